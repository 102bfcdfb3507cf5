"""Files: save and open round-trip exactly; nothing is replaced without a yes; exports are the
command line's text; bad files and unwritable folders are messages, never crashes."""

from __future__ import annotations

import os
import tomllib

import pytest
from textual.widgets import Input

from apphelp import answer_path, settle, write_scenario
from doubles import routes as doubles
from co2routes.sources.scenario import read_document
from co2routes.tui.app import Co2RoutesApp
from co2routes.tui.cli import main
from co2routes.tui.screens.dialogs import ConfirmDialog


async def test_save_as_then_open_round_trips_exactly(tmp_path):
    app = Co2RoutesApp(None, routes=doubles())
    async with app.run_test(size=(120, 40)) as pilot:
        await settle(pilot)
        app.screen.query_one("#f-site--temperature", Input).value = "12 degC"
        await settle(pilot)
        document = app.planner.document
        await pilot.press("ctrl+n")
        await answer_path(pilot, tmp_path / "mine")  # .toml is added
        await settle(pilot)
        saved = tmp_path / "mine.toml"
        assert saved.exists() and not app.planner.dirty
        assert read_document(saved)[0] == document
        # open it again (a different file first, so the open really replaces the document)
        other = write_scenario(tmp_path / "other.toml", {"name": "other", "demand": "1 kg"})
        assert app.planner.open_path(other)
        await settle(pilot)
        assert app.planner.document == {"name": "other", "demand": "1 kg"}
        await pilot.press("ctrl+o")
        await answer_path(pilot, saved)
        assert app.planner.document == document
        assert app.screen.query_one("#f-site--temperature", Input).value == "12 degC"


async def test_save_never_replaces_a_file_changed_on_disk(tmp_path):
    path = write_scenario(tmp_path / "s.toml", {"name": "mine", "demand": "1 kg"})
    app = Co2RoutesApp(str(path), routes=doubles())
    async with app.run_test(size=(120, 40)) as pilot:
        await settle(pilot)
        app.screen.query_one("#f-demand", Input).value = "2 kg"
        await settle(pilot)
        path.write_text('name = "someone else"\ndemand = "9 kg"\n', encoding="utf-8")
        os.utime(path, ns=(1, 1))  # a different mtime even on a coarse clock
        await pilot.press("ctrl+s")
        await pilot.pause()
        assert isinstance(app.screen, ConfirmDialog)
        await pilot.press("n")
        await settle(pilot)
        assert tomllib.loads(path.read_text())["demand"] == "9 kg"  # untouched
        assert app.planner.dirty
        await pilot.press("ctrl+s")
        await pilot.pause()
        await pilot.press("y")
        await settle(pilot)
        assert tomllib.loads(path.read_text())["demand"] == "2 kg"


async def test_save_as_over_an_existing_file_asks(tmp_path):
    existing = tmp_path / "taken.toml"
    existing.write_text("keep me\n", encoding="utf-8")
    app = Co2RoutesApp(None, routes=doubles())
    async with app.run_test(size=(120, 40)) as pilot:
        await settle(pilot)
        await pilot.press("ctrl+s")  # the demo has no file: save asks for a name
        await answer_path(pilot, existing)
        assert isinstance(app.screen, ConfirmDialog)
        await pilot.press("escape")
        await settle(pilot)
        assert existing.read_text() == "keep me\n"


@pytest.mark.skipif(os.geteuid() == 0, reason="root may write a read-only folder")
async def test_read_only_folder_is_a_message(tmp_path):
    folder = tmp_path / "locked"
    folder.mkdir()
    folder.chmod(0o500)
    try:
        app = Co2RoutesApp(None, routes=doubles())
        async with app.run_test(size=(120, 40)) as pilot:
            await settle(pilot)
            document = app.planner.document
            await pilot.press("ctrl+n")
            await answer_path(pilot, folder / "x.toml")
            assert app.is_running and app.planner.document == document
            assert "not saved" in str(app.screen.query_one("#status").render())
            assert list(folder.iterdir()) == []
    finally:
        folder.chmod(0o700)


async def test_malformed_and_unreadable_files_are_messages(tmp_path):
    broken = tmp_path / "broken.toml"
    broken.write_text("demand = [unclosed\n", encoding="utf-8")
    wrong = write_scenario(tmp_path / "wrong.toml", {"demand": "3 parsecs"})
    app = Co2RoutesApp(str(broken), routes=doubles())
    async with app.run_test(size=(120, 40)) as pilot:
        await settle(pilot)
        assert "could not open" in str(app.screen.query_one("#status").render())
        assert "demo" in app.planner.opened.source
        document = app.planner.document
        assert not app.planner.open_path(tmp_path / "missing.toml")
        assert not app.planner.open_path(broken)
        assert not app.planner.open_path(tmp_path)
        assert app.planner.document == document
        # a file whose values are wrong opens, with the value marked beside its field
        assert app.planner.open_path(wrong)
        await settle(pilot)
        row = app.screen.query_one("#f-demand").parent
        assert row.has_class("-bad")


async def test_export_writes_what_compare_markdown_prints(tmp_path, capsys):
    """Same scenario, registered routes: the exported Markdown is the command line's output."""
    scenario = tmp_path / "demo.toml"
    assert main(["demo", str(scenario)]) == 0
    capsys.readouterr()
    assert main(["compare", str(scenario), "--markdown"]) == 0
    printed = capsys.readouterr().out
    endings = ((".md", "--markdown"), (".csv", "--csv"), (".json", "--json"))
    app = Co2RoutesApp(str(scenario))
    async with app.run_test(size=(120, 40)) as pilot:  # one session exports all three formats
        await settle(pilot)
        for ending, _ in endings:
            await pilot.press("ctrl+t")
            await answer_path(pilot, tmp_path / f"ranking{ending}")
    for ending, flag in endings:
        capsys.readouterr()
        assert main(["compare", str(scenario), flag]) == 0  # outside the app, which holds stdout
        assert (tmp_path / f"ranking{ending}").read_text(encoding="utf-8") == capsys.readouterr().out
    assert (tmp_path / "ranking.md").read_text(encoding="utf-8") == printed


async def test_export_recipe_json_is_batch_json(tmp_path, capsys):
    scenario = tmp_path / "demo.toml"
    assert main(["demo", str(scenario)]) == 0
    app = Co2RoutesApp(str(scenario))
    async with app.run_test(size=(120, 40)) as pilot:
        await settle(pilot)
        route = app.planner.selected_row().result.route_id
        await pilot.press("ctrl+b")
        await answer_path(pilot, tmp_path / "batch.json")
    capsys.readouterr()
    assert main(["batch", route, str(scenario), "--json"]) == 0
    assert (tmp_path / "batch.json").read_text(encoding="utf-8") == capsys.readouterr().out


async def test_unwritable_place_is_a_message(tmp_path):
    """A folder that cannot take the file (here: one that does not exist, which fails the same
    way for root, who may write read-only folders) is a message; nothing is lost."""
    app = Co2RoutesApp(None, routes=doubles())
    async with app.run_test(size=(120, 40)) as pilot:
        await settle(pilot)
        document = app.planner.document
        await pilot.press("ctrl+n")
        await answer_path(pilot, tmp_path / "no" / "such" / "x.toml")
        await settle(pilot)
        assert app.is_running and app.planner.document == document and app.planner.dirty is False
        assert "not saved" in str(app.screen.query_one("#status").render())
        await pilot.press("ctrl+t")
        await answer_path(pilot, tmp_path / "no" / "x.md")
        await settle(pilot)
        assert "not exported" in str(app.screen.query_one("#status").render())

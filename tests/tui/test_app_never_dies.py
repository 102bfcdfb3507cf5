"""The interface never dies on a user's action: file actions to impossible names are messages, text
from a file cannot drive the terminal, and an error nobody caught keeps the unsaved scenario in a
recovery file (README, "Bad input")."""

from __future__ import annotations

import tomllib

import pytest
from textual.widgets import Input, Static

from apphelp import answer_path, settle, write_scenario
from doubles import routes as doubles
from co2routes.tui.app import Co2RoutesApp

NAMES = ["~nosuchuser-co2/x.toml", "n" * 300 + ".toml"]


def _status(app) -> str:
    return str(app.planner.query_one("#status", Static).render())


async def test_every_file_action_to_an_impossible_name_is_a_message(tmp_path):
    app = Co2RoutesApp(None, routes=doubles())
    async with app.run_test(size=(120, 40)) as pilot:
        await settle(pilot)
        app.screen.query_one("#f-demand", Input).value = "2 kg"
        await settle(pilot)
        for name in NAMES:
            name = name if name.startswith("~") else str(tmp_path / name)
            await pilot.press("ctrl+n")  # save as
            await answer_path(pilot, name)
            assert app.is_running and app.planner.dirty
            assert _status(app).startswith("not saved") and name[:20] in app.planner.last_failure
            assert app.planner.open_path(name) is False and app.is_running
            assert _status(app).startswith("not opened")
        assert app.planner.document["demand"] == "2 kg"
        app.planner._export_flow("ranking")
        await answer_path(pilot, "~nosuchuser-co2/ranking.md")
        await settle(pilot)
        assert app.is_running and _status(app).startswith("not exported")
        # a name with terminal escapes, read from a file, is shown without them
        path = tmp_path / "esc.toml"
        path.write_text('name = "a\\u001b[2J\\u001b[31mb"\ndemand = "1 kg"\n', encoding="utf-8")
        assert app.planner.open_path(path)
        await settle(pilot)
        assert app.planner.document["name"] == "a[2J[31mb"
        title = str(app.planner.query_one("#title-line", Static).render())
        assert "\x1b" not in title and "a[2J[31mb" in title


async def test_an_uncaught_error_keeps_the_unsaved_scenario(tmp_path, monkeypatch):
    import co2routes.tui.recovery as recovery

    monkeypatch.setattr(recovery, "folder", lambda: tmp_path)
    source = write_scenario(tmp_path / "s.toml", {"name": "mine", "demand": "1 kg"})
    app = Co2RoutesApp(str(source), routes=doubles())

    def boom() -> None:
        raise RuntimeError("a fault of ours")

    with pytest.raises(RuntimeError, match="a fault of ours"):
        async with app.run_test(size=(120, 40)) as pilot:
            await settle(pilot)
            app.screen.query_one("#f-demand", Input).value = "3 kg"
            await settle(pilot)
            app.call_later(boom)
            for _ in range(5):
                await pilot.pause()
    error, kept = app.fault
    assert isinstance(error, RuntimeError) and app.return_code == 1
    assert tomllib.loads(kept.read_text(encoding="utf-8"))["demand"] == "3 kg"
    assert "a fault of ours" in kept.with_suffix(".log").read_text(encoding="utf-8")
    line = recovery.report(kept, error)
    assert str(kept) in line and "\n" not in line

"""Helpers for the headless interface tests (the Pilot)."""

from __future__ import annotations

from pathlib import Path

from co2routes.sources.pipeline import compare
from co2routes.sources.scenario import to_toml, validate


async def settle(pilot) -> None:
    """Wait until every worker is done (the ranking worker starts the chart worker)."""
    for _ in range(3):
        await pilot.app.workers.wait_for_complete()
        await pilot.pause()


def table_ids(app) -> list[str]:
    """Route ids in the order the ranking table shows them."""
    from co2routes.tui.widgets.ranking import RankingTable

    table = app.screen.query_one(RankingTable)
    return [str(key.value) for key in table.rows]


def table_cells(app, route_id: str) -> list[str]:
    """The cell texts of one route's line in the ranking table."""
    from co2routes.tui.widgets.ranking import RankingTable

    table = app.screen.query_one(RankingTable)
    return [str(c) for c in table.get_row(route_id)]


def expected(document, routes):
    """What co2routes.sources.pipeline.compare says for ``document`` (the other face of the numbers)."""
    return compare(validate(document, "test"), routes)


def write_scenario(path: Path, document) -> Path:
    """Write a scenario document as TOML to ``path``."""
    path.write_text(to_toml(document), encoding="utf-8")
    return path


COST_ONLY = {"cost": 1, "energy": 0, "time": 0, "heat": 0, "water": 0, "purity": 0, "hazard": 0}


async def answer_path(pilot, path) -> None:
    """Type ``path`` into the open path dialog and press Enter."""
    from textual.widgets import Input

    from co2routes.tui.screens.dialogs import PathDialog

    await pilot.pause()
    assert isinstance(pilot.app.screen, PathDialog)
    pilot.app.screen.query_one("#path-input", Input).value = str(path)
    await pilot.press("enter")
    for _ in range(5):  # not settle(): the file worker may be waiting on the next dialog
        await pilot.pause()

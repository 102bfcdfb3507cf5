"""The screen at every size and by keyboard alone: every pane inside the terminal, seven routes
and their cost and hazard at 80x24, the form opened and closed by keys, focus marked without
colour."""

from __future__ import annotations

import pytest
from textual.widgets import Input, Tabs

from apphelp import settle
from doubles import routes as doubles
from co2routes.tui.app import Co2RoutesApp
from co2routes.tui.widgets.ranking import RankingTable

PANES = ("#title-line", "#ranking", "#cautions", "#status", "#key-hint")


def _inside(app, selectors, size) -> None:
    width, height = size
    for selector in selectors:
        region = app.screen.query_one(selector).region
        assert region.width > 0 and region.height > 0, selector
        assert region.right <= width and region.bottom <= height, (selector, region)


@pytest.mark.parametrize("size", [(80, 24), (160, 50)])
async def test_every_pane_fits(size):
    app = Co2RoutesApp(None, routes=doubles())
    async with app.run_test(size=size) as pilot:
        await settle(pilot)
        narrow = size[0] < 110
        assert app.screen.has_class("-narrow") == narrow
        # focus starts in the form: it is open at every size
        _inside(app, PANES + ("#form",), size)
        await pilot.press("escape")
        await pilot.pause()
        _inside(app, PANES + ("#detail",), size)
        assert app.screen.query_one("#form").display is not narrow  # a narrow screen closes it
        ranking = app.screen.query_one("#ranking").region
        assert ranking.height >= 2 + 1 + 2  # frame, heading, both routes
        assert app.screen.query_one("#cautions").region.height >= 3


async def test_wide_terminal_gives_the_results_the_room():
    app = Co2RoutesApp(None, routes=doubles())
    async with app.run_test(size=(160, 50)) as pilot:
        await settle(pilot)
        form = app.screen.query_one("#form").region
        results = app.screen.query_one("#results").region
        assert results.width > 2 * form.width
        assert form.right <= results.x


async def test_keyboard_alone_at_80x24_with_every_route(monkeypatch):
    """The real routes in a monochrome 80x24 terminal: the first field has the focus; Esc leaves
    it and the letters and digits that follow go to the ranking, not into a field; F2, F3, F4
    jump; all seven routes with cost and hazard are on screen."""
    monkeypatch.setenv("NO_COLOR", "1")
    app = Co2RoutesApp(None)
    async with app.run_test(size=(80, 24)) as pilot:
        await settle(pilot)
        planner = app.planner
        assert app.no_color
        first = planner.query(Input).first()
        assert planner.focused is first and first.id == "f-name"
        demand = planner.document["demand"]
        await pilot.press("escape", "c", "3")
        await pilot.pause()
        table = planner.query_one(RankingTable)
        assert planner.focused is table and not planner.dirty
        assert planner.document["demand"] == demand and table.sort_key == "cost"
        assert planner.query_one("#detail-tabs").active == "t-delivery"
        # every route on screen, each whole line inside the ranking's frame, cost and hazard shown
        assert table.row_count == len(planner.outcome.comparison.rows) == 7
        region = table.region
        assert region.bottom <= 24 and table.virtual_size.height <= region.height - 2
        assert {"cost", "hazard"} <= {str(k.value) for k in table.columns}
        labels = {r.result.route_id: r.result.label for r in planner.outcome.comparison.rows}
        for key in table.rows:
            shown, whole = str(table.get_cell(key, "route")), labels[str(key.value)]
            # whole, or cut where a word ends
            cut_at_word = shown.endswith("…") and whole.startswith(shown[:-1]) and whole[len(shown) - 1] in " ,("
            assert shown == whole or cut_at_word, (shown, whole)
        await pilot.press("f4")
        assert isinstance(planner.focused, Tabs)
        await pilot.press("f2")
        await pilot.pause()
        assert planner.focused is first and planner.query_one("#form").display
        await pilot.press("f3")
        await pilot.pause()
        assert planner.focused is table and not planner.query_one("#form").display

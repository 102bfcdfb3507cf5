"""The screen fits at 80x24 and scales up to 160x50: every pane is there, inside the terminal."""

from __future__ import annotations

import pytest

from apphelp import settle
from doubles import routes as doubles
from co2routes.tui.app import Co2RoutesApp

PANES = ("#title-line", "#form", "#ranking", "#weights-line", "#detail", "#cautions", "#status")


@pytest.mark.parametrize("size", [(80, 24), (160, 50)])
async def test_every_pane_fits(size):
    app = Co2RoutesApp(None, routes=doubles())
    async with app.run_test(size=size) as pilot:
        await settle(pilot)
        width, height = size
        for selector in PANES:
            region = app.screen.query_one(selector).region
            assert region.width > 0 and region.height > 0, selector
            assert region.right <= width and region.bottom <= height, (selector, region)
        # the cautions and the ranking both stay on screen at once, with room for every route
        ranking = app.screen.query_one("#ranking").region
        assert ranking.height >= 2 + 2  # border + header + at least the two routes' lines
        assert app.screen.query_one("#cautions").region.height >= 3
        assert app.screen.has_class("-narrow") == (width < 110)


async def test_wide_terminal_gives_the_results_the_room():
    app = Co2RoutesApp(None, routes=doubles())
    async with app.run_test(size=(160, 50)) as pilot:
        await settle(pilot)
        form = app.screen.query_one("#form").region
        results = app.screen.query_one("#results").region
        assert results.width > 2 * form.width
        assert form.right <= results.x

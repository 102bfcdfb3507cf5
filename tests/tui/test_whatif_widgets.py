"""The tornado and spread charts draw the what-if results they are given (headless)."""

from __future__ import annotations

import sys
from pathlib import Path

from textual.app import App

sys.path.insert(0, str(Path(__file__).resolve().parents[1] / "sources"))

from whatif_fakes import FakeRoute, scenario  # noqa: E402

from co2routes.sources.sensitivity import sensitivity  # noqa: E402
from co2routes.sources.uncertainty import uncertainty  # noqa: E402
from co2routes.tui.widgets.spread import Spread  # noqa: E402
from co2routes.tui.widgets.tornado import Tornado  # noqa: E402


class Host(App):
    def compose(self):
        yield Tornado(id="tornado")
        yield Spread(id="spread")


async def test_charts_draw_results():
    routes = [FakeRoute("a", "sucrose", 2.0), FakeRoute("b", "glucose", 1.5)]
    s = scenario()
    tornado_data = sensitivity(s, routes=routes).routes[0]
    spread_data = uncertainty(s, None, 500, seed=1, routes=routes)
    app = Host()
    async with app.run_test(size=(120, 40)) as pilot:
        tornado, spread = app.query_one(Tornado), app.query_one(Spread)
        assert tornado.showing == spread.showing == "empty"
        tornado.draw(tornado_data, "EUR")
        spread.draw(spread_data)
        await pilot.pause()
        assert tornado.showing == "tornado of a"
        assert tornado.names == tuple(i.name for i in tornado_data.inputs[: Tornado.TOP])
        assert spread.showing == "boxes of 2 routes"
        spread.draw(spread_data, "b")
        await pilot.pause()
        assert spread.showing == "histogram of b"
        spread.draw(None)
        tornado.draw(None)
        await pilot.pause()
        assert spread.showing == tornado.showing == "empty"

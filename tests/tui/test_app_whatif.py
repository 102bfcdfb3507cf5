"""The what-if tabs: the chosen route's tornado (worked out only when its tab is open) and the Monte
Carlo key's progress bar and spread, checked against co2routes.sources.sensitivity and co2routes.sources.uncertainty
called directly (the numbers' other face)."""

from __future__ import annotations

import math
import tomllib

from textual.widgets import Input, ProgressBar

from apphelp import settle, write_scenario
from co2routes.sources.registry import catalogue
from co2routes.sources.scenario import demo_text
from co2routes.sources.sensitivity import route_sensitivity
from co2routes.sources.uncertainty import uncertainty
from co2routes.sources.whatif import parse_uncertain
from co2routes.tui.app import Co2RoutesApp
from co2routes.tui.screens.whatif import SPREAD_KEY, SPREAD_SAMPLES
from co2routes.tui.widgets.spread import Spread
from co2routes.tui.widgets.tornado import Tornado

TAB_WHATIF, TAB_SPREAD = "6", "7"


def _want_tornado(app, route_id: str):
    """What co2routes.sources.sensitivity says for the route on the scenario the screen ranked."""
    planner = app.planner
    scenario = planner.outcome.scenario
    routes = catalogue().routes
    route = next(r for r in routes if r.id == route_id)
    return route_sensitivity(route, scenario, parse_uncertain(scenario, "test", None, routes))


def _chosen(app) -> str:
    return app.planner.selected_row().result.route_id


async def test_tornado_is_worked_out_when_its_tab_opens_in_the_order_sensitivity_gives():
    app = Co2RoutesApp(None)
    async with app.run_test(size=(120, 40)) as pilot:
        await settle(pilot)
        await pilot.press("escape")  # out of the first field: digits now pick tabs
        tornado = app.screen.query_one(Tornado)
        # lazily: nothing is swung before the tab is opened
        assert app.planner.tornadoes == {} and tornado.showing == "empty"
        await pilot.press(TAB_WHATIF)
        await settle(pilot)
        first = _chosen(app)
        want = _want_tornado(app, first)
        assert tornado.showing == f"tornado of {first}"
        assert tornado.names == tuple(s.name for s in want.inputs[: Tornado.TOP])
        assert app.planner.tornadoes[(app.planner.generation, first)] == want
        # another route chosen while the tab is open: its own tornado
        app.screen.query_one("#ranking").focus()
        await pilot.press("down")
        await settle(pilot)
        second = _chosen(app)
        assert second != first
        assert tornado.showing == f"tornado of {second}"
        assert tornado.names == tuple(s.name for s in _want_tornado(app, second).inputs[: Tornado.TOP])


async def test_an_edit_swings_again_only_while_the_tab_is_open():
    app = Co2RoutesApp(None)
    async with app.run_test(size=(120, 40)) as pilot:
        await settle(pilot)
        await pilot.press("escape")  # out of the first field: digits now pick tabs
        planner = app.planner

        async def edit(text: str) -> None:
            box = app.screen.query_one("#f-demand", Input)
            box.value = text
            await settle(pilot)

        await pilot.press(TAB_WHATIF)
        await settle(pilot)
        await edit("2.4 kg/day")
        assert (planner.generation, _chosen(app)) in planner.tornadoes  # open: worked out again
        planner.query_one("#detail-tabs").active = "t-batch"
        await settle(pilot)
        await edit("3.6 kg/day")
        assert not any(g == planner.generation for g, _ in planner.tornadoes)  # closed: not worked out
        await pilot.press(TAB_WHATIF)
        await settle(pilot)
        assert (planner.generation, _chosen(app)) in planner.tornadoes
        want = _want_tornado(app, _chosen(app))
        assert app.screen.query_one(Tornado).names == tuple(s.name for s in want.inputs[: Tornado.TOP])


async def test_uncertain_table_ranges_reach_the_tornado(tmp_path):
    doc = tomllib.loads(demo_text("polytunnel"))
    doc["uncertain"] = {"prices.sucrose": {"dist": "uniform", "low": "0.5 / kg", "high": "1.5 / kg"}}
    path = write_scenario(tmp_path / "u.toml", doc)
    app = Co2RoutesApp(str(path))
    async with app.run_test(size=(120, 40)) as pilot:
        await settle(pilot)
        await pilot.press("escape")  # out of the first field: digits now pick tabs
        row = next(r for r in app.planner.outcome.comparison.rows if r.result.route_id == "fermentation")
        app.screen.query_one("#ranking").move_cursor(row=row.rank - 1)
        await settle(pilot)
        await pilot.press(TAB_WHATIF)
        await settle(pilot)
        assert _chosen(app) == "fermentation"
        got = app.planner.tornadoes[(app.planner.generation, "fermentation")]
        sucrose = next(s for s in got.inputs if s.name == "prices.sucrose")
        # the swing is the [uncertain] entry's bounds (0.5 .. 1.5 per kg), not the default x0.75 .. x1.25
        assert math.isclose(sucrose.low, 0.5, rel_tol=1e-12) and math.isclose(sucrose.high, 1.5, rel_tol=1e-12)
        want = _want_tornado(app, "fermentation")
        assert app.screen.query_one(Tornado).names == tuple(s.name for s in want.inputs[: Tornado.TOP])


async def test_monte_carlo_key_shows_progress_then_the_spread_uncertainty_gives():
    app = Co2RoutesApp(None)
    async with app.run_test(size=(120, 40)) as pilot:
        await settle(pilot)
        await pilot.press("escape")  # out of the first field: digits now pick tabs
        assert app.planner.spread is None
        app.screen.query_one("#ranking").focus()
        await pilot.press(SPREAD_KEY)
        await pilot.pause()
        # the key opens the Cost range tab and shows its progress bar at once
        assert app.planner.query_one("#detail-tabs").active == "t-spread"
        bar = app.screen.query_one("#spread-bar", ProgressBar)
        assert bar.display
        await settle(pilot)
        result = app.planner.spread
        assert result is not None and result.samples == SPREAD_SAMPLES
        # the bar was moved by the run's progress callback up to its end
        assert bar.total is not None and bar.total > 0 and bar.progress == bar.total
        # the same as co2routes.sources.uncertainty.uncertainty with the same seed
        scenario = app.planner.outcome.scenario
        routes = catalogue().routes
        want = uncertainty(scenario, parse_uncertain(scenario, "test", None, routes), SPREAD_SAMPLES,
                           seed=result.seed)
        assert [r.route_id for r in result.routes] == [r.route_id for r in want.routes]
        for got, ref in zip(result.routes, want.routes):
            assert (got.cost_per_kg_p10, got.cost_per_kg_p50, got.cost_per_kg_p90, got.probability_cheapest) == \
                (ref.cost_per_kg_p10, ref.cost_per_kg_p50, ref.cost_per_kg_p90, ref.probability_cheapest)
        # probabilities of being cheapest sum to one (over routes with a known cost)
        assert math.isclose(sum(r.probability_cheapest for r in result.routes if r.probability_cheapest is not None),
                            1.0, abs_tol=1e-12)
        boxes, hist = app.screen.query_one("#spread-boxes", Spread), app.screen.query_one("#spread-hist", Spread)
        known = [r for r in result.routes if r.samples is not None]
        chosen = _chosen(app)
        assert boxes.showing == f"boxes of {len(known)} routes"
        assert hist.showing == f"histogram of {chosen}"
        line = next(r for r in result.routes if r.route_id == chosen)
        note = str(app.screen.query_one("#spread-note").render())
        assert f"P10 {line.cost_per_kg_p10:.2f}" in note and f"P50 {line.cost_per_kg_p50:.2f}" in note
        assert f"P90 {line.cost_per_kg_p90:.2f}" in note and f"{line.probability_cheapest:.1%}" in note
        # another route chosen: its histogram, from the same run
        await pilot.press("down")
        await settle(pilot)
        assert app.planner.spread is result
        assert hist.showing == f"histogram of {_chosen(app)}"


async def test_spread_tab_says_which_key_and_marks_a_run_older_than_the_inputs():
    app = Co2RoutesApp(None)
    async with app.run_test(size=(120, 40)) as pilot:
        await settle(pilot)
        await pilot.press("escape")  # out of the first field: digits now pick tabs
        await pilot.press(TAB_SPREAD)
        await settle(pilot)
        assert f"press {SPREAD_KEY}" in str(app.screen.query_one("#spread-note").render())
        app.screen.query_one("#ranking").focus()
        await pilot.press(SPREAD_KEY)
        await settle(pilot)
        assert "before the last edit" not in str(app.screen.query_one("#spread-note").render())
        app.screen.query_one("#f-demand", Input).value = "2.4 kg/day"
        await settle(pilot)
        assert "before the last edit" in str(app.screen.query_one("#spread-note").render())

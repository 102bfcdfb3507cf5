"""Start-up: the first frame, every route on screen, heavy imports off the start-up path."""

from __future__ import annotations

import subprocess
import sys

from co2routes.sources.registry import catalogue
from co2routes.tui.app import Co2RoutesApp
from apphelp import expected, settle, table_cells, table_ids
from doubles import routes as doubles


async def test_start_up_shows_every_registered_route():
    """With no argument the demo opens and every registered route is ranked, as compare ranks them."""
    app = Co2RoutesApp(None)
    async with app.run_test(size=(120, 40)) as pilot:
        await settle(pilot)
        planner = app.planner
        want = expected(planner.document, None)
        # same routes, same order as co2routes.sources.pipeline.compare (the command line's face)
        assert table_ids(app) == [row.result.route_id for row in want.rows]
        assert {r.result.route_id for r in want.rows} == {r.id for r in catalogue().routes} - {
            f.split("'")[1] for f in want.failures if "'" in f}
        assert "demo" in planner.opened.source


async def test_start_up_with_doubles_shows_both_and_their_numbers():
    routes = doubles()
    app = Co2RoutesApp(None, routes=routes)
    async with app.run_test(size=(120, 40)) as pilot:
        await settle(pilot)
        want = expected(app.planner.document, routes)
        assert table_ids(app) == [r.result.route_id for r in want.rows]
        for row in want.rows:
            cells = table_cells(app, row.result.route_id)
            assert cells[0] == str(row.rank)
            assert cells[2] == f"{row.cost_per_kg:.2f}"
            assert cells[3] == f"{row.result.energy_kwh_per_kg:.2f}"


def test_first_frame_needs_no_heavy_library():
    """Importing the app and building its screens imports neither CoolProp, Cantera nor pint
    (they load in the first worker, after the first frame)."""
    code = ("import sys; import co2routes.tui.app, co2routes.tui.screens.main, co2routes.tui.widgets.detail; "
            "bad = [m for m in ('CoolProp', 'cantera', 'pint') if m in sys.modules]; print(bad)")
    out = subprocess.run([sys.executable, "-c", code], capture_output=True, text=True, check=True)
    assert out.stdout.strip() == "[]"


async def test_the_first_compute_runs_in_a_worker():
    """on_mount only starts the worker: straight after mount there is no result yet."""
    app = Co2RoutesApp(None, routes=doubles())
    async with app.run_test(size=(120, 40)) as pilot:
        assert app.planner.outcome is None or app.workers
        await settle(pilot)
        assert app.planner.outcome is not None


async def test_keys_screen_lists_every_binding():
    from co2routes.tui.screens.help import KeysScreen, key_name
    from co2routes.tui.screens.main import MainScreen
    from co2routes.tui.widgets.ranking import RankingTable

    app = Co2RoutesApp(None, routes=doubles())
    async with app.run_test(size=(120, 40)) as pilot:
        await settle(pilot)
        await pilot.press("f1")
        await pilot.pause()
        assert isinstance(app.screen, KeysScreen)
        listed = {key for _, rows in app.screen.sections for key, _ in rows}
        for b in MainScreen.BINDINGS + RankingTable.BINDINGS + Co2RoutesApp.BINDINGS:
            assert key_name(b.key) in listed
        await pilot.press("escape")
        await pilot.pause()
        assert not isinstance(app.screen, KeysScreen)

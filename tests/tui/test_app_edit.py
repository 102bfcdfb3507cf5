"""Editing through the interface, end to end: the ranking follows co2routes.sources.pipeline.compare;
a refused entry is marked and the last good results stay; the weight keys re-rank.

The edit logic itself (every field taking junk, prices, the real routes) is tested without the
interface in tests/tui/test_editing.py."""

from __future__ import annotations

import copy

from textual.widgets import Input

from apphelp import COST_ONLY, expected, settle, table_cells, table_ids, write_scenario
from doubles import routes as doubles
from co2routes.sources.scenario import demo_text
from co2routes.tui.app import Co2RoutesApp
from co2routes.tui.widgets.form import FieldRow


def _document():
    import tomllib

    doc = tomllib.loads(demo_text("polytunnel"))
    doc["weights"] = dict(COST_ONLY)
    doc.pop("options", None)
    return doc


async def _type(pilot, widget_id: str, text: str) -> None:
    """Clear a field and type ``text`` into it key by key, as a user would."""
    box = pilot.app.screen.query_one(f"#{widget_id}", Input)
    box.focus()
    await pilot.pause()
    box.value = ""
    await pilot.press(*[("space" if ch == " " else ch) for ch in text])
    await settle(pilot)


async def test_demand_change_reorders_as_compare_says(tmp_path):
    # Doubles, cost only: A = 2.28 + 1.2/m per kg, B = 6.00 per kg (see doubles.routes), so A
    # leads at 1.2 kg/day and B leads at 0.1 kg per batch.
    routes = doubles()
    path = write_scenario(tmp_path / "s.toml", _document())
    app = Co2RoutesApp(str(path), routes=routes)
    async with app.run_test(size=(120, 40)) as pilot:
        await settle(pilot)
        assert table_ids(app) == ["double-a", "double-b"]
        await _type(pilot, "f-demand", "0.1 kg")
        want = expected(app.planner.document, routes)
        assert [r.result.route_id for r in want.rows] == ["double-b", "double-a"]
        assert table_ids(app) == ["double-b", "double-a"]
        for row in want.rows:
            assert table_cells(app, row.result.route_id)[2] == f"{row.cost_per_kg:.2f}"
        assert app.planner.dirty




async def test_bad_entry_is_marked_and_last_results_stay():
    app = Co2RoutesApp(None, routes=doubles())
    async with app.run_test(size=(120, 40)) as pilot:
        await settle(pilot)
        before = app.planner.outcome
        ids, cells = table_ids(app), table_cells(app, "double-a")
        await _type(pilot, "f-demand", "12 parsecs")
        row = app.screen.query_one("#f-demand").parent
        assert isinstance(row, FieldRow) and row.has_class("-bad")
        assert "mass" in row.reason  # the reason names what is allowed
        assert app.planner.outcome is before
        assert table_ids(app) == ids and table_cells(app, "double-a") == cells
        # fixing it clears the mark
        await _type(pilot, "f-demand", "2 kg/day")
        assert not row.has_class("-bad")
        assert app.planner.outcome is not before



async def test_weight_keys_change_the_weights_and_rank():
    routes = doubles()
    app = Co2RoutesApp(None, routes=routes)
    async with app.run_test(size=(120, 40)) as pilot:
        await settle(pilot)
        app.screen.query_one("#ranking").focus()
        await pilot.press("c")
        for _ in range(8):
            await pilot.press("plus")
        await settle(pilot)
        assert app.planner.document["weights"]["cost"] == 3 + 8 * 0.5
        assert app.screen.query_one("#f-weights--cost", Input).value == "7"
        want = expected(app.planner.document, routes)
        assert app.planner.outcome.comparison.weights["cost"] == 7.0
        assert [r.result.route_id for r in want.rows] == [r.result.route_id for r in app.planner.outcome.comparison.rows]
        doc = copy.deepcopy(app.planner.document)
        assert doc["weights"]["cost"] == 7.0

"""The demand-from-the-use panel: a scenario whose [use] sets the demand shows its balance and the
demand field says where it came from; typing a use kind beside a demand marks the conflict."""

from __future__ import annotations

import tomllib

from textual.widgets import Input

from apphelp import COST_ONLY, settle, write_scenario
from doubles import routes as doubles
from co2routes.sources.scenario import demo_text
from co2routes.tui.app import Co2RoutesApp
from co2routes.tui.widgets.use import UseBalance, use_fields


def test_use_fields_cover_every_input_once():
    from co2routes.sources.uses import all_inputs

    keys = [f.keys for f in use_fields()]
    assert len(keys) == len(set(keys))
    wanted = {("use", s.key) for specs in all_inputs().values() for s in specs} | {("use", "kind")}
    assert set(keys) == wanted


async def test_use_sets_the_demand_in_the_interface(tmp_path):
    doc = tomllib.loads(demo_text("polytunnel"))
    doc.pop("demand")
    doc.pop("options", None)
    doc["weights"] = dict(COST_ONLY)
    doc["use"] = {"kind": "greenhouse", "floor_area": "60 m**2", "mean_height": "2.5 m"}
    app = Co2RoutesApp(str(write_scenario(tmp_path / "s.toml", doc)), routes=doubles())
    async with app.run_test(size=(120, 40)) as pilot:
        await settle(pilot)
        outcome = app.planner.outcome
        assert outcome.scenario.use is not None
        shown = str(app.screen.query_one(UseBalance).render())
        assert f"{outcome.scenario.use.summary}" in shown
        assert "from the greenhouse use" in app.screen.query_one("#f-demand", Input).placeholder
        # a demand typed beside the [use] table is refused and marked under the demand field
        box = app.screen.query_one("#f-demand", Input)
        box.value = "2 kg/day"
        await settle(pilot)
        assert box.parent.has_class("-bad")
        assert app.planner.outcome is outcome  # last good result kept

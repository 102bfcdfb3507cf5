"""The demand-from-the-use panel: a scenario whose [use] sets the demand shows its balance and the
demand field says where it came from; the fields follow the kind; a demand typed beside a use is
marked under the demand field."""

from __future__ import annotations

import tomllib

from textual.widgets import Input

from apphelp import COST_ONLY, settle, write_scenario
from doubles import routes as doubles
from co2routes.sources.scenario import demo_text
from co2routes.tui.app import Co2RoutesApp
from co2routes.tui.widgets.use import UseBalance, use_fields


def test_use_fields_are_the_uses_inputs():
    from co2routes.sources.uses import KINDS, module_of

    for kind in KINDS:
        assert [f.keys[1] for f in use_fields(kind)] == [s.key for s in module_of(kind).INPUTS]


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
        assert outcome.scenario.use.summary in str(app.screen.query_one(UseBalance).render())
        assert "from the greenhouse use" in app.screen.query_one("#f-demand", Input).placeholder
        assert app.screen.query_one("#f-use--floor_area", Input).value == "60 m**2"
        # another kind: its fields replace the greenhouse's, its missing input is marked
        app.screen.query_one("#f-use--kind", Input).value = "carbonation"
        await settle(pilot)
        assert not app.screen.query("#f-use--floor_area")
        volume = app.screen.query_one("#f-use--volume", Input)
        assert volume.parent.has_class("-bad")
        volume.value = "50 L"
        await settle(pilot)
        assert app.planner.outcome.scenario.use.kind == "carbonation"
        # a demand typed beside the [use] table is refused and marked under the demand field
        box = app.screen.query_one("#f-demand", Input)
        good = app.planner.outcome
        box.value = "2 kg/day"
        await settle(pilot)
        assert box.parent.has_class("-bad")
        assert app.planner.outcome is good  # last good result kept

"""A route's own default prices and a missing price, through the comparison's pipeline."""

from __future__ import annotations

import pytest

from co2routes import api
from co2routes.sources.pipeline import evaluate
from co2routes.sources.scenario import demo


def _compute(request: api.RouteRequest) -> api.RouteResult:
    """Buys 2 kg of 'trial-feed' and 1 kg of 'unobtainium' per kg CO2, delivers dry gas."""
    kg = request.co2_kg
    return api.RouteResult(
        co2_kg=kg, co2_generated_kg=kg,
        reagents=(api.Reagent("trial feed", "X", 2 * kg, 2 * kg, None, "trial-feed"),
                  api.Reagent("rare feed", "Y", kg, kg, None, "unobtainium")),
        byproducts=(), uses=(api.Use("electricity", 1.0, api.ENERGY_KWH, "electricity"),),
        raw_gas=api.RawGas({"CO2": 1.0}, request.site.temperature_k), heat_kj=0.0,
        temperature_change_k=None, energy=api.Energy(electricity_kwh=1.0), time_h=1.0,
        hazard=api.HAZARD_LOW, hazard_reason="test route", delivers=api.GAS)


ROUTE = api.RouteModel("trial", "Trial route", (), _compute, prices={"trial-feed": "3 / kg", "electricity": "99 / kWh"})


def test_default_price_fills_a_gap_and_the_book_wins_elsewhere():
    planned = evaluate(ROUTE, demo(), co2_kg=1.0)
    lines = {line.item: line for line in planned.costs}
    # the route's default: 2 kg at 3 per kg, exact
    assert (lines["trial feed"].price_from, lines["trial feed"].cost) == ("route default", pytest.approx(6.0))
    # the demo book prices electricity: its price, not the route's 99
    assert lines["electricity"].price_from == "price book" and lines["electricity"].unit_price < 99


def test_a_missing_price_names_its_key():
    planned = evaluate(ROUTE, demo(), co2_kg=1.0)
    line = {line.item: line for line in planned.costs}["rare feed"]
    assert (line.price_key, line.price_from, line.cost) == ("unobtainium", "none", None)
    assert planned.cost_per_kg is None
    assert any("'unobtainium'" in w for w in planned.warnings)

"""Purchase route: form follows the end product, beverage-grade gas, dry-ice losses."""

import pytest
from hypothesis import given, strategies as st

from co2routes.sources.base import Route, RouteRequest, Site
from co2routes.sources.routes.purchase import ROUTE
from co2routes.thermo import cautions


def _request(kg=1.0, end="gas", **options):
    keys = [o.key for o in ROUTE.options]
    return RouteRequest(kg, Site(), {k: ROUTE.options[keys.index(k)].parse(v) for k, v in options.items()},
                        end_product=end)


def test_is_a_route():
    assert isinstance(ROUTE, Route) and ROUTE.id == "purchase"


@pytest.mark.parametrize("end, key, delivers", [("gas", "co2-cylinder", "gas"), ("liquid", "co2-liquid", "liquid"),
                                                ("dry-ice", "dry-ice", "dry-ice")])
def test_form_matches_end_product(end, key, delivers):
    r = ROUTE.compute(_request(2.0, end))
    assert r.reagents[0].price_key == key and r.delivers == delivers and r.co2_kg == 2.0


@given(kg=st.floats(0.01, 1000.0), loss=st.floats(0.0, 0.5), days=st.floats(0.0, 30.0),
       end=st.sampled_from(["gas", "liquid", "dry-ice"]))
def test_carbon_balance(kg, loss, days, end):
    # Mass (and so element) balance: bought = delivered + sublimed, to 1e-9 relative.
    req = RouteRequest(kg, Site(), {"sublimation_loss": loss, "transport_time": days * 86400.0}, end_product=end)
    r = ROUTE.compute(req)
    kept = (1 - loss) ** days if end == "dry-ice" else 1.0
    assert r.co2_kg == kg
    assert r.reagents[0].mass_kg == pytest.approx(r.co2_generated_kg, rel=1e-12)
    assert r.co2_generated_kg * kept == pytest.approx(kg, rel=1e-9)


def test_doubling_demand_doubles_purchase():
    one, two = ROUTE.compute(_request(1.0, "dry-ice")), ROUTE.compute(_request(2.0, "dry-ice"))
    assert two.reagents[0].mass_kg == pytest.approx(2 * one.reagents[0].mass_kg, rel=1e-12)


def test_dry_ice_loss_ten_percent_a_day():
    # Common practice figure of 10 %/day over the default 1 day: buy 1 / 0.9 kg per kg used.
    r = ROUTE.compute(_request(1.0, "dry-ice"))
    assert r.reagents[0].mass_kg == pytest.approx(1 / 0.9, rel=1e-12)
    assert cautions.DRY_ICE in r.cautions and cautions.ASPHYXIATION in r.cautions


def test_beverage_grade_gas():
    # ISBT quality guidelines: >= 99.9 % v/v CO2, <= 20 ppmv water. 20 ppmv is 0.00819 g water per
    # kg CO2 (18.015 / 44.0095 x 20e-6 / 0.999); tolerance 1e-5 g/kg.
    r = ROUTE.compute(_request(1.0, "gas"))
    x = r.raw_gas.mole_fractions
    assert x["CO2"] >= 0.999 and x["H2O"] <= 20e-6
    assert sum(x.values()) == pytest.approx(1.0, abs=1e-12)
    assert r.water_g_per_kg_co2 == pytest.approx(0.00820, abs=1e-5)
    assert cautions.PRESSURE in r.cautions and cautions.CYLINDER_HEAT in r.cautions
    assert not hasattr(r, "costs") and r.heat_kj == 0.0  # a route never prices itself


def test_form_option_overrides_match():
    r = ROUTE.compute(_request(1.0, "gas", form="dry-ice"))
    assert r.delivers == "dry-ice" and r.reagents[0].price_key == "dry-ice"

"""Breath route: CO2 per person against physiology, time scaling, balances."""

import pytest
from hypothesis import given, strategies as st

from co2routes.sources.base import Route, RouteRequest, Site, parse_options
from co2routes.sources.routes.breath import ROUTE, co2_generation_rate, exhaled_air
from co2routes.thermo import cautions
from co2routes.thermo.co2 import MOLAR_MASS
from co2routes.thermo.flue import air_fractions


def run(co2_kg=1.0, site=Site(), **opts):
    return ROUTE.compute(RouteRequest(co2_kg, site, parse_options(ROUTE, opts)))


def test_is_a_route():
    assert isinstance(ROUTE, Route) and ROUTE.id == "breath"


def test_adult_about_one_kg_per_day():
    # Common practice: an adult breathes out about 1 kg CO2 a day; averaged over a day the
    # activity is about 1.7 MET (FAO/WHO/UNU 2004 physical activity level, from memory); tol 15 %
    _, n = co2_generation_rate(0.85, 6.7, 1.7)
    assert n * MOLAR_MASS * 86400 == pytest.approx(1.0, rel=0.15)


def test_resting_rate():
    # Textbook respiratory physiology (e.g. West, Respiratory Physiology; from memory): resting
    # CO2 output about 200 mL/min STPD; tol 15 %
    litres, _ = co2_generation_rate(0.85, 6.7, 1.0, 273.15, 101325.0)
    assert litres * 60 == pytest.approx(0.200, rel=0.15)


def test_persily_formula_by_hand():
    # Persily & de Jonge (2017): V = RQ BMR M (T/P) 0.000211 with T [K], P [kPa]; tol 1e-12
    litres, _ = co2_generation_rate(0.85, 7.0, 1.2, 293.15, 101325.0)
    assert litres == pytest.approx(0.85 * 7.0 * 1.2 * 293.15 / 101.325 * 0.000211, rel=1e-12)


def test_exhaled_air_water_load():
    # IAPWS-95: p_sat(34 degC) = 5.32 kPa, so exhaled air holds about 5.3 % water (docs/references.md:
    # 5-6 %); tol 0.2 percentage points
    x = exhaled_air(0.85, air_fractions(425e-6), 101325.0)
    assert x["H2O"] == pytest.approx(0.0525, abs=0.002)
    assert sum(x.values()) == pytest.approx(1.0, rel=1e-12)


def test_too_few_people_scales_time():
    # 1 person at 1.2 MET gives about 0.66 kg/day: 1 kg needs more than a day of breathing
    r = run(1.0, people="1", hours="8 h")
    assert any("needs" in w for w in r.warnings)
    _, n = co2_generation_rate(0.85, 6.7, 1.2)
    hours_needed = 1.0 / MOLAR_MASS / 0.9 / n / 3600
    assert r.time_h == pytest.approx(hours_needed + 2.0, rel=1e-9)


def test_enough_people_no_warning():
    r = run(0.1, people="10", hours="8 h")
    assert not any("needs" in w for w in r.warnings)


def test_heat_sign_and_cautions():
    r = run()
    assert r.heat_kj > 0  # the kiln takes heat in
    assert cautions.BREATH in r.cautions and cautions.HOT_SURFACE in r.cautions


@given(people=st.integers(1, 50), met=st.floats(0.8, 5.0), capture=st.floats(0.1, 1.0),
       demand=st.floats(0.01, 20.0), cycles=st.integers(1, 50))
def test_balances_and_scaling(people, met, capture, demand, cycles):
    # Carbon: CO2 exhaled into the bed x capture = delivered; doubling demand doubles reagents
    # and uses (tol 1e-9 relative)
    opts = dict(people=str(people), met=str(met), capture_fraction=str(capture), cycles=str(cycles))
    r1, r2 = run(demand, **opts), run(2 * demand, **opts)
    assert r1.co2_kg == demand
    assert r1.co2_generated_kg * capture == pytest.approx(demand, rel=1e-9)
    for a, b in zip(r1.reagents, r2.reagents):
        assert b.mass_kg == pytest.approx(2 * a.mass_kg, rel=1e-9)
    for a, b in zip(r1.uses, r2.uses):
        assert b.amount == pytest.approx(2 * a.amount, rel=1e-9)

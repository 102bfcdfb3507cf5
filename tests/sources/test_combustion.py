"""Combustion route: delivered CO2, fuel bought, heat sign, balances."""

import pytest
from hypothesis import given, strategies as st

from co2routes.sources.base import Route, RouteRequest, Site, parse_options
from co2routes.sources.routes.combustion import ROUTE
from co2routes.thermo import cautions
from co2routes.thermo.co2 import MOLAR_MASS

# IUPAC standard atomic weights (2021) [g/mol]
C, H = 12.011, 1.008


def run(co2_kg=1.0, site=Site(), **opts):
    return ROUTE.compute(RouteRequest(co2_kg, site, parse_options(ROUTE, opts)))


def test_is_a_route():
    assert isinstance(ROUTE, Route) and ROUTE.id == "combustion"


def test_propane_three_kg_co2_per_kg():
    # Stoichiometry with IUPAC atomic weights: C3H8 -> 3 CO2, 2.994 kg CO2 per kg; the flue also
    # carries the air's own 425 ppm CO2 (about 0.4 % more at 15 % excess air); tol 0.6 %
    r = run(fuel="propane", capture="no")
    per_kg = r.co2_kg / r.reagents[0].mass_kg
    assert per_kg == pytest.approx(3 * (C + 32.0) / (3 * C + 8 * H), rel=6e-3)
    assert r.reagents[0].price_key == "propane"


def test_methane_is_a_use_priced_per_kwh():
    # Natural gas is bought by its heating value (price book: natural-gas per kWh)
    r = run(fuel="methane")
    assert r.reagents == ()
    gas = [u for u in r.uses if u.price_key == "natural-gas"]
    assert len(gas) == 1 and gas[0].dimension == "energy_kwh" and gas[0].amount > 0


def test_stoichiometric_methane_flue_without_capture():
    # Hand stoichiometry 1/(1 + 7.52) = 0.117 CO2 in dry flue gas; tol 0.0005
    r = run(fuel="methane", excess_air="0 %", capture="no")
    x = r.raw_gas.mole_fractions
    dry = x["CO2"] / (1 - x["H2O"])
    assert dry == pytest.approx(1 / 8.52, abs=5e-4)


def test_heat_sign_and_credit():
    # Sign convention (DEVELOPERS.md): the batch gives heat off, heat_kj strongly negative; the
    # credit is a negative use at the heat price
    r = run(heat_used="yes")
    assert r.heat_kj < -10000.0
    credit = [u for u in r.uses if u.price_key == "heat"]
    assert credit and credit[0].amount == pytest.approx(r.heat_kj / 3600.0, rel=1e-12)
    assert not [u for u in run(heat_used="no").uses if u.price_key == "heat"]


def test_cautions_and_hazard():
    r = run()
    assert cautions.BURNER in r.cautions and cautions.ASPHYXIATION in r.cautions
    assert r.hazard == 3 and r.temperature_change_k is None


@given(fuel=st.sampled_from(("methane", "propane", "butane", "ethanol")),
       excess=st.floats(0.0, 2.0), capture=st.sampled_from(("yes", "no")),
       fraction=st.floats(0.1, 1.0), demand=st.floats(0.01, 100.0))
def test_carbon_balance_and_scaling(fuel, excess, capture, fraction, demand):
    # Conservation of carbon: CO2 delivered = recovered share of the flue's CO2; doubling the
    # demand doubles every reagent and use; tol 1e-9 relative
    opts = dict(fuel=fuel, excess_air=str(excess), capture=capture, capture_fraction=str(fraction))
    r1 = run(demand, **opts)
    r2 = run(2 * demand, **opts)
    assert r1.co2_kg == demand
    share = fraction if capture == "yes" else 1.0
    assert r1.co2_kg == pytest.approx(r1.co2_generated_kg * share, rel=1e-9)
    for a, b in zip(r1.reagents + r1.uses, r2.reagents + r2.uses):
        got = b.mass_kg if hasattr(b, "mass_kg") else b.amount
        ref = a.mass_kg if hasattr(a, "mass_kg") else a.amount
        assert got == pytest.approx(2 * ref, rel=1e-9)
    assert r2.heat_kj == pytest.approx(2 * r1.heat_kj, rel=1e-9)
    assert sum(r1.raw_gas.mole_fractions.values()) == pytest.approx(1.0, rel=1e-9)


def test_fuel_carbon_matches_generated_co2():
    # Carbon balance with IUPAC weights: fuel carbon + air CO2 = flue CO2; with no CO2 in the air
    # the flue CO2 is exactly the fuel's carbon; tol 1e-9
    r = run(1.0, Site(air_co2_fraction=0.0), fuel="butane", capture="no")
    fuel_mol = r.reagents[0].mass_kg / ((4 * C + 10 * H) / 1000)
    assert r.co2_generated_kg / MOLAR_MASS == pytest.approx(4 * fuel_mol, rel=2e-5)  # Cantera vs IUPAC weights

"""Physics of the demand from the use: greenhouse balance, Balling, washout, carbonation, cold box.

Each check names its outside source (or the hand calculation written out beside it) and its
tolerance.
"""

from __future__ import annotations

import math

import pytest

from co2routes.thermo import brewing, carbonation, coldbox, dryice, greenhouse, purge
from co2routes.thermo.errors import InputError

R, M = 8.314462618, 0.0440095  # CODATA 2018; IUPAC molar mass of CO2 [kg/mol]


def test_greenhouse_steady_balance_by_hand():
    # Hand calculation: n = P V / (R T) = 101325 x 500 / (8.314462618 x 293.15) mol; ventilation
    # loss = N n (x_t - x_out) M with N = 0.8 /h, 1000 - 420 ppmv; supply = that + uptake 0.3 kg/h.
    n = 101325.0 * 500.0 / (8.314462618 * 293.15)
    vent = 0.8 * n * (1000e-6 - 420e-6) * 0.0440095
    b = greenhouse.steady_balance(500.0, 0.8, 420e-6, 1000e-6, 0.3, 293.15, 101325.0)
    assert b.ventilation_kg_h == pytest.approx(vent, rel=1e-12)
    assert b.supply_kg_h == pytest.approx(vent + 0.3, rel=1e-12)
    assert vent == pytest.approx(0.4245, abs=5e-4)  # 0.8 x 20785 mol x 580e-6 x 0.04401 kg/mol


def test_greenhouse_no_air_changes_no_uptake_needs_nothing():
    b = greenhouse.steady_balance(800.0, 0.0, 425e-6, 1200e-6, 0.0)
    assert b.supply_kg_h == 0.0 and b.ventilation_kg_h == 0.0


def test_pull_up_reaches_the_target_in_the_time():
    # The closed form against a direct integration of n dx/dt = S - U - N n (x - x_out) (Euler,
    # 20,000 steps): the level at tau is the target within 0.1 %.
    b = greenhouse.steady_balance(600.0, 0.7, 425e-6, 1000e-6, 0.25)
    s = greenhouse.pull_up_supply_kg_h(b, 1.5)
    x, steps = 425e-6, 20000
    dt = 1.5 / steps
    for _ in range(steps):
        x += dt * ((s - 0.25) / M / b.air_mol - 0.7 * (x - 425e-6))
    assert x == pytest.approx(1000e-6, rel=1e-3)


def test_decay_and_time_to_fall_are_inverse():
    x = greenhouse.decay_fraction(425e-6, 3000e-6, 2.0, 0.9)
    assert greenhouse.hours_to_fall(425e-6, 3000e-6, x, 2.0) == pytest.approx(0.9, rel=1e-12)


def test_target_below_outside_is_refused():
    with pytest.raises(InputError, match="outside"):
        greenhouse.steady_balance(100.0, 1.0, 425e-6, 400e-6, 0.0)


@pytest.mark.parametrize("oe, er, published_a", [
    # Cutaia, Reid & Speers (2009) J. Inst. Brew. 115, 318, Table III dataset means (OE, real
    # extract, alcohol % w/w): Proprietary, Navarro, CMBTC. Balling's A within 2 %.
    (17.67, 5.38, 6.56), (12.75, 4.74, 4.21), (11.34, 3.80, 3.82)])
def test_balling_alcohol_against_published_brews(oe, er, published_a):
    assert brewing.alcohol_from_extracts(oe, er) == pytest.approx(published_a, rel=0.02)


def test_balling_formula_round_trip_and_mass_balance():
    # Balling: OE = 100 (2.0665 A + ER) / (100 + 1.0665 A), exactly inverted by A(OE, ER).
    a = brewing.alcohol_from_extracts(14.3, 5.1)
    assert brewing.original_extract(a, 5.1) == pytest.approx(14.3, rel=1e-12)
    f = brewing.ferment_wort(0.2, 14.3, 3.0)
    # Balling's balance: 0.9565 g CO2 per 2.0665 g extract; wort = beer + CO2 + yeast, exactly
    assert f.co2_kg / f.extract_fermented_kg == pytest.approx(0.9565 / 2.0665, rel=1e-12)
    assert f.beer_kg + f.co2_kg + f.yeast_kg == pytest.approx(f.wort_kg, rel=1e-12)
    # alcohol of the beer by mass equals Balling's A
    assert f.ethanol_kg / f.beer_kg == pytest.approx(f.alcohol_mass_fraction, rel=1e-9)


def test_specific_gravity_and_plato():
    # ASBC extract table: 10.0 degrees Plato is SG 1.0400 (from memory), within 0.05 P
    assert brewing.plato_from_sg(1.0400) == pytest.approx(10.0, abs=0.05)
    assert brewing.plato_from_sg(brewing.sg_from_plato(17.0)) == pytest.approx(17.0, abs=1e-9)


def test_final_gravity_above_original_is_refused():
    with pytest.raises(InputError, match="final gravity"):
        brewing.ferment_wort(0.1, 10.0, 11.0)


def test_washout_against_a_direct_integration():
    # Well-mixed vessel (Danckwerts 1953): dy/dV = (1 - y) / V_h; Euler integration to 1e-4
    v_h, y, steps = 0.3, 0.0, 50000
    fed = v_h * purge.purge_volumes(0.95)
    for _ in range(steps):
        y += (fed / steps) * (1.0 - y) / v_h
    assert y == pytest.approx(0.95, abs=1e-4)
    assert purge.outlet_purity(fed, v_h) == pytest.approx(0.95, rel=1e-12)


def test_purge_loss_is_the_washout_formula():
    # fed = V_h ln(1/(1-y)) P M / (R T); held after the switch (1 - y) V_h rho
    p = purge.purge_loss(0.08, 0.98, 291.15, 101325.0)
    rho = 101325.0 * M / (R * 291.15)
    assert p.fed_before_switch_kg == pytest.approx(0.08 * math.log(1 / 0.02) * rho, rel=1e-12)
    assert p.lost_kg == pytest.approx(0.08 * (math.log(1 / 0.02) + 0.02) * rho, rel=1e-12)


@pytest.mark.parametrize("deg_f, psig, volumes", [
    # Miller (1994), BrewingTechniques 2(1), "Table I: Guideline for degrees of carbonation at
    # various beer temperatures": (32 degF, 10 psi) 2.70, (38 degF, 12 psi) 2.57, (46 degF, 15 psi)
    # 2.47 volumes. Henry's law of Sander (2015) within 4 % (it runs 3 % low at 32 degF).
    (32.0, 10.0, 2.70), (38.0, 12.0, 2.57), (46.0, 15.0, 2.47)])
def test_carbonation_against_a_published_table(deg_f, psig, volumes):
    t = (deg_f - 32.0) / 1.8 + 273.15
    got = carbonation.equilibrium_volumes(t, psig * 6894.757293168361).volumes
    assert got == pytest.approx(volumes, rel=0.04)
    back = carbonation.pressure_for(t, got).gauge_pressure_pa / 6894.757293168361
    assert back == pytest.approx(psig, rel=1e-9)


def test_one_volume_is_the_stp_density():
    # 44.0095 g/mol / 22.413969 L/mol (CODATA 2018 ideal molar volume at 0 degC, 1 atm)
    assert carbonation.volumes_to_kg_m3(1.0) == pytest.approx(1.9635, abs=1e-4)


def test_cold_box_is_the_storage_loss():
    # The box's ice over a day equals dryice.storage_loss's daily loss (the figures `snow` shows)
    loss = dryice.storage_loss(1.4, 0.6, 303.15)
    box = coldbox.dry_ice_needed(86400.0, area_m2=1.4, u_w_m2_k=0.6, outside_k=303.15)
    assert box.box_ice_kg == pytest.approx(loss.loss_kg_per_day, rel=1e-12)
    # load: 10 kg of water chilled 20 -> 5 degC: 10 x 4180 x 15 J / 573.3 kJ/kg (Giauque & Egan 1937)
    load = coldbox.dry_ice_needed(0.0, load_j=coldbox.load_heat_j(10.0, 4180.0, 293.15, 278.15))
    assert load.total_kg == pytest.approx(627.0 / 573.3, rel=1e-9)


def test_cold_box_refuses_impossible_temperatures():
    with pytest.raises(InputError):
        coldbox.dry_ice_needed(3600.0, area_m2=1.0, u_w_m2_k=0.5, outside_k=180.0)
    with pytest.raises(InputError, match="start"):
        coldbox.load_heat_j(5.0, 4180.0, 280.0, 290.0)

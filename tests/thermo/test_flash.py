"""Dry-ice fraction of liquid CO2 released to 1 atm."""

from __future__ import annotations

import pytest

from co2routes.thermo import flash
from co2routes.thermo.co2 import MOLAR_MASS, NORMAL_SUBLIMATION_K, TRIPLE_TEMPERATURE_K
from co2routes.thermo.errors import InputError


def test_sublimation_enthalpy_per_kg():
    # Giauque & Egan (1937) J. Chem. Phys. 5, 45: 25.23 kJ/mol at 194.67 K; per kg with
    # M = 44.0095 g/mol; 0.1 kJ/kg
    assert flash.SUBLIMATION_ENTHALPY_J_KG == pytest.approx(25.23e3 / MOLAR_MASS, abs=100.0)


@pytest.mark.parametrize(
    "t_c, x_ref",
    # docs/references.md (status C): -40 degC 0.54, -20 degC 0.47, 0 degC 0.39, +20 degC 0.29,
    # +30 degC 0.21 (two decimals): tolerance 0.006
    [(-40.0, 0.54), (-20.0, 0.47), (0.0, 0.39), (20.0, 0.29), (30.0, 0.21)],
)
def test_solid_fraction_reference_sheet(t_c, x_ref):
    assert flash.solid_fraction(273.15 + t_c) == pytest.approx(x_ref, abs=0.006)


def test_liquid_side_against_nist_table():
    # Independent of the vapour bridge: x(-20 degC) - x(0 degC) = (h_f(0) - h_f(-20)) / dH_sub with
    # the NIST WebBook saturated-liquid enthalpies 200.00 and 154.45 kJ/kg (Ohio University R744
    # table, NIST data) and Giauque & Egan's 573.3 kJ/kg; tolerance 5e-4
    expect = (200.00 - 154.45) / 573.3
    got = flash.solid_fraction(253.15) - flash.solid_fraction(273.15)
    assert got == pytest.approx(expect, abs=5e-4)


def test_vapour_bridge_against_independent_heat_capacity():
    # The ideal-gas enthalpy drop from 216.592 K to 194.686 K, by the TRC ideal-gas heat-capacity
    # correlation for CO2 carried in `chemicals` (TRC tables, valid 50-5000 K), must match the
    # bridge used here (Span & Wagner cp0) within 0.5 %.
    from chemicals.heat_capacity import TRC_gas_data, TRCCp_integral

    from co2routes.thermo._lazy import coolprop

    row = TRC_gas_data.loc["124-38-9"]
    coeffs = [row[f"a{i}"] for i in range(8)]
    dh_trc = (TRCCp_integral(TRIPLE_TEMPERATURE_K, *coeffs) - TRCCp_integral(NORMAL_SUBLIMATION_K, *coeffs))
    dh_trc_per_kg = dh_trc / MOLAR_MASS
    cp = coolprop()
    state = cp.AbstractState("HEOS", "CO2")
    state.update(cp.PT_INPUTS, 101325.0, TRIPLE_TEMPERATURE_K + 1e-6)
    dh_ours = state.hmass() - flash.vapor_enthalpy_at_sublimation_point()
    assert dh_ours == pytest.approx(dh_trc_per_kg, rel=5e-3)


def test_common_practice_snow_yield():
    # common practice: "about 30-45 % of liquid CO2 becomes snow" for liquid stored from about
    # -20 degC (bulk tanks) to room temperature; the ends of that span, 0.01 slack
    for t_c in (-15.0, 0.0, 15.0):
        assert 0.29 <= flash.solid_fraction(273.15 + t_c) <= 0.46


def test_fraction_decreases_with_temperature_and_stays_inside_0_1():
    temps = [TRIPLE_TEMPERATURE_K + 0.01 + i * 4.375 for i in range(20)] + [304.0]
    xs = [flash.solid_fraction(t) for t in temps]
    assert all(0.0 < x < 1.0 for x in xs)
    assert all(a > b for a, b in zip(xs, xs[1:]))


def test_masses_add_up_and_pressure_route_agrees():
    r = flash.flash_at_temperature(293.15, 10.0)
    assert r.solid_mass_kg + r.vapor_mass_kg == pytest.approx(10.0)
    assert r.solid_mass_kg == pytest.approx(10.0 * r.solid_fraction)
    by_p = flash.flash_at_pressure(r.liquid_pressure_pa, 10.0)
    assert by_p.solid_fraction == pytest.approx(r.solid_fraction, abs=1e-6)
    assert flash.flash_at_temperature(293.15).solid_mass_kg is None


@pytest.mark.parametrize(
    "call",
    [
        lambda: flash.flash_at_temperature(310.0),       # above the critical point
        lambda: flash.flash_at_temperature(210.0),       # below the triple point
        lambda: flash.flash_at_pressure(8e6),
        lambda: flash.flash_at_pressure(3e5),
        lambda: flash.flash_at_temperature(293.15, -1.0),
    ],
)
def test_refused(call):
    with pytest.raises(InputError):
        call()

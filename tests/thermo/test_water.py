"""Water vapour pressure, dew/frost points and moisture conversions against published values."""

from __future__ import annotations

import math

import pytest
from hypothesis import example, given, strategies as st

from co2routes.thermo import water
from co2routes.thermo.errors import InputError


# --- liquid water: IAPWS-95 -------------------------------------------------------------------

@pytest.mark.parametrize(
    "t_k, p_pa, rel_tol",
    [
        # Wagner & Pruss (2002) J. Phys. Chem. Ref. Data 31, 387, Table 13.1: 25 degC 3.1699 kPa
        (298.15, 3169.9, 5e-5),
        # same table: 100 degC 101.418 kPa
        (373.15, 101418.0, 5e-6),
        # IAPWS R6-95 release, Table 8 check values (from memory, matched by chemicals.iapws95_Psat):
        # 275 K 0.698451167e-3 MPa, 450 K 0.932203564 MPa, 625 K 16.9082693 MPa
        (275.0, 698.451167, 1e-7),
        (450.0, 932203.564, 1e-7),
        (625.0, 16908269.3, 1e-7),
    ],
)
def test_liquid_vapour_pressure_iapws95(t_k, p_pa, rel_tol):
    assert water.vapor_pressure_liquid(t_k) == pytest.approx(p_pa, rel=rel_tol)


@pytest.mark.parametrize("t_k", [273.16, 290.0, 330.0, 400.0, 550.0, 640.0])
def test_liquid_matches_independent_iapws95_implementation(t_k):
    # chemicals.iapws95_Psat: an independent code of the same IAPWS-95 saturation; tolerance 1e-6
    from chemicals.iapws import iapws95_Psat

    assert water.vapor_pressure_liquid(t_k) == pytest.approx(iapws95_Psat(t_k), rel=1e-6)


# --- ice: Murphy & Koop (2005) eq. 7 ------------------------------------------------------------

def test_ice_at_triple_point():
    # IAPWS R14-08(2011): triple-point pressure 611.657 Pa; Murphy & Koop eq. 7 matches it, 1e-5
    assert water.vapor_pressure_ice(273.16) == pytest.approx(611.657, rel=1e-5)


@pytest.mark.parametrize(
    "t_k, rel_tol",
    [(250.0, 6e-4), (230.0, 6e-4), (200.0, 6e-4), (150.0, 2e-3), (110.0, 3.5e-3)],
)
def test_ice_matches_iapws_2011_sublimation(t_k, rel_tol):
    # Wagner, Riethmann, Feistel & Harvey (2011) J. Phys. Chem. Ref. Data 40, 043103 (IAPWS R14-08)
    # as coded in chemicals.iapws11_Psub. Murphy & Koop (2005) Sec. 2 report agreement with the
    # IAPWS/Feistel-Wagner ice formulation to better than 0.1 % above 170 K and a few tenths of a
    # per cent near 110 K: tolerances as given.
    from chemicals.iapws import iapws11_Psub

    assert water.vapor_pressure_ice(t_k) == pytest.approx(iapws11_Psub(t_k), rel=rel_tol)


def test_iapws_2011_check_value_at_230_k():
    # IAPWS R14-08(2011) Table 4 check value (from memory): 230 K -> 8.94735 Pa. Murphy & Koop
    # eq. 7 agrees within 0.05 %.
    assert water.vapor_pressure_ice(230.0) == pytest.approx(8.94735, rel=5e-4)


def test_vapor_pressure_switches_at_triple_point():
    # below 273.16 K the frost-point (ice) branch, above it liquid; the two meet within 1e-5
    # (IAPWS-95 611.655 Pa vs IAPWS 2011 ice 611.657 Pa at the triple point)
    assert water.vapor_pressure(273.159) == pytest.approx(water.vapor_pressure_ice(273.159))
    assert water.vapor_pressure(273.16) == pytest.approx(water.vapor_pressure_liquid(273.16))
    assert water.vapor_pressure(273.159) == pytest.approx(water.vapor_pressure(273.16), rel=1e-4)


@pytest.mark.parametrize("bad", [100.0, 650.0, -5.0])
def test_vapor_pressure_refuses_out_of_range(bad):
    with pytest.raises(InputError):
        water.vapor_pressure(bad)


# --- dew and frost points -------------------------------------------------------------------------

def test_frost_point_of_20_ppmv_at_1_atm():
    # docs/references.md (C): 20 ppmv at 1 atm has a frost point of about -55.3 degC. Independent
    # route: invert the IAPWS 2011 sublimation equation (chemicals) with scipy; 0.05 K.
    from chemicals.iapws import iapws11_Psub
    from scipy.optimize import brentq

    p_w = 20e-6 * 101325.0
    t_iapws = brentq(lambda t: iapws11_Psub(t) - p_w, 150.0, 273.16)
    t_ours = water.dew_point_from_ppmv(20.0, 101325.0)
    assert t_ours == pytest.approx(t_iapws, abs=0.05)
    assert t_ours - 273.15 == pytest.approx(-55.3, abs=0.1)
    assert water.moisture_from_ppmv(20.0).over_ice


def test_dew_point_of_saturated_gas_at_100_c():
    # Wagner & Pruss (2002) Table 13.1: p_sat(100 degC) = 101.418 kPa, so that partial pressure
    # has a dew point of 373.15 K; 1 mK
    assert water.dew_point(101418.0) == pytest.approx(373.15, abs=1e-3)


@given(st.floats(min_value=115.0, max_value=640.0))
@example(273.16)
@example(273.1599)
def test_dew_point_inverts_vapor_pressure(t_k):
    # round trip through both branches; 1e-5 K: CoolProp 6.8's saturation solver converges to
    # about 1e-7 relative in pressure, a few 1e-6 K just above the triple point
    assert water.dew_point(water.vapor_pressure(t_k)) == pytest.approx(t_k, abs=1e-5)


def test_relative_humidity_against_magnus():
    # Alduchov & Eskridge (1996) J. Appl. Meteor. 35, 601, Magnus form a = 17.625, b = 243.04 degC
    # (their stated accuracy < 0.4 % in p_sat, i.e. < 0.1 K in dew point here); 25 degC, 50 % RH
    t_c, rh = 25.0, 0.5
    gamma = math.log(rh) + 17.625 * t_c / (243.04 + t_c)
    td_magnus = 243.04 * gamma / (17.625 - gamma)
    m = water.moisture_from_relative_humidity(273.15 + t_c, rh)
    assert m.dew_point_k - 273.15 == pytest.approx(td_magnus, abs=0.1)
    assert not m.over_ice


# --- conversions ----------------------------------------------------------------------------------

def test_g_per_kg_uses_molar_masses():
    # mass ratio from molar masses in `chemicals` (CRC values: water 18.015, CO2 44.0095 g/mol);
    # 1e-4 relative
    from chemicals import MW

    y = 1000e-6
    expect = 1000.0 * y / (1 - y) * MW("7732-18-5") / MW("124-38-9")
    assert water.g_per_kg_from_ppmv(1000.0) == pytest.approx(expect, rel=1e-4)


@given(st.floats(min_value=0.0, max_value=9e5))
def test_ppmv_g_per_kg_round_trip(ppmv):
    back = water.ppmv_from_g_per_kg(water.g_per_kg_from_ppmv(ppmv))
    assert back == pytest.approx(ppmv, rel=1e-9, abs=1e-9)


def test_saturated_ppmv_bubbler_at_25_c():
    # ideal mixing: 1e6 * 3.1699 kPa / 101.325 kPa (IAPWS-95 Table 13.1 value); 1e-4
    assert water.saturated_ppmv(298.15, 101325.0) == pytest.approx(1e6 * 3169.9 / 101325.0, rel=1e-4)
    # ten times the pressure carries a tenth of the water (no enhancement factor)
    assert water.saturated_ppmv(298.15, 1013250.0) == pytest.approx(
        water.saturated_ppmv(298.15) / 10.0, rel=1e-12)


def test_moisture_fields_are_consistent():
    m = water.moisture_from_dew_point(263.15, 2e5)
    assert m.over_ice
    assert m.water_pressure_pa == pytest.approx(water.vapor_pressure_ice(263.15))
    assert m.water_ppmv == pytest.approx(1e6 * m.water_pressure_pa / 2e5)
    assert water.moisture_from_g_per_kg(m.water_g_per_kg_co2, 2e5).dew_point_k == pytest.approx(263.15)


@pytest.mark.parametrize(
    "call",
    [
        lambda: water.ppmv_from_dew_point(373.15, 9e4),  # steam: p_sat above total pressure
        lambda: water.dew_point_from_ppmv(1e6),
        lambda: water.dew_point_from_ppmv(-3.0),
        lambda: water.dew_point(0.0),
        lambda: water.dew_point(1e-13),  # frost point below 110 K
        lambda: water.moisture_from_relative_humidity(298.15, 1.5),
    ],
)
def test_bad_inputs_raise_input_error(call):
    with pytest.raises(InputError):
        call()

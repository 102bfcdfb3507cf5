"""CO2 saturation, phase and vessel states against published tables and common practice."""

from __future__ import annotations

import math

import pytest
from hypothesis import assume, given, strategies as st

from co2routes.thermo import co2
from co2routes.thermo.errors import InputError

PSI = 6894.757293168361


# --- fixed points -------------------------------------------------------------------------------

def test_fixed_points_agree_with_the_equation_of_state():
    # Span & Wagner (1996) Sec. 3.1: T_t 216.592 K, p_t 0.51795 MPa, T_c 304.1282 K, p_c 7.3773 MPa.
    # CoolProp carries the same equation; its p_t comes out of the equation (14 Pa higher): 5e-5.
    from co2routes.thermo._lazy import coolprop

    cp = coolprop()
    assert cp.PropsSI("Ttriple", "CO2") == pytest.approx(co2.TRIPLE_TEMPERATURE_K, abs=1e-6)
    assert cp.PropsSI("ptriple", "CO2") == pytest.approx(co2.TRIPLE_PRESSURE_PA, rel=5e-5)
    assert cp.PropsSI("Tcrit", "CO2") == pytest.approx(co2.CRITICAL_TEMPERATURE_K, abs=1e-6)
    assert cp.PropsSI("pcrit", "CO2") == pytest.approx(co2.CRITICAL_PRESSURE_PA, rel=1e-5)
    # molar mass: chemicals (CRC) 44.0095 g/mol; Span & Wagner use 44.0098: 1e-5
    from chemicals import MW

    assert co2.MOLAR_MASS * 1000 == pytest.approx(MW("124-38-9"), rel=1e-5)


def test_normal_sublimation_point():
    # Giauque & Egan (1937) J. Chem. Phys. 5, 45: dry ice sublimes at 194.67 K under 1 atm;
    # Span & Wagner (1996) eq. 3.12 gives 194.685 K; tolerance 0.03 K
    assert co2.sublimation_temperature(101325.0) == pytest.approx(194.67, abs=0.03)
    assert co2.sublimation_temperature(101325.0) == pytest.approx(co2.NORMAL_SUBLIMATION_K, abs=2e-3)


def test_phase_lines_meet_at_triple_point():
    # eqs. 3.10 and 3.12 both pass through (T_t, p_t) by construction
    assert co2.sublimation_pressure(co2.TRIPLE_TEMPERATURE_K) == pytest.approx(co2.TRIPLE_PRESSURE_PA)
    assert co2.melting_pressure(co2.TRIPLE_TEMPERATURE_K) == pytest.approx(co2.TRIPLE_PRESSURE_PA)


# --- saturation ---------------------------------------------------------------------------------

# NIST Chemistry WebBook (Span & Wagner 1996), as tabulated by Ohio University's R744 saturation
# table (accessed 2007): T [degC], p [MPa], v_f, v_g [m3/kg], h_fg [kJ/kg]. Volumes have 3-4
# significant figures: density tolerance 0.06 %.
NIST_ROWS = [
    (-20.0, 1.9696, 0.000969, 0.019343, 282.44),
    (0.0, 3.4851, 0.001078, 0.010241, 230.89),
]


@pytest.mark.parametrize("t_c, p_mpa, vf, vg, hfg", NIST_ROWS)
def test_saturation_against_nist_table(t_c, p_mpa, vf, vg, hfg):
    s = co2.saturation_at_temperature(273.15 + t_c)
    assert s.pressure_pa / 1e6 == pytest.approx(p_mpa, abs=1e-4)
    assert s.liquid_density_kg_m3 == pytest.approx(1 / vf, rel=6e-4)
    assert s.vapor_density_kg_m3 == pytest.approx(1 / vg, rel=6e-4)
    assert s.enthalpy_of_vaporization_j_kg / 1e3 == pytest.approx(hfg, abs=0.01)


def test_saturation_at_0_c_brief_values():
    # NIST WebBook / Span & Wagner (1996): 0 degC 3.4851 MPa, liquid 927.4, vapour 97.65 kg/m3;
    # the IIR reference state puts the saturated liquid at 200.00 kJ/kg (same NIST table)
    s = co2.saturation_at_temperature(273.15)
    assert s.liquid_density_kg_m3 == pytest.approx(927.4, abs=0.1)
    assert s.vapor_density_kg_m3 == pytest.approx(97.65, abs=0.01)
    assert s.liquid_enthalpy_j_kg == pytest.approx(200.00e3, abs=10.0)


def test_saturation_at_25_c():
    # docs/references.md: 25 degC 64.34 bar (Span & Wagner via NIST WebBook 6.4342 MPa, from memory);
    # saturated liquid ~710 kg/m3 (brief); 1e-4 MPa and 1 kg/m3
    s = co2.saturation_at_temperature(298.15)
    assert s.pressure_pa / 1e6 == pytest.approx(6.4342, abs=1e-4)
    assert s.liquid_density_kg_m3 == pytest.approx(710.5, abs=1.0)


def test_common_practice_condensing_pressures():
    # common practice: CO2 condenses at about 35 bar at 0 degC and about 64 bar (~930 psi) at 25 degC
    assert co2.saturation_at_temperature(273.15).pressure_pa / 1e5 == pytest.approx(35, abs=0.5)
    p25 = co2.saturation_at_temperature(298.15).pressure_pa
    assert p25 / 1e5 == pytest.approx(64, abs=0.5)
    assert p25 / PSI == pytest.approx(930, abs=10)


def test_triple_point_densities():
    # Span & Wagner (1996) Table of the triple point (from memory): liquid 1178.5, vapour
    # 13.761 kg/m3; 0.1 and 0.005 kg/m3
    s = co2.saturation_at_temperature(co2.TRIPLE_TEMPERATURE_K)
    assert s.liquid_density_kg_m3 == pytest.approx(1178.5, abs=0.1)
    assert s.vapor_density_kg_m3 == pytest.approx(13.761, abs=0.005)


@pytest.mark.parametrize("t_c", [-50.0, -20.0, 0.0, 20.0, 30.0])
def test_saturation_by_pressure_inverts_by_temperature(t_c):
    s = co2.saturation_at_temperature(273.15 + t_c)
    assert co2.saturation_at_pressure(s.pressure_pa).temperature_k == pytest.approx(273.15 + t_c, abs=1e-6)


@pytest.mark.parametrize("t_k", [216.0, 200.0, 304.2, 350.0])
def test_saturation_refused_outside_triple_to_critical(t_k):
    with pytest.raises(InputError) as err:
        co2.saturation_at_temperature(t_k)
    assert ("no liquid" in str(err.value)) or ("no distinct liquid" in str(err.value))


@pytest.mark.parametrize("p_pa", [5e5, 1e5, 7.4e6, 2e7])
def test_saturation_by_pressure_refused_outside_range(p_pa):
    with pytest.raises(InputError):
        co2.saturation_at_pressure(p_pa)


# --- phase ---------------------------------------------------------------------------------------

@pytest.mark.parametrize(
    "p_pa, t_k, phase",
    [
        (101325.0, 293.15, "gas"),
        (6e6, 293.15, "liquid"),          # above p_sat(20 degC) = 5.729 MPa (NIST)
        (5e6, 293.15, "gas"),
        (10e6, 310.0, "supercritical"),
        (5e6, 310.0, "gas"),
        (101325.0, 190.0, "solid"),       # below the 1 atm sublimation point 194.67 K
        (101325.0, 200.0, "gas"),
        (300e6, 250.0, "solid"),          # above the melting line (182 MPa at 250 K, eq. 3.10)
        (5.7291e6, 293.15, "two-phase"),  # NIST WebBook p_sat(20 degC) 5.7291 MPa
    ],
)
def test_phase_at(p_pa, t_k, phase):
    assert co2.phase_at(p_pa, t_k) == phase


# --- vessels --------------------------------------------------------------------------------------

def test_common_practice_sphere_of_room_air_pressure_co2():
    # common practice: a 0.61 m (24 in) sphere holds about 118 L and about 0.22 kg of CO2 at
    # room conditions (20 degC, 1 atm); 1 L and 0.01 kg
    volume = math.pi / 6 * 0.61**3
    assert volume * 1000 == pytest.approx(118, abs=1.0)
    s = co2.vessel_by_pressure(volume, 101325.0, 293.15)
    assert s.co2_mass_kg == pytest.approx(0.22, abs=0.01)
    assert s.phase == "gas" and s.liquid_volume_fraction == 0.0


def test_common_practice_denser_than_air():
    # common practice: CO2 is about 1.5 times as dense as air at room conditions. Air from the
    # ideal gas with M = 28.9647 g/mol (U.S. Standard Atmosphere 1976); 0.05
    rho_air = 101325.0 * 0.0289647 / (8.314462618 * 293.15)
    assert co2.density_at(101325.0, 293.15) / rho_air == pytest.approx(1.5, abs=0.05)


def test_common_practice_liquid_volume_of_half_a_kilogram():
    # common practice: about 0.56 kg of liquid CO2 fills about 0.79 L at 25 degC (liquid ~710 kg/m3)
    s = co2.saturation_at_temperature(298.15)
    assert 0.56 / s.liquid_density_kg_m3 * 1000 == pytest.approx(0.79, abs=0.01)


def test_two_phase_vessel_at_0_c():
    # rho = 500 kg/m3 at 0 degC lies between the NIST saturated densities (927.6 / 97.65 kg/m3):
    # pressure is p_sat = 3.4851 MPa; liquid volume fraction (500 - 97.65) / (927.6 - 97.65)
    s = co2.vessel_by_mass(0.010, 5.0, 273.15)
    assert s.phase == "two-phase"
    assert s.pressure_pa / 1e6 == pytest.approx(3.4851, abs=1e-4)
    assert s.liquid_volume_fraction == pytest.approx((500 - 97.65) / (1 / 0.001078 - 97.65), rel=1e-3)
    # quality by the lever rule on specific volume
    x = (1 / 500 - 0.001078) / (0.010241 - 0.001078)
    assert s.vapor_quality == pytest.approx(x, rel=2e-3)
    assert s.fill_density_kg_l == pytest.approx(0.5)


def test_liquid_full_vessel_pressure_rises_steeply():
    # 0.75 kg/L at 25 degC exceeds the saturated liquid density (~710 kg/m3): liquid-full, above
    # p_sat, with the hydraulic-expansion warning. Its pressure climbs more than twice as fast per
    # kelvin as the saturation pressure does (about 1.5 bar/K at 25 degC, NIST table slope); at
    # 40 degC the same fill is supercritical and higher still
    s25 = co2.vessel_by_mass(0.010, 7.5, 298.15)
    s26 = co2.vessel_by_mass(0.010, 7.5, 299.15)
    assert s25.phase == "liquid" and s25.liquid_volume_fraction == 1.0
    assert s25.pressure_pa > co2.saturation_at_temperature(298.15).pressure_pa
    assert any("liquid-full" in w for w in s25.warnings)
    dp_sat = (co2.saturation_at_temperature(299.15).pressure_pa
              - co2.saturation_at_temperature(298.15).pressure_pa)
    assert s26.pressure_pa - s25.pressure_pa > 2 * dp_sat
    s40 = co2.vessel_by_mass(0.010, 7.5, 313.15)
    assert s40.phase == "supercritical" and s40.pressure_pa > s26.pressure_pa


def test_common_cylinder_fill_stays_two_phase_at_room_temperature():
    # 49 CFR 173.304a: 68 % filling density; at 20 degC such a cylinder holds liquid under vapour
    # at p_sat(20 degC) = 5.7291 MPa (NIST WebBook, via the same table source); 1e-4 MPa
    s = co2.vessel_by_mass(0.0134, 0.68 * 13.4, 293.15)
    assert s.phase == "two-phase"
    assert s.pressure_pa / 1e6 == pytest.approx(5.7291, abs=1e-3)


def test_vessel_by_pressure_refuses_saturation():
    p_sat = co2.saturation_at_temperature(293.15).pressure_pa
    with pytest.raises(InputError, match="ambiguous"):
        co2.vessel_by_pressure(0.01, p_sat, 293.15)


@pytest.mark.parametrize(
    "call",
    [
        lambda: co2.vessel_by_mass(-1.0, 1.0, 293.15),
        lambda: co2.vessel_by_mass(0.01, 0.0, 293.15),
        lambda: co2.vessel_by_mass(0.01, 1.0, 200.0),   # below the triple point
        lambda: co2.vessel_by_mass(0.001, 1.6, 250.0),  # 1600 kg/m3: would freeze
        lambda: co2.vessel_by_pressure(0.01, 300e6, 250.0),  # solid
        lambda: co2.vessel_by_pressure(0.01, 1e9, 300.0),    # beyond 800 MPa
    ],
)
def test_vessel_bad_inputs(call):
    with pytest.raises(InputError):
        call()


@given(
    t_k=st.floats(min_value=218.0, max_value=450.0),
    scale=st.floats(min_value=0.01, max_value=0.97),
    liquid=st.booleans(),
)
def test_vessel_round_trip_single_phase(t_k, scale, liquid):
    # property: vessel_by_mass then vessel_by_pressure returns the same mass in single-phase regions
    if t_k < co2.CRITICAL_TEMPERATURE_K - 0.5:
        sat = co2.saturation_at_temperature(t_k)
        if liquid:
            rho = sat.liquid_density_kg_m3 * (1.005 + 0.1 * scale)
        else:
            rho = sat.vapor_density_kg_m3 * scale
    else:
        assume(t_k > co2.CRITICAL_TEMPERATURE_K + 0.5)
        rho = 900.0 * scale
    volume = 0.02
    try:
        by_mass = co2.vessel_by_mass(volume, rho * volume, t_k)
    except InputError:
        assume(False)  # too dense: would freeze
    assume(by_mass.phase != "two-phase")
    back = co2.vessel_by_pressure(volume, by_mass.pressure_pa, t_k)
    assert back.co2_mass_kg == pytest.approx(by_mass.co2_mass_kg, rel=1e-6)
    assert back.phase == by_mass.phase

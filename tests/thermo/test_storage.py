"""Cylinder charge, hot-day pressure curve and buffer-to-cylinder transfer.

Sources used below:
* 49 CFR 173.304a: filling density of CO2 in high-pressure cylinders 68 % (0.68 kg per L of water
  capacity).
* NIST Chemistry WebBook saturation table for CO2 as tabulated by Ohio University ("Thermodynamic
  Properties of R744", data from the NIST WebBook, accessed March 2007): -20 degC 1.9696 MPa,
  v_f 0.000969 m3/kg; -10 degC 2.6487 MPa; 0 degC 3.4851 MPa, v_f 0.001078 m3/kg.
* Ideal-gas law (isothermal mixing of two gas volumes), valid for CO2 near 1-2 bar where Z > 0.99.
"""

from __future__ import annotations

import pytest

from co2routes.thermo.errors import InputError
from co2routes.thermo.storage import (
    FILLING_RATIO_KG_PER_L,
    check_charge,
    hot_day_curve,
    liquid_full_temperature_k,
    max_charge_kg,
    transfer_from_buffer,
)


def test_filling_ratio_is_the_cfr_figure():
    # 49 CFR 173.304a: 68 % filling density for CO2; 13.4 L water capacity -> 9.112 kg (exact).
    assert FILLING_RATIO_KG_PER_L == 0.68
    assert max_charge_kg(0.0134) == pytest.approx(9.112, rel=1e-12)


@pytest.mark.parametrize("v_f, t_k", [(0.001078, 273.15), (0.000969, 253.15)])
def test_liquid_full_where_saturated_liquid_density_equals_fill(v_f, t_k):
    # NIST WebBook saturated liquid specific volume (4 significant figures): a cylinder filled to
    # 1/v_f is liquid-full at that temperature. Tolerance 0.2 K (rounding of v_f).
    assert liquid_full_temperature_k(1.0 / v_f) == pytest.approx(t_k, abs=0.2)


def test_below_critical_density_never_goes_liquid_full():
    # Physical: below the critical density (467.6 kg/m3, Span & Wagner 1996) the liquid boils away.
    assert liquid_full_temperature_k(400.0) is None


def test_hot_day_curve_follows_nist_saturation_while_two_phase():
    # 9 kg in 13.4 L (0.672 kg/L): two-phase at -10 and 0 degC, so P = p_sat (NIST: 2.6487 and
    # 3.4851 MPa); tolerance 0.05 %.
    c = hot_day_curve(0.0134, 9.0)
    by_t = {round(p.temperature_k, 2): p for p in c.points}
    assert by_t[263.15].phase == "two-phase"
    assert by_t[263.15].pressure_pa == pytest.approx(2.6487e6, rel=5e-4)
    assert by_t[273.15].pressure_pa == pytest.approx(3.4851e6, rel=5e-4)
    assert c.points[-1].temperature_k == pytest.approx(328.15)  # 55 degC hot day
    pressures = [p.pressure_pa for p in c.points]
    assert pressures == sorted(pressures)  # physical: closed vessel, P rises with T


def test_hot_day_curve_marks_rated_and_relief():
    c = hot_day_curve(0.0134, 9.0, rated_pressure_pa=100e5, relief_pressure_pa=140e5)
    from co2routes.thermo.co2 import vessel_by_mass

    assert c.rated_reached_k is not None and c.relief_reached_k is not None
    # The crossing temperatures give back the marked pressures (tolerance 0.1 bar).
    assert vessel_by_mass(0.0134, 9.0, c.rated_reached_k).pressure_pa == pytest.approx(100e5, abs=1e4)
    assert vessel_by_mass(0.0134, 9.0, c.relief_reached_k).pressure_pa == pytest.approx(140e5, abs=1e4)
    assert any(p.above_relief for p in c.points)
    assert any("relief" in w for w in c.warnings)
    # Liquid-full comes before either: two-phase pressure never exceeds the critical 73.8 bar.
    assert c.liquid_full_temperature_k < c.rated_reached_k


def test_overfill_refused_unless_forced():
    with pytest.raises(InputError) as err:
        check_charge(0.0134, 10.0)
    assert err.value.field == "mass" and "49 CFR 173.304a" in str(err.value)
    warnings = check_charge(0.0134, 10.0, force=True)
    assert warnings and "burst" in warnings[0]
    assert check_charge(0.0134, 9.112) == ()


def test_transfer_matches_ideal_gas_mixing_at_low_pressure():
    # Ideal gas, isothermal: P_f = (P_b V_b + P_r V_r) / (V_b + V_r). At 2 bar CO2 has Z = 0.99, so
    # the real-gas answer agrees within 0.5 %. Mass is conserved exactly.
    r = transfer_from_buffer(0.1, 2e5, 293.15, 0.05)
    ideal = (2e5 * 0.1 + 101325.0 * 0.05) / 0.15
    assert r.final_pressure_pa == pytest.approx(ideal, rel=5e-3)
    assert r.buffer_final_kg + r.receiver_final_kg == pytest.approx(
        r.buffer_initial_kg + r.receiver_initial_kg, rel=1e-9)
    assert r.transferred_kg == pytest.approx(r.buffer_initial_kg - r.buffer_final_kg, rel=1e-9)


def test_iced_cylinder_condenses_at_nist_saturation_pressure():
    # Receiver in an ice bath at 0 degC, buffer at 25 degC and 50 bar: gas condenses in the
    # cylinder, the pressure holds at p_sat(0 degC) = 3.4851 MPa (NIST), tolerance 0.05 %.
    r = transfer_from_buffer(0.2, 50e5, 298.15, 0.0134, receiver_temperature_k=273.15)
    assert r.final_pressure_pa == pytest.approx(3.4851e6, rel=5e-4)
    assert r.receiver_phase == "two-phase"
    warm = transfer_from_buffer(0.2, 50e5, 298.15, 0.0134)
    assert r.transferred_kg > 5 * warm.transferred_kg  # the ice bath's whole point
    assert any("filling ratio" in w for w in r.warnings)  # this fill overshoots 0.68 kg/L


def test_transfer_refuses_no_pressure_difference():
    with pytest.raises(InputError):
        transfer_from_buffer(0.1, 101325.0, 293.15, 0.05, receiver_initial_pressure_pa=2e5)

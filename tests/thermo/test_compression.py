"""Staged compression and condensing of CO2, checked against outside sources.

Sources used below:
* NIST Chemistry WebBook, carbon dioxide (Span & Wagner 1996 equation, REFPROP 7), saturation
  table as tabulated by Ohio University, "Thermodynamic Properties of R744" (source of data: NIST
  Chemistry WebBook, accessed March 2007): at -20 degC 1.9696 MPa, h_g 436.89 kJ/kg; at 0 degC
  3.4851 MPa, h_f 200.00 kJ/kg, h_g 430.89 kJ/kg (IIR reference state, same as CoolProp's).
* NIST Chemistry WebBook: 25 degC saturation 6.4342 MPa; CO2 gas at 1 atm, 25 degC 1.808 kg/m3.
* The TRC ideal-gas heat capacity of CO2 carried in the `chemicals` library (Thermodynamics
  Research Center coefficients), for an ideal-gas isentropic compression at low pressure.
* Common practice: a receiver at 0 degC condenses CO2 at about 35 bar, at room temperature about
  64 bar; 150 degC discharge limit; about 4-6 pressure ratio per stage.
"""

from __future__ import annotations

import math

import pytest
from scipy.optimize import brentq

from co2routes.thermo.compression import (
    MAX_DISCHARGE_K,
    compress_stage,
    cooling_tradeoff,
    liquefy,
    mass_flow_kg_s,
    minimum_stages,
    stage_pressures,
)
from co2routes.thermo.errors import InputError

R = 8.314462618  # J/(mol K), CODATA 2018
M_CO2 = 0.0440095  # kg/mol, NIST WebBook


def test_condensing_pressure_matches_nist_webbook():
    # NIST WebBook saturation: 0 degC 3.4851 MPa, 25 degC 6.4342 MPa; tolerance 0.05 %.
    r0 = liquefy(101325.0, 298.15, 273.15)
    r25 = liquefy(101325.0, 298.15, 298.15)
    assert r0.condensing_pressure_pa == pytest.approx(3.4851e6, rel=5e-4)
    assert r25.condensing_pressure_pa == pytest.approx(6.4342e6, rel=5e-4)


def test_rule_of_thumb_ice_bath_halves_the_pressure():
    # Common practice: receiver at 0 degC -> about 35 bar; room temperature (25 degC) -> about
    # 64 bar. Tolerance 1 bar.
    rows = {round(r.condensing_temperature_k, 2): r for r in cooling_tradeoff(101325.0, 298.15)}
    assert rows[273.15].condensing_pressure_pa == pytest.approx(35e5, abs=1e5)
    assert rows[298.15].condensing_pressure_pa == pytest.approx(64e5, abs=1e5)
    # Colder receiver: less work per kg (physical consequence of the lower pressure).
    assert rows[273.15].work_j_per_kg < rows[298.15].work_j_per_kg


def test_tradeoff_pressure_and_work_rise_with_temperature():
    # Physical: saturation pressure rises monotonically to the critical point (NIST table
    # -20 degC 1.9696 MPa < 0 degC 3.4851 MPa < 25 degC 6.4342 MPa), and so does the work.
    rows = cooling_tradeoff(101325.0, 298.15, efficiency=1.0)
    p = [r.condensing_pressure_pa for r in rows]
    w = [r.work_j_per_kg for r in rows]
    assert p == sorted(p) and w == sorted(w)
    assert all(r.condensing_temperature_k < 304.1282 for r in rows)  # none above critical


def test_ideal_gas_isentropic_stage_at_low_pressure():
    # At 1 -> 2 atm CO2 is near-ideal (Z = 0.995). Independent ideal-gas model: TRC heat capacity
    # from `chemicals`, s(T2) - s(T1) = R ln(P2/P1), w = integral of Cp dT. Tolerance 1 % on work
    # (real-gas departure) and 1.5 K on the discharge temperature.
    from chemicals.heat_capacity import TRC_gas_data, TRCCp_integral, TRCCp_integral_over_T

    row = TRC_gas_data.loc["124-38-9"]
    c = [float(row[k]) for k in ("a0", "a1", "a2", "a3", "a4", "a5", "a6", "a7")]
    t1, p1, p2 = 298.15, 101325.0, 202650.0

    def ds(t2):
        return (TRCCp_integral_over_T(t2, *c) - TRCCp_integral_over_T(t1, *c)) - R * math.log(p2 / p1)

    t2 = brentq(ds, t1, 500.0)
    w_ideal = (TRCCp_integral(t2, *c) - TRCCp_integral(t1, *c)) / M_CO2
    st = compress_stage(1, p1, t1, p2, 1.0, cooled_temperature_k=t1)
    assert st.isentropic_work_j_per_kg == pytest.approx(w_ideal, rel=0.01)
    assert st.isentropic_discharge_temperature_k == pytest.approx(t2, abs=1.5)


def test_efficiency_scales_work_and_heats_the_discharge():
    # Definition of isentropic efficiency (Cengel & Boles): w = w_s / eta. Exact to rounding.
    ideal = compress_stage(1, 101325.0, 298.15, 4e5, 1.0, cooled_temperature_k=298.15)
    real = compress_stage(1, 101325.0, 298.15, 4e5, 0.7, cooled_temperature_k=298.15)
    assert real.work_j_per_kg == pytest.approx(ideal.work_j_per_kg / 0.7, rel=1e-12)
    assert real.discharge_temperature_k > ideal.discharge_temperature_k
    assert ideal.discharge_temperature_k == pytest.approx(ideal.isentropic_discharge_temperature_k,
                                                          abs=0.01)


@pytest.mark.parametrize("eta", [1.0, 0.75, 0.5])
def test_energy_balance_closes_for_each_stage(eta):
    # First law, steady flow, each stage: h_in + w = q + h_out (residual below 1 mJ/kg), and
    # the stages chain: each stage's suction is the previous cooler's outlet.
    r = liquefy(101325.0, 298.15, 273.15, stages=3, efficiency=eta)
    for s in r.stages:
        assert abs(s.energy_balance_residual_j_per_kg) < 1e-3 * max(1.0, s.work_j_per_kg)
    for a, b in zip(r.stages, r.stages[1:]):
        assert b.suction_pressure_pa == pytest.approx(a.discharge_pressure_pa, rel=1e-12)
        assert b.suction_temperature_k == pytest.approx(a.cooled_temperature_k, abs=1e-9)
    assert r.stages[-1].cooler == "condenser"
    assert r.heat_rejected_j_per_kg == pytest.approx(
        r.intercooler_heat_j_per_kg + r.condenser_heat_j_per_kg, rel=1e-12)


def test_overall_energy_balance_against_nist_enthalpies():
    # NIST WebBook (IIR reference): saturated vapour at -20 degC, 1.9696 MPa, h_g = 436.89 kJ/kg;
    # saturated liquid at 0 degC, h_f = 200.00 kJ/kg. Inlet is 0.1 K above the dew point (Cp of
    # the vapour about 1.9 kJ/(kg K): +0.2 kJ/kg at most). W - Q = h_f - h_in, tolerance 0.5 kJ/kg.
    r = liquefy(1.9696e6, 253.25, 273.15, stages=1, efficiency=0.8)
    assert (r.work_j_per_kg - r.heat_rejected_j_per_kg) / 1e3 == pytest.approx(200.00 - 436.89,
                                                                              abs=0.5)


def test_condenser_heat_includes_latent_heat():
    # NIST WebBook: h_fg at 0 degC = 230.89 kJ/kg; the condenser must take at least that
    # (desuperheat + condense). Physical bound.
    r = liquefy(101325.0, 298.15, 273.15)
    assert r.condenser_heat_j_per_kg > 230.89e3


def test_suction_density_and_batch_time_use_nist_density():
    # NIST WebBook: CO2 at 1 atm, 25 degC, 1.808 kg/m3 (tolerance 0.1 %). 50 L/min displacement,
    # volumetric efficiency 0.8, 10 kg batch: t = m / (V eta_v rho), computed by hand.
    r = liquefy(101325.0, 298.15, 273.15, displacement_m3_s=50e-3 / 60, volumetric_efficiency=0.8,
                mass_kg=10.0)
    assert r.stages[0].suction_density_kg_m3 == pytest.approx(1.808, rel=1e-3)
    expected_s = 10.0 / (50e-3 / 60 * 0.8 * 1.808)
    assert r.batch_time_s == pytest.approx(expected_s, rel=1e-3)
    assert r.mass_flow_kg_s == pytest.approx(mass_flow_kg_s(50e-3 / 60, 0.8, 1.808), rel=1e-3)


def test_no_displacement_no_time():
    r = liquefy(101325.0, 298.15, 273.15)
    assert r.batch_time_s is None and r.mass_flow_kg_s is None


def test_stage_pressures_equal_ratio():
    # Equal ratios: r = (P_out/P_in)^(1/N); arithmetic check.
    p = stage_pressures(1e5, 64e5, 3)
    assert p[0] == pytest.approx(4e5) and p[1] == pytest.approx(16e5) and p[2] == 64e5
    assert minimum_stages(1e5, 36e5) == 2 and minimum_stages(1e5, 37e5) == 3


def test_hot_discharge_warns_at_oil_limit():
    # 2 stages from 1 atm to 34.9 bar at eta 0.7: ratio 5.9, discharge above 150 degC (common
    # practice limit) -> a warning naming the limit.
    r = liquefy(101325.0, 298.15, 273.15, stages=2, efficiency=0.7)
    assert r.discharge_temperature_k > MAX_DISCHARGE_K
    assert any("150 degC" in w for w in r.warnings)


def test_automatic_stages_keep_discharge_under_the_limit():
    r = liquefy(101325.0, 298.15, 298.15, efficiency=0.7)
    assert r.discharge_temperature_k <= MAX_DISCHARGE_K
    assert all(s.pressure_ratio <= 6.0 for s in r.stages)


@pytest.mark.parametrize("kwargs, field", [
    (dict(condensing_temperature_k=305.15), "condensing temperature"),   # above 31.0 degC
    (dict(condensing_temperature_k=210.0), "condensing temperature"),    # below triple point
    (dict(stages=1), "stages"),                                          # ratio 34 > 6
    (dict(efficiency=0.0), "efficiency"),
    (dict(efficiency=1.2), "efficiency"),
    (dict(inlet_pressure_pa=40e5), "inlet pressure"),                    # above p_sat(0 degC)
    (dict(inlet_pressure_pa=30e5, inlet_temperature_k=263.15), "inlet temperature"),  # liquid
])
def test_bad_input_is_refused(kwargs, field):
    args = dict(inlet_pressure_pa=101325.0, inlet_temperature_k=298.15,
                condensing_temperature_k=273.15)
    args.update(kwargs)
    with pytest.raises(InputError) as err:
        liquefy(**args)
    assert err.value.field == field
    assert "\n" not in str(err.value)


def test_above_critical_message_explains():
    with pytest.raises(InputError, match="critical temperature of CO2, 31.0 degC"):
        liquefy(101325.0, 298.15, 308.15)

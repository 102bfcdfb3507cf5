"""``co2routes liquefy`` through ``co2routes.tui.cli.main``.

Sources: NIST Chemistry WebBook saturation pressures of CO2 (0 degC 3.4851 MPa, 25 degC 6.4342 MPa;
Span & Wagner 1996); NIST WebBook density of CO2 gas at 1 atm, 25 degC, 1.808 kg/m3; common
practice: receiver at 0 degC about 35 bar against about 64 bar at room temperature.
"""

from __future__ import annotations

import pytest

from co2routes.thermo import cautions
from clihelp import run_json
from co2routes.tui.cli import COMMANDS, main

BASE = ["liquefy", "--inlet-pressure", "1 atm", "--inlet-temperature", "25 degC"]


def test_registered():
    assert "liquefy" in COMMANDS


def test_liquefy_keys_and_values(capsys):
    a = run_json(capsys, *BASE, "--condensing-temperature", "0 degC", "--displacement", "50 L/min",
                 "--volumetric-efficiency", "80 %", "--mass", "10 kg")
    for key in ("condensing_pressure_pa", "stages", "work_kj_per_kg", "discharge_temperature_k",
                "heat_rejected_kj_per_kg", "time_h", "per_stage", "cooling_tradeoff", "warnings",
                "cautions"):
        assert key in a
    # NIST WebBook: 3.4851 MPa at 0 degC; tolerance 0.05 %.
    assert a["condensing_pressure_pa"] == pytest.approx(3.4851e6, rel=5e-4)
    assert a["stages"] == len(a["per_stage"])
    assert a["discharge_temperature_k"] == max(s["discharge_temperature_k"] for s in a["per_stage"])
    # Batch time by hand with the NIST density 1.808 kg/m3: 10 / (50e-3/60 x 0.8 x 1.808) s.
    assert a["time_h"] == pytest.approx(10.0 / (50e-3 / 60 * 0.8 * 1.808) / 3600, rel=1e-3)
    # Energy balance per stage closes (first law), residual below 1e-6 kJ/kg.
    assert all(abs(s["energy_balance_residual_kj_per_kg"]) < 1e-6 for s in a["per_stage"])
    assert a["work_kj_per_kg"] == pytest.approx(sum(s["work_kj_per_kg"] for s in a["per_stage"]))
    assert cautions.PRESSURE in a["cautions"] and cautions.COMPRESSOR_HEAT in a["cautions"]


def test_cooling_tradeoff_shows_ice_bath_rule_of_thumb(capsys):
    # Common practice: 0 degC receiver about 35 bar; 25 degC about 64 bar (NIST 6.4342 MPa).
    a = run_json(capsys, *BASE, "--condensing-temperature", "25 degC")
    rows = {round(r["condensing_temperature_k"], 2): r for r in a["cooling_tradeoff"]}
    assert rows[273.15]["condensing_pressure_pa"] == pytest.approx(35e5, abs=1e5)
    assert rows[298.15]["condensing_pressure_pa"] == pytest.approx(6.4342e6, rel=5e-4)
    assert rows[273.15]["work_kj_per_kg"] < rows[298.15]["work_kj_per_kg"]


def test_time_needs_displacement(capsys):
    a = run_json(capsys, *BASE, "--condensing-temperature", "0 degC", "--mass", "2 kg")
    assert a["time_h"] is None
    assert any("--displacement" in w for w in a["warnings"])


def test_hot_discharge_warning(capsys):
    a = run_json(capsys, *BASE, "--condensing-temperature", "0 degC", "--stages", "2")
    assert a["discharge_temperature_k"] > 423.15
    assert any("150 degC" in w for w in a["warnings"])


def test_table_output(capsys):
    assert main([*BASE, "--condensing-temperature", "0 degC"]) == 0
    out = capsys.readouterr().out
    assert "condensing pressure" in out and "bar" in out and "cooling tradeoff" in out


@pytest.mark.parametrize("extra, option", [
    (["--condensing-temperature", "35 degC"], "--condensing-temperature"),   # above critical
    (["--condensing-temperature", "-60 degC"], "--condensing-temperature"),  # below triple point
    (["--condensing-temperature", "0 degC", "--intercool-temperature", "500 degC"],
     "--intercool-temperature"),                                             # a cooler cannot heat
    (["--condensing-temperature", "0 degC", "--stages", "two"], "--stages"),
    (["--condensing-temperature", "0 degC", "--efficiency", "0"], "--efficiency"),
    (["--condensing-temperature", "0 degC", "--efficiency", "120 %"], "--efficiency"),
    (["--condensing-temperature", "0 degC", "--volumetric-efficiency", "1.5",
      "--displacement", "10 L/min"], "--volumetric-efficiency"),
    (["--condensing-temperature", "0 degC", "--displacement", "10 kg"], "--displacement"),
    (["--condensing-temperature", "0 degC", "--co2-fraction", "0 %"], "--co2-fraction"),
    (["--condensing-temperature", "0 degC", "--co2-fraction", "120 %"], "--co2-fraction"),
    # gas stripped from water, under 1 % CO2: no pressure condenses it whole
    (["--condensing-temperature", "0 degC", "--co2-fraction", "0.8 %"], "--co2-fraction"),
])
def test_bad_input_one_line_exit_2(capsys, extra, option):
    code = main([*BASE, *extra, "--json"])
    err = capsys.readouterr().err
    assert code == 2
    assert option in err and err.count("\n") == 1


def test_above_critical_explains(capsys):
    assert main([*BASE, "--condensing-temperature", "32 degC"]) == 2
    err = capsys.readouterr().err
    assert "critical temperature" in err and "31.0 degC" in err


def test_one_stage_is_answered_with_its_discharge_temperature(capsys):
    # A question about a state, not a plan: one stage from 1 atm to 34.9 bar (ratio 34) is
    # computed and warned about. Ideal-gas estimate of its discharge at eta 0.7 with gamma 1.22-1.29
    # (NIST WebBook cp of CO2 at 300-700 K): T2 = T1 + T1 (r^((g-1)/g) - 1) / eta = 660-800 K.
    a = run_json(capsys, *BASE, "--condensing-temperature", "0 degC", "--stages", "1")
    assert a["stages"] == 1
    assert 640.0 < a["discharge_temperature_k"] < 820.0
    assert any("ratio of 34" in w and "discharge would reach" in w for w in a["warnings"])


def test_intercooler_above_the_inlet_is_warned(capsys):
    a = run_json(capsys, *BASE, "--condensing-temperature", "0 degC", "--intercool-temperature", "40 degC")
    assert any("warmer than the gas drawn in" in w for w in a["warnings"])


def test_gas_with_air_condenses_at_its_bubble_pressure(capsys):
    """GERG-2008 (Kunz & Wagner 2012, through CoolProp): 98 % CO2 + 2 % N2 at 0 degC boils at
    45.8 bar, against 34.85 bar for pure CO2; the model (Peng-Robinson) within 4 %."""
    pure = run_json(capsys, *BASE, "--condensing-temperature", "0 degC")
    mixed = run_json(capsys, *BASE, "--condensing-temperature", "0 degC", "--co2-fraction", "98 %")
    assert mixed["co2_fraction"] == pytest.approx(0.98)
    assert mixed["condensing_pressure_pa"] == pytest.approx(45.79e5, rel=0.04)
    assert mixed["work_kj_per_kg"] > pure["work_kj_per_kg"]
    assert any("bubble pressure" in w for w in mixed["warnings"])
    assert all(abs(s["energy_balance_residual_kj_per_kg"]) < 1e-6 for s in mixed["per_stage"])

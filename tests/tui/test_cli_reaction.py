"""The reaction and calcination verbs through co2routes.tui.cli.main."""

from __future__ import annotations

import pytest

from clihelp import run_json
from co2routes.tui.cli import main

NAHCO3_HCL = "NaHCO3(s) + HCl(aq) -> NaCl(aq) + H2O(l) + CO2(g)"


def test_reaction_json(capsys):
    answer = run_json(capsys, "reaction", NAHCO3_HCL, "--temperature", "25 degC")
    assert set(answer) >= {"equation", "temperature_k", "delta_h_kj_per_mol",
                           "delta_h_kj_per_kg_co2", "balanced", "heat_in_words", "warnings",
                           "cautions"}
    # NBS (Wagman 1982) values, docs/references.md: +31.4 kJ/mol, endothermic.
    assert answer["delta_h_kj_per_mol"] == pytest.approx(31.4, abs=0.1)
    assert answer["delta_h_kj_per_kg_co2"] == pytest.approx(31.36 / 0.044009, rel=2e-3)
    assert answer["temperature_k"] == pytest.approx(298.15)
    assert answer["balanced"] is True
    assert "cools" in answer["heat_in_words"]
    assert answer["cautions"]


def test_reaction_exothermic_wording_and_no_co2(capsys):
    answer = run_json(capsys, "reaction", "HCl(g) = HCl(aq)")
    assert answer["delta_h_kj_per_kg_co2"] is None
    assert "warms" in answer["heat_in_words"]


def test_reaction_table_output(capsys):
    assert main(["reaction", "CaCO3(s) -> CaO(s) + CO2(g)"]) == 0
    out = capsys.readouterr().out
    assert "takes heat in" in out and "kJ/mol" in out


@pytest.mark.parametrize("argv, part", [
    (["reaction", "NaHCO3(s) + HCl(aq) -> NaCl(aq) + CO2(g)"], "does not balance"),
    (["reaction", "NaHCO3(s) + Acid(aq) -> CO2(g)"], "Acid(aq)"),
    (["reaction", NAHCO3_HCL, "--temperature", "25"], "--temperature"),
    (["reaction", NAHCO3_HCL, "--temperature", "3 bar"], "--temperature"),
    (["reaction", NAHCO3_HCL, "--temperature", "150 degC"], "temperature"),
    (["calcination", "--temperature", "2000 degC"], "--temperature"),
    (["calcination", "--co2-pressure", "50 bar"], "--co2-pressure"),
    (["calcination", "--co2-pressure", "1 kg"], "--co2-pressure"),
])
def test_bad_input_is_one_line_and_exit_2(capsys, argv, part):
    assert main(argv) == 2
    err = capsys.readouterr().err
    assert part in err
    assert err.count("\n") == 1


def test_calcination_by_temperature(capsys):
    answer = run_json(capsys, "calcination", "--temperature", "900 degC")
    assert answer["temperature_k"] == pytest.approx(1173.15)
    # Baker (1962): dG = 38,000 - 32.4 T cal/mol gives 1.004 atm at 1173.15 K; within 12 %.
    assert answer["co2_pressure_pa"] == pytest.approx(1.004 * 101325, rel=0.12)
    assert any("900 degC" in c for c in answer["cautions"])  # hot surface
    assert any("lime" in c for c in answer["cautions"])       # lime dust


def test_calcination_by_pressure(capsys):
    answer = run_json(capsys, "calcination", "--co2-pressure", "1 atm")
    # Baker (1962): 1 atm at 1172.8 K; tolerance 8 K.
    assert answer["temperature_k"] == pytest.approx(1172.8, abs=8)
    assert answer["co2_pressure_pa"] == pytest.approx(101325, rel=1e-6)


def test_calcination_above_one_atmosphere_carries_the_pressure_caution(capsys):
    from co2routes.thermo import cautions

    assert cautions.PRESSURE not in run_json(capsys, "calcination", "--co2-pressure", "0.5 atm")["cautions"]
    assert cautions.PRESSURE in run_json(capsys, "calcination", "--co2-pressure", "1.5 atm")["cautions"]


@pytest.mark.parametrize("argv", [
    ["calcination"],
    ["calcination", "--temperature", "900 degC", "--co2-pressure", "1 atm"],
])
def test_calcination_needs_exactly_one_option(capsys, argv):
    with pytest.raises(SystemExit) as ex:
        main(argv)
    assert ex.value.code == 2

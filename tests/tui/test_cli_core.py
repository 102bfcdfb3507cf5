"""The command line's frame: one-line errors with status 2, negative values, light start-up."""

import json
import subprocess
import sys

import pytest

from co2routes.tui.cli import COMMANDS, main


def test_every_verb_has_help_and_is_listed(capsys):
    with pytest.raises(SystemExit) as exc:
        main(["--help"])
    assert exc.value.code == 0
    out = capsys.readouterr().out
    for verb in COMMANDS:
        assert verb in out


def test_negative_values_are_values_not_options(capsys):
    assert main(["saturation", "--temperature", "-20degC", "--json"]) == 0
    answer = json.loads(capsys.readouterr().out)
    # NIST Chemistry WebBook (Span & Wagner 1996): CO2 saturation at -20 degC is 1.9696 MPa
    assert answer["pressure_pa"] == pytest.approx(1.9696e6, rel=1e-3)


@pytest.mark.parametrize("argv, field", [
    (["store", "--volume", "-3 L", "--pressure", "1 atm", "--temperature", "20 degC"], "--volume"),
    (["batch", "acid-carbonate", "--co2", "-1kg"], "--co2"),
    (["compare", "--weight", "colour=2"], "--weight"),
    (["saturation", "--temperature", "20"], "--temperature"),
])
def test_bad_input_is_one_line_and_status_2(argv, field, capsys):
    assert main(argv) == 2
    err = capsys.readouterr().err
    assert err.count("\n") == 1 and field in err and "Traceback" not in err


def test_unknown_option_is_one_line_and_status_2(capsys):
    with pytest.raises(SystemExit) as exc:
        main(["saturation", "--colour", "red"])
    assert exc.value.code == 2
    assert capsys.readouterr().err.count("\n") == 1


def test_help_does_not_import_the_heavy_libraries():
    code = ("import sys; from co2routes.tui.cli import build_parser; build_parser(); "
            "print(sorted(m for m in ('CoolProp', 'cantera', 'pint', 'textual') if m in sys.modules))")
    out = subprocess.run([sys.executable, "-c", code], capture_output=True, text=True, check=True).stdout
    assert out.strip() == "[]"


def test_batch_csv_rows_match_the_json_recipe(capsys):
    import csv
    import io

    assert main(["batch", "fermentation", "--json"]) == 0
    recipe = json.loads(capsys.readouterr().out)
    assert main(["batch", "fermentation", "--csv"]) == 0
    rows = list(csv.DictReader(io.StringIO(capsys.readouterr().out)))
    reagents = [r for r in rows if r["section"] == "reagent"]
    assert [r["name"] for r in reagents] == [g["name"] for g in recipe["reagents"]]
    assert float(rows[-1]["cost"]) == pytest.approx(recipe["cost_per_kg"], rel=1e-12)


def test_demand_error_names_both_forms(tmp_path, capsys):
    path = tmp_path / "s.toml"
    path.write_text('demand = "3 L"\n')
    assert main(["compare", str(path)]) == 2
    err = capsys.readouterr().err
    assert "line 1: demand" in err and "'3 kg'" in err and "kg/day" in err

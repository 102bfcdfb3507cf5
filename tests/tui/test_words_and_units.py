"""Values shown as typed and words a new user reads: what-if ranges in the unit typed, errors
echoing the text typed, one heat unit on both faces, plain labels, shared warnings said once."""

from __future__ import annotations

from co2routes.sources.registry import catalogue
from co2routes.sources.scenario import demo
from co2routes.tui.cli import main
from co2routes.tui.typed import as_typed, typed_units


def test_what_if_inputs_keep_the_unit_they_were_typed_in():
    units = typed_units(demo(), catalogue().routes,
                        ["options.fermentation.sugar_concentration", "prices.sucrose", "site.temperature"])
    assert units["options.fermentation.sugar_concentration"] == "g/L"  # the option's default "200 g/L"
    assert units["site.temperature"] == "degC" and units["prices.sucrose"] == "kg"
    # 150 kg/m3 is 150 g/L exactly (1 g/L = 1 kg/m3 by definition of the units)
    assert as_typed(150.0, "kg/m3", "g/L") == "150 g/L"
    # a price typed per cubic metre stays per cubic metre
    assert as_typed(2.25, "per m3", "m**3") == "2.25 per m**3"


def test_sensitivity_text_echoes_typed_units_and_says_shared_warnings_once(capsys):
    assert main(["sensitivity", "--route", "fermentation", "--route", "breath"]) == 0
    out = capsys.readouterr().out
    assert "150 g/L .. 250 g/L" in out and "kg/m3" not in out
    shared = [line for line in out.splitlines() if "isotherm is used outside its fitted range" in line]
    assert len(shared) == 1 and shared[0].startswith("WARNING [fermentation, breath]")


def test_store_error_echoes_the_pressure_as_typed(capsys):
    code = main(["store", "--volume", "13.4 L", "--pressure", "57.29 bar", "--temperature", "20 degC"])
    err = capsys.readouterr().err
    assert code == 2 and "'57.29 bar'" in err and "5729000" not in err


def test_heat_column_is_per_kg_of_end_product_on_the_command_line(capsys):
    assert main(["compare"]) == 0
    out = capsys.readouterr().out
    assert "heat kJ/kg" in out and "every per-kg figure is per kg of gas" in out
    assert "heat kJ " not in out


def test_dryer_names_its_currency(capsys):
    assert main(["dryer", "--flow", "1 kg/day", "--inlet-temperature", "20 degC", "--desiccant", "silica-gel",
                 "--cycle", "7 day", "--relative-humidity", "100 %", "--target-dew-point", "-40 degC"]) == 0
    out = capsys.readouterr().out
    assert "no currency" not in out and "in EUR" in out

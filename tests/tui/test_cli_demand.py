"""``co2routes demand USE``: JSON with SI keys, one-line errors for impossible inputs, the cold box
against ``snow``'s box figures, and ``compare`` on a scenario whose demand comes from a use."""

from __future__ import annotations

import pytest

from co2routes.tui.cli import main
from test_cli_store_snow_more import fails, run_json  # the same JSON and one-line-error helpers


HOUSE = ["demand", "greenhouse", "--floor-area", "150 m**2", "--mean-height", "3 m"]


def test_each_use_prints_si_keys(capsys):
    for argv in (HOUSE,
                 ["demand", "fermentation", "--volume", "200 L", "--original-gravity", "1.052",
                  "--final-gravity", "1.012"],
                 ["demand", "carbonation", "--volume", "60 L", "--target", "5.2 g/L", "--method", "in-line"],
                 ["demand", "cold-box", "--box-area", "0.8 m**2", "--wall-thickness", "5 cm", "--hold-time", "2 day"]):
        a = run_json(capsys, *argv)
        assert a["demand_kg_per_day"] > 0 and "peak_kg_per_h" in a
        assert a["sources"] and a["cautions"] and isinstance(a["warnings"], list)
    a = run_json(capsys, *HOUSE)
    assert a["peak_kg_per_h"] >= a["supply_closed_kg_per_h"] > 0


@pytest.mark.parametrize("argv, option", [
    ([*HOUSE, "--target-co2", "300 ppmv"], "--target-co2"),
    (["demand", "fermentation", "--volume", "20 L", "--original-gravity", "1.040", "--final-gravity", "1.050"],
     "--final-gravity"),
    (["demand", "cold-box", "--box-area", "1 m**2", "--box-u", "0.5 W/m**2/K", "--hold-time", "1 day",
      "--outside-temperature", "-85 degC"], "--outside-temperature"),
    (["demand", "cold-box", "--load-mass", "4 kg", "--load-start-temperature", "5 degC",
      "--load-end-temperature", "20 degC"], "--load-end-temperature"),
    (["demand", "greenhouse", "--floor-area", "150 m**2"], "--volume"),
    (["demand", "carbonation", "--volume", "20 L", "--target", "lots"], "--target"),
])
def test_impossible_inputs_are_one_line(capsys, argv, option):
    assert option in fails(capsys, *argv)


def test_cold_box_matches_snows_box(capsys):
    box = ["--box-area", "1.3 m**2", "--box-u", "0.55 W/m**2/K"]
    snow = run_json(capsys, "snow", "--liquid-temperature", "15 degC", *box, "--ambient-temperature", "27 degC")
    use = run_json(capsys, "demand", "cold-box", *box, "--outside-temperature", "27 degC", "--hold-time", "1 day")
    # same heat leak and daily loss (both dryice.storage_loss: U A (T - 194.686 K) / 573.3 kJ/kg), exactly
    assert use["storage_heat_leak_w"] == pytest.approx(snow["storage_heat_leak_w"], rel=1e-12)
    assert use["storage_loss_kg_per_day"] == pytest.approx(snow["storage_loss_kg_per_day"], rel=1e-12)
    assert use["box_dry_ice_kg"] == pytest.approx(snow["storage_loss_kg_per_day"], rel=1e-12)


def test_compare_runs_from_a_use(capsys, tmp_path):
    path = tmp_path / "house.toml"
    path.write_text('name = "invented tunnel"\n[use]\nkind = "greenhouse"\nfloor_area = "90 m**2"\n'
                    'mean_height = "2.5 m"\n', encoding="utf-8")
    a = run_json(capsys, "compare", str(path))
    assert "greenhouse" in a["demand_from"] and a["demand_kg_per_day"] > 0
    assert main(["compare", str(path)]) == 0
    assert capsys.readouterr().out.startswith("demand from the greenhouse use")


def test_table_shows_the_demand_first(capsys):
    assert main(HOUSE) == 0
    out = capsys.readouterr().out
    assert "kg/day" in out.splitlines()[0] and "balance:" in out and "caution:" in out

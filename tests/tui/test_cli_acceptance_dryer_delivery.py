"""``compare`` and ``batch`` show each route's dryer and, for a liquid or dry-ice end product, its
delivery; the what-if commands say what the cost is per kg of; small command-line fixes.

Sources named beside the asserts: NIST Chemistry WebBook saturation pressure of CO2 at 0 degC,
3.4851 MPa (Span & Wagner 1996); 49 CFR 173.304a (0.68 kg/L filling density); geometry and mass
balances worked by hand.
"""

from __future__ import annotations

import csv
import io
import math

import pytest

from clihelp import run_json
from co2routes.tui.cli import main

NIST_P_SAT_0C = 3.4851e6  # Pa, NIST WebBook CO2 saturation at 273.15 K
DRYER_KEYS = {"desiccant", "bed_mass_kg", "bed_volume_l", "bed_diameter_m", "bed_length_m",
              "water_load_kg_per_cycle", "pressure_drop_pa", "breakthrough_h", "outlet_ppmv",
              "outlet_dew_point_k", "reaches_target", "regeneration_heat_kj", "target_ppmv"}
DELIVERY_KEYS = {"end_product", "product_kg", "raw_co2_kg", "raw_co2_kg_per_kg",
                 "condensing_temperature_k", "condensing_pressure_pa", "stages", "work_kj_per_kg",
                 "discharge_temperature_k", "heat_rejected_kj_per_kg", "electricity_kwh", "time_h",
                 "solid_fraction", "cannot_condense"}


@pytest.fixture(scope="module")
def fair(tmp_path_factory):
    path = tmp_path_factory.mktemp("fair") / "fair.toml"
    assert main(["demo", "--which", "science-fair", str(path)]) == 0
    return str(path)


def run_text(capsys, *argv):
    code = main(list(argv))
    captured = capsys.readouterr()
    assert code == 0, captured.err
    return captured.out


def test_compare_json_has_a_dryer_per_made_route(capsys):
    answer = run_json(capsys, "compare")
    for route in answer["routes"]:
        assert "dryer" in route and "delivery" in route and route["delivery"] is None  # gas demo
        bed = route["dryer"]
        if route["delivers"] != "raw-gas":
            assert bed is None
            continue
        assert set(bed) == DRYER_KEYS
        # a cylinder of the bed's diameter and length (by hand), 1e-9
        assert bed["bed_volume_l"] == pytest.approx(
            math.pi / 4 * bed["bed_diameter_m"] ** 2 * bed["bed_length_m"] * 1000.0, rel=1e-9)
        assert bed["bed_mass_kg"] > 0 and bed["breakthrough_h"] > 0
        assert route["product_kg"] == pytest.approx(route["co2_kg"])  # gas: the CO2 is the product


def test_compare_json_for_dry_ice_carries_the_delivery(capsys, fair):
    answer = run_json(capsys, "compare", fair)
    assert answer["end_product"] == "dry-ice"
    for route in answer["routes"]:
        d = route["delivery"]
        assert set(d) == DELIVERY_KEYS and d["end_product"] == "dry-ice"
        assert route["product_kg"] == d["product_kg"] == 3.0
        if route["delivers"] != "raw-gas":
            assert d["stages"] is None and d["condensing_pressure_pa"] is None
            continue
        assert d["condensing_pressure_pa"] == pytest.approx(NIST_P_SAT_0C, rel=5e-4)  # NIST 0 degC
        assert d["stages"] == 3 and d["work_kj_per_kg"] > 0
        # raw CO2 per kg of dry ice is one over the flash's solid fraction, times what is made
        # over what is used (the box loss while held; hand calculation U A dT t / 573.3 kJ/kg,
        # Giauque & Egan 1937): mass balance, 1e-9
        made = 3.0 + 0.5 * 0.6 * (293.15 - 194.686) * 12 * 3600 / 573.3e3
        assert d["raw_co2_kg_per_kg"] == pytest.approx(made / 3.0 / d["solid_fraction"], rel=1e-9)
        assert route["co2_kg"] == pytest.approx(3.0 * d["raw_co2_kg_per_kg"], rel=1e-9)
        # 60 L/min displacement given in the demo: the compressor's time is known
        assert d["time_h"] is not None and route["time_h"] >= d["time_h"]


def test_compare_table_markdown_and_csv_show_the_bed_per_route(capsys, fair):
    text = run_text(capsys, "compare", fair)
    assert "dryer per route:" in text and "per kg of dry ice" in text
    ids = [r["id"] for r in run_json(capsys, "compare", fair)["routes"]]
    block = text.split("dryer per route:")[1]
    for rid in ids:
        assert rid in block
    assert "no dryer" in block and "molecular-sieve-3a" in block and "bought as dry ice" in block
    markdown = run_text(capsys, "compare", fair, "--markdown")
    assert "## Dryer and delivery per route" in markdown
    assert "condensed at 34.9 bar (0 °C)" in markdown  # NIST 3.4851 MPa at 0 degC, to 0.1 bar
    rows = list(csv.DictReader(io.StringIO(run_text(capsys, "compare", fair, "--csv"))))
    assert {"dryer_bed_mass_kg", "dryer_breakthrough_h", "delivery_raw_co2_kg_per_kg",
            "delivery_condensing_pressure_pa"} <= set(rows[0])
    purchase = next(r for r in rows if r["id"] == "purchase")
    assert purchase["dryer_bed_mass_kg"] == ""  # no bed: an empty cell, never 0


def test_batch_shows_the_dryer_and_the_delivery(capsys, fair):
    answer = run_json(capsys, "batch", "fermentation", fair)
    assert answer["end_product"] == "dry-ice" and answer["product_kg"] == 3.0
    assert set(answer["dryer"]) == DRYER_KEYS and set(answer["delivery"]) == DELIVERY_KEYS
    assert answer["running_per_kg"] == pytest.approx(
        sum(c["cost"] for c in answer["costs"]) / 3.0, rel=1e-12)  # per kg of dry ice
    # and the cost ranked on: running plus owning (co2routes.sources.equipment), by hand
    assert answer["cost_per_kg"] == pytest.approx(answer["running_per_kg"] + answer["capital_per_kg"], rel=1e-12)
    table = run_text(capsys, "batch", "fermentation", fair)
    assert "\ndryer:\n" in table and "\ndelivery:\n" in table and "bed mass" in table
    assert "34.85 bar" in table  # NIST 3.4851 MPa at 0 degC
    markdown = run_text(capsys, "batch", "fermentation", fair, "--markdown")
    assert "## Dryer" in markdown and "## Delivery" in markdown
    assert "Makes 3.000 kg of dry ice" in markdown and "Per kg dry ice:" in markdown
    gas = run_text(capsys, "batch", "purchase", "--markdown")
    assert "Per kg CO2:" in gas and "no dryer" in gas


def test_small_pressure_drops_read_in_pascal(capsys):
    text = run_text(capsys, "dryer", "--flow", "2 kg/day", "--inlet-temperature", "25 degC",
                    "--desiccant", "molecular-sieve-3a", "--cycle", "8 h")
    line = next(x for x in text.splitlines() if x.startswith("pressure drop"))
    assert " Pa (" in line and "bar" not in line


def test_whatif_commands_say_what_the_cost_is_per_kg_of(capsys, fair):
    head = run_text(capsys, "sensitivity", fair).splitlines()[0]
    assert "cost per kg dry ice" in head
    head = run_text(capsys, "uncertainty", fair, "--samples", "200", "--seed", "1").splitlines()[0]
    assert "cost per kg dry ice" in head
    assert run_json(capsys, "uncertainty", "--samples", "200", "--seed", "1")["end_product"] == "gas"


def test_uncertainty_box_chart_goes_logarithmic_over_a_wide_spread(capsys):
    # the demo's water-absorption route costs tens of times the cheapest: a linear axis would put
    # every other route's box in the first columns
    text = run_text(capsys, "uncertainty", "--samples", "200", "--seed", "1")
    assert "(log scale)" in text
    starts = {line.split()[0]: line.index("[") for line in text.splitlines() if "[" in line and "|" in line
              and not line.startswith("box")}
    assert len(set(starts.values())) >= 4  # the boxes are spread over the axis


def test_snow_takes_the_british_spelling_of_vapour(capsys):
    a = run_json(capsys, "snow", "--liquid-temperature", "20 degC", "--draw", "vapour")
    assert a["draw"] == "vapor" and a["solid_fraction"] < a["liquid_draw_solid_fraction"]


def test_forced_overfill_is_said_once(capsys):
    a = run_json(capsys, "store", "--volume", "13.4 L", "--temperature", "20 degC", "--mass", "10 kg",
                 "--force")
    # one sentence about the 0.68 kg/L filling density of 49 CFR 173.304a, not two
    assert sum("0.68 kg/L" in w for w in a["warnings"]) == 1


@pytest.mark.parametrize("body, words", [
    ('condensing_temperature = "35 degC"', "delivery.condensing_temperature"),  # above 31.0 degC
    ("stages = 1", "delivery.stages"),                                         # ratio 34 > 6
])
def test_bad_delivery_in_a_scenario_is_one_line_with_status_2(capsys, tmp_path, fair, body, words):
    text = open(fair, encoding="utf-8").read()
    key = body.split(" =")[0]
    lines = [body if line.startswith(key + " =") else line for line in text.splitlines()]
    path = tmp_path / "bad.toml"
    path.write_text("\n".join(lines) + "\n", encoding="utf-8")
    assert main(["compare", str(path), "--json"]) == 2
    err = capsys.readouterr().err
    assert words in err and err.count("\n") == 1

"""The comparison and recipe commands as a practitioner runs them: compare, batch, routes, demo.

Checks the JSON keys the issue lists, the CSV and Markdown forms, a scenario the user writes by
hand, a price book with a missing price (unknown, never zero), the demo never overwriting, and
the one-line errors with exit status 2. Outside references are named beside each assert.
"""

import csv
import io
import json

import pytest

from co2routes.tui.cli import main

ROUTE_IDS = {"acid-carbonate", "fermentation", "combustion", "sorbent-calcination", "breath",
             "water-absorption", "purchase"}
#: The per-route keys of ``compare --json`` the issue lists.
COMPARE_KEYS = {"id", "label", "rank", "co2_kg", "cost_per_kg", "energy_kwh_per_kg", "heat_kj",
                "water_g_per_kg_co2", "co2_mole_fraction", "time_h"}
#: The keys of ``batch --json`` the issue lists, and of each reagent.
BATCH_KEYS = {"route", "co2_kg", "reagents", "byproducts", "heat_kj", "temperature_change_k",
              "water_g_per_kg_co2", "co2_mole_fraction", "energy_kwh_per_kg", "time_h", "cost_per_kg",
              "warnings", "cautions"}
REAGENT_KEYS = {"name", "formula", "mass_kg", "volume_l", "pure_mass_kg", "cost"}

# IUPAC standard atomic weights (2021, abridged)
H, C, O = 1.008, 12.011, 15.999
M_CO2 = C + 2 * O
M_ACETIC = 2 * C + 4 * H + 2 * O


@pytest.fixture(autouse=True)
def _no_user_price_book(monkeypatch, tmp_path_factory):
    """Use the shipped demo price book whatever the machine's config folder holds."""
    missing = tmp_path_factory.mktemp("config") / "prices.toml"
    monkeypatch.setattr("co2routes.sources.prices.user_book_path", lambda: missing)


def _json(capsys, argv):
    assert main([*argv, "--json"]) == 0
    return json.loads(capsys.readouterr().out)


def _refused(capsys, argv):
    """Exit status 2 and the one line on stderr."""
    assert main(argv) == 2
    err = capsys.readouterr().err
    assert err.count("\n") == 1 and "Traceback" not in err
    return err


# --- compare ----------------------------------------------------------------------------------------

def test_compare_json_ranks_all_seven_routes_with_the_issue_keys(capsys):
    answer = _json(capsys, ["compare"])
    routes = answer["routes"]
    assert {r["id"] for r in routes} == ROUTE_IDS
    assert [r["rank"] for r in routes] == list(range(1, 8))
    for r in routes:
        assert COMPARE_KEYS <= r.keys()
        assert r["co2_kg"] > 0 and r["time_h"] > 0 and 0 < r["co2_mole_fraction"] <= 1
        assert r["cost_per_kg"] is not None and r["cost_per_kg"] > 0  # the demo book prices all
        assert isinstance(r["warnings"], list) and r["cautions"]
        assert set(r["cautions"]) <= set(answer["cautions"])  # the answer's own list holds them all
    assert answer["failures"] == [] and answer["warnings"] == []


def test_compare_csv_is_the_json_in_rows(capsys):
    record = _json(capsys, ["compare"])
    assert main(["compare", "--csv"]) == 0
    rows = list(csv.DictReader(io.StringIO(capsys.readouterr().out)))
    assert [r["id"] for r in rows] == [r["id"] for r in record["routes"]]
    for row, ref in zip(rows, record["routes"]):
        assert int(row["rank"]) == ref["rank"]
        for key in ("cost_per_kg", "energy_kwh_per_kg", "heat_kj", "water_g_per_kg_co2", "time_h"):
            assert float(row[key]) == pytest.approx(ref[key], rel=1e-12)  # same numbers, no rounding


def test_compare_markdown_is_a_table_of_every_route(capsys):
    assert main(["compare", "--markdown"]) == 0
    out = capsys.readouterr().out
    ranked = [line.split("|") for line in out.splitlines() if line.startswith("| ")]
    # the ranking, then the score parts; "7!" marks a route over a limit (breath falls short of
    # the demo's demand)
    ranked = [cells for cells in ranked if cells[1].strip().rstrip("!").isdigit()]
    assert len(ranked) == 14
    assert [int(cells[1].strip().rstrip("!")) for cells in ranked[:7]] == list(range(1, 8))
    assert {cells[2].strip() for cells in ranked[:7]} == ROUTE_IDS
    for table_row, parts_row in zip(ranked[:7], ranked[7:]):  # the same order, score and parts that add up to it
        assert table_row[2:4] == parts_row[2:4]
        assert sum(float(x) for x in parts_row[4:11]) == pytest.approx(float(parts_row[3]), abs=4e-3)
    assert "invented" in out.lower()  # the demo says it is invented


def test_compare_table_names_every_route_and_the_local_codes(capsys):
    from co2routes.thermo.cautions import LOCAL_CODES

    assert main(["compare"]) == 0
    out = capsys.readouterr().out
    for route_id in ROUTE_IDS:
        assert route_id in out
    assert LOCAL_CODES in out


def test_weight_on_cost_alone_puts_the_cheapest_first(capsys):
    off = [arg for k in ("energy", "time", "heat", "water", "purity", "hazard") for arg in ("--weight", f"{k}=0")]
    answer = _json(capsys, ["compare", "--weight", "cost=1", *off])
    costs = [r["cost_per_kg"] for r in answer["routes"] if r["status"] == "ranked"]
    assert costs == sorted(costs)
    assert answer["weights"]["cost"] == 1.0 and answer["weights"]["hazard"] == 0.0


USER_SCENARIO = '''# written by hand, as a user would
name = "Hand-written bench scenario"
demand = "2 kg"
end_product = "gas"

[site]
temperature = "22 degC"
pressure = "1 atm"

[options.acid-carbonate]
acid = "acetic"
strength = "5 %"

[options.fermentation]
sugar = "glucose"

[prices]
sodium-bicarbonate = "2.40 / kg"
'''


def test_a_scenario_the_user_writes_is_compared_and_planned(capsys, tmp_path):
    path = tmp_path / "bench.toml"
    path.write_text(USER_SCENARIO)
    answer = _json(capsys, ["compare", str(path)])
    assert answer["scenario"] == "Hand-written bench scenario"
    assert {r["id"] for r in answer["routes"]} == ROUTE_IDS
    assert [r["rank"] for r in answer["routes"]] == list(range(1, 8))
    recipe = _json(capsys, ["batch", "acid-carbonate", str(path)])
    acid, carbonate = recipe["reagents"]
    # vinegar at 5 %: 60.052 g acetic acid per 44.009 g CO2 made (hand stoichiometry, IUPAC
    # weights) with the 5 % default excess; 1e-4 relative (atomic-weight rounding)
    assert acid["pure_mass_kg"] / recipe["co2_generated_kg"] == pytest.approx(1.05 * M_ACETIC / M_CO2, rel=1e-4)
    assert acid["mass_kg"] == pytest.approx(acid["pure_mass_kg"] / 0.05, rel=1e-12)
    assert acid["volume_l"] > 0
    # the scenario's own price replaces the book's: cost = mass x 2.40 exactly
    assert carbonate["cost"] == pytest.approx(carbonate["mass_kg"] * 2.40, rel=1e-12)
    sugar = _json(capsys, ["batch", "fermentation", str(path)])
    assert sugar["reagents"][0]["formula"] == "C6H12O6"


def test_a_missing_price_is_null_never_zero(capsys, tmp_path, monkeypatch):
    # a user's own price book without propane: the burner's fuel cost is unknown, and so is its
    # cost per kg; every other figure of the route is still there
    book = tmp_path / "prices.toml"
    book.write_text('currency = "EUR"\n[prices]\nelectricity = "0.30 / kWh"\nwater = "3 / m**3"\n'
                    'co2-cylinder = "6.00 / kg"\n')
    monkeypatch.setattr("co2routes.sources.prices.user_book_path", lambda: book)
    answer = _json(capsys, ["compare"])
    rows = {r["id"]: r for r in answer["routes"]}
    assert rows["combustion"]["cost_per_kg"] is None
    assert rows["combustion"]["energy_kwh_per_kg"] > 0
    assert rows["purchase"]["cost_per_kg"] == pytest.approx(6.00, rel=1e-9)
    recipe = _json(capsys, ["batch", "combustion"])
    fuel = recipe["reagents"][0]
    assert fuel["formula"] == "C3H8" and fuel["mass_kg"] > 0
    assert fuel["cost"] is None and recipe["cost_per_kg"] is None
    line = next(c for c in recipe["costs"] if c["item"] == fuel["name"])
    assert line["unit_price"] is None and line["cost"] is None
    assert main(["batch", "combustion"]) == 0
    assert "unknown" in capsys.readouterr().out


# --- batch ------------------------------------------------------------------------------------------

@pytest.mark.parametrize("route_id", sorted(ROUTE_IDS))
def test_batch_json_has_the_issue_keys_for_every_route(capsys, route_id):
    recipe = _json(capsys, ["batch", route_id])
    assert BATCH_KEYS <= recipe.keys()
    assert recipe["route"] == route_id
    assert recipe["co2_kg"] == pytest.approx(1.2, rel=1e-12)  # the demo: 1.2 kg/day x 1 day
    for reagent in recipe["reagents"]:
        assert REAGENT_KEYS <= reagent.keys()
        assert reagent["mass_kg"] > 0 and 0 < reagent["pure_mass_kg"] <= reagent["mass_kg"] * (1 + 1e-12)
        assert reagent["cost"] is not None and reagent["cost"] > 0
    for b in recipe["byproducts"]:
        assert {"name", "formula", "mass_kg"} <= b.keys() and b["mass_kg"] > 0
    assert sum(recipe["raw_gas_mole_fractions"].values()) == pytest.approx(1.0, rel=1e-9)
    assert recipe["cautions"] and recipe["time_h"] > 0 and recipe["cost_per_kg"] > 0


@pytest.mark.parametrize("route_id, options", [
    ("acid-carbonate", ["--option", "acid=citric", "--option", "strength=as sold"]),
    ("fermentation", ["--option", "sugar=malt-extract"]),
    ("combustion", ["--option", "fuel=butane"]),
    ("purchase", []),
])
def test_batch_doubling_co2_doubles_every_reagent(capsys, route_id, options):
    # conservation of mass: every feed is proportional to the CO2 wanted; 1e-9 relative
    one = _json(capsys, ["batch", route_id, "--co2", "1 kg", *options])
    two = _json(capsys, ["batch", route_id, "--co2", "2000 g", *options])
    assert two["co2_kg"] == pytest.approx(2 * one["co2_kg"], rel=1e-12)
    assert len(one["reagents"]) == len(two["reagents"]) > 0
    for a, b in zip(one["reagents"], two["reagents"]):
        assert b["mass_kg"] == pytest.approx(2 * a["mass_kg"], rel=1e-9)
        assert b["cost"] == pytest.approx(2 * a["cost"], rel=1e-9)
    assert two["heat_kj"] == pytest.approx(2 * one["heat_kj"], rel=1e-9)


def test_batch_markdown_and_table_read_as_a_recipe(capsys):
    assert main(["batch", "acid-carbonate", "--markdown"]) == 0
    md = capsys.readouterr().out
    assert md.startswith("#") and "sodium bicarbonate" in md and "|" in md
    assert main(["batch", "acid-carbonate"]) == 0
    table = capsys.readouterr().out
    assert "takes heat in" in table       # NBS: NaHCO3 + HCl(aq) is endothermic (+31.4 kJ/mol)
    assert "Mix: put" in table            # the order to mix in
    assert "caution:" in table


# --- routes -----------------------------------------------------------------------------------------

def test_routes_lists_every_route_with_options_units_and_defaults(capsys):
    from co2routes.sources.registry import catalogue

    answer = _json(capsys, ["routes"])
    assert {r["id"] for r in answer["routes"]} == ROUTE_IDS and answer["failures"] == []
    for r in answer["routes"]:
        route = catalogue().get(r["id"])
        assert r["label"] and r["options"]
        for o, opt in zip(r["options"], route.options):
            assert {"key", "dimension", "default", "choices", "low", "high"} <= o.keys()
            opt.parse(o["default"])  # every default is itself a valid value
            if o["dimension"] == "choice":
                assert o["default"] in o["choices"]
    assert main(["routes"]) == 0
    out = capsys.readouterr().out
    for r in answer["routes"]:
        assert f"{r['id']}: " in out
        for o in r["options"]:
            assert f"    {o['key']} = " in out


# --- demo -------------------------------------------------------------------------------------------

def test_demo_writes_a_file_that_compares_and_never_overwrites(capsys, tmp_path):
    path = tmp_path / "mine.toml"
    assert main(["demo", str(path)]) == 0
    capsys.readouterr()
    assert "INVENTED" in path.read_text()
    mine = _json(capsys, ["compare", str(path)])
    shipped = _json(capsys, ["compare"])
    assert [r["id"] for r in mine["routes"]] == [r["id"] for r in shipped["routes"]]
    path.write_text("# my own edits\n")
    err = _refused(capsys, ["demo", str(path)])
    assert "mine.toml" in err and "already exists" in err
    assert path.read_text() == "# my own edits\n"
    assert main(["demo", str(path), "--which", "science-fair", "--overwrite"]) == 0
    assert 'end_product = "dry-ice"' in path.read_text()
    assert [p.name for p in tmp_path.iterdir()] == ["mine.toml"]  # no temporary file left


def test_demo_prints_when_no_file_is_given(capsys):
    assert main(["demo"]) == 0
    assert "INVENTED" in capsys.readouterr().out


# --- bad input --------------------------------------------------------------------------------------

@pytest.mark.parametrize("argv, words", [
    (["batch", "acid-on-chalk"], ["route", "acid-carbonate"]),
    (["batch", "acid-carbonate", "--option", "colour=red"], ["colour", "acid_excess"]),
    (["batch", "acid-carbonate", "--option", "strength=60 %"], ["option strength", "40%"]),
    (["batch", "acid-carbonate", "--option", "acid_excess=-5 %"], ["option acid_excess", "0 % and 100 %"]),
    (["batch", "acid-carbonate", "--option", "acid=nitric"], ["option acid", "hcl"]),
    (["batch", "acid-carbonate", "--option", "gas_rate=1 kg/s"], ["option gas_rate", "kg/h"]),
    (["batch", "breath", "--option", "people=0"], ["option people", "whole number from 1"]),
    (["batch", "acid-carbonate", "--option", "strength"], ["--option", "KEY=VALUE"]),
    (["batch", "acid-carbonate", "--co2", "-2 kg"], ["--co2"]),
    (["batch", "acid-carbonate", "--co2", "2"], ["--co2", "unit"]),
    (["batch", "acid-carbonate", "--co2", "2 L"], ["--co2", "mass"]),
    (["compare", "no-such-file.toml"], ["no-such-file.toml"]),
    (["compare", "--weight", "cost"], ["--weight"]),
    (["compare", "--weight", "cost=-1"], ["--weight"]),
    (["demo", "--which", "county-fair"], ["--which", "polytunnel"]),
])
def test_bad_input_is_one_line_naming_it_with_status_2(capsys, argv, words):
    err = _refused(capsys, argv)
    for word in words:
        assert word in err


@pytest.mark.parametrize("body, words", [
    ('demand = "2 kg"\n\n[prices]\nsucrose = "0.85 / K"\n', ["line 4", "prices.sucrose", "mass, volume or energy"]),
    ('demand = "-2 kg"\n', ["line 1", "demand"]),
    ('demand = "2 kg"\n[site]\ntemperature = "20"\n', ["line 3", "site.temperature", "unit"]),
])
def test_bad_scenario_names_the_file_the_line_and_the_key(capsys, tmp_path, body, words):
    path = tmp_path / "mine.toml"
    path.write_text(body)
    for verb in (["compare"], ["batch", "purchase"]):
        err = _refused(capsys, [*verb, str(path)])
        assert "mine.toml" in err
        for word in words:
            assert word in err


def test_a_mistyped_route_in_an_options_table_is_refused(capsys, tmp_path):
    # otherwise that route would quietly run on its defaults
    path = tmp_path / "typo.toml"
    path.write_text('demand = "1 kg"\n\n[options.acid-carbonat]\nacid = "acetic"\n')
    for verb in (["compare"], ["batch", "purchase"]):
        err = _refused(capsys, [*verb, str(path)])
        assert "[options.acid-carbonat]" in err and "acid-carbonate" in err


def test_batch_table_gives_the_cost_in_the_book_currency(capsys):
    assert main(["batch", "fermentation"]) == 0
    out = capsys.readouterr().out
    assert "EUR per kg" in out  # the demo book names its currency once: EUR
    assert "temperature change  – (not worked out for this route)" in out


def test_unknown_flag_is_one_line_with_status_2(capsys):
    with pytest.raises(SystemExit) as exc:
        main(["compare", "--colour"])
    assert exc.value.code == 2
    assert capsys.readouterr().err.count("\n") == 1

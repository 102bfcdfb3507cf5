"""Hard limits and route choice: from the scenario file, the command line and the comparison."""

import json
import tomllib

import pytest

from co2routes.sources.choice import hidden_ids, limit_breaks, parse_limit
from co2routes.sources.pipeline import compare
from co2routes.sources.registry import catalogue
from co2routes.sources.scenario import demo, demo_text, validate
from co2routes.thermo.errors import InputError
from co2routes.tui.cli import main


@pytest.fixture(scope="module")
def polytunnel():
    return compare(demo())


def _ids(comparison, status=None):
    return [r.result.route_id for r in comparison.rows if status is None or r.status == status]


def _document(**tables):
    doc = tomllib.loads(demo_text("polytunnel"))
    doc.update(tables)
    return doc


def test_removing_a_route_changes_nobody_elses_order(polytunnel):
    # the demo: water absorption at about 62 per kg is the extreme route
    without = compare(demo(), [r for r in catalogue().routes if r.id != "water-absorption"])
    assert _ids(without) == [i for i in _ids(polytunnel) if i != "water-absorption"]
    for row in without.rows:  # and every score is the same number as with it
        assert row.score == next(r.score for r in polytunnel.rows if r.result.route_id == row.result.route_id)


def test_an_absurdly_expensive_route_moves_nobody():
    # propane at 500 per kg makes combustion absurdly dear; with or without it the rest keep their order
    scenario = validate(_document(prices={"sucrose": "0.85 / kg", "propane": "500 / kg"}))
    dear = compare(scenario)
    ranked = [row.result.route_id for row in dear.rows if row.status == "ranked"]
    assert ranked[-1] in ("combustion", "water-absorption")
    without = compare(scenario, [r for r in catalogue().routes if r.id != "combustion"])
    assert _ids(without) == [i for i in _ids(dear) if i != "combustion"]


def test_limits_from_the_scenario_list_the_route_with_its_reason():
    scenario = validate(_document(limits={"max_hazard": 2, "max_time": "1 day"}))
    assert scenario.limits == {"max_hazard": 2.0, "max_time_h": 24.0}
    result = compare(scenario)
    assert len(result.rows) == 7  # nobody dropped
    over = [r for r in result.rows if r.status == "over limit"]
    assert {r.result.route_id for r in over} >= {"combustion", "acid-carbonate", "fermentation"}
    assert all(r.breaks for r in over)
    assert [r.status for r in result.rows] == sorted((r.status for r in result.rows), key=["ranked", "over limit"].index)
    acid = next(r for r in over if r.result.route_id == "acid-carbonate")
    assert acid.breaks == ("hazard 3 above the limit 2",)


def test_route_choice_from_the_scenario_keeps_hidden_routes_listed():
    scenario = validate(_document(routes={"include": ["fermentation", "purchase", "breath"], "exclude": ["breath"]}))
    result = compare(scenario)
    assert sorted(_ids(result, "ranked")) == ["fermentation", "purchase"]  # the two chosen, in score order
    assert len(_ids(result, "hidden")) == 5 and "breath" in _ids(result, "hidden")
    assert all(r.rank is None for r in result.rows if r.hidden)


@pytest.mark.parametrize("tables, field", [
    ({"limits": {"max_hazzard": 2}}, "limits.max_hazzard"),
    ({"limits": {"min_purity": "150 %"}}, "limits.min_purity"),
    ({"limits": {"max_time": "3 kg"}}, "limits.max_time"),
    ({"limits": {"max_cost_per_kg": -1}}, "limits.max_cost_per_kg"),
    ({"routes": {"only": ["purchase"]}}, "routes.only"),
    ({"routes": {"exclude": "purchase, 3"}}, None),
    ({"routes": {"include": [1, 2]}}, "routes.include"),
    ({"limits": "tight"}, "limits"),
])
def test_bad_limits_and_route_tables_are_refused_naming_the_key(tables, field):
    if field is None:  # a comma-separated string is accepted as a list
        assert validate(_document(**tables)).exclude == ("purchase", "3")
        return
    with pytest.raises(InputError) as err:
        validate(_document(**tables), "s.toml")
    assert field in err.value.field


def test_unknown_route_id_is_refused():
    scenario = validate(_document(routes={"exclude": ["brewing"]}))
    with pytest.raises(InputError, match="brewing"):
        compare(scenario)


def test_capital_limit_reads_capital_per_kg_when_a_route_has_it():
    from types import SimpleNamespace as S

    base = dict(hazard=1, time_h=1.0, raw_gas=S(co2_mole_fraction=1.0), cost_per_kg=1.0)
    assert limit_breaks(S(**base), {"max_capital_per_kg": 10.0}) == ("capital per kg unknown (limit 10.00)",)
    assert limit_breaks(S(**base, capital_per_kg=4.0), {"max_capital_per_kg": 10.0}) == ()
    assert limit_breaks(S(**base, capital_per_kg=40.0), {"max_capital_per_kg": 10.0}, "EUR") == (
        "capital per kg 40.00 EUR above the limit 10.00 EUR",)
    assert parse_limit("min_purity", 0.9, "x") == ("min_purity", 0.9)


def test_hidden_ids_without_include():
    from types import SimpleNamespace as S

    assert hidden_ids(S(include=None, exclude=()), ["a"]) == set()


def test_command_line_routes_exclude_and_limit(capsys):
    assert main(["compare", "--json", "--routes", "fermentation,purchase,combustion", "--exclude", "purchase",
                 "--limit", "max_hazard=2"]) == 0
    answer = json.loads(capsys.readouterr().out)
    status = {r["id"]: r["status"] for r in answer["routes"]}
    assert status["fermentation"] == "ranked" and status["purchase"] == "hidden"
    assert status["combustion"] == "over limit"
    combustion = next(r for r in answer["routes"] if r["id"] == "combustion")
    assert combustion["breaks"] == ["hazard 3 above the limit 2"]
    assert answer["limits"] == {"max_hazard": 2.0}
    assert answer["route_choice"] == {"include": ["fermentation", "purchase", "combustion"], "exclude": ["purchase"]}
    for route in answer["routes"]:
        assert sum(route["score_parts"].values()) == pytest.approx(route["score"], abs=1e-5)
        assert route["heat_kj_per_kg"] == pytest.approx(route["heat_kj"] / route["product_kg"], rel=1e-12)


def test_command_line_refuses_a_bad_limit(capsys):
    assert main(["compare", "--limit", "most_hazard=2"]) == 2
    assert "--limit" in capsys.readouterr().err


def test_text_names_the_limit_broken_and_the_hidden(capsys):
    assert main(["compare", "--exclude", "breath", "--limit", "min_purity=99 %"]) == 0
    out = capsys.readouterr().out
    assert "over a limit: fermentation: CO2 purity 98.2% below the limit 99.0%" in out
    assert "hidden by the route choice (listed, not ranked): breath" in out
    assert "per kg of gas" in out and "cost/kg gas" in out


def test_a_route_short_of_the_demand_follows_the_routes_that_meet_it():
    # The invented polytunnel demo: 4 people breathing 8 h a day cannot give 1.2 kg of CO2 a day
    # (Persily & de Jonge 2017 rates, as the breath route computes them). The breath route is listed
    # after every route that meets the demand, with what it would take, whatever its score.
    comparison = compare(demo())
    breath = next(row for row in comparison.rows if row.result.route_id == "breath")
    assert not breath.result.schedule.meets_demand
    assert breath.status == "over limit"
    assert breath.breaks[0].startswith("demand not met (") and "people" in breath.breaks[0]
    ranked = [row for row in comparison.rows if row.status == "ranked"]
    assert all(row.result.schedule.meets_demand for row in ranked)
    assert comparison.rows.index(breath) > max(comparison.rows.index(row) for row in ranked)
    # with enough people it meets the demand and is ranked on its score again
    doc = _document()
    doc["options"]["breath"] = {"people": 8}
    enough = validate(doc)
    again = next(row for row in compare(enough).rows if row.result.route_id == "breath")
    assert again.status == "ranked" and again.result.schedule.meets_demand

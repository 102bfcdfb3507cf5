"""A route that refuses the scenario is listed as not applicable; the others are still ranked."""

import dataclasses

from co2routes.sources.pipeline import compare
from co2routes.sources.records import comparison_record
from co2routes.sources.scenario import demo


def _cold_demo():
    scenario = demo("polytunnel")
    return dataclasses.replace(scenario, site=dataclasses.replace(scenario.site, temperature_k=268.15))


def test_a_cold_site_ranks_the_routes_that_can_run():
    # -5 degC: a fermenter planned at the site's temperature cannot run (yeast below 5 degC);
    # buying CO2 still can. The refusal names the route and the input.
    comparison = compare(_cold_demo())
    refused = {n.route_id: n.reason for n in comparison.not_applicable}
    ranked = {row.result.route_id for row in comparison.rows}
    assert "fermentation" in refused and "purchase" in ranked
    assert refused.keys().isdisjoint(ranked)
    assert all(reason for reason in refused.values())
    record = comparison_record(comparison)
    assert {n["id"] for n in record["not_applicable"]} == set(refused)


def test_the_command_line_lists_them_and_exits_0(tmp_path, capsys):
    from co2routes.tui.cli import main

    path = tmp_path / "cold.toml"
    path.write_text('name = "cold"\ndemand = "1 kg/day"\nbatch = "1 day"\n[site]\ntemperature = "-5 degC"\n')
    assert main(["compare", str(path)]) == 0
    out = capsys.readouterr().out
    assert "not applicable: " in out and "(fermentation)" in out

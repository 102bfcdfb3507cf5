"""``co2routes dryer`` through co2routes.tui.cli.main: JSON answer and one-line errors with exit status 2."""

from __future__ import annotations

import json

import pytest

from co2routes.tui.cli import main

BASE = ["dryer", "--flow", "2 kg/day", "--inlet-temperature", "25 degC",
        "--desiccant", "molecular-sieve-3a", "--cycle", "7 day"]
KEYS = {"water_load_kg_per_cycle", "equilibrium_loading_kg_per_kg", "working_capacity_kg_per_kg",
        "bed_mass_kg", "bed_volume_l", "bed_length_m", "bed_diameter_m", "superficial_velocity_m_s",
        "pressure_drop_pa", "breakthrough_h", "regeneration_heat_kj", "outlet_dew_point_k",
        "cost_per_kg_co2", "warnings", "cautions", "breakthrough_curve"}


def _json(capsys, argv):
    assert main(argv + ["--json"]) == 0
    return json.loads(capsys.readouterr().out)


def test_json_answer_has_the_issue_keys(capsys):
    answer = _json(capsys, BASE)
    assert KEYS <= set(answer)
    assert answer["desiccant"] == "molecular-sieve-3a"
    # 2 kg/day saturated at 25 degC for 7 days: 0.185 kg of water at ideal mixing (IAPWS-95
    # p_sat), times an enhancement of about 1.01 at 1 atm (Meyer & Harvey 2015 measure 1.05 at
    # 5 bar, rising about linearly from 1 at zero pressure); 2 %
    assert answer["water_load_kg_per_cycle"] == pytest.approx(0.185 * 1.01, rel=0.02)
    assert answer["bed_volume_l"] == pytest.approx(answer["bed_mass_kg"] / 0.750, rel=1e-9)
    assert answer["breakthrough_h"] > 7 * 24
    curve = answer["breakthrough_curve"]
    assert curve[0]["time_h"] == 0.0 and {"time_h", "outlet_ppmv"} == set(curve[0])
    assert curve[-1]["outlet_ppmv"] == pytest.approx(answer["inlet_water_ppmv"], rel=1e-3)
    assert answer["cautions"] and any("invented" in w for w in answer["warnings"])


def test_silica_gel_at_one_atmosphere_names_a_desiccant_that_can(capsys):
    answer = _json(capsys, BASE[:-4] + ["--desiccant", "silica-gel", "--cycle", "7 day"])
    assert answer["reaches_target"] is False
    assert answer["suggested_desiccant"] == "molecular-sieve-3a"
    assert any("molecular-sieve-3a reaches it" in w for w in answer["warnings"])


def test_volume_flow_gas_mix_and_geometry_options(capsys):
    answer = _json(capsys, ["dryer", "--flow", "1 L/min", "--inlet-temperature", "20 degC",
                            "--desiccant", "molecular-sieve-13x", "--cycle", "8 h",
                            "--inlet-pressure", "3 bar", "--relative-humidity", "60 %",
                            "--target-dew-point", "-40 degC", "--diameter", "5 cm",
                            "--particle-size", "2 mm", "--gas", "CO2=0.9,N2=0.1"])
    assert answer["bed_diameter_m"] == pytest.approx(0.05)
    assert answer["target_dew_point_k"] == pytest.approx(233.15, abs=1e-6)
    assert answer["regeneration_heat_kj"] > 0


def test_table_output_shows_units_and_cautions(capsys):
    assert main(BASE) == 0
    text = capsys.readouterr().out
    assert "bed mass" in text and "kg" in text and "caution:" in text


@pytest.mark.parametrize("extra, option", [
    (["--flow", "0 kg/day"], "--flow"),
    (["--flow", "-2 kg/day"], "--flow"),
    (["--flow", "2 kg"], "--flow"),
    (["--desiccant", "charcoal"], "--desiccant"),
    (["--relative-humidity", "120 %"], "--relative-humidity"),
    (["--target-ppmv", "50000"], "--target-ppmv"),
    (["--target-dew-point", "30 degC"], "--target-dew-point"),
])
def test_bad_input_is_one_line_with_exit_status_2(capsys, extra, option):
    argv = list(BASE)
    for i in range(0, len(extra), 2):
        if extra[i] in argv:
            argv[argv.index(extra[i]) + 1] = extra[i + 1]
        else:
            argv += extra[i:i + 2]
    assert main(argv + ["--json"]) == 2
    err = capsys.readouterr().err.strip()
    assert len(err.splitlines()) == 1 and option in err


def test_dryer_prices_from_the_users_price_book(capsys, monkeypatch, tmp_path):
    # The dryer command costs the charge and the regeneration from the user's book, not a list of
    # its own: doubling both prices doubles the cost per kg (cost is linear in the prices).
    argv = ["dryer", "--flow", "2 kg/day", "--inlet-temperature", "25 degC", "--desiccant",
            "silica-gel", "--cycle", "8 h", "--json"]

    def cost(text):
        book = tmp_path / "prices.toml"
        book.write_text(text, encoding="utf-8")
        monkeypatch.setattr("co2routes.sources.prices.user_book_path", lambda: book)
        assert main(argv) == 0
        return json.loads(capsys.readouterr().out)

    one = cost('currency = "GBP"\n[prices]\nsilica-gel = "3 / kg"\nelectricity = "0.2 / kWh"\n')
    two = cost('currency = "GBP"\n[prices]\nsilica-gel = "6 / kg"\nelectricity = "0.4 / kWh"\n')
    assert two["cost_per_kg_co2"] == pytest.approx(2 * one["cost_per_kg_co2"], rel=1e-9)
    assert any("GBP" in w and "price book" in w for w in one["warnings"])
    none = cost('currency = "GBP"\n[prices]\nelectricity = "0.2 / kWh"\n')
    assert none["cost_per_kg_co2"] is None
    assert any("silica-gel" in w and "Cost unknown" in w for w in none["warnings"])

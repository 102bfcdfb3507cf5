"""``co2routes sensitivity`` and ``co2routes uncertainty`` through ``co2routes.tui.cli.main``.

The routes are the small fakes of tests/sources/whatif_fakes.py (closed-form costs), so these
tests do not depend on the real route models; the arithmetic they check is in
tests/sources/test_whatif.py, with its sources. Here: JSON shape, repeatability, one-line errors
with exit status 2, the progress bar only on a terminal.
"""

from __future__ import annotations

import io
import sys
from pathlib import Path

import pytest

sys.path.insert(0, str(Path(__file__).resolve().parents[1] / "sources"))

from whatif_fakes import FakeRoute  # noqa: E402

from co2routes.sources import registry, sensitivity, uncertainty  # noqa: E402
from clihelp import run_cli as run_json  # noqa: E402
from co2routes.tui.cli import COMMANDS, main  # noqa: E402
from co2routes.tui.commands.uncertainty import ProgressBar  # noqa: E402

SCENARIO = """\
name = "what-if cli test"
demand = "3 kg"

[prices]
sucrose = "1.00 / kg"

[uncertain]
"prices.sucrose" = {dist = "triangular", low = "0.7 / kg", mode = "0.85 / kg", high = "1.1 / kg"}
"prices.glucose" = {dist = "uniform", low = "0.9 / kg", high = "1.5 / kg"}
"options.a.efficiency" = {dist = "uniform", low = "85 %", high = "95 %"}
"""


@pytest.fixture(autouse=True)
def fake_routes(monkeypatch):
    cat = registry.Catalogue((FakeRoute("a", "sucrose", 2.0), FakeRoute("b", "glucose", 1.5)), ())
    for module in (registry, sensitivity, uncertainty):
        monkeypatch.setattr(module, "catalogue", lambda: cat)
    return cat


def write(tmp_path, text=SCENARIO):
    path = tmp_path / "s.toml"
    path.write_text(text, encoding="utf-8")
    return str(path)


def test_registered():
    assert "sensitivity" in COMMANDS and "uncertainty" in COMMANDS


def test_sensitivity_json(capsys, tmp_path):
    answer, _ = run_json(capsys, "sensitivity", write(tmp_path))
    assert [r["id"] for r in answer["routes"]] == ["a", "b"]
    for route in answer["routes"]:
        effects = [abs(i["cost_per_kg_high"] - i["cost_per_kg_low"]) for i in route["inputs"]]
        assert effects == sorted(effects, reverse=True) and all(e > 0 for e in effects)
        for item in route["inputs"]:
            assert {"name", "low", "high", "cost_per_kg_low", "cost_per_kg_high"} <= set(item)
    eff = next(i for i in answer["routes"][0]["inputs"] if i["name"] == "options.a.efficiency")
    assert (eff["low"], eff["high"]) == pytest.approx((0.85, 0.95))  # from [uncertain]
    assert main(["sensitivity", write(tmp_path)]) == 0
    assert "options.a.efficiency" in capsys.readouterr().out


def test_uncertainty_json_repeatable(capsys, tmp_path):
    path = write(tmp_path)
    first, err = run_json(capsys, "uncertainty", path, "--samples", "3000", "--seed", "9")
    again, _ = run_json(capsys, "uncertainty", path, "--samples", "3000", "--seed", "9")
    assert err == ""  # no progress bar: stderr is not a terminal here
    assert first == again and first["seed"] == 9 and first["samples"] == 3000
    total = 0.0
    for r in first["routes"]:
        assert {"id", "cost_per_kg_p10", "cost_per_kg_p50", "cost_per_kg_p90", "probability_cheapest"} <= set(r)
        assert r["cost_per_kg_p10"] <= r["cost_per_kg_p50"] <= r["cost_per_kg_p90"]
        total += r["probability_cheapest"]
    assert total == pytest.approx(1.0, abs=1e-12)
    assert main(["uncertainty", path, "--samples", "500", "--seed", "1"]) == 0
    assert "P50" in capsys.readouterr().out


@pytest.mark.parametrize("entry, words", [
    ('{dist = "uniform", low = "95 %", high = "85 %"}', "bounds are reversed"),
    ('{dist = "normal", mean = "90 %", sd = "-1 %"}', "cannot be negative"),
])
def test_bad_spread_one_line_exit_2(capsys, tmp_path, entry, words):
    text = SCENARIO.replace('{dist = "uniform", low = "85 %", high = "95 %"}', entry)
    for verb in ("uncertainty", "sensitivity"):
        assert main([verb, write(tmp_path, text), "--json"]) == 2
        err = capsys.readouterr().err
        assert words in err and "options.a.efficiency" in err and "line 10" in err
        assert err.count("\n") == 1


@pytest.mark.parametrize("argv", [["--samples", "0"], ["--samples", "many"], ["--seed", "-1"]])
def test_bad_numbers_exit_2(capsys, tmp_path, argv):
    assert main(["uncertainty", write(tmp_path), *argv, "--json"]) == 2
    err = capsys.readouterr().err
    assert argv[0] in err and err.count("\n") == 1


def test_progress_bar_only_on_a_terminal():
    class Tty(io.StringIO):
        def isatty(self):
            return True

    quiet, tty = io.StringIO(), Tty()
    for stream in (quiet, tty):
        bar = ProgressBar(stream)
        for i in range(1, 11):
            bar(i, 10)
        bar.close()
    assert quiet.getvalue() == ""
    assert "100%" in tty.getvalue() and "#" * 30 in tty.getvalue()

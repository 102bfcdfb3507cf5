"""The example plug-in in docs/examples/oven-soda, installed as a third party would install it.

pip installs a copy of it (no dependencies, no build isolation: the test environment's
setuptools builds it) into a scratch folder; the program then runs in a fresh process with that
folder on its path, and the route must appear in ``routes``, ``compare`` and ``batch``. (That a price in the user's book wins over the route's
default is tested in process, in tests/sources/test_route_prices.py.)
"""

from __future__ import annotations

import json
import os
import shutil
import subprocess
import sys
from pathlib import Path

import pytest

EXAMPLE = Path(__file__).resolve().parents[2] / "docs" / "examples" / "oven-soda"


@pytest.fixture(scope="module")
def plugin_path(tmp_path_factory) -> Path:
    """The folder the example plug-in is installed into."""
    root = tmp_path_factory.mktemp("plugin")
    source = root / "oven-soda"
    shutil.copytree(EXAMPLE, source, ignore=shutil.ignore_patterns("build", "*.egg-info", "__pycache__"))
    target = root / "site"
    subprocess.run([sys.executable, "-m", "pip", "install", "-q", "--no-deps", "--no-build-isolation",
                    "--no-index", "--target", str(target), str(source)], check=True, capture_output=True,
                   timeout=300)
    return target


def co2routes(plugin_path: Path, *argv: str) -> dict:
    """``co2routes ARGV --json`` in a new process that sees the installed plug-in."""
    env = {**os.environ, "PYTHONPATH": str(plugin_path)}
    done = subprocess.run([sys.executable, "-m", "co2routes.tui.cli", *argv, "--json"], env=env,
                          capture_output=True, text=True, timeout=300, cwd=plugin_path)
    assert done.returncode == 0, done.stderr
    return json.loads(done.stdout)


def test_listed_in_routes(plugin_path):
    answer = co2routes(plugin_path, "routes")
    assert answer["failures"] == []
    route = {r["id"]: r for r in answer["routes"]}["oven-soda"]
    assert [o["key"] for o in route["options"]] == ["oven_temperature", "conversion", "oven_efficiency", "bake_time"]
    assert route["default_prices"] == {"oven-soda-bulk": "1.10 / kg"}


def test_ranked_in_compare(plugin_path):
    answer = co2routes(plugin_path, "compare")
    ids = [row["id"] for row in answer["routes"]]
    assert "oven-soda" in ids and "acid-carbonate" in ids
    row = {r["id"]: r for r in answer["routes"]}["oven-soda"]
    assert row["cost_per_kg"] is not None  # priced: the soda from the route's default, power from the book


def test_batch_prices_from_the_route_default(plugin_path):
    answer = co2routes(plugin_path, "batch", "oven-soda", "--co2", "1 kg")
    soda = answer["reagents"][0]
    # Hand stoichiometry (IUPAC 2021 atomic weights): 2 mol NaHCO3 (84.007 g/mol) per mol CO2
    # (44.0095 g/mol) at 95 % conversion: 2 x 84.007 / 44.0095 / 0.95 = 4.0186 kg; tolerance 1e-4.
    assert soda["mass_kg"] == pytest.approx(2 * 84.007 / 44.0095 / 0.95, rel=1e-4)
    # NBS (Wagman et al. 1982): dH = -1130.68 - 241.818 - 393.51 + 2 x 950.81 = +135.61 kJ/mol;
    # the batch takes heat in (heat_kj > 0), at least the reaction's 3081 kJ per kg CO2.
    assert answer["heat_kj"] > 135.61 / 0.0440095
    line = {c["item"]: c for c in answer["costs"]}["baking soda (bulk)"]
    assert (line["price_key"], line["price_from"], line["unit_price"]) == ("oven-soda-bulk", "route default", 1.10)
    power = {c["item"]: c for c in answer["costs"]}["electricity for the oven"]
    assert power["price_from"] == "price book"



def test_example_doctests(plugin_path, monkeypatch):
    import doctest
    import importlib

    monkeypatch.syspath_prepend(str(plugin_path))
    module = importlib.import_module("co2routes_oven_soda")
    result = doctest.testmod(module)
    assert result.attempted > 0 and result.failed == 0

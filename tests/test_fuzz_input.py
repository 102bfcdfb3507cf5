"""Fuzzing the edges (README, "Bad input"): whatever text reaches the quantity parser, the scenario
loader or a command's options, the answer is a value, one :class:`InputError`, or exit status 0
or 2: never a traceback, never a non-finite number in a result, never a long wait.

Example counts are kept small so the whole suite stays fast; the catalogue in
``test_bad_input.py`` holds the known cases.
"""

from __future__ import annotations

import json
import math
import sys
import time
from pathlib import Path

import pytest
from hypothesis import HealthCheck, given, settings
from hypothesis import strategies as st

from co2routes.thermo.errors import InputError
from co2routes.thermo.units import DIMENSIONS, parse
from co2routes.tui.cli import main

sys.path.insert(0, str(Path(__file__).parent))
from bad_input_cases import BASES  # noqa: E402
from test_bad_input import assert_finite  # noqa: E402

#: A single call may take at most this long [s].
CALL_SECONDS = 5.0
FAST = settings(max_examples=60, deadline=None, suppress_health_check=list(HealthCheck))

#: Pieces a quantity text is made of, so that the fuzzer reaches pint and not only the first check.
PIECES = st.sampled_from(["1", "9", "0.5", "1e3", "1e400", "-", "+", " ", "*", "**", "^", "/", "(", ")", "kg",
                          "K", "degC", "bar", "%", "m", "h", "nan", "inf", "e", ".", "9**9", "delta_degC",
                          "ppmv", "L", "\x1b", "°", "_", "x"])
QUANTITY = st.one_of(st.text(max_size=40), st.lists(PIECES, max_size=12).map("".join))


@FAST
@given(text=QUANTITY, dimension=st.sampled_from(sorted(DIMENSIONS)))
def test_the_parser_gives_a_finite_value_or_one_input_error(text, dimension):
    start = time.perf_counter()
    try:
        value = parse(text, "field", dimension)
    except InputError as err:
        assert "\n" not in str(err) and str(err).startswith("field:")
    else:
        assert math.isfinite(value)
    assert time.perf_counter() - start < CALL_SECONDS


KEYS = st.sampled_from(["demand", "batch", "name", "end_product", "currency", "site.temperature",
                        "site.pressure", "site.air_co2", "dryer.cycle", "dryer.target_ppmv",
                        "delivery.efficiency", "delivery.stages", "delivery.condensing_temperature",
                        "weights.cost", "weights.hazard", "prices.sucrose", "options.fermentation.efficiency",
                        "options.purchase.cylinder", "uncertain.demand"])
VALUES = st.one_of(QUANTITY, st.integers(-10**20, 10**20), st.floats(allow_nan=True, allow_infinity=True),
                   st.booleans(), st.lists(st.integers(), max_size=3),
                   st.fixed_dictionaries({"dist": st.sampled_from(["uniform", "normal", "x"]),
                                          "low": QUANTITY, "high": QUANTITY}))


def _document(pairs):
    document = {"demand": "1 kg"}
    for key, value in pairs:
        node = document
        *parents, last = key.split(".")
        for part in parents:
            child = node.get(part)
            if not isinstance(child, dict):
                child = node[part] = {}
            node = child
        node[last] = value
    return document


@pytest.fixture(autouse=True)
def demo_price_book(monkeypatch, tmp_path_factory):
    import co2routes.sources.prices as prices

    missing = tmp_path_factory.mktemp("book") / "none.toml"
    monkeypatch.setattr(prices, "user_book_path", lambda: missing)


@FAST
@given(pairs=st.lists(st.tuples(KEYS, VALUES), max_size=4))
def test_the_scenario_loader_gives_a_scenario_or_one_input_error(pairs):
    from co2routes.sources.scenario import validate

    start = time.perf_counter()
    try:
        scenario = validate(_document(pairs), "fuzz.toml")
    except InputError as err:
        assert "\n" not in str(err) and str(err).startswith("fuzz.toml")
    else:
        assert math.isfinite(scenario.co2_kg) and all(math.isfinite(w) for w in scenario.weights.values())
    assert time.perf_counter() - start < CALL_SECONDS


def _run(argv, capsys):
    start = time.perf_counter()
    try:
        code = main(argv)
    except SystemExit as done:  # argparse's own refusals
        code = done.code
    out, err = capsys.readouterr()
    assert time.perf_counter() - start < CALL_SECONDS * 3, argv
    assert code in (0, 2), (argv, err)
    assert "Traceback" not in out + err
    if code == 2:
        assert len(err.strip().splitlines()) == 1 and out == "", err
    return code, out


COMMANDS = sorted(c for c in BASES if c not in ("liquefy", "batch"))  # the slow two are in the catalogue


@settings(max_examples=8, deadline=None, suppress_health_check=list(HealthCheck))
@given(value=QUANTITY, which=st.integers(0, 10))
@pytest.mark.parametrize("command", COMMANDS)
def test_each_command_exits_0_or_2_with_finite_json(command, value, which, capsys):
    argv, options = BASES[command]
    option = options[which % len(options)]
    argv = list(argv)
    argv[argv.index(option) + 1] = value
    code, out = _run(argv + ["--json"], capsys)
    if code == 0:
        assert_finite(json.loads(out))


@settings(max_examples=6, deadline=None, suppress_health_check=list(HealthCheck))
@given(pairs=st.lists(st.tuples(KEYS, VALUES), max_size=3))
def test_compare_on_a_fuzzed_scenario_file_exits_0_or_2(pairs, tmp_path_factory, capsys):
    import tomli_w

    folder = tmp_path_factory.mktemp("fuzz")
    try:
        text = tomli_w.dumps(_document(pairs))
    except (TypeError, ValueError):
        return  # not writable as TOML (e.g. a NaN inside a list): nothing a file could hold
    (folder / "s.toml").write_text(text, encoding="utf-8")
    code, out = _run(["compare", str(folder / "s.toml"), "--json"], capsys)
    if code == 0:
        assert_finite(json.loads(out))


SHORT = st.one_of(st.text(max_size=12), st.integers(-5, 300).map(str), PIECES)
CHOICE_ARGS = {
    "compare": lambda v: ["compare", "--weight", v, "--json"],
    "batch": lambda v: ["batch", "purchase", "--option", v, "--json"],
    "sensitivity": lambda v: ["sensitivity", "--route", "purchase", "--top", v, "--json"],
    "uncertainty": lambda v: ["uncertainty", "--route", "purchase", "--samples", v, "--seed", "1", "--json"],
    "uncertainty-seed": lambda v: ["uncertainty", "--route", "purchase", "--samples", "20", "--seed", v, "--json"],
    "routes": lambda v: ["batch", v, "--json"],
    "reaction": lambda v: ["reaction", v, "--json"],
}


@settings(max_examples=8, deadline=None, suppress_health_check=list(HealthCheck))
@given(value=SHORT)
@pytest.mark.parametrize("which", sorted(CHOICE_ARGS))
def test_the_other_options_exit_0_or_2_with_finite_json(which, value, capsys):
    code, out = _run(CHOICE_ARGS[which](value), capsys)
    if code == 0:
        assert_finite(json.loads(out))

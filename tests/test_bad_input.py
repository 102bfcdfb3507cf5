"""The bad-input contract, case by case (README, "Bad input"): every hostile command line or file
of :mod:`bad_input_cases` ends with its expected exit status, a refusal is one line on stderr
naming the field, nothing is half printed, and no case takes long.

Run in-process through ``co2routes.tui.cli.main`` (no subprocess), so the whole catalogue stays
fast; the price book is the invented demo book unless a case replaces it.
"""

from __future__ import annotations

import json
import math
import sys
import time
from pathlib import Path

import pytest

from co2routes.tui.cli import main

sys.path.insert(0, str(Path(__file__).parent))
from bad_input_cases import all_cases  # noqa: E402

CASES = all_cases()
#: No case may take longer than this [s] (a hang is a failure, not a slow pass).
CASE_SECONDS = 10.0


def test_the_catalogue_is_large_enough():
    assert len(CASES) >= 150
    assert len({c[0] for c in CASES}) == len(CASES), "case ids must be unique"


@pytest.fixture(autouse=True)
def demo_price_book(monkeypatch, tmp_path):
    """Every case reads the demo price book, whatever the machine's user has set up."""
    import co2routes.sources.prices as prices

    monkeypatch.setattr(prices, "user_book_path", lambda: tmp_path / "no-user-book.toml")


def run_case(argv, files, folder: Path, capsys):
    for name, content in files.items():
        target = folder / name
        if isinstance(content, bytes):
            target.write_bytes(content)
        else:
            target.write_text(content, encoding="utf-8")
    argv = [a.replace("{d}", str(folder)) for a in argv]
    start = time.perf_counter()
    try:
        code = main(argv)
    except SystemExit as done:  # argparse's own refusals
        code = done.code
    seconds = time.perf_counter() - start
    out, err = capsys.readouterr()
    return code, out, err, seconds


def assert_contract(code, out, err, seconds, expected_code, field):
    assert seconds < CASE_SECONDS, f"took {seconds:.1f} s"
    assert "Traceback" not in err and "Traceback" not in out
    assert "\x1b" not in out and "\x1b" not in err, "a control character reached the terminal"
    assert code == expected_code, err
    if expected_code == 2:
        lines = err.strip().splitlines()
        assert len(lines) == 1, err
        assert "error:" in lines[0]
        if field is not None:
            assert field in lines[0].split("error:", 1)[1], lines[0]
        assert out == "", "a refused command printed part of an answer"
    if out.lstrip().startswith(("{", "[")):
        data = json.loads(out)  # whole, valid JSON (no NaN or Infinity tokens)
        assert_finite(data)


def assert_finite(data):
    if isinstance(data, float):
        assert math.isfinite(data)
    elif isinstance(data, dict):
        for value in data.values():
            assert_finite(value)
    elif isinstance(data, list):
        for value in data:
            assert_finite(value)


@pytest.mark.parametrize("case_id, argv, files, expected_code, field", CASES, ids=[c[0] for c in CASES])
def test_case(case_id, argv, files, expected_code, field, tmp_path, capsys):
    code, out, err, seconds = run_case(argv, files, tmp_path, capsys)
    assert_contract(code, out, err, seconds, expected_code, field)


@pytest.mark.parametrize("content, words", [
    (b"\xff\xfe\x00binary price book", "not text"),
    ("currency = \"EUR\"\n[prices]\nsucrose = \"nan / kg\"\n", "prices.sucrose"),
    ("currency = \"EUR\"\n[prices]\n" + "".join(f'k{i} = "1 / kg"\n' for i in range(5000)), "at most 500"),
    ("currency = \"EUR\"\nx = " + "[" * 3000 + "]" * 3000 + "\n", "deeper than"),
    ("currency = \"EUR\"\n[prices]\nsucrose = \"1 / kg**9**9**9\"\n", "no arithmetic"),
])
def test_a_broken_price_book_is_one_line_naming_it(content, words, tmp_path, monkeypatch, capsys):
    import co2routes.sources.prices as prices

    book = tmp_path / "prices.toml"
    book.write_bytes(content if isinstance(content, bytes) else content.encode())
    monkeypatch.setattr(prices, "user_book_path", lambda: book)
    code, out, err, seconds = run_case(["compare"], {}, tmp_path, capsys)
    assert_contract(code, out, err, seconds, 2, "price book")
    assert words in err and str(book) in err


def test_json_with_a_non_finite_figure_is_null_with_a_warning(capsys):
    from types import SimpleNamespace

    from co2routes.tui.output import emit

    import io

    out = io.StringIO()
    emit({"cost_per_kg": float("nan"), "rows": [{"time_h": float("inf")}], "warnings": []},
         SimpleNamespace(json=True), out)
    data = json.loads(out.getvalue())
    assert data["cost_per_kg"] is None and data["rows"][0]["time_h"] is None
    assert any("cost_per_kg" in w for w in data["warnings"])
    assert any("rows[0].time_h" in w for w in data["warnings"])


def test_a_scenario_name_with_escapes_reaches_the_terminal_clean(tmp_path, capsys):
    (tmp_path / "s.toml").write_text('name = "a\\u001b[2Jb\\u0007c"\ndemand = "1 kg"\n', encoding="utf-8")
    code, out, err, _ = run_case(["compare", str(tmp_path / "s.toml")], {}, tmp_path, capsys)
    assert code == 0 and "a[2Jbc" in out and "\x1b" not in out and "\x07" not in out


def test_the_relief_setting_is_checked_without_the_hot_day_curve(tmp_path, capsys):
    code, out, err, _ = run_case(["store", "--volume", "1 L", "--mass", "0.6 kg", "--temperature", "20 degC",
                                  "--relief-pressure", "10 bar"], {}, tmp_path, capsys)
    assert code == 0 and "relief" in out.lower() and "would open" in out


@pytest.mark.parametrize("text, dimension, si", [
    # the forms people type stay accepted; factors exact by definition (NIST SP 811, Appendix B)
    ("160 psi", "pressure", 160 * 6894.757293168361),
    ("0.5 W/m**2/K", "heat_transfer_coefficient", 0.5),
    ("0.5 W/(m**2 K)", "heat_transfer_coefficient", 0.5),
    ("2 m^3/h", "volume_flow", 2 / 3600.0),
    ("1.1 kg/L", "density", 1100.0),
    ("20°C", "temperature", 293.15),
    ("-4degF", "temperature", 253.15),
    ("5 delta_degC", "temperature_difference", 5.0),
    ("425 ppmv", "fraction", 425e-6),
    ("+2e-3 kg", "mass", 0.002),
    (".5 kg", "mass", 0.5),
    ("1.5kg", "mass", 1.5),
])
def test_ordinary_quantities_pass_the_text_checks(text, dimension, si):
    from co2routes.thermo.units import parse

    assert parse(text, "field", dimension) == pytest.approx(si, rel=1e-12)  # exact conversions


@pytest.mark.parametrize("text", ["9**9**9 K", "10**400 K", "(9**9)**9 K", "K**99", "2 degC * 3", "2 * 3 K",
                                  "3 K + 2 K", "1 / 2 K", "1" * 81, "1" * 25 + " K", "1e1234 K"])
def test_arithmetic_and_oversized_numbers_are_refused_at_once(text):
    from co2routes.thermo.errors import InputError
    from co2routes.thermo.units import parse

    start = time.perf_counter()
    with pytest.raises(InputError, match="^t: "):
        parse(text, "t", "temperature")
    assert time.perf_counter() - start < 1.0

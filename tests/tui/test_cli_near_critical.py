"""The near-critical region answers or explains (issue 11 item 2).

Every command that reaches CoolProp is swept over 28-31.1 degC and 60-80 bar: each call exits 0
with an answer or 2 with one line naming the field; never a traceback (exit 1). The pressure-
entropy flash of CoolProp 6.8 fails near 73.6 bar; the retry through (P, T) must answer.
Reference for the condensing pressure at 30.9 degC: saturation pressure of CO2 from Span & Wagner
(1996) (NIST Chemistry WebBook, 7.3640 MPa at 304.05 K), tolerance 0.1 %.
"""

from __future__ import annotations

import json

import pytest

from co2routes.tui.cli import main

TEMPERATURES_C = (28.0, 29.0, 30.0, 30.5, 30.9, 31.0, 31.1)
PRESSURES_BAR = (60.0, 65.0, 70.0, 72.0, 73.0, 73.5, 73.64, 74.0, 75.0, 80.0)


def _code(capsys, *argv):
    code = main([*argv, "--json"])
    out = capsys.readouterr()
    if code == 2:
        assert len(out.err.strip().splitlines()) == 1, out.err
    else:
        assert code == 0, out.err
        json.loads(out.out)
    return code


def test_liquefy_at_30_9_degc_answers(capsys):
    code = main(["liquefy", "--inlet-pressure", "1 atm", "--inlet-temperature", "20 degC",
                 "--condensing-temperature", "30.9 degC", "--json"])
    out = capsys.readouterr()
    assert code == 0, out.err
    a = json.loads(out.out)
    # NIST WebBook (Span & Wagner 1996): p_sat(30.9 degC) = 7.364 MPa; 0.1 %.
    assert a["condensing_pressure_pa"] == pytest.approx(7.364e6, rel=1e-3)


@pytest.mark.parametrize("t_c", TEMPERATURES_C)
def test_liquefy_sweep_near_critical(capsys, t_c):
    assert _code(capsys, "liquefy", "--inlet-pressure", "1 atm", "--inlet-temperature", "20 degC",
                 "--condensing-temperature", f"{t_c} degC", "--stages", "4") in (0, 2)


@pytest.mark.parametrize("t_c", TEMPERATURES_C)
def test_store_saturation_snow_sweep(capsys, t_c):
    for p in PRESSURES_BAR:
        assert _code(capsys, "store", "--volume", "10 L", "--pressure", f"{p} bar",
                     "--temperature", f"{t_c} degC") in (0, 2)
    assert _code(capsys, "saturation", "--temperature", f"{t_c} degC") in (0, 2)
    assert _code(capsys, "snow", "--liquid-temperature", f"{t_c} degC") in (0, 2)
    for p in PRESSURES_BAR:
        assert _code(capsys, "saturation", "--pressure", f"{p} bar") in (0, 2)
        assert _code(capsys, "moisture", "--temperature", f"{t_c} degC", "--pressure", f"{p} bar") in (0, 2)


@pytest.mark.parametrize("t_c", (28.0, 30.9, 31.1))
def test_dryer_near_critical(capsys, t_c):
    for p in (60.0, 73.5, 80.0):
        assert _code(capsys, "dryer", "--flow", "2 kg/day", "--inlet-temperature", f"{t_c} degC",
                     "--inlet-pressure", f"{p} bar", "--desiccant", "molecular-sieve-13x",
                     "--cycle", "8 h") in (0, 2)

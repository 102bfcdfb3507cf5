"""Water in gaseous, liquid and supercritical CO2 against measured water contents (issue 11).

The measured points are in ``data/water_in_co2_measured.csv`` (mole fraction of water in the
CO2-rich phase over liquid water). Their sources, named beside each check below:

* Meyer, C. W.; Harvey, A. H. (2015) "Dew-point measurements for water in compressed carbon
  dioxide", AIChE J. 61, 2913-2925, Table 2 (gravimetric hygrometer, expanded uncertainty about
  0.3 %): gaseous CO2, 5-50 bar. Used to FIT the gas-side water-CO2 attraction
  (``water_co2.a_h2o_co2``). The file's isotherm temperatures 294.83 K and 303.15 K were
  inferred (the typed copy the values were taken from labels them 293 and 304 K; at 5 bar, where
  the water content is p_sat/P times an enhancement of a few per cent, only 294.83 and 303.15 K
  are consistent); 313.15 K is as labelled.
* King, M. B.; Mubarak, A.; Kim, J. D.; Bott, T. R. (1992) J. Supercrit. Fluids 5, 296-302:
  liquid CO2 at 15, 20 and 25 degC and supercritical CO2 at 35 and 40 degC, 51.7-202.7 bar
  (pressures printed in atm). Not used in this project's fit (Spycher et al. 2003 fitted their
  dense-CO2 constant to data of this kind).
* Jooss, Y. et al. (2026) "Water content of the carbon dioxide-rich phase in CO2+H2O and
  CO2+H2O+NaCl systems", Fluid Phase Equilib. 599, 114516, Table 4: 35 degC, 10-90 bar, gas and
  supercritical, expanded uncertainty 2-19 %. Used in no fit: the independent check.
* Valtz, A. et al. (2004) Fluid Phase Equilib. 226, 333-344 and Hou, Maitland & Trusler (2013)
  are in the file but marked ``excluded``: Valtz's water contents are printed to one or two
  figures and two of its 15 degC points lie below the ideal-mixing bound p_sat/P, which no
  real mixture can (checked below); Hou's were printed as 1 - y_CO2 to five decimals, so the
  water content carries two figures at best.

The values were taken from a public typed copy of these tables (not from the papers directly);
each point's source is its first column.
"""

from __future__ import annotations

import csv
import math
from pathlib import Path

import pytest

from co2routes.thermo import water, water_co2

DATA = Path(__file__).with_name("data") / "water_in_co2_measured.csv"


def _rows(use: str | None = None, source: str | None = None) -> list[dict]:
    with DATA.open(newline="") as f:
        rows = list(csv.DictReader(f))
    return [r for r in rows if (use is None or r["use"] == use) and (source is None or r["source"] == source)]


def _model(row: dict) -> float:
    w = water_co2.saturated_water_in_co2(float(row["temperature_k"]), float(row["pressure_bar"]) * 1e5)
    return w.water_ppmv * 1e-6


def _case_id(row: dict) -> str:
    return f"{row['source']}-{row['temperature_k']}K-{row['pressure_bar']}bar"


@pytest.mark.parametrize("row", _rows("check") + _rows("fit"), ids=_case_id)
def test_within_10_percent_of_measured_water_content(row):
    # Meyer & Harvey (2015), King et al. (1992), Jooss et al. (2026): 10 % (issue 11's bound),
    # 15-40 degC, 5-203 bar, gas, liquid and supercritical CO2.
    measured = float(row["water_mole_fraction"])
    assert _model(row) == pytest.approx(measured, rel=0.10)


def test_every_phase_is_covered_at_15_to_40_degc_up_to_100_bar():
    # The check set spans what the issue asks: each CO2 phase, 15-40 degC, pressures to 100 bar.
    rows = [r for r in _rows("check") + _rows("fit") if float(r["pressure_bar"]) <= 101.4]
    phases = {r["co2_phase"] for r in rows}
    assert phases == {"gas", "liquid", "supercritical"}
    temps = [float(r["temperature_k"]) - 273.15 for r in rows]
    assert min(temps) <= 15.01 and max(temps) >= 39.99
    for r in rows:  # the file's phase is CoolProp's (Span & Wagner 1996)
        w = water_co2.saturated_water_in_co2(float(r["temperature_k"]), float(r["pressure_bar"]) * 1e5)
        assert w.co2_phase == r["co2_phase"]


def test_independent_check_jooss_2026_within_its_uncertainty_band():
    # Jooss et al. (2026) Table 4, never used in a fit: 8 % (their expanded uncertainties run 2-19 %).
    for row in _rows(source="jooss_2026"):
        assert _model(row) == pytest.approx(float(row["water_mole_fraction"]), rel=0.08)


def test_gas_constants_are_what_meyer_and_harvey_give():
    # Least squares (log y) of the model on Meyer & Harvey (2015) Table 2 recovers the constants
    # in the code: 0.1 % on a_gas(303.15 K), 2 % on its slope.
    from scipy.optimize import least_squares

    rows = _rows("fit", "meyer_harvey_2015")
    saved = water_co2.A_H2O_CO2_GAS_303, water_co2.A_H2O_CO2_GAS_SLOPE

    def residuals(p):
        water_co2.A_H2O_CO2_GAS_303, water_co2.A_H2O_CO2_GAS_SLOPE = p[0] * 1e7, p[1] * 1e5
        water_co2.saturated_water_in_co2.cache_clear()
        return [math.log(_model(r) / float(r["water_mole_fraction"])) for r in rows]

    try:
        fit = least_squares(residuals, [8.0, -1.0]).x
    finally:
        water_co2.A_H2O_CO2_GAS_303, water_co2.A_H2O_CO2_GAS_SLOPE = saved
        water_co2.saturated_water_in_co2.cache_clear()
    assert fit[0] * 1e7 == pytest.approx(saved[0], rel=1e-3)
    assert fit[1] * 1e5 == pytest.approx(saved[1], rel=0.02)


def test_published_constants_alone_run_low_in_dense_gas():
    # Why the gas-side constant exists: with Spycher et al.'s single a_H2O-CO2 = 7.89e7 (and the
    # Redlich-Kwong volume) water at 21.7 degC and 50 bar comes out more than 10 % below Meyer &
    # Harvey (2015); with it, within 3 %.
    row = next(r for r in _rows("fit", "meyer_harvey_2015")
               if r["temperature_k"] == "294.83" and r["pressure_bar"] == "50")
    measured = float(row["water_mole_fraction"])
    t, p_bar = 294.83, 50.0
    v, _phase = water_co2.co2_molar_volume_cm3(t, p_bar * 1e5)
    a_co2 = 7.54e7 - 4.13e4 * t
    ln_phi = water_co2._ln_phi(t, p_bar, v, a_co2, water_co2.A_H2O_CO2, water_co2.B_H2O)
    p_sat = water.vapor_pressure(t) / 1e5
    published_a = p_sat / (math.exp(ln_phi) * p_bar) * math.exp((p_bar - p_sat) * 18.1 / (83.1447 * t))
    assert published_a < 0.9 * measured
    assert _model(row) == pytest.approx(measured, rel=0.03)


def test_excluded_valtz_points_fall_below_the_ideal_mixing_bound():
    # IAPWS-95 p_sat / P is a lower bound (the enhancement of water in CO2 exceeds 1); two of
    # Valtz et al.'s (2004) 15 degC points lie below it, the reason the set is excluded.
    below = [r for r in _rows("excluded", "valtz_2004")
             if float(r["water_mole_fraction"]) * 1e6
             < water.saturated_ppmv(float(r["temperature_k"]), float(r["pressure_bar"]) * 1e5)]
    assert len(below) >= 2


def test_dew_point_of_measured_gas_is_its_saturation_temperature():
    # Meyer & Harvey (2015) Table 2: CO2 saturated at 21.7 degC and 50 bar holds 1024 ppm; its
    # dew point at 50 bar is that temperature (0.5 K), found on the gas side although below the
    # CO2's own condensation point (14.3 degC at 50 bar) a second root exists in liquid CO2.
    row = next(r for r in _rows("fit", "meyer_harvey_2015")
               if r["temperature_k"] == "294.83" and r["pressure_bar"] == "50")
    ppmv = float(row["water_mole_fraction"]) * 1e6
    assert water_co2.dew_point_in_co2(ppmv, 50e5) == pytest.approx(294.83, abs=0.5)

"""The options ``store`` and ``snow`` gained for storage and dry ice: hot-day curve, fill from a
buffer, overfill refusal, liquid/vapour draw, box storage loss, raw CO2 per kg of dry ice.

Sources: 49 CFR 173.304a (0.68 kg/L filling density for CO2); NIST Chemistry WebBook saturation
pressures (0 degC 3.4851 MPa, -10 degC 2.6487 MPa); Giauque & Egan (1937) 573.3 kJ/kg enthalpy of
sublimation; hand calculations named beside each assert.
"""

from __future__ import annotations

import pytest

from co2routes.thermo import cautions
from clihelp import run_json
from co2routes.tui.cli import main


def fails(capsys, *argv):
    code = main([*argv, "--json"])
    err = capsys.readouterr().err
    assert code == 2
    assert err.count("\n") == 1
    return err


CYL = ["store", "--volume", "13.4 L", "--temperature", "20 degC"]


def test_store_keeps_old_keys_and_adds_max_charge(capsys):
    a = run_json(capsys, *CYL, "--mass", "9 kg")
    for key in ("volume_l", "temperature_k", "co2_mass_kg", "pressure_pa", "phase",
                "fill_density_kg_l", "liquid_volume_fraction", "warnings", "cautions"):
        assert key in a
    assert a["max_safe_charge_kg"] == pytest.approx(0.68 * 13.4, rel=1e-12)  # 49 CFR 173.304a


def test_store_overfill_is_answered_with_its_danger(capsys):
    # A question about a state: 10 kg in 13.4 L (0.746 kg/L, over 49 CFR 173.304a's 0.68) gets its
    # pressure with the danger as a warning, with or without --force.
    a = run_json(capsys, *CYL, "--mass", "10 kg")
    assert any("burst" in w and "173.304a" in w for w in a["warnings"])
    assert a["pressure_pa"] > 0
    assert run_json(capsys, *CYL, "--mass", "10 kg", "--force")["pressure_pa"] == a["pressure_pa"]


def test_store_hot_day_curve(capsys):
    a = run_json(capsys, *CYL, "--mass", "9 kg", "--hot-day-curve", "--rated-pressure", "1800 psi",
                 "--relief-pressure", "3000 psi")
    curve = a["hot_day_curve"]
    assert curve[0]["temperature_k"] == pytest.approx(263.15)
    assert curve[-1]["temperature_k"] == pytest.approx(328.15)  # 55 degC hot day
    assert curve[0]["pressure_pa"] == pytest.approx(2.6487e6, rel=5e-4)  # NIST p_sat(-10 degC)
    assert a["hot_day_pressure_pa"] == curve[-1]["pressure_pa"]
    assert a["rated_pressure_pa"] == pytest.approx(1800 * 6894.757, rel=1e-6)
    assert a["liquid_full_temperature_k"] < a["rated_reached_temperature_k"]
    assert any(p["above_rated"] for p in curve)
    assert cautions.CYLINDER_HEAT in a["cautions"]


def test_store_fill_from_buffer_into_iced_cylinder(capsys):
    a = run_json(capsys, "store", "--volume", "13.4 L", "--pressure", "1 atm", "--temperature",
                 "0 degC", "--buffer-volume", "200 L", "--buffer-pressure", "50 bar",
                 "--buffer-temperature", "25 degC")
    # Iced cylinder: gas condenses at p_sat(0 degC) = 3.4851 MPa (NIST), tolerance 0.05 %.
    assert a["transfer_final_pressure_pa"] == pytest.approx(3.4851e6, rel=5e-4)
    # Mass conservation (exact to rounding).
    assert a["buffer_final_mass_kg"] + a["cylinder_final_mass_kg"] == pytest.approx(
        a["buffer_initial_mass_kg"] + a["co2_mass_kg"], rel=1e-9)
    assert any("isothermal" in w for w in a["warnings"])
    assert any("filling ratio" in w for w in a["warnings"])


def test_store_buffer_needs_both_options(capsys):
    err = fails(capsys, *CYL, "--pressure", "1 atm", "--buffer-volume", "50 L")
    assert "--buffer-pressure" in err


def test_snow_keeps_old_keys_and_compares_draws(capsys):
    a = run_json(capsys, "snow", "--liquid-temperature", "20 degC", "--liquid-mass", "10 kg")
    for key in ("liquid_temperature_k", "liquid_pressure_pa", "solid_fraction", "solid_mass_kg",
                "vapor_mass_kg", "solid_temperature_k"):
        assert key in a
    assert a["draw"] == "liquid" and a["solid_fraction"] == a["liquid_draw_solid_fraction"]
    assert a["vapor_draw_solid_fraction"] < 0.1 * a["liquid_draw_solid_fraction"]
    # Mass balance: raw CO2 per kg of dry ice = 1 / x with no losses.
    assert a["raw_co2_kg_per_kg"] == pytest.approx(1 / a["solid_fraction"], rel=1e-12)


def test_snow_vapour_draw_at_0_degC_makes_none(capsys):
    # NIST h_g(0 degC) 430.89 kJ/kg is above the 1 atm vapour enthalpy at 194.7 K: no solid.
    a = run_json(capsys, "snow", "--liquid-temperature", "0 degC", "--liquid-mass", "10 kg",
                 "--draw", "vapor")
    assert a["solid_fraction"] == 0.0 and a["solid_mass_kg"] == 0.0
    assert a["raw_co2_kg_per_kg"] is None


def test_snow_box_storage_loss(capsys):
    # U A (T_amb - T_s) / 573.3 kJ/kg: 0.5 x 1.0 x (293.15 - 194.686) = 49.23 W -> 7.42 kg/day
    a = run_json(capsys, "snow", "--liquid-temperature", "20 degC", "--liquid-mass", "100 kg",
                 "--box-area", "1 m**2", "--box-u", "0.5 W/m**2/K", "--hold-time", "1 day",
                 "--transfer-loss", "5 %")
    assert a["storage_heat_leak_w"] == pytest.approx(49.23, abs=0.01)
    assert a["storage_loss_kg_per_day"] == pytest.approx(49.232 / 573.3e3 * 86400, rel=1e-3)
    x = a["solid_fraction"]
    kept = a["remaining_after_hold_kg"] / a["stored_mass_kg"]
    assert a["raw_co2_kg_per_kg"] == pytest.approx(1 / (x * 0.95 * kept), rel=1e-9)


@pytest.mark.parametrize("extra, option", [
    (["--box-area", "1 m**2"], "--box-u"),
    (["--box-area", "1 m**2", "--box-u", "0.5 W/m**2/K", "--ambient-temperature", "-90 degC"],
     "--ambient-temperature"),
    (["--transfer-loss", "120 %"], "--transfer-loss"),
])
def test_snow_bad_input(capsys, extra, option):
    err = fails(capsys, "snow", "--liquid-temperature", "20 degC", "--liquid-mass", "1 kg", *extra)
    assert option in err

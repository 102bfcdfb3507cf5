"""The CO2-state verbs through ``co2routes.tui.cli.main``: saturation, store, snow, moisture."""

from __future__ import annotations

import pytest

from co2routes.thermo import cautions
from clihelp import run_json
from co2routes.tui.cli import COMMANDS, main


def test_verbs_are_registered():
    for verb in ("saturation", "store", "snow", "moisture"):
        assert verb in COMMANDS


# --- saturation -------------------------------------------------------------------------------------

def test_saturation_by_temperature(capsys):
    # NIST Chemistry WebBook (Span & Wagner 1996): 0 degC 3.4851 MPa, 927.4 / 97.65 kg/m3
    answer = run_json(capsys, "saturation", "--temperature", "0 degC")
    assert answer["temperature_k"] == pytest.approx(273.15)
    assert answer["pressure_pa"] == pytest.approx(3.4851e6, abs=100)
    assert answer["liquid_density_kg_m3"] == pytest.approx(927.4, abs=0.1)
    assert answer["vapor_density_kg_m3"] == pytest.approx(97.65, abs=0.01)
    assert cautions.PRESSURE in answer["cautions"]
    assert answer["warnings"] == []


def test_saturation_by_pressure_in_psi(capsys):
    # common practice: about 930 psi at 25 degC (NIST WebBook 6.4342 MPa = 933.2 psia); 0.05 K
    answer = run_json(capsys, "saturation", "--pressure", "933.2 psi")
    assert answer["temperature_k"] == pytest.approx(298.15, abs=0.05)


def test_saturation_table_output(capsys):
    assert main(["saturation", "--temperature", "25 degC"]) == 0
    out = capsys.readouterr().out
    assert "bar" in out and "psi" in out and "caution:" in out


@pytest.mark.parametrize(
    "argv, option",
    [
        (["saturation", "--temperature", "-60 degC"], "--temperature"),   # below the triple point
        (["saturation", "--temperature", "35 degC"], "--temperature"),    # above the critical point
        (["saturation", "--pressure", "2 bar"], "--pressure"),
        (["saturation", "--pressure", "80 bar"], "--pressure"),
        (["saturation", "--temperature", "20 kg"], "--temperature"),      # wrong unit
    ],
)
def test_saturation_bad_input(capsys, argv, option):
    assert main(argv) == 2
    err = capsys.readouterr().err
    assert f"{option}:" in err and err.count("\n") == 1


# --- store ------------------------------------------------------------------------------------------

def test_store_two_phase_cylinder(capsys):
    # 9 kg in 13.4 L at 20 degC: liquid under vapour at p_sat(20 degC) = 5.7291 MPa (NIST WebBook)
    answer = run_json(capsys, "store", "--volume", "13.4 L", "--mass", "9 kg", "--temperature", "20 degC")
    assert answer["phase"] == "two-phase"
    assert answer["pressure_pa"] == pytest.approx(5.7291e6, rel=2e-4)
    assert answer["volume_l"] == pytest.approx(13.4)
    assert answer["fill_density_kg_l"] == pytest.approx(9 / 13.4)
    assert answer["co2_mass_kg"] == pytest.approx(9.0)
    assert cautions.PRESSURE in answer["cautions"] and cautions.CYLINDER_HEAT in answer["cautions"]
    assert cautions.ASPHYXIATION in answer["cautions"]
    assert not any("0.68" in w for w in answer["warnings"])


def test_store_overfilled_and_over_rated(capsys):
    # 49 CFR 173.304a: 0.68 kg/L. 10 kg in 13.4 L (0.746 kg/L) at 30 degC is liquid-full at about
    # 90 bar (1314 psi): above a 1000 psi rating, so both warnings must appear
    answer = run_json(capsys, "store", "--volume", "13.4 L", "--mass", "10 kg", "--temperature",
                      "30 degC", "--rated-pressure", "1000 psi", "--force")  # overfill refused without
    assert answer["phase"] == "liquid"
    assert any("0.68 kg/L" in w and "173.304a" in w for w in answer["warnings"])
    assert any("rated pressure" in w for w in answer["warnings"])
    assert any("liquid-full" in w for w in answer["warnings"])


def test_store_by_pressure_common_practice_sphere(capsys):
    # common practice: a 0.61 m (24 in) sphere (about 118 L) holds about 0.22 kg of CO2 at room
    # conditions; 0.01 kg
    answer = run_json(capsys, "store", "--volume", "118.9 L", "--pressure", "1 atm", "--temperature", "20 degC")
    assert answer["phase"] == "gas"
    assert answer["co2_mass_kg"] == pytest.approx(0.22, abs=0.01)
    assert cautions.PRESSURE in answer["cautions"]


@pytest.mark.parametrize(
    "argv, option",
    [
        (["store", "--volume", "-1 L", "--mass", "1 kg", "--temperature", "20 degC"], "--volume"),
        (["store", "--volume", "0 L", "--mass", "1 kg", "--temperature", "20 degC"], "--volume"),
        (["store", "--volume", "1 L", "--mass", "0 kg", "--temperature", "20 degC"], "--mass"),
        (["store", "--volume", "1 L", "--mass", "-2 kg", "--temperature", "20 degC"], "--mass"),
        (["store", "--volume", "1 L", "--mass", "1 kg", "--temperature", "-70 degC"], "--temperature"),
        (["store", "--volume", "1 kg", "--mass", "1 kg", "--temperature", "20 degC"], "--volume"),
        (["store", "--volume", "1 L", "--mass", "1.6 kg", "--temperature", "-20 degC"], "--mass"),
        (["store", "--volume", "1 L", "--pressure", "57.29 bar", "--temperature", "20 degC"], "--pressure"),
    ],
)
def test_store_bad_input(capsys, argv, option):
    assert main(argv) == 2
    err = capsys.readouterr().err
    assert f"{option}:" in err and err.count("\n") == 1


# --- snow -------------------------------------------------------------------------------------------

def test_snow_with_mass(capsys):
    # docs/references.md (C): +20 degC liquid gives 0.29 dry ice; 0.006
    answer = run_json(capsys, "snow", "--liquid-temperature", "20 degC", "--liquid-mass", "10 kg")
    assert answer["solid_fraction"] == pytest.approx(0.29, abs=0.006)
    assert answer["solid_mass_kg"] + answer["vapor_mass_kg"] == pytest.approx(10.0)
    for c in (cautions.DRY_ICE, cautions.COLD_LIQUID, cautions.ASPHYXIATION):
        assert c in answer["cautions"]


def test_snow_by_pressure_without_mass(capsys):
    # docs/references.md (C): 0 degC liquid (34.85 bar) gives 0.39; masses unknown without a mass
    answer = run_json(capsys, "snow", "--liquid-pressure", "34.85 bar")
    assert answer["liquid_temperature_k"] == pytest.approx(273.15, abs=0.02)
    assert answer["solid_fraction"] == pytest.approx(0.39, abs=0.006)
    assert answer["solid_mass_kg"] is None and answer["vapor_mass_kg"] is None


@pytest.mark.parametrize(
    "argv, option",
    [
        (["snow", "--liquid-temperature", "40 degC"], "--liquid-temperature"),
        (["snow", "--liquid-temperature", "-60 degC"], "--liquid-temperature"),
        (["snow", "--liquid-pressure", "100 bar"], "--liquid-pressure"),
        (["snow", "--liquid-temperature", "20 degC", "--liquid-mass", "-1 kg"], "--liquid-mass"),
        (["snow", "--liquid-temperature", "20 degC", "--liquid-mass", "1 L"], "--liquid-mass"),
    ],
)
def test_snow_bad_input(capsys, argv, option):
    assert main(argv) == 2
    err = capsys.readouterr().err
    assert f"{option}:" in err and err.count("\n") == 1


# --- moisture ---------------------------------------------------------------------------------------

def test_moisture_from_frost_point(capsys):
    # docs/references.md: 20 ppmv at 1 atm has a frost point of about -55.3 degC; 0.5 ppmv
    answer = run_json(capsys, "moisture", "--dew-point=-55.3 degC")
    assert answer["water_ppmv"] == pytest.approx(20.0, abs=0.5)
    assert answer["frost_point"] is True
    assert answer["pressure_pa"] == pytest.approx(101325.0)
    assert any("frost point" in w for w in answer["warnings"])


def test_moisture_saturated_bubbler(capsys):
    # gas leaving a bubbler at 25 degC, 1 atm: ideal mixing 1e6 * 3.1699 kPa / 101.325 kPa (IAPWS-95
    # Table 13.1) times the enhancement of Spycher et al. (2003), about 1.01 at 1 atm; 1.5 %.
    answer = run_json(capsys, "moisture", "--temperature", "25 degC")
    assert answer["water_ppmv"] == pytest.approx(1e6 * 3169.9 / 101325.0, rel=1.5e-2)
    assert answer["water_ppmv"] > 1e6 * 3169.9 / 101325.0
    assert answer["dew_point_k"] == pytest.approx(298.15)
    assert answer["water_g_per_kg_co2"] == pytest.approx(13.22, rel=1.5e-2)
    assert answer["co2_phase"] == "gas"


def test_moisture_at_pressure_carries_pressure_caution(capsys):
    # IAPWS-95 ideal mixing 3169.9 ppmv at 10 bar, raised by the non-ideality of compressed CO2:
    # Meyer & Harvey (2015) measure 1.10 times ideal at 10 bar (21.7 and 30 degC); 1.05 to 1.15.
    answer = run_json(capsys, "moisture", "--temperature", "25 degC", "--pressure", "10 bar")
    assert 1.05 < answer["water_ppmv"] / (1e6 * 3169.9 / 1e6) < 1.15
    assert cautions.PRESSURE in answer["cautions"]


@pytest.mark.parametrize(
    "argv, option",
    [
        (["moisture", "--temperature", "120 degC"], "--temperature"),   # steam at 1 atm
        (["moisture", "--dew-point=-200 degC"], "--dew-point"),
        (["moisture", "--temperature", "25 degC", "--pressure", "-1 bar"], "--pressure"),
        (["moisture", "--temperature", "25 psi"], "--temperature"),
    ],
)
def test_moisture_bad_input(capsys, argv, option):
    assert main(argv) == 2
    err = capsys.readouterr().err
    assert f"{option}:" in err and err.count("\n") == 1


def test_moisture_in_liquid_co2_names_the_phase(capsys):
    # Spycher et al. (2003) model: about 2,600 ppmv in liquid CO2 at 20 degC, 60 bar (ideal mixing
    # gave 390); 5 %. The phase is CoolProp's (Span & Wagner 1996): liquid.
    answer = run_json(capsys, "moisture", "--temperature", "20 degC", "--pressure", "60 bar")
    assert answer["co2_phase"] == "liquid"
    assert answer["water_ppmv"] == pytest.approx(2640.0, rel=0.05)
    assert any("liquid" in w for w in answer["warnings"])


def test_moisture_at_plus_0_01_degc_is_a_dew_point(capsys):
    # IAPWS-95: 0.01 degC is the triple point of water; liquid water, not ice, so not a frost point.
    answer = run_json(capsys, "moisture", "--dew-point", "0.01 degC")
    assert answer["frost_point"] is False
    assert not any("frost point" in w for w in answer["warnings"])


def test_store_names_supercritical_above_the_critical_temperature(capsys):
    # Span & Wagner (1996): critical point 31.0 degC, 73.77 bar; at 35 degC and 60 bar there is
    # no liquid at any pressure and the fluid is dense (about 190 kg/m3): supercritical, not gas.
    answer = run_json(capsys, "store", "--volume", "10 L", "--pressure", "60 bar", "--temperature", "35 degC")
    assert answer["phase"] == "supercritical"


def test_store_warns_near_the_critical_point(capsys):
    answer = run_json(capsys, "store", "--volume", "10 L", "--pressure", "72 bar", "--temperature", "30 degC")
    assert any("critical point" in w for w in answer["warnings"])
    far = run_json(capsys, "store", "--volume", "10 L", "--pressure", "20 bar", "--temperature", "20 degC")
    assert not any("critical point" in w for w in far["warnings"])

"""``co2routes calcination (--temperature T | --co2-pressure P)``: the CaCO3/CaO/CO2 equilibrium."""

from __future__ import annotations

import argparse

NAME = "calcination"
HELP = "equilibrium CO2 pressure over limestone and lime at a temperature, or the reverse"


def add_arguments(parser: argparse.ArgumentParser) -> None:
    """Options of ``calcination``."""
    from co2routes.tui.commands._options import add_either

    add_either(parser, ("--temperature", "T", "kiln temperature, e.g. '900 degC' (427-1100 degC)"),
               ("--co2-pressure", "P", "CO2 partial pressure over the charge, e.g. '1 atm' or '425 ppm * 1 atm'"))


def run(args: argparse.Namespace) -> dict:
    """The equilibrium point's JSON answer."""
    from co2routes.thermo import cautions
    from co2routes.thermo.calcination import calcination_temperature, co2_pressure_over_calcite
    from co2routes.tui.commands._options import for_option, given, typed_text

    option, value = given(args, ("--temperature", "temperature"), ("--co2-pressure", "pressure+"))
    with for_option(option, typed_text(args, option), value):
        point = (co2_pressure_over_calcite if option == "--temperature" else calcination_temperature)(value)
    warnings = [
        "Equilibrium for pure calcite: kilns run hotter than this to calcine at a useful rate "
        "(common practice)."
    ]
    said = [cautions.HOT_SURFACE, cautions.LIME_DUST, cautions.ASPHYXIATION]
    if point.co2_pressure_pa > 101325.0:  # a closed retort above 1 atm is a pressure vessel
        said.append(cautions.PRESSURE)
    return {
        "temperature_k": point.temperature_k,
        "co2_pressure_pa": point.co2_pressure_pa,
        "delta_h_kj_per_mol": point.delta_h_j_per_mol / 1000.0,
        "warnings": warnings,
        "cautions": said,
    }

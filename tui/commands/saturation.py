"""``co2routes saturation``: the liquid-vapour saturation point of CO2 at a temperature or pressure."""

from __future__ import annotations

import argparse

NAME = "saturation"
HELP = "CO2 saturation pressure and liquid/vapour densities at a temperature, or the temperature at a pressure"


def add_arguments(parser: argparse.ArgumentParser) -> None:
    """Options of ``saturation``."""
    from co2routes.tui.commands._options import add_either

    add_either(parser, ("--temperature", "T", "liquid temperature, e.g. '20 degC' (-56.56 to 30.98 degC)"),
               ("--pressure", "P", "absolute pressure, e.g. '50 bar' (5.18 to 73.77 bar)"))


def run(args: argparse.Namespace) -> dict:
    """The saturation point as the JSON answer."""
    from co2routes.thermo import cautions, co2
    from co2routes.tui.commands._options import for_option, given, typed_text

    option, value = given(args, ("--temperature", "temperature"), ("--pressure", "pressure"))
    with for_option(option, typed_text(args, option), value):
        sat = (co2.saturation_at_temperature if option == "--temperature" else co2.saturation_at_pressure)(value)
    warnings = []
    if co2.CRITICAL_TEMPERATURE_K - sat.temperature_k < 2.0:
        warnings.append("Within 2 K of the critical point (30.98 degC): liquid and vapour densities "
                        "converge and properties change steeply with temperature.")
    return {
        "temperature_k": sat.temperature_k,
        "pressure_pa": sat.pressure_pa,
        "liquid_density_kg_m3": sat.liquid_density_kg_m3,
        "vapor_density_kg_m3": sat.vapor_density_kg_m3,
        "enthalpy_of_vaporization_kj_per_kg": sat.enthalpy_of_vaporization_j_kg / 1e3,
        "warnings": warnings,
        "cautions": [cautions.PRESSURE, cautions.CYLINDER_HEAT],
    }

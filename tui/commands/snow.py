"""``co2routes snow``: how much of a liquid CO2 charge becomes dry ice when released to the air."""

from __future__ import annotations

import argparse

NAME = "snow"
HELP = "dry-ice (snow) fraction of saturated liquid CO2 released to 1 atm"


def add_arguments(parser: argparse.ArgumentParser) -> None:
    """Options of ``snow``."""
    group = parser.add_mutually_exclusive_group(required=True)
    group.add_argument("--liquid-temperature", metavar="T",
                       help="temperature of the saturated liquid, e.g. '20 degC' (-56.56 to 30.98 degC)")
    group.add_argument("--liquid-pressure", metavar="P",
                       help="pressure of the saturated liquid, e.g. '57 bar' (5.18 to 73.77 bar)")
    parser.add_argument("--liquid-mass", metavar="M", help="liquid released, e.g. '10 kg'")


def run(args: argparse.Namespace) -> dict:
    """The flash result as the JSON answer."""
    from thermo import cautions, flash
    from thermo.units import parse, parse_positive
    from tui.commands._options import for_option

    mass = None if args.liquid_mass is None else parse_positive(args.liquid_mass, "--liquid-mass", "mass")
    if args.liquid_temperature is not None:
        t = parse(args.liquid_temperature, "--liquid-temperature", "temperature")
        with for_option("--liquid-temperature"):
            result = flash.flash_at_temperature(t, mass)
    else:
        p = parse(args.liquid_pressure, "--liquid-pressure", "pressure")
        with for_option("--liquid-pressure"):
            result = flash.flash_at_pressure(p, mass)
    warnings = [
        "The fraction is the adiabatic ideal: snow horns and bags collect less, since some snow is "
        "carried off with the gas and warm surfaces sublime it."
    ]
    return {
        "liquid_temperature_k": result.liquid_temperature_k,
        "liquid_pressure_pa": result.liquid_pressure_pa,
        "solid_fraction": result.solid_fraction,
        "solid_mass_kg": result.solid_mass_kg,
        "vapor_mass_kg": result.vapor_mass_kg,
        "solid_temperature_k": result.solid_temperature_k,
        "warnings": warnings,
        "cautions": [cautions.DRY_ICE, cautions.COLD_LIQUID, cautions.ASPHYXIATION, cautions.PRESSURE],
    }

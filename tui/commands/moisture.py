"""``co2routes moisture``: water carried by CO2 gas, from its temperature (saturated) or dew point."""

from __future__ import annotations

import argparse

NAME = "moisture"
HELP = "water in CO2 gas: saturated at a temperature (as leaving a bubbler) or at a dew/frost point"


def add_arguments(parser: argparse.ArgumentParser) -> None:
    """Options of ``moisture``."""
    group = parser.add_mutually_exclusive_group(required=True)
    group.add_argument("--temperature", metavar="T",
                       help="temperature of gas saturated with water, e.g. '25 degC' (as leaving a bubbler)")
    group.add_argument("--dew-point", metavar="T",
                       help="dew point of the gas, e.g. '-40 degC' (a frost point below 0 degC)")
    parser.add_argument("--pressure", metavar="P", default="1 atm",
                        help="absolute total pressure of the gas (default '1 atm')")


def run(args: argparse.Namespace) -> dict:
    """The gas's water content as the JSON answer."""
    from co2routes.thermo import cautions, water
    from co2routes.thermo.units import parse, parse_positive
    from co2routes.tui.commands._options import for_option

    p = parse_positive(args.pressure, "--pressure", "pressure")
    option, text = (("--temperature", args.temperature) if args.temperature is not None
                    else ("--dew-point", args.dew_point))
    t = parse(text, option, "temperature")
    with for_option(option, text, t):
        m = water.moisture_from_dew_point(t, p)
    warnings = ["Ideal mixing, no enhancement factor: real gas near saturation holds a few per cent "
                "more water, more at high pressure."]
    if m.over_ice:
        warnings.append("Below 0 degC the dew point is a frost point: the water deposits as ice.")
    answer_cautions = [cautions.ASPHYXIATION]
    if p > 1.5 * 101325.0:
        answer_cautions.insert(0, cautions.PRESSURE)
    return {
        "water_g_per_kg_co2": m.water_g_per_kg_co2,
        "water_ppmv": m.water_ppmv,
        "dew_point_k": m.dew_point_k,
        "frost_point": m.over_ice,
        "pressure_pa": m.pressure_pa,
        "warnings": warnings,
        "cautions": answer_cautions,
    }

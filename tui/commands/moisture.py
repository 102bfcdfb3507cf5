"""``co2routes moisture``: water carried by CO2 at any pressure, from its temperature (saturated) or dew point."""

from __future__ import annotations

import argparse

NAME = "moisture"
HELP = ("water in CO2 (gas, liquid or supercritical): saturated at a temperature (as leaving a "
        "bubbler) or at a dew/frost point, at any pressure up to 600 bar")


def add_arguments(parser: argparse.ArgumentParser) -> None:
    """Options of ``moisture``."""
    from co2routes.tui.commands._options import add_either

    add_either(parser, ("--temperature", "T", "temperature of gas saturated with water, e.g. '25 degC' (as leaving a bubbler)"),
               ("--dew-point", "T", "dew point of the gas, e.g. '-40 degC' (a frost point below 0 degC)"))
    parser.add_argument("--pressure", metavar="P", default="1 atm",
                        help="absolute total pressure of the gas (default '1 atm')")


def run(args: argparse.Namespace) -> dict:
    """The gas's water content as the JSON answer (Spycher et al. 2003 model, CO2 phase named)."""
    from co2routes.thermo import cautions, water_co2
    from co2routes.thermo.units import parse_positive
    from co2routes.tui.commands._options import for_option, given, typed_text

    p = parse_positive(args.pressure, "--pressure", "pressure")
    option, t = given(args, ("--temperature", "temperature"), ("--dew-point", "temperature"))
    dew = args.temperature is None
    with for_option(option, typed_text(args, option), t):
        w = water_co2.saturated_water_in_co2(t, p, vapour=dew)
    warnings = water_co2.warnings_for(w)
    condensing = water_co2.co2_condenses_first(t, p) if dew else None
    if condensing is not None:
        warnings.insert(0, f"At {p / 1e5:.4g} bar the CO2 itself condenses below {condensing - 273.15:.1f} "
                        "degC, above this dew point: the dew point is reckoned on CO2 vapour, and "
                        "cooling the gas this far would liquefy it first.")
    answer_cautions = [cautions.ASPHYXIATION]
    if p > 1.5 * 101325.0:
        answer_cautions.insert(0, cautions.PRESSURE)
    return {
        "water_g_per_kg_co2": w.water_g_per_kg_co2,
        "water_ppmv": w.water_ppmv,
        "dew_point_k": t,
        "frost_point": w.over_ice,
        "pressure_pa": w.pressure_pa,
        "co2_phase": w.co2_phase,
        "enhancement_factor": w.enhancement,
        "warnings": warnings,
        "cautions": answer_cautions,
    }

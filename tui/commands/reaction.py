"""``co2routes reaction "EQUATION" [--temperature T]``: heat of a reaction, checked for balance."""

from __future__ import annotations

import argparse

NAME = "reaction"
HELP = "heat of a balanced reaction, e.g. \"NaHCO3(s) + HCl(aq) -> NaCl(aq) + H2O(l) + CO2(g)\""


def add_arguments(parser: argparse.ArgumentParser) -> None:
    """Options of ``reaction``."""
    parser.add_argument(
        "equation",
        help="the equation with phase tags (g), (l), (s), (aq); coefficients like '2 HCl(aq)'; "
        "arrow '->' or '='",
    )
    parser.add_argument("--temperature", metavar="T", default="25 degC",
                        help="temperature of reactants and products, e.g. '20 degC' (default 25 degC)")


def run(args: argparse.Namespace) -> dict:
    """The reaction's JSON answer."""
    from co2routes.sources.records import heat_words
    from co2routes.thermo import cautions
    from co2routes.thermo.reaction import parse_reaction, reaction_enthalpy
    from co2routes.thermo.units import parse

    from co2routes.thermo.errors import InputError

    temperature = parse(args.temperature, "--temperature", "temperature")
    if len(args.equation) > 300:
        raise InputError("EQUATION", "must be at most 300 characters", got=f"{len(args.equation)} characters")
    try:
        result = reaction_enthalpy(args.equation, temperature)
        names = parse_reaction(args.equation).species_names()
    except InputError as err:  # thermo names "temperature" or the equation's parts
        field = "--temperature" if err.field == "temperature" else "EQUATION"
        raise InputError(field, err.allowed, err.got) from None
    warnings = list(result.warnings)
    if any(n.endswith("(aq)") for n in names):
        warnings.append(
            "Dissolved species are taken at infinite dilution; diluting a strong acid from its "
            "bought strength adds its heat of dilution (see co2routes.thermo.dilution)."
        )
    return {
        "equation": result.equation,
        "temperature_k": result.temperature_k,
        "delta_h_kj_per_mol": result.delta_h_kj_per_mol,
        "delta_h_kj_per_kg_co2": result.delta_h_kj_per_kg_co2,
        "balanced": result.balanced,
        "heat_in_words": heat_words(result.delta_h_kj_per_mol),
        "warnings": warnings,
        "cautions": _cautions(names, cautions),
    }


def _cautions(names: tuple[str, ...], cautions) -> list[str]:
    """The caution sentences that the reagents and products call for."""
    out: list[str] = []
    acids = ("HCl(aq)", "H2SO4(aq)", "CH3COOH(aq)", "C6H8O7(s)", "HCl(g)", "H2SO4(l)")
    if any(n in acids for n in names):
        out += [cautions.ACID, cautions.SPENT_LIQUOR]
    if any(n in ("CaO(s)", "Ca(OH)2(s)") for n in names):
        out.append(cautions.LIME_DUST)
    if "C2H5OH(l)" in names or "C2H5OH(aq)" in names:
        out.append(cautions.FERMENTER)
    if any(n in ("O2(g)",) for n in names):
        out.append(cautions.BURNER)
    if "CO2(g)" in names:
        out.append(cautions.ASPHYXIATION)
    return out

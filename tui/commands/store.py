"""``co2routes store``: what a closed vessel of CO2 holds, from its pressure or its charge."""

from __future__ import annotations

import argparse

NAME = "store"
HELP = "CO2 in a closed vessel: mass from pressure, or pressure from mass, at a temperature"

#: Filling density for the common class of high-pressure CO2 cylinders [kg per litre of water
#: capacity] (49 CFR 173.304a, table of filling densities: 68 %).
FILLING_DENSITY_LIMIT_KG_L = 0.68


def add_arguments(parser: argparse.ArgumentParser) -> None:
    """Options of ``store``."""
    parser.add_argument("--volume", metavar="V", required=True,
                        help="internal volume (water capacity), e.g. '13.4 L' or '5 gal'")
    group = parser.add_mutually_exclusive_group(required=True)
    group.add_argument("--pressure", metavar="P", help="absolute pressure, e.g. '10 bar'")
    group.add_argument("--mass", metavar="M", help="CO2 charge, e.g. '9 kg'")
    parser.add_argument("--temperature", metavar="T", required=True, help="vessel temperature, e.g. '20 degC'")
    parser.add_argument("--rated-pressure", metavar="P",
                        help="the vessel's rated (working) pressure, e.g. '1800 psi'; warn above it")


def vessel_state(args: argparse.Namespace):
    """The :class:`thermo.co2.VesselState` the options describe (parsed, options named in errors)."""
    from thermo import co2
    from thermo.units import parse, parse_positive
    from tui.commands._options import for_option

    volume = parse_positive(args.volume, "--volume", "volume")
    t = _temperature(parse(args.temperature, "--temperature", "temperature"))
    if args.pressure is not None:
        p = parse_positive(args.pressure, "--pressure", "pressure")
        with for_option("--pressure"):
            return co2.vessel_by_pressure(volume, p, t)
    m = parse_positive(args.mass, "--mass", "mass")
    with for_option("--mass"):
        return co2.vessel_by_mass(volume, m, t)


def _temperature(t: float) -> float:
    """``t`` [K] if a vessel of fluid CO2 can be at it, else an error naming ``--temperature``."""
    from thermo import co2
    from thermo.errors import InputError

    if not co2.TRIPLE_TEMPERATURE_K <= t <= co2.MAX_TEMPERATURE_K:
        raise InputError("--temperature", "a vessel of fluid CO2 must be at -56.56 degC (the triple "
                         "point) or warmer, and at most 1100 K", got=f"{t:.2f} K")
    return t


def run(args: argparse.Namespace) -> dict:
    """The vessel state as the JSON answer."""
    from thermo import cautions
    from thermo.units import parse_positive

    rated = None if args.rated_pressure is None else parse_positive(
        args.rated_pressure, "--rated-pressure", "pressure")
    state = vessel_state(args)
    warnings = list(state.warnings)
    if state.fill_density_kg_l > FILLING_DENSITY_LIMIT_KG_L:
        warnings.append(
            f"Fill density {state.fill_density_kg_l:.3f} kg/L is above 0.68 kg/L, the filling density "
            "for the common class of high-pressure CO2 cylinders (49 CFR 173.304a).")
    if rated is not None and state.pressure_pa > rated:
        warnings.append(
            f"Pressure {state.pressure_pa / 1e5:.1f} bar is above the rated pressure "
            f"{rated / 1e5:.1f} bar of this vessel.")
    found = [cautions.PRESSURE]
    if state.phase in ("two-phase", "liquid") or state.fill_density_kg_l > 0.1:
        found.append(cautions.CYLINDER_HEAT)
    found.append(cautions.ASPHYXIATION)
    return {
        "volume_l": state.volume_m3 * 1000.0,
        "temperature_k": state.temperature_k,
        "co2_mass_kg": state.co2_mass_kg,
        "pressure_pa": state.pressure_pa,
        "phase": state.phase,
        "fill_density_kg_l": state.fill_density_kg_l,
        "liquid_volume_fraction": state.liquid_volume_fraction,
        "warnings": warnings,
        "cautions": found,
    }

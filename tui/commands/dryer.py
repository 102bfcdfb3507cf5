"""``co2routes dryer``: size a desiccant bed that dries raw CO2 to a target dew point or ppmv."""

from __future__ import annotations

import argparse

NAME = "dryer"
HELP = ("size a desiccant dryer for wet CO2: water per cycle, bed mass and size, pressure drop, "
        "breakthrough, regeneration heat, outlet dew point and cost")

#: thermo's field names -> the option a user typed.
_OPTION_OF = {
    "flow": "--flow",
    "desiccant": "--desiccant",
    "cycle": "--cycle",
    "inlet temperature": "--inlet-temperature",
    "temperature": "--inlet-temperature",
    "inlet pressure": "--inlet-pressure",
    "pressure": "--inlet-pressure",
    "relative humidity": "--relative-humidity",
    "inlet dew point": "--inlet-dew-point",
    "dew point": "--target-dew-point",
    "target": "--target-dew-point/--target-ppmv",
    "target ppmv": "--target-ppmv",
    "diameter": "--diameter",
    "length-to-diameter ratio": "--length-to-diameter",
    "particle diameter": "--particle-size",
    "gas": "--gas",
}


def add_arguments(parser: argparse.ArgumentParser) -> None:
    """Options of ``dryer``."""
    parser.add_argument("--flow", metavar="F", required=True,
                        help="gas flow: a mass flow of the dry gas ('2 kg/day') or a volume flow of "
                             "the wet gas at inlet conditions ('1.2 L/min')")
    parser.add_argument("--inlet-temperature", metavar="T", required=True,
                        help="gas temperature entering the bed, e.g. '25 degC'")
    parser.add_argument("--desiccant", metavar="ID", required=True,
                        help="silica-gel, molecular-sieve-3a, molecular-sieve-4a, molecular-sieve-13x, "
                             "activated-alumina or calcium-chloride")
    parser.add_argument("--cycle", metavar="DURATION", required=True,
                        help="time on line between regenerations or charge changes, e.g. '8 h', '7 day'")
    parser.add_argument("--inlet-pressure", metavar="P", default="1 atm",
                        help="absolute pressure in the bed (default '1 atm')")
    wet = parser.add_mutually_exclusive_group()
    wet.add_argument("--inlet-dew-point", metavar="T", help="inlet dew point (default: saturated)")
    wet.add_argument("--relative-humidity", metavar="RH", help="inlet relative humidity, e.g. '80 %%'")
    target = parser.add_mutually_exclusive_group()
    target.add_argument("--target-dew-point", metavar="T",
                        help="outlet dew point to reach, e.g. '-40 degC' (at the bed's pressure)")
    target.add_argument("--target-ppmv", metavar="X",
                        help="outlet water in ppm by volume (default 20, the ISBT beverage-grade limit)")
    parser.add_argument("--diameter", metavar="D", help="vessel inside diameter, e.g. '10 cm'")
    parser.add_argument("--length-to-diameter", metavar="R",
                        help="bed length over diameter when no diameter is given (default 3)")
    parser.add_argument("--particle-size", metavar="D", help="desiccant particle diameter, e.g. '3 mm'")
    parser.add_argument("--gas", metavar="MIX", default="CO2=1",
                        help="dry gas mole fractions, e.g. 'CO2=0.12,N2=0.85,O2=0.03' (default pure CO2)")


def _composition(text: str) -> dict[str, float]:
    """Parse ``CO2=0.12,N2=0.85`` into mole fractions."""
    from co2routes.thermo.errors import InputError

    out: dict[str, float] = {}
    for part in text.split(","):
        name, sep, value = part.partition("=")
        try:
            out[name.strip()] = float(value)
        except ValueError:
            raise InputError("--gas", "must be NAME=FRACTION pairs separated by commas, e.g. "
                             "'CO2=0.12,N2=0.85,O2=0.03'", got=repr(text)) from None
        if not sep:
            raise InputError("--gas", "must be NAME=FRACTION pairs", got=repr(text))
    return out


def _flow(text: str, inp_kwargs: dict) -> float:
    """CO2 mass flow [kg/s] from a mass flow of dry gas or a volume flow of wet gas."""
    from co2routes.thermo.dryer import DryerInput, inlet_ppmv
    from co2routes.thermo.errors import InputError
    from co2routes.thermo.gasmix import SPECIES, co2_flow_from_volume_flow, molar_mass, normalise
    from co2routes.thermo.units import parse

    try:
        value, kind = parse(text, "--flow", "mass_flow"), "mass"
    except InputError:
        try:
            value, kind = parse(text, "--flow", "volume_flow"), "volume"
        except InputError:
            raise InputError("--flow", "must be a mass or volume flow with units, e.g. '2 kg/day', "
                             "'1.2 L/min'", got=repr(text)) from None
    if not value > 0.0:
        raise InputError("--flow", "must be greater than zero", got=repr(text))
    dry = normalise(inp_kwargs["dry_composition"])
    if kind == "mass":
        return value * dry.get("CO2", 0.0) * SPECIES["CO2"][1] / molar_mass(dry)
    ppmv = inlet_ppmv(DryerInput(co2_flow_kg_s=1.0, **inp_kwargs))
    return co2_flow_from_volume_flow(value, inp_kwargs["inlet_temperature_k"],
                                     inp_kwargs["inlet_pressure_pa"], ppmv, dry)


def _ppmv(text: str) -> float:
    """``--target-ppmv``: a bare number is ppmv ('20'); with a unit it is converted ('20 ppmv')."""
    from co2routes.thermo.units import parse_positive

    try:
        value = float(text)
    except ValueError:
        return parse_positive(text, "--target-ppmv", "fraction") * 1e6
    return parse_positive(value, "--target-ppmv", "fraction")


def _prices(kwargs: dict, desiccant: str) -> tuple[str, bool, str]:
    """Put the price book's desiccant and electricity prices into ``kwargs``; return the sentence
    saying where the cost comes from, whether it is known, and the book's currency.

    The book is the user's own (:func:`co2routes.sources.prices.load_book`), else the invented
    demo book; the regeneration heater is priced as electricity, as in the comparison
    (:mod:`co2routes.sources.conditioning`).
    """
    from co2routes.sources.prices import load_book, user_book_path

    book = load_book()
    where = (f"your price book ({user_book_path()})" if user_book_path().exists()
             else "the invented demo price book")
    charge, power = book.get(desiccant), book.get("electricity")
    missing = [name for name, price, per in ((desiccant, charge, "mass"), ("electricity", power, "energy"))
               if price is None or price.per != per]
    if missing:
        return (f"Cost unknown: {where} has no price for {' or '.join(missing)} (per kg for the "
                "desiccant, per kWh for electricity).", False, book.currency)
    kwargs["price_per_kg"] = charge.amount
    kwargs["energy_price_per_kwh"] = power.amount * 3.6e6
    return (f"Costs use {where} in {book.currency}: {desiccant} and electricity for regeneration.",
            True, book.currency)


def run(args: argparse.Namespace) -> dict:
    """Size the bed and return the JSON answer."""
    from co2routes.thermo.dryer import DryerInput, breakthrough_curve, size_dryer
    from co2routes.thermo.errors import InputError
    from co2routes.thermo.units import parse, parse_positive

    t = parse(args.inlet_temperature, "--inlet-temperature", "temperature")
    p = parse_positive(args.inlet_pressure, "--inlet-pressure", "pressure")
    kwargs: dict = {"inlet_temperature_k": t, "inlet_pressure_pa": p, "desiccant": args.desiccant,
                    "cycle_s": parse_positive(args.cycle, "--cycle", "time"),
                    "dry_composition": _composition(args.gas)}
    if args.relative_humidity is not None:
        kwargs["inlet_relative_humidity"] = parse(args.relative_humidity, "--relative-humidity",
                                                  "fraction")
    if args.inlet_dew_point is not None:
        kwargs["inlet_dew_point_k"] = parse(args.inlet_dew_point, "--inlet-dew-point", "temperature")
    if args.target_dew_point is not None:
        kwargs["target_dew_point_k"] = parse(args.target_dew_point, "--target-dew-point", "temperature")
    if args.target_ppmv is not None:
        kwargs["target_ppmv"] = _ppmv(args.target_ppmv)
    if args.diameter is not None:
        kwargs["diameter_m"] = parse_positive(args.diameter, "--diameter", "length")
    if args.length_to_diameter is not None:
        kwargs["length_to_diameter"] = parse_positive(args.length_to_diameter,
                                                      "--length-to-diameter", "fraction")
    if args.particle_size is not None:
        kwargs["particle_diameter_m"] = parse_positive(args.particle_size, "--particle-size", "length")
    book_note = _prices(kwargs, args.desiccant)
    try:
        co2 = _flow(args.flow, kwargs)
        inp = DryerInput(co2_flow_kg_s=co2, **kwargs)
        result = size_dryer(inp)
        curve = breakthrough_curve(inp, result)
    except InputError as err:
        if err.field.startswith("--"):
            raise
        option = _OPTION_OF.get(err.field, err.field)
        if err.field == "target":
            option = "--target-dew-point" if args.target_dew_point is not None else "--target-ppmv"
        raise InputError(option, err.allowed, err.got) from None
    heat = result.regeneration_heat_j
    return {
        "desiccant": result.desiccant,
        "co2_per_cycle_kg": result.co2_flow_kg_s * inp.cycle_s,
        "inlet_water_ppmv": result.inlet_water_ppmv,
        "inlet_dew_point_k": result.inlet_dew_point_k,
        "target_ppmv": result.target_ppmv,
        "target_dew_point_k": result.target_dew_point_k,
        "target_basis": result.target_basis,
        "water_load_kg_per_cycle": result.water_load_kg_per_cycle,
        "equilibrium_loading_kg_per_kg": result.equilibrium_loading_kg_per_kg,
        "residual_loading_kg_per_kg": result.residual_loading_kg_per_kg,
        "working_capacity_kg_per_kg": result.working_capacity_kg_per_kg,
        "bed_mass_kg": result.bed_mass_kg,
        "bed_volume_l": result.bed_volume_m3 * 1000.0,
        "bed_length_m": result.bed_length_m,
        "bed_diameter_m": result.bed_diameter_m,
        "mtz_length_m": result.mtz_length_m,
        "superficial_velocity_m_s": result.superficial_velocity_m_s,
        "velocity_limit_m_s": result.velocity_limit_m_s,
        "pressure_drop_pa": result.pressure_drop_pa,
        "cycle_h": inp.cycle_s / 3600.0,
        "breakthrough_h": result.breakthrough_s / 3600.0,
        "regeneration_heat_kj": None if heat is None else heat / 1000.0,
        "regeneration_energy_kwh": None if heat is None else heat / 3.6e6,
        "outlet_ppmv": result.outlet_ppmv,
        "outlet_dew_point_k": result.outlet_dew_point_k,
        "reaches_target": result.reaches_target,
        "suggested_desiccant": result.suggested_desiccant,
        "cost_per_kg_co2": result.cost_per_kg_co2 if book_note[1] else None,
        "breakthrough_curve": [{"time_h": c.time_s / 3600.0, "outlet_ppmv": c.outlet_ppmv}
                               for c in curve],
        "currency": book_note[2],
        "warnings": list(result.warnings) + [book_note[0]],
        "cautions": list(result.cautions),
    }

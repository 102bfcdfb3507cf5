"""``co2routes snow``: how much of a liquid CO2 charge becomes dry ice when released to the air."""

from __future__ import annotations

import argparse

NAME = "snow"
HELP = "dry-ice (snow) fraction of saturated liquid CO2 released to 1 atm"


def _draw(text: str) -> str:
    """``--draw`` as typed, with the British spelling taken for the American one.

    >>> _draw("Vapour"), _draw("liquid")
    ('vapor', 'liquid')
    """
    word = text.strip().lower()
    return "vapor" if word == "vapour" else word


def add_arguments(parser: argparse.ArgumentParser) -> None:
    """Options of ``snow``."""
    from co2routes.tui.commands._options import add_either

    add_either(parser, ("--liquid-temperature", "T", "temperature of the saturated liquid, e.g. '20 degC' (-56.56 to 30.98 degC)"),
               ("--liquid-pressure", "P", "pressure of the saturated liquid, e.g. '57 bar' (5.18 to 73.77 bar)"))
    parser.add_argument("--liquid-mass", metavar="M", help="liquid released, e.g. '10 kg'")
    parser.add_argument("--draw", choices=("liquid", "vapor"), default="liquid", type=_draw,
                        help="take CO2 from the liquid side (dip tube or inverted cylinder, the "
                             "default) or the vapour side (top of an upright cylinder; 'vapour' "
                             "is accepted too)")
    parser.add_argument("--transfer-loss", metavar="F", default="0 %",
                        help="share of the raw CO2 lost before the flash (purges, hoses, the heel "
                             "left in the cylinder), e.g. '5 %%'; for raw CO2 per kg of dry ice")
    box = parser.add_argument_group("storage in an insulated box")
    box.add_argument("--box-area", metavar="A", help="box surface area, e.g. '1.2 m**2'")
    box.add_argument("--box-u", metavar="U",
                     help="wall heat-transfer coefficient, e.g. '0.5 W/m**2/K' (about 0.5-1 for "
                          "5 cm of foam, common practice)")
    box.add_argument("--ambient-temperature", metavar="T", default="20 degC",
                     help="air around the box (default 20 degC)")
    box.add_argument("--hold-time", metavar="DURATION", help="how long the ice is kept, e.g. '2 day'")
    box.add_argument("--stored-mass", metavar="M",
                     help="dry ice put in the box (default: the snow from --liquid-mass)")


def run(args: argparse.Namespace) -> dict:
    """The flash result as the JSON answer."""
    from co2routes.thermo import cautions, flash
    from co2routes.thermo.units import parse, parse_positive
    from co2routes.tui.commands._options import for_option, given, typed_text

    mass = None if args.liquid_mass is None else parse_positive(args.liquid_mass, "--liquid-mass", "mass")
    option, value = given(args, ("--liquid-temperature", "temperature"), ("--liquid-pressure", "pressure"))
    with for_option(option, typed_text(args, option), value):
        result = (flash.flash_at_temperature if option == "--liquid-temperature" else flash.flash_at_pressure)(value, mass)
    warnings = [
        "The fraction is the adiabatic ideal: snow horns and bags collect less, since some snow is "
        "carried off with the gas and warm surfaces sublime it."
    ]
    from co2routes.thermo import dryice

    liquid = dryice.draw_yield(result.liquid_temperature_k, "liquid")
    vapor = dryice.draw_yield(result.liquid_temperature_k, "vapor")
    chosen = dryice.draw_yield(result.liquid_temperature_k, args.draw, mass)
    if args.draw == "vapor":
        warnings.append(chosen.note)
    answer = {
        "liquid_temperature_k": result.liquid_temperature_k,
        "liquid_pressure_pa": result.liquid_pressure_pa,
        "solid_fraction": chosen.solid_fraction,
        "solid_mass_kg": chosen.solid_mass_kg,
        "vapor_mass_kg": chosen.gas_mass_kg,
        "solid_temperature_k": result.solid_temperature_k,
        "draw": args.draw,
        "liquid_draw_solid_fraction": liquid.solid_fraction,
        "vapor_draw_solid_fraction": vapor.solid_fraction,
    }
    answer.update(_storage(args, chosen.solid_mass_kg, warnings))
    loss = parse(args.transfer_loss, "--transfer-loss", "fraction")
    stored_loss = answer.get("storage_loss_fraction") or 0.0
    answer["raw_co2_kg_per_kg"] = None
    if chosen.solid_fraction <= 0.0:
        warnings.append("No dry ice from this draw, so no raw-CO2-per-kg figure.")
    elif stored_loss < 1.0:
        with for_option("--transfer-loss"):
            answer["raw_co2_kg_per_kg"] = dryice.raw_per_dry_ice(
                chosen.solid_fraction, transfer_loss_fraction=loss,
                storage_loss_fraction=stored_loss).kg_raw_per_kg
    answer["warnings"] = warnings
    answer["cautions"] = [cautions.DRY_ICE, cautions.COLD_LIQUID, cautions.ASPHYXIATION,
                          cautions.PRESSURE]
    return answer


def _storage(args: argparse.Namespace, snow_kg: float | None, warnings: list[str]) -> dict:
    """Keys of the insulated-box storage loss (empty without --box-area and --box-u)."""
    from co2routes.thermo import dryice
    from co2routes.thermo.errors import InputError
    from co2routes.thermo.units import parse, parse_positive

    if args.box_area is None and args.box_u is None:
        if args.hold_time is not None or args.stored_mass is not None:
            raise InputError("--box-area", "and --box-u are needed for a storage loss")
        return {}
    if args.box_area is None or args.box_u is None:
        missing = "--box-area" if args.box_area is None else "--box-u"
        raise InputError(missing, "is needed with the other box option for a storage loss")
    area = parse_positive(args.box_area, "--box-area", "area")
    u = parse_positive(args.box_u, "--box-u", "heat_transfer_coefficient")
    t_amb = parse(args.ambient_temperature, "--ambient-temperature", "temperature")
    hold = None if args.hold_time is None else parse_positive(args.hold_time, "--hold-time", "time")
    stored = (snow_kg if args.stored_mass is None else
              parse_positive(args.stored_mass, "--stored-mass", "mass"))
    if stored == 0.0:
        stored = None
    try:
        r = dryice.storage_loss(area, u, t_amb, mass_kg=stored, hold_time_s=hold)
    except InputError as err:
        option = {"ambient temperature": "--ambient-temperature"}.get(err.field, "--box-area")
        raise InputError(option, err.allowed, err.got) from None
    out = {
        "box_area_m2": area,
        "box_u_w_m2_k": u,
        "ambient_temperature_k": t_amb,
        "storage_heat_leak_w": r.heat_leak_w,
        "storage_loss_kg_per_day": r.loss_kg_per_day,
        "stored_mass_kg": stored,
        "time_to_empty_h": None if r.time_to_empty_s is None else r.time_to_empty_s / 3600.0,
        "hold_time_h": None if hold is None else hold / 3600.0,
        "remaining_after_hold_kg": r.remaining_kg,
        "storage_loss_fraction": (None if r.remaining_kg is None or not stored
                                  else 1.0 - r.remaining_kg / stored),
    }
    if r.remaining_kg == 0.0:
        warnings.append("All the dry ice sublimes before the hold time ends: use a better box, a "
                        "smaller area or more ice.")
    return out

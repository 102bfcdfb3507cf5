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
    parser.add_argument("--force", action="store_true",
                        help="kept for scripts: a charge over the 0.68 kg/L filling ratio is "
                             "answered with a warning either way (the cylinder goes liquid-full and "
                             "its pressure climbs steeply); plans still refuse it")
    curve = parser.add_argument_group("hot-day curve")
    curve.add_argument("--hot-day-curve", action="store_true",
                       help="add the pressure from -10 degC up to the hot-day temperature, with the "
                            "rated and relief pressures marked")
    curve.add_argument("--hot-day-temperature", metavar="T", default="55 degC",
                       help="warm end of the curve (default 55 degC)")
    curve.add_argument("--relief-pressure", metavar="P",
                       help="relief-device setting, e.g. '3000 psi' (default 3000 psi, 5/3 of a "
                            "1800 psi service pressure; give your cylinder's own)")
    fill = parser.add_argument_group("filling from a gas buffer (the vessel above is the cylinder)")
    fill.add_argument("--buffer-volume", metavar="V", help="buffer vessel volume, e.g. '50 L'")
    fill.add_argument("--buffer-pressure", metavar="P", help="buffer pressure before filling, e.g. '20 bar'")
    fill.add_argument("--buffer-temperature", metavar="T",
                      help="buffer temperature (default: --temperature); a colder --temperature for "
                           "the cylinder (ice bath) condenses gas in it")


def vessel_state(args: argparse.Namespace):
    """The :class:`co2routes.thermo.co2.VesselState` the options describe (parsed, options named in errors)."""
    from co2routes.thermo import co2
    from co2routes.thermo.units import parse, parse_positive
    from co2routes.tui.commands._options import for_option

    volume = parse_positive(args.volume, "--volume", "volume")
    t = _temperature(parse(args.temperature, "--temperature", "temperature"))
    if args.pressure is not None:
        p = parse_positive(args.pressure, "--pressure", "pressure")
        with for_option("--pressure", args.pressure, p):
            return co2.vessel_by_pressure(volume, p, t)
    m = parse_positive(args.mass, "--mass", "mass")
    with for_option("--mass"):
        return co2.vessel_by_mass(volume, m, t)


def _temperature(t: float) -> float:
    """``t`` [K] if a vessel of fluid CO2 can be at it, else an error naming ``--temperature``."""
    from co2routes.thermo import co2
    from co2routes.thermo.errors import InputError

    if not co2.TRIPLE_TEMPERATURE_K <= t <= co2.MAX_TEMPERATURE_K:
        raise InputError("--temperature", "a vessel of fluid CO2 must be at -56.56 degC (the triple "
                         "point) or warmer, and at most 1100 K", got=f"{t:.2f} K")
    return t


def run(args: argparse.Namespace) -> dict:
    """The vessel state as the JSON answer."""
    from co2routes.thermo import cautions
    from co2routes.thermo.units import parse_positive

    rated = None if args.rated_pressure is None else parse_positive(
        args.rated_pressure, "--rated-pressure", "pressure")
    state = vessel_state(args)
    warnings = list(state.warnings)
    if args.mass is not None:
        warnings.extend(_charge_check(state))
    if state.fill_density_kg_l > FILLING_DENSITY_LIMIT_KG_L and not any(
            "filling ratio" in w for w in warnings):  # a forced charge has said it already
        warnings.append(
            f"Fill density {state.fill_density_kg_l:.3f} kg/L is above 0.68 kg/L, the filling density "
            "for the common class of high-pressure CO2 cylinders (49 CFR 173.304a).")
    if rated is not None and state.pressure_pa > rated:
        warnings.append(
            f"Pressure {state.pressure_pa / 1e5:.1f} bar is above the rated pressure "
            f"{rated / 1e5:.1f} bar of this vessel.")
    phase = _phase_name(state)
    warnings.extend(_near_critical(state))
    relief = None if args.relief_pressure is None else parse_positive(
        args.relief_pressure, "--relief-pressure", "pressure")
    if relief is not None and state.pressure_pa >= relief:
        warnings.append(
            f"Pressure {state.pressure_pa / 1e5:.1f} bar is at or above the relief setting "
            f"{relief / 1e5:.1f} bar: the relief device would open.")
    found = [cautions.PRESSURE]
    if state.phase in ("two-phase", "liquid") or state.fill_density_kg_l > 0.1:
        found.append(cautions.CYLINDER_HEAT)
    found.append(cautions.ASPHYXIATION)
    answer = {
        "volume_l": state.volume_m3 * 1000.0,
        "temperature_k": state.temperature_k,
        "co2_mass_kg": state.co2_mass_kg,
        "pressure_pa": state.pressure_pa,
        "phase": phase,
        "fill_density_kg_l": state.fill_density_kg_l,
        "liquid_volume_fraction": state.liquid_volume_fraction,
        "max_safe_charge_kg": FILLING_DENSITY_LIMIT_KG_L * state.volume_m3 * 1000.0,
        "warnings": warnings,
        "cautions": found,
    }
    if args.hot_day_curve:
        answer.update(_hot_day(args, state, rated, warnings))
        if cautions.CYLINDER_HEAT not in found:
            found.append(cautions.CYLINDER_HEAT)
    if args.buffer_volume is not None or args.buffer_pressure is not None:
        answer.update(_transfer(args, state, warnings))
        if answer["cylinder_final_phase"] != "gas" and cautions.CYLINDER_HEAT not in found:
            found.append(cautions.CYLINDER_HEAT)
    # warnings and cautions last, as in every answer
    answer["warnings"] = answer.pop("warnings")
    answer["cautions"] = answer.pop("cautions")
    return answer


def _charge_check(state) -> list[str]:
    """The danger of a charge over the filling ratio, as a warning: ``store`` answers a question
    about a state (what pressure does this cylinder reach?); plans refuse the overfill
    (:func:`co2routes.thermo.storage.check_charge` without ``force``)."""
    from co2routes.thermo import storage

    return list(storage.check_charge(state.volume_m3, state.co2_mass_kg, force=True,
                                     filling_ratio_kg_per_l=FILLING_DENSITY_LIMIT_KG_L))


#: Above the critical temperature and above this share of the critical pressure the fluid is
#: called supercritical: dense and far from an ideal gas (below it, a gas).
SUPERCRITICAL_PRESSURE_SHARE = 0.5


def _phase_name(state) -> str:
    """The phase as ``store`` names it: above the critical temperature (31.0 degC) there is no
    liquid at any pressure, and a dense fluid there (above half the critical pressure) is called
    supercritical, not gas (Span & Wagner 1996 critical point 304.128 K, 7.3773 MPa).

    >>> from types import SimpleNamespace as S
    >>> _phase_name(S(phase="gas", temperature_k=310.0, pressure_pa=60e5))
    'supercritical'
    >>> _phase_name(S(phase="gas", temperature_k=310.0, pressure_pa=1e5))
    'gas'
    """
    from co2routes.thermo import co2

    if (state.temperature_k >= co2.CRITICAL_TEMPERATURE_K
            and state.pressure_pa >= SUPERCRITICAL_PRESSURE_SHARE * co2.CRITICAL_PRESSURE_PA):
        return "supercritical"
    return state.phase


def _near_critical(state) -> list[str]:
    """A warning within 3 K and 10 bar of the critical point (31.0 degC, 73.8 bar)."""
    from co2routes.thermo import co2

    if (abs(state.temperature_k - co2.CRITICAL_TEMPERATURE_K) <= 3.0
            and abs(state.pressure_pa - co2.CRITICAL_PRESSURE_PA) <= 10e5):
        return ["Near the critical point of CO2 (31.0 degC, 73.8 bar): a small change of "
                "temperature moves the pressure and density steeply, and the figures are least "
                "certain here; keep the cylinder well below 31 degC or well above it."]
    return []


def _hot_day(args: argparse.Namespace, state, rated: float | None, warnings: list[str]) -> dict:
    """Keys of the hot-day pressure curve for the vessel's charge."""
    from co2routes.thermo import storage
    from co2routes.thermo.units import parse, parse_positive
    from co2routes.tui.commands._options import for_option

    hot = parse(args.hot_day_temperature, "--hot-day-temperature", "temperature")
    relief = (storage.DEFAULT_RELIEF_PRESSURE_PA if args.relief_pressure is None else
              parse_positive(args.relief_pressure, "--relief-pressure", "pressure"))
    if rated is None:
        rated = storage.DEFAULT_RATED_PRESSURE_PA
        warnings.append("Rated pressure not given: 1800 psi assumed (DOT-3AA1800, the common CO2 "
                        "cylinder; common practice).")
    if args.relief_pressure is None:
        warnings.append("Relief pressure not given: 3000 psi assumed (the test pressure, 5/3 of "
                        "1800 psi; from memory): use your cylinder's marked burst-disc rating.")
    low = min(storage.COLD_DAY_K, state.temperature_k)
    with for_option("--hot-day-temperature"):
        curve = storage.hot_day_curve(state.volume_m3, state.co2_mass_kg, rated_pressure_pa=rated,
                                      relief_pressure_pa=relief, low_k=low, high_k=hot)
    warnings.extend(w for w in curve.warnings if w not in warnings and "filling ratio" not in w)
    return {
        "rated_pressure_pa": rated,
        "relief_pressure_pa": relief,
        "hot_day_temperature_k": hot,
        "hot_day_pressure_pa": curve.hot_day_pressure_pa,
        "liquid_full_temperature_k": curve.liquid_full_temperature_k,
        "rated_reached_temperature_k": curve.rated_reached_k,
        "relief_reached_temperature_k": curve.relief_reached_k,
        "hot_day_curve": [
            {"temperature_k": p.temperature_k, "pressure_pa": p.pressure_pa, "phase": p.phase,
             "liquid_volume_fraction": p.liquid_volume_fraction, "above_rated": p.above_rated,
             "above_relief": p.above_relief}
            for p in curve.points
        ],
    }


def _transfer(args: argparse.Namespace, state, warnings: list[str]) -> dict:
    """Keys of a fill of this vessel from a gas buffer until the pressures are equal."""
    from co2routes.thermo import storage
    from co2routes.thermo.errors import InputError
    from co2routes.thermo.units import parse, parse_positive

    if args.buffer_volume is None or args.buffer_pressure is None:
        missing = "--buffer-volume" if args.buffer_volume is None else "--buffer-pressure"
        raise InputError(missing, "is needed with the other buffer option to plan a fill")
    v_b = parse_positive(args.buffer_volume, "--buffer-volume", "volume")
    p_b = parse_positive(args.buffer_pressure, "--buffer-pressure", "pressure")
    t_b = state.temperature_k if args.buffer_temperature is None else _temperature(
        parse(args.buffer_temperature, "--buffer-temperature", "temperature"))
    if state.phase != "gas":
        raise InputError("--pressure" if args.pressure is not None else "--mass",
                         "a cylinder filled from a gas buffer must start holding gas only",
                         got=state.phase)
    try:
        r = storage.transfer_from_buffer(v_b, p_b, t_b, state.volume_m3,
                                         receiver_temperature_k=state.temperature_k,
                                         receiver_initial_pressure_pa=state.pressure_pa)
    except InputError as err:
        option = {"buffer pressure": "--buffer-pressure", "buffer volume": "--buffer-volume",
                  "receiver initial pressure": "--pressure"}.get(err.field, "--buffer-pressure")
        raise InputError(option, err.allowed, err.got) from None
    warnings.extend(r.warnings)
    warnings.append(r.assumption)
    return {
        "buffer_volume_l": v_b * 1000.0,
        "buffer_temperature_k": t_b,
        "buffer_initial_mass_kg": r.buffer_initial_kg,
        "transfer_final_pressure_pa": r.final_pressure_pa,
        "transferred_kg": r.transferred_kg,
        "transferred_fraction": r.transferred_fraction,
        "buffer_final_mass_kg": r.buffer_final_kg,
        "cylinder_final_mass_kg": r.receiver_final_kg,
        "cylinder_final_phase": r.receiver_phase,
        "cylinder_final_fill_density_kg_l": r.receiver_fill_density_kg_l,
    }

"""Cooling with dry ice: the ice a box needs for a time at an outside temperature, and a load to chill.

The box's heat leak is the one ``co2routes snow`` uses for storage (:func:`co2routes.thermo.dryice.storage_loss`),
so the same box gives the same figures in both; the load's heat is m c_p (T_1 - T_2). Both are
turned into ice by the sublimation enthalpy at 1 atm (:mod:`co2routes.thermo.coldbox`).
"""

from __future__ import annotations

from typing import Any, Callable

from co2routes.sources.uses import UseDemand, UseInput
from co2routes.thermo import cautions
from co2routes.thermo.errors import InputError

KIND = "cold-box"

INPUTS = (
    UseInput("box_area", "box surface area", "area", optional=True, help="outside area of the box, e.g. '1.2 m**2'"),
    UseInput("box_u", "wall U", "heat_transfer_coefficient", optional=True,
             help="e.g. '0.7 W/m**2/K'; or give wall_thickness and wall_conductivity"),
    UseInput("wall_thickness", "wall thickness", "length", optional=True, help="insulation thickness, e.g. '5 cm'"),
    UseInput("wall_conductivity", "wall conductivity", "conductivity", "0.035 W/m/K",
             help="expanded polystyrene about 0.035 W/m/K (common practice)"),
    UseInput("hold_time", "hold time", "time", "0 h", help="how long the box is kept cold, e.g. '2 day'"),
    UseInput("outside_temperature", "outside temperature", "temperature", "20 degC", help="air around the box"),
    UseInput("load_mass", "load to chill", "mass", optional=True, help="mass put in warm, e.g. '10 kg'"),
    UseInput("load_heat_capacity", "load heat capacity", "specific_heat", "4.18 kJ/kg/K",
             help="water and most drinks about 4.18 kJ/kg/K"),
    UseInput("load_start_temperature", "load start temperature", "temperature", optional=True,
             help="default: the outside temperature"),
    UseInput("load_end_temperature", "load end temperature", "temperature", optional=True,
             help="what the load is chilled to, above -78.5 degC"),
    UseInput("every", "one run every", "time", optional=True, help="time between runs (default: the hold time, or 1 day)"),
)

SOURCES = (
    "Giauque & Egan (1937), J. Chem. Phys. 5, 45: sublimation enthalpy of CO2 at 1 atm, 573.3 kJ/kg",
    "Span & Wagner (1996), J. Phys. Chem. Ref. Data 25, 1509: sublimation point 194.686 K",
    "Fourier's law through a plane wall, U = k / L (Incropera & DeWitt, Fundamentals of Heat and Mass Transfer)",
)


def _u(v: dict[str, Any], name: Callable[[str], str]) -> float | None:
    from co2routes.thermo.coldbox import wall_u

    if v["box_u"] is not None and v["wall_thickness"] is not None:
        raise InputError(name("box_u"), "give the wall U or its thickness, not both")
    if v["box_u"] is not None:
        return v["box_u"]
    if v["wall_thickness"] is not None:
        try:
            return wall_u(v["wall_thickness"], v["wall_conductivity"])
        except InputError as err:
            raise InputError(name("wall_thickness"), err.allowed, err.got) from None
    return None


def _load_j(v: dict[str, Any], name: Callable[[str], str]) -> float:
    from co2routes.thermo.coldbox import load_heat_j

    if v["load_mass"] is None:
        return 0.0
    if v["load_end_temperature"] is None:
        raise InputError(name("load_end_temperature"), "is needed with a load: what it is chilled to")
    start = v["outside_temperature"] if v["load_start_temperature"] is None else v["load_start_temperature"]
    try:
        return load_heat_j(v["load_mass"], v["load_heat_capacity"], start, v["load_end_temperature"])
    except InputError as err:
        key = {"load mass": "load_mass", "load heat capacity": "load_heat_capacity"}.get(err.field, "load_end_temperature")
        raise InputError(name(key), err.allowed, err.got) from None


def compute(v: dict[str, Any], name: Callable[[str], str]) -> UseDemand:
    """Dry ice per run for the box's hold and the load, and per day."""
    from co2routes.thermo.coldbox import dry_ice_needed

    u = _u(v, name)
    if (u is None) != (v["box_area"] is None):
        raise InputError(name("box_area" if v["box_area"] is None else "box_u"),
                         "a box needs its area and its wall (U, or thickness and conductivity)")
    load = _load_j(v, name)
    if u is None and load == 0.0:
        raise InputError(name("box_area"), "give a box (area and wall) or a load to chill, or both")
    hold = v["hold_time"]
    if u is not None and not hold > 0.0:
        raise InputError(name("hold_time"), "is needed with a box: how long it is kept cold")
    try:
        r = dry_ice_needed(hold, area_m2=v["box_area"], u_w_m2_k=u, outside_k=v["outside_temperature"], load_j=load)
    except InputError as err:
        raise InputError(name("outside_temperature"), "must be warmer than the dry ice inside, -78.5 degC: a "
                         "box hotter inside than out needs no ice", err.got) from None
    every = v["every"] or (hold if hold > 0.0 else 86400.0)
    if every < hold:
        raise InputError(name("every"), "must not be shorter than the hold time", got=f"{every / 3600:g} h")
    warnings = []
    if v["load_end_temperature"] is not None and v["load_end_temperature"] < 273.15 and v["load_mass"] is not None:
        warnings.append("Freezing a watery load takes about 334 kJ/kg more than c_p x dT (latent heat of ice): "
                        "add it to the heat capacity or the figure is low.")
    balance = (
        ("box_area_m2", v["box_area"]), ("box_u_w_m2_k", u), ("outside_temperature_k", v["outside_temperature"]),
        ("hold_time_h", hold / 3600.0), ("storage_heat_leak_w", r.heat_leak_w if u is not None else None),
        ("storage_loss_kg_per_day", r.heat_leak_w * 86400.0 / r.sublimation_enthalpy_j_kg if u is not None else None),
        ("box_dry_ice_kg", r.box_ice_kg), ("load_heat_kj", load / 1000.0), ("load_dry_ice_kg", r.load_ice_kg),
        ("sublimation_enthalpy_kj_per_kg", r.sublimation_enthalpy_j_kg / 1000.0), ("every_h", every / 3600.0),
    )
    days = every / 86400.0
    summary = (f"{r.total_kg:.3g} kg of dry ice per run every {days:.3g} days "
               f"({r.box_ice_kg:.3g} kg for the box, {r.load_ice_kg:.3g} kg for the load)")
    return UseDemand(KIND, r.total_kg, every, r.total_kg / days, None, summary, balance, dict(v), SOURCES,
                     tuple(warnings), (cautions.DRY_ICE, cautions.DRY_ICE_TRANSPORT, cautions.ASPHYXIATION))

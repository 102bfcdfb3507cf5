"""Fermentation by-product: the CO2 a brew, wine or cider gives off and how much can be collected.

Released: Balling's balance from original and final gravity (:func:`co2routes.thermo.brewing.ferment_wort`),
or from the sugar fermented (:func:`co2routes.thermo.brewing.ferment_sugar`). Held in the liquid at the end:
Henry's law at the fermentation temperature under the headspace's CO2 (:mod:`co2routes.thermo.henry`).
Lost to the headspace: the purge before the gas is pure enough, and the headspace's fill after the
switch (:func:`co2routes.thermo.purge.purge_loss`). What is left can be collected.
"""

from __future__ import annotations

import re
from typing import Any, Callable

from co2routes.sources.uses import UseDemand, UseInput
from co2routes.thermo import cautions
from co2routes.thermo.errors import InputError

KIND = "fermentation"

INPUTS = (
    UseInput("volume", "wort or must volume", "volume", help="volume fermented, e.g. '1000 L'"),
    UseInput("original_gravity", "original gravity", "text", optional=True,
             help="specific gravity ('1.048') or degrees Plato ('12 P'); or give sugar"),
    UseInput("final_gravity", "final gravity", "text", optional=True,
             help="the apparent final gravity, same forms ('1.010', '2.5 P')"),
    UseInput("sugar", "sugar fermented", "mass", optional=True,
             help="sugar fermented out completely (a sugar wash), instead of the gravities"),
    UseInput("temperature", "fermentation temperature", "temperature", "20 degC", help="at the end of fermentation"),
    UseInput("headspace", "headspace", "fraction", "25 %",
             help="headspace as a share of the liquid volume; fermenters are filled to about 75-80 % (common practice)"),
    UseInput("purity", "collect from purity", "fraction", "99 %",
             help="CO2 fraction at which collection starts; the gas before it is vented"),
    UseInput("every", "one brew every", "time", "7 day", help="time between brews"),
    UseInput("atmosphere", "headspace pressure", "pressure", "1 atm", help="default: the site's air pressure"),
)

SOURCES = (
    "Balling (1854), set out by Nielsen et al. (2007) Balling's formula - scrutiny of a brewing dogma, "
    "and Cutaia, Reid & Speers (2009) J. Inst. Brew. 115, 318: CO2 from the extract fermented",
    "Sander (2015), Atmos. Chem. Phys. 15, 4399: Henry's law for the CO2 left dissolved",
    "Danckwerts (1953), Chem. Eng. Sci. 2, 1: exponential washout of the headspace",
)


def gravity(text: str, field: str) -> float:
    """Degrees Plato from a gravity typed as SG ('1.048') or Plato ('12 P', '12 degP', '12 plato').

    >>> round(gravity("1.048", "g"), 2), gravity("12 P", "g")
    (11.91, 12.0)
    """
    from co2routes.thermo.brewing import plato_from_sg

    raw = str(text).strip()
    m = re.fullmatch(r"(-?[0-9]*\.?[0-9]+)\s*(p|°p|degp|plato|°plato)?", raw, flags=re.IGNORECASE)
    if m is None:
        raise InputError(field, "must be a specific gravity such as '1.048' or degrees Plato such as '12 P'",
                         got=repr(raw))
    value = float(m.group(1))
    if m.group(2):
        return value
    if not 0.98 <= value <= 1.13:
        raise InputError(field, "a plain number is a specific gravity from 0.980 to 1.130; write Plato with "
                         "a P, e.g. '12 P'", got=repr(raw))
    return plato_from_sg(value)


def _released(v: dict[str, Any], name: Callable[[str], str]) -> tuple[float, list[tuple[str, Any]]]:
    from co2routes.thermo import brewing

    if v["sugar"] is not None:
        if v["original_gravity"] is not None or v["final_gravity"] is not None:
            raise InputError(name("sugar"), "give the sugar or the gravities, not both")
        return brewing.ferment_sugar(v["sugar"]), [("sugar_fermented_kg", v["sugar"])]
    if v["original_gravity"] is None or v["final_gravity"] is None:
        missing = "original_gravity" if v["original_gravity"] is None else "final_gravity"
        raise InputError(name(missing), "is needed (or give the sugar fermented)")
    oe = gravity(v["original_gravity"], name("original_gravity"))
    ae = gravity(v["final_gravity"], name("final_gravity"))
    try:
        f = brewing.ferment_wort(v["volume"], oe, ae)
    except InputError as err:
        key = "final_gravity" if err.field == "final gravity" else "original_gravity"
        raise InputError(name(key), err.allowed, err.got) from None
    return f.co2_kg, [("original_extract_plato", oe), ("apparent_extract_plato", ae),
                      ("real_extract_plato", f.real_extract_p), ("alcohol_mass_fraction", f.alcohol_mass_fraction),
                      ("wort_kg", f.wort_kg), ("extract_fermented_kg", f.extract_fermented_kg),
                      ("ethanol_kg", f.ethanol_kg), ("yeast_dry_matter_kg", f.yeast_kg)]


def compute(v: dict[str, Any], name: Callable[[str], str]) -> UseDemand:
    """CO2 released, held dissolved, lost to the headspace and collectable, per brew."""
    from co2routes.thermo import henry, purge, water

    if not v["volume"] > 0.0:
        raise InputError(name("volume"), "must be greater than zero", got=v["volume"])
    t, p = v["temperature"], v["atmosphere"]
    if not 273.15 <= t <= 313.15:
        raise InputError(name("temperature"), "yeast ferments from 0 to 40 degC", got=f"{t - 273.15:.1f} degC")
    if v["headspace"] > 2.0:
        raise InputError(name("headspace"), "must be at most 200 % of the liquid volume", got=v["headspace"])
    released, lines = _released(v, name)
    dissolved = henry.dissolved_co2_kg_m3(t, p - water.vapor_pressure(t)) * v["volume"]
    try:
        lost = purge.purge_loss(v["headspace"] * v["volume"], v["purity"], t, p)
    except InputError as err:
        raise InputError(name("purity"), err.allowed, err.got) from None
    collect = released - dissolved - lost.lost_kg
    warnings = []
    if collect <= 0.0:
        warnings.append("This brew gives no CO2 to collect: what it releases stays dissolved or fills the headspace.")
        collect = 0.0
    days = v["every"] / 86400.0
    lines += [("co2_released_kg", released), ("co2_dissolved_at_end_kg", dissolved),
              ("headspace_m3", lost.headspace_m3), ("purge_headspace_volumes", lost.purge_volumes),
              ("purge_vented_kg", lost.vented_kg), ("purge_fed_before_collection_kg", lost.fed_before_switch_kg),
              ("headspace_fill_after_switch_kg", lost.held_after_kg), ("co2_collectable_kg", collect),
              ("recovered_fraction", collect / released if released > 0 else None), ("every_h", v["every"] / 3600.0)]
    summary = (f"{collect:.3g} kg collectable per brew of {v['volume'] * 1000:.4g} L every {days:g} days "
               f"({released:.3g} kg released, {dissolved:.3g} kg left dissolved, {lost.lost_kg:.3g} kg to the headspace)")
    return UseDemand(KIND, collect, v["every"], collect / days, None, summary, tuple(lines), dict(v), SOURCES,
                     tuple(warnings), (cautions.FERMENTER, cautions.ASPHYXIATION))

"""Greenhouse enrichment: the CO2 a house needs a day from its size, leakiness, levels and crop.

A day of enrichment (the model of :mod:`co2routes.thermo.greenhouse`):

- the morning refill: the CO2 the house's air held above the outside level that leaked away during
  the hours without enrichment, stock x (1 - exp(-N_closed x hours off));
- the hours with vents closed at the target: (ventilation loss + crop uptake) per hour;
- the hours with vents open at the (lower) vents-open target: the same at the open air changes.

The peak the supply must reach is the larger of the steady rates and the rate that pulls the house
from the outside level up to the target in the pull-up time. Crop respiration at night (which adds
CO2) is left out, so the refill errs high.
"""

from __future__ import annotations

from typing import Any, Callable

from co2routes.sources.uses import UseDemand, UseInput
from co2routes.thermo import cautions
from co2routes.thermo.errors import InputError

KIND = "greenhouse"
#: Levels (mole fractions) above which warnings are given: few crops gain above about 1,500 ppmv
#: (common practice; Blom et al. 2002 recommend 700-1,000 ppmv) and 5,000 ppmv is the 8-h limit
#: for people (OSHA PEL); a plan at or above 40,000 ppmv (NIOSH IDLH) is refused.
CROP_HIGH, PEOPLE_LIMIT, REFUSED = 1500e-6, 5000e-6, 40000e-6

INPUTS = (
    UseInput("floor_area", "floor area", "area", help="the house's floor area, e.g. '200 m**2'"),
    UseInput("mean_height", "mean height", "length", optional=True,
             help="mean height of the air space (volume / floor area), e.g. '3.5 m'; or give volume"),
    UseInput("volume", "air volume", "volume", optional=True, help="air volume, e.g. '700 m**3'; or give mean_height"),
    UseInput("air_changes_closed", "air changes, vents closed", "frequency", "0.5 /h",
             help="leakage with vents shut; about 0.25-1 /h for a glasshouse, less for double "
                  "polythene (common practice); measure it from the CO2 decay"),
    UseInput("air_changes_open", "air changes, vents open", "frequency", "10 /h",
             help="with vents open, often 10-60 /h (common practice)"),
    UseInput("vents_open_hours", "enrichment hours with vents open", "time", "0 h",
             help="part of the enrichment hours the vents are open"),
    UseInput("outside_co2", "outside CO2", "fraction", "425 ppmv", help="ppmv (default: the site's CO2 in air)"),
    UseInput("target_co2", "target CO2, vents closed", "fraction", "1000 ppmv",
             help="700-1,000 ppmv is usual (Blom et al. 2002)"),
    UseInput("target_co2_open", "target CO2, vents open", "fraction", optional=True,
             help="default: the outside level (replace only what the crop takes up)"),
    UseInput("crop_uptake", "crop uptake", "mass_flux", "2 g/m**2/h",
             help="CO2 a full crop takes up per m2 of floor per hour of light, about 1-4 g/m**2/h "
                  "in good light (common practice, from memory)"),
    UseInput("enrichment_hours", "enrichment hours a day", "time", "10 h", help="hours of light with CO2 supplied"),
    UseInput("days_per_week", "enrichment days a week", "number", "7", help="1 to 7"),
    UseInput("pull_up_time", "pull-up time", "time", "1 h", help="time allowed to reach the target in the morning"),
    UseInput("air_temperature", "air temperature", "temperature", "20 degC", help="inside the house"),
    UseInput("air_pressure", "air pressure", "pressure", "1 atm", help="default: the site's"),
)

SOURCES = (
    "Nederhoff, van de Vooren & Udink ten Cate (1985), J. Agric. Eng. Res. 31, 309: the well-mixed "
    "CO2 balance of a greenhouse and its ventilation from the CO2 decay",
    "Blom, Straver, Ingratta, Khosla & Brown (2002), Carbon Dioxide in Greenhouses, Ontario "
    "Ministry of Agriculture factsheet 00-077: usual enrichment levels",
    "OSHA 29 CFR 1910.1000 Table Z-1 (5,000 ppm 8-h PEL); ACGIH TLV (30,000 ppm STEL); NIOSH IDLH "
    "40,000 ppm: exposure limits for people inside",
)


def _volume(v: dict[str, Any], name: Callable[[str], str]) -> float:
    if (v["volume"] is None) == (v["mean_height"] is None):
        raise InputError(name("volume"), "give the air volume or the mean height (with the floor area), one of them")
    volume = v["volume"] if v["volume"] is not None else v["floor_area"] * v["mean_height"]
    if not volume > 0.0 or not v["floor_area"] > 0.0:
        raise InputError(name("floor_area" if not v["floor_area"] > 0.0 else "volume"), "must be greater than zero")
    return volume


def compute(v: dict[str, Any], name: Callable[[str], str]) -> UseDemand:
    """The demand of one enrichment day, its peak and the house's balance."""
    import math

    from co2routes.thermo import greenhouse as gh

    volume = _volume(v, name)
    hours = v["enrichment_hours"] / 3600.0
    open_h = v["vents_open_hours"] / 3600.0
    if not 0.0 < hours <= 24.0:
        raise InputError(name("enrichment_hours"), "must be above 0 and at most 24 h", got=f"{hours:g} h")
    if open_h > hours:
        raise InputError(name("vents_open_hours"), "must not exceed the enrichment hours", got=f"{open_h:g} h")
    days = v["days_per_week"]
    if not 1.0 <= days <= 7.0:
        raise InputError(name("days_per_week"), "must be from 1 to 7", got=days)
    out, target = v["outside_co2"], v["target_co2"]
    target_open = out if v["target_co2_open"] is None else v["target_co2_open"]
    for key, level in (("target_co2", target), ("target_co2_open", target_open)):
        if level < out:
            raise InputError(name(key), "must be at least the outside CO2: enrichment cannot hold the "
                             "house below the outside level", got=f"{level * 1e6:.0f} ppmv (outside {out * 1e6:.0f} ppmv)")
        if level >= REFUSED:
            raise InputError(name(key), "must be below 40,000 ppmv, the level immediately dangerous "
                             "to life (NIOSH IDLH)", got=f"{level * 1e6:.0f} ppmv")
    uptake = v["crop_uptake"] * v["floor_area"] * 3600.0  # kg/h
    t, p = v["air_temperature"], v["air_pressure"]
    with_field = {"air changes": "air_changes_closed", "outside CO2": "outside_co2", "target CO2": "target_co2"}
    try:
        closed = gh.steady_balance(volume, v["air_changes_closed"] * 3600.0, out, target, uptake, t, p)
        opened = gh.steady_balance(volume, v["air_changes_open"] * 3600.0, out, target_open, uptake, t, p)
        pull = gh.pull_up_supply_kg_h(closed, v["pull_up_time"] / 3600.0)
    except InputError as err:
        raise InputError(name(with_field.get(err.field, "air_changes_open")), err.allowed, err.got) from None
    closed_h = hours - open_h
    refill = closed.stock_kg * (1.0 - math.exp(-closed.air_changes_per_h * (24.0 - hours)))
    day_kg = refill + closed_h * closed.supply_kg_h + open_h * opened.supply_kg_h
    peak = max([opened.supply_kg_h if open_h > 0 else 0.0] + ([pull, closed.supply_kg_h] if closed_h > 0 else []))
    warnings = []
    if max(target, target_open) > CROP_HIGH:
        warnings.append("Above about 1,500 ppmv few crops gain more and some show leaf damage (common practice).")
    if max(target, target_open) > PEOPLE_LIMIT:
        fall = gh.hours_to_fall(out, max(target, target_open), PEOPLE_LIMIT, opened.air_changes_per_h)
        warnings.append(f"The target is above 5,000 ppmv, the 8-hour limit for people: with the vents open "
                        f"the house takes {fall:.2g} h to fall below it; nobody works inside while enriched.")
    if day_kg == 0.0:
        warnings.append("With no air changes and no crop uptake the house holds its CO2: at steady state "
                        "it needs none (only the first fill, not counted per day).")
    balance = (
        ("volume_m3", volume), ("floor_area_m2", v["floor_area"]), ("air_in_house_mol", closed.air_mol),
        ("outside_co2_ppmv", out * 1e6), ("target_co2_ppmv", target * 1e6),
        ("target_co2_vents_open_ppmv", target_open * 1e6),
        ("air_changes_closed_per_h", closed.air_changes_per_h), ("air_changes_open_per_h", opened.air_changes_per_h),
        ("stock_above_outside_kg", closed.stock_kg), ("morning_refill_kg", refill),
        ("ventilation_loss_closed_kg_per_h", closed.ventilation_kg_h),
        ("ventilation_loss_open_kg_per_h", opened.ventilation_kg_h), ("crop_uptake_kg_per_h", uptake),
        ("supply_closed_kg_per_h", closed.supply_kg_h), ("supply_open_kg_per_h", opened.supply_kg_h),
        ("pull_up_supply_kg_per_h", pull), ("enrichment_h", hours), ("vents_open_h", open_h),
        ("days_per_week", days), ("week_kg", day_kg * days),
        ("mean_kg_per_day_over_week", day_kg * days / 7.0),
    )
    summary = (f"{day_kg:.3g} kg/day on {days:g} days a week for a {volume:.4g} m3 house held at "
               f"{target * 1e6:.0f} ppmv for {hours:g} h, peak {peak:.3g} kg/h")
    return UseDemand(KIND, day_kg, 86400.0, day_kg, peak, summary, balance, dict(v), SOURCES,
                     tuple(warnings), (cautions.GREENHOUSE_ENTRY, cautions.ASPHYXIATION))

"""Carbonation: the CO2 a batch of drink takes, with the usual losses, and the regulator setting.

Dissolved: (target - starting CO2) x volume, the target held at the serving temperature by the
pressure of :func:`co2routes.thermo.carbonation.pressure_for`. Gas besides (common practice, each a
stated default a user can change):

- purging: each package (keg, bottle, or the bright tank for in-line carbonation) flushed with
  ``purge_volumes`` of its volume of CO2 at 1 atm before filling;
- headspace: the package's headspace filled with CO2 at the regulator's pressure;
- dispense (keg only): the gas that takes the place of the drink as it is served, the drink's
  volume of CO2 at the regulator's pressure;
- venting and foaming: a share of the dissolved CO2 (in-line 10 %, keg 5 %, common practice).

Bottle conditioning makes the dissolved CO2 and the headspace's CO2 in the bottle from priming
sugar: it needs no gas for them, only for purging; the sugar is given, and the pressure shown is
the bottle's at the serving temperature.
"""

from __future__ import annotations

import math
from typing import Any, Callable

from co2routes.sources.uses import UseDemand, UseInput, ideal_co2_density
from co2routes.thermo import cautions
from co2routes.thermo.errors import InputError

KIND = "carbonation"
METHODS = ("in-line", "keg", "bottle-conditioning")
#: Share of the dissolved CO2 lost to venting and foaming by method (common practice).
LOSS = {"in-line": 0.10, "keg": 0.05, "bottle-conditioning": 0.0}
#: Package size by method when none is given [m3] (common practice: a 20 L keg, a 0.5 L bottle).
PACKAGE = {"keg": 0.020, "bottle-conditioning": 0.0005}

INPUTS = (
    UseInput("volume", "drink volume", "volume", help="drink carbonated per batch, e.g. '200 L'"),
    UseInput("target", "target CO2", "text", "2.5",
             help="volumes of CO2 ('2.5') or g/L ('5 g/L'); about 2.2-2.7 volumes for lager (common practice)"),
    UseInput("starting_co2", "CO2 already in the drink", "text", "0",
             help="volumes or g/L; a beer fermented at 1 atm and 20 degC holds about 0.85 volumes"),
    UseInput("serving_temperature", "serving temperature", "temperature", "4 degC", help="0-30 degC"),
    UseInput("method", "method", "choice", "keg", choices=METHODS, help=" | ".join(METHODS)),
    UseInput("package_size", "package size", "volume", optional=True,
             help="keg or bottle volume (default 20 L keg, 0.5 L bottle; in-line: the bright tank = the batch)"),
    UseInput("headspace", "headspace", "fraction", "5 %", help="share of each package left as headspace"),
    UseInput("purge_volumes", "purges", "number", "1", help="package volumes of CO2 at 1 atm to flush each package"),
    UseInput("loss", "venting and foaming loss", "fraction", optional=True,
             help="share of the dissolved CO2 (default: in-line 10 %, keg 5 %, common practice)"),
    UseInput("every", "one batch every", "time", "1 day", help="time between batches"),
    UseInput("atmosphere", "air pressure", "pressure", "1 atm", help="default: the site's"),
)

SOURCES = (
    "Sander (2015), Atmos. Chem. Phys. 15, 4399: Henry's law and its temperature dependence",
    "Miller (1994), BrewingTechniques 2(1), Table I: carbonation at beer temperatures and pressures "
    "(the check of the model)",
    "Gay-Lussac: sugar to CO2 for priming",
)


def co2_level(text: str, field: str) -> float:
    """Dissolved CO2 [kg/m3] from volumes ('2.5') or a concentration with units ('5 g/L').

    >>> round(co2_level("2.5", "t"), 3), co2_level("5 g/L", "t")
    (4.909, 5.0)
    """
    from co2routes.thermo.carbonation import volumes_to_kg_m3
    from co2routes.thermo.units import parse

    raw = str(text).strip()
    try:
        value = volumes_to_kg_m3(float(raw))
    except ValueError:
        value = parse(raw, field, "density")
    if not 0.0 <= value <= 20.0:
        raise InputError(field, "must be from 0 to 10 volumes (0-20 g/L)", got=repr(raw))
    return value


def compute(v: dict[str, Any], name: Callable[[str], str]) -> UseDemand:
    """CO2 per batch: dissolved plus purging, headspace, dispense and losses; the regulator setting."""
    from co2routes.thermo import carbonation as cb

    method, t, atm = v["method"], v["serving_temperature"], v["atmosphere"]
    volume = v["volume"]
    if not volume > 0.0:
        raise InputError(name("volume"), "must be greater than zero", got=volume)
    target = co2_level(v["target"], name("target"))
    start = co2_level(v["starting_co2"], name("starting_co2"))
    if not target > 0.0:
        raise InputError(name("target"), "must be greater than zero", got=v["target"])
    try:
        held = cb.pressure_for(t, cb.kg_m3_to_volumes(target), atm)
    except InputError as err:
        raise InputError(name("serving_temperature" if "temperature" in err.field else "target"), err.allowed, err.got) from None
    warnings = []
    if start > target:
        warnings.append("The drink already holds more CO2 than the target: it will lose some, none is added.")
    added = max(0.0, target - start) * volume
    package = v["package_size"] or PACKAGE.get(method, volume)
    if v["headspace"] >= 1.0:
        raise InputError(name("headspace"), "must be below 100 %", got=v["headspace"])
    count = math.ceil(volume / package - 1e-9)
    gauge = max(held.gauge_pressure_pa, 0.0)
    rho_atm = ideal_co2_density(t, atm)
    rho_reg = ideal_co2_density(t, atm + gauge)
    purge_kg = v["purge_volumes"] * package * count * rho_atm
    headspace_kg = v["headspace"] * package * count * rho_reg
    bottled = method == "bottle-conditioning"
    dispense_kg = volume * rho_reg if method == "keg" else 0.0
    loss_share = LOSS[method] if v["loss"] is None else v["loss"]
    lost_kg = loss_share * added if method != "bottle-conditioning" else 0.0
    gas_for_drink = added if method != "bottle-conditioning" else 0.0
    total = gas_for_drink + purge_kg + (0.0 if bottled else headspace_kg) + dispense_kg + lost_kg
    if held.gauge_pressure_pa < 0.0:
        warnings.append("At this temperature the drink holds the target below the air's pressure: no "
                        "regulator pressure is needed, and it loses CO2 in an open glass.")
    priming = cb.priming_sugar_kg(added + headspace_kg) if bottled and added > 0 else None
    if total <= 0.0:
        raise InputError(name("method"), "gives no CO2 demand for these inputs (nothing to add, purge or fill)")
    balance = (
        ("target_volumes", cb.kg_m3_to_volumes(target)), ("target_kg_m3", target), ("starting_kg_m3", start),
        ("packages", count), ("package_size_m3", package),
        ("regulator_gauge_pressure_pa", gauge), ("regulator_absolute_pressure_pa", atm + gauge),
        ("co2_dissolved_kg", added), ("co2_for_drink_kg", gas_for_drink), ("purge_kg", purge_kg),
        ("headspace_kg", headspace_kg), ("headspace_from_gas_supply", not bottled), ("dispense_kg", dispense_kg), ("venting_and_foaming_kg", lost_kg),
        ("priming_sucrose_kg", priming), ("every_h", v["every"] / 3600.0),
    )
    days = v["every"] / 86400.0
    setting = "bottle pressure" if bottled else "regulator"
    summary = (f"{total:.3g} kg per {volume * 1000:.4g} L batch ({method}) every {days:g} days, "
               f"{setting} {gauge / 1e5:.2f} bar gauge at {t - 273.15:.1f} degC")
    caution_list = [cautions.PRESSURE, cautions.ASPHYXIATION]
    return UseDemand(KIND, total, v["every"], total / days, None, summary, balance, dict(v), SOURCES,
                     tuple(warnings), tuple(caution_list))

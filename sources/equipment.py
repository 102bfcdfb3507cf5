"""Equipment and the cost of owning it: what each route, the dryer and the delivery need, priced.

Prices come from the price book's ``[equipment]`` table, one entry per kind of equipment::

    fermenter = { price = "60", size = "30 L", exponent = 0.6, life = "10 year" }

a unit of ``size`` costing ``price`` (the book's currency); a unit of size S costs
price x (S / size)^exponent, the capacity-exponent rule (Williams 1947, "Six-tenths factor aids
in approximating costs", Chem. Eng. 54(12) 124; exponent 0.6 when none is known). Life is in
years or cycles (``"2000 cycles"``); cycles become years at the unit's own cycles a year.

Owning cost: each item's price is turned into an equal yearly payment with the capital recovery
factor CRF(i, n) = i (1 + i)^n / ((1 + i)^n - 1) (:func:`capital_recovery_factor`) over the
shorter of its life and the scenario's years of use (an item that outlives the use is not
resold; one that wears out sooner is bought again); capital per kg = yearly payments / kg of end
product a year. With ``owned = true`` the user already has the gear: capital per kg is 0 and the
cost is the running cost alone. A price the book lacks makes the capital unknown (``None``).
"""

from __future__ import annotations

import math
from dataclasses import dataclass
from functools import lru_cache
from typing import Any, Mapping

from co2routes.thermo.errors import InputError
from co2routes.thermo.units import parse

_YEAR_S = 365.25 * 86400.0
#: Dimensions an equipment size may be given in, with the SI symbol sizes are shown in.
_SIZE_DIMENSIONS = {"volume": "m3", "mass": "kg", "power": "W", "mass_flow": "kg/s"}


@dataclass(frozen=True, slots=True)
class EquipmentPrice:
    """One ``[equipment]`` entry: ``price`` for a unit of ``size`` (SI of ``dimension``), the
    capacity ``exponent`` and a service life in years or cycles."""

    key: str
    price: float
    size: float
    dimension: str
    exponent: float
    life_years: float | None
    life_cycles: float | None


@dataclass(frozen=True, slots=True)
class Item:
    """One line of equipment: ``count`` units of ``size`` (SI of the priced dimension), the price
    of them all (``None`` when the book lacks it) and their service life [years]."""

    key: str
    name: str
    size: float
    unit: str
    count: int
    price: float | None
    life_years: float | None
    yearly: float | None


def capital_recovery_factor(rate: float, years: float) -> float:
    """CRF = i (1 + i)^n / ((1 + i)^n - 1), 1/n at i = 0 [1/year].

    The yearly payment that repays 1 of capital over n years at interest i (e.g. Newnan,
    Eschenbach & Lavelle, *Engineering Economic Analysis*, the (A/P, i, n) factor). Valid i >= 0,
    n > 0.

    >>> round(capital_recovery_factor(0.10, 10), 5)
    0.16275
    >>> capital_recovery_factor(0.0, 4)
    0.25
    """
    if years <= 0:
        raise InputError("plant.years", "must be more than 0", got=years)
    if rate == 0.0:
        return 1.0 / years
    growth = (1.0 + rate) ** years
    return rate * growth / (growth - 1.0)


def parse_equipment(entries: Any, where: str) -> dict[str, EquipmentPrice]:
    """The ``[equipment]`` table of a price book.

    >>> e = parse_equipment({"fermenter": {"price": "60", "size": "30 L", "life": "10 year"}}, "book")
    >>> e["fermenter"].size, e["fermenter"].exponent, e["fermenter"].life_years
    (0.03, 0.6, 10.0)
    """
    if not isinstance(entries, Mapping):
        raise InputError(f"{where}: equipment", "must be a table of KEY = {price, size, exponent, life}")
    out = {}
    for key, raw in entries.items():
        field = f"{where}: equipment.{key}"
        if not isinstance(raw, Mapping) or not {"price", "size", "life"} <= set(raw):
            raise InputError(field, 'needs price, size and life, e.g. {price = "60", size = "30 L", '
                             'exponent = 0.6, life = "10 year"}', got=raw)
        try:
            price = float(str(raw["price"]).strip())
        except ValueError:
            raise InputError(f"{field}.price", "must be a number in the book's currency", got=raw["price"]) from None
        exponent = raw.get("exponent", 0.6)
        if isinstance(exponent, bool) or not isinstance(exponent, (int, float)) or not 0.0 < exponent <= 1.5:
            raise InputError(f"{field}.exponent", "must be a number in (0, 1.5]", got=exponent)
        size, dimension = _size(raw["size"], f"{field}.size")
        years, cycles = _life(raw["life"], f"{field}.life")
        if price < 0:
            raise InputError(f"{field}.price", "a price cannot be negative", got=raw["price"])
        out[key] = EquipmentPrice(key, price, size, dimension, float(exponent), years, cycles)
    return out


@lru_cache(maxsize=256)
def _size(text: Any, field: str) -> tuple[float, str]:
    for dimension in _SIZE_DIMENSIONS:
        try:
            value = parse(text, field, dimension)
        except InputError:
            continue
        if value > 0:
            return value, dimension
    raise InputError(field, "must be a positive volume, mass, power or mass flow, e.g. '30 L', '5 kW'", got=text)


@lru_cache(maxsize=256)
def _life(text: Any, field: str) -> tuple[float | None, float | None]:
    words = str(text).split()
    if len(words) == 2 and words[1] in ("cycle", "cycles"):
        try:
            cycles = float(words[0])
        except ValueError:
            cycles = -1.0
        if cycles > 0:
            return None, cycles
        raise InputError(field, "must be a time such as '10 year' or a count such as '2000 cycles'", got=text)
    years = parse(text, field, "time") / _YEAR_S
    if years <= 0:
        raise InputError(field, "must be more than 0", got=text)
    return years, None


def price_items(needs: list[tuple[str, str, float, int, float]], book: Mapping[str, EquipmentPrice],
                plant) -> tuple[Item, ...]:
    """Price ``needs`` = ``(key, name, size SI, count, cycles a year)`` and their yearly payment.

    >>> book = parse_equipment({"box": {"price": "100", "size": "10 L", "life": "5 year", "exponent": 0.5}}, "b")
    >>> from co2routes.sources.plantplan import PlantPlan
    >>> item = price_items([("box", "cool box", 0.04, 2, 52.0)], book, PlantPlan(interest_rate=0.0))[0]
    >>> item.price, item.yearly
    (400.0, 80.0)
    """
    items = []
    for key, name, size, count, cycles_a_year in needs:
        entry = book.get(key)
        if entry is None or count <= 0:
            unit = ""
            items.append(Item(key, name, size, unit, count, None if entry is None else 0.0, None,
                              None if entry is None else 0.0))
            continue
        price = count * entry.price * (size / entry.size) ** entry.exponent
        life = entry.life_years if entry.life_years is not None else entry.life_cycles / max(cycles_a_year, 1e-12)
        yearly = price * capital_recovery_factor(plant.interest_rate, min(life, plant.years))
        items.append(Item(key, name, size, _SIZE_DIMENSIONS[entry.dimension], count, price, life, yearly))
    return tuple(items)


def capital_per_kg(items: tuple[Item, ...], product_kg_a_year: float, plant) -> float | None:
    """Owning cost per kg of end product: sum of yearly payments / kg a year; 0 when the gear is
    already owned, ``None`` when a price is unknown.

    >>> from co2routes.sources.plantplan import PlantPlan
    >>> capital_per_kg((Item("k", "kiln", 1.0, "kg", 1, 100.0, 5.0, 20.0),), 400.0, PlantPlan())
    0.05
    """
    if plant.owned:
        return 0.0
    if any(item.yearly is None for item in items):
        return None
    return sum(item.yearly for item in items) / product_kg_a_year  # type: ignore[misc]


def cycles_a_year(period_s: float | None, units: int, staggered: bool, batches_per_year: int) -> float:
    """Batches one unit runs a year: every period side by side, every ``units`` periods staggered.

    >>> cycles_a_year(86400.0, 3, True, 1)
    121.75
    """
    if period_s is None:
        return float(batches_per_year)
    return _YEAR_S / (period_s * (units if staggered else 1))


def ceil_units(x: float) -> int:
    """Whole units to hold ``x`` (never fewer than one).

    >>> ceil_units(2.0000000001), ceil_units(0.2)
    (2, 1)
    """
    return max(1, math.ceil(x - 1e-6))

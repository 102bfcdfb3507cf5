"""The scenario's ``[plant]`` table: how the plant is owned, financed and stored into.

Keys (every quantity a string with units; all optional)::

    [plant]
    interest_rate = "5 %"          # a year, for the capital recovery factor
    years = "10 year"              # years the plant is used; equipment is paid off over them
    owned = false                  # true: the equipment is already owned, cost = running cost
    batches_per_year = 1           # a demand given as a mass per batch: batches made a year
    filling_ratio = "0.68 kg/L"    # kg of CO2 per litre of a cylinder's water capacity
    cylinder_size = "13.4 L"       # a cylinder's water capacity
    refrigerant = "R134a"          # CoolProp name of the chiller's refrigerant
    evaporator_approach = "5 K"
    condenser_approach = "10 K"
    refrigeration_efficiency = "65 %"

The default filling ratio 0.68 kg/L is the United States rule for CO2 (49 CFR 173.304a(a)(2),
its table of filling densities: 68 % of the water capacity); other rules allow more for
cylinders tested to higher pressures, so a user states their local rule's value here.
"""

from __future__ import annotations

from dataclasses import dataclass
from typing import Any, Callable, Mapping

from co2routes.thermo.errors import InputError
from co2routes.thermo.units import parse

#: The rule the default filling ratio comes from.
FILLING_RULE = "US 49 CFR 173.304a: 0.68 kg per L of water capacity"

_KEYS = ("interest_rate", "years", "owned", "batches_per_year", "filling_ratio", "cylinder_size",
         "refrigerant", "evaporator_approach", "condenser_approach", "refrigeration_efficiency")


@dataclass(frozen=True, slots=True)
class PlantPlan:
    """The ``[plant]`` table in SI: interest rate [1/year], years of use, owned switch, batches a
    year (mass-per-batch demand), filling ratio [kg/m3 of water capacity], cylinder water
    capacity [m3], refrigerant, approaches [K] and the chiller compressor's isentropic efficiency."""

    interest_rate: float = 0.05
    years: float = 10.0
    owned: bool = False
    batches_per_year: int = 1
    filling_ratio_kg_m3: float = 680.0
    cylinder_volume_m3: float = 0.0134
    refrigerant: str = "R134a"
    evaporator_approach_k: float = 5.0
    condenser_approach_k: float = 10.0
    refrigeration_efficiency: float = 0.65

    @property
    def filling_rule(self) -> str:
        """The rule the filling ratio follows: the default's named, else the user's own value."""
        if abs(self.filling_ratio_kg_m3 - 680.0) < 1e-9:
            return FILLING_RULE
        return f"user's rule: {self.filling_ratio_kg_m3 / 1000.0:.3g} kg per L of water capacity"


def validate_plant(table: Any, where: Callable[[str | None, str], str]) -> PlantPlan:
    """The :class:`PlantPlan` of a scenario's ``[plant]`` table; ``where(section, key)`` names the
    file and line of a key in errors.

    >>> validate_plant({"interest_rate": "8 %", "owned": True}, lambda s, k: f"{s}.{k}").interest_rate
    0.08
    >>> validate_plant({"years": "0 year"}, lambda s, k: f"{s}.{k}")
    Traceback (most recent call last):
    ...
    co2routes.thermo.errors.InputError: plant.years: must be more than 0 (got 0 year)
    """
    if not isinstance(table, Mapping):
        raise InputError(where(None, "plant"), "must be a table, e.g. [plant]")
    for key in table:
        if key not in _KEYS:
            raise InputError(where("plant", key), f"is not a key of [plant]; keys are {', '.join(sorted(_KEYS))}")

    def q(key: str, dimension: str, default: str, low: float, high: float, strict: bool = True) -> float:
        raw = table.get(key, default)
        value = parse(raw, where("plant", key), dimension)
        if value < low or (strict and value <= low) or value > high:
            allowed = f"must be more than {low:g}" if high == float("inf") else f"must lie in ({low:g}, {high:g}]"
            raise InputError(where("plant", key), allowed, got=raw)
        return value

    owned = table.get("owned", False)
    if not isinstance(owned, bool):
        raise InputError(where("plant", "owned"), "must be true or false", got=owned)
    batches = table.get("batches_per_year", 1)
    if isinstance(batches, bool) or not isinstance(batches, int) or batches < 1:
        raise InputError(where("plant", "batches_per_year"), "must be a whole number of at least 1", got=batches)
    ratio = q("filling_ratio", "density", "0.68 kg/L", 0.0, 1100.0)
    return PlantPlan(
        interest_rate=q("interest_rate", "fraction", "5 %", 0.0, 1.0, strict=False),
        years=q("years", "time", "10 year", 0.0, float("inf")) / (365.25 * 86400.0),
        owned=owned, batches_per_year=batches, filling_ratio_kg_m3=ratio,
        cylinder_volume_m3=q("cylinder_size", "volume", "13.4 L", 0.0, float("inf")),
        refrigerant=str(table.get("refrigerant", "R134a")),
        evaporator_approach_k=q("evaporator_approach", "temperature_difference", "5 K", 0.0, 50.0),
        condenser_approach_k=q("condenser_approach", "temperature_difference", "10 K", 0.0, 50.0),
        refrigeration_efficiency=q("refrigeration_efficiency", "fraction", "65 %", 0.0, 1.0),
    )

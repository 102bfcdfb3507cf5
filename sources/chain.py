"""The hazard of the whole chain: the highest level over every step from making to the product.

Levels as the routes use them: 1 low, 2 medium, 3 high. Steps, in the order the gas meets them:
making (or buying), the buffer, drying and its regeneration, compression and pressure, liquid
storage, flashing and dry ice. The chain's level is the highest; the first step at that level
names it. The rules for each step are this project's own (common practice):

* buffer: a gas bag 1 (CO2 gathers low if it leaks), a low-pressure tank 2;
* drying: a bed near room pressure 1; hot regeneration 2 (steam, a bed at its regeneration
  temperature);
* compression: 3 from :data:`HIGH_PRESSURE_PA` up (a gas at tens of bar, a hot compressor
  head), else 2;
* liquid storage: cylinders filled on site 3 (a liquid whose pressure climbs with temperature);
* flashing and dry ice: 2 (snow at -78.5 degC, gas that displaces air).
"""

from __future__ import annotations

from dataclasses import dataclass
from typing import Any

#: Pressure from which compression counts as a high hazard [Pa]: 10 bar (common practice; many
#: pressure-equipment rules start their stricter classes near there).
HIGH_PRESSURE_PA = 10e5


@dataclass(frozen=True, slots=True)
class Step:
    """One step of the chain with its hazard level and why."""

    step: str
    level: int
    reason: str


def chain_steps(made: Any, schedule: Any, dryer: Any, delivery: Any, dryer_plan: Any) -> tuple[Step, ...]:
    """Every step of the chain with its level (rules in the module notes)."""
    steps = [Step("buying" if made.delivers != "raw-gas" else "making", made.hazard, made.hazard_reason)]
    if schedule is not None and schedule.buffer_kind == "gas bag":
        steps.append(Step("buffer", 1, "a gas bag of CO2: a leak gathers low down"))
    elif schedule is not None and schedule.buffer_kind == "low-pressure tank":
        steps.append(Step("buffer", 2, f"a buffer tank at {schedule.buffer_pressure_pa / 1e5:.0f} bar"))
    if dryer is not None:
        steps.append(_drying(dryer, dryer_plan))
    liq = None if delivery is None else delivery.liquefaction
    if liq is not None:
        p = liq.condensing_pressure_pa
        level = 3 if p >= HIGH_PRESSURE_PA else 2
        steps.append(Step("compression", level, f"a compressor to {p / 1e5:.0f} bar, discharge at "
                          f"{liq.discharge_temperature_k - 273.15:.0f} degC"))
        if delivery.end_product == "liquid":
            steps.append(Step("liquid storage", 3, "cylinders filled on site: the liquid's pressure "
                              "climbs steeply with temperature"))
    if delivery is not None and delivery.end_product == "dry-ice" and made.delivers != "dry-ice":
        steps.append(Step("flashing and dry ice", 2, "liquid flashed to snow at -78.5 degC; the gas "
                          "vented displaces air"))
    return tuple(steps)


def _drying(dryer: Any, plan: Any) -> Step:
    from co2routes.thermo.desiccants import get_desiccant

    if dryer.regeneration_heat_j is None:
        return Step("drying", 1, f"a {dryer.desiccant} bed near room pressure, changed when spent")
    t = get_desiccant(plan.desiccant).regeneration_temperature_k
    return Step("drying", 2, f"regeneration heats the {dryer.desiccant} bed to {t - 273.15:.0f} degC "
                "and drives off steam")


def highest(steps: tuple[Step, ...]) -> Step:
    """The first step at the highest level.

    >>> highest((Step("making", 1, "a"), Step("compression", 3, "b"), Step("storage", 3, "c"))).step
    'compression'
    """
    top = max(s.level for s in steps)
    return next(s for s in steps if s.level == top)

"""One route's plant put together: schedule, dryer, delivery, stores, equipment and the chain's hazard.

Called by :func:`co2routes.sources.pipeline.evaluate` once the route's batch is made. Order: the
delivery first (its compressors' draw shapes the buffer), then the schedule
(:mod:`co2routes.sources.plant`), the dryer on the schedule's flows
(:mod:`co2routes.sources.conditioning`), the stores (:mod:`co2routes.sources.stores`), the equipment
and its owning cost (:mod:`co2routes.sources.gear`, :mod:`co2routes.sources.equipment`) and the
hazard of every step (:mod:`co2routes.sources.chain`).

The end product a year, which the owning cost divides by: the demand's rate times a year
(365.25 days), or the batch times ``plant.batches_per_year`` for a demand given per batch.
"""

from __future__ import annotations

from dataclasses import dataclass
from typing import Any, Callable, Mapping

from co2routes.sources.base import RouteResult

_YEAR_S = 365.25 * 86400.0


@dataclass(frozen=True, slots=True)
class Works:
    """What the plant adds to a route's batch (see the module notes)."""

    schedule: Any
    dried: Any
    delivery: Any
    stores: Any
    compressors: int
    equipment: tuple[Any, ...]
    capital_per_kg: float | None
    hazard_steps: tuple[Any, ...]
    time_h: float
    warnings: tuple[str, ...]
    notes: tuple[str, ...]


def build(route_id: str, scenario, made: RouteResult, run: Callable[[float], RouteResult],
          options: Mapping[str, Any], product_kg: float, flash: Any) -> Works:
    """The plant around ``made`` for ``scenario`` (``run(kg)`` computes the route's batch of kg)."""
    from co2routes.sources.chain import chain_steps
    from co2routes.sources.conditioning import condition
    from co2routes.sources.delivery import plan_delivery, storage_loss_kg
    from co2routes.sources.equipment import capital_per_kg, cycles_a_year, price_items
    from co2routes.sources.gear import compressors_for, plant_needs, route_needs
    from co2routes.sources.plant import breath_limit, plan_schedule
    from co2routes.sources.stores import plan_stores

    site, plant, period = scenario.site, scenario.plant, scenario.batch_s
    delivery = plan_delivery(product_kg, made.co2_kg, flash, scenario.end_product, made.delivers,
                             scenario.delivery, site, made.raw_gas.dry_co2_fraction)
    liq = delivery.liquefaction
    flow = liq.mass_flow_kg_s if liq is not None else None
    compressors = compressors_for(made.co2_kg, period, flow) if liq is not None else 0
    draw = flow * compressors if flow else None
    limit = breath_limit(options) if route_id == "breath" else None
    schedule = plan_schedule(made, run, made.co2_kg, period, site, draw, limit)
    dried = condition(made, scenario.dryer, site, schedule, used_as_is=options.get("capture") == "no")
    box_loss = storage_loss_kg(scenario.delivery, site) if scenario.end_product == "dry-ice" else 0.0
    shown = delivery if scenario.end_product != "gas" else None
    stores = plan_stores(shown, plant, site, period, draw, box_loss)
    cycles = cycles_a_year(period, schedule.units, schedule.mode == "staggered", plant.batches_per_year)
    warnings: list[str] = []
    own = route_needs(route_id, made, schedule, options, cycles)
    if own is None and schedule.units:
        warnings.append(f"The equipment of route {route_id} is not listed: its owning cost counts only "
                        "the buffer, dryer and delivery.")
    items = price_items((own or []) + plant_needs(schedule, dried.dryer, shown, stores, compressors, draw,
                                                  cycles), scenario.prices.equipment, plant)
    a_year = product_kg * (_YEAR_S / period if period else plant.batches_per_year)
    capital = capital_per_kg(items, a_year, plant)
    if not schedule.meets_demand:
        warnings.append(f"Cannot keep up with the demand: {schedule.note}.")
    notes = [schedule.note] if schedule.meets_demand and schedule.note else []
    unknown = [i.name for i in items if i.price is None]
    if unknown and not plant.owned:
        warnings.append(f"No price for {', '.join(unknown)} in the price book's [equipment]: owning cost unknown.")
    steps = chain_steps(made, schedule, dried.dryer, shown, scenario.dryer)
    delivery_h = delivery.time_h / max(compressors, 1)
    return Works(schedule, dried, delivery, stores, compressors, items, capital, steps,
                 max(schedule.unit_time_h, delivery_h), tuple(warnings), tuple(notes) + stores.notes)

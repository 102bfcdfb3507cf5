"""What each part of the plant needs to own: the route's units, the buffer, the dryer and delivery.

One need is ``(price-book key, name, size in SI, count, cycles a unit runs a year)``, priced by
:func:`co2routes.sources.equipment.price_items`. A route's units are sized for one unit's batch
(:class:`co2routes.sources.plant.Schedule`): a vessel by what it holds, a burner by its firing rate,
a kiln or bed by the CO2 of one charge, a capture unit or column by its CO2 flow. Allowances:
a fermenter keeps a quarter of its volume as headspace for the foam (common practice); an acid
generator keeps half its height free for foaming (as the acid-carbonate route assumes); liquors
are taken at 1 kg/L.
"""

from __future__ import annotations

from typing import Any, Callable, Mapping

from co2routes.sources.base import RouteResult
from co2routes.sources.equipment import ceil_units

Need = tuple[str, str, float, int, float]


def _byproduct_kg(made: RouteResult, name: str) -> float:
    return sum(b.mass_kg for b in made.byproducts if b.name == name)


def _vessel(key: str, name: str, byproduct: str, allowance: float):
    def need(made: RouteResult, share: float, unit_s: float, options: Mapping[str, Any]) -> list[tuple[str, str, float]]:
        return [(key, name, _byproduct_kg(made, byproduct) * share / 1000.0 * allowance)]
    return need


def _charge(key: str, name: str, shared: bool = False):
    def need(made, share, unit_s, options):
        return [(key, name, made.co2_kg * share, shared)]
    return need


def _burner(made, share, unit_s, options):
    out = [("burner", "burner", made.energy.fuel_kwh * share * 3.6e6 / unit_s)]
    if options.get("capture") == "yes":
        out.append(("capture-unit", "CO2 capture unit", made.co2_kg * share / unit_s))
    return out


def _column(made, share, unit_s, options):
    return [("absorption-column", "absorption column and release vessel", made.co2_kg * share / unit_s)]


def _both(*parts):
    def need(made, share, unit_s, options):
        return [n for part in parts for n in part(made, share, unit_s, options)]
    return need


#: route id -> the route's own units as ``(key, name, size[, shared])`` per unit; a shared item
#: (a kiln, busy a few hours a charge) serves staggered units one at a time, so one is owned.
ROUTE_GEAR: dict[str, Callable[..., list[tuple[str, str, float]]]] = {
    "fermentation": _vessel("fermenter", "fermenter", "spent wash", 1.25),
    "acid-carbonate": _vessel("generator-vessel", "gas generator vessel", "spent liquor", 2.0),
    "combustion": _burner,
    "sorbent-calcination": _both(_charge("lime-bed", "lime bed and fan"), _charge("kiln", "kiln", True)),
    "breath": _both(_charge("breath-collector", "breath collector and lime bed"), _charge("kiln", "kiln", True)),
    "water-absorption": _column,
    "purchase": lambda made, share, unit_s, options: [],
}


def route_needs(route_id: str, made: RouteResult, schedule, options: Mapping[str, Any],
                cycles: float) -> list[Need] | None:
    """The route's own units, or ``None`` when the route is not one this module knows (a route
    added by a plug-in: the comparison then says its own units are not counted)."""
    gear = ROUTE_GEAR.get(route_id)
    if gear is None:
        return None
    if schedule.units == 0:
        return []
    share = schedule.unit_co2_kg / made.co2_kg
    staggered = schedule.mode == "staggered"
    out = []
    for key, name, size, *shared in gear(made, share, schedule.unit_time_h * 3600.0, options):
        one = bool(shared and shared[0]) and staggered
        if size > 0:
            out.append((key, name, size, 1 if one else schedule.units, cycles * schedule.units if one else cycles))
    return out


def plant_needs(schedule, dryer: Any, delivery: Any, stores: Any, compressors: int,
                draw_kg_s: float | None, cycles: float) -> list[Need]:
    """Buffer, dryer vessel, compressors, chiller, cylinders and dry-ice box."""
    needs: list[Need] = []
    if schedule.buffer_volume_m3 > 0:
        key = "gas-bag" if schedule.buffer_kind == "gas bag" else "buffer-tank"
        needs.append((key, schedule.buffer_kind, schedule.buffer_volume_m3, 1, cycles))
    if dryer is not None:
        needs.append(("dryer-vessel", "dryer vessel", dryer.bed_volume_m3, 1, cycles))
    if delivery is not None and delivery.liquefaction is not None and compressors > 0:
        flow = draw_kg_s / compressors if draw_kg_s else schedule.mean_flow_kg_s
        needs.append(("compressor", "CO2 compressor", flow, compressors, cycles))
    if stores.chiller_w:
        needs.append(("chiller", "condenser chiller", stores.chiller_w, 1, cycles))
    if stores.cylinders_owned:
        needs.append(("cylinder", "liquid CO2 cylinder", stores.cylinder_volume_m3, stores.cylinders_owned, cycles))
    if stores.box_volume_m3:
        needs.append(("dry-ice-box", "insulated dry-ice box", stores.box_volume_m3, 1, cycles))
    return needs


def compressors_for(raw_kg: float, period_s: float | None, mass_flow_kg_s: float | None) -> int:
    """Compressors that move a period's raw CO2 within the period (one for a single batch).

    >>> compressors_for(100.0, 86400.0, 0.0005)
    3
    """
    if period_s is None or not mass_flow_kg_s:
        return 1
    return ceil_units(raw_kg / (mass_flow_kg_s * period_s))

"""The comparison's answers as records: the JSON ``compare --json`` and ``batch --json`` print,
and the heat sign in words. Text, Markdown and CSV are drawn from these by :mod:`co2routes.tui.report`.
"""

from __future__ import annotations

import dataclasses
from typing import Any

from co2routes.sources.pipeline import Comparison
from co2routes.sources.plan import PlannedRoute
from co2routes.sources.plant_records import plant_record
from co2routes.sources.rank import RouteRow, why_place
from co2routes.sources.value import raw_figures


def row_record(row: RouteRow) -> dict[str, Any]:
    """The JSON record of one row (the keys ``compare --json`` prints).

    Per-kg figures are per kg of the end product (``heat_kj_per_kg`` the batch's heat, signed as
    ``heat_kj``; ``water_g_per_kg`` the raw gas's water); ``score`` 0 worst .. 1 best and ``score_parts`` the
    share each criterion adds to it (:mod:`co2routes.sources.rank`).
    """
    r = row.result
    figures = raw_figures(r)
    return {
        "id": r.route_id,
        "label": r.label,
        "rank": row.rank,
        "status": row.status,
        "score": round(row.score, 6),
        "score_parts": {k: round(v, 6) for k, v in row.score_parts.items()},
        "breaks": list(row.breaks),
        "non_dominated": row.non_dominated,
        "dominated_by": row.dominated_by,
        "co2_kg": r.co2_kg,
        "cost_per_kg": r.cost_per_kg,
        "energy_kwh_per_kg": r.energy_kwh_per_kg,
        "time_h": r.time_h,
        "reagent_kg_per_kg": r.reagent_kg_per_kg,
        "heat_kj": r.heat_kj,
        "heat_kj_per_kg": r.heat_kj / r.per_kg_basis,
        "water_g_per_kg_co2": r.water_g_per_kg_co2,
        "water_g_per_kg": figures["water"],
        "co2_mole_fraction": r.raw_gas.co2_mole_fraction,
        "hazard": r.hazard,
        "hazard_reason": r.hazard_reason,
        "delivers": r.delivers,
        "product_kg": r.per_kg_basis,
        "dryer": dryer_record(r.dryer),
        "delivery": delivery_record(r.delivery),
        **plant_record(r),
        "warnings": list(r.warnings),
        "cautions": list(r.cautions),
    }


def dryer_record(bed: Any) -> dict[str, Any] | None:
    """The sized bed of a route (a :class:`co2routes.thermo.dryer.DryerResult`) as JSON, ``None`` without one.

    >>> dryer_record(None) is None
    True
    """
    if bed is None:
        return None
    heat = bed.regeneration_heat_j
    return {
        "desiccant": bed.desiccant,
        "bed_mass_kg": bed.bed_mass_kg,
        "bed_volume_l": bed.bed_volume_m3 * 1000.0,
        "bed_diameter_m": bed.bed_diameter_m,
        "bed_length_m": bed.bed_length_m,
        "water_load_kg_per_cycle": bed.water_load_kg_per_cycle,
        "pressure_drop_pa": bed.pressure_drop_pa,
        "breakthrough_h": bed.breakthrough_s / 3600.0,
        "target_ppmv": bed.target_ppmv,
        "outlet_ppmv": bed.outlet_ppmv,
        "outlet_dew_point_k": bed.outlet_dew_point_k,
        "reaches_target": bed.reaches_target,
        "regeneration_heat_kj": None if heat is None else heat / 1000.0,
    }


def delivery_record(delivery: Any) -> dict[str, Any] | None:
    """Compression and flash of a route (a :class:`co2routes.sources.delivery.Delivery`) as JSON.

    ``None`` when the end product is gas. Compression figures are ``None`` when the route hands
    over CO2 already condensed or solid (bought); ``work_kj_per_kg`` and
    ``heat_rejected_kj_per_kg`` are per kg of CO2 condensed, as in ``co2routes liquefy``;
    ``raw_co2_kg_per_kg`` is kg of raw CO2 per kg of end product (flash and purchase losses);
    ``cannot_condense`` says why the gas cannot be condensed (``None``: it can).

    >>> delivery_record(None) is None
    True
    """
    if delivery is None:
        return None
    liq, flash = delivery.liquefaction, delivery.flash
    timed = liq is not None and liq.mass_flow_kg_s
    return {
        "end_product": delivery.end_product,
        "product_kg": delivery.product_kg,
        "raw_co2_kg": delivery.raw_co2_kg,
        "raw_co2_kg_per_kg": delivery.raw_per_product,
        "condensing_temperature_k": None if liq is None else liq.condensing_temperature_k,
        "condensing_pressure_pa": None if liq is None else liq.condensing_pressure_pa,
        "stages": None if liq is None else len(liq.stages),
        "work_kj_per_kg": None if liq is None else liq.work_j_per_kg / 1000.0,
        "discharge_temperature_k": None if liq is None else liq.discharge_temperature_k,
        "heat_rejected_kj_per_kg": None if liq is None else liq.heat_rejected_j_per_kg / 1000.0,
        "electricity_kwh": delivery.electricity_kwh,
        "time_h": delivery.time_h if timed else None,
        "solid_fraction": None if flash is None else flash.solid_fraction,
        "cannot_condense": delivery.cannot_condense,
    }


def comparison_record(comparison: Comparison) -> dict[str, Any]:
    """The whole comparison as the JSON ``compare --json`` prints."""
    return {
        "scenario": comparison.scenario_name,
        "end_product": comparison.end_product,
        "currency": comparison.currency,
        "weights": dict(comparison.weights),
        "reference_cost_per_kg": comparison.reference_cost,
        "limits": dict(comparison.limits),
        "route_choice": {"include": None if comparison.include is None else list(comparison.include),
                         "exclude": list(comparison.exclude)},
        "routes": [{**row_record(row), "why": why} for row, why in zip(comparison.rows, whys(comparison.rows))],
        "not_applicable": [{"id": n.route_id, "label": n.label, "reason": n.reason}
                           for n in comparison.not_applicable],
        "failures": list(comparison.failures),
        # the answer's own lists, as every command has: what went wrong, every route's cautions
        "warnings": list(comparison.failures),
        "cautions": list(dict.fromkeys(c for row in comparison.rows for c in row.result.cautions)),
        **dict(comparison.demand),
    }


def whys(rows: tuple[RouteRow, ...]) -> list[str]:
    """Each row's place in words: for a ranked route the criteria that set it against its
    neighbour above (the first: below), else the limits it breaks or that it is hidden."""
    ranked = [r for r in rows if r.status == "ranked"]
    out = []
    for row in rows:
        if row.status != "ranked":
            out.append("hidden by the route choice" if row.hidden else "over a limit: " + "; ".join(row.breaks))
            continue
        at = ranked.index(row)
        out.append(why_place(row, ranked[at - 1] if at else None, ranked[at + 1] if at + 1 < len(ranked) else None))
    return out


def batch_record(result: PlannedRoute, currency: str) -> dict[str, Any]:
    """The full recipe of one route (the JSON ``batch --json`` prints)."""
    return {
        "route": result.route_id,
        "label": result.label,
        "currency": currency,
        "co2_kg": result.co2_kg,
        "co2_generated_kg": result.co2_generated_kg,
        "reagents": [
            {"name": g.name, "formula": g.formula, "mass_kg": g.mass_kg, "volume_l": g.volume_l,
             "pure_mass_kg": g.pure_mass_kg, "cost": _cost_of(result, g.name)}
            for g in result.reagents
        ],
        "byproducts": [
            {"name": b.name, "formula": b.formula, "mass_kg": b.mass_kg, "note": b.note}
            for b in result.byproducts
        ],
        "heat_kj": result.heat_kj,
        "heat_in_words": heat_words(result.heat_kj, result.temperature_change_k is not None),
        "temperature_change_k": result.temperature_change_k,
        "raw_gas_mole_fractions": dict(result.raw_gas.mole_fractions),
        "water_g_per_kg_co2": result.water_g_per_kg_co2,
        "co2_mole_fraction": result.raw_gas.co2_mole_fraction,
        "energy_kwh_per_kg": result.energy_kwh_per_kg,
        "electricity_kwh": result.energy.electricity_kwh,
        "fuel_kwh": result.energy.fuel_kwh,
        "heat_supplied_kwh": result.energy.heat_kwh,
        "time_h": result.time_h,
        "costs": [dataclasses.asdict(line) for line in result.costs],
        "cost_per_kg": result.cost_per_kg,
        "hazard": result.hazard,
        "hazard_reason": result.hazard_reason,
        "end_product": "gas" if result.delivery is None else result.delivery.end_product,
        "product_kg": result.per_kg_basis,
        "dryer": dryer_record(result.dryer),
        "delivery": delivery_record(result.delivery),
        **plant_record(result),
        "notes": list(result.notes),
        "warnings": list(result.warnings),
        "cautions": list(result.cautions),
    }


def _cost_of(result: PlannedRoute, name: str) -> float | None:
    for line in result.costs:
        if line.item == name:
            return line.cost
    return None


def heat_words(heat_kj: float, liquor: bool = True) -> str:
    """The heat sign said in words; ``liquor`` says whether the heat lands in a batch liquor
    (acid on carbonate, a reaction in solution) or must be supplied or carried away (a kiln, a
    burner, a fermenter over days).

    >>> heat_words(12.0)
    'takes heat in (the batch cools)'
    >>> heat_words(-3.0)
    'gives heat off (the batch warms)'
    >>> heat_words(500.0, liquor=False)
    'takes heat in (it must be supplied)'
    """
    if abs(heat_kj) < 0.05:
        return "neither takes in nor gives off noticeable heat"
    if heat_kj > 0:
        return "takes heat in (the batch cools)" if liquor else "takes heat in (it must be supplied)"
    return "gives heat off (the batch warms)" if liquor else "gives heat off (to be carried away)"

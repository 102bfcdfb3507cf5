"""The side-by-side comparison: every route for one scenario, costed, conditioned and ranked.

For each route: compute the batch, size its dryer from its raw gas, add delivery (compression,
storage, dry ice) when the end product asks for it, price everything with the scenario's price
book, then rank all routes by a weighted score of the criteria in :data:`co2routes.sources.scenario.CRITERIA`.

The score is this project's own: each criterion is scaled across the routes to 0 (best) .. 1
(worst), an unknown value counts as worst, and the weighted mean of the scaled criteria orders the
ranking (lower is better; a tie goes to the lower cost).
"""

from __future__ import annotations

import dataclasses
from dataclasses import dataclass
from typing import Any, Callable, Mapping, Sequence

from co2routes.sources.base import Route, RouteRequest, RouteResult, Use
from co2routes.sources.guard import failure_line, named_in, option_table_field, route_options, run_route
from co2routes.sources.prices import cost_lines
from co2routes.sources.registry import catalogue
from co2routes.sources.scenario import CRITERIA, Scenario

#: How each criterion is read off a row, and whether higher is better.
_CRITERION: dict[str, tuple[Callable[["RouteRow"], float | None], bool]] = {
    "cost": (lambda r: r.cost_per_kg, False),
    "energy": (lambda r: r.result.energy_kwh_per_kg, False),
    "time": (lambda r: r.result.time_h, False),
    "heat": (lambda r: abs(r.result.heat_kj) / r.result.per_kg_basis, False),
    "water": (lambda r: r.result.water_g_per_kg_co2, False),
    "purity": (lambda r: r.result.raw_gas.co2_mole_fraction, True),
    "hazard": (lambda r: float(r.result.hazard), False),
}


@dataclass(frozen=True, slots=True)
class RouteRow:
    """One route in the comparison: its costed result, rank and score (0 best .. 1 worst)."""

    result: RouteResult
    rank: int
    score: float

    @property
    def cost_per_kg(self) -> float | None:
        """Cost per kg of the end product (``None`` when a price is unknown)."""
        return self.result.cost_per_kg


@dataclass(frozen=True, slots=True)
class Comparison:
    """Every route's row, best first, with the weights used and any route that failed."""

    scenario_name: str
    end_product: str
    currency: str
    weights: Mapping[str, float]
    rows: tuple[RouteRow, ...]
    failures: tuple[str, ...]


def evaluate(route: Route, scenario: Scenario, co2_kg: float | None = None,
             options: Mapping[str, str] | None = None) -> RouteResult:
    """One route's batch for ``scenario``: made, dried, delivered as the end product, priced.

    ``co2_kg`` is the end product wanted (default the scenario's demand); ``options`` override
    the scenario's options for this route. For dry ice the route is asked for the raw CO2 the
    flash needs (:func:`co2routes.sources.delivery.raw_co2_needed`). The batch's time is the longer of the
    route's and the compressor's (the compressor draws from a buffer while the gas comes).
    """
    from co2routes.sources.conditioning import condition
    from co2routes.sources.delivery import plan_delivery, raw_co2_needed

    given = dict(scenario.options.get(route.id, {}))
    given.update(options or {})
    parsed = route_options(route, given, scenario)
    product_kg = scenario.co2_kg if co2_kg is None else co2_kg

    def run(kg: float) -> RouteResult:
        return run_route(route, RouteRequest(co2_kg=kg, site=scenario.site, options=parsed,
                                             end_product=scenario.end_product))

    result = run(product_kg)
    raw_kg, flash = raw_co2_needed(product_kg, scenario.end_product, result.delivers,
                                   scenario.delivery, scenario.site)
    if raw_kg != product_kg:
        result = run(raw_kg)
    dried = condition(result, scenario.dryer, scenario.site)
    delivery = plan_delivery(product_kg, result.co2_kg, flash, scenario.end_product,
                             result.delivers, scenario.delivery, scenario.site)
    uses = result.uses + dried.uses
    if delivery.electricity_kwh > 0:
        uses += (Use("compression (electric motor)", delivery.electricity_kwh, "energy_kwh", "electricity"),)
    energy = dataclasses.replace(
        result.energy,
        electricity_kwh=result.energy.electricity_kwh + dried.electricity_kwh + delivery.electricity_kwh)
    merged = dataclasses.replace(
        result, uses=uses, energy=energy, product_kg=product_kg, dryer=dried.dryer,
        delivery=delivery if scenario.end_product != "gas" else None,
        time_h=max(result.time_h, delivery.time_h),
        warnings=_unique(result.warnings + dried.warnings + delivery.warnings),
        cautions=_unique(result.cautions + dried.cautions + delivery.cautions),
        notes=_unique(result.notes + delivery.notes),
    )
    return dataclasses.replace(merged, costs=cost_lines(merged.reagents, merged.uses, scenario.prices))


def _unique(items: Sequence[str]) -> tuple[str, ...]:
    """``items`` without repeats, first occurrence kept."""
    return tuple(dict.fromkeys(items))


def rank(results: Sequence[RouteResult], weights: Mapping[str, float]) -> tuple[RouteRow, ...]:
    """Order ``results`` by the weighted score; returns rows best first.

    >>> rank([], {"cost": 1.0})
    ()
    """
    provisional = [RouteRow(r, 0, 0.0) for r in results]
    total_weight = sum(w for k, w in weights.items() if k in _CRITERION and w > 0) or 1.0
    scores = [0.0] * len(provisional)
    for key in CRITERIA:
        weight = weights.get(key, 0.0)
        if weight <= 0:
            continue
        read, higher_better = _CRITERION[key]
        values = [read(row) for row in provisional]
        known = [v for v in values if v is not None]
        low, high = (min(known), max(known)) if known else (0.0, 0.0)
        for i, v in enumerate(values):
            if v is None:
                scaled = 1.0
            elif high > low:
                scaled = (high - v) / (high - low) if higher_better else (v - low) / (high - low)
            else:
                scaled = 0.0
            scores[i] += weight * scaled / total_weight
    order = sorted(range(len(provisional)), key=lambda i: (
        round(scores[i], 12),
        provisional[i].cost_per_kg if provisional[i].cost_per_kg is not None else float("inf")))
    return tuple(RouteRow(provisional[i].result, n + 1, scores[i]) for n, i in enumerate(order))


def compare(scenario: Scenario, routes: Sequence[Route] | None = None) -> Comparison:
    """Every route (default: every route found) for ``scenario``, ranked."""
    cat = catalogue()
    chosen = cat.routes if routes is None else tuple(routes)
    check_option_tables(scenario, (*cat.routes, *chosen))
    results = []
    failures = list(cat.failures)
    for route in chosen:
        try:
            results.append(evaluate(route, scenario))
        except Exception as err:  # noqa: BLE001 - a broken route is reported, not fatal
            from co2routes.thermo.errors import InputError

            if isinstance(err, InputError):
                raise named_in(scenario, err) from None
            failures.append(failure_line(route, err))
    return Comparison(scenario.name, scenario.end_product, scenario.prices.currency,
                      dict(scenario.weights), rank(results, scenario.weights), tuple(failures))


def check_option_tables(scenario: Scenario, routes: Sequence[Route]) -> None:
    """Refuse an ``[options.ID]`` table of ``scenario`` whose ID is none of ``routes``' ids.

    Without this a mistyped route id would leave that route on its defaults without a word.
    """
    from co2routes.thermo.errors import InputError

    known = {r.id for r in routes}
    for route_id in scenario.options:
        if route_id not in known:
            raise InputError(option_table_field(scenario, route_id),
                             f"names no route found; routes are {', '.join(sorted(known))}")


def row_record(row: RouteRow) -> dict[str, Any]:
    """The JSON record of one row (the keys ``compare --json`` prints)."""
    r = row.result
    return {
        "id": r.route_id,
        "label": r.label,
        "rank": row.rank,
        "score": round(row.score, 6),
        "co2_kg": r.co2_kg,
        "cost_per_kg": r.cost_per_kg,
        "energy_kwh_per_kg": r.energy_kwh_per_kg,
        "time_h": r.time_h,
        "reagent_kg_per_kg": r.reagent_kg_per_kg,
        "heat_kj": r.heat_kj,
        "water_g_per_kg_co2": r.water_g_per_kg_co2,
        "co2_mole_fraction": r.raw_gas.co2_mole_fraction,
        "hazard": r.hazard,
        "hazard_reason": r.hazard_reason,
        "delivers": r.delivers,
        "product_kg": r.per_kg_basis,
        "dryer": dryer_record(r.dryer),
        "delivery": delivery_record(r.delivery),
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
    ``raw_co2_kg_per_kg`` is kg of raw CO2 per kg of end product (flash and purchase losses).

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
    }


def comparison_record(comparison: Comparison) -> dict[str, Any]:
    """The whole comparison as the JSON ``compare --json`` prints."""
    return {
        "scenario": comparison.scenario_name,
        "end_product": comparison.end_product,
        "currency": comparison.currency,
        "weights": dict(comparison.weights),
        "routes": [row_record(row) for row in comparison.rows],
        "failures": list(comparison.failures),
        # the answer's own lists, as every command has: what went wrong, every route's cautions
        "warnings": list(comparison.failures),
        "cautions": list(dict.fromkeys(c for row in comparison.rows for c in row.result.cautions)),
    }


def batch_record(result: RouteResult, currency: str) -> dict[str, Any]:
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
        "notes": list(result.notes),
        "warnings": list(result.warnings),
        "cautions": list(result.cautions),
    }


def _cost_of(result: RouteResult, name: str) -> float | None:
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

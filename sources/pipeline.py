"""The comparison's one pipeline: route -> dryer -> delivery -> prices, for every route.

For each route: compute the batch (:class:`~co2routes.sources.base.RouteResult`), size its dryer
from its raw gas, add delivery (compression, storage, dry ice) when the end product asks for it,
price everything with the scenario's price book (:class:`~co2routes.sources.plan.PlannedRoute`),
then rank (:mod:`co2routes.sources.rank`). A route that refuses the scenario (its own
:class:`InputError`, e.g. a fermenter too cold) is listed as not applicable with its reason; the
others are still ranked.
"""

from __future__ import annotations

from dataclasses import dataclass, field
from typing import Any, Mapping, Sequence

from co2routes.sources.base import Energy, Route, RouteRequest, RouteResult, Use
from co2routes.sources.choice import check_route_ids, demand_break, hidden_ids, limit_breaks
from co2routes.sources.guard import (check_total, failure_line, named_in, option_table_field, route_options,
                                      run_route)
from co2routes.sources.plan import NotApplicable, PlannedRoute
from co2routes.sources.prices import cost_lines, missing_prices, route_prices
from co2routes.sources.rank import RouteRow, rank
from co2routes.sources.registry import catalogue
from co2routes.sources.scenario import Scenario
from co2routes.sources.uses import demand_fields
from co2routes.sources.value import reference_cost
from co2routes.thermo.errors import InputError


class RouteRefused(InputError):
    """A route's own refusal of the scenario; the field names the route, the text the input."""


@dataclass(frozen=True, slots=True)
class Comparison:
    """Every route's row, best first, the routes that cannot run with their reasons, the weights
    used and any route that failed to load or crashed.

    ``limits`` are the hard limits applied (key -> value, :mod:`co2routes.sources.choice`);
    ``include`` / ``exclude`` the route choice (rows of routes left out are listed as hidden);
    ``reference_cost`` the cost anchor of the score [currency/kg], ``None`` when the price book has
    no price of bought CO2 (:func:`co2routes.sources.value.reference_cost`).
    """

    scenario_name: str
    end_product: str
    currency: str
    weights: Mapping[str, float]
    rows: tuple[RouteRow, ...]
    failures: tuple[str, ...]
    not_applicable: tuple[NotApplicable, ...] = ()
    #: the demand per day and where it came from (:func:`co2routes.sources.uses.demand_fields`)
    demand: Mapping[str, Any] = field(default_factory=dict)
    limits: Mapping[str, float] = field(default_factory=dict)
    include: tuple[str, ...] | None = None
    exclude: tuple[str, ...] = ()
    reference_cost: float | None = None


def evaluate(route: Route, scenario: Scenario, co2_kg: float | None = None,
             options: Mapping[str, str] | None = None) -> PlannedRoute:
    """One route's batch for ``scenario``: made, dried, delivered as the end product, priced.

    ``co2_kg`` is the end product wanted (default the scenario's demand); ``options`` override
    the scenario's options for this route. For dry ice the route is asked for the raw CO2 the
    flash needs (:func:`co2routes.sources.delivery.raw_co2_needed`). The plant around the batch
    (schedule, dryer, delivery, stores, equipment, the chain's hazard) comes from
    :func:`co2routes.sources.works.build`; the batch's time is the longer of one unit's and one
    compressor's (the compressors draw from a buffer while the gas comes). A user's mistake in an
    option raises :class:`InputError`; the route's own refusal of
    the scenario raises :class:`RouteRefused` naming the route.
    """
    from co2routes.sources.delivery import raw_co2_needed
    from co2routes.sources.works import build

    given = dict(scenario.options.get(route.id, {}))
    given.update(options or {})
    parsed = route_options(route, given, scenario)
    product_kg = scenario.co2_kg if co2_kg is None else co2_kg

    def run(kg: float) -> RouteResult:
        try:
            return run_route(route, RouteRequest(co2_kg=kg, site=scenario.site, options=parsed,
                                                 end_product=scenario.end_product))
        except InputError as err:  # the route's own refusal, its field already names the route
            raise RouteRefused(err.field, err.allowed, err.got) from None

    made = run(product_kg)
    raw_kg, flash = raw_co2_needed(product_kg, scenario.end_product, made.delivers,
                                   scenario.delivery, scenario.site)
    if raw_kg != product_kg:
        made = run(raw_kg)
    works = build(route.id, scenario, made, run, parsed, product_kg, flash)
    dried, delivery, stores = works.dried, works.delivery, works.stores
    uses = made.uses + dried.uses + stores.uses
    if delivery.electricity_kwh > 0:
        uses += (Use("compression (electric motor)", delivery.electricity_kwh, "energy_kwh", "electricity"),)
    energy = Energy(made.energy.electricity_kwh + dried.electricity_kwh + delivery.electricity_kwh
                    + stores.refrigeration_kwh, made.energy.fuel_kwh, made.energy.heat_kwh)
    costs = cost_lines(made.reagents, uses, scenario.prices, route_prices(route))
    planned = PlannedRoute(
        route_id=route.id, label=route.label, made=made, product_kg=product_kg, uses=uses,
        energy=energy, time_h=works.time_h,
        warnings=_unique(made.warnings + dried.warnings + delivery.warnings + works.warnings
                         + missing_prices(costs)),
        cautions=_unique(made.cautions + dried.cautions + delivery.cautions),
        notes=_unique(made.notes + delivery.notes + works.notes),
        dryer=dried.dryer, delivery=delivery if scenario.end_product != "gas" else None,
        costs=costs, schedule=works.schedule,
        equipment=works.equipment, capital_per_kg=works.capital_per_kg, stores=stores,
        hazard_steps=works.hazard_steps)
    check_total(route.id, planned.total_cost)
    return planned


def _unique(items: Sequence[str]) -> tuple[str, ...]:
    """``items`` without repeats, first occurrence kept."""
    return tuple(dict.fromkeys(items))


def compare(scenario: Scenario, routes: Sequence[Route] | None = None) -> Comparison:
    """Every route (default: every route found) for ``scenario``, ranked.

    A route that refuses the scenario is listed in ``not_applicable`` with its reason; a route
    that crashes is listed in ``failures``; neither stops the others.
    """
    cat = catalogue()
    chosen = cat.routes if routes is None else tuple(routes)
    check_option_tables(scenario, (*cat.routes, *chosen))
    check_route_ids(scenario, (r.id for r in (*cat.routes, *chosen)))
    results: list[PlannedRoute] = []
    refused: list[NotApplicable] = []
    failures = list(cat.failures)
    for route in chosen:
        try:
            results.append(evaluate(route, scenario))
        except RouteRefused as err:
            refused.append(NotApplicable(route.id, route.label, str(err).removeprefix(f"route {route.id}: ")))
        except InputError as err:
            raise named_in(scenario, err) from None
        except Exception as err:  # noqa: BLE001 - a broken route is reported, not fatal
            failures.append(failure_line(route, err))
    reference = reference_cost(scenario.prices, scenario.end_product)
    breaks = {r.route_id: demand_break(r) + limit_breaks(r, scenario.limits, scenario.prices.currency)
              for r in results}
    rows = rank(results, scenario.weights, reference_cost=reference, breaks=breaks,
                hidden=hidden_ids(scenario, (r.route_id for r in results)))
    return Comparison(scenario.name, scenario.end_product, scenario.prices.currency,
                      dict(scenario.weights), rows, tuple(failures), tuple(refused), demand_fields(scenario),
                      dict(scenario.limits), scenario.include, tuple(scenario.exclude), reference)


def check_option_tables(scenario: Scenario, routes: Sequence[Route]) -> None:
    """Refuse an ``[options.ID]`` table of ``scenario`` whose ID is none of ``routes``' ids.

    Without this a mistyped route id would leave that route on its defaults without a word.
    """
    known = {r.id for r in routes}
    for route_id in scenario.options:
        if route_id not in known:
            raise InputError(option_table_field(scenario, route_id),
                             f"names no route found; routes are {', '.join(sorted(known))}")

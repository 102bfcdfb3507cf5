"""One-at-a-time sensitivity of every route's cost per kg: the data of a tornado chart.

For each route, each input that can move its cost (see :func:`co2routes.sources.whatif.targets`) is set to
the low and then the high end of its range while every other input stays nominal, and the cost
per kg is recomputed: prices through the route's price-linear cost lines (exact, no
re-computation), every other input by evaluating the route again. Inputs are ordered by the width
of their swing, ``|cost_high - cost_low|``; an input that does not move the cost is left out.

Ranges: the ``[uncertain]`` entry's bounds when the scenario gives one (the 10th and 90th
percentiles for a normal or lognormal), else the defaults of :data:`co2routes.sources.whatif.SWINGS`:
prices x0.75 / x1.25, efficiencies and other fractions -/+ 5 points, temperatures -/+ 5 K, demand
x0.5 / x2, other quantities x0.75 / x1.25, all kept inside the input's valid range.
"""

from __future__ import annotations

from dataclasses import dataclass
from typing import Any, Mapping, Sequence

from co2routes.sources.base import Route
from co2routes.sources.registry import catalogue
from co2routes.sources.scenario import Scenario
from co2routes.sources.guard import failure_line, named_in
from co2routes.sources.whatif import (SCENARIO_INPUTS, Distribution, Target, cost_model, evaluate_at, price_unit,
                            targets)
from co2routes.sources.pipeline import RouteRefused
from co2routes.thermo.errors import InputError


@dataclass(frozen=True, slots=True)
class Swing:
    """One input swung from ``low`` to ``high`` [SI, ``unit``] and the cost per kg at each end."""

    name: str
    unit: str
    nominal: float
    low: float
    high: float
    cost_per_kg_low: float | None
    cost_per_kg_high: float | None

    @property
    def effect(self) -> float | None:
        """Width of the swing in cost per kg (``None`` when an end is unknown)."""
        if self.cost_per_kg_low is None or self.cost_per_kg_high is None:
            return None
        return abs(self.cost_per_kg_high - self.cost_per_kg_low)


@dataclass(frozen=True, slots=True)
class RouteSensitivity:
    """A route's nominal cost per kg and its swings, widest first."""

    route_id: str
    label: str
    cost_per_kg: float | None
    inputs: tuple[Swing, ...]
    warnings: tuple[str, ...] = ()
    cautions: tuple[str, ...] = ()


@dataclass(frozen=True, slots=True)
class Sensitivity:
    """Every route's sensitivity for one scenario, in the catalogue's route order."""

    scenario_name: str
    currency: str
    routes: tuple[RouteSensitivity, ...]
    failures: tuple[str, ...]


def _extra_target(name: str, route: Route, scenario: Scenario) -> Target | None:
    """A target for an ``[uncertain]`` scenario-wide input outside the defaults (``None`` if unset)."""
    if name not in SCENARIO_INPUTS:
        return None
    dimension, swing, (get, _), lowest, highest = SCENARIO_INPUTS[name]
    value = get(scenario)
    return None if value is None else Target(name, dimension, float(value), lowest, highest, swing)


def route_sensitivity(route: Route, scenario: Scenario,
                      distributions: Mapping[str, Distribution] | None = None) -> RouteSensitivity:
    """The tornado of one route (see the module docstring)."""
    distributions = distributions or {}
    base = evaluate_at(route, scenario, {})
    model = cost_model(base, scenario.prices)
    nominal = base.cost_per_kg
    if nominal is None:
        return RouteSensitivity(route.id, base.label, None, (),
                                ("a price is unknown, so its cost cannot be swung",), base.cautions)
    found = targets(route, scenario, base)
    for name in distributions:
        if name not in found and (extra := _extra_target(name, route, scenario)) is not None:
            found[name] = extra
    swings: list[Swing] = []
    warnings: list[str] = []
    for name, target in found.items():
        if name in distributions:
            low, high = distributions[name].swing()
            if low < target.lowest or high > target.highest:
                warnings.append(f"{name}: range kept inside its valid range {target.lowest:g} .. {target.highest:g}")
                low, high = max(low, target.lowest), min(high, target.highest)
        else:
            low, high = target.default_range()
        if not high > low:
            continue
        ends: list[float | None] = []
        for value in (low, high):
            if target.is_price:
                ends.append(model.cost_per_kg({name[len("prices."):]: value}, scenario.prices))
                continue
            try:
                ends.append(evaluate_at(route, scenario, {name: value}).cost_per_kg)
            except InputError as err:
                warnings.append(f"{name} = {value:g}: {err}")
                ends.append(None)
        unit = price_unit(scenario.prices.get(name[7:])) if target.is_price else target.unit()
        swing = Swing(name, unit, target.nominal, low, high, ends[0], ends[1])
        if swing.effect != 0.0:
            swings.append(swing)
    swings.sort(key=lambda s: (s.effect is None, -(s.effect or 0.0), s.name))
    return RouteSensitivity(route.id, base.label, nominal, tuple(swings),
                            tuple(base.warnings) + tuple(warnings), base.cautions)


def sensitivity(scenario: Scenario, distributions: Mapping[str, Distribution] | None = None,
                routes: Sequence[Route] | None = None) -> Sensitivity:
    """Every route's tornado (default: every route found). A route that breaks is reported."""
    cat = catalogue()
    chosen = cat.routes if routes is None else tuple(routes)
    out, failures = [], list(cat.failures)
    for route in chosen:
        try:
            out.append(route_sensitivity(route, scenario, distributions))
        except RouteRefused as err:
            failures.append(f"route {route.id!r} not applicable: {str(err).removeprefix(f'route {route.id}: ')}")
        except InputError as err:
            raise named_in(scenario, err) from None
        except Exception as err:  # noqa: BLE001 - a broken route is reported, not fatal
            failures.append(failure_line(route, err))
    return Sensitivity(scenario.name, scenario.prices.currency, tuple(out), tuple(failures))


def sensitivity_record(result: Sensitivity) -> dict[str, Any]:
    """The JSON ``sensitivity --json`` prints."""
    cautions: list[str] = []
    for r in result.routes:
        cautions += [c for c in r.cautions if c not in cautions]
    return {
        "scenario": result.scenario_name,
        "currency": result.currency,
        "routes": [
            {"id": r.route_id, "label": r.label, "cost_per_kg": r.cost_per_kg,
             "inputs": [{"name": s.name, "unit": s.unit, "nominal": s.nominal, "low": s.low, "high": s.high,
                         "cost_per_kg_low": s.cost_per_kg_low, "cost_per_kg_high": s.cost_per_kg_high}
                        for s in r.inputs],
             "warnings": list(r.warnings)}
            for r in result.routes
        ],
        "failures": list(result.failures),
        "warnings": [],
        "cautions": cautions,
    }

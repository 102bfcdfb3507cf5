"""Monte Carlo over every route at once: cost per kg percentiles and the chance each is cheapest.

Every input named in the scenario's ``[uncertain]`` table is drawn independently, ``samples``
times, from one seeded ``numpy.random.Generator`` (inputs in name order, so a seed repeats a
result exactly). With no ``[uncertain]`` table, every price a route uses is drawn uniformly over
x0.75 .. x1.25 of its book value, and the result says so.

How a sample's cost is found, without a Python loop per sample:

- **Prices** act exactly: each cost line is its price's amount times a coefficient
  (:class:`co2routes.sources.whatif.CostModel`), so a line's cost in sample s is ``cost x P_s / P_nominal``.
- **Other inputs** (efficiencies, temperatures, strengths, demand) are non-linear. Each is
  evaluated through the full route model at ``grid`` points across its distribution (the bounds
  of a uniform or triangular, the 0.1 % .. 99.9 % quantiles of a normal or lognormal, spaced
  evenly in probability) and each line's cost per kg of CO2 is interpolated linearly per sample
  (``numpy.interp``). Several such inputs are combined additively around the nominal point,
  ``c(x) ~ c0 + sum_j [c(x_j, nominal others) - c0]`` (first-order cut-HDMR: Rabitz & Alis 1999,
  J. Math. Chem. 25, 197-233): interactions between two non-price inputs are neglected, while
  every price x input product is kept exactly. Samples beyond the grid take its end values.

A zero-width spread (``low == high`` or ``sd = 0``) is no spread at all: the input is set to that
value and the result equals the nominal comparison bit for bit.
"""

from __future__ import annotations

import secrets
import time
from dataclasses import dataclass, field
from typing import Any, Callable, Mapping, Sequence

import numpy as np

from co2routes.sources.base import Route
from co2routes.sources.choice import demand_break
from co2routes.sources.registry import catalogue
from co2routes.sources.scenario import Scenario
from co2routes.sources.guard import RouteFault, failure_line, named_in
from co2routes.sources.whatif import SCENARIO_INPUTS, Distribution, cost_model, evaluate_at, price_keys, targets
from co2routes.sources.pipeline import RouteRefused
from co2routes.thermo.errors import InputError

#: Grid points per non-price input (the interpolation nodes).
GRID_POINTS = 9


@dataclass(frozen=True, slots=True)
class RouteSpread:
    """One route's sampled cost per kg: nominal, mean and percentiles, and the fraction of samples
    in which it is the cheapest route. ``None`` throughout when a price is unknown;
    ``probability_cheapest`` alone ``None`` for a route that cannot keep up with the demand (it
    does not contest the cheapest place, :func:`co2routes.sources.choice.demand_break`).
    ``samples`` is the cost per kg of every sample (for a histogram)."""

    route_id: str
    label: str
    cost_per_kg_nominal: float | None
    cost_per_kg_mean: float | None
    cost_per_kg_p10: float | None
    cost_per_kg_p50: float | None
    cost_per_kg_p90: float | None
    probability_cheapest: float | None
    samples: np.ndarray | None = field(default=None, compare=False, repr=False)


@dataclass(frozen=True, slots=True)
class Uncertainty:
    """The Monte Carlo result: every route, the inputs drawn, timings [s] and notes."""

    scenario_name: str
    currency: str
    samples: int
    seed: int
    inputs: tuple[Distribution, ...]
    routes: tuple[RouteSpread, ...]
    warnings: tuple[str, ...]
    failures: tuple[str, ...]
    cautions: tuple[str, ...]
    seconds_evaluating: float
    seconds_sampling: float


def default_distributions(scenario: Scenario, routes: Sequence[Route]) -> dict[str, Distribution]:
    """Every known price the routes use, uniform over x0.75 .. x1.25 of its nominal value."""
    from co2routes.sources.pipeline import evaluate

    out: dict[str, Distribution] = {}
    for route in routes:
        try:
            result = evaluate(route, scenario)
        except RouteFault:
            continue  # reported with the route's name when the route itself is run
        for key in price_keys(result):
            price = scenario.prices.get(key) if key else None
            if price is not None and f"prices.{key}" not in out:
                out[f"prices.{key}"] = Distribution(f"prices.{key}", "uniform", low=0.75 * price.amount,
                                                    high=1.25 * price.amount)
    return out


def _grid(dist: Distribution, points: int) -> np.ndarray:
    """Interpolation nodes evenly spaced in probability across the distribution's support."""
    if dist.kind in ("uniform", "triangular"):
        q = np.linspace(0.0, 1.0, points)
    else:
        q = np.linspace(0.001, 0.999, points)
    return np.unique(dist.quantile(q))


def uncertainty(scenario: Scenario, distributions: Mapping[str, Distribution] | None, samples: int,
                seed: int | None = None, routes: Sequence[Route] | None = None,
                progress: Callable[[int, int], None] | None = None, grid: int = GRID_POINTS) -> Uncertainty:
    """Monte Carlo of every route's cost per kg (see the module docstring).

    ``progress(done, total)`` is called as route evaluations and sampling finish.
    """
    if isinstance(samples, bool) or not isinstance(samples, int) or samples < 1:
        raise InputError("samples", "must be a whole number of at least 1", got=samples)
    cat = catalogue()
    chosen = cat.routes if routes is None else tuple(routes)
    warnings: list[str] = []
    failures = list(cat.failures)
    if not distributions:
        distributions = default_distributions(scenario, chosen)
        warnings.append("the scenario has no [uncertain] table: every price each route uses is drawn "
                        "uniformly over x0.75 .. x1.25 of its book value")
    seed = secrets.randbits(32) if seed is None else int(seed)
    book = scenario.prices
    fixed = {n: d.value for n, d in distributions.items() if d.degenerate and not n.startswith("prices.")}
    for name, value in fixed.items():
        if name in SCENARIO_INPUTS:
            scenario = SCENARIO_INPUTS[name][2][1](scenario, value)
    varying = {n: d for n, d in distributions.items() if not d.degenerate and not n.startswith("prices.")}
    prices = {n[len("prices."):]: d for n, d in distributions.items() if n.startswith("prices.")}

    def applies(name: str, route: Route) -> bool:
        return name in SCENARIO_INPUTS or name.startswith(f"options.{route.id}.")

    total_steps = sum(grid * sum(applies(n, r) for n in varying) for r in chosen) + len(chosen)
    done = 0

    def step() -> None:
        nonlocal done
        done += 1
        if progress is not None:
            progress(done, total_steps)

    start = time.perf_counter()
    plans = []  # (route, base result, model, [(name, nodes, per-line cost per kg at nodes)])
    for route in chosen:
        route_fixed = {n: v for n, v in fixed.items() if n.startswith(f"options.{route.id}.")}
        try:
            base = evaluate_at(route, scenario, route_fixed)
            model = cost_model(base, book)
            found = targets(route, scenario, base)
            curves = []
            for name, dist in sorted(varying.items()):
                if not applies(name, route):
                    continue
                nodes = _grid(dist, grid)
                lowest, highest = (SCENARIO_INPUTS[name][3:5] if name in SCENARIO_INPUTS
                                   else (found[name].lowest, found[name].highest))
                if nodes[0] < lowest or nodes[-1] > highest:
                    warnings.append(f"{name}: samples beyond {lowest:g} .. {highest:g} "
                                    f"are held at that range for {route.id}")
                    nodes = np.unique(np.clip(nodes, lowest, highest))
                table = np.zeros((len(model.items), len(nodes)))
                for g, x in enumerate(nodes):
                    result = evaluate_at(route, scenario, {**route_fixed, name: float(x)})
                    at = cost_model(result, book)
                    table[:, g] = _line_basis(at, model, prices, book) * (model.basis_kg / at.basis_kg)
                    step()
                curves.append((name, nodes, table))
        except RouteRefused as err:
            failures.append(f"route {route.id!r} not applicable: {str(err).removeprefix(f'route {route.id}: ')}")
        except InputError as err:
            raise named_in(scenario, err) from None
        except Exception as err:  # noqa: BLE001 - a broken route is reported, not fatal
            failures.append(failure_line(route, err))
            continue
        plans.append((route, base, model, curves))
    seconds_evaluating = time.perf_counter() - start

    start = time.perf_counter()
    rng = np.random.default_rng(seed)
    drawn = {name: distributions[name].sample(rng, samples) for name in sorted(distributions)
             if name in varying or name.startswith("prices.")}
    for key in prices:
        if np.any(drawn[f"prices.{key}"] < 0.0):
            warnings.append(f"prices.{key}: negative samples of its spread are taken as zero")
            drawn[f"prices.{key}"] = np.maximum(drawn[f"prices.{key}"], 0.0)
    costs: list[np.ndarray | None] = []
    for route, base, model, curves in plans:
        costs.append(_route_costs(model, curves, drawn, prices, book) if model.known else None)
        step()
    short = [i for i, (_, base, _, _) in enumerate(plans) if demand_break(base)]
    for i in short:
        warnings.append(f"{plans[i][0].id}: demand not met, so not counted for the cheapest route "
                        "(its costs are still drawn)")
    known = [i for i, c in enumerate(costs) if c is not None and i not in short]
    cheapest = np.zeros(len(costs))
    if known:
        matrix = np.column_stack([costs[i] for i in known])
        counts = np.bincount(np.argmin(matrix, axis=1), minlength=len(known))
        for j, i in enumerate(known):
            cheapest[i] = counts[j] / samples
    spreads = []
    for i, (route, base, model, _) in enumerate(plans):
        c = costs[i]
        if c is None:
            spreads.append(RouteSpread(route.id, base.label, None, None, None, None, None, None))
            continue
        p10, p50, p90 = (float(v) for v in np.percentile(c, [10.0, 50.0, 90.0]))
        spreads.append(RouteSpread(route.id, base.label, base.cost_per_kg, float(np.mean(c)), p10, p50, p90,
                                   None if i in short else float(cheapest[i]), c))
    seconds_sampling = time.perf_counter() - start
    cautions: list[str] = []
    for _, base, _, _ in plans:
        cautions += [c for c in base.cautions if c not in cautions]
    return Uncertainty(scenario.name, book.currency, samples, seed,
                       tuple(distributions[n] for n in sorted(distributions)), tuple(spreads),
                       tuple(dict.fromkeys(warnings)), tuple(failures), tuple(cautions),
                       seconds_evaluating, seconds_sampling)


def _line_basis(at, model, prices: Mapping[str, Distribution], book) -> np.ndarray:
    """Each line of ``model`` (matched by item and price key in ``at``) as the factor its price
    multiplier scales: the line cost, or its cost per unit price when the nominal price is zero."""
    index = {(item, key): i for i, (item, key) in enumerate(zip(at.items, at.keys))}
    out = np.zeros(len(model.items))
    for n, (item, key) in enumerate(zip(model.items, model.keys)):
        i = index.get((item, key))
        if i is None:
            continue
        cost = at.costs[i]
        if key in prices and book.get(key).amount == 0.0:
            cost = at.per_unit[i]
        if cost is None:
            raise InputError(f"prices.{key}", "is unknown at some values of an uncertain input")
        out[n] = cost
    return out


def _route_costs(model, curves, drawn, prices, book) -> np.ndarray:
    """Cost per kg of every sample of one route (vectorised over samples; see the module docstring)."""
    base = np.array([(model.per_unit[n] if key in prices and book.get(key).amount == 0.0 else model.costs[n])
                     for n, key in enumerate(model.keys)], dtype=float)
    total: Any = 0.0
    for n, key in enumerate(model.keys):
        line: Any = base[n]
        for name, nodes, table in curves:
            line = line + (np.interp(drawn[name], nodes, table[n]) - base[n])
        if key in prices:
            nominal = book.get(key).amount
            sampled = drawn[f"prices.{key}"]
            line = line * (sampled / nominal if nominal > 0.0 else sampled)
        total = total + line
    size = len(next(iter(drawn.values()))) if drawn else 1
    # the owning cost per kg is held at its nominal value (it does not move with prices)
    return np.broadcast_to(np.asarray(total / model.basis_kg + model.fixed_per_kg, dtype=float), (size,)).copy()


def uncertainty_record(result: Uncertainty) -> dict[str, Any]:
    """The JSON ``uncertainty --json`` prints."""
    def spread(d: Distribution) -> dict[str, Any]:
        return {"name": d.name, "dist": d.kind, **{k: getattr(d, k) for k in ("low", "mode", "high", "mean", "sd")
                                                   if getattr(d, k) is not None}}
    return {
        "scenario": result.scenario_name,
        "currency": result.currency,
        "samples": result.samples,
        "seed": result.seed,
        "inputs": [spread(d) for d in result.inputs],
        "routes": [
            {"id": r.route_id, "label": r.label, "cost_per_kg_nominal": r.cost_per_kg_nominal,
             "cost_per_kg_mean": r.cost_per_kg_mean, "cost_per_kg_p10": r.cost_per_kg_p10,
             "cost_per_kg_p50": r.cost_per_kg_p50, "cost_per_kg_p90": r.cost_per_kg_p90,
             "probability_cheapest": r.probability_cheapest}
            for r in result.routes
        ],
        "failures": list(result.failures),
        "warnings": list(result.warnings),
        "cautions": list(result.cautions),
    }

"""What the interface's workers compute: the ranking, the cost-against-demand sweep and the points
of the saturation chart. Every number comes from :mod:`sources` or :mod:`thermo`; this module
only calls them and samples curves, and it imports no widget so it is tested in plain pytest.

These functions run in thread workers, off the start-up path: the first call imports pint, the
route models and, through them, CoolProp and Cantera.
"""

from __future__ import annotations

import dataclasses
import time
from dataclasses import dataclass
from typing import Any, Callable, Mapping, Sequence

#: Multiples of the scenario's demand the cost-against-demand chart is drawn at.
SWEEP_FACTORS = (0.25, 0.5, 1.0, 2.0, 4.0)


@dataclass(frozen=True, slots=True)
class Outcome:
    """A validated scenario, its ranked comparison and how long the work took [s]."""

    scenario: Any
    comparison: Any
    seconds: float


@dataclass(frozen=True, slots=True)
class Sweep:
    """Cost per kg of every route at several batch sizes; ``None`` where a price is unknown."""

    co2_kg: tuple[float, ...]
    cost_per_kg: Mapping[str, tuple[float | None, ...]]
    labels: Mapping[str, str]
    currency: str


@dataclass(frozen=True, slots=True)
class SaturationCurve:
    """Liquid-vapour saturation line of CO2 (triple to critical point) and marked points.

    ``marks`` are ``(label, temperature [K], pressure [Pa])``.
    """

    temperatures_k: tuple[float, ...]
    pressures_pa: tuple[float, ...]
    marks: tuple[tuple[str, float, float], ...]
    notes: tuple[str, ...]


def outcome(document: Mapping[str, Any], source: str, text: str | None = None,
            routes: Sequence[Any] | None = None,
            proceed: Callable[[], bool] | None = None) -> Outcome | None:
    """Validate ``document`` and rank every route for it (raises ``InputError`` on bad input).

    ``proceed`` is asked after validation, which is quick, and before the ranking, which is not:
    when it answers ``False`` (a newer edit has come in) nothing more is done and ``None`` is
    returned.
    """
    from co2routes.sources.pipeline import compare
    from co2routes.sources.scenario import validate

    start = time.perf_counter()
    scenario = validate(document, source, text)
    if proceed is not None and not proceed():
        return None
    comparison = compare(scenario, routes)
    return Outcome(scenario, comparison, time.perf_counter() - start)


def demand_sweep(scenario: Any, routes: Sequence[Any] | None = None,
                 factors: Sequence[float] = SWEEP_FACTORS, known: Any = None,
                 proceed: Callable[[], bool] | None = None) -> Sweep | None:
    """Cost per kg of each route when the batch is ``factor`` times the scenario's.

    Each point is a full :func:`co2routes.sources.pipeline.compare` of the scenario at that batch size, so
    the chart shows exactly what the ranking would at that demand. A batch size that a route
    refuses gives ``None`` for that route at that point. ``known`` is the comparison at the
    scenario's own size (factor 1), reused rather than worked out again; ``proceed`` is asked
    before each point, and ``False`` stops the sweep (``None`` is returned).
    """
    from co2routes.sources.pipeline import compare
    from co2routes.thermo.errors import InputError

    sizes = tuple(scenario.co2_kg * f for f in factors)
    costs: dict[str, list[float | None]] = {}
    labels: dict[str, str] = {}
    for i, size in enumerate(sizes):
        if proceed is not None and not proceed():
            return None
        try:
            comparison = known if known is not None and factors[i] == 1.0 else \
                compare(dataclasses.replace(scenario, co2_kg=size), routes)
        except InputError:
            comparison = None
        rows = {} if comparison is None else {row.result.route_id: row for row in comparison.rows}
        for rid, row in rows.items():
            labels.setdefault(rid, row.result.label)
            costs.setdefault(rid, [None] * len(sizes))
        for rid in costs:
            costs[rid][i] = rows[rid].cost_per_kg if rid in rows else None
    return Sweep(sizes, {k: tuple(v) for k, v in costs.items()}, labels, scenario.prices.currency)


def saturation_curve(scenario: Any, points: int = 40) -> SaturationCurve:
    """The saturation line with the condensing point and the storage point (a cylinder at the
    site's temperature) marked; for dry ice, the normal sublimation point as well."""
    from co2routes.thermo import co2

    low, high = co2.TRIPLE_TEMPERATURE_K + 0.01, co2.CRITICAL_TEMPERATURE_K - 0.01
    temps = tuple(low + (high - low) * i / (points - 1) for i in range(points))
    pressures = tuple(co2.saturation_at_temperature(t).pressure_pa for t in temps)
    marks: list[tuple[str, float, float]] = []
    notes: list[str] = []
    for label, t in (("condensing", scenario.delivery.condensing_temperature_k),
                     ("storage", scenario.site.temperature_k)):
        if low <= t <= high:
            marks.append((label, t, co2.saturation_at_temperature(t).pressure_pa))
        elif t > high:
            notes.append(f"{label} temperature {t - 273.15:.1f} degC is above the critical point: "
                         "no liquid forms there at any pressure")
        else:
            notes.append(f"{label} temperature {t - 273.15:.1f} degC is below the triple point: "
                         "CO2 is solid or gas there")
    if scenario.end_product == "dry-ice":
        marks.append(("dry ice, 1 atm", co2.NORMAL_SUBLIMATION_K, co2.ATMOSPHERE_PA))
    return SaturationCurve(temps, pressures, tuple(marks), tuple(notes))


def breakthrough_points(result: Any, scenario: Any, points: int = 41
                        ) -> tuple[tuple[float, ...], tuple[float, ...], str] | None:
    """The breakthrough curve of the dryer sized for ``result`` as ``(hours, outlet ppmv, label)``,
    from :func:`co2routes.thermo.dryer.breakthrough_curve`; ``None`` when the route needs no dryer.

    The inlet is rebuilt by :func:`co2routes.sources.conditioning.breakthrough` the way the comparison
    sized the bed.
    """
    from co2routes.sources.conditioning import breakthrough

    curve = breakthrough(result, scenario.dryer, scenario.site, points)
    if curve is None:
        return None
    return (tuple(p.time_s / 3600.0 for p in curve), tuple(p.outlet_ppmv for p in curve),
            "outlet water, ppmv")

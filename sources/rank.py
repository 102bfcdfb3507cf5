"""Ranking the planned routes by a weighted score of the criteria in
:data:`co2routes.sources.scenario.CRITERIA`.

The score is this project's own: each criterion is scaled across the routes to 0 (best) .. 1
(worst), an unknown value counts as worst, and the weighted mean of the scaled criteria orders the
ranking (lower is better; a tie goes to the lower cost).
"""

from __future__ import annotations

from dataclasses import dataclass
from typing import Callable, Mapping, Sequence

from co2routes.sources.plan import PlannedRoute
from co2routes.sources.scenario import CRITERIA

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
    """One route in the comparison: its planned batch, rank and score (0 best .. 1 worst)."""

    result: PlannedRoute
    rank: int
    score: float

    @property
    def cost_per_kg(self) -> float | None:
        """Cost per kg of the end product (``None`` when a price is unknown)."""
        return self.result.cost_per_kg


def rank(results: Sequence[PlannedRoute], weights: Mapping[str, float]) -> tuple[RouteRow, ...]:
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

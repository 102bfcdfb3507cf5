"""Ranking the planned routes: an additive multi-attribute value score on fixed scales.

Method: the simple multi-attribute rating technique (SMART, Edwards 1977; Edwards & Barron 1994),
i.e. the additive value model of Keeney & Raiffa (1976, ch. 3): each criterion ``i`` of
:data:`co2routes.sources.scenario.CRITERIA` is mapped to a value ``v_i`` in 0 (worst) .. 1 (best)
by a value function with fixed anchors (:mod:`co2routes.sources.value`), and the score is the
weighted mean

    score = sum_i w_i v_i / sum_i w_i        (0 worst .. 1 best; weights w_i >= 0)

Each term ``w_i v_i / sum w`` is the share criterion ``i`` adds (``score_parts``); the parts add
up to the score. Because every value function's anchors are fixed (never the best and worst
route present, as a "local scale" would be), a route's score depends on that route alone: adding,
removing or changing another route never swaps two others. Scores are compared exactly (as
fractions of the floats), and a tie goes to the lower cost, then the route id.

A route that breaks a hard limit (:mod:`co2routes.sources.choice`) is listed after the others
with the limits it breaks; a route the user hid is listed last, unranked. Among the ranked routes
a route that another is at least as good as on every weighted criterion, and better on one, is
*dominated* (Pareto); the others form the non-dominated set.
"""

from __future__ import annotations

from dataclasses import dataclass, field
from fractions import Fraction
from typing import Collection, Mapping, Sequence

from co2routes.sources.plan import PlannedRoute
from co2routes.sources.scenario import CRITERIA
from co2routes.sources.value import raw_figures, values

#: criteria where a larger figure is better (the rest: smaller is better)
LARGER_BETTER = frozenset({"purity"})


@dataclass(frozen=True, slots=True)
class RouteRow:
    """One route in the comparison.

    ``rank`` is its place (1 best; routes over a limit follow the others), ``None`` when the user
    hid it. ``score`` 0 (worst) .. 1 (best); ``score_parts`` the share each criterion adds to it
    (they sum to ``score``); ``values`` each criterion's value 0 .. 1 before weighting.
    ``breaks`` says which hard limits it breaks; ``hidden`` whether the user left it out;
    ``dominated_by`` the id of a ranked route at least as good on every weighted criterion and
    better on one (``None``: no ranked route is).
    """

    result: PlannedRoute
    rank: int | None
    score: float
    score_parts: Mapping[str, float] = field(default_factory=dict)
    values: Mapping[str, float] = field(default_factory=dict)
    breaks: tuple[str, ...] = ()
    hidden: bool = False
    dominated_by: str | None = None

    @property
    def cost_per_kg(self) -> float | None:
        """Cost per kg of the end product (``None`` when a price is unknown)."""
        return self.result.cost_per_kg

    @property
    def status(self) -> str:
        """``ranked``, ``over limit`` or ``hidden``."""
        return "hidden" if self.hidden else "over limit" if self.breaks else "ranked"

    @property
    def non_dominated(self) -> bool:
        """Whether the route is ranked and no ranked route beats it on every criterion."""
        return self.status == "ranked" and self.dominated_by is None


def additive(values_: Mapping[str, float], weights: Mapping[str, float]) -> tuple[float, dict[str, float]]:
    """The additive value score and each criterion's share of it.

    ``score = sum w_i v_i / sum w_i`` over the criteria with a positive weight (0 when none).
    Goodwin & Wright (*Decision Analysis for Management Judgment*, Wiley, ch. 3; 3rd ed. 2004, the
    edition from memory) work their office-location example with these numbers: Addison Square's values 100, 60, 100, 75, 0, 90
    and weights 32, 26, 23, 10, 6, 3 give 8080 / 100 = 80.8.

    >>> v = dict(zip("abcdef", (1.0, 0.6, 1.0, 0.75, 0.0, 0.9)))
    >>> score, parts = additive(v, dict(zip("abcdef", (32, 26, 23, 10, 6, 3))))
    >>> round(score * 100, 6), round(parts["b"], 4)
    (80.8, 0.156)
    """
    used = {k: float(w) for k, w in weights.items() if k in values_ and w > 0}
    total = sum(used.values())
    parts = {k: (used.get(k, 0.0) * v / total if total else 0.0) for k, v in values_.items()}
    return sum(parts.values()), parts


def _exact(values_: Mapping[str, float], weights: Mapping[str, float]) -> Fraction:
    """``sum w_i v_i`` computed exactly, so that orders never hang on rounding."""
    return sum((Fraction(float(w)) * Fraction(values_[k]) for k, w in weights.items()
                if k in values_ and w > 0), Fraction(0))


def rank(results: Sequence[PlannedRoute], weights: Mapping[str, float], *,
         reference_cost: float | None = None, breaks: Mapping[str, tuple[str, ...]] | None = None,
         hidden: Collection[str] = ()) -> tuple[RouteRow, ...]:
    """Order ``results`` by the additive score; returns rows: ranked best first, then those over a
    limit (``breaks``: route id -> limits broken), then the hidden ones (route ids).

    ``reference_cost`` anchors the cost scale (:func:`co2routes.sources.value.reference_cost`).

    >>> rank([], {"cost": 1.0})
    ()
    """
    breaks = breaks or {}
    weighted = {k: w for k, w in weights.items() if k in CRITERIA}
    scored = []
    for result in results:
        vals = values(raw_figures(result), reference_cost)
        score, parts = additive(vals, weighted)
        group = 2 if result.route_id in hidden else 1 if breaks.get(result.route_id) else 0
        cost = result.cost_per_kg
        key = (group, -_exact(vals, weighted), cost is None, cost or 0.0, result.route_id)
        scored.append((key, RouteRow(result, None, score, parts, vals, tuple(breaks.get(result.route_id, ())),
                                     result.route_id in hidden)))
    scored.sort(key=lambda item: item[0])
    rows = [item[1] for item in scored]
    beaten = dominance([r for r in rows if r.status == "ranked"], weighted)
    return tuple(_placed(row, None if row.hidden else n + 1, beaten.get(row.result.route_id))
                 for n, row in enumerate(rows))


def _placed(row: RouteRow, place: int | None, dominated_by: str | None) -> RouteRow:
    return RouteRow(row.result, place, row.score, row.score_parts, row.values, row.breaks, row.hidden,
                    dominated_by)


def _good(figures: Mapping[str, float | None], key: str) -> float:
    """A figure turned so that larger is better; unknown is the worst of all."""
    x = figures[key]
    if x is None or x != x:
        return float("-inf")
    return x if key in LARGER_BETTER else -x


def dominance(rows: Sequence[RouteRow], weights: Mapping[str, float]) -> dict[str, str]:
    """Route id -> id of the best-placed route that dominates it, for each dominated route.

    A dominates B when A is at least as good as B on every criterion with a positive weight and
    better on at least one (Pareto dominance, on the routes' own figures).
    """
    keys = [k for k in CRITERIA if weights.get(k, 0) > 0]
    good = [{k: _good(raw_figures(r.result), k) for k in keys} for r in rows]
    out: dict[str, str] = {}
    for j, b in enumerate(good):
        for i, a in enumerate(good):
            if i != j and keys and all(a[k] >= b[k] for k in keys) and any(a[k] > b[k] for k in keys):
                out[rows[j].result.route_id] = rows[i].result.route_id
                break
    return out


def why_place(row: RouteRow, above: RouteRow | None, below: RouteRow | None = None) -> str:
    """A short line saying which criteria set ``row`` against its neighbour above (or, for the
    first, against the one below): the criteria whose weighted shares differ most.

    >>> a = RouteRow(None, 1, 0.7, {"cost": 0.5, "hazard": 0.2})
    >>> b = RouteRow(None, 2, 0.6, {"cost": 0.3, "hazard": 0.3})
    >>> why_place(b, a).replace("ROUTE", "a")
    'below a (0.600 vs 0.700): behind on cost (-0.200); ahead on hazard (+0.100)'
    """
    other = above if above is not None else below
    if other is None:
        return "the only route listed"
    name = other.result.route_id if other.result is not None else "ROUTE"
    diffs = {k: row.score_parts.get(k, 0.0) - other.score_parts.get(k, 0.0) for k in row.score_parts}
    behind = sorted((k for k, d in diffs.items() if d < -5e-4), key=lambda k: diffs[k])[:2]
    ahead = sorted((k for k, d in diffs.items() if d > 5e-4), key=lambda k: -diffs[k])[:2]
    words = [f"behind on {', '.join(f'{k} ({diffs[k]:+.3f})' for k in behind)}"] if behind else []
    words += [f"ahead on {', '.join(f'{k} ({diffs[k]:+.3f})' for k in ahead)}"] if ahead else []
    where = "below" if other is above else "above"
    reason = "; ".join(words) if words else "level on every criterion"
    return f"{where} {name} ({row.score:.3f} vs {other.score:.3f}): {reason}"

"""Value functions of the ranking: each criterion mapped to 0 (worst) .. 1 (best) on a fixed scale.

The ranking (:mod:`co2routes.sources.rank`) is an additive multi-attribute value model (SMART,
Edwards 1977; Edwards & Barron 1994; the additive form of Keeney & Raiffa 1976, ch. 3). Each
criterion's value function here is a *global* scale in the sense of Belton & Stewart (2002, ch. 5):
its anchors are fixed in advance, never the best and worst route present, so a route's value
depends on that route alone and adding, removing or changing another route cannot move it.

Anchors (this project's choice, documented in the README; ``best`` scores 1, ``worst`` 0, values
between are interpolated on a log scale for quantities that span decades, on a linear scale
otherwise; a value past an anchor is clipped to it; an unknown value scores 0, the worst):

=========  ==============================================  ===================  ================
criterion  quantity                                        best                 worst
=========  ==============================================  ===================  ================
cost       cost per kg of end product                      reference / 10       reference x 10
energy     energy per kg of end product [kWh/kg]           0.01                 100
time       hours per batch [h]                             0.5                  1000
heat       abs(batch heat) per kg of end product [kJ/kg]   10                   100 000
water      water in the raw gas per kg of end product [g]  1                    1000
purity     CO2 mole fraction of the raw gas                1                    0
hazard     the route's hazard level, 1 low .. 3 high       1                    3
=========  ==============================================  ===================  ================

The cost reference is the scenario's own price of bought CO2 in the end product's form (the
price book's ``co2-cylinder``, ``co2-liquid`` or ``dry-ice``, see :func:`reference_cost`). It is a
price from the same price book as every route's cost, so a change of currency multiplies both by
the same factor and every cost value stays exactly where it was, clipped or not.
"""

from __future__ import annotations

import math
from typing import Any, Callable

#: criterion -> (best, worst) anchors of its log-scale value function (lower is better)
LOG_ANCHORS: dict[str, tuple[float, float]] = {
    "energy": (0.01, 100.0),
    "time": (0.5, 1000.0),
    "heat": (10.0, 1.0e5),
    "water": (1.0, 1000.0),
}
#: the cost anchors as multiples of the reference cost (the price of bought CO2)
COST_SPAN = (0.1, 10.0)
#: end product -> price-book key of buying that product outright
BOUGHT = {"gas": "co2-cylinder", "liquid": "co2-liquid", "dry-ice": "dry-ice"}
#: the hazard levels a route reports
HAZARD_BEST, HAZARD_WORST = 1.0, 3.0


def log_value(x: float | None, best: float, worst: float) -> float:
    """Value of ``x`` on a log scale, 1 at or below ``best``, 0 at or above ``worst``.

    ``v = ln(worst / x) / ln(worst / best)`` for ``best < x < worst`` (0 < best < worst; x in the
    criterion's own unit). An unknown or non-finite ``x`` scores 0 (worst). The log scale is the
    usual value function for a quantity whose ratios, not differences, matter (Belton & Stewart
    2002, ch. 5: the shape of a value function is a choice; this project's choice).

    >>> log_value(1.0, 0.1, 10.0), log_value(0.05, 0.1, 10.0), log_value(None, 0.1, 10.0)
    (0.5, 1.0, 0.0)
    >>> round(log_value(10.0 ** 0.5, 0.1, 10.0), 6)
    0.25
    """
    if x is None or not math.isfinite(x) or math.isnan(x):
        return 0.0
    if x <= best:
        return 1.0
    if x >= worst:
        return 0.0
    return math.log(worst / x) / math.log(worst / best)


def linear_value(x: float | None, worst: float, best: float) -> float:
    """Value of ``x`` on a straight line from ``worst`` (0) to ``best`` (1), clipped to 0 .. 1.

    Works either way round (``best`` may be below ``worst``); unknown scores 0.

    >>> linear_value(0.982, 0.0, 1.0), linear_value(2, 3.0, 1.0), linear_value(None, 0.0, 1.0)
    (0.982, 0.5, 0.0)
    """
    if x is None or not math.isfinite(x):
        return 0.0
    return min(1.0, max(0.0, (x - worst) / (best - worst)))


def reference_cost(book: Any, end_product: str) -> float | None:
    """The cost anchor: the price book's price of buying the end product outright [currency/kg].

    Falls back to the CO2 cylinder price, then to ``None`` (cost values then use a reference of
    1 currency unit per kg; see :func:`values`).

    >>> from co2routes.sources.prices import demo_book
    >>> reference_cost(demo_book(), "dry-ice"), reference_cost(demo_book(), "gas")
    (4.0, 6.0)
    """
    for key in (BOUGHT.get(end_product), "co2-cylinder"):
        price = book.get(key) if key else None
        if price is not None and price.per == "mass" and price.amount > 0:
            return price.amount
    return None


def raw_figures(result: Any) -> dict[str, float | None]:
    """The quantity each criterion reads off a planned route, per kg of the end product.

    ``result`` is a :class:`co2routes.sources.plan.PlannedRoute` (or anything with its fields).
    Water is the raw gas's water per kg of CO2 times the CO2 per kg of end product.
    """
    basis = result.per_kg_basis
    return {
        "cost": result.cost_per_kg,
        "energy": result.energy_kwh_per_kg,
        "time": result.time_h,
        "heat": abs(result.heat_kj) / basis,
        "water": result.water_g_per_kg_co2 * result.co2_kg / basis,
        "purity": result.raw_gas.co2_mole_fraction,
        "hazard": float(result.hazard),
    }


def _cost(x: float | None, reference: float | None) -> float:
    ref = 1.0 if reference is None else reference
    if x is None or not math.isfinite(x):
        return 0.0
    return log_value(x / ref, *COST_SPAN)


#: criterion -> value function of (raw figure, cost reference)
VALUE: dict[str, Callable[[float | None, float | None], float]] = {
    "cost": _cost,
    **{key: (lambda x, _ref, a=anchors: log_value(x, *a)) for key, anchors in LOG_ANCHORS.items()},
    "purity": lambda x, _ref: linear_value(x, 0.0, 1.0),
    "hazard": lambda x, _ref: linear_value(x, HAZARD_WORST, HAZARD_BEST),
}


def values(raw: dict[str, float | None], reference: float | None) -> dict[str, float]:
    """Every criterion's value (0 worst .. 1 best) of one route's raw figures.

    >>> v = values({"cost": 6.0, "energy": 0.0, "time": 24.0, "heat": 0.0, "water": 0.0,
    ...             "purity": 0.999, "hazard": 2.0}, 6.0)
    >>> v["cost"], v["energy"], v["hazard"], round(v["time"], 3)
    (0.5, 1.0, 0.5, 0.491)
    """
    return {key: VALUE[key](raw.get(key), reference) for key in VALUE}

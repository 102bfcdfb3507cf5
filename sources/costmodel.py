"""A route's cost as price-linear lines: each line is its price's amount times a coefficient that
does not depend on the price, so cost is exactly linear in each price. Part of
:mod:`co2routes.sources.whatif`, which re-exports these names.
"""

from __future__ import annotations

import dataclasses
from dataclasses import dataclass
from typing import Mapping

from co2routes.sources.plan import PlannedRoute
from co2routes.sources.prices import PriceBook, reagent_cost, use_cost


def price_keys(result: PlannedRoute) -> tuple[str | None, ...]:
    """The price key of each line of ``result.costs`` (``None`` for a line not from a reagent or use).

    :func:`co2routes.sources.prices.cost_lines` writes reagents first, then uses, one line each.
    """
    sources_ = [(r.name, r.price_key) for r in result.reagents] + [(u.name, u.price_key) for u in result.uses]
    keys: list[str | None] = []
    for i, line in enumerate(result.costs):
        if i < len(sources_) and sources_[i][0] == line.item:
            keys.append(sources_[i][1])
        else:
            keys.append(None)
    return tuple(keys)


@dataclass(frozen=True, slots=True)
class CostModel:
    """A route's cost as price-linear lines.

    ``costs`` are the nominal line costs (``None`` when unknown), ``keys`` each line's price key
    (``None``: fixed), ``per_unit`` each line's cost per unit of its price amount (the line cost
    with that price set to 1 per SI unit) [kg, m3 or J]; ``basis_kg`` what cost per kg divides by:
    the end product when the result names it (``PlannedRoute.per_kg_basis``), else the CO2 [kg].
    """

    route_id: str
    basis_kg: float
    items: tuple[str, ...]
    keys: tuple[str | None, ...]
    costs: tuple[float | None, ...]
    per_unit: tuple[float | None, ...]
    #: owning cost per kg (``PlannedRoute.capital_per_kg``), added unchanged by price changes
    fixed_per_kg: float | None = 0.0

    @property
    def known(self) -> bool:
        """True when every line's cost is known."""
        return all(c is not None for c in self.costs) and self.fixed_per_kg is not None

    def cost_per_kg(self, prices: Mapping[str, float], book: PriceBook) -> float | None:
        """Cost per kg with some price amounts replaced (``{key: amount per SI unit}``)."""
        if not self.known:
            return None
        total = 0.0
        for key, cost, unit_cost in zip(self.keys, self.costs, self.per_unit):
            if key is not None and key in prices:
                nominal = book.get(key).amount
                cost = cost * (prices[key] / nominal) if nominal > 0 else unit_cost * prices[key]
            total += cost
        return total / self.basis_kg + self.fixed_per_kg


def cost_model(result: PlannedRoute, book: PriceBook) -> CostModel:
    """Split ``result``'s costs into price-linear lines (see :class:`CostModel`)."""
    keys = price_keys(result)
    n_reagents = len(result.reagents)
    per_unit: list[float | None] = []
    for i, (line, key) in enumerate(zip(result.costs, keys)):
        price = book.get(key) if key is not None else None
        if price is None:
            per_unit.append(None)
            continue
        unit_book = PriceBook(book.currency, {key: dataclasses.replace(price, amount=1.0)})
        one = (reagent_cost(result.reagents[i], unit_book) if i < n_reagents
               else use_cost(result.uses[i - n_reagents], unit_book))
        per_unit.append(one.cost)
    basis = getattr(result, "per_kg_basis", result.co2_kg)
    return CostModel(result.route_id, basis, tuple(line.item for line in result.costs), keys,
                     tuple(line.cost for line in result.costs), tuple(per_unit),
                     getattr(result, "capital_per_kg", 0.0))

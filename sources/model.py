"""A route as one value: its id, label, options, compute function and its own default prices.

Every route, built-in or third-party, can be declared as a :class:`RouteModel` instead of a class
of its own::

    ROUTE = RouteModel("my-route", "My route", OPTIONS, compute, prices={"my-feed": "1.20 / kg"})

``prices`` are the route's defaults for its own price keys, written as in a price book
(``"AMOUNT / UNIT"`` or ``{price = ..., strength = ...}``); the comparison uses one only when the
user's price book lacks that key, and says so in the cost line (:mod:`co2routes.sources.prices`).
"""

from __future__ import annotations

from dataclasses import dataclass, field
from typing import Any, Callable, Mapping

from co2routes.sources.base import Option, RouteRequest, RouteResult


@dataclass(frozen=True, slots=True)
class RouteModel:
    """A route: ``compute(request) -> RouteResult`` with what the comparison shows about it.

    The prices are checked when the route is made, so a mistyped price stops the route from
    loading (it is then listed as a failure, naming the key) instead of costing wrongly.

    >>> from co2routes.sources.base import Option
    >>> def plan(request): raise NotImplementedError
    >>> route = RouteModel("demo", "A demo route", (Option("n", "count", "count", "1", low=1),), plan,
    ...                    prices={"demo-feed": "2.5 / kg"})
    >>> route.id, route.default_prices()["demo-feed"].amount
    ('demo', 2.5)
    >>> RouteModel("bad", "Bad", (), plan, prices={"feed": "2.5 / K"})
    Traceback (most recent call last):
    ...
    co2routes.thermo.errors.InputError: route bad prices.feed: must be 'AMOUNT / UNIT' with a unit of mass, volume or energy, e.g. '1.20 / kg', '0.30 / kWh', '2.5 / L' (got '2.5 / K')
    """

    id: str
    label: str
    options: tuple[Option, ...]
    compute: Callable[[RouteRequest], RouteResult]
    prices: Mapping[str, Any] = field(default_factory=dict)

    def __post_init__(self) -> None:
        self.default_prices()

    def default_prices(self) -> dict:
        """The route's own prices parsed, by key (:class:`co2routes.sources.prices.Price`)."""
        from co2routes.sources.prices import parse_price

        return {key: parse_price(key, raw, f"route {self.id} prices") for key, raw in self.prices.items()}

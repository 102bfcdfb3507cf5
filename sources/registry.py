"""Finding routes: every route, built-in or third-party, loads through one entry-point group.

A package adds a route by declaring, in its own ``pyproject.toml``::

    [project.entry-points."co2routes.sources"]
    my-route = "my_package.module:ROUTE"

where ``ROUTE`` is an object (or a class with a no-argument constructor) with ``id``, ``label``,
``options`` and ``compute``. A route that fails to load is reported, not fatal.
"""

from __future__ import annotations

from dataclasses import dataclass
from functools import lru_cache
from importlib.metadata import entry_points

from co2routes.sources.base import Route
from co2routes.thermo.errors import InputError

GROUP = "co2routes.sources"


@dataclass(frozen=True, slots=True)
class Catalogue:
    """The routes that loaded, in a stable order, and a line for each one that did not."""

    routes: tuple[Route, ...]
    failures: tuple[str, ...]

    def get(self, route_id: str) -> Route:
        """The route with ``route_id``, or an :class:`InputError` listing the known ids."""
        for route in self.routes:
            if route.id == route_id:
                return route
        known = ", ".join(r.id for r in self.routes)
        raise InputError("route", f"must be one of {known}", got=repr(route_id))


@lru_cache(maxsize=1)
def catalogue() -> Catalogue:
    """Load every route registered under :data:`GROUP` (cached for the process)."""
    routes: list[Route] = []
    failures: list[str] = []
    for ep in sorted(entry_points(group=GROUP), key=lambda e: e.name):
        try:
            obj = ep.load()
            route = obj() if isinstance(obj, type) else obj
            if not isinstance(route, Route):
                raise TypeError("it lacks id, label, options or compute")
        except Exception as err:  # a broken plug-in must not stop the others
            failures.append(f"route {ep.name!r} ({ep.value}) did not load: {type(err).__name__}: {err}")
            continue
        routes.append(route)
    order = {rid: i for i, rid in enumerate(BUILT_IN_ORDER)}
    routes.sort(key=lambda r: (order.get(r.id, len(order)), r.id))
    return Catalogue(tuple(routes), tuple(failures))


#: The built-in routes, in the order reports list them before ranking.
BUILT_IN_ORDER = (
    "acid-carbonate",
    "fermentation",
    "combustion",
    "sorbent-calcination",
    "breath",
    "water-absorption",
    "purchase",
)

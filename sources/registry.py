"""Finding routes: every route, built-in or third-party, loads through one entry-point group.

A package adds a route by declaring, in its own ``pyproject.toml``::

    [project.entry-points."co2routes.sources"]
    my-route = "my_package.module:ROUTE"

where ``ROUTE`` is an object (or a class with a no-argument constructor) with ``id``, ``label``,
``options`` and ``compute``. A route that fails to load is reported, not fatal.
"""

from __future__ import annotations

import re
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
    # the built-in routes load first, so a plug-in that reuses one of their ids is the one left out
    for ep in sorted(entry_points(group=GROUP), key=lambda e: (not e.value.startswith("co2routes."), e.name)):
        try:
            route = checked_route(ep.load())
        except KeyboardInterrupt:
            raise
        except BaseException as err:  # noqa: BLE001 - a broken plug-in (even sys.exit) must not stop the others
            failures.append(f"route {ep.name!r} ({ep.value}) did not load: {type(err).__name__}: "
                            f"{' '.join(str(err).split())[:300]}")
            continue
        if any(r.id == route.id for r in routes):
            failures.append(f"route {ep.name!r} ({ep.value}) left out: its id {route.id!r} is taken by "
                            "another route")
            continue
        routes.append(route)
    order = {rid: i for i, rid in enumerate(BUILT_IN_ORDER)}
    routes.sort(key=lambda r: (order.get(r.id, len(order)), r.id))
    return Catalogue(tuple(routes), tuple(failures))


def checked_route(obj: object) -> Route:
    """The route ``obj`` is (or, for a class, builds): with a short text ``id``, a ``label``, a
    callable ``compute`` and ``options`` a tuple of :class:`~co2routes.sources.base.Option`;
    otherwise ``TypeError`` saying what is wrong.

    >>> checked_route(object())
    Traceback (most recent call last):
    ...
    TypeError: it lacks id, label, options or compute
    """
    from co2routes.sources.base import Option

    route = obj() if isinstance(obj, type) else obj
    if not isinstance(route, Route):
        raise TypeError("it lacks id, label, options or compute")
    if not isinstance(route.id, str) or not re.fullmatch(r"[a-z0-9][a-z0-9_-]{0,39}", route.id):
        raise TypeError(f"its id {route.id!r} is not a short lower-case name such as 'my-route'")
    if not isinstance(route.label, str) or not callable(route.compute):
        raise TypeError("its label is not text or its compute cannot be called")
    options = route.options
    if not isinstance(options, (tuple, list)) or not all(isinstance(o, Option) for o in options):
        raise TypeError("its options are not a tuple of Option")
    return route


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

"""Containing a route: whatever a route model (a plug-in above all) does, the comparison goes on.

:func:`run_route` is the one place a route's ``compute`` is called. A route that raises (even
``SystemExit``), returns something that is not a :class:`~co2routes.sources.base.RouteResult`, or
returns a negative or non-finite figure raises :class:`RouteFault`, which every command reports
with the route's name (:func:`failure_line`) and leaves that route out. A route that *refuses*
the request (an :class:`~co2routes.thermo.errors.InputError`) is the user's to fix: its message
is prefixed with the route's id. :func:`route_options` names the scenario file, line and
``[options.ROUTE]`` key of an option a route refuses.
"""

from __future__ import annotations

import math
from typing import Any, Mapping

from co2routes.sources.base import Route, RouteRequest, RouteResult, parse_options
from co2routes.thermo.errors import InputError


class RouteFault(Exception):
    """A route broke (not the user's mistake); ``route_id`` names it.

    >>> str(RouteFault("demo", "returned None instead of a RouteResult"))
    "route 'demo' left out: returned None instead of a RouteResult"
    """

    def __init__(self, route_id: str, why: str) -> None:
        self.route_id, self.why = route_id, why
        super().__init__(f"route {route_id!r} left out: {' '.join(why.split())[:300]}")


def run_route(route: Route, request: RouteRequest) -> RouteResult:
    """``route.compute(request)``, checked by :func:`check_result`; a fault is a :class:`RouteFault`."""
    route_id = str(getattr(route, "id", "?"))
    try:
        result = route.compute(request)
    except InputError as err:
        if err.field.startswith("route "):
            raise
        raise InputError(f"route {route_id}: {err.field}", err.allowed, err.got) from None
    except KeyboardInterrupt:
        raise
    except RecursionError as err:
        raise RouteFault(route_id, f"raised RecursionError: {err}") from None
    except BaseException as err:  # noqa: BLE001 - SystemExit or any error of a plug-in is contained
        raise RouteFault(route_id, f"raised {type(err).__name__}: {err}") from None
    return check_result(route_id, result)


def _bad_number(value: Any, low: float | None = 0.0) -> bool:
    """True unless ``value`` is a finite real number of at least ``low`` (any when ``None``)."""
    if isinstance(value, bool) or not isinstance(value, (int, float)):
        return True
    return not math.isfinite(value) or (low is not None and value < low)


def check_result(route_id: str, result: Any) -> RouteResult:
    """``result`` if it is a :class:`RouteResult` whose amounts are finite and not negative
    (heat may be negative, and so may a use: a credit such as heat put to use; CO2 must be above
    zero), else :class:`RouteFault` naming the figure.

    >>> check_result("demo", None)
    Traceback (most recent call last):
    ...
    co2routes.sources.guard.RouteFault: route 'demo' left out: returned NoneType instead of a RouteResult
    """
    if not isinstance(result, RouteResult):
        raise RouteFault(route_id, f"returned {type(result).__name__} instead of a RouteResult")
    figures: list[tuple[str, Any, float | None]] = [
        ("co2_generated_kg", result.co2_generated_kg, 0.0), ("heat_kj", result.heat_kj, None),
        ("water_g_per_kg_co2", result.water_g_per_kg_co2, 0.0), ("time_h", result.time_h, 0.0),
        ("energy.electricity_kwh", result.energy.electricity_kwh, 0.0),
        ("energy.fuel_kwh", result.energy.fuel_kwh, 0.0), ("energy.heat_kwh", result.energy.heat_kwh, 0.0),
        ("hazard", result.hazard, 0.0), ("raw_gas.temperature_k", result.raw_gas.temperature_k, 0.0),
        ("raw_gas.pressure_pa", result.raw_gas.pressure_pa, 0.0),
    ]
    if result.temperature_change_k is not None:
        figures.append(("temperature_change_k", result.temperature_change_k, None))
    figures += [(f"reagent {r.name} mass_kg", r.mass_kg, 0.0) for r in result.reagents]
    figures += [(f"reagent {r.name} pure_mass_kg", r.pure_mass_kg, 0.0) for r in result.reagents]
    figures += [(f"reagent {r.name} volume_l", r.volume_l, 0.0) for r in result.reagents if r.volume_l is not None]
    figures += [(f"byproduct {b.name} mass_kg", b.mass_kg, 0.0) for b in result.byproducts]
    # a use may be a credit (heat put to use, negative); the priced total is checked by the pipeline
    figures += [(f"use {u.name} amount", u.amount, None) for u in result.uses]
    figures += [(f"raw_gas {k}", v, 0.0) for k, v in result.raw_gas.mole_fractions.items()]
    if _bad_number(result.co2_kg) or not result.co2_kg > 0:
        raise RouteFault(route_id, f"returned co2_kg = {result.co2_kg!r}; it must be a finite number above zero")
    for name, value, low in figures:
        if _bad_number(value, low):
            rule = "finite" if low is None else "finite and not negative"
            raise RouteFault(route_id, f"returned {name} = {value!r}; it must be {rule}")
    return result


def check_total(route_id: str, total_cost: float | None) -> None:
    """Refuse a batch whose priced total is negative or not finite (credits larger than costs).

    >>> check_total("demo", -1.0)
    Traceback (most recent call last):
    ...
    co2routes.sources.guard.RouteFault: route 'demo' left out: its batch costs -1 in all; credits cannot exceed costs
    """
    if total_cost is not None and (not math.isfinite(total_cost) or total_cost < 0):
        raise RouteFault(route_id, f"its batch costs {total_cost:g} in all; credits cannot exceed costs")


def route_options(route: Route, given: Mapping[str, Any], scenario: Any) -> dict[str, Any]:
    """:func:`~co2routes.sources.base.parse_options` whose errors name the scenario file, the line
    and the ``options.ROUTE.KEY`` the refused value came from (when it came from the scenario)."""
    try:
        return parse_options(route, given)
    except InputError as err:
        from co2routes.sources.scenario import option_lines

        table = scenario.options.get(route.id, {})
        known = {o.key for o in route.options}
        unknown = [k for k in table if k not in known]
        key = unknown[0] if err.field == f"route {route.id}" and unknown else err.field.removeprefix("option ")
        if key not in table or given.get(key) != table[key]:
            raise InputError(f"route {route.id}: {err.field}", err.allowed, err.got) from None
        source = getattr(scenario, "source", "scenario")
        line = option_lines(getattr(scenario, "text", None), f"options.{route.id}").get(key)
        where = f"{source}, line {line}" if line else source
        raise InputError(f"{where}: options.{route.id}.{key}", err.allowed, err.got) from None


def named_in(scenario: Any, err: InputError) -> InputError:
    """``err`` with its field placed in the scenario file (``FILE, line N: delivery.stages``) when
    it names a key of a scenario table bare, as the delivery and dryer planning do.

    >>> from types import SimpleNamespace
    >>> s = SimpleNamespace(source="s.toml", text='demand = "1 kg"\\n[delivery]\\nstages = 9\\n')
    >>> str(named_in(s, InputError("delivery.stages", "must be fewer")))
    's.toml, line 3: delivery.stages: must be fewer'
    """
    from co2routes.sources.scenario import _Where

    section, _, key = err.field.partition(".")
    if section not in ("site", "dryer", "delivery", "weights", "prices") or not key or " " in err.field:
        return err
    where = _Where(getattr(scenario, "source", "scenario"), getattr(scenario, "text", None))
    return InputError(where(section, key), err.allowed, err.got)


def option_table_field(scenario: Any, route_id: str) -> str:
    """The error field of a whole ``[options.ROUTE]`` table: file, line and table name."""
    text = getattr(scenario, "text", None) or ""
    header = next((n for n, line in enumerate(text.splitlines(), 1)
                   if line.strip().replace(" ", "") in (f"[options.{route_id}]", f'[options."{route_id}"]')), None)
    source = getattr(scenario, "source", "scenario")
    return f"{source}, line {header}: [options.{route_id}]" if header else f"{source}: [options.{route_id}]"


def failure_line(route: Route, err: BaseException) -> str:
    """The line a command reports for a route left out because of ``err``.

    >>> failure_line(type("R", (), {"id": "demo"})(), ValueError("boom"))
    "route 'demo' failed: ValueError: boom"
    """
    if isinstance(err, RouteFault):
        return str(err)
    return f"route {getattr(route, 'id', '?')!r} failed: {type(err).__name__}: {' '.join(str(err).split())[:300]}"

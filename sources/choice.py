"""What the user rules out apart from weights: hard limits and the routes chosen.

A scenario may carry two tables (validated by :func:`scenario_choices`, called from
:func:`co2routes.sources.scenario.validate`)::

    [limits]                       # every key optional
    max_hazard = 2                 # the route's hazard level, 1 low .. 3 high
    max_time = "1 day"             # longest batch (or schedule) time, with its unit
    min_purity = "95 %"            # lowest CO2 mole fraction of the raw gas
    max_cost_per_kg = 5.0          # most cost per kg of end product, in the price book's currency
    max_capital_per_kg = 20.0      # most equipment (capital) cost per kg of end product

    [routes]
    include = ["fermentation", "purchase"]   # compare only these (default: every route)
    exclude = ["breath"]                     # leave these out

A route that breaks a limit is still listed, after the others, with the limits it breaks
(:func:`limit_breaks`); so is a route whose plant cannot keep up with the demand at all
(:func:`demand_break`, a limit no scenario can lift). A route left out is listed as hidden. The
capital limit reads
``capital_per_kg`` off a planned route when the route carries it; until then every route's capital
is unknown and, unknown counting as worst, breaks a capital limit (said so in its reason).
"""

from __future__ import annotations

import dataclasses
from typing import Any, Callable, Iterable, Mapping

from co2routes.thermo.errors import InputError
from co2routes.thermo.units import parse

#: limit key as written -> (key kept, in the unit its name ends in)
LIMIT_KEYS = {"max_hazard": "max_hazard", "max_time": "max_time_h", "min_purity": "min_purity",
              "max_cost_per_kg": "max_cost_per_kg", "max_capital_per_kg": "max_capital_per_kg"}
ROUTE_KEYS = ("include", "exclude")


def _number(raw: Any, where: str, allowed: str) -> float:
    if isinstance(raw, bool):
        raise InputError(where, allowed, got=raw)
    try:
        value = float(raw)
    except (TypeError, ValueError):
        raise InputError(where, allowed, got=repr(raw)) from None
    if not value >= 0 or value == float("inf"):
        raise InputError(where, allowed, got=raw)
    return value


def parse_limit(key: str, raw: Any, where: str) -> tuple[str, float]:
    """One limit as ``(key kept, value)``: hours for time, a fraction for purity.

    >>> parse_limit("max_time", "1 day", "limits.max_time")
    ('max_time_h', 24.0)
    >>> parse_limit("min_purity", "95 %", "limits.min_purity")
    ('min_purity', 0.95)
    >>> parse_limit("max_hazard", 4, "limits.max_hazard")
    Traceback (most recent call last):
    co2routes.thermo.errors.InputError: limits.max_hazard: must be a hazard level 1, 2 or 3 (got 4)
    """
    if key not in LIMIT_KEYS:
        raise InputError(where, f"is not a limit; limits are {', '.join(LIMIT_KEYS)}")
    if key == "max_hazard":
        value = _number(raw, where, "must be a hazard level 1, 2 or 3")
        if value not in (1.0, 2.0, 3.0):
            raise InputError(where, "must be a hazard level 1, 2 or 3", got=raw)
    elif key == "max_time":
        value = parse(str(raw), where, "time") / 3600.0
        if not value > 0:
            raise InputError(where, "must be a time greater than zero, e.g. \"1 day\"", got=raw)
    elif key == "min_purity":
        value = raw if isinstance(raw, (int, float)) and not isinstance(raw, bool) else parse(str(raw), where, "fraction")
        if not 0.0 <= value <= 1.0:
            raise InputError(where, "must be a fraction from 0 to 100 %, e.g. \"95 %\"", got=raw)
    else:
        value = _number(raw, where, "must be an amount of at least 0 in the price book's currency per kg")
    return LIMIT_KEYS[key], float(value)


def _ids(raw: Any, where: str) -> tuple[str, ...]:
    if isinstance(raw, str):
        raw = [part for part in raw.split(",")]
    if not isinstance(raw, (list, tuple)) or not all(isinstance(x, str) for x in raw):
        raise InputError(where, "must be a list of route ids, e.g. [\"purchase\", \"fermentation\"]", got=raw)
    return tuple(x.strip() for x in raw if x.strip())


def scenario_choices(document: Mapping[str, Any], where: Callable[[str | None, str], str]) -> dict[str, Any]:
    """The ``[limits]`` and ``[routes]`` tables of a scenario document as :class:`Scenario` fields
    (``limits``, ``include``, ``exclude``); ``where(section, key)`` names a key for an error."""
    tables = {}
    for name in ("limits", "routes"):
        table = document.get(name, {})
        if not isinstance(table, Mapping):
            raise InputError(where(None, name), f"must be a table, e.g. [{name}]")
        tables[name] = table
    limits = dict(parse_limit(k, v, where("limits", k)) for k, v in tables["limits"].items())
    for key in tables["routes"]:
        if key not in ROUTE_KEYS:
            raise InputError(where("routes", key), f"is not a key of [routes]; keys are {', '.join(ROUTE_KEYS)}")
    include = tables["routes"].get("include")
    return {"limits": limits,
            "include": None if include is None else _ids(include, where("routes", "include")),
            "exclude": _ids(tables["routes"].get("exclude", []), where("routes", "exclude"))}


def with_choices(scenario: Any, routes: str | None = None, exclude: Iterable[str] = (),
                 limits: Iterable[str] = ()) -> Any:
    """``scenario`` with the command line's ``--routes``, ``--exclude`` and ``--limit KEY=VALUE``.

    ``--routes`` replaces the scenario's ``include``; ``--exclude`` and ``--limit`` add to its own.
    """
    chosen = dict(scenario.limits)
    for item in limits:
        key, sep, value = item.partition("=")
        if not sep:
            raise InputError("--limit", f"must be KEY=VALUE with KEY one of {', '.join(LIMIT_KEYS)}", got=repr(item))
        kept, number = parse_limit(key.strip(), value.strip(), "--limit " + key.strip())
        chosen[kept] = number
    left_out = tuple(scenario.exclude) + tuple(x for item in exclude for x in _ids(item, "--exclude"))
    include = scenario.include if routes is None else _ids(routes, "--routes")
    return dataclasses.replace(scenario, limits=chosen, include=include, exclude=left_out)


def check_route_ids(scenario: Any, known: Iterable[str]) -> None:
    """Refuse a route id in ``include`` or ``exclude`` that names no route found."""
    known = set(known)
    for key in ROUTE_KEYS:
        for route_id in getattr(scenario, key) or ():
            if route_id not in known:
                raise InputError(f"routes.{key} (or --{'routes' if key == 'include' else key})",
                                 f"{route_id!r} names no route found; routes are "
                                 f"{', '.join(sorted(known))}")


def hidden_ids(scenario: Any, ids: Iterable[str]) -> set[str]:
    """The route ids the user left out: not in ``include`` (when given) or in ``exclude``.

    >>> from types import SimpleNamespace as S
    >>> sorted(hidden_ids(S(include=("a", "b"), exclude=("b",)), ["a", "b", "c"]))
    ['b', 'c']
    """
    include, exclude = scenario.include, set(scenario.exclude)
    return {i for i in ids if (include is not None and i not in include) or i in exclude}


def limit_breaks(result: Any, limits: Mapping[str, float], currency: str = "") -> tuple[str, ...]:
    """The limits ``result`` (a planned route) breaks, each in words; an unknown figure breaks
    its limit (it cannot be shown to keep it).

    >>> from types import SimpleNamespace as S
    >>> r = S(hazard=3, time_h=30.0, raw_gas=S(co2_mole_fraction=0.9), cost_per_kg=None)
    >>> limit_breaks(r, {"max_hazard": 2, "max_time_h": 24.0, "max_cost_per_kg": 5.0}, "EUR")
    ('hazard 3 above the limit 2', 'time 30.0 h above the limit 24.0 h', 'cost per kg unknown (limit 5.00 EUR)')
    """
    figures = {
        "max_hazard": ("hazard", result.hazard, "{:.0f}", ""),
        "max_time_h": ("time", result.time_h, "{:.1f}", " h"),
        "min_purity": ("CO2 purity", result.raw_gas.co2_mole_fraction, "{:.1%}", ""),
        "max_cost_per_kg": ("cost per kg", result.cost_per_kg, "{:.2f}", f" {currency}".rstrip()),
        "max_capital_per_kg": ("capital per kg", getattr(result, "capital_per_kg", None), "{:.2f}",
                               f" {currency}".rstrip()),
    }
    out = []
    for key, limit in limits.items():
        name, value, fmt, unit = figures[key]
        shown_limit = fmt.format(limit) + unit
        if value is None:
            out.append(f"{name} unknown (limit {shown_limit})")
        elif (value < limit) if key.startswith("min_") else (value > limit):
            side = "below" if key.startswith("min_") else "above"
            out.append(f"{name} {fmt.format(value)}{unit} {side} the limit {shown_limit}")
    return tuple(out)


def demand_break(result: Any) -> tuple[str, ...]:
    """The demand itself as a limit every plan keeps: a route whose schedule cannot keep up
    (``schedule.meets_demand`` false, e.g. too few people breathing into a lime bed) breaks it
    and is listed after the routes that can, with what it would take; so does a route whose gas
    is too lean to condense to the liquid or dry ice asked for (``delivery.cannot_condense``).

    >>> from types import SimpleNamespace as S
    >>> demand_break(S(schedule=S(meets_demand=False, note="it would take 5 people")))
    ('demand not met (it would take 5 people)',)
    >>> demand_break(S(schedule=None)), demand_break(S(schedule=S(meets_demand=True, note="")))
    ((), ())
    """
    delivery = getattr(result, "delivery", None)
    cannot = getattr(delivery, "cannot_condense", None)
    if cannot:
        return (f"demand not met (gas {cannot})",)
    schedule = getattr(result, "schedule", None)
    if schedule is None or schedule.meets_demand:
        return ()
    return (f"demand not met ({schedule.note})",)


def toggled(table: Mapping[str, Any] | None, route_id: str, hidden: bool) -> dict[str, Any] | None:
    """The ``[routes]`` table after hiding ``route_id`` (``hidden`` false) or showing it again
    (``hidden`` true); ``None`` when nothing is left to say.

    >>> toggled(None, "breath", False)
    {'exclude': ['breath']}
    >>> toggled({"include": ["purchase"], "exclude": ["breath"]}, "breath", True)
    {'include': ['purchase', 'breath']}
    >>> toggled({"exclude": ["breath"]}, "breath", True) is None
    True
    """
    table = table or {}
    include = None if table.get("include") is None else list(_ids(table["include"], "routes.include"))
    exclude = [x for x in _ids(table.get("exclude", []), "routes.exclude") if x != route_id]
    if not hidden:
        exclude.append(route_id)
    elif include is not None and route_id not in include:
        include.append(route_id)
    out = {k: v for k, v in (("include", include), ("exclude", exclude)) if v is not None and (v or k == "include")}
    return out or None

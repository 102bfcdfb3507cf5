"""Demand from the use: how much CO2 a greenhouse, a brew, a carbonation run or a cold box needs.

Each use is a module here with ``KIND``, ``INPUTS`` (a tuple of :class:`UseInput`: one spec gives
the scenario's ``[use]`` keys, the ``co2routes demand KIND`` options and the interface's fields)
and ``compute(values) -> UseDemand`` on the parsed SI values. :func:`work_out` parses and
computes; :func:`from_document` is what a scenario's ``[use]`` table goes through.

The demand a use gives is a rate (kg/day over the days it runs) that replaces the scenario's
``demand``; the result keeps the balance it came from, its sources, warnings and cautions.
"""

from __future__ import annotations

import dataclasses
import importlib
from dataclasses import dataclass, field
from typing import Any, Callable, Mapping

from co2routes.thermo.errors import InputError

#: use kind -> module under co2routes.sources.uses, in the order they are listed
KINDS = {"greenhouse": "greenhouse", "fermentation": "brewing", "carbonation": "carbonation",
         "cold-box": "coldbox"}


@dataclass(frozen=True, slots=True)
class UseInput:
    """One input of a use. ``dimension`` is a :mod:`co2routes.thermo.units` dimension, ``"choice"``,
    ``"number"`` (a plain number), or ``"text"`` (parsed by the use itself); ``default`` ``None``
    means required (or, with ``optional``, absent)."""

    key: str
    label: str
    dimension: str
    default: str | None = None
    help: str = ""
    choices: tuple[str, ...] = ()
    optional: bool = False
    low: float | None = 0.0

    @property
    def option(self) -> str:
        """The command-line option, e.g. ``--floor-area``."""
        return "--" + self.key.replace("_", "-")


@dataclass(frozen=True, slots=True)
class UseDemand:
    """The demand a use gives.

    ``demand_kg`` is the CO2 one run needs (a day of enrichment, a brew, a carbonation batch, a
    box's hold) and ``period_s`` the time between runs; ``demand_kg_per_day`` = demand_kg x 1 day /
    period on the days it runs. ``balance`` lists (key, value) pairs in SI with unit-suffixed keys,
    the mass balance the demand comes from; ``inputs`` the parsed inputs.
    """

    kind: str
    demand_kg: float
    period_s: float
    demand_kg_per_day: float
    peak_kg_per_h: float | None
    summary: str
    balance: tuple[tuple[str, Any], ...]
    inputs: Mapping[str, Any] = field(default_factory=dict)
    sources: tuple[str, ...] = ()
    warnings: tuple[str, ...] = ()
    cautions: tuple[str, ...] = ()

    @property
    def demand_text(self) -> str:
        """The demand as a scenario ``demand`` string (a rate)."""
        return f"{self.demand_kg_per_day!r} kg/day"

    @property
    def source_text(self) -> str:
        """Where the demand came from, in words."""
        return f"from the {self.kind} use: {self.summary}"


def module_of(kind: str):
    """The module of a use kind."""
    if kind not in KINDS:
        raise InputError("use", f"must be one of {', '.join(KINDS)}", got=repr(kind))
    return importlib.import_module(f"co2routes.sources.uses.{KINDS[kind]}")


def all_inputs() -> dict[str, tuple[UseInput, ...]]:
    """Every use kind's inputs."""
    return {kind: module_of(kind).INPUTS for kind in KINDS}


def _parse_one(spec: UseInput, raw: Any, name: str) -> Any:
    from co2routes.thermo.units import parse

    if spec.dimension == "text":
        return str(raw).strip()
    if spec.dimension == "choice":
        value = str(raw).strip().lower()
        if value not in spec.choices:
            raise InputError(name, f"must be one of {', '.join(spec.choices)}", got=repr(raw))
        return value
    if spec.dimension == "number":
        try:
            value = float(raw)
        except (TypeError, ValueError):
            raise InputError(name, "must be a plain number", got=repr(raw)) from None
        if value != value or value in (float("inf"), float("-inf")):
            raise InputError(name, "must be a finite number", got=repr(raw))
    else:
        value = parse(raw, name, spec.dimension)
    if spec.low is not None and value < spec.low:
        raise InputError(name, f"must be at least {spec.low:g}" if spec.low else "must be 0 or more", got=raw)
    return value


def read(inputs: tuple[UseInput, ...], given: Mapping[str, Any], name: Callable[[str], str],
         defaults: Mapping[str, str] | None = None) -> dict[str, Any]:
    """Parse ``given`` (key -> text) against ``inputs``; ``name(key)`` names a field in errors.

    Absent keys take ``defaults`` (e.g. the scenario's site) or the input's own default; a required
    one that is absent is an error; an optional one is ``None``.
    """
    known = {spec.key for spec in inputs}
    for key in given:
        if key not in known:
            raise InputError(name(key), f"is not an input of this use; inputs are {', '.join(sorted(known))}")
    values: dict[str, Any] = {}
    for spec in inputs:
        raw = given.get(spec.key)
        if raw is None:
            raw = (defaults or {}).get(spec.key, spec.default)
        if raw is None:
            if not spec.optional:
                raise InputError(name(spec.key), f"is needed: {spec.label} ({spec.help})")
            values[spec.key] = None
            continue
        values[spec.key] = _parse_one(spec, raw, name(spec.key))
    return values


def work_out(kind: str, given: Mapping[str, Any], name: Callable[[str], str] | None = None,
             defaults: Mapping[str, str] | None = None) -> UseDemand:
    """Parse a use's inputs and work out its demand."""
    module = module_of(kind)
    values = read(module.INPUTS, given, name or (lambda key: key), defaults)
    return module.compute(values, name or (lambda key: key))


def from_document(document: Mapping[str, Any], where: Callable[[str | None, str], str]) -> UseDemand | None:
    """The demand of a scenario's ``[use]`` table (``None`` without one).

    ``[use]`` holds ``kind`` and that use's inputs; keys of another use are ignored with a warning
    (the interface keeps them while the kind is switched). A ``demand`` given beside it is refused.
    """
    table = document.get("use")
    if table is None:
        return None
    if not isinstance(table, Mapping):
        raise InputError(where(None, "use"), "must be a table, e.g. [use] with kind = \"greenhouse\"")
    if "demand" in document:
        raise InputError(where(None, "demand"), "is worked out from the [use] table: give demand or [use], not both")
    kind = table.get("kind")
    if kind is None:
        raise InputError(where("use", "kind"), f"is needed: one of {', '.join(KINDS)}")
    if str(kind) not in KINDS:
        raise InputError(where("use", "kind"), f"must be one of {', '.join(KINDS)}", got=repr(kind))
    kind = str(kind)
    own = {spec.key for spec in module_of(kind).INPUTS}
    other = {spec.key for specs in all_inputs().values() for spec in specs} - own
    given = {k: v for k, v in table.items() if k != "kind" and k not in other}
    site = document.get("site") if isinstance(document.get("site"), Mapping) else {}
    defaults = {"outside_co2": site.get("air_co2"), "air_pressure": site.get("pressure"),
                "atmosphere": site.get("pressure")}
    result = work_out(kind, given, lambda key: where("use", key), {k: v for k, v in defaults.items() if v})
    if not result.demand_kg_per_day > 0.0:
        raise InputError(where("use", "kind"), f"the {kind} use gives no demand: {result.summary}")
    if kind == "cold-box" and document.get("end_product") != "dry-ice":
        result = dataclasses.replace(result, warnings=result.warnings + (
            "The cold-box use gives kg of dry ice: set end_product = \"dry-ice\".",))
    ignored = sorted(k for k in table if k in other)
    if ignored:
        note = f"[use] keys of another use are ignored for {kind}: {', '.join(ignored)}."
        result = dataclasses.replace(result, warnings=result.warnings + (note,))
    return result


def record(use: UseDemand) -> dict[str, Any]:
    """The JSON answer of a use (``co2routes demand KIND --json``): SI keys with unit suffixes."""
    out: dict[str, Any] = {
        "use": use.kind,
        "demand_per_run_kg": use.demand_kg,
        "period_h": use.period_s / 3600.0,
        "demand_kg_per_day": use.demand_kg_per_day,
        "peak_kg_per_h": use.peak_kg_per_h,
        "summary": use.summary,
    }
    out.update(dict(use.balance))
    out["sources"] = list(use.sources)
    out["warnings"] = list(use.warnings)
    out["cautions"] = list(use.cautions)
    return out


def demand_fields(scenario: Any) -> dict[str, Any]:
    """What a comparison says about its demand: the rate and where it came from."""
    use = getattr(scenario, "use", None)
    rate = None if scenario.batch_s is None else scenario.co2_kg * 86400.0 / scenario.batch_s
    return {"demand_kg_per_day": rate,
            "demand_from": "the scenario's demand" if use is None else use.source_text}


def ideal_co2_density(temperature_k: float, pressure_pa: float) -> float:
    """CO2 gas density as an ideal gas, rho = P M / (R T) [kg/m3] (within 1 % below 3 bar near room
    temperature; CoolProp gives 1.839 kg/m3 at 20 degC, 1 atm against 1.830 here).

    >>> round(ideal_co2_density(293.15, 101325.0), 3)
    1.83
    """
    return pressure_pa * 0.0440095 / (8.314462618 * temperature_k)

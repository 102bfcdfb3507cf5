"""What may vary in a comparison (the *targets* of a what-if): scenario-wide inputs, route options
and prices, each with its nominal value, allowed range and default swing; and a route evaluated
with some of them set. Part of :mod:`co2routes.sources.whatif`, which re-exports these names.
"""

from __future__ import annotations

import dataclasses
import math
from dataclasses import dataclass
from typing import Callable, Mapping

from co2routes.sources.base import Route, parse_options
from co2routes.sources.plan import PlannedRoute
from co2routes.sources.costmodel import price_keys
from co2routes.sources.prices import Price
from co2routes.sources.scenario import Scenario
from co2routes.thermo.units import DIMENSIONS

_site = lambda field: (lambda s: getattr(s.site, field),  # noqa: E731
                       lambda s, v: dataclasses.replace(s, site=dataclasses.replace(s.site, **{field: v})))
_dryer = lambda field: (lambda s: getattr(s.dryer, field),  # noqa: E731
                        lambda s, v: dataclasses.replace(s, dryer=dataclasses.replace(s.dryer, **{field: v})))
_delivery = lambda field: (lambda s: getattr(s.delivery, field),  # noqa: E731
                           lambda s, v: dataclasses.replace(s, delivery=dataclasses.replace(s.delivery, **{field: v})))

#: Scenario-wide inputs: name -> (dimension, swing rule, (get, set), lowest, highest allowed [SI]).
SCENARIO_INPUTS: dict[str, tuple[str, str, tuple[Callable, Callable], float, float]] = {
    "demand": ("mass", "factor", (lambda s: s.co2_kg, lambda s, v: dataclasses.replace(s, co2_kg=v)), 1e-9, math.inf),
    "site.temperature": ("temperature", "kelvin", _site("temperature_k"), 1.0, math.inf),
    "site.pressure": ("pressure", "relative", _site("pressure_pa"), 1.0, math.inf),
    "site.air_co2": ("fraction", "relative", _site("air_co2_fraction"), 1e-9, 1.0),
    "dryer.target_dew_point": ("temperature", "kelvin", _dryer("target_dew_point_k"), 1.0, math.inf),
    "dryer.cycle": ("time", "relative", _dryer("cycle_s"), 1.0, math.inf),
    "delivery.efficiency": ("fraction", "points", _delivery("efficiency"), 0.01, 1.0),
    "delivery.condensing_temperature": ("temperature", "kelvin", _delivery("condensing_temperature_k"), 1.0, math.inf),
    "delivery.intercool_temperature": ("temperature", "kelvin", _delivery("intercool_temperature_k"), 1.0, math.inf),
}

#: The scenario-wide inputs a sensitivity swings unless ``[uncertain]`` names others.
DEFAULT_SCENARIO_INPUTS = ("demand", "site.temperature", "dryer.target_dew_point", "delivery.efficiency",
                           "delivery.condensing_temperature", "delivery.intercool_temperature")

#: Default one-at-a-time swings (sensitivity): prices x0.75 / x1.25, fractions such as efficiencies
#: and strengths -/+ 5 points, temperatures -/+ 5 K, demand x0.5 / x2, anything else x0.75 / x1.25.
#: These are this project's choice of a "plausible planning range", not published figures.
SWINGS = {"relative": (0.75, 1.25), "points": (-0.05, 0.05), "kelvin": (-5.0, 5.0), "factor": (0.5, 2.0)}


@dataclass(frozen=True, slots=True)
class Target:
    """One input of one route: its name, dimension, nominal value [SI], allowed range [SI] and the
    default swing rule (a key of :data:`SWINGS`)."""

    name: str
    dimension: str
    nominal: float
    lowest: float
    highest: float
    swing: str

    @property
    def is_price(self) -> bool:
        """True for ``prices.KEY`` inputs (which act on the cost lines only)."""
        return self.name.startswith("prices.")

    def default_range(self) -> tuple[float, float]:
        """The default swing (see :data:`SWINGS`), kept inside the allowed range.

        >>> Target("delivery.efficiency", "fraction", 0.98, 0.01, 1.0, "points").default_range()
        (0.93, 1.0)
        """
        a, b = SWINGS[self.swing]
        if self.swing in ("relative", "factor"):
            low, high = self.nominal * a, self.nominal * b
        else:
            low, high = self.nominal + a, self.nominal + b
        return max(low, self.lowest), min(high, self.highest)

    def unit(self) -> str:
        """The SI unit the input's numbers are in (for tables and JSON)."""
        if self.is_price:
            return "per kg, m3 or J"
        short = {"fraction": "1", "temperature": "K", "mass": "kg", "pressure": "Pa", "time": "s",
                 "volume": "m3", "energy": "J", "length": "m", "mass_flow": "kg/s", "volume_flow": "m3/s",
                 "density": "kg/m3", "area": "m2", "velocity": "m/s", "power": "W"}
        return short.get(self.dimension, DIMENSIONS[self.dimension][0])


def price_unit(price: Price) -> str:
    """The SI unit a price's amount is per.

    >>> price_unit(Price("sucrose", 1.0, "mass"))
    'per kg'
    """
    return {"mass": "per kg", "volume": "per m3", "energy": "per J"}[price.per]


def targets(route: Route, scenario: Scenario, result: PlannedRoute | None = None) -> dict[str, Target]:
    """Every input that can move ``route``'s cost: the prices its lines use, its numeric options and
    the scenario-wide inputs of :data:`DEFAULT_SCENARIO_INPUTS` that are set. ``result`` (the nominal result) gives the price keys."""
    out: dict[str, Target] = {}
    if result is not None:
        for key in price_keys(result):
            price = scenario.prices.get(key)
            if price is not None:
                out[f"prices.{key}"] = Target(f"prices.{key}", "price", price.amount, 0.0, math.inf, "relative")
    values = parse_options(route, scenario.options.get(route.id, {}))
    for opt in route.options:
        if opt.dimension in ("choice", "count") or not isinstance(values[opt.key], (int, float)):
            continue  # a choice, a count, or a value that follows another input (e.g. "site")
        lowest = -math.inf if opt.low is None else opt.low
        highest = math.inf if opt.high is None else opt.high
        if opt.dimension == "fraction":
            lowest = max(lowest, 0.0)
            if opt.high is None:
                highest = 1.0
        swing = {"fraction": "points", "temperature": "kelvin"}.get(opt.dimension, "relative")
        name = f"options.{route.id}.{opt.key}"
        out[name] = Target(name, opt.dimension, float(values[opt.key]), lowest, highest, swing)
    for name in DEFAULT_SCENARIO_INPUTS:
        dimension, swing, (get, _), lowest, highest = SCENARIO_INPUTS[name]
        value = get(scenario)
        if value is not None:
            out[name] = Target(name, dimension, float(value), lowest, highest, swing)
    return out


def _si_text(value: float, dimension: str) -> str:
    """An option value as text that parses back to exactly ``value`` (SI).

    >>> _si_text(300.15, "temperature"), _si_text(0.9, "fraction")
    ('300.15 kelvin', '0.9')
    """
    if dimension == "fraction":
        return repr(float(value))
    unit = "kelvin" if dimension.startswith("temperature") else DIMENSIONS[dimension][0]
    return f"{float(value)!r} {unit}"


def evaluate_at(route: Route, scenario: Scenario, settings: Mapping[str, float]) -> PlannedRoute:
    """``route``'s priced result with non-price inputs set (``{name: SI value}``).

    Inputs of another route are ignored; price inputs are not allowed here (see :class:`CostModel`).
    """
    from co2routes.sources.pipeline import evaluate

    options: dict[str, str] = {}
    prefix = f"options.{route.id}."
    for name, value in settings.items():
        if name.startswith(prefix):
            key = name[len(prefix):]
            opt = next(o for o in route.options if o.key == key)
            options[key] = _si_text(value, opt.dimension)
        elif name in SCENARIO_INPUTS:
            scenario = SCENARIO_INPUTS[name][2][1](scenario, float(value))
        elif not name.startswith("options."):
            raise ValueError(f"{name} is not a non-price input")
    return evaluate(route, scenario, options=options or None)

"""What-if inputs: what may vary in a comparison, the distributions a scenario gives them, and a
route's cost split into price-linear lines.

Shared by :mod:`co2routes.sources.sensitivity` (one input swung at a time) and :mod:`co2routes.sources.uncertainty`
(Monte Carlo over every route at once).

**Inputs** are named by where they live in a scenario:

- ``prices.KEY``: a price book entry (the amount per kg, m3 or J; a solution's strength stays);
- ``options.ROUTE.KEY``: a numeric route option (``"choice"`` and ``"count"`` options cannot vary);
- ``demand``, ``site.temperature``, ``site.pressure``, ``site.air_co2``, ``dryer.target_dew_point``,
  ``dryer.cycle``, ``delivery.efficiency``, ``delivery.condensing_temperature``,
  ``delivery.intercool_temperature``.

**Distributions** come from a scenario table of this project's own design, ``[uncertain]``, one
entry per input, every quantity a string with units as elsewhere in the scenario::

    [uncertain]
    "prices.sucrose" = {dist = "triangular", low = "0.7 / kg", mode = "0.85 / kg", high = "1.1 / kg"}
    "options.fermentation.efficiency" = {dist = "uniform", low = "85 %", high = "95 %"}
    "site.temperature" = {dist = "normal", mean = "16 degC", sd = "3 K"}
    "prices.electricity" = {dist = "lognormal", mean = "0.30 / kWh", sd = "0.06 / kWh"}

``lognormal`` takes the arithmetic mean and standard deviation of the quantity itself. A standard
deviation of a temperature is a temperature difference (``"3 K"``, ``"3 delta_degC"``).

**Cost lines.** A route's cost is ``sum(line.cost)`` over ``PlannedRoute.costs`` divided by
the kg it is per (the end product, or the CO2 delivered); every line is its price's amount times a coefficient that does not depend on the
price (a mass, a volume or an energy), so cost is exactly linear in each price.
"""

from __future__ import annotations

import dataclasses
import math
from dataclasses import dataclass
from statistics import NormalDist
from typing import Any, Callable, Mapping, Sequence

import numpy as np

from co2routes.sources.base import Route, parse_options
from co2routes.sources.plan import PlannedRoute
from co2routes.sources.prices import Price, PriceBook, parse_price, reagent_cost, use_cost
from co2routes.sources.scenario import Scenario
from co2routes.thermo.errors import InputError
from co2routes.thermo.units import DIMENSIONS, parse

KINDS = ("uniform", "triangular", "normal", "lognormal")

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


# --------------------------------------------------------------------------- cost lines


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


# --------------------------------------------------------------------------- distributions


@dataclass(frozen=True, slots=True)
class Distribution:
    """The spread of one input [SI]. ``uniform``/``triangular`` use ``low``, (``mode``,) ``high``;
    ``normal``/``lognormal`` use ``mean`` and ``sd`` (of the quantity itself)."""

    name: str
    kind: str
    low: float | None = None
    mode: float | None = None
    high: float | None = None
    mean: float | None = None
    sd: float | None = None

    @property
    def degenerate(self) -> bool:
        """True when the spread has zero width (every sample is :attr:`value`)."""
        return (self.low == self.high) if self.kind in ("uniform", "triangular") else self.sd == 0.0

    @property
    def value(self) -> float:
        """The centre: the mode (triangular), the midpoint (uniform) or the mean."""
        if self.kind == "triangular":
            return self.mode
        if self.kind == "uniform":
            return 0.5 * (self.low + self.high)
        return self.mean

    def _lognormal(self) -> tuple[float, float]:
        """(mu, sigma) of ln X from the mean m and sd s of X: sigma^2 = ln(1 + s^2/m^2),
        mu = ln m - sigma^2 / 2 (Johnson, Kotz & Balakrishnan 1994, vol. 1, ch. 14)."""
        s2 = math.log1p((self.sd / self.mean) ** 2)
        return math.log(self.mean) - 0.5 * s2, math.sqrt(s2)

    def quantile(self, q: np.ndarray | float) -> np.ndarray:
        """The inverse distribution function at probabilities ``q`` in [0, 1].

        Triangular: x = a + sqrt(q (b-a)(c-a)) for q <= F(c), else b - sqrt((1-q)(b-a)(b-c)), with
        F(c) = (c-a)/(b-a) (Kotz & van Dorp 2004, *Beyond Beta*, ch. 1); normal and lognormal
        through the standard normal quantile (Python's ``statistics.NormalDist``).

        >>> Distribution("x", "triangular", low=0.0, mode=1.0, high=2.0).quantile(0.5)
        array(1.)
        >>> float(Distribution("x", "normal", mean=10.0, sd=2.0).quantile(0.975))
        13.9199...
        """
        q = np.asarray(q, dtype=float)
        if self.degenerate:
            return np.full(q.shape, self.value)
        if self.kind == "uniform":
            return self.low + q * (self.high - self.low)
        if self.kind == "triangular":
            a, c, b = self.low, self.mode, self.high
            split = (c - a) / (b - a)
            left = a + np.sqrt(q * (b - a) * (c - a))
            right = b - np.sqrt((1.0 - q) * (b - a) * (b - c))
            return np.where(q <= split, left, right)
        z = np.vectorize(NormalDist().inv_cdf, otypes=[float])(np.clip(q, 1e-12, 1 - 1e-12))
        if self.kind == "normal":
            return self.mean + self.sd * z
        mu, sigma = self._lognormal()
        return np.exp(mu + sigma * z)

    def sample(self, rng: np.random.Generator, n: int) -> np.ndarray:
        """``n`` independent draws [SI] from ``rng`` (a degenerate spread gives its value exactly)."""
        if self.degenerate:
            return np.full(n, self.value)
        if self.kind == "uniform":
            return rng.uniform(self.low, self.high, n)
        if self.kind == "triangular":
            return rng.triangular(self.low, self.mode, self.high, n)
        if self.kind == "normal":
            return rng.normal(self.mean, self.sd, n)
        mu, sigma = self._lognormal()
        return rng.lognormal(mu, sigma, n)

    def support(self) -> tuple[float, float]:
        """Where the samples lie: the bounds, or the 0.1 % and 99.9 % quantiles."""
        if self.kind in ("uniform", "triangular"):
            return self.low, self.high
        lo, hi = self.quantile(np.array([0.001, 0.999]))
        return float(lo), float(hi)

    def swing(self) -> tuple[float, float]:
        """The range a one-at-a-time sensitivity uses: the bounds, or the 10th and 90th percentiles
        (the P10/P90 convention of common practice)."""
        if self.kind in ("uniform", "triangular"):
            return self.low, self.high
        lo, hi = self.quantile(np.array([0.1, 0.9]))
        return float(lo), float(hi)

    def analytic_mean(self) -> float:
        """The distribution's mean: (a+b)/2, (a+c+b)/3, or ``mean`` (Johnson, Kotz & Balakrishnan 1994)."""
        if self.kind == "uniform":
            return 0.5 * (self.low + self.high)
        if self.kind == "triangular":
            return (self.low + self.mode + self.high) / 3.0
        return self.mean

    def analytic_variance(self) -> float:
        """The variance: (b-a)^2/12, (a^2+b^2+c^2-ab-ac-bc)/18, or ``sd``^2."""
        if self.kind == "uniform":
            return (self.high - self.low) ** 2 / 12.0
        if self.kind == "triangular":
            a, c, b = self.low, self.mode, self.high
            return (a * a + b * b + c * c - a * b - a * c - b * c) / 18.0
        return self.sd ** 2


def parse_uncertain(scenario: Scenario, source: str = "scenario", text: str | None = None,
                    routes: Sequence[Route] | None = None) -> dict[str, Distribution]:
    """The scenario's ``[uncertain]`` table as distributions in SI, checked. ``routes`` (default:
    every route found) are where ``options.ROUTE.KEY`` entries are looked up.

    Errors name the entry (and the line when ``text`` is given): an unknown input or
    distribution, a missing bound, bounds reversed or a mode outside them, a negative standard
    deviation, a lognormal whose mean is not positive, or a price whose unit differs from the
    price book's.
    """
    from co2routes.sources.scenario import _Where

    where = _Where(source, text)
    table = scenario.document.get("uncertain", {})
    if not isinstance(table, Mapping):
        raise InputError(where(None, "uncertain"), "must be a table, e.g. [uncertain]")
    out: dict[str, Distribution] = {}
    for name, entry in table.items():
        field = where("uncertain", name)
        if not isinstance(entry, Mapping):
            raise InputError(field, 'must be a table, e.g. {dist = "uniform", low = "...", high = "..."}')
        kind = str(entry.get("dist", ""))
        if kind not in KINDS:
            raise InputError(f"{field}.dist", f"must be one of {', '.join(KINDS)}", got=repr(entry.get("dist")))
        needed = {"uniform": ("low", "high"), "triangular": ("low", "mode", "high"),
                  "normal": ("mean", "sd"), "lognormal": ("mean", "sd")}[kind]
        extra = set(entry) - set(needed) - {"dist"}
        if extra:
            raise InputError(f"{field}", f"a {kind} takes {', '.join(needed)}", got=", ".join(sorted(extra)))
        reader = _reader(name, scenario, field, routes)
        values = {}
        for key in needed:
            if key not in entry:
                raise InputError(f"{field}.{key}", f"is required for a {kind} distribution")
            values[key] = reader(entry[key], f"{field}.{key}", key == "sd")
        out[name] = _checked(Distribution(name, kind, **values), field)
    return out


def _reader(name: str, scenario: Scenario, field: str,
            routes: Sequence[Route] | None) -> Callable[[Any, str, bool], float]:
    """A parser of one bound of input ``name``: text with units -> SI float."""
    if name.startswith("prices."):
        key = name[len("prices."):]
        book_price = scenario.prices.get(key)
        if book_price is None:
            raise InputError(field, "names a price the price book lacks; give it in [prices] first")

        def read_price(raw: Any, where: str, _spread: bool) -> float:
            price = parse_price(key, raw, where.rsplit(".", 1)[0])
            if price.per != book_price.per:
                raise InputError(where, f"must be a price {price_unit(book_price)} like the price book's "
                                        f"({book_price.text})", got=repr(raw))
            return price.amount
        return read_price
    if name in SCENARIO_INPUTS:
        dimension = SCENARIO_INPUTS[name][0]
    elif name.startswith("options."):
        dimension = _option_dimension(name, field, routes)
    else:
        allowed = "prices.KEY, options.ROUTE.KEY, " + ", ".join(SCENARIO_INPUTS)
        raise InputError(field, f"is not an input that can vary; inputs are {allowed}")

    def read(raw: Any, where: str, spread: bool) -> float:
        if name == "demand":
            try:
                return parse(raw, where, "mass")
            except InputError:
                if scenario.batch_s is None:
                    raise
                return parse(raw, where, "mass_flow") * scenario.batch_s
        dim = "temperature_difference" if spread and dimension == "temperature" else dimension
        return parse(raw, where, dim)
    return read


def _option_dimension(name: str, field: str, routes: Sequence[Route] | None) -> str:
    from co2routes.sources.registry import Catalogue, catalogue

    parts = name.split(".")
    if len(parts) != 3:
        raise InputError(field, "must be options.ROUTE.KEY")
    try:
        route = (catalogue() if routes is None else Catalogue(tuple(routes), ())).get(parts[1])
    except InputError as err:
        raise InputError(field, f"names no route; {err.allowed}") from None
    opt = next((o for o in route.options if o.key == parts[2]), None)
    if opt is None:
        raise InputError(field, f"route {route.id} has no option {parts[2]!r}; options are "
                                f"{', '.join(o.key for o in route.options) or 'none'}")
    if opt.dimension in ("choice", "count"):
        raise InputError(field, "only a quantity can vary, not a choice or a count")
    return opt.dimension


def _checked(dist: Distribution, field: str) -> Distribution:
    """Refuse reversed bounds, a mode outside them, a negative sd, a non-positive lognormal mean."""
    if dist.kind in ("uniform", "triangular"):
        if dist.low > dist.high:
            raise InputError(field, "low must not exceed high (the bounds are reversed)")
        if dist.kind == "triangular" and not dist.low <= dist.mode <= dist.high:
            raise InputError(f"{field}.mode", "must lie between low and high")
    else:
        if dist.sd < 0:
            raise InputError(f"{field}.sd", "a standard deviation cannot be negative")
        if dist.kind == "lognormal" and not dist.mean > 0:
            raise InputError(f"{field}.mean", "a lognormal needs a mean greater than zero")
    return dist

"""Distributions of what-if inputs and the scenario's ``[uncertain]`` table that gives them (see
:mod:`co2routes.sources.whatif` for the table's form, which re-exports these names).
"""

from __future__ import annotations

import math
from dataclasses import dataclass
from statistics import NormalDist
from typing import Any, Callable, Mapping, Sequence

import numpy as np

from co2routes.sources.base import Route
from co2routes.sources.prices import parse_price
from co2routes.sources.scenario import Scenario
from co2routes.sources.targets import SCENARIO_INPUTS, price_unit
from co2routes.thermo.errors import InputError
from co2routes.thermo.units import parse

KINDS = ("uniform", "triangular", "normal", "lognormal")


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

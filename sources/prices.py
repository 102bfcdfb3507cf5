"""The price book: unit prices with the currency named once, and the cost roll-up.

Three layers, later ones winning entry by entry: the shipped demo book (invented prices, it says
so), the user's own book in the platform's config directory, and a scenario's ``[prices]`` table.
A missing price makes that cost unknown (``None``), never zero.
"""

from __future__ import annotations

import tomllib
from dataclasses import dataclass, field
from importlib import resources
from pathlib import Path
from typing import Any, Iterable, Mapping

from co2routes.sources.base import CostLine, Reagent, Use
from co2routes.thermo.errors import InputError
from co2routes.thermo.units import parse, registry

#: dimensions a price may be per, with the SI unit it is normalised to.
_PER = {"mass": "kilogram", "volume": "meter ** 3", "energy": "joule"}
_KWH = 3.6e6


@dataclass(frozen=True, slots=True)
class Price:
    """One entry: ``amount`` currency per SI unit of ``per`` (kg, m3 or J); ``strength`` is the
    w/w fraction of a solution as sold, ``None`` for a pure product."""

    key: str
    amount: float
    per: str
    strength: float | None = None
    text: str = ""


@dataclass(frozen=True, slots=True)
class PriceBook:
    """Prices by key, in one currency."""

    currency: str
    prices: Mapping[str, Price]
    #: the ``[equipment]`` table (:func:`co2routes.sources.equipment.parse_equipment`)
    equipment: Mapping[str, Any] = field(default_factory=dict)

    def get(self, key: str) -> Price | None:
        """The price for ``key`` or ``None`` when unknown."""
        return self.prices.get(key)

    def overridden(self, entries: Mapping[str, Any], where: str) -> "PriceBook":
        """A new book with ``entries`` (raw TOML values) replacing or adding prices."""
        merged = dict(self.prices)
        for key, raw in entries.items():
            merged[key] = parse_price(key, raw, where)
        return PriceBook(self.currency, merged, self.equipment)


def parse_price(key: str, raw: Any, where: str = "prices") -> Price:
    """Parse ``"0.45 / kg"`` or ``{price = "0.45 / kg", strength = "31 %"}``.

    >>> p = parse_price("hydrochloric-acid", {"price": "0.45 / kg", "strength": "31 %"})
    >>> (p.amount, p.per, p.strength)
    (0.45, 'mass', 0.31)
    >>> parse_price("electricity", "0.30 / kWh").amount * 3.6e6
    0.3...
    >>> parse_price("water", "3 / K")
    Traceback (most recent call last):
    ...
    co2routes.thermo.errors.InputError: prices.water: must be 'AMOUNT / UNIT' with a unit of mass, volume or energy, e.g. '1.20 / kg', '0.30 / kWh', '2.5 / L' (got '3 / K')
    """
    field = f"{where}.{key}"
    strength = None
    text = raw
    if isinstance(raw, Mapping):
        if "price" not in raw:
            raise InputError(field, "a table entry needs a 'price' key, e.g. {price = \"0.45 / kg\", strength = \"31 %\"}")
        text = raw["price"]
        if "strength" in raw:
            strength = parse(raw["strength"], f"{field}.strength", "fraction")
            if not 0.0 < strength <= 1.0:
                raise InputError(f"{field}.strength", "must be a strength between 0 and 100 %", got=raw["strength"])
    allowed = "must be 'AMOUNT / UNIT' with a unit of mass, volume or energy, e.g. '1.20 / kg', '0.30 / kWh', '2.5 / L'"
    if not isinstance(text, str) or "/" not in text:
        raise InputError(field, allowed, got=repr(text))
    amount_text, unit_text = text.split("/", 1)
    try:
        amount = float(amount_text.strip())
    except ValueError:
        raise InputError(field, allowed, got=repr(text)) from None
    if amount < 0 or amount != amount:
        raise InputError(field, "a price cannot be negative", got=repr(text))
    ureg = registry()
    try:
        unit = ureg.Quantity(1.0, unit_text.strip())
    except Exception:
        raise InputError(field, allowed, got=repr(text)) from None
    for per, si in _PER.items():
        if unit.check(ureg.Quantity(1.0, si).dimensionality):
            size = float(unit.to(si).magnitude)
            return Price(key, amount / size, per, strength, str(text))
    raise InputError(field, allowed, got=repr(text))


def _book_from_toml(data: Mapping[str, Any], where: str) -> PriceBook:
    currency = data.get("currency")
    if not isinstance(currency, str) or not currency.strip():
        raise InputError(f"{where}: currency", "the price book must name its currency once, e.g. currency = \"EUR\"")
    prices = data.get("prices", {})
    if not isinstance(prices, Mapping):
        raise InputError(f"{where}: prices", "must be a table of KEY = \"AMOUNT / UNIT\"")
    from co2routes.sources.equipment import parse_equipment

    equipment = parse_equipment(data.get("equipment", {}), where)
    return PriceBook(currency.strip(), {}, equipment).overridden(prices, f"{where}: prices")


def demo_book() -> PriceBook:
    """The shipped book of invented demo prices."""
    text = resources.files("co2routes.sources").joinpath("data/prices.toml").read_text(encoding="utf-8")
    return _book_from_toml(tomllib.loads(text), "demo price book")


def user_book_path() -> Path:
    """Where the user's own price book lives (platformdirs' user config directory)."""
    from platformdirs import user_config_dir

    return Path(user_config_dir("co2routes")) / "prices.toml"


def load_book(path: Path | None = None) -> PriceBook:
    """The user's book at ``path`` (default :func:`user_book_path`) if it exists, else the demo.

    A user's book replaces the demo book entirely, so that no invented price is mixed silently
    with real ones.
    """
    path = user_book_path() if path is None else path
    if not path.exists():
        return demo_book()
    try:
        data = tomllib.loads(path.read_text(encoding="utf-8"))
    except tomllib.TOMLDecodeError as err:
        raise InputError(str(path), f"is not valid TOML: {err}") from None
    except OSError as err:
        raise InputError(str(path), f"cannot be read: {err.strerror}") from None
    return _book_from_toml(data, str(path))


def reagent_cost(reagent: Reagent, book: PriceBook) -> CostLine:
    """The cost line of a reagent as bought.

    With a strength on the price, the price is per kg of solution at that strength and the
    reagent is costed by its pure content: cost = pure mass / strength x price. A per-volume price
    uses the reagent's volume.
    """
    price = book.get(reagent.price_key)
    name = f"{reagent.name}"
    if price is None:
        return CostLine(name, reagent.mass_kg, "kg", None, None)
    if price.per == "mass":
        mass = reagent.pure_mass_kg / price.strength if price.strength else reagent.mass_kg
        return CostLine(name, mass, "kg", price.amount, mass * price.amount)
    if price.per == "volume" and reagent.volume_l is not None:
        volume_m3 = reagent.volume_l / 1000.0
        return CostLine(name, reagent.volume_l, "L", price.amount / 1000.0, volume_m3 * price.amount)
    return CostLine(name, reagent.mass_kg, "kg", None, None)


def use_cost(use: Use, book: PriceBook) -> CostLine:
    """The cost line of a use (electricity, fuel, heat, water, disposal)."""
    price = book.get(use.price_key)
    si = {"energy_kwh": ("energy", _KWH, "kWh"), "mass_kg": ("mass", 1.0, "kg"),
          "volume_m3": ("volume", 1.0, "m³"), "volume_l": ("volume", 1e-3, "L")}[use.dimension]
    per, factor, unit = si
    if price is None or price.per != per:
        return CostLine(use.name, use.amount, unit, None, None)
    unit_price = price.amount * factor
    return CostLine(use.name, use.amount, unit, unit_price, use.amount * unit_price)


def cost_lines(reagents: Iterable[Reagent], uses: Iterable[Use], book: PriceBook) -> tuple[CostLine, ...]:
    """Every cost line of a batch: reagents first, then uses."""
    return tuple(reagent_cost(r, book) for r in reagents) + tuple(use_cost(u, book) for u in uses)

"""The price book: unit prices with the currency named once, and the cost roll-up.

Three layers, later ones winning entry by entry: the shipped demo book (invented prices, it says
so), the user's own book in the platform's config directory, and a scenario's ``[prices]`` table.
A missing price makes that cost unknown (``None``), never zero.
"""

from __future__ import annotations

from dataclasses import dataclass, field, replace
from importlib import resources
from pathlib import Path
from typing import Any, Iterable, Mapping

from co2routes.sources import limits
from co2routes.sources.base import CostLine, Reagent, Use
from co2routes.thermo.errors import InputError
from co2routes.thermo.units import check_text, parse, registry

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
        limits.check_size(entries, where)
        return self.with_prices({key: parse_price(key, raw, where) for key, raw in entries.items()})

    def with_prices(self, prices: Mapping[str, Price]) -> "PriceBook":
        """A new book with ``prices`` (parsed) replacing or adding entries."""
        return PriceBook(self.currency, {**self.prices, **prices}, self.equipment)


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
    check_text(text.replace("/", " ", 1), field, "'AMOUNT / UNIT'")
    try:
        amount = float(amount_text.strip())
    except ValueError:
        raise InputError(field, allowed, got=repr(text)) from None
    if amount != amount or amount in (float("inf"), float("-inf")):
        raise InputError(field, "a price must be a finite number", got=repr(text))
    if amount < 0:
        raise InputError(field, "a price cannot be negative", got=repr(text))
    ureg = registry()
    try:
        unit = ureg.Quantity(1.0, unit_text.strip())
    except Exception:
        raise InputError(field, allowed, got=repr(text)) from None
    for per, si in _PER.items():
        if unit.check(ureg.Quantity(1.0, si).dimensionality):
            size = float(unit.to(si).magnitude)
            limits.check_between(amount / size if size > 0 else float("inf"), field, 0.0, limits.MAX_PRICE,
                                 f"a price of at most {limits.MAX_PRICE:g} per kg, m3 or J", repr(text))
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
    return _book_from_toml(limits.loads(text, "demo price book"), "demo price book")


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
    where = f"price book {path}"
    data = limits.loads(limits.read_text(path, "price book"), where)
    return _book_from_toml(data, where)


def find_price(key: str, book: PriceBook, defaults: Mapping[str, Price] | None = None) -> tuple[Price | None, str]:
    """The price of ``key`` and where it came from: the book first, then the route's defaults.

    >>> book = PriceBook("EUR", {"water": parse_price("water", "3 / m**3")})
    >>> find_price("water", book, {"water": parse_price("water", "9 / m**3")})[1]
    'price book'
    >>> find_price("feed", book, {"feed": parse_price("feed", "2 / kg")})[1]
    'route default'
    >>> find_price("feed", book)
    (None, 'none')
    """
    price = book.get(key)
    if price is not None:
        return price, "price book"
    price = (defaults or {}).get(key)
    return (price, "route default") if price is not None else (None, "none")


def reagent_cost(reagent: Reagent, book: PriceBook, defaults: Mapping[str, Price] | None = None) -> CostLine:
    """The cost line of a reagent as bought (its price from the book, else ``defaults``).

    A price that states a strength s is per kg (or per litre) of solution at that strength: the
    reagent is bought by its pure content, m = pure mass / s, and a per-litre price converts
    through the density of that solution, V = m / rho(s) (:func:`co2routes.thermo.solutions.solution_density`,
    CRC Handbook densities at 20 degC). When s differs from the recipe's strength the line's unit
    says so ("kg at 31%"): the recipe's solution is made up from it with water. The line's item is
    always the reagent's name. A price with no strength applies to the reagent as the recipe uses
    it (its mass, or its volume).
    """
    price, source = find_price(reagent.price_key, book, defaults)
    name = f"{reagent.name}"
    line = CostLine(name, reagent.mass_kg, "kg", None, None, reagent.price_key, "none")
    if price is None:
        return line
    s = price.strength
    at = f" at {s:.0%}" if s is not None and (reagent.strength is None or abs(s - reagent.strength) > 1e-9) else ""
    if price.per == "mass":
        mass = reagent.pure_mass_kg / s if s else reagent.mass_kg
        return replace(line, amount=mass, unit="kg" + at, unit_price=price.amount, cost=mass * price.amount,
                       price_from=source)
    if price.per == "volume":
        if s is not None and reagent.solute is not None:
            from co2routes.thermo.solutions import solution_density

            volume_m3 = reagent.pure_mass_kg / s / solution_density(reagent.solute, s)
        elif s is None and reagent.volume_l is not None:
            volume_m3 = reagent.volume_l / 1000.0
        else:
            return line
        return replace(line, amount=volume_m3 * 1000.0, unit="L" + at, unit_price=price.amount / 1000.0,
                       cost=volume_m3 * price.amount, price_from=source)
    return line


def use_cost(use: Use, book: PriceBook, defaults: Mapping[str, Price] | None = None) -> CostLine:
    """The cost line of a use (electricity, fuel, heat, water, disposal)."""
    price, source = find_price(use.price_key, book, defaults)
    si = {"energy_kwh": ("energy", _KWH, "kWh"), "mass_kg": ("mass", 1.0, "kg"),
          "volume_m3": ("volume", 1.0, "m³"), "volume_l": ("volume", 1e-3, "L")}[use.dimension]
    per, factor, unit = si
    if price is None or price.per != per:
        return CostLine(use.name, use.amount, unit, None, None, use.price_key, "none")
    unit_price = price.amount * factor
    return CostLine(use.name, use.amount, unit, unit_price, use.amount * unit_price, use.price_key, source)


def cost_lines(reagents: Iterable[Reagent], uses: Iterable[Use], book: PriceBook,
               defaults: Mapping[str, Price] | None = None) -> tuple[CostLine, ...]:
    """Every cost line of a batch: reagents first, then uses; ``defaults`` are the route's own
    prices, used for a key the book lacks."""
    return (tuple(reagent_cost(r, book, defaults) for r in reagents)
            + tuple(use_cost(u, book, defaults) for u in uses))


def route_prices(route: Any) -> dict[str, Price]:
    """A route's own default prices, parsed (none for a route that ships none)."""
    if hasattr(route, "default_prices"):
        return route.default_prices()
    raw = getattr(route, "prices", None) or {}
    return {key: parse_price(key, value, f"route {route.id} prices") for key, value in raw.items()}


def missing_prices(lines: Iterable[CostLine]) -> tuple[str, ...]:
    """One warning per price key no book or route default prices, naming the key.

    >>> missing_prices([CostLine("brine", 2.0, "kg", None, None, "brine", "none")])
    ("no price for 'brine' (brine): add it to the price book; the cost is unknown",)
    """
    return tuple(f"no price for {line.price_key!r} ({line.item}): add it to the price book; the cost is unknown"
                 for line in lines if line.price_from == "none" and line.price_key)

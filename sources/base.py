"""The route-model interface: what a way of getting CO2 takes in and what it gives back.

A route is any object with ``id``, ``label``, ``options`` (a tuple of :class:`Option`) and
``compute(request) -> RouteResult``. Routes are found through the ``co2routes.sources`` entry-point
group (see :mod:`co2routes.sources.registry`); the built-in ones register the same way in our own
``pyproject.toml``.

Every quantity here is SI (kg, K, Pa, s) except where a field name says otherwise (``_kj``,
``_kwh``, ``_h``, ``_l``), which are the units the reports use.
"""

from __future__ import annotations

import re
from dataclasses import dataclass
from typing import Any, Mapping, Protocol, runtime_checkable

from co2routes.thermo.errors import InputError
from co2routes.thermo.units import parse


#: Short symbols of the SI units of :data:`co2routes.thermo.units.DIMENSIONS`, for messages.
_SI_SYMBOLS = {"kelvin": "K", "pascal": "Pa", "meter ** 3": "m**3", "kilogram": "kg", "meter": "m",
               "meter ** 2": "m**2", "second": "s", "joule": "J", "watt": "W",
               "kilogram / second": "kg/s", "meter ** 3 / second": "m**3/s",
               "kilogram / meter ** 3": "kg/m**3", "meter / second": "m/s", "delta_degC": "K",
               "watt / meter ** 2 / kelvin": "W/(m**2 K)"}


@dataclass(frozen=True, slots=True)
class Option:
    """One setting of a route, typed by the user as a string.

    ``dimension`` is a :mod:`co2routes.thermo.units` dimension (the value is parsed to an SI float and
    checked against ``low``/``high``, both SI), or ``"choice"`` (the value must be one of
    ``choices``), or ``"count"`` (a whole number within ``low``/``high``).

    >>> Option("excess_air", "excess air", "fraction", "15 %", low=0.0, high=3.0).parse("20 %")
    0.2
    >>> Option("acid", "acid", "choice", "hcl", choices=("hcl", "acetic")).parse("vinegar")
    Traceback (most recent call last):
    ...
    co2routes.thermo.errors.InputError: option acid: must be one of hcl, acetic (got 'vinegar')
    """

    key: str
    label: str
    dimension: str
    default: str
    choices: tuple[str, ...] = ()
    low: float | None = None
    high: float | None = None
    help: str = ""

    def parse(self, text: str | float | int) -> float | str | int:
        """The option's value from what the user typed (SI float, a choice, or a count)."""
        name = f"option {self.key}"
        if self.dimension == "choice":
            value = str(text).strip().lower()
            if value not in self.choices:
                raise InputError(name, f"must be one of {', '.join(self.choices)}", got=repr(str(text)))
            return value
        if self.dimension == "count":
            try:
                number = int(str(text).strip())
            except ValueError:
                raise InputError(name, "must be a whole number", got=repr(str(text))) from None
            self._check_range(name, number, text)
            return number
        number = parse(text, name, self.dimension)
        self._check_range(name, number, text)
        return number

    def _check_range(self, name: str, number: float, text: object) -> None:
        if (self.low is not None and number < self.low) or (self.high is not None and number > self.high):
            raise InputError(name, self.range_text(), got=text)

    def range_text(self) -> str:
        """What the option allows, in the unit its default is written in (SI when it has none).

        >>> Option("gas_rate", "gas rate", "mass_flow", "1 kg/h", low=1e-4, high=0.01).range_text()
        'must lie between 0.36 kg/h and 36 kg/h'
        >>> Option("excess", "excess", "fraction", "5 %", low=0.0, high=1.0).range_text()
        'must lie between 0 % and 100 %'
        >>> Option("people", "people", "count", "4", low=1, high=1000).range_text()
        'must be a whole number from 1 to 1000'
        >>> Option("depth", "depth", "length", "site", low=0.01).range_text()
        'must be at least 0.01 m'
        >>> Option("t", "fermenter temperature", "temperature", "site", low=278.15, high=313.15).range_text()
        'must lie between 5 degC and 40 degC'
        """
        if self.dimension == "count":
            if self.low is not None and self.high is not None:
                return f"must be a whole number from {self.low:g} to {self.high:g}"
            return f"must be a whole number of at least {self.low:g}" if self.low is not None \
                else f"must be a whole number of at most {self.high:g}"
        show = self._shown_in()
        if self.low is not None and self.high is not None:
            return f"must lie between {show(self.low)} and {show(self.high)}"
        return f"must be at least {show(self.low)}" if self.low is not None else f"must be at most {show(self.high)}"

    def _shown_in(self):
        """A formatter of SI values in the unit of the default (``"5 kPa"`` -> kPa)."""
        from co2routes.thermo.units import DIMENSIONS, to_unit

        match = re.match(r"^\s*[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?\s*(\S.*)?$", self.default)
        unit = (match.group(1) or "").strip() if match else None
        if self.dimension == "fraction":
            if unit == "%":
                return lambda v: f"{100.0 * v:.4g} %"
            return lambda v: f"{v:.4g}"
        si_unit = DIMENSIONS.get(self.dimension, ("", ""))[0]
        if self.dimension == "temperature" and not (unit and unit[0].isalpha()):
            unit = "degC"  # a named default such as "site": temperatures read best in degC
        if unit:
            try:
                to_unit(1.0, self.dimension, unit)
                return lambda v: f"{to_unit(v, self.dimension, unit):.4g} {unit}"
            except Exception:  # noqa: BLE001 - an odd default only changes how the range is shown
                pass
        symbol = _SI_SYMBOLS.get(si_unit, si_unit)
        return lambda v: f"{v:.4g} {symbol}".rstrip()


@dataclass(frozen=True, slots=True)
class Site:
    """Where the batch runs: ambient temperature [K], pressure [Pa], CO2 in air [mol/mol]."""

    temperature_k: float = 293.15
    pressure_pa: float = 101325.0
    air_co2_fraction: float = 425e-6


@dataclass(frozen=True, slots=True)
class RouteRequest:
    """What a route is asked for: CO2 to deliver per batch [kg], the site, parsed options, and
    the scenario's end product (``"gas"``, ``"liquid"`` or ``"dry-ice"``)."""

    co2_kg: float
    site: Site
    options: Mapping[str, Any]
    end_product: str = "gas"


@dataclass(frozen=True, slots=True)
class Reagent:
    """A feed as bought. ``mass_kg`` is what goes on the scale (solution included);
    ``pure_mass_kg`` the active compound in it; ``volume_l`` for liquids; ``price_key`` the price
    book entry; ``basis`` what the price applies to (``"mass"``, ``"volume"`` or ``"pure"``)."""

    name: str
    formula: str
    mass_kg: float
    pure_mass_kg: float
    volume_l: float | None
    price_key: str
    basis: str = "mass"
    strength: float | None = None
    """w/w strength of a solution as the recipe uses it (None: a pure product)."""
    solute: str | None = None
    """Density-table name (:mod:`co2routes.thermo.solutions`) of a solution, for per-litre prices."""


@dataclass(frozen=True, slots=True)
class Byproduct:
    """Something left over: spent liquor, ethanol, lime, condensate ... [kg]."""

    name: str
    formula: str
    mass_kg: float
    note: str = ""


@dataclass(frozen=True, slots=True)
class Use:
    """A priced quantity other than a reagent: electricity [kWh], fuel heat [kWh], water [m3] ...

    ``dimension`` names what ``amount`` is measured in: ``"energy_kwh"``, ``"mass_kg"``,
    ``"volume_m3"`` or ``"volume_l"``.
    """

    name: str
    amount: float
    dimension: str
    price_key: str
    feed_kg: float = 0.0
    """Mass of feed this use consumes [kg] (a fuel bought by its heating value, e.g. natural gas);
    counted in :attr:`RouteResult.reagent_kg_per_kg`."""


@dataclass(frozen=True, slots=True)
class Energy:
    """Energy a batch uses [kWh]: electricity, fuel (as heating value) and other heat."""

    electricity_kwh: float = 0.0
    fuel_kwh: float = 0.0
    heat_kwh: float = 0.0

    @property
    def total_kwh(self) -> float:
        """All three together [kWh]."""
        return self.electricity_kwh + self.fuel_kwh + self.heat_kwh


@dataclass(frozen=True, slots=True)
class CostLine:
    """One line of the cost breakdown; ``cost`` is ``None`` when its price is unknown.

    ``price_key`` names the price book entry the line needs; ``price_from`` says where its price
    came from: ``"price book"``, ``"route default"`` (the route's own default, the book lacking
    the key) or ``"none"`` (no price: the cost is unknown).
    """

    item: str
    amount: float
    unit: str
    unit_price: float | None
    cost: float | None
    price_key: str = ""
    price_from: str = ""


@dataclass(frozen=True, slots=True)
class RawGas:
    """The gas as it leaves the route, before drying: mole fractions, temperature, pressure."""

    mole_fractions: Mapping[str, float]
    temperature_k: float
    pressure_pa: float = 101325.0

    @property
    def co2_mole_fraction(self) -> float:
        """CO2 mole fraction of the raw gas (wet basis)."""
        return float(self.mole_fractions.get("CO2", 0.0))

    @property
    def dry_co2_fraction(self) -> float:
        """CO2 mole fraction once the water is taken out (the gas after the dryer).

        >>> RawGas({"CO2": 0.5, "H2O": 0.5, }, 298.15).dry_co2_fraction
        1.0
        """
        water = float(self.mole_fractions.get("H2O", 0.0))
        return min(1.0, self.co2_mole_fraction / (1.0 - water)) if water < 1.0 else 0.0


@dataclass(frozen=True, slots=True)
class RouteResult:
    """What a route computes for one batch, and nothing else.

    The comparison adds the rest (the dryer, the delivery, the priced cost lines, the end product
    and the route's id and label) in :class:`co2routes.sources.plan.PlannedRoute`; a route never sets them.

    ``heat_kj`` is the batch's enthalpy change: positive, the batch takes heat in (it cools).
    ``hazard`` is the route's own level, 1 (low) to 3 (high), with ``hazard_reason`` in words.
    ``delivers`` says what the route hands over: ``"raw-gas"`` (to be dried, and compressed if the
    end product asks), or ``"gas"``, ``"liquid"``, ``"dry-ice"`` when bought already in that form.
    """

    co2_kg: float
    co2_generated_kg: float
    reagents: tuple[Reagent, ...]
    byproducts: tuple[Byproduct, ...]
    uses: tuple[Use, ...]
    raw_gas: RawGas
    heat_kj: float
    temperature_change_k: float | None
    energy: Energy
    time_h: float
    hazard: int
    hazard_reason: str
    warnings: tuple[str, ...] = ()
    cautions: tuple[str, ...] = ()
    notes: tuple[str, ...] = ()
    delivers: str = "raw-gas"

    @property
    def water_g_per_kg_co2(self) -> float:
        """Water the raw gas carries per kg of CO2 [g/kg], from its mole fractions."""
        from co2routes.sources.common import water_g_per_kg_co2

        return water_g_per_kg_co2(self.raw_gas.mole_fractions)


@runtime_checkable
class Route(Protocol):
    """What every route model provides."""

    id: str
    label: str
    options: tuple[Option, ...]

    def compute(self, request: RouteRequest) -> RouteResult:  # pragma: no cover - protocol
        """Plan one batch for ``request``."""
        ...


def parse_options(route: Route, given: Mapping[str, Any]) -> dict[str, Any]:
    """Each option of ``route`` parsed from ``given`` (strings) or its default.

    Unknown keys are refused with the list of allowed ones.
    """
    known = {opt.key: opt for opt in route.options}
    for key in given:
        if key not in known:
            allowed = ", ".join(known) or "none"
            raise InputError(f"route {route.id}", f"has no option {key!r}; options are {allowed}")
    return {key: opt.parse(given.get(key, opt.default)) for key, opt in known.items()}

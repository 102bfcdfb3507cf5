"""Scenario files: what a user wants, where, and with which prices, as TOML of our own schema.

A scenario is kept two ways: the *document* (the TOML as a plain dict of strings, which is what
the interface edits and what is saved back, so a save/open round trip is exact) and the validated
:class:`Scenario` (SI floats) that the comparison reads. Loading never executes code; an error
names the file, the key and its line.

Schema (every quantity a string with units)::

    name = "..."                  # free text
    note = "..."
    demand = "1.2 kg/day"         # a rate, or a mass per batch ("3 kg")
    batch = "1 day"               # with a rate: the time one batch covers (default 1 day)
    end_product = "gas"           # gas | liquid | dry-ice
    currency = "EUR"              # optional; must match the price book
    [site]      temperature, pressure, air_co2
    [dryer]     desiccant, target_dew_point | target_ppmv, cycle
    [delivery]  condensing_temperature, stages, efficiency, volumetric_efficiency,
                displacement, intercool_temperature; for dry ice hold_time, box_area, box_u
    [weights]   cost, energy, time, heat, water, purity, hazard (numbers >= 0)
    [options.ROUTE-ID]  KEY = "VALUE" for that route's options
    [prices]    KEY = "AMOUNT / UNIT" overriding the price book
    [uncertain] "INPUT" = {dist = ..., ...}: spreads for what-if analysis (co2routes.sources.whatif)
    [use]       kind = greenhouse | fermentation | carbonation | cold-box and its inputs: sets the
                demand instead of ``demand`` (co2routes.sources.uses)
    [plant]     interest_rate, years, owned, batches_per_year, filling_ratio, cylinder_size,
                refrigerant, evaporator_approach, condenser_approach, refrigeration_efficiency
                (co2routes.sources.plantplan)
    [limits] [routes]  hard limits and the routes compared (co2routes.sources.choice)
"""

from __future__ import annotations

import copy
from dataclasses import dataclass, field
from importlib import resources
from pathlib import Path
from typing import Any, Mapping

from co2routes.sources import limits
from co2routes.sources.base import Site
from co2routes.sources.choice import scenario_choices
from co2routes.sources.plantplan import PlantPlan, validate_plant
from co2routes.sources.prices import PriceBook, load_book, parse_price
from co2routes.sources.uses import from_document as use_demand
from co2routes.thermo.errors import InputError
from co2routes.thermo.units import parse, parse_positive

END_PRODUCTS = ("gas", "liquid", "dry-ice")
CRITERIA = ("cost", "energy", "time", "heat", "water", "purity", "hazard")
DEFAULT_WEIGHTS = {"cost": 3.0, "energy": 1.0, "time": 1.0, "heat": 0.5, "water": 0.5,
                   "purity": 1.0, "hazard": 2.0}
DEMOS = {"polytunnel": "demo-polytunnel.toml", "science-fair": "demo-science-fair.toml"}
_TOP_KEYS = {"name", "note", "demand", "batch", "end_product", "currency", "site", "dryer",
             "delivery", "weights", "options", "prices", "uncertain", "use", "plant", "limits", "routes"}
_SECTION_KEYS = {
    "site": {"temperature", "pressure", "air_co2"},
    "dryer": {"desiccant", "target_dew_point", "target_ppmv", "cycle"},
    "delivery": {"condensing_temperature", "stages", "efficiency", "displacement",
                 "intercool_temperature", "volumetric_efficiency", "hold_time", "box_area", "box_u"},
}


@dataclass(frozen=True, slots=True)
class DryerPlan:
    """The dryer the scenario asks for: desiccant id, outlet target, hours between regenerations."""

    desiccant: str = "silica-gel"
    target_ppmv: float | None = None
    target_dew_point_k: float | None = None
    cycle_s: float = 7 * 86400.0


@dataclass(frozen=True, slots=True)
class DeliveryPlan:
    """How gas becomes liquid or dry ice: condensing temperature [K], stages, isentropic
    efficiency, compressor displacement [m3/s] (``None`` when not given)."""

    condensing_temperature_k: float = 273.15
    stages: int = 2
    efficiency: float = 0.65
    displacement_m3_s: float | None = None
    intercool_temperature_k: float | None = None
    volumetric_efficiency: float = 0.80
    #: dry ice: hours held in an insulated box before use [s], the box's outside area [m2] and
    #: its heat-transfer coefficient [W/(m2 K)]: 5 cm of expanded polystyrene (k about
    #: 0.035 W/(m K), common practice) gives about 0.7 W/(m2 K)
    hold_time_s: float = 0.0
    box_area_m2: float = 0.6
    box_u_w_m2_k: float = 0.7


@dataclass(frozen=True, slots=True)
class Scenario:
    """A validated scenario: SI floats, parsed route options as raw strings per route."""

    name: str
    note: str
    co2_kg: float
    batch_s: float | None
    end_product: str
    site: Site
    dryer: DryerPlan
    delivery: DeliveryPlan
    weights: Mapping[str, float]
    options: Mapping[str, Mapping[str, str]]
    prices: PriceBook
    document: Mapping[str, Any] = field(repr=False, default_factory=dict)
    #: where it was read from and its text, so that a later error names the file and line
    source: str = "scenario"
    text: str | None = field(default=None, repr=False)
    #: the :class:`co2routes.sources.uses.UseDemand` the demand was worked out from (``None``: given)
    use: Any = None
    #: the plant's finance, cylinders and refrigeration (:mod:`co2routes.sources.plantplan`)
    plant: PlantPlan = PlantPlan()
    #: hard limits and route choice (co2routes.sources.choice): limit key -> value, route ids
    limits: Mapping[str, float] = field(default_factory=dict)
    include: tuple[str, ...] | None = None
    exclude: tuple[str, ...] = ()


def _line_of(text: str | None, section: str | None, key: str) -> int | None:
    """The 1-based line where ``key`` is set inside ``[section]`` (or at top level)."""
    return option_lines(text, section).get(key)


def option_lines(text: str | None, section: str | None) -> dict[str, int]:
    r"""The 1-based line of every ``key = ...`` inside ``[section]`` (or at top level), first kept.

    >>> option_lines('a = 1\n[prices]\n"b" = "1 / kg"\n', "prices")
    {'b': 3}
    """
    lines: dict[str, int] = {}
    current = None
    for number, line in enumerate((text or "").splitlines(), start=1):
        stripped = line.strip()
        if stripped.startswith("[") and stripped.endswith("]"):
            current = stripped.strip("[]").strip()
            continue
        if "=" in stripped and current == section:
            lines.setdefault(stripped.split("=", 1)[0].strip().strip('"'), number)
    return lines


class _Where:
    """Builds error field names as ``FILE, line N: key``."""

    def __init__(self, source: str, text: str | None) -> None:
        self.source, self.text = source, text

    def __call__(self, section: str | None, key: str) -> str:
        full = f"{section}.{key}" if section else key
        line = _line_of(self.text, section, key)
        where = f"{self.source}, line {line}" if line else self.source
        return f"{where}: {full}"


@dataclass(frozen=True, slots=True)
class _Parts:
    """What the table readers share: the document, its checked sections, the error namer."""

    document: Mapping[str, Any]
    sections: Mapping[str, Mapping[str, Any]]
    where: _Where
    source: str
    text: str | None
    book: PriceBook | None

    def q(self, section, key, dimension, default=None, positive=False):
        raw = (self.sections[section] if section else self.document).get(key, default)
        if raw is None:
            return None
        fn = parse_positive if positive else parse
        return fn(raw, self.where(section, key), dimension)


def _check_shape(document: Mapping[str, Any], where: _Where) -> dict[str, Mapping[str, Any]]:
    """Refuse unknown keys and sections that are not tables; the sections by name."""
    for key in document:
        if key not in _TOP_KEYS:
            raise InputError(where(None, key), f"is not a scenario key; keys are {', '.join(sorted(_TOP_KEYS))}")
    sections = {}
    for name in ("site", "dryer", "delivery", "weights", "options", "prices", "uncertain"):
        value = document.get(name, {})
        if not isinstance(value, Mapping):
            raise InputError(where(None, name), "must be a table, e.g. [" + name + "]")
        limits.check_size(value, where(None, name))
        sections[name] = value
    for name, allowed in _SECTION_KEYS.items():
        for key in sections[name]:
            if key not in allowed:
                raise InputError(where(name, key), f"is not a key of [{name}]; keys are {', '.join(sorted(allowed))}")
    return sections


def _demand(p: _Parts) -> dict[str, Any]:
    """``demand`` (and ``batch`` with a rate): the CO2 of one batch [kg] within limits.DEMAND_KG;
    a ``[use]`` table works the demand out from the use instead (:mod:`co2routes.sources.uses`)."""
    use = use_demand(p.document, p.where)
    demand_text = p.document.get("demand") if use is None else use.demand_text
    field = p.where(None, "demand")
    if demand_text is None:
        raise InputError(field, "is required, e.g. demand = \"1.5 kg/day\" or \"3 kg\"")
    batch_s = None
    try:
        co2_kg = parse(demand_text, field, "mass")
    except InputError as as_mass:
        try:
            rate = parse(demand_text, field, "mass_flow")
        except InputError as as_rate:
            wrong_kind = [e for e in (as_mass, as_rate) if not e.allowed.startswith("must be a mass")]
            if wrong_kind:  # a mass or a rate, but out of range, too long or not finite: say that
                raise wrong_kind[0] from None
            raise InputError(field, "must be a mass per batch such as '3 kg' or a rate "
                             "such as '1.5 kg/day'", got=repr(demand_text)) from None
        batch_s = p.q(None, "batch", "time", "1 day", positive=True)
        if use is not None and "batch" not in p.document:
            batch_s = use.period_s  # a use's own run (a brew, a box's hold) is the batch
        co2_kg = rate * batch_s
    low, high = limits.DEMAND_KG
    limits.check_between(co2_kg, field, low, high, f"between {low * 1000:g} g and {high / 1000:g} t of CO2 per "
                         "batch", repr(demand_text))
    end_product = str(p.document.get("end_product", "gas"))
    if end_product not in END_PRODUCTS:
        raise InputError(p.where(None, "end_product"), f"must be one of {', '.join(END_PRODUCTS)}", got=repr(end_product))
    return {"co2_kg": co2_kg, "batch_s": batch_s, "end_product": end_product, "use": use}


def _site(p: _Parts) -> dict[str, Any]:
    """``[site]``: ambient temperature and pressure within :mod:`limits`, CO2 in air."""
    temperature = p.q("site", "temperature", "temperature", "20 degC", positive=True)
    pressure = p.q("site", "pressure", "pressure", "1 atm", positive=True)
    air = p.q("site", "air_co2", "fraction", "425 ppmv", positive=True)
    got = p.sections["site"].get
    limits.check_between(temperature, p.where("site", "temperature"), *limits.SITE_TEMPERATURE_K,
                         "between -90 degC and 70 degC", got("temperature"))
    limits.check_between(pressure, p.where("site", "pressure"), *limits.SITE_PRESSURE_PA,
                         "between 0.3 bar and 2.1 bar", got("pressure"))
    limits.check_between(air, p.where("site", "air_co2"), 0.0, 0.1, "at most 10 %", got("air_co2"))
    return {"site": Site(temperature_k=temperature, pressure_pa=pressure, air_co2_fraction=air)}


def _dryer(p: _Parts) -> dict[str, Any]:
    """``[dryer]``: desiccant, outlet target (ppmv or dew point), cycle."""
    dryer_section = p.sections["dryer"]
    if "target_ppmv" in dryer_section and "target_dew_point" in dryer_section:
        raise InputError(p.where("dryer", "target_ppmv"), "give target_ppmv or target_dew_point, not both")
    ppmv = p.q("dryer", "target_ppmv", "fraction", positive=True)
    if ppmv is not None and ppmv >= 0.01:
        raise InputError(p.where("dryer", "target_ppmv"), "must be a small fraction with its unit, e.g. \"20 ppmv\"",
                         got=dryer_section.get("target_ppmv"))
    return {"dryer": DryerPlan(
        desiccant=str(dryer_section.get("desiccant", "silica-gel")),
        target_ppmv=None if ppmv is None else ppmv * 1e6,
        target_dew_point_k=p.q("dryer", "target_dew_point", "temperature", positive=True),
        cycle_s=p.q("dryer", "cycle", "time", "7 day", positive=True),
    )}


def _delivery(p: _Parts) -> dict[str, Any]:
    """``[delivery]``: compression stages and efficiencies, dry-ice box."""
    section = p.sections["delivery"]
    stages_raw = section.get("stages", 2)
    if isinstance(stages_raw, bool) or not isinstance(stages_raw, int) or not 1 <= stages_raw <= 6:
        raise InputError(p.where("delivery", "stages"), "must be a whole number from 1 to 6", got=stages_raw)
    efficiency = p.q("delivery", "efficiency", "fraction", "65 %", positive=True)
    volumetric = p.q("delivery", "volumetric_efficiency", "fraction", "80 %", positive=True)
    for key, value in (("efficiency", efficiency), ("volumetric_efficiency", volumetric)):
        if value > 1.0:
            raise InputError(p.where("delivery", key), "must be in (0, 100 %]", got=section.get(key))
    hold = p.q("delivery", "hold_time", "time", "0 h")
    if hold < 0:
        raise InputError(p.where("delivery", "hold_time"), "must be 0 or more", got=section.get("hold_time"))
    return {"delivery": DeliveryPlan(
        condensing_temperature_k=p.q("delivery", "condensing_temperature", "temperature", "0 degC", positive=True),
        stages=stages_raw,
        efficiency=efficiency,
        displacement_m3_s=p.q("delivery", "displacement", "volume_flow", positive=True),
        intercool_temperature_k=p.q("delivery", "intercool_temperature", "temperature", positive=True),
        volumetric_efficiency=volumetric,
        hold_time_s=hold,
        box_area_m2=p.q("delivery", "box_area", "area", "0.6 m**2", positive=True),
        box_u_w_m2_k=p.q("delivery", "box_u", "heat_transfer_coefficient", "0.7 W/m**2/K", positive=True),
    )}


def _weights(p: _Parts) -> dict[str, Any]:
    """``[weights]``: finite numbers from 0 to limits.MAX_WEIGHT per criterion."""
    weights = dict(DEFAULT_WEIGHTS)
    for key, value in p.sections["weights"].items():
        if key not in CRITERIA:
            raise InputError(p.where("weights", key), f"is not a criterion; criteria are {', '.join(CRITERIA)}")
        if isinstance(value, bool) or not isinstance(value, (int, float)):
            raise InputError(p.where("weights", key), "must be a number of at least 0", got=value)
        weights[key] = limits.check_between(float(value), p.where("weights", key), 0.0, limits.MAX_WEIGHT,
                                            f"a number from 0 to {limits.MAX_WEIGHT:g}", value)
    return {"weights": weights}


def _options(p: _Parts) -> dict[str, Any]:
    """``[options.ROUTE]``: each a table of strings (checked by the route when it runs)."""
    options: dict[str, dict[str, str]] = {}
    for route_id, table in p.sections["options"].items():
        if not isinstance(table, Mapping):
            raise InputError(p.where("options", route_id), f"must be a table [options.{route_id}]")
        limits.check_size(table, p.where("options", route_id))
        options[route_id] = {k: str(v) for k, v in table.items()}
    return {"options": options}


def _prices(p: _Parts) -> dict[str, Any]:
    """``[prices]`` over the price book, whose currency ``currency`` must match."""
    book = load_book() if p.book is None else p.book
    currency = p.document.get("currency")
    if currency is not None and str(currency) != book.currency:
        raise InputError(p.where(None, "currency"), f"must match the price book's currency {book.currency}", got=currency)
    lines = option_lines(p.text, "prices")
    entries = {}
    for key, raw in p.sections["prices"].items():  # one at a time, so that an error names its line
        line = lines.get(key)
        entries[key] = parse_price(key, raw, f"{p.source}, line {line}: prices" if line else f"{p.source}: prices")
    return {"prices": book.with_prices(entries)}


#: The readers of a scenario, in order; each returns some of :class:`Scenario`'s fields. A new
#: table is one more reader here (and its field at the end of :class:`Scenario`).
def _plant(p: _Parts) -> dict[str, Any]:
    """``[plant]``: finance, cylinders and refrigeration (:func:`co2routes.sources.plantplan.validate_plant`)."""
    return {"plant": validate_plant(p.document.get("plant", {}), p.where)}


def _choices(p: _Parts) -> dict[str, Any]:
    """``[limits]`` and ``[routes]`` (:func:`co2routes.sources.choice.scenario_choices`)."""
    return scenario_choices(p.document, p.where)


READERS = (_demand, _site, _dryer, _delivery, _weights, _options, _prices, _plant, _choices)


def validate(document: Mapping[str, Any], source: str = "scenario", text: str | None = None,
             book: PriceBook | None = None) -> Scenario:
    """Check a scenario document and return the :class:`Scenario` in SI units."""
    where = _Where(source, text)
    parts = _Parts(document, _check_shape(document, where), where, source, text, book)
    fields: dict[str, Any] = {}
    for reader in READERS:
        fields.update(reader(parts))
    return Scenario(
        name=str(document.get("name", "unnamed scenario")), note=str(document.get("note", "")),
        document=copy.deepcopy(dict(document)), source=source, text=text, **fields)


def read_document(path: Path) -> tuple[dict[str, Any], str]:
    """The TOML document at ``path`` and its text; errors name the file (and line)."""
    text = limits.read_text(Path(path), "scenario file")
    return limits.loads(text, str(path)), text


def load(path: Path | str, book: PriceBook | None = None) -> Scenario:
    """Read and validate the scenario file at ``path``."""
    document, text = read_document(Path(path))
    return validate(document, str(path), text, book)


def demo_text(which: str = "polytunnel") -> str:
    """The text of a shipped demo scenario (an invented situation, labelled as such)."""
    if which not in DEMOS:
        raise InputError("demo", f"must be one of {', '.join(DEMOS)}", got=repr(which))
    return resources.files("co2routes.sources").joinpath(f"data/{DEMOS[which]}").read_text(encoding="utf-8")


def demo(which: str = "polytunnel", book: PriceBook | None = None) -> Scenario:
    """The shipped demo scenario, validated."""
    text = demo_text(which)
    return validate(limits.loads(text, f"demo {which}"), f"demo {which}", text, book)


def to_toml(document: Mapping[str, Any]) -> str:
    """The document as plain TOML text (saving writes :func:`co2routes.sources.filewrite.updated_text`)."""
    import tomli_w

    return tomli_w.dumps(dict(document))

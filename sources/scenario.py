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
    [limits] [routes]  hard limits and the routes compared (co2routes.sources.choice)
"""

from __future__ import annotations

import copy
import os
import tempfile
import tomllib
from dataclasses import dataclass, field
from importlib import resources
from pathlib import Path
from typing import Any, Mapping

from co2routes.sources.base import Site
from co2routes.sources.choice import scenario_choices
from co2routes.sources.prices import PriceBook, load_book
from co2routes.thermo.errors import InputError
from co2routes.thermo.units import parse, parse_positive

END_PRODUCTS = ("gas", "liquid", "dry-ice")
CRITERIA = ("cost", "energy", "time", "heat", "water", "purity", "hazard")
DEFAULT_WEIGHTS = {"cost": 3.0, "energy": 1.0, "time": 1.0, "heat": 0.5, "water": 0.5,
                   "purity": 1.0, "hazard": 2.0}
DEMOS = {"polytunnel": "demo-polytunnel.toml", "science-fair": "demo-science-fair.toml"}
_TOP_KEYS = {"name", "note", "demand", "batch", "end_product", "currency", "site", "dryer",
             "delivery", "weights", "options", "prices", "uncertain", "limits", "routes"}
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
    #: hard limits and route choice (co2routes.sources.choice): limit key -> value, route ids
    limits: Mapping[str, float] = field(default_factory=dict)
    include: tuple[str, ...] | None = None
    exclude: tuple[str, ...] = ()


def _line_of(text: str | None, section: str | None, key: str) -> int | None:
    """The 1-based line where ``key`` is set inside ``[section]`` (or at top level)."""
    if not text:
        return None
    current = None
    for number, line in enumerate(text.splitlines(), start=1):
        stripped = line.strip()
        if stripped.startswith("[") and stripped.endswith("]"):
            current = stripped.strip("[]").strip()
            continue
        name = stripped.split("=", 1)[0].strip().strip('"')
        if "=" in stripped and name == key and current == section:
            return number
    return None


class _Where:
    """Builds error field names as ``FILE, line N: key``."""

    def __init__(self, source: str, text: str | None) -> None:
        self.source, self.text = source, text

    def __call__(self, section: str | None, key: str) -> str:
        full = f"{section}.{key}" if section else key
        line = _line_of(self.text, section, key)
        where = f"{self.source}, line {line}" if line else self.source
        return f"{where}: {full}"


def validate(document: Mapping[str, Any], source: str = "scenario", text: str | None = None,
             book: PriceBook | None = None) -> Scenario:
    """Check a scenario document and return the :class:`Scenario` in SI units."""
    where = _Where(source, text)
    for key in document:
        if key not in _TOP_KEYS:
            raise InputError(where(None, key), f"is not a scenario key; keys are {', '.join(sorted(_TOP_KEYS))}")
    sections = {}
    for name in ("site", "dryer", "delivery", "weights", "options", "prices"):
        value = document.get(name, {})
        if not isinstance(value, Mapping):
            raise InputError(where(None, name), "must be a table, e.g. [" + name + "]")
        sections[name] = value
    for name, allowed in _SECTION_KEYS.items():
        for key in sections[name]:
            if key not in allowed:
                raise InputError(where(name, key), f"is not a key of [{name}]; keys are {', '.join(sorted(allowed))}")

    def q(section, key, dimension, default=None, positive=False):
        raw = (sections[section] if section else document).get(key, default)
        if raw is None:
            return None
        fn = parse_positive if positive else parse
        return fn(raw, where(section, key), dimension)

    demand_text = document.get("demand")
    if demand_text is None:
        raise InputError(where(None, "demand"), "is required, e.g. demand = \"1.5 kg/day\" or \"3 kg\"")
    batch_s = None
    try:
        co2_kg = parse(demand_text, where(None, "demand"), "mass")
    except InputError:
        try:
            rate = parse(demand_text, where(None, "demand"), "mass_flow")
        except InputError:
            raise InputError(where(None, "demand"), "must be a mass per batch such as '3 kg' or a rate "
                             "such as '1.5 kg/day'", got=repr(demand_text)) from None
        batch_s = q(None, "batch", "time", "1 day", positive=True)
        co2_kg = rate * batch_s
    if not co2_kg > 0.0:
        raise InputError(where(None, "demand"), "must be greater than zero", got=demand_text)
    end_product = str(document.get("end_product", "gas"))
    if end_product not in END_PRODUCTS:
        raise InputError(where(None, "end_product"), f"must be one of {', '.join(END_PRODUCTS)}", got=repr(end_product))

    site = Site(
        temperature_k=q("site", "temperature", "temperature", "20 degC", positive=True),
        pressure_pa=q("site", "pressure", "pressure", "1 atm", positive=True),
        air_co2_fraction=q("site", "air_co2", "fraction", "425 ppmv", positive=True),
    )
    dryer_section = sections["dryer"]
    if "target_ppmv" in dryer_section and "target_dew_point" in dryer_section:
        raise InputError(where("dryer", "target_ppmv"), "give target_ppmv or target_dew_point, not both")
    ppmv = q("dryer", "target_ppmv", "fraction", positive=True)
    if ppmv is not None and ppmv >= 0.01:
        raise InputError(where("dryer", "target_ppmv"), "must be a small fraction with its unit, e.g. \"20 ppmv\"",
                         got=dryer_section.get("target_ppmv"))
    dryer = DryerPlan(
        desiccant=str(dryer_section.get("desiccant", "silica-gel")),
        target_ppmv=None if ppmv is None else ppmv * 1e6,
        target_dew_point_k=q("dryer", "target_dew_point", "temperature", positive=True),
        cycle_s=q("dryer", "cycle", "time", "7 day", positive=True),
    )
    delivery_section = sections["delivery"]
    stages_raw = delivery_section.get("stages", 2)
    if isinstance(stages_raw, bool) or not isinstance(stages_raw, int) or not 1 <= stages_raw <= 6:
        raise InputError(where("delivery", "stages"), "must be a whole number from 1 to 6", got=stages_raw)
    efficiency = q("delivery", "efficiency", "fraction", "65 %", positive=True)
    volumetric = q("delivery", "volumetric_efficiency", "fraction", "80 %", positive=True)
    for key, value in (("efficiency", efficiency), ("volumetric_efficiency", volumetric)):
        if value > 1.0:
            raise InputError(where("delivery", key), "must be in (0, 100 %]", got=delivery_section.get(key))
    hold = q("delivery", "hold_time", "time", "0 h")
    if hold < 0:
        raise InputError(where("delivery", "hold_time"), "must be 0 or more", got=delivery_section.get("hold_time"))
    delivery = DeliveryPlan(
        condensing_temperature_k=q("delivery", "condensing_temperature", "temperature", "0 degC", positive=True),
        stages=stages_raw,
        efficiency=efficiency,
        displacement_m3_s=q("delivery", "displacement", "volume_flow", positive=True),
        intercool_temperature_k=q("delivery", "intercool_temperature", "temperature", positive=True),
        volumetric_efficiency=volumetric,
        hold_time_s=hold,
        box_area_m2=q("delivery", "box_area", "area", "0.6 m**2", positive=True),
        box_u_w_m2_k=q("delivery", "box_u", "heat_transfer_coefficient", "0.7 W/m**2/K", positive=True),
    )
    weights = dict(DEFAULT_WEIGHTS)
    for key, value in sections["weights"].items():
        if key not in CRITERIA:
            raise InputError(where("weights", key), f"is not a criterion; criteria are {', '.join(CRITERIA)}")
        if isinstance(value, bool) or not isinstance(value, (int, float)) or value < 0:
            raise InputError(where("weights", key), "must be a number of at least 0", got=value)
        weights[key] = float(value)
    options: dict[str, dict[str, str]] = {}
    for route_id, table in sections["options"].items():
        if not isinstance(table, Mapping):
            raise InputError(where("options", route_id), f"must be a table [options.{route_id}]")
        options[route_id] = {k: str(v) for k, v in table.items()}
    book = load_book() if book is None else book
    currency = document.get("currency")
    if currency is not None and str(currency) != book.currency:
        raise InputError(where(None, "currency"), f"must match the price book's currency {book.currency}", got=currency)
    prices = book
    for key, raw in sections["prices"].items():  # one at a time, so that an error names its line
        line = _line_of(text, "prices", key)
        prices = prices.overridden({key: raw}, f"{source}, line {line}: prices" if line else f"{source}: prices")
    return Scenario(
        name=str(document.get("name", "unnamed scenario")), note=str(document.get("note", "")),
        co2_kg=co2_kg, batch_s=batch_s, end_product=end_product, site=site, dryer=dryer,
        delivery=delivery, weights=weights, options=options, prices=prices,
        document=copy.deepcopy(dict(document)), **scenario_choices(document, where),
    )


def read_document(path: Path) -> tuple[dict[str, Any], str]:
    """The TOML document at ``path`` and its text; errors name the file (and line)."""
    try:
        text = Path(path).read_text(encoding="utf-8")
    except FileNotFoundError:
        raise InputError(str(path), "no such scenario file") from None
    except (OSError, UnicodeDecodeError) as err:
        raise InputError(str(path), f"cannot be read: {getattr(err, 'strerror', None) or err}") from None
    try:
        return tomllib.loads(text), text
    except tomllib.TOMLDecodeError as err:
        raise InputError(str(path), f"is not valid TOML: {err}") from None


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
    return validate(tomllib.loads(text), f"demo {which}", text, book)


def to_toml(document: Mapping[str, Any]) -> str:
    """The document as TOML text (what save writes)."""
    import tomli_w

    return tomli_w.dumps(dict(document))


def write_atomic(path: Path | str, text: str, *, overwrite: bool = False) -> None:
    """Write ``text`` to ``path`` through a temporary file in the same folder, then rename.

    Refuses to replace an existing file unless ``overwrite`` is set. A failure leaves any existing
    file untouched and removes the temporary file.
    """
    path = Path(path)
    if path.exists() and not overwrite:
        raise InputError(str(path), "already exists; choose another name or allow overwriting")
    folder = path.parent if str(path.parent) else Path(".")
    try:
        fd, tmp = tempfile.mkstemp(prefix=f".{path.name}.", suffix=".tmp", dir=folder)
    except OSError as err:
        raise InputError(str(path), f"cannot be written: {err.strerror}") from None
    try:
        with os.fdopen(fd, "w", encoding="utf-8") as handle:
            handle.write(text)
            handle.flush()
            os.fsync(handle.fileno())
        os.replace(tmp, path)
    except OSError as err:
        try:
            os.unlink(tmp)
        except OSError:
            pass
        raise InputError(str(path), f"cannot be written: {err.strerror}") from None

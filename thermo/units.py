"""Units at the edge: one pint registry turns the strings a user types into SI floats.

Inside co2routes every quantity is an SI float (K, Pa, kg, J, m3, s, kg/s, ...). Only this
module knows about units. Each call names the field it parses so an error can say which input
was wrong and what dimension was expected.

>>> parse("160 psi", "pressure", "pressure")
1103161.1...
>>> parse("-4 degF", "temperature", "temperature")
253.15
>>> parse("31 %", "strength", "fraction")
0.31
"""

from __future__ import annotations

import math
import re
from functools import lru_cache

from co2routes.thermo.errors import InputError

#: The dimensions a field may ask for, with the SI unit the value is returned in and the
#: pint dimensionality it must have. "fraction" is dimensionless (``31 %`` -> 0.31).
DIMENSIONS: dict[str, tuple[str, str]] = {
    "temperature": ("kelvin", "[temperature]"),
    "temperature_difference": ("delta_degC", "[temperature]"),
    "pressure": ("pascal", "[mass] / [length] / [time] ** 2"),
    "volume": ("meter ** 3", "[length] ** 3"),
    "mass": ("kilogram", "[mass]"),
    "length": ("meter", "[length]"),
    "area": ("meter ** 2", "[length] ** 2"),
    "time": ("second", "[time]"),
    "energy": ("joule", "[length] ** 2 * [mass] / [time] ** 2"),
    "power": ("watt", "[length] ** 2 * [mass] / [time] ** 3"),
    "mass_flow": ("kilogram / second", "[mass] / [time]"),
    "volume_flow": ("meter ** 3 / second", "[length] ** 3 / [time]"),
    "density": ("kilogram / meter ** 3", "[mass] / [length] ** 3"),
    "velocity": ("meter / second", "[length] / [time]"),
    "fraction": ("dimensionless", "dimensionless"),
    "heat_transfer_coefficient": ("watt / meter ** 2 / kelvin", "[mass] / [temperature] / [time] ** 3"),
    "frequency": ("1 / second", "1 / [time]"),
    "mass_flux": ("kilogram / meter ** 2 / second", "[mass] / [length] ** 2 / [time]"),
    "specific_heat": ("joule / kilogram / kelvin", "[length] ** 2 / [temperature] / [time] ** 2"),
    "conductivity": ("watt / meter / kelvin", "[length] * [mass] / [temperature] / [time] ** 3"),
}

#: A few examples per dimension, used in error messages.
EXAMPLES: dict[str, str] = {
    "temperature": "'20 degC', '293 K', '-4 degF'",
    "temperature_difference": "'5 delta_degC', '5 K'",
    "pressure": "'1 atm', '160 psi', '35 bar'",
    "volume": "'10 gal', '47 L', '0.1 m**3'",
    "mass": "'2 kg', '500 g', '5 lb'",
    "length": "'0.1 m', '4 in'",
    "area": "'0.5 m**2'",
    "time": "'8 h', '3 day'",
    "energy": "'5 kJ', '1 kWh'",
    "power": "'1.5 kW'",
    "mass_flow": "'2 kg/day', '10 g/h'",
    "volume_flow": "'1 L/min', '2 m**3/h'",
    "density": "'1.1 kg/L'",
    "velocity": "'0.2 m/s'",
    "fraction": "'31 %', '0.31'",
    "heat_transfer_coefficient": "'0.5 W/m**2/K'",
    "frequency": "'0.5 /h', '2 /day'",
    "mass_flux": "'2 g/m**2/h'",
    "specific_heat": "'4.18 kJ/kg/K'",
    "conductivity": "'0.035 W/m/K'",
}


#: Caps on what a quantity's text may hold (see README, "Bad input"): characters, digits of the
#: number and digits of its decimal exponent. Longer texts are refused before pint sees them.
MAX_TEXT = 80
MAX_DIGITS = 20
MAX_EXPONENT_DIGITS = 3

#: The largest magnitude, in the SI unit of :data:`DIMENSIONS`, any field of that dimension may
#: hold; far beyond anything a small CO2 supply meets, so a value above it is a typing mistake.
LARGEST: dict[str, float] = {
    "temperature": 1e4, "temperature_difference": 1e4, "pressure": 1e9, "volume": 1e6,
    "mass": 1e9, "length": 1e5, "area": 1e6, "time": 1e10, "energy": 1e15, "power": 1e10,
    "mass_flow": 1e4, "volume_flow": 1e4, "density": 1e5, "velocity": 1e4, "fraction": 1e3,
    "heat_transfer_coefficient": 1e6,
}

_TOKEN = re.compile(r"\s*(?:(?P<num>(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][-+]?\d+)?)"
                    r"|(?P<name>[^\W\d]\w*|%)|(?P<power>\*\*|\^)|(?P<op>[*/()])|(?P<sign>[-+]))")


def check_text(raw: str, field: str, want: str) -> None:
    """Refuse a quantity text that is not one number followed by a unit expression.

    The unit expression may use names, ``*``, ``/``, parentheses and one-digit powers
    (``m**3``, ``W/m**2/K``); a number anywhere else (``"2 degC * 3"``, ``"10**400 kg"``,
    ``"9**9**9 K"``) is arithmetic and is refused, as are texts over :data:`MAX_TEXT` characters
    and numbers over :data:`MAX_DIGITS` digits or an exponent over :data:`MAX_EXPONENT_DIGITS`.

    >>> check_text("2 degC * 3", "t", "a temperature")
    Traceback (most recent call last):
    ...
    co2routes.thermo.errors.InputError: t: must be a temperature: one number and its unit, no arithmetic (got '2 degC * 3')
    """
    if len(raw) > MAX_TEXT:
        raise InputError(field, f"must be {want}, at most {MAX_TEXT} characters", got=f"{len(raw)} characters")
    arithmetic = InputError(field, f"must be {want}: one number and its unit, no arithmetic", got=repr(raw))
    position, numbers, previous, before = 0, 0, "", ""
    while position < len(raw):
        match = _TOKEN.match(raw, position)
        if match is None:  # a character no quantity uses (",", ";", "$", ...): refused as a whole
            raise InputError(field, f"must be {want}", got=repr(raw))
        text = match.group(match.lastgroup)
        kind = "close" if text == ")" else match.lastgroup
        position = match.end()
        if kind == "num":
            mantissa, _, exponent = text.lower().partition("e")
            if sum(c.isdigit() for c in mantissa) > MAX_DIGITS or len(exponent.lstrip("+-")) > MAX_EXPONENT_DIGITS:
                raise InputError(field, f"must be {want}, a number of at most {MAX_DIGITS} digits and "
                                 f"an exponent of at most {MAX_EXPONENT_DIGITS}", got=repr(raw))
            if previous == "power" or (previous == "sign" and before == "power"):
                if not text.isdigit() or len(text) > 1:
                    raise arithmetic  # a power is one digit: m**3, not m**400
            elif numbers or previous not in ("", "sign"):
                raise arithmetic  # a second number, or one after a unit: "2 degC * 3"
            else:
                numbers += 1
        elif kind == "power" and previous not in ("name", "close"):
            raise arithmetic  # a power of a number: "10**400", "9**9**9"
        before, previous = previous, kind


@lru_cache(maxsize=1)
def registry():
    """The project's single pint registry (built on first use; pint is not on the start-up path)."""
    import pint

    # pint parses its definitions file on every start (about 0.3 s); with a cache folder (the
    # platform's user cache directory) later starts take about 0.02 s. Without a writable cache
    # it falls back to parsing.
    try:
        ureg = pint.UnitRegistry(autoconvert_offset_to_baseunit=True, cache_folder=":auto:")
    except Exception:  # noqa: BLE001 - an unwritable cache must not stop the tool
        ureg = pint.UnitRegistry(autoconvert_offset_to_baseunit=True)
    ureg.define("ppmv = 1e-6 = ppm_v")
    ureg.define("psig = 6894.757293168361 * pascal")  # treated as psi; gauge is said in the field help
    return ureg


def parse(text: str | float | int, field: str, dimension: str) -> float:
    """Parse ``text`` (cached: the interface re-parses the same strings after every edit).

    See :func:`_parse` for the rules.

    >>> parse("1 atm", "pressure", "pressure")
    101325.0
    """
    if isinstance(text, str) and len(text) > MAX_TEXT:  # refused before it is cached
        raise InputError(field, f"must be at most {MAX_TEXT} characters", got=f"{len(text)} characters")
    if isinstance(text, (str, int, float)) and not isinstance(text, bool):
        return _parse_cached(text, field, dimension)
    return _parse(text, field, dimension)


@lru_cache(maxsize=4096)
def _parse_cached(text: str | float | int, field: str, dimension: str) -> float:
    return _parse(text, field, dimension)


def _parse(text: str | float | int, field: str, dimension: str) -> float:
    """Parse ``text`` (a number with units, e.g. ``"160 psi"``) and return the SI float.

    Parameters
    ----------
    text : str
        What the user typed. A bare number is accepted only for ``dimension="fraction"``.
    field : str
        The input's name, used in the error message.
    dimension : str
        One of :data:`DIMENSIONS`.

    Raises
    ------
    InputError
        Unknown unit, wrong dimension, a bare number where a unit is needed, or not finite.

    >>> parse("10 gal", "volume", "volume")
    0.0378541...
    >>> parse("2 kg/day", "demand", "mass_flow")
    2.31481...e-05
    >>> parse("1 atm", "pressure", "pressure")
    101325.0
    """
    if dimension not in DIMENSIONS:
        raise ValueError(f"unknown dimension {dimension!r}")
    si_unit, dims = DIMENSIONS[dimension]
    want = f"a {dimension.replace('_', ' ')} with units, e.g. {EXAMPLES[dimension]}"
    if isinstance(text, bool):
        raise InputError(field, f"must be {want}", got=text)
    if isinstance(text, (int, float)):
        if dimension != "fraction":
            raise InputError(field, f"must be {want}; a bare number has no unit", got=text)
        value = float(text)
    else:
        raw = str(text).strip()
        if not raw:
            raise InputError(field, f"must be {want}", got="nothing")
        raw = raw.replace("°C", " degC").replace("°F", " degF").replace("°", " deg")
        check_text(raw, field, want)
        ureg = registry()
        try:
            q = ureg.Quantity(raw)
        except Exception:
            raise InputError(field, f"must be {want}", got=repr(raw)) from None
        if not isinstance(q, ureg.Quantity):
            q = ureg.Quantity(q)
        if q.dimensionless and not q.unitless:
            pass  # "%" or "ppmv": a dimensionless quantity with a unit
        elif q.unitless and dimension != "fraction":
            raise InputError(field, f"must be {want}; a bare number has no unit", got=repr(raw))
        if dimension == "temperature_difference":
            ok = q.check("[temperature]")
        else:
            ok = q.check(dims) if dims != "dimensionless" else q.dimensionless
        if not ok:
            raise InputError(field, f"must be {want}", got=repr(raw))
        try:
            if dimension == "temperature":
                value = float(q.to("kelvin").magnitude)
            elif dimension == "temperature_difference":
                value = _temperature_difference(q)
            else:
                value = float(q.to(si_unit).magnitude)
        except Exception:
            raise InputError(field, f"must be {want}", got=repr(raw)) from None
    return within(value, field, dimension, text)


def within(value: float, field: str, dimension: str, got: object = None) -> float:
    """``value`` if it is finite and its magnitude at most :data:`LARGEST` of ``dimension``;
    else one :class:`InputError` naming ``field``. (How small a value may be is each field's
    own rule, e.g. a scenario's demand.)

    >>> within(1e300, "--mass", "mass", "1e300 kg")
    Traceback (most recent call last):
    ...
    co2routes.thermo.errors.InputError: --mass: must be a finite number of magnitude at most 1e+09 kg (got 1e300 kg)
    """
    got = value if got is None else got
    if not math.isfinite(value):
        raise InputError(field, "must be a finite number", got=got)
    largest = LARGEST.get(dimension, 1e15)
    if abs(value) > largest:
        unit = DIMENSIONS.get(dimension, ("", ""))[0].replace("kilogram", "kg").replace("kelvin", "K")
        unit = unit.replace("pascal", "Pa").replace("meter", "m").replace("second", "s").replace(
            "joule", "J").replace("watt", "W").replace("dimensionless", "").replace("delta_degC", "K").replace(" ** ", "**")
        raise InputError(field, f"must be a finite number of magnitude at most {largest:g} {unit}".rstrip(), got=got)
    return value


def _temperature_difference(q) -> float:
    """A temperature difference in kelvin; plain degC/degF are read as differences."""
    ureg = registry()
    unit = str(q.units)
    if unit == "degree_Celsius":
        return float(q.magnitude)
    if unit == "degree_Fahrenheit":
        return float(q.magnitude) * 5.0 / 9.0
    return float(q.to(ureg.kelvin).magnitude) if unit == "kelvin" else float(
        q.to(ureg.delta_degC).magnitude
    )


def parse_positive(text: str, field: str, dimension: str) -> float:
    """Like :func:`parse` but the value must be greater than zero.

    >>> parse_positive("47 L", "volume", "volume")
    0.047
    """
    value = parse(text, field, dimension)
    if not value > 0.0:
        raise InputError(field, "must be greater than zero", got=text)
    return value


def to_unit(value_si: float, dimension: str, unit: str) -> float:
    """Convert an SI float of ``dimension`` into ``unit`` (for display at the edge).

    >>> round(to_unit(101325.0, "pressure", "bar"), 5)
    1.01325
    >>> round(to_unit(273.15, "temperature", "degC"), 6)
    0.0
    """
    ureg = registry()
    si_unit, _ = DIMENSIONS[dimension]
    return float(ureg.Quantity(value_si, si_unit).to(unit).magnitude)

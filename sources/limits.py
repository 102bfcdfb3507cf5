"""The documented caps on what a user may hand the tool (README, "Bad input").

Every cap is far above what a small CO2 supply needs, so that only a typing mistake or a hostile
file meets one; meeting one is a one-line :class:`~co2routes.thermo.errors.InputError` naming the
file, option or key, never a hang. Quantity texts have their own caps in
:mod:`co2routes.thermo.units` (characters, digits, exponent, magnitude per dimension).
"""

from __future__ import annotations

import math
import tomllib
from contextlib import contextmanager
from pathlib import Path
from typing import Any, Iterator, Mapping

from co2routes.thermo.errors import InputError

#: A scenario or price-book file [bytes] and how deep its tables and arrays may nest.
MAX_FILE_BYTES = 1_000_000
MAX_DEPTH = 8
#: Entries of one table: ``[prices]``, ``[uncertain]``, ``[options]`` routes, keys of one
#: ``[options.ROUTE]``, ``[weights]``; and every table of a scenario at once.
MAX_TABLE_KEYS = 500
#: Monte Carlo samples (``uncertainty --samples``) and compression stages (``liquefy --stages``).
MAX_SAMPLES = 200_000
MAX_STAGES = 12
#: The CO2 one batch of a scenario may deliver [kg] (1 g .. 100 t): per-kg figures stay finite.
DEMAND_KG = (1e-3, 1e5)
#: A ranking weight, and a price per SI unit (kg, m3 or J) in the book's currency.
MAX_WEIGHT = 1000.0
MAX_PRICE = 1e9
#: Where a site may be: ambient temperature [K] (-90 .. +70 degC) and pressure [Pa] (0.3 .. 2 atm).
SITE_TEMPERATURE_K = (183.15, 343.15)
SITE_PRESSURE_PA = (3e4, 2.1e5)


def read_text(path: Path, what: str) -> str:
    """The text of the file at ``path``, refused in one line when missing, unreadable, larger than
    :data:`MAX_FILE_BYTES` or not UTF-8 text. ``what`` names the kind of file in the message.

    >>> read_text(Path(""), "scenario file")
    Traceback (most recent call last):
    ...
    co2routes.thermo.errors.InputError: (no file name): no file name given; name a scenario file
    """
    if not str(path).strip() or str(path) == ".":
        raise InputError("(no file name)", f"no file name given; name a {what}")
    try:
        path = Path(path).expanduser()
        if path.is_dir():
            raise InputError(str(path), f"is a folder, not a {what}")
        if path.exists() and not path.is_file():  # a pipe or a device could keep us waiting
            raise InputError(str(path), f"is not a regular file; a {what} is a TOML text file")
        with open(path, "rb") as handle:
            data = handle.read(MAX_FILE_BYTES + 1)
    except FileNotFoundError:
        raise InputError(str(path), f"no such {what}") from None
    except (OSError, RuntimeError, ValueError) as err:
        raise InputError(str(path), f"cannot be read: {getattr(err, 'strerror', None) or err}") from None
    if len(data) > MAX_FILE_BYTES:
        raise InputError(str(path), f"is larger than {MAX_FILE_BYTES:,} bytes; a {what} is far smaller")
    try:
        return data.decode("utf-8")
    except UnicodeDecodeError:
        raise InputError(str(path), f"is not text (not UTF-8); a {what} is TOML text") from None


def loads(text: str, where: str) -> dict[str, Any]:
    """TOML ``text`` as a dict; refused in one line when invalid, over :data:`MAX_FILE_BYTES`
    or nested deeper than :data:`MAX_DEPTH`.

    >>> loads("a = [[[[[[[[[[1]]]]]]]]]]", "f.toml")
    Traceback (most recent call last):
    ...
    co2routes.thermo.errors.InputError: f.toml: nests tables or arrays deeper than 8 levels
    """
    if len(text) > MAX_FILE_BYTES:
        raise InputError(where, f"is larger than {MAX_FILE_BYTES:,} characters")
    too_deep = InputError(where, f"nests tables or arrays deeper than {MAX_DEPTH} levels")
    try:
        document = tomllib.loads(text)
    except tomllib.TOMLDecodeError as err:
        raise InputError(where, f"is not valid TOML: {err}") from None
    except RecursionError:
        raise too_deep from None
    if depth(document) > MAX_DEPTH:
        raise too_deep
    return document


def depth(value: Any) -> int:
    """How deep tables (dicts) and arrays (lists) nest in ``value``, counted without recursion.

    >>> depth({"a": {"b": [1, 2]}}), depth(3)
    (3, 0)
    """
    deepest, stack = 0, [(value, 0)]
    while stack:
        item, level = stack.pop()
        if isinstance(item, Mapping):
            children = item.values()
        elif isinstance(item, list):
            children = item
        else:
            continue
        deepest = max(deepest, level + 1)
        stack.extend((child, level + 1) for child in children)
    return deepest


def check_size(table: Mapping[str, Any] | list, field: str, cap: int = MAX_TABLE_KEYS) -> None:
    """Refuse a table (or array) holding more than ``cap`` entries.

    >>> check_size({}, "prices")
    """
    if len(table) > cap:
        raise InputError(field, f"may hold at most {cap} entries", got=f"{len(table)} entries")


def check_between(value: float, field: str, low: float, high: float, shown: str, got: object) -> float:
    """``value`` if finite and within ``[low, high]``; ``shown`` says the range in words.

    >>> check_between(2.0, "weights.cost", 0.0, MAX_WEIGHT, "from 0 to 1000", 2.0)
    2.0
    """
    if not (math.isfinite(value) and low <= value <= high):
        raise InputError(field, f"must be {shown}", got=got)
    return value


@contextmanager
def file_action(path: object, doing: str) -> Iterator[None]:
    """Turn what the system says about a file (no such user in ``~user``, a name too long, no
    permission, a full disk) into one :class:`InputError` naming the file; ``doing`` says what
    was tried ("saved", "read").

    >>> with file_action("~nosuchuser-x/a.toml", "saved"):
    ...     Path("~nosuchuser-x/a.toml").expanduser()
    Traceback (most recent call last):
    ...
    co2routes.thermo.errors.InputError: ~nosuchuser-x/a.toml: cannot be saved: Could not determine home directory.
    """
    try:
        yield
    except InputError:
        raise
    except (OSError, RuntimeError, ValueError, UnicodeError) as err:
        reason = getattr(err, "strerror", None) or str(err) or type(err).__name__
        raise InputError(str(path), f"cannot be {doing}: {reason}") from None

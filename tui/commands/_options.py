"""Small helpers shared by the CO2-state verbs (``saturation``, ``store``, ``snow``, ``moisture``).

Not a verb: it is not listed in ``co2routes.tui.cli.COMMANDS``.
"""

from __future__ import annotations

from contextlib import contextmanager
from typing import Iterator, Optional

from co2routes.thermo.errors import InputError


@contextmanager
def for_option(option: str, typed: Optional[str] = None, value: Optional[float] = None) -> Iterator[None]:
    """Re-label an :class:`InputError` raised by ``thermo`` so that it names ``option``.

    ``thermo`` names its own fields ("temperature", "mass"); on the command line the message must
    name the option the user typed. Errors that already name an option pass through. When the
    error echoes ``value`` (the SI number parsed from ``typed``), the text as typed is echoed
    instead, in the user's unit.

    >>> try:
    ...     with for_option("--volume"):
    ...         raise InputError("volume", "must be greater than zero", got=-1)
    ... except InputError as err:
    ...     print(err)
    --volume: must be greater than zero (got -1)
    >>> try:
    ...     with for_option("--pressure", "57.29 bar", 5729000.0):
    ...         raise InputError("pressure", "is the saturation pressure", got=5729000.0)
    ... except InputError as err:
    ...     print(err)
    --pressure: is the saturation pressure (got '57.29 bar')
    """
    try:
        yield
    except InputError as err:
        if err.field.startswith("--"):
            raise
        got = repr(typed) if typed is not None and value is not None and err.got == value else err.got
        raise InputError(option, err.allowed, got) from None

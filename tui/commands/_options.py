"""Small helpers shared by the CO2-state verbs (``saturation``, ``store``, ``snow``, ``moisture``).

Not a verb: it is not listed in ``co2routes.tui.cli.COMMANDS``.
"""

from __future__ import annotations

from contextlib import contextmanager
from typing import Iterator

from co2routes.thermo.errors import InputError


@contextmanager
def for_option(option: str) -> Iterator[None]:
    """Re-label an :class:`InputError` raised by ``thermo`` so that it names ``option``.

    ``thermo`` names its own fields ("temperature", "mass"); on the command line the message must
    name the option the user typed. Errors that already name an option pass through.

    >>> try:
    ...     with for_option("--volume"):
    ...         raise InputError("volume", "must be greater than zero", got=-1)
    ... except InputError as err:
    ...     print(err)
    --volume: must be greater than zero (got -1)
    """
    try:
        yield
    except InputError as err:
        if err.field.startswith("--"):
            raise
        raise InputError(option, err.allowed, err.got) from None

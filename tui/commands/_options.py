"""Small helpers shared by the verbs (``saturation``, ``store``, ``snow``, ``moisture``, ``calcination`` ...).

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


def add_either(parser, first: tuple[str, str, str], second: tuple[str, str, str]) -> None:
    """Two options of which the user must give exactly one; each is ``(flag, metavar, help)``."""
    group = parser.add_mutually_exclusive_group(required=True)
    for flag, metavar, text in (first, second):
        group.add_argument(flag, metavar=metavar, help=text)


def given(args, *choices: tuple[str, str]) -> tuple[str, float]:
    """The option the user gave among ``choices`` (``(flag, dimension)``) and its SI value.

    A dimension ending in ``+`` must be greater than zero.

    >>> import argparse
    >>> given(argparse.Namespace(temperature=None, co2_pressure="2 bar"),
    ...       ("--temperature", "temperature"), ("--co2-pressure", "pressure+"))
    ('--co2-pressure', 200000.0)
    """
    from co2routes.thermo.units import parse, parse_positive

    for flag, dimension in choices:
        text = getattr(args, flag.lstrip("-").replace("-", "_"))
        if text is not None:
            if dimension.endswith("+"):
                return flag, parse_positive(text, flag, dimension[:-1])
            return flag, parse(text, flag, dimension)
    raise InputError(" or ".join(flag for flag, _ in choices), "one of them must be given")


def typed_text(args, flag: str) -> str | None:
    """What the user typed for ``flag`` (to echo it back in their unit).

    >>> import argparse
    >>> typed_text(argparse.Namespace(co2_pressure="2 bar"), "--co2-pressure")
    '2 bar'
    """
    return getattr(args, flag.lstrip("-").replace("-", "_"))

"""The one exception type for a user's mistake.

The command line prints it on one line and exits with status 2; the interface shows it beside the
field and keeps the last good result.
"""

from __future__ import annotations


class InputError(ValueError):
    """A value the user gave that the tool cannot use.

    ``field`` names the input (a command-line option, a scenario key or a form field) and
    ``allowed`` says what would be accepted. ``str(err)`` is a single line.

    >>> str(InputError("volume", "must be greater than zero", got="-3 L"))
    'volume: must be greater than zero (got -3 L)'
    """

    def __init__(self, field: str, allowed: str, got: object | None = None) -> None:
        self.field = field
        self.allowed = allowed
        self.got = got
        text = f"{field}: {allowed}"
        if got is not None:
            text += f" (got {got})"
        super().__init__(" ".join(text.split()))


def require_positive(field: str, value: float) -> float:
    """Return ``value`` if it is a finite number above zero, else raise :class:`InputError`.

    >>> require_positive("mass", 2.0)
    2.0
    """
    if not (value > 0.0) or value != value or value == float("inf"):
        raise InputError(field, "must be a finite number greater than zero", got=value)
    return value


def require_fraction(field: str, value: float, *, allow_zero: bool = False) -> float:
    """Return ``value`` if it lies in (0, 1] (or [0, 1] with ``allow_zero``).

    >>> require_fraction("efficiency", 0.9)
    0.9
    """
    low_ok = value >= 0.0 if allow_zero else value > 0.0
    if not (low_ok and value <= 1.0):
        span = "[0, 1]" if allow_zero else "(0, 1]"
        raise InputError(field, f"must be a fraction in {span}", got=value)
    return value

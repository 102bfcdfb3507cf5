"""Option handling the built-in routes share: defaults filled in, and an option with a named default."""

from __future__ import annotations

from dataclasses import dataclass
from typing import Any, Mapping

from co2routes.sources.base import Option


@dataclass(frozen=True, slots=True)
class NamedDefaultOption(Option):
    """An :class:`Option` whose default is a word (e.g. ``"as sold"``) that parses to ``None``.

    The route then picks the value itself (for an acid's strength: the strength it is sold at).
    Anything else is parsed as for a plain option.

    >>> opt = NamedDefaultOption("strength", "acid strength", "fraction", "as sold", low=0.01, high=1.0)
    >>> opt.parse("as sold") is None, opt.parse("31 %")
    (True, 0.31)
    """

    def parse(self, text: str | float | int) -> float | str | int | None:
        """``None`` for the default word, else the parsed value."""
        if isinstance(text, str) and text.strip().lower() == self.default.strip().lower():
            return None
        return Option.parse(self, text)


def settings(options: tuple[Option, ...], given: Mapping[str, Any]) -> dict[str, Any]:
    """Every option's value: taken from ``given`` (already parsed) or parsed from its default.

    >>> settings((Option("n", "count", "count", "3", low=1, high=9),), {})
    {'n': 3}
    """
    return {opt.key: given[opt.key] if opt.key in given else opt.parse(opt.default) for opt in options}

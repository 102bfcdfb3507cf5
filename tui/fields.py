"""The fields of the scenario form: which document key each edits, its label and unit hint.

Pure data and conversion, no widgets. A field's text becomes a document value with
:meth:`Field.to_document`; a wrong value is left for :func:`co2routes.sources.scenario.validate` to refuse, so
the message the user sees is the same one the command line prints.
"""

from __future__ import annotations

from dataclasses import dataclass
from typing import Any, Iterable, Mapping

from co2routes.sources.scenario import CRITERIA, END_PRODUCTS


@dataclass(frozen=True, slots=True)
class Field:
    """One editable input.

    ``keys`` is the path in the document (``("site", "temperature")``); ``kind`` is ``"text"``
    (stored as typed), ``"whole"`` (stored as an integer when it reads as one) or ``"number"``
    (stored as a float when it reads as one); ``hint`` names the unit or what may be typed;
    ``default`` is shown greyed when the key is absent; ``choices`` lists allowed words.
    """

    keys: tuple[str, ...]
    label: str
    hint: str
    kind: str = "text"
    default: str = ""
    choices: tuple[str, ...] = ()
    group: str = "Demand"

    @property
    def dotted(self) -> str:
        """The document path as ``site.temperature``."""
        return ".".join(self.keys)

    @property
    def widget_id(self) -> str:
        """A DOM id made from the path (dots and dashes would not be valid)."""
        return "f-" + "--".join(k.replace("-", "_") for k in self.keys)

    def to_document(self, text: str) -> Any:
        """The document value for ``text``; ``None`` (remove the key) when the text is empty.

        >>> Field(("delivery", "stages"), "stages", "", kind="whole").to_document("3")
        3
        >>> Field(("weights", "cost"), "cost", "", kind="number").to_document("2.5")
        2.5
        >>> Field(("weights", "cost"), "cost", "", kind="number").to_document("lots")
        'lots'
        """
        text = text.strip()
        if not text:
            return None
        if self.kind == "whole":
            try:
                return int(text)
            except ValueError:
                return text
        if self.kind == "number":
            try:
                return float(text)
            except ValueError:
                return text
        return text

    def to_text(self, value: Any) -> str:
        """What the input shows for a document value (``""`` when absent).

        >>> Field(("weights", "cost"), "cost", "", kind="number").to_text(3.0)
        '3'
        """
        if value is None:
            return ""
        if isinstance(value, float) and self.kind == "number":
            return f"{value:g}"
        if isinstance(value, Mapping):
            return str(value.get("price", ""))
        return str(value)


#: The fields every scenario has, in the order the form shows them.
BASE_FIELDS: tuple[Field, ...] = (
    Field(("name",), "name", "free text", default="unnamed scenario"),
    Field(("demand",), "demand", "kg/day, g/h or kg per batch", default="required"),
    Field(("batch",), "batch covers", "time: h, day", default="1 day"),
    Field(("end_product",), "end product", " | ".join(END_PRODUCTS), default="gas",
          choices=END_PRODUCTS),
    Field(("site", "temperature"), "air temperature", "degC, K, degF", default="20 degC", group="Site"),
    Field(("site", "pressure"), "air pressure", "atm, bar, kPa, psi", default="1 atm", group="Site"),
    Field(("site", "air_co2"), "CO2 in air", "ppmv, %", default="425 ppmv", group="Site"),
    Field(("dryer", "desiccant"), "desiccant", "desiccant id", default="silica-gel", group="Dryer"),
    Field(("dryer", "target_dew_point"), "dry to a dew point of", "degC (or fill in the next field instead)",
          group="Dryer"),
    Field(("dryer", "target_ppmv"), "or dry to water left of", "ppmv (instead of a dew point)", group="Dryer"),
    Field(("dryer", "cycle"), "regenerate every", "h, day", default="7 day", group="Dryer"),
    Field(("delivery", "condensing_temperature"), "condense at", "degC, K", default="0 degC",
          group="Delivery"),
    Field(("delivery", "stages"), "stages", "whole number 1-6", kind="whole", default="2",
          group="Delivery"),
    Field(("delivery", "efficiency"), "efficiency", "%", default="65 %", group="Delivery"),
    Field(("delivery", "displacement"), "displacement", "L/min, m**3/h", group="Delivery"),
) + tuple(
    Field(("weights", c), c, "number >= 0", kind="number", group="Weights") for c in CRITERIA
) + (  # hard limits (co2routes.sources.choice); a route over one is listed last with the reason
    Field(("limits", "max_hazard"), "most hazard", "1, 2 or 3", kind="whole", group="Limits"),
    Field(("limits", "max_time"), "longest batch", "h, day", group="Limits"),
    Field(("limits", "min_purity"), "least CO2", "%", group="Limits"),
    Field(("limits", "max_cost_per_kg"), "most cost", "per kg of product", kind="number", group="Limits"),
    Field(("limits", "max_capital_per_kg"), "most capital", "per kg of product", kind="number", group="Limits"),
)


def option_fields(routes: Iterable[Any]) -> tuple[Field, ...]:
    """One field per option of each route, grouped by route, defaults greyed."""
    out = []
    for route in routes:
        for opt in route.options:
            hint = " | ".join(opt.choices) if opt.choices else (opt.help or opt.dimension.replace("_", " "))
            out.append(Field(("options", route.id, opt.key), opt.label, hint, default=str(opt.default),
                             choices=tuple(opt.choices), group=f"Options: {route.label}"))
    return tuple(out)


def price_fields(book: Any) -> tuple[Field, ...]:
    """One field per entry of the price book; the book's price is greyed until overridden."""
    return tuple(Field(("prices", key), key, f"{book.currency} / unit", default=price.text or "",
                       group=f"Prices ({book.currency})")
                 for key, price in sorted(book.prices.items()))


def price_value(book: Any, key: str, text: str) -> Any:
    """The ``[prices]`` value for ``text``: keeps the book's strength for a solution's price.

    A price typed for a solution sold at a strength (hydrochloric acid at 31 %) stays a price of
    that solution, so the cost of the pure content is worked out the same way as the book's.
    """
    text = text.strip()
    if not text:
        return None
    price = book.get(key) if book is not None else None
    if price is not None and price.strength is not None:
        return {"price": text, "strength": f"{price.strength * 100:g} %"}
    return text


def match_field(fields: Iterable[Field], error_field: str) -> Field | None:
    """The field an error names: ``InputError.field`` ends with the dotted path (after a file and
    line), or names a route option.

    >>> f = Field(("site", "pressure"), "air pressure", "")
    >>> match_field([f], "demo polytunnel, line 14: site.pressure") is f
    True
    """
    tail = error_field.rsplit(": ", 1)[-1].strip()
    for f in fields:
        if tail == f.dotted or tail == f"prices.{f.keys[-1]}" and f.keys[0] == "prices":
            return f
    for f in fields:
        if tail.startswith(f.dotted + "."):
            return f
    return None

"""What an edit in the scenario form does, without widgets (so it is tested in plain pytest).

:func:`document_after` is the document once the user has typed a text into a field;
:func:`refusal_marks` says which fields show which reason when the edited scenario is refused.
The planning screen (:mod:`co2routes.tui.screens.main`) only calls these and shows the result.
"""

from __future__ import annotations

from typing import Any, Iterable, Mapping

from co2routes.tui.fields import Field, match_field, price_value
from co2routes.tui.session import edited, value_at


def document_after(document: Mapping[str, Any], field: Field, text: str, book: Any) -> dict[str, Any]:
    """A copy of ``document`` with ``field`` set from the typed ``text`` (empty text removes it).

    A price keeps the book's strength (:func:`co2routes.tui.fields.price_value`).

    >>> f = Field(("site", "pressure"), "air pressure", "")
    >>> document_after({"demand": "1 kg"}, f, " 2 bar ", None)
    {'demand': '1 kg', 'site': {'pressure': '2 bar'}}
    """
    value = price_value(book, field.keys[-1], text) if field.keys[0] == "prices" else field.to_document(text)
    return edited(document, field.keys, value)


def refusal_marks(fields: Iterable[Field], err: Any, edited_field: Field | None,
                  document: Mapping[str, Any] | None = None) -> list[tuple[Field, str | None]]:
    """The marks to show for a refused scenario: ``(field, reason)``, a ``None`` reason clears.

    The reason goes under the field the error names (``err.field``, matched by
    :func:`co2routes.tui.fields.match_field`), else under the field just edited; when the error
    names another field, the edited one is cleared. A reason shown under a field the error does
    not name starts with the name it does. A number the error echoes is shown as the user typed
    it in ``document`` (their unit, not SI).

    >>> from co2routes.thermo.errors import InputError
    >>> demand = Field(("demand",), "demand", "")
    >>> refusal_marks([demand], InputError("s.toml, line 2: demand", "must be a mass", got="'x'"), demand)
    [(Field(keys=('demand',), ...), "must be a mass (got 'x')")]
    """
    fields = list(fields)
    field = match_field(fields, err.field) or edited_field
    got = err.got
    if isinstance(got, (int, float)) and not isinstance(got, bool) and field is not None and document is not None:
        typed = value_at(document, field.keys)
        got = repr(typed) if isinstance(typed, str) else got
    reason = err.allowed + (f" (got {got})" if got is not None else "")
    marks: list[tuple[Field, str | None]] = []
    if edited_field is not None and field is not edited_field:
        marks.append((edited_field, None))
    if field is not None:
        marks.append((field, reason if field is not edited_field or field.dotted in err.field
                       else f"{err.field}: {reason}"))
    return marks

"""The scenario form: every input of the scenario, each with its unit, and its error beside it.

The form only shows and collects text. Each edit is sent as a :class:`FieldEdited` message; the
screen turns it into a document change, validates it off the UI thread and, when the value is
refused, calls :meth:`ScenarioForm.mark` so the reason appears under that field.
"""

from __future__ import annotations

from dataclasses import dataclass
from typing import Any, Iterable, Mapping

from textual import on
from textual.app import ComposeResult
from textual.containers import Vertical, VerticalScroll
from textual.message import Message
from textual.suggester import SuggestFromList
from textual.widgets import Input, Label, Static

from co2routes.tui.fields import Field
from co2routes.tui.session import value_at
from co2routes.tui.widgets import css_of
from co2routes.tui.widgets.fitting import shorten


@dataclass
class FieldEdited(Message):
    """The user changed the text of ``field`` to ``text``."""

    field: Field
    text: str


class FieldRow(Vertical):
    """One field: its label, the input and a line for its error. What may be typed is shown on
    the form's bottom frame while the field has the focus (so a label never wraps)."""

    def __init__(self, field: Field, text: str) -> None:
        super().__init__(classes="field-row")
        self.field = field
        self._text = text
        #: the error shown under this field, if any
        self.reason: str | None = None

    def compose(self) -> ComposeResult:
        f = self.field
        yield Label(f.label, classes="field-label")
        suggester = SuggestFromList(f.choices, case_sensitive=False) if f.choices else None
        yield Input(self._text, placeholder=f.default, id=f.widget_id, compact=True,
                    suggester=suggester, select_on_focus=False, tooltip=f"{f.dotted}: {f.hint}")
        yield Static("", classes="field-error")

    def mark(self, reason: str | None) -> None:
        """Show ``reason`` under the input, or clear it (``None``)."""
        self.reason = reason or None
        self.query_one(".field-error", Static).update(f"✗ {reason}" if reason else "")
        self.set_class(bool(reason), "-bad")


class ScenarioForm(VerticalScroll):
    """All fields, in groups, in one scrolling column."""

    DEFAULT_CSS = css_of(__file__)

    def __init__(self, **kwargs: Any) -> None:
        super().__init__(**kwargs)
        self.fields: list[Field] = []
        self._groups: set[str] = set()

    def add_fields(self, fields: Iterable[Field], document: Mapping[str, Any]) -> None:
        """Mount ``fields`` (those not there yet) filled from ``document``."""
        widgets = []
        for f in fields:
            if any(f.keys == g.keys for g in self.fields):
                continue
            if f.group not in self._groups:
                self._groups.add(f.group)
                widgets.append(Label(f.group, classes="group-title"))
            self.fields.append(f)
            widgets.append(FieldRow(f, f.to_text(value_at(document, f.keys))))
        if widgets:
            self.mount_all(widgets)

    def fill(self, document: Mapping[str, Any]) -> None:
        """Show ``document``'s values in every field (after opening a file); clears marks."""
        for row in self.query(FieldRow):
            text = row.field.to_text(value_at(document, row.field.keys))
            box = row.query_one(Input)
            with box.prevent(Input.Changed):
                box.value = text
            row.mark(None)

    def row_of(self, field: Field) -> FieldRow | None:
        """The row showing ``field``."""
        for row in self.query(FieldRow):
            if row.field.keys == field.keys:
                return row
        return None

    def mark(self, field: Field, reason: str | None) -> None:
        """Show (or clear) the error under ``field``."""
        row = self.row_of(field)
        if row is not None:
            row.mark(reason)

    def clear_marks(self) -> None:
        """Clear every field's error."""
        for row in self.query(FieldRow):
            row.mark(None)

    def marked(self) -> dict[str, str]:
        """Dotted path -> reason, for every field showing an error."""
        return {row.field.dotted: row.reason or "" for row in self.query(FieldRow) if row.has_class("-bad")}

    def on_descendant_focus(self, event: Any) -> None:
        row = event.widget.parent
        if isinstance(row, FieldRow):
            self.border_subtitle = shorten(f"type: {row.field.hint}", max(8, self.size.width - 4))

    def on_descendant_blur(self) -> None:
        self.border_subtitle = ""

    @on(Input.Changed)
    def _changed(self, event: Input.Changed) -> None:
        row = event.input.parent
        if isinstance(row, FieldRow):
            event.stop()
            self.post_message(FieldEdited(row.field, event.value))

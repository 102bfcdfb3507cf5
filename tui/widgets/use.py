"""The demand-from-the-use panel: the ``[use]`` fields in the scenario form, and what they give.

The panel sits in the scenario form: the use's kind, then the inputs of the kind chosen (the
fields change with the kind), then :class:`UseBalance`, the demand the use gives and the balance it
comes from. The fields edit the scenario's ``[use]`` table like any other field (a refused value is
marked under its field with the command line's message), and the demand field's hint says where
the demand came from.
"""

from __future__ import annotations

from typing import Any, Mapping

from rich.text import Text
from textual.app import ComposeResult
from textual.containers import Vertical
from textual.widgets import Input, Label, Static

from co2routes.sources.uses import KINDS, module_of
from co2routes.tui.fields import Field
from co2routes.tui.session import value_at
from co2routes.tui.widgets import css_of
from co2routes.tui.widgets.form import FieldRow

#: group title of the panel
GROUP = "Demand from the use"
KIND_FIELD = Field(("use", "kind"), "use (sets the demand; clear demand)", " | ".join(KINDS),
                   choices=tuple(KINDS), group=GROUP)


def kind_of(document: Mapping[str, Any]) -> str | None:
    """The use kind the document names (``None``: none, or not a known kind).

    >>> kind_of({"use": {"kind": "greenhouse"}}), kind_of({})
    ('greenhouse', None)
    """
    table = document.get("use")
    kind = table.get("kind") if isinstance(table, Mapping) else None
    return kind if kind in KINDS else None


def use_fields(kind: str) -> tuple[Field, ...]:
    """The fields of one use's inputs, defaults greyed."""
    return tuple(Field(("use", spec.key), spec.label, spec.help, default=spec.default or "",
                       choices=spec.choices, group=f"Use: {kind}") for spec in module_of(kind).INPUTS)


class UseFieldRow(FieldRow):
    """A use field's row: it comes and goes with the kind, so a mark that arrives before its
    parts are composed (or after they are removed) is kept for when they are there."""

    def mark(self, reason: str | None) -> None:
        """Show (or clear) ``reason`` under the input once the row has its parts."""
        self._pending = reason
        if self.query(".field-error"):
            super().mark(reason)

    def on_mount(self) -> None:
        pending = getattr(self, "_pending", None)
        if pending:
            self.call_after_refresh(super().mark, pending)


class UseBalance(Static):
    """What the use gives: the demand, its peak, the balance behind it, its cautions."""

    def show(self, use: Any) -> None:
        """Show ``use`` (a :class:`co2routes.sources.uses.UseDemand`) or that the demand is given."""
        if use is None:
            self.update(Text("No use: the demand is the scenario's own. Name a use to work it out.",
                             style="dim"))
            return
        from co2routes.sources.uses import record
        from co2routes.tui.output import format_value, label_of

        text = Text(f"{use.summary}\n", style="bold")
        for key, value in record(use).items():
            if key in ("use", "summary") or isinstance(value, (list, dict)) or value is None:
                continue
            text.append(f"{label_of(key)[0]}: {format_value(key, value)}\n")
        for line in use.warnings:
            text.append(f"⚠ {line}\n", style="bold")
        for line in use.cautions:
            text.append(f"caution: {line}\n", style="italic")
        self.update(text)


class UsePanel(Vertical):
    """The kind, the chosen use's fields and the balance, inside the scenario form."""

    DEFAULT_CSS = css_of(__file__)

    def __init__(self, form: Any, document: Mapping[str, Any]) -> None:
        super().__init__(id="use-panel")
        self.form = form
        self._document = document
        #: the kind whose fields are shown
        self.kind: str | None = None

    def compose(self) -> ComposeResult:
        yield Label(GROUP, classes="group-title")
        yield UseFieldRow(KIND_FIELD, KIND_FIELD.to_text(value_at(self._document, KIND_FIELD.keys)))
        yield Vertical(id="use-fields")
        yield UseBalance(id="use-balance")

    def on_mount(self) -> None:
        self.form.fields.append(KIND_FIELD)
        self.sync(self._document, recompute=False)
        outcome = getattr(self.screen, "outcome", None)
        if outcome is not None:  # worked out before the panel was mounted
            self.call_after_refresh(show_use, self.screen, outcome.scenario)

    def sync(self, document: Mapping[str, Any], recompute: bool = True) -> None:
        """Show the fields of the kind ``document`` names (none without one); after an edit, work
        the scenario out again once they are shown, so that an error is marked under them."""
        kind = kind_of(document)
        if kind == self.kind:
            return
        self.kind = kind
        fields = use_fields(kind) if kind else ()
        self.form.fields[:] = [f for f in self.form.fields if f.keys[0] != "use" or f is KIND_FIELD]
        self.form.fields.extend(fields)
        self.call_later(self._swap, kind, fields, dict(document), recompute)

    async def _swap(self, kind: str | None, fields: tuple[Field, ...], document: Mapping[str, Any],
                    recompute: bool) -> None:
        """Replace the shown fields (the old rows go first: the kinds share input ids)."""
        box = self.query_one("#use-fields", Vertical)
        await box.remove_children()
        if kind is not None and kind == self.kind:
            await box.mount(Label(f"Use: {kind}", classes="group-title"),
                            *[UseFieldRow(f, f.to_text(value_at(document, f.keys))) for f in fields])
        if recompute and kind == self.kind:
            self.screen.start()


def add_use_panel(form: Any, document: Mapping[str, Any]) -> None:
    """Mount the use panel under the scenario form's fields, after the first frame (so that it
    does not hold the first frame back)."""
    def mount() -> None:
        form.mount(UsePanel(form, getattr(form.screen, "document", document)))

    form.call_after_refresh(mount)


def sync_use_fields(screen: Any) -> None:
    """After an edit: show the fields of the use the document now names."""
    for panel in screen.query(UsePanel):
        panel.sync(screen.document)


def show_use(screen: Any, scenario: Any) -> None:
    """After a computation: the balance, the use's fields, and the demand field's hint saying
    where the demand came from."""
    use = getattr(scenario, "use", None)
    for panel in screen.query(UsePanel):
        panel.sync(screen.document, recompute=False)
        for balance in panel.query(UseBalance):  # none yet while the panel is still composing
            balance.show(use)
    box = screen.query_one("#f-demand", Input)
    box.placeholder = "required" if use is None else f"{use.demand_kg_per_day:.4g} kg/day from the {use.kind} use"

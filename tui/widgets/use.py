"""The demand-from-the-use panel: the ``[use]`` fields in the scenario form, and what they give.

The fields edit the scenario's ``[use]`` table like any other field (so a refused value is marked
under its field with the command line's message); :class:`UseBalance` shows the demand the use
gives and the balance it comes from, and the demand field's hint says where the demand came from.
"""

from __future__ import annotations

from typing import Any, Mapping

from rich.text import Text
from textual.widgets import Input, Static

from co2routes.sources.uses import KINDS, all_inputs
from co2routes.tui.fields import Field
from co2routes.tui.widgets import css_of

#: group title of the fields every use shares (and of the kind)
GROUP = "Demand from the use"
#: hints of the inputs several uses share (each use keeps its own default)
SHARED_HINTS = {
    "volume": "L, m**3: the house's air, the wort, or the drink",
    "headspace": "%: of the fermenter's liquid, or of each package",
    "every": "time between runs: brews, batches, boxes",
    "atmosphere": "atm, bar: default the site's",
}


def use_fields() -> tuple[Field, ...]:
    """``use.kind``, the inputs several uses share, then each use's own inputs in its group."""
    specs = all_inputs()
    counts: dict[str, int] = {}
    for inputs in specs.values():
        for spec in inputs:
            counts[spec.key] = counts.get(spec.key, 0) + 1
    out = [Field(("use", "kind"), "use (sets the demand)", " | ".join(KINDS), choices=tuple(KINDS), group=GROUP)]
    shared = {}
    for kind, inputs in specs.items():
        for spec in inputs:
            if counts[spec.key] > 1:
                shared.setdefault(spec.key, spec)
                continue
            out.append(Field(("use", spec.key), spec.label, spec.help, default=spec.default or "",
                             choices=spec.choices, group=f"Use: {kind}"))
    out[1:1] = [Field(("use", key), key.replace("_", " "), SHARED_HINTS.get(key, spec.help), group=GROUP)
                for key, spec in shared.items()]
    return tuple(out)


class UseBalance(Static):
    """What the use gives: the demand, its peak, and the balance behind it."""

    DEFAULT_CSS = css_of(__file__)

    def show(self, use: Any) -> None:
        """Show ``use`` (a :class:`co2routes.sources.uses.UseDemand`) or that the demand is given."""
        if use is None:
            self.update(Text("No [use]: the demand is the scenario's own. Pick a use above to work it out.",
                             style="dim"))
            return
        from co2routes.sources.uses import record
        from co2routes.tui.output import format_value, label_of

        text = Text(f"{use.summary}\n", style="bold")
        for key, value in record(use).items():
            if key in ("use", "summary") or isinstance(value, (list, dict)) or value is None:
                continue
            label, _ = label_of(key)
            text.append(f"{label}: {format_value(key, value)}\n")
        for line in use.warnings:
            text.append(f"⚠ {line}\n", style="bold")
        for line in use.cautions:
            text.append(f"caution: {line}\n", style="italic")
        self.update(text)


def add_use_panel(form: Any, document: Mapping[str, Any]) -> None:
    """Mount the use fields and the balance under them into the scenario form."""
    form.add_fields(use_fields(), document)
    form.mount(UseBalance(id="use-balance"))


def show_use(screen: Any, scenario: Any) -> None:
    """After a computation: the balance panel, and the demand field's hint saying where it came from."""
    use = getattr(scenario, "use", None)
    screen.query_one(UseBalance).show(use)
    row = screen.query_one("#f-demand", Input)
    row.placeholder = "required" if use is None else f"{use.demand_kg_per_day:.4g} kg/day from the {use.kind} use"

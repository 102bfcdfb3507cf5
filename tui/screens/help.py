"""The keys screen: every key the interface answers to, read from the bindings themselves so the
list cannot fall out of step with the code, plus a few words on how the screen works."""

from __future__ import annotations

from typing import Iterable

from rich.table import Table
from rich.text import Text
from textual.app import ComposeResult
from textual.binding import Binding
from textual.containers import VerticalScroll
from textual.screen import ModalScreen
from textual.widgets import Static

#: Keys that come from Textual's own widgets, said in our words.
BUILT_IN = (
    ("tab / shift+tab", "next / previous field or pane"),
    ("up / down", "in the ranking: choose a route; in a dialog: move"),
    ("left / right", "in the detail tabs: previous / next tab"),
    ("enter", "in a dialog: OK"),
    ("escape", "in a dialog or this screen: close it"),
    ("y / n", "answer a question (no is the default)"),
    ("mouse", "click a column heading to sort by it; click a tab or a field"),
)

ABOUT = (
    "The first field has the focus at start: type, and the routes are ranked again as you type. "
    "Esc leaves a field for the routes; F2 goes back to the fields, F3 to the routes, F4 to the "
    "chosen route's tabs. The pane holding the focus has a double frame; the field has a bar on "
    "its left. A value that cannot be used is marked under its field with the reason, and the last "
    "good results stay on screen. Clearing a field uses the default shown greyed. Cautions for the "
    "chosen route stay at the bottom; follow local codes and licensed practice."
)


def key_name(keys: str) -> str:
    """A binding's keys as shown here (``ctrl+s`` -> ``^S``; ``question_mark`` -> ``?``).

    >>> key_name("f1,question_mark")
    'F1 / ?'
    >>> key_name("ctrl+s")
    '^S'
    """
    names = {"question_mark": "?", "plus": "+", "minus": "-", "equals_sign": "=", "escape": "esc"}
    out = []
    for key in keys.split(","):
        key = key.strip()
        if key.startswith("ctrl+") and len(key) == 6:
            out.append("^" + key[-1].upper())
        elif key.startswith("f") and key[1:].isdigit():
            out.append(key.upper())
        else:
            out.append(names.get(key, key))
    return " / ".join(out)


def binding_rows(bindings: Iterable[Binding | tuple]) -> list[tuple[str, str]]:
    """``(keys, what it does)`` for each binding with a description."""
    rows = []
    for b in bindings:
        b = b if isinstance(b, Binding) else Binding(*b)
        if b.description:
            rows.append((key_name(b.key), b.description))
    return rows


class KeysScreen(ModalScreen[None]):
    """Every key, by where it works."""

    CSS_PATH = "help.tcss"
    BINDINGS = [Binding("escape,q,f1,question_mark", "close", "close this screen")]

    def __init__(self, sections: list[tuple[str, list[tuple[str, str]]]]) -> None:
        super().__init__()
        self.sections = sections + [("From the widgets", list(BUILT_IN))]

    def compose(self) -> ComposeResult:
        with VerticalScroll(id="keys-box") as box:
            box.border_title = "Keys  (esc closes)"
            yield Static(Text(ABOUT), id="keys-about")
            for title, rows in self.sections:
                # a title line of its own, so a long title does not widen the key column
                yield Static(Text(title, style="reverse"), classes="keys-title")
                table = Table(box=None, show_header=False, pad_edge=False, expand=True)
                table.add_column("key", style="bold", no_wrap=True, width=16)
                table.add_column("what it does", ratio=1)
                for key, what in rows:
                    table.add_row(key, what)
                yield Static(table, classes="keys-table")

    def action_close(self) -> None:
        """Back to the planning screen."""
        self.dismiss(None)

"""Small modal questions: a file name, and a yes/no before anything is replaced."""

from __future__ import annotations

from textual import on
from textual.app import ComposeResult
from textual.binding import Binding
from textual.containers import Horizontal, Vertical
from textual.screen import ModalScreen
from textual.widgets import Button, Input, Label


class PathDialog(ModalScreen[str | None]):
    """Ask for a file path; dismisses with the path, or ``None`` when cancelled."""

    CSS_PATH = "dialogs.tcss"
    BINDINGS = [Binding("escape", "cancel", "cancel")]

    def __init__(self, title: str, initial: str = "", hint: str = "") -> None:
        super().__init__()
        self.title_text, self.initial, self.hint = title, initial, hint

    def compose(self) -> ComposeResult:
        with Vertical(classes="dialog"):
            yield Label(self.title_text, classes="dialog-title")
            yield Input(self.initial, id="path-input", placeholder="path/to/file")
            if self.hint:
                yield Label(self.hint, classes="dialog-hint")
            with Horizontal(classes="dialog-buttons"):
                yield Button("OK", id="ok", variant="primary")
                yield Button("Cancel", id="cancel")

    @on(Input.Submitted)
    @on(Button.Pressed, "#ok")
    def _ok(self) -> None:
        text = self.query_one("#path-input", Input).value.strip()
        self.dismiss(text or None)

    @on(Button.Pressed, "#cancel")
    def action_cancel(self) -> None:
        """Close without a path."""
        self.dismiss(None)


class ConfirmDialog(ModalScreen[bool]):
    """Ask a yes/no question; ``y`` / ``n`` answer it too. No is the safe default."""

    CSS_PATH = "dialogs.tcss"
    BINDINGS = [Binding("y", "answer(True)", "yes"), Binding("n,escape", "answer(False)", "no")]

    def __init__(self, question: str, yes: str = "Yes, replace") -> None:
        super().__init__()
        self.question, self.yes = question, yes

    def compose(self) -> ComposeResult:
        with Vertical(classes="dialog"):
            yield Label(self.question, classes="dialog-title")
            with Horizontal(classes="dialog-buttons"):
                yield Button(f"{self.yes} (y)", id="yes", variant="warning")
                yield Button("No (n)", id="no", variant="primary")

    def on_mount(self) -> None:
        self.query_one("#no", Button).focus()

    @on(Button.Pressed)
    def _pressed(self, event: Button.Pressed) -> None:
        self.dismiss(event.button.id == "yes")

    def action_answer(self, yes: bool) -> None:
        """Answer the question."""
        self.dismiss(yes)

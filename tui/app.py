"""The co2routes terminal interface: wires the planning screen, the keys screen and quitting.

``run_app(None)`` opens the invented demo scenario; ``run_app(path)`` opens a scenario file. A
file that cannot be read or is malformed opens the demo instead and says why on screen.
"""

from __future__ import annotations

from typing import Any, Sequence

from textual.app import App
from textual.binding import Binding

from co2routes.tui.screens.dialogs import ConfirmDialog
from co2routes.tui.screens.help import KeysScreen, binding_rows
from co2routes.tui.screens.main import MainScreen
from co2routes.tui.session import Opened, open_demo, open_file
from co2routes.tui.widgets.ranking import RankingTable


class Co2RoutesApp(App[int]):
    """The application: one planning screen."""

    TITLE = "co2routes"
    ENABLE_COMMAND_PALETTE = False
    BINDINGS = [Binding("ctrl+q", "leave", "quit (asks first when there are unsaved edits)", priority=True)]

    def __init__(self, path: str | None = None, routes: Sequence[Any] | None = None) -> None:
        super().__init__()
        self.path = path
        self.routes = routes
        self.open_error: str | None = None
        self.fault: tuple[BaseException, Any] | None = None

    def _handle_exception(self, error: Exception) -> None:
        """An error nobody caught: keep the scenario in a recovery file, then exit with status 1
        (:func:`run_app` says where the file is). Textual's own handler does the exiting."""
        from co2routes.tui.recovery import keep

        if self.fault is None:
            try:
                document = self.planner.document
            except Exception:  # noqa: BLE001 - no planning screen yet: nothing was edited
                document = None
            self.fault = (error, keep(document, error))
        super()._handle_exception(error)

    def _fatal_error(self) -> None:
        """Exit without printing a traceback on the user's terminal (it is in the recovery log)."""
        self.bell()
        self._close_messages_no_wait()

    def on_mount(self) -> None:
        opened: Opened
        if self.path is None:
            opened = open_demo()
        else:
            try:
                opened = open_file(self.path)
            except Exception as err:  # noqa: BLE001 - a bad file is a message, never a crash
                self.open_error = f"could not open {self.path}: {err}; showing the invented demo"
                opened = open_demo()
        self.push_screen(MainScreen(opened, self.routes, notice=self.open_error))
        if self.open_error:
            self.notify(self.open_error, title="not opened", severity="error", timeout=10)

    @property
    def planner(self) -> MainScreen:
        """The planning screen."""
        for screen in self.screen_stack:
            if isinstance(screen, MainScreen):
                return screen
        raise LookupError("the planning screen is not open")

    def action_keys(self) -> None:
        """Show every key."""
        if isinstance(self.screen, KeysScreen):
            return
        sections = [("Anywhere (digits and ? when not typing in a field)", binding_rows(self.BINDINGS) + binding_rows(MainScreen.BINDINGS)),
                    ("In the ranking", binding_rows(RankingTable.BINDINGS))]
        self.push_screen(KeysScreen(sections))

    def action_leave(self) -> None:
        """Quit; with unsaved edits, ask first."""
        try:
            dirty = self.planner.dirty
        except LookupError:
            dirty = False
        if not dirty:
            self.exit(0)
            return

        def answer(yes: bool | None) -> None:
            if yes:
                self.exit(0)

        self.push_screen(ConfirmDialog("The scenario has edits that are not saved. Quit anyway?",
                                       yes="Quit without saving"), answer)


def run_app(path: str | None = None) -> int:
    """Run the interface on ``path`` (or the demo); returns the exit status."""
    import sys

    from co2routes.tui.recovery import keep, report

    app = Co2RoutesApp(path)
    try:
        result = app.run()
    except Exception as err:  # noqa: BLE001 - escaped Textual itself: still keep the scenario
        try:
            document = app.planner.document
        except Exception:  # noqa: BLE001
            document = None
        app.fault = (err, keep(document, err))
    if app.fault is not None:
        print(report(app.fault[1], app.fault[0]), file=sys.stderr)
        return 1
    return int(result or 0)

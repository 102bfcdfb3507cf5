"""Opening, saving and exporting from the planning screen (a mixin of :class:`MainScreen`).

Nothing is replaced without a yes: saving over another file, over a file changed on disk since it
was opened, or exporting over an existing file each asks first. A failure (unreadable file, a
folder that cannot be written) is a message on the status line; the document on screen is kept.
"""

from __future__ import annotations

import io
from pathlib import Path
from types import SimpleNamespace
from typing import Any

from textual import work

from co2routes.sources.filewrite import AlreadyExists, updated_text, writable
from co2routes.thermo.errors import InputError
from co2routes.tui.screens.dialogs import ConfirmDialog, PathDialog
from co2routes.tui.session import ChangedOnDisk, Opened, export, export_format, open_file, save


def exists(path: str | Path) -> bool:
    """Whether ``path`` names an existing file; ``False`` when the name itself cannot be used
    (``~nosuchuser/...``, a name too long): the write that follows says why.

    >>> exists("~nosuchuser-x/a.toml"), exists("x" * 300)
    (False, False)
    """
    try:
        return Path(path).expanduser().exists()
    except (OSError, RuntimeError, ValueError):
        return False


def json_text(record: dict[str, Any]) -> str:
    """The JSON text the command line prints for ``record`` (``--json``), byte for byte."""
    from co2routes.tui.output import emit

    out = io.StringIO()
    emit(record, SimpleNamespace(json=True), out)
    return out.getvalue()


class Filing:
    """Open, save, save-as and export actions; the screen provides the document and messages."""

    def failed(self, what: str, err: Exception) -> None:
        """Say that a file action failed: briefly on the status line, in full in a notice."""
        self._fail(f"{what}: {err}")

    # -- open -----------------------------------------------------------------------------

    def action_open(self) -> None:
        """Ask for a scenario file and open it."""
        self._open_flow()

    @work(exclusive=True, group="files")
    async def _open_flow(self) -> None:
        if self.dirty and not await self.app.push_screen_wait(
                ConfirmDialog("The scenario has edits that are not saved. Open another and drop them?",
                              yes="Drop the edits")):
            return
        start = str(self.opened.path.parent) + "/" if self.opened.path else ""
        name = await self.app.push_screen_wait(PathDialog("Open a scenario file (.toml)", start))
        if name:
            self.open_path(name)

    def open_path(self, name: str | Path) -> bool:
        """Open the scenario at ``name`` in place of the current one; ``False`` if it failed."""
        try:
            opened = open_file(name)
        except InputError as err:
            self._fail(f"not opened: {err}")
            return False
        except Exception as err:  # noqa: BLE001 - whatever the file holds, the interface stays
            self._fail(f"not opened: {name}: {type(err).__name__}: {err}")
            return False
        self.replace_opened(opened)
        self._say(f"opened {opened.path}")
        return True

    def replace_opened(self, opened: Opened) -> None:
        """Show ``opened`` instead of the current scenario (edits are dropped)."""
        from co2routes.tui.widgets.form import ScenarioForm

        self.opened = opened
        self.document = dict(opened.document)
        self.dirty = False
        form = self.query_one(ScenarioForm)
        form.fill(self.document)
        self._title()
        self.start()

    # -- save -----------------------------------------------------------------------------

    def _refuse_if_marked(self) -> bool:
        from co2routes.tui.widgets.form import ScenarioForm

        marked = self.query_one(ScenarioForm).marked()
        if marked:
            key, reason = next(iter(marked.items()))
            self._say(f"not saved: {key} is refused ({reason}); fix it or clear it first", True)
            return True
        return False

    def action_save(self) -> None:
        """Save to the file the scenario came from (ask for a name when it has none)."""
        self._save_flow(False)

    def action_save_as(self) -> None:
        """Save under a new name."""
        self._save_flow(True)

    @work(exclusive=True, group="files")
    async def _save_flow(self, ask: bool) -> None:
        if self._refuse_if_marked():
            return
        path = self.opened.path
        expected = self.opened.stamp
        if ask or path is None:
            suggestion = str(path) if path else "my-scenario.toml"
            name = await self.app.push_screen_wait(PathDialog("Save the scenario as", suggestion,
                                                              "a .toml file; nothing is replaced without asking"))
            if not name:
                return
            path = Path(name)
            if not path.suffix and path.name:
                path = path.with_suffix(".toml")
            if path != self.opened.path:
                expected = None
        replace = False
        while True:
            try:
                stamp = save(path, self.document, expected=expected, replace=replace, base=self.opened.text)
                break
            except ChangedOnDisk:
                question = f"{path} was changed on disk since it was opened. Replace it with this scenario?"
            except AlreadyExists:
                question = f"{path} already exists. Replace it?"
            except InputError as err:
                self.failed("not saved", err)
                return
            except Exception as err:  # noqa: BLE001 - a failed save keeps the scenario on screen
                self._fail(f"not saved: {path}: {type(err).__name__}: {err}")
                return
            if not await self.app.push_screen_wait(ConfirmDialog(question)):
                self._say("not saved")
                return
            replace = True
        self.opened = Opened(dict(self.document), updated_text(self.opened.text, self.document), path, stamp,
                             str(path))
        self.dirty = False
        self._title()
        self._say(f"saved {path}")

    # -- export ---------------------------------------------------------------------------

    def ranking_text(self, fmt: str) -> str:
        """The ranking as the command line's ``compare --markdown/--csv/--json`` prints it."""
        from co2routes.sources.records import comparison_record
        from co2routes.tui.report import comparison_csv, comparison_markdown

        comparison = self.outcome.comparison
        if fmt == "markdown":
            return comparison_markdown(comparison)
        if fmt == "csv":
            return comparison_csv(comparison)
        from co2routes.sources.uses import demand_fields

        return json_text({**comparison_record(comparison), **demand_fields(self.outcome.scenario)})

    def recipe_text(self, fmt: str) -> str:
        """The chosen route's batch as ``batch --markdown/--csv/--json`` prints it."""
        from co2routes.sources.records import batch_record
        from co2routes.tui.report import recipe_csv, recipe_markdown

        row = self.selected_row()
        currency = self.outcome.comparison.currency
        if fmt == "markdown":
            return recipe_markdown(row.result, currency)
        if fmt == "json":
            return json_text(batch_record(row.result, currency))
        if fmt == "csv":
            return recipe_csv(row.result, currency)
        raise InputError("export", "a batch recipe exports as .md, .csv or .json")

    def action_export_ranking(self) -> None:
        """Export the ranking to a .md, .csv or .json file."""
        self._export_flow("ranking")

    def action_export_recipe(self) -> None:
        """Export the chosen route's batch to a .md, .csv or .json file."""
        self._export_flow("recipe")

    @work(exclusive=True, group="files")
    async def _export_flow(self, what: str) -> None:
        if self.outcome is None or (what == "recipe" and self.selected_row() is None):
            self._say("nothing to export yet: no good result", True)
            return
        stem = self.opened.path.stem if self.opened.path else "scenario"
        if what == "recipe":
            suggestion, title = f"{stem}-{self.selected_row().result.route_id}.md", "Export the batch recipe"
        else:
            suggestion, title = f"{stem}-ranking.md", "Export the ranking"
        name = await self.app.push_screen_wait(PathDialog(title, suggestion, "the ending picks the format: "
                                                          ".md, .csv or .json"))
        if not name:
            return
        try:
            fmt = export_format(name)
            text = self.recipe_text(fmt) if what == "recipe" else self.ranking_text(fmt)
        except Exception as err:  # noqa: BLE001 - a failed export is a message
            self._fail(f"not exported: {err}")
            return
        why = writable(name)
        if why is not None:
            self.failed("not exported", InputError(name, f"cannot be written: {why}"))
            return
        replace = False
        if exists(name):
            if not await self.app.push_screen_wait(ConfirmDialog(f"{name} already exists. Replace it?")):
                self._say("not exported")
                return
            replace = True
        try:
            export(name, text, replace=replace)
        except Exception as err:  # noqa: BLE001 - a failed export keeps the scenario on screen
            self.failed("not exported", err)
            return
        self._say(f"exported {what} to {name}")

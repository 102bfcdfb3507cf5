"""The planning screen: the scenario's inputs, the ranking of every route, the chosen route in
detail, and its cautions, all at once.

Every edit changes a copy of the scenario document and starts an exclusive thread worker that
validates it and ranks the routes (:func:`co2routes.tui.compute.outcome`); a refused value is marked under
its field and the last good results stay on screen. Charts are worked out by a second worker
after the ranking is shown. The first computation also runs in a worker, so the first frame is
drawn before pint, the route models, CoolProp or Cantera are imported.
"""

from __future__ import annotations

from typing import Any, Sequence

from rich.text import Text
from textual import on
from textual.app import ComposeResult
from textual.binding import Binding
from textual.containers import Horizontal, Vertical
from textual.screen import Screen
from textual.widgets import Input, ProgressBar, Static, TabbedContent

from co2routes.tui.editing import document_after, refusal_marks
from co2routes.tui.fields import BASE_FIELDS, Field
from co2routes.tui.output import clean_text
from co2routes.tui.screens.filing import Filing
from co2routes.tui.screens.whatif import SPREAD_KEY, SPREAD_SAMPLES, WhatIf
from co2routes.tui.screens.working import Working
from co2routes.tui.session import Opened, edited, value_at
from co2routes.tui.widgets.detail import TABS, CautionPanel, RouteDetail, set_aside
from co2routes.tui.widgets.fitting import shorten
from co2routes.tui.widgets.form import FieldEdited, FieldRow, ScenarioForm
from co2routes.tui.widgets.ranking import HIDE_KEY, RankingTable, RouteChosen, RouteToggled, WeightNudged
from co2routes.tui.widgets.use import add_use_panel, show_use, sync_use_fields


#: The keys a new user needs first, always on the bottom line (F1 lists every key).
KEY_HINT = "F1 keys  F2 inputs  F3 routes  F4 detail  Esc leave field  ^S save  ^Q quit"


class MainScreen(Filing, Working, WhatIf, Screen):
    """The one working screen."""

    CSS_PATH = "main.tcss"
    AUTO_FOCUS = "ScenarioForm Input"
    BINDINGS = [
        Binding("f2", "pane('form')", "go to the scenario's inputs (a narrow screen opens them)", priority=True),
        Binding("f3", "pane('ranking')", "go to the routes", priority=True),
        Binding("f4", "pane('detail')", "go to the chosen route's tabs", priority=True),
        Binding("escape", "leave_field", "leave the field you are typing in (to the routes)"),
        Binding("f1,question_mark", "app.keys", "keys and help"),
        Binding("ctrl+s", "save", "save the scenario"),
        Binding("ctrl+n", "save_as", "save the scenario under a new name"),
        Binding("ctrl+o", "open", "open a scenario file"),
        Binding("ctrl+t", "export_ranking", "export the ranking (.md .csv .json)"),
        Binding("ctrl+b", "export_recipe", "export the chosen route's batch (.md .csv .json)"),
        Binding("ctrl+g", "next_pane", "go to the next pane: inputs, ranking, detail"),
        Binding("ctrl+f", "fill", "detail fills the screen (cautions stay); again: back"),
        Binding(SPREAD_KEY, "draw_samples", f"draw {SPREAD_SAMPLES} samples of the uncertain inputs: every "
                "route's cost range and chance of being the cheapest (Cost range tab)"),
    ] + [Binding(str(i + 1), f"tab({i})", f"detail tab: {title}") for i, (_, title) in enumerate(TABS)]

    def __init__(self, opened: Opened, routes: Sequence[Any] | None = None,
                 notice: str | None = None) -> None:
        super().__init__()
        #: a message that stays in front of the status line until the first edit (a file that
        #: could not be opened at start-up)
        self.notice = notice
        self.opened = opened
        #: the document as edited now (it may hold a refused value)
        self.document: dict[str, Any] = dict(opened.document)
        #: the last good :class:`co2routes.tui.compute.Outcome`, ``None`` until one is worked out
        self.outcome: Any = None
        self.sweep: Any = None
        self.curve: Any = None
        #: route id -> breakthrough curve points of its dryer (``None``: no dryer)
        self.breakthrough: dict[str, Any] = {}
        self.routes = routes
        self.dirty = False
        #: the last failed action in full (the status line may shorten it)
        self.last_failure = ""
        self.generation = 0
        self.book: Any = None
        self._extras = False
        self._said: tuple[str, bool] = ("starting…", False)
        self._busy_timer: Any = None
        self.tornadoes = {}

    def compose(self) -> ComposeResult:
        yield Static(id="title-line")
        with Horizontal(id="body"):
            form = ScenarioForm(id="form")
            form.border_title = "Scenario"
            yield form
            with Vertical(id="results"):
                table = RankingTable(id="ranking")
                table.border_title = "Routes, best first"
                yield table
                yield Static(id="weights-line")
                yield RouteDetail(id="detail")
                cautions = CautionPanel(id="cautions")
                cautions.border_title = "Cautions"
                yield cautions
        with Horizontal(id="status-line"):
            yield Static("starting…", id="status")
            yield ProgressBar(total=None, show_eta=False, show_percentage=False, id="busy")
        yield Static(KEY_HINT, id="key-hint")

    def on_mount(self) -> None:
        form = self.query_one(ScenarioForm)
        form.add_fields(BASE_FIELDS, self.document)
        add_use_panel(form, self.document)
        self._title()
        self.query_one("#busy").display = False
        # the class action_pane("form") adds: set now, the first styling applies it (later, it
        # would restyle every widget once more before the first ranking)
        self.add_class("-editing", update=False)
        self.call_after_refresh(self.action_pane, "form")
        self.recompute(self.document, self.generation, None)

    def on_resize(self) -> None:
        self.set_class(self.size.width < 110, "-narrow")
        self.set_class(self.size.height < 32, "-short")
        self._title()
        self._say(*self._said)
        if self.outcome is not None:
            self._weights_line()

    def on_descendant_focus(self) -> None:
        # a narrow screen shows the form only while one of its fields has the focus
        focused = self.focused
        self.set_class(focused is not None and any(isinstance(a, ScenarioForm) for a in focused.ancestors),
                       "-editing")

    def action_fill(self) -> None:
        """Give the route detail the whole screen but the cautions, or give the room back."""
        self.toggle_class("-fill")
        if self.has_class("-fill"):
            self.query_one(RouteDetail).query_one("Tabs").focus()

    # -- computing ------------------------------------------------------------------------

    def start(self, edited_field: Field | None = None) -> None:
        """Recompute for the current document (the previous run's answer is dropped)."""
        self.generation += 1
        self.recompute(self.document, self.generation, edited_field)

    def _refused(self, generation: int, err: Any, edited_field: Field | None) -> None:
        if generation != self.generation:
            return
        self._idle()
        form = self.query_one(ScenarioForm)
        for field, reason in refusal_marks(form.fields, err, edited_field, self.document):
            if reason is None or form.row_of(field) is not None:
                form.mark(field, reason)
        kept = "kept the last good results" if self.outcome else "no results yet"
        self._say(f"{err} — {kept}", True)

    def _failed(self, generation: int, err: Exception) -> None:
        if generation != self.generation:
            return
        self._idle()
        self._say(f"could not work this out ({type(err).__name__}: {err}); kept the last good results", True)

    def _computed(self, generation: int, outcome: Any) -> None:
        if generation != self.generation:
            return
        self._idle()
        self.outcome = outcome
        self.breakthrough = {}
        self.query_one(ScenarioForm).clear_marks()
        show_use(self, outcome.scenario)
        comparison = outcome.comparison
        table = self.query_one(RankingTable)
        table.show(comparison.rows)
        table.border_title = (f"Routes, best first · per kg of {comparison.end_product.replace('-', ' ')} · "
                             f"prices in {comparison.currency}")
        self._weights_line()
        self._show_selected()
        self._title()
        left_out = [f"{n.label}: {n.reason}" for n in comparison.not_applicable] + list(comparison.failures)
        note = f"; {len(left_out)} route(s) not ranked: " + " | ".join(left_out) if left_out else ""
        ranked = f"{len(comparison.rows)} routes ranked in {outcome.seconds:.2f} s{note}{set_aside(comparison.rows)}"
        if self.notice:
            self._say(f"{self.notice} · {ranked}", True)
        else:
            self._say(ranked, bool(left_out))
        self.redraw_charts(outcome, generation)
        self.whatif_update()

    def _curves(self, generation: int, curves: dict[str, Any]) -> None:
        if generation != self.generation:
            return
        self.breakthrough = curves
        self._show_selected()

    def _charts(self, generation: int, sweep: Any, curve: Any) -> None:
        if generation != self.generation:
            return
        detail = self.query_one(RouteDetail)
        self.curve = curve
        detail.show_saturation(curve)
        if sweep is not None:
            self.sweep = sweep
            detail.show_curve(sweep, self.outcome.scenario.co2_kg if self.outcome else None)

    # -- showing --------------------------------------------------------------------------

    def selected_row(self) -> Any:
        """The comparison row under the ranking's cursor (``None`` before any result)."""
        if self.outcome is None:
            return None
        chosen = self.query_one(RankingTable).selected
        rows = self.outcome.comparison.rows
        return next((r for r in rows if r.result.route_id == chosen), rows[0] if rows else None)

    def _show_selected(self) -> None:
        row = self.selected_row()
        comparison = self.outcome.comparison
        curve = self.breakthrough.get(row.result.route_id) if row is not None else None
        self.query_one(RouteDetail).show(row, comparison.currency, comparison.end_product, curve,
                                         rows=comparison.rows)
        self.query_one(CautionPanel).show(row, comparison.rows)

    def _weights_line(self) -> None:
        weights = self.outcome.comparison.weights
        table = self.query_one(RankingTable)
        narrow = self.has_class("-narrow")
        line = Text("weights ", style="bold")
        for key, value in weights.items():
            style = "reverse" if key == table.sort_key else ""
            line.append(f"{key} {value:g}", style=style)
            line.append(" " if narrow else "  ")
        if not self.has_class("-narrow"):
            line.append(f"(sort: r c e t h w p z · weight: + - · hide/show: {HIDE_KEY})", style="dim")
        self.query_one("#weights-line", Static).update(line)

    def _title(self) -> None:
        name = clean_text(str(self.document.get("name", "unnamed scenario")))
        where = clean_text(str(self.opened.path)) if self.opened.path else "not yet saved to a file"
        mark = "  ● edited" if self.dirty else ""
        room = max(20, self.size.width - 2 - len("co2routes │   │ ") - len(mark))
        name = shorten(name, max(12, room - len(where)))
        self.query_one("#title-line", Static).update(
            Text.assemble(("co2routes ", "bold"), ("│ ", "dim"), name, ("  │ ", "dim"),
                          (shorten(where, room - len(name)), "italic"), (mark, "bold")))

    def _say(self, message: str, warn: bool = False) -> None:
        """Put ``message`` on the status line, shortened at a word to fit (it is said whole
        elsewhere: under the field, or in a notice)."""
        self._said = (message, warn)
        status = self.query_one("#status", Static)
        room = max(20, self.size.width - 2 - (20 if self.query_one("#busy").display else 0))
        status.update(Text(shorten(clean_text(message), room), style="bold" if warn else ""))
        status.set_class(warn, "-warn")

    def _fail(self, message: str) -> None:
        """A failed action: on the status line and, in full (wrapped), as a notification."""
        self.last_failure = message
        self._say(message, True)
        self.notify(clean_text(message), title="failed", severity="error", timeout=15, markup=False)

    # -- events ---------------------------------------------------------------------------

    @on(FieldEdited)
    def _edited(self, event: FieldEdited) -> None:
        f = event.field
        new = document_after(self.document, f, event.text, self.book)
        if new == self.document:
            return
        self.document = new
        sync_use_fields(self)
        self.dirty = True
        self.notice = None
        self._title()
        self.start(f)

    @on(RouteChosen)
    def _chosen(self, event: RouteChosen) -> None:
        if self.outcome is not None:
            self._show_selected()
            self.whatif_update()

    @on(TabbedContent.TabActivated, "#detail-tabs")
    def _tab_opened(self, event: TabbedContent.TabActivated) -> None:
        self.whatif_tab_opened(str(event.pane.id))

    @on(RouteToggled)
    def _toggled(self, event: RouteToggled) -> None:
        from co2routes.sources.choice import toggled

        row = next((r for r in self.outcome.comparison.rows if r.result.route_id == event.route_id), None)
        if row is None:
            return
        table = toggled(value_at(self.document, ("routes",)), event.route_id, row.hidden)
        self.document = edited(self.document, ("routes",), table)
        self.dirty = True
        self._title()
        self._say(f"{row.result.label} {'shown again' if row.hidden else 'hidden'} ({HIDE_KEY} again: "
                  f"{'hide' if row.hidden else 'show'}); kept in the scenario's [routes] table")
        self.start()

    @on(WeightNudged)
    def _nudged(self, event: WeightNudged) -> None:
        from co2routes.sources.limits import MAX_WEIGHT
        from co2routes.sources.scenario import DEFAULT_WEIGHTS

        keys = ("weights", event.criterion)
        now = value_at(self.document, keys)
        base = now if isinstance(now, (int, float)) else DEFAULT_WEIGHTS[event.criterion]
        value = min(MAX_WEIGHT, max(0.0, float(base) + event.delta))
        self.document = edited(self.document, keys, value)
        self.dirty = True
        form = self.query_one(ScenarioForm)
        for row in form.query(FieldRow):
            if row.field.keys == keys:
                box = row.query_one(Input)
                with box.prevent(Input.Changed):
                    box.value = row.field.to_text(value)
        self._title()
        self._say(f"weight of {event.criterion} now {value:g}")
        self.start()

    def action_tab(self, index: int) -> None:
        """Open detail tab ``index``."""
        self.query_one(RouteDetail).pick(index)

    def action_pane(self, which: str) -> None:
        """Move the focus to the form (its first field, or the one last left), the ranking or the
        detail tabs; a narrow screen opens the form first."""
        if which == "form":
            self.add_class("-editing")
            form = self.query_one(ScenarioForm)
            boxes = form.query(Input)
            last = getattr(self, "_last_field", None)
            target = last if last is not None and last in boxes else (boxes.first() if boxes else None)
            if target is not None:
                self.call_after_refresh(target.focus)
        elif which == "detail":
            self.query_one(RouteDetail).query_one("Tabs").focus()
        else:
            self.query_one(RankingTable).focus()

    def action_leave_field(self) -> None:
        """Leave the field being typed in for the ranking (Escape); elsewhere Escape does nothing."""
        focused = self.focused
        if isinstance(focused, Input) and any(isinstance(a, ScenarioForm) for a in focused.ancestors):
            self._last_field = focused
            self.query_one(RankingTable).focus()

    def action_next_pane(self) -> None:
        """Move the focus to the next pane: inputs, ranking, detail tabs."""
        panes = [(ScenarioForm, "form"), (RankingTable, "ranking"), (RouteDetail, "detail")]
        focused = self.focused
        current = next((i for i, (kind, _) in enumerate(panes) if focused is not None
                        and (isinstance(focused, kind) or any(isinstance(a, kind) for a in focused.ancestors))), -1)
        self.action_pane(panes[(current + 1) % len(panes)][1])

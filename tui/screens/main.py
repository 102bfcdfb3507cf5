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

from co2routes.tui.fields import BASE_FIELDS, Field, match_field, price_value
from co2routes.tui.screens.filing import Filing
from co2routes.tui.screens.whatif import SPREAD_KEY, SPREAD_SAMPLES, WhatIf
from co2routes.tui.screens.working import Working
from co2routes.tui.session import Opened, edited, value_at
from co2routes.tui.widgets.detail import TABS, CautionPanel, RouteDetail, set_aside
from co2routes.tui.widgets.form import FieldEdited, FieldRow, ScenarioForm
from co2routes.tui.widgets.ranking import HIDE_KEY, RankingTable, RouteChosen, RouteToggled, WeightNudged


class MainScreen(Filing, Working, WhatIf, Screen):
    """The one working screen."""

    CSS_PATH = "main.tcss"
    AUTO_FOCUS = "#ranking"
    BINDINGS = [
        Binding("f1,question_mark", "app.keys", "keys and help"),
        Binding("ctrl+s", "save", "save the scenario"),
        Binding("ctrl+n", "save_as", "save the scenario under a new name"),
        Binding("ctrl+o", "open", "open a scenario file"),
        Binding("ctrl+t", "export_ranking", "export the ranking (.md .csv .json)"),
        Binding("ctrl+b", "export_recipe", "export the chosen route's batch (.md .csv .json)"),
        Binding("ctrl+g", "next_pane", "go to the next pane: inputs, ranking, detail"),
        Binding("ctrl+f", "fill", "detail fills the screen (cautions stay); again: back"),
        Binding(SPREAD_KEY, "draw_samples", f"draw {SPREAD_SAMPLES} samples of the uncertain inputs: every "
                "route's spread of cost and chance of being the cheapest (Spread tab)"),
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
        self.generation = 0
        self.book: Any = None
        self._extras = False
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
            yield Static(f"F1 every key · {SPREAD_KEY} spread · ctrl+s save · ctrl+q quit", id="key-hint")

    def on_mount(self) -> None:
        form = self.query_one(ScenarioForm)
        form.add_fields(BASE_FIELDS, self.document)
        self._title()
        self.query_one("#busy").display = False
        self.recompute(self.document, self.generation, None)

    def on_resize(self) -> None:
        self.set_class(self.size.width < 110, "-narrow")
        self.set_class(self.size.height < 32, "-short")
        if self.outcome is not None:
            self._weights_line()

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
        field = match_field(form.fields, err.field) or edited_field
        reason = err.allowed + (f" (got {err.got})" if err.got is not None else "")
        if edited_field is not None and field is not edited_field:
            form.mark(edited_field, None)
        if field is not None and form.row_of(field) is not None:
            form.mark(field, reason if field is not edited_field or field.dotted in err.field
                      else f"{err.field}: {reason}")
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
        self.query_one(CautionPanel).show(row)

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
        name = str(self.document.get("name", "unnamed scenario"))
        where = str(self.opened.path) if self.opened.path else "invented demo, not yet saved"
        mark = "  ● edited" if self.dirty else ""
        self.query_one("#title-line", Static).update(
            Text.assemble(("co2routes ", "bold"), ("│ ", "dim"), name, ("  │ ", "dim"), (where, "italic"),
                          (mark, "bold")))

    def _say(self, message: str, warn: bool = False) -> None:
        status = self.query_one("#status", Static)
        status.update(Text(message, style="bold" if warn else ""))
        status.set_class(warn, "-warn")

    # -- events ---------------------------------------------------------------------------

    @on(FieldEdited)
    def _edited(self, event: FieldEdited) -> None:
        f = event.field
        value = price_value(self.book, f.keys[-1], event.text) if f.keys[0] == "prices" \
            else f.to_document(event.text)
        new = edited(self.document, f.keys, value)
        if new == self.document:
            return
        self.document = new
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
        from co2routes.sources.scenario import DEFAULT_WEIGHTS

        keys = ("weights", event.criterion)
        now = value_at(self.document, keys)
        base = now if isinstance(now, (int, float)) else DEFAULT_WEIGHTS[event.criterion]
        value = max(0.0, float(base) + event.delta)
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

    def action_next_pane(self) -> None:
        """Move the focus to the next pane: inputs, ranking, detail tabs."""
        panes = [self.query_one(ScenarioForm), self.query_one(RankingTable), self.query_one(RouteDetail)]
        focused = self.focused
        current = next((i for i, p in enumerate(panes) if focused is not None
                        and (focused is p or p in focused.ancestors)), -1)
        target = panes[(current + 1) % len(panes)]
        if isinstance(target, ScenarioForm):
            boxes = target.query(Input)
            if boxes:
                boxes.first().focus()
        elif isinstance(target, RouteDetail):
            target.query_one("Tabs").focus()
        else:
            target.focus()

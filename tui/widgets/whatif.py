"""The two what-if tabs of the route detail: the chosen route's tornado (one input swung at a time)
and the spread of every route's cost per kg from a Monte Carlo run, with the chosen route's
histogram. They only show results worked out by the screen's workers (:mod:`co2routes.tui.screens.whatif`).
"""

from __future__ import annotations

from typing import Any, Mapping

from rich.console import Group
from rich.table import Table
from rich.text import Text
from textual.app import ComposeResult
from textual.containers import VerticalScroll
from textual.widgets import ProgressBar, Static

from co2routes.tui.widgets import css_of
from co2routes.tui.widgets.spread import Spread
from co2routes.tui.widgets.tornado import Tornado, short_name


def span(low: float, high: float, unit: str, typed: str | None = None) -> str:
    """An input's range in the unit it was typed in (``typed``), else in the units of the command
    line's ``sensitivity`` table (%, degC ...), the unit said once.

    >>> span(4.5, 7.5, "per kg"), span(0.85, 0.95, "1"), span(284.15, 294.15, "K")
    ('4.5 .. 7.5 per kg', '85 .. 95 %', '11 .. 21 degC')
    """
    from co2routes.tui.typed import as_typed

    a, b = as_typed(low, unit, typed), as_typed(high, unit, typed)
    (a_num, _, a_unit), (b_num, _, b_unit) = a.partition(" "), b.partition(" ")
    try:
        a_num, b_num = f"{float(a_num):.3g}", f"{float(b_num):.3g}"
    except ValueError:
        return f"{a} .. {b}"
    return f"{a_num} .. {b_num} {a_unit}".rstrip() if a_unit == b_unit else f"{a} .. {b}"


def swing_table(route: Any, currency: str, units: Mapping[str, str] | None = None) -> Table:
    """Each input of a :class:`co2routes.sources.sensitivity.RouteSensitivity`, widest swing first: its range
    and the cost per kg at each end."""
    table = Table("input", "from .. to", f"{currency}/kg", box=None, pad_edge=False, show_edge=False,
                  header_style="bold")
    for s in route.inputs:
        low = "?" if s.cost_per_kg_low is None else f"{s.cost_per_kg_low:.2f}"
        high = "?" if s.cost_per_kg_high is None else f"{s.cost_per_kg_high:.2f}"
        table.add_row(short_name(s.name), span(s.low, s.high, s.unit, (units or {}).get(s.name)),
                      f"{low} .. {high}")
    return table


class TornadoPanel(VerticalScroll):
    """The "What if" tab: a line saying what is shown, the tornado, and under it the swings' figures."""

    DEFAULT_CSS = css_of(__file__)

    def compose(self) -> ComposeResult:
        yield Static(Text("open this tab to swing each input of the chosen route", style="dim"), id="tornado-note")
        yield Tornado(id="tornado")
        yield Static(id="swings")

    def waiting(self, label: str) -> None:
        """Say that the chosen route's swings are being worked out."""
        self.query_one("#tornado-note", Static).update(Text(f"swinging each input of {label}…", style="dim"))

    def failed(self, why: str) -> None:
        """Show why there is no tornado (a refused [uncertain] entry, a broken route)."""
        self.query_one("#tornado-note", Static).update(Text(why, style="bold yellow"))
        self.query_one("#swings", Static).update("")
        self.query_one(Tornado).empty("no sensitivity to draw")

    def show(self, route: Any, currency: str, ranges: str, units: Mapping[str, str] | None = None) -> None:
        """Show a :class:`co2routes.sources.sensitivity.RouteSensitivity`; ``ranges`` says where they came from."""
        low, high = Tornado.LOW, Tornado.HIGH
        note = Text.assemble("one input at a time: ", (low, f"bold {low}"), " at its low end, ",
                             (high, f"bold {high}"), " at its high end; figures below")
        self.query_one("#tornado-note", Static).update(note)
        parts: list[Any] = [swing_table(route, currency, units)] if route.inputs else \
            [Text("no input moves this route's cost", style="dim")]
        parts += [Text(ranges, style="dim")] + [Text(f"! {w}", style="yellow") for w in route.warnings]
        self.query_one("#swings", Static).update(Group(*parts))
        self.query_one(Tornado).draw(route, currency)


class SpreadPanel(VerticalScroll):
    """The "Cost range" tab: the Monte Carlo progress bar, the chosen route's percentiles and chance of
    being cheapest, the box chart of every route and under it the chosen route's histogram."""

    DEFAULT_CSS = css_of(__file__, "whatif-spread.tcss")

    def compose(self) -> ComposeResult:
        yield ProgressBar(total=None, show_eta=False, id="spread-bar")
        yield Static(id="spread-note")
        yield Spread(id="spread-boxes")
        yield Spread(id="spread-hist")

    def on_mount(self) -> None:
        self.query_one("#spread-bar").display = False

    def hint(self, key: str, samples: int) -> None:
        """Before any run: say which key draws the samples."""
        self.query_one("#spread-note", Static).update(Text(
            f"press {key} (outside a field) to draw {samples} samples of the uncertain inputs and see how "
            "likely each route is to be the cheapest", style="dim"))

    def running(self, samples: int, seed: int) -> None:
        """A run has started: show the bar from zero."""
        bar = self.query_one("#spread-bar", ProgressBar)
        bar.display = True
        bar.update(total=None, progress=0)
        self.query_one("#spread-note", Static).update(Text(f"drawing {samples} samples (seed {seed})…"))

    def failed(self, why: str) -> None:
        """The run was refused or broke: say why, keep nothing half-drawn."""
        self.query_one("#spread-bar").display = False
        self.query_one("#spread-note", Static).update(Text(why, style="bold yellow"))

    def show(self, result: Any, route_id: str | None, stale: bool, key: str) -> None:
        """Show a :class:`co2routes.sources.uncertainty.Uncertainty`, with ``route_id``'s line and histogram;
        ``stale``: the inputs were edited after the run."""
        route = next((r for r in result.routes if r.route_id == route_id), None)
        cur = result.currency
        line = Text()
        if route is None or route.cost_per_kg_p50 is None:
            line.append(f"{route_id}: cost unknown (a price is missing)" if route_id else "no route chosen",
                        style="yellow")
        else:
            line.append(route.label, style="bold")
            line.append(f": P10 {route.cost_per_kg_p10:.2f} · P50 {route.cost_per_kg_p50:.2f} · "
                        f"P90 {route.cost_per_kg_p90:.2f} {cur}/kg · ")
            if route.probability_cheapest is None:
                line.append("not counted for the cheapest (demand not met)", style="bold yellow")
            else:
                line.append("cheapest in ")
                line.append(f"{route.probability_cheapest:.1%}", style="bold")
        line.append(f"\n{result.samples} samples, seed {result.seed}; every route's box, then this route's "
                    "histogram", style="dim")
        if stale:
            line.append(f" · drawn before the last edit: {key} draws again", style="bold yellow")
        for w in result.warnings:
            line.append(f"\n! {w}", style="yellow")
        self.query_one("#spread-note", Static).update(line)
        self.query_one("#spread-boxes", Spread).draw(result)
        self.query_one("#spread-hist", Spread).draw(result, route_id)

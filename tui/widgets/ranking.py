"""The ranking: every route in one table, sortable by each criterion, and the weights line.

The table shows the numbers of :class:`co2routes.sources.pipeline.Comparison` rows as they are; sorting only
changes the order shown, never the rank (which comes from the weighted score). Moving the cursor
selects a route (:class:`RouteChosen`); ``+`` / ``-`` change the weight of the criterion the
table is sorted by (:class:`WeightNudged`); :data:`HIDE_KEY` hides or shows the selected route
(:class:`RouteToggled`): a hidden route stays listed, unranked. Per-kg columns are per kg of the end
product, the basis of the score.
"""

from __future__ import annotations

from dataclasses import dataclass
from typing import Any, Callable

from rich.text import Text
from textual import on
from textual.binding import Binding
from textual.message import Message
from textual.widgets import DataTable

from co2routes.tui.widgets import css_of
from co2routes.tui.widgets.fitting import fit_columns, shorten


@dataclass
class RouteChosen(Message):
    """The cursor is on route ``route_id``."""

    route_id: str


@dataclass
class WeightNudged(Message):
    """The user asked to raise (``delta`` > 0) or lower the weight of ``criterion``."""

    criterion: str
    delta: float


@dataclass
class RouteToggled(Message):
    """The user asked to hide route ``route_id`` if shown, or show it if hidden."""

    route_id: str


#: The key that hides or shows the route under the cursor.
HIDE_KEY = "v"


def _heat_per_kg(row: Any) -> float:
    """kJ per kg of end product, as the command line's heat column."""
    return row.result.heat_kj / row.result.per_kg_basis


def _water_per_kg(row: Any) -> float:
    """g of water per kg of end product, the score's basis."""
    from co2routes.sources.value import raw_figures

    return raw_figures(row.result)["water"]


def _place(row: Any) -> str:
    """The rank, ``–`` for a hidden route, with ``!`` after it when a limit is broken."""
    if row.rank is None:
        return "–"
    return f"{row.rank}!" if row.breaks else str(row.rank)


@dataclass(frozen=True)
class Column:
    """A column: key, heading, value read off a row, format, and the sort order that puts the
    best first (``True``: larger is better). ``criterion`` is the weight it stands for."""

    key: str
    heading: str
    read: Callable[[Any], Any]
    fmt: str
    larger_better: bool = False
    criterion: str | None = None
    sort_by: Callable[[Any], Any] | None = None


COLUMNS: tuple[Column, ...] = (
    Column("rank", "#", _place, "{}", sort_by=lambda r: r.rank if r.rank is not None else 10**6),
    Column("route", "route", lambda r: r.result.label, "{}"),
    Column("cost", "cost/kg", lambda r: r.cost_per_kg, "{:.2f}", criterion="cost"),
    Column("energy", "kWh/kg", lambda r: r.result.energy_kwh_per_kg, "{:.2f}", criterion="energy"),
    Column("time", "hours", lambda r: r.result.time_h, "{:.1f}", criterion="time"),
    Column("heat", "heat kJ/kg", _heat_per_kg, "{:+.0f}", criterion="heat",
           sort_by=lambda r: abs(_heat_per_kg(r))),
    Column("water", "H2O g/kg", _water_per_kg, "{:.1f}", criterion="water"),
    Column("purity", "CO2 %", lambda r: r.result.raw_gas.co2_mole_fraction, "{:.1%}", True,
           criterion="purity"),
    Column("hazard", "hazard", lambda r: r.result.hazard, "{:d}", criterion="hazard"),
    Column("score", "score", lambda r: r.score, "{:.3f}", True),
)
COLUMN_BY_KEY = {c.key: c for c in COLUMNS}


def cell_text(column: Column, row: Any) -> str:
    """The text of one cell (``unknown`` when the value is).

    >>> cell_text(COLUMN_BY_KEY["rank"], type("R", (), {"rank": 2, "breaks": ()})())
    '2'
    """
    value = column.read(row)
    if value is None:
        return "unknown"
    try:
        return column.fmt.format(value)
    except (TypeError, ValueError):
        return str(value)


class RankingTable(DataTable):
    """The routes, one per line, best rank first until the user sorts by a column."""

    DEFAULT_CSS = css_of(__file__)
    BINDINGS = [
        Binding("r", "sort('rank')", "order by rank"),
        Binding("c", "sort('cost')", "sort by cost per kg"),
        Binding("e", "sort('energy')", "sort by energy per kg"),
        Binding("t", "sort('time')", "sort by time"),
        Binding("h", "sort('heat')", "sort by heat per kg"),
        Binding("w", "sort('water')", "sort by water load"),
        Binding("p", "sort('purity')", "sort by CO2 purity"),
        Binding("z", "sort('hazard')", "sort by hazard"),
        Binding("plus,equals_sign", "nudge(0.5)", "weigh the sorted criterion more"),
        Binding("minus", "nudge(-0.5)", "weigh the sorted criterion less"),
        Binding(HIDE_KEY, "toggle_route", "hide the selected route, or show it again (it stays listed)"),
    ]

    def __init__(self, **kwargs: Any) -> None:
        super().__init__(cursor_type="row", zebra_stripes=True, **kwargs)
        self.rows_shown: list[Any] = []
        self.sort_key = "rank"
        self.descending = False
        self.selected: str | None = None

    @property
    def shown_keys(self) -> tuple[str, ...]:
        """The keys of the columns on screen, in order (the narrowest screens drop some)."""
        return getattr(self, "_layout_now", ((),))[0]

    def on_resize(self) -> None:
        if getattr(self, "_all", None) is not None:
            self.show(self._all)

    def _layout(self, ordered: list[Any]) -> tuple[list[Column], int]:
        """The columns that fit the table's width now and the route column's width: the least
        important go first when narrow, the route names get their whole length when wide
        (:func:`co2routes.tui.widgets.fitting.fit_columns`)."""
        texts = {c.key: [cell_text(c, r) for r in ordered] for c in COLUMNS}
        widths = {c.key: max([len(c.heading) + 2 * (c.key == self.sort_key)] + [len(t) for t in texts[c.key]])
                  for c in COLUMNS}
        room = self.size.width - 1 or self.app.size.width  # 1: the scrollbar's column
        keys, route = fit_columns(widths, room, keep=(self.sort_key,),
                                  route_need=max((len(t) for t in texts["route"]), default=0))
        return [COLUMN_BY_KEY[k] for k in keys], route

    def show(self, rows: tuple[Any, ...]) -> None:
        """Show ``rows`` (a comparison's rows) in the current sort order, keeping the selection."""
        self._all = tuple(rows)
        column = COLUMN_BY_KEY[self.sort_key]
        reverse = self.descending != column.larger_better
        key = column.sort_by or column.read

        def order(row: Any) -> tuple[int, Any]:
            value = key(row)
            return (1, 0) if value is None else (0, -value if reverse and isinstance(value, (int, float)) else value)

        ordered = sorted(rows, key=order)
        if reverse and column.key == "route":
            ordered.reverse()
        self.rows_shown = ordered
        shown, route_width = self._layout(ordered)
        layout = (tuple(c.key for c in shown), route_width, self.sort_key, self.descending)
        self.clear(columns=layout != getattr(self, "_layout_now", None))  # columns only when they change
        if layout != getattr(self, "_layout_now", None):
            self._layout_now = layout
            for c in shown:
                self.add_column(self._heading(c), key=c.key, width=route_width if c.key == "route" else None)
        for row in ordered:
            cells = []
            for c in shown:
                text = cell_text(c, row)
                style = "bold" if row.rank == 1 else "dim" if row.rank is None or row.breaks else ""
                if c.key == "route":
                    text = shorten(text, route_width)
                cells.append(Text(text, style=style, justify="left" if c.key == "route" else "right"))
            self.add_row(*cells, key=row.result.route_id)
        if ordered:
            ids = [r.result.route_id for r in ordered]
            index = ids.index(self.selected) if self.selected in ids else 0
            self.move_cursor(row=index, animate=False)
            self.selected = ids[index]

    def _heading(self, c: Column) -> Text:
        mark = (" ▼" if self.descending else " ▲") if c.key == self.sort_key else ""
        return Text(c.heading + mark)

    def action_sort(self, key: str) -> None:
        """Sort by column ``key``; the same key again turns the order round."""
        self.descending = not self.descending if key == self.sort_key else False
        self.sort_key = key
        self.show(getattr(self, "_all", ()))

    def action_nudge(self, delta: float) -> None:
        """Raise or lower the weight of the criterion the table is sorted by."""
        criterion = COLUMN_BY_KEY[self.sort_key].criterion
        if criterion is None:
            self.notify("Sort by a criterion column first (c e t h w p z), then + or -.",
                        severity="warning", timeout=4)
            return
        self.post_message(WeightNudged(criterion, delta))

    def action_toggle_route(self) -> None:
        """Hide the selected route, or show it again."""
        if self.selected is not None:
            self.post_message(RouteToggled(self.selected))

    @on(DataTable.RowHighlighted)
    def _highlighted(self, event: DataTable.RowHighlighted) -> None:
        if event.row_key is not None and event.row_key.value is not None:
            self.selected = str(event.row_key.value)
            self.post_message(RouteChosen(self.selected))

    @on(DataTable.HeaderSelected)
    def _header(self, event: DataTable.HeaderSelected) -> None:
        event.stop()
        self.action_sort(str(event.column_key.value))

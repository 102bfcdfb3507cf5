"""The selected route in full: the batch as bought, heat, raw gas and dryer, delivery, costs,
the cost-against-batch chart for every route, and the what-if tabs (:mod:`co2routes.tui.widgets.whatif`).
The cautions sit in their own panel beside it (:class:`CautionPanel`) so they stay on screen
whichever tab is open.

Dryer and delivery results are shown when the route's result carries them (``result.dryer``,
``result.delivery``); their numeric fields are laid out by the unit in their names.
"""

from __future__ import annotations

import dataclasses
from typing import Any

from rich.console import Group
from rich.table import Table
from rich.text import Text
from textual.app import ComposeResult
from textual.containers import Horizontal, Vertical, VerticalScroll
from textual.widgets import Static, TabbedContent, TabPane

from co2routes.sources.records import heat_words, whys
from co2routes.thermo.cautions import LOCAL_CODES
from co2routes.tui.output import format_value, label_of
from co2routes.tui.widgets import css_of
from co2routes.tui.widgets.charts import Bars, BreakthroughPlot, CostCurve, Keyed, SaturationPlot
from co2routes.tui.widgets.plant_lines import cost_lines as plant_cost_lines, schedule_lines
from co2routes.tui.widgets.whatif import SpreadPanel, TornadoPanel

#: The tabs, in order: (id, title). Digits 1-7 pick them.
TABS = (("t-batch", "Batch"), ("t-gas", "Gas & dryer"), ("t-delivery", "Delivery"),
        ("t-costs", "Costs"), ("t-curve", "Cost by size"), ("t-whatif", "What if"), ("t-spread", "Cost range"))


#: What a route gives, by its ``delivers`` value, in words.
HANDS_OVER = {"raw-gas": "wet raw gas at about 1 atm, to be dried", "gas": "dry gas, bought",
              "liquid": "liquid CO2 in a cylinder, bought", "dry-ice": "dry ice, bought"}


def _table(*headings: str) -> Table:
    table = Table(*headings, box=None, pad_edge=False, show_edge=False, header_style="bold")
    return table


def _n(value: float | None, fmt: str = "{:.3f}") -> str:
    return "unknown" if value is None else fmt.format(value)


#: Field-name endings of result dataclasses that the command line's table does not convert,
#: with the label unit and the factor from SI: (ending, unit, factor).
FIELD_UNITS = (("_j_per_kg", "kJ/kg", 1e-3), ("_kg_s", "kg/h", 3600.0), ("_j", "kJ", 1e-3),
               ("_s", "h", 1 / 3600.0))


def fact(name: str, value: Any) -> tuple[str, str]:
    """``(label, value with unit)`` of one result field, the unit read from its name.

    >>> fact("work_j_per_kg", 329106.0), fact("mass_flow_kg_s", 0.0015), fact("batch_time_s", None)
    (('work', '329.1 kJ/kg'), ('mass flow', '5.4 kg/h'), ('batch time', 'unknown'))
    >>> fact("condensing_pressure_pa", 3.485e6)[0]
    'condensing pressure'
    """
    for ending, unit, factor in FIELD_UNITS:
        if name.endswith(ending) and not isinstance(value, (bool, str)):
            label = name[: -len(ending)].replace("_", " ")
            return label, "unknown" if value is None else f"{value * factor:.4g} {unit}"
    return label_of(name)[0], format_value(name, value)


def facts(obj: Any, skip: tuple[str, ...] = ()) -> Table:
    """The numeric and text fields of a result dataclass as ``label  value`` lines, units taken
    from the field names (``_kg``, ``_pa``, ``_k`` ..., and :data:`FIELD_UNITS`)."""
    table = _table("", "")
    table.show_header = False
    if obj is None or not dataclasses.is_dataclass(obj):
        return table
    for f in dataclasses.fields(obj):
        value = getattr(obj, f.name)
        if f.name in skip or f.name in ("warnings", "cautions") or isinstance(value, (tuple, list, dict)):
            continue
        if dataclasses.is_dataclass(value):
            continue
        label, shown = fact(f.name, value)
        table.add_row(Text(label, style="dim"), shown)
    return table


#: The dryer figures a user reads first: (attribute, label, how to show its value).
DRYER_LINES: tuple[tuple[str, str, Any], ...] = (
    ("desiccant", "desiccant", str),
    ("bed_mass_kg", "bed mass", lambda v: f"{v:.3f} kg"),
    ("bed_volume_m3", "bed volume", lambda v: f"{v * 1000:.2f} L"),
    ("bed_diameter_m", "bed diameter", lambda v: f"{v * 1000:.0f} mm"),
    ("bed_length_m", "bed length", lambda v: f"{v * 1000:.0f} mm"),
    ("inlet_water_ppmv", "water in", lambda v: f"{v:.0f} ppmv"),
    ("inlet_dew_point_k", "inlet dew point", lambda v: format_value("t_k", v)),
    ("outlet_ppmv", "water out", lambda v: f"{v:.1f} ppmv"),
    ("outlet_dew_point_k", "outlet dew point", lambda v: format_value("t_k", v)),
    ("target_dew_point_k", "target dew point", lambda v: format_value("t_k", v)),
    ("reaches_target", "reaches the target", lambda v: "yes" if v else "NO"),
    ("breakthrough_s", "breakthrough after", lambda v: f"{v / 3600:.1f} h on stream"),
    ("water_load_kg_per_cycle", "water taken per cycle", lambda v: f"{v:.3f} kg"),
    ("pressure_drop_pa", "pressure drop", lambda v: f"{v:.0f} Pa"),
    ("superficial_velocity_m_s", "gas speed", lambda v: f"{v:.3f} m/s"),
    ("regeneration_heat_j", "regeneration heat", lambda v: f"{v / 3.6e6:.3f} kWh per cycle"),
    ("suggested_desiccant", "better desiccant", str),
)


def dryer_table(dryer: Any) -> Table:
    """The dryer bed in the words of :data:`DRYER_LINES` (fields it lacks are left out)."""
    table = _table("", "")
    table.show_header = False
    for attr, label, show in DRYER_LINES:
        value = getattr(dryer, attr, None)
        if value is not None:
            table.add_row(Text(label, style="dim"), show(value))
    return table


def place_lines(row: Any, rows: Any = ()) -> list[Text]:
    """Where the route stands and why: place and score, the share each criterion adds, the
    criteria that set it against its neighbour above (:func:`co2routes.sources.rank.why_place`),
    and whether another route beats it on every criterion."""
    place = ("hidden (listed, not ranked)" if row.rank is None else f"rank {row.rank} of {len(rows) or 1}"
             + (" — over a limit: " + "; ".join(row.breaks) if row.breaks else ""))
    standing = ("not ranked, so not compared" if row.status != "ranked" else "non-dominated: no route is as good "
                "everywhere and better somewhere" if row.dominated_by is None else f"dominated by {row.dominated_by}: "
                "no worse on any criterion")
    parts = " + ".join(f"{k} {v:.3f}" for k, v in row.score_parts.items() if v > 0) or "nothing"
    lines = [Text.assemble((f"{place} · score {row.score:.3f}", "bold"), " (0 worst .. 1 best)"),
             Text(f"score parts: {parts}"), Text(f"standing: {standing}")]
    ids = [r.result.route_id for r in rows]
    if row.result.route_id in ids:
        why = whys(tuple(rows))[ids.index(row.result.route_id)]
        if row.hidden:
            why += " ([routes] in the scenario); the hide/show key brings it back"
        lines.insert(2, Text.assemble(("why this place: ", "bold"), why))
    return lines


def set_aside(rows: Any) -> str:
    """The routes hidden or over a limit, counted for the status line (empty when none).

    >>> from types import SimpleNamespace as S
    >>> set_aside([S(status="hidden"), S(status="over limit"), S(status="ranked")])
    '; 1 hidden, 1 over a limit (listed last)'
    """
    hidden = sum(r.status == "hidden" for r in rows)
    over = sum(r.status == "over limit" for r in rows)
    return f"; {hidden} hidden, {over} over a limit (listed last)" if hidden or over else ""


def recipe(row: Any, currency: str, rows: Any = ()) -> Group:
    """The Batch tab: where the route stands and why, what to buy and weigh, what is left, heat,
    time and energy."""
    r = row.result
    buy = _table("buy and weigh", "formula", "kg", "L", "pure kg", currency)
    costs = {line.item: line.cost for line in r.costs}
    for g in r.reagents:
        buy.add_row(g.name, g.formula, _n(g.mass_kg), "–" if g.volume_l is None else f"{g.volume_l:.2f}",
                    _n(g.pure_mass_kg),
                    _n(costs.get(g.name), "{:.2f}"))
    got = "made" if r.delivers == "raw-gas" else "bought"
    parts: list[Any] = [Text(f"{r.label}: {r.co2_kg:.3f} kg CO2 delivered, {r.co2_generated_kg:.3f} kg {got}",
                             style="bold"), *place_lines(row, rows), Text(""), buy]
    if r.byproducts:
        left = _table("left over", "formula", "kg", "note")
        for b in r.byproducts:
            left.add_row(b.name, b.formula, _n(b.mass_kg), b.note)
        parts += [Text(""), left]
    dt = r.temperature_change_k
    heat = Text.assemble(("heat ", "bold"), f"{r.heat_kj:+.1f} kJ: {heat_words(r.heat_kj, r.temperature_change_k is not None)}")
    if dt is not None:
        heat.append(f"; the liquor {'warms' if dt > 0 else 'cools'} by {abs(dt):.1f} K")
    parts += [Text(""), heat,
              Text(f"time {r.time_h:.1f} h   energy {r.energy.electricity_kwh:.3f} kWh electric, "
                   f"{r.energy.fuel_kwh:.3f} kWh fuel, {r.energy.heat_kwh:.3f} kWh heat")]
    parts += schedule_lines(r)
    parts += [Text(f"note: {n}", style="italic") for n in r.notes]
    return Group(*parts)


def gas(row: Any) -> Group:
    """The Gas & dryer tab's text: raw gas composition and the dryer bed."""
    r = row.result
    mix = _table("raw gas", "mol %")
    for name, x in sorted(r.raw_gas.mole_fractions.items(), key=lambda kv: -kv[1]):
        mix.add_row(name, f"{x * 100:.2f}")
    parts: list[Any] = [mix, Text(f"at {format_value('t_k', r.raw_gas.temperature_k)}, "
                                  f"{format_value('p_pa', r.raw_gas.pressure_pa)}"),
                        Text(f"water carried {r.water_g_per_kg_co2:.1f} g per kg CO2"), Text("")]
    dryer = getattr(r, "dryer", None)
    if dryer is None:
        parts.append(Text("dryer bed: none for this route (bought dry, or already dry enough)", style="dim"))
    else:
        parts += [Text("dryer bed", style="bold"), dryer_table(dryer)]
        parts += [Text(f"! {w}", style="yellow") for w in getattr(dryer, "warnings", ())]
    return Group(*parts)


def delivery(row: Any, end_product: str) -> Group:
    """The Delivery tab's text: compression, storage and dry ice when the scenario asks."""
    r = row.result
    parts: list[Any] = [Text(f"end product {end_product}; this route gives "
                             f"{HANDS_OVER.get(r.delivers, r.delivers)}", style="bold")]
    result = getattr(r, "delivery", None)
    if result is None:
        need = "none needed: gas at about 1 atm" if end_product == "gas" else "no delivery result"
        parts.append(Text(f"compression, storage, dry ice: {need}", style="dim"))
        return Group(*parts)
    # a step the product does not go through is left out, not shown as "unknown"
    parts.append(facts(result, skip=tuple(f for f in ("liquefaction", "flash", "cannot_condense")
                                          if getattr(result, f, 1) is None)))
    for f in dataclasses.fields(result) if dataclasses.is_dataclass(result) else ():
        value = getattr(result, f.name)
        if dataclasses.is_dataclass(value):
            parts += [Text(label_of(f.name)[0], style="bold"), facts(value)]
    parts += [Text(f"! {w}", style="yellow") for w in getattr(result, "warnings", ())]
    return Group(*parts)


def breakdown(row: Any, currency: str) -> Group:
    """The Costs tab's text: each line of the cost roll-up and the total per kg."""
    r = row.result
    table = _table("item", "amount", "unit", f"{currency}/unit", currency)
    for line in r.costs:
        item = line.item + (" (route's default price)" if line.price_from == "route default" else "")
        table.add_row(item, _n(line.amount), line.unit, _n(line.unit_price, "{:.4g}"),
                      _n(line.cost, "{:.2f}"))
    total = r.total_cost
    product = "CO2 gas" if r.delivery is None else r.delivery.end_product.replace("-", " ")
    parts: list[Any] = [table, Text(f"batch {_n(total, '{:.2f}')} {currency}, "
                                    f"{_n(r.cost_per_kg, '{:.2f}')} {currency} per kg of {product}", style="bold")]
    if total is None:
        keys = ", ".join(repr(line.price_key) for line in r.costs if line.cost is None and line.price_key)
        parts.append(Text(f"a price is unknown{' (' + keys + ')' if keys else ''}: give it under Prices in the form",
                          style="yellow"))
    parts += plant_cost_lines(r, currency)
    return Group(*parts)


class CautionPanel(VerticalScroll):
    """Hazard, warnings and cautions of the selected route, and the reminder about local codes."""

    DEFAULT_CSS = css_of(__file__, "cautions.tcss")

    def compose(self) -> ComposeResult:
        yield Static(Text(LOCAL_CODES), id="caution-text")

    def show(self, row: Any | None, rows: Any = ()) -> None:
        """Show the cautions of ``row`` (always with the local-codes reminder); a warning other
        ``rows`` share is said once, with the routes it concerns."""
        lines: list[Any] = [Text("⚠ Cautions", style="bold")]
        if row is not None:
            r = row.result
            lines.append(Text.assemble(("hazard ", "bold"), (f"{r.hazard}", "bold"), f": {r.hazard_reason}"))
            for w in r.warnings:
                others = [o.result.route_id for o in rows if o is not row and w in o.result.warnings]
                lines.append(Text.assemble((f"! {w}", "yellow"),
                                           (f" (also {', '.join(others)})" if others else "", "dim")))
            cautions = list(r.cautions)
            for extra in (getattr(r, "dryer", None), getattr(r, "delivery", None)):
                cautions += [c for c in getattr(extra, "cautions", ()) if c not in cautions]
            lines += [Text(f"• {c}") for c in cautions]
        lines.append(Text(LOCAL_CODES, style="bold"))
        self.query_one("#caution-text", Static).update(Group(*lines))


class RouteDetail(Vertical):
    """The tabs of the selected route."""

    DEFAULT_CSS = css_of(__file__)

    def compose(self) -> ComposeResult:
        with TabbedContent(id="detail-tabs"):
            with TabPane(TABS[0][1], id=TABS[0][0]):
                yield VerticalScroll(Static(id="recipe"))
            with TabPane(TABS[1][1], id=TABS[1][0]):
                with Horizontal(classes="split"):
                    yield VerticalScroll(Static(id="gas"), Bars(id="gas-bars"))
                    yield BreakthroughPlot(id="breakthrough")
            with TabPane(TABS[2][1], id=TABS[2][0]):
                with Horizontal(classes="split"):
                    yield VerticalScroll(Static(id="delivery"))
                    yield Keyed(SaturationPlot(id="saturation"))
            with TabPane(TABS[3][1], id=TABS[3][0]):
                with Horizontal(classes="split"):
                    yield VerticalScroll(Static(id="costs"))
                    yield Bars(id="cost-bars")
            with TabPane(TABS[4][1], id=TABS[4][0]):
                yield Keyed(CostCurve(id="cost-curve"))
            with TabPane(TABS[5][1], id=TABS[5][0]):
                yield TornadoPanel(id="whatif")
            with TabPane(TABS[6][1], id=TABS[6][0]):
                yield SpreadPanel(id="spread")

    def show(self, row: Any | None, currency: str, end_product: str, curve: Any = None,
             rows: Any = ()) -> None:
        """Fill every tab from ``row`` (a comparison row), or say that nothing is selected;
        ``curve`` is its dryer's breakthrough curve (:func:`co2routes.tui.compute.breakthrough_points`);
        ``rows`` every row of the comparison (for the "why this place" line)."""
        if row is None:
            for name in ("recipe", "gas", "delivery", "costs"):
                self.query_one(f"#{name}", Static).update(Text("no route to show", style="dim"))
            return
        self.query_one("#recipe", Static).update(recipe(row, currency, rows))
        self.query_one("#gas", Static).update(gas(row))
        self.query_one("#delivery", Static).update(delivery(row, end_product))
        self.query_one("#costs", Static).update(breakdown(row, currency))
        r = row.result
        mix = sorted(r.raw_gas.mole_fractions.items(), key=lambda kv: -kv[1])
        self.query_one("#gas-bars", Bars).draw("raw gas, mol %", [k for k, _ in mix], [v * 100 for _, v in mix])
        self.query_one("#cost-bars", Bars).draw(f"cost of one batch, {currency}", [c.item for c in r.costs],
                                                [c.cost for c in r.costs])
        self.query_one("#breakthrough", BreakthroughPlot).draw(curve)

    def show_curve(self, sweep: Any, current_kg: float | None) -> None:
        """Draw the cost-against-batch chart."""
        self.query_one("#cost-curve", CostCurve).draw(sweep, current_kg)

    def show_saturation(self, curve: Any) -> None:
        """Draw the saturation line chart."""
        self.query_one("#saturation", SaturationPlot).draw(curve)

    @property
    def active(self) -> str:
        """The id of the open tab."""
        return self.query_one("#detail-tabs", TabbedContent).active

    def pick(self, index: int) -> None:
        """Open tab number ``index`` (0-based)."""
        if 0 <= index < len(TABS):
            self.query_one("#detail-tabs", TabbedContent).active = TABS[index][0]

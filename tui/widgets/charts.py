"""Charts drawn in the terminal with textual-plotext. Each takes data already computed by a
worker (see :mod:`co2routes.tui.compute`) and only draws it; an empty chart says why it is empty.

Titles and axis labels are kept short, the unit on its axis: plotext leaves out a title or label
wider than the chart, and these charts are often narrow. Every line of a chart has its own mark
(:data:`MARKS`), so they can be told apart without colour, and the key saying which mark is which
sits under the chart (:class:`Keyed`), never over the plotted lines."""

from __future__ import annotations

import math
from typing import Any, Sequence

from rich.text import Text
from textual.app import ComposeResult
from textual.containers import Vertical
from textual.widgets import Static
from textual_plotext import PlotextPlot

from co2routes.tui.widgets import css_of
from co2routes.tui.widgets.fitting import shorten

_CSS = css_of(__file__)
#: The marks of a chart's lines, one each, in order: distinct without colour.
MARKS = ("●", "x", "+", "o", "*", "#", "=", "%", "@")


class Keyed(Vertical):
    """A chart with its key under it: which mark stands for which line (outside the plot)."""

    DEFAULT_CSS = ("Keyed { width: 1fr; height: 1fr; min-width: 30; } Keyed > .chart-key { height: auto; } "
                   "Keyed > PlotextPlot { min-height: 6; }")

    def __init__(self, chart: "_Chart", **kwargs: Any) -> None:
        super().__init__(**kwargs)
        self._chart = chart

    def compose(self) -> ComposeResult:
        yield self._chart
        yield Static(classes="chart-key")

    def show_key(self, legend: Sequence[tuple[str, str]], note: str = "") -> None:
        """Write the key: ``mark label`` pairs, then ``note``."""
        text = Text()
        for mark, label in legend:
            text.append(f"{mark} ", style="bold")
            text.append(f"{label}   ")
        if note:
            text.append(note, style="dim")
        self.query_one(".chart-key", Static).update(text)


class _Chart(PlotextPlot):
    """A plot that can say in its title why it has nothing to draw."""

    DEFAULT_CSS = _CSS

    def __init__(self, **kwargs: Any) -> None:
        super().__init__(**kwargs)
        #: what the chart shows now, for tests and the screen ("empty" until drawn)
        self.showing = "empty"

    def _start(self, title: str) -> Any:
        plt = self.plt
        plt.clear_figure()
        plt.title(title)
        return plt

    def _key(self, legend: Sequence[tuple[str, str]] = (), note: str = "") -> None:
        """Show the key under the chart (when it sits in a :class:`Keyed`)."""
        if isinstance(self.parent, Keyed):
            self.parent.show_key(legend, note)

    def empty(self, why: str) -> None:
        """Show no data, only ``why``."""
        self._start(why)
        self._key()
        self.showing = "empty"
        self.refresh()


class CostCurve(_Chart):
    """Cost per kg of every route against the CO2 per batch (log scale on the batch axis)."""

    def draw(self, sweep: Any, current_kg: float | None = None) -> None:
        """Draw a :class:`co2routes.tui.compute.Sweep`; the scenario's own batch size is a vertical line."""
        if sweep is None or not sweep.cost_per_kg:
            self.empty("cost per kg against batch size: no routes to draw")
            return
        plt = self._start("cost per kg against batch size")
        known = [y for costs in sweep.cost_per_kg.values() for y in costs
                 if y is not None and math.isfinite(y) and y > 0]
        # log scales drawn as log10 of the data with ticks labelled in the data's own numbers:
        # plotext's own log scale takes the log again each time the chart is drawn (a resize)
        log_y = bool(known) and max(known) > 20 * min(known)  # one dear route would flatten the rest
        legend = []
        for rid, costs in sweep.cost_per_kg.items():
            pts = [(math.log10(x), math.log10(y) if log_y else y) for x, y in zip(sweep.co2_kg, costs)
                   if y is not None and math.isfinite(y) and x > 0 and (y > 0 or not log_y)]
            if pts:
                mark = MARKS[len(legend) % len(MARKS)]
                plt.plot([p[0] for p in pts], [p[1] for p in pts], marker=mark)
                legend.append((mark, shorten(sweep.labels.get(rid, rid), 24)))
        drawn = len(legend)
        if not drawn:
            self.empty("cost per kg against batch size: every price is unknown")
            return
        _log_ticks(plt.xticks, [x for x in sweep.co2_kg if x > 0])
        if log_y:
            _log_ticks(plt.yticks, known)
        plt.xlabel("kg CO2 per batch (log scale)")
        plt.ylabel(f"{sweep.currency}/kg")
        if current_kg:
            plt.vline(math.log10(current_kg), "gray")
        self._key(legend, "upright line: this scenario's batch" if current_kg else "")
        self.showing = f"cost curve of {drawn} routes"
        self.refresh()


def _log_ticks(set_ticks: Any, values: Sequence[float]) -> None:
    """Ticks at 1, 2, 5 x 10^k on an axis drawn as log10 of ``values``, labelled in the values."""
    from co2routes.tui.widgets.spread import log_ticks

    ticks = log_ticks(min(values), max(values))
    set_ticks([math.log10(t) for t in ticks], [f"{t:g}" for t in ticks])


class SaturationPlot(_Chart):
    """The CO2 liquid-vapour line with the condensing and storage points marked."""

    def draw(self, curve: Any) -> None:
        """Draw a :class:`co2routes.tui.compute.SaturationCurve` (pressure in bar, temperature in degC)."""
        if curve is None:
            self.empty("saturation line: not worked out yet")
            return
        plt = self._start("CO2 saturation line")
        plt.plot([t - 273.15 for t in curve.temperatures_k], [p / 1e5 for p in curve.pressures_pa],
                 marker="braille")
        legend = [("⠒⠒", "liquid and gas meet")]
        for (label, t, p), mark in zip(curve.marks, MARKS):
            plt.scatter([t - 273.15], [p / 1e5], marker=mark)
            legend.append((mark, f"{label} {p / 1e5:.1f} bar"))
        self._key(legend)
        plt.xlabel("degC")
        plt.ylabel("bar")
        self.showing = "saturation line with " + ", ".join(m[0] for m in curve.marks)
        self.refresh()


class BreakthroughPlot(_Chart):
    """The dryer's outlet water against time on stream."""

    def draw(self, points: tuple[Sequence[float], Sequence[float], str] | None) -> None:
        """Draw ``(hours, values, y label)`` from :func:`co2routes.tui.compute.breakthrough_points`."""
        if points is None:
            self.empty("breakthrough curve: no dryer, or not worked out yet")
            return
        hours, values, label = points
        plt = self._start("dryer breakthrough")
        plt.plot(list(hours), list(values), marker="braille")
        plt.xlabel("h on stream")
        plt.ylabel(label.rsplit(", ", 1)[-1])  # the unit of "outlet water, ppmv"
        self.showing = "breakthrough curve"
        self.refresh()


class Bars(_Chart):
    """Horizontal bars: the cost breakdown or the raw gas composition."""

    def draw(self, title: str, names: Sequence[str], values: Sequence[float]) -> None:
        """Draw one bar per name; nothing to draw gives an empty chart saying so."""
        pairs = [(shorten(n, 18), v) for n, v in zip(names, values) if v is not None and math.isfinite(v)]
        if not pairs:
            self.empty(f"{title}: nothing known to draw")
            return
        plt = self._start(title)
        plt.bar([p[0] for p in pairs], [p[1] for p in pairs], orientation="horizontal", width=0.3)
        self.showing = title
        self.refresh()

"""Charts drawn in the terminal with textual-plotext. Each takes data already computed by a
worker (see :mod:`co2routes.tui.compute`) and only draws it; an empty chart says why it is empty.

Titles and axis labels are kept short, the unit on its axis: plotext leaves out a title or label
wider than the chart, and these charts are often narrow."""

from __future__ import annotations

import math
from typing import Any, Sequence

from textual_plotext import PlotextPlot

from co2routes.tui.widgets import css_of

_CSS = css_of(__file__)


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

    def empty(self, why: str) -> None:
        """Show no data, only ``why``."""
        self._start(why)
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
        drawn = 0
        for rid, costs in sweep.cost_per_kg.items():
            pts = [(x, y) for x, y in zip(sweep.co2_kg, costs) if y is not None and math.isfinite(y)]
            if pts:
                plt.plot([p[0] for p in pts], [p[1] for p in pts], label=sweep.labels.get(rid, rid)[:22],
                         marker="braille")
                drawn += 1
        if not drawn:
            self.empty("cost per kg against batch size: every price is unknown")
            return
        plt.xscale("log")
        known = [y for costs in sweep.cost_per_kg.values() for y in costs if y and math.isfinite(y) and y > 0]
        if known and max(known) > 20 * min(known):
            plt.yscale("log")  # one dear route would flatten all the others
        plt.xlabel("kg CO2 per batch")
        plt.ylabel(f"{sweep.currency}/kg")
        if current_kg:
            plt.vline(current_kg, "gray")
        self.showing = f"cost curve of {drawn} routes"
        self.refresh()


class SaturationPlot(_Chart):
    """The CO2 liquid-vapour line with the condensing and storage points marked."""

    def draw(self, curve: Any) -> None:
        """Draw a :class:`co2routes.tui.compute.SaturationCurve` (pressure in bar, temperature in degC)."""
        if curve is None:
            self.empty("saturation line: not worked out yet")
            return
        plt = self._start("CO2 saturation line")
        plt.plot([t - 273.15 for t in curve.temperatures_k], [p / 1e5 for p in curve.pressures_pa],
                 label="saturation", marker="braille")
        for label, t, p in curve.marks:
            plt.scatter([t - 273.15], [p / 1e5], label=f"{label} {p / 1e5:.1f} bar", marker="●")
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
        pairs = [(n[:18], v) for n, v in zip(names, values) if v is not None and math.isfinite(v)]
        if not pairs:
            self.empty(f"{title}: nothing known to draw")
            return
        plt = self._start(title)
        plt.bar([p[0] for p in pairs], [p[1] for p in pairs], orientation="horizontal", width=0.3)
        self.showing = title
        self.refresh()

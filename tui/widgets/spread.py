"""The spread chart: every route's Monte Carlo cost per kg as a box, or one route's histogram.

Draws a :class:`co2routes.sources.uncertainty.Uncertainty` (it does no computing). Box: P10 to P90, the
median marked, whiskers at the 2.5th and 97.5th percentiles of the samples. Mount and call::

    from co2routes.tui.widgets.spread import Spread
    yield Spread(id="spread")
    ...
    self.query_one(Spread).draw(uncertainty_result)              # a box per route
    self.query_one(Spread).draw(uncertainty_result, "fermentation")  # that route's histogram
"""

from __future__ import annotations

from typing import Any

import math

from textual_plotext import PlotextPlot

#: bins of the histogram
BINS = 40


def log_ticks(low: float, high: float) -> list[float]:
    """Tick values 1, 2, 5 x 10^k from ``low`` to ``high`` (both > 0), thinned to at most six.

    >>> log_ticks(0.7, 75.0)
    [1.0, 2.0, 5.0, 10.0, 20.0, 50.0]
    >>> log_ticks(0.7, 750.0)
    [1.0, 10.0, 100.0]
    """
    ticks = [m * 10.0 ** k for k in range(math.floor(math.log10(low)), math.ceil(math.log10(high)) + 1)
             for m in (1.0, 2.0, 5.0)]
    ticks = [t for t in ticks if low <= t <= high]
    if len(ticks) > 6:
        ticks = [t for t in ticks if math.isclose(math.log10(t), round(math.log10(t)))]
    return ticks or [low, high]


class Spread(PlotextPlot):
    """Box chart of every route's sampled cost per kg, or the histogram of one route's."""

    DEFAULT_CSS = "Spread { height: 1fr; min-height: 12; }"

    def __init__(self, **kwargs: Any) -> None:
        super().__init__(**kwargs)
        #: what the chart shows now, for tests and the screen ("empty" until drawn)
        self.showing = "empty"

    def empty(self, why: str) -> None:
        """Show no data, only ``why``."""
        self.plt.clear_figure()
        self.plt.title(why)
        self.showing = "empty"
        self.refresh()

    def draw(self, result: Any, route_id: str | None = None) -> None:
        """Draw ``result`` (boxes), or the histogram of ``route_id`` when given."""
        routes = [r for r in (result.routes if result is not None else ()) if r.samples is not None]
        if not routes:
            self.empty("uncertainty: no route with a known cost to draw")
            return
        plt = self.plt
        plt.clear_figure()
        cur = result.currency
        # titles and axis labels kept short: plotext leaves out one wider than the chart
        if route_id is not None:
            route = next((r for r in routes if r.route_id == route_id), None)
            if route is None:
                self.empty(f"uncertainty: {route_id} has no known cost")
                return
            plt.title(f"{route.label}: {result.samples} samples")
            plt.hist(route.samples.tolist(), BINS)
            for value in (route.cost_per_kg_p10, route.cost_per_kg_p50, route.cost_per_kg_p90):
                plt.vline(value, "gray")
            plt.xlabel(f"{cur}/kg; lines: P10 P50 P90")
            plt.ylabel("samples")
            self.showing = f"histogram of {route_id}"
        else:
            import numpy as np  # here, not at the top: the interface starts without numpy

            labels, boxes = [], []
            # plotext draws the first box at the bottom: the catalogue's first route goes last, on top
            for r in reversed(routes):
                low, high = np.percentile(r.samples, [2.5, 97.5])
                share = "-" if r.probability_cheapest is None else f"{r.probability_cheapest:.0%}"
                labels.append(f"{r.route_id[:20]} {share}")
                boxes.append([float(high), r.cost_per_kg_p90, r.cost_per_kg_p50, r.cost_per_kg_p10, float(low)])
            plt.title("box P10..P90, | median, whiskers P2.5..P97.5")
            least, most = min(b[-1] for b in boxes), max(b[0] for b in boxes)
            log = least > 0 and most > 10 * least
            if log:
                # one dear route would squash every other box into a column: draw log10 of the cost
                # and label the ticks with the cost itself (plotext's own log scale breaks on boxes)
                boxes = [[math.log10(v) for v in b] for b in boxes]
                ticks = log_ticks(least, most)
                plt.xticks([math.log10(t) for t in ticks], [f"{t:g}" for t in ticks])
            plt.box(labels, boxes, quintuples=True, orientation="horizontal", width=0.3)
            plt.xlabel(f"{cur}/kg{' (log scale)' if log else ''}; % = cheapest")
            self.showing = f"boxes of {len(routes)} routes"
        self.refresh()

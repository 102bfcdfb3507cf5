"""The spread chart: every route's Monte Carlo cost per kg as a box, or one route's histogram.

Draws a :class:`sources.uncertainty.Uncertainty` (it does no computing). Box: P10 to P90, the
median marked, whiskers at the 2.5th and 97.5th percentiles of the samples. Mount and call::

    from tui.widgets.spread import Spread
    yield Spread(id="spread")
    ...
    self.query_one(Spread).draw(uncertainty_result)              # a box per route
    self.query_one(Spread).draw(uncertainty_result, "fermentation")  # that route's histogram
"""

from __future__ import annotations

from typing import Any

import numpy as np
from textual_plotext import PlotextPlot

#: bins of the histogram
BINS = 40


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
        if route_id is not None:
            route = next((r for r in routes if r.route_id == route_id), None)
            if route is None:
                self.empty(f"uncertainty: {route_id} has no known cost")
                return
            plt.title(f"{route.label}: cost per kg CO2 ({cur}), {result.samples} samples; "
                      f"cheapest in {route.probability_cheapest:.0%}")
            plt.hist(route.samples.tolist(), BINS)
            for value in (route.cost_per_kg_p10, route.cost_per_kg_p50, route.cost_per_kg_p90):
                plt.vline(value, "gray")
            plt.xlabel(f"cost per kg CO2 ({cur}); lines at P10, P50, P90")
            self.showing = f"histogram of {route_id}"
        else:
            labels, boxes = [], []
            for r in routes:
                low, high = np.percentile(r.samples, [2.5, 97.5])
                labels.append(f"{r.route_id[:18]} {r.probability_cheapest:.0%}")
                boxes.append([float(high), r.cost_per_kg_p90, r.cost_per_kg_p50, r.cost_per_kg_p10, float(low)])
            plt.title(f"cost per kg CO2 ({cur}), {result.samples} samples: box P10-P90, median, "
                      "whiskers P2.5-P97.5; % = chance of being cheapest")
            plt.box(labels, boxes, quintuples=True, orientation="horizontal", width=0.3)
            self.showing = f"boxes of {len(routes)} routes"
        self.refresh()

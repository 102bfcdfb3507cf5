"""The tornado chart: one route's inputs swung one at a time, the widest swing on top.

Draws a :class:`sources.sensitivity.RouteSensitivity` (it does no computing): for each input, a bar
from the nominal cost per kg to the cost with the input at its low end and another to the cost at
its high end, as differences from the nominal cost. Mount it anywhere and call :meth:`draw`::

    from tui.widgets.tornado import Tornado
    yield Tornado(id="tornado")
    ...
    self.query_one(Tornado).draw(route_sensitivity, currency="EUR")
"""

from __future__ import annotations

from typing import Any

from textual_plotext import PlotextPlot


class Tornado(PlotextPlot):
    """A tornado chart of one route's one-at-a-time sensitivity."""

    DEFAULT_CSS = "Tornado { height: 1fr; min-height: 12; }"

    #: inputs drawn at most (the rest are the narrowest and are left out)
    TOP = 8

    def __init__(self, **kwargs: Any) -> None:
        super().__init__(**kwargs)
        #: what the chart shows now, for tests and the screen ("empty" until drawn)
        self.showing = "empty"
        #: the input names drawn, widest swing first
        self.names: tuple[str, ...] = ()

    def empty(self, why: str) -> None:
        """Show no data, only ``why``."""
        self.plt.clear_figure()
        self.plt.title(why)
        self.showing, self.names = "empty", ()
        self.refresh()

    def draw(self, route: Any, currency: str = "") -> None:
        """Draw a :class:`sources.sensitivity.RouteSensitivity`."""
        if route is None or route.cost_per_kg is None:
            self.empty("sensitivity: the cost is unknown (a price is missing)")
            return
        known = [s for s in route.inputs if s.effect is not None][: self.TOP]
        if not known:
            self.empty(f"sensitivity of {route.label}: no input moves its cost")
            return
        nominal = route.cost_per_kg
        # plotext puts the first bar of a horizontal chart at the bottom: widest last, so on top
        shown = list(reversed(known))
        names = [s.name.split(".", 1)[-1][:24] for s in shown]
        plt = self.plt
        plt.clear_figure()
        plt.title(f"{route.label}: cost per kg {nominal:.2f} {currency}, change with each input")
        plt.multiple_bar(names, [[s.cost_per_kg_low - nominal for s in shown],
                                 [s.cost_per_kg_high - nominal for s in shown]],
                         labels=["input at its low end", "input at its high end"], orientation="horizontal")
        plt.vline(0.0, "gray")
        plt.xlabel(f"change in cost per kg CO2 ({currency})".replace(" ()", ""))
        self.names = tuple(s.name for s in known)
        self.showing = f"tornado of {route.route_id}"
        self.refresh()

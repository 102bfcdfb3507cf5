"""The tornado chart: one route's inputs swung one at a time, the widest swing on top.

Draws a :class:`co2routes.sources.sensitivity.RouteSensitivity` (it does no computing): for each input, one
line holding a bar from the nominal cost per kg to the cost with the input at its low end and
another to the cost at its high end, as differences from the nominal cost. Mount it anywhere and call :meth:`draw`::

    from co2routes.tui.widgets.tornado import Tornado
    yield Tornado(id="tornado")
    ...
    self.query_one(Tornado).draw(route_sensitivity, currency="EUR")
"""

from __future__ import annotations

from typing import Any

from textual_plotext import PlotextPlot


def short_name(name: str) -> str:
    """An input's name as a chart or table of one route labels it.

    >>> short_name("prices.sucrose"), short_name("options.fermentation.sugar_concentration")
    ('sucrose price', 'sugar concentration')
    >>> short_name("delivery.efficiency")
    'delivery efficiency'
    """
    if name.startswith("prices."):
        return f"{name[len('prices.'):]} price"
    if name.startswith("options.") and name.count(".") >= 2:
        name = name.split(".", 2)[2]
    return name.replace(".", " ").replace("_", " ")


class Tornado(PlotextPlot):
    """A tornado chart of one route's one-at-a-time sensitivity."""

    DEFAULT_CSS = "Tornado { height: 6; }"

    #: inputs drawn at most (the rest are the narrowest and are left out)
    TOP = 8
    #: colours of the low-end and the high-end bars (plotext colour names, said in the axis label)
    LOW, HIGH = "blue", "red"

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
        self.styles.height = 6
        self.refresh()

    def draw(self, route: Any, currency: str = "") -> None:
        """Draw a :class:`co2routes.sources.sensitivity.RouteSensitivity`."""
        if route is None or route.cost_per_kg is None:
            self.empty("sensitivity: the cost is unknown (a price is missing)")
            return
        known = [s for s in route.inputs if s.effect is not None][: self.TOP]
        if not known:
            self.empty(f"sensitivity of {route.label}: no input moves its cost")
            return
        nominal = route.cost_per_kg
        plt = self.plt
        plt.clear_figure()
        plt.title(f"{route.label}: {nominal:.2f} {currency}/kg at nominal inputs".replace(" /kg", " per kg"))
        # one line per input, widest on top: a bar from the nominal cost to the cost with the input
        # at its low end (LOW colour) and another to the cost with it at its high end (HIGH colour)
        n = len(known)
        for i, s in enumerate(known):
            y = n - i
            plt.plot([s.cost_per_kg_low - nominal, 0.0], [y, y], color=self.LOW, marker="█")
            plt.plot([0.0, s.cost_per_kg_high - nominal], [y, y], color=self.HIGH, marker="█")
        reach = max(max(abs(s.cost_per_kg_low - nominal), abs(s.cost_per_kg_high - nominal)) for s in known)
        reach = reach or 1.0
        ticks = [-reach, -reach / 2, 0.0, reach / 2, reach]
        plt.xticks(ticks, [f"{t:+.2g}" if t else "0" for t in ticks])
        plt.xlim(-1.05 * reach, 1.05 * reach)
        plt.yticks(list(range(n, 0, -1)), [short_name(s.name)[:20] for s in known])
        plt.ylim(0.5, n + 0.5)
        # exactly one row per input (title, frame, tick labels and axis label take five more):
        # with fewer rows plotext leaves out some inputs' names
        self.styles.height = n + 5
        plt.vline(0.0, "gray")
        # kept short: plotext leaves out an axis label wider than the chart
        plt.xlabel(f"change in {currency}/kg".replace("in /kg", "per kg"))
        self.names = tuple(s.name for s in known)
        self.showing = f"tornado of {route.route_id}"
        self.refresh()

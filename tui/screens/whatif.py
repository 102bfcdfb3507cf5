"""The planning screen's what-if workers (a mixin of :class:`co2routes.tui.screens.main.MainScreen`).

- **Sensitivity** (the "What if" tab): the chosen route's inputs swung one at a time
  (:func:`co2routes.sources.sensitivity.route_sensitivity`). Worked out lazily, in an exclusive thread
  worker: when the tab is opened, and again after an edit or a new route choice only while the tab
  is open. An answer is kept per (ranking generation, route), so going back to the tab costs nothing.
- **Uncertainty** (the "Cost range" tab, key :data:`SPREAD_KEY`): a Monte Carlo run of every route
  (:func:`co2routes.sources.uncertainty.uncertainty`) with a fresh seed, in an exclusive thread worker that
  moves the tab's progress bar; a newer run or leaving the screen stops it at its next step.

Both take their ranges from the scenario's ``[uncertain]`` table (:func:`co2routes.sources.whatif.parse_uncertain`);
with none, the sensitivity uses its default swings and the Monte Carlo draws every price +/-25 %.
"""

from __future__ import annotations

import secrets
import time
from typing import Any

from textual import work
from textual.worker import get_current_worker

from co2routes.tui.widgets.detail import TABS, RouteDetail
from co2routes.tui.widgets.whatif import SpreadPanel, TornadoPanel

#: The key that draws the Monte Carlo samples (not used by any other binding).
SPREAD_KEY = "u"
#: Samples per Monte Carlo run from the interface (the command line's default too).
SPREAD_SAMPLES = 10_000


class _Stopped(Exception):
    """A newer run (or leaving) cancelled the Monte Carlo worker."""


class WhatIf:
    """State and workers of the two what-if tabs; the screen calls :meth:`whatif_update`."""

    #: (generation, route id) -> the :class:`co2routes.sources.sensitivity.RouteSensitivity` worked out
    tornadoes: dict[tuple[int, str], Any]
    #: the last Monte Carlo result (:class:`co2routes.sources.uncertainty.Uncertainty`) and its generation
    spread: Any = None
    spread_generation = -1
    #: seconds the last sensitivity took (for the tab's note and the benchmarks)
    tornado_seconds: float | None = None

    # -- shared ---------------------------------------------------------------------------

    def _whatif_routes(self) -> tuple[Any, ...]:
        from co2routes.sources.registry import catalogue

        return tuple(self.routes) if self.routes is not None else catalogue().routes

    def whatif_distributions(self, outcome: Any) -> dict[str, Any]:
        """The ``[uncertain]`` entries of the ranked scenario, checked (raises ``InputError``)."""
        from co2routes.sources.whatif import parse_uncertain

        text = self.opened.text if self.document == self.opened.document else None
        return parse_uncertain(outcome.scenario, self.opened.source, text, self._whatif_routes())

    def whatif_update(self) -> None:
        """After a new ranking or route choice: refresh whichever what-if tab is open."""
        if self.outcome is None:
            return
        active = self.query_one(RouteDetail).active
        if active == "t-whatif":
            self._tornado_for_selected()
        if self.spread is not None:
            self._show_spread()

    def whatif_tab_opened(self, tab: str) -> None:
        """Detail tab ``tab`` was opened: the tornado is worked out now if it is not known yet."""
        if tab == "t-whatif" and self.outcome is not None:
            self._tornado_for_selected()
        elif tab == "t-spread" and self.spread is None:
            self.query_one(SpreadPanel).hint(SPREAD_KEY, SPREAD_SAMPLES)

    # -- sensitivity ----------------------------------------------------------------------

    def _tornado_for_selected(self) -> None:
        row = self.selected_row()
        if row is None:
            return
        key = (self.generation, row.result.route_id)
        if key in self.tornadoes:
            self._show_tornado(key)
            return
        self.query_one(TornadoPanel).waiting(row.result.label)
        self.swing_inputs(self.outcome, *key)

    @work(exclusive=True, thread=True, group="tornado")
    def swing_inputs(self, outcome: Any, generation: int, route_id: str) -> None:
        """Work out the tornado of ``route_id`` for ``outcome`` (thread worker)."""
        from co2routes.sources.sensitivity import route_sensitivity

        worker = get_current_worker()
        start = time.perf_counter()
        try:
            route = next(r for r in self._whatif_routes() if r.id == route_id)
            result = route_sensitivity(route, outcome.scenario, self.whatif_distributions(outcome))
        except Exception as err:  # noqa: BLE001 - a refused range or a broken route is a message
            if not worker.is_cancelled:
                self.app.call_from_thread(self.query_one(TornadoPanel).failed,
                                          f"no sensitivity for {route_id}: {err}")
            return
        seconds = time.perf_counter() - start
        if not worker.is_cancelled:
            self.app.call_from_thread(self._tornado_done, generation, route_id, result, seconds)

    def _tornado_done(self, generation: int, route_id: str, result: Any, seconds: float) -> None:
        self.tornadoes = {k: v for k, v in self.tornadoes.items() if k[0] == generation}
        self.tornadoes[(generation, route_id)] = result
        self.tornado_seconds = seconds
        row = self.selected_row()
        if generation == self.generation and row is not None and row.result.route_id == route_id:
            self._show_tornado((generation, route_id))
            self._say(f"{len(result.inputs)} inputs of {route_id} swung in {seconds:.2f} s")

    def _show_tornado(self, key: tuple[int, str]) -> None:
        from co2routes.sources.whatif import SWINGS

        named = len(self.outcome.scenario.document.get("uncertain", {}) or {})
        p_lo, p_hi = SWINGS["relative"]
        dt = SWINGS["kelvin"][1]
        points = SWINGS["points"][1] * 100
        f_lo, f_hi = SWINGS["factor"]
        ranges = (f"ranges: {named} from the scenario's [uncertain] table, else " if named else "ranges: ") + \
            (f"prices x{p_lo:g}..x{p_hi:g}, fractions -/+{points:g} points, temperatures -/+{dt:g} K, "
             f"demand x{f_lo:g}..x{f_hi:g}")
        from co2routes.sources.registry import catalogue
        from co2routes.tui.typed import typed_units

        route = self.tornadoes[key]
        units = typed_units(self.outcome.scenario, self.routes or catalogue().routes, [s.name for s in route.inputs])
        self.query_one(TornadoPanel).show(route, self.outcome.comparison.currency, ranges, units)

    # -- uncertainty ----------------------------------------------------------------------

    def action_draw_samples(self) -> None:
        """Run the Monte Carlo of every route and open the Cost range tab."""
        if self.outcome is None:
            self._say("no ranking yet: the samples are drawn once the routes are ranked", True)
            return
        self.query_one(RouteDetail).pick([tab for tab, _ in TABS].index("t-spread"))
        seed = secrets.randbits(32)
        self.query_one(SpreadPanel).running(SPREAD_SAMPLES, seed)
        self.draw_samples(self.outcome, self.generation, SPREAD_SAMPLES, seed)

    @work(exclusive=True, thread=True, group="spread")
    def draw_samples(self, outcome: Any, generation: int, samples: int, seed: int) -> None:
        """Monte Carlo of every route for ``outcome`` (thread worker) moving the progress bar."""
        from co2routes.sources.uncertainty import uncertainty

        worker = get_current_worker()
        bar = self.query_one("#spread-bar")

        def progress(done: int, total: int) -> None:
            if worker.is_cancelled:
                raise _Stopped
            self.app.call_from_thread(bar.update, progress=done, total=total)

        try:
            result = uncertainty(outcome.scenario, self.whatif_distributions(outcome), samples, seed=seed,
                                 routes=self.routes, progress=progress)
        except _Stopped:
            return
        except Exception as err:  # noqa: BLE001 - a refused distribution or a broken route is a message
            if not worker.is_cancelled:
                self.app.call_from_thread(self.query_one(SpreadPanel).failed, f"no samples drawn: {err}")
            return
        if not worker.is_cancelled:
            self.app.call_from_thread(self._spread_done, generation, result)

    def _spread_done(self, generation: int, result: Any) -> None:
        self.spread, self.spread_generation = result, generation
        self._show_spread()
        seconds = result.seconds_evaluating + result.seconds_sampling
        self._say(f"{result.samples} samples of every route drawn in {seconds:.2f} s (seed {result.seed})")

    def _show_spread(self) -> None:
        row = self.selected_row()
        self.query_one(SpreadPanel).show(self.spread, row.result.route_id if row is not None else None,
                                         self.spread_generation != self.generation, SPREAD_KEY)

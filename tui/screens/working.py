"""The planning screen's workers (a mixin of :class:`co2routes.tui.screens.main.MainScreen`).

Ranking runs in an exclusive thread worker: a newer edit cancels the older run, which drops its
answer; after validation (quick) the worker waits :data:`SETTLE_S` for the next key before the
ranking (slow), so a burst of typing costs one ranking. Charts are worked out by a second
exclusive worker once the ranking is on screen. Anything slower than :data:`BUSY_AFTER_S` shows
the progress bar.
"""

from __future__ import annotations

import time
from typing import Any

from textual import work
from textual.worker import get_current_worker

from co2routes.tui.fields import Field, option_fields, price_fields
from co2routes.tui.widgets.form import ScenarioForm

#: A computation slower than this [s] shows the progress bar.
BUSY_AFTER_S = 0.2
#: After a valid edit, wait this long [s] for the next key before ranking every route.
SETTLE_S = 0.15


class Working:
    """The compute and chart workers and the progress bar; the screen shows their answers."""

    @work(exclusive=True, thread=True, group="compute")
    def recompute(self, document: dict[str, Any], generation: int, edited_field: Field | None) -> None:
        """Validate and rank (thread worker); hands the answer to the UI thread."""
        from co2routes.thermo.errors import InputError
        from co2routes.tui.compute import outcome

        worker = get_current_worker()
        self.app.call_from_thread(self._busy, generation)
        text = self.opened.text if document == self.opened.document else None

        def proceed() -> bool:
            # typing in bursts: a short wait lets the next key cancel this run before the slow part
            time.sleep(SETTLE_S if edited_field is not None else 0.0)
            return not worker.is_cancelled

        try:
            result = outcome(document, self.opened.source, text, self.routes, proceed)
            if result is None:
                return
        except InputError as err:
            if not worker.is_cancelled:
                self.app.call_from_thread(self._refused, generation, err, edited_field)
            return
        except Exception as err:  # noqa: BLE001 - a defect must not take the user's work with it
            if not worker.is_cancelled:
                self.app.call_from_thread(self._failed, generation, err)
            return
        else:
            if not worker.is_cancelled:
                self.app.call_from_thread(self._computed, generation, result)
        finally:
            if not self._extras:
                # once the first answer (good or refused) has been drawn
                self._extras = True
                self.app.call_from_thread(self.call_after_refresh, self._extras_once)

    @work(thread=True, group="extras")
    def _extras_once(self) -> None:
        """Add the route-option and price fields to the form, once, after the first ranking is on
        screen (mounting them takes longer than the ranking itself; thread worker)."""
        try:
            self._load_extras()
        except Exception as err:  # noqa: BLE001 - a broken price book or route must not stop the form
            self.app.call_from_thread(self._say, f"could not list options and prices: {err}", True)

    def _load_extras(self) -> None:
        from co2routes.sources.prices import load_book
        from co2routes.sources.registry import catalogue

        routes = self.routes if self.routes is not None else catalogue().routes
        self.book = load_book()
        fields = option_fields(routes) + price_fields(self.book)
        self.app.call_from_thread(self.query_one(ScenarioForm).add_fields, fields, self.document)

    def redraw_charts(self, outcome: Any, generation: int) -> None:
        """Start the chart worker once the ranking is drawn (running beside the frame, it would
        slow the frame down)."""
        self.call_after_refresh(self._draw_charts, outcome, generation)

    @work(exclusive=True, thread=True, group="charts")
    def _draw_charts(self, outcome: Any, generation: int) -> None:
        """Work out the cost-against-batch sweep and the saturation line (thread worker)."""
        from co2routes.tui.compute import breakthrough_points, demand_sweep, saturation_curve

        worker = get_current_worker()
        curves: dict[str, Any] = {}
        for row in outcome.comparison.rows:
            try:
                curves[row.result.route_id] = breakthrough_points(row.result, outcome.scenario)
            except Exception as err:  # noqa: BLE001 - a chart that cannot be drawn says so
                curves[row.result.route_id] = None
                self.app.call_from_thread(self._say, f"breakthrough chart of {row.result.route_id}: {err}", True)
        if worker.is_cancelled:
            return
        self.app.call_from_thread(self._curves, generation, curves)
        try:
            curve = saturation_curve(outcome.scenario)
        except Exception as err:  # noqa: BLE001
            curve = None
            self.app.call_from_thread(self._say, f"saturation chart: {err}", True)
        if worker.is_cancelled:
            return
        self.app.call_from_thread(self._charts, generation, None, curve)
        try:
            sweep = demand_sweep(outcome.scenario, self.routes, known=outcome.comparison,
                                 proceed=lambda: not worker.is_cancelled)
        except Exception as err:  # noqa: BLE001 - a chart that cannot be drawn says so
            sweep = None
            self.app.call_from_thread(self._say, f"cost-against-batch chart: {err}", True)
        if sweep is not None and not worker.is_cancelled:
            self.app.call_from_thread(self._charts, generation, sweep, curve)

    def _busy(self, generation: int) -> None:
        if self._busy_timer is None:
            self._busy_timer = self.set_timer(BUSY_AFTER_S, self._show_busy)

    def _show_busy(self) -> None:
        if self._busy_timer is None:  # the answer came in while this call was on its way
            return
        self.query_one("#busy").display = True
        self._say("working out every route…")

    def _idle(self) -> None:
        if self._busy_timer is not None:
            self._busy_timer.stop()
            self._busy_timer = None
        self.query_one("#busy").display = False

"""The plant over time: how many units make the demand, when they run, and the buffer between.

A route computes one batch of the period's demand Q [kg] in its own time T. With the demand
given as a rate, a new Q is due every period P (the scenario's ``batch``):

* T <= P: **one unit** makes Q and stands idle for P - T;
* T > P and a smaller batch is quicker (a rate-limited route: acid added as fast as foaming
  allows, a burner of given power, a column of given water flow): **side by side**, n units each
  make Q/n at once, n the least with T(Q/n) <= P (the route is asked again for Q/n);
* T > P and a smaller batch is not quicker (fermentation, a sorbent's uptake time):
  **staggered**, n = ceil(T/P) units each make a whole Q, one started every period, so one
  finishes every period.

Each unit is then busy at most its own cycle: T(Q/n) <= P side by side, T <= nP staggered. The
gas leaving the units is piecewise constant over a period (:func:`production`); its mean is Q/P and
its peak the most units running at once times one unit's rate. A buffer between making and using
holds the difference: for a gas end product the use is steady at Q/P, for liquid or dry ice the
compressor draws whenever the buffer holds gas (:func:`buffer_mass`). The buffer is a gas bag at
the site's pressure up to :data:`BAG_LIMIT_M3`, else a low-pressure tank at
:data:`TANK_PRESSURE_PA`.

A demand given as a mass per batch (no period) is one batch made once; a gas end product is used
as it comes, liquid or dry ice is drawn by the compressors. A bought product needs no making units: its container is its store.
"""

from __future__ import annotations

import math
from dataclasses import dataclass
from functools import lru_cache
from typing import Callable, Mapping

from co2routes.sources.base import RouteResult, Site

#: Largest gas bag planned [m3]: film gas holders of a few cubic metres are common practice for
#: small biogas and CO2 stores (from memory); above it a low-pressure tank.
BAG_LIMIT_M3 = 10.0
#: Gauge pressure of a gas bag [Pa] (common practice: a few mbar, 1 kPa taken).
BAG_GAUGE_PA = 1000.0
#: Pressure of a low-pressure buffer tank [Pa], absolute: 10 bar, an ordinary air-receiver rating
#: (common practice).
TANK_PRESSURE_PA = 10e5
#: Share of T a batch of Q/n must save before side-by-side units are tried again.
_SHRINK = 0.75


@dataclass(frozen=True, slots=True)
class Schedule:
    """How a route meets the demand over time.

    ``mode`` is ``"one unit"``, ``"side by side"``, ``"staggered"``, ``"one batch"`` (a demand
    given per batch) or ``"bought"``. ``units`` making units (0 when bought), each making
    ``unit_co2_kg`` per batch in ``unit_time_h`` [h] and busy ``duty_h_per_day`` hours a day;
    ``period_h`` the demand's period (``None`` for one batch). Flows [kg/s] of CO2 leaving the
    units; ``buffer_kg`` CO2 held between making and using, as ``buffer_kind`` of
    ``buffer_volume_m3`` at ``buffer_pressure_pa``. ``meets_demand`` is False when no number of
    units can keep up, with ``note`` saying what it would take.
    """

    mode: str
    units: int
    unit_co2_kg: float
    unit_time_h: float
    period_h: float | None
    duty_h_per_day: float | None
    mean_flow_kg_s: float
    peak_flow_kg_s: float
    buffer_kg: float
    buffer_kind: str
    buffer_volume_m3: float
    buffer_pressure_pa: float
    meets_demand: bool = True
    note: str = ""

    @property
    def busy_fraction(self) -> float:
        """Share of its own cycle a unit is busy [-]; never above 1 when the demand is met."""
        if self.period_h is None or self.units == 0:
            return 0.0
        cycle = self.period_h * (self.units if self.mode == "staggered" else 1)
        return self.unit_time_h / cycle


def production(mode: str, units: int, unit_kg: float, unit_s: float, period_s: float) -> list[tuple[float, float]]:
    """The gas leaving the units over one period as ``(duration s, flow kg/s)`` segments.

    Staggered: with tau = T/P, k = floor(tau), f = tau - k, k + 1 units run for fP and k for the
    rest, each at Q/T.

    >>> production("staggered", 3, 1.0, 2.5, 1.0)
    [(0.5, 1.2...), (0.5, 0.8)]
    >>> production("one unit", 1, 2.0, 1.0, 4.0)
    [(1.0, 2.0), (3.0, 0.0)]
    """
    rate = unit_kg / unit_s
    if mode == "staggered":
        tau = unit_s / period_s
        k = math.floor(tau + 1e-12)
        f = tau - k
        return [(f * period_s, (k + 1) * rate), ((1.0 - f) * period_s, k * rate)] if f > 1e-12 \
            else [(period_s, k * rate)]
    making = units * rate
    return [(unit_s, making), (period_s - unit_s, 0.0)] if period_s > unit_s else [(unit_s, making)]


def buffer_mass(segments: list[tuple[float, float]], use_kg_s: float | None, draw_kg_s: float | None) -> float:
    """CO2 the buffer must hold [kg] between making (``segments``) and using.

    ``use_kg_s``: a steady use (gas end product); the buffer is the range of the cumulative
    difference made - used over a period (steady periodic operation). ``draw_kg_s``: a compressor
    that draws whenever the buffer holds gas; its content is followed over two periods and the
    second's largest kept. Neither: the whole batch is held.

    >>> buffer_mass([(6.0, 1.0), (18.0, 0.0)], 0.25, None)
    4.5
    >>> buffer_mass([(6.0, 1.0), (18.0, 0.0)], None, 0.5)
    3.0
    """
    if use_kg_s is None and draw_kg_s is None:
        return sum(d * r for d, r in segments)
    if use_kg_s is not None:
        level, low, high = 0.0, 0.0, 0.0
        for duration, rate in segments:
            level += (rate - use_kg_s) * duration
            low, high = min(low, level), max(high, level)
        return high - low
    level, high = 0.0, 0.0
    for turn in range(2):
        for duration, rate in segments:
            level = max(0.0, level + (rate - draw_kg_s) * duration)
            if turn:
                high = max(high, level)
    return high


def _store(mass_kg: float, site: Site, composition: Mapping[str, float]) -> tuple[str, float, float]:
    """``(kind, volume m3, pressure Pa)`` of a buffer holding ``mass_kg`` of CO2 at the site's
    temperature (densities from :func:`co2routes.thermo.gasmix.gas_state`)."""
    dry = tuple(sorted((k, v) for k, v in composition.items() if k != "H2O" and v > 1e-9))
    if mass_kg <= 0.0:
        return "none needed", 0.0, site.pressure_pa
    for kind, pressure in (("gas bag", site.pressure_pa + BAG_GAUGE_PA), ("low-pressure tank", TANK_PRESSURE_PA)):
        volume = mass_kg / _co2_density(site.temperature_k, pressure, dry)
        if kind == "low-pressure tank" or volume <= BAG_LIMIT_M3:
            return kind, volume, pressure
    raise AssertionError("unreachable")  # pragma: no cover


@lru_cache(maxsize=256)
def _co2_density(temperature_k: float, pressure_pa: float, dry: tuple[tuple[str, float], ...]) -> float:
    """Mass of CO2 per m3 of the dry gas ``dry`` at (T, P) [kg/m3]."""
    from co2routes.thermo.gasmix import gas_state

    gas = gas_state(temperature_k, pressure_pa, dict(dry))
    y_co2 = dict(dry).get("CO2", 1.0) / sum(v for _, v in dry)
    return gas.density_kg_m3 * y_co2 * 0.0440095 / gas.molar_mass_kg_mol


def plan_schedule(made: RouteResult, rerun: Callable[[float], RouteResult], demand_kg: float,
                  period_s: float | None, site: Site, draw_kg_s: float | None = None,
                  limit: Callable[[RouteResult], str] | None = None) -> Schedule:
    """The schedule that makes ``demand_kg`` every ``period_s`` from the route's batch ``made``.

    ``rerun(kg)`` computes the route's batch of ``kg``; ``draw_kg_s`` is the compressors' draw for
    a liquid or dry-ice end product (``None`` for gas); ``limit(made)`` returns what more units
    cannot lift (people breathing), an empty string when nothing.
    """
    q = made.co2_kg
    t = max(made.time_h * 3600.0, 1.0)  # a batch said to take no time still takes a second
    if made.delivers != "raw-gas":
        mean = q / period_s if period_s else 0.0
        return Schedule("bought", 0, q, made.time_h, None if period_s is None else period_s / 3600.0,
                        None, mean, mean, 0.0, "the container bought", 0.0, site.pressure_pa)
    short = limit(made) if limit is not None else ""
    if period_s is None:
        segments = [(t, q / t)]
        held = buffer_mass(segments, None, draw_kg_s) if draw_kg_s else 0.0
        kind, volume, pressure = _store(held, site, made.raw_gas.mole_fractions)
        return Schedule("one batch", 1, q, made.time_h, None, None, q / t, q / t, held, kind,
                        volume, pressure, not short, short)
    mode, units, unit_kg, unit_s = _units(q, t, period_s, rerun)
    segments = production(mode, units, unit_kg, unit_s, period_s)
    use = None if draw_kg_s else q / period_s
    held = buffer_mass(segments, use, draw_kg_s)
    kind, volume, pressure = _store(held, site, made.raw_gas.mole_fractions)
    busy = unit_s / (period_s * (units if mode == "staggered" else 1))
    note = short or (f"{units} units {mode}: one unit alone would need {made.time_h:.1f} h for a "
                     f"{period_s / 3600.0:.3g} h period" if units > 1 else "")
    return Schedule(mode, units, unit_kg, unit_s / 3600.0, period_s / 3600.0, 24.0 * busy,
                    q / period_s, max(r for _, r in segments), held, kind, volume, pressure,
                    not short, note)


def _units(q: float, t: float, period_s: float, rerun: Callable[[float], RouteResult]) -> tuple[str, int, float, float]:
    """``(mode, units, kg per unit batch, s per unit batch)`` (rules in the module notes)."""
    if t <= period_s:
        return "one unit", 1, q, t
    n = math.ceil(t / period_s)
    for _ in range(4):
        t_n = rerun(q / n).time_h * 3600.0
        if t_n <= period_s:
            return "side by side", n, q / n, t_n
        if t_n > _SHRINK * t:
            break
        n = max(n + 1, math.ceil(n * t_n / period_s))
    n = math.ceil(t / period_s - 1e-9)
    return "staggered", n, q, t


def breath_limit(options: Mapping[str, object]) -> Callable[[RouteResult], str]:
    """What more lime beds cannot lift for the breath route: the people's breathing hours.

    The route's time is the breathing it needs plus the kiln's hours; with fewer people-hours
    given than needed, it says how many people (for the hours given) it would take.
    """
    from co2routes.sources.routes.sorbent_calcination import KILN_HOURS

    def limit(made: RouteResult) -> str:
        needed_h = made.time_h - KILN_HOURS
        given_h = float(options["hours"]) / 3600.0  # type: ignore[arg-type]
        people = int(options["people"])  # type: ignore[call-overload]
        if needed_h <= given_h * (1 + 1e-9):
            return ""
        return (f"{people} people breathing {given_h:.3g} h cannot keep up: it would take "
                f"{math.ceil(people * needed_h / given_h)} people for {given_h:.3g} h, or "
                f"{needed_h:.3g} h of breathing by {people}")

    return limit

"""Condensing CO2 that carries air: the pressure at which all of it turns liquid.

A route's dry gas is not pure CO2: the rest is mostly the air's nitrogen and oxygen (flue gas,
a fermenter's headspace, gas stripped from water). Pure CO2 condenses at its saturation pressure;
with air in it, the whole gas turns liquid only at its **bubble pressure**, higher than that; a
gas too lean in CO2 has no bubble point at the condenser's temperature (above the mixture's
critical line) and cannot be condensed whole at any pressure.

Model: the Peng & Robinson (1976) equation of state with the van der Waals one-fluid mixing rule
and one interaction parameter, for the binary CO2 + N2 (every gas other than CO2 is taken as
nitrogen: oxygen and argon have nearly the same critical constants and behave alike here).
Bubble point by successive substitution on the fugacity ratios (Michelsen & Mollerup,
*Thermodynamic Models: Fundamentals & Computational Aspects*, 2007, ch. 12). Critical constants
and acentric factors are CoolProp's (Span & Wagner 1996 for CO2, Span et al. 2000 for N2).

The result is scaled so that pure CO2 gives Span & Wagner's saturation pressure exactly:
``P_bubble = P_sat,SW(T) * P_bubble,PR(x, T) / P_sat,PR(T)``.

Valid range: CO2's triple point to its critical point, CO2 mole fraction 0.8-1; within 4 % of
GERG-2008 from -30 to 25 degC, about 10 % low near -50 degC (the interaction parameter is fitted
above -30 degC). Near the mixture's critical line (bubble
pressures above about 70 bar) the model may find no bubble point where GERG-2008 has one: such a
gas is then taken as not condensable, the cautious side. Checked against the GERG-2008 mixture model (Kunz & Wagner 2012, J. Chem. Eng. Data 57, 3032;
through CoolProp) in ``tests/thermo/test_condensing.py``.
"""

from __future__ import annotations

import math
from dataclasses import dataclass
from functools import lru_cache

from co2routes.thermo.constants import R
from co2routes.thermo.errors import InputError

#: Peng-Robinson interaction parameter k_ij of CO2 + N2 [-]: chosen in this project on a 0.01 grid
#: against GERG-2008 bubble pressures (through CoolProp) at 243-290 K and 80-99.9 % CO2: -0.01
#: gives 1.9 % root-mean-square and 4.1 % at most (``tests/thermo/test_condensing.py`` checks
#: it); published Peng-Robinson values of about -0.02 to 0 (from memory) bracket it.
KIJ_CO2_N2 = -0.01

#: Condenser temperatures the model accepts [K]: CO2's triple point to its critical point (it is
#: checked against GERG-2008 from 243 to 290 K).
T_MIN_K, T_MAX_K = 216.592, 304.1282


@dataclass(frozen=True, slots=True)
class BubblePoint:
    """Where a CO2 + air liquid of the gas's composition starts to boil.

    ``pressure_pa`` is ``None`` when there is no bubble point at this temperature (the gas is too
    lean in CO2 to be condensed whole at any pressure); ``vapour_co2_fraction`` is the CO2 mole
    fraction of the first vapour (what a vent at that pressure carries away).
    """

    co2_fraction: float
    temperature_k: float
    pressure_pa: float | None
    vapour_co2_fraction: float | None


@lru_cache(maxsize=1)
def _constants() -> tuple[tuple[float, float, float], tuple[float, float, float]]:
    """(Tc [K], Pc [Pa], acentric factor) of CO2 and N2 from CoolProp."""
    import CoolProp.CoolProp as CP

    return tuple((CP.PropsSI("Tcrit", f), CP.PropsSI("pcrit", f), CP.PropsSI("acentric", f))
                 for f in ("CO2", "Nitrogen"))


def _pure_ab(temperature_k: float) -> tuple[list[float], list[float]]:
    """Peng & Robinson (1976) a_i(T) [Pa m6/mol2] and b_i [m3/mol]."""
    a, b = [], []
    for tc, pc, w in _constants():
        m = 0.37464 + 1.54226 * w - 0.26992 * w * w
        alpha = (1.0 + m * (1.0 - math.sqrt(temperature_k / tc))) ** 2
        a.append(0.45724 * (R * tc) ** 2 / pc * alpha)
        b.append(0.07780 * R * tc / pc)
    return a, b


def _cubic_roots(c2: float, c1: float, c0: float) -> list[float]:
    """Real roots of Z^3 + c2 Z^2 + c1 Z + c0 = 0 (trigonometric / Cardano)."""
    q = (3.0 * c1 - c2 * c2) / 9.0
    r = (9.0 * c2 * c1 - 27.0 * c0 - 2.0 * c2 ** 3) / 54.0
    disc = q ** 3 + r * r
    if disc > 0.0:
        s = math.copysign(abs(r + math.sqrt(disc)) ** (1.0 / 3.0), r + math.sqrt(disc))
        t = math.copysign(abs(r - math.sqrt(disc)) ** (1.0 / 3.0), r - math.sqrt(disc))
        return [s + t - c2 / 3.0]
    theta = math.acos(max(-1.0, min(1.0, r / math.sqrt(-q ** 3)))) if q < 0.0 else 0.0
    k = 2.0 * math.sqrt(-q) if q < 0.0 else 0.0
    return [k * math.cos((theta + 2.0 * math.pi * i) / 3.0) - c2 / 3.0 for i in range(3)]


def _ln_phi(x: tuple[float, float], temperature_k: float, pressure_pa: float, liquid: bool,
            kij: float) -> tuple[float, float, float]:
    """ln fugacity coefficients of CO2 and N2 in a phase of composition ``x`` (Peng & Robinson
    1976, eq. 15, with the van der Waals mixing rule), and the phase's compressibility factor."""
    a, b = _pure_ab(temperature_k)
    a12 = math.sqrt(a[0] * a[1]) * (1.0 - kij)
    aij = ((a[0], a12), (a12, a[1]))
    am = sum(x[i] * x[j] * aij[i][j] for i in range(2) for j in range(2))
    bm = x[0] * b[0] + x[1] * b[1]
    rt = R * temperature_k
    big_a, big_b = am * pressure_pa / rt ** 2, bm * pressure_pa / rt
    roots = [z for z in _cubic_roots(-(1.0 - big_b), big_a - 3.0 * big_b ** 2 - 2.0 * big_b,
                                     -(big_a * big_b - big_b ** 2 - big_b ** 3)) if z > big_b]
    z = min(roots) if liquid else max(roots)
    s2 = math.sqrt(2.0)
    log_term = math.log((z + (1.0 + s2) * big_b) / (z + (1.0 - s2) * big_b))
    out = []
    for i in range(2):
        share = 2.0 * (x[0] * aij[i][0] + x[1] * aij[i][1]) / am
        out.append(b[i] / bm * (z - 1.0) - math.log(z - big_b)
                   - big_a / (2.0 * s2 * big_b) * (share - b[i] / bm) * log_term)
    return out[0], out[1], z


def _incipient(x: tuple[float, float], temperature_k: float, pressure_pa: float,
               kij: float) -> tuple[float, float] | None:
    """(sum of K_i x_i, vapour CO2 fraction) of the first vapour over liquid ``x`` at a pressure,
    by successive substitution on y; ``None`` when it falls to the trivial solution y = x."""
    y0 = min(0.999, x[0] * 0.5) if x[1] > 0.0 else 1.0
    y = (y0, 1.0 - y0)
    total = 1.0
    for _ in range(200):
        ln_l = _ln_phi(x, temperature_k, pressure_pa, True, kij)
        ln_v = _ln_phi(y, temperature_k, pressure_pa, False, kij)
        kx = (math.exp(ln_l[0] - ln_v[0]) * x[0], math.exp(ln_l[1] - ln_v[1]) * x[1])
        total = kx[0] + kx[1]
        y_new = (kx[0] / total, kx[1] / total)
        done = abs(y_new[0] - y[0]) < 1e-11
        y = y_new
        if done:
            break
    if abs(y[0] - x[0]) < 1e-4 if x[1] > 0.0 else abs(ln_l[2] - ln_v[2]) < 1e-9:
        return None  # the same phase twice: one root of the cubic serves both
    return total, y[0]


def _pr_bubble(co2_fraction: float, temperature_k: float, kij: float,
               start_pa: float | None = None) -> tuple[float, float] | None:
    """(pressure [Pa], vapour CO2 fraction) of the Peng-Robinson bubble point, or ``None``.

    The lowest pressure where the first vapour's sum of K_i x_i is 1 (Michelsen & Mollerup 2007,
    ch. 12): stepped up from below the pure fluid's saturation pressure to the first sign change,
    then bisected; the trivial solution or no change below 200 bar means no bubble point.
    """
    tc, pc, w = _constants()[0]
    x = (co2_fraction, 1.0 - co2_fraction)
    # below the bubble point the first vapour is richer than it can be: sum K x > 1
    # start just below the pure fluid's saturation pressure (Lee-Kesler's estimate, within a few
    # per cent here); step down while the start is already above the bubble point
    # A mixture starts from the pure fluid's saturation pressure (``start_pa``; its bubble point
    # lies above it): near the critical point a liquid of the mixture's composition exists only
    # close to its bubble point, so the start creeps up until one does.
    # The pure fluid starts from Lee & Kesler's estimate and steps down until it is below its
    # saturation pressure (there the liquid's fugacity exceeds the vapour's: sum K x > 1).
    p_lo = start_pa or pc * 10.0 ** (7.0 / 3.0 * (1.0 + w) * (1.0 - tc / temperature_k))
    lo = _incipient(x, temperature_k, p_lo, kij)
    for _ in range(60):
        if lo is not None and lo[0] > 1.0:
            break
        p_lo *= 1.005 if start_pa else 0.995
        lo = _incipient(x, temperature_k, p_lo, kij)
    if lo is None or lo[0] <= 1.0:
        return None
    step = 1.05
    while True:
        p_hi = p_lo * step
        if p_hi > 2.0e7:
            return None
        hi = _incipient(x, temperature_k, p_hi, kij)
        if hi is None:
            # past the mixture's critical line: step shorter from the last good pressure, since
            # near it the bubble point lies just below where one phase begins
            if step < 1.0001:
                return None
            step = math.sqrt(step)
            continue
        if hi[0] < 1.0:
            break
        p_lo, lo = p_hi, hi
    for _ in range(40):
        mid = math.sqrt(p_lo * p_hi)
        got = _incipient(x, temperature_k, mid, kij)
        if got is None:
            return None
        if got[0] > 1.0:
            p_lo, lo = mid, got
        else:
            p_hi, hi = mid, got
    return math.sqrt(p_lo * p_hi), hi[1]


@lru_cache(maxsize=256)
def bubble_point(co2_fraction: float, temperature_k: float, kij: float = KIJ_CO2_N2) -> BubblePoint:
    """The bubble point of a CO2 + air liquid with the gas's CO2 mole fraction at a temperature.

    See the module notes for the model and its range. Raises :class:`InputError` for a fraction
    outside 0-1 or a temperature outside CO2's liquid range (216.6-304.1 K).

    >>> round(bubble_point(1.0, 273.15).pressure_pa / 1e5, 2)   # Span & Wagner: 34.85 bar
    34.85
    >>> bp = bubble_point(0.98, 273.15)
    >>> round(bp.pressure_pa / 1e5), round(bp.vapour_co2_fraction, 2)
    (45, 0.85)
    >>> bubble_point(0.30, 273.15).pressure_pa is None          # too lean to condense whole
    True
    """
    if not 0.0 < co2_fraction <= 1.0:
        raise InputError("CO2 fraction", "must be above 0 and at most 1", got=co2_fraction)
    if not T_MIN_K <= temperature_k <= T_MAX_K:
        raise InputError("condensing temperature", f"must be from {T_MIN_K - 273.15:.1f} to "
                         f"{T_MAX_K - 273.15:.1f} degC (CO2's triple and critical points)",
                         got=f"{temperature_k - 273.15:.1f} degC")
    from co2routes.thermo.co2 import saturation_at_temperature

    p_sat = saturation_at_temperature(temperature_k).pressure_pa
    if co2_fraction == 1.0:
        return BubblePoint(1.0, temperature_k, p_sat, 1.0)
    pure = _pr_bubble(1.0, temperature_k, kij)
    mixed = None if pure is None else _pr_bubble(co2_fraction, temperature_k, kij, pure[0] * (1.0 + 1e-9))
    if pure is None or mixed is None:
        return BubblePoint(co2_fraction, temperature_k, None, None)
    return BubblePoint(co2_fraction, temperature_k, p_sat * mixed[0] / pure[0], mixed[1])

"""The least work that can pull CO2 out of a gas mixture, and the real work at a stated efficiency.

Separating an ideal gas mixture at constant temperature and pressure costs at least the Gibbs
energy of mixing that is undone. For a binary feed (CO2 at mole fraction y in everything else)
split into pure CO2 and a CO2-lean residue, per mole of CO2 recovered:

    W_min = R T [ (1 - c y) g(y_r) - g(y) ] / (c y),   g(x) = x ln x + (1 - x) ln(1 - x),

with c the fraction of the CO2 recovered and y_r = y (1 - c) / (1 - c y) the residue's CO2.
For full recovery (c = 1) it reduces to W_min = -R T [ ln y + (1 - y)/y ln(1 - y) ].

Sources: House, K. Z. et al. (2011) "Economic and energetic analysis of capturing CO2 from
ambient air", PNAS 108, 20428-20433 (minimum work and second-law efficiency, the ratio of the
minimum to the work actually spent); Wilcox, J. (2012) *Carbon Capture*, Springer, ch. 2
(thermodynamics of separation).
"""

from __future__ import annotations

import math

from co2routes.thermo.constants import R
from co2routes.thermo.errors import InputError, require_fraction



def _g(x: float) -> float:
    """x ln x + (1 - x) ln(1 - x), with 0 ln 0 = 0."""
    out = 0.0
    if x > 0.0:
        out += x * math.log(x)
    if x < 1.0:
        out += (1.0 - x) * math.log(1.0 - x)
    return out


def minimum_separation_work(co2_fraction: float, temperature_k: float,
                            capture_fraction: float = 1.0) -> float:
    """Least work to recover pure CO2 from an ideal binary gas mixture [J per mol CO2].

    W_min = R T [ (1 - c y) g(y_r) - g(y) ] / (c y), g(x) = x ln x + (1 - x) ln(1 - x),
    y_r = y (1 - c) / (1 - c y); for c = 1, W_min = -R T [ ln y + (1 - y)/y ln(1 - y) ].

    Parameters
    ----------
    co2_fraction : float
        CO2 mole fraction of the feed gas, y, 0 < y < 1.
    temperature_k : float
        Temperature of feed and products [K], above 0.
    capture_fraction : float
        Fraction of the feed's CO2 recovered, c, 0 < c <= 1.

    Valid for ideal gases at one temperature and pressure with a pure CO2 product (the feed's
    other gases lumped as one). Sources: House et al. (2011) PNAS 108, 20428; Wilcox (2012)
    *Carbon Capture*, ch. 2.

    >>> round(minimum_separation_work(425e-6, 298.15) / 1000, 2)     # from air
    21.72
    >>> round(minimum_separation_work(0.1175, 298.15) / 1000, 2)     # from methane flue gas
    7.63
    """
    y = float(co2_fraction)
    if not (0.0 < y < 1.0):
        raise InputError("CO2 fraction", "must lie between 0 and 1 (exclusive)", got=y)
    if not (temperature_k > 0.0) or not math.isfinite(temperature_k):
        raise InputError("temperature", "must be a finite temperature above 0 K", got=temperature_k)
    c = require_fraction("capture fraction", capture_fraction)
    y_r = y * (1.0 - c) / (1.0 - c * y)
    return R * temperature_k * ((1.0 - c * y) * _g(y_r) - _g(y)) / (c * y)


def separation_work(co2_fraction: float, temperature_k: float, capture_fraction: float,
                    second_law_efficiency: float) -> float:
    """Work actually spent separating CO2 at a second-law efficiency [J per mol CO2].

    W = W_min / eta_II, eta_II the ratio of minimum to actual work (House et al. 2011).

    Parameters
    ----------
    co2_fraction, temperature_k, capture_fraction :
        As :func:`minimum_separation_work`.
    second_law_efficiency : float
        eta_II, 0 < eta_II <= 1. House et al. (2011) find a few per cent to about 50 % for
        working separation plants, lower the more dilute the feed.

    >>> round(separation_work(0.5, 300.0, 1.0, 0.25) / (8 * 8.314462618 * 300.0 * math.log(2)), 6)
    1.0
    """
    eta = require_fraction("second-law efficiency", second_law_efficiency)
    return minimum_separation_work(co2_fraction, temperature_k, capture_fraction) / eta

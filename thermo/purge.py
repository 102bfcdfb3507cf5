"""Purging a headspace: the CO2 spent before the gas leaving a vessel is pure enough to collect.

A vessel's headspace V_h starts full of air. Gas fed into it (CO2 from a fermentation, or from a
cylinder to flush a keg) mixes with what is there and an equal volume leaves. For a perfectly
mixed headspace (a continuous stirred tank) the outlet's CO2 fraction after a fed volume V is the
exponential washout

    y(V) = 1 - exp(-V / V_h)

(the step response of a well-mixed vessel: Danckwerts 1953, "Continuous flow systems:
distribution of residence times", Chem. Eng. Sci. 2, 1-13; Levenspiel 1999, Chemical Reaction
Engineering, 3rd ed., ch. 11). Reaching a purity y* therefore takes V = V_h ln(1 / (1 - y*)). All
that CO2 is lost to the collector: part of it vented, the rest (y* V_h) left in the headspace.
After the switch the headspace's CO2 rises on from y* to 1, and that (1 - y*) V_h also stays in
the vessel when the fermentation ends.

Valid for a headspace stirred by the rising gas (a fermenter) or a flushed keg; a plug-flow
purge (gas displacing air without mixing) needs less, about V_h: the well-mixed figure is the
conservative one. Volumes at the headspace's temperature and pressure; ideal gas.
"""

from __future__ import annotations

import math
from dataclasses import dataclass

from co2routes.thermo.errors import InputError, require_positive

#: Molar mass of CO2 [kg/mol]; molar gas constant [J/(mol K)] (CODATA 2018).
CO2_MOLAR_MASS = 0.0440095
R = 8.314462618


@dataclass(frozen=True, slots=True)
class PurgeLoss:
    """CO2 a headspace costs the collector [kg] (see the module notes).

    ``fed_before_switch_kg`` = CO2 fed until the outlet reaches the purity (vented plus held);
    ``vented_kg`` the part of it that left the vessel; ``held_after_kg`` the (1 - y*) V_h that fills
    the headspace after the switch; ``lost_kg`` their total, fed before the switch plus held after.
    """

    headspace_m3: float
    purity: float
    purge_volumes: float
    fed_before_switch_kg: float
    vented_kg: float
    held_after_kg: float
    lost_kg: float


def outlet_purity(fed_volume_m3: float, headspace_m3: float) -> float:
    """CO2 fraction leaving a well-mixed headspace after ``fed_volume_m3`` of CO2 went in.

    y = 1 - exp(-V / V_h) (Danckwerts 1953).

    >>> round(outlet_purity(1.0, 1.0), 4), round(outlet_purity(4.605, 1.0), 4)
    (0.6321, 0.99)
    """
    if fed_volume_m3 < 0.0:
        raise InputError("fed volume", "must be 0 or more", got=fed_volume_m3)
    return 1.0 - math.exp(-fed_volume_m3 / require_positive("headspace", headspace_m3))


def purge_volumes(purity: float) -> float:
    """Headspace volumes of CO2 to feed before the outlet reaches ``purity``: ln(1 / (1 - y*)).

    Parameters
    ----------
    purity : float
        CO2 fraction wanted at the outlet, 0 to 0.9999 [-].

    >>> round(purge_volumes(0.99), 3), round(purge_volumes(0.0), 3)
    (4.605, 0.0)
    """
    if not 0.0 <= purity <= 0.9999:
        raise InputError("purity", "must be from 0 to 99.99 %", got=purity)
    return math.log(1.0 / (1.0 - purity))


def purge_loss(headspace_m3: float, purity: float, temperature_k: float,
               pressure_pa: float = 101325.0) -> PurgeLoss:
    """CO2 a headspace takes from the collector: washout to ``purity`` plus filling after it.

    fed = V_h ln(1/(1 - y*)) rho, vented = fed - y* V_h rho, held after = (1 - y*) V_h rho,
    lost = fed + held after; rho = P M / (R T) (ideal gas).

    Parameters
    ----------
    headspace_m3 : float
        Headspace volume [m3] (0 gives no loss).
    purity : float
        CO2 fraction at which the gas starts to be collected [-].
    temperature_k, pressure_pa : float
        Headspace temperature [K] and pressure [Pa].

    Source: exponential washout of a well-mixed vessel (Danckwerts 1953).

    >>> p = purge_loss(0.05, 0.99, 293.15)
    >>> round(p.fed_before_switch_kg, 4), round(p.vented_kg, 4), round(p.lost_kg, 4)
    (0.4213, 0.3307, 0.4222)
    """
    if headspace_m3 < 0.0:
        raise InputError("headspace", "must be 0 or more", got=headspace_m3)
    rho = require_positive("pressure", pressure_pa) * CO2_MOLAR_MASS / (R * require_positive("temperature", temperature_k))
    n_vol = purge_volumes(purity)
    fed = headspace_m3 * n_vol * rho
    held_at_switch = purity * headspace_m3 * rho
    held_after = (1.0 - purity) * headspace_m3 * rho
    return PurgeLoss(headspace_m3, purity, n_vol, fed, fed - held_at_switch, held_after, fed + held_after)

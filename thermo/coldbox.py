"""Cooling with dry ice: the ice an insulated box needs over a time, and the ice a load needs to chill.

The box's heat leak is the one of :func:`co2routes.thermo.dryice.storage_loss`, Q = U A (T_out -
T_s), with the ice at its 1 atm sublimation point T_s = 194.686 K (Span & Wagner 1996) and the
sublimation enthalpy at 1 atm Delta H_sub = 573.3 kJ/kg (Giauque & Egan 1937, J. Chem. Phys. 5,
45; :data:`co2routes.thermo.flash.SUBLIMATION_ENTHALPY_J_KG`). A wall given as a thickness L of
insulation of conductivity k has U = k / L (conduction only; the air films on both faces are left
out, which over-states U a little for foam walls and so errs towards more ice).

A load chilled from T_1 to T_2 takes m c_p (T_1 - T_2) from the ice. Only the sublimation is
counted: the cold gas leaving the box takes some more heat as it warms, so the figure errs towards
more ice (the gas could take about 0.85 kJ/(kg K) x (T_out - T_s), 15 % more at 20 degC, if it
left at the outside temperature).

Valid for a closed (vented, never sealed) box at 1 atm with the ice spread so that the inside
stays near the ice's temperature; steady heat leak.
"""

from __future__ import annotations

from dataclasses import dataclass

from co2routes.thermo.errors import InputError, require_positive


@dataclass(frozen=True, slots=True)
class ColdBox:
    """Dry ice [kg] for a box over a time and for chilling a load, and the box's heat leak [W]."""

    heat_leak_w: float
    box_ice_kg: float
    load_heat_j: float
    load_ice_kg: float
    total_kg: float
    sublimation_enthalpy_j_kg: float


def wall_u(thickness_m: float, conductivity_w_m_k: float) -> float:
    """Heat-transfer coefficient of an insulating wall, U = k / L [W/(m2 K)] (conduction only).

    Fourier's law through a plane wall (Incropera & DeWitt, Fundamentals of Heat and Mass
    Transfer, ch. 3). Expanded polystyrene is about 0.033-0.038 W/(m K) (common practice).

    >>> round(wall_u(0.05, 0.035), 3)
    0.7
    """
    return require_positive("wall conductivity", conductivity_w_m_k) / require_positive("wall thickness", thickness_m)


def load_heat_j(mass_kg: float, heat_capacity_j_kg_k: float, start_k: float, end_k: float) -> float:
    """Heat to take from a load to chill it from ``start_k`` to ``end_k``: m c_p (T_1 - T_2) [J].

    >>> load_heat_j(10.0, 4180.0, 293.15, 278.15)
    627000.0
    """
    from co2routes.thermo.co2 import NORMAL_SUBLIMATION_K

    require_positive("load mass", mass_kg)
    require_positive("load heat capacity", heat_capacity_j_kg_k)
    if end_k > start_k:
        raise InputError("load end temperature", "must not be above its start temperature: dry ice "
                         "only cools", got=f"{end_k - 273.15:.1f} degC")
    if end_k <= NORMAL_SUBLIMATION_K:
        raise InputError("load end temperature", "must be above -78.5 degC, the temperature of dry "
                         "ice at 1 atm", got=f"{end_k - 273.15:.1f} degC")
    return mass_kg * heat_capacity_j_kg_k * (start_k - end_k)


def dry_ice_needed(hold_time_s: float, *, area_m2: float | None = None, u_w_m2_k: float | None = None,
                   outside_k: float = 293.15, load_j: float = 0.0) -> ColdBox:
    """Dry ice for a box held a time at an outside temperature, plus a load's heat.

    m = (U A (T_out - T_s) t + Q_load) / Delta H_sub, with the box's leak from
    :func:`co2routes.thermo.dryice.storage_loss` (no box: area and U both ``None``).

    Parameters
    ----------
    hold_time_s : float
        Time the box is kept cold [s] (0 for a load alone).
    area_m2, u_w_m2_k : float or None
        Box surface area [m2] and wall coefficient [W/(m2 K)].
    outside_k : float
        Air around the box [K], above the ice's -78.5 degC.
    load_j : float
        Heat taken from a load [J] (:func:`load_heat_j`).

    >>> b = dry_ice_needed(86400.0, area_m2=1.0, u_w_m2_k=0.5)
    >>> round(b.heat_leak_w, 2), round(b.box_ice_kg, 2)
    (49.23, 7.42)
    """
    from co2routes.thermo import dryice, flash

    dh = flash.SUBLIMATION_ENTHALPY_J_KG
    if hold_time_s < 0.0 or load_j < 0.0:
        raise InputError("time" if hold_time_s < 0.0 else "load", "must be 0 or more")
    leak = box = 0.0
    if area_m2 is not None or u_w_m2_k is not None:
        if area_m2 is None or u_w_m2_k is None:
            raise InputError("box area" if area_m2 is None else "box U", "is needed with the other")
        loss = dryice.storage_loss(area_m2, u_w_m2_k, outside_k)
        leak, box = loss.heat_leak_w, loss.loss_rate_kg_s * hold_time_s
    elif load_j == 0.0:
        raise InputError("box area", "give a box (area and U) or a load to chill")
    load_ice = load_j / dh
    return ColdBox(leak, box, load_j, load_ice, box + load_ice, dh)

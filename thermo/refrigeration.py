"""Refrigeration for condensing CO2 below the site's temperature: a vapour-compression cycle.

The ideal single-stage cycle with a real compressor (Moran & Shapiro, *Fundamentals of
Engineering Thermodynamics*, 5th ed. 2006, sec. 10.2-10.3):

1. saturated vapour leaves the evaporator at T_evap = T_cold - approach_evap;
2. the compressor raises it to the condensing pressure P_cond = P_sat(T_hot + approach_cond),
   h2 = h1 + (h2s - h1) / eta_is with h2s at (P_cond, s1);
3. saturated liquid leaves the condenser at P_cond;
4. the valve throttles it, h4 = h3.

COP = (h1 - h4) / (h2 - h1); the Carnot bound is T_evap / (T_cond - T_evap) with T_cond the
refrigerant's condensing temperature, and the cycle's COP always lies between 0 and it.
Refrigerant properties from CoolProp (Bell et al. 2014) by its fluid name (``R134a``,
``R290``, ``R744`` ...).

The CO2 side (:func:`co2_refrigeration_duty`): the compressed gas is first cooled to the site's
temperature in an ambient aftercooler (no refrigeration; common practice), so the refrigerated
condenser removes h(P_cond, T_site) - h_liquid(P_cond) per kg (Span & Wagner 1996 through
CoolProp); none when the CO2 condenses at or above the site's temperature.
"""

from __future__ import annotations

from dataclasses import dataclass

from co2routes.thermo._lazy import coolprop
from co2routes.thermo.errors import InputError

#: Temperature approaches [K] of the evaporator (below the cold side) and the air-cooled
#: condenser (above the site): 5 K and 10 K are common practice for small packaged chillers.
EVAPORATOR_APPROACH_K = 5.0
CONDENSER_APPROACH_K = 10.0
#: Isentropic efficiency of a small hermetic refrigeration compressor (common practice 0.6-0.75).
COMPRESSOR_EFFICIENCY = 0.65
#: Default refrigerant (CoolProp fluid name): R134a, common in small chillers.
REFRIGERANT = "R134a"


@dataclass(frozen=True, slots=True)
class CycleResult:
    """A vapour-compression cycle: state enthalpies [J/kg], pressures [Pa], temperatures [K], COP."""

    refrigerant: str
    evaporating_temperature_k: float
    condensing_temperature_k: float
    evaporating_pressure_pa: float
    condensing_pressure_pa: float
    h1_j_per_kg: float
    h2_j_per_kg: float
    h3_j_per_kg: float
    h4_j_per_kg: float
    discharge_temperature_k: float
    cop: float
    carnot_cop: float


def vapour_compression(cold_k: float, hot_k: float, refrigerant: str = REFRIGERANT, *,
                       evaporator_approach_k: float = EVAPORATOR_APPROACH_K,
                       condenser_approach_k: float = CONDENSER_APPROACH_K,
                       efficiency: float = COMPRESSOR_EFFICIENCY) -> CycleResult:
    """One vapour-compression cycle taking heat at ``cold_k`` and rejecting it at ``hot_k`` [K].

    COP = (h1 - h4) / (h2 - h1), h2 = h1 + (h2s - h1)/eta (Moran & Shapiro 2006, sec. 10.2);
    valid while the condensing temperature stays below the refrigerant's critical point and the
    evaporator above its triple point. Units: K, J/kg, Pa.

    >>> c = vapour_compression(268.15, 293.15)
    >>> 0 < c.cop < c.carnot_cop, round(c.carnot_cop, 2)
    (True, 6.58)
    """
    if not 0.0 < efficiency <= 1.0:
        raise InputError("refrigeration efficiency", "must be in (0, 100 %]", got=efficiency)
    cp = coolprop()
    t_e = cold_k - evaporator_approach_k
    t_c = hot_k + condenser_approach_k
    try:
        t_crit = cp.PropsSI("Tcrit", refrigerant)
        t_min = cp.PropsSI("Tmin", refrigerant)
    except ValueError:
        raise InputError("plant.refrigerant", "must be a fluid CoolProp knows, e.g. R134a, R290, R717",
                         got=repr(refrigerant)) from None
    if not (t_min < t_e < t_c < t_crit - 2.0):
        raise InputError("plant.refrigerant", f"{refrigerant} cannot run between "
                         f"{t_e - 273.15:.1f} degC and {t_c - 273.15:.1f} degC (its critical point is "
                         f"{t_crit - 273.15:.1f} degC)", got=refrigerant)
    p_e = cp.PropsSI("P", "T", t_e, "Q", 1.0, refrigerant)
    p_c = cp.PropsSI("P", "T", t_c, "Q", 0.0, refrigerant)
    h1 = cp.PropsSI("H", "T", t_e, "Q", 1.0, refrigerant)
    s1 = cp.PropsSI("S", "T", t_e, "Q", 1.0, refrigerant)
    h2s = cp.PropsSI("H", "P", p_c, "S", s1, refrigerant)
    h2 = h1 + (h2s - h1) / efficiency
    h3 = cp.PropsSI("H", "T", t_c, "Q", 0.0, refrigerant)
    t2 = cp.PropsSI("T", "P", p_c, "H", h2, refrigerant)
    return CycleResult(refrigerant, t_e, t_c, p_e, p_c, h1, h2, h3, h3, t2,
                       (h1 - h3) / (h2 - h1), t_e / (t_c - t_e))


def co2_refrigeration_duty(condensing_temperature_k: float, site_temperature_k: float) -> float:
    """Heat to remove below the site's temperature per kg of CO2 condensed [J/kg].

    q = h(P_sat(T_cond), T_site) - h_liquid(T_cond) when T_cond < T_site, else 0 (the ambient
    aftercooler and condenser do it all). CO2 properties: Span & Wagner (1996) through CoolProp.

    >>> round(co2_refrigeration_duty(273.15, 293.15) / 1e3)
    261
    >>> co2_refrigeration_duty(288.15, 283.15)
    0.0
    """
    if condensing_temperature_k >= site_temperature_k:
        return 0.0
    cp = coolprop()
    p = cp.PropsSI("P", "T", condensing_temperature_k, "Q", 0.0, "CO2")
    h_gas = cp.PropsSI("H", "P", p, "T", site_temperature_k, "CO2")
    return h_gas - cp.PropsSI("H", "T", condensing_temperature_k, "Q", 0.0, "CO2")


def refrigeration_work_j_per_kg(condensing_temperature_k: float, site_temperature_k: float,
                                refrigerant: str = REFRIGERANT, **cycle) -> float:
    """Chiller shaft work per kg of CO2 condensed [J/kg]: duty / COP, 0 when the CO2 condenses
    at or above the site's temperature (:func:`co2_refrigeration_duty`, :func:`vapour_compression`;
    ``cycle`` passes the approaches and efficiency).

    >>> refrigeration_work_j_per_kg(293.15, 293.15)
    0.0
    >>> round(refrigeration_work_j_per_kg(273.15, 293.15) / 1e3)
    62
    """
    duty = co2_refrigeration_duty(condensing_temperature_k, site_temperature_k)
    if duty <= 0.0:
        return 0.0
    return duty / vapour_compression(condensing_temperature_k, site_temperature_k, refrigerant, **cycle).cop

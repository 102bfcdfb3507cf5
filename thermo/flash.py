"""Liquid CO2 released to the atmosphere: how much becomes dry ice ("snow") and how much gas.

A saturated liquid at T (or at its pressure) expands through a valve to 1 atm. With no heat
exchange and negligible kinetic energy the enthalpy is conserved, and the products are solid
and vapour at the normal sublimation point T_s = 194.686 K:

    h_liquid(T) = x h_solid(T_s) + (1 - x) h_vapour(T_s, 1 atm)

so the solid mass fraction is x = (h_vapour(T_s) - h_liquid(T)) / Delta H_sub.

Data and the bridge below the triple point:

* h_liquid from the Span & Wagner (1996) equation (CoolProp, saturated liquid).
* CoolProp's equation of state stops at the triple point (216.592 K). The vapour at 1 atm is taken
  from the equation at 216.592 K and 1 atm (a real-gas value), then carried down to 194.686 K at
  constant pressure with the *ideal-gas* heat capacity cp0(T) of the same Span & Wagner equation
  (CoolProp ``cp0mass``, a function of temperature only):
  h_vapour(T_s) = h(216.592 K, 1 atm) - integral from T_s to T_t of cp0 dT (8-point Gauss-Legendre).
  The change of the residual (real-gas) enthalpy over that span is neglected: extrapolating the
  equation itself puts it at about -0.7 kJ/kg, i.e. about 0.001 in x.
* h_solid(T_s) = h_vapour(T_s) - Delta H_sub with Delta H_sub = 25.23 kJ/mol = 573.3 kJ/kg at
  194.67 K and 1 atm (Giauque, W. F.; Egan, C. J. (1937) "Carbon Dioxide. The Heat Capacity and
  Vapor Pressure of the Solid. The Heat of Sublimation...", J. Chem. Phys. 5, 45).
"""

from __future__ import annotations

from dataclasses import dataclass
from functools import lru_cache

from co2routes.thermo.co2 import (
    ATMOSPHERE_PA,
    NORMAL_SUBLIMATION_K,
    TRIPLE_TEMPERATURE_K,
    saturation_at_pressure,
    saturation_at_temperature,
)
from co2routes.thermo.errors import require_positive

#: Enthalpy of sublimation of CO2 at 194.67 K and 1 atm [J/kg] (Giauque & Egan 1937:
#: 25.23 kJ/mol, divided by 44.0095 g/mol).
SUBLIMATION_ENTHALPY_J_KG = 573.3e3


@dataclass(frozen=True, slots=True)
class FlashResult:
    """Saturated liquid CO2 released to 1 atm.

    ``liquid_temperature_k`` [K] and ``liquid_pressure_pa`` [Pa] of the saturated liquid;
    ``solid_fraction`` mass fraction that becomes dry ice (0-1); ``solid_mass_kg`` and
    ``vapor_mass_kg`` [kg] for the given liquid mass (``None`` when no mass was given);
    ``solid_temperature_k`` [K] where the snow and gas leave (the 1 atm sublimation point).
    """

    liquid_temperature_k: float
    liquid_pressure_pa: float
    solid_fraction: float
    solid_mass_kg: float | None
    vapor_mass_kg: float | None
    solid_temperature_k: float = NORMAL_SUBLIMATION_K


@lru_cache(maxsize=1)
def vapor_enthalpy_at_sublimation_point() -> float:
    """Specific enthalpy of CO2 vapour at 194.686 K and 1 atm [J/kg], on CoolProp's scale.

    h_v(T_s) = h(T_t, 1 atm) - integral_{T_s}^{T_t} cp0(T) dT, with h(T_t, 1 atm) from the
    Span & Wagner (1996) equation and cp0 its ideal-gas heat capacity (8-point Gauss-Legendre).
    CoolProp's enthalpy reference for CO2 is the IIR one (200 kJ/kg for saturated liquid at 0 degC).

    Valid: 1 atm only. Source: Span & Wagner (1996) J. Phys. Chem. Ref. Data 25, 1509 (equation
    and its ideal-gas part); see the module notes for the neglected residual term.

    >>> round(vapor_enthalpy_at_sublimation_point() / 1e3, 1)
    423.3
    """
    import numpy as np

    from co2routes.thermo._lazy import coolprop

    cp = coolprop()
    state = cp.AbstractState("HEOS", "CO2")
    state.update(cp.PT_INPUTS, ATMOSPHERE_PA, TRIPLE_TEMPERATURE_K + 1e-6)
    h_triple = state.hmass()
    nodes, weights = np.polynomial.legendre.leggauss(8)
    low, high = NORMAL_SUBLIMATION_K, TRIPLE_TEMPERATURE_K
    integral = 0.0
    for node, weight in zip(nodes, weights):
        t = float(0.5 * (high - low) * node + 0.5 * (high + low))
        state.update(cp.DmolarT_INPUTS, 1e-3, t)  # cp0 depends on T only; a near-zero density
        integral += float(weight) * state.cp0mass()
    integral *= 0.5 * (high - low)
    return h_triple - integral


def solid_fraction(liquid_temperature_k: float) -> float:
    """Mass fraction of saturated liquid CO2 at T that becomes dry ice when released to 1 atm.

    x = (h_v(194.686 K, 1 atm) - h_l,sat(T)) / Delta H_sub, Delta H_sub = 573.3 kJ/kg.

    Parameters
    ----------
    liquid_temperature_k : float
        Temperature of the saturated liquid [K], 216.592 to 304.1282 K.

    Raises
    ------
    InputError
        Below the triple point (no liquid) or above the critical point (no liquid).

    Sources: Span & Wagner (1996); Giauque & Egan (1937) J. Chem. Phys. 5, 45.

    >>> round(solid_fraction(273.15), 2)
    0.39
    """
    sat = saturation_at_temperature(liquid_temperature_k)
    return (vapor_enthalpy_at_sublimation_point() - sat.liquid_enthalpy_j_kg) / SUBLIMATION_ENTHALPY_J_KG


def _result(sat, liquid_mass_kg: float | None) -> FlashResult:
    x = (vapor_enthalpy_at_sublimation_point() - sat.liquid_enthalpy_j_kg) / SUBLIMATION_ENTHALPY_J_KG
    if liquid_mass_kg is None:
        return FlashResult(sat.temperature_k, sat.pressure_pa, x, None, None)
    m = require_positive("liquid mass", liquid_mass_kg)
    return FlashResult(sat.temperature_k, sat.pressure_pa, x, x * m, (1.0 - x) * m)


def flash_at_temperature(liquid_temperature_k: float,
                         liquid_mass_kg: float | None = None) -> FlashResult:
    """Release of saturated liquid CO2 at temperature T to 1 atm: dry ice and gas.

    x from :func:`solid_fraction`; solid mass x m, vapour mass (1 - x) m.

    Parameters
    ----------
    liquid_temperature_k : float
        Saturated liquid temperature [K], 216.592 to 304.1282 K.
    liquid_mass_kg : float, optional
        Liquid mass released [kg], above 0.

    Sources: Span & Wagner (1996); Giauque & Egan (1937).

    >>> r = flash_at_temperature(293.15, 10.0)
    >>> round(r.solid_fraction, 2), round(r.solid_mass_kg, 1)
    (0.29, 2.9)
    """
    return _result(saturation_at_temperature(liquid_temperature_k), liquid_mass_kg)


def flash_at_pressure(liquid_pressure_pa: float,
                      liquid_mass_kg: float | None = None) -> FlashResult:
    """Release of saturated liquid CO2 at pressure P to 1 atm: dry ice and gas.

    T = T_sat(P), then as :func:`flash_at_temperature`.

    Parameters
    ----------
    liquid_pressure_pa : float
        Saturation pressure of the liquid [Pa], 0.51795 to 7.3773 MPa.
    liquid_mass_kg : float, optional
        Liquid mass released [kg], above 0.

    Sources: Span & Wagner (1996); Giauque & Egan (1937).

    >>> round(flash_at_pressure(2.0e6).liquid_temperature_k - 273.15, 1)
    -19.5
    """
    return _result(saturation_at_pressure(liquid_pressure_pa), liquid_mass_kg)


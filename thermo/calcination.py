"""Equilibrium CO2 pressure over calcite and lime: CaCO3(s) <=> CaO(s) + CO2(g).

K(T) = exp(-dG(T) / (R T)) = p_CO2 / p0, with p0 = 1 bar (the standard pressure of the NASA
data) and dG(T) = g(CaO) + g(CO2) - g(CaCO3) from :mod:`co2routes.thermo.species` (NASA polynomials,
McBride, Zehe and Gordon 2002, NASA TP-2002-211556). Above this pressure of CO2 calcite is
stable; below it, it calcines.

Valid range: 700-1373.15 K (427-1100 degC). The NASA calcite polynomial ends at 1200 K; above it
calcite is carried on with a constant heat capacity, the polynomial's own cp at 1200 K
(130.57 J/(mol K)): h(T) = h(1200) + cp (T - 1200), s(T) = s(1200) + cp ln(T/1200). Over
1200-1373 K this changes dG by well under 1 kJ/mol for any cp from 125 to 135 J/(mol K). The
result agrees with the correlation of Stanmore & Gilot (2005) "Review - calcination and
carbonation of limestone during thermal cycling for CO2 sequestration", Fuel Process. Technol.
86, 1707: p = 4.137e12 exp(-20474/T) Pa, within 5 % at 600, 900 and 1100 degC, and with Baker
(1962) within 25 % (see tests). Pure, well-crystallised calcite; real limestone with impurities
and fine grain calcines at slightly different temperatures.

>>> round(calcination_temperature(101325.0).temperature_k, 1)
1167.2
"""

from __future__ import annotations

import math
from dataclasses import dataclass

from co2routes.thermo import species
from co2routes.thermo.constants import R
from co2routes.thermo.errors import InputError

P0 = 1e5  # Pa, standard pressure of the NASA data
T_MIN = 700.0  # K
T_MAX = 1373.15  # K (1100 degC), calcite extended above 1200 K
CALCITE_DATA_MAX_K = 1200.0  # K, end of the NASA calcite polynomial
EQUATION = "CaCO3(s) -> CaO(s) + CO2(g)"


@dataclass(frozen=True, slots=True)
class CalcinationPoint:
    """One point on the CaCO3/CaO/CO2 equilibrium line."""

    temperature_k: float
    """Temperature [K]."""
    co2_pressure_pa: float
    """Equilibrium partial pressure of CO2 [Pa]."""
    delta_g_j_per_mol: float
    """Standard Gibbs energy of CaCO3 -> CaO + CO2 at this temperature [J/mol]."""
    delta_h_j_per_mol: float
    """Standard enthalpy of the same reaction at this temperature [J/mol]."""


def delta_g(temperature: float) -> float:
    """Standard Gibbs energy of CaCO3(s) -> CaO(s) + CO2(g) [J/mol] at 1 bar.

    dG(T) = g_CaO(T) + g_CO2(T) - g_CaCO3(T), g = h - T s; calcite above 1200 K with the
    constant heat capacity of the module text.

    Parameters
    ----------
    temperature : float
        Temperature [K], 700-1373.15 K.

    Source: NASA polynomials through Cantera (McBride, Zehe and Gordon 2002).

    >>> round(delta_g(1000.0) / 1000, 1)
    24.1
    """
    _check_t(temperature)
    return (
        species.gibbs("CaO(s)", temperature)
        + species.gibbs("CO2(g)", temperature)
        - calcite_g_h(temperature)[0]
    )


def calcite_g_h(temperature: float) -> tuple[float, float]:
    """(g, h) of calcite [J/mol]: NASA to 1200 K, constant cp = cp(1200 K) above (module text).

    >>> round(calcite_g_h(1373.15)[1] / 1000, 1)
    -1082.4
    """
    if temperature <= CALCITE_DATA_MAX_K:
        return species.gibbs("CaCO3(s)", temperature), species.enthalpy("CaCO3(s)", temperature)
    t0 = CALCITE_DATA_MAX_K
    cp = float(species.cantera_species("CaCO3(s)").thermo.cp(t0)) / 1000.0
    h = species.enthalpy("CaCO3(s)", t0) + cp * (temperature - t0)
    s_ = species.entropy("CaCO3(s)", t0) + cp * math.log(temperature / t0)
    return h - temperature * s_, h


def co2_pressure_over_calcite(temperature: float) -> CalcinationPoint:
    """Equilibrium CO2 pressure over CaCO3/CaO at ``temperature``.

    p_CO2 = p0 exp(-dG(T) / (R T)), p0 = 1 bar.

    Parameters
    ----------
    temperature : float
        Temperature [K], 700-1373.15 K (raises InputError outside).

    Source: NASA polynomials (McBride et al. 2002); agrees with Baker (1962), J. Chem. Soc. 464,
    dG = 38,000 - 32.4 T cal/mol: 1 atm at 1167 K here against 1173 K there, pressures within
    about 10 % at 1000-1200 K (see tests).

    >>> round(co2_pressure_over_calcite(1000.0).co2_pressure_pa)
    5491
    """
    dg = delta_g(temperature)
    p = P0 * math.exp(-dg / (R * temperature))
    dh = (
        species.enthalpy("CaO(s)", temperature)
        + species.enthalpy("CO2(g)", temperature)
        - calcite_g_h(temperature)[1]
    )
    return CalcinationPoint(float(temperature), p, dg, dh)


def calcination_temperature(co2_pressure: float) -> CalcinationPoint:
    """Temperature at which calcite is in equilibrium with lime under ``co2_pressure`` of CO2.

    Solves p0 exp(-dG(T) / (R T)) = p_CO2 for T by bisection on ln p (monotonic in T: the
    reaction is endothermic), to 1e-6 K.

    Parameters
    ----------
    co2_pressure : float
        CO2 partial pressure [Pa], between the equilibrium pressures at 700 and 1373.15 K
        (about 0.0007 Pa to 13 bar).

    Source: as :func:`co2_pressure_over_calcite`.

    >>> round(calcination_temperature(101325.0).temperature_k - 273.15)
    894
    """
    if not (co2_pressure > 0.0) or not math.isfinite(co2_pressure):
        raise InputError("co2 pressure", "must be a finite pressure above zero", got=co2_pressure)
    target = math.log(co2_pressure)
    lo, hi = T_MIN, T_MAX
    p_lo = co2_pressure_over_calcite(lo).co2_pressure_pa
    p_hi = co2_pressure_over_calcite(hi).co2_pressure_pa
    if not (p_lo <= co2_pressure <= p_hi):
        raise InputError(
            "co2 pressure",
            f"must lie between {p_lo:.3g} Pa and {p_hi:.3g} Pa (equilibrium at {T_MIN:.0f}-"
            f"{T_MAX:.0f} K)",
            got=f"{co2_pressure:.4g} Pa",
        )
    for _ in range(80):
        mid = 0.5 * (lo + hi)
        if math.log(co2_pressure_over_calcite(mid).co2_pressure_pa) < target:
            lo = mid
        else:
            hi = mid
        if hi - lo < 1e-6:
            break
    return co2_pressure_over_calcite(0.5 * (lo + hi))


def _check_t(temperature: float) -> None:
    if not (T_MIN <= temperature <= T_MAX):
        raise InputError(
            "temperature",
            f"must be {T_MIN:.0f}-{T_MAX:.0f} K ({T_MIN - 273.15:.0f}-{T_MAX - 273.15:.0f} degC), "
            "the range of the calcite data and their extension",
            got=f"{temperature:.2f} K",
        )

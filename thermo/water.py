"""Water in CO2: vapour pressure over liquid water and ice, dew and frost points, moisture content.

Over liquid water the IAPWS-95 formulation is used through CoolProp (Wagner, W.; Pruss, A. (2002)
"The IAPWS Formulation 1995 for the Thermodynamic Properties of Ordinary Water Substance for
General and Scientific Use", J. Phys. Chem. Ref. Data 31, 387). Over ice the equation of
Murphy, D. M.; Koop, T. (2005) "Review of the vapour pressures of ice and supercooled water for
atmospheric applications", Q. J. R. Meteorol. Soc. 131, 1539-1565, eq. 7, is used.

Mixture rules, stated once for every function here: the gas is an ideal mixture of CO2 and water
vapour, so the water mole fraction is ``p_water / P`` at total pressure ``P``; no enhancement
factor is applied (the real water content of compressed gas near saturation is a few per cent
higher at 1 atm, more at high pressure). Below 273.16 K the dew point is a *frost point*: water
condenses as ice, and the vapour pressure over ice is used.
"""

from __future__ import annotations

import math
from dataclasses import dataclass

from co2routes.thermo.co2 import ATMOSPHERE_PA, MOLAR_MASS as CO2_MOLAR_MASS
from co2routes.thermo.constants import WATER_MOLAR_MASS
from co2routes.thermo.errors import InputError, require_positive

#: Triple point of water [K] (IAPWS-95).
WATER_TRIPLE_K = 273.16
#: Vapour pressure of liquid water at its triple point [Pa] (IAPWS-95, Wagner & Pruss 2002:
#: 611.654771 Pa; the ice equation gives 611.657 Pa there).
WATER_TRIPLE_PA = 611.654771
#: Critical temperature of water [K] (IAPWS-95).
WATER_CRITICAL_K = 647.096
#: Lowest temperature of the Murphy & Koop (2005) ice equation [K].
ICE_MIN_K = 110.0
#: A dew point is a frost point only this far below 273.16 K [K]: "0.01 degC" read as 273.15 + 0.01
#: is 273.15999999999997 in floating point and is the triple point, not ice.
_ICE_TOLERANCE_K = 1e-9


@dataclass(frozen=True, slots=True)
class Moisture:
    """Water carried by CO2 gas.

    ``dew_point_k`` [K] is a frost point (over ice) when ``over_ice`` is true, i.e. below
    273.16 K. ``water_ppmv`` is the water mole fraction times 1e6 [ppm by volume];
    ``water_g_per_kg_co2`` is grams of water per kilogram of (dry) CO2; ``pressure_pa`` [Pa] is
    the total pressure the ppmv refers to; ``water_pressure_pa`` [Pa] the water partial pressure.
    """

    dew_point_k: float
    water_ppmv: float
    water_g_per_kg_co2: float
    pressure_pa: float
    water_pressure_pa: float
    over_ice: bool


def vapor_pressure_liquid(temperature_k: float) -> float:
    """Saturation vapour pressure of liquid water [Pa], IAPWS-95 through CoolProp.

    p_sat(T) from the IAPWS-95 Helmholtz equation (CoolProp ``PropsSI('P','T',T,'Q',0,'Water')``).

    Parameters
    ----------
    temperature_k : float
        Temperature [K], 273.16 to 647.096 K (triple point to critical point).

    Source: Wagner & Pruss (2002), IAPWS-95, J. Phys. Chem. Ref. Data 31, 387; Table 13.1 gives
    3.1699 kPa at 25 degC and 101.418 kPa at 100 degC.

    >>> round(vapor_pressure_liquid(298.15), 1)
    3169.9
    """
    if not (WATER_TRIPLE_K <= temperature_k <= WATER_CRITICAL_K):
        raise InputError(
            "temperature", "liquid water exists from 273.16 K to 647.096 K (triple to critical point)",
            got=temperature_k)
    from co2routes.thermo._lazy import coolprop

    return float(coolprop().PropsSI("P", "T", temperature_k, "Q", 0, "Water"))


def vapor_pressure_ice(temperature_k: float) -> float:
    """Vapour (sublimation) pressure over hexagonal ice [Pa], Murphy & Koop (2005) eq. 7.

    ln(p / Pa) = 9.550426 - 5723.265 / T + 3.53068 ln(T) - 0.00728332 T

    Parameters
    ----------
    temperature_k : float
        Temperature [K], 110 to 273.16 K.

    Source: Murphy & Koop (2005), Q. J. R. Meteorol. Soc. 131, 1539, eq. 7 (valid T > 110 K);
    it gives 611.657 Pa at the triple point and agrees with the IAPWS (2011) sublimation equation
    within 0.06 % above 200 K.

    >>> round(vapor_pressure_ice(273.16), 2)
    611.66
    """
    if not (ICE_MIN_K <= temperature_k <= WATER_TRIPLE_K):
        raise InputError("temperature", "ice vapour pressure is valid from 110 K to 273.16 K",
                         got=temperature_k)
    t = temperature_k
    return math.exp(9.550426 - 5723.265 / t + 3.53068 * math.log(t) - 0.00728332 * t)


def vapor_pressure(temperature_k: float) -> float:
    """Saturation pressure of water [Pa]: over ice below 273.16 K, over liquid above.

    p_sat(T) = p_ice(T) (Murphy & Koop 2005, eq. 7) for 110 K <= T < 273.16 K,
    p_liquid(T) (IAPWS-95) for 273.16 K <= T <= 647.096 K. Below 0 degC this is the frost-point
    curve, not supercooled water.

    Parameters
    ----------
    temperature_k : float
        Temperature [K], 110 to 647.096 K.

    Sources: Murphy & Koop (2005); Wagner & Pruss (2002).

    >>> round(vapor_pressure(253.15), 2)
    103.25
    """
    if temperature_k < WATER_TRIPLE_K:
        return vapor_pressure_ice(temperature_k)
    return vapor_pressure_liquid(temperature_k)


def dew_point(water_pressure_pa: float) -> float:
    """Dew point [K] for a water partial pressure: the inverse of :func:`vapor_pressure`.

    Solves p_sat(T_d) = p_water. Below 611.6548 Pa (the liquid triple-point pressure) the result
    is a *frost point* (ice, below 273.16 K): the Murphy & Koop (2005) eq. 7 is inverted by
    Newton's method from their eq. 8 estimate. Above it, IAPWS-95 through CoolProp (``PropsSI('T','P',p,'Q',0,'Water')``).

    Parameters
    ----------
    water_pressure_pa : float
        Water partial pressure [Pa], 2.6e-12 Pa (frost point 110 K) to 22.064 MPa.

    Sources: Murphy & Koop (2005) eqs. 7-8; Wagner & Pruss (2002).

    >>> round(dew_point(2.02650) - 273.15, 2)   # 20 ppmv at 1 atm: frost point
    -55.26
    """
    p = require_positive("water pressure", water_pressure_pa)
    if p < WATER_TRIPLE_PA:
        if p < vapor_pressure_ice(ICE_MIN_K):
            raise InputError("water pressure", "frost points below 110 K are outside Murphy & Koop (2005)",
                             got=p)
        ln_p = math.log(p)
        t = (1.814625 * ln_p + 6190.134) / (29.120 - ln_p)  # Murphy & Koop (2005) eq. 8
        for _ in range(50):
            f = 9.550426 - 5723.265 / t + 3.53068 * math.log(t) - 0.00728332 * t - ln_p
            dfdt = 5723.265 / t**2 + 3.53068 / t - 0.00728332
            step = f / dfdt
            t -= step
            if abs(step) < 1e-10:
                break
        return min(t, WATER_TRIPLE_K)
    from co2routes.thermo._lazy import coolprop

    cp = coolprop()
    p_crit = cp.PropsSI("pcrit", "Water")
    if p > p_crit:
        raise InputError("water pressure", "must be below the critical pressure of water, 22.064 MPa",
                         got=p)
    if p <= cp.PropsSI("P", "T", WATER_TRIPLE_K, "Q", 0, "Water"):
        return WATER_TRIPLE_K
    return float(cp.PropsSI("T", "P", p, "Q", 0, "Water"))


def ppmv_from_dew_point(dew_point_k: float, pressure_pa: float = ATMOSPHERE_PA) -> float:
    """Water content [ppm by volume] of gas at total pressure P with dew (frost) point T_d.

    ppmv = 1e6 p_sat(T_d) / P (ideal mixing, no enhancement factor).

    Parameters
    ----------
    dew_point_k : float
        Dew point, or frost point below 273.16 K [K], 110 to 647.096 K.
    pressure_pa : float
        Total pressure [Pa]; must exceed p_sat(T_d).

    Sources: Murphy & Koop (2005); Wagner & Pruss (2002).

    >>> round(ppmv_from_dew_point(218.0), 2)
    20.28
    """
    p_total = require_positive("pressure", pressure_pa)
    p_w = vapor_pressure(dew_point_k)
    if p_w >= p_total:
        raise InputError("dew point", "its water vapour pressure must be below the total pressure "
                         f"({p_total:.6g} Pa): the gas would be steam", got=dew_point_k)
    return 1e6 * p_w / p_total


def dew_point_from_ppmv(water_ppmv: float, pressure_pa: float = ATMOSPHERE_PA) -> float:
    """Dew (frost) point [K] of gas holding ``water_ppmv`` at total pressure P.

    p_water = ppmv 1e-6 P, then T_d = :func:`dew_point` (p_water); a frost point below 273.16 K.

    Parameters
    ----------
    water_ppmv : float
        Water mole fraction times 1e6 [ppmv], above 0 and below 1e6.
    pressure_pa : float
        Total pressure [Pa].

    Sources: Murphy & Koop (2005); Wagner & Pruss (2002).

    >>> round(dew_point_from_ppmv(20.0) - 273.15, 1)
    -55.3
    """
    ppmv = require_positive("water content", water_ppmv)
    if ppmv >= 1e6:
        raise InputError("water content", "must be below 1,000,000 ppmv", got=ppmv)
    p_total = require_positive("pressure", pressure_pa)
    return dew_point(ppmv * 1e-6 * p_total)


def g_per_kg_from_ppmv(water_ppmv: float) -> float:
    """Grams of water per kilogram of dry CO2 for a water content in ppmv.

    w = 1000 y / (1 - y) M_H2O / M_CO2 with y = ppmv 1e-6, M_H2O = 18.015 g/mol,
    M_CO2 = 44.0095 g/mol.

    Parameters
    ----------
    water_ppmv : float
        Water content [ppmv], 0 to below 1e6.

    Source: definition of mole fraction and mass ratio; molar masses IAPWS-95 and NIST WebBook.

    >>> round(g_per_kg_from_ppmv(20.0), 4)
    0.0082
    """
    if not (0.0 <= water_ppmv < 1e6):
        raise InputError("water content", "must be from 0 to below 1,000,000 ppmv", got=water_ppmv)
    y = water_ppmv * 1e-6
    return 1000.0 * y / (1.0 - y) * WATER_MOLAR_MASS / CO2_MOLAR_MASS


def ppmv_from_g_per_kg(water_g_per_kg_co2: float) -> float:
    """Water content [ppmv] for grams of water per kilogram of dry CO2 (inverse of the above).

    n = (w / 1000) M_CO2 / M_H2O (mol water per mol CO2); ppmv = 1e6 n / (1 + n).

    Parameters
    ----------
    water_g_per_kg_co2 : float
        Water [g per kg of CO2], 0 or more.

    Source: definition of mole fraction and mass ratio.

    >>> round(ppmv_from_g_per_kg(0.0082), 1)
    20.0
    """
    if not (water_g_per_kg_co2 >= 0.0) or math.isinf(water_g_per_kg_co2):
        raise InputError("water content", "must be a finite number of g/kg, 0 or more",
                         got=water_g_per_kg_co2)
    n = water_g_per_kg_co2 / 1000.0 * CO2_MOLAR_MASS / WATER_MOLAR_MASS
    return 1e6 * n / (1.0 + n)


def saturated_ppmv(temperature_k: float, pressure_pa: float = ATMOSPHERE_PA) -> float:
    """Water [ppmv] carried by CO2 leaving a bubbler (or a wet generator) saturated at T and P.

    ppmv = 1e6 p_sat(T) / P: the gas leaves with a dew point equal to its temperature (frost
    point over ice below 273.16 K); ideal mixing, no enhancement factor.

    Parameters
    ----------
    temperature_k : float
        Gas and water temperature [K], 110 to 647.096 K.
    pressure_pa : float
        Total pressure [Pa], above p_sat(T).

    Sources: Wagner & Pruss (2002) IAPWS-95; Murphy & Koop (2005).

    >>> round(saturated_ppmv(298.15))
    31285
    """
    return ppmv_from_dew_point(temperature_k, pressure_pa)


def moisture_from_dew_point(dew_point_k: float, pressure_pa: float = ATMOSPHERE_PA) -> Moisture:
    """Full :class:`Moisture` for a dew point, or frost point below 273.16 K.

    ppmv = 1e6 p_sat(T_d) / P; g/kg from :func:`g_per_kg_from_ppmv`. Gas saturated at T (leaving
    a bubbler at T) has T_d = T.

    Parameters
    ----------
    dew_point_k : float
        Dew (frost) point [K], 110 to 647.096 K.
    pressure_pa : float
        Total pressure [Pa].

    Sources: Murphy & Koop (2005); Wagner & Pruss (2002).

    >>> m = moisture_from_dew_point(218.0)
    >>> round(m.water_ppmv, 1), m.over_ice
    (20.3, True)
    """
    ppmv = ppmv_from_dew_point(dew_point_k, pressure_pa)
    return Moisture(
        dew_point_k=float(dew_point_k),
        water_ppmv=ppmv,
        water_g_per_kg_co2=g_per_kg_from_ppmv(ppmv),
        pressure_pa=float(pressure_pa),
        water_pressure_pa=ppmv * 1e-6 * pressure_pa,
        over_ice=dew_point_k < WATER_TRIPLE_K - _ICE_TOLERANCE_K,
    )


def moisture_from_ppmv(water_ppmv: float, pressure_pa: float = ATMOSPHERE_PA) -> Moisture:
    """Full :class:`Moisture` for a water content in ppmv at total pressure P.

    T_d = :func:`dew_point_from_ppmv` (ppmv, P).

    Parameters
    ----------
    water_ppmv : float
        Water content [ppmv], above 0 and below 1e6.
    pressure_pa : float
        Total pressure [Pa].

    Sources: Murphy & Koop (2005); Wagner & Pruss (2002).

    >>> round(moisture_from_ppmv(20.0).dew_point_k - 273.15, 1)
    -55.3
    """
    t_d = dew_point_from_ppmv(water_ppmv, pressure_pa)
    return Moisture(
        dew_point_k=t_d,
        water_ppmv=float(water_ppmv),
        water_g_per_kg_co2=g_per_kg_from_ppmv(water_ppmv),
        pressure_pa=float(pressure_pa),
        water_pressure_pa=water_ppmv * 1e-6 * pressure_pa,
        over_ice=t_d < WATER_TRIPLE_K - _ICE_TOLERANCE_K,
    )


def moisture_from_g_per_kg(water_g_per_kg_co2: float,
                           pressure_pa: float = ATMOSPHERE_PA) -> Moisture:
    """Full :class:`Moisture` for grams of water per kg of CO2 at total pressure P.

    ppmv = :func:`ppmv_from_g_per_kg` (w), then :func:`moisture_from_ppmv`.

    Parameters
    ----------
    water_g_per_kg_co2 : float
        Water [g per kg CO2], above 0.
    pressure_pa : float
        Total pressure [Pa].

    Sources: Murphy & Koop (2005); Wagner & Pruss (2002).

    >>> round(moisture_from_g_per_kg(0.0082).water_ppmv, 1)
    20.0
    """
    require_positive("water content", water_g_per_kg_co2)
    return moisture_from_ppmv(ppmv_from_g_per_kg(water_g_per_kg_co2), pressure_pa)


def moisture_from_relative_humidity(temperature_k: float, relative_humidity: float,
                                    pressure_pa: float = ATMOSPHERE_PA) -> Moisture:
    """Full :class:`Moisture` for gas at temperature T and relative humidity RH.

    p_water = RH p_sat(T), with p_sat over liquid water at or above 273.16 K and over ice below
    it (so RH below 0 degC is with respect to ice, not the meteorological convention of
    supercooled water); then T_d = :func:`dew_point` (p_water).

    Parameters
    ----------
    temperature_k : float
        Gas temperature [K], 110 to 647.096 K.
    relative_humidity : float
        Relative humidity as a fraction, (0, 1].
    pressure_pa : float
        Total pressure [Pa].

    Sources: Murphy & Koop (2005); Wagner & Pruss (2002).

    >>> m = moisture_from_relative_humidity(298.15, 0.5)
    >>> round(m.dew_point_k - 273.15, 2), round(m.water_ppmv)
    (13.86, 15642)
    """
    from co2routes.thermo.errors import require_fraction

    rh = require_fraction("relative humidity", relative_humidity)
    p_w = rh * vapor_pressure(temperature_k)
    return moisture_from_ppmv(1e6 * p_w / require_positive("pressure", pressure_pa), pressure_pa)

"""Carbonating a drink: CO2 dissolved for a number of volumes, and the pressure that holds it.

"Volumes of CO2" is the trade's measure: the volume the dissolved CO2 would take as a gas at
0 degC and 1 atm, per volume of drink. With the ideal molar volume 22.414 L/mol (CODATA 2018,
22.413969 L/mol at 273.15 K and 101.325 kPa) one volume is 44.0095 / 22.414 = 1.9635 g/L.

At equilibrium under a CO2 atmosphere, Henry's law with the temperature dependence of Sander
(2015) (:func:`co2routes.thermo.henry.dissolved_co2_kg_m3`) gives the dissolved CO2 at the CO2
partial pressure p_CO2 = P_abs - p_w(T) (water vapour of :func:`co2routes.thermo.water.vapor_pressure`).
Against the carbonation table of Miller (1994), "Table I: Guideline for degrees of carbonation at
various beer temperatures", BrewingTechniques 2(1), it is within 1 % at 38-46 degF and 3 % low at
32 degF (see the tests). The constants are for water: beer (ethanol, extract) and sweet soft
drinks hold a few per cent less.

Valid from 0 to 30 degC and gauge pressures up to about 8 bar (Henry's law holds to 1 MPa).
"""

from __future__ import annotations

from dataclasses import dataclass

from co2routes.thermo.errors import InputError, require_positive

#: Ideal-gas molar volume at 0 degC and 1 atm [m3/mol] (CODATA 2018).
MOLAR_VOLUME_STP_M3 = 0.022413969
#: Molar mass of CO2 [kg/mol].
CO2_MOLAR_MASS = 0.0440095
#: One "volume" of CO2 in kg per m3 of drink (= g/L).
KG_M3_PER_VOLUME = CO2_MOLAR_MASS / MOLAR_VOLUME_STP_M3
#: Serving temperatures the model is used over [K].
T_LOW_K, T_HIGH_K = 273.15, 303.15
#: Priming sugar yield [kg CO2 per kg sugar], Gay-Lussac: sucrose C12H22O11 + H2O -> 4 C2H5OH +
#: 4 CO2 (4 x 44.0095 / 342.296) and glucose C6H12O6 -> 2 C2H5OH + 2 CO2 (2 x 44.0095 / 180.156).
PRIMING_YIELD = {"sucrose": 4 * 44.0095 / 342.296, "glucose": 2 * 44.0095 / 180.156}


@dataclass(frozen=True, slots=True)
class Carbonation:
    """A drink held at ``volumes`` of CO2 at ``temperature_k``: the dissolved CO2 [kg/m3] and the
    pressure over it, absolute and gauge [Pa]."""

    temperature_k: float
    volumes: float
    dissolved_kg_m3: float
    absolute_pressure_pa: float
    gauge_pressure_pa: float


def volumes_to_kg_m3(volumes: float) -> float:
    """Dissolved CO2 [kg/m3 = g/L] for a number of volumes: c = v M / V_m.

    >>> round(volumes_to_kg_m3(2.5), 3)
    4.909
    """
    return volumes * KG_M3_PER_VOLUME


def kg_m3_to_volumes(kg_m3: float) -> float:
    """Volumes of CO2 for a dissolved concentration [kg/m3].

    >>> round(kg_m3_to_volumes(4.909), 2)
    2.5
    """
    return kg_m3 / KG_M3_PER_VOLUME


def _check_temperature(temperature_k: float) -> float:
    if not T_LOW_K <= temperature_k <= T_HIGH_K:
        raise InputError("serving temperature", "must be from 0 to 30 degC for carbonation",
                         got=f"{temperature_k - 273.15:.1f} degC")
    return temperature_k


def equilibrium_volumes(temperature_k: float, gauge_pressure_pa: float,
                        atmosphere_pa: float = 101325.0) -> Carbonation:
    """Volumes of CO2 a drink takes up under a CO2 pressure at a temperature, at equilibrium.

    c = Hcp(T) (P_gauge + P_atm - p_w(T)) M (Sander 2015); volumes = c / 1.9635 g/L.

    Parameters
    ----------
    temperature_k : float
        Drink temperature [K], 0 to 30 degC.
    gauge_pressure_pa : float
        CO2 pressure above the atmosphere [Pa], 0 to 8 bar.
    atmosphere_pa : float
        Atmospheric pressure [Pa].

    >>> round(equilibrium_volumes(276.48, 12 * 6894.757).volumes, 2)
    2.55
    """
    from co2routes.thermo import henry, water

    _check_temperature(temperature_k)
    if not 0.0 <= gauge_pressure_pa <= 8.0e5:
        raise InputError("gauge pressure", "must be from 0 to 8 bar", got=gauge_pressure_pa)
    p_abs = gauge_pressure_pa + require_positive("atmosphere", atmosphere_pa)
    c = henry.dissolved_co2_kg_m3(temperature_k, p_abs - water.vapor_pressure(temperature_k))
    return Carbonation(temperature_k, kg_m3_to_volumes(c), c, p_abs, gauge_pressure_pa)


def pressure_for(temperature_k: float, volumes: float, atmosphere_pa: float = 101325.0) -> Carbonation:
    """The CO2 pressure that holds ``volumes`` of CO2 in a drink at a temperature (the regulator
    setting for force carbonation and serving).

    P_abs = c / (Hcp(T) M) + p_w(T); gauge = P_abs - P_atm (negative when the drink would hold
    that much at less than the atmosphere: it then loses CO2 in an open glass but needs no pressure).

    >>> c = pressure_for(276.48, 2.55)
    >>> round(c.gauge_pressure_pa / 6894.757, 1)
    12.0
    """
    from co2routes.thermo import henry, water

    _check_temperature(temperature_k)
    require_positive("volumes of CO2", volumes)
    c = volumes_to_kg_m3(volumes)
    p_co2 = c / (henry.henry_constant(temperature_k) * CO2_MOLAR_MASS)
    p_abs = p_co2 + water.vapor_pressure(temperature_k)
    if p_abs > 1.0e6:
        raise InputError("volumes of CO2", "need more than 10 bar at this temperature: beyond the "
                         "Henry's-law range used here", got=volumes)
    return Carbonation(temperature_k, volumes, c, p_abs, p_abs - atmosphere_pa)


def priming_sugar_kg(co2_kg: float, sugar: str = "sucrose") -> float:
    """Sugar [kg] a bottle-conditioned drink needs to make ``co2_kg`` of CO2 in the bottle.

    m = CO2 / yield, Gay-Lussac's yield: 0.514 kg/kg for sucrose, 0.489 kg/kg for glucose.

    >>> round(priming_sugar_kg(0.1), 4)
    0.1944
    """
    if sugar not in PRIMING_YIELD:
        raise InputError("priming sugar", f"must be one of {', '.join(PRIMING_YIELD)}", got=sugar)
    return require_positive("CO2", co2_kg) / PRIMING_YIELD[sugar]

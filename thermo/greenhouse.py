"""CO2 enrichment of a greenhouse: the well-mixed mass balance of the house's air.

The house is one well-mixed volume V of air (molar amount n = P V / (R T)) exchanged with the
outside at N air changes per hour. Its CO2 mole fraction x obeys

    n dx/dt = S - U - N n (x - x_out)

with S the CO2 supplied and U the crop's uptake [mol/h]. This is the balance used to measure a
greenhouse's ventilation from the decay of a tracer or of CO2 itself (Nederhoff, van de Vooren &
Udink ten Cate 1985, "A practical tracer gas method to determine ventilation in greenhouses",
J. Agric. Eng. Res. 31, 309-319); practical supplementation levels (700-1000 ppmv, less with the
vents open) are those of the Ontario ministry factsheet 00-077 "Carbon Dioxide in Greenhouses"
(Blom, Straver, Ingratta, Khosla & Brown 2002).

Valid for a house whose air is stirred well enough to be one value of CO2 (fans or heating pipes
running), air changes from 0 to 60 per hour, and CO2 levels up to a few thousand ppmv (ideal gas).
Molar mass of CO2 44.0095 g/mol; R = 8.314462618 J/(mol K) (CODATA 2018).
"""

from __future__ import annotations

import math
from dataclasses import dataclass

from co2routes.thermo.errors import InputError, require_positive

#: Molar mass of CO2 [kg/mol] and the molar gas constant [J/(mol K)] (CODATA 2018).
CO2_MOLAR_MASS = 0.0440095
R = 8.314462618
#: Air changes per hour the model is used for.
ACH_MAX = 60.0


@dataclass(frozen=True, slots=True)
class HouseBalance:
    """Steady CO2 balance of a well-mixed house held at ``target_fraction`` [kg/h each term].

    ``supply_kg_h = ventilation_kg_h + uptake_kg_h``; ``stock_kg`` is the CO2 the house's air holds
    above the outside level at the target (what a morning pull-up must add).
    """

    air_mol: float
    air_changes_per_h: float
    outside_fraction: float
    target_fraction: float
    ventilation_kg_h: float
    uptake_kg_h: float
    supply_kg_h: float
    stock_kg: float


def house_air_mol(volume_m3: float, temperature_k: float, pressure_pa: float) -> float:
    """Moles of air in the house, n = P V / (R T) (ideal gas).

    >>> round(house_air_mol(1000.0, 293.15, 101325.0), 0)
    41571.0
    """
    require_positive("house volume", volume_m3)
    return require_positive("air pressure", pressure_pa) * volume_m3 / (R * require_positive("air temperature", temperature_k))


def _check_levels(outside_fraction: float, target_fraction: float, air_changes_per_h: float) -> None:
    if not 0.0 < outside_fraction < 0.01:
        raise InputError("outside CO2", "must be above 0 and below 10,000 ppmv", got=outside_fraction)
    if target_fraction < outside_fraction:
        raise InputError("target CO2", "must be at least the outside CO2: a supply cannot lower the "
                         "house's CO2 below the outside level", got=f"{target_fraction * 1e6:.0f} ppmv")
    if not 0.0 <= air_changes_per_h <= ACH_MAX:
        raise InputError("air changes", f"must be from 0 to {ACH_MAX:g} per hour", got=air_changes_per_h)


def steady_balance(volume_m3: float, air_changes_per_h: float, outside_fraction: float,
                   target_fraction: float, uptake_kg_h: float, temperature_k: float = 293.15,
                   pressure_pa: float = 101325.0) -> HouseBalance:
    """The supply that holds the house at the target CO2 (dx/dt = 0).

    S = U + N n (x_t - x_out) M, with n = P V / (R T), N the air changes per hour and M the molar
    mass of CO2 [kg/h].

    Parameters
    ----------
    volume_m3 : float
        Air volume of the house [m3].
    air_changes_per_h : float
        Air changes per hour, 0 to 60 [1/h].
    outside_fraction, target_fraction : float
        CO2 mole fractions outside and wanted inside [-] (target at least the outside level).
    uptake_kg_h : float
        The crop's CO2 uptake [kg/h], 0 or more.
    temperature_k, pressure_pa : float
        Air temperature [K] and pressure [Pa] inside.

    Source: the well-mixed balance of Nederhoff et al. (1985).

    >>> b = steady_balance(1000.0, 0.5, 425e-6, 1000e-6, 0.4)
    >>> round(b.ventilation_kg_h, 4), round(b.supply_kg_h, 4), round(b.stock_kg, 4)
    (0.526, 0.926, 1.052)
    """
    _check_levels(outside_fraction, target_fraction, air_changes_per_h)
    if uptake_kg_h < 0.0:
        raise InputError("crop uptake", "must be 0 or more", got=uptake_kg_h)
    n = house_air_mol(volume_m3, temperature_k, pressure_pa)
    rise = target_fraction - outside_fraction
    vent = air_changes_per_h * n * rise * CO2_MOLAR_MASS
    return HouseBalance(n, air_changes_per_h, outside_fraction, target_fraction, vent, uptake_kg_h,
                        vent + uptake_kg_h, n * rise * CO2_MOLAR_MASS)


def pull_up_supply_kg_h(balance: HouseBalance, pull_up_h: float) -> float:
    """Constant supply [kg/h] that raises the house from the outside level to the target in a time.

    Solving n dx/dt = S - U - N n (x - x_out) from x = x_out for x(tau) = x_t:

        S = U + N n (x_t - x_out) M / (1 - exp(-N tau))      (N > 0)
        S = U + n (x_t - x_out) M / tau                       (N = 0)

    Parameters
    ----------
    balance : HouseBalance
        The house at its target (:func:`steady_balance`).
    pull_up_h : float
        Hours allowed to reach the target [h], above 0.

    Source: the well-mixed balance of Nederhoff et al. (1985), integrated at constant S and U.

    >>> b = steady_balance(1000.0, 0.0, 425e-6, 1000e-6, 0.0)
    >>> round(pull_up_supply_kg_h(b, 2.0), 4)
    0.526
    >>> b = steady_balance(1000.0, 0.5, 425e-6, 1000e-6, 0.4)
    >>> round(pull_up_supply_kg_h(b, 1.0), 4)
    1.7368
    """
    tau = require_positive("pull-up time", pull_up_h)
    k = balance.air_changes_per_h
    if k == 0.0:
        return balance.uptake_kg_h + balance.stock_kg / tau
    return balance.uptake_kg_h + k * balance.stock_kg / (1.0 - math.exp(-k * tau))


def decay_fraction(outside_fraction: float, start_fraction: float, air_changes_per_h: float,
                   hours: float) -> float:
    """CO2 left in an unsupplied house after a time with no crop uptake: exponential decay.

    x(t) = x_out + (x_0 - x_out) exp(-N t): how fast the house returns to the outside level when
    the supply stops (the measurement of N in Nederhoff et al. 1985), e.g. before people go in.

    >>> round(decay_fraction(425e-6, 1000e-6, 1.0, 1.0) * 1e6, 1)
    636.5
    """
    if hours < 0.0:
        raise InputError("time", "must be 0 or more", got=hours)
    _check_levels(outside_fraction, start_fraction, air_changes_per_h)
    return outside_fraction + (start_fraction - outside_fraction) * math.exp(-air_changes_per_h * hours)


def hours_to_fall(outside_fraction: float, start_fraction: float, level_fraction: float,
                  air_changes_per_h: float) -> float | None:
    """Hours of ventilation, supply off, for the house to fall from one level to another.

    t = ln((x_0 - x_out) / (x_1 - x_out)) / N; ``None`` when it never gets there (N = 0 or a level
    at or below the outside one) and 0 when it is already there.

    >>> round(hours_to_fall(425e-6, 1000e-6, 636.5e-6, 1.0), 3)
    1.0
    """
    if start_fraction <= level_fraction:
        return 0.0
    if air_changes_per_h <= 0.0 or level_fraction <= outside_fraction:
        return None
    return math.log((start_fraction - outside_fraction) / (level_fraction - outside_fraction)) / air_changes_per_h

"""Air as a process gas: density and viscosity for fans and packed beds.

Density from the ideal-gas law with the molar mass of dry air; viscosity from the Lemmon &
Jacobsen (2004) correlation for air through CoolProp (Lemmon, E. W.; Jacobsen, R. T. (2004)
"Viscosity and thermal conductivity equations for nitrogen, oxygen, argon, and air", Int. J.
Thermophys. 25, 21-69). Humidity and a few per cent of CO2 change either by under 2 % at room
temperature, which the bed and fan estimates here do not resolve.
"""

from __future__ import annotations

from co2routes.thermo.constants import R
from co2routes.thermo.errors import InputError, require_positive

#: Molar mass of dry air [kg/mol] (Lemmon et al. 2000, J. Phys. Chem. Ref. Data 29, 331: 28.9586 g/mol).
AIR_MOLAR_MASS = 0.0289586


def air_density(temperature_k: float, pressure_pa: float) -> float:
    """Density of dry air [kg/m3] as an ideal gas.

    rho = P M / (R T), M = 28.9586 g/mol.

    Parameters
    ----------
    temperature_k : float
        Temperature [K], 200-400 K (ideal to within 0.1 % near 1 atm).
    pressure_pa : float
        Pressure [Pa], above 0 and up to 1 MPa.

    Source: Lemmon et al. (2000) for the molar mass; CRC Handbook air density 1.204 kg/m3 at
    20 degC and 1 atm.

    >>> round(air_density(293.15, 101325.0), 3)
    1.204
    """
    _check(temperature_k, pressure_pa)
    return pressure_pa * AIR_MOLAR_MASS / (R * temperature_k)


def air_viscosity(temperature_k: float, pressure_pa: float = 101325.0) -> float:
    """Dynamic viscosity of air [Pa s], Lemmon & Jacobsen (2004) through CoolProp.

    mu(T, rho): dilute-gas Chapman-Enskog term plus residual term (their eqs. 1-5).

    Parameters
    ----------
    temperature_k : float
        Temperature [K], 200-400 K.
    pressure_pa : float
        Pressure [Pa], above 0 and up to 1 MPa.

    Source: Lemmon & Jacobsen (2004), Int. J. Thermophys. 25, 21; Incropera & DeWitt,
    *Fundamentals of Heat and Mass Transfer*, Table A.4, give 184.6e-7 Pa s at 300 K.

    >>> round(air_viscosity(300.0, 1e5) * 1e7, 1)
    185.4
    """
    _check(temperature_k, pressure_pa)
    from co2routes.thermo._lazy import coolprop

    return float(coolprop().PropsSI("V", "T", temperature_k, "P", pressure_pa, "Air"))


def _check(temperature_k: float, pressure_pa: float) -> None:
    if not (200.0 <= temperature_k <= 400.0):
        raise InputError("air temperature", "must be 200-400 K (-73 to 127 degC)", got=temperature_k)
    require_positive("air pressure", pressure_pa)
    if pressure_pa > 1e6:
        raise InputError("air pressure", "must be up to 1 MPa", got=pressure_pa)

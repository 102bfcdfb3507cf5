"""Small helpers the route models share (so that each is written once)."""

from __future__ import annotations

from typing import Mapping

from co2routes.thermo.constants import WATER_MOLAR_MASS

#: Heat capacity of a dilute aqueous batch liquor [J/(kg K)]: that of liquid water at 25 degC,
#: 4181 J/(kg K) (IAPWS-95). Salty liquors are a few per cent lower; the temperature change it
#: gives is an estimate to within about 10 % for liquors under 20 % salt.
LIQUOR_CP_J_KG_K = 4181.0


def temperature_change(heat_kj: float, liquor_kg: float, cp_j_kg_k: float = LIQUOR_CP_J_KG_K) -> float:
    """Temperature change of an adiabatic batch liquor [K] from the batch's enthalpy change.

    dT = -H / (m cp): a batch that takes heat in (H > 0) cools.

    Parameters: ``heat_kj`` the batch's enthalpy change [kJ] (positive: it takes heat in);
    ``liquor_kg`` the liquor's mass [kg], > 0; ``cp_j_kg_k`` its heat capacity [J/(kg K)].
    Valid while cp stays near constant: dilute aqueous liquors between 0 and 100 degC, within
    about 10 % for liquors under 20 % salt. Source: the definition of heat capacity, with the cp
    of liquid water at 25 degC from IAPWS-95 (Wagner & Pruss 2002) as the default.

    >>> round(temperature_change(41.81, 1.0), 3)
    -10.0
    """
    return -heat_kj * 1000.0 / (liquor_kg * cp_j_kg_k)


#: Molar masses [kg/mol] from IUPAC standard atomic weights (abridged, 2021; water as in
#: :mod:`co2routes.thermo.constants`) for the gases the raw-gas balances use.
MOLAR_MASS = {"CO2": 0.0440095, "H2O": WATER_MOLAR_MASS, "N2": 0.0280134, "O2": 0.0319988, "Ar": 0.039948,
              "CO": 0.0280101, "C2H5OH": 0.0460684}


def water_g_per_kg_co2(fractions: Mapping[str, float]) -> float:
    """Water carried per kg of CO2 [g/kg] from raw-gas mole fractions.

    w = 1000 x_H2O M_H2O / (x_CO2 M_CO2), with ``fractions`` mole fractions [mol/mol] of an
    ideal-gas mixture (any total pressure); infinite when the gas holds no CO2. Molar masses from
    the IUPAC standard atomic weights (2021, abridged), :data:`MOLAR_MASS`.

    >>> round(water_g_per_kg_co2({"CO2": 0.97, "H2O": 0.03}), 2)
    12.66
    """
    x_co2 = fractions.get("CO2", 0.0)
    if x_co2 <= 0.0:
        return float("inf")
    return 1000.0 * fractions.get("H2O", 0.0) * MOLAR_MASS["H2O"] / (x_co2 * MOLAR_MASS["CO2"])

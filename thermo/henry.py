"""CO2 dissolved in water by Henry's law: what a batch liquor keeps instead of giving off.

The solubility constant is taken from the compilation of Sander, R. (2015) "Compilation of Henry's
law constants (version 4.0) for water as solvent", Atmos. Chem. Phys. 15, 4399-4981, entry for
carbon dioxide (CAS 124-38-9): Hcp = 3.3e-4 mol/(m3 Pa) at 298.15 K and d ln Hcp / d(1/T) = 2400 K
(the value the compilation takes from the NASA/JPL evaluation, Sander et al. 2011; Carroll et al.
1991 give 3.4e-4 and 2300 K in the same table).

Only physically dissolved CO2 is counted: in an acid liquor (pH below about 5) bicarbonate is
negligible. Salts lower the solubility a little (salting out, about 10-20 % in a 1-2 mol/kg salt
liquor): the value here is an upper estimate of what stays dissolved.
"""

from __future__ import annotations

import math

from co2routes.thermo.errors import InputError, require_positive

#: Henry solubility constant of CO2 in water at 298.15 K [mol/(m3 Pa)] (Sander 2015, CO2 entry).
HCP_298_MOL_M3_PA = 3.3e-4
#: Temperature dependence d ln Hcp / d(1/T) [K] (Sander 2015, CO2 entry).
DLNH_DINVT_K = 2400.0
#: Reference temperature of the constants [K].
T_REF_K = 298.15
#: Molar mass of CO2 [kg/mol] (IUPAC standard atomic weights: 12.011 + 2 x 15.999).
CO2_MOLAR_MASS = 0.0440095
#: Temperatures the constant-enthalpy (van 't Hoff) form is used over [K]: 0-60 degC. Against the
#: correlation of Carroll, Slupsky & Mather (1991), J. Phys. Chem. Ref. Data 20, 1201, it is 3-5 %
#: low from 10 to 40 degC, 8 % low at 0 degC, 9 % low at 50 degC and 14 % low at 60 degC (it
#: leaves out the curvature of ln H in 1/T).
T_MIN_K = 273.15
T_MAX_K = 333.15


def henry_constant(temperature_k: float) -> float:
    """Henry solubility constant of CO2 in water, Hcp = c / p [mol/(m3 Pa)].

    Hcp(T) = Hcp(298.15 K) exp[ (d ln H / d(1/T)) (1/T - 1/298.15 K) ], with
    Hcp(298.15 K) = 3.3e-4 mol/(m3 Pa) and d ln H / d(1/T) = 2400 K.

    Parameters
    ----------
    temperature_k : float
        Water temperature [K], 273.15 to 333.15 K.

    Source: Sander (2015), Atmos. Chem. Phys. 15, 4399, carbon dioxide entry.

    >>> round(henry_constant(298.15), 7)
    0.00033
    >>> round(henry_constant(283.15) / henry_constant(298.15), 3)
    1.532
    """
    if not (T_MIN_K <= temperature_k <= T_MAX_K):
        raise InputError("liquor temperature", "Henry's law for CO2 is used from 0 to 60 degC (273.15-333.15 K)",
                         got=temperature_k)
    return HCP_298_MOL_M3_PA * math.exp(DLNH_DINVT_K * (1.0 / temperature_k - 1.0 / T_REF_K))


def dissolved_co2_kg_m3(temperature_k: float, co2_partial_pressure_pa: float) -> float:
    """Mass of CO2 dissolved per volume of water at equilibrium [kg/m3] (= g/L).

    c = Hcp(T) p_CO2 M_CO2, with Hcp from :func:`henry_constant` and M_CO2 = 44.0095 g/mol.

    Parameters
    ----------
    temperature_k : float
        Water temperature [K], 273.15 to 333.15 K.
    co2_partial_pressure_pa : float
        Partial pressure of CO2 over the water [Pa], above zero; Henry's law holds to within a
        few per cent up to about 1 MPa (Carroll et al. 1991).

    Source: Sander (2015); Henry's law. At 25 degC under 1 atm of CO2 it gives 1.47 g/L, against
    1.48 g/L from Shedlovsky & MacInnes (1935), J. Am. Chem. Soc. 57, 1705 (IUPAC-NIST Solubility
    Database, K = 0.03372 mol/(dm3 atm)).

    >>> round(dissolved_co2_kg_m3(298.15, 101325.0), 3)
    1.472
    """
    require_positive("CO2 partial pressure", co2_partial_pressure_pa)
    if co2_partial_pressure_pa > 1.0e6:
        raise InputError("CO2 partial pressure", "Henry's law is used up to 1 MPa", got=co2_partial_pressure_pa)
    return henry_constant(temperature_k) * co2_partial_pressure_pa * CO2_MOLAR_MASS

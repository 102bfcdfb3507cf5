"""Gases dissolved in water from a gas mixture, and what a vacuum or warming gives back.

Each gas dissolves by Henry's law, c_i = Hcp_i(T) p_i. CO2 uses :mod:`co2routes.thermo.henry`; nitrogen,
oxygen and argon use the recommended entries of the same compilation (Sander, R. (2015)
"Compilation of Henry's law constants (version 4.0) for water as solvent", Atmos. Chem. Phys.
15, 4399; values read at henrys-law.org): N2 6.4e-6 mol/(m3 Pa) and 1300 K (Sander et al. 2011),
O2 1.3e-5 and 1500 K (Sander et al. 2011), Ar 1.4e-5 and 1500 K (Wilhelm et al. 1977), each
with Hcp(T) = Hcp(298.15 K) exp[B (1/T - 1/298.15 K)].

Release is a single equilibrium flash of one cubic metre of loaded water into a head space held
at total pressure P: water vapour at p_sat(T) and the dissolved gases sharing P - p_sat(T).
"""

from __future__ import annotations

import math
from dataclasses import dataclass
from typing import Mapping

from co2routes.thermo import henry, water
from co2routes.thermo.constants import R
from co2routes.thermo.errors import InputError

#: Hcp at 298.15 K [mol/(m3 Pa)] and d ln Hcp / d(1/T) [K] (Sander 2015; see module docstring).
OTHER_GASES: dict[str, tuple[float, float]] = {
    "N2": (6.4e-6, 1300.0),
    "O2": (1.3e-5, 1500.0),
    "Ar": (1.4e-5, 1500.0),
}


def solubility(gas: str, temperature_k: float) -> float:
    """Henry solubility constant Hcp = c / p of ``gas`` in water [mol/(m3 Pa)].

    Hcp(T) = Hcp(298.15 K) exp[B (1/T - 1/298.15 K)]; CO2 through :func:`co2routes.thermo.henry.henry_constant`.

    Parameters
    ----------
    gas : str
        ``"CO2"``, ``"N2"``, ``"O2"`` or ``"Ar"``.
    temperature_k : float
        Water temperature [K], within :data:`co2routes.thermo.henry.T_MIN_K`-:data:`co2routes.thermo.henry.T_MAX_K`.

    Source: Sander (2015), Atmos. Chem. Phys. 15, 4399 (entries as in the module docstring).

    >>> round(solubility("O2", 298.15), 7)
    1.3e-05
    """
    if gas == "CO2":
        return henry.henry_constant(temperature_k)
    if gas not in OTHER_GASES:
        raise InputError("gas", "must be CO2, N2, O2 or Ar", got=repr(gas))
    if not (henry.T_MIN_K <= temperature_k <= henry.T_MAX_K):
        raise InputError("water temperature", f"must be {henry.T_MIN_K:.2f}-{henry.T_MAX_K:.2f} K, the "
                         "range of the Henry's law constants", got=temperature_k)
    h298, b = OTHER_GASES[gas]
    return h298 * math.exp(b * (1.0 / temperature_k - 1.0 / henry.T_REF_K))


def dissolution_enthalpy(gas: str) -> float:
    """Enthalpy of solution of ``gas`` in water [J/mol], from the temperature dependence of Hcp.

    dH_sol = -R d ln Hcp / d(1/T) (van 't Hoff); negative: dissolving gives heat off.

    Source: Sander (2015), section on temperature dependence.

    >>> round(dissolution_enthalpy("CO2") / 1000, 2)
    -19.95
    """
    b = henry.DLNH_DINVT_K if gas == "CO2" else OTHER_GASES[gas][1]
    return -R * b


def loaded(partial_pressures_pa: Mapping[str, float], temperature_k: float,
           saturation: float = 1.0) -> dict[str, float]:
    """Gas dissolved in water [mol/m3] under the given partial pressures.

    c_i = s Hcp_i(T) p_i, with s the approach to equilibrium (1 = saturated).

    >>> round(loaded({"CO2": 101325.0}, 298.15)["CO2"] * 0.0440095, 3)   # g/L under 1 atm CO2
    1.472
    """
    if not (0.0 < saturation <= 1.0):
        raise InputError("saturation", "must be a fraction in (0, 1]", got=saturation)
    return {g: saturation * solubility(g, temperature_k) * p for g, p in partial_pressures_pa.items() if p > 0}


@dataclass(frozen=True, slots=True)
class Flash:
    """One cubic metre of loaded water flashed at (T, P): moles [mol] released and left, the water
    vapour that leaves with the gas, and the dry partial pressure P - p_sat(T) [Pa]."""

    released_mol: Mapping[str, float]
    remaining_mol: Mapping[str, float]
    water_vapour_mol: float
    dry_pressure_pa: float

    def release_fraction(self, gas: str) -> float:
        """Share of the dissolved ``gas`` that came off."""
        total = self.released_mol.get(gas, 0.0) + self.remaining_mol.get(gas, 0.0)
        return self.released_mol.get(gas, 0.0) / total if total > 0 else 0.0


def flash(loads_mol_m3: Mapping[str, float], temperature_k: float, pressure_pa: float) -> Flash:
    """Equilibrium flash of 1 m3 of water holding ``loads_mol_m3`` into a head space at (T, P).

    With P_d = P - p_sat(T) and G the dry gas released [mol], each gas splits as
    y_i = L_i / (G + Hcp_i P_d) (released y_i G, left Hcp_i y_i P_d); G solves sum y_i = 1.
    No gas comes off if sum L_i / (Hcp_i P_d) <= 1. Water vapour leaving: G p_sat / P_d.

    Parameters
    ----------
    loads_mol_m3 : mapping
        Dissolved gas [mol per m3 of water] by gas.
    temperature_k : float
        Water temperature in the flash [K], within the range of :func:`solubility`.
    pressure_pa : float
        Head-space total pressure [Pa], above p_sat(T) (else the water boils).

    Source: Henry's law and a material balance (single equilibrium stage).

    >>> f = flash({"CO2": 10.0}, 298.15, 20000.0)
    >>> round(f.release_fraction("CO2"), 3)
    0.445
    """
    p_w = water.vapor_pressure(temperature_k)
    p_d = pressure_pa - p_w
    if p_d <= 0.0:
        raise InputError("release pressure", f"must be above the water's vapour pressure "
                         f"{p_w:.0f} Pa at {temperature_k - 273.15:.1f} degC, or the water boils",
                         got=f"{pressure_pa:.0f} Pa")
    h = {g: solubility(g, temperature_k) for g in loads_mol_m3}
    loads = {g: n for g, n in loads_mol_m3.items() if n > 0}

    def excess(g_mol: float) -> float:
        return sum(n / (g_mol + h[g] * p_d) for g, n in loads.items()) - 1.0

    if not loads or excess(0.0) <= 0.0:
        return Flash({g: 0.0 for g in loads}, dict(loads), 0.0, p_d)
    lo, hi = 0.0, sum(loads.values())
    for _ in range(200):
        mid = 0.5 * (lo + hi)
        if excess(mid) > 0.0:
            lo = mid
        else:
            hi = mid
        if hi - lo <= 1e-15 * max(hi, 1e-300):
            break
    g_mol = 0.5 * (lo + hi)
    released, remaining = {}, {}
    for g, n in loads.items():
        y = n / (g_mol + h[g] * p_d)
        released[g] = y * g_mol
        remaining[g] = n - released[g]
    return Flash(released, remaining, g_mol * p_w / p_d, p_d)

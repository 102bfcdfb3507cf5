"""Density and viscosity of a raw CO2 stream (CO2 with water, air gases or flue gas) at T and P.

Mixture rules, stated once: each species' compressibility Z_i and viscosity mu_i come from its
reference equation of state in CoolProp at the mixture's T and total P (water at its partial
pressure, just below saturation); the mixture's Z is the mole-fraction average (Amagat-type ideal
mixing of real gases) and its viscosity follows Wilke (1950). Good to a few per cent for gases
well away from their dew points and below a few MPa; not for liquids.
"""

from __future__ import annotations

from dataclasses import dataclass
from typing import Mapping

from co2routes.thermo.constants import R as _R, WATER_MOLAR_MASS
from co2routes.thermo.errors import InputError, require_positive

#: Species a composition may name: CoolProp fluid name and molar mass [kg/mol] (NIST WebBook).
SPECIES: dict[str, tuple[str, float]] = {
    "CO2": ("CO2", 0.0440095),
    "N2": ("Nitrogen", 0.0280134),
    "O2": ("Oxygen", 0.0319988),
    "Ar": ("Argon", 0.039948),
    "H2O": ("Water", WATER_MOLAR_MASS),
    "CH4": ("Methane", 0.0160425),
    "CO": ("CarbonMonoxide", 0.0280101),
    "H2": ("Hydrogen", 0.00201588),
}


@dataclass(frozen=True, slots=True)
class GasState:
    """A gas mixture at T and P: ``density_kg_m3``, ``viscosity_pa_s``, ``molar_mass_kg_mol``,
    ``compressibility`` Z [-]."""

    density_kg_m3: float
    viscosity_pa_s: float
    molar_mass_kg_mol: float
    compressibility: float


def normalise(composition: Mapping[str, float], known: Mapping[str, object] | None = SPECIES) -> dict[str, float]:
    """Mole fractions that sum to 1, zero entries dropped; the names checked against ``known``
    (:data:`SPECIES` by default, ``None``: any name).

    >>> normalise({"CO2": 3, "N2": 1})
    {'CO2': 0.75, 'N2': 0.25}
    >>> normalise({"CO2": 2.0, "C2H5OH": 2.0, "N2": 0.0}, known=None)
    {'CO2': 0.5, 'C2H5OH': 0.5}
    """
    unknown = [k for k in composition if known is not None and k not in known]
    if unknown:
        raise InputError("gas", "may name only " + ", ".join(SPECIES), got=", ".join(unknown))
    if any(v < 0 for v in composition.values()) or sum(composition.values()) <= 0:
        raise InputError("gas", "mole fractions must be 0 or more and not all zero", got=dict(composition))
    total = float(sum(composition.values()))
    return {k: float(v) / total for k, v in composition.items() if v > 0}


def molar_mass(composition: Mapping[str, float]) -> float:
    """Mean molar mass [kg/mol] of a composition (mole fractions).

    M = sum_i y_i M_i.

    >>> round(molar_mass({"CO2": 1.0}), 7)
    0.0440095
    """
    return sum(y * SPECIES[k][1] for k, y in normalise(composition).items())


def gas_state(temperature_k: float, pressure_pa: float, composition: Mapping[str, float]) -> GasState:
    """Density, viscosity, molar mass and Z of a gas mixture at T and P (rules in module notes).

    rho = P M / (Z R T), Z = sum y_i Z_i(T, P), mu = Wilke(y_i, mu_i(T, P), M_i).

    Parameters
    ----------
    temperature_k : float
        Temperature [K], above each species' triple point (water: its vapour, any T above 273.16 K;
        below that water vapour is left out of the viscosity, where it is under 0.6 %).
    pressure_pa : float
        Total pressure [Pa]; the gas must be a vapour there.
    composition : mapping
        Mole fractions by species name (:data:`SPECIES`).

    Sources: Span & Wagner (1996) and the other reference equations in CoolProp (Bell et al. 2014,
    Ind. Eng. Chem. Res. 53, 2498); Wilke (1950) J. Chem. Phys. 18, 517.

    >>> g = gas_state(298.15, 101325.0, {"CO2": 1.0})
    >>> round(g.density_kg_m3, 3), round(g.viscosity_pa_s * 1e6, 2)
    (1.808, 14.91)
    """
    from co2routes.thermo._lazy import coolprop
    from co2routes.thermo.packed_bed import wilke_viscosity

    cp = coolprop()
    t = require_positive("temperature", temperature_k)
    p = require_positive("pressure", pressure_pa)
    ys = normalise(composition)
    z_mix, fractions, mus, masses = 0.0, [], [], []
    for name, y in ys.items():
        fluid, m = SPECIES[name]
        if name == "H2O":
            z_mix += y
            p_sat = cp.PropsSI("P", "T", t, "Q", 1, "Water") if t >= 273.16 else None
            # dilute-gas viscosity hardly depends on pressure: evaluate the vapour at its partial
            # pressure, kept inside CoolProp's range (above the triple-point pressure 611.655 Pa,
            # below saturation); where no such pressure exists the trace of water is left out of
            # the viscosity (it is under 0.6 % of the gas there)
            if p_sat is not None:
                p_eval = min(max(y * p, 620.0), 0.99 * p_sat)
                if p_eval > 611.66:
                    mus.append(cp.PropsSI("V", "T", t, "P", p_eval, "Water"))
                    fractions.append(y)
                    masses.append(m)
            continue
        try:
            from co2routes.thermo.coolprop_safe import props

            rho_i = props("D", "T", t, "P", p, fluid)  # retried near the critical point
            mu_i = props("V", "T", t, "P", p, fluid)
        except ValueError as err:
            raise InputError("inlet conditions", f"{name} properties are not available at "
                             f"{t:.2f} K and {p:.6g} Pa", got=str(err).splitlines()[0][:80]) from None
        z_mix += y * p * m / (rho_i * _R * t)
        fractions.append(y)
        mus.append(mu_i)
        masses.append(m)
    m_mix = sum(y * SPECIES[k][1] for k, y in ys.items())
    return GasState(
        density_kg_m3=p * m_mix / (z_mix * _R * t),
        viscosity_pa_s=wilke_viscosity(fractions, mus, masses),
        molar_mass_kg_mol=m_mix,
        compressibility=z_mix,
    )


def co2_flow_from_volume_flow(volume_flow_m3_s: float, temperature_k: float, pressure_pa: float,
                              water_ppmv: float, dry_composition: Mapping[str, float]) -> float:
    """CO2 mass flow [kg/s] in a volume flow of wet gas measured at its own T and P.

    m_CO2 = Q rho M_CO2 (1 - y_w) y_CO2,dry / M_wet, with rho and M_wet of the wet mixture from
    :func:`gas_state` (mixture rules in the module notes).

    Parameters
    ----------
    volume_flow_m3_s : float
        Actual volume flow Q [m3/s] at T and P, above 0.
    temperature_k, pressure_pa : float
        Gas temperature [K] and absolute pressure [Pa] where Q is measured.
    water_ppmv : float
        Water in the gas [ppmv], 0 or more.
    dry_composition : mapping
        Mole fractions of the dry gas (must include CO2).

    Sources: as :func:`gas_state`.

    >>> round(co2_flow_from_volume_flow(1e-3 / 60, 298.15, 101325.0, 0.0, {"CO2": 1.0}) * 3.6e6, 1)
    108.5
    """
    q = require_positive("flow", volume_flow_m3_s)
    y_w = water_ppmv * 1e-6
    if not 0.0 <= y_w < 1.0:
        raise InputError("inlet water", "must be from 0 to below 1,000,000 ppmv", got=water_ppmv)
    dry = normalise(dry_composition)
    wet = {k: v * (1.0 - y_w) for k, v in dry.items()}
    if y_w > 0.0:
        wet["H2O"] = wet.get("H2O", 0.0) + y_w
    gas = gas_state(temperature_k, pressure_pa, wet)
    molar_flow = q * gas.density_kg_m3 / gas.molar_mass_kg_mol
    return molar_flow * (1.0 - y_w) * dry.get("CO2", 0.0) * SPECIES["CO2"][1]

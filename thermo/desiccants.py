"""Desiccants for drying CO2: their data and their water isotherms.

The data live in ``thermo/data/desiccants.toml``, each value with its source (published fit,
computed, or from memory) and the demo prices marked invented. Adsorbents (silica gel, molecular
sieves 3A, 4A and 13X, activated alumina) carry a Toth isotherm; calcium chloride is a deliquescent
salt with a capacity per kg and a relative-humidity floor, and is replaced rather than regenerated.

Isotherm loadings are kg of water per kg of dry desiccant; water pressures are partial pressures
[Pa]; temperatures [K].
"""

from __future__ import annotations

import math
import tomllib
from dataclasses import dataclass
from functools import lru_cache
from importlib import resources
from typing import Mapping

from co2routes.thermo.constants import R, WATER_MOLAR_MASS
from co2routes.thermo.errors import InputError, require_positive

#: Specific gas constant of water [J/(kg K)]: R / M_H2O (:mod:`co2routes.thermo.constants`), 461.52.
R_WATER = R / WATER_MOLAR_MASS

#: The desiccant ids, in the order a command lists them.
DESICCANT_IDS: tuple[str, ...] = (
    "silica-gel",
    "molecular-sieve-3a",
    "molecular-sieve-4a",
    "molecular-sieve-13x",
    "activated-alumina",
    "calcium-chloride",
)

#: Order in which a desiccant able to reach a target is suggested (3A first: it excludes CO2).
PREFERENCE: tuple[str, ...] = ("molecular-sieve-3a", "molecular-sieve-4a", "molecular-sieve-13x",
                               "activated-alumina", "silica-gel")


@dataclass(frozen=True, slots=True)
class Desiccant:
    """One desiccant row of ``desiccants.toml``.

    Toth parameters (``kind == "toth"``): ``w_sat`` [kg/kg], ``b0`` [1/Pa], ``q_k`` [K], ``n0`` [-],
    ``c_k`` [K]; the fitted range ``valid_t_k`` and ``valid_p_pa``. Deliquescent salts
    (``kind == "deliquescent"``): ``capacity_kg_per_kg``, ``usable_fraction``, ``rh_floor`` and
    ``deliquescence_rh`` [fractions]. Bed data: bulk density [kg/m3], voidage [-], particle
    diameter [m], heat capacity [J/(kg K)], heat of adsorption [J per kg water], regeneration
    temperature [K], lowest outlet dew point [K] (``None`` where the RH floor sets it), invented
    ``price_per_kg`` (no currency) and ``service_life_cycles``.
    """

    id: str
    label: str
    kind: str
    isotherm_source: str
    bulk_density_kg_m3: float
    voidage: float
    particle_diameter_m: float
    heat_capacity_j_kg_k: float
    price_per_kg: float
    service_life_cycles: int
    regenerable: bool
    heat_of_adsorption_j_kg: float | None = None
    regeneration_temperature_k: float | None = None
    min_dew_point_k: float | None = None
    w_sat: float | None = None
    b0: float | None = None
    q_k: float | None = None
    n0: float | None = None
    c_k: float | None = None
    valid_t_k: tuple[float, float] | None = None
    valid_p_pa: tuple[float, float] | None = None
    capacity_kg_per_kg: float | None = None
    usable_fraction: float | None = None
    rh_floor: float | None = None
    deliquescence_rh: float | None = None
    from_memory: bool = False


@lru_cache(maxsize=1)
def _table() -> dict:
    text = resources.files("co2routes.thermo").joinpath("data/desiccants.toml").read_text(encoding="utf-8")
    return tomllib.loads(text)


@lru_cache(maxsize=1)
def load_desiccants() -> Mapping[str, Desiccant]:
    """All desiccants of ``thermo/data/desiccants.toml`` by id.

    >>> sorted(load_desiccants())[:2]
    ['activated-alumina', 'calcium-chloride']
    """
    rows = {}
    for key, row in _table()["desiccants"].items():
        fields = dict(row)
        for name in ("valid_t_k", "valid_p_pa"):
            if name in fields:
                fields[name] = tuple(float(v) for v in fields[name])
        rows[key] = Desiccant(id=key, **fields)
    return rows


def defaults() -> Mapping[str, float]:
    """The ``[defaults]`` table: demo energy price per kWh (invented) and default L/D."""
    return dict(_table()["defaults"])


def get_desiccant(desiccant_id: str) -> Desiccant:
    """The desiccant called ``desiccant_id``, or an :class:`InputError` naming the allowed ids.

    >>> get_desiccant("silica-gel").bulk_density_kg_m3
    720.0
    """
    table = load_desiccants()
    if desiccant_id not in table:
        raise InputError("desiccant", "must be one of " + ", ".join(DESICCANT_IDS),
                         got=repr(desiccant_id))
    return table[desiccant_id]


def toth_loading(water_pressure_pa: float, temperature_k: float, w_sat: float, b0: float,
                 q_k: float, n0: float, c_k: float = 0.0) -> float:
    """Equilibrium water loading [kg/kg] from a temperature-dependent Toth isotherm.

    w = w_sat b p / (1 + (b p)^n)^(1/n),  b = b0 exp(Q*/T),  n = n0 + c/T

    Parameters
    ----------
    water_pressure_pa : float
        Water partial pressure p [Pa], 0 or more.
    temperature_k : float
        Adsorbent temperature T [K].
    w_sat, b0, q_k, n0, c_k : float
        Saturation loading [kg/kg], affinity pre-factor [1/Pa], affinity temperature Q* [K],
        heterogeneity n0 [-] and its temperature term c [K].

    Valid where the fit was made (see each desiccant's ``valid_t_k`` and ``valid_p_pa``);
    :func:`equilibrium_loading` reports when it extrapolates.

    Source: Toth, J. (1971) Acta Chim. Acad. Sci. Hung. 69, 311; the temperature-dependent form
    and the zeolite parameters of Wang & LeVan (2009) J. Chem. Eng. Data 54, 2839. Their 13X fit
    gives 0.180 kg/kg at 298.15 K and 44 Pa against their measured 0.1834:

    >>> round(toth_loading(44.0, 298.15, 0.2718751143, 2.408e-10, 6852.0, 0.3974, -4.199), 2)
    0.18
    """
    if water_pressure_pa < 0.0 or not math.isfinite(water_pressure_pa):
        raise InputError("water pressure", "must be a finite number, 0 or more", got=water_pressure_pa)
    t = require_positive("temperature", temperature_k)
    if water_pressure_pa == 0.0:
        return 0.0
    b = b0 * math.exp(q_k / t)
    n = n0 + c_k / t
    if n <= 0.0:
        raise InputError("temperature", "is outside the isotherm's range (its exponent n <= 0)", got=t)
    log_bp = math.log(b * water_pressure_pa)
    z = n * log_bp
    # ln[(1 + (bp)^n)^(1/n)] in logs, so a large bp does not overflow.
    log_den = (z if z > 40.0 else math.log1p(math.exp(z))) / n
    return w_sat * math.exp(log_bp - log_den)


def equilibrium_loading(desiccant: Desiccant, water_pressure_pa: float, temperature_k: float) -> float:
    """Equilibrium loading [kg water per kg desiccant] of ``desiccant`` at p_water and T.

    Adsorbents: :func:`toth_loading` with the row's parameters. Deliquescent salts:
    ``capacity_kg_per_kg`` once the relative humidity p / p_sat(T) exceeds ``rh_floor``, else 0
    (below the floor the salt takes up no water).

    Parameters
    ----------
    desiccant : Desiccant
    water_pressure_pa : float
        Water partial pressure [Pa].
    temperature_k : float
        Bed temperature [K].

    Sources: as named in each row (Chua et al. 2002; Wang & LeVan 2009; stoichiometry for CaCl2).

    >>> round(equilibrium_loading(get_desiccant("silica-gel"), 951.0, 298.15), 3)
    0.219
    """
    if desiccant.kind == "deliquescent":
        from co2routes.thermo.water import vapor_pressure

        rh = water_pressure_pa / vapor_pressure(temperature_k)
        return desiccant.capacity_kg_per_kg if rh > desiccant.rh_floor else 0.0
    return toth_loading(water_pressure_pa, temperature_k, desiccant.w_sat, desiccant.b0,
                        desiccant.q_k, desiccant.n0, desiccant.c_k)


def water_pressure_for_loading(desiccant: Desiccant, loading: float, temperature_k: float) -> float:
    """Water partial pressure [Pa] in equilibrium with ``loading`` [kg/kg]: the inverse isotherm.

    Solves w(p, T) = loading for p by bisection on ln p (w rises monotonically with p), between
    1e-12 Pa and 1e7 Pa. A deliquescent salt returns its floor, rh_floor p_sat(T).

    Parameters
    ----------
    desiccant : Desiccant
    loading : float
        Water loading [kg/kg], above 0 and below the saturation loading.
    temperature_k : float
        Bed temperature [K].

    Source: inverse of :func:`toth_loading` (Toth 1971; parameters as in each row).

    >>> sg = get_desiccant("silica-gel")
    >>> round(water_pressure_for_loading(sg, equilibrium_loading(sg, 951.0, 298.15), 298.15), 1)
    951.0
    """
    if desiccant.kind == "deliquescent":
        from co2routes.thermo.water import vapor_pressure

        return desiccant.rh_floor * vapor_pressure(temperature_k)
    require_positive("loading", loading)
    if loading >= desiccant.w_sat:
        raise InputError("loading", f"must be below the saturation loading {desiccant.w_sat:g} kg/kg",
                         got=loading)
    lo, hi = math.log(1e-12), math.log(1e7)
    for _ in range(200):
        mid = 0.5 * (lo + hi)
        if equilibrium_loading(desiccant, math.exp(mid), temperature_k) < loading:
            lo = mid
        else:
            hi = mid
        if hi - lo < 1e-12:
            break
    return math.exp(0.5 * (lo + hi))


def outlet_floor_pressure(desiccant: Desiccant, temperature_k: float) -> float:
    """Lowest water partial pressure [Pa] a fresh or well regenerated bed delivers.

    Adsorbents: p_sat(T_dp,min), the saturation (frost) pressure at the row's lowest reachable
    outlet dew point. Deliquescent salts: rh_floor p_sat(T) at bed temperature T.

    Parameters
    ----------
    desiccant : Desiccant
    temperature_k : float
        Bed temperature [K] (used by the salt only).

    Sources: the rows' ``min_dew_point_k`` (practice values, from memory) and the CaCl2 residual
    water of Bower (1934) and Trusell & Diehl (1963) (from memory); saturation pressures from
    :mod:`co2routes.thermo.water` (IAPWS-95, Murphy & Koop 2005).

    >>> round(outlet_floor_pressure(get_desiccant("silica-gel"), 298.15), 2)   # -50 degC frost
    3.94
    """
    from co2routes.thermo.water import vapor_pressure

    if desiccant.kind == "deliquescent":
        return desiccant.rh_floor * vapor_pressure(temperature_k)
    return vapor_pressure(desiccant.min_dew_point_k)


def extrapolation_warning(desiccant: Desiccant, water_pressure_pa: float,
                          temperature_k: float) -> str | None:
    """A sentence when (p, T) lies outside the range the isotherm was fitted in, else ``None``.

    >>> extrapolation_warning(get_desiccant("molecular-sieve-13x"), 100.0, 298.15) is None
    True
    """
    if desiccant.kind != "toth":
        return None
    t_lo, t_hi = desiccant.valid_t_k
    p_lo, p_hi = desiccant.valid_p_pa
    if t_lo <= temperature_k <= t_hi and p_lo <= water_pressure_pa <= p_hi:
        return None
    return (f"The {desiccant.id} isotherm is used outside its fitted range "
            f"({t_lo - 273.15:.0f} to {t_hi - 273.15:.0f} degC, {p_lo:g} to {p_hi:g} Pa of water) "
            f"at {temperature_k - 273.15:.1f} degC and {water_pressure_pa:.4g} Pa: the loading is "
            "an extrapolation.")


def outlet_limit(d: Desiccant, t_in: float) -> tuple[float, float]:
    """Lowest outlet water pressure [Pa] and residual loading [kg/kg] after regeneration.

    The residual is the equilibrium loading at the regeneration temperature under a purge of
    product gas as dry as the bed delivers (water at :func:`outlet_floor_pressure`); the outlet
    cannot be drier than the water pressure over that residual at bed temperature ``t_in``, nor
    than the floor itself. Salts are replaced fresh: no residual.

    Parameters
    ----------
    d : Desiccant
    t_in : float
        Bed (inlet gas) temperature [K].

    Sources: the isotherms of each row (extrapolated to the regeneration temperature, beyond the
    fitted range) and the practice floors (from memory).

    >>> p_out, res = outlet_limit(get_desiccant("molecular-sieve-13x"), 298.15)
    >>> round(p_out, 3), res < 1e-4
    (0.122, True)
    """
    floor = outlet_floor_pressure(d, t_in)
    if not d.regenerable:
        return floor, 0.0
    residual = equilibrium_loading(d, floor, d.regeneration_temperature_k)
    if residual > 0.0:
        floor = max(floor, water_pressure_for_loading(d, residual, t_in))
    return floor, residual


def suggest_desiccant(t_in: float, p: float, target_ppmv: float, exclude: str = "") -> str | None:
    """The first desiccant of :data:`PREFERENCE` (other than ``exclude``) whose outlet limit
    reaches ``target_ppmv`` at bed temperature ``t_in`` [K] and pressure ``p`` [Pa], or ``None``.

    >>> suggest_desiccant(298.15, 101325.0, 20.0, exclude="silica-gel")
    'molecular-sieve-3a'
    """
    for name in PREFERENCE:
        if name != exclude and outlet_limit(get_desiccant(name), t_in)[0] \
                <= target_ppmv * 1e-6 * p * (1 + 1e-9):
            return name
    return None

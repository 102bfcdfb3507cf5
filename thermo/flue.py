"""Burning a fuel in air: flame temperature, exhaust composition, dew point, condensate, heat.

One mole of fuel is mixed with dry air at the site temperature and pressure; the air carries
the site's CO2. The flame is the adiabatic, constant-pressure (HP) chemical equilibrium of that
mixture; the exhaust cooled back to the site temperature is the constant-temperature (TP)
equilibrium of the same atoms, which is complete combustion to CO2 and H2O: the carbon monoxide
and nitric oxide a real burner leaves are kinetic, not equilibrium, and are reported at the
flame only (an upper figure for what the flame can make). Water above saturation at the site
temperature condenses (vapour pressure from :mod:`co2routes.thermo.water`).

Species thermochemistry: NASA polynomials in Cantera's ``nasa_gas.yaml`` (McBride, Zehe and
Gordon 2002, NASA TP-2002-211556); liquid water and liquid ethanol from :mod:`co2routes.thermo.species`.
Dry air: N2 0.78084, O2 0.209476, Ar 0.00934 mol/mol (U.S. Standard Atmosphere 1976, Table 3),
with the CO2 given in place of the standard's 314 ppm and the three scaled to fill the rest.

>>> c = burn("methane", 0.0)
>>> round(c.dry_fractions()["CO2"], 3)
0.117
"""

from __future__ import annotations

import threading
from dataclasses import dataclass
from functools import lru_cache
from typing import Mapping

from co2routes.thermo import species, species_files, water
from co2routes.thermo._lazy import cantera
from co2routes.thermo.errors import InputError, require_positive

#: Dry air without CO2 [mol/mol] (U.S. Standard Atmosphere 1976, Table 3); scaled to fill 1 - x_CO2.
DRY_AIR = {"N2": 0.78084, "O2": 0.209476, "Ar": 0.00934}

#: Gas species of the equilibrium besides the fuel: products, air, radicals and nitrogen oxides.
PRODUCTS = ("CO2", "H2O", "N2", "O2", "Ar", "CO", "H2", "OH", "H", "O", "HO2", "H2O2",
            "NO", "NO2", "N2O", "N")

#: Site temperatures the exhaust cooling is computed for [K] (0-60 degC: liquid condensate).
T_SITE_MIN_K = 273.15
T_SITE_MAX_K = 333.15
#: Highest excess air accepted (fraction above stoichiometric); lean flames beyond blow out.
MAX_EXCESS_AIR = 4.0


@dataclass(frozen=True, slots=True)
class Fuel:
    """A fuel: ``name`` as the user types it, its Cantera gas species, and the condensed species
    it is fed as (``None`` when it reaches the burner as gas)."""

    name: str
    gas_species: str
    formula: str
    liquid_species: str | None = None


#: The fuels known here. Propane and butane leave their cylinder as vapour (the heat of
#: vaporisation comes from the surroundings); ethanol burns from the liquid.
FUELS: dict[str, Fuel] = {
    "methane": Fuel("methane", "CH4", "CH4"),
    "propane": Fuel("propane", "C3H8", "C3H8"),
    "butane": Fuel("butane", "C4H10,n-butane", "C4H10"),
    "ethanol": Fuel("ethanol", "C2H5OH", "C2H5OH", liquid_species="C2H5OH(l)"),
}


@dataclass(frozen=True, slots=True)
class Combustion:
    """One mole of fuel burnt in air; amounts are mol per mol of fuel.

    ``exhaust_mol`` is the exhaust at the site temperature with all its water still vapour;
    ``cooled_mol`` what stays gas once water above saturation has condensed, and
    ``condensate_mol`` that liquid. ``heat_released_j_per_mol`` is the heat given off when fuel
    and air at the site temperature become cooled exhaust plus condensate at that temperature
    (positive: given off). ``lhv_j_per_kg`` and ``hhv_j_per_kg`` are the lower and higher heating
    values at 298.15 K per kg of fuel as fed. ``dew_point_k`` is that of the exhaust before it
    cools. ``flame_co_ppmv`` and ``flame_no_ppmv`` are equilibrium values at the flame (wet).
    """

    fuel: str
    formula: str
    excess_air: float
    temperature_k: float
    pressure_pa: float
    fuel_molar_mass_kg_mol: float
    air_mol: float
    feed_mol: Mapping[str, float]
    flame_temperature_k: float
    flame_co_ppmv: float
    flame_no_ppmv: float
    exhaust_mol: Mapping[str, float]
    cooled_mol: Mapping[str, float]
    condensate_mol: float
    dew_point_k: float
    heat_released_j_per_mol: float
    lhv_j_per_kg: float
    hhv_j_per_kg: float
    co2_kg_per_kg_fuel: float

    def wet_fractions(self) -> dict[str, float]:
        """Mole fractions of the exhaust before any water condenses (species above 1e-12)."""
        return _fractions(self.exhaust_mol)

    def dry_fractions(self) -> dict[str, float]:
        """Mole fractions of the exhaust with all its water removed (dry basis)."""
        return _fractions({k: v for k, v in self.exhaust_mol.items() if k != "H2O"})

    def cooled_fractions(self) -> dict[str, float]:
        """Mole fractions of the exhaust cooled to the site temperature (saturated with water)."""
        return _fractions(self.cooled_mol)


def _fractions(moles: Mapping[str, float]) -> dict[str, float]:
    total = sum(moles.values())
    return {k: v / total for k, v in moles.items() if v / total > 1e-12}


def air_fractions(co2_fraction: float) -> dict[str, float]:
    """Dry air with ``co2_fraction`` of CO2 [mol/mol]: the U.S. Standard Atmosphere 1976 N2, O2 and
    Ar scaled to fill the rest.

    x_i = x_i,std (1 - x_CO2) / (x_N2 + x_O2 + x_Ar)_std

    Parameters
    ----------
    co2_fraction : float
        CO2 in the air [mol/mol], 0 to 0.05.

    Source: U.S. Standard Atmosphere 1976 (NOAA/NASA/USAF), Table 3.

    >>> round(air_fractions(425e-6)["O2"], 6)
    0.209459
    """
    if not (0.0 <= co2_fraction <= 0.05):
        raise InputError("air CO2 fraction", "must be between 0 and 5 %", got=co2_fraction)
    scale = (1.0 - co2_fraction) / sum(DRY_AIR.values())
    out = {k: v * scale for k, v in DRY_AIR.items()}
    if co2_fraction > 0.0:
        out["CO2"] = co2_fraction
    return out


def stoichiometric_oxygen(fuel: str) -> float:
    """Oxygen for complete combustion [mol O2 per mol fuel], C_xH_yO_z: x + y/4 - z/2.

    >>> stoichiometric_oxygen("propane")
    5.0
    """
    comp = _fuel(fuel).composition
    return comp.get("C", 0.0) + comp.get("H", 0.0) / 4.0 - comp.get("O", 0.0) / 2.0


#: One Cantera mixture per fuel *per thread*: :func:`burn` changes the mixture's state, and the
#: interface runs routes in several threads at once, so a shared object would mix their states.
_PER_THREAD = threading.local()


def _gas(fuel_species: str):
    """An ideal-gas Cantera mixture of the fuel and the products (built once per fuel and thread)."""
    cache = getattr(_PER_THREAD, "gases", None)
    if cache is None:
        cache = _PER_THREAD.gases = {}
    if fuel_species not in cache:
        ct = cantera()
        wanted = set(PRODUCTS) | {fuel_species}
        gas_file = species_files.read("nasa_gas.yaml")
        sp = [gas_file.species(name) for name in gas_file.names if name in wanted]
        cache[fuel_species] = ct.Solution(thermo="ideal-gas", species=sp)
    return cache[fuel_species]


@lru_cache(maxsize=8)
def _fuel_species(fuel_species: str):
    """The fuel's species of ``nasa_gas.yaml`` (read once; not changed here)."""
    return species_files.read("nasa_gas.yaml").species(fuel_species)


def _fuel(fuel: str):
    if fuel not in FUELS:
        raise InputError("fuel", f"must be one of {', '.join(FUELS)}", got=repr(fuel))
    return _fuel_species(FUELS[fuel].gas_species)


def _moles(gas, total_mass_kg: float) -> dict[str, float]:
    """Moles of each species [mol] in ``total_mass_kg`` of the Cantera mixture's current state
    (species below 1e-15 mol/mol left out: they change no balance at 1e-12)."""
    n_total = total_mass_kg / (float(gas.mean_molecular_weight) / 1000.0)
    return {name: float(x) * n_total for name, x in zip(gas.species_names, gas.X) if x > 1e-15}


def heating_values(fuel: str) -> tuple[float, float]:
    """Lower and higher heating values [J/kg of fuel as fed] at 298.15 K.

    LHV = -[x h(CO2,g) + y/2 h(H2O,g) - h(fuel)] / M_fuel (O2 and N2 have h = 0 at 298.15 K);
    HHV the same with liquid water. Ethanol is taken as liquid, the others as gas.

    Parameters
    ----------
    fuel : str
        One of :data:`FUELS`.

    Sources: NASA polynomials (McBride et al. 2002); liquids per :mod:`co2routes.thermo.species`. NIST
    WebBook standard enthalpies of combustion agree within 0.1 % (see tests).

    >>> round(heating_values("methane")[1] / 1e6, 2)
    55.5
    """
    sp = _fuel(fuel)
    comp = sp.composition
    t = 298.15
    h_fuel = _fuel_enthalpy(fuel, t)
    h_co2 = species.enthalpy("CO2(g)", t)
    h_w_gas = species.enthalpy("H2O(g)", t)
    h_w_liq = species.enthalpy("H2O(l)", t)
    m = float(sp.molecular_weight) / 1000.0
    nc, nh = comp.get("C", 0.0), comp.get("H", 0.0)
    lhv = -(nc * h_co2 + nh / 2.0 * h_w_gas - h_fuel) / m
    hhv = -(nc * h_co2 + nh / 2.0 * h_w_liq - h_fuel) / m
    return lhv, hhv


def _fuel_enthalpy(fuel: str, temperature_k: float) -> float:
    """Molar enthalpy [J/mol] of the fuel as fed (liquid ethanol, gaseous others)."""
    liquid = FUELS[fuel].liquid_species
    if liquid is not None:
        return species.enthalpy(liquid, temperature_k)
    return float(_fuel(fuel).thermo.h(temperature_k)) / 1000.0


def burn(fuel: str, excess_air: float, temperature_k: float = 293.15,
         pressure_pa: float = 101325.0, air_co2_fraction: float = 425e-6) -> Combustion:
    """Burn one mole of ``fuel`` with ``excess_air`` in dry air at the site state.

    Air: n_air = (1 + e) n_O2,st / x_O2 with n_O2,st = x + y/4 - z/2 for C_xH_yO_z.
    Flame: HP equilibrium of fuel + air from h_feed(T_site) (liquid ethanol: its liquid
    enthalpy). Cooled exhaust: TP equilibrium at T_site. Water stays vapour up to
    n_H2O,max = n_dry p_sat(T) / (P - p_sat(T)); the rest condenses.
    Heat released: Q = H_feed(T) - [H_gas(T) + n_cond (h_H2O,l(T) - h_H2O,g(T))].

    Parameters
    ----------
    fuel : str
        ``"methane"``, ``"propane"``, ``"butane"`` or ``"ethanol"``.
    excess_air : float
        Air above stoichiometric as a fraction, 0 to 4 (0.15 = 15 % excess).
    temperature_k : float
        Site temperature [K], 273.15-333.15 K (condensate is liquid water).
    pressure_pa : float
        Site pressure [Pa], 50-200 kPa.
    air_co2_fraction : float
        CO2 in the combustion air [mol/mol], 0-5 %.

    Sources: NASA polynomials (McBride et al. 2002) and Cantera's Gibbs minimiser; air per
    :func:`air_fractions`; water vapour pressure IAPWS-95 (:mod:`co2routes.thermo.water`).

    >>> c = burn("propane", 0.15)
    >>> round(c.co2_kg_per_kg_fuel, 3), round(c.flame_temperature_k)
    (2.994, 2138)
    """
    if not (0.0 <= excess_air <= MAX_EXCESS_AIR):
        raise InputError("excess air", f"must be 0 to {MAX_EXCESS_AIR * 100:.0f} % (lean of stoichiometric)",
                         got=excess_air)
    if not (T_SITE_MIN_K <= temperature_k <= T_SITE_MAX_K):
        raise InputError("site temperature", "the exhaust is cooled to the site temperature, "
                         "which must be 0 to 60 degC for liquid condensate", got=f"{temperature_k:.2f} K")
    require_positive("site pressure", pressure_pa)
    if not (5e4 <= pressure_pa <= 2e5):
        raise InputError("site pressure", "must be 50 to 200 kPa", got=f"{pressure_pa:.0f} Pa")
    info = FUELS.get(fuel)
    sp = _fuel(fuel)
    gas = _gas(info.gas_species)
    air = air_fractions(air_co2_fraction)
    n_air = (1.0 + excess_air) * stoichiometric_oxygen(fuel) / air["O2"]
    feed = {info.gas_species: 1.0}
    for k, v in air.items():
        feed[k] = feed.get(k, 0.0) + v * n_air
    mw = {k: float(m) / 1000.0 for k, m in zip(gas.species_names, gas.molecular_weights)}
    mass = sum(n * mw[k] for k, n in feed.items())
    n_feed = sum(feed.values())

    gas.TPX = temperature_k, pressure_pa, feed
    h_feed_gas = float(gas.enthalpy_mole) / 1000.0 * n_feed  # J
    h_fuel_gas = float(sp.thermo.h(temperature_k)) / 1000.0
    h_feed = h_feed_gas - h_fuel_gas + _fuel_enthalpy(fuel, temperature_k)

    gas.HP = h_feed / mass, pressure_pa
    gas.equilibrate("HP", rtol=1e-12)
    flame_t = float(gas.T)
    x = dict(zip(gas.species_names, gas.X))
    flame_co, flame_no = 1e6 * float(x["CO"]), 1e6 * float(x["NO"])

    gas.TP = temperature_k, pressure_pa
    gas.equilibrate("TP", rtol=1e-12)
    exhaust = _moles(gas, mass)
    h_exhaust_gas = float(gas.enthalpy_mole) / 1000.0 * sum(exhaust.values())

    p_sat = water.vapor_pressure(temperature_k)
    n_w = exhaust.get("H2O", 0.0)
    n_dry = sum(exhaust.values()) - n_w
    n_w_max = n_dry * p_sat / (pressure_pa - p_sat)
    condensate = max(0.0, n_w - n_w_max)
    cooled = dict(exhaust)
    cooled["H2O"] = n_w - condensate
    latent = species.enthalpy("H2O(g)", temperature_k) - species.enthalpy("H2O(l)", temperature_k)
    h_products = h_exhaust_gas - condensate * latent

    x_w = n_w / (n_w + n_dry)
    dew = water.dew_point(x_w * pressure_pa)
    lhv, hhv = heating_values(fuel)
    m_fuel = float(sp.molecular_weight) / 1000.0
    return Combustion(
        fuel=fuel, formula=info.formula, excess_air=float(excess_air),
        temperature_k=float(temperature_k), pressure_pa=float(pressure_pa),
        fuel_molar_mass_kg_mol=m_fuel, air_mol=n_air, feed_mol=feed,
        flame_temperature_k=flame_t, flame_co_ppmv=flame_co, flame_no_ppmv=flame_no,
        exhaust_mol=exhaust, cooled_mol=cooled, condensate_mol=condensate, dew_point_k=dew,
        heat_released_j_per_mol=h_feed - h_products, lhv_j_per_kg=lhv, hhv_j_per_kg=hhv,
        co2_kg_per_kg_fuel=sp.composition.get("C", 0.0) * mw["CO2"] / m_fuel,
    )


def element_totals(moles: Mapping[str, float], fuel: str | None = None) -> dict[str, float]:
    """Atoms of each element [mol] in a set of gas species amounts (for balance checks).

    >>> element_totals({"CO2": 1.0, "H2O": 2.0}, "methane")
    {'C': 1.0, 'O': 4.0, 'H': 4.0}
    """
    gas = _gas(FUELS[fuel].gas_species if fuel else "CH4")
    out: dict[str, float] = {}
    for name, n in moles.items():
        for el, k in gas.species(name).composition.items():
            out[el] = out.get(el, 0.0) + k * n
    return out


def fuel_co2_kg_per_kwh(fuel: str) -> float:
    """CO2 made per kWh of fuel burnt, on the higher heating value [kg/kWh].

    e = (x M_CO2 / M_fuel) / (HHV / 3.6e6)

    >>> round(fuel_co2_kg_per_kwh("methane"), 3)
    0.178
    """
    sp = _fuel(fuel)
    m_fuel = float(sp.molecular_weight) / 1000.0
    per_kg = sp.composition.get("C", 0.0) * species.molar_mass("CO2(g)") / m_fuel
    return per_kg / (heating_values(fuel)[1] / 3.6e6)


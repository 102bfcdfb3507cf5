"""Dissolve CO2 from a gas into water, then pull it out again by vacuum or by warming.

Water trickles down a column against the gas (air at the site's CO2, or natural-gas flue gas);
each gas dissolves by Henry's law (:mod:`co2routes.thermo.degassing`, :mod:`co2routes.thermo.henry`). The loaded water
is then flashed under a vacuum or warmed, and gives back a share of what it holds, together with
the nitrogen, oxygen and argon it took up. Air holds so little CO2 that it takes over a thousand
cubic metres of water per kilogram, and the gas that comes back is mostly air: the numbers here
show why this route ranks last for air, and where flue gas makes it merely poor.
"""

from __future__ import annotations

from co2routes.sources.base import Byproduct, Energy, Option, RawGas, RouteRequest, RouteResult, Use
from co2routes.sources.model import RouteModel
from co2routes.sources.common import temperature_change
from co2routes.sources.routes.shared import YES_NO, kwh, percent, saturated
from co2routes.thermo.constants import R
from co2routes.thermo import cautions
from co2routes.thermo.co2 import MOLAR_MASS as M_CO2
from co2routes.thermo.errors import InputError

#: Density [kg/m3] and heat capacity [J/(kg K)] of liquid water at 20-25 degC (IAPWS-95: 998.2
#: and 4181).
WATER_DENSITY = 998.2
WATER_CP = 4181.0
#: Standard gravity [m/s2].
G = 9.80665
#: Gases followed through absorber and release.
GASES = ("CO2", "N2", "O2", "Ar")
#: Excess air of the natural-gas flue used for ``gas = flue`` (common practice for small burners).
FLUE_EXCESS_AIR = 0.15

OPTIONS = (
    Option("gas", "gas the water takes CO2 from", "choice", "air", choices=("air", "flue"),
           help="flue: exhaust of natural gas burnt with 15 % excess air (about 10 % CO2 dry)"),
    Option("saturation", "approach to saturation in the absorber", "fraction", "80 %", low=0.01, high=1.0,
           help="dissolved gas / Henry's-law equilibrium (common practice for a packed column: 70-90 %)"),
    Option("gas_absorbed", "share of the CO2 in the gas that dissolves", "fraction", "50 %", low=0.01, high=1.0),
    Option("release", "release by", "choice", "vacuum", choices=("vacuum", "warming")),
    Option("vacuum_pressure", "vacuum held over the water", "pressure", "5 kPa", low=500.0, high=1e5),
    Option("warm_to", "water warmed to", "temperature", "60 degC", low=273.15, high=333.15),
    Option("heat_recovery", "heat recovered from the warm water", "fraction", "80 %", low=0.0, high=0.95,
           help="counter-flow heat exchanger between outgoing and incoming water (common practice)"),
    Option("column_height", "absorber column height", "length", "3 m", low=0.2, high=30.0),
    Option("pump_efficiency", "pump, blower and vacuum-pump efficiency", "fraction", "50 %", low=0.05, high=1.0),
    Option("recirculate", "water recirculated", "choice", "yes", choices=YES_NO,
           help="no: fresh water each pass, bought by the cubic metre"),
    Option("water_flow", "water circulation rate", "volume_flow", "2 m**3/h", low=1e-6, high=1.0),
)


def compute(request: RouteRequest) -> RouteResult:
    """Henry's-law absorption into water, released under vacuum or by warming.

    Plan one batch delivering ``request.co2_kg`` of CO2.
    """
    from co2routes.thermo.degassing import dissolution_enthalpy, flash, loaded
    from co2routes.thermo.flue import air_fractions, burn
    from co2routes.thermo.water import vapor_pressure

    opt, site = request.options, request.site
    t, p = site.temperature_k, site.pressure_pa
    if opt["gas"] == "air":
        dry = air_fractions(site.air_co2_fraction)
    else:
        dry = burn("methane", FLUE_EXCESS_AIR, t, p, site.air_co2_fraction).dry_fractions()
    dry = {g: x for g, x in dry.items() if g in GASES}
    total = sum(dry.values())
    p_w = vapor_pressure(t)
    partial = {g: x / total * (p - p_w) for g, x in dry.items()}
    load = loaded(partial, t, float(opt["saturation"]))
    vacuum = opt["release"] == "vacuum"
    t_rel = t if vacuum else float(opt["warm_to"])
    p_rel = float(opt["vacuum_pressure"]) if vacuum else p
    if vacuum and p_rel >= p:
        raise InputError("option vacuum_pressure", "must be below the site pressure", got=f"{p_rel:.0f} Pa")
    if not vacuum and t_rel <= t:
        raise InputError("option warm_to", "must be above the site temperature", got=f"{t_rel - 273.15:.1f} degC")
    fl = flash(load, t_rel, p_rel)
    released_co2 = fl.released_mol.get("CO2", 0.0)
    if released_co2 <= 0.0:
        raise InputError("option " + ("vacuum_pressure" if vacuum else "warm_to"),
                         "releases no CO2 from this water: " + ("pull a deeper vacuum" if vacuum else "warm it more"))
    co2_mol = request.co2_kg / M_CO2
    water_m3 = co2_mol / released_co2
    water_kg = water_m3 * WATER_DENSITY
    dissolved_co2 = water_m3 * load["CO2"]
    x_co2_gas = partial["CO2"] / p
    gas_mol = dissolved_co2 / float(opt["gas_absorbed"]) / x_co2_gas
    eta = float(opt["pump_efficiency"])
    head = float(opt["column_height"])
    pump_j = water_kg * G * head / eta
    blower_j = gas_mol * R * t * _log((p + WATER_DENSITY * G * head) / p) / eta
    pumped_mol = water_m3 * (sum(fl.released_mol.values()) + fl.water_vapour_mol)
    vacuum_j = pumped_mol * R * t_rel * _log(p / p_rel) / eta if vacuum else 0.0
    recovery = float(opt["heat_recovery"])
    warm_j = 0.0 if vacuum else water_kg * WATER_CP * (t_rel - t) * (1.0 - recovery)
    latent = 44.0e3  # J/mol, evaporation of water near 20-60 degC (IAPWS-95: 44.0 kJ/mol at 25 degC)
    desorb_j = water_m3 * (sum(-dissolution_enthalpy(g) * n for g, n in fl.released_mol.items())
                           + fl.water_vapour_mol * latent)
    absorb_j = water_m3 * sum(dissolution_enthalpy(g) * n for g, n in load.items())
    elec_kwh = kwh(pump_j + blower_j + vacuum_j)
    uses = [Use("electricity for pumps, blower and vacuum", elec_kwh, "energy_kwh", "electricity")]
    if warm_j > 0:
        uses.append(Use("heat to warm the water", kwh(warm_j), "energy_kwh", "heat"))
    byproducts = ()
    if opt["recirculate"] == "no":
        uses.append(Use("water, once through", water_m3, "volume_m3", "water"))
        byproducts = (Byproduct("degassed water", "H2O", water_kg, "clean; return it or reuse it"),)
    dry_out = {g: n for g, n in fl.released_mol.items() if n > 0}
    raw = saturated(dry_out, t, p)
    purity = dry_out["CO2"] / sum(dry_out.values())
    frac = fl.release_fraction("CO2")
    warnings = [
        f"{water_kg / 1000 / request.co2_kg:.3g} tonnes of water must pass per kg of CO2: each cubic metre "
        f"takes up only {load['CO2'] * M_CO2 * 1000:.3g} g from the gas and gives back {percent(frac)} of it.",
    ]
    if purity < 0.9:
        warnings.append(f"The released gas is only {percent(purity)} CO2 (dry): the nitrogen and oxygen the "
                        "water took up come off with it, and it needs another separation before use.")
    notes = (
        f"Gas bubbled: {gas_mol * R * t / p / request.co2_kg:.3g} m3 per kg CO2 ({percent(x_co2_gas)} CO2).",
        f"Electricity {elec_kwh / request.co2_kg:.3g} kWh per kg CO2 (water pump "
        f"{kwh(pump_j) / request.co2_kg:.3g}, blower {kwh(blower_j) / request.co2_kg:.3g}, vacuum "
        f"{kwh(vacuum_j) / request.co2_kg:.3g}); heat {kwh(warm_j) / request.co2_kg:.3g} kWh per kg.",
        f"Release at {t_rel - 273.15:.0f} degC and {p_rel / 1000:.3g} kPa sets free {percent(frac)} of the "
        f"dissolved CO2.",
        f"Absorbing warms the water by {temperature_change(absorb_j / 1000.0, water_kg, WATER_CP):+.2g} K and "
        f"releasing (gas and water vapour leaving) changes it by "
        f"{temperature_change(desorb_j / 1000.0, water_kg, WATER_CP):+.2g} K: spread over so much water both are tiny.",
    )
    return RouteResult(
        co2_kg=request.co2_kg,
        co2_generated_kg=dissolved_co2 * M_CO2,
        reagents=(), byproducts=byproducts, uses=tuple(uses),
        raw_gas=RawGas(raw, t, p),
        heat_kj=(desorb_j + warm_j) / 1000.0,
        # the release step's heat (gas and vapour leaving the water) spread over the water
        # released, so the sign agrees with heat_kj; absorption's warming is in the notes
        temperature_change_k=temperature_change(desorb_j / 1000.0, water_kg, WATER_CP),
        energy=Energy(electricity_kwh=elec_kwh, heat_kwh=kwh(warm_j)),
        time_h=water_m3 / float(opt["water_flow"]) / 3600.0,
        hazard=1,
        hazard_reason="water, low pressures and at most warm water; CO2 and air released indoors",
        warnings=tuple(warnings),
        cautions=(cautions.ASPHYXIATION,),
        notes=notes,
    )


def _log(x: float) -> float:
    import math

    return math.log(x)


ROUTE = RouteModel("water-absorption", "Absorb in water, release by vacuum or warming", OPTIONS, compute)

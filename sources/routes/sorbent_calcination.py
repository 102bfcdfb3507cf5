"""Load a lime sorbent with CO2 from air, then calcine it to give the CO2 back, pure.

Air is blown through a packed bed of hydrated lime (or quicklime); a share of the CO2 that passes
is taken up as carbonate. The loaded bed is heated in an indirectly fired kiln to the temperature
at which calcite gives off CO2 at the site pressure (:func:`co2routes.thermo.calcination.calcination_temperature`);
the quicklime left is slaked back to hydroxide and reused. Each cycle sinters the lime, so the bed
is sized for the capacity of its last cycle (:func:`co2routes.thermo.lime.conversion_after_cycles`) and a
share of it is bought new each batch. The release step (:func:`release`) and the bed loading
(:func:`load_bed`) are shared with the breath route.
"""

from __future__ import annotations

from dataclasses import dataclass

from co2routes.sources.base import Byproduct, Energy, Option, RawGas, Reagent, RouteRequest, RouteResult, Site, Use
from co2routes.sources.model import RouteModel
from co2routes.sources.routes.shared import kwh, percent, saturated
from co2routes.thermo.constants import R
from co2routes.thermo import cautions
from co2routes.thermo.co2 import MOLAR_MASS as M_CO2
from co2routes.thermo.constants import WATER_MOLAR_MASS as M_H2O

#: Sorbent choice -> (species, name as bought, price key, bulk density [kg/m3]). Bulk densities of
#: granular hydrated lime about 500 and of pebble quicklime about 900 kg/m3 (from memory).
SORBENTS = {
    "ca(oh)2": ("Ca(OH)2(s)", "calcium hydroxide (hydrated lime)", "calcium-hydroxide", 500.0),
    "cao": ("CaO(s)", "calcium oxide (quicklime)", "calcium-oxide", 900.0),
}
#: Void fraction of a randomly packed bed of granules (common practice: 0.36-0.42).
VOIDAGE = 0.40
#: Hours a small kiln takes to heat, calcine and cool one charge (common practice).
KILN_HOURS = 2.0

#: Options of the release step, shared with the breath route.
RELEASE_OPTIONS = (
    Option("sorbent", "sorbent", "choice", "ca(oh)2", choices=tuple(SORBENTS),
           help="ca(oh)2: hydrated lime, slaked again after each calcination; cao: quicklime"),
    Option("cycles", "cycles before the sorbent is replaced", "count", "10", low=1, high=1000),
    Option("kiln_heat", "kiln heated by", "choice", "electricity", choices=("electricity", "natural-gas")),
    Option("kiln_efficiency", "kiln efficiency", "fraction", "50 %", low=0.05, high=1.0,
           help="heat into the charge / energy bought (common practice for small kilns: 30-60 %)"),
)
#: Options of the packed bed the gas is blown through, shared with the breath route.
BED_OPTIONS = (
    Option("bed_depth", "bed depth", "length", "5 cm", low=0.005, high=1.0),
    Option("particle_size", "granule size", "length", "3 mm", low=1e-4, high=0.05),
    Option("gas_velocity", "superficial gas velocity", "velocity", "0.1 m/s", low=0.005, high=2.0),
    Option("fan_efficiency", "fan efficiency", "fraction", "40 %", low=0.05, high=1.0,
           help="common practice for small fans: 30-50 %"),
)
OPTIONS = (
    Option("capture_fraction", "share of the CO2 in the air taken up", "fraction", "50 %", low=0.01,
           high=1.0),
    Option("uptake_time", "time in moving air to load the bed", "time", "3 day", low=3600.0, high=3.2e7,
           help="the sorbent's own uptake rate (common practice for moist hydrated lime: days)"),
) + RELEASE_OPTIONS + BED_OPTIONS


@dataclass(frozen=True, slots=True)
class BedLoading:
    """Gas blown through the bed for one batch: amount [mol], volume at site [m3], bed [kg],
    bed face area [m2], pressure drop [Pa], fan work [J] and the time the gas takes [s]."""

    gas_mol: float
    gas_m3: float
    bed_kg: float
    bed_area_m2: float
    pressure_drop_pa: float
    fan_j: float
    supply_s: float


def load_bed(co2_mol: float, co2_fraction: float, capture_fraction: float, bed_ca_mol: float,
             sorbent: str, temperature_k: float, pressure_pa: float, opt) -> BedLoading:
    """Gas to move and fan work to load ``co2_mol`` into a bed holding ``bed_ca_mol`` of calcium.

    n_gas = n_CO2 / (y c); V = n_gas R T / P; bed volume m / rho_bulk over depth L gives the face
    area A; dP = L (dP/L)_Ergun(d, e, v, rho_air, mu_air); W_fan = dP V / eta; time = V / (A v).
    The gas is taken as air for density and viscosity (:mod:`co2routes.thermo.air`).
    """
    from co2routes.thermo.air import air_density, air_viscosity
    from co2routes.thermo.packed_bed import ergun_gradient

    species, _, _, bulk = SORBENTS[sorbent]
    from co2routes.thermo.species import molar_mass

    gas_mol = co2_mol / (co2_fraction * capture_fraction)
    gas_m3 = gas_mol * R * temperature_k / pressure_pa
    bed_kg = bed_ca_mol * molar_mass(species)
    depth, velocity = float(opt["bed_depth"]), float(opt["gas_velocity"])
    area = bed_kg / bulk / depth
    dp = depth * ergun_gradient(float(opt["particle_size"]), VOIDAGE, velocity,
                                air_density(temperature_k, pressure_pa), air_viscosity(temperature_k, pressure_pa))
    return BedLoading(gas_mol, gas_m3, bed_kg, area, dp, dp * gas_m3 / float(opt["fan_efficiency"]),
                      gas_m3 / (area * velocity))


@dataclass(frozen=True, slots=True)
class Release:
    """The kiln step of one batch and what it costs."""

    conversion: float
    """Carbonate share of the bed's calcium in the last cycle [-]."""
    bed_ca_mol: float
    """Calcium in the bed [mol]."""
    calcination_temperature_k: float
    """Kiln temperature: calcite in equilibrium with CO2 at the site pressure [K]."""
    kiln_heat_j: float
    """Heat into the charge, ambient to kiln temperature, reaction included [J]."""
    kiln_parts_j: tuple[float, float, float]
    """(reaction, carbonate sensible heat, uncarbonated calcium) [J]."""
    steam_mol: float
    """Water driven off the uncarbonated hydroxide [mol]."""
    carbonation_heat_j: float
    """Heat given off in the bed while loading (negative) [J]."""
    slaking_heat_j: float
    """Heat given off slaking the quicklime back (negative; zero for a quicklime bed) [J]."""
    slaking_water_kg: float
    """Water to slake the quicklime [kg]."""
    reagents: tuple[Reagent, ...]
    uses: tuple[Use, ...]
    energy: Energy
    warnings: tuple[str, ...]


def release(co2_mol: float, site: Site, opt) -> Release:
    """Size the bed for its last cycle, then calcine it and slake it back.

    Bed calcium n_Ca = n_CO2 / X_N (X_N: :func:`co2routes.thermo.lime.conversion_after_cycles`); make-up
    bought per batch n_Ca / N; kiln heat n_CO2 q(X_N) (:func:`co2routes.thermo.lime.kiln_heat`) supplied at
    ``kiln_efficiency`` by electricity or natural gas (higher heating value).
    """
    from co2routes.thermo.calcination import calcination_temperature
    from co2routes.thermo.flue import fuel_co2_kg_per_kwh
    from co2routes.thermo.lime import CARBONATION, SLAKING, conversion_after_cycles, kiln_heat, reaction_heat
    from co2routes.thermo.species import molar_mass

    species, name, key, _ = SORBENTS[str(opt["sorbent"])]
    cycles = int(opt["cycles"])
    x = conversion_after_cycles(cycles)
    n_ca = co2_mol / x
    t_c = calcination_temperature(site.pressure_pa).temperature_k
    q = kiln_heat(species, x, site.temperature_k, t_c)
    heat = co2_mol * q.total_j
    carb = co2_mol * reaction_heat(CARBONATION[species], site.temperature_k)
    hydroxide = species == "Ca(OH)2(s)"
    slake = n_ca * reaction_heat(SLAKING, site.temperature_k) if hydroxide else 0.0
    water_kg = n_ca * M_H2O if hydroxide else 0.0
    bought = n_ca / cycles * molar_mass(species)
    supplied = kwh(heat) / float(opt["kiln_efficiency"])
    uses = []
    warnings = []
    if opt["kiln_heat"] == "electricity":
        uses.append(Use("electricity for the kiln", supplied, "energy_kwh", "electricity"))
        energy = Energy(electricity_kwh=supplied)
    else:
        uses.append(Use("natural gas for the kiln (higher heating value)", supplied, "energy_kwh", "natural-gas"))
        energy = Energy(fuel_kwh=supplied)
        emitted = supplied * fuel_co2_kg_per_kwh("methane")
        warnings.append(f"The kiln's natural gas puts {emitted / (co2_mol * M_CO2):.2f} kg CO2 into the air "
                        "for each kg captured (its flue is not captured).")
    if water_kg > 0:
        uses.append(Use("water to slake the quicklime", water_kg / 1000.0, "volume_m3", "water"))
    if not hydroxide:
        warnings.append("Dry quicklime takes CO2 from room-temperature air only slowly; it works once "
                        "moist air has slaked its surface (common practice).")
    if cycles > 1:
        warnings.append(f"Each calcination sinters the lime: in cycle {cycles} only {percent(x)} of the calcium "
                        f"takes CO2 (Grasa & Abanades 2006), so the bed holds {1 / x:.1f} mol Ca per mol CO2.")
    reagent = Reagent(f"{name}, make-up", species[:-3], bought, bought, None, key)
    return Release(x, n_ca, t_c, heat, (co2_mol * q.reaction_j, co2_mol * q.carbonate_sensible_j,
                                          co2_mol * q.rest_j), co2_mol * q.steam_mol, carb, slake,
                   water_kg, (reagent,), tuple(uses), energy, tuple(warnings))


def spent_lime(rel: Release, cycles: int) -> Byproduct:
    """The sintered sorbent retired each batch: as much calcium as the make-up brings in [kg].

    In a steady campaign the bed keeps its size, so the make-up bought per batch (n_Ca / N)
    leaves again as spent sorbent, in the form it was bought (slaked again, or quicklime).
    """
    bought = rel.reagents[0]
    return Byproduct("spent lime", bought.formula, bought.mass_kg,
                     f"sintered sorbent retired after {cycles} cycles, in place of the make-up; caustic "
                     "until it has taken up CO2 from the air: spread on soil or landfill as local rules allow")


def kiln_gas(rel: Release, co2_mol: float, site: Site) -> tuple[dict[str, float], float]:
    """The kiln's gas cooled to the site (saturated mole fractions) and the condensate [kg]."""
    raw = saturated({"CO2": 1.0}, site.temperature_k, site.pressure_pa)
    vapour_mol = co2_mol * raw["H2O"] / raw["CO2"]
    return raw, max(0.0, rel.steam_mol - vapour_mol) * M_H2O


def release_notes(rel: Release, co2_kg: float) -> tuple[str, ...]:
    """Sentences describing the kiln step."""
    r, s, u = rel.kiln_parts_j
    return (
        f"Kiln at {rel.calcination_temperature_k - 273.15:.0f} degC (CO2 over calcite at the site pressure); "
        f"heat into the charge {kwh(rel.kiln_heat_j) / co2_kg:.2f} kWh per kg CO2: reaction {kwh(r) / co2_kg:.2f}, "
        f"heating the carbonate {kwh(s) / co2_kg:.2f}, the rest of the bed {kwh(u) / co2_kg:.2f}.",
        f"Loading gives off {-rel.carbonation_heat_j / 1e3 / co2_kg:.0f} kJ per kg CO2 in the bed"
        + (f" and slaking {-rel.slaking_heat_j / 1e3 / co2_kg:.0f} kJ" if rel.slaking_heat_j else "")
        + ", at room temperature (not recovered here).",
        f"Bed: {rel.bed_ca_mol:.1f} mol Ca, {percent(rel.conversion)} of it carbonated per cycle.",
    )


def kiln_result(request: RouteRequest, rel: Release, bed, load_s: float, *, co2_generated_kg: float,
                byproducts: tuple[Byproduct, ...], hazard_reason: str, first_cautions: tuple[str, ...],
                warnings: list[str], notes: tuple[str, ...]) -> RouteResult:
    """The result of a route whose CO2 comes off a lime bed in the kiln (this route and breath).

    Adds to what the route worked out: the kiln's reagents, uses and energy, the bed fan's
    electricity, the kiln gas cooled to the site, its condensate and the spent lime, the kiln's
    hazard and cautions, and :func:`release_notes`. ``load_s`` is the time to load the bed [s].
    """
    opt, site = request.options, request.site
    fan_kwh = kwh(bed.fan_j)
    raw, condensate = kiln_gas(rel, request.co2_kg / M_CO2, site)
    kiln = (Byproduct("kiln condensate", "H2O", condensate, "clean water from the kiln gas"),) if condensate > 0 else ()
    hazard = 3 if opt["kiln_heat"] == "natural-gas" else 2
    return RouteResult(
        co2_kg=request.co2_kg, co2_generated_kg=co2_generated_kg,
        reagents=rel.reagents,
        byproducts=byproducts + kiln + (spent_lime(rel, int(opt["cycles"])),),
        uses=rel.uses + (Use("electricity for the fan", fan_kwh, "energy_kwh", "electricity"),),
        raw_gas=RawGas(raw, site.temperature_k, site.pressure_pa),
        heat_kj=rel.kiln_heat_j / 1000.0,
        temperature_change_k=None,
        energy=Energy(rel.energy.electricity_kwh + fan_kwh, rel.energy.fuel_kwh, rel.energy.heat_kwh),
        time_h=load_s / 3600.0 + KILN_HOURS,
        hazard=hazard,
        hazard_reason=hazard_reason + ("; a gas-fired kiln also makes carbon monoxide" if hazard == 3 else ""),
        warnings=tuple(warnings),
        cautions=first_cautions + (cautions.HOT_SURFACE, cautions.LIME_DUST, cautions.ASPHYXIATION)
        + ((cautions.BURNER,) if hazard == 3 else ()),
        notes=notes + release_notes(rel, request.co2_kg),
    )


def compute(request: RouteRequest) -> RouteResult:
    """Lime loaded from air in a fan-blown bed, calcined in a kiln, slaked and reused.

    Plan one batch delivering ``request.co2_kg`` of CO2.
    """
    opt, site = request.options, request.site
    co2_mol = request.co2_kg / M_CO2
    rel = release(co2_mol, site, opt)
    bed = load_bed(co2_mol, site.air_co2_fraction, float(opt["capture_fraction"]), rel.bed_ca_mol,
                   str(opt["sorbent"]), site.temperature_k, site.pressure_pa, opt)
    fan_kwh = kwh(bed.fan_j)
    uptake_s = float(opt["uptake_time"])
    load_s = max(bed.supply_s, uptake_s)
    warnings = list(rel.warnings)
    if bed.supply_s > uptake_s:
        warnings.append(f"The fan needs {bed.supply_s / 86400:.1f} days to pass enough air through the bed, "
                        "longer than the sorbent's uptake time: a wider bed or faster air shortens it.")
    notes = (
        f"Air through the bed: {bed.gas_m3 / request.co2_kg:.0f} m3 per kg CO2 at "
        f"{site.air_co2_fraction * 1e6:.0f} ppm, {percent(float(opt['capture_fraction']))} taken up; bed "
        f"{bed.bed_kg:.1f} kg over {bed.bed_area_m2:.2f} m2, pressure drop {bed.pressure_drop_pa:.0f} Pa, "
        f"fan {fan_kwh / request.co2_kg:.3f} kWh per kg CO2.",
    )
    return kiln_result(request, rel, bed, load_s, co2_generated_kg=request.co2_kg, byproducts=(),
                       hazard_reason="kiln near 900 degC and caustic lime dust", first_cautions=(),
                       warnings=warnings, notes=notes)


ROUTE = RouteModel("sorbent-calcination", "Lime sorbent from air, calcined", OPTIONS, compute)

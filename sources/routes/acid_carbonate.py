"""Acid on a carbonate: hydrochloric, sulfuric, acetic or citric acid on soda, limestone or potash.

One batch: the carbonate is weighed out and fully used (it is the limiting reagent); the acid is
given with a small excess so that none of the carbonate is left. Stoichiometry and heat come from
the core's reaction model (:mod:`co2routes.thermo.reaction`, species data of :mod:`co2routes.thermo.species`), the
heat of diluting a strong acid from :mod:`co2routes.thermo.dilution`, solution densities from
:mod:`co2routes.thermo.solutions`, the CO2 the spent liquor keeps from Henry's law (:mod:`co2routes.thermo.henry`) and
the water the gas carries from :mod:`co2routes.thermo.water`.

Model, stated once:

* reaction enthalpies at the site temperature (273.15-373.15 K) with aqueous species at infinite
  dilution, plus the heat of diluting HCl or H2SO4 from its strength to infinite dilution; the
  small heats of dilution of the salts and of acetic acid are left out;
* the liquor is adiabatic (the worst case: a real vessel exchanges some heat with the room) with
  the heat capacity of water (:func:`co2routes.sources.common.temperature_change`);
* the gas leaves saturated with water at the final liquor temperature, and the liquor keeps the
  CO2 Henry's law allows at that temperature under the site pressure less the water vapour
  pressure (the gas dissolving gives heat off, the water evaporating takes heat in: both are in
  the batch heat);
* batch time: the acid is added as fast as foaming allows, taken as a gas rate (option
  ``gas_rate``, default 1 kg CO2 per hour in a vessel with half its height free: common practice).
"""

from __future__ import annotations

from dataclasses import dataclass

from co2routes.sources.base import (Byproduct, Energy, Option, RawGas, Reagent, RouteRequest, RouteResult, Use)
from co2routes.sources.common import temperature_change
from co2routes.sources.model import RouteModel
from co2routes.sources.routes._options import NamedDefaultOption, settings
from co2routes.thermo import cautions
from co2routes.thermo.errors import InputError

#: acid key -> (label, species in the reaction, dilution-table name or None, density-table name,
#: strength as sold or made up [kg/kg], lowest and highest strength allowed, price key)
ACIDS = {
    "hcl": ("hydrochloric acid", "HCl(aq)", "HCl", "HCl", 0.31, 0.01, 0.40, "hydrochloric-acid"),
    "sulfuric": ("sulfuric acid", "H2SO4(aq)", "H2SO4", "H2SO4", 0.96, 0.06, 1.0, "sulfuric-acid"),
    "acetic": ("acetic acid", "CH3COOH(aq)", None, "CH3COOH", 0.05, 0.02, 1.0, "acetic-acid"),
    "citric": ("citric acid", "C6H8O7(s)", None, "C6H8O7", 0.30, 0.05, 0.30, "citric-acid"),
}
#: carbonate key -> (label, species)
CARBONATES = {
    "sodium-bicarbonate": ("sodium bicarbonate", "NaHCO3(s)"),
    "sodium-carbonate": ("sodium carbonate", "Na2CO3(s)"),
    "calcium-carbonate": ("calcium carbonate chips", "CaCO3(s)"),
    "potassium-bicarbonate": ("potassium bicarbonate", "KHCO3(s)"),
}
#: Balanced equations, one per pair (checked by co2routes.thermo.reaction.parse_reaction when used).
EQUATIONS = {
    ("hcl", "sodium-bicarbonate"): "NaHCO3(s) + HCl(aq) -> NaCl(aq) + H2O(l) + CO2(g)",
    ("hcl", "sodium-carbonate"): "Na2CO3(s) + 2 HCl(aq) -> 2 NaCl(aq) + H2O(l) + CO2(g)",
    ("hcl", "calcium-carbonate"): "CaCO3(s) + 2 HCl(aq) -> CaCl2(aq) + H2O(l) + CO2(g)",
    ("hcl", "potassium-bicarbonate"): "KHCO3(s) + HCl(aq) -> KCl(aq) + H2O(l) + CO2(g)",
    ("sulfuric", "sodium-bicarbonate"): "2 NaHCO3(s) + H2SO4(aq) -> Na2SO4(aq) + 2 H2O(l) + 2 CO2(g)",
    ("sulfuric", "sodium-carbonate"): "Na2CO3(s) + H2SO4(aq) -> Na2SO4(aq) + H2O(l) + CO2(g)",
    ("sulfuric", "calcium-carbonate"): "CaCO3(s) + H2SO4(aq) -> CaSO4(s) + H2O(l) + CO2(g)",
    ("sulfuric", "potassium-bicarbonate"): "2 KHCO3(s) + H2SO4(aq) -> K2SO4(aq) + 2 H2O(l) + 2 CO2(g)",
    ("acetic", "sodium-bicarbonate"): "NaHCO3(s) + CH3COOH(aq) -> CH3COONa(aq) + H2O(l) + CO2(g)",
    ("acetic", "sodium-carbonate"): "Na2CO3(s) + 2 CH3COOH(aq) -> 2 CH3COONa(aq) + H2O(l) + CO2(g)",
    ("acetic", "calcium-carbonate"): "CaCO3(s) + 2 CH3COOH(aq) -> Ca(CH3COO)2(aq) + H2O(l) + CO2(g)",
    ("acetic", "potassium-bicarbonate"): "KHCO3(s) + CH3COOH(aq) -> CH3COOK(aq) + H2O(l) + CO2(g)",
    ("citric", "sodium-bicarbonate"): "3 NaHCO3(s) + C6H8O7(s) -> Na3C6H5O7(aq) + 3 H2O(l) + 3 CO2(g)",
    ("citric", "sodium-carbonate"): "3 Na2CO3(s) + 2 C6H8O7(s) -> 2 Na3C6H5O7(aq) + 3 H2O(l) + 3 CO2(g)",
    ("citric", "potassium-bicarbonate"): "3 KHCO3(s) + C6H8O7(s) -> K3C6H5O7(aq) + 3 H2O(l) + 3 CO2(g)",
}
#: Solubility of the product salts in water near 20 degC as a mass fraction of the saturated
#: solution (CRC Handbook, "Aqueous solubility of inorganic compounds"; organic salts from the
#: CRC physical-constants tables; all from memory, +-2 %).
SALT_SOLUBILITY = {
    "NaCl(aq)": 0.264, "KCl(aq)": 0.255, "CaCl2(aq)": 0.427, "Na2SO4(aq)": 0.16, "K2SO4(aq)": 0.10,
    "CH3COONa(aq)": 0.317, "CH3COOK(aq)": 0.72, "Ca(CH3COO)2(aq)": 0.258, "Na3C6H5O7(aq)": 0.42,
    "K3C6H5O7(aq)": 0.62,
}
#: Highest adiabatic liquor temperature a batch is planned for [K] (common practice: keep an open
#: acid batch well below boiling).
T_LIQUOR_MAX_K = 363.15
#: Acid strengths above which the batch counts as a high hazard [kg/kg]: hydrochloric acid above
#: the 20.2 % azeotrope gives off HCl gas faster than water (ICT vapour pressures, as in the CRC
#: Handbook); sulfuric acid above 50 % boils water it meets (common practice).
HCL_FUMING = 0.202
SULFURIC_STRONG = 0.50

OPTIONS = (
    Option("acid", "acid", "choice", "hcl", choices=tuple(ACIDS),
           help="hcl, sulfuric, acetic (vinegar) or citric (a solid, made up in water)"),
    Option("carbonate", "carbonate", "choice", "sodium-bicarbonate", choices=tuple(CARBONATES),
           help="the solid the acid is poured on; it is used up completely"),
    NamedDefaultOption("strength", "acid strength (w/w)", "fraction", "as sold", low=0.01, high=1.0,
                       help="'as sold' = hcl 31 %, sulfuric 96 %, acetic 5 % (vinegar), citric made up "
                            "at 30 % in water; or any strength within the density table"),
    Option("acid_excess", "acid excess over stoichiometric", "fraction", "5 %", low=0.0, high=1.0,
           help="extra acid so that no carbonate is left (common practice 2-10 %)"),
    Option("added_water", "water added per kg of acid solution", "fraction", "0", low=0.0, high=20.0,
           help="kg of water put in the vessel per kg of acid solution, to keep salts dissolved "
                "and the liquor cool (e.g. '1' doubles the liquid)"),
    Option("gas_rate", "gas rate foaming allows", "mass_flow", "1 kg/h", low=1e-7, high=0.1,
           help="CO2 per hour the acid can be added at without foaming over (common practice)"),
)


@dataclass(frozen=True, slots=True)
class Batch:
    """The planned batch: amounts [mol] in and out, for balances and the result."""

    equation: str
    reactions_mol: float
    inputs: dict
    """species -> mol put in (acid and carbonate as pure compounds, water separately)."""
    outputs: dict
    """species -> mol leaving or left: CO2(g) and H2O(g) in the gas, the rest in the liquor."""
    heat_kj: float
    liquor_kg: float
    liquor_water_kg: float
    liquor_temperature_k: float
    strength: float
    acid_solution_kg: float
    added_water_kg: float
    warnings: tuple[str, ...]


def plan(request: RouteRequest) -> Batch:
    """Size a batch that delivers ``request.co2_kg`` of CO2 gas (see the module notes)."""
    from co2routes.thermo import dilution, henry, species, water
    from co2routes.thermo.reaction import parse_reaction

    opt = settings(OPTIONS, request.options)
    acid, carbonate = opt["acid"], opt["carbonate"]
    label, acid_sp, dil_name, dens_name, as_sold, w_low, w_high, _ = ACIDS[acid]
    if (acid, carbonate) not in EQUATIONS:
        raise InputError("option carbonate", "citric acid on calcium carbonate is not planned: calcium "
                         "citrate is barely soluble, coats the chips and stalls the reaction within "
                         "minutes; use hydrochloric or acetic acid on chips", got=carbonate)
    w = as_sold if opt["strength"] is None else float(opt["strength"])
    if not (w_low <= w <= w_high):
        raise InputError("option strength", f"{label} is planned from {w_low:.0%} to {w_high:.0%} w/w; "
                         f"'as sold' gives each acid its own ({label} {as_sold:.0%})", got=f"{w:.1%}")
    rx = parse_reaction(EQUATIONS[(acid, carbonate)])
    carb_sp = CARBONATES[carbonate][1]
    nu_acid, nu_co2 = -rx.coefficient(acid_sp), rx.coefficient("CO2(g)")
    mw = {name: species.molar_mass(name) for name in rx.species_names()}
    m_h2o = species.molar_mass("H2O(l)")
    t_site, p_site = request.site.temperature_k, request.site.pressure_pa
    t_rx = min(max(t_site, 273.15), 373.15)
    warnings: list[str] = []
    if t_rx != t_site:
        warnings.append(f"Reaction heats are taken at {t_rx - 273.15:.0f} degC, the edge of their data, "
                        f"not at the site's {t_site - 273.15:.0f} degC.")

    # everything per mol of reaction as written, then scaled
    acid_mol = nu_acid * (1.0 + opt["acid_excess"])
    acid_solution_kg = acid_mol * mw[acid_sp] / w
    acid_water_mol = acid_solution_kg * (1.0 - w) / m_h2o
    added_water_kg = opt["added_water"] * acid_solution_kg
    h_rx = rx.delta_h(t_rx)
    if dil_name is not None:
        dil = dilution.dilution_enthalpy(dil_name, w)
        h_rx += acid_mol * dil.delta_h_j_per_mol_acid
    h_dissolve = species.enthalpy("CO2(aq)", t_rx) - species.enthalpy("CO2(g)", t_rx)
    h_evaporate = species.enthalpy("H2O(g)", t_rx) - species.enthalpy("H2O(l)", t_rx)
    liquid_in_kg = acid_solution_kg + added_water_kg + sum(c * mw[n] for n, c in rx.reactants if n != acid_sp)
    water_made_mol = rx.coefficient("H2O(l)")
    liquor_water_kg = (acid_water_mol + water_made_mol) * m_h2o + added_water_kg
    # liquor temperature, dissolved CO2 and evaporated water depend on each other: iterate
    t_liq, dissolved_mol, vapour_mol = t_site, 0.0, 0.0
    for _ in range(8):
        heat_j = h_rx + dissolved_mol * h_dissolve + vapour_mol * h_evaporate
        liquor_kg = liquid_in_kg - (nu_co2 - dissolved_mol) * mw["CO2(g)"] - vapour_mol * m_h2o
        t_liq = t_site + temperature_change(heat_j / 1000.0, liquor_kg)
        if t_liq > T_LIQUOR_MAX_K:
            need = _water_needed(heat_j, liquor_kg, t_site, acid_solution_kg, opt["added_water"])
            raise InputError("option added_water", f"this batch would heat its liquor to about "
                             f"{t_liq - 273.15:.0f} degC; add at least {need:.1f} kg water per kg of acid "
                             "solution, or use a weaker acid", got=opt["added_water"])
        t_h = min(max(t_liq, henry.T_MIN_K), henry.T_MAX_K)
        y_w = water.saturated_ppmv(max(t_liq, 273.16), p_site) / 1e6
        c_kg_m3 = henry.dissolved_co2_kg_m3(t_h, p_site * (1.0 - y_w))
        dissolved_mol = c_kg_m3 * (liquor_water_kg - vapour_mol * m_h2o) / 1000.0 / mw["CO2(g)"]
        if dissolved_mol >= nu_co2:
            raise InputError("option strength", f"{label} this weak leaves all the CO2 dissolved in the "
                             "liquor; use a stronger acid", got=f"{w:.1%}")
        vapour_mol = (nu_co2 - dissolved_mol) * y_w / (1.0 - y_w)
    # final amounts fixed: heat and liquor mass from exactly these (the balances close exactly)
    heat_j = h_rx + dissolved_mol * h_dissolve + vapour_mol * h_evaporate
    liquor_kg = liquid_in_kg - (nu_co2 - dissolved_mol) * mw["CO2(g)"] - vapour_mol * m_h2o
    if t_liq > t_h:
        warnings.append(f"The liquor ends near {t_liq - 273.15:.0f} degC, above the 0-60 degC range of "
                        "the Henry's-law data; the CO2 it keeps is estimated at 60 degC.")
    delivered_mol = nu_co2 - dissolved_mol
    scale = request.co2_kg / (delivered_mol * mw["CO2(g)"])

    inputs = {carb_sp: -rx.coefficient(carb_sp) * scale, acid_sp: acid_mol * scale,
              "H2O(l)": (acid_water_mol + added_water_kg / m_h2o) * scale}
    outputs: dict[str, float] = {"CO2(g)": delivered_mol * scale, "CO2(aq)": dissolved_mol * scale,
                                 "H2O(g)": vapour_mol * scale, acid_sp: (acid_mol - nu_acid) * scale}
    for name, c in rx.products:
        if name not in ("CO2(g)", "H2O(l)"):
            outputs[name] = c * scale
    outputs["H2O(l)"] = (acid_water_mol + added_water_kg / m_h2o + water_made_mol - vapour_mol) * scale
    return Batch(rx.equation, scale, inputs, outputs, heat_j * scale / 1000.0, liquor_kg * scale,
                 (liquor_water_kg - vapour_mol * m_h2o) * scale, t_liq, w, acid_solution_kg * scale,
                 added_water_kg * scale, tuple(warnings))


def _deg_c(t_k: float) -> str:
    """A temperature in whole degC for a sentence, never "-0".

    >>> _deg_c(272.9), _deg_c(293.15)
    ('0', '20')
    """
    return str(round(t_k - 273.15) + 0)


def _mixing_order(acid: str, acid_reagent: Reagent, carbonate_label: str, water_kg: float) -> str:
    """The order in which a technician mixes the batch (common practice: acid into water, never
    water into acid, and the solid added in portions so that the foam stays in the vessel)."""
    portions = f"then add the {carbonate_label} in small portions, as the foam allows"
    if acid == "citric":
        return (f"Mix: dissolve the {acid_reagent.mass_kg:.3g} kg citric acid in {water_kg:.3g} kg of "
                f"water, {portions}.")
    volume = "" if acid_reagent.volume_l is None else f" ({acid_reagent.volume_l:.3g} L)"
    if water_kg > 0.0:
        return (f"Mix: put {water_kg:.3g} kg of water in the vessel first, pour the "
                f"{acid_reagent.mass_kg:.3g} kg{volume} of {acid_reagent.name} slowly into it, {portions}.")
    return (f"Mix: put the {carbonate_label} in the vessel and pour the {acid_reagent.mass_kg:.3g} kg"
            f"{volume} of {acid_reagent.name} onto it slowly, as the foam allows.")


def _water_needed(heat_j: float, liquor_kg: float, t_site: float, acid_solution_kg: float,
                  added: float) -> float:
    """Water per kg of acid solution that keeps an adiabatic liquor at 80 degC [kg/kg]."""
    from co2routes.sources.common import LIQUOR_CP_J_KG_K

    extra = -heat_j / (LIQUOR_CP_J_KG_K * max(353.15 - t_site, 1.0)) - liquor_kg
    return added + max(extra, 0.0) / acid_solution_kg


def compute(request: RouteRequest) -> RouteResult:
    """Plan one acid-carbonate batch for ``request`` (see the module notes)."""
    from co2routes.thermo import solutions, species

    opt = settings(OPTIONS, request.options)
    batch = plan(request)
    acid, carbonate = opt["acid"], opt["carbonate"]
    label, acid_sp, _, dens_name, _, _, _, acid_price = ACIDS[acid]
    carb_label, carb_sp = CARBONATES[carbonate]
    w = batch.strength
    m = {name: species.molar_mass(name) for name in (*batch.inputs, *batch.outputs)}
    acid_pure_kg = batch.inputs[acid_sp] * m[acid_sp]
    carb_kg = batch.inputs[carb_sp] * m[carb_sp]
    generated_kg = (batch.outputs["CO2(g)"] + batch.outputs["CO2(aq)"]) * m["CO2(g)"]
    dissolved_kg = batch.outputs["CO2(aq)"] * m["CO2(g)"]
    if acid == "citric":
        acid_reagent = Reagent(label, "C6H8O7", acid_pure_kg, acid_pure_kg, None, acid_price,
                               solute=dens_name)
        water_kg = batch.acid_solution_kg - acid_pure_kg + batch.added_water_kg
    else:
        volume_l = solutions.acid_volume(dens_name, w, acid_pure_kg) * 1000.0
        acid_reagent = Reagent(f"{label} {w:.0%}", _formula(acid_sp), batch.acid_solution_kg,
                               acid_pure_kg, volume_l, acid_price, strength=w, solute=dens_name)
        water_kg = batch.added_water_kg
    reagents = (acid_reagent, Reagent(carb_label, _formula(carb_sp), carb_kg, carb_kg, None, carbonate))

    y_co2, y_w = batch.outputs["CO2(g)"], batch.outputs["H2O(g)"]
    fractions = {"CO2": y_co2 / (y_co2 + y_w), "H2O": y_w / (y_co2 + y_w), "N2": 0.0, "O2": 0.0}
    raw = RawGas(fractions, batch.liquor_temperature_k, request.site.pressure_pa)

    salts = {n: mol * m[n] for n, mol in batch.outputs.items()
             if n not in ("CO2(g)", "CO2(aq)", "H2O(g)", "H2O(l)", acid_sp)}
    excess_acid_kg = batch.outputs[acid_sp] * m[acid_sp]
    warnings = list(batch.warnings)
    notes = [f"Reaction: {batch.equation}; {carb_label} is the limiting reagent, "
             f"{opt['acid_excess']:.0%} acid excess.",
             f"Of {generated_kg:.3g} kg CO2 made, {dissolved_kg:.3g} kg stays dissolved in the liquor "
             f"at {_deg_c(batch.liquor_temperature_k)} degC (Henry's law, Sander 2015).",
             _mixing_order(acid, acid_reagent, carb_label, water_kg),
             "Batch time: CO2 made divided by the gas rate foaming allows (common practice)."]
    for name, kg in salts.items():
        limit = SALT_SOLUBILITY.get(name)
        share = kg / (kg + batch.liquor_water_kg)
        if limit is not None and share > limit:
            warnings.append(f"The spent liquor would hold {share:.0%} {name.split('(')[0]}, above its "
                            f"solubility (about {limit:.0%} near 20 degC, CRC, from memory): salt "
                            "crystallises and can crust the solid; add water (option added_water).")
    if acid == "sulfuric" and carbonate == "calcium-carbonate":
        warnings.append("Sulfuric acid on limestone coats the chips with calcium sulfate, which stops "
                        "the reaction after a few per cent: grind the stone fine and stir hard, or use "
                        "hydrochloric acid.")
    w_mixed = acid_pure_kg / (batch.acid_solution_kg + batch.added_water_kg)
    if acid == "hcl" and w_mixed > HCL_FUMING:
        warnings.append(f"Hydrochloric acid at {w_mixed:.0%} as mixed is above the 20 % azeotrope and "
                        "gives off HCl gas: the raw gas carries some HCl (not counted here); bubble it "
                        "through water or a bicarbonate wash before the dryer.")
    if acid == "sulfuric" and w > SULFURIC_STRONG:
        warnings.append(f"{w:.0%} sulfuric acid heats violently on meeting water: pour it slowly into "
                        "the water already in the vessel, never the reverse.")
    if batch.liquor_temperature_k < request.site.temperature_k - 10.0:
        warnings.append(f"The liquor cools to about {_deg_c(batch.liquor_temperature_k)} degC "
                        "(adiabatic): the room warms it back, but a cold batch reacts more slowly and "
                        "keeps more CO2 dissolved (below 0 degC estimated with Henry's law at 0 degC).")
    if batch.liquor_temperature_k > 333.15:
        warnings.append(f"The liquor warms to about {_deg_c(batch.liquor_temperature_k)} degC "
                        "(adiabatic): add water or add the acid more slowly.")
    neutraliser_kg = batch.outputs[acid_sp] * _protons(acid) * species.molar_mass("NaHCO3(s)")
    held = ", ".join(f"{kg:.3g} kg {_formula(n)}" for n, kg in salts.items())
    byproducts = [Byproduct("spent liquor", "aqueous", batch.liquor_kg,
                            f"holds {held} and {excess_acid_kg:.3g} kg unreacted {label}; neutralise "
                            f"with about {neutraliser_kg:.3g} kg sodium bicarbonate to pH 6-9 before "
                            "disposal")]
    uses = [Use("spent liquor disposal", batch.liquor_kg, "mass_kg", "disposal")]
    if water_kg > 0.0:
        uses.insert(0, Use("water", water_kg / 1000.0, "volume_m3", "water"))
    hazard, reason = _hazard(acid, w, batch.liquor_temperature_k)
    heat = batch.heat_kj
    notes.append(f"The batch {'takes heat in (it cools)' if heat > 0 else 'gives heat off (it warms)'}: "
                 f"{abs(heat):.4g} kJ.")
    return RouteResult(
        co2_kg=request.co2_kg, co2_generated_kg=generated_kg,
        reagents=reagents, byproducts=tuple(byproducts), uses=tuple(uses), raw_gas=raw, heat_kj=heat,
        temperature_change_k=batch.liquor_temperature_k - request.site.temperature_k, energy=Energy(),
        time_h=generated_kg / (opt["gas_rate"] * 3600.0), hazard=hazard, hazard_reason=reason,
        warnings=tuple(warnings), cautions=(cautions.ACID, cautions.SPENT_LIQUOR, cautions.ASPHYXIATION),
        notes=tuple(notes))


def _formula(name: str) -> str:
    """A species name without its phase tag: ``'NaCl(aq)'`` -> ``'NaCl'``."""
    return name[: name.rfind("(")] if name.endswith(")") else name


def _protons(acid: str) -> int:
    """Acidic protons per molecule: HCl 1, H2SO4 2, acetic 1, citric 3."""
    return {"hcl": 1, "sulfuric": 2, "acetic": 1, "citric": 3}[acid]


def _hazard(acid: str, strength: float, t_liquor_k: float) -> tuple[int, str]:
    """Hazard level 1 low, 2 moderate, 3 high, with the reason."""
    if acid == "hcl" and strength > HCL_FUMING:
        return 3, f"concentrated hydrochloric acid ({strength:.0%}) is corrosive and fumes HCl gas"
    if acid == "sulfuric" and strength > SULFURIC_STRONG:
        return 3, f"concentrated sulfuric acid ({strength:.0%}) burns severely and boils water it meets"
    if t_liquor_k > 333.15:
        return 3, f"the liquor gets hot (about {t_liquor_k - 273.15:.0f} degC)"
    if acid in ("hcl", "sulfuric") or strength > 0.25:
        return 2, f"{ACIDS[acid][0]} at {strength:.0%} is corrosive to skin and eyes"
    return 1, f"{ACIDS[acid][0]} at {strength:.0%} is a mild acid; the gas still needs ventilation"


#: The route registered under ``co2routes.sources`` as ``acid-carbonate``.
ROUTE = RouteModel("acid-carbonate", "Acid on a carbonate", OPTIONS, compute)

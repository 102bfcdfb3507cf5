"""Sugar fermented by yeast: glucose, sucrose (inverted first) or dry malt extract to ethanol and CO2.

Stoichiometry (Gay-Lussac): C6H12O6 -> 2 C2H5OH + 2 CO2, 0.4886 kg CO2 per kg glucose; sucrose is
first hydrolysed, C12H22O11 + H2O -> 2 C6H12O6. Dry malt extract is only partly fermentable: its
fermentable share (option ``malt_fermentable``, default 75 % as glucose equivalent: common
practice, the usual apparent attenuation of malt-extract worts; from memory) is counted as glucose,
the rest (dextrins, protein) stays in the wash. Pure maltose is not offered (refused as an unknown
choice): the species data carry no published formation enthalpy for it, and borrowing sucrose's
would give its heat a false precision.
Only a fraction of the sugar follows
that equation (option ``efficiency``): the rest goes to glycerol, yeast growth and other by-products
and is carried here as sugar left in the wash, so that the balances close.

Heat from the reaction model (:mod:`co2routes.thermo.reaction`): dissolving the sugar, hydrolysing a
disaccharide, then C6H12O6(aq) -> 2 C2H5OH(aq) + 2 CO2(g) (about -101 kJ/mol; "about 24 kcal per
mol of sugar fermented", Colombie et al. 2007, Biotechnol. Bioeng.), with the CO2 kept dissolved by
Henry's law at the fermenter temperature (:mod:`co2routes.thermo.henry`) and the water the gas carries away
saturated at that temperature (:mod:`co2routes.thermo.water`).

Headspace purge (well-mixed exponential washout, Danckwerts 1953, Chem. Eng. Sci. 2, 1;
:mod:`co2routes.thermo.purge`): the fermenter's headspace (option ``headspace``, a share of the must
volume) starts as air; the gas is collected only once the outlet reaches ``collect_purity``, which
takes V_h ln(1 / (1 - y*)) of CO2, and the headspace keeps the rest (1 - y*) V_h after the switch.
That CO2 is made but not recovered, beside the CO2 left dissolved.

By-product (option ``byproduct = yes``): the brew is made anyway, so its sugar, yeast, water and
vessels are paid for by the beer and cost the CO2 nothing; collection, drying and delivery are
still charged by the comparison.

Time to finish (common practice, not a published kinetic law): a 200 g/L must at 20 degC with an
ordinary wine or ale yeast ferments out in about 7 days; the time scales with the sugar
concentration and halves for every 10 K warmer (Q10 = 2), used from 15 to 32 degC.
"""

from __future__ import annotations

from dataclasses import dataclass

from co2routes.sources.base import Byproduct, Energy, Option, RawGas, Reagent, RouteRequest, RouteResult, Use
from co2routes.sources.model import RouteModel
from co2routes.sources.routes._options import NamedDefaultOption, settings
from co2routes.sources.routes.shared import YES_NO
from co2routes.thermo import cautions
from co2routes.thermo.errors import InputError

#: sugar key -> (label, species as bought, hydrolysis equation or None, price key, note)
SUGARS = {
    "glucose": ("glucose (dextrose)", "C6H12O6(s)", None, "glucose", ""),
    "sucrose": ("sucrose (table sugar)", "C12H22O11(s)", "C12H22O11(s) + H2O(l) -> 2 C6H12O6(aq)",
                "sucrose", ""),
    "malt-extract": ("dry malt extract", "C6H12O6(s)", None, "malt-extract",
                     "Dry malt extract: its fermentable share is counted as glucose (maltose's own "
                     "hydrolysis heat, a few kJ/mol, is left out); the rest stays in the wash."),
}
DISSOLVE = "C6H12O6(s) -> C6H12O6(aq)"
FERMENT = "C6H12O6(aq) -> 2 C2H5OH(aq) + 2 CO2(g)"
#: Reference time to finish [days] at T_REF and C_REF, and the Q10 of the rate (common practice).
T_REF_K, C_REF_KG_M3, DAYS_REF, Q10 = 293.15, 200.0, 7.0, 2.0
#: Temperatures the time rule is used over [K] (common practice for wine and ale yeasts).
T_RULE_LOW_K, T_RULE_HIGH_K = 288.15, 305.15
#: Must density rise per kg/m3 of dissolved sugar [-]: slope of the CRC Handbook sucrose density
#: table near 20 % w/w, 20 degC (1.0810 g/cm3 at 20 %; from memory); glucose is within 1 %.
MUST_DENSITY_SLOPE = 0.384
WATER_DENSITY_20C = 998.2

OPTIONS = (
    Option("sugar", "sugar", "choice", "sucrose", choices=tuple(SUGARS),
           help="glucose (dextrose), sucrose (table sugar, inverted by the yeast) or malt-extract "
                "(dry malt extract, partly fermentable); pure maltose is not offered: no published "
                "formation enthalpy of it is in the species data, so its heat would be a guess"),
    Option("efficiency", "share of theoretical yield", "fraction", "92 %", low=0.5, high=1.0,
           help="share of the sugar that follows Gay-Lussac's equation; practical 90-95 % "
                "(common practice), the rest goes to glycerol and yeast growth"),
    Option("sugar_concentration", "sugar in the must", "density", "200 g/L", low=20.0, high=350.0,
           help="sugar per litre of must; above about 300 g/L yeast struggles"),
    NamedDefaultOption("temperature", "fermenter temperature", "temperature", "site",
                       low=278.15, high=313.15,
                       help="'site' = the site's temperature; 5-40 degC, best 15-32 degC"),
    Option("yeast", "yeast dose", "density", "0.5 g/L", low=0.05, high=10.0,
           help="dry yeast per litre of must (common practice 0.2-1 g/L)"),
    Option("headspace", "fermenter headspace", "fraction", "25 %", low=0.0, high=2.0,
           help="headspace as a share of the must volume; fermenters are filled to about 75-80 % "
                "(common practice)"),
    Option("collect_purity", "collect from purity", "fraction", "99 %", low=0.5, high=0.9999,
           help="CO2 fraction at which collection starts; the headspace gas before it is vented"),
    Option("byproduct", "CO2 as a by-product of a brew", "choice", "no", choices=YES_NO,
           help="yes: the brew is made anyway, so sugar, yeast, water and vessels cost the CO2 "
                "nothing; collection, drying and delivery are still charged"),
    Option("malt_fermentable", "fermentable share of malt extract", "fraction", "75 %", low=0.3, high=1.0,
           help="kg of fermentable sugar (as glucose) per kg of dry malt extract (common practice "
                "about 75 %)"),
)


@dataclass(frozen=True, slots=True)
class Batch:
    """The planned fermentation: amounts [mol] in and out (yeast left out: it passes through)."""

    inputs: dict
    outputs: dict
    heat_kj: float
    must_m3: float
    water_kg: float
    temperature_k: float
    days: float
    warnings: tuple[str, ...]
    #: CO2 made but lost to the headspace purge and fill [mol] (:mod:`co2routes.thermo.purge`)
    purged_mol: float = 0.0


def plan(request: RouteRequest) -> Batch:
    """Size a fermentation that delivers ``request.co2_kg`` of CO2 gas."""
    from co2routes.thermo import henry, species, water
    from co2routes.thermo.purge import CO2_MOLAR_MASS, purge_loss
    from co2routes.thermo.reaction import parse_reaction

    opt = settings(OPTIONS, request.options)
    label, sugar_sp, hydrolysis, _, _ = SUGARS[opt["sugar"]]
    t = request.site.temperature_k if opt["temperature"] is None else float(opt["temperature"])
    if not (278.15 <= t <= 313.15):
        raise InputError("option temperature", "yeast ferments from 5 to 40 degC", got=f"{t - 273.15:.1f} degC")
    eff, conc, p = opt["efficiency"], opt["sugar_concentration"], request.site.pressure_pa
    warnings: list[str] = []
    if not (T_RULE_LOW_K <= t <= T_RULE_HIGH_K):
        warnings.append(f"At {t - 273.15:.0f} degC the fermentation is outside the 15-32 degC the time "
                        "rule is used for: below it yeast is slow and may stop, above it it stresses and dies.")

    # per mol of hexose in the must, then scaled
    ferment = parse_reaction(FERMENT)
    m = {n: species.molar_mass(n) for n in ("C6H12O6(aq)", "C2H5OH(aq)", "CO2(g)", "H2O(l)", sugar_sp)}
    if hydrolysis is None:
        sugar_mol, h_prep, water_used = 1.0, parse_reaction(DISSOLVE).delta_h(t), 0.0
    else:
        sugar_mol, h_prep, water_used = 0.5, 0.5 * parse_reaction(hydrolysis).delta_h(t), 0.5
    co2_made = 2.0 * eff
    sugar_kg = sugar_mol * m[sugar_sp]
    must_m3 = sugar_kg / conc
    water_kg = must_m3 * (WATER_DENSITY_20C + MUST_DENSITY_SLOPE * conc) - sugar_kg
    water_end_mol = water_kg / m["H2O(l)"] - water_used
    y_w = water.saturated_ppmv(t, p) / 1e6
    c = henry.dissolved_co2_kg_m3(t, p * (1.0 - y_w))
    dissolved = c * water_end_mol * m["H2O(l)"] / 1000.0 / m["CO2(g)"]
    purged = purge_loss(must_m3 * opt["headspace"], opt["collect_purity"], t, p).lost_kg / CO2_MOLAR_MASS
    if dissolved + purged >= co2_made:
        raise InputError("option sugar_concentration", "so little sugar leaves all its CO2 dissolved "
                         "or in the headspace", got=conc)
    delivered = co2_made - dissolved - purged
    vapour = delivered * y_w / (1.0 - y_w)
    heat = (h_prep + eff * ferment.delta_h(t)
            + dissolved * (species.enthalpy("CO2(aq)", t) - species.enthalpy("CO2(g)", t))
            + vapour * (species.enthalpy("H2O(g)", t) - species.enthalpy("H2O(l)", t)))
    scale = request.co2_kg / (delivered * m["CO2(g)"])
    inputs = {sugar_sp: sugar_mol * scale, "H2O(l)": water_kg / m["H2O(l)"] * scale}
    outputs = {"CO2(g)": delivered * scale, "CO2(aq)": dissolved * scale, "H2O(g)": vapour * scale,
               "C2H5OH(aq)": 2.0 * eff * scale, "C6H12O6(aq)": (1.0 - eff) * scale,
               "H2O(l)": (water_end_mol - vapour) * scale}
    days = DAYS_REF * (conc / C_REF_KG_M3) * Q10 ** ((T_REF_K - t) / 10.0)
    return Batch(inputs, outputs, heat * scale / 1000.0, must_m3 * scale, water_kg * scale, t, days,
                 tuple(warnings), purged * scale)


def compute(request: RouteRequest) -> RouteResult:
    """Plan one fermentation batch for ``request`` (see the module notes)."""
    from co2routes.thermo import species

    opt = settings(OPTIONS, request.options)
    batch = plan(request)
    label, sugar_sp, _, price_key, sugar_note = SUGARS[opt["sugar"]]
    mm = {n: species.molar_mass(n) for n in (*batch.inputs, *batch.outputs)}
    sugar_kg = batch.inputs[sugar_sp] * mm[sugar_sp]
    share = opt["malt_fermentable"] if opt["sugar"] == "malt-extract" else 1.0
    bought_kg = sugar_kg / share
    must_l = batch.must_m3 * 1000.0
    yeast_kg = opt["yeast"] * batch.must_m3
    generated = (batch.outputs["CO2(g)"] + batch.outputs["CO2(aq)"] + batch.purged_mol) * mm["CO2(g)"]
    ethanol_kg = batch.outputs["C2H5OH(aq)"] * mm["C2H5OH(aq)"]
    wash_kg = (sum(batch.outputs[n] * mm[n] for n in ("C2H5OH(aq)", "C6H12O6(aq)", "CO2(aq)", "H2O(l)"))
               + bought_kg - sugar_kg)
    y_c, y_w = batch.outputs["CO2(g)"], batch.outputs["H2O(g)"]
    fractions = {"CO2": y_c / (y_c + y_w), "H2O": y_w / (y_c + y_w), "N2": 0.0, "O2": 0.0}
    hours = batch.days * 24.0
    watts_per_l = -batch.heat_kj * 1000.0 / (hours * 3600.0) / must_l
    warnings = list(batch.warnings)
    warnings.append("The gas carries ethanol vapour, more as the wash strengthens; the dryer does not "
                    "remove it. The first gas out is the air of the headspace: purge it before use.")
    notes = [
        f"Gay-Lussac: C6H12O6 -> 2 C2H5OH + 2 CO2 at {opt['efficiency']:.0%} of the theoretical yield; "
        f"{sugar_kg:.3g} kg {label if opt['sugar'] != 'malt-extract' else 'fermentable sugar'} in "
        f"{must_l:.4g} L of must ({opt['sugar_concentration']:.0f} g/L).",
        f"The batch gives off {-batch.heat_kj:.4g} kJ over {batch.days:.1f} days: about "
        f"{watts_per_l:.2g} W per litre of must: small per hour, so an open or thin-walled vessel "
        "loses most of it to the room; an insulated one warms and ferments faster.",
        "Time to finish: 7 days for 200 g/L at 20 degC, in proportion to the sugar, halving per 10 K "
        "warmer (Q10 = 2; common practice).",
    ]
    if sugar_note:
        notes.append(sugar_note)
    notes.append(_recovery_note(batch, opt, mm["CO2(g)"], generated))
    abv = ethanol_kg / 789.0 / batch.must_m3
    byproducts = (
        Byproduct("ethanol", "C2H5OH", ethanol_kg, f"in the wash, about {abv:.0%} by volume"),
        Byproduct("spent wash", "aqueous", wash_kg, "ethanol, unfermented sugar, glycerol; usable as "
                  "wash for distilling or to a drain where local rules allow"),
        Byproduct("yeast lees", "biomass", yeast_kg, "settled yeast; compost it"),
    )
    if share < 1.0:
        notes.append(f"{bought_kg:.3g} kg of dry malt extract holds {sugar_kg:.3g} kg fermentable sugar "
                     f"({share:.0%}, as glucose; common practice); the rest stays in the wash.")
    formula = "malt extract" if opt["sugar"] == "malt-extract" else sugar_sp.split("(")[0]
    reagents = (Reagent(label, formula, bought_kg, sugar_kg, None, price_key),
                Reagent("dry yeast", "yeast", yeast_kg, yeast_kg, None, "yeast"))
    uses = (Use("water for the must", batch.water_kg / 1000.0, "volume_m3", "water"),)
    if opt["byproduct"] == "yes":
        notes.append(f"By-product: the brew's {sugar_kg:.3g} kg {label}, {yeast_kg * 1000:.3g} g yeast, "
                     f"{batch.water_kg:.4g} kg water and its vessels are paid for by the drink, not "
                     "charged to the CO2; collection, drying and delivery are.")
        reagents, uses = (), ()
    return RouteResult(
        co2_kg=request.co2_kg, co2_generated_kg=generated,
        reagents=reagents, byproducts=byproducts, uses=uses,
        raw_gas=RawGas(fractions, batch.temperature_k, request.site.pressure_pa),
        heat_kj=batch.heat_kj, temperature_change_k=None,
        energy=Energy(), time_h=hours, hazard=1,
        hazard_reason="food-grade sugar and yeast; the CO2 and ethanol vapour must be vented",
        warnings=tuple(warnings), cautions=(cautions.FERMENTER, cautions.ASPHYXIATION), notes=tuple(notes))


def _recovery_note(batch: Batch, opt: dict, molar_mass: float, generated_kg: float) -> str:
    """Where the CO2 made goes: recovered, left dissolved, lost to the headspace purge."""
    lost = batch.purged_mol * molar_mass
    dissolved = batch.outputs["CO2(aq)"] * molar_mass
    return (f"Of {generated_kg:.4g} kg CO2 made, {dissolved:.3g} kg stays dissolved and {lost:.3g} kg "
            f"({lost / generated_kg:.1%}) goes to the headspace: vented until the gas reaches "
            f"{opt['collect_purity']:.1%} CO2 and left in a {opt['headspace']:.0%} headspace "
            f"(well-mixed washout, Danckwerts 1953); {batch.outputs['CO2(g)'] * molar_mass / generated_kg:.1%} "
            "is recovered.")


#: The route registered under ``co2routes.sources`` as ``fermentation``.
ROUTE = RouteModel("fermentation", "Sugar fermentation", OPTIONS, compute)

"""Buying the CO2: a cylinder refill, bulk liquid, or dry ice, at the price book's price.

The form bought follows the scenario's end product unless the option ``form`` says otherwise:
gas -> a high-pressure cylinder, liquid -> bulk liquid, dry ice -> dry ice. The gas is beverage
grade: at least 99.9 % CO2 by volume with at most 20 ppm water by volume (ISBT quality
guidelines); the rest is taken as air-like inerts (N2 and O2, O2 at most 30 ppmv by the same
guidelines).

Dry ice sublimes on the way and in storage: the loss is an option, 10 % per day by default in an
insulated transport box (common practice; a good chest loses 5-10 % a day, a cardboard box more).
"""

from __future__ import annotations

from co2routes.sources.base import Energy, Option, RawGas, Reagent, RouteRequest, RouteResult
from co2routes.sources.model import RouteModel
from co2routes.sources.routes._options import settings
from co2routes.thermo import cautions
from co2routes.thermo.errors import InputError

#: form -> (what is bought, price key, what the route hands over)
FORMS = {
    "co2-cylinder": ("CO2 cylinder refill", "co2-cylinder", "gas"),
    "co2-liquid": ("bulk liquid CO2", "co2-liquid", "liquid"),
    "dry-ice": ("dry ice", "dry-ice", "dry-ice"),
}
#: end product -> form bought when ``form`` is ``match``
MATCH = {"gas": "co2-cylinder", "liquid": "co2-liquid", "dry-ice": "dry-ice"}
#: ISBT beverage-grade limits: purity and water [mol/mol], O2 [mol/mol].
PURITY, WATER_PPMV, O2_PPMV = 0.999, 20.0, 30.0

OPTIONS = (
    Option("form", "form bought", "choice", "match", choices=("match", *FORMS),
           help="'match' buys in the scenario's end-product form (gas -> cylinder, liquid -> bulk "
                "liquid, dry-ice -> dry ice)"),
    Option("sublimation_loss", "dry-ice loss per day", "fraction", "10 %", low=0.0, high=0.5,
           help="share of the dry ice that sublimes each day in transport and storage (common practice)"),
    Option("transport_time", "time from seller to use", "time", "1 day", low=0.0, high=30 * 86400.0,
           help="how long the gas travels and waits from the seller to use (dry ice sublimes meanwhile)"),
)


def compute(request: RouteRequest) -> RouteResult:
    """Plan one purchase that delivers ``request.co2_kg`` of CO2 in the form bought."""
    opt = settings(OPTIONS, request.options)
    form = opt["form"]
    if form == "match":
        if request.end_product not in MATCH:
            raise InputError("end product", f"must be one of {', '.join(MATCH)}", got=request.end_product)
        form = MATCH[request.end_product]
    label, price_key, delivers = FORMS[form]
    warnings: list[str] = []
    notes = ["Beverage grade: at least 99.9 % CO2 and at most 20 ppmv water (ISBT quality guidelines)."]
    bought = request.co2_kg
    days = opt["transport_time"] / 86400.0
    if form == "dry-ice":
        kept = (1.0 - opt["sublimation_loss"]) ** days
        bought = request.co2_kg / kept
        notes.append(f"Buy {bought:.3g} kg: {opt['sublimation_loss']:.0%} a day sublimes over "
                     f"{days:.2g} days (common practice for an insulated box).")
        if days > 3:
            warnings.append(f"Dry ice kept {days:.0f} days loses {1 - kept:.0%}: buy closer to use.")
    if delivers != request.end_product and delivers != "gas":
        warnings.append(f"Bought as {delivers} but the scenario asks for {request.end_product}.")
    inerts = 1.0 - PURITY - WATER_PPMV * 1e-6
    fractions = {"CO2": PURITY, "H2O": WATER_PPMV * 1e-6, "O2": O2_PPMV * 1e-6, "N2": inerts - O2_PPMV * 1e-6}
    raw = RawGas(fractions, request.site.temperature_k, request.site.pressure_pa)
    if form == "dry-ice":
        held = (cautions.DRY_ICE, cautions.ASPHYXIATION)
        hazard, reason = 2, "dry ice burns skin and its gas displaces air in closed spaces"
    elif form == "co2-liquid":
        held = (cautions.COLD_LIQUID, cautions.PRESSURE, cautions.ASPHYXIATION)
        hazard, reason = 2, "liquid CO2 is stored under pressure and flashes to snow at -78 degC"
    else:
        held = (cautions.PRESSURE, cautions.CYLINDER_HEAT, cautions.ASPHYXIATION)
        hazard, reason = 2, "a high-pressure cylinder (about 57 bar at 20 degC) must be secured and kept cool"
    return RouteResult(
        co2_kg=request.co2_kg, co2_generated_kg=bought,
        reagents=(Reagent(label, "CO2", bought, bought, None, price_key),), byproducts=(), uses=(),
        raw_gas=raw, heat_kj=0.0, temperature_change_k=None, energy=Energy(),
        time_h=opt["transport_time"] / 3600.0, hazard=hazard,
        hazard_reason=reason, warnings=tuple(warnings), cautions=held, notes=tuple(notes),
        delivers=delivers)


#: The route registered under ``co2routes.sources`` as ``purchase``.
ROUTE = RouteModel("purchase", "Buy CO2", OPTIONS, compute)

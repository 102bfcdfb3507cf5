"""Burn a fuel and take the CO2 from its exhaust (or use the cooled exhaust as it is).

The flue gas comes from a Cantera equilibrium (:func:`co2routes.thermo.flue.burn`); water above saturation
at the site temperature condenses. With ``capture = yes`` the CO2 is separated from the cooled
flue gas and charged as electricity: the least thermodynamic work (:mod:`co2routes.thermo.separation`,
House et al. 2011) divided by a second-law efficiency. With ``capture = no`` the product is the
cooled flue gas itself, fit only for direct enrichment (a greenhouse), not for drying or
compression. Fuels are bought: propane, butane and ethanol by the kilogram (reagents), natural
gas by its higher heating value (a use priced per kWh). Heat the user puts to work earns a
credit at the price book's ``heat`` price.
"""

from __future__ import annotations

from co2routes.sources.base import Byproduct, Energy, Option, RawGas, Reagent, RouteRequest, RouteResult, Use
from co2routes.sources.model import RouteModel
from co2routes.sources.routes.shared import YES_NO, kwh, percent, saturated
from co2routes.thermo import cautions
from co2routes.thermo.co2 import MOLAR_MASS as M_CO2
from co2routes.thermo.constants import WATER_MOLAR_MASS
from co2routes.thermo.gasmix import normalise

#: Price-book key, display name and formula of each fuel bought by mass.
_BOUGHT = {"propane": ("propane", "propane (LPG)"), "butane": ("butane", "n-butane (LPG butane)"),
           "ethanol": ("ethanol-fuel", "ethanol (burner fuel)")}
#: Density of liquid ethanol at 20 degC [kg/L] (CRC Handbook: 0.7893 g/cm3).
ETHANOL_DENSITY_KG_L = 0.7893
#: Excess air below which a warning about carbon monoxide is given (common practice: small
#: burners are set to 10-20 % excess air to keep CO low).
LOW_EXCESS_AIR = 0.05

OPTIONS = (
    Option("fuel", "fuel", "choice", "methane", choices=("methane", "propane", "butane", "ethanol"),
           help="methane stands for natural gas (bought per kWh of higher heating value)"),
    Option("excess_air", "excess air", "fraction", "15 %", low=0.0, high=4.0,
           help="air above the stoichiometric amount"),
    Option("capture", "separate the CO2 from the flue gas", "choice", "yes", choices=YES_NO,
           help="no: the cooled flue gas itself is the product (direct greenhouse enrichment)"),
    Option("capture_fraction", "share of the flue CO2 recovered", "fraction", "90 %", low=0.01, high=1.0),
    Option("second_law_efficiency", "separation second-law efficiency", "fraction", "25 %", low=0.01,
           high=1.0, help="minimum work / work spent; 25 % is common practice for small amine or "
                          "sorbent units"),
    Option("heat_used", "the burner's heat is put to use", "choice", "no", choices=YES_NO,
           help="yes: the heat given off earns a credit at the price book's heat price"),
    Option("burner_power", "burner firing rate", "power", "5 kW", low=100.0, high=2e6,
           help="fuel burnt per hour, as higher heating value"),
)


def compute(request: RouteRequest) -> RouteResult:
    """Fuel burnt in air; CO2 separated from the flue gas or the flue gas used as it is.

    Plan one batch delivering ``request.co2_kg`` of CO2.
    """
    from co2routes.thermo.flue import burn
    from co2routes.thermo.separation import separation_work

    opt = request.options
    site = request.site
    fuel = str(opt["fuel"])
    capture = opt["capture"] == "yes"
    c = burn(fuel, float(opt["excess_air"]), site.temperature_k, site.pressure_pa,
             site.air_co2_fraction)
    co2_flue = c.exhaust_mol["CO2"]                 # mol per mol fuel, fuel plus air carbon
    recovered = co2_flue * (float(opt["capture_fraction"]) if capture else 1.0)
    co2_mol = request.co2_kg / M_CO2
    fuel_mol = co2_mol / recovered
    fuel_kg = fuel_mol * c.fuel_molar_mass_kg_mol
    fuel_kwh = kwh(fuel_kg * c.hhv_j_per_kg)
    heat_j = fuel_mol * c.heat_released_j_per_mol
    cooled = c.cooled_fractions()
    y_flue = cooled["CO2"]

    reagents: list[Reagent] = []
    uses: list[Use] = []
    if fuel == "methane":
        uses.append(Use("natural gas (higher heating value)", fuel_kwh, "energy_kwh", "natural-gas",
                        feed_kg=fuel_kg))
    else:
        key, name = _BOUGHT[fuel]
        volume = fuel_kg / ETHANOL_DENSITY_KG_L if fuel == "ethanol" else None
        reagents.append(Reagent(name, c.formula, fuel_kg, fuel_kg, volume, key))
    sep_kwh = 0.0
    if capture:
        w = separation_work(y_flue, site.temperature_k, float(opt["capture_fraction"]),
                            float(opt["second_law_efficiency"]))
        sep_kwh = kwh(w * co2_mol)
        uses.append(Use("electricity to separate CO2 from the flue gas", sep_kwh, "energy_kwh", "electricity"))
    if opt["heat_used"] == "yes":
        uses.append(Use("heat put to use (credit)", -kwh(heat_j), "energy_kwh", "heat"))

    if capture:
        raw = saturated({"CO2": 1.0}, site.temperature_k, site.pressure_pa)
    else:
        raw = normalise({k: v for k, v in cooled.items() if v > 1e-9}, known=None)
    condensate_kg = fuel_mol * c.condensate_mol * WATER_MOLAR_MASS
    warnings = _warnings(c, capture, y_flue, opt)
    notes = (
        f"Flue gas (dry): {', '.join(f'{k} {percent(v)}' for k, v in sorted(c.dry_fractions().items(), key=lambda kv: -kv[1]) if v > 1e-4)}.",
        f"Flame {c.flame_temperature_k - 273.15:.0f} degC (adiabatic equilibrium); exhaust dew point "
        f"{c.dew_point_k - 273.15:.1f} degC; condensate {condensate_kg / request.co2_kg:.2f} kg per kg CO2.",
        f"{c.co2_kg_per_kg_fuel:.3f} kg CO2 per kg {fuel} burnt; heating values {c.lhv_j_per_kg / 1e6:.2f} "
        f"(lower) and {c.hhv_j_per_kg / 1e6:.2f} MJ/kg (higher); {fuel_kg / request.co2_kg:.3f} kg fuel per kg CO2 delivered.",
        f"Heat given off {kwh(heat_j) / request.co2_kg:.2f} kWh per kg CO2 delivered (exhaust cooled to the site temperature).",
    ) + ((f"Separation: {sep_kwh / request.co2_kg:.3f} kWh per kg CO2 at {percent(float(opt['second_law_efficiency']))} "
          f"of the least work from {percent(y_flue)} CO2.",) if capture else ())
    return RouteResult(
        co2_kg=request.co2_kg,
        co2_generated_kg=fuel_mol * co2_flue * M_CO2,
        reagents=tuple(reagents),
        byproducts=(Byproduct("flue condensate", "H2O", condensate_kg,
                              "slightly acidic (dissolved CO2 and nitrogen oxides): drain it to a sewer"),),
        uses=tuple(uses),
        raw_gas=RawGas(raw, site.temperature_k, site.pressure_pa),
        heat_kj=-heat_j / 1000.0,
        temperature_change_k=None,
        energy=Energy(electricity_kwh=sep_kwh, fuel_kwh=fuel_kwh),
        time_h=fuel_kwh / (float(opt["burner_power"]) / 1000.0),
        hazard=3,
        hazard_reason="open flame and flammable gas; the burner makes carbon monoxide and uses up oxygen",
        warnings=warnings,
        cautions=(cautions.BURNER, cautions.ASPHYXIATION),
        notes=notes,
    )


def _warnings(c, capture: bool, y_flue: float, opt) -> tuple[str, ...]:
    out = []
    if c.excess_air < LOW_EXCESS_AIR:
        out.append(f"At {percent(c.excess_air)} excess air the flame holds {c.flame_co_ppmv:.0f} ppm CO at "
                   "equilibrium and a real burner leaves much of it: set 10-20 % excess air and check CO.")
    if not capture:
        out.append(f"Without separation the product is flue gas with {percent(y_flue)} CO2, saturated with water "
                   "and carrying traces of CO and nitrogen oxides: fit for direct greenhouse enrichment only, "
                   "not for drying, compressing or dry ice.")
    out.append(f"The flame can make up to {c.flame_no_ppmv:.0f} ppm NO at equilibrium; real burners make less, "
               "but plants and people need the exhaust scrubbed or diluted.")
    if capture and opt["heat_used"] == "no":
        out.append("The burner's heat is thrown away; where it can warm a room or a greenhouse set heat_used = yes.")
    return tuple(out)


ROUTE = RouteModel("combustion", "Burn a fuel (flue gas)", OPTIONS, compute)

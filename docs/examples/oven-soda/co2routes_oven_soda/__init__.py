"""Example co2routes route: CO2 from baking soda heated in an electric oven.

2 NaHCO3(s) -> Na2CO3(s) + H2O(g) + CO2(g), which runs at a useful rate from about 120 degC
(common practice for baking soda; from memory). The gas leaves with one mol of steam per mol of
CO2; cooled to the site, most of the steam condenses and the rest goes on, saturated, to the
dryer. What is left in the tray is washing soda (Na2CO3) and the soda that did not convert.

Heat into the charge per mol CO2: dH_r(298 K) + 2 cp(NaHCO3) (T_oven - T_site), with dH_r =
dfH(Na2CO3) + dfH(H2O, g) + dfH(CO2) - 2 dfH(NaHCO3) = -1130.68 - 241.818 - 393.51 + 2 x 950.81
= +135.61 kJ/mol and cp(NaHCO3, s) = 87.61 J/(mol K), all from the NBS tables (Wagman et al.
1982, J. Phys. Chem. Ref. Data 11, Suppl. 2). The products' sensible heat is neglected (the gas
leaves the oven cooled by the charge). The oven's electricity is that heat over its efficiency.

This module imports only :mod:`co2routes.api`, as a plug-in should.
"""

from __future__ import annotations

from co2routes import api

#: Molar masses [kg/mol] from the IUPAC 2021 standard atomic weights (abridged).
M_NAHCO3 = 0.084007
M_NA2CO3 = 0.105988
#: Enthalpy of the decomposition per mol CO2 at 298.15 K [J/mol] (NBS, see the module notes).
REACTION_J_MOL = 135.61e3
#: Heat capacity of solid NaHCO3 [J/(mol K)] (NBS).
CP_NAHCO3 = 87.61
#: Price key of the soda this route buys; the route ships its own default price for it.
SODA_KEY = "oven-soda-bulk"

OPTIONS = (
    api.Option("oven_temperature", "oven temperature", "temperature", "200 degC", low=393.15, high=523.15,
               help="120-250 degC; hotter converts faster and costs more heat"),
    api.Option("conversion", "share of the soda converted", api.FRACTION, "95 %", low=0.5, high=1.0,
               help="what a tray of soda gives in the bake time"),
    api.Option("oven_efficiency", "oven efficiency", api.FRACTION, "50 %", low=0.05, high=1.0,
               help="heat into the charge / electricity drawn"),
    api.Option("bake_time", "bake time", "time", "1.5 h", low=600.0, high=86400.0),
)

CAUTION = ("The oven and the tray reach 200 degC and the gas leaving it is hot and humid: vent it, "
           "wear oven gloves, and keep the leftover washing soda (an eye irritant) out of food use.")


def compute(request: api.RouteRequest) -> api.RouteResult:
    """One oven batch delivering ``request.co2_kg`` of CO2 (see the module notes for the balance).

    >>> site = api.Site()
    >>> opts = {o.key: o.parse(o.default) for o in OPTIONS}
    >>> r = compute(api.RouteRequest(co2_kg=1.0, site=site, options=opts))
    >>> round(r.reagents[0].mass_kg, 3), round(r.heat_kj)
    (4.019, 3836)
    """
    opt, site = request.options, request.site
    n = request.co2_kg / api.CO2_MOLAR_MASS
    conversion = float(opt["conversion"])
    t_oven = float(opt["oven_temperature"])
    soda_kg = 2.0 * n / conversion * M_NAHCO3
    heat_j = n * (REACTION_J_MOL + 2.0 * CP_NAHCO3 * (t_oven - site.temperature_k) / conversion)
    raw = api.saturated({"CO2": 1.0}, site.temperature_k, site.pressure_pa)
    condensate_kg = max(0.0, n - n * raw["H2O"] / raw["CO2"]) * api.WATER_MOLAR_MASS
    electricity = api.kwh(heat_j) / float(opt["oven_efficiency"])
    leftover_kg = 2.0 * n * (1.0 / conversion - 1.0) * M_NAHCO3
    warnings = []
    if t_oven < 423.15:
        warnings.append("Below 150 degC the soda converts slowly: give it a longer bake time.")
    return api.RouteResult(
        co2_kg=request.co2_kg,
        co2_generated_kg=request.co2_kg,
        reagents=(api.Reagent("baking soda (bulk)", "NaHCO3", soda_kg, soda_kg, None, SODA_KEY,
                              api.PRICE_PER_MASS),),
        byproducts=(api.Byproduct("washing soda", "Na2CO3", n * M_NA2CO3 + leftover_kg,
                                  "left in the tray, with the soda that did not convert"),
                    api.Byproduct("condensate", "H2O", condensate_kg, "from the gas cooled to the site")),
        uses=(api.Use("electricity for the oven", electricity, api.ENERGY_KWH, "electricity"),),
        raw_gas=api.RawGas(raw, site.temperature_k, site.pressure_pa),
        heat_kj=heat_j / 1000.0,
        temperature_change_k=None,
        energy=api.Energy(electricity_kwh=electricity),
        time_h=float(opt["bake_time"]) / 3600.0,
        hazard=api.HAZARD_MEDIUM,
        hazard_reason="an oven near 200 degC and hot humid gas",
        warnings=tuple(warnings),
        cautions=(CAUTION, api.ASPHYXIATION),
        notes=(f"Heat into the charge {heat_j / 1e6 / request.co2_kg:.2f} MJ per kg CO2 at "
               f"{t_oven - 273.15:.0f} degC, {conversion:.0%} converted.",),
    )


#: The route, registered in this package's pyproject.toml under ``co2routes.sources``.
ROUTE = api.RouteModel("oven-soda", "Baking soda in an oven (example plug-in)", OPTIONS, compute,
                       prices={SODA_KEY: "1.10 / kg"})

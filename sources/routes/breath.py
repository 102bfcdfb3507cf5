"""CO2 from people's breath: exhaled air drawn through a lime bed, which is then calcined.

People breathe room air in and out through mouthpieces or a hood; a small fan draws the exhaled
air (about 4 % CO2, saturated with water near body temperature) through a hydrated-lime bed. The
bed is released in a kiln exactly as in the lime-sorbent route (:func:`co2routes.sources.routes.
sorbent_calcination.release`), so the two routes share one release model. The CO2 made per person
follows Persily & de Jonge (2017). A batch needs enough people for long enough: if the options
do not suffice, the route says so and counts the hours it would take.
"""

from __future__ import annotations

from co2routes.sources.base import Byproduct, Option, RouteRequest, RouteResult
from co2routes.sources.model import RouteModel
from co2routes.sources.routes.shared import kwh, percent, saturated
from co2routes.thermo.constants import R
from co2routes.sources.routes.sorbent_calcination import (BED_OPTIONS, M_H2O, RELEASE_OPTIONS, kiln_result,
                                                load_bed, release)
from co2routes.thermo import cautions
from co2routes.thermo.co2 import MOLAR_MASS as M_CO2

#: CO2 in mixed exhaled air, dry basis [mol/mol]: about 4 % at rest (textbook respiratory
#: physiology, e.g. West, *Respiratory Physiology*; from memory).
EXHALED_CO2_DRY = 0.04
#: Temperature exhaled air is saturated at [K]: 34 degC (breath leaves the mouth at 34-35 degC,
#: common physiology; from memory).
EXHALED_K = 307.15
#: Persily & de Jonge (2017) constant [L kPa / (K MJ)] in V = RQ BMR M (T/P) 0.000211 (s/day folded in).
PERSILY_K = 0.000211
#: Seconds in a day.
DAY_S = 86400.0

OPTIONS = (
    Option("people", "people breathing into the collector", "count", "4", low=1, high=1000),
    Option("hours", "hours they breathe into it per batch", "time", "8 h", low=60.0, high=3.2e7),
    Option("met", "activity (metabolic equivalents, MET)", "fraction", "1.2", low=0.7, high=12.0,
           help="1.0 at rest lying, 1.2-1.3 seated, 2-3 light work (Persily & de Jonge 2017)"),
    Option("rq", "respiratory quotient", "fraction", "0.85", low=0.7, high=1.0,
           help="CO2 made / O2 used; 0.85 for a mixed diet (Persily & de Jonge 2017)"),
    Option("bmr", "basal metabolic rate per person", "power", "6.7 MJ/day", low=30.0, high=180.0,
           help="6.7 MJ/day: mean of a 30-60-year-old man of 80 kg and woman of 70 kg by the "
                "Schofield equations Persily & de Jonge use (from memory)"),
    Option("capture_fraction", "share of the exhaled CO2 taken up by the bed", "fraction", "90 %",
           low=0.01, high=1.0),
) + RELEASE_OPTIONS + BED_OPTIONS


def co2_generation_rate(rq: float, bmr_mj_per_day: float, met: float, temperature_k: float = 273.15,
                        pressure_pa: float = 101325.0) -> tuple[float, float]:
    """CO2 a person breathes out: volume flow [L/s] at (T, P) and molar flow [mol/s].

    V_CO2 = RQ BMR M (T / P) 0.000211, with BMR [MJ/day], T [K], P [kPa]; molar flow
    n = V P / (R T) = RQ BMR M 0.000211 / R (R = 8.314 L kPa/(mol K)).

    Parameters
    ----------
    rq : float
        Respiratory quotient [-], 0.7-1.0.
    bmr_mj_per_day : float
        Basal metabolic rate [MJ/day], 3-15.
    met : float
        Activity level [MET], 0.7-12.
    temperature_k, pressure_pa : float
        State the volume is given at [K], [Pa] (default 0 degC and 1 atm, i.e. STPD).

    Source: Persily, A.; de Jonge, L. (2017) "Carbon dioxide generation rates for building
    occupants", Indoor Air 27, 868-879, eq. for V_CO2 (constant 0.000211 from memory; at
    BMR 6.7 MJ/day and rest it gives 0.19 L/min STPD, the textbook resting 200 mL/min).

    >>> v, n = co2_generation_rate(0.85, 6.7, 1.0)
    >>> round(v * 60, 3), round(n * 0.0440095 * 86400, 3)
    (0.194, 0.55)
    """
    from co2routes.thermo.errors import InputError

    if not (0.7 <= rq <= 1.0 and 3.0 <= bmr_mj_per_day <= 15.0 and 0.7 <= met <= 12.0):
        raise InputError("metabolism", "needs RQ 0.7-1.0, BMR 3-15 MJ/day and 0.7-12 MET",
                         got=(rq, bmr_mj_per_day, met))
    k = rq * bmr_mj_per_day * met * PERSILY_K
    litres = k * temperature_k / (pressure_pa / 1000.0)
    return litres, k / R  # R = 8.314 L kPa/(mol K), the same number as in J/(mol K)


def exhaled_air(rq: float, air: dict[str, float], pressure_pa: float) -> dict[str, float]:
    """Mole fractions of exhaled air saturated at :data:`EXHALED_K`.

    Dry basis: CO2 4 %, oxygen lowered by the CO2 / RQ taken up, nitrogen and argon in their air
    ratio for the rest; then saturated with water (:func:`co2routes.sources.routes.shared.saturated`).
    """
    o2 = air["O2"] - EXHALED_CO2_DRY / rq
    inert = {k: v for k, v in air.items() if k in ("N2", "Ar")}
    share = (1.0 - EXHALED_CO2_DRY - o2) / sum(inert.values())
    dry = {"CO2": EXHALED_CO2_DRY, "O2": o2, **{k: v * share for k, v in inert.items()}}
    return saturated(dry, EXHALED_K, pressure_pa)


def compute(request: RouteRequest) -> RouteResult:
    """Exhaled breath drawn through a lime bed; the bed calcined as in the sorbent route.

    Plan one batch delivering ``request.co2_kg`` of CO2.
    """
    from co2routes.thermo.flue import air_fractions
    from co2routes.thermo.water import vapor_pressure

    opt, site = request.options, request.site
    co2_mol = request.co2_kg / M_CO2
    capture = float(opt["capture_fraction"])
    exhaled_mol = co2_mol / capture
    _, per_person = co2_generation_rate(float(opt["rq"]), float(opt["bmr"]) * DAY_S / 1e6, float(opt["met"]))
    people = int(opt["people"])
    needed_s = exhaled_mol / (people * per_person)
    given_s = float(opt["hours"])
    warnings = []
    if needed_s > given_s:
        made = people * per_person * given_s * capture * M_CO2
        warnings.append(f"{people} people over {given_s / 3600:.3g} h give only {made:.3g} kg of CO2 into the "
                        f"bed; the batch needs {needed_s / 3600:.3g} h of breathing (or more people).")
    breath = exhaled_air(float(opt["rq"]), air_fractions(site.air_co2_fraction), site.pressure_pa)
    rel = release(co2_mol, site, opt)
    bed = load_bed(co2_mol, breath["CO2"], capture, rel.bed_ca_mol, str(opt["sorbent"]),
                   site.temperature_k, site.pressure_pa, opt)
    # water breathed out per mol of exhaled gas, and what condenses when it cools to the site
    gas_mol = exhaled_mol / breath["CO2"]
    water_out = gas_mol * breath["H2O"]
    p_s = vapor_pressure(site.temperature_k)
    line_condensate = max(0.0, water_out - gas_mol * (1 - breath["H2O"]) * p_s / (site.pressure_pa - p_s)) * M_H2O
    warnings.append(f"Exhaled air is saturated at {EXHALED_K - 273.15:.0f} degC: it carries "
                    f"{water_out * M_H2O / request.co2_kg:.2f} kg of water per kg CO2, of which "
                    f"{line_condensate / request.co2_kg:.2f} kg condenses in the collector line: drain it.")
    warnings.extend(rel.warnings)
    fan_kwh = kwh(bed.fan_j)
    rate_kg_day = per_person * M_CO2 * DAY_S
    notes = (
        f"Each person breathes out {rate_kg_day:.2f} kg CO2 per day at {float(opt['met']):.2g} MET "
        f"(Persily & de Jonge 2017); exhaled air {percent(breath['CO2'])} CO2, {percent(breath['H2O'])} water.",
        f"Gas through the bed {bed.gas_m3 / request.co2_kg:.1f} m3 per kg CO2, pressure drop "
        f"{bed.pressure_drop_pa:.0f} Pa, fan {fan_kwh / request.co2_kg:.4f} kWh per kg CO2.",
    )
    condensate = Byproduct("breath condensate", "H2O", line_condensate, "drained from the collector line")
    return kiln_result(request, rel, bed, max(needed_s, 0.0), co2_generated_kg=exhaled_mol * M_CO2,
                       byproducts=(condensate,), first_cautions=(cautions.BREATH,),
                       hazard_reason="kiln near 900 degC and caustic lime; CO2 builds up where people gather",
                       warnings=warnings, notes=notes)


ROUTE = RouteModel("breath", "Captured breath (lime bed, calcined)", OPTIONS, compute)

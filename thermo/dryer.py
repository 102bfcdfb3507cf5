"""Desiccant dryer for raw CO2: bed size, pressure drop, breakthrough, regeneration and cost.

Method (one fixed bed, downflow, sized for one adsorption period):

1. Water taken up per cycle from the inlet and outlet water contents (ideal mixing).
2. Equilibrium loading at the inlet (the desiccant's isotherm, :mod:`co2routes.thermo.desiccants`) less the
   residual left by regeneration with a purge of product gas (as dry as the bed delivers) at the
   regeneration temperature: the working capacity.
3. Saturated-zone length from the water load; plus a mass-transfer-zone (MTZ) allowance
   L_MTZ = (v/35 ft/min)^0.3 Z with Z = 1.70 ft for 1/8-in particles (0.85 ft for 1/16-in; taken
   proportional to particle size): GPSA Engineering Data Book, 12th ed. (2004), sec. 20 (from
   memory); the saturated zone + MTZ design is the one of Abdel-Aal, Aggour & Fahim (2003)
   Petroleum and Gas Field Processing, dehydration chapter, after Campbell. When the target is
   tighter than the zone's 5 % edge, the stretch of front between 5 % and the target is added.
4. Diameter from the user, from a length-to-diameter ratio (default 3, common practice), or
   widened so the superficial velocity stays below the velocity at which the Ergun gradient
   reaches 0.33 psi/ft (7.47 kPa/m), the design gradient for downflow beds (GPSA sec. 20, from
   memory); the bed's total drop is checked against 8 psi (Abdel-Aal et al. 2003).
5. Breakthrough curve: constant-pattern front with linear-driving-force uptake
   (:func:`co2routes.thermo.packed_bed.constant_pattern_shape`), its rate constant set so the 5-95 % front
   spans the MTZ; the bed is lengthened if the outlet would pass the target before the cycle ends.
6. Regeneration heat: desiccant and held water heated to the regeneration temperature, plus the
   heat of adsorption of the water load (vessel, purge and losses not counted).

The lowest outlet water content is the larger of the desiccant's practice floor and the water
pressure over the residual loading at the bed's product end.

The steps live in two modules by job: :mod:`co2routes.thermo.dryer_duty` (steps 1-2: the water
to take up and the working capacity) and :mod:`co2routes.thermo.dryer_bed` (steps 3-5: geometry,
pressure drop, breakthrough front); this module sizes, prices the regeneration (step 6) and draws
the breakthrough curve.
"""

from __future__ import annotations

from dataclasses import dataclass, field
from typing import Mapping

from co2routes.thermo import water_co2
from co2routes.thermo.co2 import ATMOSPHERE_PA
from co2routes.thermo.desiccants import DESICCANT_IDS, Desiccant, defaults, get_desiccant
from co2routes.thermo.dryer_bed import DESIGN_GRADIENT_PA_M, MAX_BED_DROP_PA, Bed, front_shape, size_bed
from co2routes.thermo.dryer_duty import ISBT_SOURCE, ISBT_WATER_PPMV, Duty, duty, inlet_ppmv
from co2routes.thermo.errors import InputError
from co2routes.thermo.packed_bed import interpolate

#: Heat capacity of liquid water near 25 degC [J/(kg K)] (IAPWS-95: 4.18 kJ/(kg K)).
_CP_WATER = 4180.0


@dataclass(frozen=True, slots=True)
class DryerInput:
    """What the dryer must do. SI units; at most one inlet-water and one target field is set.

    ``co2_flow_kg_s`` [kg/s] of CO2 through the bed; ``dry_composition`` the dry gas's mole
    fractions (default pure CO2; e.g. flue gas ``{"CO2": 0.12, "N2": 0.85, "O2": 0.03}``);
    inlet temperature [K] and pressure [Pa]; inlet water as ppmv, a relative humidity (fraction)
    or a dew point [K], saturated when none is given; target as ppmv or dew point [K], ISBT
    20 ppmv when none is given; ``cycle_s`` [s] between regenerations (or charge changes);
    ``diameter_m`` or ``length_to_diameter``; ``particle_diameter_m`` (the desiccant's when
    ``None``); ``price_per_kg`` and ``energy_price_per_kwh`` override the invented demo prices.
    """

    co2_flow_kg_s: float
    inlet_temperature_k: float
    desiccant: str = "silica-gel"
    cycle_s: float = 8 * 3600.0
    inlet_pressure_pa: float = ATMOSPHERE_PA
    inlet_water_ppmv: float | None = None
    inlet_relative_humidity: float | None = None
    inlet_dew_point_k: float | None = None
    target_ppmv: float | None = None
    target_dew_point_k: float | None = None
    dry_composition: Mapping[str, float] = field(default_factory=lambda: {"CO2": 1.0})
    diameter_m: float | None = None
    length_to_diameter: float | None = None
    particle_diameter_m: float | None = None
    price_per_kg: float | None = None
    energy_price_per_kwh: float | None = None


@dataclass(frozen=True, slots=True)
class CurvePoint:
    """One point of a breakthrough curve: ``time_s`` [s] from the start of adsorption and the
    outlet water ``outlet_ppmv`` [ppm v/v]."""

    time_s: float
    outlet_ppmv: float


@dataclass(frozen=True, slots=True)
class DryerResult:
    """A sized bed. Units in field names ([kg], [m], [m3], [Pa], [s], [J], [K], [m/s]);
    loadings in kg water per kg desiccant; cost in the price's currency (demo: invented)."""

    desiccant: str
    co2_flow_kg_s: float
    inlet_water_ppmv: float
    inlet_dew_point_k: float
    inlet_relative_humidity: float
    target_ppmv: float
    target_dew_point_k: float
    target_basis: str
    water_in_kg_s: float
    water_load_kg_per_cycle: float
    equilibrium_loading_kg_per_kg: float
    residual_loading_kg_per_kg: float
    working_capacity_kg_per_kg: float
    saturated_length_m: float
    mtz_length_m: float
    bed_length_m: float
    bed_diameter_m: float
    bed_mass_kg: float
    bed_volume_m3: float
    gas_density_kg_m3: float
    gas_viscosity_pa_s: float
    superficial_velocity_m_s: float
    velocity_limit_m_s: float
    pressure_drop_pa: float
    stoichiometric_time_s: float
    breakthrough_s: float
    breakthrough_fraction: float
    front_rate_per_s: float
    outlet_ppmv: float
    outlet_dew_point_k: float
    reaches_target: bool
    suggested_desiccant: str | None
    regeneration_heat_j: float | None
    regeneration_energy_cost: float | None
    desiccant_cost_per_cycle: float
    cost_per_kg_co2: float
    warnings: tuple[str, ...]
    cautions: tuple[str, ...]


def size_dryer(inp: DryerInput) -> DryerResult:
    """Size one desiccant bed for one adsorption period (method in the module notes).

    Parameters
    ----------
    inp : DryerInput
        Flow, inlet state, target, desiccant, cycle and geometry (SI units).

    Returns a :class:`DryerResult`; inputs a bed cannot serve raise :class:`InputError` (unknown
    desiccant, flow or cycle not above 0, relative humidity above 100 %, a target not drier than
    the inlet, a desiccant that cannot dry the gas at all).

    Sources: as in the module notes (GPSA 2004 sec. 20; Abdel-Aal, Aggour & Fahim 2003; Ergun
    1952; Ruthven 1984; the isotherm sources in ``desiccants.toml``).

    >>> r = size_dryer(DryerInput(co2_flow_kg_s=2.0 / 86400, inlet_temperature_k=298.15,
    ...                           desiccant="molecular-sieve-3a", cycle_s=7 * 86400))
    >>> round(r.water_load_kg_per_cycle, 3), r.reaches_target
    (0.187, True)
    """
    warnings: list[str] = []
    job = duty(inp, warnings)
    bed = size_bed(inp, job, warnings)
    heat, energy_cost, charge_cost, cost = _regeneration(inp, job, bed)
    warnings.extend(_notes(job.desiccant, _relative_humidity(job)))
    return _result(job, bed, heat, energy_cost, charge_cost, cost, warnings)


def _regeneration(inp: DryerInput, job: Duty, bed: Bed) -> tuple[float | None, float | None, float, float]:
    """Regeneration heat [J] and its energy cost, the desiccant charge's cost per cycle and the
    drying cost per kg CO2 (step 6 of the method).

    Q = (m_bed cp_desiccant + m_water cp_water) (T_regen - T_in) + m_water dH_ads; a charge lasts
    ``service_life_cycles``. A desiccant that is not regenerated has no heat (``None``).
    """
    d = job.desiccant
    price = d.price_per_kg if inp.price_per_kg is None else inp.price_per_kg
    energy_price = (defaults()["regeneration_energy_price_per_kwh"] if inp.energy_price_per_kwh
                    is None else inp.energy_price_per_kwh)
    bed_mass = d.bulk_density_kg_m3 * bed.area_m2 * bed.length_m
    if d.regenerable:
        rise = d.regeneration_temperature_k - job.temperature_k
        heat = (bed_mass * d.heat_capacity_j_kg_k + job.load_kg * _CP_WATER) * rise \
            + job.load_kg * d.heat_of_adsorption_j_kg
        energy_cost = heat / 3.6e6 * energy_price
    else:
        heat = energy_cost = None
    charge_cost = bed_mass * price / d.service_life_cycles
    cost = (charge_cost + (energy_cost or 0.0)) / (job.co2_flow_kg_s * job.cycle_s)
    return heat, energy_cost, charge_cost, cost


def _relative_humidity(job: Duty) -> float:
    """The inlet's water as a share of what CO2 holds saturated at its temperature and pressure."""
    return job.y_in * 1e6 / water_co2.saturated_water_in_co2(job.temperature_k, job.pressure_pa).water_ppmv


def _result(job: Duty, bed: Bed, heat: float | None, energy_cost: float | None, charge_cost: float,
            cost: float, warnings: list[str]) -> DryerResult:
    """The :class:`DryerResult` of a duty and its bed."""
    p, d = job.pressure_pa, job.desiccant
    volume = bed.area_m2 * bed.length_m
    return DryerResult(
        desiccant=d.id, co2_flow_kg_s=job.co2_flow_kg_s, inlet_water_ppmv=job.y_in * 1e6,
        inlet_dew_point_k=water_co2.dew_point_in_co2(job.y_in * 1e6, p),
        inlet_relative_humidity=_relative_humidity(job),
        target_ppmv=job.target_ppmv, target_dew_point_k=water_co2.dew_point_in_co2(job.y_target * 1e6, p),
        target_basis=job.target_basis, water_in_kg_s=job.water_in_kg_s, water_load_kg_per_cycle=job.load_kg,
        equilibrium_loading_kg_per_kg=job.q_eq, residual_loading_kg_per_kg=job.q_res,
        working_capacity_kg_per_kg=job.working, saturated_length_m=bed.saturated_length_m,
        mtz_length_m=bed.mtz_length_m, bed_length_m=bed.length_m, bed_diameter_m=bed.diameter_m,
        bed_mass_kg=d.bulk_density_kg_m3 * volume, bed_volume_m3=volume,
        gas_density_kg_m3=bed.gas_density_kg_m3, gas_viscosity_pa_s=bed.gas_viscosity_pa_s,
        superficial_velocity_m_s=bed.velocity_m_s, velocity_limit_m_s=bed.velocity_limit_m_s,
        pressure_drop_pa=bed.pressure_drop_pa, stoichiometric_time_s=bed.stoichiometric_time_s,
        breakthrough_s=bed.breakthrough_s, breakthrough_fraction=bed.breakthrough_fraction,
        front_rate_per_s=bed.front_rate_per_s, outlet_ppmv=job.y_out * 1e6,
        outlet_dew_point_k=water_co2.dew_point_in_co2(job.y_out * 1e6, p), reaches_target=job.reaches,
        suggested_desiccant=job.suggestion, regeneration_heat_j=heat, regeneration_energy_cost=energy_cost,
        desiccant_cost_per_cycle=charge_cost, cost_per_kg_co2=cost, warnings=tuple(warnings),
        cautions=_cautions(d, p),
    )


def _notes(d: Desiccant, rh_in: float) -> list[str]:
    """Practice notes for this desiccant and inlet."""
    notes = []
    if rh_in > 0.999:
        notes.append("The inlet gas is saturated: any cooling before the bed condenses liquid "
                     "water; fit a drained knock-out pot ahead of the dryer.")
    if d.id in ("molecular-sieve-4a", "molecular-sieve-13x"):
        notes.append(f"{d.id} also adsorbs CO2: the bed warms as CO2 loads at the start of each "
                     "cycle and holds less water; 3A sieve excludes CO2 (common practice).")
    if d.from_memory:
        notes.append(f"The {d.id} isotherm is from memory, not a published fit: treat its bed "
                     "size as a rough guide.")
    if d.kind == "deliquescent" and rh_in > d.deliquescence_rh:
        notes.append(f"Above about {d.deliquescence_rh:.0%} relative humidity calcium chloride "
                     "turns to brine: give the vessel a drain and a screen above it.")
    return notes


def _cautions(d: Desiccant, pressure_pa: float) -> tuple[str, ...]:
    from co2routes.thermo import cautions as c

    found = [c.ASPHYXIATION, c.DESICCANT if d.regenerable else c.DELIQUESCENT_SALT]
    if pressure_pa > 1.5 * ATMOSPHERE_PA:
        found.append(c.PRESSURE)
    return tuple(found)


def breakthrough_curve(inp: DryerInput, result: DryerResult | None = None,
                       points: int = 41) -> tuple[CurvePoint, ...]:
    """Outlet water [ppmv] against time for the bed of ``result`` (sized from ``inp`` if absent).

    c_out(t) = c_floor + x(t) (c_in - c_floor), where x(t) is the constant-pattern LDF front of
    :func:`co2routes.thermo.packed_bed.constant_pattern_shape`: k (t - t_s) = G(x) - mean G, with
    t_s = L rho_b A dq / m_water the stoichiometric time and k the rate that makes the 5-95 %
    front span the mass-transfer zone.

    Parameters
    ----------
    inp : DryerInput
    result : DryerResult, optional
        The sized bed (from :func:`size_dryer` with the same ``inp``).
    points : int
        Number of points, 5 or more, spaced from the start to full saturation.

    Valid as the model is: isothermal bed, plug flow, constant pattern formed.

    Sources: Ruthven (1984) ch. 8; GPSA (2004) sec. 20 for the zone length.

    >>> inp = DryerInput(co2_flow_kg_s=2.0 / 86400, inlet_temperature_k=298.15,
    ...                  desiccant="molecular-sieve-3a", cycle_s=7 * 86400)
    >>> curve = breakthrough_curve(inp)
    >>> curve[0].time_s, round(curve[-1].outlet_ppmv) == round(size_dryer(inp).inlet_water_ppmv)
    (0.0, True)
    """
    if points < 5:
        raise InputError("points", "must be 5 or more", got=points)
    r = result or size_dryer(inp)
    d = get_desiccant(r.desiccant)
    p = inp.inlet_pressure_pa
    xs, kt = front_shape(d, r.inlet_water_ppmv * 1e-6 * p, inp.inlet_temperature_k,
                          r.equilibrium_loading_kg_per_kg)
    t_of = [r.stoichiometric_time_s + v / r.front_rate_per_s for v in kt]
    start = max(0.0, interpolate(1e-6, xs, t_of))
    end = interpolate(1.0 - 1e-6, xs, t_of)
    if start > 0.0:
        times = [0.0] + [start + (end - start) * i / (points - 2) for i in range(points - 1)]
    else:
        times = [end * i / (points - 1) for i in range(points)]
    out = []
    for t in times:
        x = 0.0 if t <= t_of[0] else (1.0 if t >= t_of[-1] else interpolate(t, t_of, xs))
        out.append(CurvePoint(time_s=t, outlet_ppmv=r.outlet_ppmv + x * (r.inlet_water_ppmv -
                                                                         r.outlet_ppmv)))
    return tuple(out)


__all__ = ["DryerInput", "DryerResult", "CurvePoint", "size_dryer", "breakthrough_curve",
           "inlet_ppmv", "ISBT_WATER_PPMV", "ISBT_SOURCE", "DESICCANT_IDS", "DESIGN_GRADIENT_PA_M",
           "MAX_BED_DROP_PA"]

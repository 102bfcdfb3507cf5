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
"""

from __future__ import annotations

import math
from dataclasses import dataclass, field
from typing import Mapping

from co2routes.thermo import water, water_co2
from co2routes.thermo.co2 import ATMOSPHERE_PA, MOLAR_MASS as CO2_MOLAR_MASS
from co2routes.thermo.desiccants import (DESICCANT_IDS, Desiccant, defaults, equilibrium_loading,
                               extrapolation_warning, get_desiccant, outlet_limit,
                               suggest_desiccant)
from co2routes.thermo.errors import InputError, require_positive
from co2routes.thermo.gasmix import gas_state, normalise
from co2routes.thermo.packed_bed import (constant_pattern_shape, ergun_gradient, ergun_velocity, interpolate,
                               mtz_length)

#: Beverage-grade CO2 moisture limit [ppm v/v]: ISBT quality guidelines (REFERENCES, R).
ISBT_WATER_PPMV = 20.0
ISBT_SOURCE = "ISBT quality guidelines for beverage-grade CO2: water at most 20 ppm v/v"
_FT = 0.3048
_PSI = 6894.757293168361
#: Design pressure gradient of downflow desiccant beds, 0.33 psi/ft [Pa/m] (GPSA sec. 20, M).
DESIGN_GRADIENT_PA_M = 0.33 * _PSI / _FT
#: Largest total bed pressure drop, 8 psi [Pa] (Abdel-Aal, Aggour & Fahim 2003; REFERENCES R).
MAX_BED_DROP_PA = 8.0 * _PSI
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


def inlet_ppmv(inp: DryerInput) -> float:
    """Inlet water [ppmv] from whichever inlet field of ``inp`` is set (saturated when none).

    ppmv = RH y_sat(T, P), y_sat(T_dp, P), as given, or y_sat(T, P) (saturated), with y_sat the
    water CO2 holds at T and P from :func:`co2routes.thermo.water_co2.saturated_water_in_co2`
    (Spycher, Pruess & Ennis-King 2003; the dry gas is treated as CO2, so at high pressure a
    gas rich in air or nitrogen holds somewhat less than this).

    >>> round(inlet_ppmv(DryerInput(1e-5, 298.15, inlet_relative_humidity=0.5)), -1)
    15780.0
    """
    t, p = inp.inlet_temperature_k, inp.inlet_pressure_pa
    y_sat = water_co2.saturated_water_in_co2(t, p).water_ppmv
    given = [n for n in ("inlet_water_ppmv", "inlet_relative_humidity", "inlet_dew_point_k")
             if getattr(inp, n) is not None]
    if len(given) > 1:
        raise InputError("inlet water", "give one of ppmv, relative humidity or dew point",
                         got=", ".join(given))
    if inp.inlet_relative_humidity is not None:
        rh = inp.inlet_relative_humidity
        if not 0.0 < rh <= 1.0:
            raise InputError("relative humidity", "must be above 0 and at most 100 %", got=f"{rh:.4g}")
        return rh * y_sat
    if inp.inlet_dew_point_k is not None:
        if inp.inlet_dew_point_k > t + 1e-9:
            raise InputError("inlet dew point", "cannot be above the inlet temperature (the gas "
                             "would hold liquid water)", got=inp.inlet_dew_point_k)
        return water_co2.saturated_water_in_co2(inp.inlet_dew_point_k, p, vapour=True).water_ppmv
    if inp.inlet_water_ppmv is not None:
        ppmv = require_positive("inlet water", inp.inlet_water_ppmv)
        if ppmv > y_sat * (1 + 1e-9):
            raise InputError("inlet water", f"is above saturation ({y_sat:.6g} ppmv at the "
                             "inlet temperature and pressure)", got=ppmv)
        return ppmv
    return y_sat


def _target_ppmv(inp: DryerInput) -> tuple[float, str]:
    """Target [ppmv] and where it comes from."""
    if inp.target_ppmv is not None and inp.target_dew_point_k is not None:
        raise InputError("target", "give a target dew point or a target ppmv, not both")
    if inp.target_ppmv is not None:
        return require_positive("target ppmv", inp.target_ppmv), "given as ppmv"
    if inp.target_dew_point_k is not None:
        return (water_co2.saturated_water_in_co2(inp.target_dew_point_k, inp.inlet_pressure_pa,
                                                 vapour=True).water_ppmv,
                "given as a dew point")
    return ISBT_WATER_PPMV, ISBT_SOURCE


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
    d = get_desiccant(inp.desiccant)
    m_co2 = require_positive("flow", inp.co2_flow_kg_s)
    cycle = require_positive("cycle", inp.cycle_s)
    t_in = require_positive("inlet temperature", inp.inlet_temperature_k)
    p = require_positive("inlet pressure", inp.inlet_pressure_pa)
    if not 233.15 <= t_in <= 353.15:
        raise InputError("inlet temperature", "must be from -40 degC to 80 degC for a desiccant dryer",
                         got=f"{t_in - 273.15:.2f} degC")
    dry = normalise(inp.dry_composition)
    if dry.get("CO2", 0.0) <= 0.0:
        raise InputError("gas", "must contain CO2", got=dict(inp.dry_composition))
    p_sat = water.vapor_pressure(t_in)
    if p_sat >= p:
        raise InputError("inlet pressure", "must be above the water vapour pressure at the inlet "
                         f"temperature ({p_sat:.6g} Pa)", got=p)
    y_in = inlet_ppmv(inp) * 1e-6
    target, basis = _target_ppmv(inp)
    y_t = target * 1e-6
    if y_t >= y_in:
        raise InputError("target", "must be drier than the inlet gas "
                         f"({y_in * 1e6:.6g} ppmv, dew point {water_co2.dew_point_in_co2(y_in * 1e6, p) - 273.15:.1f} degC)",
                         got=f"{target:.6g} ppmv")
    warnings: list[str] = []
    phase = water_co2.saturated_water_in_co2(t_in, p).co2_phase
    if phase != "gas":
        warnings.append(f"The CO2 is {phase} at the inlet ({t_in - 273.15:.1f} degC, {p / 1e5:.4g} bar): "
                        "it holds far more water than a gas, and the bed is sized here as for a gas.")
    p_out, q_res = outlet_limit(d, t_in)
    if p_out >= y_in * p:
        raise InputError("desiccant", f"{d.id} cannot dry this gas: its outlet floor "
                         f"({p_out:.4g} Pa of water) is above the inlet's ({y_in * p:.4g} Pa)")
    y_out = min(p_out / p, y_t)
    reaches = p_out <= y_t * p * (1 + 1e-9)
    suggestion = None
    if not reaches:
        y_out = p_out / p
        suggestion = suggest_desiccant(t_in, p, target, exclude=d.id)
        better = (f"{suggestion} reaches it" if suggestion else
                  "none of the listed desiccants reaches it at this pressure: dry at a higher "
                  "pressure or cool the gas first")
        warnings.append(f"{d.id} reaches only about {y_out * 1e6:.3g} ppmv (dew point "
                        f"{water.dew_point(p_out) - 273.15:.1f} degC) at this pressure, wetter than "
                        f"the target {target:.3g} ppmv; {better}.")
    # flows
    n_dry = m_co2 / CO2_MOLAR_MASS / dry["CO2"]                       # mol/s of dry gas
    mw = water.WATER_MOLAR_MASS
    water_in = n_dry * y_in / (1.0 - y_in) * mw
    water_rate = water_in - n_dry * y_out / (1.0 - y_out) * mw       # kg/s taken up
    load = water_rate * cycle
    # capacity
    if d.kind == "deliquescent":
        q_eq = d.capacity_kg_per_kg
        working = d.capacity_kg_per_kg * d.usable_fraction
    else:
        q_eq = equilibrium_loading(d, y_in * p, t_in)
        working = q_eq - q_res
        note = extrapolation_warning(d, y_in * p, t_in)
        if note:
            warnings.append(note)
    if working <= 0.0:
        raise InputError("desiccant", f"{d.id} has no working capacity at these conditions")
    # gas and geometry
    wet = {k: v * (1.0 - y_in) for k, v in dry.items()}
    wet["H2O"] = wet.get("H2O", 0.0) + y_in
    gas = gas_state(t_in, p, wet)
    q_vol = n_dry / (1.0 - y_in) * gas.molar_mass_kg_mol / gas.density_kg_m3   # m3/s at inlet
    dp = inp.particle_diameter_m or d.particle_diameter_m
    rho_b, eps = d.bulk_density_kg_m3, d.voidage
    v_limit = ergun_velocity(DESIGN_GRADIENT_PA_M, dp, eps, gas.density_kg_m3, gas.viscosity_pa_s)

    def lengths(diameter: float) -> tuple[float, float]:
        area = math.pi * diameter**2 / 4.0
        return load / (rho_b * area * working), mtz_length(q_vol / area, dp)

    if inp.diameter_m is not None:
        diameter = require_positive("diameter", inp.diameter_m)
    else:
        ratio = require_positive("length-to-diameter ratio",
                                 inp.length_to_diameter or defaults()["length_to_diameter"])
        lo, hi = 1e-4, 20.0
        for _ in range(200):
            mid = math.sqrt(lo * hi)
            if sum(lengths(mid)) / mid > ratio:
                lo = mid
            else:
                hi = mid
        diameter = math.sqrt(lo * hi)
        d_velocity = math.sqrt(4.0 * q_vol / (math.pi * v_limit))
        if d_velocity > diameter:
            diameter = d_velocity
            warnings.append("The diameter is set by the allowable velocity, not by the "
                            "length-to-diameter ratio.")
    area = math.pi * diameter**2 / 4.0
    l_sat, l_mtz = lengths(diameter)
    velocity = q_vol / area
    # breakthrough (constant-pattern LDF front, rate set by the MTZ)
    v_front = water_rate / (rho_b * area * working)                   # m/s
    xs, kt = _front_shape(d, y_in * p, t_in, q_eq)
    k = (interpolate(0.95, xs, kt) - interpolate(0.05, xs, kt)) / (l_mtz / v_front)
    x_b = (y_t - y_out) / (y_in - y_out) if reaches else 0.05
    x_b = max(x_b, xs[0])
    # GPSA's zone allowance keeps half a zone of margin at the front's 5 % edge; the same margin
    # is kept at the target concentration by adding the stretch of front between the two.
    length = l_sat + l_mtz + v_front * (interpolate(0.05, xs, kt) - interpolate(x_b, xs, kt)) / k
    t_b = length / v_front + interpolate(x_b, xs, kt) / k
    if t_b < cycle:
        length += (cycle - t_b) * v_front
        t_b = cycle
    t_s = length / v_front
    if not reaches:
        # a bed sized to the front's 5 % edge passes more than the floor well before then when the
        # front is wide (a near-linear isotherm): say what leaves at the end of the cycle
        t_of = [t_s + v / k for v in kt]
        x_end = 0.0 if cycle <= t_of[0] else (1.0 if cycle >= t_of[-1] else interpolate(cycle, t_of, xs))
        y_end = y_out + x_end * (y_in - y_out)
        if y_end > 1.5 * y_out:
            warnings.append(f"By the end of the {cycle / 3600.0:.3g} h cycle the outlet carries about "
                            f"{y_end * 1e6:.3g} ppmv (dew point {water_co2.dew_point_in_co2(y_end * 1e6, p) - 273.15:.0f} "
                            f"degC): {d.id}'s front is wider than the bed, so its floor of "
                            f"{y_out * 1e6:.3g} ppmv is not what this bed delivers.")
    if velocity > v_limit:
        warnings.append(f"Superficial velocity {velocity:.3g} m/s is above the {v_limit:.3g} m/s "
                        "at which the bed's pressure gradient reaches 0.33 psi/ft (GPSA design "
                        "value for downflow beds): use a wider vessel.")
    if velocity < 0.05:
        warnings.append("The gas moves slower than the 0.05 m/s the MTZ correlation was made for; "
                        "its zone length is an extrapolation (probably on the long, safe side).")
    drop = ergun_gradient(dp, eps, velocity, gas.density_kg_m3, gas.viscosity_pa_s) * length
    if drop > MAX_BED_DROP_PA:
        warnings.append(f"Bed pressure drop {drop / 1e3:.3g} kPa exceeds the 8 psi (55 kPa) design "
                        "limit (Abdel-Aal et al. 2003): use a wider, shorter bed.")
    if diameter < 10.0 * dp:
        warnings.append("The vessel is less than ten particle diameters wide: gas will bypass "
                        "along the wall; use smaller particles or a wider vessel.")
    bed_volume = area * length
    bed_mass = rho_b * bed_volume
    # regeneration, cost
    price = d.price_per_kg if inp.price_per_kg is None else inp.price_per_kg
    energy_price = (defaults()["regeneration_energy_price_per_kwh"] if inp.energy_price_per_kwh
                    is None else inp.energy_price_per_kwh)
    if d.regenerable:
        rise = d.regeneration_temperature_k - t_in
        heat = (bed_mass * d.heat_capacity_j_kg_k + load * _CP_WATER) * rise \
            + load * d.heat_of_adsorption_j_kg
        energy_cost = heat / 3.6e6 * energy_price
    else:
        heat = energy_cost = None
    charge_cost = bed_mass * price / d.service_life_cycles
    co2_per_cycle = m_co2 * cycle
    cost = (charge_cost + (energy_cost or 0.0)) / co2_per_cycle
    rh_in = y_in * 1e6 / water_co2.saturated_water_in_co2(t_in, p).water_ppmv
    warnings.extend(_notes(d, rh_in))
    return DryerResult(
        desiccant=d.id, co2_flow_kg_s=m_co2, inlet_water_ppmv=y_in * 1e6,
        inlet_dew_point_k=water_co2.dew_point_in_co2(y_in * 1e6, p), inlet_relative_humidity=rh_in,
        target_ppmv=target, target_dew_point_k=water_co2.dew_point_in_co2(y_t * 1e6, p), target_basis=basis,
        water_in_kg_s=water_in, water_load_kg_per_cycle=load, equilibrium_loading_kg_per_kg=q_eq,
        residual_loading_kg_per_kg=q_res, working_capacity_kg_per_kg=working,
        saturated_length_m=l_sat, mtz_length_m=l_mtz, bed_length_m=length, bed_diameter_m=diameter,
        bed_mass_kg=bed_mass, bed_volume_m3=bed_volume, gas_density_kg_m3=gas.density_kg_m3,
        gas_viscosity_pa_s=gas.viscosity_pa_s, superficial_velocity_m_s=velocity,
        velocity_limit_m_s=v_limit, pressure_drop_pa=drop, stoichiometric_time_s=t_s,
        breakthrough_s=t_b, breakthrough_fraction=x_b, front_rate_per_s=k, outlet_ppmv=y_out * 1e6,
        outlet_dew_point_k=water_co2.dew_point_in_co2(y_out * 1e6, p), reaches_target=reaches,
        suggested_desiccant=suggestion, regeneration_heat_j=heat, regeneration_energy_cost=energy_cost,
        desiccant_cost_per_cycle=charge_cost, cost_per_kg_co2=cost, warnings=tuple(warnings),
        cautions=_cautions(d, p),
    )


def _front_shape(d: Desiccant, p_in: float, t_in: float, q_eq: float):
    """Constant-pattern shape for desiccant ``d`` fed water at ``p_in`` [Pa] (fresh-bed basis)."""
    if d.kind == "deliquescent":
        return constant_pattern_shape(lambda x: 1.0)
    return constant_pattern_shape(lambda x: equilibrium_loading(d, x * p_in, t_in) / q_eq)


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
    xs, kt = _front_shape(d, r.inlet_water_ppmv * 1e-6 * p, inp.inlet_temperature_k,
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
           "inlet_ppmv", "ISBT_WATER_PPMV", "DESICCANT_IDS"]

"""The dryer's duty: the water that reaches the bed, the target, and what the desiccant can hold.

Steps 1 and 2 of the method in :mod:`co2routes.thermo.dryer`: inlet and target water contents
(ideal mixing), the water taken up per cycle, and the working capacity (equilibrium loading at the
inlet less the residual that regeneration leaves). Every input a bed cannot serve is refused here.
"""

from __future__ import annotations

from dataclasses import dataclass
from typing import Any

from co2routes.thermo import water, water_co2
from co2routes.thermo.co2 import MOLAR_MASS as CO2_MOLAR_MASS
from co2routes.thermo.constants import WATER_MOLAR_MASS
from co2routes.thermo.desiccants import (Desiccant, equilibrium_loading, extrapolation_warning, get_desiccant,
                                         outlet_limit, suggest_desiccant)
from co2routes.thermo.errors import InputError, require_positive
from co2routes.thermo.gasmix import normalise

#: Beverage-grade CO2 moisture limit [ppm v/v]: ISBT quality guidelines (docs/references.md, R).
ISBT_WATER_PPMV = 20.0
ISBT_SOURCE = "ISBT quality guidelines for beverage-grade CO2: water at most 20 ppm v/v"


@dataclass(frozen=True, slots=True)
class Duty:
    """What one bed must do in one cycle. Water contents ``y_*`` are mole fractions; flows [kg/s];
    ``load`` [kg] per cycle; loadings [kg/kg]; ``p_sat`` the water vapour pressure at the inlet [Pa];
    ``dry_gas_mol_s`` the dry gas [mol/s]."""

    desiccant: Desiccant
    co2_flow_kg_s: float
    cycle_s: float
    temperature_k: float
    pressure_pa: float
    dry: dict[str, float]
    p_sat: float
    y_in: float
    y_target: float
    target_ppmv: float
    target_basis: str
    y_out: float
    reaches: bool
    suggestion: str | None
    water_in_kg_s: float
    water_rate_kg_s: float
    load_kg: float
    q_eq: float
    q_res: float
    working: float
    dry_gas_mol_s: float


def inlet_ppmv(inp: Any) -> float:
    """Inlet water [ppmv] from whichever inlet field of ``inp`` (a ``DryerInput``) is set
    (saturated when none).

    ppmv = RH y_sat(T, P), y_sat(T_dp, P), as given, or y_sat(T, P) (saturated), with y_sat the
    water CO2 holds at T and P from :func:`co2routes.thermo.water_co2.saturated_water_in_co2`
    (Spycher, Pruess & Ennis-King 2003; the dry gas is treated as CO2, so at high pressure a
    gas rich in air or nitrogen holds somewhat less than this).

    >>> from co2routes.thermo.dryer import DryerInput
    >>> round(inlet_ppmv(DryerInput(1e-5, 298.15, inlet_relative_humidity=0.5)), -1)
    15800.0
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


def target_ppmv(inp: Any) -> tuple[float, str]:
    """Target [ppmv] and where it comes from (ISBT's 20 ppmv when none is given)."""
    if inp.target_ppmv is not None and inp.target_dew_point_k is not None:
        raise InputError("target", "give a target dew point or a target ppmv, not both")
    if inp.target_ppmv is not None:
        return require_positive("target ppmv", inp.target_ppmv), "given as ppmv"
    if inp.target_dew_point_k is not None:
        return (water_co2.saturated_water_in_co2(inp.target_dew_point_k, inp.inlet_pressure_pa,
                                                 vapour=True).water_ppmv,
                "given as a dew point")
    return ISBT_WATER_PPMV, ISBT_SOURCE


def _checked_inlet(inp: Any) -> tuple[Desiccant, float, float, float, float, dict[str, float], float]:
    """The desiccant, flow, cycle, inlet temperature and pressure, dry gas and p_sat, refused when
    a bed cannot serve them."""
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
    return d, m_co2, cycle, t_in, p, dry, p_sat


def duty(inp: Any, warnings: list[str]) -> Duty:
    """The duty of the bed for ``inp`` (a ``DryerInput``); warnings are appended to ``warnings``.

    Water taken up [kg/s] = n_dry (y_in / (1 - y_in) - y_out / (1 - y_out)) M_H2O, with n_dry the
    dry gas [mol/s]; the outlet is the target or, when the desiccant cannot reach it, its floor
    (:func:`co2routes.thermo.desiccants.outlet_limit`).
    """
    d, m_co2, cycle, t_in, p, dry, p_sat = _checked_inlet(inp)
    y_in = inlet_ppmv(inp) * 1e-6
    target, basis = target_ppmv(inp)
    y_t = target * 1e-6
    if y_t >= y_in:
        raise InputError("target", "must be drier than the inlet gas "
                         f"({y_in * 1e6:.6g} ppmv, dew point {water_co2.dew_point_in_co2(y_in * 1e6, p) - 273.15:.1f} degC)",
                         got=f"{target:.6g} ppmv")
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
    n_dry = m_co2 / CO2_MOLAR_MASS / dry["CO2"]
    water_in = n_dry * y_in / (1.0 - y_in) * WATER_MOLAR_MASS
    water_rate = water_in - n_dry * y_out / (1.0 - y_out) * WATER_MOLAR_MASS
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
    return Duty(d, m_co2, cycle, t_in, p, dry, p_sat, y_in, y_t, target, basis, y_out, reaches, suggestion,
                water_in, water_rate, water_rate * cycle, q_eq, q_res, working, n_dry)

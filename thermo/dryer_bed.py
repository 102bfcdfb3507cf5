"""The dryer's bed for a given duty: diameter, length, pressure drop and the breakthrough front.

Steps 3 to 5 of the method in :mod:`co2routes.thermo.dryer`: saturated zone plus mass-transfer
zone (GPSA Engineering Data Book 2004 sec. 20; Abdel-Aal, Aggour & Fahim 2003), the diameter from
the user, a length-to-diameter ratio or the Ergun design gradient, and the constant-pattern
front (Ruthven 1984 ch. 8) that sets the breakthrough time.
"""

from __future__ import annotations

import math
from dataclasses import dataclass
from functools import lru_cache
from typing import Any

from co2routes.thermo import water_co2
from co2routes.thermo.desiccants import Desiccant, defaults, equilibrium_loading
from co2routes.thermo.dryer_duty import Duty
from co2routes.thermo.errors import require_positive
from co2routes.thermo.gasmix import gas_state
from co2routes.thermo.packed_bed import (constant_pattern_shape, ergun_gradient, ergun_velocity, interpolate,
                                         mtz_length)

_FT = 0.3048
_PSI = 6894.757293168361
#: Design pressure gradient of downflow desiccant beds, 0.33 psi/ft [Pa/m] (GPSA sec. 20, M).
DESIGN_GRADIENT_PA_M = 0.33 * _PSI / _FT
#: Largest total bed pressure drop, 8 psi [Pa] (Abdel-Aal, Aggour & Fahim 2003; docs/references.md).
MAX_BED_DROP_PA = 8.0 * _PSI


@dataclass(frozen=True, slots=True)
class Bed:
    """A bed sized for a duty: lengths and diameter [m], velocities [m/s], drop [Pa], times [s],
    the front's rate [1/s] and the outlet fraction at breakthrough."""

    diameter_m: float
    saturated_length_m: float
    mtz_length_m: float
    length_m: float
    velocity_m_s: float
    velocity_limit_m_s: float
    pressure_drop_pa: float
    stoichiometric_time_s: float
    breakthrough_s: float
    breakthrough_fraction: float
    front_rate_per_s: float
    gas_density_kg_m3: float
    gas_viscosity_pa_s: float

    @property
    def area_m2(self) -> float:
        """Cross-section [m2]."""
        return math.pi * self.diameter_m**2 / 4.0


@lru_cache(maxsize=256)  # pure in its (hashable) arguments; a recompute asks the same fronts again
def front_shape(d: Desiccant, p_in: float, t_in: float, q_eq: float):
    """Constant-pattern shape for desiccant ``d`` fed water at ``p_in`` [Pa] (fresh-bed basis)."""
    if d.kind == "deliquescent":
        return constant_pattern_shape(lambda x: 1.0)
    return constant_pattern_shape(lambda x: equilibrium_loading(d, x * p_in, t_in) / q_eq)


def _diameter(inp: Any, lengths, q_vol: float, v_limit: float, warnings: list[str]) -> float:
    """The user's diameter, or the one meeting the length-to-diameter ratio, widened to keep the
    velocity under ``v_limit``."""
    if inp.diameter_m is not None:
        return require_positive("diameter", inp.diameter_m)
    ratio = require_positive("length-to-diameter ratio", inp.length_to_diameter or defaults()["length_to_diameter"])
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
        warnings.append("The diameter is set by the allowable velocity, not by the "
                        "length-to-diameter ratio.")
        return d_velocity
    return diameter


def _front(duty: Duty, l_sat: float, l_mtz: float, v_front: float, warnings: list[str]):
    """Bed length, breakthrough and stoichiometric times, breakthrough fraction and front rate.

    GPSA's zone allowance keeps half a zone of margin at the front's 5 % edge; the same margin is
    kept at the target concentration by adding the stretch of front between the two. The bed is
    lengthened if the outlet would pass the target before the cycle ends.
    """
    y_in, y_out, cycle = duty.y_in, duty.y_out, duty.cycle_s
    xs, kt = front_shape(duty.desiccant, y_in * duty.pressure_pa, duty.temperature_k, duty.q_eq)
    k = (interpolate(0.95, xs, kt) - interpolate(0.05, xs, kt)) / (l_mtz / v_front)
    x_b = max((duty.y_target - y_out) / (y_in - y_out) if duty.reaches else 0.05, xs[0])
    length = l_sat + l_mtz + v_front * (interpolate(0.05, xs, kt) - interpolate(x_b, xs, kt)) / k
    t_b = length / v_front + interpolate(x_b, xs, kt) / k
    if t_b < cycle:
        length += (cycle - t_b) * v_front
        t_b = cycle
    t_s = length / v_front
    if not duty.reaches:
        # a bed sized to the front's 5 % edge passes more than the floor well before then when the
        # front is wide (a near-linear isotherm): say what leaves at the end of the cycle
        t_of = [t_s + v / k for v in kt]
        x_end = 0.0 if cycle <= t_of[0] else (1.0 if cycle >= t_of[-1] else interpolate(cycle, t_of, xs))
        y_end = y_out + x_end * (y_in - y_out)
        if y_end > 1.5 * y_out:
            warnings.append(f"By the end of the {cycle / 3600.0:.3g} h cycle the outlet carries about "
                            f"{y_end * 1e6:.3g} ppmv (dew point {water_co2.dew_point_in_co2(y_end * 1e6, duty.pressure_pa) - 273.15:.0f} "
                            f"degC): {duty.desiccant.id}'s front is wider than the bed, so its floor of "
                            f"{y_out * 1e6:.3g} ppmv is not what this bed delivers.")
    return length, t_b, t_s, x_b, k


def _check(velocity: float, v_limit: float, drop: float, diameter: float, dp: float, warnings: list[str]) -> None:
    """Warnings for a bed outside the design limits."""
    if velocity > v_limit:
        warnings.append(f"Superficial velocity {velocity:.3g} m/s is above the {v_limit:.3g} m/s "
                        "at which the bed's pressure gradient reaches 0.33 psi/ft (GPSA design "
                        "value for downflow beds): use a wider vessel.")
    if velocity < 0.05:
        warnings.append("The gas moves slower than the 0.05 m/s the MTZ correlation was made for; "
                        "its zone length is an extrapolation (probably on the long, safe side).")
    if drop > MAX_BED_DROP_PA:
        warnings.append(f"Bed pressure drop {drop / 1e3:.3g} kPa exceeds the 8 psi (55 kPa) design "
                        "limit (Abdel-Aal et al. 2003): use a wider, shorter bed.")
    if diameter < 10.0 * dp:
        warnings.append("The vessel is less than ten particle diameters wide: gas will bypass "
                        "along the wall; use smaller particles or a wider vessel.")


def size_bed(inp: Any, duty: Duty, warnings: list[str]) -> Bed:
    """The bed for ``duty`` with the geometry asked in ``inp`` (a ``DryerInput``).

    Saturated length L_sat = load / (rho_b A dq); MTZ from :func:`co2routes.thermo.packed_bed.mtz_length`;
    velocity limit where the Ergun gradient reaches 0.33 psi/ft; pressure drop by Ergun (1952).
    """
    d = duty.desiccant
    wet = {k: v * (1.0 - duty.y_in) for k, v in duty.dry.items()}
    wet["H2O"] = wet.get("H2O", 0.0) + duty.y_in
    gas = gas_state(duty.temperature_k, duty.pressure_pa, wet)
    q_vol = duty.dry_gas_mol_s / (1.0 - duty.y_in) * gas.molar_mass_kg_mol / gas.density_kg_m3   # m3/s at inlet
    dp = inp.particle_diameter_m or d.particle_diameter_m
    rho_b, eps = d.bulk_density_kg_m3, d.voidage
    v_limit = ergun_velocity(DESIGN_GRADIENT_PA_M, dp, eps, gas.density_kg_m3, gas.viscosity_pa_s)

    def lengths(diameter: float) -> tuple[float, float]:
        area = math.pi * diameter**2 / 4.0
        return duty.load_kg / (rho_b * area * duty.working), mtz_length(q_vol / area, dp)

    diameter = _diameter(inp, lengths, q_vol, v_limit, warnings)
    area = math.pi * diameter**2 / 4.0
    l_sat, l_mtz = lengths(diameter)
    velocity = q_vol / area
    v_front = duty.water_rate_kg_s / (rho_b * area * duty.working)
    length, t_b, t_s, x_b, k = _front(duty, l_sat, l_mtz, v_front, warnings)
    drop = ergun_gradient(dp, eps, velocity, gas.density_kg_m3, gas.viscosity_pa_s) * length
    _check(velocity, v_limit, drop, diameter, dp, warnings)
    return Bed(diameter, l_sat, l_mtz, length, velocity, v_limit, drop, t_s, t_b, x_b, k,
               gas.density_kg_m3, gas.viscosity_pa_s)

"""Conditioning a route's raw gas: the desiccant dryer each route needs, as priced uses.

The raw gas of a route reaches the site temperature in the line before the dryer (cooled in an
ambient aftercooler when it leaves hotter; water above saturation there condenses and drains),
then is dried in one bed
sized by :func:`co2routes.thermo.dryer.size_dryer` for the scenario's desiccant, target and cycle. The gas
flows for the route's batch time, so a batch uses ``t_batch / t_cycle`` of a cycle: that share of
the regeneration heat (as electricity, the usual small-rig electric heater) and of the desiccant
charge's service life (``bed mass / service_life_cycles`` per cycle) is charged to the batch.
"""

from __future__ import annotations

from dataclasses import dataclass
from typing import Any

from co2routes.sources.base import RouteResult, Site, Use


@dataclass(frozen=True, slots=True)
class Conditioning:
    """The dryer for one route: the sized bed (or ``None``), its priced uses and notes."""

    dryer: Any | None
    uses: tuple[Use, ...]
    electricity_kwh: float
    warnings: tuple[str, ...]
    cautions: tuple[str, ...]


def dryer_input(result: RouteResult, plan, site: Site) -> tuple[Any | None, tuple[str, ...]]:
    """The :class:`co2routes.thermo.dryer.DryerInput` for ``result``'s raw gas, or ``None`` with the reason
    when no dryer is needed; the second item holds notes for the result."""
    from co2routes.thermo import water
    from co2routes.thermo.dryer import ISBT_WATER_PPMV, DryerInput

    gas = result.raw_gas
    if result.delivers != "raw-gas" or result.time_h <= 0:
        return None, ()
    notes: list[str] = []
    # the gas reaches the site's temperature in the line before the dryer; water above
    # saturation there condenses and drains
    temperature = site.temperature_k
    ppmv = gas.mole_fractions.get("H2O", 0.0) * 1e6
    saturated = water.saturated_ppmv(temperature, gas.pressure_pa)
    if ppmv > saturated:
        if gas.temperature_k > temperature:
            notes.append(f"Raw gas leaves at {gas.temperature_k - 273.15:.0f} degC: cool it to "
                         f"{temperature - 273.15:.0f} degC before the dryer and drain the condensate.")
        ppmv = saturated
    if plan.target_dew_point_k is not None:
        target = water.ppmv_from_dew_point(plan.target_dew_point_k, gas.pressure_pa)
    else:
        target = plan.target_ppmv if plan.target_ppmv is not None else ISBT_WATER_PPMV
    if ppmv <= target:
        return None, ("Raw gas is already as dry as the target: no dryer needed.",)
    dry = {k: v for k, v in gas.mole_fractions.items() if k != "H2O" and v > 0}
    inp = DryerInput(
        co2_flow_kg_s=result.co2_kg / (result.time_h * 3600.0),
        inlet_temperature_k=temperature, desiccant=plan.desiccant, cycle_s=plan.cycle_s,
        inlet_pressure_pa=gas.pressure_pa, inlet_water_ppmv=ppmv,
        target_ppmv=target, dry_composition=dry,
    )
    return inp, tuple(notes)


def breakthrough(result: RouteResult, plan, site: Site, points: int = 41):
    """The breakthrough curve of the bed sized for ``result`` (``co2routes.thermo.dryer.CurvePoint``s),
    or ``None`` when the route has no dryer."""
    from co2routes.thermo.dryer import breakthrough_curve

    inp, _ = dryer_input(result, plan, site)
    if inp is None or result.dryer is None:
        return None
    return breakthrough_curve(inp, result.dryer, points)


def condition(result: RouteResult, plan, site: Site) -> Conditioning:
    """Size and charge the dryer for ``result``'s raw gas under the scenario's ``plan``."""
    from co2routes.thermo.desiccants import get_desiccant
    from co2routes.thermo.dryer import size_dryer
    from co2routes.thermo.errors import InputError

    inp, notes = dryer_input(result, plan, site)
    warnings = list(notes)
    if inp is None:
        return Conditioning(None, (), 0.0, tuple(warnings), ())
    try:
        bed = size_dryer(inp)
    except InputError as err:
        if err.field == "desiccant":
            raise InputError("dryer.desiccant", err.allowed, got=err.got) from None
        warnings.append(f"Dryer not sized ({err}); its cost is unknown.")
        unknown = Use(f"dryer ({plan.desiccant})", 0.0, "mass_kg", "")
        return Conditioning(None, (unknown,), 0.0, tuple(warnings), ())
    share = result.time_h * 3600.0 / plan.cycle_s
    desiccant = get_desiccant(plan.desiccant)
    uses = [Use(f"desiccant {plan.desiccant} (share of charge life)",
                bed.bed_mass_kg / desiccant.service_life_cycles * share, "mass_kg", plan.desiccant)]
    electricity = 0.0
    if bed.regeneration_heat_j is not None:
        electricity = bed.regeneration_heat_j * share / 3.6e6
        uses.append(Use("dryer regeneration (electric heater)", electricity, "energy_kwh", "electricity"))
    warnings.extend(bed.warnings)
    return Conditioning(bed, tuple(uses), electricity, tuple(warnings), tuple(bed.cautions))

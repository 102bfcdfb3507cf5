"""Conditioning a route's raw gas: the desiccant dryer each route needs, as priced uses.

The raw gas of a route reaches the site temperature in the line before the dryer (cooled in an
ambient aftercooler when it leaves hotter; water above saturation there condenses and drains),
then is dried in one bed
sized by :func:`co2routes.thermo.dryer.size_dryer` for the scenario's desiccant, target and cycle.

With the plant's schedule (:mod:`co2routes.sources.plant`) the bed takes the water that actually
reaches it between two regenerations: the demand's gas over the cycle (mean flow x cycle; a batch
given per mass: that batch, at most the peak flow over the cycle), arriving at the schedule's peak
flow, which sets the velocity and the mass-transfer zone. The bed is sized for that flow over the
hours it is on stream, ``gas over the cycle / peak flow``, so its water load is exactly gas x
water content (:func:`cycle_flow`). Without a schedule the batch's own flow runs the whole cycle.
A batch is charged the share ``batch CO2 / CO2 over the cycle`` of the regeneration heat (as
electricity, the usual small-rig electric heater) and of the desiccant charge's service life
(``bed mass / service_life_cycles`` per cycle). A raw gas used as it is (cooled flue gas for
direct enrichment) is not dried.
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


def cycle_flow(result: RouteResult, cycle_s: float, schedule=None) -> tuple[float, float]:
    """``(CO2 flow kg/s, hours on stream s)`` the bed is sized for over one regeneration cycle.

    Flow = the schedule's peak; on stream = CO2 over the cycle / peak, the CO2 being mean flow x
    cycle for a rate demand or the batch (at most peak x cycle) for one batch. Without a schedule:
    the batch's own flow for the whole cycle.

    >>> from types import SimpleNamespace as S
    >>> cycle_flow(S(co2_kg=1.0, time_h=2.0), 7200.0)
    (0.0001388..., 7200.0)
    >>> cycle_flow(S(co2_kg=1.0, time_h=2.0), 86400.0, S(peak_flow_kg_s=1e-3, mean_flow_kg_s=1e-4, period_h=24.0))
    (0.001, 8640.0)
    """
    if schedule is None:
        return result.co2_kg / (result.time_h * 3600.0), cycle_s
    peak = schedule.peak_flow_kg_s
    if schedule.period_h is None:
        return peak, min(result.co2_kg, peak * cycle_s) / peak
    return peak, schedule.mean_flow_kg_s * cycle_s / peak


def dryer_input(result: RouteResult, plan, site: Site, schedule=None) -> tuple[Any | None, tuple[str, ...]]:
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
    flow, on_stream = cycle_flow(result, plan.cycle_s, schedule)
    inp = DryerInput(
        co2_flow_kg_s=flow,
        inlet_temperature_k=temperature, desiccant=plan.desiccant, cycle_s=on_stream,
        inlet_pressure_pa=gas.pressure_pa, inlet_water_ppmv=ppmv,
        target_ppmv=target, dry_composition=dry,
    )
    return inp, tuple(notes)


def breakthrough(result: RouteResult, plan, site: Site, points: int = 41):
    """The breakthrough curve of the bed sized for ``result`` (``co2routes.thermo.dryer.CurvePoint``s),
    or ``None`` when the route has no dryer."""
    from co2routes.thermo.dryer import breakthrough_curve

    inp, _ = dryer_input(result, plan, site, getattr(result, "schedule", None))
    if inp is None or result.dryer is None:
        return None
    return breakthrough_curve(inp, result.dryer, points)


def condition(result: RouteResult, plan, site: Site, schedule=None, used_as_is: bool = False) -> Conditioning:
    """Size and charge the dryer for ``result``'s raw gas under the scenario's ``plan`` and the
    plant's ``schedule``; none when the gas is ``used_as_is``."""
    from co2routes.thermo.desiccants import get_desiccant
    from co2routes.thermo.dryer import size_dryer
    from co2routes.thermo.errors import InputError

    if used_as_is:
        return Conditioning(None, (), 0.0, ("The raw gas is used as it is (direct enrichment): no dryer.",), ())
    inp, notes = dryer_input(result, plan, site, schedule)
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
    share = result.co2_kg / (inp.co2_flow_kg_s * inp.cycle_s)
    desiccant = get_desiccant(plan.desiccant)
    uses = [Use(f"desiccant {plan.desiccant} (share of charge life)",
                bed.bed_mass_kg / desiccant.service_life_cycles * share, "mass_kg", plan.desiccant)]
    electricity = 0.0
    if bed.regeneration_heat_j is not None:
        electricity = bed.regeneration_heat_j * share / 3.6e6
        uses.append(Use("dryer regeneration (electric heater)", electricity, "energy_kwh", "electricity"))
    warnings.extend(bed.warnings)
    return Conditioning(bed, tuple(uses), electricity, tuple(warnings), tuple(bed.cautions))

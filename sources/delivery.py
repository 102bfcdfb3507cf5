"""Delivery: from dry gas at the site to the scenario's end product (gas, liquid or dry ice).

For a liquid end product the dry gas is compressed in stages and condensed at the scenario's
condensing temperature (:func:`co2routes.thermo.compression.liquefy`). For dry ice the liquid is then
flashed to 1 atm (:func:`co2routes.thermo.flash.flash_at_temperature`); only the solid fraction becomes dry
ice and the flash gas is vented, not recompressed (a simple rig; a recycle would need a second
compressor), so each kg of dry ice takes ``1 / solid_fraction`` kg of raw CO2.

Shaft work is turned into electricity with :data:`MOTOR_EFFICIENCY`.
"""

from __future__ import annotations

from dataclasses import dataclass
from functools import lru_cache
from typing import Any

from co2routes.sources.base import Site
from co2routes.thermo import cautions
from co2routes.thermo.errors import InputError

#: Electric motor efficiency of a small compressor drive (common practice for fractional to
#: few-kW induction motors: 0.75-0.90; IEC 60034-30-1 IE2/IE3 classes sit near 0.80-0.85 at 1 kW).
MOTOR_EFFICIENCY = 0.80


@dataclass(frozen=True, slots=True)
class Delivery:
    """What delivery adds to a batch: raw CO2 needed per kg of product, work, time, cautions."""

    end_product: str
    product_kg: float
    raw_co2_kg: float
    liquefaction: Any | None
    flash: Any | None
    electricity_kwh: float
    time_h: float
    warnings: tuple[str, ...]
    cautions: tuple[str, ...]
    notes: tuple[str, ...] = ()
    #: why the product cannot be made from this gas (``None``: it can), see
    #: :func:`condenser_pressure`
    cannot_condense: str | None = None

    @property
    def raw_per_product(self) -> float:
        """kg of raw CO2 per kg of end product [kg/kg]."""
        return self.raw_co2_kg / self.product_kg


def raw_co2_needed(product_kg: float, end_product: str, delivers: str, plan, site: Site) -> tuple[float, Any | None]:
    """kg of CO2 a route must deliver for ``product_kg`` of end product, and the flash used.

    >>> from co2routes.sources.scenario import DeliveryPlan
    >>> raw_co2_needed(2.0, "gas", "raw-gas", DeliveryPlan(), Site())
    (2.0, None)
    """
    if end_product != "dry-ice":
        return product_kg, None
    made_kg = product_kg + storage_loss_kg(plan, site)
    if delivers == "dry-ice":
        return made_kg, None
    from co2routes.thermo.dryice import draw_yield, raw_per_dry_ice

    # bought gas comes as a liquid cylinder at the site's temperature; made gas is condensed at
    # the condensing temperature; either way the liquid is drawn from the bottom (dip tube)
    temperature = site.temperature_k if delivers in ("gas", "liquid") else plan.condensing_temperature_k
    flash = draw_yield(min(temperature, 303.0), draw="liquid")
    return made_kg * raw_per_dry_ice(flash.solid_fraction).kg_raw_per_kg, flash


def storage_loss_kg(plan, site: Site) -> float:
    """Dry ice that sublimes in the insulated box between making (or delivery) and use [kg].

    m = U A (T_site - 194.7 K) t / dH_sub (:func:`co2routes.thermo.dryice.storage_loss`); zero when the
    scenario holds the dry ice for no time.

    >>> from co2routes.sources.scenario import DeliveryPlan
    >>> storage_loss_kg(DeliveryPlan(), Site())
    0.0
    >>> round(storage_loss_kg(DeliveryPlan(hold_time_s=86400.0), Site(temperature_k=293.15)), 2)
    6.23
    """
    if plan.hold_time_s <= 0.0:
        return 0.0
    from co2routes.thermo.dryice import storage_loss

    loss = storage_loss(plan.box_area_m2, plan.box_u_w_m2_k, site.temperature_k)
    return loss.loss_rate_kg_s * plan.hold_time_s


#: co2routes.thermo.compression's field names -> the scenario keys they come from.
_PLAN_FIELDS = {
    "condensing temperature": "delivery.condensing_temperature",
    "stages": "delivery.stages",
    "efficiency": "delivery.efficiency",
    "intercool temperature": "delivery.intercool_temperature",
    "displacement": "delivery.displacement",
    "volumetric efficiency": "delivery.volumetric_efficiency",
    "inlet pressure": "site.pressure",
    "inlet temperature": "site.temperature",
}


@lru_cache(maxsize=64)
def _liquefy(pressure_pa: float, temperature_k: float, plan, condensing_pressure_pa: float | None = None):
    """Compression per kg from the site's state under ``plan`` (the same for every route of one
    purity, so computed once per scenario; the batch time is the mass over ``mass_flow_kg_s``)."""
    from co2routes.thermo.compression import liquefy

    return liquefy(pressure_pa, temperature_k, plan.condensing_temperature_k,
                   stages=plan.stages, efficiency=plan.efficiency,
                   intercool_temperature_k=plan.intercool_temperature_k,
                   displacement_m3_s=plan.displacement_m3_s,
                   volumetric_efficiency=plan.volumetric_efficiency,
                   condensing_pressure_pa=condensing_pressure_pa)


#: Dry CO2 mole fraction at or above which the gas is taken as pure CO2 at the condenser.
PURE_ENOUGH = 0.9995


def condenser_pressure(co2_dry_fraction: float, plan) -> tuple[float | None, str | None]:
    """The condenser's pressure for a dry gas of this CO2 fraction, and why, in words.

    Pure CO2 condenses at its saturation pressure (``None`` is returned: the plan's own); a gas
    that carries air condenses whole only at its bubble pressure
    (:func:`co2routes.thermo.condensing.bubble_point`). A gas with no bubble point at the
    condensing temperature gives ``(None, reason)`` with the reason starting "too lean".

    >>> from co2routes.sources.scenario import DeliveryPlan
    >>> condenser_pressure(1.0, DeliveryPlan())
    (None, None)
    >>> p, why = condenser_pressure(0.98, DeliveryPlan())
    >>> round(p / 1e5, 1), why.split(":")[0]
    (44.9, 'the dry gas is 98.0 % CO2')
    >>> condenser_pressure(0.0077, DeliveryPlan())[1].split(":")[0]
    'too lean to condense'
    >>> condenser_pressure(0.0, DeliveryPlan())[0] is None
    True
    """
    if co2_dry_fraction >= PURE_ENOUGH:
        return None, None
    from co2routes.thermo.condensing import bubble_point

    t_c = plan.condensing_temperature_k
    share = round(co2_dry_fraction, 6)
    bp = bubble_point(share, t_c) if share > 0.0 else None
    shown = f"{co2_dry_fraction:.1%}".replace("%", " %")
    if bp is None or bp.pressure_pa is None:
        remedy = "condense colder or separate the CO2 first" if share >= 0.5 else "separate the CO2 first"
        return None, (f"too lean to condense: the dry gas is {shown} CO2, and at "
                      f"{t_c - 273.15:.0f} degC no pressure turns it all to liquid (its air keeps "
                      f"it above the mixture's critical line); {remedy}")
    return bp.pressure_pa, (f"the dry gas is {shown} CO2: with its air it condenses whole only at "
                            f"its bubble pressure, {bp.pressure_pa / 1e5:.1f} bar at "
                            f"{t_c - 273.15:.0f} degC (Peng-Robinson, CO2 + N2), not at pure CO2's "
                            "saturation pressure; vent the air from the cylinder's top before use")


def plan_delivery(product_kg: float, raw_co2_kg: float, flash: Any | None, end_product: str,
                  delivers: str, plan, site: Site, co2_dry_fraction: float = 1.0) -> Delivery:
    """Compression (when the route hands over raw gas and the product is liquid or dry ice),
    flash and their cautions; ``co2_dry_fraction`` is the CO2 mole fraction of the dried gas
    (the condenser's pressure, :func:`condenser_pressure`)."""
    warnings: list[str] = []
    notes: list[str] = []
    liquefaction = None
    cannot = None
    electricity = 0.0
    time_h = 0.0
    if end_product in ("liquid", "dry-ice") and delivers in ("raw-gas", "gas") and not (
            delivers == "gas" and end_product == "dry-ice"):
        try:
            p_cond, why = condenser_pressure(co2_dry_fraction, plan) if delivers == "raw-gas" else (None, None)
            liquefaction = _liquefy(site.pressure_pa, site.temperature_k, plan, p_cond)
        except InputError as err:
            # name the scenario's own key, as the scenario's other errors do
            field = _PLAN_FIELDS.get(err.field)
            if field is None:
                raise
            raise InputError(field, err.allowed, got=err.got) from None
        if why is not None and p_cond is None:
            cannot = why
            warnings.append(f"The gas is {why}. Its delivery figures are those of pure CO2.")
        elif why is not None:
            notes.append(why[0].upper() + why[1:])
        electricity = liquefaction.work_j_per_kg * raw_co2_kg / MOTOR_EFFICIENCY / 3.6e6
        if liquefaction.mass_flow_kg_s:
            time_h = raw_co2_kg / liquefaction.mass_flow_kg_s / 3600.0
        warnings.extend(liquefaction.warnings)
    if end_product == "dry-ice" and flash is not None:
        notes.append(f"{flash.solid_fraction:.0%} of the liquid becomes dry ice; the rest is vented as gas")
    if end_product == "dry-ice" and plan.hold_time_s > 0:
        lost = storage_loss_kg(plan, site)
        notes.append(f"{lost:.2f} kg of dry ice sublimes in the box over {plan.hold_time_s / 3600:.0f} h "
                     f"before use ({plan.box_area_m2:g} m2 at U = {plan.box_u_w_m2_k:g} W/(m2 K)); "
                     "it is made on top of the demand")
    caution_list = []
    # bought dry ice never passes through a cylinder or a flash: only its own caution applies
    if end_product in ("liquid", "dry-ice") and delivers != "dry-ice":
        caution_list += [cautions.PRESSURE, cautions.CYLINDER_HEAT]
    if end_product == "dry-ice" and delivers != "dry-ice":
        caution_list.append(cautions.COLD_LIQUID)
    if end_product == "dry-ice":
        caution_list.append(cautions.DRY_ICE)
    return Delivery(end_product, product_kg, raw_co2_kg, liquefaction, flash, electricity, time_h,
                    tuple(warnings), tuple(caution_list), tuple(notes), cannot)

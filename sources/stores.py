"""Keeping the end product: refrigeration for a cold condenser, cylinders for liquid, a box for dry ice.

* **Refrigeration**: when the CO2 condenses below the site's temperature the heat below it
  (:func:`co2routes.thermo.refrigeration.co2_refrigeration_duty`) is taken by a vapour-compression
  chiller (:func:`co2routes.thermo.refrigeration.vapour_compression`) condensing against the site;
  its electricity is duty / COP / motor efficiency (:data:`co2routes.sources.delivery.MOTOR_EFFICIENCY`),
  its size the duty at the compressors' draw.
* **Cylinders**: a liquid end product fills cylinders of the scenario's water capacity at its
  filling ratio; cylinders filled per week from the demand, the fill time of one at the
  compressors' draw, and those owned: a week's set plus one on the line (common practice).
* **Dry-ice box**: holds a batch and what sublimes over the hold time, at the bulk density of
  pellets, :data:`DRY_ICE_BULK_KG_M3`.
"""

from __future__ import annotations

import math
from dataclasses import dataclass
from functools import lru_cache

from co2routes.sources.base import Use

#: Bulk density of dry-ice pellets [kg/m3]: about 0.8-1.0 kg/L for 3-16 mm pellets (common
#: practice; solid CO2 itself is about 1.56 kg/L).
DRY_ICE_BULK_KG_M3 = 900.0
_WEEK_S = 7 * 86400.0


@dataclass(frozen=True, slots=True)
class Stores:
    """What keeping the product adds: refrigeration [kWh per batch, W of cooling, COP and the
    refrigerant], cylinders (per week, owned, kg each, hours to fill one, the filling rule) and the
    dry-ice box [m3]. Fields that do not apply are ``None``."""

    refrigeration_kwh: float = 0.0
    refrigeration_duty_j_per_kg: float = 0.0
    chiller_w: float | None = None
    cop: float | None = None
    carnot_cop: float | None = None
    refrigerant: str | None = None
    cylinders_per_week: float | None = None
    cylinders_owned: int | None = None
    cylinder_kg: float | None = None
    cylinder_volume_m3: float | None = None
    cylinder_fill_h: float | None = None
    filling_rule: str | None = None
    box_volume_m3: float | None = None
    uses: tuple[Use, ...] = ()
    notes: tuple[str, ...] = ()


def plan_stores(delivery, plant, site, period_s: float | None, draw_kg_s: float | None,
                box_loss_kg: float = 0.0) -> Stores:
    """Refrigeration, cylinders and box for ``delivery`` (a :class:`co2routes.sources.delivery.Delivery`
    or ``None``) under the scenario's ``plant`` table; ``draw_kg_s`` is the compressors' mass flow,
    ``box_loss_kg`` the dry ice that sublimes over the hold time."""
    if delivery is None:
        return Stores()
    fields: dict = {}
    notes: list[str] = []
    uses: tuple[Use, ...] = ()
    liq = delivery.liquefaction
    if liq is not None:
        fields, uses, note = _refrigeration(liq, delivery.raw_co2_kg, plant, site, draw_kg_s)
        notes += note
    if delivery.end_product == "liquid" and liq is not None:
        fields.update(_cylinders(delivery.product_kg, plant, period_s, draw_kg_s))
        notes.append(f"{fields['cylinder_kg']:.3g} kg per cylinder of {plant.cylinder_volume_m3 * 1000:.3g} L "
                     f"({plant.filling_rule})")
    if delivery.end_product == "dry-ice":
        volume = (delivery.product_kg + box_loss_kg) / DRY_ICE_BULK_KG_M3
        fields["box_volume_m3"] = volume
        notes.append(f"Insulated box of at least {volume * 1000:.3g} L holds a batch and what sublimes "
                     f"while it waits (pellets at about {DRY_ICE_BULK_KG_M3 / 1000:.2g} kg/L).")
    return Stores(**fields, uses=uses, notes=tuple(notes))


@lru_cache(maxsize=64)
def _cycle(cold_k: float, site_k: float, plant):
    """The refrigeration duty [J/kg] and the chiller's cycle (the same for every route)."""
    from co2routes.thermo.refrigeration import co2_refrigeration_duty, vapour_compression

    duty = co2_refrigeration_duty(cold_k, site_k)
    if duty <= 0.0:
        return duty, None
    return duty, vapour_compression(cold_k, site_k, plant.refrigerant,
                                    evaporator_approach_k=plant.evaporator_approach_k,
                                    condenser_approach_k=plant.condenser_approach_k,
                                    efficiency=plant.refrigeration_efficiency)


def _refrigeration(liq, raw_kg: float, plant, site, draw_kg_s: float | None):
    from co2routes.sources.delivery import MOTOR_EFFICIENCY

    duty, cycle = _cycle(liq.condensing_temperature_k, site.temperature_k, plant)
    if cycle is None:
        return {}, (), []
    kwh = duty * raw_kg / cycle.cop / MOTOR_EFFICIENCY / 3.6e6
    fields = {"refrigeration_kwh": kwh, "refrigeration_duty_j_per_kg": duty,
              "chiller_w": None if draw_kg_s is None else duty * draw_kg_s, "cop": cycle.cop,
              "carnot_cop": cycle.carnot_cop, "refrigerant": cycle.refrigerant}
    note = [f"Condensing at {liq.condensing_temperature_k - 273.15:.0f} degC on a "
            f"{site.temperature_k - 273.15:.0f} degC site: a {cycle.refrigerant} chiller removes "
            f"{duty / 1000:.0f} kJ/kg at COP {cycle.cop:.2f} (Carnot {cycle.carnot_cop:.2f}), "
            f"{kwh / raw_kg:.3f} kWh of electricity per kg."]
    return fields, (Use("refrigeration (chiller, electric)", kwh, "energy_kwh", "electricity"),), note


def _cylinders(product_kg: float, plant, period_s: float | None, draw_kg_s: float | None) -> dict:
    each = plant.filling_ratio_kg_m3 * plant.cylinder_volume_m3
    if period_s is None:
        per_week, owned = None, math.ceil(product_kg / each - 1e-9)
    else:
        per_week = product_kg * _WEEK_S / period_s / each
        owned = math.ceil(per_week - 1e-9) + 1
    return {"cylinders_per_week": per_week, "cylinders_owned": owned, "cylinder_kg": each,
            "cylinder_volume_m3": plant.cylinder_volume_m3,
            "cylinder_fill_h": None if not draw_kg_s else each / draw_kg_s / 3600.0,
            "filling_rule": plant.filling_rule}

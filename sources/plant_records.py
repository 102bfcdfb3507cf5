"""The plant's figures as JSON keys, merged into the ``compare`` and ``batch`` records.

Keys (SI with unit suffixes, ``null`` when unknown or not applying): ``running_per_kg``,
``capital_per_kg`` (cost per kg of end product, the book's currency; ``cost_per_kg`` is their
sum), ``hazard_step`` (the step that sets ``hazard``), ``route_hazard`` (the route's own level),
``units_in_parallel``, ``meets_demand``, ``buffer_volume_m3``, ``refrigeration_kwh_per_kg``,
``cylinders_per_week``, and the objects ``schedule``, ``stores``, ``equipment`` (a list) and
``hazard_steps`` (a list).
"""

from __future__ import annotations

from typing import Any


def plant_record(r: Any) -> dict[str, Any]:
    """The plant keys of a :class:`co2routes.sources.plan.PlannedRoute`."""
    s = r.schedule
    st = r.stores if r.delivery is not None else None  # a gas end product keeps nothing
    refrigeration = None if st is None else st.refrigeration_kwh / r.product_kg
    return {
        "running_per_kg": r.running_per_kg,
        "capital_per_kg": r.capital_per_kg,
        "hazard_step": r.hazard_step,
        "route_hazard": r.made.hazard,
        "units_in_parallel": None if s is None else s.units,
        "meets_demand": None if s is None else s.meets_demand,
        "buffer_volume_m3": None if s is None else s.buffer_volume_m3,
        "refrigeration_kwh_per_kg": refrigeration,
        "cylinders_per_week": None if st is None else st.cylinders_per_week,
        "schedule": schedule_record(s),
        "stores": stores_record(st),
        "equipment": [equipment_record(item) for item in r.equipment],
        "hazard_steps": [{"step": h.step, "level": h.level, "reason": h.reason} for h in r.hazard_steps],
    }


def schedule_record(s: Any) -> dict[str, Any] | None:
    """A :class:`co2routes.sources.plant.Schedule` as JSON.

    >>> schedule_record(None) is None
    True
    """
    if s is None:
        return None
    return {
        "mode": s.mode, "units_in_parallel": s.units, "unit_co2_kg": s.unit_co2_kg,
        "unit_time_h": s.unit_time_h, "period_h": s.period_h, "duty_h_per_day": s.duty_h_per_day,
        "mean_flow_kg_h": s.mean_flow_kg_s * 3600.0, "peak_flow_kg_h": s.peak_flow_kg_s * 3600.0,
        "buffer_kg": s.buffer_kg, "buffer_kind": s.buffer_kind, "buffer_volume_m3": s.buffer_volume_m3,
        "buffer_pressure_pa": s.buffer_pressure_pa, "meets_demand": s.meets_demand, "note": s.note,
    }


def stores_record(st: Any) -> dict[str, Any] | None:
    """A :class:`co2routes.sources.stores.Stores` as JSON (``None`` for a gas end product)."""
    if st is None:
        return None
    return {
        "refrigeration_kwh": st.refrigeration_kwh,
        "refrigeration_duty_kj_per_kg": st.refrigeration_duty_j_per_kg / 1000.0,
        "chiller_kw": None if st.chiller_w is None else st.chiller_w / 1000.0,
        "refrigeration_cop": st.cop, "carnot_cop": st.carnot_cop, "refrigerant": st.refrigerant,
        "cylinders_per_week": st.cylinders_per_week, "cylinders_owned": st.cylinders_owned,
        "cylinder_kg": st.cylinder_kg,
        "cylinder_water_capacity_l": None if st.cylinder_volume_m3 is None else st.cylinder_volume_m3 * 1000.0,
        "cylinder_fill_h": st.cylinder_fill_h, "filling_rule": st.filling_rule,
        "box_volume_l": None if st.box_volume_m3 is None else st.box_volume_m3 * 1000.0,
    }


def equipment_record(item: Any) -> dict[str, Any]:
    """One :class:`co2routes.sources.equipment.Item` as JSON; ``size`` is in ``size_unit`` (SI)."""
    return {"key": item.key, "name": item.name, "size": item.size, "size_unit": item.unit,
            "count": item.count, "price": item.price, "life_years": item.life_years,
            "yearly_cost": item.yearly}

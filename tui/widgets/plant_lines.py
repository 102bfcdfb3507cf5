"""Compact lines of the plant for the detail tabs: the schedule (Batch tab) and the equipment with
running and owning cost (Costs tab). Read from a :class:`co2routes.sources.plan.PlannedRoute`; a
result without them (an older record, a test double) gives no lines.
"""

from __future__ import annotations

from typing import Any

from rich.text import Text


def schedule_lines(r: Any) -> list[Text]:
    """The schedule in two or three lines: units and duty, flows, the buffer."""
    s = getattr(r, "schedule", None)
    if s is None:
        return []
    if s.mode == "bought":
        return [Text("plant: bought, no making units; the container is the store", style="dim")]
    duty = "" if s.duty_h_per_day is None else f", each busy {s.duty_h_per_day:.1f} h/day"
    lines = [Text.assemble(("plant ", "bold"), f"{s.units} unit{'s' if s.units > 1 else ''} ({s.mode}), "
                           f"{s.unit_co2_kg:.3g} kg CO2 per unit batch in {s.unit_time_h:.1f} h{duty}"),
             Text(f"gas flow mean {s.mean_flow_kg_s * 3600:.3g} kg/h, peak {s.peak_flow_kg_s * 3600:.3g} kg/h; "
                  f"buffer {s.buffer_kind} {s.buffer_volume_m3:.3g} m3 at {s.buffer_pressure_pa / 1e5:.3g} bar "
                  f"({s.buffer_kg:.3g} kg)")]
    if not s.meets_demand:
        lines.append(Text(f"! cannot keep up: {s.note}", style="yellow"))
    hazard = getattr(r, "hazard_step", None)
    if hazard:
        lines.append(Text(f"chain hazard {r.hazard} set by {hazard}: {r.hazard_reason}"))
    return lines


def cost_lines(r: Any, currency: str) -> list[Text]:
    """Running, owning and total cost per kg, then one line per piece of equipment."""
    if not hasattr(r, "running_per_kg"):
        return []

    def n(v: float | None) -> str:
        return "unknown" if v is None else f"{v:.2f}"

    lines = [Text(f"per kg: running {n(r.running_per_kg)} + owning {n(r.capital_per_kg)} = "
                  f"{n(r.cost_per_kg)} {currency}", style="bold")]
    for item in getattr(r, "equipment", ()):
        price = "no price" if item.price is None else f"{item.price:.0f} {currency}"
        life = "" if item.life_years is None else f", {item.life_years:.3g} years"
        lines.append(Text(f"  {item.count} x {item.name} ({item.size:.3g} {item.unit}): {price}{life}"))
    stores = getattr(r, "stores", None)
    if stores is not None and stores.cylinders_per_week is not None:
        lines.append(Text(f"  {stores.cylinders_per_week:.3g} cylinders a week of {stores.cylinder_kg:.3g} kg "
                          f"({stores.filling_rule})"))
    if stores is not None and stores.refrigeration_kwh:
        lines.append(Text(f"  refrigeration {stores.refrigeration_kwh:.3g} kWh per batch, COP {stores.cop:.2f}"))
    return lines

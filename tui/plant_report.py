"""The plant of one route in words, from its JSON record (:mod:`co2routes.sources.plant_records`),
for the text and Markdown reports of ``compare``."""

from __future__ import annotations

from typing import Any, Mapping


def plant_words(route: Mapping[str, Any]) -> str:
    """Units, duty, buffer, running + owning cost per kg and the chain's hazard in one line.

    >>> plant_words({"schedule": None, "running_per_kg": 1.0, "capital_per_kg": None,
    ...              "cost_per_kg": None, "hazard": 2, "hazard_step": "making"})
    'cost per kg 1.00 running + unknown owning; hazard 2 (making)'
    """
    def n(v: float | None) -> str:
        return "unknown" if v is None else f"{v:.2f}"

    parts = []
    s = route.get("schedule")
    if s is not None and s["mode"] == "bought":
        parts.append("bought")
    elif s is not None:
        duty = "" if s["duty_h_per_day"] is None else f", each busy {s['duty_h_per_day']:.1f} h/day"
        mode = "" if s["mode"] == "one unit" else f" {s['mode']}"
        parts.append(f"{s['units_in_parallel']} unit{'s' if s['units_in_parallel'] > 1 else ''}{mode}{duty}")
        if s["buffer_volume_m3"] and s["buffer_volume_m3"] > 1e-9:  # none needed: rounding, not a bag
            parts.append(f"buffer {s['buffer_kind']} {s['buffer_volume_m3']:.3g} m3")
        if not s["meets_demand"]:
            parts.append("CANNOT KEEP UP")
    parts.append(f"cost per kg {n(route['running_per_kg'])} running + {n(route['capital_per_kg'])} owning")
    parts.append(f"hazard {route['hazard']} ({route['hazard_step']})")
    return "; ".join(parts)

"""The comparison and a recipe as text: a readable table, Markdown and CSV.

The command line and the interface's export both call these, so both faces write the same.
"""

from __future__ import annotations

import csv
import io
from typing import Any, Mapping

from sources.compare import Comparison, batch_record, comparison_record
from thermo.cautions import LOCAL_CODES

#: The comparison's columns: (JSON key, heading, format).
COLUMNS: tuple[tuple[str, str, str], ...] = (
    ("rank", "#", "{:d}"),
    ("id", "route", "{}"),
    ("cost_per_kg", "cost/kg", "{:.2f}"),
    ("energy_kwh_per_kg", "kWh/kg", "{:.2f}"),
    ("time_h", "time h", "{:.1f}"),
    ("reagent_kg_per_kg", "feed kg/kg", "{:.2f}"),
    ("heat_kj", "heat kJ", "{:+.0f}"),
    ("water_g_per_kg_co2", "water g/kg", "{:.1f}"),
    ("co2_mole_fraction", "CO2 %", "{:.1%}"),
    ("hazard", "hazard", "{:d}"),
)


def cell(key: str, fmt: str, value: Any) -> str:
    """One formatted cell; unknown values read ``unknown``.

    >>> cell("cost_per_kg", "{:.2f}", None)
    'unknown'
    >>> cell("co2_mole_fraction", "{:.1%}", 0.117)
    '11.7%'
    """
    if value is None:
        return "unknown"
    try:
        return fmt.format(value)
    except (ValueError, TypeError):
        return str(value)


def _rows(record: Mapping[str, Any]) -> list[list[str]]:
    return [[cell(k, f, route[k]) for k, _, f in COLUMNS] for route in record["routes"]]


def grouped_warnings(record: Mapping[str, Any]) -> dict[str, list[str]]:
    """Each distinct warning with the routes that carry it, in ranking order.

    >>> grouped_warnings({"routes": [{"id": "a", "warnings": ["w"]}, {"id": "b", "warnings": ["w", "v"]}]})
    {'w': ['a', 'b'], 'v': ['b']}
    """
    groups: dict[str, list[str]] = {}
    for route in record["routes"]:
        for text in route["warnings"]:
            groups.setdefault(text, []).append(route["id"])
    return groups


def comparison_table(comparison: Comparison) -> str:
    """A plain-text table of the ranking, with each route's cautions after it."""
    record = comparison_record(comparison)
    head = [h for _, h, _ in COLUMNS]
    body = _rows(record)
    widths = [max(len(x) for x in col) for col in zip(head, *body)]
    lines = [f"{record['scenario']}: end product {record['end_product']}, prices in {record['currency']}"]
    lines.append("  ".join(h.ljust(w) for h, w in zip(head, widths)))
    lines.append("  ".join("-" * w for w in widths))
    lines += ["  ".join(c.rjust(w) if i != 1 else c.ljust(w) for i, (c, w) in enumerate(zip(row, widths)))
              for row in body]
    lines.append("")
    lines.append("weights: " + ", ".join(f"{k}={v:g}" for k, v in record["weights"].items()))
    lines.append("hazard: 1 low, 2 moderate, 3 high; heat: + takes heat in, - gives heat off")
    for text, ids in grouped_warnings(record).items():
        lines.append(f"WARNING [{', '.join(ids)}]: {text}")
    seen: list[str] = []
    for route in record["routes"]:
        for c in route["cautions"]:
            if c not in seen:
                seen.append(c)
    lines += [f"caution: {c}" for c in seen] + [f"caution: {LOCAL_CODES}"]
    lines += [f"note: {f}" for f in record["failures"]]
    return "\n".join(lines)


def comparison_markdown(comparison: Comparison) -> str:
    """The ranking as a Markdown document (what ``compare --markdown`` prints)."""
    record = comparison_record(comparison)
    head = [h for _, h, _ in COLUMNS]
    out = [f"# {record['scenario']}", "",
           f"End product: {record['end_product']}. Prices in {record['currency']}.", "",
           "| " + " | ".join(head) + " |", "|" + "|".join("---" for _ in head) + "|"]
    out += ["| " + " | ".join(row) + " |" for row in _rows(record)]
    out += ["", "Weights: " + ", ".join(f"{k} {v:g}" for k, v in record["weights"].items()) + ".", ""]
    out.append("## Cautions")
    out.append("")
    for text, ids in grouped_warnings(record).items():
        out.append(f"- **{', '.join(ids)}**: {text}")
    seen: list[str] = []
    for route in record["routes"]:
        for c in route["cautions"]:
            if c not in seen:
                seen.append(c)
    out += [f"- {c}" for c in seen] + [f"- {LOCAL_CODES}"]
    return "\n".join(out) + "\n"


def comparison_csv(comparison: Comparison) -> str:
    """The ranking as CSV, one row per route, SI/JSON keys as the header."""
    record = comparison_record(comparison)
    keys = [k for k in record["routes"][0] if k not in ("warnings", "cautions")] if record["routes"] else []
    buffer = io.StringIO()
    writer = csv.writer(buffer, lineterminator="\n")
    writer.writerow(keys)
    for route in record["routes"]:
        writer.writerow(["" if route[k] is None else route[k] for k in keys])
    return buffer.getvalue()


def recipe_markdown(result, currency: str) -> str:
    """One route's batch as a Markdown recipe."""
    rec = batch_record(result, currency)
    out = [f"# Batch: {rec['label']}", "", f"Delivers {rec['co2_kg']:.3f} kg CO2 "
           f"({rec['co2_generated_kg']:.3f} kg made).", "", "## Buy and weigh", "",
           "| reagent | formula | mass kg | volume L | pure kg | cost |", "|---|---|---|---|---|---|"]
    for g in rec["reagents"]:
        out.append(f"| {g['name']} | {g['formula']} | {g['mass_kg']:.3f} | "
                   f"{cell('', '{:.3f}', g['volume_l'])} | {g['pure_mass_kg']:.3f} | {cell('', '{:.2f}', g['cost'])} |")
    if rec["byproducts"]:
        out += ["", "## Left over", ""] + [f"- {b['name']} ({b['formula']}): {b['mass_kg']:.3f} kg. {b['note']}".rstrip()
                                         for b in rec["byproducts"]]
    dt = rec["temperature_change_k"]
    out += ["", "## Heat", "", f"{rec['heat_kj']:+.1f} kJ: {rec['heat_in_words']}"
            + (f", liquor temperature change {dt:+.1f} K." if dt is not None else "."), "",
            "## Cost", "", f"Per kg CO2: {cell('', '{:.2f}', rec['cost_per_kg'])} {currency}.", ""]
    out += [f"- {c['item']}: {c['amount']:.3f} {c['unit']} -> {cell('', '{:.2f}', c['cost'])}" for c in rec["costs"]]
    out += ["", "## Cautions", ""] + [f"- {w}" for w in rec["warnings"]] + [f"- {c}" for c in rec["cautions"]]
    out.append(f"- {LOCAL_CODES}")
    return "\n".join(out) + "\n"

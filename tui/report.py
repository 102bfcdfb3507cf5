"""The comparison and a recipe as text: a readable table, Markdown and CSV.

The command line and the interface's export both call these, so both faces write the same.
"""

from __future__ import annotations

import csv
import io
from typing import Any, Mapping

from co2routes.sources.pipeline import Comparison
from co2routes.sources.records import batch_record, comparison_record
from co2routes.thermo.cautions import LOCAL_CODES
from co2routes.tui.plant_report import plant_words
from co2routes.tui.reasons import choice_lines, markdown_grid, place, reason_rows, text_grid

#: The comparison's columns: (JSON key, heading, format); ``{p}`` in a heading is the end product
#: (every per-kg figure is per kg of it, the basis the score uses).
COLUMNS: tuple[tuple[str, str, str], ...] = (
    ("rank", "#", "{:d}"),
    ("id", "route", "{}"),
    ("score", "score", "{:.3f}"),
    ("cost_per_kg", "cost/kg {p}", "{:.2f}"),
    ("energy_kwh_per_kg", "kWh/kg {p}", "{:.2f}"),
    ("time_h", "time h", "{:.1f}"),
    ("reagent_kg_per_kg", "feed kg/kg {p}", "{:.2f}"),
    ("heat_kj_per_kg", "heat kJ/kg {p}", "{:+.0f}"),
    ("water_g_per_kg", "water g/kg {p}", "{:.1f}"),
    ("co2_mole_fraction", "CO2 %", "{:.1%}"),
    ("hazard", "hazard", "{:d}"),
)


def headings(end_product: str) -> list[str]:
    """The column headings, the per-kg ones naming the end product.

    >>> headings("dry-ice")[3]
    'cost/kg dry ice'
    """
    return [h.format(p=end_product.replace("-", " ")) for _, h, _ in COLUMNS]


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
    return [[place(route) if k == "rank" else cell(k, f, route[k]) for k, _, f in COLUMNS]
            for route in record["routes"]]


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


def bed_words(dryer: Mapping[str, Any] | None) -> str:
    """A route's dryer (its ``dryer`` record) in one line.

    >>> bed_words(None)
    'no dryer'
    >>> bed_words({"desiccant": "silica-gel", "bed_mass_kg": 0.5, "bed_volume_l": 0.69,
    ...            "bed_diameter_m": 0.06, "bed_length_m": 0.18, "breakthrough_h": 30.0,
    ...            "outlet_dew_point_k": 223.15, "reaches_target": True, "target_ppmv": 20.0})
    'silica-gel 0.500 kg (0.69 L), 6.0 cm across x 18.0 cm deep; breakthrough 30.0 h; outlet dew point -50 °C'
    """
    if dryer is None:
        return "no dryer"
    text = (f"{dryer['desiccant']} {dryer['bed_mass_kg']:.3f} kg ({dryer['bed_volume_l']:.2f} L), "
            f"{dryer['bed_diameter_m'] * 100:.1f} cm across x {dryer['bed_length_m'] * 100:.1f} cm deep; "
            f"breakthrough {dryer['breakthrough_h']:.1f} h; "
            f"outlet dew point {dryer['outlet_dew_point_k'] - 273.15:.0f} °C")
    if not dryer["reaches_target"]:
        text += f" (wetter than the target {dryer['target_ppmv']:.3g} ppmv)"
    return text


def delivery_words(delivery: Mapping[str, Any] | None) -> str:
    """A route's compression and flash (its ``delivery`` record) in one line.

    >>> delivery_words(None)
    'gas as made'
    >>> delivery_words({"end_product": "dry-ice", "raw_co2_kg_per_kg": 1.0, "stages": None,
    ...                 "solid_fraction": None})
    'bought as dry ice'
    >>> delivery_words({"end_product": "liquid", "cannot_condense": "too lean to condense: ..."})
    'cannot be made into liquid: the gas is too lean to condense'
    """
    if delivery is None:
        return "gas as made"
    product = delivery["end_product"].replace("-", " ")
    if delivery.get("cannot_condense"):
        return f"cannot be made into {product}: the gas is {delivery['cannot_condense'].split(':')[0]}"
    if delivery["stages"] is None and delivery["solid_fraction"] is None:
        return f"bought as {product}"  # its purchase losses are in the feed per kg
    if delivery["stages"] is None:
        parts = ["bought as liquid"]
    else:
        parts = [f"condensed at {delivery['condensing_pressure_pa'] / 1e5:.1f} bar "
                 f"({delivery['condensing_temperature_k'] - 273.15:.0f} °C) in {delivery['stages']} "
                 f"stages, {delivery['work_kj_per_kg']:.0f} kJ/kg, discharge "
                 f"{delivery['discharge_temperature_k'] - 273.15:.0f} °C"]
    if delivery["solid_fraction"] is not None:
        parts.append(f"{delivery['solid_fraction']:.0%} of the liquid becomes dry ice")
    parts.append(f"{delivery['raw_co2_kg_per_kg']:.2f} kg CO2 per kg {product}")
    return "; ".join(parts)


def comparison_table(comparison: Comparison) -> str:
    """A plain-text table of the ranking, with each route's cautions after it."""
    record = comparison_record(comparison)
    lines = [f"{record['scenario']}: end product {record['end_product']}, prices in {record['currency']}; "
             f"every per-kg figure is per kg of {record['end_product'].replace('-', ' ')}"]
    lines += text_grid(headings(record["end_product"]), _rows(record))
    lines += ["", "why each place: the share of the score (0 worst .. 1 best) each criterion adds"]
    head, body = reason_rows(record)
    lines += text_grid(head, body, left=(1, len(head) - 1))
    lines += [""] + choice_lines(record)
    if not record.get("demand_from", "the scenario").startswith("the scenario"):
        lines.insert(0, f"demand {record['demand_from']}")
    lines.append("")
    lines.append("dryer per route:")
    width = max((len(route["id"]) for route in record["routes"]), default=0)
    lines += [f"  {route['id']:<{width}}  {bed_words(route['dryer'])}" for route in record["routes"]]
    if record["end_product"] != "gas":
        lines.append("delivery per route (per-kg figures above are per kg of "
                     f"{record['end_product'].replace('-', ' ')}):")
        lines += [f"  {route['id']:<{width}}  {delivery_words(route['delivery'])}"
                  for route in record["routes"]]
    lines.append("plant per route:")
    lines += [f"  {route['id']:<{width}}  {plant_words(route)}" for route in record["routes"]]
    lines.append("")
    lines.append("weights: " + ", ".join(f"{k}={v:g}" for k, v in record["weights"].items()))
    lines.append("hazard: 1 low, 2 moderate, 3 high; heat: + takes heat in, - gives heat off")
    for text, ids in grouped_warnings(record).items():
        lines.append(f"WARNING [{', '.join(ids)}]: {text}")
    lines += [f"caution: {c}" for c in record["cautions"]] + [f"caution: {LOCAL_CODES}"]
    lines += [f"not applicable: {n['label']} ({n['id']}): {n['reason']}" for n in record["not_applicable"]]
    lines += [f"note: {f}" for f in record["failures"]]
    return "\n".join(lines)


def comparison_markdown(comparison: Comparison) -> str:
    """The ranking as a Markdown document (what ``compare --markdown`` prints)."""
    record = comparison_record(comparison)
    out = [f"# {record['scenario']}", "",
           f"End product: {record['end_product']}. Prices in {record['currency']}. Every per-kg figure "
           f"is per kg of {record['end_product'].replace('-', ' ')}.", ""]
    out += markdown_grid(headings(record["end_product"]), _rows(record))
    out += ["", "Why each place: the share of the score (0 worst .. 1 best) each criterion adds.", ""]
    out += markdown_grid(*reason_rows(record))
    out += [""] + [f"- {line}" for line in choice_lines(record)]
    out += [f"- Not applicable: {n['label']} ({n['id']}): {n['reason']}" for n in record["not_applicable"]]
    out += ["", "Weights: " + ", ".join(f"{k} {v:g}" for k, v in record["weights"].items()) + ".", ""]
    out += [f"Every per-kg figure is per kg of {record['end_product'].replace('-', ' ')}.", ""]
    out += ["## Dryer and delivery per route", ""]
    out += ["| route | dryer | delivery |", "|---|---|---|"]
    out += [f"| {route['id']} | {bed_words(route['dryer'])} | {delivery_words(route['delivery'])} |"
            for route in record["routes"]]
    out += ["", "## Plant per route", "", "| route | plant |", "|---|---|"]
    out += [f"| {route['id']} | {plant_words(route)} |" for route in record["routes"]]
    out.append("")
    out.append("## Cautions")
    out.append("")
    for text, ids in grouped_warnings(record).items():
        out.append(f"- **{', '.join(ids)}**: {text}")
    out += [f"- {c}" for c in record["cautions"]] + [f"- {LOCAL_CODES}"]
    return "\n".join(out) + "\n"


def comparison_csv(comparison: Comparison) -> str:
    """The ranking as CSV, one row per route, SI/JSON keys as the header."""
    record = comparison_record(comparison)
    flat = [_flatten(route) for route in record["routes"]]
    keys: list[str] = []
    for route in flat:
        keys += [k for k in route if k not in keys]
    buffer = io.StringIO()
    writer = csv.writer(buffer, lineterminator="\n")
    writer.writerow(keys)
    for route in flat:
        writer.writerow(["" if route.get(k) is None else route[k] for k in keys])
    return buffer.getvalue()


def _flatten(route: Mapping[str, Any]) -> dict[str, Any]:
    """One route's record with its ``dryer`` and ``delivery`` records as prefixed columns.

    >>> _flatten({"id": "a", "dryer": {"bed_mass_kg": 1.0}, "delivery": None, "warnings": []})
    {'id': 'a', 'dryer_bed_mass_kg': 1.0}
    """
    out: dict[str, Any] = {}
    for key, value in route.items():
        if key in ("warnings", "cautions"):
            continue
        if isinstance(value, list):
            continue  # lists (equipment, hazard steps) are in the JSON only
        if isinstance(value, Mapping):
            out.update({f"{key}_{k}": v for k, v in value.items()})
        elif isinstance(value, list):
            out[key] = "; ".join(str(v) for v in value)
        elif value is not None or key not in ("dryer", "delivery"):
            out[key] = value
    return out


def recipe_markdown(result, currency: str) -> str:
    """One route's batch as a Markdown recipe."""
    rec = batch_record(result, currency)
    product = rec["end_product"]
    makes = (f"Delivers {rec['co2_kg']:.3f} kg CO2 ({rec['co2_generated_kg']:.3f} kg made)."
             if product == "gas" else
             f"Makes {rec['product_kg']:.3f} kg of {product.replace('-', ' ')} from {rec['co2_kg']:.3f} kg CO2 "
             f"({rec['co2_generated_kg']:.3f} kg made).")
    out = [f"# Batch: {rec['label']}", "", makes, "", "## Buy and weigh", "",
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
            "## Dryer", "", bed_words(rec["dryer"]) + "."]
    if rec["dryer"] is not None:
        bed = rec["dryer"]
        regen = bed["regeneration_heat_kj"]
        out += ["", f"Takes up {bed['water_load_kg_per_cycle']:.4f} kg of water per cycle; pressure "
                f"drop {bed['pressure_drop_pa']:.3g} Pa; regeneration "
                + ("none (replace the charge)." if regen is None else f"{regen:.0f} kJ per cycle.")]
    if rec["delivery"] is not None:
        out += ["", "## Delivery", "", delivery_words(rec["delivery"]) + "."]
        if rec["delivery"]["electricity_kwh"] > 0:
            out.append(f"Compressor electricity {rec['delivery']['electricity_kwh']:.3f} kWh"
                       + ("." if rec["delivery"]["time_h"] is None
                          else f", running {rec['delivery']['time_h']:.1f} h."))
    per = "CO2" if product == "gas" else product.replace("-", " ")
    out += ["", "## Cost", "", f"Per kg {per}: {cell('', '{:.2f}', rec['cost_per_kg'])} {currency}.", ""]
    out += [f"- {c['item']}: {c['amount']:.3f} {c['unit']} -> {cell('', '{:.2f}', c['cost'])}{price_note(c)}"
            for c in rec["costs"]]
    out += ["", "## Cautions", ""] + [f"- {w}" for w in rec["warnings"]] + [f"- {c}" for c in rec["cautions"]]
    out.append(f"- {LOCAL_CODES}")
    return "\n".join(out) + "\n"


def price_note(line: dict) -> str:
    """Where a cost line's price came from, when it is not the price book.

    >>> price_note({"price_key": "brine", "price_from": "none"})
    " (no price for 'brine')"
    >>> price_note({"price_key": "brine", "price_from": "route default"})
    " (the route's default price for 'brine')"
    """
    if line.get("price_from") == "none" and line.get("price_key"):
        return f" (no price for {line['price_key']!r})"
    if line.get("price_from") == "route default":
        return f" (the route's default price for {line['price_key']!r})"
    return ""


def recipe_csv(result, currency: str) -> str:
    """One route's batch as CSV: one row per thing bought or left over, then the cost lines.

    Columns: ``section, name, formula, mass_kg, volume_l, pure_mass_kg, cost`` (cost in the
    price book's currency; empty where unknown or not applicable).
    """
    rec = batch_record(result, currency)
    buffer = io.StringIO()
    writer = csv.writer(buffer, lineterminator="\n")
    writer.writerow(["section", "name", "formula", "mass_kg", "volume_l", "pure_mass_kg", "cost"])

    def blank(value: Any) -> Any:
        return "" if value is None else value

    for g in rec["reagents"]:
        writer.writerow(["reagent", g["name"], g["formula"], g["mass_kg"], blank(g["volume_l"]),
                         g["pure_mass_kg"], blank(g["cost"])])
    for b in rec["byproducts"]:
        writer.writerow(["byproduct", b["name"], b["formula"], b["mass_kg"], "", "", ""])
    for c in rec["costs"]:
        writer.writerow(["cost", c["item"], "", "", "", "", blank(c["cost"])])
    writer.writerow(["total", f"per kg ({currency})", "", "", "", "", blank(rec["cost_per_kg"])])
    return buffer.getvalue()

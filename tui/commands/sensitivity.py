"""``co2routes sensitivity [SCENARIO]``: each input swung one at a time, widest effect first."""

from __future__ import annotations

import argparse

NAME = "sensitivity"
HELP = ("swing each input of every route's cost per kg one at a time over its range (a tornado; "
        "ranges from the scenario's [uncertain] table or the defaults)")
WANTS_FORMAT_FLAGS = True

#: Width of the text tornado's bars [characters].
BAR = 24


def add_arguments(parser: argparse.ArgumentParser) -> None:
    """Options of ``sensitivity``."""
    parser.add_argument("scenario", nargs="?", help="scenario TOML file (default: the invented demo)")
    parser.add_argument("--route", action="append", default=[], metavar="ID",
                        help="only this route (repeat for more; default: every route)")
    parser.add_argument("--top", default="8", metavar="N", help="inputs shown per route in the table (default 8)")


def whatif_inputs(args: argparse.Namespace):
    """The scenario, its ``[uncertain]`` spreads and the chosen routes (shared with ``uncertainty``)."""
    from co2routes.sources.registry import catalogue
    from co2routes.sources.scenario import demo, demo_text, read_document, validate
    from co2routes.sources.whatif import parse_uncertain

    if args.scenario is None:
        text, source = demo_text(), "demo polytunnel"
        scenario = demo()
    else:
        document, text = read_document(args.scenario)
        source = str(args.scenario)
        scenario = validate(document, source, text)
    cat = catalogue()
    routes = tuple(cat.get(r) for r in args.route) if args.route else cat.routes
    return scenario, parse_uncertain(scenario, source, text, routes), routes


def run(args: argparse.Namespace) -> dict:
    """The sensitivity as its JSON record."""
    from co2routes.sources.sensitivity import sensitivity, sensitivity_record
    from co2routes.tui.commands.uncertainty import whole

    whole(args.top, "--top", 1, 10_000)
    scenario, spreads, routes = whatif_inputs(args)
    return {"end_product": scenario.end_product,
            **sensitivity_record(sensitivity(scenario, spreads, routes))}


def per_kg_words(answer: dict) -> str:
    """What the costs are per kg of: CO2 gas, liquid CO2 or dry ice (the scenario's end product).

    >>> per_kg_words({"end_product": "dry-ice"}), per_kg_words({})
    ('dry ice', 'CO2')
    """
    return {"liquid": "liquid CO2", "dry-ice": "dry ice"}.get(answer.get("end_product", "gas"), "CO2")


def render(answer: dict, args: argparse.Namespace) -> str:
    """A text tornado per route: bars from the low-end to the high-end cost around the nominal."""
    from co2routes.thermo.cautions import LOCAL_CODES

    top = int(args.top)
    cur = answer["currency"]
    lines = [f"{answer['scenario']}: cost per kg {per_kg_words(answer)} in {cur}, one input at a time"]
    for route in answer["routes"]:
        lines.append("")
        nominal = route["cost_per_kg"]
        if nominal is None:
            lines.append(f"{route['id']}: cost unknown (a price is missing)")
            continue
        lines.append(f"{route['id']}: nominal {nominal:.3f} {cur}/kg")
        shown = route["inputs"][:top]
        ends = [v for i in shown for v in (i["cost_per_kg_low"], i["cost_per_kg_high"]) if v is not None]
        span = max((abs(v - nominal) for v in ends), default=0.0) or 1.0
        width = max((len(i["name"]) for i in shown), default=0)
        for item in shown:
            lo, hi = item["cost_per_kg_low"], item["cost_per_kg_high"]
            if lo is None or hi is None:
                lines.append(f"  {item['name']:<{width}}  unknown at one end")
                continue
            left = [" "] * BAR
            right = [" "] * BAR
            for value, mark in ((lo, "-"), (hi, "+")):
                n = round(abs(value - nominal) / span * BAR)
                side = left if value < nominal else right
                for k in range(n):
                    idx = BAR - 1 - k if side is left else k
                    side[idx] = mark if side[idx] == " " else "*"
            lines.append(f"  {item['name']:<{width}}  {''.join(left)}|{''.join(right)}  "
                         f"{lo:.3f} .. {hi:.3f}  (input {_shown(item['low'], item['unit'])} .. {_shown(item['high'], item['unit'])})")
        if len(route["inputs"]) > top:
            lines.append(f"  ... {len(route['inputs']) - top} more (--top, or --json)")
        for w in route["warnings"]:
            lines.append(f"  WARNING: {w}")
    lines.append("")
    lines.append("bars: '-' cost with the input at its low end, '+' at its high end, '|' the nominal cost")
    lines += [f"note: {f}" for f in answer["failures"]]
    lines += [f"caution: {c}" for c in answer["cautions"]] + [f"caution: {LOCAL_CODES}"]
    return "\n".join(lines)


def _shown(x: float, unit: str) -> str:
    """An input value in the unit a reader expects (%, degC, per kWh, per L).

    >>> _shown(0.05, "1"), _shown(8.333e-08, "per J"), _shown(293.15, "K")
    ('5 %', '0.3 per kWh', '20 degC')
    """
    from co2routes.tui.output import _num

    if unit == "1":
        return f"{x * 100:.3g} %"
    if unit == "per J":
        return f"{x * 3.6e6:.3g} per kWh"
    if unit == "per m3":
        return f"{x / 1000:.3g} per L"
    if unit == "K":
        return f"{x - 273.15:.3g} degC"
    return f"{_num(x)} {unit}"

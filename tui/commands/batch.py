"""``co2routes batch ROUTE [SCENARIO]``: the full recipe of one route."""

from __future__ import annotations

import argparse

NAME = "batch"
HELP = "the recipe of one route: what to buy and mix, heat, gas, energy, cost and cautions"


def add_arguments(parser: argparse.ArgumentParser) -> None:
    """Options of ``batch``."""
    parser.add_argument("route", help="route id (see `co2routes routes`)")
    parser.add_argument("scenario", nargs="?", help="scenario TOML file (default: the invented demo)")
    parser.add_argument("--co2", metavar="MASS", help="CO2 to deliver in this batch, e.g. '2 kg' (default: the scenario's)")
    parser.add_argument("--option", action="append", default=[], metavar="KEY=VALUE",
                        help="a route option, e.g. --option strength='20 %%'")
    group = parser.add_mutually_exclusive_group()
    group.add_argument("--markdown", action="store_true", help="print the recipe as Markdown")
    group.add_argument("--csv", action="store_true", help="print the recipe as CSV")


def run(args: argparse.Namespace) -> dict:
    """The recipe's JSON record."""
    from co2routes.sources.guard import named_in
    from co2routes.sources.limits import DEMAND_KG, check_between
    from co2routes.sources.pipeline import check_option_tables, evaluate
    from co2routes.sources.records import batch_record
    from co2routes.sources.registry import catalogue
    from co2routes.sources.scenario import demo, load
    from co2routes.thermo.errors import InputError
    from co2routes.thermo.units import parse_positive

    scenario = demo() if args.scenario is None else load(args.scenario)
    route = catalogue().get(args.route)
    check_option_tables(scenario, catalogue().routes)
    options = {}
    for item in args.option:
        key, sep, value = item.partition("=")
        if not sep or not key.strip():
            raise InputError("--option", "must be KEY=VALUE", got=repr(item))
        options[key.strip()] = value.strip()
    co2_kg = None if args.co2 is None else parse_positive(args.co2, "--co2", "mass")
    if co2_kg is not None:
        low, high = DEMAND_KG
        check_between(co2_kg, "--co2", low, high, f"between {low * 1000:g} g and {high / 1000:g} t", args.co2)
    try:
        result = evaluate(route, scenario, co2_kg=co2_kg, options=options)
    except InputError as err:
        raise named_in(scenario, err) from None
    args._result, args._currency = result, scenario.prices.currency
    return batch_record(result, scenario.prices.currency)


def render(answer: dict, args: argparse.Namespace) -> str:
    """The recipe as Markdown or the readable table."""
    from co2routes.tui.output import table_text
    from co2routes.tui.report import recipe_csv, recipe_markdown

    if args.markdown:
        return recipe_markdown(args._result, args._currency).rstrip("\n")
    if args.csv:
        return recipe_csv(args._result, args._currency).rstrip("\n")
    nested = ("raw_gas_mole_fractions", "dryer", "delivery")
    flat = {k: v for k, v in answer.items() if k not in nested}
    flat.update(_readable(answer))
    gas = ", ".join(f"{k} {v:.2%}" for k, v in answer["raw_gas_mole_fractions"].items())
    text = table_text(flat) + f"\n\nraw gas (mole fractions): {gas}"
    delivery = answer.get("delivery")
    if delivery is not None and delivery["stages"] is None:
        # bought already condensed or solid: no compression figures to show, rather than unknowns
        delivery = {k: v for k, v in delivery.items() if v is not None}
    if delivery is not None and delivery.get("end_product") != "dry-ice":
        delivery.pop("solid_fraction", None)  # nothing is flashed to snow for gas or liquid
    return text + _section("dryer", answer.get("dryer"), "no dryer") + _section(
        "delivery", delivery, "none: the end product is the gas as made")


def _readable(answer: dict) -> dict:
    """Table values that read better as words than as the bare JSON value.

    >>> _readable({"cost_per_kg": 3.948, "currency": "EUR", "temperature_change_k": None})
    {'cost_per_kg': '3.948 EUR per kg', 'temperature_change_k': '– (not worked out for this route)'}
    >>> _readable({"cost_per_kg": None, "currency": "EUR", "temperature_change_k": -2.0})
    {'cost_per_kg': 'unknown: a price is missing from the price book'}
    """
    from co2routes.tui.output import format_value

    out = {}
    cost = answer.get("cost_per_kg")
    missing = ", ".join(repr(c["price_key"]) for c in answer.get("costs", ()) if c.get("price_from") == "none")
    out["cost_per_kg"] = f"unknown: a price is missing from the price book{' (' + missing + ')' if missing else ''}" \
        if cost is None else format_value("cost_per_kg", cost).replace(" per kg", f" {answer.get('currency', '')} per kg")
    if answer.get("temperature_change_k", 0.0) is None:
        out["temperature_change_k"] = "– (not worked out for this route)"
    return out


def _section(title: str, record: dict | None, empty: str) -> str:
    """A nested record (the dryer or the delivery) as an indented block of the readable table.

    >>> print(_section("dryer", None, "no dryer"))
    <BLANKLINE>
    <BLANKLINE>
    dryer: no dryer
    >>> print(_section("dryer", {"bed_mass_kg": 0.5, "outlet_dew_point_k": 203.15}, ""))
    <BLANKLINE>
    <BLANKLINE>
    dryer:
      bed mass           0.5000 kg
      outlet dew point   -70.00 °C (203.15 K)
    """
    from co2routes.tui.output import format_value, label_of

    if record is None:
        return f"\n\n{title}: {empty}"
    rows = [(label_of(k)[0], format_value(k, v)) for k, v in record.items()]
    width = max(len(label) for label, _ in rows)
    return f"\n\n{title}:\n" + "\n".join(f"  {label:<{width}}   {value}" for label, value in rows)

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
    parser.add_argument("--markdown", action="store_true", help="print the recipe as Markdown")


def run(args: argparse.Namespace) -> dict:
    """The recipe's JSON record."""
    from sources.compare import batch_record, evaluate
    from sources.registry import catalogue
    from sources.scenario import demo, load
    from thermo.errors import InputError
    from thermo.units import parse_positive

    scenario = demo() if args.scenario is None else load(args.scenario)
    route = catalogue().get(args.route)
    options = {}
    for item in args.option:
        key, sep, value = item.partition("=")
        if not sep or not key.strip():
            raise InputError("--option", "must be KEY=VALUE", got=repr(item))
        options[key.strip()] = value.strip()
    co2_kg = None if args.co2 is None else parse_positive(args.co2, "--co2", "mass")
    result = evaluate(route, scenario, co2_kg=co2_kg, options=options)
    args._result, args._currency = result, scenario.prices.currency
    return batch_record(result, scenario.prices.currency)


def render(answer: dict, args: argparse.Namespace) -> str:
    """The recipe as Markdown or the readable table."""
    from tui.output import table_text
    from tui.report import recipe_markdown

    if args.markdown:
        return recipe_markdown(args._result, args._currency).rstrip("\n")
    flat = {k: v for k, v in answer.items() if k not in ("raw_gas_mole_fractions",)}
    gas = ", ".join(f"{k} {v:.2%}" for k, v in answer["raw_gas_mole_fractions"].items())
    return table_text(flat) + f"\n\nraw gas (mole fractions): {gas}"

"""``co2routes compare [SCENARIO]``: every route side by side, ranked."""

from __future__ import annotations

import argparse

NAME = "compare"
HELP = "rank every route for a scenario (the invented demo when none is given)"
WANTS_FORMAT_FLAGS = True


def add_arguments(parser: argparse.ArgumentParser) -> None:
    """Options of ``compare``."""
    parser.add_argument("scenario", nargs="?", help="scenario TOML file (default: the invented demo)")
    parser.add_argument("--weight", action="append", default=[], metavar="CRITERION=W",
                        help="weight of a criterion in the rank: cost, energy, time, heat, water, purity, hazard")
    parser.add_argument("--routes", metavar="ID,ID", help="compare only these routes (the others are listed "
                        "as hidden); replaces the scenario's [routes] include")
    parser.add_argument("--exclude", action="append", default=[], metavar="ID[,ID]",
                        help="leave these routes out (listed as hidden); adds to the scenario's [routes] exclude")
    parser.add_argument("--limit", action="append", default=[], metavar="KEY=VALUE",
                        help="a hard limit: max_hazard=2, max_time='1 day', min_purity='95 %%', "
                        "max_cost_per_kg=5, max_capital_per_kg=20 (per kg of end product); a route "
                        "over a limit is listed after the others with the limit it breaks")
    group = parser.add_mutually_exclusive_group()
    group.add_argument("--csv", action="store_true", help="print CSV")
    group.add_argument("--markdown", action="store_true", help="print Markdown")


def load_scenario(args: argparse.Namespace):
    """The scenario named on the command line (or the demo), with ``--weight``, ``--routes``,
    ``--exclude`` and ``--limit`` applied."""
    import dataclasses

    from co2routes.sources.choice import with_choices
    from co2routes.sources.scenario import CRITERIA, demo, load
    from co2routes.thermo.errors import InputError

    scenario = demo() if args.scenario is None else load(args.scenario)
    from co2routes.sources.limits import MAX_WEIGHT

    weights = dict(scenario.weights)
    for item in getattr(args, "weight", []):
        key, _, value = item.partition("=")
        key = key.strip()
        if key not in CRITERIA:
            raise InputError("--weight", f"criterion must be one of {', '.join(CRITERIA)}", got=repr(item))
        try:
            weights[key] = float(value)
        except ValueError:
            raise InputError("--weight", "must be CRITERION=NUMBER, e.g. cost=3", got=repr(item)) from None
        if not 0 <= weights[key] <= MAX_WEIGHT:  # also refuses nan and inf
            raise InputError("--weight", f"a weight must be a number from 0 to {MAX_WEIGHT:g}", got=repr(item))
    scenario = with_choices(scenario, getattr(args, "routes", None), getattr(args, "exclude", ()),
                            getattr(args, "limit", ()))
    return dataclasses.replace(scenario, weights=weights)


def run(args: argparse.Namespace) -> dict:
    """The comparison as its JSON record (the table and other formats come from ``render``)."""
    from co2routes.sources.pipeline import compare
    from co2routes.sources.records import comparison_record

    comparison = compare(load_scenario(args))
    args._comparison = comparison
    return comparison_record(comparison)


def render(answer: dict, args: argparse.Namespace) -> str:
    """Table, CSV or Markdown of the comparison."""
    from co2routes.tui.report import comparison_csv, comparison_markdown, comparison_table

    if args.csv:
        return comparison_csv(args._comparison).rstrip("\n")
    if args.markdown:
        return comparison_markdown(args._comparison).rstrip("\n")
    return comparison_table(args._comparison)

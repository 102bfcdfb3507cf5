"""``co2routes demand USE ...``: the CO2 a greenhouse, a brew, a carbonation run or a cold box needs.

One sub-command per use; its options come from the use's inputs
(:data:`co2routes.sources.uses.greenhouse.INPUTS` ...), the same keys a scenario's ``[use]`` table takes.
"""

from __future__ import annotations

import argparse

NAME = "demand"
HELP = "work out the demand from the use: greenhouse, fermentation, carbonation or cold-box"
#: each use's sub-parser adds its own --json (options after USE belong to the use)
WANTS_FORMAT_FLAGS = False


def add_arguments(parser: argparse.ArgumentParser) -> None:
    """One sub-command per use, one option per input."""
    from co2routes.sources.uses import KINDS, module_of

    sub = parser.add_subparsers(dest="use", metavar="USE", required=True, parser_class=type(parser))
    for kind in KINDS:
        module = module_of(kind)
        doc = (module.__doc__ or kind).strip().splitlines()[0]
        p = sub.add_parser(kind, help=doc, description=doc)
        for spec in module.INPUTS:
            default = f" (default {spec.default})" if spec.default is not None else ""
            need = "" if spec.default is not None or spec.optional else " (needed)"
            text = f"{spec.label}: {spec.help}{default}{need}".replace("%", "%%")
            kwargs = {"choices": spec.choices} if spec.choices else {}
            p.add_argument(spec.option, dest=spec.key, metavar=spec.key.split("_")[-1].upper(), help=text, **kwargs)
        p.add_argument("--json", action="store_true", help="print the answer as JSON (SI units)")


def run(args: argparse.Namespace) -> dict:
    """The use's demand as its JSON answer."""
    from co2routes.sources.uses import module_of, record, work_out

    module = module_of(args.use)
    given = {spec.key: getattr(args, spec.key) for spec in module.INPUTS if getattr(args, spec.key, None) is not None}
    options = {spec.key: spec.option for spec in module.INPUTS}
    return record(work_out(args.use, given, lambda key: options.get(key, key)))


def render(answer: dict, args: argparse.Namespace) -> str:
    """The demand first, then the balance it comes from, its sources, warnings and cautions."""
    from co2routes.tui.output import table_text

    head = {k: answer[k] for k in ("use", "demand_kg_per_day", "peak_kg_per_h", "demand_per_run_kg", "period_h")}
    rest = {k: v for k, v in answer.items() if k not in head and k not in ("summary", "sources", "warnings", "cautions")}
    parts = [answer["summary"], "", table_text(head), "", "balance:", table_text(rest), "", "sources:"]
    parts += [f"  {s}" for s in answer["sources"]]
    parts += ["", table_text({"warnings": answer["warnings"], "cautions": answer["cautions"]}).strip("\n")]
    return "\n".join(parts).rstrip()

"""``co2routes routes``: the routes found, with their options, units and defaults."""

from __future__ import annotations

import argparse

NAME = "routes"
HELP = "list the routes found, with their options, units and defaults"


def add_arguments(parser: argparse.ArgumentParser) -> None:
    """``routes`` takes no options besides --json."""


def run(args: argparse.Namespace) -> dict:
    """Every route and option, plus any route that failed to load."""
    from co2routes.sources.prices import route_prices
    from co2routes.sources.registry import catalogue

    cat = catalogue()
    return {
        "routes": [
            {"id": r.id, "label": r.label, "options": [
                {"key": o.key, "label": o.label, "dimension": o.dimension, "default": o.default,
                 "choices": list(o.choices), "low": o.low, "high": o.high, "help": o.help}
                for o in r.options],
             "default_prices": {k: p.text for k, p in route_prices(r).items()}}
            for r in cat.routes
        ],
        "failures": list(cat.failures),
        "warnings": [],
        "cautions": [],
    }


def render(answer: dict, args: argparse.Namespace) -> str:
    """One block per route."""
    lines = []
    for route in answer["routes"]:
        lines.append(f"{route['id']}: {route['label']}")
        for o in route["options"]:
            allowed = f" one of {', '.join(o['choices'])}" if o["choices"] else f" ({o['dimension']})"
            lines.append(f"    {o['key']} = {o['default']!r}{allowed}  {o['help']}".rstrip())
        lines += [f"    price {k} = {text!r} (the route's default, when the price book has none)"
                  for k, text in route.get("default_prices", {}).items()]
    lines += [f"note: {f}" for f in answer["failures"]]
    return "\n".join(lines)

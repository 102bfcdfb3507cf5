"""``co2routes uncertainty [SCENARIO]``: Monte Carlo over every route at once."""

from __future__ import annotations

import argparse
import math
import sys

NAME = "uncertainty"
HELP = ("draw the inputs of the scenario's [uncertain] table (every price +/-25 % when it has none) "
        "and give each route's cost per kg percentiles and its chance of being the cheapest")
WANTS_FORMAT_FLAGS = True


def add_arguments(parser: argparse.ArgumentParser) -> None:
    """Options of ``uncertainty``."""
    parser.add_argument("scenario", nargs="?", help="scenario TOML file (default: the invented demo)")
    parser.add_argument("--samples", default="10000", metavar="N", help="number of samples (default 10000)")
    parser.add_argument("--seed", default=None, metavar="S",
                        help="seed of the random numbers, for a repeatable result (default: a fresh one, printed)")
    parser.add_argument("--route", action="append", default=[], metavar="ID",
                        help="only this route (repeat for more; default: every route)")


def whole(text: str, option: str, least: int, most: int | None = None) -> int:
    """A whole number from ``least`` to ``most`` (no cap when ``None``) from an option's text.

    >>> whole("10000", "--samples", 1, 200000)
    10000
    """
    from co2routes.thermo.errors import InputError

    allowed = f"must be a whole number from {least} to {most}" if most is not None \
        else f"must be a whole number of at least {least}"
    raw = str(text).strip()
    try:
        if len(raw) > 20:
            raise ValueError
        value = int(raw)
    except ValueError:
        raise InputError(option, allowed, got=repr(text) if len(raw) <= 40 else f"{len(raw)} characters") from None
    if value < least or (most is not None and value > most):
        raise InputError(option, allowed, got=text)
    return value


class ProgressBar:
    """A one-line progress bar on a terminal stream (nothing at all when it is not a terminal)."""

    def __init__(self, stream=None, width: int = 30) -> None:
        self.stream = sys.stderr if stream is None else stream
        self.width = width
        self.active = bool(getattr(self.stream, "isatty", lambda: False)())
        self.last = -1

    def __call__(self, done: int, total: int) -> None:
        if not self.active or total <= 0:
            return
        filled = int(self.width * done / total)
        if filled == self.last and done < total:
            return
        self.last = filled
        self.stream.write(f"\r{NAME} [{'#' * filled}{'.' * (self.width - filled)}] {100 * done // total:3d}%")
        self.stream.flush()

    def close(self) -> None:
        """Clear the bar's line."""
        if self.active:
            self.stream.write("\r" + " " * (self.width + len(NAME) + 10) + "\r")
            self.stream.flush()


def run(args: argparse.Namespace) -> dict:
    """The Monte Carlo result as its JSON record."""
    from co2routes.sources.uncertainty import uncertainty, uncertainty_record
    from co2routes.tui.commands.sensitivity import whatif_inputs

    from co2routes.sources.limits import MAX_SAMPLES

    samples = whole(args.samples, "--samples", 1, MAX_SAMPLES)
    seed = None if args.seed is None else whole(args.seed, "--seed", 0, 2**63 - 1)
    scenario, spreads, routes = whatif_inputs(args)
    bar = ProgressBar()
    try:
        result = uncertainty(scenario, spreads, samples, seed, routes, progress=bar)
    finally:
        bar.close()
    args._result = result
    return {"end_product": scenario.end_product, **uncertainty_record(result)}


def render(answer: dict, args: argparse.Namespace) -> str:
    """A table of the percentiles with a text box chart (P10 .. P90 box, P50 mark) per route."""
    from co2routes.thermo.cautions import LOCAL_CODES
    from co2routes.tui.commands.sensitivity import per_kg_words

    cur = answer["currency"]
    rows = [r for r in answer["routes"] if r["cost_per_kg_p50"] is not None]
    lines = [f"{answer['scenario']}: cost per kg {per_kg_words(answer)} in {cur}, {answer['samples']} samples, "
             f"seed {answer['seed']}",
             "inputs drawn: " + (", ".join(f"{i['name']} ({i['dist']})" for i in answer["inputs"]) or "none"), ""]
    lo = min((r["cost_per_kg_p10"] for r in rows), default=0.0)
    hi = max((r["cost_per_kg_p90"] for r in rows), default=1.0)
    width = 30
    scale = _scale(lo, hi, width)
    idw = max((len(r["id"]) for r in answer["routes"]), default=5)
    lines.append(f"{'route':<{idw}}  {'nominal':>8} {'P10':>8} {'P50':>8} {'P90':>8} {'cheapest':>8}  "
                 f"{lo:<.2f}{'(log scale)' if scale.log else '':^{width - 8}}{hi:>.2f}")
    for r in answer["routes"]:
        if r["cost_per_kg_p50"] is None:
            lines.append(f"{r['id']:<{idw}}  cost unknown (a price is missing)")
            continue
        chart = [" "] * (width + 1)
        a, m, b = (scale(r[k]) for k in ("cost_per_kg_p10", "cost_per_kg_p50", "cost_per_kg_p90"))
        for k in range(a, b + 1):
            chart[k] = "="
        chart[a], chart[b], chart[m] = "[", "]", "|"
        lines.append(f"{r['id']:<{idw}}  {r['cost_per_kg_nominal']:>8.3f} {r['cost_per_kg_p10']:>8.3f} "
                     f"{r['cost_per_kg_p50']:>8.3f} {r['cost_per_kg_p90']:>8.3f} {_share(r['probability_cheapest'])}  "
                     f"{''.join(chart)}")
    lines += ["", "box: [ P10, | median, ] P90"]
    lines += [f"WARNING: {w}" for w in answer["warnings"]]
    lines += [f"note: {f}" for f in answer["failures"]]
    lines += [f"caution: {c}" for c in answer["cautions"]] + [f"caution: {LOCAL_CODES}"]
    return "\n".join(lines)


class _Scale:
    """Column of a cost on the box chart: linear, or logarithmic when the costs span more than
    ten times (one expensive route would otherwise squash every other box into a column or two)."""

    def __init__(self, low: float, high: float, width: int) -> None:
        self.low, self.high, self.width = low, high, width
        self.log = low > 0 and high / low > 10.0

    def __call__(self, value: float) -> int:
        if self.log:
            share = math.log(value / self.low) / math.log(self.high / self.low)
        else:
            share = (value - self.low) / ((self.high - self.low) or 1.0)
        return min(self.width, max(0, round(share * self.width)))


def _scale(low: float, high: float, width: int) -> _Scale:
    """The chart's scale for costs from ``low`` to ``high`` over ``width`` columns.

    >>> _scale(1.0, 2.0, 30)(1.5), _scale(1.0, 100.0, 30)(10.0), _scale(1.0, 100.0, 30).log
    (15, 15, True)
    """
    return _Scale(low, high, width)


def _share(p: float | None) -> str:
    """The chance of being cheapest, 8 wide; a dash for a route not counted (demand not met)."""
    return f"{'-':>8}" if p is None else f"{p:>8.1%}"

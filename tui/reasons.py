"""Why each route sits where it does, as text: score parts, limits broken, routes hidden, the
non-dominated set. Drawn from the comparison record (:func:`co2routes.sources.records.comparison_record`)
for the text and Markdown faces of :mod:`co2routes.tui.report`.
"""

from __future__ import annotations

from typing import Any, Mapping, Sequence

from co2routes.sources.scenario import CRITERIA


def text_grid(head: Sequence[str], body: Sequence[Sequence[str]], left: Sequence[int] = (1,)) -> list[str]:
    """A plain-text table: headings, a rule, rows; the columns ``left`` left-aligned, the rest right.

    >>> text_grid(["#", "route", "x"], [["1", "ab", "0.5"]])
    ['#  route  x', '-  -----  ---', '1  ab     0.5']
    """
    widths = [max(len(x) for x in col) for col in zip(head, *body)]
    lines = ["  ".join(h.ljust(w) for h, w in zip(head, widths)).rstrip(), "  ".join("-" * w for w in widths)]
    lines += ["  ".join(c.ljust(w) if i in left else c.rjust(w) for i, (c, w) in enumerate(zip(row, widths))).rstrip()
              for row in body]
    return lines


def markdown_grid(head: Sequence[str], body: Sequence[Sequence[str]]) -> list[str]:
    """A Markdown table.

    >>> markdown_grid(["a", "b"], [["1", "2"]])
    ['| a | b |', '|---|---|', '| 1 | 2 |']
    """
    return (["| " + " | ".join(head) + " |", "|" + "|".join("---" for _ in head) + "|"]
            + ["| " + " | ".join(row) + " |" for row in body])


def place(route: Mapping[str, Any]) -> str:
    """The rank cell: ``–`` for a hidden route, ``!`` after the rank of one over a limit.

    >>> place({"rank": None, "status": "hidden"}), place({"rank": 5, "status": "over limit"})
    ('–', '5!')
    """
    if route["rank"] is None:
        return "–"
    return f"{route['rank']}!" if route["status"] == "over limit" else str(route["rank"])


def standing(route: Mapping[str, Any]) -> str:
    """A route's standing in words: hidden, over a limit, beaten by one route, or non-dominated.

    >>> standing({"status": "ranked", "non_dominated": False, "dominated_by": "purchase"})
    'dominated by purchase (no worse on any criterion)'
    """
    if route["status"] == "hidden":
        return "hidden"
    if route["status"] == "over limit":
        return "over a limit"
    if route["non_dominated"]:
        return "non-dominated"
    return f"dominated by {route['dominated_by']} (no worse on any criterion)"


def reason_rows(record: Mapping[str, Any]) -> tuple[list[str], list[list[str]]]:
    """Headings and rows of the score-parts table: place, route, score, each criterion's share."""
    head = ["#", "route", "score", *[f"+{k}" for k in CRITERIA], "standing"]
    body = [[place(r), r["id"], f"{r['score']:.3f}",
             *[f"{r['score_parts'].get(k, 0.0):.3f}" for k in CRITERIA], standing(r)]
            for r in record["routes"]]
    return head, body


def choice_lines(record: Mapping[str, Any]) -> list[str]:
    """The method, the limits, the routes over a limit and the routes hidden, one line each."""
    ref = record["reference_cost_per_kg"]
    anchor = (f"bought CO2 at {ref:.2f} {record['currency']}/kg" if ref is not None
              else f"1 {record['currency']}/kg (the price book has no price of bought CO2)")
    lines = [f"score: weighted sum of values on fixed scales (SMART, Edwards & Barron 1994); a route's "
             f"score does not depend on the others; cost scale anchored on {anchor}"]
    if record["limits"]:
        lines.append("limits: " + ", ".join(f"{k} {v:g}" for k, v in record["limits"].items()))
    lines += [f"why {r['id']}: {r['why']}" for r in record["routes"] if r["status"] == "ranked"]
    lines += [f"over a limit: {r['id']}: {'; '.join(r['breaks'])}" for r in record["routes"]
              if r["status"] == "over limit"]
    hidden = [r["id"] for r in record["routes"] if r["status"] == "hidden"]
    if hidden:
        lines.append("hidden by the route choice (listed, not ranked): " + ", ".join(hidden))
    return lines

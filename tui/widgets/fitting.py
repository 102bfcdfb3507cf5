"""Fitting text and table columns into the room a terminal gives: pure functions, no widgets.

Text that does not fit is shortened at a word boundary and ends in an ellipsis, never cut inside
a word; the ranking keeps its most important columns when the terminal is narrow and gives the
route column the room its longest name needs when it is wide.
"""

from __future__ import annotations

from typing import Mapping, Sequence

#: Columns in the order they are kept as the room shrinks; keys not named here come last.
PRIORITY = ("rank", "route", "cost", "hazard", "score", "energy", "time", "heat", "water", "purity")
#: Columns never dropped: the rank, the route, its cost, its hazard and its score.
MUST = PRIORITY[:5]
#: The route column never gets narrower than this [cells].
ROUTE_MIN = 12
#: The route column gets this much [cells] before the less important columns are added.
ROUTE_WANT = 20
#: Cells a table column takes beyond its text (one blank each side).
PADDING = 2


def shorten(text: str, width: int) -> str:
    """``text`` fitted into ``width`` cells, cut at a word boundary and ending in ``…``.

    >>> shorten("Acid on a carbonate", 12)
    'Acid on a…'
    >>> shorten("Buy CO2", 12)
    'Buy CO2'
    >>> shorten("Lime sorbent from air, calcined", 22)
    'Lime sorbent from air…'
    >>> shorten("Fermentation", 6)
    'Ferme…'
    """
    if len(text) <= width:
        return text
    if width < 2:
        return "…"[:width]
    head = text[: width - 1]
    if text[width - 1] not in " ,;:":  # the cut falls inside a word: go back to its start
        boundary = max(head.rfind(" "), head.rfind("("))
        if boundary > 0:
            head = head[:boundary]
    return head.rstrip(" ,;:(") + "…"


def fit_columns(widths: Mapping[str, int], room: int, keep: Sequence[str] = (),
                route_need: int = 0) -> tuple[list[str], int]:
    """The columns that fit in ``room`` cells, in table order, and the route column's width.

    ``widths`` maps each column key (in table order) to the width of its widest text; ``keep``
    names columns that stay whatever happens (the one sorted by); ``route_need`` is the width of
    the longest route name. The columns of :data:`MUST` and ``keep`` always stay; the route
    column is given up to :data:`ROUTE_WANT`; the other columns are added in the order of
    :data:`PRIORITY` while they fit; the route column then takes what is left, up to its need.

    >>> w = {"rank": 1, "route": 5, "cost": 7, "energy": 6, "hazard": 6}
    >>> fit_columns(w, 40, route_need=30)
    (['rank', 'route', 'cost', 'hazard'], 18)
    >>> fit_columns(w, 80, route_need=30)
    (['rank', 'route', 'cost', 'energy', 'hazard'], 30)
    """
    order = list(widths)
    rest = sorted((k for k in order if k != "route"),
                  key=lambda k: PRIORITY.index(k) if k in PRIORITY else len(PRIORITY))
    chosen = [k for k in rest if k in MUST or k in keep]
    need = max(route_need, widths.get("route", 0))

    def used(keys: list[str]) -> int:
        return sum(widths[k] + PADDING for k in keys) + PADDING  # the last: the route's padding

    want = max(ROUTE_MIN, min(need, ROUTE_WANT))
    for key in rest:
        if key not in chosen and used(chosen + [key]) + want <= room:
            chosen.append(key)
    route = max(ROUTE_MIN, min(need, room - used(chosen)))
    return [k for k in order if k in chosen or k == "route"], route

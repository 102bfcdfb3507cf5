"""Text snapshots of the main states at fixed terminal sizes (80x24, 120x40 and 200x50).

Each state is rendered headless, exported with ``App.export_screenshot()`` (SVG), turned back into
the characters on screen (no colours), the volatile parts masked (see :data:`MASKS`), and compared
with ``tests/tui/snapshots/<state>-<cols>x<rows>.txt``. The test-double routes are used so that a
change in a route model does not change the pictures; what is pictured is the layout and wording.

After an intended change of the screen, rewrite the expected files and read the diff:

    CO2ROUTES_UPDATE_SNAPSHOTS=1 .venv/bin/python -m pytest -q -p no:cacheprovider tests/tui/test_app_snapshots.py
    git diff tests/tui/snapshots/
"""

from __future__ import annotations

import html
import os
import re
from pathlib import Path

from textual.widgets import Input

from apphelp import settle
from doubles import routes as doubles
from co2routes.tui.app import Co2RoutesApp

SNAPSHOTS = Path(__file__).parent / "snapshots"
SIZES = ((80, 24), (120, 40), (200, 50))
#: Width of one terminal cell in Rich's SVG export [px] (its default font size 20 x 0.61).
CELL_PX = 12.2

#: (pattern, replacement): timings (``ranked in 0.82 s``) change from run to run.
MASKS = ((re.compile(r"\b\d+\.\d+ s\b"), "#.## s"),)

_TEXT = re.compile(r'<text class="[^"]*" x="([\d.]+)" y="[\d.]+" textLength="[\d.]+" '
                   r'clip-path="url\(#terminal-\d+-line-(\d+)\)">(.*?)</text>')


def screen_text(svg: str, width: int, height: int) -> str:
    """The characters of an ``export_screenshot()`` SVG as lines of text, trailing blanks removed."""
    grid = [[" "] * width for _ in range(height)]
    for x, line, text in _TEXT.findall(svg):
        row, col = int(line), round(float(x) / CELL_PX)
        for i, ch in enumerate(html.unescape(text).replace("\xa0", " ")):
            if row < height and col + i < width:
                grid[row][col + i] = ch
    return "\n".join("".join(r).rstrip() for r in grid) + "\n"


def masked(text: str) -> str:
    """``text`` with the volatile parts replaced (:data:`MASKS`)."""
    for pattern, replacement in MASKS:
        text = pattern.sub(replacement, text)
    return text


def check(app, name: str) -> None:
    """Compare the screen with its stored snapshot (or store it when asked to)."""
    width, height = app.size
    got = masked(screen_text(app.export_screenshot(), width, height))
    path = SNAPSHOTS / f"{name}-{width}x{height}.txt"
    if os.environ.get("CO2ROUTES_UPDATE_SNAPSHOTS") == "1":
        SNAPSHOTS.mkdir(exist_ok=True)
        path.write_text(got, encoding="utf-8")
        return
    assert path.exists(), f"no snapshot {path.name}: run with CO2ROUTES_UPDATE_SNAPSHOTS=1 to write it"
    want = path.read_text(encoding="utf-8")
    assert got == want, f"{path.name} differs; if the change is intended, rewrite with CO2ROUTES_UPDATE_SNAPSHOTS=1"


async def _ready(pilot) -> None:
    await settle(pilot)
    await pilot.pause()


async def _type(pilot, widget_id: str, text: str) -> None:
    box = pilot.app.screen.query_one(f"#{widget_id}", Input)
    box.focus()
    box.value = text
    await _ready(pilot)


async def _at_every_size(pilot, name: str, failed: list[str]) -> None:
    """Snapshot the current state at each of :data:`SIZES` (one run of the app, resized)."""
    for width, height in SIZES:
        await pilot.resize_terminal(width, height)
        await _ready(pilot)
        try:
            check(pilot.app, name)
        except AssertionError as err:
            failed.append(str(err))


async def test_every_state_at_every_size():
    """Start-up (focus in the first field), an inline error, the keys screen, a dry-ice
    scenario's Delivery tab with the focus on the routes, and its cost-by-size chart; each at
    80x24, 120x40 and 200x50.
    One app is resized rather than one started per picture: the suite stays fast."""
    failed: list[str] = []
    app = Co2RoutesApp(None, routes=doubles())
    async with app.run_test(size=SIZES[0]) as pilot:
        await _ready(pilot)
        await _at_every_size(pilot, "start-up", failed)
        await _type(pilot, "f-demand", "12 parsecs")
        assert app.screen.query_one("#f-demand").parent.has_class("-bad")
        await _at_every_size(pilot, "inline-error", failed)
        await _type(pilot, "f-demand", "1.2 kg/day")
        await pilot.press("f1")
        await _at_every_size(pilot, "keys", failed)
        await pilot.press("escape")
        await _type(pilot, "f-end_product", "dry-ice")
        assert app.planner.outcome.scenario.end_product == "dry-ice"
        await pilot.press("escape", "3")
        await _at_every_size(pilot, "dry-ice-delivery", failed)
        # the cost-by-size chart redrawn at each size: a mark per route, its key under the plot
        await pilot.press("5")
        await _at_every_size(pilot, "cost-by-size", failed)
    assert not failed, "\n".join(failed)



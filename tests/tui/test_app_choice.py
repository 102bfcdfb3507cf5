"""The interface's route choice and reasons: the hide/show key and the score parts (state, not pixels)."""

from __future__ import annotations

import io
import tomllib

from rich.console import Console
from textual.widgets import Input, Static

from apphelp import settle, table_cells, table_ids, write_scenario
from doubles import routes as doubles
from co2routes.sources.rank import why_place
from co2routes.sources.scenario import demo_text
from co2routes.tui.app import Co2RoutesApp
from co2routes.tui.widgets.ranking import HIDE_KEY, RankingTable


def _recipe_text(app) -> str:
    console = Console(width=300, record=True, file=io.StringIO())
    console.print(app.screen.query_one("#recipe", Static).content)
    return console.export_text()


async def test_hide_key_hides_and_shows_the_route_and_detail_gives_the_score_parts(tmp_path):
    doc = tomllib.loads(demo_text("polytunnel"))
    doc.pop("options", None)
    path = write_scenario(tmp_path / "s.toml", doc)
    app = Co2RoutesApp(str(path), routes=doubles())
    async with app.run_test(size=(120, 40)) as pilot:
        await settle(pilot)
        screen = app.planner
        first, second = screen.outcome.comparison.rows
        # the score parts and the why line of the selected (first) route, as the ranking says
        text = _recipe_text(app)
        assert f"score {first.score:.3f}" in text
        assert "score parts: " + " + ".join(f"{k} {v:.3f}" for k, v in first.score_parts.items() if v > 0) in text
        assert "why this place: " + why_place(first, None, second) in " ".join(text.split())
        score_at = app.screen.query_one(RankingTable).shown_keys.index("score")
        assert table_cells(app, first.result.route_id)[score_at] == f"{first.score:.3f}"

        screen.query_one("#ranking").focus()
        await pilot.press(HIDE_KEY)
        await settle(pilot)
        hidden_id = first.result.route_id
        assert screen.document["routes"] == {"exclude": [hidden_id]}
        rows = {r.result.route_id: r for r in screen.outcome.comparison.rows}
        assert rows[hidden_id].hidden and rows[hidden_id].rank is None
        assert rows[second.result.route_id].rank == 1
        assert table_ids(app)[-1] == hidden_id  # still listed, last
        assert table_cells(app, hidden_id)[0] == "–"
        assert "hidden (listed, not ranked)" in _recipe_text(app)  # the selection stays on it

        await pilot.press(HIDE_KEY)
        await settle(pilot)
        assert "routes" not in screen.document
        assert [r.status for r in screen.outcome.comparison.rows] == ["ranked", "ranked"]
        assert table_ids(app)[0] == hidden_id

        # a limit typed in the form: the hazard-2 double goes after the other, marked, with its reason
        box = screen.query_one("#f-limits--max_hazard", Input)
        box.focus()
        await pilot.press("1")
        await settle(pilot)
        assert screen.document["limits"] == {"max_hazard": 1}
        rows = screen.outcome.comparison.rows
        assert [r.status for r in rows] == ["ranked", "over limit"]
        assert rows[1].breaks == ("hazard 2 above the limit 1",)
        assert table_cells(app, rows[1].result.route_id)[0] == "2!"

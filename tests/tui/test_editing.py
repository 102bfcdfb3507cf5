"""The form's edit logic without the interface: typed text -> document -> ranking or a marked field.

The interface (tests/tui/test_app_edit.py) runs the same functions in its workers; here every
field of the form takes junk in plain pytest, which is what a few hundred interface edits used to
check.
"""

from __future__ import annotations

import math
import tomllib

import pytest

from apphelp import COST_ONLY
from doubles import routes as doubles
from co2routes.sources.pipeline import compare
from co2routes.sources.prices import demo_book
from co2routes.sources.scenario import demo_text, validate
from co2routes.thermo.errors import InputError
from co2routes.tui.compute import demand_sweep, outcome
from co2routes.tui.editing import document_after, refusal_marks
from co2routes.tui.fields import BASE_FIELDS, option_fields, price_fields
from co2routes.tui.session import open_demo, value_at
from co2routes.tui.widgets.ranking import COLUMN_BY_KEY, cell_text

JUNK = ("☃ 3 [x]", "-1e999 K", "nan kg")


def _fields(routes, book):
    """The form's fields, as the planning screen builds them."""
    return BASE_FIELDS + option_fields(routes) + price_fields(book)


def _field(fields, dotted):
    return next(f for f in fields if f.dotted == dotted)


def _cost_only_document():
    doc = tomllib.loads(demo_text("polytunnel"))
    doc["weights"] = dict(COST_ONLY)
    doc.pop("options", None)
    return doc


@pytest.mark.parametrize("junk", JUNK)
def test_any_text_in_any_field_is_ranked_or_marked(junk):
    """Every field takes junk: the scenario is either ranked (and charted) or refused with a
    reason that lands beside a field of the form; typing the old text back ranks as before."""
    opened, book, routes = open_demo(), demo_book(), doubles()
    fields = _fields(routes, book)
    before = [r.result.route_id for r in outcome(opened.document, opened.source, routes=routes).comparison.rows]
    refused = 0
    for f in fields:
        doc = document_after(opened.document, f, junk, book)
        try:
            done = outcome(doc, opened.source, routes=routes)
        except InputError as err:
            refused += 1
            marks = refusal_marks(fields, err, f)
            assert marks and marks[-1][0] in fields and marks[-1][1], (f.dotted, str(err))
        else:
            assert done.comparison.rows or done.comparison.not_applicable, f.dotted
            sweep = demand_sweep(done.scenario, routes, known=done.comparison)
            assert all(c is None or math.isfinite(c) for costs in sweep.cost_per_kg.values() for c in costs)
        back = document_after(doc, f, f.to_text(value_at(opened.document, f.keys)), book)
        again = outcome(back, opened.source, routes=routes)
        assert [r.result.route_id for r in again.comparison.rows] == before, f.dotted
    assert refused > len(fields) // 2  # most fields refuse junk; the name, for one, takes any text


def test_a_refused_value_is_marked_on_its_own_field():
    opened, book, routes = open_demo(), demo_book(), doubles()
    fields = _fields(routes, book)
    demand = _field(fields, "demand")
    with pytest.raises(InputError) as caught:
        outcome(document_after(opened.document, demand, "12 parsecs", book), opened.source, routes=routes)
    [(field, reason)] = refusal_marks(fields, caught.value, demand)
    assert field is demand and "mass" in reason  # the reason names what is allowed


def test_an_error_naming_another_field_moves_the_mark():
    book, routes = demo_book(), doubles()
    fields = _fields(routes, book)
    ppmv, dew = _field(fields, "dryer.target_ppmv"), _field(fields, "dryer.target_dew_point")
    err = InputError("demo, line 9: dryer.target_dew_point", "give the dew point or the water left, not both")
    marks = refusal_marks(fields, err, ppmv)
    assert marks == [(ppmv, None), (dew, "give the dew point or the water left, not both")]


def test_clearing_a_field_removes_its_key_and_restores_the_default():
    opened, book = open_demo(), demo_book()
    f = _field(BASE_FIELDS, "site.temperature")
    doc = document_after(opened.document, f, "", book)
    assert value_at(doc, f.keys) is None and value_at(opened.document, f.keys) is not None
    # the default (20 degC) then applies, as the greyed hint says
    assert validate(doc, "test").site.temperature_k == pytest.approx(293.15)


def test_demand_edit_ranks_as_compare_says():
    # Doubles, cost only: A = 2.28 + 1.2/m per kg, B = 6.00 per kg (tests/tui/doubles.py): A leads
    # at 1.2 kg/day, B at 0.1 kg per batch.
    routes, book = doubles(), demo_book()
    doc = _cost_only_document()
    assert [r.result.route_id for r in outcome(doc, "test", routes=routes).comparison.rows] == ["double-a", "double-b"]
    doc = document_after(doc, _field(BASE_FIELDS, "demand"), "0.1 kg", book)
    shown = outcome(doc, "test", routes=routes).comparison
    want = compare(validate(doc, "test"), routes)
    assert [r.result.route_id for r in shown.rows] == [r.result.route_id for r in want.rows] == ["double-b", "double-a"]
    for got, row in zip(shown.rows, want.rows):
        assert cell_text(COLUMN_BY_KEY["cost"], got) == f"{row.cost_per_kg:.2f}"


def test_price_edit_reorders_and_shows_the_new_cost():
    routes, book = doubles(), demo_book()
    fields = _fields(routes, book)
    doc = document_after(_cost_only_document(), _field(fields, "prices.co2-cylinder"), "1.00 / kg", book)
    assert doc["prices"]["co2-cylinder"] == "1.00 / kg"
    shown = outcome(doc, "test", routes=routes).comparison
    assert [r.result.route_id for r in shown.rows] == ["double-b", "double-a"]
    assert cell_text(COLUMN_BY_KEY["cost"], shown.rows[0]) == "1.00"


def test_real_routes_follow_compare_after_a_demand_edit():
    opened, book = open_demo(), demo_book()
    doc = document_after(opened.document, _field(BASE_FIELDS, "demand"), "5 kg/day", book)
    shown = outcome(doc, opened.source).comparison
    want = compare(validate(doc, "test"))
    assert [r.result.route_id for r in shown.rows] == [r.result.route_id for r in want.rows]
    for got, row in zip(shown.rows, want.rows):
        cost = "unknown" if row.cost_per_kg is None else f"{row.cost_per_kg:.2f}"
        assert cell_text(COLUMN_BY_KEY["cost"], got) == cost

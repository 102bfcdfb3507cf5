"""Ranking: an additive value score on fixed scales, independent of the other routes present."""

import math

from hypothesis import assume, given, strategies as st

from co2routes.sources.base import CostLine, Energy, RawGas, RouteResult
from co2routes.sources.plan import PlannedRoute
from co2routes.sources.rank import additive, dominance, rank, why_place
from co2routes.sources.scenario import CRITERIA
from co2routes.sources.value import log_value, values


def _result(rid, cost, hazard=1, purity=1.0, time_h=1.0, kwh=0.0, heat_kj=0.0, water=0.0, product_kg=1.0):
    """A planned route with the given figures per kg (the batch makes ``product_kg``)."""
    # ``water`` is the share of what is not CO2 that is water vapour (the rest nitrogen)
    rest = 1.0 - purity
    fractions = {"CO2": purity, "H2O": rest * water, "N2": rest * (1.0 - water)}
    made = RouteResult(
        co2_kg=product_kg, co2_generated_kg=product_kg, reagents=(), byproducts=(), uses=(),
        raw_gas=RawGas(fractions, 293.15), heat_kj=heat_kj, temperature_change_k=None,
        energy=Energy(), time_h=time_h, hazard=hazard, hazard_reason="",
    )
    return PlannedRoute(rid, rid, made, product_kg=product_kg, uses=(), energy=Energy(kwh, 0.0, 0.0),
                        time_h=time_h, costs=(CostLine("x", 1, "kg", cost, cost),))


def _ids(rows):
    return [r.result.route_id for r in rows]


def test_hand_worked_smart_example():
    # Goodwin & Wright, Decision Analysis for Management Judgment (Wiley), ch. 3, office location:
    # Addison Square's values 100, 60, 100, 75, 0, 90 with weights 32, 26, 23, 10, 6, 3 give an
    # aggregate value of 8080 / 100 = 80.8 (exact arithmetic; tolerance 1e-9).
    values_ = dict(zip(("closeness", "visibility", "image", "size", "comfort", "parking"),
                       (1.00, 0.60, 1.00, 0.75, 0.00, 0.90)))
    weights = dict(zip(values_, (32, 26, 23, 10, 6, 3)))
    score, parts = additive(values_, weights)
    assert math.isclose(score * 100, 80.8, abs_tol=1e-9)
    assert math.isclose(parts["visibility"] * 100, 60 * 26 / 100, abs_tol=1e-9)  # 1560 / 100
    assert math.isclose(sum(parts.values()), score, abs_tol=1e-12)


def test_cheapest_wins_on_cost_alone_and_scores_are_fixed():
    rows = rank([_result("a", 5.0), _result("b", 2.0), _result("c", 9.0)], {"cost": 1.0},
                reference_cost=5.0)
    assert _ids(rows) == ["b", "a", "c"]
    # a route at the reference cost sits half way on the log scale from reference/10 to x10
    assert math.isclose(rows[1].score, 0.5, abs_tol=1e-12)
    assert math.isclose(rows[0].score, math.log(50 / 2) / math.log(100), abs_tol=1e-12)


def test_unknown_cost_ranks_last_on_cost():
    rows = rank([_result("a", None), _result("b", 2.0)], {"cost": 1.0}, reference_cost=2.0)
    assert _ids(rows) == ["b", "a"]
    assert rows[1].values["cost"] == 0.0


def test_weights_change_the_order():
    routes = [_result("cheap-risky", 1.0, hazard=3), _result("dear-safe", 3.0, hazard=1)]
    assert _ids(rank(routes, {"cost": 1.0, "hazard": 0.1}, reference_cost=3.0))[0] == "cheap-risky"
    assert _ids(rank(routes, {"cost": 1.0, "hazard": 5.0}, reference_cost=3.0))[0] == "dear-safe"


def test_purity_higher_is_better():
    rows = rank([_result("flue", 1.0, purity=0.1), _result("pure", 1.0, purity=0.99)], {"purity": 1.0})
    assert _ids(rows)[0] == "pure"


def test_limits_and_hidden_are_listed_after():
    routes = [_result("a", 1.0), _result("b", 2.0), _result("c", 3.0)]
    rows = rank(routes, {"cost": 1.0}, reference_cost=2.0, breaks={"a": ("hazard 3 above the limit 2",)},
                hidden={"b"})
    assert _ids(rows) == ["c", "a", "b"]
    assert [r.status for r in rows] == ["ranked", "over limit", "hidden"]
    assert [r.rank for r in rows] == [1, 2, None]
    assert rows[1].breaks == ("hazard 3 above the limit 2",)


def test_dominated_route_names_one_that_beats_it():
    routes = [_result("good", 1.0, hazard=1), _result("worse", 2.0, hazard=2), _result("trade", 0.5, hazard=3)]
    rows = rank(routes, {"cost": 1.0, "hazard": 1.0}, reference_cost=1.0)
    by_id = {r.result.route_id: r for r in rows}
    assert by_id["worse"].dominated_by == "good"
    assert by_id["good"].non_dominated and by_id["trade"].non_dominated
    assert dominance(rows, {}) == {}  # no weighted criterion: nobody beats anybody


def test_why_names_the_deciding_criterion():
    rows = rank([_result("cheap", 1.0, hazard=2), _result("safe", 4.0, hazard=1)],
                {"cost": 3.0, "hazard": 1.0}, reference_cost=4.0)
    line = why_place(rows[1], rows[0])
    assert line.startswith("below cheap") and "behind on cost" in line and "ahead on hazard" in line


# -- properties (hypothesis) ------------------------------------------------------------------

_cost = st.one_of(st.none(), st.floats(0.01, 500.0))
_route = st.builds(
    lambda cost, hazard, purity, time_h, kwh, heat, water: (cost, hazard, purity, time_h, kwh, heat, water),
    _cost, st.integers(1, 3), st.floats(0.001, 1.0), st.floats(0.01, 5000.0), st.floats(0.0, 500.0),
    st.floats(-1e6, 1e6), st.floats(0.0, 1.0))
_weights = st.fixed_dictionaries({k: st.sampled_from([0.0, 0.5, 1.0, 2.0, 3.0, 7.5]) for k in CRITERIA})


def _make(i, spec, factor=1.0):
    cost, hazard, purity, time_h, kwh, heat, water = spec
    return _result(f"r{i}", None if cost is None else cost * factor, hazard, purity, time_h, kwh, heat, water)


def _order(specs, weights, reference=6.0, factor=1.0, skip=()):
    routes = [_make(i, s, factor) for i, s in enumerate(specs) if i not in skip]
    return _ids(rank(routes, weights, reference_cost=reference * factor))


@given(st.lists(_route, min_size=3, max_size=6), _weights, st.data())
def test_a_third_route_never_swaps_two_others(specs, weights, data):
    """Adding, removing or making a third route ten times worse leaves the others' order."""
    k = data.draw(st.integers(0, len(specs) - 1))
    full = _order(specs, weights)
    without = _order(specs, weights, skip={k})
    assert [i for i in full if i != f"r{k}"] == without
    cost, hazard, purity, time_h, kwh, heat, water = specs[k]
    worse = list(specs)
    worse[k] = (None if cost is None else cost * 10, 3, purity / 10, time_h * 10, kwh * 10, heat * 10, water)
    assert [i for i in _order(worse, weights) if i != f"r{k}"] == without


@given(st.lists(_route, min_size=2, max_size=6), _weights, st.floats(1e-3, 1e3))
def test_a_change_of_currency_keeps_the_order(specs, weights, factor):
    """Every price (route costs and the bought-CO2 reference) times the same factor."""
    assert _order(specs, weights) == _order(specs, weights, factor=factor)


@given(st.lists(_route, min_size=2, max_size=6), _weights, st.sampled_from(CRITERIA),
       st.sampled_from([0.5, 1.0, 5.0, 100.0]))
def test_more_weight_never_lowers_the_route_best_on_it(specs, weights, criterion, extra):
    routes = [_make(i, s) for i, s in enumerate(specs)]
    vals = {r.route_id: values(_figures(r), 6.0)[criterion] for r in routes}
    best = max(vals.values())
    before = rank(routes, weights, reference_cost=6.0)
    after = rank(routes, {**weights, criterion: weights[criterion] + extra}, reference_cost=6.0)
    for rid in (r for r, v in vals.items() if v == best):
        place = {r.result.route_id: r.rank for r in before}[rid]
        assert {r.result.route_id: r.rank for r in after}[rid] <= place


def _figures(route):
    from co2routes.sources.value import raw_figures

    return raw_figures(route)


@given(st.floats(1e-6, 1e6), st.floats(1e-6, 1e6))
def test_log_value_is_monotone(a, b):
    assume(a < b)
    assert log_value(a, 0.1, 10.0) >= log_value(b, 0.1, 10.0)

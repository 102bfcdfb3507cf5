"""Ranking: weights, unknown values count as worst, scores in [0, 1]."""

from co2routes.sources.base import Energy, RawGas, RouteResult, CostLine
from co2routes.sources.plan import PlannedRoute
from co2routes.sources.rank import rank


def _result(rid, cost, hazard=1, purity=1.0):
    made = RouteResult(
        co2_kg=1.0, co2_generated_kg=1.0, reagents=(), byproducts=(),
        uses=(), raw_gas=RawGas({"CO2": purity, "H2O": 1 - purity}, 293.15), heat_kj=0.0,
        temperature_change_k=None, energy=Energy(), time_h=1.0, hazard=hazard, hazard_reason="",
    )
    return PlannedRoute(rid, rid, made, product_kg=1.0, uses=(), energy=Energy(), time_h=1.0,
                        costs=(CostLine("x", 1, "kg", cost, cost),))


def test_cheapest_wins_on_cost_alone():
    rows = rank([_result("a", 5.0), _result("b", 2.0), _result("c", 9.0)], {"cost": 1.0})
    assert [r.result.route_id for r in rows] == ["b", "a", "c"]
    assert rows[0].score == 0.0 and rows[-1].score == 1.0


def test_unknown_cost_ranks_last_on_cost():
    rows = rank([_result("a", None), _result("b", 2.0)], {"cost": 1.0})
    assert rows[0].result.route_id == "b"
    assert rows[1].cost_per_kg is None


def test_weights_change_the_order():
    routes = [_result("cheap-risky", 1.0, hazard=3), _result("dear-safe", 3.0, hazard=1)]
    assert rank(routes, {"cost": 1.0, "hazard": 0.1})[0].result.route_id == "cheap-risky"
    assert rank(routes, {"cost": 1.0, "hazard": 5.0})[0].result.route_id == "dear-safe"


def test_purity_higher_is_better():
    rows = rank([_result("flue", 1.0, purity=0.1), _result("pure", 1.0, purity=0.99)], {"purity": 1.0})
    assert rows[0].result.route_id == "pure"

"""What-if analysis: cost lines, distributions, sensitivity and Monte Carlo.

External references: scipy.stats (installed for tests) for the distribution quantiles; the mean
and variance of a linear combination of independent random variables, E[sum a_i X_i] =
sum a_i E[X_i] and Var = sum a_i^2 Var[X_i] (Montgomery & Runger 2014, *Applied Statistics and
Probability for Engineers*, 6th ed., sec. 5-4), with the means and variances of the uniform,
triangular and lognormal distributions (Johnson, Kotz & Balakrishnan 1994/1995, *Continuous
Univariate Distributions*), for the sampling-error bound of the Monte Carlo mean (the standard
error sigma / sqrt(N), central limit theorem).
"""

from __future__ import annotations

import dataclasses
import math

import numpy as np
import pytest

from co2routes.sources.pipeline import compare, evaluate
from co2routes.sources.sensitivity import sensitivity, sensitivity_record
from co2routes.sources.uncertainty import uncertainty, uncertainty_record
from co2routes.sources.whatif import Distribution, cost_model, parse_uncertain
from co2routes.thermo.errors import InputError
from whatif_fakes import FakeRoute, scenario

KWH = 3.6e6


def test_cost_model_is_exactly_linear_in_each_price():
    """Internal identity: the linear model equals re-costing with a changed price book."""
    route, s = FakeRoute(), scenario()
    model = cost_model(evaluate(route, s), s.prices)
    assert model.cost_per_kg({}, s.prices) == evaluate(route, s).cost_per_kg
    for key, amount in (("sucrose", 1.7), ("electricity", 0.42 / KWH), ("disposal", 0.0)):
        changed = dataclasses.replace(s, prices=s.prices.overridden({key: f"{amount * (KWH if key == 'electricity' else 1)} / {'kWh' if key == 'electricity' else 'kg'}"}, "t"))
        again = evaluate(route, changed).cost_per_kg
        assert model.cost_per_kg({key: amount}, s.prices) == pytest.approx(again, rel=1e-12)


def test_quantiles_match_scipy():
    """Quantiles against scipy.stats (reference library), rel 1e-9."""
    stats = pytest.importorskip("scipy.stats")
    q = np.array([0.001, 0.1, 0.37, 0.5, 0.9, 0.999])
    tri = Distribution("x", "triangular", low=0.7, mode=0.85, high=1.1)
    ref = stats.triang(c=(0.85 - 0.7) / 0.4, loc=0.7, scale=0.4).ppf(q)
    assert tri.quantile(q) == pytest.approx(ref, rel=1e-9)
    norm = Distribution("x", "normal", mean=290.0, sd=3.0)
    assert norm.quantile(q) == pytest.approx(stats.norm(290.0, 3.0).ppf(q), rel=1e-9)
    logn = Distribution("x", "lognormal", mean=0.3, sd=0.06)
    sigma = math.sqrt(math.log1p(0.2 ** 2))
    ref = stats.lognorm(s=sigma, scale=0.3 * math.exp(-0.5 * sigma ** 2)).ppf(q)
    assert logn.quantile(q) == pytest.approx(ref, rel=1e-9)
    assert stats.lognorm(s=sigma, scale=0.3 * math.exp(-0.5 * sigma ** 2)).mean() == pytest.approx(0.3, rel=1e-12)


def test_sensitivity_swings_and_order():
    """Swings against the fake route's closed form (feed 2/eff kg per kg, see whatif_fakes)."""
    route, s = FakeRoute(), scenario()
    result = sensitivity(s, routes=[route]).routes[0]
    names = [i.name for i in result.inputs]
    effects = [i.effect for i in result.inputs]
    assert effects == sorted(effects, reverse=True)
    assert "options.fake.vessel" not in names  # a choice cannot swing
    sugar = s.prices.get("sucrose").amount
    eff = next(i for i in result.inputs if i.name == "options.fake.efficiency")
    assert (eff.low, eff.high) == pytest.approx((0.85, 0.95), abs=1e-15)  # default +/- 5 points
    # only the feed line depends on efficiency: 2/eff kg per kg (the dryer, if any, does not)
    for e, c in ((0.85, eff.cost_per_kg_low), (0.95, eff.cost_per_kg_high)):
        assert c - result.cost_per_kg == pytest.approx(2 * sugar * (1 / e - 1 / 0.9), rel=1e-9)
    price = next(i for i in result.inputs if i.name == "prices.sucrose")
    assert price.cost_per_kg_high - price.cost_per_kg_low == pytest.approx(0.5 * sugar * 2 / 0.9, rel=1e-12)
    demand = next(i for i in result.inputs if i.name == "demand")
    assert (demand.low, demand.high) == (1.5, 6.0)  # x0.5 / x2
    for x, c in ((1.5, demand.cost_per_kg_low), (6.0, demand.cost_per_kg_high)):
        assert c == evaluate(route, dataclasses.replace(s, co2_kg=x)).cost_per_kg  # a full re-evaluation
    assert demand.cost_per_kg_low > demand.cost_per_kg_high  # the fixed 0.5 kg disposal spreads thinner
    temp = next(i for i in result.inputs if i.name == "options.fake.temperature")
    assert temp.high - temp.low == pytest.approx(10.0)  # +/- 5 K
    record = sensitivity_record(sensitivity(s, routes=[route]))
    assert set(record["routes"][0]["inputs"][0]) >= {"name", "low", "high", "cost_per_kg_low", "cost_per_kg_high"}


def test_sensitivity_takes_ranges_from_uncertain():
    route = FakeRoute()
    s = scenario({"options.fake.efficiency": {"dist": "uniform", "low": "80 %", "high": "99 %"}})
    dists = parse_uncertain(s, routes=[route])
    eff = next(i for i in sensitivity(s, dists, routes=[route]).routes[0].inputs if i.name.endswith("efficiency"))
    assert (eff.low, eff.high) == pytest.approx((0.80, 0.99))


def test_zero_width_equals_the_nominal_comparison_exactly():
    routes = [FakeRoute("a", "sucrose", 2.0), FakeRoute("b", "glucose", 1.5)]
    s = scenario({
        "prices.sucrose": {"dist": "triangular", "low": "1 / kg", "mode": "1 / kg", "high": "1 / kg"},
        "options.a.efficiency": {"dist": "uniform", "low": "90 %", "high": "90 %"},
        "site.temperature": {"dist": "normal", "mean": "20 degC", "sd": "0 K"},
    }, sucrose="1 / kg")
    dists = parse_uncertain(s, routes=routes)
    result = uncertainty(s, dists, 500, seed=3, routes=routes)
    nominal = {row.result.route_id: row.cost_per_kg for row in compare(s, routes).rows}
    for r in result.routes:
        assert r.cost_per_kg_p10 == r.cost_per_kg_p50 == r.cost_per_kg_p90 == nominal[r.route_id]
        assert r.cost_per_kg_mean == pytest.approx(nominal[r.route_id], rel=1e-15)
    cheapest = min(nominal, key=nominal.get)
    assert {r.route_id: r.probability_cheapest for r in result.routes}[cheapest] == 1.0


def _two_route_case():
    routes = [FakeRoute("a", "sucrose", 2.0), FakeRoute("b", "glucose", 1.5)]
    s = scenario({
        "prices.sucrose": {"dist": "triangular", "low": "0.7 / kg", "mode": "0.85 / kg", "high": "1.1 / kg"},
        "prices.glucose": {"dist": "uniform", "low": "0.9 / kg", "high": "1.5 / kg"},
        "prices.electricity": {"dist": "lognormal", "mean": "0.30 / kWh", "sd": "0.06 / kWh"},
    })
    return routes, s, parse_uncertain(s, routes=routes)


def test_percentiles_ordered_stable_and_probabilities_sum_to_one():
    routes, s, dists = _two_route_case()
    first = uncertainty(s, dists, 4000, seed=11, routes=routes)
    again = uncertainty(s, dists, 4000, seed=11, routes=routes)
    other = uncertainty(s, dists, 4000, seed=12, routes=routes)
    assert uncertainty_record(first)["routes"] == uncertainty_record(again)["routes"]
    assert uncertainty_record(first)["routes"] != uncertainty_record(other)["routes"]
    for r in first.routes:
        assert r.cost_per_kg_p10 < r.cost_per_kg_p50 < r.cost_per_kg_p90
    assert sum(r.probability_cheapest for r in first.routes) == pytest.approx(1.0, abs=1e-12)
    assert 0.0 < first.routes[0].probability_cheapest < 1.0


def test_monte_carlo_mean_of_a_linear_cost_within_sampling_error():
    """Mean and variance of sum a_i X_i (Montgomery & Runger 2014, sec. 5-4); 4 standard errors."""
    routes, s, dists = _two_route_case()
    n = 20000
    result = uncertainty(s, dists, n, seed=5, routes=routes)
    for r, route in zip(result.routes, routes):
        model = cost_model(evaluate(route, s), s.prices)
        mean, var = model.fixed_per_kg, 0.0   # the owning cost per kg does not move with prices
        for key, cost, unit in zip(model.keys, model.costs, model.per_unit):
            a = unit / model.basis_kg
            d = dists.get(f"prices.{key}")
            mean += a * (d.analytic_mean() if d else s.prices.get(key).amount)
            var += a * a * (d.analytic_variance() if d else 0.0)
        assert abs(r.cost_per_kg_mean - mean) < 4.0 * math.sqrt(var / n)
        assert float(np.var(r.samples)) == pytest.approx(var, rel=0.05)


def test_non_price_input_by_interpolation():
    """Efficiency uniform on [a, b]: E[1/eff] = ln(b/a)/(b-a) (integral of 1/x); feed 2/eff kg per kg.
    Tolerance: 4 standard errors plus the interpolation error (< 1e-4 relative with 9 nodes)."""
    route, n = FakeRoute(), 20000
    s = scenario({"options.fake.efficiency": {"dist": "uniform", "low": "80 %", "high": "98 %"}})
    result = uncertainty(s, parse_uncertain(s, routes=[route]), n, seed=2, routes=[route]).routes[0]
    sugar = s.prices.get("sucrose").amount
    fixed = evaluate(route, s).cost_per_kg - 2 * sugar / 0.9  # every line but the feed (nominal eff 90 %)
    mean = 2 * sugar * math.log(0.98 / 0.80) / 0.18 + fixed
    second = 4 * sugar ** 2 * (1 / 0.80 - 1 / 0.98) / 0.18
    sd = math.sqrt(second - (mean - fixed) ** 2)
    assert abs(result.cost_per_kg_mean - mean) < 4 * sd / math.sqrt(n) + 1e-4 * mean
    # the median of a decreasing function of eff is its value at eff's median 0.89
    assert result.cost_per_kg_p50 == pytest.approx(2 * sugar / 0.89 + fixed, rel=2e-3)


def test_default_spreads_when_no_table():
    route = FakeRoute()
    s = scenario()
    result = uncertainty(s, None, 200, seed=1, routes=[route])
    assert {d.name for d in result.inputs} >= {"prices.sucrose", "prices.electricity", "prices.disposal"}
    assert all(d.kind == "uniform" and d.low == pytest.approx(0.75 * s.prices.get(d.name[7:]).amount)
               for d in result.inputs)
    assert any("no [uncertain] table" in w for w in result.warnings)


@pytest.mark.parametrize("entry, field", [
    ({"dist": "uniform", "low": "95 %", "high": "85 %"}, "reversed"),
    ({"dist": "triangular", "low": "80 %", "mode": "99 %", "high": "90 %"}, "mode"),
    ({"dist": "normal", "mean": "90 %", "sd": "-2 %"}, "cannot be negative"),
    ({"dist": "beta", "low": "1 %", "high": "2 %"}, "must be one of uniform"),
    ({"dist": "uniform", "low": "85 %"}, "is required"),
])
def test_bad_spreads_are_one_line_errors(entry, field):
    s = scenario({"options.fake.efficiency": entry})
    with pytest.raises(InputError) as err:
        parse_uncertain(s, routes=[FakeRoute()])
    assert field in str(err.value) and "options.fake.efficiency" in str(err.value)
    assert "\n" not in str(err.value)


def test_bad_names_and_units():
    with pytest.raises(InputError, match="price book lacks"):
        parse_uncertain(scenario({"prices.unobtainium": {"dist": "uniform", "low": "1 / kg", "high": "2 / kg"}}))
    with pytest.raises(InputError, match="like the price book"):
        parse_uncertain(scenario({"prices.sucrose": {"dist": "uniform", "low": "1 / kWh", "high": "2 / kWh"}}))
    with pytest.raises(InputError, match="not an input"):
        parse_uncertain(scenario({"colour": {"dist": "uniform", "low": "1 %", "high": "2 %"}}))
    with pytest.raises(InputError, match="samples"):
        uncertainty(scenario(), None, 0, routes=[FakeRoute()])


def test_zero_width_equals_nominal_for_dry_ice():
    """Cost per kg of end product (dry ice): the Monte Carlo divides by the same basis as compare."""
    from co2routes.sources.scenario import validate

    route = FakeRoute()
    s = validate({"name": "dry ice", "demand": "3 kg", "end_product": "dry-ice", "uncertain": {
        "prices.sucrose": {"dist": "uniform", "low": "1 / kg", "high": "1 / kg"}}}, "test")
    nominal = compare(s, [route]).rows[0].cost_per_kg
    r = uncertainty(s, parse_uncertain(s, routes=[route]), 50, seed=1, routes=[route]).routes[0]
    assert r.cost_per_kg_p10 == r.cost_per_kg_p90 == nominal


def test_a_route_short_of_the_demand_does_not_contest_the_cheapest_place():
    # The invented polytunnel demo: breath cannot keep up with 1.2 kg/day (4 people, 8 h), so its
    # costs are drawn but it is not counted for the cheapest route; the others' chances add to 1.
    from co2routes.sources.scenario import demo

    s = demo()
    result = uncertainty(s, parse_uncertain(s), 200, seed=5)
    by_id = {r.route_id: r for r in result.routes}
    assert by_id["breath"].probability_cheapest is None and by_id["breath"].cost_per_kg_p50 is not None
    assert math.fsum(r.probability_cheapest for r in result.routes if r.probability_cheapest is not None) == \
        pytest.approx(1.0)
    assert any(w.startswith("breath: demand not met") for w in result.warnings)
    record = uncertainty_record(result)
    assert next(r for r in record["routes"] if r["id"] == "breath")["probability_cheapest"] is None

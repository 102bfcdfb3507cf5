"""The plant over time (issue "The plant over time"): schedule, dryer per cycle, equipment and its
owning cost, refrigeration, cylinders, dry-ice box and the whole chain's hazard.

Four invented users, written here (not shipped): a grower wanting 1.5 kg/day of gas for a
polytunnel, a brewery storing 40 kg/day of its fermentation CO2 as liquid, an outreach team
needing 10 kg of dry ice a week, and a lab drying 0.5 kg/day from an acid-carbonate generator.

Sources named beside the asserts:
* the capital recovery factor (A/P, i, n) against compound-interest tables (e.g. Newnan,
  Eschenbach & Lavelle, *Engineering Economic Analysis*, appendix of interest tables; values
  printed to 4 decimals, from memory) and the worked loan of 10,000 at 12 % over 5 years, yearly
  payment 2,774 (same tables);
* the refrigeration cycle: tests/thermo/test_refrigeration.py;
* the dryer's water per cycle against demand x cycle x water content (mass balance by hand),
  molar masses IUPAC through ``chemicals``.
"""

from __future__ import annotations

import math

import pytest
from chemicals.elements import molecular_weight
from hypothesis import given, settings, strategies as st

from co2routes.sources.base import Energy, RawGas, RouteResult, Site
from co2routes.sources.equipment import capital_recovery_factor
from co2routes.sources.pipeline import compare, evaluate
from co2routes.sources.plant import plan_schedule
from co2routes.sources.registry import catalogue
from co2routes.sources.scenario import validate
from co2routes.thermo.errors import InputError

M_W = molecular_weight({"H": 2, "O": 1}) / 1000.0     # kg/mol, IUPAC via `chemicals`
M_CO2 = molecular_weight({"C": 1, "O": 2}) / 1000.0   # kg/mol, IUPAC via `chemicals`
DAY = 86400.0

GROWER = {"name": "grower (invented)", "demand": "1.5 kg/day", "batch": "1 day", "end_product": "gas",
          "site": {"temperature": "18 degC"},
          "options": {"combustion": {"capture": "no", "fuel": "propane"}}}
BREWERY = {"name": "brewery (invented)", "demand": "40 kg/day", "batch": "1 day", "end_product": "liquid",
           "site": {"temperature": "20 degC"},
           "delivery": {"condensing_temperature": "-5 degC", "displacement": "60 L/min", "stages": 3},
           "plant": {"cylinder_size": "13.4 L", "interest_rate": "6 %", "years": "8 year"}}
OUTREACH = {"name": "outreach (invented)", "demand": "10 kg/week", "batch": "1 week", "end_product": "dry-ice",
            "delivery": {"condensing_temperature": "0 degC", "displacement": "60 L/min", "stages": 3,
                         "hold_time": "24 h"}}
LAB = {"name": "lab (invented)", "demand": "0.5 kg/day", "batch": "1 day", "end_product": "gas",
       "dryer": {"desiccant": "molecular-sieve-3a", "target_ppmv": "10 ppmv", "cycle": "14 day"}}


def scenario(document, **plant):
    doc = dict(document)
    if plant:
        doc["plant"] = {**doc.get("plant", {}), **plant}
    return validate(doc, "test")


def route(route_id):
    return catalogue().get(route_id)


# -- capital recovery factor --------------------------------------------------------------------

@pytest.mark.parametrize("rate, years, table", [(0.10, 10, 0.1627), (0.08, 5, 0.2505), (0.06, 20, 0.0872),
                                                (0.12, 5, 0.2774)])
def test_capital_recovery_factor_matches_interest_tables(rate, years, table):
    # (A/P, i, n) of compound-interest tables, printed to 4 decimals: 5e-5
    assert capital_recovery_factor(rate, years) == pytest.approx(table, abs=5e-5)


def test_capital_recovery_factor_worked_loan():
    # worked example: 10,000 borrowed at 12 % for 5 years is repaid by 2,774 a year (tables); 1
    assert 10_000 * capital_recovery_factor(0.12, 5) == pytest.approx(2774.0, abs=1.0)


# -- the schedule ----------------------------------------------------------------------------------

def _fake(kg: float, hours: float) -> RouteResult:
    return RouteResult(kg, kg, (), (), (), RawGas({"CO2": 1.0}, 293.15), 0.0, None, Energy(), hours, 1, "test")


@given(st.floats(min_value=0.01, max_value=500.0), st.floats(min_value=0.0, max_value=300.0),
       st.floats(min_value=0.0, max_value=20.0), st.sampled_from([3600.0, 8 * 3600.0, DAY, 7 * DAY]))
def test_parallel_units_never_ask_a_unit_for_more_than_its_time(q, fixed_h, h_per_kg, period):
    """A route whose batch takes fixed_h + h_per_kg x kg: units keep up and none is overbooked."""
    def rerun(kg):
        return _fake(kg, fixed_h + h_per_kg * kg + 1e-3)
    made = rerun(q)
    s = plan_schedule(made, rerun, q, period, Site())
    assert s.meets_demand
    assert s.busy_fraction <= 1.0 + 1e-9                          # a unit's batch fits its own cycle
    per_period = s.units * s.unit_co2_kg if s.mode != "staggered" else s.unit_co2_kg
    assert per_period == pytest.approx(q, rel=1e-12)               # one period's demand is made
    assert s.mean_flow_kg_s == pytest.approx(q / period, rel=1e-12)
    assert s.peak_flow_kg_s >= s.mean_flow_kg_s * (1 - 1e-12)


def _made_rows(comparison):
    return [row.result for row in comparison.rows if row.result.delivers == "raw-gas"]


@pytest.fixture(scope="module")
def four():
    return {name: compare(scenario(doc)) for name, doc in
            (("grower", GROWER), ("brewery", BREWERY), ("outreach", OUTREACH), ("lab", LAB))}


def test_every_route_honours_its_schedule(four):
    for name, comparison in four.items():
        for row in comparison.rows:
            r, s = row.result, row.result.schedule
            assert s is not None, (name, r.route_id)
            if not s.meets_demand:
                # never silently: the row says what it would take
                assert any("Cannot keep up" in w for w in r.warnings), (name, r.route_id)
                continue
            assert s.busy_fraction <= 1.0 + 1e-9, (name, r.route_id)
            if s.mode == "side by side":
                assert s.units * s.unit_co2_kg == pytest.approx(r.co2_kg, rel=1e-12)
            elif s.units:
                assert s.unit_co2_kg == pytest.approx(r.co2_kg, rel=1e-12)
            assert r.time_h <= s.period_h * (s.units if s.mode == "staggered" else 1) * (1 + 1e-9) or \
                s.mode == "bought", (name, r.route_id)


def test_a_slow_route_gets_the_units_it_needs(four):
    ferm = next(r for r in _made_rows(four["grower"]) if r.route_id == "fermentation")
    # 1.5 kg a day from batches of about nine days: staggered fermenters, one finishing a day
    assert ferm.schedule.mode == "staggered"
    assert ferm.schedule.units == math.ceil(ferm.made.time_h / 24.0)
    fermenters = next(i for i in ferm.equipment if i.key == "fermenter")
    assert fermenters.count == ferm.schedule.units


# -- the dryer per cycle -----------------------------------------------------------------------------

def _water_per_kg_co2(bed, raw):
    dry = {k: v for k, v in raw.mole_fractions.items() if k != "H2O" and v > 0}
    x_co2 = dry["CO2"] / sum(dry.values())
    y_in, y_out = bed.inlet_water_ppmv * 1e-6, bed.outlet_ppmv * 1e-6
    return (y_in / (1 - y_in) - y_out / (1 - y_out)) * M_W / (M_CO2 * x_co2)


def test_dryer_water_per_cycle_is_demand_times_cycle_times_water(four):
    for name, doc in (("grower", GROWER), ("lab", LAB)):
        s = scenario(doc)
        for r in _made_rows(four[name]):
            if r.dryer is None:
                continue
            # demand x cycle x water content (mass balance by hand), 1 %
            expected = s.co2_kg / s.batch_s * s.dryer.cycle_s * _water_per_kg_co2(r.dryer, r.raw_gas)
            assert r.dryer.water_load_kg_per_cycle == pytest.approx(expected, rel=0.01), (name, r.route_id)


def test_lab_acid_carbonate_bed_takes_the_water_that_arrives(four):
    r = next(r for r in _made_rows(four["lab"]) if r.route_id == "acid-carbonate")
    # 0.5 kg/day x 14 days x the gas's water per kg (hand balance), 1 %
    assert r.dryer.water_load_kg_per_cycle == pytest.approx(
        0.5 * 14 * _water_per_kg_co2(r.dryer, r.raw_gas), rel=0.01)
    assert r.dryer.desiccant == "molecular-sieve-3a"


@given(st.floats(min_value=0.2, max_value=20.0))
@settings(max_examples=6)
def test_dryer_water_per_cycle_doubles_with_demand(kg_per_day):
    one = scenario({**LAB, "demand": f"{kg_per_day} kg/day"})
    two = scenario({**LAB, "demand": f"{2 * kg_per_day} kg/day"})
    a, b = evaluate(route("acid-carbonate"), one).dryer, evaluate(route("acid-carbonate"), two).dryer
    assert b.water_load_kg_per_cycle == pytest.approx(2 * a.water_load_kg_per_cycle, rel=1e-6)


def test_flue_gas_used_as_it_is_gets_no_dryer(four):
    r = next(r for r in _made_rows(four["grower"]) if r.route_id == "combustion")
    assert r.dryer is None and not any(i.key == "dryer-vessel" for i in r.equipment)
    assert not any("desiccant" in c.item for c in r.costs)


# -- owning cost ------------------------------------------------------------------------------------

def test_total_is_running_plus_owning_exactly(four):
    for comparison in four.values():
        for row in comparison.rows:
            r = row.result
            assert r.cost_per_kg == r.running_per_kg + r.capital_per_kg   # exactly, by construction
            assert row.cost_per_kg == r.cost_per_kg                     # the ranking reads the sum


@given(st.floats(min_value=0.3, max_value=30.0), st.floats(min_value=1.2, max_value=4.0))
@settings(max_examples=6)
def test_owning_cost_per_kg_falls_as_demand_grows(kg_per_day, factor):
    small = scenario({**GROWER, "demand": f"{kg_per_day} kg/day"})
    large = scenario({**GROWER, "demand": f"{kg_per_day * factor} kg/day"})
    a, b = evaluate(route("fermentation"), small), evaluate(route("fermentation"), large)
    assert a.schedule.units == b.schedule.units          # the fermentation time does not depend on size
    assert b.capital_per_kg < a.capital_per_kg            # capacity exponent below 1 (Williams 1947)
    total = sum(i.yearly for i in a.equipment)
    # yearly payments over a year's product, by hand
    assert a.capital_per_kg == pytest.approx(total / (kg_per_day * 365.25), rel=1e-12)


def test_owned_gear_costs_only_its_running(four):
    owned = compare(scenario(GROWER, owned=True))
    for row in owned.rows:
        assert row.result.capital_per_kg == 0.0
        assert row.result.cost_per_kg == row.result.running_per_kg


def test_yearly_payment_uses_the_capital_recovery_factor():
    s = scenario(GROWER, interest_rate="7 %", years="12 year")
    r = evaluate(route("acid-carbonate"), s)
    for item in r.equipment:
        years = min(item.life_years, 12.0)
        assert item.yearly == pytest.approx(item.price * capital_recovery_factor(0.07, years), rel=1e-12)


# -- liquid, dry ice, refrigeration -------------------------------------------------------------------

def test_brewery_cylinders_and_refrigeration(four):
    s = scenario(BREWERY)
    for r in _made_rows(four["brewery"]):
        st_ = r.stores
        # 40 kg/day for 7 days over 0.68 kg/L x 13.4 L (US 49 CFR 173.304a filling ratio), 1e-9
        assert st_.cylinders_per_week == pytest.approx(40 * 7 / (0.68 * 13.4), rel=1e-9)
        assert "49 CFR 173.304a" in st_.filling_rule
        liq = r.delivery.liquefaction
        draw = liq.mass_flow_kg_s * next(i.count for i in r.equipment if i.key == "compressor")
        assert st_.cylinder_fill_h == pytest.approx(0.68 * 13.4 / draw / 3600.0, rel=1e-9)
        # condensing at -5 degC on a 20 degC site: refrigeration counted, bounded by Carnot
        assert st_.refrigeration_kwh > 0 and 0 < st_.cop < st_.carnot_cop
        line = next(c for c in r.costs if c.item.startswith("refrigeration"))
        assert line.amount == pytest.approx(st_.refrigeration_kwh, rel=1e-12)
        # the first step at the top level names it: the route's own when it is already high
        assert r.hazard == 3 and r.hazard_step == ("making" if r.made.hazard == 3 else "compression")
        assert r.per_kg_basis == pytest.approx(s.co2_kg)


def test_a_users_filling_ratio_changes_the_cylinders():
    r = evaluate(route("acid-carbonate"), scenario(BREWERY, filling_ratio="0.75 kg/L"))
    assert r.stores.cylinders_per_week == pytest.approx(40 * 7 / (0.75 * 13.4), rel=1e-9)
    assert "user's rule" in r.stores.filling_rule


def test_outreach_dry_ice_box_and_the_chains_hazard(four):
    from co2routes.sources.delivery import storage_loss_kg

    s = scenario(OUTREACH)
    loss = storage_loss_kg(s.delivery, s.site)
    for row in four["outreach"].rows:
        r = row.result
        # a week's 10 kg plus what sublimes over 24 h, at 0.9 kg/L pellets (stores notes), 1e-9
        assert r.stores.box_volume_m3 == pytest.approx((10.0 + loss) / 900.0, rel=1e-9)
        if r.route_id == "fermentation":
            # the fermenter alone is low hazard; a compressor to 35 bar sets the chain's
            assert r.made.hazard == 1 and r.hazard == 3 and r.hazard_step == "compression"
        if r.route_id == "purchase":
            assert r.hazard == 2 and r.hazard_step == "buying"


def test_plant_keys_are_validated():
    with pytest.raises(InputError) as caught:
        scenario(GROWER, interest_rat="5 %")
    assert "plant.interest_rat" in caught.value.field
    with pytest.raises(InputError) as caught:
        scenario(GROWER, owned="yes")
    assert "plant.owned" in caught.value.field


def test_breath_says_what_it_would_take(four):
    r = next(row.result for row in four["grower"].rows if row.result.route_id == "breath")
    s = r.schedule
    # Persily & de Jonge rates give 4 people x 8 h less than 1.5 kg/day: more beds cannot help
    assert not s.meets_demand
    needed_h = r.made.time_h - 2.0                      # the route's time less the kiln's 2 h
    people = math.ceil(4 * needed_h / 8.0)              # people for the 8 h given, by hand
    assert f"it would take {people} people for 8 h" in s.note
    assert any(s.note in w for w in r.warnings)

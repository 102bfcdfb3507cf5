"""Demand from the use: the use models, the scenario's [use] table, the fermentation route's purge
and by-product option. Sources and tolerances beside each numeric check."""

from __future__ import annotations

import math
import tomllib

import pytest

from co2routes.sources.base import RouteRequest, Site
from co2routes.sources.routes.fermentation import ROUTE, plan
from co2routes.sources.scenario import validate
from co2routes.sources.uses import work_out
from co2routes.thermo import henry, water
from co2routes.thermo.errors import InputError

R, M = 8.314462618, 0.0440095

HOUSE = {"floor_area": "200 m**2", "mean_height": "3 m", "air_changes_closed": "0.6 /h",
         "target_co2": "900 ppmv", "outside_co2": "420 ppmv", "crop_uptake": "1.5 g/m**2/h",
         "enrichment_hours": "12 h"}


def test_greenhouse_day_by_hand():
    # Hand calculation: n = 101325 x 600 / (R x 293.15); steady supply = 0.6 n 480e-6 M + 0.3 kg/h
    # for 12 h, plus the refill of the stock n 480e-6 M x (1 - exp(-0.6 x 12)) lost overnight.
    u = work_out("greenhouse", HOUSE)
    n = 101325.0 * 600.0 / (R * 293.15)
    stock = n * 480e-6 * M
    supply = 0.6 * stock + 1.5e-3 * 200
    expected = 12 * supply + stock * (1 - math.exp(-0.6 * 12))
    assert u.demand_kg_per_day == pytest.approx(expected, rel=1e-9)
    assert u.peak_kg_per_h >= supply


def test_greenhouse_no_leak_no_crop_gives_zero_and_the_scenario_refuses_it():
    u = work_out("greenhouse", {**HOUSE, "air_changes_closed": "0 /h", "crop_uptake": "0 g/m**2/h"})
    assert u.demand_kg_per_day == 0.0
    doc = {"use": {"kind": "greenhouse", **HOUSE, "air_changes_closed": "0 /h", "crop_uptake": "0 g/m**2/h"}}
    with pytest.raises(InputError, match="no demand"):
        validate(doc)


def test_greenhouse_vents_open_hours_hold_the_outside_level():
    # With vents open and the default vents-open target (the outside level) only uptake is supplied
    u = work_out("greenhouse", {**HOUSE, "vents_open_hours": "4 h"})
    b = dict(u.balance)
    assert b["supply_open_kg_per_h"] == pytest.approx(0.3, rel=1e-12)


def test_fermentation_use_accounts_for_every_kg():
    u = work_out("fermentation", {"volume": "1000 L", "original_gravity": "12 P", "final_gravity": "2.5 P"})
    b = dict(u.balance)
    assert b["co2_released_kg"] == pytest.approx(
        b["co2_dissolved_at_end_kg"] + b["purge_fed_before_collection_kg"]
        + b["headspace_fill_after_switch_kg"] + b["co2_collectable_kg"], rel=1e-12)
    # dissolved: Henry (Sander 2015) at 20 degC under 1 atm less water vapour, over 1 m3
    assert b["co2_dissolved_at_end_kg"] == pytest.approx(
        henry.dissolved_co2_kg_m3(293.15, 101325.0 - water.vapor_pressure(293.15)), rel=1e-12)
    assert u.period_s == 7 * 86400.0 and u.demand_kg_per_day == pytest.approx(u.demand_kg / 7, rel=1e-12)


def test_carbonation_keg_parts():
    u = work_out("carbonation", {"volume": "40 L", "target": "2.5", "serving_temperature": "4 degC"})
    b = dict(u.balance)
    assert b["packages"] == 2
    assert b["co2_dissolved_kg"] == pytest.approx(2.5 * 0.0440095 / 0.022413969 * 0.040, rel=1e-9)
    assert u.demand_kg == pytest.approx(sum(b[k] for k in ("co2_for_drink_kg", "purge_kg", "headspace_kg",
                                                          "dispense_kg", "venting_and_foaming_kg")), rel=1e-12)


def test_scenario_use_sets_the_demand_and_says_so():
    text = '''
name = "invented brewery"
[use]
kind = "fermentation"
volume = "500 L"
original_gravity = "1.050"
final_gravity = "1.010"
every = "14 day"
'''
    s = validate(tomllib.loads(text), "t.toml", text)
    assert s.use.kind == "fermentation"
    # the batch is the use's own run (a brew every period), so the CO2 per batch is one brew's
    assert s.co2_kg == pytest.approx(s.use.demand_kg, rel=1e-12)
    assert s.batch_s == pytest.approx(s.use.period_s, rel=1e-12)
    assert "fermentation" in s.use.source_text


def test_scenario_refuses_demand_beside_use_and_unknown_keys():
    with pytest.raises(InputError, match="not both"):
        validate({"demand": "1 kg/day", "use": {"kind": "greenhouse", **HOUSE}})
    with pytest.raises(InputError, match="use.leakiness"):
        validate({"use": {"kind": "greenhouse", **HOUSE, "leakiness": "high"}})
    with pytest.raises(InputError, match="use.kind"):
        validate({"use": {"kind": "aquarium"}})


def test_scenario_ignores_another_uses_keys_with_a_warning():
    s = validate({"use": {"kind": "greenhouse", **HOUSE, "original_gravity": "1.050"}})
    assert any("ignored" in w for w in s.use.warnings)


def test_scenario_use_takes_the_sites_co2():
    s = validate({"site": {"air_co2": "500 ppmv"}, "use": {"kind": "greenhouse",
                 **{k: v for k, v in HOUSE.items() if k != "outside_co2"}}})
    assert dict(s.use.balance)["outside_co2_ppmv"] == pytest.approx(500.0)


def _request(**options):
    keys = [o.key for o in ROUTE.options]
    return RouteRequest(1.0, Site(), {k: ROUTE.options[keys.index(k)].parse(v) for k, v in options.items()})


def test_fermentation_route_purge_is_the_washout():
    # Danckwerts (1953) washout: lost = V_h (ln(1/(1-y)) + (1-y)) P M / (R T), V_h = 30 % of the must
    batch = plan(_request(headspace="30 %", collect_purity="98 %"))
    v_h = 0.30 * batch.must_m3
    expected = v_h * (math.log(1 / 0.02) + 0.02) * 101325.0 / (R * batch.temperature_k)  # mol
    assert batch.purged_mol == pytest.approx(expected, rel=1e-9)
    none = plan(_request(headspace="0 %"))
    assert none.purged_mol == 0.0
    # more headspace: more sugar for the same delivered kg
    assert batch.inputs["C12H22O11(s)"] > none.inputs["C12H22O11(s)"]


def test_fermentation_route_byproduct_charges_no_sugar():
    plain = ROUTE.compute(_request())
    free = ROUTE.compute(_request(byproduct="yes"))
    assert plain.reagents and plain.uses
    assert free.reagents == () and free.uses == ()
    assert any("By-product" in n for n in free.notes)
    assert free.co2_generated_kg == pytest.approx(plain.co2_generated_kg, rel=1e-12)

"""The workers' computations: the chart data agree with compare and with thermo."""

from __future__ import annotations

import dataclasses

from doubles import routes as doubles
from co2routes.sources.pipeline import compare
from co2routes.sources.scenario import demo
from co2routes.thermo import co2
from co2routes.tui.compute import breakthrough_points, demand_sweep, outcome, saturation_curve
from co2routes.tui.session import open_demo


def test_sweep_point_equals_compare_at_that_size():
    scenario = demo()
    sweep = demand_sweep(scenario, doubles(), factors=(0.5, 2.0))
    for i, size in enumerate(sweep.co2_kg):
        rows = compare(dataclasses.replace(scenario, co2_kg=size), doubles()).rows
        for row in rows:
            assert sweep.cost_per_kg[row.result.route_id][i] == row.cost_per_kg


def test_sweep_stops_when_told():
    assert demand_sweep(demo(), doubles(), proceed=lambda: False) is None


def test_saturation_marks_lie_on_the_line():
    scenario = demo("science-fair")
    curve = saturation_curve(scenario)
    marks = {label: (t, p) for label, t, p in curve.marks}
    # 0 degC condensing: 34.85 bar (NIST WebBook CO2 saturation at 273.15 K: 3.4851 MPa, value from memory), 0.1 %
    t, p = marks["condensing"]
    assert abs(t - 273.15) < 1e-9 and abs(p - 3.4851e6) / 3.4851e6 < 1e-3
    # 20 degC storage: 57.29 bar (NIST WebBook CO2 saturation at 293.15 K: 5.7291 MPa, value from memory), 0.1 %
    t, p = marks["storage"]
    assert abs(p - 5.7291e6) / 5.7291e6 < 1e-3
    assert "dry ice, 1 atm" in marks
    assert curve.pressures_pa == tuple(sorted(curve.pressures_pa))  # rises with temperature
    assert curve.pressures_pa[-1] < co2.CRITICAL_PRESSURE_PA


def test_breakthrough_curve_rises_from_outlet_to_inlet_water():
    opened = open_demo()
    result = outcome(opened.document, opened.source, opened.text)
    rows = [r for r in result.comparison.rows if r.result.dryer is not None]
    assert rows, "the demo's routes need a dryer"
    hours, ppmv, _ = breakthrough_points(rows[0].result, result.scenario)
    bed = rows[0].result.dryer
    assert hours[0] == 0.0 and list(hours) == sorted(hours)
    span = bed.inlet_water_ppmv - bed.outlet_ppmv
    # the curve starts at the bed's outlet water and ends at the inlet's (co2routes.thermo.dryer), 1 % of span
    assert abs(ppmv[0] - bed.outlet_ppmv) < 0.01 * span
    assert abs(ppmv[-1] - bed.inlet_water_ppmv) / bed.inlet_water_ppmv < 0.01
    no_dryer = [r for r in result.comparison.rows if r.result.dryer is None]
    for row in no_dryer:
        assert breakthrough_points(row.result, result.scenario) is None

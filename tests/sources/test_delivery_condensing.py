"""A gas that carries air, condensed for liquid or dry ice (co2routes.sources.delivery).

Checks: the condenser runs at the gas's bubble pressure (co2routes.thermo.condensing, itself
checked against GERG-2008 in tests/thermo/test_condensing.py); the compression's energy balance
closes on Span & Wagner (1996) enthalpies through CoolProp (first law, W - Q = h_out - h_in); a gas
too lean to condense is listed after the routes that can make the product.
"""

from __future__ import annotations

import pytest

CP = pytest.importorskip("CoolProp.CoolProp")

from co2routes.sources.base import Site  # noqa: E402
from co2routes.sources.choice import demand_break  # noqa: E402
from co2routes.sources.delivery import plan_delivery  # noqa: E402
from co2routes.sources.pipeline import compare  # noqa: E402
from co2routes.sources.scenario import DeliveryPlan, demo  # noqa: E402
from co2routes.thermo.condensing import bubble_point  # noqa: E402
from co2routes.thermo.errors import InputError  # noqa: E402
from co2routes.thermo.liquefaction import liquefy  # noqa: E402

PLAN = DeliveryPlan(condensing_temperature_k=273.15, stages=3, efficiency=0.65)
SITE = Site(temperature_k=293.15, pressure_pa=101325.0)


def _deliver(fraction: float):
    return plan_delivery(1.0, 1.0, None, "liquid", "raw-gas", PLAN, SITE, fraction)


def test_pure_gas_condenses_at_the_saturation_pressure():
    d = _deliver(1.0)
    assert d.liquefaction.condensing_pressure_pa == pytest.approx(CP.PropsSI("P", "T", 273.15, "Q", 0, "CO2"))
    assert d.cannot_condense is None


def test_gas_with_air_condenses_at_its_bubble_pressure():
    pure, mixed = _deliver(1.0), _deliver(0.98)
    p = bubble_point(0.98, 273.15).pressure_pa
    assert mixed.liquefaction.condensing_pressure_pa == pytest.approx(p)
    assert p > 1.2 * pure.liquefaction.condensing_pressure_pa  # about 45 bar against 34.9
    assert mixed.liquefaction.work_j_per_kg > pure.liquefaction.work_j_per_kg
    assert any("bubble pressure" in n for n in mixed.notes) and mixed.cannot_condense is None


def test_subcooled_condenser_closes_the_energy_balance():
    """First law over the whole machine: W - Q = h(P_cond, T_cond) - h(P_in, T_in)."""
    p = bubble_point(0.98, 273.15).pressure_pa
    r = liquefy(101325.0, 293.15, 273.15, stages=3, efficiency=0.65, condensing_pressure_pa=p)
    h_in = CP.PropsSI("H", "P", 101325.0, "T", 293.15, "CO2")
    h_out = CP.PropsSI("H", "P", p, "T", 273.15, "CO2")
    assert r.work_j_per_kg - r.heat_rejected_j_per_kg == pytest.approx(h_out - h_in, rel=1e-6)
    assert r.stages[-1].cooler == "condenser" and r.stages[-1].cooled_temperature_k == 273.15


def test_condensing_pressure_below_saturation_is_refused():
    with pytest.raises(InputError, match="condensing pressure"):
        liquefy(101325.0, 293.15, 273.15, condensing_pressure_pa=30e5)


def test_gas_too_lean_breaks_the_demand():
    d = _deliver(0.0077)
    assert d.cannot_condense.startswith("too lean to condense")
    assert any("too lean" in w for w in d.warnings)

    class Planned:
        delivery = d
        schedule = None

    assert demand_break(Planned())[0].startswith("demand not met (gas too lean to condense")


def test_stripped_air_gas_is_listed_after_the_routes_that_make_dry_ice():
    """The invented science-fair demo: gas stripped from water is under 1 % CO2 once dry, and
    cannot be made into dry ice; in the gas demo the same route is ranked (no condensing)."""
    rows = compare(demo("science-fair")).rows
    lean = next(r for r in rows if r.result.route_id == "water-absorption")
    assert lean.status == "over limit" and "too lean to condense" in lean.breaks[0]
    assert rows.index(lean) > max(rows.index(r) for r in rows if r.status == "ranked")
    gas = next(r for r in compare(demo()).rows if r.result.route_id == "water-absorption")
    assert gas.status == "ranked"

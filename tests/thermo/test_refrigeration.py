"""The vapour-compression cycle of co2routes.thermo.refrigeration against CoolProp state points
worked by hand here (Moran & Shapiro 2006, *Fundamentals of Engineering Thermodynamics*, sec.
10.2: h2 = h1 + (h2s - h1)/eta, h4 = h3) and the Carnot bound (second law: 0 < COP < Carnot);
the CO2 condenser duty against CoolProp's Span & Wagner states by hand.
"""

from __future__ import annotations

import CoolProp.CoolProp as CP
import pytest
from hypothesis import given, settings, strategies as st

from co2routes.thermo.errors import InputError
from co2routes.thermo.refrigeration import co2_refrigeration_duty, vapour_compression


# -----------------------------------------------------------------------------

def test_refrigeration_cycle_against_coolprop_state_points_by_hand():
    c = vapour_compression(268.15, 293.15, "R134a", evaporator_approach_k=5.0, condenser_approach_k=10.0,
                           efficiency=0.7)
    t_e, t_c = 263.15, 303.15
    h1 = CP.PropsSI("H", "T", t_e, "Q", 1, "R134a")                 # saturated vapour out of the evaporator
    s1 = CP.PropsSI("S", "T", t_e, "Q", 1, "R134a")
    p_c = CP.PropsSI("P", "T", t_c, "Q", 0, "R134a")
    h2 = h1 + (CP.PropsSI("H", "P", p_c, "S", s1, "R134a") - h1) / 0.7
    h4 = CP.PropsSI("H", "T", t_c, "Q", 0, "R134a")                 # throttled saturated liquid
    # CoolProp states by hand (Moran & Shapiro 2006 sec. 10.2), 1e-9
    assert c.cop == pytest.approx((h1 - h4) / (h2 - h1), rel=1e-9)
    assert c.carnot_cop == pytest.approx(t_e / (t_c - t_e), rel=1e-12)


@given(st.floats(min_value=250.0, max_value=290.0), st.floats(min_value=0.0, max_value=15.0),
       st.floats(min_value=0.4, max_value=1.0))
@settings(max_examples=25)
def test_refrigeration_cop_between_zero_and_carnot(cold, lift, efficiency):
    c = vapour_compression(cold, cold + lift, "R134a", efficiency=efficiency)
    assert 0.0 < c.cop < c.carnot_cop                                # second law


def test_unknown_refrigerant_names_the_key():
    with pytest.raises(InputError) as caught:
        vapour_compression(268.15, 293.15, "R-nothing")
    assert caught.value.field == "plant.refrigerant"


def test_co2_duty_is_site_gas_to_saturated_liquid():
    p = CP.PropsSI("P", "T", 268.15, "Q", 0, "CO2")
    # Span & Wagner through CoolProp by hand: gas at the site's 20 degC to liquid at -5 degC, 1e-12
    by_hand = CP.PropsSI("H", "P", p, "T", 293.15, "CO2") - CP.PropsSI("H", "T", 268.15, "Q", 0, "CO2")
    assert co2_refrigeration_duty(268.15, 293.15) == pytest.approx(by_hand, rel=1e-12)
    assert co2_refrigeration_duty(295.0, 293.15) == 0.0     # at or above the site: no chiller

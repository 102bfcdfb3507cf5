"""Dry ice: liquid-side against vapour-side draw, storage loss, raw CO2 per kg of dry ice.

Sources used below:
* NIST Chemistry WebBook saturation table for CO2 (IIR reference) as tabulated by Ohio University
  ("Thermodynamic Properties of R744", data from the NIST WebBook, accessed March 2007):
  -20 degC h_f 154.45, h_g 436.89 kJ/kg; 0 degC h_f 200.00, h_g 430.89 kJ/kg.
* Giauque & Egan (1937), J. Chem. Phys. 5, 45: enthalpy of sublimation 25.23 kJ/mol at 194.67 K
  (573.3 kJ/kg with 44.0095 g/mol).
* Mass balance (raw CO2 per kg of dry ice), worked by hand.
"""

from __future__ import annotations

import pytest

from co2routes.thermo import flash
from co2routes.thermo.dryice import draw_yield, raw_per_dry_ice, storage_loss
from co2routes.thermo.errors import InputError

DH_SUB = 25.23e3 / 0.0440095  # J/kg, Giauque & Egan 1937


@pytest.mark.parametrize("t_k, h_f, h_g", [(273.15, 200.00e3, 430.89e3), (253.15, 154.45e3, 436.89e3)])
def test_liquid_draw_follows_nist_liquid_enthalpy(t_k, h_f, h_g):
    # x = (h_v(194.7 K, 1 atm) - h_f) / Delta H_sub with the NIST h_f; tolerance 0.002 (NIST table
    # rounding 0.01 kJ/kg plus the 0.1 % between 573.3 and 25.23/44.0095).
    h_v = flash.vapor_enthalpy_at_sublimation_point()
    r = draw_yield(t_k, "liquid", 10.0)
    assert r.solid_fraction == pytest.approx((h_v - h_f) / DH_SUB, abs=2e-3)
    assert r.solid_mass_kg + r.gas_mass_kg == pytest.approx(10.0, rel=1e-12)  # mass balance
    # Same answer as the flash module it reuses.
    assert r.solid_fraction == flash.flash_at_temperature(t_k).solid_fraction
    # NIST h_g at this temperature is above the 1 atm vapour enthalpy: a vapour draw makes none.
    assert h_g > h_v
    assert draw_yield(t_k, "vapor", 10.0).solid_mass_kg == 0.0


def test_vapour_draw_makes_almost_no_snow_even_warm():
    # At 20 and 25 degC the vapour draw gives a few per cent against 26-29 % from the liquid side;
    # the difference is h_fg / Delta H_sub (energy balance), exact to rounding.
    for t in (293.15, 298.15):
        liq, vap = draw_yield(t, "liquid"), draw_yield(t, "vapor")
        assert vap.solid_fraction < 0.06 and liq.solid_fraction > 0.25
        from co2routes.thermo.co2 import saturation_at_temperature

        h_fg = saturation_at_temperature(t).enthalpy_of_vaporization_j_kg
        assert liq.solid_fraction - vap.solid_fraction == pytest.approx(
            h_fg / flash.SUBLIMATION_ENTHALPY_J_KG, rel=1e-9)
        assert "little or no snow" in vap.note


def test_storage_loss_by_hand():
    # U A (T_amb - T_s) / Delta H_sub with T_s = -78.5 degC = 194.65 K (common figure) and 573.3
    # kJ/kg: 0.5 W/(m2 K) x 1.2 m2 x (293.15 - 194.65) K = 59.1 W -> 8.91 kg/day. The module uses
    # 194.686 K (Span & Wagner 1996); tolerance 0.1 %.
    r = storage_loss(1.2, 0.5, 293.15, mass_kg=20.0, hold_time_s=86400.0)
    q = 0.5 * 1.2 * (293.15 - 194.65)
    assert r.heat_leak_w == pytest.approx(q, rel=1e-3)
    assert r.loss_kg_per_day == pytest.approx(q / 573.3e3 * 86400.0, rel=1e-3)
    assert r.time_to_empty_s == pytest.approx(20.0 / r.loss_rate_kg_s, rel=1e-12)
    assert r.remaining_kg == pytest.approx(20.0 - r.loss_kg_per_day, rel=1e-9)
    gone = storage_loss(1.2, 0.5, 293.15, mass_kg=1.0, hold_time_s=86400.0)
    assert gone.remaining_kg == 0.0  # never negative


def test_raw_co2_per_kg_dry_ice_by_hand():
    # Mass balance: 1 / (0.3 x 0.95 x 0.9) = 3.899 kg raw per kg delivered; with 300 kJ/kg of
    # liquefaction work, 300e3 x 3.899 / 3.6e6 = 0.3249 kWh per kg of dry ice.
    r = raw_per_dry_ice(0.3, transfer_loss_fraction=0.05, storage_loss_fraction=0.10,
                        liquefaction_work_j_per_kg=300e3)
    assert r.kg_raw_per_kg == pytest.approx(1 / (0.3 * 0.95 * 0.9), rel=1e-12)
    assert r.work_kwh_per_kg == pytest.approx(300e3 * r.kg_raw_per_kg / 3.6e6, rel=1e-12)


@pytest.mark.parametrize("call", [
    lambda: draw_yield(305.0, "liquid"),                 # above critical: no liquid
    lambda: draw_yield(273.15, "top"),                   # unknown draw
    lambda: storage_loss(1.0, 0.5, 190.0),               # ambient colder than dry ice
    lambda: storage_loss(0.0, 0.5, 293.15),
    lambda: raw_per_dry_ice(0.0),                        # vapour draw: no dry ice
    lambda: raw_per_dry_ice(0.3, transfer_loss_fraction=1.0),
])
def test_bad_input_is_refused(call):
    with pytest.raises(InputError):
        call()

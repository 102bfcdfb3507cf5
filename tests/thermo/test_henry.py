"""Henry's law for CO2 in water against published solubilities."""

import math

import pytest

from co2routes.thermo.errors import InputError
from co2routes.thermo.henry import dissolved_co2_kg_m3, henry_constant


def _carroll_hcp(temperature_k: float) -> float:
    """Hcp [mol/(m3 Pa)] from the mole-fraction Henry constant of Carroll, Slupsky & Mather (1991),
    J. Phys. Chem. Ref. Data 20, 1201, abstract: ln(H21/MPa) = -6.8346 + 1.2817e4/T
    - 3.7668e6/T^2 + 2.997e8/T^3 (273-433 K); dilute: c = x rho_w / M_w with IAPWS-95 water."""
    from co2routes.thermo._lazy import coolprop

    t = temperature_k
    h_pa = math.exp(-6.8346 + 1.2817e4 / t - 3.7668e6 / t**2 + 2.997e8 / t**3) * 1e6
    rho_w = coolprop().PropsSI("D", "T", t, "Q", 0, "Water")
    return rho_w / 0.018015268 / h_pa


def test_solubility_at_25_c_and_1_atm_matches_shedlovsky_macinnes():
    # Shedlovsky & MacInnes (1935) J. Am. Chem. Soc. 57, 1705, as compiled in the IUPAC-NIST
    # Solubility Database (NIST SRD 106): K = 0.03372 mol/(dm3 atm) at 298.15 K -> 1.484 g/L.
    published = 0.03372 * 44.0095  # g/L under 1 atm of CO2
    assert dissolved_co2_kg_m3(298.15, 101325.0) == pytest.approx(published, rel=0.02)  # 2 %


def test_solubility_at_25_c_in_the_handbook_range():
    # CRC Handbook / Carroll et al. (1991): about 1.45-1.5 g CO2 per L of water at 25 degC, 1 atm.
    assert 1.45 <= dissolved_co2_kg_m3(298.15, 101325.0) <= 1.50


@pytest.mark.parametrize("t_c, tol", [(10.0, 0.06), (20.0, 0.05), (25.0, 0.05), (30.0, 0.05), (40.0, 0.07)])
def test_against_carroll_correlation(t_c, tol):
    # Carroll, Slupsky & Mather (1991) correlation; the constant-enthalpy form is 3-6 % low here.
    t = t_c + 273.15
    assert henry_constant(t) == pytest.approx(_carroll_hcp(t), rel=tol)


def test_colder_water_holds_more():
    # Sander (2015): d ln H / d(1/T) > 0, so solubility falls as water warms.
    assert henry_constant(283.15) > henry_constant(298.15) > henry_constant(313.15)


def test_outside_range_is_refused():
    with pytest.raises(InputError):
        henry_constant(363.15)
    with pytest.raises(InputError):
        dissolved_co2_kg_m3(298.15, -5.0)

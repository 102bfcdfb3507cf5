"""Heats of acid dilution against a second published compilation and NBS end points."""

from __future__ import annotations

import pytest
from chemicals.elements import molecular_weight, nested_formula_parser
from chemicals.reaction import Hfg, Hfl
from hypothesis import given
from hypothesis import strategies as st

from _refdata import crc_ion
from co2routes.thermo import dilution
from co2routes.thermo.errors import InputError

# Koretsky (2013), Engineering and Chemical Thermodynamics 2nd ed., Table 6.1: integral heat of
# solution of HCl(g) in n H2O at 25 degC, kJ/mol (read, as transcribed in a public data file).
KORETSKY_HCL = {3: -56.852, 4: -61.204, 5: -64.049, 10: -69.488, 20: -71.777, 50: -73.739,
                100: -73.848}
KORETSKY_HCL_INF = -75.189


@pytest.mark.parametrize("n", sorted(KORETSKY_HCL))
def test_hcl_table_against_koretsky(n):
    # Parker (1965) table here against Koretsky's compilation: the heat from n to infinite
    # dilution agrees within 0.5 kJ/mol (the compilations use different NBS editions).
    heat_off = KORETSKY_HCL[n] - KORETSKY_HCL_INF
    assert dilution.heat_to_infinite_dilution("HCl", n) / 1000 == pytest.approx(heat_off, abs=0.5)
    assert dilution.solution_enthalpy("HCl", n) / 1000 == pytest.approx(KORETSKY_HCL[n], abs=0.8)


def test_hcl_infinite_dilution_end_point():
    # Gunn and Green (1961): HCl(g) -> infinite dilution -17.88 kcal/mol = -74.81 kJ/mol (read);
    # CRC ion Cl- with ATcT HCl(g) through chemicals.
    inf = dilution.solution_enthalpy("HCl", 1e9) / 1000
    assert inf == pytest.approx(-17.88 * 4.184, abs=0.1)
    assert inf == pytest.approx((crc_ion("Cl-")["Hf"] - Hfg("7647-01-0")) / 1000, abs=0.2)


def test_h2so4_infinite_dilution_end_point():
    # CRC ion SO4 2- (-909.3) less liquid H2SO4 (chemicals -814.0): -95.3 kJ/mol, within 0.2.
    ref = (crc_ion("SO4-2")["Hf"] - Hfl("7664-93-9")) / 1000
    assert dilution.solution_enthalpy("H2SO4", 10.0) / 1000 == pytest.approx(-70.04, abs=1e-6)
    assert (dilution.solution_enthalpy("H2SO4", 0.0)
            - dilution.heat_to_infinite_dilution("H2SO4", 0.0)) / 1000 == pytest.approx(ref, abs=0.2)


def test_commercial_hydrochloric_acid():
    # 31 % w/w acid is HCl . 4.5 H2O (docs/references.md). Koretsky's table interpolated at n = 4.5
    # gives 12.6 kJ/mol to infinite dilution; 0.6 kJ/mol tolerance.
    d = dilution.hcl_dilution_enthalpy(0.31)
    assert d.n_initial == pytest.approx(4.5, abs=0.01)
    koretsky_45 = 0.5 * (KORETSKY_HCL[4] + KORETSKY_HCL[5])
    assert d.delta_h_j_per_mol_acid / 1000 == pytest.approx(
        -(koretsky_45 - KORETSKY_HCL_INF), abs=0.6)
    assert d.delta_h_j_per_kg_acid == pytest.approx(d.delta_h_j_per_mol_acid / 0.036458, rel=1e-3)
    assert d.warnings == ()


def test_sulfuric_acid_from_concentrate():
    # Koretsky Table 6.1: dilution of H2SO4 . 1 H2O to H2SO4 . 10 H2O gives off
    # 70.04 - 31.08 = 38.96 kJ/mol (same table, exact at its rows).
    w1 = dilution.mass_fraction_from_ratio("H2SO4", 1.0)
    w10 = dilution.mass_fraction_from_ratio("H2SO4", 10.0)
    d = dilution.h2so4_dilution_enthalpy(w1, w10)
    assert d.delta_h_j_per_mol_acid / 1000 == pytest.approx(-38.964, abs=1e-6)
    to_inf = dilution.h2so4_dilution_enthalpy(0.96)
    assert to_inf.warnings and to_inf.delta_h_j_per_mol_acid < -80e3


def test_water_ratio_against_chemicals_molar_masses():
    # n = (1 - w)/w * M_HCl / M_H2O with chemicals' IUPAC weights; 0.01 % tolerance.
    m_hcl = molecular_weight(nested_formula_parser("HCl"))
    m_h2o = molecular_weight(nested_formula_parser("H2O"))
    assert dilution.water_ratio("HCl", 0.2) == pytest.approx(0.8 / 0.2 * m_hcl / m_h2o, rel=1e-4)


@pytest.mark.parametrize("call", [
    lambda: dilution.hcl_dilution_enthalpy(0.75),            # beyond n = 1 (66.9 %)
    lambda: dilution.h2so4_dilution_enthalpy(0.5, 0.01),     # final beyond n = 100 (5.2 %)
    lambda: dilution.hcl_dilution_enthalpy(0.2, 0.3),        # "dilution" to a stronger acid
    lambda: dilution.dilution_enthalpy("HNO3", 0.5),         # acid without a table
    lambda: dilution.hcl_dilution_enthalpy(0.0),
])
def test_out_of_range_is_refused(call):
    with pytest.raises(InputError):
        call()


def test_fuming_strength_warns():
    assert dilution.hcl_dilution_enthalpy(0.40).warnings


@given(st.floats(0.02, 0.40), st.floats(0.05, 0.95), st.floats(0.05, 0.95))
def test_dilution_in_steps_adds_up(w1, f2, f3):
    # Enthalpy is a state function: w1 -> w2 -> w3 equals w1 -> w3 (exact for a table of
    # heats to infinite dilution).
    w2 = w1 * f2
    w3 = w2 * f3
    a = dilution.hcl_dilution_enthalpy(w1, w2).delta_h_j_per_mol_acid
    b = dilution.hcl_dilution_enthalpy(w2, w3).delta_h_j_per_mol_acid
    c = dilution.hcl_dilution_enthalpy(w1, w3).delta_h_j_per_mol_acid
    assert a + b == pytest.approx(c, rel=1e-9, abs=1e-6)
    assert a <= 0.0 and b <= 0.0

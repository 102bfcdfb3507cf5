"""Acid solution densities at 20 degC against the Laliberte (2009) model and handbook rows."""

from __future__ import annotations

import pytest

from _refdata import laliberte_density
from co2routes.thermo import solutions
from co2routes.thermo.errors import InputError

# (table key, Laliberte name, strongest w where the model applies, tolerance kg/m3)
# Laliberte (2009) parameter ranges: HCl to w = 0.376, H2SO4 to 0.782, acetic acid to 1.
CASES = [
    ("HCl", "Hydrochloric Acid", 0.36, 1.0),
    ("H2SO4", "Sulfuric Acid", 0.78, 2.5),
    ("CH3COOH", "Acetic Acid", 1.0, 3.0),
]


@pytest.mark.parametrize("key, lal_name, w_max, tol", CASES)
def test_table_rows_against_laliberte(key, lal_name, w_max, tol):
    # Laliberte, M. (2009) J. Chem. Eng. Data 54, 1725, parameters from the chemicals package;
    # tolerance per solute as in CASES (the model's own fit error is of this order).
    for row in solutions.table(key):
        if 0.0 < row.mass_fraction <= w_max:
            assert row.density_kg_m3 == pytest.approx(
                laliberte_density(lal_name, row.mass_fraction), abs=tol), row


@pytest.mark.parametrize("key, lal_name, w", [
    ("HCl", "Hydrochloric Acid", 0.31), ("HCl", "Hydrochloric Acid", 0.05),
    ("H2SO4", "Sulfuric Acid", 0.37), ("CH3COOH", "Acetic Acid", 0.075),
])
def test_interpolated_points_against_laliberte(key, lal_name, w):
    # Between rows, linear interpolation stays within 1.5 kg/m3 of the model.
    assert solutions.solution_density(key, w) == pytest.approx(laliberte_density(lal_name, w),
                                                               abs=1.5)


def test_hcl_rows_from_ict():
    # International Critical Tables via Perry's (docs/references.md, read): 20 degC, g/cm3.
    for w, rho in [(0.10, 1.048), (0.20, 1.098), (0.30, 1.149), (0.32, 1.159), (0.36, 1.179),
                   (0.38, 1.189)]:
        assert solutions.hcl_density(w) / 1000 == pytest.approx(rho, abs=0.0006)


def test_citric_acid_rows():
    # CRC (docs/references.md, read): 10 % 1.0402, 30 % 1.1346 g/cm3 at 20 degC.
    assert solutions.solution_density("citric acid", 0.10) == pytest.approx(1040.2, abs=0.05)
    assert solutions.solution_density("C6H8O7", 0.30) == pytest.approx(1134.6, abs=0.05)


def test_water_row_against_iapws95():
    # IAPWS-95 through CoolProp: liquid water at 20 degC, 1 atm; 0.02 kg/m3.
    from co2routes.thermo._lazy import coolprop

    rho = coolprop().PropsSI("D", "T", 293.15, "P", 101325, "Water")
    assert solutions.solution_density("HCl", 0.0) == pytest.approx(rho, abs=0.02)


@pytest.mark.parametrize("solute, w", [("HCl", 0.45), ("C6H8O7", 0.5), ("H2SO4", 1.2),
                                       ("nitric acid", 0.1), ("HCl", -0.1)])
def test_out_of_table_is_refused(solute, w):
    with pytest.raises(InputError):
        solutions.solution_density(solute, w)


def test_acid_volume():
    # 1 kg HCl as 32 % acid: 1 / (0.32 * 1159.4 kg/m3) = 2.695 L.
    assert solutions.acid_volume("HCl", 0.32, 1.0) == pytest.approx(1 / (0.32 * 1159.4), rel=1e-9)

"""Ergun, Wilke and the constant-pattern front against textbooks and reference libraries."""

from __future__ import annotations

import math

import pytest
from hypothesis import given
from hypothesis import strategies as st

from co2routes.thermo.errors import InputError
from co2routes.thermo.packed_bed import (constant_pattern_shape, ergun_gradient, ergun_velocity, mtz_length,
                               wilke_viscosity)

LB, FT, LBF, INCH = 0.45359237, 0.3048, 4.4482216152605, 0.0254


def test_ergun_against_fluids_docstring():
    # fluids.packed_bed.Ergun(dp=8e-4, voidage=0.4, vs=1e-3, rho=1000, mu=1e-3) = 1338.867 Pa/m
    assert ergun_gradient(8e-4, 0.4, 1e-3, 1000.0, 1e-3) == pytest.approx(1338.867, abs=1e-3)


@given(st.floats(1e-4, 1e-2), st.floats(0.3, 0.6), st.floats(1e-4, 2.0), st.floats(0.1, 100.0),
       st.floats(5e-6, 5e-5))
def test_ergun_matches_fluids_everywhere(dp, eps, v, rho, mu):
    from fluids.packed_bed import Ergun

    # fluids (Bell) implements the same Ergun (1952) equation: agreement to 1e-9 relative
    assert ergun_gradient(dp, eps, v, rho, mu) == pytest.approx(
        Ergun(dp=dp, voidage=eps, vs=v, rho=rho, mu=mu), rel=1e-9)
    assert ergun_velocity(ergun_gradient(dp, eps, v, rho, mu), dp, eps, rho, mu) == pytest.approx(v, rel=1e-9)


def test_ergun_fogler_example_4_4():
    # Fogler, Elements of Chemical Reaction Engineering, 4th ed. (2006), Example 4-4: gas at
    # 104.4 lb/h through 1.5-in schedule-40 pipe (0.01414 ft2) packed with 1/4-in particles,
    # porosity 0.45, rho0 = 0.413 lb/ft3, mu = 0.0673 lb/(ft h); beta0 = 164.1 lbf/ft3
    # (= 0.0775 atm/ft, 25.8 kPa/m). Tolerance 0.5 % (the book rounds).
    g = 104.4 * LB / 3600.0 / (0.01414 * FT**2)          # kg/(m2 s)
    rho = 0.413 * LB / FT**3
    mu = 0.0673 * LB / FT / 3600.0
    grad = ergun_gradient(0.25 * INCH, 0.45, g / rho, rho, mu)
    assert grad == pytest.approx(164.1 * LBF / FT**3, rel=0.005)
    assert grad / 101325.0 * FT == pytest.approx(0.0775, rel=0.005)


def test_wilke_against_chemicals():
    from chemicals.viscosity import Wilke

    ys, mus, ms = [0.12, 0.85, 0.03], [1.49e-5, 1.78e-5, 2.06e-5], [44.0095, 28.0134, 31.9988]
    # chemicals.viscosity.Wilke implements Wilke (1950): agreement to 1e-9 relative
    assert wilke_viscosity(ys, mus, ms) == pytest.approx(Wilke(ys, mus, ms), rel=1e-9)


def test_mtz_length_published_points():
    # GPSA Engineering Data Book (2004) sec. 20 (from memory): Z = 1.70 ft for 1/8-in and 0.85 ft
    # for 1/16-in sieve at 35 ft/min; (V/35)^0.3 elsewhere. Exact by construction of the formula.
    v35 = 35.0 * FT / 60.0
    assert mtz_length(v35, 0.125 * INCH) == pytest.approx(1.70 * FT, rel=1e-9)
    assert mtz_length(v35, 0.0625 * INCH) == pytest.approx(0.85 * FT, rel=1e-9)
    assert mtz_length(2 * v35, 0.125 * INCH) == pytest.approx(1.70 * FT * 2**0.3, rel=1e-9)


@pytest.mark.parametrize("r", [0.05, 0.3, 0.7])
def test_constant_pattern_langmuir_closed_form(r):
    # Constant separation factor r, solid-film LDF: k (t - t_s) = [r ln x - ln(1-x)]/(1-r) - 1
    # (Ruthven 1984 ch. 8; the form of Perry's 8th ed. Table 16-13, from memory). Tolerance 1e-3.
    xs, kt = constant_pattern_shape(lambda x: x / (r + (1.0 - r) * x))
    for x, value in zip(xs, kt):
        if 1e-6 < x < 1.0 - 1e-6:
            assert value == pytest.approx((r * math.log(x) - math.log(1.0 - x)) / (1.0 - r) - 1.0,
                                          abs=1e-3)


def test_constant_pattern_needs_a_favourable_isotherm():
    with pytest.raises(InputError):
        constant_pattern_shape(lambda x: x * x)

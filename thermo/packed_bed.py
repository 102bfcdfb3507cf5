"""Packed beds: pressure drop (Ergun), gas-mixture viscosity (Wilke) and a constant-pattern front.

SI floats throughout: lengths [m], velocities [m/s] (superficial, i.e. volume flow over the empty
vessel's cross-section), densities [kg/m3], viscosities [Pa s], pressure gradients [Pa/m].
"""

from __future__ import annotations

import math
from typing import Callable, Sequence

from co2routes.thermo.errors import InputError, require_fraction, require_positive


def ergun_gradient(particle_diameter_m: float, voidage: float, superficial_velocity_m_s: float,
                   density_kg_m3: float, viscosity_pa_s: float) -> float:
    """Pressure gradient [Pa/m] through a packed bed by the Ergun equation.

    dP/L = 150 mu (1 - e)^2 v / (e^3 d^2) + 1.75 rho (1 - e) v^2 / (e^3 d)

    Parameters
    ----------
    particle_diameter_m : float
        Particle diameter d [m] (for non-spheres, the equivalent-sphere diameter times sphericity).
    voidage : float
        Bed void fraction e [-], in (0, 1).
    superficial_velocity_m_s : float
        Superficial velocity v [m/s], 0 or more.
    density_kg_m3, viscosity_pa_s : float
        Fluid density rho [kg/m3] and dynamic viscosity mu [Pa s].

    Valid for randomly packed beds of particles much smaller than the vessel (d/D below about
    0.1), across laminar and turbulent particle Reynolds numbers.

    Source: Ergun, S. (1952) "Fluid flow through packed columns", Chem. Eng. Prog. 48, 89-94.
    The example in the docstring of ``fluids.packed_bed.Ergun`` (Bell, fluids library):

    >>> round(ergun_gradient(8e-4, 0.4, 1e-3, 1000.0, 1e-3), 3)
    1338.867
    """
    d = require_positive("particle diameter", particle_diameter_m)
    e = require_fraction("voidage", voidage)
    if e >= 1.0:
        raise InputError("voidage", "must be below 1", got=e)
    if superficial_velocity_m_s < 0.0:
        raise InputError("superficial velocity", "must be 0 or more", got=superficial_velocity_m_s)
    rho = require_positive("gas density", density_kg_m3)
    mu = require_positive("gas viscosity", viscosity_pa_s)
    v = superficial_velocity_m_s
    viscous = 150.0 * mu * (1.0 - e) ** 2 * v / (e**3 * d**2)
    inertial = 1.75 * rho * (1.0 - e) * v * v / (e**3 * d)
    return viscous + inertial


def ergun_velocity(gradient_pa_m: float, particle_diameter_m: float, voidage: float,
                   density_kg_m3: float, viscosity_pa_s: float) -> float:
    """Superficial velocity [m/s] that gives a pressure gradient: the Ergun equation inverted.

    a v^2 + b v - dP/L = 0 with a = 1.75 rho (1 - e)/(e^3 d), b = 150 mu (1 - e)^2/(e^3 d^2);
    v = (-b + sqrt(b^2 + 4 a dP/L)) / (2 a).

    Parameters
    ----------
    gradient_pa_m : float
        Allowed pressure gradient [Pa/m], above 0.
    particle_diameter_m, voidage, density_kg_m3, viscosity_pa_s : float
        As in :func:`ergun_gradient`.

    Source: Ergun (1952), solved as a quadratic in v.

    >>> round(ergun_velocity(1338.867, 8e-4, 0.4, 1000.0, 1e-3), 6)
    0.001
    """
    g = require_positive("pressure gradient", gradient_pa_m)
    d = require_positive("particle diameter", particle_diameter_m)
    e = require_fraction("voidage", voidage)
    a = 1.75 * require_positive("gas density", density_kg_m3) * (1.0 - e) / (e**3 * d)
    b = 150.0 * require_positive("gas viscosity", viscosity_pa_s) * (1.0 - e) ** 2 / (e**3 * d**2)
    return 2.0 * g / (b + math.sqrt(b * b + 4.0 * a * g))


def wilke_viscosity(mole_fractions: Sequence[float], viscosities_pa_s: Sequence[float],
                    molar_masses: Sequence[float]) -> float:
    """Viscosity [Pa s] of a low-pressure gas mixture by Wilke's mixing rule.

    mu = sum_i y_i mu_i / sum_j y_j phi_ij,
    phi_ij = [1 + (mu_i/mu_j)^(1/2) (M_j/M_i)^(1/4)]^2 / [8 (1 + M_i/M_j)]^(1/2)

    Parameters
    ----------
    mole_fractions : sequence of float
        Mole fractions y_i (normalised here).
    viscosities_pa_s : sequence of float
        Pure-component viscosities mu_i at the mixture's T and P [Pa s].
    molar_masses : sequence of float
        Molar masses M_i (any consistent unit).

    Valid for dilute gases (roughly below a few MPa and away from the critical point); within a
    few per cent for non-polar mixtures, less good with water vapour.

    Source: Wilke, C. R. (1950) "A viscosity equation for gas mixtures", J. Chem. Phys. 18, 517.

    >>> round(wilke_viscosity([1.0], [1.49e-5], [44.0095]), 10)
    1.49e-05
    """
    ys = [float(y) for y in mole_fractions]
    total = sum(ys)
    if not ys or total <= 0.0 or min(ys) < 0.0:
        raise InputError("composition", "mole fractions must be 0 or more and not all zero", got=ys)
    ys = [y / total for y in ys]
    mus, ms = list(viscosities_pa_s), list(molar_masses)
    result = 0.0
    for i, (yi, mui, mi) in enumerate(zip(ys, mus, ms)):
        if yi == 0.0:
            continue
        denom = 0.0
        for yj, muj, mj in zip(ys, mus, ms):
            phi = (1.0 + (mui / muj) ** 0.5 * (mj / mi) ** 0.25) ** 2 / math.sqrt(8.0 * (1.0 + mi / mj))
            denom += yj * phi
        result += yi * mui / denom
    return result


def mtz_length(superficial_velocity_m_s: float, particle_diameter_m: float) -> float:
    """Mass-transfer-zone length [m] of a desiccant bed drying gas.

    L_MTZ = (v / 35)^0.3 Z,  v in ft/min, Z = 1.70 ft x (d / 3.175 mm)

    (Z = 1.70 ft for 1/8-in and 0.85 ft for 1/16-in molecular sieve; taken proportional to the
    particle diameter between and beyond those two.)

    Parameters
    ----------
    superficial_velocity_m_s : float
        Superficial gas velocity [m/s], above 0.
    particle_diameter_m : float
        Particle diameter [m].

    Valid for natural-gas dehydrators, about 10-60 ft/min (0.05-0.3 m/s), 1/16-1/8 in sieve;
    slower beds are an extrapolation (the correlation's zone shrinks slowly with velocity, so it
    errs long, i.e. safe).

    Source: GPSA Engineering Data Book, 12th ed. (2004), sec. 20, molecular-sieve MTZ length
    (from memory).

    >>> round(mtz_length(35 * 0.3048 / 60, 0.003175) / 0.3048, 3)
    1.7
    """
    v_ft_min = require_positive("superficial velocity", superficial_velocity_m_s) / 0.3048 * 60.0
    z_ft = 1.70 * require_positive("particle diameter", particle_diameter_m) / 0.003175
    return (v_ft_min / 35.0) ** 0.3 * z_ft * 0.3048


def constant_pattern_shape(loading_ratio: Callable[[float], float],
                           points: int = 801) -> tuple[tuple[float, ...], tuple[float, ...]]:
    """Shape of a constant-pattern adsorption front with linear-driving-force uptake.

    On the front the solid loading follows the operating line, q/q0 = c/c0 = x, and the solid
    takes up water at the LDF rate dq/dt = k (q* - q). With f(x) = q*(x c0)/q0 this gives
    k dt = dx / (f(x) - x), so at a fixed point of the bed

        k (t(x) - t_s) = G(x) - integral_0^1 G dx,   G(x) = integral_{1/2}^{x} dx'/(f(x') - x')

    where t_s is the stoichiometric time (the front's mass centre: integral_0^1 t dx = t_s). The
    integral is taken on a logit grid, x = 1/(1 + e^-s), where the integrand x(1-x)/(f - x) stays
    finite at both ends for a favourable isotherm.

    Parameters
    ----------
    loading_ratio : callable
        f(x): equilibrium loading at concentration x c0 over that at c0, for 0 < x < 1; must
        exceed x there (a favourable isotherm).
    points : int
        Grid points, 50 or more.

    Returns ``(x, k_tau)``: outlet concentration ratios and k (t - t_s) [-] at each.

    Valid for a favourable isotherm, an isothermal bed, plug flow and a long enough bed for the
    pattern to form. For a constant-separation-factor (Langmuir) isotherm, f(x) = x/(r + (1-r)x),
    it reproduces the closed form k (t - t_s) = [r ln x - ln(1 - x)]/(1 - r) - 1.

    Source: Ruthven, D. M. (1984) Principles of Adsorption and Adsorption Processes, Wiley,
    ch. 8 (constant-pattern behaviour); LeVan, Carta & Yon, Perry's Chemical Engineers'
    Handbook, 8th ed. (2008), sec. 16, constant-pattern solutions (from memory).

    >>> x, kt = constant_pattern_shape(lambda x: x / (0.5 + 0.5 * x))
    >>> i = min(range(len(x)), key=lambda j: abs(x[j] - 0.5))
    >>> round(kt[i], 2), round((0.5 * math.log(0.5) - math.log(0.5)) / 0.5 - 1.0, 2)
    (-0.31, -0.31)
    """
    if points < 50:
        raise InputError("points", "must be 50 or more", got=points)
    s_max = 23.0
    s = [-s_max + 2.0 * s_max * i / (points - 1) for i in range(points)]
    xs = [1.0 / (1.0 + math.exp(-si)) for si in s]
    integrand = []
    for x in xs:
        gap = loading_ratio(x) - x
        if gap <= 0.0:
            raise InputError("isotherm", "must be favourable (q*(x c0)/q0 > x) for a constant pattern",
                             got=x)
        integrand.append(x * (1.0 - x) / gap)
    g = [0.0]
    for i in range(1, points):
        g.append(g[-1] + 0.5 * (integrand[i] + integrand[i - 1]) * (s[i] - s[i - 1]))
    mid = points // 2
    g = [v - g[mid] for v in g]
    # integral_0^1 G dx = integral G x(1-x) ds (trapezoid on the same grid).
    w = [x * (1.0 - x) for x in xs]
    mean = sum(0.5 * (g[i] * w[i] + g[i - 1] * w[i - 1]) * (s[i] - s[i - 1]) for i in range(1, points))
    return tuple(xs), tuple(v - mean for v in g)


def interpolate(x: float, xs: Sequence[float], ys: Sequence[float]) -> float:
    """Linear interpolation of ys(x) on increasing xs, held constant beyond the ends.

    >>> interpolate(1.5, [1.0, 2.0], [10.0, 20.0])
    15.0
    """
    if x <= xs[0]:
        return ys[0]
    if x >= xs[-1]:
        return ys[-1]
    lo, hi = 0, len(xs) - 1
    while hi - lo > 1:
        mid = (lo + hi) // 2
        if xs[mid] <= x:
            lo = mid
        else:
            hi = mid
    f = (x - xs[lo]) / (xs[hi] - xs[lo])
    return ys[lo] + f * (ys[hi] - ys[lo])

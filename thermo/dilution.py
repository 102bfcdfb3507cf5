"""Heat of diluting hydrochloric and sulfuric acid, from the published integral-heat tables.

A strong acid bought at 31 % w/w is far from the infinite dilution that the reaction data in
:mod:`co2routes.thermo.reaction` assume. Mixing it into water gives heat off: for hydrochloric acid about
13 kJ per mol HCl from 31 % to infinite dilution, for sulfuric acid about 70 kJ per mol from 98 % to 20 %.
This module turns strengths into n (mol water per mol acid) and reads the tables:

* HCl: heat given off on dilution from n to infinity, Parker (1965), NSRDS-NBS 2, as in the CRC
  Handbook table "Enthalpy of dilution of acids" (thermo/data/hcl_dilution_25c.csv), n = 1 to
  500,000.
* H2SO4: integral enthalpy of solution of the liquid in n water, Koretsky (2013), Table 6.1
  (thermo/data/h2so4_solution_25c.csv), n = 0 to 100; the step from n = 100 to infinite dilution
  is taken from the NBS 1982 formation enthalpies so that it matches the reaction data.

Between rows the tables are interpolated linearly in ln n (linear in n between 0 and 1 for
H2SO4). All values at 25 degC.

>>> d = hcl_dilution_enthalpy(0.31)
>>> round(d.n_initial, 2), round(d.delta_h_j_per_mol_acid / 1000, 1)
(4.5, -12.9)
"""

from __future__ import annotations

import bisect
import csv
import math
from dataclasses import dataclass
from functools import lru_cache
from pathlib import Path

from co2routes.thermo import species
from co2routes.thermo.errors import InputError

_DATA = Path(__file__).with_name("data")
#: Acids this module knows: name -> (species of the pure acid, species at infinite dilution).
ACIDS: dict[str, tuple[str, str]] = {
    "HCl": ("HCl(g)", "HCl(aq)"),
    "H2SO4": ("H2SO4(l)", "H2SO4(aq)"),
}
#: Above this strength hydrochloric acid fumes HCl gas at room temperature (common practice).
HCL_FUMING_FRACTION = 0.38


@dataclass(frozen=True, slots=True)
class DilutionHeat:
    """Enthalpy change of diluting one acid from one strength to another (25 degC)."""

    acid: str
    """``"HCl"`` or ``"H2SO4"``."""
    mass_fraction_initial: float
    """Strength before [kg acid / kg solution]."""
    mass_fraction_final: float | None
    """Strength after [kg/kg]; None for infinite dilution."""
    n_initial: float
    """mol water per mol acid before."""
    n_final: float | None
    """mol water per mol acid after; None for infinite dilution."""
    delta_h_j_per_mol_acid: float
    """Enthalpy change [J per mol of acid]; negative means heat is given off."""
    delta_h_j_per_kg_acid: float
    """The same per kilogram of pure acid (HCl or H2SO4) [J/kg]."""
    warnings: tuple[str, ...] = ()
    """Sentences about the range and reliability of the figure."""


def water_ratio(acid: str, mass_fraction: float) -> float:
    """mol water per mol acid for a solution of ``mass_fraction`` [kg/kg] acid.

    n = (1 - w) / w * M_acid / M_H2O.

    >>> round(water_ratio("HCl", 0.31), 3)
    4.504
    """
    pure, _ = _acid(acid)
    if not (0.0 < mass_fraction <= 1.0):
        raise InputError(f"{acid} strength", "must be a mass fraction in (0, 1]", got=mass_fraction)
    return (1.0 - mass_fraction) / mass_fraction * species.molar_mass(pure) / species.molar_mass(
        "H2O(l)"
    )


def mass_fraction_from_ratio(acid: str, n: float) -> float:
    """Mass fraction of acid [kg/kg] in a solution of n mol water per mol acid.

    >>> round(mass_fraction_from_ratio("H2SO4", 1.0), 4)
    0.8448
    """
    pure, _ = _acid(acid)
    m_acid = species.molar_mass(pure)
    return m_acid / (m_acid + n * species.molar_mass("H2O(l)"))


def heat_to_infinite_dilution(acid: str, n: float) -> float:
    """Heat given off [J per mol acid] when a solution of n water per acid is diluted without end.

    Q(n) = -dilH(n -> infinity) = dsolH(n) - dsolH(infinity), read from the tables named in the
    module docstring and interpolated linearly in ln n.

    Parameters
    ----------
    acid : str
        ``"HCl"`` (n = 1 to 500,000; beyond, Q falls as n**-0.5, the Debye-Hueckel limiting
        law) or ``"H2SO4"`` (n = 0 to 100).

    Sources: Parker (1965), NSRDS-NBS 2 (CRC table "Enthalpy of dilution of acids");
    Koretsky (2013) Table 6.1; NBS (Wagman et al. 1982) for the H2SO4 end point.

    >>> round(heat_to_infinite_dilution("HCl", 10.0) / 1000, 3)
    5.841
    >>> round(heat_to_infinite_dilution("H2SO4", 0.0) / 1000, 1)
    95.3
    """
    _acid(acid)
    if acid == "HCl":
        ns, qs = _table("hcl_dilution_25c.csv")
        if n < ns[0]:
            raise InputError("HCl strength", _strength_range("HCl", ns[0], None), got=f"n = {n:.3g}")
        if n > ns[-1]:
            return qs[-1] * math.sqrt(ns[-1] / n) * 1000.0
        return _interp_log(ns, qs, n) * 1000.0
    ns, hs = _table("h2so4_solution_25c.csv")
    if not (ns[0] <= n <= ns[-1]):
        raise InputError("H2SO4 strength", _strength_range("H2SO4", 0.0, ns[-1]), got=f"n = {n:.3g}")
    h_n = hs[0] + (hs[1] - hs[0]) * n if n < 1.0 else _interp_log(ns[1:], hs[1:], n)
    return (h_n - _solution_enthalpy_infinite("H2SO4") / 1000.0) * 1000.0


def solution_enthalpy(acid: str, n: float) -> float:
    """Integral enthalpy of solution [J per mol acid] of pure acid (HCl gas, H2SO4 liquid) in n water.

    dsolH(n) = dsolH(infinity) + Q(n), with dsolH(infinity) = dfH(acid, aq) - dfH(pure acid)
    from the NBS 1982 values (HCl: -74.85 kJ/mol; H2SO4: -95.28 kJ/mol) and Q from
    :func:`heat_to_infinite_dilution`.

    >>> round(solution_enthalpy("HCl", 10.0) / 1000, 2)
    -69.01
    """
    return _solution_enthalpy_infinite(acid) + heat_to_infinite_dilution(acid, n)


def dilution_enthalpy(acid: str, mass_fraction_initial: float,
                      mass_fraction_final: float | None = None) -> DilutionHeat:
    """Enthalpy change of diluting ``acid`` from w1 to w2 (None: to infinite dilution), 25 degC.

    dH = Q(n1) - Q(n2) taken negative: dH = Q(n2) - Q(n1) [J per mol acid], Q from
    :func:`heat_to_infinite_dilution`, n from :func:`water_ratio`. Negative dH: heat given off.

    Parameters
    ----------
    acid : str
        ``"HCl"`` or ``"H2SO4"``.
    mass_fraction_initial : float
        Strength before [kg/kg]: HCl up to 0.669 (n = 1; above 0.38 it fumes), H2SO4 up to 1.
    mass_fraction_final : float or None
        Strength after [kg/kg], below the initial one (H2SO4: at least 0.052, n = 100); None for
        infinite dilution.

    Sources: as :func:`heat_to_infinite_dilution`.

    >>> round(dilution_enthalpy("HCl", 0.31, 0.10).delta_h_j_per_mol_acid / 1000, 2)
    -9.35
    """
    pure, _ = _acid(acid)
    n1 = water_ratio(acid, mass_fraction_initial)
    warnings: list[str] = []
    if mass_fraction_final is None:
        n2 = None
        q2 = 0.0
        if acid == "H2SO4":
            warnings.append(
                "From about 5 % to infinite dilution the bisulfate ion dissociates; that last step "
                "uses the NBS 1982 formation enthalpies and adds some 18 kJ/mol."
            )
    else:
        if not (0.0 < mass_fraction_final < mass_fraction_initial):
            raise InputError(f"{acid} final strength",
                             "must be above zero and below the starting strength",
                             got=mass_fraction_final)
        n2 = water_ratio(acid, mass_fraction_final)
        q2 = heat_to_infinite_dilution(acid, n2)
    q1 = heat_to_infinite_dilution(acid, n1)
    if acid == "HCl" and mass_fraction_initial > HCL_FUMING_FRACTION:
        warnings.append("Hydrochloric acid above about 38 % gives off HCl gas at room temperature.")
    if acid == "H2SO4" and n1 < 1.0:
        warnings.append("Above 84.5 % H2SO4 the heat is interpolated between pure acid and "
                        "H2SO4.H2O; it is less certain there.")
    dh = q2 - q1
    return DilutionHeat(
        acid=acid,
        mass_fraction_initial=float(mass_fraction_initial),
        mass_fraction_final=None if mass_fraction_final is None else float(mass_fraction_final),
        n_initial=n1,
        n_final=n2,
        delta_h_j_per_mol_acid=dh,
        delta_h_j_per_kg_acid=dh / species.molar_mass(pure),
        warnings=tuple(warnings),
    )


def hcl_dilution_enthalpy(mass_fraction_initial: float,
                          mass_fraction_final: float | None = None) -> DilutionHeat:
    """:func:`dilution_enthalpy` for hydrochloric acid (Parker 1965 table).

    >>> round(hcl_dilution_enthalpy(0.36).delta_h_j_per_mol_acid / 1000, 1)
    -15.8
    """
    return dilution_enthalpy("HCl", mass_fraction_initial, mass_fraction_final)


def h2so4_dilution_enthalpy(mass_fraction_initial: float,
                            mass_fraction_final: float | None = None) -> DilutionHeat:
    """:func:`dilution_enthalpy` for sulfuric acid (Koretsky 2013 Table 6.1, NBS end point).

    >>> round(h2so4_dilution_enthalpy(0.98, 0.20).delta_h_j_per_mol_acid / 1000, 1)
    -71.2
    """
    return dilution_enthalpy("H2SO4", mass_fraction_initial, mass_fraction_final)


def _acid(acid: str) -> tuple[str, str]:
    if acid not in ACIDS:
        raise InputError("acid", f"must be one of {', '.join(ACIDS)}", got=acid)
    return ACIDS[acid]


def _solution_enthalpy_infinite(acid: str) -> float:
    """dfH(aq, infinite dilution) - dfH(pure acid) at 298.15 K [J/mol], from the species data."""
    pure, aq = _acid(acid)
    return species.enthalpy(aq, 298.15) - species.enthalpy(pure, 298.15)


def _strength_range(acid: str, n_min: float, n_max: float | None) -> str:
    w_max = mass_fraction_from_ratio(acid, n_min)
    text = f"strength must be at most {100 * w_max:.1f} % w/w"
    if n_max is not None:
        text += f" and at least {100 * mass_fraction_from_ratio(acid, n_max):.1f} % w/w"
        text += " (the table's range; use infinite dilution for weaker solutions)"
    return text


@lru_cache(maxsize=None)
def _table(filename: str) -> tuple[tuple[float, ...], tuple[float, ...]]:
    """Two numeric columns of a data file, comment lines (#) and the header skipped."""
    with open(_DATA / filename, newline="", encoding="utf-8") as f:
        rows = [r for r in csv.reader(line for line in f if not line.startswith("#"))]
    body = rows[1:]
    return tuple(float(r[0]) for r in body), tuple(float(r[1]) for r in body)


def _interp_log(xs: tuple[float, ...], ys: tuple[float, ...], x: float) -> float:
    """Linear interpolation of y in ln x (xs ascending, all > 0, x within them)."""
    i = bisect.bisect_left(xs, x)
    if i < len(xs) and xs[i] == x:
        return ys[i]
    i = min(max(i, 1), len(xs) - 1)
    x0, x1 = math.log(xs[i - 1]), math.log(xs[i])
    t = (math.log(x) - x0) / (x1 - x0)
    return ys[i - 1] + t * (ys[i] - ys[i - 1])

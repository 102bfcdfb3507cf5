"""Densities of the acid solutions a batch is measured out in, at 20 degC.

Table look-up in thermo/data/solution_density_20c.csv (CRC Handbook, "Concentrative properties of
aqueous solutions", 20 degC; hydrochloric acid 10-38 % also as the International Critical Tables
give it in Perry's), interpolated linearly in mass fraction between rows 1-10 points of per cent
apart. Each row's status (read in its source, or from memory) is in the file; the HCl, H2SO4 and
acetic-acid rows agree with the Laliberte (2009) model within 0.003 g/cm3 (tests).

>>> round(solution_density("HCl", 0.32))
1159
>>> round(acid_volume("HCl", 0.32, 1.0) * 1000, 3)   # litres of 32 % acid holding 1 kg HCl
2.695
"""

from __future__ import annotations

import bisect
import csv
from dataclasses import dataclass
from functools import lru_cache
from pathlib import Path

from co2routes.thermo.errors import InputError

DATA_FILE = Path(__file__).with_name("data") / "solution_density_20c.csv"
#: Solute names accepted, with the label used in messages.
SOLUTES: dict[str, str] = {
    "HCl": "hydrochloric acid",
    "H2SO4": "sulfuric acid",
    "CH3COOH": "acetic acid",
    "C6H8O7": "citric acid",
}
_ALIASES = {
    "hcl": "HCl", "hydrochloric acid": "HCl", "muriatic acid": "HCl", "hcl(aq)": "HCl",
    "h2so4": "H2SO4", "sulfuric acid": "H2SO4", "sulphuric acid": "H2SO4", "h2so4(aq)": "H2SO4",
    "ch3cooh": "CH3COOH", "acetic acid": "CH3COOH", "vinegar": "CH3COOH", "ch3cooh(aq)": "CH3COOH",
    "c6h8o7": "C6H8O7", "citric acid": "C6H8O7",
}
TEMPERATURE_K = 293.15


@dataclass(frozen=True, slots=True)
class DensityRow:
    """One row of the density table."""

    solute: str
    mass_fraction: float
    """kg solute / kg solution."""
    density_kg_m3: float
    """Solution density at 20 degC [kg/m3]."""
    status: str
    """Where the value comes from (read, or from memory)."""


def solution_density(solute: str, mass_fraction: float) -> float:
    """Density [kg/m3] at 20 degC and 1 atm of an aqueous solution of ``solute``.

    rho(w) by linear interpolation between the table rows bracketing w.

    Parameters
    ----------
    solute : str
        ``"HCl"``, ``"H2SO4"``, ``"CH3COOH"`` or ``"C6H8O7"`` (common names such as
        "hydrochloric acid" are accepted).
    mass_fraction : float
        kg solute per kg solution; within the table (HCl 0-0.40, H2SO4 0-1, acetic 0-1,
        citric 0-0.30).

    Raises
    ------
    InputError
        Unknown solute, or a strength outside the table.

    Source: CRC Handbook, "Concentrative properties of aqueous solutions" (20 degC); ICT via
    Perry's for HCl 10-38 %; pure water IAPWS-95.

    >>> solution_density("HCl", 0.10)
    1047.6
    >>> round(solution_density("sulfuric acid", 0.37), 1)
    1276.9
    """
    key = _solute(solute)
    ws, rhos = _columns(key)
    if not (ws[0] <= mass_fraction <= ws[-1]):
        raise InputError(
            f"{SOLUTES[key]} strength",
            f"must be {100 * ws[0]:g}-{100 * ws[-1]:g} % w/w (the range of the density table)",
            got=f"{100 * mass_fraction:.4g} %",
        )
    i = bisect.bisect_left(ws, mass_fraction)
    if ws[i] == mass_fraction:
        return rhos[i]
    t = (mass_fraction - ws[i - 1]) / (ws[i] - ws[i - 1])
    return rhos[i - 1] + t * (rhos[i] - rhos[i - 1])


def hcl_density(mass_fraction: float) -> float:
    """Density of hydrochloric acid [kg/m3] at 20 degC; :func:`solution_density` for HCl.

    >>> hcl_density(0.36)
    1179.1
    """
    return solution_density("HCl", mass_fraction)


def acid_volume(solute: str, mass_fraction: float, solute_mass: float) -> float:
    """Volume [m3] of solution at 20 degC that holds ``solute_mass`` [kg] of pure solute.

    V = m_solute / (w rho(w)).

    >>> round(acid_volume("CH3COOH", 0.05, 0.05) * 1000, 3)   # 1 kg of 5 % vinegar
    0.995
    """
    if not mass_fraction > 0.0:
        raise InputError(f"{SOLUTES[_solute(solute)]} strength", "must be greater than zero",
                         got=mass_fraction)
    return solute_mass / (mass_fraction * solution_density(solute, mass_fraction))


def table(solute: str) -> tuple[DensityRow, ...]:
    """The rows of the density table for one solute, weakest first.

    >>> table("C6H8O7")[1].status
    'read: CRC'
    """
    key = _solute(solute)
    return tuple(r for r in _rows() if r.solute == key)


def _solute(solute: str) -> str:
    text = " ".join(str(solute).split())
    if text in SOLUTES:
        return text
    key = _ALIASES.get(text.lower())
    if key is None:
        raise InputError("solute", f"must be one of {', '.join(SOLUTES)}", got=repr(text))
    return key


@lru_cache(maxsize=1)
def _rows() -> tuple[DensityRow, ...]:
    with open(DATA_FILE, newline="", encoding="utf-8") as f:
        reader = csv.DictReader(line for line in f if not line.startswith("#"))
        return tuple(
            DensityRow(r["solute"], float(r["mass_percent"]) / 100.0,
                       float(r["density_g_cm3"]) * 1000.0, r["status"])
            for r in reader
        )


@lru_cache(maxsize=None)
def _columns(key: str) -> tuple[tuple[float, ...], tuple[float, ...]]:
    rows = [r for r in _rows() if r.solute == key]
    return tuple(r.mass_fraction for r in rows), tuple(r.density_kg_m3 for r in rows)

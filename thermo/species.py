"""Species in the notation people write, with Cantera's NASA data and this project's own.

A name is a formula with a phase tag: ``NaHCO3(s)``, ``HCl(aq)``, ``CO2(g)``, ``H2O(l)``. The
gases come from Cantera's bundled ``nasa_gas.yaml`` (McBride, Zehe and Gordon 2002, NASA
TP-2002-211556), most solids and liquid water from ``nasa_condensed.yaml`` (same source), and the
species those files lack (baking soda, aqueous salts and acids at infinite dilution, sugars,
ethanol, citric acid) from ``thermo/data/species.yaml``, each entry with its published source.
The names are listed once, on first use;
a species' data are read from its file the first time it is asked for (:mod:`species_files`).

>>> round(molar_mass("NaHCO3(s)") * 1000, 3)
84.006
>>> elements("Ca(OH)2(s)")
{'Ca': 1.0, 'H': 2.0, 'O': 2.0}
>>> round(enthalpy("CO2(g)", 298.15) / 1000, 2)
-393.51
"""

from __future__ import annotations

import difflib
from dataclasses import dataclass
from functools import lru_cache
from pathlib import Path

from co2routes.thermo import species_files
from co2routes.thermo.errors import InputError

DATA_FILE = Path(__file__).with_name("data") / "species.yaml"

#: User notation -> Cantera species name, where the NASA files spell it differently.
ALIASES: dict[str, str] = {
    "H2O(l)": "H2O(L)",
    "H2O(s)": "H2O(s)",
    "CaCO3(s)": "CaCO3(caL)",
    "Ca(OH)2(s)": "CaO2H2(s)",
    "Na2CO3(s)": "Na2CO3(I)",
    "Na2SO4(s)": "Na2SO4(V)",
    "K2SO4(s)": "K2SO4(a)",
    "NaOH(s)": "NaOH(a)",
    "KOH(s)": "KOH(a)",
    "H2SO4(l)": "H2SO4(L)",
    "C6H6(l)": "C6H6(L)",
}

#: Gas isomers of one formula, named apart: user name -> NASA name (McBride et al. 2002 carry
#: both butanes, with their own formation enthalpies: n-butane -125.8, isobutane -134.2 kJ/mol).
GAS_ISOMERS: dict[str, str] = {
    "n-C4H10(g)": "C4H10,n-butane",
    "i-C4H10(g)": "C4H10,isobutane",
}

#: Common names accepted as well as formulas (lower case, phase tag kept).
COMMON_NAMES: dict[str, str] = {
    "baking soda(s)": "NaHCO3(s)",
    "sodium bicarbonate(s)": "NaHCO3(s)",
    "potassium bicarbonate(s)": "KHCO3(s)",
    "soda ash(s)": "Na2CO3(s)",
    "sodium carbonate(s)": "Na2CO3(s)",
    "potassium carbonate(s)": "K2CO3(s)",
    "limestone(s)": "CaCO3(s)",
    "calcite(s)": "CaCO3(s)",
    "chalk(s)": "CaCO3(s)",
    "quicklime(s)": "CaO(s)",
    "slaked lime(s)": "Ca(OH)2(s)",
    "citric acid(s)": "C6H8O7(s)",
    "n-butane(g)": "n-C4H10(g)",
    "butane(g)": "n-C4H10(g)",
    "isobutane(g)": "i-C4H10(g)",
    "glucose(s)": "C6H12O6(s)",
    "dextrose(s)": "C6H12O6(s)",
    "glucose(aq)": "C6H12O6(aq)",
    "sucrose(s)": "C12H22O11(s)",
    "sugar(s)": "C12H22O11(s)",
    "ethanol(l)": "C2H5OH(l)",
    "ethanol(aq)": "C2H5OH(aq)",
    "ethanol(g)": "C2H5OH(g)",
    "acetic acid(aq)": "CH3COOH(aq)",
    "vinegar(aq)": "CH3COOH(aq)",
    "sodium acetate(aq)": "CH3COONa(aq)",
    "potassium acetate(aq)": "CH3COOK(aq)",
    "calcium acetate(aq)": "Ca(CH3COO)2(aq)",
    "trisodium citrate(aq)": "Na3C6H5O7(aq)",
    "sodium citrate(aq)": "Na3C6H5O7(aq)",
    "tripotassium citrate(aq)": "K3C6H5O7(aq)",
    "potassium citrate(aq)": "K3C6H5O7(aq)",
    "water(l)": "H2O(l)",
    "methane(g)": "CH4(g)",
    "propane(g)": "C3H8(g)",
}

_TAGS = ("(g)", "(l)", "(s)", "(aq)")


@dataclass(frozen=True, slots=True)
class SpeciesInfo:
    """One species as this project knows it."""

    name: str
    """User notation, e.g. ``"H2O(l)"``."""
    cantera_name: str
    """The Cantera species behind it, e.g. ``"H2O(L)"``."""
    source: str
    """``"nasa_gas"``, ``"nasa_condensed"`` or ``"co2routes"`` (thermo/data/species.yaml)."""
    t_min_k: float
    """Lowest temperature of the thermo data [K]."""
    t_max_k: float
    """Highest temperature of the thermo data [K]."""
    cp_estimated: bool
    """True when the heat capacity is an estimate (see the species' note)."""
    note: str
    """The data file's note, with the published source (empty for NASA species)."""


@lru_cache(maxsize=1)
def _tables() -> tuple[dict, dict]:
    """(the file of each Cantera name, user name -> (Cantera name, source)); built once, from the
    species' names alone: a species' data are read when first asked for (:func:`_species`)."""
    gas = species_files.read("nasa_gas.yaml")
    condensed = species_files.read("nasa_condensed.yaml")
    ours = species_files.read(str(DATA_FILE))
    by_ct: dict = {}
    names: dict[str, tuple[str, str]] = {}
    for f in (gas, condensed, ours):
        by_ct.update(dict.fromkeys(f.names, f))
    for ct_name in gas.names:
        if "+" in ct_name or "-" in ct_name[1:]:
            continue  # ions and charged radicals stay out of the user's list
        names[_user_formula(ct_name) + "(g)"] = (ct_name, "nasa_gas")
    for alias, ct_name in GAS_ISOMERS.items():
        names[alias] = (ct_name, "nasa_gas")
    condensed_names = set(condensed.names)
    for alias, ct_name in ALIASES.items():
        if ct_name in condensed_names:
            names[alias] = (ct_name, "nasa_condensed")
    for ct_name in condensed.names:
        for tag_ct, tag in (("(s)", "(s)"), ("(L)", "(l)")):
            if ct_name.endswith(tag_ct):
                user = _user_formula(ct_name[: -len(tag_ct)]) + tag
                if user not in names:
                    names[user] = (ct_name, "nasa_condensed")
    for ct_name in ours.names:
        names[ct_name] = (ct_name, "co2routes")
    return by_ct, names


@lru_cache(maxsize=None)
def _species(ct_name: str):
    """The ``cantera.Species`` of a Cantera name, read from its file on first use."""
    return _tables()[0][ct_name].species(ct_name)


@lru_cache(maxsize=None)
def _info(user: str) -> SpeciesInfo:
    """The :class:`SpeciesInfo` of a user name already in the tables."""
    ct_name, source = _tables()[1][user]
    sp = _species(ct_name)
    data = sp.input_data
    return SpeciesInfo(
        name=user,
        cantera_name=sp.name,
        source=source,
        t_min_k=float(sp.thermo.min_temp),
        t_max_k=float(sp.thermo.max_temp),
        cp_estimated=bool(data.get("cp-estimated", False)),
        note=" ".join(str(data.get("note", "")).split()),
    )


def _user_formula(nasa: str) -> str:
    """NASA spelling -> ordinary spelling: chlorine is ``CL`` there, ``Cl`` here.

    >>> _user_formula("HCL"), _user_formula("CaCL2")
    ('HCl', 'CaCl2')
    """
    return nasa.replace("CL", "Cl").replace("AL", "Al")


def canonical(name: str) -> str:
    """The user-notation name a string refers to, or raise :class:`InputError`.

    Accepts formulas with a phase tag (``"NaHCO3(s)"``), the common names in
    :data:`COMMON_NAMES` (``"baking soda(s)"``) and ignores surrounding spaces.

    >>> canonical(" glucose(s) ")
    'C6H12O6(s)'
    >>> canonical("HCl(aq)")
    'HCl(aq)'
    """
    text = " ".join(str(name).split())
    _, info = _tables()
    if text in info:
        return text
    low = text.lower()
    if low in COMMON_NAMES:
        return COMMON_NAMES[low]
    for key in info:
        if key.lower() == low:
            return key
    isomers = [k for k in GAS_ISOMERS if k.split("-", 1)[1].lower() == low]
    if isomers:
        raise InputError("species", f"{text} has isomers with different data: write "
                         f"{' or '.join(isomers)} (n-butane or isobutane)", got=repr(text))
    raise InputError("species", _unknown_message(text), got=repr(text))


def _unknown_message(text: str) -> str:
    """'unknown species' with close names suggested."""
    _, info = _tables()
    pool = list(info) + list(COMMON_NAMES)
    close = difflib.get_close_matches(text, pool, n=4, cutoff=0.6)
    if not any(text.endswith(t) for t in _TAGS):
        tagged = [n for n in info if n.rsplit("(", 1)[0] == text]
        close = tagged[:4] or close
        hint = "needs a phase tag (g), (l), (s) or (aq)"
    else:
        hint = "unknown species"
    if close:
        return f"{hint}; did you mean {', '.join(close)}?"
    return f"{hint}; see `known_names()` for the list"


def info(name: str) -> SpeciesInfo:
    """The :class:`SpeciesInfo` for a user name.

    >>> info("CaCO3(s)").cantera_name
    'CaCO3(caL)'
    """
    return _info(canonical(name))


def cantera_species(name: str):
    """The ``cantera.Species`` object behind a user name."""
    return _species(info(name).cantera_name)


def known_names() -> tuple[str, ...]:
    """Every user-notation name this module knows, sorted (common names not included).

    >>> "NaHCO3(s)" in known_names() and "CO2(g)" in known_names()
    True
    """
    return tuple(sorted(_tables()[1]))


def molar_mass(name: str) -> float:
    """Molar mass [kg/mol] from IUPAC standard atomic weights (as Cantera carries them).

    M = sum_i n_i A_i / 1000, with n_i atoms of element i of atomic weight A_i [g/mol].

    Parameters
    ----------
    name : str
        Species in user notation, e.g. ``"CaCO3(s)"``.

    Source: IUPAC Commission on Isotopic Abundances and Atomic Weights, standard atomic
    weights, through Cantera's element table.

    >>> round(molar_mass("CO2(g)"), 6)
    0.04401
    >>> round(molar_mass("C6H12O6(s)") * 1000, 2)
    180.16
    """
    return float(cantera_species(name).molecular_weight) / 1000.0


def elements(name: str) -> dict[str, float]:
    """Atoms of each element in one formula unit, e.g. ``{'C': 1.0, 'O': 2.0}``.

    >>> elements("CO2(g)")
    {'C': 1.0, 'O': 2.0}
    """
    return dict(sorted(cantera_species(name).composition.items()))


def enthalpy(name: str, temperature: float) -> float:
    """Absolute standard molar enthalpy [J/mol]: formation enthalpy at 298.15 K plus sensible heat.

    h(T) = dfH(298.15 K) + integral from 298.15 K to T of cp dT, at 1 bar, on the common
    reference of the NASA files (elements in their standard states have h = 0 at 298.15 K).

    Parameters
    ----------
    name : str
        Species in user notation.
    temperature : float
        Temperature [K], within the species' data range. NASA condensed data that start at
        298.15 or 300 K are extrapolated down to 273.15 K (their cp changes slowly there; the
        sensible-heat error is well under 0.1 kJ/mol).

    Raises
    ------
    InputError
        Temperature outside the species' data range.

    Sources: NASA polynomials, McBride, Zehe and Gordon (2002), NASA TP-2002-211556; other
    species per their notes in thermo/data/species.yaml (NBS, Wagman et al. 1982).

    >>> round(enthalpy("H2O(l)", 298.15) / 1000, 2)
    -285.83
    >>> round((enthalpy("N2(g)", 400.0) - enthalpy("N2(g)", 298.15)) / 1000, 3)
    2.971
    """
    sp_info = info(name)
    check_temperature(sp_info, temperature)
    return float(cantera_species(name).thermo.h(temperature)) / 1000.0


def entropy(name: str, temperature: float) -> float:
    """Standard molar entropy [J/(mol K)] at 1 bar.

    >>> round(entropy("CO2(g)", 298.15), 2)
    213.79
    """
    sp_info = info(name)
    check_temperature(sp_info, temperature)
    return float(cantera_species(name).thermo.s(temperature)) / 1000.0


def gibbs(name: str, temperature: float) -> float:
    """Standard molar Gibbs energy g = h - T s [J/mol] on the same reference as :func:`enthalpy`.

    >>> round(gibbs("O2(g)", 298.15) / 1000, 2)
    -61.16
    """
    return enthalpy(name, temperature) - temperature * entropy(name, temperature)


def check_temperature(sp_info: SpeciesInfo, temperature: float) -> None:
    """Raise :class:`InputError` if ``temperature`` is outside the species' data range."""
    low = min(sp_info.t_min_k, 273.15 if sp_info.source == "nasa_condensed" else 298.15)
    if not (low - 1e-9 <= temperature <= sp_info.t_max_k + 1e-9):
        raise InputError(
            "temperature",
            f"{sp_info.name} data cover {low:.2f}-{sp_info.t_max_k:.2f} K",
            got=f"{temperature:.2f} K",
        )

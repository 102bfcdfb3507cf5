"""Chemical equations as people write them, checked for balance, with their heat of reaction.

``parse_reaction("NaHCO3(s) + HCl(aq) -> NaCl(aq) + H2O(l) + CO2(g)")`` reads the equation
(coefficients as ``2 HCl(aq)`` or ``2HCl(aq)``, arrow ``->`` or ``=``), refuses one whose elements
do not balance, and returns a :class:`Reaction` whose :meth:`Reaction.delta_h` is the standard
enthalpy of reaction from the species data in :mod:`co2routes.thermo.species`.

>>> r = reaction_enthalpy("NaHCO3(s) + HCl(aq) -> NaCl(aq) + H2O(l) + CO2(g)")
>>> round(r.delta_h_kj_per_mol, 1), round(r.delta_h_kj_per_kg_co2)
(31.4, 713)
"""

from __future__ import annotations

import re
from dataclasses import dataclass
from fractions import Fraction

from co2routes.thermo import species
from co2routes.thermo.errors import InputError

FIELD = "equation"
#: Below this many atoms an element counts as balanced (coefficients are exact fractions, so
#: any real imbalance is at least 1e-3).
BALANCE_TOLERANCE = 1e-9
#: Further than this from 298.15 K, species with estimated heat capacities earn a warning [K].
CP_WARNING_SPAN_K = 25.0

_ARROW = re.compile(r"\s*(?:->|→|=>|<=>|=)\s*")
_TERM = re.compile(r"^\s*(\d+(?:\.\d+)?(?:/\d+)?)?\s*(.*?)\s*$")


@dataclass(frozen=True, slots=True)
class Reaction:
    """A balanced reaction; coefficients are per mol of reaction as written."""

    reactants: tuple[tuple[str, float], ...]
    """(species in user notation, stoichiometric coefficient) on the left."""
    products: tuple[tuple[str, float], ...]
    """(species, coefficient) on the right."""

    @property
    def equation(self) -> str:
        """The equation in canonical spelling, e.g. ``'CaCO3(s) -> CaO(s) + CO2(g)'``."""
        def side(terms):
            return " + ".join(f"{_fmt(c)}{name}" for name, c in terms)

        return f"{side(self.reactants)} -> {side(self.products)}"

    def coefficient(self, name: str) -> float:
        """Net coefficient of a species: positive for a product, negative for a reactant."""
        key = species.canonical(name)
        total = sum(c for n, c in self.products if n == key)
        return total - sum(c for n, c in self.reactants if n == key)

    def delta_h(self, temperature: float = 298.15) -> float:
        """Standard enthalpy of reaction [J per mol of reaction as written].

        dH(T) = sum over products of nu h_i(T) - sum over reactants of nu h_i(T), with h_i the
        absolute molar enthalpy of :func:`co2routes.thermo.species.enthalpy` (formation enthalpy at
        298.15 K plus sensible heat). Negative: the reaction gives heat off.

        Parameters
        ----------
        temperature : float
            Temperature of reactants and products [K], within every species' data range
            (aqueous species and most solids: 273.15-373.15 K).

        Aqueous species are at infinite dilution; the heat of diluting a strong acid to that
        state is in :mod:`co2routes.thermo.dilution`. Source: NBS tables (Wagman et al. 1982) and NASA
        polynomials (McBride et al. 2002) through the species data.

        >>> round(parse_reaction("CaCO3(s) -> CaO(s) + CO2(g)").delta_h() / 1000, 1)
        178.3
        """
        total = 0.0
        for name, c in self.products:
            total += c * species.enthalpy(name, temperature)
        for name, c in self.reactants:
            total -= c * species.enthalpy(name, temperature)
        return total

    def co2_made(self) -> float:
        """Net mol of CO2 (gas plus dissolved) made per mol of reaction (negative if consumed)."""
        made = 0.0
        for tag in ("CO2(g)", "CO2(aq)"):
            made += self.coefficient(tag)
        return made

    def delta_h_per_kg_co2(self, temperature: float = 298.15) -> float | None:
        """Enthalpy of reaction per kilogram of CO2 made [J/kg], or None if no CO2 is made.

        dH / (nu_CO2 M_CO2), nu_CO2 the net mol of CO2(g) + CO2(aq) per mol of reaction and
        M_CO2 = 0.044009 kg/mol. If the reaction consumes CO2 (e.g. lime carbonation) the value is
        per kilogram of CO2 taken up and the sign is that of dH.

        >>> rx = parse_reaction("C6H12O6(s) -> 2 C2H5OH(l) + 2 CO2(g)")
        >>> round(rx.delta_h_per_kg_co2() / 1000)
        -785
        """
        nu = self.co2_made()
        if abs(nu) < BALANCE_TOLERANCE:
            return None
        return self.delta_h(temperature) / (abs(nu) * species.molar_mass("CO2(g)"))

    def species_names(self) -> tuple[str, ...]:
        """All species in the reaction, reactants first."""
        return tuple(n for n, _ in self.reactants) + tuple(n for n, _ in self.products)


@dataclass(frozen=True, slots=True)
class ReactionEnthalpy:
    """The heat of one reaction at one temperature."""

    equation: str
    """Canonical spelling of the equation."""
    temperature_k: float
    """Temperature [K]."""
    delta_h_kj_per_mol: float
    """Enthalpy of reaction [kJ per mol of reaction as written]; positive takes heat in."""
    delta_h_kj_per_kg_co2: float | None
    """Enthalpy of reaction per kg of CO2 made [kJ/kg], None if the reaction makes no CO2."""
    balanced: bool
    """Always True: an unbalanced equation raises InputError instead."""
    warnings: tuple[str, ...] = ()
    """Sentences about the reliability of the figure."""


def parse_reaction(text: str) -> Reaction:
    """Read an equation in ordinary notation and check that its elements balance.

    Grammar: ``side ARROW side``; ARROW is ``->``, ``=>``, ``→`` or ``=``; a side is terms joined
    by ``+``; a term is an optional coefficient (``2``, ``0.5``, ``1/2``) and a species name in
    user notation (see :func:`co2routes.thermo.species.canonical`). Repeated species are summed.

    Raises
    ------
    InputError
        Missing arrow, empty side, unknown species (named, with close names), a zero
        coefficient, or an element that does not balance (named, with its surplus).

    >>> parse_reaction("2HCl(aq) + Na2CO3(s) = 2 NaCl(aq) + H2O(l) + CO2(g)").reactants
    (('HCl(aq)', 2.0), ('Na2CO3(s)', 1.0))
    >>> parse_reaction("NaHCO3(s) + HCl(aq) -> NaCl(aq) + CO2(g)")
    Traceback (most recent call last):
    ...
    co2routes.thermo.errors.InputError: equation: does not balance: H 2 more on the left, O 1 more on the left (got 'NaHCO3(s) + HCl(aq) -> NaCl(aq) + CO2(g)')
    """
    raw = " ".join(str(text).split())
    parts = _ARROW.split(raw)
    if len(parts) != 2:
        raise InputError(FIELD, "must be 'reactants -> products' with one arrow (-> or =)",
                         got=repr(raw))
    left = _side(parts[0], raw)
    right = _side(parts[1], raw)
    reaction = Reaction(reactants=left, products=right)
    surplus = imbalance(reaction)
    if surplus:
        bits = []
        for el, amount in surplus.items():
            where = "left" if amount > 0 else "right"
            bits.append(f"{el} {abs(amount):.4g} more on the {where}")
        raise InputError(FIELD, "does not balance: " + ", ".join(bits), got=repr(raw))
    return reaction


def imbalance(reaction: Reaction) -> dict[str, float]:
    """Atoms of each element in excess on the left (positive) or right (negative); {} if balanced.

    >>> imbalance(Reaction((("CaCO3(s)", 1.0),), (("CaO(s)", 1.0),)))
    {'C': 1.0, 'O': 2.0}
    """
    count: dict[str, float] = {}
    for name, c in reaction.reactants:
        for el, n in species.elements(name).items():
            count[el] = count.get(el, 0.0) + c * n
    for name, c in reaction.products:
        for el, n in species.elements(name).items():
            count[el] = count.get(el, 0.0) - c * n
    return {el: v for el, v in sorted(count.items()) if abs(v) > BALANCE_TOLERANCE}


def reaction_enthalpy(text: str, temperature: float = 298.15) -> ReactionEnthalpy:
    """Parse, balance-check and evaluate the enthalpy of a reaction at ``temperature`` [K].

    dH(T) as in :meth:`Reaction.delta_h`; per kg of CO2 as in :meth:`Reaction.delta_h_per_kg_co2`.
    Valid range: the common range of the species' data (273.15-373.15 K whenever an aqueous
    species takes part). A warning is attached when a species with an estimated heat capacity
    is used more than 25 K from 298.15 K.

    Sources: NBS tables (Wagman et al. 1982) and NASA polynomials (McBride et al. 2002), per
    species (thermo/data/species.yaml notes).

    >>> r = reaction_enthalpy("CaCO3(s) + 2 HCl(aq) -> CaCl2(aq) + H2O(l) + CO2(g)")
    >>> round(r.delta_h_kj_per_mol, 1)
    -15.3
    >>> reaction_enthalpy("Ca(OH)2(s) + CO2(g) -> CaCO3(s) + H2O(l)").delta_h_kj_per_kg_co2 < 0
    True
    """
    reaction = parse_reaction(text)
    dh = reaction.delta_h(temperature)
    per_kg = reaction.delta_h_per_kg_co2(temperature)
    warnings = []
    if abs(temperature - 298.15) > CP_WARNING_SPAN_K:
        rough = [n for n in reaction.species_names() if species.info(n).cp_estimated]
        if rough:
            warnings.append(
                "Heat capacities of " + ", ".join(rough) + " are estimates; away from 25 degC the "
                "reaction heat is less certain (roughly 0.1-0.3 kJ/mol per 10 K)."
            )
    return ReactionEnthalpy(
        equation=reaction.equation,
        temperature_k=float(temperature),
        delta_h_kj_per_mol=dh / 1000.0,
        delta_h_kj_per_kg_co2=None if per_kg is None else per_kg / 1000.0,
        balanced=True,
        warnings=tuple(warnings),
    )


def _side(text: str, whole: str) -> tuple[tuple[str, float], ...]:
    """Terms of one side of an equation, coefficients summed per species, order kept."""
    if not text.strip():
        raise InputError(FIELD, "each side of the arrow needs at least one species", got=repr(whole))
    terms: dict[str, float] = {}
    for chunk in text.split("+"):
        m = _TERM.match(chunk)
        coef_text, name = m.group(1), m.group(2)
        if not name:
            raise InputError(FIELD, "a term has a coefficient but no species", got=repr(whole))
        coef = float(Fraction(coef_text)) if coef_text else 1.0
        if coef <= 0:
            raise InputError(FIELD, "coefficients must be greater than zero", got=repr(chunk))
        key = species.canonical(name)
        terms[key] = terms.get(key, 0.0) + coef
    return tuple(terms.items())


def _fmt(c: float) -> str:
    """Coefficient for display: '' for 1, '2 ' for 2, '0.5 ' for 0.5."""
    if abs(c - 1.0) < 1e-12:
        return ""
    if abs(c - round(c)) < 1e-12:
        return f"{int(round(c))} "
    return f"{c:g} "

"""Lime as a CO2 sorbent: capacity over cycles, and the heat of calcining, slaking and loading.

A calcium sorbent takes CO2 from a gas as carbonate (Ca(OH)2 + CO2 -> CaCO3 + H2O, or
CaO + CO2 -> CaCO3) and gives it back, pure, in a kiln (CaCO3 -> CaO + CO2); quicklime is slaked
back to hydroxide with water (CaO + H2O -> Ca(OH)2). Each pass through the kiln sinters the lime
a little, so the share of the calcium that carbonates falls with the number of cycles.

Reaction enthalpies come from :mod:`co2routes.thermo.reaction` and sensible heats from the species data of
:mod:`co2routes.thermo.species` (NASA polynomials, McBride, Zehe and Gordon 2002; NBS, Wagman et al. 1982).
"""

from __future__ import annotations

from dataclasses import dataclass

from co2routes.thermo import species
from co2routes.thermo.errors import InputError, require_fraction
from co2routes.thermo.reaction import parse_reaction

#: Deactivation constant k and residual conversion X_r of the cycle-decay equation (Grasa &
#: Abanades 2006; their fit to natural limestones over up to 500 cycles; the residual "about 7-8 %"
#: is read from the abstract, k = 0.52 from memory).
DECAY_K = 0.52
RESIDUAL_CONVERSION = 0.075

CALCINATION = "CaCO3(s) -> CaO(s) + CO2(g)"
DEHYDRATION = "Ca(OH)2(s) -> CaO(s) + H2O(g)"
SLAKING = "CaO(s) + H2O(l) -> Ca(OH)2(s)"
CARBONATION = {"Ca(OH)2(s)": "Ca(OH)2(s) + CO2(g) -> CaCO3(s) + H2O(l)",
               "CaO(s)": "CaO(s) + CO2(g) -> CaCO3(s)"}


def conversion_after_cycles(cycles: int, k: float = DECAY_K, residual: float = RESIDUAL_CONVERSION) -> float:
    """Fraction of the calcium that carbonates in cycle N (Grasa & Abanades 2006).

    X_N = 1 / (1 / (1 - X_r) + k N) + X_r

    Parameters
    ----------
    cycles : int
        Cycle number N, 1 to 10,000 (N = 0 gives 1, fresh lime).
    k : float
        Deactivation constant [-], default 0.52.
    residual : float
        Residual conversion X_r [-], default 0.075.

    Valid for lime from natural limestone calcined at 850-950 degC; fitted to thermogravimetric
    runs of up to 500 cycles. Source: Grasa, G. S.; Abanades, J. C. (2006) "CO2 capture capacity
    of CaO in long series of carbonation/calcination cycles", Ind. Eng. Chem. Res. 45, 8846-8851.

    >>> round(conversion_after_cycles(1), 3), round(conversion_after_cycles(20), 3)
    (0.7, 0.162)
    """
    if not isinstance(cycles, int) or not (0 <= cycles <= 10000):
        raise InputError("cycles", "must be a whole number from 0 to 10,000", got=cycles)
    require_fraction("residual conversion", residual, allow_zero=True)
    return 1.0 / (1.0 / (1.0 - residual) + k * cycles) + residual


@dataclass(frozen=True, slots=True)
class KilnHeat:
    """Heat a kiln puts into a loaded bed per mol of CO2 released [J/mol], by part.

    The bed holds 1/X mol of calcium per mol of CO2 (X its carbonate share); it enters at the
    ambient temperature and leaves, with its gases, at the calcination temperature.
    ``reaction_j`` is dH of CaCO3 -> CaO + CO2 at the calcination temperature; ``carbonate_sensible_j``
    heats the CaCO3 from ambient to it; ``rest_j`` takes the calcium that did not carbonate from
    ambient to lime at the kiln temperature (for hydroxide: dehydration at ambient plus heating
    CaO and steam); ``steam_mol`` is the water driven off per mol of CO2.
    """

    calcination_temperature_k: float
    reaction_j: float
    carbonate_sensible_j: float
    rest_j: float
    steam_mol: float

    @property
    def total_j(self) -> float:
        """All heat per mol of CO2 [J/mol]."""
        return self.reaction_j + self.carbonate_sensible_j + self.rest_j


def kiln_heat(sorbent: str, conversion: float, ambient_k: float, calcination_k: float) -> KilnHeat:
    """Heat to calcine a loaded bed from ambient, per mol of CO2 released.

    Q = dH_calc(T_c) + [h_CaCO3(T_c) - h_CaCO3(T_a)]
        + (1 - X)/X [h_CaO(T_c) - h(sorbent, T_a) + (h_H2O,g(T_c) if hydroxide)]

    Parameters
    ----------
    sorbent : str
        ``"Ca(OH)2(s)"`` or ``"CaO(s)"``: what the uncarbonated calcium is.
    conversion : float
        Carbonate share X of the calcium, (0, 1].
    ambient_k : float
        Temperature the bed enters at [K], 273.15-373.15 K.
    calcination_k : float
        Kiln temperature [K], 700-1373.15 K (calcite above 1200 K as in
        :mod:`co2routes.thermo.calcination`).

    Sources: reaction enthalpies and sensible heats from NASA polynomials (McBride et al. 2002)
    through :mod:`co2routes.thermo.species`; at 298.15 K, dH_calc = +178.3 kJ/mol against +178.32 from the
    NBS tables (Wagman et al. 1982).

    >>> q = kiln_heat("CaO(s)", 1.0, 298.15, 1167.0)
    >>> round(q.reaction_j / 1000, 1), round(q.carbonate_sensible_j / 1000, 1)
    (167.6, 97.6)
    """
    x = require_fraction("carbonate conversion", conversion)
    if sorbent not in CARBONATION:
        raise InputError("sorbent", "must be Ca(OH)2(s) or CaO(s)", got=repr(sorbent))
    if not (273.15 <= ambient_k <= 373.15):
        raise InputError("ambient temperature", "must be 0-100 degC", got=ambient_k)
    from co2routes.thermo import calcination

    if not (700.0 <= calcination_k <= calcination.T_MAX):
        raise InputError("calcination temperature", "must be 700-1373.15 K (427-1100 degC)", got=calcination_k)
    reaction = calcination.co2_pressure_over_calcite(calcination_k).delta_h_j_per_mol
    sensible = calcination.calcite_g_h(calcination_k)[1] - species.enthalpy("CaCO3(s)", ambient_k)
    rest_per_ca = species.enthalpy("CaO(s)", calcination_k) - species.enthalpy(sorbent, ambient_k)
    steam = 0.0
    if sorbent == "Ca(OH)2(s)":
        steam = (1.0 - x) / x
        rest_per_ca += species.enthalpy("H2O(g)", calcination_k)
    rest = (1.0 - x) / x * rest_per_ca
    return KilnHeat(float(calcination_k), reaction, sensible, rest, steam)


def reaction_heat(equation: str, temperature_k: float) -> float:
    """Enthalpy of one of this module's reactions [J per mol as written] at ``temperature_k``.

    Source: :meth:`co2routes.thermo.reaction.Reaction.delta_h` (NBS / NASA data).

    >>> round(reaction_heat(SLAKING, 298.15) / 1000, 1)
    -65.2
    """
    return parse_reaction(equation).delta_h(temperature_k)

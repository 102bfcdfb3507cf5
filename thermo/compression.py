"""Liquefying CO2: staged compression with intercooling, then a condenser.

The gas is drawn in at ``(P_in, T_in)`` and raised to the saturation pressure of the chosen
condensing temperature in ``N`` stages of equal pressure ratio. After each stage but the last an
intercooler brings the gas back to the intercooling temperature; after the last stage the
condenser desuperheats it and condenses it to saturated liquid at the condensing temperature.
Every state comes from the Span & Wagner (1996) equation of state through CoolProp; the
saturation pressure comes from :mod:`co2routes.thermo.co2`.

Cooling the receiving cylinder (an ice bath, a chiller) lowers the condensing pressure and so the
work and the number of stages: :func:`cooling_tradeoff` tabulates that. This module holds one
stage and the limits; the whole plan (:func:`liquefy`, :func:`cooling_tradeoff`) is in
:mod:`co2routes.thermo.liquefaction`, importable from here too.

Limits used here that are common practice, not published rules:

* :data:`MAX_DISCHARGE_K` 150 degC discharge temperature, above which compressor oil breaks down;
* :data:`MAX_STAGE_PRESSURE_RATIO` 6 and :data:`HIGH_STAGE_PRESSURE_RATIO` 4: small reciprocating
  compressors work at about 4-6 per stage;
* :data:`DEFAULT_ISENTROPIC_EFFICIENCY` 0.70 and :data:`DEFAULT_VOLUMETRIC_EFFICIENCY` 0.80 for a
  small reciprocating machine.
"""

from __future__ import annotations

import math
from dataclasses import dataclass

from co2routes.thermo.errors import InputError, require_fraction, require_positive

FLUID = "CO2"

#: Highest discharge temperature before compressor oil breaks down [K] (150 degC, common practice).
MAX_DISCHARGE_K = 423.15
#: Highest pressure ratio per stage accepted (common practice: about 4-6 per stage for small
#: reciprocating compressors).
MAX_STAGE_PRESSURE_RATIO = 6.0
#: Ratio per stage above which a warning is given (lower end of the 4-6 band, common practice).
HIGH_STAGE_PRESSURE_RATIO = 4.0
#: Isentropic efficiency assumed when none is given (common practice, small reciprocating).
DEFAULT_ISENTROPIC_EFFICIENCY = 0.70
#: Volumetric efficiency assumed when a displacement is given without one (common practice).
DEFAULT_VOLUMETRIC_EFFICIENCY = 0.80
#: Most stages :func:`liquefy` adds on its own to keep the discharge under the oil limit.
MAX_AUTO_STAGES = 6
#: Condensing temperatures tabulated by :func:`cooling_tradeoff` when none are given [K].
TRADEOFF_TEMPERATURES_K = (253.15, 263.15, 273.15, 283.15, 293.15, 298.15, 303.15)


@dataclass(frozen=True, slots=True)
class StageResult:
    """One compression stage and the cooler after it (all per kg of CO2 passing through).

    ``cooler`` is ``"intercooler"`` (gas cooled to ``cooled_temperature_k`` at the discharge
    pressure) or ``"condenser"`` (desuperheated and condensed to saturated liquid).
    ``energy_balance_residual_j_per_kg`` is ``h_suction + work - heat_rejected - h_cooled``,
    each enthalpy evaluated from its own state; it is zero to rounding when the stage closes.
    """

    index: int
    suction_pressure_pa: float
    suction_temperature_k: float
    suction_density_kg_m3: float
    discharge_pressure_pa: float
    pressure_ratio: float
    isentropic_work_j_per_kg: float
    work_j_per_kg: float
    isentropic_discharge_temperature_k: float
    discharge_temperature_k: float
    cooler: str
    cooled_temperature_k: float
    heat_rejected_j_per_kg: float
    energy_balance_residual_j_per_kg: float


@dataclass(frozen=True, slots=True)
class LiquefactionResult:
    """Compression from the inlet state to saturated liquid at the condensing temperature.

    Works and heats are per kg of CO2 [J/kg]. ``batch_time_s`` and ``mass_flow_kg_s`` are
    ``None`` unless a displacement was given (the time also needs a batch mass).
    """

    inlet_pressure_pa: float
    inlet_temperature_k: float
    condensing_temperature_k: float
    condensing_pressure_pa: float
    isentropic_efficiency: float
    stages: tuple[StageResult, ...]
    isentropic_work_j_per_kg: float
    work_j_per_kg: float
    intercooler_heat_j_per_kg: float
    condenser_heat_j_per_kg: float
    heat_rejected_j_per_kg: float
    discharge_temperature_k: float
    mass_flow_kg_s: float | None
    batch_time_s: float | None
    warnings: tuple[str, ...]

    @property
    def work_kwh_per_kg(self) -> float:
        """Shaft work per kg of liquid CO2 [kWh/kg]."""
        return self.work_j_per_kg / 3.6e6


@dataclass(frozen=True, slots=True)
class TradeoffRow:
    """One condensing temperature in the cooling trade-off (per kg of CO2)."""

    condensing_temperature_k: float
    condensing_pressure_pa: float
    stages: int
    pressure_ratio: float
    work_j_per_kg: float
    discharge_temperature_k: float
    condenser_heat_j_per_kg: float


def stage_pressures(inlet_pressure_pa: float, outlet_pressure_pa: float, stages: int) -> tuple[float, ...]:
    """Discharge pressure of each stage for equal pressure ratios.

    Equation: ``r = (P_out / P_in) ** (1 / N)``, ``P_i = P_in * r ** i`` for ``i = 1 .. N``. Equal
    ratios minimise the total work of ideal-gas compression with intercooling to the inlet
    temperature (Cengel & Boles, *Thermodynamics: An Engineering Approach*, multistage compression
    with intercooling).

    Parameters
    ----------
    inlet_pressure_pa : float
        Suction pressure of the first stage [Pa].
    outlet_pressure_pa : float
        Discharge pressure of the last stage [Pa], above the inlet pressure.
    stages : int
        Number of stages, 1 or more.

    >>> [round(p) for p in stage_pressures(1e5, 36e5, 2)]
    [600000, 3600000]
    """
    if stages < 1:
        raise InputError("stages", "must be a whole number of 1 or more", got=stages)
    ratio = (outlet_pressure_pa / inlet_pressure_pa) ** (1.0 / stages)
    pressures = [inlet_pressure_pa * ratio**i for i in range(1, stages)]
    return tuple(pressures) + (outlet_pressure_pa,)


def minimum_stages(inlet_pressure_pa: float, outlet_pressure_pa: float,
                   max_ratio: float = MAX_STAGE_PRESSURE_RATIO) -> int:
    """Fewest equal-ratio stages that keep each stage's pressure ratio at or below ``max_ratio``.

    Equation: ``N = ceil(ln(P_out / P_in) / ln(r_max))`` (at least 1).

    Parameters
    ----------
    inlet_pressure_pa, outlet_pressure_pa : float
        Suction and final discharge pressure [Pa].
    max_ratio : float
        Largest ratio per stage [-] (default 6, common practice for small reciprocating machines).

    >>> minimum_stages(101325.0, 3485140.0)
    2
    >>> minimum_stages(101325.0, 6434244.0)
    3
    """
    overall = outlet_pressure_pa / inlet_pressure_pa
    if overall <= 1.0:
        return 1
    return max(1, math.ceil(math.log(overall) / math.log(max_ratio) - 1e-12))


def compress_stage(index: int, suction_pressure_pa: float, suction_temperature_k: float,
                   discharge_pressure_pa: float, efficiency: float, *,
                   cooled_temperature_k: float | None = None,
                   liquid_temperature_k: float | None = None) -> StageResult:
    """One adiabatic compression stage followed by its cooler.

    Equations (steady flow, per kg): ``s_2s = s_1``; ``w_s = h(P_2, s_1) - h_1``;
    ``w = w_s / eta``; ``h_2 = h_1 + w``; ``T_2 = T(P_2, h_2)``. Intercooler:
    ``q = h_2 - h(P_2, T_c)``. Condenser (``cooled_temperature_k=None``): the gas leaves as
    saturated liquid at ``P_2``, ``q = h_2 - h_liq(P_2)``. Balance: ``h_1 + w = q + h_out``.
    Isentropic efficiency as defined in Cengel & Boles, *Thermodynamics: An Engineering Approach*
    (isentropic efficiency of compressors); states from Span & Wagner (1996) via CoolProp.

    Parameters
    ----------
    index : int
        Stage number, from 1.
    suction_pressure_pa, suction_temperature_k : float
        Gas state at the stage inlet [Pa], [K]; must be vapour.
    discharge_pressure_pa : float
        Stage outlet pressure [Pa]; for the condenser, below the critical pressure.
    efficiency : float
        Isentropic efficiency in (0, 1] [-].
    cooled_temperature_k : float or None
        Intercooler outlet temperature [K], or ``None`` for the condenser.
    liquid_temperature_k : float or None
        Condenser only: the liquid leaves at this temperature, below the saturation temperature
        at ``P_2`` (a gas that carries air condenses whole only above its own saturation
        pressure, :mod:`co2routes.thermo.condensing`): ``q = h_2 - h(P_2, T_l)``.

    Valid for the vapour region of CO2 from the triple point to 1100 K (Span & Wagner 1996).

    >>> st = compress_stage(1, 101325.0, 298.15, 600000.0, 0.7, cooled_temperature_k=298.15)
    >>> round(st.isentropic_work_j_per_kg / 1e3, 1), round(st.discharge_temperature_k - 273.15)
    (121.2, 212)
    """
    require_fraction("efficiency", efficiency)
    from co2routes.thermo.coolprop_safe import props

    h1 = props("H", "P", suction_pressure_pa, "T", suction_temperature_k, FLUID)
    s1 = props("S", "P", suction_pressure_pa, "T", suction_temperature_k, FLUID)
    d1 = props("D", "P", suction_pressure_pa, "T", suction_temperature_k, FLUID)
    h2s = props("H", "P", discharge_pressure_pa, "S", s1, FLUID)
    t2s = props("T", "P", discharge_pressure_pa, "S", s1, FLUID)
    w_s = h2s - h1
    w = w_s / efficiency
    h2 = h1 + w
    if h2 > props("H", "P", discharge_pressure_pa, "T", 1100.0, FLUID):  # the data's top, see above
        raise InputError("efficiency", "is too low for this pressure ratio: the discharge would pass "
                         "1100 K, beyond the property data (Span & Wagner 1996)", got=f"{efficiency:.0%}")
    t2 = props("T", "P", discharge_pressure_pa, "H", h2, FLUID)
    h2_state = props("H", "P", discharge_pressure_pa, "T", t2, FLUID)
    if liquid_temperature_k is not None:
        cooler = "condenser"
        t_out = liquid_temperature_k
        h_out = props("H", "P", discharge_pressure_pa, "T", t_out, FLUID)
    elif cooled_temperature_k is None:
        cooler = "condenser"
        from co2routes.thermo.co2 import saturation_at_pressure

        sat = saturation_at_pressure(discharge_pressure_pa)
        h_out, t_out = sat.liquid_enthalpy_j_kg, sat.temperature_k
    else:
        cooler = "intercooler"
        t_out = cooled_temperature_k
        h_out = props("H", "P", discharge_pressure_pa, "T", t_out, FLUID)
    q = h2_state - h_out
    return StageResult(
        index=index,
        suction_pressure_pa=suction_pressure_pa,
        suction_temperature_k=suction_temperature_k,
        suction_density_kg_m3=d1,
        discharge_pressure_pa=discharge_pressure_pa,
        pressure_ratio=discharge_pressure_pa / suction_pressure_pa,
        isentropic_work_j_per_kg=w_s,
        work_j_per_kg=w,
        isentropic_discharge_temperature_k=t2s,
        discharge_temperature_k=t2,
        cooler=cooler,
        cooled_temperature_k=t_out,
        heat_rejected_j_per_kg=q,
        energy_balance_residual_j_per_kg=h1 + w - q - h_out,
    )


def mass_flow_kg_s(displacement_m3_s: float, volumetric_efficiency: float,
                   suction_density_kg_m3: float) -> float:
    """Mass drawn in by a reciprocating compressor's first stage.

    Equation: ``m_dot = V_disp * eta_v * rho_suction`` (definition of volumetric efficiency;
    Perry's Chemical Engineers' Handbook, 8th ed., section 10, reciprocating compressors).

    Parameters
    ----------
    displacement_m3_s : float
        Swept volume per unit time of the first stage [m3/s].
    volumetric_efficiency : float
        Fraction of the swept volume filled with suction gas, in (0, 1] [-].
    suction_density_kg_m3 : float
        Density of the gas at the first-stage suction [kg/m3].

    >>> round(mass_flow_kg_s(50e-3 / 60, 0.8, 1.808) * 3600, 3)
    4.339
    """
    require_positive("displacement", displacement_m3_s)
    require_fraction("volumetric efficiency", volumetric_efficiency)
    require_positive("suction density", suction_density_kg_m3)
    return displacement_m3_s * volumetric_efficiency * suction_density_kg_m3


def __getattr__(name: str):
    """:func:`liquefy` and :func:`cooling_tradeoff` live in :mod:`co2routes.thermo.liquefaction`;
    they stay importable from here (loaded on first use, so the two modules import in either order)."""
    if name in ("liquefy", "cooling_tradeoff"):
        from co2routes.thermo import liquefaction

        return getattr(liquefaction, name)
    raise AttributeError(f"module {__name__!r} has no attribute {name!r}")

"""Liquefying CO2: staged compression with intercooling, then a condenser.

The gas is drawn in at ``(P_in, T_in)`` and raised to the saturation pressure of the chosen
condensing temperature in ``N`` stages of equal pressure ratio. After each stage but the last an
intercooler brings the gas back to the intercooling temperature; after the last stage the
condenser desuperheats it and condenses it to saturated liquid at the condensing temperature.
Every state comes from the Span & Wagner (1996) equation of state through CoolProp; the
saturation pressure comes from :mod:`co2routes.thermo.co2`.

Cooling the receiving cylinder (an ice bath, a chiller) lowers the condensing pressure and so the
work and the number of stages: :func:`cooling_tradeoff` tabulates that.

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

from co2routes.thermo._lazy import coolprop
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
                   cooled_temperature_k: float | None = None) -> StageResult:
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

    Valid for the vapour region of CO2 from the triple point to 1100 K (Span & Wagner 1996).

    >>> st = compress_stage(1, 101325.0, 298.15, 600000.0, 0.7, cooled_temperature_k=298.15)
    >>> round(st.isentropic_work_j_per_kg / 1e3, 1), round(st.discharge_temperature_k - 273.15)
    (121.2, 212)
    """
    require_fraction("efficiency", efficiency)
    CP = coolprop()
    h1 = CP.PropsSI("H", "P", suction_pressure_pa, "T", suction_temperature_k, FLUID)
    s1 = CP.PropsSI("S", "P", suction_pressure_pa, "T", suction_temperature_k, FLUID)
    d1 = CP.PropsSI("D", "P", suction_pressure_pa, "T", suction_temperature_k, FLUID)
    h2s = CP.PropsSI("H", "P", discharge_pressure_pa, "S", s1, FLUID)
    t2s = CP.PropsSI("T", "P", discharge_pressure_pa, "S", s1, FLUID)
    w_s = h2s - h1
    w = w_s / efficiency
    h2 = h1 + w
    if h2 > CP.PropsSI("H", "P", discharge_pressure_pa, "T", 1100.0, FLUID):  # the data's top, see above
        raise InputError("efficiency", "is too low for this pressure ratio: the discharge would pass "
                         "1100 K, beyond the property data (Span & Wagner 1996)", got=f"{efficiency:.0%}")
    t2 = CP.PropsSI("T", "P", discharge_pressure_pa, "H", h2, FLUID)
    h2_state = CP.PropsSI("H", "P", discharge_pressure_pa, "T", t2, FLUID)
    if cooled_temperature_k is None:
        cooler = "condenser"
        from co2routes.thermo.co2 import saturation_at_pressure

        sat = saturation_at_pressure(discharge_pressure_pa)
        h_out, t_out = sat.liquid_enthalpy_j_kg, sat.temperature_k
    else:
        cooler = "intercooler"
        t_out = cooled_temperature_k
        h_out = CP.PropsSI("H", "P", discharge_pressure_pa, "T", t_out, FLUID)
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


def _saturation(temperature_k: float):
    from co2routes.thermo import co2

    return co2.saturation_at_temperature(temperature_k)


def _check_condensing(temperature_k: float, field: str) -> None:
    from co2routes.thermo import co2

    if temperature_k >= co2.CRITICAL_TEMPERATURE_K:
        raise InputError(
            field,
            f"must be below the critical temperature of CO2, "
            f"{co2.CRITICAL_TEMPERATURE_K - 273.15:.1f} degC: above it CO2 does not condense at any "
            "pressure; cool the receiving cylinder (ice bath, chiller) below it",
            got=f"{temperature_k - 273.15:.1f} degC",
        )
    if temperature_k <= co2.TRIPLE_TEMPERATURE_K:
        raise InputError(
            field,
            f"must be above the triple point of CO2, {co2.TRIPLE_TEMPERATURE_K - 273.15:.1f} "
            f"degC ({co2.TRIPLE_PRESSURE_PA / 1e5:.2f} bar): below it the gas deposits as "
            "solid, not liquid",
            got=f"{temperature_k - 273.15:.1f} degC",
        )


def liquefy(inlet_pressure_pa: float, inlet_temperature_k: float, condensing_temperature_k: float,
            *, stages: int | None = None, efficiency: float = DEFAULT_ISENTROPIC_EFFICIENCY,
            intercool_temperature_k: float | None = None, displacement_m3_s: float | None = None,
            volumetric_efficiency: float | None = None, mass_kg: float | None = None,
            ) -> LiquefactionResult:
    """Compress CO2 gas in stages and condense it to saturated liquid.

    The condensing pressure is the saturation pressure at the condensing temperature
    (:func:`co2routes.thermo.co2.saturation_at_temperature`); stage pressures follow
    :func:`stage_pressures`; each stage is :func:`compress_stage`. Total work
    ``W = sum(w_i)``, heat rejected ``Q = sum(q_i)``; overall ``W - Q = h_liq(T_c) - h_in``.

    Parameters
    ----------
    inlet_pressure_pa, inlet_temperature_k : float
        Gas state drawn in [Pa], [K]; must be vapour below the condensing pressure.
    condensing_temperature_k : float
        Temperature of the receiver / condenser [K], between the triple point (216.59 K) and the
        critical point (304.13 K).
    stages : int or None
        Number of stages; ``None`` picks the fewest within :data:`MAX_STAGE_PRESSURE_RATIO` whose
        discharge stays at or below :data:`MAX_DISCHARGE_K` (at most :data:`MAX_AUTO_STAGES`).
    efficiency : float
        Isentropic efficiency of every stage, in (0, 1] [-].
    intercool_temperature_k : float or None
        Gas temperature after each intercooler [K]; default the inlet temperature.
    displacement_m3_s, volumetric_efficiency, mass_kg : float or None
        First-stage swept volume rate [m3/s], its volumetric efficiency [-] and a batch mass [kg],
        for the batch time ``t = m / m_dot``.

    Raises
    ------
    InputError
        Condensing temperature outside the liquid range, a stage ratio above 6, efficiency
        outside (0, 1], inlet not vapour, inlet pressure at or above the condensing pressure.

    Sources: Span & Wagner (1996) J. Phys. Chem. Ref. Data 25, 1509 (through CoolProp); limits
    marked common practice in the module notes.

    >>> r = liquefy(101325.0, 298.15, 273.15, efficiency=0.7)
    >>> len(r.stages), round(r.condensing_pressure_pa / 1e5, 2), round(r.work_j_per_kg / 1e3)
    (3, 34.85, 316)
    >>> round(r.discharge_temperature_k - 273.15), r.warnings
    (145, ())
    """
    require_positive("inlet pressure", inlet_pressure_pa)
    require_positive("inlet temperature", inlet_temperature_k)
    require_fraction("efficiency", efficiency)
    _check_condensing(condensing_temperature_k, "condensing temperature")
    from co2routes.thermo import co2

    p_cond = _saturation(condensing_temperature_k).pressure_pa
    if inlet_pressure_pa >= p_cond:
        raise InputError(
            "inlet pressure",
            f"must be below the condensing pressure {p_cond / 1e5:.2f} bar at "
            f"{condensing_temperature_k - 273.15:.1f} degC; no compression is needed",
            got=f"{inlet_pressure_pa / 1e5:.2f} bar",
        )
    _require_vapour(inlet_pressure_pa, inlet_temperature_k, "inlet temperature")
    t_ic = inlet_temperature_k if intercool_temperature_k is None else intercool_temperature_k
    require_positive("intercool temperature", t_ic)
    if t_ic <= co2.TRIPLE_TEMPERATURE_K:
        raise InputError("intercool temperature", "must be above the triple point, -56.6 degC",
                         got=f"{t_ic - 273.15:.1f} degC")
    if stages is None:
        # Fewest stages within the ratio limit whose discharge stays under the oil limit.
        n = minimum_stages(inlet_pressure_pa, p_cond)
        results, warnings = _run_stages(inlet_pressure_pa, inlet_temperature_k, p_cond, n,
                                        efficiency, t_ic)
        while (n < MAX_AUTO_STAGES
               and max(s.discharge_temperature_k for s in results) > MAX_DISCHARGE_K):
            n += 1
            results, warnings = _run_stages(inlet_pressure_pa, inlet_temperature_k, p_cond, n,
                                            efficiency, t_ic)
    else:
        n = int(stages)
        if n < 1 or n != stages:
            raise InputError("stages", "must be a whole number of 1 or more", got=stages)
        ratio = (p_cond / inlet_pressure_pa) ** (1.0 / n)
        if ratio > MAX_STAGE_PRESSURE_RATIO:
            need = minimum_stages(inlet_pressure_pa, p_cond)
            raise InputError(
                "stages",
                f"{n} stage(s) need a pressure ratio of {ratio:.1f} per stage, above the limit of "
                f"{MAX_STAGE_PRESSURE_RATIO:g} (common practice for small reciprocating "
                f"compressors, about 4-6 per stage); use at least {need} stages",
                got=n,
            )
        results, warnings = _run_stages(inlet_pressure_pa, inlet_temperature_k, p_cond, n,
                                        efficiency, t_ic)
    flow = time_s = None
    if displacement_m3_s is not None:
        if volumetric_efficiency is None:
            volumetric_efficiency = DEFAULT_VOLUMETRIC_EFFICIENCY
            warnings.append(
                f"Volumetric efficiency not given: {DEFAULT_VOLUMETRIC_EFFICIENCY:.0%} assumed "
                "(common practice for a small reciprocating compressor).")
        flow = mass_flow_kg_s(displacement_m3_s, volumetric_efficiency,
                              results[0].suction_density_kg_m3)
        if mass_kg is not None:
            time_s = require_positive("mass", mass_kg) / flow
    q_ic = sum(s.heat_rejected_j_per_kg for s in results[:-1])
    return LiquefactionResult(
        inlet_pressure_pa=inlet_pressure_pa,
        inlet_temperature_k=inlet_temperature_k,
        condensing_temperature_k=condensing_temperature_k,
        condensing_pressure_pa=p_cond,
        isentropic_efficiency=efficiency,
        stages=tuple(results),
        isentropic_work_j_per_kg=sum(s.isentropic_work_j_per_kg for s in results),
        work_j_per_kg=sum(s.work_j_per_kg for s in results),
        intercooler_heat_j_per_kg=q_ic,
        condenser_heat_j_per_kg=results[-1].heat_rejected_j_per_kg,
        heat_rejected_j_per_kg=q_ic + results[-1].heat_rejected_j_per_kg,
        discharge_temperature_k=max(s.discharge_temperature_k for s in results),
        mass_flow_kg_s=flow,
        batch_time_s=time_s,
        warnings=tuple(warnings),
    )


def _run_stages(p_first: float, t_first: float, p_cond: float, n: int, efficiency: float,
                t_ic: float) -> tuple[list[StageResult], list[str]]:
    """The ``n`` stages from the inlet to the condenser, with their warnings."""
    warnings: list[str] = []
    ratio = (p_cond / p_first) ** (1.0 / n)
    if ratio > HIGH_STAGE_PRESSURE_RATIO:
        warnings.append(
            f"Pressure ratio {ratio:.1f} per stage is at the top of the usual 4-6 range for small "
            "reciprocating compressors (common practice); another stage runs cooler.")
    results: list[StageResult] = []
    p_in, t_in = p_first, t_first
    for i, p_out in enumerate(stage_pressures(p_first, p_cond, n), start=1):
        cooled = None
        if i < n:
            cooled = t_ic
            dew = _dew_temperature(p_out)
            if dew is not None and cooled <= dew + 0.5:
                cooled = dew + 0.5
                warnings.append(
                    f"Stage {i} intercooler held at {cooled - 273.15:.1f} degC, just above the dew "
                    f"point at {p_out / 1e5:.1f} bar: liquid must not reach the next stage.")
        st = compress_stage(i, p_in, t_in, p_out, efficiency, cooled_temperature_k=cooled)
        if st.discharge_temperature_k > MAX_DISCHARGE_K:
            warnings.append(
                f"Stage {i} discharge reaches {st.discharge_temperature_k - 273.15:.0f} degC, above "
                f"{MAX_DISCHARGE_K - 273.15:.0f} degC where compressor oil breaks down (common "
                "practice): add a stage or cool the suction.")
        results.append(st)
        p_in, t_in = p_out, st.cooled_temperature_k
    return results, warnings


def cooling_tradeoff(inlet_pressure_pa: float, inlet_temperature_k: float, *,
                     temperatures_k: tuple[float, ...] = TRADEOFF_TEMPERATURES_K,
                     stages: int | None = None,
                     efficiency: float = DEFAULT_ISENTROPIC_EFFICIENCY,
                     intercool_temperature_k: float | None = None) -> tuple[TradeoffRow, ...]:
    """Condensing pressure, stages and work against the receiver's temperature.

    For each condensing temperature below the critical point whose saturation pressure is above
    the inlet pressure, runs :func:`liquefy` with ``stages`` if that stays within
    :data:`MAX_STAGE_PRESSURE_RATIO`, else lets it choose the stages. Colder receivers need
    less pressure and less work but must take the condenser heat away at a lower temperature.

    Parameters
    ----------
    inlet_pressure_pa, inlet_temperature_k : float
        Gas state drawn in [Pa], [K].
    temperatures_k : tuple of float
        Condensing temperatures to tabulate [K].
    stages, efficiency, intercool_temperature_k
        As in :func:`liquefy`.

    Source: saturation pressures of Span & Wagner (1996); rule of thumb (common practice) that a
    receiver at 0 degC condenses CO2 at about 35 bar where room temperature needs about 64 bar.

    >>> rows = cooling_tradeoff(101325.0, 298.15, temperatures_k=(273.15, 298.15))
    >>> [round(r.condensing_pressure_pa / 1e5, 1) for r in rows]
    [34.9, 64.3]
    """
    rows: list[TradeoffRow] = []
    for t in sorted(set(temperatures_k)):
        try:
            _check_condensing(t, "condensing temperature")
            p = _saturation(t).pressure_pa
        except InputError:
            continue
        if p <= inlet_pressure_pa:
            continue
        n = stages
        if n is not None and (p / inlet_pressure_pa) ** (1.0 / n) > MAX_STAGE_PRESSURE_RATIO:
            n = None
        r = liquefy(inlet_pressure_pa, inlet_temperature_k, t, stages=n, efficiency=efficiency,
                    intercool_temperature_k=intercool_temperature_k)
        rows.append(TradeoffRow(
            condensing_temperature_k=t,
            condensing_pressure_pa=p,
            stages=len(r.stages),
            pressure_ratio=r.stages[0].pressure_ratio,
            work_j_per_kg=r.work_j_per_kg,
            discharge_temperature_k=r.discharge_temperature_k,
            condenser_heat_j_per_kg=r.condenser_heat_j_per_kg,
        ))
    return tuple(rows)


def _dew_temperature(pressure_pa: float) -> float | None:
    """Saturation temperature at ``pressure_pa`` [K], or None outside the liquid-vapour range."""
    from co2routes.thermo import co2

    if not (co2.TRIPLE_PRESSURE_PA <= pressure_pa < co2.CRITICAL_PRESSURE_PA):
        return None
    return co2.saturation_at_pressure(pressure_pa).temperature_k


def _require_vapour(pressure_pa: float, temperature_k: float, field: str) -> None:
    """Refuse an inlet state that is liquid or solid."""
    dew = _dew_temperature(pressure_pa)
    if dew is not None and temperature_k <= dew:
        raise InputError(field, f"must be above the dew point {dew - 273.15:.1f} degC at "
                         f"{pressure_pa / 1e5:.2f} bar so the compressor draws gas",
                         got=f"{temperature_k - 273.15:.1f} degC")
    from co2routes.thermo import co2

    if temperature_k <= co2.TRIPLE_TEMPERATURE_K:
        raise InputError(field, "must be above the triple point, -56.6 degC, where the equation of "
                         "state starts (Span & Wagner 1996)", got=f"{temperature_k - 273.15:.1f} degC")

"""Liquefying CO2 as a whole: the stages from the inlet to the condenser, and the cooling trade-off.

One stage, the limits (common practice) and the result types are in
:mod:`co2routes.thermo.compression`, whose module text states the model; states from the Span &
Wagner (1996) equation of state through CoolProp.
"""

from __future__ import annotations

from co2routes.thermo.compression import (
    DEFAULT_ISENTROPIC_EFFICIENCY,
    DEFAULT_VOLUMETRIC_EFFICIENCY,
    HIGH_STAGE_PRESSURE_RATIO,
    MAX_AUTO_STAGES,
    MAX_DISCHARGE_K,
    MAX_STAGE_PRESSURE_RATIO,
    TRADEOFF_TEMPERATURES_K,
    LiquefactionResult,
    StageResult,
    TradeoffRow,
    compress_stage,
    mass_flow_kg_s,
    minimum_stages,
    stage_pressures,
)
from co2routes.thermo.errors import InputError, require_fraction, require_positive


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
            plan: bool = True, condensing_pressure_pa: float | None = None) -> LiquefactionResult:
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
    condensing_pressure_pa : float or None
        The condenser's pressure [Pa] when it must be above the saturation pressure: a gas that
        carries air condenses whole only at its bubble pressure
        (:func:`co2routes.thermo.condensing.bubble_point`); the liquid then leaves subcooled at
        the condensing temperature. The stages compress CO2's own properties (the air's share of
        the work, a few per cent of the gas, is left out).
    plan : bool
        True (a plan): a stage ratio above :data:`MAX_STAGE_PRESSURE_RATIO` is refused. False (a
        question about a state): it is computed and carries a warning with its discharge
        temperature.

    Raises
    ------
    InputError
        Condensing temperature outside the liquid range, a stage ratio above 6 (plans only),
        efficiency outside (0, 1], inlet not vapour, inlet pressure at or above the condensing
        pressure, an intercooler set above the gas it should cool.

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

    p_sat = _saturation(condensing_temperature_k).pressure_pa
    p_cond = p_sat
    if condensing_pressure_pa is not None:
        if not condensing_pressure_pa >= p_sat:
            raise InputError("condensing pressure", f"must be at least the saturation pressure "
                             f"{p_sat / 1e5:.2f} bar at {condensing_temperature_k - 273.15:.1f} degC",
                             got=f"{condensing_pressure_pa / 1e5:.2f} bar")
        p_cond = condensing_pressure_pa
    t_liquid = condensing_temperature_k if p_cond > p_sat * (1.0 + 1e-6) else None
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
    warm_intercooler = (f"The intercoolers are set to {t_ic - 273.15:.0f} degC, warmer than the gas drawn "
                        f"in ({inlet_temperature_k - 273.15:.0f} degC): every later stage then runs "
                        "hotter and takes more work than with cooling to the inlet temperature."
                        if t_ic > inlet_temperature_k + 0.5 else None)
    if stages is None:
        # Fewest stages within the ratio limit whose discharge stays under the oil limit.
        n = minimum_stages(inlet_pressure_pa, p_cond)
        results, warnings = _run_stages(inlet_pressure_pa, inlet_temperature_k, p_cond, n,
                                        efficiency, t_ic, t_liquid)
        while (n < MAX_AUTO_STAGES
               and max(s.discharge_temperature_k for s in results) > MAX_DISCHARGE_K):
            n += 1
            results, warnings = _run_stages(inlet_pressure_pa, inlet_temperature_k, p_cond, n,
                                            efficiency, t_ic, t_liquid)
    else:
        n = int(stages)
        if n < 1 or n != stages:
            raise InputError("stages", "must be a whole number of 1 or more", got=stages)
        ratio = (p_cond / inlet_pressure_pa) ** (1.0 / n)
        need = minimum_stages(inlet_pressure_pa, p_cond)
        too_high = (f"{n} stage(s) need a pressure ratio of {ratio:.1f} per stage, above the limit of "
                    f"{MAX_STAGE_PRESSURE_RATIO:g} (common practice for small reciprocating "
                    f"compressors, about 4-6 per stage); use at least {need} stages")
        if ratio > MAX_STAGE_PRESSURE_RATIO and plan:
            raise InputError("stages", too_high, got=n)
        results, warnings = _run_stages(inlet_pressure_pa, inlet_temperature_k, p_cond, n,
                                        efficiency, t_ic, t_liquid)
        if ratio > MAX_STAGE_PRESSURE_RATIO:
            t_max = max(s.discharge_temperature_k for s in results)
            warnings.insert(0, f"{too_high[0].upper()}{too_high[1:]}: the discharge would reach "
                               f"{t_max - 273.15:.0f} degC, and a real machine of this kind "
                               "cannot hold that ratio.")
    if warm_intercooler and len(results) > 1:
        warnings.append(warm_intercooler)
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
                t_ic: float, t_liquid: float | None = None) -> tuple[list[StageResult], list[str]]:
    """The ``n`` stages from the inlet to the condenser, with their warnings (``t_liquid``: the
    condenser's liquid leaves subcooled at this temperature, see :func:`liquefy`)."""
    warnings: list[str] = []
    ratio = (p_cond / p_first) ** (1.0 / n)
    if HIGH_STAGE_PRESSURE_RATIO < ratio <= MAX_STAGE_PRESSURE_RATIO:
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
        st = compress_stage(i, p_in, t_in, p_out, efficiency, cooled_temperature_k=cooled,
                            liquid_temperature_k=t_liquid if i == n else None)
        if cooled is not None and cooled > st.discharge_temperature_k:
            raise InputError("intercool temperature", f"must be below stage {i}'s discharge "
                             f"temperature, {st.discharge_temperature_k - 273.15:.0f} degC: an "
                             "intercooler only cools the gas", got=f"{cooled - 273.15:.1f} degC")
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

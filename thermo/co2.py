"""Carbon dioxide states: fixed points, saturation, phase, and what a closed vessel holds.

Properties come from the Span & Wagner (1996) reference equation of state through CoolProp.
Span, R.; Wagner, W. (1996) "A New Equation of State for Carbon Dioxide Covering the Fluid Region
from the Triple-Point Temperature to 1100 K at Pressures up to 800 MPa", J. Phys. Chem. Ref. Data
25, 1509-1596.
"""

from __future__ import annotations

import math
from dataclasses import dataclass

from co2routes.thermo.errors import InputError, require_positive

#: Triple-point temperature [K] (Span & Wagner 1996, Sec. 3.1).
TRIPLE_TEMPERATURE_K = 216.592
#: Triple-point pressure [Pa] (Span & Wagner 1996, Sec. 3.1: 0.51795 MPa).
TRIPLE_PRESSURE_PA = 0.51795e6
#: Critical temperature [K] (Span & Wagner 1996, Sec. 3.1).
CRITICAL_TEMPERATURE_K = 304.1282
#: Critical pressure [Pa] (Span & Wagner 1996, Sec. 3.1: 7.3773 MPa).
CRITICAL_PRESSURE_PA = 7.3773e6
#: Molar mass [kg/mol] (NIST Chemistry WebBook, carbon dioxide: 44.0095 g/mol).
MOLAR_MASS = 0.0440095
#: Normal sublimation temperature at 101325 Pa [K] (Span & Wagner 1996: 194.686 K; their
#: sublimation-pressure equation 3.12 gives 101325 Pa at 194.685 K).
NORMAL_SUBLIMATION_K = 194.686
#: One standard atmosphere [Pa].
ATMOSPHERE_PA = 101325.0
#: Upper limits of the Span & Wagner (1996) equation [K], [Pa].
MAX_TEMPERATURE_K = 1100.0
MAX_PRESSURE_PA = 800e6
#: Relative distance from the saturation pressure inside which a (P, T) pair is taken to lie on
#: the saturation line, where a vessel's content cannot be told from P and T alone.
SATURATION_TOLERANCE = 1e-4

_FLUID = "CO2"


@dataclass(frozen=True, slots=True)
class Saturation:
    """A point on the liquid-vapour saturation line of CO2.

    Temperature [K], pressure [Pa], saturated liquid and vapour densities [kg/m3], their specific
    enthalpies [J/kg] (CoolProp's default reference for CO2: 200 kJ/kg for saturated liquid at
    0 degC, as in the NIST WebBook tables) and the enthalpy of vaporization [J/kg].
    """

    temperature_k: float
    pressure_pa: float
    liquid_density_kg_m3: float
    vapor_density_kg_m3: float
    liquid_enthalpy_j_kg: float
    vapor_enthalpy_j_kg: float
    enthalpy_of_vaporization_j_kg: float


@dataclass(frozen=True, slots=True)
class VesselState:
    """What a closed vessel of CO2 holds at one temperature.

    ``volume_m3`` internal volume (= water capacity) [m3]; ``temperature_k`` [K]; ``pressure_pa``
    [Pa]; ``co2_mass_kg`` [kg]; ``phase`` one of 'gas', 'liquid' (liquid-full), 'two-phase'
    (liquid under its vapour), 'supercritical'; ``fill_density_kg_l`` CO2 mass per litre of water
    capacity [kg/L] (the filling ratio); ``liquid_volume_fraction`` share of the volume that is
    liquid (0 gas, 1 liquid-full, ``None`` supercritical); ``density_kg_m3`` mean density
    [kg/m3]; ``vapor_quality`` vapour mass fraction (two-phase only, else ``None``);
    ``warnings`` sentences about the state.
    """

    volume_m3: float
    temperature_k: float
    pressure_pa: float
    co2_mass_kg: float
    phase: str
    fill_density_kg_l: float
    liquid_volume_fraction: float | None
    density_kg_m3: float
    vapor_quality: float | None
    warnings: tuple[str, ...] = ()


_BELOW_TRIPLE = ("is below the triple point (216.592 K, -56.56 degC): below it CO2 has no liquid, "
                 "only solid and vapour")
_ABOVE_CRITICAL = ("is above the critical point (304.1282 K, 7.3773 MPa): above it there is no "
                   "distinct liquid and vapour")


def _props(output: str, name1: str, value1: float, name2: str, value2: float) -> float:
    from co2routes.thermo.coolprop_safe import props

    return props(output, name1, value1, name2, value2, _FLUID)


def saturation_at_temperature(temperature_k: float) -> Saturation:
    """Saturated liquid and vapour of CO2 at temperature T.

    p_sat(T), rho_l(T), rho_v(T), h_l(T), h_v(T) from the Span & Wagner (1996) equation of state
    (CoolProp, ``Q=0`` and ``Q=1``); Delta h_vap = h_v - h_l.

    Parameters
    ----------
    temperature_k : float
        Temperature [K], 216.592 K (triple point) to 304.1282 K (critical point).

    Raises
    ------
    InputError
        Below the triple point (no liquid exists) or above the critical point (no distinct
        liquid).

    Source: Span & Wagner (1996) J. Phys. Chem. Ref. Data 25, 1509; NIST Chemistry WebBook
    (0 degC: 3.4851 MPa, 927.4 and 97.65 kg/m3).

    >>> s = saturation_at_temperature(273.15)
    >>> round(s.pressure_pa / 1e6, 4), round(s.liquid_density_kg_m3, 1), round(s.vapor_density_kg_m3, 2)
    (3.4851, 927.4, 97.65)
    """
    t = float(temperature_k)
    if not t >= TRIPLE_TEMPERATURE_K:
        raise InputError("temperature", "must be at or above 216.592 K; it " + _BELOW_TRIPLE, got=t)
    if not t <= CRITICAL_TEMPERATURE_K:
        raise InputError("temperature", "must be at or below 304.1282 K; it " + _ABOVE_CRITICAL, got=t)
    p = _props("P", "T", t, "Q", 0)
    rho_l = _props("D", "T", t, "Q", 0)
    rho_v = _props("D", "T", t, "Q", 1)
    h_l = _props("H", "T", t, "Q", 0)
    h_v = _props("H", "T", t, "Q", 1)
    return Saturation(t, p, rho_l, rho_v, h_l, h_v, h_v - h_l)


def saturation_at_pressure(pressure_pa: float) -> Saturation:
    """Saturated liquid and vapour of CO2 at pressure P (its boiling temperature T_sat(P)).

    T_sat(P) from the Span & Wagner (1996) equation (CoolProp ``PropsSI('T','P',P,'Q',0)``),
    then :func:`saturation_at_temperature`.

    Parameters
    ----------
    pressure_pa : float
        Pressure [Pa], 0.51795 MPa (triple point) to 7.3773 MPa (critical point).

    Raises
    ------
    InputError
        Below the triple-point pressure (no liquid) or above the critical pressure.

    Source: Span & Wagner (1996); NIST Chemistry WebBook.

    >>> round(saturation_at_pressure(3.4851e6).temperature_k, 2)
    273.15
    """
    p = float(pressure_pa)
    if not p >= TRIPLE_PRESSURE_PA:
        raise InputError("pressure", "must be at or above 0.51795 MPa (5.18 bar); it " + _BELOW_TRIPLE,
                         got=p)
    if not p <= CRITICAL_PRESSURE_PA:
        raise InputError("pressure", "must be at or below 7.3773 MPa (73.8 bar); it " + _ABOVE_CRITICAL,
                         got=p)
    from co2routes.thermo._lazy import coolprop

    cp = coolprop()
    p_triple_eos = cp.PropsSI("ptriple", _FLUID)  # the equation's own triple pressure, 14 Pa higher
    p_crit_eos = cp.PropsSI("pcrit", _FLUID)
    if p <= p_triple_eos:
        return saturation_at_temperature(TRIPLE_TEMPERATURE_K)
    t = float(cp.PropsSI("T", "P", min(p, p_crit_eos), "Q", 0, _FLUID))
    return saturation_at_temperature(min(max(t, TRIPLE_TEMPERATURE_K), CRITICAL_TEMPERATURE_K))


def sublimation_pressure(temperature_k: float) -> float:
    """Pressure of CO2 vapour over dry ice [Pa], Span & Wagner (1996) eq. 3.12.

    ln(p_sub / p_t) = (T_t / T) [a1 (1 - T/T_t) + a2 (1 - T/T_t)^1.9 + a3 (1 - T/T_t)^2.9]
    with a1 = -14.740846, a2 = 2.4327015, a3 = -5.3061778, T_t = 216.592 K, p_t = 0.51795 MPa.

    Parameters
    ----------
    temperature_k : float
        Temperature [K], 150 K to 216.592 K (the equation was fitted to data from about 155 K up,
        from memory; its use below that is an extrapolation).

    Source: Span & Wagner (1996) J. Phys. Chem. Ref. Data 25, 1509, eq. 3.12.

    >>> round(sublimation_pressure(194.686))
    101329
    """
    t = float(temperature_k)
    if not (150.0 <= t <= TRIPLE_TEMPERATURE_K):
        raise InputError("temperature", "the sublimation curve is used from 150 K to 216.592 K", got=t)
    th = 1.0 - t / TRIPLE_TEMPERATURE_K
    s = -14.740846 * th + 2.4327015 * th**1.9 - 5.3061778 * th**2.9
    return TRIPLE_PRESSURE_PA * math.exp(TRIPLE_TEMPERATURE_K / t * s)


def sublimation_temperature(pressure_pa: float) -> float:
    """Temperature [K] of dry ice in its own vapour at pressure P: inverse of eq. 3.12.

    Solves :func:`sublimation_pressure` (T) = P by bisection on ln p.

    Parameters
    ----------
    pressure_pa : float
        Pressure [Pa], p_sub(150 K) to 0.51795 MPa.

    Source: Span & Wagner (1996) eq. 3.12.

    >>> round(sublimation_temperature(101325.0), 3)
    194.685
    """
    p = require_positive("pressure", pressure_pa)
    lo, hi = 150.0, TRIPLE_TEMPERATURE_K
    if not (sublimation_pressure(lo) <= p <= TRIPLE_PRESSURE_PA):
        raise InputError("pressure", "the sublimation curve is used from 150 K to the triple point, "
                         f"{sublimation_pressure(lo):.4g} Pa to 0.51795 MPa", got=p)
    ln_p = math.log(p)
    for _ in range(80):
        mid = 0.5 * (lo + hi)
        if math.log(sublimation_pressure(mid)) < ln_p:
            lo = mid
        else:
            hi = mid
    return 0.5 * (lo + hi)


def melting_pressure(temperature_k: float) -> float:
    """Pressure at which liquid (or supercritical) CO2 freezes at temperature T [Pa], S&W eq. 3.10.

    p_m / p_t = 1 + 1955.5390 (T/T_t - 1) + 2055.4593 (T/T_t - 1)^2

    Parameters
    ----------
    temperature_k : float
        Temperature [K], 216.592 K up (the equation of state ends at 800 MPa, about 327 K on this
        curve).

    Source: Span & Wagner (1996) J. Phys. Chem. Ref. Data 25, 1509, eq. 3.10.

    >>> round(melting_pressure(250.0) / 1e6, 1)
    182.1
    """
    t = float(temperature_k)
    if not t >= TRIPLE_TEMPERATURE_K:
        raise InputError("temperature", "the melting curve starts at the triple point, 216.592 K", got=t)
    x = t / TRIPLE_TEMPERATURE_K - 1.0
    return TRIPLE_PRESSURE_PA * (1.0 + 1955.5390 * x + 2055.4593 * x * x)


def phase_at(pressure_pa: float, temperature_k: float) -> str:
    """Phase of CO2 at (P, T): 'gas', 'liquid', 'supercritical', 'solid' or 'two-phase'.

    Below the triple-point temperature: 'solid' at or above the sublimation pressure (eq. 3.12),
    else 'gas'. At or above it: 'solid' at or above the melting pressure (eq. 3.10); above both
    the critical temperature and pressure 'supercritical'; above T_c only, 'gas'; below T_c,
    'liquid' above p_sat(T), 'gas' below, and 'two-phase' within :data:`SATURATION_TOLERANCE`
    (0.01 %) of p_sat, where P and T cannot tell how much is liquid.

    Parameters
    ----------
    pressure_pa : float
        Pressure [Pa], above 0 and up to 800 MPa.
    temperature_k : float
        Temperature [K], 150 K to 1100 K.

    Source: Span & Wagner (1996) eqs. 3.10, 3.12 and the equation of state (CoolProp).

    >>> phase_at(101325.0, 293.15), phase_at(6e6, 293.15), phase_at(101325.0, 190.0)
    ('gas', 'liquid', 'solid')
    >>> phase_at(10e6, 320.0)
    'supercritical'
    """
    p = require_positive("pressure", pressure_pa)
    t = require_positive("temperature", temperature_k)
    if p > MAX_PRESSURE_PA:
        raise InputError("pressure", "must be at most 800 MPa (limit of the Span & Wagner equation)", got=p)
    if t > MAX_TEMPERATURE_K:
        raise InputError("temperature", "must be at most 1100 K (limit of the Span & Wagner equation)",
                         got=t)
    if t < TRIPLE_TEMPERATURE_K:
        return "solid" if p >= sublimation_pressure(t) else "gas"
    if p >= melting_pressure(t):
        return "solid"
    if t >= CRITICAL_TEMPERATURE_K:
        return "supercritical" if p > CRITICAL_PRESSURE_PA else "gas"
    p_sat = _props("P", "T", t, "Q", 0)
    if abs(p - p_sat) <= SATURATION_TOLERANCE * p_sat:
        return "two-phase"
    return "liquid" if p > p_sat else "gas"


def _check_vessel_temperature(temperature_k: float) -> float:
    t = float(require_positive("temperature", temperature_k))
    if t < TRIPLE_TEMPERATURE_K:
        raise InputError("temperature", "a vessel state needs at least 216.592 K: below the triple "
                         "point CO2 is solid or vapour and the equation of state does not apply", got=t)
    if t > MAX_TEMPERATURE_K:
        raise InputError("temperature", "must be at most 1100 K (limit of the Span & Wagner equation)",
                         got=t)
    return t


_LIQUID_FULL = ("The vessel is liquid-full: any further warming raises the pressure very steeply "
                "(hydraulic expansion), with no vapour space to absorb it.")


def _state(volume: float, t: float, p: float, rho: float, phase: str, liquid_fraction,
           quality, warnings=()) -> VesselState:
    mass = rho * volume
    return VesselState(volume, t, p, mass, phase, mass / (volume * 1000.0), liquid_fraction, rho,
                       quality, tuple(warnings))


def vessel_by_pressure(volume_m3: float, pressure_pa: float, temperature_k: float) -> VesselState:
    """State of a vessel of CO2 known by its pressure and temperature (single phase only).

    m = rho(P, T) V with rho from the Span & Wagner (1996) equation (CoolProp, phase imposed
    from :func:`phase_at`).

    Parameters
    ----------
    volume_m3 : float
        Internal volume, i.e. water capacity [m3], above 0.
    pressure_pa : float
        Absolute pressure [Pa], up to 800 MPa.
    temperature_k : float
        Temperature [K], 216.592 to 1100 K.

    Raises
    ------
    InputError
        At the saturation pressure (within 0.01 %): liquid and vapour coexist and P, T alone do
        not say how much is in the vessel; give the mass instead. Also where CO2 would be solid.

    Source: Span & Wagner (1996) J. Phys. Chem. Ref. Data 25, 1509.

    >>> s = vessel_by_pressure(0.1189, 101325.0, 293.15)   # 24 in sphere of room air-pressure CO2
    >>> round(s.co2_mass_kg, 3), s.phase
    (0.219, 'gas')
    """
    v = float(require_positive("volume", volume_m3))
    p = float(require_positive("pressure", pressure_pa))
    t = _check_vessel_temperature(temperature_k)
    phase = phase_at(p, t)
    if phase == "two-phase":
        raise InputError("pressure", "is the saturation pressure at this temperature: liquid and "
                         "vapour coexist and the fill is ambiguous; give the mass instead", got=p)
    if phase == "solid":
        raise InputError("pressure", "at this temperature CO2 would be solid (above its melting "
                         "pressure)", got=p)
    tag = {"gas": "gas", "liquid": "liquid", "supercritical": "supercritical_gas"}[phase]
    if phase == "gas" and t >= CRITICAL_TEMPERATURE_K:
        tag = "supercritical_gas"
    rho = _props("D", "T", t, f"P|{tag}", p)
    if phase == "liquid":
        return _state(v, t, p, rho, "liquid", 1.0, None, (_LIQUID_FULL,))
    if phase == "supercritical":
        return _state(v, t, p, rho, "supercritical", None, None)
    return _state(v, t, p, rho, "gas", 0.0, None)


def vessel_by_mass(volume_m3: float, mass_kg: float, temperature_k: float) -> VesselState:
    """State of a closed vessel holding a known mass of CO2 at temperature T, in every region.

    rho = m / V. Below T_c: if rho <= rho_v,sat(T) the vessel holds gas and P = P(rho, T); if
    rho >= rho_l,sat(T) it is liquid-full and P = P(rho, T) (CoolProp ``PropsSI('P','D',rho,'T',T)``);
    between, liquid lies under its vapour at P = p_sat(T), with vapour quality
    x = (1/rho - 1/rho_l) / (1/rho_v - 1/rho_l) and liquid volume fraction
    (rho - rho_v) / (rho_l - rho_v). At or above T_c: P = P(rho, T), 'supercritical' above p_c.

    Parameters
    ----------
    volume_m3 : float
        Internal volume, i.e. water capacity [m3], above 0.
    mass_kg : float
        CO2 mass [kg], above 0.
    temperature_k : float
        Temperature [K], 216.592 to 1100 K.

    Raises
    ------
    InputError
        If the resulting pressure would freeze the CO2 (above the melting pressure) or exceed
        800 MPa.

    Source: Span & Wagner (1996) J. Phys. Chem. Ref. Data 25, 1509.

    >>> s = vessel_by_mass(0.0134, 9.0, 293.15)   # 9 kg in a 13.4 L cylinder at 20 degC
    >>> s.phase, round(s.pressure_pa / 1e5, 2), round(s.fill_density_kg_l, 3)
    ('two-phase', 57.29, 0.672)
    """
    v = float(require_positive("volume", volume_m3))
    m = float(require_positive("mass", mass_kg))
    t = _check_vessel_temperature(temperature_k)
    rho = m / v
    warnings: list[str] = []
    if t < CRITICAL_TEMPERATURE_K:
        sat = saturation_at_temperature(t)
        if sat.vapor_density_kg_m3 < rho < sat.liquid_density_kg_m3:
            lvf = (rho - sat.vapor_density_kg_m3) / (sat.liquid_density_kg_m3 - sat.vapor_density_kg_m3)
            x = (1 / rho - 1 / sat.liquid_density_kg_m3) / (
                1 / sat.vapor_density_kg_m3 - 1 / sat.liquid_density_kg_m3)
            return _state(v, t, sat.pressure_pa, rho, "two-phase", lvf, x)
        phase = "gas" if rho <= sat.vapor_density_kg_m3 else "liquid"
    else:
        phase = "supercritical"
    try:
        p = _props("P", "D", rho, "T", t)
    except ValueError:
        p = math.inf
    if not (0.0 < p <= MAX_PRESSURE_PA) or (p >= melting_pressure(t)):
        raise InputError("mass", f"{m:.6g} kg in {v * 1000:.6g} L is too dense at this temperature: "
                         "the CO2 would freeze or pass 800 MPa", got=m)
    if phase == "supercritical":
        if p <= CRITICAL_PRESSURE_PA:
            return _state(v, t, p, rho, "gas", 0.0, None)
        return _state(v, t, p, rho, "supercritical", None, None)
    if phase == "liquid":
        warnings.append(_LIQUID_FULL)
        return _state(v, t, p, rho, "liquid", 1.0, None, warnings)
    return _state(v, t, p, rho, "gas", 0.0, None)


def density_at(pressure_pa: float, temperature_k: float) -> float:
    """Density of single-phase CO2 [kg/m3] at (P, T), Span & Wagner (1996) via CoolProp.

    rho(P, T) with the phase from :func:`phase_at`; refused on the saturation line and in the
    solid.

    Parameters
    ----------
    pressure_pa : float
        Pressure [Pa], up to 800 MPa.
    temperature_k : float
        Temperature [K], 216.592 to 1100 K.

    Source: Span & Wagner (1996).

    >>> round(density_at(101325.0, 293.15), 3)
    1.839
    """
    return vessel_by_pressure(1.0, pressure_pa, temperature_k).density_kg_m3

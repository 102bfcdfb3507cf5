"""Water in gaseous, liquid and supercritical CO2 at any pressure: the Spycher et al. (2003) model.

Spycher, N.; Pruess, K.; Ennis-King, J. (2003) "CO2-H2O mixtures in the geological sequestration
of CO2. I. Assessment and calculation of mutual solubilities from 12 to 100 degC and up to
600 bar", Geochim. Cosmochim. Acta 67, 3015-3031 (eqs. 1-14, Tables 1-2). Water in the CO2-rich
phase in equilibrium with liquid water (their eq. 11-13, pure water, no salt):

    y_H2O = (1 - B) / (1/A - B)
    A = f0_H2O / (phi_H2O P) exp((P - p0) V_H2O / (R T))
    B = phi_CO2 P / (55.508 K0_CO2) exp(-(P - p0) V_CO2 / (R T))

with phi from the Redlich-Kwong equation (their eqs. 2-5, water at infinite dilution in CO2):
a_CO2 = 7.54e7 - 4.13e4 T, a_H2O-CO2 = 7.89e7 [bar cm6 K^0.5 mol^-2], b_CO2 = 27.80,
b_H2O = 18.18 [cm3/mol]; V_H2O = 18.1, V_CO2 = 32.6 [cm3/mol] (average partial molar volumes);
log10 K0_CO2 = 1.189 + 1.304e-2 t - 5.446e-5 t^2 (gas), 1.169 + 1.368e-2 t - 5.380e-5 t^2
(liquid CO2), t in degC. The Redlich-Kwong volume root is the one nearest CoolProp's CO2 molar
volume (Span & Wagner 1996), so the CO2 phase (gas, liquid, supercritical) is CoolProp's.

Two changes for water in gaseous and near-critical CO2, both stated and tested against measured
data: (1) phi_H2O is evaluated at CoolProp's CO2 molar volume, not at the Redlich-Kwong root,
which is far off near the critical point (phi_CO2 and so the CO2 in water stay as published);
(2) a_H2O-CO2 goes over from Spycher's dense-CO2 value to a value fitted to gaseous CO2 (Meyer
& Harvey 2015) as the CO2 density falls below its critical density (:func:`a_h2o_co2`). With
the published constants alone, water in gaseous CO2 near its condensation pressure runs up to
12 % below Meyer & Harvey's measurements (21.7 degC, 50 bar) and 16 % below Jooss et al.'s
(35 degC, 60-70 bar); with the changes every measured point 15-40 degC up to 200 bar in
the tests lies within 10 % (Meyer & Harvey 2015; King et al. 1992; Jooss et al. 2026).

One substitution, stated: Spycher's fitted water constant K0_H2O(t) at p0 = 1 bar is replaced by
the vapour pressure of water (IAPWS-95; over ice below 273.16 K, Murphy & Koop 2005) with the
Poynting factor taken from that vapour pressure, f0_H2O = p_sat, p0 = p_sat. Their fit
(log10 K0_H2O = -2.209 + 3.097e-2 t - 1.098e-4 t^2 + 2.048e-7 t^3) is the same quantity and
agrees with IAPWS-95 within 0.3 % from 12 to 40 degC (:func:`spycher_k0_h2o_bar`); the
substitution keeps the result continuous with the ideal-mixing value p_sat / P at 1 atm (the
enhancement there is about +0.5 %) and defined below 12 degC for dew and frost points.
Over ice the condensed water is pure ice (no CO2 in it, x_H2O = 1) with V_ice = 19.65 cm3/mol
(IAPWS 2006 ice Ih, 1.0908e-3 m3/kg at 0 degC).

Valid range: 12-100 degC and up to 600 bar as fitted by Spycher et al.; below 12 degC (dew and
frost points) it is an extrapolation of the same equations, and below about 10 degC above
about 12 bar CO2 hydrate can form instead of water or ice (Sloan & Koh 2008, Clathrate Hydrates
of Natural Gases, 3rd ed., CO2 hydrate curve), which this model does not treat.
"""

from __future__ import annotations

import math
from functools import lru_cache
from dataclasses import dataclass

from co2routes.thermo.co2 import MOLAR_MASS as CO2_MOLAR_MASS
from co2routes.thermo.errors import InputError, require_positive
from co2routes.thermo.water import WATER_TRIPLE_K, vapor_pressure

#: Gas constant [bar cm3 / (mol K)].
R_BAR_CM3 = 83.1447
#: Redlich-Kwong parameters of Spycher et al. (2003) Table 1.
B_CO2 = 27.80
B_H2O = 18.18
A_H2O_CO2 = 7.89e7
#: Water-CO2 attraction in gaseous CO2 [bar cm6 K^0.5 mol^-2] at 303.15 K and its slope per K:
#: least squares on the measured water content of Meyer & Harvey (2015), Table 2 (see a_h2o_co2).
A_H2O_CO2_GAS_303 = 8.686e7
A_H2O_CO2_GAS_SLOPE = -2.180e5
#: Temperatures the gas-side constants were fitted over [K]; outside they are held at the ends.
GAS_FIT_T_RANGE_K = (294.83, 313.15)
#: The dense value holds above, the gas value below, the critical density of CO2 [kg/m3]
#: (Span & Wagner 1996: 467.6); the exponent sets how sharp the change is.
BLEND_DENSITY_KG_M3 = 467.6
BLEND_EXPONENT = 6.0
#: Average partial molar volumes [cm3/mol], Spycher et al. (2003) Table 2; ice Ih (IAPWS 2006).
V_H2O = 18.1
V_CO2 = 32.6
V_ICE = 19.65
#: Highest temperature of the Spycher et al. (2003) fit [K] and highest pressure [Pa].
MAX_TEMPERATURE_K = 373.15
MAX_PRESSURE_PA = 600e5
#: Lowest temperature the fit was made from [K]; below it results are an extrapolation.
FIT_MIN_TEMPERATURE_K = 285.15
#: Pressure below which the model and ideal mixing differ by under about 3 % [Pa].
LOW_PRESSURE_PA = 5e5


@dataclass(frozen=True, slots=True)
class WaterInCO2:
    """Water in the CO2-rich phase in equilibrium with liquid water (or ice).

    ``water_ppmv`` is the water mole fraction times 1e6; ``water_g_per_kg_co2`` grams of water per
    kilogram of dry CO2; ``co2_phase`` the phase of the CO2 ('gas', 'liquid' or 'supercritical',
    CoolProp); ``enhancement`` = y_H2O P / p_sat (1 for ideal mixing); ``over_ice`` true below
    273.16 K, where the condensed water is ice; ``water_fugacity_coefficient`` phi_H2O;
    ``co2_in_water_mole_fraction`` x_CO2 in the coexisting water (0 over ice).
    """

    temperature_k: float
    pressure_pa: float
    co2_phase: str
    water_ppmv: float
    water_g_per_kg_co2: float
    enhancement: float
    water_fugacity_coefficient: float
    over_ice: bool
    co2_in_water_mole_fraction: float


def spycher_k0_h2o_bar(temperature_k: float) -> float:
    """Spycher et al. (2003) water equilibrium constant K0_H2O [bar] at 1 bar.

    log10 K0 = -2.209 + 3.097e-2 t - 1.098e-4 t^2 + 2.048e-7 t^3, t in degC, 12-100 degC
    (Spycher, Pruess & Ennis-King 2003, Table 2). Used here only to check the IAPWS-95
    substitution.

    >>> round(spycher_k0_h2o_bar(298.15), 5)
    0.03161
    """
    t = temperature_k - 273.15
    return 10.0 ** (-2.209 + 3.097e-2 * t - 1.098e-4 * t**2 + 2.048e-7 * t**3)


def _k0_co2(t_c: float, liquid: bool) -> float:
    """Spycher et al. (2003) Table 2 K0_CO2 [bar], gas or liquid CO2; t in degC."""
    if liquid:
        return 10.0 ** (1.169 + 1.368e-2 * t_c - 5.380e-5 * t_c**2)
    return 10.0 ** (1.189 + 1.304e-2 * t_c - 5.446e-5 * t_c**2)


def _rk_roots(t: float, p_bar: float, a: float, b: float) -> list[float]:
    """Real roots V [cm3/mol] > b of the Redlich-Kwong cubic (Spycher et al. 2003 eq. 2).

    V^3 - V^2 RT/P - V (RT b/P - a/(P T^0.5) + b^2) - a b/(P T^0.5) = 0.
    """
    import numpy as np

    rt_p = R_BAR_CM3 * t / p_bar
    a_p = a / (p_bar * math.sqrt(t))
    roots = np.roots([1.0, -rt_p, -(rt_p * b - a_p + b * b), -a_p * b])
    return sorted(float(r.real) for r in roots if abs(r.imag) < 1e-9 * max(1.0, abs(r.real)) and r.real > b)


def co2_molar_volume_cm3(temperature_k: float, pressure_pa: float, *, vapour: bool = False) -> tuple[float, str]:
    """Redlich-Kwong molar volume of CO2 [cm3/mol] and the CO2 phase at (T, P).

    The cubic's root nearest CoolProp's molar volume (Span & Wagner 1996) is taken, so gas, liquid
    and supercritical CO2 get the root of their own phase; the phase name is
    :func:`co2routes.thermo.co2.phase_at` ('two-phase' on the saturation line is named 'gas').
    With ``vapour`` a liquid state takes the cubic's vapour root instead (the CO2 as a
    metastable vapour: a dew point below the CO2's own condensation point), named 'gas'.

    >>> v, phase = co2_molar_volume_cm3(293.15, 60e5)
    >>> phase, round(v)
    ('liquid', 59)
    """
    v_rk, _v_real, phase = _co2_volumes(temperature_k, pressure_pa, vapour)
    return v_rk, phase


def _co2_volumes(t: float, pressure_pa: float, vapour: bool) -> tuple[float, float, str]:
    """(Redlich-Kwong root, real molar volume [cm3/mol], phase); see :func:`co2_molar_volume_cm3`.

    The real volume is CoolProp's (Span & Wagner 1996); for CO2 reckoned as a metastable vapour
    (or below its triple point) CoolProp has none and the Redlich-Kwong vapour root stands for it.
    """
    from co2routes.thermo.co2 import TRIPLE_TEMPERATURE_K, phase_at
    from co2routes.thermo.coolprop_safe import props

    phase = phase_at(pressure_pa, t)
    if phase == "two-phase":
        phase = "gas"
    if phase == "solid":
        raise InputError("temperature", "CO2 is solid at this temperature and pressure; water in solid "
                         "CO2 is not modelled", got=f"{t - 273.15:.2f} degC at {pressure_pa / 1e5:.4g} bar")
    roots = _rk_roots(t, pressure_pa / 1e5, 7.54e7 - 4.13e4 * t, B_CO2)
    if (vapour and phase == "liquid") or t < TRIPLE_TEMPERATURE_K:
        return roots[-1], roots[-1], "gas"  # below the triple point fluid CO2 is vapour only
    rho = props("D", "P", pressure_pa, "T", t)
    v_real = CO2_MOLAR_MASS / rho * 1e6
    return min(roots, key=lambda v: abs(v - v_real)), v_real, phase


def a_h2o_co2(temperature_k: float, co2_density_kg_m3: float) -> float:
    """Water-CO2 attraction a_H2O-CO2 of the Redlich-Kwong rule [bar cm6 K^0.5 mol^-2].

    a = a_dense + (a_gas(T) - a_dense) / (1 + (rho / rho_c)^6), with a_dense = 7.89e7 (Spycher,
    Pruess & Ennis-King 2003, Table 1, fitted to water in dense CO2) and a_gas(T) = 8.686e7
    - 2.180e5 (T - 303.15 K), a least-squares fit (this project's) of the same equations to the
    water content of gaseous CO2 measured by Meyer & Harvey (2015, AIChE J. 61, 2913, Table 2;
    21.7-40 degC, 5-50 bar), where the single dense value runs up to 12 % low; rho_c = 467.6 kg/m3
    is CO2's critical density (Span & Wagner 1996). The blend's form and exponent are this
    project's choice. Valid 12-100 degC as Spycher et al.; a_gas(T) is held at its value at the
    ends of 21.7-40 degC outside that range.

    >>> round(a_h2o_co2(303.15, 50.0) / 1e7, 3), round(a_h2o_co2(303.15, 800.0) / 1e7, 3)
    (8.686, 7.921)
    """
    lo, hi = GAS_FIT_T_RANGE_K
    t = min(max(temperature_k, lo), hi)
    a_gas = A_H2O_CO2_GAS_303 + A_H2O_CO2_GAS_SLOPE * (t - 303.15)
    share = 1.0 / (1.0 + (co2_density_kg_m3 / BLEND_DENSITY_KG_M3) ** BLEND_EXPONENT)
    return A_H2O_CO2 + (a_gas - A_H2O_CO2) * share


def _ln_phi(t: float, p_bar: float, v: float, a_mix: float, a_k: float, b_k: float) -> float:
    """Redlich-Kwong fugacity coefficient ln phi_k in CO2 (Spycher et al. 2003 eq. 5), y_CO2 = 1."""
    b = B_CO2
    rt15 = R_BAR_CM3 * t**1.5
    log_vb = math.log((v + b) / v)
    return (math.log(v / (v - b)) + b_k / (v - b) - 2.0 * a_k / (rt15 * b) * log_vb
            + a_mix * b_k / (rt15 * b * b) * (log_vb - b / (v + b))
            - math.log(p_bar * v / (R_BAR_CM3 * t)))


def _check(temperature_k: float, pressure_pa: float) -> tuple[float, float]:
    t = require_positive("temperature", temperature_k)
    p = require_positive("pressure", pressure_pa)
    if t > MAX_TEMPERATURE_K:
        raise InputError("temperature", "water in CO2 is modelled up to 100 degC (Spycher et al. 2003)", got=t)
    if p > MAX_PRESSURE_PA:
        raise InputError("pressure", "water in CO2 is modelled up to 600 bar (Spycher et al. 2003)", got=p)
    return t, p


@lru_cache(maxsize=4096)  # pure in its float arguments; a recompute asks the same states again
def saturated_water_in_co2(temperature_k: float, pressure_pa: float, *, vapour: bool = False) -> WaterInCO2:
    """Water [ppmv, g/kg] in CO2 saturated with water (or ice) at T and P, any CO2 phase.

    y_H2O = (1 - B)/(1/A - B) (Spycher et al. 2003 eq. 13; see the module text for A, B and the
    IAPWS-95 vapour pressure in place of K0_H2O); over ice y_H2O = A (no CO2 in ice).

    Parameters
    ----------
    temperature_k : float
        Temperature [K], 110 K (frost points) to 373.15 K; fitted from 285.15 K.
    pressure_pa : float
        Total pressure [Pa], above the water vapour pressure, up to 600 bar.
    vapour : bool
        Reckon the CO2 as vapour even where it would be liquid (for dew points below the CO2's
        own condensation point); see :func:`co2_molar_volume_cm3`.

    Sources: Spycher, Pruess & Ennis-King (2003) Geochim. Cosmochim. Acta 67, 3015; Wagner &
    Pruss (2002) IAPWS-95; Murphy & Koop (2005); :func:`a_h2o_co2` for the water-CO2 attraction.
    Checked against measured water contents 15-40 degC, 5-200 bar (Meyer & Harvey 2015; King et
    al. 1992; Jooss et al. 2026): within 10 % in gas, liquid and supercritical CO2.

    >>> w = saturated_water_in_co2(293.15, 60e5)
    >>> w.co2_phase, round(w.water_ppmv, -1)
    ('liquid', 2770.0)
    """
    t, p = _check(temperature_k, pressure_pa)
    over_ice = t < WATER_TRIPLE_K - 1e-9
    p_sat = vapor_pressure(min(t, 647.0)) if not over_ice else vapor_pressure(t)
    if p_sat >= p:
        raise InputError("pressure", f"must be above the water vapour pressure ({p_sat:.6g} Pa at this "
                         "temperature): below it the water boils", got=p)
    v, v_real, phase = _co2_volumes(t, p, vapour)
    p_bar, ps_bar = p / 1e5, p_sat / 1e5
    a_co2 = 7.54e7 - 4.13e4 * t
    a_wc = a_h2o_co2(t, CO2_MOLAR_MASS / (v_real * 1e-6))
    phi_w = math.exp(_ln_phi(t, p_bar, v_real, a_co2, a_wc, B_H2O))
    v_w = V_ICE if over_ice else V_H2O
    a_coef = ps_bar / (phi_w * p_bar) * math.exp((p_bar - ps_bar) * v_w / (R_BAR_CM3 * t))
    if over_ice:
        y, x_co2 = a_coef, 0.0
    else:
        phi_c = math.exp(_ln_phi(t, p_bar, v, a_co2, a_co2, B_CO2))
        k0 = _k0_co2(t - 273.15, phase == "liquid")
        b_coef = phi_c * p_bar / (55.508 * k0) * math.exp(-(p_bar - 1.0) * V_CO2 / (R_BAR_CM3 * t))
        y = (1.0 - b_coef) / (1.0 / a_coef - b_coef)
        x_co2 = b_coef * (1.0 - y)
    y = min(y, 0.999999)
    from co2routes.thermo.water import g_per_kg_from_ppmv

    return WaterInCO2(temperature_k=t, pressure_pa=p, co2_phase=phase, water_ppmv=y * 1e6,
                      water_g_per_kg_co2=g_per_kg_from_ppmv(y * 1e6), enhancement=y * p / p_sat,
                      water_fugacity_coefficient=phi_w, over_ice=over_ice, co2_in_water_mole_fraction=x_co2)


@lru_cache(maxsize=4096)
def dew_point_in_co2(water_ppmv: float, pressure_pa: float, *, vapour: bool = True) -> float:
    """Dew (frost) point [K] of CO2 holding ``water_ppmv`` at total pressure P, Spycher et al. (2003).

    Solves y_sat(T_d, P) = y for T_d by bisection (y_sat from :func:`saturated_water_in_co2`,
    rising with T); the dew point is a frost point below 273.16 K. With ``vapour`` (default) the
    CO2 is reckoned as vapour at the dew point even where it would itself have condensed. Where
    CO2 at the dew point would be solid, the ideal-mixing frost point p_water = y P is returned.

    Parameters
    ----------
    water_ppmv : float
        Water content [ppmv], above 0.
    pressure_pa : float
        Total pressure [Pa], up to 600 bar.

    Source: Spycher, Pruess & Ennis-King (2003); Murphy & Koop (2005); IAPWS-95.

    >>> round(dew_point_in_co2(saturated_water_in_co2(288.15, 20e5).water_ppmv, 20e5) - 273.15, 3)
    15.0
    """
    y = require_positive("water content", water_ppmv)
    p = require_positive("pressure", pressure_pa)
    from co2routes.thermo.water import WATER_TRIPLE_PA, dew_point as boiling_point

    hi = MAX_TEMPERATURE_K if p <= WATER_TRIPLE_PA else min(MAX_TEMPERATURE_K, boiling_point(min(p, 22e6)) - 1e-6)
    t_d = _dew_point_fixed_point(y, p, vapour)
    t_cond = _co2_condensation_k(p)
    # water condenses from the gas before the CO2 does: the dew point is the gas-side root (below
    # the CO2's condensation the water it can hold jumps, and a second root lies there)
    gas_side = t_cond is not None and _sat_ppmv_or_zero(t_cond + 1e-3, p, vapour) <= y
    if t_d is not None and not (gas_side and t_d < t_cond):
        return t_d
    if saturated_water_in_co2(hi, p).water_ppmv < y:
        raise InputError("water content", "is more than CO2 holds at 100 degC at this pressure", got=y)
    t_d = _bisect_dew_point(y, p, vapour, t_cond + 1e-3 if gas_side else 160.0, hi)
    if abs(_sat_ppmv_or_zero(t_d, p, vapour) / y - 1.0) > 1e-3:
        # CO2 is solid at (T_d, P): no fluid CO2 to hold the water; ideal mixing (no enhancement)
        return boiling_point(y * 1e-6 * p)
    return t_d


def _co2_condensation_k(p: float) -> float | None:
    """CO2's own saturation temperature at P [K] (Span & Wagner 1996), None outside its
    triple-point to critical pressure (no liquid CO2 to condense)."""
    from co2routes.thermo import co2

    if not co2.TRIPLE_PRESSURE_PA < p < co2.CRITICAL_PRESSURE_PA:
        return None
    return co2.saturation_at_pressure(p).temperature_k


def _bisect_dew_point(y: float, p: float, vapour: bool, lo: float, hi: float) -> float:
    """T in [lo, hi] where the saturated water content crosses ``y`` (rising with T), to 1 uK."""
    for _ in range(60):
        mid = 0.5 * (lo + hi)
        if _sat_ppmv_or_zero(mid, p, vapour) < y:
            lo = mid
        else:
            hi = mid
        if hi - lo < 1e-6:
            break
    return 0.5 * (lo + hi)


def _dew_point_fixed_point(y: float, p: float, vapour: bool) -> float | None:
    """T_d from T = T_d,ideal(y P / E(T)), E the enhancement; None if it does not settle in 12 steps."""
    from co2routes.thermo.water import dew_point as ideal_dew_point

    e = 1.0
    t_d = None
    for _ in range(12):
        p_w = y * 1e-6 * p / e
        if p_w >= p:
            return None
        try:
            t_new = ideal_dew_point(p_w)
            w = saturated_water_in_co2(t_new, p, vapour=vapour)
        except InputError:
            return None
        if t_d is not None and abs(t_new - t_d) < 1e-7:
            return t_new
        t_d, e = t_new, w.enhancement
    return None


def _sat_ppmv_or_zero(t: float, p: float, vapour: bool) -> float:
    """Saturated ppmv, or 0 where CO2 is solid at (T, P) (the dew point is above that)."""
    try:
        return saturated_water_in_co2(t, p, vapour=vapour).water_ppmv
    except InputError:
        return 0.0


#: Above this pressure [Pa] and below 10 degC, CO2 hydrate can be the stable water phase
#: (Sloan & Koh 2008: the CO2 hydrate curve passes about 12.6 bar at 0 degC and 44.5 bar at 10 degC).
HYDRATE_MIN_PRESSURE_PA = 12.6e5
HYDRATE_MAX_TEMPERATURE_K = 283.15


def warnings_for(w: WaterInCO2) -> list[str]:
    """Plain-language warnings for a :class:`WaterInCO2` answer: phase, model range, ice, hydrate.

    >>> warnings_for(saturated_water_in_co2(293.15, 60e5))[0][:22]
    'The CO2 is liquid here'
    """
    from co2routes.thermo.co2 import CRITICAL_PRESSURE_PA, CRITICAL_TEMPERATURE_K

    out: list[str] = []
    if w.co2_phase == "liquid":
        out.append("The CO2 is liquid here: this is water dissolved in liquid CO2 (far more than "
                   "ideal mixing gives); free water separates beyond it.")
    elif w.co2_phase == "supercritical":
        out.append("The CO2 is supercritical here (above 31.0 degC and 73.8 bar): dense, and it "
                   "holds far more water than ideal mixing gives.")
    out.append(f"Water content {w.enhancement:.3g} times the ideal-mixing value p_sat/P: fugacity "
               "model of Spycher, Pruess & Ennis-King (2003), its gas side refitted to measured data; "
               "within 10 % of measurements at 15-40 degC up to 200 bar.")
    if abs(w.temperature_k - CRITICAL_TEMPERATURE_K) < 3.0 and abs(w.pressure_pa - CRITICAL_PRESSURE_PA) < 10e5:
        out.append("Near the critical point of CO2 the density, and the water it holds, change "
                   "steeply with small changes of temperature or pressure.")
    if w.temperature_k < FIT_MIN_TEMPERATURE_K:
        out.append("Below 12 degC the model is extrapolated beyond its fit: treat the figure as an "
                   "estimate.")
    if w.over_ice:
        out.append("Below 0 degC the dew point is a frost point: the water deposits as ice.")
    if w.temperature_k < HYDRATE_MAX_TEMPERATURE_K and w.pressure_pa > HYDRATE_MIN_PRESSURE_PA:
        out.append("Below 10 degC at this pressure CO2 hydrate (a solid of water and CO2) can form "
                   "first, at a higher temperature than this dew point (Sloan & Koh 2008).")
    return out


def co2_condenses_first(dew_point_k: float, pressure_pa: float) -> float | None:
    """CO2's own condensation temperature [K] at P when it lies above the dew point, else None.

    T_sat,CO2(P) from Span & Wagner (1996) (:func:`co2routes.thermo.co2.saturation_at_pressure`);
    None above the critical pressure or below the triple-point pressure (no liquid CO2).

    >>> round(co2_condenses_first(233.15, 20e5) - 273.15, 1)
    -19.5
    """
    t_sat = _co2_condensation_k(pressure_pa)
    return t_sat if t_sat is not None and t_sat > dew_point_k else None

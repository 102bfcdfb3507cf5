"""Dry ice from a liquid CO2 cylinder: which side to draw from, what storage loses, raw CO2 per kg.

The flash of a saturated phase released to 1 atm is the energy balance of :mod:`co2routes.thermo.flash`
(isenthalpic expansion to solid + vapour at the 1 atm sublimation point 194.686 K):

    x = (h_v(194.686 K, 1 atm) - h_in) / Delta H_sub

``h_in`` is the saturated *liquid* enthalpy for a liquid-side draw (dip tube, or an inverted
cylinder) and the saturated *vapour* enthalpy for a vapour-side draw (the valve of an upright
cylinder without a dip tube). Saturated vapour holds about as much enthalpy as the 1 atm vapour at
194.7 K, so it makes little solid: none below about 9.6 degC, where its enthalpy is the higher (x
clipped at 0: the gas simply leaves colder), 2.7 % at 20 degC against 29 % for the liquid.

Storage loss in an insulated box: the heat leak sublimes the ice,
``m_dot = U A (T_amb - T_s) / Delta H_sub`` with T_s = 194.686 K and Delta H_sub = 573.3 kJ/kg
(Giauque & Egan 1937, J. Chem. Phys. 5, 45), both taken from :mod:`co2routes.thermo.flash` / :mod:`co2routes.thermo.co2`.
"""

from __future__ import annotations

from dataclasses import dataclass

from co2routes.thermo.errors import InputError, require_fraction, require_positive

#: The two ways of taking CO2 from a liquid cylinder.
DRAWS = ("liquid", "vapor")


@dataclass(frozen=True, slots=True)
class DrawYield:
    """Dry ice from one draw of a liquid cylinder at ``cylinder_temperature_k``.

    ``solid_fraction`` of the drawn mass becomes dry ice (0-1); ``solid_mass_kg`` and
    ``gas_mass_kg`` for the given drawn mass (``None`` without one); ``draw_enthalpy_j_per_kg`` is
    the enthalpy of the drawn saturated phase (CoolProp IIR scale).
    """

    draw: str
    cylinder_temperature_k: float
    cylinder_pressure_pa: float
    draw_enthalpy_j_per_kg: float
    solid_fraction: float
    solid_mass_kg: float | None
    gas_mass_kg: float | None
    note: str


@dataclass(frozen=True, slots=True)
class StorageLoss:
    """Dry ice subliming in an insulated box.

    ``heat_leak_w`` [W]; ``loss_rate_kg_s`` [kg/s] and ``loss_kg_per_day`` [kg/day];
    ``time_to_empty_s`` [s] for the stored mass (``None`` without one); ``remaining_kg`` after
    ``hold_time_s`` (``None`` unless both mass and time were given; 0 when all is gone).
    """

    area_m2: float
    u_w_m2_k: float
    ambient_temperature_k: float
    heat_leak_w: float
    loss_rate_kg_s: float
    loss_kg_per_day: float
    mass_kg: float | None
    time_to_empty_s: float | None
    hold_time_s: float | None
    remaining_kg: float | None


@dataclass(frozen=True, slots=True)
class RawPerDryIce:
    """End to end: kg of raw CO2 bought or made per kg of dry ice delivered.

    ``kg_raw_per_kg`` = 1 / (x (1 - transfer loss) (1 - storage loss)); ``work_kwh_per_kg`` is the
    liquefaction work carried onto each kg of dry ice (``None`` without a work per kg of liquid).
    """

    solid_fraction: float
    transfer_loss_fraction: float
    storage_loss_fraction: float
    kg_raw_per_kg: float
    work_kwh_per_kg: float | None


def draw_yield(cylinder_temperature_k: float, draw: str = "liquid",
               drawn_mass_kg: float | None = None) -> DrawYield:
    """Dry-ice fraction of CO2 drawn from the liquid side or the vapour side of a cylinder.

    Equation: ``x = max(0, (h_v(194.686 K, 1 atm) - h_sat(T)) / Delta H_sub)``, with ``h_sat`` the
    saturated liquid (``draw="liquid"``, via :func:`co2routes.thermo.flash.flash_at_temperature`) or
    saturated vapour (``draw="vapor"``) enthalpy at the cylinder temperature.

    Parameters
    ----------
    cylinder_temperature_k : float
        Temperature of the two-phase cylinder [K], 216.592 to 304.1282 K.
    draw : str
        ``"liquid"`` (dip tube / inverted) or ``"vapor"`` (upright, no dip tube).
    drawn_mass_kg : float or None
        Mass drawn [kg].

    Sources: Span & Wagner (1996) saturated enthalpies; Giauque & Egan (1937) Delta H_sub =
    573.3 kJ/kg; the 1 atm vapour enthalpy of :func:`co2routes.thermo.flash.vapor_enthalpy_at_sublimation_point`.

    >>> round(draw_yield(293.15, "liquid").solid_fraction, 2), draw_yield(273.15, "vapor").solid_fraction
    (0.29, 0.0)
    """
    from co2routes.thermo import co2, flash

    if draw not in DRAWS:
        raise InputError("draw", "must be 'liquid' or 'vapor'", got=draw)
    if drawn_mass_kg is not None:
        require_positive("drawn mass", drawn_mass_kg)
    sat = co2.saturation_at_temperature(cylinder_temperature_k)
    if draw == "liquid":
        f = flash.flash_at_temperature(cylinder_temperature_k, drawn_mass_kg)
        x, h = f.solid_fraction, sat.liquid_enthalpy_j_kg
        note = "Liquid drawn through a dip tube (or from an inverted cylinder) flashes to snow."
    else:
        h = sat.vapor_enthalpy_j_kg
        raw = (flash.vapor_enthalpy_at_sublimation_point() - h) / flash.SUBLIMATION_ENTHALPY_J_KG
        x = max(0.0, raw)
        note = ("Vapour from the top of an upright cylinder makes little or no snow"
                + (": it leaves as cold gas." if raw <= 0 else f" ({x:.1%}).")
                + " The liquid left behind boils to replace it and cools the cylinder; draw "
                "liquid (dip tube or inverted cylinder) to make dry ice.")
    solid = None if drawn_mass_kg is None else x * drawn_mass_kg
    gas = None if drawn_mass_kg is None else (1.0 - x) * drawn_mass_kg
    return DrawYield(draw, sat.temperature_k, sat.pressure_pa, h, x, solid, gas, note)


def storage_loss(area_m2: float, u_w_m2_k: float, ambient_temperature_k: float, *,
                 mass_kg: float | None = None, hold_time_s: float | None = None) -> StorageLoss:
    """Sublimation loss of dry ice in an insulated box from its heat leak.

    Equation: ``Q = U A (T_amb - T_s)``, ``m_dot = Q / Delta H_sub``; time to lose ``m`` is
    ``m / m_dot``. T_s = 194.686 K (1 atm sublimation point, Span & Wagner 1996), Delta H_sub =
    573.3 kJ/kg (Giauque & Egan 1937). Assumes the ice stays at T_s and the box wall's overall
    coefficient U is steady; the vented gas's own warming is neglected.

    Parameters
    ----------
    area_m2 : float
        Box surface area [m2].
    u_w_m2_k : float
        Overall heat-transfer coefficient of the wall [W/(m2 K)] (about 0.5-1 for 5 cm of foam,
        common practice).
    ambient_temperature_k : float
        Air temperature outside the box [K], above 194.686 K.
    mass_kg, hold_time_s : float or None
        Stored mass [kg] and holding time [s].

    >>> r = storage_loss(1.0, 0.5, 293.15)
    >>> round(r.heat_leak_w, 2), round(r.loss_kg_per_day, 2)
    (49.23, 7.42)
    """
    from co2routes.thermo import co2, flash

    a = require_positive("box area", area_m2)
    u = require_positive("box U", u_w_m2_k)
    t = require_positive("ambient temperature", ambient_temperature_k)
    if t <= co2.NORMAL_SUBLIMATION_K:
        raise InputError("ambient temperature", "must be warmer than dry ice, -78.5 degC",
                         got=f"{t - 273.15:.1f} degC")
    q = u * a * (t - co2.NORMAL_SUBLIMATION_K)
    rate = q / flash.SUBLIMATION_ENTHALPY_J_KG
    empty = remaining = None
    if mass_kg is not None:
        empty = require_positive("mass", mass_kg) / rate
        if hold_time_s is not None:
            remaining = max(0.0, mass_kg - rate * require_positive("hold time", hold_time_s))
    return StorageLoss(a, u, t, q, rate, rate * 86400.0, mass_kg, empty, hold_time_s, remaining)


def raw_per_dry_ice(solid_fraction: float, *, transfer_loss_fraction: float = 0.0,
                    storage_loss_fraction: float = 0.0,
                    liquefaction_work_j_per_kg: float | None = None) -> RawPerDryIce:
    """Kilograms of raw CO2 per kg of dry ice delivered, end to end.

    Equation: ``R = 1 / (x (1 - f_transfer) (1 - f_storage))``. Work per kg of dry ice
    ``W_ice = W_liq R``: every kg of raw CO2 is taken to be liquefied before it is lost (a
    conservative bound) and the flash gas is vented, not recompressed.

    Parameters
    ----------
    solid_fraction : float
        Dry ice per kg of liquid drawn, in (0, 1] (from :func:`draw_yield`).
    transfer_loss_fraction : float
        Share of the raw CO2 lost before the flash (purges, leaks, hose and cylinder heel), [0, 1).
    storage_loss_fraction : float
        Share of the dry ice sublimed before use, [0, 1).
    liquefaction_work_j_per_kg : float or None
        Compression work per kg of liquid [J/kg] (:attr:`co2routes.thermo.compression.LiquefactionResult.work_j_per_kg`).

    Source: mass balance; the flash fraction from Span & Wagner (1996) and Giauque & Egan (1937).

    >>> round(raw_per_dry_ice(0.3, transfer_loss_fraction=0.05).kg_raw_per_kg, 2)
    3.51
    """
    if solid_fraction <= 0.0:
        raise InputError("solid fraction", "is zero: this draw makes no dry ice (draw liquid, not "
                         "vapour)", got=solid_fraction)
    x = require_fraction("solid fraction", solid_fraction)
    ft = require_fraction("transfer loss", transfer_loss_fraction, allow_zero=True)
    fs = require_fraction("storage loss", storage_loss_fraction, allow_zero=True)
    if ft >= 1.0 or fs >= 1.0:
        raise InputError("loss", "must be below 1 (100 %)", got=max(ft, fs))
    ratio = 1.0 / (x * (1.0 - ft) * (1.0 - fs))
    work = None
    if liquefaction_work_j_per_kg is not None:
        work = liquefaction_work_j_per_kg * ratio / 3.6e6
    return RawPerDryIce(x, ft, fs, ratio, work)

"""Storing CO2: the safe charge of a cylinder, its pressure on a hot day, and filling from a buffer.

Vessel states come from :mod:`co2routes.thermo.co2` (Span & Wagner 1996 through CoolProp). The mass a gas
buffer holds at (P, T) is :func:`co2routes.thermo.co2.vessel_by_pressure`; this module adds what a user
needs to decide whether a charge is safe and how much a buffer can pass on.

Limits:

* :data:`FILLING_RATIO_KG_PER_L` 0.68 kg of CO2 per litre of water capacity: the filling density of
  68 % for CO2 in high-pressure cylinders (49 CFR 173.304a, table of filling densities).
* :data:`HOT_DAY_K` 55 degC: the hot-day temperature a charged cylinder must survive (common
  practice; 49 CFR uses 130 degF, 54.4 degC, for liquefied-gas service pressure checks, from
  memory).
* :data:`DEFAULT_RATED_PRESSURE_PA` 1800 psi: the marked service pressure of the common
  DOT-3AA1800 CO2 cylinder (common practice). :data:`DEFAULT_RELIEF_PRESSURE_PA` 3000 psi: the
  test pressure, 5/3 of the service pressure (49 CFR 178.37, from memory); CO2 cylinder burst discs
  are set at or below it (CGA S-1.1, from memory). Give the real figures of the cylinder at hand.
"""

from __future__ import annotations

from dataclasses import dataclass

from co2routes.thermo.errors import InputError, require_positive

PSI = 6894.757293168361
#: Filling density for CO2 in high-pressure cylinders [kg/L of water capacity] (49 CFR 173.304a).
FILLING_RATIO_KG_PER_L = 0.68
#: Hot-day temperature for the pressure curve [K] (55 degC, common practice).
HOT_DAY_K = 328.15
#: Coldest temperature of the default curve [K] (-10 degC).
COLD_DAY_K = 263.15
#: Service pressure of a DOT-3AA1800 cylinder [Pa] (1800 psi, common practice).
DEFAULT_RATED_PRESSURE_PA = 1800.0 * PSI
#: Relief (burst disc) pressure assumed [Pa] (3000 psi = 5/3 of 1800 psi; from memory).
DEFAULT_RELIEF_PRESSURE_PA = 3000.0 * PSI
#: How the buffer-to-cylinder transfer is modelled (said beside every transfer result).
TRANSFER_ASSUMPTION = (
    "Each vessel is held at its own temperature while gas flows (slow filling, isothermal), no CO2 "
    "is lost, and flow stops when the pressures are equal. A fast fill is closer to adiabatic: the "
    "buffer cools and the cylinder warms, so less is transferred until they settle."
)


@dataclass(frozen=True, slots=True)
class CurvePoint:
    """One temperature on a charged cylinder's pressure curve.

    ``phase`` and ``liquid_volume_fraction`` as in :class:`co2routes.thermo.co2.VesselState`.
    """

    temperature_k: float
    pressure_pa: float
    phase: str
    liquid_volume_fraction: float | None
    above_rated: bool
    above_relief: bool


@dataclass(frozen=True, slots=True)
class HotDayCurve:
    """Pressure against temperature for a cylinder holding a fixed mass of CO2.

    ``liquid_full_temperature_k`` is where the liquid fills the whole cylinder (``None`` if it
    never does below the critical point: the liquid boils away instead); ``rated_reached_k`` and
    ``relief_reached_k`` where the pressure reaches the rated and relief pressures (``None`` if not
    within the curve).
    """

    volume_m3: float
    mass_kg: float
    fill_density_kg_l: float
    rated_pressure_pa: float
    relief_pressure_pa: float
    points: tuple[CurvePoint, ...]
    liquid_full_temperature_k: float | None
    rated_reached_k: float | None
    relief_reached_k: float | None
    hot_day_pressure_pa: float
    warnings: tuple[str, ...]


@dataclass(frozen=True, slots=True)
class TransferResult:
    """Filling a cylinder from a gas buffer until the pressures are equal (masses in kg)."""

    final_pressure_pa: float
    buffer_initial_kg: float
    buffer_final_kg: float
    receiver_initial_kg: float
    receiver_final_kg: float
    transferred_kg: float
    transferred_fraction: float
    receiver_phase: str
    receiver_fill_density_kg_l: float
    warnings: tuple[str, ...]
    assumption: str = TRANSFER_ASSUMPTION


def max_charge_kg(volume_m3: float, filling_ratio_kg_per_l: float = FILLING_RATIO_KG_PER_L) -> float:
    """Largest safe CO2 charge of a cylinder by its filling ratio.

    Equation: ``m_max = FR * V_water`` with ``V_water`` in litres.

    Parameters
    ----------
    volume_m3 : float
        Water capacity (internal volume) [m3].
    filling_ratio_kg_per_l : float
        Filling ratio [kg CO2 per L water capacity]; 0.68 for high-pressure CO2 cylinders
        (49 CFR 173.304a).

    >>> round(max_charge_kg(0.0134), 3)   # a 13.4 L cylinder
    9.112
    """
    require_positive("volume", volume_m3)
    require_positive("filling ratio", filling_ratio_kg_per_l)
    return filling_ratio_kg_per_l * volume_m3 * 1000.0


def liquid_full_temperature_k(fill_density_kg_m3: float) -> float | None:
    """Temperature at which a closed cylinder's liquid expands to fill it.

    Solves ``rho_l,sat(T) = m / V`` (saturated liquid density from Span & Wagner 1996). Below the
    critical density (about 467.6 kg/m3) the liquid boils away as it warms and never fills the
    cylinder: returns ``None``. Above the triple-point liquid density the cylinder is liquid-full
    at every temperature: returns the triple-point temperature.

    Parameters
    ----------
    fill_density_kg_m3 : float
        CO2 mass per internal volume [kg/m3].

    Source: Span & Wagner (1996) J. Phys. Chem. Ref. Data 25, 1509 (through :mod:`co2routes.thermo.co2`).

    >>> round(liquid_full_temperature_k(680.0) - 273.15, 1)
    26.8
    >>> liquid_full_temperature_k(300.0) is None
    True
    """
    from scipy.optimize import brentq

    from co2routes.thermo import co2

    rho = require_positive("fill density", fill_density_kg_m3)

    def gap(t: float) -> float:
        return co2.saturation_at_temperature(t).liquid_density_kg_m3 - rho

    low, high = co2.TRIPLE_TEMPERATURE_K, co2.CRITICAL_TEMPERATURE_K - 1e-3
    if gap(low) <= 0.0:
        return low
    if gap(high) > 0.0:
        return None
    return float(brentq(gap, low, high, xtol=1e-4))


def check_charge(volume_m3: float, mass_kg: float, *, force: bool = False,
                 filling_ratio_kg_per_l: float = FILLING_RATIO_KG_PER_L) -> tuple[str, ...]:
    """Refuse a liquid charge above the filling ratio unless forced, saying the danger.

    Returns warnings (the danger sentence when forced, else nothing). Source of the limit:
    49 CFR 173.304a (68 % filling density for CO2).

    Parameters
    ----------
    volume_m3 : float
        Water capacity [m3].
    mass_kg : float
        Intended CO2 charge [kg].
    force : bool
        Accept an overfill (the warning is still returned).

    >>> check_charge(0.0134, 9.0)
    ()
    """
    limit = max_charge_kg(volume_m3, filling_ratio_kg_per_l)
    require_positive("mass", mass_kg)
    if mass_kg <= limit * (1.0 + 1e-9):
        return ()
    ratio = mass_kg / (volume_m3 * 1000.0)
    t_full = liquid_full_temperature_k(ratio * 1000.0)
    when = ("already liquid-full" if t_full is not None and t_full <= 216.6 else
            f"liquid-full at {t_full - 273.15:.1f} degC" if t_full is not None else
            "above its safe fill")
    danger = (f"{mass_kg:.3g} kg in {volume_m3 * 1000:.3g} L is {ratio:.3f} kg/L, over the filling "
              f"ratio {filling_ratio_kg_per_l:g} kg/L (49 CFR 173.304a): the cylinder is {when}, and "
              "past that point its pressure climbs by several bar per degree until the relief "
              "device vents or the cylinder bursts.")
    if not force:
        raise InputError("mass", f"must be at most {limit:.3g} kg for {volume_m3 * 1000:.3g} L "
                         f"({danger} Refused unless forced, for a cylinder known to be rated for it)",
                         got=f"{mass_kg:.3g} kg")
    return (danger,)


def hot_day_curve(volume_m3: float, mass_kg: float, *,
                  rated_pressure_pa: float = DEFAULT_RATED_PRESSURE_PA,
                  relief_pressure_pa: float = DEFAULT_RELIEF_PRESSURE_PA,
                  low_k: float = COLD_DAY_K, high_k: float = HOT_DAY_K, step_k: float = 5.0,
                  ) -> HotDayCurve:
    """Pressure of a charged cylinder from a cold day to a hot day.

    At each temperature the state is :func:`co2routes.thermo.co2.vessel_by_mass` (fixed mass and volume):
    two-phase at ``p_sat(T)`` while liquid and vapour share the cylinder, then ``P(rho, T)`` once
    it is liquid-full or supercritical, where pressure rises steeply. Crossing temperatures of the
    rated and relief pressures are found by root-finding on the same state.

    Parameters
    ----------
    volume_m3, mass_kg : float
        Water capacity [m3] and CO2 charge [kg].
    rated_pressure_pa, relief_pressure_pa : float
        Marked service pressure and relief-device pressure [Pa].
    low_k, high_k, step_k : float
        Temperature range and step [K]; default -10 degC to 55 degC in 5 K.

    Source: Span & Wagner (1996) via :mod:`co2routes.thermo.co2`; 55 degC hot day (common practice).

    >>> c = hot_day_curve(0.001, 0.68)
    >>> round(c.hot_day_pressure_pa / 1e5, 1), round(c.liquid_full_temperature_k - 273.15, 1)
    (159.6, 26.8)
    """
    from scipy.optimize import brentq

    from co2routes.thermo import co2

    require_positive("volume", volume_m3)
    require_positive("mass", mass_kg)
    require_positive("rated pressure", rated_pressure_pa)
    require_positive("relief pressure", relief_pressure_pa)
    require_positive("temperature step", step_k)
    if not high_k > low_k:
        raise InputError("temperature range", "the hot end must be warmer than the cold end",
                         got=f"{low_k} to {high_k} K")

    def pressure(t: float) -> float:
        return co2.vessel_by_mass(volume_m3, mass_kg, t).pressure_pa

    temps = []
    t = low_k
    while t < high_k - 1e-9:
        temps.append(t)
        t += step_k
    temps.append(high_k)
    points = []
    for t in temps:
        s = co2.vessel_by_mass(volume_m3, mass_kg, t)
        points.append(CurvePoint(t, s.pressure_pa, s.phase, s.liquid_volume_fraction,
                                 s.pressure_pa > rated_pressure_pa,
                                 s.pressure_pa > relief_pressure_pa))

    def crossing(limit: float) -> float | None:
        if points[0].pressure_pa >= limit:
            return low_k
        if points[-1].pressure_pa < limit:
            return None
        return float(brentq(lambda x: pressure(x) - limit, low_k, high_k, xtol=1e-3))

    rho = mass_kg / volume_m3
    t_full = liquid_full_temperature_k(rho)
    rated_at, relief_at = crossing(rated_pressure_pa), crossing(relief_pressure_pa)
    warnings = []
    if t_full is not None and t_full <= high_k:
        warnings.append(f"The cylinder becomes liquid-full at {t_full - 273.15:.1f} degC; above "
                        "that its pressure rises steeply with every degree.")
    if rated_at is not None:
        warnings.append(f"Pressure passes the rated {rated_pressure_pa / 1e5:.0f} bar at "
                        f"{rated_at - 273.15:.1f} degC.")
    if relief_at is not None:
        warnings.append(f"Pressure reaches the relief setting {relief_pressure_pa / 1e5:.0f} bar "
                        f"at {relief_at - 273.15:.1f} degC: the relief device would vent.")
    if rho / 1000.0 > FILLING_RATIO_KG_PER_L * (1.0 + 1e-9):
        warnings.append(f"The charge is {rho / 1000:.3f} kg/L, over the {FILLING_RATIO_KG_PER_L} "
                        "kg/L filling ratio (49 CFR 173.304a).")
    return HotDayCurve(volume_m3, mass_kg, rho / 1000.0, rated_pressure_pa, relief_pressure_pa,
                       tuple(points), t_full, rated_at, relief_at, points[-1].pressure_pa,
                       tuple(warnings))


def transfer_from_buffer(buffer_volume_m3: float, buffer_pressure_pa: float,
                         buffer_temperature_k: float, receiver_volume_m3: float, *,
                         receiver_temperature_k: float | None = None,
                         receiver_initial_pressure_pa: float = 101325.0) -> TransferResult:
    """How much CO2 a gas buffer passes into a cylinder before the pressures equalise.

    Mass conservation with a common final pressure ``P_f`` (see :data:`TRANSFER_ASSUMPTION`):
    ``rho(P_f, T_b) V_b + m_r(P_f) = m_b0 + m_r0``, where ``m_r(P) = rho(P, T_r) V_r`` while the
    cylinder holds gas. If the cylinder is colder than the critical point and ``P_f`` would pass
    ``p_sat(T_r)``, gas condenses in it: the pressure stays at ``p_sat(T_r)`` and the cylinder takes
    ``m_b0 + m_r0 - rho(p_sat, T_r) V_b`` (liquid under vapour). Densities from Span & Wagner (1996)
    via :mod:`co2routes.thermo.co2`.

    Parameters
    ----------
    buffer_volume_m3, buffer_pressure_pa, buffer_temperature_k : float
        The buffer's volume [m3] and its gas state [Pa], [K] before filling.
    receiver_volume_m3 : float
        Cylinder water capacity [m3].
    receiver_temperature_k : float or None
        Cylinder temperature [K] (an ice bath lowers it); default the buffer's.
    receiver_initial_pressure_pa : float
        CO2 pressure already in the cylinder [Pa]; default 1 atm (purged, empty).

    >>> r = transfer_from_buffer(0.05, 20e5, 293.15, 0.0134)
    >>> round(r.final_pressure_pa / 1e5, 2), round(r.transferred_kg, 3)
    (16.37, 0.411)
    """
    from scipy.optimize import brentq

    from co2routes.thermo import co2

    t_b = buffer_temperature_k
    t_r = t_b if receiver_temperature_k is None else receiver_temperature_k
    v_b = require_positive("buffer volume", buffer_volume_m3)
    v_r = require_positive("receiver volume", receiver_volume_m3)
    buf0 = co2.vessel_by_pressure(v_b, buffer_pressure_pa, t_b)
    if buf0.phase != "gas":
        raise InputError("buffer pressure", "must leave the buffer holding gas (below the "
                         "saturation pressure at its temperature)", got=f"{buffer_pressure_pa / 1e5:.3g} bar")
    rec0 = co2.vessel_by_pressure(v_r, receiver_initial_pressure_pa, t_r)
    if rec0.phase != "gas":
        raise InputError("receiver initial pressure", "must leave the cylinder holding gas",
                         got=f"{receiver_initial_pressure_pa / 1e5:.3g} bar")
    if receiver_initial_pressure_pa >= buffer_pressure_pa:
        raise InputError("buffer pressure", "must be above the cylinder's pressure for gas to flow",
                         got=f"{buffer_pressure_pa / 1e5:.3g} bar")
    total = buf0.co2_mass_kg + rec0.co2_mass_kg
    warnings: list[str] = []

    def excess(p: float) -> float:
        return (co2.density_at(p, t_b) * v_b + co2.density_at(p, t_r) * v_r) - total

    p_sat = None
    if t_r < co2.CRITICAL_TEMPERATURE_K:
        p_sat = co2.saturation_at_temperature(t_r).pressure_pa
    pinned = p_sat is not None and p_sat < buffer_pressure_pa and excess(p_sat * (1 - 2e-4)) < 0.0
    if pinned:
        p_f = p_sat
        m_b = co2.density_at(p_sat * (1 - 2e-4), t_b) * v_b
        m_r = total - m_b
        warnings.append(f"Gas condenses in the cylinder at {t_r - 273.15:.1f} degC: the pressure "
                        f"holds at its saturation pressure {p_sat / 1e5:.1f} bar while liquid "
                        "collects.")
        if m_r >= co2.saturation_at_temperature(t_r).liquid_density_kg_m3 * v_r:
            # Liquid-full: the pressure climbs again along the compressed-liquid branch.
            p_f = float(brentq(excess, p_sat * (1 + 2e-4), buffer_pressure_pa, rtol=1e-10))
            m_b = co2.density_at(p_f, t_b) * v_b
            m_r = total - m_b
        rec = co2.vessel_by_mass(v_r, m_r, t_r)
    else:
        p_f = float(brentq(excess, receiver_initial_pressure_pa, buffer_pressure_pa, rtol=1e-10))
        m_b = co2.density_at(p_f, t_b) * v_b
        m_r = total - m_b
        rec = co2.vessel_by_mass(v_r, m_r, t_r)
    warnings.extend(rec.warnings)
    if rec.fill_density_kg_l > FILLING_RATIO_KG_PER_L:
        warnings.append(f"The cylinder ends at {rec.fill_density_kg_l:.3f} kg/L, over the "
                        f"{FILLING_RATIO_KG_PER_L} kg/L filling ratio (49 CFR 173.304a): stop "
                        "the fill earlier.")
    moved = m_r - rec0.co2_mass_kg
    return TransferResult(p_f, buf0.co2_mass_kg, m_b, rec0.co2_mass_kg, m_r, moved,
                          moved / buf0.co2_mass_kg, rec.phase, rec.fill_density_kg_l,
                          tuple(warnings))

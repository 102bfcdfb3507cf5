"""Small pieces the capture routes (combustion, sorbent, breath, water) share."""

from __future__ import annotations

from typing import Mapping

from co2routes.thermo.gasmix import normalise

#: Joules in a kilowatt-hour.
J_PER_KWH = 3.6e6

#: Choices of a yes/no option.
YES_NO = ("yes", "no")


def saturated(dry: Mapping[str, float], temperature_k: float, pressure_pa: float) -> dict[str, float]:
    """Mole fractions of a gas of dry composition ``dry`` once saturated with water at (T, P).

    x_H2O = p_sat(T) / P (ideal mixing, :func:`co2routes.thermo.water.vapor_pressure`); the dry gases share
    the rest in their own proportions. Species under 1e-9 mol/mol are dropped.

    >>> x = saturated({"CO2": 1.0}, 298.15, 101325.0)
    >>> round(x["H2O"], 5)
    0.03128
    """
    from co2routes.thermo.water import vapor_pressure

    x_w = vapor_pressure(temperature_k) / pressure_pa
    dry_n = normalise({k: v for k, v in dry.items() if k != "H2O"}, known=None)
    out = {k: v * (1.0 - x_w) for k, v in dry_n.items() if v * (1.0 - x_w) > 1e-9}
    out["H2O"] = x_w
    return out


def kwh(joules: float) -> float:
    """Joules to kilowatt-hours.

    >>> kwh(3.6e6)
    1.0
    """
    return joules / J_PER_KWH


def percent(x: float) -> str:
    """A fraction as a short percentage for sentences.

    >>> percent(0.1175)
    '11.8 %'
    """
    return f"{100.0 * x:.3g} %"

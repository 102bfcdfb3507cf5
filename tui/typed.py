"""Values shown in the unit the user typed them in: the what-if tables of the command line and
the interface echo an input such as the sugar in the must as "150 g/L" (as typed), not as the SI
"150.0 kg/m3", and a price per cubic metre per cubic metre.

The unit of each input is read off the text it came from: the scenario file, a route option's
default, or the price book entry. Pure functions (pint through :mod:`co2routes.thermo.units`).
"""

from __future__ import annotations

import re
from typing import Any, Iterable, Mapping

#: SI unit of a what-if input (``Swing.unit``) -> the dimension :func:`co2routes.thermo.units.parse` knows.
SI_DIMENSION = {"kg/m3": "density", "K": "temperature", "Pa": "pressure", "kg": "mass", "s": "time",
                "m3": "volume", "J": "energy", "m": "length", "kg/s": "mass_flow", "m3/s": "volume_flow",
                "m2": "area", "m/s": "velocity", "W": "power", "1": "fraction"}
#: SI unit a price is per -> the dimension of what it is per.
PRICE_DIMENSION = {"per kg": "mass", "per m3": "volume", "per J": "energy"}
_NUMBER = re.compile(r"^\s*[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?\s*")


def unit_of(text: Any) -> str:
    """The unit part of a typed value (``""`` when there is none); for a price, what it is per.

    >>> unit_of("200 g/L"), unit_of("0.9 / m**3"), unit_of(3), unit_of("20 degC")
    ('g/L', 'm**3', '', 'degC')
    """
    if not isinstance(text, str):
        return ""
    if "/" in text and _NUMBER.sub("", text).startswith("/"):
        return text.split("/", 1)[1].strip()
    return _NUMBER.sub("", text, count=1).strip()


def typed_units(scenario: Any, routes: Iterable[Any], names: Iterable[str]) -> dict[str, str]:
    """What-if input name -> the unit its value was typed in (names with no unit left out)."""
    by_id = {r.id: r for r in routes}
    out = {}
    for name in names:
        parts = name.split(".")
        text: Any = None
        if parts[0] == "prices" and len(parts) == 2:
            price = scenario.prices.get(parts[1])
            text = f"1 / {unit_of(price.text)}" if price is not None and price.text else None
        elif parts[0] == "options" and len(parts) == 3:
            text = scenario.options.get(parts[1], {}).get(parts[2])
            route = by_id.get(parts[1])
            if text is None and route is not None:
                text = next((o.default for o in route.options if o.key == parts[2]), None)
        else:
            node: Any = scenario.document
            for key in parts:
                node = node.get(key) if isinstance(node, Mapping) else None
            text = node
        unit = unit_of(text)
        if unit:
            out[name] = unit
    return out


def as_typed(x: float, si_unit: str, unit: str | None) -> str:
    """``x`` (SI, in ``si_unit``) in ``unit``, the unit it was typed in; the reader's default unit
    (:func:`co2routes.tui.commands.sensitivity._shown`) when there is none or it does not fit.

    >>> as_typed(150.0, "kg/m3", "g/L"), as_typed(2.25, "per m3", "L"), as_typed(293.15, "K", "degC")
    ('150 g/L', '0.00225 per L', '20 degC')
    >>> as_typed(2.25, "per m3", "m**3"), as_typed(0.2, "1", None)
    ('2.25 per m**3', '20 %')
    """
    from co2routes.thermo.units import parse, to_unit
    from co2routes.tui.commands.sensitivity import _shown

    if not unit:
        return _shown(x, si_unit)
    try:
        if si_unit in PRICE_DIMENSION:
            return f"{x * parse(f'1 {unit}', 'price', PRICE_DIMENSION[si_unit]):.3g} per {unit}"
        if si_unit in SI_DIMENSION:
            return f"{to_unit(x, SI_DIMENSION[si_unit], unit):.4g} {unit}"
    except Exception:  # noqa: BLE001 - a unit pint cannot read back: show the default unit
        pass
    return _shown(x, si_unit)

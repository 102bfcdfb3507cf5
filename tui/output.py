"""Printing a command's answer: JSON, or a readable table whose units come from the key names.

A key ends in its unit (``_pa``, ``_k``, ``_kg`` ...); the table shows the value in units a
practitioner reads (bar and psi for pressure, degC for temperature) without the command having
to format anything itself.
"""

from __future__ import annotations

import json
import math
import re
from typing import IO, Any

from co2routes.thermo.cautions import LOCAL_CODES

# suffix -> (display unit, factor from SI, offset); checked longest first.
_SUFFIXES: dict[str, tuple[str, float, float]] = {
    "_kg_m3": ("kg/m³", 1.0, 0.0),
    "_kg_l": ("kg/L", 1.0, 0.0),
    "_kg_per_kg": ("kg/kg", 1.0, 0.0),
    "_g_per_kg_co2": ("g/kg CO2", 1.0, 0.0),
    "_kj_per_kg_co2": ("kJ/kg CO2", 1.0, 0.0),
    "_kj_per_kg": ("kJ/kg", 1.0, 0.0),
    "_j_per_kg": ("kJ/kg", 1e-3, 0.0),
    "_kg_s": ("kg/h", 3600.0, 0.0),
    "_kj_per_mol": ("kJ/mol", 1.0, 0.0),
    "_kwh_per_kg": ("kWh/kg", 1.0, 0.0),
    "_kg_per_cycle": ("kg/cycle", 1.0, 0.0),
    "_kg_per_day": ("kg/day", 1.0, 0.0),
    "_kg_per_h": ("kg/h", 1.0, 0.0),
    "_per_h": ("per h", 1.0, 0.0),
    "_w_m2_k": ("W/(m²·K)", 1.0, 0.0),
    "_m2": ("m²", 1.0, 0.0),
    "_w": ("W", 1.0, 0.0),
    "_per_kg_co2": ("per kg CO2", 1.0, 0.0),
    "_per_kg": ("per kg", 1.0, 0.0),
    "_m_s": ("m/s", 1.0, 0.0),
    "_pa": ("bar", 1e-5, 0.0),
    "_k": ("°C", 1.0, -273.15),
    "_kg": ("kg", 1.0, 0.0),
    "_kj": ("kJ", 1.0, 0.0),
    "_kwh": ("kWh", 1.0, 0.0),
    "_l": ("L", 1.0, 0.0),
    "_m3": ("m³", 1.0, 0.0),
    "_m": ("m", 1.0, 0.0),
    "_h": ("h", 1.0, 0.0),
    "_s": ("h", 1.0 / 3600.0, 0.0),
    "_j": ("kJ", 1e-3, 0.0),
    "_ppmv": ("ppmv", 1.0, 0.0),
}


#: Keys whose words, read off the key, would be unclear: key -> the label shown instead.
WORDS = {
    "raw_co2_kg": "CO2 to make or buy",
    "raw_co2_kg_per_kg": "CO2 to make or buy per kg of product",
    "co2_generated_kg": "CO2 made or bought",
    "co2_kg": "CO2 delivered",
    "product_kg": "end product wanted",
    "solid_fraction": "share that turns to dry ice",
}


def label_of(key: str) -> tuple[str, str]:
    """Split a key into a human label and its display unit.

    >>> label_of("vapor_density_kg_m3")
    ('vapor density', 'kg/m³')
    >>> label_of("phase")
    ('phase', '')
    >>> label_of("raw_co2_kg_per_kg")
    ('CO2 to make or buy per kg of product', 'kg/kg')
    """
    for suffix in sorted(_SUFFIXES, key=len, reverse=True):
        if key.endswith(suffix):
            return WORDS.get(key, key[: -len(suffix)].replace("_", " ")), _SUFFIXES[suffix][0]
    return WORDS.get(key, key.replace("_", " ")), ""


def format_value(key: str, value: Any) -> str:
    """Format one value for the table, converting SI to the display unit.

    >>> format_value("pressure_pa", 6434244.25)
    '64.34 bar (933.2 psi)'
    >>> format_value("temperature_k", 298.15)
    '25.00 °C (298.15 K)'
    >>> format_value("pressure_drop_pa", 838.8)
    '838.8 Pa (0.1217 psi)'
    >>> format_value("cost_per_kg", None)
    'unknown'
    >>> format_value("temperature_change_k", -14.27)
    '-14.27 K'
    """
    if value is None:
        if key.endswith(("_reached_k", "_reached_temperature_k")):
            return "not reached"
        return "–" if key == "volume_l" else "unknown"
    if isinstance(value, bool):
        return "yes" if value else "no"
    if isinstance(value, (int, float)):
        for suffix in sorted(_SUFFIXES, key=len, reverse=True):
            if key.endswith(suffix):
                unit, factor, offset = _SUFFIXES[suffix]
                shown = value * factor + offset
                if suffix == "_pa" and abs(value) < 1e4:  # small drops read best in Pa
                    return f"{_num(value)} Pa ({_num(value / 6894.757293168361)} psi)"
                if suffix == "_pa":
                    return f"{_num(shown)} bar ({_num(value / 6894.757293168361)} psi)"
                if suffix == "_k" and _is_difference(key):
                    return f"{value:+.2f} K"
                if suffix == "_k":
                    return f"{shown:.2f} °C ({value:.2f} K)"
                return f"{_num(shown)} {unit}"
        return _num(value)
    if isinstance(value, (list, tuple)):
        return ", ".join(str(v) for v in value)
    return str(value)


def _is_difference(key: str) -> bool:
    """Whether a ``_k`` key is a temperature difference rather than a temperature.

    >>> _is_difference("temperature_change_k"), _is_difference("dew_point_k")
    (True, False)
    """
    return any(word in key for word in ("change", "difference", "rise", "drop_k", "delta"))


def _num(x: float) -> str:
    """Four significant figures, no exponent for everyday magnitudes."""
    if isinstance(x, int):
        return str(x)
    if x == 0 or not math.isfinite(x):
        return f"{x:g}"
    mag = abs(x)
    if 1e-3 <= mag < 1e6:
        digits = max(0, 3 - int(math.floor(math.log10(mag))))
        return f"{x:.{digits}f}"
    return f"{x:.3e}"


def table_text(answer: dict[str, Any]) -> str:
    """The readable table for an answer, cautions and the local-codes reminder last."""
    rows = []
    for key, value in answer.items():
        if key in ("warnings", "cautions") or isinstance(value, (dict, list)) and key != "":
            continue
        label, _ = label_of(key)
        rows.append((label, format_value(key, value)))
    width = max((len(r[0]) for r in rows), default=0)
    lines = [f"{label:<{width}}  {text}" for label, text in rows]
    for key, value in answer.items():
        if isinstance(value, list) and key not in ("warnings", "cautions") and value:
            lines.append("")
            lines.append(f"{key.replace('_', ' ')}:")
            for item in value:
                if isinstance(item, dict):
                    lines.append("  " + "; ".join(
                        f"{label_of(k)[0]} {format_value(k, v)}" for k, v in item.items()))
                else:
                    lines.append(f"  {item}")
    warnings = answer.get("warnings") or []
    cautions = answer.get("cautions") or []
    if warnings:
        lines.append("")
        lines.extend(f"WARNING: {w}" for w in warnings)
    if cautions:
        lines.append("")
        lines.extend(f"caution: {c}" for c in cautions)
        lines.append(f"caution: {LOCAL_CODES}")
    return "\n".join(lines)


def emit(answer: dict[str, Any], args: Any, out: IO[str]) -> None:
    """Write ``answer`` to ``out`` as JSON (``--json``) or as the readable table, whole or not at
    all: the text is built first, so an error leaves nothing half printed."""
    out.write(answer_text(answer, args))


def answer_text(answer: dict[str, Any], args: Any) -> str:
    """The full text :func:`emit` writes: JSON without inf/NaN, or the table stripped of control
    characters (text from a file must not drive the terminal)."""
    if getattr(args, "json", False):
        return json_text(answer) + "\n"
    render = getattr(args._module, "render", None) if hasattr(args, "_module") else None
    return clean_text(render(answer, args) if render else table_text(answer)) + "\n"


_CONTROL = re.compile(r"[\x00-\x08\x0b-\x1f\x7f-\x9f]")


def clean_text(text: str) -> str:
    """``text`` without control characters (escape sequences, bells, carriage returns); line
    breaks and tabs stay.

    >>> clean_text("demo\x1b[2J name\x07")
    'demo[2J name'
    """
    return _CONTROL.sub("", text)


def json_text(answer: dict[str, Any]) -> str:
    """``answer`` as JSON; a non-finite number becomes ``null`` and adds a warning naming it.

    >>> json_text({"cost_per_kg": float("inf"), "warnings": []}).split()
    ['{', '"cost_per_kg":', 'null,', '"warnings":', '[', '"cost_per_kg', 'was', 'not', 'a', 'finite', 'number;', 'shown', 'as', 'null"', ']', '}']
    """
    bad: list[str] = []
    data = _finite(_plain(answer), "", bad)
    if bad and isinstance(data, dict):
        data["warnings"] = list(data.get("warnings") or []) + [
            f"{path} was not a finite number; shown as null" for path in bad]
    return json.dumps(data, indent=2, allow_nan=False)


def _plain(obj: Any) -> Any:
    """Dataclasses as dicts, tuples as lists (what ``json`` would write)."""
    if hasattr(obj, "__dataclass_fields__") and not isinstance(obj, type):
        return _plain(_jsonable(obj))
    if isinstance(obj, dict):
        return {str(k): _plain(v) for k, v in obj.items()}
    if isinstance(obj, (list, tuple)):
        return [_plain(v) for v in obj]
    return obj


def _finite(obj: Any, path: str, bad: list[str]) -> Any:
    if isinstance(obj, float) and not math.isfinite(obj):
        bad.append(path or "value")
        return None
    if isinstance(obj, dict):
        return {k: _finite(v, f"{path}.{k}" if path else k, bad) for k, v in obj.items()}
    if isinstance(obj, list):
        return [_finite(v, f"{path}[{i}]", bad) for i, v in enumerate(obj)]
    return obj


def _jsonable(obj: Any) -> Any:
    if hasattr(obj, "__dataclass_fields__"):
        import dataclasses

        return dataclasses.asdict(obj)
    raise TypeError(f"not JSON serialisable: {type(obj).__name__}")

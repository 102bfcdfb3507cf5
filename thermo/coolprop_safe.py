"""CoolProp calls that answer near the critical point or say which state they could not solve.

CoolProp 6.8's pressure-entropy and pressure-enthalpy flashes can fail to converge close to the
critical point of CO2 (304.13 K, 7.3773 MPa), e.g. ``PropsSI('H','P',7.364e6,'S',...)``. Every
property call that can meet such a state goes through :func:`props`:

1. the call as asked;
2. if it fails and the inputs are pressure with entropy or enthalpy, the same state from another
   pair of inputs: the temperature at that pressure is found by bisection on (P, T) calls (the
   form CoolProp solves most robustly), or, inside the two-phase dome, the vapour quality from
   the saturated liquid and vapour at P; then the output from (P, T) or (P, Q);
3. if it fails with temperature and pressure, the same call 1 mK either side (a change far
   below the accuracy of the equation of state near the critical point);
4. otherwise one :class:`~co2routes.thermo.errors.InputError` naming the state.

Equation of state: Span & Wagner (1996) for CO2, IAPWS-95 for water, through CoolProp.
"""

from __future__ import annotations

from co2routes.thermo.errors import InputError

_BY_T = {"S", "H", "Smass", "Hmass"}


def _raw(output: str, name1: str, value1: float, name2: str, value2: float, fluid: str) -> float:
    from co2routes.thermo._lazy import coolprop

    return float(coolprop().PropsSI(output, name1, value1, name2, value2, fluid))


def _state_text(name1: str, value1: float, name2: str, value2: float, fluid: str) -> str:
    units = {"P": "Pa", "T": "K", "S": "J/(kg K)", "H": "J/kg", "D": "kg/m3", "Q": ""}
    parts = [f"{n}={v:.6g} {units.get(n, '')}".strip() for n, v in ((name1, value1), (name2, value2))]
    return f"{fluid} at {', '.join(parts)}"


def _failed(output: str, name1: str, value1: float, name2: str, value2: float, fluid: str) -> InputError:
    return InputError(
        "state", f"the equation of state could not be solved for {output} of "
        f"{_state_text(name1, value1, name2, value2, fluid)} (outside its range, or too close to "
        "the critical point: move the temperature or pressure a little away from it)")


def props(output: str, name1: str, value1: float, name2: str, value2: float, fluid: str = "CO2") -> float:
    """``PropsSI(output, name1, value1, name2, value2, fluid)`` with the retries in the module text.

    Raises :class:`InputError` (field 'state') naming the state when no retry answers.

    >>> s = props("S", "P", 7.364e6, "T", 304.04)
    >>> round(props("T", "P", 7.364e6, "S", s), 2)
    304.04
    """
    try:
        return _raw(output, name1, value1, name2, value2, fluid)
    except ValueError:
        pass
    names = {name1.split("|")[0]: value1, name2.split("|")[0]: value2}  # "P|gas" imposes a phase
    if "P" in names and len(set(names) & _BY_T) == 1:
        other = (set(names) & _BY_T).pop()
        try:
            return _via_temperature(output, names["P"], other, names[other], fluid)
        except ValueError:
            pass
    elif set(names) == {"P", "T"}:
        t_first = name1.startswith("T")
        for dt in (1e-3, -1e-3):
            try:
                return _raw(output, name1, value1 + (dt if t_first else 0.0), name2,
                            value2 + (0.0 if t_first else dt), fluid)
            except ValueError:
                continue
    raise _failed(output, name1, value1, name2, value2, fluid)


def _via_temperature(output: str, p: float, name: str, target: float, fluid: str) -> float:
    """Output at (P, name=target) found by bisection on T with (P, T) calls, or (P, Q) in the dome."""
    p_crit = _raw_const("pcrit", fluid)
    if p < p_crit:
        low_sat = _raw(name, "P", p, "Q", 0, fluid)
        high_sat = _raw(name, "P", p, "Q", 1, fluid)
        if low_sat <= target <= high_sat:
            q = (target - low_sat) / (high_sat - low_sat)
            return _raw(output, "P", p, "Q", q, fluid)
        t_sat = _raw("T", "P", p, "Q", 0, fluid)
        lo, hi = ((_raw_const("Tmin", fluid), t_sat - 1e-6) if target < low_sat
                  else (t_sat + 1e-6, _raw_const("Tmax", fluid)))
    else:
        lo, hi = _raw_const("Tmin", fluid), _raw_const("Tmax", fluid)
    for _ in range(200):
        mid = 0.5 * (lo + hi)
        if _raw(name, "P", p, "T", mid, fluid) < target:
            lo = mid
        else:
            hi = mid
        if hi - lo < 1e-9 * hi:
            break
    t = 0.5 * (lo + hi)
    return t if output == "T" else props(output, "P", p, "T", t, fluid)


def _raw_const(name: str, fluid: str) -> float:
    from co2routes.thermo._lazy import coolprop

    return float(coolprop().PropsSI(name, fluid))

"""Heavy libraries, imported on first use so that they stay off the start-up path.

CoolProp 8 takes about 1.6 s to import on a 2-core machine and 6.8 about 0.2 s (measured: see
docs/benchmarks.md; the project pins 6.8 for that reason); Cantera about 0.2 s. Call :func:`coolprop` or :func:`cantera` inside the function that needs them.
"""

from __future__ import annotations

from functools import lru_cache


@lru_cache(maxsize=1)
def coolprop():
    """The ``CoolProp.CoolProp`` module (``PropsSI`` and friends)."""
    import CoolProp.CoolProp as CP

    return CP


@lru_cache(maxsize=1)
def cantera():
    """The ``cantera`` module."""
    import cantera as ct

    return ct

"""What the interface leaves off its start-up path (not timed: which modules are loaded)."""

from __future__ import annotations

import subprocess
import sys


def loaded_after(code: str, names: tuple[str, ...]) -> list[str]:
    """Which of ``names`` are in ``sys.modules`` after running ``code`` in a fresh interpreter."""
    probe = f"import sys; {code}; print([m for m in {names!r} if m in sys.modules])"
    out = subprocess.run([sys.executable, "-c", probe], capture_output=True, text=True, check=True)
    return eval(out.stdout.strip())  # noqa: S307 - our own probe's list of names


def test_the_interface_imports_without_numpy():
    """numpy comes with the first comparison (pint and Cantera need it), not with the screens:
    the cost-range widget imports it where it draws the boxes."""
    code = "import co2routes.tui.app, co2routes.tui.screens.main, co2routes.tui.widgets.detail"
    assert loaded_after(code, ("numpy", "scipy", "pint", "CoolProp", "cantera")) == []

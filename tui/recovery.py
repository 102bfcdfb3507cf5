"""The last line of defence: a fault of ours must never take the user's unsaved scenario with it.

When the interface meets an error nobody caught, :func:`keep` writes the scenario being edited to a
recovery file (and the error's details beside it) before the interface exits with status 1;
:func:`report` is the line that says where both are.
"""

from __future__ import annotations

import os
import time
import traceback
from pathlib import Path
from typing import Any, Mapping


def folder() -> Path:
    """Where recovery files go: the platform's user state folder, else the temporary folder."""
    try:
        from platformdirs import user_state_dir

        path = Path(user_state_dir("co2routes")) / "recovery"
        path.mkdir(parents=True, exist_ok=True)
        return path
    except Exception:  # noqa: BLE001 - no state folder: the temporary folder still works
        import tempfile

        return Path(tempfile.gettempdir())


def keep(document: Mapping[str, Any] | None, error: BaseException, where: Path | None = None) -> Path | None:
    """Write ``document`` as TOML to a new recovery file in ``where`` (default :func:`folder`),
    with the error's traceback in a ``.log`` file of the same name; the file, or ``None`` when
    nothing could be written."""
    from co2routes.sources.scenario import to_toml

    stamp = time.strftime("%Y%m%d-%H%M%S")
    try:
        base = (folder() if where is None else where) / f"recovered-{stamp}-{os.getpid()}"
        path = base.with_suffix(".toml")
        try:
            text = to_toml(dict(document or {}))
        except Exception:  # noqa: BLE001 - a document TOML cannot hold: keep what it says anyway
            text = "# the scenario could not be written as TOML; its contents as Python saw them:\n" + \
                "\n".join(f"# {line}" for line in repr(document).splitlines())
        path.write_text(text, encoding="utf-8")
        base.with_suffix(".log").write_text(
            "".join(traceback.format_exception(type(error), error, error.__traceback__)), encoding="utf-8")
        return path
    except Exception:  # noqa: BLE001 - the recovery itself must not raise
        return None


def report(path: Path | None, error: BaseException) -> str:
    """The one line printed when the interface stopped on ``error``.

    >>> report(Path("/tmp/r.toml"), KeyError("x"))
    "co2routes: the interface stopped on an internal error (KeyError: 'x'); your scenario was saved to /tmp/r.toml and the details to /tmp/r.log"
    """
    what = f"{type(error).__name__}: {' '.join(str(error).split())[:200]}"
    if path is None:
        return f"co2routes: the interface stopped on an internal error ({what}); no recovery file could be written"
    return (f"co2routes: the interface stopped on an internal error ({what}); your scenario was saved to "
            f"{path} and the details to {path.with_suffix('.log')}")

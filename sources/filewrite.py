"""Writing a user's file without spoiling it: the text of a scenario with only the changed values
rewritten, and an atomic write that keeps the file's mode and writes through a symlink.

:func:`updated_text` edits the TOML the user wrote (comments, key order, blank lines and the way
each value is spelled survive) with the style-preserving ``tomlkit`` parser; only keys whose value
changed are touched. :func:`write_atomic` writes a temporary file beside the real one (the target
of a symlink, so the link stays a link), gives it the mode of the file it replaces (or the mode a
new file gets under the process umask), and renames it over the original in one step.
"""

from __future__ import annotations

import os
import stat
import tempfile
from pathlib import Path
from typing import Any, Mapping

from co2routes.thermo.errors import InputError


class AlreadyExists(InputError):
    """The file is there and the caller did not say it may be replaced."""


def _merge(table: Any, new: Mapping[str, Any]) -> None:
    """Make the tomlkit ``table`` hold ``new``: changed values are set, missing keys removed,
    new keys appended; unchanged keys (and the comments beside them) are left alone."""
    import tomlkit

    for key in [k for k in table if k not in new]:
        del table[key]
    for key, value in new.items():
        if key not in table:
            table[key] = value
            continue
        old = table[key]
        if isinstance(value, Mapping) and isinstance(old, Mapping) and not isinstance(
                old, tomlkit.items.InlineTable):
            _merge(old, value)
        elif _plain(old) != value:
            if isinstance(old, tomlkit.items.InlineTable) and isinstance(value, Mapping):
                inline = tomlkit.inline_table()  # an inline table stays inline
                inline.update(value)
                value = inline
            table[key] = value


def _plain(item: Any) -> Any:
    """The Python value of a tomlkit item (itself for plain values)."""
    unwrap = getattr(item, "unwrap", None)
    return unwrap() if callable(unwrap) else item


def updated_text(base: str | None, document: Mapping[str, Any]) -> str:
    """The TOML text of ``document`` written over ``base`` (the text it was read from).

    Only values that differ from ``base`` are rewritten; every comment, blank line and the order
    of the keys that remain stay as they were. With no ``base`` (or one that is not TOML) the
    document is written plainly.

    >>> base = '# my site\\ndemand = "1 kg"  # enough for a week\\n\\n[site]\\npressure = "1 atm"\\n'
    >>> print(updated_text(base, {"demand": "2 kg", "site": {"pressure": "1 atm"}}), end="")
    # my site
    demand = "2 kg"  # enough for a week
    <BLANKLINE>
    [site]
    pressure = "1 atm"
    """
    import tomlkit

    if base:
        try:
            doc = tomlkit.parse(base)
        except tomlkit.exceptions.TOMLKitError:
            doc = None
        if doc is not None:
            _merge(doc, document)
            return tomlkit.dumps(doc)
    return tomlkit.dumps(dict(document))


def _new_file_mode() -> int:
    """The mode a newly created file gets under the process umask (0o666 less the umask)."""
    mask = os.umask(0o022)
    os.umask(mask)
    return 0o666 & ~mask


def write_atomic(path: Path | str, text: str, *, overwrite: bool = False) -> None:
    """Write ``text`` to ``path`` through a temporary file in the same folder, then rename.

    A symlink is followed: its target is written and the link stays. The new file takes the mode
    of the file it replaces (a new file: 0o666 less the umask). Refuses to replace an existing
    file unless ``overwrite`` is set (:class:`AlreadyExists`). A failure leaves any existing file
    untouched and removes the temporary file.
    """
    shown = str(path)
    path = Path(os.path.realpath(Path(path).expanduser()))
    if path.exists() and not overwrite:
        raise AlreadyExists(shown, "already exists; choose another name, or add --overwrite to replace it")
    try:
        mode = stat.S_IMODE(path.stat().st_mode)
    except FileNotFoundError:
        mode = _new_file_mode()
    except OSError as err:
        raise InputError(shown, f"cannot be written: {err.strerror}") from None
    try:
        fd, tmp = tempfile.mkstemp(prefix=f".{path.name}.", suffix=".tmp", dir=path.parent)
    except OSError as err:
        raise InputError(shown, f"cannot be written: {err.strerror}") from None
    try:
        with os.fdopen(fd, "w", encoding="utf-8") as handle:
            handle.write(text)
            handle.flush()
            os.fchmod(handle.fileno(), mode)
            os.fsync(handle.fileno())
        os.replace(tmp, path)
    except OSError as err:
        try:
            os.unlink(tmp)
        except OSError:
            pass
        raise InputError(shown, f"cannot be written: {err.strerror}") from None


def writable(path: Path | str) -> str | None:
    """Why ``path`` cannot be written (``None`` when it can): checked before asking the user
    whether to replace it, so a save that would fail says so at once.

    >>> writable("/nonexistent-folder-xyz/s.toml")
    'its folder /nonexistent-folder-xyz does not exist'
    >>> writable("~nosuchuser-xyz/s.toml")
    'the name cannot be used: Could not determine home directory.'
    """
    try:
        path = Path(os.path.realpath(Path(path).expanduser()))
        folder = path.parent
        if not folder.is_dir():
            return f"its folder {folder} does not exist"
        if not os.access(folder, os.W_OK | os.X_OK):
            return f"its folder {folder} cannot be written (permission denied)"
        if path.is_dir():
            return "is a folder"
    except (RuntimeError, OSError, ValueError) as err:  # ~nosuchuser, a name too long, a NUL byte
        return f"the name cannot be used: {err}"
    return None

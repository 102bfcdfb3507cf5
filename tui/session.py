"""The scenario the interface is editing: its document, where it came from, and how it is saved.

No widgets here, so all of it is tested in plain pytest. The document is the TOML as a plain dict
(see :mod:`co2routes.sources.scenario`); an edit changes one key of a copy, so a failed edit never touches
the last good document. Saving goes through :func:`co2routes.sources.filewrite.write_atomic` and refuses to
overwrite a file that changed on disk since it was opened unless the caller says so. What is saved
is the text the scenario was opened from with only the changed values rewritten
(:func:`co2routes.sources.filewrite.updated_text`), so the user's comments and layout survive.
"""

from __future__ import annotations

import copy
import hashlib
from dataclasses import dataclass
from pathlib import Path
from typing import Any, Mapping

from co2routes.sources.filewrite import AlreadyExists, updated_text, writable, write_atomic
from co2routes.sources.limits import file_action, loads
from co2routes.sources.scenario import demo_text, read_document
from co2routes.thermo.errors import InputError


@dataclass(frozen=True, slots=True)
class Stamp:
    """What a file looked like when read: modification time [ns] and SHA-256 of its bytes."""

    mtime_ns: int
    digest: str


@dataclass(frozen=True, slots=True)
class Opened:
    """A scenario as read: its document, its text, its file (``None`` for a demo) and stamp."""

    document: dict[str, Any]
    text: str
    path: Path | None
    stamp: Stamp | None
    source: str


class ChangedOnDisk(InputError):
    """The file was changed by someone else since it was opened (or last saved)."""


def stamp_of(path: Path | str) -> Stamp | None:
    """The stamp of the file at ``path`` now, ``None`` when there is no such file."""
    path = Path(path)
    try:
        data = path.read_bytes()
        mtime = path.stat().st_mtime_ns
    except FileNotFoundError:
        return None
    except OSError as err:
        raise InputError(str(path), f"cannot be read: {err.strerror}") from None
    return Stamp(mtime, hashlib.sha256(data).hexdigest())


def open_demo(which: str = "polytunnel") -> Opened:
    """The shipped (invented) demo scenario, not tied to any file."""
    text = demo_text(which)
    return Opened(loads(text, f"demo {which}"), text, None, None, f"demo {which}")


def open_file(path: Path | str) -> Opened:
    """The scenario file at ``path``; an unreadable or malformed file raises :class:`InputError`.

    The stamp is taken before reading, so a change made while reading is caught at save time.
    """
    with file_action(path, "read"):
        path = Path(path).expanduser()
        if path.is_dir():
            raise InputError(str(path), "is a folder, not a scenario file")
        stamp = stamp_of(path)
        document, text = read_document(path)
    return Opened(cleaned(document), text, path, stamp, str(path))


def cleaned(value: Any) -> Any:
    """``value`` (a document) with control characters taken out of every key and string, so
    that no text from a file drives the terminal.

    >>> cleaned({"name": "a\x1b[2Jb", "site": {"pressure": "1 atm"}})
    {'name': 'a[2Jb', 'site': {'pressure': '1 atm'}}
    """
    from co2routes.tui.output import clean_text

    if isinstance(value, str):
        return clean_text(value)
    if isinstance(value, Mapping):
        return {clean_text(str(k)): cleaned(v) for k, v in value.items()}
    if isinstance(value, list):
        return [cleaned(v) for v in value]
    return value


def edited(document: Mapping[str, Any], keys: tuple[str, ...], value: Any) -> dict[str, Any]:
    """A copy of ``document`` with the key at ``keys`` set to ``value`` (``None`` removes it).

    Empty tables left behind by a removal are dropped, so clearing a field and saving gives the
    file it would have been without that key.

    >>> edited({"site": {"pressure": "1 atm"}}, ("site", "pressure"), None)
    {}
    >>> edited({}, ("options", "fermentation", "sugar"), "glucose")
    {'options': {'fermentation': {'sugar': 'glucose'}}}
    """
    new = copy.deepcopy(dict(document))
    parents = [new]
    node = new
    for key in keys[:-1]:
        child = node.get(key)
        if not isinstance(child, dict):
            if value is None:
                return new
            child = {}
            node[key] = child
        node = child
        parents.append(node)
    if value is None:
        node.pop(keys[-1], None)
        for depth in range(len(keys) - 1, 0, -1):
            if not parents[depth]:
                parents[depth - 1].pop(keys[depth - 1], None)
    else:
        node[keys[-1]] = value
    return new


def value_at(document: Mapping[str, Any], keys: tuple[str, ...]) -> Any:
    """The value at ``keys`` in ``document`` or ``None``.

    >>> value_at({"site": {"pressure": "1 atm"}}, ("site", "pressure"))
    '1 atm'
    """
    node: Any = document
    for key in keys:
        if not isinstance(node, Mapping) or key not in node:
            return None
        node = node[key]
    return node


def save(path: Path | str, document: Mapping[str, Any], *, expected: Stamp | None,
         replace: bool = False, base: str | None = None) -> Stamp:
    """Write ``document`` to ``path`` atomically and return the new stamp.

    ``base`` is the text the scenario was opened from: only the values that changed are
    rewritten in it (comments, blank lines and key order stay). A path that cannot be written
    raises :class:`InputError` before anything else is asked.

    ``expected`` is the stamp the file had when this session read or last wrote it (``None`` when
    the session never had it). An existing file is replaced only when its stamp still equals
    ``expected``, or when ``replace`` is set (the user said yes); otherwise
    :class:`ChangedOnDisk` (it changed under us) or :class:`InputError` (it already exists).
    """
    not_finite(document)
    with file_action(path, "saved"):
        path = Path(path).expanduser()
        why = writable(path)
        if why is not None:
            raise InputError(str(path), f"cannot be saved: {why}")
        now = stamp_of(path)
        if now is not None and not replace:
            if expected is None:
                raise AlreadyExists(str(path), "already exists; choose another name or allow replacing it")
            if now != expected:
                raise ChangedOnDisk(str(path), "was changed on disk since it was opened; "
                                    "reload it or allow replacing it")
        write_atomic(path, updated_text(base, document), overwrite=now is not None)
        stamp = stamp_of(path)
    if stamp is None:
        raise InputError(str(path), "cannot be saved: the file is gone right after writing it")
    return stamp


def not_finite(document: Mapping[str, Any], prefix: str = "") -> None:
    """Refuse to save a document holding an infinite or NaN number (nothing could read it back).

    >>> not_finite({"weights": {"cost": float("nan")}})
    Traceback (most recent call last):
    ...
    co2routes.thermo.errors.InputError: weights.cost: must be a finite number to be saved (got nan)
    """
    import math

    for key, value in document.items():
        name = f"{prefix}{key}"
        if isinstance(value, Mapping):
            not_finite(value, f"{name}.")
        elif isinstance(value, float) and not math.isfinite(value):
            raise InputError(name, "must be a finite number to be saved", got=value)


def export(path: Path | str, text: str, *, replace: bool = False) -> None:
    """Write an export (Markdown, CSV or JSON text) atomically; never replaces unless asked."""
    with file_action(path, "written"):
        write_atomic(Path(path).expanduser(), text, overwrite=replace)


#: File endings an export may have, with the format each one picks.
EXPORT_FORMATS = {".md": "markdown", ".markdown": "markdown", ".csv": "csv", ".json": "json"}


def export_format(path: Path | str) -> str:
    """The export format a file name asks for by its ending.

    >>> export_format("ranking.md")
    'markdown'
    >>> export_format("ranking.txt")
    Traceback (most recent call last):
    ...
    co2routes.thermo.errors.InputError: ranking.txt: must end in .md, .csv or .json to pick the export format
    """
    suffix = Path(path).suffix.lower()
    if suffix not in EXPORT_FORMATS:
        raise InputError(str(path), "must end in .md, .csv or .json to pick the export format")
    return EXPORT_FORMATS[suffix]

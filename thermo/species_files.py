"""Cantera species files read by name: every species' name at once, a species' data when asked.

Reading a whole NASA file into ``cantera.Species`` objects takes about 0.2 s (1130 species), while
a calculation needs a dozen of them. :func:`read` only scans the file's text for the ``- name:``
lines that start its species (the files are YAML written one species after another under
``species:``); :meth:`SpeciesFile.species` then hands Cantera the text of that one species, with
the file's ``units`` line, so Cantera reads it exactly as it reads the whole file (a test checks
every species of every file against ``cantera.Species.list_from_file``).

>>> from co2routes.thermo.species import DATA_FILE
>>> ours = read(str(DATA_FILE))
>>> "NaHCO3(s)" in ours.names
True
>>> round(ours.species("NaHCO3(s)").thermo.h(298.15) / 1e6, 2)
-950.81
"""

from __future__ import annotations

import os
import re
from dataclasses import dataclass
from functools import lru_cache
from typing import Mapping

from co2routes.thermo._lazy import cantera

_NAME = re.compile(r"^- name: *(.+?) *$", re.MULTILINE)
_UNITS = re.compile(r"^units: .*$", re.MULTILINE)


@dataclass(frozen=True, slots=True)
class SpeciesFile:
    """The species of one YAML file, as text until asked for."""

    path: str
    """Where the file is."""
    units: str
    """The file's top-level ``units:`` line (empty when it has none)."""
    blocks: Mapping[str, str]
    """Cantera name -> the YAML text of that species (a one-item list)."""

    @property
    def names(self) -> tuple[str, ...]:
        """Every species name, in the file's order."""
        return tuple(self.blocks)

    def species(self, name: str):
        """The ``cantera.Species`` called ``name`` (read now, not kept)."""
        text = f"{self.units}\nspecies:\n{self.blocks[name]}"
        return cantera().Species.list_from_yaml(text, section="species")[0]


def locate(name: str) -> str:
    """The path of a species file the way Cantera finds it: as given when it exists, else in
    Cantera's data directories (``cantera.get_data_directories()``, in order)."""
    if os.path.isfile(name):
        return name
    for folder in cantera().get_data_directories():
        path = os.path.join(folder, name)
        if os.path.isfile(path):
            return path
    raise FileNotFoundError(f"species file {name} is not in Cantera's data directories")


@lru_cache(maxsize=None)
def read(name: str) -> SpeciesFile:
    """Scan the species file ``name`` (a path, or a file in Cantera's data directories); once."""
    path = locate(name)
    with open(path, encoding="utf-8") as handle:
        text = handle.read()
    starts = [(m.start(), m.group(1)) for m in _NAME.finditer(text)]
    ends = [start for start, _ in starts[1:]] + [len(text)]
    blocks = {found: text[start:end] for (start, found), end in zip(starts, ends)}
    units = _UNITS.search(text)
    return SpeciesFile(path, units.group(0) if units else "", blocks)

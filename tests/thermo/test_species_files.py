"""Species read one at a time (thermo/species_files.py) are the species Cantera reads from the whole
file: the reference is Cantera itself (``cantera.Species.list_from_file``), compared exactly."""

from __future__ import annotations

import subprocess
import sys

import cantera as ct
import pytest

from co2routes.thermo import species, species_files

FILES = ["nasa_gas.yaml", "nasa_condensed.yaml", str(species.DATA_FILE)]


def same(one: ct.Species, other: ct.Species) -> None:
    assert one.name == other.name
    assert one.composition == other.composition
    assert one.molecular_weight == other.molecular_weight
    assert one.input_data == other.input_data
    assert (one.thermo.min_temp, one.thermo.max_temp) == (other.thermo.min_temp, other.thermo.max_temp)
    low, high = one.thermo.min_temp, one.thermo.max_temp
    for t in (low, 298.15 if low <= 298.15 <= high else low, (low + high) / 2, high):
        # exact: the same coefficients evaluated by the same code (tolerance 0)
        assert one.thermo.h(t) == other.thermo.h(t)
        assert one.thermo.s(t) == other.thermo.s(t)
        assert one.thermo.cp(t) == other.thermo.cp(t)


@pytest.mark.parametrize("name", FILES)
def test_every_species_read_alone_is_the_one_read_with_its_file(name):
    whole = ct.Species.list_from_file(name)
    scanned = species_files.read(name)
    assert scanned.names == tuple(sp.name for sp in whole)
    for sp in whole:
        same(scanned.species(sp.name), sp)


def test_a_missing_file_is_named():
    with pytest.raises(FileNotFoundError, match="no_such_species.yaml"):
        species_files.read("no_such_species.yaml")


def test_one_enthalpy_reads_only_the_species_it_needs():
    """Looking a species up lists every name but reads the data of that species alone."""
    code = ("from co2routes.thermo import species; species.enthalpy('CO2(g)', 298.15); "
            "print(species._species.cache_info().currsize, len(species.known_names()) > 500)")
    out = subprocess.run([sys.executable, "-c", code], capture_output=True, text=True, check=True)
    assert out.stdout.split() == ["1", "True"]

"""The wheel lists every package folder: a folder missing from pyproject's list would work in an
editable install and be absent from a real one."""

from __future__ import annotations

import pathlib
import tomllib

TOP = pathlib.Path(__file__).resolve().parents[1]


def test_every_package_folder_is_in_the_wheel():
    config = tomllib.loads((TOP / "pyproject.toml").read_text())["tool"]["setuptools"]
    listed = set(config["packages"])
    mapped = {folder: name for name, folder in config["package-dir"].items()}
    found = set()
    for folder, name in mapped.items():
        for init in (TOP / folder).rglob("__init__.py"):
            relative = init.parent.relative_to(TOP / folder)
            found.add(".".join([name, *relative.parts]))
    assert found == listed

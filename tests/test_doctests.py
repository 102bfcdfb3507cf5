"""Every docstring example of the installed package runs, under its installed name (co2routes.*).

The examples are collected from the modules as Python imports them, not from the folders, so a
module that only works because the repository's top is on ``sys.path`` fails here. Flags as
pytest's own doctest runner: NORMALIZE_WHITESPACE, ELLIPSIS and NUMBER (pytest's float match).
"""

from __future__ import annotations

import doctest
import importlib
import pkgutil

import pytest
from _pytest.doctest import _get_checker  # pytest's own checker (its NUMBER flag)


_NUMBER = doctest.OPTIONFLAGS_BY_NAME.get("NUMBER") or doctest.register_optionflag("NUMBER")
_FLAGS = doctest.NORMALIZE_WHITESPACE | doctest.ELLIPSIS | _NUMBER


def _modules() -> list[str]:
    # walked one subpackage at a time: an editable install maps each to its own folder
    names = ["co2routes", "co2routes.api"]
    for sub in ("thermo", "sources", "tui"):
        package = importlib.import_module(f"co2routes.{sub}")
        names.append(package.__name__)
        names += [info.name for info in pkgutil.walk_packages(package.__path__, f"{package.__name__}.")]
    return sorted(names)


def _examples(name: str) -> list[doctest.DocTest]:
    module = importlib.import_module(name)
    finder = doctest.DocTestFinder(exclude_empty=True)
    return [t for t in finder.find(module, name) if t.examples]


MODULES = _modules()


def test_every_package_folder_installs_under_the_namespace():
    # the layout issue: these three must be found only as co2routes.*
    assert {"co2routes.thermo", "co2routes.sources", "co2routes.tui", "co2routes.api"} <= set(MODULES)


@pytest.mark.parametrize("name", [m for m in MODULES if not m.startswith("co2routes.tui.screens")
                                  and not m.startswith("co2routes.tui.app")])
def test_docstring_examples(name):
    tests = _examples(name)
    runner = doctest.DocTestRunner(checker=_get_checker(), optionflags=_FLAGS)
    for test in tests:
        runner.run(test)
    result = runner.summarize(verbose=False)
    assert result.failed == 0, f"{result.failed} docstring example(s) failed in {name}"

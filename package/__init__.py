"""co2routes: plan a small carbon-dioxide supply end to end.

The repository keeps its folders ``thermo/``, ``sources/`` and ``tui/`` at the top; they install
as ``co2routes.thermo``, ``co2routes.sources`` and ``co2routes.tui`` (see ``pyproject.toml``), so
no top-level name of another distribution is claimed. A plug-in author imports
:mod:`co2routes.api` only.
"""

__version__ = "0.2.0"

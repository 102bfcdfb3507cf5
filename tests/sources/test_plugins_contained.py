"""Broken route plug-ins are reported by name and left out, in every command (README, "Bad input").

The plug-ins here are test doubles registered through a stand-in for the entry-point lookup; each
breaks in one way a third-party route could: at import, at construction, in its shape, or in
what ``compute`` does or returns.
"""

from __future__ import annotations

import dataclasses
import sys

import pytest

from co2routes.sources import registry
from co2routes.sources.base import Option
from co2routes.tui.cli import main

sys.path.insert(0, str(__import__("pathlib").Path(__file__).parents[1] / "tui"))
from doubles import LinearRoute  # noqa: E402


class FakeEntryPoint:
    """What :func:`importlib.metadata.entry_points` yields: a name, a value and ``load()``."""

    def __init__(self, name, load):
        self.name, self.value, self._load = name, f"fake_plugins:{name}", load

    def load(self):
        return self._load()


def _raise(err):
    def load():
        raise err
    return load


class Broken(LinearRoute):
    """A double whose compute result is spoilt by ``spoil`` (or replaced by what it returns)."""

    def __init__(self, rid, spoil):
        super().__init__(rid, f"Broken {rid}", "sodium-bicarbonate", 1.9, 4.0, 2, 0.97)
        self.spoil = spoil

    def compute(self, request):
        return self.spoil(super().compute(request))


def _exit(_):
    sys.exit(3)


def _raise_value(_):
    raise ValueError("boom")


def _negative(result):
    reagent = dataclasses.replace(result.reagents[0], mass_kg=-5.0)
    return dataclasses.replace(result, reagents=(reagent,))


class NoOptions:
    id, label = "no-options", "No options"

    def compute(self, request):  # pragma: no cover - never called: refused at load
        raise AssertionError


class NoneOptions(NoOptions):
    id, options = "none-options", None


class BadId(NoOptions):
    id, options = "Bad Id!", ()


class Explodes:
    def __init__(self):
        raise RuntimeError("cannot build")


RUNTIME = {
    "raises": _raise_value,
    "exits": _exit,
    "returns-none": lambda r: None,
    "returns-dict": lambda r: {"co2_kg": 1.0},
    "negative-mass": _negative,
    "nan-heat": lambda r: dataclasses.replace(r, heat_kj=float("nan")),
    "inf-time": lambda r: dataclasses.replace(r, time_h=float("inf")),
    "zero-co2": lambda r: dataclasses.replace(r, co2_kg=0.0),
}
LOADTIME = {
    "import-error": _raise(ImportError("no module named nowhere")),
    "exit-at-import": _raise(SystemExit(1)),
    "no-options": lambda: NoOptions(),
    "none-options": lambda: NoneOptions(),
    "bad-id": lambda: BadId(),
    "constructor-raises": lambda: Explodes,
    "duplicate-id": lambda: LinearRoute("fermentation", "Second fermentation", "sucrose", 1.0, 0.0, 1, 0.9),
}


@pytest.fixture
def plugins(monkeypatch, tmp_path):
    """The real routes plus every broken double; the catalogue cache is cleared around the test."""
    import co2routes.sources.prices as prices

    real = list(registry.entry_points(group=registry.GROUP))
    fakes = [FakeEntryPoint(name, load) for name, load in LOADTIME.items()]
    fakes += [FakeEntryPoint(f"zz-{name}", (lambda n=name, s=spoil: Broken(f"zz-{n}", s)))
              for name, spoil in RUNTIME.items()]
    monkeypatch.setattr(registry, "entry_points", lambda group: real + fakes)
    monkeypatch.setattr(prices, "user_book_path", lambda: tmp_path / "none.toml")
    registry.catalogue.cache_clear()
    yield
    registry.catalogue.cache_clear()


def _run(argv, capsys):
    code = main(argv)
    out, err = capsys.readouterr()
    assert "Traceback" not in out + err
    return code, out, err


def test_every_broken_plugin_is_named_at_load_and_left_out(plugins):
    cat = registry.catalogue()
    ids = [r.id for r in cat.routes]
    assert ids.count("fermentation") == 1 and "Bad Id!" not in ids
    text = "\n".join(cat.failures)
    for name in LOADTIME:
        assert repr(name) in text, name
    assert "SystemExit" in text and "is taken by another route" in text


@pytest.mark.parametrize("argv", [
    ["compare", "--json"],
    ["sensitivity", "--json"],
    ["uncertainty", "--samples", "40", "--seed", "1", "--json"],
])
def test_every_command_ranks_the_good_routes_and_names_the_broken(plugins, argv, capsys):
    import json

    code, out, err = _run(argv, capsys)
    assert code == 0, err
    answer = json.loads(out)
    failures = "\n".join(answer["failures"])
    for name in RUNTIME:
        assert f"zz-{name}" in failures, name
    for name in LOADTIME:
        assert repr(name) in failures, name
    listed = json.dumps(answer["routes"])
    assert "zz-" not in listed and "fermentation" in listed


def test_routes_lists_the_good_ones_and_the_failures(plugins, capsys):
    code, out, _ = _run(["routes"], capsys)
    assert code == 0 and "fermentation" in out and "exit-at-import" in out


@pytest.mark.parametrize("name", sorted(RUNTIME))
def test_batch_of_a_broken_route_is_one_line_naming_it(plugins, name, capsys):
    code, out, err = _run(["batch", f"zz-{name}"], capsys)
    assert code == 2 and out == ""
    assert len(err.strip().splitlines()) == 1 and f"zz-{name}" in err


def test_a_route_that_refuses_is_named(monkeypatch):
    from co2routes.sources.pipeline import evaluate
    from co2routes.sources.scenario import demo
    from co2routes.thermo.errors import InputError

    def refuse(_):
        raise InputError("temperature", "too cold for this route")

    route = Broken("picky", lambda r: r)
    monkeypatch.setattr(route, "compute", refuse)
    with pytest.raises(InputError, match=r"^route picky: temperature: too cold"):
        evaluate(route, demo())


def test_options_must_be_options():
    with pytest.raises(TypeError, match="options"):
        registry.checked_route(type("R", (), {"id": "r", "label": "R", "options": ("x",),
                                              "compute": lambda self, q: None})())
    assert registry.checked_route(LinearRoute("ok", "OK", "k", 1.0, 0.0, 1, 0.9)).options[0].key == "grade"
    assert isinstance(Option("a", "a", "count", "1"), Option)


def test_the_interface_computation_leaves_broken_routes_out(tmp_path, monkeypatch):
    # what the interface's ranking worker and its cost-against-batch chart call
    import co2routes.sources.prices as prices
    from co2routes.tui.compute import demand_sweep, outcome

    monkeypatch.setattr(prices, "user_book_path", lambda: tmp_path / "none.toml")
    good = LinearRoute("good", "Good", "sodium-bicarbonate", 1.9, 4.0, 2, 0.97)
    broken = [Broken(f"zz-{name}", spoil) for name, spoil in RUNTIME.items()]
    result = outcome({"demand": "1 kg"}, "s.toml", None, [good, *broken])
    assert [row.result.route_id for row in result.comparison.rows] == ["good"]
    assert len(result.comparison.failures) == len(RUNTIME)
    sweep = demand_sweep(result.scenario, [good, *broken], known=result.comparison)
    assert sweep is not None and set(sweep.cost_per_kg) == {"good"}

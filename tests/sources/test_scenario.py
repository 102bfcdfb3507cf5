"""Scenario files: demo, validation messages with file/key/line, exact round trip, atomic write."""

import os
import tomllib

import pytest

from co2routes.sources import scenario as sc
from co2routes.sources.filewrite import write_atomic
from co2routes.thermo.errors import InputError


def test_demos_are_labelled_invented_and_validate():
    for which in sc.DEMOS:
        text = sc.demo_text(which)
        assert "INVENTED" in text
        s = sc.demo(which)
        assert s.co2_kg > 0


def test_rate_demand_times_batch_gives_batch_mass():
    s = sc.validate({"demand": "2 kg/day", "batch": "12 h"})
    assert s.co2_kg == pytest.approx(1.0)
    assert sc.validate({"demand": "3 kg"}).batch_s is None


def test_error_names_file_key_and_line(tmp_path):
    path = tmp_path / "mine.toml"
    path.write_text('demand = "1 kg/day"\n\n[site]\ntemperature = "hot"\n')
    with pytest.raises(InputError) as err:
        sc.load(path)
    text = str(err.value)
    assert "mine.toml, line 4: site.temperature" in text and "\n" not in text


@pytest.mark.parametrize("doc, field", [
    ({}, "demand"),
    ({"demand": "-1 kg"}, "demand"),
    ({"demand": "1 kg", "end_product": "steam"}, "end_product"),
    ({"demand": "1 kg", "colour": "red"}, "colour"),
    ({"demand": "1 kg", "weights": {"cost": -1}}, "weights.cost"),
    ({"demand": "1 kg", "dryer": {"target_ppmv": "20"}}, "dryer.target_ppmv"),
    ({"demand": "1 kg", "delivery": {"stages": 0}}, "delivery.stages"),
    ({"demand": "1 kg", "prices": {"sucrose": "1 / K"}}, "sucrose"),
])
def test_bad_documents_name_the_key(doc, field):
    with pytest.raises(InputError) as err:
        sc.validate(doc)
    assert field in str(err.value)


def test_malformed_toml_names_the_file(tmp_path):
    path = tmp_path / "broken.toml"
    path.write_text("demand = \n")
    with pytest.raises(InputError) as err:
        sc.load(path)
    assert "broken.toml" in str(err.value) and "line 1" in str(err.value)


def test_save_open_round_trip_is_exact(tmp_path):
    doc = tomllib.loads(sc.demo_text())
    path = tmp_path / "copy.toml"
    write_atomic(path, sc.to_toml(doc))
    again, _ = sc.read_document(path)
    assert again == doc


def test_write_atomic_never_overwrites_unasked_and_leaves_no_temp(tmp_path):
    path = tmp_path / "s.toml"
    path.write_text("keep me")
    with pytest.raises(InputError):
        write_atomic(path, "new")
    assert path.read_text() == "keep me"
    write_atomic(path, "new", overwrite=True)
    assert path.read_text() == "new"
    assert [p.name for p in tmp_path.iterdir()] == ["s.toml"]


@pytest.mark.skipif(os.geteuid() == 0, reason="root can write into a read-only folder")
def test_read_only_folder_is_an_input_error(tmp_path):
    folder = tmp_path / "ro"
    folder.mkdir()
    folder.chmod(0o500)
    try:
        with pytest.raises(InputError):
            write_atomic(folder / "s.toml", "x")
    finally:
        folder.chmod(0o700)


def test_dry_ice_hold_time_adds_the_box_loss_to_what_is_made():
    from co2routes.sources.pipeline import evaluate
    from co2routes.sources.registry import catalogue

    base = sc.validate({"demand": "3 kg", "end_product": "dry-ice", "site": {"temperature": "20 degC"}})
    held = sc.validate({"demand": "3 kg", "end_product": "dry-ice", "site": {"temperature": "20 degC"},
                        "delivery": {"hold_time": "24 h", "box_area": "0.6 m**2", "box_u": "0.7 W/m**2/K"}})
    route = catalogue().get("fermentation")
    a, b = evaluate(route, base), evaluate(route, held)
    # hand calculation: U A (T - 194.686 K) t / 573.3 kJ/kg (Giauque & Egan 1937 enthalpy of
    # sublimation) = 0.7 * 0.6 * 98.464 * 86400 / 573300 = 6.232 kg more dry ice made
    extra = 0.7 * 0.6 * (293.15 - 194.686) * 86400 / 573.3e3
    assert b.co2_kg / a.co2_kg == pytest.approx((3.0 + extra) / 3.0, rel=1e-9)
    assert b.product_kg == a.product_kg == 3.0
    assert b.cost_per_kg > a.cost_per_kg
    with pytest.raises(InputError):
        sc.validate({"demand": "3 kg", "delivery": {"hold_time": "-1 h"}})

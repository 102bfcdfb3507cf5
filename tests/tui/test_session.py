"""The interface's file and document logic, without widgets."""

from __future__ import annotations

import os
import tomllib

import pytest

from co2routes.sources.scenario import demo_text, read_document
from co2routes.thermo.errors import InputError
from co2routes.tui.fields import BASE_FIELDS, match_field, price_value
from co2routes.tui.session import ChangedOnDisk, edited, export, export_format, open_demo, open_file, save, stamp_of


def test_save_open_round_trip_is_exact(tmp_path):
    opened = open_demo("science-fair")
    path = tmp_path / "fair.toml"
    stamp = save(path, opened.document, expected=None)
    again = open_file(path)
    assert again.document == opened.document == tomllib.loads(demo_text("science-fair"))
    assert again.stamp == stamp == stamp_of(path)


def test_save_refuses_a_changed_file_until_told(tmp_path):
    path = tmp_path / "s.toml"
    path.write_text('demand = "1 kg"\n', encoding="utf-8")
    opened = open_file(path)
    path.write_text('demand = "7 kg"\n', encoding="utf-8")
    os.utime(path, ns=(5, 5))
    with pytest.raises(ChangedOnDisk):
        save(path, {"demand": "2 kg"}, expected=opened.stamp)
    assert read_document(path)[0] == {"demand": "7 kg"}
    save(path, {"demand": "2 kg"}, expected=opened.stamp, replace=True)
    assert read_document(path)[0] == {"demand": "2 kg"}


def test_save_as_never_replaces_without_being_told(tmp_path):
    path = tmp_path / "taken.toml"
    path.write_text("x = 1\n", encoding="utf-8")
    with pytest.raises(InputError, match="already exists"):
        save(path, {"demand": "1 kg"}, expected=None)
    assert path.read_text() == "x = 1\n"
    with pytest.raises(InputError, match="already exists"):
        export(path, "text")
    assert [p.name for p in tmp_path.iterdir()] == ["taken.toml"]  # no temporary file left


def test_edit_removes_emptied_tables_and_leaves_the_original():
    doc = {"site": {"pressure": "1 atm"}, "demand": "1 kg"}
    new = edited(doc, ("site", "pressure"), None)
    assert new == {"demand": "1 kg"} and doc == {"site": {"pressure": "1 atm"}, "demand": "1 kg"}


def test_error_field_names_find_their_form_field():
    # field names as co2routes.sources.scenario.validate writes them (file, line, dotted key)
    f = match_field(BASE_FIELDS, "fair.toml, line 9: dryer.target_ppmv")
    assert f is not None and f.keys == ("dryer", "target_ppmv")
    assert match_field(BASE_FIELDS, "option strength") is None


def test_price_override_keeps_the_books_strength():
    from co2routes.sources.prices import demo_book

    book = demo_book()
    assert price_value(book, "hydrochloric-acid", "0.50 / kg") == {"price": "0.50 / kg", "strength": "31 %"}
    assert price_value(book, "sucrose", " 0.9 / kg ") == "0.9 / kg"
    assert price_value(book, "sucrose", "") is None


def test_export_format_follows_the_ending():
    assert [export_format(n) for n in ("a.md", "b.CSV", "c.json")] == ["markdown", "csv", "json"]
    with pytest.raises(InputError):
        export_format("a.txt")

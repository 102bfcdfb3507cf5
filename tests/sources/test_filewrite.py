"""Saving keeps the user's file: comments, order, blank lines and mode survive; only the changed
value is rewritten; a symlink is written through; a save that cannot succeed says so at once."""

from __future__ import annotations

import os
import stat
import tomllib

import pytest

from co2routes.sources.filewrite import AlreadyExists, updated_text, write_atomic
from co2routes.thermo.errors import InputError
from co2routes.tui.session import edited, open_file, save

COMMENTED = """\
# My greenhouse: written by hand, please keep these notes.
#
# Demand measured over a fortnight in May.

name = "greenhouse"
demand = "1.5 kg/day"   # enough for the tomatoes
end_product = "gas"

[site]
temperature = "18 degC" # inside, not outside
pressure = "1 atm"

# weights I settled on after trying a few
[weights]
cost = 3
hazard = 2  # children visit
"""


def test_one_changed_value_changes_one_line(tmp_path):
    path = tmp_path / "mine.toml"
    path.write_text(COMMENTED, encoding="utf-8")
    opened = open_file(path)
    document = edited(opened.document, ("site", "temperature"), "21 degC")
    save(path, document, expected=opened.stamp, base=opened.text)
    before, after = COMMENTED.splitlines(), path.read_text(encoding="utf-8").splitlines()
    assert len(after) == len(before)
    changed = [(a, b) for a, b in zip(before, after) if a != b]
    assert changed == [('temperature = "18 degC" # inside, not outside',
                        'temperature = "21 degC" # inside, not outside')]
    assert tomllib.loads("\n".join(after)) == document


def test_removed_and_added_keys_leave_the_rest_alone():
    document = edited(tomllib.loads(COMMENTED), ("site", "pressure"), None)
    document = edited(document, ("weights", "energy"), 1.5)
    text = updated_text(COMMENTED, document)
    assert tomllib.loads(text) == document
    assert 'pressure = "1 atm"' not in text
    assert text.startswith(COMMENTED.split("[site]")[0])  # header and top keys untouched
    assert "hazard = 2  # children visit" in text and "energy = 1.5" in text


def test_mode_survives_a_save_and_a_new_file_follows_the_umask(tmp_path):
    path = tmp_path / "shared.toml"
    path.write_text('demand = "1 kg"\n', encoding="utf-8")
    path.chmod(0o644)
    write_atomic(path, 'demand = "2 kg"\n', overwrite=True)
    assert stat.S_IMODE(path.stat().st_mode) == 0o644
    path.chmod(0o640)
    write_atomic(path, 'demand = "3 kg"\n', overwrite=True)
    assert stat.S_IMODE(path.stat().st_mode) == 0o640
    old = os.umask(0o022)
    try:
        write_atomic(tmp_path / "new.toml", "x = 1\n")
    finally:
        os.umask(old)
    assert stat.S_IMODE((tmp_path / "new.toml").stat().st_mode) == 0o644


def test_a_symlink_is_written_through(tmp_path):
    target = tmp_path / "real" / "s.toml"
    target.parent.mkdir()
    target.write_text('demand = "1 kg"\n', encoding="utf-8")
    link = tmp_path / "link.toml"
    link.symlink_to(target)
    write_atomic(link, 'demand = "4 kg"\n', overwrite=True)
    assert link.is_symlink() and os.readlink(link) == str(target)
    assert target.read_text(encoding="utf-8") == 'demand = "4 kg"\n'
    assert sorted(p.name for p in target.parent.iterdir()) == ["s.toml"]  # no temporary file left


def test_demo_command_writes_through_a_link_with_the_targets_mode(tmp_path):
    from co2routes.tui.cli import main

    target = tmp_path / "target.toml"
    target.write_text("old\n", encoding="utf-8")
    target.chmod(0o664)
    link = tmp_path / "link.toml"
    link.symlink_to(target)
    assert main(["demo", str(link), "--overwrite"]) == 0
    assert link.is_symlink() and "invented" in target.read_text(encoding="utf-8").lower()
    assert stat.S_IMODE(target.stat().st_mode) == 0o664


def test_existing_file_is_a_question_and_an_unwritable_place_is_a_plain_error(tmp_path):
    path = tmp_path / "taken.toml"
    path.write_text("x = 1\n", encoding="utf-8")
    with pytest.raises(AlreadyExists, match="--overwrite"):
        write_atomic(path, "y = 2\n")
    with pytest.raises(AlreadyExists):
        save(path, {"demand": "1 kg"}, expected=None)
    # a folder that does not exist is refused before any question about replacing
    with pytest.raises(InputError) as err:
        save(tmp_path / "no" / "such.toml", {"demand": "1 kg"}, expected=None)
    assert not isinstance(err.value, AlreadyExists) and "does not exist" in str(err.value)


def test_an_inline_table_stays_inline():
    base = '[prices]\nhydrochloric-acid = {price = "0.45 / kg", strength = "31 %"}  # my supplier\n'
    doc = {"prices": {"hydrochloric-acid": {"price": "0.50 / kg", "strength": "31 %"}}}
    text = updated_text(base, doc)
    assert text == '[prices]\nhydrochloric-acid = {price = "0.50 / kg", strength = "31 %"}  # my supplier\n'

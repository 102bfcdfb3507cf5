"""Running the command line inside a test: one helper for every test file that needs it."""

from __future__ import annotations

import json

from co2routes.tui.cli import main


def run_cli(capsys, *argv):
    """``co2routes ARGV --json`` in this process: the parsed answer and what went to stderr.

    Fails the test when the exit status is not 0, showing stderr.
    """
    code = main([*argv, "--json"])
    captured = capsys.readouterr()
    assert code == 0, captured.err
    return json.loads(captured.out), captured.err


def run_json(capsys, *argv):
    """``co2routes ARGV --json`` in this process: the parsed answer (exit status 0 asserted)."""
    return run_cli(capsys, *argv)[0]

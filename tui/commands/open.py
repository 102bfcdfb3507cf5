"""``co2routes open FILE.toml``: the interface on a scenario file.

A file that is missing, unreadable or not TOML is refused on the command line (one line, exit
status 2); a file whose values are wrong opens, with each refused value marked beside its field.
"""

from __future__ import annotations

import argparse

NAME = "open"
HELP = "open the interface on a scenario file (with no command: on the invented demo)"
WANTS_FORMAT_FLAGS = False


def add_arguments(parser: argparse.ArgumentParser) -> None:
    """Options of ``open``."""
    parser.add_argument("file", help="scenario TOML file")


def run(args: argparse.Namespace) -> dict:
    """Check the file can be read, then run the interface on it until the user quits."""
    from co2routes.tui.cli import _open_interface
    from co2routes.tui.session import open_file

    opened = open_file(args.file)
    status = _open_interface(str(opened.path))
    if status:  # the interface stopped on a fault and has said where the scenario was kept
        raise SystemExit(status)
    return {"file": str(opened.path), "exit_status": status, "warnings": [], "cautions": []}


def render(answer: dict, args: argparse.Namespace) -> str:
    """Nothing to print after the interface closes but the file it had open."""
    return f"closed {answer['file']}"

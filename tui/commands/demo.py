"""``co2routes demo [FILE]``: write (or print) an invented demo scenario to start from."""

from __future__ import annotations

import argparse

NAME = "demo"
HELP = "write an invented demo scenario to FILE (or print it) to start your own from"
WANTS_FORMAT_FLAGS = False


def add_arguments(parser: argparse.ArgumentParser) -> None:
    """Options of ``demo``."""
    parser.add_argument("file", nargs="?", help="where to write it (default: print to the screen)")
    parser.add_argument("--which", default="polytunnel", help="polytunnel (gas, per day) or science-fair (dry ice)")
    parser.add_argument("--overwrite", action="store_true", help="replace FILE if it exists")


def run(args: argparse.Namespace) -> dict:
    """Write the demo scenario atomically, never over an existing file unless asked."""
    from co2routes.sources.filewrite import write_atomic
    from co2routes.sources.scenario import demo_text
    from co2routes.tui.commands._options import for_option

    with for_option("--which"):
        text = demo_text(args.which)
    if args.file:
        from co2routes.sources.limits import file_action

        with file_action(args.file, "written"):
            write_atomic(args.file, text, overwrite=args.overwrite)
    args._text = text
    return {"file": args.file}


def render(answer: dict, args: argparse.Namespace) -> str:
    """The text, or where it went."""
    return f"wrote the invented demo scenario to {answer['file']}" if answer["file"] else args._text.rstrip("\n")

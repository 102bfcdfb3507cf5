"""The ``co2routes`` command line.

With no verb it opens the interface on the demo scenario. Each verb lives in its own module under
:mod:`co2routes.tui.commands`; this module only wires them, prints their answer and turns a user's mistake
into one line on stderr with exit status 2.
"""

from __future__ import annotations

import argparse
import importlib
import re
import sys
from typing import Sequence

from co2routes.thermo.errors import InputError

#: The verbs, in the order ``--help`` lists them; each is ``co2routes.tui.commands.<module>``.
COMMANDS: tuple[str, ...] = (
    "compare",
    "demand",
    "sensitivity",
    "uncertainty",
    "batch",
    "routes",
    "demo",
    "open",
    "saturation",
    "store",
    "snow",
    "liquefy",
    "moisture",
    "dryer",
    "reaction",
    "calcination",
)

PROG = "co2routes"


class _Parser(argparse.ArgumentParser):
    """An argument parser whose errors are one line and exit with status 2."""

    def error(self, message: str) -> None:  # noqa: D401 - argparse hook
        self.exit(2, f"{self.prog}: error: {' '.join(message.split())}\n")

    def _parse_optional(self, arg_string: str):  # argparse hook
        # "-20degC", "-4 degF", "-1.5kg" are values, not options: no option starts with a digit
        if re.match(r"^-\.?\d", arg_string):
            return None
        return super()._parse_optional(arg_string)


def build_parser() -> argparse.ArgumentParser:
    """The full parser, with one sub-parser per verb."""
    parser = _Parser(
        prog=PROG,
        description=(
            "Plan a small CO2 supply: compare sourcing routes, plan a batch, size the dryer and "
            "plan compression, storage and dry ice. With no command, opens the interface."
        ),
    )
    sub = parser.add_subparsers(dest="command", metavar="COMMAND", parser_class=_Parser)
    for name in COMMANDS:
        module = importlib.import_module(f"co2routes.tui.commands.{name}")
        text = module.HELP.replace("%", "%%")  # argparse %-formats help strings
        p = sub.add_parser(module.NAME, help=text, description=module.HELP)
        module.add_arguments(p)
        if getattr(module, "WANTS_FORMAT_FLAGS", True):
            p.add_argument("--json", action="store_true", help="print the answer as JSON (SI units)")
        p.set_defaults(_module=module)
    return parser


def main(argv: Sequence[str] | None = None) -> int:
    """Entry point of the ``co2routes`` console script; returns the exit status."""
    argv = list(sys.argv[1:] if argv is None else argv)
    parser = build_parser()
    args = parser.parse_args(argv)
    if args.command is None:
        return _open_interface(None)
    from co2routes.sources.guard import RouteFault
    from co2routes.tui.output import answer_text, clean_text

    try:
        text = answer_text(args._module.run(args), args)
    except (InputError, RouteFault) as err:
        print(clean_text(f"{PROG} {args.command}: error: {err}"), file=sys.stderr)
        return 2
    except (RecursionError, OverflowError, MemoryError) as err:
        print(f"{PROG} {args.command}: error: the input is too large or too deep to work with "
              f"({type(err).__name__})", file=sys.stderr)
        return 2
    except Exception as err:  # noqa: BLE001 - a fault of ours: one line, not a traceback
        print(clean_text(f"{PROG} {args.command}: internal error, please report it: "
                         f"{type(err).__name__}: {' '.join(str(err).split())[:300]}"), file=sys.stderr)
        return 1
    try:
        sys.stdout.write(text)
        sys.stdout.flush()
    except BrokenPipeError:
        return 0
    return 0


def _open_interface(path: str | None) -> int:
    """Open the terminal interface (or, until it exists, show the help)."""
    try:
        app_module = importlib.import_module("co2routes.tui.app")
    except ModuleNotFoundError:
        build_parser().print_help()
        return 0
    return app_module.run_app(path)


if __name__ == "__main__":  # pragma: no cover
    sys.exit(main())

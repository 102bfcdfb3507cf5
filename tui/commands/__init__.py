"""One module per command-line verb.

Each module defines ``NAME`` (the verb), ``HELP`` (one line), ``add_arguments(parser)`` and
``run(args) -> dict``. The dict is the command's JSON answer: SI numbers under snake_case keys that
end in their unit, ``None`` for unknown, and ``warnings`` and ``cautions`` lists. Modules import
nothing heavy at top level: Cantera and CoolProp are imported inside ``run``.
"""

"""The interface's widgets: each file one widget family, its messages beside it, its own .tcss."""

from importlib import resources


def css_of(module_file: str, name: str | None = None) -> str:
    """The text of the ``.tcss`` file shipped beside a widget module (``widgets/form.py`` ->
    ``widgets/form.tcss``), or of the file ``name`` in the same folder."""
    from pathlib import Path

    name = name or Path(module_file).with_suffix(".tcss").name
    return resources.files("co2routes.tui.widgets").joinpath(name).read_text(encoding="utf-8")

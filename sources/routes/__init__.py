"""The built-in routes, one module each; each module exposes ``ROUTE``.

They are registered under the ``co2routes.sources`` entry-point group in ``pyproject.toml``, the
same way a third-party route would be.
"""

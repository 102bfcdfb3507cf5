"""Shared test settings."""

from hypothesis import settings

settings.register_profile("default", deadline=None, max_examples=40)
settings.load_profile("default")

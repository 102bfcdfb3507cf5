"""Small fake routes for the what-if tests (they do not depend on the real route models).

Their formulas are simple on purpose, so that each cost has a closed form to test against:
feed = 2 kg per kg of CO2 / efficiency, electricity 0.1 kWh per kg x (1 + (T - 293.15 K)/100),
and a fixed 0.5 kg of disposal per batch (so cost per kg falls with demand).
"""

from __future__ import annotations

from co2routes.sources.base import Energy, Option, RawGas, Reagent, RouteRequest, RouteResult, Use


class FakeRoute:
    """A route satisfying :class:`co2routes.sources.base.Route`."""

    def __init__(self, route_id: str = "fake", feed_key: str = "sucrose", feed_per_kg: float = 2.0) -> None:
        self.id = route_id
        self.label = f"fake route {route_id}"
        self.feed_key = feed_key
        self.feed_per_kg = feed_per_kg
        self.options = (
            Option("efficiency", "efficiency", "fraction", "90 %", low=0.5, high=1.0),
            Option("temperature", "liquor temperature", "temperature", "20 degC", low=273.15, high=373.15),
            Option("vessel", "vessel", "choice", "bucket", choices=("bucket", "drum")),
        )
        self.calls = 0

    def compute(self, request: RouteRequest) -> RouteResult:
        self.calls += 1
        eff = request.options["efficiency"]
        t = request.options["temperature"]
        feed = self.feed_per_kg * request.co2_kg / eff
        kwh = 0.1 * request.co2_kg * (1.0 + (t - 293.15) / 100.0)
        return RouteResult(
            co2_kg=request.co2_kg, co2_generated_kg=request.co2_kg,
            reagents=(Reagent("feed", "X", feed, feed, None, self.feed_key),),
            byproducts=(),
            uses=(Use("electricity", kwh, "energy_kwh", "electricity"),
                  Use("disposal", 0.5, "mass_kg", "disposal")),
            raw_gas=RawGas({"CO2": 0.9, "H2O": 0.1}, t), heat_kj=0.0, temperature_change_k=None,
            energy=Energy(electricity_kwh=kwh), time_h=1.0, hazard=1,
            hazard_reason="fake", cautions=("fake caution",),
        )


def scenario(uncertain: dict | None = None, **prices):
    """A validated scenario (3 kg batch) with the demo book and optional ``[uncertain]`` entries."""
    from co2routes.sources.scenario import validate

    document = {"name": "what-if test", "demand": "3 kg", "prices": dict(prices)}
    if uncertain is not None:
        document["uncertain"] = uncertain
    return validate(document, "test")

"""Test doubles for the interface tests: two tiny route objects with the route interface.

They are NOT route models (the real ones live in sources/routes); they exist so the interface
tests can run whatever routes happen to be registered, and so the numbers they produce can be
checked against co2routes.sources.pipeline.compare on the same objects. Their only "physics" is a fixed
mass ratio, chosen so that the two routes trade places when demand or a price changes.
"""

from __future__ import annotations

from co2routes.sources.base import Energy, Option, RawGas, Reagent, RouteRequest, RouteResult, Use


class LinearRoute:
    """Buys ``ratio`` kg of one priced feed per kg CO2 and a fixed amount of electricity per batch."""

    def __init__(self, rid: str, label: str, price_key: str, ratio: float, fixed_kwh: float,
                 hazard: int, purity: float, delivers: str = "raw-gas") -> None:
        self.id, self.label, self.price_key = rid, label, price_key
        self.ratio, self.fixed_kwh, self.hazard, self.purity = ratio, fixed_kwh, hazard, purity
        self.delivers = delivers
        self.options = (Option("grade", "grade", "choice", "plain", choices=("plain", "fine")),)

    def compute(self, request: RouteRequest) -> RouteResult:
        mass = self.ratio * request.co2_kg
        water = 1.0 - self.purity
        return RouteResult(
            co2_kg=request.co2_kg, co2_generated_kg=request.co2_kg,
            reagents=(Reagent(self.price_key, "X", mass, mass, None, self.price_key),),
            byproducts=(), uses=(Use("electricity", self.fixed_kwh, "energy_kwh", "electricity"),),
            raw_gas=RawGas({"CO2": self.purity, "H2O": water}, request.site.temperature_k),
            heat_kj=-10.0 * request.co2_kg, temperature_change_k=None,
            energy=Energy(electricity_kwh=self.fixed_kwh), time_h=2.0 + self.hazard,
            hazard=self.hazard, hazard_reason="test double", cautions=("Test caution sentence.",),
            delivers=self.delivers,
        )


def routes() -> tuple[LinearRoute, LinearRoute]:
    """Two doubles: a cheap feed with a big fixed energy use, and a dear feed with none.

    Per kg CO2 at demand m [kg]: A = 1.2*1.9 + 0.30*4/m (+ a little for its dryer), B = 6.0*1.0
    (bought dry, no dryer); A is cheaper above about 0.32 kg.
    """
    return (LinearRoute("double-a", "Double A (bicarbonate)", "sodium-bicarbonate", 1.9, 4.0, 2, 0.97),
            LinearRoute("double-b", "Double B (cylinder)", "co2-cylinder", 1.0, 0.0, 1, 0.999, "gas"))

"""One route's batch as the comparison plans it: the route's own result plus what the plant adds.

A route computes a :class:`~co2routes.sources.base.RouteResult` (reagents, raw gas, heat, energy,
its own hazard). The comparison (:mod:`co2routes.sources.pipeline`) then dries the gas, delivers
it as the end product and prices everything; :class:`PlannedRoute` holds both, the route's answer
untouched in ``made``. The figures a report reads (``heat_kj``, ``raw_gas``, ``hazard`` ...) are
read through, so a report never needs to know which of the two set them.
"""

from __future__ import annotations

from dataclasses import dataclass
from typing import Any

from co2routes.sources.base import Byproduct, CostLine, Energy, RawGas, Reagent, RouteResult, Use


@dataclass(frozen=True, slots=True)
class PlannedRoute:
    """A route's batch made, dried, delivered as the end product and priced.

    ``product_kg`` is the end product (gas, liquid or dry ice) the batch yields [kg]; every per-kg
    figure divides by it. ``uses``, ``energy``, ``time_h``, ``warnings``, ``cautions`` and ``notes``
    are the route's with the dryer's and the delivery's added. ``dryer`` is a
    :class:`co2routes.thermo.dryer.DryerResult` or ``None`` (no dryer needed); ``delivery`` a
    :class:`co2routes.sources.delivery.Delivery` or ``None`` for a gas end product. ``costs`` one
    line per reagent and use, a line's cost ``None`` when its price is unknown.
    """

    route_id: str
    label: str
    made: RouteResult
    product_kg: float
    uses: tuple[Use, ...]
    energy: Energy
    time_h: float
    warnings: tuple[str, ...] = ()
    cautions: tuple[str, ...] = ()
    notes: tuple[str, ...] = ()
    dryer: Any = None
    delivery: Any = None
    costs: tuple[CostLine, ...] = ()
    #: the plant over time (:class:`co2routes.sources.plant.Schedule`), ``None`` outside a comparison
    schedule: Any = None
    #: what is owned (:class:`co2routes.sources.equipment.Item` lines) and its owning cost per kg
    #: of end product (0 when owned already or nothing is, ``None`` when a price is unknown)
    equipment: tuple[Any, ...] = ()
    capital_per_kg: float | None = 0.0
    #: refrigeration, cylinders and dry-ice box (:class:`co2routes.sources.stores.Stores`)
    stores: Any = None
    #: every step of the chain with its hazard (:class:`co2routes.sources.chain.Step`)
    hazard_steps: tuple[Any, ...] = ()

    # -- the route's own figures, read through -------------------------------------------------
    @property
    def co2_kg(self) -> float:
        """CO2 the route delivers per batch [kg] (raw CO2 for a flash, more than the product)."""
        return self.made.co2_kg

    @property
    def co2_generated_kg(self) -> float:
        """CO2 the route makes or buys per batch, before its own losses [kg]."""
        return self.made.co2_generated_kg

    @property
    def reagents(self) -> tuple[Reagent, ...]:
        """Feeds as bought."""
        return self.made.reagents

    @property
    def byproducts(self) -> tuple[Byproduct, ...]:
        """What is left over."""
        return self.made.byproducts

    @property
    def raw_gas(self) -> RawGas:
        """The gas as it leaves the route, before drying."""
        return self.made.raw_gas

    @property
    def heat_kj(self) -> float:
        """The batch's enthalpy change [kJ]; positive, it takes heat in."""
        return self.made.heat_kj

    @property
    def temperature_change_k(self) -> float | None:
        """The batch liquor's temperature change [K], ``None`` without a liquor."""
        return self.made.temperature_change_k

    @property
    def water_g_per_kg_co2(self) -> float:
        """Water the raw gas carries per kg of CO2 [g/kg]."""
        return self.made.water_g_per_kg_co2

    @property
    def hazard(self) -> int:
        """The whole chain's hazard level, 1 (low) to 3 (high): the highest of its steps (the
        route's own alone when no steps are known; that stays in ``made.hazard``)."""
        return self._top().level if self.hazard_steps else self.made.hazard

    @property
    def hazard_step(self) -> str:
        """The step that sets :attr:`hazard` (``making``, ``compression``, ...)."""
        return self._top().step if self.hazard_steps else "making"

    @property
    def hazard_reason(self) -> str:
        """Why the chain's hazard is at its level."""
        return self._top().reason if self.hazard_steps else self.made.hazard_reason

    def _top(self):
        from co2routes.sources.chain import highest

        return highest(self.hazard_steps)

    @property
    def delivers(self) -> str:
        """What the route hands over (``raw-gas``, ``gas``, ``liquid`` or ``dry-ice``)."""
        return self.made.delivers

    # -- per kg of the end product ----------------------------------------------------------------
    @property
    def per_kg_basis(self) -> float:
        """The mass every per-kg figure divides by: the end product [kg]."""
        return self.product_kg

    @property
    def energy_kwh_per_kg(self) -> float:
        """All energy used per kg of end product [kWh/kg]."""
        return self.energy.total_kwh / self.product_kg

    @property
    def reagent_kg_per_kg(self) -> float:
        """Mass of everything bought per kg of end product [kg/kg], fuel bought by its heating
        value included (:attr:`~co2routes.sources.base.Use.feed_kg`)."""
        return (sum(r.mass_kg for r in self.reagents) + sum(u.feed_kg for u in self.uses)) / self.product_kg

    @property
    def total_cost(self) -> float | None:
        """Sum of the cost lines, ``None`` if any line's price is unknown."""
        if any(line.cost is None for line in self.costs):
            return None
        return sum(line.cost for line in self.costs)  # type: ignore[misc]

    @property
    def running_per_kg(self) -> float | None:
        """Running cost (reagents, energy, consumables) per kg of end product, ``None`` if any
        price is unknown."""
        total = self.total_cost
        return None if total is None else total / self.product_kg

    @property
    def cost_per_kg(self) -> float | None:
        """Running plus owning cost per kg of end product, ``None`` if either is unknown."""
        running = self.running_per_kg
        if running is None or self.capital_per_kg is None:
            return None
        return running + self.capital_per_kg


@dataclass(frozen=True, slots=True)
class NotApplicable:
    """A route that cannot run for the scenario, with the reason it gave (naming the input)."""

    route_id: str
    label: str
    reason: str

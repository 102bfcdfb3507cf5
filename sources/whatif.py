"""What-if inputs: what may vary in a comparison, the distributions a scenario gives them, and a
route's cost split into price-linear lines.

Shared by :mod:`co2routes.sources.sensitivity` (one input swung at a time) and :mod:`co2routes.sources.uncertainty`
(Monte Carlo over every route at once).

The work lives in three modules, re-exported here: :mod:`co2routes.sources.targets` (what may vary
and a route evaluated with it set), :mod:`co2routes.sources.distributions` (spreads and the
``[uncertain]`` table) and :mod:`co2routes.sources.costmodel` (cost as price-linear lines).

**Inputs** are named by where they live in a scenario:

- ``prices.KEY``: a price book entry (the amount per kg, m3 or J; a solution's strength stays);
- ``options.ROUTE.KEY``: a numeric route option (``"choice"`` and ``"count"`` options cannot vary);
- ``demand``, ``site.temperature``, ``site.pressure``, ``site.air_co2``, ``dryer.target_dew_point``,
  ``dryer.cycle``, ``delivery.efficiency``, ``delivery.condensing_temperature``,
  ``delivery.intercool_temperature``.

**Distributions** come from a scenario table of this project's own design, ``[uncertain]``, one
entry per input, every quantity a string with units as elsewhere in the scenario::

    [uncertain]
    "prices.sucrose" = {dist = "triangular", low = "0.7 / kg", mode = "0.85 / kg", high = "1.1 / kg"}
    "options.fermentation.efficiency" = {dist = "uniform", low = "85 %", high = "95 %"}
    "site.temperature" = {dist = "normal", mean = "16 degC", sd = "3 K"}
    "prices.electricity" = {dist = "lognormal", mean = "0.30 / kWh", sd = "0.06 / kWh"}

``lognormal`` takes the arithmetic mean and standard deviation of the quantity itself. A standard
deviation of a temperature is a temperature difference (``"3 K"``, ``"3 delta_degC"``).

**Cost lines.** A route's cost is ``sum(line.cost)`` over ``PlannedRoute.costs`` divided by
the kg it is per (the end product, or the CO2 delivered); every line is its price's amount times a coefficient that does not depend on the
price (a mass, a volume or an energy), so cost is exactly linear in each price.
"""

from __future__ import annotations

from co2routes.sources.costmodel import CostModel, cost_model, price_keys
from co2routes.sources.distributions import KINDS, Distribution, parse_uncertain
from co2routes.sources.targets import (DEFAULT_SCENARIO_INPUTS, SCENARIO_INPUTS, SWINGS, Target, evaluate_at,
                                       price_unit, targets)

__all__ = ["CostModel", "cost_model", "price_keys", "KINDS", "Distribution", "parse_uncertain",
           "DEFAULT_SCENARIO_INPUTS", "SCENARIO_INPUTS", "SWINGS", "Target", "evaluate_at", "price_unit",
           "targets"]

"""What a route plug-in imports: the route contract, its words, its cautions and its helpers.

A route is a :class:`RouteModel`: an id, a label, its options and a function
``compute(request: RouteRequest) -> RouteResult``, with optional default prices for its own price
keys. Register it in the plug-in's own ``pyproject.toml``::

    [project.entry-points."co2routes.sources"]
    my-route = "my_package.my_route:ROUTE"

A minimal route (the example plug-in in ``docs/examples/`` is a complete one)::

    from co2routes import api

    OPTIONS = (api.Option("purity", "purity of the feed", api.FRACTION, "90 %", low=0.5, high=1.0),)

    def compute(request: api.RouteRequest) -> api.RouteResult:
        ...  # reagents, raw gas, heat, energy, time, hazard

    ROUTE = api.RouteModel("my-route", "My route", OPTIONS, compute, prices={"my-feed": "2 / kg"})

What a route computes and what it never sets:

- ``RouteResult`` holds only what the route works out for one batch. The comparison adds the
  dryer, the delivery, the priced cost lines, the end product and the route's id and label.
- Never price anything: list each :class:`Reagent` with a ``price_key`` and each other priced
  quantity as a :class:`Use` (``dimension`` one of :data:`USE_DIMENSIONS`). The user's price book
  prices them; for a key the book lacks, the route's own default price (``RouteModel.prices``) is
  used and the cost line says so; a key with no price at all leaves the cost unknown and a
  warning names the key.
- ``heat_kj`` is the batch's enthalpy change: positive, the batch takes heat in (it cools).
- ``hazard`` is 1 (low) to 3 (high) with ``hazard_reason`` in words; ``cautions`` are sentences,
  take them from :data:`CAUTIONS` (the ones listed here) or write your own.
- A scenario the route cannot serve: raise :class:`InputError` naming the input; the comparison
  lists the route as not applicable with that reason and ranks the others.
- Every quantity is SI inside (kg, K, Pa, s) except where a field name says otherwise.
"""

from __future__ import annotations

from co2routes.sources.base import (Byproduct, Energy, Option, RawGas, Reagent, Route, RouteRequest,
                                    RouteResult, Site, Use)
from co2routes.sources.model import RouteModel
from co2routes.sources.routes.shared import kwh, saturated
from co2routes.thermo import cautions as _cautions
from co2routes.thermo.co2 import MOLAR_MASS as CO2_MOLAR_MASS
from co2routes.thermo.constants import R, WATER_MOLAR_MASS
from co2routes.thermo.errors import InputError
from co2routes.thermo.units import DIMENSIONS

__all__ = [
    # the route contract
    "RouteModel", "Route", "Option", "Site", "RouteRequest", "RouteResult", "RawGas", "Reagent",
    "Byproduct", "Use", "Energy", "InputError",
    # words a route uses
    "ENERGY_KWH", "MASS_KG", "VOLUME_M3", "VOLUME_L", "USE_DIMENSIONS",
    "PRICE_PER_MASS", "PRICE_PER_VOLUME", "PRICE_PER_PURE", "PRICE_BASES",
    "CHOICE", "COUNT", "FRACTION", "OPTION_DIMENSIONS",
    "RAW_GAS", "GAS", "LIQUID", "DRY_ICE", "DELIVERS",
    "HAZARD_LOW", "HAZARD_MEDIUM", "HAZARD_HIGH",
    # cautions
    "CAUTIONS", "ACID", "ASPHYXIATION", "BREATH", "BURNER", "COLD_LIQUID", "COMPRESSOR_HEAT",
    "CYLINDER_HEAT", "DELIQUESCENT_SALT", "DESICCANT", "DRY_ICE_HANDLING", "FERMENTER",
    "HOT_SURFACE", "LIME_DUST", "PRESSURE", "SPENT_LIQUOR", "LOCAL_CODES",
    # helpers and constants
    "saturated", "kwh", "R", "WATER_MOLAR_MASS", "CO2_MOLAR_MASS",
]

# -- what a Use's amount is measured in (Use.dimension) ------------------------------------------
#: Energy [kWh] (electricity, fuel as heating value, heat).
ENERGY_KWH = "energy_kwh"
#: Mass [kg] (e.g. disposal of a liquor).
MASS_KG = "mass_kg"
#: Volume [m3] (e.g. water).
VOLUME_M3 = "volume_m3"
#: Volume [L].
VOLUME_L = "volume_l"
#: Every word ``Use.dimension`` may be.
USE_DIMENSIONS = (ENERGY_KWH, MASS_KG, VOLUME_M3, VOLUME_L)

# -- what a reagent's price applies to (Reagent.basis) -------------------------------------------
#: The mass as bought (the default).
PRICE_PER_MASS = "mass"
#: The volume as bought (``Reagent.volume_l`` must be set).
PRICE_PER_VOLUME = "volume"
#: The active compound only (``Reagent.pure_mass_kg``).
PRICE_PER_PURE = "pure"
#: Every word ``Reagent.basis`` may be.
PRICE_BASES = (PRICE_PER_MASS, PRICE_PER_VOLUME, PRICE_PER_PURE)

# -- an option's dimension (Option.dimension) ----------------------------------------------------
#: One of ``Option.choices``.
CHOICE = "choice"
#: A whole number within ``low``/``high``.
COUNT = "count"
#: A fraction: ``"20 %"`` or ``0.2``.
FRACTION = "fraction"
#: Every word ``Option.dimension`` may be: a unit dimension (parsed to SI), a choice or a count.
OPTION_DIMENSIONS = (*DIMENSIONS, CHOICE, COUNT)

# -- what the route hands over (RouteResult.delivers) --------------------------------------------
#: Gas to be dried (and compressed if the end product asks): what a route that makes CO2 gives.
RAW_GAS = "raw-gas"
#: Bought already as dry gas, liquid or dry ice.
GAS, LIQUID, DRY_ICE = "gas", "liquid", "dry-ice"
#: Every word ``RouteResult.delivers`` may be.
DELIVERS = (RAW_GAS, GAS, LIQUID, DRY_ICE)

# -- the route's own hazard level (RouteResult.hazard) -------------------------------------------
HAZARD_LOW, HAZARD_MEDIUM, HAZARD_HIGH = 1, 2, 3

# -- cautions a route may attach (RouteResult.cautions) ------------------------------------------
ACID = _cautions.ACID
ASPHYXIATION = _cautions.ASPHYXIATION
BREATH = _cautions.BREATH
BURNER = _cautions.BURNER
COLD_LIQUID = _cautions.COLD_LIQUID
COMPRESSOR_HEAT = _cautions.COMPRESSOR_HEAT
CYLINDER_HEAT = _cautions.CYLINDER_HEAT
DELIQUESCENT_SALT = _cautions.DELIQUESCENT_SALT
DESICCANT = _cautions.DESICCANT
#: Handling dry ice (named apart from :data:`DRY_ICE`, the end product's word).
DRY_ICE_HANDLING = _cautions.DRY_ICE
FERMENTER = _cautions.FERMENTER
HOT_SURFACE = _cautions.HOT_SURFACE
LIME_DUST = _cautions.LIME_DUST
PRESSURE = _cautions.PRESSURE
SPENT_LIQUOR = _cautions.SPENT_LIQUOR
#: The line every report adds itself; a route need not attach it.
LOCAL_CODES = _cautions.LOCAL_CODES
#: Every caution above by name.
CAUTIONS = {"acid": ACID, "asphyxiation": ASPHYXIATION, "breath": BREATH, "burner": BURNER,
            "cold-liquid": COLD_LIQUID, "compressor-heat": COMPRESSOR_HEAT, "cylinder-heat": CYLINDER_HEAT,
            "deliquescent-salt": DELIQUESCENT_SALT, "desiccant": DESICCANT, "dry-ice": DRY_ICE_HANDLING,
            "fermenter": FERMENTER, "hot-surface": HOT_SURFACE, "lime-dust": LIME_DUST,
            "pressure": PRESSURE, "spent-liquor": SPENT_LIQUOR}

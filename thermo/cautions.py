"""Cautions are data: the sentences a result carries when its work can hurt someone.

Every screen or report that shows a pressure, a reagent or a hazard shows the cautions its
result carries, and :data:`LOCAL_CODES` with them. Wording is this project's own; limits are
cited where a published limit exists.
"""

from __future__ import annotations

LOCAL_CODES = (
    "These figures are for planning only: follow local codes, the equipment makers' ratings and "
    "licensed practice, and have pressure and gas work checked by a competent person."
)

PRESSURE = (
    "Use only vessels rated above the highest pressure they can reach, each with a relief device; "
    "follow local pressure-equipment codes."
)
COMPRESSOR_HEAT = (
    "Compressor heads and discharge lines run hot enough to burn: guard them, and stop the "
    "machine if the discharge passes about 150 degC, where compressor oil breaks down."
)
CYLINDER_HEAT = (
    "A liquid CO2 cylinder's pressure rises steeply with temperature: keep it out of sun and away "
    "from heaters, and never fill past its filling ratio."
)
ASPHYXIATION = (
    "CO2 is about 1.5 times as dense as air and collects low down: work ventilated; exposure limits "
    "are 5,000 ppm over 8 h (OSHA PEL) and 40,000 ppm immediately dangerous (NIOSH IDLH)."
)
DRY_ICE = (
    "Dry ice at -78.5 degC burns skin: handle with insulated gloves and eye protection, and never "
    "seal it in a closed container or a small closed room."
)
COLD_LIQUID = (
    "Liquid CO2 released to air flashes to snow and gas at -78.5 degC: wear a face shield and "
    "insulated gloves, and expect the line to freeze."
)
ACID = (
    "Acids burn skin and eyes and strong hydrochloric acid fumes: wear goggles and gloves, add "
    "acid to water never water to acid, and work ventilated."
)
SPENT_LIQUOR = (
    "Neutralise spent liquor (check pH 6-9) before disposal and follow local rules for drains."
)
BURNER = (
    "Burners make carbon monoxide and nitrogen oxides and use up oxygen: run them only with "
    "flue ventilation and a CO alarm, and keep flammable gas lines leak-tested."
)
HOT_SURFACE = (
    "Calcination runs near 900 degC: use a rated kiln, keep combustibles away and let parts cool "
    "before handling."
)
LIME_DUST = (
    "Quicklime and slaked lime are caustic: wear dust mask, goggles and gloves; slaking quicklime "
    "gets hot enough to boil water."
)
FERMENTER = (
    "A fermenter gives off CO2 and ethanol vapour: vent it through an airlock to a ventilated place, "
    "never seal it, and keep flames away."
)
BREATH = (
    "Never rebreathe collected air or gather people in a closed room to raise CO2: indoor CO2 above "
    "5,000 ppm (OSHA PEL) is harmful and 40,000 ppm (NIOSH IDLH) is immediately dangerous."
)
DESICCANT = (
    "Hot regeneration of a desiccant bed releases steam: vent it, and let the bed cool before it "
    "takes gas again."
)
DELIQUESCENT_SALT = (
    "Calcium chloride dust and brine irritate eyes and skin and corrode steel and aluminium: wear "
    "goggles and gloves, use a plastic or stainless vessel with a drain, and dispose of spent brine "
    "as local rules require."
)
GREENHOUSE_ENTRY = (
    "People work in an enriched house: keep CO2 below 5,000 ppm averaged over 8 h (OSHA PEL, "
    "29 CFR 1910.1000 Table Z-1; ACGIH TLV-TWA) and 30,000 ppm over 15 min (ACGIH STEL); stop the "
    "supply and ventilate before anyone enters, and fit a CO2 alarm at working height."
)
DRY_ICE_TRANSPORT = (
    "Subliming dry ice fills a closed car, cold room or lift with CO2: carry it ventilated, never in "
    "a closed passenger space, and open a cold room's door and air it before going in."
)

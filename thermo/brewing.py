"""CO2 given off by a fermenting wort, must or juice, from its original and final gravity.

Balling's mass balance (Balling 1854; set out by Nielsen, Kristiansen, Lassen & Erikstroem 2007,
"Balling's formula - scrutiny of a brewing dogma", Brauwelt International, April 2007, and examined
against 532 brews by Cutaia, Reid & Speers 2009, J. Inst. Brew. 115, 318-327):

    2.0665 g extract fermented -> 1.000 g ethanol + 0.9565 g CO2 + 0.11 g yeast dry matter

so that per 100 g of wort of original extract OE (degrees Plato = g per 100 g), fermented to a
beer of real extract ER and alcohol A (both per 100 g of beer):

    OE = 100 (2.0665 A + ER) / (100 + 1.0665 A)

and A = (OE - ER) / (2.0665 - 0.010665 OE). The real extract follows from the hydrometer's
apparent extract AE (the final gravity read in the alcoholic beer) by Balling's attenuation
relation ER = 0.1808 OE + 0.8192 AE (the coefficients as given by Cutaia et al. 2009).

Valid for beer worts and fruit musts fermented by yeast, 2 to 30 degrees Plato; a wine or cider
must's sugar counts as extract. Gravity is the specific gravity at 20 degC / 20 degC.
"""

from __future__ import annotations

from dataclasses import dataclass

from co2routes.thermo.errors import InputError, require_positive

#: Balling's balance [g per g of ethanol]: extract fermented, CO2, yeast dry matter.
EXTRACT_PER_ETHANOL = 2.0665
CO2_PER_ETHANOL = 0.9565
YEAST_PER_ETHANOL = 0.11
#: Density of water at 20 degC [kg/m3] (IAPWS-95 via CoolProp: 998.21).
WATER_DENSITY_20C = 998.21
#: Extracts the relations are used over [degrees Plato].
PLATO_MAX = 30.0


@dataclass(frozen=True, slots=True)
class Fermented:
    """What a fermentation of ``wort_kg`` of wort gives (Balling's balance).

    Extracts in degrees Plato (g/100 g); ``alcohol_mass_fraction`` in g ethanol per g beer;
    masses in kg.
    """

    original_extract_p: float
    real_extract_p: float
    alcohol_mass_fraction: float
    wort_kg: float
    extract_fermented_kg: float
    ethanol_kg: float
    co2_kg: float
    yeast_kg: float
    beer_kg: float


def plato_from_sg(specific_gravity: float) -> float:
    """Degrees Plato from specific gravity (20 degC / 20 degC).

    P = -616.868 + 1111.14 SG - 630.272 SG^2 + 135.997 SG^3, a cubic fit of the ASBC extract table
    (ASBC Methods of Analysis, Table 1, "Extract in wort and beer"), from memory within about
    0.05 degrees Plato from SG 1.000 to 1.130.

    >>> round(plato_from_sg(1.048), 2), round(plato_from_sg(1.000), 2)
    (11.91, -0.0)
    """
    if not 0.98 <= specific_gravity <= 1.13:
        raise InputError("specific gravity", "must be from 0.980 to 1.130 (20 degC / 20 degC)",
                         got=specific_gravity)
    sg = specific_gravity
    return -616.868 + 1111.14 * sg - 630.272 * sg ** 2 + 135.997 * sg ** 3


def sg_from_plato(plato: float) -> float:
    """Specific gravity from degrees Plato (inverse of :func:`plato_from_sg`, by Newton's method).

    >>> round(sg_from_plato(12.0), 4)
    1.0484
    """
    if not -1.0 <= plato <= PLATO_MAX:
        raise InputError("gravity", f"must be from 0 to {PLATO_MAX:g} degrees Plato", got=plato)
    sg = 1.0 + plato / 250.0
    for _ in range(30):
        f = plato_from_sg(min(max(sg, 0.98), 1.13)) - plato
        slope = 1111.14 - 2.0 * 630.272 * sg + 3.0 * 135.997 * sg ** 2
        sg -= f / slope
        if abs(f) < 1e-10:
            break
    return sg


def real_extract(original_extract_p: float, apparent_extract_p: float) -> float:
    """Real extract of the beer from original and apparent extract [degrees Plato].

    ER = 0.1808 OE + 0.8192 AE (Balling's attenuation relation; Cutaia et al. 2009).

    >>> round(real_extract(12.0, 2.5), 3)
    4.218
    """
    return 0.1808 * original_extract_p + 0.8192 * apparent_extract_p


def alcohol_from_extracts(original_extract_p: float, real_extract_p: float) -> float:
    """Alcohol [g per 100 g of beer] from original and real extract, Balling's formula solved for A.

    A = (OE - ER) / (2.0665 - 0.010665 OE)   (Balling 1854; Nielsen et al. 2007).

    >>> round(alcohol_from_extracts(12.0, 4.218), 3)
    4.014
    """
    return (original_extract_p - real_extract_p) / (EXTRACT_PER_ETHANOL - 0.010665 * original_extract_p)


def original_extract(alcohol_p: float, real_extract_p: float) -> float:
    """Balling's formula: OE = 100 (2.0665 A + ER) / (100 + 1.0665 A) [degrees Plato].

    >>> round(original_extract(4.015, 4.218), 2)
    12.0
    """
    return 100.0 * (EXTRACT_PER_ETHANOL * alcohol_p + real_extract_p) / (100.0 + 1.0665 * alcohol_p)


def ferment_wort(volume_m3: float, original_extract_p: float, apparent_extract_p: float) -> Fermented:
    """CO2, ethanol and yeast from fermenting a volume of wort from OE down to AE.

    Wort mass m = V rho_w SG(OE); per 100 g of wort the ethanol formed is e = 100 A / (100 +
    1.0665 A) g, the extract fermented 2.0665 e, the CO2 0.9565 e and the yeast 0.11 e (Balling's
    balance), with A from :func:`alcohol_from_extracts` and ER from :func:`real_extract`.

    Parameters
    ----------
    volume_m3 : float
        Wort volume at 20 degC [m3].
    original_extract_p, apparent_extract_p : float
        Original gravity and final (apparent) gravity, degrees Plato; 0 < OE <= 30, AE <= OE.

    >>> f = ferment_wort(0.1, 12.0, 2.5)
    >>> round(f.wort_kg, 2), round(f.co2_kg, 3), round(f.ethanol_kg, 3)
    (104.65, 3.854, 4.029)
    """
    require_positive("wort volume", volume_m3)
    if not 0.0 < original_extract_p <= PLATO_MAX:
        raise InputError("original gravity", f"must be above 0 and at most {PLATO_MAX:g} degrees Plato "
                         "(SG 1.129)", got=f"{original_extract_p:.2f} P")
    if apparent_extract_p > original_extract_p:
        raise InputError("final gravity", "must not be above the original gravity: fermentation "
                         "lowers the gravity", got=f"{apparent_extract_p:.2f} P")
    if apparent_extract_p < -5.0:
        raise InputError("final gravity", "must be at least -5 degrees Plato (SG 0.980)",
                         got=f"{apparent_extract_p:.2f} P")
    er = real_extract(original_extract_p, apparent_extract_p)
    a = alcohol_from_extracts(original_extract_p, er)
    wort_kg = volume_m3 * WATER_DENSITY_20C * sg_from_plato(original_extract_p)
    e = 100.0 * a / (100.0 + 1.0665 * a) * wort_kg / 100.0  # kg ethanol
    return Fermented(original_extract_p, er, a / 100.0, wort_kg, EXTRACT_PER_ETHANOL * e, e,
                     CO2_PER_ETHANOL * e, YEAST_PER_ETHANOL * e, wort_kg - (CO2_PER_ETHANOL + YEAST_PER_ETHANOL) * e)


def ferment_sugar(sugar_kg: float) -> float:
    """CO2 [kg] from sugar fermented out completely, by Balling's ratio 0.9565 / 2.0665.

    The ratio (0.463 kg/kg) is below Gay-Lussac's 0.489 kg/kg for glucose because it counts the
    extract that becomes yeast and by-products (Balling 1854).

    >>> round(ferment_sugar(10.0), 3)
    4.629
    """
    return require_positive("sugar", sugar_kg) * CO2_PER_ETHANOL / EXTRACT_PER_ETHANOL

"""Species named apart and sugars with their own data (issue 11 item 7)."""

from __future__ import annotations

import pytest

from co2routes.sources.base import RouteRequest, Site
from co2routes.sources.routes.fermentation import ROUTE as FERMENTATION
from co2routes.thermo import species
from co2routes.thermo.errors import InputError
from co2routes.thermo.reaction import parse_reaction

COMBUSTION_N = "n-C4H10(g) + 6.5 O2(g) -> 4 CO2(g) + 5 H2O(l)"
COMBUSTION_I = "i-C4H10(g) + 6.5 O2(g) -> 4 CO2(g) + 5 H2O(l)"


def test_both_butanes_are_known_with_their_own_heats():
    # NIST Chemistry WebBook, standard enthalpy of combustion of the gas at 298.15 K:
    # n-butane -2877.6 kJ/mol, isobutane -2868.8 kJ/mol (from memory); 2 kJ/mol.
    assert parse_reaction(COMBUSTION_N).delta_h(298.15) / 1000 == pytest.approx(-2877.6, abs=2.0)
    assert parse_reaction(COMBUSTION_I).delta_h(298.15) / 1000 == pytest.approx(-2868.8, abs=2.0)
    assert species.canonical("butane(g)") == "n-C4H10(g)"
    assert species.canonical("isobutane(g)") == "i-C4H10(g)"


def test_bare_c4h10_names_both_isomers():
    with pytest.raises(InputError) as err:
        species.canonical("C4H10(g)")
    assert "n-C4H10(g)" in str(err.value) and "i-C4H10(g)" in str(err.value)


def test_combustion_route_names_its_butane():
    from co2routes.sources.pipeline import evaluate
    from co2routes.sources.registry import catalogue
    from co2routes.sources.scenario import demo

    r = evaluate(catalogue().get("combustion"), demo(), options={"fuel": "butane"})
    assert r.reagents[0].name.startswith("n-butane")


def _ferment(**options):
    opts = {o.key: o for o in FERMENTATION.options}
    return RouteRequest(1.0, Site(), {k: opts[k].parse(v) for k, v in options.items()})


def test_maltose_is_refused_until_there_are_data():
    # No published formation enthalpy of maltose is carried: the choice is refused, and the
    # option's help says why, instead of borrowing sucrose's data.
    with pytest.raises(InputError):
        FERMENTATION.compute(_ferment(sugar="maltose"))
    sugar = {o.key: o for o in FERMENTATION.options}["sugar"]
    assert "maltose" not in sugar.choices and "malt-extract" in sugar.choices
    assert "maltose is not offered" in sugar.help


def test_malt_extract_ferments_only_its_fermentable_share():
    # Gay-Lussac on the fermentable share (75 %, common practice) counted as glucose:
    # 2 x 44.0095 / 180.156 x 0.75 kg CO2 per kg of extract at full yield; 1e-4.
    r = FERMENTATION.compute(_ferment(sugar="malt-extract", efficiency="100 %"))
    g = FERMENTATION.compute(_ferment(sugar="glucose", efficiency="100 %"))
    extract = r.reagents[0]
    assert extract.pure_mass_kg == pytest.approx(0.75 * extract.mass_kg, rel=1e-12)
    assert r.co2_generated_kg / extract.mass_kg == pytest.approx(0.75 * 2 * 44.0095 / 180.156, rel=1e-3)
    assert extract.pure_mass_kg == pytest.approx(g.reagents[0].mass_kg, rel=1e-12)
    half = FERMENTATION.compute(_ferment(sugar="malt-extract", malt_fermentable="50 %"))
    assert half.reagents[0].mass_kg == pytest.approx(1.5 * FERMENTATION.compute(_ferment(sugar="malt-extract")).reagents[0].mass_kg, rel=1e-9)


def test_methane_burnt_counts_in_feed_per_kg():
    # Natural gas is bought per kWh, but the methane burnt is feed: CH4 -> CO2 gives
    # 16.043 / 44.0095 = 0.3645 kg CH4 per kg CO2 (IUPAC atomic weights), divided by the 90 %
    # capture and the CO2 of the air also recovered (1.000 mol CO2 per mol CH4 within 0.1 %,
    # air at 425 ppm); 1 %. It was 0.00 in compare's feed column.
    from co2routes.sources.pipeline import evaluate
    from co2routes.sources.registry import catalogue
    from co2routes.sources.scenario import demo

    r = evaluate(catalogue().get("combustion"), demo(), options={"fuel": "methane"})
    per_kg_co2 = r.reagent_kg_per_kg * r.per_kg_basis / r.co2_kg
    assert per_kg_co2 == pytest.approx(16.043 / 44.0095 / 0.90, rel=0.01)

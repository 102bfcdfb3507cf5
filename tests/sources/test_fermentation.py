"""Fermentation route: Gay-Lussac yield, balances, heat sign and size, the time rule."""

import pytest
from hypothesis import given, strategies as st

from co2routes.sources.base import Route, RouteRequest, Site
from co2routes.sources.routes.fermentation import ROUTE, plan
from co2routes.thermo import species

# IUPAC standard atomic weights: H 1.008, C 12.011, O 15.999.
M_GLUCOSE = 6 * 12.011 + 12 * 1.008 + 6 * 15.999
M_SUCROSE = 12 * 12.011 + 22 * 1.008 + 11 * 15.999
M_CO2 = 12.011 + 2 * 15.999


def _request(kg=1.0, temperature_k=293.15, **options):
    keys = [o.key for o in ROUTE.options]
    return RouteRequest(kg, Site(temperature_k=temperature_k),
                        {k: ROUTE.options[keys.index(k)].parse(v) for k, v in options.items()})


def _elements(amounts):
    total = {}
    for name, mol in amounts.items():
        for el, n in species.elements(name).items():
            total[el] = total.get(el, 0.0) + n * mol
    return total


def test_is_a_route():
    assert isinstance(ROUTE, Route) and ROUTE.id == "fermentation"


@given(sugar=st.sampled_from(["glucose", "sucrose", "malt-extract"]), kg=st.floats(0.01, 1000.0),
       eff=st.floats(0.5, 1.0), conc=st.floats(40.0, 350.0), t_c=st.floats(5.0, 40.0))
def test_element_balance(sugar, kg, eff, conc, t_c):
    # Conservation of elements: exact, to 1e-9 relative.
    req = RouteRequest(kg, Site(), {"sugar": sugar, "efficiency": eff, "sugar_concentration": conc,
                                    "temperature": t_c + 273.15})
    batch = plan(req)
    # the headspace purge's CO2 (vented or left in the headspace) leaves beside the collected gas
    vented = {**batch.outputs, "CO2(g)": batch.outputs["CO2(g)"] + batch.purged_mol}
    e_in, e_out = _elements(batch.inputs), _elements(vented)
    for el in e_in:
        assert e_out[el] == pytest.approx(e_in[el], rel=1e-9)
    assert batch.outputs["CO2(g)"] * species.molar_mass("CO2(g)") == pytest.approx(kg, rel=1e-9)
    assert ROUTE.compute(req).co2_kg == kg


def test_gay_lussac_yield():
    # Gay-Lussac: 2 x 44.009 / 180.156 = 0.4886 kg CO2 per kg glucose (IUPAC weights), to 1e-4.
    r = ROUTE.compute(_request(sugar="glucose", efficiency="100 %"))
    assert r.co2_generated_kg / r.reagents[0].mass_kg == pytest.approx(2 * M_CO2 / M_GLUCOSE, rel=1e-4)
    assert r.co2_generated_kg / r.reagents[0].mass_kg == pytest.approx(0.489, abs=5e-4)
    # sucrose: 4 x 44.009 / 342.30 = 0.5143 kg/kg (hydrolysed first)
    s = ROUTE.compute(_request(sugar="sucrose", efficiency="100 %"))
    assert s.co2_generated_kg / s.reagents[0].mass_kg == pytest.approx(4 * M_CO2 / M_SUCROSE, rel=1e-4)


def test_efficiency_scales_the_sugar():
    full = ROUTE.compute(_request(sugar="glucose", efficiency="100 %"))
    part = ROUTE.compute(_request(sugar="glucose", efficiency="90 %"))
    ratio = (part.reagents[0].mass_kg / part.co2_generated_kg) / (full.reagents[0].mass_kg / full.co2_generated_kg)
    assert ratio == pytest.approx(1 / 0.9, rel=1e-12)


def test_doubling_demand_doubles_reagents():
    one, two = ROUTE.compute(_request(1.0)), ROUTE.compute(_request(2.0))
    for a, b in zip(one.reagents, two.reagents):
        assert b.mass_kg == pytest.approx(2 * a.mass_kg, rel=1e-12)
    assert two.heat_kj == pytest.approx(2 * one.heat_kj, rel=1e-12)
    assert two.time_h == one.time_h


def test_heat_gives_off_about_24_kcal_per_mol_sugar():
    # Colombie et al. (2007): about 24 kcal (100 kJ) released per mol of hexose fermented; NBS
    # (Wagman 1982) gives -101 kJ/mol for glucose(aq) -> 2 ethanol(aq) + 2 CO2(g). Glucose bought
    # solid takes about 11 kJ/mol in to dissolve (NBS); tolerance 15 kJ/mol.
    r = ROUTE.compute(_request(sugar="glucose", efficiency="100 %"))
    fermented_mol = r.reagents[0].mass_kg / (M_GLUCOSE / 1000.0)
    assert r.heat_kj < 0
    assert r.heat_kj / fermented_mol == pytest.approx(-24 * 4.184 + 11.1, abs=15.0)


def test_time_rule_q10():
    # Common practice rule: 7 days at 20 degC for 200 g/L, halving per 10 K (Q10 = 2).
    base = ROUTE.compute(_request(temperature="20 degC"))
    warm = ROUTE.compute(_request(temperature="30 degC"))
    assert base.time_h == pytest.approx(7 * 24.0, rel=1e-12)
    assert warm.time_h == pytest.approx(base.time_h / 2, rel=1e-12)
    cold = ROUTE.compute(_request(temperature="10 degC"))
    assert any("15-32 degC" in w for w in cold.warnings)


def test_raw_gas_and_cautions():
    from co2routes.thermo import cautions
    from co2routes.thermo.water import vapor_pressure

    r = ROUTE.compute(_request(temperature="25 degC"))
    # IAPWS-95 saturation (co2routes.thermo.water): y_H2O = p_sat(25 degC) / 1 atm = 3169.9 / 101325
    assert r.raw_gas.mole_fractions["H2O"] == pytest.approx(vapor_pressure(298.15) / 101325.0, rel=1e-9)
    assert cautions.FERMENTER in r.cautions and cautions.ASPHYXIATION in r.cautions
    assert r.byproducts[0].name == "ethanol" and r.byproducts[0].mass_kg > 0.9

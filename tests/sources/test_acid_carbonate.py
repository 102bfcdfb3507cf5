"""Acid-carbonate route: balances, stoichiometry against hand figures, densities, heat sign."""

import pytest
from hypothesis import assume, given, strategies as st

from co2routes.sources.base import Route, RouteRequest, Site
from co2routes.sources.routes.acid_carbonate import EQUATIONS, ROUTE, plan
from co2routes.thermo import species
from co2routes.thermo.errors import InputError

# IUPAC standard atomic weights (2021, abridged): H 1.008, C 12.011, O 15.999, Na 22.990,
# Cl 35.45, S 32.06, K 39.098, Ca 40.078.
A = {"H": 1.008, "C": 12.011, "O": 15.999, "Na": 22.990, "Cl": 35.45, "S": 32.06, "K": 39.098, "Ca": 40.078}
M_CO2 = A["C"] + 2 * A["O"]
M_NAHCO3 = A["Na"] + A["H"] + A["C"] + 3 * A["O"]
M_NA2CO3 = 2 * A["Na"] + A["C"] + 3 * A["O"]
M_CACO3 = A["Ca"] + A["C"] + 3 * A["O"]
M_KHCO3 = A["K"] + A["H"] + A["C"] + 3 * A["O"]
M_HCL = A["H"] + A["Cl"]
M_CITRIC = 6 * A["C"] + 8 * A["H"] + 7 * A["O"]


def _request(kg=1.0, **options):
    return RouteRequest(kg, Site(), {k: ROUTE.options[[o.key for o in ROUTE.options].index(k)].parse(v)
                                     for k, v in options.items()})


def _elements(amounts):
    total = {}
    for name, mol in amounts.items():
        for el, n in species.elements(name).items():
            total[el] = total.get(el, 0.0) + n * mol
    return total


def test_is_a_route():
    assert isinstance(ROUTE, Route) and ROUTE.id == "acid-carbonate"


PAIRS = sorted(EQUATIONS)


@given(pair=st.sampled_from(PAIRS), kg=st.floats(0.01, 500.0), excess=st.floats(0.0, 0.5),
       water=st.floats(0.0, 5.0), t_c=st.floats(5.0, 35.0))
def test_element_and_mass_balance(pair, kg, excess, water, t_c):
    # Conservation of elements and of mass (Lavoisier): exact, to 1e-9 relative.
    acid, carbonate = pair
    req = RouteRequest(kg, Site(temperature_k=t_c + 273.15),
                       {"acid": acid, "carbonate": carbonate, "acid_excess": excess, "added_water": water})
    try:
        batch = plan(req)
    except InputError:
        assume(False)  # batches that would boil their liquor are refused, by design
    e_in, e_out = _elements(batch.inputs), _elements(batch.outputs)
    assert e_in.keys() == e_out.keys()
    for el in e_in:
        assert e_out[el] == pytest.approx(e_in[el], rel=1e-9)
    result = ROUTE.compute(req)
    assert result.co2_kg == kg
    assert batch.outputs["CO2(g)"] * species.molar_mass("CO2(g)") == pytest.approx(kg, rel=1e-9)
    bought = sum(r.mass_kg for r in result.reagents)
    water_in = sum(u.amount * 1000.0 for u in result.uses if u.price_key == "water")
    gas_out = kg + batch.outputs["H2O(g)"] * species.molar_mass("H2O(g)")
    liquor = result.byproducts[0].mass_kg
    assert bought + water_in == pytest.approx(gas_out + liquor, rel=1e-9)


@pytest.mark.parametrize("pair", PAIRS)
def test_doubling_demand_doubles_reagents(pair):
    acid, carbonate = pair
    opts = {"acid": acid, "carbonate": carbonate, "added_water": "3"}
    one, two = ROUTE.compute(_request(1.0, **opts)), ROUTE.compute(_request(2.0, **opts))
    for a, b in zip(one.reagents, two.reagents):
        assert b.mass_kg == pytest.approx(2 * a.mass_kg, rel=1e-12)
    assert two.heat_kj == pytest.approx(2 * one.heat_kj, rel=1e-12)


@pytest.mark.parametrize("carbonate, ratio", [
    ("sodium-bicarbonate", M_NAHCO3 / M_CO2),   # hand: 84.007 / 44.009 = 1.909 kg/kg
    ("sodium-carbonate", M_NA2CO3 / M_CO2),     # 105.99 / 44.009 = 2.408
    ("calcium-carbonate", M_CACO3 / M_CO2),     # 100.09 / 44.009 = 2.274
    ("potassium-bicarbonate", M_KHCO3 / M_CO2),  # 100.11 / 44.009 = 2.275
])
def test_carbonate_per_kg_co2_made_matches_hand_stoichiometry(carbonate, ratio):
    # Hand stoichiometry with IUPAC standard atomic weights; 1e-4 relative (atomic-weight rounding).
    r = ROUTE.compute(_request(1.0, acid="hcl", carbonate=carbonate, strength="10 %"))
    assert r.reagents[1].mass_kg / r.co2_generated_kg == pytest.approx(ratio, rel=1e-4)


def test_bicarbonate_per_kg_co2_is_1_909():
    # 1.909 kg NaHCO3 per kg CO2 (hand figure above, IUPAC weights), to 1e-3 absolute.
    r = ROUTE.compute(_request(1.0, acid="sulfuric", carbonate="sodium-bicarbonate"))
    assert r.reagents[1].mass_kg / r.co2_generated_kg == pytest.approx(1.909, abs=1e-3)


def test_acid_per_kg_co2_with_excess():
    # HCl: 36.46 g per 44.01 g CO2 from NaHCO3, times (1 + 5 %) excess, in 31 % solution.
    r = ROUTE.compute(_request(1.0, acid="hcl", carbonate="sodium-bicarbonate"))
    acid = r.reagents[0]
    assert acid.pure_mass_kg / r.co2_generated_kg == pytest.approx(1.05 * M_HCL / M_CO2, rel=1e-4)
    assert acid.mass_kg == pytest.approx(acid.pure_mass_kg / 0.31, rel=1e-12)
    # citric acid is triprotic: 1 mol per 3 mol NaHCO3 -> 192.12 / (3 x 44.009) kg per kg CO2
    c = ROUTE.compute(_request(1.0, acid="citric", carbonate="sodium-bicarbonate", acid_excess="0 %"))
    assert c.reagents[0].mass_kg / c.co2_generated_kg == pytest.approx(M_CITRIC / (3 * M_CO2), rel=1e-4)


@pytest.mark.parametrize("percent, perry", [(10, 1.048), (20, 1.098), (30, 1.149), (32, 1.159),
                                            (36, 1.179), (38, 1.189)])
def test_hcl_volume_uses_perry_density(percent, perry):
    # Perry's Chemical Engineers' Handbook HCl density table (ICT values, 20 degC), g/cm3 to 3
    # decimals: tolerance 0.0006 g/cm3 (half the last digit plus rounding).
    r = ROUTE.compute(_request(1.0, acid="hcl", strength=f"{percent} %", added_water="3"))
    acid = r.reagents[0]
    assert acid.mass_kg / acid.volume_l == pytest.approx(perry, abs=6e-4)


def test_heat_sign():
    # NBS tables (Wagman 1982): NaHCO3 + HCl(aq) dH = +31.4 kJ/mol takes heat in; the dilution of
    # 10 % HCl gives off about 3 kJ/mol (Parker 1965), so the batch still cools.
    cool = ROUTE.compute(_request(1.0, acid="hcl", strength="10 %"))
    assert cool.heat_kj > 0 and cool.temperature_change_k < 0
    # Na2CO3 + 2 HCl(aq) dH = -28.9 kJ/mol (same tables): gives heat off.
    warm = ROUTE.compute(_request(1.0, acid="hcl", carbonate="sodium-carbonate", strength="10 %"))
    assert warm.heat_kj < 0 and warm.temperature_change_k > 0


def test_bicarbonate_with_dilute_hcl_heat_per_mol():
    # NBS (Wagman 1982): +31.4 kJ/mol; Parker (1965) dilution of 10 % HCl (n = 18) about -3.8 kJ/mol;
    # minus the CO2 kept dissolved (-20 kJ/mol of it) and plus water evaporated (+44 kJ/mol):
    # the net heat per mol of CO2 made lies within 22-30 kJ.
    r = ROUTE.compute(_request(1.0, acid="hcl", strength="10 %", acid_excess="0 %"))
    per_mol = r.heat_kj / (r.co2_generated_kg / 0.0440095)
    assert 22.0 < per_mol < 30.0


def test_dissolved_co2_matches_carroll_solubility():
    # Carroll, Slupsky & Mather (1991), J. Phys. Chem. Ref. Data 20, 1201: ln(H/MPa) = -6.8346
    # + 1.2817e4/T - 3.7668e6/T^2 + 2.997e8/T^3 (mole-fraction Henry constant), at the liquor
    # temperature under 1 atm less water vapour; Sander's (2015) constant used by the route is
    # 3-6 % below it at 10-40 degC: tolerance 8 %. Salting out by the acetate is not modelled.
    import math

    from co2routes.thermo.water import vapor_pressure

    req = _request(1.0, acid="acetic", strength="5 %")
    r, batch = ROUTE.compute(req), plan(req)
    t = batch.liquor_temperature_k
    h_pa = math.exp(-6.8346 + 1.2817e4 / t - 3.7668e6 / t**2 + 2.997e8 / t**3) * 1e6
    x = (101325.0 - vapor_pressure(t)) / h_pa
    carroll_g_per_kg_water = x / (1 - x) / 0.018015 * 44.0095
    kept = (r.co2_generated_kg - r.co2_kg) * 1000.0 / batch.liquor_water_kg
    assert kept == pytest.approx(carroll_g_per_kg_water, rel=0.08)


def test_warnings_cautions_and_refusals():
    from co2routes.thermo import cautions

    gyp = ROUTE.compute(_request(1.0, acid="sulfuric", carbonate="calcium-carbonate", added_water="3"))
    assert any("calcium sulfate" in w for w in gyp.warnings)
    assert set(gyp.cautions) >= {cautions.ACID, cautions.SPENT_LIQUOR, cautions.ASPHYXIATION}
    assert gyp.hazard == 3
    vinegar = ROUTE.compute(_request(1.0, acid="acetic"))
    assert vinegar.hazard == 1 and vinegar.reagents[0].name.endswith("5%")
    with pytest.raises(InputError, match="calcium citrate"):
        ROUTE.compute(_request(1.0, acid="citric", carbonate="calcium-carbonate"))
    with pytest.raises(InputError, match="option added_water"):
        ROUTE.compute(_request(1.0, acid="sulfuric", carbonate="sodium-carbonate"))
    with pytest.raises(InputError, match="option strength"):
        ROUTE.compute(_request(1.0, acid="hcl", strength="45 %"))


def test_raw_gas_is_saturated_at_liquor_temperature():
    # IAPWS-95 vapour pressure (co2routes.thermo.water): water mole fraction = p_sat(T) / P.
    from co2routes.thermo.water import vapor_pressure

    r = ROUTE.compute(_request(1.0, acid="acetic"))
    x = r.raw_gas.mole_fractions
    assert x["H2O"] == pytest.approx(vapor_pressure(r.raw_gas.temperature_k) / 101325.0, rel=1e-9)
    assert x["CO2"] + x["H2O"] == pytest.approx(1.0, rel=1e-12)

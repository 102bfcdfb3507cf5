"""Flue gas, separation work, air properties, lime heats and dissolved gases, against outside data."""

import math

import pytest
from hypothesis import given, strategies as st

from co2routes.thermo import air, degassing, flue, lime, separation
from co2routes.thermo.errors import InputError

# IUPAC standard atomic weights (abridged, 2021) [g/mol]
C, H, O = 12.011, 1.008, 15.999


def test_propane_co2_per_kg_fuel():
    # IUPAC atomic weights: 3 CO2 per C3H8 -> 3 x 44.009 / 44.097 = 2.9940 kg/kg; tol 0.001
    hand = 3 * (C + 2 * O) / (3 * C + 8 * H)
    c = flue.burn("propane", 0.0)
    assert c.co2_kg_per_kg_fuel == pytest.approx(hand, abs=1e-3)
    assert c.co2_kg_per_kg_fuel == pytest.approx(3.0, abs=0.01)  # "about 3.0 kg per kg" (stoichiometry)


def test_methane_stoichiometric_dry_co2():
    # Hand stoichiometry, air as 3.76 N2 per O2: CH4 + 2 O2 + 7.52 N2 -> CO2 + 2 H2O + 7.52 N2,
    # dry CO2 = 1 / (1 + 7.52) = 0.1174; tol 0.0005 (real air carries argon and 425 ppm CO2)
    c = flue.burn("methane", 0.0)
    assert c.dry_fractions()["CO2"] == pytest.approx(1 / (1 + 7.52), abs=5e-4)


@pytest.mark.parametrize("fuel,cas_name,atoms,liquid", [
    ("methane", "methane", {"C": 1, "H": 4}, False),
    ("propane", "propane", {"C": 3, "H": 8}, False),
    ("butane", "butane", {"C": 4, "H": 10}, False),
    ("ethanol", "ethanol", {"C": 2, "H": 6, "O": 1}, True),
])
def test_higher_heating_value_against_chemicals(fuel, cas_name, atoms, liquid):
    # `chemicals` (Bell, ChEDL): HHV from its own formation enthalpies; tol 0.2 %
    from chemicals import MW, CAS_from_any, Hfg, Hfl
    from chemicals.combustion import HHV_stoichiometry, combustion_stoichiometry

    cas = CAS_from_any(cas_name)
    hf = Hfl(cas) if liquid else Hfg(cas)
    ref = -HHV_stoichiometry(combustion_stoichiometry(atoms), hf) / (MW(cas) / 1000.0)
    assert flue.heating_values(fuel)[1] == pytest.approx(ref, rel=2e-3)


def test_methane_lower_heating_value():
    # NIST WebBook / Perry's: methane LHV 50.0 MJ/kg; tol 0.5 %
    assert flue.heating_values("methane")[0] == pytest.approx(50.0e6, rel=5e-3)


def test_natural_gas_dew_point():
    # Common practice (condensing-boiler literature, from memory): natural-gas flue gas at low
    # excess air has a water dew point near 59 degC; tol 1.5 K
    assert flue.burn("methane", 0.0).dew_point_k - 273.15 == pytest.approx(59.0, abs=1.5)


@given(fuel=st.sampled_from(sorted(flue.FUELS)), excess=st.floats(0.0, 3.0),
       t=st.floats(275.0, 320.0), y=st.floats(0.0, 0.002))
def test_element_balance(fuel, excess, t, y):
    # Conservation of atoms (Lavoisier): feed = exhaust = cooled gas + condensate; tol 1e-9 relative
    c = flue.burn(fuel, excess, t, 101325.0, y)
    feed = flue.element_totals(c.feed_mol, fuel)
    out = flue.element_totals(c.exhaust_mol, fuel)
    cooled = flue.element_totals(c.cooled_mol, fuel)
    cooled["H"] = cooled.get("H", 0.0) + 2 * c.condensate_mol
    cooled["O"] = cooled.get("O", 0.0) + c.condensate_mol
    for el, n in feed.items():
        assert out.get(el, 0.0) == pytest.approx(n, rel=1e-9)
        assert cooled.get(el, 0.0) == pytest.approx(n, rel=1e-9)


def test_heat_sign_and_size():
    # Combustion gives heat off: close to the HHV when nearly all water condenses (NIST 890.6 kJ/mol
    # for methane); at 20 degC some water stays vapour, so the heat lies between LHV and HHV
    c = flue.burn("methane", 0.15, 293.15)
    lhv, hhv = (v * c.fuel_molar_mass_kg_mol for v in flue.heating_values("methane"))
    assert lhv < c.heat_released_j_per_mol < hhv * 1.001


def test_fuel_refused():
    with pytest.raises(InputError):
        flue.burn("coal", 0.1)
    with pytest.raises(InputError):
        flue.burn("methane", -0.1)


def test_minimum_work_equimolar():
    # Ideal Gibbs energy of mixing (any thermodynamics text; Wilcox 2012 ch. 2): splitting an
    # equimolar binary completely costs 2 RT ln 2 per mol of CO2; tol 1e-12
    t = 300.0
    assert separation.minimum_separation_work(0.5, t) == pytest.approx(2 * separation.R * t * math.log(2), rel=1e-12)


def test_minimum_work_from_air():
    # House et al. (2011) PNAS 108, 20428: the minimum work from air is about 20 kJ/mol CO2
    # (from memory); tol 10 %
    assert separation.minimum_separation_work(400e-6, 298.15, 0.5) == pytest.approx(20e3, rel=0.1)


@given(y=st.floats(1e-4, 0.9), c=st.floats(0.05, 1.0))
def test_minimum_work_partial_capture_is_cheaper_per_mol(y, c):
    # Second law: taking only the richer part costs no more per mol than taking all of it
    t = 298.15
    assert separation.minimum_separation_work(y, t, c) <= separation.minimum_separation_work(y, t, 1.0) * (1 + 1e-9)


def test_air_properties():
    # Incropera & DeWitt Table A.4: air at 300 K: mu = 184.6e-7 Pa s (tol 1 %), rho = 1.1614 kg/m3
    # (the table's densities match 100 kPa; tol 0.5 %)
    assert air.air_viscosity(300.0, 1e5) == pytest.approx(184.6e-7, rel=0.01)
    assert air.air_density(300.0, 1e5) == pytest.approx(1.1614, rel=5e-3)


def test_calcination_heat_nbs():
    # NBS tables (Wagman et al. 1982): dfH CaCO3 -1206.92, CaO -635.09, CO2 -393.51 kJ/mol
    # -> CaCO3 -> CaO + CO2 +178.32 kJ/mol; tol 0.5 kJ/mol
    nbs = -635.09 - 393.51 + 1206.92
    assert lime.reaction_heat(lime.CALCINATION, 298.15) / 1000 == pytest.approx(nbs, abs=0.5)


def test_slaking_heat_nbs():
    # NBS (Wagman 1982): Ca(OH)2 -986.09, CaO -635.09, H2O(l) -285.83 -> -65.17 kJ/mol; tol 0.5
    nbs = -986.09 + 635.09 + 285.83
    assert lime.reaction_heat(lime.SLAKING, 298.15) / 1000 == pytest.approx(nbs, abs=0.5)


def test_lime_cycle_decay():
    # Grasa & Abanades (2006) Ind. Eng. Chem. Res. 45, 8846: residual conversion "about 7-8 %"
    # after hundreds of cycles; equation X_N = 1/(1/(1-Xr) + kN) + Xr evaluated by hand at N = 1
    assert lime.conversion_after_cycles(500) == pytest.approx(0.075, abs=0.01)
    assert lime.conversion_after_cycles(1) == pytest.approx(1 / (1 / 0.925 + 0.52) + 0.075, rel=1e-12)
    assert lime.conversion_after_cycles(0) == pytest.approx(1.0)


def test_kiln_heat_is_reaction_plus_sensible():
    # Hess's law: CaCO3(Ta) -> CaO(Tc) + CO2(Tc) equals dH(298) plus the products' sensible heat
    from co2routes.thermo import species
    q = lime.kiln_heat("CaO(s)", 1.0, 298.15, 1150.0)
    direct = species.enthalpy("CaO(s)", 1150.0) + species.enthalpy("CO2(g)", 1150.0) - species.enthalpy("CaCO3(s)", 298.15)
    assert q.total_j == pytest.approx(direct, rel=1e-12)


def test_oxygen_in_air_saturated_water():
    # Benson & Krause (1984) / USGS dissolved-oxygen tables: 9.09 mg/L at 20 degC, 1 atm (from
    # memory); tol 5 %
    t, p = 293.15, 101325.0
    from co2routes.thermo.water import vapor_pressure
    pp = {"O2": flue.air_fractions(425e-6)["O2"] * (p - vapor_pressure(t))}
    c = degassing.loaded(pp, t)["O2"] * 31.998  # mg/L
    assert c == pytest.approx(9.09, rel=0.05)


@given(co2=st.floats(0.01, 10.0), n2=st.floats(0.0, 1.0), p=st.floats(3000.0, 90000.0))
def test_flash_conserves_each_gas(co2, n2, p):
    # Material balance: released + left = loaded for every gas; tol 1e-9 relative
    f = degassing.flash({"CO2": co2, "N2": n2}, 293.15, p)
    for g, n in {"CO2": co2, "N2": n2}.items():
        if n > 0:
            assert f.released_mol[g] + f.remaining_mol[g] == pytest.approx(n, rel=1e-9)

"""Price book: parsing, layering, unknown prices stay unknown."""

import pytest

from co2routes.sources.base import Reagent, Use
from co2routes.sources.prices import PriceBook, demo_book, load_book, parse_price, reagent_cost, use_cost
from co2routes.thermo.errors import InputError


def test_demo_book_says_it_is_invented():
    from importlib import resources

    text = resources.files("co2routes.sources").joinpath("data/prices.toml").read_text()
    assert "INVENTED" in text
    assert demo_book().currency == "EUR"


def test_price_per_litre_and_per_kwh_normalise_to_si():
    assert parse_price("x", "2.5 / L").amount == pytest.approx(2500.0)  # per m3
    assert parse_price("x", "0.30 / kWh").amount == pytest.approx(0.30 / 3.6e6)
    assert parse_price("x", "1 / lb").amount == pytest.approx(1 / 0.45359237)  # NIST SP 811: 1 lb = 0.45359237 kg


@pytest.mark.parametrize("raw", ["cheap", "3 / K", "-1 / kg", "1.2 kg", {"strength": "31 %"}])
def test_bad_prices_are_refused_with_the_key(raw):
    with pytest.raises(InputError) as err:
        parse_price("sucrose", raw, "prices")
    assert "prices.sucrose" in str(err.value)


def test_missing_price_is_unknown_not_zero():
    book = PriceBook("EUR", {})
    line = reagent_cost(Reagent("salt", "NaCl", 1.0, 1.0, None, "salt"), book)
    assert line.cost is None
    assert use_cost(Use("power", 2.0, "energy_kwh", "electricity"), book).cost is None


def test_solution_priced_at_its_strength_is_costed_by_pure_content():
    book = PriceBook("EUR", {}).overridden({"hcl": {"price": "0.31 / kg", "strength": "31 %"}}, "p")
    # 1 kg of pure HCl bought as 31 % acid is 1/0.31 kg of solution at 0.31 per kg: cost 1.00
    line = reagent_cost(Reagent("acid", "HCl", 5.0, 1.0, None, "hcl"), book)
    assert line.cost == pytest.approx(1.0)


def test_user_book_replaces_demo(tmp_path):
    path = tmp_path / "prices.toml"
    path.write_text('currency = "GBP"\n[prices]\nelectricity = "0.25 / kWh"\n')
    book = load_book(path)
    assert book.currency == "GBP" and book.get("sucrose") is None
    path.write_text("currency = \n")
    with pytest.raises(InputError):
        load_book(path)

"""Units at the edge against NIST SP 811 (Thompson & Taylor 2008, Guide for the Use of the SI,
Appendix B conversion factors), and the one-line errors naming the field."""

import pytest

from co2routes.thermo.errors import InputError
from co2routes.thermo.units import parse, parse_positive


@pytest.mark.parametrize("text, dimension, si", [
    ("160 psi", "pressure", 160 * 6.894757e3),        # SP 811 B.8: psi -> Pa 6.894 757 E+03
    ("1 atm", "pressure", 101325.0),                  # exact by definition
    ("35 bar", "pressure", 35e5),                     # exact
    ("10 gal", "volume", 10 * 3.785412e-3),           # US liquid gallon -> m3 3.785 412 E-03
    ("47 L", "volume", 0.047),                        # exact
    ("2 kg/day", "mass_flow", 2 / 86400.0),           # day = 86 400 s exactly
    ("5 lb", "mass", 5 * 0.45359237),                 # exact by definition
    ("-4 degF", "temperature", 253.15),               # T/K = (t/degF + 459.67) / 1.8, exact
    ("20 degC", "temperature", 293.15),               # exact
    ("31 %", "fraction", 0.31),                       # per cent
    ("425 ppmv", "fraction", 425e-6),                 # parts per million by volume
])
def test_conversion_factors_against_nist_sp_811(text, dimension, si):
    # SP 811 gives its factors to 7 significant figures: tolerance 1e-6 relative
    assert parse(text, "field", dimension) == pytest.approx(si, rel=1e-6)


@pytest.mark.parametrize("text, dimension, words", [
    ("160", "pressure", "a bare number has no unit"),
    ("3 kg", "pressure", "must be a pressure with units"),
    ("warm", "temperature", "must be a temperature with units"),
    ("", "mass", "got nothing"),
])
def test_wrong_dimension_or_bare_number_names_the_field(text, dimension, words):
    with pytest.raises(InputError) as err:
        parse(text, "--rated-pressure", dimension)
    message = str(err.value)
    assert message.startswith("--rated-pressure:") and words in message and "\n" not in message


def test_zero_or_negative_is_refused_where_a_positive_is_needed():
    for text in ("0 L", "-3 L"):
        with pytest.raises(InputError, match="--volume: must be greater than zero"):
            parse_positive(text, "--volume", "volume")

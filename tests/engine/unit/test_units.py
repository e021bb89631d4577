"""Parsing and formatting of quantities at the engine's edge (engine.units)."""

import math

import pytest
from kernline.engine import units
from kernline.engine.errors import InputError
from kernline.engine.units import Kind, format_length, format_quantity, parse_quantity

# Exact conversion factors: NIST Special Publication 811 (2008), appendix B.8/B.9:
# 1 in = 0.0254 m, 1 ft = 0.3048 m, 1 lbf = 4.448 221 615 260 5 N.
INCH, FOOT, LBF = 0.0254, 0.3048, 4.4482216152605


@pytest.mark.parametrize(
    ("text", "kind", "expected"),
    [
        ("24 in", Kind.LENGTH, 24 * INCH),
        ("600 mm", Kind.LENGTH, 0.6),
        ("2 ft 6 in", Kind.LENGTH, 30 * INCH),
        ("2'-6\"", Kind.LENGTH, 30 * INCH),
        ('6"', Kind.LENGTH, 6 * INCH),
        ("1.2 m", Kind.LENGTH, 1.2),
        ("2 kip", Kind.FORCE, 2000 * LBF),
        ("10 kN", Kind.FORCE, 10_000.0),
        ("300 plf", Kind.LINE_LOAD, 300 * LBF / FOOT),
        ("1.5 kip/ft", Kind.LINE_LOAD, 1500 * LBF / FOOT),
        ("3 kN/m", Kind.LINE_LOAD, 3000.0),
        ("2000 psf", Kind.PRESSURE, 2000 * LBF / FOOT**2),
        ("2 ksf", Kind.PRESSURE, 2000 * LBF / FOOT**2),
        ("150 kPa", Kind.PRESSURE, 150_000.0),
        ("150 pcf", Kind.UNIT_WEIGHT, 150 * LBF / FOOT**3),
        ("23.6 kN/m**3", Kind.UNIT_WEIGHT, 23_600.0),
        ("0.15 kcf", Kind.UNIT_WEIGHT, 150 * LBF / FOOT**3),
        ("250 pcf", Kind.PRESSURE_GRADIENT, 250 * LBF / FOOT**3),
        ("-90 plf", Kind.LINE_LOAD, -90 * LBF / FOOT),
    ],
)
def test_parse_quantity_converts_to_si(text, kind, expected):
    """Text in any unit of the right dimension becomes the SI value (NIST SP 811 factors)."""
    assert parse_quantity(text, kind) == pytest.approx(expected, rel=1e-12)


def test_units_file_defines_trade_units():
    """Our units file gives pint psf, ksf, plf, klf, pcf and kcf (pint itself knows kip)."""
    reg = units.registry()
    assert reg.Quantity(1, "ksf").to("psf").magnitude == pytest.approx(1000.0)
    assert reg.Quantity(1, "klf").to("plf").magnitude == pytest.approx(1000.0)
    assert reg.Quantity(1, "kcf").to("pcf").magnitude == pytest.approx(1000.0)
    assert reg.Quantity(1, "psf").to("Pa").magnitude == pytest.approx(47.880259, rel=1e-7)  # NIST SP 811 B.9


@pytest.mark.parametrize(
    ("text", "kind"),
    [
        ("24", Kind.LENGTH),
        ("24 kip", Kind.LENGTH),
        ("abc", Kind.LENGTH),
        ("", Kind.LENGTH),
        ("1 ft 2 kip", Kind.LENGTH),
        ("2000 psi ft", Kind.PRESSURE),
        ("3 ft", Kind.FORCE),
        ("150 psf", Kind.UNIT_WEIGHT),
        ("2 lb", Kind.LENGTH),
    ],
)
def test_wrong_dimension_or_text_is_refused_with_an_example(text, kind):
    """A bare number, a wrong unit or text is refused; the message shows an example of the right form."""
    with pytest.raises(InputError) as err:
        parse_quantity(text, kind)
    assert kind.info.example in err.value.message
    assert f'"{text}"' in err.value.message


@pytest.mark.parametrize("text", ["nan ft", "inf in", "1e400 m"])
def test_non_finite_values_are_refused(text):
    """NaN and infinities are not lengths."""
    with pytest.raises(InputError, match="finite"):
        parse_quantity(text, Kind.LENGTH)


def test_bare_number_uses_the_default_unit():
    """In the window a bare number is in the display unit of the field."""
    assert parse_quantity("18", Kind.LENGTH, default_unit="in") == pytest.approx(18 * INCH)
    assert parse_quantity("450", Kind.LENGTH, default_unit="mm") == pytest.approx(0.45)


def test_general_unit_expressions_work():
    """Less common spellings are units pint knows: '1.5 kip / foot', '2 kN*m'."""
    assert parse_quantity("1.5 kip / foot", Kind.LINE_LOAD) == pytest.approx(1500 * LBF / FOOT)
    assert parse_quantity("2 kN*m", Kind.MOMENT) == pytest.approx(2000.0)
    assert parse_quantity("0.5 meter", Kind.LENGTH) == pytest.approx(0.5)


@pytest.mark.parametrize(
    ("metres", "text"),
    [(30 * INCH, "2'-6\""), (6 * INCH, '6"'), (12 * FOOT, "12'-0\""), (6.25 * INCH, '6 1/4"'), (-FOOT, "-1'-0\"")],
)
def test_format_length_feet_inches(metres, text):
    """US dimensions print as feet and inches to the nearest 1/4 in (common practice on drawings)."""
    assert format_length(metres, "US") == text


def test_format_quantity_precision():
    """psf to whole numbers, kips to two decimals, kPa to one (common practice)."""
    assert format_quantity(2000 * LBF / FOOT**2, Kind.PRESSURE, "US") == "2,000 psf"
    assert format_quantity(2500 * LBF, Kind.FORCE, "US") == "2.50 kip"
    assert format_quantity(95_760.5, Kind.PRESSURE, "SI") == "95.8 kPa"
    assert format_quantity(None, Kind.FORCE, "US") == "—"
    assert format_quantity(math.inf, Kind.FORCE, "US") == "∞"


def test_length_text_round_trips():
    """Sizes written back into a file parse to the same value."""
    for value in (0.4572, 1.2192, 0.3):
        for system in ("US", "SI"):
            assert parse_quantity(units.length_text(value, system), Kind.LENGTH) == pytest.approx(value, abs=1e-6)


@pytest.mark.parametrize(
    ("text", "inches"),
    [('-6"', -6.0), ("-2'-6\"", -30.0), ("-2 ft 6 in", -30.0), ("+3'", 36.0), ("2'-6\"", 30.0)],
)
def test_a_leading_sign_applies_to_the_whole_compound_length(text, inches):
    """A minus sign before feet-and-inches negates the whole length (loads on the start extension)."""
    assert parse_quantity(text, Kind.LENGTH) == pytest.approx(inches * INCH)


@pytest.mark.parametrize("text", ["2 ft -6 in", "2'-+6\"", "9**9**9 in", "2^99 ft", "1e13 N", "(9)**9 in"])
def test_signs_inside_powers_and_absurd_magnitudes_are_refused(text):
    """No sign inside a compound length, no powers of numbers (pint would evaluate them), no 1e13 N."""
    kind = Kind.FORCE if text.endswith(" N") else Kind.LENGTH
    with pytest.raises(InputError):
        parse_quantity(text, kind)


def test_remembered_pint_answers_equal_pints_own(tmp_path, monkeypatch):
    """The factors kept on disk between runs are pint's answers, read back unchanged (pint is the reference)."""
    monkeypatch.setenv("XDG_CACHE_HOME", str(tmp_path))
    monkeypatch.delenv("KERNLINE_UNIT_CACHE", raising=False)
    first = units._PintAnswers()
    assert first.get("psf|[force] / [length] ** 2") == (False, None)
    factor = units._ask_pint("psf", "[force] / [length] ** 2")
    first.put("psf|[force] / [length] ** 2", factor)
    first.put("ftt|[length]", None)  # a unit pint does not know is remembered as unknown
    again = units._PintAnswers()  # a later run
    assert again.get("psf|[force] / [length] ** 2") == (True, factor)
    assert again.get("ftt|[length]") == (True, None)
    reg = units.registry()
    assert factor == reg.Quantity(1.0, "psf").to_base_units().magnitude
    assert list((tmp_path / "kernline").glob("unit-factors-*.json"))


def test_remembered_answers_can_be_turned_off(tmp_path, monkeypatch):
    """KERNLINE_UNIT_CACHE=0: nothing is read or written."""
    monkeypatch.setenv("XDG_CACHE_HOME", str(tmp_path))
    monkeypatch.setenv("KERNLINE_UNIT_CACHE", "0")
    answers = units._PintAnswers()
    answers.put("in|[length]", 0.0254)
    assert not (tmp_path / "kernline").exists()

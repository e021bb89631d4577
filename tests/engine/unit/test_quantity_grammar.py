"""The one quantity grammar of the project file, the command line and the window (engine.units).

Exact factors: NIST Special Publication 811 (2008), appendix B.8/B.9: 1 in = 0.0254 m, 1 ft = 0.3048 m,
1 lbf = 4.448 221 615 260 5 N. pint, the reference library for units, does the conversions; these
expected values are worked out by hand from the NIST factors, so the table checks pint and the
grammar together.
"""

from __future__ import annotations

import json

import pytest
from hypothesis import given, settings
from hypothesis import strategies as st
from kernline.engine.errors import InputError
from kernline.engine.project_file import parse_project
from kernline.engine.units import Kind, parse_quantity, stored_text

INCH, FOOT, LBF = 0.0254, 0.3048, 4.4482216152605
KIP = 1000 * LBF


@pytest.mark.parametrize(
    ("text", "kind", "expected"),
    [
        # a number and a unit; sums of terms of one kind
        ("2 ft 6 in", Kind.LENGTH, 30 * INCH),
        ("2 ft 6 1/2 in", Kind.LENGTH, 30.5 * INCH),
        ("1 m 250 mm", Kind.LENGTH, 1.25),
        ("-2 ft 6 in", Kind.LENGTH, -30 * INCH),  # one leading sign negates the whole sum
        # feet-and-inch marks
        ("2'-6\"", Kind.LENGTH, 30 * INCH),
        ("2' 6\"", Kind.LENGTH, 30 * INCH),
        ("2'-6 1/2\"", Kind.LENGTH, 30.5 * INCH),
        ('6 1/2"', Kind.LENGTH, 6.5 * INCH),
        ("30 1/2 in", Kind.LENGTH, 30.5 * INCH),
        ("2′-6″", Kind.LENGTH, 30 * INCH),  # typographic primes
        ("-1'-0\"", Kind.LENGTH, -FOOT),
        # mixed fractions for any unit, decimals and exponents
        ("3 1/2 kip", Kind.FORCE, 3.5 * KIP),
        ("1/2 in", Kind.LENGTH, 0.5 * INCH),
        ("1.5e3 lbf", Kind.FORCE, 1500 * LBF),
        (".5 in", Kind.LENGTH, 0.5 * INCH),
        ("2.5E-1 m", Kind.LENGTH, 0.25),
        # the usual spellings
        ("2 kip", Kind.FORCE, 2 * KIP),
        ("2 kips", Kind.FORCE, 2 * KIP),
        ("300 lb", Kind.FORCE, 300 * LBF),  # lb means pound-force on structural drawings
        ("300 lbs", Kind.FORCE, 300 * LBF),
        ("300 lbf", Kind.FORCE, 300 * LBF),
        ("24 in", Kind.LENGTH, 24 * INCH),
        ("24 inch", Kind.LENGTH, 24 * INCH),
        ("24 inches", Kind.LENGTH, 24 * INCH),
        ("2 ft", Kind.LENGTH, 2 * FOOT),
        ("1 foot", Kind.LENGTH, FOOT),
        ("3 feet", Kind.LENGTH, 3 * FOOT),
        ("300 plf", Kind.LINE_LOAD, 300 * LBF / FOOT),
        ("1.2 klf", Kind.LINE_LOAD, 1200 * LBF / FOOT),
        ("1.5 kip/ft", Kind.LINE_LOAD, 1500 * LBF / FOOT),
        ("2000 psf", Kind.PRESSURE, 2000 * LBF / FOOT**2),
        ("2 ksf", Kind.PRESSURE, 2000 * LBF / FOOT**2),
        ("3000 psi", Kind.PRESSURE, 3000 * LBF / INCH**2),
        ("150 pcf", Kind.UNIT_WEIGHT, 150 * LBF / FOOT**3),
        ("3 kN/m", Kind.LINE_LOAD, 3000.0),
        ("18 kN/m^3", Kind.UNIT_WEIGHT, 18_000.0),
        ("18 kN/m³", Kind.UNIT_WEIGHT, 18_000.0),
        ("18 kN/m**3", Kind.UNIT_WEIGHT, 18_000.0),
        ("150 kPa", Kind.PRESSURE, 150_000.0),
        ("25 MPa", Kind.PRESSURE, 25e6),
        ("25 kPa/m", Kind.PRESSURE_GRADIENT, 25_000.0),
        ("10 kip*ft", Kind.MOMENT, 10 * KIP * FOOT),
        ("10 kN·m", Kind.MOMENT, 10_000.0),
        ("  24 in  ", Kind.LENGTH, 24 * INCH),
    ],
)
def test_accepted_forms_and_their_si_values(text, kind, expected):
    """Each accepted form gives its SI value (hand-worked from the NIST SP 811 factors)."""
    assert parse_quantity(text, kind) == pytest.approx(expected, rel=1e-12)


@pytest.mark.parametrize(
    ("text", "words"),
    [
        ("2 ft 6", "ends with a number that has no unit"),  # a trailing bare number (pint read it as 12 ft)
        ("1 ft 4", "ends with a number that has no unit"),
        ("in", "is a unit with no number"),  # a unit alone (pint read it as 1 in)
        ("ft 2", "starts with a unit"),  # a unit first
        ("--24 in", "more than one sign"),  # doubled signs (pint read it as +24 in)
        ("+-24 in", "more than one sign"),
        ("2 ft ft", "a unit right after a unit"),  # a repeated unit
        ("2 ft 3 ft", 'gives the unit "ft" twice'),
        ("24 in 2", "ends with a number that has no unit"),  # two numbers in a row
        ("24 2 in", "two numbers in a row"),
        ("2.5.1 ft", "malformed number"),
        ("1/0 ft", "divides by zero"),
        ("6 1/0 in", "divides by zero"),
        ("nan ft", "not a finite number"),
        ("inf in", "not a finite number"),
        ("1e999 ft", "not a finite number"),
        ("٢٤ in", "digit other than 0-9"),  # Arabic-Indic digits
        ("２４ in", "digit other than 0-9"),  # full-width digits
        ("2 ft -6 in", "sign inside"),
        ("6 3/2 in", "improper fraction"),
        ("2.5 1/2 in", "not whole numbers"),
        ("24 ftt", '"ftt" is not a unit Kernline knows'),
        ("2 kin", '"kin" is not a unit Kernline knows'),  # no prefixes on inch-pound units
        ("24 kip", '"kip" is not a length'),
        ("9**9**9 in", 'unexpected "*"'),  # no user text reaches pint's evaluator
        ("(9)**9 in", 'unexpected "("'),
        ("2^99 ft", "unexpected"),
        ("24 in\x1b[31m", "control character"),
        ("", "is empty"),
        ("6 1/2", "has no unit"),  # a bare number is refused where the field gives no unit
    ],
)
def test_refused_forms_say_what_is_wrong(text, words):
    """Everything outside the grammar is refused, never guessed, with a one-line message that says why."""
    with pytest.raises(InputError) as err:
        parse_quantity(text, Kind.LENGTH)
    message = err.value.message
    assert words in message
    assert "\n" not in message and "\r" not in message and "\x1b" not in message
    assert len(message) <= 240


@pytest.mark.parametrize(
    ("text", "kind", "limit"),
    [("1001 m", Kind.LENGTH, "1 km"), ("1e11 N", Kind.FORCE, "1e10 N"), ("-2 km", Kind.LENGTH, "1 km")],
)
def test_values_beyond_physical_sense_name_the_limit(text, kind, limit):
    """A length over 1 km or a force over 1e10 N is a slip of unit or digits: refused, naming the limit."""
    with pytest.raises(InputError, match=limit):
        parse_quantity(text, kind)


def test_a_bare_number_means_the_fields_own_unit():
    """In a window field a bare number is in the unit shown beside the field, fractions included."""
    assert parse_quantity("18", Kind.LENGTH, default_unit="in") == pytest.approx(18 * INCH)
    assert parse_quantity("6 1/2", Kind.LENGTH, default_unit="in") == pytest.approx(6.5 * INCH)
    assert parse_quantity("-90", Kind.LINE_LOAD, default_unit="plf") == pytest.approx(-90 * LBF / FOOT)
    assert stored_text("6 1/2", Kind.LENGTH, "in") == "6 1/2 in"
    assert stored_text(" 2 ft 6 in ", Kind.LENGTH, "in") == "2 ft 6 in"


# ---- property: the file and a window field read any text the same way --------------------------

_ALPHABET = st.sampled_from(list("0123456789 ./-+'\"eE") + ["ft", "in", "m", "mm", "kip", "lb", "1/2", " ", "--", "٣"])


def _through_file(text: str) -> float | str:
    """The footing width of a one-wall project whose file holds ``text``; or the refusal message."""
    raw = {
        "format": "kernline-project",
        "version": 1,
        "soil": {"allowable_bearing": "2000 psf", "friction": 0.35, "unit_weight": "110 pcf"},
        "walls": [
            {
                "id": "P1",
                "length": "10 ft",
                "thickness": "1 in",
                "footing": {"width": text, "thickness": "12 in"},
                "loads": [{"type": "line", "case": "D", "value": "500 plf"}],
            }
        ],
    }
    try:
        return parse_project(json.loads(json.dumps(raw))).walls[0].footing.width
    except InputError as err:
        return err.message


def _through_field(text: str) -> float | str:
    """The same, with ``text`` typed into a window field showing "in": stored, then read as a file."""
    try:
        stored = stored_text(text, Kind.LENGTH, "in")
    except InputError as err:
        return err.message
    return _through_file(stored)


@settings(max_examples=400, deadline=None)
@given(st.lists(_ALPHABET, min_size=0, max_size=8).map("".join))
def test_any_text_reads_the_same_through_the_file_and_a_field(text):
    """Any text gives one value through the file and through a field, or a one-line refusal."""
    by_file, by_field = _through_file(text), _through_field(text)
    for outcome in (by_file, by_field):
        if isinstance(outcome, str):
            assert "\n" not in outcome and "\r" not in outcome and len(outcome) <= 240
    if isinstance(by_file, float):
        assert by_field == pytest.approx(by_file, rel=1e-12)  # what the file accepts, a field accepts alike
    if isinstance(by_field, float) and isinstance(by_file, str):
        # only a bare number differs: the field gives it the unit shown, the file asks for one
        assert parse_quantity(text, Kind.LENGTH, default_unit="in") == pytest.approx(by_field)
        assert "has no unit" in by_file or "must be greater than zero" in by_file or "narrower" in by_file

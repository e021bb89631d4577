"""Each printed equation of the demo package reproduces its printed result from its printed inputs, in US
and in SI units.

A plan checker redoes the arithmetic of a hand calc from what is on the sheet. These tests do the
same: they read the PDF's text (pypdf), take each substituted line (``= 0.516 × 8.718 kip × 11'-0"/2``),
evaluate it with its printed units (pint: the units are converted, never assumed), and require the
printed result within the rounding of what is printed (half a unit of the result's last digit plus the
first-order effect of each printed value's own rounding, half a unit of its last digit) and, as a
reader redoing it by hand expects, within one and a half units of the result's last digit. A line that
substitutes a coarsely rounded value (an eccentricity to the nearest 1/4 in) fails the second even when
it passes the first; a line whose units do not make its result's fails outright.

Source: arithmetic only (the formulas printed on the sheets; Das, Principles of Foundation
Engineering, for the pressure formulas they restate; ACI 318-19 for the concrete lines). Feet-inches
values on the demo sheets are the inputs as entered (whole inches), so they are taken as exact; load
factors such as 0.516 are printed to all their digits (engine.calc_package.factor_text) and also taken
as exact. The concrete lines work on a strip b wide (12 in or 1,000 mm, printed in the line): a force or
area over the strip is the printed result per foot or per metre of footing.
"""

from __future__ import annotations

import math
import re
from dataclasses import dataclass
from typing import Any

import pint
import pytest
from kernline.engine.units import registry
from report_helpers import RenderedPackage, render, variant

# the start of each substituted line to check (symbol and formula as printed, subscripts run in)
STABILITY = (
    "Wf = γc B tf Lf",
    "Wsoil = γs hs",
    "W = Wf + Wstem + Wsoil",
    "MOT = Σ f H",
    "MR = Σ f P",
    "ratio = MR / MOT",
    "V = Σ f H",
    "N = Σ f P + fD W",
    "Fμ = μ N",
    "Fp = pp B",
    "R = Fμ + Fc + Fp",
    "ratio = R / V",
    "M = ± Σ f H",
    "e = M / N",
    "a = 3 (Lf/2 − |e|)",
    "qmax = N / (B Lf)",
    "qmin = N / (B Lf)",
    "qmax = 2N / (3B",
    "ratio = qa / qmax",
)
CONCRETE = (
    "qu = qmax − fD W",
    "c = (B − tw) / 2",
    "Mu = qu c² / 2",
    "d = h − cover − db / 2",
    "As,min = 0.0018 b h",
    "As,prov = Ab b / s",
    "Vu = qu (c",
    "φVc = φ min(8",
    "ℓavail = c − cover",
    "hs = h − 2 in",
    "Sm = b hs² / 6",
    "φMn = 0.6 × 5",
    "φVn = 0.6 × (4/3)",
)
LINES = STABILITY + CONCRETE

# printed unit → pint unit (longest first, so "kip·ft/ft" is not read as "kip")
_UNITS = {
    "kip·ft/ft": "kip * foot / foot",
    "kN·m/m": "kilonewton * meter / meter",
    "kip·ft": "kip * foot",
    "kN·m": "kilonewton * meter",
    "kN/m³": "kilonewton / meter ** 3",
    "kip/ft": "kip / foot",
    "kN/m": "kilonewton / meter",
    "psf/ft": "psf / foot",
    "kPa/m": "kilopascal / meter",
    "in³/ft": "inch ** 3 / foot",
    "in²/ft": "inch ** 2 / foot",
    "mm³/m": "millimeter ** 3 / meter",
    "mm²/m": "millimeter ** 2 / meter",
    "in³": "inch ** 3",
    "in²": "inch ** 2",
    "mm³": "millimeter ** 3",
    "mm²": "millimeter ** 2",
    "kip": "kip",
    "kN": "kilonewton",
    "psf": "psf",
    "pcf": "pcf",
    "ksf": "ksf",
    "psi": "psi",
    "kPa": "kilopascal",
    "MPa": "megapascal",
    "mm": "millimeter",
    "in": "inch",
    "ft": "foot",
    "m": "meter",
}
_UNIT = "(?:" + "|".join(re.escape(u) for u in _UNITS) + ")"
_END = r"(?=[\s),\]/]|$)"
_RESULT = re.compile(rf" = (?P<res>−?[\d,]+(?:\.\d+)?)(?: (?P<unit>{_UNIT}))?{_END}")
_FEET_INCHES = re.compile(r"(\d+)'-(\d+)(?: (\d)/(\d))?\"")
_INCHES = re.compile(r"(?<![\d'])(\d+)(?: (\d)/(\d))?\"")
_WITH_UNIT = re.compile(rf"(−?)([\d,]+(?:\.(\d+))?) ({_UNIT}){_END}")
_BARE = re.compile(r"(?<![\w.])(\d+(?:\.\d+)?)(?![\w.])")
STRIPS = ("12 in", "1,000 mm")  # the design strip b of the concrete lines


def quantity(value: float, printed_unit: str) -> Any:
    ureg = registry()
    return ureg.Quantity(value, ureg.parse_units(_UNITS[printed_unit])) if printed_unit else ureg.Quantity(value)


@dataclass(frozen=True)
class Line:
    start: str
    numbers: str
    result: float
    result_unit: str
    result_half_unit: float


def substituted_lines(text: str, starts: tuple[str, ...] = LINES) -> list[Line]:
    """Every printed ``symbol = formula = numbers = result`` line whose symbol and formula start as in ``starts``."""
    out = []
    for start in starts:
        for m in re.finditer(re.escape(start), text):
            rest = text[m.end() :]
            # the formula runs to the first " = ", the numbers to the next " = " that starts the result
            formula_end = rest.index(" = ")
            numbers_and_result = rest[formula_end + 3 :]
            r = _RESULT.search(numbers_and_result)
            assert r, (start, numbers_and_result[:200])
            numbers = numbers_and_result[: r.start()]
            digits = r.group("res").split(".")
            half = 0.5 * 10.0 ** -(len(digits[1]) if len(digits) > 1 else 0)
            value = float(r.group("res").replace("−", "-").replace(",", ""))
            out.append(Line(start, numbers, value, r.group("unit") or "", half))
    return out


def evaluate(numbers: str) -> tuple[Any, list[Any]]:
    """The value of a printed expression (a pint quantity) and its values with each rounded printed value
    moved by half a unit of its last digit (for the first-order effect of the printed rounding)."""
    values: dict[str, Any] = {}
    halves: dict[str, Any] = {}

    def name(value: Any, half: Any) -> str:
        key = f"v{len(values)}"
        values[key] = value
        halves[key] = half
        return f" {key} "

    def feet_inches(m: re.Match[str]) -> str:
        frac = int(m.group(3)) / int(m.group(4)) if m.group(3) else 0.0
        return name(quantity(int(m.group(1)) + (int(m.group(2)) + frac) / 12.0, "ft"), None)

    def inches(m: re.Match[str]) -> str:
        frac = int(m.group(2)) / int(m.group(3)) if m.group(2) else 0.0
        return name(quantity(int(m.group(1)) + frac, "in"), None)

    def with_unit(m: re.Match[str]) -> str:
        places = len(m.group(3) or "")
        value = float(m.group(2).replace(",", "")) * (-1.0 if m.group(1) else 1.0)
        return name(quantity(value, m.group(4)), quantity(0.5 * 10.0**-places, m.group(4)))

    expr = _FEET_INCHES.sub(feet_inches, numbers)
    expr = _INCHES.sub(inches, expr)
    expr = _WITH_UNIT.sub(with_unit, expr)
    expr = _BARE.sub(lambda m: name(float(m.group(1)), None), expr)  # a plain number (pint compares 0 with any unit)
    expr = expr.replace("×", "*").replace("−", "-").replace("²", "**2").replace("[", "(").replace("]", ")")
    expr = re.sub(r"\|([^|]*)\|", r"abs(\1)", expr)
    assert re.fullmatch(r"[\sv\d+\-*/().,absmxin]*", expr), (numbers, expr)
    env = {"abs": abs, "max": _max, "min": min}
    value = eval(expr, env, dict(values))  # noqa: S307 - the expression is names, digits and operators only (checked above)
    moved = [
        eval(expr, env, dict(values, **{key: values[key] + half}))  # noqa: S307
        for key, half in halves.items()
        if half is not None
    ]
    return value, moved


def _max(*args: Any) -> Any:
    """max() of printed values, where a bare 0 takes the unit of what it is compared with."""
    best = max(args)
    quantities = [a for a in args if isinstance(a, pint.Quantity)]
    return quantities[0] * 0.0 if not isinstance(best, pint.Quantity) and quantities else best


def in_result_units(value: Any, line: Line) -> float:
    """``value`` in the printed result's unit; a concrete line over its strip b gives the result per length."""
    unit = quantity(1.0, line.result_unit)
    value = registry().Quantity(value) if not isinstance(value, pint.Quantity) else value
    try:
        return float((value / unit).to("dimensionless").magnitude)
    except pint.DimensionalityError:
        strip = next((s for s in STRIPS if re.search(rf"(?<![\d,.]){s}(?![²³\w])", line.numbers)), None)
        assert strip is not None, (line, "the units of the line do not make the unit of its result")
        width = quantity(float(strip.split()[0].replace(",", "")), strip.split()[1])
        return float((value / width / unit).to("dimensionless").magnitude)


def check(line: Line, where: tuple[str, ...]) -> None:
    value, moved = evaluate(line.numbers)
    shown = in_result_units(value, line)
    spread = sum(abs(in_result_units(v, line) - shown) for v in moved)
    unit = 2.0 * line.result_half_unit
    context = (*where, line.start, line.numbers, shown, line.result)
    # within the rounding of every printed value
    assert math.isclose(shown, line.result, abs_tol=spread + line.result_half_unit + 1e-9), context
    # and, as a reader redoing it by hand would expect, within one and a half units of the last digit
    assert abs(shown - line.result) <= 1.5 * unit + 1e-9, context


@pytest.fixture(scope="module")
def demo_si(demo_document) -> RenderedPackage:
    """The demo project with its units set to SI."""
    return render(variant(demo_document, lambda raw: raw.update(units="SI")))


WALLS = ["N1", "S2", "C3", "E4", "K5"]


@pytest.mark.parametrize("system", ["US", "SI"])
@pytest.mark.parametrize("wall_id", WALLS)
def test_every_printed_line_reproduces_its_result(
    demo: RenderedPackage, demo_si: RenderedPackage, wall_id: str, system: str
) -> None:
    """Self weight, overturning, sliding, bearing and concrete lines recompute to their printed results."""
    package = demo if system == "US" else demo_si
    stability = substituted_lines(package.text_of(f"Wall {wall_id}: stability"), STABILITY)
    starts = {line.start for line in stability}
    # every wall prints the self weight, both moments, the shear, N, e and a peak pressure
    for required in ("W = Wf + Wstem + Wsoil", "MOT = Σ f H", "MR = Σ f P", "V = Σ f H", "N = Σ f P + fD W", "e = M / N"):
        assert required in starts, (wall_id, system, required)
    assert starts & {"qmax = N / (B Lf)", "qmax = 2N / (3B"}
    concrete = substituted_lines(package.text_of(f"Wall {wall_id}: concrete"), CONCRETE)
    starts = {line.start for line in concrete}
    # every concrete sheet substitutes q_u, the cantilever, M_u and both capacities (plain or reinforced)
    assert {"qu = qmax − fD W", "Mu = qu c² / 2"} <= starts, (wall_id, system, starts)
    assert {"φMn = 0.6 × 5", "φVn = 0.6 × (4/3)"} <= starts or {"As,prov = Ab b / s", "φVc = φ min(8"} <= starts
    for line in stability + concrete:
        check(line, (wall_id, system))


def test_si_capacity_lines_carry_their_substitution(demo_si: RenderedPackage) -> None:
    """In SI, a capacity line is not just "symbol = formula = result": its numbers are printed (issue 12)."""
    text = demo_si.text_of("Wall N1: concrete")
    for start in ("Sm = b hs² / 6 = ", "φMn = 0.6 × 5 λ √f'c Sm = ", "φVn = 0.6 × (4/3) λ √f'c b hs = "):
        after = text[text.index(start) + len(start) :]
        assert re.match(r"[\d,.]+ (?:mm|MPa|×)", after), (start, after[:80])


def test_a_coarse_eccentricity_would_be_caught() -> None:
    """The old S2 line (e to the nearest 1/4 in) recomputes to 4'-1 1/2" = 4.125 ft, not the printed a."""
    line = Line("a = 3 (Lf/2 − |e|)", "3 × (11'-0\"/2 − 4'-1 1/2\")", 4.1458, "ft", 0.00005)
    value, _ = evaluate(line.numbers)
    assert in_result_units(value, line) == pytest.approx(4.125)
    with pytest.raises(AssertionError):
        check(line, ("S2",))
    check(Line(line.start, "3 × (11.000 ft/2 − 4.117 ft)", 4.149, "ft", 0.0005), ("S2",))


def test_a_line_in_the_wrong_units_would_be_caught() -> None:
    """A result printed per foot from a line with no strip in it, or in a unit its numbers cannot make, fails."""
    with pytest.raises(AssertionError):  # kip·ft from kip alone
        check(Line("x", "0.5 × 2.00 kip", 1.00, "kip·ft", 0.005), ("test",))
    with pytest.raises(AssertionError):  # 1 MPa × 1,000 mm² is 1 kN, not 1 kN/m: no strip printed
        check(Line("x", "1.0000 MPa × 1,000 mm²", 1.00, "kN/m", 0.005), ("test",))
    check(Line("x", "1.0000 MPa × 1,000 mm × 1.0 mm", 1.00, "kN/m", 0.005), ("test",))  # over the 1,000 mm strip
    check(Line("x", "150 pcf × 2'-0\" × 1'-0\" × 10'-0\"", 3.00, "kip", 0.005), ("test",))  # lb to kip by pint


def test_uplift_point_load_arrow_points_up(demo_document) -> None:
    """E4's chord uplift (E −1.20 kip) is drawn pointing up, its compression pointing down (review item 4)."""
    from kernline.engine.calc_package import Arrow, _Fmt, elevation_drawing

    wall = next(w for w in demo_document.project.walls if w.id == "E4")
    drawing = elevation_drawing(wall, _Fmt("US"), 372.0, 236.0)
    point_arrows = [s for s in drawing.shapes if isinstance(s, Arrow) and s.width == 0.7]  # point loads' arrows
    assert len(point_arrows) == 2
    up = [a for a in point_arrows if a.y2 > a.y1]
    down = [a for a in point_arrows if a.y2 < a.y1]
    assert len(up) == 1 and len(down) == 1
    assert up[0].x1 < down[0].x1  # the uplift is at the start end (at 3"), the compression at the far end

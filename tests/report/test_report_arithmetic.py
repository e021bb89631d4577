"""Each printed equation of the demo package reproduces its printed result from its printed inputs.

A plan checker redoes the arithmetic of a hand calc from what is on the sheet. These tests do the
same: they read the PDF's text (pypdf), take each substituted line (``= 0.516 × 8.718 kip × 11'-0"/2``),
evaluate it, and require the printed result within the rounding of what is printed (half a unit of
the result's last digit plus the first-order effect of each printed value's own rounding, half a unit
of its last digit) and, as a reader redoing it by hand expects, within one and a half units of the
result's last digit. A line that substitutes a coarsely rounded value (an eccentricity to the nearest
1/4 in) fails the second even when it passes the first.

Source: arithmetic only (the formulas printed on the sheets; Das, Principles of Foundation
Engineering, for the pressure formulas they restate). Feet-inches values on the demo sheets are the
inputs as entered (whole inches), so they are taken as exact; load factors such as 0.516 are printed
to all their digits (engine.calc_package.factor_text) and also taken as exact.
"""

from __future__ import annotations

import math
import re
from dataclasses import dataclass

import pytest
from report_helpers import RenderedPackage

# the start of each substituted line to check (symbol and formula as printed, subscripts run in)
LINES = (
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

_UNIT = r"(?:kip·ft|kip|psf/ft|psf|pcf|ft)"
_RESULT = re.compile(rf" = (?P<res>−?[\d,]+(?:\.\d+)?)(?: (?P<unit>{_UNIT}))?(?=\s|$)")
_FEET_INCHES = re.compile(r"(\d+)'-(\d+)(?: (\d)/(\d))?\"")
_INCHES = re.compile(r"(?<![\d'])(\d+)(?: (\d)/(\d))?\"")
_WITH_UNIT = re.compile(rf"(−?)([\d,]+(?:\.(\d+))?) ({_UNIT})")
_BARE = re.compile(r"(?<![\w.])(\d+(?:\.\d+)?)(?![\w.])")


@dataclass(frozen=True)
class Line:
    start: str
    numbers: str
    result: float
    result_unit: str
    result_half_unit: float


def substituted_lines(text: str) -> list[Line]:
    """Every printed ``symbol = formula = numbers = result`` line whose symbol and formula start as in LINES."""
    out = []
    for start in LINES:
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


def evaluate(numbers: str) -> tuple[float, float]:
    """The value of a printed expression and the first-order effect of its printed values' rounding."""
    values: dict[str, float] = {}
    halves: dict[str, float] = {}

    def name(value: float, half: float) -> str:
        key = f"v{len(values)}"
        values[key] = value
        halves[key] = half
        return f" {key} "

    def feet_inches(m: re.Match[str]) -> str:
        frac = int(m.group(3)) / int(m.group(4)) if m.group(3) else 0.0
        return name(int(m.group(1)) + (int(m.group(2)) + frac) / 12.0, 0.0)

    def inches(m: re.Match[str]) -> str:
        frac = int(m.group(2)) / int(m.group(3)) if m.group(2) else 0.0
        return name((int(m.group(1)) + frac) / 12.0, 0.0)

    def with_unit(m: re.Match[str]) -> str:
        places = len(m.group(3) or "")
        value = float(m.group(2).replace(",", "")) * (-1.0 if m.group(1) else 1.0)
        return name(value, 0.5 * 10.0**-places)

    expr = _FEET_INCHES.sub(feet_inches, numbers)
    expr = _INCHES.sub(inches, expr)
    expr = _WITH_UNIT.sub(with_unit, expr)
    expr = _BARE.sub(lambda m: name(float(m.group(1)), 0.0), expr)
    expr = expr.replace("×", "*").replace("−", "-").replace("²", "**2").replace("[", "(").replace("]", ")")
    expr = re.sub(r"\|([^|]*)\|", r"abs(\1)", expr)
    assert re.fullmatch(r"[\sv\d+\-*/().,absmxin]*", expr), (numbers, expr)
    env = {"abs": abs, "max": max, "min": min}
    value = eval(expr, env, dict(values))  # noqa: S307 - the expression is digits and operators only (checked above)
    spread = 0.0
    for key, half in halves.items():
        if half:
            moved = dict(values, **{key: values[key] + half})
            spread += abs(eval(expr, env, moved) - value)  # noqa: S307
    return value, spread


def _scale(line: Line) -> float:
    """Unit change between the printed inputs and the printed result (kip·ft and ft stay as they are)."""
    if line.result_unit == "psf" and "kip" in line.numbers and "psf" not in line.numbers:
        return 1000.0  # kip / ft² to psf
    if line.result_unit == "kip" and re.search(r"pcf|psf", line.numbers):
        return 1e-3  # lb to kip
    return 1.0


@pytest.mark.parametrize("wall_id", ["N1", "S2", "C3", "E4"])
def test_every_printed_line_reproduces_its_result(demo: RenderedPackage, wall_id: str) -> None:
    """Self weight, overturning, sliding and bearing lines recompute to their printed results."""
    text = demo.text_of(f"Wall {wall_id}")
    lines = substituted_lines(text)
    starts = {line.start for line in lines}
    # every wall prints the self weight, both moments, the shear, N, e and a peak pressure
    for required in ("W = Wf + Wstem + Wsoil", "MOT = Σ f H", "MR = Σ f P", "V = Σ f H", "N = Σ f P + fD W", "e = M / N"):
        assert required in starts, (wall_id, required)
    assert starts & {"qmax = N / (B Lf)", "qmax = 2N / (3B"}
    for line in lines:
        value, spread = evaluate(line.numbers)
        value *= _scale(line)
        spread *= _scale(line)
        unit = 2.0 * line.result_half_unit
        where = (wall_id, line.start, line.numbers, value, line.result)
        # within the rounding of every printed value
        assert math.isclose(value, line.result, abs_tol=spread + line.result_half_unit + 1e-9), where
        # and, as a reader redoing it by hand would expect, within one and a half units of the last digit
        assert abs(value - line.result) <= 1.5 * unit + 1e-9, where


def test_a_coarse_eccentricity_would_be_caught() -> None:
    """The old S2 line (e to the nearest 1/4 in) recomputes to 4'-1 1/2" = 4.125 ft, not the printed a."""
    value, spread = evaluate("3 × (11'-0\"/2 − 4'-1 1/2\")")
    assert value == pytest.approx(4.125)
    assert not math.isclose(value, 4.1458, abs_tol=spread + 0.0005)  # 4'-1 3/4" printed from the unrounded e
    value, spread = evaluate("3 × (11.000 ft/2 − 4.117 ft)")
    assert math.isclose(value, 4.149, abs_tol=spread + 0.0005)


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

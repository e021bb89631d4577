"""Deformed reinforcing bars: the ASTM A615 sizes, their names, and the bar texts of drawings.

Source: ASTM A615/A615M, *Standard Specification for Deformed and Plain Carbon-Steel Bars for
Concrete Reinforcement*, Table 1 (bar designation numbers, nominal diameters and nominal
cross-sectional areas). The inch-pound designations #3 to #11 carry the table's inch-pound values,
converted exactly with 1 in = 0.0254 m (NIST Special Publication 811, appendix B). The soft-metric
designations of the same table (No. 10 to No. 36) name the same bars and are accepted as aliases;
their rounded SI values are not used, so a bar has one set of dimensions whichever name is typed.

Texts parsed here:

* a bar: ``"#5"``, ``"# 5"``, ``"No. 16"``, ``"No.16"``, ``"no 16"``;
* a bar and its spacing: ``"#5 @ 12 in"``, ``"No. 16 @ 300 mm"``, ``"#5@1'-0\\""`` (the spacing is
  any length that :func:`engine.units.parse_quantity` reads);
* a number of bars: ``"3 #5"``, ``"3-#5"``, ``"2 No. 13"``.

Errors are :class:`engine.errors.InputError` with an empty field path (the caller adds it).
"""

from __future__ import annotations

import math
import re
from dataclasses import dataclass

from ..errors import InputError
from ..units import Kind, parse_quantity

INCH = 0.0254  # m (exact, NIST SP 811 appendix B)
SQUARE_INCH = INCH * INCH  # m^2

# ASTM A615/A615M Table 1: designation -> (nominal diameter in, nominal area in^2, soft-metric No.).
_TABLE_1: dict[int, tuple[float, float, int]] = {
    3: (0.375, 0.11, 10),
    4: (0.500, 0.20, 13),
    5: (0.625, 0.31, 16),
    6: (0.750, 0.44, 19),
    7: (0.875, 0.60, 22),
    8: (1.000, 0.79, 25),
    9: (1.128, 1.00, 29),
    10: (1.270, 1.27, 32),
    11: (1.410, 1.56, 36),
}

# Bar sizes and spacings offered when Kernline chooses the bars (common practice for wall footings:
# #4 to #8 at whole-inch spacings; the closest spacing keeps 3 in of clear space for concrete).
PRACTICAL_SIZES = (4, 5, 6, 7, 8)
PRACTICAL_SPACING_MIN = 4.0 * INCH
PRACTICAL_SPACING_MAX = 18.0 * INCH
SPACING_STEP = 1.0 * INCH


@dataclass(frozen=True, slots=True)
class Bar:
    """One ASTM A615 deformed bar (ASTM A615/A615M Table 1).

    Attributes:
        size: the inch-pound designation number (3 to 11; "#5" is size 5).
        diameter: nominal diameter d_b (m).
        area: nominal cross-sectional area A_b (m^2).
        metric: the soft-metric designation number of the same bar (No. 16 for #5).
    """

    size: int
    diameter: float
    area: float
    metric: int

    @property
    def name(self) -> str:
        """The inch-pound name, "#5"."""
        return f"#{self.size}"

    @property
    def metric_name(self) -> str:
        """The soft-metric name, "No. 16"."""
        return f"No. {self.metric}"

    def __str__(self) -> str:
        return self.name


def _bar(size: int) -> Bar:
    diameter_in, area_in2, metric = _TABLE_1[size]
    return Bar(size=size, diameter=diameter_in * INCH, area=area_in2 * SQUARE_INCH, metric=metric)


BARS: dict[int, Bar] = {size: _bar(size) for size in _TABLE_1}
"""Every bar of ASTM A615/A615M Table 1 from #3 to #11, by its inch-pound size."""
_BY_METRIC: dict[int, Bar] = {bar.metric: bar for bar in BARS.values()}

_SIZES_TEXT = "#3 to #11 (or No. 10 to No. 36)"
_BAR_RE = re.compile(r"^(?:#\s*(?P<us>\d+)|[Nn][Oo]\s*\.?\s*(?P<si>\d+))$")
_SPACED_RE = re.compile(r"^(?P<bar>.+?)\s*@\s*(?P<spacing>.+)$")
_COUNTED_RE = re.compile(r"^(?P<count>\d+)\s*(?:-\s*|x\s*|×\s*)?(?P<bar>(?:#|[Nn][Oo]).*)$")


def bar(size: int) -> Bar:
    """The bar of inch-pound ``size`` (3 to 11), ASTM A615/A615M Table 1.

    Raises:
        InputError: for a size outside the table.
    """
    if isinstance(size, bool) or size not in BARS:
        raise InputError("", f"no bar #{size}; expected a bar from {_SIZES_TEXT}")
    return BARS[size]


def parse_bar(text: str) -> Bar:
    """A bar from its name: ``"#5"`` (inch-pound) or ``"No. 16"`` / ``"No.16"`` (soft metric).

    A "No." name is read as soft metric, as ASTM A615M names the bars; "No. 5" is refused rather than
    guessed, because "No. 10" and "No. 11" would mean different bars in the two systems.

    Raises:
        InputError: text that names no bar of ASTM A615/A615M Table 1.
    """
    if not isinstance(text, str):
        raise InputError("", f'expected a bar such as "#5" or "No. 16", got {text!r}')
    match = _BAR_RE.match(text.strip())
    if match is None:
        raise InputError("", f'"{text.strip()}" is not a bar; expected a bar such as "#5" or "No. 16"')
    if match["us"] is not None:
        size = int(match["us"])
        if size not in BARS:
            raise InputError("", f'"{text.strip()}" is not a bar size; expected a bar from {_SIZES_TEXT}')
        return BARS[size]
    number = int(match["si"])
    if number not in _BY_METRIC:
        hint = f'; write "#{number}" for the inch-pound bar' if number in BARS else ""
        raise InputError("", f'"{text.strip()}" is not a soft-metric bar (No. 10 to No. 36){hint}')
    return _BY_METRIC[number]


def parse_spaced(text: str) -> tuple[Bar, float]:
    """A bar and its centre-to-centre spacing from text such as ``"#5 @ 12 in"``.

    The spacing is read by :func:`engine.units.parse_quantity` as a length in any unit.

    Returns:
        (the bar, the spacing in m).

    Raises:
        InputError: no "@", an unknown bar, a spacing that is not a length or not greater than zero.
    """
    if not isinstance(text, str):
        raise InputError("", f'expected bars and a spacing such as "#5 @ 12 in", got {text!r}')
    match = _SPACED_RE.match(text.strip())
    if match is None:
        raise InputError("", f'"{text.strip()}" has no spacing; expected bars and a spacing such as "#5 @ 12 in"')
    the_bar = parse_bar(match["bar"])
    try:
        spacing = parse_quantity(match["spacing"].strip(), Kind.LENGTH)
    except InputError as error:
        raise InputError("", f"the spacing of {text.strip()!r}: {error.problem}") from None
    if not spacing > 0.0:
        raise InputError("", f'the spacing of "{text.strip()}" must be greater than zero')
    return the_bar, spacing


def parse_counted(text: str) -> tuple[int, Bar]:
    """A number of bars from text such as ``"3 #5"`` or ``"2 No. 13"``.

    Returns:
        (the count, at least 1; the bar).

    Raises:
        InputError: no leading whole number, a count of zero, or an unknown bar.
    """
    if not isinstance(text, str):
        raise InputError("", f'expected a number of bars such as "3 #5", got {text!r}')
    match = _COUNTED_RE.match(text.strip())
    if match is None:
        raise InputError("", f'"{text.strip()}" is not a number of bars; expected text such as "3 #5"')
    count = int(match["count"])
    if count < 1:
        raise InputError("", f'"{text.strip()}" has no bars; the count must be at least 1')
    return count, parse_bar(match["bar"])


def practical_bars() -> tuple[Bar, ...]:
    """The bar sizes offered when Kernline chooses the bars: #4 to #8 (common practice)."""
    return tuple(BARS[size] for size in PRACTICAL_SIZES)


def practical_spacings() -> tuple[float, ...]:
    """Whole-inch spacings from 4 in to 18 in (m), offered when Kernline chooses the bars.

    18 in is the largest spacing ACI 318-19 7.7.2.3 allows for flexural bars of a one-way slab
    (the lesser of 3h and 18 in); 4 in is common practice (room to place and vibrate concrete).
    """
    count = round((PRACTICAL_SPACING_MAX - PRACTICAL_SPACING_MIN) / SPACING_STEP) + 1
    return tuple(PRACTICAL_SPACING_MIN + i * SPACING_STEP for i in range(count))


def _length_words(value: float, system: str) -> str:
    if system == "SI":
        return f"{value * 1000.0:.0f} mm"
    inches = value / INCH
    if math.isclose(inches, round(inches), abs_tol=1e-6):
        return f"{round(inches)} in"
    return f"{inches:.2f}".rstrip("0").rstrip(".") + " in"


def spaced_text(the_bar: Bar, spacing: float, system: str = "US") -> str:
    """Bars at a spacing as a drawing shows them: "#7 @ 10 in" (US) or "No. 22 @ 254 mm" (SI)."""
    name = the_bar.metric_name if system == "SI" else the_bar.name
    return f"{name} @ {_length_words(spacing, system)}"


def counted_text(count: int, the_bar: Bar, system: str = "US") -> str:
    """A number of bars as a drawing shows them: "3 #5" (US) or "3 No. 16" (SI)."""
    return f"{count} {the_bar.metric_name if system == 'SI' else the_bar.name}"


__all__ = [
    "BARS",
    "Bar",
    "bar",
    "counted_text",
    "parse_bar",
    "parse_counted",
    "parse_spaced",
    "practical_bars",
    "practical_spacings",
    "spaced_text",
]

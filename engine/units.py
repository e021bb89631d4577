"""Units at the engine's edges: the one pint registry, parsing of "number unit" text, formatting.

Inside the engine every quantity is a float in SI base units (N, m, Pa, N/m, N/m^3, N*m). Text typed
by a user or stored in a project file is parsed here once, checked for the dimension its field needs
and converted; results are formatted here for the project's display system ("US" or "SI").

The registry is pint's default one plus Kernline's own definitions (``resources/kernline_units.txt``:
psf, ksf, plf, klf, pcf, kcf). It is built lazily on the first parse that needs it, because building
it costs a noticeable part of a command-line run.
"""

from __future__ import annotations

import math
import re
from collections.abc import Callable
from dataclasses import dataclass
from enum import Enum
from functools import lru_cache
from typing import TYPE_CHECKING, Any

from .errors import InputError
from .resources import resource_path

if TYPE_CHECKING:  # pragma: no cover
    import pint


@dataclass(frozen=True, slots=True)
class _KindInfo:
    noun: str  # "a length"
    dimensionality: str  # pint dimensionality expression
    example: str  # shown in messages: "24 in"
    si_unit: str  # pint unit of the SI base value
    display_us: str  # pint unit for display in the US system
    display_si: str  # pint unit for display in the SI system
    label_us: str  # how the unit is printed
    label_si: str
    decimals_us: int
    decimals_si: int


class Kind(Enum):
    """The physical kind of a field: fixes its dimension, its SI unit and how it is displayed."""

    LENGTH = _KindInfo("a length", "[length]", "24 in", "m", "ft", "m", "ft", "m", 2, 3)
    FORCE = _KindInfo("a force", "[force]", "2 kip", "N", "kip", "kN", "kip", "kN", 2, 2)
    LINE_LOAD = _KindInfo("a force per length", "[force] / [length]", "300 plf", "N/m", "plf", "kN/m", "plf", "kN/m", 0, 2)
    PRESSURE = _KindInfo("a pressure", "[force] / [length] ** 2", "2000 psf", "Pa", "psf", "kPa", "psf", "kPa", 0, 1)
    UNIT_WEIGHT = _KindInfo(
        "a unit weight", "[force] / [length] ** 3", "150 pcf", "N/m**3", "pcf", "kN/m**3", "pcf", "kN/m³", 0, 2
    )
    PRESSURE_GRADIENT = _KindInfo(
        "a pressure per depth",
        "[force] / [length] ** 3",
        "150 pcf",
        "N/m**3",
        "pcf",
        "kN/m**3",
        "psf/ft",
        "kPa/m",
        0,
        2,
    )
    MOMENT = _KindInfo("a moment", "[force] * [length]", "10 kip*ft", "N*m", "kip*ft", "kN*m", "kip·ft", "kN·m", 2, 2)

    @property
    def info(self) -> _KindInfo:
        return self.value


SYSTEMS = ("US", "SI")

_registry: pint.UnitRegistry | None = None


def registry() -> pint.UnitRegistry:
    """Return the one unit registry, building it on first use (pint default units + ours)."""
    global _registry
    if _registry is None:
        import pint

        try:
            reg: pint.UnitRegistry = pint.UnitRegistry(cache_folder=":auto:")
        except Exception:  # pragma: no cover - a read-only home: build without the cache
            reg = pint.UnitRegistry()
        reg.load_definitions(str(resource_path("kernline_units.txt")))
        _registry = reg
    return _registry


_NUMBER = r"[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?"
_BARE_NUMBER = re.compile(rf"^\s*({_NUMBER})\s*$")
# 2'-6", 2' 6", 2', 6", 2'-6 1/2" is not supported (fractions are rare in a project file)
_UNSIGNED = r"(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?"
_SIGN = re.compile(r"^\s*([-+])\s*")
# after one leading sign: 2'-6", 2' 6", 2', 6" (the "-" between feet and inches is a separator)
_FEET_INCHES = re.compile(rf"""^(?:({_UNSIGNED})\s*')?\s*(?:-\s*)?(?:({_UNSIGNED})\s*")?\s*$""")
# after one leading sign: "2 ft 6 in", "1 m 250 mm": two or more unsigned number-word pairs, summed
_COMPOUND_PART = re.compile(rf"\s*({_UNSIGNED})\s*([A-Za-z]+)\s*")
# pint evaluates powers of numbers ("9**9**9 in" would run for minutes): refuse them, and big exponents
_RISKY_POWER = re.compile(r"(\d\s*\)?\s*(\*\*|\^))|((\*\*|\^)\s*[-+]?\s*\d{2,})")
# magnitudes beyond this (in SI) are typing errors, and would overflow products of forces and arms
MAX_MAGNITUDE = 1e12
_SIMPLE = re.compile(rf"^\s*({_NUMBER})\s*([A-Za-z_][A-Za-z_0-9*/^ .·]*?)\s*$")


def _expected(kind: Kind, text: str) -> InputError:
    return InputError("", f'expected {kind.info.noun} such as "{kind.info.example}", got "{text}"')


# Exact definitions (NIST SP 811, appendix B): 1 in = 0.0254 m, 1 lbf = 4.4482216152605 N.
_INCH = 0.0254
_FOOT = 12.0 * _INCH
_LBF = 4.4482216152605
_KIP = 1000.0 * _LBF

# The units a structural engineer types most, with their SI factors, so that a run that meets only
# these never pays for building the pint registry. tests/engine/unit/test_units.py checks every
# entry against pint. "lb" and "lbs" mean pound-force here, as they do on structural drawings.
_COMMON_UNITS: dict[str, dict[str, float]] = {
    "[length]": {
        "m": 1.0,
        "mm": 1e-3,
        "cm": 1e-2,
        "in": _INCH,
        "inch": _INCH,
        "inches": _INCH,
        "ft": _FOOT,
        "foot": _FOOT,
        "feet": _FOOT,
    },
    "[force]": {
        "N": 1.0,
        "kN": 1e3,
        "MN": 1e6,
        "lbf": _LBF,
        "lb": _LBF,
        "lbs": _LBF,
        "kip": _KIP,
        "kips": _KIP,
    },
    "[force] / [length]": {
        "N/m": 1.0,
        "kN/m": 1e3,
        "plf": _LBF / _FOOT,
        "klf": _KIP / _FOOT,
        "lbf/ft": _LBF / _FOOT,
        "lb/ft": _LBF / _FOOT,
        "kip/ft": _KIP / _FOOT,
    },
    "[force] / [length] ** 2": {
        "Pa": 1.0,
        "kPa": 1e3,
        "MPa": 1e6,
        "psf": _LBF / _FOOT**2,
        "ksf": _KIP / _FOOT**2,
        "psi": _LBF / _INCH**2,
        "ksi": _KIP / _INCH**2,
        "kN/m^2": 1e3,
        "kN/m**2": 1e3,
        "kN/m²": 1e3,
    },
    "[force] / [length] ** 3": {
        "N/m^3": 1.0,
        "N/m**3": 1.0,
        "kN/m^3": 1e3,
        "kN/m**3": 1e3,
        "kN/m³": 1e3,
        "pcf": _LBF / _FOOT**3,
        "kcf": _KIP / _FOOT**3,
        "psf/ft": _LBF / _FOOT**3,
        "kPa/m": 1e3,
        "lbf/ft^3": _LBF / _FOOT**3,
    },
    "[force] * [length]": {
        "N*m": 1.0,
        "kN*m": 1e3,
        "kN·m": 1e3,
        "kip*ft": _KIP * _FOOT,
        "kip·ft": _KIP * _FOOT,
        "lbf*ft": _LBF * _FOOT,
        "lb*ft": _LBF * _FOOT,
        "ft*kip": _KIP * _FOOT,
    },
}


@lru_cache(maxsize=256)
def _unit_factor(unit: str, dimensionality: str) -> float | None:
    """SI factor of ``unit`` when it has ``dimensionality``; None when it does not or is unknown."""
    common = _COMMON_UNITS.get(dimensionality, {}).get(unit.replace(" ", ""))
    if common is not None:
        return common
    if any(unit.replace(" ", "") in table for table in _COMMON_UNITS.values()):
        return None  # a known unit of another dimension: no need to build the registry to say so
    reg = registry()
    try:
        q = reg.Quantity(1.0, unit.replace("·", "*"))
    except Exception:
        return None
    if q.dimensionality != reg.get_dimensionality(dimensionality):
        return None
    return float(q.to_base_units().magnitude)


@lru_cache(maxsize=4096)
def parse_quantity(text: str, kind: Kind, default_unit: str | None = None) -> float:
    """Parse text such as "24 in", "600 mm", "2 ft 6 in" or 2'-6" into an SI float.

    Args:
        text: what the user typed or the file holds.
        kind: the physical kind the field needs; text of another dimension is refused.
        default_unit: unit for a bare number ("24"); when None a bare number is refused.

    Returns:
        The value in SI base units (m, N, N/m, Pa, N/m^3, N*m).

    Raises:
        InputError: with an empty field path (the caller's scope adds it) and a message naming what
            was expected.
    """
    if not isinstance(text, str):
        raise _expected(kind, str(text))
    dim = kind.info.dimensionality
    value: float | None = None
    bare = _BARE_NUMBER.match(text)
    if bare:
        if default_unit is None:
            raise _expected(kind, text)
        factor = _unit_factor(default_unit, dim)
        if factor is None:
            raise _expected(kind, text)
        value = float(bare.group(1)) * factor
    elif kind is Kind.LENGTH and ("'" in text or '"' in text):
        value = _signed(text, kind, _feet_inches)
    else:
        simple = _SIMPLE.match(text)
        if simple:
            factor = _unit_factor(simple.group(2).strip(), dim)
            if factor is not None:
                value = float(simple.group(1)) * factor
        if value is None and kind is Kind.LENGTH and len(_COMPOUND_PART.findall(text)) >= 2:
            value = _signed(text, kind, _compound_length)
        if value is None:
            value = _parse_with_pint(text, kind)
    if not math.isfinite(value):
        raise InputError("", f'expected a finite number, got "{text}"')
    if abs(value) > MAX_MAGNITUDE:
        raise InputError("", f'"{text}" is far too large; check the number and its unit')
    return value


def _signed(text: str, kind: Kind, parse: Callable[[str, Kind], float | None]) -> float:
    """Apply one leading sign to a compound form; a sign inside it is refused."""
    sign = 1.0
    m = _SIGN.match(text)
    body = text
    if m:
        sign = -1.0 if m.group(1) == "-" else 1.0
        body = text[m.end() :]
    value = parse(body, kind)
    if value is None:
        raise _expected(kind, text)
    return sign * value


def _feet_inches(body: str, kind: Kind) -> float | None:
    """2'-6", 2' 6", 2', 6" (unsigned): feet and inches, 1 in = 0.0254 m exactly (NIST SP 811)."""
    m = _FEET_INCHES.match(body)
    if not m or (m.group(1) is None and m.group(2) is None):
        return None
    return (float(m.group(1) or 0.0) * 12.0 + float(m.group(2) or 0.0)) * 0.0254


def _compound_length(body: str, kind: Kind) -> float | None:
    """ "2 ft 6 in", "1 m 250 mm" (unsigned parts): the sum of the parts."""
    parts = _COMPOUND_PART.findall(body)
    if len(parts) < 2 or "".join(f"{n}{u}" for n, u in parts) != re.sub(r"\s+", "", body):
        return None
    total = 0.0
    for number, unit in parts:
        factor = _unit_factor(unit, kind.info.dimensionality)
        if factor is None:
            return None
        total += float(number) * factor
    return total


def _parse_with_pint(text: str, kind: Kind) -> float:
    """General pint parse for anything the fast paths above do not cover ("3 kN/m", "1.5 kip/ft")."""
    if _RISKY_POWER.search(text) or len(text) > 80:
        raise _expected(kind, text)
    reg = registry()
    try:
        q: Any = reg.parse_expression(text.replace("·", "*"))
    except Exception:
        raise _expected(kind, text) from None
    if not hasattr(q, "dimensionality"):
        raise _expected(kind, text)
    if q.dimensionality != reg.get_dimensionality(kind.info.dimensionality):
        raise _expected(kind, text)
    try:
        return float(q.to_base_units().magnitude)
    except Exception:
        raise _expected(kind, text) from None


@lru_cache(maxsize=64)
def display_factor(kind: Kind, system: str) -> float:
    """SI value per display unit of ``kind`` in ``system`` (e.g. 47.88 Pa per psf)."""
    unit = kind.info.display_us if system == "US" else kind.info.display_si
    factor = _unit_factor(unit, kind.info.dimensionality)
    assert factor is not None, unit
    return factor


def to_display(value_si: float, kind: Kind, system: str) -> float:
    """Convert an SI value to the display unit of ``kind`` in ``system``."""
    return value_si / display_factor(kind, system)


def unit_label(kind: Kind, system: str) -> str:
    """The printed name of the display unit of ``kind`` in ``system``."""
    return kind.info.label_us if system == "US" else kind.info.label_si


def format_quantity(value_si: float | None, kind: Kind, system: str, decimals: int | None = None) -> str:
    """Format an SI value in the display unit of ``system`` with the trade's usual precision.

    Kips and kN to two decimals, psf to whole numbers, kPa to one decimal (common practice).
    ``None`` (no demand) prints as an em dash; infinities as "∞".
    """
    if value_si is None:
        return "—"
    if math.isinf(value_si):
        return "∞"
    if decimals is None:
        decimals = kind.info.decimals_us if system == "US" else kind.info.decimals_si
    shown = to_display(value_si, kind, system)
    return f"{shown:,.{decimals}f} {unit_label(kind, system)}"


def format_length(value_si: float | None, system: str) -> str:
    """Format a length: feet and inches to the nearest 1/4 in for US (2'-6 1/4"), metres for SI."""
    if value_si is None:
        return "—"
    if system != "US":
        return f"{value_si:,.3f} m"
    sign = "-" if value_si < 0 else ""
    quarters = round(abs(value_si) / 0.0254 * 4.0)
    feet, quarters_left = divmod(quarters, 48)
    inches, quarter = divmod(quarters_left, 4)
    frac = {0: "", 1: " 1/4", 2: " 1/2", 3: " 3/4"}[quarter]
    if feet == 0:
        return f'{sign}{inches}{frac}"'
    return f"{sign}{feet}'-{inches}{frac}\""


def length_text(value_si: float, system: str) -> str:
    """Short text for a footing dimension that parses back to ``value_si`` (within 1e-9 m).

    Whole or decimal inches (US) or millimetres (SI); when the value is on the other system's grid
    (a US project sized in millimetre steps) that unit is used; otherwise as many decimals as needed.
    """
    units_in_order = (("in", 0.0254), ("mm", 0.001)) if system == "US" else (("mm", 0.001), ("in", 0.0254))
    for name, size in units_in_order:
        for decimals in range(4):
            text = f"{_trim(value_si / size, decimals)} {name}"
            if abs(float(text.split()[0]) * size - value_si) <= 1e-9:
                return text
    name, size = units_in_order[0]
    return f"{value_si / size:.12g} {name}"


def _trim(value: float, decimals: int) -> str:
    text = f"{value:.{decimals}f}".rstrip("0").rstrip(".") if decimals else f"{value:.0f}"
    return text if text not in ("-0", "") else "0"

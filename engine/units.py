"""Units at the engine's edges: the one pint registry, parsing of "number unit" text, formatting.

Inside the engine every quantity is a float in SI base units (N, m, Pa, N/m, N/m^3, N*m). Text typed
by a user or stored in a project file is parsed here once, checked for the dimension its field needs
and converted; results are formatted here for the project's display system ("US" or "SI").

The registry is pint's default one plus Kernline's own definitions (``resources/kernline_units.txt``:
psf, ksf, plf, klf, pcf, kcf). It is built lazily on the first parse that needs it, because building
it costs a noticeable part of a command-line run.
"""

from __future__ import annotations

import hashlib
import json
import math
import os
import re
import tempfile
import unicodedata
from dataclasses import dataclass
from enum import Enum
from functools import lru_cache
from pathlib import Path
from typing import TYPE_CHECKING

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


# Limits of physical sense per kind, in SI: a value beyond one is a typing or unit slip (a length in
# millimetres typed as metres, a force in N typed as kN), never a footing (common practice).
LIMITS: dict[Kind, tuple[float, str]] = {
    Kind.LENGTH: (1000.0, "1 km"),
    Kind.FORCE: (1e10, "1e10 N"),
    Kind.LINE_LOAD: (1e10, "1e10 N/m"),
    Kind.PRESSURE: (1e10, "1e10 Pa"),
    Kind.UNIT_WEIGHT: (1e7, "1e7 N/m³"),
    Kind.PRESSURE_GRADIENT: (1e7, "1e7 N/m³"),
    Kind.MOMENT: (1e13, "1e13 N·m"),
}
MAX_TEXT = 100  # characters in one quantity: longer text is a paste gone wrong

# ---- the quantity grammar ---------------------------------------------------------------------
#
#   quantity  := [sign] term (term)*          terms of one kind, summed: "2 ft 6 1/2 in"
#   term      := magnitude unit | magnitude mark ["-"]       2'-6 1/2"   30 1/2 in   1.5e3 lbf
#   magnitude := decimal | integer "/" integer | integer integer "/" integer
#   unit      := word [power] ((" / " | " * " | "·") word [power])*    kN/m^3, kip*ft, kN/m³
#   mark      := ' (feet) | " (inches), also the primes ′ ″
#
# A bare magnitude is a number in the field's own unit where the caller gives one (a window field),
# and is refused elsewhere. Only the unit words reach pint (:func:`unit_factor`), never user text as
# an expression, so nothing typed is evaluated.

_DECIMAL = re.compile(r"(?:[0-9]+(?:\.[0-9]*)?|\.[0-9]+)(?:[eE][-+]?[0-9]+)?")
_WORD = r"[A-Za-z_µμ]+(?:\^[0-9]|\*\*[0-9]|[²³])?"
_UNIT = re.compile(rf"{_WORD}(?:\s*[/*·]\s*{_WORD})*")
_SIGNS = {"+": 1.0, "-": -1.0, "−": -1.0}
_MARKS = {"'": "ft", "′": "ft", '"': "in", "″": "in"}
# Spellings of pound-force: pint's "lb" is the pound mass; on structural drawings "lb" means lbf.
_POUND_SPELLINGS = {"lb": "lbf", "lbs": "lbf"}
# Prefixes (k, M, m ...) belong on SI units only: "kin" or "mft" is a typo, not a kilo-inch.
_PREFIXABLE = frozenset({"meter", "newton", "pascal", "gram", "second"})


class _Refused(Exception):
    """Text outside the grammar; the message says what is wrong with it."""


@dataclass(frozen=True, slots=True)
class _Term:
    magnitude: float
    unit: str  # a unit expression of words, or "ft"/"in" for the marks


def _tokens_of(text: str) -> tuple[float, list[_Term]]:
    """Split ``text`` into a sign and its terms, or raise :class:`_Refused` saying why."""
    for ch in text:
        if unicodedata.category(ch) == "Nd" and not "0" <= ch <= "9":
            raise _Refused("uses a digit other than 0-9; type the number with the digits 0-9")
        if unicodedata.category(ch) in ("Cc", "Cf") and ch not in "\t":
            raise _Refused("contains a control character")
    pos, n = 0, len(text)

    def skip() -> None:
        nonlocal pos
        while pos < n and text[pos].isspace():
            pos += 1

    skip()
    sign = 1.0
    if pos < n and text[pos] in _SIGNS:
        sign = _SIGNS[text[pos]]
        pos += 1
        skip()
        if pos < n and text[pos] in _SIGNS:
            raise _Refused("has more than one sign; give one sign before the number")
    terms: list[_Term] = []
    while True:
        skip()
        if pos >= n:
            break
        # the magnitude
        m = _DECIMAL.match(text, pos)
        if not m:
            if text[pos] in _SIGNS:
                raise _Refused("has a sign inside it; one sign goes before the whole value")
            u = _UNIT.match(text, pos)
            if u and u.group(0).lower() in ("nan", "inf", "infinity"):
                raise _Refused("is not a finite number")
            if u:
                if not terms and u.end() == len(text.rstrip()):
                    raise _Refused("is a unit with no number")
                raise _Refused("has a unit with no number before it" if terms else "starts with a unit; put the number first")
            raise _Refused(f'has an unexpected "{text[pos]}"')
        number_text = m.group(0)
        pos = m.end()
        if pos < n and (text[pos] == "." or "0" <= text[pos] <= "9"):
            raise _Refused(f'has a malformed number "{number_text}{text[pos]}"')
        magnitude = float(number_text)
        simple = _fraction_at(text, pos)
        if simple is not None:  # "1/2": the number just read is the numerator
            denominator, pos = simple
            if not number_text.isdigit():
                raise _Refused(f'has a fraction with a numerator that is not a whole number, "{number_text}/"')
            if denominator == 0:
                raise _Refused("divides by zero")
            magnitude = int(number_text) / denominator
        else:
            second = _DECIMAL.match(text, _skip_spaces(text, pos))
            if second is not None and _skip_spaces(text, pos) > pos:
                mixed = _fraction_at(text, second.end())
                if mixed is None:
                    raise _Refused("has two numbers in a row; give each number its unit")
                # a mixed number "6 1/2": a whole number, then a proper fraction
                denominator, end_of_fraction = mixed
                if not number_text.isdigit() or not second.group(0).isdigit():
                    raise _Refused("has a mixed number whose parts are not whole numbers")
                if denominator == 0:
                    raise _Refused("divides by zero")
                numerator = int(second.group(0))
                if numerator >= denominator:
                    raise _Refused(f'has a mixed number with an improper fraction "{numerator}/{denominator}"')
                magnitude = int(number_text) + numerator / denominator
                pos = end_of_fraction
        skip()
        # the unit
        if pos >= n:
            if terms:
                raise _Refused("ends with a number that has no unit")
            return sign, [_Term(magnitude, "")]
        if text[pos] in _MARKS:
            unit = _MARKS[text[pos]]
            pos += 1
            skip()
            if unit == "ft" and pos < n and text[pos] in "-−" and _DECIMAL.match(text, _skip_spaces(text, pos + 1)):
                pos += 1  # 2'-6": the hyphen separates feet from inches
        else:
            u = _UNIT.match(text, pos)
            if not u:
                if text[pos] in _SIGNS:
                    raise _Refused("has a sign inside it; one sign goes before the whole value")
                raise _Refused(f'has an unexpected "{text[pos]}" where a unit should be')
            unit = re.sub(r"\s+", "", u.group(0))
            pos = u.end()
            if pos < n and not text[pos].isspace() and text[pos] not in _MARKS:
                raise _Refused(f'has an unexpected "{text[pos]}" after the unit "{unit}"')
        if any(t.unit == unit for t in terms):
            raise _Refused(f'gives the unit "{unit}" twice')
        terms.append(_Term(magnitude, unit))
        skip()
        if pos < n and _UNIT.match(text, pos) and not _DECIMAL.match(text, pos):
            raise _Refused("has a unit right after a unit; write a product as kip*ft and give each number one unit")
    if not terms:
        raise _Refused("is empty")
    return sign, terms


def _fraction_at(text: str, pos: int) -> tuple[int, int] | None:
    """At ``pos``, "/ 2" (spaces allowed): the denominator and the position after it, else None."""
    pos = _skip_spaces(text, pos)
    if pos >= len(text) or text[pos] != "/":
        return None
    m = re.compile(r"[0-9]+").match(text, _skip_spaces(text, pos + 1))
    if m is None:
        raise _Refused('has a "/" that is neither a fraction nor part of a unit')
    end = m.end()
    if end < len(text) and (text[end] == "." or "0" <= text[end] <= "9"):
        raise _Refused("has a fraction whose denominator is not a whole number")
    return int(m.group(0)), end


def _skip_spaces(text: str, pos: int) -> int:
    while pos < len(text) and text[pos].isspace():
        pos += 1
    return pos


def _show_text(text: str) -> str:
    """The user's text, quoted, shortened and with control characters escaped, for a message."""
    shown = "".join(ch if unicodedata.category(ch) not in ("Cc", "Cf") else f"\\x{ord(ch):02x}" for ch in text)
    return f'"{shown}"' if len(shown) <= 40 else f'"{shown[:37]}..."'


class _PintAnswers:
    """pint's answers to :func:`unit_factor`, remembered on disk between runs.

    Importing pint and building the registry costs about 0.15 s, most of a ``kernline check``. The
    answers pint gave (a unit's SI factor, or None for a unit it does not know in that dimension) are
    kept in the user's cache folder, in a file whose name hashes pint's version and Kernline's unit
    definitions, so that an upgrade of either starts afresh. Nothing here converts a unit: every
    value in the file came from pint. ``KERNLINE_UNIT_CACHE=0`` turns it off.
    """

    FORMAT = 1

    def __init__(self) -> None:
        self.path: Path | None = None
        self.answers: dict[str, float | None] | None = None

    def _open(self) -> dict[str, float | None]:
        if self.answers is not None:
            return self.answers
        self.answers = {}
        if os.environ.get("KERNLINE_UNIT_CACHE", "1") == "0":
            return self.answers
        try:
            from . import _installed_version  # pint's version, without importing pint or importlib.metadata

            pint_version = _installed_version("pint")
            if pint_version is None:
                raise LookupError("pint is not installed")
            stamp = f"{self.FORMAT}|{pint_version}|".encode() + resource_path("kernline_units.txt").read_bytes()
            name = f"unit-factors-{hashlib.sha256(stamp).hexdigest()[:16]}.json"
            base = (
                os.environ.get("XDG_CACHE_HOME")
                or os.environ.get("LOCALAPPDATA")
                or os.path.join(os.path.expanduser("~"), ".cache")
            )
            self.path = Path(base) / "kernline" / name
            if self.path.is_file():
                loaded = json.loads(self.path.read_text(encoding="utf-8"))
                if isinstance(loaded, dict):
                    self.answers = {
                        str(k): (float(v) if isinstance(v, (int, float)) and not isinstance(v, bool) else None)
                        for k, v in loaded.items()
                    }
        except Exception:  # an unreadable cache is no cache
            self.answers = {}
        return self.answers

    def get(self, key: str) -> tuple[bool, float | None]:
        answers = self._open()
        return (key in answers, answers.get(key))

    def put(self, key: str, value: float | None) -> None:
        answers = self._open()
        answers[key] = value
        if self.path is None:
            return
        try:  # written whole, then renamed: a reader sees the old file or the new one
            self.path.parent.mkdir(parents=True, exist_ok=True)
            fd, tmp = tempfile.mkstemp(prefix=".unit-factors-", suffix=".tmp", dir=self.path.parent)
            with os.fdopen(fd, "w", encoding="utf-8") as fh:
                json.dump(answers, fh)
            os.replace(tmp, self.path)
        except Exception:  # pragma: no cover - a read-only cache folder: keep the answers in memory
            pass


_pint_answers = _PintAnswers()


@lru_cache(maxsize=512)
def unit_factor(unit: str, dimensionality: str) -> float | None:
    """SI value of one ``unit`` when it has ``dimensionality``; None when it is unknown or of another kind.

    pint (the one registry, with Kernline's psf, plf, pcf ... definitions) does every conversion;
    its answers are remembered between runs (:class:`_PintAnswers`). ``unit`` is a unit expression of
    the grammar above (words, "/", "*", "·", small powers), never a number or an arbitrary expression.
    """
    if not _UNIT.fullmatch(unit):
        return None
    key = f"{unit}|{dimensionality}"
    known, value = _pint_answers.get(key)
    if known:
        return value
    value = _ask_pint(unit, dimensionality)
    _pint_answers.put(key, value)
    return value


def _ask_pint(unit: str, dimensionality: str) -> float | None:
    """pint's SI factor of ``unit`` in ``dimensionality`` (None when unknown, prefixed wrongly or of another kind)."""
    words = re.findall(r"[A-Za-z_µμ]+", unit)
    expr = unit.replace("·", "*").replace("^", "**").replace("²", "**2").replace("³", "**3")
    for word in words:
        if word in _POUND_SPELLINGS:
            expr = re.sub(rf"(?<![A-Za-z_]){word}(?![A-Za-z_])", _POUND_SPELLINGS[word], expr)
    reg = registry()
    try:
        for word in words:
            spelled = _POUND_SPELLINGS.get(word, word)
            parses = reg.parse_unit_name(spelled)
            if not parses:
                return None
            prefix, name, _suffix = parses[0]
            if prefix and name not in _PREFIXABLE:
                return None
        units = reg.parse_units(expr)
        q = reg.Quantity(1.0, units)
    except Exception:
        return None
    if q.dimensionality != reg.get_dimensionality(dimensionality):
        return None
    return float(q.to_base_units().magnitude)


@lru_cache(maxsize=4096)
def parse_quantity(text: str, kind: Kind, default_unit: str | None = None) -> float:
    """Parse text such as "24 in", "2 ft 6 1/2 in", 2'-6", "3 1/2 kip" or "1.5e3 lbf" into an SI float.

    The grammar is in this module's comments and the README. Unit names and conversions are pint's
    (the one registry); exact inch-pound factors per NIST SP 811 appendix B come through pint.

    Args:
        text: what the user typed or the file holds.
        kind: the physical kind the field needs; text of another dimension is refused.
        default_unit: the unit of a bare number ("24"), i.e. the unit shown beside a window field;
            when None a bare number is refused (the project file always states units).

    Returns:
        The value in SI base units (m, N, N/m, Pa, N/m^3, N*m).

    Raises:
        InputError: with an empty field path (the caller's scope adds it) and a one-line message
            saying what is wrong and what was expected.
    """
    info = kind.info
    if not isinstance(text, str):
        raise _expected(kind, str(text))
    if len(text) > MAX_TEXT:
        raise InputError("", f"{_show_text(text)} is too long for one value ({len(text)} characters; at most {MAX_TEXT})")
    try:
        sign, terms = _tokens_of(text)
    except _Refused as why:
        raise InputError("", f'{_show_text(text)} {why}; expected {info.noun} such as "{info.example}"') from None
    total = 0.0
    for term in terms:
        unit = term.unit or default_unit
        if unit is None:
            raise InputError("", f'{_show_text(text)} has no unit; expected {info.noun} such as "{info.example}"')
        factor = unit_factor(unit, info.dimensionality)
        if factor is None:
            known = unit_factor(unit, unit_dimensionality(unit) or "") if unit_dimensionality(unit) else None
            what = f'"{unit}" is not {info.noun}' if known is not None else f'"{unit}" is not a unit Kernline knows'
            raise InputError("", f'{_show_text(text)}: {what}; expected {info.noun} such as "{info.example}"')
        if not math.isfinite(term.magnitude):
            raise InputError("", f"{_show_text(text)} is not a finite number")
        total += term.magnitude * factor
    value = sign * total
    if not math.isfinite(value):
        raise InputError("", f"{_show_text(text)} is not a finite number")
    limit, limit_text = LIMITS[kind]
    if abs(value) > limit:
        raise InputError(
            "", f"{_show_text(text)} is beyond {limit_text}, the limit for {info.noun}; check the number and its unit"
        )
    return value


@lru_cache(maxsize=256)
def unit_dimensionality(unit: str) -> str | None:
    """The pint dimensionality of a known unit expression (for messages), or None."""
    if not _UNIT.fullmatch(unit):
        return None
    try:
        reg = registry()
        expr = unit.replace("·", "*").replace("^", "**").replace("²", "**2").replace("³", "**3")
        for word, spelled in _POUND_SPELLINGS.items():
            expr = re.sub(rf"(?<![A-Za-z_]){word}(?![A-Za-z_])", spelled, expr)
        return str(reg.Quantity(1.0, reg.parse_units(expr)).dimensionality)
    except Exception:
        return None


def stored_text(text: str, kind: Kind, default_unit: str) -> str:
    """The text to store for what was typed into a field whose unit is ``default_unit``.

    The text is checked with :func:`parse_quantity` (InputError if refused). A bare number ("18",
    "6 1/2") gets the field's unit written after it, so the file states its units and reads back to
    the same value; anything else is stored as typed (less outer spaces).
    """
    parse_quantity(text, kind, default_unit)
    _sign, terms = _tokens_of(text)
    if len(terms) == 1 and not terms[0].unit:
        return f"{text.strip()} {default_unit}"
    return text.strip()


def _expected(kind: Kind, text: str) -> InputError:
    return InputError("", f'expected {kind.info.noun} such as "{kind.info.example}", got {_show_text(text)}')


@lru_cache(maxsize=64)
def display_factor(kind: Kind, system: str) -> float:
    """SI value per display unit of ``kind`` in ``system`` (e.g. 47.88 Pa per psf)."""
    unit = kind.info.display_us if system == "US" else kind.info.display_si
    factor = unit_factor(unit, kind.info.dimensionality)
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

"""The calculation package as plain data: sections of headings, text, tables, equations and drawings.

:func:`build_package` reads the engine's results (:mod:`engine.results`, :mod:`engine.sizing`,
:mod:`engine.loads`, :mod:`engine.soil_pressure`) and lays them out the way a careful hand calc reads:
inputs, sketches, each governing check's equation written out with the numbers put in, the result in
words. Every result printed is an engine value formatted for display; the substituted expressions
only repeat inputs and engine values, so a reviewer can redo the arithmetic. This module imports no
PDF library: :mod:`engine.report` renders what it builds.

Text is plain (never markup). Program-written formulas may mark subscripts as ``M_{OT}``
(:func:`formula`); user text is kept in :class:`Run` objects and is never interpreted.
"""

from __future__ import annotations

import datetime as _dt
import math
import re
from collections.abc import Sequence
from dataclasses import dataclass, field, replace
from typing import Any

from .. import CAUTION, __version__
from ..checks.embedment import MIN_DEPTH
from ..combinations import combinations_of
from ..errors import InputError
from ..loads import VerticalResultant, lateral_resultants, vertical_resultants
from ..model import (
    BearingBasis,
    Check,
    LateralLoad,
    LineLoad,
    LoadCombination,
    Method,
    PointLoad,
    Project,
    SlidingBasis,
    Wall,
)
from ..results import CaseResult, Governing, WallResult, check_wall
from ..sizing import SizingResult, size_footing
from ..stability import reported_checks, table_checks
from ..units import Kind, format_length, format_quantity, to_display, unit_label

PROGRAM = "Kernline"

# Drawing area available on a sheet (points, 1/72 in): the renderer's frame is at least this big.
CONTENT_WIDTH = 522.0

# ---------------------------------------------------------------------------------------------
# Text
# ---------------------------------------------------------------------------------------------


@dataclass(frozen=True, slots=True)
class Run:
    """A piece of text printed literally, optionally as a subscript or in bold."""

    text: str
    sub: bool = False
    bold: bool = False


Rich = tuple[Run, ...]

_SUBSCRIPT = re.compile(r"_\{([^}]*)\}")


def formula(text: str, bold: bool = False) -> Rich:
    """Program-written text with ``_{...}`` subscripts (never call this on user text)."""
    runs: list[Run] = []
    pos = 0
    for m in _SUBSCRIPT.finditer(text):
        if m.start() > pos:
            runs.append(Run(text[pos : m.start()], bold=bold))
        runs.append(Run(m.group(1), sub=True, bold=bold))
        pos = m.end()
    if pos < len(text):
        runs.append(Run(text[pos:], bold=bold))
    return tuple(runs)


def plain(text: str, bold: bool = False) -> Rich:
    """User or program text printed exactly as given."""
    return (Run(text, bold=bold),)


Cell = Rich | str

# ---------------------------------------------------------------------------------------------
# Blocks
# ---------------------------------------------------------------------------------------------


@dataclass(frozen=True, slots=True)
class Heading:
    """A heading; ``bookmark`` puts it in the PDF outline under its section."""

    text: Cell
    level: int = 1
    bookmark: str = ""


@dataclass(frozen=True, slots=True)
class Para:
    """A paragraph; ``style`` is "body", "small", "note", "caution", "pass" or "fail"."""

    text: Cell
    style: str = "body"


@dataclass(frozen=True, slots=True)
class Bullets:
    items: tuple[Cell, ...]
    style: str = "body"


@dataclass(frozen=True, slots=True)
class Table:
    """A table. ``widths`` are fractions of the frame width; ``fail_rows`` are printed in bold.

    ``align`` gives "L", "R" or "C" per column.
    """

    headers: tuple[Cell, ...]
    rows: tuple[tuple[Cell, ...], ...]
    widths: tuple[float, ...]
    align: str = ""
    font_size: float = 8.0
    fail_rows: tuple[int, ...] = ()
    repeat_header: bool = True
    links: tuple[str, ...] = ()  # per row: the section key its first cell links to ("" for none)


@dataclass(frozen=True, slots=True)
class KeyValues:
    """Pairs of label and value, laid out in ``columns`` label/value column pairs."""

    pairs: tuple[tuple[Cell, Cell], ...]
    columns: int = 2


@dataclass(frozen=True, slots=True)
class Equation:
    """``symbol = formula = numbers = result`` (formula and numbers may be absent).

    ``clause`` is the standard's clause the step follows, printed in the margin column; ``column`` is the
    result as the right-hand results column carries it (a comparison on the line, its value there).
    """

    symbol: Rich
    formula: Rich | None
    numbers: Cell | None
    result: Cell
    note: Cell = ""
    clause: str = ""
    column: Cell | None = None  # what the results column shows, when shorter than ``result`` (default: ``result``)


@dataclass(frozen=True, slots=True)
class Verdict:
    """A result in words, printed prominently (``passes`` picks the wording's emphasis)."""

    passes: bool
    text: Cell


# Drawing primitives, in points with y up; (0, 0) at the drawing's lower-left corner.


@dataclass(frozen=True, slots=True)
class Line:
    x1: float
    y1: float
    x2: float
    y2: float
    width: float = 0.6
    dash: bool = False
    color: str = "ink"


@dataclass(frozen=True, slots=True)
class Rect:
    x: float
    y: float
    w: float
    h: float
    fill: str = "none"
    width: float = 0.8


@dataclass(frozen=True, slots=True)
class Polygon:
    points: tuple[tuple[float, float], ...]
    fill: str = "none"
    width: float = 0.8


@dataclass(frozen=True, slots=True)
class Arrow:
    """From tail (x1, y1) to head (x2, y2)."""

    x1: float
    y1: float
    x2: float
    y2: float
    width: float = 0.8
    color: str = "load"


@dataclass(frozen=True, slots=True)
class Label:
    """Text at (x, y): ``anchor`` "start", "middle" or "end"; ``angle`` in degrees."""

    x: float
    y: float
    text: str
    anchor: str = "start"
    size: float = 6.5
    bold: bool = False
    angle: float = 0.0
    color: str = "ink"
    markup: bool = False  # program text whose ``_{...}`` parts print as subscripts (see :func:`formula`)


@dataclass(frozen=True, slots=True)
class Dimension:
    """A horizontal (y1 == y2) or vertical (x1 == x2) dimension line offset from the measured points."""

    x1: float
    y1: float
    x2: float
    y2: float
    text: str
    offset: float = 12.0
    outside: str = "end"  # where the text goes when it does not fit between the ends: "start" or "end"
    markup: bool = False  # program text whose ``_{...}`` parts print as subscripts (see :func:`formula`)


Shape = Line | Rect | Polygon | Arrow | Label | Dimension


@dataclass(frozen=True, slots=True)
class Drawing:
    width: float
    height: float
    shapes: tuple[Shape, ...]
    caption: str = ""


@dataclass(frozen=True, slots=True)
class DrawingRow:
    """Drawings side by side."""

    drawings: tuple[Drawing, ...]


@dataclass(frozen=True, slots=True)
class Group:
    """Blocks kept on one sheet when they fit."""

    blocks: tuple[Block, ...]


@dataclass(frozen=True, slots=True)
class ContentsEntry:
    """A line of the contents: a title and where it is, as (words, section key) pairs such as
    ("sheet", "wall:N1"); the renderer writes the sheet numbers."""

    title: str
    refs: tuple[tuple[str, str], ...]


@dataclass(frozen=True, slots=True)
class Contents:
    """The list of sections with their sheet numbers (the renderer fills in the numbers)."""

    entries: tuple[ContentsEntry, ...] = ()


Block = Heading | Para | Bullets | Table | KeyValues | Equation | Verdict | Drawing | DrawingRow | Group | Contents


@dataclass(frozen=True, slots=True)
class Section:
    """A part of the package that starts on a new sheet; ``subject`` goes in the title strip.

    ``parent`` groups sections in the PDF outline ("Front matter", "Wall N1"); the section's
    ``title`` is its entry there.
    """

    key: str
    title: str
    subject: str
    blocks: tuple[Block, ...]
    parent: str = ""
    new_sheet: bool = True  # False: runs on from the previous section (a wall's checks after its inputs)


@dataclass(frozen=True, slots=True)
class TitleBlock:
    project_name: str
    project_number: str
    client: str
    address: str
    prepared_by: str
    date: str
    checked_by: str
    revision: str
    program: str
    caution: str
    printed: str = ""  # the date of this print (the footer); ``date`` is the revision's date


@dataclass(frozen=True, slots=True)
class Package:
    title: TitleBlock
    units: str
    sections: tuple[Section, ...]
    wall_ids: tuple[str, ...] = field(default_factory=tuple)
    seal_every_sheet: bool = False  # a small seal box in every sheet's title strip (the cover has the full square)


# ---------------------------------------------------------------------------------------------
# Formatting (display only: every number comes from the engine or the inputs)
# ---------------------------------------------------------------------------------------------


class _Fmt:
    def __init__(self, units: str) -> None:
        self.units = units

    def length(self, value: float) -> str:
        return minus(format_length(value, self.units))

    def force(self, value: float | Any) -> str:
        return minus(format_quantity(float(value), Kind.FORCE, self.units))

    def moment(self, value: float) -> str:
        return minus(format_quantity(value, Kind.MOMENT, self.units))

    def pressure(self, value: float) -> str:
        return minus(format_quantity(value, Kind.PRESSURE, self.units))

    def line_load(self, value: float) -> str:
        return minus(format_quantity(value, Kind.LINE_LOAD, self.units))

    def unit_weight(self, value: float) -> str:
        return format_quantity(value, Kind.UNIT_WEIGHT, self.units)

    def gradient(self, value: float) -> str:
        return format_quantity(value, Kind.PRESSURE_GRADIENT, self.units)

    def number(self, value: float, kind: Kind) -> str:
        """The display number of ``kind`` without its unit (for tables whose header names the unit)."""
        if value is None or math.isnan(value):
            return "—"
        if math.isinf(value):
            return "∞"
        if kind is Kind.LENGTH:  # a table length: decimal feet (US) or metres to three places
            return self.decimal(value).rsplit(" ", 1)[0]
        info = kind.info
        decimals = info.decimals_us if self.units == "US" else info.decimals_si
        return minus(f"{to_display(value, kind, self.units):,.{decimals}f}")

    def unit(self, kind: Kind) -> str:
        return unit_label(kind, self.units)

    def decimal(self, value: float, places: int = 3) -> str:
        """A length in decimal feet (US) or metres (SI) to ``places`` decimals, for substitution.

        Substituted lengths that are computed (e, a) print this way, so that the printed line
        reproduces its printed result; a true minus sign marks a negative value.
        """
        unit = "ft" if self.units == "US" else "m"
        shown = value / _FOOT if self.units == "US" else value
        return minus(f"{shown:,.{places}f} {unit}")

    def exact(self, value: float) -> str:
        """An input length in decimal feet (m in SI): three decimals, or four where three are not exact."""
        shown = value / _FOOT if self.units == "US" else value
        places = 3 if abs(shown - round(shown, 3)) < 1e-7 else 4
        return self.decimal(value, places)

    def signed_length(self, value: float) -> str:
        """A signed computed length: decimal with a true minus, then feet-inches (US) and the side it is toward."""
        side = "toward x = L_{f}" if value > 0 else ("toward x = 0" if value < 0 else "at mid-length")
        extra = f"{format_length(abs(value), self.units)} " if self.units == "US" else ""
        return f"{self.decimal(value)} ({extra}{side})"

    def carried(self, value: float | Any, kind: Kind, extra: int = 1) -> str:
        """A force or moment as carried through the equations: the display precision when that is exact,
        else ``extra`` more decimals (so a line recomputed from printed values lands on its printed result)."""
        value = float(value)
        info = kind.info
        decimals = info.decimals_us if self.units == "US" else info.decimals_si
        shown = to_display(value, kind, self.units)
        if abs(shown - round(shown, decimals)) > 1e-7:
            decimals += extra
        return minus(format_quantity(value, kind, self.units, decimals))

    def sub(self, value: float | Any, kind: Kind) -> str:
        """:meth:`carried` for substitution into an expression: a negative value in parentheses."""
        return paren(self.carried(value, kind))

    def arm_sub(self, value: float | Any) -> str:
        """A force substituted beside a long arm (f H (h + t_f)): in SI, where converted inch-pound loads are
        not round, one decimal more than :meth:`sub`, so the moment reproduces to its last printed digit."""
        return paren(self.carried(value, Kind.FORCE, 1 if self.units == "US" else 2))

    def term(self, value: float) -> str:
        """A length substituted into an expression: feet and inches (US, exact for whole inches) or metres to
        three places, four where three are not exact (SI), so that the line reproduces its printed result."""
        return self.length(value) if self.units == "US" else paren(self.exact(value))

    def weight_term(self, value: float, kind: Kind = Kind.UNIT_WEIGHT) -> str:
        """A unit weight or pressure gradient substituted into an expression, with the digits it needs
        (23.563 kN/m³ for 150 pcf; US values print as entered)."""
        if self.units == "US":
            return format_quantity(value, kind, self.units)
        return self.carried(value, kind)


_FOOT = 0.3048

Formatter = _Fmt  # the public name of the display formatter


def minus(text: str) -> str:
    """Text with a leading hyphen-minus turned into a true minus sign (−), so it cannot read as a dash."""
    return "−" + text[1:] if text.startswith("-") else text


def paren(text: str) -> str:
    """A substituted value, in parentheses with a true minus when it is negative: ``(−1.20 kip)``."""
    text = minus(text)
    return f"({text})" if text.startswith("−") else text


def factor_text(value: float) -> str:
    """A load factor as printed in the combination names: up to four decimals, trailing zeros cut."""
    text = f"{value:.4f}".rstrip("0").rstrip(".")
    return text if text not in ("-0", "") else "0"


def ratio_text(ratio: float, required: float, passes: bool) -> str:
    """A ratio to two decimals; more where two would contradict the verdict (0.996 shown as 1.00)."""
    if math.isinf(ratio):
        return "no demand"
    for decimals in (2, 3, 4, 6):
        shown = round(ratio, decimals)
        if (shown >= round(required, decimals)) == passes:
            return f"{ratio:.{decimals}f}"
    return f"{ratio:.6f}"


def direction_text(direction: str) -> str:
    return {"+": "+", "-": "−", "none": "—"}.get(direction, direction)


def direction_words(direction: str) -> str:
    return {
        "+": "lateral load toward the end x = L_{f} (direction +)",
        "-": "lateral load toward the end x = 0 (direction −)",
        "none": "no lateral load",
    }.get(direction, direction)


def case_name(combination: str, direction: str) -> str:
    return combination if direction == "none" else f"{combination} ({direction_text(direction)})"


def _clean(text: str) -> str:
    """User text without control characters (they have no glyph and can upset PDF text)."""
    return "".join(ch for ch in text if ch in "\n\t" or ord(ch) >= 32 and ord(ch) != 127)


# Longest user text printed whole in a heading, a contents line or a table cell; longer text is cut
# short there with an ellipsis and printed in full, wrapped, in the list of inputs it belongs to.
LABEL_LIMIT = 80  # wall and load labels (at most seven lines in the schedule's label column)
INFO_LIMIT = 120  # project name, number, client, address and engineer on the cover
ELLIPSIS = "…"


def brief(text: str, limit: int = LABEL_LIMIT) -> str:
    """``text`` cut to at most ``limit`` characters, ending in an ellipsis when it was longer."""
    if len(text) <= limit:
        return text
    return text[: limit - 1].rstrip() + ELLIPSIS


def _is_long(text: str, limit: int = LABEL_LIMIT) -> bool:
    return len(text) > limit


def wall_title(wall: Wall) -> str:
    """The heading of a wall's sheet, "Wall N1: North exterior wall", the label cut short by :func:`brief`."""
    label = _clean(wall.label)
    return f"Wall {wall.id}" + (f": {brief(label)}" if label.strip() else "")


_CHECK_WORD = {Check.OVERTURNING: "overturning", Check.SLIDING: "sliding", Check.BEARING: "bearing", Check.EMBEDMENT: "embedment"}
_CHECK_TITLE = {
    Check.OVERTURNING: "Overturning",
    Check.SLIDING: "Sliding",
    Check.BEARING: "Soil bearing",
    Check.EMBEDMENT: "Embedment",
}
_CHECK_RATIO = {
    Check.OVERTURNING: "M_{R} / M_{OT}",
    Check.SLIDING: "R / V",
    Check.BEARING: "q_{a} / q",
}

# ---------------------------------------------------------------------------------------------
# The package
# ---------------------------------------------------------------------------------------------


@dataclass(frozen=True, slots=True)
class WallReport:
    """What the wall sheets print: the wall, its results on the current footing and its sizing."""

    wall: Wall
    result: WallResult
    sizing: SizingResult | None
    sized_result: WallResult | None
    sizing_error: str = ""


def select_walls(project: Project, wall_ids: Sequence[str] | None) -> tuple[Wall, ...]:
    """The walls named by ``wall_ids`` in the order given (all walls when None).

    Raises:
        InputError: an id the project does not have, or an empty selection.
    """
    if wall_ids is None:
        return project.walls
    by_id = {w.id: w for w in project.walls}
    ids = [str(i).strip() for i in wall_ids if str(i).strip()]
    if not ids:
        raise InputError("walls", "no wall ids given; name one or more, such as " + ",".join(list(by_id)[:2]))
    unknown = [i for i in ids if i not in by_id]
    if unknown:
        raise InputError(
            "walls", f"no wall {', '.join(repr(u) for u in unknown)} in the project; its walls are {', '.join(by_id)}"
        )
    seen: list[str] = []
    for i in ids:
        if i not in seen:
            seen.append(i)
    return tuple(by_id[i] for i in seen)


def wall_report(project: Project, wall: Wall) -> WallReport:
    """Check the wall on its current footing and size it (engine calls only)."""
    result = check_wall(project, wall)
    try:
        sizing = size_footing(project, wall)
    except InputError as err:
        return WallReport(wall, result, None, None, err.message)
    sized = None
    if sizing.feasible and sizing.width is not None and sizing.thickness is not None:
        footing = replace(wall.footing, width=sizing.width, thickness=sizing.thickness)
        sized = check_wall(project, replace(wall, footing=footing))
    return WallReport(wall, result, sizing, sized)


def build_package(
    project: Project,
    wall_ids: Sequence[str] | None = None,
    *,
    soil_report: str | None = None,
    revision: str | None = None,
    issued: _dt.date | str | None = None,
    checked_by: str = "",
    printed: _dt.date | None = None,
    seal_every_sheet: bool = False,
    verification: bool = False,
) -> Package:
    """Assemble the calculation package of ``project`` (the walls named, or all of them).

    Args:
        project: the parsed project.
        wall_ids: walls to include, in order (None: all).
        soil_report: the geotechnical report the soil values come from; the project's ``soil.report``
            when None (a blank to fill when that is empty too).
        revision: the revision printed in the title block; the project's ``project.revision`` when
            None ("0" when that is empty too).
        issued: the revision's date printed in the title strip; the project's ``project.revision_date``
            when None (a dash when that is empty too: the print date is not a revision date).
        checked_by: the checker's name; the project's ``project.checker`` when empty.
        printed: the date of this print, in the footer of every sheet (today when None).
        seal_every_sheet: a small seal box in every sheet's title strip (the cover has the 3 in square).
        verification: add the verification appendix (the benchmark cases run now; :mod:`.verification`).
    """
    walls = select_walls(project, wall_ids)
    fmt = _Fmt(project.units)
    reports = tuple(wall_report(project, w) for w in walls)
    info = project.info
    soil_report = soil_report if soil_report is not None else (project.soil.report or None)
    revision = revision if revision is not None else (info.revision or None)
    checked_by = checked_by or info.checker
    if issued is None:
        issued = info.revision_date.strip()
    date_text = issued.isoformat() if isinstance(issued, _dt.date) else _clean(str(issued))
    printed = printed or _dt.date.today()
    title = TitleBlock(
        project_name=_clean(info.name) or "(project name not given)",
        project_number=_clean(info.number),
        client=_clean(info.client),
        address=_clean(info.address),
        prepared_by=_clean(info.engineer),
        date=date_text,
        checked_by=_clean(checked_by),
        revision=_clean(revision) if revision else "0",
        program=f"{PROGRAM} {__version__}",
        caution=CAUTION,
        printed=printed.isoformat(),
    )
    report_text = _clean(soil_report).strip() if soil_report else ""
    sections = [
        _design_basis(project, reports, fmt, report_text),
        _references_and_notes(project, fmt, report_text),
        _schedule(project, reports, fmt),
    ]
    entries = [ContentsEntry("Project information and contents", (("sheet", "cover"),))]
    entries += [ContentsEntry(s.title, (("sheet", s.key),)) for s in sections]
    for r in reports:
        first, checks = _wall_sections(project, r, fmt)
        sections += [first, checks]
        refs = [("stability: sheet", first.key)]
        member = _concrete_section(project, r, fmt)
        if member is not None:
            sections.append(member)
            refs.append(("concrete", member.key))
        entries.append(ContentsEntry(wall_title(r.wall), tuple(refs)))
    if reports:
        sections.append(_appendix(project, reports, fmt))
        entries.append(ContentsEntry("Appendix: every combination and direction of every wall", (("sheet", "appendix"),)))
    if verification:
        from .verification import verification_section

        sections.append(verification_section(printed, title.program))
        entries.append(ContentsEntry(sections[-1].title, (("sheet", sections[-1].key),)))
    sections.insert(0, _cover(project, reports, title, tuple(entries)))
    front = {"cover", "basis", "references", "schedule"}
    sections = [replace(s, parent="Front matter") if s.key in front else s for s in sections]
    return Package(
        title=title,
        units=project.units,
        sections=tuple(sections),
        wall_ids=tuple(w.id for w in walls),
        seal_every_sheet=seal_every_sheet,
    )


# ---------------------------------------------------------------------------------------------
# Front matter
# ---------------------------------------------------------------------------------------------


def _count(n: int, noun: str) -> str:
    """``n`` with the noun in the singular or plural: "1 wall", "4 walls"."""
    return f"{n} {noun}" if n == 1 else f"{n} {noun}s"


def _cover(project: Project, reports: Sequence[WallReport], title: TitleBlock, contents: tuple[ContentsEntry, ...]) -> Section:
    info = project.info
    n_fail = sum(not r.result.passes_all for r in reports)  # the design along the length included
    failing = [r.wall.id for r in reports if not r.result.passes_all]
    ids = ", ".join(r.wall.id for r in reports)
    scope = (
        f"This package covers {_count(len(reports), 'wall')} of the project's {len(project.walls)}: {ids}."
        if len(reports) != len(project.walls)
        else (
            f"This package covers all {_count(len(reports), 'wall')} of the project: {ids}."
            if len(reports) > 1
            else f"This package covers the project's one wall: {ids}."
        )
    )
    if n_fail:
        verdict = Verdict(
            False,
            f"{n_fail} of {_count(len(reports), 'wall')} {'FAILS' if n_fail == 1 else 'FAIL'} on "
            f"{'its' if n_fail == 1 else 'their'} current footing: {', '.join(failing)}. "
            "See the summary schedule and the wall sheets.",
        )
    else:
        verdict = Verdict(
            True,
            f"All {_count(len(reports), 'wall')} pass every check on their current footing."
            if len(reports) > 1
            else "The wall passes every check on its current footing.",
        )
    user_info = (  # cut short in the key-value list when long, and then printed in full under it
        ("Project", title.project_name),
        ("Project number", _clean(info.number) or "—"),
        ("Client", _clean(info.client) or "—"),
        ("Site address", _clean(info.address) or "—"),
        ("Engineer", _clean(info.engineer) or "—"),
    )
    blocks: list[Block] = [
        Heading("Calculation package"),
        Para(
            "Global stability of concrete strip footings under shear walls: overturning, sliding and soil bearing, "
            "in every load combination and both directions of the lateral load"
            + (
                "; and each footing's design as a concrete member (ACI 318-19), across its width and along its length."
                if project.concrete is not None
                else "."
            )
        ),
        Heading("Project information", 2),
        KeyValues(
            (
                *((name, plain(brief(value, INFO_LIMIT))) for name, value in user_info),
                ("Display units", "US customary (ft, in, kip, psf)" if project.units == "US" else "SI (m, kN, kPa)"),
                ("Prepared with", f"{title.program} (program name and version; every input is printed in this package)"),
            ),
            columns=1,
        ),
        *(Para(plain(f"{name} in full: {value}")) for name, value in user_info if _is_long(value, INFO_LIMIT)),
        Para(scope),
        verdict,
        Para(CAUTION, "caution"),
        seal_drawing(title),
    ]
    if info.notes.strip():
        blocks += [Heading("Project notes", 2), Para(plain(_clean(info.notes)))]
    blocks += [Heading("Contents", 2), Contents(contents)]
    return Section("cover", "Project information and contents", "Project information", tuple(blocks))


_METHOD_TEXT = {
    Method.ASCE7_16_ASD: (
        "ASCE 7-16 allowable stress design: the basic combinations of section 2.4.1 with the seismic load effect in "
        "the ASD forms of section 2.4.5. The vertical seismic effect Ev = 0.2 S_{DS} D (12.4.2.2) is "
        "included in the dead-load factor of the seismic combinations. Wind W and seismic E are entered at strength "
        "level; the combinations apply 0.6W and 0.7E. E is the horizontal seismic load effect as given by the engineer, "
        "E_{h} = ρ Q_{E} with the redundancy factor ρ included; the overstrength factor Ω_{0} is not applied. "
        "With these ASD combinations a required ratio of 1.00 is sufficient: the margin against overturning and "
        "sliding is in the reduced dead load of 0.6D (2.4.1) and (0.6 − 0.14 S_{DS})D (2.4.5) that resists the full "
        "wind or seismic effect."
    ),
    Method.SERVICE_FS: (
        "Service loads with factors of safety (common practice): unfactored D + W and D + E checked against the "
        "required ratios below; the gravity combinations are checked for bearing only."
    ),
}


ASSUMED = "assumed"


def assumed(project: Project, path: str) -> bool:
    """The engineer did not enter the value at ``path``: Kernline took it by default (``project.assumptions``)."""
    return any(a.field == path for a in project.assumptions)


def mark_assumed(project: Project, path: str, text: str) -> str:
    """``text`` with "(assumed)" beside it when the value at ``path`` was taken by default."""
    return f"{text} ({ASSUMED})" if assumed(project, path) else text


SEAL_SIZE = 216.0  # points: the 3 in square kept clear for the engineer's seal and signature (cover only)


def seal_drawing(title: TitleBlock) -> Drawing:
    """The cover's sign-off: the revision, its date and the names at the left, the empty 3 in seal square at the right."""
    width, height = CONTENT_WIDTH, SEAL_SIZE + 14.0
    x_seal = width - SEAL_SIZE
    shapes: list[Shape] = [
        Rect(x_seal, 0.0, SEAL_SIZE, SEAL_SIZE, width=0.6),
        Label(x_seal + SEAL_SIZE / 2, SEAL_SIZE + 4.0, "Engineer's seal and signature (3 in square, keep clear)", "middle", 6.5),
    ]
    rows = (
        ("Prepared by", title.prepared_by or "—"),
        ("Checked by", title.checked_by or "—"),
        ("Revision", title.revision),
        ("Revision date", title.date or "—"),
        ("Printed", title.printed or "—"),
    )
    for k, (label, value) in enumerate(rows):
        y = SEAL_SIZE - 18.0 - 26.0 * k
        shapes.append(Label(0.0, y + 9.0, label, "start", 6.5, color="grey"))
        shapes.append(Label(0.0, y, brief(value, 60), "start", 9.0))
        shapes.append(Line(0.0, y - 4.0, x_seal - 18.0, y - 4.0, 0.4, color="grey"))
    return Drawing(width, height, tuple(shapes))


def _strength_basis(project: Project) -> list[Block]:
    """The strength combinations of the footing's concrete design, once for the package."""
    from .concrete import strength_combination_blocks

    blocks = strength_combination_blocks(project)
    return [Heading("Strength combinations for the concrete design", 2), *blocks] if blocks else []


def _paired_rows(rows: Sequence[tuple[Cell, ...]]) -> tuple[tuple[Cell, ...], ...]:
    """Rows of (number, name, checks) two to a table row, the first half on the left (factors are in the names)."""
    short = [(r[0], r[1], r[3]) for r in rows]
    half = (len(short) + 1) // 2
    left, right = short[:half], short[half:]
    return tuple((*a, *(right[k] if k < len(right) else ("", "", ""))) for k, a in enumerate(left))


def _combination_rows(combos: Sequence[LoadCombination]) -> tuple[tuple[Cell, ...], ...]:
    rows = []
    for i, c in enumerate(combos, start=1):
        factors = ", ".join(f"{case.value} × {factor_text(f)}" for case, f in c.factors if f != 0.0) or "—"
        checks = ", ".join(_CHECK_WORD.get(ch, ch.id) for ch in table_checks() if ch in c.checks)
        rows.append((str(i), plain(_clean(c.name)), factors, checks))
    return tuple(rows)


def _option_rows(project: Project, fmt: _Fmt) -> list[tuple[Any, Any]]:
    """The options of the code basis in force, each with the clause that allows it."""
    crit = project.criteria
    rows: list[tuple[Any, Any]] = []
    options = crit.method.options
    if "ev_at_soil" in options:
        rows.append(
            (
                "Vertical seismic effect at the soil",
                "kept in every seismic combination"
                if crit.ev_at_soil
                else formula(
                    "Ev = 0 in the counteracting combination, which reads 0.6D + 0.7E (ASCE 7-16 12.4.2.2, exception 2)"
                ),
            )
        )
    if "seismic_overturning_reduction" in options:
        r = crit.seismic_overturning_reduction
        rows.append(
            (
                "Reduction of seismic overturning",
                "none"
                if not r
                else plain(
                    f"the overturning moment of the E lateral loads × (1 − {r:g}) in the overturning and bearing checks "
                    "(ASCE 7-16 12.13.4); sliding takes the full shear, and E point loads are not reduced"
                ),
            )
        )
    if "wind_omega" in options:
        rows.append((formula("ω on 0.6W (IBC 2021 1605.2)"), f"{crit.wind_omega:g}"))
    if "seismic_snow_factor" in options and crit.seismic_snow_factor is not None:
        rows.append(
            (
                "Snow factor in the seismic combination",
                plain(f"{crit.seismic_snow_factor:g}, as entered by the engineer from ASCE 7-22 2.4.5"),
            )
        )
    frost = project.site.frost_depth
    for k, (label, value) in enumerate(rows):
        path = {
            "Vertical seismic effect at the soil": "criteria.ev_at_soil",
            "Reduction of seismic overturning": "criteria.seismic_overturning_reduction",
        }.get(str(label), "")
        if path and assumed(project, path):
            rows[k] = (label, (plain(value) if isinstance(value, str) else value) + plain(f" ({ASSUMED})"))
    rows.append(
        (
            "Frost depth",
            plain(f"{fmt.length(frost)} (IBC 2021 1809.5)")
            if frost is not None
            else "not given: the 12 in of IBC 2021 1809.4 governs",
        )
    )
    return rows


def _design_basis(project: Project, reports: Sequence[WallReport], fmt: _Fmt, soil_report: str) -> Section:
    crit = project.criteria
    soil = project.soil
    combos = combinations_of(crit)
    if crit.custom_combinations:
        method = "The project's own load combinations (they replace the preset of the design method: " + crit.method.value + ")."
    else:
        method = _METHOD_TEXT.get(crit.method, crit.method.wording)
    req = crit.required
    engineer_sets = crit.method.id == "service-fs"

    def required(check_id: str, value: float) -> Cell:
        """The required ratio with its citation: the code basis's clause, or the engineer's own value."""
        path = f"criteria.required.{check_id}"
        if engineer_sets and not assumed(project, path):
            return f"{value:.2f} (set by the engineer)"
        return plain(mark_assumed(project, path, f"{value:.2f}"))

    increase = (
        f"× {factor_text(crit.bearing_increase)} in combinations with W or E (a value the geotechnical report, or IBC 2021 "
        "1806.1 with the alternative combinations, must permit)"
        if crit.bearing_increase != 1.0
        else "none (× 1.0 in every combination)"
    )
    unit_weights = sorted({r.wall.footing.unit_weight for r in reports})
    if len(unit_weights) == 1:
        concrete = f"{fmt.unit_weight(unit_weights[0])} (every wall in this package)"
    else:
        concrete = "; ".join(f"{r.wall.id}: {fmt.unit_weight(r.wall.footing.unit_weight)}" for r in reports)
    basis = (
        "gross (compared with the peak pressure)"
        if soil.bearing_basis is BearingBasis.GROSS
        else ("net (compared with the peak pressure less the overburden γ_{s}(h_{s} + t_{f}))")
    )
    blocks: list[Block] = [
        Heading("Design basis"),
        Heading("Method and load combinations", 2),
        Para(formula(method)),
        Table(
            ("No.", "Combination", "Factors", "Checks it applies to"),
            _combination_rows(combos),
            (0.06, 0.38, 0.32, 0.24),
            align="CLLL",
            font_size=7.0,
        )
        if crit.custom_combinations
        else Table(
            ("No.", "Combination (the factors as named)", "Checks it applies to", "No.", "Combination", "Checks"),
            _paired_rows(_combination_rows(combos)),
            (0.04, 0.26, 0.2, 0.04, 0.26, 0.2),
            align="CLLCLL",
            font_size=7.0,
        ),
        *_strength_basis(project),
        Heading("Required ratios and seismic and bearing settings", 2),
        KeyValues(
            (
                (formula("Overturning, M_{R} / M_{OT} ≥"), required("overturning", req.overturning)),
                ("Sliding, R / V ≥", required("sliding", req.sliding)),
                (formula("Bearing, q_{a} / q ≥"), required("bearing", req.bearing)),
                (
                    "Basis of the required ratios",
                    "set by the engineer" if engineer_sets else plain(crit.method.required_basis),
                ),
                (
                    formula("Embedment, (h_{s} + t_{f}) / d_{req} ≥"),
                    formula(f"1.00, d_{{req}} = max({fmt.length(MIN_DEPTH)}, frost depth) (IBC 2021 1809.4, 1809.5)"),
                ),
                (formula("S_{DS}"), f"{crit.sds:g}"),
                ("Allowable bearing increase", increase),
                *_option_rows(project, fmt),
            ),
            columns=1,
        ),
        Heading("Soil values", 2),
        KeyValues(
            (
                (formula("Allowable bearing pressure q_{a}"), fmt.pressure(soil.allowable_bearing)),
                ("Basis of the allowable", formula(basis)),
                (
                    formula("Friction coefficient μ (on the dead load f_{D} (D + W_{f}), at most N; see below)")
                    if soil.sliding_basis is SlidingBasis.DEAD
                    else "Friction coefficient μ (on the vertical load N; see below)",
                    f"{soil.friction:g}",
                ),
                (
                    "Cohesion c (sliding; capped at one-half of the dead load; see below)"
                    if soil.sliding_basis is SlidingBasis.DEAD
                    else "Cohesion c (sliding; capped at 0.5 N; see below)",
                    fmt.pressure(soil.cohesion),
                ),
                (
                    formula("Passive lateral bearing pressure per foot of depth p_{p}")
                    if project.units == "US"
                    else formula("Passive lateral bearing pressure per metre of depth p_{p}"),
                    fmt.gradient(soil.passive),
                ),
                ("Passive ignored from grade to depth", fmt.length(soil.passive_ignore)),
                (formula("Soil unit weight γ_{s}"), fmt.unit_weight(soil.unit_weight)),
                (
                    "Source of the soil values",
                    plain(
                        f"IBC 2021 Table 1806.2, presumptive class {soil.presumptive_class}"
                        + (f"; {soil_report}" if soil_report else "")
                    )
                    if soil.presumptive_class
                    else plain(soil_report)
                    if soil_report
                    else "not stated in the project file: ________________________________",
                ),
            ),
            columns=1,
        ),
        Heading("Materials", 2),
        KeyValues(((formula("Concrete unit weight γ_{c}"), concrete),), columns=1),
    ]
    blocks += _assumptions(project)
    return Section("basis", "Design basis", "Design basis", tuple(blocks))


_REFERENCES = (
    "ASCE/SEI 7-16, Minimum Design Loads and Associated Criteria for Buildings and Other Structures: "
    "section 2.4.1 (basic combinations for allowable stress design), 2.4.5 (ASD combinations with seismic load "
    "effects), 12.4.2.2 (vertical seismic load effect Ev = 0.2 S_{DS} D, and Ev = 0 at the soil-structure "
    "interface in Eq. 12.4-2), 12.13.4 (reduction of foundation overturning).",
    "ASCE/SEI 7-22, the same title: section 2.4.1 (ASD combinations with 0.7S) and 2.4.5, where the project uses it.",
    "International Building Code 2021: section 1605 (load combinations; 1605.1.1 stability, 1605.2 alternative "
    "allowable stress design combinations), section 1806 (1806.1 one-third increase with the alternative "
    "combinations; presumptive load-bearing values of Table 1806.2; 1806.3 lateral sliding resistance, 1806.3.1 "
    "combined friction and passive resistance, 1806.3.2 cohesion-type resistance at most one-half of the dead "
    "load), section 1809 (1809.4 depth and width of footings, 1809.5 frost protection).",
    "Das, B. M., Principles of Foundation Engineering: eccentrically loaded foundations (e = M / N; q_{max} = "
    "4N / (3B (L − 2e)) beyond the kern); stability of retaining structures (overturning about the toe).",
    "Bowles, J. E., Foundation Analysis and Design, 5th ed.: section 4-8 (footings with eccentric load, the kern); "
    "sliding factor of safety as resisting over driving force.",
    "Hibbeler, R. C., Statics, 14th ed., section 4.9: resultant of a distributed load.",
)


def _how_checks_are_made(project: Project) -> list[Block]:
    """The symbols and the method of each stability check, in words (for the references and notes sheet)."""
    soil = project.soil
    return [
        Heading("How the checks are made", 2),
        Bullets(
            (
                formula(
                    "Symbols: B footing width, t_{f} footing thickness, L_{f} footing length, h_{s} soil cover over the "
                    "footing, t_{w} wall thickness, h_{stem} and t_{stem} stem wall height and thickness, c cohesion, "
                    "p_{p} passive pressure per depth. D, L, L_{r}, S, R, W and E are the load cases as ASCE 7 writes them. "
                    "In the equations f is the combination's factor on the case of the load it multiplies, and f_{D} "
                    "its factor on D, which the self weight W carries. P is a vertical load (its resultant), H a lateral "
                    "load at height h above the top of the footing."
                ),
                formula(
                    "Overturning: moments about the toe (the footing end the lateral load pushes toward). "
                    "Ratio M_{R} / M_{OT}; downward loads resist, uplift and lateral loads overturn; lateral loads act "
                    "at their height above the top of the footing plus the footing thickness t_{f}."
                ),
                formula(
                    "Sliding: resistance R = friction μ N_{D} + cohesion min(c B a, 0.5 N_{D}) + passive p_{p} on the "
                    "footing's end face; ratio R / V (resisting over driving, Bowles). N_{D} is the combination's dead "
                    "load f_{D} (D + W_{f}), never more than the whole vertical load N on the soil (IBC 2021 Table 1806.2 "
                    "note a and 1806.3.2)."
                )
                if soil.sliding_basis is SlidingBasis.DEAD
                else formula(
                    "Sliding: resistance R = friction μ N + cohesion min(c B a, 0.5 N) + passive p_{p} on the footing's "
                    "end face; ratio R / V (resisting over driving, Bowles). N is the combination's total vertical load on "
                    "the soil, with the factored self weight: it includes any live, snow or vertical seismic load the "
                    "combination carries. IBC 2021 Table 1806.2 note a applies friction to the dead load and 1806.3.2 "
                    "caps cohesion at one-half of the dead load; where a governing sliding combination carries live or "
                    "snow load, this method departs from that wording and the engineer must confirm it (or check "
                    'sliding on the dead load alone, with the soil\'s sliding basis "dead").'
                ),
                formula(
                    "Embedment: the bottom of the footing lies h_{s} + t_{f} below grade (the top of the soil over the "
                    "footing); it must be at least 12 in below undisturbed ground (IBC 2021 1809.4) and below the frost "
                    "depth (IBC 2021 1809.5). Ratio (h_{s} + t_{f}) / d_{req}."
                ),
                formula(
                    "Soil bearing: rigid footing, linear soil pressure, no tension. Inside the kern (|e| ≤ L_{f}/6) "
                    "q = N / (B L_{f}) (1 ± 6|e| / L_{f}); beyond it a triangular block of length a = 3 (L_{f}/2 − |e|) "
                    "with q_{max} = 2N / (3B (L_{f}/2 − |e|)); |e| ≥ L_{f}/2 or N ≤ 0 has no equilibrium (fails). "
                    "Ratio q_{a} / q_{max}."
                ),
                formula(
                    "Self weight of footing, stem and soil cover is dead load at the footing's mid-length, "
                    "carried with the combination's factor f_{D} on D."
                ),
                formula(
                    "Computed lengths (e, a) are substituted in decimal "
                    + ("feet to three places, with feet and inches in brackets" if project.units == "US" else "metres")
                    + "; forces and moments carry one decimal more than their display precision where that is not "
                    "exact, so that every line recomputes to its printed result."
                ),
                "Every combination is checked in both directions of the lateral load; the case with the lowest "
                "ratio / required governs each check.",
            )
        ),
    ]


def _assumptions(project: Project) -> list[Block]:
    """Every value the engineer did not enter, together (each is also marked "assumed" where it is printed)."""
    if not project.assumptions:
        return [Heading("Assumed values", 2), Para("None: every value was entered by the engineer.")]
    grouped: dict[tuple[str, str], list[str]] = {}  # one row per value and basis, its fields together
    for a in project.assumptions:
        grouped.setdefault((_clean(a.value), _clean(a.basis)), []).append(a.field)
    rows = tuple((plain(", ".join(fields)), plain(value), plain(basis)) for (value, basis), fields in grouped.items())
    return [
        Heading("Assumed values (not entered by the engineer; confirm each, or enter it)", 2),
        Table(("Field", "Value assumed", "Basis"), rows, (0.36, 0.2, 0.44), align="LLL", font_size=6.5),
    ]


def _references_and_notes(project: Project, fmt: _Fmt, soil_report: str = "") -> Section:
    scope = (
        "Scope: global stability of each wall and its strip footing in the plane of the wall (overturning, sliding, "
        "soil bearing) and the footing's design as a concrete member (ACI 318-19) across its width and along its "
        "length. Not covered here and to be checked separately: hold-down and anchor embedment, settlement, code "
        "minimum footing sizes, and out-of-plane loads."
        if project.concrete is not None
        else "Scope: global stability of each wall and its strip footing in the plane of the wall (overturning, "
        "sliding, soil bearing). Not covered here and to be checked separately: footing reinforcement, flexure and "
        "shear of the footing, hold-down and anchor embedment, settlement, code minimum footing sizes, and "
        "out-of-plane loads."
    )
    notes: list[Cell] = [
        scope,
        "Loads are as entered by the engineer of record. Vertical loads are positive downward; lateral loads are "
        "in-plane shears at a height above the top of the footing.",
        "Coordinates: x runs along the footing from its start end (x = 0) to x = L_{f} = extension at start + wall "
        "length + extension at end. Direction + pushes toward x = L_{f}, direction − toward x = 0. Loads marked "
        '"reverses" act at their mirror position about the wall\'s mid-length in direction −.',
        "The footing is taken as rigid and the soil takes no tension. The soil pressure is checked along the "
        "footing's length; its width B carries the pressure uniformly.",
        formula(
            "Passive resistance acts on the footing's end face of width B, from depth z_{0} = max(h_{s}, ignored depth) "
            "below grade down to the base at h_{s} + t_{f}."
        ),
        formula(
            "Assumptions of the self weight: the stem wall's weight is taken over the full footing length L_{f} "
            "(including the extensions); the soil over the footing is h_{s} deep and B − t_{stem} wide (B − t_{w} with no "
            "stem) over the full footing length, extensions included. Where the drawings differ, revise the inputs."
        ),
        "Dimensions are shown in "
        + (
            "feet and inches to the nearest 1/4 in; forces in kip to two decimals; pressures in psf."
            if project.units == "US"
            else "metres; forces in kN; pressures in kPa."
        ),
        'A ratio of "no demand" means the case produces no overturning moment, no shear or no pressure for that check.',
    ]
    source = f"the geotechnical report ({soil_report})" if soil_report else "the geotechnical report for the site"
    notes += [
        "These results are for review by a licensed engineer, who takes responsibility for the design by sealing "
        "and signing this package. They are not a design until then.",
        "The local building code as adopted and amended by the jurisdiction governs. Where it differs from the "
        "load combinations, factors or limits used here, the code governs and the results must be revised.",
        f"The soil values must be those of {source}. Where the report limits bearing pressure, friction, "
        "cohesion, passive resistance or any increase for wind or seismic load, the report governs.",
        "The inputs printed on the wall sheets must match the structural drawings (wall lengths, footing sizes, "
        "loads and their positions). Check them before sealing.",
    ]
    blocks: list[Block] = [
        Heading("References"),
        Bullets(tuple(formula(r) for r in _REFERENCES)),
        *_how_checks_are_made(project),
        Heading("General notes"),
        Para(CAUTION, "caution"),
        Bullets(tuple(formula(n) if isinstance(n, str) else n for n in notes)),
    ]
    return Section("references", "References and general notes", "References and notes", tuple(blocks))


def _schedule(project: Project, reports: Sequence[WallReport], fmt: _Fmt) -> Section:
    rows: list[tuple[Cell, ...]] = []
    fail_rows = []
    for k, r in enumerate(reports):
        # from the engine's results: the footing as checked and each reported check's governing ratio
        res = r.result
        cells: list[Cell] = [
            plain(r.wall.id),
            plain(brief(_clean(r.wall.label))),
            f"{fmt.length(res.width)} × {fmt.length(res.thickness)} × {fmt.length(res.length)}",
        ]
        for check in reported_checks(project):
            g = res.governing[check]
            shown = ratio_text(g.ratio, g.required, g.passes)
            if math.isinf(g.ratio):
                cells.append("no demand")
            elif not g.combination:
                cells.append(f"{shown} / {g.required:.2f}")
            else:
                cells.append(f"{shown} / {g.required:.2f}\n{case_name(g.combination, g.direction)}")
        failing = [_CHECK_WORD.get(c, c.id) for c in reported_checks(project) if not res.governing[c].passes]
        if not res.passes_along:
            failing.append("along the length")
        cells.append("FAILS: " + ", ".join(failing) if failing else "passes")
        if not r.result.passes_all:
            fail_rows.append(k)
        rows.append(tuple(cells))
    blocks: list[Block] = [
        Heading("Summary schedule"),
        Para(
            formula(
                "Footing size as drawn (width B × thickness t_{f} × length L_{f}) and, for each check, the governing "
                "ratio / required ratio with the combination and direction that govern: (+) lateral load toward "
                "x = L_{f}, (−) toward x = 0, no mark: a combination without lateral load."
            )
        ),
        Table(
            (
                "Wall",
                "Label",
                formula("Footing B × t_{f} × L_{f}"),
                *(_narrow_header(_CHECK_TITLE.get(c, c.title)) for c in reported_checks(project)),
                "Result",
            ),
            tuple(rows),
            (0.06, 0.19, 0.15, *((0.50 / len(reported_checks(project)),) * len(reported_checks(project))), 0.10),
            align="L" * (4 + len(reported_checks(project))),
            font_size=7.0,
            fail_rows=tuple(fail_rows),
            links=tuple(f"wall:{r.wall.id}" for r in reports),
        ),
    ]
    sized = [r for r in reports if r.sizing is not None]
    if sized:
        srows = []
        for r in sized:
            s = r.sizing
            assert s is not None
            if s.feasible and s.width is not None and s.thickness is not None:
                size = f"{fmt.length(s.width)} × {fmt.length(s.thickness)}"
                same = _same_size(r.wall, s)
                state = (
                    "current footing is this size"
                    if same
                    else ("current footing passes" if r.result.passes_all else "current footing FAILS")
                )
            else:
                size, state = "none in the bounds passes", "revise the bounds, loads or footing length"
            srows.append((plain(r.wall.id), size, f"{s.candidates:,}", state))
        blocks += [
            Heading("Smallest passing footing found by the program", 2),
            Table(
                ("Wall", formula("Smallest passing B × t_{f}"), "Candidates checked", "Current footing"),
                tuple(srows),
                (0.12, 0.30, 0.20, 0.38),
            ),
        ]
    return Section("schedule", "Summary schedule", "Summary schedule", tuple(blocks))


_HYPHENATED = {"Overturning": "Over-\nturning", "Embedment": "Embed-\nment"}


def _narrow_header(title: str) -> str:
    """A check's title for a narrow schedule column: long words hyphenated where a reader would break them
    (the table would otherwise cut "Overturni / ng")."""
    return " ".join(_HYPHENATED.get(word, word) for word in title.split(" "))


def _same_size(wall: Wall, sizing: SizingResult) -> bool:
    if sizing.width is None or sizing.thickness is None:
        return False
    return abs(wall.footing.width - sizing.width) < 1e-6 and abs(wall.footing.thickness - sizing.thickness) < 1e-6


# ---------------------------------------------------------------------------------------------
# Wall sheets
# ---------------------------------------------------------------------------------------------


def _mark(blocks: list[Block], name: str) -> list[Block]:
    """``blocks`` with their first heading (inside a group too) entered in the PDF outline as ``name``."""
    out = list(blocks)
    for k, b in enumerate(out):
        if isinstance(b, Heading):
            out[k] = replace(b, bookmark=name)
            return out
        if isinstance(b, Group):
            inner = _mark(list(b.blocks), name)
            if inner != list(b.blocks):
                out[k] = Group(tuple(inner))
                return out
    return out


def _wall_sections(project: Project, report: WallReport, fmt: _Fmt) -> tuple[Section, Section]:
    """A wall's two stability sheets: (1) sketch, inputs and self weight; (2) the checks, the pressure
    diagram and sizing. The checks' sheets come from :data:`CHECK_SHEETS`, in the registry's order."""
    from .sheets import CHECK_SHEETS

    wall, result = report.wall, report.result
    title = wall_title(wall)
    blocks: list[Block] = [Heading(plain(title)), _wall_verdict(result)]
    blocks.append(
        DrawingRow(
            (
                elevation := elevation_drawing(wall, fmt, 372.0, 170.0),
                section_drawing(wall, project, fmt, 140.0, max(elevation.height, 150.0)),
            )
        )
    )
    blocks += _loads(project, wall, fmt)  # right under the sketch: its numbered tags are this table's numbers
    blocks += _inputs(project, wall, result, fmt)
    blocks += _self_weight(project, wall, result, fmt)
    checks: list[Block] = []
    for check in result.governing:
        sheet = CHECK_SHEETS.get(check.id)
        if sheet is not None:
            checks += _mark(sheet(project, wall, result, fmt), _CHECK_TITLE.get(check, check.title))
    checks += _mark(_sizing(project, report, fmt), "Sizing")
    return (
        Section(f"wall:{wall.id}", "Sketch, inputs and self weight", f"Wall {wall.id}: stability", tuple(blocks), parent=title),
        Section(
            f"checks:{wall.id}",
            "Stability checks and sizing",
            f"Wall {wall.id}: stability",
            tuple(checks),
            parent=title,
            new_sheet=False,
        ),
    )


def _concrete_section(project: Project, report: WallReport, fmt: _Fmt) -> Section | None:
    """The wall's concrete design sheet (None when the project has no concrete section)."""
    from .concrete import concrete_blocks

    blocks = concrete_blocks(project, report, fmt)
    if blocks is None:
        return None
    wall = report.wall
    return Section(
        f"concrete:{wall.id}", "Concrete design (ACI 318-19)", f"Wall {wall.id}: concrete", tuple(blocks), parent=wall_title(wall)
    )


def _wall_verdict(result: WallResult) -> Verdict:
    along = "" if result.passes_along else " and the design along the length"
    if result.passes:
        names = ", ".join(_CHECK_WORD.get(c, c.title.lower()) for c in result.governing)
        if along:
            return Verdict(
                False,
                f"Wall {result.wall_id} passes every check ({names}) but FAILS the design along the length on its "
                "current footing (see its concrete design sheet).",
            )
        return Verdict(True, f"Wall {result.wall_id} PASSES every check ({names}) on its current footing.")
    parts = []
    for check in result.governing:
        g = result.governing[check]
        if not g.passes:
            where = f", {case_name(g.combination, g.direction)}" if g.combination else ""
            parts.append(
                f"{_CHECK_WORD.get(check, check.title.lower())} (ratio {ratio_text(g.ratio, g.required, g.passes)} < {g.required:.2f} "
                f"required{where})"
            )
    return Verdict(False, f"Wall {result.wall_id} FAILS " + "; ".join(parts) + along + " on its current footing.")


def _inputs(project: Project, wall: Wall, result: WallResult, fmt: _Fmt) -> list[Block]:
    f = wall.footing
    pairs: list[tuple[Cell, Cell]] = [
        ("Wall length", fmt.length(wall.length)),
        (formula("Wall thickness t_{w}"), fmt.length(wall.thickness)),
        ("Footing width B", fmt.length(f.width)),
        (formula("Footing thickness t_{f}"), fmt.length(f.thickness)),
        ("Extension at start / end", f"{fmt.length(f.extension_start)} / {fmt.length(f.extension_end)}"),
        (formula("Footing length L_{f}"), fmt.length(result.length)),
        (formula("Soil cover h_{s} over the footing"), fmt.length(f.cover)),
        (formula("Concrete γ_{c}"), fmt.unit_weight(f.unit_weight)),
        (
            formula("Stem wall h_{stem} × t_{stem}"),
            f"{fmt.length(wall.stem.height)} × {fmt.length(wall.stem.thickness)}" if wall.stem.present else "no stem",
        ),
        (formula("Soil γ_{s}"), fmt.unit_weight(project.soil.unit_weight)),
    ]
    blocks: list[Block] = [Heading("Inputs", 2), KeyValues(tuple(pairs), columns=2)]
    label = _clean(wall.label)
    if _is_long(label):  # cut short in the headings and the schedule: here in full
        blocks.append(Para(plain(f"Wall label in full: {label}")))
    return blocks


def _load_position(load: LineLoad | PointLoad | LateralLoad, fmt: _Fmt) -> str:
    if isinstance(load, LineLoad):
        return f"{fmt.length(load.start)} to {fmt.length(load.end)}"
    if isinstance(load, PointLoad):
        return f"at {fmt.length(load.at)}"
    return f"h = {fmt.length(load.height)}"


def _loads(project: Project, wall: Wall, fmt: _Fmt) -> list[Block]:
    verticals = iter(vertical_resultants(wall))
    rows: list[tuple[Cell, ...]] = []
    long_labels: list[tuple[int, str]] = []
    for i, load in enumerate(wall.loads, start=1):
        if isinstance(load, LateralLoad):
            kind, value, resultant, where = "lateral", fmt.force(load.value), fmt.force(load.value), "—"
        else:
            v = next(verticals)
            kind = "line" if isinstance(load, LineLoad) else "point"
            value = fmt.line_load(load.value) if isinstance(load, LineLoad) else fmt.force(load.value)
            resultant = fmt.force(v.force)
            where = fmt.length(v.x)
            if load.reverses:
                where += f" (−: {fmt.length(v.x_reversed)})"
        label = _clean(load.label)
        if _is_long(label):
            long_labels.append((i, label))
        label = brief(label)  # a reversing load shows its position in direction − ("−:") beside x
        index = next((k for k, w in enumerate(project.walls) if w.id == wall.id), -1)
        position = mark_assumed(project, f"walls[{index}].loads[{i - 1}]", _load_position(load, fmt))
        rows.append((str(i), kind, load.case.value, value, position, resultant, where, plain(label)))
    if not rows:
        return [Heading("Loads", 2), Para("The wall carries no loads; only the self weight acts.")]
    in_full: list[Block] = [Para(plain(f"Label of load {i} in full: {label}"), "small") for i, label in long_labels]
    return [
        Heading("Loads (as entered; positions from the wall's start end)", 2),
        Table(
            ("No.", "Type", "Case", "Value", "Position on wall", "Resultant", "x on footing", "Label"),
            tuple(rows),
            (0.035, 0.055, 0.045, 0.1, 0.175, 0.1, 0.15, 0.34),
            align="CLCRLRLL",
            font_size=7.0,
        ),
        *in_full,
        Para(
            formula(
                "P = w (s_{2} − s_{1}) at the mid-point (Hibbeler 4.9); x on footing = extension at start + position; "
                '"−:" the position in direction − of a load that reverses with the direction; negative values act upward.'
            ),
            "small",
        ),
    ]


def _self_weight(project: Project, wall: Wall, result: WallResult, fmt: _Fmt) -> list[Block]:
    f = wall.footing
    sw = result.self_weight
    L, B, t = fmt.term(result.length), fmt.term(result.width), fmt.term(result.thickness)
    eqs: list[Block] = [
        Heading("Self weight (dead load at the footing's mid-length)", 2),
        Equation(
            formula("W_{f}"),
            formula("γ_{c} B t_{f} L_{f}"),
            f"{fmt.weight_term(f.unit_weight)} × {B} × {t} × {L}",
            fmt.sub(sw.footing, Kind.FORCE),
        ),
    ]
    if wall.stem.present:
        eqs.append(
            Equation(
                formula("W_{stem}"),
                formula("γ_{c} t_{stem} h_{stem} L_{f}"),
                f"{fmt.weight_term(f.unit_weight)} × {fmt.term(wall.stem.thickness)} × {fmt.term(wall.stem.height)} × {L}",
                fmt.sub(sw.stem, Kind.FORCE),
                "the stem runs the full footing length",
            )
        )
    else:
        eqs.append(Equation(formula("W_{stem}"), None, None, fmt.force(sw.stem), "no stem wall"))
    t_sup = "t_{stem}" if wall.stem.present else "t_{w}"
    eqs.append(
        Equation(
            formula("W_{soil}"),
            formula(f"γ_{{s}} h_{{s}} (B − {t_sup}) L_{{f}}"),
            f"{fmt.weight_term(project.soil.unit_weight)} × {fmt.term(f.cover)} × ({B} − {fmt.term(wall.supported_thickness)}) × {L}",
            fmt.sub(sw.soil, Kind.FORCE),
            "",
        )
    )
    eqs.append(
        Equation(
            formula("W"),
            formula("W_{f} + W_{stem} + W_{soil}"),
            f"{fmt.sub(sw.footing, Kind.FORCE)} + {fmt.sub(sw.stem, Kind.FORCE)} + {fmt.sub(sw.soil, Kind.FORCE)}",
            plain(fmt.sub(sw.total, Kind.FORCE), bold=True),
            "",
        )
    )
    return _lead(eqs, 2)


def _lead(blocks: Sequence[Block], n: int) -> list[Block]:
    """Keep the first ``n`` blocks together (a heading with what it introduces); the rest may flow."""
    return [Group(tuple(blocks[:n])), *blocks[n:]]


def _tail(blocks: list[Block], n: int) -> list[Block]:
    """Keep the last ``n`` blocks together (the ratio with its verdict)."""
    return [*blocks[:-n], Group(tuple(blocks[-n:]))]


def _case_of(result: WallResult, g: Governing) -> tuple[CaseResult, LoadCombination, int, float]:
    i = g.case_index
    assert i is not None, "a geometric check has no case"
    design = result.table.cases[i]
    return result.cases[i], design.combination, i, float(result.table.dead_factor[i])


def _no_demand(title: str, why: str, name: str | None = None) -> list[Block]:
    """The sheet of a check that no case loads: its heading, why there is no demand, and the verdict
    (naming the check as ``name``, by default its title)."""
    return [Heading(title, 2), Para(why), Verdict(True, f"{name or title} passes: no demand.")]


def _governing_heading(check: Check, g: Governing) -> list[Block]:
    words = {"+": ", lateral load toward x = L_{f}", "-": ", lateral load toward x = 0"}.get(g.direction, "")
    head = Heading(formula(f"{_CHECK_TITLE[check]}: governing case {case_name(g.combination, g.direction)}{words}"), 2)
    return [head]


def _lateral_terms(wall: Wall, combo: LoadCombination, direction: str, fmt: _Fmt, with_arm: bool) -> list[str]:
    """Substituted terms f H (h + t_f) (or f H) of the lateral loads acting in the case."""
    if direction == "none":
        return []
    terms = []
    for h in lateral_resultants(wall):
        f = combo.factor(h.case)
        if f == 0.0:
            continue
        if with_arm:
            terms.append(
                f"{factor_text(f)} × {fmt.arm_sub(h.force)} × ({fmt.term(h.height)} + {fmt.term(wall.footing.thickness)})"
            )
        else:
            terms.append(f"{factor_text(f)} × {fmt.sub(h.force, Kind.FORCE)}")
    return terms


def _position(v: VerticalResultant, direction: str) -> float:
    return v.x_reversed if direction == "-" else v.x


def _join(terms: Sequence[str], empty: str = "0") -> str:
    return " + ".join(terms) if terms else empty


def _n_equation(wall: Wall, result: WallResult, combo: LoadCombination, f_d: float, value: float, fmt: _Fmt) -> Equation:
    """N = Σ f P + f_D W of a combination, written out (N does not depend on the lateral direction)."""
    terms = []
    for v in vertical_resultants(wall):
        f = combo.factor(v.case)
        if f == 0.0 or v.force == 0.0:
            continue
        terms.append(f"{factor_text(f)} × {fmt.sub(v.force, Kind.FORCE)}")
    terms.append(f"{factor_text(f_d)} × {fmt.sub(result.self_weight.total, Kind.FORCE)}")
    return Equation(formula("N"), formula("Σ f P + f_{D} W"), _join(terms), fmt.carried(value, Kind.FORCE))


def _check_verdict(check: Check, ratio: float, required: float, passes: bool, symbol: str | None = None) -> Verdict:
    shown = ratio_text(ratio, required, passes)
    sign = "≥" if passes else "<"
    word = "passes" if passes else "FAILS"
    symbol = symbol or _CHECK_RATIO[check]
    return Verdict(passes, formula(f"{_CHECK_TITLE[check]} {word}: {symbol} = {shown} {sign} {required:.2f} required."))


def _sizing(project: Project, report: WallReport, fmt: _Fmt) -> list[Block]:
    wall, s = report.wall, report.sizing
    z = wall.sizing
    blocks: list[Block] = [Heading("Sizing: the smallest footing that passes", 2)]
    if s is None:
        blocks.append(Para(plain(f"The program could not size this footing: {report.sizing_error}"), "fail"))
        return blocks
    blocks.append(
        Para(
            formula(
                f"B from {fmt.length(z.width_min)} to {fmt.length(z.width_max)} by {fmt.length(z.width_step)} "
                f"({s.widths.size}) × t_{{f}} from {fmt.length(z.thickness_min)} to {fmt.length(z.thickness_max)} by "
                f"{fmt.length(z.thickness_step)} ({s.thicknesses.size}): {s.candidates:,} candidates, each in every case, "
                "L_{f} and loads as entered; ranked by cross-section B × t_{f}, then thinner, then narrower; the first "
                "that passes is chosen."
            )
        )
    )
    if not s.feasible or s.width is None or s.thickness is None:
        finding = s.message[:1].upper() + s.message[1:]
        blocks.append(Verdict(False, plain(f"No candidate within the bounds passes. Program's finding: {finding}.")))
        if s.suggestions:
            blocks.append(Bullets(tuple(plain(t) for t in s.suggestions)))
        return _lead(blocks, 3)
    row = int(abs(s.thicknesses - s.thickness).argmin())
    col = int(abs(s.widths - s.width).argmin())
    table_rows: list[tuple[Cell, ...]] = []
    fail_rows = []
    for k, (name, r, c) in enumerate(
        (("smallest passing", row, col), ("next narrower", row, col - 1), ("next thinner", row - 1, col))
    ):
        if r < 0 or c < 0:
            continue  # outside the bounds searched: not a candidate
        values = []
        for j in range(len(s.checks)):
            v = float(s.check_normalized[j, r, c])
            values.append("no demand" if math.isinf(v) else f"{v:.3f}")
        if not bool(s.allowed[r, c]):
            verdict = "narrower than the wall it carries"
        elif bool(s.passes[r, c]):
            verdict = "passes"
        else:
            verdict = "FAILS " + s.governing_check(r, c).id
            fail_rows.append(k)
        table_rows.append((name, f"{fmt.length(float(s.widths[c]))} × {fmt.length(float(s.thicknesses[r]))}", *values, verdict))
    # one line per candidate: its size, each check's lowest ratio / required (1.000 or more passes), result;
    # the first line says what the numbers are
    lines = tuple(
        plain(
            f"{row[0]}, {row[1]}"
            + (" (each check's lowest ratio / required over all cases; 1.000 or more passes)" if k == 0 else "")
            + ": "
            + ", ".join(f"{c.title.lower()} {v}" for c, v in zip(s.checks, row[2:-1], strict=True))
            + f"; {row[-1]}",
            bold=k in fail_rows,
        )
        for k, row in enumerate(table_rows)
    )
    blocks += [
        Para(formula(f"Smallest passing size: B × t_{{f}} = {fmt.length(s.width)} × {fmt.length(s.thickness)}.", bold=True)),
        Bullets(lines),
    ]
    if row == 0 and col == 0:
        blocks.append(
            Para(
                "The lower bounds pass: stability does not govern; the code minimums (IBC 2021 1809) and practice set the size.",
                "small",
            )
        )
    if _same_size(wall, s):
        blocks.append(Verdict(True, "The current footing is this smallest passing size."))
    elif report.result.passes_all:
        blocks.append(
            Verdict(
                True,
                f"The current footing ({fmt.length(wall.footing.width)} × {fmt.length(wall.footing.thickness)}) is not this size; "
                "it passes as drawn.",
            )
        )
    else:
        blocks.append(
            Verdict(
                False,
                f"The current footing ({fmt.length(wall.footing.width)} × {fmt.length(wall.footing.thickness)}) FAILS; "
                f"revise it, for example to the smallest passing size {fmt.length(s.width)} × {fmt.length(s.thickness)}, "
                "as the engineer decides.",
            )
        )
    return _lead(blocks, 2)


# ---------------------------------------------------------------------------------------------
# Appendix
# ---------------------------------------------------------------------------------------------


def _short_ratio(ratio: float, required: float, passes: bool) -> str:
    return "no dem." if math.isinf(ratio) else ratio_text(ratio, required, passes)


_CHECK_ABBREVIATION = {Check.OVERTURNING: "OT", Check.SLIDING: "SL", Check.BEARING: "BR"}


def _appendix(project: Project, reports: Sequence[WallReport], fmt: _Fmt) -> Section:
    """One appendix for every wall: the key once, then each wall's table of every case under its heading."""
    tables = [_appendix_table(project, r, fmt) for r in reports]
    key = tables[0][0] if tables else ""
    blocks: list[Block] = [Heading("Appendix: every combination and direction"), Para(formula(key), "small")]
    for r, (_, head, table) in zip(reports, tables, strict=True):
        blocks += [Heading(plain(head), 2, bookmark=f"Wall {r.wall.id}"), table]
    return Section("appendix", "Appendix: every combination and direction", "Appendix: all cases", tuple(blocks))


def _appendix_table(project: Project, report: WallReport, fmt: _Fmt) -> tuple[str, str, Table]:
    """The key, the heading and the table of one wall's cases."""
    result = report.result
    rows: list[tuple[Cell, ...]] = []
    fail_rows = []
    governs: dict[int, list[str]] = {}
    for check, g in result.governing.items():
        if g.case_index is not None:
            governs.setdefault(g.case_index, []).append(_CHECK_ABBREVIATION.get(check, check.symbol))
    for k, c in enumerate(result.cases):
        ot, sl, br = c.overturning, c.sliding, c.bearing
        failing = [name for name, r in (("OT", ot), ("SL", sl), ("BR", br)) if r is not None and not r.passes]
        mark = ""
        if br is None:
            e_cell = "n/a"
        elif not br.stable:
            e_cell = fmt.number(br.eccentricity, Kind.LENGTH) + "\nno equil."
        elif br.contact_length < result.length * (1.0 - 1e-9):
            e_cell = fmt.number(br.eccentricity, Kind.LENGTH) + f"\na = {fmt.number(br.contact_length, Kind.LENGTH)}"
        else:
            e_cell = fmt.number(br.eccentricity, Kind.LENGTH)
        rows.append(
            (
                plain(_clean(c.combination) + mark),
                {"+": "+", "-": "−", "none": "none"}.get(c.direction, c.direction),
                fmt.number(c.vertical, Kind.FORCE),
                fmt.number(c.lateral, Kind.FORCE),
                fmt.number(c.moment, Kind.MOMENT),
                e_cell,
                fmt.number(ot.moment, Kind.MOMENT) if ot is not None else "n/a",
                fmt.number(ot.resisting, Kind.MOMENT) if ot is not None else "n/a",
                _short_ratio(ot.ratio, ot.required, ot.passes) if ot is not None else "n/a",
                fmt.number(sl.resistance, Kind.FORCE) if sl is not None else "n/a",
                _short_ratio(sl.ratio, sl.required, sl.passes) if sl is not None else "n/a",
                fmt.number(br.q_max, Kind.PRESSURE) if br is not None else "n/a",
                fmt.number(br.allowable, Kind.PRESSURE) if br is not None else "n/a",
                _short_ratio(br.ratio, br.required, br.passes) if br is not None else "n/a",
                ("passes" if not failing else "FAILS " + ", ".join(failing))
                + (f"\n* {', '.join(governs[k])}" if k in governs else ""),
            )
        )
        if failing:
            fail_rows.append(k)
    u = fmt.unit
    length_unit = "decimal ft" if project.units == "US" else u(Kind.LENGTH)
    headers = (
        "Combination",
        "Dir.",
        f"N ({u(Kind.FORCE)})",
        f"V ({u(Kind.FORCE)})",
        f"M ({u(Kind.MOMENT)})",
        f"e ({length_unit})",
        formula(f"M_{{OT}} ({u(Kind.MOMENT)})"),
        formula(f"M_{{R}} ({u(Kind.MOMENT)})"),
        "OT ratio",
        f"R ({u(Kind.FORCE)})",
        "SL ratio",
        formula(f"q_{{max}} ({u(Kind.PRESSURE)})"),
        formula(f"q_{{a}} ({u(Kind.PRESSURE)})"),
        "BR ratio",
        "Result",
    )
    widths = (0.19, 0.04, 0.052, 0.045, 0.058, 0.085, 0.058, 0.058, 0.061, 0.052, 0.061, 0.052, 0.045, 0.045, 0.075)
    total = sum(widths)
    any_na = any("n/a" in row for row in rows)
    key = (
        "Footing B × t_{f} × L_{f} as drawn, under each wall's heading. N vertical load on the soil, V shear, M moment about the footing's mid-length, e = M / N (lengths in "
        + ("decimal feet" if project.units == "US" else "metres")
        + '; a second line "a = ..." marks a resultant beyond the kern (middle third), with its contact length a), '
        "M_{OT} and M_{R} moments about the toe, R sliding resistance, q_{max} peak soil pressure, q_{a} allowable. "
        "Dir.: + lateral load toward x = L_{f}, − toward x = 0, none: no lateral load. OT, SL, BR: overturning, sliding, "
        'bearing. "* OT" in the result column marks the case that governs the checks named. "no dem.": no demand (no overturning '
        "moment, shear or pressure)." + (" n/a: the combination does not apply to that check." if any_na else "")
    )
    head = (
        f"{wall_title(report.wall)}: footing {fmt.length(result.width)} × {fmt.length(result.thickness)} × "
        f"{fmt.length(result.length)}"
    )
    table = Table(
        headers,
        tuple(rows),
        tuple(w / total for w in widths),
        align="LCRRRRRRRRRRRRL",
        font_size=6.5,
        fail_rows=tuple(fail_rows),
    )
    return key, head, table


# ---------------------------------------------------------------------------------------------
# Drawings
# ---------------------------------------------------------------------------------------------

# The drawings and the check sheets read the blocks above; imported last (they import this module).
from .drawings import drawing_scale, elevation_drawing, pressure_drawing, section_drawing  # noqa: E402

__all__ = [
    "CONTENT_WIDTH",
    "Arrow",
    "Block",
    "Bullets",
    "Contents",
    "ContentsEntry",
    "Dimension",
    "Drawing",
    "DrawingRow",
    "Equation",
    "Group",
    "Heading",
    "KeyValues",
    "Label",
    "Line",
    "Package",
    "Para",
    "Polygon",
    "Rect",
    "Rich",
    "Run",
    "Section",
    "Table",
    "TitleBlock",
    "Verdict",
    "WallReport",
    "build_package",
    "drawing_scale",
    "elevation_drawing",
    "pressure_drawing",
    "section_drawing",
    "Formatter",
    "formula",
    "plain",
    "ratio_text",
    "select_walls",
    "wall_report",
]

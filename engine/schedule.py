"""The footing schedule: one row per wall (size, bars, governing ratios, verdict), as rows or a CSV file.

With a concrete section in the project the schedule lists the footing's bars after its size: the
transverse bars (across the width, "#5 @ 12 in" or "plain"), the bottom and top bars along the length
("3 #5"), and for each whether it was entered in the project or designed by Kernline. They are read from
the engine's results (the flexure record and :func:`engine.concrete.along.design_along`), never
worked out here. A ratio that is no number is said in words (:mod:`engine.summary`): "no demand",
"no equilibrium".

The CSV file is meant to be opened in a spreadsheet program:

- UTF-8 with a byte-order mark (``utf-8-sig``), so spreadsheet programs that otherwise guess a legacy
  code page read unit symbols and accented labels as written (common practice);
- rows end in CR LF, the csv module's default and RFC 4180's line break; a cell holding a line break
  or a comma is quoted;
- no cell can run as a formula: a cell that begins with ``=``, ``+``, ``-``, ``@``, a tab or a carriage
  return gets a leading apostrophe, which spreadsheet programs read as "this is text" (OWASP, "CSV
  Injection", https://owasp.org/www-community/attacks/CSV_Injection). The rule is applied to every
  cell, but a cell that is a plain decimal number (``-0.35``) is left as it is, so a negative number
  stays a number; the schedule's own numbers are ratios (not negative in practice) and lengths, which
  are written with their unit (``24 in``) and so are text.
"""

from __future__ import annotations

import csv
import io
import os
import re
from collections.abc import Mapping, Sequence
from dataclasses import dataclass

from .errors import EngineError
from .file_safety import atomic_write_text
from .model import Project, Wall
from .results import WallResult, check_project
from .stability import reported_checks, table_checks
from .summary import NO_DEMAND, case_text, state_words
from .units import format_length

CSV_ENCODING = "utf-8-sig"
FORMULA_STARTS = ("=", "+", "-", "@", "\t", "\r")
"""First characters that make a spreadsheet read a cell as a formula (OWASP, "CSV Injection")."""

_PLAIN_NUMBER = re.compile(r"-?[0-9]+(\.[0-9]+)?")


def guard_cell(cell: str) -> str:
    """``cell`` as written to the CSV file: with a leading apostrophe if a spreadsheet would run it.

    A plain decimal number (``-12``, ``-0.35``) is not guarded: a spreadsheet reads it as the number
    it is, and an apostrophe would turn it into text.
    """
    if cell.startswith(FORMULA_STARTS) and not _PLAIN_NUMBER.fullmatch(cell):
        return "'" + cell
    return cell


ENTERED = "entered"
DESIGNED = "designed by Kernline"
NOT_NEEDED = "none needed"
BAR_HEADERS = (
    "Transverse bars",
    "Transverse bars from",
    "Bottom bars",
    "Bottom bars from",
    "Top bars",
    "Top bars from",
)
"""The bar columns, after the footing's size, when the project has a concrete section."""


@dataclass(frozen=True, slots=True, kw_only=True)
class FootingBars:
    """The footing's bars as the schedule shows them, each with where it came from.

    ``transverse``: across the width ("#5 @ 12 in", "No. 16 @ 305 mm", "plain", or the engine's
    words when no bars pass); ``bottom``, ``top``: along the length ("3 #5", "none needed"; ", fails"
    added where the engine's design along the length does not pass and this face is why); each ``*_from`` is
    :data:`ENTERED` (given in the project) or :data:`DESIGNED`.
    """

    transverse: str
    transverse_from: str
    bottom: str
    bottom_from: str
    top: str
    top_from: str

    def cells(self) -> list[str]:
        return [self.transverse, self.transverse_from, self.bottom, self.bottom_from, self.top, self.top_from]


def bars_in_units(text: str, units: str) -> str:
    """The flexure record's "#5 @ 12 in" in the project's units ("No. 16 @ 305 mm" in SI); other
    words ("plain", "none pass") as they are."""
    from .concrete.bars import parse_spaced, spaced_text

    try:
        the_bar, spacing = parse_spaced(text)
    except EngineError:  # "plain", "none pass": the engine's words, as they are
        return text
    return spaced_text(the_bar, spacing, units)


def transverse_entered(wall: Wall) -> bool:
    """Whether the footing's transverse bars (or "plain") were given in the project, not designed."""
    given = wall.footing.reinforcement
    return given is not None and (given.plain or given.transverse is not None)


def footing_bars(project: Project, wall: Wall, result: WallResult) -> FootingBars | None:
    """The bars of ``wall``'s footing from the engine's results (None without a concrete section).

    The transverse bars are the flexure record's (checked when entered, else chosen); the bottom and
    top bars are those of the design along the length (``result.along``, :func:`engine.concrete.along.
    design_along`), which the result works out on first use (a few milliseconds a wall) and keeps.
    """
    from .concrete.bars import counted_text

    if project.concrete is None:
        return None
    units = project.units
    given = wall.footing.reinforcement
    flexure = next((g.record for c, g in result.governing.items() if c.id == "flexure"), None)
    transverse = bars_in_units(flexure.bars, units) if flexure is not None else NO_DEMAND
    faces = [NO_DEMAND, NO_DEMAND]
    if result.along is not None:  # the engine's design along the length, kept with the result
        design = result.along[0]
        for k, face in enumerate((design.bottom, design.top)):
            shown = counted_text(face.count, face.bar, units) if face.bar is not None and face.count else NOT_NEEDED
            # a face fails only where the design along the length fails (a plain footing whose plain
            # section carries every case passes with bars that would not carry it alone)
            faces[k] = shown if face.passes or design.passes else f"{shown}, fails"
    return FootingBars(
        transverse=transverse,
        transverse_from=ENTERED if transverse_entered(wall) else DESIGNED,
        bottom=faces[0],
        bottom_from=ENTERED if given is not None and given.bottom is not None else DESIGNED,
        top=faces[1],
        top_from=ENTERED if given is not None and given.top is not None else DESIGNED,
    )


def schedule_headers(units: str, project: Project | None = None) -> list[str]:
    """Column titles of the schedule (the bars and the strength checks too when ``project`` has a
    concrete section)."""
    heads = ["Wall", "Label", "Wall length", "Footing width", "Footing thickness", "Footing length"]
    if project is not None and project.concrete is not None:
        heads += BAR_HEADERS
    for check in reported_checks(project) if project is not None else table_checks():
        name = check.title
        heads += [f"{name} ratio", f"{name} required", f"{name} governing case"]
    return heads + ["Result"]


def schedule_rows(
    project: Project, results: Sequence[WallResult], bars: Mapping[str, FootingBars | None] | None = None
) -> list[list[str]]:
    """The schedule's rows, formatted in the project's display units.

    ``bars``: each wall's :func:`footing_bars` by wall id, where the caller has them already; missing
    ones are read from the results here. "Result" is the wall's whole verdict, the design along the
    length included (``WallResult.passes_all``).
    """
    walls = {w.id: w for w in project.walls}
    rows = []
    for r in results:
        wall = walls[r.wall_id]
        row = [
            r.wall_id,
            wall.label,
            format_length(wall.length, project.units),
            format_length(r.width, project.units),
            format_length(r.thickness, project.units),
            format_length(r.length, project.units),
        ]
        if project.concrete is not None:
            known = bars.get(r.wall_id) if bars is not None else None
            shown = known if known is not None else footing_bars(project, wall, r)
            row += shown.cells() if shown is not None else [""] * len(BAR_HEADERS)
        for check in reported_checks(project):
            g = r.governing[check]
            words = state_words(g, r)
            ratio = words or f"{g.ratio:.2f}"
            row += [ratio, f"{g.required:.2f}", "" if words == NO_DEMAND else case_text(g)]
        row.append("PASS" if r.passes_all else "FAIL")  # the design along the length included
        rows.append(row)
    return rows


def schedule_csv(project: Project, results: Sequence[WallResult] | None = None) -> str:
    """The schedule as CSV text (header row first, CR LF line ends, every cell guarded by :func:`guard_cell`)."""
    results = check_project(project) if results is None else results
    buffer = io.StringIO(newline="")
    writer = csv.writer(buffer)  # the default dialect: "\r\n" line ends, quotes where a cell needs them
    for row in [schedule_headers(project.units, project), *schedule_rows(project, results)]:
        writer.writerow([guard_cell(cell) for cell in row])
    return buffer.getvalue()


def write_schedule(project: Project, path: str | os.PathLike[str], results: Sequence[WallResult] | None = None) -> None:
    """Write the schedule CSV atomically, in UTF-8 with a byte-order mark (:data:`CSV_ENCODING`).

    Raises:
        FilePathError: ``path`` cannot be written (see :func:`engine.file_safety.atomic_write_bytes`).
    """
    atomic_write_text(path, schedule_csv(project, results), encoding=CSV_ENCODING)

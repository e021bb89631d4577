"""The footing schedule: one row per wall (size, governing ratios, verdict), as rows or a CSV file.

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
import math
import os
import re
from collections.abc import Sequence

from .file_safety import atomic_write_text
from .model import Project
from .results import WallResult, check_project
from .stability import reported_checks, table_checks
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


def schedule_headers(units: str, project: Project | None = None) -> list[str]:
    """Column titles of the schedule (the strength checks too when ``project`` has a concrete section)."""
    heads = ["Wall", "Label", "Wall length", "Footing width", "Footing thickness", "Footing length"]
    for check in reported_checks(project) if project is not None else table_checks():
        name = check.title
        heads += [f"{name} ratio", f"{name} required", f"{name} governing case"]
    return heads + ["Result"]


def schedule_rows(project: Project, results: Sequence[WallResult]) -> list[list[str]]:
    """The schedule's rows, formatted in the project's display units."""
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
        for check in reported_checks(project):
            g = r.governing[check]
            if math.isinf(g.ratio):
                row += ["no demand", f"{g.required:.2f}", ""]
            elif g.case_index is None:  # a geometric check (no combination) or a strength check (its most loaded case)
                direction = "" if g.direction in ("none", "") else f" ({g.direction})"
                row += [f"{g.ratio:.2f}", f"{g.required:.2f}", g.combination + direction]
            elif check.id == "bearing" and g.ratio == 0.0:
                direction = "" if g.direction == "none" else f" ({g.direction})"
                row += ["no equilibrium", f"{g.required:.2f}", g.combination + direction]
            else:
                direction = "" if g.direction == "none" else f" ({g.direction})"
                row += [f"{g.ratio:.2f}", f"{g.required:.2f}", g.combination + direction]
        row.append("PASS" if r.passes else "FAIL")
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

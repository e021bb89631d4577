"""Plain-text summary tables for the command line (formatting of engine results only)."""

from __future__ import annotations

import math
from collections.abc import Sequence

from . import CAUTION
from .errors import one_line
from .input_warnings import InputWarning
from .model import Project
from .results import Governing, WallResult
from .sizing import SizingResult
from .units import format_length


def ratio_text(g: Governing) -> str:
    """ "1.37 >= 1.00 OK" style text of a governing ratio (no colour needed to read it)."""
    if math.isinf(g.ratio):
        return "no demand"
    if g.ratio == 0.0 and g.case_index is not None and g.check.id == "bearing":
        return "no equilibrium NG"
    verdict = "OK" if g.passes else "NG"
    sign = ">=" if g.passes else "<"
    return f"{g.ratio:.2f} {sign} {g.required:.2f} {verdict}"


def case_text(g: Governing) -> str:
    if math.isinf(g.ratio) or not g.combination:
        return ""
    return g.combination if g.direction == "none" else f"{g.combination} ({g.direction})"


def footing_text(width: float, thickness: float, length: float, units: str) -> str:
    return f"{format_length(width, units)} x {format_length(thickness, units)} x {format_length(length, units)}"


def _table(headers: Sequence[str], rows: Sequence[Sequence[str]]) -> str:
    widths = [max(len(h), *(len(r[i]) for r in rows)) if rows else len(h) for i, h in enumerate(headers)]
    line = "  ".join(h.ljust(w) for h, w in zip(headers, widths, strict=True))
    out = [line, "  ".join("-" * w for w in widths)]
    out += ["  ".join(c.ljust(w) for c, w in zip(r, widths, strict=True)) for r in rows]
    return "\n".join(line.rstrip() for line in out)


def check_table(project: Project, results: Sequence[WallResult]) -> str:
    """One row per wall: footing, the governing ratio of every registered check with its case, and the
    verdict; then the values taken by default, and the caution."""
    checks = tuple(results[0].governing) if results else ()
    headers = ["Wall", "Footing B x t_f x L_f", *[c.title for c in checks], "Governing case (worst)", "Result"]
    rows = []
    for r in results:
        worst = r.worst
        rows.append(
            [
                one_line(r.wall_id, 40),
                footing_text(r.width, r.thickness, r.length, project.units),
                *[ratio_text(r.governing[c]) for c in checks],
                f"{worst.check.id}: {case_text(worst)}".rstrip(": "),
                "PASS" if r.passes else "FAIL",
            ]
        )
    failing = sum(not r.passes for r in results)
    title = f"{project.info.name or 'Project'}: {len(results)} wall(s), {failing} failing"
    listed = assumptions_text(project)
    return f"{title}\n\n{_table(headers, rows)}\n\n" + (f"{listed}\n\n" if listed else "") + CAUTION


def size_table(project: Project, sized: Sequence[SizingResult], results: Sequence[WallResult]) -> str:
    """One row per wall: the size found (or why none) and the governing ratios at that size."""
    checks = tuple(results[0].governing) if results else ()
    headers = ["Wall", "Sized B x t_f x L_f", "Candidates", *[c.title for c in checks], "Why this size"]
    rows = []
    for s, r in zip(sized, results, strict=True):
        size = (
            footing_text(s.width, s.thickness, r.length, project.units)
            if s.feasible and s.width and s.thickness
            else "none passes"
        )
        note = s.message if s.feasible else s.message + ". " + " ".join(s.suggestions)
        rows.append(
            [
                one_line(s.wall_id, 40),
                size,
                str(s.candidates),
                *[ratio_text(r.governing[c]) if s.feasible else "" for c in checks],
                note,
            ]
        )
    listed = assumptions_text(project)
    return f"{_table(headers, rows)}\n\n" + (f"{listed}\n\n" if listed else "") + CAUTION


def assumptions_text(project: Project) -> str:
    """The values taken by default, one per line with their basis ("" when every value was entered)."""
    if not project.assumptions:
        return ""
    rows = [[one_line(a.field, 60), one_line(a.value, 40), one_line(a.basis, 100)] for a in project.assumptions]
    return "Assumed (not in the project file; confirm, or enter the value):\n" + _table(["Field", "Value", "Basis"], rows)


def warnings_text(warnings: Sequence[InputWarning]) -> str:
    """Warnings, one line each, prefixed "warning:" (for stderr)."""
    return "\n".join(f"warning: {one_line(w.text)}" for w in warnings)

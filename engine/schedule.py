"""The footing schedule: one row per wall (size, governing ratios, verdict), as rows or a CSV file."""

from __future__ import annotations

import csv
import io
import math
import os
from collections.abc import Sequence

from .model import ALL_CHECKS, Project
from .project_file import atomic_write_text
from .results import WallResult, check_project
from .units import format_length


def schedule_headers(units: str) -> list[str]:
    """Column titles of the schedule."""
    heads = ["Wall", "Label", "Wall length", "Footing width", "Footing thickness", "Footing length"]
    for check in ALL_CHECKS:
        name = check.value.capitalize()
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
        for check in ALL_CHECKS:
            g = r.governing[check]
            if math.isinf(g.ratio):
                row += ["no demand", f"{g.required:.2f}", ""]
            else:
                direction = "" if g.direction == "none" else f" ({g.direction})"
                row += [f"{g.ratio:.2f}", f"{g.required:.2f}", g.combination + direction]
        row.append("PASS" if r.passes else "FAIL")
        rows.append(row)
    return rows


def schedule_csv(project: Project, results: Sequence[WallResult] | None = None) -> str:
    """The schedule as CSV text (header row first)."""
    results = check_project(project) if results is None else results
    buffer = io.StringIO()
    writer = csv.writer(buffer, lineterminator="\n")
    writer.writerow(schedule_headers(project.units))
    writer.writerows(schedule_rows(project, results))
    return buffer.getvalue()


def write_schedule(project: Project, path: str | os.PathLike[str], results: Sequence[WallResult] | None = None) -> None:
    """Write the schedule CSV atomically."""
    from pathlib import Path

    atomic_write_text(Path(path), schedule_csv(project, results))

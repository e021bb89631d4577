"""Small helpers shared by the window tests (typing into fields, reading the engine's answer)."""

from __future__ import annotations

import copy
import json
from typing import Any

from kernline.engine.project_file import parse_project
from kernline.engine.resources import resource_path
from kernline.engine.results import check_wall
from kernline.engine.soil_pressure import pressure_diagram
from PySide6.QtCore import Qt

PSF = 4.4482216152605 / 0.3048**2  # Pa per psf (exact definitions, NIST SP 811)
INCH = 0.0254


def demo_raw() -> dict[str, Any]:
    return json.loads(resource_path("demo.kernline").read_text(encoding="utf-8"))


def wall_index(window, wall_id: str) -> int:
    return [w.id for w in window.document.project.walls].index(wall_id)


def select_wall(window, wall_id: str) -> None:
    window.document.set_current_index(wall_index(window, wall_id))


def field(window, *path: Any):
    """The QuantityField bound to ``path`` (a wall field's path starts below the wall)."""
    for group in (window.wall_form.group, window.project_form.group):
        for f in group.fields:
            if f.spec.path == tuple(path):
                return f
    raise KeyError(path)


def type_into(qtbot, f, text: str) -> None:
    """Replace the field's text by typing, then press Enter."""
    f.edit.selectAll()
    qtbot.keyClick(f.edit, Qt.Key.Key_Backspace)
    qtbot.keyClicks(f.edit, text)
    qtbot.keyClick(f.edit, Qt.Key.Key_Return)


def engine_answer(raw: dict[str, Any], wall_id: str):
    """Parse ``raw`` independently of the window and check the wall with the engine."""
    project = parse_project(copy.deepcopy(raw))
    wall = next(w for w in project.walls if w.id == wall_id)
    return project, wall, check_wall(project, wall)


def engine_pressure_psf(result, index: int):
    """The engine's pressure ordinates (psf) of case ``index`` of ``result``."""
    case = result.cases[index]
    e = case.bearing.eccentricity
    diagram = pressure_diagram(case.vertical, e, result.width, result.length)
    return diagram.q / PSF

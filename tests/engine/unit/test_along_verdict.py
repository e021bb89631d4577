"""The design along the length in the wall's verdict, the results JSON and sizing.

Statics and ACI 318-19 rules are tested in tests/engine/properties/test_beam_diagram_properties.py and
tests/engine/verification; here: the wiring. The demo's walls are used as inputs only (invented).
"""

from __future__ import annotations

import copy
import json
from dataclasses import replace

from kernline.engine.project_file import parse_project
from kernline.engine.resources import resource_path
from kernline.engine.results import along_lines, check_wall, results_json
from kernline.engine.sizing import size_footing


def demo() -> dict:
    return json.loads(resource_path("demo.kernline").read_text(encoding="utf-8"))


def test_bars_too_light_along_the_length_fail_the_wall_in_json_and_words():
    raw = demo()
    c3 = next(w for w in raw["walls"] if w["id"] == "C3")
    c3["footing"]["width"] = "20 in"  # passes bearing and the design across the width
    c3["footing"]["reinforcement"] = {"transverse": "plain", "bottom": "2 #4", "top": "2 #4"}
    project = parse_project(copy.deepcopy(raw))
    wall = next(w for w in project.walls if w.id == "C3")
    result = check_wall(project, wall)
    assert result.passes and not result.passes_along and not result.passes_all
    doc = results_json((result,), project=project)
    assert doc["walls"][0]["passes"] is False
    assert doc["walls"][0]["concrete"]["longitudinal"]["passes"] is False
    (line,) = along_lines((result,))
    assert line.startswith("C3: bottom 2 #4 (entered)") and "FAILS" in line


def test_without_a_concrete_section_there_is_no_design_along_the_length():
    raw = demo()
    raw.pop("concrete")
    project = parse_project(raw)
    result = check_wall(project, project.walls[0])
    assert result.along is None and result.passes_along and along_lines((result,)) == []


def test_sizing_skips_sizes_that_fail_along_the_length():
    """S2's plain footing with 2 #5 top and bottom: the thinnest sizes that pass the grid's checks
    fail along the length (the plain section is too weak and the bars are below 0.0018 B h)."""
    project = parse_project(demo())
    wall = next(w for w in project.walls if w.id == "S2")
    sized = size_footing(project, wall)
    assert sized.feasible and "along the length" in sized.message
    chosen = replace(wall, footing=replace(wall.footing, width=sized.width, thickness=sized.thickness))
    assert check_wall(project, chosen).passes_all


def test_a_plain_footing_whose_bars_fail_is_never_said_to_be_carried_by_its_bars():
    """A case the plain section does not carry and whose bars fail reads as failing in words, even
    when its own design carries no message (the words go to the first failure the design keeps)."""
    from kernline.engine.concrete.along import _plain_along

    raw = demo()
    c3 = next(w for w in raw["walls"] if w["id"] == "C3")
    c3["footing"]["width"] = "20 in"
    c3["footing"]["reinforcement"] = {"transverse": "plain", "bottom": "2 #4", "top": "2 #4"}
    project = parse_project(copy.deepcopy(raw))
    wall = next(w for w in project.walls if w.id == "C3")
    design = check_wall(project, wall).along[0]
    assert not design.plain_carries and not design.passes and "plain section does not carry" in design.message
    bare = replace(design, message="", plain_carries=None)
    concrete = project.concrete
    (again,) = _plain_along([bare], wall.footing.width, wall.footing.thickness, concrete.fc, concrete.lam)
    assert not again.passes and not again.plain_carries
    assert "the bars carry them" not in again.message and again.message.endswith("nor do the bars")

"""The drawing numbers of the footing's section (engine.concrete.view_data): they repeat the strength
checks' design, with the bars placed as common practice details them.

Sources: ASTM A615/A615M Table 1 (#5 = 0.625 in); ACI 318-19 Table 13.2.7.1 (the moment section of a
footing under a concrete wall is at the wall's face: c = (B - t)/2); even spacing between the side
covers (common practice, derived in the module).
"""

from __future__ import annotations

import copy
import json

import pytest
from kernline.engine.concrete.along import design_along
from kernline.engine.concrete.view_data import bar_centres, section_data
from kernline.engine.project_file import parse_project
from kernline.engine.resources import resource_path
from kernline.engine.results import check_wall

INCH = 0.0254


def _result(wall_id: str, concrete: bool = True):
    raw = json.loads(resource_path("demo.kernline").read_text(encoding="utf-8"))
    raw = copy.deepcopy(raw)
    if not concrete:
        raw.pop("concrete", None)
    project = parse_project(raw)
    wall = next(w for w in project.walls if w.id == wall_id)
    return check_wall(project, wall)


def test_bar_centres_run_between_the_side_covers():
    """3 bars of 0.625 in in 20 in with 3 in cover: 3.3125, 10, 16.6875 in (D)."""
    centres = bar_centres(20 * INCH, 3 * INCH, 0.625 * INCH, 3)
    assert [c / INCH for c in centres] == pytest.approx([3.3125, 10.0, 16.6875], rel=1e-12)
    assert bar_centres(20 * INCH, 3 * INCH, 0.625 * INCH, 1) == (pytest.approx(10 * INCH),)
    assert bar_centres(20 * INCH, 3 * INCH, 0.625 * INCH, 0) == ()


def test_reinforced_section_repeats_the_given_bars():
    """K5 (concrete wall, #5 @ 12 in given): the bar, its spacing, its height and c = (B - t)/2."""
    result = _result("K5")
    along, _i, _d = design_along(result.strength_table, result.strength_evaluation)
    data = section_data(result, along)
    assert data is not None and not data.plain
    assert data.transverse_bar is not None and data.transverse_bar.size == 5
    assert data.transverse_spacing == pytest.approx(12 * INCH, rel=1e-9)
    assert data.transverse_height == pytest.approx(3 * INCH + 0.3125 * INCH, rel=1e-9)
    wall_t = result.strength_table.wall.supported_thickness
    assert data.moment_section == pytest.approx((result.width - wall_t) / 2, rel=1e-9)
    bottom = next(r for r in data.rows if r.face == "bottom")
    # the bottom bars rest on the transverse bars
    assert bottom.height == pytest.approx(3 * INCH + 0.625 * INCH + bottom.bar.diameter / 2, rel=1e-9)
    assert len(bottom.across) == along.bottom.count


def test_plain_section_has_no_transverse_bars():
    """N1 is plain across the width: no transverse bar; its given 2 #4 bottom sit at cover + db/2."""
    result = _result("N1")
    along, _i, _d = design_along(result.strength_table, result.strength_evaluation)
    data = section_data(result, along)
    assert data is not None and data.plain and data.transverse_bar is None
    bottom = next(r for r in data.rows if r.face == "bottom")
    assert bottom.height == pytest.approx(3 * INCH + 0.25 * INCH, rel=1e-9)


def test_no_concrete_section_no_data():
    assert section_data(_result("N1", concrete=False)) is None

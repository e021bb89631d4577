"""Sizing mechanics: candidate grid, choice rule, agreement with the single check, diagnosis."""

from dataclasses import replace

import numpy as np
import pytest
from kernline.engine.model import ALL_CHECKS, INCH, Check
from kernline.engine.project_file import parse_project
from kernline.engine.results import check_wall
from kernline.engine.sizing import candidate_values, size_footing
from kernline.engine.stability import case_table, evaluate

FOOT = 0.3048


def project(loads=None, sizing=None, footing=None, soil=None, wall_thickness="8 in"):
    wall = {
        "id": "T1",
        "length": "12 ft",
        "thickness": wall_thickness,
        "footing": footing or {"width": "24 in", "thickness": "12 in", "extension_start": "1 ft", "extension_end": "1 ft"},
        "loads": loads
        or [
            {"type": "line", "case": "D", "value": "900 plf"},
            {"type": "line", "case": "L", "value": "700 plf"},
            {"type": "point", "case": "D", "value": "3 kip", "at": "9 ft"},
            {"type": "lateral", "case": "W", "value": "4 kip", "height": "18 ft"},
            {"type": "lateral", "case": "E", "value": "3 kip", "height": "12 ft"},
        ],
    }
    if sizing:
        wall["sizing"] = sizing
    raw = {"format": "kernline-project", "version": 1, "criteria": {"sds": 0.5}, "walls": [wall]}
    raw["soil"] = {"allowable_bearing": "2000 psf", "friction": 0.35, "unit_weight": "110 pcf", **(soil or {})}
    return parse_project(raw)


def test_candidate_values_include_the_upper_bound_despite_rounding():
    """12 in to 8 ft by 1 in has 85 values and ends exactly at 96 in (common practice: inclusive bounds)."""
    values = candidate_values(12 * INCH, 96 * INCH, INCH)
    assert values.size == 85
    assert values[-1] == pytest.approx(96 * INCH)
    assert candidate_values(0.3, 0.9, 0.1).size == 7  # 0.1 is not exact in binary


def test_grid_evaluation_equals_the_single_check():
    """The sizing grid and a single check run the same code: every cell equals a direct check."""
    p = project()
    wall = p.walls[0]
    table = case_table(wall, p.soil, p.criteria)
    widths = np.array([18, 24, 36]) * INCH
    thicknesses = np.array([12, 18]) * INCH
    grid = evaluate(table, widths[None, :], thicknesses[:, None])
    for r, d in enumerate(thicknesses):
        for c, b in enumerate(widths):
            single = check_wall(p, replace(wall, footing=replace(wall.footing, width=float(b), thickness=float(d))))
            for j, check in enumerate(ALL_CHECKS):
                ratios = (grid.overturning_ratio, grid.sliding_ratio, grid.bearing_ratio)[j][:, r, c]
                assert float(np.min(ratios)) == pytest.approx(single.governing[check].ratio, rel=1e-12)


def test_choice_is_least_area_then_thinner_then_narrower():
    """The chosen size has the least B*D of all passing candidates; among equals the thinnest."""
    p = project()
    s = size_footing(p, p.walls[0])
    assert s.feasible
    area = s.thicknesses[:, None] * s.widths[None, :]
    best = area[s.passes].min()
    assert s.width * s.thickness == pytest.approx(best)
    ties = np.argwhere(s.passes & np.isclose(area, best))
    assert s.thickness == pytest.approx(min(s.thicknesses[r] for r, _ in ties))


def test_never_narrower_than_the_wall_it_carries():
    """Candidates narrower than the wall (or stem) are not allowed even when they would pass."""
    p = project(
        footing={"width": "24 in", "thickness": "12 in"},
        loads=[{"type": "line", "case": "D", "value": "100 plf"}],
        sizing={"width_min": "12 in", "width_max": "24 in"},  # 12 in: the least width IBC 2021 1809.4 allows
        wall_thickness="16 in",
    )
    s = size_footing(p, p.walls[0])
    assert not s.allowed[:, s.widths < 16 * INCH - 1e-9].any()
    assert s.width == pytest.approx(16 * INCH)


def test_infeasible_sizing_says_which_check_fails_and_what_helps():
    """A wall that overturns at every size in bounds: the message names the check and the shortfall."""
    p = project(
        loads=[
            {"type": "line", "case": "D", "value": "100 plf"},
            {"type": "lateral", "case": "W", "value": "40 kip", "height": "30 ft"},
        ],
        sizing={"width_max": "3 ft", "thickness_max": "18 in"},
    )
    s = size_footing(p, p.walls[0])
    assert not s.feasible and s.width is None
    assert "overturning reaches" in s.message
    text = " ".join(s.suggestions)
    assert "overturning" in text
    assert "longer footing" in text or "wider" in text or "deeper" in text
    at_max = s.check_normalized[:, -1, -1]
    assert at_max[ALL_CHECKS.index(Check.OVERTURNING)] < 1.0


def test_an_absurd_grid_is_refused_when_the_file_is_read():
    """Steps far too fine for the range are refused with the field path, before any memory is taken."""
    from kernline.engine.errors import InputError

    with pytest.raises(InputError) as err:
        project(sizing={"width_max": "900 m", "width_step": "1 mm"})
    assert err.value.field == "walls[0].sizing.width_step"
    assert "coarser steps" in err.value.problem


def test_next_narrower_candidate_below_the_wall_is_named_as_such():
    """The message does not blame a check for a candidate refused only for being narrower than the wall."""
    p = project(
        footing={"width": "18 in", "thickness": "12 in"},
        loads=[{"type": "line", "case": "D", "value": "100 plf"}],
        sizing={"width_min": "12 in", "width_max": "24 in"},
        wall_thickness="16 in",
    )
    s = size_footing(p, p.walls[0])
    assert s.width == pytest.approx(16 * INCH)
    assert "next narrower one is narrower than the wall" in s.message


def test_no_equilibrium_at_the_largest_size_is_said_in_words():
    """When the resultant stays beyond the footing's end, the diagnosis says so and what helps."""
    p = project(
        loads=[
            {"type": "line", "case": "D", "value": "50 plf"},
            {"type": "lateral", "case": "W", "value": "60 kip", "height": "30 ft"},
        ],
        sizing={"width_max": "24 in", "thickness_max": "18 in"},
    )
    s = size_footing(p, p.walls[0])
    assert not s.feasible
    assert "no equilibrium" in s.message
    assert any(t.startswith("bearing:") and "would help" in t for t in s.suggestions)

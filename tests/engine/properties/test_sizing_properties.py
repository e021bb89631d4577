"""Automatic sizing chooses a footing that passes and that no smaller candidate could replace.

Contract (issue 2, "Sizing"): candidates run from the minimum to the maximum in fixed steps; the
choice is the passing candidate with the least B*D. So the chosen size passes when checked on its own
(``check_wall``), and the next narrower and the next thinner candidates fail (or lie outside the
bounds, or are narrower than the wall). When nothing passes, the largest candidate fails.
"""

from __future__ import annotations

import dataclasses

import numpy as np
from hypothesis import given, settings
from hypothesis import strategies as st
from kernline.engine.errors import InputError
from kernline.engine.project_file import parse_project
from kernline.engine.results import check_wall
from kernline.engine.sizing import size_footing

FAST = settings(max_examples=60, deadline=None)


def _num(value: float) -> str:
    return repr(float(value))


@st.composite
def projects(draw, passive_only: bool = False):
    """A wall with gravity, wind and maybe seismic loads; with ``passive_only`` sliding is resisted by
    passive pressure alone, so that the footing's thickness matters to the choice."""
    length = draw(st.floats(3.0, 30.0))
    loads = [
        {"type": "line", "case": "D", "value": f"{_num(draw(st.floats(0.1, 6.0)))} klf"},
        {"type": "line", "case": "L", "value": f"{_num(draw(st.floats(0.0, 4.0)))} klf"},
        {
            "type": "lateral",
            "case": "W",
            "value": f"{_num(draw(st.floats(0.2, 15.0)))} kip",
            "height": f"{_num(draw(st.floats(0.0, 20.0)))} ft",
        },
    ]
    if draw(st.booleans()):
        loads.append(
            {
                "type": "point",
                "case": "W",
                "value": f"{_num(draw(st.floats(-10.0, 10.0)))} kip",
                "at": f"{_num(draw(st.floats(0.0, 1.0)) * length)} ft",
            }
        )
    if draw(st.booleans()):
        loads.append(
            {
                "type": "lateral",
                "case": "E",
                "value": f"{_num(draw(st.floats(0.2, 15.0)))} kip",
                "height": f"{_num(draw(st.floats(0.0, 20.0)))} ft",
            }
        )
    wall = {
        "id": "Z1",
        "length": f"{_num(length)} ft",
        "thickness": f"{draw(st.sampled_from([6, 8, 10, 12, 16]))} in",
        "footing": {
            "width": "24 in",
            "thickness": "12 in",
            "extension_start": f"{_num(draw(st.floats(0.0, 3.0)))} ft",
            "extension_end": f"{_num(draw(st.floats(0.0, 3.0)))} ft",
            "cover": f"{_num(draw(st.floats(0.0, 2.0)))} ft",
        },
        "loads": loads,
        "sizing": {
            "width_min": f"{draw(st.sampled_from([12, 18, 24]))} in",  # IBC 2021 1809.4: at least 12 in
            "width_max": f"{draw(st.sampled_from([48, 72, 96]))} in",
            "width_step": f"{draw(st.sampled_from([1, 2, 3]))} in",
            "thickness_min": f"{draw(st.sampled_from([8, 12]))} in",
            "thickness_max": f"{draw(st.sampled_from([24, 36]))} in",
            "thickness_step": f"{draw(st.sampled_from([1, 2]))} in",
        },
    }
    criteria = {"method": "asce7-16-asd", "sds": draw(st.floats(0.0, 1.5))} if draw(st.booleans()) else {"method": "service-fs"}
    soil = {
        "allowable_bearing": f"{_num(draw(st.floats(1000, 5000)))} psf",
        "friction": draw(st.floats(0.0, 0.6)),
        "cohesion": f"{_num(draw(st.floats(0, 300)))} psf",
        "passive": f"{_num(draw(st.floats(0, 1500)))} pcf",
        "unit_weight": f"{_num(draw(st.floats(90, 130)))} pcf",
    }
    if passive_only:
        soil.update(friction=0.0, cohesion="0 psf", passive=f"{_num(draw(st.floats(500, 3000)))} pcf")
    return {"format": "kernline-project", "version": 1, "criteria": criteria, "soil": soil, "walls": [wall]}


def _passes(project, wall, width: float, thickness: float) -> bool | None:
    """check_wall on the given size; None when the size is not a valid footing for the wall."""
    try:
        resized = dataclasses.replace(
            wall, footing=dataclasses.replace(wall.footing, width=float(width), thickness=float(thickness))
        )
    except InputError:
        return None  # narrower than the wall it carries
    return check_wall(project, resized).passes


@FAST
@given(st.one_of(projects(), projects(passive_only=True)))
def test_sized_footing_passes_and_next_smaller_does_not(raw):
    """The chosen size passes; the next narrower and next thinner candidates fail or are out of bounds."""
    project = parse_project(raw)
    wall = project.walls[0]
    sized = size_footing(project, wall)
    if not sized.feasible:
        assert _passes(project, wall, sized.widths[-1], sized.thicknesses[-1]) in (False, None)
        assert not sized.passes.any()
        return
    col = int(np.flatnonzero(sized.widths == sized.width)[0])
    row = int(np.flatnonzero(sized.thicknesses == sized.thickness)[0])
    assert sized.passes[row, col]
    assert _passes(project, wall, sized.width, sized.thickness) is True
    if col > 0:
        assert _passes(project, wall, sized.widths[col - 1], sized.thickness) in (False, None)
    if row > 0:
        assert _passes(project, wall, sized.width, sized.thicknesses[row - 1]) in (False, None)


@FAST
@given(projects())
def test_sized_footing_has_the_least_area_of_the_passing_candidates(raw):
    """No passing candidate on the map has a smaller B*D than the chosen one; ties go to the thinner, then the narrower."""
    project = parse_project(raw)
    sized = size_footing(project, project.walls[0])
    if sized.feasible:
        area = sized.thicknesses[:, None] * sized.widths[None, :]
        chosen = sized.width * sized.thickness
        assert area[sized.passes].min() >= chosen * (1.0 - 1e-9)
        # ties on B*D go to the thinner candidate, then the narrower
        rows, cols = np.nonzero(sized.passes & np.isclose(area, chosen, rtol=1e-9, atol=0.0))
        assert sized.thicknesses[rows].min() == sized.thickness
        assert sized.widths[cols[sized.thicknesses[rows] == sized.thickness]].min() == sized.width


@FAST
@given(projects())
def test_feasibility_map_agrees_with_single_checks(raw):
    """A few candidates of the map, checked one at a time with check_wall, pass exactly where the map says."""
    project = parse_project(raw)
    wall = project.walls[0]
    sized = size_footing(project, wall)
    rows, cols = sized.passes.shape
    for r, c in {(0, 0), (rows - 1, cols - 1), (rows // 2, cols // 2), (0, cols - 1), (rows - 1, 0)}:
        single = _passes(project, wall, sized.widths[c], sized.thicknesses[r])
        assert bool(sized.passes[r, c]) == bool(single)
        assert (single is None) == (not sized.allowed[r, c])

"""Plain concrete wall footings in seismic design categories C to F, and plain footings along their length.

Sources:
- IBC 2021 1905.6.2, which replaces ACI 318-19 14.1.4 (the section number is from memory; the model
  text is R as reproduced in local adoptions, e.g. San Mateo (CA) Municipal Code 23.08.130): "Plain
  concrete footings supporting walls are permitted provided the footings have at least two
  continuous longitudinal reinforcing bars. Bars shall not be smaller than No. 4 and shall have a
  total area of not less than 0.002 times the gross cross-sectional area of the footing", with a bar
  at the top and one at the bottom of a footing more than 8 in thick.
- ACI 318-19 14.5.1.7 (h - 2 in for strength when cast against soil), 14.5.2.1 (Mn = 5λ√f'c Sm),
  14.5.5.1 (Vn = (4/3)λ√f'c b h), Table 21.2.1 (φ = 0.60); 21.2.4.3 (φ for shear in SDC D to F).
- Bar areas: ASTM A615 (#4 0.20 in², #5 0.31 in²).
Hand arithmetic (D) in each docstring.
"""

from __future__ import annotations

import copy
import math

import pytest
from kernline.engine.concrete.bars import parse_counted
from kernline.engine.concrete.plain import plain_seismic_grid, plain_seismic_words
from kernline.engine.errors import InputError
from kernline.engine.project_file import parse_project
from kernline.engine.results import check_wall, longitudinal_json

INCH = 0.0254
LB_IN = 4.4482216152605 * INCH  # N·m


def _grid(sdc, bottom=None, top=None, width=18 * INCH, thickness=12 * INCH):
    return plain_seismic_grid(
        sdc=sdc,
        bottom=parse_counted(bottom) if bottom else None,
        top=parse_counted(top) if top else None,
        width=width,
        thickness=thickness,
    )


def test_nothing_asked_without_a_category_or_in_a_and_b():
    assert not _grid(None).applies
    assert not _grid("A").applies and not _grid("B").applies
    assert plain_seismic_words(_grid("B")) == ""


@pytest.mark.parametrize("sdc", ["C", "D", "E", "F"])
def test_two_bars_no_4_or_larger_totalling_0_002_ag(sdc):
    """18 in x 12 in: 0.002 Ag = 0.002 x 216 = 0.432 in²; 2 #4 + 1 #4 = 0.60 in², ratio 1.389 (D)."""
    grid = _grid(sdc, "2 #4", "1 #4")
    assert float(grid.ratio) == pytest.approx(0.60 / 0.432, rel=1e-3)
    assert plain_seismic_words(grid) == ""


def test_bars_short_of_0_002_ag_are_refused_in_words():
    """30 in x 18 in: 0.002 Ag = 1.08 in²; 2 #4 + 2 #4 = 0.80 in², ratio 0.741 (D)."""
    grid = _grid("D", "2 #4", "2 #4", width=30 * INCH, thickness=18 * INCH)
    assert float(grid.ratio) == pytest.approx(0.80 / 1.08, rel=1e-3)
    assert "0.002" in plain_seismic_words(grid)


def test_no_bars_small_bars_and_one_face_refused():
    assert "at least two continuous" in plain_seismic_words(_grid("D"))
    assert "not #3" in plain_seismic_words(_grid("D", "2 #3", "1 #4"))
    one_face = _grid("D", "3 #5", None)  # 12 in > 8 in: a bar at the top and one at the bottom
    assert float(one_face.ratio) == 0.0 and "top" in plain_seismic_words(one_face)
    thin = _grid("D", "2 #4", None, thickness=8 * INCH)  # 8 in: one face is enough
    assert float(thin.ratio) == pytest.approx(0.40 / (0.002 * 18 * 8), rel=1e-3)


def _project(reinforcement, sdc="D", **footing):
    raw = {
        "format": "kernline-project",
        "version": 1,
        "criteria": {"method": "asce7-16-asd", "sds": 0.5, "seismic_design_category": sdc},
        "soil": {"allowable_bearing": "2000 psf", "friction": 0.35, "unit_weight": "110 pcf"},
        "concrete": {"fc": "3000 psi", "fy": "60 ksi", "cover": "3 in"},
        "walls": [
            {
                "id": "P1",
                "length": "24 ft",
                "thickness": "6 in",
                "construction": "light-frame",
                "footing": {"width": "18 in", "thickness": "12 in", "cover": "12 in", "reinforcement": reinforcement, **footing},
                "loads": [{"type": "line", "case": "D", "value": "600 plf"}, {"type": "line", "case": "L", "value": "300 plf"}],
            }
        ],
    }
    return parse_project(copy.deepcopy(raw))


def _flexure(project):
    result = check_wall(project, project.walls[0])
    return next(g for c, g in result.governing.items() if c.id == "flexure"), result


def test_plain_across_with_bars_along_is_read_from_the_file():
    project = _project({"transverse": "plain", "bottom": "2 #4", "top": "1 #4"})
    given = project.walls[0].footing.reinforcement
    assert given.plain and given.bottom[0] == 2 and given.top[0] == 1
    with pytest.raises(InputError):
        _project({"transverse": "plane"})


def test_a_plain_footing_without_bars_fails_flexure_in_category_d_with_the_reason():
    flexure, result = _flexure(_project("plain"))
    assert not flexure.passes and not result.passes
    assert "IBC 2021 1905.6.2" in flexure.record.message
    passing, _ = _flexure(_project({"transverse": "plain", "bottom": "2 #4", "top": "1 #4"}))
    assert passing.passes and passing.record.message == ""
    low, _ = _flexure(_project("plain", sdc="B"))
    assert low.passes


def test_the_strength_design_takes_the_seismic_shear_phi_in_category_d():
    """φ = 0.60 instead of 0.75 for one-way shear (ACI 318-19 21.2.4.3): the capacity scales by 0.8."""

    def shear(sdc):
        project = _project({"transverse": "#4 @ 12 in"}, sdc=sdc, width="60 in")
        result = check_wall(project, project.walls[0])
        return next(g for c, g in result.governing.items() if c.id == "one_way_shear").record

    assert shear("D").shear_capacity == pytest.approx(0.8 * shear("B").shear_capacity, rel=1e-9)


def test_a_plain_footing_along_its_length_uses_the_plain_section():
    """18 in x 12 in, h_s = 10 in: φMn = 0.60 x 5 x √3000 x 18 x 10²/6 = 49,295 lb-in; φVn = 0.60 x
    (4/3) x √3000 x 18 x 10 = 7,888 lb (D). Uniform loads on a uniform pressure: no moment, passes."""
    project = _project({"transverse": "plain", "bottom": "2 #4", "top": "1 #4"})
    along = longitudinal_json(check_wall(project, project.walls[0]))
    assert along is not None and along["passes"]
    root = math.sqrt(3000.0)
    assert along["plain_moment_capacity"] == pytest.approx(0.60 * 5 * root * 18 * 100 / 6 * LB_IN, rel=1e-6)
    assert along["plain_shear_capacity"] == pytest.approx(0.60 * 4 / 3 * root * 18 * 10 * 4.4482216152605, rel=1e-6)


def test_a_missing_seismic_design_category_is_warned_with_e_loads_and_a_concrete_design():
    from kernline.engine.input_warnings import input_warnings

    project = _project("plain", sdc="D")
    raw_without = {"criteria.seismic_design_category"}
    assert not [w for w in input_warnings(project) if w.field in raw_without]  # no E loads here
    import json

    from kernline.engine.resources import resource_path

    raw = json.loads(resource_path("demo.kernline").read_text(encoding="utf-8"))
    del raw["criteria"]["seismic_design_category"]
    warned = [w for w in input_warnings(parse_project(raw)) if w.field == "criteria.seismic_design_category"]
    assert len(warned) == 1 and "21.2.4.3" in warned[0].message


def test_the_engine_says_whether_the_plain_section_carries_the_length():
    """Uniform loads: no moment along the length, the plain section carries it. The demo's N1 (light-frame
    chord couple on an 18 in x 12 in plain footing): |M| well above φMn = 49,295 lb-in, so its bars must."""
    import json

    from kernline.engine.resources import resource_path

    project = _project({"transverse": "plain", "bottom": "2 #4", "top": "1 #4"})
    assert longitudinal_json(check_wall(project, project.walls[0]))["plain_carries"] is True
    demo = parse_project(json.loads(resource_path("demo.kernline").read_text(encoding="utf-8")))
    n1 = longitudinal_json(check_wall(demo, demo.walls[0]))
    assert n1["plain_carries"] is False and n1["passes"] is True
    assert max(abs(n1["moment_bottom"]), abs(n1["moment_top"])) > n1["plain_moment_capacity"]

"""Properties of the stability checks of a whole wall, checked with hypothesis.

Statics behind each (status D; docs/verification.md, "Property tests" and case 1, and the issue's
"Mechanics" contract): a wall and its loads that are symmetric about the wall's mid-length give the
same ratios when the lateral load acts either way; adding dead load adds resisting moment about the
toe and so never lowers the overturning ratio; with centred resisting loads FS = L/(2e); with the
self weight off, a wider footing carries the same N and e on more area, so the peak pressure never
rises; a footing with no downward load on the soil has no equilibrium (bearing ratio 0, the wall
fails, and nothing raises).
"""

from __future__ import annotations

import dataclasses
import math

import pytest
from hypothesis import given, settings
from hypothesis import strategies as st
from kernline.engine.model import ALL_CHECKS, Check, LineLoad, LoadCase
from kernline.engine.project_file import parse_project
from kernline.engine.results import check_wall

FAST = settings(max_examples=60, deadline=None)
FT = 0.3048


def _num(value: float) -> str:
    return repr(float(value))


def _criteria(draw) -> dict:
    if draw(st.booleans()):
        return {"method": "asce7-16-asd", "sds": draw(st.floats(0.0, 2.0))}
    return {"method": "service-fs"}


def _soil(draw) -> dict:
    return {
        "allowable_bearing": f"{_num(draw(st.floats(1000, 6000)))} psf",
        "friction": draw(st.floats(0.0, 0.6)),
        "cohesion": f"{_num(draw(st.floats(0, 400)))} psf",
        "passive": f"{_num(draw(st.floats(0, 400)))} pcf",
        "passive_ignore": f"{_num(draw(st.floats(0, 1.5)))} ft",
        "unit_weight": f"{_num(draw(st.floats(90, 130)))} pcf",
    }


def _project(criteria: dict, soil: dict, wall: dict) -> dict:
    return {"format": "kernline-project", "version": 1, "criteria": criteria, "soil": soil, "walls": [wall]}


@st.composite
def symmetric_projects(draw):
    """A wall, footing and loads symmetric about the wall's mid-length (W point loads reverse)."""
    length = draw(st.floats(4.0, 40.0))
    extension = draw(st.floats(0.0, 5.0))
    loads = [{"type": "line", "case": "D", "value": f"{_num(draw(st.floats(0.2, 5.0)))} klf"}]
    if draw(st.booleans()):
        loads.append({"type": "line", "case": "L", "value": f"{_num(draw(st.floats(0.0, 3.0)))} klf"})
    if draw(st.booleans()):  # a symmetric pair of dead point loads
        a = draw(st.floats(0.0, 0.5)) * length
        p = _num(draw(st.floats(0.0, 30.0)))
        loads += [
            {"type": "point", "case": "D", "value": f"{p} kip", "at": f"{_num(a)} ft"},
            {"type": "point", "case": "D", "value": f"{p} kip", "at": f"{_num(length - a)} ft"},
        ]
    if draw(st.booleans()):  # a hold-down or chord force that moves with the shear
        at = draw(st.floats(0.0, 1.0)) * length
        value = draw(st.floats(-20.0, 20.0))
        loads.append({"type": "point", "case": "W", "value": f"{_num(value)} kip", "at": f"{_num(at)} ft", "reverses": True})
    loads.append(
        {
            "type": "lateral",
            "case": "W",
            "value": f"{_num(draw(st.floats(0.5, 30.0)))} kip",
            "height": f"{_num(draw(st.floats(0.0, 30.0)))} ft",
        }
    )
    if draw(st.booleans()):
        loads.append(
            {
                "type": "lateral",
                "case": "E",
                "value": f"{_num(draw(st.floats(0.5, 30.0)))} kip",
                "height": f"{_num(draw(st.floats(0.0, 30.0)))} ft",
            }
        )
    wall = {
        "id": "M1",
        "length": f"{_num(length)} ft",
        "thickness": "8 in",
        "footing": {
            "width": f"{_num(draw(st.floats(1.0, 8.0)))} ft",
            "thickness": f"{_num(draw(st.floats(0.75, 3.0)))} ft",
            "extension_start": f"{_num(extension)} ft",
            "extension_end": f"{_num(extension)} ft",
            "cover": f"{_num(draw(st.floats(0.0, 2.0)))} ft",
        },
        "loads": loads,
    }
    return _project(_criteria(draw), _soil(draw), wall)


@st.composite
def projects(draw, *, self_weight: bool = True):
    """A wall with loads anywhere on it, a lateral W (and maybe E), and any soil."""
    length = draw(st.floats(4.0, 40.0))
    loads = [{"type": "line", "case": "D", "value": f"{_num(draw(st.floats(0.2, 5.0)))} klf"}]
    for case in ("D", "L", "S"):
        if draw(st.booleans()):
            loads.append(
                {
                    "type": "point",
                    "case": case,
                    "value": f"{_num(draw(st.floats(0.0, 30.0)))} kip",
                    "at": f"{_num(draw(st.floats(0.0, 1.0)) * length)} ft",
                }
            )
    if draw(st.booleans()):
        loads.append(
            {
                "type": "point",
                "case": "W",
                "value": f"{_num(draw(st.floats(-20.0, 20.0)))} kip",
                "at": f"{_num(draw(st.floats(0.0, 1.0)) * length)} ft",
            }
        )
    loads.append(
        {
            "type": "lateral",
            "case": "W",
            "value": f"{_num(draw(st.floats(0.5, 30.0)))} kip",
            "height": f"{_num(draw(st.floats(0.0, 30.0)))} ft",
        }
    )
    if draw(st.booleans()):
        loads.append(
            {
                "type": "lateral",
                "case": "E",
                "value": f"{_num(draw(st.floats(0.5, 30.0)))} kip",
                "height": f"{_num(draw(st.floats(0.0, 30.0)))} ft",
            }
        )
    soil = _soil(draw)
    footing = {
        "width": f"{_num(draw(st.floats(1.0, 8.0)))} ft",
        "thickness": f"{_num(draw(st.floats(0.75, 3.0)))} ft",
        "extension_start": f"{_num(draw(st.floats(0.0, 5.0)))} ft",
        "extension_end": f"{_num(draw(st.floats(0.0, 5.0)))} ft",
        "cover": f"{_num(draw(st.floats(0.0, 2.0)))} ft",
    }
    if not self_weight:
        footing["unit_weight"] = "0 pcf"
        soil["unit_weight"] = "0 pcf"
    wall = {"id": "P1", "length": f"{_num(length)} ft", "thickness": "8 in", "footing": footing, "loads": loads}
    return _project(_criteria(draw), soil, wall)


def _same(a: float, b: float) -> bool:
    if math.isinf(a) or math.isinf(b):
        return a == b
    return a == pytest.approx(b, rel=1e-9, abs=1e-9)


@FAST
@given(symmetric_projects())
def test_symmetric_wall_same_ratios_both_directions(raw):
    """Each combination's '+' and '-' cases have equal ratios for every check."""
    project = parse_project(raw)
    result = check_wall(project, project.walls[0])
    plus = [c for c in result.cases if c.direction == "+"]
    minus = [c for c in result.cases if c.direction == "-"]
    assert [c.combination for c in plus] == [c.combination for c in minus]
    for a, b in zip(plus, minus, strict=True):
        for check in ALL_CHECKS:
            ra, rb = a.of(check), b.of(check)
            assert (ra is None) == (rb is None)
            if ra is not None:
                assert _same(ra.ratio, rb.ratio), (a.combination, check)
        if a.bearing is not None:
            assert _same(a.bearing.eccentricity, -b.bearing.eccentricity)


@FAST
@given(symmetric_projects())
def test_symmetric_wall_governing_ratio_same_both_directions(raw):
    """The lowest ratio / required over the '+' cases equals that over the '-' cases, for each check."""
    project = parse_project(raw)
    result = check_wall(project, project.walls[0])
    for check in ALL_CHECKS:
        lowest = {}
        for direction in ("+", "-"):
            ratios = [
                c.of(check).ratio / c.of(check).required
                for c in result.cases
                if c.direction == direction and c.of(check) is not None
            ]
            lowest[direction] = min(ratios, default=math.inf)
        assert _same(lowest["+"], lowest["-"]), check


@FAST
@given(projects(), st.floats(0.0, 1.0), st.floats(0.0, 1.0), st.floats(0.01, 50.0))
def test_more_dead_load_never_lowers_overturning_ratio(raw, a, b, klf):
    """Adding a dead line load anywhere on the wall never lowers any case's overturning ratio."""
    project = parse_project(raw)
    wall = project.walls[0]
    before = check_wall(project, wall)
    start, end = sorted((a * wall.length, b * wall.length))
    if end - start < 1e-3:
        end = min(start + 1.0, wall.length)
        start = end - 1.0 if end - 1.0 >= 0.0 else 0.0
    extra = LineLoad(case=LoadCase.D, value=klf * 4448.2216152605 / FT, start=start, end=end)
    heavier = dataclasses.replace(wall, loads=wall.loads + (extra,))
    after = check_wall(project, heavier)
    for c0, c1 in zip(before.cases, after.cases, strict=True):
        if c0.overturning is not None:  # service-fs gravity combinations check bearing only
            assert c1.overturning.ratio >= c0.overturning.ratio * (1.0 - 1e-12)
    g0, g1 = before.governing[Check.OVERTURNING], after.governing[Check.OVERTURNING]
    assert g1.ratio >= g0.ratio * (1.0 - 1e-12)


@FAST
@given(projects(), st.floats(1.0, 3.0))
def test_heavier_footing_never_lowers_overturning_ratio(raw, factor):
    """A denser footing (more self weight, at the centre) never lowers the overturning ratio."""
    project = parse_project(raw)
    wall = project.walls[0]
    heavier = dataclasses.replace(wall, footing=dataclasses.replace(wall.footing, unit_weight=wall.footing.unit_weight * factor))
    g0 = check_wall(project, wall).governing[Check.OVERTURNING]
    g1 = check_wall(project, heavier).governing[Check.OVERTURNING]
    assert g1.ratio >= g0.ratio * (1.0 - 1e-12)


@st.composite
def centred_projects(draw):
    """Every vertical load centred and downward, lateral W; custom factors on D and W."""
    length = draw(st.floats(4.0, 40.0))
    extension = draw(st.floats(0.0, 5.0))
    wall = {
        "id": "I1",
        "length": f"{_num(length)} ft",
        "thickness": "8 in",
        "footing": {
            "width": f"{_num(draw(st.floats(1.0, 8.0)))} ft",
            "thickness": f"{_num(draw(st.floats(0.75, 3.0)))} ft",
            "extension_start": f"{_num(extension)} ft",
            "extension_end": f"{_num(extension)} ft",
        },
        "loads": [
            {"type": "line", "case": "D", "value": f"{_num(draw(st.floats(0.0, 5.0)))} klf"},
            {"type": "point", "case": "D", "value": f"{_num(draw(st.floats(0.0, 50.0)))} kip", "at": f"{_num(length / 2.0)} ft"},
            {
                "type": "lateral",
                "case": "W",
                "value": f"{_num(draw(st.floats(0.5, 60.0)))} kip",
                "height": f"{_num(draw(st.floats(0.0, 40.0)))} ft",
            },
        ],
    }
    criteria = {
        "combinations": [{"name": "fD + gW", "factors": {"D": draw(st.floats(0.3, 1.5)), "W": draw(st.floats(0.3, 1.5))}}]
    }
    return _project(criteria, {"allowable_bearing": "2000 psf", "friction": 0.35, "unit_weight": "110 pcf"}, wall)


@FAST
@given(centred_projects())
def test_overturning_ratio_is_l_over_2e_for_centred_loads(raw):
    """With every resisting load centred, FS_OT = L / (2|e|) in both directions."""
    project = parse_project(raw)
    result = check_wall(project, project.walls[0])
    for case in result.cases:
        assert case.overturning.ratio == pytest.approx(result.length / (2.0 * abs(case.bearing.eccentricity)), rel=1e-9)


@FAST
@given(projects(self_weight=False), st.floats(1.0, 4.0))
def test_wider_footing_never_raises_peak_pressure(raw, factor):
    """Self weight off: a wider footing gives every case the same N and e and no higher q_max."""
    project = parse_project(raw)
    wall = project.walls[0]
    wider = dataclasses.replace(wall, footing=dataclasses.replace(wall.footing, width=wall.footing.width * factor))
    narrow, wide = check_wall(project, wall), check_wall(project, wider)
    for c0, c1 in zip(narrow.cases, wide.cases, strict=True):
        assert c1.vertical == pytest.approx(c0.vertical, rel=1e-12, abs=1e-9)
        if c0.bearing is not None:
            assert c1.bearing.q_max <= c0.bearing.q_max * (1.0 + 1e-12)
    assert wide.governing[Check.BEARING].ratio >= narrow.governing[Check.BEARING].ratio * (1.0 - 1e-12)


@FAST
@given(st.floats(0.1, 5.0), st.floats(1.0, 3.0), st.floats(4.0, 40.0))
def test_uplift_beyond_dead_load_has_no_equilibrium(dead_klf, uplift_factor, length):
    """Net uplift on the soil (N <= 0): bearing ratio 0, the wall fails, no exception."""
    wall = {
        "id": "U1",
        "length": f"{_num(length)} ft",
        "thickness": "8 in",
        "footing": {"width": "2 ft", "thickness": "1 ft", "unit_weight": "0 pcf"},
        "loads": [
            {"type": "line", "case": "D", "value": f"{_num(dead_klf)} klf"},
            {"type": "line", "case": "W", "value": f"{_num(-dead_klf * uplift_factor)} klf"},
            {"type": "lateral", "case": "W", "value": "1 kip", "height": "10 ft"},
        ],
    }
    criteria = {"combinations": [{"name": "D + W", "factors": {"D": 1.0, "W": 1.0}}]}
    project = parse_project(_project(criteria, {"allowable_bearing": "2000 psf", "friction": 0.35, "unit_weight": "0 pcf"}, wall))
    result = check_wall(project, project.walls[0])
    for case in result.cases:
        assert case.vertical <= 1e-9 * abs(dead_klf)
        assert not case.bearing.stable
        assert case.bearing.ratio == 0.0
        assert not case.bearing.passes
        assert case.sliding.friction == 0.0
    assert not result.passes

"""Design-case expansion and load bookkeeping (engine.combinations, engine.loads, engine.stability)."""

import pytest
from kernline.engine.combinations import asce7_16_asd, design_cases, service_fs
from kernline.engine.loads import self_weight, vertical_resultants
from kernline.engine.model import Check, LoadCase
from kernline.engine.project_file import parse_project
from kernline.engine.results import check_wall

FOOT, INCH = 0.3048, 0.0254
KIP = 4448.2216152605


def make(loads, criteria=None, footing=None, stem=None):
    wall = {
        "id": "A",
        "length": "10 ft",
        "thickness": "6 in",
        "footing": footing or {"width": "2 ft", "thickness": "1 ft", "extension_start": "2 ft", "extension_end": "0 ft"},
        "loads": loads,
    }
    if stem:
        wall["stem"] = stem
    soil = {"allowable_bearing": "2000 psf", "friction": 0.35, "unit_weight": "110 pcf"}
    raw = {"format": "kernline-project", "version": 1, "soil": soil, "walls": [wall]}
    raw["criteria"] = criteria or {"sds": 0.0}
    return parse_project(raw)


def test_asce7_16_asd_preset_has_the_sixteen_combinations():
    """ASCE 7-16 2.4.1 with 2.4.5 seismic forms: 16 combinations; S_DS enters the dead-load factor."""
    combos = asce7_16_asd(1.0)
    assert len(combos) == 16
    names = [c.name for c in combos]
    assert "0.6D + 0.6W" in names and "1.14D + 0.7E" in names and "0.46D + 0.7E" in names
    assert "1.105D + 0.75L + 0.525E + 0.75S" in names


def test_lateral_combinations_expand_to_both_directions():
    """Combinations with W or E give '+' and '-' cases when the wall has a lateral load; others 'none'."""
    cases = design_cases(asce7_16_asd(0.0), frozenset({LoadCase.W}))
    directions = {(c.combination.name, c.direction.value) for c in cases}
    assert ("0.6D + 0.6W", "+") in directions and ("0.6D + 0.6W", "-") in directions
    assert ("D + L", "none") in directions
    # E combinations act laterally only if the wall has a seismic shear
    assert ("1D + 0.7E", "none") in directions
    assert len(design_cases(service_fs(), frozenset())) == 9


def test_service_fs_checks_gravity_combinations_for_bearing_only():
    combos = {c.name: c.checks for c in service_fs()}
    assert combos["D + W"] == frozenset(Check)
    assert combos["D + L"] == frozenset({Check.BEARING})


def test_line_and_point_resultants_in_footing_coordinates():
    """A line load's resultant acts at its mid-point; positions shift by the start extension."""
    p = make(
        [
            {"type": "line", "case": "D", "value": "1 klf", "start": "2 ft", "end": "6 ft"},
            {"type": "point", "case": "E", "value": "-2 kip", "at": "1 ft"},
        ]
    )
    line, point = vertical_resultants(p.walls[0])
    assert line.force == pytest.approx(4 * KIP)
    assert line.x == pytest.approx(6 * FOOT)  # 2 ft extension + 4 ft
    assert line.x_reversed == line.x  # D loads do not reverse
    assert point.x == pytest.approx(3 * FOOT)
    assert point.x_reversed == pytest.approx(11 * FOOT)  # mirror about the wall's mid-length (7 ft)


def test_self_weight_of_footing_stem_and_cover():
    """gc B D L + gc ts hs L + gs c (B - ts) L (issue 2 contract; hand arithmetic)."""
    p = make(
        [{"type": "line", "case": "D", "value": "1 klf"}],
        footing={"width": "3 ft", "thickness": "1 ft", "cover": "1 ft", "extension_end": "2 ft"},
        stem={"height": "2 ft", "thickness": "1 ft"},
    )
    sw = self_weight(p.walls[0], p.soil, 3 * FOOT, 1 * FOOT)
    lbf = 4.4482216152605
    assert sw.footing == pytest.approx(150 * 3 * 1 * 12 * lbf)  # 5,400 lb
    assert sw.stem == pytest.approx(150 * 1 * 2 * 12 * lbf)  # 3,600 lb
    assert sw.soil == pytest.approx(110 * 1 * (3 - 1) * 12 * lbf)  # 2,640 lb


def test_reversing_uplift_governs_in_both_directions_equally():
    """A symmetric pair of reversing chord forces gives the same overturning ratio in '+' and '-'."""
    loads = [
        {"type": "line", "case": "D", "value": "500 plf"},
        {"type": "point", "case": "E", "value": "-3 kip", "at": "0 ft"},
        {"type": "point", "case": "E", "value": "3 kip", "at": "10 ft"},
        {"type": "lateral", "case": "E", "value": "2 kip", "height": "10 ft"},
    ]
    p = make(loads, footing={"width": "2 ft", "thickness": "1 ft", "extension_start": "1 ft", "extension_end": "1 ft"})
    r = check_wall(p, p.walls[0])
    by_case = {(c.combination, c.direction): c for c in r.cases}
    plus, minus = by_case[("0.6D + 0.7E", "+")], by_case[("0.6D + 0.7E", "-")]
    assert plus.overturning.ratio == pytest.approx(minus.overturning.ratio, rel=1e-12)
    assert plus.bearing.eccentricity == pytest.approx(-minus.bearing.eccentricity, rel=1e-12)
    # the uplift at the heel overturns: with it the ratio is lower than without it
    without = make(
        loads[:1] + loads[3:], footing={"width": "2 ft", "thickness": "1 ft", "extension_start": "1 ft", "extension_end": "1 ft"}
    )
    r0 = check_wall(without, without.walls[0])
    assert r.governing[Check.OVERTURNING].ratio < r0.governing[Check.OVERTURNING].ratio


def test_no_lateral_load_means_no_overturning_or_sliding_demand():
    p = make([{"type": "line", "case": "D", "value": "500 plf"}])
    r = check_wall(p, p.walls[0])
    assert r.governing[Check.OVERTURNING].ratio == float("inf")
    assert r.governing[Check.SLIDING].ratio == float("inf")
    assert r.passes


def test_bearing_increase_applies_only_with_wind_or_seismic():
    """The allowable is raised only in combinations that carry W or E (IBC 2021 1806.1 usage)."""
    loads = [
        {"type": "line", "case": "D", "value": "500 plf"},
        {"type": "lateral", "case": "W", "value": "1 kip", "height": "10 ft"},
    ]
    p = make(loads, criteria={"bearing_increase": 1.3333})
    r = check_wall(p, p.walls[0])
    for case in r.cases:
        expected = p.soil.allowable_bearing * (1.3333 if "W" in case.combination or "E" in case.combination else 1.0)
        assert case.bearing.allowable == pytest.approx(expected)

"""The footing's concrete design run through whole walls: project file → strength combinations →
net soil pressure of the factored wall loads → ACI 318-19 checks → results, sizing and JSON.

Sources (docs/verification.md cases 18 and 19): McCormac & Brown, *Design of Reinforced Concrete*,
9th ed., Example 12.1 (R): 12 in concrete wall, D = 20 k/ft, L = 15 k/ft, f'c = 3000 psi, fy = 60
ksi, cover 3 in, B = 10 ft, h = 20 in, #7 @ 10 in; q_u = (1.2·20 + 1.6·15)/10 = 4.80 ksf, Mu = 48.6
ft-k/ft; under ACI 318-19 22.5.5.1(c) with λs neglected (13.2.6.2) φVc ≈ 10.0 k/ft < Vu ≈ 15.0 k/ft
(D). The masonry/concrete pair of case 18 (D): an 8 in wall on a 30 in × 10 in plain footing with
q_u = 3.04 ksf passes as a concrete wall and fails as a masonry wall.
"""

from __future__ import annotations

import json

import pytest
from kernline.engine.project_file import parse_project
from kernline.engine.results import check_wall, results_json
from kernline.engine.sizing import size_footing

KSF = 47_880.25898033586  # Pa (NIST SP 811)
KIP_PER_FT = 4448.2216152605 / 0.3048  # N/m
KIP_FT_PER_FT = 4448.2216152605  # N·m/m
INCH = 0.0254


def example_12_1(**footing) -> dict:
    return {
        "format": "kernline-project",
        "version": 1,
        "soil": {"allowable_bearing": "4 ksf", "friction": 0.35, "unit_weight": "100 pcf"},
        "concrete": {"fc": "3000 psi", "fy": "60 ksi", "cover": "3 in"},
        "walls": [
            {
                "id": "M1",
                "length": "10 ft",
                "thickness": "12 in",
                "construction": "concrete",
                "footing": {"width": "10 ft", "thickness": "20 in", "cover": "28 in", **footing},
                "loads": [
                    {"type": "line", "case": "D", "value": "20 klf"},
                    {"type": "line", "case": "L", "value": "15 klf"},
                ],
            }
        ],
    }


def governing(result, check_id):
    return next(g for c, g in result.governing.items() if c.id == check_id)


def test_example_12_1_through_a_wall():
    """q_u 4.80 ksf from 1.2D + 1.6L, Mu 48.6 ft-k/ft; the book's #7 @ 10 in fails one-way shear under 318-19."""
    project = parse_project(example_12_1(reinforcement={"transverse": "#7 @ 10 in"}))
    result = check_wall(project, project.walls[0])
    flexure, shear = governing(result, "flexure"), governing(result, "one_way_shear")
    assert flexure.record.q_u == pytest.approx(4.80 * KSF, rel=1e-6)  # R
    assert flexure.combination.startswith("1.2D + 1.6L")
    assert flexure.record.moment == pytest.approx(48.6 * KIP_FT_PER_FT, rel=1e-3)  # R
    assert shear.record.shear == pytest.approx(14.975 * KIP_PER_FT, rel=1e-3)  # D: Kernline's d = 16.5625 in
    assert shear.record.shear_capacity == pytest.approx(10.03 * KIP_PER_FT, rel=2e-3)  # D
    assert flexure.passes and not shear.passes and not result.passes


def test_sizing_thickens_the_footing_until_one_way_shear_passes():
    """Sizing with the strength checks never proposes a footing that fails one-way shear."""
    raw = example_12_1()
    raw["walls"][0]["sizing"] = {"width_min": "10 ft", "width_max": "10 ft", "thickness_min": "12 in", "thickness_max": "40 in"}
    project = parse_project(raw)
    sized = size_footing(project, project.walls[0])
    assert sized.feasible
    assert sized.thickness > 20 * INCH  # the book's 20 in fails ACI 318-19 one-way shear
    assert "one_way_shear" in [c.id for c in sized.checks]
    thinner = sized.thickness - INCH
    from dataclasses import replace

    wall = project.walls[0]
    at_thinner = check_wall(project, replace(wall, footing=replace(wall.footing, width=sized.width, thickness=thinner)))
    assert not governing(at_thinner, "one_way_shear").passes


def test_masonry_and_concrete_walls_on_the_same_plain_footing():
    """Table 13.2.7.1: the masonry section lies further in, so the same plain footing fails as masonry."""

    def plain_footing(construction: str):
        # q_u = 3.04 ksf on a 30 in wide strip: 1.2D + 1.6L = 3.04 × 2.5 = 7.6 k/ft, e.g. D = 3.0, L = 2.5 k/ft
        raw = example_12_1()
        wall = raw["walls"][0]
        wall.update(thickness="8 in", construction=construction)
        wall["footing"] = {"width": "30 in", "thickness": "10 in", "cover": "14 in", "reinforcement": "plain"}
        wall["loads"] = [{"type": "line", "case": "D", "value": "3.0 klf"}, {"type": "line", "case": "L", "value": "2.5 klf"}]
        project = parse_project(raw)
        return governing(check_wall(project, project.walls[0]), "flexure")

    concrete, masonry = plain_footing("concrete"), plain_footing("masonry")
    assert concrete.record.q_u == pytest.approx(3.04 * KSF, rel=1e-6)  # (1.2·3.0 + 1.6·2.5)/2.5
    assert concrete.record.moment == pytest.approx(1.277 * KIP_FT_PER_FT, rel=2e-3)  # D, at the face
    assert masonry.record.moment == pytest.approx(1.784 * KIP_FT_PER_FT, rel=2e-3)  # D, halfway in
    assert concrete.record.moment_capacity == pytest.approx(1.753 * KIP_FT_PER_FT, rel=2e-3)  # D, 0.60·5√3000·128 in³
    assert concrete.passes and not masonry.passes


def test_results_json_carries_the_concrete_design():
    """Per wall, "concrete" holds the transverse design in SI; governing has flexure and one_way_shear."""
    project = parse_project(example_12_1(reinforcement={"transverse": "#7 @ 10 in"}))
    doc = results_json((check_wall(project, project.walls[0]),), project=project)
    wall = doc["walls"][0]
    assert {"flexure", "one_way_shear"} <= set(wall["governing"])
    transverse = wall["concrete"]["transverse"]
    assert transverse["bars"] == "#7 @ 10 in" and wall["concrete"]["plain"] is False
    assert transverse["q_u"] == pytest.approx(4.80 * KSF, rel=1e-6)
    json.dumps(doc, allow_nan=False)


def test_without_a_concrete_section_no_strength_check_runs():
    """The stability checks alone, as before, when the project asks for no concrete design."""
    raw = example_12_1()
    del raw["concrete"]
    project = parse_project(raw)
    result = check_wall(project, project.walls[0])
    assert {c.id for c in result.governing} == {"overturning", "sliding", "bearing", "embedment"}


@pytest.mark.parametrize("construction", ["concrete", "masonry", "light-frame"])
def test_the_footing_beam_closes_in_every_strength_case(construction):
    """Statics: wall loads, chord couple or rigid-wall pressure, self weight and the soil balance, so
    V and M vanish beyond the far end in every strength case of every demo wall."""
    from kernline.engine.concrete.along import case_diagram
    from kernline.engine.resources import resource_path

    raw = json.loads(resource_path("demo.kernline").read_text(encoding="utf-8"))
    raw["concrete"] = {}
    for wall in raw["walls"]:
        wall["construction"] = construction
    project = parse_project(raw)
    for wall in project.walls:
        result = check_wall(project, wall)
        table, ev = result.strength_table, result.strength_evaluation
        for i in range(len(table.cases)):
            if not bool(ev.statics.stable[i]):
                continue
            diagram = case_diagram(table, ev, i)
            scale = abs(float(ev.statics.vertical[i])) * table.length + 1.0
            assert abs(diagram.closure_moment) <= 1e-9 * scale, (wall.id, i)
            assert abs(diagram.closure_shear) <= 1e-9 * (abs(float(ev.statics.vertical[i])) + 1.0), (wall.id, i)


def test_results_json_reports_the_design_along_the_length():
    """The governing strength case along the length, its bars and its diagram [[x, V, M], ...]."""
    from kernline.engine.resources import resource_path

    raw = json.loads(resource_path("demo.kernline").read_text(encoding="utf-8"))
    raw["concrete"] = {}
    project = parse_project(raw)
    doc = results_json(tuple(check_wall(project, w) for w in project.walls), project=project)
    for wall in doc["walls"]:
        along = wall["concrete"]["longitudinal"]
        assert along["bars_bottom"] and along["diagram"] and len(along["diagram"][0]) == 3
        first = along["diagram"][0]
        assert first[0] == pytest.approx(0.0) and first[2] == pytest.approx(0.0, abs=1e-6)  # M = 0 at the free start
        assert isinstance(along["passes"], bool)
    json.dumps(doc, allow_nan=False)

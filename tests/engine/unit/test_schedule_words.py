"""Results said in words, never as 0.00 (engine.schedule, engine.summary): a case with no equilibrium,
a check with no demand, no passing size within the sizing bounds; and the margin words.

The tipping wall is our own: a 3 ft wall on a 12 in x 12 in footing 5 ft long, 100 plf dead load and a
10 kip shear 10 ft up: M = 10 x (10 + 1) = 110 kip-ft about the base against N of about 1.4 kip, so
e = M / N is far beyond L_f / 2 = 2.5 ft and the resultant leaves the footing (statics).
"""

from __future__ import annotations

import json

import pytest
from kernline.engine.project_file import parse_project
from kernline.engine.resources import resource_path
from kernline.engine.results import check_project, check_wall
from kernline.engine.schedule import schedule_csv, schedule_headers, schedule_rows
from kernline.engine.sizing import size_footing
from kernline.engine.summary import (
    NO_DEMAND,
    NO_EQUILIBRIUM,
    OUTSIDE_BOUNDS,
    check_table,
    comparison_text,
    margin_text,
    ratio_text,
    size_table,
    state_words,
    verdict_text,
)

CONCRETE = {"fc": "3000 psi", "fy": "60 ksi", "cover": "3 in", "lambda": 1.0, "strength_method": "asce7-16-lrfd"}
TIPPING = {
    "id": "T1",
    "label": "tipping wall",
    "length": "3 ft",
    "thickness": "6 in",
    "footing": {"width": "12 in", "thickness": "12 in", "extension_start": "1 ft", "extension_end": "1 ft", "cover": "12 in"},
    "loads": [
        {"type": "line", "case": "D", "value": "100 plf"},
        {"type": "lateral", "case": "W", "value": "10 kip", "height": "10 ft"},
    ],
    "sizing": {
        "width_min": "12 in",
        "width_max": "24 in",
        "width_step": "1 in",
        "thickness_min": "12 in",
        "thickness_max": "18 in",
        "thickness_step": "1 in",
    },
}


def project_with_tipping_wall(concrete: bool = False):
    raw = json.loads(resource_path("demo.kernline").read_text(encoding="utf-8"))
    raw.pop("concrete", None)
    for wall in raw["walls"]:
        wall["footing"].pop("reinforcement", None)
    if concrete:
        raw["concrete"] = dict(CONCRETE)
    raw["walls"].append(json.loads(json.dumps(TIPPING)))
    return parse_project(raw)


def tipping_result(project):
    wall = next(w for w in project.walls if w.id == "T1")
    return wall, check_wall(project, wall)


def test_the_tipping_wall_has_no_equilibrium():
    """The engine's own finding, which the words below rely on: bearing's governing case is unstable."""
    _wall, result = tipping_result(project_with_tipping_wall())
    g = next(g for c, g in result.governing.items() if c.id == "bearing")
    assert g.ratio == 0.0 and not bool(result.evaluation.stable[g.case_index])


@pytest.mark.parametrize("concrete", [False, True])
def test_schedule_says_no_equilibrium_and_no_demand(concrete: bool):
    project = project_with_tipping_wall(concrete)
    results = check_project(project)
    heads = schedule_headers(project.units, project)
    row = next(r for r in schedule_rows(project, results) if r[0] == "T1")
    assert row[heads.index("Bearing ratio")] == NO_EQUILIBRIUM
    assert "0.00" not in row
    csv_row = next(line for line in schedule_csv(project, results).split("\r\n") if line.startswith("T1,"))
    assert NO_EQUILIBRIUM in csv_row and ",0.00," not in csv_row
    result = next(r for r in results if r.wall_id == "T1")
    for check, g in result.governing.items():  # every check: its words, or its ratio as a number
        words = state_words(g, result)
        assert row[heads.index(f"{check.title} ratio")] == (words or f"{g.ratio:.2f}")


def test_schedule_says_no_demand_without_lateral_load():
    """A wall with dead load only: overturning and sliding have no demand, in words, with no case."""
    raw = json.loads(resource_path("demo.kernline").read_text(encoding="utf-8"))
    raw["walls"][0]["loads"] = [{"type": "line", "case": "D", "value": "500 plf"}]
    project = parse_project(raw)
    heads = schedule_headers(project.units, project)
    row = schedule_rows(project, check_project(project))[0]
    for name in ("Overturning", "Sliding"):
        assert row[heads.index(f"{name} ratio")] == NO_DEMAND
        assert row[heads.index(f"{name} governing case")] == ""


def test_check_table_says_no_equilibrium():
    project = project_with_tipping_wall(concrete=True)
    table = check_table(project, check_project(project))
    line = next(line for line in table.splitlines() if line.startswith("T1 "))
    assert "no equilibrium NG" in line and "0.00" not in line


def test_size_table_says_outside_the_sizing_bounds():
    """No 12-24 in x 12-18 in footing 5 ft long holds the tipping wall: the size reads in words."""
    project = project_with_tipping_wall()
    wall, _ = tipping_result(project)
    sized = size_footing(project, wall)
    assert not sized.feasible
    table = size_table(project, [sized], [check_wall(project, wall)])
    line = next(line for line in table.splitlines() if line.startswith("T1 "))
    assert OUTSIDE_BOUNDS in line and "0.00" not in line and "none passes" not in line


def test_ratio_text_words():
    project = project_with_tipping_wall()
    _wall, result = tipping_result(project)
    bearing = next(g for c, g in result.governing.items() if c.id == "bearing")
    assert ratio_text(bearing, result) == "no equilibrium NG"
    assert verdict_text(bearing, result) == NO_EQUILIBRIUM
    assert comparison_text(bearing, result, project.units) == NO_EQUILIBRIUM


@pytest.mark.parametrize(
    ("ratio", "required", "passes", "words"),
    [
        (2000.0 / 1720.0, 1.0, True, "14% margin"),  # 1 - 1720/2000 = 0.14
        (1.0, 1.0, True, "0% margin"),
        (2.0, 1.5, True, "25% margin"),  # usable capacity C/1.5: 1 - 1.5/2 = 0.25
        (2000.0 / 2250.0, 1.0, False, "11% short"),  # 1 - 0.889 = 0.111
        (0.997, 1.0, False, "1% short"),  # a failing ratio never reads 0% short
        (0.0224, 1.0, False, "98% short"),
    ],
)
def test_margin_words(ratio: float, required: float, passes: bool, words: str):
    """Margin = 1 - R / ratio rounded down; shortfall = 1 - ratio / R rounded, at least 1% (derived here)."""
    assert margin_text(ratio, required, passes) == words


def test_comparisons_are_the_records_numbers():
    """C3 of the demo: bearing reads the record's compared pressure against its allowable, in psf."""
    from kernline.engine.units import Kind, format_quantity

    project = project_with_tipping_wall()
    wall = next(w for w in project.walls if w.id == "C3")
    result = check_wall(project, wall)
    g = next(g for c, g in result.governing.items() if c.id == "bearing")
    record = result.cases[g.case_index].bearing
    q = format_quantity(record.pressure_compared, Kind.PRESSURE, "US").removesuffix(" psf")
    a = format_quantity(record.allowable, Kind.PRESSURE, "US")
    assert comparison_text(g, result, "US") == f"{q} of {a} allowable"
    o = next(g for c, g in result.governing.items() if c.id == "overturning")
    text = comparison_text(o, result, "SI")
    shown = format_quantity(result.cases[o.case_index].overturning.moment, Kind.MOMENT, "SI", 1).removesuffix(" kN·m")
    assert text.startswith(f"{shown} against ") and text.endswith(" kN·m resisting")

"""Result fields the calculation package reads instead of working them out itself.

Source: the kern of a rectangular footing is its middle third, e <= L/6 (Bowles, Foundation Analysis
and Design, 5th ed., section 4-8; Das, Principles of Foundation Engineering) — arithmetic on the
footing length.
"""

from __future__ import annotations

import copy

import pytest
from kernline.engine.project_file import load_project, parse_project
from kernline.engine.resources import resource_path
from kernline.engine.results import check_wall
from kernline.engine.soil_pressure import kern_eccentricity


def test_kern_eccentricity_is_a_sixth_of_the_length() -> None:
    """A 30 ft footing: e_k = 5 ft (L/6, Bowles 4-8)."""
    assert kern_eccentricity(30 * 0.3048) == pytest.approx(5 * 0.3048)


def test_bearing_record_carries_the_kern_eccentricity() -> None:
    """Every case's bearing record names L_f/6 of the wall's footing (an 11 ft footing: 1.8333 ft)."""
    raw = copy.deepcopy(load_project(resource_path("demo.kernline")).raw)
    wall = raw["walls"][0]
    wall["length"] = "7 ft"
    wall["footing"]["extension_start"] = "2 ft"
    wall["footing"]["extension_end"] = "2 ft"
    for load in wall["loads"]:
        load.pop("start", None)
        load.pop("end", None)
        if "at" in load:
            load["at"] = "3 ft"
        if "height" in load:
            load["height"] = "10 ft"
    project = parse_project(raw)
    result = check_wall(project, project.walls[0])
    assert result.length == pytest.approx(11 * 0.3048)
    for case in result.cases:
        assert case.bearing is not None
        assert case.bearing.kern_eccentricity == pytest.approx(11 * 0.3048 / 6)

"""A wall that passes every check across the width but fails the design along the length is reported
as failing everywhere the package gives a verdict: the cover, the summary schedule, the wall's sheet
and the sizing table (the same verdict as ``WallResult.passes_all``, the JSON's "passes" and the exit
code of ``kernline check``). The demo's wall C3 is used as an input only (invented)."""

from __future__ import annotations

import json

import pytest
from kernline.engine.project_file import parse_project
from kernline.engine.resources import resource_path
from kernline.engine.results import check_wall
from report_helpers import RenderedPackage, render


@pytest.fixture(scope="module")
def project():
    raw = json.loads(resource_path("demo.kernline").read_text(encoding="utf-8"))
    c3 = next(w for w in raw["walls"] if w["id"] == "C3")
    c3["footing"]["width"] = "20 in"  # passes bearing and the design across the width
    c3["footing"]["reinforcement"] = {"transverse": "plain", "bottom": "2 #4", "top": "2 #4"}  # too light along L_f
    return parse_project(raw)


@pytest.fixture(scope="module")
def package(project) -> RenderedPackage:
    return render(project, wall_ids=["C3"])


def test_the_engine_says_c3_passes_across_and_fails_along(project) -> None:
    result = check_wall(project, next(w for w in project.walls if w.id == "C3"))
    assert result.passes and not result.passes_along and not result.passes_all


def test_cover_schedule_and_wall_sheet_say_it_fails(package: RenderedPackage) -> None:
    text = " ".join(package.pages)
    assert "1 of 1 wall FAILS on its current footing: C3" in text
    assert "FAILS: along the length" in text  # the summary schedule's result cell
    assert "Wall C3 passes every check" in text and "but FAILS the design along the length" in text
    assert "PASSES every check" not in text
    assert "current footing passes" not in text  # the sizing table's state of the current footing

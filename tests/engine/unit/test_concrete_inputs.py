"""The footing's concrete inputs in the project file: the concrete section, the wall's construction,
the footing's reinforcement (engine.project_file)."""

from __future__ import annotations

import json

import pytest
from kernline.engine.errors import InputError
from kernline.engine.input_warnings import input_warnings
from kernline.engine.model import WallConstruction
from kernline.engine.project_file import parse_project
from kernline.engine.resources import resource_path

PSI = 4.4482216152605 / 0.0254**2  # NIST SP 811
INCH = 0.0254


def demo() -> dict:
    """The demo without its concrete section, walls' construction and reinforcement (each test adds what it tests)."""
    raw = json.loads(resource_path("demo.kernline").read_text(encoding="utf-8"))
    raw.pop("concrete", None)
    for wall in raw["walls"]:
        wall.pop("construction", None)
        wall["footing"].pop("reinforcement", None)
    return raw


def test_concrete_section_values_and_defaults():
    """Entered values are read; the others are listed as assumed with their basis."""
    raw = demo()
    raw["concrete"] = {"fc": "4000 psi"}
    project = parse_project(raw)
    assert project.concrete.fc == pytest.approx(4000 * PSI)
    assert project.concrete.fy == pytest.approx(60_000 * PSI)  # Grade 60 (ASTM A615)
    assert project.concrete.cover == pytest.approx(3 * INCH)  # ACI 318-19 Table 20.5.1.3.1, cast against earth
    assert project.concrete.strength_method.id == "asce7-16-lrfd"
    found = {a.field: a.value for a in project.assumptions}
    assert found["concrete.fy"] == "60,000 psi" and found["concrete.cover"] == '3"'
    assert "concrete.fc" not in found
    assert found["walls[0].construction"] == "light-frame"


def test_without_a_concrete_section_nothing_about_it_is_assumed():
    """The wall's construction only matters to the concrete design: no assumption without it."""
    project = parse_project(demo())
    assert project.concrete is None
    assert not [a for a in project.assumptions if a.field.endswith(("construction", "chord_offset"))]


def test_reinforcement_forms():
    """Bars as the issue spells them: "#5 @ 12 in", "3 #5", soft-metric names, "plain"."""
    raw = demo()
    raw["concrete"] = {}
    raw["walls"][0]["construction"] = "concrete"
    raw["walls"][0]["footing"]["reinforcement"] = {"transverse": "No. 16 @ 300 mm", "bottom": "3 #5"}
    raw["walls"][1]["footing"]["reinforcement"] = "plain"
    project = parse_project(raw)
    r0 = project.walls[0].footing.reinforcement
    assert r0.transverse[0].size == 5 and r0.transverse[1] == pytest.approx(0.3)
    assert r0.bottom[0] == 3 and r0.bottom[1].size == 5 and r0.top is None
    assert project.walls[1].footing.reinforcement.plain
    assert project.walls[0].construction is WallConstruction.CONCRETE
    assert project.walls[2].footing.reinforcement is None  # absent: Kernline designs it


@pytest.mark.parametrize(
    ("mutate", "field"),
    [
        (
            lambda r: r["walls"][0]["footing"].__setitem__("reinforcement", {"transverse": "#5 12 in"}),
            "walls[0].footing.reinforcement.transverse",
        ),
        (
            lambda r: r["walls"][0]["footing"].__setitem__("reinforcement", {"bottm": "3 #5"}),
            "walls[0].footing.reinforcement.bottm",
        ),
        (lambda r: r["walls"][0]["footing"].__setitem__("reinforcement", "none"), "walls[0].footing.reinforcement"),
        (lambda r: r["walls"][0].__setitem__("construction", "steel"), "walls[0].construction"),
        (lambda r: r["concrete"].__setitem__("lambda", 1.2), "concrete.lambda"),
        (lambda r: r["concrete"].__setitem__("strength_method", "asce7-16-asd"), "concrete.strength_method"),
        (lambda r: r["criteria"].__setitem__("seismic_design_category", "G"), "criteria.seismic_design_category"),
    ],
)
def test_bad_concrete_inputs_name_their_field(mutate, field):
    """Each bad concrete input is refused naming its path."""
    raw = demo()
    raw["concrete"] = {}
    mutate(raw)
    with pytest.raises(InputError) as err:
        parse_project(raw)
    assert err.value.field == field


def test_a_concrete_section_is_designed_not_flagged():
    """The concrete design runs (flexure and one-way shear), so no warning says it does not."""
    raw = demo()
    raw["concrete"] = {}
    fields = [w.field for w in input_warnings(parse_project(raw))]
    assert "concrete" not in fields

"""The beam diagrams of many load sets at once equal the diagrams of each set on its own.

engine.concrete.longitudinal.beam_diagrams evaluates the statics of beam_diagram (V and M of a free
beam on the rigid-footing soil pressure, derived here, D) for several load sets together, with numpy
over sets x segments. beam_diagram, one set at a time, is the reference: every array and every
extreme must agree for random footings, loads (including loads that end on the footing's ends or on
each other's ends, and uplift) and soil pressures. engine.concrete.along.case_diagrams is checked the
same way against case_diagram on random walls of every construction, and passes_along against the
verdict of design_along.
"""

from __future__ import annotations

import json
from dataclasses import replace

import numpy as np
import pytest
from hypothesis import assume, given, settings
from hypothesis import strategies as st
from kernline.engine.concrete.along import case_diagram, case_diagrams, design_along, failing_case_along, passes_along
from kernline.engine.concrete.longitudinal import (
    BeamLineLoad,
    BeamPointLoad,
    beam_diagram,
    beam_diagrams,
    rigid_soil_stations,
)
from kernline.engine.model import INCH
from kernline.engine.project_file import parse_project
from kernline.engine.resources import resource_path
from kernline.engine.results import check_wall

FAST = settings(max_examples=60, deadline=None)

FIELDS = (
    "x",
    "shear_left",
    "shear_right",
    "moment",
    "width",
    "net_start",
    "net_end",
    "closure_shear",
    "closure_moment",
    "max_moment",
    "max_moment_at",
    "min_moment",
    "min_moment_at",
    "max_shear",
)

fractions = st.sampled_from([0.0, 0.25, 0.5, 1.0]) | st.floats(0.0, 1.0)


@st.composite
def load_set(draw, length):
    """Line and point loads on a footing of ``length``, with their soil stations and pressures."""
    lines = []
    for _ in range(draw(st.integers(0, 5))):
        a, b = sorted((draw(fractions), draw(fractions)))
        assume(b - a > 1e-6)
        lines.append(BeamLineLoad(value=draw(st.floats(-5e4, 2e5)), start=a * length, end=b * length))
    points = [
        BeamPointLoad(value=draw(st.floats(-2e5, 5e5)), at=draw(fractions) * length) for _ in range(draw(st.integers(0, 4)))
    ]
    vertical = draw(st.floats(-1e4, 2e6))
    eccentricity = draw(st.floats(-0.6, 0.6)) * length
    return lines, points, vertical, eccentricity


def assert_same(one, other):
    for name in FIELDS:
        a, b = np.asarray(getattr(one, name)), np.asarray(getattr(other, name))
        assert a.shape == b.shape, name
        np.testing.assert_allclose(b, a, rtol=1e-12, atol=1e-9 * (1.0 + float(np.max(np.abs(a), initial=0.0))), err_msg=name)


@FAST
@given(st.floats(1.0, 30.0), st.floats(0.3, 3.0), st.data())
def test_diagrams_at_once_equal_each_diagram_alone(length, width, data):
    """beam_diagrams of 1 to 6 load sets equals beam_diagram of each (D)."""
    sets = [data.draw(load_set(length)) for _ in range(data.draw(st.integers(1, 6)))]
    stations, pressures = zip(*(rigid_soil_stations(n, e, width, length) for _, _, n, e in sets), strict=True)
    together = beam_diagrams(
        stations,
        pressures,
        width,
        [[(w.value, w.start, w.end) for w in lines] for lines, _, _, _ in sets],
        [[(p.value, p.at) for p in points] for _, points, _, _ in sets],
    )
    assert len(together) == len(sets)
    for (lines, points, _, _), x, q, diagram in zip(sets, stations, pressures, together, strict=True):
        assert_same(beam_diagram(x, q, width, lines, points), diagram)


def reference_design_along(table, evaluation):
    """The design along the length case by case, as Kernline did it before the cases were computed
    together: case_diagram and design_longitudinal for every case, the first failure that the plain
    section does not carry either worded, the plain section's verdict over each (the reference the faster design_along must reproduce)."""
    from kernline.engine.concrete.along import (
        _chosen_bars,
        _plain_along,
        _plain_capacities,
        _plain_carries,
        _setup,
    )
    from kernline.engine.concrete.longitudinal import design_longitudinal

    thickness, materials, given, layer = _setup(table, evaluation.statics)
    concrete = table.concrete
    diagrams = [case_diagram(table, evaluation, i) for i in range(len(table.cases))]
    bottom, top, sag, hog = _chosen_bars(diagrams, thickness, materials, given, layer)
    largest = sag if diagrams[sag].max_moment >= -diagrams[hog].min_moment else hog
    plain = given is not None and given.plain
    width = float(np.asarray(evaluation.statics.width))
    if plain:
        phi_mn, phi_vn = _plain_capacities(width, thickness, concrete.fc, concrete.lam)
        if all(_plain_carries(d, phi_mn, phi_vn) for d in diagrams):
            one = design_longitudinal(
                diagrams[largest], thickness=thickness, materials=materials, bottom=bottom, top=top, layer_below=layer
            )
            return _plain_along([one], width, thickness, concrete.fc, concrete.lam)[0], largest, diagrams[largest]
    designs = [
        design_longitudinal(d, thickness=thickness, materials=materials, bottom=bottom, top=top, layer_below=layer, words=False)
        for d in diagrams
    ]
    carried = [plain and _plain_carries(d, phi_mn, phi_vn) for d in diagrams]
    # the governing failure is worded: the first case neither the plain section nor the bars carry
    first = next((i for i, d in enumerate(designs) if not d.passes and not carried[i]), None)
    if first is not None:
        designs[first] = design_longitudinal(
            diagrams[first], thickness=thickness, materials=materials, bottom=bottom, top=top, layer_below=layer
        )
    if plain:
        designs = _plain_along(designs, width, thickness, concrete.fc, concrete.lam)
    failing = [i for i, d in enumerate(designs) if not d.passes]
    index = failing[0] if failing else largest
    return designs[index], index, diagrams[index]


def _demo_walls():
    raw = json.loads(resource_path("demo.kernline").read_text(encoding="utf-8"))
    return raw, parse_project(raw)


RAW, PROJECT = _demo_walls()


@FAST
@given(
    st.integers(0, len(PROJECT.walls) - 1),
    st.sampled_from(["concrete", "masonry", "light-frame"]),
    st.floats(12.0, 120.0),
    st.floats(12.0, 48.0),
    st.floats(0.2, 4.0),
    st.sampled_from(["as given", "designed", "plain, designed", "light", "plain, light"]),
)
def test_case_diagrams_equal_case_diagram_on_random_walls(index, construction, width_in, thickness_in, scale, bars):
    """case_diagrams gives every strength case's case_diagram, design_along what the case-by-case
    reference gives, and passes_along the verdict of
    design_along (whichever case failing_case_along tries first), on the demo's walls (inputs only)
    with other constructions, sizes, loads and bars (D)."""
    from kernline.engine.concrete.bars import bar
    from kernline.engine.model import Reinforcement, WallConstruction

    wall = PROJECT.walls[index]
    loads = tuple(replace(load, value=load.value * scale) for load in wall.loads)
    reinforcement = wall.footing.reinforcement
    if bars != "as given":
        plain = bars.startswith("plain")
        light = (2, bar(4)) if bars.endswith("light") else None
        transverse = None if plain else (bar(5), 12.0 * INCH)
        reinforcement = Reinforcement(transverse=transverse, bottom=light, top=light, plain=plain)
    footing = replace(
        wall.footing,
        width=max(width_in * INCH, wall.supported_thickness),
        thickness=thickness_in * INCH,
        reinforcement=reinforcement,
    )
    wall = replace(wall, construction=WallConstruction(construction), loads=loads, footing=footing)
    result = check_wall(PROJECT, wall)
    table, evaluation = result.strength_table, result.strength_evaluation
    assert table is not None and evaluation is not None
    together = case_diagrams(table, evaluation)
    assert len(together) == len(table.cases)
    for i, diagram in enumerate(together):
        assert_same(case_diagram(table, evaluation, i), diagram)
    design, index, diagram = design_along(table, evaluation)
    expected, expected_index, expected_diagram = reference_design_along(table, evaluation)
    assert index == expected_index
    assert_same(expected_diagram, diagram)
    assert_same(expected.diagram, design.diagram)
    assert (design.passes, design.message, design.plain_carries) == (expected.passes, expected.message, expected.plain_carries)
    assert (design.plain_moment_capacity, design.plain_shear_capacity) == (
        expected.plain_moment_capacity,
        expected.plain_shear_capacity,
    )
    for face in ("bottom", "top"):
        ours, theirs = getattr(design, face), getattr(expected, face)
        for name in theirs.__slots__:
            value = getattr(theirs, name)
            wanted = pytest.approx(value, rel=1e-12, abs=1e-12) if isinstance(value, float) else value
            assert getattr(ours, name) == wanted, (face, name)
    passes = design.passes
    assert passes_along(table, evaluation) == passes
    for probe in (0, len(table.cases) // 2, len(table.cases) - 1):  # trying one case first changes nothing
        assert (failing_case_along(table, evaluation.statics, probe) is None) == passes


@FAST
@given(
    st.integers(0, len(PROJECT.walls) - 1),
    st.sampled_from(["concrete", "light-frame"]),
    st.floats(12.0, 120.0),
    st.floats(12.0, 48.0),
    st.floats(0.2, 4.0),
    st.sampled_from([(2, 4), (2, 5), (3, 5), (4, 6), (6, 8), (12, 8)]),
)
def test_given_bars_pass_case_by_case_as_design_longitudinal(index, construction, width_in, thickness_in, scale, bars):
    """given_bars_pass says, for every case at once, what design_longitudinal says of each face with
    the same bars given (D: the same ratios on the same numbers)."""
    from kernline.engine.concrete.along import _case_beams, _setup
    from kernline.engine.concrete.bars import bar
    from kernline.engine.concrete.longitudinal import TOP_COVER, design_longitudinal, given_bars_pass
    from kernline.engine.model import WallConstruction

    wall = PROJECT.walls[index]
    loads = tuple(replace(load, value=load.value * scale) for load in wall.loads)
    footing = replace(wall.footing, width=max(width_in * INCH, wall.supported_thickness), thickness=thickness_in * INCH)
    wall = replace(wall, construction=WallConstruction(construction), loads=loads, footing=footing)
    result = check_wall(PROJECT, wall)
    table, state = result.strength_table, result.strength_evaluation.statics
    thickness, materials, _, layer = _setup(table, state)
    beams = _case_beams(table, state)
    given_bars = (bars[0], bar(bars[1]))
    low = given_bars_pass(
        beams, "bottom", *given_bars, thickness=thickness, materials=materials, cover=materials.cover, layer_below=layer
    )
    high = given_bars_pass(beams, "top", *given_bars, thickness=thickness, materials=materials, cover=TOP_COVER)
    for i, diagram in enumerate(beams.diagrams()):
        design = design_longitudinal(
            diagram, thickness=thickness, materials=materials, bottom=given_bars, top=given_bars, layer_below=layer, words=False
        )
        assert (low[i], high[i]) == (design.bottom.passes, design.top.passes)

"""Properties of the footing's shear and moment along its length (engine.concrete.longitudinal).

The footing is a free beam loaded by the wall (line and point loads, downward) and by the
rigid-footing soil pressure of engine.soil_pressure (upward). The properties are statics (derived
here, D): when the soil pressure is the one that balances the loads, V closes to zero and M is zero
at both free ends; dM/dx = V between the nodes; loads symmetric about the middle give a moment
diagram symmetric about the middle; a light-frame chord couple is a pure moment (no net force).
"""

from __future__ import annotations

import numpy as np
import pytest
from hypothesis import assume, given, settings
from hypothesis import strategies as st
from kernline.engine.concrete.longitudinal import (
    CANNOT_SPREAD,
    BeamLineLoad,
    BeamPointLoad,
    beam_diagram,
    chord_couple,
    design_longitudinal,
    rigid_soil_stations,
)
from kernline.engine.concrete.transverse import Materials

FAST = settings(max_examples=80, deadline=None)

lengths = st.floats(1.0, 30.0)  # m
widths = st.floats(0.3, 3.0)  # m
line_values = st.floats(1e3, 2e5)  # N/m
point_values = st.floats(1e3, 5e5)  # N
fractions = st.floats(0.0, 1.0)


@st.composite
def wall_loads(draw):
    """A footing, its line and point loads (at least one), all downward."""
    length = draw(lengths)
    lines = []
    for _ in range(draw(st.integers(0, 3))):
        a, b = sorted((draw(fractions), draw(fractions)))
        assume(b - a > 1e-3)
        lines.append(BeamLineLoad(value=draw(line_values), start=a * length, end=b * length))
    points = [BeamPointLoad(value=draw(point_values), at=draw(fractions) * length) for _ in range(draw(st.integers(0, 3)))]
    assume(lines or points)
    return length, draw(widths), lines, points


def _resultant(length, lines, points):
    """N and its eccentricity from the middle (statics)."""
    n = sum(w.value * (w.end - w.start) for w in lines) + sum(p.value for p in points)
    m = sum(w.value * (w.end - w.start) * (0.5 * (w.start + w.end) - 0.5 * length) for w in lines)
    m += sum(p.value * (p.at - 0.5 * length) for p in points)
    return n, m / n


def _scale(length, lines, points):
    total = sum(abs(w.value) * (w.end - w.start) for w in lines) + sum(abs(p.value) for p in points)
    return total, total * length


@FAST
@given(wall_loads())
def test_shear_and_moment_close_at_the_far_end(case):
    """With the soil pressure that balances the loads, V and M vanish beyond the far end (D)."""
    length, width, lines, points = case
    n, e = _resultant(length, lines, points)
    assume(abs(e) < 0.45 * length)
    x, q = rigid_soil_stations(n, e, width, length)
    diagram = beam_diagram(x, q, width, lines, points)
    force, moment = _scale(length, lines, points)
    assert abs(diagram.closure_shear) <= 1e-9 * force
    assert abs(diagram.closure_moment) <= 1e-9 * moment
    assert diagram.moment[0] == 0.0 and diagram.shear_left[0] == 0.0


@FAST
@given(wall_loads())
def test_slope_of_the_moment_is_the_shear(case):
    """dM/dx = V: on each segment (M1 - M0)/h equals the mean of V at its ends, to O(h^2) (D)."""
    length, width, lines, points = case
    n, e = _resultant(length, lines, points)
    assume(abs(e) < 0.45 * length)
    x, q = rigid_soil_stations(n, e, width, length, count=801)
    d = beam_diagram(x, q, width, lines, points)
    h = np.diff(d.x)
    keep = h > 1e-6 * length
    slope = np.diff(d.moment)[keep] / h[keep]
    mean_v = 0.5 * (d.shear_right[:-1] + d.shear_left[1:])[keep]
    force, _ = _scale(length, lines, points)
    assert np.max(np.abs(slope - mean_v)) <= 1e-3 * force


@FAST
@given(
    lengths,
    widths,
    st.lists(st.tuples(line_values, fractions, fractions), max_size=3),
    st.lists(st.tuples(point_values, fractions), max_size=3),
)
def test_symmetric_loads_give_a_symmetric_moment(length, width, line_specs, point_specs):
    """Each load and its mirror image about the middle: M(x) = M(L - x) (D)."""
    lines, points = [], []
    for value, a, b in line_specs:
        lo, hi = sorted((a, b))
        assume(hi - lo > 1e-3)
        lines += [
            BeamLineLoad(value=value, start=lo * length, end=hi * length),
            BeamLineLoad(value=value, start=(1.0 - hi) * length, end=(1.0 - lo) * length),
        ]
    for value, a in point_specs:
        points += [BeamPointLoad(value=value, at=a * length), BeamPointLoad(value=value, at=(1.0 - a) * length)]
    assume(lines or points)
    n, _ = _resultant(length, lines, points)
    x, q = rigid_soil_stations(n, 0.0, width, length)
    d = beam_diagram(x, q, width, lines, points)
    mirrored = np.interp(length - d.x, d.x, d.moment)
    _, moment = _scale(length, lines, points)
    assert np.max(np.abs(d.moment - mirrored)) <= 1e-9 * moment


@FAST
@given(st.floats(1e3, 1e6), st.floats(2.0, 12.0), st.floats(0.0, 2.0), st.floats(0.0, 0.1))
def test_chord_couple_is_a_pure_moment(moment, wall_length, extension, offset):
    """The two chord forces sum to zero and their moment is M, about any point (D)."""
    start, end = extension, extension + wall_length
    a, b = chord_couple(moment, wall_start=start, wall_end=end, offset=offset)
    assert abs(a.value + b.value) <= 1e-12 * abs(moment)
    couple = b.value * b.at + a.value * a.at
    assert abs(couple - moment) <= 1e-9 * abs(moment)


@FAST
@given(st.floats(2.0, 10.0), st.floats(1e4, 3e5), st.floats(1e4, 2e6), widths)
def test_overturned_wall_closes_and_the_design_answers(wall_length, dead, overturning, width):
    """A wall's dead load with the chord couple of its overturning moment, on the rigid soil: the
    diagram closes (D) and the design returns bars or says in words why it cannot (never raises)."""
    length = wall_length + 1.0
    lines = [BeamLineLoad(value=dead, start=0.5, end=0.5 + wall_length)]
    points = list(chord_couple(overturning, wall_start=0.5, wall_end=0.5 + wall_length))
    n, e = _resultant(length, lines, points)
    assume(n > 0.0 and abs(e) < 0.45 * length)
    x, q = rigid_soil_stations(n, e, width, length)
    diagram = beam_diagram(x, q, width, lines, points)
    force, moment = _scale(length, lines, points)
    assert abs(diagram.closure_shear) <= 1e-9 * force
    assert abs(diagram.closure_moment) <= 1e-9 * moment
    design = design_longitudinal(diagram, thickness=0.45, materials=Materials(fc=20.7e6))
    assert design.passes == (design.message == "")


def test_point_load_at_the_middle_gives_pl_over_8():
    """A 20 k point load at the middle of a 10 ft footing on uniform soil: M = P L / 8 = 25 k-ft at the
    middle, V = P/2 = 10 k either side of it (statics, D)."""
    foot, kip = 0.3048, 4448.2216152605
    length, width = 10.0 * foot, 2.0 * foot
    points = [BeamPointLoad(value=20.0 * kip, at=5.0 * foot)]
    x, q = rigid_soil_stations(20.0 * kip, 0.0, width, length)
    diagram = beam_diagram(x, q, width, (), points)
    assert diagram.max_moment / (kip * foot) == pytest.approx(25.0, rel=1e-12)
    assert diagram.max_moment_at / foot == pytest.approx(5.0, rel=1e-12)
    assert diagram.max_shear / kip == pytest.approx(10.0, rel=1e-12)


def test_a_footing_too_shallow_for_the_overturning_says_so():
    """A 10 ft wall with 6 klf of dead load and 400 k-ft of overturning (chords 3 in inside its ends)
    on a footing 20 ft x 24 in x 12 in with 5 ft extensions: N = 60 k, e = 400/60 = 6.67 ft (beyond
    the kern, in equilibrium); no bars that fit in 24 in carry the moment of about 140 k-ft near the
    compression chord, and the design says so in words (D)."""
    foot, kip = 0.3048, 4448.2216152605
    length, width = 20.0 * foot, 2.0 * foot
    lines = [BeamLineLoad(value=6.0 * kip / foot, start=5.0 * foot, end=15.0 * foot)]
    points = list(chord_couple(400.0 * kip * foot, wall_start=5.0 * foot, wall_end=15.0 * foot))
    n, e = _resultant(length, lines, points)
    assert e / foot == pytest.approx(400.0 / 60.0, rel=1e-12)
    x, q = rigid_soil_stations(n, e, width, length)
    diagram = beam_diagram(x, q, width, lines, points)
    design = design_longitudinal(diagram, thickness=12 * 0.0254, materials=Materials(fc=20.7e6))
    assert not design.passes
    assert design.message.endswith(CANNOT_SPREAD)
    deeper = design_longitudinal(diagram, thickness=36 * 0.0254, materials=Materials(fc=20.7e6))
    assert deeper.passes and deeper.message == ""

"""The sizing grid's soil pressure and checks against a plain, one-size-at-a-time reference.

``engine.soil_pressure.pressure_distribution`` and the checks work on whole grids of cases x
thicknesses x widths in place (few temporary arrays). These properties check that the grid gives,
element by element, what the textbook formulas give for one footing at a time, written here as
scalar if/else code (Bowles, *Foundation Analysis and Design*, 5th ed., section 4-8; Das,
*Principles of Foundation Engineering*, eccentrically loaded foundations: q = N/(B L) (1 +- 6e/L)
within the kern, q_max = 2N / (3B(L/2 - e)) beyond it, no equilibrium for N <= 0 or |e| >= L/2), and
that every check's least ratio over the grid equals the one found for each size on its own.
"""

from __future__ import annotations

import math

import numpy as np
import pytest
from hypothesis import given, settings
from hypothesis import strategies as st
from kernline.engine.project_file import load_project
from kernline.engine.resources import resource_path
from kernline.engine.sizing import _tables, candidate_grid
from kernline.engine.soil_pressure import pressure_distribution, resultant_eccentricity
from kernline.engine.stability import evaluate

FAST = settings(max_examples=60, deadline=None)


def _eccentricity(m: float, n: float) -> float:
    """e = M / N; +-inf (the sign of M) where N <= 0 (no resultant on the soil)."""
    return math.copysign(math.inf, m) if n <= 0.0 else m / n


def _pressure(n: float, e: float, b: float, span: float) -> tuple[float, float, float, bool]:
    """q_max, q_min, contact length and stability of one footing, one formula branch at a time."""
    a = abs(e)
    if n <= 0.0 or not a < span / 2.0:
        return math.inf, 0.0, 0.0, False
    if a <= span / 6.0:
        average = n / (b * span)
        swing = average * (6.0 / span) * a
        return average + swing, max(average - swing, 0.0), span, True
    return (2.0 / 3.0) * n / (b * (span / 2.0 - a)), 0.0, 3.0 * (span / 2.0 - a), True


def _same(got: float, want: float) -> None:
    if math.isinf(want):
        assert got == want
    else:
        assert got == pytest.approx(want, rel=1e-12, abs=1e-300)


@FAST
@given(st.integers(1, 6), st.integers(1, 5), st.integers(1, 7), st.floats(0.5, 30.0), st.integers(0, 2**32 - 1))
def test_pressure_grid_equals_one_footing_at_a_time(k, rows, cols, span, seed):
    """Every element of a cases x thicknesses x widths grid equals the scalar formulas for that footing,
    including loads that lift the footing (N <= 0) and resultants in, at and beyond the kern."""
    rng = np.random.default_rng(seed)
    n = rng.normal(2e5, 3e5, (k, rows, cols))
    n[rng.random(n.shape) < 0.1] = 0.0
    m = rng.normal(0.0, 1e5 * span, (k, rows, 1))  # the moment does not depend on the width
    widths = rng.uniform(0.3, 4.0, (1, cols))
    e = resultant_eccentricity(m, n)
    for i, r, c in np.ndindex(n.shape):
        _same(float(e[i, r, c]), _eccentricity(float(m[i, r, 0]), float(n[i, r, c])))
    # some resultants exactly at the kern's edge and at the footing's end
    pick = rng.random(n.shape)
    e = np.where(pick < 0.05, span / 6.0, np.where(pick > 0.95, -span / 2.0, e))
    p = pressure_distribution(n, e, widths, span)
    for i, r, c in np.ndindex(n.shape):
        q_max, q_min, contact, stable = _pressure(float(n[i, r, c]), float(e[i, r, c]), float(widths[0, c]), span)
        assert bool(p.stable[i, r, c]) is stable
        _same(float(p.q_max[i, r, c]), q_max)
        _same(float(p.q_min[i, r, c]), q_min)
        _same(float(p.contact_length[i, r, c]), contact)


def test_pressure_of_one_footing_keeps_its_types():
    """Scalars in give 0-d arrays out (and a numpy bool for stable), as drawings and records expect."""
    p = pressure_distribution(100.0, 3.0, 1.0, 10.0)  # Das, e > L/6: q_max = 2N / (3B(L/2 - e))
    assert isinstance(p.q_max, np.ndarray) and p.q_max.shape == ()
    assert float(p.q_max) == pytest.approx(2.0 * 100.0 / (3.0 * 1.0 * 2.0), rel=1e-15)
    assert float(p.contact_length) == pytest.approx(6.0, rel=1e-15)
    assert bool(p.stable)


@pytest.mark.parametrize("index", range(5))
def test_grid_minima_equal_each_size_on_its_own(index):
    """Each check's least ratio over the cases, from the whole sizing grid of a demo wall, equals the
    one found by evaluating that width and thickness alone (service and strength checks)."""
    project = load_project(resource_path("demo.kernline")).project
    wall = project.walls[index]
    widths, thicknesses = candidate_grid(wall)
    rng = np.random.default_rng(index)
    for table in _tables(project, wall):
        grid = evaluate(table, widths[None, :], thicknesses[:, None]).check_minima()
        for _ in range(12):
            r, c = int(rng.integers(thicknesses.size)), int(rng.integers(widths.size))
            alone = evaluate(table, float(widths[c]), float(thicknesses[r])).check_minima()
            for j in range(len(table.checks)):
                want = float(alone[j])
                got = float(grid[j, r, c])
                if math.isinf(want):
                    assert got == want
                else:
                    assert got == pytest.approx(want, rel=1e-12)


@pytest.mark.parametrize("index", range(5))
def test_overturning_sums_the_same_whether_or_not_every_weight_resists(index):
    """The overturning check's shortcut for footings whose weight resists in every case gives, element
    by element, the sums of the general formula sum M_R = applied + max(f_D W_f, 0) L_f/2, sum M_O =
    applied + max(-f_D W_f, 0) L_f/2 + sum f H (h + t_f) (statics about the toe; Das, *Principles of
    Foundation Engineering*, retaining-wall stability), which a grid with one weightless or lifting
    element takes."""
    from dataclasses import replace

    from kernline.engine.checks import OVERTURNING
    from kernline.engine.stability import case_table, statics

    project = load_project(resource_path("demo.kernline")).project
    wall = project.walls[index]
    widths, thicknesses = candidate_grid(wall)
    table = case_table(wall, project.soil, project.criteria, project.site)
    state = statics(table, widths[None, :], thicknesses[:, None])
    assert (state.factored_weight > 0.0).all()
    usual = OVERTURNING.evaluate(state)
    half = 0.5 * table.length
    for value in (0.0, -1.0e4):
        weight = np.array(state.factored_weight, copy=True)
        weight[0, 0, 0] = value
        general = OVERTURNING.evaluate(replace(state, factored_weight=weight))
        for name in ("resisting", "moment"):
            got, want = general[name].copy(), usual[name].copy()
            got[0, 0, 0] = want[0, 0, 0] = 0.0
            assert np.array_equal(got, want)
        assert float(general["resisting"][0, 0, 0]) == float(table.applied_resisting[0]) + max(value, 0.0) * half
        lateral = float(state.overturning_lateral_moment[0, 0, 0])
        assert float(general["moment"][0, 0, 0]) == float(table.applied_overturning[0]) + max(-value, 0.0) * half + lateral

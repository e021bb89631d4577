"""Properties of the rigid-footing soil pressure (no tension), checked with hypothesis.

The formulas are those of ``engine.soil_pressure`` (the classical linear solution, e.g. Das,
*Principles of Foundation Engineering*, eccentrically loaded foundations; status R through the worked
examples of docs/verification.md, cases 2 to 7); the properties are statics:
the pressure block must carry N with its resultant at e, vary continuously through the kern limit
e = L/6, grow without bound as e -> L/2, and never rise when the footing is made wider.
"""

from __future__ import annotations

import math

import numpy as np
import pytest
from hypothesis import given, settings
from hypothesis import strategies as st
from kernline.engine.bearing import bearing_ratio
from kernline.engine.soil_pressure import pressure_at, pressure_diagram, pressure_distribution

FAST = settings(max_examples=100, deadline=None)

vertical = st.floats(1e2, 1e8)  # N
length = st.floats(0.5, 40.0)  # m
width = st.floats(0.2, 6.0)  # m
# eccentricity as a fraction of L, kept off the e -> L/2 singularity
fraction = st.floats(-0.499, 0.499)


def _integrals(x: np.ndarray, q: np.ndarray, centre: float) -> tuple[float, float]:
    """Exact integrals of a piecewise-linear q(x) and of q(x) (x - centre) (Simpson is exact for both)."""
    force = moment = 0.0
    for x0, x1, q0, q1 in zip(x[:-1], x[1:], q[:-1], q[1:], strict=True):
        h = x1 - x0
        if h == 0.0:
            continue  # a vertical edge of the block carries nothing
        xm, qm = 0.5 * (x0 + x1), 0.5 * (q0 + q1)
        force += h * (q0 + q1) / 2.0
        moment += h / 6.0 * (q0 * (x0 - centre) + 4.0 * qm * (xm - centre) + q1 * (x1 - centre))
    return force, moment


@FAST
@given(vertical, fraction, width, length)
def test_diagram_resultant_equals_vertical_load(n, f, b, span):
    """The area of the pressure block times B equals N."""
    d = pressure_diagram(n, f * span, b, span)
    force, _ = _integrals(d.x, d.q, span / 2.0)
    assert force * b == pytest.approx(n, rel=1e-9)


@FAST
@given(vertical, fraction, width, length)
def test_diagram_moment_about_centre_equals_n_e(n, f, b, span):
    """The moment of the pressure block about the footing's centre equals N e."""
    d = pressure_diagram(n, f * span, b, span)
    _, moment = _integrals(d.x, d.q, span / 2.0)
    assert moment * b == pytest.approx(n * f * span, rel=1e-9, abs=1e-9 * n * span)


@FAST
@given(vertical, fraction, width, length)
def test_diagram_resultant_position(n, f, b, span):
    """The diagram places the resultant at L/2 + e, its peak at q_max and keeps q >= 0."""
    d = pressure_diagram(n, f * span, b, span)
    assert d.resultant_x == pytest.approx(span / 2.0 + f * span, rel=1e-12, abs=1e-12 * span)
    assert max(d.q) == pytest.approx(d.q_max, rel=1e-12)
    assert min(d.q) >= -1e-9 * d.q_max
    assert 0.0 <= d.contact_start < d.contact_end <= span * (1.0 + 1e-12)


@FAST
@given(vertical, fraction, width, length)
def test_sampled_pressure_carries_vertical_load(n, f, b, span):
    """pressure_at (the ordinates a view draws) integrates to N within the sampling error."""
    dist = pressure_distribution(n, f * span, b, span)
    samples = 20_000
    x = (np.arange(samples) + 0.5) * (span / samples)  # midpoints
    q = pressure_at(dist, f * span, span, x)
    # midpoint sum; the kink at the end of contact costs at most about one sample's share
    assert float(q.sum() * (span / samples) * b) == pytest.approx(n, rel=2e-3)


@FAST
@given(vertical, width, length)
def test_continuity_at_kern_limit(n, b, span):
    """Just below, at and just above e = L/6 the peak, the least pressure and the contact agree."""
    below, at, above = (pressure_distribution(n, span / 6.0 * k, b, span) for k in (1.0 - 1e-9, 1.0, 1.0 + 1e-9))
    average = n / (b * span)
    for q in (below, above):
        assert float(q.q_max) == pytest.approx(float(at.q_max), rel=1e-7)
        assert float(q.contact_length) == pytest.approx(float(at.contact_length), rel=1e-7)
        assert float(q.q_min) == pytest.approx(float(at.q_min), abs=1e-7 * average)
    # at the limit the block is a full triangle: q_max = 2N/(BL), q_min = 0
    assert float(at.q_max) == pytest.approx(2.0 * average, rel=1e-9)
    assert float(at.q_min) == pytest.approx(0.0, abs=1e-9 * average)


@FAST
@given(vertical, width, length, st.sampled_from([1.0, -1.0]))
def test_peak_grows_without_bound_toward_half_length(n, b, span, sign):
    """As |e| -> L/2 the peak pressure rises steadily and without bound."""
    steps = [0.5 * span * (1.0 - 10.0**-k) for k in range(1, 9)]
    peaks = [float(pressure_distribution(n, sign * e, b, span).q_max) for e in steps]
    assert all(later > earlier for earlier, later in zip(peaks, peaks[1:], strict=False))
    assert peaks[-1] > 1e7 * n / (b * span)


@FAST
@given(vertical, width, length, st.floats(0.5, 10.0), st.sampled_from([1.0, -1.0]))
def test_no_equilibrium_at_or_beyond_half_length(n, b, span, k, sign):
    """|e| >= L/2: no equilibrium (unstable, q_max infinite, no contact, bearing ratio 0)."""
    e = sign * span * k  # k >= 0.5, so |e| >= L/2
    q = pressure_distribution(n, e, b, span)
    assert not bool(q.stable)
    assert math.isinf(float(q.q_max))
    assert float(q.contact_length) == 0.0
    assert float(bearing_ratio(200e3, q.q_max, q.stable)) == 0.0
    d = pressure_diagram(n, e, b, span)
    assert not d.stable and math.isinf(d.q_max)


@FAST
@given(st.floats(-1e8, 0.0), fraction, width, length)
def test_no_equilibrium_without_downward_load(n, f, b, span):
    """N <= 0: no equilibrium, whatever e is."""
    q = pressure_distribution(n, f * span, b, span)
    assert not bool(q.stable)
    assert math.isinf(float(q.q_max))
    assert float(bearing_ratio(200e3, q.q_max, q.stable)) == 0.0


@FAST
@given(vertical, fraction, fraction, width, length)
def test_peak_never_falls_as_eccentricity_grows(n, f1, f2, b, span):
    """q_max is non-decreasing in |e|."""
    lo, hi = sorted((abs(f1), abs(f2)))
    q_lo = float(pressure_distribution(n, lo * span, b, span).q_max)
    q_hi = float(pressure_distribution(n, hi * span, b, span).q_max)
    assert q_hi >= q_lo * (1.0 - 1e-12)


@FAST
@given(vertical, fraction, width, st.floats(1.0, 5.0), length)
def test_wider_footing_never_raises_peak(n, f, b, factor, span):
    """Same N and e on a wider footing: the peak pressure does not rise."""
    narrow = float(pressure_distribution(n, f * span, b, span).q_max)
    wide = float(pressure_distribution(n, f * span, b * factor, span).q_max)
    assert wide <= narrow * (1.0 + 1e-12)

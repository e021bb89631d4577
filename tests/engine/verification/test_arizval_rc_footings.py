"""Strip footing with an eccentric load inside the kern (arizval.app example).

Source: arizval.app, "Principles of RC - footings", interactive example (docs/verification.md,
case 6; status R; the average pressure P/A = 300 kPa is inferred from the page, D): strip of width
2.0 m in the direction of the eccentricity, e = 0.125 m, P = 600 kN per metre; B/6 = 0.333 m;
q_max = 412.5 kPa, q_min = 187.5 kPa; the peak exceeds q_allow = 250 kPa.

The source's strip is analysed per metre of wall with the eccentricity across it, so here the 2.0 m
is the footing dimension along the eccentricity (``length``) and the per-metre run is the other
dimension (``width`` = 1 m).
"""

from __future__ import annotations

import pytest
from kernline.engine.bearing import bearing_ratio
from kernline.engine.soil_pressure import pressure_distribution


def _strip():
    return pressure_distribution(600e3, 0.125, 1.0, 2.0)


def test_strip_example_peak_pressure():
    """q_max = 300 x (1 + 6 x 0.125 / 2) = 412.5 kPa (R)."""
    assert float(_strip().q_max) == pytest.approx(412.5e3, rel=1e-12)


def test_strip_example_least_pressure():
    """q_min = 300 x (1 - 0.375) = 187.5 kPa (R)."""
    assert float(_strip().q_min) == pytest.approx(187.5e3, rel=1e-12)


def test_strip_example_full_contact():
    """e = 0.125 m < B/6 = 0.333 m: the whole 2.0 m is in contact (R)."""
    q = _strip()
    assert float(q.contact_length) == pytest.approx(2.0, rel=1e-12)
    assert bool(q.stable)


def test_strip_example_exceeds_allowable():
    """412.5 kPa exceeds q_allow = 250 kPa: ratio 250 / 412.5 = 0.606 < 1 (R; ratio D)."""
    q = _strip()
    assert float(bearing_ratio(250e3, q.q_max, q.stable)) == pytest.approx(250.0 / 412.5, rel=1e-12)

"""Posts on the SEAINT structural engineers' listserv: beyond-kern pressure and the sliding ratio.

Sources (the SEAINT mail list's public archive, seaintarchive.org; docs/verification.md, case 3):
* W. C. Sherman, SEAINT listserv, 22 April 2004: beyond the kern the contact length is
  Y = 3(L/2 - e) and q_max = 2P / (Y B) (status R).
* H. Brooks, SEAINT listserv, 1999: the per-foot form q_max = P / (0.75 W - 1.5 e), W being the
  footing dimension along e (status R); algebraically the same.
* SEAINT listserv thread "Sliding factor of safety for retaining walls", September 1997,
  http://seaintarchive.org/mailarchive/1997b/msg00588.html (status R): active 2,000 lb, passive
  400 lb, base friction 2,400 lb. Method 1 (net force) gives 2,400 / 1,600 = 1.50; method 2 (Bowles,
  *Foundation Analysis and Design*, 2nd ed., p. 380, as quoted in the thread, R2: friction + passive
  over driving) gives 2,800 / 2,000 = 1.40. Kernline uses method 2 (its ratio is
  resistance / |V| with the passive resistance in the resistance).
"""

from __future__ import annotations

import pytest
from kernline.engine.sliding import friction_resistance, passive_resistance, sliding_ratio
from kernline.engine.soil_pressure import pressure_distribution

FOOT = 0.3048
LBF = 4.4482216152605  # N


def test_sherman_2004_contact_length():
    """Y = 3(L/2 - e): L = 12 ft, e = 3 ft gives Y = 9 ft (D from the R formula)."""
    q = pressure_distribution(20e3, 3.0 * FOOT, 1.0 * FOOT, 12.0 * FOOT)
    assert float(q.contact_length) == pytest.approx(9.0 * FOOT, rel=1e-12)


def test_sherman_2004_peak_pressure():
    """q_max = 2P / (Y B): 2 x 20 kN / (9 ft x 1 ft) (D from the R formula)."""
    q = pressure_distribution(20e3, 3.0 * FOOT, 1.0 * FOOT, 12.0 * FOOT)
    assert float(q.q_max) == pytest.approx(2.0 * 20e3 / (9.0 * FOOT * 1.0 * FOOT), rel=1e-12)


def test_brooks_1999_per_foot_form():
    """P / (0.75 W - 1.5 e) per foot: P = 6 kip/ft, W = 8 ft, e = 2 ft gives 6 / 3 = 2 ksf (D from the R formula)."""
    q = pressure_distribution(6000.0 * LBF, 2.0 * FOOT, 1.0 * FOOT, 8.0 * FOOT)
    assert float(q.q_max) == pytest.approx(2000.0 * LBF / FOOT**2, rel=1e-12)


def test_sliding_1997_method_2_ratio():
    """(2,400 + 400) / 2,000 = 1.40, Bowles's form, which Kernline uses (R)."""
    # friction 2,400 lb as mu x N with mu = 0.4 and N = 6,000 lb; passive 400 lb as K B D^2 / 2
    # with K = 200 psf/ft, B = 1 ft, D = 2 ft
    friction = friction_resistance(0.4, 6000.0 * LBF)
    passive = passive_resistance(200.0 * LBF / FOOT**3, 1.0 * FOOT, 0.0, 2.0 * FOOT, 0.0)
    assert float(friction) == pytest.approx(2400.0 * LBF, rel=1e-12)
    assert float(passive) == pytest.approx(400.0 * LBF, rel=1e-12)
    assert float(sliding_ratio(friction + passive, 2000.0 * LBF)) == pytest.approx(1.40, rel=1e-12)


def test_sliding_1997_ratio_is_not_method_1():
    """Method 1 would give 1.50; Kernline's ratio is the 1.40 of method 2 (R)."""
    friction = friction_resistance(0.4, 6000.0 * LBF)
    passive = passive_resistance(200.0 * LBF / FOOT**3, 1.0 * FOOT, 0.0, 2.0 * FOOT, 0.0)
    assert float(sliding_ratio(friction + passive, 2000.0 * LBF)) != pytest.approx(1.50, rel=1e-3)

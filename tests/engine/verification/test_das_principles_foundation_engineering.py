"""The beyond-kern peak pressure in Das's form, q_max = 4Q / (3L(B - 2e)).

Source: B. M. Das, *Principles of Foundation Engineering*, section on eccentrically loaded
foundations (one-way eccentricity): with e > B/6, q_max = 4Q / (3L(B - 2e)), B being the dimension in
the direction of e and L the other. Edition and publisher not recorded: the form is quoted from
memory (status M); it is identical to 2Q / (3L(B/2 - e)). Identity check (status D;
docs/verification.md, case 2): Q = 100, B = 10, L = 1, e = 3 gives 33.33.
"""

from __future__ import annotations

import pytest
from kernline.engine.soil_pressure import pressure_distribution


def _identity_case():
    # Das's B (along e) is Kernline's footing length; Das's L is Kernline's width
    return pressure_distribution(100.0, 3.0, 1.0, 10.0)


def test_identity_check_peak_pressure():
    """4 x 100 / (3 x 1 x (10 - 6)) = 33.33 (D; from memory for the form, M)."""
    # 33.33 is 33.333... rounded
    assert float(_identity_case().q_max) == pytest.approx(33.33, rel=2e-4)


def test_identity_check_equals_das_form_exactly():
    """The engine's 2Q/(3L(B/2 - e)) equals Das's 4Q/(3L(B - 2e)) (D)."""
    assert float(_identity_case().q_max) == pytest.approx(4.0 * 100.0 / (3.0 * 1.0 * (10.0 - 2.0 * 3.0)), rel=1e-12)


def test_identity_check_contact_length():
    """Beyond the kern the triangle is 3(B/2 - e) = 3 x 2 = 6 long (D)."""
    assert float(_identity_case().contact_length) == pytest.approx(6.0, rel=1e-12)

"""Overturning and eccentricity are one check when the resisting loads are centred.

Source: statics of a rigid footing (status D; docs/verification.md, case 1):
with every resisting vertical load at the footing's centre, FS_OT = (N L/2) / (N e) = L / (2e), so
FS = 3 is the kern limit e = L/6, FS = 2 is e = L/4 and FS = 1.5 is e = L/3. The pressure at each
follows from the classical rigid-footing solution (R; e.g. Das, *Principles of Foundation
Engineering*, eccentrically loaded foundations): at e = L/6 a full triangle, q_max = 2N/(BL);
beyond it a triangle 3(L/2 - e) long.

A Kernline wall: N = 100 kip centred on a 24 ft footing 2 ft wide (self weight off), with a lateral
W at 9 ft above the top of a 1 ft footing (arm 10 ft) sized to put e where wanted: H = N e / 10 ft.
"""

from __future__ import annotations

import pytest
from kernline.engine.project_file import parse_project
from kernline.engine.results import check_wall

FOOT = 0.3048
KIP = 4448.2216152605  # N
KSF = KIP / FOOT**2


def _case(shear_kip: float, direction: str = "+"):
    raw = {
        "format": "kernline-project",
        "version": 1,
        "criteria": {"combinations": [{"name": "D + W", "factors": {"D": 1.0, "W": 1.0}}]},
        "soil": {"allowable_bearing": "2000 psf", "friction": 0.35, "unit_weight": "0 pcf"},
        "walls": [
            {
                "id": "R1",
                "length": "24 ft",
                "thickness": "8 in",
                "footing": {"width": "2 ft", "thickness": "1 ft", "unit_weight": "0 pcf"},
                "loads": [
                    {"type": "line", "case": "D", "value": f"{100.0 / 24.0!r} klf"},
                    {"type": "lateral", "case": "W", "value": f"{shear_kip} kip", "height": "9 ft"},
                ],
            }
        ],
    }
    project = parse_project(raw)
    for case in check_wall(project, project.walls[0]).cases:
        if case.direction == direction:
            return case
    raise AssertionError(direction)


@pytest.mark.parametrize(
    ("shear_kip", "e_ft", "factor_of_safety"),
    [(40.0, 4.0, 3.0), (60.0, 6.0, 2.0), (80.0, 8.0, 1.5)],
    ids=["e=L/6", "e=L/4", "e=L/3"],
)
@pytest.mark.parametrize("direction", ["+", "-"])
def test_identity_factor_of_safety(shear_kip, e_ft, factor_of_safety, direction):
    """FS = L/(2e): 3 at e = L/6, 2 at e = L/4, 1.5 at e = L/3 (D)."""
    case = _case(shear_kip, direction)
    assert abs(case.bearing.eccentricity) == pytest.approx(e_ft * FOOT, rel=1e-12)
    assert case.overturning.ratio == pytest.approx(factor_of_safety, rel=1e-12)


def test_identity_at_kern_limit_is_a_full_triangle():
    """At FS = 3 (e = L/6): q_max = 2N/(BL) = 200 / 48 = 4.1667 ksf, q_min = 0, full contact (D)."""
    case = _case(40.0)
    assert case.bearing.q_max == pytest.approx(200.0 / 48.0 * KSF, rel=1e-12)
    assert case.bearing.q_min == pytest.approx(0.0, abs=1e-9 * KSF)
    assert case.bearing.contact_length == pytest.approx(24.0 * FOOT, rel=1e-12)


def test_identity_at_fs_2_contact_length():
    """At FS = 2 (e = L/4): contact 3(12 - 6) = 18 ft, q_max = 2 x 100 / (3 x 2 x 6) = 5.556 ksf (D)."""
    case = _case(60.0)
    assert case.bearing.contact_length == pytest.approx(18.0 * FOOT, rel=1e-12)
    assert case.bearing.q_max == pytest.approx(200.0 / 36.0 * KSF, rel=1e-12)


def test_identity_at_fs_1_5_contact_length():
    """At FS = 1.5 (e = L/3): contact 3(12 - 8) = 12 ft, half the footing (D)."""
    case = _case(80.0)
    assert case.bearing.contact_length == pytest.approx(12.0 * FOOT, rel=1e-12)

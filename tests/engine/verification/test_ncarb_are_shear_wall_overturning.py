"""Concrete shear wall on a continuous footing: overturning (published exam question).

Source: NCARB, *ARE Structural Systems* exam guide, sample question on the overturning of a concrete
shear wall on a continuous footing (question 28 or 31 depending on the edition); the solution is
reproduced consistently in two public forum threads (ARE 5 community "Structures" and the arecoach
forum; addresses in docs/verification.md, case 8). Inputs and answer status R; the extensions
(eccentricity, soil pressures, 0.6D, sliding, the L/(2e) identity) are derived by plain statics,
status D.

Inputs (R): wall 16 ft long x 40 ft high x 1.5 ft thick, 150 pcf -> 144 k; footing 20 ft x 6 ft x
2 ft -> 36 k; superimposed dead load 240 k, centred; lateral force 24 k at the top of the wall,
42 ft above the footing base; soil over the footing ignored.

Modelled as a Kernline project: the wall on a 20 ft footing with 2 ft extensions each end; the wall
weight and the superimposed dead load as D line loads over the wall; W = 24 kip at 40 ft above the
top of the 2 ft footing. Custom combinations apply the source's unfactored numbers ("D + W") and the
derived 0.6D extension ("0.6D + W").
"""

from __future__ import annotations

import pytest
from kernline.engine.model import Check
from kernline.engine.project_file import parse_project
from kernline.engine.results import check_wall

FOOT = 0.3048
KIP = 4448.2216152605  # N (exact: 1 lbf = 4.4482216152605 N, NIST SP 811)
KIP_FT = KIP * FOOT
KSF = KIP / FOOT**2


def _project(friction: float = 0.25) -> dict:
    return {
        "format": "kernline-project",
        "version": 1,
        "units": "US",
        "criteria": {
            "method": "service-fs",
            "required": {"overturning": 1.5, "sliding": 1.5, "bearing": 1.0},
            "combinations": [
                {"name": "D + W", "factors": {"D": 1.0, "W": 1.0}},
                {"name": "0.6D + W", "factors": {"D": 0.6, "W": 1.0}},
            ],
        },
        "soil": {"allowable_bearing": "8 ksf", "friction": friction, "unit_weight": "0 pcf"},
        "walls": [
            {
                "id": "SW1",
                "length": "16 ft",
                "thickness": "18 in",
                "footing": {
                    "width": "6 ft",
                    "thickness": "2 ft",
                    "extension_start": "2 ft",
                    "extension_end": "2 ft",
                    "unit_weight": "150 pcf",
                },
                "loads": [
                    # wall weight 144 k = 9 klf over 16 ft; superimposed dead load 240 k = 15 klf
                    {"type": "line", "case": "D", "value": "9 klf", "label": "wall weight"},
                    {"type": "line", "case": "D", "value": "15 klf", "label": "superimposed dead"},
                    {"type": "lateral", "case": "W", "value": "24 kip", "height": "40 ft"},
                ],
            }
        ],
    }


def _case(friction: float, combination: str, direction: str = "+"):
    project = parse_project(_project(friction))
    result = check_wall(project, project.walls[0])
    for case in result.cases:
        if case.combination == combination and case.direction == direction:
            return result, case
    raise AssertionError(f"no case {combination} {direction}")


def test_exam_question_footing_weight():
    """Footing 20 ft x 6 ft x 2 ft at 150 pcf weighs 36 k (R)."""
    result, _ = _case(0.25, "D + W")
    assert result.self_weight.footing == pytest.approx(36.0 * KIP, rel=1e-9)


def test_exam_question_total_vertical_load():
    """P = 240 + 144 + 36 = 420 k (R)."""
    _, case = _case(0.25, "D + W")
    assert case.vertical == pytest.approx(420.0 * KIP, rel=1e-9)


@pytest.mark.parametrize("direction", ["+", "-"])
def test_exam_question_resisting_moment(direction):
    """M_R = 420 k x 10 ft = 4,200 k-ft about the toe (R)."""
    _, case = _case(0.25, "D + W", direction)
    assert case.overturning.resisting == pytest.approx(4200.0 * KIP_FT, rel=1e-9)


@pytest.mark.parametrize("direction", ["+", "-"])
def test_exam_question_overturning_moment(direction):
    """M_O = 24 k x 42 ft = 1,008 k-ft (R)."""
    _, case = _case(0.25, "D + W", direction)
    assert case.overturning.moment == pytest.approx(1008.0 * KIP_FT, rel=1e-9)


@pytest.mark.parametrize("direction", ["+", "-"])
def test_exam_question_factor_of_safety(direction):
    """FS = 4,200 / 1,008 = 4.17 (R; the exam answer is 4.2)."""
    _, case = _case(0.25, "D + W", direction)
    # the source rounds 4.1667 to 4.17
    assert case.overturning.ratio == pytest.approx(4.17, rel=1e-3)


def test_exam_question_governing_overturning():
    """The governing overturning case is 0.6D + W with FS 2.50 (D: 0.6 x 4,200 / 1,008)."""
    project = parse_project(_project())
    governing = check_wall(project, project.walls[0]).governing[Check.OVERTURNING]
    assert governing.combination == "0.6D + W"
    assert governing.ratio == pytest.approx(2.50, rel=1e-9)


@pytest.mark.parametrize("direction", ["+", "-"])
def test_exam_question_extension_eccentricity(direction):
    """e = 1,008 / 420 = 2.40 ft < L/6 = 3.33 ft (D); the sign follows the direction of the push."""
    _, case = _case(0.25, "D + W", direction)
    sign = 1.0 if direction == "+" else -1.0
    assert case.bearing.eccentricity == pytest.approx(sign * 2.40 * FOOT, rel=1e-9)


def test_exam_question_extension_peak_pressure():
    """q_max = 3.5 ksf x (1 + 6 x 2.4 / 20) = 3.5 x 1.72 = 6.02 ksf (D)."""
    _, case = _case(0.25, "D + W")
    assert case.bearing.q_max == pytest.approx(6.02 * KSF, rel=1e-9)


def test_exam_question_extension_least_pressure():
    """q_min = 3.5 ksf x 0.28 = 0.98 ksf, whole footing in contact (D)."""
    _, case = _case(0.25, "D + W")
    assert case.bearing.q_min == pytest.approx(0.98 * KSF, rel=1e-9)
    assert case.bearing.contact_length == pytest.approx(20.0 * FOOT, rel=1e-12)


def test_exam_question_extension_overturning_with_0_6d():
    """With 0.6D: FS = 0.6 x 4,200 / 1,008 = 2.50 (D)."""
    _, case = _case(0.25, "0.6D + W")
    assert case.overturning.ratio == pytest.approx(2.50, rel=1e-9)


def test_exam_question_extension_sliding_mu_0_25():
    """Sliding with mu = 0.25: 0.25 x 420 / 24 = 105 / 24 = 4.38 (D)."""
    _, case = _case(0.25, "D + W")
    # the source rounds 4.375 to 4.38
    assert case.sliding.ratio == pytest.approx(4.38, rel=2e-3)


def test_exam_question_extension_sliding_mu_0_35():
    """Sliding with mu = 0.35: 0.35 x 420 / 24 = 147 / 24 = 6.13 (D)."""
    _, case = _case(0.35, "D + W")
    # the source rounds 6.125 to 6.13
    assert case.sliding.ratio == pytest.approx(6.13, rel=2e-3)


def test_exam_question_identity_l_over_2e():
    """With the resisting loads centred, FS = L / (2e) = 20 / 4.8 = 4.17 (D)."""
    result, case = _case(0.25, "D + W")
    assert case.overturning.ratio == pytest.approx(result.length / (2.0 * case.bearing.eccentricity), rel=1e-9)
    # the source rounds 20 / 4.8 = 4.1667 to 4.17
    assert 20.0 / (2.0 * case.bearing.eccentricity / FOOT) == pytest.approx(4.17, rel=1e-3)

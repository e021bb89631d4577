"""Integrated seismic scenario: a strip footing under a shear wall, ASD combinations 8 and 10.

Source: docs/verification.md, case 12 (status D: derived here by statics, not published), built on
International Building Code Table 1806.2 class 4 soil (q_a = 2,000 psf, friction 0.25, lateral
bearing 150 psf/ft; status R as reproduced in R. W. Day, *Geotechnical Earthquake Engineering
Handbook*, Table 14.6) and ASCE/SEI 7-16 2.4.5 combinations 8 (D + 0.7Ev + 0.7Eh) and 10
(0.6D + 0.7Eh with Ev = 0 at the soil interface, 12.4.2.2 exception; R2/M), including the sliding
check of that case.

Scenario: wall 20 ft long, D = 30 k centred; footing 24 ft x 3 ft x 1.5 ft at 150 pcf
(W_f = 16.2 k, D_total = 46.2 k); top of footing 1 ft below grade, soil over the footing ignored;
Eh = 12 k at 12 ft above the top of the footing (arm 13.5 ft); S_DS = 1.0.

Only the rows that match Kernline's contract are checked: combination 8 with Ev through the preset
(1.14D + 0.7E) and combination 10 with Ev = 0 as a custom combination. The rows with the 12.13.4
overturning reduction (x 0.75 on M) are outside the contract.
"""

from __future__ import annotations

import pytest
from kernline.engine.model import Check
from kernline.engine.project_file import parse_project
from kernline.engine.results import check_wall

FOOT = 0.3048
KIP = 4448.2216152605  # N
KIP_FT = KIP * FOOT
KSF = KIP / FOOT**2


def _raw(criteria: dict) -> dict:
    return {
        "format": "kernline-project",
        "version": 1,
        "criteria": criteria,
        "soil": {"allowable_bearing": "2000 psf", "friction": 0.25, "passive": "150 pcf", "unit_weight": "0 pcf"},
        "walls": [
            {
                "id": "S84",
                "length": "20 ft",
                "thickness": "8 in",
                "footing": {
                    "width": "3 ft",
                    "thickness": "1.5 ft",
                    "extension_start": "2 ft",
                    "extension_end": "2 ft",
                    "cover": "1 ft",
                    "unit_weight": "150 pcf",
                },
                "loads": [
                    {"type": "line", "case": "D", "value": "1.5 klf", "label": "wall and tributary dead, 30 k"},
                    {"type": "lateral", "case": "E", "value": "12 kip", "height": "12 ft"},
                ],
            }
        ],
    }


def _combination_10():
    criteria = {"combinations": [{"name": "0.6D + 0.7E (Ev = 0)", "factors": {"D": 0.6, "E": 0.7}}]}
    project = parse_project(_raw(criteria))
    result = check_wall(project, project.walls[0])
    return result, result.cases[0]


def _combination_8():
    project = parse_project(_raw({"method": "asce7-16-asd", "sds": 1.0}))
    result = check_wall(project, project.walls[0])
    # ASD 8 in the preset: (1.0 + 0.14 S_DS)D + 0.7E, the only case with a dead factor of 1.14
    matches = [c for c in result.cases if c.dead_factor == pytest.approx(1.14, rel=1e-12) and c.direction == "+"]
    assert len(matches) == 1
    return matches[0]


def test_scenario_footing_weight():
    """W_f = 150 x 24 x 3 x 1.5 = 16.2 k (D)."""
    result, _ = _combination_10()
    assert result.self_weight.total == pytest.approx(16.2 * KIP, rel=1e-12)


def test_case_10_vertical_load():
    """P = 0.6 x 46.2 = 27.72 k (D)."""
    assert _combination_10()[1].vertical == pytest.approx(27.72 * KIP, rel=1e-12)


def test_case_10_shear():
    """H = 0.7 x 12 = 8.40 k (D)."""
    assert _combination_10()[1].lateral == pytest.approx(8.40 * KIP, rel=1e-12)


def test_case_10_moment():
    """M = 8.4 x 13.5 = 113.40 k-ft about the centre of the base (D)."""
    assert _combination_10()[1].moment == pytest.approx(113.40 * KIP_FT, rel=1e-12)


def test_case_10_eccentricity_outside_kern():
    """e = 113.4 / 27.72 = 4.0909 ft > L/6 = 4.0 ft (D)."""
    # case 12 rounds 4.090909 to 4.0909
    assert _combination_10()[1].bearing.eccentricity == pytest.approx(4.0909 * FOOT, rel=3e-5)


def test_case_10_peak_pressure():
    """q_max = 2 x 27.72 / (3 x 3 x (12 - 4.0909)) = 0.7789 ksf (D)."""
    # case 12 rounds 0.77886 to 0.7789
    assert _combination_10()[1].bearing.q_max == pytest.approx(0.7789 * KSF, rel=1e-4)


def test_case_10_least_pressure():
    """Beyond the kern: q_min = 0 (D)."""
    assert _combination_10()[1].bearing.q_min == 0.0


def test_case_10_contact_length():
    """Contact 3 x (12 - 4.0909) = 23.727 ft (D)."""
    # case 12 rounds 23.7273 to 23.727
    assert _combination_10()[1].bearing.contact_length == pytest.approx(23.727 * FOOT, rel=3e-5)


def test_case_10_overturning_about_toe():
    """FS_OT = 27.72 x 12 / 113.4 = 2.933 (D)."""
    # case 12 rounds 2.93333 to 2.933
    assert _combination_10()[1].overturning.ratio == pytest.approx(2.933, rel=2e-4)


def test_case_10_sliding_friction():
    """Friction 0.25 x 27.72 = 6.93 k (case 12, D)."""
    assert _combination_10()[1].sliding.friction == pytest.approx(6.93 * KIP, rel=1e-12)


def test_case_10_sliding_lateral_bearing():
    """Lateral bearing 150 x (2.5^2 - 1^2) x 3 / 2 = 1.18 k (case 12, D)."""
    # case 12 rounds 1.18125 to 1.18
    assert _combination_10()[1].sliding.passive == pytest.approx(1.18 * KIP, rel=2e-3)


def test_case_10_sliding_resistance():
    """6.93 + 1.18 = 8.11 k against 8.40 k (case 12, D)."""
    # case 12 rounds 8.11125 to 8.11
    assert _combination_10()[1].sliding.resistance == pytest.approx(8.11 * KIP, rel=2e-4)


def test_case_10_sliding_fails():
    """FS = 8.11 / 8.40 = 0.966 < 1.0: the design fails in sliding (case 12, D)."""
    result, case = _combination_10()
    # case 12 rounds 0.96563 to 0.966
    assert case.sliding.ratio == pytest.approx(0.966, rel=5e-4)
    assert not case.sliding.passes
    assert not result.governing[Check.SLIDING].passes


def test_case_8_vertical_load():
    """P = (1 + 0.14 x 1.0) x 46.2 = 52.668 k (D)."""
    assert _combination_8().vertical == pytest.approx(52.668 * KIP, rel=1e-12)


def test_case_8_eccentricity_inside_kern():
    """e = 113.4 / 52.668 = 2.1531 ft < 4.0 ft (D)."""
    # case 12 rounds 2.15311 to 2.1531
    assert _combination_8().bearing.eccentricity == pytest.approx(2.1531 * FOOT, rel=3e-5)


def test_case_8_peak_pressure():
    """q_max = 52.668 / 72 x (1 + 6 x 2.1531 / 24) = 1.1252 ksf (D)."""
    # case 12 rounds 1.12525 to 1.1252
    assert _combination_8().bearing.q_max == pytest.approx(1.1252 * KSF, rel=1e-4)


def test_case_8_least_pressure():
    """q_min = 52.668 / 72 x (1 - 6 x 2.1531 / 24) = 0.3378 ksf (D)."""
    # case 12 rounds 0.33775 to 0.3378
    assert _combination_8().bearing.q_min == pytest.approx(0.3378 * KSF, rel=3e-4)


def test_case_8_overturning_about_toe():
    """FS_OT = 52.668 x 12 / 113.4 = 5.573 (D)."""
    # case 12 rounds 5.5733 to 5.573
    assert _combination_8().overturning.ratio == pytest.approx(5.573, rel=1e-4)

"""Sliding resistance from the IBC presumptive values (Table 1806.2 and section 1806.3).

Source: International Code Council, *International Building Code*, Table 1806.2 "Presumptive
load-bearing values" (status R: IBC 2012 as reproduced in R. W. Day, *Geotechnical Earthquake
Engineering Handbook*, McGraw-Hill, Table 14.6; 2015 to 2021 unchanged, M) and 1806.3.1 (friction
and lateral bearing may be combined, M), 1806.3.2 (cohesion-type resistance at most one-half the dead
load, R2). Check values (all D; docs/verification.md, case 11):

* 4.1 Class 4 (lateral bearing 150 psf/ft), face from grade to 2 ft, per ft of face: 300 lb/ft.
* 4.2 Class 4, face from 1 ft to 2.5 ft below grade, 3 ft wide: 150 x (2.5^2 - 1^2) x 3 / 2 = 1,181 lb.
* 4.3 Class 5 (cohesion 130 psf), contact 3 ft^2 per ft, dead load 600 plf: 390 lb/ft capped at
  0.5 x 600 = 300 lb/ft. (Kernline caps the cohesion at half of the combination's vertical load,
  per the issue's contract; with D alone that is half the dead load.)
* 4.6 Class 4 friction 0.25 on D = 420 kips: 105 kips.
"""

from __future__ import annotations

import pytest
from kernline.engine.project_file import parse_project
from kernline.engine.results import check_wall
from kernline.engine.sliding import cohesion_resistance, friction_resistance, passive_resistance

FOOT = 0.3048
LBF = 4.4482216152605  # N
KIP = 1000.0 * LBF
PCF = LBF / FOOT**3  # psf per ft of depth is the same unit
PSF = LBF / FOOT**2


def test_check_value_4_1_lateral_bearing_from_grade():
    """1/2 x 150 x 2^2 = 300 lb per ft of face (D)."""
    force = passive_resistance(150.0 * PCF, 1.0 * FOOT, 0.0, 2.0 * FOOT, 0.0)
    assert float(force) == pytest.approx(300.0 * LBF, rel=1e-12)


def test_check_value_4_2_lateral_bearing_below_cover():
    """1/2 x 150 x (2.5^2 - 1^2) x 3 = 1,181 lb (D)."""
    force = passive_resistance(150.0 * PCF, 3.0 * FOOT, 1.0 * FOOT, 1.5 * FOOT, 0.0)
    # case 11 rounds 1,181.25 to 1,181
    assert float(force) == pytest.approx(1181.0 * LBF, rel=3e-4)


def test_check_value_4_3_cohesion_capped_at_half_the_dead_load():
    """min(130 x 3, 0.5 x 600) = 300 lb per ft (D)."""
    force = cohesion_resistance(130.0 * PSF, 3.0 * FOOT, 1.0 * FOOT, 600.0 * LBF)
    assert float(force) == pytest.approx(300.0 * LBF, rel=1e-12)


def test_check_value_4_3_cohesion_below_the_cap():
    """With 1,000 plf of dead load the cap (500) does not bind: 130 x 3 = 390 lb per ft (D)."""
    force = cohesion_resistance(130.0 * PSF, 3.0 * FOOT, 1.0 * FOOT, 1000.0 * LBF)
    assert float(force) == pytest.approx(390.0 * LBF, rel=1e-12)


def test_check_value_4_6_friction_times_dead_load():
    """0.25 x 420 kips = 105 kips (D)."""
    assert float(friction_resistance(0.25, 420.0 * KIP)) == pytest.approx(105.0 * KIP, rel=1e-12)


def _class_5_wall():
    # the class 5 cohesion check as a wall: 3 ft wide strip, 10 ft long, D = 600 plf, footing weight off
    raw = {
        "format": "kernline-project",
        "version": 1,
        "criteria": {"combinations": [{"name": "D + W", "factors": {"D": 1.0, "W": 1.0}}]},
        "soil": {"allowable_bearing": "2000 psf", "friction": 0.0, "cohesion": "130 psf", "unit_weight": "0 pcf"},
        "walls": [
            {
                "id": "K5",
                "length": "10 ft",
                "thickness": "8 in",
                "footing": {"width": "3 ft", "thickness": "1 ft", "unit_weight": "0 pcf"},
                "loads": [
                    {"type": "line", "case": "D", "value": "600 plf"},
                    {"type": "lateral", "case": "W", "value": "1 kip", "height": "0 ft"},
                ],
            }
        ],
    }
    project = parse_project(raw)
    return check_wall(project, project.walls[0]).cases[0]


def test_check_value_4_3_through_a_wall():
    """A 10 ft strip: cohesion 130 x 3 x 10 = 3,900 lb capped at 0.5 x 6,000 = 3,000 lb (D)."""
    assert _class_5_wall().sliding.cohesion == pytest.approx(3000.0 * LBF, rel=1e-12)


def _class_4_wall():
    # the class 4 lateral bearing check as a wall: top of footing 1 ft below grade, 1.5 ft thick, 3 ft wide
    raw = {
        "format": "kernline-project",
        "version": 1,
        "criteria": {"combinations": [{"name": "D + W", "factors": {"D": 1.0, "W": 1.0}}]},
        "soil": {"allowable_bearing": "2000 psf", "friction": 0.25, "passive": "150 pcf", "unit_weight": "0 pcf"},
        "walls": [
            {
                "id": "K4",
                "length": "20 ft",
                "thickness": "8 in",
                "footing": {"width": "3 ft", "thickness": "1.5 ft", "cover": "1 ft", "unit_weight": "0 pcf"},
                "loads": [
                    {"type": "line", "case": "D", "value": "21 klf"},
                    {"type": "lateral", "case": "W", "value": "100 kip", "height": "0 ft"},
                ],
            }
        ],
    }
    project = parse_project(raw)
    return check_wall(project, project.walls[0]).cases[0]


def test_check_value_4_2_through_a_wall():
    """The end face of the footing from 1 ft to 2.5 ft below grade: 1,181 lb (D)."""
    # case 11 rounds 1,181.25 to 1,181
    assert _class_4_wall().sliding.passive == pytest.approx(1181.0 * LBF, rel=3e-4)


def test_check_value_4_6_through_a_wall():
    """D = 21 klf x 20 ft = 420 kips: friction 0.25 x 420 = 105 kips (D)."""
    assert _class_4_wall().sliding.friction == pytest.approx(105.0 * KIP, rel=1e-12)


def test_friction_and_lateral_bearing_combine():
    """1806.3.1: the resistance is 105 kips + 1.18 kips (D)."""
    assert _class_4_wall().sliding.resistance == pytest.approx(105.0 * KIP + 1181.25 * LBF, rel=1e-12)

"""ASCE 7-16 basic ASD load combinations: the arithmetic of the vertical and lateral totals.

Source: ASCE/SEI 7-16, *Minimum Design Loads and Associated Criteria for Buildings and Other
Structures*, section 2.4.1 (basic ASD combinations) with the seismic forms of 2.4.5 and the
vertical seismic effect Ev = 0.2 S_DS D of 12.4.2.2 (Eq. 12.4-4a). The combination list is status R2
(secondary quotations of the standard); the 2.4.5 seismic forms and Eq. 12.4-4a are M (from memory).
The check values are plain arithmetic (status D; docs/verification.md, case 10), for D = 10, L = 5,
Lr = 2, S = 3, R = 0, W = 8 (lateral), Eh = 6 (lateral), S_DS = 1.0, hence Ev = 0.2 x 1.0 x 10 = 2.

Kernline's preset (the issue's contract) carries Ev on the dead load in the 0.7E combinations, so
ASD 10 is the "with Ev" row (V = 4.6), not the soil-interface row with Ev = 0 (V = 6.0). Every row,
including combinations 1 to 3 and the Lr and R branches of 4 and 6, is derived the same way from the
2.4.1 list (D).
"""

from __future__ import annotations

import pytest
from kernline.engine.combinations import asce7_16_asd
from kernline.engine.model import LoadCase
from kernline.engine.project_file import parse_project
from kernline.engine.results import check_wall

KIP = 4448.2216152605  # N

LOADS = {LoadCase.D: 10.0, LoadCase.L: 5.0, LoadCase.LR: 2.0, LoadCase.S: 3.0, LoadCase.R: 0.0}
W_LATERAL = 8.0
EH_LATERAL = 6.0
SDS = 1.0

# (the combination as the contract lists it, expected V, expected H, status)
EXPECTED = [
    ("D", 10.0, 0.0, "D (2.4.1 combination 1)"),
    ("D + L", 15.0, 0.0, "D (combination 2)"),
    ("D + Lr", 12.0, 0.0, "D (combination 3, Lr)"),
    ("D + S", 13.0, 0.0, "D (combination 3, S)"),
    ("D + R", 10.0, 0.0, "D (combination 3, R)"),
    ("D + 0.75L + 0.75Lr", 15.25, 0.0, "D (combination 4, Lr)"),
    ("D + 0.75L + 0.75S", 16.0, 0.0, "D, table row ASD 4"),
    ("D + 0.75L + 0.75R", 13.75, 0.0, "D (combination 4, R)"),
    ("D + 0.6W", 10.0, 4.8, "D, table row ASD 5"),
    ("(1.0 + 0.14 S_DS)D + 0.7E", 11.4, 4.2, "D, table row ASD 8"),
    ("D + 0.75L + 0.45W + 0.75Lr", 15.25, 3.6, "D (combination 6, Lr)"),
    ("D + 0.75L + 0.45W + 0.75S", 16.0, 3.6, "D, table row ASD 6"),
    ("D + 0.75L + 0.45W + 0.75R", 13.75, 3.6, "D (combination 6, R)"),
    ("(1.0 + 0.105 S_DS)D + 0.75L + 0.525E + 0.75S", 17.05, 3.15, "D, table row ASD 9"),
    ("0.6D + 0.6W", 6.0, 4.8, "D, table row ASD 7"),
    ("(0.6 - 0.14 S_DS)D + 0.7E", 4.6, 4.2, "D, table row ASD 10 with Ev"),
]
IDS = [row[0] for row in EXPECTED]


def test_asd_preset_has_the_sixteen_combinations_of_the_contract():
    """The preset lists the 2.4.1 / 2.4.5 combinations with every Lr/S/R branch (16 in all)."""
    assert len(asce7_16_asd(SDS)) == len(EXPECTED)


@pytest.mark.parametrize(("index", "row"), list(enumerate(EXPECTED)), ids=IDS)
def test_asd_combination_vertical_total(index, row):
    """V = sum of factor x load over the vertical cases (case 10 check values, D)."""
    _, expected_v, _, _status = row
    combo = asce7_16_asd(SDS)[index]
    vertical = sum(combo.factor(case) * value for case, value in LOADS.items())
    assert vertical == pytest.approx(expected_v, rel=1e-12)


@pytest.mark.parametrize(("index", "row"), list(enumerate(EXPECTED)), ids=IDS)
def test_asd_combination_lateral_total(index, row):
    """H = factor on W x 8 + factor on E x 6 (case 10 check values, D)."""
    _, _, expected_h, _status = row
    combo = asce7_16_asd(SDS)[index]
    lateral = combo.factor(LoadCase.W) * W_LATERAL + combo.factor(LoadCase.E) * EH_LATERAL
    assert lateral == pytest.approx(expected_h, rel=1e-12, abs=1e-12)


def _project() -> dict:
    loads = [
        {"type": "point", "case": case, "value": f"{value} kip", "at": "10 ft"}
        for case, value in (("D", 10), ("L", 5), ("Lr", 2), ("S", 3), ("R", 0))
    ]
    loads += [
        {"type": "lateral", "case": "W", "value": "8 kip", "height": "10 ft"},
        {"type": "lateral", "case": "E", "value": "6 kip", "height": "10 ft"},
    ]
    return {
        "format": "kernline-project",
        "version": 1,
        "criteria": {"method": "asce7-16-asd", "sds": SDS},
        # self weight off so that V is the applied loads only
        "soil": {"allowable_bearing": "2000 psf", "friction": 0.35, "unit_weight": "0 pcf"},
        "walls": [
            {
                "id": "C1",
                "length": "20 ft",
                "thickness": "8 in",
                "footing": {"width": "3 ft", "thickness": "1 ft", "unit_weight": "0 pcf"},
                "loads": loads,
            }
        ],
    }


def _cases_by_combination():
    project = parse_project(_project())
    result = check_wall(project, project.walls[0])
    grouped: dict[str, list] = {}
    for case in result.cases:
        grouped.setdefault(case.combination, []).append(case)
    return grouped, [combo.name for combo in asce7_16_asd(SDS)]


@pytest.mark.parametrize(("index", "row"), list(enumerate(EXPECTED)), ids=IDS)
def test_asd_combination_totals_through_a_wall(index, row):
    """The same totals come out of a wall checked with the preset (every direction of each combination)."""
    _, expected_v, expected_h, _status = row
    grouped, names = _cases_by_combination()
    cases = grouped[names[index]]
    # a combination with W or E is checked in both directions, one without once
    assert [c.direction for c in cases] == (["+", "-"] if expected_h else ["none"])
    for case in cases:
        assert case.vertical == pytest.approx(expected_v * KIP, rel=1e-12)
        assert case.lateral == pytest.approx(expected_h * KIP, rel=1e-12, abs=1e-9)

"""ASCE 7-22 ASD combinations: strength-level snow entered as 0.7S, and the seismic snow factor.

Sources:

* ASCE/SEI 7-22, *Minimum Design Loads and Associated Criteria for Buildings and Other Structures*,
  section 2.4.1: ground snow loads are strength-level, so the ASD combinations 3, 4 and 6 carry 0.7S:
  D + (Lr or 0.7S or R); D + 0.75L + 0.75(Lr or 0.7S or R); D + 0.75L + 0.75(0.6W) + 0.75(Lr or 0.7S
  or R). Status **R2**: read in STRUCTURE magazine, "ASCE 7-22 Flat Roof Snow Load versus Minimum Snow
  Load", which quotes the combinations; the ASCE text itself was not seen.
* The snow term of the seismic combination 9 (D + 0.75L + 0.525E + ?S) was not confirmed, so Kernline
  asks the engineer for it (``criteria.seismic_snow_factor``) whenever a wall carries both E and S
  loads. The factor used below (0.5) is a value for the test only, not a claim about the standard.
* The remaining combinations and Ev = 0.2 S_DS D (12.4.2.2) are those of ASCE 7-16 (docs/verification.md,
  case 10; M).

Check values (docs/verification.md, case 14), D = 10, L = 5, Lr = 2, S = 3, R = 0, W = 8 (lateral),
E = 6 (lateral), S_DS = 1.0. All arithmetic on the R2 combinations (status D):

* D + 0.7S: 10 + 0.7 x 3 = 12.1.
* D + 0.75L + 0.75(0.7S): 10 + 3.75 + 0.525 x 3 = 10 + 3.75 + 1.575 = 15.325.
* D + 0.75L + 0.45W + 0.75(0.7S): V = 15.325, H = 0.45 x 8 = 3.6.
* Combination 9 with the factor 0.5 entered: (1 + 0.105 x 1.0)D + 0.75L + 0.525E + 0.5S:
  V = 11.05 + 3.75 + 1.5 = 16.3, H = 0.525 x 6 = 3.15; without S loads (no factor needed):
  V = 11.05 + 3.75 = 14.8, H = 3.15.
"""

from __future__ import annotations

import pytest
from kernline.engine.errors import InputError
from kernline.engine.project_file import parse_project
from kernline.engine.results import check_wall

KIP = 4448.2216152605  # N (NIST SP 811)

ALL_VERTICAL = (("D", 10), ("L", 5), ("Lr", 2), ("S", 3), ("R", 0))


def _raw(criteria: dict | None = None, vertical=ALL_VERTICAL, lateral=("W", "E")) -> dict:
    """A 20 ft wall with every load at its mid-length; footing and soil weightless."""
    loads = [{"type": "point", "case": case, "value": f"{value} kip", "at": "10 ft"} for case, value in vertical]
    sizes = {"W": "8 kip", "E": "6 kip"}
    loads += [{"type": "lateral", "case": case, "value": sizes[case], "height": "10 ft"} for case in lateral]
    return {
        "format": "kernline-project",
        "version": 1,
        "criteria": {"method": "asce7-22-asd", "sds": 1.0, **(criteria or {})},
        "soil": {"allowable_bearing": "2000 psf", "friction": 0.35, "unit_weight": "0 pcf"},
        "walls": [
            {
                "id": "S22",
                "length": "20 ft",
                "thickness": "8 in",
                "footing": {"width": "3 ft", "thickness": "1 ft", "unit_weight": "0 pcf"},
                "loads": loads,
            }
        ],
    }


def _grouped(raw: dict) -> dict[str, list]:
    project = parse_project(raw)
    grouped: dict[str, list] = {}
    for case in check_wall(project, project.walls[0]).cases:
        grouped.setdefault(case.combination, []).append(case)
    return grouped


# (combination as Kernline names it, V, H): the 0.7S rows and their neighbours (D)
EXPECTED = [
    ("D + 0.7S", 12.1, 0.0),  # 10 + 0.7 x 3 (check value, R2 combination 3)
    ("D + Lr", 12.0, 0.0),  # 10 + 2 (combination 3, Lr branch unchanged)
    ("D + 0.75L + 0.525S", 15.325, 0.0),  # 10 + 3.75 + 1.575 (combination 4)
    ("D + 0.75L + 0.75Lr", 15.25, 0.0),  # 10 + 3.75 + 1.5 (combination 4, Lr unchanged)
    ("D + 0.75L + 0.45W + 0.525S", 15.325, 3.6),  # combination 6; 0.45 x 8
    ("D + 0.75L + 0.45W + 0.75Lr", 15.25, 3.6),  # combination 6, Lr branch
]


@pytest.mark.parametrize(("name", "v", "h"), EXPECTED, ids=[row[0] for row in EXPECTED])
def test_snow_at_0_7_through_a_wall(name, v, h):
    """V and H of the combinations that carry snow (combination 9 is tested below) (D)."""
    cases = _grouped(_raw({"seismic_snow_factor": 0.5}))[name]
    assert [c.direction for c in cases] == (["+", "-"] if h else ["none"])
    for case in cases:
        assert case.vertical == pytest.approx(v * KIP, rel=1e-12)
        assert case.lateral == pytest.approx(h * KIP, rel=1e-12, abs=1e-9)


def test_no_combination_carries_full_snow():
    """Under 7-22 snow never enters at 1.0 or 0.75 (it is 0.7S or 0.75 x 0.7S) (R2)."""
    names = _grouped(_raw({"seismic_snow_factor": 0.5}))
    assert "D + S" not in names
    assert "D + 0.75L + 0.75S" not in names
    assert "D + 0.75L + 0.45W + 0.75S" not in names


def test_e_and_s_on_one_wall_need_the_seismic_snow_factor():
    """A wall with E and S loads and no criteria.seismic_snow_factor is refused, naming the key."""
    with pytest.raises(InputError) as err:
        parse_project(_raw())
    assert err.value.field == "criteria.seismic_snow_factor"
    assert "S22" in err.value.problem


def test_the_entered_seismic_snow_factor_appears_in_combination_9():
    """(1 + 0.105 S_DS)D + 0.75L + 0.525E + 0.5S: V = 11.05 + 3.75 + 1.5 = 16.3, H = 3.15 (D)."""
    cases = _grouped(_raw({"seismic_snow_factor": 0.5}))["1.105D + 0.75L + 0.525E + 0.5S"]
    assert [c.direction for c in cases] == ["+", "-"]
    for case in cases:
        assert case.dead_factor == pytest.approx(1.105, rel=1e-12)  # 1 + 0.75 x 0.7 x 0.2 x 1.0
        assert case.vertical == pytest.approx(16.3 * KIP, rel=1e-12)
        assert case.lateral == pytest.approx(3.15 * KIP, rel=1e-12)


def test_without_s_loads_the_factor_is_not_required():
    """E without S: parsed without the factor; combination 9 has no S term, V = 14.8, H = 3.15 (D)."""
    no_snow = tuple(row for row in ALL_VERTICAL if row[0] != "S")
    project = parse_project(_raw(vertical=no_snow))
    assert project.criteria.seismic_snow_factor is None
    cases = _grouped(_raw(vertical=no_snow))["1.105D + 0.75L + 0.525E"]
    for case in cases:
        assert case.vertical == pytest.approx(14.8 * KIP, rel=1e-12)  # 11.05 + 3.75
        assert case.lateral == pytest.approx(3.15 * KIP, rel=1e-12)  # 0.525 x 6


def test_without_e_loads_the_factor_is_not_required():
    """S without E: parsed without the factor (combination 9 carries no load of the wall's)."""
    project = parse_project(_raw(lateral=("W",)))
    assert project.criteria.seismic_snow_factor is None


def test_the_seismic_snow_factor_is_refused_by_asce7_16():
    """The factor is an option of ASCE 7-22 only: ASCE 7-16 refuses it, naming the key."""
    raw = _raw({"seismic_snow_factor": 0.5})
    raw["criteria"]["method"] = "asce7-16-asd"
    with pytest.raises(InputError) as err:
        parse_project(raw)
    assert err.value.field == "criteria.seismic_snow_factor"

"""IBC 2021 alternative allowable stress design combinations (1605.2) and the bearing increase (1806.1).

Sources:

* International Code Council, *International Building Code* 2021, section 1605.2 "Alternative basic
  load combinations" (numbered 1605.3.2 before 2021). The equations D + L + (Lr or S or R);
  D + L + 0.6 omega W; D + L + 0.6 omega W + S/2; D + L + S + 0.6 omega W/2; D + L + S + E/1.4;
  0.9D + E/1.4; two-thirds of the dead load where it counteracts wind; omega = 1.3 (wind of ASCE 7
  chapters 26 to 31) or 1.0; Ev taken as zero when proportioning foundations: status **M** (from
  memory for the 2021 text; engine/codes/ibc2021_alt.py notes that the two-thirds rule, omega and
  Ev = 0 were read in the IBC 2018 text). Only the arithmetic of the combinations is checked here.
* IBC 2021 section 1806.1: the allowable bearing pressures may be increased by one-third with the
  alternative basic load combinations of 1605.2 that include wind or earthquake loads. Status **R**,
  read in a state adoption of the IBC 2021 text.

Check values (docs/verification.md, case 13) for D = 10, L = 5, Lr = 2, S = 3, R = 0,
W = 8 (lateral), E = 6 (lateral). Every V and H is arithmetic on the M equations (status D):

| combination | omega = 1.3: V, H | omega = 1.0: V, H |
|---|---|---|
| D + L + Lr / S / R | 17 / 18 / 15, 0 | the same |
| D + L + 0.6 omega W | 15, 0.78 x 8 = 6.24 | 15, 0.6 x 8 = 4.8 |
| D + L + 0.6 omega W + S/2 | 10 + 5 + 1.5 = 16.5, 6.24 | 16.5, 4.8 |
| D + L + S + 0.6 omega W/2 | 18, 0.39 x 8 = 3.12 | 18, 0.3 x 8 = 2.4 |
| D + L + S + E/1.4 | 18, 6/1.4 = 4.2857 | the same |
| 0.9D + E/1.4 | 9.0, 4.2857 | the same |
| 2/3 D + 0.6 omega W | 20/3 = 6.667, 6.24 | 6.667, 4.8 |
"""

from __future__ import annotations

import pytest
from kernline.engine.errors import InputError
from kernline.engine.project_file import parse_project
from kernline.engine.results import check_wall

LBF = 4.4482216152605  # N (NIST SP 811)
KIP = 1000.0 * LBF
FOOT = 0.3048
PSF = LBF / FOOT**2

E_DIVISOR = 1.4  # IBC 2021 1605.2: E/1.4 (M)

# (name as Kernline prints it, V, H), omega = 1.3: 0.6 x 1.3 = 0.78, half of it 0.39 (all D)
EXPECTED_OMEGA_13 = [
    ("D + L + Lr", 17.0, 0.0),  # 10 + 5 + 2
    ("D + L + S", 18.0, 0.0),  # 10 + 5 + 3
    ("D + L + R", 15.0, 0.0),  # 10 + 5 + 0
    ("D + L + 0.78W", 15.0, 6.24),  # 10 + 5; 0.78 x 8
    ("D + L + 0.78W + 0.5S", 16.5, 6.24),  # 10 + 5 + 3/2; 0.78 x 8
    ("D + L + S + 0.39W", 18.0, 3.12),  # 10 + 5 + 3; 0.39 x 8
    ("D + L + S + E/1.4", 18.0, 6.0 / E_DIVISOR),  # 10 + 5 + 3; 6/1.4 = 4.2857
    ("0.9D + E/1.4", 9.0, 6.0 / E_DIVISOR),  # 0.9 x 10; 4.2857
    ("2/3D + 0.78W", 20.0 / 3.0, 6.24),  # 2/3 x 10 = 6.667; 0.78 x 8
]
# omega = 1.0: 0.6 x 1.0 = 0.6, half of it 0.3 (all D)
EXPECTED_OMEGA_10 = [
    ("D + L + Lr", 17.0, 0.0),
    ("D + L + S", 18.0, 0.0),
    ("D + L + R", 15.0, 0.0),
    ("D + L + 0.6W", 15.0, 4.8),  # 0.6 x 8
    ("D + L + 0.6W + 0.5S", 16.5, 4.8),
    ("D + L + S + 0.3W", 18.0, 2.4),  # 0.3 x 8
    ("D + L + S + E/1.4", 18.0, 6.0 / E_DIVISOR),
    ("0.9D + E/1.4", 9.0, 6.0 / E_DIVISOR),
    ("2/3D + 0.6W", 20.0 / 3.0, 4.8),
]


def _raw(criteria: dict | None = None, loads: list | None = None) -> dict:
    """A 20 ft wall with every load at its mid-length; footing and soil weightless, so V is the
    applied loads only."""
    if loads is None:
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
        "criteria": {"method": "ibc2021-alt-asd", **(criteria or {})},
        "soil": {"allowable_bearing": "2000 psf", "friction": 0.35, "unit_weight": "0 pcf"},
        "walls": [
            {
                "id": "A1",
                "length": "20 ft",
                "thickness": "8 in",
                "footing": {"width": "3 ft", "thickness": "1 ft", "unit_weight": "0 pcf"},
                "loads": loads,
            }
        ],
    }


def _result(criteria: dict | None = None, loads: list | None = None):
    project = parse_project(_raw(criteria, loads))
    return project, check_wall(project, project.walls[0])


def _grouped(result) -> dict[str, list]:
    grouped: dict[str, list] = {}
    for case in result.cases:
        grouped.setdefault(case.combination, []).append(case)
    return grouped


def test_the_preset_lists_the_nine_combinations_with_omega_1_3():
    """omega defaults to 1.3: the nine 1605.2 combinations by name (equations M)."""
    _, result = _result()
    assert list(_grouped(result)) == [name for name, _, _ in EXPECTED_OMEGA_13]


def test_omega_defaults_to_1_3_and_is_listed_as_assumed():
    """IBC 2021 1605.2: omega = 1.3 for wind of ASCE 7 chapters 26 to 31 (M), listed as assumed."""
    project, _ = _result()
    assert project.criteria.wind_omega == 1.3
    found = {a.field: a for a in project.assumptions}
    assert found["criteria.wind_omega"].value == "1.3"


@pytest.mark.parametrize(("name", "v", "h"), EXPECTED_OMEGA_13, ids=[row[0] for row in EXPECTED_OMEGA_13])
def test_omega_1_3_totals_through_a_wall(name, v, h):
    """V and H of each combination with omega = 1.3, in each direction it is checked (D)."""
    _, result = _result()
    cases = _grouped(result)[name]
    assert [c.direction for c in cases] == (["+", "-"] if h else ["none"])
    for case in cases:
        assert case.vertical == pytest.approx(v * KIP, rel=1e-12)
        assert case.lateral == pytest.approx(h * KIP, rel=1e-12, abs=1e-9)


@pytest.mark.parametrize(("name", "v", "h"), EXPECTED_OMEGA_10, ids=[row[0] for row in EXPECTED_OMEGA_10])
def test_omega_1_0_totals_through_a_wall(name, v, h):
    """V and H of each combination with omega = 1.0 (D)."""
    _, result = _result({"wind_omega": 1.0})
    cases = _grouped(result)[name]
    assert [c.direction for c in cases] == (["+", "-"] if h else ["none"])
    for case in cases:
        assert case.vertical == pytest.approx(v * KIP, rel=1e-12)
        assert case.lateral == pytest.approx(h * KIP, rel=1e-12, abs=1e-9)


def test_two_thirds_of_the_dead_load_counteracts_wind():
    """2/3 D where dead load counteracts wind: 2/3 x 10 = 6.667 (equation M, arithmetic D)."""
    _, result = _result()
    case = _grouped(result)["2/3D + 0.78W"][0]
    assert case.dead_factor == pytest.approx(2.0 / 3.0, rel=1e-12)
    # 20/3 = 6.6667, printed 6.667 in case 13
    assert case.vertical == pytest.approx(6.667 * KIP, rel=1e-4)


def test_other_omega_values_are_refused():
    """omega is 1.3 or 1.0 (IBC 2021 1605.2, M): 1.2 is refused, naming the key."""
    with pytest.raises(InputError) as err:
        parse_project(_raw({"wind_omega": 1.2}))
    assert err.value.field == "criteria.wind_omega"


def _dead_factors(result) -> list[float]:
    return [case.dead_factor for case in result.cases]


def test_ev_is_zero_whatever_s_ds():
    """Ev = 0 when proportioning foundations (M): S_DS = 0.5 and S_DS = 2.0 give the same cases (D)."""
    _, low = _result({"sds": 0.5})
    _, high = _result({"sds": 2.0})
    assert [(c.combination, c.direction) for c in low.cases] == [(c.combination, c.direction) for c in high.cases]
    assert _dead_factors(low) == _dead_factors(high)
    assert [c.vertical for c in low.cases] == [c.vertical for c in high.cases]
    assert [c.moment for c in low.cases] == [c.moment for c in high.cases]


def test_ev_is_zero_so_the_seismic_dead_factors_are_1_0_and_0_9():
    """D + L + S + E/1.4 keeps D at 1.0 and 0.9D + E/1.4 at 0.9 with S_DS = 2.0 (no Ev; M)."""
    _, result = _result({"sds": 2.0})
    grouped = _grouped(result)
    assert {c.dead_factor for c in grouped["D + L + S + E/1.4"]} == {1.0}
    assert {c.dead_factor for c in grouped["0.9D + E/1.4"]} == {0.9}


def test_walls_with_e_loads_need_no_s_ds():
    """The method does not use S_DS, so a wall with E loads parses without it."""
    project, _ = _result()
    assert project.criteria.sds == 0.0


def _allowable(result, name: str) -> float:
    return _grouped(result)[name][0].bearing.allowable


def test_bearing_increase_defaults_to_four_thirds():
    """IBC 2021 1806.1: one-third increase with W or E (R); taken by default and listed as assumed."""
    project, _ = _result()
    assert project.criteria.bearing_increase == pytest.approx(4.0 / 3.0, rel=1e-12)
    found = {a.field: a for a in project.assumptions}
    assert "1806.1" in found["criteria.bearing_increase"].basis


@pytest.mark.parametrize("name", ["D + L + Lr", "D + L + S", "D + L + R"])
def test_no_increase_in_gravity_combinations(name):
    """Without W or E the allowable stays 2,000 psf (1806.1, R)."""
    _, result = _result()
    assert _allowable(result, name) == pytest.approx(2000.0 * PSF, rel=1e-12)


@pytest.mark.parametrize("name", ["D + L + 0.78W", "D + L + 0.78W + 0.5S", "2/3D + 0.78W", "0.9D + E/1.4"])
def test_one_third_increase_with_wind_or_seismic(name):
    """With W or E the allowable is 4/3 x 2,000 = 2,666.7 psf (1806.1, R; arithmetic D)."""
    _, result = _result()
    # 8000/3 = 2666.67 psf
    assert _allowable(result, name) == pytest.approx(8000.0 / 3.0 * PSF, rel=1e-12)


def test_an_entered_bearing_increase_replaces_the_default():
    """bearing_increase 1.0 (none) entered: the wind case keeps 2,000 psf."""
    _, result = _result({"bearing_increase": 1.0})
    assert _allowable(result, "D + L + 0.78W") == pytest.approx(2000.0 * PSF, rel=1e-12)


@pytest.mark.parametrize(
    ("key", "value"),
    [("seismic_overturning_reduction", 0.25), ("ev_at_soil", False), ("seismic_snow_factor", 0.5)],
)
def test_options_of_other_methods_are_refused(key, value):
    """IBC 2021 1605.2 forbids the ASCE 7 12.13.4 reduction (M); Ev is zero throughout, so ev_at_soil
    has no meaning; the seismic snow factor belongs to ASCE 7-22. Each is refused, naming the key."""
    with pytest.raises(InputError) as err:
        parse_project(_raw({key: value}))
    assert err.value.field == f"criteria.{key}"
    assert "ibc2021-alt-asd" in err.value.problem

"""ASCE 7 seismic options at the foundation: Ev = 0 at the soil (12.4.2.2) and the overturning
reduction of 12.13.4.

Sources:

* ASCE/SEI 7-16, section 12.4.2.2, exception: the vertical seismic load effect Ev may be taken as
  zero in Eq. 12.4-2 (the counteracting form, 0.6D + 0.7E in ASD) when determining demands on the
  soil-structure interface of foundations. Status **R2** (secondary quotations of the standard).
  With ``"ev_at_soil": false`` Kernline takes the counteracting combination as 0.6D + 0.7E; the
  additive combination (1 + 0.14 S_DS)D + 0.7E keeps Ev.
* ASCE/SEI 7-16, section 12.13.4 "Reduction of foundation overturning": the overturning effects at
  the soil-foundation interface may be reduced by 25 % (equivalent lateral force procedure, not an
  inverted pendulum or cantilevered column) or 10 % (modal response spectrum analysis). Status
  **R2**: the ASCE 7-05 text of the same section and its commentary, read as quoted on a public
  engineering forum. Kernline multiplies the moment of the E lateral loads about the base by (1 - r)
  in the overturning and bearing checks; sliding keeps the full shear, and the moment of E vertical
  loads (hold-downs) is not reduced.

Hand-worked wall for 12.13.4 (invented for this test; all values **D**, worked twice):
wall 20 ft long, D = 1.5 klf over its length (30 k at the middle); footing 20 ft x 3 ft x 1.5 ft at
150 pcf, no extensions, no soil over it (W_f = 150 x 20 x 3 x 1.5 = 13,500 lb = 13.5 k at the
middle); Eh = 10 k at 10.5 ft above the top of the footing (arm to the base 10.5 + 1.5 = 12 ft);
an E hold-down uplift of 4 k at 1 ft from the wall's start on the heel side, moving to 19 ft when the
shear reverses; friction 0.35 on the whole vertical load. Combination 0.6D + 0.7E (``ev_at_soil``
false), direction "+" (toe at x = 20 ft):

* N = 0.6 x (30 + 13.5) - 0.7 x 4 = 26.1 - 2.8 = 23.3 k.
* Resisting about the toe: 26.1 x 10 = 261 k ft.
* Hold-down about the toe: 2.8 x (20 - 1) = 53.2 k ft (overturning; never reduced).
* Moment of Eh about the base: 0.7 x 10 x 12 = 84 k ft.
* Moment about the middle of the base from the hold-down: -2.8 x (1 - 10) = +25.2 k ft.

| r | Eh moment | M_OT | FS_OT = 261 / M_OT | M about the middle | e = M / 23.3 |
|---|---|---|---|---|---|
| 0 | 84 | 84 + 53.2 = 137.2 | 1.9023 | 84 + 25.2 = 109.2 | 4.6867 ft |
| 0.25 | 0.75 x 84 = 63 | 116.2 | 2.2461 | 88.2 | 3.7854 ft |
| 0.10 | 0.90 x 84 = 75.6 | 128.8 | 2.0264 | 100.8 | 4.3262 ft |

Check of the statics (D): resisting - overturning = N x (L/2 - e): 261 - 116.2 = 144.8 and
23.3 x (10 - 3.7854) = 144.8. Sliding, every r: 0.35 x 23.3 = 8.155 k against 0.7 x 10 = 7 k,
ratio 1.165. With r = 0.25, e = 3.7854 ft > L/6 = 3.333 ft, so q_max = 2 x 23.3 / (3 x 3 x
(10 - 3.7854)) = 46.6 / 55.931 = 0.8332 ksf.
(docs/verification.md, case 15.)
"""

from __future__ import annotations

import pytest
from kernline.engine.errors import InputError
from kernline.engine.project_file import parse_project
from kernline.engine.results import check_wall

LBF = 4.4482216152605  # N (NIST SP 811)
KIP = 1000.0 * LBF
FOOT = 0.3048
KIP_FT = KIP * FOOT
KSF = KIP / FOOT**2

COUNTERACTING = "0.6D + 0.7E"


# ---- 12.4.2.2: Ev = 0 at the soil-structure interface --------------------------------------------


def _simple_raw(method: str, sds: float, ev_at_soil: bool | None) -> dict:
    criteria: dict = {"method": method, "sds": sds}
    if ev_at_soil is not None:
        criteria["ev_at_soil"] = ev_at_soil
    return {
        "format": "kernline-project",
        "version": 1,
        "criteria": criteria,
        "soil": {"allowable_bearing": "2000 psf", "friction": 0.35, "unit_weight": "0 pcf"},
        "walls": [
            {
                "id": "V1",
                "length": "20 ft",
                "thickness": "8 in",
                "footing": {"width": "3 ft", "thickness": "1 ft", "unit_weight": "0 pcf"},
                "loads": [
                    {"type": "point", "case": "D", "value": "10 kip", "at": "10 ft"},
                    {"type": "lateral", "case": "E", "value": "6 kip", "height": "10 ft"},
                ],
            }
        ],
    }


def _dead_factors(raw: dict) -> dict[str, float]:
    project = parse_project(raw)
    return {case.combination: case.dead_factor for case in check_wall(project, project.walls[0]).cases}


@pytest.mark.parametrize("method", ["asce7-16-asd", "asce7-22-asd"])
@pytest.mark.parametrize("sds", [0.5, 1.0, 1.5])
def test_ev_at_soil_false_makes_the_counteracting_dead_factor_exactly_0_6(method, sds):
    """12.4.2.2 exception (R2): 0.6D + 0.7E, the dead factor 0.6 whatever S_DS."""
    factors = _dead_factors(_simple_raw(method, sds, ev_at_soil=False))
    assert factors[COUNTERACTING] == 0.6


@pytest.mark.parametrize("method", ["asce7-16-asd", "asce7-22-asd"])
@pytest.mark.parametrize(("sds", "name", "factor"), [(0.5, "1.07D + 0.7E", 1.07), (1.0, "1.14D + 0.7E", 1.14)])
def test_the_additive_seismic_combination_keeps_ev(method, sds, name, factor):
    """(1 + 0.14 S_DS)D + 0.7E keeps Ev with ev_at_soil false: 1 + 0.14 x 0.5 = 1.07, 1 + 0.14 = 1.14 (D)."""
    factors = _dead_factors(_simple_raw(method, sds, ev_at_soil=False))
    assert factors[name] == pytest.approx(factor, rel=1e-12)


@pytest.mark.parametrize(("sds", "name", "factor"), [(0.5, "0.53D + 0.7E", 0.53), (1.0, "0.46D + 0.7E", 0.46)])
def test_by_default_the_counteracting_combination_keeps_ev(sds, name, factor):
    """Without the option, (0.6 - 0.14 S_DS)D: 0.6 - 0.07 = 0.53, 0.6 - 0.14 = 0.46 (D); listed as assumed."""
    raw = _simple_raw("asce7-16-asd", sds, ev_at_soil=None)
    factors = _dead_factors(raw)
    assert factors[name] == pytest.approx(factor, rel=1e-12)
    assert COUNTERACTING not in factors
    assert "criteria.ev_at_soil" in {a.field for a in parse_project(raw).assumptions}


def test_ev_at_soil_false_through_the_vertical_load():
    """0.6D + 0.7E with D = 10 k, S_DS = 1.0: V = 6.0 k (the soil-interface row of case 10; D)."""
    project = parse_project(_simple_raw("asce7-16-asd", 1.0, ev_at_soil=False))
    cases = [c for c in check_wall(project, project.walls[0]).cases if c.combination == COUNTERACTING]
    assert [c.direction for c in cases] == ["+", "-"]
    for case in cases:
        assert case.vertical == pytest.approx(6.0 * KIP, rel=1e-12)


def test_ev_at_soil_must_be_true_or_false():
    with pytest.raises(InputError) as err:
        parse_project(_simple_raw("asce7-16-asd", 1.0, ev_at_soil="no"))  # type: ignore[arg-type]
    assert err.value.field == "criteria.ev_at_soil"


# ---- 12.13.4: reduction of foundation overturning -------------------------------------------------


def _hand_raw(r: float | None, method: str = "asce7-16-asd", lateral: bool = True) -> dict:
    criteria: dict = {"method": method, "sds": 1.0, "ev_at_soil": False}
    if r is not None:
        criteria["seismic_overturning_reduction"] = r
    loads: list[dict] = [
        {"type": "line", "case": "D", "value": "1.5 klf"},
        {"type": "point", "case": "E", "value": "-4 kip", "at": "1 ft", "reverses": True},
    ]
    if lateral:
        loads.append({"type": "lateral", "case": "E", "value": "10 kip", "height": "10.5 ft"})
    return {
        "format": "kernline-project",
        "version": 1,
        "criteria": criteria,
        "soil": {"allowable_bearing": "3000 psf", "friction": 0.35, "unit_weight": "110 pcf"},
        "walls": [
            {
                "id": "R1",
                "length": "20 ft",
                "thickness": "8 in",
                "footing": {"width": "3 ft", "thickness": "1.5 ft", "unit_weight": "150 pcf"},
                "loads": loads,
            }
        ],
    }


def _counteracting(r: float | None, direction: str = "+", lateral: bool = True):
    project = parse_project(_hand_raw(r, lateral=lateral))
    for case in check_wall(project, project.walls[0]).cases:
        if case.combination == COUNTERACTING and case.direction == direction:
            return case
    raise AssertionError("no 0.6D + 0.7E case")


# (r, M_OT, FS_OT, M about the middle, e): the table of the module docstring (D)
HAND = [
    (0.0, 137.2, 261.0 / 137.2, 109.2, 109.2 / 23.3),
    (0.25, 116.2, 261.0 / 116.2, 88.2, 88.2 / 23.3),
    (0.10, 128.8, 261.0 / 128.8, 100.8, 100.8 / 23.3),
]


def test_hand_wall_vertical_load_and_resisting_moment():
    """N = 0.6 x 43.5 - 0.7 x 4 = 23.3 k; M_R = 26.1 x 10 = 261 k ft (D)."""
    case = _counteracting(0.25)
    assert case.dead_factor == 0.6
    assert case.vertical == pytest.approx(23.3 * KIP, rel=1e-12)
    assert case.overturning.resisting == pytest.approx(261.0 * KIP_FT, rel=1e-12)


@pytest.mark.parametrize(("r", "m_ot", "fs", "m", "e"), HAND, ids=["r=0", "r=0.25", "r=0.10"])
def test_hand_wall_overturning_moment(r, m_ot, fs, m, e):
    """M_OT = (1 - r) x 84 + 53.2 k ft: the hold-down's 53.2 is not reduced (D)."""
    assert _counteracting(r).overturning.moment == pytest.approx(m_ot * KIP_FT, rel=1e-12)


@pytest.mark.parametrize(("r", "m_ot", "fs", "m", "e"), HAND, ids=["r=0", "r=0.25", "r=0.10"])
def test_hand_wall_overturning_ratio(r, m_ot, fs, m, e):
    """FS_OT = 261 / M_OT: 1.9023 (r = 0), 2.2461 (r = 0.25), 2.0264 (r = 0.10) (D)."""
    assert _counteracting(r).overturning.ratio == pytest.approx(fs, rel=1e-12)


@pytest.mark.parametrize(("r", "m_ot", "fs", "m", "e"), HAND, ids=["r=0", "r=0.25", "r=0.10"])
def test_hand_wall_moment_about_the_middle(r, m_ot, fs, m, e):
    """M = (1 - r) x 84 + 25.2 k ft: 109.2, 88.2, 100.8 (D)."""
    assert _counteracting(r).moment == pytest.approx(m * KIP_FT, rel=1e-12)


@pytest.mark.parametrize(("r", "m_ot", "fs", "m", "e"), HAND, ids=["r=0", "r=0.25", "r=0.10"])
def test_hand_wall_eccentricity(r, m_ot, fs, m, e):
    """e = M / 23.3: 4.6867, 3.7854, 4.3262 ft (D)."""
    assert _counteracting(r).bearing.eccentricity == pytest.approx(e * FOOT, rel=1e-12)


@pytest.mark.parametrize(("r", "m_ot", "fs", "m", "e"), HAND, ids=["r=0", "r=0.25", "r=0.10"])
def test_hand_wall_is_symmetric(r, m_ot, fs, m, e):
    """The hold-down moves to 19 ft when the shear reverses: direction "-" mirrors "+" (D)."""
    plus, minus = _counteracting(r, "+"), _counteracting(r, "-")
    assert minus.overturning.ratio == pytest.approx(plus.overturning.ratio, rel=1e-12)
    assert minus.bearing.eccentricity == pytest.approx(-plus.bearing.eccentricity, rel=1e-12)


def test_hand_wall_peak_pressure_with_r_0_25():
    """e = 3.7854 ft > L/6: q_max = 46.6 / (9 x 6.2146) = 0.8332 ksf (D)."""
    # exact 46.6 / (9 x (10 - 88.2/23.3)) = 0.833165 ksf
    assert _counteracting(0.25).bearing.q_max == pytest.approx(0.833165 * KSF, rel=1e-6)


@pytest.mark.parametrize("r", [0.25, 0.10])
def test_sliding_is_not_reduced(r):
    """Sliding keeps the full shear: 0.35 x 23.3 / 7 = 1.165, the same as with r = 0 (D)."""
    reduced, unreduced = _counteracting(r).sliding, _counteracting(0.0).sliding
    assert reduced.force == pytest.approx(7.0 * KIP, rel=1e-12)
    assert reduced.ratio == pytest.approx(1.165, rel=1e-12)
    assert reduced.ratio == unreduced.ratio


def test_e_vertical_loads_alone_are_not_reduced():
    """Without an E lateral load only the hold-down acts: r = 0.25 changes nothing (D)."""
    reduced, unreduced = _counteracting(0.25, "none", lateral=False), _counteracting(0.0, "none", lateral=False)
    # M_OT = 53.2 k ft either way (2.8 x 19)
    assert reduced.overturning.moment == pytest.approx(53.2 * KIP_FT, rel=1e-12)
    assert reduced.overturning.ratio == unreduced.overturning.ratio
    assert reduced.moment == unreduced.moment


def test_wind_cases_are_not_reduced():
    """The reduction is of seismic overturning: D + 0.6W is the same with r = 0.25 and r = 0."""

    def wind_case(r: float):
        raw = _hand_raw(r)
        raw["walls"][0]["loads"].append({"type": "lateral", "case": "W", "value": "10 kip", "height": "10.5 ft"})
        project = parse_project(raw)
        return next(c for c in check_wall(project, project.walls[0]).cases if c.combination == "D + 0.6W")

    assert wind_case(0.25).overturning.moment == wind_case(0.0).overturning.moment
    assert wind_case(0.25).moment == wind_case(0.0).moment


@pytest.mark.parametrize("r", [0.05, 0.2, 0.3, 0.5])
def test_other_reductions_are_refused(r):
    """12.13.4 allows 0.25 or 0.10 (and 0, none): any other r is refused, naming the key."""
    with pytest.raises(InputError) as err:
        parse_project(_hand_raw(r))
    assert err.value.field == "criteria.seismic_overturning_reduction"


@pytest.mark.parametrize("method", ["service-fs", "ibc2021-alt-asd"])
def test_the_reduction_is_refused_by_methods_that_do_not_allow_it(method):
    """Service loads (common practice) and IBC 2021 1605.2 (which forbids 12.13.4, M) refuse r."""
    raw = _hand_raw(0.25, method)
    del raw["criteria"]["ev_at_soil"], raw["criteria"]["sds"]
    with pytest.raises(InputError) as err:
        parse_project(raw)
    assert err.value.field == "criteria.seismic_overturning_reduction"

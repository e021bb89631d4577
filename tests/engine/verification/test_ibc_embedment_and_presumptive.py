"""IBC 2021 footing embedment (1809.4, 1809.5), presumptive soil classes (Table 1806.2) and sliding
resistance on the dead load (Table 1806.2 note a, 1806.3.2).

Sources:

* International Code Council, *International Building Code* 2021, section 1809.4: the bottom of a
  footing at least 12 in below the surface of undisturbed ground, and footings at least 12 in wide;
  section 1809.5: footings below the frost line. Status **R**, read in a state adoption of the IBC
  2021 text. Kernline's ratio: (soil cover + t_f) / max(12 in, frost depth), required 1.0.
* IBC Table 1806.2 "Presumptive load-bearing values": status **R**, the IBC 2012 table reproduced in
  R. W. Day, *Geotechnical Earthquake Engineering Handbook* (McGraw-Hill), Table 14.6; the 2015 to
  2021 editions taken as unchanged (**M**). Classes 1 to 5: allowable bearing 12,000 / 4,000 / 3,000 /
  2,000 / 1,500 psf; lateral bearing 1,200 / 400 / 200 / 150 / 100 psf/ft; friction 0.70 / 0.35 /
  0.35 / 0.25 / none; cohesion none / none / none / none / 130 psf. psf to Pa with the exact
  definitions 1 lbf = 4.4482216152605 N and 1 ft = 0.3048 m (NIST Special Publication 811,
  appendix B).
* Table 1806.2 note a: the coefficient of friction multiplies the dead load (R, as above);
  1806.3.2: cohesion-type resistance at most one-half the dead load (R2, docs/verification.md
  case 11). Kernline's ``sliding_basis`` "dead": friction = mu x f_D (D + W_f), never more than
  mu N; the cohesion cap is one-half of f_D (D + W_f).

Check values (docs/verification.md, case 16), all **D** (arithmetic on the R values):

* embedment: t_f = 12 in, no cover, no frost depth: 12/12 = 1.0 (at the limit, passes); t_f = 11 in:
  11/12 = 0.9167 (fails); cover 6 in + t_f 12 in: 18/12 = 1.5; frost 36 in, cover 12 in: t_f 24 in
  gives 36/36 = 1.0, t_f 23 in 35/36 = 0.9722, t_f 30 in 42/36 = 1.1667; frost 6 in: the 12 in of
  1809.4 governs, 12/12 = 1.0.
* sizing with frost 36 in and cover 12 in: t_f = 36 - 12 = 24 in.
* 4.6 through a wall with live load (class 4, mu = 0.25): wall 20 ft, D = 19.8 klf (396 k), footing
  20 ft x 4 ft x 2 ft at 150 pcf (W_f = 24 k), D + W_f = 420 k, L = 10 klf (200 k). In
  D + 0.75L + 0.45W + 0.75S: N = 420 + 150 = 570 k, friction 0.25 x 420 = 105 k (not 0.25 x 570 =
  142.5 k); in 0.6D + 0.6W: 0.25 x 0.6 x 420 = 63 k.
* the same wall with a W uplift of 100 k at its middle: 0.6D + 0.6W: N = 252 - 60 = 192 k < 252 k,
  friction 0.25 x 192 = 48 k (mu N); D + 0.6W: N = 420 - 60 = 360 k, friction 90 k;
  D + 0.75L + 0.45W + 0.75S: N = 570 - 45 = 525 k > 420 k, friction stays 105 k.
* 4.3 through a wall with live load (class 5, cohesion 130 psf): wall 10 ft, footing 3 ft wide and
  weightless, D = 600 plf, L = 400 plf, combination D + L + W: cohesion 130 x 3 = 390 lb/ft limited to
  0.5 x 600 = 300 lb/ft, 3,000 lb on the 10 ft strip (on the whole N it would be min(3,900, 5,000) =
  3,900 lb).
"""

from __future__ import annotations

import numpy as np
import pytest
from kernline.engine.checks import EMBEDMENT
from kernline.engine.errors import InputError
from kernline.engine.project_file import parse_project
from kernline.engine.results import check_wall
from kernline.engine.sizing import size_footing

INCH = 0.0254
FOOT = 0.3048
LBF = 4.4482216152605  # N (NIST SP 811)
KIP = 1000.0 * LBF
PSF = LBF / FOOT**2  # Pa per psf
PSF_PER_FT = LBF / FOOT**3  # Pa/m per psf/ft


# ---- IBC 2021 1809.4 and 1809.5: embedment -----------------------------------------------------------


def _embedment_raw(thickness: str, cover: str = "0 in", frost: str | None = None, sizing: dict | None = None) -> dict:
    """A lightly loaded 10 ft wall that passes every stability check with room to spare."""
    wall = {
        "id": "F1",
        "length": "10 ft",
        "thickness": "8 in",
        "footing": {"width": "2 ft", "thickness": thickness, "cover": cover},
        "loads": [{"type": "line", "case": "D", "value": "1 klf"}],
    }
    if sizing is not None:
        wall["sizing"] = sizing
    raw = {
        "format": "kernline-project",
        "version": 1,
        "soil": {"allowable_bearing": "2000 psf", "friction": 0.35, "unit_weight": "110 pcf"},
        "walls": [wall],
    }
    if frost is not None:
        raw["site"] = {"frost_depth": frost}
    return raw


def _embedment(thickness: str, cover: str = "0 in", frost: str | None = None):
    project = parse_project(_embedment_raw(thickness, cover, frost))
    result = check_wall(project, project.walls[0])
    return result, result.governing[EMBEDMENT]


# (t_f, cover, frost depth, ratio, passes): the breakpoints of case 16 (D)
BREAKPOINTS = [
    ("12 in", "0 in", None, 1.0, True),  # 12 / 12, at the 1809.4 limit
    ("11 in", "0 in", None, 11.0 / 12.0, False),  # 0.9167
    ("12 in", "6 in", None, 1.5, True),  # 18 / 12
    ("24 in", "12 in", "36 in", 1.0, True),  # 36 / 36, at the 1809.5 limit
    ("23 in", "12 in", "36 in", 35.0 / 36.0, False),  # 0.9722
    ("30 in", "12 in", "36 in", 42.0 / 36.0, True),  # 1.1667
    ("12 in", "0 in", "6 in", 1.0, True),  # a shallow frost line: the 12 in of 1809.4 governs
]


@pytest.mark.parametrize(("t", "cover", "frost", "ratio", "passes"), BREAKPOINTS)
def test_embedment_ratio(t, cover, frost, ratio, passes):
    """(cover + t_f) / max(12 in, frost depth) (1809.4, 1809.5: R; arithmetic D)."""
    _, governing = _embedment(t, cover, frost)
    assert governing.ratio == pytest.approx(ratio, rel=1e-12)


@pytest.mark.parametrize(("t", "cover", "frost", "ratio", "passes"), BREAKPOINTS)
def test_embedment_pass_or_fail(t, cover, frost, ratio, passes):
    """At the limit it passes, below it fails (required ratio 1.0)."""
    result, governing = _embedment(t, cover, frost)
    assert governing.passes is passes
    assert governing.required == 1.0
    # the wall's other checks pass, so embedment decides the wall
    assert result.passes is passes


@pytest.mark.parametrize(
    ("t", "cover", "frost", "depth", "required"), [("12 in", "6 in", None, 18, 12), ("24 in", "12 in", "36 in", 36, 36)]
)
def test_embedment_record(t, cover, frost, depth, required):
    """The record gives the depth below grade and the depth required (in inches: D)."""
    _, governing = _embedment(t, cover, frost)
    assert governing.record.depth == pytest.approx(depth * INCH, rel=1e-12)
    assert governing.record.required_depth == pytest.approx(required * INCH, rel=1e-12)


def test_embedment_takes_part_in_governing_without_a_case():
    """WallResult.governing has an "embedment" entry with no combination and case_index None."""
    result, governing = _embedment("12 in", "6 in")
    assert EMBEDMENT in result.governing
    assert governing.check.id == "embedment"
    assert governing.case_index is None
    assert governing.combination == ""
    assert governing.passes


def test_a_too_shallow_footing_is_the_worst_check():
    """t_f = 11 in: the stability checks pass, the wall fails on embedment (0.9167, D)."""
    result, _ = _embedment("11 in")
    assert result.worst.check is EMBEDMENT
    assert not result.passes


def _sized(frost: str | None):
    project = parse_project(_embedment_raw("12 in", "12 in", frost))
    return project, size_footing(project, project.walls[0])


def test_sizing_goes_below_the_frost_line():
    """Frost 36 in, cover 12 in: sizing picks t_f = 36 - 12 = 24 in (D), on the 1 in grid from 12 in."""
    _, sizing = _sized("36 in")
    assert sizing.feasible
    assert sizing.thickness == pytest.approx(24 * INCH, rel=1e-9)


def test_sizing_never_proposes_a_footing_too_shallow():
    """Every passing candidate of the map has t_f >= 24 in; every t_f of 23 in or less fails."""
    _, sizing = _sized("36 in")
    rows = np.nonzero(sizing.passes.any(axis=1))[0]
    assert sizing.thicknesses[rows].min() >= 24 * INCH - 1e-9
    assert not sizing.passes[sizing.thicknesses < 24 * INCH - 1e-9].any()


def test_sizing_without_a_frost_depth_keeps_the_thinnest():
    """Without a frost depth, cover 12 in + 12 in already meets 1809.4: t_f = 12 in."""
    _, sizing = _sized(None)
    assert sizing.thickness == pytest.approx(12 * INCH, rel=1e-9)


def test_frost_depth_not_given_is_listed_as_assumed():
    project = parse_project(_embedment_raw("12 in"))
    assert project.site.frost_depth is None
    assert "site.frost_depth" in {a.field for a in project.assumptions}


def test_width_min_below_12_in_is_refused():
    """1809.4: footings at least 12 in wide; width_min 11 in is refused, naming the key."""
    with pytest.raises(InputError) as err:
        parse_project(_embedment_raw("12 in", sizing={"width_min": "11 in"}))
    assert err.value.field == "walls[0].sizing.width_min"
    assert "1809.4" in err.value.problem


def test_width_min_of_12_in_is_accepted():
    project = parse_project(_embedment_raw("12 in", sizing={"width_min": "12 in"}))
    assert project.walls[0].sizing.width_min == pytest.approx(12 * INCH, rel=1e-12)


# ---- IBC Table 1806.2: presumptive classes ------------------------------------------------------------

# class: (allowable bearing psf, lateral bearing psf/ft, friction, cohesion psf), Table 1806.2 (R)
TABLE = {
    1: (12_000.0, 1_200.0, 0.70, 0.0),
    2: (4_000.0, 400.0, 0.35, 0.0),
    3: (3_000.0, 200.0, 0.35, 0.0),
    4: (2_000.0, 150.0, 0.25, 0.0),
    5: (1_500.0, 100.0, 0.0, 130.0),
}


def _class_raw(number: int, **soil: object) -> dict:
    return {
        "format": "kernline-project",
        "version": 1,
        "soil": {"presumptive_class": number, "unit_weight": "110 pcf", **soil},
        "walls": [
            {
                "id": "P1",
                "length": "10 ft",
                "thickness": "8 in",
                "footing": {"width": "2 ft", "thickness": "12 in"},
                "loads": [{"type": "line", "case": "D", "value": "1 klf"}],
            }
        ],
    }


@pytest.mark.parametrize("number", sorted(TABLE))
def test_presumptive_class_allowable_bearing(number):
    soil = parse_project(_class_raw(number)).soil
    assert soil.allowable_bearing == pytest.approx(TABLE[number][0] * PSF, rel=1e-12)


@pytest.mark.parametrize("number", sorted(TABLE))
def test_presumptive_class_lateral_bearing(number):
    soil = parse_project(_class_raw(number)).soil
    assert soil.passive == pytest.approx(TABLE[number][1] * PSF_PER_FT, rel=1e-12)


@pytest.mark.parametrize("number", sorted(TABLE))
def test_presumptive_class_friction(number):
    soil = parse_project(_class_raw(number)).soil
    assert soil.friction == pytest.approx(TABLE[number][2], rel=1e-12, abs=0.0)


@pytest.mark.parametrize("number", sorted(TABLE))
def test_presumptive_class_cohesion(number):
    soil = parse_project(_class_raw(number)).soil
    assert soil.cohesion == pytest.approx(TABLE[number][3] * PSF, rel=1e-12, abs=0.0)


@pytest.mark.parametrize("number", sorted(TABLE))
def test_presumptive_class_is_recorded(number):
    assert parse_project(_class_raw(number)).soil.presumptive_class == number


@pytest.mark.parametrize(
    ("key", "value"), [("allowable_bearing", "3000 psf"), ("friction", 0.3), ("cohesion", "100 psf"), ("passive", "200 pcf")]
)
def test_a_value_beside_a_class_is_refused(key, value):
    """The class sets the value: entering it too is refused, naming the key."""
    with pytest.raises(InputError) as err:
        parse_project(_class_raw(4, **{key: value}))
    assert err.value.field == f"soil.{key}"


@pytest.mark.parametrize("number", [0, 6, "4", 4.0, True])
def test_classes_outside_the_table_are_refused(number):
    with pytest.raises(InputError) as err:
        parse_project(_class_raw(number))  # type: ignore[arg-type]
    assert err.value.field == "soil.presumptive_class"


def test_sliding_basis_defaults_to_dead_with_a_class_and_is_listed():
    """Note a: friction on the dead load; taken by default with a class and listed as assumed."""
    project = parse_project(_class_raw(4))
    assert project.soil.sliding_basis.value == "dead"
    found = {a.field: a for a in project.assumptions}
    assert found["soil.sliding_basis"].value == "dead"
    assert "1806.2" in found["soil.sliding_basis"].basis


def test_sliding_basis_defaults_to_total_with_report_values():
    raw = _class_raw(4)
    raw["soil"] = {"allowable_bearing": "2000 psf", "friction": 0.25, "unit_weight": "110 pcf"}
    assert parse_project(raw).soil.sliding_basis.value == "total"


# ---- sliding on the dead load: check values 4.6 and 4.3 through walls --------------------------------


def _friction_wall(basis: str | None = None, uplift: bool = False) -> dict:
    """Class 4; D + W_f = 396 + 24 = 420 k, L = 200 k, W = 40 k lateral (ASCE 7-16 ASD preset)."""
    loads: list[dict] = [
        {"type": "line", "case": "D", "value": "19.8 klf"},  # 19.8 x 20 = 396 k
        {"type": "line", "case": "L", "value": "10 klf"},  # 200 k
        {"type": "lateral", "case": "W", "value": "40 kip", "height": "10 ft"},
    ]
    if uplift:
        loads.append({"type": "point", "case": "W", "value": "-100 kip", "at": "10 ft"})
    soil: dict = {"presumptive_class": 4, "unit_weight": "110 pcf"}
    if basis is not None:
        soil["sliding_basis"] = basis
    return {
        "format": "kernline-project",
        "version": 1,
        "criteria": {"method": "asce7-16-asd"},
        "soil": soil,
        "walls": [
            {
                "id": "G4",
                "length": "20 ft",
                "thickness": "8 in",
                # 150 pcf x 20 ft x 4 ft x 2 ft = 24,000 lb
                "footing": {"width": "4 ft", "thickness": "2 ft", "unit_weight": "150 pcf"},
                "loads": loads,
            }
        ],
    }


def _sliding(raw: dict, combination: str):
    project = parse_project(raw)
    cases = [c for c in check_wall(project, project.walls[0]).cases if c.combination == combination]
    assert cases
    return cases


COMPANION_WIND = "D + 0.75L + 0.45W + 0.75S"


def test_check_value_4_6_friction_on_the_dead_load_with_live_load():
    """N = 420 + 0.75 x 200 = 570 k, but friction = 0.25 x 1.0 x 420 = 105 k (note a; D)."""
    for case in _sliding(_friction_wall(), COMPANION_WIND):
        assert case.vertical == pytest.approx(570.0 * KIP, rel=1e-12)
        assert case.sliding.friction == pytest.approx(105.0 * KIP, rel=1e-12)


def test_check_value_4_6_on_the_whole_vertical_load_instead():
    """sliding_basis "total": 0.25 x 570 = 142.5 k (D), the contrast."""
    for case in _sliding(_friction_wall("total"), COMPANION_WIND):
        assert case.sliding.friction == pytest.approx(142.5 * KIP, rel=1e-12)


def test_friction_carries_the_dead_factor_of_the_combination():
    """0.6D + 0.6W: 0.25 x 0.6 x 420 = 63 k (D)."""
    for case in _sliding(_friction_wall(), "0.6D + 0.6W"):
        assert case.sliding.friction == pytest.approx(63.0 * KIP, rel=1e-12)


@pytest.mark.parametrize(
    ("combination", "normal", "friction"),
    [
        ("0.6D + 0.6W", 192.0, 48.0),  # N = 252 - 0.6 x 100 = 192 < 252: mu N
        ("D + 0.6W", 360.0, 90.0),  # N = 420 - 60 = 360 < 420: mu N
        (COMPANION_WIND, 525.0, 105.0),  # N = 570 - 0.45 x 100 = 525 > 420: mu f_D (D + W_f)
    ],
)
def test_friction_never_exceeds_mu_n_under_uplift(combination, normal, friction):
    """Uplift in the combination: friction = 0.25 x min(f_D (D + W_f), N) (D)."""
    for case in _sliding(_friction_wall(uplift=True), combination):
        assert case.vertical == pytest.approx(normal * KIP, rel=1e-12)
        assert case.sliding.friction == pytest.approx(friction * KIP, rel=1e-12)
        assert case.sliding.friction <= 0.25 * case.vertical * (1.0 + 1e-12)


def _cohesion_wall(basis: str | None = None) -> dict:
    soil: dict = {"presumptive_class": 5, "unit_weight": "110 pcf"}
    if basis is not None:
        soil["sliding_basis"] = basis
    return {
        "format": "kernline-project",
        "version": 1,
        "criteria": {"combinations": [{"name": "D + L + W", "factors": {"D": 1.0, "L": 1.0, "W": 1.0}}]},
        "soil": soil,
        "walls": [
            {
                "id": "K5",
                "length": "10 ft",
                "thickness": "8 in",
                "footing": {"width": "3 ft", "thickness": "1 ft", "unit_weight": "0 pcf"},
                "loads": [
                    {"type": "line", "case": "D", "value": "600 plf"},
                    {"type": "line", "case": "L", "value": "400 plf"},
                    # e = 1 x 1 / 10 = 0.1 ft < L/6: the whole 10 ft strip is in contact
                    {"type": "lateral", "case": "W", "value": "1 kip", "height": "0 ft"},
                ],
            }
        ],
    }


def test_check_value_4_3_cohesion_capped_at_half_the_dead_load_with_live_load():
    """min(130 x 3 x 10, 0.5 x 6,000) = 3,000 lb, i.e. 300 lb/ft (1806.3.2; D)."""
    for case in _sliding(_cohesion_wall(), "D + L + W"):
        assert case.bearing.contact_length == pytest.approx(10.0 * FOOT, rel=1e-12)
        assert case.sliding.cohesion == pytest.approx(3000.0 * LBF, rel=1e-12)


def test_check_value_4_3_on_the_whole_vertical_load_instead():
    """sliding_basis "total": the cap 0.5 x 10,000 = 5,000 lb does not bind: 3,900 lb (D)."""
    for case in _sliding(_cohesion_wall("total"), "D + L + W"):
        assert case.sliding.cohesion == pytest.approx(3900.0 * LBF, rel=1e-12)

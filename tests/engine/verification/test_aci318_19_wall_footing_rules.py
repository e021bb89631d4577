"""ACI 318-19 member rules for wall footings, the ASTM A615 bar table and the ASCE 7-16 LRFD combinations.

Sources:

* American Concrete Institute, ACI 318-19, *Building Code Requirements for Structural Concrete*:
  7.6.1.1 with Table 24.4.3.2 (As,min = 0.0018 Ag), 7.7.2.3 (flexural bars at most 3h and 18 in
  apart), 13.3.1.2 (depth above the bottom bars at least 6 in), 13.2.6.2 (λs may be neglected for
  footings), 22.5.5.1 (Vc of row (c) and the limit 5 λ √f'c bw d), 25.4.2.4 (ℓd, (cb + Ktr)/db at
  most 2.5, ψs), 25.4.2.1 (ℓd at least 12 in), 14.3.2.1 (plain footings at least 8 in), 14.1.4
  (plain footings in SDC D to F). The rules are status R; the clause numbers of 7.7.2.3, 22.5.5.1.1
  and 25.4.1.4 and the value of ψg are M (from memory). The numbers checked are D (arithmetic).
* ASTM A615/A615M, Table 1: nominal diameters and areas of #3 to #11 (R, read in a public copy of
  the standard's table).
* ASCE/SEI 7-16, sections 2.3.1 and 2.3.6 (rows 1 to 5 R, read in the 7-10 text; seismic rows R2)
  and 12.4.2.2 (Ev = 0.2 S_DS D, M). The check values are plain arithmetic (D) for D = 10, L = 5,
  Lr = 2, S = 3, R = 0, W = 8 (lateral), E = 6 (lateral), S_DS = 1.0.
"""

from __future__ import annotations

import numpy as np
import pytest
from kernline.engine.codes import asce7_16_lrfd
from kernline.engine.concrete.bars import BARS, practical_bars, practical_spacings
from kernline.engine.concrete.plain import plain_permitted
from kernline.engine.concrete.transverse import (
    Construction,
    Materials,
    design_transverse,
    development_length,
    evaluate_transverse,
    max_spacing,
    minimum_steel,
    one_way_shear_strength,
)
from kernline.engine.model import LoadCase
from kernline.engine.registry import Check, Family, code_by_id

INCH = 0.0254
FOOT = 0.3048
KIP = 4448.2216152605
PSI = KIP / 1000.0 / INCH**2
KSF = KIP / FOOT**2
MATERIALS = Materials(fc=3000.0 * PSI)

# ---- ASTM A615 Table 1 ------------------------------------------------------------------------------

TABLE_1 = {3: (0.375, 0.11), 4: (0.500, 0.20), 5: (0.625, 0.31), 6: (0.750, 0.44), 7: (0.875, 0.60)}
TABLE_1 |= {8: (1.000, 0.79), 9: (1.128, 1.00), 10: (1.270, 1.27), 11: (1.410, 1.56)}


@pytest.mark.parametrize("size", sorted(TABLE_1))
def test_astm_a615_nominal_diameter(size):
    """ASTM A615/A615M Table 1 nominal diameter (R)."""
    assert BARS[size].diameter / INCH == pytest.approx(TABLE_1[size][0], rel=1e-12)


@pytest.mark.parametrize("size", sorted(TABLE_1))
def test_astm_a615_nominal_area(size):
    """ASTM A615/A615M Table 1 nominal area (R)."""
    assert BARS[size].area / INCH**2 == pytest.approx(TABLE_1[size][1], rel=1e-12)


def test_astm_a615_soft_metric_names():
    """The soft-metric designations of Table 1: #3 = No. 10 ... #11 = No. 36 (R)."""
    assert [BARS[s].metric for s in range(3, 12)] == [10, 13, 16, 19, 22, 25, 29, 32, 36]


# ---- ACI 318-19 ---------------------------------------------------------------------------------------


def test_minimum_steel_is_0_0018_ag():
    """7.6.1.1 / Table 24.4.3.2: 0.0018 x 12 x 20 = 0.432 in^2/ft (R; the value of McCormac Example 12.1)."""
    assert float(minimum_steel(12.0 * INCH, 20.0 * INCH)) / INCH**2 == pytest.approx(0.432, rel=1e-12)


def test_max_spacing_three_h_for_a_thin_footing():
    """7.7.2.3: min(3h, 18 in) = 3 x 4 = 12 in for h = 4 in (D)."""
    assert float(max_spacing(4.0 * INCH)) / INCH == pytest.approx(12.0, rel=1e-12)


def test_max_spacing_eighteen_in_for_a_thick_footing():
    """7.7.2.3: min(3 x 20, 18) = 18 in for h = 20 in (D)."""
    assert float(max_spacing(20.0 * INCH)) / INCH == pytest.approx(18.0, rel=1e-12)


def test_spacing_beyond_the_limit_fails():
    """#5 @ 19 in on a 20 in footing is beyond 18 in (7.7.2.3): flagged, the rest may pass (D)."""
    design = design_transverse(
        q_u=1.0 * KSF,
        width=4.0 * FOOT,
        thickness=20.0 * INCH,
        wall_thickness=8.0 * INCH,
        construction=Construction.CONCRETE,
        materials=MATERIALS,
        bars="#5 @ 19 in",
    )
    assert not design.spacing_passes


def _thin(thickness_in: float):
    return design_transverse(
        q_u=1.0 * KSF,
        width=3.0 * FOOT,
        thickness=thickness_in * INCH,
        wall_thickness=8.0 * INCH,
        construction=Construction.CONCRETE,
        materials=MATERIALS,
        bars="#4 @ 12 in",
    )


def test_depth_above_bottom_bars_below_6_in_is_flagged():
    """13.3.1.2: h = 9 in, d = 9 - 3 - 0.25 = 5.75 in < 6 in (D)."""
    design = _thin(9.0)
    assert design.effective_depth / INCH == pytest.approx(5.75, rel=1e-12)
    assert not design.depth_passes


def test_depth_above_bottom_bars_of_6_in_or_more_passes():
    """13.3.1.2: h = 10 in, d = 6.75 in >= 6 in (D)."""
    assert _thin(10.0).depth_passes


def test_shear_has_no_size_effect_in_footings():
    """13.2.6.2: λs neglected, so φVc / (b d) is the same for d = 10 in and d = 60 in (D)."""
    small = float(one_way_shear_strength(1.0, 10.0 * INCH, 0.002, MATERIALS)) / (10.0 * INCH)
    large = float(one_way_shear_strength(1.0, 60.0 * INCH, 0.002, MATERIALS)) / (60.0 * INCH)
    assert large == pytest.approx(small, rel=1e-12)


def test_shear_row_c_value():
    """22.5.5.1(c): φVc = 0.75 x 8 x 0.001^(1/3) x √3000 x 12 x 10 = 3,944 lb for b = 12 in, d = 10 in (D)."""
    phi_vc = float(one_way_shear_strength(12.0 * INCH, 10.0 * INCH, 0.001, MATERIALS))
    assert phi_vc / (KIP / 1000.0) == pytest.approx(0.75 * 8.0 * 0.1 * 3000.0**0.5 * 120.0, rel=1e-12)


def test_shear_limit_five_lambda_root_fc():
    """22.5.5.1.1: with ρw = 0.3, 8 ρw^(1/3) = 5.36 > 5, so φVc = 0.75 x 5 x √3000 x 12 x 10 (D)."""
    phi_vc = float(one_way_shear_strength(12.0 * INCH, 10.0 * INCH, 0.3, MATERIALS))
    assert phi_vc / (KIP / 1000.0) == pytest.approx(0.75 * 5.0 * 3000.0**0.5 * 120.0, rel=1e-12)


def test_shear_phi_for_seismic_walls():
    """21.2.4.3: φ = 0.60 for a footing under a seismic-force-resisting wall gives 0.60/0.75 of φVc (D)."""
    normal = float(one_way_shear_strength(1.0, 0.4, 0.002, MATERIALS))
    seismic = float(one_way_shear_strength(1.0, 0.4, 0.002, MATERIALS, phi=0.60))
    assert seismic / normal == pytest.approx(0.8, rel=1e-12)


def test_development_length_at_least_12_in():
    """25.4.2.1: #3 with f'c = 10,000 psi: 0.075 x 60000/100 x 0.8/2.5 x 0.375 = 5.4 in, so 12 in (D)."""
    ld = float(development_length(0.375 * INCH, 3.0 * INCH, Materials(fc=10_000.0 * PSI)))
    assert ld / INCH == pytest.approx(12.0, rel=1e-12)


def test_development_confinement_term_capped_at_2_5():
    """25.4.2.4: (cb + Ktr)/db is at most 2.5: cb = 10 db gives the same ℓd as cb = 2.5 db (D)."""
    db = 0.625 * INCH
    assert float(development_length(db, 10.0 * db, MATERIALS)) == pytest.approx(
        float(development_length(db, 2.5 * db, MATERIALS))
    )


def test_development_size_factor():
    """Table 25.4.2.5: ψs = 0.8 for #6 and smaller, 1.0 for #7 and larger: ℓd/db of #7 over #6 = 1/0.8 (D)."""
    six = float(development_length(0.75 * INCH, 2.5 * 0.75 * INCH, MATERIALS)) / 0.75
    seven = float(development_length(0.875 * INCH, 2.5 * 0.875 * INCH, MATERIALS)) / 0.875
    assert seven / six == pytest.approx(1.25, rel=1e-12)


def test_development_length_general_equation_value():
    """25.4.2.4: #5, f'c = 3000 psi, Grade 60: 0.075 x 60000/√3000 x 0.8 / 2.5 x 0.625 = 16.43 in (D)."""
    ld = float(development_length(0.625 * INCH, 3.3125 * INCH, MATERIALS))
    assert ld / INCH == pytest.approx(0.075 * 60000.0 / 3000.0**0.5 * 0.8 / 2.5 * 0.625, rel=1e-12)


def test_plain_permitted_in_low_seismic_categories():
    """14.1.4 restricts plain footings only in SDC D to F (R)."""
    assert plain_permitted(sdc="C", construction=Construction.LIGHT_FRAME, width=1.0, thickness=0.3).permitted


def test_plain_in_sdc_d_needs_two_no_4_bars_and_0_002_ag():
    """14.1.4: 30 in x 10 in footing, 0.002 Ag = 0.6 in^2: 2 #4 (0.40) refused, 2 #5 (0.62) permitted (R, D)."""
    refused = plain_permitted(
        sdc="D", construction=Construction.CONCRETE, longitudinal="2 #4", width=30 * INCH, thickness=10 * INCH
    )
    permitted = plain_permitted(
        sdc="D", construction=Construction.CONCRETE, longitudinal="2 #5", width=30 * INCH, thickness=10 * INCH
    )
    assert not refused.permitted and "0.002" in refused.reason
    assert permitted.permitted


def test_plain_in_sdc_d_refuses_no_3_bars_and_a_single_bar():
    """14.1.4: bars no smaller than No. 4, at least two (R)."""
    small = plain_permitted(sdc="E", construction=Construction.MASONRY, longitudinal="4 #3", width=1.0, thickness=0.25)
    single = plain_permitted(sdc="F", construction=Construction.MASONRY, longitudinal="1 #8", width=0.5, thickness=0.25)
    assert not small.permitted and "No. 4" in small.reason
    assert not single.permitted and "two" in single.reason


def test_plain_in_sdc_d_refuses_light_frame_and_unreinforced_walls():
    """14.1.4: only under cast-in-place reinforced concrete or reinforced masonry walls (R)."""
    frame = plain_permitted(sdc="D", construction=Construction.LIGHT_FRAME, longitudinal="2 #5", width=0.6, thickness=0.25)
    masonry = plain_permitted(
        sdc="D", construction=Construction.MASONRY, wall_reinforced=False, longitudinal="2 #5", width=0.6, thickness=0.25
    )
    assert not frame.permitted
    assert not masonry.permitted


@pytest.mark.parametrize("construction", [Construction.CONCRETE, Construction.MASONRY])
def test_chosen_bars_are_the_lightest_that_pass(construction):
    """Kernline's choice on a grid of widths and thicknesses equals a brute-force search over #4 to #8
    at every whole-inch spacing from 4 to 18 in, each checked with every rule above: the least steel
    per length, ties to the larger spacing; and it passes exactly where some bars pass (D)."""
    widths = np.arange(16, 100, 9)[:, None] * INCH
    thicknesses = np.arange(8, 40, 4)[None, :] * INCH
    q_u = 150e3 / widths  # 150 kN/m of factored wall load
    common = {"wall_thickness": 8 * INCH, "construction": construction, "materials": MATERIALS}
    chosen = evaluate_transverse(q_u, widths, thicknesses, **common)
    best_steel = np.full(chosen.ratio.shape, np.inf)
    best_spacing = np.zeros(chosen.ratio.shape)
    for the_bar in practical_bars():
        for spacing in practical_spacings():
            grid = evaluate_transverse(q_u, widths, thicknesses, **common, bars=(the_bar, spacing))
            steel = np.where(grid.passes, grid.steel_provided, np.inf)
            lighter = steel < best_steel * (1.0 - 1e-9)
            tie = grid.passes & np.isclose(steel, best_steel, rtol=1e-9, atol=0.0) & (spacing > best_spacing)
            take = lighter | tie
            best_steel = np.where(take, steel, best_steel)
            best_spacing = np.where(take, spacing, best_spacing)
    some = np.isfinite(best_steel)
    assert some.any() and not some.all()
    np.testing.assert_array_equal(chosen.passes, some)
    np.testing.assert_allclose(chosen.steel_provided[some], best_steel[some], rtol=1e-12)
    np.testing.assert_allclose(chosen.spacing[some], best_spacing[some], rtol=1e-12)


# ---- ASCE 7-16 strength combinations (2.3.1, 2.3.6) ---------------------------------------------

CONCRETE = Check(id="concrete-test", title="Concrete", symbol="C", family=Family.STRENGTH, ratio_words="", basis="")
VERTICAL = {LoadCase.D: 10.0, LoadCase.L: 5.0, LoadCase.LR: 2.0, LoadCase.S: 3.0, LoadCase.R: 0.0}
LATERAL = {LoadCase.W: 8.0, LoadCase.E: 6.0}
SDS = 1.0

# (name, V, H): V = sum of factor x load over D, L, Lr, S, R; H over W and E (D).
LRFD = [
    ("1.4D", 14.0, 0.0),
    ("1.2D + 1.6L + 0.5Lr", 21.0, 0.0),
    ("1.2D + 1.6L + 0.5S", 21.5, 0.0),
    ("1.2D + 1.6L + 0.5R", 20.0, 0.0),
    ("1.2D + 1.6Lr + L", 20.2, 0.0),
    ("1.2D + 1.6Lr + 0.5W", 15.2, 4.0),
    ("1.2D + 1.6S + L", 21.8, 0.0),
    ("1.2D + 1.6S + 0.5W", 16.8, 4.0),
    ("1.2D + 1.6R + L", 17.0, 0.0),
    ("1.2D + 1.6R + 0.5W", 12.0, 4.0),
    ("1.2D + 1.0W + L + 0.5Lr", 18.0, 8.0),
    ("1.2D + 1.0W + L + 0.5S", 18.5, 8.0),
    ("1.2D + 1.0W + L + 0.5R", 17.0, 8.0),
    ("0.9D + 1.0W", 9.0, 8.0),
    ("1.4D + 1.0E + L + 0.2S", 19.6, 6.0),
    ("0.7D + 1.0E", 7.0, 6.0),
]


def _combos():
    return asce7_16_lrfd.combinations(SDS, frozenset({CONCRETE}))


def test_lrfd_has_sixteen_combinations_in_order():
    """2.3.1 and 2.3.6 expanded for Lr, S and R and both branches of combination 3 (D)."""
    assert [c.name for c in _combos()] == [row[0] for row in LRFD]


@pytest.mark.parametrize(("index", "row"), list(enumerate(LRFD)), ids=[row[0] for row in LRFD])
def test_lrfd_vertical_total(index, row):
    """V = sum of factor x load (D)."""
    combo = _combos()[index]
    assert sum(combo.factor(case) * value for case, value in VERTICAL.items()) == pytest.approx(row[1], rel=1e-12)


@pytest.mark.parametrize(("index", "row"), list(enumerate(LRFD)), ids=[row[0] for row in LRFD])
def test_lrfd_lateral_total(index, row):
    """H = factor on W x 8 + factor on E x 6 (D)."""
    combo = _combos()[index]
    assert sum(combo.factor(case) * value for case, value in LATERAL.items()) == pytest.approx(row[2], rel=1e-12, abs=1e-12)


def test_lrfd_combinations_apply_only_to_the_strength_checks_named():
    """The strength combinations are not offered to the stability (service) checks."""
    assert all(c.checks == frozenset({CONCRETE}) for c in _combos())


def test_lrfd_seismic_dead_factors_follow_sds():
    """(1.2 + 0.2 S_DS) and (0.9 - 0.2 S_DS) with S_DS = 0.5: 1.3 and 0.8 (D)."""
    combos = asce7_16_lrfd.combinations(0.5, frozenset({CONCRETE}))
    assert combos[-2].factor(LoadCase.D) == pytest.approx(1.3, rel=1e-12)
    assert combos[-1].factor(LoadCase.D) == pytest.approx(0.8, rel=1e-12)


def test_lrfd_basis_is_registered_as_a_strength_basis():
    """The code basis "asce7-16-lrfd" is in the registry with the STRENGTH family."""
    assert code_by_id("asce7-16-lrfd").family is Family.STRENGTH

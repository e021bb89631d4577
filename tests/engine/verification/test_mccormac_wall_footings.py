"""Wall footings of McCormac & Brown, checked with Kernline's ACI 318-19 design (engine.concrete).

Source: J. C. McCormac and R. H. Brown, *Design of Reinforced Concrete*, 9th ed., Wiley, chapter 12
(footings): Example 12.1 (a reinforced wall footing, US units, designed there to ACI 318-11),
Example 12.10 (a plain concrete wall footing) and Example 12.11 (a reinforced wall footing in SI).
Values read in the book are status R; values Kernline derives from them (the ACI 318-19 one-way shear
of Example 12.1, the masonry/concrete pair) are D, with the arithmetic in the test's docstring. See
docs/verification.md for the status key.

Example 12.1 (R): 12 in concrete wall, D = 20 k/ft, L = 15 k/ft, f'c = 3000 psi, fy = 60 ksi, cover
3 in; footing B = 10 ft, h = 20 in, d = 16.5 in; #7 @ 10 in (0.72 in^2/ft).
Example 12.10 (R): 12 in concrete wall, plain footing B = 5.5 ft, h = 24 in, f'c = 3000 psi,
q_u = 4.36 ksf.
Example 12.11 (R): 300 mm wall, D = 300 kN/m, L = 200 kN/m, B = 3.00 m, h = 450 mm, d = 360 mm,
fy = 420 MPa, f'c = 28 MPa (D: read from the √28 of the book's calculation).

The masonry/concrete pair (D, re-derived here): an 8 in CMU wall on a 30 in x 10 in footing with
q_u = 3.04 ksf, f'c = 3000 psi, checked as plain concrete.
"""

from __future__ import annotations

import pytest
from kernline.engine.codes.asce7_16_lrfd import combinations
from kernline.engine.concrete.plain import design_plain
from kernline.engine.concrete.transverse import (
    Construction,
    Materials,
    design_transverse,
    development_length,
    one_way_shear_strength,
    steel_required,
)
from kernline.engine.model import LoadCase
from kernline.engine.registry import Check, Family

INCH = 0.0254
FOOT = 0.3048
KIP = 4448.2216152605  # N (NIST SP 811)
PSI = KIP / 1000.0 / INCH**2  # Pa
KSF = KIP / FOOT**2  # Pa
KIP_PER_FT = KIP / FOOT  # N/m
FT_KIP_PER_FT = KIP * FOOT / FOOT  # N·m/m
SQIN_PER_FT = INCH**2 / FOOT  # m^2/m

# An unregistered strength check for the combinations to name (no strength check is wired yet).
CONCRETE = Check(id="concrete-test", title="Concrete", symbol="C", family=Family.STRENGTH, ratio_words="", basis="")
GRAVITY = "1.2D + 1.6L + 0.5Lr"  # 1.2D + 1.6L + 0.5(Lr or S or R) with no roof load


def _gravity_factors() -> tuple[float, float]:
    combo = next(c for c in combinations(0.0, frozenset({CONCRETE})) if c.name == GRAVITY)
    return combo.factor(LoadCase.D), combo.factor(LoadCase.L)


# ---- Example 12.1 ---------------------------------------------------------------------------------

EX1 = Materials(fc=3000.0 * PSI, fy=60_000.0 * PSI, cover=3.0 * INCH)


def _example_12_1(bars: str | None = "#7 @ 10 in"):
    return design_transverse(
        q_u=4.80 * KSF,
        width=10.0 * FOOT,
        thickness=20.0 * INCH,
        wall_thickness=12.0 * INCH,
        construction=Construction.CONCRETE,
        materials=EX1,
        bars=bars,
    )


def test_example_12_1_factored_net_pressure():
    """q_u = (1.2 x 20 + 1.6 x 15) / 10 = 4.80 ksf, with the factors of 1.2D + 1.6L (R)."""
    d_factor, l_factor = _gravity_factors()
    q_u = (d_factor * 20.0 + l_factor * 15.0) * KIP_PER_FT / (10.0 * FOOT)
    assert q_u / KSF == pytest.approx(4.80, rel=1e-12)


def test_example_12_1_moment_at_the_wall_face():
    """Mu = 4.80 x 4.50^2 / 2 = 48.6 ft-k/ft, cantilever 4.50 ft to the face of the concrete wall (R)."""
    design = _example_12_1()
    assert design.cantilever / FOOT == pytest.approx(4.50, rel=1e-12)
    assert design.moment / FT_KIP_PER_FT == pytest.approx(48.6, rel=1e-9)


def test_example_12_1_shear_at_d_from_the_face():
    """Vu = 4.80 x 3.125 = 15.0 k/ft with the book's d = 16.5 in (arm 5 - 0.5 - 16.5/12 = 3.125 ft) (R).

    Kernline's own d for #7 bars under 3 in of cover is 20 - 3 - 0.4375 = 16.5625 in, so its Vu is
    4.80 x (4.5 - 16.5625/12) = 14.975 k/ft (D); the book rounds d to 16.5 in.
    """
    assert 4.80 * KSF * (4.50 * FOOT - 16.5 * INCH) / KIP_PER_FT == pytest.approx(15.0, rel=1e-12)
    design = _example_12_1()
    assert design.effective_depth / INCH == pytest.approx(16.5625, rel=1e-12)
    assert design.shear / KIP_PER_FT == pytest.approx(14.975, rel=1e-9)


def test_example_12_1_required_steel():
    """As = 0.68 in^2/ft for Mu = 48.6 ft-k/ft, b = 12 in, d = 16.5 in (R; exact 0.6823, book rounds)."""
    required = steel_required(48.6 * FT_KIP_PER_FT, 1.0, 16.5 * INCH, EX1.fc, EX1.fy)
    assert float(required) / SQIN_PER_FT == pytest.approx(0.68, abs=0.005)


def test_example_12_1_development_length():
    """ℓd of #7 (general equation, (cb + Ktr)/db capped at 2.5) times As,req/As,prov = 0.68/0.72 is
    27.15 in (R: the book's 318-11 equation is the form of ACI 318-19 25.4.2.4 with ψg = 1); Kernline
    does not take that reduction, so its ℓd is 0.075 x 60000/√3000 x 0.875 / 2.5 = 28.755 in (D).
    The length available is 4.50 ft - 3 in = 51 in (R)."""
    cb = 3.0 * INCH + 0.4375 * INCH  # cover to the bar's centre; half the spacing is 5 in
    ld = float(development_length(0.875 * INCH, cb, EX1))
    assert ld / INCH * 0.68 / 0.72 == pytest.approx(27.15, abs=0.01)
    assert ld / INCH == pytest.approx(28.7554, rel=1e-4)
    design = _example_12_1()
    assert design.development_available / INCH == pytest.approx(51.0, rel=1e-12)
    assert design.development_passes


def test_example_12_1_fails_one_way_shear_under_aci_318_19():
    """ACI 318-19 22.5.5.1(c), λs neglected (13.2.6.2): ρw = 0.72/(12 x 16.5) = 0.003636,
    φVc = 0.75 x 8 x 0.003636^(1/3) x √3000 x 12 x 16.5 = 10,009 lb = 10.0 k/ft < 15.0 k/ft (D)."""
    rho_w = 0.72 / (12.0 * 16.5)
    phi_vc = float(one_way_shear_strength(12.0 * INCH, 16.5 * INCH, rho_w, EX1))
    assert phi_vc / KIP == pytest.approx(10.0, abs=0.05)


def test_example_12_1_bars_of_the_book_fail_shear_in_kernline():
    """The 20 in footing with #7 @ 10 in fails one-way shear under ACI 318-19 (D): φVc = 10.03 k/ft
    with Kernline's d = 16.5625 in, against Vu = 14.975 k/ft; flexure passes (φMn >= 48.6 ft-k/ft)."""
    design = _example_12_1()
    assert design.bars == "#7 @ 10 in"
    assert design.shear_capacity / KIP_PER_FT == pytest.approx(10.03, abs=0.01)
    assert design.flexure_passes
    assert not design.shear_passes
    assert not design.passes
    assert "one-way shear" in design.message


# ---- Example 12.10 (plain concrete) -----------------------------------------------------------------


def _example_12_10():
    return design_plain(
        q_u=4.36 * KSF,
        width=5.5 * FOOT,
        thickness=24.0 * INCH,
        wall_thickness=12.0 * INCH,
        construction=Construction.CONCRETE,
        fc=3000.0 * PSI,
    )


def test_example_12_10_moment():
    """Mu = 4.36 x 2.25^2 / 2 = 11.04 ft-k/ft (R; exact 11.036)."""
    assert _example_12_10().moment / FT_KIP_PER_FT == pytest.approx(11.04, abs=0.005)


def test_example_12_10_section_modulus_on_the_reduced_thickness():
    """S = 12 x 22^2 / 6 = 968 in^3/ft with h = 24 - 2 = 22 in (R; ACI 318-19 14.5.1.7)."""
    design = _example_12_10()
    assert design.strength_thickness / INCH == pytest.approx(22.0, rel=1e-12)
    assert design.section_modulus / (INCH**3 / FOOT) == pytest.approx(968.0, rel=1e-12)


def test_example_12_10_flexural_strength():
    """φMn = 0.60 x 5 x √3000 x 968 = 159,060 in-lb = 13.25 ft-k/ft (R; exact 13.255)."""
    assert _example_12_10().moment_capacity / FT_KIP_PER_FT == pytest.approx(13.25, abs=0.01)


def test_example_12_10_shear_strength():
    """φVn = 0.60 x (4/3) x √3000 x 12 x 22 = 11,568 lb = 11.57 k/ft (R)."""
    assert _example_12_10().shear_capacity / KIP_PER_FT == pytest.approx(11.57, abs=0.005)


def test_example_12_10_shear_section_22_in_from_the_wall_face():
    """The book puts the shear section 22 in (the reduced h) from the wall face: Vu = 4.36 x (2.25 -
    22/12) = 1.82 k/ft (R; exact 1.8167). With the full 24 in it would be 1.09 k/ft (D)."""
    design = _example_12_10()
    assert design.shear_distance / INCH == pytest.approx(22.0, rel=1e-12)
    assert design.shear / KIP_PER_FT == pytest.approx(1.82, abs=0.005)
    assert design.passes


# ---- Example 12.11 (SI) ---------------------------------------------------------------------------


def test_example_12_11_factored_net_pressure():
    """q_u = (1.2 x 300 + 1.6 x 200) / 3.00 = 226.7 kPa, with the factors of 1.2D + 1.6L (R; exact 226.67)."""
    d_factor, l_factor = _gravity_factors()
    q_u = (d_factor * 300e3 + l_factor * 200e3) / 3.00
    assert q_u / 1e3 == pytest.approx(226.7, abs=0.05)


def test_example_12_11_moment():
    """Mu = 226.7 x 1.35^2 / 2 = 206.58 kN·m/m, cantilever (3.00 - 0.30)/2 = 1.35 m (R).

    The book rounds q_u to 226.7 kPa before multiplying; with 226.7 Kernline gives 206.58 exactly.
    """
    design = design_transverse(
        q_u=226.7e3,
        width=3.00,
        thickness=0.450,
        wall_thickness=0.300,
        construction=Construction.CONCRETE,
        materials=Materials(fc=28e6, fy=420e6, cover=0.075),
    )
    assert design.cantilever == pytest.approx(1.35, rel=1e-12)
    assert design.moment / 1e3 == pytest.approx(206.58, abs=0.005)


def test_example_12_11_required_steel():
    """As = 1580 mm^2/m for Mu = 206.58 kN·m/m, d = 360 mm, f'c = 28 MPa, fy = 420 MPa (R; exact 1579)."""
    required = float(steel_required(206.58e3, 1.0, 0.360, 28e6, 420e6))
    assert required * 1e6 == pytest.approx(1580.0, abs=2.0)


# ---- the masonry/concrete pair (D) ------------------------------------------------------------------


def _pair(construction: Construction):
    return design_plain(
        q_u=3.04 * KSF,
        width=30.0 * INCH,
        thickness=10.0 * INCH,
        wall_thickness=8.0 * INCH,
        construction=construction,
        fc=3000.0 * PSI,
    )


def test_masonry_wall_moment_section_13_in_from_the_edge():
    """ACI 318-19 Table 13.2.7.1: halfway between the CMU wall's centre and face, (30 - 8)/2 + 8/4 = 13 in
    from the edge; Mu = 3.04 x (13/12)^2 / 2 = 1.784 ft-k/ft (D)."""
    design = _pair(Construction.MASONRY)
    assert design.cantilever / INCH == pytest.approx(13.0, rel=1e-12)
    assert design.moment / FT_KIP_PER_FT == pytest.approx(1.784, abs=0.0005)


def test_concrete_wall_moment_at_the_face():
    """At the face of a concrete wall, 11 in from the edge: Mu = 3.04 x (11/12)^2 / 2 = 1.277 ft-k/ft (D)."""
    design = _pair(Construction.CONCRETE)
    assert design.cantilever / INCH == pytest.approx(11.0, rel=1e-12)
    assert design.moment / FT_KIP_PER_FT == pytest.approx(1.277, abs=0.0005)


def test_pair_plain_flexural_strength():
    """h = 10 - 2 = 8 in, S = 12 x 8^2 / 6 = 128 in^3, φMn = 0.60 x 5 x √3000 x 128 = 1.753 ft-k/ft (D)."""
    design = _pair(Construction.MASONRY)
    assert design.section_modulus / (INCH**3 / FOOT) == pytest.approx(128.0, rel=1e-12)
    assert design.moment_capacity / FT_KIP_PER_FT == pytest.approx(1.753, abs=0.0005)


def test_pair_fails_as_masonry_passes_as_concrete():
    """1.784 > 1.753: fails by 1.8 % under a masonry wall; 1.277 < 1.753: passes under a concrete wall (D)."""
    assert not _pair(Construction.MASONRY).flexure_passes
    assert _pair(Construction.CONCRETE).flexure_passes


def test_light_frame_wall_is_placed_like_masonry():
    """A light-frame wall on a sill is treated as masonry (Kernline's assumption): the same section (D)."""
    assert _pair(Construction.LIGHT_FRAME).moment == pytest.approx(_pair(Construction.MASONRY).moment, rel=1e-15)

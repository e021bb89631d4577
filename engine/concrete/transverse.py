"""The wall footing across its width: a cantilever each side of the wall (ACI 318-19, chapter 13).

Everything is per unit length of footing (b = 1 m): moments in N·m/m, shears in N/m, steel areas in
m^2/m. The factored net soil pressure q_u (Pa) is an input: the caller computes it from the factored
wall loads only (the footing's own weight and the soil on it go straight to the soil and bend
nothing; McCormac & Brown, *Design of Reinforced Concrete*, 9th ed., chapter 12, Example 12.1).

The ACI 318-19 equations are written in its inch-pound form (psi, in) and converted exactly to SI:
a term "k √f'c" in psi is k·√(f'c·PSI) in Pa when f'c is in Pa (PSI = 6894.757... Pa,
NIST Special Publication 811, appendix B), and fy/√f'c (psi / √psi) is fy/√(f'c·PSI).

The functions named in ``__all__`` broadcast over numpy arrays of width B and thickness h (the sizing
grid); :func:`evaluate_transverse` chooses or checks the bars for a whole grid at once and
:func:`design_transverse` is the same evaluation for one footing, returned as a record.

Assumptions (for the calculation package's list of assumptions):

* The wall sits at the middle of the footing's width (no transverse offset).
* A light-frame wall on a sill plate is treated as a masonry wall: its moment section lies halfway
  between the wall's centre and face (ACI 318-19 Table 13.2.7.1 has no row for it; derived here as
  the closest row: a sill is no stiff concrete wall that could fix the cantilever at its face).
* The reduction of ℓd for excess reinforcement (ACI 318-19 25.4.10.1) is not taken (conservative).
* The crack-control spacing of ACI 318-19 24.3.2 is not checked (from memory, 7.7.2.2 sends one-way
  slabs to it; whether 13.3.2.1 carries it to footings is to be confirmed).
"""

from __future__ import annotations

import math
from dataclasses import dataclass
from enum import Enum

import numpy as np

from ..errors import InputError
from .bars import INCH, Bar, bar, parse_spaced, practical_bars, practical_spacings, spaced_text

ArrayLike = float | np.ndarray

# Pa per psi: 1 lbf / in^2 with 1 lbf = 4.4482216152605 N and 1 in = 0.0254 m (NIST SP 811 app. B).
PSI = 4.4482216152605 / INCH**2
KSI = 1000.0 * PSI

# ACI 318-19 Table 21.2.1(a) and 21.2.2: strength reduction factor, tension-controlled sections.
PHI_TENSION_CONTROLLED = 0.90
# ACI 318-19 Table 21.2.2: compression-controlled sections, "other" transverse reinforcement.
PHI_COMPRESSION_CONTROLLED = 0.65
# ACI 318-19 Table 21.2.1(b): strength reduction factor for shear.
PHI_SHEAR = 0.75
# ACI 318-19 22.2.2.1: the largest usable strain at the extreme concrete compression fibre.
CONCRETE_STRAIN = 0.003
# ACI 318-19 Table 21.2.2: tension-controlled when εt >= εty + 0.003.
TENSION_CONTROL_MARGIN = 0.003
# ACI 318-19 21.2.2.1: for Grade 60 deformed bars εty may be taken as 0.002 (from memory, M).
GRADE60_YIELD_STRAIN = 0.002
GRADE60 = 60.0 * KSI
# ASTM A615M Grade 420, the soft-metric name of Grade 60 (ASTM A615/A615M, Table 2).
GRADE420 = 420.0e6
# ACI 318-19 7.3.3.1: εt of a nonprestressed one-way slab at least 0.004 (from memory, M).
MIN_NET_TENSILE_STRAIN = 0.004
# ACI 318-19 22.2.2.4.1: the equivalent rectangular stress block, 0.85 f'c.
STRESS_BLOCK = 0.85
# ACI 318-19 Table 22.2.2.4.3: β1 = 0.85 up to 4000 psi, less 0.05 per 1000 psi, at least 0.65.
BETA1_MAX = 0.85
BETA1_MIN = 0.65
BETA1_KNEE = 4000.0 * PSI
BETA1_STEP = 0.05 / (1000.0 * PSI)
# ACI 318-19 20.2.2.2: modulus of elasticity of nonprestressed bars.
STEEL_MODULUS = 29_000.0 * KSI
# ACI 318-19 7.6.1.1 with Table 24.4.3.2: As,min = 0.0018 Ag (deformed bars, Grade 60).
MIN_STEEL_RATIO = 0.0018
# ACI 318-19 7.7.2.3: flexural bars of a one-way slab at most the lesser of 3h and 18 in apart.
MAX_SPACING_THICKNESSES = 3.0
MAX_SPACING = 18.0 * INCH
# ACI 318-19 13.3.1.2: depth of footing above the bottom reinforcement at least 6 in.
MIN_DEPTH_ABOVE_BARS = 6.0 * INCH
# ACI 318-19 20.5.1.3 (Table 20.5.1.3.1): cover of concrete cast against and permanently in contact
# with the ground.
COVER_AGAINST_SOIL = 3.0 * INCH
# ACI 318-19 Table 22.5.5.1(c): Vc = 8 λs λ ρw^(1/3) √f'c bw d (psi) where Av < Av,min.
VC_COEFFICIENT = 8.0
# ACI 318-19 22.5.5.1.1: Vc at most 5 λ √f'c bw d (psi).
VC_LIMIT = 5.0
# ACI 318-19 22.5.3.1 and 25.4.1.4: √f'c at most 100 psi in shear and development (from memory, M).
ROOT_FC_LIMIT = 100.0
# ACI 318-19 25.4.2.4(a): ℓd = (3/40)(fy/(λ√f'c)) ψt ψe ψs ψg / ((cb + Ktr)/db) · db.
LD_COEFFICIENT = 3.0 / 40.0
# ACI 318-19 25.4.2.4: (cb + Ktr)/db not taken greater than 2.5.
CONFINEMENT_LIMIT = 2.5
# ACI 318-19 25.4.2.1(b): ℓd at least 12 in.
MIN_DEVELOPMENT = 12.0 * INCH
# ACI 318-19 Table 25.4.2.5: ψs = 0.8 for No. 6 and smaller bars, 1.0 for No. 7 and larger.
PSI_S_SMALL = 0.8
PSI_S_LARGE = 1.0
SMALL_BAR_DIAMETER = 0.75 * INCH  # No. 6
# ACI 318-19 Table 25.4.2.5: ψg = 1.0 for Grade 40 and 60, 1.15 for Grade 80, 1.3 for Grade 100 (M).
# Grade 60 is also written Grade 420 (420 MPa, a little above 60 ksi), so it ends at 420 MPa.
PSI_G = ((GRADE420, 1.0), (80.0 * KSI, 1.15), (math.inf, 1.3))
# ACI 318-19 Table 25.4.2.5: ψt = 1.0 (not more than 12 in of fresh concrete below the bottom
# bars) and ψe = 1.0 (uncoated bars).
PSI_T = 1.0
PSI_E = 1.0
# ACI 318-19 Table 13.2.7.1: moment section of a footing under a masonry wall, halfway between the
# wall's centre and face, i.e. a quarter of the wall thickness inside the face.
MASONRY_SECTION = 0.25
# Relative tolerance of a pass at the limit (a ratio of 1 - 1e-9 still passes: rounding, not design).
TOLERANCE = 1e-9


class Construction(Enum):
    """What the footing carries, which places its moment section (ACI 318-19 Table 13.2.7.1).

    CONCRETE: a concrete wall, section at the wall's face.
    MASONRY: a masonry wall, section halfway between the wall's centre and face.
    LIGHT_FRAME: a light-frame wall on a sill plate, treated as masonry (an assumption, derived here;
    the table has no row for it).
    """

    CONCRETE = "concrete"
    MASONRY = "masonry"
    LIGHT_FRAME = "light-frame"


@dataclass(frozen=True, slots=True, kw_only=True)
class Materials:
    """Concrete and reinforcement (SI).

    Attributes:
        fc: f'c, the specified compressive strength of concrete (Pa).
        fy: fy, the specified yield strength of the bars (Pa); Grade 60 by default.
        lam: λ, the lightweight-concrete factor (ACI 318-19 19.2.4; 1.0 for normal weight).
        cover: clear cover to the bottom bars (m); 3 in for concrete cast against soil (20.5.1.3).
        steel_modulus: Es (Pa), ACI 318-19 20.2.2.2.
    """

    fc: float
    fy: float = GRADE60
    lam: float = 1.0
    cover: float = COVER_AGAINST_SOIL
    steel_modulus: float = STEEL_MODULUS

    def __post_init__(self) -> None:
        for name in ("fc", "fy", "steel_modulus"):
            value = getattr(self, name)
            if not (isinstance(value, (int, float)) and math.isfinite(value) and value > 0.0):
                raise InputError(name, "must be a finite number greater than zero")
        if not (isinstance(self.lam, (int, float)) and 0.0 < self.lam <= 1.0):
            raise InputError("lam", "λ must be greater than 0 and at most 1 (ACI 318-19 19.2.4)")
        if not (isinstance(self.cover, (int, float)) and math.isfinite(self.cover) and self.cover >= 0.0):
            raise InputError("cover", "must be a finite number, not negative")


# ---- section arithmetic (broadcastable) ---------------------------------------------------------


def root_fc(fc: ArrayLike, capped: bool = False) -> np.ndarray:
    """√f'c of ACI 318-19's inch-pound equations, expressed in Pa (exact conversion).

    In psi the term is √(f'c[psi]); multiplied by PSI to give Pa it is √(f'c[Pa] · PSI).

    Args:
        fc: f'c (Pa).
        capped: take √f'c at most 100 psi (ACI 318-19 22.5.3.1 for shear, 25.4.1.4 for development).

    Returns:
        √f'c as a stress (Pa).
    """
    root_psi = np.sqrt(np.asarray(fc, dtype=float) / PSI)
    if capped:
        root_psi = np.minimum(root_psi, ROOT_FC_LIMIT)
    return root_psi * PSI


def beta1(fc: ArrayLike) -> np.ndarray:
    """β1 of the rectangular stress block, ACI 318-19 Table 22.2.2.4.3.

    β1 = 0.85 for f'c <= 4000 psi; 0.85 - 0.05 (f'c - 4000)/1000 up to 8000 psi; 0.65 beyond.

    Args:
        fc: f'c (Pa).
    """
    fc = np.asarray(fc, dtype=float)
    return np.clip(BETA1_MAX - BETA1_STEP * (fc - BETA1_KNEE), BETA1_MIN, BETA1_MAX)


def yield_strain(fy: float, steel_modulus: float = STEEL_MODULUS) -> float:
    """εty = fy / Es (ACI 318-19 21.2.2.1), taken as 0.002 for Grade 60 (permitted there; M).

    Grade 60 is fy = 60 ksi, or 420 MPa as ASTM A615M names the same grade.

    Args:
        fy: fy (Pa). steel_modulus: Es (Pa).
    """
    if GRADE60 * (1.0 - 1e-6) <= fy <= GRADE420 * (1.0 + 1e-6):
        return GRADE60_YIELD_STRAIN
    return fy / steel_modulus


def cantilever(width: ArrayLike, wall_thickness: ArrayLike, construction: Construction) -> np.ndarray:
    """c: the cantilever from the footing's edge to the moment section (m), ACI 318-19 Table 13.2.7.1.

    c = (B - t)/2 for a concrete wall (section at the face); c = (B - t)/2 + t/4 for a masonry wall
    (halfway between centre and face) and for a light-frame wall on a sill (treated as masonry).

    Args:
        width: B, the footing's width (m). wall_thickness: t (m). construction: the wall's kind.
    """
    c = 0.5 * (np.asarray(width, dtype=float) - np.asarray(wall_thickness, dtype=float))
    if construction is not Construction.CONCRETE:
        c = c + MASONRY_SECTION * np.asarray(wall_thickness, dtype=float)
    return c


def effective_depth(thickness: ArrayLike, cover: float, bar_diameter: ArrayLike) -> np.ndarray:
    """d = h - cover - db/2 (m): depth from the top of the footing to the bottom bars' centre.

    Args:
        thickness: h (m). cover: clear cover to the bars (m). bar_diameter: db (m).
    """
    return np.asarray(thickness, dtype=float) - cover - 0.5 * np.asarray(bar_diameter, dtype=float)


def factored_moment(q_u: ArrayLike, arm: ArrayLike) -> np.ndarray:
    """Mu = q_u c^2 / 2 (N·m/m): the cantilever moment at the moment section (McCormac & Brown,
    9th ed., Example 12.1); zero where the section falls beyond the edge (c <= 0).

    Args:
        q_u: factored net soil pressure (Pa). arm: c, edge to moment section (m).
    """
    c = np.maximum(np.asarray(arm, dtype=float), 0.0)
    return 0.5 * np.asarray(q_u, dtype=float) * c * c


def factored_shear(q_u: ArrayLike, arm: ArrayLike, distance: ArrayLike) -> np.ndarray:
    """Vu = q_u (c - d) (N/m): one-way shear at ``distance`` from the moment section toward the
    edge (ACI 318-19 13.2.7.2: d for reinforced footings; h for plain ones, 14.4.3.3); zero where
    that section falls beyond the edge.

    Args:
        q_u: factored net soil pressure (Pa). arm: c (m). distance: d or h (m).
    """
    return np.asarray(q_u, dtype=float) * np.maximum(np.asarray(arm, dtype=float) - np.asarray(distance, dtype=float), 0.0)


def steel_required(
    moment: ArrayLike, b: ArrayLike, d: ArrayLike, fc: float, fy: float, phi: float = PHI_TENSION_CONTROLLED
) -> np.ndarray:
    """As for φMn = Mu with the rectangular stress block (ACI 318-19 22.2.2.4.1), in m^2 per b.

    From Mu = φ As fy (d - a/2), a = As fy / (0.85 f'c b), the root of the quadratic is
    As = (0.85 f'c b d / fy) (1 - √(1 - 2 Rn / (0.85 f'c))), Rn = Mu / (φ b d^2).

    Args:
        moment: Mu (N·m per b). b: width of the section (m). d: effective depth (m).
        fc: f'c (Pa). fy: fy (Pa). phi: φ, 0.90 for a tension-controlled section (Table 21.2.2).

    Returns:
        As (m^2); inf where no amount of tension steel reaches Mu (Rn > 0.425 f'c) or d <= 0;
        0 where Mu <= 0.
    """
    mu = np.maximum(np.asarray(moment, dtype=float), 0.0)
    b = np.asarray(b, dtype=float)
    d = np.asarray(d, dtype=float)
    with np.errstate(divide="ignore", invalid="ignore"):
        rn = mu / (phi * b * d * d)
        root = 1.0 - 2.0 * rn / (STRESS_BLOCK * fc)
        steel = STRESS_BLOCK * fc * b * d / fy * (1.0 - np.sqrt(np.maximum(root, 0.0)))
    impossible = (root < 0.0) | (d <= 0.0)
    steel = np.where(impossible, np.inf, steel)
    return np.where(mu <= 0.0, 0.0, steel)


@dataclass(frozen=True, slots=True, eq=False)
class Flexure:
    """The flexural strength of a singly reinforced rectangular section (arrays).

    Attributes:
        capacity: φMn (N·m per b). nominal: Mn (N·m per b). phi: φ from εt (Table 21.2.2).
        strain: εt, the net tensile strain in the bars at nominal strength.
    """

    capacity: np.ndarray
    nominal: np.ndarray
    phi: np.ndarray
    strain: np.ndarray


def flexural_strength(steel: ArrayLike, b: ArrayLike, d: ArrayLike, materials: Materials) -> Flexure:
    """φMn of tension steel As in a section b x d, ACI 318-19 22.2 and 21.2.2.

    a = As fy / (0.85 f'c b) (22.2.2.4.1); c = a / β1 (22.2.2.4.2); εt = 0.003 (d - c) / c
    (22.2.2.1); Mn = As fy (d - a/2); φ = 0.90 for εt >= εty + 0.003, 0.65 for εt <= εty and
    0.65 + 0.25 (εt - εty) / 0.003 between (Table 21.2.2, "other"). Steel is taken as yielded; a
    section with εt below 0.004 is refused elsewhere (7.3.3.1), so it never reaches a design.

    Args:
        steel: As (m^2 per b). b: width (m). d: effective depth (m). materials: f'c, fy, Es.
    """
    a_s = np.asarray(steel, dtype=float)
    b = np.asarray(b, dtype=float)
    d = np.asarray(d, dtype=float)
    fc, fy = materials.fc, materials.fy
    eps_y = yield_strain(fy, materials.steel_modulus)
    with np.errstate(divide="ignore", invalid="ignore"):
        a = a_s * fy / (STRESS_BLOCK * fc * b)
        c = a / beta1(fc)
        strain = np.where(a_s > 0.0, CONCRETE_STRAIN * (d - c) / c, np.inf)
    nominal = np.where(d > 0.0, np.maximum(a_s * fy * (d - 0.5 * a), 0.0), 0.0)
    transition = PHI_COMPRESSION_CONTROLLED + (PHI_TENSION_CONTROLLED - PHI_COMPRESSION_CONTROLLED) * (
        (strain - eps_y) / TENSION_CONTROL_MARGIN
    )
    phi = np.clip(
        np.nan_to_num(transition, nan=PHI_COMPRESSION_CONTROLLED, posinf=PHI_TENSION_CONTROLLED),
        PHI_COMPRESSION_CONTROLLED,
        PHI_TENSION_CONTROLLED,
    )
    return Flexure(capacity=phi * nominal, nominal=nominal, phi=phi, strain=strain)


def minimum_steel(b: ArrayLike, thickness: ArrayLike) -> np.ndarray:
    """As,min = 0.0018 b h (m^2 per b), ACI 318-19 7.6.1.1 with Table 24.4.3.2 (Grade 60 bars).

    Args:
        b: width of the section (m). thickness: h (m).
    """
    return MIN_STEEL_RATIO * np.asarray(b, dtype=float) * np.asarray(thickness, dtype=float)


def max_spacing(thickness: ArrayLike) -> np.ndarray:
    """The largest spacing of flexural bars, min(3h, 18 in) (m), ACI 318-19 7.7.2.3.

    Args:
        thickness: h (m).
    """
    return np.minimum(MAX_SPACING_THICKNESSES * np.asarray(thickness, dtype=float), MAX_SPACING)


def one_way_shear_strength(
    b: ArrayLike, d: ArrayLike, rho_w: ArrayLike, materials: Materials, phi: float = PHI_SHEAR
) -> np.ndarray:
    """φVc of a footing without shear reinforcement (N per b), ACI 318-19 22.5.5.1 row (c).

    Vc = 8 λs λ ρw^(1/3) √f'c bw d (psi, in) with λs = 1.0 for footings (13.2.6.2 permits λs to be
    neglected) and Nu = 0; Vc <= 5 λ √f'c bw d (22.5.5.1.1); √f'c <= 100 psi (22.5.3.1).
    In SI: Vc = 8 λ ρw^(1/3) √(f'c · PSI) b d with f'c in Pa.

    Args:
        b: bw (m). d: effective depth (m). rho_w: ρw = As / (bw d) of the bars in tension.
        materials: f'c and λ. phi: φ for shear, 0.75 (Table 21.2.1); a smaller value for footings
            under seismic-force-resisting walls in SDC D to F (21.2.4.3: the wall's shear φ, e.g. 0.60).

    Returns:
        φVc (N per b), 0 where d <= 0.
    """
    root = root_fc(materials.fc, capped=True)
    rho = np.maximum(np.asarray(rho_w, dtype=float), 0.0)
    stress = np.minimum(VC_COEFFICIENT * np.cbrt(rho), VC_LIMIT) * materials.lam * root
    return phi * stress * np.asarray(b, dtype=float) * np.maximum(np.asarray(d, dtype=float), 0.0)


def psi_g(fy: float) -> float:
    """ψg of ACI 318-19 Table 25.4.2.5: 1.0 up to Grade 60, 1.15 Grade 80, 1.3 Grade 100 (M).

    Args:
        fy: fy (Pa).
    """
    for limit, value in PSI_G:
        if fy <= limit * (1.0 + 1e-9):
            return value
    return PSI_G[-1][1]  # pragma: no cover - the last limit is infinite


def development_length(bar_diameter: ArrayLike, cb: ArrayLike, materials: Materials, ktr: ArrayLike = 0.0) -> np.ndarray:
    """ℓd of a straight bottom bar in tension (m), ACI 318-19 25.4.2.4 (general equation).

    ℓd = (3/40) (fy / (λ √f'c)) ψt ψe ψs ψg / ((cb + Ktr)/db) · db, (cb + Ktr)/db <= 2.5, ℓd >= 12 in
    (25.4.2.1). ψt = 1.0 (bottom bars), ψe = 1.0 (uncoated), ψs = 0.8 for No. 6 and smaller and 1.0
    for No. 7 and larger, ψg by grade (Table 25.4.2.5; ψg is M). √f'c <= 100 psi (25.4.1.4). In SI
    fy/√f'c (psi) is fy / √(f'c · PSI) with both in Pa. The reduction for excess reinforcement
    (25.4.10.1) is not taken.

    Args:
        bar_diameter: db (m). cb: the lesser of the distance from the bar's centre to the nearest
            concrete surface and half the bars' centre-to-centre spacing (m). materials: f'c, fy, λ.
        ktr: Ktr, the transverse reinforcement index (m); 0 in a footing without stirrups.
    """
    db = np.asarray(bar_diameter, dtype=float)
    ratio = np.minimum((np.asarray(cb, dtype=float) + np.asarray(ktr, dtype=float)) / db, CONFINEMENT_LIMIT)
    psi_s = np.where(db <= SMALL_BAR_DIAMETER * (1.0 + 1e-9), PSI_S_SMALL, PSI_S_LARGE)
    factors = PSI_T * PSI_E * psi_s * psi_g(materials.fy)
    stress_ratio = materials.fy / (materials.lam * root_fc(materials.fc, capped=True))
    return np.maximum(LD_COEFFICIENT * stress_ratio * factors / ratio * db, MIN_DEVELOPMENT)


# ---- the transverse design of a footing, for one size or a grid -------------------------------


@dataclass(frozen=True, slots=True, eq=False)
class TransverseGrid:
    """The transverse design of every candidate footing (arrays of the broadcast shape of q_u, B, h).

    Attributes:
        passes: every requirement is met (see :class:`TransverseDesign` for the list).
        ratio: the least of the normalized ratios (capacity / demand for flexure and shear,
            available / required for development, provided / least for As,min, allowed / used for
            spacing, d / 6 in, εt / 0.004); passes exactly where ratio >= 1 (to rounding).
        size: the bar's inch-pound size (#5 -> 5). spacing: the bars' spacing (m).
        cantilever: c (m). effective_depth: d (m).
        moment, moment_capacity: Mu and φMn (N·m/m). phi_flexure, strain: φ and εt.
        shear, shear_capacity: Vu and φVc (N/m).
        steel_required: As for Mu (m^2/m, inf where no steel suffices). steel_minimum: As,min (m^2/m).
        steel_provided: A_b / s (m^2/m). max_spacing: min(3h, 18 in) (m).
        development_length, development_available: ℓd and c less the end cover (m).
        ratios: each normalized ratio by name ("depth", "flexure", "minimum", "spacing", "strain",
            "shear", "development").
    """

    passes: np.ndarray
    ratio: np.ndarray
    size: np.ndarray
    spacing: np.ndarray
    cantilever: np.ndarray
    effective_depth: np.ndarray
    moment: np.ndarray
    moment_capacity: np.ndarray
    phi_flexure: np.ndarray
    strain: np.ndarray
    shear: np.ndarray
    shear_capacity: np.ndarray
    steel_required: np.ndarray
    steel_minimum: np.ndarray
    steel_provided: np.ndarray
    max_spacing: np.ndarray
    development_length: np.ndarray
    development_available: np.ndarray
    ratios: dict[str, np.ndarray]


_RATIO_NAMES = ("depth", "flexure", "minimum", "spacing", "strain", "shear", "development")


def _safe_ratio(capacity: np.ndarray, demand: np.ndarray) -> np.ndarray:
    """capacity / demand, inf where there is no demand."""
    capacity, demand = np.broadcast_arrays(np.asarray(capacity, dtype=float), np.asarray(demand, dtype=float))
    return np.divide(capacity, demand, out=np.full(capacity.shape, np.inf), where=demand > 0.0)


def _check(
    q_u: np.ndarray,
    width: np.ndarray,
    thickness: np.ndarray,
    wall_thickness: float,
    construction: Construction,
    materials: Materials,
    phi_shear: float,
    bar_diameter: np.ndarray,
    bar_area: np.ndarray,
    bar_size: np.ndarray,
    spacing: np.ndarray,
    record: bool = True,
) -> TransverseGrid:
    """Every quantity and ratio of bars (db, A_b) at ``spacing``, all broadcast, b = 1 m.

    ``record`` False skips As for Mu (not needed to compare candidates; nan in the result)."""
    db = bar_diameter
    c = cantilever(width, wall_thickness, construction)
    d = effective_depth(thickness, materials.cover, db)
    mu = factored_moment(q_u, c)
    vu = factored_shear(q_u, c, d)
    provided = bar_area / spacing
    required = steel_required(mu, 1.0, d, materials.fc, materials.fy) if record else np.asarray(np.nan)
    minimum = minimum_steel(1.0, thickness)
    flexure = flexural_strength(provided, 1.0, d, materials)
    with np.errstate(divide="ignore", invalid="ignore"):
        rho_w = np.where(d > 0.0, provided / np.where(d > 0.0, d, 1.0), 0.0)
    phi_vc = one_way_shear_strength(1.0, d, rho_w, materials, phi_shear)
    cb = np.minimum(materials.cover + 0.5 * db, 0.5 * spacing)
    ld = development_length(db, cb, materials)
    available = c - materials.cover  # moment section to the bar's end, less the end cover
    s_max = max_spacing(thickness)
    loaded = mu > 0.0
    ratios = {
        "depth": d / MIN_DEPTH_ABOVE_BARS,
        "flexure": _safe_ratio(flexure.capacity, mu),
        "minimum": _safe_ratio(provided, minimum),
        "spacing": s_max / spacing,
        "strain": np.where(loaded, flexure.strain / MIN_NET_TENSILE_STRAIN, np.inf),
        "shear": _safe_ratio(phi_vc, vu),
        "development": np.where(loaded, _safe_ratio(np.maximum(available, 0.0), ld), np.inf),
    }
    shape = np.broadcast_shapes(*(np.shape(r) for r in ratios.values()), np.shape(bar_size))
    ratios = {k: np.broadcast_to(v, shape) for k, v in ratios.items()}
    ratio = ratios[_RATIO_NAMES[0]]
    for name in _RATIO_NAMES[1:]:
        ratio = np.minimum(ratio, ratios[name])
    return TransverseGrid(
        passes=ratio >= 1.0 - TOLERANCE,
        ratio=ratio,
        size=np.broadcast_to(bar_size, shape),
        spacing=np.broadcast_to(spacing, shape),
        cantilever=np.broadcast_to(c, shape),
        effective_depth=np.broadcast_to(d, shape),
        moment=np.broadcast_to(mu, shape),
        moment_capacity=np.broadcast_to(flexure.capacity, shape),
        phi_flexure=np.broadcast_to(flexure.phi, shape),
        strain=np.broadcast_to(flexure.strain, shape),
        shear=np.broadcast_to(vu, shape),
        shear_capacity=np.broadcast_to(phi_vc, shape),
        steel_required=np.broadcast_to(required, shape),
        steel_minimum=np.broadcast_to(minimum, shape),
        steel_provided=np.broadcast_to(provided, shape),
        max_spacing=np.broadcast_to(s_max, shape),
        development_length=np.broadcast_to(ld, shape),
        development_available=np.broadcast_to(available, shape),
        ratios=ratios,
    )


def _lightest_spacing(
    q_u: np.ndarray,
    width: np.ndarray,
    thickness: np.ndarray,
    wall_thickness: float,
    construction: Construction,
    materials: Materials,
    phi_shear: float,
    bar_diameter: np.ndarray,
    bar_area: np.ndarray,
    spacings: np.ndarray,
) -> np.ndarray:
    """The widest spacing from ``spacings`` (ascending) whose steel A_b/s meets the requirements
    that more steel always helps: φMn >= Mu at φ = 0.90, As,min, one-way shear and s <= min(3h, 18 in).

    Shear: Vu <= φ 8 λ ρw^(1/3) √f'c b d gives ρw >= (Vu / (φ 8 λ √f'c b d))^3 (22.5.5.1(c),
    rearranged). Where no spacing suffices the closest is returned (its check then fails).
    """
    c = cantilever(width, wall_thickness, construction)
    d = effective_depth(thickness, materials.cover, bar_diameter)
    mu = factored_moment(q_u, c)
    vu = factored_shear(q_u, c, d)
    flexural = steel_required(mu, 1.0, d, materials.fc, materials.fy)
    unit_shear = phi_shear * VC_COEFFICIENT * materials.lam * root_fc(materials.fc, capped=True) * np.maximum(d, 0.0)
    with np.errstate(divide="ignore", invalid="ignore", over="ignore"):
        rho_needed = np.where(vu > 0.0, (vu / unit_shear) ** 3, 0.0)
        for_shear = np.nan_to_num(rho_needed * d, nan=np.inf, posinf=np.inf)
    needed = np.maximum(np.maximum(flexural, for_shear), minimum_steel(1.0, thickness))
    with np.errstate(divide="ignore"):
        widest = bar_area / needed  # the widest spacing that gives the steel needed
    widest = np.minimum(widest, max_spacing(thickness))
    # the widest listed spacing not above it (whole inches); the closest where none is small enough
    index = np.searchsorted(spacings, widest * (1.0 + TOLERANCE), side="right") - 1
    return spacings[np.clip(index, 0, len(spacings) - 1)]


def _choose(stacked: TransverseGrid) -> np.ndarray:
    """Along the leading (bar size) axis, the index of each cell's choice: the lightest passing
    candidate (least A_b/s; ties to the larger spacing); where none passes, the greatest ratio."""
    steel = np.where(stacked.passes, stacked.steel_provided, np.inf)
    least = steel.min(axis=0)
    lightest = stacked.passes & (steel <= least * (1.0 + TOLERANCE))
    pick_pass = np.argmax(np.where(lightest, stacked.spacing, -np.inf), axis=0)
    pick_fail = np.argmax(stacked.ratio, axis=0)
    return np.where(stacked.passes.any(axis=0), pick_pass, pick_fail)


def evaluate_transverse(
    q_u: ArrayLike,
    width: ArrayLike,
    thickness: ArrayLike,
    *,
    wall_thickness: float,
    construction: Construction,
    materials: Materials,
    phi_shear: float = PHI_SHEAR,
    bars: tuple[Bar, float] | None = None,
) -> TransverseGrid:
    """The transverse design of a footing, or of a whole grid of footings at once.

    With ``bars`` the given bar and spacing are checked. Without, for each cell the lightest passing
    bars of the practical list are chosen (#4 to #8 at whole-inch spacings from 4 in up to
    min(3h, 18 in); least steel per length, ties to the larger spacing): for each size the widest
    spacing that gives the steel flexure, As,min and shear need is found in closed form (more steel
    only helps those), then every requirement is checked. A tighter spacing can only lengthen ℓd
    (smaller cb) and lower εt, so no heavier spacing of that size passes where that one fails,
    except through φ below 0.90, which is handled by tightening the spacing while flexure alone fails.
    The bar sizes are evaluated together along an extra leading axis.

    Args:
        q_u: factored net soil pressure (Pa), broadcastable with ``width`` (q_u = Pu / B).
        width: B (m). thickness: h (m). wall_thickness: t (m). construction: the wall's kind.
        materials: concrete and bars. phi_shear: φ for one-way shear (0.75; see
            :func:`one_way_shear_strength`). bars: (bar, spacing in m) to check, or None to choose.
    """
    q = np.asarray(q_u, dtype=float)
    b = np.asarray(width, dtype=float)
    h = np.asarray(thickness, dtype=float)
    args = (q, b, h, wall_thickness, construction, materials, phi_shear)
    if bars is not None:
        the_bar, spacing = bars
        return _check(
            *args, np.asarray(the_bar.diameter), np.asarray(the_bar.area), np.asarray(the_bar.size), np.asarray(spacing)
        )
    spacings = np.asarray(practical_spacings())
    sizes = practical_bars()
    axis = (len(sizes),) + (1,) * np.broadcast(q, b, h).ndim
    db = np.array([x.diameter for x in sizes]).reshape(axis)
    area = np.array([x.area for x in sizes]).reshape(axis)
    size = np.array([x.size for x in sizes]).reshape(axis)
    s = _lightest_spacing(*args, db, area, spacings)
    stacked = _check(*args, db, area, size, s, record=False)
    for _ in range(len(spacings)):
        # φ below 0.90 (εt < εty + 0.003) can leave flexure short at the closed-form spacing
        short = (
            (stacked.ratios["flexure"] < 1.0 - TOLERANCE) & (stacked.ratios["strain"] >= 1.0) & (stacked.spacing > spacings[0])
        )
        if not short.any():
            break
        tighter = np.where(short, spacings[np.clip(np.searchsorted(spacings, stacked.spacing) - 1, 0, None)], stacked.spacing)
        stacked = _check(*args, db, area, size, tighter, record=False)
    pick = _choose(stacked)
    spacing = np.take_along_axis(stacked.spacing, pick[None, ...], axis=0)[0]
    flat = (slice(None),) + (0,) * (db.ndim - 1)
    return _check(*args, db[flat][pick], area[flat][pick], size[flat][pick], spacing)


# ---- one footing as a record -------------------------------------------------------------------


@dataclass(frozen=True, slots=True)
class TransverseDesign:
    """The transverse design of one wall footing, per unit length (SI).

    Attributes:
        construction: the wall's kind (places the moment section).
        q_u: factored net soil pressure (Pa).
        cantilever: c, footing edge to the moment section (m).
        effective_depth: d (m).
        moment, moment_capacity: Mu and φMn (N·m/m). phi_flexure: φ (Table 21.2.2). strain: εt.
        shear, shear_capacity: Vu at d from the moment section and φVc (N/m). phi_shear: φ used.
        steel_required: As for Mu alone (m^2/m). steel_minimum: 0.0018 b h (m^2/m).
        steel_provided: A_b / s (m^2/m). bar: the bar. spacing: its spacing (m).
        max_spacing: min(3h, 18 in) (m). bars: "#7 @ 10 in".
        development_length: ℓd (m). development_available: c less the end cover (m).
        depth_passes: d >= 6 in (13.3.1.2). flexure_passes: φMn >= Mu. minimum_passes: As >= As,min.
        spacing_passes: s <= min(3h, 18 in). strain_passes: εt >= 0.004 (7.3.3.1).
        shear_passes: φVc >= Vu. development_passes: ℓd <= available.
        ratio: the least normalized ratio (see :class:`TransverseGrid`).
        chosen: True when Kernline chose the bars, False when they were given.
        message: "" when everything passes; else what fails and what to change, in words.
    """

    construction: Construction
    q_u: float
    cantilever: float
    effective_depth: float
    moment: float
    moment_capacity: float
    phi_flexure: float
    strain: float
    shear: float
    shear_capacity: float
    phi_shear: float
    steel_required: float
    steel_minimum: float
    steel_provided: float
    bar: Bar
    spacing: float
    max_spacing: float
    bars: str
    development_length: float
    development_available: float
    depth_passes: bool
    flexure_passes: bool
    minimum_passes: bool
    spacing_passes: bool
    strain_passes: bool
    shear_passes: bool
    development_passes: bool
    ratio: float
    chosen: bool
    message: str

    @property
    def passes(self) -> bool:
        """Every requirement is met."""
        return (
            self.depth_passes
            and self.flexure_passes
            and self.minimum_passes
            and self.spacing_passes
            and self.strain_passes
            and self.shear_passes
            and self.development_passes
        )


_WORDS = {
    "depth": "the depth above the bottom bars is less than 6 in (ACI 318-19 13.3.1.2); thicken the footing",
    "flexure": "the bars do not carry the factored moment (φMn < Mu); use more steel or thicken the footing",
    "minimum": "the steel is less than 0.0018 b h (ACI 318-19 7.6.1.1); use more steel",
    "spacing": "the bars are farther apart than 3h or 18 in (ACI 318-19 7.7.2.3); space them closer",
    "strain": "the section is over-reinforced (εt < 0.004, ACI 318-19 7.3.3.1); thicken the footing",
    "shear": "one-way shear exceeds φVc (ACI 318-19 22.5.5.1); thicken the footing or use more bottom steel",
    "development": "the bars cannot develop between the moment section and their ends (ACI 318-19 25.4.2.4); "
    "use smaller bars or widen the footing",
}


def failure_words(ratios: dict[str, float]) -> str:
    """What fails, in words, for the normalized ratios of one footing ("" when all pass)."""
    return "; ".join(_WORDS[k] for k in _RATIO_NAMES if ratios[k] < 1.0 - TOLERANCE)


def _positive(value: float, name: str) -> None:
    if not (isinstance(value, (int, float)) and math.isfinite(value) and value > 0.0):
        raise InputError(name, "must be a finite number greater than zero")


def design_transverse(
    *,
    q_u: float,
    width: float,
    thickness: float,
    wall_thickness: float,
    construction: Construction,
    materials: Materials,
    bars: str | tuple[Bar, float] | None = None,
    phi_shear: float = PHI_SHEAR,
) -> TransverseDesign:
    """Design (or check) the transverse bottom bars of one wall footing, ACI 318-19 chapter 13.

    Moment at the section of Table 13.2.7.1 (Mu = q_u c^2/2), one-way shear at d from it (13.2.7.2),
    flexure with φ from εt (21.2.2), As,min (7.6.1.1), spacing (7.7.2.3), d >= 6 in (13.3.1.2),
    shear by 22.5.5.1(c) with λs = 1 (13.2.6.2) and development by 25.4.2.4.

    Args:
        q_u: factored net soil pressure from the factored wall loads only (Pa), >= 0.
        width: B (m). thickness: h (m). wall_thickness: t (m), less than B.
        construction: the wall's kind. materials: concrete and bars.
        bars: "#7 @ 10 in" or (bar, spacing m) to check; None to choose from #4 to #8 at whole inches.
        phi_shear: φ for one-way shear, 0.75, or the wall's shear φ (e.g. 0.60) for a footing under a
            seismic-force-resisting wall in SDC D to F (21.2.4.3).

    Raises:
        InputError: a bad number or bar text (field names as the arguments; bar text errors come
            with an empty field path).
    """
    if not (isinstance(q_u, (int, float)) and math.isfinite(q_u) and q_u >= 0.0):
        raise InputError("q_u", "must be a finite pressure, not negative")
    for name, value in (("width", width), ("thickness", thickness), ("wall_thickness", wall_thickness)):
        _positive(value, name)
    if not 0.0 < phi_shear <= PHI_SHEAR:
        raise InputError("phi_shear", "φ for shear must be greater than 0 and at most 0.75 (ACI 318-19 21.2.1)")
    given = parse_spaced(bars) if isinstance(bars, str) else bars
    if given is not None:
        the_bar, spacing = given
        _positive(spacing, "spacing")
        bar(the_bar.size)  # a Bar of the table
    grid = evaluate_transverse(
        q_u,
        width,
        thickness,
        wall_thickness=wall_thickness,
        construction=construction,
        materials=materials,
        phi_shear=phi_shear,
        bars=given,
    )

    def f(name: str) -> float:
        return float(np.asarray(getattr(grid, name)))

    ratios = {k: float(np.asarray(v)) for k, v in grid.ratios.items()}
    ok = {k: v >= 1.0 - TOLERANCE for k, v in ratios.items()}
    chosen_bar = bar(int(np.asarray(grid.size)))
    spacing = f("spacing")
    return TransverseDesign(
        construction=construction,
        q_u=float(q_u),
        cantilever=f("cantilever"),
        effective_depth=f("effective_depth"),
        moment=f("moment"),
        moment_capacity=f("moment_capacity"),
        phi_flexure=f("phi_flexure"),
        strain=f("strain"),
        shear=f("shear"),
        shear_capacity=f("shear_capacity"),
        phi_shear=float(phi_shear),
        steel_required=f("steel_required"),
        steel_minimum=f("steel_minimum"),
        steel_provided=f("steel_provided"),
        bar=chosen_bar,
        spacing=spacing,
        max_spacing=f("max_spacing"),
        bars=spaced_text(chosen_bar, spacing),
        development_length=f("development_length"),
        development_available=f("development_available"),
        depth_passes=ok["depth"],
        flexure_passes=ok["flexure"],
        minimum_passes=ok["minimum"],
        spacing_passes=ok["spacing"],
        strain_passes=ok["strain"],
        shear_passes=ok["shear"],
        development_passes=ok["development"],
        ratio=f("ratio"),
        chosen=given is None,
        message=failure_words(ratios),
    )


__all__ = [
    "Construction",
    "Flexure",
    "Materials",
    "TransverseDesign",
    "TransverseGrid",
    "beta1",
    "cantilever",
    "design_transverse",
    "development_length",
    "effective_depth",
    "evaluate_transverse",
    "factored_moment",
    "factored_shear",
    "flexural_strength",
    "max_spacing",
    "minimum_steel",
    "one_way_shear_strength",
    "root_fc",
    "steel_required",
]

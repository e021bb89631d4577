"""The plain (unreinforced) concrete wall footing, ACI 318-19 chapter 14.

Per unit length of footing (b = 1 m), SI floats, inch-pound equations converted exactly as in
:mod:`engine.concrete.transverse`. The rules:

* h >= 8 in (14.3.2.1), on the actual thickness;
* for a footing cast against soil the thickness used for strength is h less 2 in (14.5.1.7);
* φ = 0.60 for flexure and shear of plain concrete (Table 21.2.1);
* Mn = 5 λ √f'c Sm (14.5.2.1, the tension face governs), Sm = b h_s^2 / 6;
* Vn = (4/3) λ √f'c b h_s (14.5.5.1), with the shear section at a distance h from the moment section
  (14.4.3.3). Kernline takes the strength thickness h_s (h less 2 in when cast against soil) for that
  distance, as McCormac & Brown, *Design of Reinforced Concrete*, 9th ed., Example 12.10, do (22 in
  from the wall face for a 24 in footing). The section then lies nearer the wall than with the full
  h, so Vu is larger: the conservative reading.
* the moment section is that of Table 13.2.7.1, as for a reinforced footing (the chapter 14 clause
  that applies it to plain footings is from memory; McCormac & Brown, Example 12.10, take the face
  of the concrete wall, R).

In seismic design categories D to F plain concrete footings are permitted only as 14.1.4 says;
:func:`plain_permitted` answers whether, and why not.
"""

from __future__ import annotations

import math
from dataclasses import dataclass

import numpy as np

from ..errors import InputError
from .bars import INCH, Bar, parse_counted
from .transverse import (
    TOLERANCE,
    ArrayLike,
    Construction,
    _safe_ratio,
    cantilever,
    factored_moment,
    factored_shear,
    root_fc,
)

# ACI 318-19 14.3.2.1: plain footings at least 8 in thick.
MIN_THICKNESS = 8.0 * INCH
# ACI 318-19 14.5.1.7: for footings cast against soil, h for strength is the actual h less 2 in.
SOIL_ALLOWANCE = 2.0 * INCH
# ACI 318-19 Table 21.2.1: φ for flexure and shear of plain concrete.
PHI_PLAIN = 0.60
# ACI 318-19 14.5.2.1: Mn = 5 λ √f'c Sm (psi), tension governing.
FLEXURE_COEFFICIENT = 5.0
# ACI 318-19 14.5.5.1: Vn = (4/3) λ √f'c bw h (psi), one-way shear.
SHEAR_COEFFICIENT = 4.0 / 3.0
# ACI 318-19 14.1.4: in SDC D to F, plain footings under reinforced walls need at least two
# continuous longitudinal bars, no smaller than No. 4, with As >= 0.002 Ag.
SEISMIC_MIN_BARS = 2
SEISMIC_MIN_BAR_SIZE = 4
SEISMIC_MIN_STEEL_RATIO = 0.002
SEISMIC_CATEGORIES = ("A", "B", "C", "D", "E", "F")
HIGH_SEISMIC = frozenset({"D", "E", "F"})


def strength_thickness(thickness: ArrayLike, cast_against_soil: bool = True) -> np.ndarray:
    """h_s, the thickness used for strength (m), ACI 318-19 14.5.1.7: h - 2 in when cast against soil.

    Args:
        thickness: h, the actual thickness (m). cast_against_soil: the footing is cast on soil.
    """
    h = np.asarray(thickness, dtype=float)
    return h - SOIL_ALLOWANCE if cast_against_soil else h


def section_modulus(b: ArrayLike, h_s: ArrayLike) -> np.ndarray:
    """Sm = b h_s^2 / 6 (m^3 per b), the elastic section modulus of the rectangle (ACI 318-19 14.5.2.1).

    Args:
        b: width of the section (m). h_s: thickness for strength (m).
    """
    h = np.maximum(np.asarray(h_s, dtype=float), 0.0)
    return np.asarray(b, dtype=float) * h * h / 6.0


def plain_moment_strength(b: ArrayLike, h_s: ArrayLike, fc: float, lam: float = 1.0) -> np.ndarray:
    """φMn = 0.60 · 5 λ √f'c Sm (N·m per b), ACI 318-19 14.5.2.1 and Table 21.2.1.

    Args:
        b: width (m). h_s: thickness for strength (m). fc: f'c (Pa). lam: λ (19.2.4).
    """
    return PHI_PLAIN * FLEXURE_COEFFICIENT * lam * root_fc(fc) * section_modulus(b, h_s)


def plain_shear_strength(b: ArrayLike, h_s: ArrayLike, fc: float, lam: float = 1.0) -> np.ndarray:
    """φVn = 0.60 · (4/3) λ √f'c b h_s (N per b), ACI 318-19 14.5.5.1 and Table 21.2.1.

    Args:
        b: width (m). h_s: thickness for strength (m). fc: f'c (Pa). lam: λ (19.2.4).
    """
    h = np.maximum(np.asarray(h_s, dtype=float), 0.0)
    return PHI_PLAIN * SHEAR_COEFFICIENT * lam * root_fc(fc) * np.asarray(b, dtype=float) * h


@dataclass(frozen=True, slots=True, eq=False)
class PlainGrid:
    """The plain-concrete check of every candidate (arrays of the broadcast shape of q_u, B, h).

    Attributes:
        passes: h >= 8 in, φMn >= Mu and φVn >= Vu.
        ratio: the least of h / 8 in, φMn / Mu and φVn / Vu.
        strength_thickness: h_s (m). cantilever: c (m). section_modulus: Sm (m^3/m).
        moment, moment_capacity: Mu and φMn (N·m/m).
        shear_distance: the shear section's distance from the moment section (= h_s, m).
        shear, shear_capacity: Vu and φVn (N/m).
        ratios: "thickness", "flexure", "shear".
    """

    passes: np.ndarray
    ratio: np.ndarray
    strength_thickness: np.ndarray
    cantilever: np.ndarray
    section_modulus: np.ndarray
    moment: np.ndarray
    moment_capacity: np.ndarray
    shear_distance: np.ndarray
    shear: np.ndarray
    shear_capacity: np.ndarray
    ratios: dict[str, np.ndarray]


def evaluate_plain(
    q_u: ArrayLike,
    width: ArrayLike,
    thickness: ArrayLike,
    *,
    wall_thickness: float,
    construction: Construction,
    fc: float,
    lam: float = 1.0,
    cast_against_soil: bool = True,
) -> PlainGrid:
    """The plain-concrete check of a footing or of a grid of footings (ACI 318-19 chapter 14).

    Mu = q_u c^2/2 at the section of Table 13.2.7.1; Vu = q_u (c - h_s) at h_s from it (14.4.3.3, h_s
    as the module docstring says); capacities of 14.5.2.1 and 14.5.5.1 on h_s (14.5.1.7).

    Args:
        q_u: factored net soil pressure (Pa). width: B (m). thickness: h, actual (m).
        wall_thickness: t (m). construction: the wall's kind. fc: f'c (Pa). lam: λ.
        cast_against_soil: take 2 in off h for strength (14.5.1.7).
    """
    h = np.asarray(thickness, dtype=float)
    h_s = strength_thickness(h, cast_against_soil)
    c = cantilever(width, wall_thickness, construction)
    mu = factored_moment(q_u, c)
    vu = factored_shear(q_u, c, h_s)
    phi_mn = plain_moment_strength(1.0, h_s, fc, lam)
    phi_vn = plain_shear_strength(1.0, h_s, fc, lam)
    ratios = {
        "thickness": h / MIN_THICKNESS,
        "flexure": _safe_ratio(phi_mn, mu),
        "shear": _safe_ratio(phi_vn, vu),
    }
    shape = np.broadcast_shapes(*(np.shape(r) for r in ratios.values()))
    ratios = {k: np.broadcast_to(v, shape) for k, v in ratios.items()}
    ratio = np.minimum.reduce(list(ratios.values()))
    return PlainGrid(
        passes=ratio >= 1.0 - TOLERANCE,
        ratio=ratio,
        strength_thickness=np.broadcast_to(h_s, shape),
        cantilever=np.broadcast_to(c, shape),
        section_modulus=np.broadcast_to(section_modulus(1.0, h_s), shape),
        moment=np.broadcast_to(mu, shape),
        moment_capacity=np.broadcast_to(phi_mn, shape),
        shear_distance=np.broadcast_to(h_s, shape),
        shear=np.broadcast_to(vu, shape),
        shear_capacity=np.broadcast_to(phi_vn, shape),
        ratios=ratios,
    )


@dataclass(frozen=True, slots=True)
class PlainDesign:
    """The plain-concrete check of one wall footing, per unit length (SI).

    Attributes:
        construction: the wall's kind. q_u: factored net soil pressure (Pa).
        thickness: h, actual (m). strength_thickness: h_s (m; h - 2 in when cast against soil).
        cantilever: c (m). section_modulus: Sm (m^3/m).
        moment, moment_capacity: Mu and φMn (N·m/m).
        shear_distance: distance of the shear section from the moment section, h_s (m).
        shear, shear_capacity: Vu and φVn (N/m).
        thickness_passes: h >= 8 in (14.3.2.1). flexure_passes, shear_passes.
        ratio: the least of the three ratios. message: "" or what fails, in words.
    """

    construction: Construction
    q_u: float
    thickness: float
    strength_thickness: float
    cantilever: float
    section_modulus: float
    moment: float
    moment_capacity: float
    shear_distance: float
    shear: float
    shear_capacity: float
    thickness_passes: bool
    flexure_passes: bool
    shear_passes: bool
    ratio: float
    message: str

    @property
    def passes(self) -> bool:
        """Every requirement of chapter 14 checked here is met."""
        return self.thickness_passes and self.flexure_passes and self.shear_passes


_WORDS = {
    "thickness": "a plain footing must be at least 8 in thick (ACI 318-19 14.3.2.1)",
    "flexure": "plain concrete does not carry the factored moment (φMn < Mu, ACI 318-19 14.5.2.1); "
    "thicken the footing or reinforce it",
    "shear": "plain concrete does not carry the one-way shear (φVn < Vu, ACI 318-19 14.5.5.1); thicken the footing",
}


def design_plain(
    *,
    q_u: float,
    width: float,
    thickness: float,
    wall_thickness: float,
    construction: Construction,
    fc: float,
    lam: float = 1.0,
    cast_against_soil: bool = True,
) -> PlainDesign:
    """Check one plain wall footing, ACI 318-19 chapter 14 (see :func:`evaluate_plain`).

    Raises:
        InputError: a number that is not finite or not positive, named by its argument.
    """
    for name, value in (("width", width), ("thickness", thickness), ("wall_thickness", wall_thickness), ("fc", fc)):
        if not (isinstance(value, (int, float)) and math.isfinite(value) and value > 0.0):
            raise InputError(name, "must be a finite number greater than zero")
    if not (isinstance(q_u, (int, float)) and math.isfinite(q_u) and q_u >= 0.0):
        raise InputError("q_u", "must be a finite pressure, not negative")
    if not 0.0 < lam <= 1.0:
        raise InputError("lam", "λ must be greater than 0 and at most 1 (ACI 318-19 19.2.4)")
    grid = evaluate_plain(
        q_u,
        width,
        thickness,
        wall_thickness=wall_thickness,
        construction=construction,
        fc=fc,
        lam=lam,
        cast_against_soil=cast_against_soil,
    )
    ratios = {k: float(np.asarray(v)) for k, v in grid.ratios.items()}
    ok = {k: v >= 1.0 - TOLERANCE for k, v in ratios.items()}

    def f(name: str) -> float:
        return float(np.asarray(getattr(grid, name)))

    return PlainDesign(
        construction=construction,
        q_u=float(q_u),
        thickness=float(thickness),
        strength_thickness=f("strength_thickness"),
        cantilever=f("cantilever"),
        section_modulus=f("section_modulus"),
        moment=f("moment"),
        moment_capacity=f("moment_capacity"),
        shear_distance=f("shear_distance"),
        shear=f("shear"),
        shear_capacity=f("shear_capacity"),
        thickness_passes=ok["thickness"],
        flexure_passes=ok["flexure"],
        shear_passes=ok["shear"],
        ratio=f("ratio"),
        message="; ".join(_WORDS[k] for k in ("thickness", "flexure", "shear") if not ok[k]),
    )


@dataclass(frozen=True, slots=True)
class PlainPermission:
    """Whether a plain footing is permitted (ACI 318-19 14.1.4) and, if not, why.

    Attributes:
        permitted: True when plain concrete may be used. reason: "" when permitted; else why not.
    """

    permitted: bool
    reason: str


def plain_permitted(
    *,
    sdc: str,
    construction: Construction,
    wall_reinforced: bool = True,
    longitudinal: str | tuple[int, Bar] | None = None,
    width: float,
    thickness: float,
) -> PlainPermission:
    """Whether a plain wall footing is permitted, ACI 318-19 14.1.4 (R; see docs/verification.md).

    In seismic design categories A to C plain footings are permitted. In D to F a plain footing is
    permitted only under a cast-in-place reinforced concrete wall or a reinforced masonry wall, and
    only with at least two continuous longitudinal bars no smaller than No. 4 whose total area is
    at least 0.002 Ag (Ag = B h, the footing's gross section). A light-frame wall is refused in D to
    F: the provision's exceptions for detached dwellings (from memory) are not modelled.

    Args:
        sdc: the seismic design category, "A" to "F".
        construction: the wall's kind. wall_reinforced: for concrete and masonry walls, whether the
            wall is reinforced (and, for concrete, cast in place).
        longitudinal: the continuous longitudinal bars, "2 #4" or (count, bar), or None.
        width: B (m). thickness: h, actual (m).

    Raises:
        InputError: an unknown seismic design category or unreadable bar text.
    """
    category = sdc.strip().upper() if isinstance(sdc, str) else ""
    if category not in SEISMIC_CATEGORIES:
        raise InputError("sdc", f"expected a seismic design category A to F, got {sdc!r}")
    if category not in HIGH_SEISMIC:
        return PlainPermission(True, "")
    where = f"in seismic design category {category}"
    if construction is Construction.LIGHT_FRAME:
        return PlainPermission(
            False,
            f"{where} a plain footing may carry only a cast-in-place reinforced concrete or reinforced masonry wall "
            "(ACI 318-19 14.1.4); reinforce the footing",
        )
    if not wall_reinforced:
        kind = "concrete" if construction is Construction.CONCRETE else "masonry"
        return PlainPermission(
            False, f"{where} a plain footing may not carry an unreinforced {kind} wall (ACI 318-19 14.1.4); reinforce the footing"
        )
    bars = parse_counted(longitudinal) if isinstance(longitudinal, str) else longitudinal
    if bars is None or bars[0] < SEISMIC_MIN_BARS:
        return PlainPermission(
            False, f"{where} a plain footing needs at least two continuous longitudinal bars, No. 4 or larger (ACI 318-19 14.1.4)"
        )
    count, the_bar = bars
    if the_bar.size < SEISMIC_MIN_BAR_SIZE:
        return PlainPermission(
            False, f"{where} the continuous longitudinal bars must be No. 4 or larger, not {the_bar.name} (ACI 318-19 14.1.4)"
        )
    gross = width * thickness
    if count * the_bar.area < SEISMIC_MIN_STEEL_RATIO * gross * (1.0 - TOLERANCE):
        return PlainPermission(
            False,
            f"{where} the continuous longitudinal bars must total at least 0.002 of the footing's gross section "
            f"(ACI 318-19 14.1.4); {count} {the_bar.name} is {count * the_bar.area / gross:.5f} of it",
        )
    return PlainPermission(True, "")


# IBC 2021 1905.6.2 replaces ACI 318-19 14.1.4 (section number from memory; the model text as adopted
# locally, e.g. San Mateo (CA) Municipal Code 23.08.130 and Pasadena (CA) 14.04.210, R): in seismic
# design categories C to F plain concrete wall footings are permitted with at least two continuous
# longitudinal bars, no smaller than No. 4, totalling at least 0.002 Ag, and, in a footing thicker
# than 8 in, at least one bar at the top and one at the bottom.
IBC_PLAIN_CATEGORIES = frozenset({"C", "D", "E", "F"})
IBC_TOP_AND_BOTTOM_ABOVE = 8.0 * INCH
IBC_PLAIN_CLAUSE = "IBC 2021 1905.6.2, replacing ACI 318-19 14.1.4"


@dataclass(frozen=True, slots=True, eq=False)
class PlainSeismicGrid:
    """The seismic condition on a plain wall footing over candidate sizes.

    Attributes:
        applies: the seismic design category calls for longitudinal bars.
        ratio: As of the continuous bars / (0.002 Ag) where the bar count, size and faces meet the
            rule, else 0 (array of the broadcast shape of B and h; inf where the rule does not apply).
        reason: the first unmet condition that holds for every size, in words ("" when none).
        steel: the continuous bars' total area (m^2).
        steel_required: 0.002 Ag over the sizes (m^2; 0 where nothing is asked).
    """

    applies: bool
    ratio: np.ndarray
    reason: str
    steel: float
    steel_required: np.ndarray | float = 0.0


def plain_seismic_grid(
    *,
    sdc: str | None,
    bottom: tuple[int, Bar] | None,
    top: tuple[int, Bar] | None,
    width: ArrayLike,
    thickness: ArrayLike,
) -> PlainSeismicGrid:
    """Whether plain concrete is permitted for a wall footing under the IBC, over candidate sizes.

    IBC 2021 1905.6.2 (its replacement of ACI 318-19 14.1.4; see :data:`IBC_PLAIN_CLAUSE`): in
    seismic design categories C to F a plain wall footing needs at least two continuous longitudinal
    bars, each No. 4 or larger, with a total area of at least 0.002 times the footing's gross section
    (Ag = B h), and, in a footing more than 8 in thick, at least one bar at the top and one at the
    bottom. The exception for detached one- and two-family dwellings is not modelled. Without a
    seismic design category (``sdc`` None) or in A and B, nothing is required.

    Args:
        sdc: "A" to "F", or None. bottom, top: the continuous bars (count, bar) at each face, or
            None. width: B (m). thickness: h (m).
    """
    b = np.asarray(width, dtype=float)
    h = np.asarray(thickness, dtype=float)
    shape = np.broadcast_shapes(b.shape, h.shape)
    if sdc is None or sdc not in IBC_PLAIN_CATEGORIES:
        return PlainSeismicGrid(False, np.full(shape, np.inf), "", 0.0)
    where = f"in seismic design category {sdc} a plain footing needs"
    faces = [bars for bars in (bottom, top) if bars is not None]
    count = sum(n for n, _ in faces)
    steel = float(sum(n * bar_.area for n, bar_ in faces))
    reason = ""
    if count < SEISMIC_MIN_BARS:
        reason = f"{where} at least two continuous longitudinal bars, No. 4 or larger ({IBC_PLAIN_CLAUSE}); give them as bottom and top bars"
    elif any(bar_.size < SEISMIC_MIN_BAR_SIZE for _, bar_ in faces):
        small = next(bar_.name for _, bar_ in faces if bar_.size < SEISMIC_MIN_BAR_SIZE)
        reason = f"{where} continuous bars of No. 4 or larger, not {small} ({IBC_PLAIN_CLAUSE})"
    gross = b * h
    required = np.broadcast_to(SEISMIC_MIN_STEEL_RATIO * gross, shape)
    if reason:
        return PlainSeismicGrid(True, np.zeros(shape), reason, steel, required)
    ratio = np.broadcast_to(steel / (SEISMIC_MIN_STEEL_RATIO * gross), shape).copy()
    both_faces = bottom is not None and top is not None
    if not both_faces:
        thick = np.broadcast_to(h > IBC_TOP_AND_BOTTOM_ABOVE * (1.0 + TOLERANCE), shape)
        ratio = np.where(thick, 0.0, ratio)
        if bool(np.all(thick)):
            reason = (
                f"{where} a continuous bar at the top and one at the bottom when it is more than 8 in thick ({IBC_PLAIN_CLAUSE})"
            )
    return PlainSeismicGrid(True, ratio, reason, steel, required)


def plain_seismic_words(grid: PlainSeismicGrid, index: tuple[int, ...] | int = ()) -> str:
    """Why a plain footing is not permitted at one size, or "" (see :func:`plain_seismic_grid`)."""
    if not grid.applies:
        return ""
    value = float(np.asarray(grid.ratio)[index]) if np.ndim(grid.ratio) else float(grid.ratio)
    if value >= 1.0 - TOLERANCE:
        return ""
    if grid.reason:
        return grid.reason
    if value == 0.0:
        return (
            f"a plain footing more than 8 in thick needs a continuous bar at the top and one at the bottom ({IBC_PLAIN_CLAUSE})"
        )
    return (
        f"the continuous longitudinal bars of a plain footing must total at least 0.002 of its gross section "
        f"({IBC_PLAIN_CLAUSE}); they give {value * SEISMIC_MIN_STEEL_RATIO:.5f} of it"
    )


__all__ = [
    "IBC_PLAIN_CLAUSE",
    "PlainDesign",
    "PlainGrid",
    "PlainPermission",
    "PlainSeismicGrid",
    "design_plain",
    "evaluate_plain",
    "plain_moment_strength",
    "plain_seismic_grid",
    "plain_seismic_words",
    "plain_permitted",
    "plain_shear_strength",
    "section_modulus",
    "strength_thickness",
]

"""Overturning of the wall and footing about the toe.

Source: statics of a rigid body tipping about the edge of its base; the ratio of resisting to
overturning moment about the toe, e.g. Das, *Principles of Foundation Engineering*, retaining-wall
stability (FS_overturning = sum M_R / sum M_O); for shear walls on footings with ASCE 7-16 2.4.1
combination 7 (0.6D + 0.6W) the required ratio is 1.0, the 0.6 on dead load carrying the margin
(Breyer et al., *Design of Wood Structures - ASD*, 5th ed., p. 2.37, read in a secondary quotation;
see docs/verification.md, "Required ratios"). With every resisting load centred the ratio is L/(2e)
(docs/verification.md, case 1).

Vertical loads resist when downward and overturn when upward; lateral loads overturn with
f*H*(height + D), their arm measured from the base of the footing.
"""

from __future__ import annotations

import numpy as np

ArrayLike = float | np.ndarray


def toe_arm(x: ArrayLike, length: float, toe_sign: ArrayLike) -> np.ndarray:
    """Arm (m) of a vertical load at x about the toe: L - x for the toe at x = L (sign +1), x for x = 0.

    ``toe_sign`` may be an array broadcasting against ``x`` (one toe per design case).
    """
    return np.where(np.asarray(toe_sign) > 0, np.subtract(length, x), x)


def vertical_toe_moments(force: ArrayLike, arm: ArrayLike) -> tuple[np.ndarray, np.ndarray]:
    """Split the moment of factored vertical force P (downward positive) at ``arm`` about the toe.

    Returns:
        (resisting, overturning) moments (N*m): P*arm when P is downward, |P|*arm when upward.
    """
    moment = np.multiply(force, arm)
    return np.maximum(moment, 0.0), np.maximum(-moment, 0.0)


def lateral_moment(moment_about_top: ArrayLike, shear: ArrayLike, thickness: ArrayLike) -> np.ndarray:
    """Overturning moment (N*m) about the base of shears H_i applied h_i above the top of a footing D thick.

    M = sum H_i (h_i + D) = sum H_i h_i + (sum H_i) D: each arm runs to the base of the footing, about
    which the footing tips.

    Args:
        moment_about_top: sum H_i h_i (N*m).
        shear: sum H_i (N).
        thickness: D (m).
    """
    return np.add(moment_about_top, np.multiply(shear, thickness))


def overturning_ratio(resisting: ArrayLike, overturning: ArrayLike) -> np.ndarray:
    """Ratio M_R / M_OT; inf where there is no overturning moment (no demand)."""
    m_ot = np.asarray(overturning, dtype=float)
    with np.errstate(divide="ignore", invalid="ignore"):
        ratio = np.asarray(resisting, dtype=float) / m_ot
    none = m_ot <= 0.0
    if none.any():
        ratio = np.where(none, np.inf, ratio)
    return ratio

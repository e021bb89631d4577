"""Soil pressure under a rigid strip footing with a one-way eccentric load, soil taking no tension.

Source: the classical linear contact-pressure solution (P/A +- M/S with S = B L^2 / 6 while the
resultant is inside the kern; a triangular block of length 3(L/2 - e) beyond it), e.g. Das,
*Principles of Foundation Engineering*, section on eccentrically loaded foundations (q_max =
4P / (3B(L - 2e)) beyond the kern) and Bowles, *Foundation Analysis and Design*, 5th ed.,
section 4-8 (both cited from memory); checked against published worked examples in
docs/verification.md, cases 2 to 7.

Every function takes floats or numpy arrays and broadcasts, so the same code serves a single check
and the sizing grid.
"""

from __future__ import annotations

import math
from dataclasses import dataclass

import numpy as np

ArrayLike = float | np.ndarray


@dataclass(frozen=True, slots=True)
class PressureDistribution:
    """Linear soil pressure along the footing (Pa) for a resultant N at eccentricity e.

    Attributes:
        q_max: peak pressure, at the end toward which e points (inf where there is no equilibrium).
        q_min: pressure at the other end of the contact (0 beyond the kern).
        contact_length: length in contact with the soil, measured from the loaded end (m).
        stable: False where N <= 0 or |e| >= L/2 (the footing cannot be in equilibrium on the soil).
    """

    q_max: np.ndarray
    q_min: np.ndarray
    contact_length: np.ndarray
    stable: np.ndarray


def resultant_eccentricity(moment_about_centre: ArrayLike, vertical: ArrayLike) -> np.ndarray:
    """e = M / N: eccentricity of the resultant from the footing's mid-length (m).

    Source: statics; Das, *Principles of Foundation Engineering*, eccentric loading (e = M/Q).
    Returns +-inf (the sign of M; +inf for M = 0) where N <= 0: no resultant on the soil.
    """
    n = np.asarray(vertical, dtype=float)
    m = np.asarray(moment_about_centre, dtype=float)
    with np.errstate(divide="ignore", invalid="ignore"):
        e = m / n
    no_resultant = n <= 0.0
    if no_resultant.any():
        if isinstance(e, np.ndarray) and e.ndim:  # overwrite in place: no second grid-sized array
            np.copyto(e, np.copysign(np.inf, m), where=no_resultant)
        else:
            e = np.where(no_resultant, np.copysign(np.inf, m), e)
    return e


KERN_FRACTION = 1.0 / 6.0  # e <= L/6 keeps the whole footing in contact (Bowles, 5th ed., 4-8; Das)


def kern_eccentricity(length: float) -> float:
    """The largest eccentricity with the whole footing in contact, e_k = L/6 (m).

    Source: Bowles, *Foundation Analysis and Design*, 5th ed., section 4-8 (the kern, the middle
    third of a rectangular footing); Das, *Principles of Foundation Engineering*.

    Args:
        length: L, the footing's length along the eccentricity (m).
    """
    return KERN_FRACTION * float(length)


def pressure_distribution(vertical: ArrayLike, eccentricity: ArrayLike, width: ArrayLike, length: float) -> PressureDistribution:
    """Soil pressure under a rigid footing of width B and length L, no tension.

    * |e| <= L/6 (resultant in the kern): q = N/(B L) * (1 +- 6|e|/L), full contact.
    * L/6 < |e| < L/2: triangular block, contact length a = 3 (L/2 - |e|),
      q_max = 2 N / (3 B (L/2 - |e|)), q_min = 0.
    * N <= 0 or |e| >= L/2: no equilibrium; q_max = inf, contact 0.

    Args:
        vertical: N, total vertical load on the soil (N, downward positive).
        eccentricity: e, of N from the footing's mid-length (m).
        width: B (m).
        length: L (m).
    """
    # The same arithmetic as the formulas above, done in as few grid-sized arrays as possible (the
    # sizing grid calls this on cases x thicknesses x widths): each step writes into an array whose
    # previous value is no longer needed, and the beyond-the-kern branch is divided only where it applies.
    n = np.asarray(vertical, dtype=float)
    w = np.asarray(width, dtype=float)
    e_in = np.asarray(eccentricity, dtype=float)
    # the shape of stable and contact_length, and that of q_max and q_min (which B may widen)
    along = n.shape if n.shape == e_in.shape else np.broadcast_shapes(n.shape, e_in.shape)
    shape = along if not w.ndim or w.shape == along else np.broadcast_shapes(along, w.shape)
    half = 0.5 * length
    e = np.abs(e_in, out=np.empty(shape))  # |e|
    e_along = e if along == shape else np.abs(e_in)
    stable = (n > 0.0) & (e_along < half)
    in_kern = e <= length / 6.0
    contact = np.subtract(half, e_along, out=np.empty(along))
    contact *= 3.0  # a = 3 (L/2 - |e|) beyond the kern
    np.copyto(contact, length, where=in_kern if along == shape else e_along <= length / 6.0)
    with np.errstate(divide="ignore", invalid="ignore", over="ignore"):
        average = np.divide(n, w * length, out=np.empty(shape))  # N / (B L)
        swing = np.multiply(average, 6.0 / length, out=np.empty(shape))
        swing *= e  # N / (B L) * 6|e|/L
        q_max = np.add(average, swing, out=np.empty(shape))  # in the kern
        q_min = np.subtract(average, swing, out=average)
        np.maximum(q_min, 0.0, out=q_min)  # no rounding below zero at e = L/6
        beyond = ~in_kern
        if beyond.any():
            # beyond the kern: q_max = 2 N / (3 B (L/2 - |e|)), q_min = 0
            half_minus_e = np.subtract(half, e, out=e)
            two_thirds_n = np.multiply(n, 2.0 / 3.0, out=swing)
            np.divide(two_thirds_n, np.multiply(w, half_minus_e, out=half_minus_e), out=q_max, where=beyond)
            np.copyto(q_min, 0.0, where=beyond)
    unstable = ~stable
    if unstable.any():
        np.copyto(q_max, np.inf, where=unstable)
        np.copyto(q_min, 0.0, where=unstable)
        np.copyto(contact, 0.0, where=unstable)
    return PressureDistribution(q_max=q_max, q_min=q_min, contact_length=contact, stable=stable)


def pressure_at(distribution: PressureDistribution, eccentricity: float, length: float, x: np.ndarray) -> np.ndarray:
    """Pressure ordinates (Pa) at positions x (m from the footing's start end), for drawing.

    The peak is at the end toward which e points; beyond the kern the pressure falls linearly to zero
    over the contact length.
    """
    q_max = float(distribution.q_max)
    if not bool(distribution.stable):
        return np.zeros_like(x)
    q_min = float(distribution.q_min)
    a = float(distribution.contact_length)
    # distance from the loaded end
    s = (length - x) if eccentricity >= 0.0 else x
    return np.clip(q_max - (q_max - q_min) * s / a, 0.0, None) * (s <= a + 1e-12)


@dataclass(frozen=True, slots=True)
class PressureDiagram:
    """What a view needs to draw the soil pressure of one case (SI units, x from the start end).

    Attributes:
        x, q: ordinates of the diagram (m, Pa), ready to plot.
        kern: the kern limits, L/3 and 2L/3 (the middle third, within which e = |M/N| <= L/6 keeps the
            whole footing in contact).
        contact_start, contact_end: the stretch in contact with the soil.
        resultant_x: where the resultant N acts (L/2 + e).
        q_max, q_min, stable: as in :class:`PressureDistribution`.
    """

    x: np.ndarray
    q: np.ndarray
    kern: tuple[float, float]
    contact_start: float
    contact_end: float
    resultant_x: float
    q_max: float
    q_min: float
    stable: bool


def pressure_diagram(vertical: float, eccentricity: float, width: float, length: float) -> PressureDiagram:
    """The pressure diagram of a resultant N at eccentricity e under a footing B x L (see
    :func:`pressure_distribution` for the formulas)."""
    dist = pressure_distribution(vertical, eccentricity, width, length)
    stable = bool(dist.stable)
    kern = (length / 3.0, 2.0 * length / 3.0)
    if not stable:
        x = np.array([0.0, length])
        return PressureDiagram(x, np.zeros(2), kern, 0.0, 0.0, math.nan, math.inf, 0.0, False)
    a = float(dist.contact_length)
    q_max, q_min = float(dist.q_max), float(dist.q_min)
    # the peak is at the end toward which e points; the block closes to zero at both ends
    if eccentricity >= 0.0:
        start, end, q_start, q_end = length - a, length, q_min, q_max
    else:
        start, end, q_start, q_end = 0.0, a, q_max, q_min
    x = np.array([start, start, end, end])
    q = np.array([0.0, q_start, q_end, 0.0])
    return PressureDiagram(x, q, kern, start, end, 0.5 * length + float(eccentricity), q_max, q_min, True)

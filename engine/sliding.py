"""Sliding of the footing along its length under the wall's in-plane shear.

Sources:
* Friction: mu * N at the base, N the combination's whole vertical load on the soil, only while
  N > 0 (the project's contract). IBC 2021 Table 1806.2 note a applies the coefficient to the dead
  load; the two agree in the 0.6D and (0.6 - 0.14 S_DS)D combinations that usually govern sliding,
  and the README and the calc package state the difference.
* Cohesion: c times the contact area B*a, capped at one-half of N (IBC 2021 1806.3.2 caps the
  cohesion-type resistance at one-half the dead load; we cap it at half of the vertical load of the
  combination, which is the dead load times its factor plus any companion loads).
* Passive: a pressure rising linearly with depth, p = K z (``passive`` in psf per ft of depth,
  IBC 2021 Table 1806.2 "lateral bearing"), on the footing's end face of width B between the depth
  z0 = max(cover, passive_ignore) and the base at cover + D:
  P_p = K B ((c + D)^2 - z0^2) / 2, none when z0 >= c + D.
* The friction and passive resistances may be combined (IBC 2021 1806.3.1).
Ratio = resistance / |V| (Bowles, *Foundation Analysis and Design*, 5th ed.: FS = resisting / driving).
"""

from __future__ import annotations

import numpy as np

ArrayLike = float | np.ndarray

# IBC 2021 1806.3.2: cohesion-type sliding resistance at most one-half of the dead load.
COHESION_CAP = 0.5


def friction_resistance(friction: float, vertical: ArrayLike) -> np.ndarray:
    """mu * N while N > 0, else 0 (N)."""
    return np.asarray(friction * np.maximum(vertical, 0.0))


def cohesion_resistance(cohesion: float, width: ArrayLike, contact_length: ArrayLike, vertical: ArrayLike) -> np.ndarray:
    """min(c * B * a, 0.5 N), never below zero (N)."""
    if cohesion == 0.0:
        return np.zeros(np.broadcast_shapes(np.shape(width), np.shape(contact_length), np.shape(vertical)))
    return np.maximum(np.minimum(cohesion * np.multiply(width, contact_length), COHESION_CAP * np.asarray(vertical)), 0.0)


def passive_resistance(passive: float, width: ArrayLike, cover: float, thickness: ArrayLike, ignore_depth: float) -> np.ndarray:
    """K B ((c + D)^2 - z0^2) / 2 with z0 = max(c, ignored depth); 0 when z0 >= c + D (N)."""
    z0 = max(cover, ignore_depth)
    bottom = np.add(cover, thickness)
    return np.where(bottom > z0, 0.5 * passive * np.multiply(width, np.square(bottom) - z0 * z0), 0.0)


def sliding_ratio(resistance: ArrayLike, shear: ArrayLike) -> np.ndarray:
    """Resistance / |V|; inf where there is no shear (no demand)."""
    v = np.abs(np.asarray(shear, dtype=float))
    with np.errstate(divide="ignore", invalid="ignore"):
        ratio = np.asarray(resistance, dtype=float) / v
    none = v <= 0.0
    if none.any():
        ratio = np.where(none, np.inf, ratio)
    return ratio

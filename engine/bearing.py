"""Soil bearing: peak soil pressure against the allowable from the geotechnical report.

Sources:
* Gross and net allowable pressure: a net allowable excludes the overburden at the footing base,
  so the gross peak is reduced by gs (c + D) before comparing (B. M. Das, *Principles of Foundation
  Engineering*, net allowable bearing capacity). The project states which one its soils report gives:
  the two are commonly confused between geotechnical and structural engineers (common practice).
* Increase of the allowable in combinations with wind or seismic load: a value the geotechnical
  report (or IBC 2021 1806.1 with the alternative basic combinations of 1605.2) permits; the
  project states it, default 1.0 (no increase).
Ratio = allowable (x increase) / q, where q is the pressure compared (inf where q <= 0; 0 where the
footing has no equilibrium).
"""

from __future__ import annotations

import numpy as np

from .model import BearingBasis

ArrayLike = float | np.ndarray


def compared_pressure(
    q_max: ArrayLike, basis: BearingBasis, soil_unit_weight: float, cover: float, thickness: ArrayLike
) -> np.ndarray:
    """q_max for a gross allowable; q_max - gs (c + D) for a net allowable (Pa)."""
    if basis is BearingBasis.NET:
        return np.asarray(np.subtract(q_max, soil_unit_weight * np.add(cover, thickness)))
    return np.asarray(q_max)


def allowable_pressure(allowable: float, increase: float, wind_or_seismic: ArrayLike) -> np.ndarray:
    """The allowable, times the increase in combinations that carry W or E (Pa)."""
    return np.where(wind_or_seismic, allowable * increase, allowable)


def bearing_ratio(allowable: ArrayLike, pressure: ArrayLike, stable: ArrayLike) -> np.ndarray:
    """allowable / q; inf where q <= 0 (no demand); 0 where the footing has no equilibrium."""
    q = np.asarray(pressure, dtype=float)
    with np.errstate(divide="ignore", invalid="ignore"):
        ratio = np.asarray(allowable, dtype=float) / q  # q = inf (no equilibrium) gives 0
    no_demand = q <= 0.0
    if no_demand.any():
        ratio = np.where(no_demand, np.inf, ratio)
    unstable = ~np.asarray(stable, dtype=bool)
    if unstable.any():
        ratio = np.where(unstable, 0.0, ratio)
    return ratio

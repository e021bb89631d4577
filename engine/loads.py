"""Loads on the footing: resultants of the wall's loads and the self weight of footing, stem and soil.

Everything here is statics (the resultant of a uniform line load is its intensity times its length,
acting at its mid-point: e.g. Hibbeler, *Statics*, 14th ed., section 4.9) in the footing coordinates
of :mod:`engine.model`.
"""

from __future__ import annotations

from dataclasses import dataclass

import numpy as np

from .model import LateralLoad, LineLoad, LoadCase, PointLoad, SoilProperties, Wall

ArrayLike = float | np.ndarray


@dataclass(frozen=True, slots=True)
class VerticalResultant:
    """A vertical force (N, positive downward) at ``x`` (m from the footing's start end).

    ``x_reversed`` is where it acts when the lateral load acts in the '-' direction (the mirror image
    about the wall's mid-length for loads that reverse, else ``x``).
    """

    case: LoadCase
    force: float
    x: float
    x_reversed: float
    label: str = ""


@dataclass(frozen=True, slots=True)
class LateralResultant:
    """An in-plane shear (N) and its height above the top of the footing (m)."""

    case: LoadCase
    force: float
    height: float
    label: str = ""


def vertical_resultants(wall: Wall) -> tuple[VerticalResultant, ...]:
    """Resultants of the wall's line and point loads, in footing coordinates.

    A line load w from ``start`` to ``end`` has resultant w*(end - start) at its mid-point.
    """
    x0 = wall.footing.extension_start
    mirror = 2.0 * x0 + wall.length  # x -> mirror - x reflects about the wall's mid-length
    out: list[VerticalResultant] = []
    for load in wall.loads:
        if isinstance(load, LineLoad):
            force = load.value * (load.end - load.start)
            x = x0 + 0.5 * (load.start + load.end)
        elif isinstance(load, PointLoad):
            force = load.value
            x = x0 + load.at
        else:
            continue
        out.append(VerticalResultant(load.case, force, x, mirror - x if load.reverses else x, load.label))
    return tuple(out)


def lateral_resultants(wall: Wall) -> tuple[LateralResultant, ...]:
    """The wall's in-plane shears."""
    return tuple(
        LateralResultant(load.case, load.value, load.height, load.label) for load in wall.loads if isinstance(load, LateralLoad)
    )


@dataclass(frozen=True, slots=True)
class SelfWeight:
    """Dead load of the foundation itself (N), all acting at the footing's mid-length."""

    footing: ArrayLike
    stem: ArrayLike
    soil: ArrayLike

    @property
    def total(self) -> ArrayLike:
        return self.footing + self.stem + self.soil


def self_weight(wall: Wall, soil: SoilProperties, width: ArrayLike, thickness: ArrayLike) -> SelfWeight:
    """Self weight of footing, stem and soil cover for footing width B and thickness t_f (load case D).

    Footing gc*B*t_f*L_f; stem gc*ts*hs*L when the stem is there; soil over the footing gs*c*(B - t)*L,
    with c the cover and t the stem thickness (or the wall's when there is no stem). Width and
    thickness may be numpy arrays (the sizing grid); the result broadcasts.
    """
    length = wall.footing_length
    gc = wall.footing.unit_weight
    footing = gc * width * thickness * length
    stem = gc * wall.stem.thickness * wall.stem.height * length if wall.stem.present else 0.0
    soil_cover = soil.unit_weight * wall.footing.cover * (width - wall.supported_thickness) * length
    return SelfWeight(footing=footing, stem=stem, soil=soil_cover)

"""Read-only numbers for drawing the footing's concrete design (no new engineering).

The window draws the footing's cross-section with its bars, its critical sections and the design
along its length. The numbers it needs are already computed by the strength checks
(:func:`engine.checks._strength.strength_grid`, one evaluation per footing) and by
:func:`engine.concrete.along.design_along`; this module only collects them for one footing, in SI,
and places the bars in the section (detailing geometry, derived here, shown in each docstring).

Bar placement (common practice for wall footings, derived here):

* the transverse bars are the lowest layer, their centre ``cover + db/2`` above the bottom, as the
  transverse design takes them (d = h - cover - db/2, :func:`engine.concrete.transverse.effective_depth`);
* the bottom longitudinal bars rest on the transverse bars, their centre
  ``cover + db_t + db/2`` above the bottom (``cover + db/2`` when there are no transverse bars);
* the top longitudinal bars hang ``TOP_COVER`` below the top, their centre ``h - TOP_COVER - db/2``
  above the bottom (:data:`engine.concrete.longitudinal.TOP_COVER`);
* the bars of a face are spaced evenly across the width between the side covers: centres from
  ``cover + db/2`` to ``B - cover - db/2``.
"""

from __future__ import annotations

import math
from dataclasses import dataclass
from typing import TYPE_CHECKING

import numpy as np

from .bars import Bar, bar
from .longitudinal import TOP_COVER, LongitudinalDesign
from .transverse import Construction

if TYPE_CHECKING:  # pragma: no cover
    from ..results import WallResult


@dataclass(frozen=True, slots=True)
class BarRow:
    """One face's longitudinal bars as dots of the cross-section (SI, m from the footing's edge and bottom).

    Attributes:
        face: "bottom" or "top". bar: the bar. across: the centres across the width (m from one edge).
        height: the centres' height above the bottom of the footing (m). text: "3 #5".
    """

    face: str
    bar: Bar
    across: tuple[float, ...]
    height: float
    text: str


@dataclass(frozen=True, slots=True)
class SectionData:
    """The footing across its width as the strength checks designed it (SI).

    Attributes:
        plain: no bars across the width (ACI 318-19 chapter 14); bars along the length may be given.
        width: B (m). thickness: h (m). wall_thickness: what sits on the footing (m).
        construction: the wall's kind, which places the moment section (ACI 318-19 Table 13.2.7.1).
        cover: clear cover to the bottom bars (m).
        moment_section: c, from each edge of the footing to the moment section (m).
        shear_distance: from the moment section to the one-way shear section, toward the edge (m):
            d for a reinforced footing (13.2.7.2), h_s for a plain one (14.4.3.3).
        transverse_bar, transverse_spacing: the bars across the width and their spacing (m); None when
            plain or when no bars pass.
        transverse_height: the transverse bars' centre above the bottom (m); 0 when plain.
        rows: the longitudinal bars of each face that has bars (empty without ``along``).
    """

    plain: bool
    width: float
    thickness: float
    wall_thickness: float
    construction: Construction
    cover: float
    moment_section: float
    shear_distance: float
    transverse_bar: Bar | None
    transverse_spacing: float | None
    transverse_height: float
    rows: tuple[BarRow, ...]

    @property
    def shear_section(self) -> float:
        """From each edge of the footing to the one-way shear section (m); <= 0 when the section falls
        beyond the edge, so that no one-way shear acts (c - d, derived here)."""
        return self.moment_section - self.shear_distance


def bar_centres(width: float, cover: float, diameter: float, count: int) -> tuple[float, ...]:
    """Centres of ``count`` bars spaced evenly across the width between the side covers (derived here).

    x_i = cover + db/2 + i (B - 2 cover - db) / (n - 1), i = 0 .. n - 1; one bar sits at mid-width.

    Args:
        width: B (m). cover: side cover (m). diameter: db (m). count: n, at least 1.
    """
    if count <= 0:
        return ()
    if count == 1:
        return (0.5 * width,)
    first, last = cover + 0.5 * diameter, width - cover - 0.5 * diameter
    return tuple(float(x) for x in np.linspace(first, last, count))


def section_data(result: WallResult, along: LongitudinalDesign | None = None) -> SectionData | None:
    """The cross-section of ``result``'s footing with the bars the strength checks designed or checked.

    ``along``: the design along the length (:func:`engine.concrete.along.design_along`) whose bars
    are drawn as dots; None draws no longitudinal bars. Returns None without a concrete section.
    """
    from ..checks._strength import strength_grid

    table, ev = result.strength_table, result.strength_evaluation
    if table is None or ev is None or table.concrete is None:
        return None
    grid = strength_grid(ev.statics)
    design = grid.design
    wall = table.wall
    cover = table.concrete.cover
    width, thickness = result.width, result.thickness
    construction = Construction(wall.construction.value)
    moment_section = float(np.asarray(design.cantilever))
    plain = bool(grid.plain)
    if plain:
        transverse, spacing, distance = None, None, float(np.asarray(design.shear_distance))
    else:
        size = int(np.asarray(design.size))
        spacing = float(np.asarray(design.spacing))
        transverse = bar(size) if size > 0 and math.isfinite(spacing) else None
        distance = float(np.asarray(design.effective_depth))
    below = transverse.diameter if transverse is not None else 0.0
    rows: list[BarRow] = []
    if along is not None:
        for face in (along.bottom, along.top):
            if face.bar is None or face.count <= 0:
                continue
            db = face.bar.diameter
            # bottom bars on the transverse bars; top bars under the top cover
            height = cover + below + 0.5 * db if face.face == "bottom" else thickness - TOP_COVER - 0.5 * db
            rows.append(
                BarRow(
                    face=face.face,
                    bar=face.bar,
                    across=bar_centres(width, cover, db, face.count),
                    height=height,
                    text=face.bars,
                )
            )
    return SectionData(
        plain=plain,
        width=width,
        thickness=thickness,
        wall_thickness=wall.supported_thickness,
        construction=construction,
        cover=cover,
        moment_section=moment_section,
        shear_distance=distance,
        transverse_bar=transverse,
        transverse_spacing=spacing if transverse is not None else None,
        transverse_height=cover + 0.5 * below if transverse is not None else 0.0,
        rows=tuple(rows),
    )


__all__ = ["BarRow", "SectionData", "bar_centres", "section_data"]

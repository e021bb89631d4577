"""The footing's transverse design over every strength case and candidate size, shared by the
flexure and one-way shear checks (ACI 318-19; formulas in :mod:`engine.concrete`).

Member design takes the net soil pressure of the factored wall loads (the footing's own weight and the
soil on it go straight to the soil), at the most heavily loaded point of the rigid-footing pressure
along the length: q_u = the largest, over the strength cases, of q_max less the uniform pressure of
the factored self weight f_D W_f / (B L_f). With uniform wall loads this is the factored wall load
over B, as in the textbooks; with an eccentric resultant it keeps the pressure's shape that of the
footing as it stands on the soil (a case with no equilibrium fails the stability checks and puts no
member demand here). The design across the
width is then that of a unit strip under q_u (McCormac & Brown, *Design of Reinforced Concrete*, 9th
ed., section 12.4; ACI 318-19 13.2.7). A case with no equilibrium on the soil puts no member demand
here: it fails the stability checks already.
"""

from __future__ import annotations

from dataclasses import dataclass
from typing import TYPE_CHECKING, Any

import numpy as np

from ..concrete.plain import PlainSeismicGrid, evaluate_plain, plain_seismic_grid
from ..concrete.transverse import Construction, Materials, evaluate_transverse

if TYPE_CHECKING:  # pragma: no cover
    from ..stability import Statics

# ACI 318-19 Table 21.2.1: one-way shear phi; 21.2.4.3: a footing under walls that resist seismic
# forces in seismic design categories D to F takes no more than the walls' shear phi, 0.60 when the
# wall's nominal shear strength is below the shear of its flexural strength (21.2.4.1) - taken here.
PHI_SHEAR = 0.75
PHI_SHEAR_SEISMIC = 0.60
SEISMIC_CATEGORIES = frozenset({"D", "E", "F"})


@dataclass(frozen=True, slots=True, eq=False)
class StrengthGrid:
    """q_u (Pa) and the governing case index over the grid, and the design there."""

    q_u: np.ndarray
    case_index: np.ndarray
    design: Any  # TransverseGrid or PlainGrid
    plain: bool
    phi_shear: float
    seismic: PlainSeismicGrid | None = None


def phi_shear(state: Statics) -> float:
    """0.75, or 0.60 in seismic design categories D to F (ACI 318-19 21.2.4.3)."""
    sdc = state.table.criteria.seismic_design_category
    return PHI_SHEAR_SEISMIC if sdc in SEISMIC_CATEGORIES else PHI_SHEAR


def strength_grid(state: Statics) -> StrengthGrid:
    """The transverse design at every candidate, computed once per evaluation."""
    cached = state.memo.get("strength_grid")
    if isinstance(cached, StrengthGrid):
        return cached
    table = state.table
    concrete = table.concrete
    assert concrete is not None, "a strength table carries the concrete settings"
    wall = table.wall
    # net pressure: the rigid-footing peak less the uniform pressure of the factored self weight
    # f_D W_f / (B L_f), which the footing and the soil on it carry straight to the soil
    own = np.asarray(state.factored_weight, dtype=float) / (state.width * table.length)
    q = np.where(np.asarray(state.stable), np.asarray(state.q_max, dtype=float) - own, 0.0)
    q = np.where(np.isfinite(q), np.maximum(q, 0.0), 0.0)
    if q.shape[0]:
        index = np.argmax(q, axis=0)
        q_u = np.max(q, axis=0)
    else:
        index = np.zeros(state.grid_shape, dtype=int)
        q_u = np.zeros(state.grid_shape)
    construction = Construction(wall.construction.value)
    reinforcement = wall.footing.reinforcement
    plain = bool(reinforcement is not None and reinforcement.plain)
    phi = phi_shear(state)
    design: Any
    if plain:
        design = evaluate_plain(
            q_u,
            state.width,
            state.thickness,
            wall_thickness=wall.supported_thickness,
            construction=construction,
            fc=concrete.fc,
            lam=concrete.lam,
        )
    else:
        design = evaluate_transverse(
            q_u,
            state.width,
            state.thickness,
            wall_thickness=wall.supported_thickness,
            construction=construction,
            materials=Materials(fc=concrete.fc, fy=concrete.fy, lam=concrete.lam, cover=concrete.cover),
            phi_shear=phi,
            bars=reinforcement.transverse if reinforcement is not None else None,
        )
    seismic = None
    if plain:
        assert reinforcement is not None
        seismic = plain_seismic_grid(
            sdc=table.criteria.seismic_design_category,
            bottom=reinforcement.bottom,
            top=reinforcement.top,
            width=state.width,
            thickness=state.thickness,
        )
    grid = StrengthGrid(q_u=q_u, case_index=index, design=design, plain=plain, phi_shear=phi, seismic=seismic)
    state.memo["strength_grid"] = grid
    return grid


def case_words(state: Statics, index: int) -> tuple[str, str]:
    """The combination name and direction of strength case ``index``."""
    if not state.table.cases:
        return "", ""
    case = state.table.cases[index]
    return case.combination.name, case.direction.value

"""The one-way shear check of the footing across its width (ACI 318-19 22.5, or 14.5.5 plain).

Reinforced, without stirrups: φVc = φ · 8λ ρw^(1/3) √f'c b d at d from the moment section (Table
22.5.5.1 row (c) with λs neglected for footings, 13.2.6.2; 13.2.7.2), capped at φ 5λ√f'c b d; φ 0.75,
or 0.60 in seismic design categories D to F (21.2.4.3). Plain: φVn = 0.60 (4/3)λ√f'c b h (14.5.5.1).
Sizing thickens the footing until this passes: footings carry no stirrups (common practice).
"""

from __future__ import annotations

from dataclasses import dataclass
from typing import TYPE_CHECKING, Any

import numpy as np

from ..registry import Check, CheckArrays, Family, register_check
from ..registry import json_number as _num
from ._strength import case_words, strength_grid

if TYPE_CHECKING:  # pragma: no cover
    from ..stability import Statics


@dataclass(frozen=True, slots=True, kw_only=True)
class OneWayShearResult:
    """One-way shear across the width, per metre of footing (SI)."""

    plain: bool
    q_u: float
    combination: str
    direction: str
    shear: float
    shear_capacity: float
    phi: float
    ratio: float
    required: float
    passes: bool


@dataclass(frozen=True, eq=False, repr=False)
class OneWayShearCheck(Check):
    """φVc / Vu at d from the moment section (at h_s for plain), at the most loaded strength case."""

    def evaluate(self, state: Statics) -> CheckArrays:
        grid = strength_grid(state)
        ratio = np.broadcast_to(grid.design.ratios["shear"], state.grid_shape)
        return CheckArrays(ratio=ratio, parts={"q_u": grid.q_u})

    def record(self, state: Statics, arrays: CheckArrays, index: int, required: float) -> OneWayShearResult:
        from ..results import meets

        grid = strength_grid(state)
        ratio = float(arrays.ratio)
        combination, direction = case_words(state, int(grid.case_index))
        return OneWayShearResult(
            plain=grid.plain,
            q_u=float(grid.q_u),
            combination=combination,
            direction=direction,
            shear=float(grid.design.shear),
            shear_capacity=float(grid.design.shear_capacity),
            phi=0.60 if grid.plain else grid.phi_shear,
            ratio=ratio,
            required=required,
            passes=meets(ratio, required),
        )

    def record_json(self, record: Any) -> dict[str, Any]:
        return {
            "plain": record.plain,
            "q_u": _num(record.q_u),
            "combination": record.combination or None,
            "shear": _num(record.shear),
            "shear_capacity": _num(record.shear_capacity),
            "phi": record.phi,
        }


ONE_WAY_SHEAR = register_check(
    OneWayShearCheck(
        id="one_way_shear",
        title="One-way shear",
        symbol="VS",
        family=Family.STRENGTH,
        ratio_words="φVc / Vu at d from the moment section, without stirrups",
        basis="ACI 318-19 22.5.5.1(c), 13.2.6.2, 13.2.7.2, 21.2.4.3; plain 14.5.5.1",
        order=60,
    ),
    alias="ONE_WAY_SHEAR",
)

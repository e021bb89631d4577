"""The sliding check: friction, cohesion and passive resistance against the shear, per design case.

Formulas: :mod:`engine.sliding` (IBC 2021 Table 1806.2 and 1806.3).
"""

from __future__ import annotations

from dataclasses import dataclass
from typing import TYPE_CHECKING, Any

import numpy as np

from .. import sliding
from ..registry import Check, CheckArrays, Family, register_check
from ..registry import json_number as _num
from ._arrays import full

if TYPE_CHECKING:  # pragma: no cover
    from ..stability import Statics


@dataclass(frozen=True, slots=True, kw_only=True)
class SlidingResult:
    """Shear V and the resistance that opposes it (N), with its parts."""

    force: float
    resistance: float
    friction: float
    cohesion: float
    passive: float
    ratio: float
    required: float
    passes: bool


@dataclass(frozen=True, eq=False, repr=False)
class SlidingCheck(Check):
    """(friction + cohesion + passive) / V of each design case."""

    def evaluate(self, state: Statics) -> CheckArrays:
        table, soil = state.table, state.table.soil
        normal = state.sliding_normal
        friction = sliding.friction_resistance(soil.friction, normal)
        if soil.cohesion == 0.0:  # no cohesion: zero everywhere, without a grid-sized array of zeros
            cohesion = np.broadcast_to(0.0, np.broadcast_shapes(state.width.shape, state.contact_length.shape, normal.shape))
        else:
            cohesion = sliding.cohesion_resistance(soil.cohesion, state.width, state.contact_length, normal)
        passive = np.broadcast_to(
            sliding.passive_resistance(soil.passive, state.width, table.wall.footing.cover, state.thickness, soil.passive_ignore),
            state.shape,
        )
        shear = state.per_case(table.shear)
        resistance = friction + cohesion  # (friction + cohesion) + passive, summed in one array
        resistance += passive
        ratio = sliding.sliding_ratio(resistance, shear)
        return CheckArrays(
            ratio=full(ratio, state.shape),
            parts={"friction": friction, "cohesion": cohesion, "passive": passive, "force": np.broadcast_to(shear, state.shape)},
        )

    def record(self, state: Statics, arrays: CheckArrays, index: int, required: float) -> SlidingResult:
        from ..results import meets

        ratio = float(arrays.ratio[index])
        fr, co, pa = (float(arrays[name][index]) for name in ("friction", "cohesion", "passive"))
        return SlidingResult(
            force=float(arrays["force"][index]),
            resistance=fr + co + pa,
            friction=fr,
            cohesion=co,
            passive=pa,
            ratio=ratio,
            required=required,
            passes=meets(ratio, required),
        )

    def record_json(self, record: Any) -> dict[str, Any]:
        return {
            "force": _num(record.force),
            "resistance": _num(record.resistance),
            "friction": _num(record.friction),
            "cohesion": _num(record.cohesion),
            "passive": _num(record.passive),
        }


SLIDING = register_check(
    SlidingCheck(
        id="sliding",
        title="Sliding",
        symbol="SL",
        family=Family.SERVICE,
        ratio_words="(friction + cohesion + passive) / shear",
        basis="IBC 2021 Table 1806.2 and 1806.3",
        order=20,
    ),
    alias="SLIDING",
)

"""The overturning check: resisting against overturning moment about the toe, per design case.

Formulas: :mod:`engine.overturning` (statics of a rigid body tipping about the edge of its base;
Das, *Principles of Foundation Engineering*, retaining-wall stability). The footing's self weight
acts at L_f/2 from either toe.
"""

from __future__ import annotations

from dataclasses import dataclass
from typing import TYPE_CHECKING, Any

import numpy as np

from .. import overturning
from ..registry import Check, CheckArrays, Family, register_check
from ..registry import json_number as _num
from ._arrays import full

if TYPE_CHECKING:  # pragma: no cover
    from ..stability import Statics


@dataclass(frozen=True, slots=True, kw_only=True)
class OverturningResult:
    """Moments about the toe (N*m) and their ratio."""

    moment: float
    resisting: float
    ratio: float
    required: float
    passes: bool


@dataclass(frozen=True, eq=False, repr=False)
class OverturningCheck(Check):
    """Sum M_R / sum M_O about the toe of each design case."""

    def evaluate(self, state: Statics) -> CheckArrays:
        table, per_case = state.table, state.per_case
        half = 0.5 * table.length
        weight = state.factored_weight  # acts at L_f/2: resists when downward, overturns when net upward
        if (weight > 0.0).all():
            # the usual case, the footing's weight resists in every case: max(f_D W_f, 0) = f_D W_f and
            # max(-f_D W_f, 0) L_f/2 = +0 exactly, so the sums below are those of the general case
            resisting = np.multiply(weight, half)
            resisting += per_case(table.applied_resisting)
            moment = np.add(per_case(table.applied_overturning) + 0.0, state.overturning_lateral_moment)
        else:
            # sum M_R = applied resisting + max(f_D W_f, 0) L_f/2, each step in one array (the grid is large)
            resisting = np.maximum(weight, 0.0)
            resisting *= half
            resisting += per_case(table.applied_resisting)
            # sum M_O = applied overturning + max(-f_D W_f, 0) L_f/2 + the shears' moment about the base
            moment = np.negative(weight)
            np.maximum(moment, 0.0, out=moment)
            moment *= half
            moment += per_case(table.applied_overturning)
            moment += state.overturning_lateral_moment
        ratio = overturning.overturning_ratio(resisting, moment)
        return CheckArrays(ratio=full(ratio, state.shape), parts={"resisting": resisting, "moment": moment})

    def record(self, state: Statics, arrays: CheckArrays, index: int, required: float) -> OverturningResult:
        from ..results import meets

        ratio = float(arrays.ratio[index])
        return OverturningResult(
            moment=float(arrays["moment"][index]),
            resisting=float(arrays["resisting"][index]),
            ratio=ratio,
            required=required,
            passes=meets(ratio, required),
        )

    def record_json(self, record: Any) -> dict[str, Any]:
        return {"moment": _num(record.moment), "resisting": _num(record.resisting)}


OVERTURNING = register_check(
    OverturningCheck(
        id="overturning",
        title="Overturning",
        symbol="OT",
        family=Family.SERVICE,
        ratio_words="resisting / overturning moment about the toe",
        basis="statics about the toe; Das, Principles of Foundation Engineering (retaining-wall stability)",
        order=10,
    ),
    alias="OVERTURNING",
)

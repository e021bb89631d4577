"""The soil-bearing check: the allowable against the peak (or net peak) soil pressure, per case.

Formulas: :mod:`engine.soil_pressure` (rigid-footing pressure within and beyond the kern) and
:mod:`engine.bearing` (gross or net allowable, increase with W or E).
"""

from __future__ import annotations

from dataclasses import dataclass
from typing import TYPE_CHECKING, Any

import numpy as np

from .. import bearing
from ..registry import Check, CheckArrays, Family, register_check
from ..registry import json_number as _num
from ..soil_pressure import kern_eccentricity

if TYPE_CHECKING:  # pragma: no cover
    from ..stability import Statics


@dataclass(frozen=True, slots=True, kw_only=True)
class BearingResult:
    """Eccentricity (m), soil pressures (Pa), contact length (m) and their ratio to the allowable."""

    eccentricity: float
    q_max: float
    q_min: float
    contact_length: float
    pressure_compared: float
    allowable: float
    stable: bool
    ratio: float
    required: float
    passes: bool
    kern_eccentricity: float = 0.0  # L_f/6, the edge of the kern (soil_pressure.kern_eccentricity)


@dataclass(frozen=True, eq=False, repr=False)
class BearingCheck(Check):
    """q_allowable / q_max (or the net q_max) of each design case; 0 where there is no equilibrium."""

    def evaluate(self, state: Statics) -> CheckArrays:
        table, soil = state.table, state.table.soil
        compared = bearing.compared_pressure(
            state.q_max, soil.bearing_basis, soil.unit_weight, table.wall.footing.cover, state.thickness
        )
        allowable = bearing.allowable_pressure(
            soil.allowable_bearing, table.criteria.bearing_increase, state.per_case(table.wind_or_seismic)
        )
        ratio = bearing.bearing_ratio(allowable, compared, state.stable)
        # A case that puts no load at all on the soil (N = 0, M = 0: e.g. a combination of a case the
        # wall does not have, on a weightless footing) is no demand, not a loss of equilibrium.
        unloaded = (state.vertical == 0.0) & (state.moment == 0.0)
        if unloaded.any():
            ratio = np.where(unloaded, np.inf, ratio)
        return CheckArrays(
            ratio=np.broadcast_to(ratio, state.shape),
            parts={"pressure_compared": compared, "allowable": np.broadcast_to(allowable, state.shape)},
        )

    def record(self, state: Statics, arrays: CheckArrays, index: int, required: float) -> BearingResult:
        from ..results import meets

        ratio = float(arrays.ratio[index])
        return BearingResult(
            eccentricity=float(state.eccentricity[index]),
            q_max=float(state.q_max[index]),
            q_min=float(state.q_min[index]),
            contact_length=float(state.contact_length[index]),
            pressure_compared=float(arrays["pressure_compared"][index]),
            allowable=float(arrays["allowable"][index]),
            stable=bool(state.stable[index]),
            ratio=ratio,
            required=required,
            passes=meets(ratio, required),
            kern_eccentricity=kern_eccentricity(state.table.length),
        )

    def record_json(self, record: Any) -> dict[str, Any]:
        return {
            "eccentricity": _num(record.eccentricity),
            "q_max": _num(record.q_max),
            "q_min": _num(record.q_min),
            "contact_length": _num(record.contact_length),
            "pressure_compared": _num(record.pressure_compared),
            "allowable": _num(record.allowable),
            "stable": record.stable,
        }


BEARING = register_check(
    BearingCheck(
        id="bearing",
        title="Bearing",
        symbol="BR",
        family=Family.SERVICE,
        ratio_words="allowable / peak soil pressure",
        basis="Das, Principles of Foundation Engineering; Bowles, Foundation Analysis and Design, 4-8",
        order=30,
    ),
    alias="BEARING",
)

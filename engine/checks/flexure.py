"""The flexure check of the footing across its width (ACI 318-19 chapters 13 and 22, or 14 plain).

Reinforced: φMn / Mu at the moment section of Table 13.2.7.1, with As,min (7.6.1.1, 24.4.3.2), the
bar spacing (3h and 18 in), d at least 6 in (13.3.1.2), a tension-controlled section and the
development length of the bars (25.4.2.4) taken into the ratio: the least of those ratios. Plain:
φMn = 0.60 · 5λ√f'c Sm on h − 2 in (14.5.1.7, 14.5.2.1) and h at least 8 in (14.3.2.1); in seismic
design categories C to F the continuous longitudinal bars that IBC 2021 1905.6.2 asks of a plain
footing (As >= 0.002 Ag, taken into the ratio as As / 0.002 Ag). Bars given in
the project are checked; without them the lightest passing bars (#4–#8 at whole inches) are chosen.
"""

from __future__ import annotations

from dataclasses import dataclass
from typing import TYPE_CHECKING, Any

import numpy as np

from ..concrete.bars import bar, spaced_text
from ..concrete.plain import plain_seismic_words
from ..registry import Check, CheckArrays, Family, register_check
from ..registry import json_number as _num
from ._strength import case_words, strength_grid

if TYPE_CHECKING:  # pragma: no cover
    from ..stability import Statics

_REINFORCED = ("depth", "flexure", "minimum", "spacing", "strain", "development")
_PLAIN = ("thickness", "flexure")


@dataclass(frozen=True, slots=True, kw_only=True)
class FlexureResult:
    """The footing's flexure across its width, per metre of footing (SI)."""

    plain: bool
    q_u: float
    combination: str
    direction: str
    moment: float
    moment_capacity: float
    steel_required: float | None
    steel_provided: float | None
    bars: str
    development_length: float | None
    development_available: float | None
    ratio: float
    required: float
    passes: bool
    message: str = ""


@dataclass(frozen=True, eq=False, repr=False)
class FlexureCheck(Check):
    """The least of the flexure ratios of the transverse design, at the most loaded strength case."""

    def evaluate(self, state: Statics) -> CheckArrays:
        grid = strength_grid(state)
        names = _PLAIN if grid.plain else _REINFORCED
        parts = [np.broadcast_to(grid.design.ratios[n], state.grid_shape) for n in names]
        if grid.seismic is not None and grid.seismic.applies:  # IBC 2021 1905.6.2: plain needs bars along
            parts.append(np.broadcast_to(grid.seismic.ratio, state.grid_shape))
        ratio = np.minimum.reduce(parts)
        return CheckArrays(ratio=ratio, parts={"q_u": grid.q_u})

    def record(self, state: Statics, arrays: CheckArrays, index: int, required: float) -> FlexureResult:
        from ..results import meets

        grid = strength_grid(state)
        d = grid.design
        ratio = float(arrays.ratio)
        combination, direction = case_words(state, int(grid.case_index))
        message = ""
        if grid.plain:
            steel_required = steel_provided = development = available = None
            bars = "plain"
            if grid.seismic is not None:
                message = plain_seismic_words(grid.seismic)
        else:
            steel_required, steel_provided = float(d.steel_required), float(d.steel_provided)
            development, available = float(d.development_length), float(d.development_available)
            bars = _bars_text(d)
        return FlexureResult(
            plain=grid.plain,
            q_u=float(grid.q_u),
            combination=combination,
            direction=direction,
            moment=float(d.moment),
            moment_capacity=float(d.moment_capacity),
            steel_required=steel_required,
            steel_provided=steel_provided,
            bars=bars,
            development_length=development,
            development_available=available,
            ratio=ratio,
            required=required,
            passes=meets(ratio, required),
            message=message,
        )

    def record_json(self, record: Any) -> dict[str, Any]:
        return {
            "plain": record.plain,
            "q_u": _num(record.q_u),
            "combination": record.combination or None,
            "moment": _num(record.moment),
            "moment_capacity": _num(record.moment_capacity),
            "steel_required": _num(record.steel_required),
            "steel_provided": _num(record.steel_provided),
            "bars": record.bars,
            "development_length": _num(record.development_length),
            "development_available": _num(record.development_available),
            "message": record.message or None,
        }


def _bars_text(design: Any) -> str:
    """The transverse bars checked or chosen, as "#5 @ 12 in"."""
    size = int(design.size)
    if size <= 0 or not np.isfinite(float(design.spacing)):
        return "none pass"
    return spaced_text(bar(size), float(design.spacing))


FLEXURE = register_check(
    FlexureCheck(
        id="flexure",
        title="Flexure",
        symbol="FL",
        family=Family.STRENGTH,
        ratio_words="φMn / Mu across the width, with As,min, spacing, depth and development",
        basis="ACI 318-19 13.2.7.1, 7.6.1.1, 22.2, 25.4.2.4; plain 14.5.2.1",
        order=50,
    ),
    alias="FLEXURE",
)

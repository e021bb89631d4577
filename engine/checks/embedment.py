"""The embedment check: the depth of the footing's bottom below grade against the code minimum.

IBC 2021 1809.4: the bottom of a footing at least 12 in below the surface of undisturbed ground; IBC
2021 1809.5: below the frost line where the ground freezes (the frost depth the building official or
the geotechnical report gives). The depth below grade is the soil cover plus the footing thickness,
grade being the top of the soil over the footing. The ratio is depth / required depth, required 1.0.
It depends on no load combination, so it has one value per candidate size, not one per case.
"""

from __future__ import annotations

from dataclasses import dataclass
from typing import TYPE_CHECKING, Any

import numpy as np

from ..registry import Check, CheckArrays, Family, register_check

if TYPE_CHECKING:  # pragma: no cover
    from ..stability import Statics

# IBC 2021 1809.4: footings at least 12 in below undisturbed ground, and at least 12 in wide.
MIN_DEPTH = 12 * 0.0254
MIN_WIDTH = 12 * 0.0254


@dataclass(frozen=True, slots=True, kw_only=True)
class EmbedmentResult:
    """Depth of the footing's bottom below grade and the depth required (m)."""

    depth: float
    required_depth: float
    frost_depth: float | None
    ratio: float
    required: float
    passes: bool


def required_depth(frost_depth: float | None) -> float:
    """max(12 in, frost depth): IBC 2021 1809.4 and 1809.5 (m)."""
    return max(MIN_DEPTH, frost_depth or 0.0)


@dataclass(frozen=True, eq=False, repr=False)
class EmbedmentCheck(Check):
    """(soil cover + t_f) / max(12 in, frost depth) for every candidate."""

    def evaluate(self, state: Statics) -> CheckArrays:
        cover = state.table.wall.footing.cover
        need = required_depth(state.table.site.frost_depth)
        depth = np.broadcast_to(cover + state.thickness, state.grid_shape)
        ratio = depth / need
        return CheckArrays(ratio=ratio, parts={"depth": depth, "required_depth": np.full(state.grid_shape, need)})

    def record(self, state: Statics, arrays: CheckArrays, index: int, required: float) -> EmbedmentResult:
        from ..results import meets

        ratio = float(arrays.ratio)
        return EmbedmentResult(
            depth=float(arrays["depth"]),
            required_depth=float(arrays["required_depth"]),
            frost_depth=state.table.site.frost_depth,
            ratio=ratio,
            required=required,
            passes=meets(ratio, required),
        )

    def record_json(self, record: Any) -> dict[str, Any]:
        return {"depth": record.depth, "required_depth": record.required_depth, "frost_depth": record.frost_depth}


EMBEDMENT = register_check(
    EmbedmentCheck(
        id="embedment",
        title="Embedment",
        symbol="EM",
        family=Family.GEOMETRY,
        ratio_words="depth of the footing's bottom below grade / required depth",
        basis="IBC 2021 1809.4 (12 in minimum) and 1809.5 (frost depth)",
        order=40,
    ),
    alias="EMBEDMENT",
)

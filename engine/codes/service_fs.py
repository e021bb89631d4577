"""Service loads checked against factors of safety (common practice, no code clause).

The older practice of unfactored service loads with factors of safety of 2.0 on overturning, 1.5 on
sliding and 1.0 on bearing: common practice, fixed by no code clause (the retaining-wall stability
values in Das, *Principles of Foundation Engineering*, are of the same order, from memory); see
docs/verification.md, "Required ratios". The required values are editable in the project.
"""

from __future__ import annotations

from dataclasses import dataclass
from functools import lru_cache
from typing import TYPE_CHECKING

from ..registry import CodeBasis, Family, check_by_id, register_code
from ._combo import combo

if TYPE_CHECKING:  # pragma: no cover
    from ..model import DesignCriteria, LoadCombination

# Factors of safety (common practice; editable in the project).
OVERTURNING_FS = 2.0
SLIDING_FS = 1.5
BEARING_FS = 1.0


@lru_cache(maxsize=1)
def combinations() -> tuple[LoadCombination, ...]:
    """Unfactored service combinations (common practice).

    D + W and D + E apply to every check; the gravity and companion combinations to bearing only.
    """
    bearing = frozenset({check_by_id("bearing")})
    return (
        combo("D + W", D=1.0, W=1.0),
        combo("D + E", D=1.0, E=1.0),
        combo("D", bearing, D=1.0),
        combo("D + L", bearing, D=1.0, L=1.0),
        combo("D + L + Lr", bearing, D=1.0, L=1.0, Lr=1.0),
        combo("D + L + S", bearing, D=1.0, L=1.0, S=1.0),
        combo("D + L + R", bearing, D=1.0, L=1.0, R=1.0),
        combo("D + L + W", bearing, D=1.0, L=1.0, W=1.0),
        combo("D + L + E", bearing, D=1.0, L=1.0, E=1.0),
    )


@dataclass(frozen=True, eq=False, repr=False)
class ServiceFs(CodeBasis):
    def combinations(self, criteria: DesignCriteria) -> tuple[LoadCombination, ...]:
        return combinations()


SERVICE_FS = register_code(
    ServiceFs(
        id="service-fs",
        title="Service loads with factors of safety",
        family=Family.SERVICE,
        required={"overturning": OVERTURNING_FS, "sliding": SLIDING_FS, "bearing": BEARING_FS},
        required_basis="factors of safety common in practice with service loads",
        options=frozenset({"bearing_increase"}),
        uses_sds=False,
        bearing_increase=1.0,
        bearing_increase_basis="no increase of the allowable for W or E",
        wording=(
            "Unfactored service load combinations checked against factors of safety set by the engineer "
            "(common practice: 2.0 on overturning, 1.5 on sliding, 1.0 on bearing)."
        ),
        order=90,
    ),
    alias="SERVICE_FS",
)

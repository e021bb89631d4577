"""IBC 2021 section 1605.2: the alternative allowable stress design load combinations.

International Building Code 2021, 1605.2 (numbered 1605.3.2 before 2021; renumbering read in the
California Building Standards Commission's notes on the 2022 CBC, chapter 16):

* D + L + (Lr or S or R); D + L + 0.6 omega W; D + L + 0.6 omega W + S/2; D + L + S + 0.6 omega W/2;
  D + L + S + E/1.4; 0.9D + E/1.4 (the equations from memory, status M; their arithmetic is tested);
* where dead load counteracts wind, only two-thirds of the minimum dead load is used: 2/3 D +
  0.6 omega W (read in the IBC 2018 text, status R);
* omega = 1.3 for wind loads of ASCE 7 chapters 26 to 31 where the stress increase is taken, else
  1.0 (R, IBC 2018 text);
* Ev may be taken as zero when proportioning foundations (R, IBC 2018 text), which Kernline does
  throughout this method;
* the ASCE 7 12.13.4 reduction of foundation overturning shall not be used with these combinations
  (R, IBC 2018 text), so Kernline refuses it.

IBC 2021 1806.1 lets the allowable vertical and lateral bearing pressures of Table 1806.2 be increased
by one-third with these combinations where they include wind or earthquake (read in a state
adoption of the IBC 2021 text, status R): the default increase of this method is 4/3.
"""

from __future__ import annotations

from dataclasses import dataclass
from functools import lru_cache
from typing import TYPE_CHECKING

from ..registry import CodeBasis, Family, register_code
from ._combo import combo, num

if TYPE_CHECKING:  # pragma: no cover
    from ..model import DesignCriteria, LoadCombination

# IBC 2021 1605.2: wind at 0.6 omega W.
ASD_WIND = 0.6
# IBC 2021 1605.2: two-thirds of the dead load where it counteracts wind.
COUNTERACTING_DEAD_WIND = 2.0 / 3.0
# IBC 2021 1605.2: E/1.4, and 0.9D where dead load counteracts E.
SEISMIC_DIVISOR = 1.4
COUNTERACTING_DEAD_SEISMIC = 0.9
# IBC 2021 1605.2: S/2 with full wind, 0.6 omega W / 2 with full snow.
HALF = 0.5
# IBC 2021 1806.1: one-third increase of the allowable with W or E.
BEARING_INCREASE = 4.0 / 3.0


@lru_cache(maxsize=8)
def combinations(omega: float) -> tuple[LoadCombination, ...]:
    """IBC 2021 1605.2 combinations with omega on 0.6W; Ev = 0 (foundations), E = Eh."""
    w = ASD_WIND * omega
    e = 1.0 / SEISMIC_DIVISOR
    wtext = f"{num(w)}W"
    return (
        combo("D + L + Lr", D=1.0, L=1.0, Lr=1.0),
        combo("D + L + S", D=1.0, L=1.0, S=1.0),
        combo("D + L + R", D=1.0, L=1.0, R=1.0),
        combo(f"D + L + {wtext}", D=1.0, L=1.0, W=w),
        combo(f"D + L + {wtext} + 0.5S", D=1.0, L=1.0, W=w, S=HALF),
        combo(f"D + L + S + {num(w * HALF)}W", D=1.0, L=1.0, S=1.0, W=w * HALF),
        combo("D + L + S + E/1.4", D=1.0, L=1.0, S=1.0, E=e),
        combo("0.9D + E/1.4", D=COUNTERACTING_DEAD_SEISMIC, E=e),
        combo(f"2/3D + {wtext}", D=COUNTERACTING_DEAD_WIND, W=w),
    )


@dataclass(frozen=True, eq=False, repr=False)
class Ibc2021AltAsd(CodeBasis):
    def combinations(self, criteria: DesignCriteria) -> tuple[LoadCombination, ...]:
        return combinations(round(criteria.wind_omega, 12))


IBC2021_ALT_ASD = register_code(
    Ibc2021AltAsd(
        id="ibc2021-alt-asd",
        title="IBC 2021 1605.2, alternative allowable stress design combinations",
        family=Family.SERVICE,
        required={},
        required_basis="a ratio of 1.0 with the alternative ASD combinations (IBC 2021 1605.1.1, 1605.2)",
        options=frozenset({"wind_omega", "bearing_increase"}),
        uses_sds=False,
        bearing_increase=BEARING_INCREASE,
        bearing_increase_basis="one-third increase with W or E (IBC 2021 1806.1)",
        wording=(
            "Alternative allowable stress design load combinations of IBC 2021 section 1605.2, with omega "
            "on 0.6W, two-thirds of the dead load where it counteracts wind, Ev = 0 when proportioning "
            "foundations, and no reduction of foundation overturning (ASCE 7 12.13.4). The allowable "
            "bearing pressure is increased by one-third in combinations with W or E (IBC 2021 1806.1). "
            "Every check is required to reach a ratio of 1.0."
        ),
        order=30,
    ),
    alias="IBC2021_ALT_ASD",
)

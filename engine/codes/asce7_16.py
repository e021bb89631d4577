"""ASCE/SEI 7-16 allowable stress design: section 2.4.1 with the seismic forms of 2.4.5.

ASCE/SEI 7-16, *Minimum Design Loads and Associated Criteria for Buildings and Other Structures*:
section 2.4.1 (basic combinations for allowable stress design) with the seismic load effect of
section 12.4.2 in the forms of section 2.4.5, where the vertical seismic effect is Ev = 0.2 S_DS D
(12.4.2.2, Eq. 12.4-4a) and the ASD factor on E is 0.7. The required ratio of every check is 1.0: the
factors of the combinations carry the margin (IBC 2021 1605.1.1 with ASCE 7 2.4).
"""

from __future__ import annotations

from dataclasses import dataclass
from functools import lru_cache
from typing import TYPE_CHECKING

from ..registry import CodeBasis, Family, register_code
from ._combo import combo, num

if TYPE_CHECKING:  # pragma: no cover
    from ..model import DesignCriteria, LoadCombination

# ASCE 7-16 2.4.1: companion factor on live and roof loads in combinations 4 and 6.
COMPANION = 0.75
# ASCE 7-16 2.4.1 combinations 5 and 7: wind at 0.6W (strength-level wind to ASD).
ASD_WIND = 0.6
# ASCE 7-16 2.4.1 combination 7 (and 2.4.5 combination 10): dead load counteracting W or E.
COUNTERACTING_DEAD = 0.6
# ASCE 7-16 2.4.5 combinations 8 and 10: 0.7 on the seismic load effect E.
ASD_SEISMIC = 0.7
# ASCE 7-16 12.4.2.2, Eq. 12.4-4a: Ev = 0.2 S_DS D.
EV_COEFFICIENT = 0.2
# The largest S_DS for which the counteracting dead-load factor 0.6 - 0.14 S_DS stays >= 0.
MAX_SDS = COUNTERACTING_DEAD / (ASD_SEISMIC * EV_COEFFICIENT)


@lru_cache(maxsize=32)
def combinations(sds: float, ev_at_soil: bool = True) -> tuple[LoadCombination, ...]:
    """ASCE 7-16 section 2.4.1 basic ASD combinations, with E per 2.4.5 and Ev per 12.4.2.2.

    The vertical seismic effect adds to dead load where it adds (1.0 + 0.7*0.2 S_DS = 1.0 + 0.14 S_DS;
    with the 0.75 companion factor 1.0 + 0.105 S_DS) and subtracts where dead load counteracts E
    (0.6 - 0.14 S_DS). Wind in combination 6 is 0.75 * 0.6 W = 0.45 W.

    Args:
        sds: S_DS, the design spectral acceleration at short periods (ASCE 7-16 11.4.5).
        ev_at_soil: False takes Ev = 0 in the counteracting combination 0.6D + 0.7E, as ASCE 7-16
            12.4.2.2 exception 2 permits for Eq. 12.4-2 at the soil-structure interface of foundations.
    """
    ev = ASD_SEISMIC * EV_COEFFICIENT * sds  # 0.14 S_DS
    ev_companion = COMPANION * ev  # 0.105 S_DS
    wind_companion = COMPANION * ASD_WIND  # 0.45
    seismic_companion = COMPANION * ASD_SEISMIC  # 0.525
    d_up = 1.0 + ev
    d_up_companion = 1.0 + ev_companion
    d_down = COUNTERACTING_DEAD - (ev if ev_at_soil else 0.0)
    return (
        combo("D", D=1.0),
        combo("D + L", D=1.0, L=1.0),
        combo("D + Lr", D=1.0, Lr=1.0),
        combo("D + S", D=1.0, S=1.0),
        combo("D + R", D=1.0, R=1.0),
        combo("D + 0.75L + 0.75Lr", D=1.0, L=COMPANION, Lr=COMPANION),
        combo("D + 0.75L + 0.75S", D=1.0, L=COMPANION, S=COMPANION),
        combo("D + 0.75L + 0.75R", D=1.0, L=COMPANION, R=COMPANION),
        combo("D + 0.6W", D=1.0, W=ASD_WIND),
        combo(f"{num(d_up)}D + 0.7E", D=d_up, E=ASD_SEISMIC),
        combo("D + 0.75L + 0.45W + 0.75Lr", D=1.0, L=COMPANION, W=wind_companion, Lr=COMPANION),
        combo("D + 0.75L + 0.45W + 0.75S", D=1.0, L=COMPANION, W=wind_companion, S=COMPANION),
        combo("D + 0.75L + 0.45W + 0.75R", D=1.0, L=COMPANION, W=wind_companion, R=COMPANION),
        combo(
            f"{num(d_up_companion)}D + 0.75L + 0.525E + 0.75S", D=d_up_companion, L=COMPANION, E=seismic_companion, S=COMPANION
        ),
        combo("0.6D + 0.6W", D=COUNTERACTING_DEAD, W=ASD_WIND),
        combo(f"{num(d_down)}D + 0.7E", D=d_down, E=ASD_SEISMIC),
    )


@dataclass(frozen=True, eq=False, repr=False)
class Asce716Asd(CodeBasis):
    def combinations(self, criteria: DesignCriteria) -> tuple[LoadCombination, ...]:
        return combinations(round(criteria.sds, 12), criteria.ev_at_soil)


ASCE7_16_ASD = register_code(
    Asce716Asd(
        id="asce7-16-asd",
        title="ASCE 7-16, allowable stress design (2.4.1, with E per 2.4.5 and Ev per 12.4.2.2)",
        family=Family.SERVICE,
        required={},
        required_basis="a ratio of 1.0 with the ASD combinations (IBC 2021 1605.1.1, ASCE 7-16 2.4)",
        options=frozenset({"sds", "ev_at_soil", "seismic_overturning_reduction", "bearing_increase"}),
        uses_sds=True,
        bearing_increase=1.0,
        bearing_increase_basis="no increase of the allowable for W or E",
        wording=(
            "Load combinations of ASCE 7-16 section 2.4.1 for allowable stress design, with the seismic "
            "load effect in the forms of section 2.4.5 and the vertical seismic effect Ev = 0.2 S_DS D of "
            "section 12.4.2.2. Every check is required to reach a ratio of 1.0: the load factors carry the "
            "margin (IBC 2021 1605.1.1)."
        ),
        order=10,
    ),
    alias="ASCE7_16_ASD",
)

"""ASCE/SEI 7-22 allowable stress design: section 2.4.1 with the seismic forms of 2.4.5.

ASCE 7-22 makes ground snow loads strength-level, so the ASD combinations carry 0.7S: combinations 3,
4 and 6 read D + (Lr or 0.7S or R), D + 0.75L + 0.75(Lr or 0.7S or R) and D + 0.75L + 0.75(0.6W) +
0.75(Lr or 0.7S or R) (read in STRUCTURE magazine, "ASCE 7-22 Flat Roof Snow Load versus Minimum
Snow Load"; status R2, see docs/verification.md). The other combinations are those of ASCE 7-16,
with Ev = 0.2 S_DS D (12.4.2.2, the same in both editions from memory).

The snow term of the seismic combination 9 (D + 0.525Ev + 0.525Eh + 0.75L + ?S) could not be
confirmed against the published text, so Kernline does not guess it: a project whose walls carry E
and S loads under this method must enter the factor as printed in the edition in force
(``criteria.seismic_snow_factor``), and the package prints it as entered by the engineer.
"""

from __future__ import annotations

from dataclasses import dataclass
from functools import lru_cache
from typing import TYPE_CHECKING

from ..registry import CodeBasis, Family, register_code
from ._combo import combo, num
from .asce7_16 import ASD_SEISMIC, ASD_WIND, COMPANION, COUNTERACTING_DEAD, EV_COEFFICIENT

if TYPE_CHECKING:  # pragma: no cover
    from ..model import DesignCriteria, LoadCombination

# ASCE 7-22 2.4.1 combinations 3, 4 and 6: strength-level snow to ASD.
ASD_SNOW = 0.7


@lru_cache(maxsize=32)
def combinations(sds: float, ev_at_soil: bool = True, seismic_snow: float | None = None) -> tuple[LoadCombination, ...]:
    """ASCE 7-22 section 2.4.1 basic ASD combinations, with E per 2.4.5 and Ev per 12.4.2.2.

    Args:
        sds: S_DS (ASCE 7-22 11.4.5).
        ev_at_soil: False takes Ev = 0 in the counteracting combination 0.6D + 0.7E (12.4.2.2
            exception at the soil-structure interface).
        seismic_snow: the factor on S in combination 9, as the engineer reads it in the standard;
            None leaves S out of combination 9 (used only where no wall carries both E and S).
    """
    ev = ASD_SEISMIC * EV_COEFFICIENT * sds  # 0.14 S_DS
    snow = ASD_SNOW  # 0.7
    snow_companion = COMPANION * ASD_SNOW  # 0.525
    wind_companion = COMPANION * ASD_WIND  # 0.45
    seismic_companion = COMPANION * ASD_SEISMIC  # 0.525
    d_up = 1.0 + ev
    d_up_companion = 1.0 + COMPANION * ev
    d_down = COUNTERACTING_DEAD - (ev if ev_at_soil else 0.0)
    nine = {"D": d_up_companion, "L": COMPANION, "E": seismic_companion}
    name9 = f"{num(d_up_companion)}D + 0.75L + 0.525E"
    if seismic_snow:
        nine["S"] = seismic_snow
        name9 += f" + {num(seismic_snow)}S"
    return (
        combo("D", D=1.0),
        combo("D + L", D=1.0, L=1.0),
        combo("D + Lr", D=1.0, Lr=1.0),
        combo("D + 0.7S", D=1.0, S=snow),
        combo("D + R", D=1.0, R=1.0),
        combo("D + 0.75L + 0.75Lr", D=1.0, L=COMPANION, Lr=COMPANION),
        combo("D + 0.75L + 0.525S", D=1.0, L=COMPANION, S=snow_companion),
        combo("D + 0.75L + 0.75R", D=1.0, L=COMPANION, R=COMPANION),
        combo("D + 0.6W", D=1.0, W=ASD_WIND),
        combo(f"{num(d_up)}D + 0.7E", D=d_up, E=ASD_SEISMIC),
        combo("D + 0.75L + 0.45W + 0.75Lr", D=1.0, L=COMPANION, W=wind_companion, Lr=COMPANION),
        combo("D + 0.75L + 0.45W + 0.525S", D=1.0, L=COMPANION, W=wind_companion, S=snow_companion),
        combo("D + 0.75L + 0.45W + 0.75R", D=1.0, L=COMPANION, W=wind_companion, R=COMPANION),
        combo(name9, None, **nine),
        combo("0.6D + 0.6W", D=COUNTERACTING_DEAD, W=ASD_WIND),
        combo(f"{num(d_down)}D + 0.7E", D=d_down, E=ASD_SEISMIC),
    )


@dataclass(frozen=True, eq=False, repr=False)
class Asce722Asd(CodeBasis):
    def combinations(self, criteria: DesignCriteria) -> tuple[LoadCombination, ...]:
        return combinations(round(criteria.sds, 12), criteria.ev_at_soil, criteria.seismic_snow_factor)


ASCE7_22_ASD = register_code(
    Asce722Asd(
        id="asce7-22-asd",
        title="ASCE 7-22, allowable stress design (2.4.1 with 0.7S, E per 2.4.5, Ev per 12.4.2.2)",
        family=Family.SERVICE,
        required={},
        required_basis="a ratio of 1.0 with the ASD combinations (IBC 2021 1605.1.1, ASCE 7-22 2.4)",
        options=frozenset({"sds", "ev_at_soil", "seismic_overturning_reduction", "bearing_increase", "seismic_snow_factor"}),
        uses_sds=True,
        bearing_increase=1.0,
        bearing_increase_basis="no increase of the allowable for W or E",
        wording=(
            "Load combinations of ASCE 7-22 section 2.4.1 for allowable stress design, in which the "
            "strength-level snow load enters as 0.7S, with the seismic load effect in the forms of section "
            "2.4.5 and Ev = 0.2 S_DS D. Every check is required to reach a ratio of 1.0."
        ),
        order=20,
    ),
    alias="ASCE7_22_ASD",
)

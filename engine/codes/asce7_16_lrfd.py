"""ASCE/SEI 7-16 strength design (LRFD): the combinations of sections 2.3.1 and 2.3.6.

ASCE/SEI 7-16, *Minimum Design Loads and Associated Criteria for Buildings and Other Structures*:
section 2.3.1 (basic combinations for strength design) and section 2.3.6 (basic combinations with
seismic load effects), where the vertical seismic effect is Ev = 0.2 S_DS D (12.4.2.2, Eq. 12.4-4a):

1. 1.4D
2. 1.2D + 1.6L + 0.5(Lr or S or R)
3. 1.2D + 1.6(Lr or S or R) + (L or 0.5W)
4. 1.2D + 1.0W + L + 0.5(Lr or S or R)
5. 0.9D + 1.0W
6. 1.2D + Ev + Eh + L + 0.2S, that is (1.2 + 0.2 S_DS)D + E + L + 0.2S
7. 0.9D - Ev + Eh, that is (0.9 - 0.2 S_DS)D + E

W and E are the nominal loads of ASCE 7-16 (strength level), hence the factors 1.0W and 1.0E.
Combination 3 is expanded into its two branches (with L and with 0.5W) for each of Lr, S and R, and
combinations 2 and 4 into their Lr, S and R branches: 16 combinations in all.

Status of the text (see docs/verification.md): the combination list is R for rows 1 to 5 (read in
the ASCE 7-10 text, unchanged in 7-16) and R2 for the seismic rows 6 and 7 (7-16 forms corroborated
in secondary sources); Eq. 12.4-4a is M (from memory). The exception of 2.3.1 that permits 0.5L in
combinations 3, 4 and 6 (not for garages, places of public assembly or L > 100 psf) is M and is not
applied: Kernline uses 1.0L there, which is conservative for load effects that L increases. Nor is
exception 2 of 12.4.2.2 (Ev = 0 at the soil-structure interface) offered: these combinations serve
the design of the footing as a concrete member, so Ev stays in combination 7.

These combinations apply only to checks of the STRENGTH family (the footing's own concrete design,
:mod:`engine.concrete`); the stability checks keep the SERVICE basis the project names.
"""

from __future__ import annotations

from dataclasses import dataclass
from functools import lru_cache
from typing import TYPE_CHECKING

from ..errors import EngineError
from ..registry import Check, CodeBasis, Family, checks, register_code
from ._combo import combo, num

if TYPE_CHECKING:  # pragma: no cover
    from ..model import DesignCriteria, LoadCombination

# ASCE 7-16 2.3.1 combination 1: dead load alone.
DEAD_ALONE = 1.4
# ASCE 7-16 2.3.1 combinations 2, 3 and 4: dead load with gravity, wind or both.
DEAD = 1.2
# ASCE 7-16 2.3.1 combination 2 (on L) and combination 3 (on Lr, S or R): the principal gravity load.
PRINCIPAL = 1.6
# ASCE 7-16 2.3.1 combinations 2 and 4: the companion roof load 0.5(Lr or S or R).
ROOF_COMPANION = 0.5
# ASCE 7-16 2.3.1 combination 3: 0.5W as the companion of the principal roof load.
WIND_COMPANION = 0.5
# ASCE 7-16 2.3.1 combinations 3, 4 and 6: live load 1.0L (the 0.5L exception is not applied).
LIVE_COMPANION = 1.0
# ASCE 7-16 2.3.1 combinations 4 and 5: the nominal (strength-level) wind load.
WIND = 1.0
# ASCE 7-16 2.3.1 combination 5 and 2.3.6 combination 7: dead load counteracting W or E.
COUNTERACTING_DEAD = 0.9
# ASCE 7-16 2.3.6 combinations 6 and 7: the nominal (strength-level) seismic load effect Eh.
SEISMIC = 1.0
# ASCE 7-16 2.3.6 combination 6: 0.2S with the seismic load effect.
SEISMIC_SNOW = 0.2
# ASCE 7-16 12.4.2.2, Eq. 12.4-4a: Ev = 0.2 S_DS D.
EV_COEFFICIENT = 0.2
# The largest S_DS for which the counteracting dead-load factor 0.9 - 0.2 S_DS stays >= 0.
MAX_SDS = COUNTERACTING_DEAD / EV_COEFFICIENT

_ROOF = ("Lr", "S", "R")


@lru_cache(maxsize=32)
def combinations(sds: float, applies_to: frozenset[Check]) -> tuple[LoadCombination, ...]:
    """ASCE 7-16 sections 2.3.1 and 2.3.6 strength combinations, with Ev = 0.2 S_DS D (12.4.2.2).

    The seismic combinations carry the vertical effect on the dead load: (1.2 + 0.2 S_DS)D where it
    adds and (0.9 - 0.2 S_DS)D where dead load counteracts E.

    Args:
        sds: S_DS, the design spectral acceleration at short periods (ASCE 7-16 11.4.5), >= 0.
        applies_to: the checks the combinations apply to (the registered STRENGTH checks; see
            :meth:`Asce716Lrfd.combinations`).

    Returns:
        The 16 combinations, in the order of the list in this module's docstring.
    """
    d_up = DEAD + EV_COEFFICIENT * sds  # 1.2 + 0.2 S_DS
    d_down = COUNTERACTING_DEAD - EV_COEFFICIENT * sds  # 0.9 - 0.2 S_DS
    rows = [combo("1.4D", applies_to, D=DEAD_ALONE)]
    # 2.3.1 combination 2: 1.2D + 1.6L + 0.5(Lr or S or R)
    rows += [combo(f"1.2D + 1.6L + 0.5{r}", applies_to, D=DEAD, L=PRINCIPAL, **{r: ROOF_COMPANION}) for r in _ROOF]
    # 2.3.1 combination 3: 1.2D + 1.6(Lr or S or R) + (L or 0.5W)
    for r in _ROOF:
        rows.append(combo(f"1.2D + 1.6{r} + L", applies_to, D=DEAD, L=LIVE_COMPANION, **{r: PRINCIPAL}))
        rows.append(combo(f"1.2D + 1.6{r} + 0.5W", applies_to, D=DEAD, W=WIND_COMPANION, **{r: PRINCIPAL}))
    # 2.3.1 combination 4: 1.2D + 1.0W + L + 0.5(Lr or S or R)
    rows += [
        combo(f"1.2D + 1.0W + L + 0.5{r}", applies_to, D=DEAD, W=WIND, L=LIVE_COMPANION, **{r: ROOF_COMPANION}) for r in _ROOF
    ]
    # 2.3.1 combination 5: 0.9D + 1.0W
    rows.append(combo("0.9D + 1.0W", applies_to, D=COUNTERACTING_DEAD, W=WIND))
    # 2.3.6 combination 6: 1.2D + Ev + Eh + L + 0.2S
    rows.append(combo(f"{num(d_up)}D + 1.0E + L + 0.2S", applies_to, D=d_up, E=SEISMIC, L=LIVE_COMPANION, S=SEISMIC_SNOW))
    # 2.3.6 combination 7: 0.9D - Ev + Eh
    rows.append(combo(f"{num(d_down)}D + 1.0E", applies_to, D=d_down, E=SEISMIC))
    return tuple(rows)


@dataclass(frozen=True, eq=False, repr=False)
class Asce716Lrfd(CodeBasis):
    """The strength basis: its combinations apply to the registered checks of the STRENGTH family."""

    def combinations(self, criteria: DesignCriteria) -> tuple[LoadCombination, ...]:
        """The 16 combinations for ``criteria.sds``, applying to every registered STRENGTH check.

        Raises:
            EngineError: when no STRENGTH check is registered (a combination must name a check).
        """
        strength = frozenset(checks(Family.STRENGTH))
        if not strength:
            raise EngineError("the strength combinations need a registered strength check (engine.checks); none is registered")
        return combinations(round(criteria.sds, 12), strength)


ASCE7_16_LRFD = register_code(
    Asce716Lrfd(
        id="asce7-16-lrfd",
        title="ASCE 7-16, strength design (2.3.1, with E per 2.3.6 and Ev per 12.4.2.2)",
        family=Family.STRENGTH,
        required={},
        required_basis="design strength at least the required strength (ACI 318-19 4.6.1): a ratio of 1.0",
        options=frozenset({"sds"}),
        uses_sds=True,
        bearing_increase=1.0,
        bearing_increase_basis="not used: the strength combinations size no soil bearing",
        wording=(
            "Load combinations of ASCE 7-16 section 2.3.1 for strength design, with the seismic load "
            "effect in the forms of section 2.3.6 and the vertical seismic effect Ev = 0.2 S_DS D of "
            "section 12.4.2.2. W and E are strength-level loads (factor 1.0). The factor on L in the "
            "combinations with W or E and with the principal roof load is 1.0 (the 0.5L exception is "
            "not used). They serve the design of the footing as a concrete member (ACI 318-19)."
        ),
        order=60,
    ),
    alias="ASCE7_16_LRFD",
)

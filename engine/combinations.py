"""Load combinations: the presets of each design method and the cases they expand into.

ASCE/SEI 7-16, *Minimum Design Loads and Associated Criteria for Buildings and Other Structures*:
section 2.4.1 (basic combinations for allowable stress design) with the seismic load effect of
section 12.4.2 in the forms of section 2.4.5 / 12.4.2.3, where the vertical seismic effect is
Ev = 0.2 S_DS D (Eq. 12.4-4a) and the ASD seismic factor on E is 0.7.

The "service-fs" method is the older practice of unfactored service loads checked against factors of
safety (overturning 2.0, sliding 1.5, bearing 1.0): common practice, fixed by no code clause (the
retaining-wall stability values in Das, *Principles of Foundation Engineering*, are of the same order,
from memory); see docs/verification.md, "Required ratios". The required values are editable.
"""

from __future__ import annotations

from dataclasses import dataclass
from functools import lru_cache

from .model import (
    ALL_CHECKS,
    Check,
    DesignCriteria,
    Direction,
    LoadCase,
    LoadCombination,
    Method,
    RequiredRatios,
)

D, L, LR, S, R, W, E = LoadCase.D, LoadCase.L, LoadCase.LR, LoadCase.S, LoadCase.R, LoadCase.W, LoadCase.E

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

# Required ratios of the service-fs method (common practice; editable in the project).
SERVICE_FS_REQUIRED = RequiredRatios(overturning=2.0, sliding=1.5, bearing=1.0)
ASD_REQUIRED = RequiredRatios(overturning=1.0, sliding=1.0, bearing=1.0)


def _combo(name: str, checks: frozenset[Check] = frozenset(ALL_CHECKS), **factors: float) -> LoadCombination:
    cases = {"D": D, "L": L, "Lr": LR, "S": S, "R": R, "W": W, "E": E}
    return LoadCombination(name=name, factors=tuple((cases[k], v) for k, v in factors.items()), checks=checks)


def _num(value: float) -> str:
    return f"{value:.4f}".rstrip("0").rstrip(".")


@lru_cache(maxsize=32)
def asce7_16_asd(sds: float) -> tuple[LoadCombination, ...]:
    """ASCE 7-16 section 2.4.1 basic ASD combinations, with E per 2.4.5 / 12.4.2.3.

    The vertical seismic effect adds to dead load where it adds (1.0 + 0.7*0.2 S_DS = 1.0 + 0.14 S_DS;
    with the 0.75 companion factor 1.0 + 0.105 S_DS) and subtracts where dead load counteracts E
    (0.6 - 0.14 S_DS). Wind in combination 6 is 0.75 * 0.6 W = 0.45 W.

    Args:
        sds: S_DS, the design spectral acceleration at short periods (ASCE 7-16 11.4.5).
    """
    ev = ASD_SEISMIC * EV_COEFFICIENT * sds  # 0.14 S_DS
    ev_companion = COMPANION * ev  # 0.105 S_DS
    wind_companion = COMPANION * ASD_WIND  # 0.45
    seismic_companion = COMPANION * ASD_SEISMIC  # 0.525
    d_up = 1.0 + ev
    d_up_companion = 1.0 + ev_companion
    d_down = COUNTERACTING_DEAD - ev
    return (
        _combo("D", D=1.0),
        _combo("D + L", D=1.0, L=1.0),
        _combo("D + Lr", D=1.0, Lr=1.0),
        _combo("D + S", D=1.0, S=1.0),
        _combo("D + R", D=1.0, R=1.0),
        _combo("D + 0.75L + 0.75Lr", D=1.0, L=COMPANION, Lr=COMPANION),
        _combo("D + 0.75L + 0.75S", D=1.0, L=COMPANION, S=COMPANION),
        _combo("D + 0.75L + 0.75R", D=1.0, L=COMPANION, R=COMPANION),
        _combo("D + 0.6W", D=1.0, W=ASD_WIND),
        _combo(f"{_num(d_up)}D + 0.7E", D=d_up, E=ASD_SEISMIC),
        _combo("D + 0.75L + 0.45W + 0.75Lr", D=1.0, L=COMPANION, W=wind_companion, Lr=COMPANION),
        _combo("D + 0.75L + 0.45W + 0.75S", D=1.0, L=COMPANION, W=wind_companion, S=COMPANION),
        _combo("D + 0.75L + 0.45W + 0.75R", D=1.0, L=COMPANION, W=wind_companion, R=COMPANION),
        _combo(
            f"{_num(d_up_companion)}D + 0.75L + 0.525E + 0.75S", D=d_up_companion, L=COMPANION, E=seismic_companion, S=COMPANION
        ),
        _combo("0.6D + 0.6W", D=COUNTERACTING_DEAD, W=ASD_WIND),
        _combo(f"{_num(d_down)}D + 0.7E", D=d_down, E=ASD_SEISMIC),
    )


@lru_cache(maxsize=1)
def service_fs() -> tuple[LoadCombination, ...]:
    """Unfactored service combinations checked against factors of safety (common practice).

    D + W and D + E apply to all three checks; the gravity and companion combinations to bearing only.
    """
    bearing = frozenset({Check.BEARING})
    return (
        _combo("D + W", D=1.0, W=1.0),
        _combo("D + E", D=1.0, E=1.0),
        _combo("D", bearing, D=1.0),
        _combo("D + L", bearing, D=1.0, L=1.0),
        _combo("D + L + Lr", bearing, D=1.0, L=1.0, Lr=1.0),
        _combo("D + L + S", bearing, D=1.0, L=1.0, S=1.0),
        _combo("D + L + R", bearing, D=1.0, L=1.0, R=1.0),
        _combo("D + L + W", bearing, D=1.0, L=1.0, W=1.0),
        _combo("D + L + E", bearing, D=1.0, L=1.0, E=1.0),
    )


def preset(method: Method, sds: float) -> tuple[LoadCombination, ...]:
    """The preset combinations of ``method``."""
    if method is Method.SERVICE_FS:
        return service_fs()
    return asce7_16_asd(round(sds, 12))


def default_required(method: Method) -> RequiredRatios:
    """Required ratios of ``method`` when the project does not set them."""
    return SERVICE_FS_REQUIRED if method is Method.SERVICE_FS else ASD_REQUIRED


def combinations_of(criteria: DesignCriteria) -> tuple[LoadCombination, ...]:
    """The combinations in force: the project's own list, else the method's preset."""
    return criteria.custom_combinations or preset(criteria.method, criteria.sds)


@dataclass(frozen=True, slots=True)
class DesignCase:
    """One combination checked in one direction of the lateral load."""

    combination: LoadCombination
    direction: Direction


def design_cases(combinations: tuple[LoadCombination, ...], lateral_cases: frozenset[LoadCase]) -> tuple[DesignCase, ...]:
    """Expand combinations into cases: both directions where a lateral load acts, else "none".

    A combination acts laterally when it carries a factor on a case of which the wall has a lateral
    load (practice notes section 1.2: every combination in both lateral directions).
    """
    cases: list[DesignCase] = []
    for combo in combinations:
        if any(combo.factor(case) != 0.0 for case in lateral_cases):
            cases.append(DesignCase(combo, Direction.POSITIVE))
            cases.append(DesignCase(combo, Direction.NEGATIVE))
        else:
            cases.append(DesignCase(combo, Direction.NONE))
    return tuple(cases)

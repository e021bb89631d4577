"""Load combinations in force and the design cases they expand into.

The combinations of each code basis live in :mod:`engine.codes` (one module per edition or method,
factors as named constants with their clause); a project's own list replaces the preset. This module
picks the list in force and expands it into design cases: every combination that carries a lateral
load of the wall in both directions of that load.
"""

from __future__ import annotations

from dataclasses import dataclass

from .codes.asce7_16 import (  # noqa: F401 - the ASCE 7-16 factors, under their old home
    ASD_SEISMIC,
    ASD_WIND,
    COMPANION,
    COUNTERACTING_DEAD,
    EV_COEFFICIENT,
    MAX_SDS,
)
from .codes.asce7_16 import combinations as _asce7_16
from .codes.service_fs import combinations as _service_fs
from .model import DesignCriteria, Direction, LoadCase, LoadCombination, RequiredRatios
from .registry import CodeBasis, checks


def asce7_16_asd(sds: float) -> tuple[LoadCombination, ...]:
    """ASCE 7-16 2.4.1 / 2.4.5 ASD combinations for S_DS (see :mod:`engine.codes.asce7_16`)."""
    return _asce7_16(round(sds, 12))


def service_fs() -> tuple[LoadCombination, ...]:
    """The service-load combinations (see :mod:`engine.codes.service_fs`)."""
    return _service_fs()


def preset(method: CodeBasis, sds: float) -> tuple[LoadCombination, ...]:
    """The preset combinations of ``method`` for S_DS (its other options at their defaults)."""
    return method.combinations(DesignCriteria(method=method, sds=sds))


def default_required(method: CodeBasis) -> RequiredRatios:
    """Required ratios of ``method`` when the project does not set them."""
    return RequiredRatios({c.id: method.required_of(c) for c in checks()})


def combinations_of(criteria: DesignCriteria) -> tuple[LoadCombination, ...]:
    """The combinations in force: the project's own list, else the method's preset."""
    return criteria.custom_combinations or criteria.method.combinations(criteria)


@dataclass(frozen=True, slots=True)
class DesignCase:
    """One combination checked in one direction of the lateral load."""

    combination: LoadCombination
    direction: Direction


def design_cases(combinations: tuple[LoadCombination, ...], lateral_cases: frozenset[LoadCase]) -> tuple[DesignCase, ...]:
    """Expand combinations into cases: both directions where a lateral load acts, else "none".

    A combination acts laterally when it carries a factor on a case of which the wall has a lateral
    load (every combination is checked in both lateral directions: common practice).
    """
    cases: list[DesignCase] = []
    for combo in combinations:
        if any(combo.factor(case) != 0.0 for case in lateral_cases):
            cases.append(DesignCase(combo, Direction.POSITIVE))
            cases.append(DesignCase(combo, Direction.NEGATIVE))
        else:
            cases.append(DesignCase(combo, Direction.NONE))
    return tuple(cases)

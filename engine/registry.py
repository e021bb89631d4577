"""The design basis as data: the registry of checks and the registry of code bases.

A *check* (overturning, sliding, bearing, embedment, and later the footing's own strength) is one
object, registered by id in :mod:`engine.checks`: it knows the combination family it uses, how to
evaluate its ratio over every design case and every candidate size at once, how to build its per-case
record and its JSON, and its words for the window and the calculation package. Results, governing
cases, sizing, the tables and the package loop over :func:`checks`; adding a check is adding a module.

A *code basis* (ASCE 7-16 ASD, ASCE 7-22 ASD, the IBC 2021 alternative ASD combinations, service loads
with factors of safety) is one object, registered by id in :mod:`engine.codes`: its combinations
(factors as named constants with their clause), its options, its defaults and its wording for the
package. ``criteria.method`` selects one.

This module holds only the two base classes and the two registries; it imports nothing of the
engine, so that :mod:`engine.model` can refer to checks and code bases without an import cycle.
"""

from __future__ import annotations

from collections.abc import Iterator, Mapping
from dataclasses import dataclass
from enum import Enum
from typing import TYPE_CHECKING, Any, ClassVar

if TYPE_CHECKING:  # pragma: no cover
    import numpy as np

    from .model import DesignCriteria, LoadCombination


class Family(Enum):
    """Which load combinations a check uses.

    SERVICE: the allowable-stress (ASD) or service-load combinations of the project's code basis;
    STRENGTH: factored strength combinations (the footing's own concrete design);
    GEOMETRY: none, the check compares the footing's geometry with a requirement (embedment).
    """

    SERVICE = "service"
    STRENGTH = "strength"
    GEOMETRY = "geometry"


@dataclass(frozen=True, slots=True, eq=False)
class CheckArrays:
    """What a check's evaluation found: its ratio and the named parts a record or drawing shows.

    ``ratio`` has shape (k,) + grid for a per-case check (one row per design case) and the grid's
    shape for a geometric one. Ratios are capacity / demand; inf where there is no demand.
    """

    ratio: np.ndarray
    parts: Mapping[str, np.ndarray]

    def __getitem__(self, name: str) -> np.ndarray:
        return self.parts[name]


class _CheckMeta(type):
    """Lets ``Check`` be iterated like the enum of the three stability checks it replaces."""

    def __iter__(cls) -> Iterator[Check]:
        return iter(c for c in _CHECKS if c.family is Family.SERVICE)


@dataclass(frozen=True, eq=False)
class Check(metaclass=_CheckMeta):
    """One check of a footing, registered by id.

    Attributes:
        id: the key in project files, results JSON and the registry ("overturning").
        title: its name in tables and headings ("Overturning").
        symbol: a short mark for narrow columns ("OT").
        family: the combinations it uses (:class:`Family`).
        ratio_words: what its ratio is, in words ("resisting / overturning moment about the toe").
        basis: where its formula and required ratio come from (standard and clause, or textbook).
        order: where it is shown among the checks (tables, verdicts, the package): lower first.
    """

    id: str
    title: str
    symbol: str
    family: Family
    ratio_words: str
    basis: str
    order: int = 100

    # The three global stability checks and embedment, by their old names (set on registration).
    OVERTURNING: ClassVar[Check]
    SLIDING: ClassVar[Check]
    BEARING: ClassVar[Check]
    EMBEDMENT: ClassVar[Check]
    FLEXURE: ClassVar[Check]
    ONE_WAY_SHEAR: ClassVar[Check]

    @property
    def value(self) -> str:
        """The id (the name an enum member had before the registry)."""
        return self.id

    @property
    def per_case(self) -> bool:
        """True when the check has a ratio for each design case (the service checks). A geometric
        check has one value per size; a strength check is judged at its most loaded case."""
        return self.family is Family.SERVICE

    def evaluate(self, state: Any) -> CheckArrays:
        """The check's ratio and parts for every case and candidate (``state``: stability.Statics)."""
        raise NotImplementedError

    def record(self, state: Any, arrays: CheckArrays, index: int, required: float) -> Any:
        """The per-case record of case ``index`` (a single footing size was evaluated)."""
        raise NotImplementedError

    def record_json(self, record: Any) -> dict[str, Any]:
        """The record in the results JSON (SI base units, null where there is no demand)."""
        raise NotImplementedError

    def __repr__(self) -> str:
        return f"Check({self.id!r})"

    def __lt__(self, other: Check) -> bool:  # sortable, in registration order
        return _CHECK_ORDER[self.id] < _CHECK_ORDER[other.id]


def json_number(value: float | None) -> float | None:
    """A number for the results JSON: null for None, infinity (no demand) and NaN."""
    return None if value is None or value != value or value in (float("inf"), float("-inf")) else float(value)


_CHECKS: list[Check] = []
_CHECK_ORDER: dict[str, int] = {}


def register_check(check: Check, alias: str | None = None) -> Check:
    """Add ``check`` to the registry (ids are unique); ``alias`` also sets ``Check.<alias>``."""
    if check.id in _CHECK_ORDER:
        raise ValueError(f"a check with id {check.id!r} is registered already")
    _CHECKS.append(check)
    _CHECKS.sort(key=lambda c: c.order)
    _CHECK_ORDER.clear()
    _CHECK_ORDER.update((c.id, i) for i, c in enumerate(_CHECKS))
    if alias:
        setattr(Check, alias, check)
    return check


def checks(family: Family | None = None) -> tuple[Check, ...]:
    """The registered checks in their display order, all or those of one family."""
    return tuple(c for c in _CHECKS if family is None or c.family is family)


def check_by_id(check_id: str) -> Check:
    """The registered check with ``check_id`` (KeyError if none)."""
    for c in _CHECKS:
        if c.id == check_id:
            return c
    raise KeyError(check_id)


@dataclass(frozen=True, eq=False)
class CodeBasis:
    """A code edition or method: its combinations, options, defaults and wording.

    Attributes:
        id: the value of ``criteria.method`` ("asce7-16-asd").
        title: the name printed in the package ("ASCE 7-16, allowable stress design (2.4.1, 2.4.5)").
        family: the family of checks its combinations serve (SERVICE for ASD and service loads).
        required: the required ratio of each check id by default (a check not named requires 1.0).
        required_basis: where those required ratios come from, for the assumptions list and package.
        options: the ``criteria`` keys of options this basis accepts.
        uses_sds: its combinations need S_DS when a wall carries E loads.
        bearing_increase: the default increase of the allowable bearing pressure with W or E.
        bearing_increase_basis: where that default comes from.
        wording: a paragraph for the calculation package's design basis.
        order: where it is offered among the code bases: lower first.
    """

    id: str
    title: str
    family: Family
    required: Mapping[str, float]
    required_basis: str
    options: frozenset[str]
    uses_sds: bool
    bearing_increase: float
    bearing_increase_basis: str
    wording: str
    order: int = 100

    ASCE7_16_ASD: ClassVar[CodeBasis]
    ASCE7_22_ASD: ClassVar[CodeBasis]
    IBC2021_ALT_ASD: ClassVar[CodeBasis]
    SERVICE_FS: ClassVar[CodeBasis]

    @property
    def value(self) -> str:
        return self.id

    def combinations(self, criteria: DesignCriteria) -> tuple[LoadCombination, ...]:
        """The preset combinations for ``criteria`` (S_DS and options)."""
        raise NotImplementedError

    def required_of(self, check: Check) -> float:
        return float(self.required.get(check.id, 1.0))

    def __repr__(self) -> str:
        return f"CodeBasis({self.id!r})"


_CODES: list[CodeBasis] = []


def register_code(code: CodeBasis, alias: str | None = None) -> CodeBasis:
    """Add ``code`` to the registry (ids are unique); ``alias`` also sets ``CodeBasis.<alias>``."""
    if any(c.id == code.id for c in _CODES):
        raise ValueError(f"a code basis with id {code.id!r} is registered already")
    _CODES.append(code)
    _CODES.sort(key=lambda c: c.order)
    if alias:
        setattr(CodeBasis, alias, code)
    return code


def codes(family: Family | None = None) -> tuple[CodeBasis, ...]:
    """The registered code bases in the order they are offered."""
    return tuple(c for c in _CODES if family is None or c.family is family)


def code_by_id(code_id: str) -> CodeBasis:
    for c in _CODES:
        if c.id == code_id:
            return c
    raise KeyError(code_id)


class _MethodMeta(type):
    """Lets ``Method`` be iterated and indexed like the enum it replaces."""

    def __iter__(cls) -> Iterator[CodeBasis]:
        return iter(codes())

    def __getattr__(cls, name: str) -> CodeBasis:
        value = getattr(CodeBasis, name, None)
        if isinstance(value, CodeBasis):
            return value
        raise AttributeError(name)


class Method(metaclass=_MethodMeta):
    """The registered code bases under the old enum's name: ``Method.ASCE7_16_ASD``, ``list(Method)``."""


__all__ = [
    "Check",
    "CheckArrays",
    "CodeBasis",
    "Family",
    "Method",
    "check_by_id",
    "checks",
    "code_by_id",
    "codes",
    "json_number",
    "register_check",
    "register_code",
]

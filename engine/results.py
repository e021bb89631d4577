"""Results of the stability checks of a wall: per case, per check, and the governing case of each.

:func:`check_wall` runs :mod:`engine.stability` on the wall's current footing and turns the arrays
into small frozen records that the command line, the window and the calc package read. Nothing here
computes engineering; it selects and labels. :func:`results_json` writes the documented results
format (SI base units; null where there is no demand).
"""

from __future__ import annotations

import math
from collections.abc import Sequence
from dataclasses import dataclass, field
from typing import Any, overload

import numpy as np

from .checks import BearingResult, EmbedmentResult, OverturningResult, SlidingResult
from .combinations import DesignCase
from .loads import SelfWeight, self_weight
from .model import Project, Wall
from .registry import Check, Family
from .registry import json_number as _num
from .stability import CaseTable, Evaluation, case_table, evaluate

# Relative tolerance on "ratio >= required", so that a ratio equal to its requirement up to
# floating-point rounding passes (common practice: reviewers compare to the printed digits).
PASS_TOLERANCE = 1e-9


def meets(ratio: float, required: float) -> bool:
    """ratio >= required, within :data:`PASS_TOLERANCE`."""
    return ratio >= required * (1.0 - PASS_TOLERANCE)


CheckResult = OverturningResult | SlidingResult | BearingResult | EmbedmentResult | Any


@dataclass(frozen=True, slots=True, kw_only=True)
class CaseResult:
    """One combination in one direction: loads on the soil and the record of each check it applies to.

    ``records`` maps each per-case check (:mod:`engine.checks`) to its record, or None where the
    combination does not apply to it.
    """

    combination: str
    direction: str
    dead_factor: float
    vertical: float
    lateral: float
    moment: float
    records: dict[Check, Any]

    def of(self, check: Check) -> CheckResult | None:
        return self.records.get(check)

    def _by_id(self, check_id: str) -> Any:
        for check, record in self.records.items():
            if check.id == check_id:
                return record
        return None

    @property
    def overturning(self) -> OverturningResult | None:
        return self._by_id("overturning")  # type: ignore[no-any-return]

    @property
    def sliding(self) -> SlidingResult | None:
        return self._by_id("sliding")  # type: ignore[no-any-return]

    @property
    def bearing(self) -> BearingResult | None:
        return self._by_id("bearing")  # type: ignore[no-any-return]


@dataclass(frozen=True, slots=True, kw_only=True)
class Governing:
    """The case with the lowest ratio / required for one check (ratio inf: no demand anywhere).

    A geometric check (embedment) has no case: ``combination`` and ``direction`` are "" and
    ``case_index`` is None; ``record`` is its one record.
    """

    check: Check
    ratio: float
    required: float
    combination: str
    direction: str
    case_index: int | None
    passes: bool
    record: Any = None

    @property
    def normalized(self) -> float:
        return self.ratio / self.required


class CaseResults(Sequence[CaseResult]):
    """The per-case records of a wall, built from the evaluation arrays on first use.

    The numbers are all computed by :func:`engine.stability.evaluate`; this only packs them into
    records, which a window redrawing on every keystroke often does not need.
    """

    __slots__ = ("_table", "_evaluation", "_records")

    def __init__(self, table: CaseTable, evaluation: Evaluation) -> None:
        self._table = table
        self._evaluation = evaluation
        self._records: tuple[CaseResult, ...] | None = None

    def _all(self) -> tuple[CaseResult, ...]:
        if self._records is None:
            self._records = _case_results(self._table, self._evaluation)
        return self._records

    @overload
    def __getitem__(self, index: int) -> CaseResult: ...
    @overload
    def __getitem__(self, index: slice) -> tuple[CaseResult, ...]: ...
    def __getitem__(self, index: int | slice) -> CaseResult | tuple[CaseResult, ...]:
        return self._all()[index]

    def __len__(self) -> int:
        return len(self._table.cases)

    def __repr__(self) -> str:
        return f"CaseResults({len(self)} cases)"


@dataclass(frozen=True, slots=True, kw_only=True)
class WallResult:
    """Everything the checks found for one wall on its footing.

    ``table`` and ``evaluation`` hold the arrays (one entry per case) for views that draw them.
    """

    wall_id: str
    width: float
    thickness: float
    length: float
    self_weight: SelfWeight
    cases: CaseResults
    governing: dict[Check, Governing]
    table: CaseTable
    evaluation: Evaluation
    strength_table: CaseTable | None = None
    strength_evaluation: Evaluation | None = None
    memo: dict[str, Any] = field(default_factory=dict, compare=False, repr=False)

    @property
    def passes(self) -> bool:
        """Every governing check passes (stability, embedment and the design across the width). The
        design along the length is costlier and apart: :attr:`passes_along`."""
        return all(g.passes for g in self.governing.values())

    @property
    def along(self) -> Any:
        """The design along the length, ``(LongitudinalDesign, case index, BeamDiagram)`` of
        :func:`engine.concrete.along.design_along`, or None without a concrete design; computed on
        first use (a few milliseconds) and kept."""
        if "along" not in self.memo:
            table, ev = self.strength_table, self.strength_evaluation
            if table is None or ev is None or not table.cases or table.concrete is None:
                self.memo["along"] = None
            else:
                from .concrete.along import design_along

                self.memo["along"] = design_along(table, ev)
        return self.memo["along"]

    @property
    def passes_along(self) -> bool:
        """The footing carries its strength cases as a beam along its length (True without a
        concrete design)."""
        along = self.along
        return along is None or bool(along[0].passes)

    @property
    def passes_all(self) -> bool:
        """:attr:`passes` and :attr:`passes_along`: the wall's whole verdict."""
        return self.passes and self.passes_along

    @property
    def worst(self) -> Governing:
        """The governing check with the lowest ratio / required."""
        return min(self.governing.values(), key=lambda g: g.normalized)


def _case_results(table: CaseTable, ev: Evaluation) -> tuple[CaseResult, ...]:
    vertical, moment = ev.vertical.tolist(), ev.moment.tolist()
    shear = table.shear.tolist()
    dead = table.dead_factor.tolist()
    per_case = [(j, c) for j, c in enumerate(table.checks) if c.per_case]
    applies = table.applies.tolist()
    out = []
    for i, case in enumerate(table.cases):
        records = {
            check: check.record(ev.statics, ev.arrays[check], i, float(table.required[j])) if applies[j][i] else None
            for j, check in per_case
        }
        out.append(
            CaseResult(
                combination=case.combination.name,
                direction=case.direction.value,
                dead_factor=dead[i],
                vertical=vertical[i],
                lateral=shear[i],
                moment=moment[i],
                records=records,
            )
        )
    return tuple(out)


def governing_case(table: CaseTable, evaluation: Evaluation, check: Check) -> Governing:
    """The case with the lowest ratio / required for ``check`` (the first such case on ties).

    Cases whose combination does not apply to the check are passed over; where no case has any
    demand the ratio is inf (printed as "no demand"). A geometric check has one value and no case.
    """
    j = table.checks.index(check)
    required = float(table.required[j])
    ratio_j = evaluation.arrays[check].ratio
    if not check.per_case:
        ratio = float(ratio_j)
        record = check.record(evaluation.statics, evaluation.arrays[check], 0, required)
        return Governing(
            check=check,
            ratio=ratio,
            required=required,
            combination=getattr(record, "combination", ""),  # a strength check names its most loaded case
            direction=getattr(record, "direction", ""),
            case_index=None,
            passes=meets(ratio, required),
            record=record,
        )
    i = int(np.argmin(np.where(table.applies[j], ratio_j, np.inf)))
    ratio = float(ratio_j[i]) if table.applies[j, i] else math.inf
    design: DesignCase = table.cases[i]
    return Governing(
        check=check,
        ratio=ratio,
        required=required,
        combination=design.combination.name,
        direction=design.direction.value,
        case_index=i,
        passes=meets(ratio, required),
    )


def check_wall(project: Project, wall: Wall, table: CaseTable | None = None) -> WallResult:
    """Check ``wall`` on its current footing for every registered check, combination and direction.

    With a concrete section in the project the footing's own strength checks (flexure, one-way shear)
    run too, on the strength combinations (:func:`strength_table`).
    """
    table = table or case_table(wall, project.soil, project.criteria, project.site)
    b, d = wall.footing.width, wall.footing.thickness
    ev = evaluate(table, b, d)
    strength = strength_table(project, wall)
    strength_ev = evaluate(strength, b, d) if strength is not None else None
    strength_governing = (
        {check: governing_case(strength, strength_ev, check) for check in strength.checks}
        if strength is not None and strength_ev is not None
        else {}
    )
    sw = self_weight(wall, project.soil, b, d)
    return WallResult(
        wall_id=wall.id,
        width=b,
        thickness=d,
        length=wall.footing_length,
        self_weight=SelfWeight(footing=float(sw.footing), stem=float(sw.stem), soil=float(sw.soil)),
        cases=CaseResults(table, ev),
        governing={**{check: governing_case(table, ev, check) for check in table.checks}, **strength_governing},
        table=table,
        evaluation=ev,
        strength_table=strength,
        strength_evaluation=strength_ev,
    )


def strength_table(project: Project, wall: Wall) -> CaseTable | None:
    """The case table of the footing's strength design (None without a concrete section)."""
    if project.concrete is None:
        return None
    return case_table(wall, project.soil, project.criteria, project.site, project.concrete, Family.STRENGTH)


def along_lines(results: Sequence[WallResult]) -> list[str]:
    """One line per wall with a concrete design: its bars along the length and whether the footing
    carries its strength cases as a beam (ACI 318-19; :func:`engine.concrete.along.design_along`),
    with the engine's words when it does not."""
    lines = []
    for r in results:
        if r.along is None:
            continue
        design = r.along[0]
        given = r.table.wall.footing.reinforcement
        bars = []
        for face, faced in (("bottom", design.bottom), ("top", design.top)):
            entered = given is not None and getattr(given, face) is not None
            if faced.bars:
                bars.append(f"{face} {faced.bars} ({'entered' if entered else 'designed'})")
        text = ", ".join(bars) or "no bars"
        verdict = "carries its strength cases" if design.passes else "FAILS: " + design.message
        plain = bool(design.plain_carries)
        lines.append(f"{r.wall_id}: {text}; " + ("the plain section " if plain else "") + verdict)
    return lines


def check_project(project: Project) -> tuple[WallResult, ...]:
    """Check every wall of the project."""
    return tuple(check_wall(project, wall) for wall in project.walls)


def _check_json(check: Check, result: Any) -> dict[str, Any]:
    body = check.record_json(result)
    body.update(ratio=_num(result.ratio), required=result.required, passes=result.passes)
    return body


def wall_json(result: WallResult) -> dict[str, Any]:
    """The documented results record of one wall (SI base units; null where there is no demand)."""
    governing: dict[str, Any] = {}
    for check, g in result.governing.items():
        demand = not math.isinf(g.ratio) and bool(g.combination)
        entry: dict[str, Any] = {
            "ratio": _num(g.ratio),
            "required": g.required,
            "combination": g.combination if demand else None,
            "direction": g.direction if demand else None,
            "passes": g.passes,
        }
        if check.id == "bearing":
            br = result.cases[g.case_index].bearing if g.case_index is not None else None
            entry["q_max"] = _num(br.q_max) if br is not None and demand else None
        if g.record is not None:
            entry.update(check.record_json(g.record))
        governing[check.id] = entry
    cases = []
    for case in result.cases:
        entry = {
            "combination": case.combination,
            "direction": case.direction,
            "vertical": _num(case.vertical),
            "lateral": _num(case.lateral),
        }
        for check, r in case.records.items():
            if r is not None:
                entry[check.id] = _check_json(check, r)
        cases.append(entry)
    out: dict[str, Any] = {
        "id": result.wall_id,
        "passes": result.passes_all,  # the design along the length included
        "footing": {"width": result.width, "thickness": result.thickness, "length": result.length},
        "governing": governing,
        "cases": cases,
    }
    concrete = concrete_json(result)
    if concrete is not None:
        out["concrete"] = concrete
    return out


def concrete_json(result: WallResult) -> dict[str, Any] | None:
    """The footing's concrete design across its width (SI, per metre of footing), or None when the
    project has no concrete section. The design along the length is not yet reported ("longitudinal":
    null)."""
    flexure = next((g.record for c, g in result.governing.items() if c.id == "flexure"), None)
    shear = next((g.record for c, g in result.governing.items() if c.id == "one_way_shear"), None)
    if flexure is None or shear is None:
        return None
    return {
        "plain": flexure.plain,
        "longitudinal": longitudinal_json(result),
        "transverse": {
            "q_u": _num(flexure.q_u),
            "combination": flexure.combination or None,
            "moment": _num(flexure.moment),
            "moment_capacity": _num(flexure.moment_capacity),
            "shear": _num(shear.shear),
            "shear_capacity": _num(shear.shear_capacity),
            "steel_required": _num(flexure.steel_required),
            "steel_provided": _num(flexure.steel_provided),
            "bars": flexure.bars,
            "development_length": _num(flexure.development_length),
            "development_available": _num(flexure.development_available),
        },
    }


def longitudinal_json(result: WallResult, stations: int = 101) -> dict[str, Any] | None:
    """The design along the length (the footing as a beam, ACI 318-19), for the governing strength
    case: extreme moments and shear, the bars of each face, and the diagram as [[x, V, M], ...]."""
    table = result.strength_table
    if result.along is None or table is None:
        return None
    design, index, diagram = result.along
    case = table.cases[index]
    step = max(1, len(diagram.x) // stations)
    points = [
        [float(x), float(v), float(m)]
        for x, v, m in zip(diagram.x[::step], diagram.shear_right[::step], diagram.moment[::step], strict=True)
    ]
    return {
        "combination": case.combination.name,
        "direction": case.direction.value,
        "moment_bottom": _num(diagram.max_moment),
        "moment_top": _num(diagram.min_moment),
        "shear": _num(diagram.max_shear),
        "bars_bottom": design.bottom.bars or None,
        "bars_top": design.top.bars or None,
        "passes": design.passes,
        "message": design.message,
        "plain_moment_capacity": _num(design.plain_moment_capacity),
        "plain_shear_capacity": _num(design.plain_shear_capacity),
        "plain_carries": design.plain_carries,
        "diagram": points,
    }


def results_json(
    results: tuple[WallResult, ...],
    sizing: dict[str, dict[str, Any]] | None = None,
    project: Project | None = None,
) -> dict[str, Any]:
    """The whole results document, format "kernline-results" version 1.

    With ``project``, the document also lists ``"assumptions"`` (every value taken by default, as
    ``{"field", "value", "basis"}``) and ``"warnings"`` (legal inputs that are usually mistakes, as
    ``{"field", "message"}``); both are lists, empty when there are none.
    """
    walls = []
    for r in results:
        entry = wall_json(r)
        if sizing is not None and r.wall_id in sizing:
            entry["sizing"] = sizing[r.wall_id]
        walls.append(entry)
    out: dict[str, Any] = {"format": "kernline-results", "version": 1}
    if project is not None:
        from .input_warnings import input_warnings

        out["assumptions"] = [{"field": a.field, "value": a.value, "basis": a.basis} for a in project.assumptions]
        out["warnings"] = [{"field": w.field, "message": w.message} for w in input_warnings(project, results)]
    out["walls"] = walls
    return out


__all__ = [
    "BearingResult",
    "EmbedmentResult",
    "CaseResult",
    "CheckResult",
    "Governing",
    "OverturningResult",
    "SlidingResult",
    "WallResult",
    "check_project",
    "check_wall",
    "meets",
    "results_json",
    "wall_json",
    "Wall",
]

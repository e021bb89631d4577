"""Results of the stability checks of a wall: per case, per check, and the governing case of each.

:func:`check_wall` runs :mod:`engine.stability` on the wall's current footing and turns the arrays
into small frozen records that the command line, the window and the calc package read. Nothing here
computes engineering; it selects and labels. :func:`results_json` writes the documented results
format (SI base units; null where there is no demand).
"""

from __future__ import annotations

import math
from collections.abc import Sequence
from dataclasses import dataclass
from typing import Any, overload

import numpy as np

from .combinations import DesignCase
from .loads import SelfWeight, self_weight
from .model import ALL_CHECKS, Check, Project, Wall
from .stability import CaseTable, Evaluation, case_table, evaluate

# Relative tolerance on "ratio >= required", so that a ratio equal to its requirement up to
# floating-point rounding passes (common practice: reviewers compare to the printed digits).
PASS_TOLERANCE = 1e-9


def meets(ratio: float, required: float) -> bool:
    """ratio >= required, within :data:`PASS_TOLERANCE`."""
    return ratio >= required * (1.0 - PASS_TOLERANCE)


@dataclass(frozen=True, slots=True, kw_only=True)
class OverturningResult:
    """Moments about the toe (N*m) and their ratio."""

    moment: float
    resisting: float
    ratio: float
    required: float
    passes: bool


@dataclass(frozen=True, slots=True, kw_only=True)
class SlidingResult:
    """Shear V and the resistance that opposes it (N), with its parts."""

    force: float
    resistance: float
    friction: float
    cohesion: float
    passive: float
    ratio: float
    required: float
    passes: bool


@dataclass(frozen=True, slots=True, kw_only=True)
class BearingResult:
    """Eccentricity (m), soil pressures (Pa), contact length (m) and their ratio to the allowable."""

    eccentricity: float
    q_max: float
    q_min: float
    contact_length: float
    pressure_compared: float
    allowable: float
    stable: bool
    ratio: float
    required: float
    passes: bool


CheckResult = OverturningResult | SlidingResult | BearingResult


@dataclass(frozen=True, slots=True, kw_only=True)
class CaseResult:
    """One combination in one direction: loads on the soil and the checks it applies to."""

    combination: str
    direction: str
    dead_factor: float
    vertical: float
    lateral: float
    moment: float
    overturning: OverturningResult | None
    sliding: SlidingResult | None
    bearing: BearingResult | None

    def of(self, check: Check) -> CheckResult | None:
        return getattr(self, check.value)  # type: ignore[no-any-return]


@dataclass(frozen=True, slots=True, kw_only=True)
class Governing:
    """The case with the lowest ratio / required for one check (ratio inf: no demand anywhere)."""

    check: Check
    ratio: float
    required: float
    combination: str
    direction: str
    case_index: int
    passes: bool

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

    @property
    def passes(self) -> bool:
        return all(g.passes for g in self.governing.values())

    @property
    def worst(self) -> Governing:
        """The governing check with the lowest ratio / required."""
        return min(self.governing.values(), key=lambda g: g.normalized)


def _case_results(table: CaseTable, ev: Evaluation) -> tuple[CaseResult, ...]:
    r = [ev.overturning_ratio.tolist(), ev.sliding_ratio.tolist(), ev.bearing_ratio.tolist()]
    applies = table.applies.tolist()
    req = table.required.tolist()
    vertical, moment, e = ev.vertical.tolist(), ev.moment.tolist(), ev.eccentricity.tolist()
    q_max, q_min, contact = ev.q_max.tolist(), ev.q_min.tolist(), ev.contact_length.tolist()
    stable, compared, allowable = ev.stable.tolist(), ev.pressure_compared.tolist(), ev.allowable.tolist()
    m_r, m_o = ev.resisting_moment.tolist(), ev.overturning_moment.tolist()
    fr, co, pa = ev.friction.tolist(), ev.cohesion.tolist(), ev.passive.tolist()
    shear = table.shear.tolist()
    dead = table.dead_factor.tolist()
    out = []
    for i, case in enumerate(table.cases):
        ot = sl = br = None
        if applies[0][i]:
            ot = OverturningResult(moment=m_o[i], resisting=m_r[i], ratio=r[0][i], required=req[0], passes=meets(r[0][i], req[0]))
        if applies[1][i]:
            sl = SlidingResult(
                force=shear[i],
                resistance=fr[i] + co[i] + pa[i],
                friction=fr[i],
                cohesion=co[i],
                passive=pa[i],
                ratio=r[1][i],
                required=req[1],
                passes=meets(r[1][i], req[1]),
            )
        if applies[2][i]:
            br = BearingResult(
                eccentricity=e[i],
                q_max=q_max[i],
                q_min=q_min[i],
                contact_length=contact[i],
                pressure_compared=compared[i],
                allowable=allowable[i],
                stable=bool(stable[i]),
                ratio=r[2][i],
                required=req[2],
                passes=meets(r[2][i], req[2]),
            )
        out.append(
            CaseResult(
                combination=case.combination.name,
                direction=case.direction.value,
                dead_factor=dead[i],
                vertical=vertical[i],
                lateral=shear[i],
                moment=moment[i],
                overturning=ot,
                sliding=sl,
                bearing=br,
            )
        )
    return tuple(out)


def governing_case(table: CaseTable, evaluation: Evaluation, check: Check) -> Governing:
    """The case with the lowest ratio / required for ``check`` (the first such case on ties).

    Cases whose combination does not apply to the check are passed over; where no case has any
    demand the ratio is inf (printed as "no demand").
    """
    j = ALL_CHECKS.index(check)
    ratio_j = (evaluation.overturning_ratio, evaluation.sliding_ratio, evaluation.bearing_ratio)[j]
    i = int(np.argmin(np.where(table.applies[j], ratio_j, np.inf)))  # one required value per check
    required = float(table.required[j])
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
    """Check ``wall`` on its current footing for every combination and direction."""
    table = table or case_table(wall, project.soil, project.criteria)
    b, d = wall.footing.width, wall.footing.thickness
    ev = evaluate(table, b, d)
    sw = self_weight(wall, project.soil, b, d)
    return WallResult(
        wall_id=wall.id,
        width=b,
        thickness=d,
        length=wall.footing_length,
        self_weight=SelfWeight(footing=float(sw.footing), stem=float(sw.stem), soil=float(sw.soil)),
        cases=CaseResults(table, ev),
        governing={check: governing_case(table, ev, check) for check in ALL_CHECKS},
        table=table,
        evaluation=ev,
    )


def check_project(project: Project) -> tuple[WallResult, ...]:
    """Check every wall of the project."""
    return tuple(check_wall(project, wall) for wall in project.walls)


def _num(value: float) -> float | None:
    return None if value is None or math.isinf(value) or math.isnan(value) else float(value)


def _check_json(result: CheckResult) -> dict[str, Any]:
    if isinstance(result, OverturningResult):
        body: dict[str, Any] = {"moment": _num(result.moment), "resisting": _num(result.resisting)}
    elif isinstance(result, SlidingResult):
        body = {
            "force": _num(result.force),
            "resistance": _num(result.resistance),
            "friction": _num(result.friction),
            "cohesion": _num(result.cohesion),
            "passive": _num(result.passive),
        }
    else:
        body = {
            "eccentricity": _num(result.eccentricity),
            "q_max": _num(result.q_max),
            "q_min": _num(result.q_min),
            "contact_length": _num(result.contact_length),
            "pressure_compared": _num(result.pressure_compared),
            "allowable": _num(result.allowable),
            "stable": result.stable,
        }
    body.update(ratio=_num(result.ratio), required=result.required, passes=result.passes)
    return body


def wall_json(result: WallResult) -> dict[str, Any]:
    """The documented results record of one wall (SI base units; null where there is no demand)."""
    governing: dict[str, Any] = {}
    for check, g in result.governing.items():
        demand = not math.isinf(g.ratio)
        entry: dict[str, Any] = {
            "ratio": _num(g.ratio),
            "required": g.required,
            "combination": g.combination if demand else None,
            "direction": g.direction if demand else None,
            "passes": g.passes,
        }
        if check is Check.BEARING:
            br = result.cases[g.case_index].bearing
            entry["q_max"] = _num(br.q_max) if br is not None and demand else None
        governing[check.value] = entry
    cases = []
    for case in result.cases:
        entry = {
            "combination": case.combination,
            "direction": case.direction,
            "vertical": _num(case.vertical),
            "lateral": _num(case.lateral),
        }
        for check in ALL_CHECKS:
            r = case.of(check)
            if r is not None:
                entry[check.value] = _check_json(r)
        cases.append(entry)
    return {
        "id": result.wall_id,
        "passes": result.passes,
        "footing": {"width": result.width, "thickness": result.thickness, "length": result.length},
        "governing": governing,
        "cases": cases,
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

"""Warnings: inputs that are legal but usually a mistake.

A warning never changes a result or an exit code. It names the field to look at and says what looks
wrong, so the engineer can confirm or correct it. The command line prints warnings on stderr, the
results JSON lists them under ``"warnings"``, and the window shows them beside the verdict.
"""

from __future__ import annotations

from collections.abc import Sequence
from dataclasses import dataclass

from .checks.embedment import MIN_WIDTH
from .model import LateralLoad, LoadCase, PointLoad, Project, Wall
from .results import WallResult

# A governing case whose soil contact is shorter than this share of the footing's length is
# flagged: the footing then rocks on a short strip, and the rigid-footing pressure model and the
# footing's strength along its length deserve a second look (common practice).
MIN_CONTACT_SHARE = 0.5
# The concrete section feeds the flexure and one-way shear checks across the footing's width; the
# design along the length is reported but not yet a check (see engine.concrete.longitudinal).
CONCRETE_DESIGN_WIRED = True


@dataclass(frozen=True, slots=True, kw_only=True)
class InputWarning:
    """A legal input that is usually a mistake.

    Attributes:
        field: the path of the field to look at ("criteria.sds", "walls[2].loads[4]").
        message: one sentence that says what looks wrong.
    """

    field: str
    message: str

    @property
    def text(self) -> str:
        return f"{self.field}: {self.message}" if self.field else self.message


def input_warnings(project: Project, results: Sequence[WallResult] | None = None) -> tuple[InputWarning, ...]:
    """The warnings for ``project``; with ``results`` (one per wall, same order) also those on results."""
    out: list[InputWarning] = []
    seismic_walls = [i for i, w in enumerate(project.walls) if _has_case(w, LoadCase.E)]
    if seismic_walls and project.criteria.sds == 0.0 and not project.criteria.custom_combinations:
        out.append(
            InputWarning(
                field="criteria.sds",
                message=f"is 0 while {_walls_text(project, seismic_walls)} carry E loads, so the vertical seismic "
                "effect Ev = 0.2 S_DS D (ASCE 7-16 12.4.2.2) is zero; enter S_DS from the site's seismic data",
            )
        )
    if seismic_walls and project.concrete is not None and project.criteria.seismic_design_category is None:
        out.append(
            InputWarning(
                field="criteria.seismic_design_category",
                message=f"is not given while {_walls_text(project, seismic_walls)} carry E loads; the concrete design "
                "then takes φ = 0.75 for one-way shear (0.60 in D to F, ACI 318-19 21.2.4.3) and asks no continuous "
                "bars of a plain footing (C to F, IBC 2021 1905.6.2); enter the category (ASCE 7-16 11.6)",
            )
        )
    for i, wall in enumerate(project.walls):
        for case in (LoadCase.W, LoadCase.E):
            lateral = any(isinstance(ld, LateralLoad) and ld.case is case for ld in wall.loads)
            points = [j for j, ld in enumerate(wall.loads) if isinstance(ld, PointLoad) and ld.case is case]
            if lateral and points:
                out.append(
                    InputWarning(
                        field=f"walls[{i}].loads[{points[0]}]",
                        message=f"wall {wall.id} has {case.value} point loads and {case.value} lateral loads; if the point "
                        "loads are the chord or hold-down forces of those shears, the overturning is counted twice",
                    )
                )
    if project.concrete is not None and not CONCRETE_DESIGN_WIRED:
        out.append(
            InputWarning(
                field="concrete",
                message="is read, but this version does not design the footing's concrete",
            )
        )
    for i, wall in enumerate(project.walls):
        if wall.footing.width < MIN_WIDTH - 1e-9:
            out.append(
                InputWarning(
                    field=f"walls[{i}].footing.width",
                    message=f"wall {wall.id}: the footing is narrower than the 12 in minimum width of IBC 2021 1809.4",
                )
            )
    if results is not None:
        for i, (wall, result) in enumerate(zip(project.walls, results, strict=False)):
            out.extend(_short_contact(i, wall, result, project.units))
    return tuple(out)


def _short_contact(index: int, wall: Wall, result: WallResult, units: str) -> list[InputWarning]:
    """A governing case whose soil contact covers less than half the footing's length."""
    from .units import format_length

    length = result.length
    worst: tuple[float, str, str] | None = None
    for g in result.governing.values():
        if g.ratio == float("inf") or g.case_index is None:
            continue
        contact = float(result.evaluation.contact_length[g.case_index])
        stable = bool(result.evaluation.stable[g.case_index])
        if stable and 0.0 < contact < MIN_CONTACT_SHARE * length and (worst is None or contact < worst[0]):
            worst = (contact, g.combination, g.direction)
    if worst is None:
        return []
    contact, combination, direction = worst
    return [
        InputWarning(
            field=f"walls[{index}].footing",
            message=f"wall {wall.id}: in {combination} ({direction}) the soil touches the footing over "
            f"{format_length(contact, units)} of {format_length(length, units)}, less than half its length; "
            "check the footing's strength along its length",
        )
    ]


def _has_case(wall: Wall, case: LoadCase) -> bool:
    return any(ld.case is case for ld in wall.loads)


def _walls_text(project: Project, indices: Sequence[int]) -> str:
    ids = [project.walls[i].id for i in indices]
    shown = ", ".join(ids[:4]) + (f" and {len(ids) - 4} more" if len(ids) > 4 else "")
    return f"wall{'s' if len(ids) > 1 else ''} {shown}"


__all__ = ["MIN_CONTACT_SHARE", "InputWarning", "input_warnings"]

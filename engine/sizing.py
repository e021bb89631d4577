"""Automatic sizing: the smallest footing width x thickness on the candidate grid that passes.

Every candidate of the grid is checked against every case at once (numpy broadcasting over
cases x thicknesses x widths; no Python loop over candidates). The choice is the passing candidate
with the least cross-section B*t_f (the least concrete per length of footing), ties going to the
thinner, then the narrower (common practice: excavation depth costs more than width). The full
feasibility map is returned for the window's design map.
"""

from __future__ import annotations

import math
from dataclasses import dataclass, replace

import numpy as np

from .model import Project, Wall
from .registry import Check, Family
from .stability import CaseTable, case_table, evaluate, statics
from .units import format_length

# Relative tolerance that lets the upper bound of a range be reached despite floating-point steps.
GRID_TOLERANCE = 1e-6
# Fraction of the wall length tried on each end when probing whether a longer footing would help.
LONGER_PROBE = 0.1


def candidate_values(low: float, high: float, step: float) -> np.ndarray:
    """low, low + step, ... up to high inclusive (within a rounding tolerance)."""
    count = int(math.floor((high - low) / step * (1.0 + GRID_TOLERANCE) + GRID_TOLERANCE)) + 1
    return low + step * np.arange(count)


def candidate_grid(wall: Wall) -> tuple[np.ndarray, np.ndarray]:
    """The candidate widths and thicknesses of the wall's sizing bounds (m)."""
    z = wall.sizing
    return (
        candidate_values(z.width_min, z.width_max, z.width_step),
        candidate_values(z.thickness_min, z.thickness_max, z.thickness_step),
    )


@dataclass(frozen=True, slots=True, eq=False)
class SizingResult:
    """The chosen size and the feasibility map of every candidate.

    Map arrays have shape (len(thicknesses), len(widths)): rows are thicknesses (up), columns widths.

    Attributes:
        widths, thicknesses: the candidate values (m).
        allowed: False where the candidate is narrower than the wall or stem it carries.
        passes: the candidate meets every required ratio (and is allowed).
        checks: the checks evaluated, in registry order (the first axis of ``check_normalized``).
        governing: index into ``checks`` of the check with the lowest normalized ratio at each
            candidate.
        normalized: that lowest ratio / required (>= 1 passes).
        check_normalized: (checks, rows, cols) lowest ratio / required of each check over all
            cases, for drawing each check's boundary.
        width, thickness: the chosen size, or None when no candidate passes.
        extension: the extension added at each end when the length was sized (0.0 when it was not
            needed; None when nothing passes); extensions: the extensions tried; length: the chosen
            footing's length L_f.
        message: what was found, in words; with suggestions when nothing passes.
    """

    wall_id: str
    widths: np.ndarray
    thicknesses: np.ndarray
    allowed: np.ndarray
    passes: np.ndarray
    governing: np.ndarray
    normalized: np.ndarray
    check_normalized: np.ndarray
    width: float | None
    thickness: float | None
    message: str
    suggestions: tuple[str, ...] = ()
    checks: tuple[Check, ...] = ()
    extension: float | None = None
    extensions: np.ndarray | None = None
    length: float | None = None

    @property
    def feasible(self) -> bool:
        return self.width is not None

    @property
    def candidates(self) -> int:
        lengths = self.extensions.size if self.extensions is not None else 1
        return int(self.widths.size * self.thicknesses.size * lengths)

    def governing_check(self, row: int, col: int) -> Check:
        return self.checks[int(self.governing[row, col])]

    def as_json(self) -> dict[str, object]:
        return {
            "feasible": self.feasible,
            "width": self.width,
            "thickness": self.thickness,
            "extension": self.extension if self.extensions is not None and self.extensions.size > 1 else None,
            "length": self.length,
            "candidates": self.candidates,
            "message": self.message,
            "suggestions": list(self.suggestions),
        }


def feasibility_maps(
    tables: list[CaseTable], widths: np.ndarray, thicknesses: np.ndarray
) -> tuple[np.ndarray, np.ndarray, tuple[Check, ...]]:
    """:func:`feasibility_map` over several case tables (the stability one, and the strength one when
    the footing's concrete is designed): their rows stacked, and the checks in that order."""
    maps = [feasibility_map(t, widths, thicknesses) for t in tables]
    stacked = np.concatenate([m[0] for m in maps], axis=0)
    checks = tuple(c for t in tables for c in t.checks)
    return stacked, maps[0][1], checks


def _tables(project: Project, wall: Wall) -> list[CaseTable]:
    tables = [case_table(wall, project.soil, project.criteria, project.site)]
    if project.concrete is not None:
        tables.append(case_table(wall, project.soil, project.criteria, project.site, project.concrete, Family.STRENGTH))
    return tables


def feasibility_map(table: CaseTable, widths: np.ndarray, thicknesses: np.ndarray) -> tuple[np.ndarray, np.ndarray]:
    """Lowest ratio / required of each check over all cases, for every candidate.

    Returns:
        (check_normalized with shape (checks, rows, cols), allowed with shape (rows, cols)).
    """
    b = widths[None, :]
    d = thicknesses[:, None]
    ev = evaluate(table, b, d)
    check_normalized = ev.check_minima()
    allowed = np.broadcast_to(b >= table.wall.supported_thickness - 1e-12, (d.size, b.size))
    return check_normalized, allowed


def sized_wall(wall: Wall, sizing: SizingResult) -> Wall:
    """``wall`` on the footing sizing chose (unchanged when nothing passes)."""
    if not sizing.feasible or sizing.width is None or sizing.thickness is None:
        return wall
    chosen = extended(wall, sizing.extension or 0.0)
    return replace(chosen, footing=replace(chosen.footing, width=sizing.width, thickness=sizing.thickness))


def sized_footing_values(wall: Wall, sizing: SizingResult) -> dict[str, float]:
    """The footing keys sizing changes, for writing back: width and thickness, and the extensions
    when the length was sized."""
    chosen = sized_wall(wall, sizing)
    values = {"width": chosen.footing.width, "thickness": chosen.footing.thickness}
    if sizing.extensions is not None and sizing.extensions.size > 1:
        values.update(extension_start=chosen.footing.extension_start, extension_end=chosen.footing.extension_end)
    return values


def extended(wall: Wall, extension: float) -> Wall:
    """``wall`` with ``extension`` added to the footing's extension at both ends (m)."""
    if extension == 0.0:
        return wall
    footing = replace(
        wall.footing,
        extension_start=wall.footing.extension_start + extension,
        extension_end=wall.footing.extension_end + extension,
    )
    return replace(wall, footing=footing)


def round_volume(section: np.ndarray | float, length: float) -> np.ndarray:
    """B*t_f*L_f rounded to 1e-12 m^3, so that equal volumes compare equal (m^3). Rounding is
    monotone, so the volume of the least B*t_f bounds every other from below."""
    return np.round(np.asarray(section) * length, 12)


def size_footing(project: Project, wall: Wall) -> SizingResult:
    """Find the passing candidate with the least concrete on the wall's sizing grid.

    Without extension bounds the grid is widths x thicknesses and the choice has the least B*t_f (the
    length is fixed). With ``sizing.extension_max`` > 0 a third axis adds equal extensions e at both
    ends (0 to extension_max by extension_step); the choice then has the least volume B*t_f*L_f,
    ties going to the shorter, then the thinner, then the narrower footing. The map returned is the
    one at the chosen extension (at the largest one when nothing passes). Longer footings whose least
    B*t_f already holds no less concrete than the choice are not evaluated (they cannot be chosen).
    """
    widths, thicknesses = candidate_grid(wall)
    z = wall.sizing
    extensions = candidate_values(0.0, z.extension_max, z.extension_step) if z.extension_max > 0.0 else np.zeros(1)
    maps = []
    best: tuple[float, float, float, float, int, int, int] | None = None  # volume, e, t, b, k, row, col
    smallest = float(thicknesses.min() * widths.min()) if thicknesses.size and widths.size else 0.0
    for k, e in enumerate(extensions.tolist()):
        trial = extended(wall, e)
        if best is not None and smallest > 0.0 and round_volume(smallest, trial.footing_length) >= best[0]:
            # even the least B*t_f at this length (and at every longer one) has no less concrete than
            # the choice, and a tie goes to the shorter: nothing from here on can be chosen
            break
        tables = _tables(project, trial)
        check_normalized, allowed, all_checks = feasibility_maps(tables, widths, thicknesses)
        passes = allowed & (np.min(check_normalized, axis=0) >= 1.0 - 1e-9)
        maps.append((trial, tables, check_normalized, allowed, passes))
        if not passes.any():
            continue
        rows, cols = np.nonzero(passes)
        volume = round_volume(thicknesses[rows] * widths[cols], trial.footing_length)
        # least volume; ties to the shorter (this e is the shortest so far at equal volume), thinner, narrower
        order = np.lexsort((widths[cols], thicknesses[rows], volume))
        i = int(order[0])
        candidate = (float(volume[i]), e, float(thicknesses[rows[i]]), float(widths[cols[i]]), k, int(rows[i]), int(cols[i]))
        if best is None or candidate[:4] < best[:4]:
            best = candidate

    k = best[4] if best is not None else len(maps) - 1
    trial, trial_tables, check_normalized, allowed, passes = maps[k]
    table = trial_tables[0]
    governing = np.argmin(check_normalized, axis=0)
    normalized = np.min(check_normalized, axis=0)
    width: float | None
    thickness: float | None
    extension: float | None
    if best is not None:
        _, extension, thickness, width, _, row, col = best
        message = _why_smallest(all_checks, check_normalized, passes, allowed, row, col)
        if project.concrete is not None:
            row, col, skipped = _along_the_length(trial_tables[-1], widths, thicknesses, passes, row, col)
            width, thickness = float(widths[col]), float(thicknesses[row])
            if skipped:
                plural = "s pass" if skipped > 1 else " passes"
                message = (
                    f"smallest size that also carries its loads along the length: {skipped} smaller size{plural} "
                    "the other checks but not the design along the length (the footing as a beam, ACI 318-19)"
                )
        if extensions.size > 1:
            message += _why_this_length(project, extensions, k, [bool(m[4].any()) for m in maps])
        suggestions: tuple[str, ...] = ()
    else:
        width, thickness, extension = None, None, None
        message, suggestions = _diagnose(project, trial, table, widths, thicknesses, check_normalized, allowed, all_checks)
    return SizingResult(
        wall_id=wall.id,
        widths=widths,
        thicknesses=thicknesses,
        allowed=np.array(allowed),
        passes=passes,
        governing=governing,
        normalized=normalized,
        check_normalized=check_normalized,
        width=width,
        thickness=thickness,
        message=message,
        suggestions=suggestions,
        checks=all_checks,
        extension=extension,
        extensions=extensions,
        length=trial.footing_length if best is not None else None,
    )


# How many passing sizes, in order of concrete, are tried against the design along the length (each
# costs a few milliseconds); beyond them the first is kept and the verdict says it fails.
ALONG_TRIES = 40


def _along_the_length(
    strength: CaseTable, widths: np.ndarray, thicknesses: np.ndarray, passes: np.ndarray, row: int, col: int
) -> tuple[int, int, int]:
    """The first size, in order of least B·t_f (ties thinner, then narrower), that passes the grid's
    checks and also the design along the length (:func:`engine.concrete.along.failing_case_along`, which
    the grid does not evaluate: it costs milliseconds a size). Returns (row, col, how many smaller
    passing sizes fail it); the grid's choice when none of the first ``ALONG_TRIES`` pass.

    ``strength`` is the wall's strength case table; it does not depend on the footing's size, so each
    size tried only needs its statics on it (the same numbers :func:`engine.results.check_wall` gets
    on a wall with that footing)."""
    from .concrete.along import failing_case_along

    designed = bool(strength.cases) and strength.concrete is not None  # else nothing to design along it
    rows, cols = np.nonzero(passes)
    order = np.lexsort((widths[cols], thicknesses[rows], np.round(thicknesses[rows] * widths[cols], 12)))
    failed: int | None = None  # the case that failed on the last size: tried first on the next
    for tried, i in enumerate(order[:ALONG_TRIES].tolist()):
        r, c = int(rows[i]), int(cols[i])
        if designed:
            failed = failing_case_along(strength, statics(strength, float(widths[c]), float(thicknesses[r])), failed)
        if not designed or failed is None:
            return r, c, tried
    return row, col, 0


def _why_this_length(project: Project, extensions: np.ndarray, k: int, any_passes: list[bool]) -> str:
    """Say what the chosen extension (index ``k``) saves against the shorter ones."""
    e = float(extensions[k])
    if k == 0:
        return "; no extension needed (the shortest footing has the least concrete)"
    if not any(any_passes[:k]):
        return f"; {format_length(e, project.units)} more at each end is the least extension that lets any size pass"
    return f"; {format_length(e, project.units)} more at each end gives the least concrete"


def _why_smallest(
    checks: tuple[Check, ...], check_normalized: np.ndarray, passes: np.ndarray, allowed: np.ndarray, row: int, col: int
) -> str:
    """Say which check the next smaller candidate along each axis fails."""
    parts = []
    for axis_name, r, c in (("narrower", row, col - 1), ("thinner", row - 1, col)):
        if r < 0 or c < 0:
            parts.append(f"the next {axis_name} candidate is outside the bounds")
            continue
        if not allowed[r, c]:
            parts.append(f"the next {axis_name} one is narrower than the wall it carries")
        elif not passes[r, c]:
            j = int(np.argmin(check_normalized[:, r, c]))
            value = float(check_normalized[j, r, c])
            parts.append(f"the next {axis_name} one fails {checks[j].title.lower()} (ratio/required {value:.3f})")
    return "smallest passing size: " + "; ".join(parts)


def _diagnose(
    project: Project,
    wall: Wall,
    table: CaseTable,
    widths: np.ndarray,
    thicknesses: np.ndarray,
    check_normalized: np.ndarray,
    allowed: np.ndarray,
    all_checks: tuple[Check, ...] | None = None,
) -> tuple[str, tuple[str, ...]]:
    """Why nothing passes: the failing check at the largest size, by how much, and what would help."""
    last_r, last_c = thicknesses.size - 1, widths.size - 1
    at_max = check_normalized[:, last_r, last_c]
    all_checks = all_checks or table.checks
    failing = [(all_checks[j], float(at_max[j])) for j in range(len(all_checks)) if at_max[j] < 1.0 - 1e-9]
    if not allowed[last_r, last_c]:
        return "even the widest candidate is narrower than the wall it carries", ("raise width_max above the wall thickness",)
    described = ", ".join(
        f"{c.title.lower()} has no equilibrium (the resultant falls beyond the footing's end)"
        if c.id == "bearing" and v == 0.0
        else f"{c.title.lower()} reaches {v:.0%} of its required ratio"
        for c, v in failing
    )
    size = f"{format_length(float(widths[-1]), project.units)} x {format_length(float(thicknesses[-1]), project.units)}"
    message = f"no candidate passes; at the largest size ({size}) {described}"
    suggestions = []
    for check, value in failing:
        helps = []
        j = all_checks.index(check)
        if widths.size > 1 and check_normalized[j, last_r, last_c - 1] < value - 1e-12:
            helps.append("a wider footing (raise width_max)")
        if thicknesses.size > 1 and check_normalized[j, last_r - 1, last_c] < value - 1e-12:
            helps.append("a deeper footing (raise thickness_max)")
        longer = _longer_probe(project, wall, widths[-1], thicknesses[-1], check) if check.per_case else None
        if longer is not None and longer > value + 1e-12:
            helps.append(f"a longer footing (extending each end by {LONGER_PROBE:.0%} of the wall length gives {longer:.0%})")
        if check.id == "embedment" and not helps:
            helps.append("a thicker footing or more soil cover (raise thickness_max)")
        if check.id == "bearing" and value == 0.0 and not helps:
            helps.append("a longer footing or more resisting dead load, to bring the resultant back onto the footing")
        if helps:
            suggestions.append(f"{check.title.lower()}: " + "; ".join(helps) + " would help")
        else:
            suggestions.append(f"{check.title.lower()}: no change of footing size helps; revisit the loads or the soil values")
    return message, tuple(suggestions)


def _longer_probe(project: Project, wall: Wall, width: float, thickness: float, check: Check) -> float | None:
    """Normalized ratio of ``check`` with each end extended by LONGER_PROBE of the wall length."""
    extra = LONGER_PROBE * wall.length
    footing = replace(
        wall.footing,
        width=float(width),
        thickness=float(thickness),
        extension_start=wall.footing.extension_start + extra,
        extension_end=wall.footing.extension_end + extra,
    )
    # loads keep their positions on the wall: moving the wall's start moves them with it
    longer = replace(wall, footing=footing)
    table = case_table(longer, project.soil, project.criteria, project.site)
    ev = evaluate(table, float(width), float(thickness))
    return float(ev.check_minima()[table.checks.index(check)]) if len(table.cases) else None

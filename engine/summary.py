"""Plain-text summary tables for the command line, and the words every table shares (formatting of
engine results only).

The words: a ratio that cannot be read as a number is said in words everywhere the results are shown
(the command-line tables, the schedule, the window's walls list, verdict and cases table):

* "no demand": the check has nothing to resist in any case (its ratio is infinite);
* "no equilibrium": the governing case has no equilibrium on the soil (the resultant falls beyond the
  footing's end, :mod:`engine.soil_pressure`), where the check's ratio is 0 by convention;
* "outside the sizing bounds": sizing found no passing size among its candidates.

A ratio is also said as a demand against a capacity (:func:`comparison_text`) with the margin left,
in percent (:func:`margin_text`).
"""

from __future__ import annotations

import math
from collections.abc import Sequence
from typing import Any

from . import CAUTION
from .errors import one_line
from .input_warnings import InputWarning
from .model import Project
from .results import Governing, WallResult
from .sizing import SizingResult
from .units import Kind, display_factor, format_length, format_quantity, unit_label

MOMENT_DECIMALS = 1  # a wall's overturning moments in kip·ft or kN·m: tenths are plenty (common practice)
NO_DEMAND = "no demand"
NO_EQUILIBRIUM = "no equilibrium"
OUTSIDE_BOUNDS = "outside the sizing bounds"


def no_equilibrium(g: Governing, result: WallResult | None = None) -> bool:
    """Whether ``g``'s ratio of 0 means its case has no equilibrium on the soil.

    The engine's evaluation marks each case stable or not (:mod:`engine.soil_pressure`); a check whose
    governing case is not stable and whose ratio is 0 (bearing, by its convention) has no number to show.
    Without ``result`` a bearing ratio of exactly 0 at a case is taken as that convention.
    """
    if g.ratio != 0.0 or g.case_index is None:
        return False
    if result is None:
        return g.check.id == "bearing"
    stable = result.evaluation.stable
    return 0 <= g.case_index < len(stable) and not bool(stable[g.case_index])


def state_words(g: Governing, result: WallResult | None = None) -> str:
    """ "no demand" or "no equilibrium" where ``g`` has no ratio to show as a number; "" otherwise."""
    if math.isinf(g.ratio):
        return NO_DEMAND
    if no_equilibrium(g, result):
        return NO_EQUILIBRIUM
    return ""


def ratio_text(g: Governing, result: WallResult | None = None) -> str:
    """ "1.37 >= 1.00 OK" style text of a governing ratio (no colour needed to read it), or its words."""
    words = state_words(g, result)
    if words == NO_DEMAND:
        return words
    if words:
        return f"{words} NG"
    verdict = "OK" if g.passes else "NG"
    sign = ">=" if g.passes else "<"
    return f"{g.ratio:.2f} {sign} {g.required:.2f} {verdict}"


def margin(ratio: float, required: float) -> float:
    """The share of the usable capacity a passing check leaves unused (derived here).

    With capacity C, demand Q and required ratio R (ratio = C / Q), the usable capacity is C / R, so
    margin = 1 - Q / (C / R) = 1 - R / ratio: 0.14 for 1,720 psf against 2,000 psf allowable.
    A failing check's shortfall is :func:`shortfall`.
    """
    return 1.0 - required / ratio


def shortfall(ratio: float, required: float) -> float:
    """The share of the needed capacity a failing check lacks (derived here): 1 - ratio / R.

    0.11 for 2,250 psf against 2,000 psf allowable (2,000 / 2,250 = 0.889 of what is needed).
    """
    return 1.0 - ratio / required


def margin_text(ratio: float, required: float, passes: bool) -> str:
    """ "14% margin" for a passing ratio, "11% short" for a failing one.

    A margin is rounded down, so it never reads larger than it is; a shortfall is rounded to the
    nearest percent but reads at least "1% short": a ratio that fails by a hair never reads "0% short".
    """
    if passes:
        return f"{max(0, math.floor(100.0 * margin(ratio, required) + 1e-9)):,d}% margin"
    return f"{max(1, round(100.0 * shortfall(ratio, required))):,d}% short"


def governing_record(result: WallResult, g: Governing) -> Any:
    """The engine's record of ``g``: its own for a check judged once, else its governing case's."""
    if g.record is not None:
        return g.record
    if g.case_index is None or not 0 <= g.case_index < len(result.cases):
        return None
    return result.cases[g.case_index].of(g.check)


def _per_length(value: float, kind: Kind, units: str) -> str:
    """A value per length of footing (N·m/m or N/m) in kip·ft/ft, kip/ft or kN·m/m, kN/m (2 decimals)."""
    force = display_factor(Kind.FORCE, units)
    length = display_factor(Kind.LENGTH, units)
    if kind is Kind.MOMENT:  # N·m/m is N: kip·ft/ft is kip
        return f"{value / force:,.2f} {unit_label(Kind.MOMENT, units)}/{unit_label(Kind.LENGTH, units)}"
    return f"{value / (force / length):,.2f} {unit_label(Kind.FORCE, units)}/{unit_label(Kind.LENGTH, units)}"


def _of(demand: str, capacity: str, word: str = "of") -> str:
    """ "1,720 of 2,000 psf" when both share the unit (the unit said once); else "Mu 1.20 of φMn 3.40 kip·ft/ft"."""
    d_num, _, d_unit = demand.rpartition(" ")
    c_num, _, c_unit = capacity.rpartition(" ")
    if d_unit == c_unit and d_num and c_num:
        return f"{d_num} {word} {c_num} {c_unit}"
    return f"{demand} {word} {capacity}"


def _close(a: float | None, b: float) -> bool:
    return a is not None and math.isfinite(b) and abs(a - b) <= 1e-9 * max(abs(a), abs(b), 1e-300)


def comparison_text(g: Governing, result: WallResult, units: str) -> str:
    """The demand against the capacity of ``g``, from its record, in the project's units.

    "1,720 of 2,000 psf allowable" (bearing), "43.2 against 118.0 kip·ft resisting" (overturning:
    the overturning moment against the resisting one about the toe), "3.10 against 4.12 kip resisting"
    (sliding: the shear against the resistance), "depth 2'-0\", 1'-6\" required" (embedment),
    "Mu 0.70 of φMn 38.40 kip·ft/ft" (flexure), "Vu 2.10 of φVc 9.32 kip/ft" (one-way shear). A
    flexure ratio set by the bars' development rather than by φMn says so ("ℓd 1'-4 1/2\" with
    4 1/2\" available"). A check whose record is not
    known here: "ratio 0.50 of 1.00 required". No demand and no equilibrium: those words.
    """
    words = state_words(g, result)
    if words:
        return words
    r = governing_record(result, g)
    q = format_quantity
    if r is None:
        return f"ratio {g.ratio:.2f} of {g.required:.2f} required"
    if hasattr(r, "resisting") and hasattr(r, "moment"):  # overturning, about the toe
        moments = (q(r.moment, Kind.MOMENT, units, MOMENT_DECIMALS), q(r.resisting, Kind.MOMENT, units, MOMENT_DECIMALS))
        return _of(*moments, "against") + " resisting"
    if hasattr(r, "resistance") and hasattr(r, "force"):  # sliding
        return _of(q(abs(r.force), Kind.FORCE, units), q(r.resistance, Kind.FORCE, units), "against") + " resisting"
    if hasattr(r, "pressure_compared") and hasattr(r, "allowable"):  # bearing
        shown = _of(q(r.pressure_compared, Kind.PRESSURE, units), q(r.allowable, Kind.PRESSURE, units))
        net = r.pressure_compared != r.q_max  # the net pressure is compared (soil.bearing_basis "net")
        return ("net " if net else "") + shown + " allowable"
    if hasattr(r, "depth") and hasattr(r, "required_depth"):  # embedment
        return f"depth {format_length(r.depth, units)}, {format_length(r.required_depth, units)} required"
    if hasattr(r, "moment_capacity") and hasattr(r, "moment"):  # flexure across the width
        moment = f"Mu {_per_length(r.moment, Kind.MOMENT, units)}"
        capacity = f"φMn {_per_length(r.moment_capacity, Kind.MOMENT, units)}"
        shown = _of(moment, capacity)
        if r.moment > 0.0 and _close(g.ratio, r.moment_capacity / r.moment):
            return shown
        if r.development_length and _close(g.ratio, max(r.development_available or 0.0, 0.0) / r.development_length):
            return (
                f"ℓd {format_length(r.development_length, units)} with "
                f"{format_length(max(r.development_available, 0.0), units)} available"
            )
        # another requirement sets the ratio; the record names it only when it fails ("message"), so
        # the ratio comes first and the moments after it
        rules = "h ≥ 8 in or the IBC 2021 1905.6.2 bars" if r.plain else "As,min, bar spacing, d or εt"
        limit = getattr(r, "message", "") or f"ratio {g.ratio:.2f} by {rules}"
        return f"{limit} ({shown})"
    if hasattr(r, "shear_capacity") and hasattr(r, "shear"):  # one-way shear across the width
        return _of(f"Vu {_per_length(r.shear, Kind.FORCE, units)}", f"φVc {_per_length(r.shear_capacity, Kind.FORCE, units)}")
    return f"ratio {g.ratio:.2f} of {g.required:.2f} required"


def verdict_text(g: Governing, result: WallResult | None = None) -> str:
    """ "14% margin", "11% short", or the words for no demand / no equilibrium (no colour needed)."""
    words = state_words(g, result)
    return words or margin_text(g.ratio, g.required, g.passes)


def case_text(g: Governing) -> str:
    if math.isinf(g.ratio) or not g.combination:
        return ""
    return g.combination if g.direction in ("none", "") else f"{g.combination} ({g.direction})"


def footing_text(width: float, thickness: float, length: float, units: str) -> str:
    return f"{format_length(width, units)} x {format_length(thickness, units)} x {format_length(length, units)}"


def _table(headers: Sequence[str], rows: Sequence[Sequence[str]]) -> str:
    widths = [max(len(h), *(len(r[i]) for r in rows)) if rows else len(h) for i, h in enumerate(headers)]
    line = "  ".join(h.ljust(w) for h, w in zip(headers, widths, strict=True))
    out = [line, "  ".join("-" * w for w in widths)]
    out += ["  ".join(c.ljust(w) for c, w in zip(r, widths, strict=True)) for r in rows]
    return "\n".join(line.rstrip() for line in out)


def check_table(project: Project, results: Sequence[WallResult]) -> str:
    """One row per wall: footing, the governing ratio of every registered check with its case, and the
    verdict; then the values taken by default, and the caution."""
    checks = tuple(results[0].governing) if results else ()
    headers = ["Wall", "Footing B x t_f x L_f", *[c.title for c in checks], "Governing case (worst)", "Result"]
    rows = []
    for r in results:
        worst = r.worst
        rows.append(
            [
                one_line(r.wall_id, 40),
                footing_text(r.width, r.thickness, r.length, project.units),
                *[ratio_text(r.governing[c], r) for c in checks],
                f"{worst.check.id}: {case_text(worst)}".rstrip(": "),
                "PASS" if r.passes_all else "FAIL",  # the design along the length included
            ]
        )
    failing = sum(not r.passes_all for r in results)
    title = f"{project.info.name or 'Project'}: {len(results)} wall(s), {failing} failing"
    listed = assumptions_text(project)
    return f"{title}\n\n{_table(headers, rows)}\n\n" + (f"{listed}\n\n" if listed else "") + CAUTION


def size_table(project: Project, sized: Sequence[SizingResult], results: Sequence[WallResult]) -> str:
    """One row per wall: the size found and the governing ratios at that size; where no candidate
    passes, "outside the sizing bounds" and why."""
    checks = tuple(results[0].governing) if results else ()
    headers = ["Wall", "Sized B x t_f x L_f", "Candidates", *[c.title for c in checks], "Why this size"]
    rows = []
    for s, r in zip(sized, results, strict=True):
        size = (
            footing_text(s.width, s.thickness, r.length, project.units)
            if s.feasible and s.width and s.thickness
            else OUTSIDE_BOUNDS
        )
        note = s.message if s.feasible else s.message + ". " + " ".join(s.suggestions)
        rows.append(
            [
                one_line(s.wall_id, 40),
                size,
                str(s.candidates),
                *[ratio_text(r.governing[c], r) if s.feasible else "-" for c in checks],
                note,
            ]
        )
    listed = assumptions_text(project)
    return f"{_table(headers, rows)}\n\n" + (f"{listed}\n\n" if listed else "") + CAUTION


def assumptions_text(project: Project) -> str:
    """The values taken by default, one per line with their basis ("" when every value was entered)."""
    if not project.assumptions:
        return ""
    rows = [[one_line(a.field, 60), one_line(a.value, 40), one_line(a.basis, 100)] for a in project.assumptions]
    return "Assumed (not in the project file; confirm, or enter the value):\n" + _table(["Field", "Value", "Basis"], rows)


def warnings_text(warnings: Sequence[InputWarning]) -> str:
    """Warnings, one line each, prefixed "warning:" (for stderr)."""
    return "\n".join(f"warning: {one_line(w.text)}" for w in warnings)

"""The wall's factored loads as loads on the footing-beam, for the design along the length.

For one strength case (a combination in one direction) the footing carries, as a beam along L_f
(statics; the soil pressure is the rigid-footing one of :mod:`engine.soil_pressure`):

* its factored self weight f_D W_f as a uniform line load over the whole length;
* the wall's factored vertical line and point loads where they act (mirrored about the wall's
  mid-length in direction "-" when they reverse);
* the overturning moment of the factored shears about the base, M = direction · sum f H (h + t_f),
  delivered as the wall's construction delivers it: a concrete or masonry wall as the linear
  pressure of a rigid wall (strips of uniform load whose moment is M and whose sum is zero); a
  light-frame wall as a chord couple at its ends, each chord ``chord_offset`` inside the wall's end
  (:func:`engine.concrete.longitudinal.chord_couple`).

The pressure under the footing balances all of it, so the diagram closes (V = M = 0 beyond the far
end), which the caller can check.
"""

from __future__ import annotations

from collections.abc import Sequence
from typing import TYPE_CHECKING, Any

import numpy as np

from ..loads import self_weight
from ..model import LateralLoad, LineLoad, LoadCase, PointLoad, WallConstruction
from .bars import parse_counted
from .longitudinal import (
    TOP_COVER,
    BeamArrays,
    BeamDiagram,
    LongitudinalDesign,
    bars_fail_anywhere,
    beam_arrays,
    chord_couple,
    design_longitudinal,
    given_bars_pass,
    rigid_soil_stations_of,
)
from .transverse import TOLERANCE

if TYPE_CHECKING:  # pragma: no cover
    from ..model import Reinforcement
    from ..stability import CaseTable, Evaluation, Statics
    from .bars import Bar
    from .transverse import Materials

# Strips that carry a rigid wall's overturning as a linear pressure along the wall (even, so the
# middle strip boundary sits at the wall's mid-length).
WALL_STRIPS = 24


def case_diagram(table: CaseTable, evaluation: Evaluation, index: int) -> BeamDiagram:
    """The beam diagram of strength case ``index`` on the size ``evaluation`` was made for (the loads
    of :func:`_case_beams`, that case alone)."""
    return _case_beams(table, evaluation.statics, only=[index]).diagram(0)


def case_diagrams(table: CaseTable, evaluation: Evaluation) -> list[BeamDiagram]:
    """The beam diagram of every strength case on the size ``evaluation`` was made for, at once.

    Each case's loads (the factored self weight over L_f, the wall's factored line and point loads,
    mirrored where a load reverses with the direction, and the overturning as a chord couple of a
    light-frame wall or a linear pressure along a rigid wall) handed to
    :func:`engine.concrete.longitudinal.beam_arrays` (numpy over cases); a property test compares
    it with :func:`engine.concrete.longitudinal.beam_diagram`, one load set at a time.
    """
    return _case_beams(table, evaluation.statics).diagrams() if table.cases else []


def _case_beams(table: CaseTable, state: Statics, only: Sequence[int] | None = None) -> BeamArrays:
    """:func:`case_diagrams` as the padded arrays of :func:`engine.concrete.longitudinal.beam_arrays`
    (at least one case), on the statics of one size; ``only`` these cases (row i is case only[i]),
    whose rows are those they have among all the cases (each row is computed on its own)."""
    wall = table.wall
    chosen = list(range(len(table.cases))) if only is None else list(only)
    width = float(np.asarray(state.width))
    thickness = float(np.asarray(state.thickness))
    length = table.length
    start = wall.footing.extension_start
    total = float(self_weight(wall, table.soil, width, thickness).total)
    wall_start, wall_end = start, start + wall.length
    light_frame = wall.construction is WallConstruction.LIGHT_FRAME
    strips: list[tuple[float, float, float]] = []
    if not light_frame:  # the strips of a rigid wall: their edges and the moment of a unit intensity
        edges = np.linspace(wall_start, wall_end, WALL_STRIPS + 1)
        mids = 0.5 * (edges[:-1] + edges[1:]) - 0.5 * (wall_start + wall_end)
        step = float(edges[1] - edges[0])
        unit = float(np.sum(step * mids * mids))
        strips = [(float(mids[j]), float(edges[j]), float(edges[j + 1])) for j in range(WALL_STRIPS)]
    vertical = np.asarray(state.vertical)[chosen].tolist()
    eccentricity = np.asarray(state.eccentricity)[chosen].tolist()
    lines_of, points_of = [], []
    for index in chosen:
        case = table.cases[index]
        combo, sign = case.combination, case.direction.sign
        lines: list[tuple[float, float, float]] = []
        points: list[tuple[float, float]] = []
        weight = total * combo.factor(LoadCase.D)
        if weight:
            lines.append((weight / length, 0.0, length))
        moment = 0.0
        for load in wall.loads:
            f = combo.factor(load.case)
            if f == 0.0:
                continue
            mirror = sign < 0 and getattr(load, "reverses", False)
            if isinstance(load, LineLoad):
                a, b = (wall.length - load.end, wall.length - load.start) if mirror else (load.start, load.end)
                lines.append((f * load.value, start + a, start + b))
            elif isinstance(load, PointLoad):
                at = wall.length - load.at if mirror else load.at
                points.append((f * load.value, start + at))
            elif isinstance(load, LateralLoad) and sign != 0:
                moment += sign * f * load.value * (load.height + thickness)
        if moment:
            if light_frame:
                chords = chord_couple(moment, wall_start=wall_start, wall_end=wall_end, offset=wall.chord_offset)
                points.extend((chord.value, chord.at) for chord in chords)
            else:
                scale = moment / unit  # sum w_i step (x_i - x_mid) = M
                lines.extend((scale * mid, a, b) for mid, a, b in strips)
        lines_of.append(lines)
        points_of.append(points)
    # cases with the same loads and the same N and e (combinations that differ only in load cases
    # the wall does not have) have the same diagram: computed once
    first: dict[tuple[object, ...], int] = {}
    inverse = [
        first.setdefault((n, e, tuple(lines), tuple(points)), len(first))
        for n, e, lines, points in zip(vertical, eccentricity, lines_of, points_of, strict=True)
    ]
    unique = list(first.values())
    rows = [inverse.index(u) for u in unique]  # a row of each distinct case
    soil = rigid_soil_stations_of(np.array([vertical[r] for r in rows]), np.array([eccentricity[r] for r in rows]), width, length)
    beams = beam_arrays(
        [x for x, _ in soil], [q for _, q in soil], width, [lines_of[r] for r in rows], [points_of[r] for r in rows]
    )
    return beams if len(rows) == len(inverse) else beams.rows(inverse)


def _setup(table: CaseTable, state: Statics) -> tuple[float, Materials, Reinforcement | None, float]:
    """What every case's design along the length shares: h (m), the materials, the bars given in the
    project and the diameter of the transverse layer under the bottom bars (m)."""
    from .transverse import Materials

    concrete = table.concrete
    if concrete is None:
        raise ValueError("the design along the length needs the project's concrete settings")
    thickness = float(np.asarray(state.thickness))
    materials = Materials(fc=concrete.fc, fy=concrete.fy, lam=concrete.lam, cover=concrete.cover)
    return thickness, materials, table.wall.footing.reinforcement, _transverse_layer(state)


def _chosen_bars(
    diagrams: list[BeamDiagram], thickness: float, materials: Materials, given: Reinforcement | None, layer: float
) -> tuple[tuple[int, Bar] | str | None, tuple[int, Bar] | str | None, int, int]:
    """The bottom and top bars (given, else chosen for the case with the largest sagging, and the one
    with the largest hogging, moment) and the indices of those two cases."""
    sag = int(np.argmax([d.max_moment for d in diagrams]))
    hog = int(np.argmin([d.min_moment for d in diagrams]))
    bottom = given.bottom if given is not None and given.bottom is not None else None
    top = given.top if given is not None and given.top is not None else None
    if bottom is None:
        chosen = design_longitudinal(diagrams[sag], thickness=thickness, materials=materials, top=top, layer_below=layer)
        bottom = (chosen.bottom.count, chosen.bottom.bar) if chosen.bottom.bar is not None else None
    if top is None:
        chosen = design_longitudinal(diagrams[hog], thickness=thickness, materials=materials, bottom=bottom, layer_below=layer)
        top = (chosen.top.count, chosen.top.bar) if chosen.top.bar is not None else None
    return bottom, top, sag, hog


def design_along(table: CaseTable, evaluation: Evaluation) -> tuple[LongitudinalDesign, int, BeamDiagram]:
    """Design the longitudinal bars for every strength case at the evaluated size (ACI 318-19).

    A plain footing (ACI 318-19 chapter 14) is first checked as plain concrete along its length: when
    its whole section carries every case's moment and shear (φMn = 0.60 · 5λ√f'c Sm and φVn = 0.60 ·
    (4/3)λ√f'c B h_s on h_s = h - 2 in; 14.5.1.7, 14.5.2.1, 14.5.5.1), the bars along it are the
    continuous bars the building code asks of it and carry no computed moment. Otherwise its bars are
    checked as below. Bars given in the project are checked; otherwise the bottom bars are chosen for the case with the
    largest sagging moment and the top bars for the case with the largest hogging one, and then every
    case is checked with those bars. Returns the design of the case that governs (the first failing
    one, else the one with the largest moment) with its index and diagram.
    """
    thickness, materials, given, layer = _setup(table, evaluation.statics)
    concrete = table.concrete
    assert concrete is not None
    if not table.cases:
        raise ValueError("no strength case")
    beams = _case_beams(table, evaluation.statics)
    diagrams = beams.diagrams()
    bottom, top, sag, hog = _chosen_bars(diagrams, thickness, materials, given, layer)
    largest = sag if diagrams[sag].max_moment >= -diagrams[hog].min_moment else hog
    plain = given is not None and given.plain
    width = float(np.asarray(evaluation.statics.width))
    if plain:  # the plain section first: when it carries every case, the bars are only checked at one
        phi_mn, phi_vn = _plain_capacities(width, thickness, concrete.fc, concrete.lam)
        if all(_plain_carries(d, phi_mn, phi_vn) for d in diagrams):
            one = design_longitudinal(
                diagrams[largest], thickness=thickness, materials=materials, bottom=bottom, top=top, layer_below=layer
            )
            return _plain_along([one], width, thickness, concrete.fc, concrete.lam)[0], largest, diagrams[largest]

    def design(i: int, words: bool) -> LongitudinalDesign:
        return design_longitudinal(
            diagrams[i], thickness=thickness, materials=materials, bottom=bottom, top=top, layer_below=layer, words=words
        )

    # every case checked quickly (all at once where both faces have bars); only the first failure of
    # the bars is worded (a search over the bars), and only the governing case's design is built
    designs: dict[int, LongitudinalDesign] = {}
    if bottom is not None and top is not None:
        faces = [
            given_bars_pass(
                beams, face, *(parse_counted(bars) if isinstance(bars, str) else bars),
                thickness=thickness, materials=materials, cover=cover, layer_below=below,
            )
            for face, bars, cover, below in (("bottom", bottom, materials.cover, layer), ("top", top, TOP_COVER, 0.0))
        ]  # fmt: skip
        bars_pass = [low and high for low, high in zip(*faces, strict=True)]
    else:
        designs = {i: design(i, False) for i in range(len(diagrams))}
        bars_pass = [d.passes for d in designs.values()]
    if plain:  # a case the plain section carries passes whatever its bars do
        carried = [_plain_carries(d, phi_mn, phi_vn) for d in diagrams]
        bars_pass = [c or ok for c, ok in zip(carried, bars_pass, strict=True)]
    first = next((i for i, ok in enumerate(bars_pass) if not ok), None)
    if first is not None:  # the governing failure, worded (the first one the design does not carry)
        designs[first] = design(first, True)
    index = first if first is not None else largest
    chosen = designs[index] if index in designs else design(index, False)
    if plain:
        chosen = _plain_along([chosen], width, thickness, concrete.fc, concrete.lam)[0]
    return chosen, index, diagrams[index]


def passes_along(table: CaseTable, evaluation: Evaluation) -> bool:
    """Whether :func:`design_along` passes at the evaluated size, without its words or its governing
    design (:func:`verdict_along` on the evaluation's statics)."""
    return verdict_along(table, evaluation.statics)


def verdict_along(table: CaseTable, state: Statics) -> bool:
    """Whether :func:`design_along` passes on the size of ``state`` (:func:`engine.stability.statics`):
    :func:`failing_case_along` finds no failing case."""
    return failing_case_along(table, state) is None


def failing_case_along(table: CaseTable, state: Statics, probe: int | None = None) -> int | None:
    """A strength case that fails the design along the length on the size of ``state``
    (:func:`engine.stability.statics`), or None when :func:`design_along` passes there: the same
    diagrams, bars and checks, without the words or the governing design.

    Every case passes when (for a plain footing) its plain section carries it or its bars do, and
    (otherwise) its bars do; the words :func:`design_along` adds to the first failure do not change
    whether it passes. Given bars that fail whatever the loads (As,min, fit, count) fail every case
    without a diagram; bars on both faces are checked for every case at once
    (:func:`engine.concrete.longitudinal.given_bars_pass`). Where each case's verdict is its own
    (the bars given, not chosen from all the cases), case ``probe`` (say the one that failed on the
    last size tried) is checked first, alone, and returned when it fails.
    """
    thickness, materials, given, layer = _setup(table, state)
    concrete = table.concrete
    assert concrete is not None
    k = len(table.cases)
    if not k:
        raise ValueError("no strength case")
    width = float(np.asarray(state.width))
    plain = given is not None and given.plain
    # given bars that fail whatever the loads (As,min, fit, count) fail every case; then only a plain
    # section that carries every case passes, and a reinforced footing fails without its diagrams
    hopeless = given is not None and any(
        bars is not None
        and bars_fail_anywhere(*bars, width=width, thickness=thickness, materials=materials, cover=cover, layer_below=below)
        for bars, cover, below in ((given.bottom, materials.cover, layer), (given.top, TOP_COVER, 0.0))
    )
    if hopeless and not plain:
        return 0
    phi_mn, phi_vn = _plain_capacities(width, thickness, concrete.fc, concrete.lam) if plain else (0.0, 0.0)
    both = given is not None and given.bottom is not None and given.top is not None

    def failing(beams: BeamArrays, cases: list[int], bottom: Any, top: Any) -> int | None:
        """The first of ``cases`` (rows of ``beams``) that fails with these bars on both faces."""
        rows = range(len(cases))
        carries = [
            plain and _plain_carries_values(beams.max_moment[i], beams.min_moment[i], beams.max_shear[i], phi_mn, phi_vn)
            for i in rows
        ]
        if hopeless or all(carries):
            return next((cases[i] for i in rows if not carries[i]), None)
        faces = [
            given_bars_pass(
                beams, face, *(parse_counted(bars) if isinstance(bars, str) else bars),
                thickness=thickness, materials=materials, cover=cover, layer_below=below,
            )
            for face, bars, cover, below in (("bottom", bottom, materials.cover, layer), ("top", top, TOP_COVER, 0.0))
        ]  # fmt: skip
        return next((cases[i] for i in rows if not (carries[i] or (faces[0][i] and faces[1][i]))), None)

    if probe is not None and 0 <= probe < k and (hopeless or both) and given is not None:
        if failing(_case_beams(table, state, [probe]), [probe], given.bottom, given.top) is not None:
            return probe
    beams = _case_beams(table, state)
    everyone = list(range(k))
    if hopeless or both:
        assert given is not None
        return failing(beams, everyone, given.bottom, given.top)
    carries = [
        plain and _plain_carries_values(beams.max_moment[i], beams.min_moment[i], beams.max_shear[i], phi_mn, phi_vn)
        for i in everyone
    ]
    if all(carries):
        return None
    diagrams = beams.diagrams()
    bottom, top, _, _ = _chosen_bars(diagrams, thickness, materials, given, layer)
    if bottom is not None and top is not None:
        return failing(beams, everyone, bottom, top)
    # a face without bars (none needed where they were chosen): case by case, as design_along
    for i, (diagram, carried) in enumerate(zip(diagrams, carries, strict=True)):
        if carried:
            continue
        design = design_longitudinal(
            diagram, thickness=thickness, materials=materials, bottom=bottom, top=top, layer_below=layer, words=False
        )
        if not design.passes:
            return i
    return None


def _transverse_layer(state: Statics) -> float:
    """The diameter of the transverse bars under the bottom longitudinal bars (m): the bars given or
    chosen across the width; 0 for a plain footing (common practice: the longitudinal bars sit on the
    transverse layer, so their d is one transverse bar less)."""
    from ..checks._strength import strength_grid
    from .bars import bar

    given = state.table.wall.footing.reinforcement
    if given is not None and given.plain:  # what strength_grid calls plain, without designing it
        return 0.0
    grid = strength_grid(state)
    if grid.plain:
        return 0.0
    size = int(np.asarray(grid.design.size))
    return bar(size).diameter if size > 0 else 0.0


def _plain_capacities(width: float, thickness: float, fc: float, lam: float) -> tuple[float, float]:
    """φMn and φVn of the whole plain section along the length (ACI 318-19 14.5.2.1, 14.5.5.1 on h_s
    of 14.5.1.7; b = B)."""
    from .plain import plain_moment_strength, plain_shear_strength, strength_thickness

    h_s = strength_thickness(thickness)
    return float(plain_moment_strength(width, h_s, fc, lam)), float(plain_shear_strength(width, h_s, fc, lam))


def _plain_carries(diagram: BeamDiagram, phi_mn: float, phi_vn: float) -> bool:
    return _plain_carries_values(diagram.max_moment, diagram.min_moment, diagram.max_shear, phi_mn, phi_vn)


def _plain_carries_values(max_moment: float, min_moment: float, max_shear: float, phi_mn: float, phi_vn: float) -> bool:
    """|M| <= φMn and |V| <= φVn of the plain section (ACI 318-19 14.5.2.1, 14.5.5.1)."""
    moment = max(abs(max_moment), abs(min_moment))
    return moment <= phi_mn * (1.0 + TOLERANCE) and max_shear <= phi_vn * (1.0 + TOLERANCE)


def _plain_along(
    designs: list[LongitudinalDesign], width: float, thickness: float, fc: float, lam: float
) -> list[LongitudinalDesign]:
    """The designs of a plain footing: each passes when the plain section carries its diagram
    (ACI 318-19 14.5.2.1 and 14.5.5.1 on h_s of 14.5.1.7, the whole width B as the section's b);
    when it does not, the bars' design stands, with the reason first."""
    from dataclasses import replace

    phi_mn, phi_vn = _plain_capacities(width, thickness, fc, lam)
    out = []
    for design in designs:
        if _plain_carries(design.diagram, phi_mn, phi_vn):
            out.append(
                replace(
                    design, passes=True, message="", plain_moment_capacity=phi_mn, plain_shear_capacity=phi_vn, plain_carries=True
                )
            )
        else:
            why = "the plain section does not carry the moment and shear along the length (ACI 318-19 14.5.2.1, 14.5.5.1)"
            if design.message:
                message = f"{why}; {design.message}"
            else:
                message = why + ("; the bars carry them" if design.passes else "; nor do the bars")
            out.append(
                replace(design, message=message, plain_moment_capacity=phi_mn, plain_shear_capacity=phi_vn, plain_carries=False)
            )
    return out

"""Drawings of the calculation package as simple shapes (points, y up): the beam diagrams along the footing.

Every value drawn is an engine value: the shear and moment at the nodes of
:class:`engine.concrete.longitudinal.BeamDiagram` (its :meth:`~BeamDiagram.drawing` points).
"""

from __future__ import annotations

import math
from collections.abc import Sequence

from ..concrete.longitudinal import BeamDiagram
from ..model import LateralLoad, LineLoad, PointLoad, Project, Wall
from ..results import Governing, WallResult
from ..soil_pressure import PressureDiagram
from ..units import Kind
from . import Arrow, Dimension, Drawing, Formatter, Label, Line, Polygon, Rect, Shape, case_name


def beam_drawing(diagram: BeamDiagram, fmt: Formatter, width: float, height: float, case: str) -> Drawing:
    """The footing-beam's shear V and moment M along x, one panel above the other, on one x scale.

    Positive M puts the bottom of the footing in tension (sagging) and is drawn upward; the extremes
    are labelled with their values and positions.
    """
    x, v, m = diagram.drawing()
    length = float(x[-1]) if len(x) else 1.0
    left, right = 64.0, 64.0
    panel = (height - 40.0) / 2.0
    sx = (width - left - right) / length if length > 0 else 1.0
    shapes: list[Shape] = []

    def X(value: float) -> float:
        return left + value * sx

    def panel_shapes(
        values: list[float], base: float, fill: str, name: str, text: str, extremes: list[tuple[float, float, str]]
    ) -> None:
        top = max(max(values, default=0.0), 0.0)
        bottom = min(min(values, default=0.0), 0.0)
        span = top - bottom
        scale = (panel - 12.0) / span if span > 0 else 0.0
        axis = base + 6.0 + (-bottom) * scale
        pts = [(X(0.0), axis)]
        pts += [(X(float(xx)), axis + float(val) * scale) for xx, val in zip(x, values, strict=True)]
        pts.append((X(length), axis))
        shapes.append(Polygon(tuple(pts), fill=fill, width=0.5))
        shapes.append(Line(X(0.0), axis, X(length), axis, 0.6))
        shapes.append(Label(X(0.0) - 4.0, axis - 2.5, name, "end", 7.0, bold=True, markup=True))
        shapes.append(Label(X(length) + 4.0, axis - 2.5, text, "start", 6.5))
        for at, value, words in extremes:
            if value == 0.0:
                continue
            y = axis + value * scale
            y_text = y + 2.5 if value > 0 else y - 8.0
            anchor = "start" if X(at) < left + 0.6 * (width - left - right) else "end"
            shapes.append(Line(X(at), axis, X(at), y, 0.4, dash=True))
            shapes.append(Label(X(at) + (3.0 if anchor == "start" else -3.0), y_text, words, anchor, 6.5))

    max_v_at = float(x[int(abs(v).argmax())]) if len(x) else 0.0
    v_max = float(v[int(abs(v).argmax())]) if len(x) else 0.0
    panel_shapes(
        [float(t) for t in v],
        panel + 28.0,
        "pressure",
        "V",
        fmt.unit(Kind.FORCE),
        [(max_v_at, v_max, f"{fmt.force(abs(v_max))} at x = {fmt.length(max_v_at)}")],
    )
    panel_shapes(
        [float(t) for t in m],
        12.0,
        "wall",
        "M",
        fmt.unit(Kind.MOMENT),
        [
            (
                diagram.max_moment_at,
                diagram.max_moment,
                f"+{fmt.moment(diagram.max_moment)} at x = {fmt.length(diagram.max_moment_at)}",
            ),
            (
                diagram.min_moment_at,
                diagram.min_moment,
                f"{fmt.moment(diagram.min_moment)} at x = {fmt.length(diagram.min_moment_at)}",
            ),
        ],
    )
    # the footing itself, as a strip across the top, with its ends
    shapes.append(Rect(X(0.0), height - 10.0, length * sx, 6.0, fill="concrete", width=0.5))
    # the ends named beside the strip, inside the drawing (above it they ran into the text over the drawing)
    shapes.append(Label(X(0.0) - 4.0, height - 9.5, "x = 0", "end", 6.5))
    shapes.append(Label(X(length) + 4.0, height - 9.5, "x = L_{f}", "start", 6.5, markup=True))
    caption = (
        f"The footing as a beam in {case}: shear V and moment M along x, to one horizontal scale "
        "(M drawn up where the bottom is in tension)."
    )
    return Drawing(width, height, tuple(shapes), caption)


# Drawing scales: (points per metre at 1:n, the printed name). US architectural and engineering
# scales; SI ratios (common practice).
_US_SCALES = (
    (16, '3/4" = 1\'-0"'),
    (24, '1/2" = 1\'-0"'),
    (32, '3/8" = 1\'-0"'),
    (48, '1/4" = 1\'-0"'),
    (64, '3/16" = 1\'-0"'),
    (96, '1/8" = 1\'-0"'),
    (128, '3/32" = 1\'-0"'),
    (192, '1/16" = 1\'-0"'),
    (240, '1" = 20\'-0"'),
    (360, '1" = 30\'-0"'),
    (384, '1/32" = 1\'-0"'),
    (480, '1" = 40\'-0"'),
    (600, '1" = 50\'-0"'),
    (1200, '1" = 100\'-0"'),
    (2400, '1" = 200\'-0"'),
)
_SI_SCALES = tuple((n, f"1:{n}") for n in (10, 20, 25, 50, 75, 100, 150, 200, 250, 500, 1000, 2000))
_POINTS_PER_METRE = 72.0 / 0.0254
# A generous average character width of the sans-serif drawing font, per point of size (for
# deciding whether a label fits; the renderer measures exactly).
_TEXT_WIDTH = 0.58
_CORNER_CLEAR = 6.0  # points: arrowheads nearer than this to the wall's top corner are moved apart


def drawing_scale(fit: float, units: str) -> tuple[float, str]:
    """The largest standard scale whose points per metre do not exceed ``fit``.

    Returns (points per metre, printed scale). Falls back to ``fit`` itself ("not to a standard
    scale") when even the smallest standard scale is too large.
    """
    for n, name in _US_SCALES if units == "US" else _SI_SCALES:
        ppm = _POINTS_PER_METRE / n
        if ppm <= fit:
            return ppm, name
    return fit, f"1:{_POINTS_PER_METRE / fit:,.0f}"


# Load tags: a small box holding the numbers of the loads table ("No.") next to the arrow it names.
_TAG_SIZE = 6.5  # points: the tag's text (the package's floor for drawings)
_TAG_PAD = 2.0  # points between the tag's text and its box
_TAG_H = 1.05 * _TAG_SIZE + 2 * _TAG_PAD  # the box's height
_LEVEL = 14.0  # points between the bars of line loads that overlap along the wall
_ARROW = 10.0  # points: length of a line load's arrow (drawn 0.6 pt wide; a point load's 0.7 pt)


def _text_width(text: str, size: float) -> float:
    """A generous estimate of a label's width in the drawing font (DejaVu Sans: digits 0.636 em)."""
    return sum((0.64 if c.isdigit() else 0.32 if c in ", ." else _TEXT_WIDTH) for c in text) * size


def _numbers(indexes: Sequence[int]) -> str:
    return ", ".join(str(k) for k in indexes)


def _tag(x: float, y: float, text: str, anchor: str) -> tuple[list[Shape], tuple[float, float]]:
    """A numbered tag whose box's lower edge is at ``y``; ``anchor`` places the box's "start", "middle"
    or "end" at ``x``. Returns its shapes and the box's horizontal extent."""
    w = _text_width(text, _TAG_SIZE) + 2 * _TAG_PAD
    x0 = {"start": x, "middle": x - w / 2.0, "end": x - w}[anchor]
    baseline = y + _TAG_PAD + 0.3 * _TAG_SIZE
    shapes: list[Shape] = [
        Rect(x0, y, w, _TAG_H, fill="none", width=0.5),
        Label(x0 + w / 2.0, baseline, text, "middle", _TAG_SIZE, bold=True, color="load"),
    ]
    return shapes, (x0, x0 + w)


def _levels(spans: Sequence[tuple[float, float]]) -> list[int]:
    """The lowest level for each span (in order) that no earlier span on that level overlaps."""
    taken: list[list[tuple[float, float]]] = []
    out: list[int] = []
    for a, b in spans:
        level = next(
            (k for k, row in enumerate(taken) if all(b <= c - 1e-9 or a >= d + 1e-9 for c, d in row)),
            len(taken),
        )
        if level == len(taken):
            taken.append([])
        taken[level].append((a, b))
        out.append(level)
    return out


def elevation_drawing(wall: Wall, fmt: Formatter, width: float, height: float) -> Drawing:
    """To-scale elevation of the wall on its footing, each load drawn as one arrow with a numbered tag.

    The tags carry the numbers of the loads table on the same sheet (its "No." column: case, type, value
    and position); loads that act at the same place in the same sense share an arrow and a tag. Line
    loads are a bar over the length they act on with one arrow at its middle (bars that overlap along
    the wall stand one above the other); point loads one arrow onto (or, for uplift, away from) the
    wall's top; in-plane shears an arrow at their height, pushing in direction +, whose heights are
    dimensioned on the right. ``height`` is the most the drawing may take; it shrinks to what it holds.
    """
    f = wall.footing
    length = wall.footing_length
    numbered = list(enumerate(wall.loads, start=1))
    laterals = [(i, ld) for i, ld in numbered if isinstance(ld, LateralLoad)]
    h_top = max([ld.height for _, ld in laterals] + [0.0])
    stem_h = wall.stem.height if wall.stem.present else 0.0
    wall_top = max(h_top, stem_h + 2.0)  # at least a stub of wall above the stem
    ws, we = f.extension_start, f.extension_start + wall.length

    # line loads: one bar per extent and sense; point loads: one arrow per position and sense
    bars: dict[tuple[float, float, bool], list[int]] = {}
    points: dict[tuple[float, bool], list[int]] = {}
    for i, ld in numbered:
        if isinstance(ld, LineLoad):
            bars.setdefault((round(ld.start, 6), round(ld.end, 6), ld.value < 0), []).append(i)
        elif isinstance(ld, PointLoad):
            points.setdefault((round(ld.at, 6), ld.value < 0), []).append(i)
    bar_keys = sorted(bars, key=lambda k: (k[2], k[0], -(k[1] - k[0])))  # downward first, then from the start
    levels = _levels([(a, b) for a, b, _ in bar_keys])
    n_levels = max(levels, default=-1) + 1
    bars_top = (4.0 + _LEVEL * n_levels) if bars else 0.0
    stalk = bars_top + 14.0  # points: a point load's arrow reaches above every bar
    above = (stalk + 2.0 + _TAG_H if points else bars_top) + 4.0
    left_margin, right_margin, bottom_margin = 86.0, 46.0, 34.0
    fit = min((width - left_margin - right_margin) / length, (height - bottom_margin - above) / (wall_top + f.thickness))
    s, scale_name = drawing_scale(fit, fmt.units)
    height = bottom_margin + (wall_top + f.thickness) * s + above  # the box shrinks to what it holds
    x0 = left_margin + ((width - left_margin - right_margin) - length * s) / 2.0
    y0 = bottom_margin + f.thickness * s  # top of footing

    def X(x: float) -> float:
        return x0 + x * s

    def Y(y: float) -> float:
        return y0 + y * s

    shapes: list[Shape] = []
    # grade line over the footing
    grade = Y(f.cover)
    shapes.append(Line(X(0) - 14, grade, X(length) + 8, grade, 0.5, dash=True, color="soil"))
    shapes.append(Label(X(0) - 16, grade - 2, "grade", "end", 6.5, color="soil"))
    if f.cover > 0:
        shapes.append(Rect(X(0), Y(0), length * s, f.cover * s, fill="soil", width=0))
    # footing
    shapes.append(Rect(X(0), Y(-f.thickness), length * s, f.thickness * s, fill="concrete"))
    # stem (full footing length) and wall
    base = 0.0
    if wall.stem.present:
        shapes.append(Rect(X(0), Y(0), length * s, stem_h * s, fill="stem"))
        base = stem_h
    shapes.append(Rect(X(ws), Y(base), wall.length * s, (wall_top - base) * s, fill="wall"))
    top = Y(wall_top)
    # in-plane shears: one arrow per height, tagged at its tail
    heights: dict[float, list[int]] = {}
    for i, ld in laterals:
        heights.setdefault(round(ld.height, 6), []).append(i)
    for y, idx in sorted(heights.items()):
        yy = Y(y)
        shapes.append(Arrow(X(ws) - 26, yy, X(ws), yy))
        shapes += _tag(X(ws) - 28, yy - _TAG_H / 2.0, _numbers(idx), "end")[0]
    for k, y in enumerate(sorted(heights)):
        shapes.append(Dimension(X(length), Y(0), X(length), Y(y), fmt.length(y), offset=14.0 + 18.0 * k))
    # point loads: an arrow from above every bar down onto the wall (uplift: from the wall upward)
    shear_at_top = any(abs(Y(ld.height) - top) < _CORNER_CLEAR for _, ld in laterals)
    stalks: list[float] = []
    for (at, up), idx in sorted(points.items()):
        xx = X(ws + at)
        stalks.append(xx)
        # a shear arrow at the wall's top corner: keep the point load's arrowhead clear above it
        gap = 7.0 if shear_at_top and abs(xx - X(ws)) < _CORNER_CLEAR else 1.0
        if up:
            shapes.append(Arrow(xx, top + gap, xx, top + stalk, 0.7))
        else:
            shapes.append(Arrow(xx, top + stalk, xx, top + gap, 0.7))
        shapes += _tag(xx, top + stalk + 2.0, _numbers(idx), "middle")[0]
    # line loads: a bar over the loaded length, one arrow at a free place along it, the tag beside it
    for (a, b, up), level in zip(bar_keys, levels, strict=True):
        xa, xb = X(ws + a), X(ws + b)
        yb = top + 4.0 + _LEVEL * level
        text = _numbers(bars[(a, b, up)])
        shapes.append(Line(xa, yb, xb, yb, 0.8, color="load"))
        shapes.append(Line(xa, yb - 2.0, xa, yb + 2.0, 0.8, color="load"))
        shapes.append(Line(xb, yb - 2.0, xb, yb + 2.0, 0.8, color="load"))
        w = _text_width(text, _TAG_SIZE) + 2 * _TAG_PAD
        candidates = [(xa + xb) / 2.0 + t * (xb - xa) for t in (0.0, -0.2, 0.2, -0.35, 0.35)]

        def clear(xm: float, w: float = w) -> bool:
            return all(abs(xm - p) > 3.0 and not (xm + 1.0 <= p <= xm + 3.0 + w) for p in stalks)

        xm = next((c for c in candidates if clear(c)), candidates[0])
        stalks.append(xm)  # the next bar's arrow stands elsewhere
        if up:
            shapes.append(Arrow(xm, yb, xm, yb + _ARROW, 0.6))
        else:
            shapes.append(Arrow(xm, yb + _ARROW, xm, top + 0.5, 0.6))
        shapes += _tag(xm + 2.0, yb + 1.5, text, "start")[0]
    # dimensions: footing length, extensions and wall length, footing thickness
    shapes.append(
        Dimension(X(0), Y(-f.thickness), X(length), Y(-f.thickness), f"L_{{f}} = {fmt.length(length)}", offset=-18.0, markup=True)
    )
    if f.extension_start > 0:
        shapes.append(
            Dimension(X(0), Y(-f.thickness), X(ws), Y(-f.thickness), fmt.length(f.extension_start), offset=-8.0, outside="start")
        )
    if f.extension_end > 0:
        shapes.append(Dimension(X(we), Y(-f.thickness), X(length), Y(-f.thickness), fmt.length(f.extension_end), offset=-8.0))
    wall_text = f"wall, {fmt.length(wall.length)} long"
    if wall.length * s > _text_width(wall_text, 6.5) + 6.0:
        shapes.append(Label(X(ws + wall.length / 2), Y((base + wall_top) / 2) - 2.0, wall_text, "middle", 6.5))
    else:  # a narrow wall: the text runs up it
        shapes.append(Label(X(ws + wall.length / 2) + 2.0, Y((base + wall_top) / 2), wall_text, "middle", 6.5, angle=90.0))
    if wall.stem.present:
        # the stem's words in the taller of its parts below and above grade, when they fit there
        parts = [(0.0, min(f.cover, stem_h)), (min(f.cover, stem_h), stem_h)]
        lo, hi = max(parts, key=lambda p: p[1] - p[0])
        stem_text = f"stem wall, {fmt.length(stem_h)} high"
        if (hi - lo) * s >= 9.0 and length * s > _text_width(stem_text, 6.5) + 4.0:
            shapes.append(Label(X(length / 2), Y((lo + hi) / 2) - 2.2, stem_text, "middle", 6.5))
    shapes.append(Label(X(0), Y(-f.thickness) - 30, "x = 0", "middle", 6.5))
    shapes.append(Label(X(length), Y(-f.thickness) - 30, "x = L_{f}", "middle", 6.5, markup=True))
    caption = (
        f"Elevation along the wall, scale {scale_name} (printed at 100%). Each arrow's tag gives its loads' numbers "
        "in the loads table below; loads that reverse are drawn for direction + (to the right); the wall is drawn "
        "to the highest shear."
    )
    return Drawing(width, height, tuple(shapes), caption)


def section_drawing(wall: Wall, project: Project, fmt: Formatter, width: float, height: float) -> Drawing:
    """To-scale section across the footing: width B, thickness t_f, soil cover h_s, wall and stem thicknesses."""
    f = wall.footing
    stem_h = wall.stem.height if wall.stem.present else 0.0
    above = max(f.cover, stem_h) + 0.6  # show the wall a little above grade or the stem
    margin_x, bottom, top = 24.0, 30.0, 22.0
    fit = min((width - 2 * margin_x) / f.width, (height - bottom - top) / (above + f.thickness))
    s, scale_name = drawing_scale(fit, fmt.units)
    cx = width / 2.0
    y0 = bottom + f.thickness * s

    def Y(y: float) -> float:
        return y0 + y * s

    shapes: list[Shape] = []
    half = f.width * s / 2.0
    if f.cover > 0:
        shapes.append(Rect(cx - half - 12, Y(0), f.width * s + 24, f.cover * s, fill="soil", width=0))
    shapes.append(Line(cx - half - 14, Y(f.cover), cx + half + 14, Y(f.cover), 0.5, dash=True, color="soil"))
    shapes.append(Rect(cx - half, Y(-f.thickness), f.width * s, f.thickness * s, fill="concrete"))
    base = 0.0
    if wall.stem.present:
        ts = wall.stem.thickness * s
        shapes.append(Rect(cx - ts / 2, Y(0), ts, stem_h * s, fill="stem"))
        base = stem_h
    tw = wall.thickness * s
    shapes.append(Rect(cx - tw / 2, Y(base), tw, (above - base) * s, fill="wall"))
    # thickness of the wall across its top, and of the stem across its mid-height
    shapes.append(
        Dimension(cx - tw / 2, Y(above), cx + tw / 2, Y(above), f"t_{{w}} = {fmt.length(wall.thickness)}", 8.0, markup=True)
    )
    if wall.stem.present:
        ts = wall.stem.thickness * s
        yy = Y(min(stem_h, f.cover if f.cover > 0 else stem_h) / 2)  # clear of the grade line
        shapes.append(
            Dimension(cx - ts / 2, yy, cx + ts / 2, yy, f"t_{{stem}} = {fmt.length(wall.stem.thickness)}", 0.0, markup=True)
        )
    shapes.append(Dimension(cx - half, Y(-f.thickness), cx + half, Y(-f.thickness), f"B = {fmt.length(f.width)}", offset=-12.0))
    shapes.append(Dimension(cx + half, Y(-f.thickness), cx + half, Y(0), fmt.length(f.thickness), offset=10.0))
    if f.cover > 0:
        shapes.append(Dimension(cx - half, Y(0), cx - half, Y(f.cover), fmt.length(f.cover), offset=-10.0))
    return Drawing(width, height, tuple(shapes), f"Section across the footing, scale {scale_name}.")


_LABEL_STEP = 8.0  # points between the baselines of labels stacked in a margin (6 pt text)


def _stack(wanted: Sequence[float], highest: float) -> list[float]:
    """Baselines for margin labels wanted at ``wanted`` (points, y up), kept at least
    :data:`_LABEL_STEP` apart and no higher than ``highest``; the order of the labels is kept."""
    order = sorted(range(len(wanted)), key=lambda k: -wanted[k])
    out = [0.0] * len(wanted)
    limit = highest
    for k in order:
        out[k] = min(wanted[k], limit)
        limit = out[k] - _LABEL_STEP
    return out


def pressure_drawing(
    diagram: PressureDiagram, allowable: float, result: WallResult, g: Governing, fmt: Formatter, width: float, height: float
) -> Drawing:
    """Soil pressure under the footing in the governing bearing case, with the allowable line.

    The values are written in the side margins at the level they mark (q_max at the peak's end, q_min at
    the other end, q_a at the end away from the peak), so no label crosses the outline, the fill or the
    dashed allowable line; the contact length is dimensioned below the lowest line. ``height`` is the
    most the drawing may take; it shrinks to what it holds.
    """
    length = result.length
    left = right = 74.0
    top = 48.0
    depth = height - top - 44.0  # points for the deeper of q_max and q_a
    sx = (width - left - right) / length
    q_top = max(diagram.q_max if math.isfinite(diagram.q_max) else 0.0, allowable)
    sy = depth / q_top if q_top > 0 else 0.0
    partial = diagram.stable and diagram.contact_end - diagram.contact_start < length * (1 - 1e-9)
    # below the lowest line: the contact dimension (text above its line), or room for two margin labels
    # pushed apart (q_min and q_a at one end)
    below = 18.0 if partial else 14.0
    height = top + depth + below
    y_base = height - top  # underside of the footing; pressure drawn downward from it
    y_low = y_base - q_top * sy  # the lowest of the peak and the allowable line

    def X(x: float) -> float:
        return left + x * sx

    shapes: list[Shape] = []
    # footing strip and the kern (middle third)
    shapes.append(Rect(X(0), y_base, length * sx, 10.0, fill="concrete"))
    k1, k2 = diagram.kern
    shapes.append(Line(X(k1), y_base + 10, X(k1), y_base + 16, 0.6))
    shapes.append(Line(X(k2), y_base + 10, X(k2), y_base + 16, 0.6))
    shapes.append(Line(X(k1), y_base + 16, X(k2), y_base + 16, 0.6))
    kern_text = "kern (middle third)"
    kern_w = _TEXT_WIDTH * 5.5 * len(kern_text) + 3.0
    xr = X(diagram.resultant_x) if diagram.stable else X(length / 2)
    # the kern's name beside its bracket, on the side away from the resultant's arrow
    if X(k1) - 3 - kern_w < xr < X(k1) + 2:
        shapes.append(Label(X(k2) + 3, y_base + 13, kern_text, "start", 5.5))
    else:
        shapes.append(Label(X(k1) - 3, y_base + 13, kern_text, "end", 5.5))
    ya = y_base - allowable * sy
    shapes.append(Line(X(0), ya, X(length), ya, 0.8, dash=True, color="allow"))
    # margin labels: (end, wanted baseline, text, bold, colour); end 0 = left margin, 1 = right margin
    margin: list[tuple[int, float, str, bool, str]] = []
    if diagram.stable:
        pts = tuple((X(float(x)), y_base - float(q) * sy) for x, q in zip(diagram.x, diagram.q, strict=True))
        shapes.append(Polygon(pts, fill="pressure"))
        # the resultant N
        shapes.append(Arrow(xr, y_base + 36, xr, y_base + 11, 1.0))
        assert g.case_index is not None
        case = result.cases[g.case_index]
        text = f"N = {fmt.force(case.vertical)}"
        if case.bearing is not None:
            text += f" at e = {fmt.decimal(case.bearing.eccentricity)}"
        shapes.append(Label(xr, y_base + 38, text, "middle", 6.0, color="load"))
        # pressure values beside the ends of the block, at their levels
        peak_left = float(diagram.q[1]) >= float(diagram.q[2])
        peak_end, other_end = (0, 1) if peak_left else (1, 0)
        margin.append((peak_end, y_base - diagram.q_max * sy - 2, f"q_{{max}} = {fmt.pressure(diagram.q_max)}", True, "ink"))
        if diagram.q_min > 0:
            margin.append(
                (other_end, y_base - diagram.q_min * sy - 2, f"q_{{min}} = {fmt.pressure(diagram.q_min)}", False, "ink")
            )
        if partial:
            shapes.append(
                Dimension(
                    X(diagram.contact_start),
                    y_base,
                    X(diagram.contact_end),
                    y_base,
                    f"contact a = {fmt.length(diagram.contact_end - diagram.contact_start)}",
                    offset=-(y_base - y_low + 12.0),
                )
            )
    else:
        peak_end, other_end = 0, 1
        shapes.append(
            Label(
                width / 2,
                y_base - 30,
                "no equilibrium: the resultant is outside the footing",
                "middle",
                7.0,
                bold=True,
                color="fail",
            )
        )
    margin.append((other_end, ya - 2, f"q_{{a}} = {fmt.pressure(allowable)}", False, "allow"))
    for end in (0, 1):
        items = [m for m in margin if m[0] == end]
        for (_, _, text, bold, color), y in zip(items, _stack([m[1] for m in items], y_base - 8.0), strict=True):
            x, anchor = (X(0) - 4, "end") if end == 0 else (X(length) + 4, "start")
            shapes.append(Label(x, y, text, anchor, 6.0, bold=bold, color=color, markup=True))
    shapes.append(Label(X(0) - 4, y_base + 2, "x = 0", "end", 5.5))
    shapes.append(Label(X(length) + 4, y_base + 2, "x = L_{f}", "start", 5.5, markup=True))
    caption = (
        f"Soil pressure in the governing bearing case {case_name(g.combination, g.direction)} "
        "(pressures drawn downward to a uniform scale; dashed: allowable)."
    )
    return Drawing(width, height, tuple(shapes), caption)

"""Drawings of the calculation package as simple shapes (points, y up): the beam diagrams along the footing.

Every value drawn is an engine value: the shear and moment at the nodes of
:class:`engine.concrete.longitudinal.BeamDiagram` (its :meth:`~BeamDiagram.drawing` points).
"""

from __future__ import annotations

import math
from collections.abc import Sequence

from ..concrete.longitudinal import BeamDiagram
from ..loads import lateral_resultants
from ..model import LineLoad, PointLoad, Project, Wall
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
    shapes.append(Label(X(0.0), height - 2.0, "x = 0", "middle", 6.5))
    shapes.append(Label(X(length), height - 2.0, "x = L_{f}", "middle", 6.5, markup=True))
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


def _group_loads(items: Sequence[tuple[float, str]]) -> list[tuple[float, str]]:
    """Merge labels of loads at the same position."""
    out: dict[float, list[str]] = {}
    for x, text in items:
        key = round(x, 6)
        out.setdefault(key, []).append(text)
    return [(x, ", ".join(t)) for x, t in sorted(out.items())]


def elevation_drawing(wall: Wall, fmt: Formatter, width: float, height: float) -> Drawing:
    """To-scale elevation of the wall on its footing with its loads and dimensions (points)."""
    f = wall.footing
    length = wall.footing_length
    laterals = lateral_resultants(wall)
    h_top = max([h.height for h in laterals] + [0.0])
    stem_h = wall.stem.height if wall.stem.present else 0.0
    wall_top = max(h_top, stem_h + 2.0)  # at least a stub of wall above the stem
    line_loads = [ld for ld in wall.loads if isinstance(ld, LineLoad)]
    point_loads = [ld for ld in wall.loads if isinstance(ld, PointLoad)]
    band = 10.0 * len(line_loads) + (24.0 if point_loads else 0.0)
    left_margin, right_margin, bottom_margin, top_margin = 86.0, 46.0, 32.0, 14.0 + band
    fit = min((width - left_margin - right_margin) / length, (height - bottom_margin - top_margin) / (wall_top + f.thickness))
    s, scale_name = drawing_scale(fit, fmt.units)
    height = bottom_margin + (wall_top + f.thickness) * s + top_margin  # the box shrinks to what it holds
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
    shapes.append(Label(X(0) - 16, grade - 2, "grade", "end", 5.5, color="soil"))
    if f.cover > 0:
        shapes.append(Rect(X(0), Y(0), length * s, f.cover * s, fill="soil", width=0))
    # footing
    shapes.append(Rect(X(0), Y(-f.thickness), length * s, f.thickness * s, fill="concrete"))
    # stem (full footing length) and wall
    base = 0.0
    if wall.stem.present:
        shapes.append(Rect(X(0), Y(0), length * s, stem_h * s, fill="stem"))
        base = stem_h
    ws, we = f.extension_start, f.extension_start + wall.length
    shapes.append(Rect(X(ws), Y(base), wall.length * s, (wall_top - base) * s, fill="wall"))
    # break mark at the top of the wall (the wall continues above)
    top = Y(wall_top)
    shapes.append(Line(X(ws) + 0.45 * wall.length * s, top, X(ws) + 0.5 * wall.length * s, top + 4, 0.6, color="paper"))
    # lateral loads: arrows at their heights pushing in direction +
    for y, text in _group_loads([(h.height, f"{h.case.value} {fmt.force(h.force)}") for h in laterals]):
        yy = Y(y)
        shapes.append(Arrow(X(ws) - 30, yy, X(ws), yy))
        shapes.append(Label(X(ws) - 33, yy - 2, text, "end", 6.0, color="load"))
    # heights of lateral loads above the top of footing, on the right
    for k, (y, _) in enumerate(_group_loads([(h.height, "") for h in laterals])):
        shapes.append(Dimension(X(length), Y(0), X(length), Y(y), fmt.length(y), offset=14.0 + 18.0 * k))
    # vertical loads: line loads as bands of arrows above the wall, point loads as single arrows
    y_band = top + 8.0
    for ld in line_loads:
        xa, xb = X(f.extension_start + ld.start), X(f.extension_start + ld.end)
        down = ld.value >= 0
        shapes.append(Line(xa, y_band + 8, xb, y_band + 8, 0.5, color="load"))
        n = max(2, int((xb - xa) / 18.0) + 1)
        for k in range(n):
            xx = xa + (xb - xa) * k / (n - 1)
            if down:
                shapes.append(Arrow(xx, y_band + 8, xx, y_band + 1, 0.5))
            else:
                shapes.append(Arrow(xx, y_band + 1, xx, y_band + 8, 0.5))
        text = f"{ld.case.value} {fmt.line_load(ld.value)}" + (" (reverses)" if ld.reverses else "")
        shapes.append(Label(xa - 4, y_band + 2, text, "end", 5.5, color="load"))
        y_band += 10.0
    shear_at_top = any(abs(Y(h.height) - top) < _CORNER_CLEAR for h in laterals)
    if point_loads:
        items = [
            (f.extension_start + p.at, f"{p.case.value} {fmt.force(p.value)}" + (" rev." if p.reverses else ""))
            for p in point_loads
        ]
        for up in (False, True):  # downward (compression) and upward (uplift) loads drawn apart
            group = [it for it, p in zip(items, point_loads, strict=True) if (p.value < 0) == up]
            for x, text in _group_loads(group):
                xx = X(x)
                # a shear arrow at the wall's top corner: keep the point load's arrowhead clear above it
                gap = 7.0 if shear_at_top and abs(xx - X(ws)) < _CORNER_CLEAR else 2.0
                if up:  # uplift: the arrow leaves the top of the wall, pointing up
                    shapes.append(Arrow(xx, top + gap, xx, y_band + 16, 0.7))
                else:
                    shapes.append(Arrow(xx, y_band + 16, xx, top + gap, 0.7))
                shapes.append(Label(xx, y_band + 18, text, "middle", 5.5, color="load"))
    # dimensions: footing length, extensions and wall length, footing thickness
    shapes.append(
        Dimension(X(0), Y(-f.thickness), X(length), Y(-f.thickness), f"L_{{f}} = {fmt.length(length)}", offset=-18.0, markup=True)
    )
    if f.extension_start > 0 or f.extension_end > 0:
        if f.extension_start > 0:
            shapes.append(
                Dimension(
                    X(0), Y(-f.thickness), X(ws), Y(-f.thickness), fmt.length(f.extension_start), offset=-8.0, outside="start"
                )
            )
        if f.extension_end > 0:
            shapes.append(Dimension(X(we), Y(-f.thickness), X(length), Y(-f.thickness), fmt.length(f.extension_end), offset=-8.0))
    wall_text = f"wall, {fmt.length(wall.length)} long"
    if wall.length * s > _TEXT_WIDTH * 6.0 * len(wall_text) + 6.0:
        shapes.append(Label(X(ws + wall.length / 2), Y((base + wall_top) / 2), wall_text, "middle", 6.0))
    else:  # a narrow wall: the text runs up it
        shapes.append(Label(X(ws + wall.length / 2) + 2.0, Y((base + wall_top) / 2), wall_text, "middle", 6.0, angle=90.0))
    if wall.stem.present:
        shapes.append(Label(X(ws + wall.length / 2), Y(stem_h / 2) - 2, f"stem wall, {fmt.length(stem_h)} high", "middle", 5.5))
    shapes.append(Label(X(0), Y(-f.thickness) - 30, "x = 0", "middle", 5.0))
    shapes.append(Label(X(length), Y(-f.thickness) - 30, "x = L_{f}", "middle", 5.0, markup=True))
    caption = f"Elevation along the wall, scale {scale_name} (printed at 100%); wall drawn to the highest lateral load; + direction to the right."
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

"""Drawings of the calculation package as simple shapes (points, y up): the beam diagrams along the footing.

Every value drawn is an engine value: the shear and moment at the nodes of
:class:`engine.concrete.longitudinal.BeamDiagram` (its :meth:`~BeamDiagram.drawing` points).
"""

from __future__ import annotations

from typing import TYPE_CHECKING

from ..concrete.longitudinal import BeamDiagram
from ..units import Kind

if TYPE_CHECKING:  # pragma: no cover
    from . import Drawing, Formatter, Shape


def beam_drawing(diagram: BeamDiagram, fmt: Formatter, width: float, height: float, case: str) -> Drawing:
    """The footing-beam's shear V and moment M along x, one panel above the other, on one x scale.

    Positive M puts the bottom of the footing in tension (sagging) and is drawn upward; the extremes
    are labelled with their values and positions.
    """
    from . import Drawing, Label, Line, Polygon, Rect

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

"""Geometry of the package's drawings: labels clear of lines and fills, subscripts, no empty bands.

Source: plan-checker review of the demo package, item 9 (labels struck through by the allowable line,
touching a dimension line, crossed by the pressure outline, inside the fill) and item 16 (gap between a
pressure diagram and its caption; arrowheads meeting at the wall's top corner) — common practice of
drafting: a label never shares its space with a line it does not name.
"""

from __future__ import annotations

from collections.abc import Iterator

import pytest
from kernline.engine.calc_package import (
    CONTENT_WIDTH,
    Arrow,
    Dimension,
    Drawing,
    Label,
    Line,
    Polygon,
    Rect,
    _Fmt,
    elevation_drawing,
    formula,
    pressure_drawing,
    section_drawing,
)
from kernline.engine.model import Check
from kernline.engine.results import check_wall
from kernline.engine.soil_pressure import pressure_diagram

WALLS = ("N1", "S2", "C3", "E4")
Box = tuple[float, float, float, float]  # x0, y0, x1, y1
Segment = tuple[float, float, float, float]


def _label_box(label: Label) -> Box:
    """The label's box as the renderer draws it (the package's font, subscripts at their size)."""
    from kernline.engine.report import _SUB_SCALE, _fonts
    from reportlab.pdfbase.pdfmetrics import stringWidth

    fonts = _fonts()
    font = fonts.bold if label.bold else fonts.regular
    runs = formula(label.text) if label.markup else formula(label.text.replace("_{", "_ {"))
    w = sum(stringWidth(r.text, font, label.size * (_SUB_SCALE if r.sub else 1.0)) for r in runs)
    x0 = {"start": label.x, "middle": label.x - w / 2, "end": label.x - w}[label.anchor]
    assert label.angle == 0.0
    return (x0, label.y - 0.3 * label.size, x0 + w, label.y + 0.75 * label.size)


def _segments(drawing: Drawing) -> Iterator[Segment]:
    """Every stroked line of the drawing (outlines, dimension and extension lines, arrows)."""
    for s in drawing.shapes:
        if isinstance(s, Line | Arrow):
            yield (s.x1, s.y1, s.x2, s.y2)
        elif isinstance(s, Rect) and s.width > 0:
            corners = [(s.x, s.y), (s.x + s.w, s.y), (s.x + s.w, s.y + s.h), (s.x, s.y + s.h)]
            yield from ((*corners[k], *corners[(k + 1) % 4]) for k in range(4))
        elif isinstance(s, Polygon):
            pts = s.points
            yield from ((*pts[k], *pts[(k + 1) % len(pts)]) for k in range(len(pts)))
        elif isinstance(s, Dimension) and s.y1 == s.y2:
            y = s.y1 + s.offset
            yield (s.x1, y, s.x2, y)
            yield (s.x1, s.y1, s.x1, y)
            yield (s.x2, s.y2, s.x2, y)


def _crosses(seg: Segment, box: Box) -> bool:
    """Whether a segment passes through a box (Liang-Barsky clipping)."""
    x1, y1, x2, y2 = seg
    bx0, by0, bx1, by1 = box
    t0, t1 = 0.0, 1.0
    dx, dy = x2 - x1, y2 - y1
    for p, q in ((-dx, x1 - bx0), (dx, bx1 - x1), (-dy, y1 - by0), (dy, by1 - y1)):
        if p == 0:
            if q < 0:
                return False
        else:
            t = q / p
            if p < 0:
                t0 = max(t0, t)
            else:
                t1 = min(t1, t)
            if t0 > t1:
                return False
    return True


def _inside(point: tuple[float, float], polygon: tuple[tuple[float, float], ...]) -> bool:
    x, y = point
    inside = False
    for k in range(len(polygon)):
        (xa, ya), (xb, yb) = polygon[k], polygon[(k + 1) % len(polygon)]
        if (ya > y) != (yb > y) and x < xa + (y - ya) * (xb - xa) / (yb - ya):
            inside = not inside
    return inside


def _overlap(a: Box, b: Box) -> bool:
    return a[0] < b[2] and b[0] < a[2] and a[1] < b[3] and b[1] < a[3]


def _assert_labels_clear(drawing: Drawing, where: str) -> None:
    labels = [s for s in drawing.shapes if isinstance(s, Label)]
    boxes = [_label_box(lb) for lb in labels]
    segments = list(_segments(drawing))
    fills = [s.points for s in drawing.shapes if isinstance(s, Polygon)]
    for lb, box in zip(labels, boxes, strict=True):
        for seg in segments:
            assert not _crosses(seg, box), f"{where}: label {lb.text!r} crosses a line {seg}"
        centre = ((box[0] + box[2]) / 2, (box[1] + box[3]) / 2)
        for poly in fills:
            assert not _inside(centre, poly), f"{where}: label {lb.text!r} inside the pressure fill"
        assert 0 <= box[0] and box[2] <= drawing.width and 0 <= box[1] and box[3] <= drawing.height, (
            f"{where}: label {lb.text!r} outside the drawing"
        )
    for i in range(len(boxes)):
        for j in range(i + 1, len(boxes)):
            assert not _overlap(boxes[i], boxes[j]), f"{where}: labels {labels[i].text!r} and {labels[j].text!r} overlap"


def _governing_bearing(project, wall_id: str):
    wall = next(w for w in project.walls if w.id == wall_id)
    result = check_wall(project, wall)
    g = result.governing[Check.BEARING]
    case = result.cases[g.case_index]
    assert case.bearing is not None
    diagram = pressure_diagram(case.vertical, case.bearing.eccentricity, result.width, result.length)
    return wall, result, g, case.bearing, diagram


@pytest.mark.parametrize("wall_id", WALLS)
def test_pressure_labels_clear_of_lines_and_fill(demo_document, wall_id: str) -> None:
    """Each value label of the pressure diagram misses every line, the fill and the other labels."""
    project = demo_document.project
    _, result, g, br, diagram = _governing_bearing(project, wall_id)
    fmt = _Fmt(project.units)
    drawing = pressure_drawing(diagram, br.allowable, result, g, fmt, CONTENT_WIDTH, 150.0)
    _assert_labels_clear(drawing, wall_id)


@pytest.mark.parametrize("wall_id", WALLS)
@pytest.mark.parametrize("share", [0.0, 0.5, 1.0, 1.02, 1.5])
def test_pressure_labels_clear_when_the_allowable_meets_a_pressure(demo_document, wall_id: str, share: float) -> None:
    """An allowable line at q_min, at q_max or near either still leaves the labels apart (stacked in the margin)."""
    project = demo_document.project
    _, result, g, _, diagram = _governing_bearing(project, wall_id)
    allowable = diagram.q_min + share * (diagram.q_max - diagram.q_min)
    drawing = pressure_drawing(diagram, allowable, result, g, _Fmt(project.units), CONTENT_WIDTH, 150.0)
    _assert_labels_clear(drawing, f"{wall_id} allowable {allowable:.0f} Pa")


@pytest.mark.parametrize("wall_id", WALLS)
def test_pressure_labels_use_subscripts(demo_document, wall_id: str) -> None:
    """q_max, q_min, q_a and L_f are written with subscript markup, never a literal underscore."""
    project = demo_document.project
    _, result, g, br, diagram = _governing_bearing(project, wall_id)
    drawing = pressure_drawing(diagram, br.allowable, result, g, _Fmt(project.units), CONTENT_WIDTH, 150.0)
    labels = [s for s in drawing.shapes if isinstance(s, Label)]
    texts = [lb.text for lb in labels]
    assert any(t.startswith("q_{max} = ") for t in texts)
    assert any(t.startswith("q_{a} = ") for t in texts)
    assert "x = L_{f}" in texts
    for lb in labels:
        assert "_" not in lb.text or lb.markup, lb.text
        assert "_" not in lb.text.replace("_{", ""), lb.text


@pytest.mark.parametrize("wall_id", WALLS)
def test_pressure_drawing_has_no_empty_band_above_its_caption(demo_document, wall_id: str) -> None:
    """The lowest line or label is within 20 pt of the drawing's bottom edge, where the caption starts."""
    project = demo_document.project
    _, result, g, br, diagram = _governing_bearing(project, wall_id)
    drawing = pressure_drawing(diagram, br.allowable, result, g, _Fmt(project.units), CONTENT_WIDTH, 150.0)
    lows = [min(s[1], s[3]) for s in _segments(drawing)]
    lows += [_label_box(lb)[1] for lb in drawing.shapes if isinstance(lb, Label)]
    assert 0 <= min(lows) <= 20.0


@pytest.mark.parametrize("wall_id", WALLS)
def test_drawings_name_the_footing_length_l_f(demo_document, wall_id: str) -> None:
    """The elevation dimensions L_f and marks x = L_f; the section dimensions the wall (and stem) thickness."""
    project = demo_document.project
    wall = next(w for w in project.walls if w.id == wall_id)
    fmt = _Fmt(project.units)
    elevation = elevation_drawing(wall, fmt, 372.0, 236.0)
    texts = [s.text for s in elevation.shapes if isinstance(s, Label | Dimension)]
    assert f"L_{{f}} = {fmt.length(wall.footing_length)}" in texts
    assert "x = L_{f}" in texts
    assert not any(t.startswith("L = ") or t == "x = L" for t in texts)
    section = section_drawing(wall, project, fmt, 140.0, 236.0)
    dims = [s.text for s in section.shapes if isinstance(s, Dimension)]
    assert f"t_{{w}} = {fmt.length(wall.thickness)}" in dims
    if wall.stem.present:
        assert f"t_{{stem}} = {fmt.length(wall.stem.thickness)}" in dims


def test_point_load_arrowhead_clear_of_the_top_shear_arrowhead(demo_document) -> None:
    """E4 carries a point load at the wall's start with the roof shear at the wall's top: the two arrows do not meet."""
    project = demo_document.project
    wall = next(w for w in project.walls if w.id == "E4")
    drawing = elevation_drawing(wall, _Fmt(project.units), 372.0, 236.0)
    arrows = [s for s in drawing.shapes if isinstance(s, Arrow)]
    horizontal = [a for a in arrows if a.y1 == a.y2]
    vertical = [a for a in arrows if a.x1 == a.x2 and a.width >= 0.7]  # point loads (line-load arrows are 0.5)
    assert horizontal and vertical
    for h in horizontal:
        for v in vertical:
            near_end = min(abs(v.y1 - h.y2), abs(v.y2 - h.y2))
            if abs(v.x1 - h.x2) < 6.0:
                assert near_end >= 6.0, f"point load at x={v.x1:.1f} meets the shear arrow at y={h.y2:.1f}"

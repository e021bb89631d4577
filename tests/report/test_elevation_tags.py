"""The elevation's loads: one arrow per place and sense, tagged with the numbers of the loads table.

Sources: issue 12 §3 (the load sketch redrawn as numbered arrows keyed to the loads table, legible at
6.5 pt or more); common practice of drafting: a label never shares its space with a line it does not
name, and two labels never overlap.
"""

from __future__ import annotations

import re

import pytest
from kernline.engine.calc_package import Arrow, Label, Rect, _Fmt, elevation_drawing
from kernline.engine.model import LateralLoad, LineLoad, PointLoad
from test_report_drawings import _crosses, _label_box, _overlap, _segments

WALLS = ("N1", "S2", "C3", "E4", "K5")
HEIGHT = 170.0  # the height the wall's first sheet offers the elevation


def _drawing(demo_document, wall_id: str):
    project = demo_document.project
    wall = next(w for w in project.walls if w.id == wall_id)
    return wall, elevation_drawing(wall, _Fmt(project.units), 372.0, HEIGHT)


def _tags(drawing) -> list[Label]:
    return [s for s in drawing.shapes if isinstance(s, Label) and re.fullmatch(r"\d+(, \d+)*", s.text)]


def _box(label: Label) -> tuple[float, float, float, float]:
    """The label's box; a label running up the drawing (90°) turned with it."""
    if label.angle == 0.0:
        return _label_box(label)
    assert label.angle == 90.0
    x0, y0, x1, y1 = _label_box(Label(label.x, label.y, label.text, label.anchor, label.size, label.bold))
    w = x1 - x0
    return (label.x - 0.75 * label.size, label.y - w / 2, label.x + 0.3 * label.size, label.y + w / 2)


@pytest.mark.parametrize("wall_id", WALLS)
def test_every_load_is_tagged_once_with_its_table_number(demo_document, wall_id: str) -> None:
    """The tags hold 1..n (n loads, numbered as in the loads table), each number once; a tag groups loads of
    one kind only (line, point or lateral)."""
    wall, drawing = _drawing(demo_document, wall_id)
    numbers = [int(n) for tag in _tags(drawing) for n in tag.text.split(", ")]
    assert sorted(numbers) == list(range(1, len(wall.loads) + 1))
    for tag in _tags(drawing):
        kinds = {type(wall.loads[int(n) - 1]) for n in tag.text.split(", ")}
        assert len(kinds) == 1, tag.text


@pytest.mark.parametrize("wall_id", WALLS)
def test_each_tag_sits_in_its_box_near_its_arrow(demo_document, wall_id: str) -> None:
    """Every tag is inside a box of its own, and an arrow of the load's kind passes within 12 pt of that box."""
    wall, drawing = _drawing(demo_document, wall_id)
    boxes = [s for s in drawing.shapes if isinstance(s, Rect) and s.fill == "none"]
    arrows = [s for s in drawing.shapes if isinstance(s, Arrow)]
    for tag in _tags(drawing):
        x0, y0, x1, y1 = _label_box(tag)
        box = next((b for b in boxes if b.x <= x0 and x1 <= b.x + b.w and b.y <= y0 and y1 <= b.y + b.h), None)
        assert box is not None, tag.text
        kind = type(wall.loads[int(tag.text.split(", ")[0]) - 1])
        wanted = [a for a in arrows if (a.y1 == a.y2) == (kind is LateralLoad)]
        near = [
            a
            for a in wanted
            if min(abs(a.x1 - box.x), abs(a.x1 - box.x - box.w), abs(a.x2 - box.x - box.w)) <= 12.0
            or box.x <= a.x1 <= box.x + box.w
        ]
        assert near, f"{wall_id}: tag {tag.text} has no {kind.__name__} arrow beside it"


@pytest.mark.parametrize("wall_id", WALLS)
def test_elevation_labels_are_legible_and_clear(demo_document, wall_id: str) -> None:
    """Every label is at least 6.5 pt, inside the drawing, crossed by no line and clear of every other label."""
    _, drawing = _drawing(demo_document, wall_id)
    labels = [s for s in drawing.shapes if isinstance(s, Label)]
    segments = list(_segments(drawing))
    boxes = [_box(lb) for lb in labels]
    for lb, box in zip(labels, boxes, strict=True):
        assert lb.size >= 6.5, lb.text
        assert 0 <= box[0] and box[2] <= drawing.width and 0 <= box[1] and box[3] <= drawing.height, lb.text
        for seg in segments:
            assert not _crosses(seg, box), f"{wall_id}: {lb.text!r} crosses {seg}"
    for i in range(len(boxes)):
        for j in range(i + 1, len(boxes)):
            assert not _overlap(boxes[i], boxes[j]), f"{wall_id}: {labels[i].text!r} and {labels[j].text!r} overlap"


def test_no_load_values_are_stacked_above_the_wall(demo_document) -> None:
    """The loads' cases and values are in the table, not on the sketch: no label names a case with a value."""
    for wall_id in WALLS:
        _, drawing = _drawing(demo_document, wall_id)
        for lb in (s for s in drawing.shapes if isinstance(s, Label)):
            assert not re.search(r"\b(D|L|Lr|S|W|E) [−-]?\d", lb.text), lb.text


def test_uplift_line_load_points_away_from_the_wall(demo_document) -> None:
    """N1's roof wind uplift (a negative line load) is drawn pointing up, its gravity loads down."""
    wall, drawing = _drawing(demo_document, "N1")
    assert any(isinstance(ld, LineLoad) and ld.value < 0 for ld in wall.loads)
    bar_arrows = [s for s in drawing.shapes if isinstance(s, Arrow) and s.x1 == s.x2 and s.width == 0.6]
    assert len([a for a in bar_arrows if a.y2 > a.y1]) == 1  # the uplift bar's one arrow
    assert len([a for a in bar_arrows if a.y2 < a.y1]) == 1  # the downward loads share one bar
    assert not any(isinstance(ld, PointLoad) for ld in wall.loads)

"""The design map draws a boundary for every check of the sizing result, the strength checks too; each
boundary's label sits at the boundary's end, inside the plot and clear of the others; each legend glyph
is drawn from the dash pattern its line is drawn with.

Source of the rules: the window review of the drawings (labels must neither collide nor clip; a legend
names what the plot draws). K5 of the demo is the wall whose thickness one-way shear sets (ACI 318-19
22.5.5.1), as `kernline check resources/demo.kernline` reports.
"""

from __future__ import annotations

import itertools
import math

import numpy as np
import pytest
from kernline.app.style import check_style
from kernline.app.views.design_map import dash_glyph
from PySide6.QtCore import QPointF, Qt
from window_helpers import select_wall

SIZES = [(1480, 940), (1280, 800)]
WALLS = ("N1", "S2", "C3", "E4", "K5")


def _sized(qtbot, window, size):
    window.resize(*size)
    window.tabs.setCurrentWidget(window.design_map)
    window.size_all_action.trigger()
    doc = window.document
    qtbot.waitUntil(
        lambda: all(doc.sizing_for(w)[0] is not None and doc.sizing_for(w)[1] for w in doc.project.walls), timeout=30000
    )
    return window.design_map


def _shown(dm):
    return [
        (label.toPlainText(), label.sceneBoundingRect())
        for label in dm.boundary_labels
        if label.isVisible() and label.toPlainText()
    ]


def _piece_ends(xs, ys):
    """The end points of the NaN-separated pieces of a boundary."""
    ends = []
    finite = np.isfinite(xs)
    for k in np.flatnonzero(finite):
        before = k == 0 or not finite[k - 1]
        after = k == len(xs) - 1 or not finite[k + 1]
        if before or after:
            ends.append((float(xs[k]), float(ys[k])))
    return ends


def test_k5_map_draws_the_strength_checks(qtbot, window):
    """K5: the map has a line and a label for flexure and for one-way shear, and one-way shear is what
    fails the next thinner candidate at the chosen width (the engine's governing check)."""
    dm = _sized(qtbot, window, (1480, 940))
    select_wall(window, "K5")
    qtbot.wait(50)
    s = dm.entry.result
    names = [c.title.lower() for c in s.checks]
    assert "flexure" in names and "one-way shear" in names
    assert [c.title.lower() for c in dm.checks] == names
    assert len(dm.boundaries) == len(names) == s.check_normalized.shape[0]
    col = int(np.argmin(abs(s.widths - s.width)))
    row = int(np.argmin(abs(s.thicknesses - s.thickness)))
    assert row > 0 and not s.passes[row - 1, col]
    assert s.governing_check(row - 1, col).title.lower() == "one-way shear"
    for name in ("flexure", "one-way shear"):
        k = names.index(name)
        xs, _ys = dm.boundaries[k].getData()
        assert np.isfinite(xs).sum() >= 2, f"no {name} line drawn"
        assert dm.boundary_labels[k].toPlainText() == name and dm.boundary_labels[k].isVisible()


@pytest.mark.parametrize("size", SIZES)
def test_map_labels_stay_inside_and_apart(qtbot, window, size):
    """Every demo wall at both window sizes: each shown label lies inside the plot and no two overlap."""
    dm = _sized(qtbot, window, size)
    box = dm.plot.getPlotItem().getViewBox()
    seen = 0
    for wall_id in WALLS:
        select_wall(window, wall_id)
        qtbot.wait(30)
        shown = _shown(dm)
        seen += len(shown)
        bounds = box.sceneBoundingRect().adjusted(-1, -1, 1, 1)
        for text, rect in shown:
            assert bounds.contains(rect), f"{wall_id}: {text!r} at {rect} leaves the plot {bounds}"
        for (ta, a), (tb, b) in itertools.combinations(shown, 2):
            common = a.intersected(b)
            assert common.width() <= 1.0 or common.height() <= 1.0, f"{wall_id}: {ta!r} overlaps {tb!r} at {size}"
    assert seen >= 2 * len(WALLS) - 2  # the demo's walls show most of their boundaries' labels


def test_map_labels_sit_at_their_line_ends(qtbot, window):
    """At 1480 x 940 each label lies within about its own height of an end of its own line (a nudged label
    moves by about a label's height), not at its middle."""
    dm = _sized(qtbot, window, (1480, 940))
    box = dm.plot.getPlotItem().getViewBox()
    for wall_id in WALLS:
        select_wall(window, wall_id)
        qtbot.wait(30)
        for curve, label in zip(dm.boundaries, dm.boundary_labels, strict=True):
            if not label.toPlainText():
                continue
            rect = label.sceneBoundingRect()
            xs, ys = curve.getData()
            ends = [box.mapViewToScene(QPointF(x, y)) for x, y in _piece_ends(xs, ys)]

            def gap(p, rect=rect):
                dx = max(rect.left() - p.x(), 0.0, p.x() - rect.right())
                dy = max(rect.top() - p.y(), 0.0, p.y() - rect.bottom())
                return math.hypot(dx, dy)

            assert min(gap(p) for p in ends) <= rect.height() + 8.0, (
                f"{wall_id}: {label.toPlainText()!r} is not at an end of its line"
            )


def test_legend_glyphs_come_from_the_line_styles(qtbot, window):
    """Each line's pen has its check's dash pattern, and the legend prints the glyph of that pattern,
    different for every check."""
    dm = _sized(qtbot, window, (1480, 940))
    select_wall(window, "K5")
    qtbot.wait(30)
    glyphs = dm.legend_glyphs()
    assert list(glyphs) == [c.title.lower() for c in dm.checks]
    assert len(set(glyphs.values())) == len(glyphs), "two checks share a legend glyph"
    legend = dm.legend.text()
    for k, (name, curve) in enumerate(zip(glyphs, dm.boundaries, strict=True)):
        dashes, tone, _ = check_style(k)
        pen = curve.opts["pen"]
        if any(dashes[1::2]):
            assert pen.style() == Qt.PenStyle.CustomDashLine
            assert pen.dashPattern() == pytest.approx(list(dashes))
        else:
            assert pen.style() == Qt.PenStyle.SolidLine
        assert pen.color().name() == tone
        assert glyphs[name] == dash_glyph(dashes)
        assert f"{glyphs[name]} {name}" in legend


def test_dash_glyph_reads_the_pattern():
    """Marks from the on lengths (dot, en dash, em dash), spaces from the gaps, solid for no gap."""
    assert dash_glyph((1, 0)) == "───"
    assert dash_glyph((1.5, 2.5)) == "· · ·"
    assert dash_glyph((6, 3)) == "– – –"
    assert dash_glyph((8, 3, 1.5, 3)) == "– · –"
    assert dash_glyph((12, 4)) == "— — —"
    assert dash_glyph((6, 1)) == "–––"

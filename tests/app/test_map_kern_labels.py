"""The pressure diagram's kern labels are shown for every demo wall, inside the plot, clear of each
other, of the pressure block and of the resultant's marker.

Source of the rule: the window review of the drawings (labels must neither collide nor hide the drawing).
"""

from __future__ import annotations

import pytest
from PySide6.QtCore import QPointF, QRectF
from PySide6.QtGui import QPolygonF
from window_helpers import select_wall

WALLS = ("N1", "S2", "C3", "E4", "K5")


@pytest.mark.parametrize("size", [(1480, 940), (1280, 800)])
def test_kern_labels_clear_of_the_pressure_block_and_each_other(qtbot, window, size):
    window.resize(*size)
    for wall_id in WALLS:
        select_wall(window, wall_id)
        qtbot.wait(30)
        plot = window.drawings.pressure
        box = plot.getPlotItem().getViewBox()
        rects = [label.sceneBoundingRect() for label in plot.kern_labels]
        assert [label.toPlainText() for label in plot.kern_labels] == ["kern", "kern"], wall_id
        assert all(label.isVisible() for label in plot.kern_labels)
        bounds = box.sceneBoundingRect().adjusted(-1, -1, 1, 1)
        for rect in rects:
            assert bounds.contains(rect), f"{wall_id}: a kern label leaves the plot"
        common = rects[0].intersected(rects[1])
        assert common.width() <= 1.0 or common.height() <= 1.0, f"{wall_id}: the kern labels overlap"
        xs, ys = plot.block.getData()
        block = QPolygonF([box.mapViewToScene(QPointF(float(x), float(y))) for x, y in zip(xs, ys, strict=True)])
        rx, ry = plot.resultant.getData()
        marker = box.mapViewToScene(QPointF(float(rx[0]), float(ry[0])))
        marker_rect = QRectF(marker.x() - 6.0, marker.y() - 6.0, 12.0, 12.0)  # the 12 px ▼
        for rect in rects:
            inner = rect.adjusted(1, 1, -1, -1)
            assert not block.intersects(QPolygonF(inner)), f"{wall_id} at {size}: a kern label covers the pressure block"
            assert not inner.intersects(marker_rect), f"{wall_id} at {size}: a kern label covers the resultant"

"""The elevation of the selected wall on its footing, to scale, with its loads drawn as arrows.

x runs along the footing from its start end (as in the engine), y is height above the top of the
footing; both in the display length unit (ft or m) with the aspect ratio locked at 1:1. Items are
created once and updated with ``setData`` / ``setRect``; nothing is rebuilt per edit.
"""

from __future__ import annotations

import math
from collections import OrderedDict

import numpy as np
import pyqtgraph as pg
from PySide6.QtCore import QRectF, Qt
from PySide6.QtGui import QBrush, QColor, QPen
from PySide6.QtWidgets import QGraphicsRectItem

from engine.model import LateralLoad, LineLoad, PointLoad, Wall
from engine.units import Kind

from ..style import CONCRETE, CONCRETE_EDGE, GRAPHITE, LOAD, MUTED, SOIL, WALL, configure_pyqtgraph
from .fields import FORCE, LINE, LONG, trim, unit_factor

AXIS_WIDTH = 62  # px: the elevation and the pressure plot share it so their x scales line up
NOMINAL_WALL_HEIGHT = 3.0  # m drawn above the stem when no lateral load sets the wall's height
LABEL_POOL = 24


def _pen(color: str, width: float = 1.0, style: Qt.PenStyle = Qt.PenStyle.SolidLine) -> QPen:
    pen = QPen(QColor(color))
    pen.setCosmetic(True)
    pen.setWidthF(width)
    pen.setStyle(style)
    return pen


def _rect_item(fill: str, edge: str, z: float) -> QGraphicsRectItem:
    item = QGraphicsRectItem()
    item.setBrush(QBrush(QColor(fill)))
    item.setPen(_pen(edge, 1.2))
    item.setZValue(z)
    return item


def _number(value: float) -> str:
    return trim(value, 2)


class ElevationView(pg.PlotWidget):
    """Elevation of wall, stem, footing and soil cover, with line, point and lateral load arrows."""

    def __init__(self, parent=None) -> None:
        configure_pyqtgraph()
        super().__init__(parent)
        self.setObjectName("elevation")
        plot = self.getPlotItem()
        plot.setMenuEnabled(False)
        plot.hideButtons()
        plot.setAspectLocked(True, ratio=1.0)
        plot.disableAutoRange()
        for name in ("left", "bottom"):
            axis = plot.getAxis(name)
            axis.enableAutoSIPrefix(False)
            axis.setPen(_pen(MUTED))
            axis.setTextPen(_pen(MUTED))
        plot.getAxis("left").setWidth(AXIS_WIDTH)
        self.setMinimumHeight(140)

        self.soil = _rect_item(SOIL, SOIL, -3)
        self.footing = _rect_item(CONCRETE, CONCRETE_EDGE, 0)
        self.stem = _rect_item(CONCRETE, CONCRETE_EDGE, 0)
        self.wall = _rect_item(WALL, CONCRETE_EDGE, -1)
        for item in (self.soil, self.footing, self.stem, self.wall):
            plot.addItem(item)
        self.grade = pg.PlotCurveItem(pen=_pen("#8a7b62", 1.4))
        plot.addItem(self.grade)
        self.shafts = pg.PlotCurveItem(pen=_pen(LOAD, 1.3), connect="pairs")
        self.heavy_shafts = pg.PlotCurveItem(pen=_pen(LOAD, 2.2), connect="pairs")
        self.heads = pg.ScatterPlotItem(size=9, pen=pg.mkPen(None), brush=pg.mkBrush(LOAD))
        for item in (self.shafts, self.heavy_shafts, self.heads):
            item.setZValue(5)
            plot.addItem(item)
        self.labels: list[pg.TextItem] = []
        for _ in range(LABEL_POOL):
            label = pg.TextItem(color=GRAPHITE, anchor=(0, 1))
            label.setZValue(6)
            label.hide()
            plot.addItem(label)
            self.labels.append(label)
        self._range: tuple[float, ...] | None = None
        self._units = ""

    # ---- drawing -------------------------------------------------------------------------------

    def render(self, wall: Wall, units: str, direction: str) -> None:  # type: ignore[override]
        """Draw ``wall``; ``direction`` ("+", "-", "none") of the shown case points the lateral arrows."""
        plot = self.getPlotItem()
        if units != self._units:
            unit = LONG[1] if units == "SI" else LONG[0]
            plot.setLabel("bottom", f"along the footing ({unit})")
            plot.setLabel("left", f"height ({unit})")
            self._units = units
        f = unit_factor(LONG[1] if units == "SI" else LONG[0], Kind.LENGTH)
        ft = wall.footing
        length = wall.footing_length / f
        x0 = ft.extension_start / f
        x1 = x0 + wall.length / f
        d = ft.thickness / f
        cover = ft.cover / f
        hs = wall.stem.height / f if wall.stem.present else 0.0
        laterals = [ld for ld in wall.loads if isinstance(ld, LateralLoad)]
        top = max([hs + NOMINAL_WALL_HEIGHT / f] + [ld.height / f for ld in laterals])

        scale = max(length, top)
        band = 0.07 * scale
        margin = 0.16 * scale
        xmin, xmax = -margin, length + margin

        self.footing.setRect(QRectF(0.0, -d, length, d))
        self.stem.setVisible(hs > 0.0)
        self.stem.setRect(QRectF(x0, 0.0, x1 - x0, hs))
        self.wall.setRect(QRectF(x0, hs, x1 - x0, top - hs))
        below = max(0.35 * d, 0.04 * scale)
        self.soil.setRect(QRectF(xmin, -d - below, xmax - xmin, cover + d + below))
        self.soil.setVisible(True)
        self.grade.setData([xmin, xmax], [cover, cover])

        shafts_x: list[float] = []
        shafts_y: list[float] = []
        heavy_x: list[float] = []
        heavy_y: list[float] = []
        heads: list[dict] = []
        labels: list[tuple[float, float, str, tuple[float, float]]] = []
        mirror = x0 + x1
        long_unit = LONG[1] if units == "SI" else LONG[0]

        # line loads, grouped by extent, stacked in bands above the wall
        groups: OrderedDict[tuple[float, float], list[LineLoad]] = OrderedDict()
        for ld in wall.loads:
            if isinstance(ld, LineLoad):
                a, b = x0 + ld.start / f, x0 + ld.end / f
                if ld.reverses and direction == "-":
                    a, b = mirror - b, mirror - a
                groups.setdefault((round(a, 6), round(b, 6)), []).append(ld)
        line_unit = LINE[1] if units == "SI" else LINE[0]
        line_factor = unit_factor(line_unit, Kind.LINE_LOAD)
        for k, ((a, b), loads) in enumerate(groups.items()):
            y_low, y_high = top + k * band, top + (k + 1) * band
            count = max(2, int(round((b - a) / (0.06 * scale))) + 1)
            xs = np.linspace(a, b, count)
            for x in xs:
                shafts_x += [x, x]
                shafts_y += [y_high, y_low]
                heads.append({"pos": (x, y_low), "symbol": "t"})
            shafts_x += [a, b]
            shafts_y += [y_high, y_high]
            text = " · ".join(f"{ld.case.value} {_number(ld.value / line_factor)}" for ld in loads) + f" {line_unit}"
            labels.append((a, y_high, text, (0, 1)))
        stack_top = top + len(groups) * band

        # point loads, grouped by position: long arrows over the bands
        points: OrderedDict[float, list[PointLoad]] = OrderedDict()
        for ld in wall.loads:
            if isinstance(ld, PointLoad):
                x = x0 + ld.at / f
                if ld.reverses and direction == "-":
                    x = mirror - x
                points.setdefault(round(x, 6), []).append(ld)
        force_unit = FORCE[1] if units == "SI" else FORCE[0]
        force_factor = unit_factor(force_unit, Kind.FORCE)
        tail = stack_top + 2.8 * band  # room for the line loads' label under the point loads' labels
        for x, loads in points.items():
            down = sum(ld.value for ld in loads) >= 0.0
            heavy_x += [x, x]
            heavy_y += [tail, top]
            heads.append({"pos": (x, top) if down else (x, tail), "symbol": "t" if down else "t1"})
            text = " · ".join(f"{ld.case.value} {_number(ld.value / force_factor)}" for ld in loads) + f" {force_unit}"
            labels.append((x, tail, text, (0.5, 1)))

        # lateral loads, grouped by height, pushing in the direction of the shown case
        heights: OrderedDict[float, list[LateralLoad]] = OrderedDict()
        for ld in laterals:
            heights.setdefault(round(ld.height / f, 6), []).append(ld)
        push_left = direction == "-"
        arrow = 0.11 * scale
        for h, loads in heights.items():
            if push_left:
                start, end = x1 + arrow, x1
            else:
                start, end = x0 - arrow, x0
            heavy_x += [start, end]
            heavy_y += [h, h]
            heads.append({"pos": (end, h), "symbol": "t3" if push_left else "t2"})
            text = (
                " · ".join(f"{ld.case.value} {_number(ld.value / force_factor)}" for ld in loads)
                + f" {force_unit} at {_number(h)} {long_unit}"
            )
            labels.append((start, h, text, (1, 0.5) if not push_left else (0, 0.5)))

        self.shafts.setData(np.array(shafts_x, dtype=float), np.array(shafts_y, dtype=float))
        self.heavy_shafts.setData(np.array(heavy_x, dtype=float), np.array(heavy_y, dtype=float))
        self.heads.setData(heads)
        for label, spec in zip(self.labels, labels[: len(self.labels)], strict=False):
            x, y, text, anchor = spec
            if label.toPlainText() != text:
                label.setText(text)
            if tuple(label.anchor) != anchor:
                label.setAnchor(anchor)
            if (label.pos().x(), label.pos().y()) != (x, y):
                label.setPos(x, y)
            if not label.isVisible():
                label.show()
        for label in self.labels[len(labels) :]:
            if label.isVisible():
                label.hide()

        ymax = tail + 2.0 * band if points else stack_top + 2.0 * band
        # the range moves in steps of 5 % of the drawing, so that most edits leave the axes alone
        # (a new range re-ticks both linked plots, which costs more than the drawing itself)
        q = 0.05 * scale
        extent = (math.floor(xmin / q) * q, math.ceil(xmax / q) * q, math.floor((-d - below) / q) * q, math.ceil(ymax / q) * q)
        if extent != self._range:
            self._range = extent
            plot.setRange(xRange=extent[:2], yRange=extent[2:], padding=0.0)

    def label_texts(self) -> list[str]:
        """The load labels shown (for tests and screen readers)."""
        return [label.toPlainText() for label in self.labels if label.isVisible()]

    def footing_rect(self) -> QRectF:
        return self.footing.rect()

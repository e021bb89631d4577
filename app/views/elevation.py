"""The elevation of the selected wall on its footing, to scale, with its loads drawn as arrows.

x runs along the footing from its start end (as in the engine), y is height above the top of the
footing; both in the display length unit (ft or m) with the aspect ratio locked at 1:1. Items are
created once and updated with ``setData`` / ``setRect``; nothing is rebuilt per edit.
"""

from __future__ import annotations

import math
from collections import OrderedDict
from dataclasses import dataclass

import numpy as np
import pyqtgraph as pg
from kernline.engine.model import LateralLoad, LineLoad, PointLoad, Wall
from kernline.engine.units import Kind
from PySide6.QtCore import QPointF, QRectF, Qt
from PySide6.QtGui import QBrush, QColor, QPen
from PySide6.QtWidgets import QGraphicsRectItem

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


@dataclass(frozen=True, slots=True)
class Spot:
    """One place a label may go: the view point (data units) and the label's anchor there."""

    x: float
    y: float
    anchor: tuple[float, float]


@dataclass(slots=True)
class Placement:
    """A label and where it may go, best first; ``nudge`` is the screen direction (+1 down, -1 up) to
    slide it when every spot collides (0: slide away from whichever side is free)."""

    item: pg.TextItem
    spots: list[Spot]
    nudge: int = -1


GAP = 2.0  # px kept between labels, and between a label and the edge of the plot


def place_labels(box: pg.ViewBox, placements: list[Placement], obstacles: list[QRectF] = ()) -> list[QRectF]:
    """Put each label at its first spot that stays inside the view and clear of the labels placed
    before it and of ``obstacles`` (scene rectangles); failing that, slide the first spot vertically.

    Works in scene pixels (labels keep their pixel size while the view scales), so it is run again
    whenever the view's range or size changes. Returns the scene rectangle of each shown label.
    """
    bounds = box.sceneBoundingRect().adjusted(GAP, GAP, -GAP, -GAP)
    taken: list[QRectF] = [QRectF(r) for r in obstacles]
    placed: list[QRectF] = []
    if bounds.width() <= 0 or bounds.height() <= 0:
        return placed

    def clear(rect: QRectF) -> bool:
        return not any(rect.intersects(other) for other in taken)

    for placement in placements:
        item = placement.item
        if not item.isVisible() or not item.toPlainText() or not placement.spots:
            continue
        size = item.textItem.boundingRect()
        w, h = size.width(), size.height()
        options = []
        for spot in placement.spots:
            p = box.mapViewToScene(QPointF(spot.x, spot.y))
            rect = QRectF(p.x() - spot.anchor[0] * w, p.y() - spot.anchor[1] * h, w, h)
            options.append((spot, _inside(rect, bounds)))
        chosen = next(((spot, rect) for spot, rect in options if clear(rect)), None)
        if chosen is None:
            slid = [(spot, _slide(rect, bounds, taken, placement.nudge)) for spot, rect in options]
            cleared = [
                (abs(moved.top() - rect.top()), k)
                for k, ((_s, rect), (_t, moved)) in enumerate(zip(options, slid, strict=True))
                if clear(moved)
            ]
            if cleared:
                chosen = slid[min(cleared)[1]]
            else:  # nowhere clear: the spot that hides the least
                chosen = min(options, key=lambda option: sum(_overlap(option[1], other) for other in taken))
        spot, rect = chosen
        if tuple(item.anchor) != spot.anchor:
            item.setAnchor(spot.anchor)
        corner = box.mapSceneToView(QPointF(rect.left() + spot.anchor[0] * w, rect.top() + spot.anchor[1] * h))
        item.setPos(corner.x(), corner.y())
        taken.append(rect.adjusted(-GAP, -GAP, GAP, GAP))
        placed.append(rect)
    return placed


def _overlap(a: QRectF, b: QRectF) -> float:
    common = a.intersected(b)
    return max(0.0, common.width()) * max(0.0, common.height())


def _inside(rect: QRectF, bounds: QRectF) -> QRectF:
    """``rect`` moved the least to lie inside ``bounds`` (its left/top edge wins if it is too big)."""
    dx = max(0.0, bounds.left() - rect.left()) or min(0.0, bounds.right() - rect.right())
    dy = max(0.0, bounds.top() - rect.top()) or min(0.0, bounds.bottom() - rect.bottom())
    moved = rect.translated(dx, dy)
    return moved.translated(max(0.0, bounds.left() - moved.left()), max(0.0, bounds.top() - moved.top()))


def _slide(rect: QRectF, bounds: QRectF, taken: list[QRectF], nudge: int) -> QRectF:
    """Slide ``rect`` vertically past whatever it hits, first in the ``nudge`` direction, staying inside
    ``bounds``; the nearest clear position wins, else the rectangle as it was."""
    best: QRectF | None = None
    for direction in (nudge, -nudge) if nudge else (-1, 1):
        moved = QRectF(rect)
        for _ in range(len(taken) + 1):
            hits = [other for other in taken if moved.intersects(other)]
            if not hits:
                if best is None or abs(moved.top() - rect.top()) < abs(best.top() - rect.top()):
                    best = moved
                break
            if direction > 0:
                step = max(other.bottom() for other in hits) - moved.top() + 0.5
            else:
                step = min(other.top() for other in hits) - moved.bottom() - 0.5
            moved = moved.translated(0.0, step)
            if moved.top() < bounds.top() - 0.5 or moved.bottom() > bounds.bottom() + 0.5:
                break
    return best if best is not None else rect


def style_axes(plot: pg.PlotItem) -> None:
    """Quiet axes in engineering units (no SI prefixes such as "kpsf"), the left one of fixed width so
    that the elevation and the pressure plot share one horizontal scale."""
    for name in ("left", "bottom"):
        axis = plot.getAxis(name)
        axis.enableAutoSIPrefix(False)
        axis.setPen(_pen(MUTED))
        axis.setTextPen(_pen(MUTED))
    plot.getAxis("left").setWidth(AXIS_WIDTH)


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
        style_axes(plot)
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
        self._placements: list[Placement] = []
        self._vertical_obstacles: list[tuple[float, float, float]] = []  # x, y from, y to
        self._horizontal_obstacles: list[tuple[float, float, float]] = []  # x from, x to, y
        self.label_rects: list[QRectF] = []
        box = plot.getViewBox()
        box.sigRangeChanged.connect(self.layout_labels)
        box.sigResized.connect(self._on_resized)

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
        labels: list[tuple[str, list[Spot]]] = []
        self._vertical_obstacles = []
        self._horizontal_obstacles = []
        mirror = x0 + x1
        long_unit = LONG[1] if units == "SI" else LONG[0]

        # point loads, grouped by position: long arrows over the bands
        points: OrderedDict[float, list[PointLoad]] = OrderedDict()
        for ld in wall.loads:
            if isinstance(ld, PointLoad):
                x = x0 + ld.at / f
                if ld.reverses and direction == "-":
                    x = mirror - x
                points.setdefault(round(x, 6), []).append(ld)

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
            # over the band from its start; else from its end, or beside a point load's arrow crossing it
            spots = [Spot(a, y_high, (0.0, 1.0)), Spot(b, y_high, (1.0, 1.0))]
            for x in points:
                spots += [Spot(x, y_high, (-0.04, 1.0)), Spot(x, y_high, (1.04, 1.0))]
            labels.append((text, spots))
        stack_top = top + len(groups) * band

        force_unit = FORCE[1] if units == "SI" else FORCE[0]
        force_factor = unit_factor(force_unit, Kind.FORCE)
        tail = stack_top + 2.8 * band  # room for the line loads' label under the point loads' labels
        for x, loads in points.items():
            down = sum(ld.value for ld in loads) >= 0.0
            heavy_x += [x, x]
            heavy_y += [tail, top]
            self._vertical_obstacles.append((x, top, tail))
            heads.append({"pos": (x, top) if down else (x, tail), "symbol": "t" if down else "t1"})
            text = " · ".join(f"{ld.case.value} {_number(ld.value / force_factor)}" for ld in loads) + f" {force_unit}"
            labels.append((text, [Spot(x, tail, (0.5, 1.0)), Spot(x, tail, (0.0, 1.0)), Spot(x, tail, (1.0, 1.0))]))

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
            self._horizontal_obstacles.append((min(start, end), max(start, end), h))
            heads.append({"pos": (end, h), "symbol": "t3" if push_left else "t2"})
            text = (
                " · ".join(f"{ld.case.value} {_number(ld.value / force_factor)}" for ld in loads)
                + f" {force_unit} at {_number(h)} {long_unit}"
            )
            # beside the arrow's tail; where the plot's edge is too near, above or below the arrow
            side = 0.0 if push_left else 1.0
            labels.append(
                (
                    text,
                    [
                        Spot(start, h, (1.03 * side - 0.03 * (1.0 - side), 0.5)),
                        Spot(start, h, (1.0 - side, 1.15)),
                        Spot(start, h, (1.0 - side, -0.15)),
                    ],
                )
            )

        self.shafts.setData(np.array(shafts_x, dtype=float), np.array(shafts_y, dtype=float))
        self.heavy_shafts.setData(np.array(heavy_x, dtype=float), np.array(heavy_y, dtype=float))
        self.heads.setData(heads)
        self._placements = []
        for label, (text, spots) in zip(self.labels, labels[: len(self.labels)], strict=False):
            if label.toPlainText() != text:
                label.setText(text)
            if not label.isVisible():
                label.show()
            self._placements.append(Placement(label, spots, nudge=-1))
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
        self.layout_labels()

    def _on_resized(self, *_args) -> None:
        """Fit the whole drawing again: with the aspect locked, a resize alone would crop its top or sides."""
        if self._range is not None:
            self.getPlotItem().setRange(xRange=self._range[:2], yRange=self._range[2:], padding=0.0)
        self.layout_labels()

    def layout_labels(self, *_args) -> None:
        """Place the load labels clear of each other, of the point and lateral arrows and of the plot's edges."""
        box = self.getPlotItem().getViewBox()
        px, py = box.viewPixelSize()
        thin_x, thin_y = 2.0 * px, 2.0 * py  # the arrows' shafts, a few pixels wide
        obstacles = [
            QRectF(box.mapViewToScene(QPointF(x - thin_x, high)), box.mapViewToScene(QPointF(x + thin_x, low))).normalized()
            for x, low, high in self._vertical_obstacles
        ] + [
            QRectF(box.mapViewToScene(QPointF(a, h + thin_y)), box.mapViewToScene(QPointF(b, h - thin_y))).normalized()
            for a, b, h in self._horizontal_obstacles
        ]
        self.label_rects = place_labels(box, self._placements, obstacles)

    def label_texts(self) -> list[str]:
        """The load labels shown (for tests and screen readers)."""
        return [label.toPlainText() for label in self.labels if label.isVisible()]

    def footing_rect(self) -> QRectF:
        return self.footing.rect()

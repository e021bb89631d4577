"""The elevation of the selected wall on its footing, to scale, with its loads drawn as arrows.

x runs along the footing from its start end (as in the engine), y is height above the top of the
footing; both in the display length unit (ft or m). Lengths fill the plot's width; heights are to
the same scale when the plot is tall enough, else smaller (the panel's title says so). Items are
created once and updated with ``setData`` / ``setRect``; nothing is rebuilt per edit.
"""

from __future__ import annotations

from collections import OrderedDict
from dataclasses import dataclass

import numpy as np
import pyqtgraph as pg
from kernline.engine.model import LateralLoad, LineLoad, PointLoad, Wall
from kernline.engine.units import Kind
from PySide6.QtCore import QPointF, QRect, QRectF, Qt, Signal
from PySide6.QtGui import QBrush, QColor, QPen
from PySide6.QtWidgets import QGraphicsRectItem, QLabel, QSizePolicy

from ..style import CONCRETE, CONCRETE_EDGE, GRAPHITE, LOAD, MUTED, SOIL, WALL, configure_pyqtgraph
from .fields import FORCE, LINE, LONG, trim, unit_factor

AXIS_WIDTH = 62  # px: the elevation and the pressure plot share it so their x scales line up
NOMINAL_WALL_HEIGHT = 3.0  # m drawn above the stem when no lateral load sets the wall's height
LABEL_POOL = 24


CAPTION_LINES = 2  # a caption wraps to at most this many lines at the narrowest panel


class Caption(QLabel):
    """A hint that wraps to the panel's width; it never sets the window's minimum width.

    Its height is the lines its text takes at the panel's width (one or :data:`CAPTION_LINES`), so a
    caption that fits on one line leaves the second line's height to the drawing. The height changes
    only when the number of lines does, not on every edit.
    """

    def __init__(self) -> None:
        super().__init__()
        self.setObjectName("hint")
        self.setWordWrap(True)
        self.setSizePolicy(QSizePolicy.Policy.Ignored, QSizePolicy.Policy.Fixed)
        self.setAlignment(Qt.AlignmentFlag.AlignLeft | Qt.AlignmentFlag.AlignTop)
        self.setContentsMargins(6, 0, 6, 0)
        self.lines = 0
        self._fit()

    def setText(self, text: str) -> None:  # noqa: N802 - Qt's name
        if text != self.text():
            super().setText(text)
            self._fit()

    def resizeEvent(self, event) -> None:  # noqa: N802 - Qt's name
        super().resizeEvent(event)
        self._fit()

    def _fit(self) -> None:
        metrics = self.fontMetrics()
        margins = self.contentsMargins()
        width = max(1, self.width() - margins.left() - margins.right())
        needed = metrics.boundingRect(QRect(0, 0, width, 10_000), int(Qt.TextFlag.TextWordWrap), self.text()).height()
        lines = max(1, min(CAPTION_LINES, -(-needed // metrics.lineSpacing())))
        if lines != self.lines:
            self.lines = lines
            self.setFixedHeight(metrics.lineSpacing() * lines + 2)


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


BAND_PX = 12.0  # px: the height of a line-load band
ARROW_PX = 34.0  # px: the length of a lateral arrow
EDGE_PX = 10.0  # px kept beyond the footing's ends (and beyond a lateral label)
POINT_PX = 16.0  # px: a point load's arrow above the line-load bands
SCALE_TOLERANCE = 0.03  # heights and lengths within 3 % of one scale: "to scale"


@dataclass(frozen=True, slots=True)
class _Drawing:
    """What one render found in the model, in display units; the pixel layout is made from it."""

    length: float
    x0: float
    x1: float
    depth: float
    cover: float
    stem: float
    top: float
    bands: list[tuple[float, float, str]]  # line-load groups: from, to, label
    points: list[tuple[float, bool, str]]  # point-load groups: x, pushing down, label
    laterals: list[tuple[float, str]]  # lateral groups: height, label
    push_left: bool
    governing: str  # "+", "-" or "" : the direction of the governing lateral case


class ElevationView(pg.PlotWidget):
    """Elevation of wall, stem, footing and soil cover, with line, point and lateral load arrows.

    Lengths fill the plot's width (the footing with a small margin, and room for the lateral labels on
    the side the loads come from); heights take the same scale when the plot is tall enough, else a
    smaller one, which :attr:`scale_words` states (the panel shows it in its title). The load
    annotations (bands, arrows) keep their size in pixels, so they are laid out again on a resize.
    """

    scale_changed = Signal(str)

    def __init__(self, parent=None) -> None:
        configure_pyqtgraph()
        super().__init__(parent)
        self.setObjectName("elevation")
        plot = self.getPlotItem()
        plot.setMenuEnabled(False)
        plot.hideButtons()
        plot.setMouseEnabled(x=False, y=False)
        plot.disableAutoRange()
        style_axes(plot)
        # the plots under the elevation carry the same x axis (linked), with its ticks and name
        plot.hideAxis("bottom")
        self.setMinimumHeight(100)

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
        # the governing lateral direction: a small arrow glyph in a top corner
        self.direction_glyph = pg.TextItem(color=MUTED, anchor=(0, 0))
        self.direction_glyph.setZValue(6)
        plot.addItem(self.direction_glyph)
        self._range: tuple[float, ...] | None = None
        self._units = ""
        self._drawing: _Drawing | None = None
        self._placements: list[Placement] = []
        self._vertical_obstacles: list[tuple[float, float, float]] = []  # x, y from, y to
        self._horizontal_obstacles: list[tuple[float, float, float]] = []  # x from, x to, y
        self.label_rects: list[QRectF] = []
        self.scale_words = "to scale"
        self.exaggeration = 1.0  # vertical scale / horizontal scale
        box = plot.getViewBox()
        box.sigRangeChanged.connect(self.layout_labels)
        box.sigResized.connect(self._on_resized)

    # ---- drawing -------------------------------------------------------------------------------

    def render(self, wall: Wall, units: str, direction: str, governing: str = "") -> None:  # type: ignore[override]
        """Draw ``wall``; ``direction`` ("+", "-", "none") of the shown case points the lateral arrows;
        ``governing`` ("+", "-" or "") is the direction of the governing lateral case, shown as a glyph."""
        plot = self.getPlotItem()
        if units != self._units:
            unit = LONG[1] if units == "SI" else LONG[0]
            plot.setLabel("left", f"height ({unit})")
            plot.setLabel("bottom", f"along the footing ({unit})")
            plot.hideAxis("bottom")  # named, but shown by the plot below on the same x axis
            self._units = units
        f = unit_factor(LONG[1] if units == "SI" else LONG[0], Kind.LENGTH)
        ft = wall.footing
        length = wall.footing_length / f
        x0 = ft.extension_start / f
        x1 = x0 + wall.length / f
        d = ft.thickness / f
        hs = wall.stem.height / f if wall.stem.present else 0.0
        laterals = [ld for ld in wall.loads if isinstance(ld, LateralLoad)]
        top = max([hs + NOMINAL_WALL_HEIGHT / f] + [ld.height / f for ld in laterals])
        mirror = x0 + x1
        long_unit = LONG[1] if units == "SI" else LONG[0]

        # point loads, grouped by position
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
        force_unit = FORCE[1] if units == "SI" else FORCE[0]
        force_factor = unit_factor(force_unit, Kind.FORCE)
        bands = [
            (a, b, " · ".join(f"{ld.case.value} {_number(ld.value / line_factor)}" for ld in loads) + f" {line_unit}")
            for (a, b), loads in groups.items()
        ]
        point_marks = [
            (
                x,
                sum(ld.value for ld in loads) >= 0.0,
                " · ".join(f"{ld.case.value} {_number(ld.value / force_factor)}" for ld in loads) + f" {force_unit}",
            )
            for x, loads in points.items()
        ]
        heights: OrderedDict[float, list[LateralLoad]] = OrderedDict()
        for ld in laterals:
            heights.setdefault(round(ld.height / f, 6), []).append(ld)
        lateral_marks = [
            (
                h,
                " · ".join(f"{ld.case.value} {_number(ld.value / force_factor)}" for ld in loads)
                + f" {force_unit}\nat {_number(h)} {long_unit}",
            )
            for h, loads in heights.items()
        ]
        self.footing.setRect(QRectF(0.0, -d, length, d))
        self.stem.setVisible(hs > 0.0)
        self.stem.setRect(QRectF(x0, 0.0, x1 - x0, hs))
        self.wall.setRect(QRectF(x0, hs, x1 - x0, top - hs))
        self._drawing = _Drawing(
            length=length,
            x0=x0,
            x1=x1,
            depth=d,
            cover=ft.cover / f,
            stem=hs,
            top=top,
            bands=bands,
            points=point_marks,
            laterals=lateral_marks,
            push_left=direction == "-",
            governing=governing if laterals else "",
        )
        texts = [t for _a, _b, t in bands] + [t for _x, _down, t in point_marks] + [t for _h, t in lateral_marks]
        for label, text in zip(self.labels, texts[: len(self.labels)], strict=False):
            if label.toPlainText() != text:
                label.setText(text)
            if not label.isVisible():
                label.show()
        for label in self.labels[len(texts) :]:
            if label.isVisible():
                label.hide()
        glyph = {"+": "governs: + ⟶", "-": "⟵ governs: −"}.get(self._drawing.governing, "")
        if self.direction_glyph.toPlainText() != glyph:
            self.direction_glyph.setText(glyph)
        self.direction_glyph.setToolTip("the lateral direction of the governing case")
        self._fit()

    def _on_resized(self, *_args) -> None:
        self._fit()

    def _fit(self) -> None:
        """Lay the drawing out for the plot's size in pixels: the x and y ranges, the load annotations
        (their size is in pixels) and the labels."""
        drawing = self._drawing
        box = self.getPlotItem().getViewBox()
        size = box.boundingRect()
        width_px, height_px = size.width(), size.height()
        if drawing is None or width_px < 20.0 or height_px < 20.0:
            return
        dr = drawing
        label_h = max((lb.textItem.boundingRect().height() for lb in self.labels if lb.isVisible()), default=16.0)
        n_lat = len(dr.laterals)
        lateral_labels = self.labels[len(dr.bands) + len(dr.points) : len(dr.bands) + len(dr.points) + n_lat]
        lateral_w = max((lb.textItem.boundingRect().width() for lb in lateral_labels), default=0.0)
        side_px = ARROW_PX + lateral_w + 2.0 * GAP if n_lat else 0.0
        # the lateral loads come from the left in direction +, from the right in direction -; the part
        # of the footing beyond the wall's end on that side is room for them too
        left_px = right_px = EDGE_PX
        sx = max(1e-9, (width_px - left_px - right_px) / dr.length)  # px per unit along
        for _ in range(3):
            if dr.push_left:
                right_px = max(EDGE_PX, EDGE_PX + side_px - (dr.length - dr.x1) * sx)
            else:
                left_px = max(EDGE_PX, EDGE_PX + side_px - dr.x0 * sx)
            sx = max(1e-9, (width_px - left_px - right_px) / dr.length)
        below = 0.5 * dr.depth  # soil drawn under the footing
        bottom = -dr.depth - below
        pitch_px = BAND_PX + label_h + GAP
        annotation_px = len(dr.bands) * pitch_px + (POINT_PX + label_h + GAP if dr.points else 0.0) + label_h + 2 * GAP
        # what the annotations leave for the drawing, but never less than a third of the plot
        sy = max(height_px - annotation_px, height_px / 3.0) / (dr.top - bottom)
        sy = min(sy, sx)  # never taller than to scale
        self.exaggeration = sy / sx
        if abs(self.exaggeration - 1.0) <= SCALE_TOLERANCE:
            words = "to scale"
        elif self.exaggeration < 0.5:
            words = f"heights at 1/{1.0 / self.exaggeration:.0f} of the length scale"
        else:
            words = f"heights at {self.exaggeration:.2f}× the length scale"
        if words != self.scale_words:
            self.scale_words = words
            self.scale_changed.emit(words)
        xmin, xmax = -left_px / sx, dr.length + right_px / sx
        ymax = bottom + height_px / sy
        self.soil.setRect(QRectF(xmin, bottom, xmax - xmin, dr.cover + dr.depth + below))
        self.grade.setData([xmin, xmax], [dr.cover, dr.cover])

        band, label_hy, gap_y = BAND_PX / sy, label_h / sy, GAP / sy
        shafts_x: list[float] = []
        shafts_y: list[float] = []
        heavy_x: list[float] = []
        heavy_y: list[float] = []
        heads: list[dict] = []
        spots: list[list[Spot]] = []
        self._vertical_obstacles = []
        self._horizontal_obstacles = []
        for k, (a, b, _text) in enumerate(dr.bands):
            y_low = dr.top + k * (band + label_hy + gap_y)
            y_high = y_low + band
            count = max(2, int(round((b - a) * sx / 28.0)) + 1)
            for x in np.linspace(a, b, count):
                shafts_x += [x, x]
                shafts_y += [y_high, y_low]
                heads.append({"pos": (x, y_low), "symbol": "t"})
            shafts_x += [a, b]
            shafts_y += [y_high, y_high]
            # over the band from its start; else from its end, or beside a point load's arrow crossing it
            options = [Spot(a, y_high, (0.0, 1.0)), Spot(b, y_high, (1.0, 1.0))]
            for x, _down, _t in dr.points:
                options += [Spot(x, y_high, (-0.04, 1.0)), Spot(x, y_high, (1.04, 1.0))]
            spots.append(options)
        stack_top = dr.top + len(dr.bands) * (band + label_hy + gap_y)
        tail = stack_top + POINT_PX / sy
        for x, down, _text in dr.points:
            heavy_x += [x, x]
            heavy_y += [tail, dr.top]
            self._vertical_obstacles.append((x, dr.top, tail))
            heads.append({"pos": (x, dr.top) if down else (x, tail), "symbol": "t" if down else "t1"})
            spots.append([Spot(x, tail, (0.5, 1.0)), Spot(x, tail, (0.0, 1.0)), Spot(x, tail, (1.0, 1.0))])
        arrow = ARROW_PX / sx
        for h, _text in dr.laterals:
            start, end = (dr.x1 + arrow, dr.x1) if dr.push_left else (dr.x0 - arrow, dr.x0)
            heavy_x += [start, end]
            heavy_y += [h, h]
            self._horizontal_obstacles.append((min(start, end), max(start, end), h))
            heads.append({"pos": (end, h), "symbol": "t3" if dr.push_left else "t2"})
            # beside the arrow's tail, away from the wall
            anchor_x = -0.02 if dr.push_left else 1.02
            spots.append([Spot(start, h, (anchor_x, 0.5)), Spot(start, h, (anchor_x, 0.0)), Spot(start, h, (anchor_x, 1.0))])
        self.shafts.setData(np.array(shafts_x, dtype=float), np.array(shafts_y, dtype=float))
        self.heavy_shafts.setData(np.array(heavy_x, dtype=float), np.array(heavy_y, dtype=float))
        self.heads.setData(heads)
        placements = [Placement(label, options, nudge=-1) for label, options in zip(self.labels, spots, strict=False)]
        # lateral labels from the lowest up, each sliding up past the one below it (their order stays)
        lateral = sorted(placements[len(dr.bands) + len(dr.points) :], key=lambda p: p.spots[0].y)
        self._placements = placements[: len(dr.bands) + len(dr.points)] + lateral
        if self.direction_glyph.toPlainText():
            corner = [Spot(xmin, ymax, (0.0, 0.0)), Spot(xmax, ymax, (1.0, 0.0))]
            if dr.governing == "-":
                corner.reverse()
            self._placements.append(Placement(self.direction_glyph, corner, nudge=1))
        extent = (xmin, xmax, bottom, ymax)
        if extent != self._range:
            self._range = extent
            self.getPlotItem().setRange(xRange=extent[:2], yRange=extent[2:], padding=0.0)
        self.layout_labels()

    def layout_labels(self, *_args) -> None:
        """Place the load labels clear of each other, of the arrows, of the wall and footing and of the plot's edges."""
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
        obstacles += self.body_rects()
        self.label_rects = place_labels(box, self._placements, obstacles)

    def body_rects(self) -> list[QRectF]:
        """Scene rectangles of the wall, the stem and the footing (labels keep off them)."""
        box = self.getPlotItem().getViewBox()
        items = [self.wall, self.footing] + ([self.stem] if self.stem.isVisible() else [])
        return [box.mapViewToScene(item.rect()).boundingRect() for item in items]

    def label_texts(self) -> list[str]:
        """The load labels shown (for tests and screen readers)."""
        return [label.toPlainText() for label in self.labels if label.isVisible()]

    def footing_rect(self) -> QRectF:
        return self.footing.rect()

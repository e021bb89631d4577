"""The soil pressure under the footing for one combination and direction, on the elevation's x scale.

The ordinates come from :func:`engine.soil_pressure.pressure_diagram`, fed with the case's vertical
load N and eccentricity e as :func:`engine.results.check_wall` found them; the allowable is the
case's own (with any increase for W or E). Nothing is recomputed here. Pressure is drawn downward
from the underside of the footing, as it acts on the soil.
"""

from __future__ import annotations

import math

import numpy as np
import pyqtgraph as pg
from kernline.engine.model import Wall
from kernline.engine.results import WallResult
from kernline.engine.soil_pressure import PressureDiagram, pressure_diagram
from kernline.engine.units import Kind
from PySide6.QtCore import QPointF, QRectF, Qt
from PySide6.QtGui import QColor
from PySide6.QtWidgets import QComboBox, QWidget

from ..style import ACCENT, ACCENT_LIGHT, GRAPHITE, MUTED, WARM, configure_pyqtgraph
from .elevation import GAP, Placement, Spot, _pen, place_labels, style_axes
from .fields import LONG, PRESSURE, trim, unit_factor

MIN_HEIGHT = 140  # px


def case_title(result: WallResult, index: int) -> str:
    case = result.table.cases[index]
    name = case.combination.name
    return name if case.direction.value == "none" else f"{name} ({case.direction.value})"


class CasePicker(QComboBox):
    """Choose the case the drawings show: a governing case (default: bearing) or any other."""

    def __init__(self, parent: QWidget | None = None) -> None:
        super().__init__(parent)
        self.setObjectName("casePicker")
        self.setToolTip(
            "The combination and direction drawn in the elevation and the pressure diagram. "
            "Governing: the case with the lowest ratio / required for that check (embedment depends on no case)."
        )
        self.setSizeAdjustPolicy(QComboBox.SizeAdjustPolicy.AdjustToMinimumContentsLengthWithIcon)
        self.setMinimumContentsLength(20)
        self._key: tuple[str, ...] = ()

    def fill(self, result: WallResult, choice: tuple) -> None:
        """Offer the governing case of each check that has one (a geometric check has none) and every case;
        select ``choice``."""
        governing = [(c, g.case_index) for c, g in result.governing.items() if g.case_index is not None]
        governing_titles = tuple(f"{c.id}:{case_title(result, i)}" for c, i in governing)
        cases = tuple(case_title(result, i) for i in range(len(result.table.cases)))
        key = governing_titles + ("|",) + cases
        self.blockSignals(True)
        try:
            if key != self._key:
                self._key = key
                self.clear()
                for check, i in governing:
                    self.addItem(f"Governing {check.title.lower()}: {case_title(result, i)}", ("governing", check))
                self.insertSeparator(self.count())
                for title, case in zip(cases, result.table.cases, strict=True):
                    self.addItem(title, ("case", case.combination.name, case.direction.value))
            for i in range(self.count()):
                if self.itemData(i) == choice:
                    self.setCurrentIndex(i)
                    break
        finally:
            self.blockSignals(False)

    def choice(self) -> tuple:
        return self.currentData()


class PressurePlot(pg.PlotWidget):
    """Soil pressure block, allowable line, kern limits, contact length and the resultant (▼)."""

    def __init__(self, parent=None) -> None:
        configure_pyqtgraph()
        super().__init__(parent)
        self.setObjectName("pressurePlot")
        plot = self.getPlotItem()
        plot.setMenuEnabled(False)
        plot.hideButtons()
        plot.disableAutoRange()
        plot.setMouseEnabled(x=True, y=False)
        plot.invertY(True)
        style_axes(plot)
        # tall enough for the kern labels above the footing line and the contact bar below the
        # block, also when the design map tab takes half of the column
        self.setMinimumHeight(MIN_HEIGHT)

        fill = QColor(ACCENT_LIGHT)
        fill.setAlpha(220)
        self.block = pg.PlotDataItem(pen=_pen(ACCENT, 1.6), fillLevel=0.0, brush=fill)
        plot.addItem(self.block)
        self.base = pg.PlotCurveItem(pen=_pen(GRAPHITE, 1.2))
        plot.addItem(self.base)
        self.allowable = pg.InfiniteLine(angle=0, movable=False, pen=_pen(WARM, 1.3, Qt.PenStyle.DashLine))
        plot.addItem(self.allowable)
        self.allowable_label = pg.TextItem(color=WARM, anchor=(0, 1))
        plot.addItem(self.allowable_label)
        self.kern = [pg.InfiniteLine(angle=90, movable=False, pen=_pen(MUTED, 1.0, Qt.PenStyle.DotLine)) for _ in range(2)]
        for line in self.kern:
            plot.addItem(line)
        # the labels hang from the top edge of the view (anchor at their top), so a short plot never clips them
        self.kern_labels = [
            pg.TextItem("kern", color=MUTED, anchor=(1.0, 0.0)),
            pg.TextItem("kern", color=MUTED, anchor=(0.0, 0.0)),
        ]
        for label in self.kern_labels:
            plot.addItem(label)
        self.contact = pg.PlotCurveItem(pen=_pen(GRAPHITE, 1.2), connect="pairs")
        plot.addItem(self.contact)
        self.contact_label = pg.TextItem(color=GRAPHITE, anchor=(0.5, 0))
        plot.addItem(self.contact_label)
        self.end_labels = [pg.TextItem(color=GRAPHITE, anchor=(1, 0.5)), pg.TextItem(color=GRAPHITE, anchor=(0, 0.5))]
        for label in self.end_labels:
            plot.addItem(label)
        self.resultant = pg.ScatterPlotItem(size=12, symbol="t", pen=pg.mkPen(None), brush=pg.mkBrush(GRAPHITE))
        plot.addItem(self.resultant)
        self.notice = pg.TextItem(color=WARM, anchor=(0.5, 0.5))
        plot.addItem(self.notice)
        self._units = ""
        self._y_range: tuple[float, float] | None = None
        self._top: float | None = None
        self.diagram: PressureDiagram | None = None
        self.shown_q: np.ndarray = np.zeros(0)
        self.shown_allowable = 0.0
        self._placements: list[Placement] = []
        self.label_rects: list[QRectF] = []
        box = plot.getViewBox()
        box.sigRangeChanged.connect(self.layout_labels)
        box.sigResized.connect(self._on_resized)

    def render(self, wall: Wall, result: WallResult, index: int, units: str) -> PressureDiagram:  # type: ignore[override]
        """Draw the pressure of case ``index`` of ``result``; returns the engine's diagram."""
        plot = self.getPlotItem()
        q_unit = PRESSURE[1] if units == "SI" else PRESSURE[0]
        l_unit = LONG[1] if units == "SI" else LONG[0]
        if units != self._units:
            plot.setLabel("left", f"soil pressure ({q_unit})")
            plot.setLabel("bottom", f"along the footing ({l_unit})")
            self._units = units
        fq = unit_factor(q_unit, Kind.PRESSURE)
        fl = unit_factor(l_unit, Kind.LENGTH)
        plot.showAxis("left")
        ev = result.evaluation
        vertical = float(ev.vertical[index])
        eccentricity = float(ev.eccentricity[index])
        diagram = pressure_diagram(vertical, eccentricity, result.width, result.length)
        self.diagram = diagram
        allowable = float(ev.allowable[index]) / fq
        length = result.length / fl

        x = diagram.x / fl
        q = diagram.q / fq
        self.shown_q = q
        self.shown_allowable = allowable
        self.block.setData(x, q)
        self.base.setData([0.0, length], [0.0, 0.0])
        peak = float(np.max(q)) if diagram.stable else 0.0
        top = _nice_ceiling(max(peak, allowable) * 1.18)
        self._top = top
        y_range = self._headroom_range(top)
        if y_range != self._y_range:  # a new range re-ticks the axis: only when the nice ceiling moves
            self._y_range = y_range
            plot.setYRange(*y_range, padding=0.0)

        self.allowable.setValue(allowable)
        increased = result.table.wind_or_seismic[index] and result.table.criteria.bearing_increase != 1.0
        self.allowable_label.setText(f"allowable {trim(allowable, 1)} {q_unit}" + (" (increased)" if increased else ""))
        k1, k2 = diagram.kern
        for label in self.kern_labels:  # emptied while nothing was checked
            label.setText("kern")
        self.kern[0].setValue(k1 / fl)
        self.kern[1].setValue(k2 / fl)
        kern_spots = [[Spot(k1 / fl, y_range[0], (1.0, 0.0))], [Spot(k2 / fl, y_range[0], (0.0, 0.0))]]
        # the allowable label goes at the end away from the peak: beside the footing, else inside it
        low_end_first = diagram.stable and float(q[2]) > float(q[1])
        start_spots = [Spot(0.0, allowable, anchor) for anchor in ((1.02, 1.0), (1.02, 0.0), (-0.02, 1.0), (-0.02, 0.0))]
        end_spots = [Spot(length, allowable, anchor) for anchor in ((-0.02, 1.0), (-0.02, 0.0), (1.02, 1.0), (1.02, 0.0))]
        allowable_spots = start_spots + end_spots if low_end_first else end_spots + start_spots
        end_spots_shown: list[list[Spot]] = [[], []]
        if diagram.stable:
            self.notice.setText("")
            a, b = diagram.contact_start / fl, diagram.contact_end / fl
            y = top * 1.12
            self.contact.setData([a, b, a, a, b, b], [y, y, y - 0.04 * top, y + 0.04 * top, y - 0.04 * top, y + 0.04 * top])
            full = abs((b - a) - length) < 1e-9 * max(length, 1.0)
            self.contact_label.setText(
                f"contact {trim(b - a, 2)} {l_unit}" + (" (full length)" if full else f" of {trim(length, 2)} {l_unit}")
            )
            self.contact_label.setPos(0.5 * (a + b), y + 0.03 * top)
            q_start, q_end = float(q[1]), float(q[2])
            # beyond the kern one end of the contact carries no pressure: the contact label says where it is
            for k, (value, x_end, side) in enumerate(((q_start, a, 1.06), (q_end, b, -0.06))):
                zero = value <= 1e-9 * max(abs(q_start), abs(q_end), 1e-30)
                self.end_labels[k].setText("" if zero and not full else f"{trim(value, 0 if units == 'US' else 1)} {q_unit}")
                end_spots_shown[k] = [Spot(x_end, value, (side, 0.5))]
            self.resultant.setData([diagram.resultant_x / fl], [0.0])
        else:
            self.contact.setData([], [])
            self.contact_label.setText("")
            for label in self.end_labels:
                label.setText("")
            self.resultant.setData([], [])
            self.notice.setText("No equilibrium on the soil:\nthe resultant falls outside the footing\n(N ≤ 0 or |e| ≥ L/2)")
            self.notice.setPos(0.5 * length, 0.5 * top)
        self._placements = [Placement(label, spots, 0) for label, spots in zip(self.kern_labels, kern_spots, strict=True)]
        if not diagram.stable:
            self._placements.append(Placement(self.notice, [Spot(0.5 * length, 0.5 * top, (0.5, 0.5))], 1))
        for label, spots in zip(self.end_labels, end_spots_shown, strict=True):
            if spots and label.toPlainText():
                # slide away from the allowable line (down the screen when above the allowable)
                self._placements.append(Placement(label, spots, 1 if spots[0].y > allowable else -1))
        if diagram.stable:
            self._placements.append(
                Placement(self.contact_label, [Spot(self.contact_label.pos().x(), self.contact_label.pos().y(), (0.5, 0.0))], 1)
            )
        self._placements.append(Placement(self.allowable_label, allowable_spots, -1))
        self.layout_labels()
        return diagram

    def _headroom_range(self, top: float) -> tuple[float, float]:
        """The pressure axis range: to 1.45 × top below the footing line, and above it room for the kern
        labels (their height in pixels at the plot's present height), at least 0.22 × top."""
        box = self.getPlotItem().getViewBox()
        need = self.kern_labels[0].textItem.boundingRect().height() + 2 * GAP + 7.0  # and the ▼'s upper half
        pixels = box.height()
        above = 0.22 * top
        if pixels > 2 * need:
            above = max(above, need * 1.45 * top / (pixels - need))
        return (-above, top * 1.45)

    def _on_resized(self, *_args) -> None:
        if self.diagram is not None and self._top is not None:
            y_range = self._headroom_range(self._top)
            if y_range != self._y_range:
                self._y_range = y_range
                self.getPlotItem().setYRange(*y_range, padding=0.0)
        self.layout_labels()

    def render_unchecked(self, wall: Wall, units: str, missing: str) -> None:
        """Nothing is checked yet (site values missing): the footing line and a notice of what to enter."""
        plot = self.getPlotItem()
        l_unit = LONG[1] if units == "SI" else LONG[0]
        length = wall.footing_length / unit_factor(l_unit, Kind.LENGTH)
        self.diagram = None
        self.shown_q = np.zeros(0)
        for item in (self.block, self.contact, self.resultant):
            item.setData([], [])
        self.base.setData([0.0, length], [0.0, 0.0])
        self.allowable_label.setText("")
        self.allowable.setValue(-1e9)  # out of view
        for line, x in zip(self.kern, (-1e9, -1e9), strict=True):
            line.setValue(x)
        for label in (*self.kern_labels, *self.end_labels, self.contact_label):
            label.setText("")
        self._top = None
        self._y_range = (-0.25, 1.0)
        plot.setYRange(*self._y_range, padding=0.0)
        plot.hideAxis("left")  # no pressure: no pressure scale
        self.notice.setText("Not checked: enter " + missing.replace(" and ", "\nand ") + "\nto see the soil pressure")
        self._placements = [Placement(self.notice, [Spot(0.5 * length, 0.45, (0.5, 0.5))], 1)]
        self.layout_labels()

    def layout_labels(self, *_args) -> None:
        """Place the labels clear of each other, of the allowable line (end values) and of the plot's edges."""
        box = self.getPlotItem().getViewBox()
        line = box.mapViewToScene(QPointF(0.0, self.shown_allowable)).y()
        bounds = box.sceneBoundingRect()
        # the allowable line is an obstacle for the labels placed before the allowable label itself
        band = QRectF(bounds.left(), line - 1.5, bounds.width(), 3.0)
        # the kern labels keep off the pressure block and the resultant's ▼
        diagram_rects = []
        if len(self.shown_q):
            xs, _ys = self.block.getData()
            if xs is not None and len(xs):
                a = box.mapViewToScene(QPointF(float(np.min(xs)), 0.0))
                b = box.mapViewToScene(QPointF(float(np.max(xs)), float(np.max(self.shown_q))))
                diagram_rects.append(QRectF(a, b).normalized().adjusted(0.0, -1.0, 0.0, 0.0))
            rx, ry = self.resultant.getData()
            if rx is not None and len(rx):
                c = box.mapViewToScene(QPointF(float(rx[0]), float(ry[0])))
                diagram_rects.append(QRectF(c.x() - 7.0, c.y() - 7.0, 14.0, 14.0))
        kern = [p for p in self._placements if p.item in self.kern_labels]
        rects = place_labels(box, kern, [band, *diagram_rects])
        before = [p for p in self._placements if p.item is not self.allowable_label and p.item not in self.kern_labels]
        rects += place_labels(box, before, [band, *[r.adjusted(-GAP, -GAP, GAP, GAP) for r in rects]])
        shown = [QRectF(r) for r in rects]
        own = [p for p in self._placements if p.item is self.allowable_label]
        self.label_rects = shown + place_labels(box, own, [r.adjusted(-2.0, -2.0, 2.0, 2.0) for r in shown])

    @staticmethod
    def caption(result: WallResult, index: int, units: str) -> str:
        """One line under the picker: N, e and where it sits relative to the kern (formatted results)."""
        q_unit = PRESSURE[1] if units == "SI" else PRESSURE[0]
        l_unit = LONG[1] if units == "SI" else LONG[0]
        ev = result.evaluation
        fl = unit_factor(l_unit, Kind.LENGTH)
        e = float(ev.eccentricity[index])
        length = result.length
        if not bool(ev.stable[index]):
            where = "no equilibrium"
        elif float(ev.contact_length[index]) >= length * (1.0 - 1e-9):
            where = "inside the kern: full contact"
        else:
            where = "beyond the kern: partial contact"
        bearing = result.cases[index].bearing
        q_text = ""
        if bearing is not None and math.isfinite(bearing.q_max):
            q_text = f"  q_max {trim(bearing.q_max / unit_factor(q_unit, Kind.PRESSURE), 0 if units == 'US' else 1)} {q_unit};"
        force_unit = "kip" if units == "US" else "kN"
        n = float(ev.vertical[index]) / unit_factor(force_unit, Kind.FORCE)
        e_text = trim(e / fl, 2) if math.isfinite(e) else "∞"
        return f"N {trim(n, 2)} {force_unit};  e {e_text} {l_unit} ({where});{q_text}"


def _nice_ceiling(value: float) -> float:
    """The next of 1, 1.5, 2, 3, 4, 5, 6, 8, 10 x 10^n at or above ``value`` (1.0 for nothing)."""
    if not math.isfinite(value) or value <= 0.0:
        return 1.0
    power = 10.0 ** math.floor(math.log10(value))
    for step in (1.0, 1.5, 2.0, 3.0, 4.0, 5.0, 6.0, 8.0, 10.0):
        if step * power >= value * (1.0 - 1e-12):
            return step * power
    return 10.0 * power

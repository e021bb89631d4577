"""The footing's concrete design: its cross-section with the bars, the numbers across the width, and
the shear and moment along its length on the elevation's x scale.

Everything shown is the engine's: the transverse numbers are the records of the flexure and one-way
shear checks (:func:`engine.results.check_wall`), the bars and critical sections come from
:func:`engine.concrete.view_data.section_data`, the diagrams and longitudinal bars from
:func:`engine.concrete.along.design_along`. The design along the length costs tens of milliseconds
per wall, so it is made only while the view is visible (once per result; a hidden view remembers
that it is stale and catches up when shown).
"""

from __future__ import annotations

from typing import Any

import numpy as np
import pyqtgraph as pg
from kernline.engine.concrete.along import case_diagram, design_along
from kernline.engine.concrete.bars import counted_text, spaced_text
from kernline.engine.concrete.longitudinal import CANNOT_SPREAD, BeamDiagram, LongitudinalDesign
from kernline.engine.concrete.view_data import SectionData, section_data
from kernline.engine.model import Wall
from kernline.engine.results import WallResult
from kernline.engine.units import Kind, format_quantity, unit_factor, unit_label
from PySide6.QtCore import QPointF, QRectF, Qt
from PySide6.QtGui import QBrush, QColor
from PySide6.QtWidgets import QGraphicsEllipseItem, QHBoxLayout, QLabel, QSizePolicy, QVBoxLayout, QWidget

from ..style import ACCENT, CONCRETE_EDGE, GRAPHITE, MUTED, NG_MARK, OK_MARK, WALL, WARM, configure_pyqtgraph
from .elevation import Caption, Placement, Spot, _pen, _rect_item, place_labels, style_axes
from .fields import LONG, SHORT, trim
from .pressure import _nice_ceiling

ENABLE_TEXT = (
    "No concrete design in this project: tick Concrete design (all walls) in the form to design the footing's bars (ACI 318-19)."
)
SECTION_WIDTH = 150  # px of the cross-section beside the numbers
STEEL = "#3b3f44"  # bars: darker than the concrete's edge
FOOTING_FILL = "#dcdad4"  # the section's concrete, lighter than the elevation's so the bars read
DIAGRAM_MIN_HEIGHT = 44  # px of each diagram

# Display units of the per-length results across the width and of the bars (engine unit names).
PER_LENGTH = {
    "moment": (("kip*ft/ft", "kip·ft/ft"), ("kN*m/m", "kN·m/m"), "[force]"),
    "shear": (("kip/ft", "kip/ft"), ("kN/m", "kN/m"), "[force] / [length]"),
    "area": (("in**2/ft", "in²/ft"), ("mm**2/m", "mm²/m"), "[length]"),
    "bar": (("in", "in"), ("mm", "mm"), "[length]"),
}


def per_length(value: float | None, what: str, units: str, decimals: int = 2) -> str:
    """An SI result across the width in the project's units: "10.2 kip·ft/ft", "0.27 in²/ft"."""
    us, si, dimension = PER_LENGTH[what]
    unit, label = si if units == "SI" else us
    if value is None:
        return "—"
    factor = unit_factor(unit, dimension)
    assert factor is not None, unit
    return f"{trim(value / factor, decimals)} {label}"


def _record(result: WallResult, check_id: str) -> Any:
    return next((g.record for c, g in result.governing.items() if c.id == check_id), None)


def case_text(combination: str, direction: str) -> str:
    """ "1.2D + 1.0W + L + 0.5S (+)": a strength case in words (no direction when none acts)."""
    return combination if direction in ("none", "") else f"{combination} ({direction})"


def _mark(ok: bool) -> str:
    return OK_MARK if ok else NG_MARK


class SectionPlot(pg.PlotWidget):
    """The footing across its width, to scale: concrete, the wall or stem on it, the bars, the cover,
    and the moment (M) and one-way shear (V) sections on both sides."""

    def __init__(self, parent=None) -> None:
        configure_pyqtgraph()
        super().__init__(parent)
        self.setObjectName("concreteSection")
        plot = self.getPlotItem()
        plot.setMenuEnabled(False)
        plot.hideButtons()
        plot.hideAxis("left")
        plot.hideAxis("bottom")
        plot.setMouseEnabled(x=False, y=False)
        plot.setAspectLocked(True, ratio=1.0)
        plot.disableAutoRange()
        self.footing = _rect_item(FOOTING_FILL, CONCRETE_EDGE, 0)
        self.wall = _rect_item(WALL, CONCRETE_EDGE, 0)
        self.transverse = _rect_item(STEEL, STEEL, 3)
        for item in (self.footing, self.wall, self.transverse):
            plot.addItem(item)
        self.dots: list[QGraphicsEllipseItem] = []
        self.sections = pg.PlotCurveItem(pen=_pen(WARM, 1.2, Qt.PenStyle.DashLine), connect="pairs")
        self.shear_sections = pg.PlotCurveItem(pen=_pen(ACCENT, 1.2, Qt.PenStyle.DotLine), connect="pairs")
        self.cover_line = pg.PlotCurveItem(pen=_pen(MUTED, 1.0), connect="pairs")
        for item in (self.sections, self.shear_sections, self.cover_line):
            item.setZValue(4)
            plot.addItem(item)
        self.labels = {name: pg.TextItem(color=color, anchor=(0, 0)) for name, color in (("moment", WARM), ("shear", ACCENT))}
        for label in self.labels.values():
            label.setZValue(6)
            plot.addItem(label)
        self.data: SectionData | None = None
        self._placements: list[Placement] = []
        self.label_rects: list[QRectF] = []
        self._factor = 1.0
        box = plot.getViewBox()
        box.sigRangeChanged.connect(self.layout_labels)
        box.sigResized.connect(self._on_resized)
        self._range: tuple[float, float, float, float] | None = None

    def _dot(self, k: int) -> QGraphicsEllipseItem:
        while len(self.dots) <= k:
            dot = QGraphicsEllipseItem()
            dot.setBrush(QBrush(QColor(STEEL)))
            dot.setPen(_pen(STEEL, 0.8))
            dot.setZValue(5)
            self.getPlotItem().addItem(dot)
            self.dots.append(dot)
        return self.dots[k]

    def render(self, data: SectionData, units: str) -> None:  # type: ignore[override]
        """Draw ``data`` in inches (US) or millimetres (SI)."""
        self.data = data
        unit = SHORT[1] if units == "SI" else SHORT[0]
        f = unit_factor(unit, "[length]")
        assert f is not None
        self._factor = f
        b, h = data.width / f, data.thickness / f
        t = data.wall_thickness / f
        cover = data.cover / f
        self.footing.setRect(QRectF(0.0, 0.0, b, h))
        stub = 0.55 * h  # a short piece of what stands on the footing
        self.wall.setRect(QRectF(0.5 * (b - t), h, t, stub))
        placements: list[Placement] = []
        labels = self.labels
        shown = 0
        if data.plain or data.transverse_bar is None:
            self.transverse.setVisible(False)
            self.cover_line.setData([], [])
        else:
            db = data.transverse_bar.diameter / f
            y = data.transverse_height / f
            self.transverse.setVisible(True)
            self.transverse.setRect(QRectF(cover, y - 0.5 * db, b - 2.0 * cover, db))
            # the cover: a dimension from the bottom to the lowest bar, near the right-hand end
            x_dim = b - 0.5 * cover
            self.cover_line.setData([x_dim, x_dim], [0.0, y - 0.5 * db])
        for row in data.rows:
            db = row.bar.diameter / f
            for x in row.across:
                dot = self._dot(shown)
                dot.setRect(QRectF(x / f - 0.5 * db, row.height / f - 0.5 * db, db, db))
                dot.setVisible(True)
                shown += 1
        for dot in self.dots[shown:]:
            dot.setVisible(False)
        # the critical sections, measured from each edge: M at c, V at c - d (none beyond the edge)
        c = data.moment_section / f
        top = h + stub
        self.sections.setData([c, c, b - c, b - c], [-0.08 * h, top, -0.08 * h, top])
        labels["moment"].setText("M")
        placements.append(Placement(labels["moment"], [Spot(c, -0.08 * h, (0.5, 0.0)), Spot(c, top, (1.1, 1.0))], 1))
        v = data.shear_section / f
        if v > 0.0:
            self.shear_sections.setData([v, v, b - v, b - v], [-0.08 * h, h, -0.08 * h, h])
            labels["shear"].setText("V")
            placements.append(Placement(labels["shear"], [Spot(v, -0.08 * h, (0.5, 0.0)), Spot(v, h, (1.1, 1.0))], 1))
        else:
            self.shear_sections.setData([], [])
            labels["shear"].setText("")
        self._placements = placements
        margin = 0.08 * max(b, h)
        extent = (-margin, b + margin, -0.45 * h - margin, top + 0.5 * margin)
        if extent != self._range:
            self._range = extent
            self.getPlotItem().setRange(xRange=extent[:2], yRange=extent[2:], padding=0.0)
        self.layout_labels()

    def _on_resized(self, *_args) -> None:
        if self._range is not None:
            self.getPlotItem().setRange(xRange=self._range[:2], yRange=self._range[2:], padding=0.0)
        self.layout_labels()

    def layout_labels(self, *_args) -> None:
        box = self.getPlotItem().getViewBox()
        obstacles = [box.mapViewToScene(self.footing.rect()).boundingRect().adjusted(1, 1, -1, -1)]
        self.label_rects = place_labels(box, self._placements, obstacles if self.data is not None else [])

    def dot_rects(self) -> list[QRectF]:
        """The longitudinal bars' circles as drawn (display units), for tests."""
        return [dot.rect() for dot in self.dots if dot.isVisible()]


class DiagramPlot(pg.PlotWidget):
    """One diagram along the footing (shear or moment), filled to zero, with its extremes labelled."""

    def __init__(self, name: str, tone: str, parent=None) -> None:
        configure_pyqtgraph()
        super().__init__(parent)
        self.setObjectName(name)
        plot = self.getPlotItem()
        plot.setMenuEnabled(False)
        plot.hideButtons()
        plot.disableAutoRange()
        plot.setMouseEnabled(x=True, y=False)
        style_axes(plot)
        self.setMinimumHeight(DIAGRAM_MIN_HEIGHT)
        fill = QColor(tone)
        fill.setAlpha(60)
        self.curve = pg.PlotDataItem(pen=_pen(tone, 1.5), fillLevel=0.0, brush=fill)
        plot.addItem(self.curve)
        self.zero = pg.PlotCurveItem(pen=_pen(GRAPHITE, 1.0))
        plot.addItem(self.zero)
        self.marks = pg.ScatterPlotItem(size=7, pen=pg.mkPen(None), brush=pg.mkBrush(GRAPHITE))
        self.marks.setZValue(5)
        plot.addItem(self.marks)
        self.labels = [pg.TextItem(color=GRAPHITE, anchor=(0, 1)) for _ in range(2)]
        self.unit_label = pg.TextItem(color=MUTED, anchor=(0, 0))  # "V (kip)" in the top-left corner
        self.unit_label.setZValue(6)
        plot.addItem(self.unit_label)
        for label in self.labels:
            label.setZValue(6)
            plot.addItem(label)
        self._placements: list[Placement] = []
        self.label_rects: list[QRectF] = []
        self._y_range: tuple[float, float] | None = None
        self.x = np.zeros(0)
        self.y = np.zeros(0)
        box = plot.getViewBox()
        box.sigRangeChanged.connect(self.layout_labels)
        box.sigResized.connect(self.layout_labels)

    def render(  # type: ignore[override]
        self, x: np.ndarray, y: np.ndarray, length: float, extremes: list[tuple[float, float, str]], name: str
    ) -> None:
        """Draw y(x) over the footing's length; ``extremes`` are (x, y, label) in display units; ``name``
        ("V (kip)") is written in the plot's top-left corner."""
        self.x, self.y = x, y
        if self.unit_label.toPlainText() != name:
            self.unit_label.setText(name)
        self.curve.setData(x, y)
        self.zero.setData([0.0, length], [0.0, 0.0])
        top = _nice_ceiling(1.2 * float(np.max(np.abs(y)))) if y.size else 1.0
        low = -top if float(np.min(y, initial=0.0)) < -1e-9 * top else -0.25 * top
        high = top if float(np.max(y, initial=0.0)) > 1e-9 * top else 0.25 * top
        y_range = (low, high)
        if y_range != self._y_range:
            self._y_range = y_range
            self.getPlotItem().setYRange(*y_range, padding=0.0)
        self.marks.setData([e[0] for e in extremes], [e[1] for e in extremes])
        self._placements = []
        for label, extreme in zip(self.labels, [*extremes, None, None], strict=False):
            if extreme is None:
                label.setText("")
                continue
            ex, ey, text = extreme
            label.setText(text)
            vertical = 1.0 if ey >= 0.0 else 0.0  # above a peak, below a trough
            spots = [Spot(ex, ey, (0.5, vertical)), Spot(ex, ey, (-0.03, vertical)), Spot(ex, ey, (1.03, vertical))]
            spots += [Spot(ex, ey, (0.5, 1.0 - vertical)), Spot(ex, 0.0, (0.5, 1.0 - vertical))]
            self._placements.append(Placement(label, spots, -1 if ey >= 0.0 else 1))
        box = self.getPlotItem().getViewBox()
        (x_low, x_high), (y_low, y_high) = box.viewRange()
        x_start = max(x_low, float(x[0])) if x.size else x_low
        x_end = min(x_high, float(x[-1])) if x.size else x_high
        # the diagram's name in a corner that is free: top left, bottom left, top right, bottom right
        corners = [
            Spot(x_start, y_high, (0.0, 0.0)),
            Spot(x_start, y_low, (0.0, 1.0)),
            Spot(x_end, y_high, (1.0, 0.0)),
            Spot(x_end, y_low, (1.0, 1.0)),
        ]
        self._placements.append(Placement(self.unit_label, corners, 0))
        self.layout_labels()

    def clear_diagram(self) -> None:
        self.curve.setData([], [])
        self.zero.setData([], [])
        self.marks.setData([], [])
        for label in self.labels:
            label.setText("")
        self._placements = []

    def layout_labels(self, *_args) -> None:
        box = self.getPlotItem().getViewBox()
        obstacles: list[QRectF] = []
        if self.x.size:
            # the markers at the extremes
            for x, y in zip(*self.marks.getData(), strict=True):
                p = box.mapViewToScene(QPointF(float(x), float(y)))
                obstacles.append(QRectF(p.x() - 4.0, p.y() - 4.0, 8.0, 8.0))
        self.label_rects = place_labels(box, self._placements, obstacles)


class ConcreteView(QWidget):
    """Cross-section and numbers across the width above the shear and moment diagrams along the length."""

    def __init__(self, parent: QWidget | None = None) -> None:
        super().__init__(parent)
        self.setObjectName("concreteView")
        self.notice = QLabel(ENABLE_TEXT)
        self.notice.setObjectName("hint")
        self.notice.setWordWrap(True)
        self.notice.setAlignment(Qt.AlignmentFlag.AlignLeft | Qt.AlignmentFlag.AlignTop)
        self.notice.setVisible(False)
        self.section = SectionPlot()
        self.section.setFixedWidth(SECTION_WIDTH)
        self.numbers = QLabel()
        self.numbers.setObjectName("concreteNumbers")
        self.numbers.setWordWrap(True)
        self.numbers.setAlignment(Qt.AlignmentFlag.AlignLeft | Qt.AlignmentFlag.AlignTop)
        self.numbers.setSizePolicy(QSizePolicy.Policy.Ignored, QSizePolicy.Policy.Preferred)
        self.numbers.setTextFormat(Qt.TextFormat.RichText)
        self.along_caption = Caption()
        self.shear_plot = DiagramPlot("shearDiagram", ACCENT)
        self.moment_plot = DiagramPlot("momentDiagram", WARM)
        self.shear_plot.getPlotItem().hideAxis("bottom")
        # the moment plot also carries the x axis: as much room for its curve as the shear plot has
        self.moment_plot.setMinimumHeight(DIAGRAM_MIN_HEIGHT + 34)
        top_row = QHBoxLayout()
        top_row.setContentsMargins(0, 0, 0, 0)
        top_row.setSpacing(6)
        top_row.addWidget(self.section)
        top_row.addWidget(self.numbers, 1)
        self.top = QWidget()
        self.top.setLayout(top_row)
        self.top.setMinimumHeight(58)
        self.top.setMaximumHeight(92)
        layout = QVBoxLayout(self)
        layout.setContentsMargins(0, 0, 0, 0)
        layout.setSpacing(2)
        layout.addWidget(self.notice)
        layout.addWidget(self.top, 1)
        layout.addWidget(self.along_caption)
        layout.addWidget(self.shear_plot, 3)
        layout.addWidget(self.moment_plot, 5)
        self.enabled = False
        self.stale = False
        self._args: tuple[Wall, WallResult | None, str] | None = None
        self._along: tuple[WallResult, tuple[LongitudinalDesign, int, BeamDiagram]] | None = None
        self.designs_made = 0  # design_along runs (for tests and the benchmark)
        self.along: LongitudinalDesign | None = None
        self.diagram: BeamDiagram | None = None
        self.data: SectionData | None = None
        self.case_words = ""

    def link_x(self, plot: pg.PlotWidget) -> None:
        """Share ``plot``'s x axis (the elevation's) with both diagrams."""
        self.shear_plot.setXLink(plot)
        self.moment_plot.setXLink(plot)

    def set_data(self, wall: Wall, result: WallResult | None, units: str) -> None:
        """Remember what to draw; draw now only when visible (the design along the length is costly)."""
        self._args = (wall, result, units)
        if self.isVisible():
            self.refresh()
        else:
            self.stale = True

    def showEvent(self, event) -> None:  # noqa: N802 - Qt's name
        super().showEvent(event)
        if self.stale:
            self.refresh()

    def _design(self, result: WallResult) -> tuple[LongitudinalDesign, int, BeamDiagram]:
        """design_along for ``result``, once per result."""
        if self._along is None or self._along[0] is not result:
            assert result.strength_table is not None and result.strength_evaluation is not None
            self._along = (result, design_along(result.strength_table, result.strength_evaluation))
            self.designs_made += 1
        return self._along[1]

    def refresh(self) -> None:
        self.stale = False
        if self._args is None:
            return
        wall, result, units = self._args
        enabled = result is not None and result.strength_table is not None
        self.enabled = enabled
        self.top.setVisible(enabled)
        self.shear_plot.setVisible(enabled)
        self.moment_plot.setVisible(enabled)
        self.along_caption.setVisible(enabled)
        if result is None:
            self.notice.setText("Not checked yet: the concrete design follows once the missing values are entered.")
            self.notice.setVisible(True)
            return
        if not enabled:
            self.notice.setText(ENABLE_TEXT)
            self.notice.setVisible(True)
            self.along = self.diagram = self.data = None
            return
        self.notice.setVisible(False)
        flexure = _record(result, "flexure")
        shear = _record(result, "one_way_shear")
        table = result.strength_table
        assert table is not None and table.cases
        along, index, diagram = self._design(result)
        self.along, self.diagram = along, diagram
        plain = bool(flexure.plain)
        data = section_data(result, along)
        assert data is not None
        self.data = data
        self.section.render(data, units)
        self.numbers.setText(self._numbers_text(flexure, shear, data, units))
        case = table.cases[index]
        self.case_words = case_text(case.combination.name, case.direction.value)
        self._render_along(wall, result, along, diagram, plain, units)

    # ---- text --------------------------------------------------------------------------------

    @staticmethod
    def _numbers_text(flexure: Any, shear: Any, data: SectionData, units: str) -> str:
        per = "ft" if units == "US" else "m"
        q = format_quantity(flexure.q_u, Kind.PRESSURE, units)
        words = case_text(flexure.combination, flexure.direction) if flexure.combination else "no strength case"
        flex_ok = flexure.moment <= flexure.moment_capacity * (1.0 + 1e-9)
        shear_ok = shear.shear <= shear.shear_capacity * (1.0 + 1e-9)
        beyond = " (section beyond the edge)" if data.shear_section <= 0.0 else ""
        rows = [
            f"<b>Across the width</b>, per {per}, at {words}: q<sub>u</sub> {q}",
            f"M<sub>u</sub> {per_length(flexure.moment, 'moment', units)} vs φM<sub>n</sub> "
            f"{per_length(flexure.moment_capacity, 'moment', units)} {_mark(flex_ok)};&nbsp; "
            f"V<sub>u</sub> {per_length(shear.shear, 'shear', units)} vs φV<sub>n</sub> "
            f"{per_length(shear.shear_capacity, 'shear', units)} {_mark(shear_ok)}{beyond}",
        ]
        cover = per_length(data.cover, "bar", units, 1 if units == "US" else 0)
        if flexure.plain:
            rows.append("<b>plain concrete</b> across the width: no bars (ACI 318-19 chapter 14)")
        else:
            area_decimals = 3 if units == "US" else 0
            bars = (
                spaced_text(data.transverse_bar, data.transverse_spacing, units)
                if data.transverse_bar is not None and data.transverse_spacing is not None
                else flexure.bars
            )
            provided = flexure.steel_provided or 0.0
            as_ok = provided >= (flexure.steel_required or 0.0) * (1.0 - 1e-9)
            ld, available = flexure.development_length, flexure.development_available
            ld_ok = ld is not None and available is not None and ld <= available * (1.0 + 1e-9)
            decimals = 1 if units == "US" else 0
            rows.append(
                f"<b>{bars}</b>: A<sub>s</sub> {per_length(flexure.steel_required, 'area', units, area_decimals)} "
                f"required, {per_length(flexure.steel_provided, 'area', units, area_decimals)} provided {_mark(as_ok)};&nbsp; "
                f"ℓ<sub>d</sub> {per_length(ld, 'bar', units, decimals)} needed, "
                f"{per_length(available, 'bar', units, decimals)} available {_mark(ld_ok)}"
            )
        along = ", ".join(f"{counted_text(len(r.across), r.bar, units)} {r.face}" for r in data.rows)
        rows.append(f"along: {along or 'no bars'};&nbsp; cover {cover}")
        return "<br>".join(rows)

    def _render_along(
        self, wall: Wall, result: WallResult, along: LongitudinalDesign, diagram: BeamDiagram, plain: bool, units: str
    ) -> None:
        long_unit = LONG[1] if units == "SI" else LONG[0]
        fl = unit_factor(long_unit, "[length]")
        force = unit_label(Kind.FORCE, units)
        moment = unit_label(Kind.MOMENT, units)
        ff = unit_factor(Kind.FORCE.info.display_si if units == "SI" else Kind.FORCE.info.display_us, "[force]")
        fm = unit_factor(Kind.MOMENT.info.display_si if units == "SI" else Kind.MOMENT.info.display_us, "[force] * [length]")
        assert fl is not None and ff is not None and fm is not None
        x, v, m = diagram.drawing()
        length = result.length / fl
        xs = x / fl
        self.moment_plot.getPlotItem().setLabel("bottom", f"along the footing ({long_unit})")
        k = int(np.argmax(np.abs(v))) if v.size else 0
        shear_extremes = []
        if v.size and abs(float(v[k])) > 0.0:
            shear_extremes.append((float(xs[k]), float(v[k]) / ff, f"|V| max {trim(diagram.max_shear / ff, 2)} {force}"))
        self.shear_plot.render(xs, v / ff, length, shear_extremes, f"V ({force})")
        moment_extremes = []
        noise = 1e-6 * max(abs(diagram.max_moment), abs(diagram.min_moment), 1e-30)
        bottom_bars = _face_words(along.bottom, units)
        top_bars = _face_words(along.top, units)
        if diagram.max_moment > noise:
            moment_extremes.append(
                (
                    diagram.max_moment_at / fl,
                    diagram.max_moment / fm,
                    f"+M {trim(diagram.max_moment / fm, 2)} {moment}" + (f": bottom {bottom_bars}" if bottom_bars else ""),
                )
            )
        if diagram.min_moment < -noise:
            moment_extremes.append(
                (
                    diagram.min_moment_at / fl,
                    diagram.min_moment / fm,
                    f"−M {trim(-diagram.min_moment / fm, 2)} {moment}" + (f": top {top_bars}" if top_bars else ""),
                )
            )
        self.moment_plot.render(xs, m / fm, length, moment_extremes, f"M ({moment})")
        head = f"Along the length, as a beam on the soil, at {self.case_words} (+M: bottom in tension)"
        bars = f"bottom {bottom_bars or 'none'}, top {top_bars or 'none'}"
        bars += f" {OK_MARK}" if along.passes else f" {NG_MARK}"
        text = f"{head}; {bars}"
        if not along.passes and along.message:
            text += f". {_sentence(along.message)}"
        self.along_caption.setText(text)
        self.along_caption.setStyleSheet(f"color: {WARM};" if not along.passes else "")

    # ---- for tests ---------------------------------------------------------------------------

    def case_diagram(self, index: int) -> BeamDiagram:
        """The engine's diagram of strength case ``index`` of the shown result."""
        assert self._args is not None and self._args[1] is not None
        result = self._args[1]
        assert result.strength_table is not None and result.strength_evaluation is not None
        return case_diagram(result.strength_table, result.strength_evaluation, index)

    def cannot_spread(self) -> bool:
        return self.along is not None and CANNOT_SPREAD in self.along.message


def _face_words(face: Any, units: str) -> str:
    if face.bar is None or face.count <= 0:
        return ""
    return counted_text(face.count, face.bar, units)


def _sentence(text: str) -> str:
    return text[:1].upper() + text[1:] + ("" if text.endswith(".") else ".")

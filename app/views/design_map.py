"""The design map: every candidate footing width (across) and thickness (up) of the sizing grid.

Passing candidates are filled, failing ones left pale, candidates narrower than the wall greyed. Each
registered check's boundary is drawn where its ratio / required reaches 1 (from the engine's
``check_normalized``, one row per check of ``SizingResult.checks``), with its own dash pattern and
name, so the map shows which check limits the size; embedment, which depends on the thickness t_f
only, is a level line. The engine's chosen size is ringed, the current size marked with a cross.
Hovering reads out every check's ratio at a cell; clicking a passing cell adopts it (one undoable
command). When sizing also chose the footing's length, the map is the one at the chosen extension and
adopting a cell adopts that length too.
"""

from __future__ import annotations

import math

import numpy as np
import pyqtgraph as pg
from kernline.engine.registry import Check
from kernline.engine.sizing import SizingResult, sized_footing_values
from kernline.engine.stability import table_checks
from kernline.engine.units import Kind
from PySide6.QtCore import QPointF, QRectF, Qt, Signal
from PySide6.QtWidgets import (
    QBoxLayout,
    QFrame,
    QGridLayout,
    QHBoxLayout,
    QLabel,
    QPushButton,
    QScrollArea,
    QVBoxLayout,
    QWidget,
)

from .. import commands
from ..document import ProjectDocument, SizingEntry
from ..style import ACCENT, ACCENT_LIGHT, GRAPHITE, MUTED, PAPER, WARM, check_style, configure_pyqtgraph
from .elevation import _pen
from .fields import LONG, SHORT, trim, unit_factor

NOT_ALLOWED, FAILS, PASSES = 0, 1, 2
# Clip for drawing boundaries: "no demand" (inf) becomes a large finite number.
_CLIP = 1.0e3
RING_ROOM = 0.08  # of the grid's span, kept around it for the ring of a corner cell before the plot has a size
RING_RADIUS_PX = 11.0  # the chosen ring's 18 px symbol, its pen and a pixel to spare
LABEL_GAP_PX = 3.0  # between a boundary's end and its label, and between two nudged labels
SIDE_WIDTH = 320  # px: the buttons, message and legend beside the map
_NO_LIMIT = 16_777_215  # Qt's QWIDGETSIZE_MAX


def _rgb(hex_colour: str) -> list[int]:
    h = hex_colour.lstrip("#")
    return [int(h[i : i + 2], 16) for i in (0, 2, 4)]


def boundary_lines(values: np.ndarray, widths: np.ndarray, thicknesses: np.ndarray) -> tuple[np.ndarray, np.ndarray]:
    """Where ``values`` (rows = thicknesses, cols = widths) crosses 1, as x/y arrays separated by NaN.

    Marching squares (pyqtgraph's isocurve) in pixel-edge coordinates, mapped to widths and
    thicknesses at the cell centres.
    """
    data = np.clip(np.nan_to_num(values, nan=0.0, posinf=_CLIP, neginf=0.0), 0.0, _CLIP)
    if data.size == 0 or data.min() >= 1.0 or data.max() < 1.0 or min(data.shape) < 2:
        return np.zeros(0), np.zeros(0)
    dw = float(widths[1] - widths[0]) if widths.size > 1 else 1.0
    dt = float(thicknesses[1] - thicknesses[0]) if thicknesses.size > 1 else 1.0
    xs: list[float] = []
    ys: list[float] = []
    for line in pg.isocurve(data, 1.0, connected=True, extendToEdge=True):
        for r, c in line:
            xs.append(float(widths[0]) + (float(c) - 0.5) * dw)
            ys.append(float(thicknesses[0]) + (float(r) - 0.5) * dt)
        xs.append(math.nan)
        ys.append(math.nan)
    return np.array(xs), np.array(ys)


def dash_glyph(dashes: tuple[float, ...]) -> str:
    """The legend glyph of a line drawn with the dash pattern ``dashes`` (on, off, on, off, … in pen
    widths, as QPen.setDashPattern takes it; an off length of 0 is a solid line).

    A short mark (under 2 pen widths) is a dot, a long one (10 or more) an em dash, others en dashes;
    gaps of 2 pen widths or more are spaces. The pattern repeats until the glyph shows three marks.
    """
    if len(dashes) < 2 or not any(dashes[1::2]):
        return "───"
    period = ["·" if on < 2 else "—" if on >= 10 else "–" for on in dashes[0::2]]
    spaced = any(off >= 2 for off in dashes[1::2])
    marks = [period[k % len(period)] for k in range(max(3, len(period) + 1))]
    return (" " if spaced else "").join(marks)


def _line_end(
    xs: np.ndarray, ys: np.ndarray, x_span: tuple[float, float], y_span: tuple[float, float]
) -> tuple[float, float] | None:
    """The end of a boundary where its label goes: of the ends of its pieces, the one farthest up and to
    the right of the grid (away from the small sizes, where the ring usually sits)."""
    finite = np.isfinite(xs) & np.isfinite(ys)
    if not finite.any():
        return None
    idx = np.flatnonzero(finite)
    # ends of the pieces: first and last finite index of each run between NaNs
    breaks = np.flatnonzero(np.diff(idx) > 1)
    ends = np.unique(np.concatenate([idx[[0, -1]], idx[breaks], idx[breaks + 1]]))
    sx = (x_span[1] - x_span[0]) or 1.0
    sy = (y_span[1] - y_span[0]) or 1.0
    score = (xs[ends] - x_span[0]) / sx + (ys[ends] - y_span[0]) / sy
    k = int(ends[int(np.argmax(score))])
    return float(xs[k]), float(ys[k])


def _length_sized(s: SizingResult) -> bool:
    """Whether sizing tried more than one length (the wall has extension bounds)."""
    return s.extensions is not None and s.extensions.size > 1


def _extensions(entry: SizingEntry) -> dict[str, float] | None:
    """The extensions the map's cells stand for, when sizing chose the footing's length (else None).

    The map is the one at the chosen extension (the largest tried when nothing passes), added at both ends.
    """
    s = entry.result
    if not _length_sized(s):
        return None
    assert s.extensions is not None
    e = s.extension if s.extension is not None else float(s.extensions[-1])
    footing = entry.wall.footing
    return {"extension_start": footing.extension_start + e, "extension_end": footing.extension_end + e}


def _free_top(wanted: float, left: float, w: float, h: float, placed: list[QRectF], bounds: QRectF) -> float | None:
    """The top (scene y) nearest ``wanted`` at which a w × h label at ``left`` stays inside ``bounds`` and
    clear of ``placed``; tries steps up and down alternately. None when nothing is clear."""
    low, high = bounds.top(), bounds.bottom() - h
    start = min(max(wanted, low), high)
    step = 2.0
    tops = [start]
    for k in range(1, int((bounds.height() + h) / step) + 2):
        tops += [start - k * step, start + k * step]
    for top in tops:
        if not low - 1e-6 <= top <= high + 1e-6:
            continue
        rect = QRectF(left, top, w, h).adjusted(-1, -LABEL_GAP_PX / 2, 1, LABEL_GAP_PX / 2)
        if not any(rect.intersects(other) for other in placed):
            return top
    return None


def _layout(items: list[tuple[QPointF, float, float]], bounds: QRectF) -> tuple[int, list[QRectF]]:
    """Rectangles for labels of size w × h at line ends p, in this order: each just above its end, right
    of it (left when the right would leave ``bounds``), nudged up or down clear of those placed before it
    (beside one of them when the plot is too short for that). Returns
    how many found no clear place (those stay at their end, inside ``bounds``) and the rectangles."""
    placed: list[QRectF] = []
    misses = 0
    for p, w, h in items:
        right_side, left_side = p.x() + LABEL_GAP_PX, p.x() - LABEL_GAP_PX - w
        sides = [right_side, left_side] if right_side + w <= bounds.right() else [left_side, right_side]
        # last resorts on a short plot: beside a label already placed
        sides += sorted(
            (x for r in placed for x in (r.left() - w - LABEL_GAP_PX, r.right() + LABEL_GAP_PX)), key=lambda x: abs(x - sides[0])
        )
        sides = [min(max(x, bounds.left()), bounds.right() - w) for x in sides]
        rect = None
        for left in sides:
            top = _free_top(p.y() - h, left, w, h, placed, bounds)
            if top is not None:
                rect = QRectF(left, top, w, h)
                break
        if rect is None:
            misses += 1
            rect = QRectF(sides[0], min(max(p.y() - h, bounds.top()), bounds.bottom() - h), w, h)
        placed.append(rect)
    return misses, placed


class DesignMapView(QWidget):
    """Map of the sizing grid of the selected wall."""

    size_requested = Signal()
    size_all_requested = Signal()

    def __init__(self, document: ProjectDocument, parent: QWidget | None = None) -> None:
        configure_pyqtgraph()
        super().__init__(parent)
        self.document = document
        self.message = QLabel(self)
        self.message.setWordWrap(True)
        self.size_button = QPushButton("Size this footing")
        self.size_button.setToolTip(
            "Search the wall's sizing grid for the passing footing with the least B × t_f (the least volume when "
            "its length is sized too) (Ctrl+M)"
        )
        self.size_all_button = QPushButton("Size all walls")
        self.size_all_button.setToolTip("Size every wall of the project (Ctrl+Shift+M)")
        self.adopt_button = QPushButton("Adopt ringed size")
        self.adopt_button.setToolTip("Make the engine's chosen size this wall's footing (undoable)")
        self.adopt_all_button = QPushButton("Adopt all chosen sizes")
        self.adopt_all_button.setToolTip(
            "Make each failing wall's chosen size its footing, in one undoable step; walls that pass keep theirs"
        )
        buttons = QGridLayout()
        buttons.setSpacing(3)
        for k, b in enumerate((self.size_button, self.size_all_button, self.adopt_button, self.adopt_all_button)):
            buttons.addWidget(b, k // 2, k % 2)

        self.plot = pg.PlotWidget(self)
        self.plot.setObjectName("designMap")
        item = self.plot.getPlotItem()
        item.setMenuEnabled(False)
        item.hideButtons()
        item.disableAutoRange()
        item.setMouseEnabled(x=False, y=False)
        for name in ("left", "bottom"):
            axis = item.getAxis(name)
            axis.enableAutoSIPrefix(False)
            axis.setPen(_pen(MUTED))
            axis.setTextPen(_pen(MUTED))
        self.image = pg.ImageItem()
        lut = np.array([_rgb("#dcd9d2"), _rgb(PAPER), _rgb(ACCENT_LIGHT)], dtype=np.ubyte)
        self.image.setLookupTable(lut)
        self.image.setLevels((0, 2))
        item.addItem(self.image)
        self.checks: tuple[Check, ...] = ()
        self.boundaries: list[pg.PlotCurveItem] = []
        self.boundary_labels: list[pg.TextItem] = []
        self.chosen = pg.ScatterPlotItem(size=18, symbol="o", pen=pg.mkPen(ACCENT, width=2.5), brush=pg.mkBrush(None))
        self.current = pg.ScatterPlotItem(size=14, symbol="x", pen=pg.mkPen(GRAPHITE, width=1), brush=pg.mkBrush(GRAPHITE))
        for it in (self.chosen, self.current):
            it.setZValue(5)
            item.addItem(it)
        self.readout = QLabel("Hover over a cell to read its ratios; click a passing cell to adopt it.", self)
        self.readout.setObjectName("hint")
        self.legend = QLabel(self)
        self._set_checks(table_checks())  # the legend before any sizing: the checks a sizing will evaluate
        self.legend.setObjectName("hint")
        self.legend.setWordWrap(True)
        self.readout.setWordWrap(True)
        side = QVBoxLayout()
        side.setSpacing(6)
        side.addLayout(buttons)
        side.addWidget(self.message)
        side.addWidget(self.readout)
        side.addStretch(1)
        side.addWidget(self.legend)
        side.setContentsMargins(0, 0, 4, 0)
        side_box = QWidget()
        side_box.setLayout(side)
        # a short panel scrolls its side column instead of squeezing the buttons and cutting the text
        self.side = QScrollArea(self)
        self.side.setObjectName("designMapSide")
        self.side.setWidget(side_box)
        self.side.setWidgetResizable(True)
        self.side.setFrameShape(QFrame.Shape.NoFrame)
        self.side.setHorizontalScrollBarPolicy(Qt.ScrollBarPolicy.ScrollBarAlwaysOff)
        self.side.setFixedWidth(SIDE_WIDTH)
        layout = QHBoxLayout(self)
        layout.setContentsMargins(4, 4, 4, 4)
        layout.setSpacing(6)
        layout.addWidget(self.plot, 1)
        layout.addWidget(self.side)
        self.row = layout
        self.plot_lent = False  # the map shown in another pane's place (see lend_plot)

        self.entry: SizingEntry | None = None
        self.fresh = False
        self.busy = False
        self._grid_key: tuple | None = None
        self._grid_rect: QRectF | None = None
        self._cell = (1.0, 1.0)
        self._label_ends: list[tuple[float, float] | None] = []
        self._units = ""
        self.size_button.clicked.connect(self.size_requested)
        self.size_all_button.clicked.connect(self.size_all_requested)
        self.adopt_button.clicked.connect(self.adopt_chosen)
        self.adopt_all_button.clicked.connect(lambda: self.adopt_all())  # clicked(bool) must not reach include_passing
        self.plot.getPlotItem().getViewBox().sigResized.connect(self._on_resized)
        self.plot.scene().sigMouseMoved.connect(self._on_mouse_moved)
        self.plot.scene().sigMouseClicked.connect(self._on_mouse_clicked)

    # ---- rendering -----------------------------------------------------------------------------

    def _unit(self) -> tuple[str, float]:
        unit = SHORT[1] if self.document.units == "SI" else SHORT[0]
        return unit, unit_factor(unit, Kind.LENGTH)

    def _set_checks(self, checks: tuple[Check, ...]) -> None:
        """A boundary line, its label and a legend entry for each check of the sizing result."""
        if checks == self.checks:
            return
        item = self.plot.getPlotItem()
        for old in (*self.boundaries, *self.boundary_labels):
            item.removeItem(old)
        self.boundaries, self.boundary_labels = [], []
        glyphs = []
        for k, check in enumerate(checks):
            dashes, tone, _glyph = check_style(k)
            dashed = len(dashes) > 1 and any(dashes[1::2])
            pen = _pen(tone, 2.0, Qt.PenStyle.CustomDashLine if dashed else Qt.PenStyle.SolidLine)
            pen.setCapStyle(Qt.PenCapStyle.FlatCap)  # the marks as long as the pattern says, as the glyph shows them
            if dashed:
                pen.setDashPattern(list(dashes))
            curve = pg.PlotCurveItem(pen=pen, connect="finite")
            curve.setZValue(3)
            item.addItem(curve)
            self.boundaries.append(curve)
            label = pg.TextItem("", color=tone, anchor=(0, 0))
            label.textItem.document().setDocumentMargin(1.0)
            label.setZValue(4)
            item.addItem(label)
            self.boundary_labels.append(label)
            glyphs.append(f"{dash_glyph(dashes)} {check.title.lower()}")
        self.checks = checks
        self.legend.setText(
            "Filled cells pass every check; grey cells are narrower than the wall. "
            "Lines: where a check reaches its required ratio:\n"
            # two lines to a row, so that a glyph never parts from its check's name at a wrap
            + "\n".join("    ".join(glyphs[i : i + 2]) for i in range(0, len(glyphs), 2))
            + "\n◯ smallest passing size (least B × t_f)   ✕ current size"
        )

    def legend_glyphs(self) -> dict[str, str]:
        """Each check's legend glyph by its name, as the legend prints it."""
        return {c.title.lower(): dash_glyph(check_style(k)[0]) for k, c in enumerate(self.checks)}

    def legend_checks(self) -> list[str]:
        """The checks the legend names, in its order."""
        return [c.title.lower() for c in self.checks]

    def render(self) -> None:  # type: ignore[override]
        doc = self.document
        wall = doc.current_wall
        entry, fresh = doc.sizing_for(wall)
        self.entry, self.fresh = entry, fresh
        unit, f = self._unit()
        item = self.plot.getPlotItem()
        if doc.units != self._units:
            item.setLabel("bottom", f"footing width B ({unit})")
            item.setLabel("left", f"footing thickness t_f ({unit})")
            self._units = doc.units
            self._grid_key = None
        if not doc.checkable:  # site values missing: nothing to size against
            entry = self.entry = None
        self.adopt_all_button.setEnabled(doc.checkable and bool(self.adoptable_sizes()))
        if entry is None:
            self.image.clear()
            for curve in self.boundaries:
                curve.setData([], [])
            for label in self.boundary_labels:
                label.setText("")
            self.chosen.setData([], [])
            self.current.setData([], [])
            self.adopt_button.setEnabled(False)
            if not doc.checkable:
                self.message.setText("Nothing to size against yet: enter " + doc.missing_text() + ".")
            else:
                self.message.setText(
                    "Sizing…" if self.busy else f"Wall {wall.id} has not been sized yet. Press “Size this footing”."
                )
            return
        s = entry.result
        self._set_checks(tuple(s.checks))
        widths, thicknesses = s.widths / f, s.thicknesses / f
        state = np.where(s.allowed, np.where(s.passes, PASSES, FAILS), NOT_ALLOWED).astype(np.ubyte)
        self.image.setImage(state, autoLevels=False, levels=(0, 2))
        dw = float(widths[1] - widths[0]) if widths.size > 1 else 1.0
        dt = float(thicknesses[1] - thicknesses[0]) if thicknesses.size > 1 else 1.0
        rect = QRectF(float(widths[0]) - dw / 2, float(thicknesses[0]) - dt / 2, dw * widths.size, dt * thicknesses.size)
        self.image.setRect(rect)
        key = (rect.x(), rect.y(), rect.width(), rect.height())
        if key != self._grid_key:
            self._grid_key = key
            self._grid_rect = QRectF(rect)
            self._cell = (dw, dt)
            self._fit_range()
        self._label_ends = []
        x_span = (float(widths[0]), float(widths[-1]))
        y_span = (float(thicknesses[0]), float(thicknesses[-1]))
        for k, curve in enumerate(self.boundaries):
            xs, ys = boundary_lines(s.check_normalized[k], widths, thicknesses)
            curve.setData(xs, ys)
            end = _line_end(xs, ys, x_span, y_span)
            self.boundary_labels[k].setText(self.checks[k].title.lower() if end is not None else "")
            self._label_ends.append(end)
        self._place_labels()
        if s.feasible:
            self.chosen.setData([s.width / f], [s.thickness / f])
        else:
            self.chosen.setData([], [])
        self.current.setData([wall.footing.width / f], [wall.footing.thickness / f])
        self.adopt_button.setEnabled(bool(s.feasible and fresh))
        text = self._message(s, unit, f)
        if not fresh:
            text = ("Sizing again…  " if self.busy else "The inputs changed since this map was made; size again.  ") + text
        self.message.setText(text)

    def _fit_range(self) -> None:
        """Show the grid with half a cell more on every side and room for the ring's radius (in pixels,
        from the plot's present size), so the ring and cross at a corner cell show whole."""
        rect = self._grid_rect
        if rect is None:
            return
        dw, dt = self._cell
        box = self.plot.getPlotItem().getViewBox()
        w_px, h_px = box.width(), box.height()

        def room(span: float, cell: float, pixels: float) -> float:
            # the margin m in data units with m >= r px once the view spans span + 2m over the pixels
            if pixels > 4 * RING_RADIUS_PX:
                return max(cell / 2, RING_RADIUS_PX * span / (pixels - 2 * RING_RADIUS_PX))
            return max(cell / 2, RING_ROOM * span)

        px = room(rect.width(), dw, w_px)
        py = room(rect.height(), dt, h_px)
        box.setRange(xRange=(rect.left() - px, rect.right() + px), yRange=(rect.top() - py, rect.bottom() + py), padding=0.0)

    def _on_resized(self) -> None:
        self._fit_range()
        self._place_labels()

    def _place_labels(self) -> None:
        """Put each boundary's label at the boundary's end, inside the plot, nudged up or down (or to the
        other side of the end) clear of the other labels, in scene pixels since the labels keep their
        size on screen."""
        box = self.plot.getPlotItem().getViewBox()
        bounds = box.sceneBoundingRect()
        wanted: list[tuple[pg.TextItem, QPointF, float, float]] = []
        for label, end in zip(self.boundary_labels, self._label_ends, strict=False):
            if end is None or not label.toPlainText():
                continue
            size = label.textItem.boundingRect()
            wanted.append((label, box.mapViewToScene(QPointF(*end)), size.width(), size.height()))
        best: tuple[int, list[QRectF]] | None = None
        # the checks' order first; when a label finds no clear place, the labels top down, then bottom up
        for order in (
            list(range(len(wanted))),
            sorted(range(len(wanted)), key=lambda i: wanted[i][1].y()),
            sorted(range(len(wanted)), key=lambda i: -wanted[i][1].y()),
        ):
            misses, rects = _layout([wanted[i][1:] for i in order], bounds)
            by_label = [rects[order.index(i)] for i in range(len(wanted))]
            if best is None or misses < best[0]:
                best = (misses, by_label)
            if misses == 0:
                break
        if best is None:
            return
        for (label, *_rest), rect in zip(wanted, best[1], strict=True):
            label.setPos(box.mapSceneToView(rect.topLeft()))

    def _message(self, s: SizingResult, unit: str, f: float) -> str:
        if s.feasible:
            assert s.width is not None and s.thickness is not None
            head = f"Smallest passing footing: B {trim(s.width / f, 1)} × t_f {trim(s.thickness / f, 1)} {unit}"
            if _length_sized(s) and s.length is not None:
                long_unit = LONG[1] if self.document.units == "SI" else LONG[0]
                head += f", L_f {trim(s.length / unit_factor(long_unit, Kind.LENGTH), 2)} {long_unit}"
            why = s.message.removeprefix("smallest passing size: ")
            return f"{head}. Why not smaller: {why}."
        return "No candidate passes. " + s.message + ("; " + "; ".join(s.suggestions) if s.suggestions else "")

    # ---- reading and adopting cells ------------------------------------------------------------

    def cell_at(self, x: float, y: float) -> tuple[int, int] | None:
        """(row, col) of the candidate under the point (display units), or None outside the grid."""
        if self.entry is None:
            return None
        _unit, f = self._unit()
        s = self.entry.result
        widths, thicknesses = s.widths / f, s.thicknesses / f
        dw = float(widths[1] - widths[0]) if widths.size > 1 else 1.0
        dt = float(thicknesses[1] - thicknesses[0]) if thicknesses.size > 1 else 1.0
        col = int(round((x - widths[0]) / dw))
        row = int(round((y - thicknesses[0]) / dt))
        if 0 <= col < widths.size and 0 <= row < thicknesses.size:
            return row, col
        return None

    def cell_text(self, row: int, col: int) -> str:
        assert self.entry is not None
        s = self.entry.result
        unit, f = self._unit()
        required = self.document.project.criteria.required
        parts = []
        for k, check in enumerate(s.checks):
            value = float(s.check_normalized[k, row, col])
            name = check.title.lower()
            if math.isinf(value):
                parts.append(f"{name} no demand")
                continue
            ratio = value * required.of(check)
            parts.append(f"{name} {ratio:.2f} {'✓' if value >= 1.0 - 1e-9 else '✗'}")
        if not s.allowed[row, col]:
            verdict = "narrower than the wall it carries"
        elif s.passes[row, col]:
            verdict = "passes — click to adopt"
        else:
            verdict = f"fails ({s.governing_check(row, col).title.lower()} governs)"
        return (
            f"B {trim(s.widths[col] / f, 1)} × t_f {trim(s.thicknesses[row] / f, 1)} {unit}:  "
            + ",  ".join(parts)
            + f"  →  {verdict}"
        )

    def adopt_cell(self, row: int, col: int) -> str | None:
        """Adopt the candidate (row, col) as the wall's footing; returns a refusal message, if any."""
        entry = self.entry
        if entry is None or not self.fresh:
            return "size the footing again first: the inputs changed since this map was made"
        s = entry.result
        if not s.passes[row, col]:
            return "that size does not pass every check; choose a filled cell"
        doc = self.document
        return doc.push(
            commands.adopt_size(doc, doc.current_index, float(s.widths[col]), float(s.thicknesses[row]), _extensions(entry))
        )

    def adopt_chosen(self) -> str | None:
        entry = self.entry
        if entry is None or not entry.result.feasible or not self.fresh:
            return "nothing to adopt"
        doc = self.document
        s = entry.result
        assert s.width is not None and s.thickness is not None
        return doc.push(commands.adopt_size(doc, doc.current_index, s.width, s.thickness, _extensions(entry)))

    def adoptable_sizes(self) -> dict[str, dict[str, float]]:
        """Chosen footing values (width, thickness and, when the length was sized, the extensions) of walls
        whose sizing is current and differs from their footing."""
        doc = self.document
        sizes = {}
        for wall in doc.project.walls:
            entry, fresh = doc.sizing_for(wall)
            if entry is None or not fresh or not entry.result.feasible:
                continue
            values = sized_footing_values(wall, entry.result)
            if any(abs(value - getattr(wall.footing, key)) > 1e-9 for key, value in values.items()):
                sizes[wall.id] = values
        return sizes

    def lend_plot(self, holder: QBoxLayout | None) -> None:
        """Show the map itself in ``holder`` (a short window shows it in the drawings' place, where it has the
        height), the buttons, readout and legend taking this page's whole width; with None, take it back
        beside them. The map's items and labels stay as they are: only its size changes."""
        lent = holder is not None
        if lent == self.plot_lent:
            return
        self.plot_lent = lent
        if holder is not None:
            self.row.removeWidget(self.plot)
            holder.addWidget(self.plot, 1)
            self.side.setMinimumWidth(0)
            self.side.setMaximumWidth(_NO_LIMIT)
        else:
            parent = self.plot.parentWidget()
            layout = parent.layout() if parent is not None else None
            if layout is not None:
                layout.removeWidget(self.plot)
            self.row.insertWidget(0, self.plot, 1)
            self.side.setFixedWidth(SIDE_WIDTH)
        self.plot.show()

    def wall_passes(self, wall_id: str) -> bool:
        """Whether the wall passes every check as it stands (the design along its length too, where there is
        one); a wall without results (not checkable) counts as not passing."""
        result = self.document.results.get(wall_id)
        if result is None:
            return False
        return bool(getattr(result, "passes_all", result.passes))

    def failing_sizes(self) -> dict[str, dict[str, float]]:
        """The :meth:`adoptable_sizes` of the walls that fail as they stand."""
        return {wid: values for wid, values in self.adoptable_sizes().items() if not self.wall_passes(wid)}

    def adopt_all(self, include_passing: bool = False) -> str | None:
        """Make the chosen sizes the walls' footings, in one undoable step; returns a refusal, if any.

        Only walls that fail as they stand change: a wall that passes keeps its footing (its chosen size
        may be smaller, with less margin) unless ``include_passing`` asks for every wall, as the window
        does after listing the changes and asking.
        """
        sizes = self.adoptable_sizes() if include_passing else self.failing_sizes()
        if not sizes:
            return "nothing to adopt"
        doc = self.document
        count = len(sizes)
        walls = f"{count} {'failing ' if not include_passing else ''}wall{'s' if count > 1 else ''}"
        return doc.push(commands.adopt_sizes(doc, sizes, f"Adopt the chosen sizes of {walls}"))

    def _view_point(self, scene_pos) -> tuple[float, float] | None:
        vb = self.plot.getPlotItem().getViewBox()
        if not vb.sceneBoundingRect().contains(scene_pos):
            return None
        p = vb.mapSceneToView(scene_pos)
        return p.x(), p.y()

    def _on_mouse_moved(self, scene_pos) -> None:
        point = self._view_point(scene_pos)
        cell = self.cell_at(*point) if point else None
        if cell is None:
            return
        text = self.cell_text(*cell)
        self.readout.setText(text)
        self.plot.setToolTip(text)

    def _on_mouse_clicked(self, event) -> None:
        if event.button() != Qt.MouseButton.LeftButton:
            return
        point = self._view_point(event.scenePos())
        cell = self.cell_at(*point) if point else None
        if cell is None:
            return
        message = self.adopt_cell(*cell)
        if message:
            self.readout.setText(f"{self.cell_text(*cell)}  —  {message}")
            self.readout.setStyleSheet(f"color: {WARM};")
        else:
            self.readout.setStyleSheet("")
            self.readout.setText(f"Adopted {self.cell_text(*cell).split(':')[0]} (Ctrl+Z undoes it).")

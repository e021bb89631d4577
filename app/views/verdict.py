"""The verdict: each registered check's governing ratio against its requirement, readable without colour.

Each row is a ratio bar (ratio / required, with a tick at 1.0; a failing bar is also hatched) and
text: "2.75 ≥ 1.00  ✓ OK  0.6D + 0.6W (+)". A geometric check (embedment) has no governing case: its
row reads "depth 2'-0" ≥ 1'-6"  ✓ OK  required: below frost (IBC 2021 1809.5)" and names the rule that sets the depth. The rows are the
checks of the engine's results, in the registry's order; the numbers are the engine's.
"""

from __future__ import annotations

import math
from typing import Any

from kernline.engine.model import LateralLoad, Wall
from kernline.engine.registry import Check
from kernline.engine.results import Governing, WallResult
from kernline.engine.stability import table_checks
from kernline.engine.summary import case_text
from kernline.engine.units import format_length
from PySide6.QtCore import QRectF, QSize, Qt
from PySide6.QtGui import QBrush, QColor, QPainter, QPalette, QPen
from PySide6.QtWidgets import QGridLayout, QLabel, QSizePolicy, QVBoxLayout, QWidget

from ..style import ACCENT, GRAPHITE, HAIRLINE, MUTED, WARM, mark

BAR_SPAN = 2.0  # the bar's full width is twice the requirement


def ratio_text(g: Governing) -> str:
    if math.isinf(g.ratio):
        return "no demand"
    sign = "≥" if g.passes else "<"
    return f"{g.ratio:.2f} {sign} {g.required:.2f}"


def _stable(result: WallResult, g: Governing) -> bool:
    """Whether the governing case has equilibrium on the soil (the engine's evaluation, per case)."""
    stable = result.evaluation.stable
    return g.case_index is None or not 0 <= g.case_index < len(stable) or bool(stable[g.case_index])


def depth_texts(g: Governing, units: str) -> tuple[str, str] | None:
    """An embedment-style record (depth, required depth, frost depth) as (ratio words, rule words); None otherwise."""
    record: Any = g.record
    depth = getattr(record, "depth", None)
    need = getattr(record, "required_depth", None)
    if depth is None or need is None:
        return None
    sign = "≥" if g.passes else "<"
    ratio = f"depth {format_length(depth, units)} {sign} {format_length(need, units)}"
    frost = getattr(record, "frost_depth", None)
    if frost is not None and frost >= need - 1e-12:
        rule = "required: below frost (IBC 2021 1809.5)"
    else:
        rule = "required: 12 in (IBC 2021 1809.4)"
    return ratio, rule


class RatioBar(QWidget):
    """ratio / required as a bar with a tick at 1.0; hatched when failing."""

    def __init__(self, parent: QWidget | None = None) -> None:
        super().__init__(parent)
        self.normalized = 0.0
        self.passes = True
        self.no_demand = False
        self.setMinimumWidth(90)
        self.setSizePolicy(QSizePolicy.Policy.Expanding, QSizePolicy.Policy.Fixed)

    def sizeHint(self) -> QSize:  # noqa: N802 - Qt's name
        return QSize(160, 16)

    def set_value(self, normalized: float, passes: bool) -> None:
        self.no_demand = math.isinf(normalized)
        self.normalized = 0.0 if self.no_demand else max(0.0, normalized)
        self.passes = passes
        self.update()

    def paintEvent(self, _event) -> None:  # noqa: N802 - Qt's name
        p = QPainter(self)
        p.setRenderHint(QPainter.RenderHint.Antialiasing, False)
        w, h = self.width() - 1, self.height() - 1
        p.setPen(QPen(QColor(HAIRLINE)))
        p.setBrush(Qt.BrushStyle.NoBrush)
        p.drawRect(0, 2, w, h - 4)
        if not self.no_demand:
            fraction = min(self.normalized / BAR_SPAN, 1.0)
            colour = QColor(ACCENT if self.passes else WARM)
            p.setPen(Qt.PenStyle.NoPen)
            p.setBrush(QBrush(colour, Qt.BrushStyle.SolidPattern if self.passes else Qt.BrushStyle.BDiagPattern))
            p.drawRect(QRectF(1, 3, max(0.0, fraction * (w - 1)), h - 5))
            if not self.passes:
                p.setPen(QPen(colour))
                p.setBrush(Qt.BrushStyle.NoBrush)
                p.drawRect(QRectF(1, 3, max(0.0, fraction * (w - 1)), h - 5))
        tick = int(w / BAR_SPAN)
        p.setPen(QPen(QColor(GRAPHITE), 2))
        p.drawLine(tick, 0, tick, h)
        p.end()


class VerdictView(QWidget):
    """Headline, one row per registered check and a hint for what to do next."""

    def __init__(self, parent: QWidget | None = None) -> None:
        super().__init__(parent)
        self.setObjectName("verdict")
        self.headline = QLabel(self)
        self.headline.setObjectName("verdictHead")
        self.headline.setWordWrap(True)
        self.grid = QGridLayout()
        self.grid.setContentsMargins(0, 0, 0, 0)
        self.grid.setHorizontalSpacing(10)
        self.grid.setVerticalSpacing(0)  # the bars keep 2 px above and below: rows stay apart
        self.grid.setColumnStretch(1, 2)
        self.grid.setColumnStretch(4, 3)
        self.rows: dict[Check, tuple[QLabel, RatioBar, QLabel, QLabel, QLabel]] = {}
        self.hint = _Hint(self)
        self.hint.setObjectName("hint")
        self.hint.setWordWrap(True)
        layout = QVBoxLayout(self)
        layout.setContentsMargins(6, 3, 6, 2)
        layout.setSpacing(2)
        layout.addWidget(self.headline)
        layout.addLayout(self.grid)
        layout.addWidget(self.hint)
        self._set_checks(table_checks())  # the rows are there from the start: a first result does not relayout

    def _set_checks(self, checks: tuple[Check, ...]) -> None:
        """One row per check, in the order given (the engine's results follow the registry)."""
        if tuple(self.rows) == checks:
            return
        for row in self.rows.values():
            for widget in row:
                self.grid.removeWidget(widget)
                widget.hide()  # deleteLater waits for the event loop: never paint a removed row meanwhile
                widget.deleteLater()
        self.rows = {}
        for r, check in enumerate(checks):
            name = QLabel(check.title)
            name.setToolTip(f"{check.title}: {check.ratio_words} ({check.basis})")
            bar = RatioBar()
            ratio = QLabel()
            ratio.setObjectName(f"ratio_{check.id}")
            verdict = QLabel()
            verdict.setObjectName(f"mark_{check.id}")
            case = QLabel()
            case.setObjectName(f"case_{check.id}")
            case.setStyleSheet(f"color: {MUTED};")
            # the case column takes the room that is left: it never widens the window (its tooltip has it all)
            case.setSizePolicy(QSizePolicy.Policy.Ignored, QSizePolicy.Policy.Preferred)
            case.setMinimumWidth(60)
            for c, widget in enumerate((name, bar, ratio, verdict, case)):
                self.grid.addWidget(widget, r, c)
                widget.setVisible(self.checked)
            self.rows[check] = (name, bar, ratio, verdict, case)
        # never squeezed below its rows (six with the concrete checks): the tabs under it give way
        layout = self.layout()
        if layout is not None:
            layout.activate()
            self.setMinimumHeight(layout.minimumSize().height())

    def render_unchecked(self, wall: Wall, missing: str) -> None:
        """The project cannot be checked (site values missing): say so, and what to enter, in place of ratios."""
        for row in self.rows.values():
            for widget in row:
                widget.hide()
        self.headline.setText(f"Wall {wall.id}: not checked — values Kernline does not guess are still to be entered")
        _set_colour(self.headline, WARM, bold=True)
        self.hint.setText(f"Enter {missing}. Until then Kernline checks nothing: it does not guess site or code values.")
        self.checked = False

    checked = True

    def render(self, wall: Wall, result: WallResult, units: str = "US") -> None:  # type: ignore[override]
        if not self.checked:
            for row in self.rows.values():
                for widget in row:
                    widget.show()
            self.checked = True
        self._set_checks(tuple(result.governing))
        for check, g in result.governing.items():
            name, bar, ratio, verdict, case = self.rows[check]
            bar.set_value(g.normalized, g.passes)
            no_demand = math.isinf(g.ratio)
            depth = depth_texts(g, units)
            if depth is not None:  # a geometric check: the depths themselves, and the rule that sets the requirement
                ratio.setText(depth[0])
                case.setText(depth[1])
                case.setToolTip(
                    f"Depth of the footing's bottom below grade (soil cover + t_f) {depth[0].removeprefix('depth ')}; " + depth[1]
                )
            else:
                # an unstable case has no pressure to compare: the resultant falls beyond the footing's end
                unstable = g.ratio == 0.0 and not _stable(result, g)
                ratio.setText("no equilibrium" if unstable else ratio_text(g))
                case.setText(case_text(g))
                case.setToolTip(f"Governing case: {case_text(g)}" if case_text(g) else "")
            # "no demand" is said once, by the ratio; the mark column keeps only its symbol
            verdict.setText(mark(None).split()[0] if no_demand else mark(g.passes))
            _set_colour(verdict, WARM if not g.passes else GRAPHITE, bold=True)
        worst = result.worst
        if result.passes:
            self.headline.setText(f"Wall {wall.id}: {mark(True)} — every check meets its required ratio")
        else:
            failing = [c.title.lower() for c, g in result.governing.items() if not g.passes]
            self.headline.setText(f"Wall {wall.id}: {mark(False)} — {_listing(failing)} below the required ratio")
        _set_colour(self.headline, GRAPHITE if result.passes else WARM, bold=True)
        self.hint.setText(_hint(wall, result, worst))

    def texts(self) -> dict[str, tuple[str, str, str]]:
        """Shown text per check id: (ratio, mark, case)."""
        return {c.id: (row[2].text(), row[3].text(), row[4].text()) for c, row in self.rows.items()}


class _Hint(QLabel):
    """A wrapping hint whose minimum is one line: it takes a second line only where the column is narrow,
    instead of reserving it at every width (the drawings above need the height)."""

    def minimumSizeHint(self) -> QSize:  # noqa: N802 - Qt's name
        return QSize(0, self.fontMetrics().lineSpacing() if self.text() else 0)


def _listing(words: list[str]) -> str:
    """ "a", "a and b", "a, b and c"."""
    return words[0] if len(words) == 1 else ", ".join(words[:-1]) + " and " + words[-1]


def _set_colour(label: QLabel, colour: str, bold: bool = False) -> None:
    """Set a label's text colour through its palette, only when it changes (a style sheet per render
    would re-polish the label and relayout the window)."""
    if label.property("tone") == colour:
        return
    label.setProperty("tone", colour)
    palette = label.palette()
    palette.setColor(QPalette.ColorRole.WindowText, QColor(colour))
    label.setPalette(palette)
    if bold:
        font = label.font()
        font.setBold(True)
        label.setFont(font)


def _hint(wall: Wall, result: WallResult, worst: Governing) -> str:
    idle = [c.title.lower() for c, g in result.governing.items() if math.isinf(g.ratio)]
    if idle and not any(isinstance(ld, LateralLoad) for ld in wall.loads):
        verb = "has" if len(idle) == 1 else "have"
        return f"No lateral load on this wall: {_listing(idle)} {verb} no demand. Add a W or E lateral load to check them."
    if not result.passes:
        return "Size this footing (Ctrl+M): the smallest size that passes, and the check that limits it."
    return ""

"""The verdict: each check's governing ratio against its requirement, readable without colour.

Each row is a ratio bar (ratio / required, with a tick at 1.0; a failing bar is also hatched) and
text: "2.75 ≥ 1.00  ✓ OK  0.6D + 0.6W (+)". The numbers are the engine's governing results.
"""

from __future__ import annotations

import math

from PySide6.QtCore import QRectF, QSize, Qt
from PySide6.QtGui import QBrush, QColor, QPainter, QPalette, QPen
from PySide6.QtWidgets import QGridLayout, QLabel, QSizePolicy, QVBoxLayout, QWidget

from engine.model import ALL_CHECKS, Check, LateralLoad, Wall
from engine.results import Governing, WallResult

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
    return not 0 <= g.case_index < len(stable) or bool(stable[g.case_index])


def case_text(g: Governing) -> str:
    if math.isinf(g.ratio):
        return ""
    return g.combination if g.direction == "none" else f"{g.combination} ({g.direction})"


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
    """Headline, three check rows and a hint for what to do next."""

    def __init__(self, parent: QWidget | None = None) -> None:
        super().__init__(parent)
        self.setObjectName("verdict")
        self.headline = QLabel(self)
        self.headline.setObjectName("verdictHead")
        self.headline.setWordWrap(True)
        grid = QGridLayout()
        grid.setContentsMargins(0, 0, 0, 0)
        grid.setHorizontalSpacing(10)
        grid.setVerticalSpacing(2)
        self.rows: dict[Check, tuple[QLabel, RatioBar, QLabel, QLabel, QLabel]] = {}
        for r, check in enumerate(ALL_CHECKS):
            name = QLabel(check.value.capitalize())
            bar = RatioBar()
            ratio = QLabel()
            ratio.setObjectName(f"ratio_{check.value}")
            verdict = QLabel()
            verdict.setObjectName(f"mark_{check.value}")
            case = QLabel()
            case.setObjectName(f"case_{check.value}")
            case.setStyleSheet(f"color: {MUTED};")
            for c, widget in enumerate((name, bar, ratio, verdict, case)):
                grid.addWidget(widget, r, c)
            self.rows[check] = (name, bar, ratio, verdict, case)
        grid.setColumnStretch(1, 2)
        grid.setColumnStretch(4, 3)
        self.hint = QLabel(self)
        self.hint.setObjectName("hint")
        self.hint.setWordWrap(True)
        layout = QVBoxLayout(self)
        layout.setContentsMargins(6, 4, 6, 4)
        layout.setSpacing(3)
        layout.addWidget(self.headline)
        layout.addLayout(grid)
        layout.addWidget(self.hint)

    def render_unchecked(self, wall: Wall, missing: list[str]) -> None:
        """The project cannot be checked (site values missing): say so, and what to enter, in place of ratios."""
        for row in self.rows.values():
            for widget in row:
                widget.hide()
        self.headline.setText(f"Wall {wall.id}: not checked — the project's soil values are still to be entered")
        _set_colour(self.headline, WARM, bold=True)
        self.hint.setText(
            "Enter " + ", ".join(missing) + " from the geotechnical report (Soil, all walls). Until then Kernline "
            "checks nothing: it does not guess site values."
        )
        self.checked = False

    checked = True

    def render(self, wall: Wall, result: WallResult) -> None:  # type: ignore[override]
        if not self.checked:
            for row in self.rows.values():
                for widget in row:
                    widget.show()
            self.checked = True
        for check in ALL_CHECKS:
            g = result.governing[check]
            _name, bar, ratio, verdict, case = self.rows[check]
            bar.set_value(g.normalized, g.passes)
            no_demand = math.isinf(g.ratio)
            unstable = check is Check.BEARING and not _stable(result, g)
            # an unstable case has no pressure to compare: the resultant falls beyond the footing's end
            ratio.setText("no equilibrium" if unstable else ratio_text(g))
            # "no demand" is said once, by the ratio; the mark column keeps only its symbol
            verdict.setText(mark(None).split()[0] if no_demand else mark(g.passes))
            _set_colour(verdict, WARM if not g.passes else GRAPHITE, bold=True)
            case.setText(case_text(g))
        worst = result.worst
        if result.passes:
            self.headline.setText(f"Wall {wall.id}: {mark(True)} — all three checks meet their required ratios")
        else:
            failing = [c.value for c in ALL_CHECKS if not result.governing[c].passes]
            self.headline.setText(f"Wall {wall.id}: {mark(False)} — {', '.join(failing)} below the required ratio")
        _set_colour(self.headline, GRAPHITE if result.passes else WARM, bold=True)
        self.hint.setText(_hint(wall, result, worst))

    def texts(self) -> dict[str, tuple[str, str, str]]:
        """Shown text per check: (ratio, mark, case)."""
        return {c.value: (self.rows[c][2].text(), self.rows[c][3].text(), self.rows[c][4].text()) for c in ALL_CHECKS}


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
    if not any(isinstance(ld, LateralLoad) for ld in wall.loads):
        return "No lateral load on this wall: overturning and sliding have no demand. Add a W or E lateral load to check them."
    if not result.passes:
        return "Size this footing (Ctrl+M) to see the smallest width and thickness that pass, and which check limits them."
    return ""

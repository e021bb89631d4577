"""Kernline's palette and the few style rules of the window (our own: quiet, one accent, one warm tone).

Pass and fail are never told by colour alone: every verdict also carries a word ("OK" / "NG") and a
symbol (✓ / ✗), and the design map's check boundaries differ by dash pattern as well as tone.
"""

from __future__ import annotations

# Text and lines: a graphite grey, not black.
GRAPHITE = "#2f3439"
MUTED = "#6b737b"
HAIRLINE = "#c9ced3"
PAPER = "#fbfaf7"
PANEL = "#f1f0ec"

# The one accent (selection, the chosen size, passing region): a deep slate teal.
ACCENT = "#1f6f78"
ACCENT_LIGHT = "#cfe3e4"
ACCENT_FAINT = "#e7f0f0"

# A warm tone for "NG" and invalid input: burnt sienna.
WARM = "#b4532a"
WARM_LIGHT = "#f5dccf"

# Drawing materials (elevation): concrete, soil, wall.
CONCRETE = "#b9b7b0"
CONCRETE_EDGE = "#55585c"
SOIL = "#e4d9c6"
WALL = "#e9e6df"
LOAD = "#3d4a57"

OK_MARK = "✓"
NG_MARK = "✗"
NO_DEMAND_MARK = "–"

# Line styles of the check boundaries on the design map, given to the registered checks in their order
# (overturning, sliding, bearing, embedment, ...; a further check reuses them from the start): a dash
# pattern (dash, gap, ...; (1, 0) is solid), a tone, and the glyph that draws the pattern in the legend.
CHECK_DASHES = ((1, 0), (6, 3), (1.5, 2.5), (8, 3, 1.5, 3), (12, 4), (8, 3, 1.5, 3, 1.5, 3))
CHECK_TONES = ("#2f3439", "#7a4b8c", "#b4532a", "#6f5f3f", "#2b5f9e", "#8c3a5b")
CHECK_GLYPHS = ("──", "– –", "···", "–·–", "— —", "–··–")


def check_style(index: int) -> tuple[tuple[float, ...], str, str]:
    """(dash pattern, tone, legend glyph) of the ``index``-th check on the design map."""
    k = index % len(CHECK_DASHES)
    return CHECK_DASHES[k], CHECK_TONES[k], CHECK_GLYPHS[k]


STYLE_SHEET = f"""
QMainWindow, QWidget#centre {{ background: {PAPER}; }}
QWidget {{ color: {GRAPHITE}; }}
QLabel#caution {{ color: {GRAPHITE}; background: {PANEL}; border-top: 1px solid {HAIRLINE}; padding: 4px 8px; }}
QLabel#sectionTitle {{ font-weight: 600; color: {GRAPHITE}; }}
QLabel#fieldError {{ color: {WARM}; }}
QLabel#hint {{ color: {MUTED}; }}
QLabel#verdictHead {{ font-weight: 600; }}
QLineEdit {{ border: 1px solid {HAIRLINE}; border-radius: 3px; padding: 2px 4px; background: white; }}
QLineEdit[assumed="true"] {{ border: 1px dashed {MUTED}; background: {PAPER}; }}
QLineEdit:focus {{ border: 1px solid {ACCENT}; }}
QLineEdit[invalid="true"] {{ border: 2px solid {WARM}; background: {WARM_LIGHT}; }}
QLineEdit:read-only, QLineEdit:disabled {{ background: {PANEL}; color: {MUTED}; border: 1px dotted {HAIRLINE}; }}
QComboBox[assumed="true"] {{ border: 1px dashed {MUTED}; border-radius: 3px; padding: 1px 4px; background: {PAPER}; }}
QLabel:disabled {{ color: {MUTED}; }}
QLabel#warningsTitle {{ font-weight: 600; color: {WARM}; }}
QListWidget#warningsList {{ border: 1px solid {HAIRLINE}; background: {PAPER}; }}
QToolButton#sectionToggle {{ border: none; font-weight: 600; text-align: left; padding: 3px 0px; }}
QTreeWidget::item:selected, QTableView::item:selected, QListWidget::item:selected {{
    background: {ACCENT_LIGHT}; color: {GRAPHITE};
}}
QTabWidget::pane {{ border: 1px solid {HAIRLINE}; }}
QScrollArea#verdictBox, QWidget#verdict {{ background: {PAPER}; }}
QToolBar {{ border: none; spacing: 4px; background: {PANEL}; }}
QToolBar QToolButton:checked {{ background: {ACCENT}; color: white; border-radius: 3px; }}
QPushButton {{ padding: 3px 10px; }}
"""


ASSUMED_WORD = "assumed"


def assumed_icon(size: int = 12):
    """Kernline's marker of a value the engineer did not enter: a small open diamond with a dot, in the accent.

    Drawn here (not taken from any icon set); quiet on purpose: the value is legal, only not the engineer's own.
    """
    from PySide6.QtCore import QPointF, Qt
    from PySide6.QtGui import QColor, QIcon, QPainter, QPen, QPixmap, QPolygonF

    pixmap = QPixmap(size, size)
    pixmap.fill(Qt.GlobalColor.transparent)
    p = QPainter(pixmap)
    p.setRenderHint(QPainter.RenderHint.Antialiasing, True)
    c = size / 2
    r = size / 2 - 1.5
    p.setPen(QPen(QColor(ACCENT), 1.3))
    p.setBrush(Qt.BrushStyle.NoBrush)
    p.drawPolygon(QPolygonF([QPointF(c, c - r), QPointF(c + r, c), QPointF(c, c + r), QPointF(c - r, c)]))
    p.setPen(Qt.PenStyle.NoPen)
    p.setBrush(QColor(ACCENT))
    p.drawEllipse(QPointF(c, c), 1.3, 1.3)
    p.end()
    return QIcon(pixmap)


def mark(passes: bool | None) -> str:
    """The symbol and word of a verdict, readable without colour."""
    if passes is None:
        return f"{NO_DEMAND_MARK} no demand"
    return f"{OK_MARK} OK" if passes else f"{NG_MARK} NG"


def configure_pyqtgraph() -> None:
    """pyqtgraph's global options, set before any plot is created (idempotent)."""
    import pyqtgraph as pg

    pg.setConfigOptions(antialias=True, background=PAPER, foreground=GRAPHITE, imageAxisOrder="row-major")

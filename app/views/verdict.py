"""The verdict: each check of the engine's results as a demand against a capacity, with its margin.

One row per check, in the registry's order, readable without colour:

    Bearing        1,043 of 2,000 psf allowable      ✓ OK, 47% margin    1.063D + 0.75L + 0.525E + 0.75S (+)
    Flexure        ℓd 1'-4 3/4" of 4 1/2" available  ✗ NG, 73% short     1.32D + 1.0E + L + 0.2S (+) · #5 @ 12 in entered

The demand and capacity are the check record's numbers in the project's units (engine.summary.
comparison_text); the margin is the share of the usable capacity left (or lacking) at the governing
case (engine.summary.margin_text); the last column names the governing case (a geometric check such as
embedment names the rule that sets its requirement instead) and, for the footing's strength checks,
the transverse bars and whether they were entered or designed by Kernline. A check with nothing to
resist says "no demand"; a case whose resultant leaves the footing says "no equilibrium".

With a concrete design the headline and hint also give the design along the length (the footing as a
beam, ``WallResult.along``). It costs tens of milliseconds, too much for every keystroke, so a render
whose result has not designed it yet says so ("the design along the length follows") and designs it a
moment after the typing stops, then renders again.
"""

from __future__ import annotations

import math
from typing import Any

from kernline.engine.concrete.bars import counted_text
from kernline.engine.model import LateralLoad, Wall
from kernline.engine.registry import Check, Family
from kernline.engine.results import Governing, WallResult
from kernline.engine.schedule import ENTERED, bars_in_units, transverse_entered
from kernline.engine.stability import table_checks
from kernline.engine.summary import (
    NO_DEMAND,
    NO_EQUILIBRIUM,
    case_text,
    comparison_text,
    margin_text,
    state_words,
)
from PySide6.QtCore import QSize, Qt, QTimer
from PySide6.QtGui import QColor, QPainter, QPalette
from PySide6.QtWidgets import QGridLayout, QLabel, QSizePolicy, QVBoxLayout, QWidget

from ..style import GRAPHITE, MUTED, NG_MARK, NO_DEMAND_MARK, OK_MARK, WARM

CASE_FONT_SCALE = 0.92  # the case column is secondary: a little smaller, and muted
CASE_MIN_WIDTH = 110  # px: "0.516D + 0.7E (+)" whole; the demand and capacity beside it come first
ALONG_DELAY_MS = 150  # idle time after a render before the design along the length is worked out  # px: a long demand-against-capacity text is elided before the case column is


def verdict_words(g: Governing, result: WallResult) -> str:
    """ "✓ 47% margin", "✗ 12% short", "✗ NG" (no equilibrium: no margin to give) or "–" (no demand).

    The symbol and the word ("margin" or "short") each tell pass from fail without colour."""
    words = state_words(g, result)
    if words == NO_DEMAND:
        return NO_DEMAND_MARK
    if words == NO_EQUILIBRIUM:
        return f"{NG_MARK} NG"
    return f"{OK_MARK if g.passes else NG_MARK} {margin_text(g.ratio, g.required, g.passes)}"


def depth_rule(g: Governing) -> str | None:
    """The rule that sets an embedment-style requirement (depth, required depth, frost depth); None otherwise."""
    record: Any = g.record
    need = getattr(record, "required_depth", None)
    if getattr(record, "depth", None) is None or need is None:
        return None
    frost = getattr(record, "frost_depth", None)
    if frost is not None and frost >= need - 1e-12:
        return "below frost (IBC 2021 1809.5)"
    return "12 in minimum (IBC 2021 1809.4)"


def bars_words(wall: Wall, g: Governing, result: WallResult, units: str) -> str:
    """The transverse bars of the footing (the flexure record's, shared by the strength checks) and
    where they came from, "#5 @ 12 in (entered)" or "#4 @ 9 in (designed)"; "" for the other checks
    and where a strength check has no demand."""
    if g.check.family is not Family.STRENGTH or state_words(g, result):
        return ""
    flexure = next((f.record for c, f in result.governing.items() if c.id == "flexure"), None)
    bars = getattr(flexure, "bars", None)
    if not bars:
        return ""
    return f"{bars_in_units(bars, units)} ({ENTERED if transverse_entered(wall) else 'designed'})"


class _Elided(QLabel):
    """A one-line label that gives way to its neighbours: it paints its text elided ("…") where the
    column is narrow, and its tooltip holds the whole."""

    def minimumSizeHint(self) -> QSize:  # noqa: N802 - Qt's name
        return QSize(60, self.fontMetrics().height())

    def sizeHint(self) -> QSize:  # noqa: N802 - Qt's name
        return QSize(self.fontMetrics().horizontalAdvance(self.text()) + 2, self.fontMetrics().height())

    def paintEvent(self, _event) -> None:  # noqa: N802 - Qt's name
        painter = QPainter(self)
        painter.setPen(self.palette().color(QPalette.ColorRole.WindowText))
        painter.setFont(self.font())
        shown = self.fontMetrics().elidedText(self.text(), Qt.TextElideMode.ElideRight, self.width())
        painter.drawText(self.rect(), int(Qt.AlignmentFlag.AlignLeft | Qt.AlignmentFlag.AlignVCenter), shown)
        painter.end()


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
        self.grid.setHorizontalSpacing(9)
        self.grid.setVerticalSpacing(1)
        self.grid.setColumnStretch(3, 1)  # the case column takes what is left
        self.rows: dict[Check, tuple[QLabel, QLabel, QLabel, QLabel]] = {}
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
        self._pending: tuple[Wall, WallResult, str] | None = None  # waits for its design along the length
        self._along_timer = QTimer(self)
        self._along_timer.setSingleShot(True)
        self._along_timer.setInterval(ALONG_DELAY_MS)
        self._along_timer.timeout.connect(self._on_along_due)

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
            statement = _Elided()
            statement.setObjectName(f"ratio_{check.id}")
            # as wide as its text where there is room; elided before it could widen the window
            statement.setSizePolicy(QSizePolicy.Policy.Preferred, QSizePolicy.Policy.Preferred)
            verdict = QLabel()
            verdict.setObjectName(f"mark_{check.id}")
            case = _Elided()
            case.setObjectName(f"case_{check.id}")
            case.setStyleSheet(f"color: {MUTED};")
            small = case.font()
            small.setPointSizeF(small.pointSizeF() * CASE_FONT_SCALE)
            case.setFont(small)
            # the case column takes the room that is left: it never widens the window (its tooltip has it all)
            case.setSizePolicy(QSizePolicy.Policy.Ignored, QSizePolicy.Policy.Preferred)
            case.setMinimumWidth(CASE_MIN_WIDTH)
            for c, widget in enumerate((name, statement, verdict, case)):
                self.grid.addWidget(widget, r, c)
                widget.setVisible(self.checked)
            self.rows[check] = (name, statement, verdict, case)
        # never squeezed below its rows (six with the concrete checks): the tabs under it give way
        layout = self.layout()
        if layout is not None:
            layout.activate()
            self.setMinimumHeight(layout.minimumSize().height())

    def render_unchecked(self, wall: Wall, missing: str) -> None:
        """The project cannot be checked (site values missing): say so, and what to enter, in place of results."""
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
            _name, statement, verdict, case = self.rows[check]
            said = comparison_text(g, result, units)
            statement.setText(said)
            ratio = "no ratio" if state_words(g, result) else f"ratio {g.ratio:.2f}, {g.required:.2f} required"
            statement.setToolTip(f"{check.title}: {said} ({ratio}; {check.ratio_words})")
            verdict.setText(verdict_words(g, result))
            rule = depth_rule(g)
            if rule is not None:  # a geometric check: the rule that sets the requirement
                case.setText(rule)
                case.setToolTip(f"Depth of the footing's bottom below grade (soil cover + t_f): {said}; {rule}")
            else:
                where = case_text(g)
                bars = bars_words(wall, g, result, units)
                # bars first: short, and what a designed footing's reader looks for; the case may be elided
                case.setText(" · ".join(part for part in (bars, where) if part))
                tip = f"Governing case: {where}" if where else ""
                if bars:
                    tip += ("; " if tip else "") + f"transverse bars {bars}"
                case.setToolTip(tip)
            _set_colour(verdict, WARM if not g.passes else GRAPHITE, bold=True)
        ready = along_ready(result)
        along = along_words(result, units) if ready else ""
        whole = result.passes_all if ready else result.passes
        if whole:
            follows = "" if ready else "; the design along the length follows"
            self.headline.setText(
                f"Wall {wall.id}: {OK_MARK} OK — every check meets its required ratio" + _least(result) + follows
            )
        else:
            failing = [c.title.lower() for c, g in result.governing.items() if not g.passes]
            said = [f"{_listing(failing)} below the required ratio"] if failing else []
            if ready and not result.passes_along:
                said.append("the footing fails along its length")
            self.headline.setText(f"Wall {wall.id}: {NG_MARK} NG — " + "; ".join(said))
        _set_colour(self.headline, GRAPHITE if whole else WARM, bold=True)
        self.hint.setText(" ".join(part for part in (along, _hint(wall, result, whole, bool(along))) if part))
        reason = along_reason(result)
        self.hint.setToolTip(f"Along L_f: {reason}" if reason else "")
        self._pending = None if ready else (wall, result, units)
        if ready:
            self._along_timer.stop()
        else:
            self._along_timer.start()  # restarted by each render: it runs once the typing stops

    def _on_along_due(self) -> None:
        """Work out the pending result's design along the length (kept by the result) and show it."""
        if self._pending is None or not self.checked:
            return
        wall, result, units = self._pending
        _ = result.along  # the engine designs it once; the result keeps it
        self.render(wall, result, units)

    def texts(self) -> dict[str, tuple[str, str, str]]:
        """Shown text per check id: (demand against capacity, verdict and margin, case)."""
        return {c.id: (row[1].text(), row[2].text(), row[3].text()) for c, row in self.rows.items()}


def along_ready(result: WallResult) -> bool:
    """Whether ``result`` needs no design along the length, or has worked it out already (cheap to ask)."""
    table = result.strength_table
    return table is None or table.concrete is None or "along" in result.memo


def along_words(result: WallResult, units: str = "US") -> str:
    """The bars along the length and whether the footing carries its strength cases as a beam, from
    the engine's design along the length, in one short sentence ("" without a concrete design):
    "Along L_f: bottom 3 #5, top 2 #4 (entered) — carries its strength cases." or "... — fails."
    (the engine's words on why: :func:`along_reason`). In SI the bars take their soft-metric names
    ("3 No. 16"), as the form shows them."""
    along = result.along
    if along is None:
        return ""
    design = along[0]
    given = result.table.wall.footing.reinforcement
    faces, sources = [], []
    for face, faced in (("bottom", design.bottom), ("top", design.top)):
        if faced.bars:
            named = counted_text(faced.count, faced.bar, units) if faced.bar is not None and faced.count else faced.bars
            faces.append(f"{face} {named}")
            sources.append(ENTERED if given is not None and getattr(given, face) is not None else "designed")
    if len(set(sources)) == 1:
        bars = ", ".join(faces) + f" ({sources[0]})"
    else:
        bars = ", ".join(f"{f} ({s})" for f, s in zip(faces, sources, strict=True)) or "no bars"
    return f"Along L_f: {bars} — " + ("carries its strength cases." if design.passes else "fails.")


def along_reason(result: WallResult) -> str:
    """The engine's words on why the design along the length fails ("" when it passes or is not made)."""
    along = result.memo.get("along")
    return "" if along is None or along[0].passes else along[0].message


def _least(result: WallResult) -> str:
    """ "; least margin 14% (bearing)": the check closest to its requirement ("" when none has demand)."""
    least = result.worst  # a check without demand has an infinite ratio: the least only when none has demand
    if math.isinf(least.ratio):
        return ""
    percent = margin_text(least.ratio, least.required, True).removesuffix(" margin")
    return f"; least margin {percent} ({least.check.title.lower()})"


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


def _hint(wall: Wall, result: WallResult, whole: bool, short: bool = False) -> str:
    """What to do next; ``whole``: the wall's verdict as far as it is known (see :func:`along_ready`);
    ``short``: one short sentence, after the line on the design along the length."""
    # the stability checks idle for want of a lateral load (a strength check's "no demand" has other causes)
    idle = [c.title.lower() for c, g in result.governing.items() if math.isinf(g.ratio) and c.family is Family.SERVICE]
    if idle and not any(isinstance(ld, LateralLoad) for ld in wall.loads):
        verb = "has" if len(idle) == 1 else "have"
        return f"No lateral load on this wall: {_listing(idle)} {verb} no demand. Add a W or E lateral load to check them."
    if not whole:
        if short:
            return "Size this footing (Ctrl+M)."
        return "Size this footing (Ctrl+M): the smallest size that passes, and the check that limits it."
    return ""

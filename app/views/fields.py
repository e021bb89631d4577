"""Input fields that take text with units, their definitions, and a collapsible section.

A field shows its value in the project's display units ("18 in", "450 mm") and accepts any text of
the right dimension ("600 mm", "2 ft 6 in", 2'-6", "1.5 kip"); a bare number is read in the field's
display unit. Parsing is the engine's (:func:`engine.units.parse_quantity`); the raw document stores
what the user typed (a bare number gets its unit written after it).
"""

from __future__ import annotations

import math
import re
from collections.abc import Callable
from dataclasses import dataclass
from typing import Any

from kernline.engine.errors import InputError
from kernline.engine.model import Project, Wall
from kernline.engine.registry import Check, Family, checks
from kernline.engine.units import Kind, parse_quantity
from PySide6.QtCore import QEvent, QObject, QPoint, Qt, QTimer, Signal
from PySide6.QtGui import QAction, QContextMenuEvent, QKeyEvent, QKeySequence, QPainter
from PySide6.QtWidgets import (
    QAbstractSpinBox,
    QComboBox,
    QLabel,
    QLineEdit,
    QSizePolicy,
    QToolButton,
    QToolTip,
    QVBoxLayout,
    QWidget,
)

from ..document import MISSING
from ..style import ASSUMED_WORD, assumed_icon

OMIT: Any = MISSING  # what an empty optional field stores: the key is removed from the file

# Typing pauses this long before a valid entry is applied live (ms); Enter or leaving applies at once.
LIVE_DELAY_MS = 350

_INTEGER = re.compile(r"^\s*[-+]?\d+\s*$")

# Display units per kind of field: (US, SI).
LONG = ("ft", "m")  # wall length, positions, heights, extensions
SHORT = ("in", "mm")  # section dimensions: widths, thicknesses, cover
FORCE = ("kip", "kN")
LINE = ("plf", "kN/m")
PRESSURE = ("psf", "kPa")
DENSITY = ("pcf", "kN/m³")
GRADIENT = ("psf/ft", "kPa/m")
CONCRETE_STRENGTH = ("psi", "MPa")  # f'c
STEEL_STRENGTH = ("ksi", "MPa")  # fy


@dataclass(frozen=True, slots=True)
class FieldSpec:
    """One input: where it lives in the raw document, how it is read and shown, and what it means.

    Attributes:
        path: the path below the field's scope (the current wall, or the project).
        label: the words beside the field.
        kind: the quantity kind (None for a plain number or text).
        units: display units (US, SI) for a quantity field.
        value: reads the current value from the parsed model (SI float, number or text).
        tip: the tooltip: what the input is and where its rule comes from.
        scope: "wall" or "project".
        text: a free-text field (labels, names).
        step: the arrow-key step of the field (m), from the wall's sizing bounds.
        optional: the key may be left out of the file: an empty field removes it, and a value of
            None shows as an empty field (with ``placeholder`` saying what then applies).
        placeholder: the grey text of an empty optional field.
    """

    path: tuple[str, ...]
    label: str
    kind: Kind | None
    units: tuple[str, str] | None
    value: Callable[[Project, Wall], Any]
    tip: str
    scope: str = "wall"
    text: bool = False
    step: Callable[[Wall], float] | None = None
    optional: bool = False
    placeholder: str = ""

    def unit(self, system: str) -> str:
        assert self.units is not None
        return self.units[1] if system == "SI" else self.units[0]


def trim(value: float, decimals: int = 3) -> str:
    """A number without trailing zeros ("18", "2.5", "0.583")."""
    if math.isinf(value):
        return "∞"
    text = f"{value:.{decimals}f}"
    if "." in text:
        text = text.rstrip("0").rstrip(".")
    return "0" if text in ("-0", "") else text


def unit_factor(unit: str, kind: Kind) -> float:
    """SI value of one ``unit`` (engine parse; cached there)."""
    return parse_quantity(f"1 {unit}", kind)


def show(value_si: float, kind: Kind, unit: str, decimals: int = 3) -> str:
    """An SI value in ``unit``: "18 in", "2.5 ft", "520 plf"."""
    return f"{trim(value_si / unit_factor(unit, kind), decimals)} {unit}"


def display_text(spec: FieldSpec, project: Project, wall: Wall) -> str:
    value = spec.value(project, wall)
    if value is None and spec.optional:
        return ""
    if spec.text:
        return str(value)
    if spec.kind is None:
        return trim(float(value), 4)
    return show(float(value), spec.kind, spec.unit(project.units))


def assumed_tip(assumption: Any) -> str:
    """The tooltip of an assumed value: the word, the value taken and its basis."""
    return f"{ASSUMED_WORD.capitalize()}: {assumption.value} — {assumption.basis}. Type a value to make it your own."


# Examples of text each kind accepts, shown in SI projects in place of the engine's US example.
SI_EXAMPLES = {
    Kind.LENGTH: "600 mm",
    Kind.FORCE: "10 kN",
    Kind.LINE_LOAD: "4.4 kN/m",
    Kind.PRESSURE: "95 kPa",
    Kind.UNIT_WEIGHT: "23.6 kN/m³",
    Kind.PRESSURE_GRADIENT: "25 kPa/m",
    Kind.MOMENT: "15 kN*m",
}


def field_problem(problem: str, kind: Kind | None, system: str) -> str:
    """The engine's problem sentence for a field, with an example in the project's units."""
    if system != "SI":
        return problem
    for each in (kind,) if kind is not None else tuple(SI_EXAMPLES):
        problem = problem.replace(f'such as "{each.info.example}"', f'such as "{SI_EXAMPLES[each]}"')
    return problem


def to_raw(spec: FieldSpec, text: str, system: str) -> Any:
    """What the raw document stores for ``text`` typed into the field; raises InputError if unusable."""
    text = " ".join(text.split())
    if spec.optional and not text:
        return OMIT
    if spec.text:
        return text
    if spec.kind is None:
        return parse_number(text)
    return quantity_text(text, spec.kind, spec.unit(system))


def quantity_text(text: str, kind: Kind, unit: str) -> str:
    """What a project file stores for ``text`` typed where ``unit`` is shown: a bare number gets that unit.

    Raises InputError (the engine's words) when the text is not a quantity of ``kind``. Whether the
    text is a bare number is the engine's reading too: it is one exactly when it reads with the shown
    unit and not without one, so the stored text always means what the field showed.
    """
    text = " ".join(text.split())
    value = parse_quantity(text, kind, default_unit=unit)  # refuses the wrong dimension or a typo
    try:
        parse_quantity(text, kind)
    except InputError:
        stored = f"{text} {unit}"
        assert math.isclose(parse_quantity(stored, kind), value, rel_tol=1e-12, abs_tol=0.0)
        return stored
    return text


def unit_label(spec: FieldSpec, system: str) -> str:
    """The field's label with the unit a bare number is read in: "Footing width B (in)"; plain numbers keep their label."""
    if spec.kind is None or spec.units is None:
        return spec.label
    return f"{spec.label} ({spec.unit(system)})"


def parse_number(text: str) -> float | int:
    """A plain number (ratios, factors, S_DS)."""
    try:
        value = float(text)
    except ValueError:
        raise InputError("", f'expected a number such as "1.5", got "{text}"') from None
    if not math.isfinite(value):
        raise InputError("", f'expected a finite number, got "{text}"')
    return int(value) if _INTEGER.match(text) else value


def history_key(event: QKeyEvent) -> int:
    """+1 for a redo key (Ctrl+Shift+Z, Ctrl+Y), -1 for undo (Ctrl+Z), 0 for any other key."""
    if event.matches(QKeySequence.StandardKey.Undo):
        return -1
    if event.matches(QKeySequence.StandardKey.Redo) or (
        event.key() == Qt.Key.Key_Y and event.modifiers() == Qt.KeyboardModifier.ControlModifier
    ):
        return 1
    return 0


class StepLineEdit(QLineEdit):
    """A line edit whose Up / Down keys ask to step the value, and whose undo keys go to the document.

    QLineEdit's own undo would put back text the document no longer holds (a live edit has already
    been applied), so Ctrl+Z / Ctrl+Shift+Z / Ctrl+Y are reported with ``history_requested`` instead.
    """

    stepped = Signal(int)
    history_requested = Signal(int)  # -1 undo, +1 redo

    def event(self, event: Any) -> bool:
        # claim the undo keys before the window's Undo action does, so the field decides what they mean
        if event.type() == event.Type.ShortcutOverride and history_key(event):
            event.accept()
            return True
        return super().event(event)

    def keyPressEvent(self, event: QKeyEvent) -> None:  # noqa: N802 - Qt's name
        if event.key() in (Qt.Key.Key_Up, Qt.Key.Key_Down):
            self.stepped.emit(1 if event.key() == Qt.Key.Key_Up else -1)
            return
        step = history_key(event)
        if step:
            self.history_requested.emit(step)
            return
        super().keyPressEvent(event)

    def contextMenuEvent(self, event: QContextMenuEvent) -> None:  # noqa: N802 - Qt's name
        # the menu's own Undo / Redo would act on the line edit's history, not the document's
        menu = self.createStandardContextMenu()
        for action in menu.actions():
            if action.objectName() in ("edit-undo", "edit-redo"):
                action.setVisible(False)
        menu.exec(event.globalPos())
        menu.deleteLater()


class QuantityField(QWidget):
    """A line edit with its error line. Emits ``commit_requested(text, live)``.

    ``live`` commits come from a pause in typing and are made only when the text is valid; a final
    commit (Enter, leaving the field) reports any error at the field.
    """

    commit_requested = Signal(str, bool)
    step_requested = Signal(int)
    history_requested = Signal(int)  # -1 undo, +1 redo (typed in the field)

    def __init__(self, spec: FieldSpec, parent: QWidget | None = None) -> None:
        super().__init__(parent)
        self.spec = spec
        self.session = 0
        self.edit = StepLineEdit(self)
        self.edit.setToolTip(spec.tip)
        self.edit.setAccessibleName(spec.label)
        self.edit.setObjectName("field_" + "_".join(spec.path))
        if spec.placeholder:
            self.edit.setPlaceholderText(spec.placeholder)
        # the reason for a refusal sits inside the field, at its right (shortened; whole in the tooltip and
        # the status bar), so that a message never pushes the rows below it down
        self.error = ElidedLabel(self.edit, Qt.AlignmentFlag.AlignRight)
        self.error.setObjectName("fieldError")
        self.error.setAttribute(Qt.WidgetAttribute.WA_TransparentForMouseEvents, True)
        self.error.hide()
        self.edit.installEventFilter(self)
        layout = QVBoxLayout(self)
        layout.setContentsMargins(0, 0, 0, 0)
        layout.setSpacing(0)
        layout.addWidget(self.edit)
        self.setSizePolicy(QSizePolicy.Policy.Expanding, QSizePolicy.Policy.Fixed)
        self._shown = ""
        self.assumption: Any = None  # the engine's Assumption for this field, when the engineer did not enter it
        self._assumed_action: Any = None
        self.missing = False  # a site value not entered yet: shown empty with what to enter, not as a typing error
        self._timer = QTimer(self)
        self._timer.setSingleShot(True)
        self._timer.setInterval(LIVE_DELAY_MS)
        self._timer.timeout.connect(self._on_pause)
        self.edit.textEdited.connect(self._on_text_edited)
        self.edit.editingFinished.connect(self._on_editing_finished)
        self.edit.stepped.connect(self.step_requested)
        self.edit.history_requested.connect(self.history_requested)

    @property
    def shown_text(self) -> str:
        return self._shown

    @property
    def invalid(self) -> bool:
        """Whether the field holds an entry the engine refused (a missing site value is not one)."""
        return not self.missing and (self.error.isVisible() or bool(self.edit.property("invalid")))

    def set_missing(self, message: str | None) -> None:
        """Mark the field as a site value still to be entered (``message`` says what), or clear that mark."""
        if message is None:
            if self.missing:
                self.missing = False
                self.set_error(None)
            return
        self.set_error(message)
        self.missing = True

    def set_display(self, text: str, force: bool = False) -> None:
        """Show the model's value, unless the user is typing into the field or it holds an error."""
        if not force and (self.edit.isModified() or self.invalid):
            return
        self._shown = text
        if self.edit.text() != text:
            self.edit.setText(text)
            self.edit.setCursorPosition(0)
        self.edit.setModified(False)

    def set_assumed(self, assumption: Any) -> None:
        """Mark the value as assumed (the engine's :class:`engine.model.Assumption`), or clear the mark.

        The mark is quiet: a dashed outline and Kernline's small open diamond inside the field; its
        tooltip says "assumed", the value taken and its basis. Typing a value makes it the engineer's own.
        """
        if assumption == self.assumption:
            return
        self.assumption = assumption
        on = assumption is not None
        if bool(self.edit.property("assumed")) != on:
            self.edit.setProperty("assumed", on)
            self.edit.style().unpolish(self.edit)
            self.edit.style().polish(self.edit)
        if on and self._assumed_action is None:
            # made here with the field as its parent: the action addAction(icon, position) returns lost
            # its Python wrapper on an X server (the C++ action lived on)
            self._assumed_action = QAction(assumed_icon(), "", self.edit)
            self.edit.addAction(self._assumed_action, QLineEdit.ActionPosition.TrailingPosition)
        if self._assumed_action is not None:
            self._assumed_action.setVisible(on)
            self._assumed_action.setToolTip(assumed_tip(assumption) if on else "")
        self._place_error()
        self._update_tip()

    def _update_tip(self) -> None:
        tip = self.spec.tip
        if self.assumption is not None:
            tip = f"{assumed_tip(self.assumption)}\n\n{tip}"
        if not self.error.isHidden() and self.error.text():
            tip = f"{self.error.text()}\n\n{tip}"
        self.edit.setToolTip(tip)

    def set_error(self, message: str | None) -> None:
        self.missing = False
        invalid = message is not None
        if bool(self.edit.property("invalid")) != invalid:
            self.edit.setProperty("invalid", invalid)
            self.edit.style().unpolish(self.edit)
            self.edit.style().polish(self.edit)
        self.error.setText(message or "")
        self.error.setVisible(invalid)
        self._place_error()
        self._update_tip()

    def eventFilter(self, watched: QObject, event: QEvent) -> bool:  # noqa: N802 - Qt's name
        if watched is self.edit and event.type() == QEvent.Type.Resize:
            self._place_error()
        return False

    def _place_error(self) -> None:
        """Put the message in the right part of the field (at most 3/5 of it) and keep the typing clear of it."""
        edit = self.edit
        if self.error.isHidden() or not self.error.text():
            if edit.textMargins().right():
                edit.setTextMargins(0, 0, 0, 0)
            return
        room = edit.width() - ERROR_INSET
        if self._assumed_action is not None and self._assumed_action.isVisible():
            room -= ASSUMED_ACTION_WIDTH
        width = max(0, min(self.error.fontMetrics().horizontalAdvance(self.error.text()) + 4, room * 3 // 5))
        self.error.setGeometry(room - width, 0, width, edit.height())
        edit.setTextMargins(0, 0, width + 2, 0)

    def reset(self) -> None:
        """Drop any typing and error (another wall or project is shown)."""
        self._timer.stop()
        self.set_error(None)
        self.edit.setModified(False)
        self.session += 1

    def _on_text_edited(self, _text: str) -> None:
        self._timer.start()

    def flush(self) -> None:
        """Apply typing not yet applied now, as Enter would (before a save, an export, a sizing or another wall).

        A valid entry becomes an edit; one that is not valid is marked at the field with its reason.
        """
        pending = self._timer.isActive() or self.edit.isModified()
        self._timer.stop()
        if pending and (self.edit.text() != self._shown or self._adopting()):
            self.commit_requested.emit(self.edit.text(), False)

    def _on_pause(self) -> None:
        if self.edit.text().strip() and self.edit.text() != self._shown:
            self.commit_requested.emit(self.edit.text(), True)

    def _adopting(self) -> bool:
        """Whether the engineer typed the assumed value itself: entered, it becomes their own."""
        return self.assumption is not None and self.edit.isModified() and bool(self.edit.text().strip())

    def announce_error(self) -> None:
        """Show the whole message under the field for a moment (the field itself shows it shortened)."""
        if self.error.isVisible() and self.error.text() and self.edit.isVisible():
            QToolTip.showText(self.edit.mapToGlobal(QPoint(0, self.edit.height())), self.error.text(), self.edit)

    def _on_editing_finished(self) -> None:
        self._timer.stop()
        if self.edit.text() != self._shown or self.invalid or self._adopting():
            self.commit_requested.emit(self.edit.text(), False)
        self.session += 1


# Where the message inside a field sits: clear of the frame, and of the assumed mark when it is shown (px).
ERROR_INSET = 6
ASSUMED_ACTION_WIDTH = 20


class ElidedLabel(QLabel):
    """A one-line message that never grows: text too long for its width ends in "…", whole in its tooltip.

    ``text()`` keeps the whole message; only the painting is shortened.
    """

    def __init__(self, parent: QWidget | None = None, align: Qt.AlignmentFlag = Qt.AlignmentFlag.AlignLeft) -> None:
        super().__init__(parent)
        self._align = align | Qt.AlignmentFlag.AlignVCenter
        self.setSizePolicy(QSizePolicy.Policy.Ignored, QSizePolicy.Policy.Fixed)

    def reserve_line(self) -> None:
        """Keep one line of height whether or not there is a message (under a table: nothing moves)."""
        self.setFixedHeight(self.fontMetrics().height() + 4)

    def setText(self, text: str) -> None:  # noqa: N802 - Qt's name
        super().setText(text)
        self.setToolTip(text)
        self.update()

    def paintEvent(self, event: Any) -> None:  # noqa: N802 - Qt's name
        painter = QPainter(self)
        painter.setPen(self.palette().color(self.foregroundRole()))
        rect = self.contentsRect()
        shown = self.fontMetrics().elidedText(self.text(), Qt.TextElideMode.ElideRight, rect.width())
        painter.drawText(rect, int(self._align), shown)
        painter.end()


class WheelGuard(QObject):
    """Keeps the mouse wheel from changing a choice box or spin box that does not have keyboard focus.

    A wheel turned over such a box while scrolling the form would change a design value by accident;
    the event is passed on to the parent (the scroll area scrolls). Click or Tab into the box first to
    turn through its values with the wheel.
    """

    def eventFilter(self, watched: QObject, event: QEvent) -> bool:  # noqa: N802 - Qt's name
        if event.type() == QEvent.Type.Wheel and isinstance(watched, QWidget) and not watched.hasFocus():
            event.ignore()  # ignored and filtered: Qt offers the wheel to the parent widgets instead
            return True
        return False


WHEEL_GUARD = WheelGuard()


def guard_wheel(root: QWidget) -> int:
    """Give every choice box and spin box under ``root`` strong focus and the wheel guard; returns how many.

    Strong focus matters as much as the filter: Qt gives a wheel-focus widget (a choice box's default)
    the focus on the first turn of the wheel, after which the guard would let the wheel through.
    """
    boxes = [*root.findChildren(QComboBox), *root.findChildren(QAbstractSpinBox)]
    for box in boxes:
        box.setFocusPolicy(Qt.FocusPolicy.StrongFocus)
        box.removeEventFilter(WHEEL_GUARD)
        box.installEventFilter(WHEEL_GUARD)
    return len(boxes)


class Note(QLabel):
    """A wrapping hint in a form whose height always holds its text at the form's width.

    (A word-wrapped label spanning a form row can be given the height of fewer lines than it needs;
    this one asks for the lines its text takes whenever its text or width changes.)
    """

    def __init__(self, parent: QWidget | None = None) -> None:
        super().__init__(parent)
        self.setObjectName("hint")
        self.setWordWrap(True)
        self.setSizePolicy(QSizePolicy.Policy.Ignored, QSizePolicy.Policy.Fixed)

    def setText(self, text: str) -> None:  # noqa: N802 - Qt's name
        if text != self.text():
            super().setText(text)
            self._fit()

    def resizeEvent(self, event: Any) -> None:  # noqa: N802 - Qt's name
        super().resizeEvent(event)
        self._fit()

    def _fit(self) -> None:
        width = max(60, self.width() - self.contentsMargins().left() - self.contentsMargins().right())
        rect = self.fontMetrics().boundingRect(0, 0, width, 100_000, int(Qt.TextFlag.TextWordWrap), self.text())
        height = rect.height() + 4 if self.text() else 0
        if height != self.height() or self.minimumHeight() != height:
            self.setFixedHeight(height)


class Section(QWidget):
    """A titled group that folds away with its title button."""

    def __init__(self, title: str, content: QWidget, expanded: bool = True, parent: QWidget | None = None) -> None:
        super().__init__(parent)
        self.toggle = QToolButton(self)
        self.toggle.setObjectName("sectionToggle")
        self.toggle.setText(title)
        self.toggle.setCheckable(True)
        self.toggle.setChecked(expanded)
        self.toggle.setToolButtonStyle(Qt.ToolButtonStyle.ToolButtonTextBesideIcon)
        self.toggle.setArrowType(Qt.ArrowType.DownArrow if expanded else Qt.ArrowType.RightArrow)
        # reached with Tab (Space opens or folds it) so the keyboard reaches a folded section's fields too;
        # a click does not take the focus from the field being edited
        self.toggle.setFocusPolicy(Qt.FocusPolicy.TabFocus)
        self.content = content
        layout = QVBoxLayout(self)
        layout.setContentsMargins(0, 4, 0, 4)
        layout.setSpacing(2)
        layout.addWidget(self.toggle)
        layout.addWidget(content)
        content.setVisible(expanded)
        self.toggle.toggled.connect(self._on_toggled)

    def _on_toggled(self, expanded: bool) -> None:
        self.toggle.setArrowType(Qt.ArrowType.DownArrow if expanded else Qt.ArrowType.RightArrow)
        self.content.setVisible(expanded)


# ---- the fields --------------------------------------------------------------------------------------
# Symbols in labels and tips are chosen so that none reads as a load case of ASCE 7 (D dead, L live,
# W wind): the footing's width is B, its thickness t_f, its length L_f and its self weight W_f.

_GEOMETRY_RULE = (
    "Footing length L_f = extension at start + wall length + extension at end (Kernline project-file format, version 1)."
)


def _wall_field(
    path: tuple[str, ...],
    label: str,
    kind: Kind | None,
    units: tuple[str, str] | None,
    value: Callable[[Wall], Any],
    tip: str,
    **kw: Any,
) -> FieldSpec:
    return FieldSpec(path, label, kind, units, lambda p, w: value(w), tip, **kw)


def _project_field(
    path: tuple[str, ...],
    label: str,
    kind: Kind | None,
    units: tuple[str, str] | None,
    value: Callable[[Project], Any],
    tip: str,
    **kw: Any,
) -> FieldSpec:
    return FieldSpec(path, label, kind, units, lambda p, w: value(p), tip, scope="project", **kw)


WALL_FIELDS = (
    _wall_field(
        ("label",),
        "Label",
        None,
        None,
        lambda w: w.label,
        "A description of the wall (grid line, storey), in your words; printed in the schedule and beside the wall's "
        "sheets of the package (Kernline schedule).",
        text=True,
    ),
    _wall_field(
        ("length",),
        "Wall length",
        Kind.LENGTH,
        LONG,
        lambda w: w.length,
        "In-plane length of the shear wall. Loads are located from its start end. " + _GEOMETRY_RULE,
    ),
    _wall_field(
        ("thickness",),
        "Wall thickness",
        Kind.LENGTH,
        SHORT,
        lambda w: w.thickness,
        "Thickness of the wall that sits on the footing (or on the stem). The footing may not be narrower than "
        "what it carries (Kernline input rule).",
    ),
)

STEM_FIELDS = (
    _wall_field(
        ("stem", "height"),
        "Stem height",
        Kind.LENGTH,
        SHORT,
        lambda w: w.stem.height,
        "Height of a concrete stem wall between footing and wall; 0 means no stem. Its weight counts as dead load "
        "at mid-length (self weight, Kernline mechanics).",
    ),
    _wall_field(
        ("stem", "thickness"),
        "Stem thickness",
        Kind.LENGTH,
        SHORT,
        lambda w: w.stem.thickness,
        "Thickness of the stem wall, used only when the stem height is above zero: its weight (concrete unit weight × "
        "stem thickness × stem height × wall length) is dead load, and the soil cover is taken over B minus the "
        "stem thickness (Kernline mechanics, plain statics).",
    ),
)

FOOTING_FIELDS = (
    _wall_field(
        ("footing", "width"),
        "Footing width B",
        Kind.LENGTH,
        SHORT,
        lambda w: w.footing.width,
        "Width B of the strip footing across the wall; at least 12 in (IBC 2021 1809.4). Up/Down steps by the "
        "sizing step. Minimum widths for light-frame walls: IBC 2021 Table 1809.7 (not checked here).",
        step=lambda w: w.sizing.width_step,
    ),
    _wall_field(
        ("footing", "thickness"),
        "Footing thickness t_f",
        Kind.LENGTH,
        SHORT,
        lambda w: w.footing.thickness,
        "Thickness t_f of the footing. It sets the footing's self weight W_f = concrete unit weight × B × t_f × L_f "
        "and raises the lateral arm to height + t_f (Kernline mechanics); soil cover + t_f is the depth of the "
        "footing's bottom below grade (IBC 2021 1809.4, 1809.5). Minimum depths: ACI 318-19 13.3.1.2 (not checked "
        "here). Up/Down steps by the sizing step.",
        step=lambda w: w.sizing.thickness_step,
    ),
    _wall_field(
        ("footing", "extension_start"),
        "Extension at start",
        Kind.LENGTH,
        LONG,
        lambda w: w.footing.extension_start,
        "Footing beyond the wall's start end. " + _GEOMETRY_RULE,
    ),
    _wall_field(
        ("footing", "extension_end"),
        "Extension at end",
        Kind.LENGTH,
        LONG,
        lambda w: w.footing.extension_end,
        "Footing beyond the wall's far end. " + _GEOMETRY_RULE,
    ),
    _wall_field(
        ("footing", "cover"),
        "Soil cover",
        Kind.LENGTH,
        SHORT,
        lambda w: w.footing.cover,
        "Depth of soil over the top of the footing; grade is this far above the footing top. Its weight over B minus "
        "the wall (or stem) thickness is dead load (Kernline mechanics), and soil cover + t_f is the embedment "
        "checked against IBC 2021 1809.4 and 1809.5.",
    ),
    _wall_field(
        ("footing", "unit_weight"),
        "Concrete unit weight",
        Kind.UNIT_WEIGHT,
        DENSITY,
        lambda w: w.footing.unit_weight,
        "Unit weight of the footing and stem concrete (sets W_f); 150 pcf (23.6 kN/m³) for normal-weight reinforced "
        "concrete (common practice).",
    ),
)

_SIZING_RULE = (
    "Bounds and step of the candidate grid that automatic sizing searches (inclusive). The chosen size is "
    "the passing candidate with the least B × t_f, or with extension bounds the least volume B × t_f × L_f "
    "(Kernline sizing rule)."
)

SIZING_FIELDS = tuple(
    _wall_field(
        ("sizing", key),
        label,
        Kind.LENGTH,
        SHORT,
        (lambda k: lambda w: getattr(w.sizing, k))(key),
        _SIZING_RULE + extra,
    )
    for key, label, extra in (
        ("width_min", "Width B from", " Not below 12 in (IBC 2021 1809.4)."),
        ("width_max", "Width B to", ""),
        ("width_step", "Width B step", ""),
        ("thickness_min", "Thickness t_f from", ""),
        ("thickness_max", "Thickness t_f to", ""),
        ("thickness_step", "Thickness t_f step", ""),
    )
)

_EXTENSION_RULE = (
    "Sizing of the footing's length: equal extensions e are added at both ends, from 0 to this bound by this "
    "step, on top of the extensions entered above; L_f = extension at start + wall length + extension at end + 2e. "
    "Both bounds are given together, or neither (then the length is not sized). Kernline sizing rule."
)

EXTENSION_FIELDS = tuple(
    _wall_field(
        ("sizing", key),
        label,
        Kind.LENGTH,
        LONG,
        (lambda k: lambda w: getattr(w.sizing, k) or None)(key),
        _EXTENSION_RULE,
        optional=True,
        placeholder="length not sized",
    )
    for key, label in (("extension_max", "Extra extension e to"), ("extension_step", "Extra extension e step"))
)

SOIL_FIELDS = (
    _project_field(
        ("soil", "allowable_bearing"),
        "Allowable bearing",
        Kind.PRESSURE,
        PRESSURE,
        lambda p: p.soil.allowable_bearing,
        "Allowable soil bearing pressure from the geotechnical report (or a presumptive class of IBC 2021 Table "
        "1806.2). Compared with the peak pressure q_max of each combination.",
    ),
    _project_field(
        ("soil", "friction"),
        "Friction coefficient",
        None,
        None,
        lambda p: p.soil.friction,
        "Coefficient of friction between footing and soil; resists sliding as friction × N while N > 0 "
        "(IBC 2021 1806.3.2; presumptive values in IBC 2021 Table 1806.2; the geotechnical report governs).",
    ),
    _project_field(
        ("soil", "cohesion"),
        "Cohesion",
        Kind.PRESSURE,
        PRESSURE,
        lambda p: p.soil.cohesion,
        "Cohesion × contact area resists sliding, limited to half of the load it acts with (IBC 2021 1806.3.2).",
    ),
    _project_field(
        ("soil", "passive"),
        "Passive pressure",
        Kind.PRESSURE_GRADIENT,
        GRADIENT,
        lambda p: p.soil.passive,
        "Lateral bearing pressure per depth below grade on the footing's end face (IBC 2021 Table 1806.2, "
        "'lateral bearing'; the geotechnical report governs).",
    ),
    _project_field(
        ("soil", "passive_ignore"),
        "Passive ignored to",
        Kind.LENGTH,
        SHORT,
        lambda p: p.soil.passive_ignore,
        "Depth below grade within which passive resistance is ignored (common practice: the top 1 ft).",
    ),
    _project_field(
        ("soil", "unit_weight"),
        "Soil unit weight",
        Kind.UNIT_WEIGHT,
        DENSITY,
        lambda p: p.soil.unit_weight,
        "Unit weight of the soil cover over the footing (dead load) and of the overburden for a net allowable "
        "(geotechnical report; 110 pcf is a common default).",
    ),
    _project_field(
        ("soil", "report"),
        "Geotechnical report",
        None,
        None,
        lambda p: p.soil.report,
        "The geotechnical report the soil values come from (title, number, date); printed in the package's design "
        "basis as the source of the soil values (IBC 2021 1803.6 lists what the report gives).",
        text=True,
    ),
)

SITE_FIELDS = (
    _project_field(
        ("site", "frost_depth"),
        "Frost depth",
        Kind.LENGTH,
        SHORT,
        lambda p: p.site.frost_depth,
        "Depth of frost penetration from the building official or the geotechnical report. The footing's bottom "
        "(soil cover + t_f below grade) must be below it (IBC 2021 1809.5) and at least 12 in down "
        "(IBC 2021 1809.4). Leave empty where the ground does not freeze: the 12 in minimum governs.",
        optional=True,
        placeholder="none given: 12 in minimum",
    ),
)


def _required_field(check: Check) -> FieldSpec:
    return _project_field(
        ("criteria", "required", check.id),
        f"Required {check.title.lower()} ratio",
        None,
        None,
        lambda p: p.criteria.required.of(check),
        f"Least {check.ratio_words} ({check.basis}). 1.0 with ASD combinations, whose load factors carry the "
        "margin (IBC 2021 1605.1.1); with service loads a factor of safety (common practice: 2.0 on overturning, "
        "1.5 on sliding, 1.0 on bearing; see the geotechnical report and local code).",
    )


def required_fields() -> tuple[FieldSpec, ...]:
    """A required-ratio field for each registered check evaluated with the code basis's combinations."""
    return tuple(_required_field(c) for c in checks(Family.SERVICE))


# The code basis's number options: the criteria key each field writes is the last key of its path.
OPTION_FIELDS = (
    _project_field(
        ("criteria", "sds"),
        "S_DS",
        None,
        None,
        lambda p: p.criteria.sds,
        "Design spectral acceleration at short periods (ASCE 7-16 and 7-22 11.4.5). Sets the vertical seismic "
        "effect Ev = 0.2 S_DS D (ASCE 7-16 12.4.2.2) in the seismic combinations.",
    ),
    _project_field(
        ("criteria", "bearing_increase"),
        "Allowable increase with W or E",
        None,
        None,
        lambda p: p.criteria.bearing_increase,
        "Factor on the allowable bearing in combinations with wind or seismic, 1.0 for none. IBC 2021 1806.1 "
        "permits one-third (4/3) with the alternative basic combinations of 1605.2, the default of that method; "
        "otherwise only where the geotechnical report permits one.",
    ),
    _project_field(
        ("criteria", "seismic_snow_factor"),
        "Snow factor with E",
        None,
        None,
        lambda p: p.criteria.seismic_snow_factor,
        "The factor on S in the ASCE 7-22 seismic ASD combination with snow (2.4.5, combination 9), as the "
        "edition in force prints it. Kernline has not confirmed it, so it does not supply one: needed once a "
        "wall carries both E and S loads.",
        optional=True,
        placeholder="needed with E and S loads",
    ),
)

PROJECT_FIELDS = tuple(
    _project_field(("project", key), label, None, None, (lambda k: lambda p: getattr(p.info, k))(key), tip, text=True)
    for key, label, tip in (
        ("name", "Project", "Project name: in the window's title and the title block of every sheet of the package."),
        ("number", "Project number", "The office's job number, in the title block of every sheet."),
        ("client", "Client", "The client, in the title block of the cover sheet."),
        ("address", "Site address", "Where the building stands, in the title block of the cover sheet."),
        ("engineer", "Engineer", "Engineer of record or preparer: 'prepared by' in the title block."),
        ("checker", "Checked by", "Who checked the calculations: 'checked by' in the title block."),
        ("revision", "Revision", 'Revision mark of this issue ("0", "A", "for permit"), in the title block; "0" when empty.'),
        (
            "revision_date",
            "Revision date",
            "Date of this revision as it should print (e.g. 2026-03-14), in the title block; the date of printing "
            "goes in each sheet's footer.",
        ),
        ("notes", "Notes", "General notes: printed as 'Project notes' on the cover sheet, under the title block."),
    )
)


# ---- the footing's concrete design (ACI 318-19) ---------------------------------------------------------


def _concrete_value(key: str) -> Callable[[Project], Any]:
    """A value of the project's concrete section, or None where the project has no concrete design."""
    return lambda p: getattr(p.concrete, key) if p.concrete is not None else None


_CONCRETE_DEFAULT = "empty: Kernline's default (marked assumed)"

CONCRETE_FIELDS = (
    _project_field(
        ("concrete", "fc"),
        "Concrete strength f'c",
        Kind.PRESSURE,
        CONCRETE_STRENGTH,
        _concrete_value("fc"),
        "Specified compressive strength f'c of the footing concrete (ACI 318-19 19.2.1; Table 19.2.1.1 asks at "
        "least 2500 psi, 17 MPa). It sets the one-way shear strength Vc (22.5.5.1), the plain-concrete strengths "
        "(14.5) and the development length (25.4.2.4). Empty: 3000 psi, a common strength for footings (common "
        "practice).",
        optional=True,
        placeholder=_CONCRETE_DEFAULT,
    ),
    _project_field(
        ("concrete", "fy"),
        "Bar yield strength fy",
        Kind.PRESSURE,
        STEEL_STRENGTH,
        _concrete_value("fy"),
        "Specified yield strength fy of the deformed bars (ACI 318-19 20.2.2; ASTM A615 Grade 60 is 60 ksi, "
        "420 MPa). It sets the flexural strength and the development length (25.4.2.4). Empty: 60 ksi.",
        optional=True,
        placeholder=_CONCRETE_DEFAULT,
    ),
    _project_field(
        ("concrete", "cover"),
        "Cover to the bottom bars",
        Kind.LENGTH,
        SHORT,
        _concrete_value("cover"),
        "Clear concrete cover below the bottom bars. Concrete cast against and permanently in contact with earth "
        "needs 3 in, 75 mm (ACI 318-19 Table 20.5.1.3.1). The effective depth is d = t_f - cover - d_b/2. Empty: 3 in.",
        optional=True,
        placeholder=_CONCRETE_DEFAULT,
    ),
    _project_field(
        ("concrete", "lambda"),
        "Lightweight factor λ",
        None,
        None,
        _concrete_value("lam"),
        "Modification factor λ for lightweight concrete (ACI 318-19 19.2.4, Table 19.2.4.2): 1.0 for normal-weight "
        "concrete, 0.75 for all-lightweight; at most 1.0. It multiplies √f'c in the shear and plain-concrete "
        "strengths. Empty: 1.0.",
        optional=True,
        placeholder=_CONCRETE_DEFAULT,
    ),
)

CHORD_OFFSET_FIELD = _wall_field(
    ("chord_offset",),
    "Chord offset",
    Kind.LENGTH,
    SHORT,
    lambda w: w.chord_offset,
    "Light-frame walls only: how far in from each end of the wall its hold-down chord stands. The wall delivers "
    "its overturning to the footing as a couple of the two chord forces, this far in from the wall's ends, plus "
    "the shear at the top of the footing (Kernline mechanics, plain statics). Empty: 3 in, Kernline's "
    "assumption; enter the chord's position from the wall's framing and hold-downs.",
    optional=True,
    placeholder="empty: 3 in (assumed)",
)


def _transverse_text(w: Wall, system: str) -> str | None:
    r = w.footing.reinforcement
    if r is None or r.transverse is None:
        return None
    bar, spacing = r.transverse
    name = bar.metric_name if system == "SI" else bar.name
    return f"{name} @ {show(spacing, Kind.LENGTH, SHORT[1] if system == 'SI' else SHORT[0])}"


def _counted_text(w: Wall, face: str, system: str) -> str | None:
    r = w.footing.reinforcement
    found = getattr(r, face) if r is not None else None
    if found is None:
        return None
    count, bar = found
    return f"{count} {bar.metric_name if system == 'SI' else bar.name}"


_BARS_RULE = (
    " Bars #3 to #11 of ASTM A615 (inch-pound), or the soft-metric names No. 10 to No. 36 of the same bars; "
    "a spacing in any length unit. Leave it empty and Kernline designs this part."
)

BAR_FIELDS = (
    FieldSpec(
        ("footing", "reinforcement", "transverse"),
        "Transverse bars",
        None,
        None,
        lambda p, w: _transverse_text(w, p.units),
        'Bottom bars across the width B, as size and centre-to-centre spacing ("#5 @ 12 in"). Flexure at the '
        "section of ACI 318-19 Table 13.2.7.1 with As,min = 0.0018 Ag (7.6.1.1, 24.4.3.2); spacing at most 3h and "
        "18 in (7.7.2.3); ρw of these bars enters Vc (22.5.5.1)." + _BARS_RULE,
        text=True,
        optional=True,
        placeholder="designed by Kernline",
    ),
    FieldSpec(
        ("footing", "reinforcement", "bottom"),
        "Bottom bars along L_f",
        None,
        None,
        lambda p, w: _counted_text(w, "bottom", p.units),
        'Continuous bars along the footing\'s length near its bottom face, as a count and size ("3 #5"): the '
        "footing as a beam along L_f under the wall's loads and the soil pressure (sagging moment; As,min of "
        "ACI 318-19 7.6.1.1)." + _BARS_RULE,
        text=True,
        optional=True,
        placeholder="designed by Kernline",
    ),
    FieldSpec(
        ("footing", "reinforcement", "top"),
        "Top bars along L_f",
        None,
        None,
        lambda p, w: _counted_text(w, "top", p.units),
        'Continuous bars along the footing\'s length near its top face, as a count and size ("2 #4"): hogging '
        "moment of the footing as a beam along L_f, as where the overturning lifts one end." + _BARS_RULE,
        text=True,
        optional=True,
        placeholder="designed by Kernline",
    ),
)

"""The input forms: the selected wall (geometry, stem, footing, loads, sizing range) and the project
(soil, criteria, combinations, title block). They render from document signals and write only
through undoable commands.
"""

from __future__ import annotations

from collections.abc import Sequence
from typing import Any

from kernline.engine.combinations import combinations_of
from kernline.engine.errors import InputError
from kernline.engine.model import LateralLoad, LineLoad, LoadCase, PointLoad, WallConstruction
from kernline.engine.presumptive import TABLE_1806_2
from kernline.engine.project_file import OPTION_KEYS
from kernline.engine.registry import Check, CodeBasis, Family, checks, code_by_id, codes
from kernline.engine.units import Kind
from PySide6.QtCore import QCoreApplication, QEvent, QModelIndex, QObject, Qt
from PySide6.QtGui import QBrush, QColor, QFocusEvent, QIcon, QKeyEvent
from PySide6.QtWidgets import (
    QAbstractItemDelegate,
    QAbstractItemView,
    QAbstractScrollArea,
    QCheckBox,
    QComboBox,
    QFormLayout,
    QHBoxLayout,
    QHeaderView,
    QLabel,
    QPushButton,
    QScrollArea,
    QSizePolicy,
    QStyledItemDelegate,
    QTableWidget,
    QTableWidgetItem,
    QVBoxLayout,
    QWidget,
)

from .. import commands
from ..document import MISSING, ProjectDocument, get_at, path_text
from ..style import WARM_LIGHT, assumed_icon
from .fields import (
    BAR_FIELDS,
    CHORD_OFFSET_FIELD,
    CONCRETE_FIELDS,
    EXTENSION_FIELDS,
    FOOTING_FIELDS,
    FORCE,
    LINE,
    LONG,
    OMIT,
    OPTION_FIELDS,
    PROJECT_FIELDS,
    SITE_FIELDS,
    SIZING_FIELDS,
    SOIL_FIELDS,
    STEM_FIELDS,
    WALL_FIELDS,
    ElidedLabel,
    FieldSpec,
    Note,
    QuantityField,
    Section,
    assumed_tip,
    display_text,
    field_problem,
    parse_number,
    quantity_text,
    required_fields,
    show,
    to_raw,
    trim,
    unit_label,
)


class FieldGroup:
    """Binds a set of :class:`QuantityField` to the document: shows values, commits edits."""

    def __init__(self, document: ProjectDocument) -> None:
        self.document = document
        self.fields: list[QuantityField] = []
        self.labels: dict[int, QLabel] = {}  # by id of the field: the words beside it, with its unit

    def add(self, spec: FieldSpec, form: QFormLayout) -> QuantityField:
        field = QuantityField(spec)
        label = QLabel(unit_label(spec, self.document.units))
        label.setToolTip(spec.tip)
        self.labels[id(field)] = label
        label.setBuddy(field.edit)
        form.addRow(label, field)
        field.commit_requested.connect(lambda text, live, f=field: self.commit(f, text, live))
        field.step_requested.connect(lambda direction, f=field: self.step(f, direction))
        field.history_requested.connect(lambda step, f=field: self.history(f, step))
        self.document.field_labels[path_text(spec.path)] = spec.label
        self.fields.append(field)
        return field

    def full_path(self, spec: FieldSpec) -> tuple[Any, ...]:
        return self.document.wall_path(*spec.path) if spec.scope == "wall" else spec.path

    def refresh(self, force: bool = False) -> list[str]:
        """Show the model's values; ``force`` drops typing and errors (another wall or project is shown).

        Returns, for a forced refresh, a description of each invalid entry that was dropped
        ('"abc" in Footing width B'), so the window can say that it was discarded.
        """
        doc = self.document
        dropped = []
        assumed = doc.assumptions_by_field()
        for field in self.fields:
            label = self.labels[id(field)]
            words = unit_label(field.spec, doc.units)
            if label.text() != words:
                label.setText(words)
            field.set_assumed(assumed.get(self.field_key(field.spec)))
            if force:
                if self.unapplied(field):
                    dropped.append(f'"{field.edit.text().strip()}" in {field.spec.label}')
                field.reset()
            gap = doc.site_gaps.get(self.full_path(field.spec)) if field.spec.scope == "project" else None
            if gap is not None:  # a site value not entered: empty, saying what to enter (never a stand-in)
                if force or not (field.edit.isModified() or field.invalid):
                    field.set_display("", force=True)
                    field.set_missing(gap)
                continue
            field.set_missing(None)
            field.set_display(self.display(field), force=force)
        return dropped

    def field_key(self, spec: FieldSpec) -> str:
        """The field's path as the engine names it ("walls[0].footing.unit_weight", "soil.cohesion")."""
        return path_text(self.full_path(spec))

    def display(self, field: QuantityField) -> str:
        doc = self.document
        return display_text(field.spec, doc.project, doc.current_wall)

    def unapplied(self, field: QuantityField) -> bool:
        """Whether the field holds text that never reached the model (refused, or typed and not valid)."""
        if field.invalid:
            return True
        if not field.edit.isModified():
            return False
        try:
            to_raw(field.spec, field.edit.text(), self.document.units)
        except InputError:
            return True
        return False

    def history(self, field: QuantityField, step: int) -> None:
        """Ctrl+Z / Ctrl+Shift+Z typed in a field.

        Text the model never took (refused or not yet valid) is put back to the model's value first;
        otherwise the key undoes or redoes the document's last edit (a live edit of this very field
        included), and the field shows the value in force afterwards. The field never keeps text
        that differs from the model.
        """
        doc = self.document
        field.flush()  # typing still waiting for its pause is applied first, as Enter would
        pending = self.unapplied(field)
        field.reset()
        if not (pending and step < 0):
            stack = doc.undo_stack
            if step < 0:
                stack.undo()
            else:
                stack.redo()
        field.set_display(display_text(field.spec, doc.project, doc.current_wall), force=True)

    def field_at(self, path: Sequence[Any]) -> QuantityField | None:
        for field in self.fields:
            if self.full_path(field.spec) == tuple(path):
                return field
        return None

    def commit(self, field: QuantityField, text: str, live: bool) -> bool:
        """Turn the field's text into an edit; report a refusal at the field (not while typing)."""
        doc = self.document
        spec = field.spec
        path = self.full_path(spec)
        gap = doc.site_gaps.get(path) if spec.scope == "project" else None
        if gap is not None and not text.strip():  # left empty: still to be entered
            field.set_display("", force=True)
            field.set_missing(gap)
            return False
        try:
            value = to_raw(spec, text, doc.units)
        except InputError as err:
            if not live:
                field.set_error(field_problem(err.problem, spec.kind, doc.units))
                field.announce_error()
            return False
        if value == get_at(doc.raw, path):
            field.set_error(None)
            if not live:
                field.set_display(display_text(spec, doc.project, doc.current_wall), force=True)
            return True
        announce = None
        if spec.scope == "project" and not spec.text:  # a design value of every wall: named in the status bar
            before = field.shown_text or "not entered"
            announce = lambda: f"{spec.label}: {before} → {self.display(field) or 'not entered'}"  # noqa: E731 - read after the edit
        extra = companions(doc, path, value)
        if extra:  # keys that go together: one undo step
            command: Any = commands.set_fields(doc, f"Set {_words(spec.label)}", {path: value, **extra})
        else:
            command = commands.SetField(doc, path, value, session=field.session, text=f"Set {_words(spec.label)}")
        message = doc.push(command, quiet=live, announce=announce)
        if message is not None:
            if not live:
                # at the field its label names it: the engine's sentence without its path
                refusal = doc.last_refusal
                field.set_error(field_problem(refusal.problem, spec.kind, doc.units) if refusal is not None else message)
                field.announce_error()
            return False
        field.set_error(None)
        if not live:
            field.set_display(display_text(spec, doc.project, doc.current_wall), force=True)
        return True

    def step(self, field: QuantityField, direction: int) -> None:
        """Up / Down in a footing dimension: one sizing step."""
        spec = field.spec
        if spec.step is None or spec.kind is None:
            return
        doc = self.document
        wall = doc.current_wall
        value = float(spec.value(doc.project, wall)) + direction * spec.step(wall)
        text = show(value, spec.kind, spec.unit(doc.units))
        field.edit.setText(text)
        if self.commit(field, text, live=False):
            field.edit.setModified(False)


# The step written with a first extension bound when none is given yet (a grid of 6 in / 150 mm steps:
# Kernline's default, common practice for footing lengths).
EXTENSION_STEP = {"US": "6 in", "SI": "150 mm"}


def companions(doc: ProjectDocument, path: tuple[Any, ...], value: Any) -> dict[tuple[Any, ...], Any]:
    """Other keys an edit at ``path`` changes with it, in the same undo step.

    The extension bounds of a wall's sizing go together (the reader refuses one without the other):
    the first extension bound typed brings the step along; clearing the bound clears the step too.
    """
    if len(path) < 2 or path[-2:] != ("sizing", "extension_max"):
        return {}
    step_path = (*path[:-1], "extension_step")
    has_step = get_at(doc.raw, step_path) is not MISSING
    if value is OMIT:
        return {step_path: OMIT} if has_step else {}
    if not has_step:
        return {step_path: EXTENSION_STEP["SI" if doc.units == "SI" else "US"]}
    return {}


def _focus(group: FieldGroup, rest: str, section: Section | None, scroll: QScrollArea) -> bool:
    """Open ``section`` and focus the field whose path is ``rest`` (or, for a section's name, its first field)."""
    fields = [f for f in group.fields if ".".join(f.spec.path) == rest]
    if not fields:
        fields = [f for f in group.fields if ".".join(f.spec.path).startswith(rest + ".")]
    if section is not None:
        section.toggle.setChecked(True)
        _settle(scroll)
    if not fields:
        if section is not None:
            scroll.ensureWidgetVisible(section)
        return section is not None
    scroll.ensureWidgetVisible(fields[0])
    fields[0].edit.setFocus()
    return True


def _settle(scroll: QScrollArea) -> None:
    """Lay the form out now, so that a section just opened has its place before the view scrolls to it
    (the layout requests Qt would handle on its next pass, the scroll area's own included)."""
    QCoreApplication.sendPostedEvents(None, QEvent.Type.LayoutRequest)


def _words(label: str) -> str:
    """A field's label inside a sentence: "Footing width B" -> "footing width B" (symbols such as S_DS keep their case)."""
    return label if label[1:2].isupper() or label[1:2] == "_" else label[:1].lower() + label[1:]


def _compact(box: QComboBox) -> QComboBox:
    """A choice box whose longest entry does not set the form's minimum width (it elides instead)."""
    box.setSizeAdjustPolicy(QComboBox.SizeAdjustPolicy.AdjustToMinimumContentsLengthWithIcon)
    box.setMinimumContentsLength(8)
    return box


def _form() -> tuple[QWidget, QFormLayout]:
    box = QWidget()
    form = QFormLayout(box)
    form.setContentsMargins(8, 0, 0, 0)
    form.setLabelAlignment(Qt.AlignmentFlag.AlignLeft)
    form.setFieldGrowthPolicy(QFormLayout.FieldGrowthPolicy.AllNonFixedFieldsGrow)
    form.setVerticalSpacing(4)
    # a narrow column puts the field under its label rather than pushing it out of view
    form.setRowWrapPolicy(QFormLayout.RowWrapPolicy.WrapLongRows)
    return box, form


def reserved_message(parent: QWidget) -> tuple[QWidget, ElidedLabel]:
    """A message line under a table whose place is kept when it is empty: (its holder, the message).

    The message is one line, shortened with "…" when long (whole in its tooltip), so nothing below moves.
    """
    holder = QWidget(parent)
    message = ElidedLabel(holder)
    message.setObjectName("fieldError")
    message.reserve_line()
    holder.setFixedHeight(message.height())
    holder.setSizePolicy(QSizePolicy.Policy.Ignored, QSizePolicy.Policy.Fixed)
    row = QHBoxLayout(holder)
    row.setContentsMargins(0, 0, 0, 0)
    row.addWidget(message)
    message.hide()
    return holder, message


# ---- loads table -------------------------------------------------------------------------------------

LOAD_COLUMNS = ("Type", "Case", "Value", "Start x / at x / h", "End x", "Label")
LOAD_TIPS = (
    "line: uniform load along the wall (from-to); point: a concentrated load; lateral: an in-plane shear (W or E only).",
    "ASCE 7-16 load case symbol (section 2.2): D dead, L live, Lr roof live, S snow, R rain, W wind, E seismic.",
    "Positive downward; a negative W line or point load is uplift. Lateral loads are magnitudes; the window checks "
    "both directions (Kernline mechanics).",
    "x is measured along the wall from the wall's start end (not from the footing's end: the footing begins "
    "'extension at start' before it). Line load: the x where it starts; point load: the x where it acts; lateral "
    "load: its height h above the top of the footing (the arm about the footing's base is h + t_f).",
    "Line loads only: the x where the load ends, from the wall's start end (the whole wall when not given).",
    "Your description, printed beside the load.",
)


LOADS_WHERE = (
    "x: measured along the wall from the wall's start end (the footing's end lies 'extension at start' before "
    "it). h: height of a lateral load above the top of the footing."
)


def load_tips(units: str) -> list[str]:
    """The column tips, with the unit a bare number typed in each column is read in (the unit its cells show)."""
    i = 1 if units == "SI" else 0
    bare = (
        "",
        "",
        f" A bare number is read in {LINE[i]} for a line load and {FORCE[i]} for a point or lateral load (the unit the cell shows).",
        f" A bare number is read in {LONG[i]}.",
        f" A bare number is read in {LONG[i]}.",
        "",
    )
    return [tip + extra for tip, extra in zip(LOAD_TIPS, bare, strict=True)]


KINDS = ("line", "point", "lateral")
_ERROR_ROLE = Qt.ItemDataRole.UserRole + 7
_ASSUMED_ROLE = Qt.ItemDataRole.UserRole + 8


CASES = tuple(c.value for c in LoadCase)


def _leaves_backward(event: QKeyEvent) -> bool:
    return event.key() == Qt.Key.Key_Backtab or bool(event.modifiers() & Qt.KeyboardModifier.ShiftModifier)


class _CellDelegate(QStyledItemDelegate):
    """A cell editor that answers Ctrl+Tab (Ctrl+Shift+Tab) as Qt's widgets that keep Tab do: the entry is
    committed and the keyboard leaves the table for the next (previous) input."""

    def eventFilter(self, editor: QObject, event: QEvent) -> bool:  # noqa: N802 - Qt's name
        if (
            event.type() == QEvent.Type.KeyPress
            and isinstance(event, QKeyEvent)
            and event.key() in (Qt.Key.Key_Tab, Qt.Key.Key_Backtab)
            and event.modifiers() & Qt.KeyboardModifier.ControlModifier
            and isinstance(editor, QWidget)
        ):
            table = self.parent()
            self.commitData.emit(editor)
            self.closeEditor.emit(editor, QAbstractItemDelegate.EndEditHint.NoHint)
            if isinstance(table, CellTable):
                table.leave(forward=not _leaves_backward(event))
            return True
        return super().eventFilter(editor, event)


class CellTable(QTableWidget):
    """An editable table that Tab walks cell by cell, row by row, and leaves after its last cell (Shift+Tab:
    before its first) for the next (previous) input of the form; Ctrl+Tab and Ctrl+Shift+Tab leave it from
    any cell, as Qt's widgets that keep Tab do. Tab entering the table starts at its first cell, Shift+Tab
    at its last. The arrow keys move between cells as in any table."""

    def __init__(self, rows: int, columns: int, parent: QWidget | None = None) -> None:
        super().__init__(rows, columns, parent)
        self.setTabKeyNavigation(True)
        self.setItemDelegate(_CellDelegate(self))

    def _step(self, forward: bool) -> Any:
        """The cell Tab (Shift+Tab) goes to from the current one; an invalid index after the last (before the
        first) cell, where Qt's own table would wrap round."""
        current = self.currentIndex()
        action = QAbstractItemView.CursorAction.MoveNext if forward else QAbstractItemView.CursorAction.MovePrevious
        target = self.moveCursor(action, Qt.KeyboardModifier.NoModifier)
        if not target.isValid() or not current.isValid():
            return target
        here, there = (current.row(), current.column()), (target.row(), target.column())
        if (there <= here) if forward else (there >= here):
            return QModelIndex()  # wrapped round: out of the table instead
        return target

    def leave(self, forward: bool) -> None:
        """Give the focus to the input after (before) the table."""
        QAbstractScrollArea.focusNextPrevChild(self, forward)

    def focusNextPrevChild(self, next: bool) -> bool:  # noqa: N802, A002 - Qt's names
        if self.hasFocus() and self.tabKeyNavigation() and self.rowCount() and self._step(next).isValid():
            return super().focusNextPrevChild(next)  # the next cell
        return QAbstractScrollArea.focusNextPrevChild(self, next)  # out of the table

    def keyPressEvent(self, event: QKeyEvent) -> None:  # noqa: N802 - Qt's name
        if event.key() in (Qt.Key.Key_Tab, Qt.Key.Key_Backtab) and event.modifiers() & Qt.KeyboardModifier.ControlModifier:
            self.leave(forward=not _leaves_backward(event))
            event.accept()
            return
        super().keyPressEvent(event)

    def closeEditor(self, editor: QWidget, hint: QAbstractItemDelegate.EndEditHint) -> None:  # noqa: N802 - Qt's name
        hints = QAbstractItemDelegate.EndEditHint
        if hint in (hints.EditNextItem, hints.EditPreviousItem):
            forward = hint == hints.EditNextItem
            if not self._step(forward).isValid():  # Tab from the last cell being edited: out of the table
                super().closeEditor(editor, hints.NoHint)
                self.leave(forward)
                return
        super().closeEditor(editor, hint)

    def focusInEvent(self, event: QFocusEvent) -> None:  # noqa: N802 - Qt's name
        rows, columns = self.rowCount(), self.columnCount()
        if (
            self.tabKeyNavigation()
            and rows
            and columns
            and event.reason() in (Qt.FocusReason.TabFocusReason, Qt.FocusReason.BacktabFocusReason)
        ):
            last = event.reason() == Qt.FocusReason.BacktabFocusReason
            self.setCurrentCell(rows - 1 if last else 0, columns - 1 if last else 0)
        super().focusInEvent(event)


class _ChoiceDelegate(_CellDelegate):
    """A combo box editor with fixed choices for the Type and Case columns."""

    def __init__(self, choices: Sequence[str], parent: QWidget | None = None) -> None:
        super().__init__(parent)
        self.choices = tuple(choices)

    def createEditor(self, parent: QWidget, option: Any, index: Any) -> QWidget:  # noqa: N802 - Qt's name
        box = QComboBox(parent)
        box.addItems(self.choices)
        box.activated.connect(lambda _i, b=box: self.commitData.emit(b))
        return box

    def setEditorData(self, editor: QWidget, index: Any) -> None:  # noqa: N802 - Qt's name
        assert isinstance(editor, QComboBox)
        editor.setCurrentText(str(index.data()))

    def setModelData(self, editor: QWidget, model: Any, index: Any) -> None:  # noqa: N802 - Qt's name
        assert isinstance(editor, QComboBox)
        model.setData(index, editor.currentText())


class LoadsEditor(QWidget):
    """The current wall's loads as an editable table; each cell edit is one undoable command."""

    def __init__(self, document: ProjectDocument, parent: QWidget | None = None) -> None:
        super().__init__(parent)
        self.document = document
        self.table = CellTable(0, len(LOAD_COLUMNS), self)
        self.table.setObjectName("loadsTable")
        self.table.setHorizontalHeaderLabels(LOAD_COLUMNS)
        for col, tip in enumerate(LOAD_TIPS):
            self.table.horizontalHeaderItem(col).setToolTip(tip)
        header = self.table.horizontalHeader()
        header.setSectionResizeMode(QHeaderView.ResizeMode.ResizeToContents)
        header.setSectionResizeMode(len(LOAD_COLUMNS) - 1, QHeaderView.ResizeMode.Stretch)
        self.table.verticalHeader().setDefaultSectionSize(22)
        self.table.setSelectionBehavior(QAbstractItemView.SelectionBehavior.SelectRows)
        self.table.setSelectionMode(QAbstractItemView.SelectionMode.SingleSelection)
        self.table.setEditTriggers(
            QAbstractItemView.EditTrigger.DoubleClicked
            | QAbstractItemView.EditTrigger.EditKeyPressed
            | QAbstractItemView.EditTrigger.AnyKeyPressed
            | QAbstractItemView.EditTrigger.SelectedClicked
        )
        self.table.setItemDelegateForColumn(0, _ChoiceDelegate(KINDS, self.table))
        self.table.setItemDelegateForColumn(1, _ChoiceDelegate(CASES, self.table))
        self.table.setMinimumHeight(150)
        holder, self.message = reserved_message(self)
        buttons = QHBoxLayout()
        buttons.setSpacing(4)
        self.add_buttons = {}
        for kind in KINDS:
            b = QPushButton(f"+ {kind}")
            b.setToolTip(f"Add a {kind} load to this wall")
            b.clicked.connect(lambda _c=False, k=kind: self._add(k))
            buttons.addWidget(b)
            self.add_buttons[kind] = b
        self.remove_button = QPushButton("Delete")
        self.remove_button.setToolTip("Delete the selected load")
        self.up_button = QPushButton("↑")
        self.up_button.setToolTip("Move the selected load up")
        self.down_button = QPushButton("↓")
        self.down_button.setToolTip("Move the selected load down")
        for b in (self.remove_button, self.up_button, self.down_button):
            buttons.addWidget(b)
        buttons.addStretch(1)
        self.remove_button.clicked.connect(self._remove)
        self.up_button.clicked.connect(lambda: self._move(-1))
        self.down_button.clicked.connect(lambda: self._move(1))
        self.where = Note(self)
        self.where.setText(LOADS_WHERE)
        layout = QVBoxLayout(self)
        layout.setContentsMargins(8, 0, 0, 0)
        layout.addWidget(self.where)
        layout.addWidget(self.table)
        layout.addWidget(holder)
        layout.addLayout(buttons)
        self._refreshing = False
        self._units = ""
        self._error_cell: tuple[int, int] | None = None
        self.table.itemChanged.connect(self._on_item_changed)

    # ---- rendering -----------------------------------------------------------------------------

    def refresh(self, clear_message: bool = False) -> None:
        doc = self.document
        wall = doc.current_wall
        units = doc.units
        loads = wall.loads
        if clear_message:
            self._show_message(None)
        if units != self._units:  # the header tips name the unit a bare number is read in
            self._units = units
            for col, tip in enumerate(load_tips(units)):
                self.table.horizontalHeaderItem(col).setToolTip(tip)
        self._refreshing = True
        try:
            if self.table.rowCount() != len(loads):
                self.table.setRowCount(len(loads))
            self._mark_assumed_rows(len(loads))
            for row, load in enumerate(loads):
                texts, editable = _load_row(load, units)
                for col, text in enumerate(texts):
                    item = self.table.item(row, col)
                    if item is None:
                        item = QTableWidgetItem()
                        self.table.setItem(row, col, item)
                    if item.text() != text:
                        item.setText(text)
                    flags = Qt.ItemFlag.ItemIsSelectable | Qt.ItemFlag.ItemIsEnabled
                    if editable[col]:
                        flags |= Qt.ItemFlag.ItemIsEditable
                    if item.flags() != flags:
                        item.setFlags(flags)
                    error = self._error_cell == (row, col)
                    if bool(item.data(_ERROR_ROLE)) != error:
                        item.setData(_ERROR_ROLE, error)
                        item.setBackground(QBrush(QColor(WARM_LIGHT)) if error else QBrush())
        finally:
            self._refreshing = False

    def _mark_assumed_rows(self, rows: int) -> None:
        """A row with a value the engineer did not enter (a line load's extent, a point load's mirroring) is
        marked in its row header with Kernline's assumed-value marker; the tooltip says what and why."""
        doc = self.document
        prefix = f"walls[{doc.current_index}].loads["
        by_row: dict[int, list[Any]] = {}
        for a in doc.assumptions:
            if a.field.startswith(prefix):
                row = a.field[len(prefix) : a.field.find("]", len(prefix))]
                if row.isdigit():
                    by_row.setdefault(int(row), []).append(a)
        for row in range(rows):
            item = self.table.verticalHeaderItem(row)
            if item is None:
                item = QTableWidgetItem(str(row + 1))
                self.table.setVerticalHeaderItem(row, item)
            found = by_row.get(row, [])
            tip = "\n".join(assumed_tip(a) for a in found)
            if item.toolTip() != tip:
                item.setToolTip(tip)
                item.setIcon(assumed_icon() if found else QIcon())
                item.setData(_ASSUMED_ROLE, bool(found))

    def assumed_rows(self) -> list[int]:
        """Rows shown with the assumed-value marker."""
        return [
            r
            for r in range(self.table.rowCount())
            if (self.table.verticalHeaderItem(r) or QTableWidgetItem()).data(_ASSUMED_ROLE)
        ]

    def _show_message(self, text: str | None, cell: tuple[int, int] | None = None) -> None:
        self._error_cell = cell
        self.message.setText(text or "")
        self.message.setVisible(bool(text))

    # ---- editing -------------------------------------------------------------------------------

    def _on_item_changed(self, item: QTableWidgetItem) -> None:
        if self._refreshing:
            return
        row, col = item.row(), item.column()
        message = self.edit_cell(row, col, item.text())
        if message is not None:
            self._show_message(f"Row {row + 1}, {LOAD_COLUMNS[col].lower()}: {message} (the previous value is kept)", (row, col))
        else:
            self._show_message(None)
        self.refresh()
        if message is not None and row < self.table.rowCount():
            self.table.scrollToItem(self.table.item(row, col))

    def edit_cell(self, row: int, col: int, text: str) -> str | None:
        """Apply a cell edit as one command; return the refusal message, if any."""
        doc = self.document
        wi = doc.current_index
        load = doc.current_wall.loads[row]
        base = ("walls", wi, "loads", row)
        text = " ".join(text.split())
        if col == 0:
            if text not in KINDS:
                return f"expected one of {', '.join(KINDS)}"
            if text == _kind_of(load):
                return None
            return self._push(row, commands.change_load_type(doc, wi, row, text))
        if col == 1:
            if text == load.case.value:
                return None
            return self._push(row, commands.SetField(doc, (*base, "case"), text, text="Set load case"))
        if col == 5:
            if text == load.label:
                return None
            return self._push(row, commands.SetField(doc, (*base, "label"), text, text="Set load label"))
        key, kind, units = _cell_key(load, col)
        if key is None:
            return None
        if key == "height" and text.lower().startswith("h "):
            text = text[2:].strip()  # the shown "h 21 ft", edited in place
        unit = units[1] if doc.units == "SI" else units[0]
        try:
            value = quantity_text(text, kind, unit)  # a bare number is read in the unit the cell shows
        except InputError as err:
            return field_problem(err.problem, kind, doc.units)
        if value == get_at(doc.raw, (*base, key)):
            return None
        return self._push(row, commands.SetField(doc, (*base, key), value, text=f"Set load {key}"))

    def _push(self, row: int, command: Any) -> str | None:
        """Push a load edit; a refusal about this load is told without its path (the row and column say where)."""
        doc = self.document
        message = doc.push(command)
        refusal = doc.last_refusal
        if message is None or refusal is None:
            return message
        field = refusal.field
        if field.startswith("walls["):
            field = field[field.find("]") + 2 :]
        return refusal.problem if field.startswith(f"loads[{row}]") else message

    def _selected_row(self) -> int | None:
        rows = self.table.selectionModel().selectedRows()
        return rows[0].row() if rows else (self.table.currentRow() if self.table.currentRow() >= 0 else None)

    def _add(self, kind: str) -> None:
        doc = self.document
        if doc.push(commands.add_load(doc, doc.current_index, kind)) is None:
            self.table.selectRow(self.table.rowCount() - 1)

    def _remove(self) -> None:
        row = self._selected_row()
        if row is not None:
            doc = self.document
            doc.push(commands.remove_load(doc, doc.current_index, row))

    def _move(self, step: int) -> None:
        row = self._selected_row()
        if row is None:
            return
        target = row + step
        if 0 <= target < self.table.rowCount():
            doc = self.document
            if doc.push(commands.move_load(doc, doc.current_index, row, target)) is None:
                self.table.selectRow(target)


def _kind_of(load: Any) -> str:
    return "line" if isinstance(load, LineLoad) else "point" if isinstance(load, PointLoad) else "lateral"


def _cell_key(load: Any, col: int) -> tuple[str | None, Kind, tuple[str, str]]:
    if col == 2:
        return (
            "value",
            (Kind.LINE_LOAD if isinstance(load, LineLoad) else Kind.FORCE),
            (LINE if isinstance(load, LineLoad) else FORCE),
        )
    if col == 3:
        key = "start" if isinstance(load, LineLoad) else "at" if isinstance(load, PointLoad) else "height"
        return key, Kind.LENGTH, LONG
    if col == 4 and isinstance(load, LineLoad):
        return "end", Kind.LENGTH, LONG
    return None, Kind.LENGTH, LONG


def _load_row(load: Any, units: str) -> tuple[list[str], list[bool]]:
    """The texts of a load's row, in display units, and which cells can be edited."""
    long_unit = LONG[1] if units == "SI" else LONG[0]
    if isinstance(load, LineLoad):
        value = show(load.value, Kind.LINE_LOAD, LINE[1] if units == "SI" else LINE[0])
        return (
            [
                "line",
                load.case.value,
                value,
                show(load.start, Kind.LENGTH, long_unit),
                show(load.end, Kind.LENGTH, long_unit),
                load.label,
            ],
            [True] * 6,
        )
    force_unit = FORCE[1] if units == "SI" else FORCE[0]
    if isinstance(load, PointLoad):
        return (
            [
                "point",
                load.case.value,
                show(load.value, Kind.FORCE, force_unit),
                show(load.at, Kind.LENGTH, long_unit),
                "",
                load.label,
            ],
            [True, True, True, True, False, True],
        )
    assert isinstance(load, LateralLoad)
    return (
        [
            "lateral",
            load.case.value,
            show(load.value, Kind.FORCE, force_unit),
            "h " + show(load.height, Kind.LENGTH, long_unit),
            "",
            load.label,
        ],
        [True, True, True, True, False, True],
    )


# ---- combinations table ------------------------------------------------------------------------------

COMBO_CASES = CASES


def combination_checks() -> tuple[Check, ...]:
    """The checks a load combination can name: the registered per-case checks of the ASD / service family."""
    return tuple(c for c in checks(Family.SERVICE) if c.per_case)


class CombinationsEditor(QWidget):
    """The combinations in force: the method's preset (read only) or the project's own list."""

    def __init__(self, document: ProjectDocument, parent: QWidget | None = None) -> None:
        super().__init__(parent)
        self.document = document
        self.custom = QCheckBox("Edit the combinations for this project")
        self.custom.setToolTip(
            "Replace the method's combinations by a list of this project's own, edited here. It starts as a copy of "
            "the method's; untick to return to the method's list."
        )
        self.checks: tuple[Check, ...] = ()
        self.table = CellTable(0, 0, self)
        self.table.setObjectName("combinationsTable")
        self._set_columns()
        self.table.verticalHeader().setDefaultSectionSize(20)
        self.table.verticalHeader().hide()
        self.table.setMinimumHeight(180)
        holder, self.message = reserved_message(self)
        self.add_button = QPushButton("+ combination")
        self.remove_button = QPushButton("Delete")
        buttons = QHBoxLayout()
        buttons.addWidget(self.add_button)
        buttons.addWidget(self.remove_button)
        buttons.addStretch(1)
        layout = QVBoxLayout(self)
        layout.setContentsMargins(8, 0, 0, 0)
        layout.addWidget(self.custom)
        layout.addWidget(self.table)
        layout.addWidget(holder)
        layout.addLayout(buttons)
        self._refreshing = False
        self._key: tuple | None = None
        self.custom.toggled.connect(self._on_custom_toggled)
        self.table.itemChanged.connect(self._on_item_changed)
        self.add_button.clicked.connect(self._add)
        self.remove_button.clicked.connect(self._remove)

    def is_custom(self) -> bool:
        return isinstance(get_at(self.document.raw, ("criteria", "combinations"), None), list)

    def _set_columns(self) -> None:
        """One column per load case, then one per check a combination can name (from the registry)."""
        self.checks = combination_checks()
        columns = ("Name", *COMBO_CASES, *(c.symbol for c in self.checks))
        self.table.setColumnCount(len(columns))
        self.table.setHorizontalHeaderLabels(columns)
        first = 1 + len(COMBO_CASES)
        for k, check in enumerate(self.checks):
            self.table.horizontalHeaderItem(first + k).setToolTip(f"Checked for {check.title.lower()} ({check.symbol})")
        header = self.table.horizontalHeader()
        header.setSectionResizeMode(QHeaderView.ResizeMode.ResizeToContents)
        header.setSectionResizeMode(0, QHeaderView.ResizeMode.Stretch)

    def refresh(self) -> None:
        doc = self.document
        custom = self.is_custom()
        key = (doc.project.criteria, custom, combination_checks())
        if key == self._key:
            return
        self._key = key
        if combination_checks() != self.checks:
            self._set_columns()
        combos = combinations_of(doc.project.criteria)
        self._refreshing = True
        try:
            self.custom.setChecked(custom)
            self.table.setRowCount(len(combos))
            for row, combo in enumerate(combos):
                cells = [combo.name] + [
                    trim(combo.factor(LoadCase(c)), 4) if combo.factor(LoadCase(c)) != 0.0 else "" for c in COMBO_CASES
                ]
                for col, text in enumerate(cells):
                    item = self.table.item(row, col) or QTableWidgetItem()
                    if self.table.item(row, col) is None:
                        self.table.setItem(row, col, item)
                    item.setText(text)
                    flags = Qt.ItemFlag.ItemIsEnabled | Qt.ItemFlag.ItemIsSelectable
                    if custom:
                        flags |= Qt.ItemFlag.ItemIsEditable
                    item.setFlags(flags)
                for k, check in enumerate(self.checks):
                    col = 1 + len(COMBO_CASES) + k
                    item = self.table.item(row, col) or QTableWidgetItem()
                    if self.table.item(row, col) is None:
                        self.table.setItem(row, col, item)
                    flags = Qt.ItemFlag.ItemIsEnabled | Qt.ItemFlag.ItemIsSelectable
                    if custom:
                        flags |= Qt.ItemFlag.ItemIsUserCheckable
                    item.setFlags(flags)
                    item.setCheckState(Qt.CheckState.Checked if check in combo.checks else Qt.CheckState.Unchecked)
        finally:
            self._refreshing = False
        self.add_button.setEnabled(custom)
        self.remove_button.setEnabled(custom)
        self.table.setTabKeyNavigation(custom)  # the method's list is read only: Tab passes it in one step

    def _preset_as_raw(self) -> list[dict[str, Any]]:
        out = []
        for combo in combinations_of(self.document.project.criteria):
            out.append(
                {
                    "name": combo.name,
                    "factors": {case.value: factor for case, factor in combo.factors},
                    "checks": [c.id for c in self.checks if c in combo.checks],
                }
            )
        return out

    def _on_custom_toggled(self, on: bool) -> None:
        if self._refreshing or on == self.is_custom():
            return
        doc = self.document
        message = doc.push(commands.use_custom_combinations(doc, self._preset_as_raw() if on else None))
        self._show(message)
        self.refresh()

    def _show(self, message: str | None) -> None:
        self.message.setText(message or "")
        self.message.setVisible(bool(message))

    def _on_item_changed(self, item: QTableWidgetItem) -> None:
        if self._refreshing or not self.is_custom():
            return
        message = self.edit_cell(item.row(), item.column(), item.text(), item.checkState() == Qt.CheckState.Checked)
        self._show(f"Row {item.row() + 1}: {message} (the previous value is kept)" if message else None)
        self.refresh()

    def edit_cell(self, row: int, col: int, text: str, checked: bool = False) -> str | None:
        doc = self.document
        base = ("criteria", "combinations", row)
        if col == 0:
            return doc.push(commands.SetField(doc, (*base, "name"), text.strip(), text="Rename combination"))
        if col <= len(COMBO_CASES):
            case = COMBO_CASES[col - 1]
            if not text.strip():
                value: Any = commands.DELETE
            else:
                try:
                    value = parse_number(text.strip())
                except InputError as err:
                    return err.problem
            return doc.push(commands.SetField(doc, (*base, "factors", case), value, text=f"Set factor on {case}"))
        keys = [c.id for c in self.checks]
        key = keys[col - 1 - len(COMBO_CASES)]
        named = list(get_at(doc.raw, (*base, "checks"), keys))
        if checked and key not in named:
            named.append(key)
        elif not checked and key in named:
            named.remove(key)
        named = [k for k in keys if k in named]
        return doc.push(commands.SetField(doc, (*base, "checks"), named, text="Set checks of combination"))

    def _add(self) -> None:
        doc = self.document
        n = len(get_at(doc.raw, ("criteria", "combinations"), []))
        change = commands.InsertItem(("criteria", "combinations"), n, {"name": f"combination {n + 1}", "factors": {"D": 1.0}})
        self._show(doc.push(commands.RawEdit(doc, "Add combination", [change], focus_path=("criteria", "combinations"))))
        self.refresh()

    def _remove(self) -> None:
        row = self.table.currentRow()
        doc = self.document
        if row < 0:
            return
        change = commands.RemoveItem(("criteria", "combinations"), row)
        self._show(doc.push(commands.RawEdit(doc, "Delete combination", [change], focus_path=("criteria", "combinations"))))
        self.refresh()


# ---- the two forms -----------------------------------------------------------------------------------


class WallForm(QWidget):
    """Inputs of the selected wall."""

    def __init__(self, document: ProjectDocument, parent: QWidget | None = None) -> None:
        super().__init__(parent)
        self.document = document
        self.group = FieldGroup(document)
        self.title = QLabel(self)
        self.title.setObjectName("sectionTitle")
        layout = QVBoxLayout(self)
        layout.setContentsMargins(0, 0, 0, 0)
        layout.setSpacing(0)
        layout.addWidget(self.title)
        self.sections: dict[str, Section] = {}
        for name, specs, expanded in (
            ("Wall", WALL_FIELDS, True),
            ("Stem", STEM_FIELDS, False),
            ("Footing", FOOTING_FIELDS, True),
        ):
            box, form = _form()
            for spec in specs:
                self.group.add(spec, form)
            self.sections[name] = Section(name, box, expanded)
            layout.addWidget(self.sections[name])

        # the footing's concrete design: how the wall is built, and the bars (shown with a concrete design)
        box, form = _form()
        self.concrete_form = form
        self.concrete_note = Note()
        self.concrete_note.setText(NO_CONCRETE_WALL)
        form.addRow(self.concrete_note)
        self.choices: dict[tuple[str, ...], Choice] = {}
        self._choice(form, ("construction",), "Wall construction", CONSTRUCTIONS, CONSTRUCTION_TIP)
        self.chord_offset = self.group.add(CHORD_OFFSET_FIELD, form)
        self._choice(form, ("footing", "reinforcement"), "Footing bars", REINFORCEMENT_FORMS, REINFORCEMENT_TIP)
        self.bar_fields = [self.group.add(spec, form) for spec in BAR_FIELDS]
        self.sections["Concrete"] = Section("Concrete design", box, True)
        layout.addWidget(self.sections["Concrete"])
        for path, choice in self.choices.items():
            self.document.field_labels[path_text(path)] = choice.label.text()
            choice.box.activated.connect(lambda _i, p=path: self._on_choice(p))

        self.loads = LoadsEditor(document)
        self.sections["Loads"] = Section("Loads", self.loads, True)
        layout.addWidget(self.sections["Loads"])
        box, form = _form()
        for spec in SIZING_FIELDS + EXTENSION_FIELDS:
            self.group.add(spec, form)
        self.sections["Sizing range"] = Section("Sizing range", box, False)
        layout.addWidget(self.sections["Sizing range"])
        # the section of each field path's first key ("footing.width" -> Footing)
        self._section_keys = {
            "footing": "Footing",
            "stem": "Stem",
            "loads": "Loads",
            "sizing": "Sizing range",
            "construction": "Concrete",
            "chord_offset": "Concrete",
        }

    shown_wall_id = ""

    def _choice(
        self, form: QFormLayout, path: tuple[str, ...], label: str, entries: Sequence[tuple[str, Any]], tip: str
    ) -> Choice:
        choice = Choice(path, label, entries, tip)
        form.addRow(choice.label, choice.box)
        self.choices[path] = choice
        return choice

    def refresh(self, force: bool = False) -> list[str]:
        """Show the current wall; returns what a forced refresh dropped (see :meth:`FieldGroup.refresh`)."""
        doc = self.document
        wall = doc.current_wall
        previous = self.shown_wall_id
        self.shown_wall_id = wall.id
        self.title.setText(f"Wall {wall.id}" + (f" — {wall.label}" if wall.label else ""))
        dropped = self.group.refresh(force)
        self.loads.refresh(clear_message=force)
        self._show_concrete()
        return [f"{d} of wall {previous}" for d in dropped] if previous else dropped

    def _show_concrete(self) -> None:
        """The wall's concrete inputs: shown with a concrete design; the chord offset for a light-frame wall
        only; the bar fields when the bars are entered."""
        doc = self.document
        wall = doc.current_wall
        assumed = doc.assumptions_by_field()
        designed = doc.project.concrete is not None
        form = self.concrete_form
        form.setRowVisible(self.concrete_note, not designed)
        form_of = reinforcement_form(get_at(doc.raw, doc.wall_path("footing", "reinforcement")))
        values = {("construction",): wall.construction.value, ("footing", "reinforcement"): form_of}
        for path, choice in self.choices.items():
            choice.show_value(values[path], assumed.get(path_text(doc.wall_path(*path))))
            form.setRowVisible(choice.box, designed)
        light = wall.construction is WallConstruction.LIGHT_FRAME
        form.setRowVisible(self.chord_offset, designed and light)
        for f in self.bar_fields:
            along = f.spec.path[-1] in ("bottom", "top")
            form.setRowVisible(f, designed and (form_of == "entered" or (form_of == "plain-bars" and along)))

    def _on_choice(self, path: tuple[str, ...]) -> None:
        """A wall's construction or its form of reinforcement chosen: one undoable edit."""
        choice = self.choices[path]
        doc = self.document
        value = choice.box.currentData()
        full = doc.wall_path(*path)
        if path == ("footing", "reinforcement"):
            if value == reinforcement_form(get_at(doc.raw, full)):
                return
            raw_value: Any = REINFORCEMENT_RAW[value]
        else:
            raw_value = value
            if get_at(doc.raw, full) == raw_value:
                return
        before = choice.box.itemText(choice.shown_index)
        label = choice.label.text()
        doc.push(
            commands.SetField(doc, full, raw_value, text=f"Set {_words(label)}"),
            announce=f"{doc.current_wall.id} · {label}: {before} → {choice.box.currentText()}",
        )
        self._show_concrete()

    def set_choice(self, path: tuple[str, ...], value: Any) -> None:
        """Choose ``value`` in the wall's choice box of ``path`` as a user would (for tests and keyboard use)."""
        self.choices[path].choose(value)

    def field_widget(self, rest: str) -> QWidget | None:
        """The current wall's input at ``rest`` ("footing.width", "construction"), or None."""
        path = tuple(rest.split("."))
        if path in self.choices:
            return self.choices[path].box
        for f in self.group.fields:
            if f.spec.path == path:
                return f.edit
        return None

    def show_field(self, rest: str, scroll: QScrollArea) -> bool:
        """Show and focus the current wall's input at ``rest`` (the path below the wall, as the engine names it)."""
        if not rest:
            return True
        head = rest.split(".")[0].split("[")[0]
        if rest.startswith("footing.reinforcement"):
            head = "construction"  # the bars sit with the concrete design
        section = self.sections.get(self._section_keys.get(head, "Wall"))
        if rest.startswith("loads["):
            row = rest[6 : rest.find("]")]
            assert section is not None
            section.toggle.setChecked(True)
            if row.isdigit() and int(row) < self.loads.table.rowCount():
                self.loads.table.selectRow(int(row))
                self.loads.table.scrollToItem(self.loads.table.item(int(row), 0))
            scroll.ensureWidgetVisible(self.loads)
            self.loads.table.setFocus()
            return True
        path = tuple(rest.split("."))
        if path in self.choices:
            assert section is not None
            section.toggle.setChecked(True)
            _settle(scroll)
            box = self.choices[path].box
            scroll.ensureWidgetVisible(box)
            box.setFocus()
            return True
        return _focus(self.group, rest, section, scroll)

    def focus_order(self) -> list[QWidget]:
        """Every input in the order the form shows it (fields, choice boxes, the loads table)."""
        return [w for section in self.sections.values() for w in _section_order(section, self.group)]


def _section_order(section: Section, group: FieldGroup) -> list[QWidget]:
    """The inputs of one section, top to bottom: the line edits of its fields, its choice boxes and check
    boxes, or the table of a loads or combinations editor."""
    content = section.content
    form = content.layout()
    if not isinstance(form, QFormLayout):
        return [section.toggle, *(w for w in content.findChildren(QAbstractScrollArea) if isinstance(w, QTableWidget))]
    by_widget = {id(f): f for f in group.fields}
    order: list[QWidget] = [section.toggle]
    for row in range(form.rowCount()):
        for role in (QFormLayout.ItemRole.FieldRole, QFormLayout.ItemRole.SpanningRole):
            item = form.itemAt(row, role)
            widget = item.widget() if item is not None else None
            if isinstance(widget, (QComboBox, QCheckBox)):
                order.append(widget)
            elif widget is not None and id(widget) in by_widget:
                order.append(by_widget[id(widget)].edit)
            if widget is not None:
                break  # a spanning row answers to both roles
    return order


# ---- concrete design choices ----------------------------------------------------------------------------

NO_CONCRETE_WALL = (
    "This project has no concrete design of its footings. Add one under Concrete design (all walls), "
    "further down, to give this wall's construction and its footing's bars."
)
NO_CONCRETE_PROJECT = (
    "No concrete design: the footings are checked for overturning, sliding, bearing and embedment only. "
    "Tick the box to design them to ACI 318-19 (reinforced, chapter 13, or plain, chapter 14)."
)
CONSTRUCTIONS = tuple((c.value, c.value) for c in WallConstruction)
CONSTRUCTION_TIP = (
    "What the wall is built of. It sets the footing's moment section (ACI 318-19 Table 13.2.7.1): at the face "
    "of a concrete wall, halfway between the centre and the face of a masonry wall; a light-frame wall on a sill "
    "is taken like masonry (Kernline's assumption). Along the length, a concrete or masonry wall delivers its "
    "overturning as the linear pressure of a rigid wall, a light-frame wall as a couple of its end chords."
)
REINFORCEMENT_FORMS = (
    ("designed by Kernline", "designed"),
    ("plain concrete, no bars (ACI 318-19 ch. 14)", "plain"),
    ("plain across, continuous bars along (IBC 2021 1905.6.2)", "plain-bars"),
    ("bars as entered below", "entered"),
)
REINFORCEMENT_RAW: dict[str, Any] = {
    "designed": commands.DELETE,
    "plain": "plain",
    "plain-bars": {"transverse": "plain"},
    "entered": {},
}
REINFORCEMENT_TIP = (
    "The footing's bars. Designed by Kernline: the lightest passing bar size and spacing (#4 to #8 at whole "
    "inches, common practice). Plain concrete: no bars, ACI 318-19 chapter 14 (h at least 8 in, strength on "
    "h - 2 in cast against soil, 14.5.1.7). Plain across with continuous bars along: the same, with the "
    "bottom and top bars that IBC 2021 1905.6.2 asks of a plain wall footing in seismic design categories C "
    "to F (two or more, #4 or larger, As at least 0.002 Ag, one top and one bottom above 8 in). As "
    "entered: the bars you give are checked; a part left empty is designed by Kernline."
)


def reinforcement_form(raw: Any) -> str:
    """The form of a footing's raw "reinforcement": "designed" (absent), "plain", "plain-bars" (plain
    across the width, continuous bars along it) or "entered" (bars given, some parts possibly left to
    Kernline)."""
    if raw is MISSING or raw is None:
        return "designed"
    if raw == "plain":
        return "plain"
    if isinstance(raw, dict) and raw.get("transverse") == "plain":
        return "plain-bars"
    return "entered"


SEISMIC_CATEGORIES: tuple[tuple[str, str | None], ...] = (("not given", None),) + tuple(
    (category, category) for category in "ABCDEF"
)
SEISMIC_CATEGORY_TIP = (
    "Seismic design category of the building (ASCE 7-16 11.6), from the structural drawings. Used by the "
    "concrete design: in categories D to F the footing's shear φ is 0.60, not above the wall's (ACI 318-19 "
    "21.2.4.3); in categories C to F a plain wall footing needs at least two continuous #4 or larger bars "
    "with As at least 0.002 Ag (IBC 2021 1905.6.2, in place of ACI 318-19 14.1.4). Not given: neither rule "
    "is applied."
)


BASES = (("gross", "gross"), ("net of overburden", "net"))
SLIDING_BASES = (
    ("friction on the whole vertical load N", "total"),
    ("friction on the dead load only", "dead"),
)
EV_AT_SOIL = (("kept: (0.6 − 0.14 S_DS)D", True), ("zero: 0.6D (exception 2)", False))
OVERTURNING_REDUCTIONS = (
    ("none", 0.0),
    ("10 % (modal response spectrum, 12.9)", 0.10),
    ("25 % (equivalent lateral force, 12.8)", 0.25),
)
WIND_OMEGAS = (("1.3 (wind of ASCE 7 chapters 26 to 31)", 1.3), ("1.0", 1.0))
REPORT_VALUES = "the geotechnical report"


def method_name(code: CodeBasis) -> str:
    """A code basis's title without its clauses, ASD abbreviated: "ASCE 7-16, ASD" (the full title is its tooltip)."""
    return code.title.split(" (")[0].replace("allowable stress design", "ASD")


def presumptive_choices() -> list[tuple[str, int | None]]:
    """ "the geotechnical report", then each class of IBC 2021 Table 1806.2 with its material."""
    return [(REPORT_VALUES, None)] + [(f"IBC Table 1806.2 class {n}: {c.material}", n) for n, c in sorted(TABLE_1806_2.items())]


def presumptive_text(number: int, units: str) -> str:
    """The values class ``number`` of IBC 2021 Table 1806.2 sets, in the display units (read-only text)."""
    c = TABLE_1806_2[number]
    pressure = "kPa" if units == "SI" else "psf"
    gradient = "kPa/m" if units == "SI" else "psf/ft"

    def value(si: float, kind: Kind, unit: str) -> str:
        return show(si, kind, unit, 1).replace(" ", "\u00a0")  # a number and its unit stay on one line

    return (
        f"Set by class {number} of IBC 2021 Table 1806.2: allowable bearing "
        f"{value(c.allowable_bearing, Kind.PRESSURE, pressure)}, lateral bearing "
        f"{value(c.lateral_bearing, Kind.PRESSURE_GRADIENT, gradient)} below natural grade, "
        f"friction {trim(c.friction, 2)} on the dead load (note a), cohesion "
        f"{value(c.cohesion, Kind.PRESSURE, pressure)} (note b). Choose {REPORT_VALUES} to enter your own."
    )


class Choice:
    """A choice box bound to one key of the project: its entries (words, value), label and tooltip."""

    def __init__(self, path: tuple[str, ...], label: str, entries: Sequence[tuple[str, Any]], tip: str) -> None:
        self.path = path
        self.box = _compact(QComboBox())
        self.box.setObjectName("choice_" + "_".join(path))
        self.box.setAccessibleName(label)
        for text, value in entries:
            self.box.addItem(text, value)
        self.box.setToolTip(tip)
        self.label = QLabel(label)
        self.label.setToolTip(tip)
        self.label.setBuddy(self.box)
        self.tip = tip
        self.shown_index = 0

    def index_of(self, value: Any) -> int:
        for i in range(self.box.count()):
            data = self.box.itemData(i)
            if data == value or (
                isinstance(data, float)
                and isinstance(value, (int, float))
                and not isinstance(value, bool)
                and abs(data - value) < 1e-9
            ):
                return i
        return -1

    def choose(self, value: Any) -> None:
        """Choose ``value`` as a user would (the box's ``activated`` signal commits it)."""
        index = self.index_of(value)
        if index < 0:
            raise ValueError(f"{value!r} is not a choice of {path_text(self.path)}")
        self.box.setCurrentIndex(index)
        self.box.activated.emit(index)

    def show_value(self, value: Any, assumption: Any = None) -> None:
        index = self.index_of(value)
        self.box.setCurrentIndex(max(0, index))
        self.shown_index = self.box.currentIndex()
        on = assumption is not None
        if bool(self.box.property("assumed")) != on:
            self.box.setProperty("assumed", on)
            self.box.style().unpolish(self.box)
            self.box.style().polish(self.box)
        self.box.setToolTip(f"{assumed_tip(assumption)}\n\n{self.tip}" if on else self.tip)


class ProjectForm(QWidget):
    """Project-wide inputs: soil, site, design criteria and combinations, project information."""

    def __init__(self, document: ProjectDocument, parent: QWidget | None = None) -> None:
        super().__init__(parent)
        self.document = document
        self.group = FieldGroup(document)
        layout = QVBoxLayout(self)
        layout.setContentsMargins(0, 0, 0, 0)
        layout.setSpacing(0)
        self.sections: dict[str, Section] = {}
        self.choices: dict[tuple[str, ...], Choice] = {}
        self.rows: dict[str, tuple[QFormLayout, QWidget]] = {}  # criteria option key -> its row

        # soil
        box, form = _form()
        self.source = self._choice(
            form,
            ("soil", "presumptive_class"),
            "Soil values from",
            presumptive_choices(),
            "Where the bearing, friction, cohesion and lateral bearing values come from: the geotechnical report, "
            "or a class of presumptive load-bearing values of IBC 2021 Table 1806.2 where the building official "
            "accepts them (1806.2).",
        )
        self.presumptive_note = Note()
        self.presumptive_note.hide()
        form.addRow(self.presumptive_note)
        self.group.add(SOIL_FIELDS[0], form)
        self.basis = self._choice(
            form,
            ("soil", "bearing_basis"),
            "Allowable is",
            BASES,
            "Whether the allowable is a gross pressure or net of the overburden at the footing base "
            "(then q_max - soil unit weight × (soil cover + t_f) is compared); the geotechnical report says which.",
        ).box
        for spec in SOIL_FIELDS[1:-1]:
            self.group.add(spec, form)
        self.sliding = self._choice(
            form,
            ("soil", "sliding_basis"),
            "Sliding resisted by",
            SLIDING_BASES,
            "The load that friction and the cohesion cap act on: the combination's whole vertical load N, or "
            "its dead load only as IBC 2021 Table 1806.2 note a and 1806.3.2 say (the default with a presumptive "
            "class).",
        ).box
        self.group.add(SOIL_FIELDS[-1], form)
        self.sections["Soil"] = Section("Soil (all walls)", box, True)
        layout.addWidget(self.sections["Soil"])

        # site
        box, form = _form()
        for spec in SITE_FIELDS:
            self.group.add(spec, form)
        self.sections["Site"] = Section("Site (all walls)", box, True)
        layout.addWidget(self.sections["Site"])

        # criteria: the method, the required ratios, then the options of the method
        box, form = _form()
        self.method = self._choice(
            form,
            ("criteria", "method"),
            "Method",
            [(method_name(code), code.id) for code in codes(Family.SERVICE)],
            "The code basis: ASCE 7-16 or ASCE 7-22 allowable stress design (2.4), the alternative basic "
            "combinations of IBC 2021 1605.2, or service loads with factors of safety (common practice); each "
            "item's tooltip gives its clauses. It sets the load combinations, required ratios and options. "
            "Options the method does not "
            "take are hidden, and choosing another method removes those the new one does not take (one undo step).",
        ).box
        for i, code in enumerate(codes(Family.SERVICE)):
            self.method.setItemData(i, f"{code.title}\n\n{code.wording}", Qt.ItemDataRole.ToolTipRole)
        self.required_specs = required_fields()
        for spec in self.required_specs:
            self.group.add(spec, form)
        option_fields = {spec.path[-1]: spec for spec in OPTION_FIELDS}
        self.group.add(option_fields["sds"], form)
        self.group.add(option_fields["bearing_increase"], form)
        self._choice(
            form,
            ("criteria", "ev_at_soil"),
            "Ev where dead load resists E",
            EV_AT_SOIL,
            "The vertical seismic effect Ev = 0.2 S_DS D in the counteracting seismic combination. ASCE 7-16 "
            "12.4.2.2, exception 2, permits Ev = 0 where the demand is on the soil-structure interface of a "
            "foundation.",
        )
        self._choice(
            form,
            ("criteria", "seismic_overturning_reduction"),
            "Seismic overturning reduction",
            OVERTURNING_REDUCTIONS,
            "ASCE 7-16 12.13.4: the overturning effect of the seismic loads at the soil-foundation interface may "
            "be reduced by 25 % with the equivalent lateral force procedure (12.8) or 10 % with the modal response "
            "spectrum analysis (12.9). Applied to the E lateral loads in the overturning and bearing checks.",
        )
        self._choice(
            form,
            ("criteria", "wind_omega"),
            "Omega on 0.6W",
            WIND_OMEGAS,
            "IBC 2021 1605.2: omega = 1.3 on 0.6W for wind loads of ASCE 7 chapters 26 to 31; 1.0 for other wind loads.",
        )
        self.group.add(option_fields["seismic_snow_factor"], form)
        self._choice(
            form, ("criteria", "seismic_design_category"), "Seismic design category", SEISMIC_CATEGORIES, SEISMIC_CATEGORY_TIP
        )
        for key in OPTION_KEYS + ("sds", "bearing_increase"):
            widget = self.choices[("criteria", key)].box if ("criteria", key) in self.choices else None
            if widget is None:
                widget = next(f for f in self.group.fields if f.spec.path == ("criteria", key))
            self.rows[key] = (form, widget)
        self.method_note = Note()
        form.addRow(self.method_note)
        self.sections["Criteria"] = Section("Design criteria (all walls)", box, True)
        layout.addWidget(self.sections["Criteria"])

        # the footings' concrete design (ACI 318-19): present or not, then its values
        box, form = _form()
        self.concrete_form = form
        self.concrete_on = QCheckBox("Design the footings' concrete (ACI 318-19)")
        self.concrete_on.setObjectName("concreteOn")
        self.concrete_on.setToolTip(
            "Adds the concrete section to the project: every footing is then designed or checked as reinforced "
            "(ACI 318-19 chapter 13) or plain (chapter 14) concrete on the strength combinations, with flexure and "
            "one-way shear among its checks. Untick to remove the section (Edit > Undo brings it back)."
        )
        self.concrete_on.clicked.connect(self._on_concrete_toggled)
        form.addRow(self.concrete_on)
        self.concrete_note = Note()
        form.addRow(self.concrete_note)
        self.concrete_fields = [self.group.add(spec, form) for spec in CONCRETE_FIELDS]
        self.strength = self._choice(
            form,
            ("concrete", "strength_method"),
            "Strength combinations",
            [(method_name(code), code.id) for code in codes(Family.STRENGTH)],
            "The factored load combinations of the concrete design, from the code-basis registry. W and E are the "
            "ASCE 7 nominal loads (as the ASD methods take them, with 0.6W and 0.7E), so these combinations use "
            "1.0W and 1.0E. Both lateral directions are checked.",
        ).box
        for i, code in enumerate(codes(Family.STRENGTH)):
            self.strength.setItemData(i, f"{code.title}\n\n{code.wording}", Qt.ItemDataRole.ToolTipRole)
        self.sections["Concrete"] = Section("Concrete design (all walls)", box, True)
        layout.addWidget(self.sections["Concrete"])

        self.combinations = CombinationsEditor(document)
        self.sections["Combinations"] = Section("Load combinations", self.combinations, False)
        layout.addWidget(self.sections["Combinations"])

        box, form = _form()
        for spec in PROJECT_FIELDS:
            self.group.add(spec, form)
        self.sections["Project"] = Section("Project information (title block)", box, False)
        layout.addWidget(self.sections["Project"])

        for path, choice in self.choices.items():
            self.document.field_labels[path_text(path)] = choice.label.text()
            choice.box.activated.connect(lambda _i, p=path: self._on_choice(p))

    def _choice(
        self, form: QFormLayout, path: tuple[str, ...], label: str, entries: Sequence[tuple[str, Any]], tip: str
    ) -> Choice:
        choice = Choice(path, label, entries, tip)
        form.addRow(choice.label, choice.box)
        self.choices[path] = choice
        return choice

    # ---- edits ---------------------------------------------------------------------------------

    def _on_choice(self, path: tuple[str, ...]) -> None:
        choice = self.choices[path]
        doc = self.document
        value = choice.box.currentData()
        before = choice.box.itemText(choice.shown_index)
        after = choice.box.currentText()
        label = choice.label.text()
        if path == ("criteria", "method"):
            if value == doc.project.criteria.method.id and get_at(doc.raw, path) == value:
                return
            command, removed = commands.change_method(doc, value)
            note = f" (removed {', '.join(removed)}: not an option of this method)" if removed else ""
            entered = get_at(doc.raw, ("criteria", "bearing_increase"))
            default = code_by_id(value).bearing_increase
            if isinstance(entered, (int, float)) and abs(float(entered) - default) > 1e-9:
                note += f"; the allowable increase stays {trim(float(entered), 3)} as entered (this method's default is {trim(default, 3)})"
            doc.push(command, announce=f"{label}: {before} → {after}{note}")
        elif path == ("soil", "presumptive_class"):
            if value == doc.project.soil.presumptive_class:
                return
            doc.push(commands.set_presumptive_class(doc, value), announce=f"{label}: {before} → {after}")
        else:
            raw_value = commands.DELETE if value is None else value  # "not given": the key is removed
            if get_at(doc.raw, path) == raw_value:
                return
            doc.push(
                commands.SetField(doc, path, raw_value, text=f"Set {_words(label)}"), announce=f"{label}: {before} → {after}"
            )
        self.refresh()

    def _on_concrete_toggled(self, on: bool) -> None:
        """Add the concrete section (every value then taken by default, marked assumed) or remove it; one undo step."""
        doc = self.document
        if on == ("concrete" in doc.raw):
            return
        words = "Add concrete design" if on else "Remove concrete design"
        doc.push(
            commands.SetField(doc, ("concrete",), {} if on else commands.DELETE, text=words),
            announce=f"Concrete design: {'none → ACI 318-19' if on else 'ACI 318-19 → none'}",
        )
        self.refresh()

    def set_choice(self, path: tuple[str, ...], value: Any) -> None:
        """Choose ``value`` in the choice box of ``path`` as a user would (for tests and keyboard use)."""
        self.choices[path].choose(value)

    # ---- rendering -----------------------------------------------------------------------------

    def refresh(self, force: bool = False) -> list[str]:
        doc = self.document
        project = doc.project
        dropped = self.group.refresh(force)
        assumed = doc.assumptions_by_field()
        criteria, soil = project.criteria, project.soil
        values = {
            ("soil", "presumptive_class"): soil.presumptive_class,
            ("soil", "bearing_basis"): soil.bearing_basis.value,
            ("soil", "sliding_basis"): soil.sliding_basis.value,
            ("criteria", "method"): criteria.method.id,
            ("criteria", "ev_at_soil"): criteria.ev_at_soil,
            ("criteria", "seismic_overturning_reduction"): criteria.seismic_overturning_reduction,
            ("criteria", "wind_omega"): criteria.wind_omega,
            ("criteria", "seismic_design_category"): criteria.seismic_design_category,
            ("concrete", "strength_method"): project.concrete.strength_method.id if project.concrete else None,
        }
        for path, choice in self.choices.items():
            choice.show_value(values[path], assumed.get(path_text(path)))
        self._show_options(criteria.method)
        self._show_presumptive(soil.presumptive_class)
        self._show_concrete()
        self.combinations.refresh()
        return dropped

    def _show_concrete(self) -> None:
        """The concrete values are shown only when the project has a concrete design."""
        designed = self.document.project.concrete is not None
        if self.concrete_on.isChecked() != designed:
            self.concrete_on.setChecked(designed)
        form = self.concrete_form
        form.setRowVisible(self.concrete_note, not designed)
        self.concrete_note.setText("" if designed else NO_CONCRETE_PROJECT)
        for f in self.concrete_fields:
            form.setRowVisible(f, designed)
        form.setRowVisible(self.strength, designed)

    def option_label(self, key: str) -> str:
        """The words beside the field or choice of criteria option ``key``."""
        path = ("criteria", key)
        if path in self.choices:
            return self.choices[path].label.text()
        f = self.group.field_at(path)
        return f.spec.label if f is not None else key

    def _show_options(self, method: CodeBasis) -> None:
        """Show the fields of the options ``method`` takes; hide the others (and say which)."""
        hidden = []
        for key, (form, widget) in self.rows.items():
            shown = key in method.options
            if form.isRowVisible(widget) != shown:
                form.setRowVisible(widget, shown)
            if not shown:
                hidden.append(self.option_label(key))
        text = method.title + "."
        if hidden:
            text += " Not options of this method: " + "; ".join(hidden) + "."
        if self.method_note.text() != text:
            self.method_note.setText(text)

    def _show_presumptive(self, number: int | None) -> None:
        """With a presumptive class its values are shown as read-only text and their fields disabled."""
        on = number is not None
        self.presumptive_note.setVisible(on)
        if on:
            self.presumptive_note.setText(presumptive_text(number, self.document.units))
        for f in self.group.fields:
            if f.spec.path[:1] == ("soil",) and f.spec.path[-1] in commands.PRESUMPTIVE_KEYS and f.isEnabled() == on:
                f.setEnabled(not on)
                self.group.labels[id(f)].setEnabled(not on)
                f.edit.setReadOnly(on)

    def field_widget(self, field: str) -> QWidget | None:
        """The input at an engine field path ("soil.cohesion", "criteria.method"), or None."""
        path = tuple(field.split("."))
        if path in self.choices:
            return self.choices[path].box
        f = self.group.field_at(path)
        return f.edit if f is not None else None

    def show_field(self, field: str, scroll: QScrollArea) -> bool:
        """Show and focus the project's input at ``field`` ("soil.cohesion", "criteria.required.sliding")."""
        head = field.split(".")[0]
        names = {"soil": "Soil", "site": "Site", "criteria": "Criteria", "project": "Project", "concrete": "Concrete"}
        path = tuple(field.split("."))
        if field == "concrete":
            self.sections["Concrete"].toggle.setChecked(True)
            _settle(scroll)
            scroll.ensureWidgetVisible(self.concrete_on)
            self.concrete_on.setFocus()
            return True
        if path in self.choices:
            self.sections[names[head]].toggle.setChecked(True)
            _settle(scroll)
            box = self.choices[path].box
            scroll.ensureWidgetVisible(box)
            box.setFocus()
            return True
        if field.startswith("criteria.combinations"):
            self.sections["Combinations"].toggle.setChecked(True)
            _settle(scroll)
            scroll.ensureWidgetVisible(self.combinations)
            self.combinations.table.setFocus()
            return True
        section = self.sections.get(names.get(head, ""))
        return _focus(self.group, field, section, scroll)

    def focus_order(self) -> list[QWidget]:
        """Every input in the order the form shows it (fields, choice and check boxes, the combinations)."""
        order = []
        for section in self.sections.values():
            if section.content is self.combinations:
                order += [section.toggle, self.combinations.custom, self.combinations.table]
            else:
                order += _section_order(section, self.group)
        return order

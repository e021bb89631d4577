"""The input forms: the selected wall (geometry, stem, footing, loads, sizing range) and the project
(soil, criteria, combinations, title block). They render from document signals and write only
through undoable commands.
"""

from __future__ import annotations

from collections.abc import Sequence
from typing import Any

from PySide6.QtCore import Qt
from PySide6.QtGui import QBrush, QColor, QIcon
from PySide6.QtWidgets import (
    QAbstractItemView,
    QCheckBox,
    QComboBox,
    QFormLayout,
    QHBoxLayout,
    QHeaderView,
    QLabel,
    QPushButton,
    QScrollArea,
    QStyledItemDelegate,
    QTableWidget,
    QTableWidgetItem,
    QVBoxLayout,
    QWidget,
)

from engine.combinations import combinations_of
from engine.errors import InputError
from engine.model import ALL_CHECKS, LateralLoad, LineLoad, LoadCase, PointLoad
from engine.units import Kind

from .. import commands
from ..document import ProjectDocument, get_at, path_text
from ..style import WARM_LIGHT, assumed_icon
from .fields import (
    CRITERIA_FIELDS,
    FOOTING_FIELDS,
    FORCE,
    LINE,
    LONG,
    PROJECT_FIELDS,
    SIZING_FIELDS,
    SOIL_FIELDS,
    STEM_FIELDS,
    WALL_FIELDS,
    FieldSpec,
    QuantityField,
    Section,
    assumed_tip,
    display_text,
    field_problem,
    parse_number,
    quantity_text,
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
            return False
        if value == get_at(doc.raw, path):
            field.set_error(None)
            if not live:
                field.set_display(display_text(spec, doc.project, doc.current_wall), force=True)
            return True
        announce = None
        if spec.scope == "project" and not spec.text:  # a design value of every wall: named in the status bar
            before = field.shown_text or "not entered"
            announce = lambda: f"{spec.label}: {before} → {self.display(field)}"  # noqa: E731 - read after the edit
        message = doc.push(
            commands.SetField(doc, path, value, session=field.session, text=f"Set {_words(spec.label)}"),
            quiet=live,
            announce=announce,
        )
        if message is not None:
            if not live:
                # at the field its label names it: the engine's sentence without its path
                refusal = doc.last_refusal
                field.set_error(field_problem(refusal.problem, spec.kind, doc.units) if refusal is not None else message)
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


def _focus(group: FieldGroup, rest: str, section: Section | None, scroll: QScrollArea) -> bool:
    """Open ``section`` and focus the field whose path is ``rest`` (or, for a section's name, its first field)."""
    fields = [f for f in group.fields if ".".join(f.spec.path) == rest]
    if not fields:
        fields = [f for f in group.fields if ".".join(f.spec.path).startswith(rest + ".")]
    if section is not None:
        section.toggle.setChecked(True)
    if not fields:
        if section is not None:
            scroll.ensureWidgetVisible(section)
        return section is not None
    scroll.ensureWidgetVisible(fields[0])
    fields[0].edit.setFocus()
    return True


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


# ---- loads table -------------------------------------------------------------------------------------

LOAD_COLUMNS = ("Type", "Case", "Value", "At / from / height", "To", "Label")
LOAD_TIPS = (
    "line: uniform load along the wall (from-to); point: a concentrated load; lateral: an in-plane shear (W or E only).",
    "ASCE 7-16 load case symbol (section 2.2): D dead, L live, Lr roof live, S snow, R rain, W wind, E seismic.",
    "Positive downward; a negative W line or point load is uplift. Lateral loads are magnitudes; the window checks "
    "both directions (Kernline mechanics).",
    "Line: where it starts; point: where it acts (both from the wall's start end); lateral: height above the top of "
    "the footing (the arm about the base is height + D).",
    "Line loads only: where the load ends (the whole wall when not given).",
    "Your description, printed beside the load.",
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


class _ChoiceDelegate(QStyledItemDelegate):
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
        self.table = QTableWidget(0, len(LOAD_COLUMNS), self)
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
        self.message = QLabel(self)
        self.message.setObjectName("fieldError")
        self.message.setWordWrap(True)
        self.message.hide()
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
        layout = QVBoxLayout(self)
        layout.setContentsMargins(8, 0, 0, 0)
        layout.addWidget(self.table)
        layout.addWidget(self.message)
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
COMBO_COLUMNS = ("Name", *COMBO_CASES, "OT", "SL", "BR")
_CHECK_KEYS = tuple(c.value for c in ALL_CHECKS)


class CombinationsEditor(QWidget):
    """The combinations in force: the method's preset (read only) or the project's own list."""

    def __init__(self, document: ProjectDocument, parent: QWidget | None = None) -> None:
        super().__init__(parent)
        self.document = document
        self.custom = QCheckBox("Use our own list of combinations")
        self.custom.setToolTip(
            "Replace the method's preset (ASCE 7-16 2.4.1 with 2.4.5 for E, or the service-load list) by a list "
            "edited here. Starts as a copy of the preset."
        )
        self.table = QTableWidget(0, len(COMBO_COLUMNS), self)
        self.table.setObjectName("combinationsTable")
        self.table.setHorizontalHeaderLabels(COMBO_COLUMNS)
        self.table.horizontalHeaderItem(len(COMBO_COLUMNS) - 3).setToolTip("Checked for overturning")
        self.table.horizontalHeaderItem(len(COMBO_COLUMNS) - 2).setToolTip("Checked for sliding")
        self.table.horizontalHeaderItem(len(COMBO_COLUMNS) - 1).setToolTip("Checked for bearing")
        header = self.table.horizontalHeader()
        header.setSectionResizeMode(QHeaderView.ResizeMode.ResizeToContents)
        header.setSectionResizeMode(0, QHeaderView.ResizeMode.Stretch)
        self.table.verticalHeader().setDefaultSectionSize(20)
        self.table.verticalHeader().hide()
        self.table.setMinimumHeight(180)
        self.message = QLabel(self)
        self.message.setObjectName("fieldError")
        self.message.setWordWrap(True)
        self.message.hide()
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
        layout.addWidget(self.message)
        layout.addLayout(buttons)
        self._refreshing = False
        self._key: tuple | None = None
        self.custom.toggled.connect(self._on_custom_toggled)
        self.table.itemChanged.connect(self._on_item_changed)
        self.add_button.clicked.connect(self._add)
        self.remove_button.clicked.connect(self._remove)

    def is_custom(self) -> bool:
        return isinstance(get_at(self.document.raw, ("criteria", "combinations"), None), list)

    def refresh(self) -> None:
        doc = self.document
        custom = self.is_custom()
        key = (doc.project.criteria, custom)
        if key == self._key:
            return
        self._key = key
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
                for k, check in enumerate(ALL_CHECKS):
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

    def _preset_as_raw(self) -> list[dict[str, Any]]:
        out = []
        for combo in combinations_of(self.document.project.criteria):
            out.append(
                {
                    "name": combo.name,
                    "factors": {case.value: factor for case, factor in combo.factors},
                    "checks": [c.value for c in ALL_CHECKS if c in combo.checks],
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
        key = _CHECK_KEYS[col - 1 - len(COMBO_CASES)]
        checks = list(get_at(doc.raw, (*base, "checks"), list(_CHECK_KEYS)))
        if checked and key not in checks:
            checks.append(key)
        elif not checked and key in checks:
            checks.remove(key)
        checks = [k for k in _CHECK_KEYS if k in checks]
        return doc.push(commands.SetField(doc, (*base, "checks"), checks, text="Set checks of combination"))

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
        self.loads = LoadsEditor(document)
        self.sections["Loads"] = Section("Loads", self.loads, True)
        layout.addWidget(self.sections["Loads"])
        box, form = _form()
        for spec in SIZING_FIELDS:
            self.group.add(spec, form)
        self.sections["Sizing range"] = Section("Sizing range", box, False)
        layout.addWidget(self.sections["Sizing range"])
        # the section of each field path's first key ("footing.width" -> Footing)
        self._section_keys = {"footing": "Footing", "stem": "Stem", "loads": "Loads", "sizing": "Sizing range"}

    shown_wall_id = ""

    def refresh(self, force: bool = False) -> list[str]:
        """Show the current wall; returns what a forced refresh dropped (see :meth:`FieldGroup.refresh`)."""
        wall = self.document.current_wall
        previous = self.shown_wall_id
        self.shown_wall_id = wall.id
        self.title.setText(f"Wall {wall.id}" + (f" — {wall.label}" if wall.label else ""))
        dropped = self.group.refresh(force)
        self.loads.refresh(clear_message=force)
        return [f"{d} of wall {previous}" for d in dropped] if previous else dropped

    def show_field(self, rest: str, scroll: QScrollArea) -> bool:
        """Show and focus the current wall's input at ``rest`` (the path below the wall, as the engine names it)."""
        if not rest:
            return True
        head = rest.split(".")[0].split("[")[0]
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
        return _focus(self.group, rest, section, scroll)

    def focus_order(self) -> list[QWidget]:
        return (
            [f.edit for f in self.group.fields[: len(WALL_FIELDS) + len(STEM_FIELDS) + len(FOOTING_FIELDS)]]
            + [self.loads.table]
            + [f.edit for f in self.group.fields[len(WALL_FIELDS) + len(STEM_FIELDS) + len(FOOTING_FIELDS) :]]
        )


METHODS = (("ASCE 7-16 ASD combinations", "asce7-16-asd"), ("Service loads with factors of safety", "service-fs"))
BASES = (("gross", "gross"), ("net of overburden", "net"))


class ProjectForm(QWidget):
    """Project-wide inputs: soil, design criteria and combinations, title block."""

    def __init__(self, document: ProjectDocument, parent: QWidget | None = None) -> None:
        super().__init__(parent)
        self.document = document
        self.group = FieldGroup(document)
        layout = QVBoxLayout(self)
        layout.setContentsMargins(0, 0, 0, 0)
        layout.setSpacing(0)
        self.sections: dict[str, Section] = {}

        box, form = _form()
        for spec in SOIL_FIELDS[:1]:
            self.group.add(spec, form)
        self.basis = _compact(QComboBox())
        for text, value in BASES:
            self.basis.addItem(text, value)
        self.basis.setToolTip(
            "Whether the allowable is a gross pressure or net of the overburden at the footing base "
            "(then q_max - soil weight x (cover + D) is compared); the geotechnical report says which."
        )
        form.addRow("Allowable is", self.basis)
        for spec in SOIL_FIELDS[1:]:
            self.group.add(spec, form)
        self.sections["Soil"] = Section("Soil (all walls)", box, True)
        layout.addWidget(self.sections["Soil"])

        box, form = _form()
        self.method = _compact(QComboBox())
        for text, value in METHODS:
            self.method.addItem(text, value)
        self.method.setToolTip(
            "ASCE 7-16 ASD: section 2.4.1 combinations with 2.4.5 / 12.4.2.3 for E, required ratios 1.0. "
            "Service loads: unfactored combinations with factors of safety 2.0 / 1.5 / 1.0 (common practice)."
        )
        form.addRow("Method", self.method)
        for spec in CRITERIA_FIELDS:
            self.group.add(spec, form)
        self.sections["Criteria"] = Section("Design criteria (all walls)", box, True)
        layout.addWidget(self.sections["Criteria"])

        self.combinations = CombinationsEditor(document)
        self.sections["Combinations"] = Section("Load combinations", self.combinations, False)
        layout.addWidget(self.sections["Combinations"])

        box, form = _form()
        for spec in PROJECT_FIELDS:
            self.group.add(spec, form)
        self.sections["Project"] = Section("Project", box, False)
        layout.addWidget(self.sections["Project"])

        self._shown_index: dict[tuple[str, ...], int] = {}
        self.method.activated.connect(lambda _i: self._set_choice(self.method, ("criteria", "method"), "Method", "Set method"))
        self.basis.activated.connect(
            lambda _i: self._set_choice(self.basis, ("soil", "bearing_basis"), "Allowable is", "Set bearing basis")
        )

    def _set_choice(self, box: QComboBox, path: tuple[str, ...], label: str, text: str) -> None:
        doc = self.document
        value = box.currentData()
        if get_at(doc.raw, path, None) == value:
            return
        before = box.itemText(self._shown_index.get(path, box.currentIndex()))
        after = box.currentText()
        doc.push(commands.SetField(doc, path, value, text=text), announce=f"{label}: {before} → {after}")
        self.refresh()

    def refresh(self, force: bool = False) -> list[str]:
        project = self.document.project
        dropped = self.group.refresh(force)
        self.method.setCurrentIndex(max(0, self.method.findData(project.criteria.method.value)))
        self.basis.setCurrentIndex(max(0, self.basis.findData(project.soil.bearing_basis.value)))
        self._shown_index = {
            ("criteria", "method"): self.method.currentIndex(),
            ("soil", "bearing_basis"): self.basis.currentIndex(),
        }
        self.combinations.refresh()
        return dropped

    def show_field(self, field: str, scroll: QScrollArea) -> bool:
        """Show and focus the project's input at ``field`` ("soil.cohesion", "criteria.required.sliding")."""
        if field == "soil.bearing_basis" or field == "criteria.method":
            box = self.basis if field.startswith("soil") else self.method
            section = self.sections["Soil" if field.startswith("soil") else "Criteria"]
            section.toggle.setChecked(True)
            scroll.ensureWidgetVisible(box)
            box.setFocus()
            return True
        if field.startswith("criteria.combinations"):
            self.sections["Combinations"].toggle.setChecked(True)
            scroll.ensureWidgetVisible(self.combinations)
            self.combinations.table.setFocus()
            return True
        head = field.split(".")[0]
        section = self.sections.get({"soil": "Soil", "criteria": "Criteria", "project": "Project"}.get(head, ""))
        return _focus(self.group, field, section, scroll)

    def focus_order(self) -> list[QWidget]:
        fields = self.group.fields
        return [
            fields[0].edit,
            self.basis,
            *[f.edit for f in fields[1 : len(SOIL_FIELDS)]],
            self.method,
            *[f.edit for f in fields[len(SOIL_FIELDS) :]],
        ]

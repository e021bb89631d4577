"""The project's walls: id, footing size, and the check closest to failing with its margin in words.

The last column reads "✓ 24% margin", "✗ 74% short", "✗ no equilibrium" or "✓ no demand": a pass/fail
symbol and the margin (or shortfall) of the check that governs, the one closest to its limit in the
engine's results (engine.summary). Its tooltip names that check and says its demand against its
capacity and its governing case. A wall whose sizing found no passing size says so in its tooltip
("outside the sizing bounds"). With a concrete design the mark also takes in the design along the
length (``WallResult.along``, tens of milliseconds a wall): until a result has worked it out the mark
reads its checks alone, and the list designs the missing ones a moment after the typing stops.

Add, duplicate, rename (F2 or double-click the id), delete and reorder; each is one undoable command.
"""

from __future__ import annotations

import math

from kernline.engine.results import Governing, WallResult
from kernline.engine.summary import OUTSIDE_BOUNDS, case_text, comparison_text, margin_text, state_words
from kernline.engine.units import format_length
from PySide6.QtCore import Qt, QTimer
from PySide6.QtGui import QColor
from PySide6.QtWidgets import (
    QAbstractItemView,
    QHBoxLayout,
    QHeaderView,
    QLabel,
    QPushButton,
    QTreeWidget,
    QTreeWidgetItem,
    QVBoxLayout,
    QWidget,
)

from .. import commands
from ..document import ProjectDocument
from ..style import GRAPHITE, MUTED, NG_MARK, OK_MARK, WARM

COLUMNS = ("Wall", "B × t_f", "Least margin")
MM = 0.001  # m


def footing_size_text(width: float, thickness: float, units: str) -> str:
    """B × t_f as the walls list shows it: 1'-6" × 1'-0" (US); 457 × 305 in SI, millimetres to the millimetre
    with the unit in the column's title (:func:`size_title`), so that the least margin beside it keeps its
    room in the list's width."""
    if units == "SI":
        return f"{width / MM:.0f} × {thickness / MM:.0f}"
    return f"{format_length(width, units)} × {format_length(thickness, units)}"


def size_title(units: str) -> str:
    """The footing column's title: "B × t_f", with "(mm)" in SI (see :func:`footing_size_text`)."""
    return f"{COLUMNS[1]} (mm)" if units == "SI" else COLUMNS[1]


ALONG_DELAY_MS = 150  # idle time after a refresh before the designs along the length are worked out


def along_ready(result: WallResult) -> bool:
    """Whether ``result`` needs no design along the length, or has worked it out already (cheap to ask)."""
    table = result.strength_table
    return table is None or table.concrete is None or "along" in result.memo


def margin_cell(result: WallResult) -> str:
    """ "✓ 24% margin", "✗ 74% short", "✗ no equilibrium", "✓ no demand" (no check has any demand), or
    "✗ fails along L_f" when every check passes but the design along the length does not (once the
    result has worked it out)."""
    worst = result.worst
    ready = along_ready(result)
    if result.passes and ready and not result.passes_along:
        return f"{NG_MARK} fails along L_f"
    mark = OK_MARK if (result.passes_all if ready else result.passes) else NG_MARK
    words = state_words(worst, result)
    return f"{mark} {words or margin_text(worst.ratio, worst.required, worst.passes)}"


def margin_tip(result: WallResult, units: str) -> str:
    """The governing check's demand against its capacity, its ratio and its case."""
    worst: Governing = result.worst
    said = comparison_text(worst, result, units)
    where = case_text(worst)
    ratio = (
        ""
        if math.isinf(worst.ratio) or state_words(worst, result)
        else f" (ratio {worst.ratio:.2f}, {worst.required:.2f} required)"
    )
    return f"Least margin: {worst.check.title.lower()}, {said}{ratio}" + (f" in {where}" if where else "")


class WallsView(QWidget):
    """List of walls with their verdicts; selection sets the document's current wall."""

    def __init__(self, document: ProjectDocument, parent: QWidget | None = None) -> None:
        super().__init__(parent)
        self.document = document
        title = QLabel("Walls")
        title.setObjectName("sectionTitle")
        self.tree = QTreeWidget(self)
        self.tree.setObjectName("wallsList")
        self.tree.setColumnCount(len(COLUMNS))
        self.tree.setHeaderLabels(COLUMNS)
        self.tree.setRootIsDecorated(False)
        self.tree.setIndentation(0)  # a flat list: no room kept for branches
        self.tree.setUniformRowHeights(True)
        self.tree.setSelectionMode(QAbstractItemView.SelectionMode.SingleSelection)
        self.tree.setEditTriggers(QAbstractItemView.EditTrigger.EditKeyPressed | QAbstractItemView.EditTrigger.DoubleClicked)
        self.tree.header().setSectionResizeMode(QHeaderView.ResizeMode.ResizeToContents)
        self.tree.header().setStretchLastSection(True)
        self.tree.headerItem().setToolTip(1, "The footing: width B × thickness t_f")
        self.tree.headerItem().setToolTip(
            2, "The check closest to its limit: ✓ with the margin it leaves, or ✗ with how far it falls short"
        )
        self.tree.setToolTip("The project's walls. F2 or double-click renames; ✓ passes every check, ✗ fails one.")
        self.buttons: dict[str, QPushButton] = {}
        grid = QHBoxLayout()
        grid.setSpacing(3)
        for key, text, tip in (
            ("add", "Add", "Add a wall (Ctrl+Shift+N)"),
            ("duplicate", "Duplicate", "Duplicate the selected wall (Ctrl+D)"),
            ("rename", "Rename", "Rename the selected wall (F2)"),
            ("delete", "Delete", "Delete the selected wall"),
            ("up", "↑", "Move the wall up the list"),
            ("down", "↓", "Move the wall down the list"),
        ):
            b = QPushButton(text)
            b.setToolTip(tip)
            if key in ("up", "down"):
                b.setFixedWidth(28)
            self.buttons[key] = b
            grid.addWidget(b)
        self.message = QLabel(self)
        self.message.setObjectName("fieldError")
        self.message.setWordWrap(True)
        self.message.hide()
        layout = QVBoxLayout(self)
        layout.setContentsMargins(6, 6, 6, 6)
        layout.addWidget(title)
        layout.addWidget(self.tree, 1)
        row1 = QHBoxLayout()
        for key in ("add", "duplicate", "rename"):
            row1.addWidget(self.buttons[key])
        row2 = QHBoxLayout()
        for key in ("delete", "up", "down"):
            row2.addWidget(self.buttons[key])
        row2.addStretch(1)
        layout.addLayout(row1)
        layout.addLayout(row2)
        layout.addWidget(self.message)
        self._refreshing = False
        self.buttons["add"].clicked.connect(self.add)
        self.buttons["duplicate"].clicked.connect(self.duplicate)
        self.buttons["rename"].clicked.connect(self.start_rename)
        self.buttons["delete"].clicked.connect(self.delete)
        self.buttons["up"].clicked.connect(lambda: self.move(-1))
        self.buttons["down"].clicked.connect(lambda: self.move(1))
        self.tree.currentItemChanged.connect(self._on_current_item_changed)
        document.sizing_changed.connect(self._on_sizing_changed)
        self._along_timer = QTimer(self)
        self._along_timer.setSingleShot(True)
        self._along_timer.setInterval(ALONG_DELAY_MS)
        self._along_timer.timeout.connect(self._on_along_due)
        self.tree.itemChanged.connect(self._on_item_changed)

    # ---- rendering -----------------------------------------------------------------------------

    def refresh(self) -> None:
        doc = self.document
        walls = doc.project.walls
        units = doc.units
        self._refreshing = True
        pending = False  # a wall whose design along the length is still to be worked out
        try:
            while self.tree.topLevelItemCount() > len(walls):
                self.tree.takeTopLevelItem(self.tree.topLevelItemCount() - 1)
            while self.tree.topLevelItemCount() < len(walls):
                item = QTreeWidgetItem()
                item.setFlags(item.flags() | Qt.ItemFlag.ItemIsEditable)
                self.tree.addTopLevelItem(item)
            if self.tree.headerItem().text(1) != size_title(units):
                self.tree.headerItem().setText(1, size_title(units))
            for i, wall in enumerate(walls):
                item = self.tree.topLevelItem(i)
                result = doc.result_of(wall)
                size = footing_size_text(wall.footing.width, wall.footing.thickness, units)
                if result is None:  # site values missing: nothing is checked
                    self._show_unchecked(item, wall.id, size, wall.label)
                    continue
                for col, text in enumerate((wall.id, size, margin_cell(result))):
                    if item.text(col) != text:
                        item.setText(col, text)
                ready = along_ready(result)
                pending = pending or not ready
                tone = QColor(GRAPHITE if (result.passes_all if ready else result.passes) else WARM)
                if item.foreground(2).color() != tone:
                    item.setForeground(2, tone)
                said = margin_tip(result, units)
                entry, fresh = doc.sizing_for(wall)
                if entry is not None and fresh and not entry.result.feasible:
                    said += f"\nSizing: no passing size; it is {OUTSIDE_BOUNDS} (widen them in Sizing range)"
                for col, tip in (
                    (0, wall.label or wall.id),
                    (2, said),
                ):
                    if item.toolTip(col) != tip:
                        item.setToolTip(col, tip)
            current = self.tree.topLevelItem(doc.current_index)
            if current is not None and self.tree.currentItem() is not current:
                self.tree.setCurrentItem(current)
        finally:
            self._refreshing = False
        if pending:
            self._along_timer.start()  # restarted by each refresh: it runs once the typing stops

    def _on_along_due(self) -> None:
        """Work out the design along the length of every wall still without it (each result keeps
        its own), then show the marks again."""
        doc = self.document
        if not doc.checkable:
            return
        for wall in doc.project.walls:
            result = doc.result_of(wall)
            if result is not None and not along_ready(result):
                _ = result.along
        self.refresh()

    def _on_sizing_changed(self, _wall_id: str) -> None:
        self.refresh()  # a wall's tooltip says when sizing found no passing size

    @staticmethod
    def _show_unchecked(item: QTreeWidgetItem, wall_id: str, size: str, label: str) -> None:
        for col, text in enumerate((wall_id, size, "not checked")):
            if item.text(col) != text:
                item.setText(col, text)
        item.setForeground(2, QColor(MUTED))
        item.setToolTip(0, label or wall_id)
        item.setToolTip(2, "Not checked: the project's soil values are still to be entered")

    def _show(self, message: str | None) -> None:
        self.message.setText(message or "")
        self.message.setVisible(bool(message))

    # ---- actions -------------------------------------------------------------------------------

    def _on_current_item_changed(self, current: QTreeWidgetItem | None, _previous: QTreeWidgetItem | None) -> None:
        if self._refreshing or current is None:
            return
        if not self.document.set_current_index(self.tree.indexOfTopLevelItem(current)):
            QTimer.singleShot(0, self.refresh)  # staying on the wall: the list shows it selected again

    def _on_item_changed(self, item: QTreeWidgetItem, column: int) -> None:
        if self._refreshing or column != 0:
            return
        index = self.tree.indexOfTopLevelItem(item)
        self.rename(index, item.text(0))

    def rename(self, index: int, new_id: str) -> str | None:
        doc = self.document
        new_id = new_id.strip()
        if new_id == doc.project.walls[index].id:
            return None
        message = doc.push(commands.rename_wall(doc, index, new_id)) if new_id else "the wall id must not be empty"
        self._show(f"Rename: {message}" if message else None)
        self.refresh()
        return message

    def add(self) -> None:
        self._show(self.document.push(commands.add_wall(self.document)))

    def duplicate(self) -> None:
        self._show(self.document.push(commands.duplicate_wall(self.document, self.document.current_index)))

    def start_rename(self) -> None:
        item = self.tree.topLevelItem(self.document.current_index)
        if item is not None:
            self.tree.editItem(item, 0)

    def delete(self) -> None:
        doc = self.document
        if len(doc.project.walls) <= 1:
            self._show("A project needs at least one wall; add another before deleting this one.")
            return
        self._show(doc.push(commands.remove_wall(doc, doc.current_index)))

    def move(self, step: int) -> None:
        doc = self.document
        target = doc.current_index + step
        if 0 <= target < len(doc.project.walls):
            self._show(doc.push(commands.move_wall(doc, doc.current_index, target)))

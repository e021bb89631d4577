"""The project's walls: id, footing size and the worst ratio with a pass/fail mark (text, not colour).

Add, duplicate, rename (F2 or double-click the id), delete and reorder; each is one undoable command.
"""

from __future__ import annotations

import math

from kernline.engine.results import Governing
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

COLUMNS = ("Wall", "Footing B × t_f", "Worst")


def _worst_tip(worst: Governing) -> str:
    """Which check is worst, and where (a geometric check has no case)."""
    where = ""
    if worst.case_index is not None and not math.isinf(worst.ratio):
        where = f" in {worst.combination}" + ("" if worst.direction == "none" else f" ({worst.direction})")
    return f"worst: {worst.check.title.lower()}, ratio {worst.ratio:.2f} vs required {worst.required:.2f}{where}"


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
        self.tree.setUniformRowHeights(True)
        self.tree.setSelectionMode(QAbstractItemView.SelectionMode.SingleSelection)
        self.tree.setEditTriggers(QAbstractItemView.EditTrigger.EditKeyPressed | QAbstractItemView.EditTrigger.DoubleClicked)
        self.tree.header().setSectionResizeMode(QHeaderView.ResizeMode.ResizeToContents)
        self.tree.header().setStretchLastSection(True)
        self.tree.headerItem().setToolTip(1, "Footing width B × thickness t_f")
        self.tree.headerItem().setToolTip(2, "The lowest ratio / required of every check, with ✓ OK or ✗ NG")
        self.tree.setToolTip("The project's walls. F2 or double-click renames; the mark reads ✓ OK or ✗ NG.")
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
        self.tree.itemChanged.connect(self._on_item_changed)

    # ---- rendering -----------------------------------------------------------------------------

    def refresh(self) -> None:
        doc = self.document
        walls = doc.project.walls
        units = doc.units
        self._refreshing = True
        try:
            while self.tree.topLevelItemCount() > len(walls):
                self.tree.takeTopLevelItem(self.tree.topLevelItemCount() - 1)
            while self.tree.topLevelItemCount() < len(walls):
                item = QTreeWidgetItem()
                item.setFlags(item.flags() | Qt.ItemFlag.ItemIsEditable)
                self.tree.addTopLevelItem(item)
            for i, wall in enumerate(walls):
                item = self.tree.topLevelItem(i)
                result = doc.result_of(wall)
                size = f"{format_length(wall.footing.width, units)} × {format_length(wall.footing.thickness, units)}"
                if result is None:  # site values missing: nothing is checked
                    self._show_unchecked(item, wall.id, size, wall.label)
                    continue
                worst = result.worst
                if math.isinf(worst.ratio):
                    worst_text = "no demand"
                else:
                    worst_text = (
                        f"{OK_MARK if result.passes else NG_MARK} {worst.normalized:.2f} {'OK' if result.passes else 'NG'}"
                    )
                for col, text in enumerate((wall.id, size, worst_text)):
                    if item.text(col) != text:
                        item.setText(col, text)
                tone = QColor(GRAPHITE if result.passes else WARM)
                if item.foreground(2).color() != tone:
                    item.setForeground(2, tone)
                for col, tip in (
                    (0, wall.label or wall.id),
                    (2, _worst_tip(worst)),
                ):
                    if item.toolTip(col) != tip:
                        item.setToolTip(col, tip)
            current = self.tree.topLevelItem(doc.current_index)
            if current is not None and self.tree.currentItem() is not current:
                self.tree.setCurrentItem(current)
        finally:
            self._refreshing = False

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

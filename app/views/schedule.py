"""The footing schedule of all walls (engine.schedule rows), with copy and CSV export.

With a concrete section the rows carry the footing's bars. The bottom and top bars come from the
engine's design along the length, tens of milliseconds a wall, which each result works out once and
keeps: a refresh after an edit designs only the edited wall again.
"""

from __future__ import annotations

from kernline.engine.registry import checks
from kernline.engine.schedule import schedule_headers, schedule_rows
from PySide6.QtCore import Qt, Signal
from PySide6.QtGui import QColor, QGuiApplication
from PySide6.QtWidgets import (
    QAbstractItemView,
    QHBoxLayout,
    QHeaderView,
    QLabel,
    QPushButton,
    QTableWidget,
    QTableWidgetItem,
    QVBoxLayout,
    QWidget,
)

from ..document import ProjectDocument
from ..style import WARM


def early_columns() -> tuple[str, ...]:
    """Shown first, so the verdict stays on screen in a narrow window; copy and CSV keep the engine's order.

    The wall, its result, the ratio of each registered check (as the schedule names it), the size and,
    with a concrete section, the bars.
    """
    ratios = [f"{c.title} ratio" for c in checks()]
    bars = ("Transverse bars", "Bottom bars", "Top bars")
    return ("Wall", "Result", *ratios, "Footing width", "Footing thickness", *bars)


NOTE = "Sizes as entered; ratios are the governing case of each check."
BARS_TIP = 'Bars as entered in the project, or designed by Kernline where none were given (the "from" columns say which).'


class ScheduleView(QWidget):
    """All walls, one row each: id, label, sizes, governing ratios, result."""

    export_requested = Signal()

    def __init__(self, document: ProjectDocument, parent: QWidget | None = None) -> None:
        super().__init__(parent)
        self.document = document
        self.table = QTableWidget(self)
        self.table.setObjectName("scheduleTable")
        self.table.setEditTriggers(QAbstractItemView.EditTrigger.NoEditTriggers)
        self.table.setSelectionBehavior(QAbstractItemView.SelectionBehavior.SelectRows)
        self.table.verticalHeader().hide()
        self.table.verticalHeader().setDefaultSectionSize(20)
        self.table.horizontalHeader().setSectionResizeMode(QHeaderView.ResizeMode.ResizeToContents)
        self.copy_button = QPushButton("Copy")
        self.copy_button.setToolTip("Copy the schedule (tab-separated, with headers) to paste into a spreadsheet")
        self.export_button = QPushButton("Export CSV…")
        self.export_button.setToolTip("Write the schedule as a CSV file")
        self.note = note = QLabel(NOTE)
        note.setObjectName("hint")
        note.setWordWrap(True)
        buttons = QHBoxLayout()
        buttons.addWidget(note, 1)
        buttons.addWidget(self.copy_button)
        buttons.addWidget(self.export_button)
        layout = QVBoxLayout(self)
        layout.setContentsMargins(4, 4, 4, 4)
        layout.addLayout(buttons)
        layout.addWidget(self.table, 1)
        self.copy_button.clicked.connect(self.copy)
        self.export_button.clicked.connect(self.export_requested)
        self.headers: list[str] = []
        self.rows: list[list[str]] = []

    def refresh(self) -> None:
        doc = self.document
        self.headers = schedule_headers(doc.units, doc.project if doc.checkable else None)
        if not doc.checkable:  # nothing is checked until the site values are in
            self.rows = []
            self.note.setText("Not checked yet: enter " + doc.missing_text() + ".")
        else:
            results = [doc.results[w.id] for w in doc.project.walls]
            self.rows = schedule_rows(doc.project, results)
            self.note.setText(NOTE)
            self.note.setToolTip(BARS_TIP if doc.project.concrete is not None else "")
        self.copy_button.setEnabled(bool(self.rows))
        self.export_button.setEnabled(bool(self.rows))
        self.table.setColumnCount(len(self.headers))
        self.table.setHorizontalHeaderLabels(self.headers)
        self._order_columns()
        self.table.setRowCount(len(self.rows))
        for r, row in enumerate(self.rows):
            for c, text in enumerate(row):
                item = self.table.item(r, c)
                if item is None:
                    item = QTableWidgetItem()
                    self.table.setItem(r, c, item)
                item.setText(text)
                item.setForeground(QColor(WARM) if text == "FAIL" else self.palette().text().color())
                if c >= 2:
                    item.setTextAlignment(
                        (Qt.AlignmentFlag.AlignRight | Qt.AlignmentFlag.AlignVCenter)
                        if c < len(row) - 1
                        else Qt.AlignmentFlag.AlignCenter
                    )

    def _order_columns(self) -> None:
        """Move the verdict columns forward on screen only (the model's column order is untouched)."""
        header = self.table.horizontalHeader()
        logical = [self.headers.index(name) for name in early_columns() if name in self.headers]
        logical += [c for c in range(len(self.headers)) if c not in logical]
        for visual, column in enumerate(logical):
            if header.visualIndex(column) != visual:
                header.moveSection(header.visualIndex(column), visual)

    def visible_headers(self) -> list[str]:
        """The headers in the order shown."""
        header = self.table.horizontalHeader()
        return [self.headers[header.logicalIndex(v)] for v in range(header.count())]

    def tsv(self) -> str:
        lines = ["\t".join(self.headers)] + ["\t".join(row) for row in self.rows]
        return "\n".join(lines) + "\n"

    def copy(self) -> None:
        self.refresh()
        QGuiApplication.clipboard().setText(self.tsv())

"""What to look at again: the engine's input warnings (right under the verdict; folded away while the
design map tab needs the height) and the values the engineer did not enter (the "Assumed values" tab). Both list fields by wall and name; activating an entry asks
the window to show its wall and field (``field_requested`` with the engine's field path).

Nothing here judges an input: the warnings are :func:`engine.input_warnings.input_warnings`, the
assumptions are the parser's :attr:`engine.model.Project.assumptions`.
"""

from __future__ import annotations

from PySide6.QtCore import QSize, Qt, Signal
from PySide6.QtWidgets import (
    QHeaderView,
    QLabel,
    QListWidget,
    QListWidgetItem,
    QSizePolicy,
    QTreeWidget,
    QTreeWidgetItem,
    QVBoxLayout,
    QWidget,
)

from ..document import ProjectDocument
from ..style import assumed_icon

FIELD_ROLE = Qt.ItemDataRole.UserRole + 11


class FittedLabel(QLabel):
    """A one-line label that shows the longest of its wordings that fits its width (the last, shortest one
    when none does); the whole thought belongs in its tooltip. Its height never changes, so a title that
    shortens in a narrow column moves nothing below it."""

    def __init__(self, parent: QWidget | None = None) -> None:
        super().__init__(parent)
        self.wordings: tuple[str, ...] = ("",)
        self.setSizePolicy(QSizePolicy.Policy.Ignored, QSizePolicy.Policy.Fixed)
        self.setWordWrap(False)

    def set_wordings(self, *wordings: str) -> None:
        """Longest first; the first is the whole thought, the last short enough for the narrowest column."""
        self.wordings = wordings or ("",)
        self._fit()

    def text_fits(self) -> bool:
        """Whether the text shown fits the label's width (what the tests read)."""
        return self.fontMetrics().horizontalAdvance(self.text()) <= self.contentsRect().width()

    def _fit(self) -> None:
        metrics = self.fontMetrics()
        room = self.contentsRect().width()
        shown = next((w for w in self.wordings if metrics.horizontalAdvance(w) <= room), self.wordings[-1])
        if shown != self.text():
            self.setText(shown)

    def resizeEvent(self, event) -> None:  # noqa: N802 - Qt's name
        super().resizeEvent(event)
        self._fit()

    def minimumSizeHint(self) -> QSize:  # noqa: N802 - Qt's name
        hint = super().minimumSizeHint()
        return QSize(self.fontMetrics().horizontalAdvance(self.wordings[-1]), hint.height())


class WarningsView(QWidget):
    """The project's input warnings, one line each (the whole sentence in the tooltip); hidden when there are none."""

    field_requested = Signal(str)

    VISIBLE_ROWS = 3  # more scroll

    def __init__(self, document: ProjectDocument, parent: QWidget | None = None) -> None:
        super().__init__(parent)
        self.document = document
        self.title = FittedLabel(self)
        self.title.setObjectName("warningsTitle")
        self.list = QListWidget(self)
        self.list.setObjectName("warningsList")
        self.list.setWordWrap(False)
        self.list.setTextElideMode(Qt.TextElideMode.ElideRight)
        self.list.setHorizontalScrollBarPolicy(Qt.ScrollBarPolicy.ScrollBarAlwaysOff)
        self.list.setUniformItemSizes(True)
        self.list.setSizePolicy(QSizePolicy.Policy.Expanding, QSizePolicy.Policy.Fixed)
        layout = QVBoxLayout(self)
        layout.setContentsMargins(6, 0, 6, 2)
        layout.setSpacing(1)
        layout.addWidget(self.title)
        layout.addWidget(self.list)
        self.list.itemClicked.connect(self._on_item)
        self.list.itemActivated.connect(self._on_item)
        self._shown: tuple[tuple[str, str], ...] | None = None
        self.folded = False  # set while the design map needs the column's height
        self.hide()

    def set_folded(self, folded: bool) -> None:
        """Fold the list away (the design map tab needs the height) or show it again."""
        self.folded = folded
        self.setVisible(bool(self._shown) and not folded)

    def refresh(self) -> None:
        doc = self.document
        shown = tuple((w.field, w.message) for w in doc.warnings())
        if shown == self._shown:
            return
        self._shown = shown
        self.list.clear()
        for field, message in shown:
            text = f"{doc.field_words(field)}: {message}" if field else message
            item = QListWidgetItem(f"⚠ {text}")
            item.setData(FIELD_ROLE, field)
            item.setToolTip(f"{text}\n\nClick to go to the field.")
            self.list.addItem(item)
        count = len(shown)
        self.title.set_wordings(
            f"Look again ({count}) — legal inputs that are often a mistake; click one to go to its field",
            f"Look again ({count}) — inputs often a mistake; click one",
            f"Look again ({count}) — click one to go to its field",
            f"Look again ({count})",
        )
        self.title.setToolTip(
            f"Look again ({count}): inputs that are legal but usually a mistake. A warning changes no result; "
            "click one to go to its field."
        )
        rows = min(count, self.VISIBLE_ROWS)
        row_height = self.list.sizeHintForRow(0) if count else 0
        self.list.setFixedHeight(rows * row_height + 2 * self.list.frameWidth() + 2)
        self.setVisible(bool(count) and not self.folded)

    def texts(self) -> list[str]:
        return [self.list.item(i).text() for i in range(self.list.count())]

    def _on_item(self, item: QListWidgetItem) -> None:
        field = item.data(FIELD_ROLE)
        if field:
            self.field_requested.emit(str(field))


ASSUMPTION_COLUMNS = ("Where", "Value taken", "Basis")


class AssumptionsView(QWidget):
    """Every value the engineer did not enter: where, the value taken, and why that value."""

    field_requested = Signal(str)

    def __init__(self, document: ProjectDocument, parent: QWidget | None = None) -> None:
        super().__init__(parent)
        self.document = document
        self.note = QLabel(self)
        self.note.setObjectName("hint")
        self.note.setWordWrap(True)
        self.tree = QTreeWidget(self)
        self.tree.setObjectName("assumptionsList")
        self.tree.setColumnCount(len(ASSUMPTION_COLUMNS))
        self.tree.setHeaderLabels(ASSUMPTION_COLUMNS)
        self.tree.setRootIsDecorated(False)
        self.tree.setUniformRowHeights(True)
        self.tree.setWordWrap(False)
        header = self.tree.header()
        header.setSectionResizeMode(0, QHeaderView.ResizeMode.ResizeToContents)
        header.setSectionResizeMode(1, QHeaderView.ResizeMode.ResizeToContents)
        header.setStretchLastSection(True)
        layout = QVBoxLayout(self)
        layout.setContentsMargins(4, 4, 4, 4)
        layout.addWidget(self.note)
        layout.addWidget(self.tree, 1)
        self.tree.itemActivated.connect(self._on_item)
        self.tree.itemClicked.connect(self._on_item)
        self._shown: tuple | None = None
        self._icon = assumed_icon()

    @property
    def count(self) -> int:
        return self.tree.topLevelItemCount()

    def refresh(self) -> None:
        doc = self.document
        shown = tuple((a.field, a.value, a.basis, doc.field_words(a.field)) for a in doc.assumptions)
        if shown == self._shown:
            return
        self._shown = shown
        self.tree.clear()
        for field, value, basis, words in shown:
            item = QTreeWidgetItem([words, value, basis])
            item.setIcon(0, self._icon)
            item.setData(0, FIELD_ROLE, field)
            for col, text in enumerate((f"{words} ({field})", value, basis)):
                item.setToolTip(col, text)
            self.tree.addTopLevelItem(item)
        self.note.setText(
            "Values Kernline took because the project does not give them, marked ◇ at their fields. "
            "Check each; typing a value makes it your own. Click one to go to its field."
            if shown
            else "Every value of this project was entered; none is assumed."
        )

    def rows(self) -> list[tuple[str, str, str]]:
        return [tuple(self.tree.topLevelItem(i).text(c) for c in range(len(ASSUMPTION_COLUMNS))) for i in range(self.count)]  # type: ignore[misc]

    def _on_item(self, item: QTreeWidgetItem, _column: int = 0) -> None:
        field = item.data(0, FIELD_ROLE)
        if field:
            self.field_requested.emit(str(field))

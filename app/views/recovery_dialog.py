"""The question asked at launch when windows of an earlier run ended without closing.

It lists every orphaned document (its name, its file or "never saved", when it was autosaved) with a
tick box each, all ticked. *Restore ticked* brings the ticked ones back (the first into this window,
each other one in a window of its own) and deletes the unticked ones; *Discard all* deletes them all;
*Decide later* leaves every record for the next launch.
"""

from __future__ import annotations

from collections.abc import Sequence
from dataclasses import dataclass

from PySide6.QtCore import Qt
from PySide6.QtWidgets import (
    QDialog,
    QDialogButtonBox,
    QLabel,
    QListWidget,
    QListWidgetItem,
    QPushButton,
    QVBoxLayout,
    QWidget,
)

from ..recovery import Orphan


@dataclass(frozen=True, slots=True)
class RecoveryChoice:
    """What to do with the orphans: restore these, delete those (the rest stays for later)."""

    restore: tuple[Orphan, ...] = ()
    discard: tuple[Orphan, ...] = ()


def orphan_line(orphan: Orphan) -> str:
    where = str(orphan.path) if orphan.path is not None else ("the demo project" if orphan.demo else "never saved")
    when = orphan.saved.replace("T", " ")[:16] if orphan.saved else "at an unknown time"
    return f"{orphan.title} — {where} — autosaved {when}"


class RecoveryDialog(QDialog):
    """Lists the orphaned documents with tick boxes; :meth:`choice` is the answer once it closes."""

    def __init__(self, orphans: Sequence[Orphan], parent: QWidget | None = None) -> None:
        super().__init__(parent)
        self.setWindowTitle("Restore unsaved work")
        self.orphans = tuple(orphans)
        count = len(self.orphans)
        intro = QLabel(
            "Kernline did not close normally. "
            + ("This document has" if count == 1 else f"These {count} documents have")
            + " changes that were never saved. Restore the ticked ones? The first opens in this window, "
            "each other one in a window of its own; unticked ones are deleted."
        )
        intro.setWordWrap(True)
        self.list = QListWidget(self)
        self.list.setObjectName("recoveryList")
        for orphan in self.orphans:
            item = QListWidgetItem(orphan_line(orphan))
            item.setFlags(item.flags() | Qt.ItemFlag.ItemIsUserCheckable)
            item.setCheckState(Qt.CheckState.Checked)
            item.setToolTip(str(orphan.record))
            self.list.addItem(item)
        buttons = QDialogButtonBox(self)
        self.restore_button = QPushButton("Restore ticked")
        self.discard_button = QPushButton("Discard all")
        self.later_button = QPushButton("Decide later")
        self.later_button.setToolTip("Keep every autosaved document; Kernline asks again at the next launch")
        buttons.addButton(self.restore_button, QDialogButtonBox.ButtonRole.AcceptRole)
        buttons.addButton(self.discard_button, QDialogButtonBox.ButtonRole.DestructiveRole)
        buttons.addButton(self.later_button, QDialogButtonBox.ButtonRole.RejectRole)
        self.restore_button.setDefault(True)
        self._answer = "later"
        self.restore_button.clicked.connect(lambda: self._close_with("restore"))
        self.discard_button.clicked.connect(lambda: self._close_with("discard"))
        self.later_button.clicked.connect(lambda: self._close_with("later"))
        layout = QVBoxLayout(self)
        layout.addWidget(intro)
        layout.addWidget(self.list, 1)
        layout.addWidget(buttons)
        row = self.list.sizeHintForRow(0) if count else 20
        self.list.setMinimumHeight(row * min(count, 8) + 12)
        self.resize(max(760, self.list.sizeHintForColumn(0) + 40), self.sizeHint().height())

    def _close_with(self, answer: str) -> None:
        self._answer = answer
        self.accept() if answer != "later" else self.reject()

    def ticked(self) -> tuple[Orphan, ...]:
        return tuple(o for i, o in enumerate(self.orphans) if self.list.item(i).checkState() == Qt.CheckState.Checked)

    def choice(self) -> RecoveryChoice:
        if self._answer == "restore":
            ticked = self.ticked()
            return RecoveryChoice(restore=ticked, discard=tuple(o for o in self.orphans if o not in ticked))
        if self._answer == "discard":
            return RecoveryChoice(discard=self.orphans)
        return RecoveryChoice()

    @classmethod
    def ask(cls, parent: QWidget | None, orphans: Sequence[Orphan]) -> RecoveryChoice:
        """Show the dialog (modal) and return the answer; closing it is "Decide later"."""
        dialog = cls(orphans, parent)
        dialog.exec()
        return dialog.choice()

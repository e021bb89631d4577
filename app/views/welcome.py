"""The first screen when Kernline starts with no project: three ways in and the recent projects.

It stands in place of the editor until a project is open. It holds no state of the project and
touches no document: it only asks, through its signals, for the window to open something.
"""

from __future__ import annotations

import json
from collections.abc import Sequence
from pathlib import Path

from kernline.engine import __version__
from kernline.engine.resources import resource_path
from PySide6.QtCore import Qt, Signal
from PySide6.QtWidgets import QFrame, QHBoxLayout, QLabel, QPushButton, QSizePolicy, QVBoxLayout, QWidget

from ..style import ACCENT, ACCENT_FAINT, GRAPHITE, HAIRLINE, MUTED, PAPER, WARM

COLUMN_WIDTH = 560  # px: the panel is one narrow column in the middle of the window

_STYLE = f"""
QWidget#welcome {{ background: {PAPER}; }}
QLabel#welcomeTitle {{ font-size: 22pt; font-weight: 600; color: {GRAPHITE}; }}
QLabel#welcomeLead {{ color: {MUTED}; font-size: 11pt; }}
QLabel#welcomeHeading {{ color: {MUTED}; font-weight: 600; letter-spacing: 1px; padding-top: 14px; }}
QLabel#welcomeHint {{ color: {MUTED}; padding-left: 2px; }}
QFrame#welcomeRule {{ color: {HAIRLINE}; }}
QPushButton#welcomeAction, QPushButton#recentEntry {{
    text-align: left; padding: 7px 12px; border: 1px solid {HAIRLINE}; border-radius: 4px; background: white;
}}
QPushButton#welcomeAction:hover, QPushButton#recentEntry:hover,
QPushButton#welcomeAction:focus, QPushButton#recentEntry:focus {{ border: 1px solid {ACCENT}; background: {ACCENT_FAINT}; }}
QPushButton#welcomeAction[primary="true"] {{ background: {ACCENT}; color: white; border: 1px solid {ACCENT}; font-weight: 600; }}
QPushButton#welcomeAction[primary="true"]:hover, QPushButton#welcomeAction[primary="true"]:focus {{ background: #185a62; }}
QPushButton#recentEntry {{ border: none; border-left: 3px solid {HAIRLINE}; border-radius: 0px; background: transparent; }}
QLabel#recentName {{ color: {GRAPHITE}; font-weight: 600; }}
QLabel#recentFolder {{ color: {MUTED}; }}
QLabel#recentMissing {{ color: {WARM}; }}
"""


NUMBER_WORDS = ("no", "one", "two", "three", "four", "five", "six", "seven", "eight", "nine", "ten")


def demo_words() -> str:
    """What the demo project is, its walls counted from the demo file itself (so the words follow the demo)."""
    try:
        walls = json.loads(resource_path("demo.kernline").read_text(encoding="utf-8")).get("walls", [])
    except (OSError, ValueError, AttributeError):
        return "A two-storey clinic; one of its walls fails bearing until it is sized."
    count = len(walls)
    number = NUMBER_WORDS[count] if count < len(NUMBER_WORDS) else str(count)
    return f"A two-storey clinic with {number} wall{'s' if count != 1 else ''}; one of them fails bearing until it is sized."


class WelcomePanel(QWidget):
    """Open the demo, start a new project, open a file, or pick one of the recent projects."""

    demo_requested = Signal()
    new_requested = Signal()
    open_requested = Signal()
    recent_requested = Signal(str)  # the file's path

    def __init__(self, parent: QWidget | None = None) -> None:
        super().__init__(parent)
        self.setObjectName("welcome")
        self.setAttribute(Qt.WidgetAttribute.WA_StyledBackground, True)
        self.setStyleSheet(_STYLE)

        title = QLabel("Kernline")
        title.setObjectName("welcomeTitle")
        version = QLabel(f"version {__version__}")
        version.setObjectName("welcomeHint")
        title_row = QHBoxLayout()
        title_row.addWidget(title)
        title_row.addWidget(version, 0, Qt.AlignmentFlag.AlignBottom)
        title_row.addStretch(1)
        lead = QLabel(
            "Checks concrete strip footings under shear walls for overturning, sliding and soil bearing "
            "under ASCE 7-16 load combinations, designs their concrete (ACI 318-19), and finds the smallest "
            "footing that passes."
        )
        lead.setObjectName("welcomeLead")
        lead.setWordWrap(True)

        entries = (
            self._action("Open the demo project", demo_words(), primary=True),
            self._action("New project", "One wall with starting values, to be replaced with your own."),
            self._action("Open a project file…", "A .kernline file saved earlier."),
        )
        (self.demo_button, _), (self.new_button, _), (self.open_button, _) = entries
        self.demo_button.clicked.connect(self.demo_requested)
        self.new_button.clicked.connect(self.new_requested)
        self.open_button.clicked.connect(self.open_requested)

        recent_heading = QLabel("RECENT PROJECTS")
        recent_heading.setObjectName("welcomeHeading")
        self.recent_box = QWidget()
        self.recent_layout = QVBoxLayout(self.recent_box)
        self.recent_layout.setContentsMargins(0, 0, 0, 0)
        self.recent_layout.setSpacing(2)
        self.no_recent = QLabel("None yet: projects you open or save are listed here.")
        self.no_recent.setObjectName("welcomeHint")
        self.recent_buttons: list[QPushButton] = []

        column = QWidget()
        column.setMaximumWidth(COLUMN_WIDTH)
        column.setSizePolicy(QSizePolicy.Policy.Preferred, QSizePolicy.Policy.Maximum)
        col = QVBoxLayout(column)
        col.setContentsMargins(0, 0, 0, 0)
        col.setSpacing(6)
        col.addLayout(title_row)
        col.addWidget(lead)
        col.addSpacing(14)
        for button, hint in entries:
            col.addWidget(button)
            col.addWidget(hint)
            col.addSpacing(4)
        rule = QFrame()
        rule.setObjectName("welcomeRule")
        rule.setFrameShape(QFrame.Shape.HLine)
        col.addWidget(rule)
        col.addWidget(recent_heading)
        col.addWidget(self.no_recent)
        col.addWidget(self.recent_box)

        row = QHBoxLayout()
        row.addStretch(1)
        row.addWidget(column, 3)
        row.addStretch(1)
        outer = QVBoxLayout(self)
        outer.setContentsMargins(24, 24, 24, 24)
        outer.addStretch(1)
        outer.addLayout(row)
        outer.addStretch(2)
        QWidget.setTabOrder(self.demo_button, self.new_button)
        QWidget.setTabOrder(self.new_button, self.open_button)
        self.set_recent([])

    def _action(self, text: str, hint_text: str, primary: bool = False) -> tuple[QPushButton, QLabel]:
        button = QPushButton(text)
        button.setObjectName("welcomeAction")
        button.setProperty("primary", primary)
        button.setAccessibleDescription(hint_text)
        button.setCursor(Qt.CursorShape.PointingHandCursor)
        hint = QLabel(hint_text)
        hint.setObjectName("welcomeHint")
        hint.setWordWrap(True)
        return button, hint

    def set_recent(self, files: Sequence[str]) -> None:
        """List ``files`` (most recent first) as entries that ask for the file to be opened."""
        for button in self.recent_buttons:
            self.recent_layout.removeWidget(button)
            button.deleteLater()
        self.recent_buttons = []
        for path in files:
            p = Path(path)
            missing = not p.is_file()
            button = _RecentEntry(p, missing)
            button.setCursor(Qt.CursorShape.PointingHandCursor)
            button.clicked.connect(lambda _checked=False, f=str(path): self.recent_requested.emit(f))
            self.recent_layout.addWidget(button)
            self.recent_buttons.append(button)
        self.no_recent.setVisible(not files)
        self.recent_box.setVisible(bool(files))


def short_folder(path: Path) -> str:
    """The file's folder, with the home folder written as "~"."""
    folder = path.parent
    try:
        return str(Path("~") / folder.relative_to(Path.home()))
    except (ValueError, RuntimeError):  # outside the home folder, or no home folder known
        return str(folder)


class _RecentEntry(QPushButton):
    """One recent project: its file name, and its folder in a quieter tone; clicking asks to open it."""

    def __init__(self, path: Path, missing: bool) -> None:
        super().__init__()
        self.setObjectName("recentEntry")
        self.setAccessibleName(f"Open {path.name}")
        self.setToolTip(f"Open {path}" if not missing else f"{path} no longer exists")
        name = QLabel(path.name)
        name.setObjectName("recentName")
        folder = QLabel(short_folder(path) + ("  — not found" if missing else ""))
        folder.setObjectName("recentMissing" if missing else "recentFolder")
        folder.setTextFormat(Qt.TextFormat.PlainText)
        name.setTextFormat(Qt.TextFormat.PlainText)
        layout = QHBoxLayout(self)
        layout.setContentsMargins(10, 4, 10, 4)
        layout.setSpacing(12)
        layout.addWidget(name)
        layout.addWidget(folder, 1)
        for label in (name, folder):
            label.setAttribute(Qt.WidgetAttribute.WA_TransparentForMouseEvents, True)
        self.setMinimumHeight(layout.sizeHint().height())
        self.name_label, self.folder_label = name, folder

"""The user guide in a window of its own: docs/guide.md rendered, with working links, opened at a section.

F1 opens the guide at the section about the focused input: :func:`anchor_for` maps an engine field
path ("walls[0].footing.width", "soil.friction") to the guide's section; :data:`PANE_TOPICS` names the
section for the other panes. Headings get the anchors a Markdown reader on the web would give them
(:func:`slug`), so the same links work in the repository and in the window.
"""

from __future__ import annotations

import re
import sys
from importlib import resources as _importlib_resources
from pathlib import Path

from PySide6.QtCore import Qt, QUrl
from PySide6.QtGui import QDesktopServices, QKeySequence, QShortcut, QTextCharFormat, QTextCursor, QTextDocument
from PySide6.QtWidgets import QHBoxLayout, QLabel, QPushButton, QTextBrowser, QVBoxLayout, QWidget

GUIDE = "guide.md"
TOP = "kernline-user-guide"  # the guide's title

# Field paths (below "walls[i]." for a wall's input) to the guide's sections: the longest matching
# prefix wins, so "footing.reinforcement" goes to the bars and the rest of "footing" to the footing.
FIELD_TOPICS: tuple[tuple[str, str], ...] = (
    ("label", "the-wall"),
    ("length", "the-wall"),
    ("thickness", "the-wall"),
    ("id", "the-walls-list"),
    ("stem", "stem-wall"),
    ("footing.reinforcement", "footing-reinforcement"),
    ("footing", "the-footing"),
    ("construction", "wall-construction"),
    ("chord_offset", "wall-construction"),
    ("loads", "loads"),
    ("sizing", "sizing-range"),
    ("soil.presumptive_class", "presumptive-soil-classes"),
    ("soil", "soil"),
    ("site", "site"),
    ("criteria.combinations", "load-combinations"),
    ("criteria.required", "required-ratios"),
    ("criteria.seismic_design_category", "the-concrete-section"),
    ("criteria", "design-criteria"),
    ("concrete", "the-concrete-section"),
    ("project", "project-information"),
    ("units", "units-and-quantities"),
)

# The window's panes (by attribute name on the main window) to the guide's sections.
PANE_TOPICS: tuple[tuple[str, str], ...] = (
    ("walls_view", "the-walls-list"),
    ("design_map", "sizing-with-the-design-map"),
    ("cases_table", "every-case"),
    ("schedule", "the-schedule"),
    ("assumptions_view", "assumed-values"),
    ("warnings_view", "look-again-warnings"),
    ("verdict", "the-verdict"),
    ("drawings", "the-drawings"),
    ("welcome", "starting-kernline"),
)


def guide_path() -> Path:
    """Where docs/guide.md is: in a frozen build's bundle, the installed package ``kernline.docs``, or the checkout."""
    bundle = getattr(sys, "_MEIPASS", None)
    if bundle:
        candidate = Path(bundle) / "docs" / GUIDE
        if candidate.exists():
            return candidate
    try:
        candidate = Path(str(_importlib_resources.files("kernline.docs").joinpath(GUIDE)))
        if candidate.exists():
            return candidate
    except (ModuleNotFoundError, TypeError, OSError, ValueError):  # e.g. a namespace over several folders
        pass
    return Path(__file__).resolve().parents[2] / "docs" / GUIDE


def guide_text() -> str:
    return guide_path().read_text(encoding="utf-8")


def slug(heading: str) -> str:
    """The anchor of a heading as Markdown readers on the web make it: lower case, punctuation dropped,
    spaces to hyphens ("Look again: warnings" → "look-again-warnings")."""
    text = heading.strip().lower()
    text = re.sub(r"[^\w\- ]", "", text)
    return text.replace(" ", "-")


def headings(markdown: str) -> list[tuple[int, str, str]]:
    """(level, text, anchor) of every heading of ``markdown`` outside code blocks."""
    found = []
    fenced = False
    for line in markdown.splitlines():
        if line.startswith("```"):
            fenced = not fenced
            continue
        m = re.match(r"^(#{1,6})\s+(.*?)\s*#*\s*$", line)
        if m and not fenced:
            found.append((len(m.group(1)), m.group(2), slug(m.group(2))))
    return found


def section(markdown: str, anchor: str) -> str:
    """The text of the section whose heading has ``anchor``, up to the next heading of its level or above."""
    lines = markdown.splitlines()
    start = level = None
    for i, line in enumerate(lines):
        m = re.match(r"^(#{1,6})\s+(.*?)\s*#*\s*$", line)
        if not m:
            continue
        depth = len(m.group(1))
        if start is None and slug(m.group(2)) == anchor:
            start, level = i, depth
        elif start is not None and level is not None and depth <= level:
            return "\n".join(lines[start:i])
    return "\n".join(lines[start:]) if start is not None else ""


def anchor_for(field: str) -> str:
    """The guide's section about an input named by its engine field path.

    "walls[0].footing.width" → "the-footing"; "walls[2].footing.reinforcement.bottom" →
    "footing-reinforcement"; "soil.friction" → "soil"; anything unknown → the guide's top.
    """
    rest = re.sub(r"^walls\[\d+\]\.?", "", field)
    rest = re.sub(r"\[\d+\]", "", rest)
    best = ""
    anchor = TOP
    for prefix, topic in FIELD_TOPICS:
        if (rest == prefix or rest.startswith(prefix + ".")) and len(prefix) > len(best):
            best, anchor = prefix, topic
    return anchor


class HelpWindow(QWidget):
    """The guide, with back and forward, contents, and links that work (outside links go to the browser)."""

    def __init__(self, parent: QWidget | None = None) -> None:
        super().__init__(parent, Qt.WindowType.Window)
        self.setObjectName("helpWindow")
        self.setWindowTitle("Kernline — user guide")
        self.resize(760, 820)
        self.browser = QTextBrowser(self)
        self.browser.setObjectName("guide")
        self.browser.document().setDocumentMargin(14)
        self.browser.setOpenLinks(False)  # internal anchors scroll here; outside links open in the browser
        self.browser.anchorClicked.connect(self._on_link)
        self.back_button = QPushButton("← Back")
        self.back_button.setToolTip("The section shown before (Alt+Left)")
        self.forward_button = QPushButton("Forward →")
        self.forward_button.setToolTip("The section shown next (Alt+Right)")
        self.contents_button = QPushButton("Contents")
        self.contents_button.setToolTip("The guide's contents (Alt+Home)")
        self.where = QLabel()
        self.where.setObjectName("hint")
        row = QHBoxLayout()
        for b in (self.back_button, self.forward_button, self.contents_button):
            row.addWidget(b)
        row.addWidget(self.where, 1)
        layout = QVBoxLayout(self)
        layout.setContentsMargins(8, 8, 8, 8)
        layout.addLayout(row)
        layout.addWidget(self.browser, 1)
        self.back_button.clicked.connect(self.back)
        self.forward_button.clicked.connect(self.forward)
        self.contents_button.clicked.connect(lambda: self.show_anchor("contents"))
        QShortcut(QKeySequence("Alt+Left"), self, self.back)
        QShortcut(QKeySequence("Alt+Right"), self, self.forward)
        QShortcut(QKeySequence("Alt+Home"), self, lambda: self.show_anchor("contents"))
        QShortcut(QKeySequence("Ctrl+W"), self, self.close)
        self.anchors: list[str] = []
        self.history: list[str] = []
        self.position = -1
        self.load()

    def load(self, markdown: str | None = None) -> None:
        """Render the guide (``markdown``, else docs/guide.md) and give every heading its anchor."""
        text = guide_text() if markdown is None else markdown
        self.browser.document().setMarkdown(text, QTextDocument.MarkdownFeature.MarkdownDialectGitHub)
        self.anchors = self._name_headings()
        self.history, self.position = [], -1
        self._update_buttons()

    def _name_headings(self) -> list[str]:
        """Mark each heading's text as an anchor named by :func:`slug`; Qt's Markdown reader gives headings none."""
        doc = self.browser.document()
        names = []
        block = doc.begin()
        while block.isValid():
            if block.blockFormat().headingLevel() > 0:
                name = slug(block.text())
                cursor = QTextCursor(block)
                cursor.movePosition(QTextCursor.MoveOperation.EndOfBlock, QTextCursor.MoveMode.KeepAnchor)
                fmt = QTextCharFormat()
                fmt.setAnchor(True)
                fmt.setAnchorNames([name])
                cursor.mergeCharFormat(fmt)
                names.append(name)
            block = block.next()
        return names

    def show_anchor(self, anchor: str, remember: bool = True) -> bool:
        """Scroll to the section ``anchor`` (the top when there is none); True when it exists."""
        known = anchor in self.anchors
        target = anchor if known else TOP
        if target in self.anchors:
            self.browser.scrollToAnchor(target)
        if remember:
            del self.history[self.position + 1 :]
            self.history.append(target)
            self.position = len(self.history) - 1
        self.current = target
        self.where.setText(self._heading_text(target))
        self._update_buttons()
        return known

    current = TOP

    def _heading_text(self, anchor: str) -> str:
        block = self.browser.document().begin()
        while block.isValid():
            if block.blockFormat().headingLevel() > 0 and slug(block.text()) == anchor:
                return block.text()
            block = block.next()
        return ""

    def back(self) -> None:
        if self.position > 0:
            self.position -= 1
            self.show_anchor(self.history[self.position], remember=False)

    def forward(self) -> None:
        if self.position + 1 < len(self.history):
            self.position += 1
            self.show_anchor(self.history[self.position], remember=False)

    def _update_buttons(self) -> None:
        self.back_button.setEnabled(self.position > 0)
        self.forward_button.setEnabled(self.position + 1 < len(self.history))

    def _on_link(self, url: QUrl) -> None:
        if url.scheme() in ("http", "https", "mailto"):
            QDesktopServices.openUrl(url)
            return
        if url.hasFragment() and not url.path():
            self.show_anchor(url.fragment())

    def open_at(self, anchor: str) -> bool:
        """Show the window, raised, at ``anchor``."""
        self.show()
        self.raise_()
        self.activateWindow()
        return self.show_anchor(anchor)

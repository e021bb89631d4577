"""Kernline's main window: walls, inputs, drawings and verdict on one screen.

Layout (ours): the walls list on the left; the selected wall's inputs and the project-wide soil and
criteria in the middle; on the right the elevation above the soil pressure (one x scale), the verdict,
and tabs for every case, the design map and the schedule. A caution line stays at the bottom.

:func:`launch` is what ``kernline``, ``kernline open FILE`` and ``kernline demo`` call. Started with
neither a file nor the demo, the window shows a welcome panel in place of the editor until a project
is open. File > Export calculation package writes the PDF on a worker (:class:`runner.PackageWriter`).
"""

from __future__ import annotations

import contextlib
import os
import re
import sys
import warnings
from collections.abc import Callable, Mapping
from pathlib import Path
from typing import Any

from kernline.engine import CAUTION, __version__
from kernline.engine.errors import InputError
from kernline.engine.project_file import EXTENSION
from kernline.engine.registry import Family, checks, codes
from kernline.engine.schedule import write_schedule
from kernline.engine.units import format_length
from PySide6.QtCore import QEvent, QSettings, QSize, QStandardPaths, Qt, QTimer
from PySide6.QtGui import QAction, QActionGroup, QCloseEvent, QKeySequence
from PySide6.QtWidgets import (
    QAbstractButton,
    QAbstractItemView,
    QApplication,
    QBoxLayout,
    QFileDialog,
    QFrame,
    QLabel,
    QListWidget,
    QMainWindow,
    QMenu,
    QMessageBox,
    QProgressBar,
    QScrollArea,
    QSizePolicy,
    QSplitter,
    QStackedWidget,
    QTabWidget,
    QToolBar,
    QVBoxLayout,
    QWidget,
)

from . import commands, qt_platform, recovery
from .document import ProjectDocument, absolute, split_field
from .recovery import Orphan, RecoverySlot
from .runner import PackageOutcome, PackageWriter, SizingBatch, SizingRunner
from .style import STYLE_SHEET, configure_pyqtgraph
from .views.cases import CasesTable
from .views.design_map import DesignMapView
from .views.drawings import DrawingsPanel
from .views.fields import guard_wheel
from .views.forms import ProjectForm, WallForm
from .views.help import PANE_TOPICS, HelpWindow, anchor_for
from .views.notes import AssumptionsView, FittedLabel, WarningsView
from .views.recovery_dialog import RecoveryDialog
from .views.schedule import ScheduleView
from .views.verdict import VerdictView
from .views.walls import WallsView
from .views.welcome import WelcomePanel

AUTOSAVE_MS = 15_000  # an edit reaches the recovery file within this time
RECENT_LIMIT = 8
PACKAGE_SEAL_KEY = "package/seal_every_sheet"  # settings keys of File > Package options
PACKAGE_VERIFICATION_KEY = "package/verification_appendix"
FILE_FILTER = f"Kernline projects (*{EXTENSION});;All files (*)"
PDF_FILTER = "PDF (*.pdf);;All files (*)"
EXIT_AFTER_VARIABLE = "KERNLINE_EXIT_AFTER_MS"  # the frozen build's smoke check: quit this many ms after showing
# The frame's layout (ours). Widths and heights in pixels; shares of the space the panes split.
WALLS_WIDTH = 250  # the walls list: id, footing and worst ratio
FORMS_WIDTH = (410, 470)  # the inputs column: never narrower (its fields fit), never wider (more width goes right)
FORMS_SHARE = 0.28  # of the window's width, within FORMS_WIDTH
DRAWINGS_SHARE = 0.5  # of the right column's height: elevation and pressure; the verdict and tabs take the rest
VERDICT_SPARE_LINES = 2  # lines of text the verdict's headline and hint may take beyond one each
DRAWINGS_CAPTIONS = 1  # lines of room for the drawings' captions to wrap without moving the panes
WIDE_COLUMN = 780  # a right column this wide puts the warnings beside the verdict instead of under it
MAP_LEAST_HEIGHT = 240  # a design map tab page lower than this shows the map in the drawings' place while it is open
REFERENCES = (
    "ASCE 7-16 and ASCE 7-22 (load combinations, section 2.4); IBC 2021 (sections 1605, 1806 and 1809); "
    "Das and Bowles (soil pressure under eccentric load)"
)


def exit_after_ms(environ: Mapping[str, str] | None = None) -> int | None:
    """The smoke hook's delay from ``KERNLINE_EXIT_AFTER_MS``: a positive whole number of ms, else None."""
    text = (os.environ if environ is None else environ).get(EXIT_AFTER_VARIABLE, "").strip()
    if not text.isdigit():
        return None
    value = int(text)
    return value if value > 0 else None


# What the window writes besides the project: (ending after the project's name, suffix, name without a project name)
EXPORTS = {"package": ("", ".pdf", "calculation-package"), "schedule": ("-schedule", ".csv", "schedule")}


def export_file_name(project_name: str, kind: str) -> str:
    """The suggested file name of an export ("package" PDF or "schedule" CSV), both from the project's name.

    Characters file systems refuse become "-"; a project without a name gives the export's own name.
    "Cedar Hollow Clinic" → "Cedar Hollow Clinic.pdf" and "Cedar Hollow Clinic-schedule.csv".
    """
    ending, suffix, fallback = EXPORTS[kind]
    stem = re.sub(r'[\\/:*?"<>|\x00-\x1f]+', "-", project_name).strip(" .-")
    return (stem + ending if stem else fallback) + suffix


def package_file_name(project_name: str) -> str:
    """The PDF's suggested file name (see :func:`export_file_name`)."""
    return export_file_name(project_name, "package")


def default_recovery_dir() -> Path:
    """Where recovery files live: Kernline/recovery in the user's data folder (see :mod:`app.recovery`).

    Linux ~/.local/share/Kernline/recovery; macOS ~/Library/Application Support/Kernline/recovery;
    Windows %LOCALAPPDATA%\\Kernline\\recovery.
    """
    base = QStandardPaths.writableLocation(QStandardPaths.StandardLocation.GenericDataLocation) or str(Path.home())
    return Path(base) / "Kernline" / "recovery"


class ResultsPane(QWidget):
    """The verdict-and-warnings strip at its own height, and the tabs in all the height left under it.

    Placed by hand rather than by a box layout: a tab page whose text wraps (height for width) would make a
    box layout squeeze the strip or move the tabs when that page is shown; here the tabs simply get what
    is left, whichever page is shown.
    """

    GAP = 2

    def __init__(self, notes: QWidget, tabs: QWidget, least_strip: Callable[[], int]) -> None:
        super().__init__()
        self.setObjectName("resultsPane")
        self.notes, self.tabs = notes, tabs
        self.least_strip = least_strip  # the strip's height without its spare lines: what the window must fit
        notes.setParent(self)
        tabs.setParent(self)

    _least: QSize | None = None  # asked for often by the splitter: kept until a child's size rules change

    def minimumSizeHint(self) -> QSize:  # noqa: N802 - Qt's name
        if self._least is None:
            tabs = self.tabs.minimumSizeHint()
            self._least = QSize(
                max(self.notes.minimumSizeHint().width(), tabs.width()), self.least_strip() + self.GAP + tabs.height()
            )
        return QSize(self._least)

    def forget_hint(self) -> None:
        """The strip's or the tabs' size rules changed: work the least size out again."""
        self._least = None
        self.updateGeometry()

    def sizeHint(self) -> QSize:  # noqa: N802 - Qt's name
        return self.minimumSizeHint()

    def resizeEvent(self, event) -> None:  # noqa: N802 - Qt's name
        super().resizeEvent(event)
        self.place()

    def place(self) -> None:
        width = self.width()
        strip = max(self.notes.minimumHeight(), self.notes.sizeHint().height())
        self.notes.setGeometry(0, 0, width, strip)
        top = strip + self.GAP
        self.tabs.setGeometry(0, top, width, max(0, self.height() - top))

    def event(self, event) -> bool:
        if event.type() == QEvent.Type.LayoutRequest:  # a child's size rules changed: place again
            self._least = None
            self.place()
        return super().event(event)


# windows opened by another window (restored documents) are kept here so they outlive the call that made them
_OTHER_WINDOWS: list[MainWindow] = []


class MainWindow(QMainWindow):
    """The one window. ``settings`` and ``recovery_dir`` can be given so tests never touch real ones."""

    def __init__(
        self, settings: QSettings | None = None, recovery_dir: Path | None = None, autosave_ms: int = AUTOSAVE_MS
    ) -> None:
        configure_pyqtgraph()
        super().__init__()
        self.settings = settings if settings is not None else QSettings("Kernline", "Kernline")
        self.recovery_dir = Path(recovery_dir) if recovery_dir is not None else default_recovery_dir()
        self.recovery_slot: RecoverySlot | None = None
        self.spawned: list[MainWindow] = []  # windows this one opened (restored documents)
        self._autosave_ms = autosave_ms
        self.document = ProjectDocument(self)
        self.runner = SizingRunner(self)
        self.package_writer = PackageWriter(self)
        self._map_timer = QTimer(self)
        self._map_timer.setSingleShot(True)
        self._map_timer.setInterval(0)
        self._map_timer.timeout.connect(self._place_map)
        self.setObjectName("mainWindow")
        self.setStyleSheet(STYLE_SHEET)
        self.resize(1480, 940)
        self._build_views()
        self._build_actions()
        self._connect()
        # one write per pause: started by the first unsaved edit, it writes when it runs out
        self.autosave_timer = QTimer(self)
        self.autosave_timer.setSingleShot(True)
        self.autosave_timer.setInterval(autosave_ms)
        self.autosave_timer.timeout.connect(self.autosave_now)
        self.document.leave_wall_guard = self._may_leave_wall
        guard_wheel(self)
        self._rendered_index = -1
        self._on_document_replaced()
        self._update_title()

    # ---- construction --------------------------------------------------------------------------

    def _build_views(self) -> None:
        doc = self.document
        self.walls_view = WallsView(doc)
        self.wall_form = WallForm(doc)
        self.project_form = ProjectForm(doc)
        forms = QWidget()
        forms_layout = QVBoxLayout(forms)
        forms_layout.setContentsMargins(6, 6, 10, 6)
        forms_layout.addWidget(self.wall_form)
        forms_layout.addWidget(self.project_form)
        forms_layout.addStretch(1)
        self.forms_scroll = QScrollArea()
        self.forms_scroll.setWidget(forms)
        self.forms_scroll.setWidgetResizable(True)
        self.forms_scroll.setMinimumWidth(400)
        self.forms_scroll.setHorizontalScrollBarPolicy(Qt.ScrollBarPolicy.ScrollBarAlwaysOff)
        self.forms_scroll.setFocusPolicy(Qt.FocusPolicy.NoFocus)  # Tab goes to the inputs, which scroll into view

        self.drawings = DrawingsPanel(doc)
        self.verdict = VerdictView()
        self.cases_table = CasesTable()
        self.design_map = DesignMapView(doc)
        self._map_readout = self.design_map.readout.text()  # the map's hint, put back when another project opens
        self.schedule = ScheduleView(doc)
        # read-only tables: Tab leaves them (it would go round their cells for ever); arrows move inside
        for table in (self.cases_table, getattr(self.schedule, "table", None)):
            if isinstance(table, QAbstractItemView):
                table.setTabKeyNavigation(False)
        self.tabs = QTabWidget()
        self.tabs.setObjectName("resultTabs")
        # one stop for Tab, the tab bar: the tab widget itself takes no focus (as its bar's proxy it would send
        # Tab back to the bar from wherever the focus chain left it)
        self.tabs.setFocusProxy(None)
        self.tabs.setFocusPolicy(Qt.FocusPolicy.NoFocus)
        self.tabs.tabBar().setFocusPolicy(Qt.FocusPolicy.TabFocus)
        self.tabs.addTab(self.cases_table, "All cases")
        self.tabs.addTab(self.design_map, "Design map")
        self.tabs.addTab(self.schedule, "Schedule")
        self.assumptions_view = AssumptionsView(doc)
        self.tabs.addTab(self.assumptions_view, "Assumed values")
        self.warnings_view = WarningsView(doc)
        # the warnings take a slot of their own with its height reserved, so that warnings coming
        # and going never move the tabs; when there are none the slot says so
        self.no_warnings = FittedLabel()
        self.no_warnings.set_wordings(
            "Look again: nothing — no input looks like a common mistake.", "Look again: nothing to look at", "Look again: none"
        )
        self.no_warnings.setToolTip("No input looks like a common mistake (inputs legal but usually wrong are listed here).")
        self.no_warnings.setObjectName("hint")
        self.no_warnings.setContentsMargins(6, 0, 6, 0)
        self.warnings_slot = QWidget()
        self.warnings_slot.setObjectName("warningsSlot")
        slot_layout = QVBoxLayout(self.warnings_slot)
        slot_layout.setContentsMargins(0, 0, 0, 0)
        slot_layout.setSpacing(0)
        slot_layout.addWidget(self.warnings_view)
        slot_layout.addWidget(self.no_warnings)
        slot_layout.addStretch(1)
        self.warnings_slot.setFixedHeight(self._warnings_height())
        # verdict and warnings: one above the other in a narrow column, side by side in a wide one
        # (side by side they split the width 2 : 1 whatever they hold; their height is what they need, so
        # the tabs below never move when a tab's page changes)
        # the verdict's height is reserved (its rows and two spare lines of text); a longer verdict scrolls
        verdict_box = QScrollArea()
        verdict_box.setObjectName("verdictBox")
        verdict_box.setWidget(self.verdict)
        verdict_box.setWidgetResizable(True)
        verdict_box.setFrameShape(QFrame.Shape.NoFrame)
        verdict_box.setHorizontalScrollBarPolicy(Qt.ScrollBarPolicy.ScrollBarAlwaysOff)
        verdict_box.setSizePolicy(QSizePolicy.Policy.Ignored, QSizePolicy.Policy.Fixed)
        verdict_box.viewport().setAutoFillBackground(False)  # the window's paper shows through
        self.verdict_box = verdict_box
        self.warnings_slot.setSizePolicy(QSizePolicy.Policy.Ignored, QSizePolicy.Policy.Fixed)
        self.notes = QWidget()
        self.notes.setObjectName("verdictAndWarnings")
        self.notes.setSizePolicy(QSizePolicy.Policy.Preferred, QSizePolicy.Policy.Fixed)
        self.notes_row = QBoxLayout(QBoxLayout.Direction.LeftToRight, self.notes)
        self.notes_row.setContentsMargins(0, 0, 0, 0)
        self.notes_row.setSpacing(2)
        self.notes_row.addWidget(verdict_box, 2)
        self.notes_row.addWidget(self.warnings_slot, 1, Qt.AlignmentFlag.AlignTop)
        lower = ResultsPane(self.notes, self.tabs, self._least_notes_height)
        self.results_pane = lower
        right = QSplitter(Qt.Orientation.Vertical)
        right.setObjectName("resultsColumn")
        right.addWidget(self.drawings)
        right.addWidget(lower)
        # proportional growth: with the sizes in these proportions a resize keeps the share
        right.setStretchFactor(0, round(100 * DRAWINGS_SHARE))
        right.setStretchFactor(1, 100 - round(100 * DRAWINGS_SHARE))
        right.setChildrenCollapsible(False)
        self.right_splitter = right

        self.walls_view.setMinimumWidth(WALLS_WIDTH)
        # the walls list, and under it the warnings when the right column is too narrow to hold them beside
        # the verdict (the tabs then keep that height)
        left = QWidget()
        left.setObjectName("wallsColumn")
        self.left_layout = QVBoxLayout(left)
        self.left_layout.setContentsMargins(0, 0, 0, 0)
        self.left_layout.setSpacing(4)
        self.left_layout.addWidget(self.walls_view, 1)
        self.walls_column = left
        main = QSplitter(Qt.Orientation.Horizontal)
        main.setObjectName("mainColumns")
        main.addWidget(left)
        main.addWidget(self.forms_scroll)
        main.addWidget(right)
        main.setStretchFactor(0, 0)
        main.setStretchFactor(1, 0)
        main.setStretchFactor(2, 1)
        main.setChildrenCollapsible(False)
        self.main_splitter = main
        # the panes keep the share below until the user drags a handle; then they keep the user's
        self._user_split = {main: False, right: False}
        for splitter in (main, right):
            splitter.splitterMoved.connect(lambda _pos, _index, s=splitter: self._user_split.__setitem__(s, True))
            splitter.installEventFilter(self)

        self.caution = QLabel(CAUTION)
        self.caution.setObjectName("caution")
        self.caution.setWordWrap(True)
        self.welcome = WelcomePanel()
        self.stack = QStackedWidget()
        self.stack.addWidget(main)
        self.stack.addWidget(self.welcome)
        self.stack.setCurrentWidget(main)
        centre = QWidget()
        centre.setObjectName("centre")
        layout = QVBoxLayout(centre)
        layout.setContentsMargins(0, 0, 0, 0)
        layout.setSpacing(0)
        layout.addWidget(self.stack, 1)
        layout.addWidget(self.caution)
        self.setCentralWidget(centre)
        self.statusBar().setSizeGripEnabled(True)
        self.busy_label = QLabel()
        self.busy_bar = QProgressBar()
        self.busy_bar.setRange(0, 0)  # no steps to count: a moving bar says "working"
        self.busy_bar.setMaximumWidth(140)
        self.busy_bar.setMaximumHeight(14)
        self.busy_bar.setTextVisible(False)
        for w in (self.busy_label, self.busy_bar):
            self.statusBar().addPermanentWidget(w)
            w.hide()

    def _action(self, text: str, slot: Any, shortcut: QKeySequence | str | None = None, tip: str = "") -> QAction:
        action = QAction(text, self)
        if shortcut is not None:
            action.setShortcut(QKeySequence(shortcut))
        if tip:
            action.setStatusTip(tip)
            action.setToolTip(tip)
        action.triggered.connect(slot)
        return action

    def _option(self, text: str, key: str, tip: str) -> QAction:
        """A checkable package option, stored in the settings under ``key`` (off by default)."""
        action = QAction(text, self)
        action.setCheckable(True)
        action.setChecked(str(self.settings.value(key, "false")).lower() == "true")
        action.setStatusTip(tip)
        action.setToolTip(tip)
        action.toggled.connect(lambda on, k=key: self.settings.setValue(k, "true" if on else "false"))
        return action

    def package_options(self) -> dict[str, bool]:
        """The options File › Package options holds, as :func:`engine.report.write_report` takes them."""
        return {
            "seal_every_sheet": self.seal_every_sheet_action.isChecked(),
            "verification": self.verification_action.isChecked(),
        }

    def _build_actions(self) -> None:
        # the keys are spelt out (not the platform's standard keys, which differ between desktops) so that
        # the guide's table of shortcuts holds everywhere; on macOS Qt reads Ctrl as Command
        self.new_action = self._action("&New", self.new_project, "Ctrl+N", "Start a new project")
        self.open_action = self._action("&Open…", self.open_dialog, "Ctrl+O", "Open a Kernline project file")
        self.demo_action = self._action("Open the &demo project", self.open_demo, None, "Open the built-in demo project")
        self.save_action = self._action("&Save", self.save, "Ctrl+S", "Save the project")
        self.save_as_action = self._action("Save &As…", self.save_as, "Ctrl+Shift+S", "Save the project under a new name")
        self.export_action = self._action(
            "Export &schedule (CSV)…", self.export_schedule, None, "Write the footing schedule as CSV"
        )
        # the package's options, kept between sessions; both off unless chosen
        self.seal_every_sheet_action = self._option(
            "Seal box on every sheet",
            PACKAGE_SEAL_KEY,
            "Print a small seal box in every sheet's title strip (the cover always has the seal square)",
        )
        self.verification_action = self._option(
            "Verification appendix",
            PACKAGE_VERIFICATION_KEY,
            "Run the program's benchmark cases when the package is written and print their published values "
            "beside this version's (docs/verification.md)",
        )
        self.export_pdf_action = self._action(
            "&Export calculation package (PDF)…",
            self.export_package,
            "Ctrl+E",
            "Write the calculation package (design basis, every wall's checks, appendix) as a PDF",
        )
        self.project_info_action = self._action(
            "Project &information…",
            self.show_project_information,
            "Ctrl+I",
            "Edit the project's name, number, client, address, engineer, checker, revision and notes (the title block)",
        )
        self.quit_action = self._action("&Quit", self.close, "Ctrl+Q", "Close Kernline")
        self.undo_action = self.document.undo_stack.createUndoAction(self, "&Undo")
        self.undo_action.setShortcut(QKeySequence("Ctrl+Z"))
        self.redo_action = self.document.undo_stack.createRedoAction(self, "&Redo")
        self.redo_action.setShortcuts([QKeySequence("Ctrl+Shift+Z"), QKeySequence("Ctrl+Y")])
        self.size_action = self._action(
            "Size this &footing", self.size_current, "Ctrl+M", "Find the smallest passing footing of the selected wall"
        )
        self.size_all_action = self._action(
            "Size &all walls", self.size_all, "Ctrl+Shift+M", "Find the smallest passing footing of every wall"
        )
        self.add_wall_action = self._action("&Add wall", self.walls_view.add, "Ctrl+Shift+N", "Add a wall")
        self.duplicate_action = self._action(
            "&Duplicate wall", self.walls_view.duplicate, "Ctrl+D", "Duplicate the selected wall"
        )
        self.rename_action = self._action("&Rename wall", self.walls_view.start_rename, "F2", "Rename the selected wall")
        self.delete_wall_action = self._action("D&elete wall", self.walls_view.delete, None, "Delete the selected wall")
        self.guide_action = self._action(
            "&User guide", self.show_help, "F1", "The user guide, at the section about the input or pane you are in"
        )
        self.shortcuts_action = self._action(
            "&Keyboard shortcuts", lambda: self.open_guide("keyboard-shortcuts"), None, "Every key of the window"
        )
        self.about_action = self._action(
            "&About Kernline", self.about, None, "What Kernline is, and the caution that goes with it"
        )

        self.units_group = QActionGroup(self)
        self.units_group.setExclusive(True)
        self.us_action = QAction("US", self, checkable=True)
        self.us_action.setToolTip("Show feet, inches, kips, psf")
        self.si_action = QAction("SI", self, checkable=True)
        self.si_action.setToolTip("Show metres, millimetres, kN, kPa")
        for a in (self.us_action, self.si_action):
            self.units_group.addAction(a)
        self.us_action.triggered.connect(lambda: self.set_units("US"))
        self.si_action.triggered.connect(lambda: self.set_units("SI"))

        bar = self.menuBar()
        file_menu = bar.addMenu("&File")
        for a in (self.new_action, self.open_action, self.demo_action):
            file_menu.addAction(a)
        # made here, owned by the window: the menu addMenu(title) returns lost its Python wrapper once
        # the window was activated on an X server (shiboken's ownership of returned menus)
        self.recent_menu = QMenu("Open &Recent", self)
        file_menu.addMenu(self.recent_menu)
        file_menu.addSeparator()
        for a in (self.save_action, self.save_as_action):
            file_menu.addAction(a)
        file_menu.addSeparator()
        file_menu.addAction(self.project_info_action)
        file_menu.addSeparator()
        for a in (self.export_pdf_action, self.export_action):
            file_menu.addAction(a)
        self.package_menu = QMenu("&Package options", self)
        for a in (self.seal_every_sheet_action, self.verification_action):
            self.package_menu.addAction(a)
        file_menu.addMenu(self.package_menu)
        file_menu.addSeparator()
        file_menu.addAction(self.quit_action)
        edit_menu = bar.addMenu("&Edit")
        edit_menu.addAction(self.undo_action)
        edit_menu.addAction(self.redo_action)
        wall_menu = bar.addMenu("&Wall")
        for a in (self.add_wall_action, self.duplicate_action, self.rename_action, self.delete_wall_action):
            wall_menu.addAction(a)
        wall_menu.addSeparator()
        wall_menu.addAction(self.size_action)
        wall_menu.addAction(self.size_all_action)
        view_menu = bar.addMenu("&Units")
        view_menu.addAction(self.us_action)
        view_menu.addAction(self.si_action)
        help_menu = bar.addMenu("&Help")
        help_menu.addAction(self.guide_action)
        help_menu.addAction(self.shortcuts_action)
        help_menu.addSeparator()
        help_menu.addAction(self.about_action)

        # the toolbar shares the menu bar's row (at its right), so the panes get that height
        tools = self.toolbar = QToolBar("Main")
        tools.setObjectName("mainToolbar")
        tools.setMovable(False)
        bar.setCornerWidget(tools, Qt.Corner.TopRightCorner)
        tools.setToolButtonStyle(Qt.ToolButtonStyle.ToolButtonTextOnly)
        for a in (self.new_action, self.open_action, self.save_action):
            tools.addAction(a)
        tools.addSeparator()
        # the toolbar's buttons keep short fixed words (the menu items name the edit they undo)
        stack = self.document.undo_stack
        self.undo_button = QAction("Undo", self)
        self.undo_button.setToolTip("Undo the last edit (Ctrl+Z)")
        self.undo_button.triggered.connect(stack.undo)
        self.undo_button.setEnabled(stack.canUndo())
        stack.canUndoChanged.connect(self.undo_button.setEnabled)
        self.redo_button = QAction("Redo", self)
        self.redo_button.setToolTip("Redo the edit undone last (Ctrl+Shift+Z)")
        self.redo_button.triggered.connect(stack.redo)
        self.redo_button.setEnabled(stack.canRedo())
        stack.canRedoChanged.connect(self.redo_button.setEnabled)
        tools.addAction(self.undo_button)
        tools.addAction(self.redo_button)
        tools.addSeparator()
        tools.addAction(self.size_action)
        tools.addAction(self.size_all_action)
        tools.addSeparator()
        tools.addWidget(QLabel(" Units "))
        tools.addAction(self.us_action)
        tools.addAction(self.si_action)
        self._rebuild_recent_menu()

    def _connect(self) -> None:
        doc = self.document
        doc.project_changed.connect(self._on_project_changed)
        doc.results_changed.connect(self._on_results_changed)
        doc.current_wall_changed.connect(self._on_current_wall_changed)
        doc.case_choice_changed.connect(self._on_case_choice_changed)
        doc.document_replaced.connect(self._on_document_replaced)
        doc.dirty_changed.connect(self._on_dirty_changed)
        doc.path_changed.connect(self._update_title)
        doc.edit_refused.connect(self._on_edit_refused)
        doc.basis_changed.connect(self._on_basis_changed)
        doc.undo_stack.indexChanged.connect(self._schedule_autosave)
        doc.path_changed.connect(self._sync_recovery_slot)
        doc.sizing_changed.connect(self._on_sizing_changed)
        self.runner.finished.connect(self._on_sizing_finished)
        self.cases_table.case_activated.connect(self._on_case_activated)
        self.tabs.currentChanged.connect(self._on_tab_changed)
        self.design_map.size_requested.connect(self.size_current)
        self.design_map.size_all_requested.connect(self.size_all)
        # "Adopt all chosen sizes" changes the failing walls only; passing walls only after asking
        adopt_all = self.design_map.adopt_all_button
        with warnings.catch_warnings(), contextlib.suppress(RuntimeError, TypeError):
            warnings.simplefilter("ignore", RuntimeWarning)  # nothing connected: nothing to take off
            adopt_all.clicked.disconnect()
        adopt_all.clicked.connect(self.adopt_all_sizes)
        adopt_all.setToolTip(
            "Make each failing wall's chosen size its footing, in one undoable step; walls that pass keep theirs. "
            "Pressed when no wall fails, it offers to bring the passing walls to their smallest passing sizes, "
            "listing every change and asking first."
        )
        self.warnings_view.field_requested.connect(self.show_field)
        self.assumptions_view.field_requested.connect(self.show_field)
        self.schedule.export_requested.connect(self.export_schedule)
        self.package_writer.finished.connect(self._on_package_written)
        self.welcome.demo_requested.connect(self.open_demo)
        self.welcome.new_requested.connect(self.new_project)
        self.welcome.open_requested.connect(self.open_dialog)
        self.welcome.recent_requested.connect(self._open_recent)

    def frame_panes(self) -> list[tuple[str, QWidget]]:
        """The panes in the order Tab visits them: walls, inputs, drawings, verdict, tabs, and the warnings
        after the verdict when they sit beside it, after the walls list when they sit under it."""
        panes: list[tuple[str, QWidget]] = [
            ("walls", self.walls_view),
            ("inputs", self.forms_scroll),
            ("drawings", self.drawings),
            ("verdict", self.verdict_box),
            ("tabs", self.tabs),
        ]
        # the warnings where they are shown: after the verdict beside it, or after the walls list under it
        panes.insert(4 if self.warnings_beside_verdict else 1, ("warnings", self.warnings_slot))
        return panes

    def _focus_ring(self) -> list[QWidget]:
        """Every widget of this window that Tab can reach, in the focus chain's present order."""
        ring: list[QWidget] = []
        start = self
        w = start.nextInFocusChain()
        while w is not start and w is not None and len(ring) < 10_000:
            if (
                w.window() is self
                and (w.focusPolicy() & Qt.FocusPolicy.TabFocus) == Qt.FocusPolicy.TabFocus
                and w.focusProxy() is None
            ):
                ring.append(w)
            w = w.nextInFocusChain()
        return ring

    def tab_chain(self) -> list[QWidget]:
        """The order Tab follows, pane by pane (see :meth:`frame_panes`).

        Inside the inputs the forms' own order holds (their ``focus_order``), with each table's buttons
        right after the table; inside every other pane, the order its widgets already have.
        """
        ring = self._focus_ring()
        panes = self.frame_panes()
        chain: list[QWidget] = []
        for name, pane in panes:
            mine = [w for w in ring if w is pane or pane.isAncestorOf(w)]
            if name == "walls":
                tree = self.walls_view.tree
                mine = [tree] + [w for w in mine if w is not tree]
            elif name == "inputs":
                ordered: list[QWidget] = []
                for w in (*self.wall_form.focus_order(), *self.project_form.focus_order()):
                    ordered.append(w)
                    editor = w.parentWidget()
                    if isinstance(w, QAbstractItemView) and editor is not None:
                        ordered += [
                            b for b in mine if isinstance(b, QAbstractButton) and editor.isAncestorOf(b) and b not in ordered
                        ]
                mine = ordered + [w for w in mine if w not in ordered]
            chain += [w for w in mine if w not in chain]
        return chain

    def _set_tab_order(self) -> None:
        chain = self.tab_chain()
        for a, b in zip(chain, chain[1:], strict=False):
            QWidget.setTabOrder(a, b)

    # ---- rendering from document signals -------------------------------------------------------

    def _on_document_replaced(self) -> None:
        self._rendered_index = -1
        self._forget_adoptions()
        self._sync_recovery_slot()
        self.show_editor()
        self.wall_form.refresh(force=True)
        self.project_form.refresh(force=True)
        self._notice = None
        self._set_tab_order()
        self._render_results()
        self._update_units_actions()
        self._update_title()

    def _on_project_changed(self) -> None:
        if self._notice is not None and self.statusBar().currentMessage() == self._notice:
            self.statusBar().clearMessage()  # a later edit went through: the refusal no longer describes the state
        self._notice = None
        self.wall_form.refresh()
        self.project_form.refresh()
        self._update_units_actions()
        self._update_title()

    def _on_results_changed(self) -> None:
        self._render_results()

    def _may_leave_wall(self, index: int) -> bool:
        """Before another wall is shown: an entry of this wall that is not valid is dropped only when the user says so."""
        self.flush_typing()
        group = self.wall_form.group
        pending = [f for f in group.fields if f.invalid]
        if not pending:
            return True
        doc = self.document
        entries = "; ".join(f'"{f.edit.text().strip()}" in {f.spec.label}' for f in pending)
        target = doc.project.walls[index].id if 0 <= index < len(doc.project.walls) else "another wall"
        answer = QMessageBox.question(
            self,
            "Entry not valid",
            f"Wall {doc.current_wall.id} holds an entry that is not valid: {entries}.\n\n"
            f"Discard it and show wall {target}, or stay to correct it?",
            QMessageBox.StandardButton.Discard | QMessageBox.StandardButton.Cancel,
            QMessageBox.StandardButton.Cancel,
        )
        if answer == QMessageBox.StandardButton.Discard:
            return True
        pending[0].edit.setFocus()
        return False

    def _on_current_wall_changed(self, index: int) -> None:
        if index == self._rendered_index:
            return
        self._forget_adoptions(status=False)
        dropped = self.wall_form.refresh(force=True)
        if dropped:
            self._show_notice("Discarded " + "; ".join(dropped) + " — not a valid entry, so the last valid value stays in force.")
        self._render_results()

    def _on_case_choice_changed(self) -> None:
        self.drawings.render()

    def _render_results(self) -> None:
        """Redraw everything that shows results of the current wall."""
        doc = self.document
        self._rendered_index = doc.current_index
        self.walls_view.refresh()
        self.drawings.render()
        result = doc.current_result
        if result is None:
            self.verdict.render_unchecked(doc.current_wall, doc.missing_text())
        else:
            self.verdict.render(doc.current_wall, result, doc.units)
        self.warnings_view.refresh()
        self._fit_verdict()
        self._fit_warnings_slot()
        self.assumptions_view.refresh()
        count = self.assumptions_view.count
        self.tabs.setTabText(self.tabs.indexOf(self.assumptions_view), f"Assumed values ({count})" if count else "Assumed values")
        current = self.tabs.currentWidget()
        if current is self.cases_table:
            self.cases_table.set_result(result, doc.units)
        elif current is self.schedule:
            self.schedule.refresh()
        elif current is self.design_map:
            self._render_map(auto_size=True)

    def _render_map(self, auto_size: bool) -> None:
        doc = self.document
        wall = doc.current_wall
        entry, fresh = doc.sizing_for(wall)
        if auto_size and not fresh and doc.checkable:
            self._request_wall_sizing()
        self.design_map.busy = self.runner.busy(f"wall:{wall.id}") or self.runner.busy("all")
        self.design_map.render()

    def _place_map(self) -> None:
        """In a short window (the design map's tab page lower than :data:`MAP_LEAST_HEIGHT`) the map, while
        its tab is shown, takes the drawings' place, which has the height; its buttons, readout and legend
        stay in the tab. No pane moves: only what the drawings pane shows changes."""
        dm = self.design_map
        lend = self.tabs.currentWidget() is dm and 0 < dm.height() < MAP_LEAST_HEIGHT
        if lend == dm.plot_lent:
            return
        dm.lend_plot(self.drawings.map_layout if lend else None)
        self.drawings.show_map(lend)
        self._set_tab_order()

    def _on_tab_changed(self, _index: int) -> None:
        """Render the tab that came into view; no pane moves (the tabs always have their share)."""
        doc = self.document
        self._place_map()
        current = self.tabs.currentWidget()
        if current is self.cases_table:
            self.cases_table.set_result(doc.current_result, doc.units)
        elif current is self.schedule:
            self.schedule.refresh()
        elif current is self.design_map:
            self._render_map(auto_size=True)

    # ---- layout --------------------------------------------------------------------------------

    def _warnings_height(self) -> int:
        """The warnings slot's reserved height: the warnings view with :attr:`WarningsView.VISIBLE_ROWS` rows.

        A row's height is measured on a list of the same kind holding a warning's glyph, so the slot is
        right before the first warning appears.
        """
        view = self.warnings_view
        rows = getattr(view, "VISIBLE_ROWS", 3)
        probe = QListWidget()
        probe.setObjectName(view.list.objectName())
        probe.setFont(view.list.font())
        probe.addItem("⚠ Wg")
        row = probe.sizeHintForRow(0)
        frame = probe.frameWidth()
        probe.deleteLater()
        layout = view.layout()
        margins = layout.contentsMargins() if layout is not None else None
        outer = (margins.top() + margins.bottom() + layout.spacing()) if margins is not None else 0
        # as WarningsView.refresh sizes its list: rows, the frame and 2 px; then its title and margins
        return view.title.sizeHint().height() + outer + rows * row + 2 * frame + 2

    def _fit_verdict(self, resized: bool = False) -> None:
        """Reserve the verdict's height: its rows, with room for the headline and the hint to wrap.

        The reserve depends only on the checks shown, the font and the window's size, never on a wall's
        words, so a wall that fails, with its longer headline and hint, does not move the tabs below; a
        verdict longer still scrolls in its slot. It is worked out again only when the window is resized
        or the verdict's rows change.
        """
        verdict = self.verdict
        base = verdict.minimumHeight() or verdict.minimumSizeHint().height()  # its rows, a line each of headline and hint
        if not resized and base == self._verdict_base:
            return
        self._verdict_base = base
        line = verdict.fontMetrics().lineSpacing()
        spare = VERDICT_SPARE_LINES * line
        right = self.right_splitter
        column = right.height() - right.handleWidth()
        if column > 0:
            # the spare lines only from height nothing else needs: the drawings' least height (with its
            # captions' room), the tabs' least height, and the warnings' slot when it sits under the verdict
            others = self._drawings_least() + ResultsPane.GAP + self.tabs.minimumSizeHint().height()
            spare = max(0, min(spare, column - others - base))
        height = base + spare
        if self.verdict_box.minimumHeight() != height or self.verdict_box.maximumHeight() != height:
            self.verdict_box.setFixedHeight(height)
        self._fit_notes()

    _verdict_base = -1

    def _drawings_least(self) -> int:
        """The drawings' least height with room for a caption to wrap to another line without moving the panes."""
        return self.drawings.minimumSizeHint().height() + DRAWINGS_CAPTIONS * self.drawings.fontMetrics().lineSpacing()

    def _least_notes_height(self) -> int:
        """The verdict-and-warnings strip without the verdict's spare lines (the least the window must give it)."""
        base = self.verdict.minimumHeight() or self.verdict.minimumSizeHint().height()
        return max(base, self.warnings_slot.height()) if self.warnings_beside_verdict else base

    def _fit_notes(self) -> None:
        """Pin the verdict-and-warnings strip at the height its reserved slots take, so the tabs under it never
        lend it height or borrow from it."""
        layout = self.notes_row
        layout.invalidate()
        height = layout.sizeHint().height()
        if self.notes.minimumHeight() != height or self.notes.maximumHeight() != height:
            self.notes.setFixedHeight(height)
            self.results_pane.place()
        self.results_pane.forget_hint()

    def _fit_warnings_slot(self) -> None:
        """Show the "nothing" line when there are no warnings; grow the slot only if the list ever outgrows it."""
        shown = not self.warnings_view.isHidden()
        self.no_warnings.setVisible(not shown)
        need = self.warnings_view.sizeHint().height() if shown else 0
        if need > self.warnings_slot.height() and need > self.warnings_slot.minimumHeight():
            self.warnings_slot.setFixedHeight(need)
            self._fit_notes()

    def eventFilter(self, watched, event) -> bool:  # noqa: N802 - Qt's name
        if event.type() == QEvent.Type.Resize:
            if watched is self.main_splitter:
                self._share_columns()
            elif watched is self.right_splitter:
                self._share_results()
        return super().eventFilter(watched, event)

    @property
    def warnings_beside_verdict(self) -> bool:
        return self.notes_row.indexOf(self.warnings_slot) >= 0

    def _place_warnings(self, wide: bool) -> None:
        """Warnings beside the verdict in a wide right column; under the walls list otherwise."""
        if wide == self.warnings_beside_verdict:
            return
        slot = self.warnings_slot
        if wide:
            self.left_layout.removeWidget(slot)
            self.notes_row.addWidget(slot, 1, Qt.AlignmentFlag.AlignTop)
        else:
            self.notes_row.removeWidget(slot)
            self.left_layout.addWidget(slot)
        slot.show()
        self._verdict_base = -1  # the strip's height changes: work the verdict's reserve out again
        self._fit_verdict()
        self._set_tab_order()

    def _share_columns(self) -> None:
        """Walls list and inputs keep their widths; every further pixel of width goes to the drawings and tables."""
        main = self.main_splitter
        width = main.width() - 2 * main.handleWidth()
        if self._user_split[main] or width <= 0:
            return
        forms = max(FORMS_WIDTH[0], min(FORMS_WIDTH[1], round(FORMS_SHARE * width)))
        main.setSizes([WALLS_WIDTH, forms, width - WALLS_WIDTH - forms])

    def _share_results(self) -> None:
        """Drawings above, verdict and tabs below, in fixed shares of the column's height; verdict and warnings
        side by side once the column is wide enough."""
        right = self.right_splitter
        self._map_timer.start()  # the map's place, once the tabs have their new height
        self._place_warnings(right.width() >= WIDE_COLUMN)
        self._fit_verdict(resized=True)
        height = right.height() - right.handleWidth()
        if self._user_split[right] or height <= 0:
            return
        # at least the drawings' least height with room for a caption's second line, so that a caption
        # wrapping never pushes the handle down
        top = max(round(DRAWINGS_SHARE * height), self._drawings_least())
        # the verdict's spare lines were given from height the drawings' least height leaves: keep them
        strip = self.notes.minimumHeight() or self.results_pane.least_strip()
        top = min(top, height - (strip + ResultsPane.GAP + self.tabs.minimumSizeHint().height()))
        right.setSizes([top, height - top])

    def show_project_information(self) -> bool:
        """Open the project information (title block), bring it into view and put the cursor in its first field."""
        form = self.project_form
        shown = form.show_field("project.name", self.forms_scroll)
        fields = [f for f in form.group.fields if f.spec.path[0] == "project"]
        if shown and fields:
            self.forms_scroll.ensureWidgetVisible(fields[-1])  # the whole group, from its title down
            self.forms_scroll.ensureWidgetVisible(form.sections["Project"].toggle)
        return shown

    def show_field(self, field: str) -> bool:
        """Go to an input named by the engine's field path: select its wall, open its section, focus it.

        "walls[2].footing.unit_weight" focuses that field of wall 3; "walls[3].loads[4]" selects row 5 of
        the loads table; "soil.cohesion" focuses the project's field; "walls[1].footing" opens the
        footing section. Returns False when the wall cannot be shown (an entry in error kept it) or the
        field is not one the window shows.
        """
        doc = self.document
        wall_index, rest = split_field(field)
        if wall_index is not None:
            if not 0 <= wall_index < len(doc.project.walls) or not doc.set_current_index(wall_index):
                return False
            return self.wall_form.show_field(rest, self.forms_scroll)
        return self.project_form.show_field(field, self.forms_scroll)

    def _on_case_activated(self, index: int) -> None:
        result = self.document.current_result
        if result is None:
            return
        case = result.table.cases[index]
        self.document.set_case_choice(("case", case.combination.name, case.direction.value))

    def _schedule_autosave(self, _index: int = 0) -> None:
        """An edit, undo or redo: unsaved work reaches the recovery record when the autosave timer runs out."""
        if self.document.dirty and not self.autosave_timer.isActive():
            self.autosave_timer.start()

    def _on_dirty_changed(self, dirty: bool) -> None:
        self._update_title()
        if not dirty:  # saved, or undone back to the saved state: nothing to recover
            self.autosave_timer.stop()
            self.remove_recovery()

    _notice: str | None = None

    def _show_notice(self, text: str) -> None:
        """A status message about an edit that did not reach the model; cleared by the next edit that does."""
        self._notice = text
        self.statusBar().showMessage(text)

    def _on_edit_refused(self, field: str, message: str) -> None:
        self._show_notice(f"Not applied — {message}")

    def _on_basis_changed(self, text: str) -> None:
        """A project-wide design value changed: say which, from what to what, and how to take it back."""
        self.statusBar().showMessage(f"{text} — Ctrl+Z undoes", 12000)

    def _update_title(self) -> None:
        self.setWindowTitle(f"{self.document.display_name}[*] — Kernline")
        self.setWindowModified(self.document.dirty)

    def _update_units_actions(self) -> None:
        si = self.document.units == "SI"
        self.si_action.setChecked(si)
        self.us_action.setChecked(not si)

    # ---- edits from the window -----------------------------------------------------------------

    def set_units(self, units: str) -> None:
        doc = self.document
        if units != doc.units:
            doc.push(commands.set_units(doc, units))
        self._update_units_actions()

    # ---- sizing --------------------------------------------------------------------------------

    def _request_wall_sizing(self) -> int:
        doc = self.document
        wall = doc.current_wall
        self.design_map.busy = True
        return self.runner.request(f"wall:{wall.id}", doc.project, [wall])

    def _refuse_unchecked(self, what: str) -> bool:
        """While site values are missing nothing can be checked: say so (True) instead of doing ``what``."""
        doc = self.document
        if doc.checkable:
            return False
        self.statusBar().showMessage(f"Cannot {what} yet: enter {doc.missing_text()} first.", 10000)
        return True

    def size_current(self) -> int:
        """Size the selected wall and show the design map (-1 when it cannot be sized yet)."""
        self.flush_typing()
        self.tabs.setCurrentWidget(self.design_map)
        if self._refuse_unchecked("size the footing"):
            return -1
        seq = self._request_wall_sizing()
        self.design_map.busy = self.runner.busy(f"wall:{self.document.current_wall.id}")
        self.design_map.render()
        return seq

    def size_all(self) -> int:
        """Size every wall (on a worker when it is more than a frame's work); -1 when they cannot be sized yet."""
        self.flush_typing()
        doc = self.document
        if self._refuse_unchecked("size the walls"):
            self.tabs.setCurrentWidget(self.design_map)
            return -1
        self.statusBar().showMessage(f"Sizing {len(doc.project.walls)} walls…")
        self.tabs.setCurrentWidget(self.design_map)
        return self.runner.request("all", doc.project, doc.project.walls)

    # ---- adopting sizes ------------------------------------------------------------------------

    def _forget_adoptions(self, status: bool = True) -> None:
        """Words about adopting a size belong to the project (and wall) they were said of: clear them."""
        readout = self.design_map.readout
        readout.setText(self._map_readout)
        readout.setStyleSheet("")
        if status and self._adopt_message is not None and self.statusBar().currentMessage() == self._adopt_message:
            self.statusBar().clearMessage()
        if status:
            self._adopt_message = None

    _adopt_message: str | None = None

    def _say_adopted(self, text: str) -> None:
        self._adopt_message = text
        self.statusBar().showMessage(text, 15000)

    def _wall_passes(self, wall_id: str) -> bool:
        return self.design_map.wall_passes(wall_id)

    def size_change_text(self, wall_id: str, values: Mapping[str, float]) -> str:
        """ "C3: B 1'-4" × t_f 1'-0" → B 2'-0" × t_f 1'-2"" (and L_f when the extensions change)."""
        doc = self.document
        wall = next(w for w in doc.project.walls if w.id == wall_id)
        ft = wall.footing
        units = doc.units

        def size(width: float, thickness: float) -> str:
            return f"B {format_length(width, units)} × t_f {format_length(thickness, units)}"

        before = size(ft.width, ft.thickness)
        after = size(values.get("width", ft.width), values.get("thickness", ft.thickness))
        if "extension_start" in values or "extension_end" in values:
            now = ft.extension_start + wall.length + ft.extension_end
            then = values.get("extension_start", ft.extension_start) + wall.length + values.get("extension_end", ft.extension_end)
            before += f" × L_f {format_length(now, units)}"
            after += f" × L_f {format_length(then, units)}"
        return f"{wall_id}: {before} → {after}"

    def adopt_all_sizes(self) -> str:
        """The design map's "Adopt all chosen sizes": the failing walls take their chosen sizes, in one undo step.

        Walls that pass keep their footings. When no failing wall is left to change but passing walls
        could be brought to their smallest passing sizes, the window lists every change (wall, from → to)
        and asks first; a yes is one undo step. Returns what happened: "failing", "passing", "declined"
        or "nothing".
        """
        self.flush_typing()
        doc = self.document
        sizes = self.design_map.adoptable_sizes()
        if not sizes:
            self.statusBar().showMessage("Nothing to adopt: every sized wall already has its chosen size.", 8000)
            return "nothing"
        failing = self.design_map.failing_sizes()
        if failing:
            changes = [self.size_change_text(wid, v) for wid, v in failing.items()]
            count = len(failing)
            refused = self.design_map.adopt_all()
            if refused:
                self.statusBar().showMessage(f"Not adopted: {refused}", 12000)
                return "nothing"
            kept = len(sizes) - count
            text = "Adopted " + "; ".join(changes) + " (Ctrl+Z undoes)."
            if kept:
                text += f" {kept} passing wall{'s' if kept > 1 else ''} kept {'their footings' if kept > 1 else 'its footing'}."
            self._say_adopted(text)
            return "failing"
        changes = [self.size_change_text(wid, v) for wid, v in sizes.items()]
        count = len(sizes)
        walls = f"{count} wall{'s' if count > 1 else ''}"
        answer = QMessageBox.question(
            self,
            "Change walls that already pass?",
            f"Every wall passes as it stands. Bring {walls} to {'their' if count > 1 else 'its'} smallest passing "
            f"size{'s' if count > 1 else ''}?\n\n"
            + "\n".join(changes)
            + "\n\nA smaller footing passes with less margin; check the contact length and the assumptions. "
            "One Ctrl+Z undoes every change.",
            QMessageBox.StandardButton.Yes | QMessageBox.StandardButton.No,
            QMessageBox.StandardButton.No,
        )
        if answer != QMessageBox.StandardButton.Yes:
            self.statusBar().showMessage("No footing changed.", 5000)
            return "declined"
        refused = doc.push(commands.adopt_sizes(doc, sizes, f"Bring {walls} that pass to their smallest passing sizes"))
        # (the design map's adopt_all(include_passing=True) does the same; the undo text here says they passed)
        if refused:
            self.statusBar().showMessage(f"Not adopted: {refused}", 12000)
            return "nothing"
        self._say_adopted("Adopted " + "; ".join(changes) + " (Ctrl+Z undoes).")
        return "passing"

    def _on_sizing_finished(self, batch: SizingBatch) -> None:
        doc = self.document
        project_walls = {w.id: w for w in doc.project.walls}
        # results for walls whose inputs changed meanwhile are kept but shown as stale
        entries = [e for e in batch.entries if e.wall.id in project_walls]
        self.design_map.busy = False
        doc.set_sizing(entries)
        if batch.key == "all":
            units = doc.units
            parts = []
            for e in entries:
                s = e.result
                parts.append(
                    f"{e.wall.id} {format_length(s.width, units)} × {format_length(s.thickness, units)}"
                    if s.feasible
                    else f"{e.wall.id} no size passes"
                )
            parts += [f"{wid}: {msg}" for wid, msg in batch.errors.items()]
            self.statusBar().showMessage(
                f"Sized {len(entries)} walls in {batch.seconds * 1000:.0f} ms: " + "; ".join(parts), 15000
            )
        elif batch.errors:
            self.statusBar().showMessage("; ".join(batch.errors.values()), 15000)
        if self.tabs.currentWidget() is self.design_map:
            self.design_map.render()

    def _on_sizing_changed(self, wall_id: str) -> None:
        if wall_id == self.document.current_wall.id and self.tabs.currentWidget() is self.design_map:
            self.design_map.render()

    # ---- files ---------------------------------------------------------------------------------

    def start(self, path: str | None = None, demo: bool = False, recover: bool = True) -> None:
        """What the window opens with: restored work, the file, the demo, or else the welcome panel.

        Work restored after a crash comes first (into this window; further documents into windows of
        their own); a file asked for as well then opens in a window of its own, unless it was among
        the restored. ``recover=False`` skips the offer (the smoke check must not wait on a question).
        """
        restored = self.offer_recovery() if recover else []
        if restored:
            if path and not any(p is not None and p == absolute(path) for p in restored):
                self.open_in_new_window(path)
            return
        if path:
            if self.open_path(path, confirm=False):
                return
        if demo:
            self.open_demo(confirm=False)
            return
        self.show_welcome()

    # ---- welcome panel -------------------------------------------------------------------------

    @property
    def welcome_shown(self) -> bool:
        return self.stack.currentWidget() is self.welcome

    def show_welcome(self) -> None:
        """Put the welcome panel in place of the editor (until a project is opened or started)."""
        self.welcome.set_recent(self.recent_files())
        self.stack.setCurrentWidget(self.welcome)
        self.toolbar.hide()  # its buttons act on a project; the panel offers what there is to do
        self._enable_project_actions(False)
        self.welcome.demo_button.setFocus()

    def show_editor(self) -> None:
        if self.stack.currentWidget() is not self.main_splitter:
            self.stack.setCurrentWidget(self.main_splitter)
            self.toolbar.show()
        self._enable_project_actions(True)

    def _enable_project_actions(self, enabled: bool) -> None:
        """Actions that act on an open project are off while the welcome panel stands in for it."""
        for a in (
            self.save_action,
            self.save_as_action,
            self.export_action,
            self.export_pdf_action,
            self.size_action,
            self.size_all_action,
            self.add_wall_action,
            self.duplicate_action,
            self.rename_action,
            self.delete_wall_action,
            self.us_action,
            self.si_action,
            self.project_info_action,
        ):
            a.setEnabled(enabled)
        if enabled and self.package_writer.busy:
            self.export_pdf_action.setEnabled(False)

    def confirm_discard(self) -> bool:
        """Ask before unsaved changes would be lost: True when it is fine to go on."""
        if not self.document.dirty:
            return True
        answer = QMessageBox.question(
            self,
            "Unsaved changes",
            f"Save the changes to {self.document.display_name} first?",
            QMessageBox.StandardButton.Save | QMessageBox.StandardButton.Discard | QMessageBox.StandardButton.Cancel,
            QMessageBox.StandardButton.Save,
        )
        if answer == QMessageBox.StandardButton.Save:
            return self.save()
        return answer == QMessageBox.StandardButton.Discard

    def new_project(self) -> None:
        if self.confirm_discard():
            self.document.new(self.document.units)
            self.remove_recovery()

    def open_demo(self, confirm: bool = True) -> None:
        if confirm and not self.confirm_discard():
            return
        self.document.open_demo()
        self.remove_recovery()

    def open_dialog(self) -> None:
        if not self.confirm_discard():
            return
        start = str(self.document.path.parent) if self.document.path else ""
        path, _ = QFileDialog.getOpenFileName(self, "Open a Kernline project", start, FILE_FILTER)
        if path:
            self.open_path(path, confirm=False)

    def open_path(self, path: str | Path, confirm: bool = True) -> bool:
        """Open a project file; a file that cannot be used is reported and the current project kept."""
        if confirm and not self.confirm_discard():
            return False
        try:
            self.document.open(path)
        except InputError as err:
            text = err.message if str(path) in err.message else f"{path}\n\n{err.message}"
            QMessageBox.warning(self, "Cannot open the project", text)
            return False
        self.remove_recovery()
        self._add_recent(Path(path))
        self.statusBar().showMessage(f"Opened {path}", 5000)
        return True

    def flush_typing(self) -> None:
        """Apply typing not yet applied in every field, as Enter would: a valid entry becomes an edit,
        an invalid one is marked at its field with the reason."""
        for field in self.wall_form.group.fields + self.project_form.group.fields:
            field.flush()

    def refuse_invalid(self, what: str) -> bool:
        """When a field holds an entry that is not valid, say which (field and reason) and return True."""
        problems = self.invalid_problems()
        if not problems:
            return False
        listing = "\n".join(f"• {label}: {problem}" for label, problem in problems)
        first = problems[0][0]
        self.statusBar().showMessage(f"Not {what}: {first} holds an entry that is not valid; correct it first.", 12000)
        QMessageBox.warning(
            self,
            f"Not {what}",
            f"Not {what}: {'this field holds' if len(problems) == 1 else 'these fields hold'} an entry that is not valid.\n\n"
            f"{listing}\n\nCorrect the entry (or undo it with Ctrl+Z in the field), then try again.",
        )
        self._focus_first_invalid()
        return True

    def invalid_problems(self) -> list[tuple[str, str]]:
        """(label, reason) of each field holding text the engine refused (the model keeps its last valid value)."""
        fields = self.wall_form.group.fields + self.project_form.group.fields
        return [(f.spec.label, f.error.text()) for f in fields if f.invalid]

    def _focus_first_invalid(self) -> None:
        for f in self.wall_form.group.fields + self.project_form.group.fields:
            if f.invalid:
                self.forms_scroll.ensureWidgetVisible(f)
                f.edit.setFocus()
                return

    def save(self) -> bool:
        self.flush_typing()
        if self.refuse_invalid("saved"):
            return False
        if self.document.path is None:
            return self.save_as()
        return self._save_to(self.document.path)

    def save_as(self) -> bool:
        self.flush_typing()
        if self.refuse_invalid("saved"):
            return False
        doc = self.document
        suggestion = str(doc.path) if doc.path else (doc.project.info.name.strip() or "project") + EXTENSION
        path, _ = QFileDialog.getSaveFileName(self, "Save the project as", suggestion, FILE_FILTER)
        if not path:
            return False
        if not Path(path).suffix:  # typed without an extension: the project file's own
            path += EXTENSION
        return self._save_to(Path(path))

    def _save_to(self, path: Path) -> bool:
        try:
            self.document.save(path)
        except (OSError, InputError) as err:
            QMessageBox.warning(self, "Cannot save the project", f"{path}\n\n{err}")
            return False
        self.remove_recovery()
        self._add_recent(path)
        saved = self.document.path
        if self.document.checkable:
            self.statusBar().showMessage(f"Saved {saved}", 5000)
        else:
            self.statusBar().showMessage(
                f"Saved {saved} — still to enter: {self.document.missing_text()}; nothing is checked until then.",
                10000,
            )
        return True

    def export_schedule(self) -> bool:
        self.flush_typing()
        if self._refuse_unchecked("write the schedule"):
            return False
        doc = self.document
        suggestion = self.export_suggestion("schedule")
        path, _ = QFileDialog.getSaveFileName(self, "Export the footing schedule", str(suggestion), "CSV (*.csv)")
        if not path:
            return False
        if not Path(path).suffix:
            path += ".csv"
        try:
            write_schedule(doc.project, path, [doc.results[w.id] for w in doc.project.walls])  # all checked
        except OSError as err:
            QMessageBox.warning(self, "Cannot write the schedule", f"{path}\n\n{err}")
            return False
        self.settings.setValue("last_export_folder", str(Path(path).parent))
        self.statusBar().showMessage(f"Wrote the schedule to {path}", 5000)
        return True

    def export_suggestion(self, kind: str) -> Path:
        """Where an export is first offered: the project's folder (else the folder of the last export, else
        the home folder) and :func:`export_file_name` — the same way for the PDF and the CSV."""
        doc = self.document
        folder = doc.path.parent if doc.path else Path(self.settings.value("last_export_folder", "") or Path.home())
        return folder / export_file_name(doc.project.info.name.strip(), kind)

    # ---- calculation package -------------------------------------------------------------------

    def invalid_inputs(self) -> list[str]:
        """Labels of the fields that hold text the engine refused (the model keeps their last valid value)."""
        fields = self.wall_form.group.fields + self.project_form.group.fields
        return [f.spec.label for f in fields if f.invalid]

    def export_package(self) -> bool:
        """Ask where, then write the calculation package of the current model on a worker.

        Returns True when writing has started; the outcome is reported when it ends.
        """
        self.flush_typing()
        doc = self.document
        if self._refuse_unchecked("write the calculation package"):
            return False
        if self.package_writer.busy:
            self.statusBar().showMessage("A calculation package is still being written.", 5000)
            return False
        suggestion = self.export_suggestion("package")
        path, _ = QFileDialog.getSaveFileName(self, "Export the calculation package", str(suggestion), PDF_FILTER)
        if not path:
            return False
        if not Path(path).suffix:
            path += ".pdf"
        target = Path(path)
        # the model in force: an edit the engine refused never reached it, so it is the last valid one
        self._export_invalid = self.invalid_inputs()
        self.package_writer.write(doc.raw, doc.project, target, **self.package_options())
        self.export_pdf_action.setEnabled(False)
        self._set_busy(f"Writing the calculation package to {target.name}…")
        return True

    _export_invalid: list[str] = []

    def _set_busy(self, text: str | None) -> None:
        self.busy_label.setText(text or "")
        self.busy_label.setVisible(bool(text))
        self.busy_bar.setVisible(bool(text))

    def _on_package_written(self, outcome: PackageOutcome) -> None:
        self._set_busy(None)
        self.export_pdf_action.setEnabled(not self.welcome_shown)
        if not outcome.ok:
            self.statusBar().showMessage("The calculation package was not written.", 8000)
            QMessageBox.warning(self, "Cannot write the calculation package", f"{outcome.path}\n\n{outcome.error}")
            return
        self.settings.setValue("last_export_folder", str(outcome.path.parent))
        walls = f"{outcome.walls} wall" + ("s" if outcome.walls != 1 else "")
        text = f"Wrote the calculation package ({walls}) to\n{outcome.path}\nin {outcome.seconds:.1f} s."
        if self._export_invalid:
            text += (
                "\n\nNot in the package: " + ", ".join(self._export_invalid) + " — the text typed there is not valid, "
                "so the package shows the last valid values."
            )
        self.statusBar().showMessage(f"Wrote the calculation package to {outcome.path}", 8000)
        QMessageBox.information(self, "Calculation package written", text)

    # ---- recent files --------------------------------------------------------------------------

    def recent_files(self) -> list[str]:
        value = self.settings.value("recent_files", [])
        if isinstance(value, str):
            value = [value]
        return [str(v) for v in (value or [])]

    def _add_recent(self, path: Path) -> None:
        text = str(Path(path).resolve())
        files = [text] + [f for f in self.recent_files() if f != text]
        self.settings.setValue("recent_files", files[:RECENT_LIMIT])
        self.settings.sync()
        self._rebuild_recent_menu()

    def _rebuild_recent_menu(self) -> None:
        self.recent_menu.clear()
        files = self.recent_files()
        for i, f in enumerate(files):
            action = self.recent_menu.addAction(f"&{i + 1} {Path(f).name}")
            action.setToolTip(f)
            action.triggered.connect(lambda _c=False, p=f: self._open_recent(p))
        self.recent_menu.setEnabled(bool(files))
        if hasattr(self, "welcome"):
            self.welcome.set_recent(files)

    def _open_recent(self, path: str) -> None:
        if not Path(path).is_file():
            QMessageBox.warning(self, "File not found", f"{path}\n\nno longer exists; it is removed from the list.")
            self.settings.setValue("recent_files", [f for f in self.recent_files() if f != path])
            self._rebuild_recent_menu()
            return
        self.open_path(path)

    # ---- autosave and recovery -----------------------------------------------------------------

    @property
    def recovery_path(self) -> Path:
        """This window's recovery record (it exists only while there is unsaved work)."""
        self._sync_recovery_slot()
        assert self.recovery_slot is not None
        return self.recovery_slot.record

    def _sync_recovery_slot(self) -> None:
        """Give the open document its own recovery slot (lock taken at once), keyed by its path and session.

        A document that gets another file (Save As) or is replaced moves to a new slot; the old
        slot's record and lock go (its work was saved or deliberately dropped).
        """
        doc = self.document
        slot = self.recovery_slot
        if slot is not None and slot.path == doc.path and slot.session == doc.session:
            return
        if slot is not None:
            slot.release()
        self.recovery_slot = RecoverySlot(self.recovery_dir, doc.path, doc.session)
        self.recovery_slot.acquire()
        if doc.dirty and slot is not None:
            self.autosave_now()  # the work moved to the new slot at once

    def autosave_now(self) -> bool:
        """Write the unsaved project to this window's recovery record (nothing when there is nothing unsaved)."""
        doc = self.document
        if not doc.dirty or self.recovery_slot is None:
            return False
        self._sync_recovery_slot()
        try:
            self.recovery_slot.write(doc.raw, demo=doc.is_demo, name=doc.project.info.name)
        except OSError as err:
            self.statusBar().showMessage(f"Autosave failed: {err}", 8000)
            return False
        return True

    def remove_recovery(self) -> None:
        """Delete this window's recovery record (the document was saved, dropped, or is as saved)."""
        if self.recovery_slot is not None:
            self.recovery_slot.remove()

    def offer_recovery(self) -> list[Path | None]:
        """After a crash, offer every orphaned document (owner gone) of the recovery folder.

        Records of live windows (in this or another process) are left alone. Unreadable records are
        set aside as ``*.corrupt`` and named in the status bar. Returns the paths (None: never saved)
        of the documents restored; the first is in this window.
        """
        found = recovery.scan(self.recovery_dir)
        notes = []
        if found.set_aside:
            names = ", ".join(str(p) for p in found.set_aside)
            notes.append(f"A damaged recovery file was set aside and not restored: {names}")
        restored: list[Path | None] = []
        if found.orphans:
            choice = RecoveryDialog.ask(self, found.orphans)
            for orphan in choice.discard:
                lock = recovery.claim(orphan)
                if lock is not None:
                    recovery.discard(orphan, lock)
            for orphan in choice.restore:
                target = self if not restored else self.open_in_new_window(None)
                done, note = target.restore(orphan)
                if note:
                    notes.append(note)
                if done:
                    restored.append(orphan.path)
                elif target is not self:
                    target.close()
        if restored:
            more = f" and {len(restored) - 1} more in windows of their own" if len(restored) > 1 else ""
            notes.insert(0, f"Restored unsaved work{more}; save it to keep it.")
        if notes:
            self.statusBar().showMessage(" ".join(notes), 20000)
        return restored

    def restore(self, orphan: Orphan) -> tuple[bool, str | None]:
        """Bring an orphaned document into this window: (restored, a note for the status bar or None).

        The document keeps its absolute file path, so Save writes to that file. Its work is written
        to this window's own record before the orphan's record is deleted, so it is never without one.
        """
        lock = recovery.claim(orphan)
        if lock is None:
            gone = not orphan.record.exists()
            return False, None if gone else f"{orphan.title} is being restored by another window."
        try:
            self.document.replace(orphan.raw, orphan.path, demo=orphan.demo, recovered=True)
        except (InputError, ValueError, TypeError, KeyError, AttributeError) as err:
            message = err.message if isinstance(err, InputError) else str(err)
            lock.release()
            try:
                kept = recovery.set_aside(orphan.record)
            except OSError:
                kept = orphan.record
            QMessageBox.warning(
                self,
                "Cannot restore",
                f"The autosaved copy of {orphan.title} cannot be used:\n\n{message}\n\nIt is kept at {kept}.",
            )
            return False, f"The autosaved copy of {orphan.title} could not be used; it is kept at {kept}."
        self.show_editor()
        if self.autosave_now():
            recovery.discard(orphan, lock)
        else:
            lock.release()  # this window could not write its own record: keep the orphan for the next launch
        if orphan.path is not None and not orphan.path.parent.is_dir():
            return True, f"The folder of {orphan.path} no longer exists; save {orphan.title} with Save As."
        return True, None

    def open_in_new_window(self, path: str | Path | None) -> MainWindow:
        """A further window of this process (same settings and recovery folder), shown; opens ``path`` when given."""
        window = MainWindow(settings=self.settings, recovery_dir=self.recovery_dir, autosave_ms=self._autosave_ms)
        window.setAttribute(Qt.WidgetAttribute.WA_DeleteOnClose, True)
        self.spawned.append(window)
        _OTHER_WINDOWS.append(window)
        window.destroyed.connect(lambda _obj=None, w=window: _forget(w))
        if path is not None:
            window.start(str(path), recover=False)
        window.show()
        return window

    # ---- help ----------------------------------------------------------------------------------

    help_window: HelpWindow | None = None

    def open_guide(self, anchor: str = "contents") -> HelpWindow:
        """Show the user guide at ``anchor`` (one guide window per main window, made on first use)."""
        if self.help_window is None:
            self.help_window = HelpWindow(self)
        self.help_window.open_at(anchor)
        return self.help_window

    def focused_field(self, widget: QWidget | None = None) -> str | None:
        """The engine field path of the input that has the focus ("walls[0].footing.width", "soil.friction"), or None."""
        w = widget if widget is not None else (QApplication.focusWidget() or self.focusWidget())
        doc = self.document
        wall_prefix = f"walls[{doc.current_index}]"
        forms = ((self.wall_form, wall_prefix + "."), (self.project_form, ""))
        while w is not None and w is not self:
            spec = getattr(w, "spec", None)
            path = getattr(spec, "path", None)
            if isinstance(path, tuple) and path:
                scope = getattr(spec, "scope", "wall")
                return ".".join(path) if scope == "project" else f"{wall_prefix}.{'.'.join(path)}"
            for form, prefix in forms:
                for key, choice in getattr(form, "choices", {}).items():
                    if getattr(choice, "box", None) is w:
                        return prefix + ".".join(key)
            loads = getattr(self.wall_form, "loads", None)
            if w is loads:
                return f"{wall_prefix}.loads"
            if w is getattr(self.project_form, "combinations", None):
                return "criteria.combinations"
            w = w.parentWidget()
        return None

    def help_topic(self, widget: QWidget | None = None) -> str:
        """The guide's section for the focused input or pane (the contents when nothing more precise is known)."""
        w = widget if widget is not None else (QApplication.focusWidget() or self.focusWidget())
        field = self.focused_field(w)
        if field is not None:
            return anchor_for(field)
        for attribute, topic in PANE_TOPICS:
            pane = getattr(self, attribute, None)
            if w is not None and isinstance(pane, QWidget) and (w is pane or pane.isAncestorOf(w)):
                return topic
        return "contents"

    def show_help(self) -> HelpWindow:
        """F1: the guide at the section about the focused input or pane."""
        return self.open_guide(self.help_topic())

    # ---- about, closing ------------------------------------------------------------------------

    def about(self) -> None:
        QMessageBox.about(
            self,
            "About Kernline",
            f"<h3>Kernline {__version__}</h3>"
            "<p>Kernline checks concrete strip footings under shear walls for "
            + _listing([c.title.lower() for c in checks()])
            + " (with soil pressure beyond the kern) under the load combinations of the chosen code basis ("
            + "; ".join(c.title for c in codes(Family.SERVICE))
            + ") in both lateral directions, and sizes them on a grid of widths and thicknesses (and lengths).</p>"
            f"<p><b>Basis.</b> {REFERENCES}.</p>"
            f"<p><b>Caution.</b> {CAUTION}</p>",
        )

    def closeEvent(self, event: QCloseEvent) -> None:  # noqa: N802 - Qt's name
        if not self.confirm_discard():
            event.ignore()
            return
        self.autosave_timer.stop()
        self.runner.wait()
        self.package_writer.wait()
        if self.recovery_slot is not None:
            self.recovery_slot.release()
            self.recovery_slot = None
        event.accept()

    def quit_for_smoke_check(self) -> None:
        """End the run with exit code 0 without questions (nothing is saved; an autosave is kept)."""
        self.autosave_timer.stop()
        self.runner.wait()
        self.package_writer.wait()
        self.hide()
        QApplication.instance().exit(0)


def _listing(words: list[str]) -> str:
    """ "a", "a and b", "a, b and c"."""
    return words[0] if len(words) == 1 else ", ".join(words[:-1]) + " and " + words[-1]


def _forget(window: MainWindow) -> None:
    if window in _OTHER_WINDOWS:
        _OTHER_WINDOWS.remove(window)


def launch(path: str | None = None, demo: bool = False) -> int:
    """Create the application, show the window (with ``path``, the demo, or the welcome panel) and run until it closes.

    When ``KERNLINE_EXIT_AFTER_MS`` holds a positive whole number, the run ends with exit code 0 that many
    milliseconds after the window is shown, without the recovery question (the frozen build's smoke check);
    any other value is ignored.

    When no display plugin Qt would try can load (a system library missing), one line naming the Debian
    packages to install goes to stderr and the exit code is 3, instead of Qt's own abort.
    """
    problem = qt_platform.platform_problem()
    if problem is not None:
        print(problem, file=sys.stderr)
        return qt_platform.EXIT_NO_PLATFORM
    app = QApplication.instance() or QApplication(sys.argv[:1])
    app.setOrganizationName("Kernline")
    app.setApplicationName("Kernline")
    smoke_ms = exit_after_ms()
    window = MainWindow()
    window.start(path, demo, recover=smoke_ms is None)
    window.show()
    if smoke_ms is not None:
        QTimer.singleShot(smoke_ms, window.quit_for_smoke_check)
    return int(app.exec())

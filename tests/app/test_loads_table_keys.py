"""The loads table answers Tab as a form does: Tab walks its cells row by row and, after the last cell,
goes on to the inputs after the table (the loads' buttons); Shift+Tab walks back and leaves before the
first cell; Ctrl+Tab and Ctrl+Shift+Tab leave from any cell, editing or not (Qt's convention for a widget
that keeps Tab). A Tab pressed while a cell is being edited commits the entry.

Basis: issue 13 ("check the tab order so the keyboard reaches every field"); Qt's QAbstractItemView
documentation (tabKeyNavigation; Ctrl+Tab moves the focus out of a widget that uses Tab).
"""

from __future__ import annotations

import pytest
from PySide6.QtCore import Qt
from PySide6.QtWidgets import QAbstractItemView, QApplication, QWidget


@pytest.fixture
def loads(qtbot, window):
    window.activateWindow()
    qtbot.waitUntil(lambda: QApplication.activeWindow() is window, timeout=2000)
    editor = window.wall_form.loads
    section = next(s for s in window.wall_form.sections.values() if s.content.isAncestorOf(editor) or s.content is editor)
    section.toggle.setChecked(True)
    qtbot.waitUntil(editor.table.isVisible, timeout=2000)
    assert editor.table.rowCount() >= 2
    return editor


def _widget_before(table: QWidget) -> QWidget:
    w = table.previousInFocusChain()
    while not (w.isVisible() and w.isEnabled() and w.focusPolicy() & Qt.FocusPolicy.TabFocus):
        w = w.previousInFocusChain()
    return w


def _press(qtbot, key: Qt.Key, modifier=Qt.KeyboardModifier.NoModifier) -> QWidget:
    qtbot.keyClick(QApplication.focusWidget(), key, modifier)
    return QApplication.focusWidget()


def test_tab_walks_the_cells_and_leaves_after_the_last(qtbot, loads):
    table = loads.table
    rows, cols = table.rowCount(), table.columnCount()
    before = _widget_before(table)
    before.setFocus(Qt.FocusReason.TabFocusReason)
    assert _press(qtbot, Qt.Key.Key_Tab) is table
    visited = [(table.currentRow(), table.currentColumn())]
    for _ in range(rows * cols - 1):
        assert _press(qtbot, Qt.Key.Key_Tab) is table
        visited.append((table.currentRow(), table.currentColumn()))
    assert visited == [(r, c) for r in range(rows) for c in range(cols)]  # every cell once, row by row
    assert _press(qtbot, Qt.Key.Key_Tab) is loads.add_buttons["line"]  # out, to the loads' first button


def test_shift_tab_walks_back_and_leaves_before_the_first(qtbot, loads):
    table = loads.table
    rows, cols = table.rowCount(), table.columnCount()
    loads.add_buttons["line"].setFocus()
    assert _press(qtbot, Qt.Key.Key_Backtab) is table
    assert (table.currentRow(), table.currentColumn()) == (rows - 1, cols - 1)  # entered at its last cell
    for _ in range(rows * cols - 1):
        assert _press(qtbot, Qt.Key.Key_Backtab) is table
    assert (table.currentRow(), table.currentColumn()) == (0, 0)
    assert _press(qtbot, Qt.Key.Key_Backtab) is _widget_before(table)


@pytest.mark.parametrize(
    ("key", "modifier", "out"),
    [
        (Qt.Key.Key_Tab, Qt.KeyboardModifier.ControlModifier, "after"),
        (Qt.Key.Key_Backtab, Qt.KeyboardModifier.ControlModifier | Qt.KeyboardModifier.ShiftModifier, "before"),
    ],
)
def test_ctrl_tab_leaves_from_any_cell(qtbot, loads, key, modifier, out):
    table = loads.table
    expected = loads.add_buttons["line"] if out == "after" else _widget_before(table)
    table.setFocus()
    table.setCurrentCell(1, 2)
    assert _press(qtbot, key, modifier) is expected
    # and from a cell being edited
    table.setFocus()
    table.setCurrentCell(1, 2)
    table.editItem(table.item(1, 2))
    qtbot.waitUntil(lambda: table.state() == QAbstractItemView.State.EditingState, timeout=2000)
    assert _press(qtbot, key, modifier) is expected
    assert table.state() != QAbstractItemView.State.EditingState


def test_tab_while_editing_commits_moves_on_and_leaves_after_the_last_cell(qtbot, window, loads):
    table = loads.table
    doc = window.document
    # an entry typed into the value cell and Tab: committed as one undoable edit, the next cell is current
    table.setFocus()
    table.setCurrentCell(0, 2)
    table.editItem(table.item(0, 2))
    qtbot.waitUntil(lambda: table.state() == QAbstractItemView.State.EditingState, timeout=2000)
    edit = QApplication.focusWidget()
    edit.selectAll()
    before = doc.undo_stack.count()
    qtbot.keyClicks(edit, "345")
    _press(qtbot, Qt.Key.Key_Tab)
    assert doc.undo_stack.count() == before + 1
    assert table.item(0, 2).text().startswith("345")
    assert (table.currentRow(), table.currentColumn()) == (0, 3)
    # the last cell being edited: Tab leaves the table (Qt's own table would wrap round to the first cell)
    last_row, last_col = table.rowCount() - 1, table.columnCount() - 1
    table.setCurrentCell(last_row, last_col)
    table.editItem(table.item(last_row, last_col))
    qtbot.waitUntil(lambda: table.state() == QAbstractItemView.State.EditingState, timeout=2000)
    assert _press(qtbot, Qt.Key.Key_Tab) is loads.add_buttons["line"]
    assert table.state() != QAbstractItemView.State.EditingState


def test_the_methods_read_only_combinations_are_passed_in_one_tab_and_an_own_list_walked(qtbot, window):
    editor = window.project_form.combinations
    section = next(s for s in window.project_form.sections.values() if s.content is editor)
    section.toggle.setChecked(True)
    window.activateWindow()
    qtbot.waitUntil(lambda: QApplication.activeWindow() is window, timeout=2000)
    table = editor.table
    assert not editor.custom.isChecked() and table.rowCount() > 1
    editor.custom.setFocus(Qt.FocusReason.TabFocusReason)
    assert _press(qtbot, Qt.Key.Key_Tab) is table
    assert _press(qtbot, Qt.Key.Key_Tab) is not table  # the method's list: one stop
    editor.custom.setChecked(True)  # the project's own list: Tab walks its cells
    assert editor.custom.isChecked() and table.tabKeyNavigation()
    editor.custom.setFocus(Qt.FocusReason.TabFocusReason)
    assert _press(qtbot, Qt.Key.Key_Tab) is table
    assert _press(qtbot, Qt.Key.Key_Tab) is table and (table.currentRow(), table.currentColumn()) == (0, 1)
    assert _press(qtbot, Qt.Key.Key_Tab, Qt.KeyboardModifier.ControlModifier) is editor.add_button

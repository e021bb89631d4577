"""The keyboard reaches every control of the frame: Tab goes pane by pane (walls, inputs, drawings,
verdict, warnings, tabs and the page shown) and back to the walls, and every menu opens with Alt and
a letter of its own.

Basis: issue 13 ("check the tab order so the keyboard reaches every field").
"""

from __future__ import annotations

import pytest
from PySide6.QtCore import Qt
from PySide6.QtWidgets import QApplication, QMenu, QTabWidget, QWidget


def _visible_chain(window) -> list[QWidget]:
    """The widgets Tab stops at, from the walls list round to it again (as QWidget.focusNextChild walks)."""
    start = window.walls_view.tree
    chain = [start]
    w = start.nextInFocusChain()
    while w is not start:
        if (
            w.window() is window
            and w.isVisibleTo(window)
            and w.isEnabled()
            and (w.focusPolicy() & Qt.FocusPolicy.TabFocus) == Qt.FocusPolicy.TabFocus
            and w.focusProxy() is None
            and not isinstance(w, QTabWidget)
        ):
            chain.append(w)
        w = w.nextInFocusChain()
        assert len(chain) < 2000
    return chain


def _pane(window, w) -> str:
    for name, pane in window.frame_panes():
        if w is pane or pane.isAncestorOf(w):
            return name
    return "elsewhere"


def _runs(names: list[str]) -> list[str]:
    out: list[str] = []
    for n in names:
        if not out or out[-1] != n:
            out.append(n)
    return out


@pytest.mark.parametrize(
    ("size", "order"),
    [
        ((1480, 940), ["walls", "inputs", "drawings", "verdict", "warnings", "tabs"]),  # warnings beside the verdict
        ((1280, 800), ["walls", "warnings", "inputs", "drawings", "verdict", "tabs"]),  # warnings under the walls
    ],
)
def test_tab_goes_pane_by_pane_and_back_to_the_walls(qtbot, window, size, order):
    window.resize(*size)
    qtbot.waitUntil(lambda: window.size().toTuple() == size, timeout=2000)
    qtbot.wait(20)
    chain = _visible_chain(window)
    assert _runs([_pane(window, w) for w in chain]) == order


def test_tab_reaches_every_control_of_the_frame(window):
    """Every visible control that takes focus is in the chain: the walls' buttons, the loads' buttons right
    after the loads table, the case picker, the warnings list, the tab bar and the page shown."""
    chain = _visible_chain(window)
    loads = window.wall_form.loads
    table_at = chain.index(loads.table)
    assert all(isinstance(w, type(loads.add_buttons["line"])) for w in chain[table_at + 1 : table_at + 4])
    for w in (window.walls_view.tree, loads.table, window.drawings.picker, window.warnings_view.list, window.tabs.tabBar()):
        assert w in chain, w.objectName()
    bar_at = chain.index(window.tabs.tabBar())
    assert chain[bar_at + 1] is window.cases_table
    everything = [
        w
        for w in window.findChildren(QWidget)
        if w.isVisibleTo(window)
        and w.isEnabled()
        and (w.focusPolicy() & Qt.FocusPolicy.TabFocus) == Qt.FocusPolicy.TabFocus
        and w.focusProxy() is None
        and not isinstance(w, QTabWidget)
        and _pane(window, w) != "elsewhere"
    ]
    missing = [f"{type(w).__name__} {w.objectName()}" for w in everything if w not in chain]
    assert not missing


def test_each_result_tab_is_reached_after_the_tab_bar(qtbot, window):
    for k in range(window.tabs.count()):
        window.tabs.setCurrentIndex(k)
        qtbot.wait(1)
        chain = _visible_chain(window)
        after = chain[chain.index(window.tabs.tabBar()) + 1 :]
        page = window.tabs.widget(k)
        assert after and all(page is w or page.isAncestorOf(w) for w in after), window.tabs.tabText(k)


def test_pressing_tab_moves_the_focus_along_the_chain(qtbot, window):
    """Real Tab presses from the warnings list go to the tab bar, into the page, and out of its read-only
    table round to the walls (a results table does not keep Tab among its cells)."""
    window.activateWindow()
    qtbot.waitUntil(lambda: QApplication.activeWindow() is window, timeout=2000)
    window.warnings_view.list.setFocus()
    for expected in (window.tabs.tabBar(), window.cases_table, window.walls_view.tree):
        qtbot.keyClick(QApplication.focusWidget(), Qt.Key.Key_Tab)
        assert QApplication.focusWidget() is expected


def test_every_menu_opens_with_alt_and_a_letter_of_its_own(window):
    letters = []
    for action in window.menuBar().actions():
        assert isinstance(action.menu(), QMenu)
        text = action.text()
        assert "&" in text, text
        letters.append(text[text.index("&") + 1].lower())
    assert len(letters) == len(set(letters))

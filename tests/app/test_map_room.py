"""The design map has room at every window size: where its tab page is low (1280 x 800) the map itself,
while its tab is open, is shown in the drawings' place, which has the height; its buttons and readout stay
in the tab. No pane moves either way, and leaving the tab brings the drawings back.

Basis: issue 13 (at 1280 x 800 the design map was small: the drawings' least height left it ~150 px).
"""

from __future__ import annotations

import pytest
from kernline.app.main_window import MAP_LEAST_HEIGHT
from window_helpers import select_wall

ROOM_PX = 240  # common practice: a plot of two axes needs about this height to read its ticks and lines


def _open_map(qtbot, window, size):
    window.resize(*size)
    qtbot.waitUntil(lambda: window.size().toTuple() == size, timeout=2000)
    select_wall(window, "C3")
    window.tabs.setCurrentWidget(window.design_map)
    qtbot.wait(30)


def _panes(window) -> dict[str, tuple]:
    return {name: pane.geometry().getRect() for name, pane in window.frame_panes()}


@pytest.mark.parametrize("size", [(1280, 800), (1480, 940), (1920, 1080)])
def test_the_design_map_has_room_at_every_size(qtbot, window, size):
    before = _panes(window) if window.size().toTuple() == size else None
    _open_map(qtbot, window, size)
    dm = window.design_map
    box = dm.plot.getPlotItem().getViewBox()
    assert dm.plot.isVisible() and dm.plot.height() >= ROOM_PX, dm.plot.height()
    assert box.height() >= 0.6 * ROOM_PX
    lent = dm.height() < MAP_LEAST_HEIGHT
    assert dm.plot_lent == lent == window.drawings.showing_map
    assert window.drawings.isAncestorOf(dm.plot) == lent and dm.isAncestorOf(dm.plot) != lent
    if before is not None:
        assert _panes(window) == before
    for button in (dm.size_button, dm.adopt_all_button):  # the buttons stay in the tab, whole
        assert dm.isAncestorOf(button) and button.isVisible()
        assert button.width() >= button.fontMetrics().horizontalAdvance(button.text())


def test_at_1280_by_800_the_map_takes_the_drawings_place_and_gives_it_back(qtbot, window):
    window.resize(1280, 800)
    qtbot.waitUntil(lambda: window.size().toTuple() == (1280, 800), timeout=2000)
    qtbot.wait(30)
    panes = _panes(window)
    drawings = window.drawings
    assert drawings.elevation.isVisible() and not drawings.showing_map
    _open_map(qtbot, window, (1280, 800))
    dm = window.design_map
    assert drawings.showing_map and not drawings.elevation.isVisible()
    assert dm.plot.height() >= drawings.height() - 2 * drawings.map_title.height()  # nearly the whole pane
    assert _panes(window) == panes
    window.tabs.setCurrentWidget(window.cases_table)
    qtbot.wait(30)
    assert not drawings.showing_map and drawings.elevation.isVisible()
    assert not dm.plot_lent and dm.isAncestorOf(dm.plot)
    assert _panes(window) == panes
    # a taller window with the map open takes it back into its tab
    window.tabs.setCurrentWidget(dm)
    qtbot.wait(30)
    assert dm.plot_lent
    window.resize(1480, 940)
    qtbot.waitUntil(lambda: window.size().toTuple() == (1480, 940), timeout=2000)
    qtbot.waitUntil(lambda: not dm.plot_lent, timeout=2000)
    assert dm.isAncestorOf(dm.plot) and not drawings.showing_map and dm.plot.isVisible()


def test_a_click_on_the_map_in_the_drawings_place_still_adopts(qtbot, window):
    """The map keeps working where it is shown: sized, its cells read and adopt as in the tab."""
    _open_map(qtbot, window, (1280, 800))
    dm = window.design_map
    window.runner.sync_limit = 10**9
    window.size_current()
    qtbot.waitUntil(lambda: dm.entry is not None and dm.fresh, timeout=20_000)
    entry = dm.entry
    assert entry is not None and entry.result.feasible
    width_in, thickness_in = entry.result.width / 0.0254, entry.result.thickness / 0.0254
    cell = dm.cell_at(width_in, thickness_in)
    assert cell is not None
    assert dm.adopt_cell(*cell) is None
    ft = window.document.current_wall.footing
    assert ft.width == pytest.approx(entry.result.width) and ft.thickness == pytest.approx(entry.result.thickness)

"""Sizing from the window: the engine's sizing off the GUI thread, the design map, adopting a cell."""

from __future__ import annotations

import numpy as np
import pytest
from kernline.app.runner import SizingRunner
from kernline.engine.sizing import size_footing
from PySide6.QtCore import QPoint, QPointF, Qt
from window_helpers import select_wall


def _size_current(qtbot, window):
    with qtbot.waitSignal(window.runner.finished, timeout=10_000):
        window.runner.sync_limit = 0  # force the worker thread, as for a large grid
        window.size_current()
    qtbot.waitUntil(lambda: window.design_map.entry is not None and window.design_map.fresh, timeout=5000)


def test_size_this_footing_shows_the_engines_map_and_choice(qtbot, window):
    """C3 sized on a worker: the map's cells, ring and boundaries come from engine.sizing.size_footing."""
    select_wall(window, "C3")
    _size_current(qtbot, window)
    doc = window.document
    expected = size_footing(doc.project, doc.current_wall)
    view = window.design_map
    s = view.entry.result
    assert window.tabs.currentWidget() is view
    assert (s.width, s.thickness) == (expected.width, expected.thickness)
    np.testing.assert_array_equal(s.passes, expected.passes)
    ring_x, ring_y = view.chosen.getData()
    assert ring_x[0] == pytest.approx(expected.width / 0.0254)
    assert ring_y[0] == pytest.approx(expected.thickness / 0.0254)
    cross_x, _ = view.current.getData()
    assert cross_x[0] == pytest.approx(16.0)  # C3's footing is 16 in wide
    bx, _by = view.boundaries[2].getData()  # bearing limits C3
    assert np.isfinite(bx).any()
    assert "Smallest passing footing" in view.message.text()


def test_clicking_a_passing_cell_adopts_it_and_undo_restores(qtbot, window):
    """A real mouse click on the map cell B = 24 in, D = 14 in adopts it as one command."""
    select_wall(window, "C3")
    _size_current(qtbot, window)
    doc = window.document
    view = window.design_map
    s = view.entry.result
    col = int(np.argmin(np.abs(s.widths - 24 * 0.0254)))
    row = int(np.argmin(np.abs(s.thicknesses - 14 * 0.0254)))
    assert s.passes[row, col]
    vb = view.plot.getPlotItem().getViewBox()
    scene_point = vb.mapViewToScene(QPointF(24.0, 14.0))
    widget_point = view.plot.mapFromScene(scene_point)
    qtbot.mouseClick(view.plot.viewport(), Qt.MouseButton.LeftButton, pos=QPoint(widget_point.x(), widget_point.y()))
    assert doc.raw["walls"][2]["footing"]["width"] == "24 in"
    assert doc.raw["walls"][2]["footing"]["thickness"] == "14 in"
    assert doc.results["C3"].passes
    assert doc.undo_stack.count() == 1
    doc.undo_stack.undo()
    assert doc.raw["walls"][2]["footing"]["width"] == "16 in"
    assert doc.raw["walls"][2]["footing"]["thickness"] == "12 in"


def test_a_failing_cell_is_not_adopted(qtbot, window):
    select_wall(window, "C3")
    _size_current(qtbot, window)
    view = window.design_map
    s = view.entry.result
    row, col = 0, 0  # 12 in x 12 in fails bearing for C3
    assert not s.passes[row, col]
    assert "does not pass" in view.adopt_cell(row, col)
    assert window.document.undo_stack.count() == 0
    assert "fails" in view.cell_text(row, col)


def test_size_all_then_adopt_all_in_one_step(qtbot, window):
    """Every wall sized; adopting all makes every wall pass; one undo restores every footing changed."""
    doc = window.document
    window.runner.sync_limit = 0
    window.size_all()
    # showing the map may also size the selected wall on its own: wait for the batch of every wall
    qtbot.waitUntil(lambda: set(doc.sizing) == {w.id for w in doc.project.walls}, timeout=10_000)
    for wall in doc.project.walls:
        expected = size_footing(doc.project, wall)
        assert doc.sizing[wall.id].result.width == expected.width
    assert window.adopt_all_sizes() == "failing"  # the failing walls take their sizes; the passing keep theirs
    assert all(r.passes for r in doc.results.values())
    assert doc.undo_stack.count() == 1
    doc.undo_stack.undo()
    assert not doc.results["C3"].passes


def test_an_edit_makes_the_map_stale_and_it_is_sized_again(qtbot, window):
    """With the map shown, changing a load re-sizes the wall; adopting from a stale map is refused."""
    select_wall(window, "C3")
    _size_current(qtbot, window)
    doc = window.document
    view = window.design_map
    with qtbot.waitSignal(window.runner.finished, timeout=10_000):
        window.wall_form.loads.table.item(0, 2).setText("1200")
        assert not view.fresh or view.busy
    qtbot.waitUntil(lambda: view.fresh, timeout=5000)
    assert view.entry.wall == doc.current_wall
    assert view.entry.result.width == size_footing(doc.project, doc.current_wall).width


def test_stale_results_are_dropped_by_sequence_number(qtbot, window):
    """Two requests for the same key on the worker: only the newer one is delivered."""
    doc = window.document
    runner = SizingRunner(sync_limit=0)
    delivered = []
    runner.finished.connect(delivered.append)
    first = runner.request("all", doc.project, doc.project.walls)
    second = runner.request("all", doc.project, doc.project.walls[:1])
    qtbot.waitUntil(lambda: len(delivered) == 1 and runner.dropped == 1, timeout=10_000)
    assert runner.wait(5000)
    assert delivered[0].seq == second != first
    assert [e.wall.id for e in delivered[0].entries] == ["N1"]


def test_small_jobs_run_at_once_on_the_gui_thread(window):
    doc = window.document
    runner = SizingRunner(sync_limit=10**9)
    delivered = []
    runner.finished.connect(delivered.append)
    runner.request("wall:N1", doc.project, doc.project.walls[:1])
    assert len(delivered) == 1 and not delivered[0].threaded

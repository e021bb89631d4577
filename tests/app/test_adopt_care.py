"""Adopting sized footings with care: "Adopt all chosen sizes" changes only the walls that fail; bringing
passing walls down asks first, lists every change (wall, from → to) and is one undo step; words about
an adoption do not outlive their project.

Basis: issue 13 (adopt all shrank demo wall S2, which passed, to a footing with little contact, and an
"Adopted …" message stayed after File > New). The sizes compared are the engine's own
(engine.sizing.size_footing), read independently of the window.
"""

from __future__ import annotations

import copy

import pytest
from kernline.engine.project_file import parse_project
from kernline.engine.results import check_wall
from kernline.engine.sizing import size_footing
from kernline.engine.units import format_length
from PySide6.QtCore import QPoint, QPointF, Qt
from PySide6.QtWidgets import QMessageBox
from window_helpers import select_wall


def _size_all(qtbot, window):
    doc = window.document
    window.runner.sync_limit = 10**9  # at once, on this thread
    window.size_all()
    qtbot.waitUntil(lambda: {w.id for w in doc.project.walls} <= set(doc.sizing), timeout=10_000)


def _footings(raw) -> dict[str, dict]:
    return {w["id"]: copy.deepcopy(w["footing"]) for w in raw["walls"]}


def _engine(raw):
    project = parse_project(copy.deepcopy(raw))
    return project, {w.id: (w, check_wall(project, w)) for w in project.walls}


def _passes(result) -> bool:
    return bool(getattr(result, "passes_all", result.passes))


def test_adopt_all_changes_only_the_failing_walls(qtbot, window, dialogs):
    doc = window.document
    _size_all(qtbot, window)
    before = _footings(doc.raw)
    project, checked = _engine(doc.raw)
    failing = {wid for wid, (_w, r) in checked.items() if not _passes(r)}
    assert failing == {"C3"}  # the demo as drawn: C3 fails bearing
    assert window.adopt_all_sizes() == "failing"
    assert dialogs.questions == []  # nothing asked: failing walls are what the button is for
    after = _footings(doc.raw)
    assert {wid for wid in before if before[wid] != after[wid]} == failing
    wall = next(w for w in project.walls if w.id == "C3")
    expected = size_footing(project, wall)
    _p, now = _engine(doc.raw)
    assert now["C3"][0].footing.width == pytest.approx(expected.width)
    assert now["C3"][0].footing.thickness == pytest.approx(expected.thickness)
    assert _passes(now["C3"][1])
    assert doc.undo_stack.count() == 1
    message = window.statusBar().currentMessage()
    units = doc.units
    assert f"C3: B {format_length(wall.footing.width, units)} × t_f {format_length(wall.footing.thickness, units)} → " in message
    assert f"B {format_length(expected.width, units)} × t_f {format_length(expected.thickness, units)}" in message
    doc.undo_stack.undo()
    assert _footings(doc.raw) == before


def test_passing_walls_change_only_when_the_user_says_so_with_the_list_shown(qtbot, window, dialogs):
    doc = window.document
    _size_all(qtbot, window)
    window.adopt_all_sizes()  # C3 first
    project, _checked = _engine(doc.raw)
    steps = doc.undo_stack.count()
    before = _footings(doc.raw)
    offered = window.design_map.adoptable_sizes()
    assert offered, "the demo's passing walls are larger than their smallest passing sizes"
    # asked, and declined (the recorder answers what the test says; No here)
    dialogs.answer = QMessageBox.StandardButton.No
    assert window.adopt_all_sizes() == "declined"
    assert _footings(doc.raw) == before and doc.undo_stack.count() == steps
    question = dialogs.questions[-1]
    units = doc.units
    for wid in offered:
        wall = next(w for w in project.walls if w.id == wid)
        s = size_footing(project, wall)
        line = f"{wid}: B {format_length(wall.footing.width, units)} × t_f {format_length(wall.footing.thickness, units)}"
        assert line in question
        assert f"B {format_length(s.width, units)} × t_f {format_length(s.thickness, units)}" in question
    # asked again and accepted: every offered wall changes, in one undo step
    dialogs.answer = QMessageBox.StandardButton.Yes
    assert window.adopt_all_sizes() == "passing"
    after = _footings(doc.raw)
    assert {wid for wid in before if before[wid] != after[wid]} == set(offered)
    assert doc.undo_stack.count() == steps + 1
    doc.undo_stack.undo()
    assert _footings(doc.raw) == before


def test_the_maps_button_adopts_with_care(qtbot, window, dialogs):
    """A real click on "Adopt all chosen sizes" goes the careful way: the passing walls are left alone."""
    doc = window.document
    _size_all(qtbot, window)
    before = _footings(doc.raw)
    button = window.design_map.adopt_all_button
    qtbot.waitUntil(button.isEnabled, timeout=5000)
    qtbot.mouseClick(button, Qt.MouseButton.LeftButton)
    after = _footings(doc.raw)
    assert {wid for wid in before if before[wid] != after[wid]} == {"C3"}
    assert dialogs.questions == []
    assert "failing" in button.toolTip() and "asking first" in button.toolTip()


def test_words_about_an_adoption_do_not_survive_new_or_open(qtbot, window, demo_file, dialogs):
    doc = window.document
    select_wall(window, "C3")
    window.runner.sync_limit = 10**9
    window.size_current()
    view = window.design_map
    qtbot.waitUntil(lambda: view.entry is not None and view.fresh, timeout=5000)
    hint = window._map_readout
    s = view.entry.result
    row, col = int(s.passes.any(axis=1).argmax()), 0
    col = int(s.passes[row].argmax())
    vb = view.plot.getPlotItem().getViewBox()
    f = 0.0254 if doc.units != "SI" else 0.001
    point = view.plot.mapFromScene(vb.mapViewToScene(QPointF(s.widths[col] / f, s.thicknesses[row] / f)))
    qtbot.mouseClick(view.plot.viewport(), Qt.MouseButton.LeftButton, pos=QPoint(point.x(), point.y()))
    assert view.readout.text().startswith("Adopted")
    window.adopt_all_sizes()
    dialogs.answer = QMessageBox.StandardButton.Discard  # File > New: drop the unsaved adoption
    window.new_project()
    assert view.readout.text() == hint
    assert "Adopted" not in window.statusBar().currentMessage()
    # and after Open
    window.open_demo()
    _size_all(qtbot, window)
    window.adopt_all_sizes()
    assert "Adopted" in window.statusBar().currentMessage()
    assert window.open_path(demo_file)
    assert "Adopted" not in window.statusBar().currentMessage()
    assert view.readout.text() == hint


def test_the_design_maps_adopt_all_called_directly_leaves_passing_walls_alone(qtbot, window):
    """The view's own adopt_all (not only the window's button) changes only failing walls; asked to include
    the passing ones, it changes every wall whose chosen size differs, in one undo step."""
    doc = window.document
    _size_all(qtbot, window)
    before = _footings(doc.raw)
    _project, checked = _engine(doc.raw)
    failing = {wid for wid, (_w, r) in checked.items() if not _passes(r)}
    differing = set(window.design_map.adoptable_sizes())
    assert failing == {"C3"} and differing - failing  # a passing wall the engine would shrink: the case at stake
    count = doc.undo_stack.count()
    assert window.design_map.adopt_all() is None
    assert doc.undo_stack.count() == count + 1
    after = _footings(doc.raw)
    assert {wid for wid in before if before[wid] != after[wid]} == failing
    assert window.design_map.adopt_all() == "nothing to adopt"  # no failing wall left to change
    assert window.design_map.adopt_all(include_passing=True) is None
    assert doc.undo_stack.count() == count + 2
    changed = _footings(doc.raw)
    assert {wid for wid in before if before[wid] != changed[wid]} == differing
    doc.undo_stack.undo()
    assert _footings(doc.raw) == after

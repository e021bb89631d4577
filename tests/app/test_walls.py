"""The walls list: add, duplicate, rename, delete and reorder, each one undoable command, and a
pass/fail mark with the governing check's margin in words that reads without colour."""

from __future__ import annotations

from kernline.engine.summary import margin_text, state_words
from window_helpers import demo_raw, select_wall


def _ids(window) -> list[str]:
    return [w.id for w in window.document.project.walls]


def _row_texts(window, row: int) -> list[str]:
    item = window.walls_view.tree.topLevelItem(row)
    return [item.text(c) for c in range(3)]


def test_the_list_shows_size_and_a_textual_mark(qtbot, window):
    """Each row: ✓ and the margin of the check closest to its limit, or ✗ and how far it falls short;
    the tooltip names that check (engine verdicts and margins); the design along the length joins the
    mark a moment after the list is drawn."""
    from kernline.app.views.walls import along_ready

    results = window.document.results
    qtbot.waitUntil(lambda: all(along_ready(r) for r in results.values()), timeout=10000)
    window.walls_view.refresh()
    ids = _ids(window)
    for row, wall_id in enumerate(ids):
        texts = _row_texts(window, row)
        assert texts[0] == wall_id
        result = window.document.results[wall_id]
        worst = result.worst
        words = state_words(worst, result) or margin_text(worst.ratio, worst.required, worst.passes)
        if not result.passes:
            assert texts[2] == "✗ " + words
        elif result.passes_along:
            assert texts[2] == "✓ " + words
        else:  # every check passes; the design along the length does not
            assert texts[2] == "✗ fails along L_f"
        assert worst.check.title.lower() in window.walls_view.tree.topLevelItem(row).toolTip(2)
    assert _row_texts(window, 0)[1] == "1'-6\" × 1'-0\""
    assert window.walls_view.tree.headerItem().text(2) == "Least margin"


def test_add_duplicate_rename_delete_reorder_and_undo_each(qtbot, window):
    doc = window.document
    start = _ids(window)
    assert start[:4] == ["N1", "S2", "C3", "E4"]
    window.walls_view.add()
    assert _ids(window) == [*start, "W1"]
    assert doc.current_wall.id == "W1"
    assert window.wall_form.title.text().startswith("Wall W1")

    select_wall(window, "C3")
    window.walls_view.duplicate()
    assert _ids(window) == ["N1", "S2", "C3", "C3-2", *start[3:], "W1"]
    assert doc.current_wall.loads == doc.project.walls[2].loads

    item = window.walls_view.tree.topLevelItem(3)
    item.setText(0, "C5")  # the inline edit of the id column
    assert _ids(window) == ["N1", "S2", "C3", "C5", *start[3:], "W1"]

    assert window.walls_view.rename(3, "N1") is not None  # a used id is refused
    assert "used by another wall" in window.walls_view.message.text()
    assert _ids(window)[3] == "C5"

    window.walls_view.move(-1)
    assert _ids(window) == ["N1", "S2", "C5", "C3", *start[3:], "W1"]
    assert doc.current_wall.id == "C5"

    window.walls_view.delete()
    assert _ids(window) == [*start, "W1"]

    assert doc.undo_stack.count() == 5
    for _ in range(5):
        doc.undo_stack.undo()
    assert doc.raw == demo_raw()
    assert window.walls_view.tree.topLevelItemCount() == len(start)
    for _ in range(5):
        doc.undo_stack.redo()
    assert _ids(window) == [*start, "W1"]


def test_the_last_wall_cannot_be_deleted(window):
    doc = window.document
    for _ in range(len(doc.project.walls) - 1):
        window.walls_view.delete()
    assert len(doc.project.walls) == 1
    window.walls_view.delete()
    assert len(doc.project.walls) == 1
    assert "at least one wall" in window.walls_view.message.text()


def test_selecting_a_wall_shows_its_inputs_and_drawings(qtbot, window):
    """Clicking E4 in the list: the form shows its stem, the elevation draws its stem."""
    tree = window.walls_view.tree
    tree.setCurrentItem(tree.topLevelItem(3))
    doc = window.document
    assert doc.current_wall.id == "E4"
    assert window.wall_form.group.field_at(("walls", 3, "stem", "height")).edit.text() == "30 in"
    assert window.drawings.elevation.stem.isVisible()
    assert window.verdict.headline.text().startswith("Wall E4")

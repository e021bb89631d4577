"""A field never shows text the model does not hold, and refusals are told in the field's own words.

Basis: the window review (undo inside a field, dropped input on a wall switch, stale refusals in the
status bar, internal paths in messages).
"""

from __future__ import annotations

import pytest
from kernline.engine.model import Check
from PySide6.QtCore import Qt
from window_helpers import INCH, demo_raw, field, select_wall, type_into


def _live_type(qtbot, window, f, text: str) -> None:
    """Type ``text`` without Enter and wait for the typing pause to apply it."""
    f.edit.setFocus()
    f.edit.selectAll()
    qtbot.keyClick(f.edit, Qt.Key.Key_Backspace)
    qtbot.keyClicks(f.edit, text)
    qtbot.waitUntil(lambda: not f._timer.isActive(), timeout=3000)


def test_ctrl_z_in_a_field_after_a_live_edit_undoes_the_document_once(qtbot, window):
    """Width 20 in (Enter), thickness 20 live, Ctrl+Z in the field: thickness back to 12 in, width kept, field agrees."""
    doc = window.document
    type_into(qtbot, field(window, "footing", "width"), "20 in")
    thickness = field(window, "footing", "thickness")
    _live_type(qtbot, window, thickness, "20")
    assert doc.current_wall.footing.thickness == pytest.approx(20 * INCH)
    qtbot.keyClick(thickness.edit, Qt.Key.Key_Z, Qt.KeyboardModifier.ControlModifier)
    assert doc.current_wall.footing.thickness == pytest.approx(12 * INCH)  # demo value
    assert doc.current_wall.footing.width == pytest.approx(20 * INCH)  # one step undone, not two
    assert thickness.edit.text() == "12 in"
    qtbot.keyClick(thickness.edit, Qt.Key.Key_Tab)
    assert doc.current_wall.footing.thickness == pytest.approx(12 * INCH)
    assert thickness.edit.text() == "12 in"
    thickness.edit.setFocus()
    qtbot.keyClick(thickness.edit, Qt.Key.Key_Z, Qt.KeyboardModifier.ControlModifier | Qt.KeyboardModifier.ShiftModifier)
    assert doc.current_wall.footing.thickness == pytest.approx(20 * INCH)
    assert thickness.edit.text() == "20 in"


def test_ctrl_z_in_a_field_holding_refused_text_puts_back_the_model_value(qtbot, window):
    """ "abc" refused in Footing width B; Ctrl+Z shows 18 in again and undoes nothing else."""
    doc = window.document
    f = field(window, "footing", "width")
    type_into(qtbot, f, "abc")
    assert f.error.isVisible()
    qtbot.keyClick(f.edit, Qt.Key.Key_Z, Qt.KeyboardModifier.ControlModifier)
    assert f.edit.text() == "18 in" and not f.invalid
    assert doc.raw == demo_raw() and doc.undo_stack.count() == 0


def test_an_invalid_entry_dropped_by_a_wall_switch_is_reported(qtbot, window):
    """ "abc" in N1's Footing width B, then select S2: the status bar says what was discarded, and where."""
    type_into(qtbot, field(window, "footing", "width"), "abc")
    select_wall(window, "S2")
    message = window.statusBar().currentMessage()
    assert '"abc" in Footing width B of wall N1' in message and "Discarded" in message


def test_a_refusal_notice_is_cleared_by_the_next_edit_that_goes_through(qtbot, window):
    """Soil cover -1 is refused (status says so); Footing width 20 in then applies and the notice goes."""
    type_into(qtbot, field(window, "footing", "cover"), "-1")
    assert window.statusBar().currentMessage().startswith("Not applied")
    type_into(qtbot, field(window, "footing", "width"), "20 in")
    assert window.statusBar().currentMessage() == ""


def test_refusals_name_fields_by_their_labels_not_their_paths(qtbot, window):
    """Soil cover, S_DS and the required overturning ratio are named as the form names them."""
    bar = window.statusBar()
    type_into(qtbot, field(window, "footing", "cover"), "-1")
    assert bar.currentMessage().startswith("Not applied — Soil cover: ")
    assert field(window, "footing", "cover").error.text().startswith("must not be negative")
    type_into(qtbot, field(window, "criteria", "sds"), "-1")
    assert "S_DS: " in bar.currentMessage() and "sds:" not in bar.currentMessage()
    type_into(qtbot, field(window, "criteria", "required", "overturning"), "-2")
    assert "Required overturning ratio: " in bar.currentMessage()
    assert "required.overturning" not in bar.currentMessage()


def test_the_error_under_a_field_speaks_of_that_field(qtbot, window):
    """Wall thickness 30 in (wider than the footing): the field's message has no other field's name in front."""
    f = field(window, "thickness")
    type_into(qtbot, f, "30 in")
    assert f.error.isVisible()
    assert not f.error.text().lower().startswith("footing width")
    assert "narrower than the wall" in f.error.text()
    # the whole message is in the field's tooltip (the field shows it shortened, inside itself)
    assert f.error.text() in f.edit.toolTip()


def test_a_load_refusal_is_told_by_row_and_column_without_the_path(qtbot, window):
    """A lateral load made case D: "Row n, case: ..." with no "loads[" path; the row is scrolled into view."""
    loads = window.wall_form.loads
    row = next(r for r in range(loads.table.rowCount()) if loads.table.item(r, 0).text() == "lateral")
    loads.table.item(row, 1).setText("D")
    text = loads.message.text()
    assert text.startswith(f"Row {row + 1}, case: ")
    assert "loads[" not in text and "walls[" not in text


def test_si_projects_get_an_si_example_in_messages(qtbot, window):
    """In SI a bad width is refused with an example in millimetres, not inches."""
    window.set_units("SI")
    f = field(window, "footing", "width")
    type_into(qtbot, f, "abc")
    assert '"600 mm"' in f.error.text() and '"24 in"' not in f.error.text()


def test_a_missing_file_is_named_once(window, tmp_path, dialogs):
    """Opening a file that does not exist: the warning names its path once."""
    missing = tmp_path / "gone.kernline"
    assert not window.open_path(str(missing))
    assert dialogs.warnings[0].count(str(missing)) == 1


def test_the_undo_menu_keeps_the_labels_case(qtbot, window):
    """After a width edit the Edit menu reads "Undo Set footing width B" (the symbol B stays upper case)."""
    type_into(qtbot, field(window, "footing", "width"), "20 in")
    assert window.document.undo_stack.undoText() == "Set footing width B"


def test_a_wall_without_lateral_load_says_so(qtbot, window):
    """A new project's wall (dead load only): the elevation says "no lateral load"; "no demand" is said once per row."""
    window.new_project()
    for path, text in ((("soil", "allowable_bearing"), "2000"), (("soil", "friction"), "0.35"), (("soil", "unit_weight"), "110")):
        type_into(qtbot, field(window, *path), text)
    assert "no lateral load" in window.drawings.elevation_caption.text()
    assert "direction" not in window.drawings.elevation_caption.text()
    ratio, mark, _case = window.verdict.texts()["overturning"]
    assert ratio == "no demand" and "no demand" not in mark


def test_reversing_loads_drawn_mirrored_are_explained(qtbot, window):
    """E4 shown for a direction "-" case: the caption says reversing loads are drawn mirrored."""
    select_wall(window, "E4")
    doc = window.document
    case = next(c for c in doc.current_result.table.cases if c.direction.value == "-")
    doc.set_case_choice(("case", case.combination.name, "-"))
    assert "mirrored" in window.drawings.elevation_caption.text()


def test_a_case_without_equilibrium_reads_no_equilibrium(qtbot, window):
    """A 400 kip wind shear on N1 tips the footing: the verdict's bearing ratio reads "no equilibrium", marked NG."""
    loads = window.wall_form.loads
    row = next(r for r in range(loads.table.rowCount()) if loads.table.item(r, 0).text() == "lateral")
    loads.table.item(row, 2).setText("400 kip")
    result = window.document.current_result
    assert not result.cases[result.governing[Check.BEARING].case_index].bearing.stable  # the engine's finding
    ratio, mark, _case = window.verdict.texts()["bearing"]
    assert ratio == "no equilibrium" and "NG" in mark

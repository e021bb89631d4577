"""Typing into the forms: the model, the drawings and the verdict follow with the engine's numbers;
bad entries are refused at the field and the last valid model stays in force."""

from __future__ import annotations

import math

import numpy as np
import pytest
from kernline.engine.model import ALL_CHECKS, Check
from kernline.engine.summary import comparison_text
from PySide6.QtCore import Qt
from window_helpers import INCH, demo_raw, engine_answer, engine_pressure_psf, field, select_wall, type_into


def test_typing_a_footing_width_updates_model_drawings_and_verdict(qtbot, window):
    """Width "24" (bare number, inches) on C3: raw gets "24 in"; pressure data and ratios equal the engine's."""
    select_wall(window, "C3")
    doc = window.document
    f = field(window, "footing", "width")
    type_into(qtbot, f, "24")

    assert doc.raw["walls"][2]["footing"]["width"] == "24 in"
    assert doc.current_wall.footing.width == pytest.approx(24 * INCH, rel=1e-12)
    assert f.edit.text() == "24 in"
    assert doc.undo_stack.count() == 1

    raw = demo_raw()
    raw["walls"][2]["footing"]["width"] = "24 in"
    _project, _wall, expected = engine_answer(raw, "C3")
    shown = window.verdict.texts()
    for check in ALL_CHECKS:
        g = expected.governing[check]
        assert shown[check.value][0] == comparison_text(g, expected, "US")  # the engine's demand and capacity
        assert (g.combination in shown[check.value][2]) or math.isinf(g.ratio)
    # the pressure drawn is the engine's diagram of the governing bearing case (default choice)
    index = expected.governing[Check.BEARING].case_index
    np.testing.assert_allclose(window.drawings.pressure.shown_q, engine_pressure_psf(expected, index), rtol=1e-9)
    # the elevation's footing is drawn 24 in wide in the caption and L long in the drawing (ft)
    assert window.drawings.elevation.footing_rect().width() == pytest.approx(expected.length / 0.3048)


def test_a_load_typed_in_the_table_reaches_the_elevation_and_the_verdict(qtbot, window):
    """The D line load of N1 set to 900 plf: the arrow label and the governing ratios are the engine's."""
    doc = window.document
    table = window.wall_form.loads.table
    item = table.item(0, 2)
    item.setText("900")
    assert doc.raw["walls"][0]["loads"][0]["value"] == "900 plf"
    assert any("D 900" in t for t in window.drawings.elevation.label_texts())
    raw = demo_raw()
    raw["walls"][0]["loads"][0]["value"] = "900 plf"
    _p, _w, expected = engine_answer(raw, "N1")
    for check in ALL_CHECKS:
        assert window.verdict.texts()[check.value][0] == comparison_text(expected.governing[check], expected, "US")


def test_text_with_any_unit_is_accepted(qtbot, window):
    """ "600 mm" in a US project is stored as typed and shown in inches (600 / 25.4 = 23.622 in)."""
    doc = window.document
    f = field(window, "footing", "width")
    type_into(qtbot, f, "600 mm")
    assert doc.raw["walls"][0]["footing"]["width"] == "600 mm"
    assert doc.current_wall.footing.width == pytest.approx(0.6, rel=1e-12)
    assert f.edit.text() == "23.622 in"
    type_into(qtbot, field(window, "length"), "2 ft 6 in")
    assert doc.current_wall.length == pytest.approx(0.762, rel=1e-12)


@pytest.mark.parametrize(
    ("path", "text", "words"),
    [
        (("footing", "width"), "abc", 'expected a length such as "24 in"'),
        (("footing", "width"), "3 kip", "expected a length"),
        (("footing", "width"), "2 in", "narrower than the wall"),
        (("length",), "-4", "greater than zero"),
    ],
)
def test_invalid_entries_are_refused_at_the_field(qtbot, window, path, text, words):
    """A bad entry is marked with a message; the raw document, the model and the undo stack are unchanged."""
    doc = window.document
    raw_before = demo_raw()
    project_before = doc.project
    f = field(window, *path)
    type_into(qtbot, f, text)
    assert f.error.isVisible()
    assert words in f.error.text()
    assert f.edit.property("invalid") is True
    assert f.edit.text() == text  # the typing is kept for correcting
    assert doc.raw == raw_before
    assert doc.project is project_before
    assert doc.undo_stack.count() == 0
    # correcting it clears the mark
    type_into(qtbot, f, "20 in" if "width" in path else "32 ft")
    assert not f.error.isVisible()
    assert doc.undo_stack.count() == 1


def test_live_typing_applies_after_a_pause_and_merges_into_one_undo_step(qtbot, window):
    """Typing pauses apply a valid entry without Enter; Enter then adds no second undo step."""
    doc = window.document
    f = field(window, "footing", "width")
    f.edit.selectAll()
    qtbot.keyClick(f.edit, Qt.Key.Key_Backspace)
    qtbot.keyClicks(f.edit, "30")
    qtbot.waitUntil(lambda: doc.current_wall.footing.width == pytest.approx(30 * INCH), timeout=3000)
    assert doc.undo_stack.count() == 1
    qtbot.keyClicks(f.edit, " in")
    qtbot.keyClick(f.edit, Qt.Key.Key_Return)
    assert doc.undo_stack.count() == 1
    doc.undo_stack.undo()
    assert doc.raw["walls"][0]["footing"]["width"] == "18 in"


def test_arrow_keys_step_a_footing_dimension_by_the_sizing_step(qtbot, window):
    """Up in the width field adds the wall's width step (1 in in the demo)."""
    doc = window.document
    f = field(window, "footing", "width")
    qtbot.keyClick(f.edit, Qt.Key.Key_Up)
    assert doc.current_wall.footing.width == pytest.approx(19 * INCH)
    assert f.edit.text() == "19 in"


def test_undo_and_redo_of_a_field_edit(qtbot, window):
    """Undo restores the raw text, the field and the verdict; redo brings the edit back."""
    doc = window.document
    select_wall(window, "C3")
    before = window.verdict.texts()
    f = field(window, "footing", "width")
    type_into(qtbot, f, "30 in")
    after = window.verdict.texts()
    assert after != before
    window.undo_action.trigger()
    assert doc.raw == demo_raw()
    assert f.edit.text() == "16 in"
    assert window.verdict.texts() == before
    window.redo_action.trigger()
    assert doc.raw["walls"][2]["footing"]["width"] == "30 in"
    assert f.edit.text() == "30 in"
    assert window.verdict.texts() == after


def test_project_wide_fields_and_choices_recheck_every_wall(qtbot, window):
    """Allowable bearing 1500 psf: every wall's results are the engine's for the new soil."""
    doc = window.document
    type_into(qtbot, field(window, "soil", "allowable_bearing"), "1500")
    assert doc.raw["soil"]["allowable_bearing"] == "1500 psf"
    raw = demo_raw()
    raw["soil"]["allowable_bearing"] = "1500 psf"
    for wall in doc.project.walls:
        _p, _w, expected = engine_answer(raw, wall.id)
        assert doc.results[wall.id].governing[Check.BEARING].ratio == pytest.approx(
            expected.governing[Check.BEARING].ratio, rel=1e-12
        )
    form = window.project_form
    form.method.setCurrentIndex(form.method.findData("service-fs"))
    form.method.activated.emit(form.method.currentIndex())
    assert doc.raw["criteria"]["method"] == "service-fs"
    assert doc.project.criteria.required.overturning == 2.0  # service-fs default (common practice)


def test_custom_combinations_are_editable_as_a_table(qtbot, window):
    """Switching to our own list copies the preset; a factor typed in the table reaches the engine."""
    doc = window.document
    editor = window.project_form.combinations
    editor.custom.setChecked(True)
    combos = doc.raw["criteria"]["combinations"]
    assert [c["name"] for c in combos][:2] == ["D", "D + L"]
    assert editor.edit_cell(1, 2, "0.5") is None  # D + L -> D + 0.5L
    assert doc.project.criteria.custom_combinations[1].factors[1][1] == 0.5
    assert editor.edit_cell(1, 2, "half") is not None  # refused, kept
    assert doc.project.criteria.custom_combinations[1].factors[1][1] == 0.5
    doc.undo_stack.undo()
    doc.undo_stack.undo()
    assert "combinations" not in doc.raw["criteria"]


def test_a_bad_load_cell_is_refused_and_marked(qtbot, window):
    """ "lots" in a value cell: message under the table, the cell marked, the load unchanged."""
    from kernline.app.views.forms import _ERROR_ROLE

    doc = window.document
    loads = window.wall_form.loads
    loads.table.item(0, 2).setText("lots")
    assert loads.message.isVisible()
    assert "Row 1, value" in loads.message.text() and "force per length" in loads.message.text()
    assert loads.table.item(0, 2).text() == "520 plf"
    assert loads.table.item(0, 2).data(_ERROR_ROLE)
    assert doc.raw == demo_raw()
    # a lateral height edited in place ("h 21 ft" -> "h 24 ft") and a lateral load made case D are handled
    row = next(r for r in range(loads.table.rowCount()) if loads.table.item(r, 0).text() == "lateral")
    loads.table.item(row, 3).setText("h 24 ft")
    assert doc.raw["walls"][0]["loads"][row]["height"] == "24 ft"
    assert not loads.message.isVisible()
    loads.table.item(row, 1).setText("D")
    assert "lateral loads must be case W or E" in loads.message.text() or "expected one of W, E" in loads.message.text()
    assert doc.raw["walls"][0]["loads"][row]["case"] == "W"


def test_changing_a_load_type_keeps_its_label(qtbot, window):
    doc = window.document
    loads = window.wall_form.loads
    loads.table.item(0, 0).setText("point")
    load = doc.raw["walls"][0]["loads"][0]
    assert load["type"] == "point" and load["label"] == "roof, floor and wall dead" and load["at"] == "0 ft"
    doc.undo_stack.undo()
    assert doc.raw == demo_raw()

"""The case picker, the table of all cases, the schedule, the About box and the caution line."""

from __future__ import annotations

import numpy as np
from kernline.engine import CAUTION
from kernline.engine.model import Check
from kernline.engine.schedule import schedule_csv
from PySide6.QtCore import Qt
from PySide6.QtWidgets import QApplication
from window_helpers import engine_pressure_psf, select_wall


def test_the_picker_shows_any_case_in_the_pressure_plot(window):
    doc = window.document
    select_wall(window, "S2")
    picker = window.drawings.picker
    result = doc.current_result
    target = next(i for i, c in enumerate(result.table.cases) if c.combination.name == "D + L")
    for i in range(picker.count()):
        if picker.itemData(i) == ("case", "D + L", "none"):
            picker.setCurrentIndex(i)
            picker.activated.emit(i)
            break
    assert doc.chosen_case_index() == target
    np.testing.assert_allclose(window.drawings.pressure.shown_q, engine_pressure_psf(result, target), rtol=1e-9)
    assert "N " in window.drawings.caption.text()
    # governing overturning of S2 acts in the '-' direction: the lateral arrows point toward x = 0
    doc.set_case_choice(("governing", Check.OVERTURNING))
    assert result.governing[Check.OVERTURNING].direction == "-"
    assert window.drawings.elevation.heads.data["symbol"].tolist().count("t3") >= 1


def test_the_cases_table_lists_every_case_and_sorts(qtbot, window):
    doc = window.document
    select_wall(window, "C3")
    table = window.cases_table
    window.tabs.setCurrentWidget(table)
    strength = doc.current_result.strength_table  # the demo has a concrete design: its strength cases follow
    assert table.model().rowCount() == len(doc.current_result.cases) + (len(strength.cases) if strength else 0)
    table.sortByColumn(8, Qt.SortOrder.AscendingOrder)  # bearing ratio / required, lowest first
    first = table.model().index(0, 0).data()
    governing = doc.current_result.governing[Check.BEARING]
    assert first == governing.combination
    assert table.model().index(0, 8).data().startswith(f"{governing.ratio:.2f} ✗")
    table.case_activated.emit(0)
    assert doc.case_choice[0] == "case"


def test_schedule_copy_and_csv_export(qtbot, window, tmp_path, dialogs):
    doc = window.document
    window.tabs.setCurrentWidget(window.schedule)
    assert window.schedule.table.rowCount() == len(doc.project.walls)
    window.schedule.copy()
    copied = QApplication.clipboard().text().splitlines()
    assert copied[0].split("\t")[0] == "Wall"
    assert copied[3].split("\t")[0] == "C3" and copied[3].endswith("FAIL")
    dialogs.save_path = str(tmp_path / "schedule.csv")
    assert window.export_schedule()
    assert (tmp_path / "schedule.csv").read_bytes().decode("utf-8-sig") == schedule_csv(doc.project)


def test_about_box_and_caution_line_carry_the_caution(window, dialogs):
    assert window.caution.text() == CAUTION
    assert window.caution.isVisible()
    window.about_action.trigger()
    assert CAUTION in dialogs.abouts[0]


def test_every_input_has_a_tooltip(window):
    """Tooltips define each input. (Tab order: tests/app/test_forms_layout_and_keys.py presses Tab through
    both forms; Qt's focus chain also holds widgets that take no focus, so it is not compared here.)"""
    fields = window.wall_form.group.fields + window.project_form.group.fields
    assert all(f.edit.toolTip() and f.spec.tip in f.edit.toolTip() for f in fields)

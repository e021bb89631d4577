"""The forms hold still and answer the keyboard: a refusal is told inside its field (the rows below do
not move), Tab reaches every input in the order the form shows them, folded sections open from the
keyboard, and the wording says where positions are measured from."""

from __future__ import annotations

import pytest
from kernline.app.views.fields import unit_label
from kernline.app.views.forms import LOAD_COLUMNS
from PySide6.QtCore import QPoint, Qt
from PySide6.QtWidgets import QApplication, QWidget
from window_helpers import field, type_into


def _y(widget: QWidget, window) -> int:
    return widget.mapTo(window, QPoint(0, 0)).y()


@pytest.mark.parametrize(("path", "text"), [(("footing", "width"), "abc"), (("footing", "width"), "2 in")])
def test_a_refusal_does_not_push_the_rows_below_down(qtbot, window, path, text):
    below = field(window, "footing", "thickness")
    form_height = window.wall_form.height()
    y_before = _y(below, window)
    f = field(window, *path)
    type_into(qtbot, f, text)
    QApplication.processEvents()
    assert f.invalid and f.error.isVisible() and f.error.text()
    assert _y(below, window) == y_before and window.wall_form.height() == form_height
    # the message sits inside the field, clear of the typing, and whole in the tooltip
    assert f.edit.rect().contains(f.error.geometry())
    assert f.edit.textMargins().right() >= f.error.width()
    assert f.error.text() in f.edit.toolTip()
    type_into(qtbot, f, "20 in")
    assert not f.invalid and f.edit.textMargins().right() == 0


def test_a_refused_load_cell_keeps_the_buttons_in_place(qtbot, window):
    loads = window.wall_form.loads
    button = loads.add_buttons["line"]
    y_before = _y(button, window)
    loads.table.item(0, 2).setText("abc")
    QApplication.processEvents()
    assert loads.message.isVisible() and "Row 1, value" in loads.message.text()
    assert _y(button, window) == y_before
    assert loads.message.toolTip() == loads.message.text()  # whole in the tooltip when shortened


def _tab_through(qtbot, window, start: QWidget, stop: QWidget, limit: int = 400) -> list[QWidget]:
    """Press Tab from ``start`` until ``stop`` has the focus; returns the widgets focused on the way."""
    start.setFocus()
    qtbot.waitUntil(lambda: QApplication.focusWidget() is start, timeout=2000)
    seen = [start]
    for _ in range(limit):
        qtbot.keyClick(QApplication.focusWidget(), Qt.Key.Key_Tab)
        now = QApplication.focusWidget()
        if now is stop:
            return seen
        if now is not seen[-1]:  # an editable table keeps the focus while Tab walks its cells
            seen.append(now)
    raise AssertionError("Tab never reached the end of the forms")


def test_tab_reaches_every_input_of_both_forms_in_order(qtbot, window):
    window.activateWindow()
    qtbot.waitActive(window)
    for form in (window.wall_form, window.project_form):
        for section in form.sections.values():
            section.toggle.setChecked(True)  # every section open: every input is on the way
    window.wall_form.set_choice(("footing", "reinforcement"), "entered")
    expected = [
        w
        for w in (*window.wall_form.focus_order(), *window.project_form.focus_order())
        if w.isVisibleTo(window) and w.isEnabled()
    ]
    seen = _tab_through(qtbot, window, window.walls_view.tree, window.drawings.picker)
    visited = [w for w in seen if w in expected]
    names = lambda ws: [w.objectName() or w.text() for w in ws]  # noqa: E731
    assert names(visited) == names(expected)
    # the fields of the concrete design are among them
    for key in ("fc", "fy", "cover", "lambda"):
        assert field(window, "concrete", key).edit in visited
    assert field(window, "footing", "reinforcement", "transverse").edit in visited
    assert window.wall_form.choices[("construction",)].box in visited


def test_a_folded_section_opens_from_the_keyboard(qtbot, window):
    window.activateWindow()
    qtbot.waitActive(window)
    section = window.project_form.sections["Project"]
    section.toggle.setChecked(False)
    section.toggle.setFocus()
    qtbot.waitUntil(lambda: QApplication.focusWidget() is section.toggle, timeout=2000)
    qtbot.keyClick(section.toggle, Qt.Key.Key_Space)
    assert section.toggle.isChecked() and section.content.isVisible()
    qtbot.keyClick(section.toggle, Qt.Key.Key_Tab)
    assert QApplication.focusWidget() is field(window, "project", "name").edit


def test_positions_say_what_they_are_measured_from(window):
    loads = window.wall_form.loads
    header = loads.table.horizontalHeaderItem(3)
    assert LOAD_COLUMNS[3] == header.text() and "x" in header.text() and "h" in header.text()
    assert "from the wall's start end" in header.toolTip()
    assert "above the top of the footing" in header.toolTip()  # engine/model.py's coordinate contract
    assert "from the wall's start end" in loads.where.text()
    assert "from the wall's start end" in loads.table.horizontalHeaderItem(4).toolTip()
    assert window.project_form.combinations.custom.text() == "Edit the combinations for this project"


def test_unit_weights_are_shown_in_kn_per_cubic_metre(qtbot, window):
    window.set_units("SI")
    f = field(window, "soil", "unit_weight")
    assert unit_label(f.spec, "SI").endswith("(kN/m³)")
    assert f.edit.text().endswith(" kN/m³") and "^" not in f.edit.text()
    type_into(qtbot, f, "18")
    assert window.document.raw["soil"]["unit_weight"] == "18 kN/m³"
    assert window.document.project.soil.unit_weight == pytest.approx(18e3)

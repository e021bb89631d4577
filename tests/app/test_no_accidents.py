"""Inputs that do not change by accident, and saves that never hide an entry in error: a field holding
text that is not valid stops Save with its name; the wheel turns no unfocused choice box; a change of
a project-wide design value is named in the status bar."""

from __future__ import annotations

from kernline.app.views import fields
from kernline.app.views.fields import display_text
from kernline.engine.project_file import load_project
from PySide6.QtCore import QPoint, QPointF, Qt
from PySide6.QtGui import QWheelEvent
from PySide6.QtWidgets import QApplication, QMessageBox
from window_helpers import field, select_wall, type_into


def test_save_stops_on_an_entry_that_is_not_valid(qtbot, make_window, demo_file, dialogs):
    window = make_window(str(demo_file))
    original = demo_file.read_bytes()
    type_into(qtbot, field(window, "footing", "thickness"), "14")  # a valid edit: the project is unsaved
    width = field(window, "footing", "width")
    width.edit.selectAll()
    qtbot.keyClicks(width.edit, "16 ftt")  # typed, no Enter: Ctrl+S comes straight after
    assert not window.save()
    assert demo_file.read_bytes() == original  # nothing written
    assert len(dialogs.warnings) == 1 and "Not saved" in dialogs.warnings[0]
    assert "Footing width B" in dialogs.warnings[0] and "16 ftt" in dialogs.warnings[0]
    assert not window.statusBar().currentMessage().startswith("Saved")
    assert "Footing width B" in window.statusBar().currentMessage()
    assert window.isWindowModified() and window.document.dirty  # the unsaved mark stays
    assert width.edit.text() == "16 ftt" and width.invalid  # the entry and its reason stay at the field

    type_into(qtbot, width, "16 ft")  # corrected (a footing 16 ft wide is legal, if odd)
    assert window.save()
    assert load_project(demo_file).raw["walls"][0]["footing"]["width"] == "16 ft"
    assert window.statusBar().currentMessage().startswith("Saved")


def test_save_as_stops_too_and_asks_for_no_file_name(qtbot, window, dialogs, tmp_path):
    type_into(qtbot, field(window, "soil", "cohesion"), "12 pfs")
    dialogs.save_path = str(tmp_path / "x.kernline")
    assert not window.save_as()
    assert not (tmp_path / "x.kernline").exists()
    assert "Cohesion" in dialogs.warnings[0]


def test_export_schedule_applies_typing_first(qtbot, window, dialogs, tmp_path):
    width = field(window, "footing", "width")
    width.edit.selectAll()
    qtbot.keyClicks(width.edit, "30")
    dialogs.save_path = str(tmp_path / "s.csv")
    assert window.export_schedule()
    assert window.document.raw["walls"][0]["footing"]["width"] == "30 in"
    assert "2'-6\"" in (tmp_path / "s.csv").read_text(encoding="utf-8-sig")


def test_another_wall_asks_before_an_entry_in_error_is_dropped(qtbot, window, dialogs):
    doc = window.document
    width = field(window, "footing", "width")
    type_into(qtbot, width, "16 ftt")
    assert width.invalid
    dialogs.answer = QMessageBox.StandardButton.Cancel
    select_wall(window, "S2")
    assert doc.current_wall.id == "N1"  # stayed
    assert "16 ftt" in dialogs.questions[-1] and "Footing width B" in dialogs.questions[-1]
    assert width.edit.text() == "16 ftt" and width.invalid
    # the walls list, clicked: it shows the wall still in force again
    tree = window.walls_view.tree
    tree.setCurrentItem(tree.topLevelItem(1))
    qtbot.waitUntil(lambda: tree.currentItem() is tree.topLevelItem(0), timeout=2000)
    assert doc.current_wall.id == "N1"

    dialogs.answer = QMessageBox.StandardButton.Discard
    select_wall(window, "S2")
    assert doc.current_wall.id == "S2"
    assert not width.invalid and width.edit.text() == display_text(width.spec, doc.project, doc.current_wall)


def test_the_wheel_over_an_unfocused_choice_box_changes_nothing(qtbot, window):
    doc = window.document
    box = window.project_form.basis
    window.forms_scroll.ensureWidgetVisible(box)
    assert box.focusPolicy() == Qt.FocusPolicy.StrongFocus
    window.walls_view.tree.setFocus()
    index, depth, raw = box.currentIndex(), doc.undo_stack.count(), doc.raw["soil"]["bearing_basis"]

    def make_event(steps: int) -> QWheelEvent:
        centre = QPointF(box.width() / 2, box.height() / 2)
        return QWheelEvent(
            centre,
            QPointF(box.mapToGlobal(QPoint(int(centre.x()), int(centre.y())))),
            QPoint(0, 0),
            QPoint(0, -120 * steps),
            Qt.MouseButton.NoButton,
            Qt.KeyboardModifier.NoModifier,
            Qt.ScrollPhase.NoScrollPhase,
            False,
        )

    def wheel(steps: int) -> None:
        QApplication.sendEvent(box, make_event(steps))

    wheel(1)
    assert box.currentIndex() == index and doc.undo_stack.count() == depth
    assert doc.raw["soil"]["bearing_basis"] == raw
    # the guard filters the event and marks it ignored: Qt then offers a real (spontaneous) wheel
    # event to the parents, so the form's scroll area scrolls
    event = make_event(1)
    assert fields.WHEEL_GUARD.eventFilter(box, event) and not event.isAccepted()

    box.setFocus()  # with keyboard focus the wheel does turn it (so the guard above is what stopped it)
    qtbot.waitUntil(box.hasFocus, timeout=2000)
    wheel(1)
    assert box.currentIndex() != index and doc.undo_stack.count() == depth + 1


def test_a_project_wide_change_is_named_in_the_status_bar(qtbot, window):
    box = window.project_form.basis
    box.setCurrentIndex(box.findData("net"))
    box.activated.emit(box.currentIndex())
    assert window.document.raw["soil"]["bearing_basis"] == "net"
    assert window.statusBar().currentMessage() == "Allowable is: gross → net of overburden — Ctrl+Z undoes"
    type_into(qtbot, field(window, "soil", "allowable_bearing"), "1500")
    assert window.statusBar().currentMessage() == "Allowable bearing: 2000 psf → 1500 psf — Ctrl+Z undoes"
    type_into(qtbot, field(window, "criteria", "sds"), "0.8")
    assert window.statusBar().currentMessage() == "S_DS: 0.6 → 0.8 — Ctrl+Z undoes"


def test_a_wall_field_is_not_announced(qtbot, window):
    window.statusBar().clearMessage()
    type_into(qtbot, field(window, "footing", "width"), "20")
    assert "→" not in window.statusBar().currentMessage()

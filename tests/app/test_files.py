"""Project files from the window: open, save, save as, recent files, the unsaved-changes prompt and
the modified marker (recovery after a crash: test_recovery.py)."""

from __future__ import annotations

import json

from kernline.engine.project_file import load_project
from PySide6.QtWidgets import QMessageBox
from window_helpers import field, type_into


def test_open_then_save_leaves_the_file_byte_identical(qtbot, make_window, demo_file):
    original = demo_file.read_bytes()
    window = make_window(str(demo_file))
    assert window.document.path == demo_file
    assert window.save()
    assert demo_file.read_bytes() == original
    # an edit undone is no change either
    type_into(qtbot, field(window, "footing", "width"), "22 in")
    window.document.undo_stack.undo()
    assert window.save()
    assert demo_file.read_bytes() == original


def test_an_edit_saved_and_reopened_is_the_same_project(qtbot, make_window, demo_file, tmp_path, dialogs):
    window = make_window(str(demo_file))
    type_into(qtbot, field(window, "footing", "width"), "22")
    assert window.isWindowModified()
    dialogs.save_path = str(tmp_path / "copy")  # Save As adds the extension
    assert window.save_as()
    saved = tmp_path / "copy.kernline"
    assert window.document.path == saved
    assert not window.isWindowModified()
    assert "copy.kernline" in window.windowTitle()
    reopened = load_project(saved)
    assert reopened.raw == window.document.raw
    assert reopened.project == window.document.project
    assert reopened.raw["walls"][0]["footing"]["width"] == "22 in"
    # everything else is as it was, key order included
    before = json.loads(demo_file.read_text(encoding="utf-8"))
    before["walls"][0]["footing"]["width"] = "22 in"
    assert saved.read_text(encoding="utf-8") == json.dumps(before, indent=2, ensure_ascii=False) + "\n"
    # a file Kernline wrote, opened and saved again, is unchanged to the byte
    written = saved.read_bytes()
    assert window.open_path(str(saved))
    assert window.save()
    assert saved.read_bytes() == written


def test_title_carries_the_modified_marker(qtbot, window):
    assert "[*]" in window.windowTitle()
    assert not window.isWindowModified()
    type_into(qtbot, field(window, "footing", "width"), "20")
    assert window.isWindowModified()
    window.document.undo_stack.undo()
    assert not window.isWindowModified()


def test_unsaved_changes_prompt_before_open_new_and_close(qtbot, window, dialogs, demo_file):
    doc = window.document
    type_into(qtbot, field(window, "footing", "width"), "20")
    dialogs.answer = QMessageBox.StandardButton.Cancel
    assert not window.open_path(str(demo_file))
    window.new_project()
    assert not window.close()
    assert len(dialogs.questions) == 3 and "Unsaved changes" in dialogs.questions[0]
    assert doc.raw["walls"][0]["footing"]["width"] == "20 in"  # nothing was lost
    assert window.isVisible()
    dialogs.answer = QMessageBox.StandardButton.Discard
    window.new_project()
    assert [w.id for w in doc.project.walls] == ["W1"]
    assert not doc.dirty


def test_answering_save_saves_before_going_on(qtbot, make_window, demo_file, dialogs, tmp_path):
    window = make_window(str(demo_file))
    type_into(qtbot, field(window, "footing", "width"), "21")
    dialogs.answer = QMessageBox.StandardButton.Save
    window.open_demo()
    assert load_project(demo_file).raw["walls"][0]["footing"]["width"] == "21 in"
    assert window.document.is_demo


def test_a_file_that_cannot_be_used_is_reported_and_the_project_kept(window, tmp_path, dialogs):
    bad = tmp_path / "bad.kernline"
    bad.write_text('{"format": "kernline-project", "version": 1, "walls": [{"id": "A1", "length": "20"}]}', encoding="utf-8")
    before = window.document.project
    assert not window.open_path(str(bad))
    assert window.document.project is before
    assert "walls[0].length" in dialogs.warnings[0]


def test_recent_files_are_remembered_in_settings(make_window, demo_file, settings):
    window = make_window(str(demo_file))
    assert window.recent_files() == [str(demo_file.resolve())]
    assert settings.value("recent_files") == [str(demo_file.resolve())]
    assert window.recent_menu.actions()[0].toolTip() == str(demo_file.resolve())

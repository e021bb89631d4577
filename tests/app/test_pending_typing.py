"""Typing still waiting for its pause is applied before a save (no lost keystrokes)."""

from kernline.engine.project_file import load_project
from PySide6.QtWidgets import QFileDialog


def test_save_applies_typing_that_has_not_paused(window, tmp_path, monkeypatch):
    """Type a footing width and save at once: the saved file holds the typed width."""
    field = next(f for f in window.wall_form.group.fields if f.spec.path[-1] == "width" and "footing" in f.spec.path)
    field.edit.setText("31 in")
    field.edit.textEdited.emit("31 in")  # as a keystroke does: the live timer starts, nothing applied yet
    assert field._timer.isActive()
    path = tmp_path / "p.kernline"
    monkeypatch.setattr(QFileDialog, "getSaveFileName", staticmethod(lambda *a, **k: (str(path), "")))
    assert window.save_as()
    widths = [w.footing.width for w in load_project(path).project.walls]
    assert any(abs(b - 31 * 0.0254) < 1e-9 for b in widths), widths

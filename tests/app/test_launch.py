"""`kernline demo` / `kernline open FILE` call app.main_window.launch: it shows the window and returns
the event loop's exit code."""

from __future__ import annotations

import json

import kernline.app.main_window as main_window
from kernline.engine.resources import resource_path
from PySide6.QtCore import QSettings, QTimer
from PySide6.QtWidgets import QApplication


def _run_launch(monkeypatch, tmp_path, **kwargs) -> tuple[int, list]:
    monkeypatch.setattr(main_window, "QSettings", lambda *a: QSettings(str(tmp_path / "s.ini"), QSettings.Format.IniFormat))
    monkeypatch.setattr(main_window, "default_recovery_dir", lambda: tmp_path / "recovery")
    seen = []

    def close_windows():
        for w in QApplication.topLevelWidgets():
            if isinstance(w, main_window.MainWindow) and w.isVisible():
                seen.append((w.document.display_name, [wall.id for wall in w.document.project.walls]))
                w.close()

    QTimer.singleShot(0, close_windows)
    return main_window.launch(**kwargs), seen


def test_launch_demo_shows_the_demo_and_returns_zero(qapp, monkeypatch, tmp_path):
    code, seen = _run_launch(monkeypatch, tmp_path, demo=True)
    assert code == 0
    demo = json.loads(resource_path("demo.kernline").read_text(encoding="utf-8"))
    assert seen == [(f"{demo['project']['name']} (demo)", [w["id"] for w in demo["walls"]])]


def test_launch_with_a_file_opens_it(qapp, monkeypatch, tmp_path, demo_file):
    code, seen = _run_launch(monkeypatch, tmp_path, path=str(demo_file))
    assert code == 0
    assert seen[0][0] == "Cedar Hollow Community Clinic (clinic.kernline)"

"""Fixtures of the window tests: a real MainWindow on the demo project, isolated from user settings.

Message boxes are replaced by recorders for every test (a modal box would block an offscreen run);
a test that needs a particular answer sets ``dialogs.answer``.
"""

from __future__ import annotations

import shutil
from pathlib import Path

import pytest
from kernline.engine.resources import resource_path
from PySide6.QtCore import QSettings
from PySide6.QtWidgets import QFileDialog, QMessageBox
from shiboken6 import isValid


class Dialogs:
    """Records message boxes and file dialogs, and answers them."""

    def __init__(self) -> None:
        self.questions: list[str] = []
        self.warnings: list[str] = []
        self.abouts: list[str] = []
        self.answer = QMessageBox.StandardButton.Discard
        self.save_path: str = ""
        self.open_path: str = ""
        # the launch question about work left by windows that did not close: "restore", "discard" or "later"
        self.recovery_answer = "later"
        self.recovery_untick: set[int] = set()  # rows left unticked when restoring
        self.recovery_offers: list[list] = []  # the orphans offered, per question

    def question(self, _parent, title, text, *args, **kwargs):
        self.questions.append(f"{title}: {text}")
        return self.answer

    def warning(self, _parent, title, text, *args, **kwargs):
        self.warnings.append(f"{title}: {text}")
        return QMessageBox.StandardButton.Ok

    def about(self, _parent, title, text):
        self.abouts.append(f"{title}: {text}")

    def recovery(self, _parent, orphans):
        from kernline.app.views.recovery_dialog import RecoveryChoice

        orphans = list(orphans)
        self.recovery_offers.append(orphans)
        if self.recovery_answer == "restore":
            ticked = tuple(o for i, o in enumerate(orphans) if i not in self.recovery_untick)
            return RecoveryChoice(restore=ticked, discard=tuple(o for o in orphans if o not in ticked))
        if self.recovery_answer == "discard":
            return RecoveryChoice(discard=tuple(orphans))
        return RecoveryChoice()


@pytest.fixture(autouse=True)
def dialogs(monkeypatch: pytest.MonkeyPatch) -> Dialogs:
    d = Dialogs()
    monkeypatch.setattr(QMessageBox, "question", d.question)
    monkeypatch.setattr(QMessageBox, "warning", d.warning)
    monkeypatch.setattr(QMessageBox, "about", d.about)
    from kernline.app.views.recovery_dialog import RecoveryDialog

    monkeypatch.setattr(RecoveryDialog, "ask", staticmethod(d.recovery))
    monkeypatch.setattr(QFileDialog, "getSaveFileName", lambda *a, **k: (d.save_path, ""))
    monkeypatch.setattr(QFileDialog, "getOpenFileName", lambda *a, **k: (d.open_path, ""))
    return d


@pytest.fixture
def settings(tmp_path: Path) -> QSettings:
    """A settings file of the test's own (never the user's)."""
    return QSettings(str(tmp_path / "kernline-test-settings.ini"), QSettings.Format.IniFormat)


@pytest.fixture
def demo_file(tmp_path: Path) -> Path:
    """A copy of the demo project in the test's folder."""
    target = tmp_path / "clinic.kernline"
    shutil.copyfile(resource_path("demo.kernline"), target)
    return target


@pytest.fixture
def make_window(qtbot, tmp_path: Path, settings: QSettings):
    """Build windows sharing the test's settings and recovery folder."""
    from kernline.app.main_window import MainWindow

    made = []

    def make(path: str | None = None, demo: bool = True, **kwargs):
        window = MainWindow(settings=settings, recovery_dir=tmp_path / "recovery", **kwargs)
        qtbot.addWidget(window)
        window.start(path, demo=demo and path is None)
        window.show()
        qtbot.waitExposed(window)
        # the last window shown takes the keyboard, as a window manager would give it (offscreen it
        # does at once; on an X server without a window manager, as under xvfb-run, only when asked)
        window.activateWindow()
        qtbot.waitUntil(window.isActiveWindow, timeout=3000)
        made.append(window)
        return window

    yield make
    for window in made:
        for other in list(window.spawned):  # windows it opened for restored documents
            if isValid(other):
                other.runner.wait()
                other.close()
        window.runner.wait()


@pytest.fixture
def window(make_window):
    """The window with the demo project open."""
    return make_window()

"""File > Export calculation package, the welcome panel, the file dialogs' filters, the About box, the
smoke hook of ``launch()`` and the pressure plot's room beside the design map."""

from __future__ import annotations

import io
import os
import subprocess
import sys
from pathlib import Path

import pytest
from kernline.app.main_window import EXIT_AFTER_VARIABLE, FILE_FILTER, exit_after_ms, package_file_name
from kernline.app.views.pressure import MIN_HEIGHT
from kernline.engine import CAUTION, __version__
from kernline.engine.units import format_length
from pypdf import PdfReader
from PySide6.QtCore import Qt
from PySide6.QtWidgets import QFileDialog, QMessageBox
from window_helpers import field, select_wall, type_into

ROOT = Path(__file__).resolve().parents[2]
LEFT = Qt.MouseButton.LeftButton
EXPORT_TIMEOUT_MS = 30_000  # the demo takes ~0.5 s; generous for a loaded CI machine


@pytest.fixture
def informations(monkeypatch: pytest.MonkeyPatch) -> list[str]:
    """Success messages of the export (a modal box would block an offscreen run)."""
    seen: list[str] = []

    def information(_parent, title, text, *args, **kwargs):
        seen.append(f"{title}: {text}")
        return QMessageBox.StandardButton.Ok

    monkeypatch.setattr(QMessageBox, "information", information)
    return seen


def _export(qtbot, window, path: Path | str, dialogs) -> object:
    """Run File > Export calculation package to ``path`` and wait for the worker's outcome."""
    dialogs.save_path = str(path)
    with qtbot.waitSignal(window.package_writer.finished, timeout=EXPORT_TIMEOUT_MS) as blocker:
        window.export_pdf_action.trigger()
        # the worker runs: the status bar says so and a second export is refused meanwhile
        assert window.busy_bar.isVisible() and "Writing the calculation package" in window.busy_label.text()
        assert not window.export_pdf_action.isEnabled()
    return blocker.args[0]


def _pdf_text(path: Path) -> str:
    return "\n".join(page.extract_text() for page in PdfReader(io.BytesIO(path.read_bytes())).pages)


# ---- export ------------------------------------------------------------------------------------------


def test_export_writes_the_calculation_package_of_the_open_project(qtbot, window, tmp_path, dialogs, informations):
    target = tmp_path / "clinic package.pdf"
    outcome = _export(qtbot, window, target, dialogs)
    assert outcome.ok, outcome.error
    assert target.read_bytes()[:5] == b"%PDF-"
    text = _pdf_text(target)
    assert "Cedar Hollow Community Clinic" in text  # the demo's project name
    assert all(wall_id in text for wall_id in ("N1", "S2", "C3", "E4", "K5"))
    assert "Demo geotechnical memo GM-26-031" in text  # soil.report of the raw file reaches the package
    assert "FAILS on its current footing: C3" in text  # the demo's C3 fails bearing as opened
    assert informations and str(target) in informations[0] and f"{len(window.document.project.walls)} walls" in informations[0]
    assert not window.busy_bar.isVisible() and window.export_pdf_action.isEnabled()
    assert not dialogs.warnings


def test_export_follows_the_current_model(qtbot, window, tmp_path, dialogs, informations):
    """An edit made in the window is in the package: C3 widened to 20 in passes (sizing finds 19 in;
    at 30 in its 2 #5 top bars would be less than 0.0018 B h along the length)."""
    select_wall(window, "C3")
    type_into(qtbot, field(window, "footing", "width"), "20 in")
    assert window.document.current_result.passes_all
    target = tmp_path / "widened.pdf"
    assert _export(qtbot, window, target, dialogs).ok
    text = _pdf_text(target)
    assert f"All {len(window.document.project.walls)} walls pass every check on their current footing" in text
    assert format_length(0.508, "US") in text  # 20 in as the package prints it


def test_export_with_an_invalid_field_uses_the_last_valid_model_and_says_so(qtbot, window, tmp_path, dialogs, informations):
    select_wall(window, "C3")
    width = field(window, "footing", "width")
    type_into(qtbot, width, "wide")
    assert width.invalid
    target = tmp_path / "last-valid.pdf"
    assert _export(qtbot, window, target, dialogs).ok
    assert "FAILS on its current footing: C3" in _pdf_text(target)  # still 16 in, the last valid width
    assert "Footing width B" in informations[0] and "last valid" in informations[0]


def test_export_name_is_suggested_from_the_project(window, dialogs, monkeypatch):
    asked = []
    monkeypatch.setattr(QFileDialog, "getSaveFileName", lambda _p, _t, start, filt: asked.append((start, filt)) or ("", ""))
    assert not window.export_package()  # cancelled: nothing written, nothing busy
    assert Path(asked[0][0]).name == "Cedar Hollow Community Clinic.pdf"
    assert asked[0][1].startswith("PDF (*.pdf)")
    assert not window.package_writer.busy
    assert package_file_name('a/b: "c" <d>') == "a-b- -c- -d.pdf"
    assert package_file_name("  ") == "calculation-package.pdf"


@pytest.mark.parametrize("where", ["missing folder", "a folder"])
def test_export_to_an_unwritable_path_reports_an_error(qtbot, window, tmp_path, dialogs, informations, where):
    if where == "missing folder":
        target = tmp_path / "no-such-folder" / "package.pdf"
        expected = "no such folder"
    else:
        target = tmp_path / "taken.pdf"
        target.mkdir()
        expected = "is a folder"
    outcome = _export(qtbot, window, target, dialogs)
    assert not outcome.ok
    assert len(dialogs.warnings) == 1 and "Cannot write the calculation package" in dialogs.warnings[0]
    assert expected in dialogs.warnings[0]
    assert not informations
    assert window.isVisible() and window.export_pdf_action.isEnabled() and not window.busy_bar.isVisible()
    assert not any(p.suffix == ".tmp" for p in tmp_path.rglob("*"))


# ---- welcome panel -----------------------------------------------------------------------------------


def test_a_plain_start_shows_the_welcome_and_its_demo_button_opens_the_demo(qtbot, make_window):
    window = make_window(None, demo=False)
    assert window.welcome_shown and window.welcome.isVisible()
    assert not window.main_splitter.isVisible() and not window.toolbar.isVisible()
    assert not window.save_action.isEnabled() and not window.export_pdf_action.isEnabled()
    assert window.welcome.no_recent.isVisible()  # nothing opened yet in this test's settings
    qtbot.mouseClick(window.welcome.demo_button, LEFT)
    assert window.document.is_demo
    assert [w.id for w in window.document.project.walls] == ["N1", "S2", "C3", "E4", "K5"]
    assert not window.welcome_shown and window.main_splitter.isVisible() and window.toolbar.isVisible()
    assert window.save_action.isEnabled() and window.export_pdf_action.isEnabled()


def test_the_welcome_new_and_open_buttons(qtbot, make_window, demo_file, dialogs):
    window = make_window(None, demo=False)
    qtbot.mouseClick(window.welcome.new_button, LEFT)
    assert not window.welcome_shown and [w.id for w in window.document.project.walls] == ["W1"]

    window = make_window(None, demo=False)
    dialogs.open_path = ""  # cancelled: the welcome stays
    qtbot.mouseClick(window.welcome.open_button, LEFT)
    assert window.welcome_shown
    dialogs.open_path = str(demo_file)
    qtbot.mouseClick(window.welcome.open_button, LEFT)
    assert not window.welcome_shown and window.document.path == demo_file


def test_demo_and_file_starts_skip_the_welcome(make_window, demo_file):
    assert not make_window(None, demo=True).welcome_shown
    assert not make_window(str(demo_file)).welcome_shown


def test_recent_entries_on_the_welcome_open_their_files(qtbot, make_window, demo_file, settings, tmp_path, dialogs):
    gone = tmp_path / "moved-away.kernline"
    settings.setValue("recent_files", [str(gone), str(demo_file.resolve())])
    window = make_window(None, demo=False)
    entries = window.welcome.recent_buttons
    assert [e.name_label.text() for e in entries] == ["moved-away.kernline", "clinic.kernline"]
    assert "not found" in entries[0].folder_label.text()
    # a file that no longer exists is reported and dropped from the list; the welcome stays
    qtbot.mouseClick(entries[0], LEFT)
    assert "moved-away.kernline" in dialogs.warnings[0] and window.welcome_shown
    assert [e.name_label.text() for e in window.welcome.recent_buttons] == ["clinic.kernline"]
    qtbot.mouseClick(window.welcome.recent_buttons[0], LEFT)
    assert not window.welcome_shown
    assert window.document.path == demo_file.resolve()
    assert window.document.project.info.name == "Cedar Hollow Community Clinic"


# ---- file dialogs ------------------------------------------------------------------------------------


def test_open_and_save_as_offer_the_project_filter_and_save_as_adds_the_extension(window, tmp_path, monkeypatch):
    asked = []

    def save_name(_parent, _title, _start, filt):
        asked.append(("save", filt))
        return str(tmp_path / "typed-without-extension"), filt.split(";;")[0]

    def open_name(_parent, _title, _start, filt):
        asked.append(("open", filt))
        return "", ""

    monkeypatch.setattr(QFileDialog, "getSaveFileName", save_name)
    monkeypatch.setattr(QFileDialog, "getOpenFileName", open_name)
    assert window.save_as()
    assert window.document.path == tmp_path / "typed-without-extension.kernline"
    assert window.document.path.is_file()
    window.open_dialog()
    assert FILE_FILTER == "Kernline projects (*.kernline);;All files (*)"
    assert asked == [("save", FILE_FILTER), ("open", FILE_FILTER)]


# ---- about box ---------------------------------------------------------------------------------------


def test_about_box_gives_version_purpose_caution_and_references(window, dialogs):
    window.about_action.trigger()
    text = dialogs.abouts[0]
    assert __version__ in text and CAUTION in text
    assert "shear walls" in text and "overturning" in text
    for reference in ("ASCE 7-16", "IBC 2021", "Das", "Bowles"):
        assert reference in text


# ---- smoke hook of launch() --------------------------------------------------------------------------


@pytest.mark.parametrize(
    ("value", "expected"),
    [
        ("250", 250),
        (" 40 ", 40),
        ("0", None),
        ("-5", None),
        ("1.5", None),
        ("soon", None),
        ("", None),
    ],
)
def test_exit_after_accepts_only_a_positive_whole_number(value, expected):
    assert exit_after_ms({EXIT_AFTER_VARIABLE: value}) == expected
    assert exit_after_ms({}) is None


@pytest.mark.parametrize("arguments", ["demo=True", ""])
def test_launch_quits_with_code_zero_when_asked_by_the_environment(tmp_path, arguments):
    """The frozen build's check: ``launch()`` returns 0 on its own (demo, and the welcome panel)."""
    env = dict(
        os.environ,
        QT_QPA_PLATFORM="offscreen",
        HOME=str(tmp_path),
        XDG_CONFIG_HOME=str(tmp_path / "config"),
        XDG_DATA_HOME=str(tmp_path / "data"),
        **{EXIT_AFTER_VARIABLE: "200"},
    )
    code = f"from kernline.app.main_window import launch; import sys; sys.exit(launch({arguments}))"
    done = subprocess.run([sys.executable, "-c", code], cwd=ROOT, env=env, timeout=60, capture_output=True, text=True)
    assert done.returncode == 0, done.stderr


# ---- pressure plot beside the design map -------------------------------------------------------------


def test_pressure_plot_keeps_its_height_and_kern_labels_with_the_design_map_open(qtbot, window):
    select_wall(window, "C3")
    window.tabs.setCurrentWidget(window.design_map)
    qtbot.waitUntil(lambda: not window.runner.busy())
    plot = window.drawings.pressure
    assert plot.height() >= MIN_HEIGHT
    view = plot.getPlotItem().getViewBox().sceneBoundingRect()
    for label in plot.kern_labels:
        box = label.sceneBoundingRect()
        assert box.height() > 0
        assert view.top() - 0.5 <= box.top() and box.bottom() <= view.bottom() + 0.5, (box, view)

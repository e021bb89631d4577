"""File › Package options: the seal box on every sheet and the verification appendix reach the package
the window writes; both are off by default and kept in the settings between sessions."""

from __future__ import annotations

import io
from pathlib import Path

import pytest
from kernline.app.main_window import PACKAGE_SEAL_KEY, PACKAGE_VERIFICATION_KEY
from pypdf import PdfReader
from PySide6.QtWidgets import QMessageBox

EXPORT_TIMEOUT_MS = 60_000  # the verification appendix runs the benchmark cases; generous for CI


@pytest.fixture
def informations(monkeypatch: pytest.MonkeyPatch) -> list[str]:
    seen: list[str] = []
    monkeypatch.setattr(QMessageBox, "information", lambda _p, title, text, *a, **k: seen.append(f"{title}: {text}"))
    return seen


def _export(qtbot, window, path: Path, dialogs) -> list[str]:
    dialogs.save_path = str(path)
    with qtbot.waitSignal(window.package_writer.finished, timeout=EXPORT_TIMEOUT_MS) as blocker:
        window.export_pdf_action.trigger()
    assert blocker.args[0].ok, blocker.args[0].error
    return [page.extract_text() for page in PdfReader(io.BytesIO(path.read_bytes())).pages]


def test_options_are_off_by_default_and_in_the_file_menu(window) -> None:
    assert window.package_options() == {"seal_every_sheet": False, "verification": False}
    titles = [a.text() for a in window.package_menu.actions()]
    assert titles == ["Seal box on every sheet", "Verification appendix"]
    assert all(a.isCheckable() and a.toolTip() for a in window.package_menu.actions())


def test_options_are_kept_between_sessions(make_window, settings) -> None:
    first = make_window()
    first.verification_action.setChecked(True)
    assert str(settings.value(PACKAGE_VERIFICATION_KEY)) == "true"
    assert str(settings.value(PACKAGE_SEAL_KEY, "false")) == "false"
    again = make_window()
    assert again.package_options() == {"seal_every_sheet": False, "verification": True}


def test_the_options_reach_the_package(qtbot, window, tmp_path, dialogs, informations) -> None:
    plain = _export(qtbot, window, tmp_path / "plain.pdf", dialogs)
    window.seal_every_sheet_action.setChecked(True)
    window.verification_action.setChecked(True)
    chosen = _export(qtbot, window, tmp_path / "chosen.pdf", dialogs)
    assert not any("Verification appendix" in page for page in plain)
    assert "Verification appendix" in chosen[-1]  # the appendix comes last
    assert len(chosen) > len(plain)
    # the small seal box's word sits in every sheet's title strip but the cover's (which has the square)
    assert all("seal" in page for page in chosen[1:]) and not all("seal" in page for page in plain[1:])

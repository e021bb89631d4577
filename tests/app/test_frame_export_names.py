"""The PDF and the CSV are offered under names made the same way: the project's name (characters file
systems refuse made "-") in the project's folder (else the last export's folder).

Basis: issue 13 (the package was named after the project, the schedule after the file).
"""

from __future__ import annotations

from pathlib import Path

import pytest
from kernline.app.main_window import export_file_name, package_file_name
from PySide6.QtWidgets import QFileDialog


@pytest.mark.parametrize(
    ("name", "pdf", "csv"),
    [
        ("Cedar Hollow Clinic", "Cedar Hollow Clinic.pdf", "Cedar Hollow Clinic-schedule.csv"),
        ('a/b: "c" <d>', "a-b- -c- -d.pdf", "a-b- -c- -d-schedule.csv"),
        ("  ", "calculation-package.pdf", "schedule.csv"),
    ],
)
def test_one_rule_names_both_exports(name, pdf, csv):
    assert export_file_name(name, "package") == pdf == package_file_name(name)
    assert export_file_name(name, "schedule") == csv


def test_the_window_offers_both_in_the_projects_folder(make_window, demo_file, monkeypatch, tmp_path):
    window = make_window(str(demo_file))
    offered = []

    def record(_parent, _title, suggestion, _filter):
        offered.append(Path(suggestion))
        return "", ""

    monkeypatch.setattr(QFileDialog, "getSaveFileName", record)
    window.export_schedule()
    window.export_package()
    name = window.document.project.info.name
    assert offered == [demo_file.parent / f"{name}-schedule.csv", demo_file.parent / f"{name}.pdf"]


def test_an_unsaved_project_offers_the_last_export_folder(window, monkeypatch, tmp_path):
    window.settings.setValue("last_export_folder", str(tmp_path))
    assert window.document.path is None  # the demo has no file
    assert window.export_suggestion("schedule").parent == tmp_path
    assert window.export_suggestion("package").parent == tmp_path

"""The project information is entered in the form and reaches the project file and the calculation
package's title strip and design basis (no JSON edited by hand)."""

from __future__ import annotations

import json

from kernline.engine.calc_package import build_package
from kernline.engine.project_file import load_project
from window_helpers import field, type_into

ENTRIES = {
    "name": "Larchmont Annex",
    "number": "27-114",
    "client": "Larchmont Library Trust",
    "address": "12 Weir Lane",
    "engineer": "R. Okafor, PE",
    "checker": "T. Lindqvist, PE",
    "revision": "B",
    "revision_date": "2027-02-09",
    "notes": "Footings bear on the engineered fill of the soil memo.",
}


def test_every_project_information_field_reaches_the_file_and_the_package(qtbot, window, tmp_path):
    doc = window.document
    window.show_project_information()
    for key, text in ENTRIES.items():
        type_into(qtbot, field(window, "project", key), text)
    type_into(qtbot, field(window, "soil", "report"), "Soil memo SM-7, 2027-01-20")
    assert doc.last_error is None
    path = tmp_path / "info.kernline"
    doc.save(path)
    saved = json.loads(path.read_text(encoding="utf-8"))
    assert saved["project"] == {**saved["project"], **ENTRIES}
    assert saved["soil"]["report"] == "Soil memo SM-7, 2027-01-20"
    project = load_project(path).project
    for key, text in ENTRIES.items():
        assert getattr(project.info, key) == text, key
    title = build_package(project, ["N1"]).title
    assert (title.project_name, title.project_number, title.client, title.address) == (
        "Larchmont Annex",
        "27-114",
        "Larchmont Library Trust",
        "12 Weir Lane",
    )
    assert (title.prepared_by, title.checked_by, title.revision, title.date) == (
        "R. Okafor, PE",
        "T. Lindqvist, PE",
        "B",
        "2027-02-09",
    )
    # each is one undo step, and undo puts the demo's value back
    before = doc.undo_stack.count()
    type_into(qtbot, field(window, "project", "checker"), "A. N. Other")
    assert doc.undo_stack.count() == before + 1
    doc.undo_stack.undo()
    assert doc.project.info.checker == "T. Lindqvist, PE"
    assert field(window, "project", "checker").edit.text() == "T. Lindqvist, PE"


def test_project_information_fields_say_where_they_print(window):
    for key in ENTRIES:
        tip = field(window, "project", key).edit.toolTip()
        assert "title block" in tip or "design basis" in tip, key
    assert "design basis" in field(window, "soil", "report").edit.toolTip()

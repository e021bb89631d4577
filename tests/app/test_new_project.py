"""A new project has no geotechnical report yet: its site values are empty, the soil fields say what to
enter, and nothing is checked (or sized, or exported) until the engineer enters them."""

from __future__ import annotations

import json

import pytest
from kernline.app.document import new_project_raw, parse_for_window, site_gaps
from kernline.engine.project_file import load_project
from window_helpers import field, type_into

SITE = (("soil", "allowable_bearing"), ("soil", "friction"), ("soil", "cohesion"), ("soil", "unit_weight"))


def enter_soil(qtbot, window) -> None:
    type_into(qtbot, field(window, "soil", "allowable_bearing"), "2000")
    type_into(qtbot, field(window, "soil", "friction"), "0.35")
    type_into(qtbot, field(window, "soil", "unit_weight"), "110")


@pytest.mark.parametrize("units", ["US", "SI"])
def test_the_template_holds_no_site_value(units):
    raw = new_project_raw(units)
    for section, key in (*SITE, ("criteria", "sds")):
        assert key not in raw[section]
    project, gaps = parse_for_window(raw)
    assert set(gaps) == set(SITE)
    assert [w.id for w in project.walls] == ["W1"]


def test_a_new_project_shows_the_soil_fields_to_fill_and_checks_nothing(qtbot, window):
    window.new_project()
    doc = window.document
    assert not doc.checkable and doc.results == {} and doc.current_result is None
    for path in SITE:
        f = field(window, *path)
        assert f.edit.text() == "" and f.error.isVisible() and "geotechnical report" in f.error.text()
        assert f.missing and not f.invalid  # still to be entered, not a typing error
    head = window.verdict.headline.text()
    assert "not checked" in head and "OK" not in head and "NG" not in head
    assert "Allowable bearing" in window.verdict.hint.text() and "Friction coefficient or Cohesion" in window.verdict.hint.text()
    assert all(not w.isVisible() for row in window.verdict.rows.values() for w in row)
    assert window.walls_view.tree.topLevelItem(0).text(2) == "not checked"
    assert window.cases_table.model().rowCount() == 0
    assert "Not checked" in window.drawings.pressure.notice.toPlainText()
    window.tabs.setCurrentWidget(window.schedule)
    assert window.schedule.rows == [] and "Not checked yet" in window.schedule.note.text()


def test_sizing_and_exports_wait_for_the_soil_values(qtbot, window, dialogs, tmp_path):
    window.new_project()
    assert window.size_current() == -1
    assert "Cannot size the footing yet" in window.statusBar().currentMessage()
    assert "Nothing to size against yet" in window.design_map.message.text()
    assert window.size_all() == -1
    dialogs.save_path = str(tmp_path / "out.pdf")
    assert not window.export_package()
    assert not window.export_schedule()
    assert not (tmp_path / "out.pdf").exists()


def test_entering_the_soil_values_checks_the_wall_and_undo_takes_it_back(qtbot, window):
    window.new_project()
    doc = window.document
    type_into(qtbot, field(window, "soil", "allowable_bearing"), "2000")
    assert not doc.checkable and set(doc.site_gaps) == set(SITE[1:])
    assert field(window, "soil", "friction").missing
    assert "Allowable bearing: not entered → 2000 psf" in window.statusBar().currentMessage()
    type_into(qtbot, field(window, "soil", "friction"), "0.35")
    assert not field(window, "soil", "cohesion").missing  # friction or cohesion: one is enough
    type_into(qtbot, field(window, "soil", "unit_weight"), "110")
    assert doc.checkable and doc.current_result is not None
    assert "W1:" in window.verdict.headline.text() and "not checked" not in window.verdict.headline.text()
    assert all(w.isVisible() for row in window.verdict.rows.values() for w in row)
    assert window.walls_view.tree.topLevelItem(0).text(2) != "not checked"
    doc.undo_stack.undo()
    assert not doc.checkable and field(window, "soil", "unit_weight").missing
    assert "not checked" in window.verdict.headline.text()


def test_an_empty_entry_leaves_a_site_value_to_be_entered(qtbot, window):
    window.new_project()
    f = field(window, "soil", "allowable_bearing")
    type_into(qtbot, f, "abc")
    assert f.invalid and "expected" in f.error.text()
    type_into(qtbot, f, "")
    assert f.missing and not f.invalid and "geotechnical report" in f.error.text()


def test_an_unfinished_project_saves_and_opens_again_as_it_was(qtbot, window, dialogs, tmp_path):
    window.new_project()
    type_into(qtbot, field(window, "soil", "allowable_bearing"), "2500")
    dialogs.save_path = str(tmp_path / "draft.kernline")
    assert window.save_as()
    saved = json.loads((tmp_path / "draft.kernline").read_text(encoding="utf-8"))
    assert saved["soil"]["allowable_bearing"] == "2500 psf" and "friction" not in saved["soil"]
    assert "still to enter" in window.statusBar().currentMessage()
    window.new_project()
    assert window.open_path(str(tmp_path / "draft.kernline"))
    doc = window.document
    assert not doc.checkable and doc.raw == saved
    assert field(window, "soil", "friction").missing and field(window, "soil", "allowable_bearing").edit.text() == "2500 psf"


def test_an_e_load_asks_for_s_ds(qtbot, window):
    window.new_project()
    enter_soil(qtbot, window)
    doc = window.document
    assert doc.checkable
    loads = window.wall_form.loads
    loads.table.item(0, 1).setText("E")  # the dead line load becomes a seismic one
    assert doc.raw["walls"][0]["loads"][0]["case"] == "E"
    assert set(doc.site_gaps) == {("criteria", "sds")}
    assert field(window, "criteria", "sds").missing and "S_DS" in window.verdict.hint.text()
    type_into(qtbot, field(window, "criteria", "sds"), "0.6")
    assert doc.checkable


def test_site_gaps_treat_blank_text_as_not_entered():
    raw = new_project_raw("US")
    raw["soil"].update(allowable_bearing="  ", friction=0.3, unit_weight="110 pcf")
    assert set(site_gaps(raw)) == {("soil", "allowable_bearing")}


def test_the_demo_has_every_site_value(window):
    assert window.document.checkable and site_gaps(load_project_raw()) == {}


def load_project_raw():
    from kernline.engine.resources import resource_path

    return load_project(resource_path("demo.kernline")).raw

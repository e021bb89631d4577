"""Inputs the engineer meant: values taken by default are marked at their fields and listed; the
engine's warnings sit under the verdict and lead to their fields; every field shows the unit a bare
number is read in."""

from __future__ import annotations

import json

import pytest
from kernline.app.views.fields import (
    EXTENSION_FIELDS,
    FOOTING_FIELDS,
    OPTION_FIELDS,
    SITE_FIELDS,
    SIZING_FIELDS,
    SOIL_FIELDS,
    STEM_FIELDS,
    WALL_FIELDS,
    to_raw,
    unit_label,
)
from kernline.engine.units import Kind, parse_quantity
from PySide6.QtCore import QPoint
from PySide6.QtWidgets import QApplication
from window_helpers import demo_raw, field, select_wall, type_into

QUANTITY_SPECS = [
    s
    for s in (
        *WALL_FIELDS,
        *STEM_FIELDS,
        *FOOTING_FIELDS,
        *SIZING_FIELDS,
        *EXTENSION_FIELDS,
        *SOIL_FIELDS,
        *SITE_FIELDS,
        *OPTION_FIELDS,
    )
    if s.kind
]


@pytest.fixture
def defaulted(tmp_path, make_window):
    """The demo without N1's concrete unit weight and without the depth where passive starts."""
    raw = demo_raw()
    del raw["walls"][0]["footing"]["unit_weight"]
    del raw["soil"]["passive_ignore"]
    path = tmp_path / "defaulted.kernline"
    path.write_text(json.dumps(raw, indent=2), encoding="utf-8")
    return make_window(str(path))


def test_a_value_not_entered_is_marked_assumed_with_its_basis(qtbot, defaulted):
    window = defaulted
    unit_weight = field(window, "footing", "unit_weight")
    assert unit_weight.edit.property("assumed") is True
    tip = unit_weight.edit.toolTip()
    assert tip.startswith("Assumed: 150 pcf — normal-weight concrete, common practice")
    assert unit_weight.edit.text() == "150 pcf"
    passive = field(window, "soil", "passive_ignore")
    assert passive.edit.property("assumed") is True and "Assumed" in passive.edit.toolTip()
    for entered in (field(window, "footing", "width"), field(window, "soil", "allowable_bearing")):
        assert not entered.edit.property("assumed") and "Assumed" not in entered.edit.toolTip()
    # another wall gave its unit weight: no mark there
    select_wall(window, "S2")
    assert not field(window, "footing", "unit_weight").edit.property("assumed")
    select_wall(window, "N1")
    assert field(window, "footing", "unit_weight").edit.property("assumed")
    # typed, it becomes the engineer's own value
    type_into(qtbot, unit_weight, "145")
    assert not unit_weight.edit.property("assumed") and "Assumed" not in unit_weight.edit.toolTip()
    window.document.undo_stack.undo()
    assert unit_weight.edit.property("assumed")


def test_assumptions_are_listed_and_lead_to_their_field(qtbot, defaulted):
    window = defaulted
    view = window.assumptions_view
    rows = view.rows()
    assert ("N1 · Concrete unit weight", "150 pcf", "normal-weight concrete, common practice") in rows
    assert any(r[0] == "Passive ignored to" for r in rows)
    assert len(rows) == len(window.document.project.assumptions)
    assert window.tabs.tabText(window.tabs.indexOf(view)) == f"Assumed values ({len(rows)})"
    select_wall(window, "E4")
    window.tabs.setCurrentWidget(view)
    row = next(i for i, r in enumerate(rows) if r[0] == "N1 · Concrete unit weight")
    view._on_item(view.tree.topLevelItem(row))
    assert window.document.current_wall.id == "N1"
    target = field(window, "footing", "unit_weight")
    qtbot.waitUntil(lambda: QApplication.focusWidget() is target.edit, timeout=2000)


def test_load_rows_with_an_assumed_value_are_marked(defaulted):
    window = defaulted
    loads = window.wall_form.loads
    n1 = window.document.project.walls[0]
    full_length = [i for i, a in enumerate(n1.loads) if f"walls[0].loads[{i}]" in {x.field for x in window.document.assumptions}]
    assert full_length and loads.assumed_rows() == full_length
    tip = loads.table.verticalHeaderItem(full_length[0]).toolTip()
    assert tip.startswith("Assumed:") and "full length" in tip


def test_a_project_with_everything_entered_lists_no_assumption(qtbot, window):
    """Type every assumed value: the list empties and says so."""
    doc = window.document
    for a in doc.assumptions:
        assert a.field  # each names its field
    window.tabs.setCurrentWidget(window.assumptions_view)
    for key in ("overturning", "sliding", "bearing"):
        type_into(qtbot, field(window, "criteria", "required", key), "1.0")
    assert not any(a.field.startswith("criteria.required") for a in doc.assumptions)
    assert all(not r[0].startswith("Required") for r in window.assumptions_view.rows())


def test_warnings_sit_under_the_verdict_and_lead_to_their_field(qtbot, window):
    view = window.warnings_view
    texts = view.texts()
    assert view.isVisible() and len(texts) == len(window.document.warnings()) == 3
    assert texts[0].startswith("⚠ E4 · load row 4: wall E4 has W point loads")
    assert any(t.startswith("⚠ S2 · footing: wall S2:") for t in texts)
    assert view.title.text().startswith("Look again (3)")
    # click the E4 one from wall N1: E4 is shown and its load row selected
    view._on_item(view.list.item(0))
    assert window.document.current_wall.id == "E4"
    assert window.wall_form.loads.table.currentRow() == 3
    # the S2 one opens S2's footing and focuses its first field
    view._on_item(view.list.item(next(i for i, t in enumerate(texts) if "S2 · footing" in t)))
    assert window.document.current_wall.id == "S2"
    qtbot.waitUntil(lambda: QApplication.focusWidget() is field(window, "footing", "width").edit, timeout=2000)


def test_a_project_warning_focuses_its_field(qtbot, window):
    type_into(qtbot, field(window, "criteria", "sds"), "0")
    view = window.warnings_view
    row = next(i for i, t in enumerate(view.texts()) if t.startswith("⚠ S_DS:"))
    view._on_item(view.list.item(row))
    qtbot.waitUntil(lambda: QApplication.focusWidget() is field(window, "criteria", "sds").edit, timeout=2000)


def test_no_warning_no_list(qtbot, window):
    window.new_project()
    assert not window.warnings_view.isVisible() and window.warnings_view.texts() == []


# ---- units ---------------------------------------------------------------------------------------------


@pytest.mark.parametrize("system", ["US", "SI"])
@pytest.mark.parametrize("spec", QUANTITY_SPECS, ids=lambda s: ".".join(s.path))
def test_a_bare_number_is_read_in_the_unit_shown_beside_the_field(spec, system):
    unit = spec.unit(system)
    assert unit_label(spec, system).endswith(f"({unit})")
    for typed in ("7", "7.", "+7", "7e0", " 7 "):
        stored = to_raw(spec, typed, system)
        assert stored.endswith(f" {unit}")
        assert parse_quantity(stored, spec.kind) == pytest.approx(7 * parse_quantity(f"1 {unit}", spec.kind))


def test_the_window_labels_show_the_units_and_follow_a_switch(qtbot, window):
    labels = window.project_form.group.labels
    bearing = field(window, "soil", "allowable_bearing")
    assert labels[id(bearing)].text() == "Allowable bearing (psf)"
    assert labels[id(field(window, "soil", "friction"))].text() == "Friction coefficient"  # a plain number
    window.set_units("SI")
    assert labels[id(bearing)].text() == "Allowable bearing (kPa)"
    width = field(window, "footing", "width")
    assert window.wall_form.group.labels[id(width)].text() == "Footing width B (mm)"
    type_into(qtbot, bearing, "100")
    assert window.document.raw["soil"]["allowable_bearing"] == "100 kPa"
    assert window.document.project.soil.allowable_bearing == pytest.approx(100e3)


def test_every_quantity_field_in_the_window_shows_its_unit(window):
    for group in (window.wall_form.group, window.project_form.group):
        for f in group.fields:
            if f.spec.kind is not None:
                unit = f.spec.unit(window.document.units)
                assert group.labels[id(f)].text().endswith(f"({unit})")
                if f.spec.optional and not f.edit.text():  # left out of the file: the placeholder says what applies
                    assert f.edit.placeholderText()
                    continue
                assert f.edit.text().endswith(f" {unit}")  # and the value itself carries it


def test_a_bare_number_in_a_load_cell_is_read_in_the_unit_the_cell_shows(qtbot, window):
    loads = window.wall_form.loads
    table = loads.table
    line = next(r for r in range(table.rowCount()) if table.item(r, 0).text() == "line")
    assert table.item(line, 2).text().endswith("plf")
    table.item(line, 2).setText("610.")
    assert window.document.raw["walls"][0]["loads"][line]["value"] == "610. plf"
    lateral = next(r for r in range(table.rowCount()) if table.item(r, 0).text() == "lateral")
    assert table.item(lateral, 2).text().endswith("kip")
    table.item(lateral, 2).setText("3.5")
    assert window.document.current_wall.loads[lateral].value == pytest.approx(3.5 * parse_quantity("1 kip", Kind.FORCE))
    assert "kip" in table.horizontalHeaderItem(2).toolTip() and "plf" in table.horizontalHeaderItem(2).toolTip()


def test_the_warnings_keep_their_place_when_the_design_map_opens(qtbot, window):
    """Steady layout: opening the design map neither hides the warnings nor moves them."""
    view = window.warnings_view
    assert view.isVisible()
    y = view.mapTo(window, QPoint(0, 0)).y()
    window.tabs.setCurrentWidget(window.design_map)
    QApplication.processEvents()
    assert view.isVisible() and view.mapTo(window, QPoint(0, 0)).y() == y
    window.tabs.setCurrentWidget(window.cases_table)
    QApplication.processEvents()
    assert view.isVisible() and view.mapTo(window, QPoint(0, 0)).y() == y

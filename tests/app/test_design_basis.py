"""The design basis as data, in the window: the method and its options, presumptive soil classes, the
site's frost depth, project information and the sizing of the footing's length; the verdict, the walls
list, the cases table and the design map loop over the registered checks (embedment included).

Sources of the rules: IBC 2021 Table 1806.2 (presumptive values; a class sets bearing, lateral
bearing, friction and cohesion), IBC 2021 1809.4 and 1809.5 (embedment), and the project-file reader
(engine/project_file.py), which refuses a criteria option the chosen method does not take.
"""

from __future__ import annotations

import numpy as np
import pytest
from kernline.app.document import new_project_raw, site_gaps
from kernline.engine.codes import codes
from kernline.engine.presumptive import TABLE_1806_2
from kernline.engine.registry import Family, checks
from kernline.engine.stability import table_checks
from PySide6.QtCore import Qt
from window_helpers import INCH, PSF, demo_raw, field, select_wall, type_into


def _option_visible(form, key: str) -> bool:
    layout, widget = form.rows[key]
    return layout.isRowVisible(widget)


# ---- the method and its options ---------------------------------------------------------------------


def test_the_method_choice_offers_every_registered_code_basis_by_title(window):
    box = window.project_form.method
    assert [box.itemData(i) for i in range(box.count())] == [c.id for c in codes(Family.SERVICE)]
    for i, code in enumerate(codes(Family.SERVICE)):
        assert box.itemText(i).split(",")[0] in code.title  # "ASCE 7-16, ASD" for "ASCE 7-16, allowable ..."
        assert code.title in box.itemData(i, Qt.ItemDataRole.ToolTipRole)  # the whole title in the entry's tooltip


def test_a_method_switch_removes_the_options_it_refuses_in_one_undo_step(qtbot, window):
    doc = window.document
    form = window.project_form
    form.set_choice(("criteria", "ev_at_soil"), False)
    form.set_choice(("criteria", "seismic_overturning_reduction"), 0.25)
    assert doc.raw["criteria"]["ev_at_soil"] is False
    assert doc.raw["criteria"]["seismic_overturning_reduction"] == 0.25
    before = doc.undo_stack.index()
    form.set_choice(("criteria", "method"), "ibc2021-alt-asd")
    assert doc.last_error is None  # the reader took it: nothing refused is left behind
    assert doc.raw["criteria"]["method"] == "ibc2021-alt-asd"
    assert "ev_at_soil" not in doc.raw["criteria"]
    assert "seismic_overturning_reduction" not in doc.raw["criteria"]
    assert doc.project.criteria.method.id == "ibc2021-alt-asd"
    assert doc.undo_stack.index() == before + 1
    assert "removed ev_at_soil, seismic_overturning_reduction" in window.statusBar().currentMessage()
    doc.undo_stack.undo()
    assert doc.raw["criteria"]["method"] == "asce7-16-asd"
    assert doc.raw["criteria"]["ev_at_soil"] is False and doc.raw["criteria"]["seismic_overturning_reduction"] == 0.25
    assert form.method.currentData() == "asce7-16-asd"


def test_the_fields_of_options_a_method_does_not_take_are_hidden(qtbot, window):
    form = window.project_form
    for code in codes(Family.SERVICE):
        form.set_choice(("criteria", "method"), code.id)
        for key in form.rows:
            assert _option_visible(form, key) == (key in code.options), (code.id, key)
        hidden = [form.option_label(k) for k in form.rows if k not in code.options]
        assert all(label in form.method_note.text() for label in hidden)
    form.set_choice(("criteria", "method"), "service-fs")  # takes only the bearing increase
    assert [k for k in form.rows if _option_visible(form, k)] == ["bearing_increase"]


def test_every_option_has_its_clause_in_its_tooltip(window):
    form = window.project_form
    clauses = {
        "sds": "11.4.5",
        "bearing_increase": "1806.1",
        "ev_at_soil": "12.4.2.2",
        "seismic_overturning_reduction": "12.13.4",
        "wind_omega": "1605.2",
        "seismic_snow_factor": "2.4.5",
    }
    for key, clause in clauses.items():
        widget = form.field_widget(f"criteria.{key}")
        assert widget is not None and clause in widget.toolTip(), key
    for path in (("soil", "sliding_basis"), ("soil", "presumptive_class")):
        assert "IBC 2021" in form.choices[path].box.toolTip()
    assert "1809.5" in field(window, "site", "frost_depth").edit.toolTip()


def test_asce_7_22_asks_for_the_snow_factor_of_walls_with_e_and_s(qtbot, window):
    """The demo's N1 carries E and S: under ASCE 7-22 nothing is checked until the factor is entered."""
    doc = window.document
    window.project_form.set_choice(("criteria", "method"), "asce7-22-asd")
    assert set(doc.site_gaps) == {("criteria", "seismic_snow_factor")}
    f = field(window, "criteria", "seismic_snow_factor")
    assert f.missing and f.isVisibleTo(window.project_form)
    assert "Snow factor with E" in window.verdict.hint.text()
    type_into(qtbot, f, "0.2")
    assert doc.checkable and doc.raw["criteria"]["seismic_snow_factor"] == 0.2
    assert doc.project.criteria.seismic_snow_factor == 0.2
    window.project_form.set_choice(("criteria", "method"), "asce7-16-asd")  # 7-16 refuses the factor: it goes
    assert "seismic_snow_factor" not in doc.raw["criteria"] and doc.checkable


def test_s_ds_is_asked_for_only_by_a_method_that_uses_it():
    raw = new_project_raw("US")
    raw["soil"].update(allowable_bearing="2000 psf", friction=0.35, unit_weight="110 pcf")
    raw["walls"][0]["loads"][0]["case"] = "E"
    assert set(site_gaps(raw)) == {("criteria", "sds")}
    for method in ("ibc2021-alt-asd", "service-fs"):
        raw["criteria"]["method"] = method
        assert site_gaps(raw) == {}


# ---- soil and site --------------------------------------------------------------------------------------


def test_a_presumptive_class_sets_the_soil_values_in_one_undo_step(qtbot, window):
    doc = window.document
    form = window.project_form
    before = doc.undo_stack.index()
    form.set_choice(("soil", "presumptive_class"), 4)
    soil = doc.raw["soil"]
    assert soil["presumptive_class"] == 4
    assert not {"allowable_bearing", "friction", "cohesion", "passive"} & set(soil)
    assert doc.undo_stack.index() == before + 1 and doc.checkable
    cls = TABLE_1806_2[4]
    assert doc.project.soil.allowable_bearing == pytest.approx(cls.allowable_bearing)
    for key in ("allowable_bearing", "friction", "cohesion", "passive"):
        f = field(window, "soil", key)
        assert not f.isEnabled() and f.edit.isReadOnly(), key
    assert field(window, "soil", "allowable_bearing").edit.text() == "2000 psf"
    assert field(window, "soil", "friction").edit.text() == "0.25"
    note = form.presumptive_note
    assert note.isVisibleTo(form) and "class 4" in note.text() and "150\u00a0psf/ft" in note.text()
    assert field(window, "soil", "unit_weight").isEnabled()  # not a value the class sets
    assert form.sliding.currentData() == "dead"  # note a: friction on the dead load, by default with a class
    doc.undo_stack.undo()
    assert doc.raw == demo_raw()
    assert field(window, "soil", "allowable_bearing").isEnabled() and not form.presumptive_note.isVisibleTo(form)


def test_back_to_the_report_leaves_the_soil_values_to_be_entered(qtbot, window):
    doc = window.document
    form = window.project_form
    form.set_choice(("soil", "presumptive_class"), 2)
    form.set_choice(("soil", "presumptive_class"), None)
    assert "presumptive_class" not in doc.raw["soil"]
    assert not doc.checkable and field(window, "soil", "allowable_bearing").missing
    type_into(qtbot, field(window, "soil", "allowable_bearing"), "2500")
    type_into(qtbot, field(window, "soil", "friction"), "0.3")
    assert doc.checkable and doc.project.soil.allowable_bearing == pytest.approx(2500 * PSF)


def test_sliding_basis_and_report_reference_are_written(qtbot, window):
    doc = window.document
    window.project_form.set_choice(("soil", "sliding_basis"), "dead")
    assert doc.raw["soil"]["sliding_basis"] == "dead" and doc.project.soil.sliding_basis.value == "dead"
    type_into(qtbot, field(window, "soil", "report"), "Report GR-7, 2026-02-03")
    assert doc.raw["soil"]["report"] == "Report GR-7, 2026-02-03"


def test_the_frost_depth_field_sets_the_embedment_requirement(qtbot, window):
    doc = window.document
    f = field(window, "site", "frost_depth")
    assert f.edit.text() == "18 in"
    assert window.verdict.texts()["embedment"] == (
        "depth 2'-0\", 1'-6\" required",
        "✓ 25% margin",  # 1 - 18/24
        "below frost (IBC 2021 1809.5)",
    )
    type_into(qtbot, f, "36")
    assert doc.raw["site"]["frost_depth"] == "36 in"
    ratio, verdict, _rule = window.verdict.texts()["embedment"]
    assert ratio == "depth 2'-0\", 3'-0\" required" and verdict == "✗ 33% short"  # 1 - 24/36
    assert "embedment" in window.verdict.headline.text()
    type_into(qtbot, f, "")  # none given: the 12 in minimum of 1809.4 governs
    assert "frost_depth" not in doc.raw["site"] and doc.project.site.frost_depth is None
    assert window.verdict.texts()["embedment"][2] == "12 in minimum (IBC 2021 1809.4)"
    doc.undo_stack.undo()
    doc.undo_stack.undo()
    assert doc.raw == demo_raw()


# ---- project information and sizing bounds ------------------------------------------------------------


def test_project_information_fields_write_the_project_keys(qtbot, window):
    doc = window.document
    for key in ("name", "number", "client", "address", "engineer", "checker", "revision", "revision_date", "notes"):
        assert field(window, "project", key).spec.label
    type_into(qtbot, field(window, "project", "checker"), "A. Reviewer, PE")
    type_into(qtbot, field(window, "project", "revision"), "B")
    type_into(qtbot, field(window, "project", "revision_date"), "2026-03-14")
    assert doc.raw["project"]["checker"] == "A. Reviewer, PE"
    assert doc.project.info.revision == "B" and doc.project.info.revision_date == "2026-03-14"
    assert window.project_info_action.isEnabled()
    window.project_info_action.trigger()
    assert window.project_form.sections["Project"].toggle.isChecked()
    assert field(window, "project", "name").edit.hasFocus()


def test_an_extension_bound_brings_its_step_in_one_undo_step(qtbot, window):
    doc = window.document
    window.wall_form.sections["Sizing range"].toggle.setChecked(True)
    f = field(window, "sizing", "extension_max")
    assert f.edit.text() == "" and f.edit.placeholderText()
    before = doc.undo_stack.index()
    type_into(qtbot, f, "4")
    sizing = doc.raw["walls"][0]["sizing"]
    assert sizing["extension_max"] == "4 ft" and sizing["extension_step"] == "6 in"
    assert doc.undo_stack.index() == before + 1
    assert doc.current_wall.sizing.extension_step == pytest.approx(6 * INCH)
    type_into(qtbot, f, "")  # no bound: the length is not sized, and the step goes with it
    assert "extension_max" not in doc.raw["walls"][0]["sizing"] and "extension_step" not in doc.raw["walls"][0]["sizing"]
    doc.undo_stack.undo()
    doc.undo_stack.undo()
    assert doc.raw == demo_raw()


def test_adopting_a_size_found_with_the_length_writes_the_extensions(qtbot, window):
    doc = window.document
    select_wall(window, "C3")
    type_into(qtbot, field(window, "sizing", "extension_max"), "2")
    window.size_current()
    dm = window.design_map
    qtbot.waitUntil(lambda: dm.entry is not None and dm.fresh, timeout=20000)
    s = dm.entry.result
    assert s.feasible and s.extensions is not None and s.extensions.size > 1
    start = doc.current_wall.footing.extension_start
    assert dm.adopt_chosen() is None
    footing = doc.current_wall.footing
    assert footing.width == pytest.approx(s.width) and footing.thickness == pytest.approx(s.thickness)
    assert footing.extension_start == pytest.approx(start + s.extension)
    assert "L_f" in dm.message.text() or s.extension == 0.0


# ---- every registered check, and nothing hard-coded ----------------------------------------------------


def test_the_verdict_lists_every_registered_check_with_embedment(window):
    # the stability checks, then (the demo has a concrete design) the registered strength checks
    shown = [*table_checks(), *(checks(Family.STRENGTH) if window.document.project.concrete is not None else ())]
    ids = [c.id for c in shown]
    assert "embedment" in ids and len(ids) >= 4
    assert list(window.verdict.texts()) == ids
    assert [row[0].text() for row in window.verdict.rows.values()] == [c.title for c in shown]
    failing = [c.title.lower() for c, g in window.document.current_result.governing.items() if not g.passes]
    headline = window.verdict.headline.text().lower()
    assert (failing[0] in headline) if failing else ("every check meets its required ratio" in headline)
    assert window.verdict.texts()["embedment"][2].endswith("(IBC 2021 1809.5)")  # a rule, not a load combination


def test_the_design_map_draws_a_line_for_every_check_and_embedment_as_a_level(qtbot, window):
    """Frost depth 36 in with 12 in of soil cover: t_f must reach 24 in, a level line on the map."""
    type_into(qtbot, field(window, "site", "frost_depth"), "36")
    window.size_current()
    dm = window.design_map
    qtbot.waitUntil(lambda: dm.entry is not None and dm.fresh, timeout=20000)
    checks = dm.entry.result.checks
    assert dm.legend_checks() == [c.title.lower() for c in checks] and "embedment" in dm.legend_checks()
    assert len(dm.boundaries) == len(checks) == dm.entry.result.check_normalized.shape[0]
    k = [c.id for c in checks].index("embedment")
    _xs, ys = dm.boundaries[k].getData()
    level = ys[np.isfinite(ys)]
    assert level.size and np.all((level >= 23.0) & (level <= 24.0))  # between the 23 in and 24 in rows
    assert dm.boundary_labels[k].toPlainText() == "embedment"
    assert dm.entry.result.thickness >= 24 * INCH - 1e-9
    row = int(np.argmin(np.abs(dm.entry.result.thicknesses - 20 * INCH)))
    assert "embedment 0.89 ✗" in dm.cell_text(row, 10)  # (12 + 20) / 36


def test_the_cases_table_has_a_column_per_check_evaluated_per_case(window):
    window.tabs.setCurrentWidget(window.cases_table)
    model = window.cases_table.cases_model
    headers = [model.headerData(c, Qt.Orientation.Horizontal) for c in range(model.columnCount())]
    per_case = [c.title for c in table_checks() if c.per_case]
    assert headers[6 : 6 + len(per_case)] == per_case  # then the strength checks, with a concrete section
    editor = window.project_form.combinations
    symbols = [editor.table.horizontalHeaderItem(c).text() for c in range(editor.table.columnCount())][-len(editor.checks) :]
    assert symbols == [c.symbol for c in editor.checks] and "EM" not in symbols  # embedment names no combination

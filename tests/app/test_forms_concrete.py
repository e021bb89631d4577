"""The footing's concrete design is entered in the forms: the project's concrete section (f'c, fy,
cover, λ, strength combinations), each wall's construction and chord offset, each footing's bars,
and the seismic design category.

Each input is typed or chosen as a user would, saved, and read back with the engine's own reader
(:func:`engine.project_file.load_project`), independently of the window. Values that are checked
against a standard: bar names and areas, ASTM A615/A615M Table 1 (#5 = No. 16, 0.31 in²; #4 = No. 13);
cover for concrete cast against earth, 3 in (ACI 318-19 Table 20.5.1.3.1); λ of normal-weight concrete,
1.0 (ACI 318-19 Table 19.2.4.2).
"""

from __future__ import annotations

import json

import pytest
from kernline.engine.model import WallConstruction
from kernline.engine.project_file import load_project
from kernline.engine.results import concrete_json
from PySide6.QtWidgets import QApplication
from window_helpers import INCH, demo_raw, field, type_into

PSI = 4.4482216152605 / INCH**2  # Pa per psi (exact definitions, NIST SP 811)
SQUARE_INCH = INCH * INCH


def _without_concrete(raw: dict) -> dict:
    """A project with no concrete design at all: no concrete section, construction, bars or category."""
    raw.pop("concrete", None)
    raw["criteria"].pop("seismic_design_category", None)
    for wall in raw["walls"]:
        for key in ("construction", "chord_offset"):
            wall.pop(key, None)
        wall["footing"].pop("reinforcement", None)
    return raw


@pytest.fixture
def window(make_window, tmp_path):
    """The demo project without its concrete design (the tests add it from the form)."""
    path = tmp_path / "no-concrete.kernline"
    path.write_text(json.dumps(_without_concrete(demo_raw()), indent=2), encoding="utf-8")
    return make_window(str(path))


def _with_concrete(window) -> None:
    window.project_form.concrete_on.click()
    assert "concrete" in window.document.raw


def _saved(window, tmp_path):
    """Save the window's project and read it back with the engine's reader: (the JSON, the parsed project)."""
    path = tmp_path / "saved.kernline"
    window.document.save(path)
    return json.loads(path.read_text(encoding="utf-8")), load_project(path).project


def test_the_concrete_section_is_added_with_its_defaults_assumed_and_removed_by_undo(qtbot, window):
    doc = window.document
    form = window.project_form
    assert doc.project.concrete is None and not form.concrete_on.isChecked()
    assert not any(f.isVisibleTo(form) for f in form.concrete_fields)
    assert form.concrete_note.isVisibleTo(form) and "No concrete design" in form.concrete_note.text()
    # the wall's concrete inputs wait for the project's section, and say so
    wall_form = window.wall_form
    assert wall_form.concrete_note.isVisibleTo(wall_form)
    assert not wall_form.choices[("construction",)].box.isVisibleTo(wall_form)

    _with_concrete(window)
    assert doc.raw["concrete"] == {}
    assert form.concrete_on.isChecked() and all(f.isVisibleTo(form) for f in form.concrete_fields)
    fc = field(window, "concrete", "fc")
    assert fc.edit.text() == "3000 psi" and fc.edit.property("assumed") is True
    assert field(window, "concrete", "fy").edit.text() == "60 ksi"
    cover = field(window, "concrete", "cover")
    assert cover.edit.text() == "3 in" and "Table 20.5.1.3.1" in cover.edit.toolTip()  # ACI 318-19
    assert field(window, "concrete", "lambda").edit.text() == "1"
    assert form.choices[("concrete", "strength_method")].box.property("assumed") is True
    construction = wall_form.choices[("construction",)].box
    assert construction.isVisibleTo(wall_form) and construction.property("assumed") is True
    assert construction.currentData() == "light-frame"
    assert not wall_form.concrete_note.isVisibleTo(wall_form)

    doc.undo_stack.undo()
    assert "concrete" not in doc.raw and doc.project.concrete is None
    assert not form.concrete_on.isChecked() and not fc.isVisibleTo(form)
    doc.undo_stack.redo()
    form.concrete_on.click()  # unticked: the section goes, in one undo step
    assert "concrete" not in doc.raw
    doc.undo_stack.undo()
    assert doc.raw["concrete"] == {}


def test_each_concrete_value_round_trips_through_the_project_file(qtbot, window, tmp_path):
    doc = window.document
    _with_concrete(window)
    type_into(qtbot, field(window, "concrete", "fc"), "4000")  # a bare number in the shown unit, psi
    type_into(qtbot, field(window, "concrete", "fy"), "420 MPa")
    type_into(qtbot, field(window, "concrete", "cover"), "75 mm")
    type_into(qtbot, field(window, "concrete", "lambda"), "0.75")
    window.project_form.set_choice(("concrete", "strength_method"), "asce7-16-lrfd")
    window.project_form.set_choice(("criteria", "seismic_design_category"), "D")
    assert doc.last_error is None
    saved, project = _saved(window, tmp_path)
    assert saved["concrete"] == {
        "fc": "4000 psi",
        "fy": "420 MPa",
        "cover": "75 mm",
        "lambda": 0.75,
        "strength_method": "asce7-16-lrfd",
    }
    assert saved["criteria"]["seismic_design_category"] == "D"
    concrete = project.concrete
    assert concrete.fc == pytest.approx(4000 * PSI, rel=1e-12)
    assert concrete.fy == pytest.approx(420e6, rel=1e-12)
    assert concrete.cover == pytest.approx(0.075, rel=1e-12)
    assert concrete.lam == pytest.approx(0.75)
    assert concrete.strength_method.id == "asce7-16-lrfd"
    assert project.criteria.seismic_design_category == "D"
    # "not given" removes the category again
    window.project_form.set_choice(("criteria", "seismic_design_category"), None)
    assert "seismic_design_category" not in doc.raw["criteria"]
    # an emptied field gives the value back to Kernline's default, marked assumed
    fc = field(window, "concrete", "fc")
    type_into(qtbot, fc, "")
    assert "fc" not in doc.raw["concrete"] and fc.edit.property("assumed") is True
    assert fc.edit.text() == "3000 psi"


def test_a_walls_construction_chord_offset_and_bars_round_trip(qtbot, window, tmp_path):
    doc = window.document
    _with_concrete(window)
    wall_form = window.wall_form
    chord = field(window, "chord_offset")
    assert chord.isVisibleTo(wall_form)  # a light-frame wall (the default) has chords
    type_into(qtbot, chord, "4.5")
    wall_form.set_choice(("footing", "reinforcement"), "entered")
    bars = {name: field(window, "footing", "reinforcement", name) for name in ("transverse", "bottom", "top")}
    assert all(f.isVisibleTo(wall_form) for f in bars.values())
    type_into(qtbot, bars["transverse"], "#5 @ 12 in")
    type_into(qtbot, bars["bottom"], "3 #5")
    type_into(qtbot, bars["top"], "2 No. 13")
    assert doc.last_error is None
    saved, project = _saved(window, tmp_path)
    n1 = saved["walls"][0]
    assert n1["chord_offset"] == "4.5 in"
    assert n1["footing"]["reinforcement"] == {"transverse": "#5 @ 12 in", "bottom": "3 #5", "top": "2 No. 13"}
    wall = project.walls[0]
    assert wall.chord_offset == pytest.approx(4.5 * INCH)
    r = wall.footing.reinforcement
    bar, spacing = r.transverse
    assert bar.name == "#5" and bar.area == pytest.approx(0.31 * SQUARE_INCH) and spacing == pytest.approx(12 * INCH)
    assert r.bottom[0] == 3 and r.bottom[1].name == "#5"
    assert r.top[0] == 2 and r.top[1].name == "#4"  # No. 13 is the soft-metric name of #4
    assert bars["top"].edit.text() == "2 #4"  # shown in the project's (US) names

    # masonry: no chords; plain: no bar fields
    wall_form.set_choice(("construction",), "masonry")
    assert not chord.isVisibleTo(wall_form)
    wall_form.set_choice(("footing", "reinforcement"), "plain")
    assert not any(f.isVisibleTo(wall_form) for f in bars.values())
    saved, project = _saved(window, tmp_path)
    assert saved["walls"][0]["construction"] == "masonry" and saved["walls"][0]["footing"]["reinforcement"] == "plain"
    assert project.walls[0].construction is WallConstruction.MASONRY
    assert project.walls[0].footing.reinforcement.plain
    wall_form.set_choice(("footing", "reinforcement"), "designed")
    saved, project = _saved(window, tmp_path)
    assert "reinforcement" not in saved["walls"][0]["footing"] and project.walls[0].footing.reinforcement is None
    # the other walls were not touched
    assert saved["walls"][1:] == _without_concrete(demo_raw())["walls"][1:]


@pytest.mark.parametrize(
    ("name", "text", "words"),
    [
        ("transverse", "#5 12 in", "has no spacing"),
        ("transverse", "#12 @ 12 in", "#3 to #11"),
        ("bottom", "three #5", 'such as "3 #5"'),
        ("top", "2 No. 5", "soft-metric"),
    ],
)
def test_a_bad_bar_text_is_refused_with_a_message_naming_the_field(qtbot, window, name, text, words):
    doc = window.document
    _with_concrete(window)
    window.wall_form.set_choice(("footing", "reinforcement"), "entered")
    raw_before = json.dumps(doc.raw, sort_keys=True)
    steps = doc.undo_stack.count()
    f = field(window, "footing", "reinforcement", name)
    type_into(qtbot, f, text)
    assert f.invalid and words in f.error.text(), f.error.text()
    assert f.edit.text() == text  # kept for correcting
    assert json.dumps(doc.raw, sort_keys=True) == raw_before and doc.undo_stack.count() == steps
    # the window's message names the field in the form's words, then what is wrong
    assert doc.last_error is not None and doc.last_error.startswith(f"{f.spec.label}: "), doc.last_error
    assert words in doc.last_error and words in f.edit.toolTip()


def test_undo_reverts_each_concrete_edit(qtbot, window):
    doc = window.document
    _with_concrete(window)
    wall_form = window.wall_form
    edits = [
        lambda: type_into(qtbot, field(window, "concrete", "fc"), "5000 psi"),
        lambda: type_into(qtbot, field(window, "concrete", "cover"), "2 in"),
        lambda: type_into(qtbot, field(window, "concrete", "lambda"), "0.85"),
        lambda: window.project_form.set_choice(("criteria", "seismic_design_category"), "E"),
        lambda: wall_form.set_choice(("construction",), "concrete"),
        lambda: wall_form.set_choice(("footing", "reinforcement"), "entered"),
        lambda: type_into(qtbot, field(window, "footing", "reinforcement", "transverse"), "#6 @ 10 in"),
    ]
    snapshots = []
    for edit in edits:
        snapshots.append(json.dumps(doc.raw, sort_keys=True))
        steps = doc.undo_stack.count()
        edit()
        assert doc.undo_stack.count() == steps + 1 and doc.last_error is None
    for before in reversed(snapshots):
        doc.undo_stack.undo()
        assert json.dumps(doc.raw, sort_keys=True) == before
    assert doc.raw["concrete"] == {}
    # the forms show the values in force after the undos
    assert field(window, "concrete", "fc").edit.text() == "3000 psi"
    assert wall_form.choices[("construction",)].box.currentData() == "light-frame"
    assert window.project_form.choices[("criteria", "seismic_design_category")].box.currentData() is None


def test_assumed_marks_go_when_the_value_is_entered_and_come_back_with_undo(qtbot, window):
    _with_concrete(window)
    doc = window.document
    for key, text in (("fc", "3000 psi"), ("fy", "60 ksi"), ("cover", "3 in"), ("lambda", "1.0")):
        f = field(window, "concrete", key)
        assert f.edit.property("assumed") is True and "Assumed" in f.edit.toolTip(), key
        type_into(qtbot, f, text)  # the same value, now the engineer's own
        assert not f.edit.property("assumed") and "Assumed" not in f.edit.toolTip(), key
        assert f"concrete.{key}" not in doc.assumptions_by_field()
        doc.undo_stack.undo()
        assert f.edit.property("assumed") is True, key
    construction = window.wall_form.choices[("construction",)].box
    window.wall_form.set_choice(("construction",), "light-frame")
    assert not construction.property("assumed")
    doc.undo_stack.undo()
    assert construction.property("assumed") is True


def test_show_field_reaches_the_concrete_inputs(qtbot, window):
    _with_concrete(window)
    window.wall_form.set_choice(("footing", "reinforcement"), "entered")
    window.wall_form.sections["Concrete"].toggle.setChecked(False)
    window.project_form.sections["Concrete"].toggle.setChecked(False)
    for path, target in (
        ("concrete.cover", lambda: field(window, "concrete", "cover").edit),
        ("concrete.strength_method", lambda: window.project_form.choices[("concrete", "strength_method")].box),
        ("criteria.seismic_design_category", lambda: window.project_form.choices[("criteria", "seismic_design_category")].box),
        ("walls[1].construction", lambda: window.wall_form.choices[("construction",)].box),
        ("walls[0].footing.reinforcement.top", lambda: field(window, "footing", "reinforcement", "top").edit),
    ):
        assert window.show_field(path), path
        qtbot.waitUntil(lambda t=target: QApplication.focusWidget() is t(), timeout=2000)


def test_the_warning_of_a_missing_seismic_design_category_leads_to_its_choice(qtbot, window):
    """A concrete design with E loads and no category is warned about; the warning's click reaches the choice,
    and choosing a category clears the warning."""
    doc = window.document
    view = window.warnings_view
    assert not any(w.field == "criteria.seismic_design_category" for w in doc.warnings())
    _with_concrete(window)
    row = next(i for i, w in enumerate(doc.warnings()) if w.field == "criteria.seismic_design_category")
    assert view.texts()[row].startswith("⚠ Seismic design category:")  # the field in the form's words
    window.project_form.sections["Criteria"].toggle.setChecked(False)
    view._on_item(view.list.item(row))
    box = window.project_form.choices[("criteria", "seismic_design_category")].box
    qtbot.waitUntil(lambda: QApplication.focusWidget() is box, timeout=2000)
    assert window.project_form.sections["Criteria"].toggle.isChecked()
    window.project_form.set_choice(("criteria", "seismic_design_category"), "D")
    assert not any(w.field == "criteria.seismic_design_category" for w in doc.warnings())
    assert not any(t.startswith("⚠ Seismic design category") for t in view.texts())


def test_a_concrete_edit_is_live_in_the_results(qtbot, window):
    """A thinner cover raises d and so the one-way shear capacity the engine reports (ACI 318-19 22.5.5.1)."""
    doc = window.document
    _with_concrete(window)
    before = concrete_json(doc.current_result)["transverse"]["shear_capacity"]
    type_into(qtbot, field(window, "concrete", "cover"), "2 in")
    assert doc.project.concrete.cover == pytest.approx(2 * INCH)
    after = concrete_json(doc.current_result)["transverse"]["shear_capacity"]
    assert after > before  # d one inch larger: Vc grows (8 λ ρw^(1/3) √f'c b d, ρw = As / (b d))
    doc.undo_stack.undo()
    assert concrete_json(doc.current_result)["transverse"]["shear_capacity"] == pytest.approx(before)

"""The US / SI switch changes every displayed value and the diagram axes, and round-trips exactly."""

from __future__ import annotations

import pytest
from window_helpers import demo_raw, field, select_wall


def _texts(window) -> list[str]:
    return [f.edit.text() for g in (window.wall_form.group, window.project_form.group) for f in g.fields]


def test_switch_to_si_and_back(qtbot, window):
    doc = window.document
    select_wall(window, "C3")
    us_texts = _texts(window)
    us_verdict = window.verdict.texts()
    model = doc.project.walls
    window.si_action.trigger()
    assert doc.units == "SI"
    assert field(window, "footing", "width").edit.text() == "406.4 mm"  # 16 in
    assert field(window, "length").edit.text() == "4.877 m"  # 16 ft
    assert field(window, "soil", "allowable_bearing").edit.text() == "95.761 kPa"  # 2000 psf
    assert "(m)" in window.drawings.elevation.getPlotItem().getAxis("bottom").labelText
    assert "kPa" in window.drawings.pressure.getPlotItem().getAxis("left").labelText
    assert window.drawings.pressure.shown_allowable == pytest.approx(95.76052, rel=1e-5)
    assert "kN/m" in window.wall_form.loads.table.item(0, 2).text()
    assert window.walls_view.tree.headerItem().text(1).endswith("(mm)") and "'" not in window.walls_view.tree.topLevelItem(
        0
    ).text(1)
    assert doc.project.walls == model  # the SI values inside do not change
    si_verdict = window.verdict.texts()
    # margins and cases do not depend on units; the demands and capacities are said in kPa, kN, m
    assert {k: v[1:] for k, v in si_verdict.items()} == {k: v[1:] for k, v in us_verdict.items()}
    assert si_verdict["embedment"][0] == "depth 0.610 m, 0.457 m required"  # 2 ft against the 18 in frost depth
    assert si_verdict["bearing"][0].endswith(" of 95.8 kPa allowable")  # 2000 psf
    assert si_verdict["embedment"][1] == us_verdict["embedment"][1]
    # a bare number now means millimetres
    f = field(window, "footing", "width")
    f.edit.setText("500")
    f.edit.editingFinished.emit()
    assert doc.raw["walls"][2]["footing"]["width"] == "500 mm"
    doc.undo_stack.undo()
    window.us_action.trigger()
    assert doc.units == "US"
    assert _texts(window) == us_texts
    assert "(ft)" in window.drawings.elevation.getPlotItem().getAxis("bottom").labelText
    assert doc.raw == demo_raw()
    doc.undo_stack.undo()
    doc.undo_stack.undo()
    assert doc.undo_stack.index() == 0


@pytest.mark.parametrize("units", ["US", "SI"])
def test_the_walls_list_columns_fit_at_1280_by_800(qtbot, window, units):
    """Every wall's id, footing and least margin are whole in the 250 px list (SI names the unit once)."""
    window.set_units(units)
    window.resize(1280, 800)
    qtbot.waitUntil(lambda: window.size().toTuple() == (1280, 800), timeout=2000)
    qtbot.wait(20)
    tree = window.walls_view.tree
    header = tree.header()
    assert header.sectionPosition(2) + header.sectionSize(2) <= tree.viewport().width()
    for i in range(tree.topLevelItemCount()):
        item = tree.topLevelItem(i)
        for col in range(3):
            room = header.sectionSize(col) - (tree.indentation() if col == 0 else 0)
            assert tree.fontMetrics().horizontalAdvance(item.text(col)) <= room, (item.text(col), room)
    if units == "SI":
        assert tree.topLevelItem(0).text(1) == "457 × 305"  # N1: 18 in × 12 in, in mm
        assert tree.headerItem().text(1) == "B × t_f (mm)"

"""A plain footing with continuous bars along it, as the demo's light-frame walls have (IBC 2021
1905.6.2 asks for at least two continuous #4 or larger bars, As >= 0.002 Ag, one top and one bottom
above 8 in, in seismic design categories C to F): the form shows it as such, edits it and undoes it."""

from __future__ import annotations

from window_helpers import field, select_wall, type_into


def _rows_shown(window) -> dict[str, bool]:
    form = window.wall_form.concrete_form
    return {f.spec.path[-1]: form.isRowVisible(f) for f in window.wall_form.bar_fields}


def test_the_demo_plain_footing_with_bars_along_shows_its_bars(window):
    select_wall(window, "N1")  # {"transverse": "plain", "bottom": "2 #4", "top": "2 #4"}
    choice = window.wall_form.choices[("footing", "reinforcement")]
    assert choice.box.currentData() == "plain-bars"
    assert _rows_shown(window) == {"transverse": False, "bottom": True, "top": True}
    assert field(window, "footing", "reinforcement", "bottom").edit.text() == "2 #4"


def test_plain_then_plain_with_bars_then_a_bar_edit_and_undo(qtbot, window):
    doc = window.document
    select_wall(window, "K5")  # designed bars along, #5 @ 12 in across
    path = doc.wall_path("footing", "reinforcement")
    window.wall_form.set_choice(("footing", "reinforcement"), "plain")
    assert doc.raw["walls"][doc.current_index]["footing"]["reinforcement"] == "plain"
    assert _rows_shown(window) == {"transverse": False, "bottom": False, "top": False}
    window.wall_form.set_choice(("footing", "reinforcement"), "plain-bars")
    assert doc.raw["walls"][doc.current_index]["footing"]["reinforcement"] == {"transverse": "plain"}
    type_into(qtbot, field(window, "footing", "reinforcement", "bottom"), "3 #6")
    raw = doc.raw["walls"][doc.current_index]["footing"]["reinforcement"]
    assert raw == {"transverse": "plain", "bottom": "3 #6"}
    assert doc.project.walls[doc.current_index].footing.reinforcement.plain
    doc.undo_stack.undo()
    assert doc.raw["walls"][doc.current_index]["footing"]["reinforcement"] == {"transverse": "plain"}
    assert path[-1] == "reinforcement"

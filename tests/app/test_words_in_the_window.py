"""Results said in words in the window, never as 0.00: a wall whose footing has no equilibrium reads
"no equilibrium" in the walls list, the verdict, the cases table and the schedule; a wall with no
lateral load reads "no demand"; a wall sized without a passing size says "outside the sizing bounds".

The tipping wall is our own: 3 ft long on a 12 in x 12 in footing 5 ft long, 100 plf dead load and a
10 kip wind shear 10 ft up (M = 110 kip-ft against N of about 1.4 kip: the resultant leaves the footing).
"""

from __future__ import annotations

import json

from kernline.engine.summary import NO_DEMAND, NO_EQUILIBRIUM, OUTSIDE_BOUNDS
from window_helpers import demo_raw, select_wall

CONCRETE = {"fc": "3000 psi", "fy": "60 ksi", "cover": "3 in", "lambda": 1.0, "strength_method": "asce7-16-lrfd"}
TIPPING = {
    "id": "T1",
    "label": "tipping wall",
    "length": "3 ft",
    "thickness": "6 in",
    "footing": {"width": "12 in", "thickness": "12 in", "extension_start": "1 ft", "extension_end": "1 ft", "cover": "12 in"},
    "loads": [
        {"type": "line", "case": "D", "value": "100 plf"},
        {"type": "lateral", "case": "W", "value": "10 kip", "height": "10 ft"},
    ],
    "sizing": {
        "width_min": "12 in",
        "width_max": "18 in",
        "width_step": "1 in",
        "thickness_min": "12 in",
        "thickness_max": "14 in",
        "thickness_step": "1 in",
    },
}


def open_with_tipping_wall(make_window, tmp_path, concrete: bool):
    raw = demo_raw()
    raw.pop("concrete", None)
    for wall in raw["walls"]:
        wall["footing"].pop("reinforcement", None)
    if concrete:
        raw["concrete"] = dict(CONCRETE)
    raw["walls"].append(json.loads(json.dumps(TIPPING)))
    path = tmp_path / "tipping.kernline"
    path.write_text(json.dumps(raw, indent=2), encoding="utf-8")
    window = make_window(str(path))
    select_wall(window, "T1")
    return window


def row_of(window, wall_id: str) -> int:
    return [w.id for w in window.document.project.walls].index(wall_id)


def test_no_equilibrium_in_the_walls_list_and_the_verdict(make_window, tmp_path):
    window = open_with_tipping_wall(make_window, tmp_path, concrete=False)
    result = window.document.results["T1"]
    bearing = next(g for c, g in result.governing.items() if c.id == "bearing")
    assert bearing.ratio == 0.0 and not result.evaluation.stable[bearing.case_index]  # the engine's finding
    item = window.walls_view.tree.topLevelItem(row_of(window, "T1"))
    assert item.text(2) == f"✗ {NO_EQUILIBRIUM}"
    assert "bearing" in item.toolTip(2) and "0.00" not in item.toolTip(2)
    statement, mark, case = window.verdict.texts()["bearing"]
    assert statement == NO_EQUILIBRIUM and mark == "✗ NG" and case  # the case is still named
    for shown in window.verdict.texts().values():
        assert not any("0.00" in text for text in shown), shown


def test_no_equilibrium_in_the_cases_table_and_the_schedule(make_window, tmp_path):
    window = open_with_tipping_wall(make_window, tmp_path, concrete=True)
    model = window.cases_table.cases_model
    texts = [model.item(r, c).text() for r in range(model.rowCount()) for c in range(model.columnCount())]
    assert any(t.startswith(NO_EQUILIBRIUM) for t in texts)
    assert not any(t.startswith("0.00") for t in texts)
    window.tabs.setCurrentWidget(window.schedule)
    view = window.schedule
    view.refresh()
    row = next(r for r in view.rows if r[0] == "T1")
    assert row[view.headers.index("Bearing ratio")] == NO_EQUILIBRIUM
    assert "0.00" not in row
    shown = [view.table.item(row_of(window, "T1"), c).text() for c in range(view.table.columnCount())]
    assert NO_EQUILIBRIUM in shown and "0.00" not in shown


def test_no_demand_without_a_lateral_load(make_window, tmp_path):
    """T1 without its shear: overturning and sliding have no demand; the walls list gives the margin of
    the check that governs instead."""
    raw = demo_raw()
    raw.pop("concrete", None)
    tipping = json.loads(json.dumps(TIPPING))
    tipping["loads"] = tipping["loads"][:1]
    raw["walls"] = [tipping]
    path = tmp_path / "quiet.kernline"
    path.write_text(json.dumps(raw, indent=2), encoding="utf-8")
    window = make_window(str(path))
    texts = window.verdict.texts()
    assert texts["overturning"][0] == NO_DEMAND and texts["sliding"][0] == NO_DEMAND
    assert texts["overturning"][1] == "–" and texts["overturning"][2] == ""
    cell = window.walls_view.tree.topLevelItem(0).text(2)
    assert cell.endswith(("margin", "short")) and NO_DEMAND not in cell  # bearing and embedment have demand


def test_outside_the_sizing_bounds_in_the_walls_list(qtbot, make_window, tmp_path):
    """Sizing T1 finds no passing size in its 12-18 in x 12-14 in grid: the walls list says so."""
    window = open_with_tipping_wall(make_window, tmp_path, concrete=False)
    window.size_current()
    dm = window.design_map
    qtbot.waitUntil(lambda: dm.entry is not None and dm.fresh, timeout=20000)
    assert not dm.entry.result.feasible
    item = window.walls_view.tree.topLevelItem(row_of(window, "T1"))
    assert OUTSIDE_BOUNDS in item.toolTip(2)

"""The schedule on screen with a concrete section: the bars beside the size, the engine's rows
(engine.schedule), and no bar columns without a concrete section."""

from __future__ import annotations

import json

from kernline.engine.schedule import BAR_HEADERS, DESIGNED, ENTERED, schedule_rows
from window_helpers import demo_raw

CONCRETE = {"fc": "3000 psi", "fy": "60 ksi", "cover": "3 in", "lambda": 1.0, "strength_method": "asce7-16-lrfd"}


def open_project(make_window, tmp_path, concrete: bool):
    raw = demo_raw()
    raw.pop("concrete", None)
    for wall in raw["walls"]:
        wall["footing"].pop("reinforcement", None)
    if concrete:
        raw["concrete"] = dict(CONCRETE)
        next(w for w in raw["walls"] if w["id"] == "N1")["footing"]["reinforcement"] = {
            "transverse": "#5 @ 12 in",
            "bottom": "3 #5",
            "top": "2 #4",
        }
    path = tmp_path / "p.kernline"
    path.write_text(json.dumps(raw, indent=2), encoding="utf-8")
    window = make_window(str(path))
    window.tabs.setCurrentWidget(window.schedule)
    window.schedule.refresh()
    return window


def test_bars_on_screen_are_the_engines(make_window, tmp_path):
    window = open_project(make_window, tmp_path, concrete=True)
    view, doc = window.schedule, window.document
    expected = schedule_rows(doc.project, [doc.results[w.id] for w in doc.project.walls])
    assert view.rows == expected
    visible = view.visible_headers()
    size = visible.index("Footing thickness")
    assert visible[size + 1 : size + 4] == ["Transverse bars", "Bottom bars", "Top bars"]
    n1 = dict(zip(view.headers, view.rows[0], strict=True))
    assert (n1["Transverse bars"], n1["Transverse bars from"]) == ("#5 @ 12 in", ENTERED)
    assert n1["Bottom bars from"] == ENTERED and n1["Top bars from"] == ENTERED
    c3 = dict(zip(view.headers, next(r for r in view.rows if r[0] == "C3"), strict=True))
    assert c3["Transverse bars from"] == DESIGNED and " @ " in c3["Transverse bars"]
    for column, name in enumerate(view.headers):  # the table shows the rows' text
        assert view.table.item(0, column).text() == view.rows[0][column], name
    assert view.tsv().splitlines()[0].split("\t") == view.headers


def test_no_bar_columns_without_a_concrete_section(make_window, tmp_path):
    window = open_project(make_window, tmp_path, concrete=False)
    assert not set(BAR_HEADERS) & set(window.schedule.headers)

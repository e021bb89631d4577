"""The schedule's bar columns (engine.schedule): present only with a concrete section, and the very
bars the engine's results hold (the flexure record across the width, the design along the length),
each marked entered or designed by Kernline; the CSV keeps its guards."""

from __future__ import annotations

import csv
import io
import json

import pytest
from kernline.engine.concrete.along import design_along
from kernline.engine.concrete.bars import counted_text
from kernline.engine.project_file import parse_project
from kernline.engine.resources import resource_path
from kernline.engine.results import check_project
from kernline.engine.schedule import (
    BAR_HEADERS,
    DESIGNED,
    ENTERED,
    NOT_NEEDED,
    schedule_csv,
    schedule_headers,
    schedule_rows,
)

CONCRETE = {"fc": "3000 psi", "fy": "60 ksi", "cover": "3 in", "lambda": 1.0, "strength_method": "asce7-16-lrfd"}


def demo(concrete: bool = True) -> dict:
    """The demo project with our own concrete section (or none) and no bars given."""
    raw = json.loads(resource_path("demo.kernline").read_text(encoding="utf-8"))
    raw.pop("concrete", None)
    for wall in raw["walls"]:
        wall["footing"].pop("reinforcement", None)
    if concrete:
        raw["concrete"] = dict(CONCRETE)
    return raw


def footing_of(raw: dict, wall_id: str) -> dict:
    return next(w for w in raw["walls"] if w["id"] == wall_id)["footing"]


def bar_cells(project, results) -> dict[str, dict[str, str]]:
    heads = schedule_headers(project.units, project)
    rows = schedule_rows(project, results)
    return {row[0]: {h: row[heads.index(h)] for h in BAR_HEADERS} for row in rows}


def engine_faces(result) -> tuple[str, str]:
    """The bottom and top bars of the engine's design along the length, as the schedule writes them
    (designed afresh here, not read from the result's memo)."""
    design, _index, _diagram = design_along(result.strength_table, result.strength_evaluation)
    shown = []
    for face in (design.bottom, design.top):
        text = counted_text(face.count, face.bar) if face.bar is not None and face.count else NOT_NEEDED
        shown.append(text if face.passes or design.passes else f"{text}, fails")
    return shown[0], shown[1]


def test_no_bar_columns_without_a_concrete_section():
    project = parse_project(demo(concrete=False))
    heads = schedule_headers(project.units, project)
    assert not set(BAR_HEADERS) & set(heads)
    assert all(len(row) == len(heads) for row in schedule_rows(project, check_project(project)))


def test_designed_bars_are_the_engines():
    """The demo with a concrete section and no bars given: every wall's bars are the engine's, designed."""
    project = parse_project(demo())
    results = check_project(project)
    heads = schedule_headers(project.units, project)
    assert heads[6:12] == list(BAR_HEADERS)  # right after the footing's size
    cells = bar_cells(project, results)
    for result in results:
        flexure = next(g.record for c, g in result.governing.items() if c.id == "flexure")
        bottom, top = engine_faces(result)
        assert cells[result.wall_id] == {
            "Transverse bars": flexure.bars,
            "Transverse bars from": DESIGNED,
            "Bottom bars": bottom,
            "Bottom bars from": DESIGNED,
            "Top bars": top,
            "Top bars from": DESIGNED,
        }
        assert " @ " in flexure.bars  # bars were chosen across the width


def test_entered_and_plain_footings_say_so():
    """N1 with its bars given, S2 plain: the given bars are listed as entered; S2 reads "plain"."""
    raw = demo()
    footing_of(raw, "N1")["reinforcement"] = {"transverse": "#5 @ 12 in", "bottom": "3 #5", "top": "2 #4"}
    footing_of(raw, "S2")["reinforcement"] = "plain"
    footing_of(raw, "C3")["reinforcement"] = {"bottom": "4 #5"}
    project = parse_project(raw)
    results = check_project(project)
    cells = bar_cells(project, results)
    n1 = cells["N1"]
    assert n1["Transverse bars"] == "#5 @ 12 in" and n1["Transverse bars from"] == ENTERED
    assert n1["Bottom bars"].startswith("3 #5") and n1["Bottom bars from"] == ENTERED
    assert n1["Top bars"].startswith("2 #4") and n1["Top bars from"] == ENTERED
    assert (n1["Bottom bars"], n1["Top bars"]) == engine_faces(next(r for r in results if r.wall_id == "N1"))
    assert cells["S2"]["Transverse bars"] == "plain" and cells["S2"]["Transverse bars from"] == ENTERED
    c3 = cells["C3"]
    assert c3["Transverse bars from"] == DESIGNED and c3["Top bars from"] == DESIGNED
    assert c3["Bottom bars"].startswith("4 #5") and c3["Bottom bars from"] == ENTERED


def test_si_project_names_bars_in_soft_metric():
    """An SI project: "#5 @ 12 in" reads "No. 16 @ 305 mm" (ASTM A615M names; 12 in = 304.8 mm)."""
    raw = demo()
    raw["units"] = "SI"
    footing_of(raw, "N1")["reinforcement"] = {"transverse": "#5 @ 12 in", "bottom": "3 #5"}
    project = parse_project(raw)
    cells = bar_cells(project, check_project(project))
    assert cells["N1"]["Transverse bars"] == "No. 16 @ 305 mm"
    assert cells["N1"]["Bottom bars"].startswith("3 No. 16")


def test_bars_given_by_the_caller_are_used_as_given():
    """A window hands in the bars it keeps per result: the rows use them, not a new design."""
    from kernline.engine.schedule import FootingBars

    project = parse_project(demo())
    results = check_project(project)
    kept = FootingBars(
        transverse="#6 @ 10 in", transverse_from=ENTERED, bottom="4 #6", bottom_from=ENTERED, top="2 #5", top_from=ENTERED
    )
    rows = schedule_rows(project, results, bars={"N1": kept})
    assert next(row for row in rows if row[0] == "N1")[6:12] == kept.cells()


@pytest.mark.parametrize("label", ['=HYPERLINK("http://example.com","x")', "+1", "@SUM(A1)"])
def test_csv_with_bars_stays_guarded(label: str):
    """UTF-8 with a byte-order mark is the writer's; here: CR LF rows and no cell a spreadsheet runs."""
    raw = demo()
    raw["walls"][0]["label"] = label
    project = parse_project(raw)
    text = schedule_csv(project)
    assert text.count("\r\n") == len(project.walls) + 1
    rows = list(csv.reader(io.StringIO(text, newline="")))
    assert rows[0][6:12] == list(BAR_HEADERS)
    assert rows[1][1] == "'" + label
    assert rows[1][6] != "" and rows[1][8] != ""  # the bars are there
    for row in rows:
        for cell in row:
            assert not cell.startswith(("=", "+", "@", "\t", "\r")), cell


def test_a_face_marked_failing_means_the_wall_fails():
    """ ", fails" beside bars only where the engine's design along the length fails, so never on a PASS
    row; the demo's walls and a short wall under a large shear (our own) whose bars cannot pass."""
    raw = demo()
    short = json.loads(json.dumps(next(w for w in raw["walls"] if w["id"] == "C3")))
    short.update(id="T1", length="3 ft")
    short["footing"].update(width="12 in", thickness="12 in")
    short["loads"] = [
        {"type": "line", "case": "D", "value": "100 plf"},
        {"type": "lateral", "case": "W", "value": "10 kip", "height": "10 ft"},
    ]
    raw["walls"].append(short)
    project = parse_project(raw)
    results = check_project(project)
    heads = schedule_headers(project.units, project)
    marked = 0
    for row, result in zip(schedule_rows(project, results), results, strict=True):
        fails = any(row[heads.index(h)].endswith(", fails") for h in ("Bottom bars", "Top bars"))
        marked += fails
        assert not fails or (row[-1] == "FAIL" and not result.passes_along)
    assert marked  # the short wall's bars along its length fail

"""The all-cases table says "no equilibrium" where the resultant falls beyond the footing's end."""

import copy
import json

from kernline.app.views.cases import CASE_ROLE, CasesModel
from kernline.engine.project_file import parse_project
from kernline.engine.resources import resource_path
from kernline.engine.results import check_wall
from PySide6.QtCore import Qt

BEARING_COLUMN = 8


def test_unstable_case_reads_no_equilibrium(qapp):
    """S2 without extensions and with 6 kip shears loses equilibrium in some cases; those rows say so."""
    raw = copy.deepcopy(json.loads(resource_path("demo.kernline").read_text(encoding="utf-8")))
    wall = next(w for w in raw["walls"] if w["id"] == "S2")
    wall["footing"].update({"extension_start": "0 ft", "extension_end": "0 ft"})
    for load in wall["loads"]:
        if load["type"] == "lateral":
            load["value"] = "6 kip"
    project = parse_project(raw)
    result = check_wall(project, next(w for w in project.walls if w.id == "S2"))
    unstable = [i for i, c in enumerate(result.cases) if c.bearing is not None and not c.bearing.stable]
    assert unstable, "the test needs a case without equilibrium"
    table = CasesModel()
    table.set_result(result, "US")
    assert table.headerData(BEARING_COLUMN, Qt.Orientation.Horizontal) == "Bearing"
    texts = [table.item(row, BEARING_COLUMN).text() for row in unstable]
    assert all(t.startswith("no equilibrium") for t in texts), texts
    stable_row = next(i for i, c in enumerate(result.cases) if c.bearing is not None and c.bearing.stable)
    assert not table.item(stable_row, BEARING_COLUMN).text().startswith("no equilibrium")


def test_strength_rows_show_their_combination_and_bars(qapp):
    """With a concrete section the strength combinations follow the service ones, marked "strength";
    flexure and one-way shear are shown on the row of their most loaded case (the engine's record),
    flexure with the transverse bars; the stability checks read "—" there."""
    raw = copy.deepcopy(json.loads(resource_path("demo.kernline").read_text(encoding="utf-8")))
    raw["concrete"] = {"fc": "3000 psi", "fy": "60 ksi", "cover": "3 in", "strength_method": "asce7-16-lrfd"}
    for wall in raw["walls"]:
        wall["footing"].pop("reinforcement", None)
    project = parse_project(raw)
    result = check_wall(project, next(w for w in project.walls if w.id == "C3"))
    table = CasesModel()
    table.set_result(result, "US")
    headers = [table.headerData(c, Qt.Orientation.Horizontal) for c in range(table.columnCount())]
    assert headers[-3:] == ["Flexure", "One-way shear", "Result"]
    service, strength = len(result.cases), len(result.strength_table.cases)
    assert table.rowCount() == service + strength
    flexure = next(g for c, g in result.governing.items() if c.id == "flexure")
    rows = [[table.item(r, c).text() for c in range(table.columnCount())] for r in range(table.rowCount())]
    assert all(row[headers.index("Flexure")] == "—" for row in rows[:service])
    governing = [row for row in rows[service:] if row[headers.index("Flexure")]]
    assert len(governing) == 1
    row = governing[0]
    assert row[0] == f"{flexure.combination} · strength" and row[1] == flexure.direction
    mark = "✓" if flexure.passes else "✗"
    assert row[headers.index("Flexure")] == f"{flexure.ratio:.2f} {mark} · {flexure.record.bars} (designed)"
    assert row[headers.index("Bearing")] == "—"
    assert row[-1] == ("OK" if all(g.passes for c, g in result.governing.items() if c.family.value == "strength") else "NG")
    assert table.item(service, 0).data(CASE_ROLE) is None  # a strength row shows no service case in the drawings

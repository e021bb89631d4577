"""The all-cases table says "no equilibrium" where the resultant falls beyond the footing's end."""

import copy
import json

from kernline.app.views.cases import CasesModel
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

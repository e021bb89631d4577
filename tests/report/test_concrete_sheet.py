"""The concrete design sheet of each wall (ACI 318-19): present with a concrete section, numbers from the engine.

Sources: every printed value is compared with the engine's own result (engine.results.concrete_json and
longitudinal_json), converted here to the printed units by plain arithmetic (1 kip = 4448.2216 N,
1 ft = 0.3048 m). The substituted lines are re-evaluated from their printed numbers (arithmetic only;
the formulas are those of ACI 318-19 13.2.7.1, 13.2.7.2, 14.5.1.7 as printed).
"""

from __future__ import annotations

import re

import pytest
from concrete_project import concrete_raw
from kernline.engine.project_file import parse_project
from kernline.engine.results import check_wall, concrete_json
from report_helpers import RenderedPackage, render

KIP = 4448.2216152605
FOOT = 0.3048
KSF = KIP / FOOT**2


@pytest.fixture(scope="module")
def project():
    return parse_project(concrete_raw())


@pytest.fixture(scope="module")
def package(project) -> RenderedPackage:
    return render(project)


def sheet_text(package: RenderedPackage, wall_id: str) -> str:
    """The text of the wall's concrete sheet(s): from its heading to the next wall's heading or the appendix."""
    text = " ".join(package.pages)
    start = text.index(f"Wall {wall_id}: concrete design of the footing (ACI 318-19)")
    after = re.compile(r"Wall [A-Z0-9]+: |Appendix").search(text, start + 10)
    return text[start : after.start() if after else len(text)]


@pytest.fixture(scope="module")
def engine(project):
    return {w.id: concrete_json(check_wall(project, w)) for w in project.walls}


def test_each_wall_has_its_concrete_sheet(package: RenderedPackage) -> None:
    for wall_id in ("R1", "P2"):
        assert f"Wall {wall_id}: concrete design of the footing (ACI 318-19)" in " ".join(package.pages)


def test_no_concrete_section_no_concrete_sheet() -> None:
    raw = concrete_raw()
    del raw["concrete"]
    raw["walls"][1]["footing"].pop("reinforcement")
    text = " ".join(render(parse_project(raw)).pages)
    assert "concrete design of the footing" not in text


def test_reinforced_sheet_prints_the_engine_values(package: RenderedPackage, engine) -> None:
    t = engine["R1"]["transverse"]
    text = sheet_text(package, "R1")
    assert f"{t['q_u'] / KSF:.3f} ksf" in text
    assert f"{t['moment'] * FOOT / (KIP * FOOT):.2f} kip·ft/ft" in text
    assert f"{t['moment_capacity'] / KIP:.2f} kip·ft/ft" in text
    assert f"{t['shear'] * FOOT / KIP:.2f} kip/ft" in text
    assert f"{t['shear_capacity'] * FOOT / KIP:.2f} kip/ft" in text
    assert t["bars"] in text
    for clause in ("Table 13.2.7.1", "13.2.7.2", "22.5.5.1", "25.4.2.4", "7.6.1.1"):
        assert clause in text, clause


def test_plain_sheet_follows_chapter_14(package: RenderedPackage, engine) -> None:
    t = engine["P2"]["transverse"]
    text = sheet_text(package, "P2")
    assert "h − 2 in" in text and "14.5.1.7" in text and "14.5.5.1" in text
    assert f"{t['moment_capacity'] / KIP:.2f} kip·ft/ft" in text
    assert f"{t['shear_capacity'] * FOOT / KIP:.2f} kip/ft" in text


def test_longitudinal_bars_and_strength_combinations(package: RenderedPackage, engine) -> None:
    along = engine["R1"]["longitudinal"]
    text = sheet_text(package, "R1")
    assert "Along the length: the footing as a beam" in text
    assert along["bars_bottom"] in text
    assert "1.0W and 1.0E" in text  # W and E are nominal loads (ASCE 7-16 2.3.1, 2.3.6)
    assert along["combination"] in text


_LINE = re.compile(r"Mu = qu c² / 2 (?:= )?(?P<q>[\d.]+) ksf × \((?P<c>[\d.]+) ft\)² / 2 = (?P<m>[\d.]+) kip·ft/ft")


@pytest.mark.parametrize("wall_id", ["R1", "P2"])
def test_moment_line_reproduces_its_result(package: RenderedPackage, wall_id: str) -> None:
    """Mu = q_u c²/2 from the printed q_u and c, within the rounding of the printed values."""
    m = _LINE.search(sheet_text(package, wall_id))
    assert m, wall_id
    q, c, printed = float(m["q"]), float(m["c"]), float(m["m"])
    spread = 0.0005 * c * c / 2 + q * c * 0.0005 + 0.005
    assert abs(q * c * c / 2 - printed) <= spread

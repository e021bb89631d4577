"""What the package is given: user text printed literally, a subset of walls, a failing wall, SI units,
a missing font, bad output paths, and the command line.

Sources: issue 4 items 1, 7 and 8 (the wall subset, units, escaping) and the common brief (bad input
gives a clear message, never a traceback).
"""

from __future__ import annotations

import io
import os
import re
import subprocess
import sys
from pathlib import Path

import pytest
from kernline.engine.errors import InputError
from kernline.engine.model import Check
from kernline.engine.report import render_report, write_report
from kernline.engine.results import check_wall
from kernline.engine.units import Kind, format_quantity
from report_helpers import RenderedPackage, page_texts, render, variant

HOSTILE = '<b>&amp; "x" </para>'


def _hostile(raw: dict) -> None:
    raw["project"]["name"] = HOSTILE
    raw["project"]["client"] = "<client & co> </b>"
    raw["project"]["notes"] = f"first line {HOSTILE}\nsecond line <br/> & <font size=40>"
    raw["walls"][0]["label"] = HOSTILE
    raw["walls"][0]["loads"][0]["label"] = "dead <&> load" + "\x07"
    raw["walls"][1]["label"] = "L" * 400  # far longer than any field


def test_hostile_text_prints_literally(demo_document) -> None:
    """Markup-like text in the project name, notes and labels prints exactly as typed and does not crash."""
    package = render(variant(demo_document, _hostile))
    everything = " ".join(package.pages)
    assert HOSTILE in package.pages[0]
    assert f"Wall N1: {HOSTILE}" in everything
    assert "<client & co> </b>" in everything
    assert "second line <br/> & <font size=40>" in everything
    assert "dead <&> load" in everything and "\x07" not in everything
    # the project name is in every title block
    assert all(HOSTILE in page for page in package.pages)


def test_long_text_is_fitted_into_the_title_block(demo_document) -> None:
    """A project name too long for its field is shortened with an ellipsis, not printed over the seal space."""
    package = render(variant(demo_document, lambda raw: raw["project"].update(name="Clinic " * 40)))
    assert "…" in package.pages[0]
    assert "Clinic " * 40 not in package.pages[0].split("Engineer's seal")[1]


def test_wall_subset(demo_document) -> None:
    """--walls C3,N1 gives sheets for those walls only, in that order, and says so on the cover."""
    package = render(demo_document, wall_ids=["C3", "N1"])
    subjects = list(dict.fromkeys(package.subject(i) for i in range(len(package.pages))))
    walls = list(dict.fromkeys(s.split(":")[0] for s in subjects if s.startswith("Wall ")))
    assert walls == ["Wall C3", "Wall N1"]
    assert [s for s in subjects if s.startswith("Appendix")] == ["Appendix: all cases"]
    appendix = package.text_of("Appendix: all cases")
    assert appendix.index("Wall C3: ") < appendix.index("Wall N1: ")
    n = len(demo_document.project.walls)
    assert f"This package covers 2 walls of the project's {n}: C3, N1." in package.pages[0]
    schedule = package.text_of("Summary schedule")
    assert "S2" not in schedule and "E4" not in schedule
    total = len(package.pages)
    assert f"Sheet {total} of {total} " in package.pages[-1]


def test_wall_subset_as_comma_text(demo_document) -> None:
    """The ids may come as the command line's comma-separated text."""
    package = render(demo_document.project, wall_ids="E4, S2")
    subjects = [package.subject(i) for i in range(len(package.pages))]
    walls = list(dict.fromkeys(s.split(":")[0] for s in subjects if s.startswith("Wall ")))
    assert walls == ["Wall E4", "Wall S2"]


@pytest.mark.parametrize("ids, words", [(["Z9"], "'Z9'"), (["N1", "nope"], "'nope'"), ([" ", ""], "no wall ids")])
def test_unknown_or_empty_wall_ids_are_refused(demo_document, ids: list[str], words: str) -> None:
    """An id the project lacks, or none at all, is an InputError naming it and the walls there are."""
    with pytest.raises(InputError) as err:
        render_report(demo_document.project, wall_ids=ids)
    assert err.value.field == "walls"
    assert words in err.value.message


def test_failing_wall_is_reported_failing_in_words(demo: RenderedPackage, demo_document) -> None:
    """C3 fails bearing in the engine; the package says FAILS on its sheets, the schedule and the cover."""
    project = demo_document.project
    c3 = next(w for w in project.walls if w.id == "C3")
    result = check_wall(project, c3)
    assert not result.passes and not result.governing[Check.BEARING].passes  # engine's verdict
    sheets = demo.text_of("Wall C3")
    assert "Wall C3 FAILS bearing" in sheets
    assert "Soil bearing FAILS: qa / qmax = " in sheets
    assert "The current footing (1'-4\" × 1'-0\") FAILS" in sheets
    assert "FAILS: bearing" in demo.text_of("Summary schedule")
    assert f"1 of {len(project.walls)} walls FAILS on its current footing: C3." in demo.pages[0]
    # and a passing wall is not reported failing
    assert "Wall N1 PASSES every check (overturning, sliding, bearing, embedment" in demo.text_of("Wall N1")
    assert "FAILS" not in demo.text_of("Wall N1")


def test_no_candidate_passes(demo_document) -> None:
    """When sizing finds nothing within the bounds the package says so, with the engine's suggestions."""

    def tight(raw: dict) -> None:
        raw["walls"][2]["sizing"].update(width_min="12 in", width_max="14 in", thickness_min="12 in", thickness_max="13 in")

    package = render(variant(demo_document, tight), wall_ids=["C3"])
    text = package.text_of("Wall C3")
    assert "No candidate within the bounds passes." in text
    assert "would help" in text


def _no_loads(raw: dict) -> None:
    raw["walls"][0]["loads"] = []


def _overturns(raw: dict) -> None:
    raw["walls"][0]["loads"].append({"type": "lateral", "case": "E", "value": "80 kip", "height": "21 ft"})


def _net_with_increase(raw: dict) -> None:
    raw["soil"].update(bearing_basis="net", cohesion="200 psf")
    raw["criteria"].update(bearing_increase=1.33)


def test_wall_without_loads_is_refused_not_printed(demo_document) -> None:
    """A wall with no loads is refused when the project is read, so no package shows it passing."""
    with pytest.raises(InputError, match=r"walls\[0\]\.loads: is empty"):
        variant(demo_document, _no_loads)


def test_resultant_beyond_the_footing_is_no_equilibrium(demo_document) -> None:
    """A lateral load the footing cannot hold (engine: bearing ratio 0, not stable) is reported as overturning."""
    project = variant(demo_document, _overturns)
    result = check_wall(project, project.walls[0])
    assert not result.cases[result.governing[Check.BEARING].case_index].bearing.stable
    text = render(project, wall_ids=["N1"]).text_of("Wall N1")
    assert "the footing cannot be in equilibrium on the soil. It overturns; bearing fails." in text
    assert "Soil bearing FAILS" in text and "No candidate within the bounds passes." in text


def test_net_allowable_and_increase_are_written_out(demo_document) -> None:
    """A net allowable subtracts the overburden before comparing; the W/E increase multiplies the allowable."""
    project = variant(demo_document, _net_with_increase)
    result = check_wall(project, project.walls[0])
    br = result.cases[result.governing[Check.BEARING].case_index].bearing
    text = render(project, wall_ids=["N1"]).text_of("Wall N1")
    assert f"= {format_quantity(br.pressure_compared, Kind.PRESSURE, 'US')}" in text
    assert "net pressure, for a net allowable" in text
    assert "= 2,000 psf × 1.33" in text and f"= {format_quantity(br.allowable, Kind.PRESSURE, 'US')}" in text
    assert "min(200 psf × " in text  # the cohesion term, capped at 0.5 N


def test_service_method_marks_checks_that_do_not_apply(demo_document) -> None:
    """Under the service-fs method gravity combinations check bearing only: the appendix prints n/a."""
    project = variant(demo_document, lambda raw: raw.update(criteria={"method": "service-fs"}))
    package = render(project, wall_ids=["N1"])
    assert "Service loads with factors of safety" in package.text_of("Design basis")
    case = next(c for c in check_wall(project, project.walls[0]).cases if c.combination == "D + L")
    assert case.overturning is None and case.sliding is None and case.bearing is not None  # engine: bearing only
    n = format_quantity(case.vertical, Kind.FORCE, "US").removesuffix(" kip")
    appendix = package.text_of("Appendix: all cases")
    assert f"D + L none {n} 0.00 0.00 0.000 n/a n/a n/a n/a n/a" in appendix
    assert "n/a: the combination does not apply to that check." in appendix  # the key explains the mark it uses


def test_si_project_prints_si_units_on_a4(demo_document) -> None:
    """An SI project prints kN, kPa and metres, on A4 paper."""
    from pypdf import PdfReader

    project = variant(demo_document, lambda raw: raw.update(units="SI"))
    package = render(project, wall_ids=["N1"])
    text = package.text_of("Wall N1")
    result = check_wall(project, project.walls[0])
    br = result.cases[result.governing[Check.BEARING].case_index].bearing
    assert (
        f"qmax = {format_quantity(br.q_max, Kind.PRESSURE, 'SI')}" in text
        or f"= {format_quantity(br.q_max, Kind.PRESSURE, 'SI')}" in text
    )
    assert " kN" in text and " kPa" in text and "psf" not in text and " kip" not in text
    box = PdfReader(io.BytesIO(package.pdf)).pages[0].mediabox
    assert (round(float(box.width)), round(float(box.height))) == (595, 842)


def test_soil_report_is_named_or_left_blank(demo_document) -> None:
    """The geotechnical report named in the file (or given) is printed; without one, a blank to fill."""
    from dataclasses import replace

    named = render(demo_document.project, wall_ids=["N1"], soil_report="Soils report 12-345, Acme Geotech")
    assert "Soils report 12-345, Acme Geotech" in named.text_of("Design basis")
    from_file = render(demo_document.project, wall_ids=["N1"])  # the model carries soil.report
    assert demo_document.raw["soil"]["report"] in from_file.text_of("Design basis")
    project = demo_document.project
    unnamed = replace(project, soil=replace(project.soil, report=""))
    blank = render(unnamed, wall_ids=["N1"])
    assert "not stated in the project file: ____" in blank.text_of("Design basis")


def test_without_dejavu_the_builtin_font_is_used(demo_document, monkeypatch) -> None:
    """With no DejaVu font the package still renders, with ASCII stand-ins for symbols Helvetica lacks."""
    import kernline.engine.report as report

    monkeypatch.setattr(report, "_fonts", lambda: report._Fonts("Helvetica", "Helvetica-Bold", False))
    package = render(demo_document, wall_ids=["N1"])
    text = package.text_of("Wall N1")
    assert ">= 1.00 required" in text and "≥" not in text
    assert "sum f H" in text


def test_missing_font_folder_falls_back_to_helvetica() -> None:
    """Looking for DejaVu in a folder without it gives the built-in font, not an error."""
    from kernline.engine.report import _fonts

    fonts = _fonts("/nonexistent-folder")
    assert (fonts.regular, fonts.unicode) == ("Helvetica", False)


def test_write_report_is_atomic_and_overwrites(demo_document, tmp_path: Path) -> None:
    """write_report leaves a whole PDF and no temporary file, and replaces an older file in place."""
    out = tmp_path / "package.pdf"
    out.write_bytes(b"old")
    write_report(demo_document, out, wall_ids=["S2"])
    data = out.read_bytes()
    assert data.startswith(b"%PDF") and data.rstrip().endswith(b"%%EOF")
    assert sorted(p.name for p in tmp_path.iterdir()) == ["package.pdf"]
    assert len(page_texts(data)) > 5


def test_write_report_refuses_bad_paths(demo_document, tmp_path: Path) -> None:
    """A missing folder or a folder as the output is an InputError with the path in the message."""
    with pytest.raises(InputError, match="no such folder"):
        write_report(demo_document.project, tmp_path / "missing" / "out.pdf")
    with pytest.raises(InputError, match="is a folder"):
        write_report(demo_document.project, tmp_path)


def test_importing_the_package_modules_does_not_import_reportlab() -> None:
    """engine.report imports reportlab lazily, and engine.calc_package never does (fast command line)."""
    code = "import sys, kernline.engine.calc_package, kernline.engine.report; print('reportlab' in sys.modules)"
    out = subprocess.run([sys.executable, "-c", code], capture_output=True, text=True, check=True)
    assert out.stdout.strip() == "False"
    folder = Path(__file__).resolve().parents[2] / "engine" / "calc_package"
    for source in folder.glob("*.py"):
        assert "reportlab" not in source.read_text(encoding="utf-8"), source.name


def test_command_line_report(tmp_path: Path) -> None:
    """kernline report FILE -o OUT --walls C3 writes the package of that wall; a bad id exits 2 with a message."""
    from kernline.engine.resources import resource_path

    demo = resource_path("demo.kernline")
    out = tmp_path / "c3.pdf"
    env = dict(os.environ, QT_QPA_PLATFORM="offscreen")
    done = subprocess.run(
        [sys.executable, "-m", "kernline.app.cli", "report", str(demo), "-o", str(out), "--walls", "C3"],
        capture_output=True,
        text=True,
        env=env,
    )
    assert done.returncode == 0, done.stderr
    texts = page_texts(out.read_bytes())
    assert any(re.search(r"Sheet \d+ of \d+ Wall C3: ", t) for t in texts)
    assert not any(re.search(r"Sheet \d+ of \d+ Wall N1: ", t) for t in texts)
    bad = subprocess.run(
        [sys.executable, "-m", "kernline.app.cli", "report", str(demo), "-o", str(out), "--walls", "Q7"],
        capture_output=True,
        text=True,
        env=env,
    )
    assert bad.returncode == 2
    assert "Q7" in bad.stderr and "Traceback" not in bad.stderr

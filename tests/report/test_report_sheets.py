"""The package's sheets: title strip, sheet numbering, contents, outline, links, metadata, cautions, seal,
text sizes, assumed values and citations.

Source of what a sheet must carry: plan reviewers expect the project, "sheet N of M", the revision and
its date, the originator and checker on every sheet, and a clear space for the seal (common practice);
the compact layout, navigation, assumptions and citations are those asked for in issue 12 of the
project's tracker. The citations checked are the clause numbers of ASCE/SEI 7-16 (2.4.1, 2.4.5,
12.4.2.2) and IBC 2021 (1605.1.1, Table 1806.2).
"""

from __future__ import annotations

import io
import re

import pytest
from concrete_project import concrete_raw
from kernline.engine import CAUTION, __version__
from kernline.engine.calc_package import SEAL_SIZE
from kernline.engine.project_file import parse_project
from kernline.engine.report import STRIP_HEIGHT, TEXT_FLOOR
from report_helpers import ISSUED, RenderedPackage, normalize, render


@pytest.fixture(scope="module")
def member() -> RenderedPackage:
    """A project of our own with a concrete section: two walls."""
    return render(parse_project(concrete_raw()))


def test_every_page_has_its_title_strip(demo: RenderedPackage, demo_document) -> None:
    """Each page names the project, job number, sheet N of M, its subject, by / checked / revision / date."""
    info = demo_document.project.info
    total = len(demo.pages)
    for i, text in enumerate(demo.pages):
        where = f"page {i + 1}"
        assert re.findall(r"Sheet \d+ of \d+", text) == [f"Sheet {i + 1} of {total}"], where
        for expected in (info.name, info.number, info.engineer, ISSUED.isoformat(), "checked", "rev."):
            assert expected in text, f"{where}: {expected!r}"
        assert f"Kernline {__version__}" in text, where
        assert demo.subject(i), where


def test_title_strip_is_at_most_three_quarters_of_an_inch() -> None:
    assert STRIP_HEIGHT <= 0.75 * 72.0


def test_revision_date_from_the_project_print_date_in_the_footer(member: RenderedPackage) -> None:
    """The strip's date is the project's revision date; the footer carries the date of the print."""
    import datetime as dt

    for page in member.pages:
        assert "rev. date 2026-03-14" in page  # the tests' issued date stands for the revision date
        assert f"Printed {dt.date.today().isoformat()}" in page


def test_metadata_names_the_engineer_and_the_print_date(member: RenderedPackage) -> None:
    import datetime as dt

    from pypdf import PdfReader

    meta = PdfReader(io.BytesIO(member.pdf)).metadata
    assert meta.author == "Test Engineer"
    assert "Test hall for the concrete sheets" in meta.title
    assert "concrete design" in meta.subject
    assert meta.creation_date.date() == dt.date.today()


def test_caution_once_on_the_cover_and_once_in_the_general_notes(demo: RenderedPackage) -> None:
    text = normalize(CAUTION)
    pages = [i for i, p in enumerate(demo.pages) if text in p]
    assert len(pages) == 2
    assert pages[0] == 0
    assert demo.subject(pages[1]) == "References and notes"
    assert sum(p.count(text) for p in demo.pages) == 2


def test_seal_square_on_the_cover_only_and_empty(demo: RenderedPackage, demo_document) -> None:
    """The 3 in seal square is drawn on the cover only, and nothing is drawn inside it."""
    from kernline.engine.calc_package import Label, Line, Rect, build_package

    assert SEAL_SIZE == pytest.approx(216.0)
    assert "Engineer's seal and signature" in demo.pages[0]
    assert all("Engineer's seal and signature" not in p for p in demo.pages[1:])
    package = build_package(demo_document.project)
    seal = [b for b in package.sections[0].blocks if getattr(b, "shapes", None) and any(isinstance(s, Rect) for s in b.shapes)]
    assert len(seal) == 1
    square = next(s for s in seal[0].shapes if isinstance(s, Rect))
    assert (square.w, square.h) == (SEAL_SIZE, SEAL_SIZE)
    for shape in seal[0].shapes:
        if shape is square:
            continue
        x, y = (
            (shape.x, shape.y)
            if isinstance(shape, Label)
            else (max(shape.x1, shape.x2), shape.y1)
            if isinstance(shape, Line)
            else (0, 0)
        )
        inside = square.x < x < square.x + square.w and square.y < y < square.y + square.h
        assert not inside, shape


def test_small_seal_box_on_every_sheet_is_an_option(demo_document) -> None:
    """Off by default; with the option each strip carries a small box marked "seal"."""
    pages = render(demo_document, seal_every_sheet=True, wall_ids="N1").pages
    assert all(re.search(r"\bseal\b", p) for p in pages)


def test_sheet_count(demo: RenderedPackage, demo_document, member: RenderedPackage) -> None:
    """At most 4 + 4 sheets per wall; each wall at most two stability sheets and one concrete sheet."""
    walls = demo_document.project.walls
    assert len(demo.pages) <= 4 + 4 * len(walls)
    for package, ids in ((demo, [w.id for w in walls]), (member, ["R1", "P2"])):
        subjects = [package.subject(i) for i in range(len(package.pages))]
        for wall_id in ids:
            assert 1 <= subjects.count(f"Wall {wall_id}: stability") <= 2, wall_id
            assert subjects.count(f"Wall {wall_id}: concrete") <= 1, wall_id
        assert subjects.count("Appendix: all cases") <= len(ids)


def test_outline_lists_front_matter_walls_with_their_checks_and_the_appendix(member: RenderedPackage) -> None:
    from pypdf import PdfReader

    reader = PdfReader(io.BytesIO(member.pdf))

    def titles(items) -> list:
        out = []
        for item in items:
            out.append(titles(item) if isinstance(item, list) else item.title)
        return out

    outline = titles(reader.outline)
    top = [t for t in outline if isinstance(t, str)]
    assert top[0] == "Front matter"
    assert outline[1][:2] == ["Project information and contents", "Design basis"]
    assert "Wall R1: Concrete wall on a reinforced footing" in top
    assert "Wall P2: Masonry wall on a plain footing" in top
    assert top[-1] == "Appendix: every combination and direction"
    r1 = outline[outline.index("Wall R1: Concrete wall on a reinforced footing") + 1]
    flat = str(r1)
    for entry in ("Sketch, inputs and self weight", "Stability checks and sizing", "Overturning", "Sliding", "Soil bearing"):
        assert entry in flat, entry
    assert "Concrete design (ACI 318-19)" in flat


def test_schedule_rows_link_to_their_walls(member: RenderedPackage) -> None:
    """The summary schedule's rows and the contents lines are links to the sheets they name."""
    from pypdf import PdfReader

    reader = PdfReader(io.BytesIO(member.pdf))
    subjects = [member.subject(i) for i in range(len(member.pages))]
    schedule = subjects.index("Summary schedule")
    targets = {reader.pages[subjects.index(f"Wall {w}: stability")].indirect_reference.idnum for w in ("R1", "P2")}
    annots = [a.get_object() for a in reader.pages[schedule].get("/Annots", [])]
    linked = {a["/Dest"][0].idnum for a in annots if "/Dest" in a}
    assert targets <= linked
    cover = [a.get_object() for a in reader.pages[0].get("/Annots", [])]
    assert len(cover) >= 5  # the contents lines


def _text_sizes(pdf: bytes) -> list[tuple[float, bool]]:
    """The size of every piece of text shown in the PDF, and whether a smaller size of the same text run
    (a subscript) could be meant: read back from the content streams (``Tf`` sets the size, ``Tj``/``TJ``
    shows text)."""
    from pypdf import PdfReader
    from pypdf.generic import ContentStream

    shown: list[tuple[float, bool]] = []
    reader = PdfReader(io.BytesIO(pdf))
    for page in reader.pages:
        size = 0.0
        for operands, operator in ContentStream(page.get_contents(), reader).operations:
            if operator == b"Tf":
                size = round(float(operands[1]), 2)
            elif operator in (b"Tj", b"TJ", b"'", b'"'):
                shown.append((size, True))
    return shown


def too_small(sizes: set[float]) -> list[float]:
    """Sizes below the 6.5 pt floor that are not the subscript size (0.72 ×) of a size at or above it."""
    subscript = 0.72  # engine.report's subscript scale
    allowed = {round(s * subscript, 2) for s in sizes if s >= TEXT_FLOOR - 1e-6}
    return sorted(s for s in sizes if s < TEXT_FLOOR - 1e-6 and not any(abs(s - a) <= 0.011 for a in allowed))


@pytest.mark.parametrize("which", ["member", "demo"])
def test_font_size_floor(which: str, member: RenderedPackage, demo: RenderedPackage) -> None:
    """Every piece of text read back from the PDF is at least 6.5 pt (drawings and tables), or the subscript
    size of such text; the smallest full-size text is the floor or above it."""
    package = member if which == "member" else demo
    sizes = {s for s, _ in _text_sizes(package.pdf)}
    assert not too_small(sizes), too_small(sizes)
    subscripts = {round(s * 0.72, 2) for s in sizes}
    assert min(sizes - subscripts) >= TEXT_FLOOR


def test_a_label_below_the_floor_would_be_caught() -> None:
    """5.5 pt text (the old drawing labels) is neither 6.5 pt or more nor 0.72 × a size in use."""
    assert too_small({5.5, 6.5, 7.0, 8.0}) == [5.5]
    assert too_small({4.68, 6.5, 8.0}) == []  # 0.72 × 6.5: a subscript of 6.5 pt text


def test_body_text_is_at_least_seven_points() -> None:
    from kernline.engine.report import _STYLES

    for name in ("body", "small", "note", "bullet", "calc", "result", "remark", "pass", "fail", "h2"):
        assert _STYLES[name].size >= 7.0, name


def test_assumed_values_are_marked_and_listed_in_the_design_basis(member: RenderedPackage) -> None:
    """The test project enters no required ratios: each is printed "(assumed)" and the list says why."""
    basis = member.text_of("Design basis")
    assert "Assumed values" in basis
    assert "criteria.required.overturning" in basis
    assert "1.00 (assumed)" in basis


def test_design_basis_citations(member: RenderedPackage, demo: RenderedPackage) -> None:
    """ASCE 7-16 2.4.1 and 2.4.5 with Ev per 12.4.2.2; required ratios cited (IBC 2021 1605.1.1, ASCE 7-16 2.4);
    soil values from the soil report; Table 1806.2 only with a presumptive class."""
    for package, report in ((member, "Test soil letter TS-7"), (demo, "Demo geotechnical memo GM-26-031")):
        basis = package.text_of("Design basis")
        for expected in (
            "the basic combinations of section 2.4.1 with the seismic load effect in the ASD forms of section 2.4.5",
            "Ev = 0.2 SDS D (12.4.2.2)",
            "Basis of the required ratios a ratio of 1.0 with the ASD combinations (IBC 2021 1605.1.1, ASCE 7-16 2.4)",
            f"Source of the soil values {report}",
        ):
            assert expected in basis, expected
        assert "12.4.2.3" not in " ".join(package.pages)  # ASCE 7-10 numbering
        assert "1806.2, presumptive" not in basis
    # the demo's passive value (250 psf/ft) exceeds every class of Table 1806.2: it is the soil report's
    assert "250 psf/ft" in demo.text_of("Design basis")
    assert "Table 1806.2" not in demo.text_of("Wall N1")


def test_presumptive_class_cites_table_1806_2() -> None:
    """With a presumptive class (and no report) the soil values are Table 1806.2's, cited as such."""
    raw = concrete_raw()
    raw["soil"] = {"presumptive_class": 4, "unit_weight": "110 pcf"}
    basis = render(parse_project(raw), wall_ids="P2").text_of("Design basis")
    assert "Source of the soil values IBC 2021 Table 1806.2, presumptive class 4" in basis
    assert "Test soil letter" not in basis


def test_revision_date_is_the_projects_never_the_print_date() -> None:
    """The strip's date is project.revision_date; without one it is a dash, not the print date."""
    import datetime as dt

    raw = concrete_raw()
    dated = render(parse_project(raw), wall_ids="P2", issued=None)
    assert all(f"rev. date {raw['project']['revision_date']}" in p for p in dated.pages)
    del raw["project"]["revision_date"]
    undated = render(parse_project(raw), wall_ids="P2", issued=None)
    for page in undated.pages:
        assert "rev. date —" in page
        assert f"rev. date {dt.date.today().isoformat()}" not in page
        assert f"Printed {dt.date.today().isoformat()}" in page  # the print date is in the footer


def test_assumed_beside_a_defaulted_value_on_the_wall_sheet(demo: RenderedPackage, demo_document) -> None:
    """E4's line loads were entered without start and end: their extents print "(assumed)"; its point loads'
    positions were entered and do not."""
    e4 = demo.text_of("Wall E4: stability")
    assert e4.count('0" to 22\'-0" (assumed)') == 3
    assert 'at 3" (assumed)' not in e4 and 'at 3"' in e4
    paths = [a.field for a in demo_document.project.assumptions]
    assert "walls[3].loads[0]" in " ".join(paths)


def test_service_fs_required_ratios_are_set_by_the_engineer() -> None:
    raw = concrete_raw()
    raw["criteria"] = {"method": "service-fs", "required": {"overturning": 1.5, "sliding": 1.5, "bearing": 1.0}}
    basis = render(parse_project(raw), wall_ids="P2").text_of("Design basis")
    assert "1.50 (set by the engineer)" in basis


def test_us_package_is_letter_size(demo: RenderedPackage) -> None:
    """US projects print on US letter (8.5 x 11 in), so the drawing scales hold at 100%."""
    from pypdf import PdfReader

    box = PdfReader(io.BytesIO(demo.pdf)).pages[0].mediabox
    assert (float(box.width), float(box.height)) == pytest.approx((612.0, 792.0))


def test_command_line_seal_every_sheet(tmp_path) -> None:
    """kernline report --seal-every-sheet puts the small seal box in every strip; without it, only the cover has a seal."""
    import os
    import subprocess
    import sys

    from kernline.engine.resources import resource_path
    from report_helpers import page_texts

    env = dict(os.environ, QT_QPA_PLATFORM="offscreen")
    texts = {}
    for flag in ((), ("--seal-every-sheet",)):
        out = tmp_path / f"p{len(flag)}.pdf"
        command = [sys.executable, "-m", "kernline.app.cli", "report", str(resource_path("demo.kernline")), "-o", str(out)]
        done = subprocess.run([*command, "--walls", "N1", *flag], capture_output=True, text=True, env=env)
        assert done.returncode == 0, done.stderr
        texts[bool(flag)] = page_texts(out.read_bytes())
    assert all(re.search(r"\bseal\b", p) for p in texts[True])
    assert not any(re.search(r"\bseal\b", p) for p in texts[False][1:])

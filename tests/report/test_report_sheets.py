"""The package's sheets: title block on every page, sheet numbering, contents, cautions, seal space.

Source of what a sheet must carry: issue 4 item 2 and the practice notes section 4 (plan reviewers
expect project title, "sheet __ of __", revision and date on every page, the originator and checker,
the program's name and version, and space for the seal) — common practice.
"""

from __future__ import annotations

import re
import shutil
import subprocess
from pathlib import Path

import pytest
from kernline.engine import CAUTION, __version__
from kernline.engine.report import BAND_HEIGHT, MARGIN_BOTTOM, SEAL_SIZE
from report_helpers import ISSUED, RenderedPackage, normalize


def test_every_page_has_its_title_block(demo: RenderedPackage, demo_document) -> None:
    """Each page names the project, number, client, subject, sheet N of M, preparer, date, checker, revision, program."""
    info = demo_document.project.info
    total = len(demo.pages)
    assert total > 10
    for i, text in enumerate(demo.pages):
        where = f"page {i + 1}"
        assert f"Sheet {i + 1} of {total}" in text, where
        assert re.findall(r"Sheet \d+ of \d+", text) == [f"Sheet {i + 1} of {total}"], where
        for expected in (info.name, info.number, info.client, info.engineer, ISSUED.isoformat()):
            assert expected in text, f"{where}: {expected!r}"
        for label in ("Project number", "Client", "Sheet subject", "Prepared by", "Date", "Checked by", "Revision"):
            assert label in text, f"{where}: {label}"
        assert f"Kernline {__version__}" in text, where
        assert "Engineer's seal and signature" in text, where
        assert demo.subject(i), where


def test_checked_by_is_left_blank_and_revision_printed(demo: RenderedPackage) -> None:
    """The checker's field is blank to fill by hand; the revision defaults to 0."""
    assert "Checked by Revision 0" in demo.pages[0]


def test_subjects_follow_the_sections(demo: RenderedPackage, demo_document) -> None:
    """Front matter first, then each wall's sheets, then each wall's appendix, in the project's order."""
    subjects = [demo.subject(i) for i in range(len(demo.pages))]
    ordered = list(dict.fromkeys(subjects))
    ids = [w.id for w in demo_document.project.walls]
    assert ordered == [
        "Project information",
        "Design basis",
        "References and notes",
        "Cautions",
        "Summary schedule",
        *[f"Wall {i}" for i in ids],
        *[f"Appendix, wall {i}" for i in ids],
    ]
    # each subject's sheets are consecutive
    for subject in ordered:
        idx = [i for i, s in enumerate(subjects) if s == subject]
        assert idx == list(range(idx[0], idx[-1] + 1)), subject


def test_contents_give_the_right_sheet_numbers(demo: RenderedPackage, demo_document) -> None:
    """The contents on the cover point at the sheet where each wall's calculation and appendix start."""
    subjects = [demo.subject(i) for i in range(len(demo.pages))]
    cover = demo.pages[0]
    for wall in demo_document.project.walls:
        start = subjects.index(f"Wall {wall.id}") + 1
        appendix = subjects.index(f"Appendix, wall {wall.id}") + 1
        assert f"sheet {start}; all cases: sheet {appendix}" in cover, wall.id
    assert f"sheet {subjects.index('Cautions') + 1}" in cover


def test_cautions_page_is_present(demo: RenderedPackage) -> None:
    """A sheet headed Cautions states that the results are for a licensed engineer's review and defer to
    the local code and the geotechnical report (issue 4 item 3)."""
    cautions = demo.text_of("Cautions")
    assert cautions.startswith("Cautions") or "Cautions " in cautions
    assert normalize(CAUTION) in cautions
    assert "licensed engineer" in cautions
    assert "local building code" in cautions
    assert "geotechnical report" in cautions
    # and the caution is in every title block too
    assert all("Results are for review by a licensed engineer" in p for p in demo.pages)


def test_design_basis_lists_the_combinations_and_soil_source(demo: RenderedPackage, demo_document) -> None:
    """The design basis lists every combination in force, the S_DS, and the report the soil values come from."""
    from kernline.engine.combinations import combinations_of

    basis = demo.text_of("Design basis")
    for combo in combinations_of(demo_document.project.criteria):
        assert combo.name in basis
    assert "ASCE 7-16" in basis and "2.4.1" in basis and "2.4.5" in basis and "12.4.2.2" in basis
    assert "SDS" in basis  # its value shows in the dead-load factors of the seismic combinations above
    assert demo_document.raw["soil"]["report"] in basis
    assert "150 pcf" in basis  # concrete unit weight of the demo footings


def test_references_cite_the_code_sections_and_textbooks(demo: RenderedPackage) -> None:
    """ASCE 7-16 2.4.1, 2.4.5 and 12.4.2.2, IBC 2021 1605, 1806 and 1809, and the textbook basis are cited."""
    refs = demo.text_of("References and notes")
    for expected in (
        "ASCE/SEI 7-16",
        "2.4.1",
        "2.4.5",
        "12.4.2.2",
        "1809.4",
        "International Building Code 2021",
        "1605",
        "1806",
        "Principles of Foundation Engineering",
        "Foundation Analysis and Design",
    ):
        assert expected in refs, expected


@pytest.mark.skipif(shutil.which("pdftoppm") is None, reason="pdftoppm (poppler-utils) is not installed")
def test_seal_square_is_empty_on_every_sheet(demo: RenderedPackage, tmp_path: Path) -> None:
    """The 3 in square kept for the seal has nothing drawn inside its border on any sheet."""
    assert SEAL_SIZE == pytest.approx(216.0)  # 3 in at 72 points per inch
    pdf = tmp_path / "package.pdf"
    pdf.write_bytes(demo.pdf)
    dpi = 30
    subprocess.run(["pdftoppm", "-r", str(dpi), "-gray", str(pdf), str(tmp_path / "p")], check=True)
    images = sorted(tmp_path.glob("p-*.pgm"))
    assert len(images) == len(demo.pages)
    for image in images:
        width, height, pixels = _read_pgm(image)
        scale = dpi / 72.0
        page_w, page_h = width / scale, height / scale
        x0 = (page_w - 522.0) / 2.0 + 522.0 - SEAL_SIZE
        inset = 4.0  # points inside the border
        left, right = int((x0 + inset) * scale) + 1, int((x0 + SEAL_SIZE - inset) * scale) - 1
        top = int((page_h - (MARGIN_BOTTOM + SEAL_SIZE - inset)) * scale) + 1
        bottom = int((page_h - (MARGIN_BOTTOM + inset)) * scale) - 1
        assert BAND_HEIGHT > SEAL_SIZE
        dark = [pixels[y * width + x] for y in range(top, bottom) for x in range(left, right) if pixels[y * width + x] < 250]
        assert not dark, f"{image.name}: {len(dark)} drawn pixels inside the seal square"


def _read_pgm(path: Path) -> tuple[int, int, bytes]:
    """Width, height and 8-bit pixels of a binary PGM file (what pdftoppm -gray writes)."""
    data = path.read_bytes()
    fields: list[bytes] = []
    pos = 0
    while len(fields) < 4:
        while data[pos : pos + 1].isspace():
            pos += 1
        end = pos
        while not data[end : end + 1].isspace():
            end += 1
        fields.append(data[pos:end])
        pos = end
    assert fields[0] == b"P5" and int(fields[3]) == 255
    return int(fields[1]), int(fields[2]), data[pos + 1 :]


def test_us_package_is_letter_size(demo: RenderedPackage) -> None:
    """US projects print on US letter (8.5 x 11 in), so the drawing scales hold at 100%."""
    import io

    from pypdf import PdfReader

    box = PdfReader(io.BytesIO(demo.pdf)).pages[0].mediabox
    assert (float(box.width), float(box.height)) == pytest.approx((612.0, 792.0))

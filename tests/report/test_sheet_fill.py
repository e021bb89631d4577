"""No sheet of the demo package is more than about 60% blank, except the last sheet of its section.

Source: issue 12 §1 (layout): "No sheet is more than about 60% blank, except the last of a section".
The filled share of each sheet is measured from the laid-out frames (engine.report.sheet_fill): how far
down the body frame, between the title strip and the footer, the content reaches.
"""

from __future__ import annotations

from dataclasses import replace

from kernline.engine.calc_package import Drawing, Para, Rect, Section
from kernline.engine.report import _frame_geometry, render_package, report_package, sheet_fill
from report_helpers import ISSUED, RenderedPackage, page_texts

LEAST_FILL = 0.40  # "no more than about 60% blank"


def _sections(package: RenderedPackage) -> list[tuple[str, bool]]:
    """Each sheet's subject and whether it is the last sheet of its run of sheets with that subject."""
    subjects = [package.subject(i) for i in range(len(package.pages))]
    return [(s, k + 1 == len(subjects) or subjects[k + 1] != s) for k, s in enumerate(subjects)]


def test_sheet_fill_matches_the_rendered_sheets(demo_document) -> None:
    """One share per sheet, each between 0 and 1; the cover is nearly full, and a made-up one-sheet
    section (the summary schedule of five walls) less so."""
    package = report_package(demo_document, issued=ISSUED)
    fill = sheet_fill(package)
    assert len(fill) == len(page_texts(render_package(package)))
    assert all(0.0 <= f <= 1.0 for f in fill)
    assert fill[0] > 0.8


def test_no_sheet_is_more_than_about_sixty_percent_blank(demo_document, demo: RenderedPackage) -> None:
    fill = sheet_fill(report_package(demo_document, issued=ISSUED))
    sections = _sections(demo)
    assert len(fill) == len(sections)
    thin = [
        f"sheet {k} ({subject}): {share:.0%} filled"
        for k, (share, (subject, last)) in enumerate(zip(fill, sections, strict=True), start=1)
        if not last and share < LEAST_FILL
    ]
    assert not thin, thin


def test_a_mostly_blank_sheet_would_be_caught(demo_document) -> None:
    """A line of text followed by a drawing too tall to join it leaves a first sheet nearly blank: the
    measure says so (and says the drawing's sheet is mostly full)."""
    package = report_package(demo_document, issued=ISSUED)
    frame_height = _frame_geometry(package.units)[5]
    tall = Drawing(400.0, frame_height - 8.0, (Rect(0.0, 0.0, 400.0, frame_height - 8.0),))
    blank = replace(package, sections=(Section("test", "Test", "Test", (Para("One line."), tall)),))
    fill = sheet_fill(blank)
    assert len(fill) == 2
    assert fill[0] < 0.1 < LEAST_FILL < 0.75 < fill[1]


HEADROOM = 0.95  # a wall's last stability sheet keeps a few lines free, so one longer remark adds no sheet


def test_each_walls_last_stability_sheet_has_headroom(demo_document, demo: RenderedPackage) -> None:
    """The demo's walls end their stability sheets at most 95% full (E4's second sheet was 100%)."""
    fill = sheet_fill(report_package(demo_document, issued=ISSUED))
    sections = _sections(demo)
    last = {
        subject: share for share, (subject, end) in zip(fill, sections, strict=True) if end and subject.endswith(": stability")
    }
    assert len(last) == len(demo_document.project.walls)
    full = {subject: round(share, 3) for subject, share in last.items() if share > HEADROOM}
    assert not full, full

"""The optional verification appendix of the calculation package.

What it must do is asked in issue 12 of the project's tracker (item 7): off by default; when asked for,
the benchmark cases of the verification register (docs/verification.md) are run and their published
values printed beside the program's own, with the date of the run and the program's version, its own
outline entry and contents line, in the package's text sizes. The values themselves are checked
against the register in tests/engine/verification/test_evidence_cases.py.
"""

from __future__ import annotations

import datetime as dt
import io
import re

import pytest
from kernline.engine import __version__
from kernline.engine.calc_package.verification import SUBJECT, TITLE
from kernline.engine.evidence import CASES, run_cases
from kernline.engine.report import TEXT_FLOOR
from report_helpers import RenderedPackage, body, render

PRINTED = dt.date(2026, 4, 2)


@pytest.fixture(scope="module")
def plain_package(demo_document) -> RenderedPackage:
    return render(demo_document, wall_ids="N1", printed=PRINTED)


@pytest.fixture(scope="module")
def with_appendix(demo_document) -> RenderedPackage:
    return render(demo_document, wall_ids="N1", printed=PRINTED, verification=True)


def _appendix_pages(package: RenderedPackage) -> list[str]:
    return [p for i, p in enumerate(package.pages) if package.subject(i) == SUBJECT]


def test_off_by_default(plain_package: RenderedPackage) -> None:
    """Without the option no sheet is the appendix and the text never mentions it."""
    assert not _appendix_pages(plain_package)
    assert "Verification appendix" not in " ".join(plain_package.pages)


def test_on_adds_its_sheets_at_the_end(plain_package: RenderedPackage, with_appendix: RenderedPackage) -> None:
    """The appendix adds one to three sheets after everything else; the sheets before it are unchanged in number."""
    added = len(with_appendix.pages) - len(plain_package.pages)
    assert 1 <= added <= 3
    pages = _appendix_pages(with_appendix)
    assert len(pages) == added
    assert with_appendix.pages[-added:] == pages
    subjects = [with_appendix.subject(i) for i in range(len(plain_package.pages))]
    assert subjects == [plain_package.subject(i) for i in range(len(plain_package.pages))]


def test_outline_entry_and_contents_line(with_appendix: RenderedPackage) -> None:
    """Its title is the last top-level outline entry, and the cover's contents lists it with its sheet."""
    from pypdf import PdfReader

    reader = PdfReader(io.BytesIO(with_appendix.pdf))
    top = [item.title for item in reader.outline if not isinstance(item, list)]
    assert top[-1] == TITLE
    first_sheet = len(with_appendix.pages) - len(_appendix_pages(with_appendix)) + 1
    contents = body(with_appendix.pages[0])
    contents = contents[contents.index("Contents") :]
    assert TITLE in contents
    # the contents' titles come out of the PDF first and their sheet numbers after them, in the same order
    assert re.findall(r"sheet (\d+)", contents)[-1] == str(first_sheet)


def test_heading_says_what_it_is_when_and_which_version(with_appendix: RenderedPackage) -> None:
    text = " ".join(body(p) for p in _appendix_pages(with_appendix))
    assert PRINTED.isoformat() in text
    assert f"Kernline {__version__}" in text
    assert "reproduces the cited values" in text
    assert "not a substitute for the engineer's review" in text
    assert f"{len(CASES)} of {len(CASES)} values agree" in text


def test_every_case_published_and_computed_value_is_printed(with_appendix: RenderedPackage) -> None:
    """Each row's published value, the value this version computes and the difference are in the PDF text."""
    text = " ".join(body(p) for p in _appendix_pages(with_appendix))
    results = run_cases()
    assert len(results) == len(CASES)
    for r in results:
        assert r.passes, r.benchmark.quantity
        for value in (r.benchmark.published, r.computed_text, r.difference_text, r.tolerance_text):
            assert value in text, (r.benchmark.case, value)
    assert text.count("agrees") == len(CASES)
    for module in {b.module.rsplit("/", 1)[-1] for b in CASES}:
        assert module in text


def test_font_size_floor_on_the_appendix(with_appendix: RenderedPackage) -> None:
    """Its tables and notes are at least 6.5 pt (subscripts at their reduced size of such text)."""
    from pypdf import PdfReader

    reader = PdfReader(io.BytesIO(with_appendix.pdf))
    sizes: set[float] = set()
    for k, page in enumerate(reader.pages):
        if with_appendix.subject(k) != SUBJECT:
            continue
        for m in re.finditer(rb"/F\d+\s+([\d.]+)\s+Tf", page.get_contents().get_data()):
            sizes.add(round(float(m.group(1)), 2))
    assert sizes
    for s in sizes:
        assert s >= TEXT_FLOOR - 1e-6 or s >= round(TEXT_FLOOR * 0.72, 2) - 0.01, s
    assert min(s for s in sizes if s >= TEXT_FLOOR - 1e-6) >= TEXT_FLOOR


def test_command_line_flag(tmp_path) -> None:
    """kernline report --verification-appendix adds the appendix; without the flag there is none."""
    import os
    import subprocess
    import sys

    from kernline.engine.resources import resource_path
    from report_helpers import page_texts

    env = dict(os.environ, QT_QPA_PLATFORM="offscreen")
    found = {}
    for flag in ((), ("--verification-appendix",)):
        out = tmp_path / f"p{len(flag)}.pdf"
        command = [sys.executable, "-m", "kernline.app.cli", "report", str(resource_path("demo.kernline")), "-o", str(out)]
        done = subprocess.run([*command, "--walls", "N1", *flag], capture_output=True, text=True, env=env)
        assert done.returncode == 0, done.stderr
        found[bool(flag)] = any(TITLE in p for p in page_texts(out.read_bytes()))
    assert found == {False: False, True: True}


def test_a_case_that_differs_or_cannot_run_is_printed_in_bold_and_counted(demo_document, monkeypatch) -> None:
    """A benchmark that differs, or cannot run, is a row marked as such with its message; the count says so."""
    import dataclasses

    from kernline.engine import evidence

    def broken() -> float:
        raise ValueError("the engine refused the case")

    first = evidence.CASES[0]
    cases = (first, dataclasses.replace(first, compute=lambda: 3.5), dataclasses.replace(first, compute=broken))
    monkeypatch.setattr(evidence, "CASES", cases)
    package = render(demo_document, wall_ids="N1", printed=PRINTED, verification=True)
    text = " ".join(body(p) for p in _appendix_pages(package))
    assert "2 of 3 values DO NOT agree within their tolerance" in text
    assert "DIFFERS" in text and "NO VALUE" in text
    assert "Does not run: ValueError: the engine refused the case" in text

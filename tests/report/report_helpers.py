"""Helpers for the calculation-package tests: render a package and read its pages as text."""

from __future__ import annotations

import copy
import datetime as dt
import io
import re
from dataclasses import dataclass
from typing import Any

from kernline.engine.project_file import ProjectDocument, parse_project

ISSUED = dt.date(2026, 3, 14)


def normalize(text: str) -> str:
    """Collapse runs of white space, so that numbers are found wherever a line breaks."""
    return re.sub(r"\s+", " ", text).strip()


@dataclass(frozen=True)
class RenderedPackage:
    """A rendered package: the PDF bytes and the normalized text of each page."""

    pdf: bytes
    pages: list[str]

    def subject(self, index: int) -> str:
        """The sheet subject printed in the title strip of page ``index`` (0-based): the strip is drawn last,
        its sheet number and subject at the very end of the page's text."""
        m = re.search(r"Sheet \d+ of \d+ (.*)$", self.pages[index])
        assert m, f"no sheet subject on page {index + 1}"
        return m.group(1)

    def pages_of(self, subject: str) -> list[str]:
        """The pages of ``subject``, or of every subject it heads ("Wall N1" is "Wall N1: stability" and
        "Wall N1: concrete")."""
        return [p for i, p in enumerate(self.pages) if self.subject(i) in (subject,) or self.subject(i).startswith(subject + ":")]

    def text_of(self, subject: str) -> str:
        """The text of the subject's sheets without their title blocks, so sentences run on across sheets."""
        return " ".join(body(p) for p in self.pages_of(subject))


TITLE_BLOCK_START = "Job "


def body(page: str) -> str:
    """A page's text before its title strip (the strip is drawn last, when the PDF is saved; it starts with
    the job number)."""
    return page[: page.rindex(TITLE_BLOCK_START)].strip()


def page_texts(pdf: bytes) -> list[str]:
    from pypdf import PdfReader

    return [normalize(page.extract_text() or "") for page in PdfReader(io.BytesIO(pdf)).pages]


def render(project: Any, **options: Any) -> RenderedPackage:
    from kernline.engine.report import render_report

    options.setdefault("issued", ISSUED)
    pdf = render_report(project, **options)
    return RenderedPackage(pdf, page_texts(pdf))


def variant(document: ProjectDocument, edit: Any) -> Any:
    """The demo project with ``edit(raw)`` applied to a copy of its raw document."""
    raw = copy.deepcopy(document.raw)
    edit(raw)
    return parse_project(raw)

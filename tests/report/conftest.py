"""Fixtures for the calculation-package tests: the demo project and its package as page texts."""

from __future__ import annotations

import pytest
from kernline.engine.project_file import ProjectDocument, load_project
from kernline.engine.resources import resource_path
from report_helpers import RenderedPackage, render


@pytest.fixture(scope="session")
def demo_document() -> ProjectDocument:
    return load_project(resource_path("demo.kernline"))


@pytest.fixture(scope="session")
def demo(demo_document: ProjectDocument) -> RenderedPackage:
    """The demo project's whole package, rendered from the document (so the soil report is named)."""
    return render(demo_document)

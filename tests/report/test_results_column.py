"""Nothing in a calculation step's right-hand results column runs past the column.

Source: issue 12 §3 (our own typography: the result repeated in a right-hand results column) and the
plan-check reading of the demo package, where bearing's column clipped comparisons such as
"|e| ≤ L_f/6 = 3.833 ft" and eccentricities with their side. The widths are read back with reportlab's
stringWidth (engine.report._runs_width) in the font and size the column is set in.
"""

from __future__ import annotations

from collections.abc import Iterator

import pytest
from kernline.engine.calc_package import Block, Equation, Group, Package, plain
from kernline.engine.report import _RESULT_COLUMN, _STYLES, _fonts, _runs_width, _Text, report_package
from report_helpers import ISSUED, variant


def equations(package: Package) -> Iterator[tuple[str, Equation]]:
    """Every calculation step of the package, with the subject of its sheet."""

    def walk(blocks: tuple[Block, ...] | list[Block]) -> Iterator[Equation]:
        for block in blocks:
            if isinstance(block, Group):
                yield from walk(block.blocks)
            elif isinstance(block, Equation):
                yield block

    for section in package.sections:
        for eq in walk(section.blocks):
            yield section.subject, eq


def column_width(cell: object) -> float:
    """The width of a results-column cell in the column's bold type (subscripts at their smaller size)."""
    fonts = _fonts()
    runs = plain(cell) if isinstance(cell, str) else cell
    return _runs_width(runs, fonts.bold, _STYLES["result"].size, _Text(fonts))  # type: ignore[arg-type]


def shown(eq: Equation) -> object:
    return eq.result if eq.column is None else eq.column


@pytest.mark.parametrize("units", ["US", "SI"])
def test_results_column_holds_what_it_carries(demo_document, units: str) -> None:
    project = demo_document if units == "US" else variant(demo_document, lambda raw: raw.update(units="SI"))
    package = report_package(project, issued=ISSUED)
    steps = list(equations(package))
    assert len(steps) > 100  # every wall's stability and concrete steps
    too_wide = [
        (subject, shown(eq), round(column_width(shown(eq)), 1))
        for subject, eq in steps
        if column_width(shown(eq)) > _RESULT_COLUMN
    ]
    assert not too_wide, too_wide


def test_a_comparison_in_the_column_would_be_caught(demo_document) -> None:
    """The bearing steps that compare |e| with L_f/6 and give e's side are wider than the column when
    printed in full; the column carries their value or verdict instead."""
    package = report_package(demo_document, issued=ISSUED)
    steps = [eq for _, eq in equations(package) if "".join(r.text for r in eq.symbol) in ("e", "|e|")]
    assert steps
    for eq in steps:
        assert eq.column is not None
        assert column_width(eq.result) > _RESULT_COLUMN  # the full comparison or side would run past
        assert column_width(eq.column) <= _RESULT_COLUMN

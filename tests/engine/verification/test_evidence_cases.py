"""The verification appendix's benchmark cases (engine.evidence) agree, and cannot drift from the suite.

Source: the cases of docs/verification.md, each with its own published source, status and test
module (cases 1 to 20 there). Every benchmark is run and must agree with its published value within
its tolerance; each must name a case of the register and a test module that exists; its source must
be the register's, and its published value must be printed, with its unit and its status, in that
case of the register and appear in that test module. So the appendix prints the values the test
suite checks, never numbers of its own.
"""

from __future__ import annotations

import re
from pathlib import Path

import pytest
from kernline.engine.evidence import CASES, STATUS_WORDS, Benchmark, run_case, run_cases

ROOT = Path(__file__).resolve().parents[3]
REGISTER = (ROOT / "docs" / "verification.md").read_text(encoding="utf-8")
IDS = [f"{b.case}-{k}-{b.published}" for k, b in enumerate(CASES)]


def _section(case: str) -> str:
    """The text of ``case`` in the register, from its heading to the next."""
    m = re.search(rf"^### {re.escape(case)}:.*?(?=^### |^## |\Z)", REGISTER, flags=re.S | re.M)
    assert m, f"no section for {case} in docs/verification.md"
    return m.group(0)


def _flat(text: str) -> str:
    """Markdown without emphasis marks, its white space collapsed (a source quoted across lines)."""
    return re.sub(r"\s+", " ", text.replace("*", ""))


def _number(published: str) -> re.Pattern[str]:
    """The published value as a number of its own (4.6 is not found inside 14.6 or 4.65)."""
    return re.compile(rf"(?<![\d.,]){re.escape(published)}(?![\d])")


def test_there_are_cases_of_both_parts_of_the_design():
    """Stability and concrete design both have cases; 15 to 30 rows in all."""
    assert 15 <= len(CASES) <= 30
    assert {b.topic for b in CASES} == {"Stability", "Concrete design"}


@pytest.mark.parametrize("case", CASES, ids=IDS)
def test_kernline_reproduces_the_published_value(case: Benchmark):
    """Each case agrees with its published value within its tolerance."""
    result = run_case(case)
    assert result.message == ""
    assert result.computed == pytest.approx(case.value, abs=case.allowed)
    assert result.passes


@pytest.mark.parametrize("case", CASES, ids=IDS)
def test_case_names_the_register_and_its_test_module(case: Benchmark):
    """The module exists, the register's case names it and quotes the same source."""
    assert (ROOT / case.module).is_file(), case.module
    section = _section(case.case)
    assert case.module.rsplit("/", 1)[-1] in section
    assert case.source in _flat(section), case.source
    assert case.status.split(" ")[0] in STATUS_WORDS


@pytest.mark.parametrize("case", CASES, ids=IDS)
def test_published_value_is_the_registers_with_its_unit_and_status(case: Benchmark):
    """The register prints the value in the case's section, on a line with its unit, and gives it the same status:
    as a cell of that table row, or for the whole case ("all D")."""
    section = _section(case.case)
    number = _number(case.published)
    lines = [line for line in section.splitlines() if number.search(line)]
    assert lines, f"{case.published} is not in {case.case} of docs/verification.md"
    if case.unit:
        assert any(case.unit in line for line in lines), case.unit
    cells = [{c.strip() for c in line.split("|")} for line in lines if line.startswith("|")]
    assert any(case.status in row for row in cells) or f"(all {case.status})" in section, case.status


@pytest.mark.parametrize("case", CASES, ids=IDS)
def test_published_value_is_the_one_its_test_module_checks(case: Benchmark):
    """The test module of the case states the same value."""
    text = (ROOT / case.module).read_text(encoding="utf-8")
    assert _number(case.published).search(text), f"{case.published} not in {case.module}"


def test_a_case_that_cannot_run_is_a_failed_row_with_its_message():
    """run_cases never raises: a computation that fails is reported, not thrown."""

    def broken() -> float:
        raise ValueError("no such wall")

    case = Benchmark(
        case="Case 1",
        module=CASES[0].module,
        source="statics of a rigid footing",
        where="",
        status="D",
        quantity="a case that fails to run",
        published="3.0",
        unit="",
        compute=broken,
    )
    (result,) = run_cases((case,))
    assert not result.passes and result.computed is None
    assert "no such wall" in result.message
    assert result.computed_text == "—" and result.difference_text == "—"


def test_a_value_outside_its_tolerance_fails():
    """3.06 against a published 3.0 (± 0.05) differs; 3.04 agrees."""
    far = Benchmark(**{**_fields(CASES[0]), "compute": lambda: 3.06})
    near = Benchmark(**{**_fields(CASES[0]), "compute": lambda: 3.04})
    assert not run_case(far).passes and run_case(far).difference_text == "+0.060"
    assert run_case(near).passes


def _fields(benchmark: Benchmark) -> dict:
    return {name: getattr(benchmark, name) for name in Benchmark.__dataclass_fields__}

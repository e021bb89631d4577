"""The verification appendix (optional): the benchmark cases run now, published values beside Kernline's.

The cases are :data:`engine.evidence.CASES`, the same quantities the verification suite checks; this
module only lays out what :func:`engine.evidence.run_cases` returns (no value is computed here).
"""

from __future__ import annotations

import datetime as _dt
import re
from collections.abc import Sequence
from typing import TYPE_CHECKING

from . import Block, Cell, Heading, Para, Section, Table, Verdict, formula, plain

if TYPE_CHECKING:  # pragma: no cover
    from ..evidence import BenchmarkResult

KEY = "verification"
TITLE = "Verification appendix: published values beside this version's"
SUBJECT = "Verification appendix"

# Case, source (status), quantity, published, Kernline, difference, tolerance, result
_WIDTHS = (0.05, 0.22, 0.295, 0.09, 0.095, 0.085, 0.085, 0.08)
_FONT = 7.0
# "FS_OT", "q_max", "A_s,min": the letters after "_" print as a subscript
_SUBSCRIPTS = re.compile(r"_([A-Za-z]+(?:,[A-Za-z]+)?)")


def verification_section(printed: _dt.date, program: str) -> Section:
    """The appendix: what it is, then one table per part of the design (stability, concrete design).

    Args:
        printed: the date of this print, which is the date the cases are run.
        program: the program's name and version as printed in the title block.
    """
    from ..evidence import STATUS_WORDS, run_cases

    results = run_cases()
    agree = sum(r.passes for r in results)
    blocks: list[Block] = [
        Heading(TITLE),
        Para(
            f"This appendix was produced by running the program's benchmark cases when this package was printed, "
            f"on {printed.isoformat()}, with {program}. Each row is one quantity of a case of the program's "
            "verification register (docs/verification.md in the program's source): the value its source publishes "
            "(or, with status D, the value worked by hand from the formula named), the value this version computes with the engine functions that prepared this package, their "
            "difference, and the tolerance allowed for the source's rounding. The same cases, with the same published "
            "values, are checked by the program's test suite."
        ),
        Para(
            "It shows that the program reproduces the cited values. It is not a substitute for the engineer's review "
            "of the calculations in this package."
        ),
        Verdict(
            agree == len(results),
            f"{agree} of {len(results)} values agree within their tolerance."
            if agree == len(results)
            else f"{len(results) - agree} of {len(results)} values DO NOT agree within their tolerance (printed in bold).",
        ),
    ]
    key = "; ".join(f"{status} {words}" for status, words in STATUS_WORDS.items())
    modules: dict[str, list[str]] = {}
    for r in results:
        name = r.benchmark.module.rsplit("/", 1)[-1]
        numbers = modules.setdefault(name, [])
        if r.benchmark.case not in numbers:
            numbers.append(r.benchmark.case)
    listing = "; ".join(f"{', '.join(cases)}: {name}" for name, cases in modules.items())
    blocks += [
        Para(
            f"Status of the published value: {key}. Difference: this version's value minus the published one, "
            "in the same unit. Tolerance: half a unit in the last digit the source prints, or wider where the "
            "source's own rounding is larger (stated in the quantity).",
            "small",
        ),
        Para(plain(f"Test modules of the cases (tests/engine/verification): {listing}."), "small"),
    ]
    topics: list[str] = []
    for r in results:
        if r.benchmark.topic not in topics:
            topics.append(r.benchmark.topic)
    for topic in topics:
        rows = [r for r in results if r.benchmark.topic == topic]
        blocks += [Heading(topic, 2), _table(rows)]
    return Section(KEY, TITLE, SUBJECT, tuple(blocks))


def _table(results: Sequence[BenchmarkResult]) -> Table:
    rows: list[tuple[Cell, ...]] = []
    fail_rows: list[int] = []
    before: tuple[str, str, str] = ("", "", "")
    for k, r in enumerate(results):
        b = r.benchmark
        # the source once per run of rows of one case; the rows after it name only what differs
        if (b.case, b.source, b.where) == before:
            source = f"as above [{b.status}]"
        elif (b.case, b.source) == before[:2]:
            source = f"{b.where} [{b.status}]"
        else:
            source = f"{b.source}, {b.where} [{b.status}]"
        before = (b.case, b.source, b.where)
        unit = f" {b.unit}" if b.unit else ""
        quantity = b.quantity if not r.message else f"{b.quantity}\nDoes not run: {r.message}"
        rows.append(
            (
                b.case.removeprefix("Case "),
                plain(source),
                formula(_SUBSCRIPTS.sub(r"_{\1}", quantity)),
                f"{b.published}{unit}",
                f"{r.computed_text}{unit}" if r.computed is not None else "—",
                r.difference_text,
                r.tolerance_text,
                "agrees" if r.passes else ("DIFFERS" if r.computed is not None else "NO VALUE"),
            )
        )
        if not r.passes:
            fail_rows.append(k)
    return Table(
        ("Case", "Source [status]", "Quantity", "Published", "This version", "Difference", "Tolerance", "Result"),
        tuple(rows),
        _WIDTHS,
        align="CLLRRRRL",
        font_size=_FONT,
        fail_rows=tuple(fail_rows),
    )

"""``kernline schedule`` writes a CSV a spreadsheet reads safely: UTF-8 with a byte-order mark, CR LF rows,
quoted line breaks, and no cell a spreadsheet would run as a formula (OWASP, "CSV Injection",
https://owasp.org/www-community/attacks/CSV_Injection)."""

from __future__ import annotations

import csv
import io
from pathlib import Path

import pytest
from cli_projects import demo_raw, write_project
from kernline.app import cli
from kernline.engine.schedule import guard_cell

HOSTILE = ['=HYPERLINK("http://example.com","x")', "+1+2", "-2+3", "@SUM(A1:A9)", "\tx", "\rx"]


def schedule_of(tmp_path: Path, raw: dict, capsys: pytest.CaptureFixture[str]) -> bytes:
    project = write_project(tmp_path / "p.kernline", raw)
    out = tmp_path / "schedule.csv"
    assert cli.main(["schedule", str(project), "-o", str(out)]) == 0
    capsys.readouterr()
    return out.read_bytes()


def rows_of(data: bytes) -> list[list[str]]:
    return list(csv.reader(io.StringIO(data.decode("utf-8-sig"), newline="")))


@pytest.mark.parametrize("cell", HOSTILE)
def test_formula_starts_get_an_apostrophe(cell: str) -> None:
    assert guard_cell(cell) == "'" + cell


@pytest.mark.parametrize("cell", ["-12", "-0.35", "1.33", "0", "no demand", "24 in", "1'-6\"", "D + 0.75L (+)", ""])
def test_numbers_and_ordinary_text_are_left_alone(cell: str) -> None:
    """A plain negative number stays a number (an apostrophe would make it text); other cells are unchanged."""
    assert guard_cell(cell) == cell


@pytest.mark.parametrize("cell", ["-", "-1-1", "-1e3", "-.5", "- 2", "-inf"])
def test_minus_that_is_not_a_plain_number_is_guarded(cell: str) -> None:
    assert guard_cell(cell) == "'" + cell


def test_hostile_labels_and_ids_are_written_as_text(tmp_path: Path, capsys: pytest.CaptureFixture[str]) -> None:
    raw = demo_raw()
    for wall, label in zip(raw["walls"], HOSTILE, strict=False):
        wall["label"] = label
    raw["walls"][3]["id"] = "=E4"
    rows = rows_of(schedule_of(tmp_path, raw, capsys))
    labels = [row[1] for row in rows[1:]]
    assert labels == ["'" + label for label in HOSTILE[: len(raw["walls"])]]
    assert rows[4][0] == "'=E4"
    for row in rows:
        for cell in row:
            assert not cell.startswith(("=", "+", "@", "\t", "\r")), cell
            assert not cell.startswith("-") or cell.replace(".", "", 1).lstrip("-").isdigit(), cell


def test_csv_is_utf8_with_bom_and_crlf_rows(tmp_path: Path, capsys: pytest.CaptureFixture[str]) -> None:
    raw = demo_raw()
    raw["walls"][0]["label"] = "Façade wall, grid 1 ✓ µ"
    raw["walls"][1]["label"] = "two\nlines"
    data = schedule_of(tmp_path, raw, capsys)
    assert data.startswith(b"\xef\xbb\xbf")
    assert data.endswith(b"\r\n")
    walls = len(raw["walls"])
    assert data.count(b"\r\n") == walls + 1  # the header and a row per wall
    assert b',"two\nlines",' in data  # the label's own line break, inside quotes
    rows = rows_of(data)
    assert len(rows) == walls + 1
    assert rows[1][1] == "Façade wall, grid 1 ✓ µ"
    assert rows[2][1] == "two\nlines"

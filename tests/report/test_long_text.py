"""Long user text in the calculation package: wrapped and cut in time that grows linearly with its length;
table cells, headings and contents lines show it cut short with an ellipsis, and the inputs list prints
it in full, wrapped."""

from __future__ import annotations

import json
import subprocess
import sys
from typing import Any

import kernline.engine.report as report
import pytest
from kernline.engine.calc_package import INFO_LIMIT, LABEL_LIMIT, brief
from kernline.engine.project_file import parse_project
from kernline.engine.report import _break_word, _clip, _fonts, _width, _wrap_plain
from kernline.engine.resources import resource_path
from report_helpers import TITLE_BLOCK_START, body, page_texts

LONG = 50_000


def demo_raw() -> dict[str, Any]:
    return json.loads(resource_path("demo.kernline").read_text(encoding="utf-8"))


# --------------------------------------------------------------------------------------------
# The pieces: cutting a word, wrapping, clipping
# --------------------------------------------------------------------------------------------


@pytest.mark.parametrize("word", ["W" * 997, "il" * 400 + "W" * 50, "ab≥γ" * 123])
def test_cut_word_pieces_fit_and_join_back(word: str) -> None:
    font = _fonts().regular
    pieces = _break_word(word, font, 8.5, 60.0, 100.0)
    assert "".join(pieces) == word
    assert _width(pieces[0], font, 8.5) <= 60.0 + 1e-9
    assert all(_width(p, font, 8.5) <= 100.0 + 1e-9 for p in pieces[1:])
    for k, piece in enumerate(pieces[:-1]):  # each piece as long as fits: one more character would not
        assert _width(piece + pieces[k + 1][0], font, 8.5) > (60.0 if k == 0 else 100.0)


def test_a_piece_holds_at_least_one_character() -> None:
    assert _break_word("WWW", _fonts().regular, 20.0, 1.0, 1.0) == ["W", "W", "W"]


def test_wrapping_breaks_at_spaces_and_cuts_only_overlong_words() -> None:
    font = _fonts().regular
    text = "short words here " + "X" * 300 + " tail"
    lines = _wrap_plain(text, font, 7.0, 80.0)
    assert lines[0].startswith("short")
    assert "".join(lines).replace(" ", "") == text.replace(" ", "")
    assert all(_width(line, font, 7.0) <= 80.0 + 1e-9 for line in lines)
    # a word a little wider than the line but narrower than the cell keeps its own line, whole
    assert _wrap_plain("none", font, 6.5, 13.0, widest_word=18.0) == ["none"]


def test_clip_fits_and_ends_with_an_ellipsis() -> None:
    font = _fonts().regular
    clipped = _clip("W" * LONG, font, 9.0, 120.0)
    assert clipped.endswith("…") and _width(clipped, font, 9.0) <= 120.0
    assert _clip("fits", font, 9.0, 120.0) == "fits"


def test_brief_cuts_long_labels_with_an_ellipsis() -> None:
    assert brief("x" * LABEL_LIMIT) == "x" * LABEL_LIMIT
    cut = brief("x" * (LABEL_LIMIT + 1))
    assert len(cut) == LABEL_LIMIT and cut.endswith("…")
    assert len(brief("y" * LONG, INFO_LIMIT)) == INFO_LIMIT


# --------------------------------------------------------------------------------------------
# Linear time: the characters measured grow with the text, not with its square
# --------------------------------------------------------------------------------------------


def characters_measured(monkeypatch: pytest.MonkeyPatch, n: int) -> int:
    """Characters passed to reportlab's stringWidth while rendering the demo with four texts ``n`` long."""
    import reportlab.pdfbase.pdfmetrics as metrics

    raw = demo_raw()
    raw["project"]["name"] = "N" * n
    raw["project"]["notes"] = "x" * n
    raw["walls"][0]["label"] = "W" * n
    raw["walls"][0]["loads"][0]["label"] = "L" * n
    project = parse_project(raw)
    measured = [0]
    real = metrics.stringWidth

    def counting(text: str, font: str, size: float, *args: Any, **kwargs: Any) -> float:
        measured[0] += len(text)
        return real(text, font, size, *args, **kwargs)

    monkeypatch.setattr(metrics, "stringWidth", counting)
    monkeypatch.setattr(report, "_WIDTHS", {})  # measure from scratch
    monkeypatch.setattr(report, "_CHAR_WIDTHS", {})
    report.render_report(project, issued="2026-03-14")
    return measured[0]


def test_measuring_grows_linearly_with_the_length_of_the_text(monkeypatch: pytest.MonkeyPatch) -> None:
    """Cutting a long word by measuring ever longer prefixes is quadratic (and took 31 s for 20,000
    characters); adding up character widths is linear."""
    base = characters_measured(monkeypatch, 0)
    short = characters_measured(monkeypatch, 4_000) - base
    long = characters_measured(monkeypatch, 16_000) - base
    assert long <= 10 * 4 * 16_000  # a few measurements per character of the four texts
    assert long / short < 5.0  # four times the text, about four times the measuring (quadratic: 16)


def test_table_cell_is_cut_to_its_line_limit() -> None:
    """Whatever reaches a table cell, its row stays shorter than a sheet: the text ends in an ellipsis."""
    from kernline.engine.report import _CELL_MAX_LINES, GridSpec, _Builder

    builder = _Builder(_fonts())
    spec = GridSpec((90.0,), "L", 7.0, 8.5)
    lines = builder._cell("W" * LONG, spec, False, 0)
    assert len(lines) == _CELL_MAX_LINES and lines[-1].endswith("…")
    assert all(_width(line, builder.fonts.regular, 7.0) <= 85.0 for line in lines)
    words = builder._cell(" ".join(["word"] * 2000), spec, False, 0)
    assert len(words) == _CELL_MAX_LINES and words[-1].endswith("…")
    assert builder._cell("two words", spec, False, 0) == ["two words"]


# --------------------------------------------------------------------------------------------
# A real project: kernline demo --save, a 50,000-character label, kernline report
# --------------------------------------------------------------------------------------------


@pytest.fixture(scope="module")
def long_label_package(tmp_path_factory: pytest.TempPathFactory) -> list[str]:
    """The package of the demo project with a 50,000-character wall label, load label and project
    name, written by the command line (which must finish well inside the timeout)."""
    folder = tmp_path_factory.mktemp("long")
    project = folder / "x.kernline"
    command = [sys.executable, "-m", "kernline.app.cli"]
    subprocess.run([*command, "demo", "--save", str(project)], check=True, capture_output=True, timeout=60)
    raw = json.loads(project.read_text(encoding="utf-8"))
    raw["walls"][0]["label"] = "W" * LONG
    raw["walls"][0]["loads"][0]["label"] = "L" * LONG
    raw["project"]["name"] = "N" * LONG
    project.write_text(json.dumps(raw, indent=2), encoding="utf-8")
    out = folder / "x.pdf"
    result = subprocess.run([*command, "report", str(project), "-o", str(out)], capture_output=True, text=True, timeout=60)
    assert result.returncode == 0, result.stderr
    return page_texts(out.read_bytes())


def squeezed(text: str) -> str:
    """Text without spaces (a cut word's pieces are separate lines, which read as spaces)."""
    return text.replace(" ", "")


def test_schedule_and_headings_show_the_label_cut_short(long_label_package: list[str]) -> None:
    wall_sheet = next(p for p in long_label_package if p.startswith("Wall N1: "))
    assert squeezed(wall_sheet).startswith(squeezed("Wall N1: " + brief("W" * LONG)) + "WallN1PASSES")
    schedule = next(p for p in long_label_package if p.startswith("Summary schedule"))
    cell = squeezed(schedule.split(" N1 ", 1)[1].split(" 1'-6\"", 1)[0])
    assert cell == brief("W" * LONG) and len(cell) == LABEL_LIMIT and cell.endswith("W…")


def test_inputs_print_the_labels_and_name_in_full(long_label_package: list[str]) -> None:
    text = squeezed(" ".join(body(p) for p in long_label_package))
    assert "Walllabelinfull:" + "W" * LONG + "Selfweight" in text  # the inputs follow the loads table
    assert "Labelofload1infull:" + "L" * LONG + "P=w" in text
    assert "Projectinfull:" + "N" * LONG + "Thispackagecovers" in text


def test_title_block_fits_the_long_project_name_on_one_line(long_label_package: list[str]) -> None:
    for page in long_label_package:
        title_strip = page[page.rindex(TITLE_BLOCK_START) :]
        name = title_strip.split(" by ", 1)[0].rsplit(" ", 1)[1]  # the project's name ends the strip's first field
        assert name.endswith("N…") and set(name[:-1]) == {"N"}

"""``kernline report`` and ``schedule`` never overwrite the project file and refuse outputs they cannot write.

Each refusal exits 2 with one line on stderr naming the path, and leaves the project file as it was.
"""

from __future__ import annotations

import os
from pathlib import Path

import pytest
from cli_projects import demo_project, run
from kernline.app import cli


@pytest.fixture
def project(tmp_path: Path) -> Path:
    return demo_project(tmp_path / "p.kernline")


def refused(capsys: pytest.CaptureFixture[str], argv: list[str], words: str) -> str:
    """Run ``kernline ARGV`` in this process; assert exit 2 and one stderr line containing ``words``."""
    assert cli.main(argv) == cli.EXIT_INPUT
    captured = capsys.readouterr()
    lines = captured.err.splitlines()
    assert len(lines) == 1, captured.err
    assert lines[0].startswith("kernline: ") and words in lines[0], lines[0]
    assert "Traceback" not in captured.err and captured.out == ""
    return lines[0]


@pytest.mark.parametrize("command", ["report", "schedule"])
def test_output_that_is_the_project_file_is_refused_by_any_spelling(
    tmp_path: Path, project: Path, capsys: pytest.CaptureFixture[str], command: str
) -> None:
    before = project.read_bytes()
    (tmp_path / "x").mkdir()
    (tmp_path / "link.kernline").symlink_to("p.kernline")
    os.link(project, tmp_path / "hard.kernline")
    (tmp_path / "here").symlink_to(".")
    spellings = [
        project,
        tmp_path / "x" / ".." / "p.kernline",
        tmp_path / "link.kernline",
        tmp_path / "hard.kernline",
        tmp_path / "here" / "p.kernline",
    ]
    for output in spellings:
        line = refused(capsys, [command, str(project), "-o", str(output)], "is the project file")
        assert line.startswith(f"kernline: {output}: ")
    # the symlink and the hard link as the project FILE, the real file as the output
    refused(capsys, [command, str(tmp_path / "link.kernline"), "-o", str(project)], "is the project file")
    refused(capsys, [command, str(tmp_path / "hard.kernline"), "-o", str(project)], "is the project file")
    assert project.read_bytes() == before
    assert (tmp_path / "link.kernline").is_symlink()


def test_relative_spelling_from_the_working_folder_is_refused(tmp_path: Path, project: Path) -> None:
    """``kernline report p.kernline -o ./x/../p.kernline`` in a real process, run from the project's folder."""
    before = project.read_bytes()
    (tmp_path / "x").mkdir()
    result = run("report", "p.kernline", "-o", "./x/../p.kernline", cwd=tmp_path)
    assert result.returncode == 2
    assert result.stderr == "kernline: ./x/../p.kernline: is the project file p.kernline itself; choose another output file\n"
    assert project.read_bytes() == before


@pytest.mark.parametrize("command", ["report", "schedule"])
def test_outputs_that_cannot_be_written_are_refused(
    tmp_path: Path, project: Path, capsys: pytest.CaptureFixture[str], command: str
) -> None:
    before = project.read_bytes()
    fifo = tmp_path / "out.fifo"
    os.mkfifo(fifo)
    locked = tmp_path / "locked"
    locked.mkdir()
    locked.chmod(0o555)
    read_only = tmp_path / "read-only.out"
    read_only.write_text("keep", encoding="utf-8")
    read_only.chmod(0o444)
    cases = [
        (tmp_path, "is a folder"),
        ("/dev/null", "is a device"),
        (fifo, "is a named pipe"),
        (tmp_path / "missing" / "out.pdf", "no such folder"),
        (locked / "out.pdf", "is read-only; choose another folder"),
        (read_only, "is read-only"),
    ]
    try:
        for output, words in cases:
            refused(capsys, [command, str(project), "-o", str(output)], words)
        assert list(locked.iterdir()) == []
        assert read_only.read_text(encoding="utf-8") == "keep"
    finally:
        locked.chmod(0o755)
        read_only.chmod(0o644)
    assert project.read_bytes() == before
    assert sorted(p.name for p in tmp_path.iterdir()) == ["locked", "out.fifo", "p.kernline", "read-only.out"]


def test_earlier_pdf_and_csv_are_overwritten(tmp_path: Path, project: Path, capsys: pytest.CaptureFixture[str]) -> None:
    pdf, csv = tmp_path / "package.pdf", tmp_path / "schedule.csv"
    pdf.write_bytes(b"an earlier package")
    csv.write_text("an earlier schedule", encoding="utf-8")
    assert cli.main(["report", str(project), "-o", str(pdf), "--walls", "S2"]) == 0
    assert cli.main(["schedule", str(project), "-o", str(csv)]) == 0
    assert pdf.read_bytes().startswith(b"%PDF")
    assert csv.read_text(encoding="utf-8-sig").startswith("Wall,Label,")
    assert capsys.readouterr().err == ""


def test_refused_output_is_said_before_the_project_is_read(tmp_path: Path, capsys: pytest.CaptureFixture[str]) -> None:
    """A bad output is refused before any work: an unreadable project is not even parsed."""
    broken = tmp_path / "broken.kernline"
    broken.write_text("{ not json", encoding="utf-8")
    refused(capsys, ["report", str(broken), "-o", str(tmp_path / "missing" / "out.pdf")], "no such folder")

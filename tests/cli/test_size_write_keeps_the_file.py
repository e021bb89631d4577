"""``kernline size --write`` keeps what the user had: the link, the mode; it refuses a file it may not write
before any sizing, and a refused command leaves the file as it was."""

from __future__ import annotations

import json
import stat
from pathlib import Path

import pytest
from cli_projects import demo_project
from kernline.app import cli
from kernline.engine.file_safety import TEMP_MARK


@pytest.fixture
def project(tmp_path: Path) -> Path:
    return demo_project(tmp_path / "p.kernline")


def test_write_through_a_symlink_keeps_the_link(tmp_path: Path, project: Path, capsys: pytest.CaptureFixture[str]) -> None:
    link = tmp_path / "current.kernline"
    link.symlink_to(project.name)
    before = project.read_text(encoding="utf-8")
    assert cli.main(["size", str(link), "--write"]) == 0
    assert link.is_symlink() and link.readlink() == Path(project.name)
    after = project.read_text(encoding="utf-8")
    assert after != before and json.loads(after)["walls"][0]["footing"]["width"].endswith(" in")
    assert [p.name for p in tmp_path.iterdir() if TEMP_MARK in p.name] == []


def test_write_keeps_the_mode(project: Path, capsys: pytest.CaptureFixture[str]) -> None:
    project.chmod(0o640)
    assert cli.main(["size", str(project), "--write"]) == 0
    assert stat.S_IMODE(project.stat().st_mode) == 0o640


@pytest.mark.parametrize("mode", [0o444, 0o400])
def test_read_only_file_is_refused_and_unchanged(project: Path, capsys: pytest.CaptureFixture[str], mode: int) -> None:
    """No write bit for anyone: refused even when the tests run as root (as in CI)."""
    before = project.read_bytes()
    project.chmod(mode)
    try:
        assert cli.main(["size", str(project), "--write"]) == cli.EXIT_INPUT
    finally:
        project.chmod(0o644)
    captured = capsys.readouterr()
    assert captured.err.startswith(f"kernline: {project}: is read-only") and captured.err.count("\n") == 1
    assert captured.out == ""  # refused before the sizing: no table printed
    assert project.read_bytes() == before


def test_refusal_comes_before_reading_the_project(tmp_path: Path, capsys: pytest.CaptureFixture[str]) -> None:
    """A read-only file that is not even valid JSON is refused for being read-only: nothing was parsed or sized."""
    broken = tmp_path / "broken.kernline"
    broken.write_text("{ not json", encoding="utf-8")
    broken.chmod(0o444)
    try:
        assert cli.main(["size", str(broken), "--write"]) == cli.EXIT_INPUT
    finally:
        broken.chmod(0o644)
    assert "is read-only" in capsys.readouterr().err
    assert broken.read_text(encoding="utf-8") == "{ not json"


def test_file_in_a_read_only_folder_is_refused(tmp_path: Path, capsys: pytest.CaptureFixture[str]) -> None:
    folder = tmp_path / "locked"
    folder.mkdir()
    project = demo_project(folder / "p.kernline")
    before = project.read_bytes()
    folder.chmod(0o555)
    try:
        assert cli.main(["size", str(project), "--write"]) == cli.EXIT_INPUT
        assert sorted(p.name for p in folder.iterdir()) == ["p.kernline"]
    finally:
        folder.chmod(0o755)
    assert "is read-only; choose another folder" in capsys.readouterr().err
    assert project.read_bytes() == before


def test_bad_project_is_refused_without_changing_it(project: Path, capsys: pytest.CaptureFixture[str]) -> None:
    raw = json.loads(project.read_text(encoding="utf-8"))
    raw["walls"][1]["footing"]["width"] = "24"
    project.write_text(json.dumps(raw, indent=2), encoding="utf-8")
    before = project.read_bytes()
    assert cli.main(["size", str(project), "--write"]) == cli.EXIT_INPUT
    assert "walls[1].footing.width" in capsys.readouterr().err
    assert project.read_bytes() == before

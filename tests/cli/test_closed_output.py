"""A standard output closed early (``kernline check --json FILE | head -1``) ends the command quietly:
exit code 141, nothing on stderr but the project's warnings, no traceback and no "internal error"."""

from __future__ import annotations

import os
import subprocess
import sys
from pathlib import Path

import pytest
from cli_projects import demo_project, demo_raw, many_walls, write_project
from kernline.app import cli


def quiet(stderr: str) -> bool:
    """Nothing on stderr but warnings about the project (the demo has some)."""
    return all(line.startswith("warning: ") for line in stderr.splitlines())


def run_with_closed_stdout(*args: str) -> subprocess.CompletedProcess[str]:
    """Run ``kernline ARGS`` with stdout a pipe whose reading end is already closed (every write fails)."""
    read_end, write_end = os.pipe()
    os.close(read_end)
    try:
        return subprocess.run(
            [sys.executable, "-m", "kernline.app.cli", *args], stdout=write_end, stderr=subprocess.PIPE, text=True, timeout=120
        )
    finally:
        os.close(write_end)


@pytest.mark.parametrize("args", [["check", "--json"], ["check"], ["size", "--json"], ["size"]], ids=" ".join)
def test_closed_stdout_ends_quietly(tmp_path: Path, args: list[str]) -> None:
    project = demo_project(tmp_path / "p.kernline")
    result = run_with_closed_stdout(args[0], str(project), *args[1:])
    assert quiet(result.stderr)
    assert result.returncode == cli.EXIT_CLOSED_OUTPUT == 141


def test_size_write_still_writes_when_stdout_is_closed(tmp_path: Path) -> None:
    """The sizes are stored before the table is printed, so a closed pipe does not lose them."""
    project = demo_project(tmp_path / "p.kernline")
    before = project.read_text(encoding="utf-8")
    result = run_with_closed_stdout("size", str(project), "--write")
    assert result.returncode == 141 and quiet(result.stderr)
    assert project.read_text(encoding="utf-8") != before


def test_pipe_into_head_prints_one_line_and_no_error(tmp_path: Path) -> None:
    """The real pipeline, with output far larger than a pipe's buffer so the writer sees the reader go."""
    project = write_project(tmp_path / "big.kernline", many_walls(demo_raw(), 40))
    command = f'set -o pipefail 2>/dev/null; "{sys.executable}" -m app.cli check --json "{project}" | head -1; echo "status $?"'
    result = subprocess.run(["bash", "-c", command], capture_output=True, text=True, timeout=120)
    assert result.stdout == "{\nstatus 141\n"
    assert quiet(result.stderr)

"""A project FILE that is not a regular file (a named pipe, a device, a folder) is refused at once: exit 2,
one line on stderr, never a wait for a writer that does not come."""

from __future__ import annotations

import os
from pathlib import Path

import pytest
from cli_projects import run
from kernline.app import cli

COMMANDS = [
    ["check"],
    ["check", "--json"],
    ["size"],
    ["size", "--write"],
    ["report", "-o", "out.pdf"],
    ["schedule", "-o", "out.csv"],
]


def argv(command: list[str], file: str) -> list[str]:
    return [command[0], file, *command[1:]]


@pytest.mark.parametrize("command", COMMANDS, ids=lambda c: " ".join(c))
def test_fifo_as_file_exits_2_promptly(tmp_path: Path, command: list[str]) -> None:
    """Opening a FIFO for reading blocks until something writes to it: the command must not open it.

    The timeout makes a blocking command fail this test instead of hanging the suite.
    """
    fifo = tmp_path / "pipe.kernline"
    os.mkfifo(fifo)
    result = run(*argv(command, str(fifo)), cwd=tmp_path, timeout=30)
    assert result.returncode == 2
    assert result.stderr == f"kernline: {fifo}: is a named pipe (FIFO), not a project file\n"
    assert not (tmp_path / "out.pdf").exists() and not (tmp_path / "out.csv").exists()


@pytest.mark.parametrize("command", COMMANDS, ids=lambda c: " ".join(c))
def test_folder_and_device_as_file_exit_2(
    tmp_path: Path, monkeypatch: pytest.MonkeyPatch, capsys: pytest.CaptureFixture[str], command: list[str]
) -> None:
    monkeypatch.chdir(tmp_path)
    for file, words in ((str(tmp_path), "is a folder, not a project file"), ("/dev/null", "is a device, not a project file")):
        assert cli.main(argv(command, file)) == cli.EXIT_INPUT
        captured = capsys.readouterr()
        assert captured.err == f"kernline: {file}: {words}\n"
        assert captured.out == ""


def test_open_refuses_a_folder_before_starting_the_window(tmp_path: Path, capsys: pytest.CaptureFixture[str]) -> None:
    assert cli.main(["open", str(tmp_path)]) == cli.EXIT_INPUT
    assert capsys.readouterr().err == f"kernline: {tmp_path}: is a folder, not a project file\n"


def test_missing_file_exits_2_naming_it_once(tmp_path: Path, capsys: pytest.CaptureFixture[str]) -> None:
    missing = tmp_path / "nope.kernline"
    assert cli.main(["size", str(missing), "--write"]) == cli.EXIT_INPUT
    assert capsys.readouterr().err == f"kernline: {missing}: no such file\n"
    assert not missing.exists()

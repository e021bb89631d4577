"""``kernline size --write`` killed with SIGKILL at any moment leaves the old document or the new one,
complete, never a mixture; the next save leaves no temporary file behind.

The project has 300 walls (the demo's four, repeated with new ids), so a run lasts long enough for the
kills to land while it loads, sizes and writes. The kill delays are spread over the length of one
uninterrupted run, measured first, so that some kills fall near the write whatever the machine's
speed. About 20 runs: the test takes some tens of seconds.
"""

from __future__ import annotations

import json
import signal
import subprocess
import sys
import time
from collections import Counter
from pathlib import Path

from cli_projects import demo_raw, many_walls, run, write_project
from kernline.engine.file_safety import TEMP_MARK

WALLS = 300
TRIES = 20


def temp_files(folder: Path) -> list[str]:
    return [p.name for p in folder.iterdir() if TEMP_MARK in p.name]


def test_kill_during_size_write_leaves_the_old_or_the_new_document(tmp_path: Path) -> None:
    path = write_project(tmp_path / "big.kernline", many_walls(demo_raw(), WALLS))
    old = path.read_bytes()

    # the new document: what one uninterrupted run writes (and how long a run takes here)
    reference = tmp_path / "reference"
    reference.mkdir()
    (reference / path.name).write_bytes(old)
    start = time.perf_counter()
    result = run("size", str(reference / path.name), "--write", timeout=120)
    duration = time.perf_counter() - start
    assert result.returncode in (0, 1), result.stderr
    new = (reference / path.name).read_bytes()
    assert new != old and json.loads(new)["walls"][WALLS - 1]["id"] == f"W{WALLS:03d}"

    outcomes: Counter[str] = Counter()
    for k in range(TRIES):
        path.write_bytes(old)
        delay = 1.1 * duration * k / (TRIES - 1)
        proc = subprocess.Popen(
            [sys.executable, "-m", "kernline.app.cli", "size", str(path), "--write"],
            stdout=subprocess.DEVNULL,
            stderr=subprocess.DEVNULL,
        )
        time.sleep(delay)  # the point of the test: a kill at an arbitrary moment
        proc.send_signal(signal.SIGKILL)
        proc.wait(timeout=60)
        data = path.read_bytes()
        json.loads(data)  # always a complete JSON document
        assert data in (old, new), f"a mixed document after a kill at {delay:.2f} s"
        outcomes["new" if data == new else "old"] += 1
        outcomes["temporary file left"] += bool(temp_files(tmp_path))
    print(f"kills: {dict(outcomes)} over {1.1 * duration:.2f} s")

    # the next successful save removes any temporary file a killed save left
    path.write_bytes(old)
    result = run("size", str(path), "--write", timeout=120)
    assert result.returncode in (0, 1), result.stderr
    assert path.read_bytes() == new
    assert temp_files(tmp_path) == []


def test_kill_in_the_middle_of_the_write_leaves_the_old_document_and_the_next_save_cleans_up(tmp_path: Path) -> None:
    """A SIGKILL after the temporary file is written but before it is renamed (made certain here by
    killing the process from inside its flush to disk): the old document stays; the next save removes
    the temporary file left behind."""
    path = write_project(tmp_path / "p.kernline", many_walls(demo_raw(), 8))
    old = path.read_bytes()
    code = (
        "import os, signal, sys\n"
        "os.fsync = lambda fd: os.kill(os.getpid(), signal.SIGKILL)\n"
        "from kernline.app import cli\n"
        "cli.main(['size', sys.argv[1], '--write'])\n"
    )
    killed = subprocess.run([sys.executable, "-c", code, str(path)], capture_output=True, timeout=120)
    assert killed.returncode == -signal.SIGKILL
    assert path.read_bytes() == old
    left = temp_files(tmp_path)
    assert len(left) == 1 and left[0].startswith(f".p.kernline{TEMP_MARK}")
    assert len((tmp_path / left[0]).read_bytes()) > 0  # the half-done save: never read as the project

    result = run("size", str(path), "--write", timeout=120)
    assert result.returncode in (0, 1), result.stderr
    assert path.read_bytes() != old and json.loads(path.read_bytes())
    assert temp_files(tmp_path) == []

"""The repository stands alone: no file points at notes kept outside it.

Every citation in code, tests and documents must be followable by someone who cloned only this
repository: a published source, or docs/verification.md. This test reads every tracked text file
(``git ls-files``; every file under the root, skipping build and cache folders, where git or the
``.git`` folder is missing) and fails with file:line for each pointer to a sibling folder of notes.
"""

from __future__ import annotations

import os
import subprocess
from collections.abc import Iterable, Iterator
from pathlib import Path

ROOT = Path(__file__).resolve().parent.parent
THIS_FILE = Path(__file__).resolve()

# what a pointer outside the repository looks like
# Spelled in pieces so that this file does not itself hold the pointers it looks for.
_SIBLING = "shar" + "ed"
FORBIDDEN = ("../" + _SIBLING, _SIBLING + "/reference", _SIBLING + "/STYLE")

# folders the fallback walk skips: version control, caches, environments, build output
SKIPPED_DIRS = frozenset(
    {".git", "__pycache__", ".venv", "venv", "build", "dist", ".pytest_cache", ".mypy_cache", ".ruff_cache", ".hypothesis"}
)


def _git_files(root: Path) -> list[Path] | None:
    """The tracked files under ``root``, or None when git or the repository is not there."""
    try:
        listing = subprocess.run(["git", "ls-files", "-z"], cwd=root, capture_output=True, check=True, timeout=60).stdout
    except (OSError, subprocess.SubprocessError):
        return None
    return [root / name for name in listing.decode("utf-8", "surrogateescape").split("\0") if name]


def _walked_files(root: Path) -> Iterator[Path]:
    """Every file under ``root``, skipping the folders in SKIPPED_DIRS and ``*.egg-info``."""
    for folder, dirs, files in os.walk(root):
        dirs[:] = sorted(d for d in dirs if d not in SKIPPED_DIRS and not d.endswith(".egg-info"))
        for name in sorted(files):
            yield Path(folder) / name


def repository_files(root: Path = ROOT) -> list[Path]:
    """The files to read: tracked files where git answers, else a walk of the tree."""
    files = _git_files(root)
    return files if files is not None else list(_walked_files(root))


def pointers_outside(paths: Iterable[Path], root: Path = ROOT) -> list[str]:
    """``file:line: text`` for each line of a text file in ``paths`` that contains a FORBIDDEN string.

    Binary files (a NUL byte in them), missing files and this test module are skipped.
    """
    found = []
    for path in paths:
        if not path.is_file() or path.resolve() == THIS_FILE:
            continue
        data = path.read_bytes()
        if b"\0" in data:
            continue  # binary
        text = data.decode("utf-8", errors="replace")
        for number, line in enumerate(text.splitlines(), start=1):
            if any(pattern in line for pattern in FORBIDDEN):
                try:
                    shown = path.relative_to(root)
                except ValueError:
                    shown = path
                found.append(f"{shown}:{number}: {line.strip()}")
    return found


def test_no_file_points_outside_the_repository():
    """No tracked text file points at the sibling folder outside the repository (see FORBIDDEN)."""
    files = repository_files()
    assert files, "found no files to check"
    found = pointers_outside(files)
    assert not found, (
        "these lines point at files outside the repository; cite the published source or "
        "docs/verification.md instead:\n" + "\n".join(found)
    )


def test_the_check_finds_a_pointer(tmp_path):
    """A file with a pointer outside is reported with its line number; a clean file is not."""
    clean = tmp_path / "clean.md"
    clean.write_text("Das, *Principles of Foundation Engineering*.\n", encoding="utf-8")
    pointing = tmp_path / "pointing.py"
    pointing.write_text('"""Doc."""\n# see ' + "../" + _SIBLING + "/reference/notes.md\n", encoding="utf-8")
    assert pointers_outside([clean, pointing], root=tmp_path) == [
        "pointing.py:2: # see " + "../" + _SIBLING + "/reference/notes.md"
    ]


def test_the_fallback_walk_skips_caches(tmp_path):
    """Without git the walk lists the tree's files and leaves out caches and version control."""
    (tmp_path / "docs").mkdir()
    (tmp_path / "docs" / "a.md").write_text("a\n", encoding="utf-8")
    (tmp_path / "__pycache__").mkdir()
    (tmp_path / "__pycache__" / "a.pyc").write_bytes(b"\0")
    (tmp_path / ".git").mkdir()
    (tmp_path / ".git" / "HEAD").write_text("ref\n", encoding="utf-8")
    assert [p.relative_to(tmp_path).as_posix() for p in _walked_files(tmp_path)] == ["docs/a.md"]

"""engine.file_safety: atomic saves keep links, modes and owners, refuse what may not be written, leave
no temporary file; input and output paths are checked before any work."""

from __future__ import annotations

import errno
import os
import socket
import stat
from collections.abc import Iterator
from pathlib import Path

import pytest
from kernline.engine.errors import InputError
from kernline.engine.file_safety import (
    TEMP_MARK,
    FilePathError,
    atomic_write_bytes,
    atomic_write_text,
    check_input_file,
    check_output_path,
    check_writable,
)


def temp_files(folder: Path) -> list[str]:
    return sorted(p.name for p in folder.iterdir() if TEMP_MARK in p.name)


@pytest.fixture
def project(tmp_path: Path) -> Path:
    path = tmp_path / "p.kernline"
    path.write_text("old\n", encoding="utf-8")
    return path


@pytest.fixture
def umask() -> Iterator[None]:
    """Restore the process's umask after a test that sets it."""
    old = os.umask(0o022)
    os.umask(old)
    yield
    os.umask(old)


# --------------------------------------------------------------------------------------------
# atomic_write_text: what the user had is kept
# --------------------------------------------------------------------------------------------


def test_write_replaces_the_text_and_leaves_no_temporary_file(project: Path) -> None:
    atomic_write_text(project, "new ✓\n")
    assert project.read_text(encoding="utf-8") == "new ✓\n"
    assert temp_files(project.parent) == []


def test_text_is_written_as_given_without_newline_translation(tmp_path: Path) -> None:
    path = tmp_path / "a.csv"
    atomic_write_text(path, "a\r\nb\n", encoding="utf-8-sig")
    assert path.read_bytes() == b"\xef\xbb\xbfa\r\nb\n"


def test_write_through_a_symlink_replaces_its_target_and_keeps_the_link(tmp_path: Path, project: Path) -> None:
    elsewhere = tmp_path / "links"
    elsewhere.mkdir()
    link = elsewhere / "p.kernline"
    link.symlink_to(os.path.relpath(project, elsewhere))
    second = tmp_path / "second-link.kernline"
    second.symlink_to(link)  # a chain of two links
    atomic_write_text(second, "new\n")
    assert link.is_symlink() and second.is_symlink()
    assert project.read_text(encoding="utf-8") == "new\n"
    assert temp_files(tmp_path) == [] and temp_files(elsewhere) == []


def test_write_through_a_dangling_symlink_creates_its_target(tmp_path: Path) -> None:
    link = tmp_path / "link.kernline"
    link.symlink_to("target.kernline")
    atomic_write_text(link, "new\n")
    assert link.is_symlink() and (tmp_path / "target.kernline").read_text(encoding="utf-8") == "new\n"


@pytest.mark.parametrize("mode", [0o600, 0o640, 0o664, 0o755])
def test_write_keeps_the_mode(project: Path, mode: int) -> None:
    project.chmod(mode)
    atomic_write_text(project, "new\n")
    assert stat.S_IMODE(project.stat().st_mode) == mode


def test_write_keeps_owner_and_group_where_allowed(project: Path) -> None:
    """As root (CI) the file is given to another user first; otherwise the user's own ids are kept."""
    uid, gid = (4321, 4322) if os.geteuid() == 0 else (os.getuid(), os.getgid())
    os.chown(project, uid, gid)
    atomic_write_text(project, "new\n")
    st = project.stat()
    assert (st.st_uid, st.st_gid) == (uid, gid)


@pytest.mark.parametrize(("mask", "expected"), [(0o022, 0o644), (0o027, 0o640), (0o077, 0o600)])
def test_new_file_follows_the_umask(tmp_path: Path, umask: None, mask: int, expected: int) -> None:
    os.umask(mask)
    path = tmp_path / "new.kernline"
    atomic_write_text(path, "new\n")
    assert stat.S_IMODE(path.stat().st_mode) == expected


def test_stale_temporary_file_of_the_same_target_is_removed(tmp_path: Path, project: Path) -> None:
    stale = tmp_path / f".p.kernline{TEMP_MARK}abcd1234"
    other = tmp_path / f".q.kernline{TEMP_MARK}abcd1234"  # another file's: not ours to remove
    unlike = tmp_path / f".p.kernline{TEMP_MARK}x"  # not the pattern
    for p in (stale, other, unlike):
        p.write_text("partial", encoding="utf-8")
    atomic_write_text(project, "new\n")
    assert not stale.exists() and other.exists() and unlike.exists()


def test_a_failed_write_keeps_the_old_file_and_leaves_no_temporary_file(project: Path, monkeypatch: pytest.MonkeyPatch) -> None:
    def full_disk(*args: object) -> None:
        raise OSError(errno.ENOSPC, "No space left on device")

    monkeypatch.setattr(os, "replace", full_disk)
    with pytest.raises(FilePathError, match=r"p\.kernline: cannot be written \(No space left on device\)"):
        atomic_write_text(project, "new\n")
    assert project.read_text(encoding="utf-8") == "old\n"
    assert temp_files(project.parent) == []


def test_an_interrupted_write_leaves_no_temporary_file(project: Path, monkeypatch: pytest.MonkeyPatch) -> None:
    def interrupt(*args: object) -> None:
        raise KeyboardInterrupt

    monkeypatch.setattr(os, "fsync", interrupt)
    with pytest.raises(KeyboardInterrupt):
        atomic_write_text(project, "new\n")
    assert project.read_text(encoding="utf-8") == "old\n"
    assert temp_files(project.parent) == []


# --------------------------------------------------------------------------------------------
# Refusals: read-only files and folders, things that are not files
# --------------------------------------------------------------------------------------------


@pytest.mark.parametrize("mode", [0o444, 0o400, 0o000, 0o555])
def test_read_only_file_is_refused_even_for_root(project: Path, mode: int) -> None:
    """No write bit for anyone: refused by its mode, whoever runs Kernline; the file is unchanged."""
    project.chmod(mode)
    try:
        with pytest.raises(FilePathError, match=r"p\.kernline: is read-only") as err:
            atomic_write_text(project, "new\n")
        assert isinstance(err.value, InputError) and isinstance(err.value, OSError)
        assert err.value.field == str(project)
        assert "\n" not in str(err.value)
    finally:
        project.chmod(0o644)
    assert project.read_text(encoding="utf-8") == "old\n"
    assert temp_files(project.parent) == []


def test_file_the_user_may_not_write_is_refused(project: Path, monkeypatch: pytest.MonkeyPatch) -> None:
    """Write bits set, but not for this user (simulated: the tests may run as root, who may write anything)."""
    real_access = os.access
    monkeypatch.setattr(os, "access", lambda p, m: False if m & os.W_OK and Path(p) == project else real_access(p, m))
    with pytest.raises(FilePathError, match="may not be written by you"):
        atomic_write_text(project, "new\n")
    assert project.read_text(encoding="utf-8") == "old\n"


def test_read_only_folder_is_refused(tmp_path: Path) -> None:
    folder = tmp_path / "locked"
    folder.mkdir()
    folder.chmod(0o555)
    try:
        with pytest.raises(FilePathError, match=r"the folder .*locked is read-only"):
            atomic_write_text(folder / "new.kernline", "new\n")
        assert list(folder.iterdir()) == []
    finally:
        folder.chmod(0o755)


def test_missing_folder_is_refused(tmp_path: Path) -> None:
    with pytest.raises(FilePathError, match=r"no such folder"):
        atomic_write_text(tmp_path / "missing" / "new.kernline", "new\n")


def test_folder_and_device_are_refused_as_targets(tmp_path: Path) -> None:
    with pytest.raises(FilePathError, match="is a folder"):
        atomic_write_text(tmp_path, "new\n")
    with pytest.raises(FilePathError, match="is a device"):
        check_writable("/dev/null")


def test_fifo_is_refused_as_a_target_without_blocking(tmp_path: Path) -> None:
    fifo = tmp_path / "pipe"
    os.mkfifo(fifo)
    with pytest.raises(FilePathError, match="is a named pipe"):
        atomic_write_bytes(fifo, b"x")


# --------------------------------------------------------------------------------------------
# check_input_file
# --------------------------------------------------------------------------------------------


def test_input_file_that_is_a_regular_file_passes(project: Path) -> None:
    assert check_input_file(str(project)) == project


def test_input_checks_refuse_what_is_not_a_project_file(tmp_path: Path) -> None:
    fifo = tmp_path / "pipe.kernline"
    os.mkfifo(fifo)  # opening it for reading would block until a writer came
    with pytest.raises(FilePathError, match=r"pipe\.kernline: is a named pipe \(FIFO\), not a project file"):
        check_input_file(fifo)
    with pytest.raises(FilePathError, match="is a folder, not a project file"):
        check_input_file(tmp_path)
    with pytest.raises(FilePathError, match="is a device, not a project file"):
        check_input_file("/dev/null")
    with pytest.raises(FilePathError, match=r"nope\.kernline: no such file"):
        check_input_file(tmp_path / "nope.kernline")


def test_input_check_refuses_a_socket(tmp_path: Path) -> None:
    path = tmp_path / "s.kernline"
    server = socket.socket(socket.AF_UNIX)
    try:
        server.bind(str(path))
        with pytest.raises(FilePathError, match="is a socket"):
            check_input_file(path)
    finally:
        server.close()


# --------------------------------------------------------------------------------------------
# check_output_path
# --------------------------------------------------------------------------------------------


def same_file_spellings(tmp_path: Path, project: Path) -> list[Path]:
    sub = tmp_path / "x"
    sub.mkdir()
    (tmp_path / "link.kernline").symlink_to(project)
    os.link(project, tmp_path / "hard.kernline")
    (tmp_path / "folder-link").symlink_to(tmp_path)
    return [
        project,
        sub / ".." / "p.kernline",
        tmp_path / "." / "p.kernline",
        tmp_path / "link.kernline",
        tmp_path / "hard.kernline",
        tmp_path / "folder-link" / "p.kernline",
    ]


def test_output_that_is_the_project_file_is_refused_by_any_spelling(tmp_path: Path, project: Path) -> None:
    for spelling in same_file_spellings(tmp_path, project):
        with pytest.raises(FilePathError, match="is the project file .* itself; choose another output file"):
            check_output_path(spelling, inputs=[project])
    assert project.read_text(encoding="utf-8") == "old\n"


def test_output_compares_with_a_relative_input(tmp_path: Path, project: Path, monkeypatch: pytest.MonkeyPatch) -> None:
    monkeypatch.chdir(tmp_path)
    (tmp_path / "x").mkdir()
    with pytest.raises(FilePathError, match="is the project file"):
        check_output_path("./x/../p.kernline", inputs=["p.kernline"])


def test_earlier_output_may_be_overwritten(tmp_path: Path, project: Path) -> None:
    earlier = tmp_path / "package.pdf"
    earlier.write_bytes(b"%PDF old")
    assert check_output_path(earlier, inputs=[project]) == earlier.resolve()
    assert check_output_path(tmp_path / "new.csv", inputs=[project]) == (tmp_path / "new.csv").resolve()


def test_output_refusals(tmp_path: Path, project: Path) -> None:
    fifo = tmp_path / "out.pipe"
    os.mkfifo(fifo)
    locked = tmp_path / "locked"
    locked.mkdir()
    locked.chmod(0o555)
    cases = [
        (tmp_path, "is a folder"),
        ("/dev/null", "is a device"),
        (fifo, "is a named pipe"),
        (tmp_path / "missing" / "out.pdf", "no such folder"),
        (locked / "out.pdf", "is read-only"),
        (project / "out.pdf", "is not a folder"),
    ]
    try:
        for output, words in cases:
            with pytest.raises(FilePathError, match=words):
                check_output_path(output, inputs=[project])
    finally:
        locked.chmod(0o755)

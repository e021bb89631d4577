"""Files written and read safely: atomic saves, and checks on the paths given for input and output.

Readers of a file Kernline writes see the old file or the new one, never a mixture: the new text goes
to a temporary file in the same folder, is flushed to the disk, and is renamed over the old file
(``os.replace``, atomic on POSIX and Windows). A save also keeps what the user had:

- a symbolic link stays a link; the file it points to is the one replaced;
- the file keeps its permission bits, and its owner and group where the system allows it;
- a new file gets the permissions the umask allows (``0o666 & ~umask``), like any other program's;
- a file the user may not write, or whose permission bits give nobody write access, is refused with
  :class:`FilePathError` (also for root, who could write it anyway: the bits say "keep this");
- no temporary file is left behind. Temporary files are named ``.NAME.kernline-tmp-XXXXXXXX``
  (:data:`TEMP_MARK`); one left by a save that was killed is removed by the next save of NAME.

A hard link is not kept: the other names of the file keep the old text (the price of replacing the
file atomically instead of writing into it).
"""

from __future__ import annotations

import os
import re
import stat
import tempfile
from collections.abc import Iterable
from pathlib import Path

from .errors import InputError

TEMP_MARK = ".kernline-tmp-"
"""What the name of every temporary file Kernline writes contains, after ``.NAME``."""

_MKSTEMP_RANDOM = r"[a-z0-9_]{8}"  # the random part tempfile.mkstemp puts after the prefix
_NEW_FILE_MODE = 0o666  # rw for all, before the umask (what open(..., "w") asks for)
_ANY_WRITE = stat.S_IWUSR | stat.S_IWGRP | stat.S_IWOTH


class FilePathError(InputError, OSError):
    """A path Kernline will not read or write, named in the message ("PATH: is a folder").

    It is an :class:`InputError` (exit code 2 on the command line) and an :class:`OSError`, so code
    that handles failed file operations handles it too.
    """

    def __init__(self, path: str | os.PathLike[str], problem: str) -> None:
        super().__init__(os.fspath(path), problem)


def _kind(mode: int) -> str:
    """What a file that is not a regular file is, in words."""
    if stat.S_ISDIR(mode):
        return "a folder"
    if stat.S_ISFIFO(mode):
        return "a named pipe (FIFO)"
    if stat.S_ISSOCK(mode):
        return "a socket"
    if stat.S_ISCHR(mode) or stat.S_ISBLK(mode):
        return "a device"
    return "not a regular file"


def _reason(err: OSError) -> str:
    return err.strerror or type(err).__name__


def check_input_file(path: str | os.PathLike[str]) -> Path:
    """Refuse, without opening it, a project FILE that cannot be read as a file.

    The path is only ``stat``-ed, so a named pipe or a device never blocks the caller and a folder
    is named as one.

    Returns:
        ``path`` as a Path.

    Raises:
        FilePathError: the path is missing, a folder, a named pipe, a device or a socket, or the
            user may not read it.
    """
    p = Path(path)
    try:
        st = os.stat(p)
    except FileNotFoundError:
        raise FilePathError(p, "no such file") from None
    except OSError as err:
        raise FilePathError(p, f"cannot be read ({_reason(err)})") from None
    if stat.S_ISDIR(st.st_mode):
        raise FilePathError(p, "is a folder, not a project file")
    if not stat.S_ISREG(st.st_mode):
        raise FilePathError(p, f"is {_kind(st.st_mode)}, not a project file")
    if not os.access(p, os.R_OK):
        raise FilePathError(p, "cannot be read (permission denied)")
    return p


def _same_file(a: Path, b: Path) -> bool:
    """True when ``a`` and ``b`` name one file: the same resolved path, or the same inode (hard links)."""
    if os.path.realpath(a) == os.path.realpath(b):
        return True
    try:
        return os.path.samefile(a, b)
    except OSError:  # one of them does not exist (yet)
        return False


def _check_folder(folder: Path, shown: str | os.PathLike[str]) -> None:
    """Refuse a missing folder, or one in which no file may be created."""
    try:
        st = os.stat(folder)
    except FileNotFoundError:
        raise FilePathError(shown, f"no such folder ({folder})") from None
    except OSError as err:
        raise FilePathError(shown, f"the folder {folder} cannot be used ({_reason(err)})") from None
    if not stat.S_ISDIR(st.st_mode):
        raise FilePathError(shown, f"{folder} is not a folder")
    if not st.st_mode & _ANY_WRITE or not os.access(folder, os.W_OK | os.X_OK):
        raise FilePathError(shown, f"the folder {folder} is read-only; choose another folder")


def _check_existing(target: Path, shown: str | os.PathLike[str]) -> os.stat_result | None:
    """The status of the file to be replaced (None if there is none); refuse one that may not be written."""
    try:
        st = os.stat(target)
    except (FileNotFoundError, NotADirectoryError):  # a new file (its folder is checked next)
        return None
    except OSError as err:
        raise FilePathError(shown, f"cannot be written ({_reason(err)})") from None
    if stat.S_ISDIR(st.st_mode):
        raise FilePathError(shown, "is a folder; give the name of a file in it")
    if not stat.S_ISREG(st.st_mode):
        raise FilePathError(shown, f"is {_kind(st.st_mode)}; give the name of a regular file")
    if not st.st_mode & _ANY_WRITE:
        raise FilePathError(shown, "is read-only (its permissions give nobody write access); make it writable or save elsewhere")
    if not os.access(target, os.W_OK):
        raise FilePathError(shown, "may not be written by you (permission denied); save elsewhere")
    return st


def final_target(path: str | os.PathLike[str]) -> Path:
    """The file a write to ``path`` replaces: the end of a chain of symbolic links, as an absolute path."""
    return Path(os.path.realpath(path))


def check_writable(path: str | os.PathLike[str]) -> Path:
    """Refuse a path that a save could not replace; return the file a save would replace.

    Checks what :func:`atomic_write_bytes` needs, without writing anything: an existing target is a
    regular file that may be written (its permission bits give someone write access), and its folder
    exists and new files may be created in it.

    Raises:
        FilePathError: naming ``path`` and what is wrong.
    """
    target = final_target(path)
    _check_existing(target, path)
    _check_folder(target.parent, path)
    return target


def check_output_path(output: str | os.PathLike[str], *, inputs: Iterable[str | os.PathLike[str]] = ()) -> Path:
    """Refuse an output path that would overwrite an input, or that cannot be written.

    ``output`` is compared with each input however either is spelled: resolved paths (``./x/../p``,
    symbolic links) and the file's identity (hard links). Overwriting an earlier output file (a PDF
    or CSV written before) is allowed.

    Returns:
        The file that writing ``output`` replaces (symbolic links followed).

    Raises:
        FilePathError: ``output`` is an input file, a folder, a device or named pipe, a read-only
            file, or lies in a missing or read-only folder.
    """
    out = Path(output)
    for source in inputs:
        if _same_file(out, Path(source)):
            raise FilePathError(output, f"is the project file {os.fspath(source)} itself; choose another output file")
    return check_writable(out)


def _umask() -> int:
    """The process's umask, read without changing it where the system says (Linux), else by setting it back."""
    try:
        with open("/proc/self/status", encoding="ascii") as fh:
            for line in fh:
                if line.startswith("Umask:"):
                    return int(line.split()[1], 8)
    except (OSError, ValueError, IndexError):
        pass
    mask = os.umask(0o022)
    os.umask(mask)
    return mask


def temp_pattern(target: Path) -> re.Pattern[str]:
    """The names of temporary files written while saving ``target`` (a file name in the same folder)."""
    return re.compile(re.escape(f".{target.name}{TEMP_MARK}") + _MKSTEMP_RANDOM)


def _remove_stale(target: Path) -> None:
    """Remove temporary files left beside ``target`` by a save that never finished."""
    pattern = temp_pattern(target)
    try:
        entries = list(os.scandir(target.parent))
    except OSError:
        return
    for entry in entries:
        if pattern.fullmatch(entry.name) and entry.is_file(follow_symlinks=False):
            try:
                os.unlink(entry.path)
            except OSError:
                pass


def _keep_owner_and_mode(fd: int, st: os.stat_result | None) -> None:
    """Give the temporary file the old file's owner, group and mode, or a new file's mode."""
    if st is None:
        os.fchmod(fd, _NEW_FILE_MODE & ~_umask())
        return
    if hasattr(os, "fchown"):
        try:
            os.fchown(fd, st.st_uid, st.st_gid)
        except OSError:  # only root may give a file away; the group may still be kept
            try:
                os.fchown(fd, -1, st.st_gid)
            except OSError:
                pass
    os.fchmod(fd, stat.S_IMODE(st.st_mode))  # after chown, which may clear set-id bits


def atomic_write_bytes(path: str | os.PathLike[str], data: bytes) -> None:
    """Replace the file at ``path`` with ``data`` so that readers see the old file or the new one.

    Raises:
        FilePathError: the path may not be written (see :func:`check_writable`), or the write failed
            (a full disk, a read-only file system); the old file is untouched and no temporary file
            is left.
    """
    target = final_target(path)
    st = _check_existing(target, path)
    folder = target.parent
    _check_folder(folder, path)
    _remove_stale(target)
    try:
        fd, tmp = tempfile.mkstemp(prefix=f".{target.name}{TEMP_MARK}", dir=folder)
    except OSError as err:
        raise FilePathError(path, f"cannot be written in {folder} ({_reason(err)})") from None
    try:
        try:
            with os.fdopen(fd, "wb") as fh:
                fh.write(data)
                fh.flush()
                if os.name == "posix":
                    _keep_owner_and_mode(fh.fileno(), st)
                os.fsync(fh.fileno())
            os.replace(tmp, target)
        except OSError as err:
            raise FilePathError(path, f"cannot be written ({_reason(err)}); the old file is unchanged") from None
    except BaseException:
        try:
            os.unlink(tmp)
        except OSError:
            pass
        raise
    _sync_folder(folder)


def atomic_write_text(path: str | os.PathLike[str], text: str, *, encoding: str = "utf-8") -> None:
    """Replace the file at ``path`` with ``text`` (written as is, no newline translation); see
    :func:`atomic_write_bytes`."""
    atomic_write_bytes(path, text.encode(encoding))


def _sync_folder(folder: Path) -> None:
    """Make the rename itself durable."""
    try:
        dir_fd = os.open(folder, os.O_RDONLY)
    except OSError:  # pragma: no cover - not possible on every system
        return
    try:
        os.fsync(dir_fd)
    except OSError:  # pragma: no cover - some file systems refuse fsync on a folder
        pass
    finally:
        os.close(dir_fd)

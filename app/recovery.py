"""Recovery files: one per open document, so unsaved work survives a crash of any one window.

Each document a window holds has a *slot*: a record file and a lock file in the recovery folder.

* The record (``<key>.kernline-recovery``, JSON) holds the document's raw project, its absolute path
  (or null when it was never saved), the owner's process id and that process's start time, when it
  was written, and the record's format name and version. It is written atomically.
* The key is a hash of the document's absolute path followed by a session id (a uuid of the
  window's document), or ``unsaved-`` and the session id for a document without a file. The
  session id keeps two windows on the same file, and a new window beside an orphaned record of the
  same file, from writing over each other.
* The lock (``<key>.kernline-recovery.lock``) is held by the owner for the life of the document:
  ``fcntl.flock`` on POSIX, ``msvcrt.locking`` on Windows. The operating system lets go of it when
  the owner ends, cleanly or not, so another process can tell a live owner from a dead one. Where no
  lock can be taken, the owner's process id and start time decide (a reused process id has another
  start time; the start time is read on Linux only, elsewhere a live process id counts as a live
  owner).

A record is *orphaned* when its lock is free and its owner is not alive: the next launch offers it.
A record that cannot be read is renamed to ``*.corrupt`` and reported; it never blocks a launch.
Nothing here knows engineering or Qt.
"""

from __future__ import annotations

import contextlib
import hashlib
import json
import os
import sys
import time
import uuid
from dataclasses import dataclass
from pathlib import Path
from typing import Any

from kernline.engine.file_safety import atomic_write_text

FORMAT = "kernline-recovery"
VERSION = 2  # 1: the single shared autosave file of Kernline before per-document records
SUFFIX = ".kernline-recovery"
LOCK_SUFFIX = ".lock"
CORRUPT_SUFFIX = ".corrupt"


def new_session() -> str:
    """A session id for a document (a uuid4 as 32 hex digits)."""
    return uuid.uuid4().hex


def record_name(path: Path | None, session: str) -> str:
    """The record's file name: a hash of the absolute path and the session id, or ``unsaved-`` and the session."""
    if path is None:
        return f"unsaved-{session}{SUFFIX}"
    digest = hashlib.sha256(os.fsencode(os.path.abspath(path))).hexdigest()[:16]
    return f"{digest}-{session[:12]}{SUFFIX}"


def lock_path_of(record: Path) -> Path:
    return record.with_name(record.name + LOCK_SUFFIX)


# ---- processes ---------------------------------------------------------------------------------------


def process_start_time(pid: int) -> str | None:
    """When process ``pid`` started, as the kernel counts it (Linux: /proc/<pid>/stat field 22), else None."""
    try:
        text = Path(f"/proc/{pid}/stat").read_text(encoding="ascii", errors="replace")
    except OSError:
        return None
    # field 2 (the command name) is in parentheses and may hold spaces: count fields after the last ")"
    fields = text[text.rfind(")") + 2 :].split()
    # fields[0] is field 3 (state), so field 22 (starttime) is fields[19]
    return fields[19] if len(fields) > 19 else None


def _pid_alive(pid: int) -> bool:
    if pid <= 0:
        return False
    if sys.platform == "win32":  # pragma: no cover - exercised on Windows only
        return _windows_pid_alive(pid)
    try:
        os.kill(pid, 0)
    except ProcessLookupError:
        return False
    except PermissionError:  # alive, owned by someone else
        return True
    except OSError:
        return False
    return True


def _windows_pid_alive(pid: int) -> bool:  # pragma: no cover - Windows only
    import ctypes

    kernel32 = ctypes.windll.kernel32  # type: ignore[attr-defined]
    process_query_limited_information = 0x1000
    still_active = 259
    handle = kernel32.OpenProcess(process_query_limited_information, False, pid)
    if not handle:
        return False
    try:
        code = ctypes.c_ulong()
        if not kernel32.GetExitCodeProcess(handle, ctypes.byref(code)):
            return True
        return code.value == still_active
    finally:
        kernel32.CloseHandle(handle)


def process_alive(pid: Any, started: Any) -> bool:
    """Whether the process that wrote a record still runs: its id is alive and, where known, started when it did."""
    if isinstance(pid, bool) or not isinstance(pid, int) or not _pid_alive(pid):
        return False
    if started is None:
        return True
    now = process_start_time(pid)
    return now is None or now == str(started)


# ---- locks -------------------------------------------------------------------------------------------


class Lock:
    """An exclusive lock on a file, held until :meth:`release` (or the process ends)."""

    def __init__(self, path: Path, fd: int | None) -> None:
        self.path = path
        self.fd = fd  # None: no lock available on this system (the process id stands in)

    @classmethod
    def take(cls, path: Path) -> Lock | None:
        """Take the lock without waiting: the Lock, or None when another owner holds it."""
        try:
            fd = os.open(path, os.O_RDWR | os.O_CREAT, 0o600)
        except OSError:
            return cls(path, None)
        try:
            if not _try_lock(fd):
                os.close(fd)
                return None
        except OSError:
            os.close(fd)
            return cls(path, None)
        return cls(path, fd)

    @property
    def held(self) -> bool:
        return self.fd is not None

    def release(self, remove: bool = False) -> None:
        """Let go of the lock; ``remove`` deletes the lock file first (while still holding it)."""
        if remove:
            with contextlib.suppress(OSError):
                self.path.unlink()
        if self.fd is not None:
            with contextlib.suppress(OSError):
                _unlock(self.fd)
            with contextlib.suppress(OSError):
                os.close(self.fd)
            self.fd = None


def _try_lock(fd: int) -> bool:
    """Lock ``fd`` exclusively without waiting: False when another holds it; OSError when locks are unsupported."""
    if os.name == "nt":  # pragma: no cover - Windows only
        import msvcrt

        os.lseek(fd, 0, os.SEEK_SET)
        try:
            msvcrt.locking(fd, msvcrt.LK_NBLCK, 1)
        except OSError as err:
            if err.errno in (13, 36):  # EACCES, EDEADLOCK: held by another handle
                return False
            raise
        return True
    import fcntl

    try:
        fcntl.flock(fd, fcntl.LOCK_EX | fcntl.LOCK_NB)
    except BlockingIOError:
        return False
    return True


def _unlock(fd: int) -> None:
    if os.name == "nt":  # pragma: no cover - Windows only
        import msvcrt

        os.lseek(fd, 0, os.SEEK_SET)
        msvcrt.locking(fd, msvcrt.LK_UNLCK, 1)
        return
    import fcntl

    fcntl.flock(fd, fcntl.LOCK_UN)


def lock_state(path: Path) -> str:
    """ "held" (another owner holds it), "free" (nobody does, or there is no lock file) or "unknown"."""
    if not path.exists():
        return "free"
    try:
        fd = os.open(path, os.O_RDWR)
    except FileNotFoundError:
        return "free"
    except OSError:
        return "unknown"
    try:
        if not _try_lock(fd):
            return "held"
        _unlock(fd)
        return "free"
    except OSError:
        return "unknown"
    finally:
        os.close(fd)


# ---- one document's slot -----------------------------------------------------------------------------


class RecoverySlot:
    """The recovery record of one open document and the lock that says its owner lives.

    Args:
        folder: the recovery folder (created when first needed).
        path: the document's file (made absolute), or None for a document never saved.
        session: the document's session id.
    """

    def __init__(self, folder: Path, path: Path | None, session: str) -> None:
        self.folder = Path(folder)
        self.path = Path(os.path.abspath(path)) if path is not None else None
        self.session = session
        self.record = self.folder / record_name(self.path, session)
        self.lock: Lock | None = None

    def acquire(self) -> None:
        """Take the lock (for the life of the document). A folder that cannot be made leaves the pid as the sign of life."""
        if self.lock is not None:
            return
        try:
            self.folder.mkdir(parents=True, exist_ok=True, mode=0o700)
        except OSError:
            self.lock = Lock(lock_path_of(self.record), None)
            return
        # the session id is new, so nobody else holds this lock; None would mean a clash of uuids
        self.lock = Lock.take(lock_path_of(self.record)) or Lock(lock_path_of(self.record), None)

    def write(self, raw: dict[str, Any], *, demo: bool = False, name: str = "") -> None:
        """Write the record (atomically). Raises OSError when the folder cannot be written."""
        self.acquire()
        self.folder.mkdir(parents=True, exist_ok=True, mode=0o700)
        pid = os.getpid()
        record = {
            "format": FORMAT,
            "version": VERSION,
            "saved": time.strftime("%Y-%m-%dT%H:%M:%S%z"),
            "path": str(self.path) if self.path is not None else None,
            "name": name,
            "demo": demo,
            "pid": pid,
            "started": process_start_time(pid),
            "session": self.session,
            "project": raw,
        }
        atomic_write_text(self.record, json.dumps(record, indent=1, ensure_ascii=False) + "\n")

    def remove(self) -> None:
        """Delete the record (the document was saved, closed or is back to its saved state); keep the lock."""
        with contextlib.suppress(OSError):
            self.record.unlink()

    def release(self) -> None:
        """Delete the record and the lock file and let go of the lock (the document is closed)."""
        self.remove()
        if self.lock is not None:
            self.lock.release(remove=True)
            self.lock = None

    @property
    def exists(self) -> bool:
        return self.record.is_file()


# ---- after a crash -----------------------------------------------------------------------------------


@dataclass(frozen=True, slots=True)
class Orphan:
    """A record whose owner is gone: the unsaved work of a window that did not close."""

    record: Path
    raw: dict[str, Any]
    path: Path | None  # the document's file; None when never saved (or the record's path was not absolute)
    saved: str
    name: str
    demo: bool

    @property
    def title(self) -> str:
        project = self.raw.get("project")
        name = self.name or (project.get("name", "") if isinstance(project, dict) else "")
        return str(name).strip() or (self.path.name if self.path else "Untitled project")


@dataclass(frozen=True, slots=True)
class Scan:
    """What the recovery folder holds besides live windows' records."""

    orphans: tuple[Orphan, ...]
    set_aside: tuple[Path, ...]  # unreadable records, renamed to *.corrupt
    live: int  # records of live owners (left alone)


class CorruptRecord(ValueError):
    """A record that cannot be read as one."""


def read_record(record: Path) -> dict[str, Any]:
    """The record's JSON object; raises CorruptRecord when it is not a readable record, OSError when unreadable."""
    try:
        data = json.loads(record.read_text(encoding="utf-8"))
    except (UnicodeDecodeError, ValueError) as err:
        raise CorruptRecord(f"not valid JSON ({err})") from None
    if not isinstance(data, dict) or data.get("format") != FORMAT:
        raise CorruptRecord("not a Kernline recovery record")
    version = data.get("version")
    if isinstance(version, bool) or not isinstance(version, int) or not 1 <= version <= VERSION:
        raise CorruptRecord(f"recovery format version {version!r} is not one this Kernline reads")
    if not isinstance(data.get("project"), dict):
        raise CorruptRecord("it holds no project")
    return data


def set_aside(record: Path) -> Path:
    """Rename a record that cannot be used to ``*.corrupt`` (a free name) so it is kept but never offered again."""
    target = record.with_name(record.name + CORRUPT_SUFFIX)
    n = 2
    while target.exists():
        target = record.with_name(f"{record.name}.{n}{CORRUPT_SUFFIX}")
        n += 1
    os.replace(record, target)
    with contextlib.suppress(OSError):
        lock_path_of(record).unlink()
    return target


def owner_alive(record: Path, data: dict[str, Any] | None) -> bool:
    """A live owner holds the record's lock, or (where locks say nothing) its process still runs."""
    state = lock_state(lock_path_of(record))
    if state == "held":
        return True
    if data is None:
        return state == "unknown"
    if "pid" not in data:  # a version 1 record: its writer took no lock and wrote no pid
        return False
    return process_alive(data.get("pid"), data.get("started"))


def scan(folder: Path) -> Scan:
    """Find the orphaned records in ``folder``; set aside the unreadable ones (unless a live owner holds them)."""
    folder = Path(folder)
    orphans: list[Orphan] = []
    aside: list[Path] = []
    live = 0
    try:
        records = sorted(p for p in folder.glob("*" + SUFFIX) if p.is_file())
    except OSError:
        return Scan((), (), 0)
    for record in records:
        try:
            data = read_record(record)
        except CorruptRecord:
            if owner_alive(record, None):
                live += 1
                continue
            with contextlib.suppress(OSError):
                aside.append(set_aside(record))
            continue
        except OSError:
            continue  # unreadable now (permissions, vanished): leave it
        if owner_alive(record, data):
            live += 1
            continue
        text = data.get("path")
        path = Path(text) if isinstance(text, str) and text and os.path.isabs(text) else None
        orphans.append(
            Orphan(
                record=record,
                raw=data["project"],
                path=path,
                saved=str(data.get("saved", "")),
                name=str(data.get("name", "") or ""),
                demo=bool(data.get("demo", False)),
            )
        )
    _prune_locks(folder)
    orphans.sort(key=lambda o: o.saved, reverse=True)
    return Scan(tuple(orphans), tuple(aside), live)


def _prune_locks(folder: Path) -> None:
    """Delete lock files with no record and no owner (left by a crash between the two deletions)."""
    with contextlib.suppress(OSError):
        for lock in folder.glob("*" + SUFFIX + LOCK_SUFFIX):
            if (lock.with_name(lock.name[: -len(LOCK_SUFFIX)])).exists():
                continue
            taken = Lock.take(lock)
            if taken is not None and taken.held:
                taken.release(remove=True)


def claim(orphan: Orphan) -> Lock | None:
    """Take an orphan's lock so that no other process restores or discards it meanwhile; None when taken."""
    lock = Lock.take(lock_path_of(orphan.record))
    if lock is None:
        return None
    if not orphan.record.exists():  # another process dealt with it
        lock.release()
        return None
    return lock


def discard(orphan: Orphan, lock: Lock | None = None) -> None:
    """Delete an orphaned record (restored into a window, or declined) and its lock file."""
    with contextlib.suppress(OSError):
        orphan.record.unlink()
    if lock is not None:
        lock.release(remove=True)
    else:
        with contextlib.suppress(OSError):
            lock_path_of(orphan.record).unlink()


__all__ = [
    "FORMAT",
    "SUFFIX",
    "VERSION",
    "CorruptRecord",
    "Lock",
    "Orphan",
    "RecoverySlot",
    "Scan",
    "claim",
    "discard",
    "lock_path_of",
    "lock_state",
    "new_session",
    "owner_alive",
    "process_alive",
    "process_start_time",
    "read_record",
    "record_name",
    "scan",
    "set_aside",
]

"""Run the engine's footing sizing off the GUI thread when it could take longer than a frame.

:func:`engine.sizing.size_footing` evaluates the whole candidate grid at once (numpy); one wall of
the demo takes ~10 ms, a project of many walls much longer. A request estimates its work
(candidates x design cases); small jobs run at once on the GUI thread, larger ones on a
:class:`QThreadPool` worker. Every request carries a sequence number per key ("wall:C3", "all"), and
a result whose number is older than the latest request of its key is dropped, so a slow answer to a
superseded edit never overwrites a newer one.

:class:`PackageWriter` writes the calculation package (:func:`engine.report.write_report`) on a
worker too: the demo takes ~0.5 s and a 20-wall project ~2 s, too long to freeze the window.
"""

from __future__ import annotations

import copy
import time
from collections.abc import Sequence
from dataclasses import dataclass, field
from pathlib import Path
from typing import Any

from kernline.engine.combinations import combinations_of
from kernline.engine.errors import EngineError, InputError
from kernline.engine.model import Project, Wall
from kernline.engine.project_file import ProjectDocument as ProjectFile
from kernline.engine.sizing import candidate_grid, candidate_values, size_footing
from PySide6.QtCore import QObject, QRunnable, QThreadPool, Signal

from .document import SizingEntry

# Candidate-cases evaluated per frame budget on a 2-core machine: ~0.1 us each (measured with the
# demo, 3,145 candidates x 32 cases in ~11 ms), so 40,000 stay well inside a 16 ms frame.
SYNC_LIMIT = 40_000


@dataclass(frozen=True, slots=True)
class SizingBatch:
    """The outcome of one request: sized walls, walls that could not be sized, and timing."""

    seq: int
    key: str
    entries: tuple[SizingEntry, ...]
    errors: dict[str, str] = field(default_factory=dict)
    seconds: float = 0.0
    threaded: bool = False


def estimated_work(project: Project, walls: Sequence[Wall]) -> int:
    """Candidates x design cases (both lateral directions counted) over ``walls``; a wall whose length is
    sized too counts each extension tried."""
    cases = 2 * len(combinations_of(project.criteria))
    total = 0
    for wall in walls:
        widths, thicknesses = candidate_grid(wall)
        z = wall.sizing
        lengths = candidate_values(0.0, z.extension_max, z.extension_step).size if z.extension_max > 0.0 else 1
        total += widths.size * thicknesses.size * cases * lengths
    return total


def size_walls(seq: int, key: str, project: Project, walls: Sequence[Wall]) -> SizingBatch:
    """Size each wall with the engine; an engine refusal (e.g. a grid too fine) becomes a message."""
    start = time.perf_counter()
    entries = []
    errors = {}
    for wall in walls:
        try:
            result = size_footing(project, wall)
        except EngineError as err:
            errors[wall.id] = str(err)
            continue
        entries.append(SizingEntry(wall=wall, soil=project.soil, criteria=project.criteria, result=result, site=project.site))
    return SizingBatch(seq, key, tuple(entries), errors, time.perf_counter() - start)


class _Relay(QObject):
    """Lives on the GUI thread; a worker emits through it (Qt queues the call across threads)."""

    done = Signal(object)


class _Job(QRunnable):
    def __init__(self, relay: _Relay, seq: int, key: str, project: Project, walls: tuple[Wall, ...]) -> None:
        super().__init__()
        self.relay, self.seq, self.key, self.project, self.walls = relay, seq, key, project, walls

    def run(self) -> None:
        batch = size_walls(self.seq, self.key, self.project, self.walls)
        self.relay.done.emit(SizingBatch(batch.seq, batch.key, batch.entries, batch.errors, batch.seconds, True))


class SizingRunner(QObject):
    """Runs sizing requests; emits ``finished`` with each batch that is still current."""

    started = Signal(str)  # key
    finished = Signal(object)  # SizingBatch

    def __init__(self, parent: QObject | None = None, *, sync_limit: int = SYNC_LIMIT, pool: QThreadPool | None = None) -> None:
        super().__init__(parent)
        self.sync_limit = sync_limit
        self.pool = pool or QThreadPool(self)
        self.pool.setMaxThreadCount(1)  # one sizing at a time; the GUI keeps the other core
        self._relay = _Relay(self)
        self._relay.done.connect(self._on_done)
        self._seq = 0
        self._latest: dict[str, int] = {}
        self.dropped = 0
        self.running: set[str] = set()

    def request(self, key: str, project: Project, walls: Sequence[Wall]) -> int:
        """Size ``walls`` of ``project``; returns the request's sequence number."""
        self._seq += 1
        seq = self._seq
        self._latest[key] = seq
        walls = tuple(walls)
        self.running.add(key)
        self.started.emit(key)
        if estimated_work(project, walls) <= self.sync_limit:
            self._on_done(size_walls(seq, key, project, walls))
        else:
            self.pool.start(_Job(self._relay, seq, key, project, walls))
        return seq

    def busy(self, key: str | None = None) -> bool:
        return bool(self.running) if key is None else key in self.running

    def wait(self, msecs: int = 5000) -> bool:
        """Wait for the worker to finish (used before quitting)."""
        return self.pool.waitForDone(msecs)

    def _on_done(self, batch: SizingBatch) -> None:
        if batch.seq != self._latest.get(batch.key):
            self.dropped += 1
            return
        self.running.discard(batch.key)
        self.finished.emit(batch)


# ---- the calculation package ----------------------------------------------------------------------


@dataclass(frozen=True, slots=True)
class PackageOutcome:
    """What became of one export: the file written, or why not (``error`` is a sentence for the user)."""

    path: Path
    walls: int
    seconds: float
    error: str | None = None
    size: int = 0

    @property
    def ok(self) -> bool:
        return self.error is None


def write_package(raw: dict[str, Any], project: Project, path: Path, **options: bool) -> PackageOutcome:
    """Write the calculation package of ``project`` to ``path``; any failure becomes a message.

    The raw dict goes along so that the package prints the geotechnical report named in
    ``soil.report`` (see :func:`engine.report.write_report`); ``options`` are the package's own
    (``seal_every_sheet``, ``verification``).
    """
    from kernline.engine.report import write_report  # reportlab is imported only when a package is written

    start = time.perf_counter()
    walls = len(project.walls)
    try:
        write_report(ProjectFile(raw=raw, project=project), path, **options)
    except InputError as err:
        return PackageOutcome(path, walls, time.perf_counter() - start, err.problem or err.message)
    except OSError as err:
        return PackageOutcome(path, walls, time.perf_counter() - start, f"{path}: cannot be written ({err.strerror or err})")
    except Exception as err:  # noqa: BLE001 - a bug must reach the user as a message, not end the worker silently
        return PackageOutcome(path, walls, time.perf_counter() - start, f"unexpected error while writing the package: {err!r}")
    try:
        size = path.stat().st_size
    except OSError:  # pragma: no cover - it was just written
        size = 0
    return PackageOutcome(path, walls, time.perf_counter() - start, None, size)


class _PackageJob(QRunnable):
    def __init__(self, relay: _Relay, raw: dict[str, Any], project: Project, path: Path, options: dict[str, bool]) -> None:
        super().__init__()
        self.relay, self.raw, self.project, self.path, self.options = relay, raw, project, path, options

    def run(self) -> None:
        self.relay.done.emit(write_package(self.raw, self.project, self.path, **self.options))


class PackageWriter(QObject):
    """Writes one calculation package at a time on a worker; emits ``finished`` with a PackageOutcome."""

    finished = Signal(object)  # PackageOutcome

    def __init__(self, parent: QObject | None = None, *, pool: QThreadPool | None = None) -> None:
        super().__init__(parent)
        self.pool = pool or QThreadPool(self)
        self.pool.setMaxThreadCount(1)
        self._relay = _Relay(self)
        self._relay.done.connect(self._on_done)
        self.busy = False

    def write(self, raw: dict[str, Any], project: Project, path: str | Path, **options: bool) -> bool:
        """Start writing ``project`` (with its raw file dict) to ``path`` with the package's ``options``
        (:func:`write_package`); False if one is still being written."""
        if self.busy:
            return False
        self.busy = True
        # the worker gets its own copy: the window keeps editing the raw dict meanwhile
        self.pool.start(_PackageJob(self._relay, copy.deepcopy(raw), project, Path(path), dict(options)))
        return True

    def wait(self, msecs: int = 30_000) -> bool:
        return self.pool.waitForDone(msecs)

    def _on_done(self, outcome: PackageOutcome) -> None:
        self.busy = False
        self.finished.emit(outcome)

"""Window benchmark (a script that prints figures; not a timed test).

    python tests/benchmarks/bench_window.py [--edits 200] [--starts 5]

* Edit-to-redrawn latency over 200 edits of the demo project in a 1480 x 940 window: a value is
  typed into a field (or a loads-table cell) and committed; the clock stops when the model, results
  and every visible view are updated ("updated") and again when Qt has painted the window
  ("painted"). Target: median painted < 25 ms on 2 cores.
* Cold start to a shown window: a fresh Python process imports Kernline, builds the window with the
  demo project and shows it; the clock runs from launching the process to the first painted frame.
  Target < 1.5 s.

Runs offscreen (or on the display QT_QPA_PLATFORM names); uses a temporary settings file and recovery
folder. The machine's load average is printed before and after: other work on a shared machine slows
both figures, so compare runs at similar load.
"""

from __future__ import annotations

import argparse
import os
import statistics
import subprocess
import sys
import tempfile
import time
from pathlib import Path

os.environ.setdefault("QT_QPA_PLATFORM", "offscreen")

SIZE = (1480, 940)  # the window's own first size, where the targets hold
EDIT_TARGET_MS = 25.0
START_TARGET_S = 1.5

ROOT = Path(__file__).resolve().parents[2]

_CHILD = r"""
import os, sys, tempfile, time
from pathlib import Path
os.environ.setdefault("QT_QPA_PLATFORM", "offscreen")
sys.path.insert(0, {root!r})
from PySide6.QtCore import QSettings
from PySide6.QtWidgets import QApplication
from kernline.app.main_window import MainWindow
app = QApplication(sys.argv[:1])
tmp = tempfile.mkdtemp()
window = MainWindow(settings=QSettings(str(Path(tmp) / "s.ini"), QSettings.Format.IniFormat), recovery_dir=Path(tmp) / "r")
window.start(None, demo=True)
window.show()
app.processEvents()
print("shown", flush=True)
"""


def percentile(values: list[float], p: float) -> float:
    ordered = sorted(values)
    k = (len(ordered) - 1) * p
    lo, hi = int(k), min(int(k) + 1, len(ordered) - 1)
    return ordered[lo] + (ordered[hi] - ordered[lo]) * (k - lo)


def cold_starts(count: int) -> list[float]:
    times = []
    code = _CHILD.format(root=str(ROOT))
    env = dict(os.environ)
    for _ in range(count):
        start = time.perf_counter()
        child = subprocess.Popen(
            [sys.executable, "-c", code], stdout=subprocess.PIPE, stderr=subprocess.DEVNULL, text=True, env=env
        )
        assert child.stdout is not None
        line = child.stdout.readline()
        shown = time.perf_counter()
        child.wait(timeout=60)
        if line.strip() != "shown":
            raise RuntimeError("the window did not start")
        times.append(shown - start)
    return times


def edit_latency(edits: int) -> tuple[list[float], list[float]]:
    sys.path.insert(0, str(ROOT))
    from kernline.app.main_window import MainWindow
    from PySide6.QtCore import QSettings
    from PySide6.QtWidgets import QApplication

    app = QApplication.instance() or QApplication(sys.argv[:1])
    tmp = tempfile.mkdtemp()
    window = MainWindow(settings=QSettings(str(Path(tmp) / "s.ini"), QSettings.Format.IniFormat), recovery_dir=Path(tmp) / "r")
    window.resize(*SIZE)
    window.start(None, demo=True)
    window.show()
    app.processEvents()
    if window.size().toTuple() != SIZE:
        raise RuntimeError(f"the window is {window.size().toTuple()}, not {SIZE}")
    doc = window.document
    fields = {f.spec.path: f for f in window.wall_form.group.fields}
    width = fields[("footing", "width")]
    thickness = fields[("footing", "thickness")]
    table = window.wall_form.loads.table

    updated: list[float] = []
    painted: list[float] = []
    for i in range(edits):
        doc.set_current_index(i % len(doc.project.walls))
        app.processEvents()
        kind = i % 3
        start = time.perf_counter()
        if kind == 0:
            width.edit.setText(f"{24 + i % 13} in")
            width.edit.editingFinished.emit()
        elif kind == 1:
            thickness.edit.setText(f"{12 + i % 7} in")
            thickness.edit.editingFinished.emit()
        else:
            table.item(0, 2).setText(f"{400 + 10 * (i % 20)}")
        middle = time.perf_counter()
        app.processEvents()
        end = time.perf_counter()
        updated.append(middle - start)
        painted.append(end - start)
    if doc.undo_stack.count() < edits * 0.9:
        raise RuntimeError(f"only {doc.undo_stack.count()} of {edits} edits were applied")
    doc.undo_stack.clear()
    window.close()
    return updated, painted


def load_average() -> str:
    try:
        return "load average " + " ".join(f"{x:.2f}" for x in os.getloadavg()) + " (1, 5, 15 min)"
    except OSError:
        return "load average not known"


def main(argv: list[str]) -> int:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--edits", type=int, default=200)
    parser.add_argument("--starts", type=int, default=5)
    args = parser.parse_args(argv[1:])
    print(f"machine: {os.cpu_count()} cores, Python {sys.version.split()[0]}, QT_QPA_PLATFORM={os.environ['QT_QPA_PLATFORM']}")
    print(f"before: {load_average()}")
    updated, painted = edit_latency(args.edits)
    ms = 1000.0
    print(
        f"edit to updated views ({len(updated)} edits): median {statistics.median(updated) * ms:.1f} ms, "
        f"p95 {percentile(updated, 0.95) * ms:.1f} ms"
    )
    print(
        f"edit to painted window at {SIZE[0]} x {SIZE[1]} ({len(painted)} edits): median {statistics.median(painted) * ms:.1f} ms, "
        f"p95 {percentile(painted, 0.95) * ms:.1f} ms   (target: median < {EDIT_TARGET_MS:.0f} ms)"
    )
    starts = cold_starts(args.starts)
    print(
        f"cold start to shown window ({len(starts)} runs): median {statistics.median(starts):.2f} s, "
        f"min {min(starts):.2f} s, max {max(starts):.2f} s   (target < {START_TARGET_S} s)"
    )
    print(f"after: {load_average()}")
    return 0


if __name__ == "__main__":
    sys.exit(main(sys.argv))

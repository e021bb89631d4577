"""Concrete view benchmark (a script that prints figures; not a timed test).

    python tests/benchmarks/bench_concrete_view.py [--edits 40]

Edits the footing thickness of the demo's wall K5 through the document's edit command, alternating two
values, and times each edit until the drawings panel is redrawn: once with the soil pressure page shown
(the design along the length is not made) and once with the concrete page shown (it is made once per
edit). Prints the median and 90th percentile per edit, and the design along the length alone.
Runs offscreen with a temporary settings file and recovery folder.
"""

from __future__ import annotations

import argparse
import os
import statistics
import sys
import tempfile
import time
from pathlib import Path

os.environ.setdefault("QT_QPA_PLATFORM", "offscreen")


def edit_times(window, app, edits: int) -> list[float]:
    from kernline.app import commands

    doc = window.document
    times = []
    for k in range(edits):
        start = time.perf_counter()
        doc.push(commands.SetField(doc, doc.wall_path("footing", "thickness"), "14 in" if k % 2 else "16 in"))
        app.processEvents()
        times.append((time.perf_counter() - start) * 1000.0)
    return times


def main(argv: list[str]) -> int:
    parser = argparse.ArgumentParser()
    parser.add_argument("--edits", type=int, default=40)
    args = parser.parse_args(argv[1:])
    from PySide6.QtCore import QSettings
    from PySide6.QtWidgets import QApplication

    app = QApplication.instance() or QApplication(sys.argv[:1])
    from kernline.app.main_window import MainWindow
    from kernline.engine.concrete.along import design_along

    with tempfile.TemporaryDirectory() as tmp:
        settings = QSettings(str(Path(tmp) / "s.ini"), QSettings.Format.IniFormat)
        window = MainWindow(settings=settings, recovery_dir=Path(tmp) / "r")
        window.resize(1480, 940)
        window.start(None, demo=True)
        window.show()
        ids = [w.id for w in window.document.project.walls]
        window.document.set_current_index(ids.index("K5"))
        app.processEvents()
        for page, name in ((0, "soil pressure page"), (1, "concrete page")):
            window.drawings.show_page(page)
            app.processEvents()
            edit_times(window, app, 4)  # warm up
            times = edit_times(window, app, args.edits)
            p90 = sorted(times)[int(0.9 * (len(times) - 1))]
            print(f"{name:20s} edit to redrawn: median {statistics.median(times):6.1f} ms, p90 {p90:6.1f} ms")
        result = window.document.current_result
        runs = []
        for _ in range(10):
            start = time.perf_counter()
            design_along(result.strength_table, result.strength_evaluation)
            runs.append((time.perf_counter() - start) * 1000.0)
        print(f"design_along alone (K5): median {statistics.median(runs):6.1f} ms")
        window.document.undo_stack.clear()
        window.close()
    return 0


if __name__ == "__main__":
    sys.exit(main(sys.argv))

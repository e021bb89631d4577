"""Time to write the calculation package of a 20-wall project (a script, not a test).

The project is the demo project's four walls repeated five times under new ids. Prints

* the command line from a fresh process (``kernline report FILE -o OUT.pdf``: Python start, imports,
  engine checks and sizing, layout and the PDF), median of a few runs;
* :func:`engine.report.write_report` called again in a warm process, median of a few runs;

and the page count. Target: under 3 s on 2 cores.

Run: python tests/benchmarks/bench_report.py [--runs N]
"""

from __future__ import annotations

import argparse
import copy
import io
import os
import resource
import statistics
import subprocess
import sys
import tempfile
import time
from pathlib import Path
from typing import Any

from kernline.engine.project_file import dumps_project, load_project, parse_project
from kernline.engine.resources import resource_path

WALLS = 20


def twenty_wall_raw() -> dict[str, Any]:
    raw = load_project(resource_path("demo.kernline")).raw
    walls = []
    for k in range(WALLS):
        wall = copy.deepcopy(raw["walls"][k % len(raw["walls"])])
        wall["id"] = f"{wall['id']}-{k + 1:02d}"
        walls.append(wall)
    return dict(raw, walls=walls)


def twenty_wall_project() -> Any:
    return parse_project(twenty_wall_raw())


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--runs", type=int, default=3)
    args = parser.parse_args()
    runs = max(1, args.runs)

    with tempfile.TemporaryDirectory() as folder:
        project_file = Path(folder) / "twenty.kernline"
        project_file.write_text(dumps_project(twenty_wall_raw()), encoding="utf-8")
        out = Path(folder) / "package.pdf"

        env = dict(os.environ, QT_QPA_PLATFORM="offscreen")
        fresh = []
        fresh_cpu = []
        for _ in range(runs):
            t, c = time.perf_counter(), resource.getrusage(resource.RUSAGE_CHILDREN).ru_utime
            subprocess.run(
                [sys.executable, "-m", "kernline.app.cli", "report", str(project_file), "-o", str(out)],
                check=True,
                env=env,
                capture_output=True,
            )
            fresh.append(time.perf_counter() - t)
            fresh_cpu.append(resource.getrusage(resource.RUSAGE_CHILDREN).ru_utime - c)

        from kernline.engine.report import write_report

        project = twenty_wall_project()
        write_report(project, out)  # warm up: imports, font registration
        warm = []
        cpu = []
        for _ in range(runs):
            t, c = time.perf_counter(), time.process_time()
            write_report(project, out)
            warm.append(time.perf_counter() - t)
            cpu.append(time.process_time() - c)

        from pypdf import PdfReader

        data = out.read_bytes()
        pages = len(PdfReader(io.BytesIO(data)).pages)
    print(f"{WALLS}-wall package: {pages} pages, {len(data) / 1024:.0f} KiB")
    print(
        f"kernline report, fresh process: median {statistics.median(fresh):.2f} s over {runs} run(s) "
        f"(min {min(fresh):.2f} s, max {max(fresh):.2f} s; user CPU {statistics.median(fresh_cpu):.2f} s)"
    )
    print(
        f"write_report, warm process:     median {statistics.median(warm):.2f} s "
        f"(CPU {statistics.median(cpu):.2f} s; min {min(warm):.2f} s, max {max(warm):.2f} s)"
    )
    print(f"machine: {os.cpu_count()} CPU(s); load average {os.getloadavg()[0]:.2f}")


if __name__ == "__main__":
    main()

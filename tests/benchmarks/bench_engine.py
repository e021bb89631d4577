"""Engine benchmark: prints figures (not a test; timings on shared machines are noisy).

    python tests/benchmarks/bench_engine.py

Targets on a 2-core machine: one wall checked (all combinations, every registered check) < 1 ms;
one wall sized on a 96 x 48 grid with the four checks < 30 ms median (with the strength checks and
the design along the length), and with 13 extension steps < 150 ms; ``kernline check`` start-to-exit < 0.35 s; 1,000 walls sized from the command line (figure
reported).
"""

from __future__ import annotations

import copy
import json
import os
import resource
import statistics
import subprocess
import sys
import tempfile
import time
from dataclasses import replace
from pathlib import Path

from kernline.engine.model import INCH, SizingBounds
from kernline.engine.project_file import load_project, parse_project
from kernline.engine.resources import resource_path
from kernline.engine.results import check_wall
from kernline.engine.sizing import _tables, candidate_grid, feasibility_maps, size_footing


def median_time(fn, repeat: int) -> tuple[float, float]:
    times = []
    for _ in range(repeat):
        t = time.perf_counter()
        fn()
        times.append(time.perf_counter() - t)
    times.sort()
    return statistics.median(times), times[int(0.95 * (len(times) - 1))]


def main() -> None:
    print(f"machine: load average {os.getloadavg()[0]:.2f} at the start")
    doc = load_project(resource_path("demo.kernline"))
    project = doc.project
    wall = project.walls[0]
    n_cases = len(check_wall(project, wall).cases)
    med, p95 = median_time(lambda: check_wall(project, wall), 3000)
    print(
        f"check one wall ({n_cases} cases), governing ratios: median {med * 1e3:.3f} ms, p95 {p95 * 1e3:.3f} ms (target < 1 ms)"
    )
    med, p95 = median_time(lambda: check_wall(project, wall).cases[0], 2000)
    print(f"check one wall with every case record built:    median {med * 1e3:.3f} ms, p95 {p95 * 1e3:.3f} ms")

    for each in project.walls:  # the design along the length: computed once per result, on first use
        med, p95 = median_time(lambda each=each: check_wall(project, each).along, 20)
        print(f"check wall {each.id} with the design along the length: median {med * 1e3:.1f} ms, p95 {p95 * 1e3:.1f} ms")
    for each in project.walls:  # sizing checks the sizes it tries along the length too
        med, p95 = median_time(lambda each=each: size_footing(project, each), 20)
        grid_widths, grid_thicknesses = candidate_grid(each)
        tables = _tables(project, each)
        grid, _ = median_time(lambda t=tables, w=grid_widths, d=grid_thicknesses: feasibility_maps(t, w, d), 20)
        print(
            f"size wall {each.id} (its own grid, the design along the length verified): median {med * 1e3:.1f} ms, "
            f"of which the grid's checks ({grid_thicknesses.size} x {grid_widths.size} sizes x "
            f"{sum(len(t.cases) for t in tables)} cases) {grid * 1e3:.1f} ms"
        )

    bounds = SizingBounds(
        width_min=12 * INCH,
        width_max=107 * INCH,
        width_step=INCH,
        thickness_min=12 * INCH,
        thickness_max=59 * INCH,
        thickness_step=INCH,
    )
    big = replace(wall, sizing=bounds)
    widths, thicknesses = candidate_grid(big)
    assert (widths.size, thicknesses.size) == (96, 48)
    checks = len(check_wall(project, wall).governing)
    med, p95 = median_time(lambda: size_footing(project, big), 60)
    print(
        f"size one wall on a {widths.size} x {thicknesses.size} grid ({n_cases} cases, {checks} checks): median {med * 1e3:.2f} ms, p95 {p95 * 1e3:.2f} ms (target < 30 ms with the strength checks)"
    )
    longer = replace(big, sizing=replace(bounds, extension_max=72 * INCH, extension_step=6 * INCH))
    steps = size_footing(project, longer).extensions.size
    med, p95 = median_time(lambda: size_footing(project, longer), 15)
    print(
        f"size one wall on a {widths.size} x {thicknesses.size} x {steps} grid (extensions): median {med * 1e3:.1f} ms, p95 {p95 * 1e3:.1f} ms (target < 150 ms)"
    )

    with tempfile.TemporaryDirectory() as tmp:
        demo = str(resource_path("demo.kernline"))
        # as this environment runs Python, and with the bytecode compiled once (as an install leaves it;
        # with PYTHONDONTWRITEBYTECODE set and no bytecode, every run compiles some forty modules)
        compiled = {k: v for k, v in os.environ.items() if k != "PYTHONDONTWRITEBYTECODE"}
        compiled["PYTHONPYCACHEPREFIX"] = str(Path(tmp) / "bytecode")
        for label, env in (("as run here", None), ("bytecode compiled", compiled)):
            runs = []
            for _ in range(11):
                t = time.perf_counter()
                subprocess.run(
                    [sys.executable, "-m", "kernline.app.cli", "check", demo], capture_output=True, check=False, env=env
                )
                runs.append(time.perf_counter() - t)
            runs = runs[1:]  # the first run writes the bytecode
            print(
                f"kernline check demo, start to exit ({label}): median {statistics.median(runs):.3f} s, "
                f"min {min(runs):.3f} s (target < 0.35 s)"
            )

        raw = json.loads(resource_path("demo.kernline").read_text(encoding="utf-8"))
        walls = []
        for i in range(1000):
            w = copy.deepcopy(raw["walls"][i % len(raw["walls"])])
            w["id"] = f"W{i:04d}"
            walls.append(w)
        raw["walls"] = walls
        parse_project(raw)  # valid
        path = Path(tmp) / "thousand.kernline"
        path.write_text(json.dumps(raw), encoding="utf-8")
        before = resource.getrusage(resource.RUSAGE_CHILDREN)
        t = time.perf_counter()
        subprocess.run([sys.executable, "-m", "kernline.app.cli", "size", str(path)], capture_output=True, check=False)
        elapsed = time.perf_counter() - t
        after = resource.getrusage(resource.RUSAGE_CHILDREN)
        print(
            f"kernline size, 1,000 walls (demo walls repeated, grids of 1,800-3,145 candidates): {elapsed:.2f} s "
            f"({elapsed:.2f} ms per wall; CPU {after.ru_utime - before.ru_utime:.2f} s user, "
            f"{after.ru_stime - before.ru_stime:.2f} s system, {(after.ru_minflt - before.ru_minflt) / 1e6:.2f} M page faults)"
        )
    print(f"machine: load average {os.getloadavg()[0]:.2f} at the end")


if __name__ == "__main__":
    main()

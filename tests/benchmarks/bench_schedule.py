"""Schedule benchmark: what the bar columns cost (a script that prints figures, not a test).

    python tests/benchmarks/bench_schedule.py [WALLS]

With a concrete section the schedule lists each footing's bars; the bottom and top bars come from
the design along the length (engine.concrete.along.design_along), which is by far the dearest part.
Prints, for the demo project with a concrete section and its walls repeated to WALLS (default 200):
the check of every wall, the design along the length per wall, the whole schedule CSV, and the
same schedule without a concrete section for comparison.
"""

from __future__ import annotations

import copy
import json
import statistics
import sys
import time

from kernline.engine.concrete.along import design_along
from kernline.engine.project_file import parse_project
from kernline.engine.resources import resource_path
from kernline.engine.results import check_project
from kernline.engine.schedule import schedule_csv

CONCRETE = {"fc": "3000 psi", "fy": "60 ksi", "cover": "3 in", "lambda": 1.0, "strength_method": "asce7-16-lrfd"}


def project_of(count: int, concrete: bool):
    raw = json.loads(resource_path("demo.kernline").read_text(encoding="utf-8"))
    raw.pop("concrete", None)  # our own concrete section below (or none), and no bars given
    for wall in raw["walls"]:
        wall["footing"].pop("reinforcement", None)
    walls = raw["walls"]
    raw["walls"] = []
    for k in range(count):
        wall = copy.deepcopy(walls[k % len(walls)])
        wall["id"] = f"W{k + 1:03d}"
        raw["walls"].append(wall)
    if concrete:
        raw["concrete"] = dict(CONCRETE)
    return parse_project(raw)


def timed(fn) -> float:
    t = time.perf_counter()
    fn()
    return time.perf_counter() - t


def main(argv: list[str]) -> None:
    count = int(argv[1]) if len(argv) > 1 else 200
    project = project_of(count, concrete=True)
    results = check_project(project)
    per_wall = []
    for r in results[: min(count, 40)]:
        per_wall.append(timed(lambda r=r: design_along(r.strength_table, r.strength_evaluation)))
    check = timed(lambda: check_project(project))
    whole = timed(lambda: schedule_csv(project, results))
    plain = project_of(count, concrete=False)
    plain_results = check_project(plain)
    without = timed(lambda: schedule_csv(plain, plain_results))
    print(f"{count} walls with a concrete section")
    print(f"  check every wall:                       {check * 1e3:8.0f} ms")
    print(
        f"  design along the length, one wall:      median {statistics.median(per_wall) * 1e3:.1f} ms, "
        f"max {max(per_wall) * 1e3:.1f} ms ({len(per_wall)} walls)"
    )
    print(f"  schedule CSV (bars included):           {whole * 1e3:8.0f} ms")
    print(f"  schedule CSV without a concrete section: {without * 1e3:7.0f} ms")


if __name__ == "__main__":
    main(sys.argv)

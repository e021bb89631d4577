"""Project files for the command-line tests: the demo project, and a large one made from it."""

from __future__ import annotations

import copy
import json
import subprocess
import sys
from pathlib import Path
from typing import Any

from kernline.engine.resources import resource_path


def run(*args: str, cwd: Path | None = None, timeout: float = 120) -> subprocess.CompletedProcess[str]:
    """``kernline ARGS`` in a new interpreter (the installed entry point's module)."""
    return subprocess.run(
        [sys.executable, "-m", "kernline.app.cli", *args], capture_output=True, text=True, timeout=timeout, cwd=cwd
    )


def demo_raw() -> dict[str, Any]:
    """The demo project's JSON document (what ``kernline demo --save`` writes)."""
    return json.loads(resource_path("demo.kernline").read_text(encoding="utf-8"))


def write_project(path: Path, raw: dict[str, Any]) -> Path:
    path.write_text(json.dumps(raw, indent=2, ensure_ascii=False) + "\n", encoding="utf-8")
    return path


def demo_project(path: Path) -> Path:
    """The demo project written to ``path``."""
    return write_project(path, demo_raw())


def many_walls(raw: dict[str, Any], count: int) -> dict[str, Any]:
    """A copy of ``raw`` with ``count`` walls: its walls repeated in turn, each copy with a new id."""
    out = copy.deepcopy(raw)
    walls = raw["walls"]
    out["walls"] = []
    for k in range(count):
        wall = copy.deepcopy(walls[k % len(walls)])
        wall["id"] = f"W{k + 1:03d}"
        out["walls"].append(wall)
    return out

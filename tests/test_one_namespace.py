"""Kernline installs as one namespace, ``kernline.engine`` and ``kernline.app``: nothing imports the
source folders as top-level packages called ``engine`` or ``app`` (two copies of a module would mean
two registries of checks)."""

from __future__ import annotations

import re
import subprocess
import sys
from pathlib import Path

ROOT = Path(__file__).resolve().parents[1]
TOP_LEVEL = re.compile(r"^\s*(from|import)\s+(engine|app)(\.|\s|$)", re.MULTILINE)


def tracked_python_files() -> list[Path]:
    try:
        out = subprocess.run(["git", "ls-files", "*.py", "*.spec"], cwd=ROOT, capture_output=True, text=True, check=True).stdout
        return [ROOT / line for line in out.splitlines() if line]
    except (OSError, subprocess.CalledProcessError):
        return [p for p in ROOT.rglob("*.py") if ".git" not in p.parts and "build" not in p.parts]


def test_no_source_imports_engine_or_app_as_top_level_packages():
    """Every import names kernline.engine or kernline.app."""
    offenders = []
    for path in tracked_python_files():
        for m in TOP_LEVEL.finditer(path.read_text(encoding="utf-8")):
            line = path.read_text(encoding="utf-8")[: m.start()].count("\n") + 1
            offenders.append(f"{path.relative_to(ROOT)}:{line}")
    assert not offenders, offenders


def test_the_command_and_the_window_load_no_top_level_engine_or_app():
    """Run from the repository's folder, where engine/ and app/ are importable by name, the command
    and the window still load only the kernline.* modules."""
    code = (
        "import os, sys; os.environ.setdefault('QT_QPA_PLATFORM', 'offscreen'); "
        "import kernline.app.cli, kernline.app.main_window, kernline.engine.report, kernline.engine.concrete; "
        "print(sorted(m for m in sys.modules if m.split('.')[0] in ('engine', 'app')))"
    )
    result = subprocess.run([sys.executable, "-c", code], cwd=ROOT, capture_output=True, text=True, timeout=120)
    assert result.returncode == 0, result.stderr[-2000:]
    assert result.stdout.strip() == "[]"


def test_the_engine_ships_type_information():
    """PEP 561: kernline.engine carries py.typed."""
    import kernline.engine

    assert (Path(kernline.engine.__file__).parent / "py.typed").is_file()


def test_the_facade_names_what_they_say():
    """Every facade name resolves to a function or class, never to a module that shadows it."""
    import inspect

    import kernline.engine as engine

    for name in engine._FACADE:
        value = getattr(engine, name)
        assert not inspect.ismodule(value), name
    assert callable(engine.warnings_for) and callable(engine.registered_checks)

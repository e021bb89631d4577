"""The engine stays pure: no Qt anywhere in engine/, reportlab only in the PDF writer."""

import ast
import subprocess
import sys
from pathlib import Path

ENGINE = Path(__file__).resolve().parents[3] / "engine"
QT = ("PySide6", "pyqtgraph", "PyQt5", "PyQt6", "shiboken6")
PDF_WRITER = "report.py"


def imported_roots(path: Path) -> set[str]:
    tree = ast.parse(path.read_text(encoding="utf-8"))
    roots = set()
    for node in ast.walk(tree):
        if isinstance(node, ast.Import):
            roots |= {alias.name.split(".")[0] for alias in node.names}
        elif isinstance(node, ast.ImportFrom) and node.module and node.level == 0:
            roots.add(node.module.split(".")[0])
    return roots


def test_engine_modules_import_no_qt_and_reportlab_only_in_the_writer():
    for path in sorted(ENGINE.glob("*.py")):
        roots = imported_roots(path)
        assert not roots & set(QT), f"{path.name} imports Qt"
        if path.name != PDF_WRITER:
            assert "reportlab" not in roots, f"{path.name} imports reportlab"


BLOCKER = """
import importlib.abc, sys
class Block(importlib.abc.MetaPathFinder):
    def find_spec(self, name, path, target=None):
        if name.split('.')[0] in {blocked!r}:
            raise ImportError('blocked for the test: ' + name)
sys.meta_path.insert(0, Block())
import pkgutil, importlib
import kernline.engine as engine
for m in pkgutil.walk_packages(engine.__path__, 'kernline.engine.'):
    importlib.import_module(m.name)
from kernline.engine.project_file import load_project
from kernline.engine.resources import resource_path
from kernline.engine.results import check_project
from kernline.engine.sizing import size_footing
doc = load_project(resource_path('demo.kernline'))
check_project(doc.project)
[size_footing(doc.project, w) for w in doc.project.walls]
print('ok')
"""


def test_engine_runs_with_qt_unavailable():
    """Every engine module imports, and check and size run, when Qt cannot be imported at all."""
    code = BLOCKER.format(blocked=set(QT))
    result = subprocess.run([sys.executable, "-c", code], capture_output=True, text=True, timeout=120)
    assert result.returncode == 0, result.stderr[-2000:]
    assert result.stdout.strip().endswith("ok")

"""Save screenshots of the window's main states for the README (a script, not a test).

    python tests/benchmarks/screenshots.py [OUT_DIR]

Writes demo.png (the demo project open), failing-wall.png (wall C3, which fails bearing),
design-map.png (C3 sized, its design map shown), si-units.png (the same in SI units) and
welcome.png (a plain start with two recent projects) to
resources/screenshots/ unless another folder is given. Runs offscreen; touches no user settings.
"""

from __future__ import annotations

import os
import sys
import tempfile
from pathlib import Path

os.environ.setdefault("QT_QPA_PLATFORM", "offscreen")

ROOT = Path(__file__).resolve().parents[2]
sys.path.insert(0, str(ROOT))

from PySide6.QtCore import QElapsedTimer, QSettings  # noqa: E402
from PySide6.QtWidgets import QApplication  # noqa: E402

SIZE = (1480, 940)


def _wait(app: QApplication, condition, timeout_ms: int = 5000) -> None:
    timer = QElapsedTimer()
    timer.start()
    while not condition():
        app.processEvents()
        if timer.elapsed() > timeout_ms:
            raise TimeoutError("the window did not reach the expected state")


def main(argv: list[str]) -> int:
    out = Path(argv[1]) if len(argv) > 1 else ROOT / "resources" / "screenshots"
    out.mkdir(parents=True, exist_ok=True)
    app = QApplication.instance() or QApplication(sys.argv[:1])
    from kernline.app.main_window import MainWindow

    with tempfile.TemporaryDirectory() as tmp:
        settings = QSettings(str(Path(tmp) / "settings.ini"), QSettings.Format.IniFormat)
        window = MainWindow(settings=settings, recovery_dir=Path(tmp) / "recovery")
        window.resize(*SIZE)
        window.start(None, demo=True)
        window.show()
        app.processEvents()
        doc = window.document
        shots = []

        def shot(name: str) -> None:
            app.processEvents()
            path = out / name
            window.grab().save(str(path))
            shots.append(path)

        shot("demo.png")
        ids = [w.id for w in doc.project.walls]
        doc.set_current_index(ids.index("C3"))
        shot("failing-wall.png")
        window.size_current()
        _wait(app, lambda: not window.runner.busy())
        window.design_map.readout.setText(
            window.design_map.cell_text(
                *window.design_map.cell_at(doc.current_wall.footing.width / 0.0254, doc.current_wall.footing.thickness / 0.0254)
            )
        )
        shot("design-map.png")
        window.set_units("SI")
        _wait(app, lambda: not window.runner.busy())
        window.tabs.setCurrentWidget(window.cases_table)
        shot("si-units.png")
        doc.undo_stack.clear()
        window.close()

        # the welcome panel of a plain start, with two recent projects (copies of the demo)
        from kernline.engine.resources import resource_path

        recent = []
        for name in ("clinic.kernline", "warehouse-annex.kernline"):
            copy = Path(tmp) / "Projects" / name
            copy.parent.mkdir(exist_ok=True)
            copy.write_text(resource_path("demo.kernline").read_text(encoding="utf-8"), encoding="utf-8")
            recent.insert(0, str(copy))
        settings.setValue("recent_files", recent)
        welcome = MainWindow(settings=settings, recovery_dir=Path(tmp) / "recovery")
        welcome.resize(*SIZE)
        welcome.start(None, demo=False)
        welcome.show()
        app.processEvents()
        path = out / "welcome.png"
        welcome.grab().save(str(path))
        shots.append(path)
        welcome.close()
    for path in shots:
        print(path)
    return 0


if __name__ == "__main__":
    sys.exit(main(sys.argv))

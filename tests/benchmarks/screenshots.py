"""Save screenshots of the window's main states for the README (a script, not a test).

    python tests/benchmarks/screenshots.py [OUT_DIR] [--size WxH ...]

Writes demo.png (the demo project open), failing-wall.png (wall C3, which fails bearing),
design-map.png (C3 sized, its design map shown), si-units.png (the same in SI units) and
welcome.png (a plain start with two recent projects) to
resources/screenshots/ unless another folder is given, at the window's own size (1480 x 940).

``--size 1280x800`` (repeatable) takes the same shots at that size too, named with the size:
demo-1280x800.png, failing-wall-1280x800.png, design-map-1280x800.png, si-units-1280x800.png and
welcome-1280x800.png. ``--all`` takes the window's size, 1280 x 800 and 1920 x 1080.
Runs offscreen; touches no user settings.
"""

from __future__ import annotations

import argparse
import os
import sys
import tempfile
from pathlib import Path

os.environ.setdefault("QT_QPA_PLATFORM", "offscreen")

ROOT = Path(__file__).resolve().parents[2]
sys.path.insert(0, str(ROOT))

from PySide6.QtCore import QElapsedTimer, QSettings  # noqa: E402
from PySide6.QtWidgets import QApplication  # noqa: E402

SIZE = (1480, 940)  # the window's own first size: the shots keep their plain names
SIZES = ((1480, 940), (1280, 800), (1920, 1080))  # --all: the smallest laptop screen and a full HD monitor


def _wait(app: QApplication, condition, timeout_ms: int = 5000) -> None:
    timer = QElapsedTimer()
    timer.start()
    while not condition():
        app.processEvents()
        if timer.elapsed() > timeout_ms:
            raise TimeoutError("the window did not reach the expected state")


def _size(text: str) -> tuple[int, int]:
    width, _, height = text.lower().partition("x")
    return int(width), int(height)


def main(argv: list[str]) -> int:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("out", nargs="?", type=Path, default=ROOT / "resources" / "screenshots")
    parser.add_argument("--size", type=_size, action="append", default=[], help="another window size, WxH")
    parser.add_argument("--all", action="store_true", help=f"every size of {SIZES}")
    args = parser.parse_args(argv[1:])
    sizes = list(SIZES) if args.all else [SIZE, *args.size]
    out: Path = args.out
    out.mkdir(parents=True, exist_ok=True)
    app = QApplication.instance() or QApplication(sys.argv[:1])
    shots: list[Path] = []
    for size in dict.fromkeys(sizes):
        shots += take(app, out, size)
    for path in shots:
        print(path)
    return 0


def take(app: QApplication, out: Path, size: tuple[int, int]) -> list[Path]:
    """Every shot at one window size; the window's own size keeps the plain names."""
    from kernline.app.main_window import MainWindow

    ending = "" if size == SIZE else f"-{size[0]}x{size[1]}"
    shots: list[Path] = []

    with tempfile.TemporaryDirectory() as tmp:
        settings = QSettings(str(Path(tmp) / "settings.ini"), QSettings.Format.IniFormat)
        window = MainWindow(settings=settings, recovery_dir=Path(tmp) / "recovery")
        window.resize(*size)
        window.start(None, demo=True)
        window.show()
        _wait(app, lambda: window.size().toTuple() == size)
        app.processEvents()
        doc = window.document

        def shot(name: str) -> None:
            # the design along the length is worked out once typing has paused (150 ms): let it finish,
            # so the verdict shows it rather than "follows"
            settle = QElapsedTimer()
            settle.start()
            while settle.elapsed() < 600:
                app.processEvents()
            path = out / name.replace(".png", f"{ending}.png")
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
        welcome.resize(*size)
        welcome.start(None, demo=False)
        welcome.show()
        _wait(app, lambda: welcome.size().toTuple() == size)
        app.processEvents()
        path = out / f"welcome{ending}.png"
        welcome.grab().save(str(path))
        shots.append(path)
        welcome.close()
    return shots


if __name__ == "__main__":
    sys.exit(main(sys.argv))

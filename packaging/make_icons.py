"""Render resources/icons/kernline.svg to PNG icons of 16-256 px (and a Windows .ico).

    QT_QPA_PLATFORM=offscreen python packaging/make_icons.py

Uses Qt's SVG renderer, so it needs only the packages Kernline already depends on.
"""

from __future__ import annotations

import os
import sys
from pathlib import Path

os.environ.setdefault("QT_QPA_PLATFORM", "offscreen")

from PySide6.QtCore import QSize, Qt  # noqa: E402
from PySide6.QtGui import QGuiApplication, QImage, QPainter  # noqa: E402
from PySide6.QtSvg import QSvgRenderer  # noqa: E402

SIZES = (16, 24, 32, 48, 64, 128, 256)
ICONS = Path(__file__).resolve().parent.parent / "resources" / "icons"


def render(renderer: QSvgRenderer, size: int) -> QImage:
    image = QImage(QSize(size, size), QImage.Format.Format_ARGB32)
    image.fill(Qt.GlobalColor.transparent)
    painter = QPainter(image)
    painter.setRenderHint(QPainter.RenderHint.Antialiasing)
    renderer.render(painter)
    painter.end()
    return image


def main() -> int:
    _app = QGuiApplication.instance() or QGuiApplication(sys.argv[:1])
    renderer = QSvgRenderer(str(ICONS / "kernline.svg"))
    if not renderer.isValid():
        print("kernline.svg could not be read", file=sys.stderr)
        return 1
    for size in SIZES:
        path = ICONS / f"kernline-{size}.png"
        if not render(renderer, size).save(str(path)):
            print(f"could not write {path}", file=sys.stderr)
            return 1
        print(f"wrote {path.relative_to(ICONS.parent.parent)}")
    ico = ICONS / "kernline.ico"
    if render(renderer, 256).save(str(ico), "ICO"):
        print(f"wrote {ico.relative_to(ICONS.parent.parent)}")
    return 0


if __name__ == "__main__":
    sys.exit(main())

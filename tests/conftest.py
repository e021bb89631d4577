"""Suite-wide setup: Qt runs offscreen (no display needed) for every test that imports it.

Set before any Qt import, so that a QApplication created by pytest-qt (or by a test) never looks for
a display; without it a headless run aborts with no report. A platform named in the environment is
kept, so ``QT_QPA_PLATFORM=xcb xvfb-run -a python3 -m pytest tests/app`` runs the window tests on a
real X server.
"""

import os

os.environ.setdefault("QT_QPA_PLATFORM", "offscreen")

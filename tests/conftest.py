"""Suite-wide setup: Qt runs offscreen (no display needed) for every test that imports it.

Set before any Qt import, so that a QApplication created by pytest-qt (or by a test) never looks for
a display; without it a headless run aborts with no report.
"""

import os

os.environ["QT_QPA_PLATFORM"] = "offscreen"

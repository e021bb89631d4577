"""The "Look again" title (the input warnings' heading) and its "nothing" line fit their column at every
window size the window is designed for: the text's width, as its font measures it, is within the label's
rectangle, in the narrow column under the walls list (1280 x 800) as beside the verdict (1480 x 940,
1920 x 1080). The whole sentence stays in the tooltip.

Basis: issue 13 (the title was cut in the narrow column); Qt's QFontMetrics.horizontalAdvance.
"""

from __future__ import annotations

import pytest

SIZES = [(1280, 800), (1480, 940), (1920, 1080)]


def _fits(label) -> bool:
    return label.fontMetrics().horizontalAdvance(label.text()) <= label.contentsRect().width()


@pytest.mark.parametrize("size", SIZES)
def test_the_warnings_title_fits_its_column(qtbot, window, size):
    window.resize(*size)
    qtbot.waitUntil(lambda: window.size().toTuple() == size, timeout=2000)
    qtbot.wait(20)
    title = window.warnings_view.title
    assert window.warnings_view.isVisible() and window.warnings_view.list.count() > 0  # the demo has warnings
    assert title.text().startswith(f"Look again ({window.warnings_view.list.count()})")
    assert _fits(title), (title.text(), title.contentsRect().width())
    assert "click one to go to its field" in title.toolTip()
    if size == (1280, 800):  # the narrow column under the walls list
        assert not window.warnings_beside_verdict


@pytest.mark.parametrize("size", SIZES)
def test_the_nothing_line_fits_when_there_are_no_warnings(qtbot, window, size):
    doc = window.document
    window.new_project()  # a fresh project: no input to warn about
    qtbot.waitUntil(lambda: not doc.warnings(), timeout=2000)
    window.resize(*size)
    qtbot.waitUntil(lambda: window.size().toTuple() == size, timeout=2000)
    qtbot.wait(20)
    line = window.no_warnings
    assert line.isVisible() and line.text().startswith("Look again")
    assert _fits(line), (line.text(), line.contentsRect().width())

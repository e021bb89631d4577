"""A project with a concrete section: the verdict lists the footing's strength checks too, each row
readable (no row drawn over another) at the smallest supported window size."""

from __future__ import annotations

import json

from PySide6.QtCore import QRect
from window_helpers import demo_raw


def test_concrete_checks_have_rows_of_their_own(make_window, tmp_path, qtbot):
    raw = demo_raw()
    raw["concrete"] = {"fc": "3000 psi"}
    path = tmp_path / "concrete.kernline"
    path.write_text(json.dumps(raw, indent=2), encoding="utf-8")
    window = make_window(str(path))
    window.resize(1280, 800)
    qtbot.waitUntil(lambda: window.height() <= 800)
    from PySide6.QtWidgets import QApplication

    for _ in range(5):
        QApplication.processEvents()
    texts = window.verdict.texts()
    assert list(texts)[-2:] == ["flexure", "one_way_shear"]
    names = [row[0] for row in window.verdict.rows.values()]
    rects = [QRect(n.mapTo(window, n.rect().topLeft()), n.size()) for n in names]
    for i, a in enumerate(rects):
        assert a.height() >= names[i].fontMetrics().height() - 1, names[i].text()
        for b in rects[i + 1 :]:
            assert not a.intersects(b), (a, b)


def test_the_bars_along_the_length_take_their_metric_names_in_si(qtbot, window):
    """The verdict's "Along L_f" line names the bars as the form does: "3 #5" in US, "3 No. 16" in SI
    (ASTM A615M soft-metric names of the same bars)."""
    from window_helpers import select_wall

    select_wall(window, "C3")
    qtbot.waitUntil(lambda: "Along L_f" in window.verdict.hint.text(), timeout=10_000)
    assert "3 #5" in window.verdict.hint.text()
    window.set_units("SI")
    qtbot.waitUntil(lambda: "3 No. 16" in window.verdict.hint.text(), timeout=10_000)
    assert "#" not in window.verdict.hint.text().split("—")[0]

"""The verdict in our own idiom: each check as its demand against its capacity with the margin left,
every number the engine's (engine.summary words over the check records), the strength checks with
their combination and bars, no ratio bar; readable at 1280 x 800."""

from __future__ import annotations

import json

import pytest
from kernline.engine.summary import case_text, comparison_text, margin_text, state_words
from PySide6.QtCore import QRect
from PySide6.QtWidgets import QApplication, QLabel
from window_helpers import demo_raw, field, select_wall, type_into

CONCRETE = {"fc": "3000 psi", "fy": "60 ksi", "cover": "3 in", "lambda": 1.0, "strength_method": "asce7-16-lrfd"}


def concrete_window(make_window, tmp_path, bars: dict | None = None):
    """The demo with our own concrete section; no bars given except ``bars`` on N1."""
    raw = demo_raw()
    raw["concrete"] = dict(CONCRETE)
    for wall in raw["walls"]:
        wall["footing"].pop("reinforcement", None)
    if bars is not None:
        next(w for w in raw["walls"] if w["id"] == "N1")["footing"]["reinforcement"] = bars
    path = tmp_path / "concrete.kernline"
    path.write_text(json.dumps(raw, indent=2), encoding="utf-8")
    return make_window(str(path))


def test_each_row_is_the_engines_demand_capacity_and_margin(window):
    """Every wall of the demo: the statement, the margin and the case of each check are the engine's."""
    doc = window.document
    for wall in doc.project.walls:
        select_wall(window, wall.id)
        result = doc.results[wall.id]
        shown = window.verdict.texts()
        for check, g in result.governing.items():
            statement, verdict, case = shown[check.id]
            assert statement == comparison_text(g, result, doc.units)
            if not state_words(g, result):
                assert verdict.endswith(margin_text(g.ratio, g.required, g.passes))
                assert verdict.startswith("✓" if g.passes else "✗")
            if check.id != "embedment":
                assert case_text(g) in case


def test_bearing_reads_pressure_of_allowable_in_the_projects_units(qtbot, window):
    """C3's bearing: "<q> of 2,000 psf allowable" in US, kPa after the switch to SI."""
    select_wall(window, "C3")
    statement = window.verdict.texts()["bearing"][0]
    assert statement.endswith(" of 2,000 psf allowable")
    window.si_action.trigger()
    assert window.verdict.texts()["bearing"][0].endswith(" of 95.8 kPa allowable")  # 2000 psf = 95.76 kPa


def test_no_ratio_bar_and_every_row_is_words(window):
    """Each row is four labels (name, statement, verdict, case): no drawn bar with a tick at 1.0."""
    for row in window.verdict.rows.values():
        assert len(row) == 4 and all(isinstance(w, QLabel) for w in row)
    assert not hasattr(__import__("kernline.app.views.verdict", fromlist=["x"]), "RatioBar")


def test_a_failing_check_says_how_short(qtbot, window):
    """Frost depth 36 in: the footing's bottom at 24 in is 1 - 24/36 = 33% short of it (derived)."""
    type_into(qtbot, field(window, "site", "frost_depth"), "36")
    statement, verdict, rule = window.verdict.texts()["embedment"]
    assert statement == "depth 2'-0\", 3'-0\" required"
    assert verdict == "✗ 33% short"
    assert rule == "below frost (IBC 2021 1809.5)"


def test_strength_rows_name_their_combination_and_bars(qtbot, make_window, tmp_path):
    """Designed bars are named "(designed)", bars given "(entered)"; the strength combination follows."""
    window = concrete_window(make_window, tmp_path, bars={"transverse": "#5 @ 12 in"})
    doc = window.document
    for wall_id, source in (("N1", "(entered)"), ("C3", "(designed)")):
        select_wall(window, wall_id)
        result = doc.results[wall_id]
        flexure = next(g for c, g in result.governing.items() if c.id == "flexure")
        case = window.verdict.texts()["flexure"][2]
        assert case.startswith(f"{flexure.record.bars} {source}")
        assert case.endswith(case_text(flexure)) and case_text(flexure)  # a strength combination, by name
        shear = next(g for c, g in result.governing.items() if c.id == "one_way_shear")
        shown = window.verdict.texts()["one_way_shear"][2]
        # the same bars on the shear row where it has demand; a row with none names nothing
        assert shown.startswith(f"{flexure.record.bars} {source}") if not state_words(shear, result) else shown == ""
    # the design along the length follows a moment after the render, then the hint gives its bars
    qtbot.waitUntil(lambda: "Along L_f:" in window.verdict.hint.text(), timeout=5000)
    along = doc.results["C3"].along[0]
    assert f"bottom {along.bottom.bars}" in window.verdict.hint.text() and "(designed)" in window.verdict.hint.text()
    assert "follows" not in window.verdict.headline.text()


def test_rows_stay_readable_at_1280_by_800(qtbot, make_window, tmp_path):
    """Every row's name, statement and verdict are on screen, not drawn over each other, and the
    verdict column shows its whole text."""
    window = concrete_window(make_window, tmp_path)
    window.resize(1280, 800)
    qtbot.waitUntil(lambda: window.height() <= 810)
    for _ in range(5):
        QApplication.processEvents()
    rects = []
    for name, statement, verdict, case in window.verdict.rows.values():
        for label in (name, statement, verdict, case):
            assert label.isVisible() and label.width() >= 40, label.objectName()
        assert verdict.width() >= verdict.fontMetrics().horizontalAdvance(verdict.text())
        assert name.width() >= name.fontMetrics().horizontalAdvance(name.text())
        rects.append(QRect(name.mapTo(window, name.rect().topLeft()), name.size()))
    for i, a in enumerate(rects):
        for b in rects[i + 1 :]:
            assert not a.intersects(b), (a, b)


@pytest.mark.parametrize("size", [(1280, 800), (1480, 940), (1920, 1080)])
def test_the_stability_statements_are_whole_at_every_size(qtbot, window, size):
    """Demand against capacity of overturning, sliding and bearing is read whole (the case beside it gives way
    and keeps its words in the tooltip)."""
    window.resize(*size)
    qtbot.waitUntil(lambda: window.size().toTuple() == size, timeout=2000)
    qtbot.wait(20)
    for check, (_name, statement, _mark, _case) in window.verdict.rows.items():
        if check.id in ("overturning", "sliding", "bearing"):
            assert statement.fontMetrics().horizontalAdvance(statement.text()) <= statement.width(), (check.id, size)

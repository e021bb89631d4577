"""The window shows whatever checks the registry holds: a check registered for the test (a geometric
one, "Clearance", failing everywhere) appears in the verdict, the walls list and the design map's
legend without any change to the window; and the window's words name the footing so that no symbol
reads as a load case (t_f not D, L_f not L, W_f not W; "Soil cover", never plain "cover").
"""

from __future__ import annotations

import re
from dataclasses import dataclass
from typing import Any

import kernline.engine.registry as registry
import numpy as np
import pytest
from kernline.engine.registry import Check, CheckArrays, Family, register_check
from kernline.engine.stability import _case_layout, reported_checks
from PySide6.QtWidgets import QAbstractButton, QLabel
from window_helpers import field

CLEARANCE_RATIO = 0.5  # below 1.0: the test check fails at every size


@dataclass(frozen=True, slots=True)
class _Record:
    ratio: float
    required: float
    passes: bool


@dataclass(frozen=True, eq=False, repr=False)
class _Clearance(Check):
    """A geometric check of the test's own: the same ratio at every candidate size."""

    def evaluate(self, state: Any) -> CheckArrays:
        return CheckArrays(ratio=np.full(state.grid_shape, CLEARANCE_RATIO), parts={})

    def record(self, state: Any, arrays: CheckArrays, index: int, required: float) -> _Record:
        ratio = float(np.asarray(arrays.ratio).flat[0])
        return _Record(ratio=ratio, required=required, passes=ratio >= required)

    def record_json(self, record: Any) -> dict[str, Any]:
        return {}


def _forget(check: Check) -> None:
    registry._CHECKS.remove(check)
    registry._CHECK_ORDER.clear()
    registry._CHECK_ORDER.update((c.id, i) for i, c in enumerate(registry._CHECKS))


@pytest.fixture
def clearance():
    """Register the test check (the case layout is cached per check list: cleared before and after)."""
    check = register_check(
        _Clearance(
            id="test-clearance",
            title="Clearance",
            symbol="CL",
            family=Family.GEOMETRY,
            ratio_words="a test ratio",
            basis="this test",
            order=35,
        )
    )
    _case_layout.cache_clear()
    try:
        yield check
    finally:
        _forget(check)
        _case_layout.cache_clear()


def test_a_registered_check_shows_in_the_verdict_walls_and_map(qtbot, clearance, make_window):
    window = make_window()
    texts = window.verdict.texts()
    assert list(texts) == [
        c.id for c in reported_checks(window.document.project)
    ]  # the registry's order: clearance after bearing
    assert list(texts).index("test-clearance") == list(texts).index("bearing") + 1
    assert texts["test-clearance"] == ("ratio 0.50 of 1.00 required", "✗ 50% short", "")
    names = [row[0].text() for row in window.verdict.rows.values()]
    assert "Clearance" in names and "Embedment" in names
    assert "clearance below the required ratio" in window.verdict.headline.text()
    item = window.walls_view.tree.topLevelItem(0)
    assert item.text(2) == "✗ 50% short" and "clearance" in item.toolTip(2)
    window.size_current()
    dm = window.design_map
    qtbot.waitUntil(lambda: dm.entry is not None and dm.fresh, timeout=20000)
    assert "clearance" in dm.legend_checks() and "clearance" in dm.legend.text()
    assert len(dm.boundaries) == len(dm.entry.result.checks)
    assert "test-clearance" in [c.id for c in dm.entry.result.checks]
    assert not dm.entry.result.feasible


def test_the_registry_is_as_it_was_after_the_test_check(window):
    """The fixture removes its check: the window of a later test shows the registered checks only."""
    assert "test-clearance" not in window.verdict.texts()
    assert list(window.verdict.texts()) == [c.id for c in reported_checks(window.document.project)]


# ---- names a reader cannot misread ---------------------------------------------------------------------

# A footing dimension written with a load-case letter: "Thickness D", "B × D", "x D", "D =", "L =", "W =".
# Case-sensitive for "D =": "d = t_f - cover - d_b/2" is the effective depth, not the dead load.
MISREAD = re.compile(r"((?i:thickness D\b)|[×x] D\b|\bD =|\bL =|\bW =|(?i:footing L\b)|(?i:footing D\b))")


def _shown_words(window) -> list[str]:
    words = [w.text() for w in window.findChildren(QLabel)] + [w.text() for w in window.findChildren(QAbstractButton)]
    words += [w.toolTip() for w in window.findChildren(QLabel)]
    for group in (window.wall_form.group, window.project_form.group):
        words += [f.spec.label for f in group.fields] + [f.spec.tip for f in group.fields]
    tree = window.walls_view.tree
    words += [tree.headerItem().text(c) for c in range(tree.columnCount())]
    item = window.design_map.plot.getPlotItem()
    words += [item.getAxis("left").labelText, item.getAxis("bottom").labelText]
    return [w for w in words if w]


def test_the_footing_is_named_t_f_l_f_and_w_f(qtbot, window):
    assert window.wall_form.group.labels[id(field(window, "footing", "thickness"))].text() == "Footing thickness t_f (in)"
    assert window.walls_view.tree.headerItem().text(1) == "B × t_f"
    window.tabs.setCurrentWidget(window.design_map)
    assert "t_f" in window.design_map.plot.getPlotItem().getAxis("left").labelText
    caption = window.drawings.elevation_caption.text()
    assert "L_f " in caption and "t_f " in caption and "W_f " in caption and "soil cover" in caption
    misread = [w for w in _shown_words(window) if MISREAD.search(w)]
    assert misread == []


def test_cover_is_always_soil_cover(window):
    """ "Cover" alone is ambiguous: the soil over the footing, or the concrete over its bars; every
    label and tip says which."""

    def qualified(w: str) -> bool:
        low = w.lower()
        return any(k in low for k in ("soil cover", "concrete cover", "cover to the", "bars", "cover sheet"))

    plain = [w for w in _shown_words(window) if re.search(r"\bcover\b", w, re.IGNORECASE) and not qualified(w)]
    assert plain == []

"""The concrete page of the drawings: the footing's section with its bars to scale, the numbers across
the width, and the shear and moment along the length on the elevation's x axis, all the engine's.

Sources: bar diameters from ASTM A615/A615M Table 1 (#4 = 0.500 in, #5 = 0.625 in); the bars of a face
spaced evenly between the side covers (common practice, :mod:`engine.concrete.view_data`).
"""

from __future__ import annotations

import pytest
from kernline.app import commands
from kernline.engine.concrete.along import design_along
from PySide6.QtCore import QPointF
from window_helpers import INCH, select_wall

KIP_FT = 4448.2216152605 * 0.3048  # N·m per kip·ft (NIST SP 811)
KIP = 4448.2216152605  # N per kip


def _concrete(qtbot, window, wall_id: str):
    window.resize(1480, 940)
    select_wall(window, wall_id)
    window.drawings.show_page(1)
    qtbot.waitUntil(lambda: window.drawings.concrete.isVisible())
    view = window.drawings.concrete
    qtbot.waitUntil(lambda: view.data is not None and not view.stale)
    return view


def test_transverse_bar_is_drawn_to_its_diameter(qtbot, window):
    """K5 carries #5 @ 12 in across: the bar is 0.625 in deep, B - 2 cover long, its centre cover + db/2 up."""
    view = _concrete(qtbot, window, "K5")
    wall = window.document.current_wall
    rect = view.section.transverse.rect()  # inches
    assert view.section.transverse.isVisible()
    assert rect.height() == pytest.approx(0.625, rel=1e-9)
    assert rect.width() == pytest.approx(wall.footing.width / INCH - 2 * 3.0, rel=1e-9)
    assert rect.center().y() == pytest.approx(3.0 + 0.625 / 2, rel=1e-9)
    assert "#5 @ 12 in" in view.numbers.text()


def test_longitudinal_bars_are_dots_of_their_diameter_evenly_spaced(qtbot, window):
    """C3 carries 3 #5 bottom and 2 #5 top: five dots 0.625 in across, the bottom ones (B - 2c - db)/2 apart."""
    view = _concrete(qtbot, window, "C3")
    width = window.document.current_wall.footing.width / INCH
    dots = view.section.dot_rects()
    assert len(dots) == 5
    for dot in dots:
        assert dot.width() == pytest.approx(0.625, rel=1e-9)
        assert dot.height() == pytest.approx(0.625, rel=1e-9)
    bottom = sorted((d for d in dots if d.center().y() < 6.0), key=lambda d: d.center().x())
    assert len(bottom) == 3
    pitch = (width - 2 * 3.0 - 0.625) / 2
    assert bottom[1].center().x() - bottom[0].center().x() == pytest.approx(pitch, rel=1e-9)
    assert bottom[0].center().x() == pytest.approx(3.0 + 0.625 / 2, rel=1e-9)
    # no transverse layer under them (plain across the width): they sit at cover + db/2
    assert bottom[0].center().y() == pytest.approx(3.0 + 0.625 / 2, rel=1e-9)


def test_diagrams_share_the_elevations_x_axis(qtbot, window):
    """Both diagrams are x-linked to the elevation: the same x range, also after the range moves."""
    view = _concrete(qtbot, window, "N1")
    elevation_box = window.drawings.elevation.getPlotItem().getViewBox()
    for plot in (view.shear_plot, view.moment_plot):
        box = plot.getPlotItem().getViewBox()
        assert box.linkedView(0) is elevation_box
        assert box.viewRange()[0] == pytest.approx(elevation_box.viewRange()[0], rel=1e-9)


def test_diagram_extremes_are_the_engines(qtbot, window):
    """C3: the marked +M and the labelled |V| max are design_along's, in kip·ft and kip."""
    view = _concrete(qtbot, window, "C3")
    result = window.document.current_result
    _design, _index, diagram = design_along(result.strength_table, result.strength_evaluation)
    xs, ys = view.moment_plot.marks.getData()
    assert max(ys) == pytest.approx(diagram.max_moment / KIP_FT, rel=1e-9)
    assert xs[list(ys).index(max(ys))] == pytest.approx(diagram.max_moment_at / 0.3048, rel=1e-9)
    _sx, sy = view.shear_plot.marks.getData()
    assert max(abs(v) for v in sy) == pytest.approx(diagram.max_shear / KIP, rel=1e-9)
    assert "bottom 3 #5" in view.along_caption.text()


def test_view_follows_a_thickness_edit(qtbot, window):
    """Footing thickness 12 in -> 18 in through the edit command: the section and design are redrawn."""
    view = _concrete(qtbot, window, "K5")
    doc = window.document
    made = view.designs_made
    assert doc.push(commands.SetField(doc, doc.wall_path("footing", "thickness"), "18 in")) is None
    qtbot.waitUntil(lambda: view.data is not None and abs(view.data.thickness - 18 * INCH) < 1e-9)
    assert view.section.footing.rect().height() == pytest.approx(18.0, rel=1e-9)
    assert view.designs_made == made + 1
    result = doc.current_result
    _design, _index, diagram = design_along(result.strength_table, result.strength_evaluation)
    assert max(view.moment_plot.marks.getData()[1]) == pytest.approx(diagram.max_moment / KIP_FT, rel=1e-9)


def test_hidden_view_makes_no_design(qtbot, window):
    """On the soil pressure page an edit costs no design along the length; showing the page catches up."""
    view = _concrete(qtbot, window, "K5")
    window.drawings.show_page(0)
    made = view.designs_made
    doc = window.document
    doc.push(commands.SetField(doc, doc.wall_path("footing", "thickness"), "16 in"))
    assert view.designs_made == made and view.stale
    window.drawings.show_page(1)
    qtbot.waitUntil(lambda: not view.stale)
    assert view.designs_made == made + 1


def test_plain_footing_says_plain(qtbot, window):
    """N1 is plain across the width: no transverse bar drawn and the numbers say plain."""
    view = _concrete(qtbot, window, "N1")
    assert not view.section.transverse.isVisible()
    assert "plain concrete" in view.numbers.text()


def test_without_a_concrete_section_the_view_says_how_to_enable_it(qtbot, window):
    """The concrete section removed: one line on how to enable the design, no plots."""
    view = _concrete(qtbot, window, "N1")
    doc = window.document
    assert doc.push(commands.SetField(doc, ("concrete",), commands.DELETE)) is None
    qtbot.waitUntil(lambda: not view.enabled)
    assert view.notice.isVisible()
    assert "Concrete design" in view.notice.text() and "tick" in view.notice.text()
    assert not view.shear_plot.isVisible() and not view.section.isVisible()


def test_concrete_labels_stay_apart(qtbot, window):
    """The diagram labels of every demo wall lie inside their plots and apart (1480 x 940)."""
    for wall_id in ("N1", "S2", "C3", "E4", "K5"):
        view = _concrete(qtbot, window, wall_id)
        for plot in (view.shear_plot, view.moment_plot):
            box = plot.getPlotItem().getViewBox()
            bounds = box.sceneBoundingRect().adjusted(-1, -1, 1, 1)
            rects = plot.label_rects
            for rect in rects:
                assert bounds.contains(rect)
            for i, a in enumerate(rects):
                for b in rects[i + 1 :]:
                    common = a.intersected(b)
                    assert common.width() <= 1.0 or common.height() <= 1.0
        assert QPointF  # the section's labels are placed by the same placer

"""The user guide: shown in the Help window with working links, opened by F1 at the focused input's
section, its keyboard shortcuts the same as the window's, and installed with the program.

Basis: issue 13 (Help had only About and F1 opened it). The guide is our own text, docs/guide.md.
"""

from __future__ import annotations

import re
import tomllib
from pathlib import Path

import pytest
from kernline.app.views.help import (
    FIELD_TOPICS,
    PANE_TOPICS,
    TOP,
    HelpWindow,
    anchor_for,
    guide_path,
    guide_text,
    headings,
    section,
    slug,
)
from PySide6.QtCore import Qt, QUrl
from PySide6.QtGui import QKeySequence
from PySide6.QtWidgets import QMenu
from window_helpers import field, select_wall

ROOT = Path(__file__).resolve().parents[2]


def anchors() -> set[str]:
    return {a for _level, _text, a in headings(guide_text())}


def test_the_guide_is_the_repositorys_docs_guide():
    assert guide_path().resolve() == (ROOT / "docs" / "guide.md").resolve()


def test_every_internal_link_of_the_guide_leads_to_a_heading():
    links = re.findall(r"\]\(#([^)]+)\)", guide_text())
    assert links, "the guide links its sections"
    missing = sorted(set(links) - anchors())
    assert not missing


def test_headings_are_unique():
    found = [a for _l, _t, a in headings(guide_text())]
    assert len(found) == len(set(found))


def test_the_guide_follows_a_whole_job():
    """A new project, walls and loads, sizing with the map, the concrete design (section, construction,
    bars entered / plain / designed), the package, saving and recovery, and the keys."""
    need = {
        "a-new-project",
        "walls-and-loads",
        "loads",
        "sizing-with-the-design-map",
        "adopting-sizes",
        "the-concrete-section",
        "wall-construction",
        "footing-reinforcement",
        "the-calculation-package",
        "saving-and-recovery",
        "unsaved-work-after-a-crash",
        "keyboard-shortcuts",
    }
    assert need <= anchors()
    bars = section(guide_text(), "footing-reinforcement").lower()
    for form in ("designed by kernline", "plain concrete", "bars as entered"):
        assert form in bars


def test_every_topic_names_a_section_of_the_guide():
    have = anchors()
    assert TOP in have and "contents" in have
    assert {t for _p, t in FIELD_TOPICS} <= have
    assert {t for _p, t in PANE_TOPICS} <= have


def test_field_paths_map_to_their_sections():
    assert anchor_for("walls[0].footing.width") == "the-footing"
    assert anchor_for("walls[3].footing.reinforcement.bottom") == "footing-reinforcement"
    assert anchor_for("walls[1].loads[4]") == "loads"
    assert anchor_for("walls[0].stem.height") == "stem-wall"
    assert anchor_for("soil.friction") == "soil"
    assert anchor_for("soil.presumptive_class") == "presumptive-soil-classes"
    assert anchor_for("criteria.required.sliding") == "required-ratios"
    assert anchor_for("concrete.fc") == "the-concrete-section"
    assert anchor_for("project.name") == "project-information"
    assert anchor_for("no.such.field") == TOP
    assert slug("Look again: warnings") == "look-again-warnings"


def test_every_input_of_the_forms_has_a_section(window):
    """Each field and choice box the forms show maps to a section of its own (not the guide's top)."""
    paths = []
    for form, prefix in ((window.wall_form, "walls[0]."), (window.project_form, "")):
        paths += [prefix + ".".join(f.spec.path) for f in form.group.fields]
        paths += [prefix + ".".join(key) for key in getattr(form, "choices", {})]
    assert len(paths) > 20
    lost = [p for p in paths if anchor_for(p) == TOP]
    assert not lost


def _press_f1(qtbot, window, widget):
    window.activateWindow()
    widget.setFocus()
    qtbot.waitUntil(lambda: widget.hasFocus() or window.focusWidget() is widget, timeout=2000)
    qtbot.keyClick(widget, Qt.Key.Key_F1)
    help_window = window.help_window
    assert help_window is not None and help_window.isVisible()
    return help_window


@pytest.mark.parametrize(
    ("engine_path", "anchor"),
    [
        ("walls[1].footing.width", "the-footing"),
        ("soil.friction", "soil"),
        ("walls[1].length", "the-wall"),
    ],
)
def test_f1_opens_the_guide_at_the_focused_fields_section(qtbot, window, engine_path, anchor):
    select_wall(window, "S2")
    assert window.show_field(engine_path)
    path = engine_path.removeprefix("walls[1].").split(".")
    f = field(window, *path)
    help_window = _press_f1(qtbot, window, f.edit)
    qtbot.addWidget(help_window)
    assert window.focused_field(f.edit) == engine_path
    assert help_window.current == anchor
    assert help_window.where.text() == next(t for _l, t, a in headings(guide_text()) if a == anchor)
    # the browser scrolled to the section: its heading is the first line in view (or the view is at its end)
    bar = help_window.browser.verticalScrollBar()
    top_block = help_window.browser.cursorForPosition(help_window.browser.viewport().rect().topLeft()).block()
    assert slug(top_block.text()) == anchor or bar.value() == bar.maximum()


def test_f1_on_the_loads_table_and_a_choice_box(qtbot, window):
    assert window.help_topic(window.wall_form.loads.table.viewport()) == "loads"
    box = next(iter(window.project_form.choices.values())).box
    assert window.help_topic(box) != "contents"
    assert window.help_topic(window.design_map.size_button) == "sizing-with-the-design-map"
    assert window.help_topic(window.walls_view) == "the-walls-list"


def test_links_in_the_guide_scroll_to_their_section_and_back_returns(qtbot, window):
    help_window = window.open_guide("contents")
    qtbot.addWidget(help_window)
    help_window.browser.anchorClicked.emit(QUrl("#loads"))
    assert help_window.current == "loads"
    assert help_window.browser.verticalScrollBar().value() > 0
    help_window.back()
    assert help_window.current == "contents"
    help_window.forward()
    assert help_window.current == "loads"


def test_headings_are_anchors_in_the_rendered_guide(qapp):
    view = HelpWindow()
    try:
        assert set(view.anchors) == anchors()
    finally:
        view.close()


def _menu_shortcuts(window) -> set[tuple[str, str]]:
    rows = set()
    for top in window.menuBar().actions():
        menu = top.menu()
        if not isinstance(menu, QMenu):
            continue
        title = top.text().replace("&", "")
        for action in menu.actions():
            keys = [k.toString(QKeySequence.SequenceFormat.PortableText) for k in action.shortcuts() if not k.isEmpty()]
            if not keys:
                continue
            name = action.text().replace("&", "").replace("…", "").strip()
            if action in (window.undo_action, window.redo_action):
                name = name.split()[0]  # "Undo Set width" → "Undo"
            rows.add((" or ".join(keys), f"{title} › {name}"))
    return rows


def test_the_guides_shortcuts_are_the_windows(window):
    text = section(guide_text(), "menu-commands")
    rows = set(re.findall(r"^\| ([^|]+?) \| ([^|]+?) \|$", text, flags=re.MULTILINE)) - {("Keys", "Command")}
    assert rows == _menu_shortcuts(window)


def test_the_help_menu(window):
    help_menu = next(a.menu() for a in window.menuBar().actions() if a.text() == "&Help")
    names = [a.text().replace("&", "") for a in help_menu.actions() if not a.isSeparator()]
    assert names == ["User guide", "Keyboard shortcuts", "About Kernline"]
    assert window.guide_action.shortcut().toString() == "F1"
    window.shortcuts_action.trigger()
    assert window.help_window.current == "keyboard-shortcuts"
    window.help_window.close()


def test_the_guide_is_installed_with_the_program():
    """pyproject installs docs/guide.md as package data of kernline.docs, where the Help window looks."""
    config = tomllib.loads((ROOT / "pyproject.toml").read_text(encoding="utf-8"))
    tool = config["tool"]["setuptools"]
    assert tool["package-dir"]["kernline.docs"] == "docs"
    assert "kernline.docs" in tool["packages"]
    assert "guide.md" in tool["package-data"]["kernline.docs"]

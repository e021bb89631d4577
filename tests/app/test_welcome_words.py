"""The welcome panel describes the demo as it is: its walls counted from the demo file, and one of them
failing bearing (the engine's own verdict on the demo as drawn).

Basis: issue 13's screenshots (the panel said "four walls" of the five-wall demo).
"""

from __future__ import annotations

import json

from kernline.app.views.welcome import NUMBER_WORDS, demo_words
from kernline.engine.project_file import parse_project
from kernline.engine.resources import resource_path
from kernline.engine.results import check_wall
from PySide6.QtWidgets import QLabel


def test_the_demo_is_described_with_its_own_wall_count_and_failing_wall():
    project = parse_project(json.loads(resource_path("demo.kernline").read_text(encoding="utf-8")))
    assert f"with {NUMBER_WORDS[len(project.walls)]} walls" in demo_words()
    results = [check_wall(project, w) for w in project.walls]
    failing = [r for r in results if not r.passes]
    assert len(failing) == 1 and "one of them fails bearing" in demo_words()
    assert [c.id for c, g in failing[0].governing.items() if not g.passes] == ["bearing"]


def test_the_welcome_panel_shows_those_words(make_window):
    window = make_window(demo=False)
    assert demo_words() in [label.text() for label in window.welcome.findChildren(QLabel)]

"""Every input's tooltip names where its rule comes from: a clause of a published standard (IBC 2021,
ASCE 7-16, ACI 318-19, ASTM A615), the geotechnical report, or, where no standard applies, Kernline's
own rule, plain statics or common practice, said as such."""

from __future__ import annotations

import re

import pytest
from window_helpers import field

SOURCE = re.compile(
    r"IBC 2021|ASCE 7-16|ASCE 7|ACI 318-19|ASTM A615|geotechnical report|common practice|Kernline|"
    r"plain statics|title block|design basis"
)

# Clauses checked at particular inputs (the standard's own numbering).
CLAUSES = {
    "soil.friction": ("IBC 2021 1806.3.2", "geotechnical report"),
    "soil.cohesion": ("IBC 2021 1806.3.2",),
    "soil.passive": ("IBC 2021 Table 1806.2",),
    "soil.report": ("IBC 2021 1803.6",),
    "site.frost_depth": ("IBC 2021 1809.5", "1809.4"),
    "criteria.sds": ("11.4.5",),
    "criteria.seismic_design_category": ("ASCE 7-16 11.6", "21.2.4.3", "1905.6.2"),
    "concrete.fc": ("ACI 318-19 19.2.1",),
    "concrete.fy": ("ACI 318-19 20.2.2", "ASTM A615"),
    "concrete.cover": ("Table 20.5.1.3.1",),
    "concrete.lambda": ("ACI 318-19 19.2.4",),
    "concrete.strength_method": ("1.0W and 1.0E",),
    "walls[0].construction": ("ACI 318-19 Table 13.2.7.1",),
    "walls[0].footing.reinforcement": ("chapter 14", "14.5.1.7"),
    "walls[0].footing.reinforcement.transverse": ("ASTM A615", "7.6.1.1", "Table 13.2.7.1"),
    "walls[0].footing.width": ("IBC 2021 1809.4",),
    "walls[0].footing.thickness": ("ACI 318-19 13.3.1.2",),
}


def _widget(window, path: str):
    if path.startswith("walls[0]."):
        return window.wall_form.field_widget(path[len("walls[0].") :])
    return window.project_form.field_widget(path)


def test_every_field_and_choice_names_its_source(window):
    tips = {}
    for form in (window.wall_form, window.project_form):
        for f in form.group.fields:
            tips[".".join(f.spec.path)] = f.spec.tip
        for path, choice in form.choices.items():
            tips[".".join(path)] = choice.tip
    assert len(tips) > 50
    missing = [path for path, tip in tips.items() if not SOURCE.search(tip)]
    assert not missing


@pytest.mark.parametrize("path", sorted(CLAUSES))
def test_the_clause_of_an_input_is_in_its_tooltip(window, path):
    window.wall_form.set_choice(("footing", "reinforcement"), "entered")
    widget = _widget(window, path)
    assert widget is not None, path
    for words in CLAUSES[path]:
        assert words in widget.toolTip(), (path, words)


def test_the_label_beside_a_field_carries_the_same_tooltip(window):
    group = window.project_form.group
    f = field(window, "concrete", "cover")
    assert group.labels[id(f)].toolTip() == f.spec.tip

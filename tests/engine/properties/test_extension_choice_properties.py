"""Sizing with extensions chooses the least concrete over every extension, though it stops early.

size_footing stops trying longer footings once even the least B x t_f of the grid, at that length,
holds no less concrete than the choice so far (the volume grows with the length; a tie goes to the
shorter footing). Here every extension's feasibility map is computed by brute force and the least
volume B t_f L_f among all passing candidates (ties: shorter, thinner, narrower) must be the one
chosen (D: the ordering of size_footing's docstring). The demo's walls are inputs only, with their
loads scaled so that some need no extension, some a few steps and some none pass; no concrete
section, so the choice is not moved by the design along the length.
"""

from __future__ import annotations

import json
from dataclasses import replace

import numpy as np
from hypothesis import given, settings
from hypothesis import strategies as st
from kernline.engine.model import INCH
from kernline.engine.project_file import parse_project
from kernline.engine.resources import resource_path
from kernline.engine.sizing import _tables, candidate_grid, candidate_values, extended, feasibility_maps, size_footing


def _project():
    raw = json.loads(resource_path("demo.kernline").read_text(encoding="utf-8"))
    raw.pop("concrete")
    return parse_project(raw)


PROJECT = _project()


def brute_force(wall):
    """(volume, e, t, b) of the least-concrete passing candidate over every extension, or None."""
    widths, thicknesses = candidate_grid(wall)
    z = wall.sizing
    best = None
    for e in candidate_values(0.0, z.extension_max, z.extension_step).tolist():
        trial = extended(wall, e)
        check_normalized, allowed, _ = feasibility_maps(_tables(PROJECT, trial), widths, thicknesses)
        passes = allowed & (np.min(check_normalized, axis=0) >= 1.0 - 1e-9)
        for r, c in zip(*np.nonzero(passes), strict=True):
            volume = float(np.round(thicknesses[r] * widths[c] * trial.footing_length, 12))
            key = (volume, e, float(thicknesses[r]), float(widths[c]))
            best = key if best is None or key < best else best
    return best


@settings(max_examples=25, deadline=None)
@given(
    st.integers(0, len(PROJECT.walls) - 1),
    st.floats(0.3, 6.0),
    st.sampled_from([(24.0, 6.0), (36.0, 6.0), (72.0, 12.0), (30.0, 10.0)]),
    st.sampled_from([(12.0, 36.0, 3.0), (12.0, 96.0, 6.0), (18.0, 60.0, 2.0)]),
)
def test_the_choice_has_the_least_concrete_over_every_extension(index, scale, extension, width_range):
    """size_footing's choice equals the brute-force least B t_f L_f over all extensions (D)."""
    wall = PROJECT.walls[index]
    loads = tuple(replace(load, value=load.value * scale) for load in wall.loads)
    low, high, step = width_range
    sizing = replace(
        wall.sizing,
        width_min=low * INCH,
        width_max=high * INCH,
        width_step=step * INCH,
        thickness_min=12.0 * INCH,
        thickness_max=30.0 * INCH,
        thickness_step=2.0 * INCH,
        extension_max=extension[0] * INCH,
        extension_step=extension[1] * INCH,
    )
    wall = replace(wall, loads=loads, sizing=sizing)
    chosen = size_footing(PROJECT, wall)
    expected = brute_force(wall)
    if expected is None:
        assert not chosen.feasible
        return
    _, e, t, b = expected
    assert (chosen.extension, chosen.thickness, chosen.width) == (e, t, b)

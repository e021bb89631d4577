"""Sizing of the footing's length: equal extensions at both ends, least volume, ties to the shorter.

With ``sizing.extension_max`` and ``sizing.extension_step`` the search adds a third axis, an extension
e added at each end of the footing (0 to extension_max), and the choice is the passing candidate with
the least volume B x t_f x L_f, ties going to the shorter, then the thinner, then the narrower
footing. Without them the length is fixed and the choice has the least B x t_f (ties to the thinner,
then the narrower). Each expectation below is worked by hand (statics, D) or found by a brute-force
loop of single checks (``check_wall``) over the same grid (docs/verification.md, case 17).
"""

from __future__ import annotations

import json
import subprocess
import sys
from dataclasses import replace
from pathlib import Path

import pytest
from kernline.engine.project_file import parse_project
from kernline.engine.results import check_wall
from kernline.engine.sizing import candidate_values, size_footing, sized_footing_values, sized_wall

INCH = 0.0254
FOOT = 0.3048
REPO = Path(__file__).resolve().parents[3]


def _overturning_raw(extension: bool = True) -> dict:
    """An overturning-governed wall worked by hand (weightless footing and soil, ample bearing).

    D = 10 k at the middle of an 8 ft wall; W = 5 k at 8.5 ft above the top of the footing; the one
    combination D + W. On t_f = 12 in the W moment about the base is 5 x (8.5 + 1) = 47.5 k ft and the
    resisting moment about the toe 10 x L_f / 2, so FS = 5 L_f / 47.5 = L_f / 9.5 (D):
    L_f = 8 ft: 0.842; 9 ft (e = 6 in): 0.947; 10 ft (e = 1 ft): 1.053, the least that passes.
    A thicker footing only lengthens the arm, and the width does not enter, so the choice is
    12 in x 12 in with 1 ft added at each end. Bearing at that size: e = 47.5 / 10 = 4.75 ft,
    contact 3 x (5 - 4.75) = 0.75 ft, q_max = 2 x 10 / (3 x 1 x 0.25) = 26.7 ksf, under the 40 ksf
    allowable chosen (for this test only) so that bearing does not decide.
    """
    sizing = {
        "width_min": "12 in",
        "width_max": "36 in",
        "width_step": "6 in",
        "thickness_min": "12 in",
        "thickness_max": "24 in",
        "thickness_step": "6 in",
    }
    if extension:
        sizing.update(extension_max="2 ft", extension_step="6 in")
    return {
        "format": "kernline-project",
        "version": 1,
        "criteria": {"combinations": [{"name": "D + W", "factors": {"D": 1.0, "W": 1.0}}]},
        "soil": {"allowable_bearing": "40 ksf", "friction": 0.6, "unit_weight": "0 pcf"},
        "walls": [
            {
                "id": "X1",
                "length": "8 ft",
                "thickness": "8 in",
                "footing": {"width": "12 in", "thickness": "12 in", "unit_weight": "0 pcf"},
                "loads": [
                    {"type": "point", "case": "D", "value": "10 kip", "at": "4 ft"},
                    {"type": "lateral", "case": "W", "value": "5 kip", "height": "8.5 ft"},
                ],
                "sizing": sizing,
            }
        ],
    }


def _bearing_raw(extension: bool = True) -> dict:
    """A bearing-governed wall with a tie in volume between two lengths (weightless footing).

    D = 19 k at the middle of an 8 ft wall, allowable 2,000 psf, no lateral load: q = 19,000 / (B L_f).
    L_f = 8 ft: B = 14 in gives 2,036 psf (fails), B = 15 in 1,900 psf (passes): volume
    1 x 1.25 x 8 = 10 ft^3. L_f = 10 ft (e = 1 ft): B = 12 in gives 1,900 psf (passes): volume
    1 x 1 x 10 = 10 ft^3, the same. L_f = 12 ft: 12 ft^3. The tie goes to the shorter: B = 15 in,
    t_f = 12 in, no extension (D).
    """
    sizing = {
        "width_min": "12 in",
        "width_max": "24 in",
        "width_step": "1 in",
        "thickness_min": "12 in",
        "thickness_max": "18 in",
        "thickness_step": "6 in",
    }
    if extension:
        sizing.update(extension_max="2 ft", extension_step="1 ft")
    return {
        "format": "kernline-project",
        "version": 1,
        "criteria": {"method": "asce7-16-asd"},
        "soil": {"allowable_bearing": "2000 psf", "friction": 0.35, "unit_weight": "0 pcf"},
        "walls": [
            {
                "id": "X2",
                "length": "8 ft",
                "thickness": "8 in",
                "footing": {"width": "12 in", "thickness": "12 in", "unit_weight": "0 pcf"},
                "loads": [{"type": "point", "case": "D", "value": "19 kip", "at": "4 ft"}],
                "sizing": sizing,
            }
        ],
    }


def _mixed_raw(extension: bool = True) -> dict:
    """Overturning, bearing and self weight together (ASCE 7-16 ASD preset), for the brute-force
    cross-check: the least volume is not obvious by hand."""
    sizing = {
        "width_min": "12 in",
        "width_max": "72 in",
        "width_step": "6 in",
        "thickness_min": "12 in",
        "thickness_max": "30 in",
        "thickness_step": "6 in",
    }
    if extension:
        sizing.update(extension_max="3 ft", extension_step="6 in")
    return {
        "format": "kernline-project",
        "version": 1,
        "criteria": {"method": "asce7-16-asd"},
        "soil": {"allowable_bearing": "2500 psf", "friction": 0.35, "unit_weight": "110 pcf"},
        "walls": [
            {
                "id": "X3",
                "length": "10 ft",
                "thickness": "8 in",
                "footing": {"width": "12 in", "thickness": "12 in", "cover": "6 in"},
                "loads": [
                    {"type": "line", "case": "D", "value": "800 plf"},
                    {"type": "line", "case": "L", "value": "500 plf"},
                    {"type": "lateral", "case": "W", "value": "6 kip", "height": "9 ft"},
                ],
                "sizing": sizing,
            }
        ],
    }


def _size(raw: dict):
    project = parse_project(raw)
    wall = project.walls[0]
    return project, wall, size_footing(project, wall)


def _brute_force(project, wall, by_volume: bool):
    """Loop over the grid calling check_wall; the least key among passing candidates.

    by_volume: key (B t_f L_f, e, t_f, B); else (B t_f, t_f, B) on the fixed length.
    """
    z = wall.sizing
    widths = candidate_values(z.width_min, z.width_max, z.width_step)
    thicknesses = candidate_values(z.thickness_min, z.thickness_max, z.thickness_step)
    extensions = candidate_values(0.0, z.extension_max, z.extension_step) if by_volume else [0.0]
    best = None
    for e in extensions:
        for t in thicknesses:
            for b in widths:
                footing = replace(
                    wall.footing,
                    width=float(b),
                    thickness=float(t),
                    extension_start=wall.footing.extension_start + float(e),
                    extension_end=wall.footing.extension_end + float(e),
                )
                trial = replace(wall, footing=footing)
                if b < wall.supported_thickness or not check_wall(project, trial).passes:
                    continue
                if by_volume:
                    key = (round(float(b * t * trial.footing_length), 12), float(e), float(t), float(b))
                else:
                    key = (round(float(b * t), 12), 0.0, float(t), float(b))
                if best is None or key < best:
                    best = key
    return best


# ---- the overturning wall, worked by hand ---------------------------------------------------------


def test_the_least_extension_that_lets_overturning_pass():
    """FS = L_f / 9.5: L_f = 10 ft, e = 1 ft at each end, 12 in x 12 in (module docstring, D)."""
    _, _, sizing = _size(_overturning_raw())
    assert sizing.feasible
    assert sizing.extension == pytest.approx(1.0 * FOOT, rel=1e-9)
    assert sizing.length == pytest.approx(10.0 * FOOT, rel=1e-9)
    assert sizing.width == pytest.approx(12 * INCH, rel=1e-9)
    assert sizing.thickness == pytest.approx(12 * INCH, rel=1e-9)


def test_the_chosen_footing_passes_and_one_step_shorter_fails():
    """At L_f = 10 ft FS = 1.053 (passes); at 9 ft 0.947 (fails) (D)."""
    project, wall, sizing = _size(_overturning_raw())
    chosen = check_wall(project, sized_wall(wall, sizing))
    assert chosen.passes
    assert chosen.length == pytest.approx(10.0 * FOOT, rel=1e-9)
    assert min(c.overturning.ratio for c in chosen.cases) == pytest.approx(10.0 / 9.5, rel=1e-9)
    shorter = replace(
        sized_wall(wall, sizing),
        footing=replace(sized_wall(wall, sizing).footing, extension_start=0.5 * FOOT, extension_end=0.5 * FOOT),
    )
    assert min(c.overturning.ratio for c in check_wall(project, shorter).cases) == pytest.approx(9.0 / 9.5, rel=1e-9)


def test_the_result_in_json_names_the_extension_and_length():
    _, _, sizing = _size(_overturning_raw())
    body = sizing.as_json()
    assert body["extension"] == pytest.approx(1.0 * FOOT, rel=1e-9)
    assert body["length"] == pytest.approx(10.0 * FOOT, rel=1e-9)
    assert body["candidates"] == 5 * 3 * 5  # widths x thicknesses x extensions


def test_the_sized_values_add_the_extension_to_the_footings_own():
    """Extensions of 6 in already drawn: sizing adds e to each (written back as their sum)."""
    raw = _overturning_raw()
    raw["walls"][0]["footing"].update(extension_start="6 in", extension_end="6 in")
    _, wall, sizing = _size(raw)
    values = sized_footing_values(wall, sizing)
    # L_f = 9 ft + 2e >= 9.5 ft: e = 6 in is the least that passes, so each end is 6 + 6 = 12 in (D)
    assert sizing.extension == pytest.approx(6 * INCH, rel=1e-9)
    assert values["extension_start"] == pytest.approx(12 * INCH, rel=1e-9)
    assert values["extension_end"] == pytest.approx(12 * INCH, rel=1e-9)
    assert sizing.length == pytest.approx(10.0 * FOOT, rel=1e-9)


def test_without_extension_bounds_the_length_is_not_changed():
    """The same wall on its 8 ft footing: FS <= 0.842 whatever B and t_f, so nothing passes (D)."""
    _, _, sizing = _size(_overturning_raw(extension=False))
    assert not sizing.feasible
    assert sizing.extensions.size == 1


# ---- ties go to the shorter -------------------------------------------------------------------------


def test_a_tie_in_volume_goes_to_the_shorter_footing():
    """15 in x 12 in x 8 ft and 12 in x 12 in x 10 ft are both 10 ft^3: the shorter is chosen (D)."""
    _, _, sizing = _size(_bearing_raw())
    assert sizing.extension == 0.0
    assert sizing.length == pytest.approx(8.0 * FOOT, rel=1e-9)
    assert sizing.width == pytest.approx(15 * INCH, rel=1e-9)
    assert sizing.thickness == pytest.approx(12 * INCH, rel=1e-9)


def test_the_longer_footing_of_the_tie_passes_too():
    """12 in wide on L_f = 10 ft: q = 19,000 / 10 = 1,900 psf, it passes; the tie is real (D)."""
    project, wall, _ = _size(_bearing_raw())
    longer = replace(
        wall, footing=replace(wall.footing, width=12 * INCH, thickness=12 * INCH, extension_start=FOOT, extension_end=FOOT)
    )
    assert check_wall(project, longer).passes


# ---- brute force over the grid ------------------------------------------------------------------------


@pytest.mark.parametrize("make", [_overturning_raw, _bearing_raw, _mixed_raw], ids=["overturning", "bearing", "mixed"])
def test_brute_force_finds_the_same_choice(make):
    """check_wall over every extension x thickness x width: the least (volume, e, t_f, B) is sizing's."""
    project, wall, sizing = _size(make())
    best = _brute_force(project, wall, by_volume=True)
    assert best is not None
    _, e, t, b = best
    assert sizing.extension == pytest.approx(e, rel=1e-9, abs=1e-12)
    assert sizing.thickness == pytest.approx(t, rel=1e-9)
    assert sizing.width == pytest.approx(b, rel=1e-9)


def test_the_mixed_wall_is_cheaper_with_a_longer_footing():
    """The mixed wall: a longer footing with less concrete (48 in x 12 in x 12 ft = 48 ft^3) beats the
    least B x t_f on the drawn length (60 in x 12 in x 10 ft = 50 ft^3) (found by brute force)."""
    _, _, longer = _size(_mixed_raw())
    _, _, fixed = _size(_mixed_raw(extension=False))
    assert longer.extension == pytest.approx(1.0 * FOOT, rel=1e-9)
    assert longer.width == pytest.approx(48 * INCH, rel=1e-9)
    assert longer.thickness == pytest.approx(12 * INCH, rel=1e-9)
    assert fixed.width == pytest.approx(60 * INCH, rel=1e-9)
    assert fixed.thickness == pytest.approx(12 * INCH, rel=1e-9)
    volume_longer = longer.width * longer.thickness * longer.length
    volume_fixed = fixed.width * fixed.thickness * fixed.length
    assert volume_longer < volume_fixed


@pytest.mark.parametrize("make", [_bearing_raw, _mixed_raw], ids=["bearing", "mixed"])
def test_without_extension_bounds_the_least_cross_section_is_chosen(make):
    """The old rule: least B x t_f on the fixed length (ties thinner, then narrower), by brute force."""
    project, wall, sizing = _size(make(extension=False))
    best = _brute_force(project, wall, by_volume=False)
    assert best is not None
    _, _, t, b = best
    assert sizing.thickness == pytest.approx(t, rel=1e-9)
    assert sizing.width == pytest.approx(b, rel=1e-9)
    assert sizing.extension == 0.0
    assert sizing.length == pytest.approx(wall.footing_length, rel=1e-12)
    assert sizing.as_json()["extension"] is None
    assert set(sized_footing_values(wall, sizing)) == {"width", "thickness"}


# ---- kernline size --write ------------------------------------------------------------------------------


def test_size_write_stores_the_extensions(tmp_path):
    """`kernline size FILE --write` writes width, thickness and both extensions back (inches, US)."""
    path = tmp_path / "overturning.kernline"
    path.write_text(json.dumps(_overturning_raw(), indent=2) + "\n", encoding="utf-8")
    done = subprocess.run(
        [sys.executable, "-m", "kernline.app.cli", "size", str(path), "--write"],
        capture_output=True,
        text=True,
        timeout=120,
        cwd=REPO,
    )
    assert done.returncode == 0, done.stdout[-500:] + done.stderr[-500:]
    footing = json.loads(path.read_text(encoding="utf-8"))["walls"][0]["footing"]
    assert footing["extension_start"] == "12 in"
    assert footing["extension_end"] == "12 in"
    assert footing["width"] == "12 in"
    assert footing["thickness"] == "12 in"
    # the written file reads back as a footing that passes, 10 ft long
    project = parse_project(json.loads(path.read_text(encoding="utf-8")))
    result = check_wall(project, project.walls[0])
    assert result.passes
    assert result.length == pytest.approx(10.0 * FOOT, rel=1e-9)

"""Loading, validating and saving project files (engine.project_file)."""

import copy
import json
import os

import pytest
from kernline.engine import project_file
from kernline.engine.errors import FormatVersionError, InputError
from kernline.engine.model import BearingBasis, LateralLoad, LineLoad, LoadCase, Method, PointLoad
from kernline.engine.project_file import load_project, loads_project, parse_project, save_project, with_footing_sizes
from kernline.engine.resources import resource_path

INCH, FOOT = 0.0254, 0.3048


def minimal() -> dict:
    return {
        "format": "kernline-project",
        "version": 1,
        "soil": {"allowable_bearing": "2000 psf", "friction": 0.35, "unit_weight": "110 pcf"},
        "walls": [
            {
                "id": "A1",
                "length": "20 ft",
                "thickness": "6 in",
                "footing": {"width": "18 in", "thickness": "12 in"},
                "loads": [
                    {"type": "line", "case": "D", "value": "300 plf"},
                    {"type": "point", "case": "D", "value": "2 kip", "at": "0.5 ft"},
                    {"type": "lateral", "case": "W", "value": "6 kip", "height": "9 ft"},
                ],
            }
        ],
    }


def error_of(raw) -> InputError:
    with pytest.raises(InputError) as err:
        parse_project(raw)
    return err.value


def test_minimal_project_takes_the_documented_defaults():
    """Keys not given keep the defaults of format version 1."""
    p = parse_project(minimal())
    assert p.units == "US"
    assert p.criteria.method is Method.ASCE7_16_ASD
    assert p.criteria.required.overturning == 1.0
    assert p.soil.allowable_bearing == pytest.approx(2000 * 4.4482216152605 / FOOT**2, rel=1e-12)
    assert p.soil.bearing_basis is BearingBasis.GROSS
    assert p.soil.friction == 0.35
    wall = p.walls[0]
    assert wall.footing.width == pytest.approx(18 * INCH)
    assert wall.footing.unit_weight == pytest.approx(150 * 4.4482216152605 / FOOT**3, rel=1e-12)  # NIST SP 811
    assert wall.sizing.width_max == pytest.approx(8 * FOOT)
    assert wall.sizing.thickness_max == pytest.approx(4 * FOOT)
    line, point, lateral = wall.loads
    assert isinstance(line, LineLoad) and line.start == 0.0 and line.end == pytest.approx(20 * FOOT)
    assert isinstance(point, PointLoad) and point.at == pytest.approx(0.5 * FOOT) and not point.reverses
    assert isinstance(lateral, LateralLoad) and lateral.case is LoadCase.W


def test_service_fs_defaults_its_required_ratios():
    """service-fs: overturning 2.0, sliding 1.5, bearing 1.0 unless the project says otherwise."""
    raw = minimal()
    raw["criteria"] = {"method": "service-fs", "required": {"sliding": 1.75}}
    req = parse_project(raw).criteria.required
    assert (req.overturning, req.sliding, req.bearing) == (2.0, 1.75, 1.0)


def test_any_unit_of_the_right_dimension_is_accepted():
    """'600 mm' in a US project is fine."""
    raw = minimal()
    raw["walls"][0]["footing"]["width"] = "600 mm"
    assert parse_project(raw).walls[0].footing.width == pytest.approx(0.6)


def test_seismic_and_wind_point_loads_reverse_by_default():
    """A W or E point load (a chord force) moves to the mirror position in direction '-'."""
    raw = minimal()
    raw["criteria"] = {"sds": 0.5}
    raw["walls"][0]["loads"].append({"type": "point", "case": "E", "value": "-3 kip", "at": "0.5 ft"})
    assert parse_project(raw).walls[0].loads[-1].reverses


@pytest.mark.parametrize(
    ("mutate", "field", "words"),
    [
        (
            lambda r: r["walls"][0]["footing"].__setitem__("width", "24"),
            "walls[0].footing.width",
            '"24" has no unit; expected a length such as "24 in"',
        ),
        (lambda r: r["walls"][0]["footing"].pop("thickness"), "walls[0].footing.thickness", "is missing"),
        (lambda r: r["walls"][0].__setitem__("length", "20 kip"), "walls[0].length", "expected a length"),
        (lambda r: r["walls"][0].__setitem__("length", "-2 ft"), "walls[0].length", "greater than zero"),
        (lambda r: r["walls"][0].__setitem__("length", "0 ft"), "walls[0].length", "greater than zero"),
        (lambda r: r["walls"][0].__setitem__("length", "nan ft"), "walls[0].length", "finite"),
        (lambda r: r["walls"][0]["footing"].__setitem__("width", 18), "walls[0].footing.width", "got 18"),
        (lambda r: r["soil"].__setitem__("friction", "0.35"), "soil.friction", "expected a number"),
        (lambda r: r["soil"].__setitem__("friction", float("nan")), "soil.friction", "finite"),
        (lambda r: r["soil"].__setitem__("friction", -0.1), "soil.friction", "must not be negative"),
        (lambda r: r["walls"][0]["loads"][0].__setitem__("case", "Q"), "walls[0].loads[0].case", 'unknown load case "Q"'),
        (lambda r: r["walls"][0]["loads"][2].__setitem__("case", "D"), "walls[0].loads[2].case", "expected one of W, E"),
        (lambda r: r["walls"][0]["loads"][0].__setitem__("type", "area"), "walls[0].loads[0].type", '"area"'),
        (lambda r: r.__setitem__("walls", []), "walls", "is empty"),
        (lambda r: r.pop("walls"), "walls", "is missing"),
        (lambda r: r["walls"][0]["footing"].__setitem__("width", "4 in"), "walls[0].footing.width", "narrower than the wall"),
        (
            lambda r: r["walls"][0].__setitem__("stem", {"height": "2 ft", "thickness": "24 in"}),
            "walls[0].footing.width",
            "narrower than the stem",
        ),
        (lambda r: r["walls"][0]["loads"][1].__setitem__("at", "30 ft"), "walls[0].loads[1].at", "off the footing"),
        (lambda r: r["walls"][0]["loads"][0].__setitem__("end", "25 ft"), "walls[0].loads[0]", "runs past"),
        (lambda r: r["walls"][0]["loads"][0].__setitem__("reverses", True), "walls[0].loads[0].reverses", "only W and E"),
        (lambda r: r.__setitem__("units", "metric"), "units", 'expected "US" or "SI"'),
        (lambda r: r.__setitem__("criteria", {"method": "lrfd"}), "criteria.method", '"asce7-16-asd"'),
        (lambda r: r.__setitem__("criteria", {"required": {"bearing": 0}}), "criteria.required.bearing", "greater than zero"),
        (lambda r: r.__setitem__("criteria", {"combinations": []}), "criteria.combinations", "is empty"),
        (
            lambda r: r.__setitem__("criteria", {"combinations": [{"name": "x", "factors": {"Z": 1}}]}),
            "criteria.combinations[0].factors.Z",
            "unknown load case",
        ),
        (lambda r: r.__setitem__("walls", [r["walls"][0], copy.deepcopy(r["walls"][0])]), "walls[1].id", "used by another wall"),
        (
            lambda r: r["walls"][0].__setitem__("sizing", {"width_min": "3 ft", "width_max": "2 ft"}),
            "walls[0].sizing.width_max",
            "width_min",
        ),
        (lambda r: r.__setitem__("criteria", {"method": ["x"]}), "criteria.method", "expected one of"),
        (lambda r: r["soil"].__setitem__("bearing_basis", {"a": 1}), "soil.bearing_basis", "expected one of"),
        (lambda r: r["walls"][0]["loads"][0].__setitem__("case", ["D"]), "walls[0].loads[0].case", "unknown load case"),
        (
            lambda r: r.__setitem__("criteria", {"combinations": [{"name": "x", "factors": {"D": 1}, "checks": [["a"]]}]}),
            "criteria.combinations[0].checks[0]",
            "expected",
        ),
        (lambda r: r["soil"].__setitem__("friction", 10**400), "soil.friction", "far too large"),
        (lambda r: r.__setitem__("criteria", {"sds": 5}), "criteria.sds", "negative"),
        (lambda r: r["walls"][0]["loads"][0].__setitem__("start", "25 ft"), "walls[0].loads[0].start", 'give an "end"'),
        (
            lambda r: (
                r["walls"][0]["loads"].append({"type": "point", "case": "W", "value": "-3 kip", "at": "-1 ft"})
                or r["walls"][0]["footing"].__setitem__("extension_start", "1 ft")
            ),
            "walls[0].loads[3].reverses",
            "mirror image",
        ),
        (lambda r: r["walls"][0]["footing"].__setitem__("width", '-18"'), "walls[0].footing.width", "greater than zero"),
    ],
)
def test_bad_input_names_the_field_and_the_problem(mutate, field, words):
    """Every bad field is refused with its path and a message saying what is wrong."""
    raw = minimal()
    mutate(raw)
    err = error_of(raw)
    assert err.field == field
    assert words in err.problem
    assert err.message.startswith(field + ": ")


def test_newer_format_version_is_refused_clearly():
    """A file from a newer Kernline says so instead of misreading it."""
    raw = minimal()
    raw["version"] = 2
    with pytest.raises(FormatVersionError, match="newer Kernline"):
        parse_project(raw)


def test_not_a_project_file():
    """Other JSON is refused with the reason."""
    with pytest.raises(FormatVersionError, match="not a Kernline project"):
        parse_project({"format": "something-else", "version": 1})
    with pytest.raises(InputError, match="not valid JSON"):
        loads_project("{ nope")


def test_missing_file_is_an_input_error(tmp_path):
    with pytest.raises(InputError, match="no such file"):
        load_project(tmp_path / "absent.kernline")


def test_save_round_trip_keeps_the_file_identical(tmp_path):
    """Open then save writes the same bytes (the raw document is what is saved)."""
    path = tmp_path / "demo.kernline"
    text = project_file.dumps_project(json.loads(resource_path("demo.kernline").read_text(encoding="utf-8")))
    path.write_text(text, encoding="utf-8")
    doc = load_project(path)
    save_project(path, doc.raw)
    assert path.read_text(encoding="utf-8") == text


def test_atomic_save_leaves_the_old_file_when_writing_fails(tmp_path, monkeypatch):
    """A crash mid-save (here: fsync fails) never damages the old file and leaves no temp file."""
    path = tmp_path / "p.kernline"
    save_project(path, minimal())
    before = path.read_bytes()

    def boom(fd):
        raise OSError("disk full")

    monkeypatch.setattr(os, "fsync", boom)
    changed = minimal()
    changed["walls"][0]["length"] = "30 ft"
    with pytest.raises(OSError):
        save_project(path, changed)
    assert path.read_bytes() == before
    assert [p.name for p in tmp_path.iterdir()] == ["p.kernline"]


def test_with_footing_sizes_changes_only_the_sizes():
    """--write stores the chosen sizes and keeps every other key, including the project's own."""
    raw = minimal()
    raw["walls"][0]["x-notes"] = {"keep": True}
    raw["x-project"] = [1, 2, 3]
    out = with_footing_sizes(raw, {"A1": (30 * INCH, 14 * INCH)}, "US")
    assert out["walls"][0]["footing"] == {"width": "30 in", "thickness": "14 in"}
    assert out["walls"][0]["x-notes"] == {"keep": True}
    assert out["x-project"] == [1, 2, 3]
    assert raw["walls"][0]["footing"]["width"] == "18 in"  # the input is not changed
    si = with_footing_sizes(raw, {"A1": (0.75, 0.35)}, "SI")
    assert si["walls"][0]["footing"]["width"] == "750 mm"


def test_demo_project_loads():
    """The embedded demo is a valid project with several walls."""
    doc = load_project(resource_path("demo.kernline"))
    assert len(doc.project.walls) >= 4

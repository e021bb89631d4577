"""What a project file must say, may say and may not say (engine.project_file), and what Kernline
reports back: unknown keys, required site values, assumptions, warnings, strict JSON, messages."""

from __future__ import annotations

import copy
import json

import pytest
from kernline.engine.errors import InputError
from kernline.engine.input_warnings import input_warnings
from kernline.engine.project_file import dumps_project, loads_project, parse_project
from kernline.engine.resources import resource_path
from kernline.engine.results import check_project, results_json

INCH, FOOT, LBF = 0.0254, 0.3048, 4.4482216152605


def demo() -> dict:
    return json.loads(resource_path("demo.kernline").read_text(encoding="utf-8"))


def error_of(raw) -> InputError:
    with pytest.raises(InputError) as err:
        parse_project(raw)
    return err.value


# ---- unknown keys ------------------------------------------------------------------------------


@pytest.mark.parametrize(
    ("mutate", "message"),
    [
        (
            lambda r: r["walls"][0]["footing"].__setitem__("widht", r["walls"][0]["footing"].pop("width")),
            'walls[0].footing.widht: unknown key; did you mean "width"?',
        ),
        (
            lambda r: r["soil"].__setitem__("allowable_bearing_pressure", "1000 psf"),
            'soil.allowable_bearing_pressure: unknown key; did you mean "allowable_bearing"?',
        ),
        (
            lambda r: r["walls"][0].__setitem__("Loads", r["walls"][0].pop("loads")),
            'walls[0].Loads: unknown key; did you mean "loads"?',
        ),
        (
            lambda r: r["criteria"].__setitem__("S_DS", r["criteria"].pop("sds")),
            'criteria.S_DS: unknown key; did you mean "sds"?',
        ),
        (lambda r: r.__setitem__("Soil", r.pop("soil")), 'Soil: unknown key; did you mean "soil"?'),
        (
            lambda r: r["walls"][1]["stem"].__setitem__("heigth", "1 ft"),
            'walls[1].stem.heigth: unknown key; did you mean "height"?',
        ),
        (
            lambda r: r["walls"][0]["loads"][5].__setitem__("heigth", "1 ft"),
            'walls[0].loads[5].heigth: unknown key; did you mean "height"?',
        ),
        (
            lambda r: r["walls"][0]["loads"][0].__setitem__("at", "1 ft"),
            "walls[0].loads[0].at: unknown key",
        ),  # a line load has no "at"
        (
            lambda r: r["walls"][0].__setitem__("sizing", {"widht_max": "6 ft"}),
            'walls[0].sizing.widht_max: unknown key; did you mean "width_max"?',
        ),
        (lambda r: r["project"].__setitem__("nmae", "x"), 'project.nmae: unknown key; did you mean "name"?'),
        (
            lambda r: r["criteria"].__setitem__("required", {"overturnin": 1.5}),
            'criteria.required.overturnin: unknown key; did you mean "overturning"?',
        ),
        (
            lambda r: r["criteria"].__setitem__("combinations", [{"name": "x", "factors": {"D": 1.0}, "check": []}]),
            'criteria.combinations[0].check: unknown key; did you mean "checks"?',
        ),
        (
            lambda r: r["criteria"].__setitem__("combinations", [{"name": "x", "factors": {"d": 1.0}}]),
            'criteria.combinations[0].factors.d: unknown load case; did you mean "D"?',
        ),
    ],
)
def test_an_unknown_key_is_refused_with_its_path_and_the_closest_key(mutate, message):
    """A misspelt key is refused (never ignored with a default in its place), naming its path and the likely key."""
    raw = demo()
    mutate(raw)
    assert error_of(raw).message.startswith(message)


def test_users_own_data_is_kept_exactly():
    """An "extra" object and "x-" keys anywhere are the user's: accepted, and saved as they were."""
    raw = demo()
    raw["extra"] = {"anything": [1, {"deep": "yes"}], "née": "ü"}
    raw["x-office"] = {"desk": 4}
    raw["walls"][0]["x-note"] = "check with architect"
    raw["walls"][0]["footing"]["x-rebar-note"] = "by others"
    raw["soil"]["x-boring"] = "B-3"
    text = dumps_project(raw)
    doc = loads_project(text)
    assert dumps_project(doc.raw) == text


def test_extra_must_be_an_object():
    """The top-level "extra" holds an object of the user's own data."""
    raw = demo()
    raw["extra"] = "notes"
    assert error_of(raw).field == "extra"


# ---- required site values ----------------------------------------------------------------------


@pytest.mark.parametrize(
    ("mutate", "field"),
    [
        (lambda r: r.pop("soil"), "soil"),
        (lambda r: r["soil"].pop("allowable_bearing"), "soil.allowable_bearing"),
        (lambda r: (r["soil"].pop("friction"), r["soil"].pop("cohesion")), "soil.friction"),
        (lambda r: r["soil"].pop("unit_weight"), "soil.unit_weight"),
        (lambda r: r["criteria"].pop("sds"), "criteria.sds"),  # the demo's walls carry E loads
        (lambda r: r["walls"][2].__setitem__("loads", []), "walls[2].loads"),
        (lambda r: r["walls"][2].pop("loads"), "walls[2].loads"),
    ],
)
def test_a_site_value_is_never_defaulted(mutate, field):
    """The geotechnical values, S_DS with E loads, and a wall's loads have no default: refused, naming the key."""
    raw = demo()
    mutate(raw)
    err = error_of(raw)
    assert err.field == field
    assert "is missing" in err.problem or "is empty" in err.problem


def test_cohesion_alone_is_enough_for_a_cohesive_soil():
    """soil.cohesion may stand in for soil.friction (a cohesive soil); friction is then taken as 0 and listed."""
    raw = demo()
    raw["soil"].pop("friction")
    raw["soil"]["cohesion"] = "250 psf"
    project = parse_project(raw)
    assert project.soil.friction == 0.0
    assert any(a.field == "soil.friction" and a.value == "0" for a in project.assumptions)


def test_sds_is_not_required_without_e_loads_or_with_own_combinations():
    """S_DS only matters to the ASCE 7 preset when some wall carries E loads."""
    raw = demo()
    raw["criteria"].pop("sds")
    raw["criteria"]["method"] = "service-fs"
    parse_project(raw)
    raw = demo()
    raw["criteria"].pop("sds")
    for wall in raw["walls"]:
        wall["loads"] = [ld for ld in wall["loads"] if ld["case"] != "E"]
    parse_project(raw)


# ---- assumptions -------------------------------------------------------------------------------


def test_every_default_is_listed_with_its_value_and_basis():
    """Each value the engineer left out appears in the assumptions list, in the project's units."""
    raw = demo()
    wall = raw["walls"][0]
    del wall["footing"]["unit_weight"], wall["footing"]["cover"], wall["footing"]["extension_start"]
    del raw["soil"]["passive"], raw["soil"]["bearing_basis"], raw["criteria"]["bearing_increase"]
    wall.pop("sizing", None)
    project = parse_project(raw)
    found = {a.field: a for a in project.assumptions}
    assert found["walls[0].footing.unit_weight"].value == "150 pcf"
    assert found["walls[0].footing.unit_weight"].basis == "normal-weight concrete, common practice"
    assert found["walls[0].footing.cover"].value == '0"'
    assert found["walls[0].footing.extension_start"].value == '0"'
    assert found["soil.passive"].value == "0 psf/ft"
    assert found["soil.bearing_basis"].value == "gross"
    assert found["criteria.bearing_increase"].value == "1"
    assert found["criteria.required.overturning"].basis.startswith("a ratio of 1.0")
    assert found["walls[0].sizing.width_max"].value == "8'-0\""
    assert found["walls[0].loads[0]"].value.startswith("the wall's full length")
    assert "walls[0].footing.width" not in found  # entered values are not listed


def test_assumptions_are_shown_in_si_for_an_si_project():
    """An SI project lists its defaults in SI units."""
    raw = demo()
    raw["units"] = "SI"
    del raw["walls"][0]["footing"]["unit_weight"]
    found = {a.field: a.value for a in parse_project(raw).assumptions}
    assert found["walls[0].footing.unit_weight"] == "23.56 kN/m³"


def test_assumptions_survive_the_wall_cache():
    """A wall parsed twice (the window re-parses on every edit) lists its assumptions both times."""
    raw = demo()
    first = parse_project(raw).assumptions
    second = parse_project(copy.deepcopy(raw)).assumptions
    assert first == second and first


def test_results_json_lists_assumptions_and_warnings():
    """The results document carries "assumptions" and "warnings" lists beside the walls."""
    raw = demo()
    del raw["walls"][0]["footing"]["unit_weight"]
    project = parse_project(raw)
    doc = results_json(check_project(project), project=project)
    assert {
        "field": "walls[0].footing.unit_weight",
        "value": "150 pcf",
        "basis": "normal-weight concrete, common practice",
    } in doc["assumptions"]
    assert isinstance(doc["warnings"], list)
    json.dumps(doc, allow_nan=False)


# ---- warnings ----------------------------------------------------------------------------------


def test_e_loads_with_sds_zero_warn():
    """S_DS entered as 0 with E loads is legal but drops Ev = 0.2 S_DS D (ASCE 7-16 12.4.2.2): a warning."""
    raw = demo()
    raw["criteria"]["sds"] = 0.0
    project = parse_project(raw)
    fields = [w.field for w in input_warnings(project)]
    assert "criteria.sds" in fields


def test_chord_point_loads_with_lateral_loads_warn():
    """W or E point loads on a wall that also has lateral loads of that case may count the overturning twice."""
    project = parse_project(demo())
    warnings = input_warnings(project)
    e4 = [w for w in warnings if "wall E4" in w.message]
    assert {w.field for w in e4} == {"walls[3].loads[3]", "walls[3].loads[5]"}
    assert all("counted twice" in w.message for w in e4)


def test_short_contact_in_a_governing_case_warns():
    """Demo S2 touches the soil over about 4'-2" of 11'-0" in its governing seismic case: a warning names it."""
    project = parse_project(demo())
    warnings = input_warnings(project, check_project(project))
    s2 = [w for w in warnings if w.field == "walls[1].footing"]
    assert len(s2) == 1 and "less than half its length" in s2[0].message


def test_no_warning_for_a_plain_wall():
    """A wall with only gravity and lateral loads and full contact raises no warning."""
    raw = demo()
    raw["walls"] = [raw["walls"][0]]
    project = parse_project(raw)
    assert input_warnings(project, check_project(project)) == ()


# ---- strict JSON and messages ------------------------------------------------------------------


def test_duplicate_keys_are_refused_with_their_path():
    """One JSON object may not hold a key twice (json.loads would keep the last silently)."""
    text = dumps_project(demo()).replace('"width": "18 in",', '"width": "18 in", "width": "30 in",', 1)
    with pytest.raises(InputError, match=r"^walls\[0\]\.footing\.width: appears twice"):
        loads_project(text)


def test_a_byte_order_mark_is_accepted():
    """A UTF-8 byte-order mark (as some editors write) is read past."""
    assert loads_project("\ufeff" + dumps_project(demo())).project.walls[0].id == "N1"


@pytest.mark.parametrize(
    ("text", "words"),
    [
        ('{"a": NaN}', "NaN"),
        ('{"a": -Infinity}', "Infinity"),
        ('{"a": ' + "9" * 101 + "}", "101 digits"),
        ("[" * 65 + "]" * 65, "deeper than 64"),
        ("[" * 200_000 + "]" * 200_000, "deeper than 64"),
        ('{"a": 1', "not valid JSON"),
    ],
)
def test_json_beyond_the_limits_is_an_input_error(text, words):
    """Non-numbers, huge integers and deep nesting are bad input (exit 2), not an internal error."""
    with pytest.raises(InputError, match=words):
        loads_project(text)


def test_combination_factor_paths_are_exact():
    """A bad factor names criteria.combinations[0].factors.D, the exact key."""
    raw = demo()
    raw["criteria"]["combinations"] = [{"name": "x", "factors": {"D": "1.0"}}]
    assert error_of(raw).field == "criteria.combinations[0].factors.D"
    raw["criteria"]["combinations"] = [{"name": "x", "factors": {"D": 12.0}}]
    assert "the limit for a load factor" in error_of(raw).message


@pytest.mark.parametrize(
    ("sizing", "field"),
    [
        ({"width_min": "12 in", "width_max": "900 m", "width_step": "1 mm"}, "walls[0].sizing.width_step"),
        ({"thickness_min": "1 in", "thickness_max": "900 m", "thickness_step": "1 mm"}, "walls[0].sizing.thickness_step"),
    ],
)
def test_an_oversized_grid_names_the_step_that_made_it(sizing, field):
    """The sizing grid limit names the step of the axis that has too many candidates."""
    raw = demo()
    raw["walls"][0]["sizing"] = sizing
    assert error_of(raw).field == field


def test_friction_over_two_is_refused():
    """A friction coefficient above 2 (over 63 degrees) is a slip: refused, naming the limit."""
    raw = demo()
    raw["soil"]["friction"] = 35
    assert "beyond 2" in error_of(raw).message


def test_control_characters_from_the_file_are_escaped():
    """No ESC, CR or LF from the file reaches a message: they are shown escaped, on one line."""
    raw = demo()
    raw["walls"][0]["footing"]["\x1b[2Jwidht"] = "1 in"
    message = error_of(raw).message
    assert "\x1b" not in message and "\\x1b" in message
    raw = demo()
    raw["walls"][0]["footing"]["width"] = "18 in\r\nDone"
    message = error_of(raw).message
    assert "\r" not in message and "\n" not in message


def test_messages_stay_short_for_long_values():
    """A 10,000-character value or key still gives a message of about 200 characters."""
    raw = demo()
    raw["walls"][0]["footing"]["width"] = "9" * 10_000 + " in"
    assert len(error_of(raw).message) <= 240
    raw = demo()
    raw["walls"][0]["footing"]["w" * 10_000] = "1 in"
    assert len(error_of(raw).message) <= 240

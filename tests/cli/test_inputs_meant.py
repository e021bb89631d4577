"""Through the ``kernline`` command: refused inputs exit 2 with the field's path and leave the file as it
was; assumptions are listed under the table; warnings go to stderr and never change the exit code."""

from __future__ import annotations

import json
import subprocess
import sys
from pathlib import Path

import pytest
from cli_projects import demo_raw, write_project


def kernline(*args: str) -> subprocess.CompletedProcess[str]:
    return subprocess.run([sys.executable, "-m", "kernline.app.cli", *args], capture_output=True, text=True, timeout=120)


@pytest.mark.parametrize(
    ("value", "words"),
    [
        ("1 ft 4", "ends with a number that has no unit"),
        ("6 1/2", "has no unit"),
        ("in", "is a unit with no number"),
        ("ft 12", "starts with a unit"),
        ("--12 in", "more than one sign"),
        ("2 ft ft", "a unit right after a unit"),
        ("2.5.1 ft", "malformed number"),
        ("1/0 ft", "divides by zero"),
        ("nan ft", "not a finite number"),
        ("٢٤ in", "digit other than 0-9"),
    ],
)
@pytest.mark.parametrize("command", [["check"], ["size", "--write"]], ids=" ".join)
def test_a_refused_quantity_exits_2_naming_the_field_and_leaves_the_file(tmp_path: Path, value, words, command):
    """The C3 width typed wrongly: exit 2, one line naming walls[2].footing.width, the file unchanged."""
    raw = demo_raw()
    raw["walls"][2]["footing"]["width"] = value
    path = write_project(tmp_path / "p.kernline", raw)
    before = path.read_bytes()
    result = kernline(command[0], str(path), *command[1:])
    assert result.returncode == 2
    lines = result.stderr.strip().splitlines()
    assert len(lines) == 1 and "walls[2].footing.width" in lines[0] and words in lines[0]
    assert "Traceback" not in result.stderr
    assert path.read_bytes() == before


@pytest.mark.parametrize(
    ("mutate", "field"),
    [
        (lambda r: r["soil"].__setitem__("allowable_bearing_pressure", r["soil"].pop("allowable_bearing")), "allowable_bearing"),
        (lambda r: r.pop("soil"), "soil"),
        (lambda r: r.__setitem__("Loads", []), "Loads"),
        (lambda r: r["criteria"].__setitem__("S_DS", r["criteria"].pop("sds")), "criteria.S_DS"),
        (lambda r: r["criteria"].pop("sds"), "criteria.sds"),
    ],
)
def test_missing_or_misspelt_site_values_exit_2(tmp_path: Path, mutate, field):
    """A misspelt or missing site value is refused (it used to be replaced by a default and pass)."""
    raw = demo_raw()
    mutate(raw)
    path = write_project(tmp_path / "p.kernline", raw)
    before = path.read_bytes()
    result = kernline("size", str(path), "--write")
    assert result.returncode == 2 and field in result.stderr
    assert path.read_bytes() == before


def test_assumptions_are_listed_under_the_table(tmp_path: Path):
    """`kernline check` prints each defaulted value with its basis under the results table."""
    raw = demo_raw()
    del raw["walls"][0]["footing"]["unit_weight"]
    path = write_project(tmp_path / "p.kernline", raw)
    result = kernline("check", str(path))
    assert result.returncode == 1  # the demo's C3 fails bearing
    table, _, listed = result.stdout.partition("Assumed (not in the project file")
    assert "C3" in table
    assert "walls[0].footing.unit_weight" in listed and "150 pcf" in listed and "common practice" in listed


def test_warnings_go_to_stderr_and_leave_the_exit_code(tmp_path: Path):
    """S_DS entered as 0 with E loads warns on stderr and in the JSON; the exit code is the checks' own."""
    raw = demo_raw()
    raw["walls"] = [raw["walls"][0]]  # N1 passes
    raw["criteria"]["sds"] = 0.0
    path = write_project(tmp_path / "p.kernline", raw)
    result = kernline("check", str(path))
    assert result.returncode == 0
    assert "warning: criteria.sds:" in result.stderr
    as_json = kernline("check", "--json", str(path))
    assert as_json.returncode == 0
    doc = json.loads(as_json.stdout)
    assert [w["field"] for w in doc["warnings"]] == ["criteria.sds"]
    assert all({"field", "value", "basis"} == set(a) for a in doc["assumptions"])


def test_users_own_keys_survive_size_write(tmp_path: Path):
    """ "extra" and "x-" keys are kept exactly when `size --write` stores the sizes."""
    raw = demo_raw()
    raw["extra"] = {"drawing": "S-201", "nested": [1, 2, {"a": None}]}
    raw["walls"][0]["x-note"] = "verify with architect"
    path = write_project(tmp_path / "p.kernline", raw)
    result = kernline("size", str(path), "--write")
    assert result.returncode in (0, 1), result.stderr
    after = json.loads(path.read_text(encoding="utf-8"))
    assert after["extra"] == raw["extra"] and after["walls"][0]["x-note"] == "verify with architect"

"""The headless ``kernline`` commands: exit codes, messages, JSON, --write, and no Qt import."""

import json
import subprocess
import sys

import pytest
from kernline.app import cli
from kernline.engine.resources import resource_path

DEMO = str(resource_path("demo.kernline"))


def run(*args: str) -> subprocess.CompletedProcess:
    return subprocess.run([sys.executable, "-m", "kernline.app.cli", *args], capture_output=True, text=True, timeout=120)


def test_check_demo_prints_table_and_exits_1_for_the_failing_wall(capsys):
    """The demo has one wall (C3) that fails bearing as drawn: exit 1, and the table says so."""
    code = cli.main(["check", DEMO])
    out = capsys.readouterr().out
    assert code == 1
    assert "C3" in out and "FAIL" in out and "NG" in out
    assert "licensed engineer" in out


def test_check_json_follows_the_results_format(capsys):
    """--json prints format kernline-results v1 with governing cases and every case."""
    cli.main(["check", DEMO, "--json"])
    doc = json.loads(capsys.readouterr().out)
    assert doc["format"] == "kernline-results" and doc["version"] == 1
    wall = doc["walls"][0]
    # the demo has a concrete section: the strength checks join the stability ones
    assert set(wall["governing"]) == {"overturning", "sliding", "bearing", "embedment", "flexure", "one_way_shear"}
    assert {"plain", "transverse", "longitudinal"} <= set(wall["concrete"])
    assert "q_max" in wall["governing"]["bearing"]
    assert {"combination", "direction", "vertical", "lateral"} <= set(wall["cases"][0])
    assert set(wall["footing"]) == {"width", "thickness", "length"}


def test_bad_input_exits_2_with_the_field_and_no_traceback(tmp_path):
    raw = json.loads(resource_path("demo.kernline").read_text(encoding="utf-8"))
    raw["walls"][1]["footing"]["width"] = "24"
    path = tmp_path / "bad.kernline"
    path.write_text(json.dumps(raw), encoding="utf-8")
    result = run("check", str(path))
    assert result.returncode == 2
    assert 'walls[1].footing.width: "24" has no unit; expected a length such as "24 in"' in result.stderr
    assert "Traceback" not in result.stderr + result.stdout


def test_missing_file_exits_2(tmp_path):
    result = run("check", str(tmp_path / "nope.kernline"))
    assert result.returncode == 2 and "no such file" in result.stderr


def test_size_write_stores_sizes_and_keeps_the_rest(tmp_path, capsys):
    """size --write changes only footing sizes; afterwards every wall passes its check."""
    path = tmp_path / "demo.kernline"
    assert cli.main(["demo", "--save", str(path)]) == 0
    raw = json.loads(path.read_text(encoding="utf-8"))
    raw["x-office"] = {"job": "keep me"}
    path.write_text(json.dumps(raw, indent=2), encoding="utf-8")
    assert cli.main(["size", str(path), "--write"]) == 0
    after = json.loads(path.read_text(encoding="utf-8"))
    assert after["x-office"] == {"job": "keep me"}
    for before_wall, after_wall in zip(raw["walls"], after["walls"], strict=True):
        assert {k: v for k, v in before_wall.items() if k != "footing"} == {k: v for k, v in after_wall.items() if k != "footing"}
        assert after_wall["footing"]["width"].endswith(" in")
    capsys.readouterr()
    assert cli.main(["check", str(path)]) == 0


def test_size_json_carries_the_sizing_record(capsys):
    cli.main(["size", DEMO, "--json"])
    doc = json.loads(capsys.readouterr().out)
    sizing = doc["walls"][2]["sizing"]
    assert sizing["feasible"] is True
    assert sizing["candidates"] > 1000
    assert doc["walls"][2]["footing"]["width"] == pytest.approx(sizing["width"])


def test_headless_commands_do_not_import_qt(tmp_path):
    """check and size must run where Qt is absent: they import no PySide6 or pyqtgraph."""
    code = (
        "import sys; from kernline.app import cli; "
        f"cli.main(['check', {DEMO!r}]); cli.main(['size', {DEMO!r}]); "
        "bad = [m for m in sys.modules if m.startswith(('PySide6', 'pyqtgraph', 'reportlab'))]; "
        "print('QT', bad); sys.exit(1 if bad else 0)"
    )
    result = subprocess.run([sys.executable, "-c", code], capture_output=True, text=True, timeout=120)
    assert result.returncode == 0, result.stdout[-500:] + result.stderr[-500:]


def test_version(capsys):
    with pytest.raises(SystemExit) as exit_:
        cli.main(["--version"])
    assert exit_.value.code == 0
    assert capsys.readouterr().out.startswith("kernline ")


def test_json_never_carries_nan_or_infinity(tmp_path, capsys):
    """No-demand ratios and unstable pressures are null; the governing case of a no-demand check too."""
    raw = json.loads(resource_path("demo.kernline").read_text(encoding="utf-8"))
    raw["walls"][0]["loads"] = [load for load in raw["walls"][0]["loads"] if load["case"] in ("D", "L")]
    path = tmp_path / "p.kernline"
    path.write_text(json.dumps(raw), encoding="utf-8")
    cli.main(["check", str(path), "--json"])
    text = capsys.readouterr().out
    assert "NaN" not in text and "Infinity" not in text
    overturning = json.loads(text)["walls"][0]["governing"]["overturning"]
    assert overturning["ratio"] is None and overturning["combination"] is None


def test_missing_file_is_named_once(tmp_path):
    result = run("check", str(tmp_path / "nope.kernline"))
    assert result.stderr.count("nope.kernline") == 1


def test_window_without_a_display_says_so(monkeypatch, capsys):
    """With no display and no Qt platform chosen, the window command explains instead of aborting."""
    monkeypatch.delenv("QT_QPA_PLATFORM", raising=False)
    monkeypatch.delenv("DISPLAY", raising=False)
    monkeypatch.delenv("WAYLAND_DISPLAY", raising=False)
    monkeypatch.setattr(sys, "platform", "linux")
    assert cli.main(["demo"]) == cli.EXIT_INTERNAL
    assert "no display" in capsys.readouterr().err

"""Recovery after a crash: one record per document, live owners left alone (in this process or
another), orphans offered at the next launch, damaged records set aside, absolute paths kept."""

from __future__ import annotations

import json
import os
import subprocess
import sys
from pathlib import Path

import pytest
from kernline.app import recovery
from kernline.engine.project_file import load_project
from window_helpers import field, type_into

ROOT = Path(__file__).resolve().parents[2]

# A second Kernline process in miniature: it writes its record for a document, holds the record's
# lock and waits on stdin (as a window holds it for the life of its document).
OTHER_PROCESS = """
import json, sys
from pathlib import Path
from kernline.app.recovery import RecoverySlot
folder, document, raw_file = sys.argv[1:4]
slot = RecoverySlot(Path(folder), Path(document), "0123456789abcdef0123456789abcdef")
slot.acquire()
slot.write(json.loads(Path(raw_file).read_text(encoding="utf-8")), name="Held by another process")
print(slot.record, flush=True)
sys.stdin.readline()
"""


def records(folder: Path) -> list[Path]:
    return sorted(folder.glob("*" + recovery.SUFFIX)) if folder.is_dir() else []


def dead_pid() -> int:
    """The id of a process that has ended (and been reaped)."""
    done = subprocess.run([sys.executable, "-c", "import os; print(os.getpid())"], capture_output=True, text=True, check=True)
    return int(done.stdout)


def crash(window) -> Path:
    """Leave the window's record as a crash would: written, its lock let go, its owner gone."""
    assert window.autosave_now()
    slot = window.recovery_slot
    window.autosave_timer.stop()
    window.recovery_slot = None  # the window no longer owns (or removes) it
    slot.lock.release()  # the operating system lets go of a dead process's locks
    data = json.loads(slot.record.read_text(encoding="utf-8"))
    data["pid"], data["started"] = dead_pid(), None
    slot.record.write_text(json.dumps(data), encoding="utf-8")
    window.document.undo_stack.setClean()
    window.hide()
    return slot.record


def test_two_windows_keep_a_record_each_and_closing_one_keeps_the_other(qtbot, make_window, demo_file, tmp_path):
    first = make_window(str(demo_file), autosave_ms=20)
    second = make_window(None, demo=True, autosave_ms=20)
    type_into(qtbot, field(first, "footing", "width"), "23")
    type_into(qtbot, field(second, "footing", "width"), "25")
    qtbot.waitUntil(lambda: first.recovery_path.is_file() and second.recovery_path.is_file(), timeout=5000)
    assert first.recovery_path != second.recovery_path
    assert len(records(tmp_path / "recovery")) == 2
    one = json.loads(first.recovery_path.read_text(encoding="utf-8"))
    two = json.loads(second.recovery_path.read_text(encoding="utf-8"))
    assert one["project"]["walls"][0]["footing"]["width"] == "23 in" and one["path"] == str(demo_file)
    assert two["project"]["walls"][0]["footing"]["width"] == "25 in" and two["path"] is None and two["demo"]
    assert one["pid"] == os.getpid() and one["format"] == recovery.FORMAT and one["version"] == recovery.VERSION

    kept = second.recovery_path
    first.document.undo_stack.setClean()
    first.close()
    assert records(tmp_path / "recovery") == [kept]
    assert json.loads(kept.read_text(encoding="utf-8")) == two


def test_a_live_windows_record_is_not_offered_to_another_window(qtbot, make_window, demo_file, dialogs):
    busy = make_window(str(demo_file))
    type_into(qtbot, field(busy, "footing", "width"), "23")
    assert busy.autosave_now()
    text = busy.recovery_path.read_bytes()
    make_window(None, demo=False)
    assert dialogs.recovery_offers == []
    assert busy.recovery_path.read_bytes() == text


@pytest.fixture
def other_process(tmp_path, demo_file):
    raw_file = tmp_path / "other-raw.json"
    raw = json.loads(demo_file.read_text(encoding="utf-8"))
    raw["walls"][0]["footing"]["width"] = "27 in"
    raw_file.write_text(json.dumps(raw), encoding="utf-8")
    env = dict(os.environ, PYTHONPATH=str(ROOT) + os.pathsep + os.environ.get("PYTHONPATH", ""))
    proc = subprocess.Popen(
        [sys.executable, "-c", OTHER_PROCESS, str(tmp_path / "recovery"), str(demo_file), str(raw_file)],
        stdin=subprocess.PIPE,
        stdout=subprocess.PIPE,
        text=True,
        env=env,
    )
    record = Path(proc.stdout.readline().strip())
    yield proc, record
    if proc.poll() is None:
        proc.kill()
        proc.wait()


def test_a_record_held_by_another_process_is_left_alone_until_that_process_dies(
    qtbot, make_window, demo_file, dialogs, other_process
):
    proc, record = other_process
    assert record.is_file()
    held = record.read_bytes()

    window = make_window(str(demo_file), autosave_ms=20)
    assert dialogs.recovery_offers == []  # not offered
    type_into(qtbot, field(window, "footing", "width"), "22")
    qtbot.waitUntil(window.recovery_path.is_file, timeout=5000)
    window.document.undo_stack.setClean()
    window.close()
    assert record.read_bytes() == held  # not overwritten, not deleted

    proc.kill()
    proc.wait()
    dialogs.recovery_answer = "restore"
    restored = make_window(None, demo=False)
    assert [o.title for o in dialogs.recovery_offers[-1]] == ["Held by another process"]
    doc = restored.document
    assert doc.path == demo_file and doc.raw["walls"][0]["footing"]["width"] == "27 in"
    assert not record.exists()  # the work now lives in the restoring window's own record
    assert restored.recovery_path.is_file()


def test_a_damaged_record_is_set_aside_and_the_launch_goes_on(make_window, tmp_path, dialogs):
    folder = tmp_path / "recovery"
    folder.mkdir()
    bad = folder / ("unsaved-deadbeef" + recovery.SUFFIX)
    bad.write_text('{"format": "kernline-recovery", "version": 2, "proj', encoding="utf-8")
    window = make_window(None, demo=True)
    assert not bad.exists()
    aside = bad.with_name(bad.name + recovery.CORRUPT_SUFFIX)
    assert aside.read_text(encoding="utf-8").startswith('{"format"')  # kept, not deleted
    assert "set aside" in window.statusBar().currentMessage() and str(aside) in window.statusBar().currentMessage()
    assert window.document.is_demo and dialogs.recovery_offers == []  # the launch went on as asked


def test_a_restored_document_saves_to_its_absolute_path(qtbot, make_window, demo_file, tmp_path, dialogs, monkeypatch):
    """Opened by a relative path, crashed, restored from another folder: Save writes the original file."""
    monkeypatch.chdir(demo_file.parent)
    crashed = make_window("clinic.kernline")
    assert crashed.document.path == demo_file and crashed.document.path.is_absolute()
    type_into(qtbot, field(crashed, "footing", "width"), "23")
    crash(crashed)

    elsewhere = tmp_path / "elsewhere"
    elsewhere.mkdir()
    monkeypatch.chdir(elsewhere)
    dialogs.recovery_answer = "restore"
    restarted = make_window(None, demo=False)
    doc = restarted.document
    assert doc.path == demo_file
    assert doc.dirty and restarted.isWindowModified()
    assert restarted.save()
    assert load_project(demo_file).raw["walls"][0]["footing"]["width"] == "23 in"
    assert list(elsewhere.iterdir()) == []  # no stray copy in the working folder
    assert records(tmp_path / "recovery") == []


def test_every_orphan_is_offered_and_each_restored_in_a_window(qtbot, make_window, demo_file, dialogs, tmp_path):
    a = make_window(str(demo_file))
    type_into(qtbot, field(a, "footing", "width"), "23")
    b = make_window(None, demo=True)
    type_into(qtbot, field(b, "footing", "width"), "26")
    crash(a)
    crash(b)
    dialogs.recovery_answer = "restore"
    first = make_window(str(demo_file))
    assert len(dialogs.recovery_offers[-1]) == 2
    assert len(first.spawned) == 1  # the second document opened in a window of its own
    docs = [first.document, first.spawned[0].document]
    widths = sorted(d.raw["walls"][0]["footing"]["width"] for d in docs)
    assert widths == ["23 in", "26 in"]
    assert {d.path for d in docs} == {demo_file, None}
    assert first.spawned[0].isVisible()
    # two live windows, one record each; the orphans are gone
    assert sorted(records(tmp_path / "recovery")) == sorted([first.recovery_path, first.spawned[0].recovery_path])


def test_an_unticked_orphan_is_discarded_and_later_keeps_them_all(qtbot, make_window, demo_file, dialogs, tmp_path):
    a = make_window(str(demo_file))
    type_into(qtbot, field(a, "footing", "width"), "23")
    record = crash(a)
    make_window(None, demo=False)  # "Decide later"
    assert record.is_file()
    dialogs.recovery_answer = "restore"
    dialogs.recovery_untick = {0}
    window = make_window(None, demo=False)
    assert not record.exists()
    assert window.welcome_shown and records(tmp_path / "recovery") == []


def test_undo_back_to_the_saved_state_removes_the_record(qtbot, make_window, demo_file):
    window = make_window(str(demo_file), autosave_ms=20)
    type_into(qtbot, field(window, "footing", "width"), "23")
    qtbot.waitUntil(window.recovery_path.is_file, timeout=5000)
    window.document.undo_stack.undo()
    assert not window.document.dirty
    assert not window.recovery_path.exists()
    window.document.undo_stack.redo()
    qtbot.waitUntil(window.recovery_path.is_file, timeout=5000)  # changed again: written again


def test_saving_removes_the_record_and_save_as_moves_the_slot(qtbot, make_window, demo_file, dialogs, tmp_path):
    window = make_window(str(demo_file))
    type_into(qtbot, field(window, "footing", "width"), "23")
    assert window.autosave_now()
    before = window.recovery_path
    dialogs.save_path = str(tmp_path / "copy.kernline")
    assert window.save_as()
    assert not before.exists() and not window.recovery_path.exists()
    assert window.recovery_slot.record.name != before.name  # keyed by the new file
    assert records(tmp_path / "recovery") == []


def test_nothing_is_autosaved_without_changes(window):
    assert not window.autosave_now()
    assert not window.recovery_path.exists()


def test_a_record_of_the_old_shared_file_is_offered(make_window, tmp_path, dialogs, demo_file):
    """The single autosave file of earlier versions (no pid, no lock) is offered like any orphan."""
    folder = tmp_path / "recovery"
    folder.mkdir()
    raw = json.loads(demo_file.read_text(encoding="utf-8"))
    old = {
        "format": "kernline-recovery",
        "version": 1,
        "saved": "2025-01-02 03:04:05",
        "path": "clinic.kernline",
        "demo": False,
        "project": raw,
    }
    (folder / "autosave.kernline-recovery").write_text(json.dumps(old), encoding="utf-8")
    dialogs.recovery_answer = "restore"
    window = make_window(None, demo=False)
    assert len(dialogs.recovery_offers) == 1
    assert window.document.raw == raw
    assert window.document.path is None  # a relative path names no file for sure: Save asks where


# ---- the records themselves --------------------------------------------------------------------------


def test_a_reused_process_id_is_not_a_live_owner(tmp_path):
    """A record whose pid is alive but started at another time (a reused pid) and whose lock is free is an orphan."""
    started = recovery.process_start_time(os.getpid())
    if started is None:
        pytest.skip("process start times are read on Linux only")
    assert recovery.process_alive(os.getpid(), started)
    assert not recovery.process_alive(os.getpid(), str(int(started) + 1))
    slot = recovery.RecoverySlot(tmp_path, None, recovery.new_session())
    slot.write({"format": "kernline-project"})
    slot.lock.release()
    data = json.loads(slot.record.read_text(encoding="utf-8"))
    data["started"] = str(int(started) + 1)
    slot.record.write_text(json.dumps(data), encoding="utf-8")
    assert [o.record for o in recovery.scan(tmp_path).orphans] == [slot.record]
    data["started"] = started
    slot.record.write_text(json.dumps(data), encoding="utf-8")
    assert recovery.scan(tmp_path).orphans == ()  # the same process: alive


def test_a_held_lock_is_seen_from_another_descriptor(tmp_path):
    slot = recovery.RecoverySlot(tmp_path, tmp_path / "a.kernline", recovery.new_session())
    slot.acquire()
    lock = recovery.lock_path_of(slot.record)
    assert recovery.lock_state(lock) == "held"
    assert recovery.Lock.take(lock) is None
    slot.release()
    assert not lock.exists() and recovery.lock_state(lock) == "free"


def test_the_record_name_hashes_the_absolute_path(tmp_path, monkeypatch):
    monkeypatch.chdir(tmp_path)
    session = recovery.new_session()
    assert recovery.record_name(Path("a.kernline"), session) == recovery.record_name(tmp_path / "a.kernline", session)
    assert recovery.record_name(tmp_path / "b.kernline", session) != recovery.record_name(tmp_path / "a.kernline", session)
    assert recovery.record_name(None, session) == f"unsaved-{session}{recovery.SUFFIX}"


def test_the_dialog_restores_the_ticked_and_discards_the_rest(qtbot, tmp_path):
    from kernline.app.views.recovery_dialog import RecoveryDialog
    from PySide6.QtCore import Qt

    orphans = [
        recovery.Orphan(
            record=tmp_path / f"{n}.kernline-recovery", raw={"project": {"name": n}}, path=None, saved="", name=n, demo=False
        )
        for n in ("one", "two")
    ]
    dialog = RecoveryDialog(orphans)
    qtbot.addWidget(dialog)
    assert "two" in dialog.list.item(1).text() and "never saved" in dialog.list.item(1).text()
    dialog.list.item(1).setCheckState(Qt.CheckState.Unchecked)
    dialog.restore_button.click()
    choice = dialog.choice()
    assert [o.name for o in choice.restore] == ["one"] and [o.name for o in choice.discard] == ["two"]


def test_a_record_whose_project_cannot_be_used_is_set_aside_with_a_message(make_window, tmp_path, dialogs):
    folder = tmp_path / "recovery"
    folder.mkdir()
    record = folder / ("unsaved-0ff1ce" + recovery.SUFFIX)
    unusable = {"format": "kernline-project", "version": 1, "walls": []}
    record.write_text(
        json.dumps({"format": recovery.FORMAT, "version": 2, "pid": dead_pid(), "project": unusable}), encoding="utf-8"
    )
    dialogs.recovery_answer = "restore"
    window = make_window(None, demo=True)
    assert len(dialogs.recovery_offers) == 1
    assert "Cannot restore" in dialogs.warnings[0] and "walls" in dialogs.warnings[0]
    assert not record.exists() and record.with_name(record.name + recovery.CORRUPT_SUFFIX).is_file()
    assert window.document.is_demo  # the launch went on


def test_launch_goes_on_past_a_damaged_record(qapp, monkeypatch, tmp_path):
    """`kernline demo` with a damaged record in the folder: the window opens and the run ends with 0."""
    from test_launch import _run_launch

    folder = tmp_path / "recovery"
    folder.mkdir()
    (folder / ("x" + recovery.SUFFIX)).write_text("[1, 2]", encoding="utf-8")  # JSON, but no record
    code, seen = _run_launch(monkeypatch, tmp_path, demo=True)
    assert code == 0 and seen and seen[0][0].endswith("(demo)")
    assert (folder / ("x" + recovery.SUFFIX + recovery.CORRUPT_SUFFIX)).is_file()


def test_a_document_whose_folder_is_gone_is_restored_and_says_to_save_as(qtbot, make_window, tmp_path, dialogs):
    folder = tmp_path / "job"
    folder.mkdir()
    path = folder / "clinic.kernline"
    path.write_bytes((ROOT / "resources" / "demo.kernline").read_bytes())
    crashed = make_window(str(path))
    type_into(qtbot, field(crashed, "footing", "width"), "23")
    crash(crashed)
    path.unlink()
    folder.rmdir()
    dialogs.recovery_answer = "restore"
    window = make_window(None, demo=False)
    assert window.document.path == path and window.document.raw["walls"][0]["footing"]["width"] == "23 in"
    assert "no longer exists" in window.statusBar().currentMessage() and "Save As" in window.statusBar().currentMessage()
    assert window.recovery_path.is_file()  # still safe in this window's own record

"""Before the window starts, a missing display library is named as a Debian package in one line.

Basis: issue 13 (a new user's install aborted with Qt's raw message about xcb-cursor0). The library
lists are the xcb and wayland plugins' own dependencies (``readelf -d`` of PySide6's plugins); the
loader is replaced here by a fake so the tests run on any machine.
"""

from __future__ import annotations

import kernline.app.main_window as main_window
from kernline.app import qt_platform
from kernline.app.qt_platform import XCB_LIBRARIES, candidates, platform_problem, probe

X11 = {"DISPLAY": ":0"}


def without(*absent: str):
    """A fake loader that finds every library except ``absent``."""
    return lambda soname: soname not in absent


def test_a_missing_xcb_cursor_names_its_package():
    line = platform_problem(X11, without("libxcb-cursor.so.0"))
    assert line is not None and "\n" not in line
    assert line.endswith("sudo apt-get install libxcb-cursor0")
    assert "libxcb-cursor.so.0" in line and "X display" in line


def test_every_missing_library_is_named_once_with_its_package():
    line = platform_problem(X11, without("libxcb-icccm.so.4", "libxkbcommon-x11.so.0", "libxcb-keysyms.so.1"))
    assert line is not None
    assert line.endswith("install libxcb-icccm4 libxcb-keysyms1 libxkbcommon-x11-0")


def test_nothing_is_said_when_every_library_loads():
    assert platform_problem(X11, without()) is None


def test_offscreen_and_other_plugins_are_not_probed():
    asked = []

    def find(soname):
        asked.append(soname)
        return False

    for name in ("offscreen", "minimal", "vnc"):
        assert platform_problem({"QT_QPA_PLATFORM": name, "DISPLAY": ":0"}, find) is None
    assert asked == []


def test_xcb_without_a_display_is_left_to_the_command_line():
    """No DISPLAY: Qt fails for want of a display, which `kernline` reports itself; nothing is probed."""
    assert platform_problem({}, lambda _s: False) is None


def test_a_wayland_session_falls_back_to_xcb_like_qt():
    env = {"XDG_SESSION_TYPE": "wayland", "WAYLAND_DISPLAY": "wayland-0", "DISPLAY": ":0"}
    assert candidates(env) == ["wayland", "xcb"]
    assert candidates({"DISPLAY": ":0"}) == ["xcb"]
    # wayland loads: xcb's lack does not matter
    assert platform_problem(env, without("libxcb-cursor.so.0")) is None
    # neither loads: the line names what the fallback (xcb) lacks
    failed = probe(env, without("libwayland-cursor.so.0", "libxcb-cursor.so.0"))
    assert [p.platform for p in failed] == ["wayland", "xcb"]
    assert platform_problem(env, without("libwayland-cursor.so.0", "libxcb-cursor.so.0")).endswith("install libxcb-cursor0")


def test_an_explicit_platform_list_with_options_is_read_like_qt():
    assert candidates({"QT_QPA_PLATFORM": "xcb:nograb; offscreen"}) == ["xcb", "offscreen"]
    # xcb lacks a library but offscreen follows: Qt would use offscreen
    assert platform_problem({"QT_QPA_PLATFORM": "xcb;offscreen", "DISPLAY": ":0"}, without("libxcb.so.1")) is None
    line = platform_problem({"QT_QPA_PLATFORM": "wayland", "WAYLAND_DISPLAY": "w"}, without("libwayland-client.so.0"))
    assert line is not None and line.endswith("install libwayland-client0") and "Wayland display" in line


def test_the_real_loader_finds_the_c_library_and_not_a_made_up_one():
    assert qt_platform.loadable("libc.so.6")
    assert not qt_platform.loadable("libkernline-no-such-library.so.0")


def test_each_library_has_one_package():
    libs = [lib for lib, _ in XCB_LIBRARIES]
    assert len(libs) == len(set(libs))


def test_launch_prints_the_line_and_returns_3_without_making_a_window(qapp, monkeypatch, capsys):
    monkeypatch.setenv("QT_QPA_PLATFORM", "xcb")
    monkeypatch.setenv("DISPLAY", ":99")
    monkeypatch.setattr(qt_platform, "loadable", without("libxcb-cursor.so.0"))
    made = []
    monkeypatch.setattr(main_window, "MainWindow", lambda *a, **k: made.append(1))
    assert main_window.launch(demo=True) == 3
    err = capsys.readouterr().err
    assert err.count("\n") == 1 and "libxcb-cursor0" in err
    assert made == []

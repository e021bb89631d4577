"""Before the window starts: can Qt's display plugin load here? If not, one line naming the package.

Qt loads a "platform plugin" for the display (``xcb`` for X11, ``wayland`` for Wayland). When a
system library the plugin links against is missing, Qt prints several lines about plugins and aborts
the process. :func:`platform_problem` looks for the same shared libraries first, with the system's
own loader (so ``LD_LIBRARY_PATH`` and the loader cache count exactly as they will for Qt), and
returns one line that names the Debian packages to install instead.

The library lists are the ``NEEDED`` entries of PySide6's ``libqxcb.so`` / ``libQt6XcbQpa.so.6`` and
``libqwayland.so`` / ``libQt6WaylandClient.so.6`` that are not part of Qt itself or of the C and C++
runtimes (read with ``readelf -d`` from PySide6-Essentials 6.10); the package names are Debian 12's
(Ubuntu 22.04 and later use the same names).

No Qt is imported here: the probe has to run before a ``QApplication`` exists.
"""

from __future__ import annotations

import ctypes
import os
from collections.abc import Callable, Mapping
from dataclasses import dataclass

EXIT_NO_PLATFORM = 3  # the window cannot start here: the same code as the command line's internal error

# (shared library, Debian package) that the xcb plugin needs, beyond Qt and the C/C++ runtimes.
XCB_LIBRARIES: tuple[tuple[str, str], ...] = (
    ("libxcb-cursor.so.0", "libxcb-cursor0"),
    ("libxcb-icccm.so.4", "libxcb-icccm4"),
    ("libxcb-util.so.1", "libxcb-util1"),
    ("libxcb-image.so.0", "libxcb-image0"),
    ("libxcb-keysyms.so.1", "libxcb-keysyms1"),
    ("libxcb-randr.so.0", "libxcb-randr0"),
    ("libxcb-render-util.so.0", "libxcb-render-util0"),
    ("libxcb-render.so.0", "libxcb-render0"),
    ("libxcb-shape.so.0", "libxcb-shape0"),
    ("libxcb-shm.so.0", "libxcb-shm0"),
    ("libxcb-sync.so.1", "libxcb-sync1"),
    ("libxcb-xfixes.so.0", "libxcb-xfixes0"),
    ("libxcb-xkb.so.1", "libxcb-xkb1"),
    ("libxcb.so.1", "libxcb1"),
    ("libX11-xcb.so.1", "libx11-xcb1"),
    ("libX11.so.6", "libx11-6"),
    ("libxkbcommon-x11.so.0", "libxkbcommon-x11-0"),
    ("libxkbcommon.so.0", "libxkbcommon0"),
    ("libGL.so.1", "libgl1"),
)

# (shared library, Debian package) that the wayland plugin needs, beyond Qt and the C/C++ runtimes.
WAYLAND_LIBRARIES: tuple[tuple[str, str], ...] = (
    ("libwayland-client.so.0", "libwayland-client0"),
    ("libwayland-cursor.so.0", "libwayland-cursor0"),
    ("libxkbcommon.so.0", "libxkbcommon0"),
    ("libGL.so.1", "libgl1"),
)

PROBED = {"xcb": XCB_LIBRARIES, "wayland": WAYLAND_LIBRARIES}

Finder = Callable[[str], bool]


def loadable(soname: str) -> bool:
    """True when the system's loader can load the shared library ``soname`` (as Qt's plugin loader would)."""
    try:
        ctypes.CDLL(soname)
    except OSError:
        return False
    return True


def candidates(environ: Mapping[str, str]) -> list[str]:
    """The platform plugins Qt will try, in order, from the environment.

    ``QT_QPA_PLATFORM`` may name several, separated by ";", each with options after ":"
    ("xcb:nograb;offscreen"). Unset, Qt 6 may try wayland first where a Wayland display is set
    (``WAYLAND_DISPLAY``) and falls back to xcb; elsewhere it uses xcb. Both are taken as candidates
    then, so the window is never stopped while either could load.
    """
    text = environ.get("QT_QPA_PLATFORM", "").strip()
    if text:
        return [part.split(":")[0].strip().lower() for part in text.split(";") if part.strip()]
    if environ.get("WAYLAND_DISPLAY"):
        return ["wayland", "xcb"]
    return ["xcb"]


@dataclass(frozen=True, slots=True)
class Probe:
    """What one platform plugin lacks: its name and the (library, package) pairs not found."""

    platform: str
    missing: tuple[tuple[str, str], ...]


def probe(environ: Mapping[str, str] | None = None, find: Finder | None = None) -> list[Probe]:
    """Probe each platform Qt will try that has a display to talk to; stop at the first that can load.

    xcb is probed only when ``DISPLAY`` is set and wayland only when ``WAYLAND_DISPLAY`` is (without
    them Qt fails for want of a display, which the command line reports itself); any other plugin
    (offscreen, minimal, vnc, eglfs) is taken as loadable. Returns the probes of the platforms that
    cannot load, in Qt's order; empty when one can.
    """
    env = os.environ if environ is None else environ
    find = loadable if find is None else find
    failed: list[Probe] = []
    for platform in candidates(env):
        libraries = PROBED.get(platform)
        display = {"xcb": "DISPLAY", "wayland": "WAYLAND_DISPLAY"}.get(platform)
        if libraries is None or display is None or not env.get(display):
            return []
        missing = tuple((lib, package) for lib, package in libraries if not find(lib))
        if not missing:
            return []
        failed.append(Probe(platform, missing))
    return failed


def platform_problem(environ: Mapping[str, str] | None = None, find: Finder | None = None) -> str | None:
    """One line naming the Debian packages to install when no platform plugin Qt will try can load, else None."""
    failed = probe(environ, find)
    if not failed:
        return None
    # the plugin Qt falls back to last is the one a user is most likely to fix (xcb in a Wayland session too)
    last = failed[-1]
    packages = list(dict.fromkeys(package for _lib, package in last.missing))
    libraries = ", ".join(lib for lib, _package in last.missing)
    display = "an X display" if last.platform == "xcb" else "a Wayland display"
    return (
        f"kernline: the window cannot open on {display}: Qt's {last.platform} platform plugin needs {libraries}, "
        f"not found. Install: sudo apt-get install {' '.join(packages)}"
    )

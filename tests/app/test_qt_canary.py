"""Canary for the PySide6 6.12.0 / Python 3.11 bool_dealloc abort.

PySide6 (shiboken6) 6.12.0 on Python 3.11 drops a reference to True/False on every Signal.emit()
made from Python; after a few hundred emits the interpreter aborts with "Fatal Python error:
bool_dealloc". Measured here: the same emit loop aborts on 6.12.0 and runs on 6.11.3 and 6.10.3, hence
the pin PySide6-Essentials >=6.10,<6.12. pyqtgraph emits such signals on every redraw, so a live plot
dies after a few hundred redraws. The emits run in a child process, so an abort fails this test with
its message instead of killing the whole run.
"""

from __future__ import annotations

import os
import subprocess
import sys

EMITS = 10_000

_CHILD = f"""
from PySide6 import QtCore

class Source(QtCore.QObject):
    fired = QtCore.Signal(object)

count = 0

def slot(value):
    global count
    count += 1

source = Source()
source.fired.connect(slot)
for _ in range({EMITS}):
    source.fired.emit(source)
print(count)
"""


def test_ten_thousand_signal_emits_leave_the_process_alive():
    """10,000 Signal(object) emits from Python: the process exits normally and the slot ran every time."""
    env = dict(os.environ, QT_QPA_PLATFORM="offscreen")
    done = subprocess.run([sys.executable, "-c", _CHILD], capture_output=True, text=True, timeout=120, env=env)
    assert done.returncode == 0, f"the Qt binding aborted after repeated emits (exit {done.returncode}): {done.stderr[-500:]}"
    assert done.stdout.strip() == str(EMITS)


def test_emits_in_this_process_reach_the_slot(qtbot):
    """The same volume in the test process itself (where pyqtgraph lives) reaches the slot every time."""
    from PySide6 import QtCore

    class Source(QtCore.QObject):
        fired = QtCore.Signal(object)

    received = []
    source = Source()
    source.fired.connect(received.append)
    for _ in range(EMITS):
        source.fired.emit(True)
    assert len(received) == EMITS

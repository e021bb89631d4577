"""Array plumbing the checks and the statics share (no engineering here)."""

from __future__ import annotations

import numpy as np


def full(a: np.ndarray, shape: tuple[int, ...]) -> np.ndarray:
    """``a`` as a read-only array of ``shape``: ``a`` itself when it already has that shape (made
    read-only, as everything that reads an evaluation shares it), else a broadcast view.

    The same values as ``np.broadcast_to(a, shape)`` without the cost of a view where none is needed
    (the sizing grid makes a dozen of these per wall).
    """
    if isinstance(a, np.ndarray) and a.shape == shape:
        a.setflags(write=False)
        return a
    return np.broadcast_to(a, shape)

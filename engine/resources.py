"""Locate Kernline's resource files, from a source checkout, an installed wheel or a frozen build."""

from __future__ import annotations

import sys
from importlib import resources as _importlib_resources
from pathlib import Path

_PACKAGE = "kernline.resources"


def resource_path(name: str) -> Path:
    """Return the path of resource ``name`` (a file name inside ``resources/``).

    Looks in a frozen build's bundle first, then in the installed ``kernline.resources`` package,
    then beside the source tree.
    """
    bundle = getattr(sys, "_MEIPASS", None)
    if bundle:
        candidate = Path(bundle) / "resources" / name
        if candidate.exists():
            return candidate
    try:
        candidate = Path(str(_importlib_resources.files(_PACKAGE).joinpath(name)))
        if candidate.exists():
            return candidate
    except ModuleNotFoundError:
        pass
    return Path(__file__).resolve().parent.parent / "resources" / name

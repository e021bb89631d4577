"""Kernline's engine: global stability checks and sizing of strip footings under shear walls.

Pure Python and numpy; pint only at the edges (:mod:`kernline.engine.units`); no Qt. Results are for
review by a licensed engineer and defer to the local building code and the geotechnical report.

The public facade (what the ``kernline`` command uses; other programs should too):

* load and save: :func:`load_project`, :func:`loads_project`, :func:`save_project`,
  :func:`with_footing_sizes`, :class:`ProjectDocument`, :class:`Project`;
* check: :func:`check_project`, :func:`check_wall`, :func:`results_json`, :class:`WallResult`,
  :class:`Governing`, :func:`warnings_for` (the input warnings);
* size: :func:`size_footing`, :func:`sized_wall`, :func:`sized_footing_values`, :class:`SizingResult`;
* package and schedule: :func:`write_report`, :func:`render_report`, :func:`write_schedule`;
* the registries: :func:`registered_checks`, :func:`code_bases`;
* errors: :class:`EngineError`, :class:`InputError`, :class:`FilePathError`.

Names are loaded on first use (PEP 562), so ``import kernline.engine`` stays cheap and the PDF writer
(reportlab) is imported only by a program that asks for it. No facade name is also the name of a
module of the package (a submodule, once imported, would shadow it).
"""

import os
import sys
from importlib import import_module
from typing import Any


def _installed_version(distribution: str) -> str | None:
    """The version of an installed distribution, as ``importlib.metadata.version`` gives it, or None.

    Reads the ``Version:`` header of the first ``<name>-<version>.dist-info/METADATA`` or
    ``<name>.egg-info`` (``PKG-INFO``) on ``sys.path``, the metadata importlib.metadata finds first,
    and only when there is none asks importlib.metadata itself: importing it (and the email package
    it parses with) costs about 15 ms of every ``kernline check``.
    """
    wanted = _normalized(distribution)
    for entry in sys.path:
        folder = entry or "."
        try:
            names = os.listdir(folder)
        except OSError:  # a zip file, a path hook or a missing folder: left to importlib.metadata
            continue
        for name in names:
            if name.endswith(".dist-info"):
                headers = os.path.join(folder, name, "METADATA")
                stem = name[: -len(".dist-info")]
            elif name.endswith(".egg-info"):
                path = os.path.join(folder, name)
                headers = os.path.join(path, "PKG-INFO") if os.path.isdir(path) else path
                stem = name[: -len(".egg-info")]
            else:
                continue
            if _normalized(stem.split("-", 1)[0]) != wanted:
                continue
            found = _version_header(headers)
            return found if found is not None else _metadata_version(distribution)
    return _metadata_version(distribution)


def _normalized(name: str) -> str:
    """A distribution name as packaging compares them (PEP 503: case and runs of -_. alike)."""
    return "_".join(part for part in name.lower().replace("-", "_").replace(".", "_").split("_") if part)


def _version_header(path: str) -> str | None:
    """The ``Version:`` header of a METADATA or PKG-INFO file, or None."""
    try:
        with open(path, encoding="utf-8") as fh:
            for line in fh:
                if line.startswith("Version:"):
                    return line[len("Version:") :].strip()
                if not line.strip():  # the end of the headers
                    break
    except (OSError, UnicodeDecodeError):
        pass
    return None


def _metadata_version(distribution: str) -> str | None:
    """``importlib.metadata.version``, or None for a distribution that is not installed."""
    from importlib.metadata import PackageNotFoundError, version

    try:
        return version(distribution)
    except PackageNotFoundError:
        return None


__version__ = _installed_version("kernline") or "0.0.0+source"  # "+source": running from a bare source tree

CAUTION = (
    "Results are for review by a licensed engineer. They defer to the local building code and to the "
    "geotechnical report for the site."
)

# Register the checks and the code bases (importing the packages fills the registries).
from . import checks as _checks  # noqa: E402,F401
from . import codes as _codes  # noqa: E402,F401

_FACADE: dict[str, str | tuple[str, str]] = {
    "load_project": "project_file",
    "loads_project": "project_file",
    "save_project": "project_file",
    "with_footing_sizes": "project_file",
    "ProjectDocument": "project_file",
    "Project": "model",
    "Wall": "model",
    "Assumption": "model",
    "check_project": "results",
    "along_lines": "results",
    "check_wall": "results",
    "results_json": "results",
    "WallResult": "results",
    "Governing": "results",
    "warnings_for": ("input_warnings", "input_warnings"),
    "InputWarning": "input_warnings",
    "size_footing": "sizing",
    "sized_wall": "sizing",
    "sized_footing_values": "sizing",
    "SizingResult": "sizing",
    "write_report": "report",
    "render_report": "report",
    "write_schedule": "schedule",
    "check_table": "summary",
    "size_table": "summary",
    "warnings_text": "summary",
    "registered_checks": ("registry", "checks"),
    "code_bases": ("registry", "codes"),
    "EngineError": "errors",
    "InputError": "errors",
    "FilePathError": "file_safety",
    "check_input_file": "file_safety",
    "check_output_path": "file_safety",
    "check_writable": "file_safety",
    "atomic_write_text": "file_safety",
    "resource_path": "resources",
}


def __getattr__(name: str) -> Any:
    """The facade's names, imported from their modules on first use."""
    where = _FACADE.get(name)
    if where is None:
        raise AttributeError(f"module {__name__!r} has no attribute {name!r}")
    module, attribute = where if isinstance(where, tuple) else (where, name)
    value = getattr(import_module(f".{module}", __name__), attribute)
    globals()[name] = value
    return value


__all__ = ["CAUTION", "__version__", *_FACADE]

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

from importlib import import_module
from importlib.metadata import PackageNotFoundError, version
from typing import Any

try:
    __version__ = version("kernline")
except PackageNotFoundError:  # pragma: no cover - running from a bare source tree
    __version__ = "0.0.0+source"

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

"""The check sheets of a wall, registered by check id.

Each entry turns a wall's results into the blocks of one check's calculation (its governing case
with the numbers put in). The stability checks' sheets print on the wall's second stability sheet in
the check registry's order; the strength checks (flexure, one-way shear) share the concrete design
sheet of :mod:`.concrete`, which the package adds as a section of its own. A check without an entry
(embedment) is reported in the results table only.
"""

from __future__ import annotations

from collections.abc import Callable
from typing import TYPE_CHECKING

if TYPE_CHECKING:  # pragma: no cover
    from ..model import Project, Wall
    from ..results import WallResult
    from . import Block, Formatter

CheckSheet = Callable[["Project", "Wall", "WallResult", "Formatter"], "list[Block]"]

CHECK_SHEETS: dict[str, CheckSheet] = {}


def register_sheet(check_id: str, sheet: CheckSheet) -> CheckSheet:
    """Register the sheet of ``check_id`` (one per check)."""
    if check_id in CHECK_SHEETS:
        raise ValueError(f"a sheet for {check_id!r} is registered already")
    CHECK_SHEETS[check_id] = sheet
    return sheet


def _register_builtin() -> None:
    from .bearing import bearing_sheet
    from .overturning import overturning_sheet
    from .sliding import sliding_sheet

    register_sheet("overturning", overturning_sheet)
    register_sheet("sliding", sliding_sheet)
    register_sheet("bearing", bearing_sheet)


_register_builtin()

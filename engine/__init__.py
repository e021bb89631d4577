"""Kernline's engine: global stability checks and sizing of strip footings under shear walls.

Pure Python and numpy; pint only at the edges (:mod:`engine.units`); no Qt. Results are for review
by a licensed engineer and defer to the local building code and the geotechnical report.
"""

from importlib.metadata import PackageNotFoundError, version

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

"""The registered checks, one module each, in the order they are shown.

Importing this package registers them (:mod:`engine.registry`). A new check is a new module here,
imported below; everything that reports on checks loops over :func:`engine.registry.checks`.
"""

from ..registry import Check, CheckArrays, Family, check_by_id, checks
from . import bearing, embedment, flexure, one_way_shear, overturning, sliding  # noqa: F401 - registers them; each sets its display order
from .bearing import BEARING, BearingResult
from .embedment import EMBEDMENT, EmbedmentResult
from .overturning import OVERTURNING, OverturningResult
from .sliding import SLIDING, SlidingResult

__all__ = [
    "BEARING",
    "EMBEDMENT",
    "OVERTURNING",
    "SLIDING",
    "BearingResult",
    "Check",
    "CheckArrays",
    "EmbedmentResult",
    "Family",
    "OverturningResult",
    "SlidingResult",
    "check_by_id",
    "checks",
]

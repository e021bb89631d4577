"""The registered code bases (editions and methods), one module each.

Importing this package registers them (:mod:`engine.registry`); ``criteria.method`` selects one by
id. A new edition is a new module here, imported below.
"""

from ..registry import CodeBasis, code_by_id, codes
from . import asce7_16, asce7_16_lrfd, asce7_22, ibc2021_alt, service_fs  # noqa: F401 - registers them; each sets the order it is offered in

__all__ = ["CodeBasis", "code_by_id", "codes"]

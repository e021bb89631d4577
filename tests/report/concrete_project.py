"""A small project of our own with a concrete section, for the concrete design sheets (not the demo).

R1: a 14 ft concrete wall on a 5 ft × 18 in footing, bars designed by the program, a wind shear at
its top. P2: a 10 ft masonry wall on a plain 30 in × 14 in footing. Loads, soil and names are
invented for these tests.
"""

from __future__ import annotations

import copy
from typing import Any

RAW: dict[str, Any] = {
    "format": "kernline-project",
    "version": 1,
    "project": {
        "name": "Test hall for the concrete sheets",
        "number": "T-11",
        "engineer": "Test Engineer",
        "revision": "B",
        "revision_date": "2026-02-20",
    },
    "units": "US",
    "criteria": {"method": "asce7-16-asd", "sds": 0.5},
    "concrete": {"fc": "3000 psi", "fy": "60 ksi", "cover": "3 in", "lambda": 1.0, "strength_method": "asce7-16-lrfd"},
    "soil": {
        "allowable_bearing": "3000 psf",
        "friction": 0.4,
        "unit_weight": "110 pcf",
        "passive": "200 pcf",
        "report": "Test soil letter TS-7, invented for the tests",
    },
    "walls": [
        {
            "id": "R1",
            "label": "Concrete wall on a reinforced footing",
            "length": "14 ft",
            "thickness": "8 in",
            "construction": "concrete",
            "footing": {"width": "5 ft", "thickness": "18 in", "cover": "12 in", "unit_weight": "150 pcf"},
            "loads": [
                {"type": "line", "case": "D", "value": "4 klf"},
                {"type": "line", "case": "L", "value": "3 klf"},
                {"type": "lateral", "case": "W", "value": "6 kip", "height": "10 ft"},
            ],
        },
        {
            "id": "P2",
            "label": "Masonry wall on a plain footing",
            "length": "10 ft",
            "thickness": "8 in",
            "construction": "masonry",
            "footing": {
                "width": "30 in",
                "thickness": "14 in",
                "cover": "12 in",
                "unit_weight": "150 pcf",
                "reinforcement": "plain",
            },
            "loads": [
                {"type": "line", "case": "D", "value": "1.2 klf"},
                {"type": "line", "case": "L", "value": "0.8 klf"},
            ],
        },
    ],
}


def concrete_raw() -> dict[str, Any]:
    """A fresh copy of the test project."""
    return copy.deepcopy(RAW)

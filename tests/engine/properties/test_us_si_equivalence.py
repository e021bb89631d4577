"""The same project typed in US units ("ft", "kip", "psf") and in SI ("m", "kN", "kPa") gives the same
SI results.

Conversions are the exact definitions (NIST SP 811, appendix B: 1 ft = 0.3048 m,
1 lbf = 4.4482216152605 N); the property is that units are handled once, at the edges.
"""

from __future__ import annotations

import math

import pytest
from hypothesis import given, settings
from hypothesis import strategies as st
from kernline.engine.model import ALL_CHECKS
from kernline.engine.project_file import parse_project
from kernline.engine.results import check_wall

FT = 0.3048
LBF = 4.4482216152605
KIP = 1000.0 * LBF

# kind -> (US unit, SI unit, SI units per US unit)
UNITS = {
    "length": ("ft", "m", FT),
    "force": ("kip", "kN", KIP / 1e3),
    "line": ("klf", "kN/m", KIP / FT / 1e3),
    "pressure": ("psf", "kPa", LBF / FT**2 / 1e3),
    "density": ("pcf", "kN/m^3", LBF / FT**3 / 1e3),
}


class Pair:
    """One value written both ways."""

    def __init__(self, value: float, kind: str) -> None:
        self.value, self.kind = value, kind

    def text(self, system: str) -> str:
        us, si, factor = UNITS[self.kind]
        return f"{self.value!r} {us}" if system == "US" else f"{self.value * factor!r} {si}"


def _render(node, system: str):
    if isinstance(node, Pair):
        return node.text(system)
    if isinstance(node, dict):
        return {k: _render(v, system) for k, v in node.items()}
    if isinstance(node, list):
        return [_render(v, system) for v in node]
    return node


@st.composite
def projects(draw):
    length = draw(st.floats(4.0, 40.0))
    loads = [
        {"type": "line", "case": "D", "value": Pair(draw(st.floats(0.2, 5.0)), "line")},
        {
            "type": "line",
            "case": "L",
            "value": Pair(draw(st.floats(0.0, 3.0)), "line"),
            "start": Pair(0.0, "length"),
            "end": Pair(draw(st.floats(0.5, 1.0)) * length, "length"),
        },
        {
            "type": "point",
            "case": "W",
            "value": Pair(draw(st.floats(-20.0, 20.0)), "force"),
            "at": Pair(draw(st.floats(0.0, 1.0)) * length, "length"),
        },
        {
            "type": "lateral",
            "case": "W",
            "value": Pair(draw(st.floats(0.5, 30.0)), "force"),
            "height": Pair(draw(st.floats(0.0, 30.0)), "length"),
        },
        {
            "type": "lateral",
            "case": "E",
            "value": Pair(draw(st.floats(0.5, 30.0)), "force"),
            "height": Pair(draw(st.floats(0.0, 30.0)), "length"),
        },
    ]
    skeleton = {
        "format": "kernline-project",
        "version": 1,
        "criteria": {"method": draw(st.sampled_from(["asce7-16-asd", "service-fs"])), "sds": draw(st.floats(0.0, 1.5))},
        "soil": {
            "allowable_bearing": Pair(draw(st.floats(1000.0, 6000.0)), "pressure"),
            "bearing_basis": draw(st.sampled_from(["gross", "net"])),
            "friction": draw(st.floats(0.0, 0.6)),
            "cohesion": Pair(draw(st.floats(0.0, 400.0)), "pressure"),
            "passive": Pair(draw(st.floats(0.0, 400.0)), "density"),
            "passive_ignore": Pair(draw(st.floats(0.0, 1.5)), "length"),
            "unit_weight": Pair(draw(st.floats(90.0, 130.0)), "density"),
        },
        "walls": [
            {
                "id": "U1",
                "length": Pair(length, "length"),
                "thickness": Pair(0.5, "length"),
                "footing": {
                    "width": Pair(draw(st.floats(1.0, 8.0)), "length"),
                    "thickness": Pair(draw(st.floats(0.75, 3.0)), "length"),
                    "extension_start": Pair(draw(st.floats(0.0, 5.0)), "length"),
                    "extension_end": Pair(draw(st.floats(0.0, 5.0)), "length"),
                    "cover": Pair(draw(st.floats(0.0, 2.0)), "length"),
                    "unit_weight": Pair(draw(st.floats(0.0, 160.0)), "density"),
                },
                "stem": {"height": Pair(draw(st.sampled_from([0.0, 2.0])), "length"), "thickness": Pair(0.75, "length")},
                "loads": loads,
            }
        ],
    }
    return _render(skeleton, "US"), _render(skeleton, "SI")


def _close(a: float, b: float) -> bool:
    if math.isinf(a) or math.isinf(b) or math.isnan(a) or math.isnan(b):
        return a == b
    return a == pytest.approx(b, rel=1e-9, abs=1e-6)


@settings(max_examples=60, deadline=None)
@given(projects())
def test_us_and_si_text_give_the_same_si_results(pair):
    """Every case's loads, pressures and ratios agree whichever units the file was typed in."""
    us_raw, si_raw = pair
    us, si = parse_project(us_raw), parse_project(si_raw)
    r_us, r_si = check_wall(us, us.walls[0]), check_wall(si, si.walls[0])
    assert _close(r_us.length, r_si.length) and _close(r_us.self_weight.total, r_si.self_weight.total)
    assert len(r_us.cases) == len(r_si.cases)
    for a, b in zip(r_us.cases, r_si.cases, strict=True):
        assert (a.combination, a.direction) == (b.combination, b.direction)
        for name in ("vertical", "lateral", "moment"):
            assert _close(getattr(a, name), getattr(b, name)), name
        for check in ALL_CHECKS:
            ra, rb = a.of(check), b.of(check)
            assert (ra is None) == (rb is None)
            if ra is not None:
                assert _close(ra.ratio, rb.ratio), check
                assert ra.passes == rb.passes or _close(ra.ratio, ra.required)
        if a.bearing is not None:
            for name in ("eccentricity", "q_max", "q_min", "contact_length", "allowable"):
                assert _close(getattr(a.bearing, name), getattr(b.bearing, name)), name
    for check in ALL_CHECKS:
        assert _close(r_us.governing[check].ratio, r_si.governing[check].ratio)

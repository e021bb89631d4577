"""Benchmark cases of the verification suite as data: each published value beside Kernline's own.

The calculation package can print these cases as an appendix (:mod:`engine.calc_package.verification`),
so that an engineer can attach evidence that the program reproduces the values it is verified
against. Each :class:`Benchmark` is one quantity of a case of the verification register
(docs/verification.md, whose case numbers, sources and status key it repeats): the source with its
example or section and edition, the status of the value (R read in the source, R2 read second-hand,
D derived by hand from a stated formula, M from memory), the value as the register prints it, its
unit, the tolerance (half a unit in the last printed digit unless the register states a wider one
for the source's rounding) and a function that runs the engine the way the case's test module does.

:func:`run_cases` runs every case and never raises: a case whose computation fails becomes a failed
row carrying the message. ``tests/engine/verification/test_evidence_cases.py`` checks that every case
agrees and that each published value is the one its test module and the register state, so this
list cannot drift from the suite.
"""

from __future__ import annotations

import math
from collections.abc import Callable
from dataclasses import dataclass
from typing import Any

from .bearing import bearing_ratio
from .concrete.bars import parse_counted
from .concrete.plain import design_plain, plain_seismic_grid
from .concrete.transverse import (
    Construction,
    Materials,
    design_transverse,
    development_length,
    minimum_steel,
    one_way_shear_strength,
    steel_required,
)
from .model import LoadCase
from .project_file import parse_project
from .registry import Family
from .registry import checks as registered_checks
from .results import CaseResult, WallResult, check_wall, longitudinal_json
from .sliding import cohesion_resistance
from .soil_pressure import pressure_distribution

# Exact unit definitions (NIST Special Publication 811, appendix B): 1 ft = 0.3048 m, 1 lbf = 4.4482216152605 N.
FOOT = 0.3048  # m
INCH = FOOT / 12.0  # m
LBF = 4.4482216152605  # N
KIP = 1000.0 * LBF  # N
PSI = LBF / INCH**2  # Pa
PSF = LBF / FOOT**2  # Pa
PCF = LBF / FOOT**3  # N/m^3 (also psf per ft of depth)
KSF = KIP / FOOT**2  # Pa
KIP_FT = KIP * FOOT  # N·m
KLF = KIP / FOOT  # N/m (k/ft)
FT_KIP_PER_FT = KIP * FOOT / FOOT  # N·m/m (ft-k/ft)
SQIN_PER_FT = INCH**2 / FOOT  # m^2/m (in^2/ft)

VERIFICATION = "tests/engine/verification/"

STATUS_WORDS = {
    "R": "read in the published source",
    "R2": "read second-hand, in a quotation of the source",
    "D": "derived by hand from the stated formula (not a published number)",
    "M": "from memory, to be confirmed against the published text",
}


@dataclass(frozen=True, slots=True, kw_only=True)
class Benchmark:
    """One quantity of a verification case, with the value its source gives.

    Attributes:
        case: the case of the verification register, such as "Case 18".
        module: the test module that checks it, from the repository's root.
        source: the source as the register records it (author or body, title, edition).
        where: the example, problem or section of the source.
        status: the register's status of the value: "R", "R2", "D" or "M", possibly qualified
            ("R (exact D)", "D (form M)").
        quantity: what is compared, with the case's inputs.
        published: the value as the register prints it ("4.17", "1,008").
        unit: the unit text of ``published`` and of Kernline's value ("" for a ratio).
        compute: runs the engine and returns Kernline's value in ``unit``.
        tolerance: the agreement required, in ``unit``; None for half a unit in the last printed digit.
        topic: the part of the design the case verifies ("Stability" or "Concrete design").
    """

    case: str
    module: str
    source: str
    where: str
    status: str
    quantity: str
    published: str
    unit: str
    compute: Callable[[], float]
    tolerance: float | None = None
    topic: str = "Stability"

    @property
    def value(self) -> float:
        """The published value as a number."""
        return float(self.published.replace(",", ""))

    @property
    def decimals(self) -> int:
        """Decimal places of the published value as printed."""
        return len(self.published.partition(".")[2])

    @property
    def allowed(self) -> float:
        """The tolerance: as given, else half a unit in the last printed digit (the source's rounding)."""
        return self.tolerance if self.tolerance is not None else 0.5 * 10.0 ** (-self.decimals)

    @property
    def basis(self) -> str:
        """What the published value is, in words, from its status."""
        return STATUS_WORDS.get(self.status.split(" ")[0], self.status)


@dataclass(frozen=True, slots=True)
class BenchmarkResult:
    """A benchmark run: Kernline's value, its difference from the published one, and whether they agree.

    ``computed`` is None when the computation failed; ``message`` then says why.
    """

    benchmark: Benchmark
    computed: float | None
    passes: bool
    message: str = ""

    @property
    def difference(self) -> float | None:
        """Kernline's value minus the published value (None when there is no value)."""
        return None if self.computed is None else self.computed - self.benchmark.value

    @property
    def places(self) -> int:
        """Decimals to print Kernline's value and the difference with: one more than the source prints."""
        return self.benchmark.decimals + 1

    @property
    def computed_text(self) -> str:
        if self.computed is None:
            return "—"
        return _number(self.computed, self.places)

    @property
    def difference_text(self) -> str:
        """The difference to one more decimal than Kernline's value, so that one at the edge of the tolerance
        shows on which side it is."""
        d = self.difference
        if d is None:
            return "—"
        text = _number(abs(d), self.places + 1)
        if float(text.replace(",", "")) == 0.0:
            return _number(0.0, self.places + 1)
        return ("+" if d > 0 else "−") + text

    @property
    def tolerance_text(self) -> str:
        allowed = self.benchmark.allowed
        places = max(0, -math.floor(math.log10(allowed))) if allowed < 1.0 else 0
        while round(allowed, places) != allowed and places < 6:
            places += 1
        return "± " + _number(allowed, places)


def _number(value: float, places: int) -> str:
    """A value with thousands separators and ``places`` decimals, a true minus when negative."""
    text = f"{value:,.{places}f}"
    return "−" + text[1:] if text.startswith("-") else text


def run_case(benchmark: Benchmark) -> BenchmarkResult:
    """Run one benchmark; never raises (a failure is a failed row with its message)."""
    try:
        computed = float(benchmark.compute())
    except Exception as err:  # a benchmark that cannot run is reported as a failed row, not raised
        return BenchmarkResult(benchmark, None, False, f"{type(err).__name__}: {err}")
    if not math.isfinite(computed):
        return BenchmarkResult(benchmark, None, False, f"the engine gave {computed}")
    agrees = abs(computed - benchmark.value) <= benchmark.allowed * (1.0 + 1e-9)
    return BenchmarkResult(benchmark, computed, agrees)


def run_cases(cases: tuple[Benchmark, ...] | None = None) -> tuple[BenchmarkResult, ...]:
    """Run every benchmark (or those given), in order; never raises."""
    return tuple(run_case(b) for b in (CASES if cases is None else cases))


# ---------------------------------------------------------------------------------------------
# The computations: each runs the engine as the case's test module does.
# ---------------------------------------------------------------------------------------------


def _wall(raw: dict[str, Any]) -> WallResult:
    project = parse_project(raw)
    return check_wall(project, project.walls[0])


def _case(result: WallResult, combination: str | None = None, direction: str | None = None) -> CaseResult:
    for case in result.cases:
        if (combination is None or case.combination == combination) and (direction is None or case.direction == direction):
            return case
    raise LookupError(f"no case {combination!r} {direction!r} in the result")


def _project(walls: list[dict[str, Any]], soil: dict[str, Any], criteria: dict[str, Any], units: str = "US") -> dict[str, Any]:
    return {"format": "kernline-project", "version": 1, "units": units, "criteria": criteria, "soil": soil, "walls": walls}


def _rigid_statics() -> CaseResult:
    """Case 1: N = 100 kip centred on 24 ft x 2 ft (self weight off), W = 40 kip with an arm of 10 ft, e = L/6."""
    wall = {
        "id": "R1",
        "length": "24 ft",
        "thickness": "8 in",
        "footing": {"width": "2 ft", "thickness": "1 ft", "unit_weight": "0 pcf"},
        "loads": [
            {"type": "line", "case": "D", "value": f"{100.0 / 24.0!r} klf"},
            {"type": "lateral", "case": "W", "value": "40 kip", "height": "9 ft"},
        ],
    }
    soil = {"allowable_bearing": "2000 psf", "friction": 0.35, "unit_weight": "0 pcf"}
    criteria = {"combinations": [{"name": "D + W", "factors": {"D": 1.0, "W": 1.0}}]}
    return _case(_wall(_project([wall], soil, criteria)), direction="+")


def _case_1_factor_of_safety() -> float:
    ot = _rigid_statics().overturning
    assert ot is not None
    return float(ot.ratio)


def _case_1_peak_pressure() -> float:
    br = _rigid_statics().bearing
    assert br is not None
    return float(br.q_max) / KSF


def _case_2_das() -> float:
    # Das's B (along e) is Kernline's footing length; Das's L is the width
    return float(pressure_distribution(100.0, 3.0, 1.0, 10.0).q_max)


def _case_4_question_13() -> float:
    return float(pressure_distribution(300.0 * KIP, 700.0 / 300.0 * FOOT, 12.0 * FOOT, 12.0 * FOOT).q_max) / KSF


def _case_7_crane_pad() -> float:
    wall = {
        "id": "TC",
        "length": "7 m",
        "thickness": "1 m",
        "footing": {"width": "7 m", "thickness": "1.5 m", "unit_weight": "25 kN/m^3"},
        "loads": [
            {"type": "point", "case": "D", "value": "850 kN", "at": "3.5 m"},
            {"type": "lateral", "case": "W", "value": "100 kN", "height": "40.5 m"},
        ],
    }
    soil = {"allowable_bearing": "200 kPa", "friction": 0.35, "unit_weight": "0 kN/m^3"}
    criteria = {"combinations": [{"name": "D + W", "factors": {"D": 1.0, "W": 1.0}}]}
    br = _case(_wall(_project([wall], soil, criteria, units="SI"))).bearing
    assert br is not None
    return float(br.q_max) / 1e3


def _ncarb(combination: str) -> CaseResult:
    """Case 8: the exam question's wall, 16 ft x 40 ft x 1.5 ft, on a 20 ft x 6 ft x 2 ft footing."""
    wall = {
        "id": "SW1",
        "length": "16 ft",
        "thickness": "18 in",
        "footing": {
            "width": "6 ft",
            "thickness": "2 ft",
            "extension_start": "2 ft",
            "extension_end": "2 ft",
            "unit_weight": "150 pcf",
        },
        "loads": [
            {"type": "line", "case": "D", "value": "9 klf", "label": "wall weight"},
            {"type": "line", "case": "D", "value": "15 klf", "label": "superimposed dead"},
            {"type": "lateral", "case": "W", "value": "24 kip", "height": "40 ft"},
        ],
    }
    soil = {"allowable_bearing": "8 ksf", "friction": 0.25, "unit_weight": "0 pcf"}
    criteria = {
        "method": "service-fs",
        "required": {"overturning": 1.5, "sliding": 1.5, "bearing": 1.0},
        "combinations": [
            {"name": "D + W", "factors": {"D": 1.0, "W": 1.0}},
            {"name": "0.6D + W", "factors": {"D": 0.6, "W": 1.0}},
        ],
    }
    return _case(_wall(_project([wall], soil, criteria)), combination, "+")


def _case_8_factor_of_safety(combination: str) -> Callable[[], float]:
    def compute() -> float:
        ot = _ncarb(combination).overturning
        assert ot is not None
        return float(ot.ratio)

    return compute


def _case_8_peak_pressure() -> float:
    br = _ncarb("D + W").bearing
    assert br is not None
    return float(br.q_max) / KSF


_SP17_SERVICE = {
    "D": {"D": 4.0 / 3.0},
    "D + L": {"D": 1.0, "L": 1.0},
    "D + L + W": {"D": 1.0, "L": 1.0, "W": 1.0},
    "D + L + E": {"D": 1.0, "L": 1.0, "E": 1.0},
}


def _sp17(combinations: dict[str, dict[str, float]]) -> dict[str, Any]:
    """Case 9: the handbook's 12 in wall, D = 25, L = 12.5, W = 4, E = 5 k/ft, on a 10 ft strip 10 ft long."""
    wall = {
        "id": "W1",
        "length": "10 ft",
        "thickness": "12 in",
        "footing": {"width": "10 ft", "thickness": "12 in", "unit_weight": "0 pcf"},
        "loads": [
            {"type": "line", "case": "D", "value": "25 klf"},
            {"type": "line", "case": "L", "value": "12.5 klf"},
            {"type": "line", "case": "W", "value": "4 klf", "label": "overturning axial"},
            {"type": "line", "case": "E", "value": "5 klf", "label": "overturning axial"},
        ],
        "sizing": {
            "width_min": "1 ft",
            "width_max": "12 ft",
            "width_step": "0.1 ft",
            "thickness_min": "12 in",
            "thickness_max": "12 in",
            "thickness_step": "1 in",
        },
    }
    criteria = {
        "bearing_increase": 1.25,
        "combinations": [{"name": n, "factors": f, "checks": ["bearing"]} for n, f in combinations.items()],
    }
    return _project([wall], {"allowable_bearing": "4 ksf", "friction": 0.35, "unit_weight": "0 pcf"}, criteria)


def _case_9_width() -> float:
    from .sizing import size_footing

    project = parse_project(_sp17(_SP17_SERVICE))
    sized = size_footing(project, project.walls[0])
    if not sized.feasible or sized.width is None:
        raise ValueError("no width passes")
    return sized.width / FOOT


def _case_9_factored_pressure() -> float:
    br = _case(_wall(_sp17({"1.2D + 1.6L": {"D": 1.2, "L": 1.6}})), "1.2D + 1.6L").bearing
    assert br is not None
    return float(br.q_max) / KSF


def _asce7_16_wall() -> WallResult:
    """Case 10: D = 10, L = 5, Lr = 2, S = 3, R = 0 kip, W = 8 and E = 6 kip lateral, S_DS = 1.0, no self weight."""
    loads: list[dict[str, Any]] = [
        {"type": "point", "case": case, "value": f"{value} kip", "at": "10 ft"}
        for case, value in (("D", 10), ("L", 5), ("Lr", 2), ("S", 3), ("R", 0))
    ]
    loads += [
        {"type": "lateral", "case": "W", "value": "8 kip", "height": "10 ft"},
        {"type": "lateral", "case": "E", "value": "6 kip", "height": "10 ft"},
    ]
    wall = {
        "id": "C1",
        "length": "20 ft",
        "thickness": "8 in",
        "footing": {"width": "3 ft", "thickness": "1 ft", "unit_weight": "0 pcf"},
        "loads": loads,
    }
    soil = {"allowable_bearing": "2000 psf", "friction": 0.35, "unit_weight": "0 pcf"}
    return _wall(_project([wall], soil, {"method": "asce7-16-asd", "sds": 1.0}))


def _case_10_vertical(combination: str) -> Callable[[], float]:
    def compute() -> float:
        return float(_case(_asce7_16_wall(), combination, "+").vertical) / KIP

    return compute


def _class_4_wall() -> CaseResult:
    """Case 11: a 3 ft x 1.5 ft footing 20 ft long, its top 1 ft below grade, lateral bearing 150 psf/ft."""
    wall = {
        "id": "K4",
        "length": "20 ft",
        "thickness": "8 in",
        "footing": {"width": "3 ft", "thickness": "1.5 ft", "cover": "1 ft", "unit_weight": "0 pcf"},
        "loads": [
            {"type": "line", "case": "D", "value": "21 klf"},
            {"type": "lateral", "case": "W", "value": "100 kip", "height": "0 ft"},
        ],
    }
    soil = {"allowable_bearing": "2000 psf", "friction": 0.25, "passive": "150 pcf", "unit_weight": "0 pcf"}
    return _case(_wall(_project([wall], soil, {"combinations": [{"name": "D + W", "factors": {"D": 1.0, "W": 1.0}}]})))


def _case_11_lateral_bearing() -> float:
    sl = _class_4_wall().sliding
    assert sl is not None
    return float(sl.passive) / LBF


def _case_11_cohesion() -> float:
    return float(cohesion_resistance(130.0 * PSF, 3.0 * FOOT, 1.0 * FOOT, 600.0 * LBF)) / LBF


def _seismic_strip() -> CaseResult:
    """Case 12: wall 20 ft, D = 30 k; footing 24 ft x 3 ft x 1.5 ft; Eh = 12 k on an arm of 13.5 ft; 0.6D + 0.7E."""
    wall = {
        "id": "S84",
        "length": "20 ft",
        "thickness": "8 in",
        "footing": {
            "width": "3 ft",
            "thickness": "1.5 ft",
            "extension_start": "2 ft",
            "extension_end": "2 ft",
            "cover": "1 ft",
            "unit_weight": "150 pcf",
        },
        "loads": [
            {"type": "line", "case": "D", "value": "1.5 klf", "label": "wall and tributary dead, 30 k"},
            {"type": "lateral", "case": "E", "value": "12 kip", "height": "12 ft"},
        ],
    }
    soil = {"allowable_bearing": "2000 psf", "friction": 0.25, "passive": "150 pcf", "unit_weight": "0 pcf"}
    criteria = {"combinations": [{"name": "0.6D + 0.7E (Ev = 0)", "factors": {"D": 0.6, "E": 0.7}}]}
    return _case(_wall(_project([wall], soil, criteria)), direction="+")


def _case_12_overturning() -> float:
    ot = _seismic_strip().overturning
    assert ot is not None
    return float(ot.ratio)


def _case_12_sliding() -> float:
    sl = _seismic_strip().sliding
    assert sl is not None
    return float(sl.ratio)


_EX_12_1 = Materials(fc=3000.0 * PSI, fy=60_000.0 * PSI, cover=3.0 * INCH)


def _case_18_example_12_1_moment() -> float:
    design = design_transverse(
        q_u=4.80 * KSF,
        width=10.0 * FOOT,
        thickness=20.0 * INCH,
        wall_thickness=12.0 * INCH,
        construction=Construction.CONCRETE,
        materials=_EX_12_1,
        bars="#7 @ 10 in",
    )
    return design.moment / FT_KIP_PER_FT


def _case_18_example_12_1_steel() -> float:
    return float(steel_required(48.6 * FT_KIP_PER_FT, 1.0, 16.5 * INCH, _EX_12_1.fc, _EX_12_1.fy)) / SQIN_PER_FT


def _case_18_example_12_1_shear() -> float:
    # the book's #7 @ 10 in on b = 12 in, d = 16.5 in: rho_w = 0.72 / (12 x 16.5)
    return float(one_way_shear_strength(12.0 * INCH, 16.5 * INCH, 0.72 / (12.0 * 16.5), _EX_12_1)) / KIP


def _example_12_10(construction: Construction = Construction.CONCRETE) -> Any:
    return design_plain(
        q_u=4.36 * KSF,
        width=5.5 * FOOT,
        thickness=24.0 * INCH,
        wall_thickness=12.0 * INCH,
        construction=construction,
        fc=3000.0 * PSI,
    )


def _case_18_example_12_10_moment() -> float:
    return float(_example_12_10().moment) / FT_KIP_PER_FT


def _case_18_example_12_10_capacity() -> float:
    return float(_example_12_10().moment_capacity) / FT_KIP_PER_FT


def _case_18_example_12_11_moment() -> float:
    design = design_transverse(
        q_u=226.7e3,
        width=3.00,
        thickness=0.450,
        wall_thickness=0.300,
        construction=Construction.CONCRETE,
        materials=Materials(fc=28e6, fy=420e6, cover=0.075),
    )
    return design.moment / 1e3


def _case_18_example_12_11_steel() -> float:
    return float(steel_required(206.58e3, 1.0, 0.360, 28e6, 420e6)) * 1e6


def _case_18_masonry_pair() -> float:
    design = design_plain(
        q_u=3.04 * KSF,
        width=30.0 * INCH,
        thickness=10.0 * INCH,
        wall_thickness=8.0 * INCH,
        construction=Construction.MASONRY,
        fc=3000.0 * PSI,
    )
    return float(design.moment) / FT_KIP_PER_FT


def _case_19_minimum_steel() -> float:
    return float(minimum_steel(12.0 * INCH, 20.0 * INCH)) / INCH**2


def _case_19_development_length() -> float:
    return float(development_length(0.625 * INCH, 3.3125 * INCH, Materials(fc=3000.0 * PSI))) / INCH


def _case_19_strength_combination() -> float:
    from .codes import asce7_16_lrfd

    strength = frozenset(registered_checks(Family.STRENGTH))
    if not strength:
        raise LookupError("no strength check is registered")
    combo = next(c for c in asce7_16_lrfd.combinations(1.0, strength) if c.name == "1.2D + 1.6L + 0.5S")
    loads = {LoadCase.D: 10.0, LoadCase.L: 5.0, LoadCase.LR: 2.0, LoadCase.S: 3.0, LoadCase.R: 0.0}
    return sum(combo.factor(case) * value for case, value in loads.items())


def _case_20_bars_ratio() -> float:
    grid = plain_seismic_grid(
        sdc="D", bottom=parse_counted("2 #4"), top=parse_counted("1 #4"), width=18.0 * INCH, thickness=12.0 * INCH
    )
    return float(grid.ratio)


def _case_20_plain_moment_capacity() -> float:
    wall = {
        "id": "P1",
        "length": "24 ft",
        "thickness": "6 in",
        "construction": "light-frame",
        "footing": {
            "width": "18 in",
            "thickness": "12 in",
            "cover": "12 in",
            "reinforcement": {"transverse": "plain", "bottom": "2 #4", "top": "1 #4"},
        },
        "loads": [{"type": "line", "case": "D", "value": "600 plf"}, {"type": "line", "case": "L", "value": "300 plf"}],
    }
    raw = _project(
        [wall],
        {"allowable_bearing": "2000 psf", "friction": 0.35, "unit_weight": "110 pcf"},
        {"method": "asce7-16-asd", "sds": 0.5, "seismic_design_category": "D"},
    )
    raw["concrete"] = {"fc": "3000 psi", "fy": "60 ksi", "cover": "3 in"}
    along = longitudinal_json(_wall(raw))
    if along is None:
        raise LookupError("the engine gave no design along the length")
    return float(along["plain_moment_capacity"]) / (LBF * INCH)


def _bearing_ratio_question_13() -> float:
    q = pressure_distribution(300.0 * KIP, 700.0 / 300.0 * FOOT, 12.0 * FOOT, 12.0 * FOOT)
    return float(bearing_ratio(15.0 * KSF, q.q_max, q.stable))


# ---------------------------------------------------------------------------------------------
# The cases
# ---------------------------------------------------------------------------------------------

_DAS = "B. M. Das, Principles of Foundation Engineering, section on eccentrically loaded foundations"
_NCARB = "NCARB, ARE Structural Systems exam guide, sample multiple-choice question"
_SP17 = "American Concrete Institute, SP-17(09), The Reinforced Concrete Design Handbook"
_ASCE7_16 = "ASCE/SEI 7-16, Minimum Design Loads and Associated Criteria for Buildings and Other Structures"
_IBC_TABLE = "International Code Council, International Building Code, Table 1806.2"
_MCCORMAC = "J. C. McCormac and R. H. Brown, Design of Reinforced Concrete, 9th ed., Wiley"

CASES: tuple[Benchmark, ...] = (
    # ---- stability ----
    Benchmark(
        case="Case 1",
        module=VERIFICATION + "test_rigid_footing_statics.py",
        source="statics of a rigid footing",
        where="FS = L/(2e) with every resisting load centred",
        status="D",
        quantity="FS_OT at e = L/6 = 4 ft: N = 100 kip centred on 24 ft × 2 ft, H = 40 kip on a 10 ft arm",
        published="3.0",
        unit="",
        compute=_case_1_factor_of_safety,
    ),
    Benchmark(
        case="Case 1",
        module=VERIFICATION + "test_rigid_footing_statics.py",
        source="statics of a rigid footing",
        where="full triangle at the kern limit, q_max = 2N/(BL)",
        status="D",
        quantity="q_max at e = L/6: 2 × 100 / (2 × 24)",
        published="4.1667",
        unit="ksf",
        compute=_case_1_peak_pressure,
    ),
    Benchmark(
        case="Case 2",
        module=VERIFICATION + "test_das_principles_foundation_engineering.py",
        source=_DAS,
        where="one-way eccentricity, edition not recorded",
        status="D (form M)",
        quantity="q_max = 4Q / (3L(B − 2e)) beyond the kern: Q = 100, B = 10 along e, L = 1, e = 3",
        published="33.33",
        unit="",
        compute=_case_2_das,
    ),
    Benchmark(
        case="Case 4",
        module=VERIFICATION + "test_pegenius_eccentric_bearing.py",
        source='pegenius.com, daily question 13, "Bearing Capacity Factor of Safety"',
        where="12 ft square footing, P = 300 kip, M = 700 kip·ft",
        status="D",
        quantity="q_max beyond the kern: 2 × 300 / (3 × 12 × 3.667)",
        published="4.545",
        unit="ksf",
        compute=_case_4_question_13,
    ),
    Benchmark(
        case="Case 4",
        module=VERIFICATION + "test_pegenius_eccentric_bearing.py",
        source='pegenius.com, daily question 13, "Bearing Capacity Factor of Safety"',
        where="net bearing capacity 15 ksf",
        status="D",
        quantity="FS on bearing: 15 / 4.545",
        published="3.30",
        unit="",
        compute=_bearing_ratio_question_13,
    ),
    Benchmark(
        case="Case 7",
        module=VERIFICATION + "test_tower_crane_pad_example.py",
        source='anonymous web page titled "Tower Crane Foundation Design Calculation Example"',
        where="7 m × 7 m × 1.5 m pad, N = 2687.5 kN, M = 4200 kN·m",
        status="R (exact D)",
        quantity="q_max beyond the kern, 2N / (3B(L/2 − e)); the page rounds 132.12",
        published="132.2",
        unit="kPa",
        compute=_case_7_crane_pad,
        tolerance=0.1,
    ),
    Benchmark(
        case="Case 8",
        module=VERIFICATION + "test_ncarb_are_shear_wall_overturning.py",
        source=_NCARB,
        where="concrete shear wall on a continuous footing",
        status="R",
        quantity="FS_OT = 4,200 / 1,008 (D + W; the guide's answer 4.2)",
        published="4.17",
        unit="",
        compute=_case_8_factor_of_safety("D + W"),
    ),
    Benchmark(
        case="Case 8",
        module=VERIFICATION + "test_ncarb_are_shear_wall_overturning.py",
        source=_NCARB,
        where="extended by statics",
        status="D",
        quantity="FS_OT with 0.6D: 0.6 × 4,200 / 1,008",
        published="2.50",
        unit="",
        compute=_case_8_factor_of_safety("0.6D + W"),
    ),
    Benchmark(
        case="Case 8",
        module=VERIFICATION + "test_ncarb_are_shear_wall_overturning.py",
        source=_NCARB,
        where="extended by statics",
        status="D",
        quantity="q_max in the kern (D + W): 3.5 × (1 + 6 × 2.4 / 20)",
        published="6.02",
        unit="ksf",
        compute=_case_8_peak_pressure,
    ),
    Benchmark(
        case="Case 9",
        module=VERIFICATION + "test_aci_sp17_wall_footing.py",
        source=_SP17,
        where='Chapter 5 "Footing Design" (Mirza & Brant), FOOTINGS EXAMPLE 1',
        status="R",
        quantity="required width on a 0.1 ft grid: D + L governs, 37.5 / 4",
        published="9.4",
        unit="ft",
        compute=_case_9_width,
    ),
    Benchmark(
        case="Case 9",
        module=VERIFICATION + "test_aci_sp17_wall_footing.py",
        source=_SP17,
        where='Chapter 5 "Footing Design" (Mirza & Brant), FOOTINGS EXAMPLE 1',
        status="R",
        quantity="factored pressure 1.2D + 1.6L on B = 10 ft: 50 / 10",
        published="5.00",
        unit="ksf",
        compute=_case_9_factored_pressure,
    ),
    Benchmark(
        case="Case 10",
        module=VERIFICATION + "test_asce7_16_asd_combinations.py",
        source=_ASCE7_16,
        where="section 2.4.1 (basic ASD combinations), with the seismic forms of section 2.4.5",
        status="D",
        quantity="V of (0.6 − 0.14 S_DS)D + 0.7E with S_DS = 1.0 (0.46D + 0.7E): D = 10",
        published="4.6",
        unit="",
        compute=_case_10_vertical("0.46D + 0.7E"),
    ),
    Benchmark(
        case="Case 10",
        module=VERIFICATION + "test_asce7_16_asd_combinations.py",
        source=_ASCE7_16,
        where="section 2.4.1 (basic ASD combinations), with the seismic forms of section 2.4.5",
        status="D",
        quantity="V of (1.0 + 0.105 S_DS)D + 0.75L + 0.525E + 0.75S with S_DS = 1.0: D = 10, L = 5, S = 3",
        published="17.05",
        unit="",
        compute=_case_10_vertical("1.105D + 0.75L + 0.525E + 0.75S"),
    ),
    Benchmark(
        case="Case 11",
        module=VERIFICATION + "test_ibc_table_1806_2.py",
        source=_IBC_TABLE,
        where="class 4, lateral bearing 150 psf/ft (IBC 2012 table, as reproduced by R. W. Day)",
        status="D",
        quantity="lateral bearing on a 3 ft face from 1 ft to 2.5 ft below grade: 150 × (2.5² − 1²) × 3 / 2",
        published="1,181",
        unit="lb",
        compute=_case_11_lateral_bearing,
    ),
    Benchmark(
        case="Case 11",
        module=VERIFICATION + "test_ibc_table_1806_2.py",
        source=_IBC_TABLE,
        where="class 5, cohesion 130 psf; 1806.3.2",
        status="D",
        quantity="cohesion on 3 ft² per ft, dead load 600 plf: min(390, 0.5 × 600)",
        published="300",
        unit="lb/ft",
        compute=_case_11_cohesion,
    ),
    Benchmark(
        case="Case 12",
        module=VERIFICATION + "test_derived_seismic_strip_scenario.py",
        source="derived here by statics",
        where="ASCE 7-16 2.4.5 combination 10 (Ev = 0 at the soil), IBC Table 1806.2 class 4",
        status="D",
        quantity="FS_OT about the toe: 27.72 × 12 / 113.4",
        published="2.933",
        unit="",
        compute=_case_12_overturning,
    ),
    Benchmark(
        case="Case 12",
        module=VERIFICATION + "test_derived_seismic_strip_scenario.py",
        source="derived here by statics",
        where="ASCE 7-16 2.4.5 combination 10 (Ev = 0 at the soil), IBC Table 1806.2 class 4",
        status="D",
        quantity="sliding: (6.93 + 1.18) / 8.40, a wall that fails (as it should)",
        published="0.966",
        unit="",
        compute=_case_12_sliding,
    ),
    # ---- concrete design ----
    Benchmark(
        topic="Concrete design",
        case="Case 18",
        module=VERIFICATION + "test_mccormac_wall_footings.py",
        source=_MCCORMAC,
        where="Example 12.1",
        status="R",
        quantity="M_u at the face of the concrete wall: 4.80 × 4.50² / 2",
        published="48.6",
        unit="ft-k/ft",
        compute=_case_18_example_12_1_moment,
    ),
    Benchmark(
        topic="Concrete design",
        case="Case 18",
        module=VERIFICATION + "test_mccormac_wall_footings.py",
        source=_MCCORMAC,
        where="Example 12.1",
        status="R",
        quantity="A_s for M_u = 48.6 ft-k/ft, b = 12 in, d = 16.5 in (the book rounds 0.682)",
        published="0.68",
        unit="in²/ft",
        compute=_case_18_example_12_1_steel,
    ),
    Benchmark(
        topic="Concrete design",
        case="Case 18",
        module=VERIFICATION + "test_mccormac_wall_footings.py",
        source=_MCCORMAC,
        where="Example 12.1 under ACI 318-19 22.5.5.1(c)",
        status="D",
        quantity="φV_c = 0.75 · 8 · 0.00364^(1/3) · √3000 · 12 · 16.5 (< V_u = 15.0: fails)",
        published="10.0",
        unit="k/ft",
        compute=_case_18_example_12_1_shear,
    ),
    Benchmark(
        topic="Concrete design",
        case="Case 18",
        module=VERIFICATION + "test_mccormac_wall_footings.py",
        source=_MCCORMAC,
        where="Example 12.10 (plain footing)",
        status="R",
        quantity="M_u = 4.36 × 2.25² / 2",
        published="11.04",
        unit="ft-k/ft",
        compute=_case_18_example_12_10_moment,
    ),
    Benchmark(
        topic="Concrete design",
        case="Case 18",
        module=VERIFICATION + "test_mccormac_wall_footings.py",
        source=_MCCORMAC,
        where="Example 12.10 (plain footing)",
        status="R",
        quantity="φM_n = 0.60 · 5 · √3000 · 968 (S on h = 22 in; the book rounds 13.255)",
        published="13.25",
        unit="ft-k/ft",
        compute=_case_18_example_12_10_capacity,
        tolerance=0.01,
    ),
    Benchmark(
        topic="Concrete design",
        case="Case 18",
        module=VERIFICATION + "test_mccormac_wall_footings.py",
        source=_MCCORMAC,
        where="Example 12.11 (SI)",
        status="R",
        quantity="M_u = 226.7 × 1.35² / 2",
        published="206.58",
        unit="kN·m/m",
        compute=_case_18_example_12_11_moment,
    ),
    Benchmark(
        topic="Concrete design",
        case="Case 18",
        module=VERIFICATION + "test_mccormac_wall_footings.py",
        source=_MCCORMAC,
        where="Example 12.11 (SI)",
        status="R",
        quantity="A_s for M_u = 206.58 kN·m/m, d = 360 mm (the book rounds 1579)",
        published="1580",
        unit="mm²/m",
        compute=_case_18_example_12_11_steel,
        tolerance=2.0,
    ),
    Benchmark(
        topic="Concrete design",
        case="Case 18",
        module=VERIFICATION + "test_mccormac_wall_footings.py",
        source=_MCCORMAC,
        where="chapter 12 with ACI 318-19 Table 13.2.7.1",
        status="D",
        quantity="M_u under an 8 in CMU wall on 30 in × 10 in, q_u = 3.04 ksf, 13 in from the edge",
        published="1.784",
        unit="ft-k/ft",
        compute=_case_18_masonry_pair,
    ),
    Benchmark(
        topic="Concrete design",
        case="Case 19",
        module=VERIFICATION + "test_aci318_19_wall_footing_rules.py",
        source="ACI 318-19",
        where="7.6.1.1 with Table 24.4.3.2",
        status="R",
        quantity="A_s,min = 0.0018 · 12 · 20",
        published="0.432",
        unit="in²/ft",
        compute=_case_19_minimum_steel,
    ),
    Benchmark(
        topic="Concrete design",
        case="Case 19",
        module=VERIFICATION + "test_aci318_19_wall_footing_rules.py",
        source="ACI 318-19",
        where="25.4.2.4",
        status="D",
        quantity="ℓ_d of #5, f'c = 3000 psi, Grade 60: 0.075 · 60000/√3000 · 0.8/2.5 · 0.625",
        published="16.43",
        unit="in",
        compute=_case_19_development_length,
    ),
    Benchmark(
        topic="Concrete design",
        case="Case 19",
        module=VERIFICATION + "test_aci318_19_wall_footing_rules.py",
        source="ASCE 7-16 2.3.1",
        where="strength combination 2",
        status="D",
        quantity="V of 1.2D + 1.6L + 0.5S: D = 10, L = 5, S = 3",
        published="21.5",
        unit="",
        compute=_case_19_strength_combination,
    ),
    Benchmark(
        topic="Concrete design",
        case="Case 20",
        module=VERIFICATION + "test_ibc_plain_wall_footings.py",
        source="IBC 2021 1905.6.2",
        where="plain wall footings in SDC C to F",
        status="D",
        quantity="continuous bars 2 #4 + 1 #4 = 0.60 in² against 0.002 · 18 · 12 = 0.432 in²",
        published="1.389",
        unit="",
        compute=_case_20_bars_ratio,
    ),
    Benchmark(
        topic="Concrete design",
        case="Case 20",
        module=VERIFICATION + "test_ibc_plain_wall_footings.py",
        source="ACI 318-19 14.5.1.7, 14.5.2.1",
        where="a plain footing along its length",
        status="D",
        quantity="φM_n along the length, 18 in × 12 in, h_s = 10 in: 0.60 · 5 · √3000 · 18 · 10² / 6",
        published="49,295",
        unit="lb-in",
        compute=_case_20_plain_moment_capacity,
    ),
)

__all__ = ["CASES", "STATUS_WORDS", "Benchmark", "BenchmarkResult", "run_case", "run_cases"]

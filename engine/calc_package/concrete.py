"""The concrete design sheet of a wall: the footing as an ACI 318-19 member, across its width and along its length.

Every number is read from the engine: the transverse design of the flexure and one-way shear checks
(:func:`engine.checks._strength.strength_grid`, the arrays their records come from), and the design
along the length (:func:`engine.concrete.along.design_along`). Substituted lines only restate those
values and the inputs so that a reviewer can redo them; nothing here decides a design.

Equations are written in the inch-pound form of ACI 318-19 (√f'c in psi). In SI projects the
substitutions are in millimetres and MPa, √f'c still the inch-pound root (54.77 psi for 3,000 psi)
converted to MPa, so that every printed line reproduces its printed result in either system.
"""

from __future__ import annotations

import math
from typing import TYPE_CHECKING, Any

import numpy as np

from ..checks._strength import strength_grid
from ..concrete.along import design_along
from ..concrete.bars import bar
from ..concrete.longitudinal import BeamDiagram, LongitudinalDesign
from ..concrete.plain import FLEXURE_COEFFICIENT, MIN_THICKNESS, PHI_PLAIN, SHEAR_COEFFICIENT, SOIL_ALLOWANCE
from ..concrete.transverse import (
    MASONRY_SECTION,
    MIN_DEPTH_ABOVE_BARS,
    MIN_STEEL_RATIO,
    VC_COEFFICIENT,
    VC_LIMIT,
)
from ..model import WallConstruction
from ..units import Kind

if TYPE_CHECKING:  # pragma: no cover
    from ..model import Project
    from . import Block, Cell, Formatter, WallReport

INCH = 0.0254
FOOT = 0.3048
PSI = 4.4482216152605 / INCH**2


# ---------------------------------------------------------------------------------------------
# Display of the member quantities (units at the edge: SI in, the project's display units out)
# ---------------------------------------------------------------------------------------------


class MemberUnits:
    """Formats per-length member quantities in the project's display units (display only)."""

    def __init__(self, fmt: Formatter) -> None:
        self.fmt = fmt
        self.us = fmt.units == "US"

    def small(self, value: float, places: int = 2) -> str:
        """A member dimension: decimal inches (US) or millimetres (SI)."""
        return f"{value / INCH:,.{places}f} in" if self.us else f"{value * 1000.0:,.0f} mm"

    def sub_small(self, value: float, places: int = 2) -> str:
        """A member dimension substituted into a line: decimal inches (US) or millimetres to one place (SI),
        so that inch values converted to millimetres (304.8 mm) are carried exactly enough."""
        return self.small(value, places) if self.us else f"{value * 1000.0:,.1f} mm"

    def root(self, fc: float) -> str:
        """√f'c of the inch-pound equations (ACI 318-19 uses √f'c in psi): psi (US) or that stress in MPa (SI)."""
        root_psi = math.sqrt(fc / PSI)
        return f"{root_psi:.2f} psi" if self.us else f"{root_psi * PSI / 1e6:.5f} MPa"

    def root_note(self, fc: float) -> str:
        """In SI, how the inch-pound root was converted (blank in US)."""
        if self.us:
            return ""
        root_psi = math.sqrt(fc / PSI)
        return f"; √f'_{{c}} = √({fc / PSI:,.0f} psi) = {root_psi:.2f} psi = {root_psi * PSI / 1e6:.5f} MPa (inch-pound form)"

    def feet(self, value: float) -> str:
        """A cantilever or distance substituted in decimal feet to three places (metres to four in SI, so
        that converted inch dimensions such as 0.8128 m are carried exactly)."""
        return self.fmt.decimal(value, 3 if self.us else 4)

    def stress(self, value: float) -> str:
        """f'c and fy: psi (US) or MPa (SI)."""
        return f"{value / PSI:,.0f} psi" if self.us else f"{value / 1e6:,.1f} MPa"

    def q(self, value: float) -> str:
        """A factored soil pressure: ksf to three places (US) or kPa to two (SI)."""
        return f"{value / (1000.0 * 4.4482216152605 / FOOT**2):,.3f} ksf" if self.us else f"{value / 1000.0:,.2f} kPa"

    def moment(self, value: float) -> str:
        """A moment per length of footing: kip·ft/ft (US) or kN·m/m (SI)."""
        if self.us:
            return f"{value * FOOT / (4448.2216152605 * FOOT):,.2f} kip·ft/ft"
        return f"{value / 1000.0:,.2f} kN·m/m"

    def shear(self, value: float) -> str:
        """A shear per length of footing: kip/ft (US) or kN/m (SI)."""
        return f"{value * FOOT / 4448.2216152605:,.2f} kip/ft" if self.us else f"{value / 1000.0:,.2f} kN/m"

    def area(self, value: float) -> str:
        """Steel per length of footing: in²/ft (US) or mm²/m (SI)."""
        return f"{value * FOOT / INCH**2:,.3f} in²/ft" if self.us else f"{value * 1e6:,.0f} mm²/m"

    def bar_area(self, value: float) -> str:
        return f"{value / INCH**2:,.2f} in²" if self.us else f"{value * 1e6:,.0f} mm²"

    def total_area(self, value: float) -> str:
        """A total steel area (longitudinal bars): in² (US) or mm² (SI)."""
        return f"{value / INCH**2:,.2f} in²" if self.us else f"{value * 1e6:,.0f} mm²"

    def force(self, value: float) -> str:
        return self.fmt.force(value)

    def beam_moment(self, value: float) -> str:
        return self.fmt.moment(value)

    def strip(self) -> str:
        """The width b of the design strip: 12 in (US) or 1 m (SI)."""
        return "12 in" if self.us else "1 m"

    def strip_sub(self) -> str:
        """The strip width b substituted next to member dimensions: 12 in (US) or 1,000 mm (SI)."""
        return "12 in" if self.us else "1,000 mm"


def _construction_words(construction: WallConstruction) -> str:
    return {
        WallConstruction.CONCRETE: "concrete: moment section at the wall's face",
        WallConstruction.MASONRY: "masonry: moment section halfway from centre to face",
        WallConstruction.LIGHT_FRAME: "light-frame on a sill, as masonry: moment section halfway from centre to face",
    }[construction]


# ---------------------------------------------------------------------------------------------
# The sheet
# ---------------------------------------------------------------------------------------------


def concrete_blocks(project: Project, report: WallReport, fmt: Formatter) -> list[Block] | None:
    """The blocks of the wall's concrete design sheet, or None without a concrete section."""
    from . import Heading, Para, Verdict, formula, mark_assumed, plain

    result = report.result
    concrete = project.concrete
    table, evaluation = result.strength_table, result.strength_evaluation
    if concrete is None or table is None or evaluation is None:
        return None
    flexure = next((g for c, g in result.governing.items() if c.id == "flexure"), None)
    shear = next((g for c, g in result.governing.items() if c.id == "one_way_shear"), None)
    if flexure is None or shear is None or flexure.record is None or shear.record is None:
        return None
    u = MemberUnits(fmt)
    wall = report.wall
    grid = strength_grid(evaluation.statics)
    # the engine's design along the length, kept on the result (computed once for the window, sizing and here)
    memo = getattr(result, "along", None) if hasattr(type(result), "along") else None
    along: tuple[LongitudinalDesign, int, BeamDiagram] | None = (
        memo if memo is not None else (design_along(table, evaluation) if table.cases else None)
    )
    passes_across = flexure.passes and shear.passes
    passes_along = along is None or along[0].passes
    title = f"Wall {wall.id}: concrete design of the footing (ACI 318-19)"
    words = "PASSES" if passes_across and passes_along else "FAILS"
    parts = [f"across the width {'passes' if passes_across else 'FAILS'}"]
    if along is not None:
        parts.append(f"along the length {'passes' if passes_along else 'FAILS'}")
    blocks: list[Block] = [
        Heading(plain(title)),
        Verdict(passes_across and passes_along, f"The footing {words} as a concrete member: " + ", ".join(parts) + "."),
        Para(
            formula(
                f"f'_{{c}} = {u.stress(concrete.fc)}, f_{{y}} = {u.stress(concrete.fy)}, cover {u.small(concrete.cover, 1 if u.us else 0)}, "
                f"λ = {concrete.lam:g}; footing B × h = {fmt.length(result.width)} × {fmt.length(result.thickness)}; "
            )
            + plain(
                mark_assumed(project, _wall_path(project, wall, "construction"), _construction_words(wall.construction))
                + "; "
                + ("plain concrete (ACI 318-19 chapter 14)" if grid.plain else _given_words(wall))
                + f". Loads: the strength combinations of {concrete.strength_method.title} (listed in the design "
                "basis); W and E are nominal loads, so 1.0W and 1.0E."
            ),
            "small",
        ),
    ]
    blocks += _across(project, report, fmt, u, grid, flexure, shear)
    if along is not None:
        blocks += _along(report, fmt, u, *along)
    return blocks


def _wall_path(project: Project, wall: Any, name: str) -> str:
    index = next((k for k, w in enumerate(project.walls) if w.id == wall.id), -1)
    return f"walls[{index}].{name}"


def _given_words(wall: Any) -> str:
    given = wall.footing.reinforcement
    if given is None:
        return "designed by the program (none given)"
    parts = []
    if given.transverse is not None:
        parts.append("transverse given")
    if given.bottom is not None:
        parts.append("bottom given")
    if given.top is not None:
        parts.append("top given")
    return ", ".join(parts) + "; the rest designed by the program" if parts else "designed by the program"


def strength_combination_blocks(project: Project) -> list[Block]:
    """The strength combinations in force, with the nominal-load note (ASCE 7-16 2.3.1, 2.3.6)."""
    from . import Para, formula, plain

    concrete = project.concrete
    if concrete is None:
        return []
    combos = concrete.strength_method.combinations(project.criteria)
    names = "; ".join(c.name for c in combos)
    return [
        Para(
            plain(f"{concrete.strength_method.title}: ")
            + plain(names)
            + formula(
                ". W and E are the ASCE 7 nominal loads (the ASD combinations apply 0.6W and 0.7E), so these "
                "combinations use 1.0W and 1.0E; E includes E_{v} = 0.2 S_{DS} D (ASCE 7-16 12.4.2.2). Every "
                "combination is checked in both directions of the lateral load."
            ),
            "small",
        )
    ]


def _across(
    project: Project, report: WallReport, fmt: Formatter, u: MemberUnits, grid: Any, flexure: Any, shear: Any
) -> list[Block]:
    """Transverse design: q_u, the moment section, then reinforced (chapters 13, 22, 25) or plain (14)."""
    from . import Equation, Group, Heading, formula

    result, wall = report.result, report.wall
    design = grid.design
    rec = flexure.record
    index = int(grid.case_index)
    statics = report.result.strength_evaluation.statics  # type: ignore[union-attr]
    q_peak = float(statics.q_max[index])
    own = float(statics.factored_weight[index])
    case = result.strength_table.cases[index] if result.strength_table is not None else None  # type: ignore[union-attr]
    case_text = (
        f"{case.combination.name} ({'+' if case.direction.value == '+' else '−' if case.direction.value == '-' else 'no lateral load'})"
        if case
        else ""
    )
    B, L = u.feet(result.width), u.feet(result.length)
    t_w = wall.supported_thickness
    c = float(design.cantilever)
    eqs: list[Block] = [
        Heading("Across the width: a strip " + u.strip() + " wide, cantilevered from the moment section", 2),
        Equation(
            formula("q_{u}"),
            formula("q_{max} − f_{D} W / (B L_{f})"),
            f"{u.q(q_peak)} − {fmt.carried(own, Kind.FORCE)} / ({B} × {L})",
            u.q(rec.q_u),
            formula(f"most loaded point, {case_text}; own weight and soil cover go straight to the soil"),
            clause="ACI 13.2.6.1",
        ),
    ]
    if wall.construction is WallConstruction.CONCRETE:
        eqs.append(
            Equation(
                formula("c"),
                formula("(B − t_{w}) / 2"),
                f"({B} − {u.feet(t_w)}) / 2",
                u.feet(c),
                "",
                clause="Table 13.2.7.1",
            )
        )
    else:
        eqs.append(
            Equation(
                formula("c"),
                formula(f"(B − t_{{w}}) / 2 + {MASONRY_SECTION:g} t_{{w}}"),
                f"({B} − {u.feet(t_w)}) / 2 + {MASONRY_SECTION:g} × {u.feet(t_w)}",
                u.feet(c),
                "",
                clause="Table 13.2.7.1",
            )
        )
    eqs.append(
        Equation(
            formula("M_{u}"),
            formula("q_{u} c² / 2"),
            f"{u.q(rec.q_u)} × ({u.feet(c)})² / 2",
            u.moment(float(design.moment)),
            clause="13.2.7.1",
        )
    )
    if grid.plain:
        return [Group(tuple(eqs[:3])), *eqs[3:], *_plain(result, fmt, u, grid, rec, shear.record)]
    return [Group(tuple(eqs[:3])), *eqs[3:], *_reinforced(result, fmt, u, grid, flexure, shear)]


def _reinforced(result: Any, fmt: Formatter, u: MemberUnits, grid: Any, flexure: Any, shear: Any) -> list[Block]:
    from . import Equation, Group, Table, Verdict, formula, plain

    design = grid.design
    concrete_h = result.thickness
    rec = flexure.record
    size = int(design.size)
    the_bar = bar(size) if size > 0 else None
    d = float(design.effective_depth)
    c = float(design.cantilever)
    spacing = float(design.spacing)
    db = the_bar.diameter if the_bar is not None else 0.0
    blocks: list[Block] = [
        Equation(
            formula("d"),
            formula("h − cover − d_{b} / 2"),
            f"{u.sub_small(concrete_h)} − {u.sub_small(float(grid_cover(result)))} − {u.sub_small(db, 3)} / 2",
            u.small(d),
            formula(f"at least {u.small(MIN_DEPTH_ABOVE_BARS, 0)} above the bottom bars ({rec.bars})"),
            clause="13.3.1.2",
        ),
        Equation(
            formula("A_{s,req}"),
            None,
            None,
            u.area(float(design.steel_required)),
            formula("solves M_{u} = φ A_{s} f_{y} (d − a/2) with a = A_{s} f_{y} / (0.85 f'_{c} b), φ = 0.90"),
            clause="22.2",
        ),
        Equation(
            formula("A_{s,min}"),
            formula(f"{MIN_STEEL_RATIO:g} b h"),
            f"{MIN_STEEL_RATIO:g} × {u.strip_sub()} × {u.sub_small(concrete_h)}",
            u.area(float(design.steel_minimum)),
            clause="7.6.1.1",
        ),
        Equation(
            formula("A_{s,prov}"),
            formula("A_{b} b / s"),
            f"{u.bar_area(the_bar.area)} × {u.strip_sub()} / {u.sub_small(spacing, 1)}" if the_bar else None,
            u.area(float(design.steel_provided)),
            plain(f"{rec.bars}"),
            clause="",
        ),
        Equation(
            formula("φM_{n}"),
            formula("φ A_{s} f_{y} (d − a/2)"),
            None,
            u.moment(float(design.moment_capacity)),
            formula(
                f"φ = {float(design.phi_flexure):.2f} (Table 21.2.2), ε_{{t}} = {float(design.strain):.4f} ≥ 0.004 (7.3.3.1)"
            ),
            clause="22.2.2",
        ),
    ]
    shear_blocks: list[Block] = [
        Equation(
            formula("V_{u}"),
            formula("q_{u} (c − d)"),
            f"{u.q(rec.q_u)} × ({u.feet(c)} − {u.feet(d)})" if c > d else f"{u.q(rec.q_u)} × max({u.feet(c)} − {u.feet(d)}, 0)",
            u.shear(float(design.shear)),
            "at d from the moment section" + ("; the section lies beyond the footing's edge: no demand" if c <= d else ""),
            clause="13.2.7.2",
        ),
    ]
    rho = float(design.steel_provided) / d if d > 0 else 0.0
    coeff = min(VC_COEFFICIENT * rho ** (1.0 / 3.0), VC_LIMIT)
    fc_root = min(result_fc(result), (100.0**2) * PSI)  # √f'c at most 100 psi (22.5.3.1)
    phi = float(shear.record.phi)
    lam = result.strength_table.concrete.lam
    numbers = f"{phi:g} × {coeff:.4f} × {lam:g} × {u.root(fc_root)} × {u.strip_sub()} × {u.sub_small(d)}"
    shear_blocks.append(
        Equation(
            formula("φV_{c}"),
            formula("φ min(8 ∛ρ_{w}, 5) λ √f'_{c} b d"),
            numbers,
            u.shear(float(design.shear_capacity)),
            formula(
                f"ρ_{{w}} = {rho:.5f}; λ_{{s}} = 1 (13.2.6.2); φ = {phi:g}"
                + (" (21.2.4.3, SDC D to F)" if phi < 0.75 else " (Table 21.2.1)")
                + u.root_note(fc_root)
            ),
            clause="22.5.5.1(c)",
        )
    )
    dev: list[Block] = [
        Equation(
            formula("ℓ_{d}"),
            formula("max((3/40) (f_{y} / (λ √f'_{c})) ψ_{t} ψ_{e} ψ_{s} ψ_{g} / ((c_{b} + K_{tr}) / d_{b}) d_{b}, 12 in)"),
            None,
            u.small(float(design.development_length), 1),
            formula("(c_{b} + K_{tr}) / d_{b} ≤ 2.5, K_{tr} = 0 (no stirrups)"),
            clause="25.4.2.4",
        ),
        Equation(
            formula("ℓ_{avail}"),
            formula("c − cover"),
            f"{u.sub_small(c)} − {u.sub_small(grid_cover(result))}",
            u.small(float(design.development_available)),
            "",
            clause="25.4.2.4",
        ),
    ]

    def row(name: str, demand: str, capacity: str, key: str, clause: str) -> tuple[Cell, ...]:
        return _requirement_row(name, demand, capacity, float(design.ratios[key]), clause)

    rows = (
        row("Depth above the bars", u.small(MIN_DEPTH_ABOVE_BARS, 0), u.small(d), "depth", "13.3.1.2"),
        row("Flexure", u.moment(float(design.moment)), u.moment(float(design.moment_capacity)), "flexure", "22.2"),
        row("Minimum steel", u.area(float(design.steel_minimum)), u.area(float(design.steel_provided)), "minimum", "7.6.1.1"),
        row("Bar spacing", u.small(spacing, 1), u.small(float(design.max_spacing), 1), "spacing", "7.7.2.3"),
        row("Net tensile strain", "0.004", f"{float(design.strain):.4f}", "strain", "7.3.3.1"),
        row("One-way shear", u.shear(float(design.shear)), u.shear(float(design.shear_capacity)), "shear", "22.5.5.1"),
        row(
            "Development",
            u.small(float(design.development_length), 1),
            u.small(max(float(design.development_available), 0.0), 1),
            "development",
            "25.4.2.4",
        ),
    )
    fails = tuple(k for k, r in enumerate(rows) if r[-1] != "passes")
    across_ok = flexure.passes and shear.passes
    summary = Group(
        (
            Table(
                ("Requirement", "Demand / limit", "Provided", "Ratio", "ACI 318-19", "Result"),
                rows,
                (0.22, 0.2, 0.2, 0.1, 0.14, 0.14),
                align="LRRRLL",
                font_size=7.0,
                fail_rows=fails,
            ),
            Verdict(
                across_ok,
                f"Across the width: {rec.bars} " + ("passes every requirement." if across_ok else "FAILS (see the rows marked)."),
            ),
        )
    )
    return [*blocks, *shear_blocks, *dev, summary]


def grid_cover(result: Any) -> float:
    """The cover to the bottom bars (m) the design used."""
    return float(result.strength_table.concrete.cover)


def result_fc(result: Any) -> float:
    return float(result.strength_table.concrete.fc)


def _requirement_row(name: str, demand: str, capacity: str, ratio: float, clause: str) -> tuple[Cell, ...]:
    """One row of a requirement table: demand, capacity, the ratio (or "no demand"), the clause, the result."""
    from . import ratio_text

    ok = ratio >= 1.0 - 1e-9
    return (
        name,
        demand,
        capacity,
        "no demand" if math.isinf(ratio) else ratio_text(ratio, 1.0, ok),
        clause,
        "passes" if ok else "FAILS",
    )


def _plain(result: Any, fmt: Formatter, u: MemberUnits, grid: Any, rec: Any, shear_rec: Any) -> list[Block]:
    from . import Equation, Group, Table, Verdict, formula, ratio_text

    design = grid.design
    h_s = float(design.strength_thickness)
    c = float(design.cantilever)
    lam = result.strength_table.concrete.lam
    fc = result_fc(result)
    modulus = (
        f"{float(design.section_modulus) * FOOT / INCH**3:,.1f} in³/ft"
        if u.us
        else f"{float(design.section_modulus) * 1e9:,.0f} mm³/m"
    )
    blocks: list[Block] = [
        Equation(
            formula("h_{s}"),
            formula("h − 2 in"),
            f"{u.sub_small(result.thickness)} − {u.sub_small(SOIL_ALLOWANCE, 0)}",
            u.small(h_s),
            f"strength thickness of concrete cast against soil; h ≥ {u.small(MIN_THICKNESS, 0)} (14.3.2.1)",
            clause="14.5.1.7",
        ),
        Equation(
            formula("S_{m}"),
            formula("b h_{s}² / 6"),
            f"{u.strip_sub()} × ({u.sub_small(h_s)})² / 6",
            modulus,
            clause="14.5.2.1",
        ),
        Equation(
            formula("φM_{n}"),
            formula(f"{PHI_PLAIN:g} × {FLEXURE_COEFFICIENT:g} λ √f'_{{c}} S_{{m}}"),
            f"{PHI_PLAIN:g} × {FLEXURE_COEFFICIENT:g} × {lam:g} × {u.root(fc)} × {modulus}",
            u.moment(float(design.moment_capacity)),
            formula("φ = 0.60 (Table 21.2.1)" + u.root_note(fc)),
            clause="14.5.2.1",
        ),
        Equation(
            formula("V_{u}"),
            formula("q_{u} (c − h_{s})"),
            f"{u.q(rec.q_u)} × ({u.feet(c)} − {u.feet(h_s)})"
            if c > h_s
            else f"{u.q(rec.q_u)} × max({u.feet(c)} − {u.feet(h_s)}, 0)",
            u.shear(float(design.shear)),
            formula(
                "shear section at h_{s} from the moment section"
                + ("; it lies beyond the footing's edge: no demand" if c <= h_s else "")
            ),
            clause="14.4.3.3",
        ),
        Equation(
            formula("φV_{n}"),
            formula(f"{PHI_PLAIN:g} × (4/3) λ √f'_{{c}} b h_{{s}}"),
            f"{PHI_PLAIN:g} × {SHEAR_COEFFICIENT:.4f} × {lam:g} × {u.root(fc)} × {u.strip_sub()} × {u.sub_small(h_s)}",
            u.shear(float(design.shear_capacity)),
            clause="14.5.5.1",
        ),
    ]

    def row(name: str, demand: str, capacity: str, key: str, clause: str) -> tuple[Cell, ...]:
        return _requirement_row(name, demand, capacity, float(design.ratios[key]), clause)

    rows: tuple[tuple[Cell, ...], ...] = (
        row("Thickness", u.small(MIN_THICKNESS, 0), u.small(result.thickness), "thickness", "14.3.2.1"),
        row("Flexure", u.moment(float(design.moment)), u.moment(float(design.moment_capacity)), "flexure", "14.5.2.1"),
        row("One-way shear", u.shear(float(design.shear)), u.shear(float(design.shear_capacity)), "shear", "14.5.5.1"),
    )
    seismic = getattr(grid, "seismic", None)
    if seismic is not None and seismic.applies:  # the continuous bars IBC 2021 1905.6.2 asks of a plain footing
        r = float(np.asarray(seismic.ratio))
        bars_ok = r >= 1.0 - 1e-9
        needed = float(np.asarray(seismic.steel_required))
        rows += (
            (
                "Continuous bars along",
                f"0.002 Ag = {u.total_area(needed)}",
                u.total_area(seismic.steel),
                ratio_text(r, 1.0, bars_ok) if r > 0.0 else "—",
                "IBC 1905.6.2",
                "passes" if bars_ok else "FAILS",
            ),
        )
    ok = rec.passes and shear_rec.passes
    return [
        *blocks,
        Group(
            (
                Table(
                    ("Requirement", "Demand / limit", "Provided", "Ratio", "ACI 318-19", "Result"),
                    rows,
                    (0.22, 0.2, 0.2, 0.1, 0.14, 0.14),
                    align="LRRRLL",
                    font_size=7.0,
                    fail_rows=tuple(k for k, r in enumerate(rows) if r[-1] != "passes"),
                ),
                Verdict(ok, "Across the width: plain concrete " + ("passes." if ok else "FAILS (see the rows marked).")),
            )
        ),
    ]


def _along(
    report: WallReport, fmt: Formatter, u: MemberUnits, design: LongitudinalDesign, index: int, diagram: BeamDiagram
) -> list[Block]:
    """The footing as a beam along L_f: its diagrams, the bars of each face, and the engine's words."""
    from . import CONTENT_WIDTH, Group, Heading, Para, Table, Verdict, formula, plain
    from .drawings import beam_drawing

    result, wall = report.result, report.wall
    case = result.strength_table.cases[index]  # type: ignore[union-attr]
    direction = {"+": " (+)", "-": " (−)"}.get(case.direction.value, "")
    how = (
        f"the overturning as a chord couple at the wall's ends, each chord {fmt.length(wall.chord_offset)} inside the end"
        if wall.construction is WallConstruction.LIGHT_FRAME
        else "the overturning as the linear pressure of a rigid wall"
    )
    plain_mn = getattr(design, "plain_moment_capacity", None)
    plain_vn = getattr(design, "plain_shear_capacity", None)
    plain_carries = bool(getattr(design, "plain_carries", False))  # the engine's finding, not re-derived
    rows: list[tuple[Cell, ...]] = []
    fails = []
    for k, face in enumerate((design.bottom, design.top)):
        if not face.needed and not face.bars:
            rows.append((face.face, "not in tension", "", "", "", "", "", "", "—"))
            continue
        rows.append(
            (
                face.face,
                f"{u.beam_moment(abs(face.moment))} at x = {fmt.length(face.at)}",  # the column is |M|: never "−0.00"
                u.small(face.effective_depth),
                u.total_area(face.steel_required) if math.isfinite(face.steel_required) else "none suffices",
                u.total_area(face.steel_minimum),
                f"{face.bars or '—'} ({u.total_area(face.steel_provided)})",
                u.beam_moment(face.moment_capacity),
                f"{u.force(abs(face.shear))} / {u.force(face.shear_capacity)}",
                "passes" if face.passes else ("not needed: plain carries" if plain_carries else "FAILS"),
            )
        )
        if not face.passes and not plain_carries:
            fails.append(k)
    blocks: list[Block] = [
        Heading("Along the length: the footing as a beam", 2),
        Para(
            formula(
                f"{case.combination.name}{direction} governs. Loads: factored self weight over L_{{f}}, the wall's factored "
                f"loads, {how}, against the rigid-footing soil pressure. Bars: A_{{s}} ≥ 0.0018 B h (7.6.1.1), two at least, "
                "fitting the width (25.2.1); |V| ≤ φV_{c} (22.5.5.1) everywhere."
            ),
            "small",
        ),
        beam_drawing(diagram, fmt, CONTENT_WIDTH, 96.0, f"{case.combination.name}{direction}"),
        *(
            [
                Para(
                    formula(
                        f"Plain section along the length: φM_{{n}} = {u.beam_moment(plain_mn)} (14.5.2.1) and φV_{{n}} = "
                        f"{u.force(plain_vn or 0.0)} (14.5.5.1) of the whole section B × (h − 2 in) against |M| and |V| above"
                        + (
                            "; it carries them, so the bars below are not needed for strength."
                            if plain_carries
                            else "; it does not carry them, so the bars below must."
                        )
                    ),
                    "small",
                )
            ]
            if plain_mn is not None
            else []
        ),
        Group(
            (
                Table(
                    (
                        "Face",
                        "|M| at",
                        "d",
                        formula("A_{s,req}"),
                        formula("A_{s,min}"),
                        "Bars",
                        formula("φM_{n}"),
                        formula("|V| / φV_{c}"),
                        "Result",
                    ),
                    tuple(rows),
                    (0.07, 0.19, 0.07, 0.1, 0.09, 0.15, 0.1, 0.14, 0.09),
                    align="LLRRRLRRL",
                    font_size=7.0,
                    fail_rows=tuple(fails),
                ),
                Verdict(
                    design.passes,
                    plain(
                        "Along the length: the footing passes as a beam."
                        if design.passes
                        else f"Along the length: the footing FAILS as a beam: {design.message}."
                    ),
                ),
            )
        ),
    ]
    return blocks

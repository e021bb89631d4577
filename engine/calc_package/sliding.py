"""The sliding check's sheet: resistance against the shear in the governing case."""

from __future__ import annotations

import math

from ..model import Check, Project, Wall
from ..results import WallResult
from ..units import Kind
from . import (
    Block,
    Equation,
    Formatter,
    _case_of,
    _check_verdict,
    _governing_heading,
    _join,
    _lateral_terms,
    _lead,
    _n_equation,
    _no_demand,
    _tail,
    formula,
    plain,
    ratio_text,
)


def sliding_sheet(project: Project, wall: Wall, result: WallResult, fmt: Formatter) -> list[Block]:
    """Sliding in its governing case: the shear, friction, cohesion and passive resistance, and the ratio."""
    g = result.governing[Check.SLIDING]
    if math.isinf(g.ratio):
        return _no_demand("Sliding", "No case has a lateral shear: no demand.")
    case, combo, i, f_d = _case_of(result, g)
    sl = case.sliding
    assert sl is not None
    soil = project.soil
    N = fmt.sub(case.vertical, Kind.FORCE)
    B, t = fmt.term(result.width), fmt.term(result.thickness)
    hs = fmt.term(wall.footing.cover)
    blocks: list[Block] = _governing_heading(Check.SLIDING, g)
    blocks.append(
        Equation(
            formula("V"),
            formula("Σ f H"),
            _join(_lateral_terms(wall, combo, g.direction, fmt, with_arm=False)),
            fmt.force(sl.force),
        )
    )
    bearing = result.governing[Check.BEARING]
    if not math.isinf(bearing.ratio) and bearing.combination == g.combination:
        blocks.append(
            Equation(
                formula("N"), None, None, N, "vertical load on the soil; same combination as the bearing check, built up there"
            )
        )
    else:
        n_eq = _n_equation(wall, result, combo, f_d, case.vertical, fmt)
        blocks.append(n_eq)
    if case.vertical > 0.0:
        blocks.append(Equation(formula("F_{μ}"), formula("μ N"), f"{soil.friction:g} × {N}", fmt.force(sl.friction)))
    else:
        blocks.append(Equation(formula("F_{μ}"), None, None, fmt.force(sl.friction), "N ≤ 0: no friction"))
    if soil.cohesion > 0.0:
        a = fmt.exact(float(result.evaluation.contact_length[i]))
        blocks.append(
            Equation(
                formula("F_{c}"),
                formula("min(c B a, 0.5 N)"),
                f"min({fmt.pressure(soil.cohesion)} × {fmt.exact(result.width)} × {a}, 0.5 × {N})",
                fmt.force(sl.cohesion),
                "cohesion c over the contact length a, capped at half of N (see the design basis)",
            )
        )
    else:
        blocks.append(Equation(formula("F_{c}"), None, None, fmt.force(sl.cohesion), "no cohesion (c = 0)"))
    if soil.passive > 0.0:
        z = fmt.term(soil.passive_ignore)
        note = "passive on the end face from z_{0} = max(h_{s}, ignored depth) below grade to the base at h_{s} + t_{f}"
        if sl.passive == 0.0:
            note = "the ignored depth reaches the base: no passive resistance"
        blocks.append(
            Equation(
                formula("F_{p}"),
                formula("p_{p} B ((h_{s} + t_{f})² − z_{0}²) / 2"),
                f"{fmt.weight_term(soil.passive, Kind.PRESSURE_GRADIENT)} × {B} × (({hs} + {t})² − max({hs}, {z})²) / 2",
                fmt.force(sl.passive),
                formula(note),
            )
        )
    else:
        blocks.append(Equation(formula("F_{p}"), None, None, fmt.force(sl.passive), formula("no passive resistance (p_{p} = 0)")))
    blocks += [
        Equation(
            formula("R"),
            formula("F_{μ} + F_{c} + F_{p}"),
            f"{fmt.force(sl.friction)} + {fmt.force(sl.cohesion)} + {fmt.force(sl.passive)}",
            fmt.force(sl.resistance),
            clause="IBC 1806.3.1",  # friction and passive combined
        ),
        Equation(
            formula("ratio"),
            formula("R / V"),
            f"{fmt.force(sl.resistance)} / {fmt.force(sl.force)}",
            plain(ratio_text(sl.ratio, sl.required, sl.passes), bold=True),
        ),
        _check_verdict(Check.SLIDING, sl.ratio, sl.required, sl.passes),
    ]
    return _lead(_tail(blocks, 2), 2)

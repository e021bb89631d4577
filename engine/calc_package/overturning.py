"""The overturning check's sheet: the moments about the toe in the governing case."""

from __future__ import annotations

import math

from ..loads import vertical_resultants
from ..model import Check, Project, Wall
from ..results import WallResult
from ..units import Kind
from . import (
    Block,
    Equation,
    Formatter,
    Para,
    _case_of,
    _check_verdict,
    _governing_heading,
    _join,
    _lateral_terms,
    _lead,
    _no_demand,
    _position,
    _tail,
    factor_text,
    formula,
    plain,
    ratio_text,
)


def overturning_sheet(project: Project, wall: Wall, result: WallResult, fmt: Formatter) -> list[Block]:
    """Overturning in its governing case: the moments about the toe, written out, and the ratio."""
    g = result.governing[Check.OVERTURNING]
    if math.isinf(g.ratio):
        return _no_demand("Overturning", "No case produces an overturning moment (no lateral load and no uplift): no demand.")
    case, combo, i, f_d = _case_of(result, g)
    ot = case.overturning
    assert ot is not None
    toe_sign = float(result.table.toe_sign[i])
    L = fmt.length(result.length)
    L_term = fmt.term(result.length)
    toe = (
        f"toe at x = L_{{f}} = {L} (the end the load pushes toward)"
        if toe_sign > 0
        else "toe at x = 0 (the end the load pushes toward)"
    )
    resisting, overturning = [], []
    mirrored = False
    for v in vertical_resultants(wall):
        f = combo.factor(v.case)
        if f == 0.0 or v.force == 0.0:
            continue
        x = fmt.term(_position(v, g.direction))
        mirrored = mirrored or (g.direction == "-" and abs(v.x_reversed - v.x) > 1e-9)
        arm = f"({L_term} − {x})" if toe_sign > 0 else x
        if f * v.force > 0.0:  # downward: resists
            resisting.append(f"{factor_text(f)} × {fmt.sub(v.force, Kind.FORCE)} × {arm}")
        else:  # upward: overturns
            overturning.append(f"|{factor_text(f)} × {fmt.sub(v.force, Kind.FORCE)}| × {arm}")
    weight = fmt.sub(result.self_weight.total, Kind.FORCE)
    if f_d > 0.0:
        resisting.append(f"{factor_text(f_d)} × {weight} × {L_term}/2")
    elif f_d < 0.0:
        overturning.append(f"|{factor_text(f_d)}| × {weight} × {L_term}/2")
    lateral = _lateral_terms(wall, combo, g.direction, fmt, with_arm=True)
    # said once for both moments
    mirror_note = ' Loads that reverse are at their mirror position (direction −; loads table, after "−:").' if mirrored else ""
    blocks: list[Block] = _governing_heading(Check.OVERTURNING, g)
    blocks.append(
        Para(formula(f"Moments about the {toe}. Arms of vertical loads are measured from the toe.{mirror_note}"), "small")
    )
    blocks += [
        Equation(
            formula("M_{OT}"),
            formula("Σ f H (h + t_{f}) + Σ |f P| arm (uplift)" + (" + |f_{D}| W L_{f}/2" if f_d < 0 else "")),
            _join(lateral + overturning),
            fmt.moment(ot.moment),
        ),
        Equation(
            formula("M_{R}"),
            formula("Σ f P arm (downward loads)" + (" + f_{D} W L_{f}/2" if f_d > 0 else "")),
            _join(resisting),
            fmt.moment(ot.resisting),
        ),
        Equation(
            formula("ratio"),
            formula("M_{R} / M_{OT}"),
            f"{fmt.moment(ot.resisting)} / {fmt.moment(ot.moment)}",
            plain(ratio_text(ot.ratio, ot.required, ot.passes), bold=True),
        ),
    ]
    blocks.append(_check_verdict(Check.OVERTURNING, ot.ratio, ot.required, ot.passes))
    return _lead(_tail(blocks, 2), 2)

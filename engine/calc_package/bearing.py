"""The soil bearing check's sheet: the soil pressure in the governing case, against the kern."""

from __future__ import annotations

import math

from ..loads import vertical_resultants
from ..model import BearingBasis, Check, Project, Wall
from ..results import WallResult
from ..soil_pressure import pressure_diagram
from ..units import Kind
from . import (
    CONTENT_WIDTH,
    Block,
    Equation,
    Formatter,
    Group,
    Para,
    _case_of,
    _check_verdict,
    _governing_heading,
    _join,
    _lateral_terms,
    _lead,
    _n_equation,
    _no_demand,
    _position,
    _tail,
    factor_text,
    formula,
    plain,
    ratio_text,
)
from .drawings import pressure_drawing


def bearing_sheet(project: Project, wall: Wall, result: WallResult, fmt: Formatter) -> list[Block]:
    """Soil bearing in its governing case: N, M, e against the kern, the peak pressure and the diagram."""
    g = result.governing[Check.BEARING]
    if math.isinf(g.ratio):
        return _no_demand("Soil bearing", "No case presses on the soil: no demand.", "Bearing")
    case, combo, i, f_d = _case_of(result, g)
    br = case.bearing
    assert br is not None
    soil = project.soil
    L = fmt.term(result.length)
    Ld, Bd = fmt.exact(result.length), fmt.exact(result.width)
    # N and M carry the digits the lines below use (one more than the display precision when not exact)
    N, M = fmt.sub(case.vertical, Kind.FORCE), fmt.sub(case.moment, Kind.MOMENT)
    m_terms = []
    mirrored = False
    for v in vertical_resultants(wall):
        f = combo.factor(v.case)
        if f == 0.0 or v.force == 0.0:
            continue
        x = _position(v, g.direction)
        mirrored = mirrored or (g.direction == "-" and abs(v.x_reversed - v.x) > 1e-9)
        if abs(x - 0.5 * result.length) > 1e-9:  # a load at mid-length adds no moment about it
            m_terms.append(f"{factor_text(f)} × {fmt.sub(v.force, Kind.FORCE)} × ({fmt.term(x)} − {L}/2)")
    lateral = _lateral_terms(wall, combo, g.direction, fmt, with_arm=True)
    if lateral:
        sign = "" if g.direction == "+" else "−"
        m_terms.insert(0, f"{sign}[{' + '.join(lateral)}]")
    m_note = "about mid-length, + toward x = L_{f}"
    if mirrored:
        m_note += "; reversing loads mirrored (direction −)"
    blocks: list[Block] = _governing_heading(Check.BEARING, g)
    blocks += [
        _n_equation(wall, result, combo, f_d, case.vertical, fmt),
        Equation(
            formula("M"),
            formula("± Σ f H (h + t_{f}) + Σ f P (x − L_{f}/2)"),
            _join(m_terms),
            fmt.carried(case.moment, Kind.MOMENT),
            formula(m_note),
        ),
    ]
    if not br.stable:
        blocks += [
            Equation(
                formula("e"),
                formula("M / N"),
                f"{M} / {N}",
                formula(fmt.signed_length(br.eccentricity)) if math.isfinite(br.eccentricity) else "∞",
                column=fmt.decimal(br.eccentricity) if math.isfinite(br.eccentricity) else "∞",
            ),
            Para(
                formula(
                    "N ≤ 0 or |e| ≥ L_{f}/2: the resultant falls outside the footing and the footing cannot be in "
                    "equilibrium on the soil. It overturns; bearing fails."
                ),
                "fail",
            ),
            _check_verdict(Check.BEARING, br.ratio, br.required, br.passes),
        ]
        return [Group(tuple(blocks))]
    e_abs = fmt.decimal(abs(br.eccentricity))
    beyond = br.contact_length < result.length * (1.0 - 1e-9)
    diagram = pressure_diagram(case.vertical, br.eccentricity, result.width, result.length)
    kern_half = br.kern_eccentricity  # L_f/6, from the engine
    blocks.append(
        Equation(
            formula("e"),
            formula("M / N"),
            f"{M} / {N}",
            formula(fmt.signed_length(br.eccentricity)),
            column=fmt.decimal(br.eccentricity),  # the side it lies toward is on the line
        )
    )
    if not beyond:
        blocks += [
            Equation(
                formula("|e|"),
                None,
                None,
                formula(f"{e_abs} ≤ L_{{f}}/6 = {fmt.decimal(kern_half)}", bold=True),
                "",  # the column says it: the resultant is in the kern (middle third), the whole footing in contact
                column="in the kern",  # the comparison is on the line
            ),
            Equation(
                formula("q_{max}"),
                formula("N / (B L_{f}) (1 + 6|e| / L_{f})"),
                f"{N} / ({Bd} × {Ld}) × (1 + 6 × {e_abs} / {Ld})",
                fmt.pressure(br.q_max),
            ),
            Equation(
                formula("q_{min}"),
                formula("N / (B L_{f}) (1 − 6|e| / L_{f})"),
                f"{N} / ({Bd} × {Ld}) × (1 − 6 × {e_abs} / {Ld})",
                fmt.pressure(br.q_min),
            ),
        ]
    else:
        a_text = fmt.decimal(br.contact_length) + (f" ({fmt.length(br.contact_length)})" if fmt.units == "US" else "")
        blocks += [
            Equation(
                formula("|e|"),
                None,
                None,
                formula(f"{e_abs} > L_{{f}}/6 = {fmt.decimal(kern_half)}", bold=True),
                "the resultant is beyond the kern: only part of the footing is in contact and the pressure is a triangle",
                column="beyond the kern",  # the comparison is on the line
            ),
            Equation(
                formula("a"),
                formula("3 (L_{f}/2 − |e|)"),
                f"3 × ({Ld}/2 − {e_abs})",
                a_text,
                "contact length",
                column=fmt.decimal(br.contact_length),
            ),
            Equation(
                formula("q_{max}"),
                formula("2N / (3B (L_{f}/2 − |e|))"),
                f"2 × {N} / (3 × {Bd} × ({Ld}/2 − {e_abs}))",
                fmt.pressure(br.q_max),
            ),
            Equation(formula("q_{min}"), None, None, fmt.pressure(br.q_min), "no tension beyond the contact length"),
        ]
    tail: list[Block] = []
    if soil.bearing_basis is BearingBasis.NET:
        tail.append(
            Equation(
                formula("q"),
                formula("q_{max} − γ_{s} (h_{s} + t_{f})"),
                f"{fmt.pressure(br.q_max)} − {fmt.weight_term(soil.unit_weight)} × ({fmt.term(wall.footing.cover)} + {fmt.term(result.thickness)})",
                fmt.pressure(br.pressure_compared),
                "net pressure, for a net allowable",
            )
        )
        q_symbol = "q"
    else:
        q_symbol = "q_{max}"
    if combo.has_wind_or_seismic and project.criteria.bearing_increase != 1.0:
        tail.append(
            Equation(
                formula("q_{a}"),
                formula("q_{a,report} × increase"),
                f"{fmt.pressure(soil.allowable_bearing)} × {factor_text(project.criteria.bearing_increase)}",
                fmt.pressure(br.allowable),
                "combination with W or E",
            )
        )
    else:
        tail.append(Equation(formula("q_{a}"), None, None, fmt.pressure(br.allowable), "allowable bearing pressure"))
    tail += [
        Equation(
            formula("ratio"),
            formula(f"q_{{a}} / {q_symbol}"),
            f"{fmt.pressure(br.allowable)} / {fmt.pressure(br.pressure_compared)}",
            plain(ratio_text(br.ratio, br.required, br.passes), bold=True),
        ),
        _check_verdict(Check.BEARING, br.ratio, br.required, br.passes, f"q_{{a}} / {q_symbol}"),
    ]
    drawing = pressure_drawing(diagram, br.allowable, result, g, fmt, CONTENT_WIDTH, 118.0)
    # the heading and the equations from N to the pressures on one sheet; the allowable, ratio and
    # verdict on one sheet; the diagram with them when it fits
    return [*_lead(blocks, 2), *_tail(tail, 2), drawing]

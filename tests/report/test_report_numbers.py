"""The numbers printed in the demo package are the engine's results, formatted the project's way.

Source of every expected value: the engine itself (engine.results.check_wall, engine.sizing.size_footing,
engine.schedule.schedule_rows) run here on the demo project; what is under test is that the calc package
prints those values, in the right place, with the precision issue 4 item 7 asks for (kips to two
decimals, psf whole numbers, feet-inches for US lengths: common practice). The arithmetic checks
re-add the substituted terms the package prints and compare them with the engine's total.
"""

from __future__ import annotations

import math
import re

import pytest
from kernline.engine.model import Check
from kernline.engine.results import check_wall
from kernline.engine.schedule import schedule_rows
from kernline.engine.sizing import size_footing
from kernline.engine.units import Kind, format_length, format_quantity, to_display
from report_helpers import RenderedPackage

US = "US"


def force(value: float) -> str:
    return format_quantity(value, Kind.FORCE, US)


def moment(value: float) -> str:
    return format_quantity(value, Kind.MOMENT, US)


def pressure(value: float) -> str:
    return format_quantity(value, Kind.PRESSURE, US)


def minus(text: str) -> str:
    """A leading hyphen as the true minus sign the package prints."""
    return "−" + text[1:] if text.startswith("-") else text


def carried(value: float, kind: Kind = Kind.FORCE) -> str:
    """A force or moment as the equations carry it: the trade's precision (kips and kip·ft to two
    decimals) when that is exact, else one decimal more, so that the printed lines recompute
    (engine.calc_package._Fmt.carried; review item 1)."""
    decimals = kind.info.decimals_us
    shown = to_display(value, kind, US)
    if abs(shown - round(shown, decimals)) > 1e-7:
        decimals += 1
    return minus(format_quantity(value, kind, US, decimals))


def feet(value: float) -> str:
    """A computed length in decimal feet to three places, as substituted (review item 1)."""
    return minus(f"{value / 0.3048:,.3f} ft")


def ratio(value: float) -> str:
    return "—" if math.isinf(value) else f"{value:.2f}"


def shown(result) -> str:
    """A check's ratio as the package prints it: two decimals, three where two would read as the
    opposite verdict (0.997 failing against 1.00)."""
    if math.isinf(result.ratio):
        return "—"
    if (round(result.ratio, 2) >= result.required) != result.passes:
        return f"{result.ratio:.3f}"
    return f"{result.ratio:.2f}"


def test_ratio_text_never_contradicts_the_verdict() -> None:
    """A failing 0.997 is not printed as 1.00; a passing 1.004 is (rule of engine.calc_package.ratio_text)."""
    from kernline.engine.calc_package import ratio_text

    assert ratio_text(0.997, 1.0, False) == "0.997"
    assert ratio_text(0.9996, 1.0, False) == "0.9996"
    assert ratio_text(1.004, 1.0, True) == "1.00"
    assert ratio_text(1.37, 1.0, True) == "1.37"
    assert ratio_text(math.inf, 1.0, True) == "no demand"


@pytest.fixture(scope="module")
def results(demo_document):
    project = demo_document.project
    return {w.id: (w, check_wall(project, w)) for w in project.walls}


def test_precision_follows_the_trade(results) -> None:
    """Kips print with two decimals and psf as whole numbers (issue 4 item 7; common practice)."""
    _, r = results["N1"]
    assert re.fullmatch(r"-?[\d,]+\.\d\d kip", force(r.self_weight.total))
    assert re.fullmatch(r"[\d,]+ psf", pressure(r.cases[0].bearing.q_max))


@pytest.mark.parametrize("wall_id", ["N1", "S2", "C3", "E4"])
def test_self_weight_build_up(demo: RenderedPackage, results, wall_id: str) -> None:
    """Footing, stem, soil and total self weight are the engine's (engine.results self_weight)."""
    _, r = results[wall_id]
    text = demo.text_of(f"Wall {wall_id}")
    sw = r.self_weight
    for value in (sw.footing, sw.stem, sw.soil, sw.total):
        assert f"= {carried(value)}" in text, carried(value)
    assert f"= {carried(sw.footing)} + {carried(sw.stem)} + {carried(sw.soil)} = {carried(sw.total)}" in text
    assert f"= {carried(sw.total)} {carried(sw.total)}" in text  # repeated in the results column


@pytest.mark.parametrize("wall_id", ["N1", "S2", "C3", "E4"])
def test_overturning_equations(demo: RenderedPackage, results, wall_id: str) -> None:
    """M_OT, M_R and their ratio for the governing case, written out, are the engine's."""
    _, r = results[wall_id]
    g = r.governing[Check.OVERTURNING]
    ot = r.cases[g.case_index].overturning
    text = demo.text_of(f"Wall {wall_id}")
    assert f"Overturning: governing case {g.combination}" in text
    assert f"= {moment(ot.moment)}" in text
    assert f"= {moment(ot.resisting)}" in text
    assert f"ratio = MR / MOT = {moment(ot.resisting)} / {moment(ot.moment)} = {ratio(ot.ratio)}" in text
    assert f"Overturning passes: MR / MOT = {ratio(ot.ratio)} ≥ {ot.required:.2f} required." in text


@pytest.mark.parametrize("wall_id", ["N1", "S2", "C3", "E4"])
def test_sliding_equations(demo: RenderedPackage, results, wall_id: str, demo_document) -> None:
    """Shear, friction, cohesion, passive, resistance and ratio of the governing case are the engine's."""
    _, r = results[wall_id]
    g = r.governing[Check.SLIDING]
    case = r.cases[g.case_index]
    sl = case.sliding
    text = demo.text_of(f"Wall {wall_id}")
    mu = demo_document.project.soil.friction
    assert f"Fμ = μ N = {mu:g} × {carried(case.vertical)} = {force(sl.friction)}" in text
    assert "N = Σ f P + fD W = " in text or "same combination as the bearing check" in text  # N built up (review item 2)
    assert f"Fc = {force(sl.cohesion)}" in text
    assert f"= {force(sl.passive)}" in text
    assert (
        f"R = Fμ + Fc + Fp = {force(sl.friction)} + {force(sl.cohesion)} + {force(sl.passive)} = {force(sl.resistance)}" in text
    )
    assert f"ratio = R / V = {force(sl.resistance)} / {force(sl.force)} = {ratio(sl.ratio)}" in text


@pytest.mark.parametrize("wall_id", ["N1", "S2", "C3", "E4"])
def test_bearing_equations(demo: RenderedPackage, results, wall_id: str) -> None:
    """N, M, e, the kern comparison, q_max and q_min (or the contact length) and the ratio are the engine's."""
    _, r = results[wall_id]
    g = r.governing[Check.BEARING]
    case = r.cases[g.case_index]
    br = case.bearing
    text = demo.text_of(f"Wall {wall_id}")
    assert f"= {carried(case.vertical)}" in text
    assert f"= {carried(case.moment, Kind.MOMENT)}" in text
    m_sub = carried(case.moment, Kind.MOMENT)
    m_sub = f"({m_sub})" if m_sub.startswith("−") else m_sub
    side = "toward x = 0" if br.eccentricity < 0 else "toward x = Lf"
    e_text = f"{feet(br.eccentricity)} ({format_length(abs(br.eccentricity), US)} {side})"
    assert f"e = M / N = {m_sub} / {carried(case.vertical)} = {e_text}" in text
    assert f"qmax = {pressure(br.q_max)}" in text or f"= {pressure(br.q_max)}" in text
    assert f"qa = {pressure(br.allowable)}" in text
    assert f"= {pressure(br.allowable)} / {pressure(br.pressure_compared)} = {ratio(br.ratio)}" in text
    if br.contact_length < r.length - 1e-9:  # beyond the kern: a triangle and its contact length
        assert "> Lf/6" in text and f"= {feet(br.contact_length)} ({format_length(br.contact_length, US)})" in text
        assert "qmin = 0 psf" in text
    else:
        assert "≤ Lf/6" in text and f"= {pressure(br.q_min)}" in text
    # the diagram's labels, with subscripts (extracted as separate pieces), never a literal underscore
    assert f"q max = {pressure(br.q_max)}" in text and f"q a = {pressure(br.allowable)}" in text
    assert "q_" not in text


def test_beyond_the_kern_case_is_shown(demo: RenderedPackage, results) -> None:
    """The demo's S2 governs bearing with the resultant beyond the kern (engine: contact < L)."""
    _, r = results["S2"]
    br = r.cases[r.governing[Check.BEARING].case_index].bearing
    assert br.contact_length < r.length
    assert f"contact a = {format_length(br.contact_length, US)}" in demo.text_of("Wall S2")


def _terms(expression: str) -> list[float]:
    """Values of "f × v kip" terms of a printed sum."""
    out = []
    for term in expression.split(" + "):
        m = re.fullmatch(r"([\d.]+) × \(?(−?[\d,.]+) kip\)?", term.strip())
        assert m, term
        out.append(float(m.group(1)) * float(m.group(2).replace(",", "").replace("−", "-")))
    return out


@pytest.mark.parametrize("wall_id", ["N1", "S2", "C3", "E4"])
def test_printed_terms_add_up_to_the_engine_total(demo: RenderedPackage, results, wall_id: str) -> None:
    """Re-adding the substituted terms of N and V gives the engine's N and V (to the printed rounding)."""
    _, r = results[wall_id]
    text = demo.text_of(f"Wall {wall_id}")
    m = [*re.finditer(r"N = Σ f P \+ fD W = (.*?) = (-?[\d,.]+) kip", text)][-1]  # the bearing check's (after sliding's)
    terms = _terms(m.group(1))
    n = to_display(r.cases[r.governing[Check.BEARING].case_index].vertical, Kind.FORCE, US)
    assert float(m.group(2).replace(",", "")) == pytest.approx(n, abs=0.0005)
    assert sum(terms) == pytest.approx(n, abs=0.006 * len(terms) + 0.005)
    m = re.search(r"V = Σ f H = (.*?) = ([\d,.]+) kip", text)
    assert m
    terms = _terms(m.group(1))
    v = to_display(r.cases[r.governing[Check.SLIDING].case_index].lateral, Kind.FORCE, US)
    assert sum(terms) == pytest.approx(v, abs=0.006 * len(terms) + 0.005)


@pytest.mark.parametrize("wall_id", ["N1", "S2", "C3", "E4"])
def test_results_table_and_verdicts(demo: RenderedPackage, results, wall_id: str) -> None:
    """Each check's heading names its governing case, and its verdict gives the ratio and the required value."""
    _, r = results[wall_id]
    text = demo.text_of(f"Wall {wall_id}")
    for check, title in ((Check.OVERTURNING, "Overturning"), (Check.SLIDING, "Sliding"), (Check.BEARING, "Soil bearing")):
        g = r.governing[check]
        case = g.combination if g.direction == "none" else f"{g.combination} ({g.direction.replace('-', '−')})"
        verdict = "passes" if g.passes else "FAILS"
        assert f"{title}: governing case {case}" in text
        assert f"{title} {verdict}: " in text
        assert f" = {ratio(g.ratio)} {'≥' if g.passes else '<'} {g.required:.2f} required." in text


@pytest.mark.parametrize("wall_id", ["N1", "S2", "C3", "E4"])
def test_sizing_section(demo: RenderedPackage, demo_document, wall_id: str) -> None:
    """Bounds and steps searched, the smallest passing size, and why the next smaller fails (engine.sizing)."""
    project = demo_document.project
    wall = next(w for w in project.walls if w.id == wall_id)
    s = size_footing(project, wall)
    text = demo.text_of(f"Wall {wall_id}")
    z = wall.sizing
    assert (
        f"B from {format_length(z.width_min, US)} to {format_length(z.width_max, US)} by {format_length(z.width_step, US)}"
        in text
    )
    assert f"{s.candidates:,} candidates" in text
    assert f"Smallest passing size: B × tf = {format_length(s.width, US)} × {format_length(s.thickness, US)}." in text
    col = list(s.widths).index(s.width)
    row = list(s.thicknesses).index(s.thickness)
    if col > 0 and not s.passes[row, col - 1]:
        worst = min(float(v) for v in s.check_normalized[:, row, col - 1])
        assert f"{worst:.3f}" in text
    # at the lower bounds the size is set by code minimums, which the sheet says (review item 7)
    at_lower_bounds = (row, col) == (0, 0)
    assert ("The lower bounds pass" in text) == at_lower_bounds
    current = (wall.footing.width, wall.footing.thickness) == (s.width, s.thickness)
    assert ("The current footing is this smallest passing size." in text) == current


def test_summary_schedule_matches_the_engine_schedule(demo: RenderedPackage, demo_document, results) -> None:
    """Each wall's footing and governing ratios in the summary are the engine's (as engine.schedule prints them)."""
    project = demo_document.project
    rows = schedule_rows(project, [results[w.id][1] for w in project.walls])
    text = demo.text_of("Summary schedule")
    for row, wall in zip(rows, project.walls, strict=True):
        assert f"{row[3]} × {row[4]} × {row[5]}" in text
        r = results[wall.id][1]
        for check in (Check.OVERTURNING, Check.SLIDING, Check.BEARING):
            g = r.governing[check]
            assert f"{ratio(g.ratio)} / {g.required:.2f}" in text


def _appendix_row(case, governs: list[str], length: float) -> str:
    def num(value: float, kind: Kind) -> str:
        if kind is Kind.LENGTH:  # decimal feet to three places (review item 12: the unit is in the header)
            return minus(f"{value / 0.3048:,.3f}")
        decimals = kind.info.decimals_us
        return minus(f"{to_display(value, kind, US):,.{decimals}f}")

    def short(result) -> str:
        return "no dem." if math.isinf(result.ratio) else shown(result)

    ot, sl, br = case.overturning, case.sliding, case.bearing
    failing = [n for n, x in (("OT", ot), ("SL", sl), ("BR", br)) if x is not None and not x.passes]
    e_cell = num(br.eccentricity, Kind.LENGTH)
    if br.contact_length < length * (1 - 1e-9):  # flagged beyond the kern with its contact length
        e_cell += f" a = {num(br.contact_length, Kind.LENGTH)}"
    cells = [
        case.combination,
        {"+": "+", "-": "−", "none": "none"}[case.direction],
        num(case.vertical, Kind.FORCE),
        num(case.lateral, Kind.FORCE),
        num(case.moment, Kind.MOMENT),
        e_cell,
        num(ot.moment, Kind.MOMENT),
        num(ot.resisting, Kind.MOMENT),
        short(ot),
        num(sl.resistance, Kind.FORCE),
        short(sl),
        num(br.q_max, Kind.PRESSURE),
        num(br.allowable, Kind.PRESSURE),
        short(br),
        ("passes" if not failing else "FAILS " + ", ".join(failing)) + (f" * {', '.join(governs)}" if governs else ""),
    ]
    return " ".join(cells)


@pytest.mark.parametrize("wall_id", ["N1", "S2", "C3", "E4"])
def test_appendix_lists_every_case(demo: RenderedPackage, results, wall_id: str) -> None:
    """Every combination in every direction has its row, with the engine's numbers (units in the header)."""
    _, r = results[wall_id]
    text = demo.text_of("Appendix: all cases")
    names = {Check.OVERTURNING: "OT", Check.SLIDING: "SL", Check.BEARING: "BR"}
    assert len(r.cases) > 16
    for k, case in enumerate(r.cases):
        governs = [names[c] for c, g in r.governing.items() if g.case_index == k]
        assert _appendix_row(case, governs, r.length) in text, (wall_id, k)

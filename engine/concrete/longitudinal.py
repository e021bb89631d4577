"""The wall footing along its length: a beam on the soil under the wall's factored loads.

The footing of length L_f is a free beam: the wall pushes it down (line loads in N/m over
[start, end] and point loads in N at x), the soil pushes it up with the rigid-footing pressure q(x)
times the width B (N/m). Positions x are measured from the footing's start end (not the wall's).

Shear and moment follow by integration from the start end (statics, derived here):
V(x) = ∫0^x (B q - w) dξ - Σ P_i [a_i <= x] (the sum of the forces left of x, upward positive) and
M(x) = ∫0^x V dξ, positive when the bottom face is in tension. Between stations the soil pressure is
linear, so both integrals are evaluated exactly per segment. When loads and pressure are in
equilibrium V and M close to zero at the far end; the residuals are reported.

Light-frame walls deliver their overturning through the chords at the wall's ends: a couple of
point loads ±M / (ℓw - 2 a) at a = ``chord_offset`` inside each end (statics; the offset of 3 in,
about half the width of a doubled stud chord, is an assumption that the engineer may change).

The design takes bottom bars for the largest positive moment and top bars for the largest negative
moment (ACI 318-19 22.2 with φ from 21.2.2), at least As,min = 0.0018 B h on each face that the
analysis puts in tension (7.6.1.1 and Table 24.4.3.2: the footing treated as a one-way slab along its
length, an assumption that is conservative for the top face), at least two bars (common practice),
bars that fit in the width with the clear spacing of 25.2.1 and the side cover of 20.5.1.3, and
one-way shear |V| <= φVc of 22.5.5.1(c) at every station with ρw of the bars on the face in tension
there (the reduction to the section at d from a support is not taken: conservative).
"""

from __future__ import annotations

import math
from bisect import bisect_left
from collections.abc import Sequence
from dataclasses import dataclass
from functools import lru_cache

import numpy as np

from ..errors import InputError
from ..soil_pressure import PressureDistribution, pressure_at, pressure_distribution
from .bars import INCH, Bar, counted_text, parse_counted, practical_bars
from .transverse import (
    MIN_NET_TENSILE_STRAIN,
    PHI_SHEAR,
    TOLERANCE,
    Materials,
    flexural_strength,
    minimum_steel,
    one_way_shear_strength,
    steel_required,
)

# The distance of a light-frame chord's centroid from the wall's end (an assumption; editable).
CHORD_OFFSET = 3.0 * INCH
# ACI 318-19 20.5.1.3 (Table 20.5.1.3.1): cover of concrete exposed to earth, No. 6 to No. 18 bars
# (taken for every top bar; from memory, M).
TOP_COVER = 2.0 * INCH
# ACI 318-19 25.2.1: clear spacing of parallel bars in a layer at least 1 in, db and (4/3) d_agg.
MIN_CLEAR_SPACING = 1.0 * INCH
AGGREGATE_FACTOR = 4.0 / 3.0
# Nominal maximum size of coarse aggregate assumed when none is given (common practice).
AGGREGATE = 0.75 * INCH
# At least two longitudinal bars on a face that needs steel (common practice).
MIN_BARS = 2
# Nodes closer than this fraction of the footing's length are one node (rounding, not geometry).
NODE_GAP = 1e-12

CANNOT_SPREAD = "the footing cannot spread the overturning over its length; deepen it or shorten the effective length"


def _finite(value: float, name: str) -> None:
    if not (isinstance(value, (int, float)) and math.isfinite(value)):
        raise InputError(name, f"expected a finite number, got {value!r}")


@dataclass(frozen=True, slots=True, kw_only=True)
class BeamLineLoad:
    """A uniform downward line load on the footing (N/m, positive down) over [start, end] (m from the
    footing's start end)."""

    value: float
    start: float
    end: float
    label: str = ""

    def __post_init__(self) -> None:
        _finite(self.value, "value")
        _finite(self.start, "start")
        _finite(self.end, "end")
        if not self.end > self.start:
            raise InputError("end", "must be greater than start")


@dataclass(frozen=True, slots=True, kw_only=True)
class BeamPointLoad:
    """A downward point load on the footing (N, positive down; negative is uplift) at ``at`` (m from
    the footing's start end)."""

    value: float
    at: float
    label: str = ""

    def __post_init__(self) -> None:
        _finite(self.value, "value")
        _finite(self.at, "at")


def chord_couple(
    moment: float, *, wall_start: float, wall_end: float, offset: float = CHORD_OFFSET
) -> tuple[BeamPointLoad, BeamPointLoad]:
    """The chord forces of a light-frame wall's overturning moment M (statics, derived here).

    T = C = M / (ℓw - 2a), ℓw = wall_end - wall_start, a = offset: an uplift -T at wall_start + a
    and a push +C at wall_end - a for M > 0 (the lateral load toward +x, the end at wall_end in
    compression); M < 0 gives the mirror image.

    Args:
        moment: M, the overturning moment of the wall's lateral loads about the top of the footing (N·m).
        wall_start, wall_end: the wall's ends (m from the footing's start end).
        offset: a, each chord's centroid inside the wall's end (m), 3 in by default (an assumption).

    Raises:
        InputError: when the chords would not lie inside the wall (ℓw - 2a <= 0).
    """
    _finite(moment, "moment")
    arm = (wall_end - wall_start) - 2.0 * offset
    if not (math.isfinite(arm) and arm > 0.0 and offset >= 0.0):
        raise InputError("offset", "the chords must lie inside the wall: wall length - 2 x offset must be greater than zero")
    force = moment / arm
    return (
        BeamPointLoad(value=-force, at=wall_start + offset, label="chord at the start end"),
        BeamPointLoad(value=force, at=wall_end - offset, label="chord at the far end"),
    )


def rigid_soil_stations(
    vertical: float, eccentricity: float, width: float, length: float, count: int = 201
) -> tuple[np.ndarray, np.ndarray]:
    """Stations and the rigid-footing soil pressure at them, ready for :func:`beam_diagram`.

    The pressure is that of :mod:`engine.soil_pressure` (linear in the kern, a triangle beyond it,
    no tension); the end of the contact is added as a station so that the piecewise-linear pressure
    between stations is exact.

    Args:
        vertical: N, the factored vertical load on the soil (N). eccentricity: e from mid-length (m).
        width: B (m). length: L_f (m). count: evenly spaced stations (at least 2).

    Returns:
        (x in m, q in Pa); q is zero everywhere where there is no equilibrium (N <= 0 or |e| >= L/2).
    """
    x = np.linspace(0.0, length, max(int(count), 2))
    dist = pressure_distribution(vertical, eccentricity, width, length)
    if not bool(dist.stable):
        return x, np.zeros_like(x)
    contact = float(dist.contact_length)
    kink = length - contact if eccentricity >= 0.0 else contact
    x = _with_points(x, np.array([min(max(kink, 0.0), length)]), NODE_GAP * length)
    return x, pressure_at(dist, eccentricity, length, x)


def rigid_soil_stations_of(
    vertical: np.ndarray, eccentricity: np.ndarray, width: float, length: float, count: int = 201
) -> list[tuple[np.ndarray, np.ndarray]]:
    """:func:`rigid_soil_stations` of several cases on one footing: the pressures of all of them in one
    call of :func:`engine.soil_pressure.pressure_distribution` (numpy over cases), then each case's
    stations with the end of its contact, as :func:`rigid_soil_stations` gives them.

    Args:
        vertical, eccentricity: N (N) and e (m) of each case. width: B (m). length: L_f (m).
        count: evenly spaced stations (at least 2).
    """
    x = np.linspace(0.0, length, max(int(count), 2))
    ns = np.asarray(vertical, dtype=float)
    es = np.asarray(eccentricity, dtype=float)
    dist = pressure_distribution(ns, es, width, length)
    out = []
    for i, e in enumerate(es.tolist()):
        if not bool(dist.stable[i]):
            out.append((x, np.zeros_like(x)))
            continue
        one = PressureDistribution(
            q_max=dist.q_max[i], q_min=dist.q_min[i], contact_length=dist.contact_length[i], stable=dist.stable[i]
        )
        contact = float(one.contact_length)
        kink = length - contact if e >= 0.0 else contact
        nodes = _with_points(x, np.array([min(max(kink, 0.0), length)]), NODE_GAP * length)
        out.append((nodes, pressure_at(one, e, length, nodes)))
    return out


def _with_points(stations: np.ndarray, points: np.ndarray, gap: float) -> np.ndarray:
    """``stations`` (increasing) with ``points`` added; a point within ``gap`` of a station or of a
    point already added moves onto it (a segment shorter than the gap is rounding, not geometry), a
    station in the middle moving onto the point so that kinks stay exact."""
    nodes = np.array(stations, dtype=float)
    for point in np.sort(points):
        i = int(np.searchsorted(nodes, point))
        near = [j for j in (i - 1, i) if 0 <= j < nodes.size and abs(nodes[j] - point) <= gap]
        if not near:
            nodes = np.insert(nodes, i, point)
        elif 0 < near[0] < nodes.size - 1:
            nodes[near[0]] = point  # the ends of the footing stay where they are
    return nodes


def _with_points_sorted(stations: list[float], points: list[float], gap: float) -> list[float]:
    """:func:`_with_points` on Python floats, ``points`` already sorted: the same nodes, step for step
    (bisect_left is numpy's searchsorted), without an array copy per point added."""
    nodes = list(stations)
    for point in points:
        i = bisect_left(nodes, point)
        n = len(nodes)
        if i > 0 and abs(nodes[i - 1] - point) <= gap:
            near = i - 1
        elif i < n and abs(nodes[i] - point) <= gap:
            near = i
        else:
            nodes.insert(i, point)
            continue
        if 0 < near < n - 1:
            nodes[near] = point  # the ends of the footing stay where they are
    return nodes


@dataclass(frozen=True, slots=True, eq=False)
class BeamDiagram:
    """Shear and moment along the footing (SI), at the nodes: the stations and every load's ends.

    Attributes:
        x: nodes (m from the start end), increasing.
        shear_left, shear_right: V just left and just right of each node (N); they differ by the
            point load there. moment: M at each node (N·m; positive with the bottom in tension).
        width: B (m).
        net_start, net_end: the net upward load per length B q - w at the start and the end of each
            segment between nodes (N/m; one fewer than the nodes; linear between them).
        closure_shear, closure_moment: V and M just beyond the far end; zero for loads in
            equilibrium with the soil (statics), so they measure what is not in equilibrium.
        max_moment, max_moment_at: the largest M (>= 0 where the diagram never sags) and where.
        min_moment, min_moment_at: the least M (<= 0 where it never hogs) and where.
        max_shear: the largest |V| (N).

    The extremes include the peaks between nodes, where V changes sign inside a segment.
    """

    x: np.ndarray
    shear_left: np.ndarray
    shear_right: np.ndarray
    moment: np.ndarray
    width: float
    net_start: np.ndarray
    net_end: np.ndarray
    closure_shear: float
    closure_moment: float
    max_moment: float
    max_moment_at: float
    min_moment: float
    min_moment_at: float
    max_shear: float

    def drawing(self) -> tuple[np.ndarray, np.ndarray, np.ndarray]:
        """(x, V, M) for a plot: a node with a point load appears twice, V jumping between them."""
        jump = self.shear_left != self.shear_right
        repeat = np.where(jump, 2, 1)
        x = np.repeat(self.x, repeat)
        m = np.repeat(self.moment, repeat)
        v = np.empty_like(x)
        k = 0
        for i, times in enumerate(repeat):
            if times == 2:
                v[k], v[k + 1] = self.shear_left[i], self.shear_right[i]
            else:
                v[k] = self.shear_right[i]
            k += times
        return x, v, m


def beam_diagram(
    x: Sequence[float] | np.ndarray,
    pressure: Sequence[float] | np.ndarray,
    width: float,
    line_loads: Sequence[BeamLineLoad] = (),
    point_loads: Sequence[BeamPointLoad] = (),
) -> BeamDiagram:
    """V(x) and M(x) of the footing as a free beam on the soil (statics, derived here).

    Net upward load n = B q - w per length. On a segment of length h with n linear from n0 to n1 and
    V = V0 just right of its first node: V1 = V0 + h (n0 + n1)/2 and M1 = M0 + V0 h + h^2 (2 n0 + n1)/6;
    a point load P at a node lowers V by P. Line loads are constant on every segment because their
    ends are nodes (a load end within 1e-12 L of a node is moved onto it, its force kept);
    q is interpolated linearly between the stations given.

    Args:
        x: stations (m from the footing's start end), increasing; the first is the start end and the
            last the far end of the footing.
        pressure: the soil pressure q at each station (Pa, upward), linear between stations.
        width: B (m); the soil's line load is B q.
        line_loads, point_loads: the downward loads; they must lie on [x[0], x[-1]].

    Raises:
        InputError: stations not increasing, pressures of another length, loads off the footing.
    """
    xs = np.asarray(x, dtype=float)
    qs = np.asarray(pressure, dtype=float)
    if xs.ndim != 1 or xs.size < 2 or not np.all(np.diff(xs) > 0.0) or not np.all(np.isfinite(xs)):
        raise InputError("x", "stations must be at least two finite positions, increasing")
    if qs.shape != xs.shape or not np.all(np.isfinite(qs)):
        raise InputError("pressure", "expected one finite pressure at each station")
    if not (math.isfinite(width) and width > 0.0):
        raise InputError("width", "must be a finite number greater than zero")
    low, high = xs[0], xs[-1]
    slack = 1e-9 * (high - low)
    for i, line in enumerate(line_loads):
        if line.start < low - slack or line.end > high + slack:
            raise InputError(f"line_loads[{i}]", "the line load runs past the footing")
    for i, point in enumerate(point_loads):
        if not low - slack <= point.at <= high + slack:
            raise InputError(f"point_loads[{i}]", "the point load is off the footing")
    extra = [min(max(v, low), high) for line in line_loads for v in (line.start, line.end)]
    extra += [min(max(p.at, low), high) for p in point_loads]
    nodes = _with_points(xs, np.asarray(extra, dtype=float), NODE_GAP * (high - low))
    up = width * np.interp(nodes, xs, qs)  # N/m
    h = np.diff(nodes)
    w = np.zeros_like(h)
    for line in line_loads:
        # the load's share of each segment (1 inside it; a sliver where a node was snapped onto its end)
        overlap = np.minimum(nodes[1:], line.end) - np.maximum(nodes[:-1], line.start)
        w += line.value * np.clip(overlap, 0.0, None) / h
    n0 = up[:-1] - w
    n1 = up[1:] - w
    jumps = np.zeros_like(nodes)
    for point in point_loads:
        jumps[int(np.argmin(np.abs(nodes - point.at)))] += point.value
    right = np.concatenate([[0.0], np.cumsum(0.5 * h * (n0 + n1))]) - np.cumsum(jumps)
    left = right + jumps
    moment = np.concatenate([[0.0], np.cumsum(right[:-1] * h + h * h * (2.0 * n0 + n1) / 6.0)])
    # peaks inside segments: V(ξ) = V0 + n0 ξ + (n1 - n0) ξ^2 / (2h) = 0 for 0 < ξ < h
    a = (n1 - n0) / (2.0 * h)
    b, c = n0, right[:-1]
    peaks_x, peaks_m = [], []
    with np.errstate(all="ignore"):
        disc = b * b - 4.0 * a * c
        root = np.sqrt(np.maximum(disc, 0.0))
        linear = np.abs(a) * h <= 1e-12 * (np.abs(b) + np.abs(c) / h + 1e-300)
        candidates = [
            np.where(linear, -c / b, (-b + root) / (2.0 * a)),
            np.where(linear, np.nan, (-b - root) / (2.0 * a)),
        ]
    for xi in candidates:
        inside = np.isfinite(xi) & (xi > 0.0) & (xi < h) & (disc >= 0.0)
        if inside.any():
            s = xi[inside]
            peaks_x.append(nodes[:-1][inside] + s)
            peaks_m.append(moment[:-1][inside] + c[inside] * s + b[inside] * s * s / 2.0 + a[inside] * s**3 / 3.0)
    all_x = np.concatenate([nodes, *peaks_x])
    all_m = np.concatenate([moment, *peaks_m])
    top, bottom = int(np.argmax(all_m)), int(np.argmin(all_m))
    return BeamDiagram(
        x=nodes,
        shear_left=left,
        shear_right=right,
        moment=moment,
        width=float(width),
        net_start=n0,
        net_end=n1,
        closure_shear=float(right[-1]),
        closure_moment=float(moment[-1]),
        max_moment=float(max(all_m[top], 0.0)),
        max_moment_at=float(all_x[top]),
        min_moment=float(min(all_m[bottom], 0.0)),
        min_moment_at=float(all_x[bottom]),
        max_shear=float(np.max(np.maximum(np.abs(left), np.abs(right)))),
    )


def _check_one(
    xs: np.ndarray, qs: np.ndarray, lines: Sequence[tuple[float, float, float]], points: Sequence[tuple[float, float]]
) -> None:
    """The input checks of :func:`beam_diagram` (and of its loads) on one load set of
    :func:`beam_diagrams`, in the same order, with the same messages."""
    for value, start, end in lines:  # the loads as case_diagram builds them, before beam_diagram
        BeamLineLoad(value=value, start=start, end=end)
    for value, at in points:
        BeamPointLoad(value=value, at=at)
    if xs.ndim != 1 or xs.size < 2 or not np.all(np.diff(xs) > 0.0) or not np.all(np.isfinite(xs)):
        raise InputError("x", "stations must be at least two finite positions, increasing")
    if qs.shape != xs.shape or not np.all(np.isfinite(qs)):
        raise InputError("pressure", "expected one finite pressure at each station")
    low, high = float(xs[0]), float(xs[-1])
    slack = 1e-9 * (high - low)
    for i, (_, start, end) in enumerate(lines):
        if start < low - slack or end > high + slack:
            raise InputError(f"line_loads[{i}]", "the line load runs past the footing")
    for i, (_, at) in enumerate(points):
        if not low - slack <= at <= high + slack:
            raise InputError(f"point_loads[{i}]", "the point load is off the footing")


def _fine(
    stations: Sequence[np.ndarray],
    pressures: Sequence[np.ndarray],
    lines: np.ndarray,
    used: np.ndarray,
    points: np.ndarray,
    pressed: np.ndarray,
) -> bool:
    """Every load set of :func:`beam_diagrams` passes :func:`_check_one` (checked all at once)."""
    if any(xs.ndim != 1 or xs.size < 2 or qs.shape != xs.shape for xs, qs in zip(stations, pressures, strict=True)):
        return False
    flat = np.concatenate(stations)
    steps = np.diff(flat)
    ends = np.cumsum([xs.size for xs in stations])[:-1] - 1  # the steps from one set to the next
    steps[ends] = 1.0
    if not (np.all(np.isfinite(flat)) and np.all(steps > 0.0) and np.all(np.isfinite(np.concatenate(pressures)))):
        return False
    low = np.array([xs[0] for xs in stations])[:, None]
    high = np.array([xs[-1] for xs in stations])[:, None]
    slack = 1e-9 * (high - low)
    with np.errstate(invalid="ignore"):
        line_ok = np.isfinite(lines).all(axis=0) & (lines[2] > lines[1]) & (lines[1] >= low - slack) & (lines[2] <= high + slack)
        point_ok = np.isfinite(points).all(axis=0) & (points[1] >= low - slack) & (points[1] <= high + slack)
    return bool(np.all(line_ok | ~used) and np.all(point_ok | ~pressed))


def beam_arrays(
    stations: Sequence[np.ndarray],
    pressures: Sequence[np.ndarray],
    width: float,
    line_loads: Sequence[Sequence[tuple[float, float, float]]],
    point_loads: Sequence[Sequence[tuple[float, float]]],
) -> BeamArrays:
    """:func:`beam_diagram` of several (at least one) load sets on one footing at once (statics,
    derived here).

    The same equations as :func:`beam_diagram`, evaluated for every load set together (numpy over
    load sets x segments): each set keeps its own nodes (its stations and its loads' ends), and the
    shorter node lists are padded with their far end, whose zero-length segments add nothing. Used for
    all the strength cases of one size (:func:`engine.concrete.along.case_diagrams`); a property test
    compares it with :func:`beam_diagram` case by case.

    Args:
        stations, pressures: per load set, the stations (m) and the soil pressure q there (Pa).
        width: B (m).
        line_loads: per load set, (w in N/m, start, end) of each uniform downward line load, in order.
        point_loads: per load set, (P in N, at) of each downward point load, in order.

    Raises:
        InputError: as :func:`beam_diagram`.
    """
    k = len(stations)
    if not (math.isfinite(width) and width > 0.0):
        raise InputError("width", "must be a finite number greater than zero")
    if k == 0:
        raise InputError("stations", "expected at least one load set")
    slots = max((len(lines) for lines in line_loads), default=0)
    table = np.zeros((3, k, slots))  # slot j holds each set's j-th line load: w, start, end
    used = np.zeros((k, slots), dtype=bool)
    for i, lines in enumerate(line_loads):
        if lines:
            table[:, i, : len(lines)] = np.asarray(lines, dtype=float).T
            used[i, : len(lines)] = True
    count = max((len(points) for points in point_loads), default=0)
    forces = np.zeros((2, k, count))  # slot p holds each set's p-th point load: P, at
    pushed = np.zeros((k, count), dtype=bool)
    for i, points in enumerate(point_loads):
        if points:
            forces[:, i, : len(points)] = np.asarray(points, dtype=float).T
            pushed[i, : len(points)] = True
    if not _fine(stations, pressures, table, used, forces, pressed=pushed):
        for xs, qs, lines, points in zip(stations, pressures, line_loads, point_loads, strict=True):
            _check_one(xs, qs, lines, points)  # says which, in the order beam_diagram would
    node_lists = []
    known: dict[tuple[bytes, bytes], list[float]] = {}  # sets with the same stations and load ends
    for i, (xs, lines, points) in enumerate(zip(stations, line_loads, point_loads, strict=True)):
        low, high = float(xs[0]), float(xs[-1])
        ends = np.concatenate([table[1:, i, : len(lines)].ravel(), forces[1, i, : len(points)]])
        extra = np.sort(np.clip(ends, low, high))
        key = (xs.tobytes(), extra.tobytes())
        if key not in known:
            known[key] = _with_points_sorted(xs.tolist(), extra.tolist(), NODE_GAP * (high - low))
        node_lists.append(known[key])
    sizes = [len(n) for n in node_lists]
    m = max(sizes)
    nodes = np.empty((k, m))
    up = np.empty((k, m))
    for i, (listed, xs, qs) in enumerate(zip(node_lists, stations, pressures, strict=True)):
        row = np.asarray(listed, dtype=float)
        nodes[i, : row.size] = row
        nodes[i, row.size :] = row[-1]  # padding: zero-length segments at the far end
        up[i] = width * np.interp(nodes[i], xs, qs)  # N/m
    h = np.diff(nodes, axis=1)
    real = h > 0.0
    safe = np.where(real, h, 1.0)
    # line loads slot by slot (each set sums its own loads in its own order)
    w = np.zeros_like(h)
    for j in range(slots):
        intensity, begin, finish = table[0, :, j : j + 1], table[1, :, j : j + 1], table[2, :, j : j + 1]
        overlap = np.minimum(nodes[:, 1:], finish) - np.maximum(nodes[:, :-1], begin)
        w += intensity * np.clip(overlap, 0.0, None) / safe
    n0 = up[:, :-1] - w
    n1 = up[:, 1:] - w
    jumps = np.zeros_like(nodes)
    rows = np.arange(k)
    for p in range(count):
        at = np.argmin(np.abs(nodes - forces[1, :, p : p + 1]), axis=1)
        jumps[rows, at] += forces[0, :, p]
    zero = np.zeros((k, 1))
    right = np.concatenate([zero, np.cumsum(0.5 * h * (n0 + n1), axis=1)], axis=1) - np.cumsum(jumps, axis=1)
    left = right + jumps
    moment = np.concatenate([zero, np.cumsum(right[:, :-1] * h + h * h * (2.0 * n0 + n1) / 6.0, axis=1)], axis=1)
    # peaks inside segments: V(ξ) = V0 + n0 ξ + (n1 - n0) ξ^2 / (2h) = 0 for 0 < ξ < h
    a = (n1 - n0) / (2.0 * safe)
    b, c = n0, right[:, :-1]
    with np.errstate(all="ignore"):
        disc = b * b - 4.0 * a * c
        root = np.sqrt(np.maximum(disc, 0.0))
        linear = np.abs(a) * h <= 1e-12 * (np.abs(b) + np.abs(c) / safe + 1e-300)
        candidates = [
            np.where(linear, -c / b, (-b + root) / (2.0 * a)),
            np.where(linear, np.nan, (-b - root) / (2.0 * a)),
        ]
        peak_x, peak_m, peak_in = [], [], []
        for xi in candidates:
            inside = np.isfinite(xi) & (xi > 0.0) & (xi < h) & (disc >= 0.0) & real
            s = np.where(inside, xi, 0.0)
            peak_in.append(inside)
            peak_x.append(nodes[:, :-1] + s)
            peak_m.append(moment[:, :-1] + c * s + b * s * s / 2.0 + a * s**3 / 3.0)
    # the extremes over the nodes, then the peaks (the order beam_diagram takes them in, for ties)
    on_node = np.arange(m)[None, :] < np.asarray(sizes)[:, None]
    valid = np.concatenate([on_node, *peak_in], axis=1)
    all_x = np.concatenate([nodes, *peak_x], axis=1)
    all_m = np.concatenate([moment, *peak_m], axis=1)
    top = np.argmax(np.where(valid, all_m, -np.inf), axis=1)
    bottom = np.argmin(np.where(valid, all_m, np.inf), axis=1)
    largest_shear = np.max(np.maximum(np.abs(left), np.abs(right)), axis=1)  # padding repeats the far end
    rows_t, rows_u = all_m[rows, top].tolist(), all_m[rows, bottom].tolist()
    return BeamArrays(
        nodes=nodes,
        shear_left=left,
        shear_right=right,
        moment=moment,
        net_start=n0,
        net_end=n1,
        sizes=tuple(sizes),
        width=float(width),
        max_moment=tuple(float(max(v, 0.0)) for v in rows_t),
        max_moment_at=tuple(all_x[rows, top].tolist()),
        min_moment=tuple(float(min(v, 0.0)) for v in rows_u),
        min_moment_at=tuple(all_x[rows, bottom].tolist()),
        max_shear=tuple(largest_shear.tolist()),
    )


@dataclass(frozen=True, slots=True, eq=False)
class BeamArrays:
    """The diagrams of :func:`beam_arrays`: one row per load set, padded at the far end.

    Attributes:
        nodes, shear_left, shear_right, moment: (sets, nodes) as in :class:`BeamDiagram`; row i is
            real up to ``sizes[i]``, then repeats its far end.
        net_start, net_end: (sets, nodes - 1), n at both ends of each segment.
        sizes: the number of nodes of each set. width: B (m).
        max_moment, max_moment_at, min_moment, min_moment_at, max_shear: each set's extremes.
    """

    nodes: np.ndarray
    shear_left: np.ndarray
    shear_right: np.ndarray
    moment: np.ndarray
    net_start: np.ndarray
    net_end: np.ndarray
    sizes: tuple[int, ...]
    width: float
    max_moment: tuple[float, ...]
    max_moment_at: tuple[float, ...]
    min_moment: tuple[float, ...]
    min_moment_at: tuple[float, ...]
    max_shear: tuple[float, ...]

    def diagram(self, i: int) -> BeamDiagram:
        """The diagram of set ``i``."""
        size = self.sizes[i]
        return BeamDiagram(
            x=self.nodes[i, :size],
            shear_left=self.shear_left[i, :size],
            shear_right=self.shear_right[i, :size],
            moment=self.moment[i, :size],
            width=self.width,
            net_start=self.net_start[i, : size - 1],
            net_end=self.net_end[i, : size - 1],
            closure_shear=float(self.shear_right[i, size - 1]),
            closure_moment=float(self.moment[i, size - 1]),
            max_moment=self.max_moment[i],
            max_moment_at=self.max_moment_at[i],
            min_moment=self.min_moment[i],
            min_moment_at=self.min_moment_at[i],
            max_shear=self.max_shear[i],
        )

    def diagrams(self) -> list[BeamDiagram]:
        return [self.diagram(i) for i in range(len(self.sizes))]

    def rows(self, index: Sequence[int]) -> BeamArrays:
        """These sets, in this order (a set may repeat)."""
        at = np.asarray(index, dtype=int)

        def pick(values: tuple[float, ...]) -> tuple[float, ...]:
            return tuple(values[i] for i in index)

        return BeamArrays(
            nodes=self.nodes[at],
            shear_left=self.shear_left[at],
            shear_right=self.shear_right[at],
            moment=self.moment[at],
            net_start=self.net_start[at],
            net_end=self.net_end[at],
            sizes=tuple(self.sizes[i] for i in index),
            width=self.width,
            max_moment=pick(self.max_moment),
            max_moment_at=pick(self.max_moment_at),
            min_moment=pick(self.min_moment),
            min_moment_at=pick(self.min_moment_at),
            max_shear=pick(self.max_shear),
        )


def beam_diagrams(
    stations: Sequence[np.ndarray],
    pressures: Sequence[np.ndarray],
    width: float,
    line_loads: Sequence[Sequence[tuple[float, float, float]]],
    point_loads: Sequence[Sequence[tuple[float, float]]],
) -> list[BeamDiagram]:
    """:func:`beam_diagram` of several load sets on one footing at once: :func:`beam_arrays`, one
    :class:`BeamDiagram` per set (the arguments are those of :func:`beam_arrays`)."""
    if len(stations) == 0:
        if not (math.isfinite(width) and width > 0.0):
            raise InputError("width", "must be a finite number greater than zero")
        return []
    return beam_arrays(stations, pressures, width, line_loads, point_loads).diagrams()


@dataclass(frozen=True, slots=True)
class FaceDesign:
    """The longitudinal bars of one face (bottom or top) of the footing.

    Attributes:
        face: "bottom" or "top".
        needed: the analysis puts this face in tension (the bottom always needs As,min).
        moment: the moment its bars resist, |M| at its extreme (N·m). at: where (m).
        effective_depth: d to these bars (m).
        steel_required: As for the moment (m^2; inf when no steel suffices). steel_minimum: 0.0018 B h.
        bars: "4 #5" ("" when not needed). count, bar: the bars (0 and None when not needed).
        steel_provided: count x A_b (m^2). moment_capacity: φMn (N·m). strain: εt.
        fits: the count fits in the width (25.2.1 clear spacing, side cover). max_count: how many fit.
        shear, shear_capacity, shear_at: the station with the least φVc / |V| among those where this
            face is in tension: |V| and φVc there (N), and its position (m).
        passes: everything above is met. chosen: Kernline chose the bars.
    """

    face: str
    needed: bool
    moment: float
    at: float
    effective_depth: float
    steel_required: float
    steel_minimum: float
    bars: str
    count: int
    bar: Bar | None
    steel_provided: float
    moment_capacity: float
    strain: float
    fits: bool
    max_count: int
    shear: float
    shear_capacity: float
    shear_at: float
    passes: bool
    chosen: bool


@dataclass(frozen=True, slots=True)
class LongitudinalDesign:
    """The footing along its length: its diagram, bottom and top bars, and one-way shear.

    Attributes:
        diagram: the shear and moment diagram designed for.
        bottom, top: the bars of each face.
        phi_shear: φ used for one-way shear.
        passes: both faces pass (or, for a plain footing, the plain section carries the diagram).
        message: "" or what fails, in words.
        plain_moment_capacity, plain_shear_capacity: for a plain footing, φMn and φVn of its whole
            section along the length (N·m, N; ACI 318-19 14.5.2.1, 14.5.5.1), else None.
        plain_carries: for a plain footing, whether that section carries this diagram (the bars then
            carry no computed moment), else None.
    """

    diagram: BeamDiagram
    bottom: FaceDesign
    top: FaceDesign
    phi_shear: float
    passes: bool
    message: str
    plain_moment_capacity: float | None = None
    plain_shear_capacity: float | None = None
    plain_carries: bool | None = None


def bars_that_fit(width: float, bar_diameter: float, side_cover: float, aggregate: float = AGGREGATE) -> int:
    """How many bars of diameter db fit across the width B in one layer (ACI 318-19 25.2.1, 20.5.1.3).

    n = floor((B - 2 cover - db) / (db + s_clear)) + 1, s_clear = max(1 in, db, (4/3) d_agg).

    Args:
        width: B (m). bar_diameter: db (m). side_cover: clear cover at the sides (m).
        aggregate: nominal maximum size of coarse aggregate d_agg (m).
    """
    clear = max(MIN_CLEAR_SPACING, bar_diameter, AGGREGATE_FACTOR * aggregate)
    room = width - 2.0 * side_cover - bar_diameter
    if room < 0.0:
        return 0
    return int(math.floor(room / (bar_diameter + clear) * (1.0 + 1e-12))) + 1


# A moment smaller than this fraction of the diagram's largest is rounding, not hogging or sagging.
MOMENT_NOISE = 1e-6


def _segments(diagram: BeamDiagram) -> tuple[float, np.ndarray, np.ndarray, np.ndarray]:
    """What both faces read of the diagram's segments: the moment noise, whether each segment hogs
    (by the moment at its end with the larger |M|), its largest |V| and where (see :func:`_face`)."""
    noise = MOMENT_NOISE * max(abs(diagram.max_moment), abs(diagram.min_moment))
    m0, m1 = diagram.moment[:-1], diagram.moment[1:]
    governing = np.where(np.abs(m1) > np.abs(m0), m1, m0)
    hogging = governing < -noise
    v_start, v_end = diagram.shear_right[:-1], diagram.shear_left[1:]
    v_seg = np.maximum(np.abs(v_start), np.abs(v_end))
    x_seg = np.where(np.abs(v_end) > np.abs(v_start), diagram.x[1:], diagram.x[:-1])
    # inside a segment V peaks where n = n0 + (n1 - n0) ξ / h = 0: V* = V0 + n0 ξ* / 2
    n0, n1 = diagram.net_start, diagram.net_end
    h = np.diff(diagram.x)
    crosses = n0 * n1 < 0.0
    with np.errstate(divide="ignore", invalid="ignore"):
        xi = np.where(crosses, n0 / (n0 - n1) * h, 0.0)
    v_peak = np.abs(v_start + 0.5 * n0 * xi)
    inner = crosses & (v_peak > v_seg)
    v_seg = np.where(inner, v_peak, v_seg)
    x_seg = np.where(inner, diagram.x[:-1] + xi, x_seg)
    return noise, hogging, v_seg, x_seg


@lru_cache(maxsize=4096)
def _section(
    count: int,
    the_bar: Bar,
    width: float,
    thickness: float,
    cover: float,
    layer_below: float,
    materials: Materials,
    phi_shear: float,
    aggregate: float,
) -> tuple[float, float, float, float, float, int]:
    """What ``count`` bars on one face give whatever the diagram: d (m), As (m^2), φMn (N·m), εt,
    φVc (N) and how many such bars fit (ACI 318-19 22.2, 22.5.5.1, 25.2.1; a pure function of its
    arguments, kept for the next case and the next size)."""
    d = thickness - cover - layer_below - 0.5 * the_bar.diameter
    provided = count * the_bar.area
    flex = flexural_strength(provided, width, d, materials)
    phi_vc = float(one_way_shear_strength(width, d, provided / (width * d) if d > 0.0 else 0.0, materials, phi_shear))
    max_count = bars_that_fit(width, the_bar.diameter, materials.cover, aggregate)
    return d, provided, float(flex.capacity), float(flex.strain), phi_vc, max_count


@lru_cache(maxsize=4096)
def _steel_required(moment: float, width: float, d: float, fc: float, fy: float) -> float:
    """:func:`engine.concrete.transverse.steel_required` of one section, kept (every count of one bar
    size has the same d, so the search over the bars asks it again)."""
    return float(steel_required(moment, width, d, fc, fy))


def bars_fail_anywhere(
    count: int,
    the_bar: Bar,
    *,
    width: float,
    thickness: float,
    materials: Materials,
    cover: float,
    layer_below: float = 0.0,
    phi_shear: float = PHI_SHEAR,
    aggregate: float = AGGREGATE,
) -> bool:
    """Whether given bars on a face fail along the length whatever the diagram: below As,min =
    0.0018 B h (ACI 318-19 7.6.1.1), more than fit in the width (25.2.1) or fewer than two (common
    practice). These are the ratios of :func:`design_longitudinal` that do not depend on the loads
    (As / max(As,req, As,min) is at most As / As,min), so a face that fails here fails every case
    with the same numbers; given bars are checked on their face even where it is not in tension."""
    _, provided, _, _, _, max_count = _section(
        count, the_bar, width, thickness, cover, layer_below, materials, phi_shear, aggregate
    )
    minimum = float(minimum_steel(width, thickness))
    return min(provided / minimum, max_count / count, count / MIN_BARS) < 1.0 - TOLERANCE


def given_bars_pass(
    beams: BeamArrays,
    face: str,
    count: int,
    the_bar: Bar,
    *,
    thickness: float,
    materials: Materials,
    cover: float,
    layer_below: float = 0.0,
    phi_shear: float = PHI_SHEAR,
    aggregate: float = AGGREGATE,
) -> list[bool]:
    """Whether ``count`` bars on ``face`` pass, for every load set of ``beams`` at once: the verdict
    of :func:`design_longitudinal` on that face with these bars given, case by case (the same
    ratios, ACI 318-19 22.2, 22.5.5.1, 7.6.1.1, 25.2.1 and two bars, on the same numbers; numpy over
    cases x segments in place of :func:`_segments` and :func:`_face` per diagram)."""
    width = beams.width
    k = len(beams.sizes)
    # _segments on every row: the moment noise, the hogging segments and the largest |V| on each
    noise = np.array([MOMENT_NOISE * max(abs(a), abs(b)) for a, b in zip(beams.max_moment, beams.min_moment, strict=True)])
    m0, m1 = beams.moment[:, :-1], beams.moment[:, 1:]
    governing = np.where(np.abs(m1) > np.abs(m0), m1, m0)
    hogging = governing < -noise[:, None]
    v_start, v_end = beams.shear_right[:, :-1], beams.shear_left[:, 1:]
    v_seg = np.maximum(np.abs(v_start), np.abs(v_end))
    n0, n1 = beams.net_start, beams.net_end
    h = np.diff(beams.nodes, axis=1)
    crosses = n0 * n1 < 0.0
    with np.errstate(divide="ignore", invalid="ignore"):
        xi = np.where(crosses, n0 / (n0 - n1) * h, 0.0)
    v_peak = np.abs(v_start + 0.5 * n0 * xi)
    inner = crosses & (v_peak > v_seg)
    v_seg = np.where(inner, v_peak, v_seg)
    real = np.arange(h.shape[1])[None, :] < (np.asarray(beams.sizes) - 1)[:, None]
    in_tension = (~hogging if face == "bottom" else hogging) & real
    v_face = np.where(in_tension, v_seg, 0.0)
    # _face's evaluate with the bars given, every row
    d, provided, capacity, strain, phi_vc, max_count = _section(
        count, the_bar, width, thickness, cover, layer_below, materials, phi_shear, aggregate
    )
    moments = list(beams.max_moment) if face == "bottom" else [-m for m in beams.min_moment]
    required = np.asarray(steel_required(np.array(moments), width, d, materials.fc, materials.fy), dtype=float).tolist()
    with np.errstate(divide="ignore", invalid="ignore"):
        shear_ratios = np.where(v_face > 0.0, phi_vc / v_face, np.inf)
    least_shear = np.min(shear_ratios, axis=1).tolist() if shear_ratios.shape[1] else [math.inf] * k
    minimum = float(minimum_steel(width, thickness))
    out = []
    for moment, req, shear in zip(moments, required, least_shear, strict=True):
        ratio = min(
            provided / max(req, minimum) if math.isfinite(req) else 0.0,
            capacity / moment if moment > 0.0 else math.inf,
            strain / MIN_NET_TENSILE_STRAIN if moment > 0.0 else math.inf,
            float(shear),
            max_count / count,
            count / MIN_BARS,
        )
        out.append(ratio >= 1.0 - TOLERANCE)
    return out


def _face(
    face: str,
    diagram: BeamDiagram,
    thickness: float,
    materials: Materials,
    cover: float,
    layer_below: float,
    phi_shear: float,
    aggregate: float,
    given: tuple[int, Bar] | None,
    explain: bool = True,
    segments: tuple[float, np.ndarray, np.ndarray, np.ndarray] | None = None,
) -> tuple[FaceDesign, list[str], bool]:
    """The bars of one face: (design, what fails in words, whether no practical bars could pass).

    Shear is checked segment by segment (between nodes): the largest |V| on the segment (at its ends,
    or inside where the net load n changes sign) against φVc with ρw of the face that the segment's
    larger end moment puts in tension. So the shear just beside a chord force goes with the moment on
    that side of it, not with the moment at the node, which may be a near-zero of either sign.
    ``segments`` is :func:`_segments` of the diagram, when the caller has it already.
    """
    width = diagram.width
    noise, hogging, v_seg, x_seg = segments if segments is not None else _segments(diagram)
    in_tension = ~hogging if face == "bottom" else hogging
    moment = diagram.max_moment if face == "bottom" else -diagram.min_moment
    at = diagram.max_moment_at if face == "bottom" else diagram.min_moment_at
    needed = face == "bottom" or moment > noise or bool(in_tension.any())
    v_face = np.where(in_tension, v_seg, 0.0)
    minimum = float(minimum_steel(width, thickness))
    if not needed and given is None:
        design = FaceDesign(
            face=face, needed=False, moment=0.0, at=at, effective_depth=thickness - cover, steel_required=0.0,
            steel_minimum=minimum, bars="", count=0, bar=None, steel_provided=0.0, moment_capacity=0.0,
            strain=math.inf, fits=True, max_count=0, shear=0.0, shear_capacity=0.0, shear_at=at, passes=True, chosen=True,
        )  # fmt: skip
        return design, [], False

    def evaluate(count: int, the_bar: Bar) -> FaceDesign:
        d, provided, capacity, strain, phi_vc, max_count = _section(
            count, the_bar, width, thickness, cover, layer_below, materials, phi_shear, aggregate
        )
        required = _steel_required(moment, width, d, materials.fc, materials.fy)
        with np.errstate(divide="ignore", invalid="ignore"):
            shear_ratios = np.where(v_face > 0.0, phi_vc / v_face, np.inf)
        worst = int(np.argmin(shear_ratios))
        ratio = min(
            provided / max(required, minimum) if math.isfinite(required) else 0.0,
            capacity / moment if moment > 0.0 else math.inf,
            strain / MIN_NET_TENSILE_STRAIN if moment > 0.0 else math.inf,
            float(shear_ratios[worst]),
            max_count / count,
            count / MIN_BARS,
        )
        return FaceDesign(
            face=face,
            needed=needed,
            moment=moment,
            at=at,
            effective_depth=d,
            steel_required=required,
            steel_minimum=minimum,
            bars=counted_text(count, the_bar),
            count=count,
            bar=the_bar,
            steel_provided=provided,
            moment_capacity=capacity,
            strain=strain,
            fits=count <= max_count,
            max_count=max_count,
            shear=float(v_face[worst]),
            shear_capacity=phi_vc,
            shear_at=float(x_seg[worst]),
            passes=ratio >= 1.0 - TOLERANCE,
            chosen=given is None,
        )

    if given is not None:  # bars given that pass need no search (the search only words a failure)
        checked = evaluate(*given)
        if checked.passes or not explain:  # unexplained, a failure needs no search either
            return checked, [], False
    # the lightest passing bars of #4 to #8 (least area, ties to fewer bars); the heaviest if none passes
    best: FaceDesign | None = None
    heaviest: FaceDesign | None = None
    bends = shears = False  # some bars that fit carry the moment (with εt >= 0.004); the shear
    for the_bar in practical_bars():
        most = max(bars_that_fit(width, the_bar.diameter, materials.cover, aggregate), MIN_BARS)
        for count in range(MIN_BARS, most + 1):
            cand = evaluate(count, the_bar)
            if heaviest is None or cand.steel_provided > heaviest.steel_provided:
                heaviest = cand
            if cand.fits:
                bends |= cand.moment_capacity >= cand.moment * (1.0 - TOLERANCE) and (
                    cand.moment <= 0.0 or cand.strain >= MIN_NET_TENSILE_STRAIN
                )
                shears |= cand.shear <= cand.shear_capacity * (1.0 + TOLERANCE)
            if cand.passes:
                lighter = best is None or cand.steel_provided < best.steel_provided * (1.0 - TOLERANCE)
                tie = best is not None and abs(cand.steel_provided - best.steel_provided) <= TOLERANCE * best.steel_provided
                if lighter or (tie and best is not None and count < best.count):
                    best = cand
                break  # more bars of this size are heavier
    assert heaviest is not None
    hopeless = best is None
    result = evaluate(*given) if given is not None else (best if best is not None else heaviest)
    if result.passes:
        return result, [], False
    if given is None:
        what = [w for w, ok in (("the moment", bends), ("the one-way shear", shears)) if not ok] or [
            "the moment and the shear together"
        ]
        return result, [f"no {face} bars of #4 to #8 that fit in the width carry {' and '.join(what)} along the length"], True
    words = []
    if not math.isfinite(result.steel_required) or result.moment_capacity < result.moment * (1.0 - TOLERANCE):
        words.append(f"the {face} bars ({result.bars}) do not carry the moment along the length")
    if not result.fits:
        words.append(f"{result.bars} do not fit in the width (at most {result.max_count}, ACI 318-19 25.2.1)")
    if result.shear > result.shear_capacity * (1.0 + TOLERANCE):
        words.append(f"one-way shear along the length exceeds φVc with the {face} bars (ACI 318-19 22.5.5.1)")
    if result.moment > 0.0 and result.strain < MIN_NET_TENSILE_STRAIN:
        words.append(f"the {face} face is over-reinforced (εt < 0.004, ACI 318-19 7.3.3.1)")
    if result.steel_provided < result.steel_minimum * (1.0 - TOLERANCE):
        words.append(f"the {face} bars are less than 0.0018 B h (ACI 318-19 7.6.1.1)")
    if result.count < MIN_BARS:
        words.append(f"use at least two {face} bars")
    if not hopeless:
        words.append(f"use more or larger {face} bars")
    return result, words, hopeless


def design_longitudinal(
    diagram: BeamDiagram,
    *,
    thickness: float,
    materials: Materials,
    top_cover: float = TOP_COVER,
    layer_below: float = 0.0,
    phi_shear: float = PHI_SHEAR,
    aggregate: float = AGGREGATE,
    bottom: str | tuple[int, Bar] | None = None,
    top: str | tuple[int, Bar] | None = None,
    words: bool = True,
) -> LongitudinalDesign:
    """Design (or check) the longitudinal bars of the footing for its beam diagram (ACI 318-19).

    Bottom bars for the largest positive moment, top bars for the largest negative one (when the
    diagram hogs by more than rounding); each at least As,min = 0.0018 B h and two bars, fitting in
    the width; one-way shear |V| <= φVc (22.5.5.1(c), λs = 1 per 13.2.6.2) at every node, with ρw of
    the face in tension there. Chosen bars are the lightest of #4 to #8 (least area, ties to fewer
    bars). When no bars that fit can pass, the message ends with :data:`CANNOT_SPREAD`.

    Args:
        diagram: from :func:`beam_diagram` with the factored loads of one combination.
        thickness: h (m). materials: concrete, bars and the bottom/side cover.
        top_cover: clear cover to the top bars (m). layer_below: the diameter of the transverse bars
            under the bottom longitudinal bars (m; 0 when the longitudinal bars are the lowest layer).
        phi_shear: φ for one-way shear (0.75; 21.2.4.3 may require less). aggregate: d_agg (m).
        bottom, top: bars to check ("4 #5" or (count, bar)); None to choose.
        words: say what fails (a search over the practical bars when given bars fail); False only
            tells whether they pass, with an empty message.

    Raises:
        InputError: bad bar text or numbers.
    """
    if not (math.isfinite(thickness) and thickness > 0.0):
        raise InputError("thickness", "must be a finite number greater than zero")
    if not 0.0 < phi_shear <= PHI_SHEAR:
        raise InputError("phi_shear", "φ for shear must be greater than 0 and at most 0.75 (ACI 318-19 21.2.1)")
    given_bottom = parse_counted(bottom) if isinstance(bottom, str) else bottom
    given_top = parse_counted(top) if isinstance(top, str) else top
    common = (diagram, thickness, materials)
    segments = _segments(diagram)
    low, low_words, low_hopeless = _face(
        "bottom", *common, materials.cover, layer_below, phi_shear, aggregate, given_bottom, explain=words, segments=segments
    )
    high, high_words, high_hopeless = _face(
        "top", *common, top_cover, 0.0, phi_shear, aggregate, given_top, explain=words, segments=segments
    )
    said = low_words + high_words + ([CANNOT_SPREAD] if low_hopeless or high_hopeless else [])
    return LongitudinalDesign(
        diagram=diagram,
        bottom=low,
        top=high,
        phi_shear=float(phi_shear),
        passes=low.passes and high.passes,
        message="; ".join(said),
    )


__all__ = [
    "CANNOT_SPREAD",
    "CHORD_OFFSET",
    "BeamArrays",
    "BeamDiagram",
    "BeamLineLoad",
    "BeamPointLoad",
    "FaceDesign",
    "LongitudinalDesign",
    "bars_fail_anywhere",
    "bars_that_fit",
    "beam_arrays",
    "beam_diagram",
    "beam_diagrams",
    "chord_couple",
    "design_longitudinal",
    "given_bars_pass",
    "rigid_soil_stations",
    "rigid_soil_stations_of",
]

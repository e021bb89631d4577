"""The three stability checks of one wall, for every design case at once, on any footing size.

The wall's loads are reduced once to per-case sums that do not depend on the footing's width B or
thickness D (:class:`CaseTable`); :func:`evaluate` then adds the self weight and computes overturning,
bearing and sliding for every case with numpy, for one size (a single check) or a whole grid of
sizes (sizing) with the same code. Formulas and their sources are in the modules called here.
"""

from __future__ import annotations

from dataclasses import dataclass
from functools import lru_cache

import numpy as np

from . import bearing, overturning, sliding, soil_pressure
from .combinations import DesignCase, combinations_of, design_cases
from .loads import lateral_resultants, self_weight, vertical_resultants
from .model import ALL_CHECKS, DesignCriteria, LoadCase, SoilProperties, Wall


@dataclass(frozen=True, slots=True, eq=False)
class CaseTable:
    """Per-case sums for one wall (arrays of length k, one entry per design case).

    Attributes:
        cases: the design cases (combination and direction).
        dead_factor: factor on D, which the self weight carries.
        applied_vertical: sum f*P of the wall's vertical loads (N).
        applied_moment: sum f*P*(x - L/2) of those loads about the footing's mid-length (N*m).
        applied_resisting / applied_overturning: their moments about the case's toe (N*m).
        toe_sign: +1 toe at x = L, -1 toe at x = 0.
        direction_sign: +1, -1 or 0 (no lateral load).
        shear: V = sum f*H (N).
        shear_moment: sum f*H*h, the lateral moment about the top of the footing (N*m).
        wind_or_seismic: the combination carries W or E (bearing increase applies).
        applies: (3, k) booleans, the checks each case's combination applies to.
        required: the required ratios (overturning, sliding, bearing).
    """

    wall: Wall
    soil: SoilProperties
    criteria: DesignCriteria
    cases: tuple[DesignCase, ...]
    dead_factor: np.ndarray
    applied_vertical: np.ndarray
    applied_moment: np.ndarray
    applied_resisting: np.ndarray
    applied_overturning: np.ndarray
    toe_sign: np.ndarray
    direction_sign: np.ndarray
    shear: np.ndarray
    shear_moment: np.ndarray
    wind_or_seismic: np.ndarray
    applies: np.ndarray
    required: np.ndarray

    @property
    def length(self) -> float:
        return self.wall.footing_length


_CASE_ORDER = tuple(LoadCase)


@lru_cache(maxsize=128)
def _case_layout(
    criteria: DesignCriteria, lateral_cases: frozenset[LoadCase]
) -> tuple[tuple[DesignCase, ...], np.ndarray, np.ndarray, np.ndarray, np.ndarray]:
    """The design cases of ``criteria`` and their factors (k x 7, LoadCase order), direction signs,
    W/E flags and check masks (3 x k). Cached: it depends on the criteria and on which lateral cases
    the wall has, not on the wall's loads."""
    cases = design_cases(combinations_of(criteria), lateral_cases)
    k = len(cases)
    factors = np.array([[case.combination.factor(c) for c in _CASE_ORDER] for case in cases], dtype=float).reshape(
        k, len(_CASE_ORDER)
    )
    sign = np.array([case.direction.sign for case in cases], dtype=float)
    wind_or_seismic = np.array([case.combination.has_wind_or_seismic for case in cases], dtype=bool)
    applies = np.array([[check in case.combination.checks for case in cases] for check in ALL_CHECKS], dtype=bool).reshape(3, k)
    for array in (factors, sign, wind_or_seismic, applies):
        array.setflags(write=False)
    return cases, factors, sign, wind_or_seismic, applies


def case_table(wall: Wall, soil: SoilProperties, criteria: DesignCriteria) -> CaseTable:
    """Reduce the wall's loads to per-case sums for every combination and direction.

    In a combination with factors f: N = sum f*P over vertical loads, V = sum f*H over lateral loads
    (ASCE 7-16 2.4.1: the load effects of a combination add). A load that reverses acts at its mirror
    position in direction '-'. In a case with no lateral load the toe is the end toward which the
    loads lean.
    """
    length = wall.footing_length
    verticals = vertical_resultants(wall)
    laterals = lateral_resultants(wall)
    cases, factors, sign, wind_or_seismic, applies = _case_layout(criteria, frozenset(h.case for h in laterals))
    k = len(cases)

    # vertical loads: factored forces (k x n) at their positions for each case's direction
    column = {c: j for j, c in enumerate(_CASE_ORDER)}
    v_case = np.array([column[v.case] for v in verticals], dtype=int)
    v_force = np.array([v.force for v in verticals], dtype=float)
    v_x = np.array([v.x for v in verticals], dtype=float)
    v_x_rev = np.array([v.x_reversed for v in verticals], dtype=float)
    forces = factors[:, v_case] * v_force  # f * P
    x = np.where(sign[:, None] < 0.0, v_x_rev, v_x)
    n_app = forces.sum(axis=1)
    m_app = (forces * (x - 0.5 * length)).sum(axis=1)
    toe = np.where(sign != 0.0, sign, np.where(m_app >= 0.0, 1.0, -1.0))
    arm = overturning.toe_arm(x, length, toe[:, None])
    resisting, overturning_moment = overturning.vertical_toe_moments(forces, arm)

    # lateral loads: only in cases that act laterally
    h_case = np.array([column[h.case] for h in laterals], dtype=int)
    h_force = np.array([h.force for h in laterals], dtype=float)
    h_height = np.array([h.height for h in laterals], dtype=float)
    shears = factors[:, h_case] * h_force * (sign != 0.0)[:, None]  # f * H
    req = criteria.required
    return CaseTable(
        wall=wall,
        soil=soil,
        criteria=criteria,
        cases=cases,
        dead_factor=factors[:, column[LoadCase.D]].copy(),
        applied_vertical=n_app,
        applied_moment=m_app,
        applied_resisting=resisting.sum(axis=1) if k else np.zeros(0),
        applied_overturning=overturning_moment.sum(axis=1) if k else np.zeros(0),
        toe_sign=toe,
        direction_sign=sign,
        shear=shears.sum(axis=1),
        shear_moment=(shears * h_height).sum(axis=1),
        wind_or_seismic=wind_or_seismic,
        applies=applies,
        required=np.array([req.overturning, req.sliding, req.bearing]),
    )


@dataclass(frozen=True, slots=True, eq=False)
class Evaluation:
    """Every quantity of every case for footing width(s) B and thickness(es) D.

    Arrays have shape (k,) + the broadcast shape of B and D. Ratios are inf where there is no demand.
    """

    self_weight: np.ndarray  # W (N), unfactored
    vertical: np.ndarray  # N (N)
    moment: np.ndarray  # about the footing's mid-length (N*m)
    eccentricity: np.ndarray  # e (m)
    q_max: np.ndarray
    q_min: np.ndarray
    contact_length: np.ndarray
    stable: np.ndarray
    pressure_compared: np.ndarray  # q_max, or q_max - gs (c + D) for a net allowable (Pa)
    allowable: np.ndarray  # (Pa), with any increase
    resisting_moment: np.ndarray
    overturning_moment: np.ndarray
    friction: np.ndarray
    cohesion: np.ndarray
    passive: np.ndarray
    overturning_ratio: np.ndarray
    sliding_ratio: np.ndarray
    bearing_ratio: np.ndarray
    required: np.ndarray  # (3,)
    applies: np.ndarray  # (3, k)

    def check_minima(self) -> np.ndarray:
        """(3, ...) lowest ratio / required of each check over the cases it applies to (inf: none)."""
        out = []
        for j, ratio in enumerate((self.overturning_ratio, self.sliding_ratio, self.bearing_ratio)):
            mask = self.applies[j]
            if not mask.any():
                out.append(np.full(ratio.shape[1:], np.inf))
                continue
            rows = ratio if mask.all() else ratio[mask]
            out.append(rows.min(axis=0) / self.required[j])
        return np.stack(out)


def evaluate(table: CaseTable, width: float | np.ndarray, thickness: float | np.ndarray) -> Evaluation:
    """Run overturning, bearing and sliding for every case on footing size(s) B x D.

    Args:
        table: the wall's per-case sums.
        width: B (m), a float or an array broadcastable against ``thickness``.
        thickness: D (m).
    """
    b = np.asarray(width, dtype=float)
    d = np.asarray(thickness, dtype=float)
    grid_ndim = max(b.ndim, d.ndim)
    k = len(table.cases)

    def per_case(a: np.ndarray) -> np.ndarray:
        return a.reshape((k,) + (1,) * grid_ndim)

    wall, soil = table.wall, table.soil
    length = table.length
    cover = wall.footing.cover
    weight = np.asarray(self_weight(wall, soil, b, d).total, dtype=float)
    factored_weight = per_case(table.dead_factor) * weight  # acts at L/2
    vertical = per_case(table.applied_vertical) + factored_weight
    lateral_moment = overturning.lateral_moment(per_case(table.shear_moment), per_case(table.shear), d)  # sum f H (h + D)
    moment = per_case(table.direction_sign) * lateral_moment + per_case(table.applied_moment)
    e = soil_pressure.resultant_eccentricity(moment, vertical)
    pressure = soil_pressure.pressure_distribution(vertical, e, b, length)

    # Overturning about the toe: the self weight's arm is L/2 from either toe.
    resisting = per_case(table.applied_resisting) + np.maximum(factored_weight, 0.0) * (0.5 * length)
    overturning_moment = per_case(table.applied_overturning) + np.maximum(-factored_weight, 0.0) * (0.5 * length) + lateral_moment
    ot_ratio = overturning.overturning_ratio(resisting, overturning_moment)

    # Sliding: friction + cohesion + passive against the shear.
    friction = sliding.friction_resistance(soil.friction, vertical)
    cohesion = sliding.cohesion_resistance(soil.cohesion, b, pressure.contact_length, vertical)
    passive = np.broadcast_to(sliding.passive_resistance(soil.passive, b, cover, d, soil.passive_ignore), np.shape(vertical))
    sl_ratio = sliding.sliding_ratio(friction + cohesion + passive, per_case(table.shear))

    # Bearing: peak (or net peak) pressure against the allowable.
    compared = bearing.compared_pressure(pressure.q_max, soil.bearing_basis, soil.unit_weight, cover, d)
    allowable = bearing.allowable_pressure(
        soil.allowable_bearing, table.criteria.bearing_increase, per_case(table.wind_or_seismic)
    )
    br_ratio = bearing.bearing_ratio(allowable, compared, pressure.stable)
    # A case that puts no load at all on the soil (N = 0, M = 0: e.g. a combination of a case the wall
    # does not have, on a weightless footing) is no demand, not a loss of equilibrium.
    unloaded = (vertical == 0.0) & (moment == 0.0)
    if unloaded.any():
        br_ratio = np.where(unloaded, np.inf, br_ratio)

    return Evaluation(
        self_weight=weight,
        vertical=vertical,
        moment=moment,
        eccentricity=e,
        q_max=pressure.q_max,
        q_min=pressure.q_min,
        contact_length=pressure.contact_length,
        stable=pressure.stable,
        pressure_compared=compared,
        allowable=np.broadcast_to(allowable, np.shape(vertical)),
        resisting_moment=resisting,
        overturning_moment=overturning_moment,
        friction=friction,
        cohesion=cohesion,
        passive=passive,
        overturning_ratio=np.broadcast_to(ot_ratio, np.shape(vertical)),
        sliding_ratio=np.broadcast_to(sl_ratio, np.shape(vertical)),
        bearing_ratio=np.broadcast_to(br_ratio, np.shape(vertical)),
        required=table.required,
        applies=table.applies,
    )

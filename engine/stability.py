"""The checks of one wall, for every design case at once, on any footing size.

The wall's loads are reduced once to per-case sums that do not depend on the footing's width B or
thickness t_f (:class:`CaseTable`); :func:`evaluate` then adds the self weight, works out the statics
every check shares (the resultant, its eccentricity and the soil pressure) and runs each registered
check (:mod:`engine.checks`) with numpy, for one size (a single check) or a whole grid of sizes
(sizing) with the same code. Formulas and their sources are in the modules called here.
"""

from __future__ import annotations

from collections.abc import Callable
from dataclasses import dataclass, field
from functools import lru_cache

import numpy as np

from . import overturning, soil_pressure
from .checks._arrays import full
from .combinations import DesignCase, combinations_of, design_cases
from .loads import lateral_resultants, self_weight, vertical_resultants
from .model import ConcreteSettings, DesignCriteria, LoadCase, Project, Site, SlidingBasis, SoilProperties, Wall
from .registry import Check, CheckArrays, Family, checks


def table_checks(family: Family = Family.SERVICE) -> tuple[Check, ...]:
    """The checks a case table serves: for the SERVICE family the service (ASD) checks and the
    geometric ones; for the STRENGTH family the footing's own strength checks."""
    wanted = (Family.SERVICE, Family.GEOMETRY) if family is Family.SERVICE else (family,)
    return tuple(c for c in checks() if c.family in wanted)


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
        seismic_shear / seismic_shear_moment: the parts of shear and shear_moment from E loads (for
            the ASCE 7-16 12.13.4 reduction of the seismic overturning moment).
        applied_dead: f_D times the wall's dead loads (N), for friction on the dead load.
        wind_or_seismic: the combination carries W or E (bearing increase applies).
        checks: the checks evaluated (:func:`table_checks`), in registry order.
        applies: (len(checks), k) booleans, the checks each case's combination applies to (a
            geometric check applies to no case).
        required: the required ratio of each check.
    """

    wall: Wall
    soil: SoilProperties
    criteria: DesignCriteria
    site: Site
    concrete: ConcreteSettings | None
    family: Family
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
    seismic_shear: np.ndarray
    seismic_shear_moment: np.ndarray
    applied_dead: np.ndarray
    wind_or_seismic: np.ndarray
    checks: tuple[Check, ...]
    applies: np.ndarray
    required: np.ndarray

    @property
    def length(self) -> float:
        return self.wall.footing_length


_CASE_ORDER = tuple(LoadCase)


@lru_cache(maxsize=128)
def _case_layout(
    criteria: DesignCriteria, lateral_cases: frozenset[LoadCase], family: Family = Family.SERVICE
) -> tuple[tuple[DesignCase, ...], np.ndarray, np.ndarray, np.ndarray, np.ndarray]:
    """The design cases of ``criteria`` and their factors (k x 7, LoadCase order), direction signs,
    W/E flags and check masks (checks x k). Cached: it depends on the criteria and on which lateral
    cases the wall has, not on the wall's loads."""
    cases = design_cases(combinations_of(criteria), lateral_cases)  # the strength family's criteria name its own method
    k = len(cases)
    factors = np.array([[case.combination.factor(c) for c in _CASE_ORDER] for case in cases], dtype=float).reshape(
        k, len(_CASE_ORDER)
    )
    sign = np.array([case.direction.sign for case in cases], dtype=float)
    wind_or_seismic = np.array([case.combination.has_wind_or_seismic for case in cases], dtype=bool)
    evaluated = table_checks(family)
    applies = np.array(
        [[check.per_case and check in case.combination.checks for case in cases] for check in evaluated], dtype=bool
    ).reshape(len(evaluated), k)
    for array in (factors, sign, wind_or_seismic, applies):
        array.setflags(write=False)
    return cases, factors, sign, wind_or_seismic, applies


def reported_checks(project: Project) -> tuple[Check, ...]:
    """The checks a project's results report, in display order: the stability and geometric checks,
    and the footing's strength checks when the project has a concrete section."""
    extra = table_checks(Family.STRENGTH) if project.concrete is not None else ()
    return tuple(sorted((*table_checks(), *extra)))


def strength_criteria(criteria: DesignCriteria, concrete: ConcreteSettings) -> DesignCriteria:
    """The criteria of the footing's strength design: the concrete's strength combinations with the
    project's S_DS (no custom list: a project's own combinations are for the stability checks)."""
    return DesignCriteria(
        method=concrete.strength_method, sds=criteria.sds, seismic_design_category=criteria.seismic_design_category
    )


def case_table(
    wall: Wall,
    soil: SoilProperties,
    criteria: DesignCriteria,
    site: Site | None = None,
    concrete: ConcreteSettings | None = None,
    family: Family = Family.SERVICE,
) -> CaseTable:
    """Reduce the wall's loads to per-case sums for every combination and direction.

    In a combination with factors f: N = sum f*P over vertical loads, V = sum f*H over lateral loads
    (ASCE 7-16 2.4.1: the load effects of a combination add). A load that reverses acts at its mirror
    position in direction '-'. In a case with no lateral load the toe is the end toward which the
    loads lean.
    """
    if family is Family.STRENGTH:
        if concrete is None:
            raise ValueError("the strength family needs the project's concrete settings")
        criteria = strength_criteria(criteria, concrete)
    length = wall.footing_length
    verticals = vertical_resultants(wall)
    laterals = lateral_resultants(wall)
    cases, factors, sign, wind_or_seismic, applies = _case_layout(criteria, frozenset(h.case for h in laterals), family)
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
    seismic = np.array([h.case is LoadCase.E for h in laterals], dtype=bool)
    evaluated = table_checks(family)
    return CaseTable(
        wall=wall,
        soil=soil,
        criteria=criteria,
        site=site or Site(),
        concrete=concrete,
        family=family,
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
        seismic_shear=(shears * seismic).sum(axis=1),
        seismic_shear_moment=(shears * seismic * h_height).sum(axis=1),
        applied_dead=factors[:, column[LoadCase.D]] * float(v_force[v_case == column[LoadCase.D]].sum()),
        wind_or_seismic=wind_or_seismic,
        checks=evaluated,
        applies=applies,
        required=np.array([criteria.required.of(c) for c in evaluated]),
    )


@dataclass(frozen=True, slots=True, eq=False)
class Statics:
    """What every check of every case shares, for footing width(s) B and thickness(es) t_f.

    Arrays have shape (k,) + the broadcast shape of B and t_f (``shape``); ``grid_shape`` is that of
    B and t_f alone.

    Attributes:
        self_weight: W_f, the footing, stem and soil cover (N, unfactored), at L_f/2.
        factored_weight: f_D W_f (N).
        vertical: N, the factored vertical load on the soil (N).
        moment: about the footing's mid-length (N*m), with the seismic overturning reduction.
        eccentricity: e = M/N (m); q_max, q_min (Pa), contact_length (m), stable: the soil pressure.
        lateral_moment: sum f H (h + t_f), the shears' moment about the base (N*m).
        overturning_lateral_moment: the same with the E part times (1 - r) (ASCE 7-16 12.13.4).
        sliding_normal: the normal force friction and the cohesion cap act on (N).
    """

    table: CaseTable
    width: np.ndarray
    thickness: np.ndarray
    grid_shape: tuple[int, ...]
    shape: tuple[int, ...]
    self_weight: np.ndarray
    factored_weight: np.ndarray
    vertical: np.ndarray
    moment: np.ndarray
    eccentricity: np.ndarray
    q_max: np.ndarray
    q_min: np.ndarray
    contact_length: np.ndarray
    stable: np.ndarray
    lateral_moment: np.ndarray
    overturning_lateral_moment: np.ndarray
    sliding_normal: np.ndarray
    memo: dict[str, object] = field(default_factory=dict)

    def per_case(self, a: np.ndarray) -> np.ndarray:
        """A per-case array (k,) shaped to broadcast against the grid."""
        return a.reshape((len(self.table.cases),) + (1,) * len(self.grid_shape))


@dataclass(frozen=True, slots=True, eq=False)
class Evaluation:
    """Every quantity of every case and check for footing width(s) B and thickness(es) t_f.

    ``arrays`` holds each registered check's ratio and parts (:class:`engine.registry.CheckArrays`);
    per-case ratios have shape (k,) + grid, geometric ones the grid's shape. Ratios are inf where
    there is no demand.
    """

    statics: Statics
    arrays: dict[Check, CheckArrays]
    checks: tuple[Check, ...]
    required: np.ndarray  # (len(checks),)
    applies: np.ndarray  # (len(checks), k)

    def ratio(self, check: Check) -> np.ndarray:
        return self.arrays[check].ratio

    def check_minima(self) -> np.ndarray:
        """(checks, ...) lowest ratio / required of each check over the cases it applies to (inf: none)."""
        out = []
        grid = self.statics.grid_shape
        per_case = self.statics.per_case
        for j, check in enumerate(self.checks):
            ratio = self.arrays[check].ratio
            if not check.per_case:
                out.append(np.broadcast_to(ratio, grid) / self.required[j])
                continue
            mask = self.applies[j]
            if not mask.any():
                out.append(np.full(grid, np.inf))
                continue
            # the least over the cases the check applies to (no copy of those rows)
            lowest = ratio.min(axis=0) if mask.all() else ratio.min(axis=0, where=per_case(mask), initial=np.inf)
            out.append(np.broadcast_to(lowest, grid) / self.required[j])
        return np.stack(out)

    # the shared statics, by their names
    @property
    def self_weight(self) -> np.ndarray:
        return self.statics.self_weight

    @property
    def vertical(self) -> np.ndarray:
        return self.statics.vertical

    @property
    def moment(self) -> np.ndarray:
        return self.statics.moment

    @property
    def eccentricity(self) -> np.ndarray:
        return self.statics.eccentricity

    @property
    def q_max(self) -> np.ndarray:
        return self.statics.q_max

    @property
    def q_min(self) -> np.ndarray:
        return self.statics.q_min

    @property
    def contact_length(self) -> np.ndarray:
        return self.statics.contact_length

    @property
    def stable(self) -> np.ndarray:
        return self.statics.stable

    # the parts of the three stability checks, by the names they had before the registry
    def _part(self, check_id: str, name: str) -> np.ndarray:
        for check, arrays in self.arrays.items():
            if check.id == check_id:
                return arrays.ratio if name == "ratio" else arrays[name]
        raise KeyError(check_id)

    @property
    def overturning_ratio(self) -> np.ndarray:
        return self._part("overturning", "ratio")

    @property
    def sliding_ratio(self) -> np.ndarray:
        return self._part("sliding", "ratio")

    @property
    def bearing_ratio(self) -> np.ndarray:
        return self._part("bearing", "ratio")

    @property
    def resisting_moment(self) -> np.ndarray:
        return self._part("overturning", "resisting")

    @property
    def overturning_moment(self) -> np.ndarray:
        return self._part("overturning", "moment")

    @property
    def friction(self) -> np.ndarray:
        return self._part("sliding", "friction")

    @property
    def cohesion(self) -> np.ndarray:
        return self._part("sliding", "cohesion")

    @property
    def passive(self) -> np.ndarray:
        return self._part("sliding", "passive")

    @property
    def pressure_compared(self) -> np.ndarray:
        return self._part("bearing", "pressure_compared")

    @property
    def allowable(self) -> np.ndarray:
        return self._part("bearing", "allowable")


def statics(table: CaseTable, width: float | np.ndarray, thickness: float | np.ndarray) -> Statics:
    """The resultant, its eccentricity and the soil pressure of every case on footing size(s) B x t_f.

    N = sum f P + f_D W_f; M about the footing's mid-length = direction * sum f H (h + t_f) + sum f P
    (x - L_f/2), the E part of the shears' moment times (1 - r) where the ASCE 7-16 12.13.4 reduction
    r is taken (for overturning and bearing; sliding keeps the full shear); then e = M/N and the
    rigid-footing pressure (:mod:`engine.soil_pressure`). The normal force of friction is N, or with
    ``sliding_basis`` "dead" the combination's dead load f_D (D + W_f), at most N.
    """
    b = np.asarray(width, dtype=float)
    d = np.asarray(thickness, dtype=float)
    grid_shape = np.broadcast_shapes(b.shape, d.shape)
    k = len(table.cases)
    shape = (k,) + grid_shape
    per_case: Callable[[np.ndarray], np.ndarray] = lambda a: a.reshape((k,) + (1,) * len(grid_shape))  # noqa: E731

    wall, soil = table.wall, table.soil
    length = table.length
    weight = np.asarray(self_weight(wall, soil, b, d).total, dtype=float)
    # The strength family keeps the self weight in the soil pressure (so the pressure's shape is that
    # of the footing as it stands); the member design then takes off the uniform pressure of the
    # factored self weight, which goes straight to the soil (engine.checks._strength).
    strength = table.family is Family.STRENGTH
    factored_weight = per_case(table.dead_factor) * weight  # acts at L_f/2
    vertical = per_case(table.applied_vertical) + factored_weight
    lateral = overturning.lateral_moment(per_case(table.shear_moment), per_case(table.shear), d)  # sum f H (h + t_f)
    r = 0.0 if strength else table.criteria.seismic_overturning_reduction
    if r:
        seismic = overturning.lateral_moment(per_case(table.seismic_shear_moment), per_case(table.seismic_shear), d)
        reduced = lateral - r * seismic
    else:
        reduced = lateral
    moment = per_case(table.direction_sign) * reduced + per_case(table.applied_moment)
    if soil.sliding_basis is SlidingBasis.DEAD:
        # IBC 2021 Table 1806.2 note a, 1806.3.2: friction on the dead load f_D (D + W_f); never more
        # than the whole N the soil feels, which uplift in the combination may have reduced
        normal = per_case(table.applied_dead) + factored_weight
        np.minimum(normal, vertical, out=normal)
    else:
        normal = vertical
    e = soil_pressure.resultant_eccentricity(moment, vertical)
    pressure = soil_pressure.pressure_distribution(vertical, e, b, length)
    return Statics(
        table=table,
        width=b,
        thickness=d,
        grid_shape=grid_shape,
        shape=shape,
        self_weight=weight,
        factored_weight=factored_weight,
        vertical=full(vertical, shape),
        moment=full(moment, shape),
        eccentricity=full(e, shape),
        q_max=full(pressure.q_max, shape),
        q_min=full(pressure.q_min, shape),
        contact_length=full(pressure.contact_length, shape),
        stable=full(pressure.stable, shape),
        lateral_moment=full(lateral, shape),
        overturning_lateral_moment=full(reduced, shape),
        sliding_normal=full(normal, shape),
    )


def evaluate(table: CaseTable, width: float | np.ndarray, thickness: float | np.ndarray) -> Evaluation:
    """Run every check of the table for every case on footing size(s) B x t_f.

    Args:
        table: the wall's per-case sums.
        width: B (m), a float or an array broadcastable against ``thickness``.
        thickness: t_f (m).
    """
    state = statics(table, width, thickness)
    arrays = {check: check.evaluate(state) for check in table.checks}
    return Evaluation(statics=state, arrays=arrays, checks=table.checks, required=table.required, applies=table.applies)

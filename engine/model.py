"""The design inputs: small frozen dataclasses holding SI floats (m, N, N/m, Pa, N/m^3).

Coordinates (the contract every module follows):

* The footing runs along the wall. Its length is
  ``L = extension_start + wall length + extension_end``; ``x`` runs along it from its start end, and
  the wall occupies ``extension_start <= x <= extension_start + length``.
* Load positions are given from the wall's start end (so ``x = extension_start + position``).
* Vertical loads are positive downward. Lateral loads are in-plane shears (positive magnitudes) at a
  height above the top of the footing; the sign of their push is the direction of the check.

Edit a value with :func:`dataclasses.replace`; every constructor validates what it is given.
"""

from __future__ import annotations

import math
from collections.abc import Mapping, Sequence
from dataclasses import dataclass, field
from enum import Enum
from typing import Any, overload

from .errors import InputError
from .registry import Check, CodeBasis, Family, Method, check_by_id, checks, code_by_id

__all__ = ["ALL_CHECKS", "Check", "CodeBasis", "Method"]

# Unit weights used as defaults: 150 pcf normal-weight concrete and 110 pcf soil (common practice).
PCF = 4.4482216152605 / 0.3048**3  # N/m^3 per pcf (exact definitions, NIST SP 811)
PSF = 4.4482216152605 / 0.3048**2  # Pa per psf
INCH = 0.0254
FOOT = 0.3048
# The largest sizing grid searched (about 0.1 s on two cores).
MAX_CANDIDATES = 250_000


class LoadCase(Enum):
    """Load cases by their ASCE 7-16 symbols (section 2.2)."""

    D = "D"
    L = "L"
    LR = "Lr"
    S = "S"
    R = "R"
    W = "W"
    E = "E"

    @property
    def is_lateral_source(self) -> bool:
        """W and E are the cases whose loads reverse with the direction of the lateral force."""
        return self in (LoadCase.W, LoadCase.E)


class _LegacyChecks(Sequence[Check]):
    """``ALL_CHECKS``: the three global stability checks under their old name, read from the registry
    (new code loops over :func:`engine.registry.checks`, which also holds embedment and later ones)."""

    def _items(self) -> tuple[Check, ...]:
        return (Check.OVERTURNING, Check.SLIDING, Check.BEARING)

    @overload
    def __getitem__(self, index: int) -> Check: ...
    @overload
    def __getitem__(self, index: slice) -> tuple[Check, ...]: ...
    def __getitem__(self, index: int | slice) -> Check | tuple[Check, ...]:
        return self._items()[index]

    def __len__(self) -> int:
        return 3


ALL_CHECKS: Sequence[Check] = _LegacyChecks()


class WallConstruction(Enum):
    """What the wall is built of: it sets the footing's critical sections (ACI 318-19 Table 13.2.7.1)
    and how the wall delivers its overturning to the footing along its length."""

    CONCRETE = "concrete"
    MASONRY = "masonry"
    LIGHT_FRAME = "light-frame"


class SlidingBasis(Enum):
    """What friction and the cohesion cap act on.

    TOTAL: the combination's whole vertical load N. DEAD: the combination's dead load (its D factor
    times all dead load, self weight included), as IBC 2021 Table 1806.2 note a and 1806.3.2 say.
    """

    TOTAL = "total"
    DEAD = "dead"


class BearingBasis(Enum):
    """Whether the allowable bearing pressure is gross or net of the overburden at the footing base."""

    GROSS = "gross"
    NET = "net"


class Direction(Enum):
    """Direction of the lateral load: '+' pushes toward x = L, '-' toward x = 0."""

    POSITIVE = "+"
    NEGATIVE = "-"
    NONE = "none"

    @property
    def sign(self) -> int:
        return {"+": 1, "-": -1, "none": 0}[self.value]


def _require(condition: bool, field_name: str, problem: str) -> None:
    if not condition:
        raise InputError(field_name, problem)


def _finite(value: float, field_name: str) -> None:
    _require(isinstance(value, (int, float)) and math.isfinite(value), field_name, f"expected a finite number, got {value!r}")


def _positive(value: float, field_name: str) -> None:
    _finite(value, field_name)
    _require(value > 0.0, field_name, "must be greater than zero")


def _non_negative(value: float, field_name: str) -> None:
    _finite(value, field_name)
    _require(value >= 0.0, field_name, "must not be negative")


@dataclass(frozen=True, slots=True, kw_only=True)
class LineLoad:
    """A uniform vertical line load along part of the wall (N/m, positive downward).

    ``reverses``: for W and E loads that come from the overturning of the wall itself, the load as
    given acts for direction '+', and in direction '-' it acts mirrored about the wall's mid-length.
    """

    case: LoadCase
    value: float
    start: float
    end: float
    label: str = ""
    reverses: bool = False

    def __post_init__(self) -> None:
        _finite(self.value, "value")
        _finite(self.start, "start")
        _finite(self.end, "end")
        _require(self.end > self.start, "end", "must be greater than start")
        _require(not self.reverses or self.case.is_lateral_source, "reverses", "only W and E loads can reverse")


@dataclass(frozen=True, slots=True, kw_only=True)
class PointLoad:
    """A concentrated vertical load (N, positive downward) at ``at`` from the wall's start end.

    ``reverses`` as for :class:`LineLoad` (a hold-down force moves to the other end of the wall when
    the shear reverses).
    """

    case: LoadCase
    value: float
    at: float
    label: str = ""
    reverses: bool = False

    def __post_init__(self) -> None:
        _finite(self.value, "value")
        _finite(self.at, "at")
        _require(not self.reverses or self.case.is_lateral_source, "reverses", "only W and E loads can reverse")


@dataclass(frozen=True, slots=True, kw_only=True)
class LateralLoad:
    """An in-plane shear (N, magnitude) applied ``height`` above the top of the footing (W or E)."""

    case: LoadCase
    value: float
    height: float
    label: str = ""

    def __post_init__(self) -> None:
        _require(self.case.is_lateral_source, "case", f'lateral loads must be case W or E, got "{self.case.value}"')
        _non_negative(self.value, "value")
        _non_negative(self.height, "height")


Load = LineLoad | PointLoad | LateralLoad


@dataclass(frozen=True, slots=True, kw_only=True)
class Reinforcement:
    """The footing's bars as the engineer gave them (SI: spacing in m).

    ``transverse``: (bar, spacing) across the width, bottom face; ``bottom`` and ``top``: (count,
    bar) along the length. Any part may be None (Kernline designs it). ``plain``: no bars, ACI 318-19
    chapter 14. The bar objects are :class:`engine.concrete.bars.Bar`.
    """

    transverse: tuple[Any, float] | None = None
    bottom: tuple[int, Any] | None = None
    top: tuple[int, Any] | None = None
    plain: bool = False


@dataclass(frozen=True, slots=True, kw_only=True)
class StripFooting:
    """The continuous footing: width B across the wall, thickness t_f, extensions past the wall ends.

    ``cover`` is the depth of soil over the top of the footing; ``offset`` is reserved for a
    transverse offset of the wall on the footing (not used by the in-plane checks).
    """

    width: float
    thickness: float
    extension_start: float = 0.0
    extension_end: float = 0.0
    cover: float = 0.0
    unit_weight: float = 150.0 * PCF
    offset: float = 0.0
    reinforcement: Reinforcement | None = None

    def __post_init__(self) -> None:
        _positive(self.width, "width")
        _positive(self.thickness, "thickness")
        _non_negative(self.extension_start, "extension_start")
        _non_negative(self.extension_end, "extension_end")
        _non_negative(self.cover, "cover")
        _non_negative(self.unit_weight, "unit_weight")
        _finite(self.offset, "offset")


@dataclass(frozen=True, slots=True, kw_only=True)
class Stem:
    """A concrete stem wall between footing and wall (height 0: no stem)."""

    height: float = 0.0
    thickness: float = 8.0 * INCH

    def __post_init__(self) -> None:
        _non_negative(self.height, "height")
        _positive(self.thickness, "thickness")

    @property
    def present(self) -> bool:
        return self.height > 0.0


@dataclass(frozen=True, slots=True, kw_only=True)
class SizingBounds:
    """The candidate grid searched by automatic sizing (inclusive bounds, fixed steps).

    ``extension_max`` > 0 adds a third axis: equal extensions at both ends, 0 to extension_max by
    extension_step, added to the footing's own extensions.

    A grid of more than :data:`MAX_CANDIDATES` candidates is refused: the steps are too fine for the
    range (it would take seconds and much memory to search).
    """

    width_min: float = 12.0 * INCH
    width_max: float = 96.0 * INCH
    width_step: float = 1.0 * INCH
    thickness_min: float = 12.0 * INCH
    thickness_max: float = 48.0 * INCH
    thickness_step: float = 1.0 * INCH
    extension_max: float = 0.0
    extension_step: float = 0.0

    def __post_init__(self) -> None:
        for name in ("width_min", "width_max", "width_step", "thickness_min", "thickness_max", "thickness_step"):
            _positive(getattr(self, name), name)
        _non_negative(self.extension_max, "extension_max")
        _non_negative(self.extension_step, "extension_step")
        _require(self.extension_max == 0.0 or self.extension_step > 0.0, "extension_step", "must be greater than zero")
        _require(self.width_max >= self.width_min, "width_max", "must not be less than width_min")
        _require(self.thickness_max >= self.thickness_min, "thickness_max", "must not be less than thickness_min")
        widths = (self.width_max - self.width_min) / self.width_step + 1.0
        thicknesses = (self.thickness_max - self.thickness_min) / self.thickness_step + 1.0
        extensions = self.extension_max / self.extension_step + 1.0 if self.extension_max > 0.0 else 1.0
        shown = f"{widths:,.0f} x {thicknesses:,.0f}" + (f" x {extensions:,.0f}" if extensions > 1.0 else "")
        _require(
            widths * thicknesses * extensions <= MAX_CANDIDATES,
            "width_step",
            f"the grid would have about {shown} candidates; use coarser steps or narrower "
            f"bounds (at most {MAX_CANDIDATES:,} candidates)",
        )


@dataclass(frozen=True, slots=True, kw_only=True)
class Wall:
    """A shear wall on its strip footing, with the loads it delivers."""

    id: str
    length: float
    thickness: float
    footing: StripFooting
    label: str = ""
    stem: Stem = field(default_factory=Stem)
    loads: tuple[Load, ...] = ()
    sizing: SizingBounds = field(default_factory=SizingBounds)
    construction: WallConstruction = WallConstruction.LIGHT_FRAME
    chord_offset: float = 3.0 * INCH

    def __post_init__(self) -> None:
        _require(bool(self.id.strip()), "id", "must not be empty")
        _positive(self.length, "length")
        _positive(self.thickness, "thickness")
        _require(
            self.footing.width >= self.supported_thickness,
            "footing.width",
            "the footing is narrower than the " + ("stem" if self.stem.present else "wall") + " it carries",
        )
        low, high = -self.footing.extension_start, self.length + self.footing.extension_end
        for i, load in enumerate(self.loads):
            if isinstance(load, LineLoad):
                _require(
                    low - 1e-9 <= load.start and load.end <= high + 1e-9, f"loads[{i}]", "the line load runs past the footing"
                )
            elif isinstance(load, PointLoad):
                _require(low - 1e-9 <= load.at <= high + 1e-9, f"loads[{i}].at", "the point load is off the footing")

    @property
    def footing_length(self) -> float:
        """L = extension_start + wall length + extension_end."""
        return self.footing.extension_start + self.length + self.footing.extension_end

    @property
    def supported_thickness(self) -> float:
        """Thickness of what sits on the footing: the stem when there is one, else the wall."""
        return self.stem.thickness if self.stem.present else self.thickness

    @property
    def has_lateral(self) -> bool:
        return any(isinstance(load, LateralLoad) for load in self.loads)


@dataclass(frozen=True, slots=True, kw_only=True)
class SoilProperties:
    """Values from the geotechnical report (or the code's presumptive values); ``report`` names it."""

    allowable_bearing: float = 2000.0 * PSF
    bearing_basis: BearingBasis = BearingBasis.GROSS
    friction: float = 0.35
    cohesion: float = 0.0
    passive: float = 0.0
    passive_ignore: float = 0.0
    unit_weight: float = 110.0 * PCF
    report: str = ""
    sliding_basis: SlidingBasis = SlidingBasis.TOTAL
    presumptive_class: int | None = None

    def __post_init__(self) -> None:
        _positive(self.allowable_bearing, "allowable_bearing")
        _non_negative(self.friction, "friction")
        _non_negative(self.cohesion, "cohesion")
        _non_negative(self.passive, "passive")
        _non_negative(self.passive_ignore, "passive_ignore")
        _non_negative(self.unit_weight, "unit_weight")


@dataclass(frozen=True, init=False)
class RequiredRatios:
    """The least ratio of capacity to demand each check must reach, by check id (1.0 if not named).

    Built as ``RequiredRatios(overturning=2.0, sliding=1.5)`` or ``RequiredRatios(values={...})``; read
    with :meth:`of` (or as attributes: ``required.overturning``).
    """

    values: tuple[tuple[str, float], ...] = ()

    def __init__(self, values: Mapping[str, float] | None = None, **ratios: float) -> None:
        merged = {**(values or {}), **ratios}
        for name, value in merged.items():
            _positive(value, name)
        object.__setattr__(self, "values", tuple(sorted(merged.items())))

    def of(self, check: Check) -> float:
        return float(dict(self.values).get(check.id, 1.0))

    def __getattr__(self, name: str) -> Any:
        if name.startswith("_"):
            raise AttributeError(name)
        try:
            return self.of(check_by_id(name))
        except KeyError:
            raise AttributeError(name) from None


@dataclass(frozen=True, slots=True, kw_only=True)
class LoadCombination:
    """A named set of load factors and the checks it applies to."""

    name: str
    factors: tuple[tuple[LoadCase, float], ...]
    checks: frozenset[Check] = None  # type: ignore[assignment]  # None: every per-case check of the service family

    def __post_init__(self) -> None:
        if self.checks is None:
            object.__setattr__(self, "checks", frozenset(checks(Family.SERVICE)))
        _require(bool(self.name.strip()), "name", "must not be empty")
        for case, factor in self.factors:
            _finite(factor, f"factors.{case.value}")
        _require(bool(self.checks), "checks", "must name at least one check")

    def factor(self, case: LoadCase) -> float:
        for c, f in self.factors:
            if c is case:
                return f
        return 0.0

    @property
    def has_wind_or_seismic(self) -> bool:
        return self.factor(LoadCase.W) != 0.0 or self.factor(LoadCase.E) != 0.0


@dataclass(frozen=True, slots=True, kw_only=True)
class DesignCriteria:
    """Code basis (method), required ratios, load combinations (a custom list replaces the method's
    preset) and the options of the code basis.

    Attributes:
        method: the registered code basis (:mod:`engine.codes`); ASCE 7-16 ASD when not given.
        ev_at_soil: False takes Ev = 0 in the counteracting seismic combination (ASCE 7-16 12.4.2.2
            exception 2, at the soil-structure interface).
        seismic_overturning_reduction: r of ASCE 7-16 12.13.4 (0, 0.10 or 0.25): the overturning moment
            of the E lateral loads is multiplied by (1 - r) in the overturning and bearing checks.
        wind_omega: omega of IBC 2021 1605.2 on 0.6 W in the alternative basic ASD combinations.
        seismic_snow_factor: the factor on S in the ASCE 7-22 seismic ASD combination with snow, as
            the engineer reads it in the standard (Kernline has not confirmed it; see engine.codes.asce7_22).
    """

    method: CodeBasis = None  # type: ignore[assignment]  # None: ASCE 7-16 ASD
    required: RequiredRatios = field(default_factory=RequiredRatios)
    sds: float = 0.0
    bearing_increase: float = 1.0
    custom_combinations: tuple[LoadCombination, ...] = ()
    ev_at_soil: bool = True
    seismic_overturning_reduction: float = 0.0
    wind_omega: float = 1.3
    seismic_snow_factor: float | None = None
    seismic_design_category: str | None = None

    def __post_init__(self) -> None:
        if self.method is None:
            object.__setattr__(self, "method", code_by_id("asce7-16-asd"))
        _non_negative(self.sds, "sds")
        _positive(self.bearing_increase, "bearing_increase")
        _require(0.0 <= self.seismic_overturning_reduction < 1.0, "seismic_overturning_reduction", "must be from 0 up to 1")
        _positive(self.wind_omega, "wind_omega")


@dataclass(frozen=True, slots=True, kw_only=True)
class ProjectInfo:
    """Title-block information."""

    name: str = ""
    number: str = ""
    engineer: str = ""
    checker: str = ""
    client: str = ""
    address: str = ""
    revision: str = ""
    revision_date: str = ""
    notes: str = ""


@dataclass(frozen=True, slots=True, kw_only=True)
class Assumption:
    """A value the engineer did not enter, which Kernline took by default.

    Attributes:
        field: its path in the project file, such as ``walls[0].footing.unit_weight``.
        value: the value taken, as text in the project's units ("150 pcf").
        basis: why this value (its clause, or "common practice").
    """

    field: str
    value: str
    basis: str


@dataclass(frozen=True, slots=True, kw_only=True)
class ConcreteSettings:
    """The footing's concrete design inputs (SI): f'c, fy (Pa), cover to the bottom bars (m), λ, and
    the strength combinations (a code basis of the STRENGTH family)."""

    fc: float
    fy: float
    cover: float
    lam: float = 1.0
    strength_method: CodeBasis = None  # type: ignore[assignment]  # None: ASCE 7-16 strength design

    def __post_init__(self) -> None:
        if self.strength_method is None:
            object.__setattr__(self, "strength_method", code_by_id("asce7-16-lrfd"))
        _positive(self.fc, "fc")
        _positive(self.fy, "fy")
        _non_negative(self.cover, "cover")
        _require(0.0 < self.lam <= 1.0, "lambda", "must be above 0 and at most 1.0 (ACI 318-19 19.2.4)")


@dataclass(frozen=True, slots=True, kw_only=True)
class Site:
    """Site conditions that are not soil strengths: the frost depth (m; None when not entered)."""

    frost_depth: float | None = None

    def __post_init__(self) -> None:
        if self.frost_depth is not None:
            _non_negative(self.frost_depth, "frost_depth")


@dataclass(frozen=True, slots=True, kw_only=True)
class Project:
    """A whole project: information, display units, criteria, soil and walls.

    ``assumptions`` lists every value taken by default when the project was read (see
    :class:`Assumption`); a project built in code has none unless it says so.
    """

    info: ProjectInfo = field(default_factory=ProjectInfo)
    units: str = "US"
    criteria: DesignCriteria = field(default_factory=DesignCriteria)
    soil: SoilProperties = field(default_factory=SoilProperties)
    site: Site = field(default_factory=Site)
    walls: tuple[Wall, ...] = ()
    assumptions: tuple[Assumption, ...] = ()
    concrete: ConcreteSettings | None = None

    def __post_init__(self) -> None:
        _require(self.units in ("US", "SI"), "units", f'expected "US" or "SI", got "{self.units}"')
        ids = [w.id for w in self.walls]
        for i, wid in enumerate(ids):
            _require(wid not in ids[:i], f"walls[{i}].id", f'"{wid}" is used by another wall')

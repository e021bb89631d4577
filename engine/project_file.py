"""The project file: JSON, format "kernline-project" version 1, extension ``.kernline``.

Loading validates every field and names its path in the message
(``walls[1].footing.width: expected a length such as "24 in", got "24"``). The raw JSON document is
kept beside the parsed model, so that saving writes back exactly what was read plus the edits, and
keys the project added of its own survive. Saving is atomic: a temporary file in the same folder is
written, flushed and fsync'd, then renamed over the old one, so a crash mid-save leaves the old file
whole.
"""

from __future__ import annotations

import copy
import json
import math
import os
import re
from collections.abc import Iterator
from contextlib import contextmanager
from contextvars import ContextVar
from dataclasses import dataclass, replace
from functools import lru_cache
from pathlib import Path
from typing import Any

from .checks.embedment import MIN_WIDTH
from .combinations import MAX_SDS, default_required
from .concrete.bars import parse_counted, parse_spaced
from .errors import FormatVersionError, InputError
from .file_safety import atomic_write_text, check_input_file
from .model import (
    INCH,
    Assumption,
    BearingBasis,
    Check,
    ConcreteSettings,
    DesignCriteria,
    LateralLoad,
    LineLoad,
    LoadCase,
    LoadCombination,
    PointLoad,
    Project,
    ProjectInfo,
    Reinforcement,
    RequiredRatios,
    Site,
    SizingBounds,
    SlidingBasis,
    SoilProperties,
    Stem,
    StripFooting,
    Wall,
    WallConstruction,
)
from .registry import CodeBasis, Family, check_by_id, checks, codes
from .units import Kind, format_length, format_quantity, length_text, parse_quantity

FORMAT = "kernline-project"
VERSION = 1
EXTENSION = ".kernline"

_CASES = {c.value: c for c in LoadCase}

# ---- the keys of each section -------------------------------------------------------------------
# Inside these sections an unknown key is refused (a misspelt key would otherwise be ignored and a
# default used). Users keep their own data under the top-level "extra" object or under any key that
# starts with "x-"; both are kept exactly on save.
TOP_KEYS = ("format", "version", "units", "project", "criteria", "soil", "site", "concrete", "walls", "extra")
CONCRETE_KEYS = ("fc", "fy", "cover", "lambda", "strength_method")
REINFORCEMENT_KEYS = ("transverse", "bottom", "top")
SEISMIC_DESIGN_CATEGORIES = ("A", "B", "C", "D", "E", "F")
PROJECT_KEYS = ("name", "number", "engineer", "checker", "client", "address", "revision", "revision_date", "notes")
# the options a code basis may accept (each basis lists its own in CodeBasis.options)
OPTION_KEYS = ("ev_at_soil", "seismic_overturning_reduction", "wind_omega", "seismic_snow_factor")
CRITERIA_KEYS = ("method", "sds", "bearing_increase", "required", "combinations", "seismic_design_category", *OPTION_KEYS)
REQUIRED_KEYS = tuple(c.id for c in checks(Family.SERVICE))
SITE_KEYS = ("frost_depth",)
COMBINATION_KEYS = ("name", "factors", "checks")
SOIL_KEYS = (
    "allowable_bearing",
    "bearing_basis",
    "friction",
    "cohesion",
    "passive",
    "passive_ignore",
    "unit_weight",
    "report",
    "sliding_basis",
    "presumptive_class",
)
WALL_KEYS = ("id", "label", "length", "thickness", "construction", "chord_offset", "footing", "stem", "loads", "sizing")
FOOTING_KEYS = ("width", "thickness", "extension_start", "extension_end", "cover", "unit_weight", "offset", "reinforcement")
STEM_KEYS = ("height", "thickness")
LOAD_KEYS = {
    "line": ("type", "case", "value", "start", "end", "label", "reverses"),
    "point": ("type", "case", "value", "at", "label", "reverses"),
    "lateral": ("type", "case", "value", "height", "label"),
}
SIZING_KEYS = (
    "width_min",
    "width_max",
    "width_step",
    "thickness_min",
    "thickness_max",
    "thickness_step",
    "extension_max",
    "extension_step",
)
# ASCE 7-16 12.13.4: the reductions of the foundation overturning moment it allows.
OVERTURNING_REDUCTIONS = (0.0, 0.10, 0.25)
# IBC 2021 1605.2: omega on 0.6W, 1.3 for wind of ASCE 7 chapters 26 to 31, else 1.0.
WIND_OMEGAS = (1.0, 1.3)
USER_PREFIX = "x-"

# Limits of physical sense on plain numbers (common practice: beyond them the number is a slip).
MAX_FACTOR = 10.0  # a load factor, a required ratio or a bearing increase
MAX_FRICTION = 2.0  # a friction coefficient (tan of a friction angle; 2 is over 63 degrees)
MAX_DEPTH = 64  # nesting of JSON objects and lists
MAX_INT_DIGITS = 100

# Pressures from this value up are material strengths (f'c, fy), shown in psi or MPa, not psf or kPa.
MATERIAL_STRENGTH = 1.0e6
PSI = 4.4482216152605 / 0.0254**2

# Where the values taken by default come from (the "basis" of each assumption).
BASIS_CONCRETE = "normal-weight concrete, common practice"
BASIS_NONE = "none entered: not taken into account"
BASIS_SIZING = "Kernline's default sizing range, common practice"

_path: ContextVar[tuple[str, ...]] = ContextVar("kernline_field_path", default=())
_assumed: ContextVar[list[Assumption] | None] = ContextVar("kernline_assumptions", default=None)
_system: ContextVar[str] = ContextVar("kernline_units", default="US")


def _join(parts: tuple[str, ...]) -> str:
    out = ""
    for part in parts:
        if not part:
            continue
        out = part if not out else (out + part if part.startswith("[") else f"{out}.{part}")
    return out


@contextmanager
def _scope(path: str) -> Iterator[None]:
    """Parse inside field ``path``: errors are prefixed with it, assumptions recorded under it."""
    token = _path.set(_path.get() + (path,))
    try:
        yield
    except InputError as err:
        raise err.within(path) from None
    finally:
        _path.reset(token)


def _assume(key: str, value: str, basis: str) -> None:
    """Record that ``key`` (in the current scope) was not entered and ``value`` was taken."""
    found = _assumed.get()
    if found is not None:
        found.append(Assumption(field=_join(_path.get() + (key,)), value=value, basis=basis))


def _keys(obj: dict[str, Any], allowed: tuple[str, ...]) -> None:
    """Refuse a key that is not one of ``allowed`` (keys starting with "x-" are the user's own)."""
    for key in obj:
        if key in allowed or (isinstance(key, str) and key.startswith(USER_PREFIX)):
            continue
        shown = key if len(key) <= 40 else key[:37] + "..."
        lowered = {k.lower(): k for k in allowed}
        import difflib  # only for this message: not imported by every load

        close = difflib.get_close_matches(key.lower(), list(lowered), n=1, cutoff=0.6)
        if close:
            hint = f'did you mean "{lowered[close[0]]}"?'
        else:
            hint = "expected one of " + ", ".join(allowed)
        raise InputError(shown, f'unknown key; {hint} (keep your own data under "extra" or keys starting with "x-")')


def _object(raw: Any, path: str, required: bool = False) -> dict[str, Any]:
    if raw is None and not required:
        return {}
    if not isinstance(raw, dict):
        raise InputError(path, f"expected an object {{...}}, got {_show(raw)}")
    return raw


def _show(value: Any) -> str:
    try:
        text = json.dumps(value, ensure_ascii=False) if not isinstance(value, str) else f'"{value}"'
    except (TypeError, ValueError):
        text = type(value).__name__
    return text if len(text) <= 40 else text[:37] + "..."


def _quantity(
    obj: dict[str, Any],
    key: str,
    kind: Kind,
    default: str | None = None,
    basis: str = "",
    *,
    positive: bool = False,
    non_negative: bool = False,
) -> float:
    """Parse obj[key] ("number unit") as ``kind``; missing -> ``default`` (an assumption) or an error."""
    if key not in obj:
        if default is None:
            raise InputError(key, f'is missing; expected {kind.info.noun} such as "{kind.info.example}"')
        value = parse_quantity(default, kind)
        _assume(key, _format(value, kind), basis)
        return value
    text = obj[key]
    if not isinstance(text, str):
        raise InputError(key, f'expected {kind.info.noun} such as "{kind.info.example}" (text in quotes), got {_show(text)}')
    with _scope(key):
        value = parse_quantity(text, kind)
    if positive and not value > 0.0:
        raise InputError(key, f"must be greater than zero, got {_show(text)}")
    if non_negative and value < 0.0:
        raise InputError(key, f"must not be negative, got {_show(text)}")
    return value


def _format(value: float, kind: Kind) -> str:
    """A value taken by default, as text in the project's units."""
    system = _system.get()
    if kind is Kind.LENGTH:
        return format_length(value, system)
    if kind is Kind.PRESSURE and value >= MATERIAL_STRENGTH:  # a material strength: psi or MPa
        return f"{value / PSI:,.0f} psi" if system == "US" else f"{value / 1e6:,.1f} MPa"
    return format_quantity(value, kind, system)


def _number(
    obj: dict[str, Any],
    key: str,
    default: float | None = None,
    basis: str = "",
    *,
    positive: bool = False,
    non_negative: bool = False,
    limit: float | None = None,
    limit_reason: str = "",
) -> float:
    if key not in obj:
        if default is None:
            raise InputError(key, "is missing; expected a number")
        _assume(key, f"{default:g}", basis)
        return default
    value = obj[key]
    if isinstance(value, bool) or not isinstance(value, (int, float)):
        raise InputError(key, f"expected a number, got {_show(value)}")
    try:
        value = float(value)
    except OverflowError:
        raise InputError(key, f"the number {_show(value)} is far too large") from None
    if not math.isfinite(value):
        raise InputError(key, f"expected a finite number, got {value}")
    if positive and not value > 0.0:
        raise InputError(key, f"must be greater than zero, got {value:g}")
    if non_negative and value < 0.0:
        raise InputError(key, f"must not be negative, got {value:g}")
    if limit is not None and abs(value) > limit:
        raise InputError(key, f"{value:g} is beyond {limit:g}, the limit for {limit_reason}; check the value")
    return float(value)


def _text(obj: dict[str, Any], key: str, default: str = "") -> str:
    value = obj.get(key, default)
    if not isinstance(value, str):
        raise InputError(key, f"expected text, got {_show(value)}")
    return value


def _choice(obj: dict[str, Any], key: str, choices: dict[str, Any], default: str, basis: str) -> Any:
    if key not in obj:
        _assume(key, default, basis)
    value = obj.get(key, default)
    if not isinstance(value, str) or value not in choices:
        allowed = ", ".join(f'"{c}"' for c in choices)
        raise InputError(key, f"expected one of {allowed}, got {_show(value)}")
    return choices[value]


def _case(obj: dict[str, Any], allowed: tuple[LoadCase, ...] = tuple(LoadCase)) -> LoadCase:
    value = obj.get("case")
    names = {c.value: c for c in allowed}
    if not isinstance(value, str) or value not in names:
        listing = ", ".join(names)
        if value is None:
            raise InputError("case", f"is missing; expected one of {listing}")
        if isinstance(value, str) and value in _CASES:
            raise InputError("case", f"a {obj.get('type')} load cannot be case {value}; expected one of {listing}")
        raise InputError("case", f"unknown load case {_show(value)}; expected one of {listing}")
    return names[value]


def _info(raw: Any) -> ProjectInfo:
    obj = _object(raw, "")
    _keys(obj, PROJECT_KEYS)
    return ProjectInfo(**{k: _text(obj, k) for k in PROJECT_KEYS})


def _combination(raw: Any) -> LoadCombination:
    obj = _object(raw, "", required=True)
    _keys(obj, COMBINATION_KEYS)
    name = _text(obj, "name")
    if not name.strip():
        raise InputError("name", 'is missing; give the combination a name such as "0.6D + 0.6W"')
    factors_raw = _object(obj.get("factors"), "factors", required=True)
    factors = []
    with _scope("factors"):
        for key in factors_raw:
            if key not in _CASES:
                close = [c for c in _CASES if c.lower() == str(key).lower()]
                hint = f'did you mean "{close[0]}"? ' if close else ""
                raise InputError(str(key)[:40], f"unknown load case; {hint}expected one of {', '.join(_CASES)} (ASCE 7-16 2.2)")
            factors.append((_CASES[key], _number(factors_raw, key, limit=MAX_FACTOR, limit_reason="a load factor")))
    service = checks(Family.SERVICE)
    checks_raw = obj.get("checks", [c.id for c in service])
    if "checks" not in obj:
        _assume("checks", ", ".join(c.id for c in service), "a combination applies to every check unless it says")
    if not isinstance(checks_raw, list) or not checks_raw:
        raise InputError("checks", f'expected a list such as ["overturning", "sliding", "bearing"], got {_show(checks_raw)}')
    names = {c.id: c for c in service}
    chosen = set()
    for i, c in enumerate(checks_raw):
        if not isinstance(c, str) or c not in names:
            raise InputError(f"checks[{i}]", f"expected one of {', '.join(names)}, got {_show(c)}")
        chosen.add(names[c])
    return LoadCombination(name=name, factors=tuple(factors), checks=frozenset(chosen))


def _criteria(raw: Any, seismic_walls: list[str], seismic_snow_walls: list[str] | None = None) -> DesignCriteria:
    seismic_snow_walls = seismic_snow_walls or []
    obj = _object(raw, "")
    _keys(obj, CRITERIA_KEYS)
    method: CodeBasis = _choice(
        obj, "method", {c.id: c for c in codes(Family.SERVICE)}, "asce7-16-asd", "ASCE 7-16 ASD combinations (Kernline's default)"
    )
    for key in OPTION_KEYS:
        if key in obj and key not in method.options:
            raise InputError(key, f'is not an option of the method "{method.id}"; leave it out or choose another method')
    base = default_required(method)
    with _scope("required"):
        req_obj = _object(obj.get("required"), "")
        _keys(req_obj, REQUIRED_KEYS)
        required = RequiredRatios(
            {
                c: _number(
                    req_obj,
                    c,
                    base.of(check_by_id(c)),
                    method.required_basis,
                    positive=True,
                    limit=MAX_FACTOR,
                    limit_reason="a ratio",
                )
                for c in REQUIRED_KEYS
            }
        )
    custom: list[LoadCombination] = []
    if "combinations" in obj:
        combos = obj["combinations"]
        if not isinstance(combos, list):
            raise InputError("combinations", f"expected a list of combinations, got {_show(combos)}")
        for i, c in enumerate(combos):
            with _scope(f"combinations[{i}]"):
                custom.append(_combination(c))
        if not custom:
            raise InputError("combinations", "is empty; leave it out to use the method's preset combinations")
    uses_sds = method.uses_sds and not custom
    if uses_sds and seismic_walls and "sds" not in obj:
        raise InputError(
            "sds",
            f"is missing; walls {', '.join(seismic_walls[:3])}{' ...' if len(seismic_walls) > 3 else ''} carry E loads, and "
            "the vertical seismic effect Ev = 0.2 S_DS D (ASCE 7-16 12.4.2.2) needs S_DS from the site's seismic data",
        )
    sds = _number(obj, "sds", non_negative=True) if "sds" in obj else 0.0  # without E loads S_DS has no effect
    if uses_sds and sds > MAX_SDS:
        raise InputError(
            "sds", f"{sds:g} makes the counteracting dead-load factor 0.6 - 0.14 S_DS negative (ASCE 7-16 2.4.5); check the value"
        )
    seismic = bool(seismic_walls) and not custom
    ev_at_soil = True
    if "ev_at_soil" in method.options:
        if "ev_at_soil" in obj:
            ev_at_soil = obj["ev_at_soil"]
            if not isinstance(ev_at_soil, bool):
                raise InputError("ev_at_soil", f"expected true or false, got {_show(ev_at_soil)}")
        elif seismic:
            _assume("ev_at_soil", "true", "Ev = 0.2 S_DS D kept in 0.6D + 0.7E at the soil (ASCE 7-16 12.4.2.2 permits zero)")
    reduction = 0.0
    if "seismic_overturning_reduction" in obj:
        reduction = _number(obj, "seismic_overturning_reduction", non_negative=True)
        if not any(abs(reduction - r) < 1e-12 for r in OVERTURNING_REDUCTIONS):
            raise InputError(
                "seismic_overturning_reduction",
                f"expected 0, 0.10 (modal response spectrum) or 0.25 (equivalent lateral force), ASCE 7-16 12.13.4; got {reduction:g}",
            )
    elif "seismic_overturning_reduction" in method.options and seismic:
        _assume("seismic_overturning_reduction", "0", "the ASCE 7-16 12.13.4 reduction is not taken")
    omega = 1.3
    if "wind_omega" in method.options:
        if "wind_omega" in obj:
            omega = _number(obj, "wind_omega", positive=True)
            if not any(abs(omega - w) < 1e-12 for w in WIND_OMEGAS):
                raise InputError(
                    "wind_omega", f"expected 1.3 (wind of ASCE 7 chapters 26 to 31) or 1.0, IBC 2021 1605.2; got {omega:g}"
                )
        else:
            _assume("wind_omega", "1.3", "IBC 2021 1605.2: omega = 1.3 for wind of ASCE 7 chapters 26 to 31")
    sdc = None
    if "seismic_design_category" in obj:
        sdc = obj["seismic_design_category"]
        if not isinstance(sdc, str) or sdc.strip().upper() not in SEISMIC_DESIGN_CATEGORIES:
            raise InputError("seismic_design_category", f"expected one of A to F (ASCE 7-16 11.6), got {_show(sdc)}")
        sdc = sdc.strip().upper()
    snow_factor = None
    if "seismic_snow_factor" in obj:
        snow_factor = _number(obj, "seismic_snow_factor", non_negative=True, limit=1.0, limit_reason="a companion snow factor")
    elif "seismic_snow_factor" in method.options and seismic and seismic_snow_walls:
        raise InputError(
            "seismic_snow_factor",
            f"is missing; walls {', '.join(seismic_snow_walls[:3])} carry E and S loads, and the snow factor of the "
            f"{method.id} seismic combination (2.4.5) is one Kernline has not confirmed: enter it as the standard prints it",
        )
    return DesignCriteria(
        method=method,
        required=required,
        sds=sds,
        bearing_increase=_bearing_increase(obj, method),
        custom_combinations=tuple(custom),
        ev_at_soil=ev_at_soil,
        seismic_overturning_reduction=reduction,
        wind_omega=omega,
        seismic_snow_factor=snow_factor,
        seismic_design_category=sdc,
    )


def _bearing_increase(obj: dict[str, Any], method: CodeBasis) -> float:
    """The factor on the allowable in combinations with W or E: 1.0 (none) or more."""
    value = _number(
        obj,
        "bearing_increase",
        method.bearing_increase,
        method.bearing_increase_basis,
        positive=True,
        limit=MAX_FACTOR,
        limit_reason="a bearing increase",
    )
    if value < 1.0:
        raise InputError(
            "bearing_increase", f"is a factor that raises the allowable with W or E: 1.0 for none or more, got {value:g}"
        )
    return value


def _concrete(raw: Any) -> ConcreteSettings:
    """The footing's concrete: f'c, fy, cover to the bottom bars, λ and the strength combinations."""
    obj = _object(raw, "")
    _keys(obj, CONCRETE_KEYS)
    strength = _choice(
        obj,
        "strength_method",
        {c.id: c for c in codes(Family.STRENGTH)},
        "asce7-16-lrfd",
        "ASCE 7-16 2.3.1 and 2.3.6 strength combinations (Kernline's default)",
    )
    lam = _number(obj, "lambda", 1.0, "normal-weight concrete (ACI 318-19 19.2.4)", positive=True)
    if lam > 1.0:
        raise InputError("lambda", f"is at most 1.0 (ACI 318-19 Table 19.2.4.2), got {lam:g}")
    return ConcreteSettings(
        fc=_quantity(obj, "fc", Kind.PRESSURE, "3000 psi", "a common f'c for footings, common practice", positive=True),
        fy=_quantity(obj, "fy", Kind.PRESSURE, "60 ksi", "Grade 60 bars (ASTM A615)", positive=True),
        cover=_quantity(
            obj, "cover", Kind.LENGTH, "3 in", "concrete cast against earth (ACI 318-19 Table 20.5.1.3.1)", positive=True
        ),
        lam=lam,
        strength_method=strength,
    )


def _reinforcement(raw: Any) -> Reinforcement | None:
    """ "plain", or {"transverse": "#5 @ 12 in", "bottom": "3 #5", "top": "2 #4"} (any part may be left
    out: Kernline designs it), or absent (None: Kernline designs all of it). ``"transverse": "plain"``
    makes a plain footing with continuous longitudinal bars (IBC 2021 1905.6.2 asks for them in
    seismic design categories C to F)."""
    if raw is None:
        return None
    if raw == "plain":
        return Reinforcement(plain=True)
    if isinstance(raw, str):
        raise InputError("", f'expected "plain" or an object of bars such as {{"transverse": "#5 @ 12 in"}}, got {_show(raw)}')
    obj = _object(raw, "")
    _keys(obj, REINFORCEMENT_KEYS)
    parts: dict[str, Any] = {}
    if obj.get("transverse") == "plain":  # plain across the width, with continuous bars along it
        parts["plain"] = True
    elif "transverse" in obj:
        with _scope("transverse"):
            parts["transverse"] = (
                parse_spaced(_text(obj, "transverse"))
                if isinstance(obj["transverse"], str)
                else _bad_bars(obj["transverse"], '"#5 @ 12 in"')
            )
    for face in ("bottom", "top"):
        if face in obj:
            with _scope(face):
                parts[face] = parse_counted(obj[face]) if isinstance(obj[face], str) else _bad_bars(obj[face], '"3 #5"')
    return Reinforcement(**parts)


def _bad_bars(value: Any, example: str) -> Any:
    raise InputError("", f"expected bars such as {example}, got {_show(value)}")


def _site(raw: Any) -> Site:
    """Site conditions: the frost depth (IBC 2021 1809.5); without it the 12 in of 1809.4 governs."""
    obj = _object(raw, "")
    _keys(obj, SITE_KEYS)
    if "frost_depth" not in obj:
        _assume("frost_depth", "none given", "only the 12 in minimum depth of IBC 2021 1809.4 is required")
        return Site()
    return Site(frost_depth=_quantity(obj, "frost_depth", Kind.LENGTH, non_negative=True))


def _soil(raw: Any, present: bool) -> SoilProperties:
    """The geotechnical report's values, or a presumptive class of IBC 2021 Table 1806.2.

    The site values have no default: a missing one is refused.
    """
    if not present:
        raise InputError(
            "",
            "is missing; give the geotechnical report's allowable_bearing, friction (or cohesion) and unit_weight, "
            "or a presumptive_class of IBC Table 1806.2",
        )
    obj = _object(raw, "")
    _keys(obj, SOIL_KEYS)
    report = _text(obj, "report")
    presumptive = None
    if "presumptive_class" in obj:
        from .presumptive import TABLE_1806_2  # only for a project that names a class

        number = obj["presumptive_class"]
        if isinstance(number, bool) or not isinstance(number, int) or number not in TABLE_1806_2:
            raise InputError("presumptive_class", f"expected a class of IBC 2021 Table 1806.2, 1 to 5, got {_show(number)}")
        presumptive = TABLE_1806_2[number]
        for key in ("allowable_bearing", "friction", "cohesion", "passive"):
            if key in obj:
                raise InputError(
                    key,
                    f"is given beside presumptive_class {number}, which sets it (IBC 2021 Table 1806.2); keep one of the two",
                )
    else:
        if "allowable_bearing" not in obj:
            raise InputError(
                "allowable_bearing",
                'is missing; enter the allowable bearing pressure from the geotechnical report, such as "2000 psf"',
            )
        if "friction" not in obj and "cohesion" not in obj:
            raise InputError(
                "friction",
                "is missing; enter the friction coefficient from the geotechnical report (or cohesion, for a cohesive soil)",
            )
    if "unit_weight" not in obj:
        raise InputError(
            "unit_weight", 'is missing; enter the soil\'s unit weight from the geotechnical report, such as "110 pcf"'
        )
    sliding_default = SlidingBasis.DEAD.value if presumptive else SlidingBasis.TOTAL.value
    sliding_basis = _choice(
        obj,
        "sliding_basis",
        {b.value: b for b in SlidingBasis},
        sliding_default,
        "IBC 2021 Table 1806.2 note a: friction on the dead load"
        if presumptive
        else "friction and the cohesion cap on the combination's whole vertical load",
    )
    common = dict(
        bearing_basis=_choice(
            obj, "bearing_basis", {b.value: b for b in BearingBasis}, "gross", "the allowable is compared with the gross pressure"
        ),
        passive_ignore=_quantity(
            obj, "passive_ignore", Kind.LENGTH, "0 in", "passive resistance taken from the ground surface", non_negative=True
        ),
        unit_weight=_quantity(obj, "unit_weight", Kind.UNIT_WEIGHT, non_negative=True),
        report=report,
        sliding_basis=sliding_basis,
    )
    if presumptive is not None:
        return SoilProperties(
            allowable_bearing=presumptive.allowable_bearing,
            friction=presumptive.friction,
            cohesion=presumptive.cohesion,
            passive=presumptive.lateral_bearing,
            presumptive_class=presumptive.number,
            **common,
        )
    return SoilProperties(
        allowable_bearing=_quantity(obj, "allowable_bearing", Kind.PRESSURE, positive=True),
        friction=_number(
            obj, "friction", 0.0, BASIS_NONE, non_negative=True, limit=MAX_FRICTION, limit_reason="a friction coefficient"
        ),
        cohesion=_quantity(obj, "cohesion", Kind.PRESSURE, "0 psf", BASIS_NONE, non_negative=True),
        passive=_quantity(obj, "passive", Kind.PRESSURE_GRADIENT, "0 pcf", BASIS_NONE, non_negative=True),
        **common,
    )


def _load(raw: Any, wall_length: float) -> LineLoad | PointLoad | LateralLoad:
    obj = _object(raw, "", required=True)
    kind = obj.get("type")
    if kind not in LOAD_KEYS:
        if "type" not in obj:
            raise InputError("type", 'is missing; expected "line", "point" or "lateral"')
        raise InputError("type", f'expected "line", "point" or "lateral", got {_show(kind)}')
    _keys(obj, LOAD_KEYS[kind])
    label = _text(obj, "label")
    if kind == "line":
        case = _case(obj)
        reverses = _reverses(obj, case, default=False)
        if "start" not in obj and "end" not in obj:
            start, end = 0.0, wall_length
            shown = f"{format_length(start, _system.get())} to {format_length(end, _system.get())}"
            _assume("", f"the wall's full length, {shown}", "a line load without start and end runs the wall's full length")
        else:
            start = _quantity(obj, "start", Kind.LENGTH, "0 ft", "the load starts at the wall's start")
            if "end" in obj:
                end = _quantity(obj, "end", Kind.LENGTH)
            else:
                end = wall_length
                _assume("end", format_length(end, _system.get()), "the load runs to the wall's end")
        if not end > start:
            if "end" in obj:
                raise InputError("end", f"must be beyond start ({_show(obj.get('start', '0 ft'))}), got {_show(obj['end'])}")
            raise InputError(
                "start",
                f'{_show(obj.get("start"))} is at or beyond the wall\'s end, where the load ends by default; give an "end"',
            )
        return LineLoad(
            case=case, value=_quantity(obj, "value", Kind.LINE_LOAD), start=start, end=end, label=label, reverses=reverses
        )
    if kind == "point":
        case = _case(obj)
        reverses = _reverses(obj, case, default=case.is_lateral_source)
        value = _quantity(obj, "value", Kind.FORCE)
        _no_upward_dead_load(case, value, obj)
        return PointLoad(case=case, value=value, at=_quantity(obj, "at", Kind.LENGTH), label=label, reverses=reverses)
    case = _case(obj, (LoadCase.W, LoadCase.E))
    return LateralLoad(
        case=case,
        value=_quantity(obj, "value", Kind.FORCE, non_negative=True),
        height=_quantity(obj, "height", Kind.LENGTH, non_negative=True),
        label=label,
    )


def _no_upward_dead_load(case: LoadCase, value: float, obj: dict[str, Any]) -> None:
    """Dead load acts downward (ASCE 7-16 3.1: the weight of construction); uplift belongs to W or E."""
    if case is LoadCase.D and value < 0.0:
        raise InputError(
            "value",
            f"a dead load cannot act upward, got {_show(obj.get('value'))}; enter uplift as a W or E load (negative value)",
        )


def _reverses(obj: dict[str, Any], case: LoadCase, default: bool) -> bool:
    if "reverses" not in obj:
        if default:
            _assume("reverses", "true", "a W or E point load moves to its mirror position when the lateral load reverses")
        return default
    value = obj["reverses"]
    if not isinstance(value, bool):
        raise InputError("reverses", f"expected true or false, got {_show(value)}")
    if value and not case.is_lateral_source:
        raise InputError("reverses", f"only W and E loads reverse with the lateral direction (this load is {case.value})")
    return value


def _wall(raw: Any, units: str) -> Wall:
    obj = _object(raw, "", required=True)
    _keys(obj, WALL_KEYS)
    wid = obj.get("id")
    if not isinstance(wid, str) or not wid.strip():
        raise InputError("id", f'expected a wall id such as "A1", got {_show(wid)}')
    length = _quantity(obj, "length", Kind.LENGTH, positive=True)
    thickness = _quantity(obj, "thickness", Kind.LENGTH, positive=True)
    with _scope("footing"):
        f = _object(obj.get("footing"), "", required=True)
        _keys(f, FOOTING_KEYS)
        footing = StripFooting(
            width=_quantity(f, "width", Kind.LENGTH, positive=True),
            thickness=_quantity(f, "thickness", Kind.LENGTH, positive=True),
            extension_start=_quantity(
                f, "extension_start", Kind.LENGTH, "0 ft", "no extension past the wall's start", non_negative=True
            ),
            extension_end=_quantity(
                f, "extension_end", Kind.LENGTH, "0 ft", "no extension past the wall's end", non_negative=True
            ),
            cover=_quantity(f, "cover", Kind.LENGTH, "0 in", "no soil over the footing", non_negative=True),
            unit_weight=_quantity(f, "unit_weight", Kind.UNIT_WEIGHT, "150 pcf", BASIS_CONCRETE, non_negative=True),
            offset=_quantity(f, "offset", Kind.LENGTH) if "offset" in f else 0.0,  # not used by the in-plane checks
        )
        if "reinforcement" in f:
            with _scope("reinforcement"):
                footing = replace(footing, reinforcement=_reinforcement(f["reinforcement"]))
    with _scope("stem"):
        s = _object(obj.get("stem"), "")
        _keys(s, STEM_KEYS)
        stem_height = _quantity(s, "height", Kind.LENGTH, "0 in", "no stem wall", non_negative=True)
        if stem_height > 0.0:
            stem_thickness = _quantity(
                s, "thickness", Kind.LENGTH, "8 in", "a common stem thickness, common practice", positive=True
            )
        else:
            stem_thickness = _quantity(s, "thickness", Kind.LENGTH, "8 in", "", positive=True) if "thickness" in s else 8.0 * INCH
        stem = Stem(height=stem_height, thickness=stem_thickness)
    supported = stem.thickness if stem.present else thickness
    if footing.width < supported:
        what = "stem" if stem.present else "wall"
        raise InputError(
            "footing.width",
            f"the footing ({format_length(footing.width, units)}) is narrower than the {what} it carries "
            f"({format_length(supported, units)}); widen the footing or correct the {what} thickness",
        )
    if "loads" not in obj:
        raise InputError("loads", "is missing; a wall needs the loads it carries")
    loads_raw = obj["loads"]
    if not isinstance(loads_raw, list):
        raise InputError("loads", f"expected a list of loads, got {_show(loads_raw)}")
    if not loads_raw:
        raise InputError("loads", "is empty; a wall needs the loads it carries")
    loads = []
    low, high = -footing.extension_start, length + footing.extension_end
    for i, item in enumerate(loads_raw):
        with _scope(f"loads[{i}]"):
            load = _load(item, length)
            if isinstance(load, LineLoad) and (load.start < low - 1e-9 or load.end > high + 1e-9):
                raise InputError("", "the line load runs past the ends of the footing")
            if isinstance(load, PointLoad) and not low - 1e-9 <= load.at <= high + 1e-9:
                raise InputError(
                    "at",
                    f"the point load is off the footing (it runs from {format_length(low, units)} to {format_length(high, units)} from the wall's start)",
                )
            if not isinstance(load, LateralLoad) and load.reverses:
                ends = (load.start, load.end) if isinstance(load, LineLoad) else (load.at, load.at)
                mirrored = [length - x for x in ends]
                if min(mirrored) < low - 1e-9 or max(mirrored) > high + 1e-9:
                    raise InputError(
                        "reverses",
                        'in direction "-" this load acts at its mirror image about the wall\'s mid-length, which is off the '
                        'footing; extend the footing at that end or set "reverses": false',
                    )
        loads.append(load)
    with _scope("sizing"):
        z = _object(obj.get("sizing"), "")
        _keys(z, SIZING_KEYS)
        grid = SIZING_KEYS[:6]
        defaults = {
            "width_min": "12 in",
            "width_max": "8 ft",
            "width_step": "1 in",
            "thickness_min": "12 in",
            "thickness_max": "4 ft",
            "thickness_step": "1 in",
        }
        if units == "SI":
            defaults = {
                "width_min": "325 mm",
                "width_max": "2400 mm",
                "width_step": "25 mm",
                "thickness_min": "300 mm",
                "thickness_max": "1200 mm",
                "thickness_step": "25 mm",
            }
        bounds = {key: _quantity(z, key, Kind.LENGTH, defaults[key], BASIS_SIZING, positive=True) for key in grid}
        if bounds["width_min"] < MIN_WIDTH - 1e-9:
            raise InputError(
                "width_min", f"{_show(z.get('width_min'))} is below the 12 in minimum width of a footing (IBC 2021 1809.4)"
            )
        if "extension_max" in z or "extension_step" in z:
            if "extension_max" not in z or "extension_step" not in z:
                missing = "extension_step" if "extension_max" in z else "extension_max"
                raise InputError(missing, "is missing; sizing the length needs both extension_max and extension_step")
            bounds["extension_max"] = _quantity(z, "extension_max", Kind.LENGTH, positive=True)
            bounds["extension_step"] = _quantity(z, "extension_step", Kind.LENGTH, positive=True)
        sizing = _sizing_bounds(bounds)
    construction = _choice(
        obj,
        "construction",
        {c.value: c for c in WallConstruction},
        WallConstruction.LIGHT_FRAME.value,
        "a light-frame wall: the moment section halfway to the wall's centre (ACI 318-19 Table 13.2.7.1, as masonry)",
    )
    if "chord_offset" in obj or construction is WallConstruction.LIGHT_FRAME:  # only a light-frame wall uses it
        chord_offset = _quantity(
            obj,
            "chord_offset",
            Kind.LENGTH,
            "3 in",
            "the chord forces 3 in inside the wall's ends, about half a doubled-stud chord (an assumption; "
            "it places the light-frame wall's overturning couple on the footing along its length)",
            non_negative=True,
        )
    else:
        chord_offset = 3.0 * INCH
    return Wall(
        id=wid,
        label=_text(obj, "label"),
        length=length,
        thickness=thickness,
        footing=footing,
        stem=stem,
        loads=tuple(loads),
        sizing=sizing,
        construction=construction,
        chord_offset=chord_offset,
    )


def _sizing_bounds(bounds: dict[str, float]) -> SizingBounds:
    """The sizing grid; when it is too large, the message names the step that makes it so."""
    try:
        return SizingBounds(**bounds)
    except InputError as err:
        if err.field != "width_step":
            raise
        counts = {
            "width_step": (bounds["width_max"] - bounds["width_min"]) / bounds["width_step"] + 1.0,
            "thickness_step": (bounds["thickness_max"] - bounds["thickness_min"]) / bounds["thickness_step"] + 1.0,
        }
        if bounds.get("extension_step"):
            counts["extension_step"] = bounds["extension_max"] / bounds["extension_step"] + 1.0
        key = max(counts, key=lambda k: counts[k])
        raise InputError(key, err.problem) from None


def _wall_cached(raw: Any, units: str) -> Wall:
    """:func:`_wall`, remembered by the wall's JSON text: the window re-parses the whole project on
    every edit, and usually only one wall has changed. Its assumptions are replayed in the scope."""
    try:
        key = json.dumps(raw, sort_keys=True, allow_nan=False)
    except (TypeError, ValueError):
        wall, found = _wall_uncached(raw, units)
    else:
        wall, found = _wall_from_text(key, units)
    for a in found:
        _assume(a.field, a.value, a.basis)
    return wall


def _wall_uncached(raw: Any, units: str) -> tuple[Wall, tuple[Assumption, ...]]:
    found: list[Assumption] = []
    t_assumed, t_path, t_system = _assumed.set(found), _path.set(()), _system.set(units)
    try:
        wall = _wall(raw, units)
    finally:
        _assumed.reset(t_assumed)
        _path.reset(t_path)
        _system.reset(t_system)
    return wall, tuple(found)


@lru_cache(maxsize=1024)
def _wall_from_text(key: str, units: str) -> tuple[Wall, tuple[Assumption, ...]]:
    return _wall_uncached(json.loads(key), units)


def _has_case(raw: Any, case: str) -> bool:
    """The raw wall carries a load of ``case`` (read before the walls are parsed)."""
    return (
        isinstance(raw, dict)
        and isinstance(raw.get("loads"), list)
        and any(isinstance(ld, dict) and ld.get("case") == case for ld in raw["loads"])
    )


def parse_project(raw: Any) -> Project:
    """Validate a project document (parsed JSON) and build the model.

    Every value taken by default is listed in ``Project.assumptions``.

    Raises:
        FormatVersionError: not a Kernline project, or written by a newer version.
        InputError: a field that cannot be used; the message names its path.
    """
    obj = _object(raw, "", required=True) if isinstance(raw, dict) else None
    if obj is None:
        raise FormatVersionError("", "this is not a Kernline project file (expected a JSON object)")
    if obj.get("format") != FORMAT:
        raise FormatVersionError(
            "format", f'this is not a Kernline project file (expected "{FORMAT}", got {_show(obj.get("format"))})'
        )
    version = obj.get("version")
    if isinstance(version, bool) or not isinstance(version, int):
        raise FormatVersionError("version", f"expected a whole number, got {_show(version)}")
    if version > VERSION:
        raise FormatVersionError(
            "version",
            f"the file is format version {_show(version)}, written by a newer Kernline; this one reads up to version {VERSION}. Update Kernline to open it.",
        )
    if version < 1:
        raise FormatVersionError("version", f"expected 1, got {_show(version)}")
    _keys(obj, TOP_KEYS)
    if "extra" in obj and not isinstance(obj["extra"], dict):
        raise InputError("extra", f"expected an object {{...}} of your own data, got {_show(obj['extra'])}")
    found: list[Assumption] = []
    t_assumed, t_path = _assumed.set(found), _path.set(())
    try:
        units = obj.get("units", "US")
        if units not in ("US", "SI"):
            raise InputError("units", f'expected "US" or "SI", got {_show(units)}')
        t_system = _system.set(units)
        try:
            if "units" not in obj:
                _assume("units", "US", "display units (results are the same in either)")
            walls_raw = obj.get("walls")
            if walls_raw is None:
                raise InputError("walls", "is missing; a project needs at least one wall")
            if not isinstance(walls_raw, list):
                raise InputError("walls", f"expected a list of walls, got {_show(walls_raw)}")
            if not walls_raw:
                raise InputError("walls", "is empty; a project needs at least one wall")
            seismic = [str(w.get("id")) for w in walls_raw if _has_case(w, "E")]
            seismic_snow = [str(w.get("id")) for w in walls_raw if _has_case(w, "E") and _has_case(w, "S")]
            with _scope("project"):
                info = _info(obj.get("project"))
            with _scope("criteria"):
                criteria = _criteria(obj.get("criteria"), seismic, seismic_snow)
            with _scope("soil"):
                soil = _soil(obj.get("soil"), "soil" in obj)
            with _scope("site"):
                site = _site(obj.get("site"))
            concrete = None
            if "concrete" in obj:
                with _scope("concrete"):
                    concrete = _concrete(obj["concrete"])

            walls = []
            for i, w in enumerate(walls_raw):
                with _scope(f"walls[{i}]"):
                    walls.append(_wall_cached(w, units))
            if concrete is None:  # without a concrete design how the wall is built is not used: nothing was assumed
                found[:] = [a for a in found if not re.search(r"^walls\[\d+\]\.(construction|chord_offset)$", a.field)]
            with _scope(""):
                return Project(
                    info=info,
                    units=units,
                    criteria=criteria,
                    soil=soil,
                    site=site,
                    walls=tuple(walls),
                    assumptions=tuple(found),
                    concrete=concrete,
                )
        finally:
            _system.reset(t_system)
    finally:
        _assumed.reset(t_assumed)
        _path.reset(t_path)


@dataclass(frozen=True, slots=True)
class ProjectDocument:
    """A project as read: the raw JSON document (the source of truth when saving) and its model."""

    raw: dict[str, Any]
    project: Project


class _JsonRefused(Exception):
    """JSON that is valid but not accepted in a project file (NaN, a 200-digit integer)."""


class _Duplicated(dict[str, Any]):
    """An object in which a key appeared twice; ``key`` is the first such key."""

    key: str = ""


def _pairs(pairs: list[tuple[str, Any]]) -> dict[str, Any]:
    out: dict[str, Any] = {}
    for key, value in pairs:
        if key in out:
            marked = _Duplicated(pairs)
            marked.key = key
            return marked
        out[key] = value
    return out


def _int(text: str) -> int:
    if len(text.lstrip("-")) > MAX_INT_DIGITS:
        raise _JsonRefused(f"has an integer of {len(text.lstrip('-'))} digits; at most {MAX_INT_DIGITS} are accepted")
    return int(text)


def _constant(name: str) -> Any:
    raise _JsonRefused(f"has {name}, which is not a number a project file may hold")


def decode_json(text: str) -> Any:
    """Decode a project's JSON text strictly: a byte-order mark is accepted; duplicate keys, NaN and
    Infinity, integers of more than 100 digits and nesting deeper than 64 levels are refused."""
    if text.startswith("\ufeff"):
        text = text[1:]
    try:
        raw = json.loads(text, object_pairs_hook=_pairs, parse_int=_int, parse_constant=_constant)
    except _JsonRefused as why:
        raise InputError("", f"the file {why}") from None
    except json.JSONDecodeError as err:
        raise InputError("", f"the file is not valid JSON (line {err.lineno}, column {err.colno}: {err.msg})") from None
    except RecursionError:
        raise InputError("", f"the file nests objects and lists deeper than {MAX_DEPTH} levels") from None
    # walk the tree once: the depth, and the path of any object with a duplicate key
    stack: list[tuple[Any, str, int]] = [(raw, "", 1)]
    while stack:
        node, path, depth = stack.pop()
        if depth > MAX_DEPTH:
            raise InputError("", f"the file nests objects and lists deeper than {MAX_DEPTH} levels")
        if isinstance(node, _Duplicated):
            raise InputError(_join((path, node.key[:40])), "appears twice in one object; keep one of them")
        if isinstance(node, dict):
            stack.extend((v, _join((path, str(k)[:40])), depth + 1) for k, v in node.items())
        elif isinstance(node, list):
            stack.extend((v, f"{path}[{i}]", depth + 1) for i, v in enumerate(node))
    return raw


def loads_project(text: str) -> ProjectDocument:
    """Parse the text of a project file."""
    raw = decode_json(text)
    return ProjectDocument(raw=raw, project=parse_project(raw))


def load_project(path: str | os.PathLike[str]) -> ProjectDocument:
    """Read and validate a project file (a FIFO, device or folder is refused without being opened)."""
    p = Path(path)
    check_input_file(p)
    try:
        data = p.read_bytes()
    except FileNotFoundError:
        raise InputError("", f"{p}: no such file") from None
    except OSError as err:
        raise InputError("", f"{p}: cannot be read ({err.strerror or err})") from None
    try:
        text = data.decode("utf-8")
    except UnicodeDecodeError as err:
        raise InputError("", f"{p}: is not UTF-8 text (byte {err.start}); save the project file as UTF-8") from None
    return loads_project(text)


def dumps_project(raw: dict[str, Any]) -> str:
    """The text written for a project document: JSON, 2-space indent, key order kept, UTF-8."""
    return json.dumps(raw, indent=2, ensure_ascii=False) + "\n"


def save_project(path: str | os.PathLike[str], raw: dict[str, Any]) -> None:
    """Write a project document atomically (temp file in the same folder, fsync, rename).

    A crash or a full disk mid-save leaves the previous file untouched.
    """
    text = dumps_project(raw)
    atomic_write_text(Path(path), text)


def with_footing_sizes(
    raw: dict[str, Any], sizes: dict[str, tuple[float, float] | dict[str, float]], units: str
) -> dict[str, Any]:
    """A copy of ``raw`` with footing dimensions of the named walls replaced.

    ``sizes`` maps a wall id to (width, thickness), or to a mapping of footing keys ("width",
    "thickness", "extension_start", "extension_end") to lengths in m. Everything else in the document
    is kept as it was. Lengths are written in the project's units (inches for US, millimetres for SI).
    """
    out = copy.deepcopy(raw)
    for wall in out.get("walls", []):
        if isinstance(wall, dict) and wall.get("id") in sizes:
            given = sizes[wall["id"]]
            values = dict(given) if isinstance(given, dict) else {"width": given[0], "thickness": given[1]}
            footing = wall.setdefault("footing", {})
            for key, value in values.items():
                footing[key] = length_text(value, units)
    return out


__all__ = [
    "EXTENSION",
    "FORMAT",
    "VERSION",
    "ProjectDocument",
    "atomic_write_text",
    "dumps_project",
    "load_project",
    "loads_project",
    "parse_project",
    "save_project",
    "with_footing_sizes",
    "Check",
]

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
from collections.abc import Iterator
from contextlib import contextmanager
from dataclasses import dataclass
from functools import lru_cache
from pathlib import Path
from typing import Any

from .combinations import MAX_SDS, default_required
from .errors import FormatVersionError, InputError
from .file_safety import atomic_write_text
from .model import (
    ALL_CHECKS,
    BearingBasis,
    Check,
    DesignCriteria,
    LateralLoad,
    LineLoad,
    LoadCase,
    LoadCombination,
    Method,
    PointLoad,
    Project,
    ProjectInfo,
    RequiredRatios,
    SizingBounds,
    SoilProperties,
    Stem,
    StripFooting,
    Wall,
)
from .units import Kind, format_length, length_text, parse_quantity

FORMAT = "kernline-project"
VERSION = 1
EXTENSION = ".kernline"

_CASES = {c.value: c for c in LoadCase}


@contextmanager
def _scope(path: str) -> Iterator[None]:
    """Prefix the field path of any InputError raised inside with ``path``."""
    try:
        yield
    except InputError as err:
        raise err.within(path) from None


def _object(raw: Any, path: str, required: bool = False) -> dict[str, Any]:
    if raw is None and not required:
        return {}
    if not isinstance(raw, dict):
        raise InputError(path, f"expected an object {{...}}, got {_show(raw)}")
    return raw


def _show(value: Any) -> str:
    text = json.dumps(value) if not isinstance(value, str) else f'"{value}"'
    return text if len(text) <= 60 else text[:57] + "..."


def _quantity(
    obj: dict[str, Any], key: str, kind: Kind, default: str | None, *, positive: bool = False, non_negative: bool = False
) -> float:
    """Parse obj[key] ("number unit") as ``kind``; missing -> default (or an error when None)."""
    if key not in obj:
        if default is None:
            raise InputError(key, f'is missing; expected {kind.info.noun} such as "{kind.info.example}"')
        text = default
    else:
        text = obj[key]
    if not isinstance(text, str):
        raise InputError(key, f'expected {kind.info.noun} such as "{kind.info.example}", got {_show(text)}')
    with _scope(key):
        value = parse_quantity(text, kind)
    if positive and not value > 0.0:
        raise InputError(key, f'must be greater than zero, got "{text}"')
    if non_negative and value < 0.0:
        raise InputError(key, f'must not be negative, got "{text}"')
    return value


def _number(obj: dict[str, Any], key: str, default: float | None, *, positive: bool = False, non_negative: bool = False) -> float:
    if key not in obj:
        if default is None:
            raise InputError(key, "is missing; expected a number")
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
        raise InputError(key, f"must be greater than zero, got {value}")
    if non_negative and value < 0.0:
        raise InputError(key, f"must not be negative, got {value}")
    return float(value)


def _text(obj: dict[str, Any], key: str, default: str = "") -> str:
    value = obj.get(key, default)
    if not isinstance(value, str):
        raise InputError(key, f"expected text, got {_show(value)}")
    return value


def _choice(obj: dict[str, Any], key: str, choices: dict[str, Any], default: str) -> Any:
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
    return ProjectInfo(**{k: _text(obj, k) for k in ("name", "number", "engineer", "client", "address", "notes")})


def _combination(raw: Any) -> LoadCombination:
    obj = _object(raw, "", required=True)
    name = _text(obj, "name")
    if not name.strip():
        raise InputError("name", 'is missing; give the combination a name such as "0.6D + 0.6W"')
    factors_raw = _object(obj.get("factors"), "factors", required=True)
    factors = []
    for key in factors_raw:
        if key not in _CASES:
            raise InputError(f"factors.{key}", f"unknown load case; expected one of {', '.join(_CASES)}")
        factors.append((_CASES[key], _number(factors_raw, key, None)))
    checks_raw = obj.get("checks", [c.value for c in ALL_CHECKS])
    if not isinstance(checks_raw, list) or not checks_raw:
        raise InputError("checks", f'expected a list such as ["overturning", "sliding", "bearing"], got {_show(checks_raw)}')
    names = {c.value: c for c in ALL_CHECKS}
    checks = set()
    for i, c in enumerate(checks_raw):
        if not isinstance(c, str) or c not in names:
            raise InputError(f"checks[{i}]", f'expected "overturning", "sliding" or "bearing", got {_show(c)}')
        checks.add(names[c])
    return LoadCombination(name=name, factors=tuple(factors), checks=frozenset(checks))


def _criteria(raw: Any) -> DesignCriteria:
    obj = _object(raw, "")
    method = _choice(obj, "method", {m.value: m for m in Method}, Method.ASCE7_16_ASD.value)
    base = default_required(method)
    with _scope("required"):
        req_obj = _object(obj.get("required"), "")
        required = RequiredRatios(**{c.value: _number(req_obj, c.value, base.of(c), positive=True) for c in ALL_CHECKS})
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
    sds = _number(obj, "sds", 0.0, non_negative=True)
    if sds > MAX_SDS:
        raise InputError(
            "sds", f"{sds:g} makes the counteracting dead-load factor 0.6 - 0.14 S_DS negative (ASCE 7-16 2.4.5); check the value"
        )
    return DesignCriteria(
        method=method,
        required=required,
        sds=sds,
        bearing_increase=_bearing_increase(obj),
        custom_combinations=tuple(custom),
    )


def _bearing_increase(obj: dict[str, Any]) -> float:
    """The factor on the allowable in combinations with W or E: 1.0 (none) or more."""
    value = _number(obj, "bearing_increase", 1.0, positive=True)
    if value < 1.0:
        raise InputError(
            "bearing_increase", f"is a factor that raises the allowable with W or E: 1.0 for none or more, got {value:g}"
        )
    return value


def _soil(raw: Any) -> SoilProperties:
    obj = _object(raw, "")
    return SoilProperties(
        allowable_bearing=_quantity(obj, "allowable_bearing", Kind.PRESSURE, "2000 psf", positive=True),
        bearing_basis=_choice(obj, "bearing_basis", {b.value: b for b in BearingBasis}, "gross"),
        friction=_number(obj, "friction", 0.35, non_negative=True),
        cohesion=_quantity(obj, "cohesion", Kind.PRESSURE, "0 psf", non_negative=True),
        passive=_quantity(obj, "passive", Kind.PRESSURE_GRADIENT, "0 pcf", non_negative=True),
        passive_ignore=_quantity(obj, "passive_ignore", Kind.LENGTH, "0 in", non_negative=True),
        unit_weight=_quantity(obj, "unit_weight", Kind.UNIT_WEIGHT, "110 pcf", non_negative=True),
    )


def _load(raw: Any, wall_length: float) -> LineLoad | PointLoad | LateralLoad:
    obj = _object(raw, "", required=True)
    kind = obj.get("type")
    label = _text(obj, "label")
    if kind == "line":
        case = _case(obj)
        reverses = _reverses(obj, case, default=False)
        start = _quantity(obj, "start", Kind.LENGTH, "0 ft")
        end = _quantity(obj, "end", Kind.LENGTH, None) if "end" in obj else wall_length
        if not end > start:
            if "end" in obj:
                raise InputError("end", f'must be beyond start ("{obj.get("start", "0 ft")}"), got "{obj["end"]}"')
            raise InputError(
                "start", f'"{obj.get("start")}" is at or beyond the wall\'s end, where the load ends by default; give an "end"'
            )
        return LineLoad(
            case=case, value=_quantity(obj, "value", Kind.LINE_LOAD, None), start=start, end=end, label=label, reverses=reverses
        )
    if kind == "point":
        case = _case(obj)
        reverses = _reverses(obj, case, default=case.is_lateral_source)
        value = _quantity(obj, "value", Kind.FORCE, None)
        _no_upward_dead_load(case, value, obj)
        return PointLoad(
            case=case,
            value=value,
            at=_quantity(obj, "at", Kind.LENGTH, None),
            label=label,
            reverses=reverses,
        )
    if kind == "lateral":
        case = _case(obj, (LoadCase.W, LoadCase.E))
        return LateralLoad(
            case=case,
            value=_quantity(obj, "value", Kind.FORCE, None, non_negative=True),
            height=_quantity(obj, "height", Kind.LENGTH, None, non_negative=True),
            label=label,
        )
    raise InputError("type", f'expected "line", "point" or "lateral", got {_show(kind)}')


def _no_upward_dead_load(case: LoadCase, value: float, obj: dict[str, Any]) -> None:
    """Dead load acts downward (ASCE 7-16 3.1: the weight of construction); uplift belongs to W or E."""
    if case is LoadCase.D and value < 0.0:
        raise InputError(
            "value", f'a dead load cannot act upward, got "{obj.get("value")}"; enter uplift as a W or E load (negative value)'
        )


def _reverses(obj: dict[str, Any], case: LoadCase, default: bool) -> bool:
    if "reverses" not in obj:
        return default
    value = obj["reverses"]
    if not isinstance(value, bool):
        raise InputError("reverses", f"expected true or false, got {_show(value)}")
    if value and not case.is_lateral_source:
        raise InputError("reverses", f"only W and E loads reverse with the lateral direction (this load is {case.value})")
    return value


def _wall(raw: Any, units: str) -> Wall:
    obj = _object(raw, "", required=True)
    wid = obj.get("id")
    if not isinstance(wid, str) or not wid.strip():
        raise InputError("id", f'expected a wall id such as "A1", got {_show(wid)}')
    length = _quantity(obj, "length", Kind.LENGTH, None, positive=True)
    thickness = _quantity(obj, "thickness", Kind.LENGTH, None, positive=True)
    with _scope("footing"):
        f = _object(obj.get("footing"), "", required=True)
        footing = StripFooting(
            width=_quantity(f, "width", Kind.LENGTH, None, positive=True),
            thickness=_quantity(f, "thickness", Kind.LENGTH, None, positive=True),
            extension_start=_quantity(f, "extension_start", Kind.LENGTH, "0 ft", non_negative=True),
            extension_end=_quantity(f, "extension_end", Kind.LENGTH, "0 ft", non_negative=True),
            cover=_quantity(f, "cover", Kind.LENGTH, "0 in", non_negative=True),
            unit_weight=_quantity(f, "unit_weight", Kind.UNIT_WEIGHT, "150 pcf", non_negative=True),
            offset=_quantity(f, "offset", Kind.LENGTH, "0 in"),
        )
    with _scope("stem"):
        s = _object(obj.get("stem"), "")
        stem = Stem(
            height=_quantity(s, "height", Kind.LENGTH, "0 in", non_negative=True),
            thickness=_quantity(s, "thickness", Kind.LENGTH, "8 in", positive=True),
        )
    supported = stem.thickness if stem.present else thickness
    if footing.width < supported:
        what = "stem" if stem.present else "wall"
        raise InputError(
            "footing.width",
            f"the footing ({format_length(footing.width, units)}) is narrower than the {what} it carries "
            f"({format_length(supported, units)}); widen the footing or correct the {what} thickness",
        )
    loads_raw = obj.get("loads", [])
    if not isinstance(loads_raw, list):
        raise InputError("loads", f"expected a list of loads, got {_show(loads_raw)}")
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
        sizing = SizingBounds(
            width_min=_quantity(z, "width_min", Kind.LENGTH, "12 in", positive=True),
            width_max=_quantity(z, "width_max", Kind.LENGTH, "8 ft", positive=True),
            width_step=_quantity(z, "width_step", Kind.LENGTH, "1 in", positive=True),
            thickness_min=_quantity(z, "thickness_min", Kind.LENGTH, "12 in", positive=True),
            thickness_max=_quantity(z, "thickness_max", Kind.LENGTH, "4 ft", positive=True),
            thickness_step=_quantity(z, "thickness_step", Kind.LENGTH, "1 in", positive=True),
        )
    return Wall(
        id=wid,
        label=_text(obj, "label"),
        length=length,
        thickness=thickness,
        footing=footing,
        stem=stem,
        loads=tuple(loads),
        sizing=sizing,
    )


def _wall_cached(raw: Any, units: str) -> Wall:
    """:func:`_wall`, remembered by the wall's JSON text: the window re-parses the whole project on
    every edit, and usually only one wall has changed."""
    try:
        key = json.dumps(raw, sort_keys=True, allow_nan=False)
    except (TypeError, ValueError):
        return _wall(raw, units)
    return _wall_from_text(key, units)


@lru_cache(maxsize=1024)
def _wall_from_text(key: str, units: str) -> Wall:
    return _wall(json.loads(key), units)


def parse_project(raw: Any) -> Project:
    """Validate a project document (parsed JSON) and build the model.

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
    units = obj.get("units", "US")
    if units not in ("US", "SI"):
        raise InputError("units", f'expected "US" or "SI", got {_show(units)}')
    with _scope("project"):
        info = _info(obj.get("project"))
    with _scope("criteria"):
        criteria = _criteria(obj.get("criteria"))
    with _scope("soil"):
        soil = _soil(obj.get("soil"))
    walls_raw = obj.get("walls")
    if walls_raw is None:
        raise InputError("walls", "is missing; a project needs at least one wall")
    if not isinstance(walls_raw, list):
        raise InputError("walls", f"expected a list of walls, got {_show(walls_raw)}")
    if not walls_raw:
        raise InputError("walls", "is empty; a project needs at least one wall")
    walls = []
    for i, w in enumerate(walls_raw):
        with _scope(f"walls[{i}]"):
            walls.append(_wall_cached(w, units))
    with _scope(""):
        return Project(info=info, units=units, criteria=criteria, soil=soil, walls=tuple(walls))


@dataclass(frozen=True, slots=True)
class ProjectDocument:
    """A project as read: the raw JSON document (the source of truth when saving) and its model."""

    raw: dict[str, Any]
    project: Project


def loads_project(text: str) -> ProjectDocument:
    """Parse the text of a project file."""
    try:
        raw = json.loads(text)
    except json.JSONDecodeError as err:
        raise InputError("", f"the file is not valid JSON (line {err.lineno}, column {err.colno}: {err.msg})") from None
    return ProjectDocument(raw=raw, project=parse_project(raw))


def load_project(path: str | os.PathLike[str]) -> ProjectDocument:
    """Read and validate a project file."""
    p = Path(path)
    try:
        text = p.read_text(encoding="utf-8")
    except FileNotFoundError:
        raise InputError("", f"{p}: no such file") from None
    except (OSError, UnicodeDecodeError) as err:
        raise InputError("", f"{p}: cannot be read ({err})") from None
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


def with_footing_sizes(raw: dict[str, Any], sizes: dict[str, tuple[float, float]], units: str) -> dict[str, Any]:
    """A copy of ``raw`` with the footing width and thickness of the named walls replaced.

    Everything else in the document is kept as it was. Sizes are written in the project's units
    (inches for US, millimetres for SI).
    """
    out = copy.deepcopy(raw)
    for wall in out.get("walls", []):
        if isinstance(wall, dict) and wall.get("id") in sizes:
            width, thickness = sizes[wall["id"]]
            footing = wall.setdefault("footing", {})
            footing["width"] = length_text(width, units)
            footing["thickness"] = length_text(thickness, units)
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

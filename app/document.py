"""The open project: raw document, parsed model, results, path, dirty flag and undo stack.

One :class:`ProjectDocument` owns all state of the window. The raw JSON dict is the source of truth
(it keeps the user's unit text and keys Kernline does not know); every edit is an undoable command
(:mod:`app.commands`) that changes the raw dict at a path and re-parses it with the engine. An edit
the engine refuses is reverted before it reaches the undo stack, so the last valid model stays in
force. Results come from :func:`engine.results.check_wall`; nothing here computes engineering.

Views render from the signals (named in the past tense) and write only through :meth:`push`.
"""

from __future__ import annotations

import copy
import json
import os
from collections.abc import Callable, Iterable
from dataclasses import dataclass
from pathlib import Path
from typing import Any

from kernline.engine.errors import InputError
from kernline.engine.input_warnings import InputWarning, input_warnings
from kernline.engine.model import Assumption, DesignCriteria, Project, Site, SoilProperties, Wall
from kernline.engine.project_file import (
    FORMAT,
    VERSION,
    atomic_write_text,
    dumps_project,
    load_project,
    parse_project,
    save_project,
)
from kernline.engine.registry import Check, CodeBasis, check_by_id, code_by_id
from kernline.engine.resources import resource_path
from kernline.engine.results import WallResult, check_wall
from kernline.engine.sizing import SizingResult
from PySide6.QtCore import QObject, Signal
from PySide6.QtGui import QUndoStack

from .recovery import new_session

PathKey = str | int
RawPath = tuple[PathKey, ...]


class _Missing:
    """Marks a key that is absent from the raw dict (so undo removes it again)."""

    _instance: _Missing | None = None

    def __new__(cls) -> _Missing:
        if cls._instance is None:
            cls._instance = super().__new__(cls)
        return cls._instance

    def __repr__(self) -> str:
        return "MISSING"


MISSING: Any = _Missing()


def path_text(path: Iterable[PathKey]) -> str:
    """("walls", 1, "footing", "width") -> "walls[1].footing.width" (the engine's field paths)."""
    out = ""
    for key in path:
        if isinstance(key, int):
            out += f"[{key}]"
        else:
            out += f".{key}" if out else key
    return out


def get_at(raw: Any, path: RawPath, default: Any = MISSING) -> Any:
    """The value at ``path`` in the raw document, or ``default`` when any step is missing."""
    node = raw
    for key in path:
        if isinstance(key, int):
            if not isinstance(node, list) or not -len(node) <= key < len(node):
                return default
            node = node[key]
        else:
            if not isinstance(node, dict) or key not in node:
                return default
            node = node[key]
    return node


# ---- templates ---------------------------------------------------------------------------------------

# Starting values of a new wall: placeholders the engineer replaces with the wall's own values. A new
# project's site values are left out (see new_project_raw).
_WALL_TEMPLATE = {
    "US": {
        "length": "10 ft",
        "thickness": "6 in",
        "footing": {
            "width": "18 in",
            "thickness": "12 in",
            "extension_start": "0 ft",
            "extension_end": "0 ft",
            "cover": "12 in",
            "unit_weight": "150 pcf",
        },
        "stem": {"height": "0 in", "thickness": "8 in"},
        "loads": [{"type": "line", "case": "D", "value": "300 plf", "label": "dead"}],
        "sizing": {
            "width_min": "12 in",
            "width_max": "8 ft",
            "width_step": "1 in",
            "thickness_min": "12 in",
            "thickness_max": "4 ft",
            "thickness_step": "1 in",
        },
    },
    "SI": {
        "length": "3 m",
        "thickness": "150 mm",
        "footing": {
            "width": "450 mm",
            "thickness": "300 mm",
            "extension_start": "0 m",
            "extension_end": "0 m",
            "cover": "300 mm",
            "unit_weight": "23.6 kN/m^3",
        },
        "stem": {"height": "0 mm", "thickness": "200 mm"},
        "loads": [{"type": "line", "case": "D", "value": "4.4 kN/m", "label": "dead"}],
        "sizing": {
            "width_min": "325 mm",  # IBC 2021 1809.4: at least 12 in (304.8 mm); the next 25 mm step
            "width_max": "2400 mm",
            "width_step": "25 mm",
            "thickness_min": "300 mm",
            "thickness_max": "1200 mm",
            "thickness_step": "25 mm",
        },
    },
}


def wall_template(wall_id: str, units: str) -> dict[str, Any]:
    """A new wall's raw dict in the project's units."""
    body = copy.deepcopy(_WALL_TEMPLATE["SI" if units == "SI" else "US"])
    return {"id": wall_id, "label": "", **body}


def new_project_raw(units: str = "US") -> dict[str, Any]:
    """The raw document of File > New: one wall, the ASCE 7-16 ASD preset, and no site values.

    The allowable bearing, the friction coefficient or cohesion, and the soil unit weight come from the
    geotechnical report, so a new project leaves them out: the window shows those fields in error and
    checks nothing until the engineer enters them (see :data:`SITE_VALUES`). S_DS is left out too; it is
    asked for once a wall carries an E load. Passive resistance starts at zero (none counted). The
    bearing increase is left to the method's default (marked as assumed), so that choosing the IBC
    alternative combinations brings their one-third increase (IBC 2021 1806.1).
    """
    soil = (
        {"bearing_basis": "gross", "passive": "0 pcf", "passive_ignore": "12 in"}
        if units != "SI"
        else {"bearing_basis": "gross", "passive": "0 kPa/m", "passive_ignore": "300 mm"}
    )
    return {
        "format": FORMAT,
        "version": VERSION,
        "project": {"name": "Untitled project", "number": "", "engineer": "", "client": "", "address": "", "notes": ""},
        "units": units,
        "criteria": {"method": "asce7-16-asd"},
        "soil": soil,
        "walls": [wall_template("W1", units)],
    }


# ---- site values -------------------------------------------------------------------------------------

# Values only the site can give. A project without them cannot be checked: the window shows the field
# in error with these words and checks nothing until the engineer enters them; it never guesses them.
# (The project-file reader refuses such a file the same way.)
SITE_VALUES: dict[RawPath, str] = {
    ("soil", "allowable_bearing"): "enter the allowable bearing pressure from the geotechnical report",
    ("soil", "friction"): "enter the friction coefficient or the cohesion (or both) from the geotechnical report",
    ("soil", "cohesion"): "enter the friction coefficient or the cohesion (or both) from the geotechnical report",
    ("soil", "unit_weight"): "enter the soil unit weight from the geotechnical report",
    ("criteria", "sds"): "enter S_DS from the site's seismic data (a wall carries E loads)",
    ("criteria", "seismic_snow_factor"): "enter the factor on S in the seismic combination as the standard prints it "
    "(a wall carries E and S loads)",
}

# Stand-ins put in the place of missing site values only so that the walls can be read and drawn
# while the soil values are still to come. They are never shown, saved or used for a result.
_STAND_INS: dict[RawPath, Any] = {
    ("soil", "allowable_bearing"): "1 psf",
    ("soil", "friction"): 0.0,
    ("soil", "unit_weight"): "0 pcf",
    ("criteria", "sds"): 0.0,
    ("criteria", "seismic_snow_factor"): 0.0,
}


def _blank(obj: Any, key: str) -> bool:
    if not isinstance(obj, dict) or key not in obj:
        return True
    value = obj[key]
    return value is None or (isinstance(value, str) and not value.strip())


def _carries(raw: dict[str, Any], *cases: str) -> bool:
    """Some wall carries loads of every one of ``cases``."""
    walls = raw.get("walls")
    if not isinstance(walls, list):
        return False
    for wall in walls:
        loads = wall.get("loads") if isinstance(wall, dict) else None
        if isinstance(loads, list) and all(
            any(isinstance(ld, dict) and ld.get("case") == case for ld in loads) for case in cases
        ):
            return True
    return False


def _method(criteria: dict[str, Any]) -> CodeBasis | None:
    """The code basis the raw criteria name (the default when none is named; None for an unknown id)."""
    try:
        return code_by_id(str(criteria.get("method", "asce7-16-asd")))
    except KeyError:
        return None  # the reader names that problem itself


def site_gaps(raw: Any) -> dict[RawPath, str]:
    """The site values the raw document lacks (absent or blank), each with the words its field shows."""
    if not isinstance(raw, dict):
        return {}
    soil = raw.get("soil", {})
    criteria = raw.get("criteria", {})
    if not isinstance(soil, dict) or not isinstance(criteria, dict):
        return {}  # the reader names that problem itself
    gaps: dict[RawPath, str] = {}
    presumptive = "presumptive_class" in soil  # a class of IBC 2021 Table 1806.2 sets the strengths
    if not presumptive and _blank(soil, "allowable_bearing"):
        gaps[("soil", "allowable_bearing")] = SITE_VALUES[("soil", "allowable_bearing")]
    if not presumptive and _blank(soil, "friction") and _blank(soil, "cohesion"):
        gaps[("soil", "friction")] = SITE_VALUES[("soil", "friction")]
        gaps[("soil", "cohesion")] = SITE_VALUES[("soil", "cohesion")]
    if _blank(soil, "unit_weight"):
        gaps[("soil", "unit_weight")] = SITE_VALUES[("soil", "unit_weight")]
    method = _method(criteria)
    preset = "combinations" not in criteria  # an own list of combinations needs neither value
    if method is not None and preset:
        if method.uses_sds and _carries(raw, "E") and _blank(criteria, "sds"):
            gaps[("criteria", "sds")] = SITE_VALUES[("criteria", "sds")]
        if "seismic_snow_factor" in method.options and _carries(raw, "E", "S") and _blank(criteria, "seismic_snow_factor"):
            gaps[("criteria", "seismic_snow_factor")] = SITE_VALUES[("criteria", "seismic_snow_factor")]
    return gaps


def parse_for_window(raw: Any) -> tuple[Project, dict[RawPath, str]]:
    """Parse the raw document; missing site values are reported, not guessed.

    Returns the model and the site gaps. With gaps, the model is read from a copy in which stand-ins
    fill the gaps, so the walls can be edited and drawn; the document then holds no results.
    Raises InputError for any other problem, as the reader does.
    """
    gaps = site_gaps(raw)
    if not gaps:
        return parse_project(raw), gaps
    filled = copy.deepcopy(raw)
    for path in gaps:
        if path in _STAND_INS:
            section = filled.setdefault(path[0], {})
            if _blank(section, path[1]):
                section[path[1]] = _STAND_INS[path]
    for key in ("cohesion",):  # a blank cohesion beside a stand-in friction is left out
        if _blank(filled["soil"], key):
            filled["soil"].pop(key, None)
    return parse_project(filled), gaps


def absolute(path: str | Path) -> Path:
    """The path made absolute (against the working folder now, so a later change of folder cannot move it)."""
    return Path(os.path.abspath(os.fspath(path)))


def unique_wall_id(raw: dict[str, Any], stem: str) -> str:
    """``stem`` if no wall uses it, else ``stem-2``, ``stem-3``, ..."""
    used = {w.get("id") for w in raw.get("walls", []) if isinstance(w, dict)}
    if stem not in used:
        return stem
    n = 2
    while f"{stem}-{n}" in used:
        n += 1
    return f"{stem}-{n}"


def next_wall_id(raw: dict[str, Any]) -> str:
    """W1, W2, ... : the first free one."""
    used = {w.get("id") for w in raw.get("walls", []) if isinstance(w, dict)}
    n = 1
    while f"W{n}" in used:
        n += 1
    return f"W{n}"


# ---- state -------------------------------------------------------------------------------------------


@dataclass(frozen=True, slots=True)
class SizingEntry:
    """A sizing result together with the inputs it was computed from (to tell when it is stale)."""

    wall: Wall
    soil: SoilProperties
    criteria: DesignCriteria
    result: SizingResult
    site: Site | None = None

    def fresh_for(self, project: Project, wall: Wall) -> bool:
        return (
            self.wall == wall
            and self.soil == project.soil
            and self.criteria == project.criteria
            and (self.site or Site()) == project.site
        )


CaseChoice = tuple[str, Check] | tuple[str, str, str]
# The drawings show the soil pressure, so they start on the governing case of the check that reads it.
PRESSURE_CHECK_ID = "bearing"
GOVERNING_BEARING: CaseChoice = ("governing", check_by_id(PRESSURE_CHECK_ID))


class ProjectDocument(QObject):
    """All state of the open project. Signals are named for what has happened."""

    project_changed = Signal()  # raw and model changed (an edit, undo, redo, open, new)
    results_changed = Signal()  # check results recomputed
    document_replaced = Signal()  # a different project was opened (views reset their edits)
    current_wall_changed = Signal(int)
    case_choice_changed = Signal()
    edit_refused = Signal(str, str)  # field path text, message
    basis_changed = Signal(str)  # a project-wide design value was edited: "Allowable is: gross → net of overburden"
    path_changed = Signal()
    dirty_changed = Signal(bool)
    sizing_changed = Signal(str)  # wall id

    def __init__(self, parent: QObject | None = None) -> None:
        super().__init__(parent)
        self.undo_stack = QUndoStack(self)
        self.undo_stack.cleanChanged.connect(self._on_clean_changed)
        self.raw: dict[str, Any] = new_project_raw()
        self.project, self.site_gaps = parse_for_window(self.raw)
        self.results: dict[str, WallResult] = {}
        self.path: Path | None = None
        self.session = new_session()
        # asked before the selection moves to another wall (the window checks for entries not applied);
        # it returns False to stay on the current wall
        self.leave_wall_guard: Callable[[int], bool] | None = None
        self.is_demo = False
        self.current_index = 0
        self.case_choice: CaseChoice = GOVERNING_BEARING
        self.sizing: dict[str, SizingEntry] = {}
        self.last_error: str | None = None
        self.last_refusal: InputError | None = None
        # the words beside each input, by its path below the wall or the project ("footing.cover": "Soil cover");
        # the forms register them so refusals name a field as the user sees it
        self.field_labels: dict[str, str] = {}
        self._recovered = False
        self._loaded_text: str | None = None
        self._recompute(None)

    # ---- replacing the whole document ----------------------------------------------------------

    def replace(
        self,
        raw: dict[str, Any],
        path: Path | None,
        *,
        project: Project | None = None,
        demo: bool = False,
        recovered: bool = False,
    ) -> None:
        """Make ``raw`` the open project (clears undo history, sizing and selection).

        ``path`` is made absolute. Missing site values are held as :attr:`site_gaps` (nothing is
        checked until they are entered); any other problem raises InputError.
        """
        gaps = site_gaps(raw)
        if project is None or gaps:
            project, gaps = parse_for_window(raw)
        self._loaded_text = None
        self.undo_stack.clear()
        self.raw = raw
        self.site_gaps = gaps
        self.session = new_session()
        self.path = absolute(path) if path is not None else None
        self.is_demo = demo
        self.current_index = 0
        self.case_choice = GOVERNING_BEARING
        self.sizing = {}
        self.last_error = None
        self.project = project
        self._recompute(None)
        self._recovered = recovered
        self.document_replaced.emit()
        self.project_changed.emit()
        self.results_changed.emit()
        self.current_wall_changed.emit(self.current_index)
        self.case_choice_changed.emit()
        self.path_changed.emit()
        self.dirty_changed.emit(self.dirty)

    def new(self, units: str = "US") -> None:
        self.replace(new_project_raw(units), None)

    def open(self, path: str | Path) -> None:
        """Open a project file. Raises InputError with a readable message when it cannot be used.

        A file that lacks only site values (the soil values of the geotechnical report, S_DS) opens
        with those fields in error, so the engineer can enter them.
        """
        try:
            doc = load_project(path)
        except InputError:
            raw = _read_json(path)
            if raw is None or not site_gaps(raw):
                raise
            self.replace(raw, Path(path))
        else:
            self.replace(doc.raw, Path(path), project=doc.project)
        try:
            self._loaded_text = Path(path).read_text(encoding="utf-8")
        except (OSError, UnicodeDecodeError):  # pragma: no cover - it was just read
            self._loaded_text = None

    def open_demo(self) -> None:
        text = resource_path("demo.kernline").read_text(encoding="utf-8")
        raw = json.loads(text)
        self.replace(raw, None, demo=True)

    def save(self, path: str | Path | None = None) -> Path:
        """Write the raw document (atomically) to ``path`` or the current path; mark it clean."""
        target = absolute(path) if path is not None else self.path
        if target is None:
            raise InputError("", "the project has no file yet; choose where to save it")
        if self._loaded_text is not None and _same_document(self._loaded_text, self.raw):
            # unchanged since it was read: write the file's own text back, formatting and all
            atomic_write_text(target, self._loaded_text)
        else:
            save_project(target, self.raw)
            self._loaded_text = dumps_project(self.raw)
        changed = target != self.path
        self.path = target
        self.is_demo = False
        was_dirty = self.dirty
        self._recovered = False
        self.undo_stack.setClean()
        if changed:
            self.path_changed.emit()
        if was_dirty:
            self.dirty_changed.emit(self.dirty)
        return target

    # ---- state read by views -------------------------------------------------------------------

    @property
    def dirty(self) -> bool:
        return self._recovered or not self.undo_stack.isClean()

    @property
    def units(self) -> str:
        return self.project.units

    @property
    def display_name(self) -> str:
        name = self.project.info.name.strip()
        if self.path is not None:
            return f"{name} ({self.path.name})" if name else self.path.name
        return (name or "Untitled project") + (" (demo)" if self.is_demo else "")

    @property
    def current_wall(self) -> Wall:
        return self.project.walls[self.current_index]

    @property
    def checkable(self) -> bool:
        """Whether every site value is there, so the walls are checked (else :attr:`results` is empty)."""
        return not self.site_gaps

    @property
    def current_result(self) -> WallResult | None:
        """The current wall's results; None while site values are missing."""
        return self.results.get(self.current_wall.id)

    def result_of(self, wall: Wall) -> WallResult | None:
        return self.results.get(wall.id)

    @property
    def assumptions(self) -> tuple[Assumption, ...]:
        """The values the engineer did not enter, which the engine took (none for a site value still missing)."""
        gaps = {path_text(p) for p in self.site_gaps}
        return tuple(a for a in self.project.assumptions if a.field not in gaps)

    def assumptions_by_field(self) -> dict[str, Assumption]:
        return {a.field: a for a in self.assumptions}

    def warnings(self) -> tuple[InputWarning, ...]:
        """The engine's warnings about inputs that are legal but usually a mistake (results' too, once checked)."""
        key = (id(self.project), id(self.results))
        if self._warnings_key != key:
            results = [self.results[w.id] for w in self.project.walls] if self.checkable else None
            gaps = {path_text(p) for p in self.site_gaps}
            self._warnings = tuple(w for w in input_warnings(self.project, results) if w.field not in gaps)
            self._warnings_key = key
        return self._warnings

    _warnings_key: tuple[int, int] | None = None
    _warnings: tuple[InputWarning, ...] = ()

    def field_words(self, field: str) -> str:
        """A field path in the words the window shows: "walls[0].footing.unit_weight" -> "N1 · Concrete unit weight"."""
        wall_index, rest = split_field(field)
        if wall_index is not None:
            walls = self.project.walls
            where = walls[wall_index].id if 0 <= wall_index < len(walls) else f"wall {wall_index + 1}"
            return f"{where} · {_rest_words(rest, self.field_labels)}" if rest else where
        return _rest_words(field, self.field_labels)

    def missing_text(self) -> str:
        """The values still to be entered and where: "Allowable bearing (Soil) and S_DS (Design criteria)"."""
        by_section: dict[str, list[str]] = {}
        labels = self.missing_labels()
        for label in labels:
            section = "Design criteria" if label in self._criteria_labels() else "Soil"
            by_section.setdefault(section, []).append(label)
        parts = [f"{', '.join(names)} ({section})" for section, names in by_section.items()]
        return " and ".join(parts)

    def _criteria_labels(self) -> set[str]:
        return {self.field_labels.get(path_text(p), path_text(p)) for p in self.site_gaps if p[0] == "criteria"}

    def missing_labels(self) -> list[str]:
        """The words beside each missing site value ("Allowable bearing", "Friction coefficient or Cohesion")."""
        labels = [self.field_labels.get(path_text(p), path_text(p)) for p in self.site_gaps]
        friction, cohesion = (self.field_labels.get(k, k) for k in ("soil.friction", "soil.cohesion"))
        if friction in labels and cohesion in labels:
            labels[labels.index(friction)] = f"{friction} or {cohesion}"
            labels.remove(cohesion)
        return labels

    def wall_path(self, *rest: PathKey) -> RawPath:
        return ("walls", self.current_index, *rest)

    def chosen_case_index(self) -> int:
        """Index into the current wall's cases of the case the drawings show (0 while nothing is checked)."""
        result = self.current_result
        if result is None:
            return 0
        choice = self.case_choice
        if choice[0] == "governing":
            g = result.governing.get(choice[1])  # type: ignore[call-overload]
            if g is not None and g.case_index is not None:
                return int(g.case_index)
        else:
            for i, case in enumerate(result.table.cases):
                if case.combination.name == choice[1] and case.direction.value == choice[2]:
                    return i
        g = result.governing.get(check_by_id(PRESSURE_CHECK_ID))
        if g is not None and g.case_index is not None:
            return int(g.case_index)
        cases = [g.case_index for g in result.governing.values() if g.case_index is not None]
        return int(cases[0]) if cases else 0

    def sizing_for(self, wall: Wall) -> tuple[SizingEntry | None, bool]:
        """The wall's last sizing result and whether it still matches the inputs."""
        entry = self.sizing.get(wall.id)
        if entry is None:
            return None, False
        return entry, entry.fresh_for(self.project, wall)

    # ---- changes that are not edits of the file ------------------------------------------------

    def set_current_index(self, index: int) -> bool:
        """Select another wall, unless :attr:`leave_wall_guard` says to stay; True when the selection is ``index``."""
        index = max(0, min(index, len(self.project.walls) - 1))
        if index != self.current_index:
            if self.leave_wall_guard is not None and not self.leave_wall_guard(index):
                return False
            self.current_index = index
            self.current_wall_changed.emit(index)
        return True

    def set_case_choice(self, choice: CaseChoice) -> None:
        if choice != self.case_choice:
            self.case_choice = choice
            self.case_choice_changed.emit()

    def set_sizing(self, entries: Iterable[SizingEntry]) -> None:
        for entry in entries:
            self.sizing[entry.wall.id] = entry
            self.sizing_changed.emit(entry.wall.id)

    # ---- edits ---------------------------------------------------------------------------------

    def push(self, command: Any, *, quiet: bool = False, announce: str | Callable[[], str] | None = None) -> str | None:
        """Apply an edit command if the engine accepts the result; return the refusal message if not.

        The command's changes are applied to the raw dict and the whole project re-parsed; when the
        engine raises InputError the changes are reverted, ``edit_refused`` is emitted and nothing
        reaches the undo stack. ``quiet`` refusals (a live attempt while the user is still typing)
        emit nothing. ``announce`` (the edit of a project-wide design value in words) is emitted with
        ``basis_changed`` once the edit is applied (a callable is asked for its words then).
        """
        command.apply_changes()
        try:
            project, gaps = parse_for_window(self.raw)
        except InputError as err:
            command.revert_changes()
            message = readable(err, self.field_labels)
            self.last_refusal = err
            if not quiet:
                self.last_error = message
                self.edit_refused.emit(path_text(command.focus_path), message)
            return message
        command.prepared = (project, gaps)
        self.last_error = None
        self.last_refusal = None
        self.undo_stack.push(command)
        if announce:
            self.basis_changed.emit(announce() if callable(announce) else announce)
        return None

    def _commit(self, parsed: tuple[Project, dict[RawPath, str]], select: int | None) -> None:
        """Called by commands: the raw dict now parses to ``parsed`` (the model and the site gaps)."""
        previous, self.project = self.project, parsed[0]
        self.site_gaps = parsed[1]
        project = self.project
        self._recompute(previous)
        if select is not None:
            self.current_index = max(0, min(select, len(project.walls) - 1))
        elif self.current_index >= len(project.walls):
            self.current_index = len(project.walls) - 1
        self.project_changed.emit()
        self.results_changed.emit()
        self.current_wall_changed.emit(self.current_index)

    def _reparse(self) -> tuple[Project, dict[RawPath, str]]:
        return parse_for_window(self.raw)

    def _recompute(self, previous: Project | None) -> None:
        """Check every wall whose inputs changed (the engine does all the engineering); none while site values are missing."""
        project = self.project
        if self.site_gaps:
            self.results = {}
            return
        old_results = self.results
        same_basis = (
            previous is not None
            and previous.soil == project.soil
            and previous.criteria == project.criteria
            and previous.site == project.site
            and previous.concrete == project.concrete
        )
        old_walls = {w.id: w for w in previous.walls} if previous is not None else {}
        results: dict[str, WallResult] = {}
        for wall in project.walls:
            old = old_walls.get(wall.id)
            if same_basis and old is not None and old == wall and wall.id in old_results:
                results[wall.id] = old_results[wall.id]
            else:
                results[wall.id] = check_wall(project, wall)
        self.results = results

    def _on_clean_changed(self, clean: bool) -> None:
        self.dirty_changed.emit(self.dirty)


def _read_json(path: str | Path) -> Any:
    try:
        return json.loads(Path(path).read_text(encoding="utf-8"))
    except (OSError, UnicodeDecodeError, ValueError):
        return None


def _same_document(text: str, raw: dict[str, Any]) -> bool:
    try:
        return json.loads(text) == raw
    except ValueError:
        return False


def split_field(field: str) -> tuple[int | None, str]:
    """ "walls[3].loads[4].reverses" -> (3, "loads[4].reverses"); a project field -> (None, field)."""
    if field.startswith("walls["):
        close = field.find("]")
        number = field[6:close]
        if close > 6 and number.isdigit():
            return int(number), field[close + 2 :]
    return None, field


def _rest_words(rest: str, labels: dict[str, str]) -> str:
    if rest in labels:
        return labels[rest]
    if rest.startswith("loads["):
        close = rest.find("]")
        row = rest[6:close]
        tail = rest[close + 2 :].replace("_", " ")
        if row.isdigit():
            return f"load row {int(row) + 1}" + (f", {tail}" if tail else "")
    if rest in _SECTIONS:
        return _SECTIONS[rest]
    return rest.replace("criteria.", "").replace(".", " ").replace("_", " ")


_SECTIONS = {
    "footing": "footing",
    "stem": "stem",
    "loads": "loads",
    "sizing": "sizing range",
    "soil": "soil",
    "criteria": "criteria",
}

_FRIENDLY = {
    "footing.width": "footing width B",
    "footing.thickness": "footing thickness t_f",
    "length": "wall length",
    "thickness": "wall thickness",
    "walls": "walls",
}


def readable(err: InputError, labels: dict[str, str] | None = None) -> str:
    """The engine's message with the field path replaced by the words a user sees beside the field.

    "walls[1].footing.cover: must not be negative" -> "Soil cover: must not be negative";
    "criteria.sds: ..." -> "S_DS: ..."; a load is named by its row: "loads[10].case" -> "load row 11, case".
    """
    field = err.field
    if field.startswith("walls["):
        close = field.find("]")
        field = field[close + 2 :] if close >= 0 else field
    labels = labels or {}
    if field in labels:
        name = labels[field]
    elif field.startswith("loads["):
        close = field.find("]")
        row = field[6:close]
        rest = field[close + 2 :].replace("_", " ")
        name = f"load row {int(row) + 1}" + (f", {rest}" if rest else "") if row.isdigit() else field
    elif field in _FRIENDLY:
        name = _FRIENDLY[field]
    else:
        words = field.replace("criteria.required.", "required ").replace("criteria.", "").replace("soil.", "soil ")
        name = words.replace(".", " ").replace("_", " ")
    return f"{name}: {err.problem}" if name else err.problem


__all__ = [
    "GOVERNING_BEARING",
    "MISSING",
    "ProjectDocument",
    "SizingEntry",
    "get_at",
    "new_project_raw",
    "next_wall_id",
    "parse_for_window",
    "site_gaps",
    "split_field",
    "path_text",
    "readable",
    "unique_wall_id",
    "wall_template",
]

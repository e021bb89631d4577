"""Undoable edits of the raw project document.

Every edit is a list of small changes to the raw JSON dict (set a value at a path, insert, remove or
move a list item). :meth:`app.document.ProjectDocument.push` applies them, lets the engine re-parse
the document and only then puts the command on the undo stack; undo reverts the changes in reverse
order and re-parses. Nothing here knows engineering: values are the text a user typed ("24 in") or
the text :func:`engine.units.length_text` writes for an adopted size.
"""

from __future__ import annotations

import copy
from collections.abc import Sequence
from typing import TYPE_CHECKING, Any

from kernline.engine.units import length_text
from PySide6.QtGui import QUndoCommand

from .document import MISSING, PathKey, RawPath, get_at, unique_wall_id, wall_template

if TYPE_CHECKING:  # pragma: no cover
    from kernline.engine.model import Project

    from .document import ProjectDocument

DELETE: Any = MISSING  # set a value to DELETE to remove its key


class Change:
    """One reversible change of the raw dict."""

    def apply(self, raw: dict[str, Any]) -> None:  # pragma: no cover - interface
        raise NotImplementedError

    def revert(self, raw: dict[str, Any]) -> None:  # pragma: no cover - interface
        raise NotImplementedError


class SetValue(Change):
    """raw[path] = value (DELETE removes the key); creates missing parent objects and removes them on revert."""

    def __init__(self, path: RawPath, value: Any) -> None:
        self.path = tuple(path)
        self.value = copy.deepcopy(value)
        self.old: Any = MISSING
        self.created: RawPath | None = None

    def apply(self, raw: dict[str, Any]) -> None:
        node: Any = raw
        self.created = None
        for depth, key in enumerate(self.path[:-1]):
            if isinstance(key, str) and isinstance(node, dict) and key not in node:
                node[key] = {}
                if self.created is None:
                    self.created = self.path[: depth + 1]
            node = node[key]
        leaf = self.path[-1]
        self.old = copy.deepcopy(node[leaf]) if _has(node, leaf) else MISSING
        if self.value is MISSING:
            if _has(node, leaf):
                del node[leaf]
        else:
            node[leaf] = copy.deepcopy(self.value)

    def revert(self, raw: dict[str, Any]) -> None:
        if self.created is not None:
            parent = get_at(raw, self.created[:-1])
            del parent[self.created[-1]]
            return
        node = get_at(raw, self.path[:-1])
        leaf = self.path[-1]
        if self.old is MISSING:
            if _has(node, leaf):
                del node[leaf]
        else:
            node[leaf] = copy.deepcopy(self.old)


class InsertItem(Change):
    """Insert ``item`` into the list at ``path`` before ``index``."""

    def __init__(self, path: RawPath, index: int, item: Any) -> None:
        self.path, self.index, self.item = tuple(path), index, copy.deepcopy(item)
        self.created = False

    def apply(self, raw: dict[str, Any]) -> None:
        items = get_at(raw, self.path)
        self.created = items is MISSING
        if self.created:
            get_at(raw, self.path[:-1])[self.path[-1]] = items = []
        items.insert(self.index, copy.deepcopy(self.item))

    def revert(self, raw: dict[str, Any]) -> None:
        items = get_at(raw, self.path)
        del items[self.index]
        if self.created:
            del get_at(raw, self.path[:-1])[self.path[-1]]


class RemoveItem(Change):
    """Remove the item at ``index`` of the list at ``path``."""

    def __init__(self, path: RawPath, index: int) -> None:
        self.path, self.index = tuple(path), index
        self.item: Any = None

    def apply(self, raw: dict[str, Any]) -> None:
        self.item = get_at(raw, self.path).pop(self.index)

    def revert(self, raw: dict[str, Any]) -> None:
        get_at(raw, self.path).insert(self.index, self.item)


class MoveItem(Change):
    """Move the item at ``source`` of the list at ``path`` to ``target``."""

    def __init__(self, path: RawPath, source: int, target: int) -> None:
        self.path, self.source, self.target = tuple(path), source, target

    def apply(self, raw: dict[str, Any]) -> None:
        items = get_at(raw, self.path)
        items.insert(self.target, items.pop(self.source))

    def revert(self, raw: dict[str, Any]) -> None:
        items = get_at(raw, self.path)
        items.insert(self.source, items.pop(self.target))


def _has(node: Any, key: PathKey) -> bool:
    if isinstance(key, int):
        return isinstance(node, list) and -len(node) <= key < len(node)
    return isinstance(node, dict) and key in node


class RawEdit(QUndoCommand):
    """An undoable list of changes. Push it with :meth:`ProjectDocument.push`, never directly.

    Args:
        document: the document whose raw dict is edited.
        text: the undo menu's words for it ("Set footing width").
        changes: applied in order, reverted in reverse order.
        focus_path: the field the edit is about (refusal messages are shown there).
        select_after, select_before: the wall index to select after redo / undo (None: keep).
    """

    def __init__(
        self,
        document: ProjectDocument,
        text: str,
        changes: Sequence[Change],
        *,
        focus_path: RawPath = (),
        select_after: int | None = None,
        select_before: int | None = None,
    ) -> None:
        super().__init__(text)
        self.document = document
        self.changes = list(changes)
        self.focus_path = tuple(focus_path)
        self.select_after = select_after
        self.select_before = select_before
        self.prepared: tuple[Project, dict[RawPath, str]] | None = None  # set by ProjectDocument.push

    def apply_changes(self) -> None:
        for change in self.changes:
            change.apply(self.document.raw)

    def revert_changes(self) -> None:
        for change in reversed(self.changes):
            change.revert(self.document.raw)

    def redo(self) -> None:
        if self.prepared is not None:  # applied and parsed by ProjectDocument.push
            parsed, self.prepared = self.prepared, None
        else:
            self.apply_changes()
            parsed = self.document._reparse()
        self.document._commit(parsed, self.select_after)

    def undo(self) -> None:
        self.revert_changes()
        self.document._commit(self.document._reparse(), self.select_before)


class SetField(RawEdit):
    """Set one field of the raw document (text such as "24 in", a number, or DELETE).

    Consecutive live edits of the same field in one typing session merge into one undo step.
    """

    MERGE_ID = 1001

    def __init__(
        self, document: ProjectDocument, path: RawPath, value: Any, *, text: str | None = None, session: int | None = None
    ) -> None:
        label = text or f"Set {_field_words(path)}"
        super().__init__(document, label, [SetValue(path, value)], focus_path=path)
        self.path = tuple(path)
        self.session = session

    def id(self) -> int:
        return self.MERGE_ID if self.session is not None else -1

    def mergeWith(self, other: QUndoCommand) -> bool:  # noqa: N802 - Qt's name
        if not isinstance(other, SetField) or other.session is None or other.session != self.session or other.path != self.path:
            return False
        mine = self.changes[0]
        theirs = other.changes[0]
        assert isinstance(mine, SetValue) and isinstance(theirs, SetValue)
        mine.value = theirs.value
        if mine.old == mine.value and mine.created is None:
            self.setObsolete(True)
        return True


def _field_words(path: RawPath) -> str:
    names = [k for k in path if isinstance(k, str) and k not in ("walls",)]
    return " ".join(n.replace("_", " ") for n in names[-2:]) or "value"


def set_fields(document: ProjectDocument, text: str, values: dict[RawPath, Any]) -> RawEdit:
    """Several fields in one undo step."""
    paths = list(values)
    return RawEdit(document, text, [SetValue(p, v) for p, v in values.items()], focus_path=paths[0] if paths else ())


# ---- walls -------------------------------------------------------------------------------------------


def add_wall(document: ProjectDocument) -> RawEdit:
    from .document import next_wall_id

    index = len(document.raw.get("walls", []))
    wall = wall_template(next_wall_id(document.raw), document.units)
    return RawEdit(
        document,
        f"Add wall {wall['id']}",
        [InsertItem(("walls",), index, wall)],
        focus_path=("walls",),
        select_after=index,
        select_before=document.current_index,
    )


def duplicate_wall(document: ProjectDocument, index: int) -> RawEdit:
    source = copy.deepcopy(document.raw["walls"][index])
    source["id"] = unique_wall_id(document.raw, str(source.get("id", "W")))
    return RawEdit(
        document,
        f"Duplicate wall as {source['id']}",
        [InsertItem(("walls",), index + 1, source)],
        focus_path=("walls",),
        select_after=index + 1,
        select_before=index,
    )


def remove_wall(document: ProjectDocument, index: int) -> RawEdit:
    wid = document.raw["walls"][index].get("id", "")
    count = len(document.raw["walls"])
    return RawEdit(
        document,
        f"Delete wall {wid}",
        [RemoveItem(("walls",), index)],
        focus_path=("walls",),
        select_after=min(index, count - 2),
        select_before=index,
    )


def rename_wall(document: ProjectDocument, index: int, new_id: str) -> RawEdit:
    old = document.raw["walls"][index].get("id", "")
    return RawEdit(
        document,
        f"Rename wall {old} to {new_id}",
        [SetValue(("walls", index, "id"), new_id)],
        focus_path=("walls", index, "id"),
        select_after=index,
        select_before=index,
    )


def move_wall(document: ProjectDocument, index: int, target: int) -> RawEdit:
    wid = document.raw["walls"][index].get("id", "")
    return RawEdit(
        document,
        f"Move wall {wid}",
        [MoveItem(("walls",), index, target)],
        focus_path=("walls",),
        select_after=target,
        select_before=index,
    )


# ---- loads -------------------------------------------------------------------------------------------


def load_template(kind: str, units: str, case: str = "D") -> dict[str, Any]:
    """A new load row of ``kind`` ("line", "point", "lateral") with zero value in the project's units."""
    us = units != "SI"
    if kind == "line":
        return {"type": "line", "case": case, "value": "0 plf" if us else "0 kN/m", "label": ""}
    if kind == "point":
        return {"type": "point", "case": case, "value": "0 kip" if us else "0 kN", "at": "0 ft" if us else "0 m", "label": ""}
    lateral_case = case if case in ("W", "E") else "W"
    return {
        "type": "lateral",
        "case": lateral_case,
        "value": "0 kip" if us else "0 kN",
        "height": "10 ft" if us else "3 m",
        "label": "",
    }


def add_load(document: ProjectDocument, wall_index: int, kind: str = "line") -> RawEdit:
    loads = document.raw["walls"][wall_index].get("loads", [])
    return RawEdit(
        document,
        "Add load",
        [InsertItem(("walls", wall_index, "loads"), len(loads), load_template(kind, document.units))],
        focus_path=("walls", wall_index, "loads"),
    )


def remove_load(document: ProjectDocument, wall_index: int, row: int) -> RawEdit:
    return RawEdit(
        document, "Delete load", [RemoveItem(("walls", wall_index, "loads"), row)], focus_path=("walls", wall_index, "loads", row)
    )


def move_load(document: ProjectDocument, wall_index: int, row: int, target: int) -> RawEdit:
    return RawEdit(
        document,
        "Move load",
        [MoveItem(("walls", wall_index, "loads"), row, target)],
        focus_path=("walls", wall_index, "loads", row),
    )


def change_load_type(document: ProjectDocument, wall_index: int, row: int, kind: str) -> RawEdit:
    """Replace a load row by a new one of another kind, keeping its case (where allowed) and label."""
    old = document.raw["walls"][wall_index]["loads"][row]
    new = load_template(kind, document.units, str(old.get("case", "D")))
    new["label"] = old.get("label", "")
    for key, value in old.items():  # keys Kernline does not know stay with the row
        if key not in ("type", "case", "value", "start", "end", "at", "height", "label", "reverses"):
            new[key] = value
    return RawEdit(
        document,
        f"Make load a {kind} load",
        [SetValue(("walls", wall_index, "loads", row), new)],
        focus_path=("walls", wall_index, "loads", row, "type"),
    )


# ---- sizes, units, combinations ----------------------------------------------------------------------


FootingValues = tuple[float, float] | dict[str, float]


def _footing_values(size: FootingValues) -> dict[str, float]:
    """(width, thickness), or footing keys to lengths (m) such as :func:`engine.sizing.sized_footing_values` gives."""
    return dict(size) if isinstance(size, dict) else {"width": size[0], "thickness": size[1]}


def adopt_size(
    document: ProjectDocument, wall_index: int, width: float, thickness: float, extensions: dict[str, float] | None = None
) -> RawEdit:
    """Write a footing size (m) into the wall as the text a project file stores ("30 in", "750 mm").

    ``extensions`` (footing keys "extension_start" / "extension_end" to m) are written too when sizing
    chose the footing's length.
    """
    units = document.units
    wid = document.raw["walls"][wall_index].get("id", "")
    base = ("walls", wall_index, "footing")
    values = {"width": width, "thickness": thickness, **(extensions or {})}
    text = f"Adopt footing B {length_text(width, units)} x t_f {length_text(thickness, units)}"
    if extensions:
        text += " with longer extensions"
    return RawEdit(
        document,
        f"{text} for {wid}",
        [SetValue((*base, key), length_text(value, units)) for key, value in values.items()],
        focus_path=(*base, "width"),
        select_after=wall_index,
        select_before=document.current_index,
    )


def adopt_sizes(document: ProjectDocument, sizes: dict[str, FootingValues], text: str | None = None) -> RawEdit:
    """Adopt the chosen sizes of several walls (by id) as one undo step (``text`` names it in Edit > Undo)."""
    units = document.units
    changes: list[Change] = []
    count = 0
    for i, wall in enumerate(document.raw.get("walls", [])):
        if wall.get("id") in sizes:
            count += 1
            for key, value in _footing_values(sizes[wall["id"]]).items():
                changes.append(SetValue(("walls", i, "footing", key), length_text(value, units)))
    words = text or f"Adopt sized footings ({count} wall{'' if count == 1 else 's'})"
    return RawEdit(document, words, changes, focus_path=("walls",))


def set_units(document: ProjectDocument, units: str) -> RawEdit:
    return RawEdit(document, f"Show {units} units", [SetValue(("units",), units)], focus_path=("units",))


def change_method(document: ProjectDocument, method_id: str) -> tuple[RawEdit, list[str]]:
    """Choose another code basis; the options the new one does not take are removed in the same step.

    The reader refuses a criteria option the chosen method does not take (``ev_at_soil`` under the IBC
    alternative combinations, say), so the window never leaves one behind. Returns the command and the
    keys it removes.
    """
    from kernline.engine.project_file import OPTION_KEYS
    from kernline.engine.registry import code_by_id

    code = code_by_id(method_id)
    criteria = document.raw.get("criteria")
    present = criteria if isinstance(criteria, dict) else {}
    removed = [key for key in OPTION_KEYS if key in present and key not in code.options]
    changes: list[Change] = [SetValue(("criteria", "method"), method_id)]
    changes += [SetValue(("criteria", key), DELETE) for key in removed]
    return RawEdit(document, f"Set method to {method_id}", changes, focus_path=("criteria", "method")), removed


# The soil values a presumptive class of IBC 2021 Table 1806.2 sets (the reader refuses them beside it).
PRESUMPTIVE_KEYS = ("allowable_bearing", "friction", "cohesion", "passive")


def set_presumptive_class(document: ProjectDocument, number: int | None) -> RawEdit:
    """Take the soil values from class ``number`` of IBC 2021 Table 1806.2 (None: from the report).

    Choosing a class removes the values it sets, in the same undo step; going back to the report
    leaves them to be entered (Kernline does not guess site values).
    """
    soil = document.raw.get("soil")
    present = soil if isinstance(soil, dict) else {}
    changes: list[Change] = [SetValue(("soil", "presumptive_class"), DELETE if number is None else number)]
    if number is not None:
        changes += [SetValue(("soil", key), DELETE) for key in PRESUMPTIVE_KEYS if key in present]
    text = (
        "Take soil values from the geotechnical report" if number is None else f"Take soil values from presumptive class {number}"
    )
    return RawEdit(document, text, changes, focus_path=("soil", "presumptive_class"))


def use_custom_combinations(document: ProjectDocument, combinations: list[dict[str, Any]] | None) -> RawEdit:
    """Replace the method's preset by our own list (None: back to the preset)."""
    value = DELETE if combinations is None else combinations
    text = "Use the preset combinations" if combinations is None else "Use custom combinations"
    return RawEdit(document, text, [SetValue(("criteria", "combinations"), value)], focus_path=("criteria", "combinations"))

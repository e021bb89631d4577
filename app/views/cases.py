"""Every combination and direction of the selected wall in a sortable table (engine numbers, formatted).

With a concrete section the footing's strength combinations follow the service ones, marked
"strength": their loads on the soil, and the flexure and one-way shear of the footing, which are judged
at the most loaded strength case, shown on that case's row with the transverse bars
("0.27 ✗ · #5 @ 12 in entered"). A ratio that is no number is said in words: "no demand", "no
equilibrium"; "—" where a check does not apply to the row's combination.
"""

from __future__ import annotations

import math
from typing import Any

from kernline.engine.results import Governing, WallResult
from kernline.engine.schedule import ENTERED, bars_in_units, transverse_entered
from kernline.engine.summary import NO_DEMAND, state_words
from kernline.engine.units import Kind
from PySide6.QtCore import QModelIndex, QSortFilterProxyModel, Qt, Signal
from PySide6.QtGui import QBrush, QColor, QStandardItem, QStandardItemModel
from PySide6.QtWidgets import QAbstractItemView, QHeaderView, QTableView, QWidget

from ..style import NG_MARK, OK_MARK, WARM
from .fields import FORCE, LONG, PRESSURE, trim, unit_factor

SORT_ROLE = Qt.ItemDataRole.UserRole + 1
FIRST_CHECK_COLUMN = 6  # after combination, direction, N, V, e and q max
CASE_ROLE = Qt.ItemDataRole.UserRole + 2
STRENGTH_WORD = "strength"  # after a strength combination's name: its row is the footing's own design


class CasesModel(QStandardItemModel):
    """Rows: the wall's cases; columns: loads on the soil and the ratio of each check evaluated per case
    (the registered checks of the results, in their order; a geometric check such as embedment has
    one value for the wall, shown in the verdict, not a column).

    A QStandardItemModel keeps the cell data on the C++ side, so painting the table does not call
    back into Python for every cell and role; an update touches only the cells whose text changed.
    """

    def set_result(self, result: WallResult, units: str) -> bool:
        """Show ``result``; True when the table's shape changed."""
        us = units != "SI"
        f_force = unit_factor(FORCE[0] if us else FORCE[1], Kind.FORCE)
        f_len = unit_factor(LONG[0] if us else LONG[1], Kind.LENGTH)
        q_unit = PRESSURE[0] if us else PRESSURE[1]
        f_q = unit_factor(q_unit, Kind.PRESSURE)
        per_case = [c for c in result.table.checks if c.per_case]
        strength_table, strength_ev = result.strength_table, result.strength_evaluation
        strength = list(strength_table.checks) if strength_table is not None and strength_ev is not None else []
        headers = [
            "Combination",
            "Dir.",
            f"N ({FORCE[0] if us else FORCE[1]})",
            f"V ({FORCE[0] if us else FORCE[1]})",
            f"e ({LONG[0] if us else LONG[1]})",
            f"q max ({q_unit})",
            *[c.title for c in per_case],
            *[c.title for c in strength],
            "Result",
        ]
        ev = result.evaluation
        rows = []
        for i, case in enumerate(result.cases):
            e = float(ev.eccentricity[i])
            bearing = case.bearing
            q_max = bearing.q_max if bearing is not None else math.nan
            texts = [
                case.combination,
                case.direction,
                trim(case.vertical / f_force, 2),
                trim(case.lateral / f_force, 2),
                trim(e / f_len, 3) if math.isfinite(e) else "∞",
                (trim(q_max / f_q, 0 if us else 1) if math.isfinite(q_max) else ("∞" if bearing is not None else "—")),
            ]
            keys: list[Any] = [
                case.combination,
                case.direction,
                case.vertical,
                case.lateral,
                e if math.isfinite(e) else math.inf,
                q_max if not math.isnan(q_max) else -1.0,
            ]
            ok = True
            for check in per_case:
                r = case.of(check)
                if r is None:
                    texts.append("—")
                    keys.append(math.inf)
                    continue
                ok = ok and r.passes
                mark = OK_MARK if r.passes else NG_MARK
                if math.isinf(r.ratio):
                    texts.append(NO_DEMAND)
                elif not getattr(r, "stable", True):  # the resultant beyond the footing's end
                    texts.append(f"no equilibrium {mark}")
                else:
                    texts.append(f"{r.ratio:.2f} {mark}")
                keys.append(r.ratio / r.required)
            for _check in strength:  # the strength checks use the strength combinations, not this one
                texts.append("—")
                keys.append(math.inf)
            texts.append("OK" if ok else "NG")
            keys.append(int(ok))
            rows.append((texts, keys, ok, i))
        if strength_table is not None and strength_ev is not None:
            wall_bars = _bars_of(result, units)
            governing = {c: result.governing[c] for c in strength if c in result.governing}
            s_ecc = strength_ev.eccentricity.tolist()
            s_vertical = strength_ev.vertical.tolist()
            s_q = strength_ev.statics.q_max.tolist()
            s_shear = strength_table.shear.tolist()
            for i, case in enumerate(strength_table.cases):
                name, direction = case.combination.name, case.direction.value
                e, q = float(s_ecc[i]), float(s_q[i])
                texts = [
                    f"{name} · {STRENGTH_WORD}",
                    direction,
                    trim(s_vertical[i] / f_force, 2),
                    trim(s_shear[i] / f_force, 2),
                    trim(e / f_len, 3) if math.isfinite(e) else "∞",
                    trim(q / f_q, 0 if us else 1) if math.isfinite(q) else "∞",
                ]
                keys = [
                    name,
                    direction,
                    s_vertical[i],
                    s_shear[i],
                    e if math.isfinite(e) else math.inf,
                    q if math.isfinite(q) else math.inf,
                ]
                for _check in per_case:  # the stability checks use the service combinations
                    texts.append("—")
                    keys.append(math.inf)
                marks = []
                for check in strength:
                    g = governing.get(check)
                    if g is None or (g.combination, g.direction or "none") != (name, direction):
                        texts.append("")  # judged at the most loaded strength case, on that case's row
                        keys.append(math.inf)
                        continue
                    texts.append(_strength_text(g, result, wall_bars))
                    keys.append(g.ratio / g.required)
                    marks.append(g.passes)
                ok = all(marks)
                texts.append(("OK" if ok else "NG") if marks else "—")
                keys.append(int(ok) if marks else 2)
                rows.append((texts, keys, ok or not marks, None))
        reshaped = (
            self.rowCount() != len(rows)
            or [self.headerData(c, Qt.Orientation.Horizontal) for c in range(self.columnCount())] != headers
        )
        if reshaped:
            self.clear()
            self.setColumnCount(len(headers))
            self.setHorizontalHeaderLabels(headers)
            for k, check in enumerate(per_case):
                self.horizontalHeaderItem(FIRST_CHECK_COLUMN + k).setToolTip(
                    f"{check.title}: {check.ratio_words} for this case, with ✓ where it meets the required ratio; "
                    "— where the check does not apply."
                )
            self.setRowCount(len(rows))
        # one dataChanged for the whole update instead of one per cell (the proxy re-sorts once)
        self.blockSignals(True)
        try:
            for r, (texts, keys, ok, case_index) in enumerate(rows):
                for c, text in enumerate(texts):
                    item = self.item(r, c)
                    if item is None:
                        item = QStandardItem()
                        item.setEditable(False)
                        item.setData(case_index, CASE_ROLE)
                        if c >= 2:
                            item.setTextAlignment(Qt.AlignmentFlag.AlignRight | Qt.AlignmentFlag.AlignVCenter)
                        self.setItem(r, c, item)
                    if item.data(CASE_ROLE) != case_index:  # a service case's index; None on a strength row
                        item.setData(case_index, CASE_ROLE)
                    if item.text() != text:
                        item.setText(text)
                        item.setData(keys[c], SORT_ROLE)
                        if c == len(texts) - 1:
                            item.setForeground(QColor(WARM) if not ok else QBrush())
        finally:
            self.blockSignals(False)
        if rows:
            self.dataChanged.emit(self.index(0, 0), self.index(len(rows) - 1, len(headers) - 1))
        return reshaped


def _bars_of(result: WallResult, units: str) -> str:
    """The flexure record's transverse bars and where they came from, "#5 @ 12 in (entered)" ("" without)."""
    flexure = next((g.record for c, g in result.governing.items() if c.id == "flexure"), None)
    bars = getattr(flexure, "bars", "") or ""
    table = result.strength_table
    if not bars or table is None:
        return ""
    return f"{bars_in_units(bars, units)} ({ENTERED if transverse_entered(table.wall) else 'designed'})"


def _strength_text(g: Governing, result: WallResult, bars: str) -> str:
    """ "0.27 ✗ · #5 @ 12 in" for flexure; "1.45 ✓" for one-way shear; "no demand" where there is none."""
    words = state_words(g, result)
    if words:
        return words
    text = f"{g.ratio:.2f} {OK_MARK if g.passes else NG_MARK}"
    if g.check.id == "flexure" and bars:
        text += f" · {bars}"
    return text


class CasesTable(QTableView):
    """Sortable table of all cases; activating a row asks to show that case in the drawings."""

    case_activated = Signal(int)  # index into the wall's cases

    def __init__(self, parent: QWidget | None = None) -> None:
        super().__init__(parent)
        self.setObjectName("casesTable")
        self.cases_model = CasesModel(self)
        self.proxy = QSortFilterProxyModel(self)
        self.proxy.setSourceModel(self.cases_model)
        self.proxy.setSortRole(SORT_ROLE)
        self.setModel(self.proxy)
        self.setSortingEnabled(True)
        self.sortByColumn(-1, Qt.SortOrder.AscendingOrder)
        self.setSelectionBehavior(QAbstractItemView.SelectionBehavior.SelectRows)
        self.setSelectionMode(QAbstractItemView.SelectionMode.SingleSelection)
        self.setEditTriggers(QAbstractItemView.EditTrigger.NoEditTriggers)
        self.verticalHeader().hide()
        self.verticalHeader().setDefaultSectionSize(20)
        self.horizontalHeader().setSectionResizeMode(QHeaderView.ResizeMode.Interactive)
        self.horizontalHeader().setStretchLastSection(True)
        self.activated.connect(self._on_activated)
        self.doubleClicked.connect(self._on_activated)

    def set_result(self, result: WallResult | None, units: str) -> None:
        """Show ``result``; None (nothing checked yet) empties the table."""
        if result is None:
            self.cases_model.clear()
            return
        if self.cases_model.set_result(result, units):
            self.resizeColumnsToContents()  # measured once per shape, not per edit

    def _on_activated(self, index: QModelIndex) -> None:
        case_index = index.data(CASE_ROLE)
        if case_index is not None:
            self.case_activated.emit(int(case_index))

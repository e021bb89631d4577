"""The drawings panel: the elevation above the soil pressure, on one x scale, with the case picker."""

from __future__ import annotations

from kernline.engine.model import LateralLoad, Wall
from kernline.engine.units import Kind, format_length
from PySide6.QtCore import QRect, Qt
from PySide6.QtWidgets import QHBoxLayout, QLabel, QSizePolicy, QSplitter, QVBoxLayout, QWidget

from ..document import ProjectDocument
from .elevation import ElevationView
from .fields import FORCE, trim, unit_factor
from .pressure import CasePicker, PressurePlot


def lateral_note(wall: Wall, direction: str) -> str:
    """What the elevation's lateral arrows show: the direction drawn, and the mirrored reversing loads."""
    if not any(isinstance(ld, LateralLoad) for ld in wall.loads):
        return "no lateral load"
    shown = "−" if direction == "-" else "+"
    note = f"lateral arrows: direction {shown}"
    if direction == "-" and any(getattr(ld, "reverses", False) for ld in wall.loads):
        note += "; reversing W/E loads are drawn at their mirrored positions for direction −"
    return note


CAPTION_LINES = 2  # a caption wraps to at most this many lines at the narrowest panel


class Caption(QLabel):
    """A hint that wraps to the panel's width; it never sets the window's minimum width.

    Its height is the lines its text takes at the panel's width (one or :data:`CAPTION_LINES`), so a
    caption that fits on one line leaves the second line's height to the drawing. The height changes
    only when the number of lines does, not on every edit.
    """

    def __init__(self) -> None:
        super().__init__()
        self.setObjectName("hint")
        self.setWordWrap(True)
        self.setSizePolicy(QSizePolicy.Policy.Ignored, QSizePolicy.Policy.Fixed)
        self.setAlignment(Qt.AlignmentFlag.AlignLeft | Qt.AlignmentFlag.AlignTop)
        self.setContentsMargins(6, 0, 6, 0)
        self.lines = 0
        self._fit()

    def setText(self, text: str) -> None:  # noqa: N802 - Qt's name
        if text != self.text():
            super().setText(text)
            self._fit()

    def resizeEvent(self, event) -> None:  # noqa: N802 - Qt's name
        super().resizeEvent(event)
        self._fit()

    def _fit(self) -> None:
        metrics = self.fontMetrics()
        margins = self.contentsMargins()
        width = max(1, self.width() - margins.left() - margins.right())
        needed = metrics.boundingRect(QRect(0, 0, width, 10_000), int(Qt.TextFlag.TextWordWrap), self.text()).height()
        lines = max(1, min(CAPTION_LINES, -(-needed // metrics.lineSpacing())))
        if lines != self.lines:
            self.lines = lines
            self.setFixedHeight(metrics.lineSpacing() * lines + 2)


def _caption() -> Caption:
    return Caption()


class DrawingsPanel(QWidget):
    """Elevation, picker and pressure plot; renders the document's current wall and chosen case."""

    def __init__(self, document: ProjectDocument, parent: QWidget | None = None) -> None:
        super().__init__(parent)
        self.document = document
        self.elevation_caption = _caption()
        self.elevation = ElevationView()
        self.pressure = PressurePlot()
        self.pressure.setXLink(self.elevation)
        self.picker = CasePicker()
        self.caption = _caption()
        title = QLabel("Soil pressure for")
        title.setObjectName("sectionTitle")
        head = QHBoxLayout()
        head.setContentsMargins(6, 0, 6, 0)
        head.addWidget(title)
        head.addWidget(self.picker, 1)
        lower = QWidget()
        lower_layout = QVBoxLayout(lower)
        lower_layout.setContentsMargins(0, 0, 0, 0)
        lower_layout.setSpacing(2)
        lower_layout.addLayout(head)
        lower_layout.addWidget(self.caption)
        lower_layout.addWidget(self.pressure, 1)
        upper = QWidget()
        upper_layout = QVBoxLayout(upper)
        upper_layout.setContentsMargins(0, 0, 0, 0)
        upper_layout.setSpacing(2)
        elevation_title = QLabel("Elevation, to scale")
        elevation_title.setObjectName("sectionTitle")
        head_up = QHBoxLayout()
        head_up.setContentsMargins(6, 4, 6, 0)
        head_up.addWidget(elevation_title)
        head_up.addStretch(1)
        upper_layout.addLayout(head_up)
        upper_layout.addWidget(self.elevation_caption)
        upper_layout.addWidget(self.elevation, 1)
        splitter = QSplitter(Qt.Orientation.Vertical, self)
        splitter.addWidget(upper)
        splitter.addWidget(lower)
        splitter.setStretchFactor(0, 3)
        splitter.setStretchFactor(1, 2)
        splitter.setChildrenCollapsible(False)
        layout = QVBoxLayout(self)
        layout.setContentsMargins(0, 0, 0, 0)
        layout.addWidget(splitter)
        self.picker.activated.connect(self._on_picked)

    def _on_picked(self, _index: int) -> None:
        choice = self.picker.choice()
        if choice is not None:
            self.document.set_case_choice(choice)

    def render(self) -> None:  # type: ignore[override]
        doc = self.document
        wall = doc.current_wall
        result = doc.current_result
        index = doc.chosen_case_index()
        direction = result.table.cases[index].direction.value if result is not None else "+"
        if result is not None:
            self.picker.fill(result, doc.case_choice)
        else:
            self.picker.clear()
        self.picker.setEnabled(result is not None)
        self.elevation.render(wall, doc.units, direction)
        units = doc.units
        ft = wall.footing
        grade = f"; soil cover {format_length(ft.cover, units)} to grade" if ft.cover > 0 else ""
        weight = ""
        if result is not None:
            force_unit = FORCE[1] if units == "SI" else FORCE[0]
            weight = f"; W_f {trim(result.self_weight.footing / unit_factor(force_unit, Kind.FORCE), 2)} {force_unit}"
        self.elevation_caption.setText(
            f"footing L_f {format_length(wall.footing_length, units)} × B {format_length(ft.width, units)} × "
            f"t_f {format_length(ft.thickness, units)}{grade}{weight}; {lateral_note(wall, direction)}"
        )
        if result is None:
            self.pressure.render_unchecked(wall, doc.units, doc.missing_text())
            self.caption.setText("No soil pressure until the missing values are entered.")
            return
        self.pressure.render(wall, result, index, doc.units)
        self.caption.setText(PressurePlot.caption(result, index, doc.units))

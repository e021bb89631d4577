"""The drawings panel: the elevation above the soil pressure, on one x scale, with the case picker."""

from __future__ import annotations

from PySide6.QtCore import Qt
from PySide6.QtWidgets import QHBoxLayout, QLabel, QSizePolicy, QSplitter, QVBoxLayout, QWidget

from engine.model import LateralLoad, Wall
from engine.units import format_length

from ..document import ProjectDocument
from .elevation import ElevationView
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


def _caption() -> QLabel:
    """A hint that wraps to the panel's width; it never sets the window's minimum width or height."""
    label = QLabel()
    label.setObjectName("hint")
    label.setWordWrap(True)
    label.setSizePolicy(QSizePolicy.Policy.Ignored, QSizePolicy.Policy.Fixed)
    label.setFixedHeight(label.fontMetrics().lineSpacing() * CAPTION_LINES + 2)
    label.setAlignment(Qt.AlignmentFlag.AlignLeft | Qt.AlignmentFlag.AlignTop)
    label.setContentsMargins(6, 0, 6, 0)
    return label


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
        grade = f"; grade {format_length(ft.cover, units)} above its top" if ft.cover > 0 else ""
        self.elevation_caption.setText(
            f"footing L {format_length(wall.footing_length, units)} × B {format_length(ft.width, units)} × "
            f"D {format_length(ft.thickness, units)}{grade}; {lateral_note(wall, direction)}"
        )
        if result is None:
            self.pressure.render_unchecked(wall, doc.units, doc.missing_labels())
            self.caption.setText("No soil pressure until the soil values are entered.")
            return
        self.pressure.render(wall, result, index, doc.units)
        self.caption.setText(PressurePlot.caption(result, index, doc.units))

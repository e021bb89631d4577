"""The drawings panel: the elevation above the soil pressure or the footing's concrete design, all on
one x scale, with the case picker."""

from __future__ import annotations

from kernline.engine.model import LateralLoad, Wall
from kernline.engine.results import WallResult
from kernline.engine.units import Kind, format_length
from PySide6.QtCore import Qt
from PySide6.QtWidgets import QHBoxLayout, QLabel, QSplitter, QStackedWidget, QTabBar, QVBoxLayout, QWidget

from ..document import ProjectDocument
from .concrete import ConcreteView
from .elevation import CAPTION_LINES, Caption, ElevationView
from .fields import FORCE, trim, unit_factor
from .pressure import CasePicker, PressurePlot

__all__ = ["CAPTION_LINES", "Caption", "DrawingsPanel", "governing_direction", "lateral_note"]

PRESSURE_PAGE, CONCRETE_PAGE = 0, 1
# share of the panel's height the elevation keeps above each page (the concrete page has more to show)
ELEVATION_SHARE = {PRESSURE_PAGE: 0.58, CONCRETE_PAGE: 0.36}


def lateral_note(wall: Wall, direction: str) -> str:
    """What the elevation's lateral arrows show: the direction drawn, and the mirrored reversing loads."""
    if not any(isinstance(ld, LateralLoad) for ld in wall.loads):
        return "no lateral load"
    shown = "−" if direction == "-" else "+"
    note = f"lateral arrows: direction {shown}"
    if direction == "-" and any(getattr(ld, "reverses", False) for ld in wall.loads):
        note += "; reversing W/E loads are drawn at their mirrored positions for direction −"
    return note


def governing_direction(result: WallResult | None) -> str:
    """The lateral direction ("+" or "-") of the case that governs the wall: of the checks whose governing
    case has a direction, the one with the lowest ratio / required ("" when no case has a direction)."""
    if result is None:
        return ""
    directed = [g for g in result.governing.values() if g.case_index is not None and g.direction in ("+", "-")]
    if not directed:
        return ""
    return min(directed, key=lambda g: g.normalized).direction


def _caption() -> Caption:
    return Caption()


class DrawingsPanel(QWidget):
    """Elevation above a choice of soil pressure (with the case picker) or the footing's concrete design;
    renders the document's current wall and chosen case."""

    def __init__(self, document: ProjectDocument, parent: QWidget | None = None) -> None:
        super().__init__(parent)
        self.document = document
        self.elevation_caption = _caption()
        self.elevation = ElevationView()
        self.pressure = PressurePlot()
        self.pressure.setXLink(self.elevation)
        self.concrete = ConcreteView()
        self.concrete.link_x(self.elevation)
        self.picker = CasePicker()
        self.caption = _caption()
        self.page_bar = QTabBar()
        self.page_bar.setObjectName("drawingsPages")
        self.page_bar.setDrawBase(False)
        self.page_bar.setExpanding(False)
        self.page_bar.addTab("Soil pressure")
        self.page_bar.addTab("Concrete")
        self.page_bar.setTabToolTip(PRESSURE_PAGE, "The soil pressure under the footing for the case picked beside")
        self.page_bar.setTabToolTip(
            CONCRETE_PAGE, "The footing's concrete design (ACI 318-19): its section and bars, shear and moment along it"
        )
        self.picker_title = QLabel("for")
        head = QHBoxLayout()
        head.setContentsMargins(6, 0, 6, 0)
        head.addWidget(self.page_bar)
        head.addWidget(self.picker_title)
        head.addWidget(self.picker, 1)
        pressure_page = QWidget()
        pressure_layout = QVBoxLayout(pressure_page)
        pressure_layout.setContentsMargins(0, 0, 0, 0)
        pressure_layout.setSpacing(2)
        pressure_layout.addWidget(self.caption)
        pressure_layout.addWidget(self.pressure, 1)
        self.pages = QStackedWidget()
        self.pages.addWidget(pressure_page)
        self.pages.addWidget(self.concrete)
        lower = QWidget()
        lower_layout = QVBoxLayout(lower)
        lower_layout.setContentsMargins(0, 0, 0, 0)
        lower_layout.setSpacing(2)
        lower_layout.addLayout(head)
        lower_layout.addWidget(self.pages, 1)
        upper = QWidget()
        upper_layout = QVBoxLayout(upper)
        upper_layout.setContentsMargins(0, 0, 0, 0)
        upper_layout.setSpacing(2)
        self.elevation_title = QLabel("Elevation, to scale")
        self.elevation_title.setObjectName("sectionTitle")
        head_up = QHBoxLayout()
        head_up.setContentsMargins(6, 4, 6, 0)
        head_up.addWidget(self.elevation_title)
        head_up.addStretch(1)
        upper_layout.addLayout(head_up)
        upper_layout.addWidget(self.elevation_caption)
        upper_layout.addWidget(self.elevation, 1)
        self.splitter = QSplitter(Qt.Orientation.Vertical, self)
        self.splitter.addWidget(upper)
        self.splitter.addWidget(lower)
        self.splitter.setStretchFactor(0, 3)
        self.splitter.setStretchFactor(1, 2)
        self.splitter.setChildrenCollapsible(False)
        # in a short window the design map, while its tab is shown, takes this pane's place (see show_map)
        self.map_title = QLabel("Design map — here while its tab is open (the drawings come back when you leave it)")
        self.map_title.setObjectName("sectionTitle")
        self.map_title.setWordWrap(True)
        self.map_page = QWidget()
        self.map_page.setObjectName("drawingsMapPage")
        self.map_layout = QVBoxLayout(self.map_page)
        self.map_layout.setContentsMargins(6, 4, 6, 0)
        self.map_layout.setSpacing(2)
        self.map_layout.addWidget(self.map_title)
        self.stack = QStackedWidget(self)
        self.stack.addWidget(self.splitter)
        self.stack.addWidget(self.map_page)
        layout = QVBoxLayout(self)
        layout.setContentsMargins(0, 0, 0, 0)
        layout.addWidget(self.stack)
        self.picker.activated.connect(self._on_picked)
        self.page_bar.currentChanged.connect(self._on_page_changed)
        self.elevation.scale_changed.connect(self._on_scale_changed)

    @property
    def showing_map(self) -> bool:
        return self.stack.currentWidget() is self.map_page

    def show_map(self, shown: bool) -> None:
        """Show the design map's page (its plot placed in :attr:`map_layout` by the design map) in place of the
        drawings, or the drawings again. The pane keeps its size either way."""
        self.stack.setCurrentWidget(self.map_page if shown else self.splitter)

    def _on_picked(self, _index: int) -> None:
        choice = self.picker.choice()
        if choice is not None:
            self.document.set_case_choice(choice)

    def _on_scale_changed(self, words: str) -> None:
        self.elevation_title.setText(f"Elevation, {words}")

    def show_page(self, page: int) -> None:
        """Show the soil pressure (0) or the concrete design (1) under the elevation."""
        self.page_bar.setCurrentIndex(page)

    def _on_page_changed(self, page: int) -> None:
        self.pages.setCurrentIndex(page)
        on_pressure = page == PRESSURE_PAGE
        self.picker.setVisible(on_pressure)
        self.picker_title.setVisible(on_pressure)
        # the concrete page needs the height; its own captions say what the diagrams show
        self.elevation_caption.setVisible(on_pressure)
        self._share()

    def resizeEvent(self, event) -> None:  # noqa: N802 - Qt's name
        super().resizeEvent(event)
        self._share()

    def _share(self) -> None:
        """Split the height between the elevation and the page below as the page needs."""
        page = self.page_bar.currentIndex()
        # the panel's own height (the splitter fills it): on a resize the splitter's sizes are still the old ones,
        # and a share of those would be overruled when the splitter itself is resized
        total = self.height() - self.splitter.handleWidth()
        if total > 0:
            upper = int(round(ELEVATION_SHARE[page] * total))
            self.splitter.setSizes([upper, total - upper])

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
        self.elevation.render(wall, doc.units, direction, governing_direction(result))
        self.concrete.set_data(wall, result, doc.units)
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

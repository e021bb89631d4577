"""The footing as a concrete member: ACI 318-19 design of a wall footing (pure engine, SI floats).

* :mod:`.bars`: ASTM A615 bars #3 to #11 (soft-metric aliases No. 10 to No. 36) and bar texts.
* :mod:`.transverse`: the footing across its width, a cantilever each side of the wall (chapter 13):
  moment section, flexure, As,min, spacing, one-way shear, development; bars checked or chosen,
  for one footing or a whole sizing grid.
* :mod:`.plain`: the plain-concrete footing (chapter 14) and whether plain concrete is permitted.
* :mod:`.longitudinal`: the footing as a beam along its length under the wall's loads and the
  rigid-footing soil pressure: shear and moment diagrams, top and bottom bars, one-way shear.

The load combinations for this design are those of :mod:`engine.codes.asce7_16_lrfd`. Wiring into the
checks, sizing, results JSON, window and package is done elsewhere.
"""

from .bars import BARS, Bar, bar, counted_text, parse_bar, parse_counted, parse_spaced, practical_bars, spaced_text
from .longitudinal import (
    BeamDiagram,
    BeamLineLoad,
    BeamPointLoad,
    FaceDesign,
    LongitudinalDesign,
    beam_diagram,
    chord_couple,
    design_longitudinal,
    rigid_soil_stations,
)
from .plain import PlainDesign, PlainPermission, design_plain, evaluate_plain, plain_permitted
from .transverse import Construction, Materials, TransverseDesign, TransverseGrid, design_transverse, evaluate_transverse

__all__ = [
    "BARS",
    "Bar",
    "BeamDiagram",
    "BeamLineLoad",
    "BeamPointLoad",
    "Construction",
    "FaceDesign",
    "LongitudinalDesign",
    "Materials",
    "PlainDesign",
    "PlainPermission",
    "TransverseDesign",
    "TransverseGrid",
    "bar",
    "beam_diagram",
    "chord_couple",
    "counted_text",
    "design_longitudinal",
    "design_plain",
    "design_transverse",
    "evaluate_plain",
    "evaluate_transverse",
    "parse_bar",
    "parse_counted",
    "parse_spaced",
    "plain_permitted",
    "practical_bars",
    "rigid_soil_stations",
    "spaced_text",
]

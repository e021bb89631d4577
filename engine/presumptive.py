"""Presumptive soil values: IBC 2021 Table 1806.2 and its notes.

International Building Code 2021, Table 1806.2 "Presumptive load-bearing values", read as reproduced
from the IBC 2012 table (the values are unchanged through 2021; see docs/verification.md, case 11):
the allowable vertical foundation pressure, the lateral bearing pressure per foot of depth below
natural grade, the coefficient of friction and the cohesion of five classes of material. Note a:
the coefficient of friction multiplies the dead load. Note b: the cohesion multiplies the contact
area, limited as 1806.3.2 says (at most one-half of the dead load).
"""

from __future__ import annotations

from dataclasses import dataclass

PSF = 4.4482216152605 / 0.3048**2  # Pa per psf (NIST SP 811)
PSF_PER_FT = 4.4482216152605 / 0.3048**3  # Pa/m per psf/ft


@dataclass(frozen=True, slots=True)
class PresumptiveClass:
    """One row of IBC 2021 Table 1806.2 (SI: Pa, Pa/m)."""

    number: int
    material: str
    allowable_bearing: float
    lateral_bearing: float
    friction: float
    cohesion: float


TABLE_1806_2: dict[int, PresumptiveClass] = {
    1: PresumptiveClass(1, "crystalline bedrock", 12_000 * PSF, 1_200 * PSF_PER_FT, 0.70, 0.0),
    2: PresumptiveClass(2, "sedimentary and foliated rock", 4_000 * PSF, 400 * PSF_PER_FT, 0.35, 0.0),
    3: PresumptiveClass(3, "sandy gravel and/or gravel (GW and GP)", 3_000 * PSF, 200 * PSF_PER_FT, 0.35, 0.0),
    4: PresumptiveClass(
        4,
        "sand, silty sand, clayey sand, silty gravel and clayey gravel (SW, SP, SM, SC, GM and GC)",
        2_000 * PSF,
        150 * PSF_PER_FT,
        0.25,
        0.0,
    ),
    5: PresumptiveClass(
        5,
        "clay, sandy clay, silty clay, clayey silt, silt and sandy silt (CL, ML, MH and CH)",
        1_500 * PSF,
        100 * PSF_PER_FT,
        0.0,
        130 * PSF,
    ),
}

"""Small helpers shared by the code-basis modules (building named combinations)."""

from __future__ import annotations

from ..model import LoadCase, LoadCombination
from ..registry import Check

CASES = {"D": LoadCase.D, "L": LoadCase.L, "Lr": LoadCase.LR, "S": LoadCase.S, "R": LoadCase.R, "W": LoadCase.W, "E": LoadCase.E}


def combo(name: str, checks: frozenset[Check] | None = None, **factors: float) -> LoadCombination:
    """A combination named ``name`` with ``factors`` by case symbol (D=1.0, L=0.75, ...); by default it
    applies to every check of the service family."""
    pairs = tuple((CASES[k], v) for k, v in factors.items())
    if checks is None:
        return LoadCombination(name=name, factors=pairs)
    return LoadCombination(name=name, factors=pairs, checks=checks)


def num(value: float) -> str:
    """A factor as printed in a combination's name: up to 4 decimals, no trailing zeros."""
    return f"{value:.4f}".rstrip("0").rstrip(".")

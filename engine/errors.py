"""Errors raised by the engine.

A failing stability check is data (``CheckResult(passes=False)``), never an exception. Exceptions are
for input the engine cannot use: they name the field, what was given and what is allowed.
"""

from __future__ import annotations


class EngineError(Exception):
    """Base of every error the engine raises on purpose."""


class InputError(EngineError, ValueError):
    """Input that cannot be used, with the path of the field that holds it.

    Args:
        field: path of the field, such as ``walls[1].footing.width`` (may be empty and filled in by
            an outer scope with :meth:`within`).
        problem: what is wrong and what to change, as a sentence fragment.
    """

    def __init__(self, field: str, problem: str) -> None:
        self.field = field
        self.problem = problem
        super().__init__(self.message)

    @property
    def message(self) -> str:
        return f"{self.field}: {self.problem}" if self.field else self.problem

    def within(self, prefix: str) -> InputError:
        """Return the same error with ``prefix`` put in front of its field path."""
        if not prefix:
            return self
        if not self.field:
            field = prefix
        elif self.field.startswith("["):
            field = prefix + self.field
        else:
            field = f"{prefix}.{self.field}"
        return InputError(field, self.problem)

    def __str__(self) -> str:
        return self.message


class FormatVersionError(InputError):
    """A project file written by a newer Kernline (or not a Kernline file at all)."""

"""Errors raised by the engine.

A failing stability check is data (``CheckResult(passes=False)``), never an exception. Exceptions are
for input the engine cannot use: they name the field, what was given and what is allowed.
"""

from __future__ import annotations

import unicodedata

# A message is one line of about this many characters at most (longer ones end in "...").
MAX_MESSAGE = 240


def one_line(text: str, limit: int = MAX_MESSAGE) -> str:
    """``text`` as one printable line: control and format characters (ESC, CR, LF, bidi overrides)
    escaped as \\xNN / \\uNNNN, so nothing from a file can move the cursor or recolour a terminal,
    and cut to ``limit`` characters."""
    out = []
    for ch in text:
        if unicodedata.category(ch) in ("Cc", "Cf", "Zl", "Zp"):
            code = ord(ch)
            out.append(f"\\x{code:02x}" if code < 0x100 else f"\\u{code:04x}")
        else:
            out.append(ch)
    line = "".join(out)
    return line if len(line) <= limit else line[: limit - 3] + "..."


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
        """One line: the field path and the problem, control characters escaped (see :func:`one_line`)."""
        return one_line(f"{self.field}: {self.problem}" if self.field else self.problem)

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

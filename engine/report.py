"""Render the calculation package (:mod:`engine.calc_package`) to PDF with reportlab.

This is the only module that imports reportlab, and it does so inside functions so that
``import engine.report`` stays cheap for the command line and the window. It computes no
engineering: it lays out the text, tables, equations and drawings that
:func:`engine.calc_package.build_package` made from the engine's results, and it puts the title
block on every sheet.

Text is never parsed as markup: the package's runs (plain, subscript, bold) are measured, wrapped
and drawn as they are, so characters such as ``<``, ``&`` and ``>`` in a project name or a label
print exactly as typed. The title block needs the number of sheets ("sheet N of M"), known only
once the whole story is laid out; a canvas that holds every page until the end draws the title
blocks when the document is saved, so the package is laid out once.
"""

from __future__ import annotations

import io
import os
from collections.abc import Sequence
from dataclasses import dataclass, replace
from functools import lru_cache
from pathlib import Path
from typing import TYPE_CHECKING, Any

from .calc_package import (
    CONTENT_WIDTH,
    Arrow,
    Block,
    Bullets,
    Cell,
    Contents,
    Dimension,
    Drawing,
    DrawingRow,
    Equation,
    Group,
    Heading,
    KeyValues,
    Label,
    Line,
    Package,
    Para,
    Polygon,
    Rect,
    Rich,
    Section,
    Table,
    Verdict,
    build_package,
    formula,
    plain,
)
from .file_safety import atomic_write_bytes, check_writable
from .resources import resource_path

if TYPE_CHECKING:  # pragma: no cover
    from .model import Project

# DejaVu Sans ships in resources/fonts (Bitstream Vera licence, resources/fonts/LICENSE-DejaVu.txt),
# so the package looks the same on every machine and in the frozen build.
FONT_FOLDER = "fonts"
INCH = 72.0
STRIP_HEIGHT = 0.7 * INCH  # the title strip across the top of every sheet (at most 0.75 in)
SMALL_SEAL = STRIP_HEIGHT  # the optional seal box at the strip's right end
MARGIN_TOP = 26.0
MARGIN_BOTTOM = 34.0  # the footer line (print date) sits in it
FOOTER_Y = 18.0
STRIP_GAP = 9.0
TEXT_FLOOR = 6.5  # the smallest text size of drawings and tables (body text is at least 7 pt)
_CELL_PAD = 2.5
_PAD_TOP = 1.5
_PAD_BOTTOM = 2.0
_TABLE_START = 90.0  # a table whose heading has this much room left on a sheet starts there and splits
_CONTENTS_NUMBERS = 150.0  # room at the right of a contents line for its sheet numbers
_MIN_LINES = 2  # lines a paragraph keeps on each side of a sheet break
_SUB_SCALE = 0.72  # subscript size / text size
_SUB_RISE = -0.22  # subscript baseline shift / text size

# Characters the built-in Helvetica (WinAnsi) cannot show, and what prints instead.
_ASCII_FALLBACK = {
    "≥": ">=",
    "≤": "<=",
    "−": "-",
    "Σ": "sum ",
    "√": "sqrt",
    "∞": "inf",
    "γ": "g",
    "μ": "mu",
    "²": "^2",
    "³": "^3",
    "→": "->",
    "±": "+/-",
}

_COLORS = {
    "ink": (0.0, 0.0, 0.0),
    "grey": (0.3, 0.3, 0.3),
    "soil": (0.45, 0.33, 0.18),
    "load": (0.05, 0.22, 0.55),
    "allow": (0.75, 0.05, 0.05),
    "fail": (0.55, 0.0, 0.0),
    "paper": (1.0, 1.0, 1.0),
}
_FILLS = {
    "concrete": (0.80, 0.80, 0.80),
    "stem": (0.70, 0.70, 0.70),
    "wall": (0.95, 0.92, 0.84),
    "soil": (0.93, 0.89, 0.80),
    "pressure": (0.98, 0.85, 0.65),
    "pass": (0.90, 0.96, 0.90),
    "fail": (1.0, 0.88, 0.86),
}

RGB = tuple[float, float, float]


@dataclass(frozen=True, slots=True)
class _Fonts:
    regular: str
    bold: str
    unicode: bool  # the fonts show ≥, Σ, γ, √ ...


@lru_cache(maxsize=4)
def _fonts(folder: str | None = None) -> _Fonts:
    """DejaVu Sans from our resources (it has every symbol the package prints), else Helvetica."""
    from reportlab.pdfbase import pdfmetrics
    from reportlab.pdfbase.ttfonts import TTFont

    if folder is None:
        folder = str(resource_path(FONT_FOLDER))
    regular, bold = Path(folder) / "DejaVuSans.ttf", Path(folder) / "DejaVuSans-Bold.ttf"
    try:
        if not (regular.is_file() and bold.is_file()):
            raise FileNotFoundError(regular)
        pdfmetrics.registerFont(TTFont("KLSans", str(regular)))
        pdfmetrics.registerFont(TTFont("KLSans-Bold", str(bold)))
        return _Fonts("KLSans", "KLSans-Bold", True)
    except Exception:  # a missing or unreadable font: the built-in font, with ASCII stand-ins
        return _Fonts("Helvetica", "Helvetica-Bold", False)


class _Text:
    """Characters the chosen font can show (ASCII stand-ins for symbols under Helvetica)."""

    def __init__(self, fonts: _Fonts) -> None:
        self.fonts = fonts

    def glyphs(self, text: str) -> str:
        if self.fonts.unicode:
            return text
        return "".join(_ASCII_FALLBACK.get(ch, ch) for ch in text)


# ---------------------------------------------------------------------------------------------
# Rich text: measured, wrapped and drawn directly (no markup)
# ---------------------------------------------------------------------------------------------


@dataclass(frozen=True, slots=True)
class Span:
    """A run of text as drawn: bold, subscript, small and colour set per span."""

    text: str
    bold: bool = False
    sub: bool = False
    small: bool = False
    color: str = ""


@dataclass(frozen=True, slots=True)
class TextStyle:
    size: float = 8.5
    leading: float = 11.0
    bold: bool = False
    color: str = "ink"
    space_before: float = 0.0
    space_after: float = 3.0
    left_indent: float = 0.0
    first_indent: float = 0.0  # added to left_indent on the first line (negative: hanging)
    back: str = ""  # fill colour name of a box behind the text
    border: bool = False
    padding: float = 0.0
    keep_with_next: bool = False
    bullet: str = ""
    small_size: float = 7.0
    splits: bool = True  # may break between lines across sheets


def _spans(value: Cell, bold: bool = False, color: str = "") -> list[Span]:
    if isinstance(value, str):
        return [Span(value, bold=bold, color=color)]
    return [Span(r.text, bold=bold or r.bold, sub=r.sub, color=color) for r in value]


_WIDTHS: dict[tuple[str, str, float], float] = {}
_CHAR_WIDTHS: dict[tuple[str, float], dict[str, float]] = {}
_ELLIPSIS = "…"


def _width(text: str, font: str, size: float) -> float:
    key = (text, font, size)
    w = _WIDTHS.get(key)
    if w is None:
        from reportlab.pdfbase.pdfmetrics import stringWidth

        w = stringWidth(text, font, size)
        if len(_WIDTHS) < 200_000:
            _WIDTHS[key] = w
    return w


def _char_widths(text: str, font: str, size: float) -> list[float]:
    """The width of each character of ``text``; a string's width is their sum (reportlab applies no
    kerning), so prefixes are measured by adding up instead of measuring each prefix again."""
    from reportlab.pdfbase.pdfmetrics import stringWidth

    table = _CHAR_WIDTHS.setdefault((font, size), {})
    out = []
    for ch in text:
        w = table.get(ch)
        if w is None:
            w = table[ch] = stringWidth(ch, font, size)
        out.append(w)
    return out


def _break_word(word: str, font: str, size: float, first: float, rest: float) -> list[str]:
    """Cut a word wider than a line into pieces: the first fills ``first`` points, the others ``rest``.

    Each piece is the longest that fits (at least one character); the last piece is what is left.
    One pass over the word's character widths, so the time grows with the word's length, not its square.
    """
    pieces: list[str] = []
    start, x, avail = 0, 0.0, first
    for i, w in enumerate(_char_widths(word, font, size)):
        if x + w > avail and i > start:
            pieces.append(word[start:i])
            start, x, avail = i, 0.0, rest
        x += w
    pieces.append(word[start:])
    return pieces


def _clip(text: str, font: str, size: float, width: float) -> str:
    """``text`` cut short with an ellipsis so that it fits ``width`` (unchanged if it fits)."""
    if _width(text, font, size) <= width:
        return text
    room = width - _width(_ELLIPSIS, font, size)
    x, k = 0.0, 0  # k: characters kept
    for w in _char_widths(text, font, size):
        if x + w > room:
            break
        x += w
        k += 1
    return text[:k].rstrip() + _ELLIPSIS


def _wrap_plain(text: str, font: str, size: float, width: float, widest_word: float = 0.0) -> list[str]:
    """Lines of plain text no wider than ``width``: breaks at newlines and spaces. Linear in the length of the text.

    A word wider than ``widest_word`` (default ``width``) is cut into pieces ``width`` wide; a narrower
    one that is still wider than ``width`` keeps a line of its own (a short word in a narrow table
    column may run into the cell's padding rather than be split).
    """
    widest_word = max(widest_word, width)
    space = _width(" ", font, size)
    lines: list[str] = []
    for hard in text.split("\n"):
        words: list[str] = []
        x = 0.0
        for word in hard.split():
            w = _width(word, font, size)
            if words and x + space + w <= width:
                words.append(word)
                x += space + w
                continue
            if words:
                lines.append(" ".join(words))
            if w > widest_word and len(word) > 1:
                *full, word = _break_word(word, font, size, width, width)
                lines += full
                w = _width(word, font, size)
            words, x = [word], w
        lines.append(" ".join(words))
    return lines


# A wrapped line: its x offset and its segments (text, font, size, rise, colour) drawn in order.
_Segment = tuple[str, str, float, float, RGB]
_WrappedLine = tuple[float, list[_Segment]]


def _layout(lines: list[list[Span]], style: TextStyle, fonts: _Fonts, text: _Text, width: float) -> list[_WrappedLine]:
    """Wrap hard lines of spans to ``width``: words move whole to the next line; a word longer than
    a line is cut."""
    out: list[_WrappedLine] = []
    first = True
    for spans in lines:
        # words: (word, font, size, rise, colour, space before)
        words: list[tuple[str, str, float, float, RGB, bool]] = []
        pending_space = False
        for sp in spans:
            font = fonts.bold if (sp.bold or style.bold) else fonts.regular
            size = style.small_size if sp.small else style.size
            rise = 0.0
            if sp.sub:
                rise, size = _SUB_RISE * size, size * _SUB_SCALE
            color = _COLORS.get(sp.color or style.color, _COLORS["ink"])
            parts = text.glyphs(sp.text).split(" ")
            for k, part in enumerate(parts):
                if k > 0:
                    pending_space = True
                if part:
                    words.append((part, font, size, rise, color, pending_space))
                    pending_space = False
        indent = style.left_indent + (style.first_indent if first else 0.0)
        first = False
        avail = max(width - indent, 20.0)
        x = 0.0
        line: list[_Segment] = []
        for word, font, size, rise, color, space in words:
            w = _width(word, font, size)
            gap = _width(" ", font, size) if (space and line) else 0.0
            if line and x + gap + w > avail:
                out.append((indent, line))
                indent = style.left_indent
                avail = max(width - indent, 20.0)
                line, x, gap = [], 0.0, 0.0
            if not line and w > avail and len(word) > 1:  # a single word wider than the line: cut it
                rest = max(width - style.left_indent, 20.0)
                *full, word = _break_word(word, font, size, avail, rest)
                for cut in full:
                    out.append((indent, [(cut, font, size, rise, color)]))
                    indent, avail = style.left_indent, rest
                w = _width(word, font, size)
            piece = (" " if gap else "") + word
            if line and line[-1][1:] == (font, size, rise, color):
                line[-1] = (line[-1][0] + piece, font, size, rise, color)
            else:
                line.append((piece, font, size, rise, color))
            x += gap + w
        out.append((indent, line))
    return out


def _show(text: Any, value: str) -> None:
    """Show ``value`` at the text object's current point.

    Every line is placed with an explicit origin, so the Python-side cursor that ``textOut`` keeps
    (by measuring the string again) is not needed: ``_textOut`` writes the same operators without the
    measuring, which is a good part of the time of a long package. Falls back to ``textOut``.
    """
    show = getattr(text, "_textOut", None)
    if show is None:  # pragma: no cover - a reportlab without the private method
        text.textOut(value)
    else:
        show(value)


def _draw_lines(c: Any, lines: list[_WrappedLine], x0: float, top: float, leading: float, size: float) -> None:
    """Draw wrapped lines, the first baseline a little below ``top``."""
    if not any(segments for _, segments in lines):
        return
    text = c.beginText()
    state: tuple[str, float, float, RGB] | None = None
    y = top - (0.5 * leading + 0.35 * size)
    for indent, segments in lines:
        if segments:
            text.setTextOrigin(x0 + indent, y)
            for piece, font, seg_size, rise, color in segments:
                if state is None or state[0:2] != (font, seg_size):
                    text.setFont(font, seg_size, leading)
                if state is None or state[2] != rise:
                    text.setRise(rise)
                if state is None or state[3] != color:
                    text.setFillColorRGB(*color)
                state = (font, seg_size, rise, color)
                _show(text, piece)
        y -= leading
    c.drawText(text)


# ---------------------------------------------------------------------------------------------
# Flowables (classes are created on first use so that reportlab is imported lazily)
# ---------------------------------------------------------------------------------------------


@dataclass(frozen=True, slots=True)
class GridSpec:
    """Columns of a :class:`Grid` table: widths, alignment ("L", "R", "C"), text size.

    ``header``: the first row is a shaded header repeated on each sheet; ``ruled``: full grid
    (else a light rule under each row); ``label_columns``: columns printed small and grey.
    """

    widths: tuple[float, ...]
    align: str
    size: float
    leading: float
    header: bool = True
    ruled: bool = True
    label_columns: frozenset[int] = frozenset()


# A table split across sheets leaves at least this many rows on each side (widow and orphan rows).
_MIN_ROWS = 2
# Lines of plain text a table cell shows at most; longer text ends in an ellipsis.
_CELL_MAX_LINES = 8


@lru_cache(maxsize=1)
def _flowable_classes() -> dict[str, type]:
    from reportlab.lib.utils import simpleSplit
    from reportlab.platypus import Flowable

    class SectionStart(Flowable):
        """Zero-size marker: the sheet's subject from here on, and the sheet where the section starts."""

        def __init__(self, key: str, subject: str, outline: tuple[tuple[str, str, int], ...] = ()) -> None:
            super().__init__()
            self.key, self.subject, self.outline = key, subject, outline
            self.width = self.height = 0

        def wrap(self, aw: float, ah: float) -> tuple[float, float]:
            return 0, 0

        def draw(self) -> None:
            c = self.canv
            if self.subject:  # a heading's bookmark keeps the sheet's subject
                c._kl_subject = self.subject
            c._kl_starts.setdefault(self.key, c.getPageNumber())
            for key, title, level in self.outline:  # (destination, words, level) entries of the PDF outline
                c._kl_marks.append((c.getPageNumber(), key, title, level))

    class ContentsLine(Flowable):
        """One line of the contents: the title now, the sheet numbers when the canvas is saved."""

        def __init__(self, title: str, refs: tuple[tuple[str, str], ...], font: str, size: float) -> None:
            super().__init__()
            self.title, self.refs, self.font, self.size = title, refs, font, size

        def wrap(self, aw: float, ah: float) -> tuple[float, float]:
            self.width = aw
            return aw, self.size + 4.5

        def draw(self) -> None:
            c = self.canv
            room = self.width - _CONTENTS_NUMBERS - 8
            title, size = _fit(c, self.title, self.font, self.size, room, minimum=self.size)
            c.setFont(self.font, size)
            c.drawString(0, 2, title)
            c.setDash(0.5, 2.5)
            c.setLineWidth(0.5)
            start = _width(title, self.font, size) + 4
            if start < self.width - _CONTENTS_NUMBERS:
                c.line(start, 2.5, self.width - _CONTENTS_NUMBERS, 2.5)
            c.setDash()
            x, y = c.absolutePosition(self.width, 2)
            c._kl_numbers.append((c.getPageNumber(), x, y, self.refs))
            if self.refs:  # the whole line links to the first sheet it names
                x0, y0 = c.absolutePosition(0, 0)
                c._kl_links.append((c.getPageNumber(), (x0, y0 - 1, x0 + self.width, y0 + self.size + 2), self.refs[0][1]))

    class RichText(Flowable):
        """Wrapped runs of text with an optional bullet, box and border; splits between lines."""

        def __init__(
            self,
            lines: list[list[Span]],
            style: TextStyle,
            fonts: _Fonts,
            text: _Text,
            wrapped: list[_WrappedLine] | None = None,
            width: float = 0.0,
        ) -> None:
            super().__init__()
            self.lines, self.style, self.fonts, self.text = lines, style, fonts, text
            self._wrapped, self._wrapped_width = wrapped, width
            self.keepWithNext = style.keep_with_next

        def _layout(self, aw: float) -> list[_WrappedLine]:
            inner = aw - 2 * self.style.padding
            if self._wrapped is None or abs(self._wrapped_width - inner) > 1e-6:
                self._wrapped = _layout(self.lines, self.style, self.fonts, self.text, inner)
                self._wrapped_width = inner
            return self._wrapped

        def wrap(self, aw: float, ah: float) -> tuple[float, float]:
            self.width = aw
            self.height = len(self._layout(aw)) * self.style.leading + 2 * self.style.padding
            return aw, self.height

        def getSpaceBefore(self) -> float:  # noqa: N802 - reportlab's name
            return self.style.space_before

        def getSpaceAfter(self) -> float:  # noqa: N802 - reportlab's name
            return self.style.space_after

        def split(self, aw: float, ah: float) -> list[Any]:
            wrapped = self._layout(aw)
            k = int((ah - 2 * self.style.padding) // self.style.leading)
            k = min(k, len(wrapped) - _MIN_LINES)  # no widow: at least two lines go on
            if k < _MIN_LINES or not self.style.splits:  # no orphan: at least two lines stay
                return []
            head = RichText(
                self.lines, replace(self.style, space_after=0.0), self.fonts, self.text, wrapped[:k], self._wrapped_width
            )
            tail = RichText(
                self.lines,
                replace(self.style, space_before=0.0, bullet=""),
                self.fonts,
                self.text,
                wrapped[k:],
                self._wrapped_width,
            )
            return [head, tail]

        def draw(self) -> None:
            c, st = self.canv, self.style
            if st.back or st.border:
                c.saveState()
                if st.back:
                    c.setFillColorRGB(*_FILLS[st.back])
                c.setStrokeColorRGB(0, 0, 0)
                c.setLineWidth(0.8)
                c.rect(0, 0, self.width, self.height, stroke=1 if st.border else 0, fill=1 if st.back else 0)
                c.restoreState()
            wrapped = self._layout(self.width)
            top = self.height - st.padding
            if st.bullet:
                c.setFont(self.fonts.regular, st.size)
                c.setFillColorRGB(0, 0, 0)
                c.drawString(st.padding + 2, top - (0.5 * st.leading + 0.35 * st.size), st.bullet)
            _draw_lines(c, wrapped, st.padding, top, st.leading, st.size)

    class Sketch(Flowable):
        """A :class:`Drawing` of lines, boxes, arrows, labels and dimensions, with its caption."""

        def __init__(self, drawing: Drawing, fonts: _Fonts, text: _Text) -> None:
            super().__init__()
            self.drawing, self.fonts, self.text = drawing, fonts, text
            self.caption_lines = (
                simpleSplit(text.glyphs(drawing.caption), fonts.regular, 6.5, drawing.width) if drawing.caption else []
            )
            self.width = drawing.width
            self.height = drawing.height + 8.0 * len(self.caption_lines) + (3 if self.caption_lines else 0)

        def wrap(self, aw: float, ah: float) -> tuple[float, float]:
            return self.width, self.height

        def draw(self) -> None:
            c = self.canv
            c.saveState()
            y_caption = 8.0 * len(self.caption_lines) + (3 if self.caption_lines else 0)
            c.setFont(self.fonts.regular, 6.5)
            c.setFillColorRGB(0.25, 0.25, 0.25)
            for k, line in enumerate(self.caption_lines):
                c.drawString(0, y_caption - 8.0 * (k + 1) - 1, line)
            c.translate(0, y_caption)
            for shape in self.drawing.shapes:
                _draw_shape(c, shape, self.fonts, self.text)
            c.restoreState()

    class Grid(Flowable):
        """A table of text cells, split between rows across sheets with its header repeated.

        Cells are lists of lines (already wrapped to their column) or RichText flowables (text with
        subscripts or bold runs). The whole table is drawn with one text object and one path, which
        is several times faster than reportlab's general Table for the package's long tables.
        """

        def __init__(
            self,
            spec: GridSpec,
            fonts: _Fonts,
            rows: list[list[Any]],
            bold_rows: frozenset[int],
            links: tuple[str, ...] = (),
        ) -> None:
            super().__init__()
            self.spec, self.fonts, self.rows, self.bold_rows = spec, fonts, rows, bold_rows
            self.links = links  # per row (the header's entry ""): the section key its row links to
            self.width = sum(spec.widths)
            self._heights: list[float] | None = None

        def _row_height(self, cells: list[Any]) -> float:
            spec = self.spec
            h = spec.leading
            for cell, w in zip(cells, spec.widths, strict=True):
                if isinstance(cell, list):
                    h = max(h, len(cell) * spec.leading)
                else:
                    h = max(h, cell.wrap(w - 2 * _CELL_PAD, 10_000)[1])
            return h + _PAD_TOP + _PAD_BOTTOM

        def heights(self) -> list[float]:
            if self._heights is None:
                self._heights = [self._row_height(r) for r in self.rows]
            return self._heights

        def wrap(self, aw: float, ah: float) -> tuple[float, float]:
            self.height = sum(self.heights())
            return self.width, self.height

        def split(self, aw: float, ah: float) -> list[Any]:
            heights = self.heights()
            head = 1 if self.spec.header else 0
            used, k = sum(heights[:head]), head
            while k < len(self.rows) and used + heights[k] <= ah:
                used += heights[k]
                k += 1
            if k == len(self.rows):
                return []
            if len(self.rows) - k < _MIN_ROWS:  # no row or two left alone at the top of the next sheet
                k = len(self.rows) - _MIN_ROWS
            if k - head < _MIN_ROWS:  # nor alone under the header at the bottom of this one
                return []
            header = self.rows[:head]
            links = self.links + ("",) * (len(self.rows) - len(self.links))
            first = Grid(self.spec, self.fonts, self.rows[:k], frozenset(i for i in self.bold_rows if i < k), links[:k])
            rest = Grid(
                self.spec,
                self.fonts,
                header + self.rows[k:],
                frozenset(i - k + head for i in self.bold_rows if i >= k),
                links[:head] + links[k:],
            )
            return [first, rest]

        def draw(self) -> None:
            spec, c = self.spec, self.canv
            heights = self.heights()
            total = sum(heights)
            xs = [0.0]
            for w in spec.widths:
                xs.append(xs[-1] + w)
            tops = [total]
            for h in heights:
                tops.append(tops[-1] - h)
            c.saveState()
            if spec.header:
                c.setFillColorRGB(0.88, 0.88, 0.88)
                c.rect(0, tops[1], self.width, heights[0], stroke=0, fill=1)
            c.setFillColorRGB(*_FILLS["fail"])
            for i in self.bold_rows:
                c.rect(0, tops[i + 1], self.width, heights[i], stroke=0, fill=1)
            path = c.beginPath()
            if spec.ruled:
                c.setStrokeColorRGB(0.55, 0.55, 0.55)
                c.setLineWidth(0.3)
                for y in tops:
                    path.moveTo(0, y)
                    path.lineTo(self.width, y)
                for x in xs:
                    path.moveTo(x, 0)
                    path.lineTo(x, total)
            else:
                c.setStrokeColorRGB(0.75, 0.75, 0.75)
                c.setLineWidth(0.25)
                for y in tops[1:]:
                    path.moveTo(0, y)
                    path.lineTo(self.width, y)
            c.drawPath(path, stroke=1, fill=0)
            text = c.beginText()
            flows = []
            current: tuple[str, float] | None = None
            current_color: RGB | None = None
            for r, cells in enumerate(self.rows):
                bold = (spec.header and r == 0) or r in self.bold_rows
                for j, cell in enumerate(cells):
                    if not isinstance(cell, list):
                        flows.append((cell, xs[j] + _CELL_PAD, tops[r] - _PAD_TOP))
                        continue
                    if not any(cell):
                        continue
                    label = j in spec.label_columns
                    font = self.fonts.bold if bold else self.fonts.regular
                    size = spec.size - 1.0 if label else spec.size
                    if current != (font, size):  # font and colour operators only when they change
                        text.setFont(font, size, spec.leading)
                        current = (font, size)
                    color = _COLORS["grey"] if label else _COLORS["ink"]
                    if current_color != color:
                        text.setFillColorRGB(*color)
                        current_color = color
                    y = tops[r] - _PAD_TOP - (0.5 * spec.leading + 0.35 * spec.size)
                    for line in cell:
                        if line:
                            a = spec.align[j]
                            if a == "L":
                                x = xs[j] + _CELL_PAD
                            else:
                                w = _width(line, font, size)
                                x = xs[j + 1] - _CELL_PAD - w if a == "R" else (xs[j] + xs[j + 1] - w) / 2
                            text.setTextOrigin(x, y)
                            _show(text, line)
                        y -= spec.leading
            c.drawText(text)
            for flow, x, y_top in flows:  # wrapped to their column when the row height was found
                flow.drawOn(c, x, y_top - flow.height)
            for r, key in enumerate(self.links):  # a row that names a wall links to its sheets
                if key and r < len(self.rows):
                    x0, y0 = c.absolutePosition(0, tops[r + 1])
                    x1, y1 = c.absolutePosition(xs[1], tops[r])
                    c._kl_links.append((c.getPageNumber(), (x0, y0, x1, y1), key))
            c.restoreState()

    class CalcLine(Flowable):
        """One step of a calculation: the clause in a narrow left column, the step wrapped at its operators
        in the middle, the result repeated in a right-hand results column; a remark under it when given."""

        def __init__(
            self, clause: str, main: list[Span], result: list[Span], note: list[Span], fonts: _Fonts, text: _Text
        ) -> None:
            super().__init__()
            self.clause, self.main, self.result, self.note = clause, main, result, note
            self.fonts, self.text = fonts, text
            self._lines: list[_WrappedLine] = []
            self._clause: list[_WrappedLine] = []
            self._result: list[_WrappedLine] = []
            self._note: list[_WrappedLine] = []

        def wrap(self, aw: float, ah: float) -> tuple[float, float]:
            self.width = aw
            mid = aw - _CLAUSE_COLUMN - _RESULT_COLUMN - 8.0
            self._lines = _layout([self.main], _STYLES["calc"], self.fonts, self.text, mid)
            self._clause = _layout([[Span(self.clause)]], _STYLES["clause"], self.fonts, self.text, _CLAUSE_COLUMN - 4.0)
            self._result = _layout([self.result], _STYLES["result"], self.fonts, self.text, _RESULT_COLUMN)
            self._note = _layout([self.note], _STYLES["remark"], self.fonts, self.text, mid) if self.note else []
            lead = _STYLES["calc"].leading
            # the results column's lines run down from the step's last line (a long result wraps there)
            column = (len(self._lines) - 1 + len(self._result)) * lead
            body = max(len(self._lines) * lead, len(self._clause) * _STYLES["clause"].leading, column)
            self.height = body + len(self._note) * _STYLES["remark"].leading + 1.5
            return aw, self.height

        def draw(self) -> None:
            c = self.canv
            top = self.height
            st, cl, rs, rm = _STYLES["calc"], _STYLES["clause"], _STYLES["result"], _STYLES["remark"]
            _draw_lines(c, self._clause, 0.0, top - 0.6, cl.leading, cl.size)
            _draw_lines(c, self._lines, _CLAUSE_COLUMN, top, st.leading, st.size)
            # the results column: right-aligned on the step's last line, behind a hairline
            last = top - (len(self._lines) - 1) * st.leading
            x_res = self.width - _RESULT_COLUMN
            c.saveState()
            c.setStrokeColorRGB(0.7, 0.7, 0.7)
            c.setLineWidth(0.3)
            c.line(x_res - 4.0, top, x_res - 4.0, top - len(self._lines) * st.leading)
            c.restoreState()
            res = [(max(0.0, _RESULT_COLUMN - _line_width(segs)), segs) for _, segs in self._result]
            _draw_lines(c, res, x_res, last, rs.leading, rs.size)
            if self._note:
                _draw_lines(c, self._note, _CLAUSE_COLUMN + 10.0, top - len(self._lines) * st.leading, rm.leading, rm.size)

        def getSpaceAfter(self) -> float:  # noqa: N802 - reportlab's name
            return 1.0

    return {
        "SectionStart": SectionStart,
        "ContentsLine": ContentsLine,
        "RichText": RichText,
        "Sketch": Sketch,
        "Grid": Grid,
        "CalcLine": CalcLine,
    }


_CLAUSE_COLUMN = 62.0  # the left margin column of a calculation step: the clause it follows
_RESULT_COLUMN = 92.0  # the right-hand results column


def _line_width(segments: list[_Segment]) -> float:
    return sum(_width(piece, font, size) for piece, font, size, _, _ in segments)


def _draw_shape(c: Any, shape: Any, fonts: _Fonts, text: _Text) -> None:

    if isinstance(shape, Rect):
        c.setStrokeColorRGB(*_COLORS["ink"])
        c.setLineWidth(shape.width or 0.1)
        fill = _FILLS.get(shape.fill)
        if fill:
            c.setFillColorRGB(*fill)
        c.rect(shape.x, shape.y, shape.w, shape.h, stroke=1 if shape.width > 0 else 0, fill=1 if fill else 0)
    elif isinstance(shape, Line):
        c.setStrokeColorRGB(*_COLORS.get(shape.color, _COLORS["ink"]))
        c.setLineWidth(shape.width)
        if shape.dash:
            c.setDash(4, 2)
        c.line(shape.x1, shape.y1, shape.x2, shape.y2)
        if shape.dash:
            c.setDash()
    elif isinstance(shape, Polygon):
        fill = _FILLS.get(shape.fill)
        path = c.beginPath()
        x, y = shape.points[0]
        path.moveTo(x, y)
        for x, y in shape.points[1:]:
            path.lineTo(x, y)
        path.close()
        c.setStrokeColorRGB(*_COLORS["ink"])
        c.setLineWidth(shape.width)
        if fill:
            c.setFillColorRGB(*fill)
        c.drawPath(path, stroke=1, fill=1 if fill else 0)
    elif isinstance(shape, Arrow):
        _arrow(c, shape.x1, shape.y1, shape.x2, shape.y2, shape.width, _COLORS.get(shape.color, _COLORS["ink"]))
    elif isinstance(shape, Label):
        shape = replace(shape, size=max(shape.size, TEXT_FLOOR))
        font = fonts.bold if shape.bold else fonts.regular
        runs = formula(shape.text) if shape.markup else plain(shape.text)
        c.saveState()
        c.setFillColorRGB(*_COLORS.get(shape.color, _COLORS["ink"]))
        c.translate(shape.x, shape.y)
        if shape.angle:
            c.rotate(shape.angle)
        w = _runs_width(runs, font, shape.size, text)
        x = {"start": 0.0, "middle": -w / 2.0, "end": -w}.get(shape.anchor, 0.0)
        _draw_runs(c, x, 0.0, runs, font, shape.size, text)
        c.restoreState()
    elif isinstance(shape, Dimension):
        _dimension(c, shape, fonts, text)


def _runs_width(runs: Rich, font: str, size: float, text: _Text) -> float:
    """Width of a label's runs, subscripts at their smaller size."""
    return sum(_width(text.glyphs(r.text), font, size * _SUB_SCALE if r.sub else size) for r in runs)


def _draw_runs(c: Any, x: float, y: float, runs: Rich, font: str, size: float, text: _Text) -> None:
    """Draw a label's runs from (x, y) on the baseline, subscripts smaller and lowered as in the equations."""
    for r in runs:
        value = text.glyphs(r.text)
        run_size = size * _SUB_SCALE if r.sub else size
        c.setFont(font, run_size)
        c.drawString(x, y + (_SUB_RISE * size if r.sub else 0.0), value)
        x += _width(value, font, run_size)


def _arrow(c: Any, x1: float, y1: float, x2: float, y2: float, width: float, color: tuple[float, float, float]) -> None:
    import math

    c.setStrokeColorRGB(*color)
    c.setFillColorRGB(*color)
    c.setLineWidth(width)
    length = math.hypot(x2 - x1, y2 - y1)
    if length == 0:
        return
    ux, uy = (x2 - x1) / length, (y2 - y1) / length
    head = min(4.0 + width, 0.5 * length)
    bx, by = x2 - ux * head, y2 - uy * head
    c.line(x1, y1, bx, by)
    path = c.beginPath()
    path.moveTo(x2, y2)
    path.lineTo(bx - uy * head * 0.45, by + ux * head * 0.45)
    path.lineTo(bx + uy * head * 0.45, by - ux * head * 0.45)
    path.close()
    c.drawPath(path, stroke=0, fill=1)


def _dimension(c: Any, d: Dimension, fonts: _Fonts, text: _Text) -> None:
    size = TEXT_FLOOR
    runs = formula(d.text) if d.markup else plain(d.text)
    w = _runs_width(runs, fonts.regular, size, text)
    c.saveState()
    c.setStrokeColorRGB(0.2, 0.2, 0.2)
    c.setFillColorRGB(0, 0, 0)
    c.setLineWidth(0.4)
    c.setFont(fonts.regular, size)
    out = 2.0 if d.offset >= 0 else -2.0
    if abs(d.y1 - d.y2) < 1e-9:  # horizontal
        y = d.y1 + d.offset
        c.line(d.x1, d.y1 + (1.5 if d.offset >= 0 else -1.5), d.x1, y + out)
        c.line(d.x2, d.y2 + (1.5 if d.offset >= 0 else -1.5), d.x2, y + out)
        c.line(d.x1, y, d.x2, y)
        for x in (d.x1, d.x2):
            c.line(x - 2, y - 2, x + 2, y + 2)
        span = abs(d.x2 - d.x1)
        if w + 4 <= span:
            _draw_runs(c, (d.x1 + d.x2) / 2 - w / 2, y + 1.5, runs, fonts.regular, size, text)
        elif d.outside == "start":  # too short for its text: write it beside one end
            _draw_runs(c, min(d.x1, d.x2) - 3 - w, y - 2, runs, fonts.regular, size, text)
        else:
            _draw_runs(c, max(d.x1, d.x2) + 3, y - 2, runs, fonts.regular, size, text)
    else:  # vertical
        x = d.x1 + d.offset
        c.line(d.x1 + (1.5 if d.offset >= 0 else -1.5), d.y1, x + out, d.y1)
        c.line(d.x2 + (1.5 if d.offset >= 0 else -1.5), d.y2, x + out, d.y2)
        c.line(x, d.y1, x, d.y2)
        for y in (d.y1, d.y2):
            c.line(x - 2, y - 2, x + 2, y + 2)
        span = abs(d.y2 - d.y1)
        if w + 4 <= span:
            c.translate(x - 1.5 if d.offset < 0 else x + 1.5 + size * 0.8, (d.y1 + d.y2) / 2 - w / 2)
            c.rotate(90)
            _draw_runs(c, 0, 0, runs, fonts.regular, size, text)
        else:
            if d.offset < 0:
                _draw_runs(c, x - 3 - w, (d.y1 + d.y2) / 2 - 2, runs, fonts.regular, size, text)
            else:
                _draw_runs(c, x + 3, (d.y1 + d.y2) / 2 - 2, runs, fonts.regular, size, text)
    c.restoreState()


# ---------------------------------------------------------------------------------------------
# Blocks to flowables
# ---------------------------------------------------------------------------------------------

_STYLES = {
    "h1": TextStyle(size=12, leading=14, bold=True, space_after=4, keep_with_next=True),
    "h2": TextStyle(size=9, leading=11, bold=True, space_before=5, space_after=1.5, keep_with_next=True),
    "body": TextStyle(size=8, leading=10.2, space_after=2.5),
    "small": TextStyle(size=7, leading=8.8, color="grey", space_after=2),
    "note": TextStyle(size=7.5, leading=9.2, space_before=4),
    "caution": TextStyle(size=8.5, leading=11, bold=True, border=True, padding=5, space_before=6, space_after=8, splits=False),
    "pass": TextStyle(size=8, leading=10.2, bold=True, back="pass", padding=2.5, space_before=3, space_after=4, splits=False),
    "fail": TextStyle(
        size=8, leading=10.2, bold=True, back="fail", padding=2.5, space_before=3, space_after=4, color="fail", splits=False
    ),
    "bullet": TextStyle(size=7.5, leading=9.4, left_indent=10, bullet="•", space_after=1.5),
    "eq": TextStyle(leading=12, left_indent=58, first_indent=-50, space_after=4, splits=False),
    # a calculation step: the step, its clause, its result and a remark (see CalcLine)
    "calc": TextStyle(size=8, leading=9.5, left_indent=10, first_indent=-10, space_after=0),
    "clause": TextStyle(size=6.5, leading=8.0, color="grey", space_after=0),
    "result": TextStyle(size=8, leading=9.5, bold=True, space_after=0),
    "remark": TextStyle(size=7, leading=8.2, color="grey", space_after=0),
}


_NO_BREAK = "\u00a0"
_OPERATORS = ("+", "−", "×", "/", "=", "-")


def _operator_breaks(spans: list[Span]) -> list[Span]:
    """Spans whose spaces allow a line break only before an operator (+ − × / =): the other spaces
    become no-break spaces, so a long substitution wraps at an operator."""
    out = []
    for sp in spans:
        words = sp.text.split(" ")
        text = words[0]
        for word in words[1:]:
            text += (" " if word[:1] in _OPERATORS else _NO_BREAK) + word
        out.append(replace(sp, text=text))
    return out


def _hard_lines(spans: list[Span]) -> list[list[Span]]:
    """Split spans into lines at newlines."""
    lines: list[list[Span]] = [[]]
    for sp in spans:
        parts = sp.text.split("\n")
        for k, part in enumerate(parts):
            if k:
                lines.append([])
            if part:
                lines[-1].append(replace(sp, text=part))
    return lines


class _Builder:
    """Turns package blocks into reportlab flowables."""

    def __init__(self, fonts: _Fonts) -> None:
        self.fonts = fonts
        self.text = _Text(fonts)
        self.classes = _flowable_classes()
        self._parent = ""
        self._section = ""
        self._level = 0
        self._marks = 0

    def rich(self, value: Cell, style: str | TextStyle = "body") -> Any:
        st = _STYLES[style] if isinstance(style, str) else style
        return self.classes["RichText"](_hard_lines(_spans(value)), st, self.fonts, self.text)

    def section(self, section: Section, package: Package) -> list[Any]:
        from reportlab.platypus import CondPageBreak, PageBreak

        start = self.classes["SectionStart"](section.key, section.subject, self._outline(section))
        out: list[Any] = [PageBreak(), start] if section.new_sheet else [start]
        blocks = section.blocks
        k = 0
        while k < len(blocks):
            block = blocks[k]
            after = blocks[k + 1] if k + 1 < len(blocks) else None
            if isinstance(block, Heading) and isinstance(after, (Table, KeyValues)):
                # a heading stays with the start of its table, and a long table may begin low on a sheet
                heading = self.rich(block.text, replace(_STYLES["h1" if block.level == 1 else "h2"], keep_with_next=False))
                out += [CondPageBreak(_TABLE_START), heading, *self.block(after, package)]
                k += 2
                continue
            out += self.block(block, package)
            k += 1
        return out

    def _outline(self, section: Section) -> tuple[tuple[str, str, int], ...]:
        """The outline entries a section starts: its group's entry when the group changes, then its own."""
        entries: list[tuple[str, str, int]] = []
        level = 0
        if section.parent:
            if section.parent != self._parent:
                entries.append((f"{section.key}#group", section.parent, 0))
            level = 1
        self._parent = section.parent
        self._section, self._level = section.key, level
        entries.append((section.key, section.title, level))
        return tuple(entries)

    def block(self, block: Block, package: Package) -> list[Any]:
        from reportlab.platypus import KeepTogether, Spacer

        if isinstance(block, Heading):
            head = self.rich(block.text, "h1" if block.level == 1 else "h2")
            if block.bookmark:
                self._marks += 1
                key = f"{self._section}#{self._marks}"
                return [self.classes["SectionStart"](key, "", ((key, block.bookmark, self._level + 1),)), head]
            return [head]
        if isinstance(block, Para):
            return [self.rich(block.text, block.style)]
        if isinstance(block, Verdict):
            return [self.rich(block.text, "pass" if block.passes else "fail")]
        if isinstance(block, Bullets):
            return [self.rich(item, "bullet") for item in block.items]
        if isinstance(block, Table):
            return [self.table(block), Spacer(1, 5)]
        if isinstance(block, KeyValues):
            return [self.key_values(block), Spacer(1, 4)]
        if isinstance(block, Equation):
            return [self.equation(block)]
        if isinstance(block, Drawing):
            return [self.classes["Sketch"](block, self.fonts, self.text), Spacer(1, 6)]
        if isinstance(block, DrawingRow):
            return [self.drawing_row(block), Spacer(1, 6)]
        if isinstance(block, Group):
            inner: list[Any] = []
            for b in block.blocks:
                inner += self.block(b, package)
            return [KeepTogether(inner)]
        if isinstance(block, Contents):
            line = self.classes["ContentsLine"]
            return [line(self.text.glyphs(e.title), e.refs, self.fonts.regular, 8.5) for e in block.entries]
        raise TypeError(f"unknown block {type(block).__name__}")  # pragma: no cover - a programming error

    def table(self, t: Table) -> Any:
        align = (t.align or "") + "L" * max(0, len(t.headers) - len(t.align or ""))
        size = max(t.font_size, TEXT_FLOOR)
        spec = GridSpec(tuple(w * CONTENT_WIDTH for w in t.widths), align, size, size * 1.2)
        rows = [[self._cell(h, spec, True, j) for j, h in enumerate(t.headers)]]
        rows += [[self._cell(v, spec, k in t.fail_rows, j) for j, v in enumerate(row)] for k, row in enumerate(t.rows)]
        links = ("", *t.links) if t.links else ()
        return self.classes["Grid"](spec, self.fonts, rows, frozenset(k + 1 for k in t.fail_rows), links)

    def key_values(self, kv: KeyValues) -> Any:
        pairs = list(kv.pairs)
        cols = max(1, kv.columns)
        n = (len(pairs) + cols - 1) // cols
        unit = CONTENT_WIDTH / cols
        widths = (unit * (0.42 if cols > 1 else 0.34), unit * (0.58 if cols > 1 else 0.66)) * cols
        spec = GridSpec(
            widths, "L" * 2 * cols, 8.0, 9.8, header=False, ruled=False, label_columns=frozenset(2 * k for k in range(cols))
        )
        rows = []
        for r in range(n):
            row: list[Any] = []
            for col in range(cols):
                k = col * n + r
                label: Cell = pairs[k][0] if k < len(pairs) else ""
                value: Cell = pairs[k][1] if k < len(pairs) else ""
                row += [self._cell(label, spec, False, 2 * col), self._cell(value, spec, False, 2 * col + 1)]
            rows.append(row)
        return self.classes["Grid"](spec, self.fonts, rows, frozenset())

    def _cell(self, value: Cell, spec: GridSpec, bold: bool, j: int) -> Any:
        """Lines of text wrapped to the column, or rich text where the cell has subscripts or bold runs.

        Plain text longer than :data:`_CELL_MAX_LINES` lines is cut short with an ellipsis: a row
        never outgrows a sheet. The package prints such text in full elsewhere (a wall's label under
        its inputs, see :mod:`engine.calc_package`).
        """
        if not isinstance(value, str) and all(not r.sub and not r.bold for r in value):
            value = "".join(r.text for r in value)
        label = j in spec.label_columns
        size = spec.size - 1.0 if label else spec.size
        width = spec.widths[j] - 2 * _CELL_PAD
        if isinstance(value, str):
            font = self.fonts.bold if bold else self.fonts.regular
            lines: list[str] = []
            for part in self.text.glyphs(value).split("\n"):
                if _width(part, font, size) <= width:
                    lines.append(part)
                else:
                    lines += _wrap_plain(part, font, size, width, widest_word=spec.widths[j])
                if len(lines) > _CELL_MAX_LINES:
                    break
            if len(lines) > _CELL_MAX_LINES:
                lines = lines[:_CELL_MAX_LINES]
                lines[-1] = _clip(lines[-1] + _ELLIPSIS, font, size, width)
            return lines
        style = TextStyle(size=size, leading=spec.leading, bold=bold, space_after=0.0, color="grey" if label else "ink")
        return self.rich(value, style)

    def equation(self, eq: Equation) -> Any:
        """One line per step, ``symbol = formula = numbers = result``, wrapped only at an operator, with
        the clause in the left margin column and the result repeated in the right-hand column."""
        main = [Span(r.text, bold=True, sub=r.sub) for r in eq.symbol]
        for part in (eq.formula, eq.numbers):
            if part is not None:
                main += [Span(" = "), *_operator_breaks(_spans(part))]
        main += [Span(" = "), *_spans(eq.result)]
        shown = eq.result if eq.column is None else eq.column
        result = [replace(sp, bold=True) for sp in _spans(shown)]
        note = _spans(eq.note) if eq.note else []
        return self.classes["CalcLine"](eq.clause, main, result, note, self.fonts, self.text)

    def drawing_row(self, row: DrawingRow) -> Any:
        from reportlab.platypus import Table as RLTable
        from reportlab.platypus import TableStyle

        sketch = self.classes["Sketch"]
        cells = [sketch(d, self.fonts, self.text) for d in row.drawings]
        table = RLTable([cells], colWidths=[d.width + 5 for d in row.drawings])
        table.setStyle(
            TableStyle(
                [
                    ("VALIGN", (0, 0), (-1, -1), "TOP"),
                    ("LEFTPADDING", (0, 0), (-1, -1), 0),
                    ("RIGHTPADDING", (0, 0), (-1, -1), 5),
                    ("TOPPADDING", (0, 0), (-1, -1), 0),
                    ("BOTTOMPADDING", (0, 0), (-1, -1), 0),
                ]
            )
        )
        table.hAlign = "LEFT"
        return table


# ---------------------------------------------------------------------------------------------
# Sheets: the title block on every page
# ---------------------------------------------------------------------------------------------


def _page_size(units: str) -> tuple[float, float]:
    from reportlab.lib.pagesizes import A4, letter

    return letter if units == "US" else A4


def _canvas_class(package: Package, fonts: _Fonts) -> type:
    from reportlab.pdfgen.canvas import Canvas

    class SheetCanvas(Canvas):
        """Keeps every page until the end, then draws each title strip with the sheet count, the
        contents' sheet numbers, the outline entries and the links (all known only at the end)."""

        def __init__(self, *args: Any, **kwargs: Any) -> None:
            super().__init__(*args, **kwargs)
            self._kl_pages: list[dict[str, Any]] = []
            self._kl_subject = ""
            self._kl_starts: dict[str, int] = {}
            self._kl_numbers: list[tuple[int, float, float, tuple[tuple[str, str], ...]]] = []
            self._kl_marks: list[tuple[int, str, str, int]] = []
            self._kl_links: list[tuple[int, tuple[float, float, float, float], str]] = []

        def showPage(self) -> None:  # noqa: N802 - reportlab's name
            self._kl_pages.append(dict(self.__dict__))
            self._startPage()

        def save(self) -> None:
            total = len(self._kl_pages)
            starts, numbers, marks, links = self._kl_starts, self._kl_numbers, self._kl_marks, self._kl_links
            for n, state in enumerate(self._kl_pages, start=1):
                self.__dict__.update(state)
                self.setFont(fonts.regular, 8.0)
                for page, x, y, refs in numbers:
                    if page == n:
                        where = "; ".join(f"{words} {starts[key]}" for words, key in refs if key in starts)
                        self.drawRightString(x, y, where)
                _title_strip(self, package, fonts, n, total, state.get("_kl_subject", ""))
                for page, key, title, level in marks:
                    if page == n:
                        self.bookmarkPage(key)
                        self.addOutlineEntry(title, key, level, closed=level > 0)
                for k, (page, rect, key) in enumerate(links):
                    if page == n and key in starts:
                        self.linkRect("", key, rect, relative=0, thickness=0, name=f"klLink{k}")
                super().showPage()
            self.showOutline()
            super().save()

    return SheetCanvas


def _fit(c: Any, text: str, font: str, size: float, width: float, minimum: float = TEXT_FLOOR) -> tuple[str, float]:
    """Shrink the font (down to ``minimum``) and then shorten the text so that it fits ``width``."""
    while size > minimum and _width(text, font, size) > width:
        size -= 0.5
    return _clip(text, font, size, width), size


_STRIP_FORM = "klTitleStrip"


def _title_strip(c: Any, package: Package, fonts: _Fonts, sheet: int, total: int, subject: str) -> None:
    """Draw the title strip across the top of the sheet and the print line at its foot.

    The strip, left to right: the sheet's number in a dark tab ("Sheet N of M"), the sheet's subject
    (the wall) over the project's name and job number, then a narrow column of sign-off (by, checked,
    revision, date); optionally a small seal box at the right end. Everything but the tab and the
    subject is the same on every sheet: drawn once into a PDF form and placed on each page.
    """
    if not getattr(c, "_kl_form_ready", False):
        c.beginForm(_STRIP_FORM)
        _strip_fields(c, package, fonts, static=True, subject="", sheet="")
        c.endForm()
        c._kl_form_ready = True
    c.doForm(_STRIP_FORM)
    _strip_fields(c, package, fonts, static=False, subject=subject, sheet=f"Sheet {sheet} of {total}")


_TAB_WIDTH = 74.0
_SIGN_WIDTH = 150.0


def _strip_fields(c: Any, package: Package, fonts: _Fonts, static: bool, subject: str, sheet: str) -> None:
    page_w, page_h = c._pagesize
    tb = package.title
    glyph = _Text(fonts).glyphs
    x0 = (page_w - CONTENT_WIDTH) / 2.0
    y_top = page_h - MARGIN_TOP
    y0 = y_top - STRIP_HEIGHT
    x_end = x0 + CONTENT_WIDTH - (SMALL_SEAL if package.seal_every_sheet else 0.0)
    x_sign = x_end - _SIGN_WIDTH
    c.saveState()
    if not static:
        # the tab: sheet number, white on dark, at the strip's left end
        c.setFillColorRGB(0.16, 0.22, 0.30)
        c.rect(x0, y0, _TAB_WIDTH, STRIP_HEIGHT, stroke=0, fill=1)
        c.setFillColorRGB(1, 1, 1)
        words, of = sheet.split(" of ") if " of " in sheet else (sheet, "")
        text_obj = c.beginText()  # one text object, so that the sheet reads "Sheet N of M" when extracted
        for string, font, size, y in (
            ("Sheet", fonts.regular, 7.0, y0 + STRIP_HEIGHT - 13.0),
            (words.replace("Sheet ", ""), fonts.bold, 15.0, y0 + 17.0),
            (f"of {of}", fonts.regular, 7.0, y0 + 6.0),
        ):
            text_obj.setFont(font, size)
            text_obj.setTextOrigin(x0 + _TAB_WIDTH / 2 - _width(string, font, size) / 2, y)
            text_obj.textOut(string + " ")
        c.drawText(text_obj)
        c.setFillColorRGB(0, 0, 0)
        text, size = _fit(c, glyph(subject), fonts.bold, 11.0, x_sign - x0 - _TAB_WIDTH - 14)
        c.setFont(fonts.bold, size)
        c.drawString(x0 + _TAB_WIDTH + 8, y0 + STRIP_HEIGHT - 16.0, text)
        c.restoreState()
        return
    c.setStrokeColorRGB(0.16, 0.22, 0.30)
    c.setLineWidth(1.2)
    c.line(x0, y0, x0 + CONTENT_WIDTH, y0)  # a rule under the whole strip
    c.setLineWidth(0.4)
    c.line(x_sign, y0 + 4, x_sign, y_top - 4)
    c.setFillColorRGB(0, 0, 0)
    # project and job under the subject
    left = x0 + _TAB_WIDTH + 8
    room = x_sign - left - 6
    job = "Job " + (tb.project_number or "—") + (f" · {tb.client}" if tb.client else "")
    job, size = _fit(c, glyph(job), fonts.regular, 7.0, room)
    c.setFont(fonts.regular, size)
    c.setFillColorRGB(0.3, 0.3, 0.3)
    c.drawString(left, y0 + 6.0, job)
    c.setFillColorRGB(0, 0, 0)
    name, size = _fit(c, glyph(tb.project_name), fonts.regular, 8.5, room)
    c.setFont(fonts.regular, size)
    c.drawString(left, y0 + 17.0, name)
    # sign-off column: label and value per line
    rows = (
        ("by", tb.prepared_by or "—"),
        ("checked", tb.checked_by or "—"),
        ("rev.", tb.revision or "0"),
        ("rev. date", tb.date or "—"),
    )
    for k, (label, value) in enumerate(rows):
        y = y_top - 11.0 - 10.8 * k
        c.setFillColorRGB(0.35, 0.35, 0.35)
        c.setFont(fonts.regular, 6.5)
        c.drawString(x_sign + 5, y, label)
        c.setFillColorRGB(0, 0, 0)
        value, size = _fit(c, glyph(value), fonts.regular, 7.5, _SIGN_WIDTH - 48)
        c.setFont(fonts.regular, size)
        c.drawString(x_sign + 42, y, value)
    if package.seal_every_sheet:
        c.setLineWidth(0.6)
        c.rect(x_end + 3, y0 + 2, SMALL_SEAL - 3, STRIP_HEIGHT - 4, stroke=1, fill=0)
        c.setFont(fonts.regular, 6.5)
        c.setFillColorRGB(0.4, 0.4, 0.4)
        c.drawCentredString(x_end + 1.5 + SMALL_SEAL / 2, y0 + 5, "seal")
    # the print line at the foot of the sheet
    c.setFillColorRGB(0.3, 0.3, 0.3)
    c.setFont(fonts.regular, 6.5)
    printed = f"Printed {tb.printed} with {tb.program}" if tb.printed else f"Printed with {tb.program}"
    c.drawString(x0, FOOTER_Y, glyph(printed))
    c.drawRightString(x0 + CONTENT_WIDTH, FOOTER_Y, glyph(_fit(c, tb.project_name, fonts.regular, 6.5, 200)[0]))
    c.restoreState()


def _frame_geometry(units: str) -> tuple[float, float, float, float, float, float]:
    page_w, page_h = _page_size(units)
    x = (page_w - CONTENT_WIDTH) / 2.0
    y = MARGIN_BOTTOM
    return page_w, page_h, x, y, CONTENT_WIDTH, page_h - MARGIN_TOP - STRIP_HEIGHT - STRIP_GAP - y


# ---------------------------------------------------------------------------------------------
# Public functions
# ---------------------------------------------------------------------------------------------


def render_package(package: Package) -> bytes:
    """Lay out ``package`` and return the PDF bytes."""
    return _render(package)[0]


def sheet_fill(package: Package) -> tuple[float, ...]:
    """Lay out ``package`` and return, per sheet in order, the share of its body frame (below the title
    strip, above the footer) that holds content, from 0 (blank) to 1 (full)."""
    return _render(package)[1]


def _render(package: Package) -> tuple[bytes, tuple[float, ...]]:
    """The PDF bytes and each sheet's filled share of its body frame (see :func:`sheet_fill`)."""
    from reportlab import rl_config
    from reportlab.platypus import BaseDocTemplate, Frame, PageTemplate

    fill: list[float] = []

    class SheetDoc(BaseDocTemplate):
        def handle_pageEnd(self) -> None:  # noqa: N802 - reportlab's name
            f = self.frame
            fill.append(min(max((f._y2 - f._y) / (f._y2 - f._y1), 0.0), 1.0))
            super().handle_pageEnd()

    # Binary (not ASCII85) page streams: the pure-Python encoder costs a noticeable part of a large
    # package, and only this module writes PDFs in Kernline.
    rl_config.useA85 = 0

    fonts = _fonts()
    page_w, page_h, fx, fy, fw, fh = _frame_geometry(package.units)
    buffer = io.BytesIO()
    doc = SheetDoc(
        buffer,
        pagesize=(page_w, page_h),
        leftMargin=fx,
        rightMargin=page_w - fx - fw,
        topMargin=page_h - fy - fh,
        bottomMargin=fy,
        title=f"Calculation package: {package.title.project_name}",
        author=package.title.prepared_by,
        subject="Strip footings under shear walls: overturning, sliding, soil bearing"
        + (
            ", and the footing's concrete design (ACI 318-19)"
            if any(s.key.startswith("concrete:") for s in package.sections)
            else ""
        ),
        creator=package.title.program,
        invariant=0,  # the PDF's creation date is the date of this print
    )
    frame = Frame(fx, fy, fw, fh, leftPadding=0, rightPadding=0, topPadding=0, bottomPadding=0, id="body")
    doc.addPageTemplates([PageTemplate(id="sheet", frames=[frame])])
    builder = _Builder(fonts)
    story: list[Any] = []
    for section in package.sections:
        story += builder.section(section, package)
    story = story[1:]  # no page break before the first section
    doc.build(story, canvasmaker=_canvas_class(package, fonts))
    return buffer.getvalue(), tuple(fill)


def _unpack(project: Any) -> tuple[Project, str | None]:
    """Accept a Project or a ProjectDocument (whose raw dict may name the geotechnical report)."""
    raw = getattr(project, "raw", None)
    inner = getattr(project, "project", None)
    if inner is not None and isinstance(raw, dict):
        soil = raw.get("soil")
        report = soil.get("report") if isinstance(soil, dict) else None
        return inner, report if isinstance(report, str) else None
    return project, None


def _wall_list(wall_ids: Sequence[str] | str | None) -> list[str] | None:
    if wall_ids is None:
        return None
    if isinstance(wall_ids, str):
        return [w.strip() for w in wall_ids.split(",")]
    return [str(w) for w in wall_ids]


def render_report(project: Any, wall_ids: Sequence[str] | str | None = None, **options: Any) -> bytes:
    """The calculation package of ``project`` (a Project or a ProjectDocument) as PDF bytes.

    Args:
        project: the project; a ProjectDocument also supplies ``soil.report`` from its raw file.
        wall_ids: the walls to include (ids, in order; a comma-separated string is accepted); all when None.
        options: passed to :func:`engine.calc_package.build_package` (soil_report, revision, issued, checked_by).

    Raises:
        InputError: an unknown wall id or an empty selection.
    """
    return render_package(report_package(project, wall_ids, **options))


def report_package(project: Any, wall_ids: Sequence[str] | str | None = None, **options: Any) -> Package:
    """The calculation package :func:`render_report` prints, as the document model (same arguments)."""
    model, report = _unpack(project)
    if report is not None:
        options.setdefault("soil_report", report)
    return build_package(model, _wall_list(wall_ids), **options)


def write_report(
    project: Any, output: str | os.PathLike[str], wall_ids: Sequence[str] | str | None = None, **options: Any
) -> None:
    """Write the calculation package to ``output`` atomically (see :mod:`engine.file_safety`).

    The output path is checked before the package is laid out, so a path that cannot be written is
    refused at once.

    Raises:
        InputError: an unknown wall id.
        FilePathError: an output path that cannot be written (a folder, a device, a read-only file,
            a missing or read-only folder; the message says which).
    """
    check_writable(output)
    data = render_report(project, wall_ids, **options)
    atomic_write_bytes(output, data)


__all__ = ["render_package", "render_report", "write_report"]

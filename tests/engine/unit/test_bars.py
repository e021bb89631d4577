"""Bar names and bar texts (engine.concrete.bars): parsing, aliases, errors and the practical lists.

Bar dimensions are those of ASTM A615/A615M Table 1 (R; checked value by value in
tests/engine/verification/test_aci318_19_wall_footing_rules.py).
"""

from __future__ import annotations

import pytest
from kernline.engine.concrete.bars import (
    BARS,
    bar,
    counted_text,
    parse_bar,
    parse_counted,
    parse_spaced,
    practical_bars,
    practical_spacings,
    spaced_text,
)
from kernline.engine.errors import InputError

INCH = 0.0254


@pytest.mark.parametrize("text", ["#5", "# 5", " #5 ", "No. 16", "No.16", "no 16", "NO.16"])
def test_parse_bar_names_and_soft_metric_aliases(text):
    assert parse_bar(text) is BARS[5]


@pytest.mark.parametrize(("size", "metric"), [(3, 10), (4, 13), (6, 19), (7, 22), (8, 25), (11, 36)])
def test_soft_metric_alias_names_the_same_bar(size, metric):
    assert parse_bar(f"No. {metric}") is parse_bar(f"#{size}")


@pytest.mark.parametrize(
    ("text", "words"),
    [
        ("#2", "not a bar size"),
        ("#12", "not a bar size"),
        ("No. 5", 'write "#5"'),
        ("No. 40", "not a soft-metric bar"),
        ("5", "not a bar"),
        ("bar 5", "not a bar"),
        ("", "not a bar"),
    ],
)
def test_parse_bar_refuses_with_one_line(text, words):
    with pytest.raises(InputError) as caught:
        parse_bar(text)
    assert words in caught.value.problem
    assert caught.value.field == ""
    assert "\n" not in str(caught.value)


def test_parse_bar_refuses_what_is_not_text():
    with pytest.raises(InputError):
        parse_bar(5)  # type: ignore[arg-type]


@pytest.mark.parametrize(
    ("text", "size", "spacing"),
    [
        ("#5 @ 12 in", 5, 12 * INCH),
        ("#5@12in", 5, 12 * INCH),
        ("#7 @ 10 in", 7, 10 * INCH),
        ("No. 22 @ 225 mm", 7, 0.225),
        ("No.16 @ 0.3 m", 5, 0.3),
        ("#4 @ 1 ft", 4, 12 * INCH),
        ("#4 @ 1'-6\"", 4, 18 * INCH),
    ],
)
def test_parse_spaced_reads_any_length_unit(text, size, spacing):
    the_bar, s = parse_spaced(text)
    assert the_bar is BARS[size]
    assert s == pytest.approx(spacing, rel=1e-12)


@pytest.mark.parametrize(
    ("text", "words"),
    [
        ("#5", "no spacing"),
        ("#5 @ 12", "the spacing of"),
        ("#5 @ 12 kip", "the spacing of"),
        ("#5 @ 0 in", "greater than zero"),
        ("#13 @ 12 in", "not a bar size"),
    ],
)
def test_parse_spaced_refuses(text, words):
    with pytest.raises(InputError) as caught:
        parse_spaced(text)
    assert words in caught.value.problem
    assert "\n" not in str(caught.value)


@pytest.mark.parametrize(("text", "count", "size"), [("3 #5", 3, 5), ("3-#5", 3, 5), ("2 No. 13", 2, 4), ("10 #8", 10, 8)])
def test_parse_counted(text, count, size):
    assert parse_counted(text) == (count, BARS[size])


@pytest.mark.parametrize(("text", "words"), [("#5", "not a number of bars"), ("0 #5", "at least 1"), ("3 #2", "not a bar size")])
def test_parse_counted_refuses(text, words):
    with pytest.raises(InputError) as caught:
        parse_counted(text)
    assert words in caught.value.problem


def test_bar_by_size_and_its_names():
    five = bar(5)
    assert (five.name, five.metric_name, str(five)) == ("#5", "No. 16", "#5")
    with pytest.raises(InputError):
        bar(12)


def test_practical_list_is_4_to_8_at_whole_inches():
    assert [b.size for b in practical_bars()] == [4, 5, 6, 7, 8]
    spacings = [s / INCH for s in practical_spacings()]
    assert spacings == pytest.approx([float(i) for i in range(4, 19)])


def test_texts_for_drawings():
    assert spaced_text(BARS[7], 10 * INCH) == "#7 @ 10 in"
    assert spaced_text(BARS[7], 10.5 * INCH) == "#7 @ 10.5 in"
    assert spaced_text(BARS[7], 0.254, "SI") == "No. 22 @ 254 mm"
    assert counted_text(3, BARS[5]) == "3 #5"
    assert counted_text(3, BARS[5], "SI") == "3 No. 16"
    assert parse_spaced(spaced_text(BARS[6], 9 * INCH)) == (BARS[6], pytest.approx(9 * INCH))

"""The calculation package uses the fonts shipped in resources/, not whatever the machine has."""

from kernline.engine.report import FONT_FOLDER, _fonts
from kernline.engine.resources import resource_path


def test_shipped_dejavu_is_found_and_used():
    folder = resource_path(FONT_FOLDER)
    assert (folder / "DejaVuSans.ttf").is_file() and (folder / "DejaVuSans-Bold.ttf").is_file()
    assert (folder / "LICENSE-DejaVu.txt").is_file()
    assert _fonts().unicode  # the symbols (≥, Σ, γ) print as themselves

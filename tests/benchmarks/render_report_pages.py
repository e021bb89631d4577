"""Render sheets of the demo project's calculation package to PNG (a script, not a test).

By default writes images for the README into ``resources/report/``: the cover sheet, the first
stability sheet of one wall and that wall's concrete design sheet. ``--all DIR`` renders every sheet into DIR instead, for looking the whole
package over. Needs ``pdftoppm`` (Debian package poppler-utils).

Run: python tests/benchmarks/render_report_pages.py [--wall S2] [--dpi 80] [--all /tmp/sheets]
"""

from __future__ import annotations

import argparse
import io
import re
import shutil
import subprocess
import sys
import tempfile
from pathlib import Path

from kernline.engine.project_file import load_project
from kernline.engine.report import render_report
from kernline.engine.resources import resource_path

ROOT = Path(__file__).resolve().parents[2]
OUT = ROOT / "resources" / "report"


def subjects(pdf: bytes) -> list[str]:
    """The sheet subject in each page's title strip (the strip is drawn last: its subject ends the text)."""
    from pypdf import PdfReader

    out = []
    for page in PdfReader(io.BytesIO(pdf)).pages:
        text = re.sub(r"\s+", " ", page.extract_text() or "")
        m = re.search(r"Sheet \d+ of \d+ (.*?)\s*$", text)
        out.append(m.group(1) if m else "")
    return out


def render_page(pdf_path: Path, page: int, target: Path, dpi: int) -> None:
    """Render one page (1-based) to ``target`` (PNG)."""
    stem = target.with_suffix("")
    subprocess.run(
        ["pdftoppm", "-r", str(dpi), "-f", str(page), "-l", str(page), "-png", "-singlefile", str(pdf_path), str(stem)],
        check=True,
    )


def main() -> int:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--wall", default="S2", help="the wall whose first sheet is rendered (default S2)")
    parser.add_argument("--dpi", type=int, default=80)
    parser.add_argument("--all", metavar="DIR", help="render every sheet into DIR instead of the README images")
    args = parser.parse_args()
    if shutil.which("pdftoppm") is None:
        print("pdftoppm is not installed (Debian package poppler-utils)", file=sys.stderr)
        return 1

    document = load_project(resource_path("demo.kernline"))
    pdf = render_report(document)
    with tempfile.TemporaryDirectory() as folder:
        pdf_path = Path(folder) / "package.pdf"
        pdf_path.write_bytes(pdf)
        names = subjects(pdf)
        if args.all:
            target = Path(args.all)
            target.mkdir(parents=True, exist_ok=True)
            for n in range(1, len(names) + 1):
                render_page(pdf_path, n, target / f"sheet-{n:02d}.png", args.dpi)
            print(f"wrote {len(names)} sheets to {target}")
            return 0
        subject = f"Wall {args.wall}: stability"
        if subject not in names:
            print(f"the demo project has no wall {args.wall}", file=sys.stderr)
            return 1
        OUT.mkdir(parents=True, exist_ok=True)
        pages = {"package-cover.png": 1, "package-wall-sheet.png": names.index(subject) + 1}
        concrete = f"Wall {args.wall}: concrete"
        if concrete in names:
            pages["package-concrete-sheet.png"] = names.index(concrete) + 1
        for name, page in pages.items():
            render_page(pdf_path, page, OUT / name, args.dpi)
            print(f"wrote {OUT / name} (sheet {page} of {len(names)}, {(OUT / name).stat().st_size / 1024:.0f} KiB)")
    return 0


if __name__ == "__main__":
    sys.exit(main())

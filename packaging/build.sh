#!/usr/bin/env bash
# One-folder build of Kernline (window + command) with PyInstaller, then its smoke check.
#   bash packaging/build.sh            build into packaging/dist/kernline and smoke-check it
# Linux build here; the same spec builds on Windows and macOS (see packaging/README.md).
set -euo pipefail
cd "$(dirname "$0")/.."
python3 -m pip install --disable-pip-version-check -q -e . "pyinstaller>=6.10,<7"
QT_QPA_PLATFORM=offscreen python3 packaging/make_icons.py >/dev/null
start=$(date +%s)
python3 -m PyInstaller --noconfirm --clean --log-level WARN \
  --distpath packaging/dist --workpath packaging/build packaging/kernline.spec
end=$(date +%s)
echo "build time: $((end - start)) s"
echo "size: $(du -sh packaging/dist/kernline | cut -f1) ($(du -sb packaging/dist/kernline | cut -f1) bytes)"
bash packaging/smoke.sh packaging/dist/kernline

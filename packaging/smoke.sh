#!/usr/bin/env bash
# Smoke check of a frozen build: the program starts offscreen, opens the demo, writes a calculation
# package and a schedule, and exits 0.   bash packaging/smoke.sh packaging/dist/kernline
set -euo pipefail
dist="$(cd "${1:-packaging/dist/kernline}" && pwd)"
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT
cd "$work"
export QT_QPA_PLATFORM=offscreen

"$dist/kernline" --version
"$dist/kernline" demo --save demo.kernline
set +e
"$dist/kernline" check demo.kernline > check.txt; code=$?
set -e
[ "$code" -le 1 ] || { echo "check exited $code"; cat check.txt; exit 1; }
grep -q "licensed engineer" check.txt
"$dist/kernline" size demo.kernline --write > /dev/null
"$dist/kernline" check demo.kernline > /dev/null          # every wall passes once sized
"$dist/kernline" report demo.kernline -o demo.pdf
head -c 5 demo.pdf | grep -q "%PDF-"
"$dist/kernline" schedule demo.kernline -o demo.csv
head -1 demo.csv | sed "s/^\xef\xbb\xbf//" | grep -q "^Wall,"  # the CSV starts with a UTF-8 byte-order mark
# the window: opens the demo offscreen and closes itself
KERNLINE_EXIT_AFTER_MS=1500 "$dist/kernline" demo
echo "smoke check passed: version, demo, check, size --write, report ($(stat -c %s demo.pdf) bytes), schedule, window"

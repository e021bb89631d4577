#!/usr/bin/env bash
# Register a one-folder build with the desktop for the current user: menu entry, icon, file type.
#   bash packaging/linux/install-desktop.sh packaging/dist/kernline
set -euo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
dist="$(cd "${1:?path to the built kernline folder}" && pwd)"
apps="${XDG_DATA_HOME:-$HOME/.local/share}/applications"
bin="$HOME/.local/bin"
mkdir -p "$apps" "$bin"
ln -sf "$dist/kernline" "$bin/kernline"
ln -sf "$dist/kernline-window" "$bin/kernline-window"
for size in 16 24 32 48 64 128 256; do
  icon="$dist/_internal/resources/icons/kernline-$size.png"
  [ -f "$icon" ] && xdg-icon-resource install --novendor --size "$size" "$icon" kernline
done
xdg-mime install --novendor "$here/kernline-mime.xml"
install -m 644 "$here/kernline.desktop" "$apps/kernline.desktop"
xdg-mime default kernline.desktop application/x-kernline-project
update-desktop-database "$apps" 2>/dev/null || true
echo "installed: kernline in $bin, menu entry, .kernline file type"

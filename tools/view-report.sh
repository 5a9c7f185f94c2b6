#!/usr/bin/env bash
# Renders a design-review report (rotordrive report RIG.json -o FILE.html) in headless Chromium: one screenshot PNG per
# section (each section shown alone), to check by eye that every inline plot shows. Not run by CI: it needs a browser from
# the OS packages (apt-get install -y chromium). Works offline: the report references nothing outside itself.
#
#   tools/view-report.sh REPORT.html OUTDIR
set -euo pipefail
report=${1:?usage: tools/view-report.sh REPORT.html OUTDIR}
out=${2:?usage: tools/view-report.sh REPORT.html OUTDIR}
browser=$(command -v chromium || command -v chromium-browser || true)
if [[ -z "$browser" ]]; then
  echo "view-report: no chromium found; install it with: apt-get install -y chromium" >&2
  exit 2
fi
mkdir -p "$out"
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
for id in $(grep -o '<section id="[^"]*"' "$report" | sed 's/.*id="\([^"]*\)"/\1/'); do
  shot="$out/$id.png"
  if [[ -e "$shot" ]]; then
    echo "view-report: $shot already exists; name another folder" >&2
    exit 2
  fi
  # The same page with every other section hidden, so the section starts at the top of the screenshot.
  sed "s|</head>|<style>header, section:not(#$id) { display: none; }</style></head>|" "$report" > "$work/$id.html"
  "$browser" --headless --no-sandbox --disable-gpu --disable-quic --no-first-run --disable-background-networking \
    --disable-component-update --disable-sync --user-data-dir="$work/profile" --hide-scrollbars \
    --window-size=1100,3000 --screenshot="$shot" "file://$work/$id.html" 2>/dev/null
  echo "$shot"
done

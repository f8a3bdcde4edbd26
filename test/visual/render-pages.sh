#!/bin/sh
# Visual check of the printed documents (not part of the test run): renders the invented demo
# site's report, door notice and eyewear sheet with the headless command, then page 1 of each
# to PNG with poppler's pdftoppm, for a person to look at.
#
#   sh test/visual/render-pages.sh [out-folder] [A4|Letter] [SI|ANSI]
#
# Default folder: test/artifacts/print (ignored by git). Needs poppler-utils (pdftoppm).
set -eu
cd "$(dirname "$0")/../.."
out="${1:-test/artifacts/print}"
paper="${2:-A4}"
units="${3:-SI}"
command -v pdftoppm >/dev/null 2>&1 || { echo "pdftoppm not found: apt-get install -y poppler-utils" >&2; exit 1; }
mkdir -p "$out/pdf"
npm run --silent report -- --demo --out "$out/pdf" --paper "$paper" --units "$units" >/dev/null
for f in "$out"/pdf/*.pdf; do
  name=$(basename "$f" .pdf)
  pdftoppm -png -r 80 -f 1 -l 1 -singlefile "$f" "$out/$name-page1"
  echo "$out/$name-page1.png"
done

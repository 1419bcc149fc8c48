#!/usr/bin/env bash
# Regenerates docs/validation.md from the code (tools/PhaseSlope.Validation): every number on the
# page is computed by the built generator from the current source and the named reference values.
# Usage: bash docs/make-validation.sh           write docs/validation.md
#        bash docs/make-validation.sh --check   write to a temporary file and compare; exit 1 (with
#                                               the difference) when the committed page is stale
set -euo pipefail
cd "$(dirname "$0")/.."
check=false
case "${1:-}" in
  "") ;;
  --check) check=true ;;
  *) echo "usage: bash docs/make-validation.sh [--check]" >&2; exit 2 ;;
esac

dotnet build tools/PhaseSlope.Validation --nologo -v quiet > /dev/null
generator=tools/PhaseSlope.Validation/bin/Debug/net10.0/PhaseSlope.Validation.dll
page=docs/validation.md

if $check; then
  fresh=$(mktemp)
  trap 'rm -f "$fresh"' EXIT
  dotnet "$generator" "$fresh"
  if ! diff -u "$page" "$fresh" > "$fresh.diff"; then
    echo "docs/validation.md is not what the code gives today; run: bash docs/make-validation.sh" >&2
    head -n 60 "$fresh.diff" >&2
    rm -f "$fresh.diff"
    exit 1
  fi
  rm -f "$fresh.diff"
  echo "docs/validation.md is up to date"
else
  tmp=$(mktemp "$page.XXXXXX")
  trap 'rm -f "$tmp"' EXIT
  dotnet "$generator" "$tmp"
  mv "$tmp" "$page"
  echo "wrote $page"
fi

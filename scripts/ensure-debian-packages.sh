#!/usr/bin/env bash
# The tests need three Debian packages: Chromium for the browser tests, poppler-utils
# (pdftotext, pdftoppm, pdfinfo) to read back the PDF documents, and postgresql (initdb, pg_ctl)
# for the server tests' run on PostgreSQL, in a throwaway cluster. Install what is missing when
# running as root; otherwise say exactly what to run and fail. Never let tests be skipped quietly.
#
#   bash scripts/ensure-debian-packages.sh                 # every package below
#   bash scripts/ensure-debian-packages.sh poppler-utils   # only these
set -euo pipefail

# Each package and what it must provide: a path, or commands looked up on PATH.
declare -A provides=(
  [chromium]="${CHROMIUM_PATH:-/usr/bin/chromium}"
  [poppler-utils]="pdftotext pdftoppm pdfinfo"
  # Debian keeps the server's programs off the PATH, under the version's folder.
  [postgresql]="/usr/lib/postgresql/*/bin/pg_ctl"
)

if [ "$#" -gt 0 ]; then
  wanted=("$@")
else
  wanted=(chromium poppler-utils postgresql)
fi

present() {
  local thing
  for thing in $1; do
    if [[ "$thing" == *'*'* ]]; then
      compgen -G "$thing" >/dev/null || return 1
    elif [[ "$thing" == */* ]]; then
      [ -x "$thing" ] || return 1
    else
      command -v "$thing" >/dev/null 2>&1 || return 1
    fi
  done
}

missing=()
for package in "${wanted[@]}"; do
  if [ -z "${provides[$package]+set}" ]; then
    echo "ensure-debian-packages: no check for '$package' (known: ${!provides[*]})" >&2
    exit 2
  fi
  present "${provides[$package]}" || missing+=("$package")
done

if [ "${#missing[@]}" -eq 0 ]; then
  exit 0
fi
if [ "$(id -u)" = "0" ]; then
  echo "Missing Debian packages: ${missing[*]}. Installing them..."
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "${missing[@]}" >/dev/null
  exit 0
fi
echo "The tests need Debian packages that are not installed: ${missing[*]}. Install them with:" >&2
echo "  sudo apt-get update && sudo apt-get install -y ${missing[*]}" >&2
exit 1

#!/usr/bin/env bash
# Browser tests drive Debian's Chromium. Install it when running as root; otherwise say exactly
# what to run. Never let the browser tests be skipped quietly.
set -euo pipefail
chromium_bin="${CHROMIUM_PATH:-/usr/bin/chromium}"
if [ -x "$chromium_bin" ]; then
  exit 0
fi
if [ "$(id -u)" = "0" ]; then
  echo "Chromium is missing: installing Debian's chromium package..."
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium >/dev/null
  exit 0
fi
echo "The browser tests need Chromium at $chromium_bin. Install it with:" >&2
echo "  sudo apt-get update && sudo apt-get install -y chromium" >&2
exit 1

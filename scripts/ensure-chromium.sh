#!/usr/bin/env bash
# Run before `npm test` (npm's pretest): the browser tests drive Debian's chromium.
# Installs it with apt-get when it is missing and we may (root on Debian); otherwise
# says what to install. Quiet when chromium is already there.
set -euo pipefail
if command -v chromium >/dev/null 2>&1 || [ -x /usr/bin/chromium ]; then exit 0; fi
if [ "$(id -u)" = "0" ] && command -v apt-get >/dev/null 2>&1; then
  echo "pretest: installing Debian's chromium for the browser tests (apt-get install chromium)" >&2
  export DEBIAN_FRONTEND=noninteractive
  apt-get update -qq >/dev/null
  apt-get install -y -qq chromium >/dev/null
  exit 0
fi
echo "pretest: the browser tests need chromium at /usr/bin/chromium: install it (Debian: sudo apt-get install chromium) and run npm test again" >&2
exit 1

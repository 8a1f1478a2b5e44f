#!/usr/bin/env bash
# Installs Debian's chromium for the browser tests when it is not there yet (needs root or sudo).
# README and .ci/run both call this one script.
set -euo pipefail
if [ -x /usr/bin/chromium ]; then
  echo "chromium is already installed at /usr/bin/chromium."
  exit 0
fi
SUDO=""
if [ "$(id -u)" -ne 0 ]; then SUDO="sudo"; fi
echo "Installing Debian's chromium for the browser tests…"
$SUDO apt-get update -qq
DEBIAN_FRONTEND=noninteractive $SUDO apt-get install -y -qq chromium >/dev/null
echo "chromium installed at /usr/bin/chromium."

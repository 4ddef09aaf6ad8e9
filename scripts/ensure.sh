#!/usr/bin/env bash
# Install what a fresh Debian machine with Node 20 lacks: Debian packages the product needs, then
# node_modules from the lock file. Safe to run again: it only acts on what is missing or stale.
set -euo pipefail
cd "$(dirname "$0")/.."

# Debian packages needed by the product and its tests: the private database server, and Chromium
# for the browser tests (driven by playwright-core; never `npx playwright install`).
APT_PACKAGES=(mariadb-server chromium)
missing=()
for p in "${APT_PACKAGES[@]}"; do
  dpkg -s "$p" >/dev/null 2>&1 || missing+=("$p")
done
if [ "${#missing[@]}" -gt 0 ]; then
  echo "panelpoint: installing Debian packages: ${missing[*]}" >&2
  SUDO=""; [ "$(id -u)" -ne 0 ] && SUDO="sudo"
  $SUDO apt-get update -qq
  DEBIAN_FRONTEND=noninteractive $SUDO apt-get install -y -qq "${missing[@]}" >/dev/null
fi

node_major=$(node -p 'process.versions.node.split(".")[0]')
if [ "$node_major" -lt 20 ]; then
  echo "panelpoint: Node 20 or newer is needed (found $(node --version))" >&2
  exit 1
fi

# npm ci when node_modules is missing or older than the lock file.
if [ ! -f node_modules/.package-lock.json ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  echo "panelpoint: installing npm packages (npm ci)" >&2
  npm ci --no-audit --no-fund --loglevel=error
fi

#!/usr/bin/env bash
# Install what is missing and run Panelpoint on the shipped example (the team server comes later).
set -euo pipefail
cd "$(dirname "$0")/.."
bash scripts/ensure.sh
node cli/bin/panelpoint.mjs analyze examples/models/depot-roof-r3.json

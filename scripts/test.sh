#!/usr/bin/env bash
# The whole test suite: install what is missing, lint (import boundaries), type-check, unit and
# integration tests, then print one closing line "tests: N passed, N failed, N skipped".
set -uo pipefail
cd "$(dirname "$0")/.."
bash scripts/ensure.sh || exit 1
mkdir -p .data
status=0
echo "== lint (eslint, import boundaries)"; npx eslint . || status=1
echo "== type-check (tsc; shared/ without Node types)"; npm run -s typecheck || status=1
# The browser tests serve the built web app: rebuild dist/web when it is missing or older than its sources.
if [ ! -f dist/web/index.html ] || [ -n "$(find src shared index.html vite.config.ts tsconfig.web.json package-lock.json -newer dist/web/index.html -print -quit 2>/dev/null)" ]; then
  echo "== web app (vite build: dist/web is missing or stale)"; npx vite build --logLevel warn || status=1
fi
echo "== tests (vitest)"
npx vitest run --reporter=default --reporter=json --outputFile=.data/vitest.json || status=1
echo "== reference cases (panelpoint check)"; node cli/bin/panelpoint.mjs check examples/reference --junit .data/reference-junit.xml || status=1
node -e '
  const fs = require("fs");
  let r = { numPassedTests: 0, numFailedTests: 1, numPendingTests: 0, numTodoTests: 0 };
  try { r = JSON.parse(fs.readFileSync(".data/vitest.json", "utf8")); } catch {}
  const extra = Number(process.argv[1]);
  console.log(`tests: ${r.numPassedTests} passed, ${r.numFailedTests + extra} failed, ${r.numPendingTests + r.numTodoTests} skipped`);
' "$status"
exit $status

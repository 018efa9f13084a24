#!/usr/bin/env bash
# `npm test`: the same set-up as `npm start`, then lint, typecheck, vitest, web export and Playwright at
# 390x844 and 1440x900. Ends with one line "N passed, N failed" and a non-zero exit on any failure.
set -uo pipefail
cd "$(dirname "$0")/.."
mkdir -p .tmp
bash scripts/setup.sh || { echo "set-up failed"; echo "0 passed, 1 failed"; exit 1; }

# Playwright drives Debian's Chromium, never a downloaded browser.
if [ ! -x "${CHROMIUM_PATH:-/usr/bin/chromium}" ]; then
  if [ "$(id -u)" = 0 ]; then
    echo "== installing Debian's chromium (apt-get)"
    DEBIAN_FRONTEND=noninteractive apt-get update -qq >/dev/null && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium >/dev/null
  else
    echo "Chromium not found: install it with sudo apt-get install chromium" >&2
  fi
fi

passed=0; failed=0
step() { local name=$1; shift; local t0=$SECONDS; echo "== $name"; "$@"; local rc=$?; echo "== $name: $((SECONDS - t0)) s (exit $rc)"; return $rc; }
check() { if step "$@"; then passed=$((passed + 1)); else failed=$((failed + 1)); fi; }
count_json() { # file, kind -> "passed failed" from a vitest or Playwright JSON report
  node -e '
    const fs = require("fs"); const [file, kind] = process.argv.slice(1);
    if (!fs.existsSync(file)) { console.log("0 1"); process.exit(0); }
    const r = JSON.parse(fs.readFileSync(file, "utf8"));
    if (kind === "vitest") console.log(`${r.numPassedTests} ${r.numFailedTests + (r.numFailedTestSuites || 0) + (r.numRuntimeErrorTestSuites || 0)}`);
    else { const s = r.stats || {}; console.log(`${s.expected || 0} ${(s.unexpected || 0) + (s.flaky || 0) + (r.errors || []).length}`); }
  ' "$1" "$2"
}

check lint npx eslint .
check typecheck npx tsc --noEmit

rm -f .tmp/vitest-report.json
step vitest npx vitest run --reporter=default --reporter=json --outputFile.json=.tmp/vitest-report.json
read -r vp vf < <(count_json .tmp/vitest-report.json vitest); passed=$((passed + vp)); failed=$((failed + vf))

if step web-export npx expo export -p web --output-dir dist ${EXPORT_FLAGS:-}; then
  passed=$((passed + 1))
  rm -f .tmp/playwright-report.json
  step playwright npx playwright test
  read -r pp pf < <(count_json .tmp/playwright-report.json playwright); passed=$((passed + pp)); failed=$((failed + pf))
else
  failed=$((failed + 1))
fi

echo "$passed passed, $failed failed"
[ "$failed" -eq 0 ]

#!/usr/bin/env bash
# npm test: type check, lint, vitest (unit + integration against a throwaway PostgreSQL) and Playwright
# end-to-end tests in Debian's Chromium against a production build. Stops what it started and ends with
#   tests: N passed, N failed
set -uo pipefail
cd "$(dirname "$0")/.."
source scripts/setup.sh
source scripts/s3-fake.sh

# LibreOffice (Writer, no GUI) and poppler: the document tests open the tender in a real word processor and read its PDF.
ensure_apt postgresql chromium fonts-dejavu-core fonts-liberation libreoffice-writer-nogui poppler-utils || exit 1
ensure_node_modules || exit 1

out=.data/test-output
rm -rf "$out"; mkdir -p "$out"
port=${TEST_APP_PORT:-3100}
export DATABASE_URL=$(bash scripts/db.sh url --test)
export NEXTAUTH_URL=http://127.0.0.1:$port
export NEXTAUTH_SECRET=$(random_secret)
export E2E_BASE_URL=$NEXTAUTH_URL
export NEXT_DIST_DIR=.next-test
# Mail goes to the local SMTP stand-in; the tests read what it received from $TEST_MAIL_DIR.
export SMTP_HOST=127.0.0.1 SMTP_PORT=${SMTP_TEST_PORT:-2535} SMTP_SECURITY=none
export MAIL_FROM="Stopwright tests <mail@stopwright.test>"
export TEST_MAIL_DIR=$(pwd)/.data/test-mail

server_pid=""
fake_smtp_pid=""
cleanup() {
  [ -n "$server_pid" ] && kill "$server_pid" 2>/dev/null && wait "$server_pid" 2>/dev/null
  stop_s3_fake
  rm -rf .data/s3-test
  [ -n "$fake_smtp_pid" ] && kill "$fake_smtp_pid" 2>/dev/null && wait "$fake_smtp_pid" 2>/dev/null
  bash scripts/db.sh stop --test >/dev/null 2>&1
}
trap cleanup EXIT

passed=0; failed=0
tally() { if [ "$1" = 0 ]; then passed=$((passed + 1)); echo "✓ $2"; else failed=$((failed + 1)); echo "✗ $2"; fi; }

# Route types from an earlier build name the pages as they were; the build below writes them afresh.
rm -rf .next-test/types .next-test/dev/types
echo "── type check"; node_modules/.bin/tsc --noEmit; tally $? "type check (tsc --noEmit)"
echo "── lint"; node_modules/.bin/eslint . --max-warnings=0; tally $? "lint (eslint)"

echo "── database and build"
bash scripts/db.sh start --test || exit 1
rm -rf .data/s3-test
start_s3_fake .data/s3-test "$NEXTAUTH_URL" || exit 1
# Signed links live a few seconds here, so a test can watch an old link stop working.
export FILE_LINK_SECONDS=4
node_modules/.bin/tsx scripts/migrate.ts || exit 1
if ! node_modules/.bin/next build > "$out/build.log" 2>&1; then cat "$out/build.log"; tally 1 "production build"; else tally 0 "production build"; fi

# Another server on the port would answer in place of this build.
if curl -s -o /dev/null "$NEXTAUTH_URL/api/health"; then echo "error: port $port is already in use; stop what listens there" >&2; exit 1; fi
rm -rf "$TEST_MAIL_DIR"
start_fake_smtp "$SMTP_PORT" "$TEST_MAIL_DIR" > "$out/fake-smtp.log" 2>&1 || exit 1
node_modules/.bin/next start -H 127.0.0.1 -p "$port" > "$out/server.log" 2>&1 &
server_pid=$!
for _ in $(seq 1 60); do curl -sf "$NEXTAUTH_URL/api/health" >/dev/null && break; sleep 0.5; done

echo "── vitest"
node_modules/.bin/vitest run --reporter=default --reporter=json --outputFile.json="$out/vitest.json"
vitest_rc=$?
echo "── playwright"
PLAYWRIGHT_JSON_OUTPUT_NAME="$out/playwright.json" node_modules/.bin/playwright test --reporter=list,json
playwright_rc=$?

read -r vp vf < <(node -e '
  const fs = require("fs"); let p = 0, f = 0;
  try { const v = JSON.parse(fs.readFileSync(process.argv[1])); p += v.numPassedTests; f += v.numFailedTests + (v.numRuntimeErrorTestSuites || 0); } catch { f += 1; }
  try { const s = JSON.parse(fs.readFileSync(process.argv[2])).stats; p += s.expected + s.flaky; f += s.unexpected; } catch { f += 1; }
  console.log(p, f);' "$out/vitest.json" "$out/playwright.json")
passed=$((passed + vp)); failed=$((failed + vf))
# A runner that crashed without reporting a failure still fails the run.
if [ "$vitest_rc" != 0 ] || [ "$playwright_rc" != 0 ]; then [ "$failed" = 0 ] && failed=1; fi

echo "tests: $passed passed, $failed failed"
[ "$failed" = 0 ]

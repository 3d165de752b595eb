#!/usr/bin/env bash
# npm run bench: the estimator's benchmark, then the server's (a production build on a throwaway
# database with the demo data): speed under load with 32 connections against the floor of
# /api/health, scheme API reads, and drag-and-drop moves to a figures update.
set -uo pipefail
cd "$(dirname "$0")/.."
source scripts/setup.sh
source scripts/s3-fake.sh

ensure_apt postgresql chromium fonts-dejavu-core fonts-liberation || exit 1
ensure_node_modules || exit 1

echo "── estimator"
# Bundled as the editor ships it (one ES module, no per-import getters or name helpers that a
# development loader adds), so the figures measure the code the browser runs.
mkdir -p .data/bench
node_modules/.bin/esbuild scripts/bench.ts --bundle --platform=node --format=esm --target=node20 --outfile=.data/bench/bench.mjs --log-level=warning || exit 1
node .data/bench/bench.mjs || exit 1
echo "── drawing board"
node_modules/.bin/esbuild scripts/bench-drawing.ts --bundle --platform=node --format=esm --target=node20 --outfile=.data/bench/bench-drawing.mjs --log-level=warning || exit 1
node .data/bench/bench-drawing.mjs || exit 1

echo "── server"
export PG_TEST_PORT=${BENCH_PG_PORT:-54349} PG_TEST_NAME=pg-bench
port=${BENCH_APP_PORT:-3200}
export DATABASE_URL=$(bash scripts/db.sh url --test)
export NEXTAUTH_URL=http://127.0.0.1:$port NEXTAUTH_SECRET=$(random_secret) NEXT_DIST_DIR=.next-bench
export BENCH_BASE_URL=$NEXTAUTH_URL
# The demo data queues mail: it goes to a stand-in of the bench's own, never to another checkout's.
export SMTP_HOST=127.0.0.1 SMTP_PORT=${BENCH_SMTP_PORT:-2545} SMTP_SECURITY=none MAIL_FROM="Stopwright bench <mail@stopwright.bench>"
server_pid=""
fake_smtp_pid=""
cleanup() {
  [ -n "$server_pid" ] && kill "$server_pid" 2>/dev/null && wait "$server_pid" 2>/dev/null
  stop_s3_fake
  rm -rf .data/s3-bench
  [ -n "$fake_smtp_pid" ] && kill "$fake_smtp_pid" 2>/dev/null && wait "$fake_smtp_pid" 2>/dev/null
  bash scripts/db.sh stop --test >/dev/null 2>&1
}
trap cleanup EXIT
bash scripts/db.sh start --test >/dev/null || exit 1
# The seed stores the demo's survey files, so the bench has an object store of its own too.
rm -rf .data/s3-bench
S3_FAKE_PORT=${BENCH_S3_PORT:-4579} start_s3_fake .data/s3-bench "$NEXTAUTH_URL" >/dev/null || exit 1
node_modules/.bin/tsx scripts/migrate.ts >/dev/null && node_modules/.bin/tsx db/seed.ts >/dev/null || exit 1
node_modules/.bin/next build > /dev/null 2>&1 || { echo "build failed"; exit 1; }
if curl -s -o /dev/null "$NEXTAUTH_URL/api/health"; then echo "error: port $port is already in use; stop what listens there" >&2; exit 1; fi
rm -rf .data/bench-mail
start_fake_smtp "$SMTP_PORT" .data/bench-mail > /dev/null || exit 1
node_modules/.bin/next start -H 127.0.0.1 -p "$port" > /dev/null 2>&1 &
server_pid=$!
for _ in $(seq 1 60); do curl -sf "$NEXTAUTH_URL/api/health" >/dev/null && break; sleep 0.5; done
echo "── under load"
BENCH_SERVER_PID=$server_pid node_modules/.bin/tsx scripts/bench-load.ts
load_rc=$?
echo "── editor"
node_modules/.bin/tsx scripts/bench-editor.ts || exit 1
exit $load_rc

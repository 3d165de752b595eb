#!/usr/bin/env bash
# npm run demo: everything from a fresh machine to the product on http://127.0.0.1:3000.
# Run again, it keeps the data (the demo cluster lives in .data/pg).
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/setup.sh
source scripts/s3-fake.sh

ensure_apt postgresql
ensure_node_modules

bash scripts/db.sh start
export DATABASE_URL=$(bash scripts/db.sh url)
port=${DEMO_PORT:-3000}
export NEXTAUTH_URL=http://127.0.0.1:$port
export NEXTAUTH_SECRET=$(kept_secret .data/demo-secret)
# The demo's mail goes to a local SMTP stand-in (scripts/fake-smtp.mjs); read it on the admin's
# "Outgoing mail" page, which lists the app's own outbox.
export SMTP_HOST=127.0.0.1 SMTP_PORT=${SMTP_PORT:-2525} SMTP_SECURITY=none
export MAIL_FROM="Corvin Lathe Organ Builders <office@corvinlathe.example>"

# The object-storage fake keeps the demo's files in .data/s3, beside the database.
start_s3_fake .data/s3 "$NEXTAUTH_URL"
trap stop_s3_fake EXIT

node_modules/.bin/tsx scripts/migrate.ts
node_modules/.bin/tsx db/seed.ts
node_modules/.bin/next build

cat <<TXT

Stopwright is running on http://127.0.0.1:$port  (Ctrl-C stops it; the data stays)
Demo accounts (invented people of an invented firm):
$(node_modules/.bin/tsx scripts/print-demo-accounts.ts)

TXT
# Not exec: the script stays to stop the fakes when the server stops (Ctrl-C reaches all of them).
fake_smtp_pid=""
server_pid=""
stop_all() {
  [ -n "$server_pid" ] && kill "$server_pid" 2>/dev/null
  [ -n "$fake_smtp_pid" ] && kill "$fake_smtp_pid" 2>/dev/null
  stop_s3_fake
  wait 2>/dev/null
}
trap stop_all EXIT
trap 'exit 130' INT TERM
start_fake_smtp "$SMTP_PORT" .data/mail
node_modules/.bin/next start -H 127.0.0.1 -p "$port" &
server_pid=$!
wait "$server_pid"

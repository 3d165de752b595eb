#!/usr/bin/env bash
# npm run dev: the development server against the demo cluster, with this checkout's own secret.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/setup.sh
source scripts/s3-fake.sh
ensure_node_modules
bash scripts/db.sh start
export DATABASE_URL=${DATABASE_URL:-$(bash scripts/db.sh url)}
port=${DEV_PORT:-3000}
export NEXTAUTH_URL=http://127.0.0.1:$port
export NEXTAUTH_SECRET=$(kept_secret .data/demo-secret)
export SMTP_HOST=127.0.0.1 SMTP_PORT=${SMTP_PORT:-2525} SMTP_SECURITY=none
fake_smtp_pid=""
trap 'stop_s3_fake; [ -n "$fake_smtp_pid" ] && kill "$fake_smtp_pid" 2>/dev/null' EXIT
start_s3_fake .data/s3 "$NEXTAUTH_URL"
start_fake_smtp "$SMTP_PORT" .data/mail
node_modules/.bin/next dev -H 127.0.0.1 -p "$port"

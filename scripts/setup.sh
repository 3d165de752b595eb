#!/usr/bin/env bash
# Shared set-up for the demo and the tests: Debian packages when missing, then node_modules.
#   source scripts/setup.sh; ensure_apt pkg…; ensure_node_modules
export NEXT_TELEMETRY_DISABLED=1

ensure_apt() {
  local missing=()
  for pkg in "$@"; do dpkg -s "$pkg" >/dev/null 2>&1 || missing+=("$pkg"); done
  [ ${#missing[@]} -eq 0 ] && return 0
  echo "installing Debian packages: ${missing[*]}"
  if [ "$(id -u)" != 0 ]; then echo "error: need root (or sudo) to apt-get install ${missing[*]}" >&2; return 1; fi
  DEBIAN_FRONTEND=noninteractive apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends "${missing[@]}" >/dev/null
}

# npm ci when node_modules is missing or older than the lock file.
ensure_node_modules() {
  if [ ! -d node_modules ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
    echo "installing npm packages (npm ci)…"
    npm ci --no-audit --no-fund --loglevel=error
  fi
}

# A secret of this checkout's own for the demo, dev server, tests or bench: random, never committed.
#   random_secret            prints a new one
#   kept_secret FILE         prints the one kept in FILE, making it first
random_secret() { node -e "console.log(require('crypto').randomBytes(32).toString('hex'))"; }
kept_secret() {
  mkdir -p "$(dirname "$1")"
  [ -s "$1" ] || (umask 077; random_secret > "$1")
  cat "$1"
}

# The local SMTP stand-in (scripts/fake-smtp.mjs) on 127.0.0.1:PORT, keeping mail in FOLDER.
#   start_fake_smtp PORT FOLDER   sets fake_smtp_pid; fails when the port is taken
start_fake_smtp() {
  if (exec 3<>"/dev/tcp/127.0.0.1/$1") 2>/dev/null; then echo "error: port $1 (SMTP) is already in use; set another with the SMTP port variable" >&2; return 1; fi
  node scripts/fake-smtp.mjs "$1" "$2" &
  fake_smtp_pid=$!
  for _ in $(seq 1 40); do (exec 3<>"/dev/tcp/127.0.0.1/$1") 2>/dev/null && return 0; sleep 0.1; done
  echo "error: the fake SMTP server did not start on port $1" >&2; return 1
}

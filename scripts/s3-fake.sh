#!/usr/bin/env bash
# The local object-storage fake for the demo and the tests (sourced by scripts/demo.sh and test.sh).
#   source scripts/s3-fake.sh; start_s3_fake DATA_DIR APP_ORIGIN   → exports the app's S3_* settings, sets s3_pid
#   stop_s3_fake                                                    → stops only the fake this script started
# Its port comes from S3_FAKE_PORT (default 4569), so several checkouts can run side by side.
s3_pid=""

start_s3_fake() {
  local dir=$1 origin=$2 port=${S3_FAKE_PORT:-4569}
  export S3_ENDPOINT="http://127.0.0.1:$port"
  export S3_BUCKET=${S3_BUCKET:-stopwright-files}
  export S3_REGION=us-east-1
  # The fake's own fixed development keys (s3rver's defaults), not a secret of anyone's.
  export S3_ACCESS_KEY_ID=S3RVER S3_SECRET_ACCESS_KEY=S3RVER
  export S3_FORCE_PATH_STYLE=true
  # Another fake on the port would take this checkout's files.
  if curl -s -o /dev/null "$S3_ENDPOINT/"; then echo "error: port $port is already in use (S3_FAKE_PORT); stop what listens there" >&2; return 1; fi
  mkdir -p "$dir"
  node scripts/s3-fake.mjs --port "$port" --dir "$dir" --bucket "$S3_BUCKET" --origin "$origin" &
  s3_pid=$!
  for _ in $(seq 1 40); do curl -s -o /dev/null "$S3_ENDPOINT/" && return 0; sleep 0.25; done
  echo "error: the object storage fake did not start on port $port" >&2
  return 1
}

stop_s3_fake() {
  if [ -n "$s3_pid" ]; then kill "$s3_pid" 2>/dev/null && wait "$s3_pid" 2>/dev/null; s3_pid=""; fi
  return 0
}

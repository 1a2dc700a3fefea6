#!/usr/bin/env bash
# Keeping an answer for verification later: POST /api/pulse-parameters with pulse-parameters.json, keep
# the answer's bytes exactly as received (here a file), and send those bytes back inside
# {"document": ...} to POST /api/stamp-verifications, never parsed and written again by a model
# (a model that drops a member, writes null for an absent one or rounds a number changes the content
# the stamp covers). The service's answer is verify-kept-answer.answer.json.
# BASE_URL: the service (default http://localhost:8080).
set -euo pipefail
cd "$(dirname "$0")"
base="${BASE_URL:-http://localhost:8080}"
kept=$(mktemp)
trap 'rm -f "$kept"' EXIT
curl -sS --fail-with-body -X POST "$base/api/pulse-parameters" \
  -H 'Content-Type: application/json' -H 'Accept: application/json' \
  --data-binary @pulse-parameters.json -o "$kept"
{ printf '{"document": '; cat "$kept"; printf '}'; } \
  | curl -sS --fail-with-body -X POST "$base/api/stamp-verifications" \
      -H 'Content-Type: application/json' -H 'Accept: application/json' --data-binary @-
echo

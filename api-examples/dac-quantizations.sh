#!/usr/bin/env bash
# POST /api/dac-quantizations with the request dac-quantizations.json; the service's answer is dac-quantizations.answer.json.
# BASE_URL: the service (default http://localhost:8080).
set -euo pipefail
cd "$(dirname "$0")"
curl -sS --fail-with-body -X POST "${BASE_URL:-http://localhost:8080}/api/dac-quantizations" \
  -H 'Content-Type: application/json' -H 'Accept: application/json' \
  --data-binary @dac-quantizations.json
echo

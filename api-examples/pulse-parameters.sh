#!/usr/bin/env bash
# POST /api/pulse-parameters with the request pulse-parameters.json; the service's answer is pulse-parameters.answer.json.
# BASE_URL: the service (default http://localhost:8080).
set -euo pipefail
cd "$(dirname "$0")"
curl -sS --fail-with-body -X POST "${BASE_URL:-http://localhost:8080}/api/pulse-parameters" \
  -H 'Content-Type: application/json' -H 'Accept: application/json' \
  --data-binary @pulse-parameters.json
echo

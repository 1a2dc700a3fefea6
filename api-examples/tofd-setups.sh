#!/usr/bin/env bash
# POST /api/tofd-setups with the request tofd-setups.json; the service's answer is tofd-setups.answer.json.
# BASE_URL: the service (default http://localhost:8080).
set -euo pipefail
cd "$(dirname "$0")"
curl -sS --fail-with-body -X POST "${BASE_URL:-http://localhost:8080}/api/tofd-setups" \
  -H 'Content-Type: application/json' -H 'Accept: application/json' \
  --data-binary @tofd-setups.json
echo

#!/usr/bin/env bash
# POST /api/acquisition-budgets with the request acquisition-budgets.json; the service's answer is acquisition-budgets.answer.json.
# BASE_URL: the service (default http://localhost:8080).
set -euo pipefail
cd "$(dirname "$0")"
curl -sS --fail-with-body -X POST "${BASE_URL:-http://localhost:8080}/api/acquisition-budgets" \
  -H 'Content-Type: application/json' -H 'Accept: application/json' \
  --data-binary @acquisition-budgets.json
echo

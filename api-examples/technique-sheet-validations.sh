#!/usr/bin/env bash
# POST /api/technique-sheet-validations with the request technique-sheet-validations.json; the service's answer is technique-sheet-validations.answer.json.
# BASE_URL: the service (default http://localhost:8080).
set -euo pipefail
cd "$(dirname "$0")"
curl -sS --fail-with-body -X POST "${BASE_URL:-http://localhost:8080}/api/technique-sheet-validations" \
  -H 'Content-Type: application/json' -H 'Accept: application/json' \
  --data-binary @technique-sheet-validations.json
echo

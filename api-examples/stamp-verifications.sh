#!/usr/bin/env bash
# POST /api/stamp-verifications with the request stamp-verifications.json; the service's answer is stamp-verifications.answer.json.
# BASE_URL: the service (default http://localhost:8080).
set -euo pipefail
cd "$(dirname "$0")"
curl -sS --fail-with-body -X POST "${BASE_URL:-http://localhost:8080}/api/stamp-verifications" \
  -H 'Content-Type: application/json' -H 'Accept: application/json' \
  --data-binary @stamp-verifications.json
echo

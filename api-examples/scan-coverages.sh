#!/usr/bin/env bash
# POST /api/scan-coverages with the request scan-coverages.json; the service's answer is scan-coverages.answer.json.
# BASE_URL: the service (default http://localhost:8080).
set -euo pipefail
cd "$(dirname "$0")"
curl -sS --fail-with-body -X POST "${BASE_URL:-http://localhost:8080}/api/scan-coverages" \
  -H 'Content-Type: application/json' -H 'Accept: application/json' \
  --data-binary @scan-coverages.json
echo

#!/usr/bin/env bash
# POST /api/sampling-assessments with the request sampling-assessments.json; the service's answer is sampling-assessments.answer.json.
# BASE_URL: the service (default http://localhost:8080).
set -euo pipefail
cd "$(dirname "$0")"
curl -sS --fail-with-body -X POST "${BASE_URL:-http://localhost:8080}/api/sampling-assessments" \
  -H 'Content-Type: application/json' -H 'Accept: application/json' \
  --data-binary @sampling-assessments.json
echo

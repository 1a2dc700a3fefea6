#!/usr/bin/env bash
# POST /api/quantization-assessments with the request quantization-assessments.json; the service's answer is quantization-assessments.answer.json.
# BASE_URL: the service (default http://localhost:8080).
set -euo pipefail
cd "$(dirname "$0")"
curl -sS --fail-with-body -X POST "${BASE_URL:-http://localhost:8080}/api/quantization-assessments" \
  -H 'Content-Type: application/json' -H 'Accept: application/json' \
  --data-binary @quantization-assessments.json
echo

#!/usr/bin/env bash
# POST /api/time-of-flight-resolutions with the request time-of-flight-resolutions.json; the service's answer is time-of-flight-resolutions.answer.json.
# BASE_URL: the service (default http://localhost:8080).
set -euo pipefail
cd "$(dirname "$0")"
curl -sS --fail-with-body -X POST "${BASE_URL:-http://localhost:8080}/api/time-of-flight-resolutions" \
  -H 'Content-Type: application/json' -H 'Accept: application/json' \
  --data-binary @time-of-flight-resolutions.json
echo

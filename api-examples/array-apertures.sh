#!/usr/bin/env bash
# POST /api/array-apertures with the request array-apertures.json; the service's answer is array-apertures.answer.json.
# BASE_URL: the service (default http://localhost:8080).
set -euo pipefail
cd "$(dirname "$0")"
curl -sS --fail-with-body -X POST "${BASE_URL:-http://localhost:8080}/api/array-apertures" \
  -H 'Content-Type: application/json' -H 'Accept: application/json' \
  --data-binary @array-apertures.json
echo

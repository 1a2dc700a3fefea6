#!/usr/bin/env bash
# POST /api/thickness-resolutions with the request thickness-resolutions.json; the service's answer is thickness-resolutions.answer.json.
# BASE_URL: the service (default http://localhost:8080).
set -euo pipefail
cd "$(dirname "$0")"
curl -sS --fail-with-body -X POST "${BASE_URL:-http://localhost:8080}/api/thickness-resolutions" \
  -H 'Content-Type: application/json' -H 'Accept: application/json' \
  --data-binary @thickness-resolutions.json
echo

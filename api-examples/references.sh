#!/usr/bin/env bash
# GET /api/references: the reference catalogue that answers cite by id; the service's answer is references.answer.json.
# BASE_URL: the service (default http://localhost:8080).
set -euo pipefail
curl -sS --fail-with-body "${BASE_URL:-http://localhost:8080}/api/references" -H 'Accept: application/json'
echo

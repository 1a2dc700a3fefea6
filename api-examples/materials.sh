#!/usr/bin/env bash
# GET /api/materials: the built-in materials; the service's answer is materials.answer.json.
# BASE_URL: the service (default http://localhost:8080).
set -euo pipefail
curl -sS --fail-with-body "${BASE_URL:-http://localhost:8080}/api/materials" -H 'Accept: application/json'
echo

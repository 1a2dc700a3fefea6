#!/usr/bin/env bash
# GET /api/materials/water at 40 C (water's velocity follows its temperature); the service's
# answer is materials-water.answer.json. BASE_URL: the service (default http://localhost:8080).
set -euo pipefail
curl -sS --fail-with-body "${BASE_URL:-http://localhost:8080}/api/materials/water?temperature_c=40" \
  -H 'Accept: application/json'
echo

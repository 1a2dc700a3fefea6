#!/usr/bin/env bash
# GET /api/references/{id}: one source of the catalogue; the service's answer is references-gum-rectangular.answer.json.
# BASE_URL: the service (default http://localhost:8080).
set -euo pipefail
curl -sS --fail-with-body "${BASE_URL:-http://localhost:8080}/api/references/jcgm-100-2008-4.3.7" -H 'Accept: application/json'
echo

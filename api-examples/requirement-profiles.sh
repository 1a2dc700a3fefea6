#!/usr/bin/env bash
# GET /api/requirement-profiles: every requirement profile, built-in and the operator's; the
# service's answer is requirement-profiles.answer.json. BASE_URL: the service (default http://localhost:8080).
set -euo pipefail
curl -sS --fail-with-body "${BASE_URL:-http://localhost:8080}/api/requirement-profiles" -H 'Accept: application/json'
echo

#!/usr/bin/env bash
# GET /api/requirement-profiles/common-practice: the default profile with its rules and sources;
# the service's answer is requirement-profiles-common-practice.answer.json.
# BASE_URL: the service (default http://localhost:8080).
set -euo pipefail
curl -sS --fail-with-body "${BASE_URL:-http://localhost:8080}/api/requirement-profiles/common-practice" \
  -H 'Accept: application/json'
echo

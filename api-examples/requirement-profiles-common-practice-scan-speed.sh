#!/usr/bin/env bash
# GET /api/requirement-profiles/common-practice/rules/scan-speed: the rule a technique-sheet finding
# names by profile_id and rule_id, with its title and source; the service's answer is
# requirement-profiles-common-practice-scan-speed.answer.json.
# BASE_URL: the service (default http://localhost:8080).
set -euo pipefail
curl -sS --fail-with-body "${BASE_URL:-http://localhost:8080}/api/requirement-profiles/common-practice/rules/scan-speed" \
  -H 'Accept: application/json'
echo

#!/usr/bin/env bash
# POST /api/waveform-analyses with the request waveform-analyses.json (the demo shop's synthesised 4 MHz
# array-element echo with a ringing backing, judged at 25 MHz within 1 dB); the service's answer is
# waveform-analyses.answer.json. The same request with -H 'Accept: image/svg+xml' answers the report
# figure waveform-analyses.svg. BASE_URL: the service (default http://localhost:8080).
set -euo pipefail
cd "$(dirname "$0")"
curl -sS --fail-with-body -X POST "${BASE_URL:-http://localhost:8080}/api/waveform-analyses" \
  -H 'Content-Type: application/json' -H 'Accept: application/json' \
  --data-binary @waveform-analyses.json
echo

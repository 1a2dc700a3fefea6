#!/usr/bin/env bash
# Recalculates a whole library in one streamed batch: posts a CSV file (a header row of field
# names, dotted for nested sections such as probe.frequency_mhz) to POST /api/<calculation>/batch
# with curl's progress meter, keeps the NDJSON answer rows in a file, and prints progress and a
# summary of OK and INVALID rows (and, for technique sheets, the verdicts and findings).
#
#   bash api-examples/bulk-recalculate.sh [library.csv] [calculation] [answers.ndjson]
#
# Defaults: the demo library demo-data/technique-sheets.csv, technique-sheet-validations, and
# <library>.answers.ndjson in the current folder. BASE_URL: the service (default
# http://localhost:8080). Needs curl and python3.
set -euo pipefail
here=$(cd "$(dirname "$0")" && pwd)
library=${1:-$here/../demo-data/technique-sheets.csv}
calculation=${2:-technique-sheet-validations}
answers=${3:-$(basename "${library%.*}").answers.ndjson}

echo "POST $library to ${BASE_URL:-http://localhost:8080}/api/$calculation/batch; answers in $answers" >&2
# -T streams the file (a library may be large); -X POST because -T alone would PUT.
curl --progress-bar --fail-with-body -X POST -T "$library" \
  -H 'Content-Type: text/csv' -H 'Accept: application/x-ndjson' \
  "${BASE_URL:-http://localhost:8080}/api/$calculation/batch" \
  | tee "$answers" | python3 "$here/bulk_progress.py"

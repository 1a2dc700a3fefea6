#!/usr/bin/env bash
# Rewrites api-examples/openapi.json from the running service, exactly as it serves /v3/api-docs
# (keys sorted by the service, pretty-printed). Run it after a deliberate change of the contract
# and commit the file with the change; OpenApiContractTest fails until you do.
#
#   mvn -B -DskipTests package && bash api-examples/regenerate-openapi.sh
set -euo pipefail
cd "$(dirname "$0")/.."
source .ci/service.sh
trap service_stop EXIT

SERVICE_ARGS="--springdoc.writer-with-default-pretty-printer=true" service_start "" target/regenerate-openapi.log
curl -fsS -H 'Accept: application/json' "$SERVICE_URL/v3/api-docs" -o api-examples/openapi.json.tmp
# End the file with a newline, as editors and git like it.
printf '\n' >> api-examples/openapi.json.tmp
mv api-examples/openapi.json.tmp api-examples/openapi.json
echo "wrote api-examples/openapi.json ($(wc -c < api-examples/openapi.json) bytes)"

#!/usr/bin/env bash
# Generates the lab client's code (Generated/) with Kiota from the service's API description: a file, or the URL
# of a running service's document (its Swagger:Enabled setting on). The suite runs this on the served document
# and fails if the result differs from what is committed, so the client never drifts from the API.
#   examples/LabClient/generate-client.sh http://localhost:5000/swagger/v1/swagger.json
set -euo pipefail
here=$(cd "$(dirname "$0")" && pwd)
description=${1:-http://localhost:5000/swagger/v1/swagger.json}
output=${2:-$here/Generated}
cd "$here"
dotnet tool restore >/dev/null
dotnet kiota generate --language CSharp --openapi "$description" --output "$output" \
  --namespace-name CommunityLead.LabClient.Api --class-name CommunityLeadApi \
  --exclude-backward-compatible --clean-output --log-level Warning \
  --include-path "/api/lab/**" --include-path "/api/kits/{code}" --include-path "/api/kits/{code}/receipt" \
  --include-path "/api/reports/summary" --include-path "/health"

#!/usr/bin/env bash
# `npm test`: every check, in the order a failure is cheapest to find.
set -euo pipefail
cd "$(dirname "$0")/.."
export NEXT_TELEMETRY_DISABLED=1 PLAYWRIGHT_SKIP_BROWSER_DOWNLOAD=1

step() { printf '\n=== %s\n' "$1"; }
step "typecheck";         npx tsc --noEmit
step "lint";              npx eslint . --max-warnings=0
step "unit tests";        npx vitest run --project unit
step "integration tests"; npx vitest run --project integration
step "production build";  npx next build
step "end-to-end tests";  npx playwright test

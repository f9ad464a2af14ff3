#!/usr/bin/env bash
# Every test: typecheck, formatting, lint, unit and property tests, the CLI end to end, the browser journeys in
# Debian's chromium, then the benchmarks (figures printed, not asserted).
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/setup.sh browser
export PATH="$HOME/.local/bin:$PATH"
pnpm run typecheck
pnpm run format:check
pnpm run lint
pnpm run test
if [ -f e2e/playwright.config.ts ]; then pnpm run e2e; fi
pnpm run bench

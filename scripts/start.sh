#!/usr/bin/env bash
# Sets up what is missing, then serves the app on http://127.0.0.1:5173 (the demo project opens
# on a first visit).
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/setup.sh
export PATH="$HOME/.local/bin:$PATH"
exec pnpm --filter app dev

#!/usr/bin/env bash
# Installs what this workspace needs on a fresh Debian machine with Node 20 and npm:
# pnpm through corepack (pinned by hash in package.json), the dependencies, and — when asked with
# `browser` — Debian's chromium for the browser tests. Safe to run again: it skips what is present.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."
export COREPACK_ENABLE_DOWNLOAD_PROMPT=0

if ! command -v pnpm >/dev/null 2>&1 || ! pnpm --version 2>/dev/null | grep -q '^10\.'; then
  if [ "$(id -u)" = 0 ]; then
    corepack enable pnpm
  else
    mkdir -p "$HOME/.local/bin"
    corepack enable pnpm --install-directory "$HOME/.local/bin"
    export PATH="$HOME/.local/bin:$PATH"
  fi
fi

# The browser journeys read the printed crew sheet's PDF with poppler-utils (pdftotext, pdfinfo).
if [ "${1:-}" = browser ]; then
  missing=()
  command -v chromium >/dev/null 2>&1 || missing+=(chromium)
  command -v pdftotext >/dev/null 2>&1 && command -v pdfinfo >/dev/null 2>&1 || missing+=(poppler-utils)
  if [ "${#missing[@]}" -gt 0 ]; then
    sudo_if_needed() { if [ "$(id -u)" = 0 ]; then "$@"; else sudo "$@"; fi; }
    sudo_if_needed apt-get update
    sudo_if_needed env DEBIAN_FRONTEND=noninteractive apt-get install -y "${missing[@]}"
  fi
fi

pnpm install --frozen-lockfile

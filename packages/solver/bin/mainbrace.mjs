#!/usr/bin/env node
// The command line runs as compiled JavaScript (built by the package's `prepare` on install).
import '../dist/cli/main.js';

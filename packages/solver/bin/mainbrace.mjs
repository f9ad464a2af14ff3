#!/usr/bin/env node
// The command line runs as one bundled module, built by the package's `prepare` on install.
import '../dist/mainbrace.mjs';

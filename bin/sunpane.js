#!/usr/bin/env node
'use strict';
// The command line runs the compiled core (lib/, built by `npm ci` through the prepare script).
require('../lib/cli/main.js').main(process.argv.slice(2)).then(
  (code) => { process.exitCode = code; },
  (err) => { process.stderr.write(`sunpane: ${err && err.message ? err.message : err}\n`); process.exitCode = 2; },
);

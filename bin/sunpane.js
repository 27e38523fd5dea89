#!/usr/bin/env node
'use strict';
// The command line runs the compiled core (lib/, built by `npm ci` through the prepare script).
require('../lib/cli/main.js').runAsProcess(process.argv.slice(2));

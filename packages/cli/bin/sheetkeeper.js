#!/usr/bin/env node
// The packed CLI: plain CommonJS compiled by `npm run build:cli`, nothing transpiled at run time.
require('../dist/harness/cli.js');

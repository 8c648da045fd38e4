#!/usr/bin/env node
import { runCli } from './node/cli/main.js';

runCli(process.argv.slice(2)).then(
  (status) => {
    process.exitCode = status;
  },
  (e: unknown) => {
    process.stderr.write(`ionheat: internal error (please report it): ${e instanceof Error ? e.message : String(e)}\n`);
    process.exitCode = 3;
  },
);

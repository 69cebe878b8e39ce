#!/usr/bin/env node
/** Entry point of the `fluxkick` command. All logic is in main.ts (runnable in-process). */
import { main } from './main.js';
import { processIo } from './io.js';

main(process.argv.slice(2), processIo()).then(
  (code) => {
    process.exitCode = code;
  },
  (e: unknown) => {
    process.stderr.write(`fluxkick: internal error:\n${e instanceof Error ? (e.stack ?? e.message) : String(e)}\n`);
    process.exitCode = 3;
  },
);

#!/usr/bin/env node
/** Entry point of the `fluxkick` command. All logic is in main.ts (runnable in-process). */
import { main } from './main.js';
import { processIo } from './io.js';

// A reader that stops early (`fluxkick schema | head`) closes the pipe: that is not an error.
for (const stream of [process.stdout, process.stderr]) {
  stream.on('error', (e: NodeJS.ErrnoException) => {
    if (e.code === 'EPIPE') process.exit(process.exitCode ?? 0);
    throw e;
  });
}

main(process.argv.slice(2), processIo()).then(
  (code) => {
    process.exitCode = code;
  },
  (e: unknown) => {
    process.stderr.write(`fluxkick: internal error:\n${e instanceof Error ? (e.stack ?? e.message) : String(e)}\n`);
    process.exitCode = 3;
  },
);

/**
 * `fluxkick demo`: simulate the shipped example station (examples/demo-station.yaml).
 *
 * Where the file is found: from packages/cli/src/commands (tsx, tests) the repository's root
 * `examples/`; otherwise walking up from this module's folder to the first
 * `examples/demo-station.yaml`. The cli build (tsup.config.ts) copies the file to
 * packages/cli/examples/ so the published package carries it beside dist/.
 */
import { existsSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Command } from 'commander';
import type { CliContext } from '../context.js';
import { addShotOptions, runShot, type ShotOptions } from './shot.js';

export const DEMO_FILE = 'demo-station.yaml';

/** Absolute path of the demo station, or throws (a packaging bug). */
export function demoStationPath(from: string = dirname(fileURLToPath(import.meta.url))): string {
  // In the repository (running from src/commands), the root examples/ is the source of truth.
  const repoCopy = join(from, '..', '..', '..', '..', 'examples', DEMO_FILE);
  if (from.endsWith(join('cli', 'src', 'commands')) && existsSync(repoCopy)) return repoCopy;
  let dir = from;
  for (let i = 0; i < 8; i++) {
    const candidate = join(dir, 'examples', DEMO_FILE);
    if (existsSync(candidate)) return candidate;
    const up = dirname(dir);
    if (up === dir) break;
    dir = up;
  }
  throw new Error(`examples/${DEMO_FILE} not found above ${from} (packaging problem)`);
}

export function registerDemo(program: Command, ctx: CliContext): Command {
  const cmd = program.command('demo').description('simulate the shipped example station and print the report');
  return addShotOptions(cmd)
    .addHelpText('after', `\nExamples:\n  $ fluxkick demo\n  $ fluxkick demo --json\n\nThe station is examples/${DEMO_FILE}; copy it as a starting point for your own.\n`)
    .action((opts: ShotOptions) => runShot(ctx, demoStationPath(), opts, `examples/${DEMO_FILE}`));
}

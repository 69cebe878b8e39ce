/**
 * `fluxkick shot <design>`: one discharge. Text summary (with the safety notice) by default,
 * `--json` for machines (DESIGN.md shape), `--csv FILE` for the waveform (written atomically,
 * never over the design file). `--strict`: exit 1 when the verdict fails.
 */
import type { Command } from 'commander';
import {
  designToStation,
  formatShotText,
  loadDesign,
  shotToJsonString,
  simulateShot,
  waveformToCsv,
  writeOutputFile,
  type Design,
  type ShotResult,
  type Station,
  type Verdict,
} from '@fluxkick/core';
import { EXIT_ENGINEERING_FAIL, type CliContext } from '../context.js';

export interface ShotOptions {
  json?: boolean;
  csv?: string;
  waveform?: boolean;
  strict?: boolean;
  color?: boolean;
}

/** Verdict on a shot; null until a verdict is available for this design. */
export function shotVerdict(_design: Design, _station: Station, _result: ShotResult): Verdict | null {
  return null;
}

/** True when the shot fails engineering checks (for --strict). */
export function isEngineeringFail(verdict: Verdict | null, result: ShotResult): boolean {
  if (verdict) return verdict.overall === 'fail';
  return result.warnings.some((w) => w.severity === 'error');
}

/** Simulate the design at `designPath` and print/write what the options ask for. Shared by `shot` and `demo`. */
export function runShot(ctx: CliContext, designPath: string, opts: ShotOptions, shownName = designPath): void {
  const path = ctx.resolvePath(designPath);
  const design = loadDesign(path);
  const station = designToStation(design, shownName);
  const result = simulateShot(station);
  const verdict = shotVerdict(design, station, result);

  if (opts.csv !== undefined) {
    writeOutputFile(ctx.resolvePath(opts.csv), waveformToCsv(result), { inputs: [path], field: '--csv' });
  }
  if (opts.json) {
    ctx.io.stdout(`${shotToJsonString(result, verdict, { waveform: Boolean(opts.waveform) })}\n`);
  } else {
    ctx.io.stdout(`${formatShotText({ station, result, verdict, designName: station.name, color: ctx.useColor(opts.color) })}\n`);
    if (opts.csv !== undefined) ctx.io.stdout(`waveform written to ${opts.csv}\n`);
  }
  if (opts.strict && isEngineeringFail(verdict, result)) ctx.exitCode = EXIT_ENGINEERING_FAIL;
}

/** Options shared by `shot` and `demo`. */
export function addShotOptions(cmd: Command): Command {
  return cmd
    .option('--json', 'print the result as JSON (SI units)')
    .option('--waveform', 'include the sampled waveform arrays in --json output')
    .option('--csv <file>', 'write the waveform as CSV to <file>')
    .option('--strict', 'exit with code 1 when the verdict fails')
    .option('--no-color', 'no colour even on a terminal');
}

export function registerShot(program: Command, ctx: CliContext): Command {
  const cmd = program
    .command('shot')
    .description('simulate one discharge of a station: summary, --json, --csv waveform')
    .argument('<design>', 'design file (.yaml, .yml or .json)');
  return addShotOptions(cmd)
    .addHelpText(
      'after',
      '\nExamples:\n  $ fluxkick shot examples/demo-station.yaml\n  $ fluxkick shot my-station.yaml --json --waveform > shot.json\n  $ fluxkick shot my-station.yaml --csv shot.csv\n',
    )
    .action((designPath: string, opts: ShotOptions) => runShot(ctx, designPath, opts));
}

/**
 * `fluxkick shot <design>`: one discharge. Text summary (with the safety notice) by default,
 * `--json` for machines (DESIGN.md shape), `--csv FILE` for the waveform (written atomically,
 * never over the design file), `--svg`/`--html`/`--md FILE` for the pulse plot and the reports
 * (same atomic writer and guard). `--strict`: exit 1 when the verdict fails.
 */
import type { Command } from 'commander';
import {
  formatShotText,
  loadDesign,
  penetrationText,
  pulsePlotSvg,
  shotReportHtml,
  shotReportMarkdownFiles,
  shotToJsonString,
  simulateDesign,
  waveformToCsv,
  writeOutputFile,
  type ShotResult,
  type Verdict,
} from '@fluxkick/core';
import { EXIT_ENGINEERING_FAIL, type CliContext } from '../context.js';

export interface ShotOptions {
  json?: boolean;
  csv?: string;
  svg?: string;
  html?: string;
  md?: string;
  waveform?: boolean;
  strict?: boolean;
  color?: boolean;
}

/** True when the shot fails engineering checks or the engine reports an error (for --strict). */
export function isEngineeringFail(verdict: Verdict | null, result: ShotResult): boolean {
  return verdict?.overall === 'fail' || result.warnings.some((w) => w.severity === 'error');
}

/** Simulate the design at `designPath` and print/write what the options ask for. Shared by `shot` and `demo`. */
export function runShot(ctx: CliContext, designPath: string, opts: ShotOptions, shownName = designPath): void {
  const path = ctx.resolvePath(designPath);
  // station, shot with the station's own warnings (a yoke table's range), verdict: one library call
  const { station, result, verdict, penetration } = simulateDesign(loadDesign(path), shownName);

  if (opts.csv !== undefined) {
    writeOutputFile(ctx.resolvePath(opts.csv), waveformToCsv(result), { inputs: [path], field: '--csv' });
  }
  const written = writeReports(ctx, opts, path, { station, result, verdict, penetration, designName: station.name, subtitle: `design file: ${shownName}` });
  if (opts.json) {
    ctx.io.stdout(`${shotToJsonString(result, verdict, { waveform: Boolean(opts.waveform), penetration })}\n`);
  } else {
    ctx.io.stdout(`${formatShotText({ station, result, verdict, designName: station.name, color: ctx.useColor(opts.color) })}\n`);
    if (penetration) ctx.io.stdout(`\n${penetrationText(penetration)}\n`);
    if (opts.csv !== undefined) ctx.io.stdout(`waveform written to ${opts.csv}\n`);
    for (const w of written) ctx.io.stdout(`${w} written\n`);
  }
  if (opts.strict && isEngineeringFail(verdict, result)) ctx.exitCode = EXIT_ENGINEERING_FAIL;
}

/** Write the --svg, --html and --md outputs atomically, never over the design file; returns what was written. */
function writeReports(ctx: CliContext, opts: ShotOptions, designPath: string, report: Parameters<typeof shotReportHtml>[0]): string[] {
  const written: string[] = [];
  const inputs = [designPath];
  if (opts.svg !== undefined) {
    writeOutputFile(ctx.resolvePath(opts.svg), `${pulsePlotSvg(report.result, { title: `Pulse of "${report.designName}"` })}\n`, { inputs, field: '--svg' });
    written.push(`pulse plot ${opts.svg}`);
  }
  if (opts.html !== undefined) {
    writeOutputFile(ctx.resolvePath(opts.html), shotReportHtml(report), { inputs, field: '--html' });
    written.push(`HTML report ${opts.html}`);
  }
  if (opts.md !== undefined) {
    for (const f of shotReportMarkdownFiles(report, ctx.resolvePath(opts.md))) {
      writeOutputFile(f.path, f.content, { inputs, field: '--md' });
      written.push(f.path.endsWith('.svg') ? `Markdown plot ${f.path}` : `Markdown report ${opts.md}`);
    }
  }
  return written;
}

/** Options shared by `shot` and `demo`. */
export function addShotOptions(cmd: Command): Command {
  return cmd
    .option('--json', 'print the result as JSON (SI units)')
    .option('--waveform', 'include the sampled waveform arrays in --json output')
    .option('--csv <file>', 'write the waveform as CSV to <file>')
    .option('--svg <file>', 'write the pulse plot (SVG) to <file>')
    .option('--html <file>', 'write a self-contained HTML report to <file>')
    .option('--md <file>', 'write a Markdown report to <file> (its plot goes to <name>.pulse.svg beside it)')
    .option('--strict', 'exit with code 1 when the verdict fails')
    .option('--no-color', 'no colour even on a terminal');
}

export function registerShot(program: Command, ctx: CliContext): Command {
  const cmd = program
    .command('shot')
    .description('simulate one discharge of a station: summary, --json, --csv waveform, --svg/--html/--md reports')
    .argument('<design>', 'design file (.yaml, .yml or .json)');
  return addShotOptions(cmd)
    .addHelpText(
      'after',
      '\nExamples:\n  $ fluxkick shot examples/demo-station.yaml\n  $ fluxkick shot my-station.yaml --json --waveform > shot.json\n  $ fluxkick shot my-station.yaml --csv shot.csv\n  $ fluxkick shot my-station.yaml --html report.html --svg pulse.svg\n',
    )
    .action((designPath: string, opts: ShotOptions) => runShot(ctx, designPath, opts));
}

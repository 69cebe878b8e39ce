/**
 * `fluxkick sweep <design>`: what-if runs.
 *
 * - `--vary PATH=start:stop:count` (also `log:…` and `v1,v2,…`), one to three times: a grid
 *   over design fields, each point simulated and judged on worker threads.
 * - `--tolerance PATH=±x%`, one or more times: a seeded Monte Carlo tolerance run instead.
 *
 * Output: a table (default), `--json`, `--csv FILE` ("-" for standard output), `--svg FILE`
 * (sweep: map over two varied fields; tolerance run: histogram), `--html FILE` (tolerance run).
 * A progress bar on standard error when it is a terminal. Ctrl-C stops after the shots in
 * progress, writes the rows already done, and exits with 130.
 */
import type { Command } from 'commander';
import cliProgress from 'cli-progress';
import {
  InputError,
  histogramSvg,
  loadDesign,
  mapPlotSvg,
  parseToleranceSpec,
  parseVarySpec,
  resolveTolerance,
  resolveVaryAxis,
  runSweep,
  runTolerance,
  sweepMapInput,
  sweepToCsv,
  sweepToJson,
  sweepToText,
  toleranceHistogramInput,
  toleranceReportHtml,
  toleranceToCsv,
  toleranceToJson,
  toleranceToText,
  tryParseQuantity,
  writeOutputFile,
  checkOutputPath,
  type Design,
} from '@fluxkick/core';
import type { CliContext } from '../context.js';

/** Exit code after Ctrl-C (128 + SIGINT), with the completed rows written. */
export const EXIT_INTERRUPTED = 130;
/** Fewer points than this run in the main thread by default (worker start-up would cost more). */
const MIN_POINTS_FOR_WORKERS = 32;

export interface SweepOptions {
  vary: string[];
  tolerance: string[];
  samples?: string;
  seed?: string;
  distribution?: string;
  targetField?: string;
  threads?: string;
  json?: boolean;
  csv?: string;
  svg?: string;
  html?: string;
  progress?: boolean;
}

function collect(value: string, previous: string[]): string[] {
  return [...previous, value];
}

function optionError(option: string, value: unknown, problem: string, expected: string): InputError {
  const shown = value === undefined ? '' : `${JSON.stringify(Array.isArray(value) ? value.join(' ') : value)}: `;
  return new InputError({ code: 'option.invalid', path: option, value, problem: `${shown}${problem}`, expected });
}

/** A whole number option within bounds. */
export function intOption(option: string, text: string | undefined, fallback: number, min: number, max: number): number {
  if (text === undefined) return fallback;
  if (!/^\d+$/.test(text.trim())) throw optionError(option, text, `"${text}" is not a whole number`, `a whole number from ${min} to ${max}`);
  const n = Number(text);
  if (n < min || n > max) throw optionError(option, text, `${n} is outside ${min}…${max}`, `a whole number from ${min} to ${max}`);
  return n;
}

/** The field strength of --target-field, in A/m. */
export function fieldOption(text: string | undefined): number | undefined {
  if (text === undefined) return undefined;
  const r = tryParseQuantity(text, 'fieldStrength');
  if (!r.ok) throw optionError('--target-field', text, r.reason, r.expected);
  if (!(r.value > 0)) throw optionError('--target-field', text, 'the field must be above zero', 'a field strength, e.g. 2.4MA/m');
  return r.value;
}

/** Progress on standard error (a terminal only), and Ctrl-C handling, around one run. */
export async function withRunControls<T>(
  ctx: CliContext,
  show: boolean,
  label: string,
  run: (signal: AbortSignal, onProgress: (done: number, total: number) => void) => Promise<T>,
): Promise<{ value: T; interrupted: boolean }> {
  const controller = new AbortController();
  // First Ctrl-C: stop cleanly. The listener then steps aside, so a second Ctrl-C gets Node's
  // default handling (the process ends at once) without this code calling process.exit.
  const onSigint = () => {
    process.removeListener('SIGINT', onSigint);
    ctx.io.stderr('\nfluxkick: stopping after the shots in progress (Ctrl-C again to quit at once)...\n');
    controller.abort();
  };
  process.on('SIGINT', onSigint);
  let bar: cliProgress.SingleBar | undefined;
  if (show && ctx.io.stderrIsTTY) {
    const stream = { isTTY: true, columns: process.stderr.columns ?? 80, write: (s: string) => (ctx.io.stderr(s), true) } as unknown as NodeJS.WriteStream;
    bar = new cliProgress.SingleBar({ stream, format: `${label} [{bar}] {value}/{total} points, eta {eta_formatted}`, hideCursor: true, clearOnComplete: true }, cliProgress.Presets.shades_classic);
  }
  let started = false;
  try {
    const value = await run(controller.signal, (done, total) => {
      if (!bar) return;
      if (!started) {
        bar.start(total, 0);
        started = true;
      }
      bar.setTotal(total);
      bar.update(done);
    });
    return { value, interrupted: controller.signal.aborted };
  } finally {
    if (started) bar?.stop();
    process.removeListener('SIGINT', onSigint);
  }
}

function threadsFor(opts: SweepOptions, points: number): number | undefined {
  if (opts.threads !== undefined) return intOption('--threads', opts.threads, 0, 0, 256);
  return points < MIN_POINTS_FOR_WORKERS ? 0 : undefined;
}

/** Write `text` to FILE, or to standard output when FILE is "-". */
function emit(ctx: CliContext, file: string, text: string, field: string, inputs: string[]): void {
  if (file === '-') ctx.io.stdout(text);
  else writeOutputFile(ctx.resolvePath(file), text, { inputs, field });
}

/** Before a run that may take minutes: each output file (not "-") must be writable and not the design. */
function checkOutputs(ctx: CliContext, designPath: string, outputs: readonly (readonly [string | undefined, string])[]): void {
  const inputs = [ctx.resolvePath(designPath)];
  for (const [file, field] of outputs) if (file !== undefined && file !== '-') checkOutputPath(ctx.resolvePath(file), { inputs, field });
}

async function runGrid(ctx: CliContext, designPath: string, design: Design, opts: SweepOptions): Promise<void> {
  if (opts.vary.length > 3) throw optionError('--vary', opts.vary, `${opts.vary.length} fields given`, 'one to three --vary options');
  if (opts.html !== undefined) throw optionError('--html', opts.html, 'an HTML page is made for tolerance runs only', '--html with --tolerance; for a sweep use --svg, --csv or --json');
  const axes = opts.vary.map((v) => resolveVaryAxis(parseVarySpec(v), design));
  const seen = new Set<string>();
  for (const a of axes) {
    if (seen.has(a.path.text)) throw optionError('--vary', a.spec, `${a.path.text} is varied twice`, 'each field in at most one --vary');
    seen.add(a.path.text);
  }
  if (opts.svg !== undefined && axes.length < 2) throw optionError('--svg', opts.svg, 'a map needs two varied fields', 'two or three --vary options with --svg');
  checkOutputs(ctx, designPath, [[opts.csv, '--csv'], [opts.svg, '--svg']]);
  const points = axes.reduce((n, a) => n * a.values.length, 1);
  const threads = threadsFor(opts, points);
  const { value: result, interrupted } = await withRunControls(ctx, opts.progress !== false, 'sweep', (signal, onProgress) =>
    runSweep(design, axes, { signal, onProgress, ...(threads !== undefined ? { threads } : {}) }),
  );
  const name = design.name ?? designPath;
  const inputs = [ctx.resolvePath(designPath)];
  if (opts.csv !== undefined) emit(ctx, opts.csv, sweepToCsv(result), '--csv', inputs);
  if (opts.svg !== undefined) emit(ctx, opts.svg, `${mapPlotSvg(sweepMapInput(result))}\n`, '--svg', inputs);
  if (opts.json) ctx.io.stdout(`${JSON.stringify(sweepToJson(result, name), null, 2)}\n`);
  else if (opts.csv !== '-' && opts.svg !== '-') {
    ctx.io.stdout(sweepToText(result, { designName: name, design }));
    if (opts.csv !== undefined) ctx.io.stdout(`rows written to ${opts.csv}\n`);
    if (opts.svg !== undefined) ctx.io.stdout(`map written to ${opts.svg}\n`);
  }
  if (interrupted || result.interrupted) {
    ctx.io.stderr(`fluxkick: interrupted after ${result.completed} of ${result.total} points; the rows written are those completed.\n`);
    ctx.exitCode = EXIT_INTERRUPTED;
  }
}

async function runMonteCarlo(ctx: CliContext, designPath: string, design: Design, opts: SweepOptions): Promise<void> {
  const fields = opts.tolerance.map((t) => resolveTolerance(parseToleranceSpec(t), design));
  const samples = intOption('--samples', opts.samples, 1000, 1, 1_000_000);
  const seed = intOption('--seed', opts.seed, 1, 0, 2 ** 31 - 1);
  const distribution = opts.distribution ?? 'uniform';
  if (distribution !== 'uniform' && distribution !== 'normal') {
    throw optionError('--distribution', distribution, `"${distribution}" is not a distribution`, 'uniform (default: every value within ±x equally likely) or normal (±x is 3σ, truncated there)');
  }
  const required = fieldOption(opts.targetField);
  checkOutputs(ctx, designPath, [[opts.csv, '--csv'], [opts.svg, '--svg'], [opts.html, '--html']]);
  const threads = threadsFor(opts, samples);
  const { value: result, interrupted } = await withRunControls(ctx, opts.progress !== false, 'tolerance run', (signal, onProgress) =>
    runTolerance(design, fields, { samples, seed, distribution, signal, onProgress, ...(required !== undefined ? { requiredField_Apm: required } : {}), ...(threads !== undefined ? { threads } : {}) }),
  );
  const name = design.name ?? designPath;
  const inputs = [ctx.resolvePath(designPath)];
  if (opts.csv !== undefined) emit(ctx, opts.csv, toleranceToCsv(result), '--csv', inputs);
  if (opts.svg !== undefined) emit(ctx, opts.svg, `${histogramSvg(toleranceHistogramInput(result, name))}\n`, '--svg', inputs);
  if (opts.html !== undefined) emit(ctx, opts.html, toleranceReportHtml(result, design, name), '--html', inputs);
  if (opts.json) ctx.io.stdout(`${JSON.stringify(toleranceToJson(result, name), null, 2)}\n`);
  else if (opts.csv !== '-' && opts.svg !== '-' && opts.html !== '-') {
    ctx.io.stdout(toleranceToText(result, design, name));
    for (const [file, what] of [[opts.csv, 'rows'], [opts.svg, 'histogram'], [opts.html, 'HTML report']] as const) if (file !== undefined) ctx.io.stdout(`${what} written to ${file}\n`);
  }
  if (interrupted || result.interrupted) {
    ctx.io.stderr(`fluxkick: interrupted after ${result.completed} of ${result.samples} shots; the rows and figures are those of the completed shots.\n`);
    ctx.exitCode = EXIT_INTERRUPTED;
  }
}

export async function runSweepCommand(ctx: CliContext, designPath: string, opts: SweepOptions): Promise<void> {
  if (opts.vary.length === 0 && opts.tolerance.length === 0) {
    throw optionError('--vary', undefined, 'nothing to vary', 'at least one --vary PATH=start:stop:count, or --tolerance PATH=±x% for a tolerance run');
  }
  if (opts.vary.length > 0 && opts.tolerance.length > 0) {
    throw optionError('--tolerance', opts.tolerance[0], '--vary and --tolerance in one run', 'either a sweep (--vary) or a tolerance run (--tolerance)');
  }
  // Syntax first, so a typo is reported before the design is read.
  for (const v of opts.vary) parseVarySpec(v);
  for (const t of opts.tolerance) parseToleranceSpec(t);
  const design = loadDesign(ctx.resolvePath(designPath));
  if (opts.vary.length > 0) await runGrid(ctx, designPath, design, opts);
  else await runMonteCarlo(ctx, designPath, design, opts);
}

export function registerSweep(program: Command, ctx: CliContext): Command {
  return program
    .command('sweep')
    .description('what-if runs: a grid over one to three design fields (--vary), or a seeded tolerance run (--tolerance)')
    .argument('<design>', 'design file (.yaml, .yml or .json)')
    .option('--vary <PATH=start:stop:count>', 'vary a design field: start:stop:count (linear), log:start:stop:count, or v1,v2,...; repeat for 2-3 fields', collect, [])
    .option('--tolerance <PATH=±x%>', 'draw a design field within ±x % (also +-x%); repeat for more fields', collect, [])
    .option('--samples <n>', 'shots of a tolerance run (default 1000)')
    .option('--seed <n>', 'seed of a tolerance run (default 1)')
    .option('--distribution <kind>', 'uniform (default) or normal (±x is 3σ, truncated at ±x)')
    .option('--target-field <H>', 'required field at the part when the design has no part section, e.g. 2.4MA/m')
    .option('--threads <n>', 'worker threads (0: this thread; default: the cores, or 0 below 32 points)')
    .option('--json', 'print every point as JSON (SI units)')
    .option('--csv <file>', 'write every point as CSV ("-": standard output)')
    .option('--svg <file>', 'sweep: map over the first two varied fields; tolerance run: histogram of the peak field')
    .option('--html <file>', 'tolerance run: a self-contained HTML page with the histogram')
    .option('--no-progress', 'no progress bar (it only shows on a terminal anyway)')
    .addHelpText(
      'after',
      `
Values take units or SI prefixes ("2.2 mF", "1.5k"); PATH is a dotted path into the design file.

Examples:
  $ fluxkick sweep station.yaml --vary bank.capacitance=1m:5m:9 --vary bank.voltage=1k:3k:9 --svg map.svg
  $ fluxkick sweep station.yaml --vary bank.capacitance=log:1m:10m:9 --csv rows.csv
  $ fluxkick sweep station.yaml --vary bank.voltage=1k,1.5k,2k --json
  $ fluxkick sweep station.yaml --tolerance bank.capacitance=±10% --tolerance coil.resistance=±5% --seed 7 --html spread.html

Ctrl-C stops after the shots in progress and writes the rows already done (exit code 130).`,
    )
    .action((designPath: string, opts: SweepOptions) => runSweepCommand(ctx, designPath, opts));
}

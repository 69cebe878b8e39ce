/**
 * Benchmark contract and timing helpers (bench/README.md).
 *
 * A bench file is `bench/<name>.bench.ts`. bench/run.ts imports every such file and runs what it exports:
 *   - `export default defineBench({ name, run })` (or an array of them), or a named export `suite` / `suites`;
 *   - or `export default async function (): Promise<BenchRow[]>`.
 * A file with none of these is imported for its side effects and reported as "self-reporting".
 *
 * Each bench returns rows: one measured figure each, with its unit and optionally the target it must meet.
 * A NaN (or non-finite) value fails the run; a missed target is reported, and fails the run with `--strict`.
 * Benchmarks are measurements, not tests: they print what this machine did.
 */
import { performance } from 'node:perf_hooks';

export interface BenchTarget {
  /** `>=`: the value must be at least `value`; `<=`: at most. */
  op: '>=' | '<=';
  value: number;
}

export interface BenchRow {
  /** What was measured, e.g. "discharge engine, demo station, odex: shots per second". */
  name: string;
  value: number;
  /** Unit of `value`, e.g. "shots/s", "x", "relative error". */
  unit: string;
  target?: BenchTarget;
  /** Anything the reader needs to interpret the figure (sizes, settings). */
  note?: string;
}

export interface BenchSuite {
  name: string;
  run(): Promise<BenchRow[]> | BenchRow[];
}

export function defineBench(suite: BenchSuite): BenchSuite {
  return suite;
}

/** Whether a row meets its target (true when it has none). */
export function meetsTarget(row: BenchRow): boolean {
  if (!row.target) return true;
  return row.target.op === '>=' ? row.value >= row.target.value : row.value <= row.target.value;
}

export interface Timing {
  /** Number of timed calls. */
  runs: number;
  /** Total wall-clock time of the timed calls, s. */
  total_s: number;
  /** Mean time per call, s. */
  mean_s: number;
  /** Median of the per-batch mean times, s (robust to a stray pause of the shared machine). */
  median_s: number;
  /** Calls per second from the median. */
  perSecond: number;
}

/**
 * Time a synchronous function: untimed warm-up calls (at least `warmup` calls and `warmup_s` seconds, so that the
 * JavaScript engine has compiled the hot code), then batches of calls until `minTime_s` has passed and at least
 * `minRuns` calls ran. Returns the median over batches (batches of `batch` calls).
 */
export function timeIt(
  fn: () => unknown,
  opts: { minTime_s?: number; minRuns?: number; warmup?: number; warmup_s?: number; batch?: number } = {},
): Timing {
  const minTime_s = opts.minTime_s ?? 1;
  const minRuns = opts.minRuns ?? 10;
  const batch = Math.max(1, opts.batch ?? 1);
  const w0 = performance.now();
  for (let k = 0; k < (opts.warmup ?? 3) || (performance.now() - w0) / 1000 < (opts.warmup_s ?? 0.5); k++) fn();
  const batchMeans: number[] = [];
  let runs = 0;
  let total = 0;
  while (total < minTime_s || runs < minRuns) {
    const t0 = performance.now();
    for (let k = 0; k < batch; k++) fn();
    const dt = (performance.now() - t0) / 1000;
    batchMeans.push(dt / batch);
    runs += batch;
    total += dt;
  }
  batchMeans.sort((a, b) => a - b);
  const mid = batchMeans.length >> 1;
  const median_s = batchMeans.length % 2 ? batchMeans[mid] : (batchMeans[mid - 1] + batchMeans[mid]) / 2;
  return { runs, total_s: total, mean_s: total / runs, median_s, perSecond: 1 / median_s };
}

/** Wall-clock time of one call, s, and its result. */
export function timeOnce<T>(fn: () => T): { value: T; wall_s: number } {
  const t0 = performance.now();
  const value = fn();
  return { value, wall_s: (performance.now() - t0) / 1000 };
}

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
 * Benchmarks are measurements, not tests: they print what this machine did. Times are CPU times of the process
 * that did the work (see timeIt), so that a shared machine's load does not count.
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

/** CPU time (user + system) of this process so far, s. */
export function cpuSeconds(): number {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1e6;
}

export interface Timing {
  /** Number of timed calls. */
  runs: number;
  /** Total CPU time of the timed calls, s. */
  totalCpu_s: number;
  /** Total wall-clock time of the timed calls, s. */
  totalWall_s: number;
  /** Median over batches of the CPU time per call, s. */
  median_s: number;
  /** Calls per CPU-second, from the median. */
  perSecond: number;
  /** Calls per wall-clock second over the whole timing (lower than perSecond when the machine is shared). */
  perWallSecond: number;
}

/**
 * Time a synchronous function by the CPU time of this process (user + system: on a shared machine the wall clock
 * also counts other people's work). Untimed warm-up calls first (at least `warmup` calls and `warmup_s` CPU seconds,
 * so that the JavaScript engine has compiled the hot code), then batches of `batch` calls until `minTime_s` CPU
 * seconds have passed and at least `minRuns` calls ran. Returns the median over batches.
 */
export function timeIt(
  fn: () => unknown,
  opts: { minTime_s?: number; minRuns?: number; warmup?: number; warmup_s?: number; batch?: number } = {},
): Timing {
  const minTime_s = opts.minTime_s ?? 1;
  const minRuns = opts.minRuns ?? 10;
  const batch = Math.max(1, opts.batch ?? 1);
  const w0 = cpuSeconds();
  for (let k = 0; k < (opts.warmup ?? 3) || cpuSeconds() - w0 < (opts.warmup_s ?? 0.5); k++) fn();
  const batchMeans: number[] = [];
  let runs = 0;
  let totalCpu = 0;
  const wall0 = performance.now();
  while (totalCpu < minTime_s || runs < minRuns) {
    const c0 = cpuSeconds();
    for (let k = 0; k < batch; k++) fn();
    const dt = cpuSeconds() - c0;
    batchMeans.push(dt / batch);
    runs += batch;
    totalCpu += dt;
  }
  const totalWall = (performance.now() - wall0) / 1000;
  batchMeans.sort((a, b) => a - b);
  const mid = batchMeans.length >> 1;
  const median_s = batchMeans.length % 2 ? batchMeans[mid] : (batchMeans[mid - 1] + batchMeans[mid]) / 2;
  return { runs, totalCpu_s: totalCpu, totalWall_s: totalWall, median_s, perSecond: 1 / median_s, perWallSecond: runs / totalWall };
}

/** CPU and wall-clock time of one call, s, and its result. */
export function timeOnce<T>(fn: () => T): { value: T; cpu_s: number; wall_s: number } {
  const c0 = cpuSeconds();
  const t0 = performance.now();
  const value = fn();
  return { value, cpu_s: cpuSeconds() - c0, wall_s: (performance.now() - t0) / 1000 };
}

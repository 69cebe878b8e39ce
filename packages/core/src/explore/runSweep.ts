/**
 * A what-if sweep: the design simulated and judged at every point of a grid over one to three
 * varied fields (varySpec.ts), on worker threads, rows kept in grid order.
 *
 * Work is sent in batches of points (one design copy per batch, not per point); the batch
 * size adapts so that each thread gets about eight batches, between 1 and 32 points each
 * (one point per task in this thread).
 * An aborted run (Ctrl-C) returns the rows already done and says it was interrupted.
 */
import type { Design } from '../design/schema.js';
import { gridPoints } from './gridPoints.js';
import { runExploreTask, type PointsTask } from './exploreTasks.js';
import type { PointOutcome } from './evaluateDesign.js';
import { defaultThreads, openPool, resolveWorkerFile, type TaskPool } from './runPool.js';
import type { SweepAxis } from './varySpec.js';

export interface RunOptions {
  /** Worker threads; 0 runs in this thread. Default: the available cores. */
  threads?: number;
  signal?: AbortSignal;
  /** Called as points complete: (completed, total). */
  onProgress?: (completed: number, total: number) => void;
  /** Points per task; default adapts to the run's size. */
  batchSize?: number;
  /** A pool already open (openExplorePool), to run several runs without starting threads again. */
  pool?: TaskPool<unknown>;
}

export interface SweepRow {
  index: number;
  /** The varied values, one per axis (design-file numbers: SI, °C for temperatures). */
  values: number[];
  outcome: PointOutcome;
}

export interface RunStats {
  total: number;
  completed: number;
  interrupted: boolean;
  threads: number;
  wallTime_s: number;
}

export interface SweepResult extends RunStats {
  axes: SweepAxis[];
  /** Completed rows, in grid order. */
  rows: SweepRow[];
}

export const MAX_SWEEP_AXES = 3;

/** The worker module of what-if runs (source or build). */
export function exploreWorkerFile(): URL {
  return resolveWorkerFile(typeof __filename === 'string' ? undefined : import.meta.url, 'exploreWorker');
}

/**
 * Open a pool for what-if runs: `threads` worker threads (default the cores; 0: this thread),
 * started at once (at most `expectedTasks` of them when given). Close it when done.
 */
export async function openExplorePool(threads: number | undefined, expectedTasks?: number): Promise<TaskPool<unknown>> {
  const n = threads ?? defaultThreads();
  return openPool<unknown>({
    threads: n,
    ...(n > 0 ? { workerFile: exploreWorkerFile() } : {}),
    inThread: (t) => runExploreTask(t as PointsTask),
    ...(expectedTasks !== undefined ? { minThreads: Math.max(1, expectedTasks) } : {}),
  });
}

/** Evaluate the design at the given points (each a list of values for `paths`); rows in input order. */
export async function runPoints(
  design: Design,
  paths: PointsTask['paths'],
  points: { index: number; values: number[] }[],
  options: RunOptions = {},
): Promise<{ rows: SweepRow[] } & RunStats> {
  const pool = options.pool ?? (await openExplorePool(options.threads, points.length));
  const threads = pool.threads;
  const total = points.length;
  // In this thread there is no message to save: one point per task keeps Ctrl-C responsive.
  const batch = options.batchSize ?? (threads === 0 ? 1 : Math.min(32, Math.max(1, Math.ceil(total / (threads * 8)))));
  const tasks: PointsTask[] = [];
  for (let i = 0; i < total; i += batch) tasks.push({ kind: 'points', design, paths, points: points.slice(i, i + batch) });
  let donePoints = 0;
  const started = performance.now();
  let run: Awaited<ReturnType<TaskPool<unknown>['run']>>;
  try {
    run = await pool.run(tasks, {
      ...(options.signal ? { signal: options.signal } : {}),
      onProgress: (_done, _all, t) => {
        donePoints += tasks[t]!.points.length;
        options.onProgress?.(donePoints, total);
      },
    });
  } finally {
    if (!options.pool) await pool.close();
  }
  const wallTime_s = (performance.now() - started) / 1000;
  const rows: SweepRow[] = [];
  let completed = 0;
  run.outcomes.forEach((o, t) => {
    const task = tasks[t]!;
    if (o === undefined) return;
    task.points.forEach((p, k) => {
      const outcome: PointOutcome = o.ok ? (o.value as PointOutcome[])[k]! : { ok: false, error: o.error };
      rows.push({ index: p.index, values: p.values, outcome });
      completed += 1;
    });
  });
  return { rows, total, completed, interrupted: run.interrupted, threads, wallTime_s };
}

/** Run a sweep over the grid of the axes. */
export async function runSweep(design: Design, axes: SweepAxis[], options: RunOptions = {}): Promise<SweepResult> {
  if (axes.length < 1 || axes.length > MAX_SWEEP_AXES) throw new RangeError(`a sweep takes 1 to ${MAX_SWEEP_AXES} axes, got ${axes.length}`);
  const points = gridPoints(axes);
  const run = await runPoints(
    design,
    axes.map((a) => a.path),
    points,
    options,
  );
  return { axes, ...run };
}

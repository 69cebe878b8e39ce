/**
 * Run a list of independent tasks on worker threads (tinypool), or in this thread when
 * `threads` is 0, keeping results in task order so that the output does not depend on the
 * number of threads or on which thread finished first.
 *
 * - At most `2·threads` tasks are in flight; the rest wait here, so an interruption leaves no
 *   long queue behind.
 * - `signal` (an AbortSignal, e.g. from Ctrl-C): no new task starts; tasks already running
 *   finish and are kept; the result says `interrupted: true` and which tasks completed.
 * - A task that throws in the worker is recorded as `{ error }` for that task; the others go on.
 *
 * The worker file: a module whose default export is `(task) => result` (may be async).
 * When it is TypeScript (running from source under tsx or vitest), it is bundled into one ES
 * module with esbuild and cached (bundleWorker.ts); without esbuild, the threads start
 * tsWorkerBootstrap.mjs, which registers tsx's loader inside the thread (Node 20 does not pass
 * `--import` loaders on to worker threads) and then imports the TypeScript module. Built code
 * (dist/) runs its .js worker directly. See `resolveWorkerFile`.
 */
import { existsSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { Tinypool } from 'tinypool';
import { bundledWorker } from './bundleWorker.js';

export interface RunPoolOptions<R> {
  /** Worker threads; 0 runs every task in this thread with `inThread`. Default: available cores. */
  threads?: number;
  /** Worker module (file URL or path). Required when threads > 0. */
  workerFile?: URL | string;
  /** The same function as the worker's default export, for threads = 0. */
  inThread?: (task: unknown) => R | Promise<R>;
  /** Stop starting new tasks when aborted. */
  signal?: AbortSignal;
  /** TypeScript workers: bundle with esbuild (default true); false loads them through tsx in each thread. */
  bundle?: boolean;
  /** Called after each task with (completed tasks, total tasks, index of the task just finished). */
  onProgress?: (completed: number, total: number, index: number) => void;
}

export type TaskOutcome<R> = { ok: true; value: R } | { ok: false; error: string };

export interface PoolRun<R> {
  /** outcomes[i] for task i; undefined when the task never ran (interrupted). */
  outcomes: (TaskOutcome<R> | undefined)[];
  completed: number;
  interrupted: boolean;
  threads: number;
  wallTime_s: number;
}

/** Worker threads to use by default: the machine's available parallelism. */
export function defaultThreads(): number {
  return Math.max(1, availableParallelism());
}

function errorText(e: unknown): string {
  return e instanceof Error ? `${e.name}: ${e.message}` : String(e);
}

/** A pool of worker threads (or this thread) kept open across several runs. */
export interface TaskPool<R> {
  /** Worker threads (0: this thread). */
  readonly threads: number;
  /** Run tasks; results in task order. */
  run<T>(tasks: readonly T[], controls?: Pick<RunPoolOptions<R>, 'signal' | 'onProgress'>): Promise<PoolRun<R>>;
  close(): Promise<void>;
}

/**
 * Open a pool: start the worker threads once (the TypeScript worker bundled first), to run
 * several batches of tasks without paying the start-up again. Close it when done.
 */
export async function openPool<R>(options: Omit<RunPoolOptions<R>, 'signal' | 'onProgress'> & { minThreads?: number }): Promise<TaskPool<R>> {
  const threads = options.threads ?? defaultThreads();
  if (threads === 0) {
    if (!options.inThread) throw new Error('openPool: threads = 0 needs inThread');
    const inThread = options.inThread;
    return {
      threads: 0,
      run: (tasks, controls = {}) => runTasks(tasks, controls, 0, (task) => Promise.resolve().then(() => inThread(task))),
      close: async () => {},
    };
  }
  if (options.workerFile === undefined) throw new Error('openPool: threads > 0 needs workerFile');
  const target = options.workerFile instanceof URL ? fileURLToPath(options.workerFile) : options.workerFile;
  // A TypeScript worker (running from source): bundled into one ES module when esbuild is at hand
  // (bundleWorker.ts), else loaded through tsWorkerBootstrap.mjs, which registers tsx in the thread.
  const isTs = /\.[cm]?ts$/.test(target);
  // A failed bundle (e.g. a missing module) falls back to tsx, whose load error each task then reports.
  const bundled = isTs && options.bundle !== false ? await bundledWorker(target).catch(() => undefined) : undefined;
  const viaBootstrap = isTs && bundled === undefined;
  const filename = bundled ?? (viaBootstrap ? fileURLToPath(new URL('./tsWorkerBootstrap.mjs', here())) : target);
  const pool = new Tinypool({ filename, minThreads: Math.min(threads, options.minThreads ?? threads), maxThreads: threads });
  return {
    threads,
    run: (tasks, controls = {}) => runTasks(tasks, controls, threads, (task) => pool.run(viaBootstrap ? { module: target, task } : task) as Promise<R>),
    close: () => pool.destroy(),
  };
}

/** Feed tasks to `exec` with at most 2·threads in flight (one at a time in this thread), in order. */
async function runTasks<T, R>(
  tasks: readonly T[],
  controls: Pick<RunPoolOptions<R>, 'signal' | 'onProgress'>,
  threads: number,
  exec: (task: T) => Promise<R>,
): Promise<PoolRun<R>> {
  const started = performance.now();
  const total = tasks.length;
  const outcomes: (TaskOutcome<R> | undefined)[] = new Array(total).fill(undefined);
  let completed = 0;
  const aborted = () => controls.signal?.aborted === true;
  const record = (i: number, outcome: TaskOutcome<R>) => {
    outcomes[i] = outcome;
    completed += 1;
    controls.onProgress?.(completed, total, i);
  };
  if (threads === 0) {
    for (let i = 0; i < total && !aborted(); i++) {
      try {
        record(i, { ok: true, value: await exec(tasks[i]!) });
      } catch (e) {
        record(i, { ok: false, error: errorText(e) });
      }
      // Let signal handlers (Ctrl-C) and timers run between tasks.
      await new Promise((r) => setImmediate(r));
    }
  } else {
    let next = 0;
    const window = 2 * threads;
    await new Promise<void>((resolve) => {
      let inFlight = 0;
      const launch = () => {
        while (inFlight < window && next < total && !aborted()) {
          const i = next++;
          inFlight += 1;
          exec(tasks[i]!)
            .then(
              (value: R) => record(i, { ok: true, value }),
              (e: unknown) => record(i, { ok: false, error: errorText(e) }),
            )
            .finally(() => {
              inFlight -= 1;
              if (inFlight === 0 && (next >= total || aborted())) resolve();
              else launch();
            });
        }
        if (inFlight === 0) resolve();
      };
      controls.signal?.addEventListener('abort', () => {
        if (inFlight === 0) resolve();
      });
      launch();
    });
  }
  return { outcomes, completed, interrupted: completed < total, threads, wallTime_s: (performance.now() - started) / 1000 };
}

/** Open a pool, run the tasks, close it. */
export async function runPool<T, R>(tasks: readonly T[], options: RunPoolOptions<R>): Promise<PoolRun<R>> {
  const started = performance.now();
  const pool = await openPool<R>({ ...options, minThreads: Math.max(1, tasks.length) });
  try {
    const run = await pool.run(tasks, options);
    return { ...run, wallTime_s: (performance.now() - started) / 1000 };
  } finally {
    await pool.close();
  }
}

/**
 * Find a worker module next to the calling module: `<name>.ts` when running from source
 * (tsx, vitest), `<name>.js` in a build (tsup emits the worker as its own entry beside
 * index.js). `here` is the caller's `import.meta.url`.
 */
export function resolveWorkerFile(from: string | undefined, name: string): URL {
  const base = from ?? here();
  for (const candidate of [`./${name}.ts`, `./${name}.js`, `./${name}.mjs`, `./explore/${name}.js`]) {
    const url = new URL(candidate, base);
    if (existsSync(fileURLToPath(url))) return url;
  }
  throw new Error(`worker module ${name} not found next to ${base}`);
}

/** This module's URL, in ESM (import.meta.url) and in a CommonJS build (__filename). */
function here(): string {
  if (typeof __filename === 'string') return pathToFileURL(__filename).href;
  return import.meta.url;
}
